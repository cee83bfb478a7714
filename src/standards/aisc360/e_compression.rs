//! AISC 360 Chapter E and J4.4 — compression of connecting elements.
