//! AISC 360 J3 spacing and edge-distance rules: minimum spacing (360-22 J3.4, 360-16 J3.3),
//! minimum edge distance with Tables J3.4 / J3.4M and J3.5 / J3.5M (360-22 J3.5, 360-16 J3.4),
//! maximum spacing and edge distance (360-22 J3.6, 360-16 J3.5).

use super::super::input::{require_positive, InputError};
use super::super::Edition;
use super::{is_multiple, same_size, J3Clause, Series};
use crate::standards::{Bound, Input, Requirement};
use crate::units::Length;

/// The hole at an edge, for the edge-distance increment C2 of Table J3.5.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum EdgeHole {
    Standard,
    Oversized,
    /// A short slot whose long axis points at the edge.
    ShortSlotPerpendicularToEdge,
    /// A long slot whose long axis points at the edge.
    LongSlotPerpendicularToEdge,
    /// A slot (short or long) whose long axis runs parallel to the edge.
    SlotParallelToEdge,
}

/// Exposure of the parts, for the maximum-spacing rule.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum Exposure {
    /// Painted members, or unpainted members not subject to corrosion.
    PaintedOrNotCorroding,
    /// Unpainted weathering steel subject to atmospheric corrosion.
    UnpaintedWeathering,
}

fn positive_pair(d: Length, other_symbol: &'static str, other: Length) -> Result<(), InputError> {
    require_positive("d", d.si())?;
    require_positive(other_symbol, other.si())
}

/// AISC 360-22 J3.4 (360-16 J3.3) — minimum spacing of bolt holes, s ≥ 2-2/3 d.
pub fn bolt_spacing_minimum(
    edition: Edition,
    d: Length,
    s: Length,
) -> Result<Requirement, InputError> {
    positive_pair(d, "s", s)?;
    Ok(Requirement {
        citation: edition.cite(J3Clause::MinimumSpacing.number(edition), ""),
        formula: "s ≥ 2-2/3 d",
        inputs: vec![
            Input::new("d", d, "nominal bolt diameter"),
            Input::new("s", s, "distance between hole centres"),
        ],
        provided: s.into(),
        required: (8.0 / 3.0 * d).into(),
        bound: Bound::Minimum,
        notes: Vec::new(),
        out_of_scope: Vec::new(),
    })
}

/// AISC 360-22 J3.4 (360-16 J3.3) — preferred spacing of bolt holes, s ≥ 3 d (a preference: falling
/// short is a warning, not a failure).
pub fn bolt_spacing_preferred(
    edition: Edition,
    d: Length,
    s: Length,
) -> Result<Requirement, InputError> {
    positive_pair(d, "s", s)?;
    Ok(Requirement {
        citation: edition.cite(J3Clause::MinimumSpacing.number(edition), ""),
        formula: "s ≥ 3 d (preferred)",
        inputs: vec![
            Input::new("d", d, "nominal bolt diameter"),
            Input::new("s", s, "distance between hole centres"),
        ],
        provided: s.into(),
        required: (3.0 * d).into(),
        bound: Bound::Minimum,
        notes: vec![
            "a preference of the clause, not a requirement: report a shortfall as a warning".into(),
        ],
        out_of_scope: Vec::new(),
    })
}

/// AISC 360-22 J3.4 — clear distance between bolt holes or slots, s − dh ≥ d; `None` for 360-16,
/// whose clause gives no such rule.
pub fn bolt_clear_spacing(
    edition: Edition,
    d: Length,
    s: Length,
    dh: Length,
) -> Result<Option<Requirement>, InputError> {
    positive_pair(d, "s", s)?;
    require_positive("dh", dh.si())?;
    if edition == Edition::Aisc360_16 {
        return Ok(None);
    }
    Ok(Some(Requirement {
        citation: edition.cite(J3Clause::MinimumSpacing.number(edition), ""),
        formula: "s − dh ≥ d",
        inputs: vec![
            Input::new("d", d, "nominal bolt diameter"),
            Input::new("s", s, "distance between hole centres"),
            Input::new("dh", dh, "hole dimension along the line of the holes"),
        ],
        provided: (s - dh).into(),
        required: d.into(),
        bound: Bound::Minimum,
        notes: Vec::new(),
        out_of_scope: Vec::new(),
    }))
}

/// Table J3.4 rows (in.): bolt diameter, minimum edge distance.
const EDGE_INCH: [(f64, f64); 7] = [
    (0.5, 0.75),
    (0.625, 0.875),
    (0.75, 1.0),
    (0.875, 1.125),
    (1.0, 1.25),
    (1.125, 1.5),
    (1.25, 1.625),
];

/// Table J3.4M rows (mm), from memory: bolt diameter, minimum edge distance.
const EDGE_METRIC: [(f64, f64); 7] = [
    (16.0, 22.0),
    (20.0, 26.0),
    (22.0, 28.0),
    (24.0, 30.0),
    (27.0, 34.0),
    (30.0, 38.0),
    (36.0, 46.0),
];

/// Rows of an edge-distance table, its length unit, its smallest bolt and that bolt's name.
type EdgeTable = (&'static [(f64, f64)], fn(f64) -> Length, f64, &'static str);

/// Table J3.4 / J3.4M minimum edge distance for a standard hole, with out-of-scope remarks.
fn table_edge_distance(series: Series, d: Length) -> Result<(Length, Vec<String>), InputError> {
    let (rows, unit, smallest, name): EdgeTable = match series {
        Series::Inch => (&EDGE_INCH, Length::inch, 0.5, "1/2 in."),
        Series::Metric => (&EDGE_METRIC, Length::mm, 16.0, "M16"),
    };
    let value = match series {
        Series::Inch => d.to_in(),
        Series::Metric => d.to_mm(),
    };
    if let Some(r) = rows.iter().find(|r| same_size(d, unit(r.0))) {
        return Ok((unit(r.1), Vec::new()));
    }
    let largest = rows[rows.len() - 1].0;
    let step = match series {
        Series::Inch => 0.125,
        Series::Metric => 1.0,
    };
    if value > largest && is_multiple(value, step) {
        return Ok((1.25 * d, Vec::new()));
    }
    if value < smallest {
        return Ok((
            unit(rows[0].1),
            vec![format!(
                "bolts smaller than {name} are not covered by Table J3.4; the {name} row is shown as a conservative stand-in"
            )],
        ));
    }
    let (unit_name, table) = match series {
        Series::Inch => ("in.", "Table J3.4"),
        Series::Metric => ("mm", "Table J3.4M"),
    };
    Err(InputError::new(
        "d",
        format!("{value} {unit_name} is not a bolt diameter of {table}"),
    ))
}

/// Table J3.5 / J3.5M edge-distance increment C2 (from memory).
fn edge_increment(series: Series, d: Length, hole: EdgeHole) -> Length {
    let (over, short) = match series {
        Series::Inch => {
            let di = d.to_in();
            if di <= 0.875 + 1e-9 {
                (Length::inch(1.0 / 16.0), Length::inch(1.0 / 8.0))
            } else if di <= 1.0 + 1e-9 {
                (Length::inch(1.0 / 8.0), Length::inch(1.0 / 8.0))
            } else {
                (Length::inch(1.0 / 8.0), Length::inch(3.0 / 16.0))
            }
        }
        Series::Metric => {
            let dm = d.to_mm();
            if dm <= 22.0 + 1e-9 {
                (Length::mm(2.0), Length::mm(3.0))
            } else if dm <= 24.0 + 1e-9 {
                (Length::mm(3.0), Length::mm(3.0))
            } else {
                (Length::mm(3.0), Length::mm(5.0))
            }
        }
    };
    match hole {
        EdgeHole::Standard | EdgeHole::SlotParallelToEdge => Length::mm(0.0),
        EdgeHole::Oversized => over,
        EdgeHole::ShortSlotPerpendicularToEdge => short,
        EdgeHole::LongSlotPerpendicularToEdge => 0.75 * d,
    }
}

/// AISC 360-22 J3.5 (360-16 J3.4) — minimum edge distance, le ≥ Table J3.4 value + C2 (Table J3.5)
/// for oversized and slotted holes.
pub fn bolt_edge_distance_minimum(
    edition: Edition,
    series: Series,
    d: Length,
    hole: EdgeHole,
    le: Length,
) -> Result<Requirement, InputError> {
    positive_pair(d, "le", le)?;
    let (table, out_of_scope) = table_edge_distance(series, d)?;
    let c2 = edge_increment(series, d, hole);
    let mut notes = Vec::new();
    if series == Series::Metric {
        notes.push("Table J3.4M values from memory".to_string());
    }
    if hole != EdgeHole::Standard {
        notes.push(
            "C2 from Table J3.5 (from memory); the reduction allowed for slots shorter than the maximum is not taken"
                .to_string(),
        );
    }
    let required = table + c2;
    if le.si() < required.si() {
        if le.si() < d.si() {
            notes.push(
                "edge distance under one bolt diameter: not permitted without the approval of the engineer of record (Table J3.4 footnote)"
                    .to_string(),
            );
        } else {
            notes.push(format!(
                "a lesser edge distance is permitted where the bearing and tear-out ({}) and J4 checks are satisfied (Table J3.4 footnote)",
                J3Clause::BearingAndTearout.number(edition)
            ));
        }
    }
    Ok(Requirement {
        citation: edition.cite(J3Clause::MinimumEdgeDistance.number(edition), ""),
        formula: "le ≥ le,min (Table J3.4) + C2 (Table J3.5)",
        inputs: vec![
            Input::new("d", d, "nominal bolt diameter"),
            Input::new(
                "le,min",
                table,
                "minimum edge distance for a standard hole, Table J3.4",
            ),
            Input::new(
                "C2",
                c2,
                "edge-distance increment for oversized and slotted holes, Table J3.5",
            ),
            Input::new("le", le, "distance from the hole centre to the edge"),
        ],
        provided: le.into(),
        required: required.into(),
        bound: Bound::Minimum,
        notes,
        out_of_scope,
    })
}

/// AISC 360-22 J3.6 (360-16 J3.5) — maximum edge distance of parts in contact, le ≤ 12 t ≤ 6 in. (150 mm).
pub fn bolt_edge_distance_maximum(
    edition: Edition,
    series: Series,
    t: Length,
    le: Length,
) -> Result<Requirement, InputError> {
    require_positive("t", t.si())?;
    require_positive("le", le.si())?;
    let cap = match series {
        Series::Inch => Length::inch(6.0),
        Series::Metric => Length::mm(150.0),
    };
    Ok(Requirement {
        citation: edition.cite(J3Clause::MaximumSpacingAndEdge.number(edition), ""),
        formula: "le ≤ 12 t ≤ 6 in. (150 mm)",
        inputs: vec![
            Input::new("t", t, "thickness of the connected part"),
            Input::new(
                "le",
                le,
                "distance from the bolt centre to the nearest edge",
            ),
        ],
        provided: le.into(),
        required: (12.0 * t).min(cap).into(),
        bound: Bound::Maximum,
        notes: Vec::new(),
        out_of_scope: Vec::new(),
    })
}

/// AISC 360-22 J3.6 (360-16 J3.5) — maximum longitudinal spacing of bolts in parts in continuous contact,
/// s ≤ 24 t ≤ 12 in. (305 mm), or for unpainted weathering steel s ≤ 14 t ≤ 7 in. (180 mm).
pub fn bolt_spacing_maximum(
    edition: Edition,
    series: Series,
    exposure: Exposure,
    t_thinner: Length,
    s: Length,
) -> Result<Requirement, InputError> {
    require_positive("t", t_thinner.si())?;
    require_positive("s", s.si())?;
    let (k, cap_in, cap_mm, formula) = match exposure {
        Exposure::PaintedOrNotCorroding => (24.0, 12.0, 305.0, "s ≤ 24 t ≤ 12 in. (305 mm)"),
        Exposure::UnpaintedWeathering => (14.0, 7.0, 180.0, "s ≤ 14 t ≤ 7 in. (180 mm)"),
    };
    let cap = match series {
        Series::Inch => Length::inch(cap_in),
        Series::Metric => Length::mm(cap_mm),
    };
    Ok(Requirement {
        citation: edition.cite(J3Clause::MaximumSpacingAndEdge.number(edition), ""),
        formula,
        inputs: vec![
            Input::new("t", t_thinner, "thickness of the thinner part"),
            Input::new("s", s, "longitudinal spacing of the bolts"),
        ],
        provided: s.into(),
        required: (k * t_thinner).min(cap).into(),
        bound: Bound::Maximum,
        notes: Vec::new(),
        out_of_scope: Vec::new(),
    })
}

#[cfg(test)]
mod tests {
    use super::*;

    const E: Edition = Edition::Aisc360_22;

    #[test]
    fn spacing_rules() {
        let d = Length::inch(0.75);
        let r = bolt_spacing_minimum(E, d, Length::inch(2.0)).unwrap();
        assert!((r.required.si - Length::inch(2.0).si()).abs() < 1e-9);
        assert!(r.ratio() <= 1.0 + 1e-12);
        let p = bolt_spacing_preferred(E, d, Length::inch(2.0)).unwrap();
        assert!(p.ratio() > 1.0);
        assert!(p.notes[0].contains("warning"));
        assert_eq!(
            bolt_spacing_minimum(E, d, Length::inch(0.0))
                .unwrap_err()
                .symbol,
            "s"
        );
    }

    #[test]
    fn clear_spacing_only_in_360_22() {
        let (d, s, dh) = (
            Length::inch(0.75),
            Length::inch(1.5),
            Length::inch(13.0 / 16.0),
        );
        let r = bolt_clear_spacing(E, d, s, dh).unwrap().unwrap();
        assert!(r.ratio() > 1.0);
        assert!(bolt_clear_spacing(Edition::Aisc360_16, d, s, dh)
            .unwrap()
            .is_none());
        assert_eq!(
            bolt_clear_spacing(E, d, s, Length::inch(0.0))
                .unwrap_err()
                .symbol,
            "dh"
        );
    }

    #[test]
    fn edge_distance_branches() {
        let d = Length::inch(0.75);
        let r =
            bolt_edge_distance_minimum(E, Series::Inch, d, EdgeHole::Standard, Length::inch(0.9))
                .unwrap();
        assert!(r
            .notes
            .iter()
            .any(|n| n.contains("lesser edge distance is permitted")));
        let r =
            bolt_edge_distance_minimum(E, Series::Inch, d, EdgeHole::Standard, Length::inch(0.7))
                .unwrap();
        assert!(r.notes.iter().any(|n| n.contains("engineer of record")));
        let r = bolt_edge_distance_minimum(
            E,
            Series::Inch,
            d,
            EdgeHole::LongSlotPerpendicularToEdge,
            Length::inch(2.0),
        )
        .unwrap();
        assert!((r.required.si - Length::inch(1.0 + 0.5625).si()).abs() < 1e-9);
        let r = bolt_edge_distance_minimum(
            E,
            Series::Inch,
            Length::inch(1.5),
            EdgeHole::Standard,
            Length::inch(2.0),
        )
        .unwrap();
        assert!((r.required.si - Length::inch(1.875).si()).abs() < 1e-9);
    }

    #[test]
    fn edge_distance_scope_and_rejections() {
        let r = bolt_edge_distance_minimum(
            E,
            Series::Inch,
            Length::inch(0.25),
            EdgeHole::Standard,
            Length::inch(1.0),
        )
        .unwrap();
        assert_eq!(r.out_of_scope.len(), 1);
        assert!((r.required.si - Length::inch(0.75).si()).abs() < 1e-9);
        let err = bolt_edge_distance_minimum(
            E,
            Series::Inch,
            Length::inch(0.8),
            EdgeHole::Standard,
            Length::inch(1.0),
        )
        .unwrap_err();
        assert!(err.message.contains("Table J3.4"));
        let err = bolt_edge_distance_minimum(
            E,
            Series::Metric,
            Length::mm(33.0),
            EdgeHole::Standard,
            Length::mm(50.0),
        )
        .unwrap_err();
        assert_eq!(err.symbol, "d");
        let r = bolt_edge_distance_minimum(
            E,
            Series::Metric,
            Length::mm(20.0),
            EdgeHole::Oversized,
            Length::mm(30.0),
        )
        .unwrap();
        assert!((r.required.si - 28.0).abs() < 1e-9);
        assert!(r
            .notes
            .iter()
            .any(|n| n.contains("J3.4M values from memory")));
        assert_eq!(
            bolt_edge_distance_minimum(
                E,
                Series::Inch,
                Length::inch(0.75),
                EdgeHole::Standard,
                Length::inch(-1.0)
            )
            .unwrap_err()
            .symbol,
            "le"
        );
    }

    #[test]
    fn maximum_rules() {
        let r = bolt_edge_distance_maximum(E, Series::Inch, Length::inch(0.25), Length::inch(3.5))
            .unwrap();
        assert!((r.required.si - Length::inch(3.0).si()).abs() < 1e-9);
        assert!(r.ratio() > 1.0);
        let r = bolt_edge_distance_maximum(E, Series::Inch, Length::inch(1.0), Length::inch(3.5))
            .unwrap();
        assert!((r.required.si - Length::inch(6.0).si()).abs() < 1e-9);
        let r = bolt_spacing_maximum(
            E,
            Series::Inch,
            Exposure::UnpaintedWeathering,
            Length::inch(1.0),
            Length::inch(6.0),
        )
        .unwrap();
        assert!((r.required.si - Length::inch(7.0).si()).abs() < 1e-9);
        let r = bolt_spacing_maximum(
            E,
            Series::Metric,
            Exposure::PaintedOrNotCorroding,
            Length::mm(6.0),
            Length::mm(100.0),
        )
        .unwrap();
        assert!((r.required.si - 144.0).abs() < 1e-9);
        assert_eq!(
            bolt_spacing_maximum(
                E,
                Series::Inch,
                Exposure::PaintedOrNotCorroding,
                Length::inch(0.0),
                Length::inch(1.0)
            )
            .unwrap_err()
            .symbol,
            "t"
        );
    }
}
