//! The mate plate in compression (AISC 360-22 J4.4 Eq. J4-6; chapter E, E3, beyond Lc/r = 25),
//! run through the real binary on a one-member frame, against values worked by hand from the
//! clause's equations (no published example at hand). Units: in., kip, ksi; the hand values are
//! rounded to four figures and compared within 0.01 kip.
//!
//! The mate is 1/4 in. ASTM A36 (Fy = 36 ksi, E = 29,000 ksi), 4 in. wide, two 1/2 in. bolts at
//! 1-1/2 in. pitch along the force. Its width in compression is the Whitmore width, the bolt
//! group's gauge spread plus 30° each side over its length (common practice, from memory of the
//! AISC Manual Part 9): b_W = 0 + 2 × 1.5 × tan 30° = 1.732 in., less than the 4 in. plate, so
//! Ag = 1.732 × 0.25 = 0.4330 in.²; r = t / √12 = 0.07217 in.

use std::path::{Path, PathBuf};
use std::process::{Command, Output};

mod common;

/// The test model: mate compression test.
fn model() -> String {
    common::one_member_model(
        "Mate compression test",
        "HSS1-1/2x1-1/2x3/16",
        "TAB",
        "",
        r#"
[details.TAB]
kind = "tab"
bolts = { grade = "ASTM F3125 Gr A325", thread = "1/2-13 UNC", type = "heavy hex structural bolt", nut = "heavy hex nut", nut_grade = "ASTM A563 Gr DH", washer = "ASTM F436", washers = "under nut", head_side = "mate", across = 1, along = 2, pitch = "1-1/2 in", hole = "standard" }
tab = { thickness = "1/4 in", width = "1-1/2 in", material = "ASTM A36", end_distance = "1 in", clear_length = "1-1/2 in", k = 1.2 }
mate = { thickness = "1/4 in", width = "4 in", material = "ASTM A36", end_distance = "1-1/4 in", back_distance = "3 in", count = 1, free_length = "1-1/2 in", k = 1.2 }
weld = { size = "1/8 in", length = "2 in", electrode = "E70", slot_gap = "1/16 in" }
"#,
    )
}

const FORCES: &str = "member,case,axial [kip]\nM1,A,2.5\nM1,B,-4.0\n";

fn run(name: &str, model: &str, method: &str) -> serde_json::Value {
    let dir: PathBuf = Path::new(env!("CARGO_TARGET_TMPDIR")).join(format!("mate-{name}"));
    let _ = std::fs::remove_dir_all(&dir);
    std::fs::create_dir_all(&dir).unwrap();
    let model = model.replace("method = \"LRFD\"", &format!("method = \"{method}\""));
    std::fs::write(dir.join("model.toml"), model).unwrap();
    std::fs::write(dir.join("forces.csv"), FORCES).unwrap();
    let o: Output = Command::new(env!("CARGO_BIN_EXE_jointbook"))
        .current_dir(&dir)
        .args(["check", "model.toml", "--format", "json"])
        .output()
        .unwrap();
    assert!(
        o.status.code() == Some(0) || o.status.code() == Some(1),
        "{}",
        String::from_utf8_lossy(&o.stderr)
    );
    serde_json::from_slice(&o.stdout).unwrap()
}

fn mate_compression(v: &serde_json::Value) -> Option<serde_json::Value> {
    v["connections"][0]["checks"]
        .as_array()
        .unwrap()
        .iter()
        .find(|c| c["limit_state"] == "plate_compression" && c["subject"] == "mate")
        .cloned()
}

fn value(c: &serde_json::Value, key: &str) -> f64 {
    c[key]["value"].as_f64().unwrap()
}

fn input(c: &serde_json::Value, symbol: &str) -> f64 {
    c["inputs"][symbol]["value"].as_f64().unwrap()
}

fn close(got: f64, want: f64, tol: f64) {
    assert!((got - want).abs() <= tol, "got {got}, want {want} ± {tol}");
}

/// Hand-worked, J4.4 Eq. J4-6: L = 1.5 in., K = 1.2, Lc = 1.8 in., Lc/r = 1.8 / 0.07217 = 24.94 ≤ 25,
/// so Pn = Fy Ag = 36 × 0.4330 = 15.59 kip; LRFD φPn = 0.90 × 15.59 = 14.03 kip, ASD
/// Pn/Ω = 15.59 / 1.67 = 9.334 kip; demand 4.0 kip (case B).
#[test]
fn a_short_mate_yields_by_eq_j4_6() {
    let v = run("short", &model(), "LRFD");
    let c = mate_compression(&v).expect("the mate is checked in compression");
    assert_eq!(c["clause"], "J4.4");
    assert_eq!(c["equation"], "J4-6");
    close(input(&c, "b_W"), 1.732, 0.001);
    close(input(&c, "Lc/r"), 24.94, 0.01);
    close(value(&c, "nominal"), 15.59, 0.01);
    close(value(&c, "available"), 14.03, 0.01);
    close(value(&c, "demand"), 4.0, 1e-9);
    assert_eq!(c["load_case"], "B");
    let v = run("short-asd", &model(), "ASD");
    let c = mate_compression(&v).unwrap();
    close(value(&c, "available"), 9.334, 0.01);
    assert!(v["connections"][0]["not_checked"]
        .as_array()
        .unwrap()
        .iter()
        .all(|n| !n
            .as_str()
            .unwrap()
            .contains("plate_compression of the mate")));
}

/// Hand-worked, E3 (J4.4(b) beyond Lc/r = 25): L = 3 in., K = 1.2, Lc = 3.6 in., Lc/r = 49.88;
/// Fe = π² × 29,000 / 49.88² = 115.0 ksi (Eq. E3-4); 49.88 ≤ 4.71 √(29,000/36) = 133.7, so
/// Fcr = 0.658^(36/115.0) × 36 = 31.58 ksi (Eq. E3-2); Pn = 31.58 × 0.4330 = 13.67 kip, LRFD
/// φPn = 12.31 kip.
#[test]
fn a_longer_mate_buckles_by_chapter_e() {
    let m = model().replace(
        "free_length = \"1-1/2 in\", k = 1.2",
        "free_length = \"3 in\", k = 1.2",
    );
    let c = mate_compression(&run("long", &m, "LRFD")).unwrap();
    assert_eq!(c["clause"], "E3");
    assert_eq!(c["equation"], "E3-2");
    close(input(&c, "Fe"), 115.0, 0.05);
    close(input(&c, "Fcr"), 31.58, 0.01);
    close(value(&c, "nominal"), 13.67, 0.01);
    close(value(&c, "available"), 12.31, 0.01);
}

/// Two mates, either side of the tab, each 1/4 in.: each buckles alone (r = 0.07217 in. as
/// above), the area is both plates', Ag = 2 × 0.4330 = 0.8660 in., Pn = 36 × 0.8660 = 31.18 kip,
/// φPn = 28.06 kip (hand-worked, Eq. J4-6). A mate narrower than the Whitmore width (1-1/2 in.)
/// is taken at its width: Ag = 1.5 × 0.25 = 0.375 in.², Pn = 13.50 kip, φPn = 12.15 kip.
#[test]
fn two_mates_add_their_area_and_a_narrow_mate_takes_its_width() {
    let m = model()
        .replace("count = 1,", "count = 2,")
        .replace("head_side = \"mate\", ", "");
    let c = mate_compression(&run("double", &m, "LRFD")).unwrap();
    close(input(&c, "r"), 0.07217, 0.0001);
    close(value(&c, "nominal"), 31.18, 0.01);
    close(value(&c, "available"), 28.06, 0.01);
    let m = model().replace(
        "mate = { thickness = \"1/4 in\", width = \"4 in\"",
        "mate = { thickness = \"1/4 in\", width = \"1-1/2 in\"",
    );
    let c = mate_compression(&run("narrow", &m, "LRFD")).unwrap();
    close(input(&c, "b"), 1.5, 1e-9);
    close(value(&c, "available"), 12.15, 0.01);
}

/// Without `free_length` and `k` the mate is not checked and says why; with one bolt row the
/// Whitmore width is not defined and the mate is not checked either. Both keep the connection
/// from `pass`.
#[test]
fn the_mate_is_not_checked_without_its_free_length_or_with_one_bolt_row() {
    let m = model().replace(", free_length = \"1-1/2 in\", k = 1.2 }", " }");
    let v = run("none", &m, "LRFD");
    assert!(mate_compression(&v).is_none());
    let nc = v["connections"][0]["not_checked"].to_string();
    assert!(nc.contains("plate_compression of the mate"), "{nc}");
    assert!(nc.contains("free_length"), "{nc}");
    assert_ne!(v["connections"][0]["status"], "pass");
    let m = model().replace("along = 2, pitch = \"1-1/2 in\",", "along = 1,");
    let v = run("one-row", &m, "LRFD");
    assert!(mate_compression(&v).is_none());
    let nc = v["connections"][0]["not_checked"].to_string();
    assert!(nc.contains("Whitmore"), "{nc}");
}
