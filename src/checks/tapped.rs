//! A plug welded all round the member end with a tapped hole on the member's axis: one screw
//! through the plate under its head threads into the plug. In tension the force runs tube → end
//! weld → plug → threads → screw; in compression the plug bears on the plate and the weld carries
//! the force from the tube.

use super::bolting;
use super::tab::{
    plate_strength, push_rule, push_strength, size_table, thin_wall_note, with_thin_wall,
};
use super::weld_kds::tube_weld_kds;
use super::{ConnectionReport, Envelope};
use crate::catalogue::Shape;
use crate::model::{Bolting, Member, Model, TappedDetail};
use crate::stackup::engagement;
use crate::standards::aisc360::j3_bolts::Threads;
use crate::standards::aisc360::{d_tension, j2_welds as j2, j3_bolts as j3};
use crate::units::{Angle, Length};

/// Shear strength of a thread taken as this fraction of its material's tensile strength (the
/// ratio AISC 360 J4.2 uses for shear rupture; common practice for thread stripping).
const THREAD_SHEAR_RATIO: f64 = 0.6;

/// The screw, thread, weld and tube checks of a tapped connection.
pub fn check_tapped(
    model: &Model,
    m: &Member,
    b: &Bolting,
    t: &TappedDetail,
    env: &Envelope,
    r: &mut ConnectionReport,
) {
    let ed = model.project.edition;
    let method = model.project.method;
    let d = bolting::diameter(b);
    let (plate, plug, weld) = (&t.plate, &t.plug, &t.weld);
    let cite_tension = ed.cite(j3::J3Clause::TensionAndShear.number(ed), "J3-1");
    let Some((_, fu_plug)) =
        plate_strength(r, "plug", &plug.material, plug.thickness, cite_tension)
    else {
        return;
    };
    let Some((fy_tube, fu_tube)) =
        plate_strength(r, "member", &m.material, m.section.t_nominal, cite_tension)
    else {
        return;
    };

    if let Some(tension) = &env.tension {
        // the screw in tension
        let st = bolting::stresses(
            ed,
            b,
            Length::mm(0.0),
            plate.thickness,
            Threads::NotExcluded,
        );
        push_strength(
            r,
            method,
            "bolt_tension",
            "screw",
            cite_tension,
            tension,
            st.and_then(|st| j3::bolt_tension(ed, &st, d)),
            |c| c.note("one screw on the member's axis carries the whole tension"),
        );
        thread_checks(b, plug, fu_plug, r);
    }

    // the fillet all round the tube end, in either sense
    let gov = env.governing();
    let length = m.section.outside_perimeter();
    let thin_wall = thin_wall_note(&m.section);
    let scope = |c: super::CheckResult| match &thin_wall {
        Some(n) => c.out_of_scope(n.clone()),
        None => c,
    };
    let line = j2::FilletLine {
        size: weld.size,
        length,
        angle: Angle::deg(90.0),
        end_loaded: false,
    };
    let rect_in_tension = matches!(m.section.shape, Shape::Rect { .. }) && env.tension.is_some();
    let kds = tube_weld_kds(
        ed,
        model.project.weld_directional_increase,
        line.angle,
        rect_in_tension,
    );
    push_strength(
        r,
        method,
        "weld_strength",
        "end weld all round",
        j2::weld_metal_citation(ed, kds.used),
        &gov,
        j2::fillet_weld_rupture(ed, weld.electrode.fexx, &line, kds.used),
        |c| {
            let c = scope(kds.annotate(c.note(
                "one fillet all round the outside of the tube end, its length along the outer \
                 face with the corner arcs; transverse to the force (θ = 90 deg)",
            )));
            if env.compression.is_some() {
                c.note("in compression the plug is not taken as finished to bear: the weld carries the force")
            } else {
                c
            }
        },
    );
    let table = size_table(model.project.units);
    let with_scope = |q| with_thin_wall(q, &thin_wall);
    let thinner_part = m.section.t_nominal.min(plug.thickness);
    push_rule(
        r,
        "weld_size_min",
        "end weld all round",
        ed.cite("J2.2b", "Table J2.4"),
        with_scope(j2::fillet_size_minimum(ed, table, thinner_part, weld.size)),
        false,
    );
    push_rule(
        r,
        "weld_size_max",
        "end weld all round",
        ed.cite("J2.2b", ""),
        with_scope(j2::fillet_size_maximum(
            ed,
            table,
            m.section.t_design,
            weld.size,
            false,
        )),
        false,
    );

    // the tube at its welded end
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
        push_strength(
            r,
            method,
            "member_tension_rupture",
            "member at the end weld",
            ed.cite("D2", "D2-2"),
            tension,
            d_tension::member_tension_rupture(
                ed,
                fu_tube,
                ag,
                &d_tension::shear_lag_all_elements(ed),
            ),
            |c| c.note("no holes at the welded end: An = Ag"),
        );
    }
    r.not_checked.push(
        "plug_bending: bending of the plug under the screw's pull, and how evenly it loads the end \
         weld, is not computed"
            .into(),
    );
    r.not_checked.push(
        "the plate under the screw head (bearing under the head, pull-through, its own edge \
         distances) belongs to the part it is cut from and is not checked here"
            .into(),
    );
}

/// Thread engagement in the plug: long enough that the screw breaks before either thread strips,
/// and at least three full threads.
fn thread_checks(
    b: &Bolting,
    plug: &crate::model::Plug,
    fu_plug: crate::units::Stress,
    r: &mut ConnectionReport,
) {
    let th = &b.thread;
    let limits = th
        .tpi
        .and_then(|tpi| engagement::unified_2a_2b_limits(th.d.to_in(), tpi).map(|l| (l, tpi)));
    let Some((limits, tpi)) = limits else {
        r.not_checked.push(format!(
            "thread_engagement: the thread-strength formulas are built here for Unified inch \
             threads of 1/4 in. and up, not for {}",
            th.designation
        ));
        return;
    };
    match b.grade.strength_at(th.d) {
        Ok(s) => r.checks.push(super::CheckResult::requirement(
            "thread_engagement",
            "screw in plug",
            {
                let mut q = engagement::thread_engagement(
                    &limits,
                    tpi,
                    th.stress_area,
                    s.fu,
                    fu_plug,
                    THREAD_SHEAR_RATIO,
                    plug.engagement,
                );
                q.notes.push(
                    "thread shear strength taken as 0.6 Fu of each material (common practice); \
                     class 2A/2B limits of size"
                        .into(),
                );
                q
            },
            false,
        )),
        Err(e) => r.not_checked.push(format!("thread_engagement: {e}")),
    }
    r.checks.push(super::CheckResult::requirement(
        "thread_engagement_count",
        "screw in plug",
        engagement::engagement_thread_count(tpi, plug.engagement),
        false,
    ));
}
