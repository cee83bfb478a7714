//! Catalogues: bolt and nut grades, threads, nuts and washers, bolt lengths, tube sections,
//! materials and electrodes. Embedded from catalogues/*.toml; a user may add or override entries.

mod bolts;
mod hardware;
pub mod listing;
mod materials;
mod node;
mod range;
mod sections;
mod threads;

pub use bolts::{
    AiscGroup, BoltGrade, BoltSize, BoltType, GradeStrength, NutGrade, StrengthBasis, ThreadBand,
    ThreadLengthRule,
};
pub use hardware::{Finish, Nut, NutSize, Washer, WasherSize};
pub use materials::{Electrode, Material};
pub use range::{same_size, SizeRange};
pub use sections::{
    compute_props, Gauge, Section, SectionProps, SectionRule, Shape, Tolerance, ToleranceBand,
};
pub use threads::Thread;

use crate::diag::{nearest, Diagnostic};
use crate::units::Length;
use node::{Ctx, Table};
use std::collections::BTreeMap;

/// A length in inches and millimetres, for messages.
pub fn show_length(l: Length) -> String {
    format!("{:.4} in ({:.2} mm)", l.to_in(), l.to_mm())
}

/// A document a catalogue file cites.
#[derive(Debug, Clone, PartialEq)]
pub struct Source {
    pub id: String,
    pub document: String,
    pub edition: String,
    pub table: String,
    /// Whether the values citing it were typed from memory, without the document at hand.
    pub from_memory: bool,
}

/// Where an entry comes from: its file and line, the source it cites, and whether it was typed from
/// memory.
#[derive(Debug, Clone, PartialEq)]
pub struct Provenance {
    pub file: String,
    pub line: usize,
    pub source: Source,
    pub from_memory: bool,
    pub note: Option<String>,
}

/// A name that is not in the catalogue, with the nearest names of its kind.
#[derive(Debug, Clone, PartialEq, Eq)]
pub struct NotFound {
    pub kind: &'static str,
    pub name: String,
    pub nearest: Vec<String>,
}

impl std::fmt::Display for NotFound {
    fn fmt(&self, f: &mut std::fmt::Formatter<'_>) -> std::fmt::Result {
        write!(f, "unknown {} '{}'", self.kind, self.name)?;
        if !self.nearest.is_empty() {
            write!(f, " (nearest: {})", self.nearest.join(", "))?;
        }
        Ok(())
    }
}

impl std::error::Error for NotFound {}

/// All catalogue data, by kind and name.
#[derive(Debug, Clone, Default, PartialEq)]
pub struct Catalogue {
    pub bolt_grades: BTreeMap<String, BoltGrade>,
    pub nut_grades: BTreeMap<String, NutGrade>,
    pub bolt_types: BTreeMap<String, BoltType>,
    pub threads: BTreeMap<String, Thread>,
    pub nuts: BTreeMap<String, Nut>,
    pub washers: BTreeMap<String, Washer>,
    pub sections: BTreeMap<String, Section>,
    pub materials: BTreeMap<String, Material>,
    pub electrodes: BTreeMap<String, Electrode>,
    pub gauges: BTreeMap<String, Gauge>,
    pub tolerances: BTreeMap<String, Tolerance>,
}

/// The embedded catalogue files, in load order (gauges before the sections that use them).
pub const EMBEDDED: [(&str, &str); 5] = [
    ("bolts.toml", include_str!("../../catalogues/bolts.toml")),
    (
        "threads.toml",
        include_str!("../../catalogues/threads.toml"),
    ),
    (
        "hardware.toml",
        include_str!("../../catalogues/hardware.toml"),
    ),
    (
        "materials.toml",
        include_str!("../../catalogues/materials.toml"),
    ),
    (
        "sections.toml",
        include_str!("../../catalogues/sections.toml"),
    ),
];

/// The kinds of entry a catalogue file may hold, as its array-of-tables keys.
const KINDS: [&str; 11] = [
    "gauge",
    "bolt_grade",
    "nut_grade",
    "bolt_type",
    "thread",
    "nut",
    "washer",
    "section",
    "material",
    "electrode",
    "tolerance",
];

macro_rules! lookup {
    ($fn:ident, $map:ident, $ty:ty, $kind:literal) => {
        #[doc = concat!("The ", $kind, " of this name, or the nearest names.")]
        pub fn $fn(&self, name: &str) -> Result<&$ty, NotFound> {
            self.$map.get(name).ok_or_else(|| NotFound {
                kind: $kind,
                name: name.to_string(),
                nearest: nearest(name, self.$map.keys().map(|k| k.as_str())),
            })
        }
    };
}

impl Catalogue {
    /// The catalogue built into the program.
    pub fn embedded() -> Result<Catalogue, Vec<Diagnostic>> {
        let mut cat = Catalogue::default();
        let mut errs = Vec::new();
        for (file, text) in EMBEDDED {
            if let Err(mut e) = cat.merge_user_file(file, text) {
                errs.append(&mut e);
            }
        }
        if errs.is_empty() {
            Ok(cat)
        } else {
            Err(errs)
        }
    }

    /// Add the entries of a catalogue file. Redefining a name needs `replaces = true` on the entry;
    /// on any error nothing is added.
    pub fn merge_user_file(&mut self, file_name: &str, text: &str) -> Result<(), Vec<Diagnostic>> {
        let mut next = self.clone();
        let mut cx = Ctx::new(file_name, text);
        if let Some(root) = cx.parse_root() {
            next.read_root(&root, &mut cx);
            root.finish(&mut cx);
        }
        if cx.errs.is_empty() {
            *self = next;
            Ok(())
        } else {
            Err(cx.errs)
        }
    }

    fn read_root(&mut self, root: &Table, cx: &mut Ctx) {
        let mut sources = BTreeMap::new();
        for t in root.tables(cx, "source") {
            let id = t.str(cx, "id");
            let document = t.str(cx, "document");
            let edition = t.str(cx, "edition");
            let table = t.str(cx, "table");
            let from_memory = t.bool_or(cx, "from_memory", false);
            t.finish(cx);
            if let (Some(id), Some(document), Some(edition), Some(table)) =
                (id, document, edition, table)
            {
                if sources.contains_key(&id) {
                    cx.error(
                        &t.span,
                        &t.key("id"),
                        format!("source '{id}' is listed twice"),
                    );
                }
                sources.insert(
                    id.clone(),
                    Source {
                        id,
                        document,
                        edition,
                        table,
                        from_memory,
                    },
                );
            }
        }
        for kind in KINDS {
            for t in root.tables(cx, kind) {
                self.read_entry(kind, &t, cx, &sources);
            }
        }
        self.check_references(cx);
    }

    fn read_entry(
        &mut self,
        kind: &str,
        t: &Table,
        cx: &mut Ctx,
        sources: &BTreeMap<String, Source>,
    ) {
        let name_key = if kind == "thread" {
            "designation"
        } else {
            "name"
        };
        let name = t.str(cx, name_key);
        let replaces = t.bool_or(cx, "replaces", false);
        let from_memory = t.bool_or(cx, "from_memory", false);
        let note = t.opt_str(cx, "note");
        let source = t.str(cx, "source").and_then(|id| match sources.get(&id) {
            Some(s) => Some(s.clone()),
            None => {
                let near = nearest(&id, sources.keys().map(|k| k.as_str()));
                cx.error_hint(
                    &t.span_of("source"),
                    &t.key("source"),
                    format!("unknown source '{id}'"),
                    format!(
                        "list it in a [[source]] table of this file; nearest: {}",
                        near.join(", ")
                    ),
                );
                None
            }
        });
        let (Some(name), Some(source)) = (name, source) else {
            return;
        };
        let provenance = Provenance {
            file: cx.file.to_string(),
            line: cx.line_of(t.span.start),
            from_memory: from_memory || source.from_memory,
            source,
            note,
        };
        let span = t.span_of(name_key);
        macro_rules! put {
            ($map:ident, $label:literal, $value:expr) => {{
                if let Some(v) = $value {
                    let existing = self.$map.get(&name).map(|e| e.provenance.clone());
                    match (existing, replaces) {
                        (Some(p), false) => cx.error_hint(
                            &span,
                            &t.key(name_key),
                            format!(
                                "{} '{}' is already defined at {}:{}",
                                $label, name, p.file, p.line
                            ),
                            "add replaces = true to this entry to override it",
                        ),
                        (None, true) => cx.error(
                            &span,
                            &t.key("replaces"),
                            format!(
                                "replaces = true, but there is no {} '{}' to replace",
                                $label, name
                            ),
                        ),
                        _ => {
                            self.$map.insert(name.clone(), v);
                        }
                    }
                }
            }};
        }
        let n = name.clone();
        let p = provenance;
        match kind {
            "gauge" => put!(gauges, "gauge", Gauge::read(t, cx, n, p)),
            "bolt_grade" => put!(bolt_grades, "bolt grade", BoltGrade::read(t, cx, n, p)),
            "nut_grade" => put!(nut_grades, "nut grade", NutGrade::read(t, cx, n, p)),
            "bolt_type" => put!(bolt_types, "bolt type", BoltType::read(t, cx, n, p)),
            "thread" => put!(threads, "thread", Thread::read(t, cx, n, p)),
            "nut" => put!(nuts, "nut", Nut::read(t, cx, n, p)),
            "washer" => put!(washers, "washer", Washer::read(t, cx, n, p)),
            "section" => {
                let g = self.gauges.clone();
                put!(sections, "section", Section::read(t, cx, n, p, &g))
            }
            "material" => put!(materials, "material", Material::read(t, cx, n, p)),
            "electrode" => put!(electrodes, "electrode", Electrode::read(t, cx, n, p)),
            "tolerance" => put!(tolerances, "tolerance", Tolerance::read(t, cx, n, p)),
            _ => {}
        }
    }

    /// Every bolt grade a nut grade names (`suits`, `suits_galvanized`) must exist.
    fn check_references(&self, cx: &mut Ctx) {
        for ng in self.nut_grades.values() {
            if ng.provenance.file != cx.file {
                continue;
            }
            let named = ng
                .suits
                .iter()
                .map(|g| (g, "suits"))
                .chain(ng.suits_galvanized.iter().map(|g| (g, "suits_galvanized")));
            for (g, key) in named {
                if !self.bolt_grades.contains_key(g) {
                    let near = nearest(g, self.bolt_grades.keys().map(|k| k.as_str()));
                    let mut d = Diagnostic::file(
                        cx.file,
                        format!("nut_grade '{}'.{key}", ng.name),
                        format!("unknown bolt grade '{g}'"),
                    );
                    d.line = ng.provenance.line;
                    if !near.is_empty() {
                        d = d.hint(format!("nearest: {}", near.join(", ")));
                    }
                    cx.errs.push(d);
                }
            }
        }
    }

    lookup!(bolt_grade, bolt_grades, BoltGrade, "bolt grade");
    lookup!(nut_grade, nut_grades, NutGrade, "nut grade");
    lookup!(bolt_type, bolt_types, BoltType, "bolt type");
    lookup!(thread, threads, Thread, "thread");
    lookup!(nut, nuts, Nut, "nut");
    lookup!(washer, washers, Washer, "washer");
    lookup!(section, sections, Section, "section");
    lookup!(material, materials, Material, "material");
    lookup!(electrode, electrodes, Electrode, "electrode");
    lookup!(gauge, gauges, Gauge, "gauge");
    lookup!(tolerance, tolerances, Tolerance, "tolerance");
}
