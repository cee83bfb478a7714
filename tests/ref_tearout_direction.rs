//! Tear-out in the direction the force acts on each ply, and the tab's shear lag at its slot
//! welds, through the real binary: one tab
//! detail whose member sees tension in one load case and compression in the other (a reversal),
//! so every ply is torn out toward a different edge in each sense.
//!
//! Source: hand-worked from AISC 360-22 J3.11 Eq. J3-6c (Rn = 1.2 lc t Fu per bolt, deformation
//! at service load a design consideration), with lc the clear distance from the hole's edge to
//! the edge of the next hole or of the material in the direction of the force (J3.11 symbols),
//! and Eq. J3-6a (Rn = 2.4 d t Fu) as the cap of each bolt; holes 9/16 in. for a 1/2 in. bolt
//! (Table J3.3, standard hole). φ = 0.75 (LRFD).
//!
//! The geometry (all in inches): tab end distance 1, pitch 1-1/2, clear length from the last bolt
//! to the tube end 2; mate end distance (toward the member) 1-1/4, back distance (to its far
//! edge) 3. Member in tension: the tab is pulled toward the tube, so its bolts bear toward the
//! tab's free end; the mate is pulled toward the member, so its bolts bear toward its end. In
//! compression both reverse: the tab's toward the tube end, the mate's toward its back edge.

use std::path::{Path, PathBuf};
use std::process::{Command, Output};

mod common;

/// The test model: tear-out direction test.
fn model() -> String {
    common::one_member_model(
        "Tear-out direction test",
        "HSS2x2x3/16",
        "TAB",
        "",
        r#"
[details.TAB]
kind = "tab"
bolts = { grade = "ASTM F3125 Gr A325", thread = "1/2-13 UNC", type = "heavy hex structural bolt", nut = "heavy hex nut", nut_grade = "ASTM A563 Gr DH", washer = "ASTM F436", washers = "under nut", head_side = "mate", across = 1, along = 2, pitch = "1-1/2 in", hole = "standard" }
tab = { thickness = "1/4 in", width = "2 in", material = "ASTM A36", end_distance = "1 in", clear_length = "2 in", k = 1.2 }
mate = { thickness = "3/8 in", width = "4 in", material = "ASTM A36", end_distance = "1-1/4 in", back_distance = "3 in", count = 1 }
weld = { size = "1/8 in", length = "2 in", electrode = "E70", slot_gap = "1/16 in" }
"#,
    )
}

const FORCES: &str = "member,case,axial [kip]\nM1,T,5.0\nM1,C,-4.0\n";

fn run(name: &str) -> Output {
    let dir: PathBuf = Path::new(env!("CARGO_TARGET_TMPDIR")).join(format!("tearout-{name}"));
    let _ = std::fs::remove_dir_all(&dir);
    std::fs::create_dir_all(&dir).unwrap();
    std::fs::write(dir.join("model.toml"), model()).unwrap();
    std::fs::write(dir.join("forces.csv"), FORCES).unwrap();
    Command::new(env!("CARGO_BIN_EXE_jointbook"))
        .current_dir(&dir)
        .args(["check", "model.toml", "--format", "json"])
        .output()
        .unwrap()
}

fn tearout<'a>(v: &'a serde_json::Value, ply: &str, case: &str) -> &'a serde_json::Value {
    v["connections"][0]["checks"]
        .as_array()
        .unwrap()
        .iter()
        .find(|c| {
            c["limit_state"] == "bolt_tearout" && c["subject"] == ply && c["load_case"] == case
        })
        .unwrap_or_else(|| panic!("no bolt_tearout of the {ply} in case {case}"))
}

fn input(c: &serde_json::Value, name: &str) -> f64 {
    c["inputs"][name]["value"]
        .as_f64()
        .unwrap_or_else(|| panic!("no input {name}: {c}"))
}

fn close(got: f64, want: f64, tol: f64) {
    assert!((got - want).abs() <= tol, "got {got}, want {want}");
}

#[test]
fn each_ply_tears_toward_the_edge_its_force_points_at_in_both_senses() {
    let o = run("direction");
    assert!(
        matches!(o.status.code(), Some(0) | Some(1)),
        "{}",
        String::from_utf8_lossy(&o.stderr)
    );
    let v: serde_json::Value = serde_json::from_slice(&o.stdout).unwrap();
    // Between the holes, in every case: lc = 1.5 − 9/16 = 0.9375 in.
    // Tab, tension (toward its free end): lc = 1 − 9/32 = 0.71875 in.;
    // Rto,end = 1.2 × 0.71875 × 0.25 × 58 = 12.506 kip; Rto,between = 1.2 × 0.9375 × 0.25 × 58
    // = 16.313 kip; Rbr = 2.4 × 0.5 × 0.25 × 58 = 17.40 kip; Rn = 12.506 + 16.313 = 28.819 kip;
    // φRn = 21.614 kip.
    let t = tearout(&v, "tab", "T");
    close(input(t, "lc"), 0.71875, 1e-9);
    close(input(t, "lc,between"), 0.9375, 1e-9);
    close(t["nominal"]["value"].as_f64().unwrap(), 28.819, 1e-3);
    close(t["available"]["value"].as_f64().unwrap(), 21.614, 1e-3);
    // Tab, compression (toward the tube end): lc = 2 − 9/32 = 1.71875 in.; Rto,end = 29.906 kip,
    // capped by Rbr = 17.40; Rn = 17.40 + 16.313 = 33.713 kip.
    let c = tearout(&v, "tab", "C");
    close(input(c, "lc"), 1.71875, 1e-9);
    close(c["nominal"]["value"].as_f64().unwrap(), 33.713, 1e-3);
    // Mate (t = 3/8 in.), tension (toward its end): lc = 1.25 − 9/32 = 0.96875 in.;
    // Rto,end = 1.2 × 0.96875 × 0.375 × 58 = 25.284 kip; between 1.2 × 0.9375 × 0.375 × 58
    // = 24.469 kip; Rbr = 2.4 × 0.5 × 0.375 × 58 = 26.10 kip; Rn = 49.753 kip.
    let m = tearout(&v, "mate", "T");
    close(input(m, "lc"), 0.96875, 1e-9);
    close(m["nominal"]["value"].as_f64().unwrap(), 49.753, 1e-3);
    // Mate, compression (toward its back edge): lc = 3 − 9/32 = 2.71875 in.; Rto,end = 70.961,
    // capped at 26.10; Rn = 26.10 + 24.469 = 50.569 kip.
    let mc = tearout(&v, "mate", "C");
    close(input(mc, "lc"), 2.71875, 1e-9);
    close(mc["nominal"]["value"].as_f64().unwrap(), 50.569, 1e-3);
    // Demands: 5.0 kip in tension, 4.0 kip in compression (the forces file, demand factor 1).
    close(t["demand"]["value"].as_f64().unwrap(), 5.0, 1e-9);
    close(c["demand"]["value"].as_f64().unwrap(), 4.0, 1e-9);
}

/// The tab where the slot welds take its force: a plate connected by longitudinal welds only.
/// AISC 360-22 Table D3.1 case 4 (from memory): the welds lie at the two walls of the HSS2x2,
/// w = 2 in., l = 2 in.: l/w = 1.0 → U = 0.75; An = Ag = 2 × 1/4 = 0.5 in²;
/// Rn = Fu U An = 58 × 0.75 × 0.5 = 21.75 kip, φRn = 16.31 kip (hand-worked).
#[test]
fn the_tab_at_its_slot_welds_takes_the_shear_lag_of_longitudinal_welds() {
    let o = run("slot-welds");
    let v: serde_json::Value = serde_json::from_slice(&o.stdout).unwrap();
    let c = v["connections"][0]["checks"]
        .as_array()
        .unwrap()
        .iter()
        .find(|c| {
            c["limit_state"] == "plate_tension_rupture" && c["subject"] == "tab at the tube welds"
        })
        .expect("the tab's rupture at the welds");
    close(input(c, "U"), 0.75, 1e-12);
    close(input(c, "w"), 2.0, 1e-9);
    close(c["nominal"]["value"].as_f64().unwrap(), 21.75, 1e-6);
    close(c["available"]["value"].as_f64().unwrap(), 16.3125, 1e-6);
}
