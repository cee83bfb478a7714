//! AISC 360 J7 — bearing strength, and its use for bolts that pass through an unstiffened HSS or
//! box member (360-22 J3.11, 360-16 J3.10, which send that case here).

use super::input::{require_positive, InputError};
use super::j3_bolts::J3Clause;
use super::Edition;
use crate::standards::{Input, Strength};
use crate::units::{Area, Length, Stress};

/// AISC 360 J7(a) Eq. J7-1 — bearing on a projected area, Rn = 1.8 Fy Apb; φ 0.75, Ω 2.00.
pub fn bearing_on_projected_area(
    edition: Edition,
    fy: Stress,
    apb: Area,
) -> Result<Strength, InputError> {
    require_positive("Fy", fy.si())?;
    require_positive("Apb", apb.si())?;
    Ok(Strength {
        citation: edition.cite("J7", "J7-1"),
        formula: "Rn = 1.8 Fy Apb",
        inputs: vec![
            Input::new("Fy", fy, "specified minimum yield stress"),
            Input::new("Apb", apb, "projected area in bearing"),
        ],
        nominal: (1.8 * (fy * apb)).into(),
        phi: 0.75,
        omega: 2.00,
        notes: Vec::new(),
        out_of_scope: Vec::new(),
    })
}

/// AISC 360 J7 Eq. J7-1 for one wall of an unstiffened HSS or box that a bolt passes through,
/// Rn = 1.8 Fy Apb with Apb = d t; φ 0.75, Ω 2.00 (sent here by 360-22 J3.11, 360-16 J3.10).
pub fn hss_through_bolt_bearing(
    edition: Edition,
    fy: Stress,
    d: Length,
    t_wall: Length,
) -> Result<Strength, InputError> {
    require_positive("d", d.si())?;
    require_positive("t", t_wall.si())?;
    let apb = d * t_wall;
    let mut s = bearing_on_projected_area(edition, fy, apb)?;
    s.formula = "Rn = 1.8 Fy Apb, Apb = d t";
    s.inputs
        .insert(0, Input::new("d", d, "nominal bolt diameter"));
    s.inputs.insert(
        1,
        Input::new("t", t_wall, "design wall thickness of the HSS"),
    );
    s.notes.push(format!(
        "bolt through an unstiffened HSS or box: bearing per J7 as {} directs; strength of one wall",
        J3Clause::BearingAndTearout.number(edition)
    ));
    Ok(s)
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn projected_area_bearing() {
        let s = bearing_on_projected_area(Edition::Aisc360_22, Stress::ksi(50.0), Area::in2(1.0))
            .unwrap();
        assert!((s.nominal.si - crate::units::Force::kip(90.0).si()).abs() < 1e-6);
        assert_eq!(s.citation.equation, "J7-1");
    }

    #[test]
    fn hss_wall_bearing_and_rejections() {
        let s = hss_through_bolt_bearing(
            Edition::Aisc360_16,
            Stress::ksi(50.0),
            Length::inch(0.5),
            Length::inch(0.116),
        )
        .unwrap();
        let expected = 1.8 * 50.0 * 0.5 * 0.116;
        assert!((crate::units::Force::from_si(s.nominal.si).to_kip() - expected).abs() < 1e-9);
        assert!(s.notes[0].contains("J3.10"));
        let e = hss_through_bolt_bearing(
            Edition::Aisc360_22,
            Stress::ksi(50.0),
            Length::inch(0.5),
            Length::inch(0.0),
        );
        assert_eq!(e.unwrap_err().symbol, "t");
        let e = bearing_on_projected_area(Edition::Aisc360_22, Stress::ksi(0.0), Area::in2(1.0));
        assert_eq!(e.unwrap_err().symbol, "Fy");
    }
}
