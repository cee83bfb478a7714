//! The `check` and `catalogue` commands run as a user runs them, through the real binary, on
//! the bundled demo (examples/quillon-brook-footbridge).

use std::io::Read;
use std::process::{Command, Output, Stdio};

const DEMO: &str = "examples/quillon-brook-footbridge/model.toml";

fn jointbook(args: &[&str]) -> Output {
    Command::new(env!("CARGO_BIN_EXE_jointbook"))
        .current_dir(env!("CARGO_MANIFEST_DIR"))
        .args(args)
        .env("NO_COLOR", "1")
        .output()
        .unwrap()
}

fn stdout(o: &Output) -> String {
    String::from_utf8(o.stdout.clone()).unwrap()
}

fn demo_json() -> serde_json::Value {
    let o = jointbook(&["check", DEMO, "--format", "json"]);
    assert_eq!(o.status.code(), Some(0));
    serde_json::from_slice(&o.stdout).unwrap()
}

#[test]
fn the_demo_checks_with_a_table_and_the_caution() {
    let o = jointbook(&["check", DEMO]);
    assert_eq!(
        o.status.code(),
        Some(0),
        "{}",
        String::from_utf8_lossy(&o.stderr)
    );
    let out = stdout(&o);
    assert!(out.contains("governing check"));
    assert!(out.contains("V0/start"));
    assert!(out.contains("licensed engineer"));
    assert!(out.contains("engineer of record"));
    assert!(
        !out.contains('\u{1b}'),
        "NO_COLOR is set but the output has escapes"
    );
}

#[test]
fn the_json_has_the_documented_keys() {
    let v = demo_json();
    for k in [
        "standard",
        "method",
        "units",
        "connections",
        "status",
        "model",
        "caution",
        "project_checks",
    ] {
        assert!(v.get(k).is_some(), "top-level key {k} missing");
    }
    // the demo's one diameter, 1/2 in., carries two grades on purpose (A325 and the SAE Gr 5
    // of the post feet and the centre post): the project check warns and names both
    let p = v["project_checks"].as_array().unwrap();
    assert_eq!(p.len(), 1);
    assert_eq!(p[0]["limit_state"], "bolt_grades_per_diameter");
    assert_eq!(p[0]["status"], "warn");
    let note = p[0]["note"].as_str().unwrap();
    assert!(
        note.contains("ASTM F3125 Gr A325") && note.contains("SAE J429 Gr 5"),
        "{note}"
    );
    assert_eq!(v["standard"], "AISC 360-22");
    assert_eq!(v["method"], "LRFD");
    for k in ["force", "length", "stress"] {
        assert!(v["units"][k].is_string(), "units.{k}");
    }
    let conns = v["connections"].as_array().unwrap();
    assert_eq!(conns.len(), 22, "the demo has 22 member ends with a detail");
    for c in conns {
        for k in ["id", "member", "end", "detail", "kind", "checks", "status"] {
            assert!(c.get(k).is_some(), "connection key {k} missing");
        }
        for ch in c["checks"].as_array().unwrap() {
            for k in [
                "limit_state",
                "standard",
                "clause",
                "equation",
                "inputs",
                "nominal",
                "factor",
                "available",
                "demand",
                "ratio",
                "status",
                "note",
            ] {
                assert!(ch.get(k).is_some(), "check key {k} missing in {ch}");
            }
            let st = ch["status"].as_str().unwrap();
            assert!(["pass", "warn", "fail"].contains(&st));
            let id = ch["limit_state"].as_str().unwrap();
            assert!(
                id.chars().all(|c| c.is_ascii_lowercase() || c == '_'),
                "limit_state {id} is not snake_case"
            );
        }
    }
}

/// AISC Manual, 15th ed., Table 7-1 (available shear strength of bolts): Group A (A325),
/// threads included (N), 1/2 in. bolt, single shear, LRFD φrn = 7.95 kips per bolt
/// (from memory). The demo's web tab (D2) has two such bolts in single shear.
#[test]
fn web_tab_bolt_shear_matches_manual_table_7_1() {
    let v = demo_json();
    let c = v["connections"]
        .as_array()
        .unwrap()
        .iter()
        .find(|c| c["id"] == "D2/start")
        .unwrap();
    let shear = c["checks"]
        .as_array()
        .unwrap()
        .iter()
        .find(|k| k["limit_state"] == "bolt_shear")
        .unwrap();
    assert_eq!(shear["clause"], "J3.7");
    assert_eq!(shear["available"]["unit"], "kip");
    let per_bolt = shear["available"]["value"].as_f64().unwrap() / 2.0;
    assert!((per_bolt - 7.95).abs() < 0.01, "φrn per bolt {per_bolt}");
}

#[test]
fn si_output_changes_the_units_not_the_ratios() {
    let us = demo_json();
    let o = jointbook(&["check", DEMO, "--format", "json", "--units", "si"]);
    let si: serde_json::Value = serde_json::from_slice(&o.stdout).unwrap();
    assert_eq!(si["units"]["force"], "kN");
    assert_eq!(si["units"]["length"], "mm");
    let ratio = |v: &serde_json::Value| v["connections"][0]["governing"]["ratio"].as_f64();
    assert_eq!(ratio(&us), ratio(&si));
}

#[test]
fn explain_shows_every_input_of_a_connection() {
    let o = jointbook(&["check", DEMO, "--explain", "D1/start"]);
    assert_eq!(o.status.code(), Some(0));
    let out = stdout(&o);
    for s in [
        "bolt_shear",
        "Eq. J3-1",
        "Fnv",
        "φ = 0.75",
        "block_shear",
        "weld_strength",
    ] {
        assert!(out.contains(s), "explain lacks {s}");
    }
    let o = jointbook(&["check", DEMO, "--explain", "D1/middle"]);
    assert_eq!(o.status.code(), Some(2));
}

#[test]
fn a_closed_pipe_is_a_normal_end() {
    let mut child = Command::new(env!("CARGO_BIN_EXE_jointbook"))
        .current_dir(env!("CARGO_MANIFEST_DIR"))
        .args(["check", DEMO, "--format", "json"])
        .stdout(Stdio::piped())
        .stderr(Stdio::piped())
        .spawn()
        .unwrap();
    let mut first = [0u8; 16];
    child.stdout.take().unwrap().read_exact(&mut first).unwrap();
    // stdout is dropped here: the reader has gone, as with `| head -c 16`. The demo's JSON
    // (over 1 MB) is far larger than a pipe's buffer, so the writer meets the closed pipe.
    let status = child.wait().unwrap();
    let mut err = String::new();
    child
        .stderr
        .take()
        .unwrap()
        .read_to_string(&mut err)
        .unwrap();
    assert!(!err.contains("panicked"), "{err}");
    assert_eq!(status.code(), Some(0), "a closed pipe is not an error");
}

#[test]
fn output_file_is_written_and_never_overwritten_unasked() {
    let dir = std::path::Path::new(env!("CARGO_TARGET_TMPDIR")).join("cli-check-output");
    let _ = std::fs::remove_dir_all(&dir);
    std::fs::create_dir_all(&dir).unwrap();
    let file = dir.join("results.json");
    let f = file.to_str().unwrap();
    let o = jointbook(&["check", DEMO, "--format", "json", "--output", f]);
    assert_eq!(o.status.code(), Some(0));
    let first = std::fs::read_to_string(&file).unwrap();
    assert!(first.starts_with('{'));
    let o = jointbook(&["check", DEMO, "--output", f]);
    assert_eq!(o.status.code(), Some(2));
    assert_eq!(std::fs::read_to_string(&file).unwrap(), first);
    let o = jointbook(&["check", DEMO, "--output", f, "--overwrite"]);
    assert_eq!(o.status.code(), Some(0));
    assert!(std::fs::read_to_string(&file)
        .unwrap()
        .contains("governing check"));
}

#[test]
fn help_gives_an_example_for_each_command() {
    for cmd in ["check", "catalogue"] {
        let o = jointbook(&[cmd, "--help"]);
        assert!(stdout(&o).contains(&format!("jointbook {cmd} ")), "{cmd}");
    }
}

#[test]
fn catalogue_lists_searches_and_shows_with_sources() {
    let o = jointbook(&["catalogue", "list"]);
    assert_eq!(o.status.code(), Some(0));
    assert!(stdout(&o).contains("sections"));
    let o = jointbook(&["catalogue", "search", "A325"]);
    assert!(stdout(&o).contains("ASTM F3125 Gr A325"));
    let o = jointbook(&["catalogue", "show", "HSS2x2x3/16"]);
    let out = stdout(&o);
    assert!(out.contains("source:"));
    assert!(out.contains("square"));
    let o = jointbook(&["catalogue", "show", "HSS2x2x3/17"]);
    assert_eq!(o.status.code(), Some(2));
    assert!(String::from_utf8_lossy(&o.stderr).contains("HSS2x2x3/16"));
}

/// The Larkspur example states "threads excluded" at the post tabs but the bolt the stack-up
/// picks has its threads in the shear plane: bolt shear is taken with the threads included and
/// says how much the stated condition would have given. For a grade outside Table J3.2 the
/// threaded-part values are 0.563 Fu (excluded) and 0.450 Fu (not excluded): AISC 360-22
/// Table J3.2, footnote on threaded parts; 0.563 / 0.450 = 1.251.
#[test]
fn threads_in_the_plane_change_bolt_shear_and_say_by_how_much() {
    let o = jointbook(&[
        "check",
        "examples/larkspur-stage-frame/model.toml",
        "--explain",
        "P0/start",
    ]);
    assert_eq!(o.status.code(), Some(1), "Larkspur fails on purpose");
    let text = stdout(&o);
    assert!(
        text.contains("plane 1 (tab | mate): threads not excluded (N)"),
        "{text}"
    );
    assert!(
        text.contains("Fnv          = 54.00 ksi"),
        "0.450 × 120 ksi: {text}"
    );
    assert!(text.contains("Rn would be 1.251 times"), "{text}");
    assert!(text.contains("thread_condition — plane 1"), "{text}");
}

const LARKSPUR: &str = "examples/larkspur-stage-frame/model.toml";

/// Larkspur's top rail: hot-dip galvanized Grade A325 bolts with the plain heavy hex nut (not
/// tapped oversize: ASTM A563-15 overtapping requirement, from memory) fail; its 1/2 in. A325
/// bolts beside the posts' 1/2 in. SAE Grade 5 bolts warn at project level (common practice).
#[test]
fn larkspur_fails_the_galvanized_rail_nuts_and_warns_two_grades_at_one_diameter() {
    let o = jointbook(&["check", LARKSPUR, "--format", "json"]);
    assert_eq!(o.status.code(), Some(1));
    let v: serde_json::Value = serde_json::from_slice(&o.stdout).unwrap();
    let top = v["connections"]
        .as_array()
        .unwrap()
        .iter()
        .find(|c| c["id"] == "TOP/start")
        .unwrap();
    let rows: Vec<(&str, &str, &str)> = top["checks"]
        .as_array()
        .unwrap()
        .iter()
        .filter(|k| k["limit_state"] == "fastener_combination")
        .map(|k| {
            (
                k["subject"].as_str().unwrap(),
                k["status"].as_str().unwrap(),
                k["standard"].as_str().unwrap(),
            )
        })
        .collect();
    assert_eq!(
        rows,
        [
            ("nut grade", "pass", "RCSC 2020"),
            ("nut finish", "fail", "ASTM A563-15")
        ]
    );
    let p = v["project_checks"].as_array().unwrap();
    let half = p
        .iter()
        .find(|k| k["subject"] == "bolts d = 1/2 in")
        .expect("a project check at 1/2 in.");
    assert_eq!(half["status"], "warn");
    let note = half["note"].as_str().unwrap();
    assert!(
        note.contains("ASTM F3125 Gr A325 (hot-dip galvanized) at TOP/start, TOP/end")
            && note.contains("SAE J429 Gr 5 at P0/start, P1/start"),
        "{note}"
    );
    let three_eighths = p
        .iter()
        .find(|k| k["subject"] == "bolts d = 3/8 in")
        .unwrap();
    assert_eq!(three_eighths["status"], "pass");

    let text = stdout(&jointbook(&["check", LARKSPUR]));
    assert!(
        text.contains("project: bolt_grades_per_diameter (bolts d = 1/2 in)  ratio 2.000  WARN"),
        "{text}"
    );
    let explain = stdout(&jointbook(&["check", LARKSPUR, "--explain", "project"]));
    assert!(
        explain.contains("project: 2 checks, status WARN"),
        "{explain}"
    );
    assert!(
        explain.contains("common practice one bolt grade per nominal diameter"),
        "{explain}"
    );
}

/// Every limit-state id the checks can emit for the tab, sleeve and tapped kinds and the stack-up
/// rows, collected from the string ids in src/checks/ (tab.rs, sleeve.rs, sleeve_fit.rs,
/// tapped.rs, fastener_rows.rs, fasteners.rs, fasteners_tapped.rs). Left out: `bolt_hole`,
/// `material_strength` and `sleeve_end_distance`, which only an impossible input produces (a hole
/// the table cannot size, a material without a strength at that thickness, bolts past the end of
/// the sleeve) and which always fail, so a passing demo cannot show them. From chord_face.rs, the
/// two a longitudinal gusset on a square chord gives (`chord_plastification`, `chord_punching`);
/// the transverse-plate and round-chord ones and the flare-bevel `weld_throat_min` are shown by
/// examples/nettlebank-notice-gantry and tests/cli_flare_bevel.rs, not by the demo.
const DEMO_LIMIT_STATES: [&str; 36] = [
    "block_shear",
    "bolt_bearing",
    "bolt_clear_spacing",
    "bolt_edge_distance",
    "bolt_edge_distance_max",
    "bolt_length",
    "bolt_shear",
    "bolt_spacing",
    "bolt_spacing_max",
    "bolt_spacing_preferred",
    "bolt_tearout",
    "bolt_tension",
    "chord_plastification",
    "chord_punching",
    "fastener_combination",
    "member_tension_rupture",
    "member_tension_yield",
    "nut_insert_pass_through",
    "plate_compression",
    "plate_tension_rupture",
    "plate_tension_yield",
    "sleeve_fit",
    "sleeve_insertion",
    "stickout_max",
    "thread_condition",
    "thread_engagement",
    "thread_engagement_count",
    "thread_past_nut",
    "thread_runout",
    "tube_net_rupture",
    "weld_base_metal_rupture",
    "weld_base_metal_yield",
    "weld_length_min",
    "weld_size_max",
    "weld_size_min",
    "weld_strength",
];

#[test]
fn the_demo_shows_every_limit_state_and_the_mate_in_compression() {
    let v = demo_json();
    let mut seen = std::collections::BTreeSet::new();
    let mut mate_compression = 0;
    for c in v["connections"].as_array().unwrap() {
        for k in c["checks"].as_array().unwrap() {
            let id = k["limit_state"].as_str().unwrap().to_string();
            if id == "plate_compression" && k["subject"] == "mate" {
                mate_compression += 1;
            }
            seen.insert(id);
        }
        // the demo gives every mate its free length and K: none is left unchecked
        for n in c["not_checked"].as_array().unwrap() {
            assert!(!n.as_str().unwrap().contains("of the mate"), "{n}");
        }
    }
    let missing: Vec<_> = DEMO_LIMIT_STATES
        .iter()
        .filter(|id| !seen.contains(**id))
        .collect();
    assert!(missing.is_empty(), "the demo does not show {missing:?}");
    let unlisted: Vec<_> = seen
        .iter()
        .filter(|id| !DEMO_LIMIT_STATES.contains(&id.as_str()))
        .collect();
    assert!(unlisted.is_empty(), "ids not in the list: {unlisted:?}");
    // every tab end whose member has a compression case checks its mate: V0/end, V1, V3,
    // V4/end and the four diagonals, 14 ends (V2 carries no force, V0/V4 start are tapped)
    assert_eq!(mate_compression, 14);
}

/// `--output` into a folder that does not exist, or naming a folder, is an input error with a
/// hint, and writes nothing.
#[test]
fn output_into_a_missing_folder_or_onto_a_folder_is_refused() {
    let base = std::env::temp_dir().join(format!("jointbook-outdir-{}", std::process::id()));
    let _ = std::fs::remove_dir_all(&base);
    std::fs::create_dir_all(&base).unwrap();
    let missing = base.join("no-such-folder").join("report.txt");
    let o = jointbook(&["check", DEMO, "--output", missing.to_str().unwrap()]);
    assert_eq!(o.status.code(), Some(2));
    assert!(String::from_utf8_lossy(&o.stderr).contains("does not exist"));
    assert!(!missing.exists());
    let o = jointbook(&[
        "check",
        DEMO,
        "--output",
        base.to_str().unwrap(),
        "--overwrite",
    ]);
    assert_eq!(o.status.code(), Some(2));
    assert!(String::from_utf8_lossy(&o.stderr).contains("is a folder"));
    assert_eq!(
        std::fs::read_dir(&base).unwrap().count(),
        0,
        "nothing written"
    );
    let _ = std::fs::remove_dir_all(&base);
}

/// The demo's end diagonal D1 meets the top chord at θ = 36.87° (3 ft over 4 ft): its gusset's
/// welds to the chord carry the force with its moment about the chord face, P cos θ × 1 in.
/// (half the HSS2x2 chord). Hand-worked by the elastic method (common practice): two 1/8 in.
/// E70 lines 4 in. long, c = √((0.8/8)² + (0.6/8 + 6 × 1 × 0.8/32)²) = 0.24622 per in.,
/// rn = 0.60 × 70 × 0.70711 × 0.125 = 3.7123 kip/in., Rn = 15.077 kip, φRn = 11.308 kip.
#[test]
fn an_inclined_members_gusset_weld_takes_the_moment() {
    let v = demo_json();
    let d1 = v["connections"]
        .as_array()
        .unwrap()
        .iter()
        .find(|c| c["id"] == "D1/start")
        .unwrap();
    let w = d1["checks"]
        .as_array()
        .unwrap()
        .iter()
        .find(|k| k["subject"] == "mate-to-chord weld, with the moment")
        .expect("the eccentric weld check");
    let available = w["available"]["value"].as_f64().unwrap();
    assert!((available - 11.308).abs() < 5e-3, "{available}");
}
