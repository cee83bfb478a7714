//! Fastener stack-up: grip, washers, nut, bolt length, thread past the nut, threads in the shear
//! planes, tapped thread engagement.
