//! The model samples of README.md run as a user would copy them: the smaller complete model and
//! the tapped detail beside it are read and checked without an input error (exit 0 or 1, not 2).
//! The README wraps inline tables over lines to fit the page, as it says; they are joined here.
//! Sources: none needed — the test holds the documentation to the program.

use std::path::Path;
use std::process::Command;

/// The first ```toml block after `after` in the README, with wrapped inline tables joined.
fn toml_block(readme: &str, after: &str) -> String {
    let from = readme.find(after).expect(after);
    let start = readme[from..].find("```toml\n").expect("a toml block") + from + 8;
    let end = readme[start..].find("```").expect("the block's end") + start;
    let mut out = String::new();
    let mut open = 0i32;
    for line in readme[start..end].lines() {
        if open > 0 {
            out.push(' ');
            out.push_str(line.trim());
        } else {
            if !out.is_empty() {
                out.push('\n');
            }
            out.push_str(line);
        }
        let code = line.split(" #").next().unwrap_or(line);
        open += code.matches('{').count() as i32 - code.matches('}').count() as i32;
    }
    out.push('\n');
    out
}

#[test]
fn the_readme_samples_are_read_and_checked() {
    let readme =
        std::fs::read_to_string(Path::new(env!("CARGO_MANIFEST_DIR")).join("README.md")).unwrap();
    let model = toml_block(&readme, "## The model file");
    let tapped = toml_block(&readme, "A tapped detail:");
    // the sample names a catalogue file of the user's own, which the test does not have
    let model: String = model
        .lines()
        .filter(|l| !l.starts_with("catalogues"))
        .map(|l| format!("{l}\n"))
        .collect();
    let text = format!(
        "{model}\n[members.M2]\nfrom = \"N2\"\nto = \"N1\"\nsection = \"HSS2x2x3/16\"\nmaterial = \"ASTM A500 Gr C (shaped)\"\nstart = \"END-PLUG\"\nend = \"none\"\n\n{tapped}"
    );
    let dir = Path::new(env!("CARGO_TARGET_TMPDIR")).join("readme-sample");
    let _ = std::fs::remove_dir_all(&dir);
    std::fs::create_dir_all(&dir).unwrap();
    std::fs::write(dir.join("model.toml"), &text).unwrap();
    std::fs::write(
        dir.join("forces.csv"),
        "member,case,axial [kip]\nM1,A,2.5\nM1,B,-1.0\nM2,A,2.0\n",
    )
    .unwrap();
    let o = Command::new(env!("CARGO_BIN_EXE_jointbook"))
        .current_dir(&dir)
        .args(["check", "model.toml"])
        .output()
        .unwrap();
    assert!(
        matches!(o.status.code(), Some(0) | Some(1)),
        "exit {:?}\n{}\n{text}",
        o.status.code(),
        String::from_utf8_lossy(&o.stderr)
    );
    let out = String::from_utf8_lossy(&o.stdout);
    assert!(
        out.contains("M1/start") && out.contains("M2/start"),
        "{out}"
    );
}
