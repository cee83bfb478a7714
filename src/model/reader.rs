//! A reader over a parsed TOML document that keeps the position of every key and value, converts
//! quantities with their units, and collects every problem as a located [`Diagnostic`].
//!
//! Each accessor records the key it was asked for; [`Table::finish`] then reports every key in the
//! table that nobody asked for as unknown, with the nearest known names.

use crate::diag::{nearest, Diagnostic};
use crate::units::{self, UnitError};
use std::cell::RefCell;
use std::collections::BTreeSet;
use std::ops::Range;
use toml_edit::{Item, TableLike, Value};

/// A source file and the diagnostics found in it so far.
pub struct Source<'a> {
    pub file: &'a str,
    pub text: &'a str,
    diags: RefCell<Vec<Diagnostic>>,
}

impl<'a> Source<'a> {
    pub fn new(file: &'a str, text: &'a str) -> Self {
        Source {
            file,
            text,
            diags: RefCell::new(Vec::new()),
        }
    }

    /// Record a problem at a span.
    pub fn error(
        &self,
        span: Option<Range<usize>>,
        key: &str,
        message: impl Into<String>,
        hint: Option<String>,
    ) {
        let offset = span.map(|s| s.start).unwrap_or(0);
        let mut d = Diagnostic::at(self.file, self.text, offset, key, message);
        d.hint = hint;
        self.diags.borrow_mut().push(d);
    }

    /// Record a ready-made diagnostic.
    pub fn push(&self, d: Diagnostic) {
        self.diags.borrow_mut().push(d);
    }

    pub fn has_errors(&self) -> bool {
        !self.diags.borrow().is_empty()
    }

    pub fn take(&self) -> Vec<Diagnostic> {
        std::mem::take(&mut self.diags.borrow_mut())
    }
}

/// A value with the byte span it came from.
#[derive(Debug, Clone, PartialEq)]
pub struct At<T> {
    pub value: T,
    pub span: Option<Range<usize>>,
    /// The key path of the value, for later messages.
    pub key: String,
}

/// A view of a TOML table (a `[table]` or an inline `{ ... }`) with its key path.
pub struct Table<'s, 'a> {
    pub src: &'s Source<'a>,
    inner: &'a dyn TableLike,
    pub path: String,
    pub span: Option<Range<usize>>,
    asked: RefCell<BTreeSet<String>>,
}

fn type_name(item: &Item) -> &'static str {
    match item {
        Item::None => "nothing",
        Item::Table(_) => "a table",
        Item::ArrayOfTables(_) => "an array of tables",
        Item::Value(v) => match v {
            Value::String(_) => "a string",
            Value::Integer(_) => "an integer",
            Value::Float(_) => "a number",
            Value::Boolean(_) => "a boolean",
            Value::Datetime(_) => "a date",
            Value::Array(_) => "an array",
            Value::InlineTable(_) => "a table",
        },
    }
}

/// What kind of quantity a key holds, with the parser and an example for messages.
#[derive(Clone, Copy)]
pub enum Kind {
    Length,
    Force,
    Stress,
    Mass,
    MassPerLength,
    Angle,
}

impl Kind {
    fn example(self) -> &'static str {
        match self {
            Kind::Length => "\"1-1/2 in\" or \"38 mm\"",
            Kind::Force => "\"4.5 kip\" or \"20 kN\"",
            Kind::Stress => "\"50 ksi\" or \"345 MPa\"",
            Kind::Mass => "\"50 lb\" or \"23 kg\"",
            Kind::MassPerLength => "\"3.05 lb/ft\" or \"4.5 kg/m\"",
            Kind::Angle => "\"30 deg\"",
        }
    }
}

impl<'s, 'a> Table<'s, 'a> {
    /// The document's root table.
    pub fn root(src: &'s Source<'a>, doc: &'a toml_edit::Table) -> Self {
        Table {
            src,
            inner: doc,
            path: String::new(),
            span: Some(0..0),
            asked: RefCell::new(BTreeSet::new()),
        }
    }

    fn key_path(&self, key: &str) -> String {
        if self.path.is_empty() {
            key.to_string()
        } else {
            format!("{}.{}", self.path, key)
        }
    }

    fn item_span(&self, key: &str) -> Option<Range<usize>> {
        let (k, item) = self.inner.get_key_value(key)?;
        item.span().or_else(|| k.span())
    }

    fn item(&self, key: &str) -> Option<&'a Item> {
        self.asked.borrow_mut().insert(key.to_string());
        // `inner` lives for 'a; the borrow checker needs the explicit reborrow
        let inner: &'a dyn TableLike = self.inner;
        inner.get(key).filter(|i| !i.is_none())
    }

    /// Record a problem with a key of this table.
    pub fn error(&self, key: &str, message: impl Into<String>, hint: Option<String>) {
        let span = self.item_span(key).or_else(|| self.span.clone());
        self.src.error(span, &self.key_path(key), message, hint);
    }

    fn missing(&self, key: &str, what: &str, example: &str) {
        self.src.error(
            self.span.clone(),
            &self.key_path(key),
            format!("missing {what}"),
            Some(format!("add `{key} = {example}`")),
        );
    }

    fn wrong_type(&self, key: &str, item: &Item, wanted: &str, example: &str) {
        self.error(
            key,
            format!("expected {wanted}, found {}", type_name(item)),
            Some(format!("write `{key} = {example}`")),
        );
    }

    /// Whether the table has a key (counts as asked).
    pub fn has(&self, key: &str) -> bool {
        self.item(key).is_some()
    }

    /// The keys of this table in file order.
    pub fn keys(&self) -> Vec<String> {
        self.inner.iter().map(|(k, _)| k.to_string()).collect()
    }

    /// An optional string.
    pub fn opt_str(&self, key: &str) -> Option<At<String>> {
        let item = self.item(key)?;
        match item.as_str() {
            Some(s) => Some(At {
                value: s.to_string(),
                span: item.span(),
                key: self.key_path(key),
            }),
            None => {
                self.wrong_type(key, item, "a string", "\"...\"");
                None
            }
        }
    }

    /// A required string.
    pub fn req_str(&self, key: &str, example: &str) -> Option<At<String>> {
        if self.item(key).is_none() {
            self.missing(key, "value", example);
            return None;
        }
        let v = self.opt_str(key)?;
        if v.value.trim().is_empty() {
            self.error(key, "is empty", Some(format!("write `{key} = {example}`")));
            return None;
        }
        Some(v)
    }

    /// A string that must be one of `choices`.
    pub fn opt_choice(&self, key: &str, choices: &[&str]) -> Option<At<String>> {
        let v = self.opt_str(key)?;
        if choices.contains(&v.value.as_str()) {
            Some(v)
        } else {
            let near = nearest(&v.value, choices.iter().copied());
            self.error(
                key,
                format!("'{}' is not one of: {}", v.value, choices.join(", ")),
                near.first().map(|n| format!("did you mean '{n}'?")),
            );
            None
        }
    }

    /// A required choice.
    pub fn req_choice(&self, key: &str, choices: &[&str]) -> Option<At<String>> {
        if self.item(key).is_none() {
            self.missing(key, "value", &format!("\"{}\"", choices[0]));
            return None;
        }
        self.opt_choice(key, choices)
    }

    /// An optional boolean.
    pub fn opt_bool(&self, key: &str) -> Option<bool> {
        let item = self.item(key)?;
        match item.as_bool() {
            Some(b) => Some(b),
            None => {
                self.wrong_type(key, item, "true or false", "true");
                None
            }
        }
    }

    /// An optional positive whole number.
    pub fn opt_count(&self, key: &str) -> Option<u32> {
        let item = self.item(key)?;
        match item.as_integer() {
            Some(n) if (1..=10_000).contains(&n) => Some(n as u32),
            Some(n) => {
                self.error(
                    key,
                    format!("{n} is out of range: expected a whole number from 1 to 10000"),
                    None,
                );
                None
            }
            None => {
                self.wrong_type(key, item, "a whole number", "2");
                None
            }
        }
    }

    /// A required positive whole number.
    pub fn req_count(&self, key: &str) -> Option<u32> {
        if self.item(key).is_none() {
            self.missing(key, "whole number", "2");
            return None;
        }
        self.opt_count(key)
    }

    /// An optional plain number (a factor without unit), finite and within [lo, hi].
    pub fn opt_number(&self, key: &str, lo: f64, hi: f64) -> Option<f64> {
        let item = self.item(key)?;
        let v = item
            .as_float()
            .or_else(|| item.as_integer().map(|i| i as f64));
        match v {
            Some(v) if v.is_finite() && v >= lo && v <= hi => Some(v),
            Some(v) => {
                let near = if v.is_finite() { v.clamp(lo, hi) } else { lo };
                self.error(
                    key,
                    format!("{v} is out of range: expected a number from {lo} to {hi}"),
                    Some(format!(
                        "write a number in that range, e.g. `{key} = {near}`"
                    )),
                );
                None
            }
            None => {
                // a number written as a string ("1.0") keeps its value in the hint
                let example = item
                    .as_str()
                    .and_then(|t| t.trim().parse::<f64>().ok())
                    .filter(|x| x.is_finite() && *x >= lo && *x <= hi)
                    .unwrap_or(if (lo..=hi).contains(&1.0) { 1.0 } else { lo });
                self.wrong_type(key, item, "a number", &format!("{example:?}"));
                None
            }
        }
    }

    fn quantity_text(&self, key: &str, kind: Kind) -> Option<(&'a Item, String)> {
        let item = self.item(key)?;
        if let Some(s) = item.as_str() {
            return Some((item, s.to_string()));
        }
        if item.as_float().is_some() || item.as_integer().is_some() {
            self.error(
                key,
                format!(
                    "a bare number has no unit: {}",
                    item.as_value()
                        .map(|v| v.to_string().trim().to_string())
                        .unwrap_or_default()
                ),
                Some(format!(
                    "write the value as a string with its unit, e.g. `{key} = {}`",
                    kind.example()
                )),
            );
        } else {
            self.wrong_type(key, item, "a value with its unit", kind.example());
        }
        None
    }

    fn unit_error(&self, key: &str, e: UnitError) {
        self.error(key, e.to_string(), None);
    }

    /// An optional quantity of the given kind, parsed with its unit. Returns the value in the
    /// internal unit of its kind; use the typed accessors below.
    fn opt_quantity(&self, key: &str, kind: Kind) -> Option<f64> {
        let (_, text) = self.quantity_text(key, kind)?;
        let r = match kind {
            Kind::Length => units::parse_length(&text).map(|v| v.si()),
            Kind::Force => units::parse_force(&text).map(|v| v.si()),
            Kind::Stress => units::parse_stress(&text).map(|v| v.si()),
            Kind::Mass => units::parse_mass(&text).map(|v| v.si()),
            Kind::MassPerLength => units::parse_mass_per_length(&text).map(|v| v.si()),
            Kind::Angle => units::parse_angle(&text).map(|v| v.si()),
        };
        match r {
            Ok(v) => Some(v),
            Err(e) => {
                self.unit_error(key, e);
                None
            }
        }
    }

    fn req_quantity(&self, key: &str, kind: Kind) -> Option<f64> {
        if self.item(key).is_none() {
            self.missing(key, "value", kind.example());
            return None;
        }
        self.opt_quantity(key, kind)
    }

    fn positive(&self, key: &str, v: Option<f64>) -> Option<f64> {
        let v = v?;
        if v > 0.0 {
            Some(v)
        } else {
            self.error(
                key,
                "must be greater than zero",
                Some("check the value and its sign".into()),
            );
            None
        }
    }

    fn non_negative(&self, key: &str, v: Option<f64>) -> Option<f64> {
        let v = v?;
        if v >= 0.0 {
            Some(v)
        } else {
            self.error(
                key,
                "must not be negative",
                Some("check the value and its sign".into()),
            );
            None
        }
    }

    /// A required length greater than zero.
    pub fn req_length(&self, key: &str) -> Option<units::Length> {
        self.positive(key, self.req_quantity(key, Kind::Length))
            .map(units::Length::from_si)
    }
    /// An optional length greater than zero.
    pub fn opt_length(&self, key: &str) -> Option<units::Length> {
        self.positive(key, self.opt_quantity(key, Kind::Length))
            .map(units::Length::from_si)
    }
    /// An optional length that may be zero.
    pub fn opt_length_or_zero(&self, key: &str) -> Option<units::Length> {
        self.non_negative(key, self.opt_quantity(key, Kind::Length))
            .map(units::Length::from_si)
    }
    /// A required coordinate (any sign).
    pub fn req_coordinate(&self, key: &str) -> Option<units::Length> {
        self.req_quantity(key, Kind::Length)
            .map(units::Length::from_si)
    }
    /// A required force (any sign: tension positive).
    pub fn req_force(&self, key: &str) -> Option<units::Force> {
        self.req_quantity(key, Kind::Force)
            .map(units::Force::from_si)
    }
    /// An optional stress greater than zero.
    pub fn opt_stress(&self, key: &str) -> Option<units::Stress> {
        self.positive(key, self.opt_quantity(key, Kind::Stress))
            .map(units::Stress::from_si)
    }
    /// An optional mass greater than zero.
    pub fn opt_mass(&self, key: &str) -> Option<units::Mass> {
        self.positive(key, self.opt_quantity(key, Kind::Mass))
            .map(units::Mass::from_si)
    }
    /// An optional angle (any sign).
    pub fn opt_angle(&self, key: &str) -> Option<units::Angle> {
        self.opt_quantity(key, Kind::Angle)
            .map(units::Angle::from_si)
    }
    /// An optional percentage written as a number from 0 to 100.
    pub fn opt_percent(&self, key: &str) -> Option<f64> {
        self.opt_number(key, 0.0, 100.0)
    }

    /// An optional array of strings.
    pub fn opt_str_array(&self, key: &str) -> Option<Vec<At<String>>> {
        let item = self.item(key)?;
        let Some(arr) = item.as_array() else {
            self.wrong_type(key, item, "an array of strings", "[\"a\", \"b\"]");
            return None;
        };
        let mut out = Vec::new();
        for (i, v) in arr.iter().enumerate() {
            match v.as_str() {
                Some(s) => out.push(At {
                    value: s.to_string(),
                    span: v.span(),
                    key: format!("{}[{}]", self.key_path(key), i),
                }),
                None => self.src.error(
                    v.span(),
                    &format!("{}[{}]", self.key_path(key), i),
                    "expected a string".to_string(),
                    None,
                ),
            }
        }
        Some(out)
    }

    /// A required array of exactly `n` lengths (coordinates, any sign).
    pub fn req_coordinates(&self, key: &str, n: usize) -> Option<Vec<units::Length>> {
        let Some(item) = self.item(key) else {
            self.missing(key, "coordinates", "[\"0 ft\", \"0 ft\", \"0 ft\"]");
            return None;
        };
        let Some(arr) = item.as_array() else {
            self.wrong_type(
                key,
                item,
                "an array of lengths",
                "[\"0 ft\", \"6 ft\", \"0 ft\"]",
            );
            return None;
        };
        if arr.len() != n {
            self.error(
                key,
                format!("expected {n} coordinates (x, y, z), found {}", arr.len()),
                Some("write `[\"x\", \"y\", \"z\"]` with units".into()),
            );
            return None;
        }
        let mut out = Vec::new();
        let mut ok = true;
        for (i, v) in arr.iter().enumerate() {
            let path = format!("{}[{}]", self.key_path(key), i);
            match v.as_str() {
                Some(s) => match units::parse_length(s) {
                    Ok(l) => out.push(l),
                    Err(e) => {
                        self.src.error(v.span(), &path, e.to_string(), None);
                        ok = false;
                    }
                },
                None => {
                    self.src.error(
                        v.span(),
                        &path,
                        "a coordinate needs its unit".to_string(),
                        Some("write it as a string, e.g. \"6 ft\" or \"1830 mm\"".into()),
                    );
                    ok = false;
                }
            }
        }
        ok.then_some(out)
    }

    /// An optional sub-table (a `[a.b]` table or an inline `{ ... }`).
    pub fn opt_table(&self, key: &str) -> Option<Table<'s, 'a>> {
        let item = self.item(key)?;
        match item.as_table_like() {
            Some(t) => Some(Table {
                src: self.src,
                inner: t,
                path: self.key_path(key),
                span: item.span().or_else(|| self.item_span(key)),
                asked: RefCell::new(BTreeSet::new()),
            }),
            None => {
                self.wrong_type(key, item, "a table", "{ ... }");
                None
            }
        }
    }

    /// A required sub-table.
    pub fn req_table(&self, key: &str) -> Option<Table<'s, 'a>> {
        if self.item(key).is_none() {
            self.src.error(
                self.span.clone(),
                &self.key_path(key),
                "missing table".to_string(),
                Some(format!("add a `[{}]` table", self.key_path(key))),
            );
            return None;
        }
        self.opt_table(key)
    }

    /// Every entry of this table that is itself a table, with its name (e.g. each member of
    /// `[members]`). Entries that are not tables are reported.
    pub fn entries(&self) -> Vec<(At<String>, Table<'s, 'a>)> {
        let mut out = Vec::new();
        for (name, _) in self.inner.iter() {
            let span = self.item_span(name);
            if let Some(t) = self.opt_table(name) {
                out.push((
                    At {
                        value: name.to_string(),
                        span,
                        key: self.key_path(name),
                    },
                    t,
                ));
            }
        }
        out
    }

    /// An optional array of tables (`[[forces]]`), each as a table view.
    pub fn opt_array_of_tables(&self, key: &str) -> Option<Vec<Table<'s, 'a>>> {
        let item = self.item(key)?;
        let path = self.key_path(key);
        match item {
            Item::ArrayOfTables(arr) => Some(
                arr.iter()
                    .enumerate()
                    .map(|(i, t)| Table {
                        src: self.src,
                        inner: t,
                        path: format!("{path}[{i}]"),
                        span: t.span(),
                        asked: RefCell::new(BTreeSet::new()),
                    })
                    .collect(),
            ),
            Item::Value(Value::Array(arr)) => {
                let mut out = Vec::new();
                for (i, v) in arr.iter().enumerate() {
                    match v.as_inline_table() {
                        Some(t) => out.push(Table {
                            src: self.src,
                            inner: t,
                            path: format!("{path}[{i}]"),
                            span: t.span(),
                            asked: RefCell::new(BTreeSet::new()),
                        }),
                        None => self.src.error(
                            v.span(),
                            &format!("{path}[{i}]"),
                            "expected a table",
                            None,
                        ),
                    }
                }
                Some(out)
            }
            other => {
                self.wrong_type(key, other, "an array of tables", &format!("[[{key}]]"));
                None
            }
        }
    }

    /// Report every key of this table that no accessor asked for.
    pub fn finish(&self) {
        let asked = self.asked.borrow();
        for (key, _) in self.inner.iter() {
            if !asked.contains(key) {
                let near = nearest(key, asked.iter().map(|s| s.as_str()));
                let hint = match near.first() {
                    Some(n) => Some(format!("did you mean '{n}'?")),
                    None => Some(format!(
                        "known keys here: {}",
                        asked.iter().cloned().collect::<Vec<_>>().join(", ")
                    )),
                };
                self.src.error(
                    self.item_span(key),
                    &self.key_path(key),
                    "unknown key",
                    hint,
                );
            }
        }
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    fn read<F: FnOnce(&Table)>(text: &str, f: F) -> Vec<Diagnostic> {
        let doc = toml_edit::ImDocument::parse(text).unwrap();
        let src = Source::new("m.toml", text);
        let t = Table::root(&src, doc.as_table());
        f(&t);
        t.finish();
        src.take()
    }

    #[test]
    fn lengths_with_units_and_positions() {
        let d = read(
            "a = \"1-1/2 in\"\nb = 0.25\nc = \"3 parsecs\"\nd = \"-1 in\"\n",
            |t| {
                assert!((t.req_length("a").unwrap().to_in() - 1.5).abs() < 1e-12);
                assert!(t.req_length("b").is_none());
                assert!(t.req_length("c").is_none());
                assert!(t.req_length("d").is_none());
                assert!(t.req_length("e").is_none());
            },
        );
        let text: Vec<String> = d.iter().map(|d| d.to_string()).collect();
        assert_eq!(d.len(), 4, "{text:#?}");
        assert!(
            text[0].starts_with("m.toml:2:5: b: a bare number has no unit"),
            "{}",
            text[0]
        );
        assert!(text[1].starts_with("m.toml:3:5: c:"), "{}", text[1]);
        assert!(
            text[2].contains("d: must be greater than zero"),
            "{}",
            text[2]
        );
        assert!(text[3].contains("e: missing value"), "{}", text[3]);
    }

    #[test]
    fn unknown_keys_get_the_nearest_name() {
        let d = read("[bolts]\ngrade = \"A307 A\"\ngrde = 1\n", |t| {
            let b = t.req_table("bolts").unwrap();
            b.opt_str("grade");
            b.finish();
        });
        assert_eq!(d.len(), 1);
        assert_eq!(d[0].line, 3);
        assert!(
            d[0].to_string()
                .contains("bolts.grde: unknown key (hint: did you mean 'grade'?)"),
            "{}",
            d[0]
        );
    }

    #[test]
    fn wrong_types_are_named() {
        let d = read("n = \"two\"\nx = [1, 2]\n", |t| {
            assert!(t.req_count("n").is_none());
            assert!(t.opt_str("x").is_none());
        });
        assert!(
            d[0].message
                .contains("expected a whole number, found a string"),
            "{}",
            d[0]
        );
        assert!(
            d[1].message.contains("expected a string, found an array"),
            "{}",
            d[1]
        );
    }
}
