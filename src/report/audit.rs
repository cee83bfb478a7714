//! Output of `jointbook audit`: a table of every rule result by rule set, and the JSON document
//! for scripts (keys documented in the README and held stable).
//!
//! JSON: `rules[]` holds every result with exactly the keys `id`, `subject`, `measured`, `limit`,
//! `margin`, `status` (quantities as `{ "value", "unit" }` in the document's units);
//! `rule_sets[]` names each set with the range of `rules[]` it produced (`first`, `count`);
//! `rule_notes[]` gives the working note of a result by its index in `rules[]`.

use super::text::Colour;
use super::CAUTION;
use crate::audit::{AuditReport, AuditResult, AuditStatus};
use crate::model::Model;
use crate::units::{Dim, Quantity, UnitSystem};
use serde_json::{json, Value};
use std::fmt::Write;

/// What the audit's rules rest on, printed with every output.
pub const BASIS: &str = "piece box, piece weight, envelope, clear zones, connection kinds, \
thread past the nut and fastener variety are the rule set's own limits (no structural standard; \
the thread past the nut and the bolt lengths are measured on the stack-up the checks settle); \
vent and drain holes of galvanized pieces follow the practice of ASTM A385/A385M and ISO 14713-2 \
(from memory; the least hole is the rule set's value)";

fn status_str(s: AuditStatus) -> &'static str {
    match s {
        AuditStatus::Pass => "pass",
        AuditStatus::Fail => "fail",
        AuditStatus::Warn => "warn",
    }
}

fn status_word(s: AuditStatus, colour: Colour) -> String {
    let word = status_str(s).to_uppercase();
    match (colour, s) {
        (Colour::Off, _) => word,
        (Colour::On, AuditStatus::Pass) => format!("\x1b[32m{word}\x1b[0m"),
        (Colour::On, AuditStatus::Warn) => format!("\x1b[33m{word}\x1b[0m"),
        (Colour::On, AuditStatus::Fail) => format!("\x1b[1;31m{word}\x1b[0m"),
    }
}

fn shown(q: Quantity, units: UnitSystem) -> String {
    units.show(q)
}

/// The table: one line per result, grouped by rule set, then the notes and the caution.
pub fn table(model: &Model, report: &AuditReport, units: UnitSystem, colour: Colour) -> String {
    let p = &model.project;
    let mut out = format!("{} — revision {}\n", p.title, p.revision);
    let _ = writeln!(
        out,
        "rule audit of {} (sha256 {})\n",
        model.file,
        &model.hash[..12.min(model.hash.len())]
    );
    for set in &report.sets {
        let _ = write!(out, "rule set {} ({})", set.name, set.source);
        if let Some(a) = &set.about {
            let _ = write!(out, ": {a}");
        }
        let _ = writeln!(out);
        let mut rows: Vec<[String; 6]> = vec![[
            "rule".into(),
            "subject".into(),
            "measured".into(),
            "limit".into(),
            "margin".into(),
            "status".into(),
        ]];
        for r in &set.results {
            rows.push([
                r.id.clone(),
                r.subject.clone(),
                shown(r.measured, units),
                shown(r.limit, units),
                shown(r.margin, units),
                status_word(r.status, colour),
            ]);
        }
        let widths: Vec<usize> = (0..5)
            .map(|i| rows.iter().map(|r| r[i].chars().count()).max().unwrap_or(0))
            .collect();
        for row in &rows {
            out.push_str("  ");
            for (i, w) in widths.iter().enumerate() {
                let pad = " ".repeat(w - row[i].chars().count());
                if (2..5).contains(&i) {
                    let _ = write!(out, "{pad}{}  ", row[i]);
                } else {
                    let _ = write!(out, "{}{pad}  ", row[i]);
                }
            }
            let _ = writeln!(out, "{}", row[5]);
        }
        for r in set.results.iter().filter(|r| r.status != AuditStatus::Pass) {
            let _ = writeln!(
                out,
                "  {} {} {}: {}",
                status_str(r.status),
                r.id,
                r.subject,
                r.note
            );
        }
        let _ = writeln!(out);
    }
    let count = |s: AuditStatus| {
        report
            .sets
            .iter()
            .flat_map(|x| x.results.iter())
            .filter(|r| r.status == s)
            .count()
    };
    let total: usize = report.sets.iter().map(|s| s.results.len()).sum();
    let _ = writeln!(
        out,
        "{total} results: {} pass, {} warn, {} fail.",
        count(AuditStatus::Pass),
        count(AuditStatus::Warn),
        count(AuditStatus::Fail)
    );
    let pieces: usize = report.groups.iter().map(|g| g.quantity).sum();
    let _ = writeln!(
        out,
        "{pieces} pieces of {} marks weigh {} together.",
        report.groups.len(),
        shown(report.pieces_weight.into(), units)
    );
    for n in &report.notes {
        let _ = writeln!(out, "note: {n}");
    }
    let _ = writeln!(out, "basis: {BASIS}");
    let _ = writeln!(out, "\nCAUTION: {CAUTION}");
    out
}

/// A quantity as `{ "value", "unit" }`; a value that is not finite is refused.
fn quantity(q: Quantity, units: UnitSystem) -> Result<Value, String> {
    let v = units.value(q);
    if !v.is_finite() {
        return Err(format!("a result value is not finite ({v})"));
    }
    Ok(json!({ "value": v, "unit": units.unit(q.dim) }))
}

fn rule(r: &AuditResult, units: UnitSystem) -> Result<Value, String> {
    Ok(json!({
        "id": r.id,
        "subject": r.subject,
        "measured": quantity(r.measured, units)?,
        "limit": quantity(r.limit, units)?,
        "margin": quantity(r.margin, units)?,
        "status": status_str(r.status),
    }))
}

/// The JSON document. An error only when a value is not finite (a bug upstream, never hidden).
pub fn document(model: &Model, report: &AuditReport, units: UnitSystem) -> Result<Value, String> {
    let p = &model.project;
    let mut rules = Vec::new();
    let mut sets = Vec::new();
    let mut notes = Vec::new();
    for s in &report.sets {
        sets.push(json!({
            "name": s.name,
            "source": s.source,
            "about": s.about,
            "first": rules.len(),
            "count": s.results.len(),
        }));
        for r in &s.results {
            if !r.note.is_empty() {
                notes.push(json!({ "rule": rules.len(), "note": r.note }));
            }
            rules.push(rule(r, units)?);
        }
    }
    Ok(json!({
        "audit": "rules",
        "basis": BASIS,
        "units": {
            "length": units.unit(Dim::Length),
            "mass": units.unit(Dim::Mass),
        },
        "model": {
            "file": model.file,
            "title": p.title,
            "revision": p.revision,
            "sha256": model.hash,
        },
        "status": status_str(report.status()),
        "rule_sets": sets,
        "rules": rules,
        "rule_notes": notes,
        "pieces": report.groups.iter().map(|g| g.quantity).sum::<usize>(),
        "pieces_weight": quantity(report.pieces_weight.into(), units)?,
        "notes": report.notes,
        "caution": CAUTION,
    }))
}

/// What `jointbook audit` was asked for.
#[derive(Debug, Clone, Default)]
pub struct AuditRequest {
    pub model: std::path::PathBuf,
    /// Rule sets chosen by name (`--rules NAME`); every set when empty.
    pub rule_sets: Vec<String>,
    /// A rules file (`--rules-file FILE`) read beside the model's own sets.
    pub rules_file: Option<std::path::PathBuf>,
    pub json: bool,
}

/// Read the model and the rules, audit, and render: the output text and whether a rule failed.
pub fn run(
    req: &AuditRequest,
    colour: Colour,
) -> Result<(String, bool), Vec<crate::diag::Diagnostic>> {
    use crate::model::{load, rules, LoadOptions};
    let model = load(&req.model, &LoadOptions::default())?;
    let mut sets = model.rules.clone();
    if let Some(f) = &req.rules_file {
        sets.extend(rules::load_rules_file(f)?);
    }
    let chosen = rules::choose(&model.file, &sets, &req.rule_sets)?;
    let report = crate::audit::audit(&model, &chosen)?;
    let units = model.project.units;
    let text = if req.json {
        let doc = document(&model, &report, units).map_err(|e| {
            vec![crate::diag::Diagnostic::file(&model.file, "audit", e)
                .hint("this is a bug; please report it with the model")]
        })?;
        format!(
            "{}\n",
            serde_json::to_string_pretty(&doc).unwrap_or_default()
        )
    } else {
        table(&model, &report, units, colour)
    };
    Ok((text, report.status() == AuditStatus::Fail))
}
