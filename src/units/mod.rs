//! Quantities with units.
//!
//! One internal system: millimetre, newton, megapascal (N/mm²), kilogram, radian. Every value read
//! from a model or catalogue is parsed once, at the edge, by [`parse`]; every value shown to a person
//! is formatted by [`format`] in the unit system the user chose. Distinct types for length, area,
//! force and stress keep a force from being reported as a stress.

pub mod format;
pub mod parse;
mod types;

pub use format::{fraction_inch, UnitSystem};
pub use parse::{
    parse_angle, parse_area, parse_force, parse_length, parse_length_or_gauge, parse_mass,
    parse_mass_per_length, parse_stress, LengthOrGauge, UnitError,
};
pub use types::*;

/// Exact conversion factors (NIST SP 811, Appendix B; the inch and pound are exact by definition).
pub mod factor {
    /// millimetres per inch (exact, 1959 international yard and pound agreement).
    pub const MM_PER_IN: f64 = 25.4;
    /// millimetres per foot.
    pub const MM_PER_FT: f64 = 304.8;
    /// kilograms per avoirdupois pound (exact).
    pub const KG_PER_LB: f64 = 0.453_592_37;
    /// standard gravity, m/s² (exact, CGPM 1901).
    pub const G_N: f64 = 9.806_65;
    /// newtons per pound-force = 0.45359237 kg × 9.80665 m/s² (exact product).
    pub const N_PER_LBF: f64 = KG_PER_LB * G_N;
    /// newtons per kip (1000 lbf).
    pub const N_PER_KIP: f64 = 1000.0 * N_PER_LBF;
    /// megapascals per psi = N/lbf ÷ (mm/in)².
    pub const MPA_PER_PSI: f64 = N_PER_LBF / (MM_PER_IN * MM_PER_IN);
    /// megapascals per ksi.
    pub const MPA_PER_KSI: f64 = 1000.0 * MPA_PER_PSI;
    /// (kg/m) per (lb/ft).
    pub const KGM_PER_LBFT: f64 = KG_PER_LB / 0.3048;
}
