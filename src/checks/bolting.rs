//! What the tab and sleeve checks share about their bolts: the Table J3.2 stresses of the grade,
//! the hole, and the bearing / tear-out strength of a bolt group on one ply.

use super::fasteners::FastenerSet;
use super::CheckResult;
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

/// The thread condition the detail states, or "not excluded" with a note when it states none.
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

/// The thread condition of each of a bolt's `planes` shear planes, for bolt shear, with notes:
/// the stack-up's where it settled the bolt length (a "not excluded" stated by the detail is
/// kept, being the lower strength), else the detail's, else "not excluded".
pub fn plane_conditions(
    b: &Bolting,
    set: &FastenerSet,
    planes: u32,
) -> (Vec<Threads>, Vec<String>) {
    let mut notes = Vec::new();
    if set.planes.len() != planes as usize {
        let (t, note) = threads(b);
        notes.push(
            "the stack-up settled no bolt length, so it does not decide the thread condition"
                .to_string(),
        );
        notes.extend(note);
        return (vec![t; planes as usize], notes);
    }
    let mut out = Vec::new();
    for (i, p) in set.planes.iter().enumerate() {
        let t = match (p.excluded, b.threads) {
            (true, Some(Threads::NotExcluded)) => {
                notes.push(format!("plane {}: the stack-up excludes the threads but the detail states \"not excluded\"; the lower strength (N) is kept", i + 1));
                Threads::NotExcluded
            }
            (true, _) => Threads::Excluded,
            (false, _) => Threads::NotExcluded,
        };
        out.push(t);
    }
    let words: Vec<String> = set
        .planes
        .iter()
        .zip(&out)
        .enumerate()
        .map(|(i, (p, t))| {
            format!(
                "plane {} ({} | {}): {}",
                i + 1,
                p.plane.between.0,
                p.plane.between.1,
                match t {
                    Threads::Excluded => "threads excluded (X)",
                    Threads::NotExcluded => "threads not excluded (N)",
                }
            )
        })
        .collect();
    notes.insert(
        0,
        format!("thread condition from the stack-up: {}", words.join("; ")),
    );
    (out, notes)
}

/// Bolt shear of one bolt over its shear planes, each plane with its own thread condition
/// (AISC 360-22 J3.7 Eq. J3-1, Fnv of Table J3.2 per plane): Rn = Ab Σ Fnv,i. Where the detail
/// states "threads excluded" but the stack-up puts threads in a plane, a note gives how much
/// stronger the stated condition would have been, so the reviewer sees what the bolt costs.
pub fn shear_over_planes(
    edition: Edition,
    b: &Bolting,
    pattern_length: Length,
    grip: Length,
    conditions: &[Threads],
) -> Result<Strength, InputError> {
    let mut found = shear_with_conditions(edition, b, pattern_length, grip, conditions)?;
    let threads_in_a_plane = conditions.contains(&Threads::NotExcluded);
    if b.threads == Some(Threads::Excluded) && threads_in_a_plane {
        let stated = vec![Threads::Excluded; conditions.len()];
        let x = shear_with_conditions(edition, b, pattern_length, grip, &stated)?;
        found.notes.push(format!(
            "the detail states \"threads excluded\"; with the threads excluded from every plane Rn would be {:.3} times the value above, which the bolt chosen does not give",
            x.nominal.si / found.nominal.si
        ));
    }
    Ok(found)
}

fn shear_with_conditions(
    edition: Edition,
    b: &Bolting,
    pattern_length: Length,
    grip: Length,
    conditions: &[Threads],
) -> Result<Strength, InputError> {
    let d = diameter(b);
    let nx = conditions
        .iter()
        .filter(|t| **t == Threads::Excluded)
        .count() as u32;
    let nn = conditions.len() as u32 - nx;
    if nx == 0 || nn == 0 {
        let t = if nx == 0 {
            Threads::NotExcluded
        } else {
            Threads::Excluded
        };
        let st = stresses(edition, b, pattern_length, grip, t)?;
        return j3_bolts::bolt_shear(edition, &st, d, nn + nx);
    }
    let st_n = stresses(edition, b, pattern_length, grip, Threads::NotExcluded)?;
    let st_x = stresses(edition, b, pattern_length, grip, Threads::Excluded)?;
    let mut s = j3_bolts::bolt_shear(edition, &st_n, d, nn)?;
    let sx = j3_bolts::bolt_shear(edition, &st_x, d, nx)?;
    s.formula = "Rn = Ab (Fnv,N n_s,N + Fnv,X n_s,X)";
    s.inputs.push(Input::new(
        "Fnv,X",
        st_x.fnv,
        "nominal shear stress, threads excluded (Table J3.2)",
    ));
    s.inputs.push(Input::new(
        "n_s,X",
        crate::standards::number(f64::from(nx)),
        "shear planes with the threads excluded",
    ));
    s.notes.push("Fnv and n_s above are those of the planes with the threads not excluded (N); Fnv,X and n_s,X those of the planes with the threads excluded".into());
    for n in sx.notes {
        if !s.notes.contains(&n) {
            s.notes.push(n);
        }
    }
    for n in sx.out_of_scope {
        if !s.out_of_scope.contains(&n) {
            s.out_of_scope.push(n);
        }
    }
    s.nominal = Force::from_si(s.nominal.si + sx.nominal.si).into();
    Ok(s)
}

/// Table J3.2 stresses of the detail's bolts with the given thread condition.
/// `pattern_length` is the distance between the outermost bolts in line with the force (zero
/// for one bolt); `grip` the plies clamped.
pub fn stresses(
    edition: Edition,
    b: &Bolting,
    pattern_length: Length,
    grip: Length,
    threads: Threads,
) -> Result<BoltStresses, InputError> {
    let bolt = Bolt {
        grade: j3_grade(b)?,
        d: diameter(b),
        series: series(b),
        threads,
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
    /// Why the hole lies outside Table J3.3 (a bolt size the table does not give): each makes a
    /// check that uses the hole `warn` at best.
    pub out_of_scope: Vec<String>,
}

impl Hole {
    /// A check that uses the hole, with the hole's notes and its scope flags (which raise the
    /// status to `warn` at least).
    pub fn mark(&self, mut c: CheckResult) -> CheckResult {
        c.notes.extend(self.notes.iter().cloned());
        for s in &self.out_of_scope {
            c = c.out_of_scope(s.clone());
        }
        c
    }
}

/// The hole from Table J3.3 (or the user's diameter). The model does not give a slot's direction,
/// so a slot is taken along the force for lc and across it for the net area: the worse of each.
pub fn hole(edition: Edition, b: &Bolting) -> Result<Hole, InputError> {
    let mut notes = Vec::new();
    let mut out_of_scope = Vec::new();
    let (width, length) = match b.hole_override {
        Some(dh) => {
            notes.push("hole diameter set by the detail, not from Table J3.3".to_string());
            (dh, dh)
        }
        None => {
            let h = j3_bolts::hole_size(edition, series(b), diameter(b), b.hole)?;
            notes.extend(h.notes);
            out_of_scope.extend(h.out_of_scope);
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
        out_of_scope,
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
    notes.push(format!(
        "each bolt takes the lesser of its bearing and tear-out strength; the group is their sum ({})",
        citation.clause
    ));
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
