//! Piece-box fits of straight tube pieces, checked against hand calculations.
//!
//! Source: worked by hand (the arithmetic sits beside each check). Section size HSS2x2 outside
//! 2.000 x 2.000 in. (AISC Steel Construction Manual, 16th ed., Table 1-12, nominal size; corner
//! radius ignored, which only enlarges the box). Units: inches. Tolerance: 0.01 in. (the search
//! refines to 0.02°, which on a 123 in. piece leaves under 0.001 in. of extra size at the optimum).

use jointbook::audit::piece_box::{
    box_in_frame, piece_box, piece_box_rule, piece_solids, Attachment, Piece,
};
use jointbook::audit::{AuditStatus, MemberSolid, Point3, Roll, Section};
use jointbook::units::{Angle, Length};

fn in_(v: f64) -> Length {
    Length::inch(v)
}

/// A 10 ft HSS2x2 with a 3/8 x 2 x 6 in. tab slotted 3 in. into end B, projecting 3 in. past it.
fn tube_with_tab(a: Point3, b: Point3, roll_deg: f64) -> Piece {
    Piece {
        mark: "P1".into(),
        member: MemberSolid {
            a,
            b,
            section: Section::Rect {
                depth: in_(2.0),
                width: in_(2.0),
            },
            roll: Roll::Angle(Angle::deg(roll_deg)),
        },
        // Centre 120 in. from end A along the axis: the tab spans 117 .. 123 in.
        attachments: vec![Attachment {
            name: "tab".into(),
            center: [in_(120.0), in_(0.0), in_(0.0)],
            size: [in_(6.0), in_(2.0), in_(0.375)],
            roll: Angle::deg(0.0),
        }],
    }
}

fn assert_dims(got: [Length; 3], want: [f64; 3]) {
    for (g, w) in got.iter().zip(want) {
        assert!(
            (g.to_in() - w).abs() < 0.01,
            "{:?} vs {want:?}",
            got.map(|x| x.to_in())
        );
    }
}

#[test]
fn level_tube_with_tab_does_not_fit_an_8_by_1_by_1_ft_box() {
    // Worked by hand: length 120 + 3 = 123 in.; the tab (2 in. deep, 3/8 in. thick) stays inside
    // the 2 x 2 outline, so sizes 2 x 2 x 123 in. Against 12 x 12 x 96: margins 10, 10, −27 in.
    let p = tube_with_tab(
        Point3::inch(0.0, 0.0, 0.0),
        Point3::inch(120.0, 0.0, 0.0),
        0.0,
    );
    let limit = [Length::ft(8.0), Length::ft(1.0), Length::ft(1.0)];
    let fit = piece_box(&p, Some(limit)).unwrap();
    assert_dims(fit.dims, [2.0, 2.0, 123.0]);
    assert_dims(fit.margins.unwrap(), [10.0, 10.0, -27.0]);
    let r = piece_box_rule(&p, limit, "trailer").unwrap();
    assert_eq!(r.status, AuditStatus::Fail);
    assert!((Length::mm(r.margin.si).to_in() + 27.0).abs() < 0.01);
}

#[test]
fn same_piece_fits_an_11_by_1_by_1_ft_box() {
    // Worked by hand: 11 ft = 132 in.; margins 12 − 2 = 10, 10, 132 − 123 = 9 in.
    let p = tube_with_tab(
        Point3::inch(0.0, 0.0, 0.0),
        Point3::inch(120.0, 0.0, 0.0),
        0.0,
    );
    let r = piece_box_rule(
        &p,
        [Length::ft(1.0), Length::ft(11.0), Length::ft(1.0)],
        "kettle",
    )
    .unwrap();
    assert_eq!(r.status, AuditStatus::Pass);
    assert!((Length::mm(r.margin.si).to_in() - 9.0).abs() < 0.01);
}

#[test]
fn diagonal_rolled_member_finds_the_same_box() {
    // Worked by hand: ends (0,0,0) and (72, 96, 0) in.: √(72² + 96²) = √(5184 + 9216) = 120 in.,
    // the same piece placed on a diagonal and rolled 30°; the search turns back to 2 x 2 x 123.
    let p = tube_with_tab(
        Point3::inch(0.0, 0.0, 0.0),
        Point3::inch(72.0, 96.0, 0.0),
        30.0,
    );
    let fit = piece_box(
        &p,
        Some([Length::ft(11.0), Length::ft(1.0), Length::ft(1.0)]),
    )
    .unwrap();
    assert_dims(fit.dims, [2.0, 2.0, 123.0]);
}

#[test]
fn tab_turned_45_degrees_widens_the_box_in_the_member_frame() {
    // Worked by hand: a tab 4 in. deep x 3/8 in. turned 45° about the axis spans
    // (4 + 0.375) / √2 = 3.0936 in. along both section axes, past the tube's 2 in.; in the
    // member's own frame the box is 3.0936 x 3.0936 x 123 in. The search may only do better
    // (smaller volume), never worse.
    let mut p = tube_with_tab(
        Point3::inch(0.0, 0.0, 0.0),
        Point3::inch(120.0, 0.0, 0.0),
        0.0,
    );
    p.attachments[0].size = [in_(6.0), in_(4.0), in_(0.375)];
    p.attachments[0].roll = Angle::deg(45.0);
    let solids = piece_solids(&p).unwrap();
    let own = box_in_frame(&solids, &p.member.frame("P1").unwrap());
    assert_dims(own.map(Length::mm), [3.0936, 3.0936, 123.0]);
    let fit = piece_box(&p, None).unwrap();
    let vol = |d: [f64; 3]| d[0] * d[1] * d[2];
    assert!(vol(fit.dims.map(|d| d.si())) <= vol(own) + 1e-9);
}

// Weights. Tube weight per length, AISC Steel Construction Manual, 16th ed., Table 1-12 (from
// memory, consistent with A = 4 (B − t) t − (4 − π)((2t)² − t²) at nominal t × 3.40 lb/ft per in²):
// HSS2x2x1/8 3.05 lb/ft, HSS2x2x1/4 5.41 lb/ft. Steel 490 lb/ft³ (common practice) =
// 490 × 0.45359237 / 0.3048³ = 7849.0 kg/m³. Tolerance 0.01 lb.
use jointbook::audit::weight::{piece_weight, piece_weight_rule, structure_weight, FilletWeld};
use jointbook::units::{Density, Mass, MassPerLength};

fn steel() -> Density {
    Density::kg_per_m3(490.0 * 0.453_592_37 / 0.3048_f64.powi(3))
}

#[test]
fn ten_foot_hss2x2x1_8_with_tab_weld_and_bolt() {
    // Worked by hand: tube 3.05 × 10 = 30.50 lb; tab 6 × 2 × 0.375 = 4.5 in³ × 490/1728
    // = 1.2760 lb; weld 3/16 in. fillet, 8 in.: 0.1875²/2 × 8 = 0.140625 in³ × 0.28356
    // = 0.0399 lb; hardware 0.25 lb. Total 32.066 lb.
    let p = tube_with_tab(
        Point3::inch(0.0, 0.0, 0.0),
        Point3::inch(120.0, 0.0, 0.0),
        0.0,
    );
    let weld = FilletWeld {
        leg: in_(0.1875),
        length: in_(8.0),
        density: steel(),
    };
    let w = piece_weight(
        &p,
        MassPerLength::lb_per_ft(3.05),
        &[steel()],
        &[weld],
        &[Mass::lb(0.25)],
    )
    .unwrap();
    assert!((w.tube.to_lb() - 30.50).abs() < 0.01);
    assert!((w.attachments.to_lb() - 1.2760).abs() < 0.001);
    assert!((w.welds.to_lb() - 0.0399).abs() < 0.0005);
    assert!((w.total.to_lb() - 32.066).abs() < 0.01);
    let r = piece_weight_rule("P1", &w, Mass::lb(50.0), "lift");
    assert_eq!(r.status, AuditStatus::Pass);
    let r = piece_weight_rule("P1", &w, Mass::lb(30.0), "lift");
    assert_eq!(r.status, AuditStatus::Fail);
    // Worked by hand: a second piece of HSS2x2x1/4, 10 ft, no attachments: 54.10 lb; with 2 lb of
    // loose bolts the structure weighs 32.066 + 54.10 + 2 = 88.166 lb.
    let mut q = p.clone();
    q.attachments.clear();
    let w2 = piece_weight(&q, MassPerLength::lb_per_ft(5.41), &[], &[], &[]).unwrap();
    assert!((w2.total.to_lb() - 54.10).abs() < 0.01);
    let total = structure_weight(&[w, w2], &[Mass::lb(2.0)]);
    assert!((total.to_lb() - 88.166).abs() < 0.01);
    // A missing attachment density is an error, not a guess.
    assert!(piece_weight(&p, MassPerLength::lb_per_ft(3.05), &[], &[], &[]).is_err());
}

// Clear zones (worked by hand). Zone: x 40 .. 80, y −10 .. 10, z 20 .. 40 in.
use jointbook::audit::clear_zone::{clear_zone_rule, member_clearance, ClearZone};

fn zone() -> ClearZone {
    ClearZone {
        name: "walkway".into(),
        min: Point3::inch(40.0, -10.0, 20.0),
        max: Point3::inch(80.0, 10.0, 40.0),
    }
}

fn hss2x2(a: Point3, b: Point3) -> MemberSolid {
    MemberSolid {
        a,
        b,
        section: Section::Rect {
            depth: in_(2.0),
            width: in_(2.0),
        },
        roll: Roll::Angle(Angle::deg(0.0)),
    }
}

#[test]
fn member_beside_and_crossing_a_clear_zone() {
    // Beside: axis at z = 16 from x 0 to 120; top face z = 17; zone bottom z = 20 → clear 3 in.
    let m = hss2x2(Point3::inch(0.0, 0.0, 16.0), Point3::inch(120.0, 0.0, 16.0));
    let c = member_clearance("M1", &m, &zone()).unwrap();
    assert!(c.exact && (c.signed.to_in() - 3.0).abs() < 1e-9);
    // Crossing: axis at z = 21; bottom face z = 20 and top z = 22 → the tube must move down
    // 22 − 20 = 2 in. (or up 40 − 20 = 20 in., sideways 11 in.): penetration 2 in., signed −2.
    let m = hss2x2(Point3::inch(0.0, 0.0, 21.0), Point3::inch(120.0, 0.0, 21.0));
    let r = clear_zone_rule("M2", &m, &zone(), in_(0.0), "site").unwrap();
    assert_eq!(r.status, AuditStatus::Fail);
    assert!((Length::mm(r.margin.si).to_in() + 2.0).abs() < 1e-9);
    // Corner pass: a vertical tube at (35, 15) beside the zone's edge x = 40, y = 10: its nearest
    // corner (36, 14) is √(4² + 4²) = 5.6569 in. from the zone's vertical edge at (40, 10) (the
    // face-normal gaps alone would say 4).
    let m = hss2x2(
        Point3::inch(35.0, 15.0, 0.0),
        Point3::inch(35.0, 15.0, 60.0),
    );
    let c = member_clearance("C1", &m, &zone()).unwrap();
    assert!((c.signed.to_in() - 32.0_f64.sqrt()).abs() < 1e-9);
}

#[test]
fn round_member_clearance_is_never_over_estimated() {
    // A 2 in. round tube at z = 16: exact clearance 20 − 17 = 3 in.; the square-prism bound gives 3
    // too (face on). Beside the vertical edge as above, axis at (35, 15): exact clearance
    // √(5² + 5²) − 1 = 6.0711 in.; the bound must not exceed it.
    let mut m = hss2x2(Point3::inch(0.0, 0.0, 16.0), Point3::inch(120.0, 0.0, 16.0));
    m.section = Section::Round { diameter: in_(2.0) };
    let c = member_clearance("R1", &m, &zone()).unwrap();
    assert!(!c.exact && (c.signed.to_in() - 3.0).abs() < 1e-9);
    let mut v = hss2x2(
        Point3::inch(35.0, 15.0, 0.0),
        Point3::inch(35.0, 15.0, 60.0),
    );
    v.section = Section::Round { diameter: in_(2.0) };
    let c = member_clearance("R2", &v, &zone()).unwrap();
    let exact = 50.0_f64.sqrt() - 1.0;
    assert!(
        c.signed.to_in() <= exact + 1e-9 && c.signed.to_in() > exact - 0.05,
        "{}",
        c.signed.to_in()
    );
}

#[test]
fn rolled_square_tube_reaches_the_zone_with_its_corner() {
    // Worked by hand: a vertical HSS2x2 at (35, 0) rolled 45°: its corner lies √2 = 1.4142 in.
    // from the axis toward +x, at x = 36.4142; the zone face x = 40 → clear 3.5858 in. Moved to
    // x = 39: corner at 40.4142 → penetration 0.4142 in. (the least overlap, along x).
    let mut m = hss2x2(Point3::inch(35.0, 0.0, 0.0), Point3::inch(35.0, 0.0, 60.0));
    m.roll = Roll::Angle(Angle::deg(45.0));
    let c = member_clearance("C2", &m, &zone()).unwrap();
    assert!(
        (c.signed.to_in() - (5.0 - 2.0_f64.sqrt())).abs() < 1e-9,
        "{}",
        c.signed.to_in()
    );
    m.a = Point3::inch(39.0, 0.0, 0.0);
    m.b = Point3::inch(39.0, 0.0, 60.0);
    let c = member_clearance("C2", &m, &zone()).unwrap();
    assert!(
        (c.signed.to_in() - (1.0 - 2.0_f64.sqrt())).abs() < 1e-9,
        "{}",
        c.signed.to_in()
    );
}
