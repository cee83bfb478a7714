//! AISC 360 J4 — affected and connecting elements: tension (J4.1), shear (J4.2), block shear
//! (J4.3) and compression (J4.4); and the tear paths of a bolted rectangular tab.

use super::e_compression::flexural_buckling;
use super::input::{require_non_negative, require_positive, InputError};
use super::Edition;
use crate::standards::{Input, Strength};
use crate::units::{Area, Length, Stress};

/// The net section of a connecting element in tension.
#[derive(Debug, Clone, Copy, PartialEq)]
pub enum TensionNetSection {
    /// A bolted splice plate: Ae = An ≤ 0.85 Ag (J4.1b).
    BoltedSplice { an: Area, ag: Area },
    /// Any other connecting element, with its effective net area Ae from D3.
    Effective { ae: Area },
}

/// Whether the tension stress on a block-shear tension plane is uniform (Ubs = 1.0) or not (0.5).
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum TensionStress {
    Uniform,
    NonUniform,
}

#[allow(clippy::too_many_arguments)] // one private builder for the record fields
fn strength(
    edition: Edition,
    clause: &'static str,
    equation: &'static str,
    formula: &'static str,
    inputs: Vec<Input>,
    nominal: crate::units::Force,
    phi: f64,
    omega: f64,
) -> Strength {
    Strength {
        citation: edition.cite(clause, equation),
        formula,
        inputs,
        nominal: nominal.into(),
        phi,
        omega,
        notes: Vec::new(),
        out_of_scope: Vec::new(),
    }
}

/// AISC 360 J4.1a Eq. J4-1 — tensile yielding of a connecting element, Rn = Fy Ag; φ 0.90, Ω 1.67.
pub fn plate_tension_yield(edition: Edition, fy: Stress, ag: Area) -> Result<Strength, InputError> {
    require_positive("Fy", fy.si())?;
    require_positive("Ag", ag.si())?;
    Ok(strength(
        edition,
        "J4.1",
        "J4-1",
        "Rn = Fy Ag",
        vec![
            Input::new("Fy", fy, "specified minimum yield stress"),
            Input::new("Ag", ag, "gross area of the element"),
        ],
        fy * ag,
        0.90,
        1.67,
    ))
}

/// AISC 360 J4.1b Eq. J4-2 — tensile rupture of a connecting element, Rn = Fu Ae (Ae = An ≤ 0.85 Ag
/// for bolted splice plates); φ 0.75, Ω 2.00.
pub fn plate_tension_rupture(
    edition: Edition,
    fu: Stress,
    section: TensionNetSection,
) -> Result<Strength, InputError> {
    require_positive("Fu", fu.si())?;
    let mut inputs = vec![Input::new("Fu", fu, "specified minimum tensile strength")];
    let mut notes = Vec::new();
    let ae = match section {
        TensionNetSection::BoltedSplice { an, ag } => {
            require_positive("An", an.si())?;
            require_positive("Ag", ag.si())?;
            if an.si() > ag.si() {
                return Err(InputError::new(
                    "An",
                    "the net area cannot exceed the gross area",
                ));
            }
            inputs.push(Input::new("An", an, "net area"));
            inputs.push(Input::new("Ag", ag, "gross area"));
            if an.si() > 0.85 * ag.si() {
                notes.push("bolted splice plate: Ae limited to 0.85 Ag".to_string());
            }
            an.min(0.85 * ag)
        }
        TensionNetSection::Effective { ae } => {
            require_positive("Ae", ae.si())?;
            ae
        }
    };
    inputs.push(Input::new("Ae", ae, "effective net area"));
    let mut s = strength(
        edition,
        "J4.1",
        "J4-2",
        "Rn = Fu Ae",
        inputs,
        fu * ae,
        0.75,
        2.00,
    );
    s.notes = notes;
    Ok(s)
}

/// AISC 360 J4.2a Eq. J4-3 — shear yielding of a connecting element, Rn = 0.60 Fy Agv; φ 1.00, Ω 1.50.
pub fn plate_shear_yield(edition: Edition, fy: Stress, agv: Area) -> Result<Strength, InputError> {
    require_positive("Fy", fy.si())?;
    require_positive("Agv", agv.si())?;
    Ok(strength(
        edition,
        "J4.2",
        "J4-3",
        "Rn = 0.60 Fy Agv",
        vec![
            Input::new("Fy", fy, "specified minimum yield stress"),
            Input::new("Agv", agv, "gross area subject to shear"),
        ],
        0.60 * (fy * agv),
        1.00,
        1.50,
    ))
}

/// AISC 360 J4.2b Eq. J4-4 — shear rupture of a connecting element, Rn = 0.60 Fu Anv; φ 0.75, Ω 2.00.
pub fn plate_shear_rupture(
    edition: Edition,
    fu: Stress,
    anv: Area,
) -> Result<Strength, InputError> {
    require_positive("Fu", fu.si())?;
    require_positive("Anv", anv.si())?;
    Ok(strength(
        edition,
        "J4.2",
        "J4-4",
        "Rn = 0.60 Fu Anv",
        vec![
            Input::new("Fu", fu, "specified minimum tensile strength"),
            Input::new("Anv", anv, "net area subject to shear"),
        ],
        0.60 * (fu * anv),
        0.75,
        2.00,
    ))
}

/// The areas of one block-shear tear path.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct BlockShearAreas {
    /// Gross area subject to shear, Agv.
    pub agv: Area,
    /// Net area subject to shear, Anv.
    pub anv: Area,
    /// Net area subject to tension, Ant.
    pub ant: Area,
}

/// AISC 360 J4.3 Eq. J4-5 — block shear rupture, Rn = 0.60 Fu Anv + Ubs Fu Ant ≤ 0.60 Fy Agv + Ubs Fu Ant;
/// φ 0.75, Ω 2.00.
pub fn block_shear(
    edition: Edition,
    fy: Stress,
    fu: Stress,
    areas: BlockShearAreas,
    tension: TensionStress,
) -> Result<Strength, InputError> {
    require_positive("Fy", fy.si())?;
    require_positive("Fu", fu.si())?;
    require_positive("Agv", areas.agv.si())?;
    require_positive("Anv", areas.anv.si())?;
    require_non_negative("Ant", areas.ant.si())?;
    if areas.anv.si() > areas.agv.si() {
        return Err(InputError::new(
            "Anv",
            "the net shear area cannot exceed the gross shear area",
        ));
    }
    let ubs = match tension {
        TensionStress::Uniform => 1.0,
        TensionStress::NonUniform => 0.5,
    };
    let rupture = 0.60 * (fu * areas.anv) + ubs * (fu * areas.ant);
    let yield_cap = 0.60 * (fy * areas.agv) + ubs * (fu * areas.ant);
    let mut s = strength(
        edition,
        "J4.3",
        "J4-5",
        "Rn = 0.60 Fu Anv + Ubs Fu Ant ≤ 0.60 Fy Agv + Ubs Fu Ant",
        vec![
            Input::new("Fy", fy, "specified minimum yield stress"),
            Input::new("Fu", fu, "specified minimum tensile strength"),
            Input::new("Agv", areas.agv, "gross area subject to shear"),
            Input::new("Anv", areas.anv, "net area subject to shear"),
            Input::new("Ant", areas.ant, "net area subject to tension"),
            Input::new(
                "Ubs",
                ubs,
                "1.0 for uniform tension stress, 0.5 for non-uniform",
            ),
        ],
        rupture.min(yield_cap),
        0.75,
        2.00,
    );
    if yield_cap.si() < rupture.si() {
        s.notes.push(
            "shear yielding on the gross shear planes governs (right side of Eq. J4-5)".into(),
        );
    }
    Ok(s)
}

/// A rectangular tab with `rows` bolt rows along the load and `columns` bolt lines across it,
/// loaded toward its free end.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct BoltedTab {
    /// Bolt rows along the load (n ≥ 1).
    pub rows: u32,
    /// Bolt lines across the load (m ≥ 1).
    pub columns: u32,
    /// Pitch s between rows, along the load.
    pub pitch: Length,
    /// Gauge g between lines, across the load.
    pub gauge: Length,
    /// Distance from the row nearest the free end to the free end, along the load.
    pub end_distance: Length,
    /// Distance from an outer bolt line to the side edge of the tab.
    pub side_distance: Length,
    /// Tab thickness t.
    pub t: Length,
    /// Hole width taken for net area (dh + 1/16 in., B4.3b).
    pub hole_width: Length,
}

/// One tear path of a tab and its areas.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct TearPath {
    /// "U": shear along both outer lines, tension between them; "L": shear along one outer line,
    /// tension from it across the other lines to the far side edge.
    pub name: &'static str,
    pub areas: BlockShearAreas,
}

/// Block-shear geometry of a bolted rectangular tab loaded toward its free end (the areas J4.3
/// Eq. J4-5 uses), for the U-shaped path (m ≥ 2) and the L-shaped path.
pub fn tab_tear_paths(tab: &BoltedTab) -> Result<Vec<TearPath>, InputError> {
    if tab.rows == 0 {
        return Err(InputError::new("n", "a tab needs at least one bolt row"));
    }
    if tab.columns == 0 {
        return Err(InputError::new("m", "a tab needs at least one bolt line"));
    }
    require_positive("t", tab.t.si())?;
    require_positive("dh", tab.hole_width.si())?;
    require_positive("le", tab.end_distance.si())?;
    require_positive("le,side", tab.side_distance.si())?;
    if tab.rows > 1 {
        require_positive("s", tab.pitch.si())?;
    }
    if tab.columns > 1 {
        require_positive("g", tab.gauge.si())?;
    }
    let (n, m) = (f64::from(tab.rows), f64::from(tab.columns));
    let shear_length = tab.end_distance + (n - 1.0) * tab.pitch;
    let shear_net = shear_length - (n - 0.5) * tab.hole_width;
    if shear_net.si() <= 0.0 {
        return Err(InputError::new("dh", "the holes leave no net shear plane"));
    }
    let plane_gross = shear_length * tab.t;
    let plane_net = shear_net * tab.t;
    let mut paths = Vec::new();
    if tab.columns > 1 {
        let tension = (m - 1.0) * tab.gauge - (m - 1.0) * tab.hole_width;
        if tension.si() <= 0.0 {
            return Err(InputError::new(
                "g",
                "the holes leave no net tension plane between the lines",
            ));
        }
        paths.push(TearPath {
            name: "U",
            areas: BlockShearAreas {
                agv: 2.0 * plane_gross,
                anv: 2.0 * plane_net,
                ant: tension * tab.t,
            },
        });
    }
    let tension = (m - 1.0) * tab.gauge + tab.side_distance - (m - 0.5) * tab.hole_width;
    if tension.si() <= 0.0 {
        return Err(InputError::new(
            "le,side",
            "the holes leave no net tension plane to the side edge",
        ));
    }
    paths.push(TearPath {
        name: "L",
        areas: BlockShearAreas {
            agv: plane_gross,
            anv: plane_net,
            ant: tension * tab.t,
        },
    });
    Ok(paths)
}

/// AISC 360 J4.4 Eq. J4-6 — compressive strength of a connecting element, Pn = Fy Ag when
/// Lc/r ≤ 25 (φ 0.90, Ω 1.67), otherwise Chapter E flexural buckling (E3).
pub fn plate_compression(
    edition: Edition,
    fy: Stress,
    e: Stress,
    ag: Area,
    lc: Length,
    r: Length,
) -> Result<Strength, InputError> {
    require_positive("Fy", fy.si())?;
    require_positive("Ag", ag.si())?;
    require_positive("Lc", lc.si())?;
    require_positive("r", r.si())?;
    let slenderness = lc / r;
    if slenderness > 25.0 {
        let mut s = flexural_buckling(edition, fy, e, ag, lc, r)?;
        s.notes
            .insert(0, "Lc/r > 25: Chapter E applies (J4.4(b))".to_string());
        return Ok(s);
    }
    Ok(strength(
        edition,
        "J4.4",
        "J4-6",
        "Pn = Fy Ag (Lc/r ≤ 25)",
        vec![
            Input::new("Fy", fy, "specified minimum yield stress"),
            Input::new("Ag", ag, "gross area of the element"),
            Input::new("Lc", lc, "effective length K L"),
            Input::new("r", r, "radius of gyration"),
            Input::new("Lc/r", slenderness, "slenderness"),
        ],
        fy * ag,
        0.90,
        1.67,
    ))
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::units::Force;

    const E: Edition = Edition::Aisc360_22;

    fn kip(s: &Strength) -> f64 {
        Force::from_si(s.nominal.si).to_kip()
    }

    #[test]
    fn splice_plate_cap() {
        let s = plate_tension_rupture(
            E,
            Stress::ksi(58.0),
            TensionNetSection::BoltedSplice {
                an: Area::in2(9.5),
                ag: Area::in2(10.0),
            },
        )
        .unwrap();
        assert!((kip(&s) - 58.0 * 8.5).abs() < 1e-9);
        assert!(s.notes[0].contains("0.85 Ag"));
        let e = plate_tension_rupture(
            E,
            Stress::ksi(58.0),
            TensionNetSection::BoltedSplice {
                an: Area::in2(11.0),
                ag: Area::in2(10.0),
            },
        )
        .unwrap_err();
        assert_eq!(e.symbol, "An");
        let e = plate_tension_rupture(
            E,
            Stress::ksi(58.0),
            TensionNetSection::Effective { ae: Area::in2(0.0) },
        );
        assert_eq!(e.unwrap_err().symbol, "Ae");
    }

    #[test]
    fn block_shear_cap_and_rejections() {
        let areas = BlockShearAreas {
            agv: Area::in2(2.0),
            anv: Area::in2(1.9),
            ant: Area::in2(0.5),
        };
        let s = block_shear(
            E,
            Stress::ksi(36.0),
            Stress::ksi(58.0),
            areas,
            TensionStress::Uniform,
        )
        .unwrap();
        // 0.6·58·1.9 = 66.12 > 0.6·36·2.0 = 43.2: the yield side governs, + 58·0.5 = 29.
        assert!((kip(&s) - (43.2 + 29.0)).abs() < 1e-9);
        assert!(s.notes[0].contains("yielding"));
        let s = block_shear(
            E,
            Stress::ksi(36.0),
            Stress::ksi(58.0),
            areas,
            TensionStress::NonUniform,
        )
        .unwrap();
        assert!((kip(&s) - (43.2 + 14.5)).abs() < 1e-9);
        let bad = BlockShearAreas {
            anv: Area::in2(2.5),
            ..areas
        };
        assert_eq!(
            block_shear(
                E,
                Stress::ksi(36.0),
                Stress::ksi(58.0),
                bad,
                TensionStress::Uniform
            )
            .unwrap_err()
            .symbol,
            "Anv"
        );
    }

    fn tab() -> BoltedTab {
        BoltedTab {
            rows: 2,
            columns: 2,
            pitch: Length::inch(3.0),
            gauge: Length::inch(3.0),
            end_distance: Length::inch(1.5),
            side_distance: Length::inch(1.5),
            t: Length::inch(0.5),
            hole_width: Length::inch(0.875),
        }
    }

    #[test]
    fn tear_paths_of_a_two_by_two_tab() {
        // Worked by hand: shear plane 1.5 + 3 = 4.5 in.; net 4.5 − 1.5 × 0.875 = 3.1875 in.;
        // U tension 3 − 0.875 = 2.125 in.; L tension 3 + 1.5 − 1.5 × 0.875 = 3.1875 in.; t = 1/2.
        let paths = tab_tear_paths(&tab()).unwrap();
        assert_eq!(paths.len(), 2);
        let u = paths[0].areas;
        assert!((u.agv.to_in2() - 4.5).abs() < 1e-9);
        assert!((u.anv.to_in2() - 3.1875).abs() < 1e-9);
        assert!((u.ant.to_in2() - 1.0625).abs() < 1e-9);
        let l = paths[1].areas;
        assert!((l.agv.to_in2() - 2.25).abs() < 1e-9);
        assert!((l.ant.to_in2() - 1.59375).abs() < 1e-9);
    }

    #[test]
    fn tear_path_rejections() {
        let mut t = tab();
        t.rows = 0;
        assert_eq!(tab_tear_paths(&t).unwrap_err().symbol, "n");
        let mut t = tab();
        t.gauge = Length::inch(0.8);
        assert_eq!(tab_tear_paths(&t).unwrap_err().symbol, "g");
        let mut t = tab();
        t.columns = 1;
        t.side_distance = Length::inch(0.4);
        assert_eq!(tab_tear_paths(&t).unwrap_err().symbol, "le,side");
        let mut t = tab();
        t.columns = 1;
        assert_eq!(tab_tear_paths(&t).unwrap().len(), 1);
    }

    #[test]
    fn compression_switches_to_chapter_e_above_25() {
        let (fy, e, ag) = (Stress::ksi(36.0), Stress::ksi(29000.0), Area::in2(3.0));
        let r = Length::inch(0.144);
        let stocky = plate_compression(E, fy, e, ag, Length::inch(3.0), r).unwrap();
        assert_eq!(stocky.citation.equation, "J4-6");
        assert!((kip(&stocky) - 108.0).abs() < 1e-9);
        let slender = plate_compression(E, fy, e, ag, Length::inch(4.0), r).unwrap();
        assert_eq!(slender.citation.clause, "E3");
        assert!(kip(&slender) < 108.0);
        assert_eq!(
            plate_compression(E, fy, e, ag, Length::inch(3.0), Length::inch(0.0))
                .unwrap_err()
                .symbol,
            "r"
        );
    }

    #[test]
    fn shear_yield_and_rupture() {
        let y = plate_shear_yield(E, Stress::ksi(36.0), Area::in2(2.0)).unwrap();
        assert!((kip(&y) - 43.2).abs() < 1e-9);
        assert_eq!((y.phi, y.omega), (1.00, 1.50));
        let r = plate_shear_rupture(E, Stress::ksi(58.0), Area::in2(1.5)).unwrap();
        assert!((kip(&r) - 52.2).abs() < 1e-9);
        assert_eq!(
            plate_shear_rupture(E, Stress::ksi(58.0), Area::in2(0.0))
                .unwrap_err()
                .symbol,
            "Anv"
        );
        assert_eq!(
            plate_tension_yield(E, Stress::ksi(0.0), Area::in2(1.0))
                .unwrap_err()
                .symbol,
            "Fy"
        );
    }
}
