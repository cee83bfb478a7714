//! Formatting of quantities in the unit system the user chose, and lengths as shop fractions.

use super::factor::*;
use super::types::{Dim, Quantity};
use serde::{Deserialize, Serialize};

/// The unit system of output: US customary (in, kip, ksi) or SI (mm, kN, MPa).
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize, Deserialize, Default)]
#[serde(rename_all = "lowercase")]
pub enum UnitSystem {
    #[default]
    Us,
    Si,
}

impl UnitSystem {
    /// Parse "us" or "si" (as written in a model or on the command line).
    pub fn parse(s: &str) -> Option<Self> {
        match s.to_ascii_lowercase().as_str() {
            "us" => Some(UnitSystem::Us),
            "si" => Some(UnitSystem::Si),
            _ => None,
        }
    }

    /// The unit symbol used for a kind of quantity in this system.
    pub fn unit(self, dim: Dim) -> &'static str {
        use Dim::*;
        match (self, dim) {
            (UnitSystem::Us, Length) => "in",
            (UnitSystem::Us, Area) => "in2",
            (UnitSystem::Us, Inertia) => "in4",
            (UnitSystem::Us, Volume) => "in3",
            (UnitSystem::Us, Force) => "kip",
            (UnitSystem::Us, Stress) => "ksi",
            (UnitSystem::Us, ForcePerLength) => "kip/in",
            (UnitSystem::Us, Mass) => "lb",
            (UnitSystem::Us, MassPerLength) => "lb/ft",
            (UnitSystem::Us, Density) => "lb/ft3",
            (UnitSystem::Si, Length) => "mm",
            (UnitSystem::Si, Area) => "mm2",
            (UnitSystem::Si, Inertia) => "mm4",
            (UnitSystem::Si, Volume) => "mm3",
            (UnitSystem::Si, Force) => "kN",
            (UnitSystem::Si, Stress) => "MPa",
            (UnitSystem::Si, ForcePerLength) => "kN/mm",
            (UnitSystem::Si, Mass) => "kg",
            (UnitSystem::Si, MassPerLength) => "kg/m",
            (UnitSystem::Si, Density) => "kg/m3",
            (_, Angle) => "deg",
            (_, Number) => "",
        }
    }

    /// The value of a quantity in this system's unit for its kind.
    pub fn value(self, q: Quantity) -> f64 {
        use Dim::*;
        let v = q.si;
        match (self, q.dim) {
            (UnitSystem::Us, Length) => v / MM_PER_IN,
            (UnitSystem::Us, Area) => v / MM_PER_IN.powi(2),
            (UnitSystem::Us, Inertia) => v / MM_PER_IN.powi(4),
            (UnitSystem::Us, Volume) => v / MM_PER_IN.powi(3),
            (UnitSystem::Us, Force) => v / N_PER_KIP,
            (UnitSystem::Us, Stress) => v / MPA_PER_KSI,
            (UnitSystem::Us, ForcePerLength) => v * MM_PER_IN / N_PER_KIP,
            (UnitSystem::Us, Mass) => v / KG_PER_LB,
            (UnitSystem::Us, MassPerLength) => v / KGM_PER_LBFT,
            (UnitSystem::Us, Density) => v / KG_PER_LB * (MM_PER_FT / 1000.0).powi(3),
            (UnitSystem::Si, Force) => v / 1000.0,
            (UnitSystem::Si, ForcePerLength) => v / 1000.0,
            (_, Angle) => v.to_degrees(),
            _ => v,
        }
    }

    /// A quantity as text with its unit, to four significant figures ("17.90 kip", "0.7500 in").
    pub fn show(self, q: Quantity) -> String {
        let v = self.value(q);
        let unit = self.unit(q.dim);
        let num = significant(v, 4);
        if unit.is_empty() {
            num
        } else {
            format!("{num} {unit}")
        }
    }
}

/// A number rounded to `n` significant figures, without exponent notation for ordinary sizes.
pub fn significant(v: f64, n: i32) -> String {
    if v == 0.0 || !v.is_finite() {
        return if v == 0.0 { "0".into() } else { format!("{v}") };
    }
    let magnitude = v.abs().log10().floor() as i32;
    let decimals = (n - 1 - magnitude).max(0) as usize;
    format!("{v:.decimals$}")
}

/// A length in inches as a shop fraction to the nearest 1/16 in.: "1-1/2 in", "3/16 in", "2 ft 3-1/2 in"
/// for 24 in. and over (feet shown only when `feet` is set).
pub fn fraction_inch(inches: f64, feet: bool) -> String {
    let sixteenths = (inches.abs() * 16.0).round() as i64;
    let sign = if inches < 0.0 && sixteenths != 0 {
        "-"
    } else {
        ""
    };
    let (ft, rest) = if feet && sixteenths >= 24 * 16 {
        (sixteenths / (12 * 16), sixteenths % (12 * 16))
    } else {
        (0, sixteenths)
    };
    let whole = rest / 16;
    let mut num = rest % 16;
    let mut den = 16;
    while num != 0 && num % 2 == 0 {
        num /= 2;
        den /= 2;
    }
    let inch_part = match (whole, num) {
        (0, 0) => "0".to_string(),
        (w, 0) => format!("{w}"),
        (0, n) => format!("{n}/{den}"),
        (w, n) => format!("{w}-{n}/{den}"),
    };
    if ft > 0 {
        format!("{sign}{ft} ft {inch_part} in")
    } else {
        format!("{sign}{inch_part} in")
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::units::{Force, Length};

    #[test]
    fn fractions_to_the_nearest_sixteenth() {
        assert_eq!(fraction_inch(1.5, false), "1-1/2 in");
        assert_eq!(fraction_inch(0.1875, false), "3/16 in");
        assert_eq!(fraction_inch(0.25, false), "1/4 in");
        assert_eq!(fraction_inch(0.26, false), "1/4 in");
        assert_eq!(fraction_inch(0.97, false), "1 in");
        assert_eq!(fraction_inch(27.5, true), "2 ft 3-1/2 in");
        assert_eq!(fraction_inch(27.5, false), "27-1/2 in");
        assert_eq!(fraction_inch(0.0, false), "0 in");
    }

    #[test]
    fn shows_in_the_chosen_system() {
        let f: Quantity = Force::kip(17.9).into();
        assert_eq!(UnitSystem::Us.show(f), "17.90 kip");
        assert_eq!(UnitSystem::Si.show(f), "79.62 kN");
        let l: Quantity = Length::inch(0.75).into();
        assert_eq!(UnitSystem::Us.show(l), "0.7500 in");
        assert_eq!(UnitSystem::Si.show(l), "19.05 mm");
    }
}
