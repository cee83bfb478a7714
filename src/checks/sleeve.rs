//! A sleeve slid into the member end and through-bolted: each bolt crosses the member wall, the
//! sleeve wall, the hollow, the sleeve wall and the member wall — two shear planes.

use super::bolting::{self, LineDistances};
use super::fasteners::FastenerSet;
use super::tab::{plate_strength, push_rule, push_strength, spacing_checks};
use super::{impossible, ConnectionReport, Envelope};
use crate::catalogue::{Section, Shape};
use crate::model::{Bolting, Member, Model, SleeveDetail};
use crate::standards::aisc360::d_tension::{self as dt, TensionSection};
use crate::standards::aisc360::input::InputError;
use crate::standards::aisc360::j3_bolts as j3;
use crate::standards::aisc360::j7_bearing;
use crate::units::Length;

/// Centroid of half a rectangular tube cut through the walls the bolts cross (a channel whose web
/// is the bolted wall), measured from the web's outer face. `across` is the outside dimension of
/// the bolted wall, `depth` the other outside dimension.
fn half_tube_centroid(across: Length, depth: Length, t: Length) -> Length {
    let web = (across * t).to_mm2();
    let flange_len = depth * 0.5 - t;
    let flanges = 2.0 * (flange_len * t).to_mm2();
    let x_web = t.to_mm() * 0.5;
    let x_flange = t.to_mm() + flange_len.to_mm() * 0.5;
    Length::mm((web * x_web + flanges * x_flange) / (web + flanges))
}

/// x̄ of a rectangular tube bolted through two opposite walls, from the faying surface: the worse
/// of the two wall pairs. `inner_face` measures from the inside of the bolted wall (the member,
/// whose faying surface is its inner face) rather than the outside (the sleeve).
fn eccentricity(section: &Section, inner_face: bool) -> Option<Length> {
    let Shape::Rect { b, h } = section.shape else {
        return None;
    };
    let t = section.t_design;
    let shift = if inner_face { t } else { Length::mm(0.0) };
    let a = half_tube_centroid(b, h, t) - shift;
    let c = half_tube_centroid(h, b, t) - shift;
    Some(a.max(c))
}

/// The bolt, wall and tube checks of a sleeve connection.
pub fn check_sleeve(
    model: &Model,
    m: &Member,
    b: &Bolting,
    sl: &SleeveDetail,
    set: &FastenerSet,
    env: &Envelope,
    r: &mut ConnectionReport,
) {
    let ed = model.project.edition;
    let method = model.project.method;
    let j3c = |c: j3::J3Clause, eq: &'static str| ed.cite(c.number(ed), eq);
    let d = bolting::diameter(b);
    let series = bolting::series(b);
    let hole = match bolting::hole(ed, b) {
        Ok(h) => h,
        Err(e) => {
            r.checks.push(impossible(
                "bolt_hole",
                "bolts",
                j3c(j3::J3Clause::Holes, ""),
                e,
            ));
            return;
        }
    };
    let n = b.along;
    let s = b.pitch.unwrap_or(Length::mm(0.0));
    let gov = env.governing();
    let cite_j7 = ed.cite("J7", "J7-1");
    let Some((fy_m, fu_m)) = plate_strength(r, "member", &m.material, m.section.t_nominal, cite_j7)
    else {
        return;
    };
    let Some((fy_s, fu_s)) =
        plate_strength(r, "sleeve", &sl.material, sl.section.t_nominal, cite_j7)
    else {
        return;
    };
    let grip = match m.section.shape {
        Shape::Round { d } => d,
        Shape::Rect { b, h } => b.max(h),
    };
    let sleeve_end = sl.insertion - sl.end_distance - s * f64::from(n - 1);
    if sleeve_end.si() <= 0.0 {
        r.checks.push(impossible(
            "sleeve_end_distance",
            "sleeve",
            j3c(j3::J3Clause::MinimumEdgeDistance, ""),
            InputError::new(
                "le",
                "the bolts reach past the end of the sleeve (insertion ≤ end distance + pitches)",
            ),
        ));
        return;
    }

    // bolt shear on both planes of every bolt, each plane's thread condition from the stack-up
    let (conditions, thread_notes) = bolting::plane_conditions(b, set, 2);
    let shear = bolting::shear_over_planes(
        ed,
        b,
        s * f64::from(n - 1),
        set.grip.unwrap_or(grip),
        &conditions,
    );
    push_strength(
        r,
        method,
        "bolt_shear",
        "bolt group",
        j3c(j3::J3Clause::TensionAndShear, "J3-1"),
        &gov,
        shear,
        |c| {
            let mut c = c
                .times(f64::from(n), "n", "bolts")
                .note("through-bolt: two shear planes, member wall to sleeve wall on each side");
            c.notes.extend(thread_notes.iter().cloned());
            c
        },
    );

    // bearing (J7) and tear-out on both walls of both tubes
    let parts = [
        (
            "member walls",
            m.section.t_design,
            fy_m,
            fu_m,
            sl.end_distance,
        ),
        ("sleeve walls", sl.section.t_design, fy_s, fu_s, sleeve_end),
    ];
    for (part, t, fy, fu, free_edge) in parts {
        let bearing = j7_bearing::hss_through_bolt_bearing(ed, fy, d, t);
        push_strength(
            r,
            method,
            "bolt_bearing",
            part,
            cite_j7,
            &gov,
            bearing.clone(),
            |c| {
                c.times(f64::from(n), "n", "bolts")
                    .times(2.0, "n_w", "walls each bolt crosses")
            },
        );
        let Ok(bearing) = bearing else { continue };
        for (demand, lc_end, sense) in [
            (
                &env.tension,
                Some(j3::clear_distance_to_edge(free_edge, hole.along)),
                "member in tension: toward the free end",
            ),
            (
                &env.compression,
                None,
                "member in compression: away from the free end",
            ),
        ] {
            let Some(demand) = demand else { continue };
            let lines = LineDistances {
                lc_end,
                lc_between: j3::clear_distance_between(s, hole.along),
                bolts_per_line: n,
                lines: 1,
            };
            let group = bolting::group_bearing_tearout(
                &bearing,
                |lc| j3::hss_through_bolt_tearout(ed, lc, t, fu),
                lines,
            );
            push_strength(
                r,
                method,
                "bolt_tearout",
                part,
                j3c(j3::J3Clause::BearingAndTearout, "J3-6c"),
                demand,
                group,
                |c| hole.mark(c.times(2.0, "n_w", "walls each bolt crosses").note(sense)),
            );
        }
    }

    // the member and the sleeve across their holes
    if let Some(tension) = &env.tension {
        for (part, section, fy, fu, inner_face) in [
            ("member", &m.section, fy_m, fu_m, true),
            ("sleeve", &sl.section, fy_s, fu_s, false),
        ] {
            let ag = section.props.area;
            push_strength(
                r,
                method,
                "member_tension_yield",
                part,
                ed.cite("D2", "D2-1"),
                tension,
                dt::member_tension_yield(ed, fy, ag),
                |c| c,
            );
            let Some(x_bar) = eccentricity(section, inner_face) else {
                r.not_checked.push(format!("tube_net_rupture of the {part}: no shear lag rule is built for a round tube bolted through its walls"));
                continue;
            };
            if n < 2 {
                r.not_checked.push(format!("tube_net_rupture of the {part}: one bolt gives no connection length for Table D3.1 case 2"));
                continue;
            }
            let l = s * f64::from(n - 1);
            let rupture = dt::shear_lag_partial_connection(ed, x_bar, l, TensionSection::ClosedHss)
                .and_then(|lag| {
                    let an =
                        dt::tube_net_area_through_bolts(ag, section.t_design, hole.net_width, 1)?;
                    dt::member_tension_rupture(ed, fu, an, &lag)
                });
            push_strength(
                r,
                method,
                "tube_net_rupture",
                part,
                ed.cite("D2", "D2-2"),
                tension,
                rupture,
                |c| {
                    hole.mark(c.note("x̄ of the half tube on each side of the bolt line, from the faying surface, the worse wall pair"))
                },
            );
        }
    }

    // spacing and edge distances along the member
    if n > 1 {
        spacing_checks(r, ed, d, s, hole.along, "pitch");
    }
    let edge_hole = bolting::edge_hole(b);
    let walls = [
        ("member end", sl.end_distance, m.section.t_design),
        ("sleeve end", sleeve_end, sl.section.t_design),
    ];
    for (what, le, _) in walls {
        push_rule(
            r,
            "bolt_edge_distance",
            what,
            j3c(j3::J3Clause::MinimumEdgeDistance, ""),
            j3::bolt_edge_distance_minimum(ed, series, d, edge_hole, le),
            false,
        );
    }
    // J3.6: the walls in contact, the thinner governing the pitch, each wall to its end
    let thinner = m.section.t_design.min(sl.section.t_design);
    if n > 1 {
        let q = j3::bolt_spacing_maximum(ed, series, j3::Exposure::UnpaintedWeathering, thinner, s)
            .map(|mut q| {
                q.notes.push("the stricter limit for unpainted weathering steel is taken: the model does not state the exposure; the thinner of the walls in contact".into());
                q
            });
        push_rule(
            r,
            "bolt_spacing_max",
            "pitch",
            j3c(j3::J3Clause::MaximumSpacingAndEdge, ""),
            q,
            false,
        );
    }
    for (what, le, th) in walls {
        push_rule(
            r,
            "bolt_edge_distance_max",
            what,
            j3c(j3::J3Clause::MaximumSpacingAndEdge, ""),
            j3::bolt_edge_distance_maximum(ed, series, th, le),
            false,
        );
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn half_tube_centroid_of_a_square_tube() {
        // half of a 2 x 2 x 0.1 in. square tube: web 2 x 0.1 at 0.05, flanges 2 x 0.9 x 0.1 at 0.55
        // x̄ = (0.2·0.05 + 0.18·0.55) / 0.38 = 0.286842 in. (hand calculation of a centroid)
        let x = half_tube_centroid(Length::inch(2.0), Length::inch(2.0), Length::inch(0.1));
        assert!((x.to_in() - 0.109 / 0.38).abs() < 1e-9);
    }
}
