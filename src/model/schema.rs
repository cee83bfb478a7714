//! The tables of the model file, read into the model's types with catalogue names resolved.
//! Every problem goes to the [`Source`] with its position; a part that cannot be read is left out
//! so the rest can still be checked for more problems.

use super::reader::{At, Table};
use super::{
    Bolting, ClampedPlate, Coating, Detail, DetailKind, DirectionalIncrease, End, EndWeld,
    FlareBevelWeld, FreeLength, HeadSide, HoleAt, MatePlate, Member, Node, OnChord, Plug, Project,
    SleeveDetail, SlotWeld, TabDetail, TabPlate, TabWeld, TappedDetail, ThreadPastNut, VentHole,
    WasherPlacement,
};
use crate::catalogue::{Catalogue, NotFound};
use crate::stackup::StickoutRule;
use crate::standards::aisc360::j2_welds::FlareProcess;
use crate::standards::aisc360::j3_bolts::{HoleDeformation, HoleType, Threads};
use crate::standards::aisc360::Edition;
use crate::standards::Method;
use crate::units::{Length, UnitSystem};
use std::collections::{BTreeMap, BTreeSet};

/// The word that marks a member end without a checked connection.
pub const NO_DETAIL: &str = "none";

/// The project table and the files it names.
pub struct ProjectPart {
    pub project: Project,
    pub catalogues: Vec<At<String>>,
    pub forces_file: Option<At<String>>,
}

/// Read `[project]`.
pub fn read_project(root: &Table) -> Option<ProjectPart> {
    let t = root.req_table("project")?;
    let title = t.req_str("title", "\"Footbridge truss\"");
    let client = t.opt_str("client").map(|s| s.value);
    let revision = t.req_str("revision", "\"A\"");
    let edition = t
        .req_choice("standard", &["AISC 360-22", "AISC 360-16"])
        .and_then(|s| Edition::parse(&s.value));
    let method = t.req_choice("method", &["LRFD", "ASD"]).map(|s| {
        if s.value == "LRFD" {
            Method::Lrfd
        } else {
            Method::Asd
        }
    });
    let demand_factor = if t.has("demand_factor") {
        t.opt_number("demand_factor", 0.01, 100.0)
    } else {
        t.error(
            "demand_factor",
            "missing demand factor",
            Some("add `demand_factor = 1.0` (the factor applied to every member force; 1.0 for none)".into()),
        );
        None
    };
    let units = t
        .req_choice("units", &["us", "si"])
        .and_then(|s| UnitSystem::parse(&s.value));
    let hole_deformation = t
        .req_choice("hole_deformation", &["considered", "not considered"])
        .map(|s| {
            if s.value == "considered" {
                HoleDeformation::DesignConsideration
            } else {
                HoleDeformation::NotDesignConsideration
            }
        });
    let directional = read_directional_increase(&t);
    let thread_past_nut = read_thread_past_nut(&t);
    let max_stickout = t.opt_length("max_stickout");
    let max_stickout_bad = t.has("max_stickout") && max_stickout.is_none();
    let catalogues = t.opt_str_array("catalogues").unwrap_or_default();
    let forces_file = t.opt_str("forces");
    let spares = read_spares(&t);
    t.finish();
    if max_stickout_bad {
        return None;
    }
    Some(ProjectPart {
        project: Project {
            title: title?.value,
            client,
            revision: revision?.value,
            edition: edition?,
            method: method?,
            demand_factor: demand_factor?,
            units: units?,
            hole_deformation: hole_deformation?,
            weld_directional_increase: directional?,
            spares: spares?,
            thread_past_nut: thread_past_nut?,
            max_stickout,
        },
        catalogues,
        forces_file,
    })
}

/// Read `weld_directional_increase`: "on" or "off", off when the key is left out (the increase
/// of AISC 360 J2.4 is not relied on for welds to tube walls unless the user turns it on).
fn read_directional_increase(t: &Table) -> Option<DirectionalIncrease> {
    if !t.has("weld_directional_increase") {
        return Some(DirectionalIncrease {
            on: false,
            set_by_model: false,
        });
    }
    t.opt_choice("weld_directional_increase", &["off", "on"])
        .map(|v| DirectionalIncrease {
            on: v.value == "on",
            set_by_model: true,
        })
}

/// Read `thread_past_nut`: "flush", "N threads" (full thread pitches) or a length; flush when
/// the key is left out (RCSC 2020 §2.3.2, the rule for structural bolts).
fn read_thread_past_nut(t: &Table) -> Option<ThreadPastNut> {
    let Some(text) = t.opt_str("thread_past_nut") else {
        return (!t.has("thread_past_nut")).then_some(ThreadPastNut {
            rule: StickoutRule::Flush,
            set_by_model: false,
        });
    };
    let v = text.value.trim();
    let hint = Some("write \"flush\", \"2 threads\" or a length such as \"1/8 in\"".to_string());
    let rule = if v == "flush" {
        Some(StickoutRule::Flush)
    } else if let Some(n) = v
        .strip_suffix("threads")
        .or_else(|| v.strip_suffix("thread"))
        .map(str::trim)
    {
        match n.parse::<u32>() {
            Ok(n) if (1..=20).contains(&n) => Some(StickoutRule::Pitches(n)),
            _ => None,
        }
    } else {
        match crate::units::parse_length(v) {
            Ok(l) if l.si() > 0.0 && l.is_finite() => Some(StickoutRule::Length(l)),
            _ => None,
        }
    };
    if rule.is_none() {
        t.error(
            "thread_past_nut",
            format!("'{v}' is not a thread-past-the-nut rule"),
            hint,
        );
    }
    rule.map(|rule| ThreadPastNut {
        rule,
        set_by_model: true,
    })
}

/// Read `spares = { percent = 5, minimum = 1 }` of `[project]`: both keys, or no table at all.
/// `Some(None)` when the table is absent, `None` when it has a problem.
fn read_spares(t: &Table) -> Option<Option<super::Spares>> {
    if !t.has("spares") {
        return Some(None);
    }
    let s = t.opt_table("spares")?;
    let percent = if s.has("percent") {
        s.opt_percent("percent")
    } else {
        s.error(
            "percent",
            "missing percentage of spares",
            Some("add `percent = 5`".into()),
        );
        None
    };
    let minimum = s.req_count("minimum");
    s.finish();
    Some(Some(super::Spares {
        percent: percent?,
        minimum: minimum?,
    }))
}

/// Check an id: letters, digits, '-', '_' and '.', not empty, not the reserved word.
fn valid_id(t: &Table, name: &At<String>, what: &str) -> bool {
    let ok = !name.value.is_empty()
        && name
            .value
            .chars()
            .all(|c| c.is_ascii_alphanumeric() || "-_.".contains(c));
    if !ok {
        t.src.error(
            name.span.clone(),
            &name.key,
            format!("'{}' is not a valid {what} id", name.value),
            Some("use letters, digits, '-', '_' or '.'".into()),
        );
    } else if name.value == NO_DETAIL {
        t.src.error(
            name.span.clone(),
            &name.key,
            format!("'{NO_DETAIL}' is reserved for a member end without a detail"),
            Some("choose another id".into()),
        );
        return false;
    }
    ok
}

/// Read `[nodes]`: `ID = ["x", "y", "z"]`.
pub fn read_nodes(root: &Table) -> Vec<Node> {
    let Some(t) = root.req_table("nodes") else {
        return Vec::new();
    };
    let mut out = Vec::new();
    for key in t.keys() {
        let name = At {
            value: key.clone(),
            span: None,
            key: format!("nodes.{key}"),
        };
        let coords = t.req_coordinates(&key, 3);
        if !valid_id(&t, &name, "node") {
            continue;
        }
        if let Some(c) = coords {
            out.push(Node {
                id: key,
                at: [c[0], c[1], c[2]],
            });
        }
    }
    if out.is_empty() && !t.src.has_errors() {
        root.error(
            "nodes",
            "no nodes",
            Some("add `N1 = [\"0 ft\", \"0 ft\", \"0 ft\"]`".into()),
        );
    }
    t.finish();
    out
}

/// Report a catalogue name that is not there, at the key that named it.
fn not_found(t: &Table, key: &str, e: NotFound) {
    let hint = if e.nearest.is_empty() {
        format!("see `jointbook catalogue list {}`", e.kind)
    } else {
        format!(
            "nearest {} entries: {}",
            e.kind,
            e.nearest
                .iter()
                .map(|n| format!("'{n}'"))
                .collect::<Vec<_>>()
                .join(", ")
        )
    };
    t.error(key, format!("unknown {} '{}'", e.kind, e.name), Some(hint));
}

macro_rules! resolve {
    ($t:expr, $cat:expr, $key:literal, $lookup:ident, $example:literal) => {{
        $t.req_str($key, $example)
            .and_then(|name| match $cat.$lookup(&name.value) {
                Ok(v) => Some(v.clone()),
                Err(e) => {
                    not_found($t, $key, e);
                    None
                }
            })
    }};
}

/// Read `[members]`: `[members.ID]` with from, to, section, material, start, end.
/// `declared_nodes` are the node ids written in the file, read without error or not: a node
/// whose own entry has an error is not reported again as missing.
pub fn read_members(
    root: &Table,
    cat: &Catalogue,
    nodes: &[Node],
    declared_nodes: &BTreeSet<String>,
) -> Vec<Member> {
    let Some(t) = root.req_table("members") else {
        return Vec::new();
    };
    let by_id: BTreeMap<&str, &Node> = nodes.iter().map(|n| (n.id.as_str(), n)).collect();
    let mut out = Vec::new();
    for (name, m) in t.entries() {
        let from = node_ref(&m, "from", &by_id, declared_nodes);
        let to = node_ref(&m, "to", &by_id, declared_nodes);
        let section = resolve!(&m, cat, "section", section, "\"HSS2x2x1/8\"");
        let material = resolve!(&m, cat, "material", material, "\"ASTM A500 Gr C (shaped)\"");
        let start = m.req_str("start", "\"TAB-1\" or \"none\"");
        let end = m.req_str("end", "\"TAB-1\" or \"none\"");
        let shop = read_member_shop(&m);
        m.finish();
        if !valid_id(&t, &name, "member") {
            continue;
        }
        let (
            Some(from),
            Some(to),
            Some(section),
            Some(material),
            Some(start),
            Some(end),
            Some(shop),
        ) = (from, to, section, material, start, end, shop)
        else {
            continue;
        };
        let (a, b) = (by_id[from.as_str()], by_id[to.as_str()]);
        let length = distance(a.at, b.at);
        if length.to_mm() < 1e-6 {
            m.error(
                "to",
                format!(
                    "member '{}' has zero length: nodes '{}' and '{}' are at the same point",
                    name.value, from, to
                ),
                Some("check the node ids and coordinates".into()),
            );
            continue;
        }
        if let Some(c) = shop.cut_length {
            if c.to_mm() > length.to_mm() + 1e-6 {
                m.error(
                    "cut_length",
                    format!(
                        "the cut length {:.1} mm is longer than the member's node-to-node length {:.1} mm",
                        c.to_mm(),
                        length.to_mm()
                    ),
                    Some("check the value and its unit, or the node coordinates".into()),
                );
                continue;
            }
        }
        let offset = name.span.as_ref().map(|s| s.start).unwrap_or(0);
        let detail_of = |s: At<String>| (s.value != NO_DETAIL).then_some(s.value);
        out.push(Member {
            mark: shop.mark.unwrap_or_else(|| name.value.clone()),
            id: name.value,
            from,
            to,
            section,
            material,
            start: detail_of(start),
            end: detail_of(end),
            length,
            offset,
            line: crate::diag::line_column(t.src.text, offset).0,
            cut_length: shop.cut_length,
            start_setback: shop.start_setback,
            end_setback: shop.end_setback,
            roll: shop.roll,
            coating: shop.coating,
            vent_holes: shop.vent_holes,
        });
    }
    if out.is_empty() && !t.src.has_errors() {
        root.error(
            "members",
            "no members",
            Some("add a `[members.M1]` table".into()),
        );
    }
    t.finish();
    out
}

/// The fabrication keys of a member: all optional, each checked where it is written.
struct MemberShop {
    mark: Option<String>,
    cut_length: Option<Length>,
    start_setback: Option<Length>,
    end_setback: Option<Length>,
    roll: Option<crate::units::Angle>,
    coating: Option<Coating>,
    vent_holes: Vec<VentHole>,
}

/// Read `mark`, `cut_length`, `start_setback`, `end_setback`, `roll`, `coating` and
/// `vent_holes` of a member; `None` when one of them is wrong (already reported).
fn read_member_shop(m: &Table) -> Option<MemberShop> {
    let mut ok = true;
    let mark = m.opt_str("mark").and_then(|s| {
        let good = !s.value.trim().is_empty()
            && s.value
                .chars()
                .all(|c| c.is_ascii_alphanumeric() || "-_./".contains(c));
        if !good {
            m.error(
                "mark",
                format!("'{}' is not a valid piece mark", s.value),
                Some("use letters, digits, '-', '_', '.' or '/'".into()),
            );
        }
        good.then_some(s.value)
    });
    ok &= !m.has("mark") || mark.is_some();
    let cut_length = m.opt_length("cut_length");
    ok &= !m.has("cut_length") || cut_length.is_some();
    let start_setback = m.opt_length_or_zero("start_setback");
    ok &= !m.has("start_setback") || start_setback.is_some();
    let end_setback = m.opt_length_or_zero("end_setback");
    ok &= !m.has("end_setback") || end_setback.is_some();
    let roll = m.opt_angle("roll");
    ok &= !m.has("roll") || roll.is_some();
    let coating = m
        .opt_choice("coating", &["galvanized", "painted", "bare"])
        .map(|c| match c.value.as_str() {
            "galvanized" => Coating::Galvanized,
            "painted" => Coating::Painted,
            _ => Coating::Bare,
        });
    ok &= !m.has("coating") || coating.is_some();
    let mut vent_holes = Vec::new();
    if let Some(rows) = m.opt_array_of_tables("vent_holes") {
        for h in rows {
            let at =
                h.req_choice("at", &["start", "end", "between"])
                    .map(|a| match a.value.as_str() {
                        "start" => HoleAt::Start,
                        "end" => HoleAt::End,
                        _ => HoleAt::Between,
                    });
            let diameter = h.req_length("diameter");
            h.finish();
            match (at, diameter) {
                (Some(at), Some(diameter)) => vent_holes.push(VentHole { at, diameter }),
                _ => ok = false,
            }
        }
    } else if m.has("vent_holes") {
        ok = false;
    }
    ok.then_some(MemberShop {
        mark,
        cut_length,
        start_setback,
        end_setback,
        roll,
        coating,
        vent_holes,
    })
}

fn node_ref(
    m: &Table,
    key: &str,
    by_id: &BTreeMap<&str, &Node>,
    declared: &BTreeSet<String>,
) -> Option<String> {
    let s = m.req_str(key, "\"N1\"")?;
    if by_id.contains_key(s.value.as_str()) {
        Some(s.value)
    } else if declared.contains(&s.value) {
        None
    } else {
        let near = crate::diag::nearest(&s.value, by_id.keys().copied());
        m.error(
            key,
            format!("no node '{}' in [nodes]", s.value),
            Some(match near.first() {
                Some(n) => format!("did you mean '{n}'?"),
                None => "add the node to [nodes]".into(),
            }),
        );
        None
    }
}

fn distance(a: [Length; 3], b: [Length; 3]) -> Length {
    let d: f64 = (0..3).map(|i| (b[i].to_mm() - a[i].to_mm()).powi(2)).sum();
    Length::mm(d.sqrt())
}

/// Read `[details]`: `[details.ID]` with `kind = "tab"` or `"sleeve"`.
pub fn read_details(root: &Table, cat: &Catalogue) -> Vec<Detail> {
    let Some(t) = root.opt_table("details") else {
        return Vec::new();
    };
    let mut out = Vec::new();
    for (name, d) in t.entries() {
        let kind = d.req_choice("kind", &["tab", "sleeve", "tapped"]);
        let bolts = d
            .req_table("bolts")
            .and_then(|b| read_bolting(&b, cat, kind.as_ref()));
        let shape = match kind.as_ref().map(|k| k.value.as_str()) {
            Some("tab") => read_tab(&d, cat).map(DetailKind::Tab),
            Some("sleeve") => read_sleeve(&d, cat).map(DetailKind::Sleeve),
            Some("tapped") => read_tapped(&d, cat).map(DetailKind::Tapped),
            _ => None,
        };
        let setback = d.opt_length_or_zero("setback");
        let setback_ok = !d.has("setback") || setback.is_some();
        // With no valid kind the keys that belong here are unknown; do not list them as errors.
        if kind.is_some() {
            d.finish();
        }
        if !valid_id(&t, &name, "detail") {
            continue;
        }
        if let (Some(bolts), Some(kind), true) = (bolts, shape, setback_ok) {
            let one_mate = matches!(&kind, DetailKind::Tab(t) if t.mate.count == 1);
            match (one_mate, bolts.head_side) {
                (true, None) => {
                    d.error(
                        "bolts",
                        "a tab lapped to one plate needs the side the bolt enters from",
                        Some("add `head_side = \"mate\"` or `head_side = \"tab\"` to the bolts: the ply under the head".into()),
                    );
                    continue;
                }
                (false, Some(_)) => {
                    d.error(
                        "bolts",
                        "`head_side` has no meaning here: the stack is the same from either side",
                        Some("remove `head_side`".into()),
                    );
                    continue;
                }
                _ => {}
            }
            if let (DetailKind::Sleeve(_), true) = (&kind, bolts.across != 1) {
                d.error(
                    "bolts",
                    "a sleeve has one through-bolt per cross-section",
                    Some("set `across = 1` and give the bolts along the member as `along`".into()),
                );
                continue;
            }
            let offset = name.span.as_ref().map(|s| s.start).unwrap_or(0);
            out.push(Detail {
                id: name.value,
                bolts,
                kind,
                setback,
                line: crate::diag::line_column(t.src.text, offset).0,
            });
        }
    }
    t.finish();
    out
}

fn read_bolting(b: &Table, cat: &Catalogue, kind: Option<&At<String>>) -> Option<Bolting> {
    let grade = resolve!(b, cat, "grade", bolt_grade, "\"ASTM F3125 Gr A325\"");
    let thread = resolve!(b, cat, "thread", thread, "\"1/2-13 UNC\"");
    let bolt_type = resolve!(b, cat, "type", bolt_type, "\"heavy hex structural bolt\"");
    let tapped = kind.is_some_and(|k| k.value == "tapped");
    let (nut, nut_grade) = if tapped {
        for key in ["nut", "nut_grade"] {
            if b.has(key) {
                b.error(
                    key,
                    "a tapped detail has no nut: the screw threads into the plug",
                    Some(format!("remove `{key}`, or use a tab detail with a nut")),
                );
            }
        }
        (Some(None), Some(None))
    } else {
        (
            resolve!(b, cat, "nut", nut, "\"heavy hex nut\"").map(Some),
            resolve!(b, cat, "nut_grade", nut_grade, "\"ASTM A563 Gr DH\"").map(Some),
        )
    };
    let washer = if b.has("washer") {
        resolve!(b, cat, "washer", washer, "\"ASTM F436\"").map(Some)
    } else {
        Some(None)
    };
    let across = b.req_count("across");
    let along = b.req_count("along");
    let pitch = b.opt_length("pitch");
    let gauge = b.opt_length("gauge");
    let hole = b
        .req_choice(
            "hole",
            &["standard", "oversized", "short slot", "long slot"],
        )
        .map(|h| match h.value.as_str() {
            "standard" => HoleType::Standard,
            "oversized" => HoleType::Oversized,
            "short slot" => HoleType::ShortSlot,
            _ => HoleType::LongSlot,
        });
    let hole_override = b.opt_length("hole_diameter");
    let threads = b
        .opt_choice("threads", &["excluded", "not excluded"])
        .map(|t| {
            if t.value == "excluded" {
                Threads::Excluded
            } else {
                Threads::NotExcluded
            }
        });
    let length = b.opt_length("length");
    let length_bad = b.has("length") && length.is_none();
    let washers = b
        .opt_choice(
            "washers",
            &["none", "under head", "under nut", "under head and nut"],
        )
        .map(|w| match w.value.as_str() {
            "none" => WasherPlacement::None,
            "under head" => WasherPlacement::UnderHead,
            "under nut" => WasherPlacement::UnderNut,
            _ => WasherPlacement::UnderHeadAndNut,
        });
    let washers_given = b.has("washers");
    let head_side = b.opt_choice("head_side", &["tab", "mate"]).map(|h| {
        if h.value == "tab" {
            HeadSide::Tab
        } else {
            HeadSide::Mate
        }
    });
    let head_side_bad = b.has("head_side") && head_side.is_none();
    b.finish();
    let (across, along) = (across?, along?);
    let mut ok = !length_bad && !head_side_bad;
    let washer_named = b.has("washer");
    let washers = match (washers, washers_given, washer_named) {
        (Some(WasherPlacement::None), _, true) => {
            b.error(
                "washers",
                "a washer type is named but `washers = \"none\"`",
                Some("remove `washer` or say where it goes: \"under nut\", \"under head\" or \"under head and nut\"".into()),
            );
            None
        }
        (Some(WasherPlacement::None), _, false) => Some(WasherPlacement::None),
        (Some(w), _, true) => Some(w),
        (Some(_), _, false) => {
            b.error(
                "washer",
                "washers are placed but no washer type is named",
                Some("add `washer = \"ASTM F436\"`".into()),
            );
            None
        }
        (None, false, true) => {
            b.error(
                "washers",
                "the washer's place is not given",
                Some(if tapped {
                    "add `washers = \"under head\"` (a tapped detail has no nut), or `washers = \"none\"`".into()
                } else {
                    "add `washers = \"under nut\"` (or \"under head\", \"under head and nut\")".into()
                }),
            );
            None
        }
        (None, false, false) => Some(WasherPlacement::None),
        (None, true, _) => None,
    };
    ok &= washers.is_some();
    if tapped && washers.is_some_and(|w| w.under_nut()) {
        b.error(
            "washers",
            "a tapped detail has no nut to put a washer under",
            Some("write `washers = \"under head\"` or `\"none\"`".into()),
        );
        ok = false;
    }
    if along > 1 && pitch.is_none() && !b.has("pitch") {
        b.error(
            "pitch",
            format!("{along} bolts in line need their spacing"),
            Some("add `pitch = \"1-1/2 in\"`".into()),
        );
        ok = false;
    }
    if across > 1 && gauge.is_none() && !b.has("gauge") {
        b.error(
            "gauge",
            format!("{across} lines of bolts need their spacing across the force"),
            Some("add `gauge = \"1-1/2 in\"`".into()),
        );
        ok = false;
    }
    if kind.is_some_and(|k| k.value == "sleeve") && hole == Some(HoleType::LongSlot) {
        b.error(
            "hole",
            "a slotted hole through a tube wall is not covered here",
            Some("use `hole = \"standard\"`".into()),
        );
        ok = false;
    }
    let (grade, thread, bolt_type, nut, nut_grade, washer, hole) = (
        grade?, thread?, bolt_type?, nut?, nut_grade?, washer?, hole?,
    );
    if tapped && (across != 1 || along != 1) {
        b.error(
            if across != 1 { "across" } else { "along" },
            "a tapped detail has one screw, on the member's axis",
            Some("set `across = 1` and `along = 1`".into()),
        );
        ok = false;
    }
    if let Some(nut) = nut.as_ref().filter(|n| n.size_for(thread.d).is_none()) {
        b.error(
            "nut",
            format!(
                "the catalogue has no {} for a {} bolt",
                nut.name, thread.designation
            ),
            Some("choose another nut or add the size to a user catalogue".into()),
        );
        ok = false;
    }
    if let Some(w) = &washer {
        if w.size_for(thread.d).is_none() {
            b.error(
                "washer",
                format!(
                    "the catalogue has no {} for a {} bolt",
                    w.name, thread.designation
                ),
                Some("choose another washer or add the size to a user catalogue".into()),
            );
            ok = false;
        }
    }
    if let Err(e) = grade.strength_at(thread.d) {
        b.error(
            "grade",
            e,
            Some("choose a grade made in this diameter".into()),
        );
        ok = false;
    }
    if let Some(h) = hole_override {
        if h <= thread.d {
            b.error(
                "hole_diameter",
                "the hole is not larger than the bolt",
                Some("give the drilled hole diameter, e.g. \"9/16 in\" for a 1/2 in. bolt".into()),
            );
            ok = false;
        }
    }
    ok.then_some(Bolting {
        grade,
        thread,
        bolt_type,
        nut,
        nut_grade,
        washer,
        across,
        along,
        pitch,
        gauge,
        hole,
        hole_override,
        threads,
        length,
        washers: washers?,
        head_side,
    })
}

fn read_tab(d: &Table, cat: &Catalogue) -> Option<TabDetail> {
    let tab = d.req_table("tab").and_then(|t| {
        let thickness = t.req_length("thickness");
        let width = t.req_length("width");
        let material = resolve!(&t, cat, "material", material, "\"ASTM A36\"");
        let end_distance = t.req_length("end_distance");
        let clear_length = t.req_length("clear_length");
        let k = required_number(
            &t,
            "k",
            0.5,
            10.0,
            "1.2 (effective length factor of the tab's free length)",
        );
        t.finish();
        Some(TabPlate {
            thickness: thickness?,
            width: width?,
            material: material?,
            end_distance: end_distance?,
            clear_length: clear_length?,
            k: k?,
        })
    });
    let mate = d.req_table("mate").and_then(|t| {
        let thickness = t.req_length("thickness");
        let width = t.req_length("width");
        let material = resolve!(&t, cat, "material", material, "\"ASTM A36\"");
        let end_distance = t.req_length("end_distance");
        let back_distance = t.req_length("back_distance");
        let count = t.req_count("count").and_then(|n| match n {
            1 | 2 => Some(n),
            n => {
                t.error(
                    "count",
                    format!("{n} mating plates: a tab laps one plate or sits between two"),
                    Some("write `count = 1` or `count = 2`".into()),
                );
                None
            }
        });
        let free_length = read_free_length(&t);
        t.finish();
        Some(MatePlate {
            thickness: thickness?,
            width: width?,
            material: material?,
            end_distance: end_distance?,
            back_distance: back_distance?,
            count: count?,
            free_length: free_length?,
        })
    });
    let weld = d.req_table("weld").and_then(|t| {
        let joint = t.opt_choice("joint", &["slot fillets", "flare bevel"]);
        if t.has("joint") && joint.is_none() {
            return None;
        }
        let w = match joint.as_ref().map(|j| j.value.as_str()) {
            Some("flare bevel") => read_flare_bevel(&t, cat).map(TabWeld::FlareBevel),
            _ => read_slot_weld(&t, cat).map(TabWeld::Slot),
        };
        t.finish();
        w
    });
    let on_chord = if d.has("on_chord") {
        d.opt_table("on_chord").and_then(|t| read_on_chord(&t, cat))
    } else {
        Some(None)
    };
    Some(TabDetail {
        tab: tab?,
        mate: mate?,
        weld: weld?,
        on_chord: on_chord?,
    })
}

/// The four fillets of a tab in a slot: `size`, `length`, `electrode`, `slot_gap`.
fn read_slot_weld(t: &Table, cat: &Catalogue) -> Option<SlotWeld> {
    let size = t.req_length("size");
    let length = t.req_length("length");
    let electrode = resolve!(t, cat, "electrode", electrode, "\"E70\"");
    let slot_gap = if t.has("slot_gap") {
        t.opt_length_or_zero("slot_gap")
    } else {
        t.error(
            "slot_gap",
            "missing fit-up gap of the slot",
            Some("add `slot_gap = \"1/16 in\"` (slot width less tab thickness)".into()),
        );
        None
    };
    Some(SlotWeld {
        size: size?,
        length: length?,
        electrode: electrode?,
        slot_gap: slot_gap?,
    })
}

/// The flare-bevel welds of a tab lapped on a tube face: `length`, `electrode`, `process`, and
/// `fill = "flush"` (the only fill Table J2.2 rates).
fn read_flare_bevel(t: &Table, cat: &Catalogue) -> Option<FlareBevelWeld> {
    let length = t.req_length("length");
    let electrode = resolve!(t, cat, "electrode", electrode, "\"E70\"");
    let process = t
        .req_choice("process", &["GMAW", "FCAW-G", "SMAW", "FCAW-S", "SAW"])
        .map(|p| match p.value.as_str() {
            "GMAW" | "FCAW-G" => FlareProcess::GmawFcawG,
            "SAW" => FlareProcess::Saw,
            _ => FlareProcess::SmawFcawS,
        });
    let fill = if t.has("fill") {
        t.opt_choice("fill", &["flush"])
    } else {
        t.error(
            "fill",
            "missing fill of the flare-bevel groove",
            Some("add `fill = \"flush\"`: the effective throat of Table J2.2 is for a groove filled flush".into()),
        );
        None
    };
    fill?;
    Some(FlareBevelWeld {
        length: length?,
        electrode: electrode?,
        process: process?,
    })
}

/// The mate's optional `free_length` and `k`: both or neither (a free length without its K is an
/// error, never a default K).
fn read_free_length(t: &Table) -> Option<Option<FreeLength>> {
    match (t.has("free_length"), t.has("k")) {
        (false, false) => Some(None),
        (true, true) => {
            let length = t.req_length("free_length");
            let k = t.opt_number("k", 0.5, 10.0);
            Some(Some(FreeLength {
                length: length?,
                k: k?,
            }))
        }
        (true, false) => {
            t.error(
                "k",
                "missing effective length factor of the mate's free length",
                Some("add `k = 1.2` (or the factor the mate's support justifies) beside `free_length`".into()),
            );
            None
        }
        (false, true) => {
            t.error(
                "free_length",
                "missing: `k` is given without the free length it applies to",
                Some("add `free_length = \"1-1/2 in\"` (bolt row nearest the support to the line where the mate is held), or remove `k`".into()),
            );
            None
        }
    }
}

/// The chord ids of `on_chord`: `chord = "ID"` or `chords = ["ID", ...]`, one of the two.
fn read_chord_refs(t: &Table) -> Option<Vec<super::ChordRef>> {
    let at = |a: At<String>| super::ChordRef {
        offset: a.span.as_ref().map(|s| s.start).unwrap_or(0),
        key: a.key,
        id: a.value,
    };
    let key = if t.has("chord") { "chord" } else { "chords" };
    let refs = match (t.has("chord"), t.has("chords")) {
        (true, true) => {
            t.error(
                "chords",
                "both `chord` and `chords` are given",
                Some("keep one: `chord = \"TC1\"` or `chords = [\"TC1\", \"TC2\"]`".into()),
            );
            return None;
        }
        (false, false) => {
            t.error(
                "chord",
                "missing the member the mate is welded to",
                Some("add `chord = \"TC1\"` (a member id), or `chords = [\"TC1\", \"TC2\"]` when the detail is used on several chords".into()),
            );
            return None;
        }
        (true, false) => vec![at(t.opt_str("chord")?)],
        (false, true) => t.opt_str_array("chords")?.into_iter().map(at).collect(),
    };
    if refs.is_empty() {
        t.error(
            key,
            "no chord member named",
            Some("write `chords = [\"TC1\", \"TC2\"]`".into()),
        );
        return None;
    }
    if let Some(r) = refs.iter().find(|r| r.id.is_empty() || r.id == NO_DETAIL) {
        t.error(
            key,
            format!("'{}' is not a member id", r.id),
            Some("give the id of the member the mate is welded to".into()),
        );
        return None;
    }
    Some(refs)
}

/// Read `on_chord`: the mate shop-welded to a chord's face (`chord` or `chords`, `plate`, `lb`,
/// `weld`).
fn read_on_chord(t: &Table, cat: &Catalogue) -> Option<Option<Box<OnChord>>> {
    let chords = read_chord_refs(t);
    let plate = t
        .req_choice("plate", &["longitudinal", "transverse"])
        .map(|p| {
            if p.value == "longitudinal" {
                super::ChordPlate::Longitudinal
            } else {
                super::ChordPlate::Transverse
            }
        });
    let lb = t.opt_length("lb");
    let mut ok = !t.has("lb") || lb.is_some();
    if plate == Some(super::ChordPlate::Transverse) && t.has("lb") {
        t.error(
            "lb",
            "a transverse plate bears on the chord over its thickness; `lb` has no meaning here",
            Some("remove `lb` (the plate's width across the chord is the mate's `width`)".into()),
        );
        ok = false;
    }
    let weld = if t.has("weld") {
        t.opt_table("weld").and_then(|w| {
            let size = w.req_length("size");
            let electrode = resolve!(&w, cat, "electrode", electrode, "\"E70\"");
            let sides = w.req_count("sides").and_then(|n| match n {
                1 | 2 => Some(n),
                n => {
                    w.error(
                        "sides",
                        format!("{n} welded sides: a plate is welded on one side or both"),
                        Some(
                            "write `sides = 2` (a fillet each side of the plate) or `sides = 1`"
                                .into(),
                        ),
                    );
                    None
                }
            });
            w.finish();
            Some(super::ChordWeld {
                size: size?,
                electrode: electrode?,
                sides: sides?,
            })
        })
    } else {
        t.error(
            "weld",
            "missing weld of the mate to the chord",
            Some("add `weld = { size = \"3/16 in\", electrode = \"E70\", sides = 2 }`".into()),
        );
        None
    };
    t.finish();
    ok.then_some(())?;
    Some(Some(Box::new(OnChord {
        chords: chords?,
        plate: plate?,
        lb,
        weld: weld?,
    })))
}

fn required_number(t: &Table, key: &str, lo: f64, hi: f64, example: &str) -> Option<f64> {
    if !t.has(key) {
        t.error(
            key,
            "missing value",
            Some(format!("add `{key} = {example}`")),
        );
        return None;
    }
    t.opt_number(key, lo, hi)
}

fn read_tapped(d: &Table, cat: &Catalogue) -> Option<TappedDetail> {
    let plate = d.req_table("plate").and_then(|t| {
        let thickness = t.req_length("thickness");
        let material = resolve!(&t, cat, "material", material, "\"ASTM A36\"");
        t.finish();
        Some(ClampedPlate {
            thickness: thickness?,
            material: material?,
        })
    });
    let plug = d.req_table("plug").and_then(|t| {
        let material = resolve!(&t, cat, "material", material, "\"ASTM A36\"");
        let thickness = t.req_length("thickness");
        let engagement = t.req_length("engagement");
        t.finish();
        let (thickness, engagement) = (thickness?, engagement?);
        if engagement > thickness {
            t.error(
                "engagement",
                "the engaged thread is longer than the plug is thick",
                Some(
                    "give the length of full thread inside the plug, at most its thickness".into(),
                ),
            );
            return None;
        }
        Some(Plug {
            material: material?,
            thickness,
            engagement,
        })
    });
    let weld = d.req_table("weld").and_then(|t| {
        let size = t.req_length("size");
        let electrode = resolve!(&t, cat, "electrode", electrode, "\"E70\"");
        t.finish();
        Some(EndWeld {
            size: size?,
            electrode: electrode?,
        })
    });
    Some(TappedDetail {
        plate: plate?,
        plug: plug?,
        weld: weld?,
    })
}

fn read_sleeve(d: &Table, cat: &Catalogue) -> Option<SleeveDetail> {
    let t = d.req_table("sleeve")?;
    let section = resolve!(&t, cat, "section", section, "\"HSS1-1/2x1-1/2x1/8\"");
    let material = resolve!(&t, cat, "material", material, "\"ASTM A500 Gr C (shaped)\"");
    let insertion = t.req_length("insertion");
    let end_distance = t.req_length("end_distance");
    let inside_seam = if t.has("inside_seam") {
        t.opt_length_or_zero("inside_seam")
    } else {
        t.error(
            "inside_seam",
            "missing value: the height of the weld seam inside the member decides whether the sleeve fits",
            Some("add `inside_seam = \"1/32 in\"` (measured), or `\"0 in\"` when the seam is removed or the tube is seamless".into()),
        );
        None
    };
    let clearance_min = t.opt_length_or_zero("clearance_min");
    let clearance_max = t.opt_length("clearance_max");
    let min_insertion = t.opt_length("min_insertion");
    let length = t.opt_length("length");
    let welded_into = t.opt_choice("welded_into", &["start", "end"]).map(|w| {
        if w.value == "start" {
            End::Start
        } else {
            End::End
        }
    });
    let ok =
        (!t.has("length") || length.is_some()) && (!t.has("welded_into") || welded_into.is_some());
    t.finish();
    if let (Some(l), Some(i)) = (length, insertion) {
        if l.to_mm() <= i.to_mm() {
            t.error(
                "length",
                "the sleeve is not longer than its insertion into this member",
                Some("give the sleeve's whole length, both members' insertions and any gap".into()),
            );
            return None;
        }
    }
    if let (Some(lo), Some(hi)) = (clearance_min, clearance_max) {
        if lo >= hi {
            t.error(
                "clearance_max",
                "the largest clearance is not above the least one",
                Some(
                    "give a band, e.g. `clearance_min = \"1/32 in\"`, `clearance_max = \"1/8 in\"`"
                        .into(),
                ),
            );
            return None;
        }
    }
    ok.then_some(())?;
    Some(SleeveDetail {
        section: section?,
        material: material?,
        insertion: insertion?,
        end_distance: end_distance?,
        inside_seam: inside_seam?,
        clearance_min,
        clearance_max,
        min_insertion,
        length,
        welded_into,
    })
}
