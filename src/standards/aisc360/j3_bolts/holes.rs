//! AISC 360 Table J3.3 / J3.3M — nominal hole dimensions — and B4.3b, the hole width used for net
//! area.

use super::super::input::{require_positive, InputError};
use super::super::Edition;
use super::{is_multiple, same_size, Series};
use crate::standards::Citation;
use crate::units::Length;

/// The hole types of Table J3.3.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum HoleType {
    Standard,
    Oversized,
    ShortSlot,
    LongSlot,
}

/// Nominal hole dimensions: width (the diameter of a round hole) and length (equal to the width for
/// a round hole).
#[derive(Debug, Clone, PartialEq)]
pub struct HoleSize {
    pub citation: Citation,
    pub width: Length,
    pub length: Length,
    pub notes: Vec<String>,
    pub out_of_scope: Vec<String>,
}

/// One row of Table J3.3: bolt diameter, standard hole, oversized hole, short-slot length,
/// long-slot length (slot widths equal the standard hole), in inches or millimetres.
type Row = (f64, f64, f64, f64, f64);

/// AISC 360-16 Table J3.3 rows, in.
const INCH_16: [Row; 5] = [
    (0.5, 9.0 / 16.0, 5.0 / 8.0, 11.0 / 16.0, 1.25),
    (0.625, 11.0 / 16.0, 13.0 / 16.0, 7.0 / 8.0, 1.0 + 9.0 / 16.0),
    (0.75, 13.0 / 16.0, 15.0 / 16.0, 1.0, 1.0 + 7.0 / 8.0),
    (
        0.875,
        15.0 / 16.0,
        1.0 + 1.0 / 16.0,
        1.0 + 1.0 / 8.0,
        2.0 + 3.0 / 16.0,
    ),
    (1.0, 1.0 + 1.0 / 16.0, 1.25, 1.0 + 5.0 / 16.0, 2.5),
];

/// AISC 360-22 Table J3.3 rows, in.: as 360-16 but a 1-1/8 in. standard hole (and slot width) for
/// 1 in. bolts.
const INCH_22: [Row; 5] = [
    INCH_16[0],
    INCH_16[1],
    INCH_16[2],
    INCH_16[3],
    (1.0, 1.125, 1.25, 1.0 + 5.0 / 16.0, 2.5),
];

/// AISC 360 Table J3.3M rows, mm (from memory; the same rows are used for both editions).
const METRIC: [Row; 6] = [
    (16.0, 18.0, 20.0, 22.0, 40.0),
    (20.0, 22.0, 24.0, 26.0, 50.0),
    (22.0, 24.0, 28.0, 30.0, 55.0),
    (24.0, 27.0, 30.0, 32.0, 60.0),
    (27.0, 30.0, 35.0, 37.0, 67.0),
    (30.0, 33.0, 38.0, 40.0, 75.0),
];

fn pick(hole: HoleType, std: f64, over: f64, short: f64, long: f64) -> (f64, f64) {
    match hole {
        HoleType::Standard => (std, std),
        HoleType::Oversized => (over, over),
        HoleType::ShortSlot => (std, short),
        HoleType::LongSlot => (std, long),
    }
}

/// AISC 360 Table J3.3 (inch) or J3.3M (metric) — nominal hole dimensions by bolt diameter and
/// hole type (clause J3.3 in 360-22, J3.2 in 360-16).
pub fn hole_size(
    edition: Edition,
    series: Series,
    d: Length,
    hole: HoleType,
) -> Result<HoleSize, InputError> {
    require_positive("d", d.si())?;
    let mut notes = Vec::new();
    let mut out_of_scope = Vec::new();
    let (width, length) = match series {
        Series::Inch => {
            let rows = match edition {
                Edition::Aisc360_16 => &INCH_16,
                Edition::Aisc360_22 => &INCH_22,
            };
            let di = d.to_in();
            if let Some(r) = rows.iter().find(|r| same_size(d, Length::inch(r.0))) {
                let (w, l) = pick(hole, r.1, r.2, r.3, r.4);
                (Length::inch(w), Length::inch(l))
            } else if di >= 1.125 - 1e-9 && is_multiple(di, 0.125) {
                let std = match edition {
                    Edition::Aisc360_16 => di + 1.0 / 16.0,
                    Edition::Aisc360_22 => di + 1.0 / 8.0,
                };
                let (w, l) = pick(hole, std, di + 5.0 / 16.0, di + 3.0 / 8.0, 2.5 * di);
                (Length::inch(w), Length::inch(l))
            } else if di < 0.5 {
                out_of_scope.push(
                    "bolts smaller than 1/2 in. are not covered by Table J3.3; the 1/2 in. row's clearance is used"
                        .to_string(),
                );
                let r = rows[0];
                let (w, l) = pick(hole, r.1 - r.0, r.2 - r.0, r.3 - r.0, r.4 / r.0);
                match hole {
                    HoleType::LongSlot => (Length::inch(di + w), Length::inch(di * l)),
                    _ => (Length::inch(di + w), Length::inch(di + l)),
                }
            } else {
                return Err(InputError::new(
                    "d",
                    format!("{di} in. is not a bolt diameter of Table J3.3"),
                ));
            }
        }
        Series::Metric => {
            notes.push("Table J3.3M values from memory".to_string());
            let dm = d.to_mm();
            if let Some(r) = METRIC.iter().find(|r| same_size(d, Length::mm(r.0))) {
                let (w, l) = pick(hole, r.1, r.2, r.3, r.4);
                (Length::mm(w), Length::mm(l))
            } else if dm >= 36.0 - 1e-9 && is_multiple(dm, 1.0) {
                let (w, l) = pick(hole, dm + 3.0, dm + 8.0, dm + 10.0, 2.5 * dm);
                (Length::mm(w), Length::mm(l))
            } else if dm < 16.0 {
                out_of_scope.push(
                    "metric bolts smaller than M16 are not covered by Table J3.3M; the M16 row's clearance is used"
                        .to_string(),
                );
                let r = METRIC[0];
                let (w, l) = pick(hole, r.1 - r.0, r.2 - r.0, r.3 - r.0, r.4 / r.0);
                match hole {
                    HoleType::LongSlot => (Length::mm(dm + w), Length::mm(dm * l)),
                    _ => (Length::mm(dm + w), Length::mm(dm + l)),
                }
            } else {
                return Err(InputError::new(
                    "d",
                    format!("M{dm} is not a bolt diameter of Table J3.3M"),
                ));
            }
        }
    };
    Ok(HoleSize {
        citation: edition.cite("Table J3.3", ""),
        width,
        length,
        notes,
        out_of_scope,
    })
}

/// AISC 360 B4.3b — width of a bolt hole taken for net area: the nominal dimension plus 1/16 in.
/// (2 mm).
pub fn net_area_hole_width(series: Series, dh: Length) -> Length {
    match series {
        Series::Inch => dh + Length::inch(1.0 / 16.0),
        Series::Metric => dh + Length::mm(2.0),
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn editions_differ_at_one_inch() {
        let h16 = hole_size(
            Edition::Aisc360_16,
            Series::Inch,
            Length::inch(1.0),
            HoleType::Standard,
        )
        .unwrap();
        let h22 = hole_size(
            Edition::Aisc360_22,
            Series::Inch,
            Length::inch(1.0),
            HoleType::Standard,
        )
        .unwrap();
        assert!((h16.width.to_in() - 1.0625).abs() < 1e-9);
        assert!((h22.width.to_in() - 1.125).abs() < 1e-9);
        let big = hole_size(
            Edition::Aisc360_22,
            Series::Inch,
            Length::inch(1.25),
            HoleType::LongSlot,
        )
        .unwrap();
        assert!((big.width.to_in() - 1.375).abs() < 1e-9);
        assert!((big.length.to_in() - 3.125).abs() < 1e-9);
    }

    #[test]
    fn small_bolts_are_out_of_scope() {
        let h = hole_size(
            Edition::Aisc360_22,
            Series::Inch,
            Length::inch(0.375),
            HoleType::Standard,
        )
        .unwrap();
        assert!((h.width.to_in() - (0.375 + 1.0 / 16.0)).abs() < 1e-9);
        assert_eq!(h.out_of_scope.len(), 1);
        let h = hole_size(
            Edition::Aisc360_22,
            Series::Metric,
            Length::mm(12.0),
            HoleType::Oversized,
        )
        .unwrap();
        assert!((h.width.to_mm() - 16.0).abs() < 1e-9);
        assert_eq!(h.out_of_scope.len(), 1);
    }

    #[test]
    fn unlisted_sizes_are_refused() {
        let e = hole_size(
            Edition::Aisc360_22,
            Series::Inch,
            Length::inch(0.6),
            HoleType::Standard,
        )
        .unwrap_err();
        assert!(e.message.contains("not a bolt diameter of Table J3.3"));
        let e = hole_size(
            Edition::Aisc360_22,
            Series::Metric,
            Length::mm(33.0),
            HoleType::Standard,
        )
        .unwrap_err();
        assert!(e.message.contains("Table J3.3M"));
        assert_eq!(
            hole_size(
                Edition::Aisc360_22,
                Series::Metric,
                Length::mm(0.0),
                HoleType::Standard
            )
            .unwrap_err()
            .symbol,
            "d"
        );
    }

    #[test]
    fn metric_rows() {
        let h = hole_size(
            Edition::Aisc360_16,
            Series::Metric,
            Length::mm(20.0),
            HoleType::ShortSlot,
        )
        .unwrap();
        assert_eq!((h.width.to_mm(), h.length.to_mm()), (22.0, 26.0));
        let h = hole_size(
            Edition::Aisc360_16,
            Series::Metric,
            Length::mm(36.0),
            HoleType::Standard,
        )
        .unwrap();
        assert!((h.width.to_mm() - 39.0).abs() < 1e-9);
        assert!(h.notes[0].contains("from memory"));
    }

    #[test]
    fn net_area_allowance() {
        assert!(
            (net_area_hole_width(Series::Inch, Length::inch(13.0 / 16.0)).to_in() - 0.875).abs()
                < 1e-12
        );
        assert!(
            (net_area_hole_width(Series::Metric, Length::mm(22.0)).to_mm() - 24.0).abs() < 1e-12
        );
    }
}
