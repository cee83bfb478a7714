//! Tube sections and sheet gauges. A section entry stores only its outside size, nominal wall,
//! standard and process; its properties are computed here by that standard's rules.

use super::node::{Ctx, Table};
use super::range::SizeRange;
use super::Provenance;
use crate::units::{
    parse_length_or_gauge, Area, Density, Inertia, Length, LengthOrGauge, MassPerLength, Volume,
};
use std::collections::BTreeMap;
use std::f64::consts::PI;

/// A gauge number's thickness in one gauge system.
#[derive(Debug, Clone, PartialEq)]
pub struct Gauge {
    /// E.g. "16 ga" (Manufacturers' Standard Gauge) or "16 BWG".
    pub name: String,
    /// E.g. "MSG", "BWG".
    pub system: String,
    pub number: u32,
    pub thickness: Length,
    pub provenance: Provenance,
}

impl Gauge {
    pub(crate) fn read(
        t: &Table,
        cx: &mut Ctx,
        name: String,
        provenance: Provenance,
    ) -> Option<Self> {
        let system = t.str(cx, "system");
        let number = t.number(cx, "number");
        let thickness = t.length(cx, "thickness");
        t.finish(cx);
        let number = number?;
        if number < 0.0 || number.fract() != 0.0 {
            cx.error(
                &t.span_of("number"),
                &t.key("number"),
                "a gauge number is a whole number",
            );
            return None;
        }
        Some(Gauge {
            name,
            system: system?,
            number: number as u32,
            thickness: thickness?,
            provenance,
        })
    }
}

/// The outline of a tube.
#[derive(Debug, Clone, Copy, PartialEq)]
pub enum Shape {
    /// Square or rectangular: `h` the depth (bending about x), `b` the width.
    Rect { b: Length, h: Length },
    /// Circular, outside diameter `d`.
    Round { d: Length },
}

/// Which rules give a section's design wall, corner radius and weight.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum SectionRule {
    /// ASTM A500 electric-resistance-welded: t_des = 0.93 t_nom (AISC 360-22 §B4.2), as the AISC
    /// Manual tabulates it (to 0.001 in.); outside corner 2.0 t_des for properties; weight from
    /// the nominal wall at 490 lb/ft³.
    AiscErw,
    /// ASTM A1085, or A500 submerged-arc-welded: t_des = t_nom (AISC 360-22 §B4.2); outside corner
    /// 2.0 t; 490 lb/ft³.
    AiscFullWall,
    /// EN 10219-2 cold-formed hollow sections: t as given; outside corner 2 t (t ≤ 6 mm), 2.5 t
    /// (6 < t ≤ 10 mm), 3 t (t > 10 mm); inside corner ro − t; 7850 kg/m³.
    En10219,
    /// ASTM A513 mechanical tubing: nominal wall, no reduction; outside corner 2 t (common
    /// practice, not a value of the standard); 490 lb/ft³.
    A513,
}

impl SectionRule {
    fn select(standard: &str, process: &str) -> Option<Self> {
        match (standard, process) {
            ("ASTM A500", "ERW") => Some(SectionRule::AiscErw),
            ("ASTM A500", "SAW") | ("ASTM A1085", "ERW") | ("ASTM A1085", "SAW") => {
                Some(SectionRule::AiscFullWall)
            }
            ("EN 10219", "cold-formed") => Some(SectionRule::En10219),
            ("ASTM A513", "ERW") => Some(SectionRule::A513),
            _ => None,
        }
    }

    /// The wall used for properties.
    pub fn design_wall(self, t_nom: Length) -> Length {
        match self {
            SectionRule::AiscErw => Length::inch((0.93 * t_nom.to_in() * 1000.0).round() / 1000.0),
            _ => t_nom,
        }
    }

    /// The outside corner radius of a rectangular tube for a wall t (design wall for AISC rules).
    pub fn corner_outer(self, t: Length) -> Length {
        match self {
            SectionRule::En10219 => {
                let mm = t.to_mm();
                let k = if mm <= 6.0 {
                    2.0
                } else if mm <= 10.0 {
                    2.5
                } else {
                    3.0
                };
                t * k
            }
            _ => t * 2.0,
        }
    }

    /// The density the weight per length is computed with.
    pub fn density(self) -> Density {
        match self {
            SectionRule::En10219 => Density::kg_per_m3(7850.0),
            _ => super::node::parse_density("490 lb/ft3").expect("a valid density"),
        }
    }

    /// Where the rule comes from, in words.
    pub fn basis(self) -> &'static str {
        match self {
            SectionRule::AiscErw => {
                "AISC 360-22 §B4.2: t_des = 0.93 t_nom (ERW); AISC Manual 16th ed. Part 1: corner radius 2.0 t_des, weight from nominal wall"
            }
            SectionRule::AiscFullWall => "AISC 360-22 §B4.2: t_des = t_nom (A1085, SAW)",
            SectionRule::En10219 => {
                "EN 10219-2: ro = 2t / 2.5t / 3t by thickness, ri = ro - t, density 7850 kg/m3"
            }
            SectionRule::A513 => {
                "ASTM A513: nominal wall; corner radius 2t is common practice, not from the standard"
            }
        }
    }
}

/// Computed section properties. For rectangular tubes, x is the axis parallel to side b
/// (bending in the depth h; the strong axis when h ≥ b, labelled y-y in EN tables).
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct SectionProps {
    pub area: Area,
    pub ix: Inertia,
    pub iy: Inertia,
    pub rx: Length,
    pub ry: Length,
    /// Elastic section moduli.
    pub sx: Volume,
    pub sy: Volume,
    /// Weight (mass) per length, by the standard's rule (see [`SectionRule`]).
    pub mass_per_length: MassPerLength,
    /// Inside dimensions with the nominal wall (for sleeve fit before tolerances).
    pub inside: Shape,
    /// Inside corner radius for rectangular tubes with the design wall (None for round).
    pub r_inner: Option<Length>,
}

/// Dimensional tolerance of a tube standard for sleeve fit.
#[derive(Debug, Clone, PartialEq)]
pub struct Tolerance {
    pub name: String,
    pub standard: String,
    /// "rect" or "round".
    pub shape: String,
    /// "outside" (outside size) or "wall".
    pub dimension: String,
    pub bands: Vec<ToleranceBand>,
    pub provenance: Provenance,
}

/// One row of a tolerance table: for sizes in `range`, ± a length or ± a percent of the size.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct ToleranceBand {
    pub range: SizeRange,
    pub plus_minus: Option<Length>,
    pub percent: Option<f64>,
}

impl Tolerance {
    /// The ± tolerance for a dimension of the given size (outside size or wall).
    pub fn at(&self, size: Length) -> Option<Length> {
        self.bands.iter().find(|b| b.range.contains(size)).map(|b| {
            b.plus_minus
                .unwrap_or_else(|| size * (b.percent.unwrap_or(0.0) / 100.0))
        })
    }

    pub(crate) fn read(
        t: &Table,
        cx: &mut Ctx,
        name: String,
        provenance: Provenance,
    ) -> Option<Self> {
        let standard = t.str(cx, "standard");
        let shape = t.str(cx, "shape");
        let dimension = t.str(cx, "dimension");
        let mut bands = Vec::new();
        let mut ok = true;
        for row in t.tables(cx, "band") {
            let range = SizeRange::read(&row, cx);
            let pm = row.opt_length(cx, "plus_minus");
            let pct = row.opt_number(cx, "percent");
            let both = row.has("plus_minus") == row.has("percent");
            row.finish(cx);
            if both {
                cx.error(
                    &row.span,
                    &row.key("plus_minus"),
                    "give one of 'plus_minus' or 'percent'",
                );
                ok = false;
                continue;
            }
            match range {
                Some(range) if pm.is_some() || pct.is_some() => bands.push(ToleranceBand {
                    range,
                    plus_minus: pm,
                    percent: pct,
                }),
                _ => ok = false,
            }
        }
        t.finish(cx);
        if bands.is_empty() && ok {
            cx.error(
                &t.span,
                &t.key("band"),
                "a tolerance needs at least one [[band]] row",
            );
            ok = false;
        }
        Some(Tolerance {
            name,
            standard: standard?,
            shape: shape?,
            dimension: dimension?,
            bands,
            provenance,
        })
        .filter(|_| ok)
    }
}

/// A tube section with its computed properties.
#[derive(Debug, Clone, PartialEq)]
pub struct Section {
    pub name: String,
    pub shape: Shape,
    /// The wall as written ("1/8 in", "16 ga").
    pub wall_text: String,
    pub t_nominal: Length,
    /// The wall used for properties (AISC 360-22 §B4.2 for A500).
    pub t_design: Length,
    /// Outside corner radius used for properties (rectangular only).
    pub r_outer: Option<Length>,
    pub standard: String,
    pub process: String,
    pub rule: SectionRule,
    pub props: SectionProps,
    pub provenance: Provenance,
}

impl Section {
    /// Length round the outside: the flats and the outside corner arcs of a rectangular tube
    /// (radius `r_outer`), the circumference of a round one.
    pub fn outside_perimeter(&self) -> Length {
        match self.shape {
            Shape::Round { d } => d * std::f64::consts::PI,
            Shape::Rect { b, h } => {
                let r = self.r_outer.unwrap_or(Length::mm(0.0));
                (b + h) * 2.0 - r * 8.0 + r * (2.0 * std::f64::consts::PI)
            }
        }
    }

    pub(crate) fn read(
        t: &Table,
        cx: &mut Ctx,
        name: String,
        provenance: Provenance,
        gauges: &BTreeMap<String, Gauge>,
    ) -> Option<Self> {
        let kind = t.str(cx, "shape");
        let standard = t.str(cx, "standard");
        let process = t.str(cx, "process");
        let shape = match kind.as_deref() {
            Some("rect") => {
                let b = t.length(cx, "b");
                let h = t.length(cx, "h");
                b.zip(h).map(|(b, h)| Shape::Rect { b, h })
            }
            Some("round") => t.length(cx, "d").map(|d| Shape::Round { d }),
            Some(other) => {
                cx.error_hint(
                    &t.span_of("shape"),
                    &t.key("shape"),
                    format!("unknown shape '{other}'"),
                    "\"rect\" (with b and h) or \"round\" (with d)",
                );
                None
            }
            None => None,
        };
        let wall_text = t.str(cx, "t");
        let t_nom = wall_text
            .as_deref()
            .and_then(|w| match parse_length_or_gauge(w) {
                Ok(LengthOrGauge::Length(l)) if l.si() > 0.0 => Some(l),
                Ok(LengthOrGauge::Length(_)) => {
                    cx.error(
                        &t.span_of("t"),
                        &t.key("t"),
                        "the wall must be greater than zero",
                    );
                    None
                }
                Ok(LengthOrGauge::Gauge(n)) => {
                    let key = format!("{n} ga");
                    match gauges.get(&key) {
                        Some(g) => Some(g.thickness),
                        None => {
                            cx.error(
                                &t.span_of("t"),
                                &t.key("t"),
                                format!("no gauge '{key}' in the catalogue"),
                            );
                            None
                        }
                    }
                }
                Err(e) => {
                    cx.error(&t.span_of("t"), &t.key("t"), e.to_string());
                    None
                }
            });
        t.finish(cx);
        let (standard, process) = (standard?, process?);
        let Some(rule) = SectionRule::select(&standard, &process) else {
            cx.error_hint(
                &t.span_of("standard"),
                &t.key("standard"),
                format!("no section rule for standard '{standard}' with process '{process}'"),
                "supported: ASTM A500 ERW/SAW, ASTM A1085 ERW/SAW, EN 10219 cold-formed, ASTM A513 ERW",
            );
            return None;
        };
        let (shape, t_nom) = (shape?, t_nom?);
        let t_des = rule.design_wall(t_nom);
        let min_side = match shape {
            Shape::Rect { b, h } => b.min(h),
            Shape::Round { d } => d,
        };
        let corner_too_big = matches!(shape, Shape::Rect { .. })
            && rule.corner_outer(t_nom).to_mm() * 2.0 > min_side.to_mm();
        if t_nom.to_mm() * 2.0 >= min_side.to_mm() || corner_too_big {
            cx.error(
                &t.span,
                &t.key("t"),
                "the wall is too thick for the outside size",
            );
            return None;
        }
        let props = compute_props(shape, t_nom, t_des, rule);
        Some(Section {
            name,
            shape,
            wall_text: wall_text?,
            t_nominal: t_nom,
            t_design: t_des,
            r_outer: match shape {
                Shape::Rect { .. } => Some(rule.corner_outer(t_des)),
                Shape::Round { .. } => None,
            },
            standard,
            process,
            rule,
            props,
            provenance,
        })
    }
}

/// Area and second moments (about the axis parallel to b, and the other) of a solid rectangle b×h
/// with its four corners rounded to radius r; mm units.
fn rounded_rectangle(b: f64, h: f64, r: f64) -> (f64, f64, f64) {
    // Each corner removes a spandrel: the r×r square less a quarter circle, with area
    // (1 − π/4) r², first moment r³/6 and second moment r⁴ (1/3 − π/16) about the circle
    // centre's axes.
    let a_sp = (1.0 - PI / 4.0) * r * r;
    let q_sp = r.powi(3) / 6.0;
    let i_sp = r.powi(4) * (1.0 / 3.0 - PI / 16.0);
    let spandrel = |c: f64| c * c * a_sp + 2.0 * c * q_sp + i_sp;
    let area = b * h - 4.0 * a_sp;
    let ix = b * h.powi(3) / 12.0 - 4.0 * spandrel(h / 2.0 - r);
    let iy = h * b.powi(3) / 12.0 - 4.0 * spandrel(b / 2.0 - r);
    (area, ix, iy)
}

/// Area and second moments of a rectangular tube (outer corner ro, inner ri = ro − t, not < 0).
fn rect_tube(b: f64, h: f64, t: f64, ro: f64) -> (f64, f64, f64) {
    let ri = (ro - t).max(0.0);
    let (ao, ixo, iyo) = rounded_rectangle(b, h, ro);
    let (ai, ixi, iyi) = rounded_rectangle(b - 2.0 * t, h - 2.0 * t, ri);
    (ao - ai, ixo - ixi, iyo - iyi)
}

/// Properties of a section from its outside size and walls, by its rule.
pub fn compute_props(
    shape: Shape,
    t_nom: Length,
    t_des: Length,
    rule: SectionRule,
) -> SectionProps {
    let t = t_des.to_mm();
    let density = rule.density();
    match shape {
        Shape::Rect { b, h } => {
            let (bm, hm) = (b.to_mm(), h.to_mm());
            let ro = rule.corner_outer(t_des).to_mm();
            let (a, ix, iy) = rect_tube(bm, hm, t, ro);
            let tn = t_nom.to_mm();
            let (a_weight, _, _) = rect_tube(bm, hm, tn, rule.corner_outer(t_nom).to_mm());
            SectionProps {
                area: Area::mm2(a),
                ix: Inertia::mm4(ix),
                iy: Inertia::mm4(iy),
                rx: Length::mm((ix / a).sqrt()),
                ry: Length::mm((iy / a).sqrt()),
                sx: Volume::mm3(ix / (hm / 2.0)),
                sy: Volume::mm3(iy / (bm / 2.0)),
                mass_per_length: density * Area::mm2(a_weight),
                inside: Shape::Rect {
                    b: Length::mm(bm - 2.0 * tn),
                    h: Length::mm(hm - 2.0 * tn),
                },
                r_inner: Some(Length::mm((ro - t).max(0.0))),
            }
        }
        Shape::Round { d } => {
            let dm = d.to_mm();
            let di = dm - 2.0 * t;
            let a = PI / 4.0 * (dm * dm - di * di);
            let i = PI / 64.0 * (dm.powi(4) - di.powi(4));
            let tn = t_nom.to_mm();
            let a_weight = PI * (dm - tn) * tn;
            SectionProps {
                area: Area::mm2(a),
                ix: Inertia::mm4(i),
                iy: Inertia::mm4(i),
                rx: Length::mm((i / a).sqrt()),
                ry: Length::mm((i / a).sqrt()),
                sx: Volume::mm3(i / (dm / 2.0)),
                sy: Volume::mm3(i / (dm / 2.0)),
                mass_per_length: density * Area::mm2(a_weight),
                inside: Shape::Round {
                    d: Length::mm(dm - 2.0 * tn),
                },
                r_inner: None,
            }
        }
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn a_square_corner_gives_the_plain_rectangle() {
        // b h³ / 12 for r = 0 (textbook formula).
        let (a, ix, iy) = rounded_rectangle(2.0, 4.0, 0.0);
        assert_eq!(a, 8.0);
        assert!((ix - 2.0 * 64.0 / 12.0).abs() < 1e-12);
        assert!((iy - 4.0 * 8.0 / 12.0).abs() < 1e-12);
    }

    #[test]
    fn a_fully_rounded_square_is_a_circle() {
        // r = b/2 turns the square into a circle: A = π r², I = π r⁴ / 4 (textbook formulas).
        let (a, ix, _) = rounded_rectangle(2.0, 2.0, 1.0);
        assert!((a - PI).abs() < 1e-12);
        assert!((ix - PI / 4.0).abs() < 1e-12);
    }

    #[test]
    fn erw_design_wall_is_rounded_as_tabulated() {
        // AISC 360-22 §B4.2: 0.93 × 0.125 = 0.11625 → 0.116 in. as the Manual tabulates it.
        let t = SectionRule::AiscErw
            .design_wall(Length::inch(0.125))
            .to_in();
        assert!((t - 0.116).abs() < 1e-12);
        let t = SectionRule::A513.design_wall(Length::inch(0.065)).to_in();
        assert!((t - 0.065).abs() < 1e-12);
    }

    #[test]
    fn en_corner_radius_by_thickness() {
        // EN 10219-2 (rules as given in the task's catalogue brief): 2t, 2.5t, 3t.
        let r = |t: f64| SectionRule::En10219.corner_outer(Length::mm(t)).to_mm();
        assert_eq!(r(6.0), 12.0);
        assert_eq!(r(8.0), 20.0);
        assert_eq!(r(12.0), 36.0);
    }

    #[test]
    fn outside_perimeter_of_a_square_tube_runs_round_its_corners() {
        // Worked by hand: HSS2x2x3/16, r = 2.0 × 0.174 = 0.348 in.:
        // 4 × 2 − 8 × 0.348 + 2π × 0.348 = 8 − 2.784 + 2.187 = 7.403 in.
        let cat = crate::catalogue::Catalogue::embedded().unwrap();
        let s = cat.sections.get("HSS2x2x3/16").unwrap();
        assert!((s.outside_perimeter().to_in() - 7.403).abs() < 0.002);
    }

    #[test]
    fn outside_perimeter_of_a_round_tube_is_its_circumference() {
        // Worked by hand: π × 2.375 = 7.461 in.
        let cat = crate::catalogue::Catalogue::embedded().unwrap();
        let s = cat.sections.get("HSS2.375x0.154").unwrap();
        assert!((s.outside_perimeter().to_in() - 7.461).abs() < 0.001);
    }
}
