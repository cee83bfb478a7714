//! The joint checks: for every member end with a connection detail, every limit state of that
//! detail, for the enveloped tension and compression of the member's load cases with the demand
//! factor applied. Each result is a [`CheckResult`] carrying its clause, equation and inputs.

pub mod bolting;
pub mod chord_face;
pub mod fastener_rows;
pub mod fasteners;
pub mod fasteners_tapped;
pub mod project;
pub mod record;
pub mod sleeve;
pub mod sleeve_fit;
pub mod tab;
mod tab_welds;
pub mod tapped;
pub mod weld_kds;

pub use record::{CheckResult, Factor, Status};

use crate::model::{DetailKind, End, Member, Model};
use crate::standards::aisc360::input::InputError;
use crate::standards::Citation;
use crate::units::{Force, Quantity};

/// The checks of one member end.
#[derive(Debug, Clone)]
pub struct ConnectionReport {
    /// "MEMBER/start" or "MEMBER/end".
    pub id: String,
    pub member: String,
    pub end: End,
    pub detail: String,
    pub kind: &'static str,
    pub checks: Vec<CheckResult>,
    /// Limit states that apply but could not be evaluated, with the reason; each makes the
    /// connection `warn` at best.
    pub not_checked: Vec<String>,
}

impl ConnectionReport {
    /// The check with the highest ratio.
    pub fn governing(&self) -> Option<&CheckResult> {
        self.checks.iter().max_by(|a, b| {
            let r = |c: &CheckResult| {
                if c.ratio.is_nan() {
                    f64::INFINITY
                } else {
                    c.ratio
                }
            };
            r(a).total_cmp(&r(b)).then(a.status.cmp(&b.status))
        })
    }

    /// The worst status of the connection.
    pub fn status(&self) -> Status {
        let worst = self
            .checks
            .iter()
            .map(|c| c.status)
            .max()
            .unwrap_or(Status::Warn);
        if worst == Status::Pass && !self.not_checked.is_empty() {
            Status::Warn
        } else {
            worst
        }
    }
}

/// The checks of a whole model.
#[derive(Debug, Clone)]
pub struct Report {
    pub connections: Vec<ConnectionReport>,
    /// Member ends without a detail ("none"), listed so nothing is skipped silently.
    pub unchecked_ends: Vec<String>,
    /// Checks of the whole project (see [`project`]): JSON `project_checks`.
    pub project_checks: Vec<CheckResult>,
}

impl Report {
    /// The worst status of the connections and the project checks.
    pub fn status(&self) -> Status {
        self.connections
            .iter()
            .map(|c| c.status())
            .chain(self.project_checks.iter().map(|c| c.status))
            .max()
            .unwrap_or(Status::Pass)
    }
}

/// The governing demands on a member end: the largest tension and the largest compression of
/// its load cases, times the demand factor. Forces are magnitudes.
#[derive(Debug, Clone)]
pub struct Envelope {
    pub tension: Option<(Force, String)>,
    pub compression: Option<(Force, String)>,
}

impl Envelope {
    /// The larger of the two, for limit states that do not depend on the sense of the force.
    pub fn governing(&self) -> (Force, String) {
        match (&self.tension, &self.compression) {
            (Some(t), Some(c)) => {
                if c.0 > t.0 {
                    c.clone()
                } else {
                    t.clone()
                }
            }
            (Some(t), None) => t.clone(),
            (None, Some(c)) => c.clone(),
            (None, None) => (Force::n(0.0), String::new()),
        }
    }
}

/// The envelope of a member's forces. A member whose forces are all zero gets a zero tension.
pub fn envelope(model: &Model, member: &str) -> Envelope {
    let f = model.project.demand_factor;
    let mut tension: Option<(Force, String)> = None;
    let mut compression: Option<(Force, String)> = None;
    let mut any = None;
    for r in model.forces.iter().filter(|r| r.member == member) {
        let p = r.axial * f;
        any.get_or_insert_with(|| r.case.clone());
        if p.si() > 0.0 && tension.as_ref().map_or(true, |t| p > t.0) {
            tension = Some((p, r.case.clone()));
        }
        if p.si() < 0.0 && compression.as_ref().map_or(true, |c| p.abs() > c.0) {
            compression = Some((p.abs(), r.case.clone()));
        }
    }
    if tension.is_none() && compression.is_none() {
        tension = any.map(|c| (Force::n(0.0), c));
    }
    Envelope {
        tension,
        compression,
    }
}

/// A check that could not be computed because the geometry makes it meaningless (a hole that
/// reaches the edge, holes that remove the whole section): it fails, with the reason.
pub fn impossible(
    limit_state: &'static str,
    subject: &str,
    citation: Citation,
    e: InputError,
) -> CheckResult {
    CheckResult {
        limit_state,
        subject: subject.to_string(),
        load_case: None,
        citation,
        formula: String::new(),
        inputs: Vec::new(),
        nominal: None,
        factor: None,
        available: Quantity::number(0.0),
        demand: Quantity::number(0.0),
        bound: None,
        ratio: f64::INFINITY,
        status: Status::Fail,
        notes: vec![format!(
            "cannot be evaluated: {e}; the geometry must change"
        )],
    }
}

/// Check every connection of the model.
pub fn check_model(model: &Model) -> Report {
    let mut connections = Vec::new();
    let mut unchecked_ends = Vec::new();
    for m in &model.members {
        for (end, detail) in [(End::Start, &m.start), (End::End, &m.end)] {
            let id = format!("{}/{}", m.id, end.as_str());
            match detail {
                None => unchecked_ends.push(id),
                Some(d) => connections.push(check_connection(model, m, end, d, id)),
            }
        }
    }
    Report {
        connections,
        unchecked_ends,
        project_checks: project::project_checks(model),
    }
}

fn check_connection(
    model: &Model,
    m: &Member,
    end: End,
    detail_id: &str,
    id: String,
) -> ConnectionReport {
    let detail = model
        .details
        .iter()
        .find(|d| d.id == detail_id)
        .expect("detail references are validated when the model is read");
    let env = envelope(model, &m.id);
    let mut report = ConnectionReport {
        id,
        member: m.id.clone(),
        end,
        detail: detail.id.clone(),
        kind: detail.kind.name(),
        checks: Vec::new(),
        not_checked: Vec::new(),
    };
    let set = fasteners::fastener_set(model, m, end, &detail.id, &detail.bolts, &detail.kind);
    match &detail.kind {
        DetailKind::Tab(t) => {
            tab::check_tab(model, m, &detail.bolts, t, &set, &env, &mut report);
            match &t.on_chord {
                Some(oc) => chord_face::check_chord_face(model, m, end, t, oc, &env, &mut report),
                None => report.not_checked.push(
                    "the mate's support: the model does not say what the mate is welded to (no \
                     `on_chord`), so that weld and the member wall under it are not checked"
                        .into(),
                ),
            }
        }
        DetailKind::Sleeve(s) => {
            sleeve::check_sleeve(model, m, &detail.bolts, s, &set, &env, &mut report);
            sleeve_fit::check_sleeve_fit(model, m, s, &mut report);
        }
        DetailKind::Tapped(t) => {
            tapped::check_tapped(model, m, &detail.bolts, t, &env, &mut report)
        }
    }
    fastener_rows::push_stack_checks(model.project.edition, &detail.bolts, &set, &mut report);
    flag_typical_materials(model, m, detail, &mut report);
    report
}

/// The materials of a connection whose strengths are typical values, not a standard's specified
/// minimums (the catalogue's `specified_minimum = false`): every strength that reads a plate or
/// tube material is then `warn` at best, since the standard's strengths assume specified
/// minimums. Bolt-only strengths (shear, tension of the bolt) read the bolt grade alone.
fn flag_typical_materials(
    model: &Model,
    m: &Member,
    detail: &crate::model::Detail,
    report: &mut ConnectionReport,
) {
    let mut used = vec![&m.material];
    match &detail.kind {
        DetailKind::Tab(t) => {
            used.extend([&t.tab.material, &t.mate.material]);
            if let Some(oc) = &t.on_chord {
                used.extend(
                    oc.chords
                        .iter()
                        .filter_map(|c| model.members.iter().find(|mm| mm.id == c.id))
                        .map(|c| &c.material),
                );
            }
        }
        DetailKind::Sleeve(s) => used.push(&s.material),
        DetailKind::Tapped(t) => used.extend([&t.plate.material, &t.plug.material]),
    }
    let mut typical: Vec<&str> = used
        .iter()
        .filter(|mat| !mat.specified_minimum)
        .map(|mat| mat.name.as_str())
        .collect();
    typical.sort_unstable();
    typical.dedup();
    if typical.is_empty() {
        return;
    }
    let reason = format!(
        "the strengths of {} are typical values, not a standard's specified minimums; the standard's strengths assume specified minimums (A3.1)",
        typical.join(", ")
    );
    for c in &mut report.checks {
        if c.nominal.is_some() && !matches!(c.limit_state, "bolt_shear" | "bolt_tension") {
            *c = c.clone().out_of_scope(reason.clone());
        }
    }
}
