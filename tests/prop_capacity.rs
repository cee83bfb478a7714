//! Monotonicity properties of the limit-state functions: an available strength does not go down
//! when the part that resists gets thicker, an edge distance longer, or a bolt larger — where the
//! equations say so, and only there. Each property follows from the equations themselves (Rn is a
//! product of non-negative factors, one of which grows with the parameter), so it needs no
//! outside source; the clause is named beside each test. The inputs are a deterministic grid
//! (no random generator), every edition where the text differs (360-22 and 360-16), LRFD and ASD.
//!
//! What holds, and what is tested:
//! - thicker plate or wall t: bearing (J3.11 Eq. J3-6a/b/e), tear-out (J3-6c/d/f), bearing of a
//!   through-bolt on an HSS wall (J7 Eq. J7-1), block shear over the tab's tear paths (J4.3
//!   Eq. J4-5), tension yield and rupture of a plate with its holes (J4.1 Eq. J4-1, J4-2), a
//!   plate in compression (J4.4 Eq. J4-6, and E3 beyond Lc/r = 25: Ag and r both grow with t),
//!   shear yield and rupture of the base metal at a weld (J4.2 Eq. J4-3, J4-4);
//! - longer edge distance (le, hence lc = le − dh/2 at a fixed hole): tear-out; longer end or
//!   side distance: block shear;
//! - larger bolt d: the bolt's own strengths — shear (J3.7 Eq. J3-1, Table J3.2 with its
//!   footnotes: the A307 grip reduction shrinks as d grows), tension (J3-1), tension with a
//!   fixed shear force (J3.8 Eq. J3-2, J3-3a/b: frv falls as Ab grows), bearing at a fixed lc
//!   and t (J3-6a/b/e) and on an HSS wall (J7-1);
//! - larger fillet leg: weld rupture of an end-loaded line (J2.4 Eq. J2-3 with the long-weld
//!   factor β of J2.2b, which grows as l/w falls).
//!
//! What does not hold, and is tested the other way round: a larger bolt at fixed hole centres
//! has a larger hole (Table J3.3), so its tear-out (lc = le − dh/2) and the net section of a
//! tube through its holes (D3 Eq. D3-1, D2 Eq. D2-2) do not increase; a thicker tab in a
//! slotted tube widens the slot, so the tube's net rupture at the slot (D2-2) does not
//! increase either. A thicker ply under the bolt head can also move a shear plane past the end
//! of the plain shank (the threads are then in that plane and Fnv drops, Table J3.2): bolt shear
//! is not monotonic in ply thickness in general. End to end, the demo with every tab 1/16 in.
//! thicker gets no lower available strength on any strength check except the tube at the slot,
//! which must not rise; no shear plane of the demo changes its thread condition at that step,
//! and the test would catch it if one did.

use jointbook::checks::{check_model, Report};
use jointbook::model::{load, DetailKind, LoadOptions};
use jointbook::standards::aisc360::d3_slotted as d3;
use jointbook::standards::aisc360::d_tension;
use jointbook::standards::aisc360::e_compression::plate_radius_of_gyration;
use jointbook::standards::aisc360::j2_welds as j2;
use jointbook::standards::aisc360::j3_bolts::{self as j3, BearingHole, HoleDeformation};
use jointbook::standards::aisc360::j4_elements::{self as j4, BoltedTab, TensionNetSection};
use jointbook::standards::aisc360::j7_bearing;
use jointbook::standards::aisc360::Edition;
use jointbook::standards::{Method, Strength};
use jointbook::units::{Angle, Length, Stress};
use std::collections::BTreeMap;
use std::path::Path;

const EDITIONS: [Edition; 2] = [Edition::Aisc360_22, Edition::Aisc360_16];
const METHODS: [Method; 2] = [Method::Lrfd, Method::Asd];
const HOLES: [BearingHole; 2] = [
    BearingHole::RoundOrParallelSlot,
    BearingHole::LongSlotPerpendicular,
];
const DEFORMATIONS: [HoleDeformation; 2] = [
    HoleDeformation::DesignConsideration,
    HoleDeformation::NotDesignConsideration,
];
/// Inch bolt sizes of the catalogue's range, 1/4 to 1-1/2 in.
const DIAMETERS_IN: [f64; 13] = [
    0.25, 0.3125, 0.375, 0.4375, 0.5, 0.625, 0.75, 0.875, 1.0, 1.125, 1.25, 1.375, 1.5,
];

/// 1/8 in. to 1 in. in sixteenths.
fn thicknesses() -> Vec<Length> {
    (2..=16)
        .map(|i| Length::inch(f64::from(i) / 16.0))
        .collect()
}

/// 1/2 in. to 3 in. in sixteenths.
fn distances() -> Vec<Length> {
    (8..=48)
        .map(|i| Length::inch(f64::from(i) / 16.0))
        .collect()
}

fn available(s: &Strength, m: Method) -> f64 {
    s.available(m).si
}

/// The sequence of available strengths, in the order of the growing parameter, never falls
/// (beyond floating-point rounding).
fn assert_nondecreasing(what: &str, values: &[f64]) {
    for (i, w) in values.windows(2).enumerate() {
        assert!(
            w[1] >= w[0] * (1.0 - 1e-12) - 1e-9,
            "{what}: falls from {} to {} at step {}",
            w[0],
            w[1],
            i + 1
        );
    }
}

fn assert_nonincreasing(what: &str, values: &[f64]) {
    let reversed: Vec<f64> = values.iter().rev().copied().collect();
    assert_nondecreasing(&format!("{what} (reversed)"), &reversed);
}

fn bolt(grade: j3::BoltGrade, d: f64, threads: j3::Threads) -> j3::Bolt {
    j3::Bolt {
        grade,
        d: Length::inch(d),
        series: j3::Series::Inch,
        threads,
    }
}

fn grades() -> Vec<j3::BoltGrade> {
    vec![
        j3::BoltGrade::A307,
        j3::BoltGrade::Group120,
        j3::BoltGrade::Group150,
        j3::BoltGrade::ThreadedPart {
            fu: Stress::ksi(58.0),
        },
        j3::BoltGrade::OtherGrade {
            name: "SAE J429 Gr 5".into(),
            fu: Stress::ksi(120.0),
        },
    ]
}

/// Property (AISC 360 J3.7 Eq. J3-1, Table J3.2 with its long-joint and A307-grip footnotes): a
/// larger bolt has no lower shear or tension strength, every grade, thread condition, plane
/// count, joint length and grip.
#[test]
fn bolt_shear_and_tension_do_not_fall_with_a_larger_bolt() {
    let loadings = [
        j3::JointLoading::NotEndLoaded,
        j3::JointLoading::EndLoaded {
            pattern_length: Length::inch(12.0),
        },
        j3::JointLoading::EndLoaded {
            pattern_length: Length::inch(40.0),
        },
    ];
    for ed in EDITIONS {
        for grade in grades() {
            for threads in [j3::Threads::NotExcluded, j3::Threads::Excluded] {
                for loading in loadings {
                    for grip in [1.0, 4.0, 8.0] {
                        for m in METHODS {
                            let mut shear = [Vec::new(), Vec::new()];
                            let mut tension = Vec::new();
                            for d in DIAMETERS_IN {
                                let b = bolt(grade.clone(), d, threads);
                                let st = j3::table_j3_2(ed, &b, loading, Some(Length::inch(grip)))
                                    .unwrap();
                                for (planes, v) in shear.iter_mut().enumerate() {
                                    let s = j3::bolt_shear(ed, &st, b.d, planes as u32 + 1);
                                    v.push(available(&s.unwrap(), m));
                                }
                                tension
                                    .push(available(&j3::bolt_tension(ed, &st, b.d).unwrap(), m));
                            }
                            let case = format!(
                                "{ed:?} {grade:?} {threads:?} {loading:?} grip {grip} {m:?}"
                            );
                            assert_nondecreasing(&format!("bolt_shear 1 plane, {case}"), &shear[0]);
                            assert_nondecreasing(
                                &format!("bolt_shear 2 planes, {case}"),
                                &shear[1],
                            );
                            assert_nondecreasing(&format!("bolt_tension, {case}"), &tension);
                        }
                    }
                }
            }
        }
    }
}

/// Property (AISC 360 J3.8 Eq. J3-2 with J3-3a / J3-3b): at a fixed shear force on the bolt, a
/// larger bolt has no lower tensile strength (frv = V / Ab falls, Ab grows).
#[test]
fn bolt_tension_with_a_fixed_shear_force_does_not_fall_with_a_larger_bolt() {
    for ed in EDITIONS {
        for grade in grades() {
            for v_kip in [0.0, 1.0, 3.0, 8.0, 20.0] {
                for m in METHODS {
                    let values: Vec<f64> = DIAMETERS_IN
                        .iter()
                        .map(|&d| {
                            let b = bolt(grade.clone(), d, j3::Threads::NotExcluded);
                            let st = j3::table_j3_2(
                                ed,
                                &b,
                                j3::JointLoading::NotEndLoaded,
                                Some(b.d * 2.0),
                            )
                            .unwrap();
                            let ab = j3::nominal_body_area(b.d);
                            let frv = Stress::mpa(v_kip * 4448.2216152605 / ab.si());
                            available(
                                &j3::bolt_tension_with_shear(ed, &st, b.d, frv, m).unwrap(),
                                m,
                            )
                        })
                        .collect();
                    assert_nondecreasing(
                        &format!("bolt_tension with V = {v_kip} kip, {ed:?} {grade:?} {m:?}"),
                        &values,
                    );
                }
            }
        }
    }
}

/// Property (AISC 360-22 J3.11 Eq. J3-6a/b/e, 360-16 J3.10): bearing does not fall with a larger
/// bolt or a thicker ply.
#[test]
fn bearing_does_not_fall_with_a_larger_bolt_or_a_thicker_ply() {
    let fu = Stress::ksi(58.0);
    for ed in EDITIONS {
        for hole in HOLES {
            for def in DEFORMATIONS {
                for m in METHODS {
                    for t in thicknesses() {
                        let v: Vec<f64> = DIAMETERS_IN
                            .iter()
                            .map(|&d| {
                                available(
                                    &j3::bolt_bearing(ed, Length::inch(d), t, fu, hole, def)
                                        .unwrap(),
                                    m,
                                )
                            })
                            .collect();
                        assert_nondecreasing(
                            &format!("bolt_bearing over d, t {t:?} {ed:?} {hole:?} {def:?} {m:?}"),
                            &v,
                        );
                    }
                    for d in DIAMETERS_IN {
                        let v: Vec<f64> = thicknesses()
                            .into_iter()
                            .map(|t| {
                                available(
                                    &j3::bolt_bearing(ed, Length::inch(d), t, fu, hole, def)
                                        .unwrap(),
                                    m,
                                )
                            })
                            .collect();
                        assert_nondecreasing(
                            &format!("bolt_bearing over t, d {d} {ed:?} {hole:?} {def:?} {m:?}"),
                            &v,
                        );
                    }
                }
            }
        }
    }
}

/// Property (AISC 360-22 J3.11 Eq. J3-6c/d/f): at a fixed hole, tear-out does not fall with a
/// longer edge distance or a thicker ply; at fixed hole centres it does not rise with a larger
/// bolt, whose standard hole (Table J3.3) is larger — the bigger-bolt property does not hold here.
#[test]
fn tearout_grows_with_edge_and_thickness_and_not_with_a_larger_bolt_at_fixed_centres() {
    let fu = Stress::ksi(58.0);
    for ed in EDITIONS {
        for hole in HOLES {
            for def in DEFORMATIONS {
                for m in METHODS {
                    for d in [0.5, 0.625, 0.75, 0.875, 1.0] {
                        let dh = j3::hole_size(
                            ed,
                            j3::Series::Inch,
                            Length::inch(d),
                            j3::HoleType::Standard,
                        )
                        .unwrap()
                        .length;
                        for t in thicknesses() {
                            let v: Vec<f64> = distances()
                                .into_iter()
                                .map(|le| j3::clear_distance_to_edge(le, dh))
                                .filter(|lc| lc.si() > 0.0)
                                .map(|lc| {
                                    available(
                                        &j3::bolt_tearout(ed, lc, t, fu, hole, def).unwrap(),
                                        m,
                                    )
                                })
                                .collect();
                            assert!(v.len() > 10);
                            assert_nondecreasing(&format!("bolt_tearout over le, d {d} t {t:?} {ed:?} {hole:?} {def:?} {m:?}"), &v);
                        }
                        let lc = j3::clear_distance_to_edge(Length::inch(1.5), dh);
                        let v: Vec<f64> = thicknesses()
                            .into_iter()
                            .map(|t| {
                                available(&j3::bolt_tearout(ed, lc, t, fu, hole, def).unwrap(), m)
                            })
                            .collect();
                        assert_nondecreasing(
                            &format!("bolt_tearout over t, d {d} {ed:?} {m:?}"),
                            &v,
                        );
                    }
                    for le in [1.25, 1.5, 2.0] {
                        let v: Vec<f64> = [0.5, 0.625, 0.75, 0.875, 1.0]
                            .iter()
                            .map(|&d| {
                                let dh = j3::hole_size(
                                    ed,
                                    j3::Series::Inch,
                                    Length::inch(d),
                                    j3::HoleType::Standard,
                                )
                                .unwrap()
                                .length;
                                let lc = j3::clear_distance_to_edge(Length::inch(le), dh);
                                available(
                                    &j3::bolt_tearout(ed, lc, Length::inch(0.25), fu, hole, def)
                                        .unwrap(),
                                    m,
                                )
                            })
                            .collect();
                        assert_nonincreasing(
                            &format!("bolt_tearout over d at le {le}, {ed:?} {m:?}"),
                            &v,
                        );
                    }
                }
            }
        }
    }
}

/// Property (AISC 360 J7 Eq. J7-1 and J3.11 Eq. J3-6c applied to an HSS wall): a through-bolt's
/// bearing on a tube wall does not fall with a thicker wall or a larger bolt; the wall's tear-out
/// does not fall with a thicker wall or a longer clear distance.
#[test]
fn hss_wall_bearing_and_tearout_grow_with_wall_bolt_and_distance() {
    let (fy, fu) = (Stress::ksi(50.0), Stress::ksi(62.0));
    for ed in EDITIONS {
        for m in METHODS {
            for t in thicknesses() {
                let v: Vec<f64> = DIAMETERS_IN
                    .iter()
                    .map(|&d| {
                        available(
                            &j7_bearing::hss_through_bolt_bearing(ed, fy, Length::inch(d), t)
                                .unwrap(),
                            m,
                        )
                    })
                    .collect();
                assert_nondecreasing(&format!("HSS bearing over d, t {t:?} {ed:?} {m:?}"), &v);
                let v: Vec<f64> = distances()
                    .into_iter()
                    .map(|lc| available(&j3::hss_through_bolt_tearout(ed, lc, t, fu).unwrap(), m))
                    .collect();
                assert_nondecreasing(&format!("HSS tear-out over lc, t {t:?} {ed:?} {m:?}"), &v);
            }
            for d in DIAMETERS_IN {
                let v: Vec<f64> = thicknesses()
                    .into_iter()
                    .map(|t| {
                        available(
                            &j7_bearing::hss_through_bolt_bearing(ed, fy, Length::inch(d), t)
                                .unwrap(),
                            m,
                        )
                    })
                    .collect();
                assert_nondecreasing(&format!("HSS bearing over t, d {d} {ed:?} {m:?}"), &v);
            }
        }
    }
}

/// The least block-shear strength over the tab's tear paths (AISC 360 J4.3 Eq. J4-5), as the tab
/// check takes it.
fn block_shear_of(ed: Edition, tab: &BoltedTab, tension: j4::TensionStress, m: Method) -> f64 {
    let (fy, fu) = (Stress::ksi(36.0), Stress::ksi(58.0));
    j4::tab_tear_paths(tab)
        .unwrap()
        .into_iter()
        .map(|p| available(&j4::block_shear(ed, fy, fu, p.areas, tension).unwrap(), m))
        .fold(f64::INFINITY, f64::min)
}

/// Property (AISC 360 J4.3 Eq. J4-5 over the U and L tear paths): block shear does not fall with
/// a thicker plate, a longer end distance or a longer side distance.
#[test]
fn block_shear_grows_with_thickness_end_and_side_distance() {
    let dh = Length::inch(9.0 / 16.0 + 1.0 / 16.0);
    for ed in EDITIONS {
        for m in METHODS {
            for tension in [j4::TensionStress::Uniform, j4::TensionStress::NonUniform] {
                for (rows, columns) in [(1, 1), (2, 1), (3, 1), (2, 2), (3, 2)] {
                    let base = BoltedTab {
                        rows,
                        columns,
                        pitch: Length::inch(1.5),
                        gauge: Length::inch(1.5),
                        end_distance: Length::inch(1.0),
                        side_distance: Length::inch(0.75),
                        t: Length::inch(0.25),
                        hole_width: dh,
                    };
                    let case = format!("{rows}x{columns} {tension:?} {ed:?} {m:?}");
                    let v: Vec<f64> = thicknesses()
                        .into_iter()
                        .map(|t| block_shear_of(ed, &BoltedTab { t, ..base }, tension, m))
                        .collect();
                    assert_nondecreasing(&format!("block_shear over t, {case}"), &v);
                    let v: Vec<f64> = distances()
                        .into_iter()
                        .map(|le| {
                            block_shear_of(
                                ed,
                                &BoltedTab {
                                    end_distance: le,
                                    ..base
                                },
                                tension,
                                m,
                            )
                        })
                        .collect();
                    assert_nondecreasing(&format!("block_shear over the end distance, {case}"), &v);
                    let v: Vec<f64> = distances()
                        .into_iter()
                        .map(|ls| {
                            block_shear_of(
                                ed,
                                &BoltedTab {
                                    side_distance: ls,
                                    ..base
                                },
                                tension,
                                m,
                            )
                        })
                        .collect();
                    assert_nondecreasing(
                        &format!("block_shear over the side distance, {case}"),
                        &v,
                    );
                }
            }
        }
    }
}

/// Property (AISC 360 J4.1 Eq. J4-1 and J4-2, An ≤ 0.85 Ag for a bolted splice): a thicker plate
/// with the same holes has no lower tension yield or rupture strength.
#[test]
fn plate_tension_grows_with_thickness() {
    let (fy, fu) = (Stress::ksi(36.0), Stress::ksi(58.0));
    let w = Length::inch(4.0);
    for ed in EDITIONS {
        for m in METHODS {
            for holes in [0.0, 1.0, 2.0] {
                let dh = Length::inch(0.625) * holes;
                let yield_: Vec<f64> = thicknesses()
                    .into_iter()
                    .map(|t| available(&j4::plate_tension_yield(ed, fy, w * t).unwrap(), m))
                    .collect();
                let rupture: Vec<f64> = thicknesses()
                    .into_iter()
                    .map(|t| {
                        let s = TensionNetSection::BoltedSplice {
                            an: (w - dh) * t,
                            ag: w * t,
                        };
                        available(&j4::plate_tension_rupture(ed, fu, s).unwrap(), m)
                    })
                    .collect();
                assert_nondecreasing(&format!("plate_tension_yield, {ed:?} {m:?}"), &yield_);
                assert_nondecreasing(
                    &format!("plate_tension_rupture, {holes} holes, {ed:?} {m:?}"),
                    &rupture,
                );
            }
        }
    }
}

/// Property (AISC 360 J4.4 Eq. J4-6 for Lc/r ≤ 25, E3 Eq. E3-2 / E3-3 beyond): a thicker plate has
/// no lower compressive strength (Ag and r = t/√12 both grow), across the step between the two
/// branches; a longer effective length gives no higher strength.
#[test]
fn plate_compression_grows_with_thickness_and_falls_with_length() {
    let (fy, e) = (Stress::ksi(36.0), Stress::ksi(29000.0));
    let w = Length::inch(1.5);
    for ed in EDITIONS {
        for m in METHODS {
            for lc_in in [0.5, 1.0, 1.8, 3.0, 6.0, 12.0, 24.0] {
                let lc = Length::inch(lc_in);
                let v: Vec<f64> = thicknesses()
                    .into_iter()
                    .map(|t| {
                        available(
                            &j4::plate_compression(
                                ed,
                                fy,
                                e,
                                w * t,
                                lc,
                                plate_radius_of_gyration(t),
                            )
                            .unwrap(),
                            m,
                        )
                    })
                    .collect();
                assert_nondecreasing(
                    &format!("plate_compression over t, Lc {lc_in} in, {ed:?} {m:?}"),
                    &v,
                );
            }
            for t in thicknesses() {
                let v: Vec<f64> = (1..=96)
                    .map(|i| {
                        let lc = Length::inch(f64::from(i) / 4.0);
                        available(
                            &j4::plate_compression(
                                ed,
                                fy,
                                e,
                                w * t,
                                lc,
                                plate_radius_of_gyration(t),
                            )
                            .unwrap(),
                            m,
                        )
                    })
                    .collect();
                assert_nonincreasing(
                    &format!("plate_compression over Lc, t {t:?}, {ed:?} {m:?}"),
                    &v,
                );
            }
        }
    }
}

/// Property (AISC 360 J4.2 Eq. J4-3 and J4-4 at a weld, J2.4 Eq. J2-3 with β of J2.2b): the base
/// metal along a weld has no lower shear yield or rupture strength when thicker, and an
/// end-loaded fillet no lower rupture strength with a larger leg.
#[test]
fn weld_base_metal_and_fillet_grow_with_thickness_and_leg() {
    let (fy, fu, fexx) = (Stress::ksi(36.0), Stress::ksi(58.0), Stress::ksi(70.0));
    for ed in EDITIONS {
        for m in METHODS {
            for l_in in [1.0, 2.0, 8.0, 40.0] {
                let l = Length::inch(l_in);
                let y: Vec<f64> = thicknesses()
                    .into_iter()
                    .map(|t| {
                        available(
                            &j2::weld_base_metal_shear_yielding(ed, fy, t, l).unwrap(),
                            m,
                        )
                    })
                    .collect();
                let r: Vec<f64> = thicknesses()
                    .into_iter()
                    .map(|t| {
                        available(&j2::weld_base_metal_shear_rupture(ed, fu, t, l).unwrap(), m)
                    })
                    .collect();
                assert_nondecreasing(
                    &format!("weld_base_metal_yield over t, l {l_in}, {ed:?} {m:?}"),
                    &y,
                );
                assert_nondecreasing(
                    &format!("weld_base_metal_rupture over t, l {l_in}, {ed:?} {m:?}"),
                    &r,
                );
                let w: Vec<f64> = (1..=8)
                    .map(|i| {
                        let line = j2::FilletLine {
                            size: Length::inch(f64::from(i) / 16.0),
                            length: l,
                            angle: Angle::deg(0.0),
                            end_loaded: true,
                        };
                        available(&j2::fillet_weld_rupture(ed, fexx, &line, false).unwrap(), m)
                    })
                    .collect();
                assert_nondecreasing(
                    &format!("weld_strength over the leg, l {l_in}, {ed:?} {m:?}"),
                    &w,
                );
            }
        }
    }
}

/// The reverse property (AISC 360 D2 Eq. D2-2 with D3 Eq. D3-1, and the slotted-tube net area):
/// a wider hole or slot — a larger bolt, or a thicker tab in the slot — gives the tube no higher
/// net rupture strength. The bigger-bolt and thicker-tab properties do not hold for the tube.
#[test]
fn tube_net_rupture_does_not_rise_with_a_wider_hole_or_slot() {
    let fu = Stress::ksi(62.0);
    let ag = jointbook::units::Area::in2(1.0);
    let wall = Length::inch(0.174);
    for ed in EDITIONS {
        for m in METHODS {
            let lag = d_tension::shear_lag_all_elements(ed);
            let holes: Vec<f64> = (4..=16)
                .map(|i| {
                    let dh = Length::inch(f64::from(i) / 16.0);
                    let an = d_tension::tube_net_area_through_bolts(ag, wall, dh, 2).unwrap();
                    available(
                        &d_tension::member_tension_rupture(ed, fu, an, &lag).unwrap(),
                        m,
                    )
                })
                .collect();
            assert_nonincreasing(
                &format!("tube net rupture over the hole, {ed:?} {m:?}"),
                &holes,
            );
            let lag = d3::shear_lag_rectangular(
                ed,
                d3::RectangularGusset::SingleConcentric,
                Length::inch(1.5),
                Length::inch(1.5),
                Length::inch(2.0),
            )
            .unwrap();
            let slots: Vec<f64> = thicknesses()
                .into_iter()
                .map(|t| {
                    let slot = d3::slot_width(t, Length::inch(1.0 / 16.0));
                    available(
                        &d3::slotted_tube_tensile_rupture(ed, fu, ag, wall, Some(slot), &lag)
                            .unwrap(),
                        m,
                    )
                })
                .collect();
            assert_nonincreasing(
                &format!("tube net rupture over the tab in the slot, {ed:?} {m:?}"),
                &slots,
            );
        }
    }
}

/// (connection, limit state, subject, load case) → available strength, for every strength check.
fn strengths(r: &Report) -> BTreeMap<(String, String, String, String), f64> {
    let mut out = BTreeMap::new();
    for c in &r.connections {
        for k in c.checks.iter().filter(|k| k.nominal.is_some()) {
            let key = (
                c.id.clone(),
                k.limit_state.to_string(),
                k.subject.clone(),
                k.load_case.clone().unwrap_or_default(),
            );
            assert!(
                out.insert(key, k.available.si).is_none(),
                "two checks under one key"
            );
        }
    }
    out
}

/// End to end, the demo read through the library with every tab 1/16 in. thicker: no strength
/// check gets a lower available strength, except the tube's net rupture at the slot, which the
/// wider slot must not raise (see the file's comment); and the checks are the same set.
#[test]
fn a_thicker_tab_lowers_no_available_strength_of_the_demo() {
    let path =
        Path::new(env!("CARGO_MANIFEST_DIR")).join("examples/quillon-brook-footbridge/model.toml");
    let model = load(&path, &LoadOptions::default()).expect("the demo reads");
    let before = strengths(&check_model(&model));
    let mut thicker = model.clone();
    let mut tabs = 0;
    for d in &mut thicker.details {
        if let DetailKind::Tab(t) = &mut d.kind {
            t.tab.thickness = t.tab.thickness + Length::inch(1.0 / 16.0);
            tabs += 1;
        }
    }
    assert!(tabs >= 2, "the demo has tab details");
    let after = strengths(&check_model(&thicker));
    assert_eq!(
        before.keys().collect::<Vec<_>>(),
        after.keys().collect::<Vec<_>>(),
        "the same checks before and after"
    );
    let mut slot_checks = 0;
    let mut raised = 0;
    for (key, a) in &before {
        let b = after[key];
        if key.1 == "tube_net_rupture" && key.2 == "member at the slot" {
            slot_checks += 1;
            assert!(
                b <= a * (1.0 + 1e-12),
                "{key:?}: the wider slot raised {a} to {b}"
            );
        } else {
            assert!(
                b >= a * (1.0 - 1e-12),
                "{key:?}: the thicker tab lowered {a} to {b}"
            );
            if b > a * (1.0 + 1e-9) {
                raised += 1;
            }
        }
    }
    assert!(slot_checks > 0, "the demo has tube_net_rupture at a slot");
    assert!(
        raised > 0,
        "a thicker tab raises some strengths (bearing, block shear, ...)"
    );
}

/// The demo with one change made to every tab detail, against the demo as it is: the same set
/// of checks, and no available strength lower after the change (the property of this file); at
/// least one higher, so the change reached the checks.
fn no_strength_falls(what: &str, change: impl Fn(&mut jointbook::model::TabDetail)) {
    let path =
        Path::new(env!("CARGO_MANIFEST_DIR")).join("examples/quillon-brook-footbridge/model.toml");
    let model = load(&path, &LoadOptions::default()).expect("the demo reads");
    let before = strengths(&check_model(&model));
    let mut changed = model.clone();
    for d in &mut changed.details {
        if let DetailKind::Tab(t) = &mut d.kind {
            change(t);
        }
    }
    let after = strengths(&check_model(&changed));
    assert_eq!(
        before.keys().collect::<Vec<_>>(),
        after.keys().collect::<Vec<_>>(),
        "{what}: the same checks before and after"
    );
    let mut raised = 0;
    for (key, a) in &before {
        let b = after[key];
        assert!(
            b >= a * (1.0 - 1e-12),
            "{what}: {key:?} fell from {a} to {b}"
        );
        if b > a * (1.0 + 1e-9) {
            raised += 1;
        }
    }
    assert!(
        raised > 0,
        "{what}: no strength rose, so the change reached no check"
    );
}

/// A thicker mate (gusset) raises its bearing, tear-out, tension and compression and the chord
/// wall under it (K2-12 grows with tp), and lowers nothing.
#[test]
fn a_thicker_mate_lowers_no_available_strength_of_the_demo() {
    no_strength_falls("mate 1/16 in. thicker", |t| {
        t.mate.thickness = t.mate.thickness + Length::inch(1.0 / 16.0)
    });
}

/// Longer end distances of the tab and of the mate raise their tear-out and block shear, and
/// lower nothing.
#[test]
fn longer_end_distances_lower_no_available_strength_of_the_demo() {
    no_strength_falls("tab end distance 1/4 in. longer", |t| {
        t.tab.end_distance = t.tab.end_distance + Length::inch(0.25)
    });
    no_strength_falls("mate end distance 1/4 in. longer", |t| {
        t.mate.end_distance = t.mate.end_distance + Length::inch(0.25)
    });
}
