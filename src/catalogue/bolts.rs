//! Bolt grades (strength by diameter range), nut grades (which bolt grades each suits) and bolt
//! types (thread length rule, head size, length series).

use super::hardware::Finish;
use super::node::{Ctx, Table};
use super::range::{same_size, SizeRange};
use super::{show_length, Provenance};
use crate::units::{Length, Stress};

/// The AISC 360 group a bolt grade belongs to (AISC 360-22 Table J3.2 and §A3.3).
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum AiscGroup {
    /// ASTM A307 bolts (AISC 360-22 Table J3.2 row "A307 bolts").
    A307,
    /// Group 120 (formerly Group A): ASTM F3125 Grades A325, A325M, F1852.
    Group120,
    /// Group 150 (formerly Group B): ASTM F3125 Grades A490, A490M, F2280.
    Group150,
    /// Not a grade AISC 360 names: strengths of threaded parts apply (Table J3.2, "threaded parts").
    None,
}

impl AiscGroup {
    fn parse(s: &str) -> Option<Self> {
        match s {
            "A307" => Some(AiscGroup::A307),
            "120" => Some(AiscGroup::Group120),
            "150" => Some(AiscGroup::Group150),
            "none" => Some(AiscGroup::None),
            _ => None,
        }
    }

    /// The group as written in the catalogue ("A307", "120", "150", "none").
    pub fn as_str(self) -> &'static str {
        match self {
            AiscGroup::A307 => "A307",
            AiscGroup::Group120 => "120",
            AiscGroup::Group150 => "150",
            AiscGroup::None => "none",
        }
    }
}

/// What the second strength of a grade is.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum StrengthBasis {
    /// A minimum yield strength (or 0.2 % offset strength).
    Yield,
    /// A proof stress only.
    Proof,
    /// The standard specifies neither (e.g. ASTM A307 Grade A).
    NotSpecified,
}

/// The strengths of a grade over one diameter range.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct GradeStrength {
    /// The diameters the row applies to.
    pub range: SizeRange,
    /// Minimum tensile strength, Fu.
    pub fu: Stress,
    /// Minimum yield strength where given, else the proof stress, else `None`.
    pub fy_or_proof: Option<Stress>,
    /// Which of the two `fy_or_proof` is.
    pub basis: StrengthBasis,
    /// Minimum yield strength, where the standard gives one.
    pub fy: Option<Stress>,
    /// Proof stress, where the standard gives one.
    pub proof: Option<Stress>,
}

/// A bolt grade or property class.
#[derive(Debug, Clone, PartialEq)]
pub struct BoltGrade {
    pub name: String,
    pub standard: String,
    pub aisc_group: AiscGroup,
    /// Rows by diameter range, as the standard gives them.
    pub strengths: Vec<GradeStrength>,
    pub provenance: Provenance,
}

impl BoltGrade {
    /// The strengths for a nominal diameter; an error when the standard gives none for it.
    pub fn strength_at(&self, d: Length) -> Result<GradeStrength, String> {
        self.strengths
            .iter()
            .find(|s| s.range.contains(d))
            .copied()
            .ok_or_else(|| {
                let ranges: Vec<String> = self
                    .strengths
                    .iter()
                    .map(|s| s.range.describe("d", show_length))
                    .collect();
                format!(
                    "bolt grade '{}': diameter {} is outside every range {} gives ({})",
                    self.name,
                    show_length(d),
                    self.standard,
                    ranges.join("; ")
                )
            })
    }

    pub(crate) fn read(
        t: &Table,
        cx: &mut Ctx,
        name: String,
        provenance: Provenance,
    ) -> Option<Self> {
        let standard = t.str(cx, "standard");
        let group = t.str(cx, "aisc_group").and_then(|g| {
            let parsed = AiscGroup::parse(&g);
            if parsed.is_none() {
                cx.error_hint(
                    &t.span_of("aisc_group"),
                    &t.key("aisc_group"),
                    format!("unknown AISC group '{g}'"),
                    "one of \"A307\", \"120\", \"150\", \"none\"",
                );
            }
            parsed
        });
        let mut strengths = Vec::new();
        let mut ok = true;
        for row in t.tables(cx, "strength") {
            let range = SizeRange::read(&row, cx);
            let fu = row.stress(cx, "fu");
            let fy = row.opt_stress(cx, "fy");
            let proof = row.opt_stress(cx, "proof");
            row.finish(cx);
            match (range, fu) {
                (Some(range), Some(fu)) => {
                    let (fy_or_proof, basis) = match (fy, proof) {
                        (Some(y), _) => (Some(y), StrengthBasis::Yield),
                        (None, Some(p)) => (Some(p), StrengthBasis::Proof),
                        (None, None) => (None, StrengthBasis::NotSpecified),
                    };
                    strengths.push(GradeStrength {
                        range,
                        fu,
                        fy_or_proof,
                        basis,
                        fy,
                        proof,
                    });
                }
                _ => ok = false,
            }
        }
        if strengths.is_empty() && ok {
            cx.error_hint(
                &t.span,
                &t.key("strength"),
                "a bolt grade needs at least one strength row",
                "add [[bolt_grade.strength]] with from/over, to, fu and fy or proof",
            );
            ok = false;
        }
        if overlapping(&strengths) {
            cx.error(
                &t.span,
                &t.key("strength"),
                "strength rows overlap in diameter",
            );
            ok = false;
        }
        t.finish(cx);
        Some(BoltGrade {
            name,
            standard: standard?,
            aisc_group: group?,
            strengths,
            provenance,
        })
        .filter(|_| ok)
    }
}

fn overlapping(rows: &[GradeStrength]) -> bool {
    rows.iter().enumerate().any(|(i, a)| {
        rows[i + 1..]
            .iter()
            .any(|b| !ends_before(&a.range, &b.range) && !ends_before(&b.range, &a.range))
    })
}

/// Whether range `a` ends before range `b` begins (no size in both).
fn ends_before(a: &SizeRange, b: &SizeRange) -> bool {
    match a.upper {
        None => false,
        Some(u) if same_size(u, b.lower) => !(a.upper_inclusive && b.lower_inclusive),
        Some(u) => u.to_mm() < b.lower.to_mm(),
    }
}

/// A nut grade or property class and the bolt grades it suits.
#[derive(Debug, Clone, PartialEq)]
pub struct NutGrade {
    pub name: String,
    pub standard: String,
    /// Names of the bolt grades (in this catalogue) the nut grade suits.
    pub suits: Vec<String>,
    /// Where the suitability comes from (a compatibility table, or "common practice").
    pub suits_basis: String,
    /// The bolt grades it suits when the bolt is hot-dip galvanized (`suits_galvanized`; absent:
    /// none), with where that comes from (`suits_galvanized_basis`).
    pub suits_galvanized: Vec<String>,
    pub suits_galvanized_basis: Option<String>,
    pub provenance: Provenance,
}

impl NutGrade {
    /// Whether the nut grade suits a bolt grade by name.
    pub fn suits_grade(&self, bolt_grade: &str) -> bool {
        self.suits.iter().any(|s| s == bolt_grade)
    }

    /// Whether the nut grade suits a hot-dip galvanized bolt of a grade, by name.
    pub fn suits_galvanized_grade(&self, bolt_grade: &str) -> bool {
        self.suits_galvanized.iter().any(|s| s == bolt_grade)
    }

    pub(crate) fn read(
        t: &Table,
        cx: &mut Ctx,
        name: String,
        provenance: Provenance,
    ) -> Option<Self> {
        let standard = t.str(cx, "standard");
        let suits = t.str_list(cx, "suits");
        let suits_basis = t.str(cx, "suits_basis");
        let suits_galvanized = t.str_list(cx, "suits_galvanized");
        let suits_galvanized_basis = t.opt_str(cx, "suits_galvanized_basis");
        if !suits_galvanized.is_empty() && suits_galvanized_basis.is_none() {
            cx.error_hint(
                &t.span_of("suits_galvanized"),
                &t.key("suits_galvanized_basis"),
                "say where the galvanized suitability comes from",
                "add `suits_galvanized_basis = \"...\"` (the table it is read from)",
            );
        }
        let galvanized_ok = suits_galvanized.is_empty() || suits_galvanized_basis.is_some();
        if suits.is_empty() {
            cx.error(
                &t.span,
                &t.key("suits"),
                "a nut grade must list the bolt grades it suits",
            );
        }
        t.finish(cx);
        if suits.is_empty() || !galvanized_ok {
            return None;
        }
        Some(NutGrade {
            name,
            standard: standard?,
            suits,
            suits_basis: suits_basis?,
            suits_galvanized,
            suits_galvanized_basis,
            provenance,
        })
    }
}

/// One band of a thread-length formula: LT = times_d · d + plus, for bolt lengths up to
/// `length_up_to` (inclusive; `None` for all longer bolts).
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct ThreadBand {
    pub length_up_to: Option<Length>,
    pub times_d: f64,
    pub plus: Length,
}

/// How long the thread of a bolt type is, as its standard gives it.
#[derive(Debug, Clone, PartialEq)]
pub enum ThreadLengthRule {
    /// A formula in d by bands of bolt length (ASME B18.2.1, ISO 4014).
    Bands(Vec<ThreadBand>),
    /// A table by nominal diameter (ASME B18.2.6): pairs (d, thread length).
    Table(Vec<(Length, Length)>),
    /// Threaded up to the head (ISO 4017, fully threaded cap screws).
    Full,
}

impl ThreadLengthRule {
    /// The nominal thread length of a bolt of diameter d and length L under this rule. It may
    /// exceed L, in which case the bolt is threaded to the head.
    pub fn thread_length(&self, d: Length, l: Length) -> Result<Length, String> {
        match self {
            ThreadLengthRule::Full => Ok(l),
            ThreadLengthRule::Table(rows) => rows
                .iter()
                .find(|(dd, _)| same_size(*dd, d))
                .map(|(_, lt)| *lt)
                .ok_or_else(|| {
                    format!(
                        "the thread-length table gives no value for d = {}",
                        show_length(d)
                    )
                }),
            ThreadLengthRule::Bands(bands) => bands
                .iter()
                .find(|b| match b.length_up_to {
                    None => true,
                    Some(up) => l.to_mm() <= up.to_mm() + super::range::SAME_SIZE_MM,
                })
                .map(|b| d * b.times_d + b.plus)
                .ok_or_else(|| {
                    format!(
                        "the thread-length rule has no band for a bolt length of {}",
                        show_length(l)
                    )
                }),
        }
    }
}

/// Head size of a bolt type at one nominal diameter.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct BoltSize {
    pub d: Length,
    /// Head height (basic or maximum, as the source gives; see the entry's note).
    pub head_height: Option<Length>,
    /// Width across flats of the head.
    pub across_flats: Option<Length>,
}

/// A kind of bolt or screw: its thread-length rule, head sizes and length series.
#[derive(Debug, Clone, PartialEq)]
pub struct BoltType {
    pub name: String,
    pub standard: String,
    pub thread_length: ThreadLengthRule,
    /// The surface finish the bolt is ordered in (`finish`).
    pub finish: Finish,
    /// The standard (or stocked) lengths, ascending.
    pub lengths: Vec<Length>,
    /// Head sizes by diameter.
    pub sizes: Vec<BoltSize>,
    pub provenance: Provenance,
}

impl BoltType {
    /// Head size data for a nominal diameter.
    pub fn size_for(&self, d: Length) -> Option<&BoltSize> {
        self.sizes.iter().find(|s| same_size(s.d, d))
    }

    /// The shortest length of the series that is at least `needed`.
    pub fn length_at_least(&self, needed: Length) -> Option<Length> {
        self.lengths
            .iter()
            .copied()
            .find(|l| l.to_mm() >= needed.to_mm() - super::range::SAME_SIZE_MM)
    }

    pub(crate) fn read(
        t: &Table,
        cx: &mut Ctx,
        name: String,
        provenance: Provenance,
    ) -> Option<Self> {
        let standard = t.str(cx, "standard");
        let rule_name = t.str(cx, "thread_rule");
        let finish = Finish::read(t, cx);
        let mut ok = true;
        let mut sizes = Vec::new();
        let mut table_rows = Vec::new();
        for row in t.tables(cx, "size") {
            let d = row.length(cx, "d");
            let head_height = row.opt_length(cx, "head_height");
            let across_flats = row.opt_length(cx, "across_flats");
            let lt = row.opt_length(cx, "thread_length");
            let lt_given = row.has("thread_length");
            row.finish(cx);
            let Some(d) = d else {
                ok = false;
                continue;
            };
            if lt_given {
                match lt {
                    Some(lt) => table_rows.push((d, lt)),
                    None => ok = false,
                }
            }
            sizes.push(BoltSize {
                d,
                head_height,
                across_flats,
            });
        }
        let mut bands = Vec::new();
        for row in t.tables(cx, "thread_band") {
            let up = row.opt_length(cx, "length_up_to");
            let times_d = row.number(cx, "times_d");
            let plus = row.opt_length_or_zero(cx, "plus");
            if !row.has("plus") {
                cx.error(&row.span, &row.key("plus"), "missing key 'plus' (a length)");
            }
            row.finish(cx);
            match (times_d, plus) {
                (Some(times_d), Some(plus)) => bands.push(ThreadBand {
                    length_up_to: up,
                    times_d,
                    plus,
                }),
                _ => ok = false,
            }
        }
        let rule = match rule_name.as_deref() {
            Some("bands") => {
                if bands.is_empty() || bands.last().is_some_and(|b| b.length_up_to.is_some()) {
                    cx.error(
                        &t.span_of("thread_rule"),
                        &t.key("thread_band"),
                        "rule \"bands\" needs [[thread_band]] rows, the last with no length_up_to",
                    );
                    None
                } else {
                    Some(ThreadLengthRule::Bands(bands))
                }
            }
            Some("table") => {
                if table_rows.is_empty() || table_rows.len() != sizes.len() {
                    cx.error(
                        &t.span_of("thread_rule"),
                        &t.key("size"),
                        "rule \"table\" needs a thread_length on every [[size]] row",
                    );
                    None
                } else {
                    Some(ThreadLengthRule::Table(table_rows))
                }
            }
            Some("full") => Some(ThreadLengthRule::Full),
            Some(other) => {
                cx.error_hint(
                    &t.span_of("thread_rule"),
                    &t.key("thread_rule"),
                    format!("unknown thread rule '{other}'"),
                    "one of \"bands\", \"table\", \"full\"",
                );
                None
            }
            None => None,
        };
        let mut lengths = t.length_list(cx, "lengths");
        for step in t.tables(cx, "length_step") {
            let from = step.length(cx, "from");
            let to = step.length(cx, "to");
            let by = step.length(cx, "step");
            step.finish(cx);
            if let (Some(from), Some(to), Some(by)) = (from, to, by) {
                let n = ((to.to_mm() - from.to_mm()) / by.to_mm() + 1e-6).floor() as usize;
                for i in 0..=n {
                    lengths.push(from + by * i as f64);
                }
            } else {
                ok = false;
            }
        }
        lengths.sort_by(|a, b| a.to_mm().total_cmp(&b.to_mm()));
        lengths.dedup_by(|a, b| same_size(*a, *b));
        if lengths.is_empty() {
            cx.error(
                &t.span,
                &t.key("lengths"),
                "a bolt type needs its length series: 'lengths' or [[length_step]] rows",
            );
            ok = false;
        }
        t.finish(cx);
        Some(BoltType {
            name,
            standard: standard?,
            thread_length: rule?,
            finish: finish?,
            lengths,
            sizes,
            provenance,
        })
        .filter(|_| ok)
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn thread_length_by_bands() {
        // ASME B18.2.1 hex bolts: LT = 2D + 1/4 in. for L ≤ 6 in., 2D + 1/2 in. above (REFERENCES.md).
        let rule = ThreadLengthRule::Bands(vec![
            ThreadBand {
                length_up_to: Some(Length::inch(6.0)),
                times_d: 2.0,
                plus: Length::inch(0.25),
            },
            ThreadBand {
                length_up_to: None,
                times_d: 2.0,
                plus: Length::inch(0.5),
            },
        ]);
        let d = Length::inch(0.5);
        let short = rule.thread_length(d, Length::inch(6.0)).unwrap().to_in();
        let long = rule.thread_length(d, Length::inch(6.5)).unwrap().to_in();
        assert!((short - 1.25).abs() < 1e-9);
        assert!((long - 1.5).abs() < 1e-9);
    }

    #[test]
    fn thread_length_table_refuses_an_unlisted_diameter() {
        let rule = ThreadLengthRule::Table(vec![(Length::inch(0.5), Length::inch(1.0))]);
        assert!(rule
            .thread_length(Length::inch(0.5), Length::inch(3.0))
            .is_ok());
        let e = rule
            .thread_length(Length::inch(0.4375), Length::inch(3.0))
            .unwrap_err();
        assert!(e.contains("no value"), "{e}");
    }
}
