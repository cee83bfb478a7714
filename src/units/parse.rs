//! Parsing of quantities written with their units: "3/16 in", "1-1/2 in", "1 1/2 in",
//! "2 ft 3-1/2 in", "6.35 mm", "4.5 kip", "20 kN", "50 ksi", "345 MPa", "3.05 lb/ft", "60 deg".
//!
//! A bare number is always an error: the unit is part of the value.

use super::factor::*;
use super::types::*;
use thiserror::Error;

/// Why a quantity could not be read. The caller adds the file, line and key.
#[derive(Debug, Clone, PartialEq, Error)]
pub enum UnitError {
    #[error("'{text}' has no unit; write it with one, e.g. {example}")]
    MissingUnit { text: String, example: &'static str },
    #[error("'{text}': unknown unit '{unit}' for a {kind}; accepted: {accepted}")]
    UnknownUnit {
        text: String,
        unit: String,
        kind: &'static str,
        accepted: &'static str,
    },
    #[error("'{text}' is not a number with a unit; accepted forms: {example}")]
    Malformed { text: String, example: &'static str },
    #[error("'{text}' is not a finite number")]
    NotFinite { text: String },
    #[error("'{text}' is empty; write a value with its unit, e.g. {example}")]
    Empty { text: String, example: &'static str },
}

const LENGTH_EXAMPLE: &str =
    "\"3/16 in\", \"1-1/2 in\", \"1 1/2 in\", \"2 ft 3-1/2 in\", \"6.35 mm\", \"1.2 m\"";
const LENGTH_UNITS: &str = "in, ft, mm, cm, m (and \" or ' for inches or feet)";

/// A length, or a sheet-metal gauge number that a catalogue must resolve ("16 ga").
#[derive(Debug, Clone, Copy, PartialEq)]
pub enum LengthOrGauge {
    Length(Length),
    Gauge(u32),
}

/// Parse a number that may be a decimal, a fraction "3/16", or a mixed number "1-1/2" / "1 1/2".
fn parse_number(s: &str) -> Option<f64> {
    let s = s.trim();
    if s.is_empty() {
        return None;
    }
    let (neg, body) = match s.strip_prefix('-') {
        Some(rest) => (true, rest.trim_start()),
        None => (false, s.strip_prefix('+').unwrap_or(s)),
    };
    let value = if let Some((whole, frac)) = split_mixed(body) {
        let w = parse_plain(whole)?;
        let f = parse_fraction(frac)?;
        if w.fract() != 0.0 {
            return None;
        }
        w + f
    } else if body.contains('/') {
        parse_fraction(body)?
    } else {
        parse_plain(body)?
    };
    Some(if neg { -value } else { value })
}

/// "1-1/2" or "1 1/2" → ("1", "1/2").
fn split_mixed(s: &str) -> Option<(&str, &str)> {
    let slash = s.find('/')?;
    let head = &s[..slash];
    let sep = head.rfind(['-', ' '])?;
    Some((s[..sep].trim(), s[sep + 1..].trim()))
}

fn parse_plain(s: &str) -> Option<f64> {
    let s = s.trim();
    if s.is_empty()
        || !s
            .chars()
            .all(|c| c.is_ascii_digit() || c == '.' || c == 'e' || c == 'E' || c == '-' || c == '+')
    {
        return None;
    }
    if !s.starts_with(|c: char| c.is_ascii_digit() || c == '.') {
        return None;
    }
    s.parse::<f64>().ok()
}

fn parse_fraction(s: &str) -> Option<f64> {
    let (n, d) = s.split_once('/')?;
    let n = n.trim();
    let d = d.trim();
    if !n.chars().all(|c| c.is_ascii_digit()) || !d.chars().all(|c| c.is_ascii_digit()) {
        return None;
    }
    let n: f64 = n.parse().ok()?;
    let d: f64 = d.parse().ok()?;
    if d == 0.0 {
        return None;
    }
    Some(n / d)
}

/// Split "12.5 kip", "12.5kip" or "1-1/2 in" into the number and the unit: the number is the
/// leading run of digits, '.', '/', '-', '+', spaces and exponents; the unit is the rest.
fn split_unit(s: &str) -> (&str, &str) {
    let s = s.trim();
    let bytes = s.as_bytes();
    let mut end = 0;
    while end < bytes.len() {
        let c = bytes[end];
        let exponent = (c == b'e' || c == b'E')
            && end > 0
            && bytes[end - 1].is_ascii_digit()
            && bytes
                .get(end + 1)
                .is_some_and(|n| n.is_ascii_digit() || *n == b'-' || *n == b'+');
        if c.is_ascii_digit() || b"./-+ ".contains(&c) || exponent {
            end += 1;
        } else {
            break;
        }
    }
    (s[..end].trim(), s[end..].trim())
}

fn check_finite(text: &str, v: f64) -> Result<f64, UnitError> {
    if v.is_finite() {
        Ok(v)
    } else {
        Err(UnitError::NotFinite {
            text: text.to_string(),
        })
    }
}

fn number_and_unit<'a>(text: &'a str, example: &'static str) -> Result<(f64, &'a str), UnitError> {
    let t = text.trim();
    if t.is_empty() {
        return Err(UnitError::Empty {
            text: text.to_string(),
            example,
        });
    }
    let (num, unit) = split_unit(t);
    if unit.is_empty() {
        return match parse_number(num) {
            Some(_) => Err(UnitError::MissingUnit {
                text: text.to_string(),
                example,
            }),
            None => Err(UnitError::Malformed {
                text: text.to_string(),
                example,
            }),
        };
    }
    let v = parse_number(num).ok_or_else(|| UnitError::Malformed {
        text: text.to_string(),
        example,
    })?;
    Ok((check_finite(text, v)?, unit))
}

fn length_unit(unit: &str) -> Option<f64> {
    Some(match unit {
        "in" | "in." | "inch" | "inches" | "\"" => MM_PER_IN,
        "ft" | "ft." | "foot" | "feet" | "'" => MM_PER_FT,
        "mm" => 1.0,
        "cm" => 10.0,
        "m" => 1000.0,
        _ => return None,
    })
}

/// Parse a length: "3/16 in", "1-1/2 in", "1 1/2 in", "2 ft 3-1/2 in", "2'-3 1/2\"", "6.35 mm".
pub fn parse_length(text: &str) -> Result<Length, UnitError> {
    match parse_length_or_gauge(text)? {
        LengthOrGauge::Length(l) => Ok(l),
        LengthOrGauge::Gauge(_) => Err(UnitError::UnknownUnit {
            text: text.to_string(),
            unit: "ga".into(),
            kind: "length here (gauge numbers are read only for sheet and tube walls)",
            accepted: LENGTH_UNITS,
        }),
    }
}

/// Parse a length or a gauge number ("16 ga", "16 gauge").
pub fn parse_length_or_gauge(text: &str) -> Result<LengthOrGauge, UnitError> {
    let t = text.trim();
    if t.is_empty() {
        return Err(UnitError::Empty {
            text: text.to_string(),
            example: LENGTH_EXAMPLE,
        });
    }
    let lower = t.to_ascii_lowercase();
    for suffix in [" gauge", " ga", "ga", " gage"] {
        if let Some(n) = lower.strip_suffix(suffix) {
            let n = n.trim();
            if !n.is_empty() && n.chars().all(|c| c.is_ascii_digit()) {
                return Ok(LengthOrGauge::Gauge(n.parse().map_err(|_| {
                    UnitError::Malformed {
                        text: text.to_string(),
                        example: "\"16 ga\"",
                    }
                })?));
            }
        }
    }
    // feet-and-inches: "2 ft 3-1/2 in", "2'-3 1/2\"", "2 ft"
    let feet_split = ["ft", "'"].iter().find_map(|m| {
        let pos = lower.find(m)?;
        let rest = t[pos + m.len()..].trim();
        let rest = rest.strip_prefix('.').unwrap_or(rest).trim();
        if rest.is_empty() {
            None
        } else {
            Some((
                &t[..pos + m.len()],
                rest.strip_prefix('-').unwrap_or(rest).trim(),
            ))
        }
    });
    if let Some((feet, inches)) = feet_split {
        let f = parse_simple_length(feet)?;
        let i = parse_simple_length(inches)?;
        if feet.trim_start().starts_with('-') {
            return Err(UnitError::Malformed {
                text: text.to_string(),
                example: LENGTH_EXAMPLE,
            });
        }
        return Ok(LengthOrGauge::Length(f + i));
    }
    parse_simple_length(t).map(LengthOrGauge::Length)
}

fn parse_simple_length(text: &str) -> Result<Length, UnitError> {
    let (v, unit) = number_and_unit(text, LENGTH_EXAMPLE)?;
    let k = length_unit(&unit.to_ascii_lowercase()).ok_or_else(|| UnitError::UnknownUnit {
        text: text.to_string(),
        unit: unit.to_string(),
        kind: "length",
        accepted: LENGTH_UNITS,
    })?;
    Ok(Length::mm(v * k))
}

macro_rules! simple_parser {
    ($(#[$doc:meta])* $fname:ident, $ty:ident, $kind:literal, $example:literal, $accepted:literal, { $($u:literal => $k:expr),* $(,)? }) => {
        $(#[$doc])*
        pub fn $fname(text: &str) -> Result<$ty, UnitError> {
            let (v, unit) = number_and_unit(text, $example)?;
            let k: f64 = match unit {
                $($u => $k,)*
                _ => return Err(UnitError::UnknownUnit {
                    text: text.to_string(),
                    unit: unit.to_string(),
                    kind: $kind,
                    accepted: $accepted,
                }),
            };
            Ok($ty::from_si(v * k))
        }
    };
}

simple_parser!(
    /// Parse a force: "450 lbf", "4.5 kip", "20 kN", "900 N". A bare "lb" is refused for a force:
    /// write lbf.
    parse_force, Force, "force", "\"4.5 kip\", \"450 lbf\", \"20 kN\"",
    "lbf, kip, N, kN (write lbf, not lb, for a force)",
    { "lbf" => N_PER_LBF, "kip" => N_PER_KIP, "kips" => N_PER_KIP, "N" => 1.0, "kN" => 1000.0 }
);
simple_parser!(
    /// Parse a stress: "50 ksi", "36000 psi", "345 MPa", "345 N/mm2".
    parse_stress, Stress, "stress", "\"50 ksi\", \"345 MPa\"",
    "psi, ksi, MPa, N/mm2, GPa",
    { "psi" => MPA_PER_PSI, "ksi" => MPA_PER_KSI, "MPa" => 1.0, "N/mm2" => 1.0, "N/mm²" => 1.0, "GPa" => 1000.0 }
);
simple_parser!(
    /// Parse an area: "0.442 in2", "84.3 mm2", "4.21 cm2".
    parse_area, Area, "area", "\"0.442 in2\", \"84.3 mm2\"",
    "in2, mm2, cm2 (or in², mm², cm²)",
    { "in2" => MM_PER_IN * MM_PER_IN, "in²" => MM_PER_IN * MM_PER_IN, "sq in" => MM_PER_IN * MM_PER_IN,
      "mm2" => 1.0, "mm²" => 1.0, "cm2" => 100.0, "cm²" => 100.0 }
);
simple_parser!(
    /// Parse a mass (or a weight written as a mass): "12 lb", "5.4 kg".
    parse_mass, Mass, "mass or weight", "\"12 lb\", \"5.4 kg\"",
    "lb, kg, g",
    { "lb" => KG_PER_LB, "lbs" => KG_PER_LB, "lbm" => KG_PER_LB, "kg" => 1.0, "g" => 0.001 }
);
simple_parser!(
    /// Parse a weight per length: "3.05 lb/ft", "3.30 kg/m".
    parse_mass_per_length, MassPerLength, "weight per length", "\"3.05 lb/ft\", \"3.30 kg/m\"",
    "lb/ft, kg/m",
    { "lb/ft" => KGM_PER_LBFT, "plf" => KGM_PER_LBFT, "kg/m" => 1.0 }
);
simple_parser!(
    /// Parse an angle: "60 deg", "60°", "1.047 rad".
    parse_angle, Angle, "angle", "\"60 deg\"",
    "deg, °, rad",
    { "deg" => std::f64::consts::PI / 180.0, "°" => std::f64::consts::PI / 180.0, "rad" => 1.0 }
);

#[cfg(test)]
mod tests {
    use super::*;

    fn inch(s: &str) -> f64 {
        parse_length(s).unwrap().to_in()
    }

    #[test]
    fn length_forms() {
        // Table of accepted forms (common practice in US shop drawings and SI drawings).
        let cases: &[(&str, f64)] = &[
            ("3/16 in", 0.1875),
            ("1-1/2 in", 1.5),
            ("1 1/2 in", 1.5),
            ("1-1/2\"", 1.5),
            ("0.75 in", 0.75),
            ("0.75in", 0.75),
            ("2 ft 3-1/2 in", 27.5),
            ("2'-3 1/2\"", 27.5),
            ("2 ft", 24.0),
            ("6.35 mm", 0.25),
            ("25.4 mm", 1.0),
            ("0.0254 m", 1.0),
            ("2.54 cm", 1.0),
            ("12 inches", 12.0),
            (".5 in", 0.5),
        ];
        for (text, expected) in cases {
            let got = inch(text);
            assert!(
                (got - expected).abs() < 1e-12,
                "{text}: {got} != {expected}"
            );
        }
    }

    #[test]
    fn gauge_numbers_are_handed_back() {
        assert_eq!(
            parse_length_or_gauge("16 ga").unwrap(),
            LengthOrGauge::Gauge(16)
        );
        assert_eq!(
            parse_length_or_gauge("11 gauge").unwrap(),
            LengthOrGauge::Gauge(11)
        );
        assert!(parse_length("16 ga").is_err());
    }

    #[test]
    fn bare_number_is_refused_with_example() {
        let e = parse_length("0.25").unwrap_err();
        assert!(matches!(e, UnitError::MissingUnit { .. }));
        assert!(e.to_string().contains("3/16 in"), "{e}");
        assert!(matches!(
            parse_force("12").unwrap_err(),
            UnitError::MissingUnit { .. }
        ));
    }

    #[test]
    fn unknown_units_name_the_accepted_ones() {
        let e = parse_length("3 furlong").unwrap_err();
        assert!(
            e.to_string().contains("furlong") && e.to_string().contains("mm"),
            "{e}"
        );
        let e = parse_force("12 lb").unwrap_err();
        assert!(e.to_string().contains("lbf"), "{e}");
    }

    #[test]
    fn malformed_and_non_finite() {
        assert!(matches!(
            parse_length("abc in").unwrap_err(),
            UnitError::Malformed { .. }
        ));
        assert!(matches!(
            parse_length("1/0 in").unwrap_err(),
            UnitError::Malformed { .. }
        ));
        assert!(parse_length("NaN in").is_err());
        assert!(parse_length("inf mm").is_err());
        assert!(matches!(
            parse_length("").unwrap_err(),
            UnitError::Empty { .. }
        ));
        assert!(matches!(
            parse_length("1e999 mm").unwrap_err(),
            UnitError::NotFinite { .. }
        ));
    }

    #[test]
    fn forces_stresses_and_others() {
        assert!((parse_force("4.5 kip").unwrap().to_kip() - 4.5).abs() < 1e-12);
        assert!((parse_force("1000 lbf").unwrap().to_kip() - 1.0).abs() < 1e-12);
        assert!((parse_force("20 kN").unwrap().to_n() - 20_000.0).abs() < 1e-9);
        assert!((parse_force("-3.2 kip").unwrap().to_kip() + 3.2).abs() < 1e-12);
        assert!((parse_stress("50 ksi").unwrap().to_ksi() - 50.0).abs() < 1e-12);
        assert!((parse_stress("36000 psi").unwrap().to_ksi() - 36.0).abs() < 1e-12);
        // 345 MPa = 50.04 ksi (NIST SP 811 factor 6.894 757 MPa/ksi).
        assert!((parse_stress("345 MPa").unwrap().to_ksi() - 50.038).abs() < 1e-3);
        assert!((parse_area("0.442 in2").unwrap().to_in2() - 0.442).abs() < 1e-12);
        assert!((parse_area("84.3 mm2").unwrap().to_mm2() - 84.3).abs() < 1e-12);
        assert!((parse_mass("10 lb").unwrap().to_kg() - 4.5359237).abs() < 1e-12);
        assert!((parse_mass_per_length("3.05 lb/ft").unwrap().to_lb_per_ft() - 3.05).abs() < 1e-12);
        assert!(
            (parse_angle("90 deg").unwrap().to_rad() - std::f64::consts::FRAC_PI_2).abs() < 1e-12
        );
    }
}
