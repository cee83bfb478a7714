//! Thread strip (shear) areas of engaged threads, FED-STD-H28/2B Appendix A, with the class 2A/2B
//! limits of size of ASME B1.1 for Unified inch threads.

use crate::standards::{Bound, Citation, Input, Requirement};
use crate::units::{Area, Length, Stress};

/// FED-STD-H28/2B Appendix A, the thread-strength formulas.
pub const H28_APPENDIX_A: Citation = Citation::new("FED-STD-H28/2B", "Appendix A", "");

/// Limits of size used by the strip-area formulas, in inches.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct UnifiedLimits {
    /// Ds,min: minimum major diameter of the external thread.
    pub major_min_ext: f64,
    /// Es,min: minimum pitch diameter of the external thread.
    pub pitch_min_ext: f64,
    /// Kn,max: maximum minor diameter of the internal thread.
    pub minor_max_int: f64,
    /// En,max: maximum pitch diameter of the internal thread.
    pub pitch_max_int: f64,
}

/// Class 2A/2B limits by the ASME B1.1 formulas (from memory): Td2(2A) = 0.0015 D^(1/3) +
/// 0.0015 √LE + 0.015 P^(2/3) with LE = D; es = 0.300 Td2(2A); Td(2A) = 0.060 P^(2/3);
/// Td2(2B) = 1.30 Td2(2A); TD1(2B) = 0.25 P − 0.4 P² (D ≥ 1/4 in.). Rounded as the B1.1 tables
/// print them: four decimals (each allowance and tolerance first), the internal minor diameter three. `None` below 1/4 in.
pub fn unified_2a_2b_limits(d_in: f64, tpi: f64) -> Option<UnifiedLimits> {
    if d_in < 0.25 || tpi <= 0.0 {
        return None;
    }
    let p = 1.0 / tpi;
    let r4 = |v: f64| (v * 1e4).round() / 1e4;
    let r3 = |v: f64| (v * 1e3).round() / 1e3;
    // Each allowance and tolerance is rounded to four decimals before it is applied.
    let td2_2a_exact = 0.0015 * d_in.cbrt() + 0.0015 * d_in.sqrt() + 0.015 * p.powf(2.0 / 3.0);
    let td2_2a = r4(td2_2a_exact);
    let es = r4(0.300 * td2_2a_exact);
    let td_2a = r4(0.060 * p.powf(2.0 / 3.0));
    let td2_2b = r4(1.30 * td2_2a_exact);
    let pitch_basic = r4(d_in - 0.649_519 * p);
    let minor_basic = d_in - 1.082_532 * p;
    Some(UnifiedLimits {
        major_min_ext: r4(d_in - es - td_2a),
        pitch_min_ext: r4(pitch_basic - es - td2_2a),
        minor_max_int: r3(minor_basic + 0.25 * p - 0.4 * p * p),
        pitch_max_int: r4(pitch_basic + td2_2b),
    })
}

/// External thread strip area, FED-STD-H28/2B Appendix A: As = π n Le Kn,max [1/(2n) + 0.57735 (Es,min − Kn,max)].
pub fn external_strip_area(lim: &UnifiedLimits, tpi: f64, le: Length) -> Area {
    let k = lim.minor_max_int;
    let v = std::f64::consts::PI
        * tpi
        * le.to_in()
        * k
        * (1.0 / (2.0 * tpi) + 0.57735 * (lim.pitch_min_ext - k));
    Area::in2(v)
}

/// Internal thread strip area, FED-STD-H28/2B Appendix A: An = π n Le Ds,min [1/(2n) + 0.57735 (Ds,min − En,max)].
pub fn internal_strip_area(lim: &UnifiedLimits, tpi: f64, le: Length) -> Area {
    let ds = lim.major_min_ext;
    let v = std::f64::consts::PI
        * tpi
        * le.to_in()
        * ds
        * (1.0 / (2.0 * tpi) + 0.57735 * (ds - lim.pitch_max_int));
    Area::in2(v)
}

/// Engagement length, FED-STD-H28/2B Appendix A: Le ≥ Le,req so the bolt (At Fu,b) breaks before
/// either thread strips, each thread's shear strength taken as k Fu of its material (k = 0.6 is
/// common practice, the ratio AISC 360 J4.2 uses for shear rupture; the caller states it).
#[allow(clippy::too_many_arguments)]
pub fn thread_engagement(
    lim: &UnifiedLimits,
    tpi: f64,
    at: Area,
    fu_bolt: Stress,
    fu_internal: Stress,
    shear_ratio: f64,
    le: Length,
) -> Requirement {
    let unit = Length::inch(1.0);
    let per_in_ext = external_strip_area(lim, tpi, unit).to_in2();
    let per_in_int = internal_strip_area(lim, tpi, unit).to_in2();
    let pull = at.to_in2() * fu_bolt.to_ksi();
    let need_ext = pull / (shear_ratio * fu_bolt.to_ksi() * per_in_ext);
    let need_int = pull / (shear_ratio * fu_internal.to_ksi() * per_in_int);
    Requirement {
        citation: H28_APPENDIX_A,
        formula: "Le ≥ At Fu,b / (k Fu As per unit Le), external and internal thread",
        inputs: vec![
            Input::new("At", at, "tensile stress area"),
            Input::new("Fu,b", fu_bolt, "bolt tensile strength"),
            Input::new(
                "Fu,n",
                fu_internal,
                "tensile strength of the tapped material",
            ),
            Input::new("k", shear_ratio, "shear to tensile strength ratio"),
        ],
        provided: le.into(),
        required: Length::inch(need_ext.max(need_int)).into(),
        bound: Bound::Minimum,
        notes: vec![],
        out_of_scope: vec![],
    }
}

/// Engaged full threads, common practice: Le / P ≥ 3; fewer fails.
pub fn engagement_thread_count(tpi: f64, le: Length) -> Requirement {
    Requirement {
        citation: Citation::new("common practice", "least engaged threads", ""),
        formula: "Le n ≥ 3",
        inputs: vec![
            Input::new("Le", le, "engagement length"),
            Input::new("n", tpi, "threads per inch"),
        ],
        provided: (le.to_in() * tpi).into(),
        required: 3.0.into(),
        bound: Bound::Minimum,
        notes: vec![],
        out_of_scope: vec![],
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn below_quarter_inch_is_not_covered() {
        assert_eq!(unified_2a_2b_limits(0.19, 24.0), None);
    }

    #[test]
    fn short_engagement_fails() {
        // Worked by hand: 1/2-13, At 0.1419, same steel, k 0.6: external governs,
        // Le,req = 0.1419 / (0.6 × 0.778) = 0.304 in.
        let lim = unified_2a_2b_limits(0.5, 13.0).unwrap();
        let fu = Stress::ksi(120.0);
        let at = Area::in2(0.1419);
        let r = thread_engagement(&lim, 13.0, at, fu, fu, 0.6, Length::inch(0.25));
        assert!(r.ratio() > 1.0);
        assert!((Length::from_si(r.required.si).to_in() - 0.304).abs() < 0.001);
        let r = thread_engagement(&lim, 13.0, at, fu, fu, 0.6, Length::inch(0.5));
        assert!(r.ratio() <= 1.0);
        assert!(engagement_thread_count(13.0, Length::inch(0.2)).ratio() > 1.0);
        assert!(engagement_thread_count(13.0, Length::inch(0.25)).ratio() <= 1.0);
    }
}
