//! Section properties computed from dimensions, checked against published tables.
//!
//! Sources: AISC Steel Construction Manual, 16th ed., Table 1-12 (square HSS), US customary units
//! (in., in.², in.⁴, lb/ft); EN 10219-2 section tables (SI: mm, cm², cm⁴, kg/m). Compared at the
//! printed precision: ±1 in the last printed digit.

use jointbook::catalogue::Catalogue;

fn near(value: f64, printed: f64, last_digit: f64) -> bool {
    (value - printed).abs() <= last_digit + 1e-12
}

#[test]
fn hss_2x2x1_8_matches_manual_table_1_12() {
    // AISC Manual 16th ed. Table 1-12, HSS2×2×1/8 (as quoted in the project's reference list):
    // t_des 0.116 in. (0.93 t), A 0.840 in.², I 0.486 in.⁴, r 0.761 in., 3.05 lb/ft.
    let cat = Catalogue::embedded().unwrap();
    let s = cat.section("HSS2x2x1/8").unwrap();
    assert!(near(s.t_design.to_in(), 0.116, 0.0005));
    assert!(
        near(s.props.area.to_in2(), 0.840, 0.001),
        "{}",
        s.props.area.to_in2()
    );
    assert!(
        near(s.props.ix.to_in4(), 0.486, 0.001),
        "{}",
        s.props.ix.to_in4()
    );
    assert!(
        near(s.props.rx.to_in(), 0.761, 0.001),
        "{}",
        s.props.rx.to_in()
    );
    let w = s.props.mass_per_length.to_lb_per_ft();
    assert!(near(w, 3.05, 0.01), "{w}");
}

#[test]
fn shs_40x40x3_matches_en_10219_2() {
    // EN 10219-2 section table, SHS 40×40×3 (ro = 2t, ri = t; as quoted in the project's
    // reference list): A 4.21 cm², I 9.32 cm⁴, 3.30 kg/m.
    let cat = Catalogue::embedded().unwrap();
    let s = cat.section("SHS 40x40x3").unwrap();
    assert!(near(s.props.area.to_mm2() / 100.0, 4.21, 0.01));
    assert!(near(s.props.ix.to_mm4() / 1e4, 9.32, 0.01));
    assert!(near(s.props.mass_per_length.to_kg_per_m(), 3.30, 0.01));
}

#[test]
fn chs_48_3x3_2_from_memory() {
    // EN 10219-2 CHS 48.3×3.2, from memory: A 4.53 cm², I 11.6 cm⁴, 3.56 kg/m.
    let cat = Catalogue::embedded().unwrap();
    let s = cat.section("CHS 48.3x3.2").unwrap();
    assert!(near(s.props.area.to_mm2() / 100.0, 4.53, 0.01));
    assert!(near(s.props.ix.to_mm4() / 1e4, 11.6, 0.1));
    assert!(near(s.props.mass_per_length.to_kg_per_m(), 3.56, 0.01));
}

#[test]
fn gauge_thicknesses_are_msg() {
    // Manufacturers' Standard Gauge for sheet steel, from memory: 16 ga 0.0598 in., 11 ga 0.1196 in.
    let cat = Catalogue::embedded().unwrap();
    assert!(near(
        cat.gauge("16 ga").unwrap().thickness.to_in(),
        0.0598,
        0.00005
    ));
    assert!(near(
        cat.gauge("11 ga").unwrap().thickness.to_in(),
        0.1196,
        0.00005
    ));
}

#[test]
fn more_hss_from_memory() {
    // AISC Manual 16th ed. Tables 1-12 and 1-13, values from memory (not checked against the
    // printed table): HSS4×4×1/4: A 3.37 in.², I 7.80 in.⁴, r 1.52 in., 12.21 lb/ft;
    // HSS2.375×0.154: A 1.00 in.², I 0.627 in.⁴, 3.66 lb/ft.
    let cat = Catalogue::embedded().unwrap();
    let s = cat.section("HSS4x4x1/4").unwrap();
    assert!(
        near(s.props.area.to_in2(), 3.37, 0.01),
        "{}",
        s.props.area.to_in2()
    );
    assert!(
        near(s.props.ix.to_in4(), 7.80, 0.01),
        "{}",
        s.props.ix.to_in4()
    );
    assert!(
        near(s.props.rx.to_in(), 1.52, 0.01),
        "{}",
        s.props.rx.to_in()
    );
    let w = s.props.mass_per_length.to_lb_per_ft();
    assert!(near(w, 12.21, 0.01), "{w}");
    let r = cat.section("HSS2.375x0.154").unwrap();
    assert!(
        near(r.props.area.to_in2(), 1.00, 0.01),
        "{}",
        r.props.area.to_in2()
    );
    assert!(
        near(r.props.ix.to_in4(), 0.627, 0.001),
        "{}",
        r.props.ix.to_in4()
    );
    let w = r.props.mass_per_length.to_lb_per_ft();
    assert!(near(w, 3.66, 0.01), "{w}");
}
