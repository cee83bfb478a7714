//! AISC 360 Chapter K — HSS connections (plate-to-HSS).
