//! Typed quantities. Values are stored in mm, N, MPa, kg, rad.

use super::factor::*;
use serde::Serialize;
use std::ops::{Add, Div, Mul, Neg, Sub};

macro_rules! quantity {
    ($(#[$doc:meta])* $name:ident, $dim:ident) => {
        $(#[$doc])*
        #[derive(Debug, Clone, Copy, PartialEq, PartialOrd, Default)]
        pub struct $name(f64);

        impl $name {
            /// The value in the internal unit of this kind (see the module doc).
            pub const fn si(self) -> f64 {
                self.0
            }
            /// A value given in the internal unit of this kind.
            pub const fn from_si(v: f64) -> Self {
                Self(v)
            }
            /// The larger of two values.
            pub fn max(self, other: Self) -> Self {
                if other.0 > self.0 { other } else { self }
            }
            /// The smaller of two values.
            pub fn min(self, other: Self) -> Self {
                if other.0 < self.0 { other } else { self }
            }
            /// The absolute value.
            pub fn abs(self) -> Self {
                Self(self.0.abs())
            }
            /// Whether the value is finite.
            pub fn is_finite(self) -> bool {
                self.0.is_finite()
            }
        }
        impl Add for $name {
            type Output = Self;
            fn add(self, o: Self) -> Self {
                Self(self.0 + o.0)
            }
        }
        impl Sub for $name {
            type Output = Self;
            fn sub(self, o: Self) -> Self {
                Self(self.0 - o.0)
            }
        }
        impl Neg for $name {
            type Output = Self;
            fn neg(self) -> Self {
                Self(-self.0)
            }
        }
        impl Mul<f64> for $name {
            type Output = Self;
            fn mul(self, k: f64) -> Self {
                Self(self.0 * k)
            }
        }
        impl Mul<$name> for f64 {
            type Output = $name;
            fn mul(self, q: $name) -> $name {
                $name(self * q.0)
            }
        }
        impl Div<f64> for $name {
            type Output = Self;
            fn div(self, k: f64) -> Self {
                Self(self.0 / k)
            }
        }
        impl Div for $name {
            type Output = f64;
            fn div(self, o: Self) -> f64 {
                self.0 / o.0
            }
        }
        impl std::iter::Sum for $name {
            fn sum<I: Iterator<Item = Self>>(iter: I) -> Self {
                Self(iter.map(|q| q.0).sum())
            }
        }
        impl From<$name> for Quantity {
            fn from(q: $name) -> Quantity {
                Quantity { dim: Dim::$dim, si: q.0 }
            }
        }
    };
}

quantity!(/// A length, stored in millimetres.
    Length, Length);
quantity!(/// An area, stored in mm².
    Area, Area);
quantity!(/// A second moment of area, stored in mm⁴.
    Inertia, Inertia);
quantity!(/// A section modulus or first moment, stored in mm³.
    Volume, Volume);
quantity!(/// A force, stored in newtons.
    Force, Force);
quantity!(/// A stress, stored in MPa (N/mm²).
    Stress, Stress);
quantity!(/// A force per unit length (a weld's strength per inch, say), stored in N/mm.
    ForcePerLength, ForcePerLength);
quantity!(/// A mass, stored in kilograms. Weights in lb are masses in pounds.
    Mass, Mass);
quantity!(/// A mass per unit length, stored in kg/m.
    MassPerLength, MassPerLength);
quantity!(/// A density, stored in kg/m³.
    Density, Density);
quantity!(/// An angle, stored in radians.
    Angle, Angle);

impl Length {
    pub fn mm(v: f64) -> Self {
        Self(v)
    }
    pub fn m(v: f64) -> Self {
        Self(v * 1000.0)
    }
    pub fn inch(v: f64) -> Self {
        Self(v * MM_PER_IN)
    }
    pub fn ft(v: f64) -> Self {
        Self(v * MM_PER_FT)
    }
    pub fn to_mm(self) -> f64 {
        self.0
    }
    pub fn to_in(self) -> f64 {
        self.0 / MM_PER_IN
    }
    pub fn to_m(self) -> f64 {
        self.0 / 1000.0
    }
}
impl Area {
    pub fn mm2(v: f64) -> Self {
        Self(v)
    }
    pub fn in2(v: f64) -> Self {
        Self(v * MM_PER_IN * MM_PER_IN)
    }
    pub fn to_mm2(self) -> f64 {
        self.0
    }
    pub fn to_in2(self) -> f64 {
        self.0 / (MM_PER_IN * MM_PER_IN)
    }
    /// Square root of an area: a length.
    pub fn sqrt(self) -> Length {
        Length(self.0.sqrt())
    }
}
impl Inertia {
    pub fn mm4(v: f64) -> Self {
        Self(v)
    }
    pub fn in4(v: f64) -> Self {
        Self(v * MM_PER_IN.powi(4))
    }
    pub fn to_mm4(self) -> f64 {
        self.0
    }
    pub fn to_in4(self) -> f64 {
        self.0 / MM_PER_IN.powi(4)
    }
}
impl Volume {
    pub fn mm3(v: f64) -> Self {
        Self(v)
    }
    pub fn in3(v: f64) -> Self {
        Self(v * MM_PER_IN.powi(3))
    }
    pub fn to_mm3(self) -> f64 {
        self.0
    }
    pub fn to_in3(self) -> f64 {
        self.0 / MM_PER_IN.powi(3)
    }
}
impl Force {
    pub fn n(v: f64) -> Self {
        Self(v)
    }
    pub fn kn(v: f64) -> Self {
        Self(v * 1000.0)
    }
    pub fn lbf(v: f64) -> Self {
        Self(v * N_PER_LBF)
    }
    pub fn kip(v: f64) -> Self {
        Self(v * N_PER_KIP)
    }
    pub fn to_n(self) -> f64 {
        self.0
    }
    pub fn to_kn(self) -> f64 {
        self.0 / 1000.0
    }
    pub fn to_kip(self) -> f64 {
        self.0 / N_PER_KIP
    }
    pub fn to_lbf(self) -> f64 {
        self.0 / N_PER_LBF
    }
}
impl Stress {
    pub fn mpa(v: f64) -> Self {
        Self(v)
    }
    pub fn ksi(v: f64) -> Self {
        Self(v * MPA_PER_KSI)
    }
    pub fn psi(v: f64) -> Self {
        Self(v * MPA_PER_PSI)
    }
    pub fn to_mpa(self) -> f64 {
        self.0
    }
    pub fn to_ksi(self) -> f64 {
        self.0 / MPA_PER_KSI
    }
}
impl ForcePerLength {
    pub fn n_per_mm(v: f64) -> Self {
        Self(v)
    }
    pub fn kip_per_in(v: f64) -> Self {
        Self(v * N_PER_KIP / MM_PER_IN)
    }
    pub fn to_kip_per_in(self) -> f64 {
        self.0 * MM_PER_IN / N_PER_KIP
    }
    pub fn to_n_per_mm(self) -> f64 {
        self.0
    }
}
impl Mass {
    pub fn kg(v: f64) -> Self {
        Self(v)
    }
    pub fn lb(v: f64) -> Self {
        Self(v * KG_PER_LB)
    }
    pub fn to_kg(self) -> f64 {
        self.0
    }
    pub fn to_lb(self) -> f64 {
        self.0 / KG_PER_LB
    }
}
impl MassPerLength {
    pub fn kg_per_m(v: f64) -> Self {
        Self(v)
    }
    pub fn lb_per_ft(v: f64) -> Self {
        Self(v * KGM_PER_LBFT)
    }
    pub fn to_kg_per_m(self) -> f64 {
        self.0
    }
    pub fn to_lb_per_ft(self) -> f64 {
        self.0 / KGM_PER_LBFT
    }
}
impl Density {
    pub fn kg_per_m3(v: f64) -> Self {
        Self(v)
    }
    pub fn to_kg_per_m3(self) -> f64 {
        self.0
    }
}
impl Angle {
    pub fn deg(v: f64) -> Self {
        Self(v.to_radians())
    }
    pub fn rad(v: f64) -> Self {
        Self(v)
    }
    pub fn to_deg(self) -> f64 {
        self.0.to_degrees()
    }
    pub fn to_rad(self) -> f64 {
        self.0
    }
}

impl Mul for Length {
    type Output = Area;
    fn mul(self, o: Length) -> Area {
        Area(self.0 * o.0)
    }
}
impl Mul<Length> for Area {
    type Output = Volume;
    fn mul(self, o: Length) -> Volume {
        Volume(self.0 * o.0)
    }
}
impl Mul<Area> for Area {
    type Output = Inertia;
    fn mul(self, o: Area) -> Inertia {
        Inertia(self.0 * o.0)
    }
}
impl Div<Length> for Area {
    type Output = Length;
    fn div(self, o: Length) -> Length {
        Length(self.0 / o.0)
    }
}
impl Mul<Area> for Stress {
    type Output = Force;
    fn mul(self, a: Area) -> Force {
        Force(self.0 * a.0)
    }
}
impl Mul<Stress> for Area {
    type Output = Force;
    fn mul(self, s: Stress) -> Force {
        Force(self.0 * s.0)
    }
}
impl Div<Area> for Force {
    type Output = Stress;
    fn div(self, a: Area) -> Stress {
        Stress(self.0 / a.0)
    }
}
impl Div<Stress> for Force {
    type Output = Area;
    fn div(self, s: Stress) -> Area {
        Area(self.0 / s.0)
    }
}
impl Div<Length> for Force {
    type Output = ForcePerLength;
    fn div(self, l: Length) -> ForcePerLength {
        ForcePerLength(self.0 / l.0)
    }
}
impl Mul<Length> for ForcePerLength {
    type Output = Force;
    fn mul(self, l: Length) -> Force {
        Force(self.0 * l.0)
    }
}
impl Mul<Length> for Stress {
    type Output = ForcePerLength;
    fn mul(self, l: Length) -> ForcePerLength {
        ForcePerLength(self.0 * l.0)
    }
}
impl Mul<Length> for MassPerLength {
    type Output = Mass;
    /// kg/m × mm → kg.
    fn mul(self, l: Length) -> Mass {
        Mass(self.0 * l.0 / 1000.0)
    }
}
impl Mul<Volume> for Density {
    type Output = Mass;
    /// kg/m³ × mm³ → kg.
    fn mul(self, v: Volume) -> Mass {
        Mass(self.0 * v.0 * 1e-9)
    }
}
impl Mul<Area> for Density {
    type Output = MassPerLength;
    /// kg/m³ × mm² → kg/m.
    fn mul(self, a: Area) -> MassPerLength {
        MassPerLength(self.0 * a.0 * 1e-6)
    }
}

/// What kind of quantity a reported value is; decides its unit on output.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize)]
#[serde(rename_all = "snake_case")]
pub enum Dim {
    Length,
    Area,
    Inertia,
    Volume,
    Force,
    Stress,
    ForcePerLength,
    Mass,
    MassPerLength,
    Density,
    Angle,
    /// A pure number (a ratio, a factor, a count of threads).
    Number,
}

/// A value of any kind, tagged with its kind: what check records carry and reports print.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Quantity {
    pub dim: Dim,
    /// The value in the internal unit of its kind (mm, mm², mm⁴, mm³, N, MPa, N/mm, kg, kg/m,
    /// kg/m³, rad, or the bare number).
    pub si: f64,
}

impl Quantity {
    /// A pure number.
    pub fn number(v: f64) -> Self {
        Quantity {
            dim: Dim::Number,
            si: v,
        }
    }
}

impl From<f64> for Quantity {
    fn from(v: f64) -> Self {
        Quantity::number(v)
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn exact_factors() {
        // NIST SP 811 (2008), Appendix B.8: 1 lbf = 4.448 222 N, 1 psi = 6.894 757 kPa.
        assert!((N_PER_LBF - 4.448_221_615_260_5).abs() < 1e-12);
        assert!((MPA_PER_PSI * 1000.0 - 6.894_757).abs() < 1e-6);
        // 1 lb/ft = 1.488 164 kg/m (NIST SP 811, Appendix B.8).
        assert!((KGM_PER_LBFT - 1.488_164).abs() < 1e-6);
    }

    #[test]
    fn products_keep_their_kind() {
        let f: Force = Stress::ksi(54.0) * Area::in2(0.442);
        assert!((f.to_kip() - 23.868).abs() < 1e-9);
        let a: Area = Length::inch(2.0) * Length::inch(0.5);
        assert!((a.to_in2() - 1.0).abs() < 1e-12);
        let s: Stress = Force::kip(10.0) / Area::in2(2.0);
        assert!((s.to_ksi() - 5.0).abs() < 1e-12);
        let m: Mass = MassPerLength::lb_per_ft(3.05) * Length::ft(10.0);
        assert!((m.to_lb() - 30.5).abs() < 1e-9);
    }
}
