//! AISC 360 J7 — bearing strength.
