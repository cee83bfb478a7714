//! Piece weight: tube weight per length × cut length, attachments from their volume and density,
//! fillet weld metal, fixed hardware; totals for the structure with its loose hardware.

use super::piece_box::Piece;
use super::result::{positive, AuditInputError, AuditResult};
use crate::units::{Density, Length, Mass, MassPerLength};

/// A fillet weld of equal legs `leg` and length `length`, its metal of density `density`.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct FilletWeld {
    pub leg: Length,
    pub length: Length,
    pub density: Density,
}

/// The masses of one piece, by source.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct PieceWeight {
    pub tube: Mass,
    pub attachments: Mass,
    pub welds: Mass,
    pub hardware: Mass,
    pub total: Mass,
}

/// Weld metal of a fillet weld: w²/2 × length × density (the triangle of the legs; common practice,
/// reinforcement and penetration ignored).
pub fn fillet_weld_mass(w: &FilletWeld) -> Mass {
    w.density * ((w.leg * w.leg) * 0.5 * w.length)
}

/// The weight of a piece: `tube` per length × |AB|, each attachment box's volume × `plate_density`
/// (one density per attachment, in order), the welds, and fixed hardware masses given by the caller.
pub fn piece_weight(
    piece: &Piece,
    tube: MassPerLength,
    plate_density: &[Density],
    welds: &[FilletWeld],
    hardware: &[Mass],
) -> Result<PieceWeight, AuditInputError> {
    let mark = piece.mark.as_str();
    if !(tube.is_finite() && tube.si() > 0.0) {
        return Err(AuditInputError::new(
            mark,
            "tube weight per length",
            "must be positive",
        ));
    }
    if plate_density.len() != piece.attachments.len() {
        return Err(AuditInputError::new(
            mark,
            "attachments",
            format!(
                "{} attachments but {} densities: each attachment needs its density",
                piece.attachments.len(),
                plate_density.len()
            ),
        ));
    }
    let mut attachments = Mass::kg(0.0);
    for (i, (att, rho)) in piece.attachments.iter().zip(plate_density).enumerate() {
        for s in att.size {
            positive(mark, &format!("attachments[{i}].size"), s)?;
        }
        if !(rho.is_finite() && rho.si() > 0.0) {
            return Err(AuditInputError::new(
                mark,
                format!("attachments[{i}].density"),
                "must be positive",
            ));
        }
        attachments = attachments + *rho * (att.size[0] * att.size[1] * att.size[2]);
    }
    let mut weld_mass = Mass::kg(0.0);
    for (i, w) in welds.iter().enumerate() {
        positive(mark, &format!("welds[{i}].leg"), w.leg)?;
        positive(mark, &format!("welds[{i}].length"), w.length)?;
        weld_mass = weld_mass + fillet_weld_mass(w);
    }
    if hardware.iter().any(|m| !(m.is_finite() && m.si() >= 0.0)) {
        return Err(AuditInputError::new(
            mark,
            "hardware",
            "a mass is negative or not finite",
        ));
    }
    let hw: Mass = hardware.iter().copied().sum();
    let tube_mass = tube * piece.member.length();
    Ok(PieceWeight {
        tube: tube_mass,
        attachments,
        welds: weld_mass,
        hardware: hw,
        total: tube_mass + attachments + weld_mass + hw,
    })
}

/// The structure's total: every piece plus loose hardware.
pub fn structure_weight(pieces: &[PieceWeight], loose_hardware: &[Mass]) -> Mass {
    pieces.iter().map(|p| p.total).sum::<Mass>() + loose_hardware.iter().copied().sum()
}

/// The piece weight rule: total at most `max` (what a person may lift, say).
pub fn piece_weight_rule(mark: &str, w: &PieceWeight, max: Mass, rule_set: &str) -> AuditResult {
    AuditResult::from_margin(
        "piece_weight",
        rule_set,
        mark,
        w.total.into(),
        max.into(),
        (max - w.total).into(),
        format!(
            "tube {:.2} kg ({:.2} lb) + attachments {:.2} kg ({:.2} lb) + welds {:.3} kg ({:.3} lb) \
             + hardware {:.2} kg ({:.2} lb)",
            w.tube.si(),
            w.tube.to_lb(),
            w.attachments.si(),
            w.attachments.to_lb(),
            w.welds.si(),
            w.welds.to_lb(),
            w.hardware.si(),
            w.hardware.to_lb()
        ),
    )
}
