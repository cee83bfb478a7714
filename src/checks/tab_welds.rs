//! The welds joining a tab to its tube: four fillets in a slotted end, or two flare-bevel groove
//! welds where a tab lapped on a face of a rectangular tube meets the tube's rounded corners.

use super::tab::{
    push_rule, push_strength, push_weld_base_metal, size_table, thin_wall_note, with_thin_wall,
};
use super::weld_kds::tube_weld_kds;
use super::{impossible, CheckResult, ConnectionReport};
use crate::catalogue::Shape;
use crate::model::{FlareBevelWeld, Member, Model, SlotWeld, TabPlate};
use crate::standards::aisc360::input::InputError;
use crate::standards::aisc360::j2_welds as j2;
use crate::units::{Angle, Force, Length, Stress};

/// What the weld checks of a tab need from the connection.
pub(super) struct WeldSite<'a> {
    pub model: &'a Model,
    pub m: &'a Member,
    pub tab: &'a TabPlate,
    /// The governing demand and its load case.
    pub gov: &'a (Force, String),
    /// Fy and Fu of the tube and of the tab.
    pub tube: (Stress, Stress),
    pub tab_strength: (Stress, Stress),
}

/// The four fillets of a tab in a slotted tube end: weld metal (J2.4), base metal (J4.2) and
/// the size and length rules (J2.2b).
pub(super) fn slot_fillets(at: &WeldSite, weld: &SlotWeld, r: &mut ConnectionReport) {
    let (model, m, tab, gov) = (at.model, at.m, at.tab, at.gov);
    let ed = model.project.edition;
    let method = model.project.method;
    let ((fy_tube, fu_tube), (fy_tab, fu_tab)) = (at.tube, at.tab_strength);
    let wall = m.section.t_design;
    let line = j2::FilletLine {
        size: weld.size,
        length: weld.length,
        angle: Angle::deg(0.0),
        end_loaded: true,
    };
    let thin_wall = thin_wall_note(&m.section);
    let scope = |c: CheckResult| match &thin_wall {
        Some(n) => c.out_of_scope(n.clone()),
        None => c,
    };
    let kds = tube_weld_kds(
        ed,
        model.project.weld_directional_increase,
        line.angle,
        false,
    );
    let welds = j2::fillet_weld_group_rupture(ed, weld.electrode.fexx, &[line; 4], kds.used);
    push_strength(
        r,
        method,
        "weld_strength",
        "tab-to-tube fillets",
        j2::weld_metal_citation(ed, kds.used),
        gov,
        welds,
        |c| {
            scope(kds.annotate(c.note("four fillet lines, both faces of the tab at both slotted walls, along the force (θ = 0, so kds = 1.0 in any case)")))
        },
    );
    for (subject, fy, fu, th, length) in [
        (
            "tube wall along welds",
            fy_tube,
            fu_tube,
            wall,
            weld.length * 4.0,
        ),
        (
            "tab along welds",
            fy_tab,
            fu_tab,
            tab.thickness,
            weld.length * 2.0,
        ),
    ] {
        push_weld_base_metal(r, model, gov, subject, (fy, fu), th, length, scope);
    }
    let table = size_table(model.project.units);
    let thinner_part = m.section.t_nominal.min(tab.thickness);
    let rule = |q| with_thin_wall(q, &thin_wall);
    push_rule(
        r,
        "weld_size_min",
        "tab-to-tube fillets",
        ed.cite("J2.2b", "Table J2.4"),
        rule(j2::fillet_size_minimum(ed, table, thinner_part, weld.size)),
        false,
    );
    push_rule(
        r,
        "weld_size_max",
        "tab-to-tube fillets",
        ed.cite("J2.2b", ""),
        rule(j2::fillet_size_maximum(ed, table, wall, weld.size, false)),
        false,
    );
    push_rule(
        r,
        "weld_length_min",
        "tab-to-tube fillets",
        ed.cite("J2.2b", ""),
        rule(j2::fillet_length_minimum(ed, weld.size, weld.length)),
        false,
    );
}

/// The two flare-bevel groove welds of a lapped tab: weld metal (J2.4, Table J2.2 throat, Table
/// J2.5 factors), base metal (J4.2) and the minimum throat (Table J2.3).
pub(super) fn flare_bevels(at: &WeldSite, weld: &FlareBevelWeld, r: &mut ConnectionReport) {
    let (model, m, tab, gov) = (at.model, at.m, at.tab, at.gov);
    let ed = model.project.edition;
    let method = model.project.method;
    let ((fy_tube, fu_tube), (fy_tab, fu_tab)) = (at.tube, at.tab_strength);
    let subject = "tab-to-tube flare-bevel welds";
    let cite = ed.cite("J2.4, Table J2.2, Table J2.5", "J2-3");
    let radius = match corner_fit(m, tab) {
        Ok(radius) => radius,
        Err(e) => {
            r.checks.push(impossible("weld_strength", subject, cite, e));
            return;
        }
    };
    let thin_wall = thin_wall_note(&m.section);
    let scope = |c: CheckResult| match &thin_wall {
        Some(n) => c.out_of_scope(n.clone()),
        None => c,
    };
    let strength = j2::flare_groove_weld_rupture(
        ed,
        weld.electrode.fexx,
        j2::FlareGroove::Bevel,
        weld.process,
        radius,
        weld.length,
        j2::GrooveLoad::Shear,
    );
    let radius_note = format!(
        "R = {:.3} in., the outside corner radius of {} by the catalogue's rule ({}): a nominal \
         value, not a measured one; a tube with a tighter corner has a smaller throat",
        radius.to_in(),
        m.section.name,
        m.section.rule.basis()
    );
    push_strength(
        r,
        method,
        "weld_strength",
        subject,
        cite,
        gov,
        strength,
        |c| {
            scope(
            c.times(2.0, "n", "weld lines, one along each edge of the tab")
                .note("two flare-bevel groove welds filled flush, one along each edge of the tab where it meets a rounded corner of the tube, along the force: shear on the effective area")
                .note(radius_note)
                .note("the directional strength increase of J2.4 is for fillet welds: not applied to these groove welds"),
        )
        },
    );
    let wall = m.section.t_design;
    for (subject, fy, fu, th) in [
        ("tube wall along welds", fy_tube, fu_tube, wall),
        ("tab along welds", fy_tab, fu_tab, tab.thickness),
    ] {
        let length = weld.length * 2.0;
        push_weld_base_metal(r, model, gov, subject, (fy, fu), th, length, scope);
    }
    let table = size_table(model.project.units);
    let thinner_part = m.section.t_nominal.min(tab.thickness);
    let (throat, _) =
        j2::flare_groove_effective_throat(j2::FlareGroove::Bevel, weld.process, radius);
    push_rule(
        r,
        "weld_throat_min",
        subject,
        ed.cite("J2.1b", "Table J2.3"),
        with_thin_wall(
            j2::groove_throat_minimum(ed, table, thinner_part, throat),
            &thin_wall,
        ),
        false,
    );
}

/// The outside corner radius a lapped tab's edges meet: the tube must be rectangular and the tab
/// as wide as one of its faces (within 1/32 in., common practice), so that each edge lies at a
/// rounded corner.
fn corner_fit(m: &Member, tab: &TabPlate) -> Result<Length, InputError> {
    let (Shape::Rect { b, h }, Some(radius)) = (m.section.shape, m.section.r_outer) else {
        return Err(InputError::new(
            "R",
            format!(
                "a flare-bevel weld needs the rounded corner of a rectangular tube; {} is round",
                m.section.name
            ),
        ));
    };
    let tolerance = Length::inch(1.0 / 32.0);
    let fits = |face: Length| (tab.width - face).abs() <= tolerance;
    if !(fits(b) || fits(h)) {
        return Err(InputError::new(
            "b",
            format!(
                "the tab is {:.3} in. wide but the faces of {} are {:.3} in. and {:.3} in.: \
                 only a tab as wide as the face (within 1/32 in.) has its edges at the rounded \
                 corners, where a flare-bevel weld forms",
                tab.width.to_in(),
                m.section.name,
                b.to_in(),
                h.to_in()
            ),
        ));
    }
    Ok(radius)
}

/// What is not computed for a tab lapped on one face of the tube.
pub(super) fn lapped_tab_limits(m: &Member, tab: &TabPlate, r: &mut ConnectionReport) {
    let depth = match m.section.shape {
        Shape::Rect { b, h } => {
            if (tab.width - b).abs() <= Length::inch(1.0 / 32.0) {
                h
            } else {
                b
            }
        }
        Shape::Round { d } => d,
    };
    let offset = depth * 0.5 + tab.thickness * 0.5;
    r.not_checked.push(format!(
        "eccentricity of the lapped tab: the force in the tab is {:.3} in. off the member's axis \
         (half the tube's depth and half the tab); the bending this puts in the tube end, the \
         tab and the welds is not computed",
        offset.to_in()
    ));
    r.not_checked.push(
        "tube_net_rupture: Table D3.1 gives no shear-lag factor for a plate lapped on one face of \
         a rectangular HSS; the tube's rupture at the end of the lap is not computed"
            .into(),
    );
    r.not_checked.push(
        "the tube wall's local strength under the welded tab (chapter K) is not computed".into(),
    );
}
