//! The context the sheet templates are rendered from: every number already written in the
//! sheet's units, every list in a fixed order, so the same model gives the same bytes. The keys
//! are documented for template authors; keep them stable.

use super::cutlist::CutRow;
use super::format::{length, quantity, ratio};
use super::hardware::OrderLine;
use super::svg::{
    chord_weld_call, corner_radius, end_weld_call, hole_diameter, hole_name, tab_weld_call,
};
use crate::checks::fasteners::{BoltLength, FastenerSet};
use crate::checks::{CheckResult, ConnectionReport, Report, Status};
use crate::model::HeadSide;
use crate::model::{Detail, DetailKind, End, Model, TabWeld};
use crate::standards::weld_notation::describe;
use crate::units::{Length, UnitSystem};
use serde::Serialize;
use std::collections::BTreeMap;

/// Everything a sheet template sees.
#[derive(Debug, Clone, Serialize)]
pub struct Context {
    pub title: TitleBlock,
    pub cautions: Vec<String>,
    pub summary: Summary,
    pub cutlist: Vec<CutRow>,
    pub cutlist_notes: Vec<String>,
    pub hardware: Vec<HardwareRow>,
    pub hardware_notes: Vec<String>,
    pub details: Vec<DetailSection>,
}

/// The title block: what the sheet is, which model and revision it comes from, who signs it.
#[derive(Debug, Clone, Serialize)]
pub struct TitleBlock {
    pub project: String,
    pub client: Option<String>,
    pub revision: String,
    pub standard: String,
    pub method: String,
    pub demand_factor: String,
    pub units: String,
    /// The model file's name, without its folder.
    pub model_file: String,
    pub model_sha256: String,
    pub tool_version: String,
    /// Whether the directional strength increase of AISC 360 J2.4 is used on fillet welds to tube
    /// walls: "on", "off" or "off (default)" (the project's `weld_directional_increase`).
    pub directional_increase: String,
    /// Sign-off rows: prepared, checked, approved (left blank for the people who sign).
    pub sign_off: Vec<&'static str>,
}

/// The summary: counts, the governing check, failures and warnings first.
#[derive(Debug, Clone, Serialize)]
pub struct Summary {
    /// "fail", "warn" or "pass" — never a statement of compliance.
    pub status: &'static str,
    pub verdict: String,
    pub members: usize,
    pub pieces: u32,
    pub connections: usize,
    pub fasteners: u32,
    pub governing: Option<Governing>,
    pub failures: Vec<Finding>,
    pub warnings: Vec<Finding>,
    pub unchecked_ends: Vec<String>,
}

/// The check with the highest ratio of the model.
#[derive(Debug, Clone, Serialize)]
pub struct Governing {
    pub connection: String,
    pub limit_state: String,
    pub subject: String,
    pub ratio: String,
    pub clause: String,
    pub status: &'static str,
}

/// A failure or warning, with every connection it occurs at.
#[derive(Debug, Clone, Serialize)]
pub struct Finding {
    pub what: String,
    pub clause: String,
    pub worst_ratio: String,
    pub note: String,
    pub at: Vec<String>,
}

/// One line of the hardware order as the sheet shows it.
#[derive(Debug, Clone, Serialize)]
pub struct HardwareRow {
    pub item: &'static str,
    pub product: String,
    pub grade: String,
    pub size: String,
    pub thread: String,
    pub length: String,
    pub finish: String,
    pub quantity: u32,
    pub spares: u32,
    pub order: u32,
}

/// One section of the sheet per connection detail.
#[derive(Debug, Clone, Serialize)]
pub struct DetailSection {
    pub id: String,
    pub kind: &'static str,
    /// An HTML id for links: "detail-ID".
    pub anchor: String,
    pub svg_file: String,
    /// The drawing, already escaped SVG (mark it safe in a template).
    pub svg: String,
    pub status: &'static str,
    pub uses: Vec<UseRow>,
    pub bolts: Vec<Row>,
    /// The stack of one bolt in words, one line per layer, as at `stack_at`.
    pub stack_sketch: Vec<String>,
    pub stack_at: String,
    /// Remarks and problems of the stack-up, for every use.
    pub stack_notes: Vec<String>,
    pub geometry: Vec<Row>,
    pub plates: Vec<String>,
    pub welds: Vec<String>,
    pub checks: Vec<CheckRow>,
    pub not_checked: Vec<String>,
    pub checklist: Vec<ChecklistGroup>,
}

/// A label and its value.
#[derive(Debug, Clone, Serialize)]
pub struct Row {
    pub label: String,
    pub value: String,
}

fn row(label: &str, value: impl Into<String>) -> Row {
    Row {
        label: label.to_string(),
        value: value.into(),
    }
}

/// One place a detail is used.
#[derive(Debug, Clone, Serialize)]
pub struct UseRow {
    pub connection: String,
    pub member: String,
    pub section: String,
    pub node: String,
    pub bolt_length: String,
    pub governing: String,
    pub ratio: String,
    pub status: &'static str,
}

/// One limit state of a detail at its worst use.
#[derive(Debug, Clone, Serialize)]
pub struct CheckRow {
    pub limit_state: String,
    pub subject: String,
    pub connection: String,
    pub load_case: String,
    pub demand: String,
    pub available: String,
    pub ratio: String,
    pub clause: String,
    pub status: &'static str,
    pub note: String,
}

/// A stage of the shop checklist, each item to be marked yes / no / n.a. and initialled.
#[derive(Debug, Clone, Serialize)]
pub struct ChecklistGroup {
    pub stage: &'static str,
    pub items: Vec<String>,
    /// Why the whole stage does not apply, when it does not.
    pub not_applicable: Option<String>,
}

/// Inputs of the context that come from the other parts of the sheet.
pub struct Parts<'a> {
    pub units: UnitSystem,
    pub fasteners: &'a [FastenerSet],
    pub order: &'a [OrderLine],
    pub cutlist: Vec<CutRow>,
    pub cutlist_notes: Vec<String>,
    pub hardware_notes: Vec<String>,
    pub pieces: u32,
    /// The drawing of each detail, by detail id.
    pub drawings: &'a BTreeMap<String, String>,
}

fn status_of(s: Status) -> &'static str {
    s.as_str()
}

fn clause(c: &CheckResult) -> String {
    c.citation.to_string()
}

/// The file name of a path, without its folder.
fn file_name(path: &str) -> String {
    std::path::Path::new(path)
        .file_name()
        .map(|n| n.to_string_lossy().into_owned())
        .unwrap_or_else(|| path.to_string())
}

/// The file name of a detail's drawing.
pub fn svg_file(detail: &str) -> String {
    format!("detail-{detail}.svg")
}

fn title_block(model: &Model, units: UnitSystem) -> TitleBlock {
    let p = &model.project;
    TitleBlock {
        project: p.title.clone(),
        client: p.client.clone(),
        revision: p.revision.clone(),
        standard: p.edition.standard().to_string(),
        method: p.method.name().to_string(),
        demand_factor: super::format::trim_decimals(p.demand_factor, 4),
        units: match units {
            UnitSystem::Us => "US customary (in, kip, ksi)".into(),
            UnitSystem::Si => "SI (mm, kN, MPa)".into(),
        },
        model_file: file_name(&model.file),
        model_sha256: model.hash.clone(),
        tool_version: env!("CARGO_PKG_VERSION").to_string(),
        directional_increase: {
            let d = p.weld_directional_increase;
            if d.set_by_model {
                d.as_str().to_string()
            } else {
                format!("{} (default)", d.as_str())
            }
        },
        sign_off: vec!["prepared", "checked", "approved"],
    }
}

/// The cautions the sheet carries, the tool's own first.
fn cautions() -> Vec<String> {
    vec![
        crate::report::CAUTION.to_string(),
        "The sheet shows what the model describes: check every dimension against the approved \
         drawings before cutting, drilling or welding."
            .to_string(),
        "A check that warns is met only with the engineer's judgement; a check that fails must be \
         resolved before fabrication."
            .to_string(),
    ]
}

/// Limit state, subject and clause: one finding of the summary.
type FindingKey = (String, String, String);

/// The checks of one status gathered by limit state, subject and clause, with their worst ratio
/// and every connection they occur at ("project" for a project check); for warnings, the limit
/// states not checked too.
fn findings(report: &Report, want: Status) -> Vec<Finding> {
    // key: limit state, subject, clause; value: worst ratio, first note, connections
    let mut map: BTreeMap<FindingKey, (f64, String, Vec<String>)> = BTreeMap::new();
    let mut order: Vec<FindingKey> = Vec::new();
    let project = report.project_checks.iter().map(|k| ("project", k));
    let all = report
        .connections
        .iter()
        .flat_map(|c| c.checks.iter().map(move |k| (c.id.as_str(), k)))
        .chain(project);
    {
        for (at, k) in all.filter(|(_, k)| k.status == want) {
            let key = (k.limit_state.to_string(), k.subject.clone(), clause(k));
            let e = map.entry(key.clone()).or_insert_with(|| {
                order.push(key.clone());
                (f64::NEG_INFINITY, k.notes.join("; "), Vec::new())
            });
            let r = if k.ratio.is_nan() {
                f64::INFINITY
            } else {
                k.ratio
            };
            e.0 = e.0.max(r);
            if !e.2.iter().any(|x| x == at) {
                e.2.push(at.to_string());
            }
        }
    }
    let mut out: Vec<Finding> = order
        .into_iter()
        .map(|key| {
            let (worst, note, at) = map.remove(&key).unwrap_or_default();
            Finding {
                what: format!("{} ({})", key.0, key.1),
                clause: key.2,
                worst_ratio: ratio(worst),
                note,
                at,
            }
        })
        .collect();
    if want == Status::Warn {
        let mut not_checked: BTreeMap<&str, Vec<String>> = BTreeMap::new();
        let mut seen = Vec::new();
        for c in &report.connections {
            for n in &c.not_checked {
                if !not_checked.contains_key(n.as_str()) {
                    seen.push(n.as_str());
                }
                not_checked
                    .entry(n.as_str())
                    .or_default()
                    .push(c.id.clone());
            }
        }
        for n in seen {
            out.push(Finding {
                what: "not checked".into(),
                clause: String::new(),
                worst_ratio: "—".into(),
                note: n.to_string(),
                at: not_checked.remove(n).unwrap_or_default(),
            });
        }
    }
    out
}

fn governing(report: &Report) -> Option<Governing> {
    report
        .connections
        .iter()
        .filter_map(|c| c.governing().map(|g| (c, g)))
        .max_by(|(_, a), (_, b)| {
            let r = |k: &CheckResult| {
                if k.ratio.is_nan() {
                    f64::INFINITY
                } else {
                    k.ratio
                }
            };
            r(a).total_cmp(&r(b))
        })
        .map(|(c, g)| Governing {
            connection: c.id.clone(),
            limit_state: g.limit_state.to_string(),
            subject: g.subject.clone(),
            ratio: ratio(g.ratio),
            clause: clause(g),
            status: status_of(g.status),
        })
}

fn summary(model: &Model, report: &Report, parts: &Parts) -> Summary {
    let failures = findings(report, Status::Fail);
    let mut warnings = findings(report, Status::Warn);
    let unsettled: Vec<String> = parts
        .fasteners
        .iter()
        .filter(|f| f.length.length().is_none())
        .map(|f| f.connection.clone())
        .collect();
    for d in &model.details {
        if let DetailKind::Sleeve(sl) = &d.kind {
            if sl.welded_into.is_some() {
                warnings.push(Finding {
                    what: format!("sleeve shop weld ({})", d.id),
                    clause: String::new(),
                    worst_ratio: "—".into(),
                    note: "the model gives no size, type or length for the weld of the sleeve into its member: not checked"
                        .into(),
                    at: report
                        .connections
                        .iter()
                        .filter(|c| c.detail == d.id)
                        .map(|c| c.id.clone())
                        .collect(),
                });
            }
        }
    }
    if !unsettled.is_empty() {
        warnings.insert(
            0,
            Finding {
                what: "bolt length".into(),
                clause: String::new(),
                worst_ratio: "—".into(),
                note: "no bolt length is settled for these connections: the hardware order is not complete"
                    .into(),
                at: unsettled,
            },
        );
    }
    let status = report.status();
    let failing = report
        .connections
        .iter()
        .filter(|c| c.status() == Status::Fail)
        .count();
    let warning = report
        .connections
        .iter()
        .filter(|c| c.status() == Status::Warn)
        .count();
    let project_flagged = report
        .project_checks
        .iter()
        .filter(|k| k.status != Status::Pass)
        .count();
    let mut verdict = match status {
        Status::Fail => format!(
            "{failing} of {} connections FAIL at least one check: they must be resolved before \
             fabrication. {warning} more carry warnings.",
            report.connections.len()
        ),
        Status::Warn => format!(
            "No check fails; {warning} of {} connections carry warnings that need the engineer's \
             judgement (listed below). This is not a statement of compliance.",
            report.connections.len()
        ),
        Status::Pass => format!(
            "No check fails or warns among the {} connections for the limit states listed in each \
             detail. This is not a statement of compliance: the engineer of record reviews the \
             sheet.",
            report.connections.len()
        ),
    };
    if project_flagged > 0 {
        verdict.push_str(&format!(
            " {project_flagged} project check{} (the whole project, listed below) also fail or warn.",
            if project_flagged == 1 { "" } else { "s" }
        ));
    }
    Summary {
        status: status_of(status),
        verdict,
        members: model.members.len(),
        pieces: parts.pieces,
        connections: report.connections.len(),
        fasteners: parts.fasteners.iter().map(|f| f.bolt_count).sum(),
        governing: governing(report),
        failures,
        warnings,
        unchecked_ends: report.unchecked_ends.clone(),
    }
}

/// The node at a member end.
fn node_at(model: &Model, member: &str, end: End) -> String {
    model
        .members
        .iter()
        .find(|m| m.id == member)
        .map(|m| match end {
            End::Start => m.from.clone(),
            End::End => m.to.clone(),
        })
        .unwrap_or_default()
}

fn bolt_length_text(set: Option<&FastenerSet>, units: UnitSystem) -> String {
    match set.map(|s| &s.length) {
        Some(BoltLength::Chosen(l)) => length(*l, units, false),
        Some(BoltLength::Fixed(l)) => format!("{} (fixed by the detail)", length(*l, units, false)),
        Some(BoltLength::NoneFits { reason, .. }) => format!("none fits: {reason}"),
        Some(BoltLength::Unknown) | None => "not worked out".into(),
    }
}

fn uses(
    model: &Model,
    conns: &[&ConnectionReport],
    sets: &[FastenerSet],
    units: UnitSystem,
) -> Vec<UseRow> {
    conns
        .iter()
        .map(|c| {
            let g = c.governing();
            UseRow {
                connection: c.id.clone(),
                member: c.member.clone(),
                section: model
                    .members
                    .iter()
                    .find(|m| m.id == c.member)
                    .map(|m| m.section.name.clone())
                    .unwrap_or_default(),
                node: node_at(model, &c.member, c.end),
                bolt_length: bolt_length_text(sets.iter().find(|s| s.connection == c.id), units),
                governing: g
                    .map(|g| format!("{} ({})", g.limit_state, g.subject))
                    .unwrap_or_else(|| "—".into()),
                ratio: g.map(|g| ratio(g.ratio)).unwrap_or_else(|| "—".into()),
                status: status_of(c.status()),
            }
        })
        .collect()
}

/// Each limit state of the detail at the use where its ratio is highest (a fail before a warn at
/// equal ratios), in the order the checks run.
fn worst_checks(conns: &[&ConnectionReport], units: UnitSystem) -> Vec<CheckRow> {
    let mut worst: Vec<((String, String, String), &ConnectionReport, &CheckResult)> = Vec::new();
    let key_of = |k: &CheckResult| (k.limit_state.to_string(), k.subject.clone(), clause(k));
    let rank = |k: &CheckResult| {
        (
            if k.ratio.is_nan() {
                f64::INFINITY
            } else {
                k.ratio
            },
            k.status,
        )
    };
    for c in conns {
        for k in &c.checks {
            let key = key_of(k);
            match worst.iter_mut().find(|(w, _, _)| *w == key) {
                Some(slot) => {
                    let (r0, s0) = rank(slot.2);
                    let (r1, s1) = rank(k);
                    if r1 > r0 || (r1 == r0 && s1 > s0) {
                        slot.1 = c;
                        slot.2 = k;
                    }
                }
                None => worst.push((key, c, k)),
            }
        }
    }
    worst
        .into_iter()
        .map(|(_, c, k)| CheckRow {
            limit_state: k.limit_state.to_string(),
            subject: k.subject.clone(),
            connection: c.id.clone(),
            load_case: k.load_case.clone().unwrap_or_else(|| "—".into()),
            demand: quantity(k.demand, units),
            available: quantity(k.available, units),
            ratio: ratio(k.ratio),
            clause: clause(k),
            status: status_of(k.status),
            note: k.notes.join("; "),
        })
        .collect()
}

fn bolt_rows(model: &Model, d: &Detail, set: Option<&FastenerSet>, units: UnitSystem) -> Vec<Row> {
    let b = &d.bolts;
    let mut rows = vec![
        row(
            "bolt",
            format!(
                "{} {}, {}",
                b.thread.designation, b.bolt_type.name, b.grade.name
            ),
        ),
        row(
            "bolts at each end",
            format!(
                "{} ({} line{} across × {} along)",
                b.count(),
                b.across,
                if b.across == 1 { "" } else { "s" },
                b.along
            ),
        ),
        row("bolt length", bolt_length_text(set, units)),
        row("nut", nut_text(b)),
    ];
    match set {
        Some(s) => {
            rows.push(row("spec", s.spec.clone()));
            let washers: Vec<String> = s
                .washers
                .iter()
                .map(|w| format!("{} {}", w.name, w.side.as_str()))
                .collect();
            rows.push(row(
                "washers",
                if washers.is_empty() {
                    "none".to_string()
                } else {
                    washers.join(", ")
                },
            ));
            rows.push(row(
                "entering side (head)",
                match (&d.kind, s.head_side) {
                    (_, Some(HeadSide::Mate)) => "head on the mate side, nut on the tab side",
                    (_, Some(HeadSide::Tab)) => "head on the tab side, nut on the mate side",
                    (DetailKind::Tab(_), None) => "either side: the stack is the same both ways",
                    (DetailKind::Sleeve(_), None) => {
                        "either side: the stack through the tubes is the same both ways"
                    }
                    (DetailKind::Tapped(_), None) => {
                        "head on the plate: the screw threads into the plug"
                    }
                },
            ));
            if let Some(g) = s.grip {
                rows.push(row("grip", length(g, units, false)));
            }
            if let Some(st) = s.stickout {
                rows.push(row(
                    "stick-out past the nut",
                    format!(
                        "{} ({:.1} threads)",
                        length(st.length, units, false),
                        st.threads
                    ),
                ));
            }
        }
        None => rows.push(row(
            "stack",
            "no fastener set: the stack-up was not worked out",
        )),
    }
    rows.push(row(
        "hole",
        match hole_diameter(model, b) {
            Some(h) => format!(
                "{} ({}{})",
                length(h, units, false),
                hole_name(b),
                if b.hole_override.is_some() {
                    ""
                } else {
                    ", Table J3.3"
                }
            ),
            None => "not given by Table J3.3 for this bolt: see the checks".into(),
        },
    ));
    rows
}

fn geometry_rows(d: &Detail, units: UnitSystem) -> Vec<Row> {
    let b = &d.bolts;
    let l = |x: Length| length(x, units, false);
    let mut rows = Vec::new();
    if let Some(p) = b.pitch {
        rows.push(row("pitch (along the force)", l(p)));
    }
    if let Some(g) = b.gauge {
        rows.push(row("gauge (across the force)", l(g)));
    }
    match &d.kind {
        DetailKind::Tab(t) => {
            let g = b.gauge.unwrap_or(Length::mm(0.0));
            let edge = (t.tab.width - g * f64::from(b.across.saturating_sub(1))) * 0.5;
            rows.push(row("tab end distance (free end)", l(t.tab.end_distance)));
            rows.push(row("tab edge distance (sides)", l(edge)));
            rows.push(row(
                "tab clear length (bolt to tube end)",
                l(t.tab.clear_length),
            ));
            rows.push(row(
                "mate end distance (member side)",
                l(t.mate.end_distance),
            ));
            rows.push(row(
                "mate back distance (far side)",
                l(t.mate.back_distance),
            ));
            let medge = (t.mate.width - g * f64::from(b.across.saturating_sub(1))) * 0.5;
            rows.push(row("mate edge distance (sides)", l(medge)));
            match &t.weld {
                TabWeld::Slot(w) => {
                    rows.push(row(
                        "slot width (tab + gap)",
                        l(t.tab.thickness + w.slot_gap),
                    ));
                    rows.push(row("slot depth (tab in the tube)", l(w.length)));
                }
                TabWeld::FlareBevel(w) => {
                    rows.push(row("tab lap on the tube face", l(w.length)));
                }
            }
        }
        DetailKind::Sleeve(s) => {
            rows.push(row("end distance (member end to bolt)", l(s.end_distance)));
            rows.push(row("sleeve insertion into each member", l(s.insertion)));
        }
        DetailKind::Tapped(t) => {
            rows.push(row("plate under the head", l(t.plate.thickness)));
            rows.push(row("plug thickness", l(t.plug.thickness)));
            rows.push(row("thread engaged in the plug", l(t.plug.engagement)));
        }
    }
    rows
}

/// The nut of a detail in words; a tapped detail has none.
fn nut_text(b: &crate::model::Bolting) -> String {
    match (&b.nut, &b.nut_grade) {
        (Some(n), Some(g)) => format!("{}, {}", n.name, g.name),
        _ => "none: the screw threads into the tapped plug".into(),
    }
}

fn plate_lines(d: &Detail, units: UnitSystem) -> Vec<String> {
    let l = |x: Length| length(x, units, false);
    match &d.kind {
        DetailKind::Tab(t) => {
            let p = d.bolts.pitch.unwrap_or(Length::mm(0.0));
            let along = f64::from(d.bolts.along.saturating_sub(1));
            let tab_len = t.tab.end_distance + p * along + t.tab.clear_length + t.weld.length();
            let mate = match &t.on_chord {
                None => format!(
                    "mate: {} PL {} × {} wide, {} (its outline and free length come from the joint it belongs to)",
                    t.mate.count,
                    l(t.mate.thickness),
                    l(t.mate.width),
                    t.mate.material.name
                ),
                Some(oc) => format!(
                    "mate: {} PL {} × {} wide, {}, shop-welded {} to the face of chord {} at the node of each member end (it goes with the chord's piece); welded length {}",
                    t.mate.count,
                    l(t.mate.thickness),
                    l(t.mate.width),
                    t.mate.material.name,
                    oc.plate.as_str(),
                    oc.names(),
                    l(oc.welded_length(&t.mate))
                ),
            };
            vec![
                format!(
                    "tab: PL {} × {} × {} long, {}",
                    l(t.tab.thickness),
                    l(t.tab.width),
                    l(tab_len),
                    t.tab.material.name
                ),
                mate,
            ]
        }
        DetailKind::Sleeve(s) => vec![format!(
            "sleeve: {} × {} long ({} into each member), {}",
            s.section.name,
            l(s.insertion * 2.0),
            l(s.insertion),
            s.material.name
        )],
        DetailKind::Tapped(t) => vec![
            format!(
                "plug: {} thick, the tube's outline, {}, tapped {} through",
                l(t.plug.thickness),
                t.plug.material.name,
                d.bolts.thread.designation
            ),
            format!(
                "plate under the head: PL {}, {} (it belongs to the part it is cut from)",
                l(t.plate.thickness),
                t.plate.material.name
            ),
        ],
    }
}

fn weld_lines(model: &Model, d: &Detail, units: UnitSystem) -> Vec<String> {
    match &d.kind {
        DetailKind::Tab(t) => {
            let call = match describe(&tab_weld_call(t, corner_radius(model, &d.id)), units) {
                Ok(s) => s,
                Err(e) => format!("the weld call cannot be written: {e}"),
            };
            let joint = match &t.weld {
                TabWeld::Slot(_) => "four lines, both faces of the tab at both slotted walls",
                TabWeld::FlareBevel(_) => {
                    "two lines, one along each edge of the tab where it meets a rounded corner of \
                     the tube; effective throat in parentheses (Table J2.2, groove filled flush)"
                }
            };
            let mut lines = vec![format!(
                "{call}: {joint}, electrode {} ({})",
                t.weld.electrode().name,
                t.weld.electrode().standard
            )];
            if let Some(oc) = &t.on_chord {
                let call = match describe(&chord_weld_call(t, oc), units) {
                    Ok(s) => s,
                    Err(e) => format!("the weld call cannot be written: {e}"),
                };
                lines.push(format!(
                    "{call}: mate to the face of chord {}, {} along the plate's welded edge, electrode {} ({})",
                    oc.names(),
                    if oc.weld.sides == 2 { "one fillet each side" } else { "one fillet, one side" },
                    oc.weld.electrode.name,
                    oc.weld.electrode.standard
                ));
            }
            lines
        }
        DetailKind::Sleeve(s) => match sleeve_weld_gap(s) {
            Some(gap) => vec![gap],
            None => Vec::new(),
        },
        DetailKind::Tapped(t) => {
            let call = match describe(&end_weld_call(t), units) {
                Ok(s) => s,
                Err(e) => format!("the weld call cannot be written: {e}"),
            };
            vec![format!(
                "{call}: one fillet all round the tube end to the plug, electrode {} ({})",
                t.weld.electrode.name, t.weld.electrode.standard
            )]
        }
    }
}

/// The shop weld of a sleeve welded into one member, which the model describes by no size,
/// type or length: said in words so nobody welds it by guess.
fn sleeve_weld_gap(s: &crate::model::SleeveDetail) -> Option<String> {
    s.welded_into.map(|end| {
        format!(
            "the sleeve is welded in the shop into the member whose {} end has this detail; \
             the model gives no size, type or length for that weld: it is not drawn or checked \
             here and the engineer must detail it",
            end.as_str()
        )
    })
}

fn checklist(
    d: &Detail,
    set: Option<&FastenerSet>,
    model: &Model,
    units: UnitSystem,
) -> Vec<ChecklistGroup> {
    let l = |x: Length| length(x, units, false);
    let b = &d.bolts;
    let hole = hole_diameter(model, b)
        .map(l)
        .unwrap_or_else(|| "as the checks give".into());
    let mut fit = vec!["Piece marks, sections and materials match the cut list".to_string()];
    let (before, during, after, welding_na) = match &d.kind {
        DetailKind::Tab(t) => {
            let tab_fit = format!(
                "Tab {} thick, {} holes ⌀ {}, end {}, edges and pitch as drawn",
                l(t.tab.thickness),
                b.count(),
                hole,
                l(t.tab.end_distance)
            );
            let before = vec![
                format!(
                    "Electrode {} as the welding procedure names",
                    t.weld.electrode().name
                ),
                "Welder qualified for the process and position".to_string(),
                "Weld areas clean, dry, free of coating and mill scale".to_string(),
            ];
            let visual = "Visual inspection: no cracks, undercut or unfilled craters; slag removed"
                .to_string();
            match &t.weld {
                TabWeld::Slot(w) => {
                    fit.push(format!(
                        "Slot {} wide, {} deep, through both walls, on the member axis",
                        l(t.tab.thickness + w.slot_gap),
                        l(w.length)
                    ));
                    fit.push(tab_fit);
                    fit.push(format!(
                        "Tab in the slot {} deep, centred, {} clear from the tube end to the nearest hole",
                        l(w.length),
                        l(t.tab.clear_length)
                    ));
                    (
                        before,
                        vec![
                            format!("Fillet leg {} on all four lines", l(w.size)),
                            "Preheat and interpass temperature as the welding procedure"
                                .to_string(),
                        ],
                        vec![
                            format!("Each of the four welds {} long, size gauged", l(w.length)),
                            visual,
                        ],
                        None,
                    )
                }
                TabWeld::FlareBevel(w) => {
                    fit.push(tab_fit);
                    fit.push(format!(
                        "Tab lapped {} on the tube face, its edges flush with the tube's sides, {} clear from the tube end to the nearest hole",
                        l(w.length),
                        l(t.tab.clear_length)
                    ));
                    (
                        before,
                        vec![
                            format!(
                                "Process {} as the throat of Table J2.2 assumes; both grooves filled flush with the tube's sides",
                                w.process.label()
                            ),
                            "Preheat and interpass temperature as the welding procedure"
                                .to_string(),
                        ],
                        vec![
                            format!(
                                "Each of the two flare-bevel welds {} long, filled flush (no underfill)",
                                l(w.length)
                            ),
                            visual,
                        ],
                        None,
                    )
                }
            }
        }
        DetailKind::Sleeve(s) => {
            fit.push(format!(
                "Sleeve {} reaches {} into each member; member ends meet",
                s.section.name,
                l(s.insertion)
            ));
            fit.push(format!(
                "Holes ⌀ {} through both walls of member and sleeve, {} from the member end",
                hole,
                l(s.end_distance)
            ));
            match sleeve_weld_gap(s) {
                Some(_) => (
                    vec![
                        "Sleeve weld size, type and length as the engineer details them (not in the model)"
                            .to_string(),
                        format!(
                            "Sleeve set {} into the member it is welded into before welding",
                            l(s.insertion)
                        ),
                        "Welder qualified for the process and position".to_string(),
                    ],
                    vec!["Weld as the welding procedure and the engineer's detail".to_string()],
                    vec![
                        "Visual inspection: no cracks, undercut or unfilled craters; slag removed"
                            .to_string(),
                    ],
                    None,
                ),
                None => (
                    Vec::new(),
                    Vec::new(),
                    Vec::new(),
                    Some("no welds in this detail".to_string()),
                ),
            }
        }
        DetailKind::Tapped(t) => {
            fit.push(format!(
                "Plug {} thick on the tube end, square to the axis, tapped {} on the axis",
                l(t.plug.thickness),
                b.thread.designation
            ));
            fit.push(format!(
                "Plate under the head {} thick, hole ⌀ {}",
                l(t.plate.thickness),
                hole
            ));
            (
                vec![
                    format!(
                        "Electrode {} as the welding procedure names",
                        t.weld.electrode.name
                    ),
                    "Welder qualified for the process and position".to_string(),
                    "Tapped thread protected from spatter".to_string(),
                ],
                vec![format!(
                    "Fillet leg {} all round the tube end",
                    l(t.weld.size)
                )],
                vec![
                    "Weld all round, size gauged; thread re-gauged after welding".to_string(),
                    "Visual inspection: no cracks, undercut or unfilled craters; slag removed"
                        .to_string(),
                ],
                None,
            )
        }
    };
    let bolting = vec![
        format!(
            "{} bolts {} {}, length {}, from this connection's kit",
            b.count(),
            b.thread.designation,
            b.grade.name,
            match set.and_then(|f| f.length.length()) {
                Some(x) => l(x),
                None => "not settled: ask the engineer".into(),
            }
        ),
        match (&b.nut, &b.nut_grade) {
            (Some(n), Some(g)) => format!("Nuts {}, {}", n.name, g.name),
            _ => "No nut: the screw threads into the tapped plug; engagement as drawn".to_string(),
        },
        match set.map(|s| s.washers.as_slice()) {
            Some(ws) if !ws.is_empty() => format!(
                "Washers: {}",
                ws.iter()
                    .map(|w| format!("{} {}", w.name, w.side.as_str()))
                    .collect::<Vec<_>>()
                    .join(", ")
            ),
            _ => "No washer in the stack: confirm with the engineer".to_string(),
        },
        match set.and_then(|s| s.head_side) {
            Some(HeadSide::Mate) => "Bolt heads on the mate side".to_string(),
            Some(HeadSide::Tab) => "Bolt heads on the tab side".to_string(),
            None => "Bolts enter from either side".to_string(),
        },
        "Tightened as the engineer of record specifies".to_string(),
    ];
    let mut bolting = bolting;
    bolting.push(if b.nut.is_some() {
        "Bolt end at least flush with the outer face of the nut".to_string()
    } else {
        "Tapped thread clean and gauged before the screw goes in".to_string()
    });
    let stage = |name, items: Vec<String>, na: &Option<String>| ChecklistGroup {
        stage: name,
        not_applicable: if items.is_empty() { na.clone() } else { None },
        items,
    };
    vec![
        stage("fit-up", fit, &None),
        stage("welding: before", before, &welding_na),
        stage("welding: during", during, &welding_na),
        stage("welding: after", after, &welding_na),
        stage("bolting", bolting, &None),
    ]
}

fn detail_section(model: &Model, report: &Report, d: &Detail, parts: &Parts) -> DetailSection {
    let units = parts.units;
    let conns: Vec<&ConnectionReport> = report
        .connections
        .iter()
        .filter(|c| c.detail == d.id)
        .collect();
    let f = parts.fasteners.iter().find(|f| f.detail == d.id);
    let mut stack_notes: Vec<String> = Vec::new();
    for s in parts.fasteners.iter().filter(|s| s.detail == d.id) {
        for n in s.problems.iter().chain(&s.notes) {
            if !stack_notes.contains(n) {
                stack_notes.push(n.clone());
            }
        }
    }
    let status = conns
        .iter()
        .map(|c| c.status())
        .max()
        .unwrap_or(Status::Warn);
    let mut not_checked: Vec<String> = Vec::new();
    for c in &conns {
        for n in &c.not_checked {
            if !not_checked.contains(n) {
                not_checked.push(n.clone());
            }
        }
    }
    if conns.is_empty() {
        not_checked.push("the detail is not used at any member end".into());
    }
    if let DetailKind::Sleeve(sl) = &d.kind {
        if sl.welded_into.is_some() {
            not_checked.push("the shop weld of the sleeve: the model gives no size or type".into());
        }
    }
    DetailSection {
        id: d.id.clone(),
        kind: d.kind.name(),
        anchor: format!("detail-{}", d.id),
        svg_file: svg_file(&d.id),
        svg: parts.drawings.get(&d.id).cloned().unwrap_or_default(),
        status: status_of(status),
        uses: uses(model, &conns, parts.fasteners, units),
        bolts: bolt_rows(model, d, f, units),
        stack_sketch: f
            .map(|s| s.sketch.lines().map(str::to_string).collect())
            .unwrap_or_default(),
        stack_at: f.map(|s| s.connection.clone()).unwrap_or_default(),
        stack_notes,
        geometry: geometry_rows(d, units),
        plates: plate_lines(d, units),
        welds: weld_lines(model, d, units),
        checks: worst_checks(&conns, units),
        not_checked,
        checklist: checklist(d, f, model, units),
    }
}

/// The whole context.
pub fn build(model: &Model, report: &Report, parts: Parts) -> Context {
    let hardware = parts
        .order
        .iter()
        .map(|o| HardwareRow {
            item: o.item.kind.as_str(),
            product: o.item.product.clone(),
            grade: o.item.grade.clone(),
            size: o.item.size.clone(),
            thread: o.item.thread.clone(),
            length: o.item.length.clone(),
            finish: o.item.finish.clone(),
            quantity: o.quantity,
            spares: o.spares,
            order: o.order,
        })
        .collect();
    Context {
        title: title_block(model, parts.units),
        cautions: cautions(),
        summary: summary(model, report, &parts),
        cutlist: parts.cutlist.clone(),
        cutlist_notes: parts.cutlist_notes.clone(),
        hardware,
        hardware_notes: parts.hardware_notes.clone(),
        details: model
            .details
            .iter()
            .map(|d| detail_section(model, report, d, &parts))
            .collect(),
    }
}
