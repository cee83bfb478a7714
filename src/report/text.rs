//! Plain-text output: the summary table of `check`, and the full working of one connection
//! (`check --explain`).

use super::CAUTION;
use crate::checks::{CheckResult, ConnectionReport, Report, Status};
use crate::model::Model;
use crate::standards::{Bound, Method};
use crate::units::UnitSystem;
use std::fmt::Write;

/// Whether to colour the status words.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum Colour {
    On,
    Off,
}

/// The count of connections by status, as one sentence: "22 connections: 0 pass, 22 warn, 0 fail."
pub fn tally(report: &Report) -> String {
    let count = |s: Status| {
        report
            .connections
            .iter()
            .filter(|c| c.status() == s)
            .count()
    };
    format!(
        "{} connection{}: {} pass, {} warn, {} fail.",
        report.connections.len(),
        if report.connections.len() == 1 {
            ""
        } else {
            "s"
        },
        count(Status::Pass),
        count(Status::Warn),
        count(Status::Fail)
    )
}

fn status_word(s: Status, colour: Colour) -> String {
    let word = s.as_str().to_uppercase();
    match (colour, s) {
        (Colour::Off, _) => word,
        (Colour::On, Status::Pass) => format!("\x1b[32m{word}\x1b[0m"),
        (Colour::On, Status::Warn) => format!("\x1b[33m{word}\x1b[0m"),
        (Colour::On, Status::Fail) => format!("\x1b[1;31m{word}\x1b[0m"),
    }
}

fn ratio(r: f64) -> String {
    if r.is_finite() {
        format!("{r:.3}")
    } else {
        "—".into()
    }
}

fn header(model: &Model) -> String {
    let p = &model.project;
    let method = match p.method {
        Method::Lrfd => "LRFD",
        Method::Asd => "ASD",
    };
    let mut s = format!("{} — revision {}\n", p.title, p.revision);
    if let Some(c) = &p.client {
        let _ = writeln!(s, "client: {c}");
    }
    let _ = writeln!(
        s,
        "{} {method}, demand factor {}, model {} (sha256 {})\n",
        p.edition.standard(),
        p.demand_factor,
        model.file,
        &model.hash[..12]
    );
    s
}

/// What else needs a look at a connection besides its governing check: the counts of failing
/// and warning checks and of limit states not checked.
fn attention(c: &ConnectionReport) -> String {
    let count = |s: Status| c.checks.iter().filter(|k| k.status == s).count();
    let mut parts = Vec::new();
    for (n, word) in [
        (count(Status::Fail), "fail"),
        (count(Status::Warn), "warn"),
        (c.not_checked.len(), "not checked"),
    ] {
        if n > 0 {
            parts.push(format!("{n} {word}"));
        }
    }
    if parts.is_empty() {
        "-".into()
    } else {
        parts.join(", ")
    }
}

/// The summary table: one line per connection with its governing check.
pub fn summary(model: &Model, report: &Report, colour: Colour) -> String {
    let mut rows = vec![[
        "connection".to_string(),
        "detail".into(),
        "kind".into(),
        "governing check".into(),
        "load case".into(),
        "ratio".into(),
        "attention".into(),
        "status".into(),
    ]];
    let mut statuses = vec![None];
    for c in &report.connections {
        let (gov, case, r) = match c.governing() {
            Some(g) => (
                format!("{} ({})", g.limit_state, g.subject),
                g.load_case.clone().unwrap_or_else(|| "-".into()),
                ratio(g.ratio),
            ),
            None => ("-".into(), "-".into(), "-".into()),
        };
        rows.push([
            c.id.clone(),
            c.detail.clone(),
            c.kind.to_string(),
            gov,
            case,
            r,
            attention(c),
            String::new(),
        ]);
        statuses.push(Some(c.status()));
    }
    let widths: Vec<usize> = (0..7)
        .map(|i| rows.iter().map(|r| r[i].chars().count()).max().unwrap_or(0))
        .collect();
    let mut out = header(model);
    for (row, st) in rows.iter().zip(&statuses) {
        for (i, w) in widths.iter().enumerate() {
            let cell = &row[i];
            let pad = w - cell.chars().count();
            if i == 5 {
                let _ = write!(out, "{}{}  ", " ".repeat(pad), cell);
            } else {
                let _ = write!(out, "{}{}  ", cell, " ".repeat(pad));
            }
        }
        match st {
            Some(s) => {
                let _ = writeln!(out, "{}", status_word(*s, colour));
            }
            None => {
                let _ = writeln!(out, "status");
            }
        }
    }
    let _ = writeln!(out, "\n{}", tally(report));
    for k in &report.project_checks {
        let _ = writeln!(
            out,
            "project: {} ({})  ratio {}  {}",
            k.limit_state,
            k.subject,
            ratio(k.ratio),
            status_word(k.status, colour)
        );
        if k.status != Status::Pass {
            for n in &k.notes {
                let _ = writeln!(out, "  {n}");
            }
        }
    }
    let mut not_checked: Vec<(&str, Vec<&str>)> = Vec::new();
    for c in &report.connections {
        for n in &c.not_checked {
            match not_checked.iter_mut().find(|(m, _)| m == n) {
                Some((_, ids)) => ids.push(&c.id),
                None => not_checked.push((n, vec![&c.id])),
            }
        }
    }
    for (n, ids) in not_checked {
        let _ = writeln!(out, "not checked: {n} — at {}", ids.join(", "));
    }
    if !report.unchecked_ends.is_empty() {
        let _ = writeln!(
            out,
            "member ends without a detail (not checked): {}",
            report.unchecked_ends.join(", ")
        );
    }
    let _ = writeln!(
        out,
        "Every check of a connection: jointbook check {} --explain CONNECTION (or --explain project)",
        model.file
    );
    let _ = writeln!(out, "\nCAUTION: {CAUTION}");
    out
}

fn check_block(c: &CheckResult, units: UnitSystem, colour: Colour, out: &mut String) {
    let _ = writeln!(
        out,
        "{} — {}{}   ratio {}  {}",
        c.limit_state,
        c.subject,
        c.load_case
            .as_ref()
            .map(|l| format!(", load case {l}"))
            .unwrap_or_default(),
        ratio(c.ratio),
        status_word(c.status, colour)
    );
    let eq = if c.citation.equation.is_empty() {
        String::new()
    } else {
        format!(", Eq. {}", c.citation.equation)
    };
    let _ = writeln!(
        out,
        "  {} {}{}: {}",
        c.citation.standard, c.citation.clause, eq, c.formula
    );
    for i in &c.inputs {
        let _ = writeln!(
            out,
            "    {:<12} = {:<16} {}",
            i.symbol,
            units.show(i.value),
            i.meaning
        );
    }
    match (c.nominal, c.factor) {
        (Some(n), Some(f)) => {
            let fx = if f.symbol == "phi" {
                format!("φ = {}", f.value)
            } else {
                format!("Ω = {}", f.value)
            };
            let _ = writeln!(
                out,
                "  nominal {}, {fx}, available {}, demand {}",
                units.show(n),
                units.show(c.available),
                units.show(c.demand)
            );
        }
        _ => {
            let line = match c.bound {
                Some(Bound::Minimum) => format!(
                    "  provided {}, at least {} required",
                    units.show(c.available),
                    units.show(c.demand)
                ),
                Some(Bound::Maximum) => format!(
                    "  provided {}, at most {} allowed",
                    units.show(c.demand),
                    units.show(c.available)
                ),
                None if !c.evaluated() => {
                    "  cannot be evaluated: no available strength or demand (see the note)"
                        .to_string()
                }
                None => format!(
                    "  available {}, demand {}",
                    units.show(c.available),
                    units.show(c.demand)
                ),
            };
            let _ = writeln!(out, "{line}");
        }
    }
    for n in &c.notes {
        let _ = writeln!(out, "  note: {n}");
    }
}

/// Every project check with its inputs and notes (`--explain project`).
pub fn explain_project(
    model: &Model,
    report: &Report,
    units: UnitSystem,
    colour: Colour,
) -> String {
    let mut out = header(model);
    let worst = report
        .project_checks
        .iter()
        .map(|k| k.status)
        .max()
        .unwrap_or(Status::Pass);
    let _ = writeln!(
        out,
        "project: {} check{}, status {}\n",
        report.project_checks.len(),
        if report.project_checks.len() == 1 {
            ""
        } else {
            "s"
        },
        status_word(worst, colour)
    );
    for k in &report.project_checks {
        check_block(k, units, colour, &mut out);
        out.push('\n');
    }
    let _ = writeln!(out, "CAUTION: {CAUTION}");
    out
}

/// Every check of one connection with its inputs, strengths and notes.
pub fn explain(model: &Model, c: &ConnectionReport, units: UnitSystem, colour: Colour) -> String {
    let mut out = header(model);
    let _ = writeln!(
        out,
        "{}: detail {} ({}), {} checks, status {}\n",
        c.id,
        c.detail,
        c.kind,
        c.checks.len(),
        status_word(c.status(), colour)
    );
    for k in &c.checks {
        check_block(k, units, colour, &mut out);
        out.push('\n');
    }
    for n in &c.not_checked {
        let _ = writeln!(out, "not checked: {n}");
    }
    let _ = writeln!(out, "\nCAUTION: {CAUTION}");
    out
}
