//! Structure envelope: the overall extents along x, y and z of the members swept (each section
//! along its axis), against optional least and greatest sizes per axis.

use super::geometry::{extent, MemberSolid, Solid, Vec3};
use super::result::{AuditInputError, AuditResult};
use crate::units::Length;

/// The overall size of the structure along global x, y and z.
pub fn structure_extents(
    members: &[(String, MemberSolid)],
) -> Result<[Length; 3], AuditInputError> {
    if members.is_empty() {
        return Err(AuditInputError::new(
            "structure",
            "members",
            "no members given",
        ));
    }
    let solids = members
        .iter()
        .map(|(id, m)| m.solid(id))
        .collect::<Result<Vec<Solid>, _>>()?;
    Ok([Vec3::X, Vec3::Y, Vec3::Z].map(|d| Length::mm(extent(&solids, d))))
}

/// One result per given bound: size ≤ greatest (`max`) and size ≥ least (`min`), per axis x, y, z.
pub fn structure_envelope(
    extents: [Length; 3],
    min: [Option<Length>; 3],
    max: [Option<Length>; 3],
    rule_set: &str,
) -> Vec<AuditResult> {
    let mut out = Vec::new();
    for (k, axis) in ["x", "y", "z"].iter().enumerate() {
        if let Some(hi) = max[k] {
            out.push(AuditResult::from_margin(
                "structure_envelope_max",
                rule_set,
                "structure",
                extents[k].into(),
                hi.into(),
                (hi - extents[k]).into(),
                format!("overall size along {axis} at most the limit"),
            ));
        }
        if let Some(lo) = min[k] {
            out.push(AuditResult::from_margin(
                "structure_envelope_min",
                rule_set,
                "structure",
                extents[k].into(),
                lo.into(),
                (extents[k] - lo).into(),
                format!("overall size along {axis} at least the limit"),
            ));
        }
    }
    out
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::audit::{AuditStatus, Point3, Roll, Section};
    use crate::units::Angle;

    #[test]
    fn level_square_tube_and_diagonal_round_tube() {
        // Worked by hand: an HSS2x2 from (0,0,0) to (120,0,0) in., roll 0: x 120, y 2, z 2 in.
        // A 2 in. round tube from (0,0,0) to (0,60,80) in. (axis u = (0, 0.6, 0.8)): along y it adds
        // r √(1 − 0.6²) = 0.8 in at each end → y from −0.8 to 60.8; along z r × 0.6 each side →
        // −0.6 to 80.6; along x ±1. Together: x −1 .. 120 = 121; y −1 .. 60.8 = 61.8;
        // z −1 .. 80.6 = 81.6 in.
        let sq = MemberSolid {
            a: Point3::inch(0.0, 0.0, 0.0),
            b: Point3::inch(120.0, 0.0, 0.0),
            section: Section::Rect {
                depth: Length::inch(2.0),
                width: Length::inch(2.0),
            },
            roll: Roll::Angle(Angle::deg(0.0)),
        };
        let rd = MemberSolid {
            a: Point3::inch(0.0, 0.0, 0.0),
            b: Point3::inch(0.0, 60.0, 80.0),
            section: Section::Round {
                diameter: Length::inch(2.0),
            },
            roll: Roll::Angle(Angle::deg(0.0)),
        };
        let e = structure_extents(&[("M1".into(), sq), ("M2".into(), rd)]).unwrap();
        for (got, want) in e.iter().zip([121.0, 61.8, 81.6]) {
            assert!(
                (got.to_in() - want).abs() < 1e-9,
                "{} vs {want}",
                got.to_in()
            );
        }
        let r = structure_envelope(
            e,
            [None; 3],
            [Some(Length::inch(120.0)), None, None],
            "shop",
        );
        assert_eq!(r.len(), 1);
        assert_eq!(r[0].status, AuditStatus::Fail);
        assert!((Length::mm(r[0].margin.si).to_in() + 1.0).abs() < 1e-9);
    }

    #[test]
    fn no_members_is_an_error() {
        assert!(structure_extents(&[]).is_err());
    }
}
