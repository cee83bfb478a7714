//! AISC 360 Table D3.1, cases 5 and 6 — shear lag of a concentric plate in a slotted round or rectangular HSS.
