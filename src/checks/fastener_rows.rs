//! The stack-up rows of a connection's check report, read from its [`FastenerSet`]: the bolt
//! length, the thread past the nut, the greatest stick-out, the nylon insert, the run-out, the
//! nut grade against the bolt grade, and a stated thread exclusion against the bolt chosen.

use super::fasteners::{BoltLength, FastenerSet};
use super::{impossible, CheckResult, ConnectionReport};
use crate::model::Bolting;
use crate::stackup::{self, planes::PlaneThreads};
use crate::standards::aisc360::input::InputError;
use crate::standards::aisc360::j3_bolts::Threads;
use crate::standards::aisc360::Edition;
use crate::standards::{number, Bound, Citation, Input, Requirement};
use crate::units::Length;

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
            let mut c = CheckResult::requirement(
                "bolt_length",
                "bolts",
                length_requirement(b, set, *l),
                false,
            );
            c.notes.extend(
                set.notes
                    .iter()
                    .filter(|n| !n.starts_with("thread_past_nut"))
                    .cloned(),
            );
            r.checks.push(c);
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
            c.notes.extend(
                set.notes
                    .iter()
                    .filter(|n| n.starts_with("thread_past_nut"))
                    .cloned(),
            );
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
    let (reach, reach_rule) = set
        .rules
        .iter()
        .filter(|x| {
            x.limit_state == "thread_past_nut" || x.limit_state == "nut_insert_pass_through"
        })
        .map(|x| (x.requirement.required.si, x.limit_state))
        .fold(
            (0.0, "thread_past_nut"),
            |a, b| if b.0 > a.0 { b } else { a },
        );
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
        notes: vec![
            how,
            format!("the reach required is set by {reach_rule}"),
            format!("spec: {}", set.spec),
        ],
        out_of_scope: vec![],
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::checks::Status;
    use crate::model::{load, LoadOptions, Model};
    use std::path::Path;

    fn demo() -> Model {
        let path = Path::new(env!("CARGO_MANIFEST_DIR"))
            .join("examples/quillon-brook-footbridge/model.toml");
        load(&path, &LoadOptions::default()).expect("the demo model loads")
    }

    #[test]
    fn a_stated_exclusion_passes_where_the_shank_fills_the_plane_and_fails_where_not() {
        let mut model = demo();
        for d in &mut model.details {
            d.bolts.threads = Some(Threads::Excluded);
        }
        let report = super::super::check_model(&model);
        let c = report
            .connections
            .iter()
            .find(|c| c.id == "BC1/end")
            .unwrap();
        let rows: Vec<Status> = c
            .checks
            .iter()
            .filter(|r| r.limit_state == "thread_condition")
            .map(|r| r.status)
            .collect();
        assert_eq!(rows, [Status::Pass, Status::Fail]);
    }

    #[test]
    fn a_nut_grade_that_does_not_suit_the_bolt_fails() {
        let model = demo();
        let mut b = model.details[0].bolts.clone();
        assert!(fastener_combination(&b).ratio() <= 1.0);
        b.nut_grade.suits.retain(|g| g != &b.grade.name);
        let r = fastener_combination(&b);
        assert!(r.ratio() > 1.0);
        assert!(r.notes[0].contains("is not among them"), "{:?}", r.notes);
        assert_eq!(r.citation.clause, "Appendix X1");
    }
}
