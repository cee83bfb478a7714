//! Size ranges as standards write them: "1/4 to 3/4 in.", "over 3/4 to 1-1/2 in.", "d ≤ 16 mm",
//! "t < 3 mm", "16 < t ≤ 40 mm".

use super::node::{Ctx, Table};
use crate::units::Length;

/// Two lengths this close (mm) are the same nominal size.
pub(crate) const SAME_SIZE_MM: f64 = 0.005;

/// Whether two nominal sizes are the same (within rounding of their conversion).
pub fn same_size(a: Length, b: Length) -> bool {
    (a.to_mm() - b.to_mm()).abs() < SAME_SIZE_MM
}

/// A range of a diameter or thickness, with each end inclusive or exclusive.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct SizeRange {
    /// Lower end.
    pub lower: Length,
    /// Whether the lower end is in the range ("from", ≤) or not ("over", <).
    pub lower_inclusive: bool,
    /// Upper end; `None` where the standard sets no upper limit.
    pub upper: Option<Length>,
    /// Whether the upper end is in the range ("to", ≤) or not ("below", <).
    pub upper_inclusive: bool,
}

impl SizeRange {
    /// Whether a size falls in the range (ends compared within [`SAME_SIZE_MM`]).
    pub fn contains(&self, x: Length) -> bool {
        let lo = self.lower.to_mm();
        let v = x.to_mm();
        let above_lower = if self.lower_inclusive {
            v > lo - SAME_SIZE_MM
        } else {
            v > lo + SAME_SIZE_MM
        };
        let below_upper = match self.upper {
            None => true,
            Some(u) if self.upper_inclusive => v < u.to_mm() + SAME_SIZE_MM,
            Some(u) => v < u.to_mm() - SAME_SIZE_MM,
        };
        above_lower && below_upper
    }

    /// The range in words with a symbol, e.g. "1/4 in ≤ d ≤ 3/4 in".
    pub fn describe(&self, symbol: &str, show: impl Fn(Length) -> String) -> String {
        let lo = format!(
            "{} {} {symbol}",
            show(self.lower),
            if self.lower_inclusive { "≤" } else { "<" }
        );
        match self.upper {
            None => lo,
            Some(u) => format!(
                "{lo} {} {}",
                if self.upper_inclusive { "≤" } else { "<" },
                show(u)
            ),
        }
    }

    /// Read a range from a table: `from` (inclusive) or `over` (exclusive) for the lower end, and
    /// `to` (inclusive) or `below` (exclusive) for the upper end, or neither for no upper limit.
    pub(crate) fn read(t: &Table, cx: &mut Ctx) -> Option<SizeRange> {
        let from = t.opt_length_or_zero(cx, "from");
        let over = t.opt_length_or_zero(cx, "over");
        let has_from = t.has("from");
        let has_over = t.has("over");
        let (lower, lower_inclusive) = match (has_from, has_over) {
            (true, false) => (from?, true),
            (false, true) => (over?, false),
            (true, true) => {
                cx.error(
                    &t.span_of("over"),
                    &t.key("over"),
                    "give either 'from' (inclusive) or 'over' (exclusive), not both",
                );
                return None;
            }
            (false, false) => {
                cx.error(
                    &t.span,
                    &t.key("from"),
                    "missing the lower end of the range: 'from' (inclusive) or 'over' (exclusive)",
                );
                return None;
            }
        };
        let to = t.opt_length(cx, "to");
        let below = t.opt_length(cx, "below");
        let (upper, upper_inclusive) = match (t.has("to"), t.has("below")) {
            (true, false) => (Some(to?), true),
            (false, true) => (Some(below?), false),
            (false, false) => (None, true),
            (true, true) => {
                cx.error(
                    &t.span_of("below"),
                    &t.key("below"),
                    "give either 'to' (inclusive) or 'below' (exclusive), not both",
                );
                return None;
            }
        };
        if let Some(u) = upper {
            if u.to_mm() < lower.to_mm() + SAME_SIZE_MM {
                cx.error(
                    &t.span,
                    &t.key("to"),
                    "the upper end of the range is not above its lower end",
                );
                return None;
            }
        }
        Some(SizeRange {
            lower,
            lower_inclusive,
            upper,
            upper_inclusive,
        })
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    fn range(lo: f64, li: bool, up: Option<f64>, ui: bool) -> SizeRange {
        SizeRange {
            lower: Length::inch(lo),
            lower_inclusive: li,
            upper: up.map(Length::inch),
            upper_inclusive: ui,
        }
    }

    #[test]
    fn inclusive_and_exclusive_ends() {
        // "over 3/4 to 1-1/2 in." excludes 3/4 and includes 1-1/2.
        let r = range(0.75, false, Some(1.5), true);
        assert!(!r.contains(Length::inch(0.75)));
        assert!(r.contains(Length::inch(0.875)));
        assert!(r.contains(Length::inch(1.5)));
        assert!(!r.contains(Length::inch(1.625)));
        // "t < 3 mm" excludes 3 mm.
        let r = SizeRange {
            lower: Length::mm(0.0),
            lower_inclusive: false,
            upper: Some(Length::mm(3.0)),
            upper_inclusive: false,
        };
        assert!(!r.contains(Length::mm(3.0)));
        assert!(r.contains(Length::mm(2.5)));
        let open = range(1.0, true, None, true);
        assert!(open.contains(Length::inch(40.0)));
        assert!(!open.contains(Length::inch(0.9)));
    }

    #[test]
    fn description() {
        let r = range(0.25, true, Some(0.75), true);
        assert_eq!(
            r.describe("d", |l| format!("{:.2} in", l.to_in())),
            "0.25 in ≤ d ≤ 0.75 in"
        );
    }
}
