//! Venting and draining of closed hollow parts of pieces to be hot-dip galvanized.
//!
//! A closed hollow part dipped in molten zinc (about 450 °C) can burst from trapped air and
//! moisture, and a part that cannot drain or vent is not coated inside. ASTM A385/A385M (Standard
//! Practice for Providing High-Quality Zinc Coatings, Hot-Dip) and ISO 14713-2 (Zinc coatings —
//! Part 2: Hot dip galvanizing) recommend a vent and a drain opening in every closed part, placed
//! at its ends so the bath flows in at one end and air leaves at the other (from memory: the
//! clause numbers and the hole-size tables were not at hand, so the least hole size is a rule-set
//! input, never a default).

use super::result::{count, positive, AuditInputError, AuditResult};
use crate::units::Length;

/// Where an opening of a hollow part is.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum OpeningAt {
    EndA,
    EndB,
    /// Away from both ends: it neither vents nor drains the part in every dipping position.
    Between,
}

/// A hole in the wall or end plate of a hollow part, or an end left open (its bore as `diameter`).
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Opening {
    pub at: OpeningAt,
    pub diameter: Length,
}

/// A closed or partly closed hollow part of a piece (a tube between end plates, a sleeve cavity).
#[derive(Debug, Clone, PartialEq)]
pub struct HollowPart {
    pub name: String,
    pub openings: Vec<Opening>,
}

/// The vent rule: a part is vented when each of its two ends has an opening of at least
/// `least_hole`; measured is the number of ends so served, the limit 2.
pub fn vent_and_drain_rule(
    piece: &str,
    part: &HollowPart,
    least_hole: Length,
    rule_set: &str,
) -> Result<AuditResult, AuditInputError> {
    positive(piece, "least_hole", least_hole)?;
    for (i, o) in part.openings.iter().enumerate() {
        positive(
            piece,
            &format!("{}.openings[{i}].diameter", part.name),
            o.diameter,
        )?;
    }
    let served = |end: OpeningAt| {
        part.openings
            .iter()
            .any(|o| o.at == end && o.diameter.si() >= least_hole.si())
    };
    let mut missing = Vec::new();
    if !served(OpeningAt::EndA) {
        missing.push("end A");
    }
    if !served(OpeningAt::EndB) {
        missing.push("end B");
    }
    let ends = 2 - missing.len();
    let note = if missing.is_empty() {
        "vented and drained at both ends".to_string()
    } else if part.openings.is_empty() {
        "sealed hollow part: it can burst in the galvanizing bath; add vent and drain holes at both ends"
            .to_string()
    } else {
        format!(
            "no opening of at least {:.1} mm at {}",
            least_hole.si(),
            missing.join(" and ")
        )
    };
    Ok(AuditResult::from_margin(
        "galvanizing_vents",
        rule_set,
        &format!("{piece} {}", part.name),
        count(ends),
        count(2),
        super::Quantity::number(ends as f64 - 2.0),
        note,
    ))
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::audit::AuditStatus;

    fn hole(at: OpeningAt, d: f64) -> Opening {
        Opening {
            at,
            diameter: Length::inch(d),
        }
    }

    #[test]
    fn vent_cases() {
        let least = Length::inch(0.5);
        let part = |o: Vec<Opening>| HollowPart {
            name: "tube".into(),
            openings: o,
        };
        let both = part(vec![
            hole(OpeningAt::EndA, 0.5),
            hole(OpeningAt::EndB, 0.75),
        ]);
        assert_eq!(
            vent_and_drain_rule("P1", &both, least, "galv")
                .unwrap()
                .status,
            AuditStatus::Pass
        );
        let sealed = vent_and_drain_rule("P1", &part(vec![]), least, "galv").unwrap();
        assert_eq!(sealed.status, AuditStatus::Fail);
        assert!(sealed.note.contains("burst"));
        let one_end = part(vec![
            hole(OpeningAt::EndA, 1.0),
            hole(OpeningAt::Between, 1.0),
        ]);
        let r = vent_and_drain_rule("P1", &one_end, least, "galv").unwrap();
        assert_eq!(r.status, AuditStatus::Fail);
        assert_eq!(r.note, "no opening of at least 12.7 mm at end B");
        let small = part(vec![
            hole(OpeningAt::EndA, 0.25),
            hole(OpeningAt::EndB, 0.75),
        ]);
        assert_eq!(
            vent_and_drain_rule("P1", &small, least, "galv")
                .unwrap()
                .status,
            AuditStatus::Fail
        );
        assert!(vent_and_drain_rule("P1", &both, Length::mm(0.0), "galv").is_err());
    }
}
