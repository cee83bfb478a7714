//! The thin-walled example (examples/hollin-mere-lantern-frame/: 16 ga mechanical tubing) run
//! through the real binary: the weld-size cap at the thinner part, the sheet-steel scope flag, the
//! project's directional-increase option on the transverse ring welds of the tapped plugs, and the
//! sheet's statement of that option.

use std::path::{Path, PathBuf};
use std::process::{Command, Output};

const BIN: &str = env!("CARGO_BIN_EXE_jointbook");
const EXAMPLE: &str = concat!(
    env!("CARGO_MANIFEST_DIR"),
    "/examples/hollin-mere-lantern-frame"
);

fn scratch(name: &str) -> PathBuf {
    let dir = Path::new(env!("CARGO_TARGET_TMPDIR")).join(format!("thin-wall-{name}"));
    let _ = std::fs::remove_dir_all(&dir);
    std::fs::create_dir_all(&dir).unwrap();
    dir
}

/// The example with its model text changed by `edit`, in a fresh folder; the path of its model.
fn example_copy(name: &str, edit: impl Fn(&str) -> String) -> PathBuf {
    let dir = scratch(name);
    let text = std::fs::read_to_string(Path::new(EXAMPLE).join("model.toml")).unwrap();
    std::fs::write(dir.join("model.toml"), edit(&text)).unwrap();
    std::fs::copy(
        Path::new(EXAMPLE).join("forces.csv"),
        dir.join("forces.csv"),
    )
    .unwrap();
    dir.join("model.toml")
}

fn check_json(model: &Path) -> (Output, serde_json::Value) {
    let out = Command::new(BIN)
        .args(["check", "--format", "json"])
        .arg(model)
        .env("NO_COLOR", "1")
        .output()
        .unwrap();
    let v = serde_json::from_slice(&out.stdout).unwrap_or(serde_json::Value::Null);
    (out, v)
}

fn find<'a>(v: &'a serde_json::Value, conn: &str, id: &str) -> &'a serde_json::Value {
    v["connections"]
        .as_array()
        .unwrap()
        .iter()
        .find(|c| c["id"] == conn)
        .unwrap_or_else(|| panic!("no connection {conn}"))["checks"]
        .as_array()
        .unwrap()
        .iter()
        .find(|c| c["limit_state"] == id)
        .unwrap_or_else(|| panic!("no {id} check at {conn}"))
}

fn value(c: &serde_json::Value, key: &str) -> f64 {
    c[key]["value"].as_f64().unwrap()
}

fn input(c: &serde_json::Value, symbol: &str) -> f64 {
    c["inputs"][symbol]["value"].as_f64().unwrap()
}

fn note(c: &serde_json::Value) -> &str {
    c["note"].as_str().unwrap_or("")
}

#[test]
fn the_example_warns_but_passes_with_exit_0() {
    let (out, v) = check_json(&Path::new(EXAMPLE).join("model.toml"));
    // Nothing fails; the scope flags make it warn, and warn is exit 0.
    assert_eq!(
        out.status.code(),
        Some(0),
        "{}",
        String::from_utf8_lossy(&out.stderr)
    );
    assert_eq!(v["status"], "warn");
}

#[test]
fn weld_size_min_is_capped_at_the_thin_wall_and_flagged_as_sheet_steel() {
    let (_, v) = check_json(&Path::new(EXAMPLE).join("model.toml"));
    for conn in ["P0/start", "RAIL/start", "H0/start"] {
        let c = find(&v, conn, "weld_size_min");
        // AISC 360-22 Table J2.4: material to 1/4 in. inclusive, minimum fillet 1/8 in. (from
        // memory); J2.2b: the size need not exceed the thickness of the thinner part, here the
        // 16 ga wall, 0.0598 in. (Manufacturers' Standard Gauge, common practice).
        assert!((input(c, "w,min") - 0.125).abs() < 1e-9, "{conn}");
        assert!((value(c, "demand") - 0.0598).abs() < 1e-6, "{conn}");
        assert!(note(c).contains("capped at the thickness"), "{conn}");
        // AWS D1.1 covers steel 1/8 in. and thicker; thinner sheet is AWS D1.3 (common practice).
        assert!(note(c).contains("AWS D1.3"), "{conn}: {}", note(c));
        assert_eq!(c["status"], "warn", "{conn}");
    }
    let w = find(&v, "P0/start", "weld_strength");
    assert!(note(w).contains("under 1/8 in."), "{}", note(w));
    assert_eq!(w["status"], "warn");
}

#[test]
fn the_ring_weld_of_a_round_tube_takes_kds_when_the_option_is_on() {
    let (_, v) = check_json(&Path::new(EXAMPLE).join("model.toml"));
    // Worked by hand: RD TUBE 1x16 ga, weld all round l = π × 1.000 = 3.1416 in.; w = 0.0598 in.;
    // Awe = 0.7071 × 0.0598 × 3.1416 = 0.13284 in.²; AISC 360-22 Eq. J2-5 at θ = 90°: kds = 1.5;
    // Eq. J2-3/J2-4: Rn = 0.60 × 70 × 1.5 × 0.13284 = 8.369 kip; φRn = 0.75 Rn = 6.277 kip.
    let w = find(&v, "H0/start", "weld_strength");
    assert!((input(w, "θ") - 90.0).abs() < 1e-9);
    assert!((input(w, "kds") - 1.5).abs() < 1e-12);
    assert!((value(w, "nominal") - 8.369).abs() < 0.002);
    assert!((value(w, "available") - 6.277).abs() < 0.002);
    assert!(note(w).contains("directional strength increase of J2.4 used"));

    // The square rail in tension: AISC 360-22 J2.4 takes kds = 1.0 at the ends of rectangular
    // HSS in tension (from memory), so the increase is withheld with the reason.
    let r = find(&v, "RAIL/start", "weld_strength");
    assert!((input(r, "kds") - 1.0).abs() < 1e-12);
    assert!(note(r).contains("withheld"), "{}", note(r));
    assert!(note(r).contains("rectangular HSS"), "{}", note(r));

    // The slotted tab's lines run along the force: θ = 0, kds = 1.0 with the option on.
    let t = find(&v, "P0/start", "weld_strength");
    assert!((input(t, "θ") - 0.0).abs() < 1e-12);
    assert!((input(t, "kds") - 1.0).abs() < 1e-12);
}

#[test]
fn without_the_key_the_increase_is_off_and_the_record_says_so() {
    let model = example_copy("default", |t| {
        t.replace("weld_directional_increase = \"on\"\n", "")
    });
    let (out, v) = check_json(&model);
    assert_eq!(out.status.code(), Some(0));
    // Worked by hand as above with kds = 1.0: Rn = 0.60 × 70 × 0.13284 = 5.579 kip.
    let w = find(&v, "H0/start", "weld_strength");
    assert!((input(w, "kds") - 1.0).abs() < 1e-12);
    assert!((value(w, "nominal") - 5.579).abs() < 0.002);
    assert!(note(w).contains("off by default"), "{}", note(w));
    assert_eq!(w["equation"], "J2-3");
}

#[test]
fn the_sheet_states_the_option_in_its_title_block() {
    for (name, edit, shown) in [
        ("sheet-on", None, "on"),
        (
            "sheet-default",
            Some("weld_directional_increase = \"on\"\n"),
            "off (default)",
        ),
    ] {
        let model = example_copy(name, |t| match edit {
            Some(line) => t.replace(line, ""),
            None => t.to_string(),
        });
        let out_dir = model.parent().unwrap().join("sheet");
        let r = Command::new(BIN)
            .arg("sheet")
            .arg(&model)
            .arg("--out")
            .arg(&out_dir)
            .output()
            .unwrap();
        assert_eq!(
            r.status.code(),
            Some(0),
            "{}",
            String::from_utf8_lossy(&r.stderr)
        );
        let md = std::fs::read_to_string(out_dir.join("sheet.md")).unwrap();
        assert!(
            md.contains(&format!(
                "| Directional strength increase of J2.4 used on welds to tube walls | {shown} |"
            )),
            "{name}"
        );
        let html = std::fs::read_to_string(out_dir.join("sheet.html")).unwrap();
        assert!(
            html.contains(&format!(
                "directional strength increase of J2.4 used: {shown}</td>"
            )),
            "{name}"
        );
    }
}
