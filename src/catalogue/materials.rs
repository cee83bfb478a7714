//! Structural materials (strength by thickness range) and weld electrodes.

use super::node::{Ctx, Table};
use super::range::SizeRange;
use super::{show_length, Provenance};
use crate::units::{Density, Length, Stress};

/// A steel grade.
#[derive(Debug, Clone, PartialEq)]
pub struct Material {
    pub name: String,
    pub standard: String,
    pub density: Density,
    /// Modulus of elasticity.
    pub e: Stress,
    /// Minimum yield strength by thickness range.
    pub fy: Vec<(SizeRange, Stress)>,
    /// Minimum tensile strength by thickness range.
    pub fu: Vec<(SizeRange, Stress)>,
    /// Whether the strengths are specified minimums (false: typical values, to be confirmed by
    /// mill certificates before design use).
    pub specified_minimum: bool,
    /// What the strengths are, in words ("specified minimum", "typical as-welded", ...).
    pub basis: String,
    pub provenance: Provenance,
}

impl Material {
    /// (Fy, Fu) for a thickness; an error when the standard gives no value for it.
    pub fn strength_at(&self, t: Length) -> Result<(Stress, Stress), String> {
        let pick = |rows: &[(SizeRange, Stress)], what: &str| {
            rows.iter()
                .find(|(r, _)| r.contains(t))
                .map(|(_, s)| *s)
                .ok_or_else(|| {
                    let ranges: Vec<String> =
                        rows.iter().map(|(r, _)| r.describe("t", show_length)).collect();
                    format!(
                        "material '{}': thickness {} is outside every range {} gives for {what} ({})",
                        self.name,
                        show_length(t),
                        self.standard,
                        ranges.join("; ")
                    )
                })
        };
        Ok((pick(&self.fy, "Fy")?, pick(&self.fu, "Fu")?))
    }

    pub(crate) fn read(
        t: &Table,
        cx: &mut Ctx,
        name: String,
        provenance: Provenance,
    ) -> Option<Self> {
        let standard = t.str(cx, "standard");
        let density = t.density(cx, "density");
        let e = t.stress(cx, "e");
        let basis = t.str(cx, "basis");
        let specified_minimum = t.bool_or(cx, "specified_minimum", false);
        if !t.has("specified_minimum") {
            cx.error(
                &t.span,
                &t.key("specified_minimum"),
                "missing key 'specified_minimum' (true for a standard's minimum values)",
            );
        }
        let mut ok = t.has("specified_minimum");
        let mut rows = |key: &str, cx: &mut Ctx| {
            let mut out = Vec::new();
            for row in t.tables(cx, key) {
                let range = SizeRange::read(&row, cx);
                let v = row.stress(cx, "value");
                row.finish(cx);
                match (range, v) {
                    (Some(r), Some(v)) => out.push((r, v)),
                    _ => ok = false,
                }
            }
            if out.is_empty() && !t.has(key) {
                cx.error(
                    &t.span,
                    &t.key(key),
                    format!("at least one [[{key}]] row is needed"),
                );
                ok = false;
            }
            out
        };
        let fy = rows("yield", cx);
        let fu = rows("tensile", cx);
        t.finish(cx);
        Some(Material {
            name,
            standard: standard?,
            density: density?,
            e: e?,
            fy,
            fu,
            specified_minimum,
            basis: basis?,
            provenance,
        })
        .filter(|m| ok && !m.fy.is_empty() && !m.fu.is_empty())
    }
}

/// A weld filler metal classification.
#[derive(Debug, Clone, PartialEq)]
pub struct Electrode {
    pub name: String,
    pub standard: String,
    /// Filler metal classification strength, FEXX.
    pub fexx: Stress,
    pub provenance: Provenance,
}

impl Electrode {
    pub(crate) fn read(
        t: &Table,
        cx: &mut Ctx,
        name: String,
        provenance: Provenance,
    ) -> Option<Self> {
        let standard = t.str(cx, "standard");
        let fexx = t.stress(cx, "fexx");
        t.finish(cx);
        Some(Electrode {
            name,
            standard: standard?,
            fexx: fexx?,
            provenance,
        })
    }
}
