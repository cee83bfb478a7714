//! Checks of the slotted-tube shear lag (AISC 360-22 Table D3.1, cases 5 and 6) and of the
//! chapter K plate-to-HSS equations.
//!
//! Source: AISC 360-22 Table D3.1 (cases 5 and 6, formulas as printed in the table; the
//! expected values below are hand computations of those formulas, not printed example values).
//! The rectangular case uses B = 4 in., H = 6 in., l = 16 in.: x̄ = (16 + 48)/40 = 1.60 in.,
//! U = 1 − 1.60/16 = 0.900 — the shape of AISC Design Examples D.5 as recalled (from memory;
//! not checked against the printed example). Units: in., kip, ksi. Tolerance: 0.001 on U, 0.01 in.
//! on x̄. Chapter K values are hand computations of the table equations (no printed Design
//! Example value reproduced here).

use jointbook::standards::aisc360::d3_slotted::*;
use jointbook::standards::aisc360::k_hss::*;
use jointbook::standards::aisc360::Edition;
use jointbook::units::{Angle, Force, Length, Stress};

const E22: Edition = Edition::Aisc360_22;

#[test]
fn table_d3_1_case_6_single_concentric_plate() {
    let lag = shear_lag_rectangular(
        E22,
        RectangularGusset::SingleConcentric,
        Length::inch(4.0),
        Length::inch(6.0),
        Length::inch(16.0),
    )
    .unwrap();
    assert!((lag.x_bar.unwrap().to_in() - 1.60).abs() <= 0.01);
    assert!((lag.u - 0.900).abs() <= 0.001);
    assert!(lag.out_of_scope.is_empty());
}

#[test]
fn table_d3_1_case_5_round_plate() {
    // D = 6 in., l = 7 in. (D ≤ l < 1.3 D): x̄ = 6/π = 1.91 in., U = 1 − 1.91/7 = 0.727.
    let lag = shear_lag_round_slotted(E22, Length::inch(6.0), Length::inch(7.0)).unwrap();
    assert!((lag.x_bar.unwrap().to_in() - 1.91).abs() <= 0.01);
    assert!((lag.u - 0.727).abs() <= 0.001);
    // l = 1.3 D = 7.8 in.: U = 1.0.
    let full = shear_lag_round_slotted(E22, Length::inch(6.0), Length::inch(7.8)).unwrap();
    assert_eq!(full.u, 1.0);
}

#[test]
fn table_k2_1_round_longitudinal_plate() {
    // Eq. K2-2 by hand: D = 8.625, t = 0.233, Fy = 46, lb = 6, θ = 90°, Qf = 1:
    // Rn = 5.5 (46)(0.233²)(1 + 0.25 × 6/8.625) = 13.735 × 1.1739 = 16.12 kip.
    let hss = RoundHss {
        diameter: Length::inch(8.625),
        wall: Length::inch(0.233),
        fy: Stress::ksi(46.0),
        fu: Stress::ksi(62.0),
    };
    let s = round_longitudinal_plate_plastification(
        E22,
        &hss,
        Length::inch(6.0),
        Angle::deg(90.0),
        Connection::Tee,
        ChordFace::Tension,
    )
    .unwrap();
    let rn = Force::from_si(s.nominal.si).to_kip();
    assert!((rn - 16.12).abs() <= 0.01, "{rn}");
}

#[test]
fn table_k2_1_punching_thickness() {
    // Eq. K2-3 by hand: tp,max = Fu t / Fyp = 62 (0.233) / 36 = 0.401 in.
    let hss = RoundHss {
        diameter: Length::inch(8.625),
        wall: Length::inch(0.233),
        fy: Stress::ksi(46.0),
        fu: Stress::ksi(62.0),
    };
    let r = round_plate_shear_punching(E22, &hss, Length::inch(0.375), Stress::ksi(36.0)).unwrap();
    assert!((Length::from_si(r.required.si).to_in() - 0.401).abs() <= 0.001);
    assert!(r.ratio() <= 1.0);
}
