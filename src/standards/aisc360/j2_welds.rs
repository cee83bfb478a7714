//! AISC 360 J2 — welds (fillet and flare-bevel groove welds).
