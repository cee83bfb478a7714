//! Broken model files fed to the real binary: each must end with exit code 2, a message that
//! names the file, line and column and the key, and no output file.
//!
//! The base model is a valid one-member frame (checked by `the_base_model_is_valid`); each case
//! breaks one thing in it. Line and column numbers refer to the base text below.

use std::path::{Path, PathBuf};
use std::process::{Command, Output};
use std::sync::atomic::{AtomicUsize, Ordering};

mod common;

/// The base model every broken model is made from: one tab at the start of M1.
fn base() -> String {
    common::one_member_model(
        "Test frame",
        "HSS1-1/2x1-1/2x3/16",
        "TAB",
        "",
        r#"
[details.TAB]
kind = "tab"
bolts = { grade = "ASTM F3125 Gr A325", thread = "1/2-13 UNC", type = "heavy hex structural bolt", nut = "heavy hex nut", nut_grade = "ASTM A563 Gr DH", washer = "ASTM F436", washers = "under nut", head_side = "mate", across = 1, along = 2, pitch = "1-1/2 in", hole = "standard" }
tab = { thickness = "1/4 in", width = "1-1/2 in", material = "ASTM A36", end_distance = "1 in", clear_length = "1-1/2 in", k = 1.2 }
mate = { thickness = "1/4 in", width = "4 in", material = "ASTM A36", end_distance = "1-1/4 in", back_distance = "3 in", count = 1 }
weld = { size = "1/8 in", length = "2 in", electrode = "E70", slot_gap = "1/16 in" }
"#,
    )
}

const FORCES: &str = "member,case,axial [kip]\nM1,A,2.5\nM1,B,-1.0\n";

/// A fresh folder under the target's test scratch space.
fn scratch(name: &str) -> PathBuf {
    static N: AtomicUsize = AtomicUsize::new(0);
    let dir = Path::new(env!("CARGO_TARGET_TMPDIR")).join(format!(
        "broken-{}-{}-{name}",
        std::process::id(),
        N.fetch_add(1, Ordering::SeqCst)
    ));
    let _ = std::fs::remove_dir_all(&dir);
    std::fs::create_dir_all(&dir).unwrap();
    dir
}

/// Write the model (bytes) and forces into a fresh folder and run `check` with `--output`.
fn run(name: &str, model: &[u8], forces: &str) -> (Output, PathBuf) {
    let dir = scratch(name);
    std::fs::write(dir.join("model.toml"), model).unwrap();
    std::fs::write(dir.join("forces.csv"), forces).unwrap();
    let out = Command::new(env!("CARGO_BIN_EXE_jointbook"))
        .current_dir(&dir)
        .args([
            "check",
            "model.toml",
            "--format",
            "json",
            "--output",
            "out.json",
        ])
        .env("NO_COLOR", "1")
        .output()
        .unwrap();
    (out, dir)
}

/// Replace `from` (which must occur in the base) by `to`.
fn edit(from: &str, to: &str) -> String {
    assert!(base().contains(from), "the base model has no '{from}'");
    base().replacen(from, to, 1)
}

/// The run failed as bad input: exit 2, nothing written, and one line of stderr names
/// `location` (file:line:col) and `key`.
fn assert_located(name: &str, model: &[u8], forces: &str, location: &str, key: &str) {
    let (out, dir) = run(name, model, forces);
    let stderr = String::from_utf8_lossy(&out.stderr);
    assert_eq!(
        out.status.code(),
        Some(2),
        "{name}: exit code; stderr:\n{stderr}"
    );
    assert!(
        !dir.join("out.json").exists(),
        "{name}: an output file was written"
    );
    assert!(out.stdout.is_empty(), "{name}: something went to stdout");
    let line = stderr
        .lines()
        .find(|l| l.contains(location))
        .unwrap_or_else(|| panic!("{name}: no message at {location}; stderr:\n{stderr}"));
    assert!(
        line.contains(key),
        "{name}: the message at {location} does not name '{key}': {line}"
    );
    assert!(
        stderr.contains("nothing was written"),
        "{name}: no closing line; stderr:\n{stderr}"
    );
}

#[test]
fn the_base_model_is_valid() {
    let (out, dir) = run("valid", base().as_bytes(), FORCES);
    assert_eq!(
        out.status.code(),
        Some(0),
        "{}",
        String::from_utf8_lossy(&out.stderr)
    );
    assert!(dir.join("out.json").exists());
}

#[test]
fn an_empty_file() {
    assert_located("empty", b"", FORCES, "model.toml:1:1", "project");
}

#[test]
fn a_file_that_is_not_utf8() {
    let mut bytes = b"[project]\ntitle = \"".to_vec();
    bytes.extend([0xff, 0xfe]);
    assert_located("non-utf8", &bytes, FORCES, "model.toml:2:10", "model");
}

#[test]
fn a_toml_syntax_error() {
    let m = edit("revision = \"A\"", "revision = \"A");
    assert_located("syntax", m.as_bytes(), FORCES, "model.toml:3:14", "syntax");
}

#[test]
fn a_duplicate_key() {
    let m = edit("revision = \"A\"", "revision = \"A\"\nrevision = \"B\"");
    assert_located(
        "dup-key",
        m.as_bytes(),
        FORCES,
        "model.toml:4:1",
        "revision",
    );
}

#[test]
fn a_duplicate_member_id() {
    let m = format!("{}\n[members.M1]\nfrom = \"N1\"\n", base());
    assert_located("dup-member", m.as_bytes(), FORCES, "model.toml:30:1", "M1");
}

#[test]
fn an_unknown_key_with_the_nearest_known_one() {
    let m = edit("revision = \"A\"", "revision = \"A\"\nrevison_note = \"x\"");
    assert_located(
        "unknown-key",
        m.as_bytes(),
        FORCES,
        "model.toml:4:16",
        "project.revison_note",
    );
    let (out, _) = run("unknown-key-hint", m.as_bytes(), FORCES);
    assert!(String::from_utf8_lossy(&out.stderr).contains("did you mean 'revision'"));
}

#[test]
fn a_bare_number_where_a_length_is_needed() {
    let m = edit(
        "thickness = \"1/4 in\", width = \"1-1/2 in\"",
        "thickness = 0.25, width = \"1-1/2 in\"",
    );
    assert_located(
        "bare",
        m.as_bytes(),
        FORCES,
        "model.toml:26:21",
        "details.TAB.tab.thickness",
    );
}

#[test]
fn an_unknown_unit() {
    let m = edit(
        "thickness = \"1/4 in\", width = \"1-1/2 in\"",
        "thickness = \"1/4 furlong\", width = \"1-1/2 in\"",
    );
    assert_located(
        "unit",
        m.as_bytes(),
        FORCES,
        "model.toml:26:21",
        "details.TAB.tab.thickness",
    );
}

#[test]
fn an_unknown_section_with_the_nearest_entries() {
    let m = edit("HSS1-1/2x1-1/2x3/16", "HSS1-1/2x1-1/2x3/17");
    assert_located(
        "section",
        m.as_bytes(),
        FORCES,
        "model.toml:18:11",
        "members.M1.section",
    );
    let (out, _) = run("section-hint", m.as_bytes(), FORCES);
    assert!(String::from_utf8_lossy(&out.stderr).contains("'HSS1-1/2x1-1/2x3/16'"));
}

#[test]
fn an_unknown_bolt_grade() {
    let m = edit("ASTM F3125 Gr A325", "ASTM F3125 Gr A352");
    assert_located(
        "grade",
        m.as_bytes(),
        FORCES,
        "model.toml:25:19",
        "details.TAB.bolts.grade",
    );
}

#[test]
fn a_dangling_node() {
    let m = edit("to = \"N2\"", "to = \"N3\"");
    assert_located(
        "node",
        m.as_bytes(),
        FORCES,
        "model.toml:17:6",
        "members.M1.to",
    );
}

#[test]
fn a_dangling_detail() {
    let m = edit("start = \"TAB\"", "start = \"TABB\"");
    assert_located(
        "detail",
        m.as_bytes(),
        FORCES,
        "model.toml:15:1",
        "members.M1.start",
    );
}

#[test]
fn a_member_without_a_force() {
    let m = format!(
        "{}\n[members.M2]\nfrom = \"N1\"\nto = \"N2\"\nsection = \"HSS1-1/2x1-1/2x3/16\"\n\
         material = \"ASTM A500 Gr C (shaped)\"\nstart = \"none\"\nend = \"none\"\n",
        base()
    );
    assert_located(
        "no-force",
        m.as_bytes(),
        FORCES,
        "model.toml:30:1",
        "members.M2",
    );
}

#[test]
fn a_force_row_for_an_unknown_member() {
    let f = format!("{FORCES}M9,C,1.0\n");
    assert_located(
        "csv-member",
        base().as_bytes(),
        &f,
        "forces.csv:4:1",
        "member",
    );
}

#[test]
fn a_duplicate_force_row() {
    let f = format!("{FORCES}M1,A,3.0\n");
    assert_located("dup-force", base().as_bytes(), &f, "forces.csv:4:1", "case");
}

#[test]
fn a_zero_thickness() {
    let m = edit(
        "thickness = \"1/4 in\", width = \"1-1/2 in\"",
        "thickness = \"0 in\", width = \"1-1/2 in\"",
    );
    assert_located(
        "zero",
        m.as_bytes(),
        FORCES,
        "model.toml:26:21",
        "details.TAB.tab.thickness",
    );
}

#[test]
fn a_negative_width() {
    let m = edit("width = \"4 in\"", "width = \"-4 in\"");
    assert_located(
        "negative",
        m.as_bytes(),
        FORCES,
        "model.toml:27:40",
        "details.TAB.mate.width",
    );
}

#[test]
fn a_nan_number() {
    let m = edit("demand_factor = 1.0", "demand_factor = nan");
    assert_located(
        "nan",
        m.as_bytes(),
        FORCES,
        "model.toml:6:17",
        "project.demand_factor",
    );
}

#[test]
fn an_infinite_length() {
    let m = edit(
        "thickness = \"1/4 in\", width = \"1-1/2 in\"",
        "thickness = \"inf in\", width = \"1-1/2 in\"",
    );
    assert_located(
        "inf",
        m.as_bytes(),
        FORCES,
        "model.toml:26:21",
        "details.TAB.tab.thickness",
    );
}

#[test]
fn a_missing_forces_file() {
    let m = edit("forces = \"forces.csv\"", "forces = \"forcez.csv\"");
    assert_located(
        "missing-csv",
        m.as_bytes(),
        FORCES,
        "model.toml:9:10",
        "project.forces",
    );
}

#[test]
fn a_malformed_forces_row_at_its_own_line() {
    let f = format!("{FORCES}M1,C,lots\n");
    assert_located("bad-csv", base().as_bytes(), &f, "forces.csv:4:4", "axial");
}

#[test]
fn a_force_without_a_unit() {
    let f = "member,case,axial\nM1,A,2.5\n";
    assert_located("csv-unit", base().as_bytes(), f, "forces.csv:", "axial");
}

#[test]
fn a_missing_required_key() {
    let m = edit("revision = \"A\"\n", "");
    assert_located(
        "missing",
        m.as_bytes(),
        FORCES,
        "model.toml:1:1",
        "project.revision",
    );
}

#[test]
fn a_wrong_type() {
    let m = edit("across = 1", "across = \"one\"");
    assert_located(
        "type",
        m.as_bytes(),
        FORCES,
        "model.toml:25:228",
        "details.TAB.bolts.across",
    );
}

#[test]
fn a_misspelt_choice() {
    let m = edit("method = \"LRFD\"", "method = \"LFRD\"");
    assert_located(
        "choice",
        m.as_bytes(),
        FORCES,
        "model.toml:5:10",
        "project.method",
    );
}

#[test]
fn a_node_with_two_coordinates() {
    let m = edit(
        "N2 = [\"4 ft\", \"0 ft\", \"0 ft\"]",
        "N2 = [\"4 ft\", \"0 ft\"]",
    );
    assert_located(
        "coords",
        m.as_bytes(),
        FORCES,
        "model.toml:13:6",
        "nodes.N2",
    );
}

#[test]
fn every_error_of_a_run_is_reported_and_none_twice() {
    // Three independent mistakes: all three are reported, and the broken detail is not
    // reported a second time as a missing one.
    let m = edit("method = \"LRFD\"", "method = \"LFRD\"")
        .replacen("to = \"N2\"", "to = \"N3\"", 1)
        .replacen("width = \"4 in\"", "width = \"-4 in\"", 1);
    let (out, _) = run("several", m.as_bytes(), FORCES);
    let stderr = String::from_utf8_lossy(&out.stderr);
    assert_eq!(out.status.code(), Some(2));
    for at in ["model.toml:5:10", "model.toml:17:6", "model.toml:27:40"] {
        assert!(stderr.contains(at), "no message at {at}:\n{stderr}");
    }
    assert!(stderr.contains("3 problems found"), "{stderr}");
    assert!(!stderr.contains("no detail 'TAB'"), "{stderr}");
}

#[test]
fn an_existing_output_file_is_left_alone() {
    let dir = scratch("keep");
    std::fs::write(dir.join("model.toml"), base()).unwrap();
    std::fs::write(dir.join("forces.csv"), FORCES).unwrap();
    std::fs::write(dir.join("out.json"), "the user's own file").unwrap();
    let out = Command::new(env!("CARGO_BIN_EXE_jointbook"))
        .current_dir(&dir)
        .args(["check", "model.toml", "--output", "out.json"])
        .output()
        .unwrap();
    assert_eq!(out.status.code(), Some(2));
    assert!(String::from_utf8_lossy(&out.stderr).contains("--overwrite"));
    assert_eq!(
        std::fs::read_to_string(dir.join("out.json")).unwrap(),
        "the user's own file"
    );
}

#[test]
fn a_misspelt_directional_increase_choice() {
    let m = edit(
        "hole_deformation = \"considered\"",
        "hole_deformation = \"considered\"\nweld_directional_increase = \"yes\"",
    );
    assert_located(
        "directional-increase",
        m.as_bytes(),
        FORCES,
        "model.toml:9:29",
        "project.weld_directional_increase",
    );
}

#[test]
fn a_mate_free_length_without_its_k() {
    let m = edit(
        "back_distance = \"3 in\", count = 1 }",
        "back_distance = \"3 in\", count = 1, free_length = \"1-1/2 in\" }",
    );
    assert_located(
        "mate-no-k",
        m.as_bytes(),
        FORCES,
        "model.toml:27:",
        "details.TAB.mate.k",
    );
}

#[test]
fn a_mate_k_without_its_free_length() {
    let m = edit(
        "back_distance = \"3 in\", count = 1 }",
        "back_distance = \"3 in\", count = 1, k = 1.2 }",
    );
    assert_located(
        "mate-no-length",
        m.as_bytes(),
        FORCES,
        "model.toml:27:",
        "details.TAB.mate.free_length",
    );
}

#[test]
fn a_mate_free_length_without_a_unit() {
    let m = edit(
        "back_distance = \"3 in\", count = 1 }",
        "back_distance = \"3 in\", count = 1, free_length = 1.5, k = 1.2 }",
    );
    assert_located(
        "mate-bare-length",
        m.as_bytes(),
        FORCES,
        "model.toml:27:147",
        "details.TAB.mate.free_length",
    );
}

/// The base with a chord C1 through N1 (along y, square to M1) carrying the tab's mate, welded
/// by the `on_chord` line `oc`.
fn on_chord(oc: &str) -> String {
    edit(
        "N2 = [\"4 ft\", \"0 ft\", \"0 ft\"]\n",
        "N2 = [\"4 ft\", \"0 ft\", \"0 ft\"]\nC0 = [\"0 ft\", \"-2 ft\", \"0 ft\"]\nC2 = [\"0 ft\", \"2 ft\", \"0 ft\"]\n",
    )
    .replacen(
        "\n[details.TAB]",
        "\n[members.C1]\nfrom = \"C0\"\nto = \"C2\"\nsection = \"HSS2x2x3/16\"\nmaterial = \"ASTM A500 Gr C (shaped)\"\nstart = \"none\"\nend = \"none\"\n\n[details.TAB]",
        1,
    ) + oc
}

const CHORD_FORCES: &str = "member,case,axial [kip]\nM1,A,2.5\nM1,B,-1.0\nC1,A,-2.0\nC1,B,1.0\n";

/// "model.toml:LINE:COL" of the first occurrence of `needle` in `text`.
fn location_of(text: &str, needle: &str) -> String {
    let at = text.find(needle).expect(needle);
    let line = text[..at].matches('\n').count() + 1;
    let col = at - text[..at].rfind('\n').map_or(0, |i| i + 1) + 1;
    format!("model.toml:{line}:{col}")
}

#[test]
fn a_mate_on_a_chord_checks_the_chord_wall() {
    let m = on_chord("on_chord = { chord = \"C1\", plate = \"longitudinal\", lb = \"3 in\", weld = { size = \"3/16 in\", electrode = \"E70\", sides = 2 } }\n");
    let (out, dir) = run("chord-ok", m.as_bytes(), CHORD_FORCES);
    assert_eq!(
        out.status.code(),
        Some(0),
        "{}",
        String::from_utf8_lossy(&out.stderr)
    );
    let json: serde_json::Value =
        serde_json::from_str(&std::fs::read_to_string(dir.join("out.json")).unwrap()).unwrap();
    let text = json.to_string();
    for ls in [
        "chord_plastification",
        "chord_punching",
        "mate-to-chord weld",
        "chord wall C1",
        "K2-12",
    ] {
        assert!(text.contains(ls), "no {ls} in the JSON");
    }
}

#[test]
fn a_mate_on_a_chord_without_its_weld() {
    let oc = "on_chord = { chord = \"C1\", plate = \"longitudinal\" }\n";
    let m = on_chord(oc);
    let at = location_of(&m, "{ chord = \"C1\"");
    assert_located(
        "chord-noweld",
        m.as_bytes(),
        CHORD_FORCES,
        &at,
        "details.TAB.on_chord.weld",
    );
}

#[test]
fn a_mate_on_an_unknown_chord() {
    let m = on_chord("on_chord = { chord = \"C9\", plate = \"longitudinal\", weld = { size = \"3/16 in\", electrode = \"E70\", sides = 2 } }\n");
    let at = location_of(&m, "\"C9\"");
    assert_located(
        "chord-unknown",
        m.as_bytes(),
        CHORD_FORCES,
        &at,
        "details.TAB.on_chord.chord",
    );
    let (out, _) = run("chord-unknown-hint", m.as_bytes(), CHORD_FORCES);
    assert!(String::from_utf8_lossy(&out.stderr).contains("did you mean 'C1'?"));
}

#[test]
fn a_mate_on_a_chord_that_misses_the_node() {
    // The chord moved 1 ft along x: it no longer passes through N1.
    let m = on_chord("on_chord = { chord = \"C1\", plate = \"longitudinal\", weld = { size = \"3/16 in\", electrode = \"E70\", sides = 2 } }\n")
        .replacen("C0 = [\"0 ft\"", "C0 = [\"1 ft\"", 1)
        .replacen("C2 = [\"0 ft\"", "C2 = [\"1 ft\"", 1);
    let at = location_of(&m, "[members.M1]");
    assert_located(
        "chord-offnode",
        m.as_bytes(),
        CHORD_FORCES,
        &at,
        "members.M1.start",
    );
}

#[test]
fn a_transverse_mate_on_a_member_not_square_to_the_chord() {
    let m = on_chord("on_chord = { chord = \"C1\", plate = \"transverse\", weld = { size = \"3/16 in\", electrode = \"E70\", sides = 2 } }\n")
        .replacen("N2 = [\"4 ft\", \"0 ft\"", "N2 = [\"4 ft\", \"3 ft\"", 1);
    let at = location_of(&m, "[members.M1]");
    assert_located(
        "chord-skew",
        m.as_bytes(),
        CHORD_FORCES,
        &at,
        "members.M1.start",
    );
    let (out, _) = run("chord-skew-msg", m.as_bytes(), CHORD_FORCES);
    assert!(String::from_utf8_lossy(&out.stderr).contains("meets chord 'C1' at 53.1 deg"));
}

#[test]
fn a_mate_welded_on_three_sides() {
    let m = on_chord("on_chord = { chord = \"C1\", plate = \"longitudinal\", weld = { size = \"3/16 in\", electrode = \"E70\", sides = 3 } }\n");
    let at = location_of(&m, "3 }");
    assert_located(
        "chord-sides",
        m.as_bytes(),
        CHORD_FORCES,
        &at,
        "details.TAB.on_chord.weld.sides",
    );
}

#[test]
fn plates_opposite_and_beside_on_one_chord_node() {
    // M2 leaves N1 the other way (−x): its plate is on the opposite face, a cross-connection.
    // M3 leaves N1 at 45 deg on M1's side: its plate shares M1's face, flagged (warn).
    let oc = "on_chord = { chord = \"C1\", plate = \"longitudinal\", lb = \"3 in\", weld = { size = \"3/16 in\", electrode = \"E70\", sides = 2 } }\n";
    let m = on_chord(oc)
        .replacen(
            "C0 = [",
            "N4 = [\"-4 ft\", \"0 ft\", \"0 ft\"]\nN5 = [\"3 ft\", \"3 ft\", \"0 ft\"]\nC0 = [",
            1,
        )
        .replacen(
            "\n[details.TAB]",
            "\n[members.M2]\nfrom = \"N1\"\nto = \"N4\"\nsection = \"HSS1-1/2x1-1/2x3/16\"\nmaterial = \"ASTM A500 Gr C (shaped)\"\nstart = \"TAB\"\nend = \"none\"\n\n[members.M3]\nfrom = \"N1\"\nto = \"N5\"\nsection = \"HSS1-1/2x1-1/2x3/16\"\nmaterial = \"ASTM A500 Gr C (shaped)\"\nstart = \"TAB\"\nend = \"none\"\n\n[details.TAB]",
            1,
        );
    let forces = format!("{CHORD_FORCES}M2,A,1.0\nM3,A,1.0\n");
    let (out, dir) = run("chord-cross", m.as_bytes(), &forces);
    assert_eq!(
        out.status.code(),
        Some(0),
        "{}",
        String::from_utf8_lossy(&out.stderr)
    );
    let json: serde_json::Value =
        serde_json::from_str(&std::fs::read_to_string(dir.join("out.json")).unwrap()).unwrap();
    let conns = json["connections"].as_array().unwrap();
    let notes_of = |id: &str| {
        let c = conns.iter().find(|c| c["id"] == id).unwrap();
        let k = c["checks"]
            .as_array()
            .unwrap()
            .iter()
            .find(|k| k["limit_state"] == "chord_plastification")
            .unwrap()
            .clone();
        (
            k["status"].as_str().unwrap().to_string(),
            k["note"].to_string(),
        )
    };
    // M2 alone on its face: a cross-connection, nothing beside it.
    let (status, notes) = notes_of("M2/start");
    assert!(notes.contains("cross-connection"), "{notes}");
    assert!(!notes.contains("other plates"), "{notes}");
    // every chord-wall check warns: the chord's bending is not in the model, so Qf is not
    // confirmed (K1)
    assert!(
        notes.contains("bending moment is not in the model"),
        "{notes}"
    );
    assert_eq!(status, "warn");
    // M1 and M3 share a face: each is flagged with the other.
    let (status, notes) = notes_of("M3/start");
    assert!(
        notes.contains("other plates on chord 'C1' at node 'N1' (M1/start)"),
        "{notes}"
    );
    assert_eq!(status, "warn");
    let (status, notes) = notes_of("M1/start");
    assert!(notes.contains("(M3/start)"), "{notes}");
    assert_eq!(status, "warn");
}

#[test]
fn a_rectangular_chord_needs_its_roll_to_know_the_face() {
    // C1 is an HSS4x2 (h = 4 in., b = 2 in.) along y; M1 leaves N1 along +x.
    let oc = "on_chord = { chord = \"C1\", plate = \"longitudinal\", lb = \"3 in\", weld = { size = \"3/16 in\", electrode = \"E70\", sides = 2 } }\n";
    let base = on_chord(oc).replacen("section = \"HSS2x2x3/16\"", "section = \"HSS4x2x3/16\"", 1);
    let at = location_of(&base, "[members.M1]");
    assert_located(
        "chord-noroll",
        base.as_bytes(),
        CHORD_FORCES,
        &at,
        "members.M1.start",
    );
    let face = |roll: &str| {
        let m = base.replacen(
            "\n[details.TAB]",
            &format!("roll = \"{roll}\"\n\n[details.TAB]"),
            1,
        );
        let (out, dir) = run("chord-roll", m.as_bytes(), CHORD_FORCES);
        let stderr = String::from_utf8_lossy(&out.stderr).to_string();
        let json = std::fs::read_to_string(dir.join("out.json")).unwrap_or_default();
        (out.status.code(), json, stderr)
    };
    // Roll 0: the depth direction is global +z (the audit's reference), so +x is across the
    // width: the plate is on a 4 in. face (B = h).
    let (code, json, stderr) = face("0 deg");
    assert_eq!(code, Some(0), "{stderr}");
    assert!(
        json.contains("the plate is on the 4.000 in. face"),
        "{json}"
    );
    // Roll 90 deg about +y turns the depth direction to +x: the plate is on a 2 in. face.
    let (code, json, stderr) = face("90 deg");
    assert_eq!(code, Some(0), "{stderr}");
    assert!(
        json.contains("the plate is on the 2.000 in. face"),
        "{json}"
    );
    // Roll 45 deg: the member looks at a corner.
    let (code, _, stderr) = face("45 deg");
    assert_eq!(code, Some(2));
    assert!(stderr.contains("towards a corner"), "{stderr}");
}

#[test]
fn the_chord_wall_is_checked_in_every_load_case() {
    // Case C has less member force than case A (2.4 against 2.5 kip) but the chord is heavily
    // compressed in it (U = 50 / (50 × 1.19) ≈ 0.84, Qf = √(1 − U²) ≈ 0.54, K2-12): it governs
    // the wall, so the wall cannot be checked only at the largest member force.
    let oc = "on_chord = { chord = \"C1\", plate = \"longitudinal\", lb = \"3 in\", weld = { size = \"3/16 in\", electrode = \"E70\", sides = 2 } }\n";
    let forces = "member,case,axial [kip]\nM1,A,2.5\nM1,C,2.4\nC1,A,1.0\nC1,C,-50.0\n";
    let (out, dir) = run("chord-cases", on_chord(oc).as_bytes(), forces);
    assert_eq!(
        out.status.code(),
        Some(0),
        "{}",
        String::from_utf8_lossy(&out.stderr)
    );
    let json: serde_json::Value =
        serde_json::from_str(&std::fs::read_to_string(dir.join("out.json")).unwrap()).unwrap();
    let checks = json["connections"][0]["checks"].as_array().unwrap();
    let walls: Vec<(&str, f64)> = checks
        .iter()
        .filter(|k| k["limit_state"] == "chord_plastification")
        .map(|k| {
            (
                k["load_case"].as_str().unwrap(),
                k["ratio"].as_f64().unwrap(),
            )
        })
        .collect();
    assert_eq!(walls.len(), 2, "{walls:?}");
    let worst = walls.iter().max_by(|a, b| a.1.total_cmp(&b.1)).unwrap();
    assert_eq!(worst.0, "C", "{walls:?}");
}

#[test]
fn a_list_of_chords_picks_the_one_through_the_node() {
    // C3 runs parallel to C1, 4 ft away through N2: M1's start (N1) is on
    // C1 only, so the mate goes on C1.
    let oc = "on_chord = { chords = [\"C3\", \"C1\"], plate = \"longitudinal\", lb = \"3 in\", weld = { size = \"3/16 in\", electrode = \"E70\", sides = 2 } }\n";
    let m = on_chord(oc)
        .replacen(
            "C0 = [",
            "C4 = [\"4 ft\", \"-2 ft\", \"0 ft\"]\nC5 = [\"4 ft\", \"2 ft\", \"0 ft\"]\nC0 = [",
            1,
        )
        .replacen(
            "\n[details.TAB]",
            "\n[members.C3]\nfrom = \"C4\"\nto = \"C5\"\nsection = \"HSS2x2x3/16\"\nmaterial = \"ASTM A500 Gr C (shaped)\"\nstart = \"none\"\nend = \"none\"\n\n[details.TAB]",
            1,
        );
    let forces = format!("{CHORD_FORCES}C3,A,0.0\n");
    let (out, dir) = run("chords-list", m.as_bytes(), &forces);
    assert_eq!(
        out.status.code(),
        Some(0),
        "{}",
        String::from_utf8_lossy(&out.stderr)
    );
    let text = std::fs::read_to_string(dir.join("out.json")).unwrap();
    assert!(text.contains("chord wall C1"), "{text}");
    assert!(!text.contains("chord wall C3"), "{text}");
    // C3 moved onto C1's line, sharing N1 (a chord spliced at N1): the mate's chord is not known.
    let spliced = m
        .replacen("C4 = [\"4 ft\", \"-2 ft\"", "C4 = [\"0 ft\", \"0 ft\"", 1)
        .replacen("C5 = [\"4 ft\", \"2 ft\"", "C5 = [\"0 ft\", \"3 ft\"", 1);
    let at = location_of(&spliced, "[members.M1]");
    assert_located(
        "chords-two",
        spliced.as_bytes(),
        &forces,
        &at,
        "members.M1.start",
    );
    let (out, _) = run("chords-two-msg", spliced.as_bytes(), &forces);
    assert!(String::from_utf8_lossy(&out.stderr).contains("more than one of the chords (C3, C1)"));
}

#[test]
fn chord_and_chords_together() {
    let m = on_chord("on_chord = { chord = \"C1\", chords = [\"C1\"], plate = \"longitudinal\", weld = { size = \"3/16 in\", electrode = \"E70\", sides = 2 } }\n");
    let at = location_of(&m, "[\"C1\"]");
    assert_located(
        "chords-both",
        m.as_bytes(),
        CHORD_FORCES,
        &at,
        "details.TAB.on_chord.chords",
    );
}
