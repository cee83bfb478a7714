//! The fastener set of every connection: the hardware, the stack of plies from the head side,
//! the grip, the bolt length chosen from the catalogue series (or the length the detail fixes),
//! the stick-out, the thread condition at each shear plane, the spec line and a text sketch.
//! The checks, the fabrication sheet and the hardware list all read this one record.

use crate::catalogue::{Nut, Washer};
use crate::model::{Bolting, DetailKind, End, HeadSide, Member, Model, SleeveDetail, TabDetail};
use crate::stackup::planes::{plane_positions, plane_threads, PlanePosition, PlaneThreads};
use crate::stackup::text::{fastener_spec, stack_sketch, SketchParts, SpecParts};
use crate::stackup::{
    self, grip, length_checks_with_thread, thread_layout, BoltType, LengthRules, Ply, PlyKind,
    StackError, StickoutRule,
};
use crate::standards::{Citation, Requirement};
use crate::units::Length;

/// Transition (run-out) thread allowed for, in thread pitches: five pitches, the largest
/// transition of ASME B18.2.1 hex bolts (Y max ≈ 5P) and the ISO 4014 rule
/// ls,min = lg,max − 5P — from memory; taken for every bolt type, which is conservative for
/// the shear planes of structural bolts whose transition is shorter.
pub const TRANSITION_PITCHES: f64 = 5.0;

/// Full threads a nylon-insert nut needs beyond its far face so the insert is fully engaged
/// (common practice, no clause at hand).
pub const INSERT_EXTRA_PITCHES: u32 = 2;

/// Where a washer sits.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum WasherSide {
    /// Between the bolt head and the first ply.
    Head,
    /// Between the last ply and the nut.
    Nut,
}

impl WasherSide {
    pub fn as_str(self) -> &'static str {
        match self {
            WasherSide::Head => "under head",
            WasherSide::Nut => "under nut",
        }
    }
}

/// One washer of the set.
#[derive(Debug, Clone, PartialEq)]
pub struct WasherUse {
    /// Catalogue name, e.g. "ASTM F436".
    pub name: String,
    pub standard: String,
    pub side: WasherSide,
    /// Greatest thickness (used for the least stick-out and the shear-plane positions).
    pub thickness: Length,
    /// Least thickness (used for the greatest stick-out and the run-out).
    pub thickness_min: Length,
}

/// How the bolt length was settled.
#[derive(Debug, Clone, PartialEq)]
pub enum BoltLength {
    /// The shortest length of the bolt type's catalogue series meeting every rule.
    Chosen(Length),
    /// The length the detail fixes (`length`), checked against every rule.
    Fixed(Length),
    /// No length of the series meets every rule: the reason, and the length the rules were
    /// shown at (the shortest that reaches past the nut, else the longest of the series).
    NoneFits { reason: String, shown_at: Length },
    /// The stack could not be worked out (see [`FastenerSet::problems`]).
    Unknown,
}

impl BoltLength {
    /// The length the bolt is ordered at, if one works or is fixed.
    pub fn length(&self) -> Option<Length> {
        match self {
            BoltLength::Chosen(l) | BoltLength::Fixed(l) => Some(*l),
            _ => None,
        }
    }

    /// The length the rules were evaluated at, if any.
    pub fn evaluated_at(&self) -> Option<Length> {
        match self {
            BoltLength::Chosen(l) | BoltLength::Fixed(l) => Some(*l),
            BoltLength::NoneFits { shown_at, .. } => Some(*shown_at),
            BoltLength::Unknown => None,
        }
    }
}

/// Stick-out of the bolt end beyond the outer face of the nut.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Stickout {
    /// Length beyond the nut face, with the washers at their greatest thickness (negative: the
    /// end lies inside the nut).
    pub length: Length,
    /// The same in thread pitches.
    pub threads: f64,
}

/// One stack-up rule evaluated for the set, ready to become a check row.
#[derive(Debug, Clone, PartialEq)]
pub struct StackRule {
    /// Stable id: "thread_past_nut", "stickout_max", "nut_insert_pass_through", "thread_runout".
    pub limit_state: &'static str,
    pub requirement: Requirement,
}

/// The fasteners of one connection: every bolt of a detail has the same stack.
#[derive(Debug, Clone, PartialEq)]
pub struct FastenerSet {
    /// "MEMBER/start" or "MEMBER/end", as in the check report.
    pub connection: String,
    pub member: String,
    pub end: End,
    /// Detail id.
    pub detail: String,
    /// Bolts at this member end.
    pub bolt_count: u32,
    /// Bolt grade name, e.g. "ASTM F3125 Gr A325".
    pub grade: String,
    /// Thread designation, e.g. "1/2-13 UNC".
    pub thread: String,
    /// Bolt type name, e.g. "heavy hex structural bolt".
    pub bolt_type: String,
    /// Standard of the bolt type, e.g. "ASME B18.2.6".
    pub bolt_standard: String,
    /// Nut type name and standard; empty for a tapped detail, whose screw threads into the plug.
    pub nut: String,
    pub nut_standard: String,
    /// Nut grade name, e.g. "ASTM A563 Gr DH".
    pub nut_grade: String,
    /// Whether the nut holds by a prevailing-torque (nylon) insert.
    pub nut_locking: bool,
    /// Nut height used (the catalogue's basic or maximum height; overall height for a
    /// nylon-insert nut).
    pub nut_height: Length,
    /// Washers, head side first.
    pub washers: Vec<WasherUse>,
    /// The ply under the head, where the stack is not symmetric (the entering side).
    pub head_side: Option<HeadSide>,
    /// Plies in order from the head side: tab, mate plate(s), tube and sleeve walls, the fit
    /// clearance and the hollow of the sleeve (open gaps). Empty when the stack is unknown.
    pub plies: Vec<Ply>,
    /// Sum of the plies and gaps, washers excluded; `None` when the stack is unknown.
    pub grip: Option<Length>,
    /// Grip plus the washers at their greatest thickness: head bearing face to nut bearing face.
    pub bearing_span: Option<Length>,
    pub length: BoltLength,
    /// Thread length LT of the bolt at its length from its standard; `None` when threaded to
    /// the head (or no length).
    pub thread_length: Option<Length>,
    /// Stick-out at the length evaluated.
    pub stickout: Option<Stickout>,
    /// Per shear plane: position and "threads excluded" or "not excluded". Empty when no bolt
    /// length is settled (the checks then take every plane as not excluded).
    pub planes: Vec<PlaneThreads>,
    /// The stack-up rules at the length evaluated.
    pub rules: Vec<StackRule>,
    /// The spec line a buyer orders from.
    pub spec: String,
    /// A text sketch of the stack, one line per layer.
    pub sketch: String,
    /// What stopped the stack-up, in plain words; empty when it is complete.
    pub problems: Vec<String>,
    /// Remarks a reviewer should read (defaults applied, lengths outside the series).
    pub notes: Vec<String>,
}

/// The fastener set of every member end with a detail, in the order of the check report.
pub fn fastener_sets(model: &Model) -> Vec<FastenerSet> {
    let mut out = Vec::new();
    for m in &model.members {
        for (end, detail) in [(End::Start, &m.start), (End::End, &m.end)] {
            if let Some(id) = detail {
                if let Some(d) = model.details.iter().find(|d| &d.id == id) {
                    out.push(fastener_set(model, m, end, &d.id, &d.bolts, &d.kind));
                }
            }
        }
    }
    out
}

/// The plies of a detail from the head side and the indices of the plies each shear plane
/// follows.
pub fn detail_plies(
    m: &Member,
    b: &Bolting,
    kind: &DetailKind,
) -> Result<(Vec<Ply>, Vec<usize>), String> {
    match kind {
        DetailKind::Tab(t) => Ok(tab_plies(t, b.head_side)),
        DetailKind::Sleeve(s) => sleeve_plies(m, s),
        DetailKind::Tapped(t) => Ok((tapped_plies(t), Vec::new())),
    }
}

/// A tapped detail: the plate under the head, then the engaged thread of the plug.
pub(super) fn tapped_plies(t: &crate::model::TappedDetail) -> Vec<Ply> {
    vec![
        solid("plate", t.plate.thickness),
        solid("plug (engaged thread)", t.plug.engagement),
    ]
}

fn solid(name: &str, t: Length) -> Ply {
    Ply {
        name: name.to_string(),
        thickness: t,
        kind: PlyKind::Solid,
    }
}

fn gap(name: &str, t: Length) -> Ply {
    Ply {
        name: name.to_string(),
        thickness: t,
        kind: PlyKind::Gap,
    }
}

/// A tab between two mates: mate, tab, mate (planes after 0 and 1). A tab lapped to one mate:
/// the ply under the head first (the reader requires `head_side` there).
fn tab_plies(t: &TabDetail, head: Option<HeadSide>) -> (Vec<Ply>, Vec<usize>) {
    let tab = solid("tab", t.tab.thickness);
    let mate = solid("mate", t.mate.thickness);
    if t.mate.count == 2 {
        (vec![mate.clone(), tab, mate], vec![0, 1])
    } else if head == Some(HeadSide::Tab) {
        (vec![tab, mate], vec![0])
    } else {
        (vec![mate, tab], vec![0])
    }
}

/// The dimension across the bolted walls of a tube: its diameter, or the side of a square
/// tube; a rectangular tube is refused because the model does not say which walls are drilled.
fn across_walls(section: &crate::catalogue::Section, what: &str) -> Result<Length, String> {
    match section.shape {
        crate::catalogue::Shape::Round { d } => Ok(d),
        crate::catalogue::Shape::Rect { b, h } if (b.to_mm() - h.to_mm()).abs() < 1e-3 => Ok(b),
        crate::catalogue::Shape::Rect { .. } => Err(format!(
            "the {what} {} is rectangular and the model does not say which pair of walls the bolts cross",
            section.name
        )),
    }
}

/// A sleeve: member wall, fit clearance (open, taken on the head side so both planes sit as far
/// from the head as they can), sleeve wall, sleeve hollow (open), sleeve wall, member wall.
/// Nominal walls. Planes after the clearance (or the first member wall) and the second sleeve
/// wall.
fn sleeve_plies(m: &Member, s: &SleeveDetail) -> Result<(Vec<Ply>, Vec<usize>), String> {
    let outer = across_walls(&m.section, "member")?;
    let inner = across_walls(&s.section, "sleeve")?;
    let (tm, ts) = (m.section.t_nominal, s.section.t_nominal);
    let clearance = outer - tm * 2.0 - inner;
    if clearance.to_mm() < -1e-6 {
        return Err(format!(
            "the sleeve {} ({:.3} in. across) does not fit inside the member {} ({:.3} in. inside)",
            s.section.name,
            inner.to_in(),
            m.section.name,
            (outer - tm * 2.0).to_in()
        ));
    }
    let hollow = inner - ts * 2.0;
    if hollow.to_mm() <= 0.0 {
        return Err(format!("the sleeve {} has no hollow", s.section.name));
    }
    let mut plies = vec![solid("member wall", tm)];
    if clearance.to_mm() > 1e-6 {
        plies.push(gap("fit clearance", clearance));
    }
    let first = plies.len() - 1;
    plies.push(solid("sleeve wall", ts));
    plies.push(gap("sleeve inside", hollow));
    plies.push(solid("sleeve wall", ts));
    let second = plies.len() - 1;
    plies.push(solid("member wall", tm));
    Ok((plies, vec![first, second]))
}

pub(super) fn washer_use(w: &Washer, d: Length, side: WasherSide) -> Option<WasherUse> {
    let size = w.size_for(d)?;
    Some(WasherUse {
        name: w.name.clone(),
        standard: w.standard.clone(),
        side,
        thickness: size.t_max,
        thickness_min: size.t_min,
    })
}

/// The project's thread-past-the-nut rule with its citation.
pub fn stickout_rule(model: &Model) -> (StickoutRule, Citation) {
    let rule = model.project.thread_past_nut.rule;
    let cite = match rule {
        StickoutRule::Flush => stackup::RCSC_2020_STICKOUT,
        _ => Citation::new("project rule", "thread_past_nut", ""),
    };
    (rule, cite)
}

/// The fastener set of one connection.
pub fn fastener_set(
    model: &Model,
    m: &Member,
    end: End,
    detail_id: &str,
    b: &Bolting,
    kind: &DetailKind,
) -> FastenerSet {
    let (nut, nut_grade) = match (kind, &b.nut, &b.nut_grade) {
        (DetailKind::Tapped(t), _, _) => {
            return super::fasteners_tapped::tapped_set(model, m, end, detail_id, b, t)
        }
        (_, Some(n), Some(g)) => (n, g),
        _ => unreachable!("the model reader gives every tab and sleeve a nut and a nut grade"),
    };
    let d = b.thread.d;
    let units = model.project.units;
    let mut problems = Vec::new();
    let mut notes = Vec::new();
    let mut washers = Vec::new();
    if let Some(w) = &b.washer {
        for (on, side) in [
            (b.washers.under_head(), WasherSide::Head),
            (b.washers.under_nut(), WasherSide::Nut),
        ] {
            if on {
                match washer_use(w, d, side) {
                    Some(u) => washers.push(u),
                    None => problems.push(format!(
                        "the catalogue has no {} for a {} bolt",
                        w.name, b.thread.designation
                    )),
                }
            }
        }
    }
    let nut_height = nut.size_for(d).map(|s| s.height);
    if nut_height.is_none() {
        problems.push(format!(
            "the catalogue has no {} for a {} bolt",
            nut.name, b.thread.designation
        ));
    }
    if !b.bolt_type.sizes.is_empty() && b.bolt_type.size_for(d).is_none() {
        problems.push(format!(
            "the catalogue does not list the {} in {}",
            b.bolt_type.name, b.thread.designation
        ));
    }
    if !model.project.thread_past_nut.set_by_model {
        notes.push(
            "thread_past_nut not set: the default, flush with the nut face (RCSC 2020 §2.3.2), applies"
                .into(),
        );
    }
    notes.push("plies at their nominal thickness: mill tolerances of plates and tube walls are not applied to the stack".into());
    if let DetailKind::Sleeve(_) = kind {
        notes.push("sleeve: nominal outside sizes; the fit clearance is taken on the head side, so both shear planes lie as far from the head as they can (the worse case for the thread condition)".into());
    }
    let (plies, plane_after) = match detail_plies(m, b, kind) {
        Ok(p) => p,
        Err(e) => {
            problems.push(e);
            (Vec::new(), Vec::new())
        }
    };
    let head_w = washers.iter().find(|w| w.side == WasherSide::Head);
    let nut_w = washers.iter().find(|w| w.side == WasherSide::Nut);
    let w_max: Length = washers.iter().map(|w| w.thickness).sum();
    let w_min: Length = washers.iter().map(|w| w.thickness_min).sum();
    let head_w_t = head_w.map_or(Length::mm(0.0), |w| w.thickness);

    let mut set = FastenerSet {
        connection: format!("{}/{}", m.id, end.as_str()),
        member: m.id.clone(),
        end,
        detail: detail_id.to_string(),
        bolt_count: b.count(),
        grade: b.grade.name.clone(),
        thread: b.thread.designation.clone(),
        bolt_type: b.bolt_type.name.clone(),
        bolt_standard: b.bolt_type.standard.clone(),
        nut: nut.name.clone(),
        nut_standard: nut.standard.clone(),
        nut_grade: nut_grade.name.clone(),
        nut_locking: nut.prevailing_torque,
        nut_height: nut_height.unwrap_or(Length::mm(0.0)),
        washers: washers.clone(),
        head_side: b.head_side,
        plies: plies.clone(),
        grip: grip(&plies).ok(),
        bearing_span: grip(&plies).ok().map(|g| g + w_max),
        length: BoltLength::Unknown,
        thread_length: None,
        stickout: None,
        planes: Vec::new(),
        rules: Vec::new(),
        spec: String::new(),
        sketch: String::new(),
        problems: Vec::new(),
        notes: Vec::new(),
    };

    let worked = if problems.is_empty() {
        work_out(
            model,
            b,
            nut,
            &plies,
            &plane_after,
            w_max,
            w_min,
            head_w_t,
            &mut notes,
        )
    } else {
        Err(String::new())
    };
    match worked {
        Ok(w) => {
            set.length = w.length;
            set.thread_length = w.thread_length;
            set.stickout = w.stickout;
            set.planes = w.planes;
            set.rules = w.rules;
        }
        Err(e) if !e.is_empty() => problems.push(e),
        Err(_) => {}
    }
    set.spec = fastener_spec(
        &SpecParts {
            thread: &b.thread.designation,
            length: set.length.length(),
            bolt_type: &b.bolt_type.name,
            grade: &b.grade.name,
            nut: &nut.name,
            nut_grade: &nut_grade.name,
            washer: b.washer.as_ref().map(|w| w.name.as_str()),
            washer_under_head: head_w.is_some(),
            washer_under_nut: nut_w.is_some(),
        },
        units,
    );
    set.sketch = stack_sketch(
        &SketchParts {
            bolt_type: &b.bolt_type.name,
            head_height: b.bolt_type.size_for(d).and_then(|s| s.head_height),
            head_washer: head_w.map(|w| (w.name.as_str(), w.thickness)),
            plies: &plies,
            planes: &set.planes,
            nut_washer: nut_w.map(|w| (w.name.as_str(), w.thickness)),
            nut: &nut.name,
            nut_height: set.nut_height,
            stickout: set
                .stickout
                .filter(|_| set.length.length().is_some())
                .map(|s| (s.length, s.threads)),
        },
        units,
    );
    set.problems = problems;
    set.notes = notes;
    set
}

/// The parts of the set that follow from a complete stack.
struct Worked {
    length: BoltLength,
    thread_length: Option<Length>,
    stickout: Option<Stickout>,
    planes: Vec<PlaneThreads>,
    rules: Vec<StackRule>,
}

/// The ids of the rules [`stackup::length_checks_with_thread`] returns, in its order.
fn rule_ids(max_stickout: bool, insert: bool) -> Vec<&'static str> {
    let mut ids = vec!["thread_past_nut"];
    if max_stickout {
        ids.push("stickout_max");
    }
    if insert {
        ids.push("nut_insert_pass_through");
    }
    ids.push("thread_runout");
    ids
}

#[allow(clippy::too_many_arguments)] // the stack's parts, named at the one call
fn work_out(
    model: &Model,
    b: &Bolting,
    nut: &Nut,
    plies: &[Ply],
    plane_after: &[usize],
    w_max: Length,
    w_min: Length,
    head_w: Length,
    notes: &mut Vec<String>,
) -> Result<Worked, String> {
    let d = b.thread.d;
    let pitch = b.thread.pitch;
    let g = grip(plies).map_err(|e| e.to_string())?;
    let nut_height = nut.size_for(d).map(|s| s.height).ok_or("no nut height")?;
    let (stickout, stickout_citation) = stickout_rule(model);
    let rules = LengthRules {
        d,
        pitch,
        // not used: the thread length comes from the catalogue's rule for the bolt type
        bolt: BoltType::FullyThreaded,
        transition: pitch * TRANSITION_PITCHES,
        bearing_span: g + w_max,
        bearing_span_min: g + w_min,
        nut_height,
        stickout,
        stickout_citation,
        max_stickout: model.project.max_stickout,
        insert: nut
            .prevailing_torque
            .then_some((nut_height, INSERT_EXTRA_PITCHES)),
        clear_pitches: 0,
        runout_citation: Citation::new("common practice", "nut bears on full threads", ""),
    };
    let lt_of = |l: Length| -> Result<Option<Length>, StackError> {
        let lt = b
            .bolt_type
            .thread_length
            .thread_length(d, l)
            .map_err(StackError::ThreadLength)?;
        Ok((lt.to_mm() < l.to_mm() - 1e-6).then_some(lt))
    };
    let series = &b.bolt_type.lengths;
    let (length, evaluated, checks) = match b.length {
        Some(l) => {
            if !series.iter().any(|s| (s.to_mm() - l.to_mm()).abs() < 1e-3) {
                notes.push(format!(
                    "the fixed length is not one of the {} lengths in the catalogue series",
                    b.bolt_type.name
                ));
            }
            let c = length_checks_with_thread(&rules, l, lt_of(l).map_err(|e| e.to_string())?)
                .map_err(|e| e.to_string())?;
            (BoltLength::Fixed(l), l, c)
        }
        None => match stackup::bolt_length_with_thread(&rules, series, lt_of) {
            Ok((l, c)) => (BoltLength::Chosen(l), l, c),
            Err(StackError::NoLengthFits { tried }) => {
                let shown = shown_length(&rules, series, &lt_of)?;
                let c = length_checks_with_thread(
                    &rules,
                    shown,
                    lt_of(shown).map_err(|e| e.to_string())?,
                )
                .map_err(|e| e.to_string())?;
                let ids = rule_ids(rules.max_stickout.is_some(), rules.insert.is_some());
                let failing: Vec<&str> = ids
                    .iter()
                    .zip(&c)
                    .filter(|(_, r)| r.ratio() > 1.0)
                    .map(|(id, _)| *id)
                    .collect();
                let reason = format!(
                    "none of the {tried} lengths of the {} series meets every rule (at {:.3} in.: {} fails)",
                    b.bolt_type.name,
                    shown.to_in(),
                    failing.join(", ")
                );
                (
                    BoltLength::NoneFits {
                        reason,
                        shown_at: shown,
                    },
                    shown,
                    c,
                )
            }
            Err(e) => return Err(e.to_string()),
        },
    };
    let lt = lt_of(evaluated).map_err(|e| e.to_string())?;
    let stick = evaluated - rules.bearing_span - nut_height;
    let planes = if length.length().is_some() {
        let layout = thread_layout(evaluated, lt, rules.transition);
        let positions: Vec<PlanePosition> =
            plane_positions(plies, head_w, plane_after).map_err(|e| e.to_string())?;
        plane_threads(&layout, &positions)
    } else {
        Vec::new()
    };
    let ids = rule_ids(rules.max_stickout.is_some(), rules.insert.is_some());
    debug_assert_eq!(ids.len(), checks.len());
    Ok(Worked {
        length,
        thread_length: lt,
        stickout: Some(Stickout {
            length: stick,
            threads: stick.to_mm() / pitch.to_mm(),
        }),
        planes,
        rules: ids
            .into_iter()
            .zip(checks)
            .map(|(limit_state, requirement)| StackRule {
                limit_state,
                requirement,
            })
            .collect(),
    })
}

/// The length to show the rules at when none fits: the shortest that reaches past the nut by
/// the project's rule, else the longest of the series.
fn shown_length(
    rules: &LengthRules,
    series: &[Length],
    lt_of: &impl Fn(Length) -> Result<Option<Length>, StackError>,
) -> Result<Length, String> {
    let mut sorted = series.to_vec();
    sorted.sort_by(|a, b| a.si().total_cmp(&b.si()));
    for l in &sorted {
        let c = length_checks_with_thread(rules, *l, lt_of(*l).map_err(|e| e.to_string())?)
            .map_err(|e| e.to_string())?;
        if c[0].ratio() <= 1.0 {
            return Ok(*l);
        }
    }
    sorted
        .last()
        .copied()
        .ok_or_else(|| "the bolt type has no lengths in its series".to_string())
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::model::{load, LoadOptions};
    use crate::standards::aisc360::j3_bolts::Threads;
    use std::path::Path;

    fn demo() -> Model {
        let path = Path::new(env!("CARGO_MANIFEST_DIR"))
            .join("examples/quillon-brook-footbridge/model.toml");
        load(&path, &LoadOptions::default()).expect("the demo model loads")
    }

    fn set_of<'a>(sets: &'a [FastenerSet], id: &str) -> &'a FastenerSet {
        sets.iter().find(|s| s.connection == id).expect(id)
    }

    #[test]
    fn one_set_per_connection_in_report_order() {
        let model = demo();
        let sets = fastener_sets(&model);
        let report = super::super::check_model(&model);
        let ids: Vec<&str> = sets.iter().map(|s| s.connection.as_str()).collect();
        let report_ids: Vec<&str> = report.connections.iter().map(|c| c.id.as_str()).collect();
        assert_eq!(ids, report_ids);
    }

    #[test]
    fn tab_lapped_to_one_mate_starts_with_the_head_side_ply() {
        let model = demo();
        let sets = fastener_sets(&model);
        let s = set_of(&sets, "D2/start");
        let names: Vec<&str> = s.plies.iter().map(|p| p.name.as_str()).collect();
        assert_eq!(names, ["mate", "tab"]);
        assert_eq!(s.planes.len(), 1);
        assert_eq!(s.washers.len(), 1);
        assert_eq!(s.washers[0].side, WasherSide::Nut);
        assert!(s.problems.is_empty(), "{:?}", s.problems);
    }

    #[test]
    fn sleeve_stack_has_the_clearance_and_the_hollow_as_gaps() {
        let model = demo();
        let sets = fastener_sets(&model);
        let s = set_of(&sets, "BC1/end");
        let kinds: Vec<(&str, PlyKind)> =
            s.plies.iter().map(|p| (p.name.as_str(), p.kind)).collect();
        assert_eq!(
            kinds,
            [
                ("member wall", PlyKind::Solid),
                ("fit clearance", PlyKind::Gap),
                ("sleeve wall", PlyKind::Solid),
                ("sleeve inside", PlyKind::Gap),
                ("sleeve wall", PlyKind::Solid),
                ("member wall", PlyKind::Solid),
            ]
        );
        assert_eq!(s.planes.len(), 2);
        assert!(s.sketch.contains("shear plane 2"), "{}", s.sketch);
    }

    #[test]
    fn a_fixed_length_is_checked_not_chosen() {
        let mut model = demo();
        for d in &mut model.details {
            d.bolts.length = Some(Length::inch(1.0));
        }
        let sets = fastener_sets(&model);
        let s = set_of(&sets, "V1/start");
        assert_eq!(s.length, BoltLength::Fixed(Length::inch(1.0)));
        let past = s
            .rules
            .iter()
            .find(|r| r.limit_state == "thread_past_nut")
            .unwrap();
        assert!(
            past.requirement.ratio() > 1.0,
            "1 in. cannot reach past the nut"
        );
    }

    #[test]
    fn no_length_fits_gives_the_reason_and_no_planes() {
        let mut model = demo();
        model.project.max_stickout = Some(Length::inch(0.01));
        let sets = fastener_sets(&model);
        let s = set_of(&sets, "V1/start");
        match &s.length {
            BoltLength::NoneFits { reason, .. } => {
                assert!(reason.contains("stickout_max"), "{reason}")
            }
            other => panic!("expected no fit, got {other:?}"),
        }
        assert!(s.planes.is_empty());
        assert!(
            s.spec.contains("no length of the series works"),
            "{}",
            s.spec
        );
    }

    #[test]
    fn a_stated_not_excluded_is_kept_over_the_stack_up() {
        let mut model = demo();
        let sets = fastener_sets(&model);
        let s = set_of(&sets, "BC1/end");
        let splice = model
            .details
            .iter_mut()
            .find(|d| d.id == "CHORD-SPLICE")
            .unwrap();
        let (c, _) = super::super::bolting::plane_conditions(&splice.bolts, s, 2);
        assert_eq!(c, [Threads::Excluded, Threads::NotExcluded]);
        splice.bolts.threads = Some(Threads::NotExcluded);
        let (c, notes) = super::super::bolting::plane_conditions(&splice.bolts, s, 2);
        assert_eq!(c, [Threads::NotExcluded, Threads::NotExcluded]);
        assert!(notes.iter().any(|n| n.contains("(N) is kept")), "{notes:?}");
    }

    #[test]
    fn without_a_length_the_detail_then_not_excluded_decides() {
        let mut model = demo();
        model.project.max_stickout = Some(Length::inch(0.01));
        let sets = fastener_sets(&model);
        let s = set_of(&sets, "BC1/end");
        let splice = model
            .details
            .iter_mut()
            .find(|d| d.id == "CHORD-SPLICE")
            .unwrap();
        let (c, notes) = super::super::bolting::plane_conditions(&splice.bolts, s, 2);
        assert_eq!(c, [Threads::NotExcluded, Threads::NotExcluded]);
        assert!(
            notes
                .iter()
                .any(|n| n.contains("not excluded from the shear planes (N), the lower")),
            "{notes:?}"
        );
        splice.bolts.threads = Some(Threads::Excluded);
        let (c, _) = super::super::bolting::plane_conditions(&splice.bolts, s, 2);
        assert_eq!(c, [Threads::Excluded, Threads::Excluded]);
    }

    #[test]
    fn sketch_marks_the_plane_after_the_head_washer_and_first_ply() {
        let path =
            Path::new(env!("CARGO_MANIFEST_DIR")).join("examples/larkspur-stage-frame/model.toml");
        let model = load(&path, &LoadOptions::default()).unwrap();
        let sets = fastener_sets(&model);
        let s = set_of(&sets, "P0/start");
        let lines: Vec<&str> = s.sketch.lines().collect();
        assert!(lines[0].starts_with("head"), "{}", s.sketch);
        assert!(lines[1].starts_with("washer"), "{}", s.sketch);
        assert!(lines[2].starts_with("| tab"), "{}", s.sketch);
        assert!(
            lines[3].contains("shear plane 1") && lines[3].contains("not excluded"),
            "{}",
            s.sketch
        );
        assert!(lines[4].starts_with("| mate"), "{}", s.sketch);
        assert_eq!(s.washers.len(), 2);
        assert_eq!(s.head_side, Some(HeadSide::Tab));
    }

    #[test]
    fn rule_ids_follow_the_order_of_the_length_checks() {
        assert_eq!(
            rule_ids(true, true),
            [
                "thread_past_nut",
                "stickout_max",
                "nut_insert_pass_through",
                "thread_runout"
            ]
        );
        assert_eq!(rule_ids(false, false), ["thread_past_nut", "thread_runout"]);
    }
}

#[cfg(test)]
mod model_key_tests {
    use crate::model::{load, LoadOptions, Model};
    use crate::stackup::StickoutRule;
    use crate::units::Length;
    use std::path::Path;

    const DEMO: &str = "examples/quillon-brook-footbridge";

    /// The demo model with `edit` applied, loaded from a scratch folder.
    fn load_edited(name: &str, edit: impl Fn(String) -> String) -> Result<Model, Vec<String>> {
        let src = Path::new(env!("CARGO_MANIFEST_DIR")).join(DEMO);
        let dir = std::env::temp_dir().join(format!(
            "jointbook-fastener-keys-{}-{name}",
            std::process::id()
        ));
        std::fs::create_dir_all(&dir).unwrap();
        let text = std::fs::read_to_string(src.join("model.toml")).unwrap();
        assert!(text.contains("washers = \"under nut\""));
        std::fs::write(dir.join("model.toml"), edit(text)).unwrap();
        std::fs::copy(src.join("forces.csv"), dir.join("forces.csv")).unwrap();
        let r = load(&dir.join("model.toml"), &LoadOptions::default())
            .map_err(|ds| ds.into_iter().map(|d| d.message).collect());
        std::fs::remove_dir_all(&dir).ok();
        r
    }

    fn project_key(key_value: &'static str) -> impl Fn(String) -> String {
        move |t: String| t.replacen("units = \"us\"", &format!("units = \"us\"\n{key_value}"), 1)
    }

    fn error_of(r: Result<Model, Vec<String>>, part: &str) {
        match r {
            Ok(_) => panic!("expected an error containing '{part}'"),
            Err(msgs) => assert!(msgs.iter().any(|m| m.contains(part)), "{msgs:?}"),
        }
    }

    #[test]
    fn thread_past_nut_forms() {
        let m = load_edited("tpn-default", |t| t).unwrap();
        assert_eq!(m.project.thread_past_nut.rule, StickoutRule::Flush);
        assert!(!m.project.thread_past_nut.set_by_model);
        let m = load_edited("tpn-2", project_key("thread_past_nut = \"2 threads\"")).unwrap();
        assert_eq!(m.project.thread_past_nut.rule, StickoutRule::Pitches(2));
        assert!(m.project.thread_past_nut.set_by_model);
        let m = load_edited("tpn-1", project_key("thread_past_nut = \"1 thread\"")).unwrap();
        assert_eq!(m.project.thread_past_nut.rule, StickoutRule::Pitches(1));
        let m = load_edited("tpn-len", project_key("thread_past_nut = \"1/8 in\"")).unwrap();
        match m.project.thread_past_nut.rule {
            StickoutRule::Length(l) => assert!((l.to_in() - 0.125).abs() < 1e-12),
            other => panic!("{other:?}"),
        }
        let m = load_edited("tpn-flush", project_key("thread_past_nut = \"flush\"")).unwrap();
        assert!(m.project.thread_past_nut.set_by_model);
    }

    #[test]
    fn thread_past_nut_nonsense_is_refused() {
        error_of(
            load_edited("tpn-bad", project_key("thread_past_nut = \"sometimes\"")),
            "is not a thread-past-the-nut rule",
        );
        error_of(
            load_edited("tpn-zero", project_key("thread_past_nut = \"0 threads\"")),
            "is not a thread-past-the-nut rule",
        );
    }

    #[test]
    fn max_stickout_must_be_positive() {
        error_of(
            load_edited("max-0", |t| {
                t.replace("max_stickout = \"1/2 in\"", "max_stickout = \"0 in\"")
            }),
            "must be greater than zero",
        );
        let m = load_edited("max-ok", |t| t).unwrap();
        assert_eq!(m.project.max_stickout, Some(Length::inch(0.5)));
    }

    #[test]
    fn washer_named_without_its_place_is_refused() {
        error_of(
            load_edited("w-place", |t| t.replace("washers = \"under nut\", ", "")),
            "the washer's place is not given",
        );
    }

    #[test]
    fn washers_none_with_a_washer_named_is_refused() {
        error_of(
            load_edited("w-none", |t| {
                t.replace("washers = \"under nut\"", "washers = \"none\"")
            }),
            "a washer type is named but",
        );
    }

    #[test]
    fn washers_placed_without_a_type_are_refused() {
        error_of(
            load_edited("w-type", |t| t.replace("washer = \"ASTM F436\", ", "")),
            "no washer type is named",
        );
    }

    #[test]
    fn one_mate_tab_needs_the_head_side() {
        error_of(
            load_edited("head-missing", |t| t.replace("head_side = \"mate\", ", "")),
            "needs the side the bolt enters from",
        );
    }

    #[test]
    fn head_side_on_a_symmetric_stack_is_refused() {
        error_of(
            load_edited("head-sleeve", |t| {
                t.replace(
                    "washers = \"under nut\", across = 1, along = 2, pitch = \"1-1/2 in\", hole = \"standard\" }",
                    "washers = \"under nut\", head_side = \"tab\", across = 1, along = 2, pitch = \"1-1/2 in\", hole = \"standard\" }",
                )
            }),
            "has no meaning here",
        );
    }

    #[test]
    fn a_fixed_length_is_read() {
        let m = load_edited("len", |t| {
            // the first detail with the head on the mate side is WEB-TAB
            t.replacen(
                "head_side = \"mate\", ",
                "head_side = \"mate\", length = \"1-1/2 in\", ",
                1,
            )
        })
        .unwrap();
        let d = m.details.iter().find(|d| d.id == "WEB-TAB").unwrap();
        assert_eq!(d.bolts.length, Some(Length::inch(1.5)));
    }
}
