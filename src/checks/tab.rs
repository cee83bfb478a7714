//! A plate tab in a slotted tube end (or lapped on one face of a rectangular tube), bolted in lap
//! to one mating plate (single shear) or between two (double shear): the bolts, both plies, the
//! welds (`tab_welds`) and the tube at the slot.

use super::bolting::{self, Hole, LineDistances};
use super::fasteners::FastenerSet;
use super::tab_welds::{flare_bevels, lapped_tab_limits, slot_fillets, WeldSite};
use super::{impossible, CheckResult, ConnectionReport, Envelope};
use crate::catalogue::Shape;
use crate::model::{Bolting, Member, Model, TabDetail, TabWeld};
use crate::standards::aisc360::input::InputError;
use crate::standards::aisc360::j3_bolts::{self as j3, BearingHole, Exposure, HoleType};
use crate::standards::aisc360::j4_elements::{
    self as j4, BoltedTab, TensionNetSection, TensionStress,
};
use crate::standards::aisc360::{
    d3_slotted as d3, d_tension, e_compression, j2_welds as j2, Edition,
};
use crate::standards::{Citation, Input, Method, Requirement, Strength};
use crate::units::{Force, Length, Stress, UnitSystem};

/// Push a strength check, or an impossible-geometry failure.
#[allow(clippy::too_many_arguments)] // the record's parts, named at each call
pub(super) fn push_strength(
    r: &mut ConnectionReport,
    method: Method,
    ls: &'static str,
    subject: &str,
    cite: Citation,
    demand: &(Force, String),
    s: Result<Strength, InputError>,
    finish: impl FnOnce(CheckResult) -> CheckResult,
) {
    match s {
        Ok(s) => r.checks.push(finish(CheckResult::strength(
            ls, subject, s, method, demand.0, &demand.1,
        ))),
        Err(e) => r.checks.push(impossible(ls, subject, cite, e)),
    }
}

/// Shear rupture and shear yielding of the base metal along a weld, AISC 360-22 J4.2 Eq. J4-4
/// and J4-3 (where J2.4 sends the base metal): `th` thick, `length` of weld line in all.
#[allow(clippy::too_many_arguments)]
pub(super) fn push_weld_base_metal(
    r: &mut ConnectionReport,
    model: &Model,
    demand: &(Force, String),
    subject: &str,
    (fy, fu): (Stress, Stress),
    th: Length,
    length: Length,
    finish: impl Fn(CheckResult) -> CheckResult,
) {
    let (ed, method) = (model.project.edition, model.project.method);
    push_strength(
        r,
        method,
        "weld_base_metal_rupture",
        subject,
        ed.cite("J4.2", "J4-4"),
        demand,
        j2::weld_base_metal_shear_rupture(ed, fu, th, length),
        &finish,
    );
    push_strength(
        r,
        method,
        "weld_base_metal_yield",
        subject,
        ed.cite("J4.2", "J4-3"),
        demand,
        j2::weld_base_metal_shear_yielding(ed, fy, th, length),
        &finish,
    );
}

pub(super) fn push_rule(
    r: &mut ConnectionReport,
    ls: &'static str,
    subject: &str,
    cite: Citation,
    q: Result<Requirement, InputError>,
    advisory: bool,
) {
    match q {
        Ok(q) => r
            .checks
            .push(CheckResult::requirement(ls, subject, q, advisory)),
        Err(e) => r.checks.push(impossible(ls, subject, cite, e)),
    }
}

/// A plate's Fy and Fu at its thickness, or a failed check saying the material does not cover it.
pub(super) fn plate_strength(
    r: &mut ConnectionReport,
    subject: &str,
    m: &crate::catalogue::Material,
    t: Length,
    cite: Citation,
) -> Option<(Stress, Stress)> {
    match m.strength_at(t) {
        Ok(v) => Some(v),
        Err(e) => {
            r.checks.push(impossible(
                "material_strength",
                subject,
                cite,
                InputError::new("t", e),
            ));
            None
        }
    }
}

/// The scope flag of a weld to a tube wall under 1/8 in., outside the prequalified range of the
/// structural welding code; none for a thicker wall.
pub(super) fn thin_wall_note(section: &crate::catalogue::Section) -> Option<String> {
    (section.t_nominal.to_in() < 0.125 - 1e-9).then(|| {
        format!(
            "outside the standard's scope: the tube wall ({:.3} in.) is under 1/8 in., below the prequalified range of the structural welding code; sheet-steel welding rules apply",
            section.t_nominal.to_in()
        )
    })
}

/// A weld-size rule with the thin-wall scope flag added, when there is one.
pub(super) fn with_thin_wall(
    q: Result<Requirement, InputError>,
    thin_wall: &Option<String>,
) -> Result<Requirement, InputError> {
    q.map(|mut q| {
        if let Some(n) = thin_wall {
            q.out_of_scope.push(
                n.trim_start_matches("outside the standard's scope: ")
                    .to_string(),
            );
        }
        q
    })
}

/// Which Table J2.4 to read: the inch table for a model in US units, the metric one for SI.
pub fn size_table(units: UnitSystem) -> j2::SizeTable {
    match units {
        UnitSystem::Us => j2::SizeTable::Inch,
        UnitSystem::Si => j2::SizeTable::Metric,
    }
}

/// The bolt, plate, weld and tube checks of a tab connection.
pub fn check_tab(
    model: &Model,
    m: &Member,
    b: &Bolting,
    t: &TabDetail,
    set: &FastenerSet,
    env: &Envelope,
    r: &mut ConnectionReport,
) {
    let ed = model.project.edition;
    let method = model.project.method;
    let deformation = model.project.hole_deformation;
    let j3c = |c: j3::J3Clause, eq: &'static str| ed.cite(c.number(ed), eq);
    let d = bolting::diameter(b);
    let series = bolting::series(b);
    let hole: Hole = match bolting::hole(ed, b) {
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
    let n = b.count();
    let s = b.pitch.unwrap_or(Length::mm(0.0));
    let g = b.gauge.unwrap_or(Length::mm(0.0));
    let (tab, mate, weld) = (&t.tab, &t.mate, &t.weld);
    let mates = f64::from(mate.count);
    let t_mate = mate.thickness * mates;
    let grip = tab.thickness + t_mate;
    let gov = env.governing();
    let bearing_hole = if b.hole == HoleType::LongSlot {
        BearingHole::LongSlotPerpendicular
    } else {
        BearingHole::RoundOrParallelSlot
    };
    let cite_bearing = j3c(j3::J3Clause::BearingAndTearout, "J3-6a");
    let Some((fy_tab, fu_tab)) =
        plate_strength(r, "tab", &tab.material, tab.thickness, cite_bearing)
    else {
        return;
    };
    let Some((fy_mate, fu_mate)) =
        plate_strength(r, "mate", &mate.material, mate.thickness, cite_bearing)
    else {
        return;
    };
    let Some((fy_tube, fu_tube)) =
        plate_strength(r, "member", &m.material, m.section.t_nominal, cite_bearing)
    else {
        return;
    };
    let with_hole_notes = |c: CheckResult| hole.mark(c);

    // bolt shear: every bolt, every plane, each plane's thread condition from the stack-up
    let (conditions, thread_notes) = bolting::plane_conditions(b, set, mate.count);
    let pattern = s * f64::from(b.along - 1);
    let shear = bolting::shear_over_planes(ed, b, pattern, set.grip.unwrap_or(grip), &conditions);
    push_strength(
        r,
        method,
        "bolt_shear",
        "bolt group",
        j3c(j3::J3Clause::TensionAndShear, "J3-1"),
        &gov,
        shear,
        |c| {
            let mut c = c.times(f64::from(n), "n", "bolts in the group");
            c.notes.extend(thread_notes.iter().cloned());
            c
        },
    );

    // bearing and tear-out on each ply, in the direction the force acts on it
    let plies = [
        (
            "tab",
            tab.thickness,
            fu_tab,
            tab.end_distance,
            tab.clear_length,
        ),
        (
            "mate",
            t_mate,
            fu_mate,
            mate.end_distance,
            mate.back_distance,
        ),
    ];
    for (ply, thick, fu, edge_in_tension, edge_in_compression) in plies {
        let bearing = j3::bolt_bearing(ed, d, thick, fu, bearing_hole, deformation);
        let note_mates = (ply == "mate" && mate.count == 2).then_some(
            "two mating plates: their thicknesses are added, each carrying half the force",
        );
        push_strength(
            r,
            method,
            "bolt_bearing",
            ply,
            cite_bearing,
            &gov,
            bearing.clone(),
            |c| {
                let c = with_hole_notes(c.times(f64::from(n), "n", "bolts in the group"));
                match note_mates {
                    Some(nm) => c.note(nm),
                    None => c,
                }
            },
        );
        let Ok(bearing) = bearing else { continue };
        for (demand, edge, sense) in [
            (&env.tension, edge_in_tension, "member in tension"),
            (
                &env.compression,
                edge_in_compression,
                "member in compression",
            ),
        ] {
            let Some(demand) = demand else { continue };
            let lines = LineDistances {
                lc_end: Some(j3::clear_distance_to_edge(edge, hole.along)),
                lc_between: j3::clear_distance_between(s, hole.along),
                bolts_per_line: b.along,
                lines: b.across,
            };
            let group = bolting::group_bearing_tearout(
                &bearing,
                |lc| j3::bolt_tearout(ed, lc, thick, fu, bearing_hole, deformation),
                lines,
            );
            push_strength(
                r,
                method,
                "bolt_tearout",
                ply,
                j3c(j3::J3Clause::BearingAndTearout, "J3-6c"),
                demand,
                group,
                |c| with_hole_notes(c.note(sense)),
            );
        }
    }

    // the plies in tension, compression and block shear, each over the lesser of its width and
    // the Whitmore width of the bolt group
    let (w_tab, whitmore) = loaded_width(b, tab.width);
    let (w_mate, _) = loaded_width(b, mate.width);
    let ag_tab = w_tab * tab.thickness;
    let ag_mate = w_mate * t_mate;
    let net = |w: Length, th: Length| (w - hole.net_width * f64::from(b.across)) * th;
    let widths = |st: Strength, w: Length, full: Length| width_inputs(st, w, full, whitmore);
    if let Some(tension) = &env.tension {
        for (ply, fy, fu, ag, an, w, full) in [
            (
                "tab",
                fy_tab,
                fu_tab,
                ag_tab,
                net(w_tab, tab.thickness),
                w_tab,
                tab.width,
            ),
            (
                "mate",
                fy_mate,
                fu_mate,
                ag_mate,
                net(w_mate, t_mate),
                w_mate,
                mate.width,
            ),
        ] {
            push_strength(
                r,
                method,
                "plate_tension_yield",
                ply,
                ed.cite("J4.1", "J4-1"),
                tension,
                j4::plate_tension_yield(ed, fy, ag).map(|st| widths(st, w, full)),
                |c| c,
            );
            let an_ok = if an.si() > 0.0 {
                Ok(an)
            } else {
                Err(InputError::new("An", "the holes take the whole width"))
            };
            let rupture = an_ok
                .and_then(|an| {
                    j4::plate_tension_rupture(ed, fu, TensionNetSection::BoltedSplice { an, ag })
                })
                .map(|st| widths(st, w, full));
            push_strength(
                r,
                method,
                "plate_tension_rupture",
                ply,
                ed.cite("J4.1", "J4-2"),
                tension,
                rupture,
                |c| {
                    with_hole_notes(c.note("net area with An ≤ 0.85 Ag, the bolted splice plate limit of J4.1(b), taken for the tab and the mate alike"))
                },
            );
        }
    }
    for (demand, sense) in [
        (&env.tension, "member in tension"),
        (&env.compression, "member in compression"),
    ] {
        let Some(demand) = demand else { continue };
        let compression = sense.ends_with("compression");
        for (ply, fy, fu, th, width, end) in [
            (
                "tab",
                fy_tab,
                fu_tab,
                tab.thickness,
                tab.width,
                if compression {
                    tab.clear_length
                } else {
                    tab.end_distance
                },
            ),
            (
                "mate",
                fy_mate,
                fu_mate,
                t_mate,
                mate.width,
                if compression {
                    mate.back_distance
                } else {
                    mate.end_distance
                },
            ),
        ] {
            let paths = j4::tab_tear_paths(&BoltedTab {
                rows: b.along,
                columns: b.across,
                pitch: s,
                gauge: g,
                end_distance: end,
                side_distance: (width - g * f64::from(b.across - 1)) * 0.5,
                t: th,
                hole_width: hole.net_width,
            });
            let best = paths.and_then(|paths| {
                let mut best: Option<(Strength, &'static str)> = None;
                for p in paths {
                    let st = j4::block_shear(ed, fy, fu, p.areas, TensionStress::Uniform)?;
                    if best
                        .as_ref()
                        .map_or(true, |(b, _)| st.nominal.si < b.nominal.si)
                    {
                        best = Some((st, p.name));
                    }
                }
                best.ok_or_else(|| InputError::new("Agv", "no tear path"))
            });
            let (st, path) = match best {
                Ok((st, path)) => (Ok(st), path),
                Err(e) => (Err(e), ""),
            };
            push_strength(
                r,
                method,
                "block_shear",
                ply,
                ed.cite("J4.3", "J4-5"),
                demand,
                st,
                |c| {
                    c.note(format!("{sense}; governing tear path '{path}' of the paths through the bolt group; the bolt group is taken centred on the plate width"))
                },
            );
        }
    }
    if let Some(comp) = &env.compression {
        let lc = tab.clear_length * tab.k;
        let st = j4::plate_compression(
            ed,
            fy_tab,
            tab.material.e,
            ag_tab,
            lc,
            e_compression::plate_radius_of_gyration(tab.thickness),
        )
        .map(|st| widths(st, w_tab, tab.width));
        push_strength(
            r,
            method,
            "plate_compression",
            "tab",
            ed.cite("J4.4", "J4-6"),
            comp,
            st,
            |c| {
                c.note(format!("Lc = K L with K = {} (from the detail) and L the tab's free length outside the tube", tab.k))
            },
        );
        mate_compression(r, ed, method, b, mate, fy_mate, comp);
        if mate.count == 1 {
            r.not_checked.push(
                "the single lap in compression: tab and mate are offset by half their thicknesses, and that eccentricity (and the strut of tab, bolts and mate as one) is not computed; each plate is buckled alone as concentric".into(),
            );
        }
    }

    // spacing and edge distances
    if b.along > 1 {
        spacing_checks(r, ed, d, s, hole.along, "pitch");
    }
    if b.across > 1 {
        spacing_checks(r, ed, d, g, hole.along, "gauge");
    }
    let side = |w: Length| (w - g * f64::from(b.across - 1)) * 0.5;
    let edge_hole = bolting::edge_hole(b);
    let edges = [
        ("tab end", tab.end_distance, tab.thickness),
        ("tab side", side(tab.width), tab.thickness),
        ("mate end", mate.end_distance, mate.thickness),
        ("mate back", mate.back_distance, mate.thickness),
        ("mate side", side(mate.width), mate.thickness),
    ];
    for (what, le, _) in edges {
        push_rule(
            r,
            "bolt_edge_distance",
            what,
            j3c(j3::J3Clause::MinimumEdgeDistance, ""),
            j3::bolt_edge_distance_minimum(ed, series, d, edge_hole, le),
            false,
        );
    }
    // the maximum is from a bolt to the nearest edge of the part (J3.6): once per ply
    for ply in ["tab", "mate"] {
        let mine: Vec<&(&str, Length, Length)> =
            edges.iter().filter(|e| e.0.starts_with(ply)).collect();
        let Some(nearest) = mine.iter().min_by(|a, b| a.1.si().total_cmp(&b.1.si())) else {
            continue;
        };
        let q = j3::bolt_edge_distance_maximum(ed, series, nearest.2, nearest.1).map(|mut q| {
            q.notes.push(format!(
                "to the nearest edge of the {ply}: its {} edge",
                nearest.0.trim_start_matches(ply).trim()
            ));
            q
        });
        push_rule(
            r,
            "bolt_edge_distance_max",
            &format!("{ply} (nearest edge)"),
            j3c(j3::J3Clause::MaximumSpacingAndEdge, ""),
            q,
            false,
        );
    }
    let thinner = tab.thickness.min(mate.thickness);
    for (sp, what) in [(s, "pitch"), (g, "gauge")] {
        if sp.si() > 0.0 {
            let q = j3::bolt_spacing_maximum(ed, series, Exposure::UnpaintedWeathering, thinner, sp).map(|mut q| {
                q.notes.push("the stricter limit for unpainted weathering steel is taken: the model does not state the exposure".into());
                q
            });
            push_rule(
                r,
                "bolt_spacing_max",
                what,
                j3c(j3::J3Clause::MaximumSpacingAndEdge, ""),
                q,
                false,
            );
        }
    }

    // the welds joining the tab to the tube
    let at = WeldSite {
        model,
        m,
        tab,
        gov: &gov,
        tube: (fy_tube, fu_tube),
        tab_strength: (fy_tab, fu_tab),
    };
    match weld {
        TabWeld::Slot(w) => slot_fillets(&at, w, r),
        TabWeld::FlareBevel(w) => {
            flare_bevels(&at, w, r);
            lapped_tab_limits(m, tab, r);
        }
    }
    // the tab where the welds take its force: a plate connected by longitudinal welds only
    if let Some(tension) = &env.tension {
        let (w_lines, where_lines) = match weld {
            TabWeld::Slot(_) => {
                let across = match m.section.shape {
                    Shape::Rect { b, h } => b.max(h),
                    Shape::Round { d } => d,
                };
                (
                    across.min(tab.width),
                    "the welds lie at the two slotted walls: w is the tube's outside size across the tab (the larger side where the tab's plane is not given), at most the tab's width",
                )
            }
            TabWeld::FlareBevel(_) => (
                tab.width,
                "the welds run along the tab's two edges: w is the tab's width",
            ),
        };
        let gross = tab.width * tab.thickness;
        let rupture = d_tension::shear_lag_longitudinal_welds(ed, weld.length(), w_lines)
            .and_then(|lag| d_tension::member_tension_rupture(ed, fu_tab, gross, &lag));
        push_strength(
            r,
            method,
            "plate_tension_rupture",
            "tab at the tube welds",
            ed.cite("D3", "D3-1"),
            tension,
            rupture,
            |c| {
                c.note(format!(
                    "J4.1(b) with Ae = U An of D3, Table D3.1 case 4 (longitudinal welds only; J2.2b asks each weld at least as long as the distance between them); {where_lines}; An = Ag of the tab, no holes at the welds"
                ))
            },
        );
    }

    // the tube, and its net section at the slot
    if let Some(tension) = &env.tension {
        let ag = m.section.props.area;
        push_strength(
            r,
            method,
            "member_tension_yield",
            "member",
            ed.cite("D2", "D2-1"),
            tension,
            d_tension::member_tension_yield(ed, fy_tube, ag),
            |c| c,
        );
    }
    if let (Some(tension), TabWeld::Slot(weld)) = (&env.tension, weld) {
        let ag = m.section.props.area;
        let wall = m.section.t_design;
        let lag = match m.section.shape {
            Shape::Round { d } => d3::shear_lag_round_slotted(ed, d, weld.length),
            Shape::Rect { b: bw, h } => {
                let a = d3::shear_lag_rectangular(
                    ed,
                    d3::RectangularGusset::SingleConcentric,
                    bw,
                    h,
                    weld.length,
                );
                let c = d3::shear_lag_rectangular(
                    ed,
                    d3::RectangularGusset::SingleConcentric,
                    h,
                    bw,
                    weld.length,
                );
                match (a, c) {
                    (Ok(a), Ok(c)) => Ok(if c.u < a.u { c } else { a }),
                    (Err(e), _) | (_, Err(e)) => Err(e),
                }
            }
        };
        let slot = d3::slot_width(tab.thickness, weld.slot_gap);
        let rupture = lag.and_then(|lag| {
            d3::slotted_tube_tensile_rupture(ed, fu_tube, ag, wall, Some(slot), &lag)
        });
        let rect = matches!(m.section.shape, Shape::Rect { .. });
        push_strength(
            r,
            method,
            "tube_net_rupture",
            "member at the slot",
            ed.cite("D2", "D2-2"),
            tension,
            rupture,
            |c| {
                let c = c.note("net area at the end of the slot, shear lag by Table D3.1 for a single concentric plate");
                if rect {
                    c.note("the tab's plane is not given: U is taken for the worse of the two orientations")
                } else {
                    c
                }
            },
        );
    }
}

/// The Whitmore width of a bolt group: its gauge spread plus a 30° spread each side over its length
/// along the force, b_W = g (m − 1) + 2 s (n − 1) tan 30° (Whitmore 1952, as the AISC Manual
/// Part 9 uses it for gussets; common practice, from memory).
pub fn whitmore_width(gauge_spread: Length, pattern_length: Length) -> Length {
    gauge_spread + pattern_length * (2.0 * 30f64.to_radians().tan())
}

/// The width of a ply taken in tension and compression: the lesser of its width and the
/// Whitmore width of the bolt group (the 30° spread of AISC Manual Part 9, common practice),
/// with the Whitmore width; the full width where one bolt row gives the spread no length.
fn loaded_width(b: &Bolting, width: Length) -> (Length, Option<Length>) {
    if b.along < 2 {
        return (width, None);
    }
    let g = b.gauge.unwrap_or(Length::mm(0.0));
    let s = b.pitch.unwrap_or(Length::mm(0.0));
    let bw = whitmore_width(g * f64::from(b.across - 1), s * f64::from(b.along - 1));
    (bw.min(width), Some(bw))
}

/// A ply strength with the widths it was taken over: the ply's width, the Whitmore width and
/// the lesser, used.
fn width_inputs(
    mut st: Strength,
    used: Length,
    full: Length,
    whitmore: Option<Length>,
) -> Strength {
    st.inputs.push(Input::new("w", full, "width of the plate"));
    match whitmore {
        Some(bw) => {
            st.inputs.push(Input::new(
                "b_W",
                bw,
                "Whitmore width, g (m − 1) + 2 s (n − 1) tan 30°",
            ));
            st.inputs.push(Input::new(
                "b",
                used,
                "width taken, the lesser of w and b_W (common practice)",
            ));
        }
        None => st.notes.push(
            "one bolt row along the force: no Whitmore spread, the whole width is taken".into(),
        ),
    }
    st
}

/// AISC 360 J4.4 Eq. J4-6 (chapter E beyond Lc/r = 25) — the mate plate(s) in compression over the
/// lesser of their width and the Whitmore width, Lc = K L from the detail; not checked without them.
#[allow(clippy::too_many_arguments)] // the parts of the detail the check reads, named at the call
fn mate_compression(
    r: &mut ConnectionReport,
    ed: Edition,
    method: Method,
    b: &Bolting,
    mate: &crate::model::MatePlate,
    fy: Stress,
    demand: &(Force, String),
) {
    let Some(free) = mate.free_length else {
        r.not_checked.push("plate_compression of the mate: the detail does not give the mate's free length and its K (`free_length` and `k` on the mate)".into());
        return;
    };
    if b.along < 2 {
        r.not_checked.push("plate_compression of the mate: one bolt row has no length along the force for the Whitmore spread, so the mate's effective width is not defined".into());
        return;
    }
    let (width, whitmore) = loaded_width(b, mate.width);
    let whitmore = whitmore.expect("two or more bolt rows give a Whitmore width");
    let plates = f64::from(mate.count);
    let lc = free.length * free.k;
    let st = j4::plate_compression(
        ed,
        fy,
        mate.material.e,
        width * mate.thickness * plates,
        lc,
        e_compression::plate_radius_of_gyration(mate.thickness),
    )
    .map(|mut st| {
        st.inputs.extend([
            Input::new("L", free.length, "the mate's free length, from the detail"),
            Input::new("K", free.k, "effective length factor, from the detail"),
            Input::new(
                "b_W",
                whitmore,
                "Whitmore width, g (m − 1) + 2 s (n − 1) tan 30°",
            ),
            Input::new(
                "b",
                width,
                "width in compression, the lesser of b_W and the mate's width",
            ),
        ]);
        st
    });
    push_strength(
        r,
        method,
        "plate_compression",
        "mate",
        ed.cite("J4.4", "J4-6"),
        demand,
        st,
        |c| {
            let c = c.note("Lc = K L with L and K from the detail; the area in compression is the Whitmore width (30° spread over the bolt group, common practice) unless the mate is narrower");
            if mate.count == 2 {
                c.note("two mating plates: each buckles alone (r of one plate), Ag of both")
            } else {
                c
            }
        },
    );
}

pub(super) fn spacing_checks(
    r: &mut ConnectionReport,
    ed: Edition,
    d: Length,
    s: Length,
    dh: Length,
    what: &str,
) {
    let cite = ed.cite(j3::J3Clause::MinimumSpacing.number(ed), "");
    push_rule(
        r,
        "bolt_spacing",
        what,
        cite,
        j3::bolt_spacing_minimum(ed, d, s),
        false,
    );
    push_rule(
        r,
        "bolt_spacing_preferred",
        what,
        cite,
        j3::bolt_spacing_preferred(ed, d, s),
        true,
    );
    match j3::bolt_clear_spacing(ed, d, s, dh) {
        Ok(Some(q)) => r.checks.push(CheckResult::requirement(
            "bolt_clear_spacing",
            what,
            q,
            false,
        )),
        Ok(None) => {}
        Err(e) => r
            .checks
            .push(impossible("bolt_clear_spacing", what, cite, e)),
    }
}
