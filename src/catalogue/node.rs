//! Reading catalogue files: a TOML tree whose every value keeps its source span, and a table reader
//! that converts values with their units and collects every problem of a file as a located
//! [`Diagnostic`] (not only the first).

use crate::diag::{nearest, Diagnostic};
use crate::units::{
    parse_area, parse_length, parse_stress, Area, Density, Length, Stress, UnitError,
};
use serde::de::{self, Deserialize, Deserializer, MapAccess, SeqAccess, Visitor};
use std::cell::RefCell;
use std::collections::{BTreeMap, BTreeSet};
use std::fmt;
use std::ops::Range;
use toml::Spanned;

/// One TOML value; nested values keep their spans.
#[derive(Debug, Clone)]
pub(crate) enum Node {
    Str(String),
    Int(i64),
    Float(f64),
    Bool(bool),
    Array(Vec<Spanned<Node>>),
    Table(BTreeMap<String, Spanned<Node>>),
}

impl Node {
    fn type_name(&self) -> &'static str {
        match self {
            Node::Str(_) => "a string",
            Node::Int(_) => "an integer",
            Node::Float(_) => "a float",
            Node::Bool(_) => "a boolean",
            Node::Array(_) => "an array",
            Node::Table(_) => "a table",
        }
    }
}

impl<'de> Deserialize<'de> for Node {
    fn deserialize<D: Deserializer<'de>>(deserializer: D) -> Result<Self, D::Error> {
        deserializer.deserialize_any(NodeVisitor)
    }
}

struct NodeVisitor;

impl<'de> Visitor<'de> for NodeVisitor {
    type Value = Node;
    fn expecting(&self, f: &mut fmt::Formatter) -> fmt::Result {
        f.write_str("a TOML value")
    }
    fn visit_bool<E: de::Error>(self, v: bool) -> Result<Node, E> {
        Ok(Node::Bool(v))
    }
    fn visit_i64<E: de::Error>(self, v: i64) -> Result<Node, E> {
        Ok(Node::Int(v))
    }
    fn visit_u64<E: de::Error>(self, v: u64) -> Result<Node, E> {
        i64::try_from(v)
            .map(Node::Int)
            .map_err(|_| E::custom("integer too large"))
    }
    fn visit_f64<E: de::Error>(self, v: f64) -> Result<Node, E> {
        Ok(Node::Float(v))
    }
    fn visit_str<E: de::Error>(self, v: &str) -> Result<Node, E> {
        Ok(Node::Str(v.to_string()))
    }
    fn visit_string<E: de::Error>(self, v: String) -> Result<Node, E> {
        Ok(Node::Str(v))
    }
    fn visit_seq<A: SeqAccess<'de>>(self, mut seq: A) -> Result<Node, A::Error> {
        let mut items = Vec::new();
        while let Some(item) = seq.next_element::<Spanned<Node>>()? {
            items.push(item);
        }
        Ok(Node::Array(items))
    }
    fn visit_map<A: MapAccess<'de>>(self, mut map: A) -> Result<Node, A::Error> {
        let mut items = BTreeMap::new();
        while let Some(key) = map.next_key::<String>()? {
            let value = map.next_value::<Spanned<Node>>()?;
            items.insert(key, value);
        }
        Ok(Node::Table(items))
    }
}

/// The file being read and the problems found so far.
pub(crate) struct Ctx<'s> {
    pub file: &'s str,
    pub src: &'s str,
    pub errs: Vec<Diagnostic>,
}

impl<'s> Ctx<'s> {
    pub fn new(file: &'s str, src: &'s str) -> Self {
        Ctx {
            file,
            src,
            errs: Vec::new(),
        }
    }

    /// Record a problem at a span.
    pub fn error(&mut self, span: &Range<usize>, key: &str, message: impl Into<String>) {
        self.errs.push(Diagnostic::at(
            self.file, self.src, span.start, key, message,
        ));
    }

    /// Record a problem with a hint.
    pub fn error_hint(
        &mut self,
        span: &Range<usize>,
        key: &str,
        message: impl Into<String>,
        hint: impl Into<String>,
    ) {
        self.errs
            .push(Diagnostic::at(self.file, self.src, span.start, key, message).hint(hint.into()));
    }

    /// The 1-based line of a byte offset.
    pub fn line_of(&self, offset: usize) -> usize {
        crate::diag::line_column(self.src, offset).0
    }

    /// Parse the whole text into its top table; a syntax error is returned as one diagnostic.
    pub fn parse_root(&mut self) -> Option<Table<'static>> {
        match toml::from_str::<Spanned<Node>>(self.src) {
            Ok(root) => {
                let span = root.span();
                match root.into_inner() {
                    Node::Table(map) => Some(Table::owned(map, span, String::new())),
                    other => {
                        self.error(
                            &span,
                            "",
                            format!("expected a table, found {}", other.type_name()),
                        );
                        None
                    }
                }
            }
            Err(e) => {
                let offset = e.span().map(|s| s.start).unwrap_or(0);
                let message = e.message().to_string();
                self.errs
                    .push(Diagnostic::at(self.file, self.src, offset, "", message));
                None
            }
        }
    }
}

/// One TOML table being read: values are taken by key, converted with their units, and any key
/// never asked for is reported as unknown when the table is finished.
pub(crate) struct Table<'n> {
    map: std::borrow::Cow<'n, BTreeMap<String, Spanned<Node>>>,
    pub span: Range<usize>,
    pub path: String,
    asked: RefCell<BTreeSet<String>>,
}

impl Table<'static> {
    fn owned(map: BTreeMap<String, Spanned<Node>>, span: Range<usize>, path: String) -> Self {
        Table {
            map: std::borrow::Cow::Owned(map),
            span,
            path,
            asked: RefCell::new(BTreeSet::new()),
        }
    }
}

impl<'n> Table<'n> {
    fn borrowed(
        map: &'n BTreeMap<String, Spanned<Node>>,
        span: Range<usize>,
        path: String,
    ) -> Self {
        Table {
            map: std::borrow::Cow::Borrowed(map),
            span,
            path,
            asked: RefCell::new(BTreeSet::new()),
        }
    }

    /// The key path of a field of this table, e.g. "section[3].t".
    pub fn key(&self, key: &str) -> String {
        if self.path.is_empty() {
            key.to_string()
        } else {
            format!("{}.{key}", self.path)
        }
    }

    fn get(&self, key: &str) -> Option<&Spanned<Node>> {
        self.asked.borrow_mut().insert(key.to_string());
        self.map.get(key)
    }

    /// Whether the table has a key (marks it as known).
    pub fn has(&self, key: &str) -> bool {
        self.get(key).is_some()
    }

    /// The span of a key's value, or of the table when the key is absent.
    pub fn span_of(&self, key: &str) -> Range<usize> {
        self.map
            .get(key)
            .map(|v| v.span())
            .unwrap_or_else(|| self.span.clone())
    }

    fn missing(&self, cx: &mut Ctx, key: &str, what: &str) {
        cx.error(
            &self.span,
            &self.key(key),
            format!("missing key '{key}' ({what})"),
        );
    }

    /// An optional string.
    pub fn opt_str(&self, cx: &mut Ctx, key: &str) -> Option<String> {
        let v = self.get(key)?;
        match v.get_ref() {
            Node::Str(s) => Some(s.clone()),
            other => {
                cx.error(
                    &v.span(),
                    &self.key(key),
                    format!("expected a string, found {}", other.type_name()),
                );
                None
            }
        }
    }

    /// A required string.
    pub fn str(&self, cx: &mut Ctx, key: &str) -> Option<String> {
        if !self.has(key) {
            self.missing(cx, key, "a string");
            return None;
        }
        self.opt_str(cx, key)
    }

    /// A boolean with a default when absent.
    pub fn bool_or(&self, cx: &mut Ctx, key: &str, default: bool) -> bool {
        let Some(v) = self.get(key) else {
            return default;
        };
        match v.get_ref() {
            Node::Bool(b) => *b,
            other => {
                cx.error(
                    &v.span(),
                    &self.key(key),
                    format!("expected true or false, found {}", other.type_name()),
                );
                default
            }
        }
    }

    /// An optional plain number (integer or float), finite.
    pub fn opt_number(&self, cx: &mut Ctx, key: &str) -> Option<f64> {
        let v = self.get(key)?;
        let n = match v.get_ref() {
            Node::Int(i) => *i as f64,
            Node::Float(f) => *f,
            other => {
                cx.error(
                    &v.span(),
                    &self.key(key),
                    format!("expected a number, found {}", other.type_name()),
                );
                return None;
            }
        };
        if !n.is_finite() {
            cx.error(&v.span(), &self.key(key), "expected a finite number");
            return None;
        }
        Some(n)
    }

    /// A required plain number.
    pub fn number(&self, cx: &mut Ctx, key: &str) -> Option<f64> {
        if !self.has(key) {
            self.missing(cx, key, "a number");
            return None;
        }
        self.opt_number(cx, key)
    }

    /// An optional value with its unit, read by `parse`; must be positive unless `allow_zero`.
    fn opt_quantity<T>(
        &self,
        cx: &mut Ctx,
        key: &str,
        parse: fn(&str) -> Result<T, UnitError>,
        si: fn(&T) -> f64,
        allow_zero: bool,
    ) -> Option<T> {
        let v = self.get(key)?;
        let span = v.span();
        let Node::Str(text) = v.get_ref() else {
            cx.error_hint(
                &span,
                &self.key(key),
                format!(
                    "expected a value with its unit as a string, found {}",
                    v.get_ref().type_name()
                ),
                "write it quoted with its unit, e.g. \"0.116 in\"",
            );
            return None;
        };
        match parse(text) {
            Ok(q) => {
                let x = si(&q);
                if x < 0.0 || (!allow_zero && x == 0.0) {
                    cx.error(
                        &span,
                        &self.key(key),
                        format!("'{text}' must be greater than zero"),
                    );
                    None
                } else {
                    Some(q)
                }
            }
            Err(e) => {
                cx.error(&span, &self.key(key), e.to_string());
                None
            }
        }
    }

    /// An optional positive length.
    pub fn opt_length(&self, cx: &mut Ctx, key: &str) -> Option<Length> {
        self.opt_quantity(cx, key, parse_length, |l| l.si(), false)
    }

    /// An optional length that may be zero.
    pub fn opt_length_or_zero(&self, cx: &mut Ctx, key: &str) -> Option<Length> {
        self.opt_quantity(cx, key, parse_length, |l| l.si(), true)
    }

    /// A required positive length.
    pub fn length(&self, cx: &mut Ctx, key: &str) -> Option<Length> {
        if !self.has(key) {
            self.missing(cx, key, "a length with its unit, e.g. \"1/2 in\"");
            return None;
        }
        self.opt_length(cx, key)
    }

    /// An optional positive stress.
    pub fn opt_stress(&self, cx: &mut Ctx, key: &str) -> Option<Stress> {
        self.opt_quantity(cx, key, parse_stress, |s| s.si(), false)
    }

    /// A required positive stress.
    pub fn stress(&self, cx: &mut Ctx, key: &str) -> Option<Stress> {
        if !self.has(key) {
            self.missing(cx, key, "a stress with its unit, e.g. \"65 ksi\"");
            return None;
        }
        self.opt_stress(cx, key)
    }

    /// An optional positive area.
    pub fn opt_area(&self, cx: &mut Ctx, key: &str) -> Option<Area> {
        self.opt_quantity(cx, key, parse_area, |a| a.si(), false)
    }

    /// A required positive density ("7850 kg/m3", "490 lb/ft3").
    pub fn density(&self, cx: &mut Ctx, key: &str) -> Option<Density> {
        if !self.has(key) {
            self.missing(cx, key, "a density, e.g. \"7850 kg/m3\"");
            return None;
        }
        self.opt_quantity(cx, key, parse_density, |d| d.si(), false)
    }

    /// A list of strings (absent: empty).
    pub fn str_list(&self, cx: &mut Ctx, key: &str) -> Vec<String> {
        let Some(v) = self.get(key) else {
            return Vec::new();
        };
        let Node::Array(items) = v.get_ref() else {
            cx.error(
                &v.span(),
                &self.key(key),
                format!(
                    "expected an array of strings, found {}",
                    v.get_ref().type_name()
                ),
            );
            return Vec::new();
        };
        let mut out = Vec::new();
        for item in items {
            match item.get_ref() {
                Node::Str(s) => out.push(s.clone()),
                other => cx.error(
                    &item.span(),
                    &self.key(key),
                    format!("expected a string, found {}", other.type_name()),
                ),
            }
        }
        out
    }

    /// A list of positive lengths (absent: empty).
    pub fn length_list(&self, cx: &mut Ctx, key: &str) -> Vec<Length> {
        let Some(v) = self.get(key) else {
            return Vec::new();
        };
        let Node::Array(items) = v.get_ref() else {
            cx.error(
                &v.span(),
                &self.key(key),
                format!(
                    "expected an array of lengths, found {}",
                    v.get_ref().type_name()
                ),
            );
            return Vec::new();
        };
        let mut out = Vec::new();
        for item in items {
            match item.get_ref() {
                Node::Str(s) => match parse_length(s) {
                    Ok(l) if l.si() > 0.0 => out.push(l),
                    Ok(_) => cx.error(
                        &item.span(),
                        &self.key(key),
                        format!("'{s}' must be greater than zero"),
                    ),
                    Err(e) => cx.error(&item.span(), &self.key(key), e.to_string()),
                },
                other => cx.error(
                    &item.span(),
                    &self.key(key),
                    format!("expected a length as a string, found {}", other.type_name()),
                ),
            }
        }
        out
    }

    /// An array of tables (absent: empty), each with its key path `key[i]`.
    pub fn tables(&self, cx: &mut Ctx, key: &str) -> Vec<Table<'_>> {
        let Some(v) = self.get(key) else {
            return Vec::new();
        };
        match v.get_ref() {
            Node::Array(items) => {
                let mut out = Vec::new();
                for (i, item) in items.iter().enumerate() {
                    match item.get_ref() {
                        Node::Table(map) => out.push(Table::borrowed(
                            map,
                            item.span(),
                            format!("{}[{i}]", self.key(key)),
                        )),
                        other => cx.error(
                            &item.span(),
                            &self.key(key),
                            format!("expected a table, found {}", other.type_name()),
                        ),
                    }
                }
                out
            }
            other => {
                cx.error_hint(
                    &v.span(),
                    &self.key(key),
                    format!("expected an array of tables, found {}", other.type_name()),
                    format!("write each entry as [[{}]]", self.key(key)),
                );
                Vec::new()
            }
        }
    }

    /// Report every key of the table that was never asked for.
    pub fn finish(&self, cx: &mut Ctx) {
        let asked = self.asked.borrow();
        for (k, v) in self.map.iter() {
            if !asked.contains(k) {
                let near = nearest(k, asked.iter().map(|s| s.as_str()));
                let key = self.key(k);
                if near.is_empty() {
                    cx.error(&v.span(), &key, format!("unknown key '{k}'"));
                } else {
                    cx.error_hint(
                        &v.span(),
                        &key,
                        format!("unknown key '{k}'"),
                        format!("nearest: {}", near.join(", ")),
                    );
                }
            }
        }
    }
}

/// Parse a density: "7850 kg/m3", "490 lb/ft3" (catalogue files only).
pub(crate) fn parse_density(text: &str) -> Result<Density, UnitError> {
    use crate::units::factor::{KG_PER_LB, MM_PER_FT};
    let t = text.trim();
    let example = "\"7850 kg/m3\", \"490 lb/ft3\"";
    let split =
        t.find(|c: char| c.is_ascii_alphabetic())
            .ok_or_else(|| UnitError::MissingUnit {
                text: text.to_string(),
                example,
            })?;
    let (num, unit) = t.split_at(split);
    let v: f64 = num.trim().parse().map_err(|_| UnitError::Malformed {
        text: text.to_string(),
        example,
    })?;
    if !v.is_finite() {
        return Err(UnitError::NotFinite {
            text: text.to_string(),
        });
    }
    let k = match unit.trim() {
        "kg/m3" | "kg/m³" => 1.0,
        "lb/ft3" | "lb/ft³" | "pcf" => KG_PER_LB / (MM_PER_FT / 1000.0).powi(3),
        other => {
            return Err(UnitError::UnknownUnit {
                text: text.to_string(),
                unit: other.to_string(),
                kind: "density",
                accepted: "kg/m3, lb/ft3",
            })
        }
    };
    Ok(Density::kg_per_m3(v * k))
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn every_value_keeps_its_span() {
        let src = "[[thing]]\nname = \"a\"\nd = \"1/2 in\"\n\n[[thing]]\nname = \"b\"\nd = 12\n";
        let mut cx = Ctx::new("t.toml", src);
        let root = cx.parse_root().unwrap();
        let things = root.tables(&mut cx, "thing");
        assert_eq!(things.len(), 2);
        assert!((things[0].length(&mut cx, "d").unwrap().to_in() - 0.5).abs() < 1e-12);
        assert!(things[1].length(&mut cx, "d").is_none());
        assert!(things[1].str(&mut cx, "missing").is_none());
        assert_eq!(cx.errs.len(), 2);
        assert_eq!((cx.errs[0].line, cx.errs[0].column), (7, 5));
        assert_eq!(cx.errs[0].key, "thing[1].d");
        // the missing key is reported at its table
        assert!(cx.errs[1].line >= 5, "{}", cx.errs[1]);
    }

    #[test]
    fn unknown_keys_are_reported_with_the_nearest_known_one() {
        let src = "[[thing]]\nnmae = \"a\"\n";
        let mut cx = Ctx::new("t.toml", src);
        let root = cx.parse_root().unwrap();
        let things = root.tables(&mut cx, "thing");
        things[0].opt_str(&mut cx, "name");
        things[0].finish(&mut cx);
        assert_eq!(cx.errs.len(), 1);
        assert_eq!(
            cx.errs[0].to_string(),
            "t.toml:2:8: thing[0].nmae: unknown key 'nmae' (hint: nearest: name)"
        );
    }

    #[test]
    fn a_syntax_error_is_located() {
        let mut cx = Ctx::new("t.toml", "a = 1\nb = = 2\n");
        assert!(cx.parse_root().is_none());
        assert_eq!(cx.errs[0].line, 2);
    }

    #[test]
    fn densities() {
        // 490 lb/ft³ = 7849.0 kg/m³ (exact factors, NIST SP 811 App. B).
        let d = parse_density("490 lb/ft3").unwrap().to_kg_per_m3();
        assert!((d - 7849.05).abs() < 0.01, "{d}");
        assert_eq!(parse_density("7850 kg/m3").unwrap().to_kg_per_m3(), 7850.0);
        assert!(parse_density("7850").is_err());
        assert!(parse_density("7850 kg/l").is_err());
    }
}
