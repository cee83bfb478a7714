//! How the sheet writes numbers: lengths in the shop's units (inches as fractions to the nearest
//! 1/16 in., with the decimal where the fraction rounds), forces and ratios.

use crate::units::{fraction_inch, Length, Quantity, UnitSystem};

/// A length for the shop: "1-1/2 in", or "≈ 9/32 in (0.281 in)" when the nearest 1/16 in. is not
/// exact; in SI "38.1 mm". `feet` writes 24 in. and over as feet and inches.
pub fn length(l: Length, units: UnitSystem, feet: bool) -> String {
    match units {
        UnitSystem::Us => {
            let inches = l.to_in();
            let sixteenths = inches * 16.0;
            let fraction = fraction_inch(inches, feet);
            if (sixteenths - sixteenths.round()).abs() < 1e-6 {
                fraction
            } else {
                format!("≈ {fraction} ({inches:.3} in)")
            }
        }
        UnitSystem::Si => format!("{} mm", trim_decimals(l.to_mm(), 1)),
    }
}

/// A quantity in the chosen units to four significant figures, or "—" when it is not a number.
pub fn quantity(q: Quantity, units: UnitSystem) -> String {
    if units.value(q).is_finite() {
        units.show(q)
    } else {
        "—".into()
    }
}

/// A demand/available ratio to three decimals; "∞" where nothing is available.
pub fn ratio(r: f64) -> String {
    if r.is_finite() {
        format!("{r:.3}")
    } else {
        "∞".into()
    }
}

/// A number with at most `decimals` decimals and no trailing zeros.
pub fn trim_decimals(v: f64, decimals: usize) -> String {
    let s = format!("{v:.decimals$}");
    if s.contains('.') {
        s.trim_end_matches('0').trim_end_matches('.').to_string()
    } else {
        s
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn exact_sixteenths_are_plain_fractions() {
        assert_eq!(length(Length::inch(1.5), UnitSystem::Us, false), "1-1/2 in");
        assert_eq!(
            length(Length::inch(0.5625), UnitSystem::Us, false),
            "9/16 in"
        );
        assert_eq!(
            length(Length::inch(94.25), UnitSystem::Us, true),
            "7 ft 10-1/4 in"
        );
    }

    #[test]
    fn rounded_fractions_show_the_decimal() {
        assert_eq!(
            length(Length::inch(0.28125), UnitSystem::Us, false),
            "≈ 5/16 in (0.281 in)"
        );
        assert_eq!(length(Length::inch(1.5), UnitSystem::Si, false), "38.1 mm");
        assert_eq!(length(Length::mm(12.0), UnitSystem::Si, false), "12 mm");
    }

    #[test]
    fn ratios() {
        assert_eq!(ratio(0.78817), "0.788");
        assert_eq!(ratio(f64::INFINITY), "∞");
    }
}
