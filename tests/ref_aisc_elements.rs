//! Reference checks of the AISC 360 J4 connecting-element, E3 buckling and D2 tension functions.
//!
//! Sources: AISC Steel Construction Manual, 16th ed., Table 4-14 (available critical stress,
//! Fy = 50 ksi, values from memory); hand-worked block-shear and tension cases from AISC 360-22
//! Eq. J4-5, J4-1, J4-2, D2-1 (marked "worked by hand"). Units: in., kip, ksi. Tolerance: ±1 in the
//! last printed digit for the Manual values, 1e-6 kip for the hand-worked ones.

use jointbook::standards::aisc360::d_tension::*;
use jointbook::standards::aisc360::e_compression::*;
use jointbook::standards::aisc360::j4_elements::*;
use jointbook::standards::aisc360::Edition;
use jointbook::standards::Method;
use jointbook::units::{Area, Force, Length, Stress};

const E22: Edition = Edition::Aisc360_22;

fn kip(q: jointbook::units::Quantity) -> f64 {
    Force::from_si(q.si).to_kip()
}

fn close(value: f64, printed: f64, tol: f64) {
    assert!(
        (value - printed).abs() <= tol,
        "{value} vs printed {printed}"
    );
}

#[test]
fn manual_table_4_14_critical_stress() {
    // Manual Table 4-14, Fy = 50 ksi, E = 29 000 ksi (from memory): Lc/r = 50 → 37.5 / 24.9 ksi;
    // 100 → 21.7 / 14.4 ksi; 200 → 5.65 / 3.76 ksi (φc Fcr / Fcr/Ωc). Ag = 1 in.² so kip = ksi.
    let cases = [
        (50.0, 37.5, 24.9, 0.1),
        (100.0, 21.7, 14.4, 0.1),
        (200.0, 5.65, 3.76, 0.01),
    ];
    for (slenderness, lrfd, asd, tol) in cases {
        let s = flexural_buckling(
            E22,
            Stress::ksi(50.0),
            Stress::ksi(29000.0),
            Area::in2(1.0),
            Length::inch(slenderness),
            Length::inch(1.0),
        )
        .unwrap();
        close(kip(s.available(Method::Lrfd)), lrfd, tol);
        close(kip(s.available(Method::Asd)), asd, tol);
    }
}

#[test]
fn block_shear_of_a_two_by_two_tab() {
    // Worked by hand (Eq. J4-5): 1/2 in. A36 tab (Fy 36, Fu 58), 3/4 in. bolts in 13/16 holes
    // (7/8 in. for net area), 2 rows × 2 lines, s = g = 3 in., end and side distance 1-1/2 in.
    // U path: Agv = 2 × 4.5 × 0.5 = 4.5, Anv = 2 × (4.5 − 1.5 × 0.875) × 0.5 = 3.1875,
    // Ant = (3 − 0.875) × 0.5 = 1.0625 in.²; rupture 0.6 × 58 × 3.1875 + 58 × 1.0625 = 172.55;
    // yield cap 0.6 × 36 × 4.5 + 61.625 = 158.825 kip governs → 119.1 / 79.4 kip.
    let tab = BoltedTab {
        rows: 2,
        columns: 2,
        pitch: Length::inch(3.0),
        gauge: Length::inch(3.0),
        end_distance: Length::inch(1.5),
        side_distance: Length::inch(1.5),
        t: Length::inch(0.5),
        hole_width: Length::inch(0.875),
    };
    let paths = tab_tear_paths(&tab).unwrap();
    let u = paths.iter().find(|p| p.name == "U").unwrap();
    let s = block_shear(
        E22,
        Stress::ksi(36.0),
        Stress::ksi(58.0),
        u.areas,
        TensionStress::Uniform,
    )
    .unwrap();
    close(kip(s.nominal), 158.825, 1e-6);
    close(kip(s.available(Method::Lrfd)), 119.11875, 1e-6);
    close(kip(s.available(Method::Asd)), 79.4125, 1e-6);
}

#[test]
fn plate_tension_worked_by_hand() {
    // Worked by hand: 4 × 1/2 in. A36 splice plate, one line of two 3/4 in. bolts across it
    // (7/8 in. net holes): Ag = 2.0, An = (4 − 2 × 0.875) × 0.5 = 1.125 in.² ≤ 0.85 Ag = 1.7.
    // Yield (J4-1): 72.0 kip → 64.8 / 43.1; rupture (J4-2): 58 × 1.125 = 65.25 → 48.9 / 32.6 kip.
    let y = plate_tension_yield(E22, Stress::ksi(36.0), Area::in2(2.0)).unwrap();
    close(kip(y.available(Method::Lrfd)), 64.8, 1e-6);
    close(kip(y.available(Method::Asd)), 72.0 / 1.67, 1e-6);
    let r = plate_tension_rupture(
        E22,
        Stress::ksi(58.0),
        TensionNetSection::BoltedSplice {
            an: Area::in2(1.125),
            ag: Area::in2(2.0),
        },
    )
    .unwrap();
    close(kip(r.nominal), 65.25, 1e-6);
    // D2-1 gives the same number for a member as J4-1 for an element (same equation form).
    let m = member_tension_yield(E22, Stress::ksi(36.0), Area::in2(2.0)).unwrap();
    close(kip(m.nominal), 72.0, 1e-6);
}

#[test]
fn element_capacities_never_fall_as_the_plate_thickens() {
    // Property loop: block shear, rupture and compression of a tab do not decrease with t.
    let mut last = [0.0; 3];
    for i in 1..=24 {
        let t = Length::inch(0.0625 * f64::from(i));
        let tab = BoltedTab {
            rows: 3,
            columns: 2,
            pitch: Length::inch(3.0),
            gauge: Length::inch(3.0),
            end_distance: Length::inch(1.25),
            side_distance: Length::inch(1.25),
            t,
            hole_width: Length::inch(0.875),
        };
        let bs = tab_tear_paths(&tab)
            .unwrap()
            .iter()
            .map(|p| {
                block_shear(
                    E22,
                    Stress::ksi(36.0),
                    Stress::ksi(58.0),
                    p.areas,
                    TensionStress::Uniform,
                )
                .unwrap()
                .nominal
                .si
            })
            .fold(f64::INFINITY, f64::min);
        let width = Length::inch(6.0);
        let ag = width * t;
        let rupture = plate_tension_rupture(
            E22,
            Stress::ksi(58.0),
            TensionNetSection::BoltedSplice {
                an: (width - 2.0 * Length::inch(0.875)) * t,
                ag,
            },
        )
        .unwrap()
        .nominal
        .si;
        let comp = plate_compression(
            E22,
            Stress::ksi(36.0),
            Stress::ksi(29000.0),
            ag,
            Length::inch(6.0),
            plate_radius_of_gyration(t),
        )
        .unwrap()
        .nominal
        .si;
        for (k, v) in [bs, rupture, comp].into_iter().enumerate() {
            assert!(v >= last[k], "quantity {k} fell at t = {} in.", t.to_in());
            last[k] = v;
        }
    }
}
