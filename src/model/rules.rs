//! Rule sets: limits outside the structural standard (a galvanizing kettle, a trailer bed, what a
//! person may lift, zones kept clear), kept in the model under `[rules.NAME]` or in a rules file
//! of the same shape named on the command line. Every value carries its unit; every problem is
//! located (file:line:column, key, hint).
//!
//! ```toml
//! [rules.kettle]
//! about = "galvanizer's kettle, inside size less 6 in. all round"
//! piece_box = ["13 ft", "2 ft 6 in", "4 ft"]      # any order: the piece is fitted turned
//! vent_holes = { least_diameter = "1/2 in" }      # galvanized pieces: vent and drain at both ends
//!
//! [rules.hand-carry]
//! piece_weight = "55 lb"
//!
//! [rules.site]
//! envelope = { max_x = "16 ft 6 in", max_y = "4 ft", max_z = "8 in" }
//! connection_kinds = ["tab", "sleeve"]
//! distinct_fasteners = 3
//! thread_past_nut = "0 in"
//! [[rules.site.clear_zone]]
//! name = "towpath headroom"
//! from = ["2 ft", "-1 ft", "-4 ft"]
//! to = ["14 ft", "-6 in", "4 ft"]
//! clearance = "0 in"
//! ```

use super::reader::{Source, Table};
use crate::diag::Diagnostic;
use crate::units::{Length, Mass};
use std::collections::BTreeSet;
use std::path::Path;

/// The connection kinds a rule set may allow (the model's detail kinds).
pub const CONNECTION_KINDS: [&str; 3] = ["tab", "sleeve", "tapped"];

/// One named set of rules.
#[derive(Debug, Clone, PartialEq)]
pub struct RuleSet {
    pub name: String,
    /// The file it was read from.
    pub file: String,
    /// The line of its `[rules.NAME]` table.
    pub line: usize,
    /// What the set stands for, in the user's words.
    pub about: Option<String>,
    /// The inside sizes of the box every piece must fit, in any order (`piece_box`).
    pub piece_box: Option<[Length; 3]>,
    /// The most a piece may weigh (`piece_weight`).
    pub piece_weight: Option<Mass>,
    /// Least and greatest overall sizes of the structure along x, y, z (`envelope`).
    pub envelope: Option<EnvelopeRule>,
    /// Zones no member may enter (`[[rules.NAME.clear_zone]]`).
    pub clear_zones: Vec<ClearZoneRule>,
    /// The connection kinds allowed (`connection_kinds`).
    pub connection_kinds: Option<Vec<String>>,
    /// The least length of bolt end past the outer face of the nut (`thread_past_nut`).
    pub thread_past_nut: Option<Length>,
    /// The most distinct fastener items (`distinct_fasteners`).
    pub distinct_fasteners: Option<u32>,
    /// Vent and drain holes of galvanized pieces (`vent_holes`).
    pub vent_holes: Option<VentRule>,
}

/// Bounds of the structure's overall size per global axis.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct EnvelopeRule {
    pub min: [Option<Length>; 3],
    pub max: [Option<Length>; 3],
}

/// A zone kept clear: a box with sides along the global axes, and the least clearance to it.
#[derive(Debug, Clone, PartialEq)]
pub struct ClearZoneRule {
    pub name: String,
    /// Least x, y, z of the zone.
    pub min: [Length; 3],
    /// Greatest x, y, z of the zone.
    pub max: [Length; 3],
    /// The least distance any member must keep from the zone (0: may touch).
    pub clearance: Length,
}

/// The vent-and-drain rule of galvanized pieces.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct VentRule {
    /// The least hole diameter that counts as a vent or a drain.
    pub least_diameter: Length,
}

/// Read every `[rules.NAME]` table under `root` (the model's root or a rules file's).
pub fn read_rules(root: &Table) -> Vec<RuleSet> {
    let Some(t) = root.opt_table("rules") else {
        return Vec::new();
    };
    let mut out = Vec::new();
    for (name, r) in t.entries() {
        let ok_name = !name.value.is_empty()
            && name
                .value
                .chars()
                .all(|c| c.is_ascii_alphanumeric() || "-_.".contains(c));
        let set = read_rule_set(&r, &name.value);
        r.finish();
        if !ok_name {
            t.error(
                &name.value,
                format!("'{}' is not a valid rule set name", name.value),
                Some("use letters, digits, '-', '_' or '.'".into()),
            );
            continue;
        }
        if let Some(mut s) = set {
            let offset = name.span.as_ref().map(|s| s.start).unwrap_or(0);
            s.file = t.src.file.to_string();
            s.line = crate::diag::line_column(t.src.text, offset).0;
            out.push(s);
        }
    }
    if out.is_empty() && !t.src.has_errors() {
        root.error(
            "rules",
            "no rule sets",
            Some("add a `[rules.NAME]` table, e.g. `[rules.hand-carry]` with `piece_weight = \"55 lb\"`".into()),
        );
    }
    t.finish();
    out
}

/// `Some(v)` when the key is absent (`v = None`) or read well; `None` when it was wrong.
fn kept<T>(t: &Table, key: &str, v: Option<T>) -> Option<Option<T>> {
    match (t.has(key), v) {
        (false, _) => Some(None),
        (true, Some(v)) => Some(Some(v)),
        (true, None) => None,
    }
}

fn read_rule_set(r: &Table, name: &str) -> Option<RuleSet> {
    let about = r.opt_str("about").map(|s| s.value);
    let piece_box = kept(r, "piece_box", read_box(r, "piece_box"));
    let piece_weight = kept(r, "piece_weight", r.opt_mass("piece_weight"));
    let envelope = kept(
        r,
        "envelope",
        r.opt_table("envelope").and_then(|e| read_envelope(&e)),
    );
    let mut zones_ok = true;
    let mut clear_zones = Vec::new();
    if let Some(rows) = r.opt_array_of_tables("clear_zone") {
        for z in rows {
            match read_zone(&z) {
                Some(zone) => clear_zones.push(zone),
                None => zones_ok = false,
            }
        }
    } else if r.has("clear_zone") {
        zones_ok = false;
    }
    let kinds = r.opt_str_array("connection_kinds").and_then(|list| {
        let mut ok = !list.is_empty();
        if list.is_empty() {
            r.error(
                "connection_kinds",
                "an empty list allows no connection",
                Some(format!("list some of: {}", CONNECTION_KINDS.join(", "))),
            );
        }
        for k in &list {
            if !CONNECTION_KINDS.contains(&k.value.as_str()) {
                ok = false;
                let near = crate::diag::nearest(&k.value, CONNECTION_KINDS.iter().copied());
                r.src.error(
                    k.span.clone(),
                    &k.key,
                    format!("unknown connection kind '{}'", k.value),
                    Some(match near.first() {
                        Some(n) => format!("did you mean '{n}'?"),
                        None => format!("the kinds are: {}", CONNECTION_KINDS.join(", ")),
                    }),
                );
            }
        }
        ok.then(|| list.into_iter().map(|k| k.value).collect())
    });
    let connection_kinds = kept(r, "connection_kinds", kinds);
    let thread_past_nut = kept(
        r,
        "thread_past_nut",
        r.opt_length_or_zero("thread_past_nut"),
    );
    let distinct_fasteners = kept(r, "distinct_fasteners", r.opt_count("distinct_fasteners"));
    let vent_holes = kept(
        r,
        "vent_holes",
        r.opt_table("vent_holes").and_then(|v| {
            let d = v.req_length("least_diameter");
            v.finish();
            d.map(|least_diameter| VentRule { least_diameter })
        }),
    );
    let set = RuleSet {
        name: name.to_string(),
        file: String::new(),
        line: 0,
        about,
        piece_box: piece_box?,
        piece_weight: piece_weight?,
        envelope: envelope?,
        clear_zones,
        connection_kinds: connection_kinds?,
        thread_past_nut: thread_past_nut?,
        distinct_fasteners: distinct_fasteners?,
        vent_holes: vent_holes?,
    };
    if !zones_ok {
        return None;
    }
    if set.is_empty() {
        r.src.error(
            r.span.clone(),
            &r.path,
            format!("rule set '{name}' has no rules"),
            Some("add e.g. `piece_box = [\"8 ft\", \"2 ft\", \"2 ft\"]` or `piece_weight = \"55 lb\"`".into()),
        );
        return None;
    }
    Some(set)
}

/// Three inside sizes of a box, each a length greater than zero, in any order.
fn read_box(r: &Table, key: &str) -> Option<[Length; 3]> {
    if !r.has(key) {
        return None;
    }
    let v = r.req_coordinates(key, 3)?;
    if v.iter().any(|l| l.si() <= 0.0) {
        r.error(
            key,
            "each size of the box must be greater than zero",
            Some(format!("write `{key} = [\"8 ft\", \"2 ft\", \"2 ft\"]`")),
        );
        return None;
    }
    Some([v[0], v[1], v[2]])
}

impl RuleSet {
    /// Where the set was read: "file:line".
    pub fn source(&self) -> String {
        format!("{}:{}", self.file, self.line)
    }

    /// Whether the set has no rule at all.
    pub fn is_empty(&self) -> bool {
        self.piece_box.is_none()
            && self.piece_weight.is_none()
            && self.envelope.is_none()
            && self.clear_zones.is_empty()
            && self.connection_kinds.is_none()
            && self.thread_past_nut.is_none()
            && self.distinct_fasteners.is_none()
            && self.vent_holes.is_none()
    }
}

const AXES: [&str; 3] = ["x", "y", "z"];

fn read_envelope(e: &Table) -> Option<EnvelopeRule> {
    let mut ok = true;
    let mut min = [None; 3];
    let mut max = [None; 3];
    for k in 0..3 {
        let (lo_key, hi_key) = (format!("min_{}", AXES[k]), format!("max_{}", AXES[k]));
        min[k] = e.opt_length(&lo_key);
        max[k] = e.opt_length(&hi_key);
        ok &= (!e.has(&lo_key) || min[k].is_some()) && (!e.has(&hi_key) || max[k].is_some());
        if let (Some(lo), Some(hi)) = (min[k], max[k]) {
            if lo.si() > hi.si() {
                e.error(
                    &lo_key,
                    format!("the least {} size is more than the greatest", AXES[k]),
                    Some(format!("check `{lo_key}` and `{hi_key}`")),
                );
                ok = false;
            }
        }
    }
    e.finish();
    if ok && min.iter().chain(max.iter()).all(Option::is_none) {
        e.error(
            "max_x",
            "the envelope gives no bound",
            Some("add e.g. `max_x = \"17 ft\"` (also min_x, min_y, max_y, min_z, max_z)".into()),
        );
        return None;
    }
    ok.then_some(EnvelopeRule { min, max })
}

fn read_zone(z: &Table) -> Option<ClearZoneRule> {
    let name = z.req_str("name", "\"walkway\"");
    let from = z.req_coordinates("from", 3);
    let to = z.req_coordinates("to", 3);
    let clearance = if z.has("clearance") {
        z.opt_length_or_zero("clearance")
    } else {
        z.error(
            "clearance",
            "missing least clearance to the zone",
            Some("add `clearance = \"0 in\"` (0: a member may touch the zone)".into()),
        );
        None
    };
    z.finish();
    let (from, to) = (from?, to?);
    let mut min = [Length::mm(0.0); 3];
    let mut max = [Length::mm(0.0); 3];
    for k in 0..3 {
        if (from[k] - to[k]).abs().to_mm() < 1e-6 {
            z.error(
                "to",
                format!("the zone has no size along {}", AXES[k]),
                Some("`from` and `to` are opposite corners of the zone".into()),
            );
            return None;
        }
        min[k] = from[k].min(to[k]);
        max[k] = from[k].max(to[k]);
    }
    Some(ClearZoneRule {
        name: name?.value,
        min,
        max,
        clearance: clearance?,
    })
}

/// Read a rules file: `[rules.NAME]` tables and nothing else.
pub fn load_rules_file(path: &Path) -> Result<Vec<RuleSet>, Vec<Diagnostic>> {
    let shown = path.display().to_string();
    let text = std::fs::read_to_string(path).map_err(|e| {
        vec![
            Diagnostic::file(&shown, "--rules-file", format!("cannot read the file: {e}"))
                .hint("check the path"),
        ]
    })?;
    let doc = toml_edit::ImDocument::parse(text.as_str()).map_err(|e| {
        let offset = e.span().map(|s| s.start).unwrap_or(0);
        vec![
            Diagnostic::at(&shown, &text, offset, "(syntax)", e.message().trim()).hint(
                "check the TOML syntax at this point: strings in double quotes, `key = value`, tables in [brackets]",
            ),
        ]
    })?;
    let src = Source::new(&shown, &text);
    let root = Table::root(&src, doc.as_table());
    let sets = if root.has("rules") {
        read_rules(&root)
    } else {
        root.error(
            "rules",
            "a rules file holds `[rules.NAME]` tables; none found",
            Some("add `[rules.hand-carry]` with `piece_weight = \"55 lb\"`".into()),
        );
        Vec::new()
    };
    root.finish();
    let errs = src.take();
    if errs.is_empty() {
        Ok(sets)
    } else {
        Err(errs)
    }
}

/// The rule sets to audit: those named (`--rules NAME`, in that order), or every set when none is
/// named. A name found twice (model and rules file) or not at all is an error.
pub fn choose<'r>(
    model_file: &str,
    sets: &'r [RuleSet],
    names: &[String],
) -> Result<Vec<&'r RuleSet>, Vec<Diagnostic>> {
    let mut errs = Vec::new();
    let mut seen = BTreeSet::new();
    for s in sets {
        if !seen.insert(s.name.as_str()) {
            let first = sets.iter().find(|o| o.name == s.name).expect("seen");
            let mut d = Diagnostic::file(
                &s.file,
                format!("rules.{}", s.name),
                format!(
                    "rule set '{}' is also defined at {}",
                    s.name,
                    first.source()
                ),
            )
            .hint("rename one of them");
            d.line = s.line;
            d.column = 1;
            errs.push(d);
        }
    }
    if sets.is_empty() {
        errs.push(
            Diagnostic::file(
                model_file,
                "rules",
                "no rule sets in the model or a rules file",
            )
            .hint("add `[rules.NAME]` to the model, or name a file with --rules-file"),
        );
    }
    if !errs.is_empty() {
        return Err(errs);
    }
    if names.is_empty() {
        return Ok(sets.iter().collect());
    }
    let mut out = Vec::new();
    for n in names {
        match sets.iter().find(|s| &s.name == n) {
            Some(s) if !out.iter().any(|o: &&RuleSet| o.name == s.name) => out.push(s),
            Some(_) => {}
            None => {
                let near = crate::diag::nearest(n, sets.iter().map(|s| s.name.as_str()));
                errs.push(
                    Diagnostic::file(model_file, "--rules", format!("no rule set '{n}'")).hint(
                        match near.first() {
                            Some(m) => format!("did you mean '{m}'?"),
                            None => format!(
                                "the rule sets are: {}",
                                sets.iter()
                                    .map(|s| s.name.as_str())
                                    .collect::<Vec<_>>()
                                    .join(", ")
                            ),
                        },
                    ),
                );
            }
        }
    }
    if errs.is_empty() {
        Ok(out)
    } else {
        Err(errs)
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    fn read(text: &str) -> (Vec<RuleSet>, Vec<Diagnostic>) {
        let doc = toml_edit::ImDocument::parse(text).unwrap();
        let src = Source::new("r.toml", text);
        let root = Table::root(&src, doc.as_table());
        let sets = read_rules(&root);
        root.finish();
        (sets, src.take())
    }

    fn messages(d: &[Diagnostic]) -> Vec<String> {
        d.iter().map(|d| d.to_string()).collect()
    }

    #[test]
    fn a_full_rule_set_reads_with_its_units() {
        let (sets, errs) = read(
            "[rules.site]\nabout = \"x\"\npiece_box = [\"8 ft\", \"2 ft\", \"600 mm\"]\n\
             piece_weight = \"25 kg\"\nenvelope = { max_x = \"17 ft\", min_y = \"1 ft\" }\n\
             connection_kinds = [\"tab\"]\nthread_past_nut = \"0 in\"\ndistinct_fasteners = 3\n\
             vent_holes = { least_diameter = \"1/2 in\" }\n\
             [[rules.site.clear_zone]]\nname = \"walk\"\nfrom = [\"1 ft\", \"2 ft\", \"3 ft\"]\n\
             to = [\"0 ft\", \"0 ft\", \"0 ft\"]\nclearance = \"2 in\"\n",
        );
        assert!(errs.is_empty(), "{:?}", messages(&errs));
        let s = &sets[0];
        assert_eq!((s.name.as_str(), s.line), ("site", 1));
        let b = s.piece_box.unwrap();
        assert!((b[0].to_in() - 96.0).abs() < 1e-9 && (b[2].to_mm() - 600.0).abs() < 1e-9);
        assert!((s.piece_weight.unwrap().to_kg() - 25.0).abs() < 1e-12);
        let e = s.envelope.unwrap();
        assert!(e.max[0].is_some() && e.min[1].is_some() && e.max[1].is_none());
        // Corners given in any order become the zone's least and greatest corners.
        let z = &s.clear_zones[0];
        assert!((z.min[2].to_in()).abs() < 1e-9 && (z.max[2].to_in() - 36.0).abs() < 1e-9);
        assert_eq!(
            s.connection_kinds.as_deref(),
            Some(&["tab".to_string()][..])
        );
        assert_eq!(s.distinct_fasteners, Some(3));
        assert!((s.vent_holes.unwrap().least_diameter.to_in() - 0.5).abs() < 1e-12);
    }

    #[test]
    fn wrong_rules_are_located_and_named() {
        let (sets, errs) = read(
            "[rules.a]\npiece_weight = \"25\"\n\
             [rules.b]\nconnection_kinds = [\"tabs\"]\n\
             [rules.c]\nenvelope = { max_x = \"1 ft\", min_x = \"2 ft\" }\n\
             [rules.d]\nabout = \"nothing\"\n\
             [[rules.e.clear_zone]]\nname = \"flat\"\nfrom = [\"0 ft\", \"0 ft\", \"0 ft\"]\nto = [\"1 ft\", \"0 ft\", \"1 ft\"]\nclearance = \"0 in\"\n\
             [rules.f]\npiece_box = [\"1 ft\", \"0 ft\", \"1 ft\"]\n",
        );
        assert!(sets.is_empty());
        let m = messages(&errs);
        assert_eq!(m.len(), 6, "{m:#?}");
        assert!(
            m[0].starts_with("r.toml:2:16: rules.a.piece_weight:"),
            "{}",
            m[0]
        );
        assert!(
            m[1].contains("rules.b.connection_kinds[0]: unknown connection kind 'tabs' (hint: did you mean 'tab'?)"),
            "{}",
            m[1]
        );
        assert!(
            m[2].contains("the least x size is more than the greatest"),
            "{}",
            m[2]
        );
        assert!(
            m[3].contains("rules.d: rule set 'd' has no rules"),
            "{}",
            m[3]
        );
        assert!(m[4].contains("the zone has no size along y"), "{}", m[4]);
        assert!(
            m[5].contains("each size of the box must be greater than zero"),
            "{}",
            m[5]
        );
    }

    #[test]
    fn a_clear_zone_needs_its_clearance() {
        let (_, errs) = read(
            "[[rules.a.clear_zone]]\nname = \"z\"\nfrom = [\"0 ft\", \"0 ft\", \"0 ft\"]\nto = [\"1 ft\", \"1 ft\", \"1 ft\"]\n",
        );
        assert_eq!(errs.len(), 1);
        assert!(
            errs[0].to_string().contains("missing least clearance"),
            "{}",
            errs[0]
        );
    }

    fn set(name: &str, line: usize) -> RuleSet {
        RuleSet {
            name: name.into(),
            file: "m.toml".into(),
            line,
            about: None,
            piece_box: None,
            piece_weight: Some(Mass::kg(20.0)),
            envelope: None,
            clear_zones: Vec::new(),
            connection_kinds: None,
            thread_past_nut: None,
            distinct_fasteners: None,
            vent_holes: None,
        }
    }

    #[test]
    fn choosing_sets_by_name() {
        let sets = vec![set("kettle", 3), set("trailer", 9)];
        let all = choose("m.toml", &sets, &[]).unwrap();
        assert_eq!(all.len(), 2);
        let one = choose("m.toml", &sets, &["trailer".into(), "trailer".into()]).unwrap();
        assert_eq!(one.len(), 1);
        assert_eq!(one[0].name, "trailer");
        let e = choose("m.toml", &sets, &["kettel".into()]).unwrap_err();
        assert!(
            e[0].to_string().contains("did you mean 'kettle'?"),
            "{}",
            e[0]
        );
        let twice = vec![set("kettle", 3), set("kettle", 12)];
        let e = choose("m.toml", &twice, &[]).unwrap_err();
        assert_eq!((e[0].line, e[0].key.as_str()), (12, "rules.kettle"));
        assert!(
            e[0].message.contains("also defined at m.toml:3"),
            "{}",
            e[0]
        );
        assert!(choose("m.toml", &[], &[]).is_err());
    }
}
