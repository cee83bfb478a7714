//! A tab's mate shop-welded to the face of a chord tube (`on_chord`): the chord wall under the
//! plate by AISC 360 Chapter K (Table K2.1 round, Table K2.2 rectangular, with their limits of
//! applicability) and the fillet welds of the plate to the chord face by J2.
//!
//! The demand is the member's axial force (times the demand factor) in each load case, taken
//! along the member; the weld takes the largest force of the cases. The Chapter K functions
//! return Rn of the plate force along the member (Rn sin θ = … solved for Rn), so θ enters where
//! the clause has it. The chord's own axial force of the same load case gives the chord-stress
//! factor Qf; where the model has none, the chord is taken fully utilized (U = 1.0).

use super::tab::{
    plate_strength, push_rule, push_strength, push_weld_base_metal, size_table, thin_wall_note,
    with_thin_wall,
};
use super::{CheckResult, ConnectionReport, Envelope};
use crate::catalogue::Shape;
use crate::model::chord::{others_at_node, placement, Placement};
use crate::model::{ChordPlate, DetailKind, End, Member, Model, OnChord, TabDetail};
use crate::standards::aisc360::j2_welds as j2;
use crate::standards::aisc360::k_hss::{
    self as k, ChordFace, Connection, RectangularHss, RoundHss, TransversePlate,
};
use crate::standards::Method;
use crate::units::{Force, Length, Stress};

/// The `on_chord` of a detail id, when it is a tab with one.
fn on_chord_of(model: &Model, id: &str) -> Option<OnChord> {
    model
        .details
        .iter()
        .find(|d| d.id == id)
        .and_then(|d| match &d.kind {
            DetailKind::Tab(t) => t.on_chord.as_deref().cloned(),
            _ => None,
        })
}

/// The face stress of the chord for the chord-stress factor Qf, in the load case `case`, with the
/// note saying how it was found. U = |Pro| / (Fc Ag), Fc = Fy (LRFD) or 0.6 Fy (ASD), K1.
pub fn chord_face_stress(
    model: &Model,
    chord: &Member,
    fy: Stress,
    case: &str,
) -> (ChordFace, String) {
    let row = model
        .forces
        .iter()
        .find(|r| r.member == chord.id && r.case == case);
    let Some(row) = row else {
        return (
            ChordFace::Compression { utilization: 1.0 },
            format!(
                "chord '{}' has no force in load case '{case}': U taken as 1.0 (fully utilized), the conservative end of Qf",
                chord.id
            ),
        );
    };
    let pro = row.axial * model.project.demand_factor;
    if pro.si() >= 0.0 {
        return (
            ChordFace::Tension,
            format!(
                "chord '{}' in tension in load case '{case}' ({:.2} kip): Qf = 1",
                chord.id,
                pro.to_kip()
            ),
        );
    }
    let fc = match model.project.method {
        Method::Lrfd => fy,
        Method::Asd => fy * 0.6,
    };
    let cap: Force = fc * chord.section.props.area;
    let u = pro.abs() / cap;
    (
        ChordFace::Compression { utilization: u },
        format!(
            "chord '{}' in compression in load case '{case}': U = |Pro| / (Fc Ag) = {:.2} / {:.2} kip = {u:.3} (K1, Fc = {} Fy); the model gives axial forces only, so the chord bending term Mro/(Fc S) is not included",
            chord.id,
            pro.abs().to_kip(),
            cap.to_kip(),
            if model.project.method == Method::Lrfd { "1.0" } else { "0.6" }
        ),
    )
}

/// The chord-wall and mate-to-chord weld checks of a tab whose mate is welded to a chord face.
pub fn check_chord_face(
    model: &Model,
    m: &Member,
    end: End,
    t: &TabDetail,
    oc: &OnChord,
    env: &Envelope,
    r: &mut ConnectionReport,
) {
    let p = match placement(&model.nodes, &model.members, m, end, oc) {
        Ok(p) => p,
        Err(e) => {
            r.not_checked.push(format!(
                "the chord wall under the mate and the mate-to-chord weld: {}",
                e.message
            ));
            return;
        }
    };
    let chord = model
        .members
        .iter()
        .find(|c| c.id == p.chord)
        .expect("placement found the chord");
    if t.mate.count != 1 {
        r.not_checked.push(format!(
            "the wall of chord '{}' under two parallel mating plates and their welds to it: Chapter K tables give one plate on a face",
            chord.id
        ));
        return;
    }
    let ed = model.project.edition;
    let subject = format!("chord wall {}", chord.id);
    let clause = match chord.section.shape {
        Shape::Round { .. } => k::round_clause(ed),
        Shape::Rect { .. } => k::rectangular_clause(ed),
    };
    let Some((fy, fu)) = plate_strength(
        r,
        &subject,
        &chord.material,
        chord.section.t_nominal,
        ed.cite(clause, ""),
    ) else {
        return;
    };
    let Some((fy_mate, fu_mate)) = plate_strength(
        r,
        "mate",
        &t.mate.material,
        t.mate.thickness,
        ed.cite("J4.2", "J4-4"),
    ) else {
        return;
    };
    let others = others_at_node(&model.nodes, &model.members, m, end, &p, |id| {
        on_chord_of(model, id)
    });
    let beside: Vec<&str> = others
        .iter()
        .filter(|(_, opposite)| !opposite)
        .map(|(id, _)| id.as_str())
        .collect();
    let crowded = (!beside.is_empty()).then(|| {
        format!(
            "other plates on chord '{}' at node '{}' ({}): the tables give one plate alone, not the wall under several; each is checked alone",
            chord.id,
            p.node,
            beside.join(", ")
        )
    });
    let connection = if others.iter().any(|(_, opposite)| *opposite) {
        Connection::Cross
    } else {
        Connection::Tee
    };
    let wall = Wall {
        chord,
        fy,
        fu,
        fy_mate,
        connection,
    };
    let hss_material = matches!(
        chord.material.standard.as_str(),
        "ASTM A500"
            | "ASTM A501"
            | "ASTM A618"
            | "ASTM A847"
            | "ASTM A1065"
            | "ASTM A1085"
            | "ASTM A53"
    );
    // the chord's bending stress on the face is not in the model (axial forces only): Qf, and
    // so the wall's strength, is not confirmed
    let bending = format!(
        "the chord's bending moment is not in the model, so Qf is taken from the axial force of '{}' alone (K1: U = |Pro|/(Fc Ag) + |Mro|/(Fc S)); the engineer confirms it",
        chord.id
    );
    // Every load case on its own: the chord's force, and so Qf, changes from case to case, so the
    // case with the largest member force need not govern the wall.
    for row in model.forces.iter().filter(|f| f.member == m.id) {
        let p_case = row.axial * model.project.demand_factor;
        let sense = if p_case.si() < 0.0 {
            "member in compression"
        } else {
            "member in tension"
        };
        let demand = &(p_case.abs(), row.case.clone());
        let (face, qf_note) = chord_face_stress(model, chord, fy, &demand.1);
        let notes = vec![
            sense.to_string(),
            qf_note,
            format!(
                "θ = {:.1} deg between member '{}' and chord '{}' at node '{}', from the node coordinates",
                p.theta.to_deg(),
                m.id,
                chord.id,
                p.node
            ),
            match connection {
                Connection::Tee => "T-connection: no plate on the opposite face at this node".to_string(),
                Connection::Cross => "cross-connection: a plate on the opposite face at this node".to_string(),
            },
        ];
        let compression = sense.ends_with("compression");
        let first = r.checks.len();
        chord_wall_checks(
            model,
            &wall,
            t,
            oc,
            &p,
            face,
            compression,
            demand,
            &notes,
            r,
        );
        for check in &mut r.checks[first..] {
            if !hss_material {
                *check = check.clone().out_of_scope(format!(
                    "chord '{}' is {} ({}), not one of the HSS materials of AISC 360 A3.1 that Chapter K is written for (from memory: A500, A501, A618, A847, A1065, A1085, A53 Gr B)",
                    chord.id, chord.material.name, chord.material.standard
                ));
            }
            *check = check.clone().out_of_scope(bending.clone());
            if let Some(c) = &crowded {
                *check = check.clone().out_of_scope(c.clone());
            }
        }
    }
    let gov = env.governing();
    mate_weld_checks(model, chord, t, oc, &p, fy, fu, fy_mate, fu_mate, &gov, r);
    if p.theta.to_deg() < 90.0 - 1e-6 {
        r.not_checked.push(format!(
            "the moment on the chord wall from the member's force along the chord (P cos θ, θ = {:.1} deg) acting at the work point on the chord's axis, off the chord face: the wall is checked for the force alone (the weld is checked with the moment)",
            p.theta.to_deg()
        ));
    }
}

/// The chord, its strengths and the kind of connection.
struct Wall<'a> {
    chord: &'a Member,
    fy: Stress,
    fu: Stress,
    /// The mate's yield stress at its thickness.
    fy_mate: Stress,
    connection: Connection,
}

/// The Chapter K limit states of the chord wall for one sense of the member force.
#[allow(clippy::too_many_arguments)] // the parts of the joint, named at the call
fn chord_wall_checks(
    model: &Model,
    w: &Wall,
    t: &TabDetail,
    oc: &OnChord,
    p: &Placement,
    face: ChordFace,
    compression: bool,
    demand: &(Force, String),
    notes: &[String],
    r: &mut ConnectionReport,
) {
    let ed = model.project.edition;
    let method = model.project.method;
    let subject = format!("chord wall {}", w.chord.id);
    let section = &w.chord.section;
    let with_notes = |mut c: CheckResult| {
        c.notes.extend(notes.iter().cloned());
        c
    };
    let lb = oc.welded_length(&t.mate);
    match (section.shape, p.faces) {
        (Shape::Round { d }, _) => {
            let hss = RoundHss {
                diameter: d,
                wall: section.t_design,
                fy: w.fy,
                fu: w.fu,
            };
            let cite = ed.cite(k::round_clause(ed), "");
            match oc.plate {
                ChordPlate::Longitudinal => push_strength(
                    r,
                    method,
                    "chord_plastification",
                    &subject,
                    cite,
                    demand,
                    k::round_longitudinal_plate_plastification(
                        ed,
                        &hss,
                        lb,
                        p.theta,
                        w.connection,
                        face,
                    ),
                    with_notes,
                ),
                ChordPlate::Transverse => push_strength(
                    r,
                    method,
                    "chord_local_yielding",
                    &subject,
                    cite,
                    demand,
                    k::round_transverse_plate_local_yielding(
                        ed,
                        &hss,
                        t.mate.width,
                        w.connection,
                        face,
                    ),
                    with_notes,
                ),
            }
        }
        (Shape::Rect { .. }, Some((b, h))) => {
            let hss = RectangularHss {
                width_b: b,
                height_h: h,
                wall: section.t_design,
                corner_radius: section.r_outer,
                fy: w.fy,
                fu: w.fu,
            };
            let cite = ed.cite(k::rectangular_clause(ed), "");
            let face_note = format!(
                "the plate is on the {:.3} in. face of the chord (B), its side walls {:.3} in. high (H)",
                b.to_in(),
                h.to_in()
            );
            let with_face = |c: CheckResult| with_notes(c).note(face_note.clone());
            match oc.plate {
                ChordPlate::Longitudinal => push_strength(
                    r,
                    method,
                    "chord_plastification",
                    &subject,
                    cite,
                    demand,
                    k::rect_longitudinal_plate_plastification(
                        ed,
                        &hss,
                        t.mate.thickness,
                        lb,
                        p.theta,
                        face,
                    ),
                    with_face,
                ),
                ChordPlate::Transverse => {
                    let plate = TransversePlate {
                        width: t.mate.width,
                        thickness: t.mate.thickness,
                        fy: w.fy_mate,
                    };
                    push_strength(
                        r,
                        method,
                        "chord_local_yielding",
                        &subject,
                        cite,
                        demand,
                        k::rect_transverse_plate_local_yielding(ed, &hss, &plate),
                        with_face,
                    );
                    if let Some(s) =
                        (k::rect_transverse_plate_shear_yielding(ed, &hss, &plate)).transpose()
                    {
                        push_strength(
                            r,
                            method,
                            "chord_shear_yielding",
                            &subject,
                            cite,
                            demand,
                            s,
                            with_face,
                        );
                    }
                    if let Some(s) = (k::rect_sidewall_local_yielding(ed, &hss, &plate)).transpose()
                    {
                        push_strength(
                            r,
                            method,
                            "chord_sidewall_yielding",
                            &subject,
                            cite,
                            demand,
                            s,
                            with_face,
                        );
                    }
                    if compression {
                        if let Some(s) =
                            (k::rect_sidewall_local_crippling(ed, &hss, &plate, w.connection, face))
                                .transpose()
                        {
                            push_strength(
                                r,
                                method,
                                "chord_sidewall_crippling",
                                &subject,
                                cite,
                                demand,
                                s,
                                with_face,
                            );
                        }
                    }
                }
            }
        }
        (Shape::Rect { .. }, None) => r.not_checked.push(format!(
            "the wall of chord '{}': the face the plate is on is not known",
            w.chord.id
        )),
    }
}

/// The punching limit on the plate thickness, and the fillet welds of the mate to the chord.
#[allow(clippy::too_many_arguments)] // the parts of the joint, named at the call
fn mate_weld_checks(
    model: &Model,
    chord: &Member,
    t: &TabDetail,
    oc: &OnChord,
    p: &Placement,
    fy: Stress,
    fu: Stress,
    fy_mate: Stress,
    fu_mate: Stress,
    gov: &(Force, String),
    r: &mut ConnectionReport,
) {
    let ed = model.project.edition;
    let method = model.project.method;
    let section = &chord.section;
    let subject = format!("chord wall {}", chord.id);
    if oc.plate == ChordPlate::Longitudinal {
        match section.shape {
            Shape::Round { d } => {
                let hss = RoundHss {
                    diameter: d,
                    wall: section.t_design,
                    fy,
                    fu,
                };
                push_rule(
                    r,
                    "chord_punching",
                    &subject,
                    ed.cite(k::round_clause(ed), "K2-3"),
                    k::round_plate_shear_punching(ed, &hss, t.mate.thickness, fy_mate),
                    false,
                );
            }
            Shape::Rect { b, h } => {
                let (bw, hh) = match &p.faces {
                    Some(f) => *f,
                    None => (b, h),
                };
                let hss = RectangularHss {
                    width_b: bw,
                    height_h: hh,
                    wall: section.t_design,
                    corner_radius: section.r_outer,
                    fy,
                    fu,
                };
                push_rule(
                    r,
                    "chord_punching",
                    &subject,
                    ed.cite(k::rectangular_clause(ed), "K2-3"),
                    k::rect_plate_shear_punching(ed, &hss, t.mate.thickness, fy_mate),
                    false,
                );
            }
        }
    }

    let weld = &oc.weld;
    let length = oc.welded_length(&t.mate);
    let sides = f64::from(weld.sides);
    // a transverse plate on a rectangular chord: the flexible face loads the weld unevenly, so
    // only its effective length counts (K5, Eq. K5-1); and a plate wider than the flat of the
    // face runs its fillets onto the corner radii
    let mut weld_notes: Vec<String> = Vec::new();
    let mut weld_scope: Vec<String> = Vec::new();
    let mut effective = length;
    if let (ChordPlate::Transverse, Shape::Rect { .. }, Some((bw, _))) =
        (oc.plate, section.shape, p.faces)
    {
        let tw = section.t_design;
        let bp = t.mate.width;
        let le = bp * (2.0 * (10.0 / (bw / tw)) * ((fy * tw) / (fy_mate * t.mate.thickness)));
        let le = le.min(bp * 2.0);
        effective = (le * 0.5).min(length);
        weld_notes.push(format!(
            "effective length of the welds of a transverse plate to a rectangular HSS, K5 Eq. K5-1 (from memory): le = 2 (10/(B/t)) (Fy t / (Fyp tp)) Bp ≤ 2 Bp = {:.3} in. for both sides, {:.3} in. of each {:.3} in. line taken",
            le.to_in(),
            effective.to_in(),
            length.to_in()
        ));
        if let Some(r_out) = section.r_outer {
            let flat = bw - r_out * 2.0;
            if bp > flat + Length::mm(1e-6) {
                weld_scope.push(format!(
                    "the plate ({:.3} in.) is wider than the flat of the chord face ({:.3} in. between the corner radii): its fillets run onto the corners, where a fillet is not a fillet; narrow the plate or call for flare-bevel welds at the corners",
                    bp.to_in(),
                    flat.to_in()
                ));
            }
        }
    }
    let line = j2::FilletLine {
        size: weld.size,
        length: effective,
        // the force acts along the member, at θ to the welds that run along the chord
        angle: p.theta,
        end_loaded: true,
    };
    let lines = vec![line; weld.sides as usize];
    let thin_wall = thin_wall_note(section);
    let scope = |c: CheckResult| match &thin_wall {
        Some(n) => c.out_of_scope(n.clone()),
        None => c,
    };
    let what = "mate-to-chord weld";
    push_strength(
        r,
        method,
        "weld_strength",
        what,
        j2::weld_metal_citation(ed, false),
        gov,
        j2::fillet_weld_group_rupture(ed, weld.electrode.fexx, &lines, false),
        |c| {
            let mut c = scope(c.note(format!(
                "{} fillet line{} along the plate's welded edge on the chord face; no directional increase on a weld to a tube wall (kds = 1.0); the whole member force is taken on the weld; the long-weld factor of J2.2b is applied as for an end-loaded weld (conservative)",
                weld.sides,
                if weld.sides == 1 { "" } else { "s" }
            )));
            for n in &weld_notes {
                c = c.note(n.clone());
            }
            for n in &weld_scope {
                c = c.out_of_scope(n.clone());
            }
            c
        },
    );
    // an inclined member: its force along the chord acts at the work point on the chord's axis,
    // off the face, and bends the weld group in the plate's plane
    if p.theta.to_deg() < 90.0 - 1e-6 {
        let e = match (section.shape, p.faces) {
            (Shape::Round { d }, _) => d * 0.5,
            (Shape::Rect { .. }, Some((_, h))) => h * 0.5,
            (Shape::Rect { h, .. }, None) => h * 0.5,
        };
        push_strength(
            r,
            method,
            "weld_strength",
            "mate-to-chord weld, with the moment",
            j2::weld_metal_citation(ed, false),
            gov,
            j2::fillet_lines_eccentric(
                ed,
                weld.electrode.fexx,
                weld.size,
                effective,
                weld.sides,
                p.theta,
                e,
            ),
            |c| {
                scope(c.note(format!(
                    "the member's force passes through the work point on the chord's axis, e = {:.3} in. from the chord face (half the chord's depth), at θ = {:.1} deg",
                    e.to_in(),
                    p.theta.to_deg()
                )))
            },
        );
    }
    for (subj, fy, fu, th, len, note) in [
        (
            format!("chord wall {} along weld", chord.id),
            fy,
            fu,
            section.t_design,
            length * sides,
            "the chord wall along each fillet line, carrying the whole member force (conservative: the force across the wall is the Chapter K check)",
        ),
        (
            "mate along weld".to_string(),
            fy_mate,
            fu_mate,
            t.mate.thickness,
            length,
            "the mate through its thickness along its welded edge",
        ),
    ] {
        push_weld_base_metal(r, model, gov, &subj, (fy, fu), th, len, |c| {
            scope(c.note(note))
        });
    }
    let table = size_table(model.project.units);
    let thinner = section.t_nominal.min(t.mate.thickness);
    let rule = |q| with_thin_wall(q, &thin_wall);
    push_rule(
        r,
        "weld_size_min",
        what,
        ed.cite("J2.2b", "Table J2.4"),
        rule(j2::fillet_size_minimum(ed, table, thinner, weld.size)),
        false,
    );
    let max = j2::fillet_size_maximum(ed, table, section.t_nominal, weld.size, false).map(|mut q| {
        q.notes.push("the limit along an edge of material is applied with the chord wall's thickness: a leg larger than the wall it lands on is not taken (conservative)".into());
        q
    });
    push_rule(
        r,
        "weld_size_max",
        what,
        ed.cite("J2.2b", ""),
        rule(max),
        false,
    );
    push_rule(
        r,
        "weld_length_min",
        what,
        ed.cite("J2.2b", ""),
        rule(j2::fillet_length_minimum(ed, weld.size, length)),
        false,
    );
}
