//! The record of one check: what was checked, by which clause and equation, with which inputs,
//! and how it came out. Built from the standards' [`Strength`] and [`Requirement`] records.

use crate::standards::{Bound, Citation, Input, Method, Requirement, Strength};
use crate::units::{Dim, Force, Quantity};

/// How a check came out.
#[derive(Debug, Clone, Copy, PartialEq, Eq, PartialOrd, Ord)]
pub enum Status {
    Pass,
    /// Met, but outside the standard's scope or short of a preferred value: the engineer decides.
    Warn,
    Fail,
}

impl Status {
    pub fn as_str(self) -> &'static str {
        match self {
            Status::Pass => "pass",
            Status::Warn => "warn",
            Status::Fail => "fail",
        }
    }
}

/// The resistance factor φ (LRFD) or safety factor Ω (ASD) a strength was divided or multiplied by.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Factor {
    /// "phi" or "omega".
    pub symbol: &'static str,
    pub value: f64,
}

/// One check of one limit state or dimensional rule.
#[derive(Debug, Clone, PartialEq)]
pub struct CheckResult {
    /// Stable snake_case id of the limit state, e.g. "bolt_shear".
    pub limit_state: &'static str,
    /// The part checked, e.g. "tab", "mate", "bolt group", "member wall".
    pub subject: String,
    /// The load case the demand comes from; none for dimensional rules.
    pub load_case: Option<String>,
    pub citation: Citation,
    pub formula: String,
    pub inputs: Vec<Input>,
    /// Nominal strength Rn; none for dimensional rules.
    pub nominal: Option<Quantity>,
    pub factor: Option<Factor>,
    /// Available strength (φRn or Rn/Ω), or for a dimensional rule the limit that must not be
    /// passed (the provided value of a minimum, the limit of a maximum).
    pub available: Quantity,
    /// Demand: the required strength, or for a dimensional rule the value compared with the
    /// limit (the required value of a minimum, the provided value of a maximum).
    pub demand: Quantity,
    /// For a dimensional rule, whether the provided value is a minimum or a maximum; none for
    /// strengths.
    pub bound: Option<Bound>,
    /// demand / available; above 1 fails.
    pub ratio: f64,
    pub status: Status,
    pub notes: Vec<String>,
}

/// Above this ratio a check fails (a tolerance for rounding in unit conversion only).
const RATIO_LIMIT: f64 = 1.0 + 1e-9;

fn status_of(ratio: f64, out_of_scope: bool, advisory: bool) -> Status {
    let over = !ratio.is_finite() || ratio > RATIO_LIMIT;
    match (over, advisory, out_of_scope) {
        (true, false, _) => Status::Fail,
        (true, true, _) | (false, _, true) => Status::Warn,
        (false, _, false) => Status::Pass,
    }
}

fn notes_with_scope(notes: Vec<String>, out_of_scope: Vec<String>) -> Vec<String> {
    let mut all = notes;
    all.extend(
        out_of_scope
            .into_iter()
            .map(|s| format!("outside the standard's scope: {s}")),
    );
    all
}

impl CheckResult {
    /// A strength check: available strength against the demand of a load case.
    pub fn strength(
        limit_state: &'static str,
        subject: impl Into<String>,
        s: Strength,
        method: Method,
        demand: Force,
        load_case: &str,
    ) -> Self {
        let available = s.available(method);
        let demand: Quantity = demand.abs().into();
        let ratio = ratio(demand.si, available.si);
        let scope = !s.out_of_scope.is_empty();
        CheckResult {
            limit_state,
            subject: subject.into(),
            load_case: Some(load_case.to_string()),
            citation: s.citation,
            formula: s.formula.to_string(),
            inputs: s.inputs,
            nominal: Some(s.nominal),
            factor: Some(match method {
                Method::Lrfd => Factor {
                    symbol: "phi",
                    value: s.phi,
                },
                Method::Asd => Factor {
                    symbol: "omega",
                    value: s.omega,
                },
            }),
            available,
            demand,
            bound: None,
            ratio,
            status: status_of(ratio, scope, false),
            notes: notes_with_scope(s.notes, s.out_of_scope),
        }
    }

    /// A dimensional rule. `advisory` rules (a preferred value) warn instead of failing.
    pub fn requirement(
        limit_state: &'static str,
        subject: impl Into<String>,
        r: Requirement,
        advisory: bool,
    ) -> Self {
        let ratio = r.ratio();
        let (available, demand) = match r.bound {
            Bound::Minimum => (r.provided, r.required),
            Bound::Maximum => (r.required, r.provided),
        };
        let scope = !r.out_of_scope.is_empty();
        let mut notes = notes_with_scope(r.notes, r.out_of_scope);
        if advisory {
            notes.push("a preferred value: short of it warns, it does not fail".into());
        }
        CheckResult {
            limit_state,
            subject: subject.into(),
            load_case: None,
            citation: r.citation,
            formula: r.formula.to_string(),
            inputs: r.inputs,
            nominal: None,
            factor: None,
            available,
            demand,
            bound: Some(r.bound),
            ratio,
            status: status_of(ratio, scope, advisory),
            notes,
        }
    }

    /// Multiply the strength by a count (bolts, walls), recording it as an input.
    pub fn times(mut self, n: f64, symbol: &'static str, meaning: &'static str) -> Self {
        if let Some(nominal) = &mut self.nominal {
            nominal.si *= n;
        }
        self.available.si *= n;
        self.inputs.push(Input::new(
            symbol,
            Quantity {
                dim: Dim::Number,
                si: n,
            },
            meaning,
        ));
        self.formula = format!("{symbol} × ({})", self.formula);
        self.ratio = ratio(self.demand.si, self.available.si);
        let scope = self
            .notes
            .iter()
            .any(|n| n.starts_with("outside the standard's scope"));
        self.status = status_of(self.ratio, scope, false);
        self
    }

    /// Mark the check as outside the standard's scope: it warns at best.
    pub fn out_of_scope(mut self, reason: impl Into<String>) -> Self {
        let reason = reason.into();
        if reason.starts_with("outside the standard's scope") {
            self.notes.push(reason);
        } else {
            self.notes
                .push(format!("outside the standard's scope: {reason}"));
        }
        self.status = self.status.max(Status::Warn);
        self
    }

    /// Whether the check could be evaluated at all: a geometry that makes it impossible gives a
    /// record with no formula, inputs, nominal strength or bound (see `checks::impossible`).
    pub fn evaluated(&self) -> bool {
        !self.formula.is_empty()
            || !self.inputs.is_empty()
            || self.nominal.is_some()
            || self.bound.is_some()
    }

    /// Add a note for the reviewer.
    pub fn note(mut self, note: impl Into<String>) -> Self {
        self.notes.push(note.into());
        self
    }
}

fn ratio(demand: f64, available: f64) -> f64 {
    if demand == 0.0 {
        0.0
    } else if available > 0.0 {
        demand / available
    } else {
        f64::INFINITY
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::standards::Citation;
    use crate::units::Length;

    fn strength(nominal_kip: f64) -> Strength {
        Strength {
            citation: Citation::new("AISC 360-22", "J3.7", "J3-1"),
            formula: "Rn = Fnv Ab",
            inputs: Vec::new(),
            nominal: Force::kip(nominal_kip).into(),
            phi: 0.75,
            omega: 2.0,
            notes: Vec::new(),
            out_of_scope: Vec::new(),
        }
    }

    #[test]
    fn lrfd_and_asd_ratios() {
        let c = CheckResult::strength(
            "bolt_shear",
            "bolts",
            strength(10.0),
            Method::Lrfd,
            Force::kip(-6.0),
            "D",
        );
        assert!((c.available.si - Force::kip(7.5).si()).abs() < 1e-9);
        assert!((c.ratio - 0.8).abs() < 1e-12);
        assert_eq!(c.status, Status::Pass);
        let c = CheckResult::strength(
            "bolt_shear",
            "bolts",
            strength(10.0),
            Method::Asd,
            Force::kip(6.0),
            "D",
        );
        assert!((c.ratio - 1.2).abs() < 1e-12);
        assert_eq!(c.status, Status::Fail);
    }

    #[test]
    fn times_scales_and_out_of_scope_warns() {
        let mut s = strength(10.0);
        s.out_of_scope.push("grade not listed".into());
        let c = CheckResult::strength(
            "bolt_shear",
            "bolts",
            s,
            Method::Lrfd,
            Force::kip(12.0),
            "D",
        );
        assert_eq!(c.status, Status::Fail);
        let c = c.times(2.0, "n", "bolts");
        assert!((c.ratio - 0.8).abs() < 1e-12);
        assert_eq!(c.status, Status::Warn);
    }

    #[test]
    fn advisory_rule_warns() {
        let r = Requirement {
            citation: Citation::new("AISC 360-22", "J3.4", ""),
            formula: "s ≥ 3 d",
            inputs: Vec::new(),
            provided: Length::inch(1.25).into(),
            required: Length::inch(1.5).into(),
            bound: Bound::Minimum,
            notes: Vec::new(),
            out_of_scope: Vec::new(),
        };
        assert_eq!(
            CheckResult::requirement("bolt_spacing", "bolts", r.clone(), true).status,
            Status::Warn
        );
        assert_eq!(
            CheckResult::requirement("bolt_spacing", "bolts", r, false).status,
            Status::Fail
        );
    }
}
