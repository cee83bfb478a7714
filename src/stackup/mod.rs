//! Fastener stack-up: grip, washers, nut, bolt length, thread past the nut, threads in the shear
//! planes, tapped thread engagement.
//!
//! This first part holds the thread-length rules of the bolt standards, the grip and the
//! thread-past-the-nut rule. Pure geometry: no strength, no I/O, no catalogue types.

pub mod engagement;
pub mod planes;
pub mod text;

use crate::standards::{Bound, Citation, Input, Requirement};
use crate::units::Length;

/// Why a stack-up could not be worked out; the caller locates it in the model.
#[derive(Debug, Clone, PartialEq, thiserror::Error)]
pub enum StackError {
    /// A dimension that must be positive is zero, negative or not a number.
    #[error("{what} must be greater than zero (got {value_mm} mm)")]
    NotPositive { what: String, value_mm: f64 },
    /// The stack has no plies.
    #[error("the stack has no plies: a bolt needs at least one solid ply to clamp")]
    NoPlies,
    /// The head or nut would bear on an open gap.
    #[error("ply '{name}' is an open gap but the {side} bears on it: the first and last plies must be solid")]
    GapAtBearingFace { name: String, side: &'static str },
    /// A diameter the thread-length table of a standard does not list.
    #[error("{standard} does not tabulate a thread length for a {d_in} in. bolt")]
    SizeNotTabulated { standard: &'static str, d_in: f64 },
    /// The bolt type's thread-length rule gives no value (a size or length it does not cover).
    #[error("thread length: {0}")]
    ThreadLength(String),
    /// No length of the series satisfies every rule.
    #[error("no bolt length in the series satisfies every rule ({tried} lengths tried)")]
    NoLengthFits { tried: usize },
}

/// The thread-length rule of a bolt type.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum BoltType {
    /// ASME B18.2.1 hex bolt / hex cap screw: LT = 2D + 1/4 in. (L ≤ 6 in.), 2D + 1/2 in. (L > 6 in.).
    HexBoltAsmeB18_2_1,
    /// ASME B18.2.6 heavy hex structural bolt: LT by diameter from its table.
    HeavyHexStructuralAsmeB18_2_6,
    /// ISO 4014 part-threaded hex bolt: b = 2d + 6 / 12 / 25 mm by length.
    PartThreadedIso4014,
    /// Threaded over its whole length (ISO 4017 hex screw, fully threaded inch screws).
    FullyThreaded,
}

/// Thread length LT (or b) of a bolt of diameter `d` and length `l`, per the standard of its type;
/// `None` when the bolt is threaded over its whole length (also when LT ≥ L).
pub fn thread_length(bolt: BoltType, d: Length, l: Length) -> Result<Option<Length>, StackError> {
    positive("bolt diameter", d)?;
    positive("bolt length", l)?;
    let lt = match bolt {
        BoltType::HexBoltAsmeB18_2_1 => {
            let extra = if l.to_in() <= 6.0 { 0.25 } else { 0.5 };
            Length::inch(2.0 * d.to_in() + extra)
        }
        BoltType::HeavyHexStructuralAsmeB18_2_6 => structural_thread_length(d)?,
        BoltType::PartThreadedIso4014 => {
            let extra = if l.to_mm() <= 125.0 {
                6.0
            } else if l.to_mm() <= 200.0 {
                12.0
            } else {
                25.0
            };
            Length::mm(2.0 * d.to_mm() + extra)
        }
        BoltType::FullyThreaded => return Ok(None),
    };
    Ok(if lt.si() >= l.si() { None } else { Some(lt) })
}

/// ASME B18.2.6 heavy hex structural bolt thread length by diameter, in inches.
fn structural_thread_length(d: Length) -> Result<Length, StackError> {
    // (D, LT) in inches; 1/2 to 1 in. as listed in the project's reference table for B18.2.6.
    const TABLE: [(f64, f64); 5] = [
        (0.5, 1.00),
        (0.625, 1.25),
        (0.75, 1.38),
        (0.875, 1.50),
        (1.0, 1.75),
    ];
    let d_in = d.to_in();
    TABLE
        .iter()
        .find(|(size, _)| (size - d_in).abs() < 1e-6)
        .map(|(_, lt)| Length::inch(*lt))
        .ok_or(StackError::SizeNotTabulated {
            standard: "ASME B18.2.6",
            d_in,
        })
}

/// Whether a ply is solid material or an open gap (the hollow of a tube, the space between walls).
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum PlyKind {
    Solid,
    Gap,
}

/// One layer the bolt passes through, in order from the head side.
#[derive(Debug, Clone, PartialEq)]
pub struct Ply {
    pub name: String,
    pub thickness: Length,
    pub kind: PlyKind,
}

/// Grip: the sum of the plies and gaps the bolt passes through, exclusive of washers (the RCSC
/// Specification's glossary definition of grip, from memory); the washers are added separately.
pub fn grip(plies: &[Ply]) -> Result<Length, StackError> {
    let (first, last) = match (plies.first(), plies.last()) {
        (Some(f), Some(l)) => (f, l),
        _ => return Err(StackError::NoPlies),
    };
    for (ply, side) in [(first, "head"), (last, "nut")] {
        if ply.kind == PlyKind::Gap {
            return Err(StackError::GapAtBearingFace {
                name: ply.name.clone(),
                side,
            });
        }
    }
    for ply in plies {
        positive(&format!("thickness of ply '{}'", ply.name), ply.thickness)?;
    }
    Ok(plies.iter().map(|p| p.thickness).sum())
}

/// How far the bolt end must reach past the outer face of the nut.
#[derive(Debug, Clone, Copy, PartialEq)]
pub enum StickoutRule {
    /// At least flush with the outer face of the nut (RCSC 2020 §2.3.2).
    Flush,
    /// At least this many full thread pitches (EN 1090-2:2018 8.2.2 asks one).
    Pitches(u32),
    /// At least this length.
    Length(Length),
}

/// Thread past the nut, RCSC 2020 §2.3.2 (flush) or EN 1090-2:2018 8.2.2 (one pitch):
/// L − (grip + washers) ≥ nut height + the rule's least stick-out.
pub fn thread_past_nut(
    length: Length,
    bearing_span: Length,
    nut_height: Length,
    pitch: Length,
    rule: StickoutRule,
    citation: Citation,
) -> Requirement {
    // Compared as reach past the nut bearing face, so a flush rule keeps a positive required value
    // (a zero required value would make a negative stick-out pass the ratio test).
    let reach = snap(length - bearing_span);
    let required = match rule {
        StickoutRule::Flush => Length::mm(0.0),
        StickoutRule::Pitches(n) => pitch * f64::from(n),
        StickoutRule::Length(l) => l,
    };
    Requirement {
        citation,
        formula: "L − (grip + washers) ≥ m + stick-out required",
        inputs: vec![
            Input::new("L", length, "bolt length"),
            Input::new(
                "grip + washers",
                bearing_span,
                "head bearing face to nut bearing face",
            ),
            Input::new("m", nut_height, "nut height"),
            Input::new("P", pitch, "thread pitch"),
        ],
        provided: reach.into(),
        required: snap(nut_height + required).into(),
        bound: Bound::Minimum,
        notes: vec![],
        out_of_scope: vec![],
    }
}

/// Where the thread lies along a bolt, measured from the bearing face under the head.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct ThreadLayout {
    /// Threaded over its whole length: no shear plane can have its threads excluded.
    pub fully_threaded: bool,
    /// Farthest position from the head at which full-form thread may begin: L − LT.
    pub full_thread_start_max: Length,
    /// Nearest position from the head at which the plain shank may end: L − LT − Y.
    pub shank_end_min: Length,
}

/// Thread layout of a bolt of length `l` with thread length `lt` (`None`: fully threaded) and a
/// transition (run-out) thread of at most `transition` (Y). LT is taken as the full-form thread
/// measured from the bolt end, the transition lying beyond it toward the head (the grip-gauging
/// convention LG,max = L − LT, LB,min = LG,max − Y of ASME B18.2.1 / ISO 4014, from memory).
pub fn thread_layout(l: Length, lt: Option<Length>, transition: Length) -> ThreadLayout {
    match lt {
        None => ThreadLayout {
            fully_threaded: true,
            full_thread_start_max: transition,
            shank_end_min: Length::mm(0.0),
        },
        Some(lt) => ThreadLayout {
            fully_threaded: false,
            full_thread_start_max: snap(l - lt),
            shank_end_min: snap((l - lt - transition).max(Length::mm(0.0))),
        },
    }
}

/// Whether the threads are excluded from a shear plane at `position` from the head bearing face,
/// and by what margin (shank end − plane position). A plane within the transition thread counts as
/// not excluded (conservative); a fully threaded bolt never excludes its threads.
pub fn threads_excluded(layout: &ThreadLayout, position: Length) -> (bool, Length) {
    let margin = snap(layout.shank_end_min - position);
    (!layout.fully_threaded && margin.si() >= 0.0, margin)
}

/// Thread run-out, EN 1090-2:2018 8.2.2 (full threads clear between nut and shank) or common
/// practice (nut bears on full threads): nut bearing face ≥ L − LT + n P.
pub fn thread_runout(
    layout: &ThreadLayout,
    nut_face: Length,
    clear_pitches: u32,
    pitch: Length,
    citation: Citation,
) -> Requirement {
    let required = layout.full_thread_start_max + pitch * f64::from(clear_pitches);
    Requirement {
        citation,
        formula: "nut bearing face ≥ (L − LT) + n P",
        inputs: vec![
            Input::new(
                "L − LT",
                layout.full_thread_start_max,
                "farthest start of full thread",
            ),
            Input::new(
                "n",
                f64::from(clear_pitches),
                "full threads clear before the nut",
            ),
            Input::new("P", pitch, "thread pitch"),
        ],
        provided: snap(nut_face).into(),
        required: snap(required).into(),
        bound: Bound::Minimum,
        notes: vec![],
        out_of_scope: vec![],
    }
}

/// Nylon-insert nut, common practice (no clause at hand): the bolt must pass fully through the
/// insert, i.e. reach `pass_through` past the nut bearing face plus `extra_pitches` full threads.
pub fn insert_pass_through(
    length: Length,
    bearing_span: Length,
    pass_through: Length,
    extra_pitches: u32,
    pitch: Length,
) -> Requirement {
    Requirement {
        citation: Citation::new("common practice", "nylon-insert nut engagement", ""),
        formula: "L − (grip + washers) ≥ insert pass-through + n P",
        inputs: vec![
            Input::new("L", length, "bolt length"),
            Input::new(
                "grip + washers",
                bearing_span,
                "head bearing face to nut bearing face",
            ),
            Input::new(
                "h",
                pass_through,
                "nut bearing face to far side of the insert",
            ),
            Input::new(
                "n",
                f64::from(extra_pitches),
                "full threads beyond the insert",
            ),
            Input::new("P", pitch, "thread pitch"),
        ],
        provided: snap(length - bearing_span).into(),
        required: snap(pass_through + pitch * f64::from(extra_pitches)).into(),
        bound: Bound::Minimum,
        notes: vec!["common practice, not a clause of a cited standard".into()],
        out_of_scope: vec![],
    }
}

/// The rules a bolt length must meet in one stack, with the stack's dimensions.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct LengthRules {
    /// Basic major diameter D.
    pub d: Length,
    /// Thread pitch P.
    pub pitch: Length,
    pub bolt: BoltType,
    /// Transition (run-out) thread allowance Y.
    pub transition: Length,
    /// Grip plus washers at their greatest thickness: head bearing face to nut bearing face,
    /// farthest (governs the least stick-out).
    pub bearing_span: Length,
    /// The same span with the washers at their least thickness (governs the greatest stick-out
    /// and the run-out: the nut sits nearest the head).
    pub bearing_span_min: Length,
    /// Nut height m.
    pub nut_height: Length,
    pub stickout: StickoutRule,
    pub stickout_citation: Citation,
    /// Project maximum stick-out beyond the nut face, if any.
    pub max_stickout: Option<Length>,
    /// Nylon insert: reach past the nut bearing face and extra full threads.
    pub insert: Option<(Length, u32)>,
    /// Full threads required clear between nut and shank beyond the run-out.
    pub clear_pitches: u32,
    pub runout_citation: Citation,
}

/// Every length rule evaluated for one bolt length (stick-out, maximum, insert, run-out), the
/// thread length from the rule of `rules.bolt`.
pub fn length_checks(rules: &LengthRules, length: Length) -> Result<Vec<Requirement>, StackError> {
    let lt = thread_length(rules.bolt, rules.d, length)?;
    length_checks_with_thread(rules, length, lt)
}

/// Every length rule evaluated for one bolt length whose thread length `lt` the caller gives
/// (`None`: threaded to the head); `rules.bolt` is not used.
pub fn length_checks_with_thread(
    rules: &LengthRules,
    length: Length,
    lt: Option<Length>,
) -> Result<Vec<Requirement>, StackError> {
    positive("nut height", rules.nut_height)?;
    positive("thread pitch", rules.pitch)?;
    positive("bolt length", length)?;
    if rules.bearing_span_min.si() > rules.bearing_span.si() {
        return Err(StackError::NotPositive {
            what: "bearing span range (greatest less least)".into(),
            value_mm: (rules.bearing_span - rules.bearing_span_min).to_mm(),
        });
    }
    let layout = thread_layout(length, lt, rules.transition);
    let mut checks = vec![thread_past_nut(
        length,
        rules.bearing_span,
        rules.nut_height,
        rules.pitch,
        rules.stickout,
        rules.stickout_citation,
    )];
    if let Some(max) = rules.max_stickout {
        let mut r = thread_past_nut(
            length,
            rules.bearing_span_min,
            rules.nut_height,
            rules.pitch,
            rules.stickout,
            rules.stickout_citation,
        );
        r.citation = Citation::new("project rule", "maximum stick-out", "");
        r.formula = "L − (grip + washers) ≤ m + stick-out allowed";
        r.required = snap(rules.nut_height + max).into();
        r.bound = Bound::Maximum;
        checks.push(r);
    }
    if let Some((reach, extra)) = rules.insert {
        checks.push(insert_pass_through(
            length,
            rules.bearing_span,
            reach,
            extra,
            rules.pitch,
        ));
    }
    checks.push(thread_runout(
        &layout,
        rules.bearing_span_min,
        rules.clear_pitches,
        rules.pitch,
        rules.runout_citation,
    ));
    Ok(checks)
}

/// The shortest length of `series` meeting every length rule, with its checks.
pub fn bolt_length(
    rules: &LengthRules,
    series: &[Length],
) -> Result<(Length, Vec<Requirement>), StackError> {
    bolt_length_with_thread(rules, series, |l| thread_length(rules.bolt, rules.d, l))
}

/// The shortest length of `series` meeting every length rule, the thread length of each
/// candidate given by `lt_of` (`None`: threaded to the head).
pub fn bolt_length_with_thread(
    rules: &LengthRules,
    series: &[Length],
    lt_of: impl Fn(Length) -> Result<Option<Length>, StackError>,
) -> Result<(Length, Vec<Requirement>), StackError> {
    let mut sorted = series.to_vec();
    sorted.sort_by(|a, b| a.si().total_cmp(&b.si()));
    for l in &sorted {
        let checks = length_checks_with_thread(rules, *l, lt_of(*l)?)?;
        if checks.iter().all(|r| r.ratio() <= 1.0) {
            return Ok((*l, checks));
        }
    }
    Err(StackError::NoLengthFits {
        tried: sorted.len(),
    })
}

/// RCSC Specification for Structural Joints 2020 §2.3.2: bolt end at least flush with the nut.
pub const RCSC_2020_STICKOUT: Citation = Citation::new("RCSC 2020", "2.3.2", "");
/// EN 1090-2:2018 8.2.2: at least one full thread pitch beyond the nut face.
pub const EN_1090_2_STICKOUT: Citation = Citation::new("EN 1090-2:2018", "8.2.2", "");

/// Round a length to a millionth of a millimetre so sums of plies compare exactly.
pub(crate) fn snap(l: Length) -> Length {
    Length::mm((l.to_mm() * 1e6).round() / 1e6)
}

pub(crate) fn positive(what: &str, l: Length) -> Result<(), StackError> {
    if l.si() > 0.0 && l.is_finite() {
        Ok(())
    } else {
        Err(StackError::NotPositive {
            what: what.to_string(),
            value_mm: l.to_mm(),
        })
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    fn ply(name: &str, t_in: f64, kind: PlyKind) -> Ply {
        Ply {
            name: name.into(),
            thickness: Length::inch(t_in),
            kind,
        }
    }

    #[test]
    fn b18_2_1_rule_changes_above_six_inches() {
        // ASME B18.2.1 rule as given in the project's reference table: 2D + 1/4 / 2D + 1/2 in.
        let d = Length::inch(0.5);
        let short = thread_length(BoltType::HexBoltAsmeB18_2_1, d, Length::inch(6.0));
        let long = thread_length(BoltType::HexBoltAsmeB18_2_1, d, Length::inch(6.5));
        assert!((short.unwrap().unwrap().to_in() - 1.25).abs() < 1e-9);
        assert!((long.unwrap().unwrap().to_in() - 1.5).abs() < 1e-9);
    }

    #[test]
    fn short_bolt_is_fully_threaded() {
        let lt = thread_length(
            BoltType::HexBoltAsmeB18_2_1,
            Length::inch(0.5),
            Length::inch(1.0),
        );
        assert_eq!(lt, Ok(None));
    }

    #[test]
    fn structural_size_outside_table_is_an_error() {
        let e = thread_length(
            BoltType::HeavyHexStructuralAsmeB18_2_6,
            Length::inch(0.4),
            Length::inch(3.0),
        )
        .unwrap_err();
        assert!(e.to_string().contains("does not tabulate"), "{e}");
    }

    #[test]
    fn iso_4014_b_by_length() {
        // ISO 4014 b = 2d + 6 (l ≤ 125), 2d + 12 (≤ 200), 2d + 25 mm above (brief's rule).
        let d = Length::mm(12.0);
        for (l, b) in [(100.0, 30.0), (150.0, 36.0), (220.0, 49.0)] {
            let got = thread_length(BoltType::PartThreadedIso4014, d, Length::mm(l));
            assert!((got.unwrap().unwrap().to_mm() - b).abs() < 1e-9);
        }
    }

    #[test]
    fn grip_rejects_empty_gap_ends_and_zero_plies() {
        assert_eq!(grip(&[]), Err(StackError::NoPlies));
        let e = grip(&[ply("tube inside", 2.0, PlyKind::Gap)]).unwrap_err();
        assert!(e.to_string().contains("open gap"), "{e}");
        let e = grip(&[ply("tab", 0.0, PlyKind::Solid)]).unwrap_err();
        assert!(e.to_string().contains("greater than zero"), "{e}");
    }

    #[test]
    fn sleeve_grip_counts_the_hollow() {
        // Worked by hand: 1/4 + 1/8 + 1-3/4 (hollow) + 1/8 + 1/4 = 2-1/2 in.
        let plies = [
            ply("sleeve wall", 0.25, PlyKind::Solid),
            ply("tube wall", 0.125, PlyKind::Solid),
            ply("tube inside", 1.75, PlyKind::Gap),
            ply("tube wall", 0.125, PlyKind::Solid),
            ply("sleeve wall", 0.25, PlyKind::Solid),
        ];
        assert!((grip(&plies).unwrap().to_in() - 2.5).abs() < 1e-9);
    }

    #[test]
    fn flush_and_pitch_rules() {
        // Worked by hand: 1-1/2 in. bolt, 1 in. span, 31/64 nut: stick-out 1/64 in.
        let r = thread_past_nut(
            Length::inch(1.5),
            Length::inch(1.0),
            Length::inch(31.0 / 64.0),
            Length::inch(1.0 / 13.0),
            StickoutRule::Flush,
            RCSC_2020_STICKOUT,
        );
        assert!(r.ratio() <= 1.0);
        let r = thread_past_nut(
            Length::inch(1.5),
            Length::inch(1.0),
            Length::inch(31.0 / 64.0),
            Length::inch(1.0 / 13.0),
            StickoutRule::Pitches(1),
            EN_1090_2_STICKOUT,
        );
        assert!(r.ratio() > 1.0, "1/64 in. is less than one pitch");
    }

    #[test]
    fn runout_fails_when_the_nut_sits_on_the_transition() {
        // Worked by hand: L = 3, LT = 1.25 → full thread from 1.75 in.; nut face at 1.5 fails,
        // at 2.0 passes; EN 1090-2 8.2.2 one clear pitch: 1.75 + 1/13 = 1.8269 in.
        let layout = thread_layout(
            Length::inch(3.0),
            Some(Length::inch(1.25)),
            Length::inch(0.4),
        );
        let p = Length::inch(1.0 / 13.0);
        let c = Citation::new("EN 1090-2:2018", "8.2.2", "");
        assert!(thread_runout(&layout, Length::inch(1.5), 0, p, c).ratio() > 1.0);
        assert!(thread_runout(&layout, Length::inch(2.0), 1, p, c).ratio() <= 1.0);
        assert!(thread_runout(&layout, Length::inch(1.8), 1, p, c).ratio() > 1.0);
    }

    #[test]
    fn plane_in_the_transition_is_not_excluded() {
        let layout = thread_layout(
            Length::inch(3.0),
            Some(Length::inch(1.25)),
            Length::inch(0.4),
        );
        // Shank ends at 1.35; a plane at 1.5 lies in the transition (full thread from 1.75).
        assert!(!threads_excluded(&layout, Length::inch(1.5)).0);
        assert!(threads_excluded(&layout, Length::inch(1.35)).0);
    }

    #[test]
    fn nylon_insert_nut_just_too_short() {
        // Worked by hand: span 1.0, insert reaches 0.45 past the bearing face, two pitches of
        // 1/13: needs 1.0 + 0.45 + 0.1538 = 1.6038 in.; a 1-1/2 in. bolt is flush past a 0.4 in.
        // nut yet fails the insert rule.
        let p = Length::inch(1.0 / 13.0);
        let r = insert_pass_through(
            Length::inch(1.5),
            Length::inch(1.0),
            Length::inch(0.45),
            2,
            p,
        );
        assert!(r.ratio() > 1.0);
        let flush = thread_past_nut(
            Length::inch(1.5),
            Length::inch(1.0),
            Length::inch(0.4),
            p,
            StickoutRule::Flush,
            RCSC_2020_STICKOUT,
        );
        assert!(flush.ratio() <= 1.0);
        let r = insert_pass_through(
            Length::inch(1.75),
            Length::inch(1.0),
            Length::inch(0.45),
            2,
            p,
        );
        assert!(r.ratio() <= 1.0);
    }

    fn tab_rules() -> LengthRules {
        // Worked by hand: 1/2-13 hex bolt through 3/8 + 3/8 + 3/8 plies, one 0.1 in. washer each
        // side: span 1.325 in.; heavy hex nut 31/64 = 0.484 in.; flush needs L ≥ 1.809 in.
        LengthRules {
            d: Length::inch(0.5),
            pitch: Length::inch(1.0 / 13.0),
            bolt: BoltType::HexBoltAsmeB18_2_1,
            transition: Length::inch(5.0 / 13.0),
            bearing_span: Length::inch(1.325),
            bearing_span_min: Length::inch(1.325),
            nut_height: Length::inch(31.0 / 64.0),
            stickout: StickoutRule::Flush,
            stickout_citation: RCSC_2020_STICKOUT,
            max_stickout: None,
            insert: None,
            clear_pitches: 0,
            runout_citation: Citation::new("common practice", "nut bears on full threads", ""),
        }
    }

    #[test]
    fn shortest_length_of_the_series_is_chosen() {
        let series: Vec<Length> = [2.5, 1.75, 2.0, 2.25].map(Length::inch).to_vec();
        let (l, checks) = bolt_length(&tab_rules(), &series).unwrap();
        assert!((l.to_in() - 2.0).abs() < 1e-9);
        assert!(checks.iter().all(|r| r.ratio() <= 1.0));
    }

    #[test]
    fn no_length_fits_is_an_error_not_a_panic() {
        let mut rules = tab_rules();
        rules.max_stickout = Some(Length::inch(0.05));
        let series: Vec<Length> = [1.75, 2.0, 2.25].map(Length::inch).to_vec();
        // 1.75 too short, 2.0 sticks out 0.191 > 0.05 in.
        assert_eq!(
            bolt_length(&rules, &series),
            Err(StackError::NoLengthFits { tried: 3 })
        );
    }

    #[test]
    fn flush_rule_fails_a_bolt_short_of_the_nut_face() {
        // Regression: 1-3/4 in. bolt, span 1.325, nut 31/64 → end 0.059 in. inside the nut.
        let r = thread_past_nut(
            Length::inch(1.75),
            Length::inch(1.325),
            Length::inch(31.0 / 64.0),
            Length::inch(1.0 / 13.0),
            StickoutRule::Flush,
            RCSC_2020_STICKOUT,
        );
        assert!(r.ratio() > 1.0);
    }

    #[test]
    fn runout_uses_the_thinnest_washers() {
        // Worked by hand: 1/2 in. hex bolt, L = 2-1/2 → LT = 2(0.5) + 1/4 = 1.25 (ASME B18.2.1
        // rule), full thread from 1.25 in. With the thinnest washers the nut face is at 1.2 in.,
        // on the transition: fails, though the thickest washers (1.325 in.) would pass.
        let mut rules = tab_rules();
        rules.bearing_span_min = Length::inch(1.2);
        let checks = length_checks(&rules, Length::inch(2.5)).unwrap();
        assert!(checks[0].ratio() <= 1.0, "reaches past the nut");
        assert!(
            checks.last().unwrap().ratio() > 1.0,
            "nut on the transition"
        );
        rules.bearing_span_min = rules.bearing_span;
        let checks = length_checks(&rules, Length::inch(2.5)).unwrap();
        assert!(checks.last().unwrap().ratio() <= 1.0);
    }

    #[test]
    fn a_span_range_upside_down_is_an_error() {
        let mut rules = tab_rules();
        rules.bearing_span_min = Length::inch(1.5);
        assert!(length_checks(&rules, Length::inch(2.5)).is_err());
    }
}
