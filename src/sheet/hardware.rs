//! The hardware lists: the fastener set of every connection turned into what goes in its bag
//! (`kits.csv`) and summed per item with spares (what to order, `hardware.csv`). The model has
//! no way to say a bolt is fitted in the shop, so every item is loose field hardware.

use super::format;
use crate::checks::fasteners::FastenerSet;
use crate::model::{Detail, Model};
use crate::units::UnitSystem;
use serde::Serialize;
use std::collections::BTreeMap;

/// How many spares to order of each item: a percentage of the quantity, rounded up, and never
/// fewer than a minimum.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct SparesRule {
    pub percent: f64,
    pub minimum: u32,
}

impl Default for SparesRule {
    /// Five per cent, at least one of each item (common practice for loose site hardware).
    fn default() -> Self {
        SparesRule {
            percent: 5.0,
            minimum: 1,
        }
    }
}

impl From<crate::model::Spares> for SparesRule {
    fn from(s: crate::model::Spares) -> Self {
        SparesRule {
            percent: s.percent,
            minimum: s.minimum,
        }
    }
}

impl SparesRule {
    /// The spares for a quantity: the larger of the minimum and `percent` of it, rounded up.
    pub fn spares(&self, quantity: u32) -> u32 {
        // Round away the error of the percentage in binary before taking the ceiling, so 5 % of
        // 20 is 1 and not 2.
        let share = (f64::from(quantity) * self.percent / 100.0 * 1e9).round() / 1e9;
        (share.ceil() as u32).max(self.minimum)
    }
}

/// What kind of hardware an item is; the order of the hardware list.
#[derive(Debug, Clone, Copy, PartialEq, Eq, PartialOrd, Ord, Serialize)]
#[serde(rename_all = "lowercase")]
pub enum ItemKind {
    Bolt,
    Nut,
    Washer,
}

impl ItemKind {
    pub fn as_str(self) -> &'static str {
        match self {
            ItemKind::Bolt => "bolt",
            ItemKind::Nut => "nut",
            ItemKind::Washer => "washer",
        }
    }
}

/// One orderable hardware item; two fasteners with equal items are the same line of the order.
#[derive(Debug, Clone, PartialEq, Eq, PartialOrd, Ord, Serialize)]
pub struct Item {
    pub kind: ItemKind,
    /// The product: "heavy hex structural bolt", "heavy hex nut", "ASTM F436".
    pub product: String,
    /// Grade or specification: "ASTM F3125 Gr A325", "ASTM A563 Gr DH", or "" for a washer,
    /// whose name is its specification.
    pub grade: String,
    /// Nominal size as the shop writes it.
    pub size: String,
    /// Thread designation, "" for a washer.
    pub thread: String,
    /// Bolt length as the shop writes it, "" for nuts and washers.
    pub length: String,
    pub finish: String,
}

/// One line of a kit: an item and how many of it go in one connection's bag.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct KitLine {
    pub connection: String,
    pub member: String,
    pub end: String,
    pub detail: String,
    pub item: Item,
    pub quantity: u32,
}

/// One line of the order: an item with its quantity, spares and total.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct OrderLine {
    pub item: Item,
    pub quantity: u32,
    pub spares: u32,
    pub order: u32,
}

/// The words used where neither the model nor the catalogue gives the finish (washers).
pub const FINISH_NOT_GIVEN: &str = "not given";
/// The words used where no bolt length has been chosen.
pub const LENGTH_NOT_CHOSEN: &str = "not chosen";

fn find_detail<'m>(model: &'m Model, id: &str) -> Option<&'m Detail> {
    model.details.iter().find(|d| d.id == id)
}

/// A nut's finish as the order writes it: the finish, and the oversize tapping where it has it.
fn nut_finish(n: &crate::catalogue::Nut) -> String {
    if n.tapped_oversize_for_galvanized {
        format!("{}, tapped oversize", n.finish.as_str())
    } else {
        n.finish.as_str().into()
    }
}

/// The items of one bolt position of a connection: the bolt at the length its stack-up settled
/// (or "not chosen"), its nut and its washers, each with how many one position takes.
fn items(d: &Detail, set: &FastenerSet) -> Vec<(Item, u32)> {
    let b = &d.bolts;
    // fasteners are ordered in the sizes they are sold in: inch-series bolts, nuts and washers
    // in inches and metric ones in millimetres, whatever the sheet's units
    let units = match crate::checks::bolting::series(b) {
        crate::standards::aisc360::j3_bolts::Series::Inch => UnitSystem::Us,
        crate::standards::aisc360::j3_bolts::Series::Metric => UnitSystem::Si,
    };
    let size = format::length(b.thread.d, units, false);
    let mut out = vec![(
        Item {
            kind: ItemKind::Bolt,
            product: set.bolt_type.clone(),
            grade: set.grade.clone(),
            size: size.clone(),
            thread: set.thread.clone(),
            length: set
                .length
                .length()
                .map(|l| format::length(l, units, false))
                .unwrap_or_else(|| LENGTH_NOT_CHOSEN.into()),
            finish: b.bolt_type.finish.as_str().into(),
        },
        1,
    )];
    // a tapped detail has no nut: its screw threads into the plug
    if !set.nut.is_empty() {
        out.push((
            Item {
                kind: ItemKind::Nut,
                product: set.nut.clone(),
                grade: set.nut_grade.clone(),
                size: size.clone(),
                thread: set.thread.clone(),
                length: String::new(),
                finish: b.nut.as_ref().map_or(FINISH_NOT_GIVEN.into(), nut_finish),
            },
            1,
        ));
    }
    let mut washers: BTreeMap<&str, u32> = BTreeMap::new();
    for w in &set.washers {
        *washers.entry(w.name.as_str()).or_default() += 1;
    }
    for (name, n) in washers {
        out.push((
            Item {
                kind: ItemKind::Washer,
                product: name.to_string(),
                grade: String::new(),
                size: size.clone(),
                thread: String::new(),
                length: String::new(),
                finish: FINISH_NOT_GIVEN.into(),
            },
            n,
        ));
    }
    out
}

/// What goes in each connection's bag, in the order of the fastener sets: every item of one
/// bolt position times the bolts at that member end.
pub fn kits(model: &Model, sets: &[FastenerSet]) -> Vec<KitLine> {
    let mut out = Vec::new();
    for set in sets {
        let Some(d) = find_detail(model, &set.detail) else {
            continue;
        };
        for (item, each) in items(d, set) {
            out.push(KitLine {
                connection: set.connection.clone(),
                member: set.member.clone(),
                end: set.end.as_str().to_string(),
                detail: set.detail.clone(),
                item,
                quantity: each * set.bolt_count,
            });
        }
    }
    out
}

/// The order of loose hardware: the kits summed per item, with spares.
pub fn order(kits: &[KitLine], rule: SparesRule) -> Vec<OrderLine> {
    let mut sums: BTreeMap<&Item, u32> = BTreeMap::new();
    for k in kits {
        *sums.entry(&k.item).or_default() += k.quantity;
    }
    sums.into_iter()
        .map(|(item, quantity)| {
            let spares = rule.spares(quantity);
            OrderLine {
                item: item.clone(),
                quantity,
                spares,
                order: quantity + spares,
            }
        })
        .collect()
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn spares_are_the_larger_of_the_minimum_and_the_percentage_rounded_up() {
        let rule = SparesRule::default();
        assert_eq!(rule.spares(1), 1);
        assert_eq!(rule.spares(20), 1);
        assert_eq!(rule.spares(21), 2);
        assert_eq!(rule.spares(44), 3);
        assert_eq!(rule.spares(0), 1);
        let rule = SparesRule {
            percent: 10.0,
            minimum: 4,
        };
        assert_eq!(rule.spares(12), 4);
        assert_eq!(rule.spares(41), 5);
    }

    fn item(kind: ItemKind, length: &str) -> Item {
        Item {
            kind,
            product: "p".into(),
            grade: "g".into(),
            size: "1/2 in".into(),
            thread: "1/2-13 UNC".into(),
            length: length.into(),
            finish: FINISH_NOT_GIVEN.into(),
        }
    }

    fn kit(connection: &str, item: Item, quantity: u32) -> KitLine {
        KitLine {
            connection: connection.into(),
            member: connection.split('/').next().unwrap_or_default().into(),
            end: "start".into(),
            detail: "D".into(),
            item,
            quantity,
        }
    }

    #[test]
    fn order_sums_kits_per_item_with_spares() {
        let kits = vec![
            kit("A/start", item(ItemKind::Bolt, "2 in"), 2),
            kit("B/start", item(ItemKind::Bolt, "2 in"), 40),
            kit("C/start", item(ItemKind::Bolt, "2-1/2 in"), 2),
            kit("A/start", item(ItemKind::Nut, ""), 2),
        ];
        let o = order(&kits, SparesRule::default());
        let got: Vec<(ItemKind, &str, u32, u32, u32)> = o
            .iter()
            .map(|l| {
                (
                    l.item.kind,
                    l.item.length.as_str(),
                    l.quantity,
                    l.spares,
                    l.order,
                )
            })
            .collect();
        assert_eq!(
            got,
            vec![
                (ItemKind::Bolt, "2 in", 42, 3, 45),
                (ItemKind::Bolt, "2-1/2 in", 2, 1, 3),
                (ItemKind::Nut, "", 2, 1, 3)
            ]
        );
    }
}
