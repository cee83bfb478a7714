//! The record every audit rule returns, and the error for input a rule cannot judge.

use crate::units::{Dim, Quantity};
use serde::ser::SerializeStruct;
use serde::{Serialize, Serializer};

/// Whether a rule is met.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize)]
#[serde(rename_all = "snake_case")]
pub enum AuditStatus {
    /// The rule is met: the margin is zero or positive.
    Pass,
    /// The rule is not met.
    Fail,
    /// The computed margin cannot settle the rule; a person must look (the note says why).
    Warn,
}

/// The outcome of one rule for one subject (a piece, a member, a hollow part, the structure).
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct AuditResult {
    /// Stable rule id, e.g. "piece_box", "piece_weight", "clear_zone".
    pub id: String,
    /// The rule set the limit comes from, as the model names it.
    pub rule_set: String,
    /// The piece mark, member id or part the rule was applied to.
    pub subject: String,
    #[serde(serialize_with = "quantity_value")]
    pub measured: Quantity,
    #[serde(serialize_with = "quantity_value")]
    pub limit: Quantity,
    /// Positive (or zero) when the rule is met, negative by how much it is missed.
    #[serde(serialize_with = "quantity_value")]
    pub margin: Quantity,
    pub status: AuditStatus,
    pub note: String,
}

impl AuditResult {
    /// A result whose status follows the sign of the margin (zero passes).
    pub fn from_margin(
        id: &str,
        rule_set: &str,
        subject: &str,
        measured: Quantity,
        limit: Quantity,
        margin: Quantity,
        note: String,
    ) -> Self {
        let status = if margin.si >= 0.0 {
            AuditStatus::Pass
        } else {
            AuditStatus::Fail
        };
        AuditResult {
            id: id.to_string(),
            rule_set: rule_set.to_string(),
            subject: subject.to_string(),
            measured,
            limit,
            margin,
            status,
            note,
        }
    }
}

/// Serializes a quantity as `{ "dim": "length", "si": 3124.2 }` (the internal unit of its kind:
/// mm, kg, ... or a bare number), so scripts read a value together with its kind.
fn quantity_value<S: Serializer>(q: &Quantity, s: S) -> Result<S::Ok, S::Error> {
    let mut st = s.serialize_struct("Quantity", 2)?;
    st.serialize_field("dim", &q.dim)?;
    // serde_json writes non-finite numbers as null without a word; refuse them instead.
    if !q.si.is_finite() {
        return Err(serde::ser::Error::custom("non-finite audit value"));
    }
    st.serialize_field("si", &q.si)?;
    st.end()
}

/// A count as a pure-number quantity.
pub fn count(n: usize) -> Quantity {
    Quantity {
        dim: Dim::Number,
        si: n as f64,
    }
}

/// Input an audit rule cannot judge: missing, contradictory or out of range. Never passed silently.
#[derive(Debug, Clone, PartialEq, Eq, thiserror::Error)]
#[error("{subject}: {field}: {message}")]
pub struct AuditInputError {
    /// The piece, member or part concerned.
    pub subject: String,
    /// The input field, e.g. "attachments[0].size".
    pub field: String,
    pub message: String,
}

impl AuditInputError {
    pub fn new(
        subject: impl Into<String>,
        field: impl Into<String>,
        message: impl Into<String>,
    ) -> Self {
        AuditInputError {
            subject: subject.into(),
            field: field.into(),
            message: message.into(),
        }
    }
}

/// Check that a length is finite and strictly positive.
pub(crate) fn positive(
    subject: &str,
    field: &str,
    v: crate::units::Length,
) -> Result<(), AuditInputError> {
    if v.is_finite() && v.si() > 0.0 {
        Ok(())
    } else {
        Err(AuditInputError::new(
            subject,
            field,
            format!("must be a positive length, got {} mm", v.si()),
        ))
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::units::Length;

    #[test]
    fn margin_sign_sets_status_and_json_keys_are_stable() {
        let r = AuditResult::from_margin(
            "piece_box",
            "kettle",
            "M1",
            Length::mm(10.0).into(),
            Length::mm(12.0).into(),
            Length::mm(2.0).into(),
            String::new(),
        );
        assert_eq!(r.status, AuditStatus::Pass);
        let json = serde_json::to_string(&r).unwrap();
        for key in [
            "\"id\"",
            "\"rule_set\"",
            "\"subject\"",
            "\"measured\"",
            "\"limit\"",
            "\"margin\"",
            "\"status\":\"pass\"",
            "\"dim\":\"length\"",
        ] {
            assert!(json.contains(key), "{key} missing in {json}");
        }
        let mut bad = r.clone();
        bad.margin = Quantity::number(f64::NAN);
        assert!(serde_json::to_string(&bad).is_err());
        let f = AuditResult::from_margin(
            "x",
            "",
            "M1",
            count(1),
            count(0),
            Quantity::number(-1.0),
            String::new(),
        );
        assert_eq!(f.status, AuditStatus::Fail);
    }

    #[test]
    fn positive_rejects_zero_and_nan() {
        assert!(positive("M1", "d", Length::mm(0.0)).is_err());
        assert!(positive("M1", "d", Length::mm(f64::NAN)).is_err());
        let e = positive("M1", "d", Length::mm(-1.0)).unwrap_err();
        assert_eq!(e.to_string(), "M1: d: must be a positive length, got -1 mm");
        assert!(positive("M1", "d", Length::mm(1.0)).is_ok());
    }
}
