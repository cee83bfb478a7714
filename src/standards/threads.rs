//! Screw-thread geometry: ASME B1.1 (Unified inch screw threads) and ISO 724 / ISO 898-1 (ISO
//! general-purpose metric threads).

use crate::units::{Area, Length};

/// Tensile stress area of a Unified inch thread, ASME B1.1-2019 §10.1 (= AISC 360-22 Eq. A-3-7
/// form): As = 0.7854 (D − 0.9743 / n)², with D the basic major diameter and n threads per inch.
#[allow(clippy::approx_constant)] // 0.7854 is the coefficient as the standard prints it
pub fn tensile_stress_area_unified(d: Length, threads_per_inch: f64) -> Area {
    let d_in = d.to_in();
    let x = d_in - 0.9743 / threads_per_inch;
    Area::in2(0.7854 * x * x)
}

/// Tensile stress area of an ISO metric thread, ISO 898-1:2013 §9.1.6.1, Eq. (1) note:
/// As,nom = (π/4) ((d2 + d3)/2)², with d2 = d − 0.649519 P and d3 = d − 1.226869 P.
pub fn tensile_stress_area_metric(d: Length, pitch: Length) -> Area {
    let d = d.to_mm();
    let p = pitch.to_mm();
    let d2 = d - 0.649_519 * p;
    let d3 = d - 1.226_869 * p;
    let m = (d2 + d3) / 2.0;
    Area::mm2(std::f64::consts::FRAC_PI_4 * m * m)
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn unified_stress_areas_match_the_b1_1_table() {
        // ASME B1.1 table of tensile stress areas (also AISC Manual Table 7-17), in.², printed to
        // three or four figures; REFERENCES.md rows. Compared at the printed precision.
        let cases = [
            (0.25, 20.0, 0.0318),
            (0.375, 16.0, 0.0775),
            (0.5, 13.0, 0.1419),
            (0.75, 10.0, 0.334),
        ];
        for (d, n, printed) in cases {
            let a = tensile_stress_area_unified(Length::inch(d), n).to_in2();
            let tol = if printed < 0.2 { 0.00005 } else { 0.0005 };
            assert!((a - printed).abs() <= tol, "{d}-{n}: {a} vs {printed}");
        }
    }

    #[test]
    fn metric_stress_areas_match_iso_898_1() {
        // ISO 898-1:2013 Table 4 (As,nom, mm²): M12 84.3, M16 157, M20 245.
        let cases = [
            (12.0, 1.75, 84.3, 0.05),
            (16.0, 2.0, 157.0, 0.5),
            (20.0, 2.5, 245.0, 0.5),
        ];
        for (d, p, printed, tol) in cases {
            let a = tensile_stress_area_metric(Length::mm(d), Length::mm(p)).to_mm2();
            assert!((a - printed).abs() <= tol, "M{d}: {a} vs {printed}");
        }
    }
}
