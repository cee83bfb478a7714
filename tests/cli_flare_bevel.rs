//! A tab lapped on a face of a rectangular tube with a flare-bevel groove weld along each edge
//! (`weld.joint = "flare bevel"`), through the real binary: the weld strength worked by hand, the
//! fit of the tab to the face, what is not computed for a lapped tab, the located input errors,
//! and the weld call on the sheet.

use std::path::{Path, PathBuf};
use std::process::{Command, Output};

const BIN: &str = env!("CARGO_BIN_EXE_jointbook");

mod common;

/// The test model: lapped tab test.
fn model() -> String {
    common::one_member_model(
        "Lapped tab test",
        "HSS2x2x1/4",
        "FACE-TAB",
        "end_setback = \"0 in\"\n",
        r#"
[details.FACE-TAB]
kind = "tab"
setback = "4 in"
bolts = { grade = "ASTM F3125 Gr A325", thread = "1/2-13 UNC", type = "heavy hex structural bolt", nut = "heavy hex nut", nut_grade = "ASTM A563 Gr DH", washer = "ASTM F436", washers = "under nut", head_side = "mate", across = 1, along = 2, pitch = "1-1/2 in", hole = "standard" }
tab = { thickness = "1/4 in", width = "2 in", material = "ASTM A36", end_distance = "1 in", clear_length = "1-1/2 in", k = 1.2 }
mate = { thickness = "1/4 in", width = "4 in", material = "ASTM A36", end_distance = "1-1/4 in", back_distance = "3 in", count = 1 }
weld = { joint = "flare bevel", process = "GMAW", fill = "flush", length = "3 in", electrode = "E70" }
"#,
    )
}

const FORCES: &str = "member,case,axial [kip]\nM1,A,12.0\nM1,B,-6.0\n";

fn folder(name: &str, model: &str) -> PathBuf {
    let dir = Path::new(env!("CARGO_TARGET_TMPDIR")).join(format!("flare-{name}"));
    let _ = std::fs::remove_dir_all(&dir);
    std::fs::create_dir_all(&dir).unwrap();
    std::fs::write(dir.join("model.toml"), model).unwrap();
    std::fs::write(dir.join("forces.csv"), FORCES).unwrap();
    dir
}

fn check(name: &str, model: &str) -> (Output, serde_json::Value) {
    let dir = folder(name, model);
    let out = Command::new(BIN)
        .current_dir(&dir)
        .args(["check", "model.toml", "--format", "json"])
        .env("NO_COLOR", "1")
        .output()
        .unwrap();
    let v = serde_json::from_slice(&out.stdout).unwrap_or(serde_json::Value::Null);
    (out, v)
}

fn find<'a>(v: &'a serde_json::Value, id: &str) -> &'a serde_json::Value {
    v["connections"][0]["checks"]
        .as_array()
        .unwrap()
        .iter()
        .find(|c| c["limit_state"] == id)
        .unwrap_or_else(|| panic!("no {id} check"))
}

fn value(c: &serde_json::Value, key: &str) -> f64 {
    c[key]["value"].as_f64().unwrap()
}

#[test]
fn the_flare_bevel_welds_of_a_lapped_tab_hand_worked() {
    let (out, v) = check("ok", &model());
    assert_eq!(
        out.status.code(),
        Some(0),
        "{}",
        String::from_utf8_lossy(&out.stderr)
    );
    // Hand-worked: HSS2x2x1/4, t_des = 0.233 in. (AISC Manual 16th ed. Table 1-12, from memory);
    // R = 2 t_des = 0.466 in. (the catalogue's corner rule; Table J2.2 lets R be taken as 2t for
    // HSS); GMAW flare bevel filled flush: E = 5/8 R = 0.29125 in. (Table J2.2, from memory);
    // two lines of 3 in.: Awe = 2 × 0.29125 × 3 = 1.7475 in.²; Eq. J2-3: Rn = 0.60 × 70 ×
    // 1.7475 = 73.40 kip; Table J2.5, shear: φ = 0.75 → φRn = 55.05 kip.
    let w = find(&v, "weld_strength");
    assert_eq!(w["subject"], "tab-to-tube flare-bevel welds");
    assert_eq!(w["equation"], "J2-3");
    assert!((w["inputs"]["R"]["value"].as_f64().unwrap() - 0.466).abs() < 1e-9);
    assert!((w["inputs"]["E"]["value"].as_f64().unwrap() - 0.29125).abs() < 1e-6);
    assert!(
        (value(w, "nominal") - 73.40).abs() < 0.01,
        "{}",
        value(w, "nominal")
    );
    assert!((value(w, "available") - 55.05).abs() < 0.01);
    assert_eq!(w["status"], "pass");

    // Hand-worked, J4.2(b) Eq. J4-4 on the tube wall along both welds: 0.60 × 62 × 0.233 × 6 =
    // 52.01 kip, φ = 0.75 → 39.00 kip.
    let b = v["connections"][0]["checks"]
        .as_array()
        .unwrap()
        .iter()
        .find(|c| {
            c["limit_state"] == "weld_base_metal_rupture" && c["subject"] == "tube wall along welds"
        })
        .unwrap();
    assert!((value(b, "available") - 39.00).abs() < 0.01);

    // Table J2.3 (from memory): thinner part 1/4 in. → E ≥ 1/8 in.; 0.291 in. provided.
    let e = find(&v, "weld_throat_min");
    assert!((value(e, "demand") - 0.125).abs() < 1e-9);
    assert_eq!(e["status"], "pass");

    // No slot: the fillet rules and the slotted-tube rupture are not run; what a lapped tab adds
    // (eccentricity, shear lag of one face, the wall under the tab) is listed as not computed.
    let ids: Vec<&str> = v["connections"][0]["checks"]
        .as_array()
        .unwrap()
        .iter()
        .map(|c| c["limit_state"].as_str().unwrap())
        .collect();
    assert!(!ids.contains(&"weld_size_min") && !ids.contains(&"tube_net_rupture"));
    let not_checked = v["connections"][0]["not_checked"].to_string();
    assert!(not_checked.contains("eccentricity of the lapped tab"));
    assert!(not_checked.contains("tube_net_rupture"));
    assert_eq!(v["connections"][0]["status"], "warn");
}

#[test]
fn a_tab_narrower_than_the_face_is_not_a_flare_bevel_and_fails() {
    let m = model().replace(
        "width = \"2 in\", material = \"ASTM A36\", end_distance = \"1 in\"",
        "width = \"1-1/2 in\", material = \"ASTM A36\", end_distance = \"1 in\"",
    );
    assert_ne!(m, model());
    let (out, v) = check("narrow", &m);
    assert_eq!(out.status.code(), Some(1));
    let w = find(&v, "weld_strength");
    assert_eq!(w["status"], "fail");
    assert!(w["ratio"].is_null());
    assert!(w["note"].as_str().unwrap().contains("as wide as the face"));
}

#[test]
fn a_round_tube_has_no_corner_for_a_flare_bevel() {
    let m = model().replace("section = \"HSS2x2x1/4\"", "section = \"RD TUBE 2x11 ga\"");
    let (out, v) = check("round", &m);
    assert_eq!(out.status.code(), Some(1));
    assert_eq!(find(&v, "weld_strength")["status"], "fail");
}

#[test]
fn a_flare_bevel_without_its_fill_or_with_a_fillet_size_is_an_input_error() {
    for (name, from, to, key) in [
        ("no-fill", "fill = \"flush\", ", "", "weld.fill"),
        (
            "size",
            "fill = \"flush\", ",
            "fill = \"flush\", size = \"3/16 in\", ",
            "weld.size",
        ),
        (
            "process",
            "process = \"GMAW\"",
            "process = \"TIG\"",
            "weld.process",
        ),
    ] {
        let m = model().replace(from, to);
        assert_ne!(m, model());
        let (out, _) = check(name, &m);
        let stderr = String::from_utf8_lossy(&out.stderr);
        assert_eq!(out.status.code(), Some(2), "{name}: {stderr}");
        assert!(
            stderr.contains("model.toml:30:") && stderr.contains(key),
            "{name}: {stderr}"
        );
    }
}

#[test]
fn the_sheet_calls_the_flare_bevel_with_its_throat_and_flush_contour() {
    let dir = folder("sheet", &model());
    let out = Command::new(BIN)
        .current_dir(&dir)
        .args(["sheet", "model.toml", "--out", "sheet"])
        .output()
        .unwrap();
    assert_eq!(
        out.status.code(),
        Some(0),
        "{}",
        String::from_utf8_lossy(&out.stderr)
    );
    let md = std::fs::read_to_string(dir.join("sheet/sheet.md")).unwrap();
    // AWS A2.4 (common practice): the effective throat in parentheses, the length after the
    // symbol, the flush contour; the throat rounded down, never up.
    assert!(
        md.contains("flare-bevel groove (0.291) 3, flush contour, arrow side"),
        "{md}"
    );
    assert!(md.contains("tab lap on the tube face: 3 in"));
    let cut = std::fs::read_to_string(dir.join("sheet/cutlist.csv")).unwrap();
    assert!(!cut.contains("slot"), "a lapped tab needs no slot: {cut}");
}
