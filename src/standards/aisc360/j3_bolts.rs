//! AISC 360 J3 — bolts and threaded parts.
//!
//! Clause numbers moved by one between the editions (360-22 opened the section with a new first
//! clause): holes J3.2 → J3.3, spacing J3.3 → J3.4, edge distance J3.4 → J3.5, maximum spacing and
//! edge distance J3.5 → J3.6, tension and shear J3.6 → J3.7, combined tension and shear J3.7 → J3.8,
//! bearing and tear-out J3.10 → J3.11. Table and equation numbers did not move. The 360-22 clause
//! numbers other than J3.11 are from memory.

use super::Edition;
use crate::units::Length;

pub mod bearing;
pub mod holes;
pub mod spacing;
pub mod strength;
pub mod table_j3_2;

pub use bearing::*;
pub use holes::*;
pub use spacing::*;
pub use strength::*;
pub use table_j3_2::*;

/// Whether a bolt is sized in inches (Tables J3.3, J3.4) or millimetres (Tables J3.3M, J3.4M).
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum Series {
    Inch,
    Metric,
}

/// The clause of J3 that governs a topic, in the numbering of each edition.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum J3Clause {
    Holes,
    MinimumSpacing,
    MinimumEdgeDistance,
    MaximumSpacingAndEdge,
    TensionAndShear,
    CombinedTensionAndShear,
    BearingAndTearout,
}

impl J3Clause {
    /// The clause number in the given edition.
    pub const fn number(self, edition: Edition) -> &'static str {
        match (self, edition) {
            (J3Clause::Holes, Edition::Aisc360_16) => "J3.2",
            (J3Clause::Holes, Edition::Aisc360_22) => "J3.3",
            (J3Clause::MinimumSpacing, Edition::Aisc360_16) => "J3.3",
            (J3Clause::MinimumSpacing, Edition::Aisc360_22) => "J3.4",
            (J3Clause::MinimumEdgeDistance, Edition::Aisc360_16) => "J3.4",
            (J3Clause::MinimumEdgeDistance, Edition::Aisc360_22) => "J3.5",
            (J3Clause::MaximumSpacingAndEdge, Edition::Aisc360_16) => "J3.5",
            (J3Clause::MaximumSpacingAndEdge, Edition::Aisc360_22) => "J3.6",
            (J3Clause::TensionAndShear, Edition::Aisc360_16) => "J3.6",
            (J3Clause::TensionAndShear, Edition::Aisc360_22) => "J3.7",
            (J3Clause::CombinedTensionAndShear, Edition::Aisc360_16) => "J3.7",
            (J3Clause::CombinedTensionAndShear, Edition::Aisc360_22) => "J3.8",
            (J3Clause::BearingAndTearout, Edition::Aisc360_16) => "J3.10",
            (J3Clause::BearingAndTearout, Edition::Aisc360_22) => "J3.11",
        }
    }
}

/// Whether a length is a whole number of `step` (to within rounding of the unit conversion).
pub(crate) fn is_multiple(value: f64, step: f64) -> bool {
    let n = value / step;
    (n - n.round()).abs() < 1e-6
}

/// Whether two lengths are the same size (to within rounding of the unit conversion).
pub(crate) fn same_size(a: Length, b: Length) -> bool {
    (a.to_mm() - b.to_mm()).abs() < 1e-6
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn bearing_clause_moved_from_j3_10_to_j3_11() {
        assert_eq!(
            J3Clause::BearingAndTearout.number(Edition::Aisc360_16),
            "J3.10"
        );
        assert_eq!(
            J3Clause::BearingAndTearout.number(Edition::Aisc360_22),
            "J3.11"
        );
        assert_eq!(
            J3Clause::TensionAndShear.number(Edition::Aisc360_22),
            "J3.7"
        );
    }

    #[test]
    fn multiples_and_sizes() {
        assert!(is_multiple(0.625, 0.125));
        assert!(!is_multiple(0.6, 0.125));
        assert!(same_size(Length::inch(1.0), Length::mm(25.4)));
    }
}
