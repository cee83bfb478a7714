//! Reference checks of the AISC 360 J2 weld functions.
//!
//! Sources: AISC Steel Construction Manual, 16th ed., Part 8, Eq. 8-2a/8-2b (E70 fillet, per
//! 1/16 in. of leg per inch of length: 1.392 / 0.928 kip/in.); AISC Design Examples v16.0,
//! Example J.2 (5/16 in. E70 fillet at θ = 60°, kds = 1.40, two sides 19.5 / 13.0 kip/in.) and
//! Example J.1 (two 27 in. lines of 3/16 in. E70 fillet, β = 0.912, Rn 274 → 206 / 137 kip); AISC
//! 360-22 Table J2.4 (minimum fillet sizes). The example values are as printed in the project's
//! reference list, not re-read from the documents here (from memory). Units: in., kip, ksi.
//! Tolerance: ±1 in the last printed digit.

use jointbook::standards::aisc360::j2_welds::*;
use jointbook::standards::aisc360::Edition;
use jointbook::standards::Method;
use jointbook::units::{Angle, Force, ForcePerLength, Length, Stress};

const E22: Edition = Edition::Aisc360_22;

fn e70() -> Stress {
    Stress::ksi(70.0)
}

fn kip(q: jointbook::units::Quantity) -> f64 {
    Force::from_si(q.si).to_kip()
}

#[test]
fn manual_eq_8_2_per_sixteenth_per_inch() {
    // Manual Eq. 8-2a/8-2b: φRn = 1.392 D l, Rn/Ω = 0.928 D l (D in sixteenths, l in in.).
    let s =
        fillet_weld_rupture_per_length(E22, e70(), Length::inch(1.0 / 16.0), Angle::deg(0.0), true)
            .unwrap();
    let lrfd = ForcePerLength::from_si(s.available(Method::Lrfd).si).to_kip_per_in();
    let asd = ForcePerLength::from_si(s.available(Method::Asd).si).to_kip_per_in();
    assert!((lrfd - 1.392).abs() <= 0.001, "{lrfd}");
    assert!((asd - 0.928).abs() <= 0.001, "{asd}");
}

#[test]
fn design_example_j2_sixty_degrees() {
    // Example J.2: kds = 1.0 + 0.50 sin^1.5 60° = 1.40 (Eq. J2-5); two 5/16 in. lines:
    // 19.5 kip/in. LRFD, 13.0 kip/in. ASD.
    assert!((directional_factor(Angle::deg(60.0)) - 1.40).abs() <= 0.01);
    let s = fillet_weld_rupture_per_length(
        E22,
        e70(),
        Length::inch(5.0 / 16.0),
        Angle::deg(60.0),
        true,
    )
    .unwrap();
    let lrfd = 2.0 * ForcePerLength::from_si(s.available(Method::Lrfd).si).to_kip_per_in();
    let asd = 2.0 * ForcePerLength::from_si(s.available(Method::Asd).si).to_kip_per_in();
    assert!((lrfd - 19.5).abs() <= 0.1, "{lrfd}");
    assert!((asd - 13.0).abs() <= 0.1, "{asd}");
}

#[test]
fn design_example_j1_long_weld() {
    // Example J.1: l/w = 27/(3/16) = 144, β = 1.2 − 0.002 (144) = 0.912 (Eq. J2-1);
    // Rn = 274 kip, φRn = 206 kip, Rn/Ω = 137 kip.
    let line = FilletLine {
        size: Length::inch(0.1875),
        length: Length::inch(27.0),
        angle: Angle::deg(0.0),
        end_loaded: true,
    };
    let (_, beta) = long_weld_effective_length(line.size, line.length);
    assert!((beta - 0.912).abs() < 1e-9);
    let g = fillet_weld_group_rupture(E22, e70(), &[line, line], true).unwrap();
    assert!((kip(g.nominal) - 274.0).abs() <= 1.0, "{}", kip(g.nominal));
    assert!((kip(g.available(Method::Lrfd)) - 206.0).abs() <= 1.0);
    assert!((kip(g.available(Method::Asd)) - 137.0).abs() <= 1.0);
}

#[test]
fn table_j2_4_rows() {
    // AISC 360-22 Table J2.4: T ≤ 1/4 → 1/8; ≤ 1/2 → 3/16; ≤ 3/4 → 1/4; > 3/4 → 5/16 in.
    // (mm column: 6 → 3; 13 → 5; 19 → 6; over 19 → 8).
    let rows = [
        (0.25, 0.125),
        (0.26, 0.1875),
        (0.5, 0.1875),
        (0.75, 0.25),
        (1.0, 0.3125),
    ];
    for (t, w) in rows {
        let got = table_j2_4_minimum(SizeTable::Inch, Length::inch(t)).to_in();
        assert!((got - w).abs() < 1e-12, "t = {t}: {got}");
    }
    let rows_mm = [(6.0, 3.0), (10.0, 5.0), (19.0, 6.0), (25.0, 8.0)];
    for (t, w) in rows_mm {
        let got = table_j2_4_minimum(SizeTable::Metric, Length::mm(t)).to_mm();
        assert!((got - w).abs() < 1e-12, "t = {t}: {got}");
    }
}

#[test]
fn capacity_never_decreases_with_size_or_length() {
    // Property by plain loops: Rn grows (or stays) with w and with l, the β reduction included
    // (le = l (1.2 − 0.002 l/w) rises up to l/w = 300, then le = 180 w stays flat).
    for end_loaded in [false, true] {
        for deg in [0.0, 45.0, 90.0] {
            let mut last_by_length = 0.0;
            for i in 1..=400 {
                let line = FilletLine {
                    size: Length::inch(0.125),
                    length: Length::inch(0.1 * i as f64),
                    angle: Angle::deg(deg),
                    end_loaded,
                };
                let rn = kip(fillet_weld_rupture(E22, e70(), &line, true)
                    .unwrap()
                    .nominal);
                assert!(rn + 1e-9 >= last_by_length, "l = {}", 0.1 * i as f64);
                last_by_length = rn;
            }
            let mut last_by_size = 0.0;
            for i in 1..=32 {
                let line = FilletLine {
                    size: Length::inch(i as f64 / 32.0),
                    length: Length::inch(20.0),
                    angle: Angle::deg(deg),
                    end_loaded,
                };
                let rn = kip(fillet_weld_rupture(E22, e70(), &line, true)
                    .unwrap()
                    .nominal);
                assert!(rn + 1e-9 >= last_by_size, "w = {}/32", i);
                last_by_size = rn;
            }
        }
    }
}

#[test]
fn table_j2_2_flare_groove_throats() {
    // AISC 360-22 Table J2.2, effective weld throat of flare groove welds filled flush (from
    // memory): flare bevel 5/16 R (SMAW, FCAW-S, SAW) and 5/8 R (GMAW, FCAW-G); flare V 5/8 R
    // (SMAW, FCAW-S), 3/4 R (GMAW, FCAW-G), 1/2 R (SAW). R = 1 in. makes E the factor itself.
    let r = Length::inch(1.0);
    let rows = [
        (FlareGroove::Bevel, FlareProcess::GmawFcawG, 5.0 / 8.0),
        (FlareGroove::Bevel, FlareProcess::SmawFcawS, 5.0 / 16.0),
        (FlareGroove::Bevel, FlareProcess::Saw, 5.0 / 16.0),
        (FlareGroove::Vee, FlareProcess::GmawFcawG, 3.0 / 4.0),
        (FlareGroove::Vee, FlareProcess::SmawFcawS, 5.0 / 8.0),
        (FlareGroove::Vee, FlareProcess::Saw, 1.0 / 2.0),
    ];
    for (groove, process, k) in rows {
        let (e, factor) = flare_groove_effective_throat(groove, process, r);
        assert!((e.to_in() - k).abs() < 1e-12, "{groove:?} {process:?}");
        assert!((factor - k).abs() < 1e-12);
    }
}

#[test]
fn flare_bevel_hand_worked() {
    // Hand-worked: HSS2x2x1/4, t_des = 0.233 in. (AISC Manual 16th ed. Table 1-12, from memory),
    // R = 2 t_des = 0.466 in. (Table J2.2 note: R may be taken as 2t for HSS); GMAW flare bevel
    // filled flush, E = 5/8 × 0.466 = 0.29125 in.; l = 3 in.: Awe = 0.87375 in.²;
    // Eq. J2-3: Rn = 0.60 × 70 × 0.87375 = 36.70 kip; Table J2.5 (shear): φ = 0.75 → 27.52 kip,
    // Ω = 2.00 → 18.35 kip.
    let s = flare_groove_weld_rupture(
        E22,
        e70(),
        FlareGroove::Bevel,
        FlareProcess::GmawFcawG,
        Length::inch(0.466),
        Length::inch(3.0),
        GrooveLoad::Shear,
    )
    .unwrap();
    assert!((kip(s.nominal) - 36.70).abs() <= 0.01, "{}", kip(s.nominal));
    assert!((kip(s.available(Method::Lrfd)) - 27.52).abs() <= 0.01);
    assert!((kip(s.available(Method::Asd)) - 18.35).abs() <= 0.01);
    assert!(s.out_of_scope.is_empty(), "R ≥ 3/8 in. is in scope");
}

#[test]
fn table_j2_3_rows() {
    // AISC 360-22 Table J2.3, minimum effective throat of PJP groove welds (from memory): to 1/4
    // in. inclusive → 1/8; over 1/4 to 1/2 → 3/16; to 3/4 → 1/4; to 1-1/2 → 5/16; to 2-1/4 →
    // 3/8; to 6 → 1/2; over 6 → 5/8 in. (mm: 6 → 3, 13 → 5, 19 → 6, 38 → 8, 57 → 10, 150 → 13,
    // over 150 → 16).
    let rows = [
        (0.25, 0.125),
        (0.3, 0.1875),
        (0.75, 0.25),
        (1.5, 0.3125),
        (2.0, 0.375),
        (6.0, 0.5),
        (7.0, 0.625),
    ];
    for (t, e) in rows {
        let got = table_j2_3_minimum(SizeTable::Inch, Length::inch(t)).to_in();
        assert!((got - e).abs() < 1e-12, "t = {t}: {got}");
    }
    let rows_mm = [
        (6.0, 3.0),
        (13.0, 5.0),
        (20.0, 8.0),
        (57.0, 10.0),
        (200.0, 16.0),
    ];
    for (t, e) in rows_mm {
        let got = table_j2_3_minimum(SizeTable::Metric, Length::mm(t)).to_mm();
        assert!((got - e).abs() < 1e-12, "t = {t}: {got}");
    }
    let q =
        groove_throat_minimum(E22, SizeTable::Inch, Length::inch(0.1), Length::inch(0.1)).unwrap();
    assert_eq!(q.out_of_scope.len(), 1, "under 1/8 in. is sheet steel");
}
