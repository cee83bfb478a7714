//! Catalogue loading and lookups: stress areas against the tabulated values (ASME B1.1 table;
//! ISO 898-1:2013 Table 4; from memory, compared to 0.5 %, i.e. the printed three figures), user
//! files, nearest-name suggestions and strength ranges (SAE J429 Table 1, from memory).

use jointbook::catalogue::Catalogue;
use jointbook::units::Length;

const SOURCE: &str =
    "[[source]]\nid = \"shop\"\ndocument = \"invented supplier sheet\"\nedition = \"1\"\ntable = \"1\"\n\n";

#[test]
fn computed_stress_areas_match_the_tabulated_ones() {
    let cat = Catalogue::embedded().unwrap();
    assert!(!cat.threads.is_empty());
    for t in cat.threads.values() {
        let tab = t.stress_area_tabulated.expect("tabulated value").to_mm2();
        let calc = t.stress_area.to_mm2();
        assert!(
            (calc - tab).abs() / tab < 0.005,
            "{}: {calc} vs {tab}",
            t.designation
        );
    }
}

#[test]
fn a_user_file_adds_a_section() {
    let mut cat = Catalogue::embedded().unwrap();
    let text = format!("{SOURCE}[[section]]\nname = \"TUBE 1x1x16ga\"\nshape = \"rect\"\nb = \"1 in\"\nh = \"1 in\"\nt = \"16 ga\"\nstandard = \"ASTM A513\"\nprocess = \"ERW\"\nsource = \"shop\"\n");
    cat.merge_user_file("mine.toml", &text).unwrap();
    let s = cat.section("TUBE 1x1x16ga").unwrap();
    assert!((s.t_nominal.to_in() - 0.0598).abs() < 1e-9);
}

#[test]
fn redefining_without_replaces_is_an_error_at_its_line() {
    let mut cat = Catalogue::embedded().unwrap();
    let text = format!("{SOURCE}[[section]]\nname = \"HSS2x2x1/8\"\nshape = \"rect\"\nb = \"2 in\"\nh = \"2 in\"\nt = \"1/8 in\"\nstandard = \"ASTM A500\"\nprocess = \"ERW\"\nsource = \"shop\"\n");
    let errs = cat.merge_user_file("mine.toml", &text).unwrap_err();
    assert_eq!(errs.len(), 1, "{errs:?}");
    assert_eq!((errs[0].line, errs[0].column), (8, 8));
    assert!(errs[0].message.contains("sections.toml"), "{}", errs[0]);
    let ok = text.replace(
        "source = \"shop\"\n",
        "source = \"shop\"\nreplaces = true\n",
    );
    cat.merge_user_file("mine.toml", &ok).unwrap();
    assert_eq!(
        cat.section("HSS2x2x1/8").unwrap().provenance.file,
        "mine.toml"
    );
}

#[test]
fn every_error_of_a_file_is_collected() {
    let mut cat = Catalogue::default();
    let text = format!("{SOURCE}[[electrode]]\nname = \"X\"\nstandard = \"s\"\nfexx = \"70\"\nsource = \"shop\"\n\n[[electrode]]\nname = \"Y\"\nstandard = \"s\"\nfexx = \"70 ksi\"\nsource = \"nope\"\n");
    let errs = cat.merge_user_file("mine.toml", &text).unwrap_err();
    assert_eq!(errs.len(), 2, "{errs:?}");
    assert_eq!(errs[0].line, 10);
    assert_eq!(errs[1].line, 17);
    assert!(cat.electrodes.is_empty());
}

#[test]
fn unknown_names_suggest_the_nearest() {
    let cat = Catalogue::embedded().unwrap();
    let e = cat.bolt_grade("ASTM F3125 Gr A235").unwrap_err();
    assert_eq!(e.nearest[0], "ASTM F3125 Gr A325");
}

#[test]
fn strength_by_diameter_range() {
    let cat = Catalogue::embedded().unwrap();
    let g = cat.bolt_grade("SAE J429 Gr 2").unwrap();
    assert!((g.strength_at(Length::inch(0.75)).unwrap().fu.to_ksi() - 74.0).abs() < 1e-9);
    assert!((g.strength_at(Length::inch(1.0)).unwrap().fu.to_ksi() - 60.0).abs() < 1e-9);
    let e = g.strength_at(Length::inch(2.0)).unwrap_err();
    assert!(e.contains("outside every range"), "{e}");
    // ASTM A572 Gr 50 plates to 4 in. (Table 2, from memory): outside that, an error.
    let m = cat.material("ASTM A572 Gr 50").unwrap();
    assert!(m.strength_at(Length::inch(5.0)).is_err());
    // EN 10025-2 S355 (Table 7, from memory): 16 < t ≤ 40 mm ReH 345 MPa; 3 ≤ t ≤ 100 mm Rm 470 MPa.
    let s = cat.material("EN 10025-2 S355").unwrap();
    let (fy, fu) = s.strength_at(Length::mm(20.0)).unwrap();
    assert!((fy.to_mpa() - 345.0).abs() < 1e-9 && (fu.to_mpa() - 470.0).abs() < 1e-9);
    let (fy, _) = s.strength_at(Length::mm(16.0)).unwrap();
    assert!((fy.to_mpa() - 355.0).abs() < 1e-9);
}

#[test]
fn nut_heights_and_structural_thread_lengths() {
    // ASME B18.2.2 (as quoted in the project's reference list): heavy hex nut 1/2 → 31/64 in.,
    // 3/4 → 47/64 in.; hex nut 1/2 → 7/16 in. ASME B18.2.6 heavy hex structural bolt thread
    // length: 1/2 → 1.00, 3/4 → 1.38, 1 → 1.75 in.
    let cat = Catalogue::embedded().unwrap();
    let heavy = cat.nut("heavy hex nut").unwrap();
    let h = |d: f64| heavy.size_for(Length::inch(d)).unwrap().height.to_in();
    assert!((h(0.5) - 31.0 / 64.0).abs() < 1e-9);
    assert!((h(0.75) - 47.0 / 64.0).abs() < 1e-9);
    let hex = cat.nut("hex nut").unwrap();
    assert!((hex.size_for(Length::inch(0.5)).unwrap().height.to_in() - 7.0 / 16.0).abs() < 1e-9);
    let bolt = cat.bolt_type("heavy hex structural bolt").unwrap();
    for (d, lt) in [(0.5, 1.00), (0.75, 1.38), (1.0, 1.75)] {
        let got = bolt
            .thread_length
            .thread_length(Length::inch(d), Length::inch(3.0))
            .unwrap()
            .to_in();
        assert!((got - lt).abs() < 1e-9, "{d}: {got}");
    }
    assert!(bolt.size_for(Length::inch(0.4375)).is_none());
}
