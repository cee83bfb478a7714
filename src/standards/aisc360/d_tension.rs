//! AISC 360 Chapter D — design of members for tension (D2 yield and rupture, D3 net and effective net area).
