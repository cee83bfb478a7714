//! Nuts and washers, by nominal thread diameter.

use super::node::{Ctx, Table};
use super::range::same_size;
use super::Provenance;
use crate::units::Length;

/// The surface finish of a bolt or nut as it is ordered.
#[derive(Debug, Clone, Copy, PartialEq, Eq, PartialOrd, Ord)]
pub enum Finish {
    /// Uncoated ("black") or a thin coating that needs no oversize tapping of the nut.
    Plain,
    /// Hot-dip galvanized: the zinc on the bolt thread needs a nut tapped oversize for it.
    HotDipGalvanized,
}

impl Finish {
    /// The finish as the catalogue writes it.
    pub fn as_str(self) -> &'static str {
        match self {
            Finish::Plain => "plain",
            Finish::HotDipGalvanized => "hot-dip galvanized",
        }
    }

    /// Read the required `finish` key of a bolt type or nut.
    pub(crate) fn read(t: &Table, cx: &mut Ctx) -> Option<Self> {
        let text = t.str(cx, "finish")?;
        match text.as_str() {
            "plain" => Some(Finish::Plain),
            "hot-dip galvanized" => Some(Finish::HotDipGalvanized),
            other => {
                cx.error_hint(
                    &t.span_of("finish"),
                    &t.key("finish"),
                    format!("unknown finish '{other}'"),
                    "one of \"plain\", \"hot-dip galvanized\"",
                );
                None
            }
        }
    }
}

/// A nut's dimensions at one nominal diameter.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct NutSize {
    pub d: Length,
    /// Nut height (thickness): the basic or maximum value the standard gives (ISO: m max).
    pub height: Length,
    /// Minimum nut height, where the standard gives one (ISO: m min).
    pub height_min: Option<Length>,
    /// Width across flats.
    pub across_flats: Option<Length>,
}

/// A style of nut.
#[derive(Debug, Clone, PartialEq)]
pub struct Nut {
    pub name: String,
    pub standard: String,
    /// Whether the nut holds by a prevailing-torque insert (it needs thread through the insert).
    pub prevailing_torque: bool,
    pub finish: Finish,
    /// Whether the nut is tapped oversize after galvanizing, to go on a hot-dip galvanized bolt
    /// (`tapped_oversize_for_galvanized`).
    pub tapped_oversize_for_galvanized: bool,
    pub sizes: Vec<NutSize>,
    pub provenance: Provenance,
}

impl Nut {
    /// The nut's dimensions for a nominal diameter.
    pub fn size_for(&self, d: Length) -> Option<&NutSize> {
        self.sizes.iter().find(|s| same_size(s.d, d))
    }

    pub(crate) fn read(
        t: &Table,
        cx: &mut Ctx,
        name: String,
        provenance: Provenance,
    ) -> Option<Self> {
        let standard = t.str(cx, "standard");
        let prevailing_torque = t.bool_or(cx, "prevailing_torque", false);
        let finish = Finish::read(t, cx);
        let oversize_given = t.has("tapped_oversize_for_galvanized");
        let oversize = t.bool_or(cx, "tapped_oversize_for_galvanized", false);
        let mut ok = true;
        match (finish, oversize_given, oversize) {
            (Some(Finish::HotDipGalvanized), false, _) => {
                cx.error_hint(
                    &t.span,
                    &t.key("tapped_oversize_for_galvanized"),
                    "a hot-dip galvanized nut must say whether it is tapped oversize for galvanized bolts",
                    "add `tapped_oversize_for_galvanized = true` (or false)",
                );
                ok = false;
            }
            (Some(Finish::Plain), _, true) => {
                cx.error_hint(
                    &t.span_of("tapped_oversize_for_galvanized"),
                    &t.key("tapped_oversize_for_galvanized"),
                    "a nut tapped oversize for galvanized bolts is itself galvanized before tapping",
                    "set `finish = \"hot-dip galvanized\"`, or remove the key",
                );
                ok = false;
            }
            _ => {}
        }
        let mut sizes = Vec::new();
        for row in t.tables(cx, "size") {
            let d = row.length(cx, "d");
            let height = row.length(cx, "height");
            let height_min = row.opt_length(cx, "height_min");
            let across_flats = row.opt_length(cx, "across_flats");
            row.finish(cx);
            match (d, height) {
                (Some(d), Some(height)) => {
                    if height_min.is_some_and(|m| m.to_mm() > height.to_mm()) {
                        cx.error(
                            &row.span,
                            &row.key("height_min"),
                            "height_min exceeds height",
                        );
                        ok = false;
                    }
                    sizes.push(NutSize {
                        d,
                        height,
                        height_min,
                        across_flats,
                    })
                }
                _ => ok = false,
            }
        }
        ok &= sizes_present(t, cx, sizes.iter().map(|s| s.d).collect());
        t.finish(cx);
        Some(Nut {
            name,
            standard: standard?,
            prevailing_torque,
            finish: finish?,
            tapped_oversize_for_galvanized: oversize,
            sizes,
            provenance,
        })
        .filter(|_| ok)
    }
}

/// A washer's dimensions at one nominal bolt diameter.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct WasherSize {
    pub d: Length,
    /// Inside diameter (nominal, or d1 min for ISO 7089).
    pub id: Length,
    /// Outside diameter (nominal, or d2 max for ISO 7089).
    pub od: Length,
    /// Nominal thickness, where the standard gives one.
    pub t_nom: Option<Length>,
    /// Least thickness (the nominal one where no range is given).
    pub t_min: Length,
    /// Greatest thickness (the nominal one where no range is given).
    pub t_max: Length,
}

/// A pattern of washer.
#[derive(Debug, Clone, PartialEq)]
pub struct Washer {
    pub name: String,
    pub standard: String,
    /// Whether the washer is hardened (ASTM F436 and the like).
    pub hardened: bool,
    pub sizes: Vec<WasherSize>,
    pub provenance: Provenance,
}

impl Washer {
    /// The washer's dimensions for a nominal diameter.
    pub fn size_for(&self, d: Length) -> Option<&WasherSize> {
        self.sizes.iter().find(|s| same_size(s.d, d))
    }

    pub(crate) fn read(
        t: &Table,
        cx: &mut Ctx,
        name: String,
        provenance: Provenance,
    ) -> Option<Self> {
        let standard = t.str(cx, "standard");
        let hardened = t.bool_or(cx, "hardened", false);
        let mut sizes = Vec::new();
        let mut ok = true;
        for row in t.tables(cx, "size") {
            let d = row.length(cx, "d");
            let id = row.length(cx, "id");
            let od = row.length(cx, "od");
            let t_nom = row.opt_length(cx, "t");
            let t_min = row.opt_length(cx, "t_min");
            let t_max = row.opt_length(cx, "t_max");
            let given = (row.has("t"), row.has("t_min"), row.has("t_max"));
            row.finish(cx);
            let (lo, hi) = match (t_nom, t_min, t_max) {
                (_, Some(lo), Some(hi)) => (lo, hi),
                (Some(n), None, None) if !given.1 && !given.2 => (n, n),
                _ => {
                    if !(given.0 || given.1 && given.2) {
                        cx.error(
                            &row.span,
                            &row.key("t"),
                            "give the thickness 't', or both 't_min' and 't_max'",
                        );
                    }
                    ok = false;
                    continue;
                }
            };
            let (Some(d), Some(id), Some(od)) = (d, id, od) else {
                ok = false;
                continue;
            };
            if lo.to_mm() > hi.to_mm() || id.to_mm() >= od.to_mm() || id.to_mm() < d.to_mm() {
                cx.error(
                    &row.span,
                    &row.key("id"),
                    "inconsistent washer: need d ≤ id < od and t_min ≤ t_max",
                );
                ok = false;
                continue;
            }
            sizes.push(WasherSize {
                d,
                id,
                od,
                t_nom,
                t_min: lo,
                t_max: hi,
            });
        }
        ok &= sizes_present(t, cx, sizes.iter().map(|s| s.d).collect());
        t.finish(cx);
        Some(Washer {
            name,
            standard: standard?,
            hardened,
            sizes,
            provenance,
        })
        .filter(|_| ok)
    }
}

/// At least one size row, and no diameter twice.
fn sizes_present(t: &Table, cx: &mut Ctx, ds: Vec<Length>) -> bool {
    if ds.is_empty() {
        if t.has("size") {
            return false;
        }
        cx.error(
            &t.span,
            &t.key("size"),
            "at least one [[size]] row is needed",
        );
        return false;
    }
    for (i, a) in ds.iter().enumerate() {
        if ds[i + 1..].iter().any(|b| same_size(*a, *b)) {
            cx.error(
                &t.span,
                &t.key("size"),
                format!("diameter {} is listed twice", super::show_length(*a)),
            );
            return false;
        }
    }
    true
}

#[cfg(test)]
mod tests {
    use crate::catalogue::{Catalogue, Finish};

    const SOURCE: &str = "[[source]]\nid = \"shop\"\ndocument = \"invented supplier sheet\"\nedition = \"1\"\ntable = \"1\"\n\n";
    const SIZE: &str = "[[nut.size]]\nd = \"1/2 in\"\nheight = \"31/64 in\"\n";

    fn nut(keys: &str) -> Result<Catalogue, Vec<crate::diag::Diagnostic>> {
        let mut cat = Catalogue::embedded().unwrap();
        let text = format!(
            "{SOURCE}[[nut]]\nname = \"shop nut\"\nstandard = \"ASME B18.2.2\"\nsource = \"shop\"\n{keys}{SIZE}"
        );
        cat.merge_user_file("mine.toml", &text).map(|_| cat)
    }

    #[test]
    fn the_embedded_galvanized_nut_is_tapped_oversize() {
        let cat = Catalogue::embedded().unwrap();
        let n = cat
            .nut("heavy hex nut, hot-dip galvanized, tapped oversize")
            .unwrap();
        assert_eq!(n.finish, Finish::HotDipGalvanized);
        assert!(n.tapped_oversize_for_galvanized);
        let plain = cat.nut("heavy hex nut").unwrap();
        assert_eq!(plain.finish, Finish::Plain);
        assert!(!plain.tapped_oversize_for_galvanized);
    }

    #[test]
    fn a_nut_states_its_finish_and_a_galvanized_one_its_tapping() {
        let e = nut("").unwrap_err();
        assert!(
            e.iter().any(|d| d.message.contains("missing key 'finish'")),
            "{e:?}"
        );
        let e = nut("finish = \"zinc\"\n").unwrap_err();
        assert!(
            e.iter()
                .any(|d| d.message.contains("unknown finish 'zinc'")),
            "{e:?}"
        );
        let e = nut("finish = \"hot-dip galvanized\"\n").unwrap_err();
        assert!(
            e.iter()
                .any(|d| d.key.ends_with("tapped_oversize_for_galvanized")),
            "{e:?}"
        );
        let e = nut("finish = \"plain\"\ntapped_oversize_for_galvanized = true\n").unwrap_err();
        assert!(
            e.iter()
                .any(|d| d.message.contains("galvanized before tapping")),
            "{e:?}"
        );
        let cat = nut("finish = \"hot-dip galvanized\"\ntapped_oversize_for_galvanized = false\n")
            .unwrap();
        assert!(!cat.nut("shop nut").unwrap().tapped_oversize_for_galvanized);
    }
}
