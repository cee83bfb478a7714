//! Thread data against fastener and thread standards. Thread lengths of heavy hex structural bolts, ASME B18.2.6 (edition not at hand): LT in inches
//! by diameter as printed in the project's reference table (1/2 → 1.00, 5/8 → 1.25, 3/4 → 1.38,
//! 7/8 → 1.50, 1 → 1.75). Printed to two decimals; compared to 1e-9 in. since the table is data.

use jointbook::stackup::{thread_length, BoltType};
use jointbook::units::Length;

#[test]
fn b18_2_6_thread_lengths() {
    for (d, lt) in [
        (0.5, 1.00),
        (0.625, 1.25),
        (0.75, 1.38),
        (0.875, 1.50),
        (1.0, 1.75),
    ] {
        let got = thread_length(
            BoltType::HeavyHexStructuralAsmeB18_2_6,
            Length::inch(d),
            Length::inch(4.0),
        )
        .unwrap()
        .unwrap();
        assert!((got.to_in() - lt).abs() < 1e-9, "{d}: {}", got.to_in());
    }
}

/// Tensile stress areas, in.², ASME B1.1 table of Unified threads (from memory: the edition was not
/// at hand), printed to 3–4 significant figures; compared to ±1 in the last printed digit.
#[test]
fn unified_stress_areas_unc_unf() {
    use jointbook::standards::threads::tensile_stress_area_unified;
    let cases = [
        (0.25, 28.0, 0.0364, 0.0001),
        (0.3125, 18.0, 0.0524, 0.0001),
        (0.3125, 24.0, 0.0580, 0.0001),
        (0.375, 24.0, 0.0878, 0.0001),
        (0.4375, 14.0, 0.1063, 0.0001),
        (0.4375, 20.0, 0.1187, 0.0001),
        (0.5, 20.0, 0.1599, 0.0001),
        (0.625, 11.0, 0.226, 0.001),
        (0.625, 18.0, 0.256, 0.001),
        (0.75, 16.0, 0.373, 0.001),
        (0.875, 9.0, 0.462, 0.001),
        (0.875, 14.0, 0.509, 0.001),
        (1.0, 8.0, 0.606, 0.001),
        (1.0, 12.0, 0.663, 0.001),
    ];
    for (d, n, printed, tol) in cases {
        let a = tensile_stress_area_unified(Length::inch(d), n).to_in2();
        assert!((a - printed).abs() <= tol, "{d}-{n}: {a} vs {printed}");
    }
}

/// Nominal stress areas As,nom, mm², ISO 898-1:2013 Table 4, coarse threads M5–M36 (from memory),
/// printed to three significant figures; compared to ±1 in the last printed digit.
#[test]
fn iso_898_1_stress_areas_coarse() {
    use jointbook::standards::threads::tensile_stress_area_metric;
    let cases = [
        (5.0, 0.8, 14.2, 0.1),
        (6.0, 1.0, 20.1, 0.1),
        (8.0, 1.25, 36.6, 0.1),
        (10.0, 1.5, 58.0, 0.1),
        (12.0, 1.75, 84.3, 0.1),
        (14.0, 2.0, 115.0, 1.0),
        (16.0, 2.0, 157.0, 1.0),
        (18.0, 2.5, 192.0, 1.0),
        (20.0, 2.5, 245.0, 1.0),
        (22.0, 2.5, 303.0, 1.0),
        (24.0, 3.0, 353.0, 1.0),
        (27.0, 3.0, 459.0, 1.0),
        (30.0, 3.5, 561.0, 1.0),
        (33.0, 3.5, 694.0, 1.0),
        (36.0, 4.0, 817.0, 1.0),
    ];
    for (d, p, printed, tol) in cases {
        let a = tensile_stress_area_metric(Length::mm(d), Length::mm(p)).to_mm2();
        assert!((a - printed).abs() <= tol, "M{d}: {a} vs {printed}");
    }
}

/// 1/2-13 UNC 2A/2B: B1.1 table limits (from memory) Ds,min 0.4876, Es,min 0.4435, Kn,max 0.434,
/// En,max 0.4565; strip areas at Le = 1D from the project's reference table (Machinery's Handbook,
/// "Strength of screw threads"): external 0.389, internal 0.562 in.². Tolerance ±0.001 in.²: the
/// printed areas are rounded to three decimals and rest on the table-rounded limits.
#[test]
fn half_inch_unc_strip_areas() {
    use jointbook::stackup::engagement::*;
    let lim = unified_2a_2b_limits(0.5, 13.0).unwrap();
    assert!((lim.major_min_ext - 0.4876).abs() < 1e-9);
    assert!((lim.pitch_min_ext - 0.4435).abs() < 1e-9);
    assert!((lim.minor_max_int - 0.434).abs() < 1e-9);
    assert!((lim.pitch_max_int - 0.4565).abs() < 1e-9);
    let le = Length::inch(0.5);
    assert!((external_strip_area(&lim, 13.0, le).to_in2() - 0.389).abs() <= 0.001);
    assert!((internal_strip_area(&lim, 13.0, le).to_in2() - 0.562).abs() <= 0.001);
}
