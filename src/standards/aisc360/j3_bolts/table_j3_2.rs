//! AISC 360 Table J3.2 — nominal tensile stress Fnt and nominal shear stress Fnv of bolts and
//! threaded parts, with the table's footnotes on long end-loaded joints and long A307 grips.

use super::super::input::{require_positive, InputError};
use super::super::Edition;
use super::Series;
use crate::standards::{Citation, Input};
use crate::units::{Length, Stress};

/// A bolt or threaded-part material as Table J3.2 groups them.
#[derive(Debug, Clone, PartialEq)]
pub enum BoltGrade {
    /// ASTM A307 Grade A bolts.
    A307,
    /// Group 120 (named Group A in 360-16): ASTM F3125 Grade A325 or F1852, and their metric forms.
    Group120,
    /// Group 150 (named Group B in 360-16): ASTM F3125 Grade A490 or F2280, and their metric forms.
    Group150,
    /// A threaded part (rod) meeting AISC 360 Section A3.4, with its specified tensile strength Fu.
    ThreadedPart { fu: Stress },
    /// A grade Table J3.2 does not list (SAE J429, ISO 898-1 property classes, ...), with its
    /// name and specified minimum tensile strength Fu; rated with the threaded-part values.
    OtherGrade { name: String, fu: Stress },
}

/// Whether threads are excluded from the shear planes (Table J3.2 "X") or not ("N").
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum Threads {
    /// Threads not excluded from the shear planes (N).
    NotExcluded,
    /// Threads excluded from the shear planes (X).
    Excluded,
}

/// How the joint is loaded, for the long-joint footnote of Table J3.2.
#[derive(Debug, Clone, Copy, PartialEq)]
pub enum JointLoading {
    /// Not an end-loaded joint (the footnote does not apply).
    NotEndLoaded,
    /// An end-loaded joint whose fastener pattern length (between the outermost bolt centres
    /// parallel to the force) is given.
    EndLoaded { pattern_length: Length },
}

/// One bolt as Table J3.2 sees it.
#[derive(Debug, Clone, PartialEq)]
pub struct Bolt {
    pub grade: BoltGrade,
    /// Nominal diameter d.
    pub d: Length,
    pub series: Series,
    pub threads: Threads,
}

/// The nominal stresses of one bolt, with what they were read from.
#[derive(Debug, Clone, PartialEq)]
pub struct BoltStresses {
    pub citation: Citation,
    /// Nominal tensile stress Fnt.
    pub fnt: Stress,
    /// Nominal shear stress Fnv, after the footnote reductions.
    pub fnv: Stress,
    pub inputs: Vec<Input>,
    pub notes: Vec<String>,
    pub out_of_scope: Vec<String>,
}

/// Specified minimum tensile strength of the grades rated by Fu when a size falls outside the
/// table: A307 60 ksi (ASTM A307), Group 120 120 ksi (ASTM F3125 A325), Group 150 150 ksi
/// (ASTM F3125 A490) — from memory of the ASTM standards.
fn grade_fu(grade: &BoltGrade) -> Stress {
    match grade {
        BoltGrade::A307 => Stress::ksi(60.0),
        BoltGrade::Group120 => Stress::ksi(120.0),
        BoltGrade::Group150 => Stress::ksi(150.0),
        BoltGrade::ThreadedPart { fu } | BoltGrade::OtherGrade { fu, .. } => *fu,
    }
}

/// Table J3.2 values for the listed groups (ksi): (Fnt, Fnv with threads N, Fnv with threads X).
fn listed_group_ksi(grade: &BoltGrade) -> Option<(f64, f64, f64)> {
    match grade {
        BoltGrade::A307 => Some((45.0, 27.0, 27.0)),
        BoltGrade::Group120 => Some((90.0, 54.0, 68.0)),
        BoltGrade::Group150 => Some((113.0, 68.0, 84.0)),
        _ => None,
    }
}

/// The smallest bolt Table J3.2 rates by group: 1/2 in. (M12 for metric bolts) — ASTM F3125.
fn smallest_listed(series: Series) -> Length {
    match series {
        Series::Inch => Length::inch(0.5),
        Series::Metric => Length::mm(12.0),
    }
}

/// AISC 360 Table J3.2 — nominal tensile stress Fnt and shear stress Fnv of a bolt or threaded
/// part, with footnote reductions: Fnv × 0.833 for end-loaded joints with a pattern length over
/// 38 in. (950 mm), and 1 % per 1/16 in. (2 mm) of A307 grip over five diameters.
///
/// `grip` is needed for A307 bolts (the grip footnote) and ignored otherwise.
pub fn table_j3_2(
    edition: Edition,
    bolt: &Bolt,
    loading: JointLoading,
    grip: Option<Length>,
) -> Result<BoltStresses, InputError> {
    require_positive("d", bolt.d.si())?;
    let fu = grade_fu(&bolt.grade);
    require_positive("Fu", fu.si())?;
    let mut notes = Vec::new();
    let mut out_of_scope = Vec::new();
    let mut inputs = vec![Input::new("d", bolt.d, "nominal bolt diameter")];

    let listed = listed_group_ksi(&bolt.grade);
    let too_small = bolt.d.si() < smallest_listed(bolt.series).si() - 1e-9;
    let (mut fnt, mut fnv) = match (listed, too_small) {
        (Some((t, n, x)), false) => {
            let v = match bolt.threads {
                Threads::NotExcluded => n,
                Threads::Excluded => x,
            };
            (Stress::ksi(t), Stress::ksi(v))
        }
        _ => {
            if let BoltGrade::OtherGrade { name, .. } = &bolt.grade {
                out_of_scope.push(format!(
                    "grade {name} is not covered by AISC 360 Table J3.2; rated with the threaded-part values 0.75 Fu and 0.450 / 0.563 Fu"
                ));
            }
            if too_small {
                out_of_scope.push(format!(
                    "bolts smaller than {} are not covered by AISC 360 Table J3.2; rated with the threaded-part values",
                    match bolt.series {
                        Series::Inch => "1/2 in.",
                        Series::Metric => "M12",
                    }
                ));
            }
            if listed.is_some() {
                notes.push(
                    "Fu of the grade from its ASTM specification (from memory): A307 60 ksi, A325 120 ksi, A490 150 ksi"
                        .to_string(),
                );
            }
            inputs.push(Input::new(
                "Fu",
                fu,
                "specified minimum tensile strength of the bolt material",
            ));
            let shear_factor = match bolt.threads {
                Threads::NotExcluded => 0.450,
                Threads::Excluded => 0.563,
            };
            (0.75 * fu, shear_factor * fu)
        }
    };

    if let BoltGrade::A307 = bolt.grade {
        let grip = grip.ok_or_else(|| {
            InputError::new(
                "grip",
                "the grip is needed for an A307 bolt (Table J3.2 footnote: 1 % reduction per 1/16 in. of grip over five diameters)",
            )
        })?;
        require_positive("grip", grip.si())?;
        inputs.push(Input::new(
            "grip",
            grip,
            "grip (total thickness of the parts joined)",
        ));
        let step = match bolt.series {
            Series::Inch => Length::inch(1.0 / 16.0),
            Series::Metric => Length::mm(2.0),
        };
        let excess = grip - 5.0 * bolt.d;
        if excess.si() > 1e-9 {
            let steps = (excess / step - 1e-9).ceil();
            let factor = (1.0 - 0.01 * steps).max(0.0);
            fnt = fnt * factor;
            fnv = fnv * factor;
            inputs.push(Input::new(
                "k_grip",
                factor,
                "A307 long-grip reduction factor",
            ));
            notes.push(format!(
                "A307 grip exceeds five diameters: Fnt and Fnv reduced by {:.0} % (Table J3.2 footnote: 1 % per 1/16 in. of grip beyond 5 d{})",
                (1.0 - factor) * 100.0,
                if factor == 0.0 { ", here to nothing: the bolt carries no load at this grip" } else { "" }
            ));
        }
    }

    if let JointLoading::EndLoaded { pattern_length } = loading {
        require_positive("L_pattern", pattern_length.si())?;
        inputs.push(Input::new(
            "L_pattern",
            pattern_length,
            "fastener pattern length of the end-loaded joint",
        ));
        let limit = match bolt.series {
            Series::Inch => Length::inch(38.0),
            Series::Metric => Length::mm(950.0),
        };
        if pattern_length.si() > limit.si() {
            fnv = fnv * 0.833;
            notes.push(
                "end-loaded joint longer than 38 in. (950 mm): Fnv reduced to 83.3 % (Table J3.2 footnote)"
                    .to_string(),
            );
        }
    }

    inputs.push(Input::new("Fnt", fnt, "nominal tensile stress, Table J3.2"));
    inputs.push(Input::new("Fnv", fnv, "nominal shear stress, Table J3.2"));
    if edition == Edition::Aisc360_16 {
        match bolt.grade {
            BoltGrade::Group120 => notes.push("Group 120 is named Group A in AISC 360-16".into()),
            BoltGrade::Group150 => notes.push("Group 150 is named Group B in AISC 360-16".into()),
            _ => {}
        }
    }
    Ok(BoltStresses {
        citation: edition.cite("Table J3.2", ""),
        fnt,
        fnv,
        inputs,
        notes,
        out_of_scope,
    })
}

#[cfg(test)]
mod tests {
    use super::*;

    fn bolt(grade: BoltGrade, d_in: f64, threads: Threads) -> Bolt {
        Bolt {
            grade,
            d: Length::inch(d_in),
            series: Series::Inch,
            threads,
        }
    }

    fn ksi(s: Stress) -> f64 {
        (s.to_ksi() * 1000.0).round() / 1000.0
    }

    #[test]
    fn listed_groups() {
        let e = Edition::Aisc360_22;
        let n = JointLoading::NotEndLoaded;
        let s = table_j3_2(
            e,
            &bolt(BoltGrade::Group120, 0.75, Threads::NotExcluded),
            n,
            None,
        )
        .unwrap();
        assert_eq!((ksi(s.fnt), ksi(s.fnv)), (90.0, 54.0));
        assert!(s.out_of_scope.is_empty());
        let s = table_j3_2(
            e,
            &bolt(BoltGrade::Group150, 1.0, Threads::Excluded),
            n,
            None,
        )
        .unwrap();
        assert_eq!((ksi(s.fnt), ksi(s.fnv)), (113.0, 84.0));
    }

    #[test]
    fn a307_needs_its_grip() {
        let b = bolt(BoltGrade::A307, 0.5, Threads::NotExcluded);
        let err =
            table_j3_2(Edition::Aisc360_22, &b, JointLoading::NotEndLoaded, None).unwrap_err();
        assert_eq!(err.symbol, "grip");
    }

    #[test]
    fn a307_long_grip_reduction() {
        // 1/2 in. A307, grip 2-5/8 in. = 5d + 1/8 in.: two sixteenths over, 2 % off.
        let b = bolt(BoltGrade::A307, 0.5, Threads::NotExcluded);
        let s = table_j3_2(
            Edition::Aisc360_22,
            &b,
            JointLoading::NotEndLoaded,
            Some(Length::inch(2.625)),
        )
        .unwrap();
        assert!((s.fnt.to_ksi() - 45.0 * 0.98).abs() < 1e-9);
        assert!((s.fnv.to_ksi() - 27.0 * 0.98).abs() < 1e-9);
        // Exactly five diameters: no reduction.
        let s = table_j3_2(
            Edition::Aisc360_22,
            &b,
            JointLoading::NotEndLoaded,
            Some(Length::inch(2.5)),
        )
        .unwrap();
        assert_eq!(ksi(s.fnv), 27.0);
    }

    #[test]
    fn long_end_loaded_joint() {
        let b = bolt(BoltGrade::Group120, 0.875, Threads::NotExcluded);
        let long = JointLoading::EndLoaded {
            pattern_length: Length::inch(40.0),
        };
        let s = table_j3_2(Edition::Aisc360_22, &b, long, None).unwrap();
        assert!((s.fnv.to_ksi() - 54.0 * 0.833).abs() < 1e-9);
        assert_eq!(ksi(s.fnt), 90.0);
        let short = JointLoading::EndLoaded {
            pattern_length: Length::inch(38.0),
        };
        let s = table_j3_2(Edition::Aisc360_22, &b, short, None).unwrap();
        assert_eq!(ksi(s.fnv), 54.0);
        let bad = JointLoading::EndLoaded {
            pattern_length: Length::inch(0.0),
        };
        assert_eq!(
            table_j3_2(Edition::Aisc360_22, &b, bad, None)
                .unwrap_err()
                .symbol,
            "L_pattern"
        );
    }

    #[test]
    fn other_grades_and_small_bolts_are_out_of_scope() {
        let b = Bolt {
            grade: BoltGrade::OtherGrade {
                name: "ISO 898-1 8.8".into(),
                fu: Stress::mpa(800.0),
            },
            d: Length::mm(16.0),
            series: Series::Metric,
            threads: Threads::NotExcluded,
        };
        let s = table_j3_2(Edition::Aisc360_22, &b, JointLoading::NotEndLoaded, None).unwrap();
        assert!((s.fnt.to_mpa() - 600.0).abs() < 1e-9);
        assert!((s.fnv.to_mpa() - 360.0).abs() < 1e-9);
        assert_eq!(s.out_of_scope.len(), 1);
        assert!(s.out_of_scope[0].contains("ISO 898-1 8.8"));

        let b = bolt(BoltGrade::Group120, 0.375, Threads::Excluded);
        let s = table_j3_2(Edition::Aisc360_22, &b, JointLoading::NotEndLoaded, None).unwrap();
        assert!(s.out_of_scope[0].contains("smaller than 1/2 in."));
        assert!((s.fnv.to_ksi() - 0.563 * 120.0).abs() < 1e-9);
    }

    #[test]
    fn threaded_part_and_rejections() {
        let b = bolt(
            BoltGrade::ThreadedPart {
                fu: Stress::ksi(58.0),
            },
            0.75,
            Threads::NotExcluded,
        );
        let s = table_j3_2(Edition::Aisc360_16, &b, JointLoading::NotEndLoaded, None).unwrap();
        assert!((s.fnt.to_ksi() - 43.5).abs() < 1e-9);
        assert!((s.fnv.to_ksi() - 26.1).abs() < 1e-9);
        assert!(s.out_of_scope.is_empty());
        let b = bolt(
            BoltGrade::ThreadedPart {
                fu: Stress::ksi(0.0),
            },
            0.75,
            Threads::NotExcluded,
        );
        assert_eq!(
            table_j3_2(Edition::Aisc360_16, &b, JointLoading::NotEndLoaded, None)
                .unwrap_err()
                .symbol,
            "Fu"
        );
        let b = bolt(BoltGrade::Group120, -0.75, Threads::NotExcluded);
        assert_eq!(
            table_j3_2(Edition::Aisc360_16, &b, JointLoading::NotEndLoaded, None)
                .unwrap_err()
                .symbol,
            "d"
        );
    }

    #[test]
    fn group_names_of_360_16() {
        let b = bolt(BoltGrade::Group150, 0.75, Threads::NotExcluded);
        let s = table_j3_2(Edition::Aisc360_16, &b, JointLoading::NotEndLoaded, None).unwrap();
        assert!(s.notes.iter().any(|n| n.contains("Group B")));
        assert_eq!(s.citation.standard, "AISC 360-16");
    }
}
