//! AISC 360 J4 — affected and connecting elements (tension, shear, block shear).
