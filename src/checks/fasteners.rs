//! The fastener set of every connection: the hardware, the stack of plies from the head side,
//! the grip, the bolt length chosen from the catalogue series (or the length the detail fixes),
//! the stick-out, the thread condition at each shear plane, the spec line and a text sketch.
//! The checks, the fabrication sheet and the hardware list all read this one record.

use super::{impossible, CheckResult, ConnectionReport};
use crate::catalogue::Washer;
use crate::model::{Bolting, DetailKind, End, HeadSide, Member, Model, SleeveDetail, TabDetail};
use crate::stackup::planes::{plane_positions, plane_threads, PlanePosition, PlaneThreads};
use crate::stackup::text::{fastener_spec, stack_sketch, SketchParts, SpecParts};
use crate::stackup::{
    self, grip, length_checks_with_thread, thread_layout, BoltType, LengthRules, Ply, PlyKind,
    StackError, StickoutRule,
};
use crate::standards::aisc360::input::InputError;
use crate::standards::aisc360::j3_bolts::Threads;
use crate::standards::aisc360::Edition;
use crate::standards::{number, Bound, Citation, Input, Requirement};
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
    /// Nut type name and standard.
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
    }
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

fn washer_use(w: &Washer, d: Length, side: WasherSide) -> Option<WasherUse> {
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
    let nut_height = b.nut.size_for(d).map(|s| s.height);
    if nut_height.is_none() {
        problems.push(format!(
            "the catalogue has no {} for a {} bolt",
            b.nut.name, b.thread.designation
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
        nut: b.nut.name.clone(),
        nut_standard: b.nut.standard.clone(),
        nut_grade: b.nut_grade.name.clone(),
        nut_locking: b.nut.prevailing_torque,
        nut_height: nut_height.unwrap_or(Length::mm(0.0)),
        washers: washers.clone(),
        head_side: b.head_side,
        plies: plies.clone(),
        grip: None,
        bearing_span: None,
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
            set.grip = Some(w.grip);
            set.bearing_span = Some(w.grip + w_max);
            set.length = w.length;
            set.thread_length = w.thread_length;
            set.stickout = w.stickout;
            set.planes = w.planes;
            set.rules = w.rules;
        }
        Err(e) if !e.is_empty() => problems.push(e),
        Err(_) => {}
    }
    if let Ok(g) = grip(&plies) {
        set.grip = Some(g);
        set.bearing_span = Some(g + w_max);
    }
    set.spec = fastener_spec(
        &SpecParts {
            thread: &b.thread.designation,
            length: set.length.length(),
            bolt_type: &b.bolt_type.name,
            grade: &b.grade.name,
            nut: &b.nut.name,
            nut_grade: &b.nut_grade.name,
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
            nut: &b.nut.name,
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
    grip: Length,
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
    let nut_height = b.nut.size_for(d).map(|s| s.height).ok_or("no nut height")?;
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
        insert: b
            .nut
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
        grip: g,
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

/// The citation of a nut grade's suitability for its bolt grade, from the nut grade's standard:
/// ASTM A563 Appendix X1 (nut selection guide) or ISO 898-2 (nut class for the bolt class), as
/// the catalogue gives them (from memory); other standards cite the catalogue.
pub fn nut_suitability_citation(standard: &str) -> Citation {
    match standard {
        "ASTM A563" => Citation::new("ASTM A563-15", "Appendix X1", ""),
        "ISO 898-2" => Citation::new("ISO 898-2:2012", "Table 1", ""),
        _ => Citation::new("catalogue", "nut grade suitability", ""),
    }
}

/// The fastener combination: the nut grade must suit the bolt grade (a nut weaker than its bolt
/// fails), by the nut standard's suitability table as the catalogue records it.
pub fn fastener_combination(b: &Bolting) -> Requirement {
    let suits = b.nut_grade.suits_grade(&b.grade.name);
    let mut notes = vec![format!(
        "{} suits {}: {} ({})",
        b.nut_grade.name,
        b.nut_grade.suits.join(", "),
        if suits {
            format!("{} is among them", b.grade.name)
        } else {
            format!(
                "{} is not among them — the nut is weaker than the bolt",
                b.grade.name
            )
        },
        b.nut_grade.suits_basis
    )];
    if !suits {
        notes.push(
            "choose a nut grade that suits the bolt grade (e.g. a heavier or harder grade)".into(),
        );
    }
    let unsuited = if suits { 0.0 } else { 1.0 };
    Requirement {
        citation: nut_suitability_citation(&b.nut_grade.standard),
        formula: "bolt grades the nut grade does not suit ≤ 0",
        inputs: vec![Input::new(
            "unsuited",
            number(unsuited),
            "1 when the nut grade does not list the bolt grade, else 0",
        )],
        provided: number(unsuited),
        required: number(0.0),
        bound: Bound::Maximum,
        notes,
        out_of_scope: vec![],
    }
}

/// The shank may not end before a plane the detail states as "threads excluded": shank end
/// L − LT − Y ≥ plane position (AISC 360-22 Table J3.2, thread condition X).
pub fn stated_exclusion(edition: Edition, plane: &PlaneThreads, index: usize) -> Requirement {
    let shank_end = plane.plane.position + plane.margin;
    let mut notes = Vec::new();
    if !plane.excluded {
        notes.push(format!(
            "the detail states \"threads excluded\" but the threads reach into plane {} ({} | {}); bolt shear is taken with the threads not excluded there. Fails because the stated design basis (X) does not match the bolt: lengthen the bolt, choose a longer-shank type, or state \"not excluded\"",
            index + 1,
            plane.plane.between.0,
            plane.plane.between.1
        ));
    }
    Requirement {
        citation: edition.cite("Table J3.2", ""),
        formula: "shank end (L − LT − Y) ≥ shear plane position",
        inputs: vec![
            Input::new(
                "L − LT − Y",
                shank_end,
                "nearest end of the plain shank from the head",
            ),
            Input::new(
                "x",
                plane.plane.position,
                "shear plane from the head bearing face",
            ),
        ],
        provided: shank_end.into(),
        required: plane.plane.position.into(),
        bound: Bound::Minimum,
        notes,
        out_of_scope: vec![],
    }
}

/// The stack-up rows of a connection: bolt_length, thread_past_nut, stickout_max (when the
/// project sets one), nut_insert_pass_through (nylon-insert nuts), thread_runout, the
/// fastener_combination and, where the detail states "threads excluded", thread_condition per
/// shear plane.
pub fn push_stack_checks(
    edition: Edition,
    b: &Bolting,
    set: &FastenerSet,
    r: &mut ConnectionReport,
) {
    let cite = set
        .rules
        .first()
        .map_or(stackup::RCSC_2020_STICKOUT, |x| x.requirement.citation);
    match &set.length {
        BoltLength::Unknown => {
            let why = if set.problems.is_empty() {
                "the stack could not be worked out".to_string()
            } else {
                set.problems.join("; ")
            };
            r.checks.push(impossible(
                "bolt_length",
                "bolts",
                cite,
                InputError::new("L", why),
            ));
            r.not_checked
                .push("thread_past_nut, thread_runout: no stack to check the bolt against".into());
        }
        BoltLength::NoneFits { reason, .. } => {
            let mut c = impossible("bolt_length", "bolts", cite, InputError::new("L", ""));
            c.notes = vec![
                reason.clone(),
                "change the stack, the bolt type or the project's stick-out rule".into(),
            ];
            r.checks.push(c);
        }
        BoltLength::Chosen(l) | BoltLength::Fixed(l) => {
            r.checks.push(CheckResult::requirement(
                "bolt_length",
                "bolts",
                length_requirement(b, set, *l),
                false,
            ));
        }
    }
    let shown = match &set.length {
        BoltLength::NoneFits { shown_at, .. } => Some(*shown_at),
        _ => None,
    };
    for rule in &set.rules {
        let mut c =
            CheckResult::requirement(rule.limit_state, "bolts", rule.requirement.clone(), false);
        if let Some(l) = shown {
            c.notes.push(format!(
                "shown at L = {:.3} in. ({:.1} mm): no length of the series meets every rule",
                l.to_in(),
                l.to_mm()
            ));
        }
        if rule.limit_state == "thread_past_nut" {
            c.notes.extend(set.notes.iter().cloned());
        }
        if rule.limit_state == "nut_insert_pass_through" {
            c.notes.push(
                "the insert's length is not recorded: the bolt must pass the nut's whole height"
                    .into(),
            );
        }
        r.checks.push(c);
    }
    r.checks.push(CheckResult::requirement(
        "fastener_combination",
        "nut grade",
        fastener_combination(b),
        false,
    ));
    if b.threads == Some(Threads::Excluded) {
        for (i, p) in set.planes.iter().enumerate() {
            r.checks.push(CheckResult::requirement(
                "thread_condition",
                format!("plane {}", i + 1),
                stated_exclusion(edition, p, i),
                false,
            ));
        }
    }
}

/// bolt_length: L ≥ grip + washers + m + the least reach the rules ask past the nut face (the
/// project's stick-out rule, RCSC 2020 §2.3.2 by default; a nylon insert's pass-through).
fn length_requirement(b: &Bolting, set: &FastenerSet, l: Length) -> Requirement {
    let span = set.bearing_span.unwrap_or(Length::mm(0.0));
    let reach = set
        .rules
        .iter()
        .filter(|x| {
            x.limit_state == "thread_past_nut" || x.limit_state == "nut_insert_pass_through"
        })
        .map(|x| x.requirement.required.si)
        .fold(0.0, f64::max);
    let needed = span + Length::from_si(reach);
    let washers: Length = set.washers.iter().map(|w| w.thickness).sum();
    let how = match set.length {
        BoltLength::Fixed(_) => "fixed by the detail (`length`), checked".to_string(),
        _ => format!(
            "chosen: the shortest of the {} series ({} lengths) meeting every stack-up rule",
            b.bolt_type.name,
            b.bolt_type.lengths.len()
        ),
    };
    Requirement {
        citation: set
            .rules
            .first()
            .map_or(stackup::RCSC_2020_STICKOUT, |x| x.requirement.citation),
        formula: "L ≥ grip + washers + reach required past the nut bearing face",
        inputs: vec![
            Input::new("L", l, "bolt length"),
            Input::new(
                "grip",
                set.grip.unwrap_or(Length::mm(0.0)),
                "plies and gaps",
            ),
            Input::new("washers", washers, "washer thicknesses, greatest"),
            Input::new(
                "reach",
                Length::from_si(reach),
                "nut height plus stick-out required",
            ),
        ],
        provided: l.into(),
        required: needed.into(),
        bound: Bound::Minimum,
        notes: vec![how],
        out_of_scope: vec![],
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::model::{load, LoadOptions};
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
        let s = set_of(&sets, "D1/start");
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
        let s = set_of(&sets, "V0/start");
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
        let s = set_of(&sets, "V0/start");
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
