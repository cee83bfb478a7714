//! AISC 360-22 J3.11 (360-16 J3.10) — bearing and tear-out strength at bolt holes.

use super::super::input::{require_positive, InputError};
use super::super::Edition;
use super::J3Clause;
use crate::standards::{Input, Strength};
use crate::units::{Length, Stress};

/// Whether deformation at the bolt hole at service load is a design consideration.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum HoleDeformation {
    /// Deformation at service load is a design consideration (the lower coefficients).
    DesignConsideration,
    /// Deformation at service load is not a design consideration.
    NotDesignConsideration,
}

/// Which hole case of the bearing clause applies.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum BearingHole {
    /// Standard, oversized or short-slotted hole in any direction, or a long-slotted hole with
    /// the slot parallel to the force.
    RoundOrParallelSlot,
    /// A long-slotted hole with the slot perpendicular to the force.
    LongSlotPerpendicular,
}

/// Clear distance from a hole to the edge of the material in the direction of the force,
/// lc = le − dh / 2 (AISC 360 J3.11, definition of lc), with dh the nominal hole dimension in the
/// direction of the force.
pub fn clear_distance_to_edge(le: Length, dh: Length) -> Length {
    le - 0.5 * dh
}

/// Clear distance between adjacent holes in the direction of the force, lc = s − dh
/// (AISC 360 J3.11, definition of lc).
pub fn clear_distance_between(s: Length, dh: Length) -> Length {
    s - dh
}

/// AISC 360-22 J3.11 Eq. J3-6a/b/e (360-16 J3.10) — bearing at a bolt hole, Rn = 2.4 d t Fu, 3.0 d t Fu
/// or (long slot perpendicular to the force) 2.0 d t Fu; φ 0.75, Ω 2.00.
pub fn bolt_bearing(
    edition: Edition,
    d: Length,
    t: Length,
    fu: Stress,
    hole: BearingHole,
    deformation: HoleDeformation,
) -> Result<Strength, InputError> {
    require_positive("d", d.si())?;
    require_positive("t", t.si())?;
    require_positive("Fu", fu.si())?;
    let (k, equation, formula) = match (hole, deformation) {
        (BearingHole::RoundOrParallelSlot, HoleDeformation::DesignConsideration) => {
            (2.4, "J3-6a", "Rn = 2.4 d t Fu")
        }
        (BearingHole::RoundOrParallelSlot, HoleDeformation::NotDesignConsideration) => {
            (3.0, "J3-6b", "Rn = 3.0 d t Fu")
        }
        (BearingHole::LongSlotPerpendicular, _) => (2.0, "J3-6e", "Rn = 2.0 d t Fu"),
    };
    Ok(Strength {
        citation: edition.cite(J3Clause::BearingAndTearout.number(edition), equation),
        formula,
        inputs: vec![
            Input::new("d", d, "nominal bolt diameter"),
            Input::new("t", t, "thickness of the connected material"),
            Input::new(
                "Fu",
                fu,
                "specified minimum tensile strength of the connected material",
            ),
        ],
        nominal: (k * (fu * (d * t))).into(),
        phi: 0.75,
        omega: 2.00,
        notes: Vec::new(),
        out_of_scope: Vec::new(),
    })
}

/// AISC 360-22 J3.11 Eq. J3-6c/d/f (360-16 J3.10) — tear-out at a bolt hole, Rn = 1.2 lc t Fu,
/// 1.5 lc t Fu or (long slot perpendicular to the force) 1.0 lc t Fu; φ 0.75, Ω 2.00.
///
/// `lc` is the clear distance in the direction of the force: see [`clear_distance_to_edge`] and
/// [`clear_distance_between`].
pub fn bolt_tearout(
    edition: Edition,
    lc: Length,
    t: Length,
    fu: Stress,
    hole: BearingHole,
    deformation: HoleDeformation,
) -> Result<Strength, InputError> {
    require_positive("lc", lc.si()).map_err(|e| {
        InputError::new(
            "lc",
            format!("{} (the hole reaches the edge or the next hole)", e.message),
        )
    })?;
    require_positive("t", t.si())?;
    require_positive("Fu", fu.si())?;
    let (k, equation, formula) = match (hole, deformation) {
        (BearingHole::RoundOrParallelSlot, HoleDeformation::DesignConsideration) => {
            (1.2, "J3-6c", "Rn = 1.2 lc t Fu")
        }
        (BearingHole::RoundOrParallelSlot, HoleDeformation::NotDesignConsideration) => {
            (1.5, "J3-6d", "Rn = 1.5 lc t Fu")
        }
        (BearingHole::LongSlotPerpendicular, _) => (1.0, "J3-6f", "Rn = 1.0 lc t Fu"),
    };
    Ok(Strength {
        citation: edition.cite(J3Clause::BearingAndTearout.number(edition), equation),
        formula,
        inputs: vec![
            Input::new("lc", lc, "clear distance in the direction of the force"),
            Input::new("t", t, "thickness of the connected material"),
            Input::new(
                "Fu",
                fu,
                "specified minimum tensile strength of the connected material",
            ),
        ],
        nominal: (k * (fu * (lc * t))).into(),
        phi: 0.75,
        omega: 2.00,
        notes: Vec::new(),
        out_of_scope: Vec::new(),
    })
}

/// AISC 360-22 J3.11 Eq. J3-6c (360-16 J3.10) applied to one wall of an unstiffened HSS or box that a
/// bolt passes through — tear-out, Rn = 1.2 lc t Fu; φ 0.75, Ω 2.00.
///
/// The clause sends bearing of such bolts to J7 (see `j7_bearing::hss_through_bolt_bearing`).
/// Applying the tear-out equation to the wall, with the lower coefficient whatever the
/// deformation criterion, is from memory of the 360-22 text and is marked so in the record.
pub fn hss_through_bolt_tearout(
    edition: Edition,
    lc: Length,
    t_wall: Length,
    fu: Stress,
) -> Result<Strength, InputError> {
    let mut s = bolt_tearout(
        edition,
        lc,
        t_wall,
        fu,
        BearingHole::RoundOrParallelSlot,
        HoleDeformation::DesignConsideration,
    )?;
    s.inputs[1] = Input::new("t", t_wall, "design wall thickness of the HSS");
    s.notes.push(
        "tear-out of an unstiffened HSS wall by a through-bolt: Eq. J3-6c applied per wall (from memory of the clause text; check the edition)"
            .to_string(),
    );
    Ok(s)
}

#[cfg(test)]
mod tests {
    use super::*;

    const E: Edition = Edition::Aisc360_22;

    #[test]
    fn equations_by_case() {
        let (d, t, fu) = (Length::inch(1.0), Length::inch(1.0), Stress::ksi(1.0));
        let cases = [
            (
                BearingHole::RoundOrParallelSlot,
                HoleDeformation::DesignConsideration,
                2.4,
                "J3-6a",
            ),
            (
                BearingHole::RoundOrParallelSlot,
                HoleDeformation::NotDesignConsideration,
                3.0,
                "J3-6b",
            ),
            (
                BearingHole::LongSlotPerpendicular,
                HoleDeformation::DesignConsideration,
                2.0,
                "J3-6e",
            ),
        ];
        for (hole, def, k, eq) in cases {
            let s = bolt_bearing(E, d, t, fu, hole, def).unwrap();
            assert!(
                (s.nominal.si / Stress::ksi(1.0).si() / Length::inch(1.0).si().powi(2) - k).abs()
                    < 1e-9
            );
            assert_eq!(s.citation.equation, eq);
        }
        let cases = [
            (
                BearingHole::RoundOrParallelSlot,
                HoleDeformation::DesignConsideration,
                1.2,
                "J3-6c",
            ),
            (
                BearingHole::RoundOrParallelSlot,
                HoleDeformation::NotDesignConsideration,
                1.5,
                "J3-6d",
            ),
            (
                BearingHole::LongSlotPerpendicular,
                HoleDeformation::NotDesignConsideration,
                1.0,
                "J3-6f",
            ),
        ];
        for (hole, def, k, eq) in cases {
            let s = bolt_tearout(E, d, t, fu, hole, def).unwrap();
            assert!(
                (s.nominal.si / Stress::ksi(1.0).si() / Length::inch(1.0).si().powi(2) - k).abs()
                    < 1e-9
            );
            assert_eq!(s.citation.equation, eq);
        }
    }

    #[test]
    fn clause_follows_the_edition() {
        let s = bolt_bearing(
            Edition::Aisc360_16,
            Length::inch(0.75),
            Length::inch(0.5),
            Stress::ksi(58.0),
            BearingHole::RoundOrParallelSlot,
            HoleDeformation::DesignConsideration,
        )
        .unwrap();
        assert_eq!(s.citation.clause, "J3.10");
        assert_eq!(s.citation.standard, "AISC 360-16");
    }

    #[test]
    fn rejections() {
        let ok = (Length::inch(1.0), Length::inch(0.5), Stress::ksi(58.0));
        let (h, def) = (
            BearingHole::RoundOrParallelSlot,
            HoleDeformation::DesignConsideration,
        );
        assert_eq!(
            bolt_bearing(E, Length::inch(0.0), ok.1, ok.2, h, def)
                .unwrap_err()
                .symbol,
            "d"
        );
        assert_eq!(
            bolt_bearing(E, ok.0, Length::inch(-0.1), ok.2, h, def)
                .unwrap_err()
                .symbol,
            "t"
        );
        assert_eq!(
            bolt_bearing(E, ok.0, ok.1, Stress::ksi(0.0), h, def)
                .unwrap_err()
                .symbol,
            "Fu"
        );
        let lc = clear_distance_to_edge(Length::inch(0.4), Length::inch(13.0 / 16.0));
        let err = bolt_tearout(E, lc, ok.1, ok.2, h, def).unwrap_err();
        assert_eq!(err.symbol, "lc");
        assert!(err.message.contains("reaches the edge"));
    }

    #[test]
    fn clear_distances() {
        let dh = Length::inch(15.0 / 16.0);
        assert!((clear_distance_to_edge(Length::inch(1.5), dh).to_in() - 1.03125).abs() < 1e-12);
        assert!((clear_distance_between(Length::inch(3.0), dh).to_in() - 2.0625).abs() < 1e-12);
    }

    #[test]
    fn hss_wall_tearout_is_marked() {
        let s =
            hss_through_bolt_tearout(E, Length::inch(1.0), Length::inch(0.116), Stress::ksi(58.0))
                .unwrap();
        assert_eq!(s.citation.equation, "J3-6c");
        assert!(s.notes[0].contains("from memory"));
        assert_eq!(s.inputs[1].meaning, "design wall thickness of the HSS");
    }
}
