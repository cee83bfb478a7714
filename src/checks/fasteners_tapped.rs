//! The fastener set of a tapped detail: a screw through the plate under its head, threading
//! into the plug; no nut. Its length reaches the engagement the detail gives, and its full
//! thread starts before the plug's face so the engaged length is all full thread.

use super::fasteners::{
    tapped_plies, washer_use, BoltLength, FastenerSet, StackRule, WasherSide, TRANSITION_PITCHES,
};
use crate::model::{Bolting, End, Member, Model, TappedDetail};
use crate::stackup::text::shop_length;
use crate::standards::{Bound, Citation, Input, Requirement};
use crate::units::Length;

/// The thread length LT of the screw at length `l`; `None` when threaded to the head.
fn thread_length(b: &Bolting, l: Length) -> Result<Option<Length>, String> {
    let lt = b
        .bolt_type
        .thread_length
        .thread_length(b.thread.d, l)
        .map_err(|e| e.to_string())?;
    Ok((lt.to_mm() < l.to_mm() - 1e-6).then_some(lt))
}

/// thread_runout of a tapped screw (common practice): the end of the plain shank and the
/// transition thread, L − LT + Y, lies before the plug's face, so the engaged length is full
/// thread.
fn runout(face: Length, l: Length, lt: Option<Length>, y: Length) -> Requirement {
    let shank_end = match lt {
        Some(lt) => l - lt + y,
        None => Length::mm(0.0),
    };
    Requirement {
        citation: Citation::new(
            "common practice",
            "full thread engaged in a tapped hole",
            "",
        ),
        formula: "plug face ≥ L − LT + Y",
        inputs: vec![
            Input::new("L", l, "screw length"),
            Input::new(
                "LT",
                lt.unwrap_or(l),
                "thread length (L when threaded to the head)",
            ),
            Input::new("Y", y, "transition thread allowed (5 pitches, from memory)"),
            Input::new("face", face, "plug face from the head bearing face"),
        ],
        provided: face.into(),
        required: shank_end.into(),
        bound: Bound::Minimum,
        notes: vec![],
        out_of_scope: vec![],
    }
}

/// The fastener set of a tapped connection.
pub fn tapped_set(
    model: &Model,
    m: &Member,
    end: End,
    detail_id: &str,
    b: &Bolting,
    t: &TappedDetail,
) -> FastenerSet {
    let units = model.project.units;
    let d = b.thread.d;
    let mut problems = Vec::new();
    let mut washers = Vec::new();
    if let Some(w) = &b.washer {
        if b.washers.under_nut() {
            problems.push("a tapped detail has no nut: a washer can go under the head only".into());
        }
        if b.washers.under_head() {
            match washer_use(w, d, WasherSide::Head) {
                Some(u) => washers.push(u),
                None => problems.push(format!(
                    "the catalogue has no {} for a {} screw",
                    w.name, b.thread.designation
                )),
            }
        }
    }
    let w_max: Length = washers.iter().map(|w| w.thickness).sum();
    let w_min: Length = washers.iter().map(|w| w.thickness_min).sum();
    let plies = tapped_plies(t);
    let face = w_max + t.plate.thickness;
    let needed = face + t.plug.engagement;
    let y = b.thread.pitch * TRANSITION_PITCHES;
    // the run-out is worst with the thinnest washer: the plug face nearest the head
    let face_min = w_min + t.plate.thickness;
    let fits = |l: Length| -> Result<Option<Requirement>, String> {
        let lt = thread_length(b, l)?;
        let q = runout(face_min, l, lt, y);
        Ok((l >= needed && q.ratio() <= 1.0).then_some(q))
    };
    let mut notes = vec![
        "the plug is taken as tapped through: a screw longer than the engagement runs on into the tube".to_string(),
    ];
    let (length, rule) = if !problems.is_empty() {
        (BoltLength::Unknown, None)
    } else if let Some(l) = b.length {
        match thread_length(b, l) {
            Ok(lt) => (BoltLength::Fixed(l), Some(runout(face_min, l, lt, y))),
            Err(e) => {
                problems.push(e);
                (BoltLength::Unknown, None)
            }
        }
    } else {
        let mut found = None;
        for &l in &b.bolt_type.lengths {
            match fits(l) {
                Ok(Some(q)) => {
                    found = Some((l, q));
                    break;
                }
                Ok(None) => {}
                Err(e) => {
                    problems.push(e);
                    break;
                }
            }
        }
        match found {
            Some((l, q)) => (BoltLength::Chosen(l), Some(q)),
            None if problems.is_empty() => {
                let shown = b
                    .bolt_type
                    .lengths
                    .iter()
                    .copied()
                    .find(|&l| l >= needed)
                    .or_else(|| b.bolt_type.lengths.last().copied());
                match shown {
                    Some(s) => {
                        let q = thread_length(b, s).map(|lt| runout(face_min, s, lt, y));
                        (
                            BoltLength::NoneFits {
                                reason: format!(
                                    "none of the {} lengths of the {} series reaches {:.3} in. with full thread in the plug",
                                    b.bolt_type.lengths.len(),
                                    b.bolt_type.name,
                                    needed.to_in()
                                ),
                                shown_at: s,
                            },
                            q.ok(),
                        )
                    }
                    None => {
                        problems.push(format!("the {} has no length series", b.bolt_type.name));
                        (BoltLength::Unknown, None)
                    }
                }
            }
            None => (BoltLength::Unknown, None),
        }
    };
    let at = length.evaluated_at();
    let lt = at.and_then(|l| thread_length(b, l).ok().flatten());
    let washer_text = match washers.first() {
        Some(w) => format!("; under the head: {}", w.name),
        None => String::new(),
    };
    let spec = format!(
        "{}{} {}, {}; threads into the tapped plug ({} engaged){washer_text}",
        b.thread.designation,
        match length.length() {
            Some(l) => format!(" × {}", shop_length(l, units)),
            None => " × (no length of the series works)".into(),
        },
        b.bolt_type.name,
        b.grade.name,
        shop_length(t.plug.engagement, units),
    );
    let mut sketch = vec![format!("head      {}", b.bolt_type.name)];
    for w in &washers {
        sketch.push(format!(
            "washer    {} {}",
            w.name,
            shop_length(w.thickness, units)
        ));
    }
    sketch.push(format!(
        "plate     {}",
        shop_length(t.plate.thickness, units)
    ));
    sketch.push(format!(
        "plug      {} thick, {} engaged",
        shop_length(t.plug.thickness, units),
        shop_length(t.plug.engagement, units)
    ));
    if let Some(l) = length.length() {
        let past = l - needed;
        sketch.push(format!(
            "screw end {} past the engagement",
            shop_length(past, units)
        ));
    }
    if b.length.is_some() {
        notes.push("length fixed by the detail".into());
    }
    FastenerSet {
        connection: format!("{}/{}", m.id, end.as_str()),
        member: m.id.clone(),
        end,
        detail: detail_id.to_string(),
        bolt_count: b.count(),
        grade: b.grade.name.clone(),
        thread: b.thread.designation.clone(),
        bolt_type: b.bolt_type.name.clone(),
        bolt_standard: b.bolt_type.standard.clone(),
        nut: String::new(),
        nut_standard: String::new(),
        nut_grade: String::new(),
        nut_locking: false,
        nut_height: Length::mm(0.0),
        washers,
        head_side: None,
        plies,
        grip: Some(t.plate.thickness),
        bearing_span: Some(needed),
        length,
        thread_length: lt,
        stickout: None,
        planes: Vec::new(),
        rules: rule
            .map(|requirement| StackRule {
                limit_state: "thread_runout",
                requirement,
            })
            .into_iter()
            .collect(),
        spec,
        sketch: sketch.join("\n"),
        problems,
        notes,
    }
}
