//! AISC 360 J3 — bolts and threaded parts.
