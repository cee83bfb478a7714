//! Plain-text listing of the catalogue for `jointbook catalogue`: kinds, entries of a kind, a search
//! by name or standard, and one entry in full with its source.

use super::{Catalogue, NotFound, Provenance, Shape};
use crate::diag::{nearest, Diagnostic};
use crate::units::{Quantity, UnitSystem};
use std::fmt::Write;

/// The kinds a listing accepts.
pub const KINDS: [&str; 11] = [
    "bolt-grades",
    "nut-grades",
    "bolt-types",
    "threads",
    "nuts",
    "washers",
    "sections",
    "materials",
    "electrodes",
    "gauges",
    "tolerances",
];

/// (name, standard) of every entry of a kind.
fn entries(cat: &Catalogue, kind: &str) -> Vec<(String, String)> {
    fn pairs<T>(
        m: &std::collections::BTreeMap<String, T>,
        f: impl Fn(&T) -> String,
    ) -> Vec<(String, String)> {
        m.iter().map(|(k, v)| (k.clone(), f(v))).collect()
    }
    match kind {
        "bolt-grades" => pairs(&cat.bolt_grades, |v| v.standard.clone()),
        "nut-grades" => pairs(&cat.nut_grades, |v| v.standard.clone()),
        "bolt-types" => pairs(&cat.bolt_types, |v| v.standard.clone()),
        "threads" => pairs(&cat.threads, |v| v.series.clone()),
        "nuts" => pairs(&cat.nuts, |v| v.standard.clone()),
        "washers" => pairs(&cat.washers, |v| v.standard.clone()),
        "sections" => pairs(&cat.sections, |v| v.standard.clone()),
        "materials" => pairs(&cat.materials, |v| v.standard.clone()),
        "electrodes" => pairs(&cat.electrodes, |v| v.standard.clone()),
        "gauges" => pairs(&cat.gauges, |v| v.system.clone()),
        "tolerances" => pairs(&cat.tolerances, |v| v.standard.clone()),
        _ => Vec::new(),
    }
}

fn table(rows: &[(String, String)]) -> String {
    let w = rows.iter().map(|r| r.0.chars().count()).max().unwrap_or(0);
    let mut out = String::new();
    for (a, b) in rows {
        let pad = w - a.chars().count();
        let _ = writeln!(out, "{a}{}  {b}", " ".repeat(pad));
    }
    out
}

/// The kinds with their counts (no kind), or the entries of one kind.
pub fn list(cat: &Catalogue, kind: Option<&str>) -> Result<String, Diagnostic> {
    match kind {
        None => {
            let rows: Vec<(String, String)> = KINDS
                .iter()
                .map(|k| (k.to_string(), format!("{} entries", entries(cat, k).len())))
                .collect();
            Ok(table(&rows))
        }
        Some(k) if KINDS.contains(&k) => Ok(table(&entries(cat, k))),
        Some(k) => {
            let near = nearest(k, KINDS);
            Err(Diagnostic::file(
                "command line",
                "kind",
                format!("unknown catalogue kind '{k}'"),
            )
            .hint(format!(
                "one of {}{}",
                KINDS.join(", "),
                if near.is_empty() {
                    String::new()
                } else {
                    format!("; nearest: {}", near.join(", "))
                }
            )))
        }
    }
}

/// Entries whose name or standard contains the text (case-insensitive), with their kind.
pub fn search(cat: &Catalogue, text: &str) -> String {
    let needle = text.to_lowercase();
    let mut rows = Vec::new();
    for k in KINDS {
        for (name, standard) in entries(cat, k) {
            if name.to_lowercase().contains(&needle) || standard.to_lowercase().contains(&needle) {
                rows.push((name, format!("{k}  {standard}")));
            }
        }
    }
    table(&rows)
}

fn provenance(out: &mut String, p: &Provenance) {
    let _ = writeln!(
        out,
        "  source: {}, {}, {}{}",
        p.source.document,
        p.source.edition,
        p.source.table,
        if p.from_memory { " (from memory)" } else { "" }
    );
    let _ = writeln!(out, "  defined at: {}:{}", p.file, p.line);
    if let Some(n) = &p.note {
        let _ = writeln!(out, "  note: {n}");
    }
}

/// Every property of the entries of this name, with units and sources.
pub fn show(cat: &Catalogue, name: &str, units: UnitSystem) -> Result<String, NotFound> {
    let q = |v: Quantity| units.show(v);
    let mut out = String::new();
    if let Some(g) = cat.bolt_grades.get(name) {
        let _ = writeln!(
            out,
            "bolt grade {name}\n  standard: {}\n  AISC group: {}",
            g.standard,
            g.aisc_group.as_str()
        );
        for s in &g.strengths {
            let _ = writeln!(
                out,
                "  {}: Fu {}, Fy {}, proof {}",
                s.range.describe("d", |l| q(l.into())),
                q(s.fu.into()),
                s.fy.map_or("not specified".into(), |v| q(v.into())),
                s.proof.map_or("not specified".into(), |v| q(v.into()))
            );
        }
        provenance(&mut out, &g.provenance);
    }
    if let Some(g) = cat.nut_grades.get(name) {
        let _ = writeln!(
            out,
            "nut grade {name}\n  standard: {}\n  suits: {}\n  suits basis: {}",
            g.standard,
            g.suits.join(", "),
            g.suits_basis
        );
        let _ = writeln!(
            out,
            "  suits hot-dip galvanized: {}{}",
            if g.suits_galvanized.is_empty() {
                "none".to_string()
            } else {
                g.suits_galvanized.join(", ")
            },
            g.suits_galvanized_basis
                .as_ref()
                .map(|b| format!(" ({b})"))
                .unwrap_or_default()
        );
        provenance(&mut out, &g.provenance);
    }
    if let Some(t) = cat.bolt_types.get(name) {
        let _ = writeln!(
            out,
            "bolt type {name}\n  standard: {}\n  finish: {}\n  thread length rule: {:?}",
            t.standard,
            t.finish.as_str(),
            t.thread_length
        );
        for s in &t.sizes {
            let _ = writeln!(
                out,
                "  d {}: head height {}, across flats {}",
                q(s.d.into()),
                s.head_height.map_or("-".into(), |v| q(v.into())),
                s.across_flats.map_or("-".into(), |v| q(v.into()))
            );
        }
        let lens: Vec<String> = t.lengths.iter().map(|l| q((*l).into())).collect();
        let _ = writeln!(out, "  lengths: {}", lens.join(", "));
        provenance(&mut out, &t.provenance);
    }
    if let Some(t) = cat.threads.get(name) {
        let _ = writeln!(out, "thread {name}\n  series: {}\n  d: {}\n  pitch: {}\n  stress area (computed): {}\n  stress area (tabulated): {}", t.series, q(t.d.into()), q(t.pitch.into()), q(t.stress_area.into()), t.stress_area_tabulated.map_or("-".into(), |v| q(v.into())));
        provenance(&mut out, &t.provenance);
    }
    if let Some(n) = cat.nuts.get(name) {
        let _ = writeln!(
            out,
            "nut {name}\n  standard: {}\n  finish: {}{}",
            n.standard,
            n.finish.as_str(),
            if n.tapped_oversize_for_galvanized {
                ", tapped oversize for hot-dip galvanized bolts"
            } else {
                ""
            }
        );
        for s in &n.sizes {
            let _ = writeln!(
                out,
                "  d {}: height {}, across flats {}",
                q(s.d.into()),
                q(s.height.into()),
                s.across_flats.map_or("-".into(), |v| q(v.into()))
            );
        }
        provenance(&mut out, &n.provenance);
    }
    if let Some(w) = cat.washers.get(name) {
        let _ = writeln!(out, "washer {name}\n  standard: {}", w.standard);
        for s in &w.sizes {
            let _ = writeln!(
                out,
                "  d {}: id {}, od {}, t {} to {}",
                q(s.d.into()),
                q(s.id.into()),
                q(s.od.into()),
                q(s.t_min.into()),
                q(s.t_max.into())
            );
        }
        provenance(&mut out, &w.provenance);
    }
    if let Some(s) = cat.sections.get(name) {
        let p = &s.props;
        let shape = match s.shape {
            Shape::Rect { b, h } if (b.to_mm() - h.to_mm()).abs() < 1e-9 => {
                format!("square, {} wide", q(b.into()))
            }
            Shape::Rect { b, h } => {
                format!("rectangular, {} deep × {} wide", q(h.into()), q(b.into()))
            }
            Shape::Round { d } => format!("round, {} outside diameter", q(d.into())),
        };
        let _ = writeln!(out, "section {name}\n  standard: {} ({})\n  shape: {shape}\n  wall: {} (nominal {}, design {})\n  rule: {}", s.standard, s.process, s.wall_text, q(s.t_nominal.into()), q(s.t_design.into()), s.rule.basis());
        let _ = writeln!(
            out,
            "  A {}\n  Ix {}\n  Iy {}\n  rx {}\n  ry {}\n  Sx {}\n  Sy {}\n  weight {}",
            q(p.area.into()),
            q(p.ix.into()),
            q(p.iy.into()),
            q(p.rx.into()),
            q(p.ry.into()),
            q(p.sx.into()),
            q(p.sy.into()),
            q(p.mass_per_length.into())
        );
        provenance(&mut out, &s.provenance);
    }
    if let Some(m) = cat.materials.get(name) {
        let _ = writeln!(
            out,
            "material {name}\n  standard: {}\n  basis: {}\n  E {}\n  density {}",
            m.standard,
            m.basis,
            q(m.e.into()),
            q(m.density.into())
        );
        for (r, v) in &m.fy {
            let _ = writeln!(
                out,
                "  Fy {} for {}",
                q((*v).into()),
                r.describe("t", |l| q(l.into()))
            );
        }
        for (r, v) in &m.fu {
            let _ = writeln!(
                out,
                "  Fu {} for {}",
                q((*v).into()),
                r.describe("t", |l| q(l.into()))
            );
        }
        provenance(&mut out, &m.provenance);
    }
    if let Some(e) = cat.electrodes.get(name) {
        let _ = writeln!(
            out,
            "electrode {name}\n  standard: {}\n  FEXX {}",
            e.standard,
            q(e.fexx.into())
        );
        provenance(&mut out, &e.provenance);
    }
    if let Some(g) = cat.gauges.get(name) {
        let _ = writeln!(
            out,
            "gauge {name}\n  system: {}\n  thickness {}",
            g.system,
            q(g.thickness.into())
        );
        provenance(&mut out, &g.provenance);
    }
    if out.is_empty() {
        let all: Vec<String> = KINDS
            .iter()
            .flat_map(|k| entries(cat, k))
            .map(|e| e.0)
            .collect();
        return Err(NotFound {
            kind: "catalogue entry",
            name: name.to_string(),
            nearest: nearest(name, all.iter().map(|s| s.as_str())),
        });
    }
    Ok(out)
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn listing_searching_showing() {
        let cat = Catalogue::embedded().unwrap();
        assert!(list(&cat, None).unwrap().contains("sections"));
        assert!(list(&cat, Some("sections")).unwrap().contains("HSS2x2x1/8"));
        let e = list(&cat, Some("sektions")).unwrap_err();
        assert!(e.to_string().contains("nearest: sections"), "{e}");
        assert!(search(&cat, "j429").contains("SAE J429 Gr 5"));
        let s = show(&cat, "HSS2x2x1/8", UnitSystem::Us).unwrap();
        assert!(s.contains("0.116") && s.contains("from memory"), "{s}");
        assert!(show(&cat, "HSS2x2x1/9", UnitSystem::Us)
            .unwrap_err()
            .nearest
            .contains(&"HSS2x2x1/8".to_string()));
    }
}
