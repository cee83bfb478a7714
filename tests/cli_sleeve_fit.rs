//! sleeve_fit and sleeve_insertion on the demo's chord splice (HSS1-1/2x1-1/2x3/16 sleeve in
//! HSS2x2x3/16 chords), through the real binary, against a hand calculation.
//!
//! Tolerances: ASTM A500 (2021) §11, outside size ±0.020 in. up to 2-1/2 in., wall ±10 %;
//! outside corner radius at most 3 t (all from memory). Worked by hand:
//! tightest — chord inside half-width (2 − 0.020)/2 − 1.1 × 0.1875 = 0.78375 in., inside corner
//! radius 3 × 0.1875 − 0.1875 = 0.375 in.; sleeve half-width (1.5 + 0.020)/2 = 0.76 in., corner
//! 2 × 0.174 = 0.348 in. (the catalogue's property radius). p = q = 0.02375 − 0.027 = −0.00325,
//! so the corners touch first: per side 0.027 − 0.00325 √2 = 0.022404 in., total 0.044808 in.
//! loosest — (2 + 0.020) − 2 × (0.1875 − 0.01875) − (1.5 − 0.020) = 0.2025 in.

use std::process::Command;

const DEMO: &str = "examples/quillon-brook-footbridge/model.toml";

fn checks(args: &[&str]) -> (i32, serde_json::Value) {
    let o = Command::new(env!("CARGO_BIN_EXE_jointbook"))
        .current_dir(env!("CARGO_MANIFEST_DIR"))
        .args(args)
        .output()
        .unwrap();
    (
        o.status.code().unwrap(),
        serde_json::from_slice(&o.stdout).unwrap_or(serde_json::Value::Null),
    )
}

fn find<'a>(
    v: &'a serde_json::Value,
    conn: &str,
    ls: &str,
    subject: &str,
) -> &'a serde_json::Value {
    v["connections"]
        .as_array()
        .unwrap()
        .iter()
        .find(|c| c["id"] == conn)
        .unwrap()["checks"]
        .as_array()
        .unwrap()
        .iter()
        .find(|c| c["limit_state"] == ls && c["subject"] == subject)
        .unwrap_or_else(|| panic!("no {ls} ({subject}) at {conn}"))
}

#[test]
fn the_demo_splice_fits_within_the_default_band() {
    let (code, v) = checks(&["check", DEMO, "--format", "json"]);
    assert_eq!(code, 0);
    let tight = find(&v, "BC1/end", "sleeve_fit", "tightest fit");
    assert!((tight["available"]["value"].as_f64().unwrap() - 0.044808).abs() < 1e-5);
    assert_eq!(tight["bound"], "minimum");
    assert_eq!(tight["status"], "pass");
    let loose = find(&v, "BC1/end", "sleeve_fit", "loosest fit");
    assert!((loose["demand"]["value"].as_f64().unwrap() - 0.2025).abs() < 1e-9);
    assert_eq!(loose["bound"], "maximum");
    // common practice default: insertion at least 1.5 × 2 in. = 3 in.; 4 in. given
    let ins = find(&v, "BC1/end", "sleeve_insertion", "sleeve");
    assert!((ins["demand"]["value"].as_f64().unwrap() - 3.0).abs() < 1e-9);
}

#[test]
fn a_seam_left_inside_makes_the_sleeve_interfere() {
    let dir = std::path::Path::new(env!("CARGO_TARGET_TMPDIR")).join("sleeve-seam");
    let _ = std::fs::remove_dir_all(&dir);
    std::fs::create_dir_all(&dir).unwrap();
    let src =
        std::path::Path::new(env!("CARGO_MANIFEST_DIR")).join("examples/quillon-brook-footbridge");
    let model = std::fs::read_to_string(src.join("model.toml"))
        .unwrap()
        .replace("inside_seam = \"0 in\"", "inside_seam = \"1/16 in\"");
    std::fs::write(dir.join("model.toml"), model).unwrap();
    std::fs::copy(src.join("forces.csv"), dir.join("forces.csv")).unwrap();
    let m = dir.join("model.toml");
    let (code, v) = checks(&["check", m.to_str().unwrap(), "--format", "json"]);
    assert_eq!(code, 1);
    // 0.044808 − 0.0625 < 0: the parts can interfere.
    let tight = find(&v, "BC1/end", "sleeve_fit", "tightest fit");
    assert!(tight["available"]["value"].as_f64().unwrap() < 0.0);
    assert_eq!(tight["status"], "fail");
}
