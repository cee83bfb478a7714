//! The fit of a sleeve in the member it slides into, and its insertion: geometry and the tube
//! standards' size tolerances, not a strength.
//!
//! The tightest fit takes the member's outside size at its least and its wall at its thickest,
//! the sleeve's outside size at its largest, and the member's inside seam; the loosest the
//! reverse, without the seam. Both section outlines are convex and centrally symmetric, so the
//! sleeve fits somewhere exactly when it fits centred, and the centred clearance in a direction
//! u is the difference of the two outlines' support functions h(u) (for a rounded rectangle of
//! half-widths a, b and corner radius r: h(u) = (a − r)|ux| + (b − r)|uy| + r). The least of it
//! over all directions is the flats' clearance unless the member's inside corners are rounder
//! than the sleeve's outside corners by more than that, when the corners touch first.

use super::ConnectionReport;
use crate::catalogue::{Section, Shape, Tolerance};
use crate::model::{Member, Model, SleeveDetail};
use crate::standards::{Bound, Citation, Input, Requirement};
use crate::units::Length;

/// The common-practice band of total clearance when the detail gives none.
const DEFAULT_CLEARANCE_MIN_IN: f64 = 1.0 / 32.0;
const DEFAULT_CLEARANCE_MAX_IN: f64 = 1.0 / 4.0;
/// The common-practice least insertion: this many times the member's larger outside dimension.
const DEFAULT_INSERTION_FACTOR: f64 = 1.5;

/// The ± tolerance of a section's standard for one dimension ("outside" or "wall").
fn tolerance(model: &Model, s: &Section, dimension: &str, size: Length) -> Option<Length> {
    let shape = match s.shape {
        Shape::Rect { .. } => "rect",
        Shape::Round { .. } => "round",
    };
    model
        .tolerances
        .iter()
        .filter(|t: &&Tolerance| t.standard == s.standard && t.shape == shape)
        .find(|t| t.dimension == dimension)
        .and_then(|t| t.at(size))
}

/// Largest outside corner radius the section's standard allows, with its source: ASTM A500
/// (2021) §11: 3 t; EN 10219-2 (2006) Table 2: 2.4 t to t = 6 mm, 2.8 t to 10 mm, 3.6 t above.
/// Both from memory.
fn corner_radius_max(s: &Section) -> Option<(Length, &'static str)> {
    let t = s.t_nominal;
    match s.standard.as_str() {
        "ASTM A500" => Some((
            t * 3.0,
            "ASTM A500 §11: outside corner radius at most 3 t (from memory)",
        )),
        "EN 10219" => {
            let k = if t.to_mm() <= 6.0 {
                2.4
            } else if t.to_mm() <= 10.0 {
                2.8
            } else {
                3.6
            };
            Some((t * k, "EN 10219-2 Table 2: outside corner radius at most 2.4 t / 2.8 t / 3.6 t (from memory)"))
        }
        _ => None,
    }
}

/// Least outside corner radius of the sleeve: EN 10219-2 (2006) Table 2: 1.6 t / 2.0 t / 2.4 t
/// (from memory); other standards set none, and the catalogue's property radius is used.
fn corner_radius_min(s: &Section) -> (Length, &'static str) {
    let t = s.t_nominal;
    match (s.standard.as_str(), s.r_outer) {
        ("EN 10219", _) => {
            let k = if t.to_mm() <= 6.0 { 1.6 } else if t.to_mm() <= 10.0 { 2.0 } else { 2.4 };
            (t * k, "EN 10219-2 Table 2: outside corner radius at least 1.6 t / 2.0 t / 2.4 t (from memory)")
        }
        (_, Some(r)) => (r, "the standard sets no least corner radius (from memory): the catalogue's property radius is used; measure the sleeve's corners when the corner clearance is small"),
        (_, None) => (Length::mm(0.0), "no corner radius known: a sharp corner is taken"),
    }
}

/// Least per-side clearance of a centred rounded rectangle (half-widths ax, ay, radius ra)
/// inside another (bx, by, rb), over all directions.
pub fn least_clearance(a: (Length, Length, Length), b: (Length, Length, Length)) -> Length {
    let (ax, ay, ra) = (a.0.to_mm(), a.1.to_mm(), a.2.to_mm());
    let (bx, by, rb) = (b.0.to_mm(), b.1.to_mm(), b.2.to_mm());
    let p = (bx - ax) - (rb - ra);
    let q = (by - ay) - (rb - ra);
    let flats = (bx - ax).min(by - ay);
    Length::mm(if p < 0.0 && q < 0.0 {
        (rb - ra) - p.hypot(q)
    } else {
        flats
    })
}

fn requirement(
    citation: Citation,
    formula: &'static str,
    inputs: Vec<Input>,
    provided: Length,
    required: Length,
    bound: Bound,
    notes: Vec<String>,
) -> Requirement {
    Requirement {
        citation,
        formula,
        inputs,
        provided: provided.into(),
        required: required.into(),
        bound,
        notes,
        out_of_scope: vec![],
    }
}

/// sleeve_fit and sleeve_insertion of one sleeve connection.
pub fn check_sleeve_fit(model: &Model, m: &Member, sl: &SleeveDetail, r: &mut ConnectionReport) {
    insertion(m, sl, r);
    let (outer, inner) = (&m.section, &sl.section);
    let (Shape::Rect { b: bo, h: ho }, Shape::Rect { b: bs, h: hs }) = (outer.shape, inner.shape)
    else {
        if let (Shape::Round { d: dout }, Shape::Round { d: din }) = (outer.shape, inner.shape) {
            let dims = (dout, dout, dout * 0.5, din, din, din * 0.5);
            return fit(model, m, sl, dims, r);
        }
        r.not_checked.push(
            "sleeve_fit: a round sleeve in a square tube, or the reverse, is not built".into(),
        );
        return;
    };
    let r_outer_max = corner_radius_max(outer);
    let (r_sleeve_min, _) = corner_radius_min(inner);
    let Some((r_out, _)) = r_outer_max else {
        r.not_checked.push(format!(
            "sleeve_fit: the catalogue knows no corner radius limit of {} for the member",
            outer.standard
        ));
        return;
    };
    fit(model, m, sl, (bo, ho, r_out, bs, hs, r_sleeve_min), r);
}

/// The tightest and the loosest fit, given outside sizes and corner radii of member and sleeve
/// (for round tubes the radius is half the diameter).
fn fit(
    model: &Model,
    m: &Member,
    sl: &SleeveDetail,
    (bo, ho, r_out, bs, hs, r_sl): (Length, Length, Length, Length, Length, Length),
    r: &mut ConnectionReport,
) {
    let (outer, inner) = (&m.section, &sl.section);
    let tol = |s: &Section, dim: &str, size: Length| tolerance(model, s, dim, size);
    let (Some(tbo), Some(tho), Some(tw), Some(tbs), Some(ths)) = (
        tol(outer, "outside", bo),
        tol(outer, "outside", ho),
        tol(outer, "wall", outer.t_nominal),
        tol(inner, "outside", bs),
        tol(inner, "outside", hs),
    ) else {
        r.not_checked.push(format!(
            "sleeve_fit: the catalogue has no size tolerances of {} / {} for these sections; add them in a user catalogue",
            outer.standard, inner.standard
        ));
        return;
    };
    let t = outer.t_nominal;
    let round = matches!(outer.shape, Shape::Round { .. });
    let cite = Citation::new(
        "tube size tolerances",
        "ASTM A500 §11 / EN 10219-2 Table 2 (permissible variations, from memory)",
        "",
    );
    let common = Citation::new("common practice", "sleeve clearance band", "");
    let lo = sl
        .clearance_min
        .unwrap_or_else(|| Length::inch(DEFAULT_CLEARANCE_MIN_IN));
    let hi = sl
        .clearance_max
        .unwrap_or_else(|| Length::inch(DEFAULT_CLEARANCE_MAX_IN));
    let band_note = |given: bool| -> Vec<String> {
        if given {
            vec!["band given in the detail".into()]
        } else {
            vec!["band not given in the detail: the common-practice default 1/32 in. to 1/4 in. is used; set clearance_min / clearance_max to override".into()]
        }
    };

    // tightest: member small with a thick wall, sleeve large, the seam inside
    let half = |x: Length| x * 0.5;
    let wall_max = t + tw;
    let member_in = (
        half(bo - tbo) - wall_max,
        half(ho - tho) - wall_max,
        (r_out - t).max(Length::mm(0.0)),
    );
    let sleeve_out = (half(bs + tbs), half(hs + ths), r_sl);
    let per_side = least_clearance(sleeve_out, member_in);
    let tight = per_side * 2.0 - sl.inside_seam;
    let mut notes = band_note(sl.clearance_min.is_some());
    notes.push("total clearance across the sleeve, both sides, the seam taken off; a value below zero means the parts can interfere".into());
    if !round {
        notes.push("the member's inside corner taken at its largest radius less the wall; the sleeve's outside corner at its least".into());
    }
    r.checks.push(super::CheckResult::requirement(
        "sleeve_fit",
        "tightest fit",
        requirement(
            cite,
            "c = 2 min over directions (h_member,inside − h_sleeve,outside) − seam ≥ c_min",
            vec![
                Input::new("B_m", bo, "member outside width (nominal)"),
                Input::new("H_m", ho, "member outside depth (nominal)"),
                Input::new("δB_m", tbo, "member outside-size tolerance (±)"),
                Input::new("t_m", t, "member wall (nominal)"),
                Input::new("δt_m", tw, "member wall tolerance (±)"),
                Input::new(
                    "r_m",
                    r_out,
                    "member outside corner radius (largest allowed)",
                ),
                Input::new("B_s", bs, "sleeve outside width (nominal)"),
                Input::new("H_s", hs, "sleeve outside depth (nominal)"),
                Input::new("δB_s", tbs, "sleeve outside-size tolerance (±)"),
                Input::new("r_s", r_sl, "sleeve outside corner radius (least)"),
                Input::new("seam", sl.inside_seam, "weld seam inside the member"),
            ],
            tight,
            lo.max(Length::mm(0.0)),
            Bound::Minimum,
            notes,
        ),
        false,
    ));
    if tight.si() < 0.0 {
        if let Some(last) = r.checks.last_mut() {
            last.status = super::Status::Fail;
        }
    }

    // loosest: member large with a thin wall, sleeve small, no seam, across the flats
    let loose =
        ((bo + tbo) - (t - tw) * 2.0 - (bs - tbs)).max((ho + tho) - (t - tw) * 2.0 - (hs - ths));
    r.checks.push(super::CheckResult::requirement(
        "sleeve_fit",
        "loosest fit",
        requirement(
            common,
            "c = (B_m + δB_m) − 2 (t_m − δt_m) − (B_s − δB_s) ≤ c_max",
            vec![
                Input::new("B_m", bo.max(ho), "member outside size (nominal)"),
                Input::new("δB_m", tbo.max(tho), "member outside-size tolerance (±)"),
                Input::new("t_m", t, "member wall (nominal)"),
                Input::new("δt_m", tw, "member wall tolerance (±)"),
                Input::new("B_s", bs.max(hs), "sleeve outside size (nominal)"),
                Input::new("δB_s", tbs.max(ths), "sleeve outside-size tolerance (±)"),
            ],
            loose,
            hi,
            Bound::Maximum,
            {
                let mut n = band_note(sl.clearance_max.is_some());
                n.push("a loose sleeve lets the joint slip until the bolts bear and lets the member rotate in it".into());
                n
            },
        ),
        false,
    ));
}

/// sleeve_insertion: the sleeve reaches far enough into the member.
fn insertion(m: &Member, sl: &SleeveDetail, r: &mut ConnectionReport) {
    let size = match m.section.shape {
        Shape::Rect { b, h } => b.max(h),
        Shape::Round { d } => d,
    };
    let (required, note) = match sl.min_insertion {
        Some(v) => (v, "least insertion given in the detail".to_string()),
        None => (
            size * DEFAULT_INSERTION_FACTOR,
            "least insertion not given in the detail: the common-practice default of 1.5 times the member's larger outside dimension is used; set min_insertion to override".to_string(),
        ),
    };
    r.checks.push(super::CheckResult::requirement(
        "sleeve_insertion",
        "sleeve",
        requirement(
            Citation::new("common practice", "sleeve insertion", ""),
            "L_ins ≥ L_ins,min",
            vec![
                Input::new(
                    "L_ins",
                    sl.insertion,
                    "insertion of the sleeve into the member",
                ),
                Input::new("D", size, "member's larger outside dimension"),
            ],
            sl.insertion,
            required,
            Bound::Minimum,
            vec![note],
        ),
        false,
    ));
}

#[cfg(test)]
mod tests {
    use super::*;

    fn l(v: f64) -> Length {
        Length::inch(v)
    }

    #[test]
    fn square_in_square_with_equal_corners_is_the_flat_clearance() {
        // Worked by hand: half-widths 0.80 in the member, 0.75 the sleeve, both radii 0.3:
        // the flats give 0.05 per side, the corners (r equal) the same.
        let c = least_clearance((l(0.75), l(0.75), l(0.3)), (l(0.80), l(0.80), l(0.3)));
        assert!((c.to_in() - 0.05).abs() < 1e-12);
    }

    #[test]
    fn a_sharp_sleeve_in_a_round_cornered_tube_touches_at_the_corners() {
        // Worked by hand: member inside half-width 0.8125 with inside radius 0.375; sleeve
        // half-width 0.75, sharp. p = q = 0.0625 − 0.375 = −0.3125;
        // clearance = 0.375 − 0.3125 √2 = −0.0669 in. (the corner hits).
        let c = least_clearance((l(0.75), l(0.75), l(0.0)), (l(0.8125), l(0.8125), l(0.375)));
        assert!((c.to_in() - (0.375 - 0.3125 * 2f64.sqrt())).abs() < 1e-12);
        assert!(c.to_in() < 0.0);
    }

    #[test]
    fn a_round_sleeve_in_a_round_tube_is_the_radial_clearance() {
        // Circles are rounded squares with r = half-width: clearance = difference of radii.
        let c = least_clearance((l(0.9), l(0.9), l(0.9)), (l(1.0), l(1.0), l(1.0)));
        assert!((c.to_in() - 0.1).abs() < 1e-12);
    }
}
