//! AISC 360 Chapter E — flexural buckling of members without slender elements (E3), used by J4.4
//! for connecting elements with Lc/r above 25.

use super::input::{require_positive, InputError};
use super::Edition;
use crate::standards::{Input, Strength};
use crate::units::{Area, Length, Stress};

/// Radius of gyration of a solid rectangular plate about its weak axis, r = t / √12 (section
/// property of a rectangle).
pub fn plate_radius_of_gyration(t: Length) -> Length {
    t / 12f64.sqrt()
}

/// AISC 360 E3 Eq. E3-4 — elastic buckling stress, Fe = π² E / (Lc / r)².
pub fn elastic_buckling_stress(e: Stress, slenderness: f64) -> Stress {
    std::f64::consts::PI.powi(2) * e / (slenderness * slenderness)
}

/// AISC 360 E3 Eq. E3-1 with E3-2 / E3-3 — flexural buckling, Pn = Fcr Ag, Fcr = 0.658^(Fy/Fe) Fy
/// when Lc/r ≤ 4.71 √(E/Fy), else 0.877 Fe; φ 0.90, Ω 1.67.
///
/// Members with slender elements (E7) are outside this function: the caller checks width-to-
/// thickness ratios (Table B4.1a) first.
pub fn flexural_buckling(
    edition: Edition,
    fy: Stress,
    e: Stress,
    ag: Area,
    lc: Length,
    r: Length,
) -> Result<Strength, InputError> {
    require_positive("Fy", fy.si())?;
    require_positive("E", e.si())?;
    require_positive("Ag", ag.si())?;
    require_positive("Lc", lc.si())?;
    require_positive("r", r.si())?;
    let slenderness = lc / r;
    let fe = elastic_buckling_stress(e, slenderness);
    let limit = 4.71 * (e / fy).sqrt();
    let (fcr, equation, formula) = if slenderness <= limit {
        (
            0.658f64.powf(fy / fe) * fy,
            "E3-2",
            "Pn = Fcr Ag, Fcr = 0.658^(Fy/Fe) Fy, Fe = π² E / (Lc/r)²",
        )
    } else {
        (
            0.877 * fe,
            "E3-3",
            "Pn = Fcr Ag, Fcr = 0.877 Fe, Fe = π² E / (Lc/r)²",
        )
    };
    let mut notes = Vec::new();
    if slenderness > 200.0 {
        notes.push("Lc/r exceeds 200, the limit the E2 user note recommends".to_string());
    }
    Ok(Strength {
        citation: edition.cite("E3", equation),
        formula,
        inputs: vec![
            Input::new("Fy", fy, "specified minimum yield stress"),
            Input::new("E", e, "modulus of elasticity"),
            Input::new("Ag", ag, "gross area"),
            Input::new("Lc", lc, "effective length K L"),
            Input::new("r", r, "radius of gyration about the buckling axis"),
            Input::new("Lc/r", slenderness, "slenderness"),
            Input::new("Fe", fe, "elastic buckling stress, Eq. E3-4"),
            Input::new("Fcr", fcr, "critical stress"),
        ],
        nominal: (fcr * ag).into(),
        phi: 0.90,
        omega: 1.67,
        notes,
        out_of_scope: Vec::new(),
    })
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn inelastic_and_elastic_branches() {
        let (fy, e, ag) = (Stress::ksi(50.0), Stress::ksi(29000.0), Area::in2(1.0));
        let r = Length::inch(1.0);
        let short =
            flexural_buckling(Edition::Aisc360_22, fy, e, ag, Length::inch(50.0), r).unwrap();
        assert_eq!(short.citation.equation, "E3-2");
        let long =
            flexural_buckling(Edition::Aisc360_22, fy, e, ag, Length::inch(150.0), r).unwrap();
        assert_eq!(long.citation.equation, "E3-3");
        let very =
            flexural_buckling(Edition::Aisc360_22, fy, e, ag, Length::inch(250.0), r).unwrap();
        assert!(very.notes[0].contains("200"));
    }

    #[test]
    fn rejections() {
        let (fy, e, ag, l, r) = (
            Stress::ksi(50.0),
            Stress::ksi(29000.0),
            Area::in2(1.0),
            Length::inch(10.0),
            Length::inch(1.0),
        );
        let ed = Edition::Aisc360_22;
        assert_eq!(
            flexural_buckling(ed, fy, e, ag, l, Length::inch(0.0))
                .unwrap_err()
                .symbol,
            "r"
        );
        assert_eq!(
            flexural_buckling(ed, fy, e, ag, Length::inch(0.0), r)
                .unwrap_err()
                .symbol,
            "Lc"
        );
        assert_eq!(
            flexural_buckling(ed, fy, Stress::ksi(0.0), ag, l, r)
                .unwrap_err()
                .symbol,
            "E"
        );
    }

    #[test]
    fn plate_radius() {
        assert!((plate_radius_of_gyration(Length::inch(0.5)).to_in() - 0.144_337_567).abs() < 1e-8);
    }
}
