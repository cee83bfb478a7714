//! The `sheet` command through the real binary: golden snapshots of the demo's outputs, a count
//! of every fastener position read from the model file on its own (not through the library) held
//! against hardware.csv and kits.csv, escaping of model text, and the refusals of the output folder.
//!
//! Sources: none published — the expected counts come from the model text (bolt lines across ×
//! bolts along at every member end that names a detail); the spares rule is the one the model
//! states, or the default of the larger of 1 and 5 % rounded up (common practice). Golden files
//! are compared byte for byte; regenerate them with JOINTBOOK_UPDATE_GOLDEN=1 after a reviewed
//! change of the sheet.

use std::collections::BTreeMap;
use std::path::{Path, PathBuf};
use std::process::{Command, Output};

const BIN: &str = env!("CARGO_BIN_EXE_jointbook");
const DEMO: &str = concat!(
    env!("CARGO_MANIFEST_DIR"),
    "/examples/quillon-brook-footbridge"
);
const GOLDEN: &str = concat!(
    env!("CARGO_MANIFEST_DIR"),
    "/tests/golden/quillon-brook-footbridge"
);

fn scratch(name: &str) -> PathBuf {
    let d = std::env::temp_dir().join(format!("jointbook-cli-sheet-{name}-{}", std::process::id()));
    let _ = std::fs::remove_dir_all(&d);
    std::fs::create_dir_all(&d).unwrap();
    d
}

fn sheet(model: &Path, out: &Path, extra: &[&str]) -> Output {
    Command::new(BIN)
        .arg("sheet")
        .arg(model)
        .arg("--out")
        .arg(out)
        .args(extra)
        .output()
        .expect("the binary runs")
}

fn demo_text() -> String {
    std::fs::read_to_string(Path::new(DEMO).join("model.toml")).unwrap()
}

/// A copy of the demo in its own folder, with `edit` applied to the model text and, when given,
/// another forces file.
fn fixture(name: &str, edit: impl Fn(String) -> String, forces: Option<&str>) -> PathBuf {
    let dir = scratch(name);
    let text = edit(demo_text());
    std::fs::write(dir.join("model.toml"), text).unwrap();
    let f = match forces {
        Some(f) => f.to_string(),
        None => std::fs::read_to_string(Path::new(DEMO).join("forces.csv")).unwrap(),
    };
    std::fs::write(dir.join("forces.csv"), f).unwrap();
    dir
}

fn files_of(dir: &Path) -> BTreeMap<String, Vec<u8>> {
    std::fs::read_dir(dir)
        .unwrap()
        .map(|e| {
            let e = e.unwrap();
            (
                e.file_name().to_string_lossy().into_owned(),
                std::fs::read(e.path()).unwrap(),
            )
        })
        .collect()
}

fn first_difference(a: &[u8], b: &[u8]) -> String {
    let (a, b) = (String::from_utf8_lossy(a), String::from_utf8_lossy(b));
    for (i, (x, y)) in a.lines().zip(b.lines()).enumerate() {
        if x != y {
            return format!("line {}:\n  golden: {x}\n  now:    {y}", i + 1);
        }
    }
    format!(
        "one is a prefix of the other ({} and {} lines)",
        a.lines().count(),
        b.lines().count()
    )
}

#[test]
fn demo_outputs_match_the_golden_files() {
    let out = scratch("golden").join("sheet");
    let r = sheet(&Path::new(DEMO).join("model.toml"), &out, &[]);
    assert_eq!(
        r.status.code(),
        Some(0),
        "{}",
        String::from_utf8_lossy(&r.stderr)
    );
    let now = files_of(&out);
    if std::env::var_os("JOINTBOOK_UPDATE_GOLDEN").is_some_and(|v| v == "1") {
        let _ = std::fs::remove_dir_all(GOLDEN);
        std::fs::create_dir_all(GOLDEN).unwrap();
        for (name, bytes) in &now {
            std::fs::write(Path::new(GOLDEN).join(name), bytes).unwrap();
        }
        return;
    }
    let golden = files_of(Path::new(GOLDEN));
    assert_eq!(
        golden.keys().collect::<Vec<_>>(),
        now.keys().collect::<Vec<_>>(),
        "the sheet writes other files than the golden set (JOINTBOOK_UPDATE_GOLDEN=1 regenerates it)"
    );
    for (name, bytes) in &now {
        assert!(
            &golden[name] == bytes,
            "{name} differs from its golden file at {} (JOINTBOOK_UPDATE_GOLDEN=1 regenerates it after review)",
            first_difference(&golden[name], bytes)
        );
    }
}

#[test]
fn the_same_model_gives_the_same_bytes() {
    let dir = scratch("twice");
    let model = Path::new(DEMO).join("model.toml");
    for run in ["a", "b"] {
        let r = sheet(&model, &dir.join(run), &[]);
        assert_eq!(r.status.code(), Some(0));
    }
    let (a, b) = (files_of(&dir.join("a")), files_of(&dir.join("b")));
    assert_eq!(
        a.len(),
        11,
        "html, md, six drawings (one per detail), three lists"
    );
    assert_eq!(a, b);
}

/// Bolt positions per member end, read from the model text alone: lines across × bolts along
/// of the detail each end names, the washers per bolt its `washers` key places, and whether its
/// bolts have a nut (a tapped detail names none: its screw threads into the plug).
type Positions = (
    BTreeMap<String, (String, u64)>,
    BTreeMap<String, u64>,
    BTreeMap<String, bool>,
);
fn positions_from_model_text(text: &str) -> Positions {
    let doc: toml::Table = text.parse().unwrap();
    let mut per_detail = BTreeMap::new();
    let mut washers = BTreeMap::new();
    let mut nuts = BTreeMap::new();
    for (id, d) in doc["details"].as_table().unwrap() {
        let b = d["bolts"].as_table().unwrap();
        let n = b["across"].as_integer().unwrap() * b["along"].as_integer().unwrap();
        per_detail.insert(id.clone(), n as u64);
        let w = match b.get("washers").and_then(|w| w.as_str()) {
            Some("under head") | Some("under nut") => 1,
            Some("under head and nut") => 2,
            _ => 0,
        };
        washers.insert(id.clone(), w);
        nuts.insert(id.clone(), b.contains_key("nut"));
    }
    let mut ends = BTreeMap::new();
    for (id, m) in doc["members"].as_table().unwrap() {
        for end in ["start", "end"] {
            let d = m[end].as_str().unwrap();
            if d != "none" {
                ends.insert(format!("{id}/{end}"), (d.to_string(), per_detail[d]));
            }
        }
    }
    (ends, washers, nuts)
}

fn read_csv(path: &Path) -> Vec<BTreeMap<String, String>> {
    let mut r = csv::Reader::from_path(path).unwrap();
    let header: Vec<String> = r.headers().unwrap().iter().map(str::to_string).collect();
    r.records()
        .map(|rec| {
            header
                .iter()
                .cloned()
                .zip(rec.unwrap().iter().map(str::to_string))
                .collect()
        })
        .collect()
}

fn check_counts(model_dir: &Path, percent: f64, minimum: u64) {
    let text = std::fs::read_to_string(model_dir.join("model.toml")).unwrap();
    let (ends, washers, nuts) = positions_from_model_text(&text);
    let out = model_dir.join("sheet");
    let r = sheet(&model_dir.join("model.toml"), &out, &[]);
    assert_eq!(
        r.status.code(),
        Some(0),
        "{}",
        String::from_utf8_lossy(&r.stderr)
    );

    // kits.csv: each connection's bag holds one bolt and one nut per position, and the washers
    let kits = read_csv(&out.join("kits.csv"));
    let mut kit_bolts: BTreeMap<String, u64> = BTreeMap::new();
    let mut kit_nuts: BTreeMap<String, u64> = BTreeMap::new();
    let mut kit_washers: BTreeMap<String, u64> = BTreeMap::new();
    for k in &kits {
        let q: u64 = k["quantity"].parse().unwrap();
        let map = match k["item"].as_str() {
            "bolt" => &mut kit_bolts,
            "nut" => &mut kit_nuts,
            "washer" => &mut kit_washers,
            other => panic!("unknown item {other}"),
        };
        *map.entry(k["connection"].clone()).or_default() += q;
    }
    let expected: BTreeMap<String, u64> = ends.iter().map(|(c, (_, n))| (c.clone(), *n)).collect();
    assert_eq!(kit_bolts, expected);
    let expected_nuts: BTreeMap<String, u64> = ends
        .iter()
        .filter(|(_, (d, _))| nuts[d])
        .map(|(c, (_, n))| (c.clone(), *n))
        .collect();
    assert_eq!(kit_nuts, expected_nuts);
    let expected_washers: BTreeMap<String, u64> = ends
        .iter()
        .filter(|(_, (d, _))| washers[d] > 0)
        .map(|(c, (d, n))| (c.clone(), n * washers[d]))
        .collect();
    assert_eq!(kit_washers, expected_washers);

    // hardware.csv: the positions summed per item, spares by the rule, order = quantity + spares
    let total: u64 = expected.values().sum();
    let hardware = read_csv(&out.join("hardware.csv"));
    let sum = |item: &str| -> u64 {
        hardware
            .iter()
            .filter(|h| h["item"] == item)
            .map(|h| h["quantity"].parse::<u64>().unwrap())
            .sum()
    };
    assert_eq!(sum("bolt"), total);
    assert_eq!(sum("nut"), expected_nuts.values().sum::<u64>());
    assert_eq!(sum("washer"), expected_washers.values().sum::<u64>());
    for h in &hardware {
        let q: u64 = h["quantity"].parse().unwrap();
        let spares: u64 = h["spares"].parse().unwrap();
        let want = ((q as f64 * percent / 100.0 - 1e-9).ceil() as u64).max(minimum);
        assert_eq!(spares, want, "spares of {h:?}");
        assert_eq!(h["order"].parse::<u64>().unwrap(), q + spares);
    }
}

#[test]
fn every_fastener_position_is_in_the_kits_and_the_order() {
    // The demo: 13 members, 22 ends with a detail; 20 of them with 2 bolts and a nut on each,
    // the 2 tapped post feet with one screw and no nut = 42 positions, 40 nuts (by hand from
    // the model): 36 heavy hex nuts (5 % = 1.8 → 2 spares) and 4 nylon-insert nuts on the centre
    // vertical (5 % = 0.2 → the minimum, 1).
    let dir = fixture("count", |t| t, None);
    check_counts(&dir, 5.0, 1);
    let out = dir.join("sheet");
    let hardware = read_csv(&out.join("hardware.csv"));
    let nuts: Vec<_> = hardware
        .iter()
        .filter(|h| h["item"] == "nut")
        .map(|h| {
            (
                h["product"].as_str(),
                h["quantity"].as_str(),
                h["spares"].as_str(),
            )
        })
        .collect();
    assert_eq!(
        nuts,
        [
            ("heavy hex nut", "36", "2"),
            ("nylon insert hex nut", "4", "1")
        ]
    );
}

#[test]
fn a_stated_spares_rule_replaces_the_default() {
    let dir = fixture(
        "spares",
        |t| {
            t.replace(
                "hole_deformation = \"considered\"",
                "hole_deformation = \"considered\"\nspares = { percent = 10, minimum = 4 }",
            )
        },
        None,
    );
    check_counts(&dir, 10.0, 4);
}

#[test]
fn a_script_in_a_name_is_shown_as_text() {
    let dir = fixture(
        "script",
        |t| {
            t.replace(
                "title = \"Quillon Brook trail footbridge, north truss\"",
                "title = \"<script>alert('x')</script> & truss\"",
            )
        },
        None,
    );
    let out = dir.join("sheet");
    let r = sheet(&dir.join("model.toml"), &out, &[]);
    assert_eq!(
        r.status.code(),
        Some(0),
        "{}",
        String::from_utf8_lossy(&r.stderr)
    );
    for file in [
        "sheet.html",
        "detail-WEB-TAB.svg",
        "detail-CHORD-SPLICE.svg",
        "sheet.md",
    ] {
        let text = std::fs::read_to_string(out.join(file)).unwrap();
        assert!(!text.contains("<script"), "{file} carries the raw tag");
        assert!(
            text.contains("&lt;script&gt;"),
            "{file} does not show the name"
        );
        assert!(
            !text.contains("</script>"),
            "{file} carries the raw closing tag"
        );
    }
}

#[test]
fn a_folder_with_files_is_refused_unless_forced() {
    let dir = scratch("refuse");
    let out = dir.join("sheet");
    std::fs::create_dir_all(&out).unwrap();
    std::fs::write(out.join("notes.txt"), "keep me").unwrap();
    let model = Path::new(DEMO).join("model.toml");
    let r = sheet(&model, &out, &[]);
    assert_eq!(r.status.code(), Some(2));
    assert!(String::from_utf8_lossy(&r.stderr).contains("not empty"));
    assert_eq!(
        files_of(&out).len(),
        1,
        "nothing written beside the user's file"
    );
    let r = sheet(&model, &out, &["--force"]);
    assert_eq!(r.status.code(), Some(0));
    let files = files_of(&out);
    assert_eq!(files["notes.txt"], b"keep me");
    assert!(files.contains_key("sheet.html") && files.contains_key("kits.csv"));
    // nothing is left beside the output folder
    assert_eq!(std::fs::read_dir(&dir).unwrap().count(), 1);
}

#[test]
fn an_input_error_writes_nothing() {
    let dir = fixture(
        "bad",
        |t| t.replacen("grade = \"ASTM F3125 Gr A325\"", "grade = \"A235\"", 1),
        None,
    );
    let out = dir.join("sheet");
    let r = sheet(&dir.join("model.toml"), &out, &[]);
    assert_eq!(r.status.code(), Some(2));
    assert!(String::from_utf8_lossy(&r.stderr).contains("unknown bolt grade 'A235'"));
    assert!(!out.exists());
}

#[test]
fn a_failing_check_exits_1_and_the_sheet_lists_it_first() {
    // BC1 at 200 kip in tension: far past two 1/2 in. bolts in double shear (each about 16 kip
    // per plane available, from the demo's own check table).
    let forces = std::fs::read_to_string(Path::new(DEMO).join("forces.csv"))
        .unwrap()
        .replace("BC1,1.2D+1.6L,6.0", "BC1,1.2D+1.6L,200.0");
    let dir = fixture("fail", |t| t, Some(&forces));
    let out = dir.join("sheet");
    let r = sheet(&dir.join("model.toml"), &out, &[]);
    assert_eq!(r.status.code(), Some(1));
    let md = std::fs::read_to_string(out.join("sheet.md")).unwrap();
    let summary = md.find("## Summary").unwrap();
    let cut = md.find("## Cut list").unwrap();
    let fail = md
        .find("| FAIL bolt\\_shear")
        .expect("bolt shear listed as a failure");
    assert!(
        summary < fail && fail < cut,
        "failures sit in the summary, before the lists"
    );
    assert!(md[summary..cut].contains("**FAIL**"));
    assert!(md[summary..cut].contains("BC1/end"));
    assert!(!md.to_lowercase().contains("complies"));
}

#[test]
fn a_user_template_replaces_the_embedded_one() {
    let dir = scratch("templates");
    let templates = dir.join("templates");
    std::fs::create_dir_all(&templates).unwrap();
    std::fs::write(
        templates.join("sheet.md"),
        "revision {{ title.revision }}: {{ summary.fasteners }} bolts\n",
    )
    .unwrap();
    let out = dir.join("sheet");
    let r = sheet(
        &Path::new(DEMO).join("model.toml"),
        &out,
        &["--templates", templates.to_str().unwrap()],
    );
    assert_eq!(
        r.status.code(),
        Some(0),
        "{}",
        String::from_utf8_lossy(&r.stderr)
    );
    assert_eq!(
        std::fs::read_to_string(out.join("sheet.md")).unwrap(),
        "revision B: 42 bolts\n"
    );
    assert!(std::fs::read_to_string(out.join("sheet.html"))
        .unwrap()
        .starts_with("<!DOCTYPE html>"));
    // a template that does not render is an input error, nothing written
    std::fs::write(templates.join("sheet.md"), "{{ no.such.key }}\n").unwrap();
    let out2 = dir.join("sheet2");
    let r = sheet(
        &Path::new(DEMO).join("model.toml"),
        &out2,
        &["--templates", templates.to_str().unwrap()],
    );
    assert_eq!(r.status.code(), Some(2));
    assert!(!out2.exists());
}

/// The sheet in SI units: lengths of the cut list in millimetres; fasteners in their own series.
#[test]
fn si_units_write_millimetres() {
    let dir = scratch("si");
    let out = dir.join("sheet");
    let r = sheet(
        &Path::new(DEMO).join("model.toml"),
        &out,
        &["--units", "si"],
    );
    assert_eq!(r.status.code(), Some(0));
    let hardware = read_csv(&out.join("hardware.csv"));
    // fasteners are ordered as they are sold: the demo's inch-series bolts stay in inches (a
    // 1/2 in. bolt is not a 12.7 mm one on an order), whatever the sheet's units
    assert!(
        hardware.iter().all(|h| h["size"] == "1/2 in"),
        "{hardware:?}"
    );
    assert!(hardware
        .iter()
        .filter(|h| h["item"] == "bolt")
        .all(|h| h["length"].ends_with(" in")));
    let cut = read_csv(&out.join("cutlist.csv"));
    // V1: nodes 3 ft apart less 5-1/2 in. at each end = 25 in. = 635 mm (by hand)
    let v1 = cut.iter().find(|c| c["mark"] == "V1").unwrap();
    assert_eq!(v1["cut_length"], "635 mm");
    assert_eq!(v1["cut_length_mm"], "635");
}

#[test]
fn each_detail_shows_bolt_shear_at_its_most_loaded_use() {
    // From the demo's forces.csv alone (demand factor 1.0 in the model): the largest |axial| of
    // the members that use each detail is the bolt group's shear demand (the whole member force
    // goes through the bolts of each end), and the row names one of those members.
    let text = demo_text();
    let doc: toml::Table = text.parse().unwrap();
    let forces = std::fs::read_to_string(Path::new(DEMO).join("forces.csv")).unwrap();
    let mut worst: BTreeMap<String, f64> = BTreeMap::new();
    for line in forces.lines().filter(|l| !l.starts_with('#')).skip(1) {
        let f: Vec<&str> = line.split(',').collect();
        let v: f64 = f[2].trim().parse::<f64>().unwrap().abs();
        let e = worst.entry(f[0].to_string()).or_insert(0.0);
        *e = e.max(v);
    }
    let out = scratch("worst").join("sheet");
    assert_eq!(
        sheet(&Path::new(DEMO).join("model.toml"), &out, &[])
            .status
            .code(),
        Some(0)
    );
    let md = std::fs::read_to_string(out.join("sheet.md")).unwrap();
    for (detail, d) in doc["details"].as_table().unwrap() {
        if d["kind"].as_str() == Some("tapped") {
            continue; // a tapped screw is checked in tension, not in shear
        }
        let users: Vec<&String> = doc["members"]
            .as_table()
            .unwrap()
            .iter()
            .filter(|(_, m)| {
                m["start"].as_str() == Some(detail) || m["end"].as_str() == Some(detail)
            })
            .map(|(id, _)| id)
            .collect();
        let max = users.iter().map(|u| worst[u.as_str()]).fold(0.0, f64::max);
        let section = &md[md.find(&format!("## Detail {detail}")).unwrap()..];
        let row = section
            .lines()
            .find(|l| l.starts_with("| `bolt_shear`"))
            .expect("a bolt shear row");
        let cells: Vec<&str> = row.split(" | ").collect();
        let at_member = cells[2].split('/').next().unwrap();
        assert!(users.iter().any(|u| u.as_str() == at_member), "{row}");
        assert!((worst[at_member] - max).abs() < 1e-9, "{row}");
        let shown: f64 = cells[4].trim_end_matches(" kip").parse().unwrap();
        assert!((shown - max).abs() < 5e-4, "{row}");
    }
}

/// Every bundled example gives a sheet: its own exit code says whether a check fails (0 or 1),
/// never that the model is incomplete (2), and agrees with `check`; and every example's audit
/// runs.
#[test]
fn every_example_gives_a_sheet() {
    let examples = Path::new(env!("CARGO_MANIFEST_DIR")).join("examples");
    let mut seen = 0;
    for entry in std::fs::read_dir(&examples).unwrap() {
        let model = entry.unwrap().path().join("model.toml");
        if !model.exists() {
            continue;
        }
        seen += 1;
        let name = model
            .parent()
            .unwrap()
            .file_name()
            .unwrap()
            .to_string_lossy()
            .to_string();
        let out = scratch(&format!("example-{name}"));
        let s = sheet(&model, &out, &["--force"]);
        let check = Command::new(BIN).arg("check").arg(&model).output().unwrap();
        assert!(
            matches!(s.status.code(), Some(0) | Some(1)),
            "{name}: sheet exit {:?}\n{}",
            s.status.code(),
            String::from_utf8_lossy(&s.stderr)
        );
        assert_eq!(
            s.status.code(),
            check.status.code(),
            "{name}: sheet and check disagree"
        );
        assert!(out.join("sheet.html").exists(), "{name}: no sheet.html");
        // the exit codes the README promises for each example (check, audit)
        let promised = match name.as_str() {
            "quillon-brook-footbridge" => Some((0, 0)),
            "fennel-gorge-kit-bridge" => Some((0, 1)),
            "larkspur-stage-frame" => Some((1, 0)),
            "hollin-mere-lantern-frame" => Some((0, 0)),
            "nettlebank-notice-gantry" => Some((0, 0)),
            _ => None,
        };
        // every example carries at least one rule set, so its audit runs (passes or fails)
        let audit = Command::new(BIN).arg("audit").arg(&model).output().unwrap();
        assert!(
            matches!(audit.status.code(), Some(0) | Some(1)),
            "{name}: audit exit {:?}\n{}",
            audit.status.code(),
            String::from_utf8_lossy(&audit.stderr)
        );
        if let Some((c, a)) = promised {
            assert_eq!(check.status.code(), Some(c), "{name}: check exit");
            assert_eq!(audit.status.code(), Some(a), "{name}: audit exit");
        }
    }
    assert!(
        seen >= 3,
        "the examples folder holds at least the three bundled examples"
    );
}

/// A project check that warns is listed among the warnings of the summary, at "project", and
/// galvanized bolts and nuts are ordered with their finish. The demo with its chord splices in
/// SAE Grade 5 beside the web tabs' Grade A325 (both 1/2 in.: two grades at one diameter, common
/// practice), and the web tabs galvanized with nuts tapped oversize.
#[test]
fn a_project_warning_is_in_the_summary_and_the_order_gives_the_finish() {
    let dir = fixture(
        "project",
        |t| {
            let splice = t.find("[details.CHORD-SPLICE]").unwrap();
            let (web, chord) = t.split_at(splice);
            let web = web.replacen(
                "type = \"heavy hex structural bolt\", nut = \"heavy hex nut\"",
                "type = \"heavy hex structural bolt, hot-dip galvanized\", nut = \"heavy hex nut, hot-dip galvanized, tapped oversize\"",
                1,
            );
            let chord = chord.replacen("ASTM F3125 Gr A325", "SAE J429 Gr 5", 1);
            format!("{web}{chord}")
        },
        None,
    );
    let out = dir.join("sheet");
    let r = sheet(&dir.join("model.toml"), &out, &[]);
    assert_eq!(
        r.status.code(),
        Some(0),
        "{}",
        String::from_utf8_lossy(&r.stderr)
    );
    let md = std::fs::read_to_string(out.join("sheet.md")).unwrap();
    let summary = md.find("## Summary").unwrap();
    let cut = md.find("## Cut list").unwrap();
    let at = md[summary..cut]
        .find("bolt\\_grades\\_per\\_diameter (bolts d = 1/2 in)")
        .unwrap_or_else(|| panic!("the project warning in the summary:\n{}", &md[summary..cut]));
    assert!(md[summary + at..cut].contains("project"));
    assert!(
        md[summary..cut].contains("1 project check"),
        "{}",
        &md[summary..cut]
    );
    let csv = std::fs::read_to_string(out.join("hardware.csv")).unwrap();
    assert!(
        csv.contains("bolt,\"heavy hex structural bolt, hot-dip galvanized\",ASTM F3125 Gr A325,1/2 in,1/2-13 UNC,1-1/4 in,hot-dip galvanized,"),
        "{csv}"
    );
    assert!(
        csv.contains(",\"hot-dip galvanized, tapped oversize\","),
        "{csv}"
    );
    assert!(
        csv.contains(
            "bolt,heavy hex structural bolt,SAE J429 Gr 5,1/2 in,1/2-13 UNC,2-3/4 in,plain,"
        ),
        "{csv}"
    );
}

/// The command says what it wrote and how the checks came out, with the caution.
#[test]
fn the_command_says_what_it_wrote() {
    let out = scratch("says");
    let r = sheet(&Path::new(DEMO).join("model.toml"), &out, &[]);
    assert_eq!(r.status.code(), Some(0));
    let text = String::from_utf8(r.stdout).unwrap();
    let files = files_of(&out).len();
    let drawings = files_of(&out)
        .keys()
        .filter(|k| k.ends_with(".svg"))
        .count();
    assert!(
        text.starts_with(&format!("wrote {files} files into ")),
        "{text}"
    );
    assert!(text.contains(&format!("and {drawings} drawings")), "{text}");
    assert!(text.contains(" connections: "), "{text}");
    assert!(text.contains("CAUTION: "), "{text}");
}

/// A template folder that does not exist, or holds none of the template names, is an input
/// error (exit 2, nothing written), not silently the built-in sheet.
#[test]
fn a_wrong_template_folder_is_refused() {
    let model = Path::new(DEMO).join("model.toml");
    let out = scratch("badtpl").join("out");
    let missing = scratch("badtpl-missing").join("nowhere");
    let r = sheet(&model, &out, &["--templates", missing.to_str().unwrap()]);
    assert_eq!(r.status.code(), Some(2));
    assert!(String::from_utf8_lossy(&r.stderr).contains("--templates"));
    let empty = scratch("badtpl-empty");
    std::fs::write(empty.join("sheet.htm"), "a typo").unwrap();
    let r = sheet(&model, &out, &["--templates", empty.to_str().unwrap()]);
    assert_eq!(r.status.code(), Some(2));
    assert!(String::from_utf8_lossy(&r.stderr).contains("none of the templates"));
    assert!(!out.exists(), "nothing written");
}
