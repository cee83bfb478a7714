//! ANSI/AISC 360, Specification for Structural Steel Buildings: editions 2022 (360-22, current)
//! and 2016 (360-16) where their text differs. One file per clause group, one function per limit
//! state.

use super::Citation;
use serde::Serialize;

pub mod d3_slotted;
pub mod d_tension;
pub mod e_compression;
pub mod input;
pub mod j2_welds;
pub mod j3_bolts;
pub mod j4_elements;
pub mod j7_bearing;
pub mod k_hss;

/// The edition of AISC 360 a model is designed to.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize, serde::Deserialize)]
pub enum Edition {
    /// ANSI/AISC 360-16 (July 7, 2016).
    #[serde(rename = "AISC 360-16")]
    Aisc360_16,
    /// ANSI/AISC 360-22 (August 1, 2022).
    #[serde(rename = "AISC 360-22")]
    Aisc360_22,
}

impl Edition {
    /// The standard's name with its edition, as citations print it.
    pub const fn standard(self) -> &'static str {
        match self {
            Edition::Aisc360_16 => "AISC 360-16",
            Edition::Aisc360_22 => "AISC 360-22",
        }
    }

    /// A citation of a clause and equation of this edition.
    pub const fn cite(self, clause: &'static str, equation: &'static str) -> Citation {
        Citation::new(self.standard(), clause, equation)
    }

    /// Parse "AISC 360-22" or "AISC 360-16" (as written in a model).
    pub fn parse(s: &str) -> Option<Self> {
        match s.trim() {
            "AISC 360-22" => Some(Edition::Aisc360_22),
            "AISC 360-16" => Some(Edition::Aisc360_16),
            _ => None,
        }
    }
}
