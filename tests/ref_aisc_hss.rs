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
//!
//! The end-to-end checks below run the Nettlebank notice gantry example (examples/, an invented
//! scenario) through `check_model` and compare each chord-wall and mate-to-chord weld result with
//! a hand computation of the printed equation, worked in the comment beside it: AISC 360-22
//! Table K2.1 Eq. K2-2 and K2-3, Table K2.2 Eq. K2-7, K2-9 and K2-12, J2.4 Eq. J2-3. The
//! section values are those of the catalogue: design walls 0.93 t (AISC 360-22 B4.2):
//! HSS2.875x0.203 t = 0.189 in., HSS3x3x3/16 t = 0.174 in.; outside corner k = 2t = 0.348 in.
//! (common practice for A500 shapes, as the catalogue takes it). Units kip, in., ksi; tolerance
//! 0.01 kip (the hand values carry four to five figures).

use jointbook::checks::{check_model, CheckResult, Report};
use jointbook::model::{load, LoadOptions};
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

fn gantry() -> Report {
    let path = std::path::Path::new(env!("CARGO_MANIFEST_DIR"))
        .join("examples/nettlebank-notice-gantry/model.toml");
    check_model(&load(&path, &LoadOptions::default()).expect("the example loads"))
}

/// The one check of `limit_state` on `subject` at connection `id` for load case `case` (None:
/// a dimensional rule).
fn found<'a>(
    r: &'a Report,
    id: &str,
    limit_state: &str,
    subject: &str,
    case: Option<&str>,
) -> &'a CheckResult {
    let c = r.connections.iter().find(|c| c.id == id).expect(id);
    let all: Vec<&CheckResult> = c
        .checks
        .iter()
        .filter(|k| {
            k.limit_state == limit_state && k.subject == subject && k.load_case.as_deref() == case
        })
        .collect();
    assert_eq!(all.len(), 1, "{id} {limit_state} {subject} {case:?}");
    all[0]
}

fn nominal_kip(c: &CheckResult) -> f64 {
    Force::from_si(c.nominal.expect("a strength").si).to_kip()
}

#[test]
fn gantry_round_post_under_a_longitudinal_gusset() {
    let r = gantry();
    // Table K2.1 Eq. K2-2, K0 (45 deg to post P0) in tension 1.3 kip in case B; P0 carries
    // −0.6 kip in case B: U = 0.6 / (46 × 1.5948) = 0.6 / 73.36 = 0.00818, Ag = π (2.875 − 0.189)
    // 0.189 = 1.5948 in²; Qf = 1 − 0.3 U (1 + U) = 0.99753.
    // Rn sin θ = 5.5 (46)(0.189²)(1 + 0.25 × 4/2.875) Qf = 9.0374 × 1.34783 × 0.99753 = 12.151;
    // Rn = 12.151 / sin 45° = 17.184 kip; φ = 0.90.
    let c = found(
        &r,
        "K0/start",
        "chord_plastification",
        "chord wall P0",
        Some("B"),
    );
    assert!(
        (nominal_kip(c) - 17.184).abs() <= 0.01,
        "{}",
        nominal_kip(c)
    );
    assert_eq!(c.citation.equation, "K2-2");
    assert!(
        (c.ratio - 1.3 / (0.9 * 17.184)).abs() <= 1e-3,
        "{}",
        c.ratio
    );
    // Eq. K2-3: tp ≤ Fu t / Fyp = 62 (0.189) / 36 = 0.3255 in.; tp = 1/4 in.: ratio 0.768.
    let p = found(&r, "K0/start", "chord_punching", "chord wall P0", None);
    assert!((p.ratio - 0.25 / 0.3255).abs() <= 1e-3, "{}", p.ratio);
}

#[test]
fn gantry_square_beam_under_longitudinal_and_transverse_plates() {
    let r = gantry();
    // Table K2.2 Eq. K2-12, K0 (45 deg to the beam) in tension 1.3 kip in case B, the beam in
    // tension in case B (Qf = 1): tp/B = 0.25/3 = 0.08333;
    // Rn sin θ = 50 (0.174²) / (1 − 0.08333) × (2 × 4/3 + 4 √0.91667) = 1.6514 × 6.4964 = 10.728;
    // Rn = 10.728 / sin 45° = 15.172 kip; φ = 1.00.
    let c = found(
        &r,
        "K0/end",
        "chord_plastification",
        "chord wall BEAM",
        Some("B"),
    );
    assert!(
        (nominal_kip(c) - 15.172).abs() <= 0.01,
        "{}",
        nominal_kip(c)
    );
    assert_eq!(c.citation.equation, "K2-12");
    // Eq. K2-7, the hanger's 3 in. transverse plate on the 3 in. face: B/t = 17.241;
    // Rn = 10 (50)(0.174)(3) / 17.241 = 15.138 kip (≤ Fyp tp Bp = 36 × 0.25 × 3 = 27 kip).
    let y = found(
        &r,
        "H/start",
        "chord_local_yielding",
        "chord wall BEAM",
        Some("A"),
    );
    assert!(
        (nominal_kip(y) - 15.138).abs() <= 0.01,
        "{}",
        nominal_kip(y)
    );
    // Eq. K2-9 (Bp = B: the plate bears on the side walls): Rn = 2 (50)(0.174)(5 × 0.348 + 0.25)
    // = 17.4 × 1.99 = 34.626 kip; φ = 1.00.
    let s = found(
        &r,
        "H/start",
        "chord_sidewall_yielding",
        "chord wall BEAM",
        Some("A"),
    );
    assert!(
        (nominal_kip(s) - 34.626).abs() <= 0.01,
        "{}",
        nominal_kip(s)
    );
    // The hanger is in tension in both cases: no sidewall crippling (K2-10 is for a plate that
    // pushes on the HSS).
    let h = r.connections.iter().find(|c| c.id == "H/start").unwrap();
    assert!(h
        .checks
        .iter()
        .all(|c| c.limit_state != "chord_sidewall_crippling"));
}

#[test]
fn gantry_mate_to_chord_fillets() {
    let r = gantry();
    // J2.4 Eq. J2-3 with kds = 1.0: two 3/16 in. fillets 4 in. long,
    // Rn = 0.60 (70)(0.7071 × 0.1875)(2 × 4) = 44.548 kip; φRn = 33.41 kip.
    let w = found(
        &r,
        "K0/start",
        "weld_strength",
        "mate-to-chord weld",
        Some("B"),
    );
    assert!(
        (nominal_kip(w) - 44.548).abs() <= 0.01,
        "{}",
        nominal_kip(w)
    );
    // The hanger's two fillets 3 in. long on the 3 in. face of the HSS3x3x3/16 beam take only
    // their effective length, AISC 360-22 K5 Eq. K5-1 (from memory), worked by hand:
    // le = 2 (10/(B/t)) (Fy t / (Fyp tp)) Bp = 2 (10/(3/0.174)) (50 × 0.174 / (36 × 0.25)) × 3
    //    = 2 × 0.58 × 0.96667 × 3 = 3.3640 in. ≤ 2 Bp = 6 in.;
    // Rn = 0.60 (70)(0.7071 × 0.1875) × 3.3640 = 42 × 0.13258 × 3.3640 = 18.733 kip.
    let h = found(
        &r,
        "H/start",
        "weld_strength",
        "mate-to-chord weld",
        Some("A"),
    );
    assert!(
        (nominal_kip(h) - 18.733).abs() <= 0.01,
        "{}",
        nominal_kip(h)
    );
    // AISC 360-22 Table J2.4: thinner part 3/16 in. (the beam wall), to 1/4 in. inclusive:
    // w,min = 1/8 in.
    let m = found(&r, "H/start", "weld_size_min", "mate-to-chord weld", None);
    assert!((m.ratio - 0.125 / 0.1875).abs() <= 1e-9, "{}", m.ratio);
}
