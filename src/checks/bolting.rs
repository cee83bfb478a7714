//! What the tab and sleeve checks share about their bolts: the Table J3.2 stresses of the grade,
//! the hole, and the bearing / tear-out strength of a bolt group on one ply.

use crate::catalogue::AiscGroup;
use crate::model::Bolting;
use crate::standards::aisc360::input::InputError;
use crate::standards::aisc360::j3_bolts::{
    self, table_j3_2, Bolt, BoltGrade, BoltStresses, EdgeHole, HoleType, JointLoading, Series,
    Threads,
};
use crate::standards::aisc360::Edition;
use crate::standards::{Input, Strength};
use crate::units::{Force, Length};

/// Whether a bolt is sized in inches or millimetres, from its thread series.
pub fn series(b: &Bolting) -> Series {
    if b.thread.designation.starts_with('M') {
        Series::Metric
    } else {
        Series::Inch
    }
}

/// The nominal diameter of the bolts.
pub fn diameter(b: &Bolting) -> Length {
    b.thread.d
}

/// The thread condition used for shear, and a note when the model does not state it.
pub fn threads(b: &Bolting) -> (Threads, Option<String>) {
    match b.threads {
        Some(t) => (t, None),
        None => (
            Threads::NotExcluded,
            Some("threads taken as not excluded from the shear planes (N), the lower strength: the detail does not state the thread condition".into()),
        ),
    }
}

/// The Table J3.2 grade of a catalogue bolt grade at the bolt's diameter.
pub fn j3_grade(b: &Bolting) -> Result<BoltGrade, InputError> {
    Ok(match b.grade.aisc_group {
        AiscGroup::A307 => BoltGrade::A307,
        AiscGroup::Group120 => BoltGrade::Group120,
        AiscGroup::Group150 => BoltGrade::Group150,
        AiscGroup::None => {
            let s = b
                .grade
                .strength_at(b.thread.d)
                .map_err(|e| InputError::new("Fu", e))?;
            BoltGrade::OtherGrade {
                name: b.grade.name.clone(),
                fu: s.fu,
            }
        }
    })
}

/// Table J3.2 stresses of the detail's bolts. `pattern_length` is the distance between the
/// outermost bolts in line with the force (zero for one bolt); `grip` the plies clamped.
pub fn stresses(
    edition: Edition,
    b: &Bolting,
    pattern_length: Length,
    grip: Length,
) -> Result<BoltStresses, InputError> {
    let bolt = Bolt {
        grade: j3_grade(b)?,
        d: diameter(b),
        series: series(b),
        threads: threads(b).0,
    };
    let loading = if pattern_length.si() > 0.0 {
        JointLoading::EndLoaded { pattern_length }
    } else {
        JointLoading::NotEndLoaded
    };
    table_j3_2(edition, &bolt, loading, Some(grip))
}

/// The hole of a detail: its dimension along the force (for lc), across it, and the width taken
/// for net area (B4.3b).
#[derive(Debug, Clone)]
pub struct Hole {
    pub along: Length,
    pub net_width: Length,
    pub notes: Vec<String>,
}

/// The hole from Table J3.3 (or the user's diameter). The model does not give a slot's direction,
/// so a slot is taken along the force for lc and across it for the net area: the worse of each.
pub fn hole(edition: Edition, b: &Bolting) -> Result<Hole, InputError> {
    let mut notes = Vec::new();
    let (width, length) = match b.hole_override {
        Some(dh) => {
            notes.push("hole diameter set by the detail, not from Table J3.3".to_string());
            (dh, dh)
        }
        None => {
            let h = j3_bolts::hole_size(edition, series(b), diameter(b), b.hole)?;
            notes.extend(h.notes);
            notes.extend(
                h.out_of_scope
                    .into_iter()
                    .map(|s| format!("outside the standard's scope: {s}")),
            );
            (h.width, h.length)
        }
    };
    if matches!(b.hole, HoleType::ShortSlot | HoleType::LongSlot) {
        notes.push("slot direction not given: its length is taken along the force for tear-out and across it for the net area".into());
    }
    Ok(Hole {
        along: length,
        net_width: j3_bolts::net_area_hole_width(
            series(b),
            if b.hole_override.is_some() {
                width
            } else {
                length
            },
        ),
        notes,
    })
}

/// The Table J3.4 hole case for an edge, taking a slot as pointing at the edge (the worse case).
pub fn edge_hole(b: &Bolting) -> EdgeHole {
    match b.hole {
        HoleType::Standard => EdgeHole::Standard,
        HoleType::Oversized => EdgeHole::Oversized,
        HoleType::ShortSlot => EdgeHole::ShortSlotPerpendicularToEdge,
        HoleType::LongSlot => EdgeHole::LongSlotPerpendicularToEdge,
    }
}

/// The clear distances of one bolt line in the direction the force acts on a ply: the end bolt to
/// the free edge (none when the ply continues past it) and each other bolt to the next hole.
#[derive(Debug, Clone, Copy)]
pub struct LineDistances {
    pub lc_end: Option<Length>,
    pub lc_between: Length,
    pub bolts_per_line: u32,
    pub lines: u32,
}

/// The bearing / tear-out strength of a bolt group on one ply (AISC 360-22 J3.11, 360-16 J3.10):
/// each bolt takes the lesser of its bearing and its tear-out strength, and the group the sum.
/// `bearing` is one bolt's bearing strength and `tearout` gives one bolt's tear-out strength at a
/// clear distance.
pub fn group_bearing_tearout(
    bearing: &Strength,
    tearout: impl Fn(Length) -> Result<Strength, InputError>,
    d: LineDistances,
) -> Result<Strength, InputError> {
    let rb = bearing.nominal.si;
    let mut inputs = Vec::new();
    let mut notes = Vec::new();
    let mut out_of_scope = Vec::new();
    let mut citation = bearing.citation;
    let mut formula = "Rn = n_l [min(Rbr, Rto,end) + (n_b − 1) min(Rbr, Rto,between)]";
    let end = match d.lc_end {
        Some(lc) => {
            let t = tearout(lc)?;
            citation = t.citation;
            inputs.extend(t.inputs.iter().cloned());
            notes.extend(t.notes.iter().cloned());
            out_of_scope.extend(t.out_of_scope.iter().cloned());
            inputs.push(Input::new(
                "Rto,end",
                Force::from_si(t.nominal.si),
                "tear-out of the end bolt toward the free edge",
            ));
            t.nominal.si.min(rb)
        }
        None => {
            notes.push("the end bolt has no free edge in the direction of the force: its bearing strength governs".into());
            formula = "Rn = n_l [Rbr + (n_b − 1) min(Rbr, Rto,between)]";
            rb
        }
    };
    let mut between = 0.0;
    if d.bolts_per_line > 1 {
        let t = tearout(d.lc_between)?;
        citation = t.citation;
        if d.lc_end.is_none() {
            inputs.extend(t.inputs.iter().cloned());
        }
        inputs.push(Input::new(
            "lc,between",
            d.lc_between,
            "clear distance between adjacent holes",
        ));
        inputs.push(Input::new(
            "Rto,between",
            Force::from_si(t.nominal.si),
            "tear-out of a bolt toward the next hole",
        ));
        between = t.nominal.si.min(rb);
    }
    inputs.push(Input::new(
        "Rbr",
        Force::from_si(rb),
        "bearing strength of one bolt",
    ));
    inputs.push(Input::new(
        "n_b",
        crate::standards::number(f64::from(d.bolts_per_line)),
        "bolts in each line along the force",
    ));
    inputs.push(Input::new(
        "n_l",
        crate::standards::number(f64::from(d.lines)),
        "bolt lines",
    ));
    notes.push("each bolt takes the lesser of its bearing and tear-out strength; the group is their sum (J3.11)".into());
    let per_line = end + f64::from(d.bolts_per_line.saturating_sub(1)) * between;
    Ok(Strength {
        citation,
        formula,
        inputs,
        nominal: Force::from_si(f64::from(d.lines) * per_line).into(),
        phi: bearing.phi,
        omega: bearing.omega,
        notes,
        out_of_scope,
    })
}
