//! Clear zones: axis-aligned boxes no member may enter, and each member's signed clearance to
//! them (positive = clear by that much, negative = penetration depth).
//!
//! Rectangular members are oriented boxes (section swept along the axis, ends square): the
//! clearance is exact. The separating axis test over the 15 axes of two boxes (3 + 3 face normals,
//! 9 edge cross products) decides whether they meet; when they meet, the least overlap over those
//! axes is the exact penetration depth (the Minkowski difference of two boxes has its face normals
//! among them); when apart, the distance is the least of vertex-to-box distances both ways and the
//! 144 edge-to-edge distances, which is exact for convex polyhedra.
//!
//! Round members: conservative. The cylinder lies inside each square prism of side d circumscribing
//! it, turned 0°, 22.5°, 45° and 67.5° about its axis; the signed clearance of each prism is at most
//! the cylinder's, so the greatest of the four is still an under-estimate (never an over-estimate).

use super::geometry::{Frame, MemberSolid, OrientedBox, Point3, Section, Solid, Vec3};
use super::result::{AuditInputError, AuditResult};
use crate::units::Length;

/// A zone kept clear, between two opposite corners, sides along the global axes.
#[derive(Debug, Clone, PartialEq)]
pub struct ClearZone {
    pub name: String,
    pub min: Point3,
    pub max: Point3,
}

/// A member's clearance to a zone, and whether it is exact.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Clearance {
    pub signed: Length,
    pub exact: bool,
}

fn zone_box(zone: &ClearZone) -> Result<OrientedBox, AuditInputError> {
    let (lo, hi) = (zone.min.v(), zone.max.v());
    if !lo.is_finite() || !hi.is_finite() || (0..3).any(|k| hi.0[k] <= lo.0[k]) {
        return Err(AuditInputError::new(
            &zone.name,
            "min/max",
            "each max must exceed its min",
        ));
    }
    Ok(OrientedBox {
        center: (lo + hi) * 0.5,
        frame: Frame {
            axes: [Vec3::X, Vec3::Y, Vec3::Z],
        },
        half: [0, 1, 2].map(|k| (hi.0[k] - lo.0[k]) / 2.0),
    })
}

/// Distance from a point to a box (0 inside).
fn point_box_distance(p: Vec3, b: &OrientedBox) -> f64 {
    let d = p - b.center;
    (0..3)
        .map(|k| (d.dot(b.frame.axes[k]).abs() - b.half[k]).max(0.0).powi(2))
        .sum::<f64>()
        .sqrt()
}

/// The 12 edges of a box as corner index pairs (corners ordered as [`OrientedBox::corners`]).
const EDGES: [(usize, usize); 12] = [
    (0, 1),
    (2, 3),
    (4, 5),
    (6, 7),
    (0, 2),
    (1, 3),
    (4, 6),
    (5, 7),
    (0, 4),
    (1, 5),
    (2, 6),
    (3, 7),
];

/// Least distance between segments p1–q1 and p2–q2 (closest points of two segments, clamped).
fn segment_distance(p1: Vec3, q1: Vec3, p2: Vec3, q2: Vec3) -> f64 {
    let (d1, d2, r) = (q1 - p1, q2 - p2, p1 - p2);
    let (a, e, f) = (d1.dot(d1), d2.dot(d2), d2.dot(r));
    let (c, b) = (d1.dot(r), d1.dot(d2));
    let denom = a * e - b * b;
    let mut s = if denom > 1e-12 * a * e {
        ((b * f - c * e) / denom).clamp(0.0, 1.0)
    } else {
        0.0
    };
    let mut t = (b * s + f) / e;
    if t < 0.0 {
        t = 0.0;
        s = (-c / a).clamp(0.0, 1.0);
    } else if t > 1.0 {
        t = 1.0;
        s = ((b - c) / a).clamp(0.0, 1.0);
    }
    ((p1 + d1 * s) - (p2 + d2 * t)).norm()
}

/// Signed distance between two boxes, exact (see the module doc).
pub fn box_box_signed_distance(a: &OrientedBox, b: &OrientedBox) -> f64 {
    let mut axes: Vec<Vec3> = a.frame.axes.to_vec();
    axes.extend(b.frame.axes);
    for i in 0..3 {
        for j in 0..3 {
            if let Some(n) = a.frame.axes[i].cross(b.frame.axes[j]).unit() {
                axes.push(n);
            }
        }
    }
    let radius = |bx: &OrientedBox, n: Vec3| {
        (0..3)
            .map(|k| bx.half[k] * bx.frame.axes[k].dot(n).abs())
            .sum::<f64>()
    };
    let mut least_overlap = f64::MAX;
    let mut apart = false;
    for n in axes {
        let gap = (b.center - a.center).dot(n).abs() - radius(a, n) - radius(b, n);
        if gap > 0.0 {
            apart = true;
            break;
        }
        least_overlap = least_overlap.min(-gap);
    }
    if !apart {
        return -least_overlap;
    }
    let (ca, cb) = (a.corners(), b.corners());
    let mut d = f64::MAX;
    for p in &ca {
        d = d.min(point_box_distance(*p, b));
    }
    for p in &cb {
        d = d.min(point_box_distance(*p, a));
    }
    for (i, j) in EDGES {
        for (k, l) in EDGES {
            d = d.min(segment_distance(ca[i], ca[j], cb[k], cb[l]));
        }
    }
    d
}

/// A member's signed clearance to a zone: exact for a rectangular section, an under-estimate for a
/// round one (module doc).
pub fn member_clearance(
    id: &str,
    member: &MemberSolid,
    zone: &ClearZone,
) -> Result<Clearance, AuditInputError> {
    let z = zone_box(zone)?;
    match member.solid(id)? {
        Solid::Block(bx) => Ok(Clearance {
            signed: Length::mm(box_box_signed_distance(&bx, &z)),
            exact: true,
        }),
        Solid::Cylinder { a, b, radius } => {
            let frame = member.frame(id)?;
            let best = [0.0_f64, 22.5, 45.0, 67.5]
                .iter()
                .map(|deg| {
                    let prism = OrientedBox {
                        center: (a + b) * 0.5,
                        frame: frame.rotated_about(0, deg.to_radians()),
                        half: [(b - a).norm() / 2.0, radius, radius],
                    };
                    box_box_signed_distance(&prism, &z)
                })
                .fold(f64::MIN, f64::max);
            Ok(Clearance {
                signed: Length::mm(best),
                exact: false,
            })
        }
    }
}

/// The clear-zone rule: the member's clearance at least `least` (0 = may touch).
pub fn clear_zone_rule(
    id: &str,
    member: &MemberSolid,
    zone: &ClearZone,
    least: Length,
    rule_set: &str,
) -> Result<AuditResult, AuditInputError> {
    let c = member_clearance(id, member, zone)?;
    let how = match member.section {
        Section::Rect { .. } => "exact",
        Section::Round { .. } => "under-estimated (round section bounded by square prisms)",
    };
    Ok(AuditResult::from_margin(
        "clear_zone",
        rule_set,
        id,
        c.signed.into(),
        least.into(),
        (c.signed - least).into(),
        format!("clearance to zone '{}' ({how})", zone.name),
    ))
}
