//! Design standards as pure functions: inputs with units in, a nominal strength or a dimensional
//! requirement out, with the clause and equation it comes from. Nothing here reads files or knows
//! the model; it knows only [`crate::units`].

use crate::units::{Dim, Quantity};
use serde::Serialize;

/// Where a number comes from: the standard with its edition, the clause and the equation.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize)]
pub struct Citation {
    /// The standard and its edition, e.g. "AISC 360-22".
    pub standard: &'static str,
    /// The clause or table, e.g. "J3.11", "Table J3.4".
    pub clause: &'static str,
    /// The equation number, or "" where the clause gives a rule without a numbered equation.
    pub equation: &'static str,
}

impl Citation {
    pub const fn new(standard: &'static str, clause: &'static str, equation: &'static str) -> Self {
        Citation {
            standard,
            clause,
            equation,
        }
    }
}

impl std::fmt::Display for Citation {
    fn fmt(&self, f: &mut std::fmt::Formatter<'_>) -> std::fmt::Result {
        write!(f, "{} {}", self.standard, self.clause)?;
        if !self.equation.is_empty() {
            write!(f, ", Eq. {}", self.equation)?;
        }
        Ok(())
    }
}

/// Load and resistance factor design, or allowable strength design.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize, serde::Deserialize)]
#[serde(rename_all = "UPPERCASE")]
pub enum Method {
    Lrfd,
    Asd,
}

impl Method {
    pub fn name(self) -> &'static str {
        match self {
            Method::Lrfd => "LRFD",
            Method::Asd => "ASD",
        }
    }
}

/// One named input of a calculation, substituted into its equation: symbol, value with its kind,
/// and what it is in words.
#[derive(Debug, Clone, PartialEq)]
pub struct Input {
    pub symbol: &'static str,
    pub value: Quantity,
    pub meaning: &'static str,
}

impl Input {
    pub fn new(symbol: &'static str, value: impl Into<Quantity>, meaning: &'static str) -> Self {
        Input {
            symbol,
            value: value.into(),
            meaning,
        }
    }
}

/// A nominal strength from one limit-state equation, with its resistance and safety factors.
#[derive(Debug, Clone, PartialEq)]
pub struct Strength {
    pub citation: Citation,
    /// The equation in symbols as the standard writes it, e.g. "Rn = Fnv Ab".
    pub formula: &'static str,
    pub inputs: Vec<Input>,
    /// The nominal strength Rn (a force, or a force per length for a weld per unit length).
    pub nominal: Quantity,
    /// Resistance factor φ (LRFD).
    pub phi: f64,
    /// Safety factor Ω (ASD).
    pub omega: f64,
    /// Plain-word remarks a reviewer should read.
    pub notes: Vec<String>,
    /// Reasons the case lies outside the standard's scope; any makes the check `warn` at best.
    pub out_of_scope: Vec<String>,
}

impl Strength {
    /// The available strength: φ Rn for LRFD, Rn / Ω for ASD.
    pub fn available(&self, method: Method) -> Quantity {
        let v = match method {
            Method::Lrfd => self.phi * self.nominal.si,
            Method::Asd => self.nominal.si / self.omega,
        };
        Quantity {
            dim: self.nominal.dim,
            si: v,
        }
    }
}

/// Whether a dimensional rule sets a least or a greatest value.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize)]
#[serde(rename_all = "snake_case")]
pub enum Bound {
    Minimum,
    Maximum,
}

/// A dimensional rule (edge distance, spacing, weld size, stick-out): the dimension provided
/// against the dimension required.
#[derive(Debug, Clone, PartialEq)]
pub struct Requirement {
    pub citation: Citation,
    /// The rule in words or symbols, e.g. "le ≥ le,min (Table J3.4)".
    pub formula: &'static str,
    pub inputs: Vec<Input>,
    pub provided: Quantity,
    pub required: Quantity,
    pub bound: Bound,
    pub notes: Vec<String>,
    pub out_of_scope: Vec<String>,
}

impl Requirement {
    /// The ratio oriented so that above 1 fails: required/provided for a minimum,
    /// provided/required for a maximum.
    pub fn ratio(&self) -> f64 {
        let (p, r) = (self.provided.si, self.required.si);
        let meets = match self.bound {
            Bound::Minimum => p >= r,
            Bound::Maximum => p <= r,
        };
        let (num, den) = match self.bound {
            Bound::Minimum => (r, p),
            Bound::Maximum => (p, r),
        };
        let plain = num / den;
        if meets {
            // a rule met with a zero or negative side (e.g. a required stick-out of zero) reads 0
            if den > 0.0 && plain.is_finite() {
                plain.max(0.0)
            } else {
                0.0
            }
        } else if den > 0.0 && plain > 1.0 {
            plain
        } else {
            f64::INFINITY
        }
    }
}

#[cfg(test)]
mod ratio_tests {
    use super::*;
    use crate::units::Length;

    fn req(provided: f64, required: f64, bound: Bound) -> Requirement {
        Requirement {
            citation: Citation::new("test", "-", ""),
            formula: "",
            inputs: Vec::new(),
            provided: Length::mm(provided).into(),
            required: Length::mm(required).into(),
            bound,
            notes: Vec::new(),
            out_of_scope: Vec::new(),
        }
    }

    #[test]
    fn minimum_rules() {
        assert_eq!(req(20.0, 10.0, Bound::Minimum).ratio(), 0.5);
        assert_eq!(req(10.0, 20.0, Bound::Minimum).ratio(), 2.0);
        assert_eq!(req(0.0, 0.0, Bound::Minimum).ratio(), 0.0);
        // a negative stick-out against a zero minimum must fail, not read as met
        assert!(req(-1.0, 0.0, Bound::Minimum).ratio() > 1.0);
        assert!(req(0.0, 5.0, Bound::Minimum).ratio().is_infinite());
    }

    #[test]
    fn maximum_rules() {
        assert_eq!(req(5.0, 10.0, Bound::Maximum).ratio(), 0.5);
        assert_eq!(req(20.0, 10.0, Bound::Maximum).ratio(), 2.0);
        assert!(req(1.0, 0.0, Bound::Maximum).ratio() > 1.0);
        assert!(req(-1.0, 0.0, Bound::Maximum).ratio() <= 1.0);
    }
}

/// A force quantity, for nominal strengths.
pub fn force(q: crate::units::Force) -> Quantity {
    q.into()
}

/// A pure number as a quantity (for factors and ratios among the inputs).
pub fn number(v: f64) -> Quantity {
    Quantity {
        dim: Dim::Number,
        si: v,
    }
}

pub mod aisc360;
pub mod threads;
pub mod weld_notation;
