//! The directional strength increase of AISC 360 J2.4 (kds = 1.0 + 0.50 sin^1.5 θ, Eq. J2-5) on
//! fillet welds to tube walls: used only where the project turns it on
//! (`weld_directional_increase = "on"`) and the standard does not withhold it.

use super::CheckResult;
use crate::model::DirectionalIncrease;
use crate::standards::aisc360::j2_welds::{directional_factor, NO_INCREASE_NOTE};
use crate::standards::aisc360::Edition;
use crate::units::Angle;

/// Whether a fillet weld's line uses the increase, and the note that says so and why.
#[derive(Debug, Clone, PartialEq)]
pub struct KdsChoice {
    pub used: bool,
    pub note: String,
}

impl KdsChoice {
    /// The weld record with this choice's note in place of the clause function's general one.
    pub fn annotate(&self, mut c: CheckResult) -> CheckResult {
        c.notes.retain(|n| n != NO_INCREASE_NOTE);
        c.note(self.note.clone())
    }
}

/// AISC 360 J2.4 Eq. J2-5 — whether kds from the line's angle θ is used on a fillet weld to a
/// tube wall: the project's choice, withheld on welds to the end of a rectangular HSS in tension.
pub fn tube_weld_kds(
    edition: Edition,
    choice: DirectionalIncrease,
    angle: Angle,
    end_of_rect_hss_in_tension: bool,
) -> KdsChoice {
    let deg = angle.to_deg();
    if !choice.on {
        let why = if choice.set_by_model {
            "weld_directional_increase = \"off\""
        } else {
            "weld_directional_increase is off by default"
        };
        return KdsChoice {
            used: false,
            note: format!(
                "directional strength increase of J2.4 not used (kds = 1.0, θ = {deg:.0} deg): {why}"
            ),
        };
    }
    if end_of_rect_hss_in_tension && deg > 1e-6 {
        let edition_note = match edition {
            Edition::Aisc360_22 => "",
            Edition::Aisc360_16 => {
                "; the 360-22 rule is kept under 360-16 too, as the conservative choice"
            }
        };
        return KdsChoice {
            used: false,
            note: format!(
                "directional strength increase withheld (kds = 1.0, θ = {deg:.0} deg) although \
                 weld_directional_increase = \"on\": AISC 360-22 J2.4 (Eq. J2-5) takes kds = 1.0 \
                 for fillet welds to the ends of rectangular HSS loaded in tension (clause \
                 wording from memory){edition_note}"
            ),
        };
    }
    KdsChoice {
        used: true,
        note: format!(
            "directional strength increase of J2.4 used (weld_directional_increase = \"on\"): \
             kds = {:.3} at θ = {deg:.0} deg{}",
            directional_factor(angle),
            if deg < 1e-6 {
                ", the lines run along the force"
            } else {
                ""
            }
        ),
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    const ON: DirectionalIncrease = DirectionalIncrease {
        on: true,
        set_by_model: true,
    };
    const DEFAULT: DirectionalIncrease = DirectionalIncrease {
        on: false,
        set_by_model: false,
    };

    #[test]
    fn off_by_default_and_says_so() {
        let k = tube_weld_kds(Edition::Aisc360_22, DEFAULT, Angle::deg(90.0), false);
        assert!(!k.used);
        assert!(k.note.contains("off by default"), "{}", k.note);
    }

    #[test]
    fn on_uses_the_angle_except_at_a_rectangular_end_in_tension() {
        let k = tube_weld_kds(Edition::Aisc360_22, ON, Angle::deg(90.0), false);
        assert!(k.used);
        // kds at 90 deg is 1.5 (AISC 360-22 Eq. J2-5).
        assert!(k.note.contains("kds = 1.500"), "{}", k.note);
        let k = tube_weld_kds(Edition::Aisc360_22, ON, Angle::deg(90.0), true);
        assert!(!k.used);
        assert!(k.note.contains("rectangular HSS"), "{}", k.note);
        let k = tube_weld_kds(Edition::Aisc360_16, ON, Angle::deg(90.0), true);
        assert!(!k.used && k.note.contains("conservative"), "{}", k.note);
        let k = tube_weld_kds(Edition::Aisc360_22, ON, Angle::deg(0.0), true);
        assert!(k.used && k.note.contains("kds = 1.000"), "{}", k.note);
    }
}
