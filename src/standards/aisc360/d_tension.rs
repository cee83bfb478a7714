//! AISC 360 Chapter D — design of members for tension: D2 yield and rupture, D3 net and
//! effective net area (Table D3.1 case 2), and the net area of a tube drilled through both walls.

use super::input::{require_positive, InputError};
use super::Edition;
use crate::standards::{Citation, Input, Strength};
use crate::units::{Area, Length, Stress};

/// The kind of cross-section, for the minimum-U rule of D3.
#[derive(Debug, Clone, Copy, PartialEq)]
pub enum TensionSection {
    /// An open shape (W, C, WT, angle): U need not be less than Agc / Ag.
    Open {
        connected_area: Area,
        gross_area: Area,
    },
    /// A closed section (round or rectangular HSS, box): Table D3.1 case 2 excludes HSS.
    ClosedHss,
}

/// A shear lag factor with its provenance.
#[derive(Debug, Clone, PartialEq)]
pub struct ShearLag {
    pub citation: Citation,
    pub u: f64,
    pub inputs: Vec<Input>,
    pub notes: Vec<String>,
    pub out_of_scope: Vec<String>,
}

/// AISC 360 Table D3.1 case 2 — shear lag factor for a load carried into some but not all elements
/// by fasteners, U = 1 − x̄ / l, with the D3 minimum for open sections.
///
/// `x_bar` is the connection eccentricity and `l` the connection length (first to last bolt row).
pub fn shear_lag_partial_connection(
    edition: Edition,
    x_bar: Length,
    l: Length,
    section: TensionSection,
) -> Result<ShearLag, InputError> {
    require_positive("x̄", x_bar.si())?;
    if l.si() <= 0.0 || !l.is_finite() {
        return Err(InputError::new(
            "l",
            "Table D3.1 case 2 needs a connection length (at least two bolt rows along the load); give U instead",
        ));
    }
    let mut u = 1.0 - (x_bar / l);
    let mut inputs = vec![
        Input::new("x̄", x_bar, "connection eccentricity"),
        Input::new("l", l, "length of the connection"),
    ];
    let mut notes = Vec::new();
    let mut out_of_scope = Vec::new();
    match section {
        TensionSection::Open { connected_area, gross_area } => {
            require_positive("Agc", connected_area.si())?;
            require_positive("Ag", gross_area.si())?;
            let floor = connected_area / gross_area;
            inputs.push(Input::new("Agc/Ag", floor, "connected-element area over gross area (D3 minimum)"));
            if floor > u {
                u = floor;
                notes.push("U raised to Agc / Ag, the D3 minimum for open sections".to_string());
            }
        }
        TensionSection::ClosedHss => out_of_scope.push(
            "Table D3.1 case 2 excludes HSS (from memory); U = 1 − x̄/l is applied to the bolted tube by analogy and needs the engineer's judgement"
                .to_string(),
        ),
    }
    if u <= 0.0 {
        return Err(InputError::new(
            "x̄",
            "x̄ ≥ l leaves no effective area (U ≤ 0)",
        ));
    }
    if u < 0.6 {
        notes.push("U below 0.6: the Commentary asks that the eccentricity be considered in design (from memory)".into());
    }
    inputs.push(Input::new("U", u, "shear lag factor"));
    Ok(ShearLag {
        citation: edition.cite("Table D3.1", ""),
        u,
        inputs,
        notes,
        out_of_scope,
    })
}

/// AISC 360 Table D3.1 case 1 — shear lag factor U = 1.0 when the tension load is carried directly
/// into each cross-sectional element by fasteners or welds (a tube welded all round its end).
pub fn shear_lag_all_elements(edition: Edition) -> ShearLag {
    ShearLag {
        citation: edition.cite("Table D3.1", ""),
        u: 1.0,
        inputs: vec![Input::new(
            "U",
            1.0,
            "shear lag factor, Table D3.1 case 1: every element of the section is connected",
        )],
        notes: Vec::new(),
        out_of_scope: Vec::new(),
    }
}

/// AISC 360 Table D3.1 case 4 — shear lag factor of a plate connected by longitudinal welds
/// only: U = 1.00 for l ≥ 2w, 0.87 for 2w > l ≥ 1.5w, 0.75 for 1.5w > l ≥ w, with `l` the weld
/// length and `w` the plate width (the distance between the welds). Below l = w the table gives
/// no U, and J2.2b forbids such end welds: an error.
pub fn shear_lag_longitudinal_welds(
    edition: Edition,
    l: Length,
    w: Length,
) -> Result<ShearLag, InputError> {
    require_positive("l", l.si())?;
    require_positive("w", w.si())?;
    let ratio = l / w;
    let u = if ratio >= 2.0 - 1e-12 {
        1.0
    } else if ratio >= 1.5 - 1e-12 {
        0.87
    } else if ratio >= 1.0 - 1e-12 {
        0.75
    } else {
        return Err(InputError::new(
            "l",
            "the welds are shorter than the distance between them (l < w): Table D3.1 case 4 gives no U and J2.2b asks l ≥ w",
        ));
    };
    Ok(ShearLag {
        citation: edition.cite("Table D3.1", ""),
        u,
        inputs: vec![
            Input::new("l", l, "length of the longitudinal welds"),
            Input::new("w", w, "plate width, the distance between the welds"),
            Input::new("U", u, "shear lag factor, Table D3.1 case 4"),
        ],
        notes: vec![format!(
            "Table D3.1 case 4, plate connected by longitudinal welds only: l/w = {ratio:.3} gives U = {u}"
        )],
        out_of_scope: Vec::new(),
    })
}

/// AISC 360 B4.3b — net area of a tube with bolts passing through both walls, An = Ag − 2 n (dh + 1/16 in.) t,
/// with `hole_width` already dh + 1/16 in. (2 mm) and `bolts_in_section` the bolts cut by one
/// cross-section.
pub fn tube_net_area_through_bolts(
    ag: Area,
    t_wall: Length,
    hole_width: Length,
    bolts_in_section: u32,
) -> Result<Area, InputError> {
    require_positive("Ag", ag.si())?;
    require_positive("t", t_wall.si())?;
    require_positive("dh", hole_width.si())?;
    let removed = 2.0 * f64::from(bolts_in_section) * (hole_width * t_wall);
    let an = ag - removed;
    if an.si() <= 0.0 {
        return Err(InputError::new("dh", "the holes remove the whole section"));
    }
    Ok(an)
}

/// AISC 360 D2 Eq. D2-1 — tensile yielding of a member on its gross section, Pn = Fy Ag; φ 0.90, Ω 1.67.
pub fn member_tension_yield(
    edition: Edition,
    fy: Stress,
    ag: Area,
) -> Result<Strength, InputError> {
    require_positive("Fy", fy.si())?;
    require_positive("Ag", ag.si())?;
    Ok(Strength {
        citation: edition.cite("D2", "D2-1"),
        formula: "Pn = Fy Ag",
        inputs: vec![
            Input::new("Fy", fy, "specified minimum yield stress"),
            Input::new("Ag", ag, "gross area of the member"),
        ],
        nominal: (fy * ag).into(),
        phi: 0.90,
        omega: 1.67,
        notes: Vec::new(),
        out_of_scope: Vec::new(),
    })
}

/// AISC 360 D2 Eq. D2-2 with D3 Eq. D3-1 — tensile rupture of a member on its net section,
/// Pn = Fu Ae, Ae = An U; φ 0.75, Ω 2.00.
pub fn member_tension_rupture(
    edition: Edition,
    fu: Stress,
    an: Area,
    shear_lag: &ShearLag,
) -> Result<Strength, InputError> {
    require_positive("Fu", fu.si())?;
    require_positive("An", an.si())?;
    if !(shear_lag.u > 0.0 && shear_lag.u <= 1.0) {
        return Err(InputError::new(
            "U",
            "the shear lag factor must lie in (0, 1]",
        ));
    }
    let ae = shear_lag.u * an;
    let mut inputs = vec![
        Input::new("Fu", fu, "specified minimum tensile strength"),
        Input::new("An", an, "net area"),
    ];
    inputs.extend(shear_lag.inputs.iter().cloned());
    inputs.push(Input::new("Ae", ae, "effective net area, Eq. D3-1"));
    Ok(Strength {
        citation: edition.cite("D2", "D2-2"),
        formula: "Pn = Fu Ae, Ae = An U",
        inputs,
        nominal: (fu * ae).into(),
        phi: 0.75,
        omega: 2.00,
        notes: shear_lag.notes.clone(),
        out_of_scope: shear_lag.out_of_scope.clone(),
    })
}

#[cfg(test)]
mod tests {
    use super::*;

    const E: Edition = Edition::Aisc360_22;

    /// AISC 360-22 Table D3.1 case 4 (from memory): the three steps of U by l/w, and l < w
    /// refused.
    #[test]
    fn case_4_steps_by_weld_length() {
        let w = Length::inch(2.0);
        let u = |l: f64| {
            shear_lag_longitudinal_welds(E, Length::inch(l), w)
                .map(|s| s.u)
                .ok()
        };
        assert_eq!(u(4.0), Some(1.0));
        assert_eq!(u(3.99), Some(0.87));
        assert_eq!(u(3.0), Some(0.87));
        assert_eq!(u(2.99), Some(0.75));
        assert_eq!(u(2.0), Some(0.75));
        assert_eq!(u(1.99), None);
    }

    #[test]
    fn case_2_and_the_open_section_minimum() {
        let open = TensionSection::Open {
            connected_area: Area::in2(3.0),
            gross_area: Area::in2(4.0),
        };
        let s =
            shear_lag_partial_connection(E, Length::inch(1.0), Length::inch(6.0), open).unwrap();
        assert!((s.u - 5.0 / 6.0).abs() < 1e-12);
        let s =
            shear_lag_partial_connection(E, Length::inch(3.0), Length::inch(6.0), open).unwrap();
        assert!((s.u - 0.75).abs() < 1e-12);
        assert!(s.notes[0].contains("D3 minimum"));
    }

    #[test]
    fn hss_is_flagged_and_bad_geometry_refused() {
        let s = shear_lag_partial_connection(
            E,
            Length::inch(0.5),
            Length::inch(3.0),
            TensionSection::ClosedHss,
        )
        .unwrap();
        assert_eq!(s.out_of_scope.len(), 1);
        let e = shear_lag_partial_connection(
            E,
            Length::inch(0.5),
            Length::inch(0.0),
            TensionSection::ClosedHss,
        );
        assert_eq!(e.unwrap_err().symbol, "l");
        let e = shear_lag_partial_connection(
            E,
            Length::inch(4.0),
            Length::inch(3.0),
            TensionSection::ClosedHss,
        );
        assert_eq!(e.unwrap_err().symbol, "x̄");
        let s = shear_lag_partial_connection(
            E,
            Length::inch(1.5),
            Length::inch(3.0),
            TensionSection::ClosedHss,
        )
        .unwrap();
        assert!(s.notes.iter().any(|n| n.contains("0.6")));
    }

    #[test]
    fn tube_net_area_and_rupture() {
        // Worked by hand: Ag 0.840 in.², t 0.116 in., one 1/2 in. bolt in a 9/16 hole:
        // An = 0.840 − 2 × 0.625 × 0.116 = 0.695 in.²
        let an = tube_net_area_through_bolts(
            Area::in2(0.84),
            Length::inch(0.116),
            Length::inch(0.625),
            1,
        )
        .unwrap();
        assert!((an.to_in2() - 0.695).abs() < 1e-9);
        assert!(tube_net_area_through_bolts(
            Area::in2(0.1),
            Length::inch(0.116),
            Length::inch(0.625),
            1
        )
        .is_err());
        let lag = shear_lag_partial_connection(
            E,
            Length::inch(0.5),
            Length::inch(2.0),
            TensionSection::ClosedHss,
        )
        .unwrap();
        let r = member_tension_rupture(E, Stress::ksi(58.0), an, &lag).unwrap();
        let kip = crate::units::Force::from_si(r.nominal.si).to_kip();
        assert!((kip - 58.0 * 0.695 * 0.75).abs() < 1e-9);
        assert_eq!(r.out_of_scope.len(), 1);
        let y = member_tension_yield(E, Stress::ksi(46.0), Area::in2(0.84)).unwrap();
        assert_eq!((y.phi, y.omega), (0.90, 1.67));
        assert_eq!(
            member_tension_yield(E, Stress::ksi(46.0), Area::in2(0.0))
                .unwrap_err()
                .symbol,
            "Ag"
        );
    }
}
