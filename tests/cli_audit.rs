//! `jointbook audit` through the real binary: the demo audits clean, the Fennel Gorge example
//! breaks its crate box, its carry weight and its channel zone by margins worked by hand, its
//! bolts' thread past the nut is measured against hand-worked stack-ups, the JSON keys are the
//! documented ones, and a bad rule is reported at its line.
//!
//! Units: the examples are in US units, so JSON values are in inches and pounds. Hand-worked
//! lengths are compared to 0.001 in. (the geometry is exact; the tolerance is float noise only).
//! Weights against a published weight per length are compared at the printed precision: ±0.01
//! lb/ft times the length in feet.

use serde_json::Value;
use std::path::{Path, PathBuf};
use std::process::{Command, Output};

const BIN: &str = env!("CARGO_BIN_EXE_jointbook");
const DEMO: &str = "examples/quillon-brook-footbridge/model.toml";
const FENNEL: &str = "examples/fennel-gorge-kit-bridge/model.toml";

fn run(args: &[&str]) -> Output {
    Command::new(BIN)
        .args(args)
        .current_dir(env!("CARGO_MANIFEST_DIR"))
        .env("NO_COLOR", "1")
        .output()
        .expect("the binary runs")
}

fn code(o: &Output) -> i32 {
    o.status.code().expect("an exit code")
}

fn text(b: &[u8]) -> String {
    String::from_utf8_lossy(b).into_owned()
}

fn json(args: &[&str]) -> (i32, Value) {
    let mut all = args.to_vec();
    all.extend(["--format", "json"]);
    let o = run(&all);
    let v = serde_json::from_slice(&o.stdout)
        .unwrap_or_else(|e| panic!("not JSON ({e}): {}\n{}", text(&o.stdout), text(&o.stderr)));
    (code(&o), v)
}

/// A fresh folder for one test's files.
fn scratch(name: &str) -> PathBuf {
    let d = std::env::temp_dir().join(format!("jointbook-cli-audit-{name}-{}", std::process::id()));
    let _ = std::fs::remove_dir_all(&d);
    std::fs::create_dir_all(&d).unwrap();
    d
}

fn write(dir: &Path, file: &str, body: &str) -> String {
    let p = dir.join(file);
    std::fs::write(&p, body).unwrap();
    p.display().to_string()
}

/// The result of rule `id` for `subject` in rule set `set`.
fn result<'a>(doc: &'a Value, set: &str, id: &str, subject: &str) -> &'a Value {
    let s = doc["rule_sets"]
        .as_array()
        .unwrap()
        .iter()
        .find(|s| s["name"] == set)
        .unwrap_or_else(|| panic!("no rule set {set}"));
    let (first, count) = (
        s["first"].as_u64().unwrap() as usize,
        s["count"].as_u64().unwrap() as usize,
    );
    doc["rules"].as_array().unwrap()[first..first + count]
        .iter()
        .find(|r| r["id"] == id && r["subject"] == subject)
        .unwrap_or_else(|| panic!("no {id} for {subject} in {set}"))
}

fn value(r: &Value, key: &str) -> f64 {
    r[key]["value"].as_f64().unwrap()
}

#[test]
fn demo_audits_clean() {
    let o = run(&["audit", DEMO]);
    assert_eq!(code(&o), 0, "{}{}", text(&o.stdout), text(&o.stderr));
    let out = text(&o.stdout);
    // 13 pieces × (box, weight, clear zone) + 3 envelope axes + 22 connection kinds + the thread
    // past the nut at the 20 ends that have a nut (the 2 tapped ends have none) + 1 fastener
    // variety = 39 + 3 + 22 + 20 + 1 = 85, counted from the model file
    assert!(
        out.contains("85 results: 85 pass, 0 warn, 0 fail."),
        "{out}"
    );
    assert!(out.contains("CAUTION:"), "{out}");
    let (c, doc) = json(&["audit", DEMO]);
    assert_eq!(c, 0);
    assert_eq!(doc["status"], "pass");
    assert_eq!(doc["units"]["length"], "in");
}

#[test]
fn every_result_has_exactly_the_documented_keys() {
    let (_, doc) = json(&["audit", FENNEL]);
    let rules = doc["rules"].as_array().unwrap();
    assert!(!rules.is_empty());
    for r in rules {
        let mut keys: Vec<&str> = r.as_object().unwrap().keys().map(String::as_str).collect();
        keys.sort_unstable();
        assert_eq!(
            keys,
            ["id", "limit", "margin", "measured", "status", "subject"],
            "{r}"
        );
        for q in ["measured", "limit", "margin"] {
            assert!(
                r[q]["value"].is_f64() || r[q]["value"].is_u64() || r[q]["value"].is_i64(),
                "{r}"
            );
        }
    }
    let total: u64 = doc["rule_sets"]
        .as_array()
        .unwrap()
        .iter()
        .map(|s| s["count"].as_u64().unwrap())
        .sum();
    assert_eq!(total as usize, rules.len());
}

#[test]
fn fennel_breaks_the_crate_box_by_its_margin() {
    let (c, doc) = json(&["audit", FENNEL]);
    assert_eq!(c, 1);
    assert_eq!(doc["status"], "fail");
    // By hand: BC2 is cut 6 ft (72 in.) node to node with no set-backs and carries the 8 in.
    // sleeve, 4 in. of it outside: 76 in. long, against the crate's 5 ft = 60 in.: −16 in.
    let r = result(&doc, "crate", "piece_box", "BC2");
    assert_eq!(r["status"], "fail");
    assert!((value(r, "measured") - 76.0).abs() < 1e-3, "{r}");
    assert!((value(r, "limit") - 60.0).abs() < 1e-3, "{r}");
    assert!((value(r, "margin") + 16.0).abs() < 1e-3, "{r}");
    // BC1 has no sleeve: 72 − 60 = −12 in.
    let r = result(&doc, "crate", "piece_box", "BC1");
    assert!((value(r, "margin") + 12.0).abs() < 1e-3, "{r}");
    // The web marks fit: W-V is 1-1/2 in. square (tube and tab width) against the crate's
    // least side 6 in.: 4.5 in.
    let r = result(&doc, "crate", "piece_box", "W-V");
    assert_eq!(r["status"], "pass");
    assert!((value(r, "margin") - 4.5).abs() < 1e-3, "{r}");
    let table = text(&run(&["audit", FENNEL]).stdout);
    assert!(
        table.contains("piece_box  BC2      76.00 in  60.00 in  -16.00 in  FAIL"),
        "{table}"
    );
}

#[test]
fn fennel_breaks_the_carry_weight_by_its_margin() {
    // AISC Steel Construction Manual, 16th ed., Table 1-12: HSS2×2×1/8 weighs 3.05 lb/ft (the
    // value the project's reference list quotes). BC1 is a bare 6 ft tube: 6 × 3.05 = 18.30 lb,
    // against 15 lb: margin −3.30 lb, ±0.06 lb (±0.01 lb/ft printed precision × 6 ft).
    let (_, doc) = json(&["audit", FENNEL]);
    let r = result(&doc, "carry", "piece_weight", "BC1");
    assert_eq!(r["status"], "fail");
    assert!((value(r, "measured") - 18.30).abs() <= 0.06, "{r}");
    assert!((value(r, "margin") + 3.30).abs() <= 0.06, "{r}");
    assert!((value(r, "limit") - 15.0).abs() < 1e-9, "{r}");
}

#[test]
fn fennel_bottom_chord_enters_the_channel_and_the_top_chord_does_not() {
    // By hand: the bottom chord's axis is at y = 0, its 2 in. square reaches y = −1 in.; the
    // channel's top is at y = −1/2 in. across x = 2 ft .. 10 ft: the chord enters it by 1/2 in.
    // (clearance asked 0): margin −0.5 in. The top chord (axis y = 18 in., bottom face 17 in.)
    // passes 17 + 1/2 = 17.5 in. above it.
    let (_, doc) = json(&["audit", FENNEL]);
    let r = result(&doc, "gorge", "clear_zone", "BC1");
    assert_eq!(r["status"], "fail");
    assert!((value(r, "margin") + 0.5).abs() < 1e-3, "{r}");
    let r = result(&doc, "gorge", "clear_zone", "TC1");
    assert_eq!(r["status"], "pass");
    assert!((value(r, "margin") - 17.5).abs() < 1e-3, "{r}");
    // V1 stands on B1 (x = 3 ft): its tube stops 3-1/2 in. above the node and its tab 2 in. past
    // the tube, so the piece's lowest point is 1-1/2 in. above the node, 2 in. above the zone.
    let r = result(&doc, "gorge", "clear_zone", "V1");
    assert!((value(r, "margin") - 2.0).abs() < 1e-3, "{r}");
}

#[test]
fn the_failures_are_named_in_the_table() {
    let o = run(&["audit", FENNEL]);
    assert_eq!(code(&o), 1);
    let out = text(&o.stdout);
    for line in [
        "fail piece_box BC2:",
        "fail piece_weight BC1:",
        "fail clear_zone BC1:",
        "73 results: 63 pass, 0 warn, 10 fail.",
    ] {
        assert!(out.contains(line), "missing {line:?} in\n{out}");
    }
}

#[test]
fn a_box_fits_whatever_order_its_sides_are_given_in() {
    // By hand: W-D (fennel diagonals) run √(36² + 18²) = 40.249 in. node to node, less 3-1/2 in.
    // at each end = 33.249 in. of tube, plus a tab 2 in. past each end: 37.249 in. × 1-1/2 ×
    // 1-1/2 in. Against 3 ft × 2 in. × 2 in.: the length governs, 36 − 37.249 = −1.249 in.,
    // whichever order the sides are written in.
    let dir = scratch("order");
    for (i, sides) in [
        "[\"3 ft\", \"2 in\", \"2 in\"]",
        "[\"2 in\", \"2 in\", \"3 ft\"]",
        "[\"2 in\", \"36 in\", \"2 in\"]",
    ]
    .iter()
    .enumerate()
    {
        let f = write(
            &dir,
            &format!("box{i}.toml"),
            &format!("[rules.tube-rack]\npiece_box = {sides}\n"),
        );
        let (c, doc) = json(&["audit", FENNEL, "--rules-file", &f, "--rules", "tube-rack"]);
        assert_eq!(c, 1);
        let r = result(&doc, "tube-rack", "piece_box", "W-D");
        assert!((value(r, "measured") - 37.249).abs() < 1e-3, "{r}");
        assert!((value(r, "margin") + 1.249).abs() < 1e-3, "{r}");
    }
    // 3 ft 2 in. = 38 in. fits it as built: 38 − 37.249 = 0.751 in.; the 1-1/2 in. sides fit a
    // 1-1/2 in. opening exactly (zero margin passes).
    let f = write(
        &dir,
        "fits.toml",
        "[rules.tube-rack]\npiece_box = [\"1-1/2 in\", \"3 ft 2 in\", \"1-1/2 in\"]\n",
    );
    let (_, doc) = json(&["audit", FENNEL, "--rules-file", &f, "--rules", "tube-rack"]);
    let r = result(&doc, "tube-rack", "piece_box", "W-D");
    assert_eq!(r["status"], "pass", "{r}");
    assert!(value(r, "margin").abs() < 1e-3, "{r}");
    let _ = std::fs::remove_dir_all(&dir);
}

#[test]
fn rule_sets_are_chosen_by_name() {
    let (c, doc) = json(&["audit", FENNEL, "--rules", "crate"]);
    assert_eq!(c, 1);
    let sets = doc["rule_sets"].as_array().unwrap();
    assert_eq!(sets.len(), 1);
    assert_eq!(sets[0]["name"], "crate");
    // The gorge rules alone fail on the channel only.
    let (c, doc) = json(&["audit", FENNEL, "--rules", "gorge"]);
    assert_eq!(c, 1);
    assert!(doc["rules"]
        .as_array()
        .unwrap()
        .iter()
        .filter(|r| r["status"] == "fail")
        .all(|r| r["id"] == "clear_zone"));
    let o = run(&["audit", FENNEL, "--rules", "crates"]);
    assert_eq!(code(&o), 2);
    let err = text(&o.stderr);
    assert!(
        err.contains("--rules: no rule set 'crates' (hint: did you mean 'crate'?)"),
        "{err}"
    );
    assert!(o.stdout.is_empty());
}

#[test]
fn a_rule_without_its_unit_is_located_at_its_line() {
    let dir = scratch("unit");
    let f = write(
        &dir,
        "rules.toml",
        "# trailer rules\n[rules.trailer]\nabout = \"the club trailer\"\npiece_weight = 15\n",
    );
    let o = run(&["audit", FENNEL, "--rules-file", &f]);
    assert_eq!(code(&o), 2, "{}", text(&o.stdout));
    let err = text(&o.stderr);
    assert!(
        err.contains(&format!(
            "{f}:4:16: rules.trailer.piece_weight: a bare number has no unit"
        )),
        "{err}"
    );
    assert!(err.contains("nothing was written"), "{err}");
    // A misspelt rule is an unknown key with the nearest name.
    let f = write(
        &dir,
        "typo.toml",
        "[rules.trailer]\npeice_box = [\"8 ft\", \"4 ft\", \"2 ft\"]\n",
    );
    let err = text(&run(&["audit", FENNEL, "--rules-file", &f]).stderr);
    assert!(
        err.contains(&format!(
            "{f}:2:13: rules.trailer.peice_box: unknown key (hint: did you mean 'piece_box'?)"
        )),
        "{err}"
    );
    // A rule set of the same name as one in the model is ambiguous.
    let f = write(
        &dir,
        "twice.toml",
        "[rules.crate]\npiece_weight = \"20 lb\"\n",
    );
    let err = text(&run(&["audit", FENNEL, "--rules-file", &f]).stderr);
    assert!(err.contains("rule set 'crate' is also defined at"), "{err}");
    let _ = std::fs::remove_dir_all(&dir);
}

#[test]
fn output_file_is_written_once_unless_overwrite() {
    let dir = scratch("output");
    let out = dir.join("audit.json").display().to_string();
    let o = run(&["audit", DEMO, "--format", "json", "--output", &out]);
    assert_eq!(code(&o), 0, "{}", text(&o.stderr));
    assert!(o.stdout.is_empty());
    let doc: Value = serde_json::from_str(&std::fs::read_to_string(&out).unwrap()).unwrap();
    assert_eq!(doc["status"], "pass");
    let o = run(&["audit", DEMO, "--output", &out]);
    assert_eq!(code(&o), 2);
    assert!(
        text(&o.stderr).contains("the file exists"),
        "{}",
        text(&o.stderr)
    );
    let o = run(&["audit", DEMO, "--output", &out, "--overwrite"]);
    assert_eq!(code(&o), 0);
    assert!(std::fs::read_to_string(&out)
        .unwrap()
        .starts_with("Quillon Brook"));
    let _ = std::fs::remove_dir_all(&dir);
}

#[test]
fn help_shows_an_example() {
    let o = run(&["audit", "--help"]);
    assert_eq!(code(&o), 0);
    let h = text(&o.stdout);
    assert!(
        h.contains("jointbook audit model.toml --rules kettle --rules hand-carry"),
        "{h}"
    );
    assert!(h.contains("--rules-file <FILE>"), "{h}");
}

/// The least stick-out of the Fennel Gorge bolts past the nut face, hand-worked from the
/// catalogue values (washers at their greatest thickness):
/// - web tab WEB: 1/4 in. gusset + 1/4 in. tab = 0.500 in. grip, one ASTM F436 washer 0.177 in.
///   thick at most (ASTM F436 Table 1, from memory), heavy hex nut H = 31/64 in. (ASME B18.2.2,
///   REFERENCES.md): flush needs 1.161375 in., the shortest of the 1/4 in. series of ASME
///   B18.2.6 heavy hex structural bolts (1 in. up) is 1-1/4 in., stick-out 0.088625 in.;
/// - splice SPLICE: the walls, the fit clearance and the sleeve hollow across the 2 in. square
///   chord add to 2.000 in., so flush needs 2.661375 in.: 2-3/4 in., stick-out 0.088625 in.
const FENNEL_STICKOUT_IN: f64 = 0.088625;

const NUT_RULES: &str = "[rules.nuts-ok]\nthread_past_nut = \"1/16 in\"\n\n[rules.nuts-long]\nthread_past_nut = \"1/8 in\"\n";

#[test]
fn thread_past_nut_is_measured_on_the_chosen_bolts() {
    let d = scratch("nuts");
    let f = write(&d, "rules.toml", NUT_RULES);
    let (c, doc) = json(&["audit", FENNEL, "--rules-file", &f, "--rules", "nuts-ok"]);
    assert_eq!(c, 0, "{doc}");
    // hand-worked: 0.088625 − 1/16 = 0.026125 in. at every tab and splice end
    for subject in ["V0/start", "D4/end", "BC1/end", "TC2/start"] {
        let r = result(&doc, "nuts-ok", "thread_past_nut", subject);
        assert_eq!(r["status"], "pass", "{r}");
        assert!(
            (value(r, "measured") - FENNEL_STICKOUT_IN).abs() < 1e-6,
            "{r}"
        );
        assert!(
            (value(r, "margin") - (FENNEL_STICKOUT_IN - 0.0625)).abs() < 1e-6,
            "{r}"
        );
    }
    let (c, doc) = json(&["audit", FENNEL, "--rules-file", &f, "--rules", "nuts-long"]);
    assert_eq!(c, 1, "{doc}");
    // hand-worked: 0.088625 − 1/8 = −0.036375 in.: short of the rule at every end
    let r = result(&doc, "nuts-long", "thread_past_nut", "BC2/start");
    assert_eq!(r["status"], "fail", "{r}");
    assert!(
        (value(r, "margin") - (FENNEL_STICKOUT_IN - 0.125)).abs() < 1e-6,
        "{r}"
    );
    let fails = doc["rules"]
        .as_array()
        .unwrap()
        .iter()
        .filter(|r| r["status"] == "fail")
        .count();
    // 18 web-tab ends and 4 splice ends
    assert_eq!(fails, 22);
}

#[test]
fn thread_past_nut_is_not_applicable_to_a_tapped_detail() {
    let d = scratch("tapped");
    let model = "[project]\ntitle = \"Tapped end audit\"\nrevision = \"A\"\nstandard = \"AISC 360-22\"\nmethod = \"LRFD\"\ndemand_factor = 1.0\nunits = \"us\"\nhole_deformation = \"considered\"\nforces = \"forces.csv\"\n\n[nodes]\nN1 = [\"0 ft\", \"0 ft\", \"0 ft\"]\nN2 = [\"4 ft\", \"0 ft\", \"0 ft\"]\n\n[members.M1]\nfrom = \"N1\"\nto = \"N2\"\nsection = \"HSS1-1/2x1-1/2x3/16\"\nmaterial = \"ASTM A500 Gr C (shaped)\"\nstart = \"PLUG\"\nend = \"none\"\ncut_length = \"4 ft\"\n\n[details.PLUG]\nkind = \"tapped\"\nbolts = { grade = \"SAE J429 Gr 5\", thread = \"1/2-13 UNC\", type = \"hex cap screw\", washer = \"ASTM F436\", washers = \"under head\", across = 1, along = 1, hole = \"standard\" }\nplate = { thickness = \"1/4 in\", material = \"ASTM A36\" }\nplug = { material = \"ASTM A36\", thickness = \"3/4 in\", engagement = \"5/8 in\" }\nweld = { size = \"1/8 in\", electrode = \"E70\" }\n\n[rules.nuts]\nthread_past_nut = \"0 in\"\n";
    let m = write(&d, "model.toml", model);
    write(&d, "forces.csv", "member,case,axial [kip]\nM1,A,6.0\n");
    let (c, doc) = json(&["audit", &m]);
    assert_eq!(c, 0, "{doc}");
    assert_eq!(doc["rule_sets"][0]["count"], 0, "{doc}");
    let notes: Vec<&str> = doc["notes"]
        .as_array()
        .unwrap()
        .iter()
        .map(|n| n.as_str().unwrap())
        .collect();
    assert!(
        notes
            .iter()
            .any(|n| n.contains("thread_past_nut n.a. at tapped details")
                && n.contains("M1/start (PLUG)")),
        "{notes:?}"
    );
}

const GANTRY: &str = "examples/nettlebank-notice-gantry/model.toml";

#[test]
fn gantry_hanger_plate_is_in_the_beam_where_it_is_welded() {
    // By hand: the beam's axis is 8 ft = 96 in. up; its underside 1.5 in. lower (94.5 in.); the
    // hanger's transverse plate hangs 1 + 1-1/2 = 2-1/2 in. below it, to 92.0 in., 1/4 in. thick
    // about x = 60 in. (59.875 to 60.125) and 3 in. across z (±1.5). A probe box in the plate
    // (x 59.9 to 60.1, y 92.2 to 93, z 1.30 to 1.45 in., beside the hanger's own tube and tab)
    // overlaps it 0.2 in. in x, 0.8 in y and 0.2 in z: the beam's piece is 0.2 in. into it (the
    // least overlap); the same probe 0.1 in. below the plate (y to 91.9 in.) is clear by 0.1 in.
    let dir = scratch("gantry-zone");
    let f = write(
        &dir,
        "rules.toml",
        "[rules.probe]\nabout = \"probe boxes round the hanger plate\"\n\n\
         [[rules.probe.clear_zone]]\nname = \"into\"\nfrom = [\"59.9 in\", \"92.2 in\", \"1.3 in\"]\n\
         to = [\"60.1 in\", \"93 in\", \"1.45 in\"]\nclearance = \"0 in\"\n\n\
         [[rules.probe.clear_zone]]\nname = \"below\"\nfrom = [\"59.9 in\", \"91.5 in\", \"1.3 in\"]\n\
         to = [\"60.1 in\", \"91.9 in\", \"1.45 in\"]\nclearance = \"0 in\"\n",
    );
    let (c, doc) = json(&["audit", GANTRY, "--rules-file", &f, "--rules", "probe"]);
    assert_eq!(c, 1, "{doc}");
    let beam: Vec<f64> = doc["rules"]
        .as_array()
        .unwrap()
        .iter()
        .filter(|r| r["id"] == "clear_zone" && r["subject"] == "BEAM")
        .map(|r| value(r, "margin"))
        .collect();
    assert_eq!(beam.len(), 2, "{doc}");
    assert!((beam[0] + 0.2).abs() < 1e-3, "{beam:?}");
    assert!((beam[1] - 0.1).abs() < 1e-3, "{beam:?}");
}
