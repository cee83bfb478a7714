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
