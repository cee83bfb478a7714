//! AISC 360 Table D3.1, cases 5 and 6 — shear lag of a concentric plate in a slotted round or
//! rectangular HSS, the net area of the tube at the slot, and the tensile rupture of the slotted
//! tube (D2(b), Eq. D2-2 with Ae = An U, Eq. D3-1). Table D3.1 gives no U for a connection length
//! below D (round) or H (rectangular): such a case is computed with the nearest formula and
//! flagged out of scope, never passed.

use crate::standards::{number, Citation, Input, Strength};
use crate::units::{Area, Length, Stress};

use super::j2_welds::{require_positive, InputError};
use super::Edition;

/// The shear lag factor U of one connection with how it was found.
#[derive(Debug, Clone, PartialEq)]
pub struct ShearLag {
    pub citation: Citation,
    pub formula: &'static str,
    /// U, the shear lag factor.
    pub u: f64,
    /// x̄, the connection eccentricity, where the case uses one.
    pub x_bar: Option<Length>,
    pub inputs: Vec<Input>,
    pub notes: Vec<String>,
    pub out_of_scope: Vec<String>,
}

/// How the plate meets a rectangular HSS (Table D3.1 case 6).
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum RectangularGusset {
    /// One concentric plate through slots in the two walls of width B.
    SingleConcentric,
    /// Two plates welded along the two sides of height H (no slot).
    TwoSide,
}

fn one_minus_x_over_l(x_bar: Length, l: Length) -> f64 {
    (1.0 - x_bar / l).max(0.0)
}

/// Shear lag of a round HSS with a single concentric plate through slots, AISC 360 Table D3.1
/// case 5: l ≥ 1.3 D → U = 1.0; D ≤ l < 1.3 D → U = 1 − x̄/l, x̄ = D/π.
pub fn shear_lag_round_slotted(
    edition: Edition,
    diameter: Length,
    length: Length,
) -> Result<ShearLag, InputError> {
    require_positive("D", diameter.si(), "the outside diameter")?;
    require_positive("l", length.si(), "the connection (weld) length")?;
    let x_bar = diameter * (1.0 / std::f64::consts::PI);
    let ratio = length / diameter;
    let mut out_of_scope = Vec::new();
    let (u, formula, x) = if ratio >= 1.3 {
        (1.0, "U = 1.0 (l ≥ 1.3 D)", None)
    } else {
        if ratio < 1.0 {
            out_of_scope.push(format!(
                "connection length below D (l/D = {ratio:.2}): Table D3.1 case 5 gives no U"
            ));
        }
        (
            one_minus_x_over_l(x_bar, length),
            "U = 1 − x̄/l, x̄ = D/π (D ≤ l < 1.3 D)",
            Some(x_bar),
        )
    };
    let mut inputs = vec![
        Input::new("D", diameter, "outside diameter"),
        Input::new("l", length, "connection length (length of weld)"),
    ];
    if let Some(x) = x {
        inputs.push(Input::new("x̄", x, "connection eccentricity"));
    }
    inputs.push(Input::new("U", number(u), "shear lag factor"));
    Ok(ShearLag {
        citation: edition.cite("D3, Table D3.1 case 5", ""),
        formula,
        u,
        x_bar: x,
        inputs,
        notes: vec![],
        out_of_scope,
    })
}

/// Shear lag of a rectangular HSS with a single concentric plate, x̄ = (B² + 2BH)/(4(B + H)), or
/// two side plates, x̄ = B²/(4(B + H)); U = 1 − x̄/l for l ≥ H, AISC 360 Table D3.1 case 6.
///
/// H is the overall height in the plane of the plate(s), B the overall width normal to it.
pub fn shear_lag_rectangular(
    edition: Edition,
    gusset: RectangularGusset,
    width_b: Length,
    height_h: Length,
    length: Length,
) -> Result<ShearLag, InputError> {
    require_positive("B", width_b.si(), "the overall width normal to the plate")?;
    require_positive(
        "H",
        height_h.si(),
        "the overall height in the plane of the plate",
    )?;
    require_positive("l", length.si(), "the connection (weld) length")?;
    let b = width_b.si();
    let h = height_h.si();
    let (x_bar, formula) = match gusset {
        RectangularGusset::SingleConcentric => (
            Length::from_si((b * b + 2.0 * b * h) / (4.0 * (b + h))),
            "U = 1 − x̄/l, x̄ = (B² + 2BH)/(4(B + H)) (l ≥ H)",
        ),
        RectangularGusset::TwoSide => (
            Length::from_si(b * b / (4.0 * (b + h))),
            "U = 1 − x̄/l, x̄ = B²/(4(B + H)) (l ≥ H)",
        ),
    };
    let u = one_minus_x_over_l(x_bar, length);
    let mut out_of_scope = Vec::new();
    if length < height_h {
        out_of_scope.push(format!(
            "connection length below H (l/H = {:.2}): Table D3.1 case 6 gives no U",
            length / height_h
        ));
    }
    Ok(ShearLag {
        citation: edition.cite("D3, Table D3.1 case 6", ""),
        formula,
        u,
        x_bar: Some(x_bar),
        inputs: vec![
            Input::new("B", width_b, "overall width normal to the plate"),
            Input::new("H", height_h, "overall height in the plane of the plate"),
            Input::new("l", length, "connection length (length of weld)"),
            Input::new("x̄", x_bar, "connection eccentricity"),
            Input::new("U", number(u), "shear lag factor"),
        ],
        notes: vec![],
        out_of_scope,
    })
}

/// Slot width cut for a plate: plate thickness plus the fit-up gap (common practice).
pub fn slot_width(plate_thickness: Length, gap: Length) -> Length {
    plate_thickness + gap
}

/// Net area of a tube at a slot through both walls, AISC 360 B4.3b: An = Ag − 2 t ws.
pub fn slotted_net_area(gross: Area, wall: Length, slot: Length) -> Area {
    gross - wall * slot * 2.0
}

/// Tensile rupture of a slotted tube, AISC 360 D2(b) Eq. D2-2 with D3 Eq. D3-1: Rn = Fu Ae,
/// Ae = An U, An = Ag − 2 t ws; φ = 0.75, Ω = 2.00.
///
/// `wall` is the design wall thickness (B4.2). Pass `slot = None` for two side plates (no slot).
pub fn slotted_tube_tensile_rupture(
    edition: Edition,
    fu: Stress,
    gross: Area,
    wall: Length,
    slot: Option<Length>,
    shear_lag: &ShearLag,
) -> Result<Strength, InputError> {
    require_positive("Fu", fu.si(), "the specified minimum tensile strength")?;
    require_positive("Ag", gross.si(), "the gross area")?;
    require_positive("t", wall.si(), "the design wall thickness")?;
    if let Some(ws) = slot {
        require_positive("ws", ws.si(), "the slot width")?;
    }
    if !(shear_lag.u.is_finite() && (0.0..=1.0).contains(&shear_lag.u)) {
        return Err(InputError::new(
            "U",
            "the shear lag factor must lie in 0..1",
        ));
    }
    let removed = slot.map(|ws| wall * ws * 2.0).unwrap_or(Area::mm2(0.0));
    let net = gross - removed;
    if net.si() <= 0.0 {
        return Err(InputError::new(
            "An",
            "the slots remove the whole section (An ≤ 0)",
        ));
    }
    let effective = net * shear_lag.u;
    let mut inputs = vec![
        Input::new("Fu", fu, "specified minimum tensile strength"),
        Input::new("Ag", gross, "gross area"),
        Input::new("t", wall, "design wall thickness"),
    ];
    if let Some(ws) = slot {
        inputs.push(Input::new("ws", ws, "slot width"));
    }
    inputs.push(Input::new("An", net, "net area at the slot"));
    inputs.push(Input::new("U", number(shear_lag.u), "shear lag factor"));
    inputs.push(Input::new("Ae", effective, "effective net area"));
    let mut notes = vec![format!(
        "U from {} ({})",
        shear_lag.citation, shear_lag.formula
    )];
    notes.extend(shear_lag.notes.iter().cloned());
    Ok(Strength {
        citation: edition.cite("D2(b), D3", "D2-2, D3-1"),
        formula: "Rn = Fu Ae, Ae = An U, An = Ag − 2 t ws",
        inputs,
        nominal: (fu * effective).into(),
        phi: 0.75,
        omega: 2.00,
        notes,
        out_of_scope: shear_lag.out_of_scope.clone(),
    })
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::units::Force;

    const E22: Edition = Edition::Aisc360_22;

    #[test]
    fn round_branches() {
        let d = Length::inch(6.0);
        let full = shear_lag_round_slotted(E22, d, Length::inch(7.8)).unwrap();
        assert_eq!(full.u, 1.0);
        assert!(full.x_bar.is_none());
        let mid = shear_lag_round_slotted(E22, d, Length::inch(6.0)).unwrap();
        assert!(mid.out_of_scope.is_empty());
        assert!((mid.u - (1.0 - 1.0 / std::f64::consts::PI)).abs() < 1e-12);
        let short = shear_lag_round_slotted(E22, d, Length::inch(5.0)).unwrap();
        assert_eq!(short.out_of_scope.len(), 1);
        assert!(short.out_of_scope[0].contains("below D"));
        assert_eq!(
            shear_lag_round_slotted(E22, Length::inch(0.0), d)
                .unwrap_err()
                .symbol,
            "D"
        );
    }

    #[test]
    fn rectangular_branches() {
        let short = shear_lag_rectangular(
            E22,
            RectangularGusset::TwoSide,
            Length::inch(4.0),
            Length::inch(6.0),
            Length::inch(5.0),
        )
        .unwrap();
        assert_eq!(short.out_of_scope.len(), 1);
        // x̄ = 16/40 = 0.4 in.
        assert!((short.x_bar.unwrap().to_in() - 0.4).abs() < 1e-12);
        assert!(shear_lag_rectangular(
            E22,
            RectangularGusset::SingleConcentric,
            Length::inch(4.0),
            Length::inch(-6.0),
            Length::inch(5.0),
        )
        .is_err());
    }

    #[test]
    fn rupture_rejects_a_fully_slotted_section_and_carries_scope() {
        let lag = shear_lag_round_slotted(E22, Length::inch(6.0), Length::inch(5.0)).unwrap();
        let err = slotted_tube_tensile_rupture(
            E22,
            Stress::ksi(62.0),
            Area::in2(1.0),
            Length::inch(0.5),
            Some(Length::inch(1.0)),
            &lag,
        )
        .unwrap_err();
        assert_eq!(err.symbol, "An");
        let s = slotted_tube_tensile_rupture(
            E22,
            Stress::ksi(62.0),
            Area::in2(8.0),
            Length::inch(0.5),
            Some(Length::inch(0.5)),
            &lag,
        )
        .unwrap();
        assert_eq!(s.out_of_scope, lag.out_of_scope);
        // An = 8 − 2(0.5)(0.5) = 7.5 in.²
        let rn = Force::from_si(s.nominal.si).to_kip();
        assert!((rn - 62.0 * 7.5 * lag.u).abs() < 1e-9);
    }

    #[test]
    fn slot_width_adds_the_gap() {
        let w = slot_width(Length::inch(0.5), Length::inch(0.125));
        assert!((w.to_in() - 0.625).abs() < 1e-12);
        let an = slotted_net_area(Area::in2(5.0), Length::inch(0.25), w);
        assert!((an.to_in2() - (5.0 - 2.0 * 0.25 * 0.625)).abs() < 1e-12);
    }
}
