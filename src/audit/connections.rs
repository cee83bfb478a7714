//! Connection rules of a rule set: allowed connection kinds, bolt end past the nut, and the number
//! of distinct fastener items.

use super::result::{count, AuditInputError, AuditResult};
use crate::units::{Length, Quantity};
use std::collections::BTreeSet;

/// The kind rule: a connection's kind must be one the rule set allows.
pub fn connection_kind_rule(
    subject: &str,
    kind: &str,
    allowed: &[&str],
    rule_set: &str,
) -> AuditResult {
    let ok = allowed.contains(&kind);
    let hint = crate::diag::nearest(kind, allowed.iter().copied());
    let note = if ok {
        format!("kind '{kind}' allowed")
    } else if hint.is_empty() {
        format!(
            "kind '{kind}' not allowed (allowed: {})",
            allowed.join(", ")
        )
    } else {
        format!(
            "kind '{kind}' not allowed (nearest allowed: {})",
            hint.join(", ")
        )
    };
    AuditResult::from_margin(
        "connection_kind",
        rule_set,
        subject,
        count(usize::from(!ok)),
        count(0),
        Quantity::number(if ok { 0.0 } else { -1.0 }),
        note,
    )
}

/// The thread-past-the-nut rule: the bolt end beyond the nut's outer face (`stick_out`, negative
/// when short of flush) at least `least`. Flush (0) is the least RCSC Specification §2.3.2 allows
/// (from memory); a rule set may ask for more.
pub fn thread_past_nut_rule(
    subject: &str,
    stick_out: Length,
    least: Length,
    rule_set: &str,
) -> Result<AuditResult, AuditInputError> {
    if !stick_out.is_finite() || !least.is_finite() || least.si() < 0.0 {
        return Err(AuditInputError::new(
            subject,
            "stick_out",
            "missing or not finite, or a negative least value",
        ));
    }
    Ok(AuditResult::from_margin(
        "thread_past_nut",
        rule_set,
        subject,
        stick_out.into(),
        least.into(),
        (stick_out - least).into(),
        "bolt end beyond the outer face of the nut".to_string(),
    ))
}

/// The fastener variety rule: the number of distinct fastener item names at most `max`.
pub fn distinct_fasteners_rule(items: &[&str], max: usize, rule_set: &str) -> AuditResult {
    let distinct: BTreeSet<&str> = items.iter().copied().collect();
    AuditResult::from_margin(
        "distinct_fasteners",
        rule_set,
        "structure",
        count(distinct.len()),
        count(max),
        Quantity::number(max as f64 - distinct.len() as f64),
        format!(
            "items: {}",
            distinct.into_iter().collect::<Vec<_>>().join(", ")
        ),
    )
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::audit::AuditStatus;

    #[test]
    fn kinds_stick_out_and_variety() {
        let r = connection_kind_rule(
            "J1",
            "bolted_sleeve",
            &["bolted_sleeve", "welded_tab"],
            "rules",
        );
        assert_eq!(r.status, AuditStatus::Pass);
        let r = connection_kind_rule(
            "J2",
            "welded_tabs",
            &["bolted_sleeve", "welded_tab"],
            "rules",
        );
        assert_eq!(r.status, AuditStatus::Fail);
        assert!(r.note.contains("nearest allowed: welded_tab"), "{}", r.note);
        let r =
            thread_past_nut_rule("J1", Length::inch(-0.0625), Length::inch(0.0), "rules").unwrap();
        assert_eq!(r.status, AuditStatus::Fail);
        assert!(
            thread_past_nut_rule("J1", Length::mm(f64::NAN), Length::inch(0.0), "rules").is_err()
        );
        let r = distinct_fasteners_rule(&["B1", "B2", "B1", "N1"], 2, "rules");
        assert_eq!(r.status, AuditStatus::Fail);
        assert_eq!(r.measured.si, 3.0);
        assert_eq!(
            distinct_fasteners_rule(&["B1", "B1"], 2, "rules").status,
            AuditStatus::Pass
        );
    }
}
