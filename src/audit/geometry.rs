//! Points, directions and the solids a piece is made of: the tube as cut (its section swept along
//! its axis) and shop attachments as oriented boxes. Lengths are carried in mm as plain numbers
//! inside the geometry; the public inputs are typed [`Length`]s.

use super::result::{positive, AuditInputError};
use crate::units::{Angle, Length};
use std::ops::{Add, Mul, Neg, Sub};

/// A point in model space.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Point3 {
    pub x: Length,
    pub y: Length,
    pub z: Length,
}

impl Point3 {
    pub fn new(x: Length, y: Length, z: Length) -> Self {
        Point3 { x, y, z }
    }
    /// A point given in inches.
    pub fn inch(x: f64, y: f64, z: f64) -> Self {
        Point3::new(Length::inch(x), Length::inch(y), Length::inch(z))
    }
    /// A point given in millimetres.
    pub fn mm(x: f64, y: f64, z: f64) -> Self {
        Point3::new(Length::mm(x), Length::mm(y), Length::mm(z))
    }
    pub(crate) fn v(self) -> Vec3 {
        Vec3([self.x.si(), self.y.si(), self.z.si()])
    }
}

/// A direction or a position in mm, as plain numbers.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Vec3(pub [f64; 3]);

impl Vec3 {
    pub const X: Vec3 = Vec3([1.0, 0.0, 0.0]);
    pub const Y: Vec3 = Vec3([0.0, 1.0, 0.0]);
    pub const Z: Vec3 = Vec3([0.0, 0.0, 1.0]);

    pub fn dot(self, o: Vec3) -> f64 {
        self.0[0] * o.0[0] + self.0[1] * o.0[1] + self.0[2] * o.0[2]
    }
    pub fn cross(self, o: Vec3) -> Vec3 {
        let [a, b, c] = self.0;
        let [d, e, f] = o.0;
        Vec3([b * f - c * e, c * d - a * f, a * e - b * d])
    }
    pub fn norm(self) -> f64 {
        self.dot(self).sqrt()
    }
    /// The unit vector, or None for a (near) zero vector.
    pub fn unit(self) -> Option<Vec3> {
        let n = self.norm();
        if n.is_finite() && n > 1e-12 {
            Some(self * (1.0 / n))
        } else {
            None
        }
    }
    pub fn is_finite(self) -> bool {
        self.0.iter().all(|c| c.is_finite())
    }
    /// This vector turned by `angle` about the unit axis `k` (Rodrigues' rotation formula).
    pub fn rotated(self, k: Vec3, angle: f64) -> Vec3 {
        let (s, c) = angle.sin_cos();
        self * c + k.cross(self) * s + k * (k.dot(self) * (1.0 - c))
    }
}

impl Add for Vec3 {
    type Output = Vec3;
    fn add(self, o: Vec3) -> Vec3 {
        Vec3([self.0[0] + o.0[0], self.0[1] + o.0[1], self.0[2] + o.0[2]])
    }
}
impl Sub for Vec3 {
    type Output = Vec3;
    fn sub(self, o: Vec3) -> Vec3 {
        Vec3([self.0[0] - o.0[0], self.0[1] - o.0[1], self.0[2] - o.0[2]])
    }
}
impl Mul<f64> for Vec3 {
    type Output = Vec3;
    fn mul(self, k: f64) -> Vec3 {
        Vec3([self.0[0] * k, self.0[1] * k, self.0[2] * k])
    }
}
impl Neg for Vec3 {
    type Output = Vec3;
    fn neg(self) -> Vec3 {
        self * -1.0
    }
}

/// Three orthonormal directions (a right-handed frame).
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Frame {
    pub axes: [Vec3; 3],
}

impl Frame {
    /// The frame turned as a rigid body by `angle` about its own axis number `k`.
    pub fn rotated_about(self, k: usize, angle: f64) -> Frame {
        let axis = self.axes[k];
        Frame {
            axes: self.axes.map(|a| a.rotated(axis, angle)),
        }
    }
}

/// The cross-section of a tube.
#[derive(Debug, Clone, Copy, PartialEq)]
pub enum Section {
    /// A rectangular or square hollow section: `depth` along the section's "up" direction, `width`
    /// across it. The corner radii are ignored, which can only enlarge the outline (conservative).
    Rect { depth: Length, width: Length },
    /// A round hollow section (pipe or round HSS) of outside diameter `diameter`.
    Round { diameter: Length },
}

impl Section {
    fn validate(&self, subject: &str) -> Result<(), AuditInputError> {
        match *self {
            Section::Rect { depth, width } => {
                positive(subject, "section.depth", depth)?;
                positive(subject, "section.width", width)
            }
            Section::Round { diameter } => positive(subject, "section.diameter", diameter),
        }
    }
}

/// How the section is turned about the member axis.
///
/// The reference "up" is global +z projected on the plane square to the axis; for a vertical
/// member (axis along z) it is global +x. `Angle` turns the section's depth direction from that
/// reference, right-handed about the axis from end A to end B. `Up` names the depth direction
/// directly (it is projected on the plane square to the axis and must not lie along the axis).
#[derive(Debug, Clone, Copy, PartialEq)]
pub enum Roll {
    Angle(Angle),
    Up(Vec3),
}

/// A member as cut: its axis from end A to end B, its section and the section's roll. The ends are
/// cut square to the axis.
#[derive(Debug, Clone, PartialEq)]
pub struct MemberSolid {
    pub a: Point3,
    pub b: Point3,
    pub section: Section,
    pub roll: Roll,
}

impl MemberSolid {
    /// The cut length |AB|.
    pub fn length(&self) -> Length {
        Length::mm((self.b.v() - self.a.v()).norm())
    }

    /// The member's own frame: x along the axis from A to B, y the section's depth ("up")
    /// direction, z = x × y (across the width).
    pub fn frame(&self, subject: &str) -> Result<Frame, AuditInputError> {
        let (a, b) = (self.a.v(), self.b.v());
        if !a.is_finite() || !b.is_finite() {
            return Err(AuditInputError::new(
                subject,
                "ends",
                "an end point is not finite",
            ));
        }
        let ex = (b - a).unit().ok_or_else(|| {
            AuditInputError::new(subject, "ends", "end A and end B are the same point")
        })?;
        let project = |v: Vec3| (v - ex * v.dot(ex)).unit();
        let ey = match self.roll {
            Roll::Angle(angle) => {
                if !angle.is_finite() {
                    return Err(AuditInputError::new(
                        subject,
                        "roll",
                        "the roll angle is not finite",
                    ));
                }
                let reference = match project(Vec3::Z) {
                    Some(r) if ex.cross(Vec3::Z).norm() > 1e-9 => r,
                    _ => project(Vec3::X).expect("x is square to a vertical axis"),
                };
                reference.rotated(ex, angle.to_rad())
            }
            Roll::Up(up) => {
                let along_axis = up
                    .unit()
                    .map(|w| w.cross(ex).norm() <= 1e-6)
                    .unwrap_or(true);
                match project(up) {
                    Some(u) if !along_axis => u,
                    _ => {
                        return Err(AuditInputError::new(
                            subject,
                            "roll.up",
                            "the up vector is zero or lies along the member axis",
                        ))
                    }
                }
            }
        };
        Ok(Frame {
            axes: [ex, ey, ex.cross(ey)],
        })
    }

    /// Check the section and ends, and return the member's frame.
    pub(crate) fn validate(&self, subject: &str) -> Result<Frame, AuditInputError> {
        self.section.validate(subject)?;
        self.frame(subject)
    }

    /// The member's solid: an oriented box for a rectangular section, a flat-ended cylinder for a
    /// round one.
    pub fn solid(&self, subject: &str) -> Result<Solid, AuditInputError> {
        let frame = self.validate(subject)?;
        let (a, b) = (self.a.v(), self.b.v());
        Ok(match self.section {
            Section::Rect { depth, width } => Solid::Block(OrientedBox {
                center: (a + b) * 0.5,
                frame,
                half: [(b - a).norm() / 2.0, depth.si() / 2.0, width.si() / 2.0],
            }),
            Section::Round { diameter } => Solid::Cylinder {
                a,
                b,
                radius: diameter.si() / 2.0,
            },
        })
    }
}

/// A box of half-sizes `half` along the axes of `frame`, centred on `center` (all in mm).
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct OrientedBox {
    pub center: Vec3,
    pub frame: Frame,
    pub half: [f64; 3],
}

impl OrientedBox {
    /// The eight corners.
    pub fn corners(&self) -> Vec<Vec3> {
        let mut out = Vec::with_capacity(8);
        for sx in [-1.0, 1.0] {
            for sy in [-1.0, 1.0] {
                for sz in [-1.0, 1.0] {
                    let s = [sx, sy, sz];
                    let mut p = self.center;
                    for (k, sk) in s.iter().enumerate() {
                        p = p + self.frame.axes[k] * (sk * self.half[k]);
                    }
                    out.push(p);
                }
            }
        }
        out
    }
}

/// A convex solid of a piece or a member.
#[derive(Debug, Clone, Copy, PartialEq)]
pub enum Solid {
    Block(OrientedBox),
    /// A cylinder with flat ends square to its axis from `a` to `b`.
    Cylinder {
        a: Vec3,
        b: Vec3,
        radius: f64,
    },
}

impl Solid {
    /// The support function h(d) = max over the solid of p·d, exact for both kinds: for a box
    /// c·d + Σ hᵢ |aᵢ·d|; for a cylinder max(a·d, b·d) + r √(1 − (u·d)²) with u the unit axis
    /// (the end circle's extent along d), d a unit direction.
    pub fn support(&self, d: Vec3) -> f64 {
        match *self {
            Solid::Block(bx) => {
                bx.center.dot(d)
                    + (0..3)
                        .map(|k| bx.half[k] * bx.frame.axes[k].dot(d).abs())
                        .sum::<f64>()
            }
            Solid::Cylinder { a, b, radius } => {
                let u = (b - a).unit().unwrap_or(Vec3::X);
                let c = u.dot(d);
                a.dot(d).max(b.dot(d)) + radius * (1.0 - c * c).max(0.0).sqrt()
            }
        }
    }
}

/// The extent (max − min) of a set of solids along a unit direction.
pub fn extent(solids: &[Solid], d: Vec3) -> f64 {
    let hi = solids.iter().map(|s| s.support(d)).fold(f64::MIN, f64::max);
    let lo = solids
        .iter()
        .map(|s| s.support(-d))
        .fold(f64::MIN, f64::max);
    hi + lo
}

#[cfg(test)]
mod tests {
    use super::*;

    fn rect_member(a: Point3, b: Point3, roll: Roll) -> MemberSolid {
        MemberSolid {
            a,
            b,
            section: Section::Rect {
                depth: Length::inch(4.0),
                width: Length::inch(2.0),
            },
            roll,
        }
    }

    #[test]
    fn roll_zero_puts_depth_up_for_a_level_member() {
        let m = rect_member(
            Point3::inch(0.0, 0.0, 0.0),
            Point3::inch(10.0, 0.0, 0.0),
            Roll::Angle(Angle::deg(0.0)),
        );
        let f = m.frame("M1").unwrap();
        assert!((f.axes[1].dot(Vec3::Z) - 1.0).abs() < 1e-12);
        // Turned 90° right-handed about +x, +z goes to −y.
        let m = rect_member(m.a, m.b, Roll::Angle(Angle::deg(90.0)));
        let f = m.frame("M1").unwrap();
        assert!((f.axes[1].dot(Vec3::Y) + 1.0).abs() < 1e-12);
    }

    #[test]
    fn vertical_member_uses_x_as_reference() {
        let m = rect_member(
            Point3::inch(0.0, 0.0, 0.0),
            Point3::inch(0.0, 0.0, 10.0),
            Roll::Angle(Angle::deg(0.0)),
        );
        let f = m.frame("C1").unwrap();
        assert!((f.axes[1].dot(Vec3::X) - 1.0).abs() < 1e-12);
    }

    #[test]
    fn bad_member_input_is_rejected_with_its_field() {
        let same = rect_member(
            Point3::inch(1.0, 1.0, 1.0),
            Point3::inch(1.0, 1.0, 1.0),
            Roll::Angle(Angle::deg(0.0)),
        );
        assert_eq!(same.frame("M1").unwrap_err().field, "ends");
        let along = rect_member(
            Point3::inch(0.0, 0.0, 0.0),
            Point3::inch(5.0, 0.0, 0.0),
            Roll::Up(Vec3::X),
        );
        assert_eq!(along.frame("M1").unwrap_err().field, "roll.up");
        let zero = rect_member(along.a, along.b, Roll::Up(Vec3([0.0; 3])));
        assert_eq!(zero.frame("M1").unwrap_err().field, "roll.up");
        let mut thin = rect_member(along.a, along.b, Roll::Angle(Angle::deg(0.0)));
        thin.section = Section::Round {
            diameter: Length::mm(0.0),
        };
        assert_eq!(thin.validate("M1").unwrap_err().field, "section.diameter");
    }

    #[test]
    fn support_of_a_cylinder_is_exact() {
        // Worked by hand: a 2 in. diameter cylinder along x from 0 to 10 in.; along d = z its
        // support is r = 1 in; along d = (1, 0, 1)/√2 it is 10/√2 + 1 × √(1 − 1/2) = 7.7782 in.
        let s = Solid::Cylinder {
            a: Vec3([0.0; 3]),
            b: Vec3([254.0, 0.0, 0.0]),
            radius: 25.4,
        };
        assert!((s.support(Vec3::Z) - 25.4).abs() < 1e-9);
        let d = Vec3([1.0, 0.0, 1.0]).unit().unwrap();
        assert!((s.support(d) / 25.4 - 7.778_174_6).abs() < 1e-6);
    }
}
