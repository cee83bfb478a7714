//! The audit of a model against its chosen rule sets: the pieces are made from the model
//! ([`crate::model::pieces`]), each rule of each set is applied to every piece, member,
//! connection or to the whole structure, and the results are gathered in rule-set order.
//!
//! Pieces of one mark are alike (grouping refuses unlike ones), so the piece rules are applied
//! once per mark. Members for the envelope are taken node to node, each with its section swept
//! along its axis: a tube's set-back can only shorten it, so this is never less than the real
//! extent (conservative). For the clear zones each member is its piece in place: the tube as cut
//! between its set-backs and its shop parts (see [`piece_in_place`]).

use super::clear_zone::{clear_zone_rule, ClearZone};
use super::connections::{connection_kind_rule, distinct_fasteners_rule, thread_past_nut_rule};
use super::envelope::{structure_envelope, structure_extents};
use super::galvanizing::{vent_and_drain_rule, HollowPart, Opening, OpeningAt};
use super::piece_box::piece_box_rule;
use super::weight::piece_weight_rule;
use super::{
    AuditInputError, AuditResult, AuditStatus, MemberSolid, Point3, Roll, Section as SolidSection,
};
use crate::catalogue::Shape;
use crate::checks::fasteners::{fastener_sets, BoltLength, FastenerSet};
use crate::diag::Diagnostic;
use crate::model::pieces::{
    group_by_mark, pieces, solid_section, CutBasis, Piece, PieceGroup, ShopPartKind,
};
use crate::model::rules::RuleSet;
use crate::model::{Coating, End, HoleAt, Member, Model};
use crate::sheet::hardware::{kits, LENGTH_NOT_CHOSEN};
use crate::units::{Angle, Length, Mass};
use std::collections::{BTreeMap, BTreeSet};

/// The results of one rule set.
#[derive(Debug, Clone, PartialEq)]
pub struct RuleSetResults {
    pub name: String,
    /// Where the set was read: "file:line".
    pub source: String,
    pub about: Option<String>,
    pub results: Vec<AuditResult>,
}

/// The whole audit.
#[derive(Debug, Clone, PartialEq)]
pub struct AuditReport {
    pub sets: Vec<RuleSetResults>,
    /// The pieces grouped by mark, as audited.
    pub groups: Vec<PieceGroup>,
    /// The weight of every piece together (loose hardware not included: see `notes`).
    pub pieces_weight: Mass,
    /// Things a person must know about the whole audit.
    pub notes: Vec<String>,
}

impl AuditReport {
    /// Fail when any rule fails; else warn when any rule warns; else pass.
    pub fn status(&self) -> AuditStatus {
        let all = || self.sets.iter().flat_map(|s| s.results.iter());
        if all().any(|r| r.status == AuditStatus::Fail) {
            AuditStatus::Fail
        } else if all().any(|r| r.status == AuditStatus::Warn) {
            AuditStatus::Warn
        } else {
            AuditStatus::Pass
        }
    }
}

/// A rule that could not judge its input, as a located diagnostic.
fn input_error(model: &Model, e: AuditInputError) -> Diagnostic {
    Diagnostic::file(
        &model.file,
        e.field.clone(),
        format!("{}: {}", e.subject, e.message),
    )
    .hint("check this member's geometry and section")
}

/// The member as a solid from node to node, its section turned by `roll`. A rectangular section
/// that is not square has no default turn: it must be given.
pub fn member_solid(model: &Model, m: &Member) -> Result<MemberSolid, Diagnostic> {
    let node = |id: &str| {
        let n = model
            .nodes
            .iter()
            .find(|n| n.id == id)
            .expect("member nodes are checked when the model is read");
        Point3::new(n.at[0], n.at[1], n.at[2])
    };
    let roll = match (m.roll, m.section.shape) {
        (Some(r), _) => r,
        (None, Shape::Rect { b, h }) if (b - h).abs().to_mm() > 1e-6 => {
            let mut d = Diagnostic::file(
                &model.file,
                format!("members.{}.roll", m.id),
                format!(
                    "member '{}' has a rectangular section ({}) but no `roll`: its turn about its axis decides where it reaches",
                    m.id, m.section.name
                ),
            )
            .hint("add `roll = \"0 deg\"` (depth towards global +z projected; see the README)");
            d.line = m.line;
            d.column = 1;
            return Err(d);
        }
        // A square or round section: the turn about the axis changes the reach of a square tube
        // only off the global axes; 0 deg is the audit's reference turn (noted in the report).
        (None, _) => Angle::deg(0.0),
    };
    Ok(MemberSolid {
        a: node(&m.from),
        b: node(&m.to),
        section: solid_section(&m.section),
        roll: Roll::Angle(roll),
    })
}

/// A point moved `d` along the unit direction `u` (mm components).
fn moved(p: Point3, u: [f64; 3], d: Length) -> Point3 {
    Point3::new(
        p.x + Length::mm(u[0] * d.to_mm()),
        p.y + Length::mm(u[1] * d.to_mm()),
        p.z + Length::mm(u[2] * d.to_mm()),
    )
}

/// A piece where it stands in the structure: the tube as cut between its set-backs and each shop
/// part as a solid along the same axis (a tab as a flat bar, its width along the section depth;
/// a sleeve as its section). With a given cut length the set-backs are not known, so the tube is
/// taken node to node (never shorter than the real one), and its parts are left to that.
pub fn piece_in_place(
    node_to_node: &MemberSolid,
    piece: &Piece,
) -> (Vec<MemberSolid>, &'static str) {
    let (s1, s2) = match piece.cut_basis {
        CutBasis::FromNodes {
            start_setback,
            end_setback,
            ..
        } => (start_setback, end_setback),
        CutBasis::Given => {
            return (
                vec![node_to_node.clone()],
                "tube taken node to node (cut length given, set-backs not known)",
            )
        }
    };
    let (a, b) = (node_to_node.a, node_to_node.b);
    let d = [
        (b.x - a.x).to_mm(),
        (b.y - a.y).to_mm(),
        (b.z - a.z).to_mm(),
    ];
    let n = (d[0] * d[0] + d[1] * d[1] + d[2] * d[2]).sqrt();
    let u = d.map(|c| c / n);
    let start = moved(a, u, s1);
    let mut out = vec![MemberSolid {
        a: start,
        b: moved(b, u, -s2),
        ..node_to_node.clone()
    }];
    for part in &piece.attachments {
        if let ShopPartKind::Mate(f) = &part.kind {
            // The plate's box: along the axis over its length, off the axis along `outward` to
            // the middle of its height, its depth along `outward`.
            let mid = moved(start, u, f.at);
            let off = moved(mid, f.outward, f.face + f.height * 0.5);
            out.push(MemberSolid {
                a: moved(off, u, -(part.length * 0.5)),
                b: moved(off, u, part.length * 0.5),
                section: SolidSection::Rect {
                    depth: f.height,
                    width: f.across,
                },
                roll: Roll::Up(crate::audit::Vec3(f.outward)),
            });
            continue;
        }
        let inside = part.length - part.projection;
        let (x0, x1) = match part.end {
            End::Start => (-part.projection, inside),
            End::End => (
                piece.cut_length - inside,
                piece.cut_length + part.projection,
            ),
        };
        let section = match &part.kind {
            ShopPartKind::Tab {
                width, envelope, ..
            } => SolidSection::Rect {
                depth: *width,
                width: *envelope,
            },
            ShopPartKind::Sleeve { section } | ShopPartKind::Plug { section } => {
                solid_section(section)
            }
            ShopPartKind::Mate(_) => unreachable!("placed above"),
        };
        out.push(MemberSolid {
            a: moved(start, u, x0),
            b: moved(start, u, x1),
            section,
            roll: node_to_node.roll,
        });
    }
    (out, "the tube as cut with its shop parts")
}

/// The distinct fastener items of the model as they are ordered (bolt with its length, nut,
/// washer: the sheet's hardware items, from the checks' fastener sets), and the connections
/// where no bolt length could be chosen.
fn fastener_items(model: &Model, sets: &[FastenerSet]) -> (Vec<String>, Vec<String>) {
    let kits = kits(model, sets);
    let mut items = Vec::new();
    let mut unsettled = Vec::new();
    for k in &kits {
        let i = &k.item;
        if i.length == LENGTH_NOT_CHOSEN && !unsettled.contains(&k.connection) {
            unsettled.push(k.connection.clone());
        }
        let words: Vec<&str> = [
            i.kind.as_str(),
            i.product.as_str(),
            i.grade.as_str(),
            i.size.as_str(),
            i.thread.as_str(),
            i.length.as_str(),
            i.finish.as_str(),
        ]
        .into_iter()
        .filter(|w| !w.is_empty())
        .collect();
        items.push(words.join(" "));
    }
    (items, unsettled)
}

/// The thread-past-the-nut rule at every connection with a nut, measured on the fastener set
/// the checks settle (the stick-out at the bolt length chosen, washers at their greatest
/// thickness); tapped details have no nut and are listed in `notes` as not measured.
fn thread_past_nut_results(
    sets: &[FastenerSet],
    least: Length,
    rule_set: &str,
    notes: &mut BTreeSet<String>,
    errs: &mut Vec<Diagnostic>,
    model: &Model,
) -> Vec<AuditResult> {
    let mut out = Vec::new();
    let mut tapped = Vec::new();
    for f in sets {
        if f.nut.is_empty() {
            tapped.push(format!("{} ({})", f.connection, f.detail));
            continue;
        }
        let alike = format!(
            "detail {}, {} bolt{} alike",
            f.detail,
            f.bolt_count,
            if f.bolt_count == 1 { "" } else { "s" }
        );
        let (Some(stick), Some(at)) = (f.stickout, f.length.evaluated_at()) else {
            let mut r = AuditResult::from_margin(
                "thread_past_nut",
                rule_set,
                &f.connection,
                Length::mm(0.0).into(),
                least.into(),
                Length::mm(0.0).into(),
                format!("not measured: the stack-up could not be worked out, so no bolt length is chosen (bolt_length fails in `check`); {alike}"),
            );
            r.status = AuditStatus::Warn;
            out.push(r);
            continue;
        };
        match thread_past_nut_rule(&f.connection, stick.length, least, rule_set) {
            Ok(mut r) => {
                r.note.push_str(&format!(
                    " at L = {:.4} in ({:.1} mm), washers at their greatest thickness; {alike}",
                    at.to_in(),
                    at.to_mm()
                ));
                if let BoltLength::NoneFits { .. } = f.length {
                    r.note.push_str("; no length of the series meets every stack-up rule (bolt_length fails in `check`): measured at the length the check shows");
                    if r.status == AuditStatus::Pass {
                        r.status = AuditStatus::Warn;
                    }
                }
                out.push(r);
            }
            Err(e) => errs.push(input_error(model, e)),
        }
    }
    if !tapped.is_empty() {
        notes.insert(format!(
            "rule set '{rule_set}': thread_past_nut n.a. at tapped details (the screw threads into a plug, there is no nut): {}",
            tapped.join(", ")
        ));
    }
    out
}

fn piece_rules(
    set: &RuleSet,
    g: &PieceGroup,
    out: &mut Vec<AuditResult>,
    errs: &mut Vec<Diagnostic>,
    model: &Model,
) {
    let p: &Piece = &g.piece;
    let many = if g.quantity > 1 {
        format!(" (x{}: {})", g.quantity, g.members.join(", "))
    } else {
        String::new()
    };
    if let Some(limit) = set.piece_box {
        match piece_box_rule(&p.box_piece(), limit, &set.name) {
            Ok(mut r) => {
                r.note.push_str(&many);
                out.push(r);
            }
            Err(e) => errs.push(input_error(model, e)),
        }
    }
    if let Some(max) = set.piece_weight {
        let mut r = piece_weight_rule(&p.mark, &p.weight, max, &set.name);
        r.note.push_str(&many);
        out.push(r);
    }
    if let Some(v) = set.vent_holes {
        match p.coating {
            Some(Coating::Galvanized) => {
                let part = HollowPart {
                    name: "tube".into(),
                    openings: p
                        .vent_holes
                        .iter()
                        .map(|h| Opening {
                            at: match h.at {
                                HoleAt::Start => OpeningAt::EndA,
                                HoleAt::End => OpeningAt::EndB,
                                HoleAt::Between => OpeningAt::Between,
                            },
                            diameter: h.diameter,
                        })
                        .collect(),
                };
                match vent_and_drain_rule(&p.mark, &part, v.least_diameter, &set.name) {
                    Ok(mut r) => {
                        r.note.push_str(&many);
                        out.push(r);
                    }
                    Err(e) => errs.push(input_error(model, e)),
                }
            }
            Some(_) => {}
            None => {
                let line = model
                    .members
                    .iter()
                    .find(|m| m.id == p.member)
                    .map(|m| m.line)
                    .unwrap_or(0);
                let mut d = Diagnostic::file(
                    &model.file,
                    format!("members.{}.coating", p.member),
                    format!(
                        "rule set '{}' checks the vent holes of galvanized pieces, but member '{}' does not say whether it is galvanized",
                        set.name, p.member
                    ),
                )
                .hint("add `coating = \"galvanized\"`, \"painted\" or \"bare\"");
                d.line = line;
                d.column = 1;
                errs.push(d);
            }
        }
    }
}

/// What the rules measure, worked out once for every rule set: the pieces by mark, the members
/// node to node and in place, and the checks' fastener sets.
struct Measured<'a> {
    groups: &'a [PieceGroup],
    solids: &'a [(String, MemberSolid)],
    placed: &'a [(String, Vec<MemberSolid>, &'static str)],
    fasteners: &'a [FastenerSet],
}

/// Apply one rule set to the model.
fn audit_set(
    model: &Model,
    set: &RuleSet,
    m: &Measured,
    errs: &mut Vec<Diagnostic>,
    notes: &mut BTreeSet<String>,
) -> RuleSetResults {
    let Measured {
        groups,
        solids,
        placed,
        fasteners,
    } = *m;
    let mut out = Vec::new();
    for g in groups {
        piece_rules(set, g, &mut out, errs, model);
    }
    if set.vent_holes.is_some()
        && !groups
            .iter()
            .any(|g| g.piece.coating == Some(Coating::Galvanized))
    {
        notes.insert(format!(
            "rule set '{}': no piece is galvanized, so no vent holes were checked",
            set.name
        ));
    }
    if let Some(env) = set.envelope {
        match structure_extents(solids) {
            Ok(ext) => out.extend(structure_envelope(ext, env.min, env.max, &set.name)),
            Err(e) => errs.push(input_error(model, e)),
        }
    }
    for z in &set.clear_zones {
        let zone = ClearZone {
            name: z.name.clone(),
            min: Point3::new(z.min[0], z.min[1], z.min[2]),
            max: Point3::new(z.max[0], z.max[1], z.max[2]),
        };
        for (id, parts, how) in placed {
            let mut least: Option<AuditResult> = None;
            for s in parts {
                match clear_zone_rule(id, s, &zone, z.clearance, &set.name) {
                    Ok(r) => {
                        if least.as_ref().map_or(true, |l| r.margin.si < l.margin.si) {
                            least = Some(r);
                        }
                    }
                    Err(e) => errs.push(input_error(model, e)),
                }
            }
            if let Some(mut r) = least {
                r.note.push_str(&format!("; {how}"));
                out.push(r);
            }
        }
    }
    if let Some(kinds) = &set.connection_kinds {
        let allowed: Vec<&str> = kinds.iter().map(String::as_str).collect();
        for m in &model.members {
            for (end, id) in [("start", &m.start), ("end", &m.end)] {
                let Some(d) = id
                    .as_ref()
                    .and_then(|id| model.details.iter().find(|d| &d.id == id))
                else {
                    continue;
                };
                out.push(connection_kind_rule(
                    &format!("{}/{end}", m.id),
                    d.kind.name(),
                    &allowed,
                    &set.name,
                ));
            }
        }
    }
    if let Some(least) = set.thread_past_nut {
        out.extend(thread_past_nut_results(
            fasteners, least, &set.name, notes, errs, model,
        ));
    }
    if let Some(max) = set.distinct_fasteners {
        let (items, unsettled) = fastener_items(model, fasteners);
        let refs: Vec<&str> = items.iter().map(String::as_str).collect();
        let mut r = distinct_fasteners_rule(&refs, max as usize, &set.name);
        if !unsettled.is_empty() && r.status == AuditStatus::Pass {
            r.status = AuditStatus::Warn;
            r.note.push_str(&format!(
                "; no bolt length is chosen at {} (bolt_length fails in `check`): the count holds one item for each such bolt, its length not known",
                unsettled.join(", ")
            ));
        }
        out.push(r);
    }
    RuleSetResults {
        name: set.name.clone(),
        source: set.source(),
        about: set.about.clone(),
        results: out,
    }
}

/// Audit the model against the chosen rule sets. Any input a rule cannot judge is an error.
pub fn audit(model: &Model, sets: &[&RuleSet]) -> Result<AuditReport, Vec<Diagnostic>> {
    let all = pieces(model)?;
    let groups = group_by_mark(model, &all)?;
    let mut errs = Vec::new();
    let needs_solids = sets
        .iter()
        .any(|s| s.envelope.is_some() || !s.clear_zones.is_empty());
    let mut solids = Vec::new();
    let mut placed = Vec::new();
    if needs_solids {
        for (m, p) in model.members.iter().zip(&all) {
            match member_solid(model, m) {
                Ok(s) => {
                    let (parts, how) = piece_in_place(&s, p);
                    placed.push((m.id.clone(), parts, how));
                    solids.push((m.id.clone(), s));
                }
                Err(d) => errs.push(d),
            }
        }
        if !errs.is_empty() {
            return Err(errs);
        }
    }
    let mut notes = BTreeSet::new();
    let needs_fasteners = sets
        .iter()
        .any(|s| s.thread_past_nut.is_some() || s.distinct_fasteners.is_some());
    let fasteners = if needs_fasteners {
        fastener_sets(model)
    } else {
        Vec::new()
    };
    let results: Vec<RuleSetResults> = sets
        .iter()
        .map(|s| {
            let m = Measured {
                groups: &groups,
                solids: &solids,
                placed: &placed,
                fasteners: &fasteners,
            };
            audit_set(model, s, &m, &mut errs, &mut notes)
        })
        .collect();
    if !errs.is_empty() {
        return Err(errs);
    }
    let mut notes: Vec<String> = notes.into_iter().collect();
    let mut left_out: BTreeMap<(String, String), Vec<String>> = BTreeMap::new();
    for p in &all {
        for l in &p.not_included {
            left_out
                .entry((l.detail.clone(), l.what.clone()))
                .or_default()
                .push(format!("{}/{}", p.member, l.end.as_str()));
        }
    }
    for ((detail, what), ends) in left_out {
        notes.push(format!(
            "detail {detail}: {what} at each of {} ends ({}) is in no piece of the model (the model does not say which piece carries it), so no box or weight includes it",
            ends.len(),
            ends.join(", ")
        ));
    }
    if needs_solids && model.members.iter().any(|m| m.roll.is_none()) {
        notes.push(
            "members without `roll` (square or round sections) are taken at the reference turn 0 deg for the envelope and clear zones"
                .into(),
        );
    }
    notes.push(
        "loose hardware (field bolts, nuts, washers) has no weight in the catalogue and is not in the weights"
            .into(),
    );
    Ok(AuditReport {
        sets: results,
        pieces_weight: all.iter().map(|p| p.weight.total).sum(),
        groups,
        notes,
    })
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::model::{load, LoadOptions};

    const FENNEL: &str = include_str!("../../examples/fennel-gorge-kit-bridge/model.toml");
    const FENNEL_FORCES: &str = include_str!("../../examples/fennel-gorge-kit-bridge/forces.csv");

    /// The kit bridge with text replaced and rules appended, read from its own folder.
    fn fennel_with(name: &str, edits: &[(&str, &str)], rules: &str) -> Model {
        let dir = std::env::temp_dir().join(format!("jointbook-run-{name}-{}", std::process::id()));
        std::fs::create_dir_all(&dir).unwrap();
        let mut text = FENNEL.to_string();
        for (from, to) in edits {
            assert!(text.contains(from), "edit target missing: {from}");
            text = text.replacen(from, to, 1);
        }
        text.push_str(rules);
        std::fs::write(dir.join("model.toml"), text).unwrap();
        std::fs::write(dir.join("forces.csv"), FENNEL_FORCES).unwrap();
        let m = load(&dir.join("model.toml"), &LoadOptions::default());
        let _ = std::fs::remove_dir_all(&dir);
        m.unwrap_or_else(|e| panic!("{e:?}"))
    }

    fn run_set(model: &Model, name: &str) -> Result<AuditReport, Vec<Diagnostic>> {
        let set = model.rules.iter().find(|s| s.name == name).unwrap();
        audit(model, &[set])
    }

    const BC1_COAT: &str = "coating = \"painted\"\n\n[members.BC2]";
    const BC2_COAT: &str = "coating = \"painted\"\n\n[members.TC1]";
    const GALV: &str = "\n[rules.galv]\nvent_holes = { least_diameter = \"1/2 in\" }\n";

    #[test]
    fn galvanized_tubes_need_a_vent_at_each_end() {
        let model = fennel_with(
            "galv",
            &[
                (
                    BC1_COAT,
                    "coating = \"galvanized\"\nvent_holes = [{ at = \"start\", diameter = \"1/2 in\" }, { at = \"end\", diameter = \"5/8 in\" }]\n\n[members.BC2]",
                ),
                (BC2_COAT, "coating = \"galvanized\"\n\n[members.TC1]"),
            ],
            GALV,
        );
        let r = run_set(&model, "galv").unwrap();
        let res = &r.sets[0].results;
        // Only the two galvanized pieces are judged; painted ones are not subjects of the rule.
        assert_eq!(res.len(), 2, "{res:#?}");
        assert_eq!(
            (res[0].subject.as_str(), res[0].status),
            ("BC1 tube", AuditStatus::Pass)
        );
        assert_eq!(
            (res[1].subject.as_str(), res[1].status),
            ("BC2 tube", AuditStatus::Fail)
        );
        assert!(res[1].note.contains("burst"), "{}", res[1].note);
        assert_eq!(r.status(), AuditStatus::Fail);
    }

    #[test]
    fn a_piece_without_a_stated_coating_cannot_be_judged_for_vents() {
        let model = fennel_with("nocoat", &[(BC1_COAT, "\n[members.BC2]")], GALV);
        let e = run_set(&model, "galv").unwrap_err();
        assert_eq!(e.len(), 1, "{e:?}");
        assert_eq!(e[0].key, "members.BC1.coating");
        assert_eq!(
            e[0].line,
            FENNEL.lines().position(|l| l == "[members.BC1]").unwrap() + 1
        );
    }

    #[test]
    fn a_rectangular_tube_needs_its_roll_and_the_roll_turns_its_reach() {
        let env = "\n[rules.wide]\nenvelope = { max_z = \"2-1/2 in\" }\n";
        let rect = ("section = \"HSS2x2x1/8\"", "section = \"HSS3x2x1/8\"");
        let model = fennel_with("noroll", &[rect], env);
        let e = run_set(&model, "wide").unwrap_err();
        assert_eq!(e[0].key, "members.BC1.roll");
        // By hand: BC1 runs along x. At roll 0 its 3 in. depth lies along global z (the reference
        // "up" is +z projected), so the structure is 3 in. wide: margin 2.5 − 3 = −0.5 in. Turned
        // 90 deg about +x the depth goes to −y and the 2 in. width lies along z: the widest part
        // is then 2 in. (the other chords): margin +0.5 in.
        for (roll, margin) in [("0 deg", -0.5), ("90 deg", 0.5)] {
            let model = fennel_with(
                "roll",
                &[(rect.0, &format!("{}\nroll = \"{roll}\"", rect.1))],
                env,
            );
            let r = run_set(&model, "wide").unwrap();
            let m = Length::mm(r.sets[0].results[0].margin.si).to_in();
            assert!((m - margin).abs() < 1e-9, "roll {roll}: {m}");
        }
    }

    #[test]
    fn fastener_variety_counts_bolts_by_length() {
        // The kit bridge: one nut and one washer item in both details, and the heavy hex
        // structural bolt at two lengths (hand-worked stack-ups, see tests/cli_audit.rs): the
        // web tab's 1-1/4 in. and the splice's 2-3/4 in.: 4 items.
        let rules =
            "\n[rules.four]\ndistinct_fasteners = 4\n[rules.three]\ndistinct_fasteners = 3\n";
        let model = fennel_with("fasteners", &[], rules);
        let r = run_set(&model, "four").unwrap();
        let res = &r.sets[0].results[0];
        assert_eq!(res.measured.si, 4.0);
        assert_eq!(res.status, AuditStatus::Pass);
        assert!(
            res.note.contains("1-1/4 in") && res.note.contains("2-3/4 in"),
            "{}",
            res.note
        );
        let r = run_set(&model, "three").unwrap();
        assert_eq!(r.sets[0].results[0].status, AuditStatus::Fail);
    }

    #[test]
    fn fastener_variety_warns_where_no_bolt_length_is_chosen() {
        // A greatest stick-out of 1/64 in.: no length of the 1/4 in. series lands between flush
        // and 1/64 in. past the nut, so no bolt length is settled and the count cannot be sure.
        let model = fennel_with(
            "unsettled",
            &[(
                "forces = \"forces.csv\"\n",
                "forces = \"forces.csv\"\nmax_stickout = \"1/64 in\"\n",
            )],
            "\n[rules.many]\ndistinct_fasteners = 10\n",
        );
        let r = run_set(&model, "many").unwrap();
        let res = &r.sets[0].results[0];
        assert_eq!(res.status, AuditStatus::Warn, "{}", res.note);
        assert!(
            res.note.contains("no bolt length is chosen at BC1/end"),
            "{}",
            res.note
        );
    }

    #[test]
    fn a_connection_kind_not_allowed_fails_at_each_end() {
        let rules = "\n[rules.tabs-only]\nconnection_kinds = [\"tab\"]\n";
        let model = fennel_with("kinds", &[], rules);
        let r = run_set(&model, "tabs-only").unwrap();
        let failed: Vec<&str> = r.sets[0]
            .results
            .iter()
            .filter(|x| x.status == AuditStatus::Fail)
            .map(|x| x.subject.as_str())
            .collect();
        assert_eq!(failed, ["BC1/end", "BC2/start", "TC1/end", "TC2/start"]);
    }

    #[test]
    fn a_given_cut_length_puts_the_tube_node_to_node_for_clear_zones() {
        // V1 with a given cut length: its set-backs are not known, so the tube is taken from node
        // B1 (y = 0) to T1: its square end sits at y = 0, 1/2 in. above the channel's top.
        let model = fennel_with(
            "given",
            &[(
                "[members.V1]\nfrom = \"B1\"\nto = \"T1\"\nmark = \"W-V\"\n",
                "[members.V1]\nfrom = \"B1\"\nto = \"T1\"\ncut_length = \"11 in\"\n",
            )],
            "",
        );
        let r = run_set(&model, "gorge").unwrap();
        let v1 = r.sets[0]
            .results
            .iter()
            .find(|x| x.id == "clear_zone" && x.subject == "V1")
            .unwrap();
        assert!((Length::mm(v1.margin.si).to_in() - 0.5).abs() < 1e-9);
        assert!(v1.note.contains("node to node"), "{}", v1.note);
    }
}
