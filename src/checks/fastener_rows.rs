//! The stack-up rows of a connection's check report, read from its [`FastenerSet`]: the bolt
//! length, the thread past the nut, the greatest stick-out, the nylon insert, the run-out, the
//! nut grade against the bolt grade, and a stated thread exclusion against the bolt chosen.

use super::fasteners::{BoltLength, FastenerSet};
use super::{impossible, CheckResult, ConnectionReport};
use crate::catalogue::{Finish, Nut, NutGrade};
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

/// RCSC 2020 Table 2.1 (acceptable nut grades and finishes), cited for a hot-dip galvanized
/// bolt's nut grade (from memory).
pub const RCSC_2020_NUT_FINISHES: Citation = Citation::new("RCSC 2020", "Table 2.1", "");

/// ASTM A563 (with ASTM F3125): nuts for hot-dip galvanized bolts are tapped oversize after
/// galvanizing (from memory; the clause number is not at hand).
pub const A563_OVERTAP: Citation = Citation::new(
    "ASTM A563-15",
    "nuts for hot-dip galvanized bolts tapped oversize",
    "",
);

/// The fastener combination: the nut grade must suit the bolt grade (a nut weaker than its bolt
/// fails), by the nut standard's suitability table as the catalogue records it (ASTM A563
/// Appendix X1, ISO 898-2 Table 1); for a hot-dip galvanized bolt, by RCSC 2020 Table 2.1.
pub fn fastener_combination(b: &Bolting, nut_grade: &NutGrade) -> Requirement {
    let galvanized = b.bolt_type.finish == Finish::HotDipGalvanized;
    let (suits, list, basis) = if galvanized {
        (
            nut_grade.suits_galvanized_grade(&b.grade.name),
            &nut_grade.suits_galvanized,
            nut_grade
                .suits_galvanized_basis
                .clone()
                .unwrap_or_else(|| "the catalogue lists no galvanized bolt grade for it".into()),
        )
    } else {
        (
            nut_grade.suits_grade(&b.grade.name),
            &nut_grade.suits,
            nut_grade.suits_basis.clone(),
        )
    };
    let bolt = if galvanized {
        format!("{} hot-dip galvanized", b.grade.name)
    } else {
        b.grade.name.clone()
    };
    let listed = if list.is_empty() {
        "no bolt grade".to_string()
    } else {
        list.join(", ")
    };
    let mut notes = vec![format!(
        "{}{} suits {listed}: {} ({basis})",
        nut_grade.name,
        if galvanized { " (galvanized)" } else { "" },
        if suits {
            format!("{bolt} is among them")
        } else if galvanized {
            format!("{bolt} is not among them — no galvanized nut of this grade is listed for it")
        } else {
            format!("{bolt} is not among them — the nut is weaker than the bolt")
        },
    )];
    if !suits {
        notes.push(if galvanized {
            "choose a nut grade listed for the galvanized bolt grade (ASTM A563 Gr DH for Grade A325); Grade A490 bolts are not hot-dip galvanized (ASTM F3125, from memory)".into()
        } else {
            "choose a nut grade that suits the bolt grade (e.g. a heavier or harder grade)".into()
        });
    }
    let unsuited = if suits { 0.0 } else { 1.0 };
    Requirement {
        citation: if galvanized {
            RCSC_2020_NUT_FINISHES
        } else {
            nut_suitability_citation(&nut_grade.standard)
        },
        formula: "bolt grades the nut grade does not suit ≤ 0",
        inputs: vec![Input::new(
            "unsuited",
            number(unsuited),
            "1 when the nut grade does not list the bolt grade (for its finish), else 0",
        )],
        provided: number(unsuited),
        required: number(0.0),
        bound: Bound::Maximum,
        notes,
        out_of_scope: vec![],
    }
}

/// The nut's tapping must suit the bolt's finish: a hot-dip galvanized bolt needs a nut tapped
/// oversize after galvanizing, and a nut tapped oversize belongs on a galvanized bolt only
/// (ASTM A563-15 overtapping requirement, with ASTM F3125; from memory).
pub fn nut_finish_fit(b: &Bolting, nut: &Nut) -> Requirement {
    let galvanized = b.bolt_type.finish == Finish::HotDipGalvanized;
    let oversize = nut.tapped_oversize_for_galvanized;
    let mut notes = vec![format!(
        "bolt {}: {}; nut {}: {}{}",
        b.bolt_type.name,
        b.bolt_type.finish.as_str(),
        nut.name,
        nut.finish.as_str(),
        if oversize {
            ", tapped oversize for hot-dip galvanized bolts"
        } else {
            ", tapped to the standard thread size"
        }
    )];
    let misfit = galvanized != oversize;
    if galvanized && !oversize {
        notes.push("a nut tapped to the standard size does not go on the zinc-coated thread of a hot-dip galvanized bolt, or it strips the coating and the thread when forced: use a galvanized nut tapped oversize after galvanizing".into());
    }
    if !galvanized && oversize {
        notes.push("a nut tapped oversize goes on a plain bolt loosely: its thread engages less than the standard's proof load is based on, and the nut may strip — fails; use a plain nut, or galvanize the bolt".into());
    }
    let n = if misfit { 1.0 } else { 0.0 };
    Requirement {
        citation: A563_OVERTAP,
        formula: "nut tapping that does not suit the bolt's finish ≤ 0",
        inputs: vec![Input::new(
            "misfit",
            number(n),
            "1 when the bolt is hot-dip galvanized and the nut not tapped oversize for it, or the nut is tapped oversize and the bolt is not galvanized, else 0",
        )],
        provided: number(n),
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
    if let Some(g) = &b.nut_grade {
        r.checks.push(CheckResult::requirement(
            "fastener_combination",
            "nut grade",
            fastener_combination(b, g),
            false,
        ));
    }
    match &b.nut {
        Some(n) => r.checks.push(CheckResult::requirement(
            "fastener_combination",
            "nut finish",
            nut_finish_fit(b, n),
            false,
        )),
        None if b.bolt_type.finish == Finish::HotDipGalvanized => r.not_checked.push(
            "fastener_combination (finish): a hot-dip galvanized screw needs its plug tapped oversize for the zinc, and the model does not say how the plug is tapped".into(),
        ),
        None => {}
    }
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
    if set.nut.is_empty() {
        return tapped_length_requirement(set, l);
    }
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

/// bolt_length of a tapped screw (common practice): L ≥ washer + plate + the engagement the
/// detail gives.
fn tapped_length_requirement(set: &FastenerSet, l: Length) -> Requirement {
    let washers: Length = set.washers.iter().map(|w| w.thickness).sum();
    let plate = set.grip.unwrap_or(Length::mm(0.0));
    let engaged = set.plies.get(1).map_or(Length::mm(0.0), |p| p.thickness);
    Requirement {
        citation: Citation::new("common practice", "screw reaches its engagement", ""),
        formula: "L ≥ washers + plate + Le",
        inputs: vec![
            Input::new("L", l, "screw length"),
            Input::new(
                "washers",
                washers,
                "washer under the head, greatest thickness",
            ),
            Input::new("plate", plate, "plate under the head"),
            Input::new("Le", engaged, "thread engaged in the plug"),
        ],
        provided: l.into(),
        required: (washers + plate + engaged).into(),
        bound: Bound::Minimum,
        notes: vec![format!("spec: {}", set.spec)],
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
        let b = model.details[0].bolts.clone();
        let mut grade = b.nut_grade.clone().expect("the demo's details have nuts");
        assert!(fastener_combination(&b, &grade).ratio() <= 1.0);
        grade.suits.retain(|g| g != &b.grade.name);
        let r = fastener_combination(&b, &grade);
        assert!(r.ratio() > 1.0);
        assert!(r.notes[0].contains("is not among them"), "{:?}", r.notes);
        assert_eq!(r.citation.clause, "Appendix X1");
    }

    const GALV_BOLT: &str = "heavy hex structural bolt, hot-dip galvanized";
    const GALV_NUT: &str = "heavy hex nut, hot-dip galvanized, tapped oversize";

    #[test]
    fn a_galvanized_bolt_needs_a_nut_tapped_oversize_and_a_plain_bolt_a_plain_nut() {
        // ASTM A563-15 (with ASTM F3125-19): nuts for hot-dip galvanized bolts are tapped
        // oversize after galvanizing (from memory, clause number not at hand).
        let cat = crate::catalogue::Catalogue::embedded().unwrap();
        let plain_bolt = demo().details[0].bolts.clone();
        let plain_nut = plain_bolt.nut.clone().unwrap();
        let galv_nut = cat.nut(GALV_NUT).unwrap().clone();
        let mut galv_bolt = plain_bolt.clone();
        galv_bolt.bolt_type = cat.bolt_type(GALV_BOLT).unwrap().clone();
        let cases = [
            (&plain_bolt, &plain_nut, true),
            (&galv_bolt, &galv_nut, true),
            (&galv_bolt, &plain_nut, false),
            (&plain_bolt, &galv_nut, false),
        ];
        for (b, n, fits) in cases {
            let r = nut_finish_fit(b, n);
            assert_eq!(
                r.ratio() <= 1.0,
                fits,
                "{} with {}",
                b.bolt_type.name,
                n.name
            );
            assert_eq!(r.citation, A563_OVERTAP);
        }
        assert!(nut_finish_fit(&galv_bolt, &plain_nut).notes[1].contains("does not go on"));
        assert!(nut_finish_fit(&plain_bolt, &galv_nut).notes[1].contains("loosely"));
    }

    #[test]
    fn a_galvanized_bolt_takes_the_nut_grades_listed_for_galvanized() {
        // RCSC 2020 Table 2.1 (from memory): galvanized Grade A325 takes A563 DH, not C; Grade
        // A490 is not galvanized, so no nut grade suits it galvanized.
        let cat = crate::catalogue::Catalogue::embedded().unwrap();
        let mut b = demo().details[0].bolts.clone();
        b.bolt_type = cat.bolt_type(GALV_BOLT).unwrap().clone();
        let dh = cat.nut_grade("ASTM A563 Gr DH").unwrap();
        let c = cat.nut_grade("ASTM A563 Gr C").unwrap();
        assert!(fastener_combination(&b, dh).ratio() <= 1.0);
        assert_eq!(
            fastener_combination(&b, dh).citation,
            RCSC_2020_NUT_FINISHES
        );
        assert!(fastener_combination(&b, c).ratio() > 1.0);
        b.grade = cat.bolt_grade("ASTM F3125 Gr A490").unwrap().clone();
        let r = fastener_combination(&b, dh);
        assert!(r.ratio() > 1.0);
        assert!(
            r.notes[1].contains("A490 bolts are not hot-dip galvanized"),
            "{:?}",
            r.notes
        );
    }
}
