//! The hardware lists: every fastener position of the model gathered per connection (what goes in
//! each bag, `kits.csv`) and summed per item with spares (what to order, `hardware.csv`).

use crate::model::{Detail, End, Model};
use crate::units::{Length, UnitSystem};
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

/// The fasteners of one connection (one member end with its detail).
#[derive(Debug, Clone, PartialEq)]
pub struct ConnectionFasteners {
    /// "MEMBER/start" or "MEMBER/end".
    pub connection: String,
    pub member: String,
    pub end: End,
    pub detail: String,
    /// Bolt positions: lines across × bolts along.
    pub positions: u32,
    /// The bolt length chosen for the stack, when one is known.
    pub bolt_length: Option<Length>,
    /// Washers on each bolt.
    pub washers_per_bolt: u32,
    /// The piece the bolts are fixed to in the shop, or `None` for loose field hardware.
    pub shop_piece: Option<String>,
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
    /// "field" for loose hardware, or "shop: PIECE" where it is fixed to a piece in the shop.
    pub place: String,
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

/// The words used where the model gives no finish for the hardware.
pub const FINISH_NOT_GIVEN: &str = "not given in the model";
/// The words used where no bolt length has been chosen.
pub const LENGTH_NOT_CHOSEN: &str = "not chosen";

/// The fastener positions of every connection of the model, from its details: lines across ×
/// bolts along at each member end that has a detail, one washer per bolt where the detail names
/// a washer. The bolt length is left open here; the stack-up fills it in.
pub fn connection_fasteners(model: &Model) -> Vec<ConnectionFasteners> {
    let mut out = Vec::new();
    for m in &model.members {
        for (end, detail) in [(End::Start, &m.start), (End::End, &m.end)] {
            let Some(id) = detail else { continue };
            let Some(d) = find_detail(model, id) else {
                continue;
            };
            out.push(ConnectionFasteners {
                connection: format!("{}/{}", m.id, end.as_str()),
                member: m.id.clone(),
                end,
                detail: d.id.clone(),
                positions: d.bolts.count(),
                bolt_length: None,
                washers_per_bolt: u32::from(d.bolts.washer.is_some()),
                shop_piece: None,
            });
        }
    }
    out
}

fn find_detail<'m>(model: &'m Model, id: &str) -> Option<&'m Detail> {
    model.details.iter().find(|d| d.id == id)
}

fn size_text(d: Length, units: UnitSystem) -> String {
    super::format::length(d, units, false)
}

/// The items of one bolt position of a detail: the bolt, its nut and its washers.
fn items(
    d: &Detail,
    bolt_length: Option<Length>,
    washers: u32,
    units: UnitSystem,
) -> Vec<(Item, u32)> {
    let b = &d.bolts;
    let size = size_text(b.thread.d, units);
    let mut out = vec![
        (
            Item {
                kind: ItemKind::Bolt,
                product: b.bolt_type.name.clone(),
                grade: b.grade.name.clone(),
                size: size.clone(),
                thread: b.thread.designation.clone(),
                length: bolt_length
                    .map(|l| super::format::length(l, units, false))
                    .unwrap_or_else(|| LENGTH_NOT_CHOSEN.into()),
                finish: FINISH_NOT_GIVEN.into(),
            },
            1,
        ),
        (
            Item {
                kind: ItemKind::Nut,
                product: b.nut.name.clone(),
                grade: b.nut_grade.name.clone(),
                size: size.clone(),
                thread: b.thread.designation.clone(),
                length: String::new(),
                finish: FINISH_NOT_GIVEN.into(),
            },
            1,
        ),
    ];
    if let (Some(w), true) = (&b.washer, washers > 0) {
        out.push((
            Item {
                kind: ItemKind::Washer,
                product: w.name.clone(),
                grade: String::new(),
                size,
                thread: String::new(),
                length: String::new(),
                finish: FINISH_NOT_GIVEN.into(),
            },
            washers,
        ));
    }
    out
}

/// What goes in each connection's bag, in the order of the connections.
pub fn kits(model: &Model, fasteners: &[ConnectionFasteners], units: UnitSystem) -> Vec<KitLine> {
    let mut out = Vec::new();
    for c in fasteners {
        let Some(d) = find_detail(model, &c.detail) else {
            continue;
        };
        let place = match &c.shop_piece {
            Some(p) => format!("shop: {p}"),
            None => "field".to_string(),
        };
        for (item, each) in items(d, c.bolt_length, c.washers_per_bolt, units) {
            out.push(KitLine {
                connection: c.connection.clone(),
                member: c.member.clone(),
                end: c.end.as_str().to_string(),
                detail: c.detail.clone(),
                place: place.clone(),
                item,
                quantity: each * c.positions,
            });
        }
    }
    out
}

/// The order of loose hardware: the field kits summed per item, with spares. Hardware fixed to a
/// piece in the shop is listed with that piece, not here.
pub fn order(kits: &[KitLine], rule: SparesRule) -> Vec<OrderLine> {
    let mut sums: BTreeMap<&Item, u32> = BTreeMap::new();
    for k in kits.iter().filter(|k| k.place == "field") {
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

/// The hardware fixed to pieces in the shop, summed per piece and item (no spares: the shop
/// fits it from its own stock with the piece).
pub fn shop_fitted(kits: &[KitLine]) -> Vec<(String, Item, u32)> {
    let mut sums: BTreeMap<(&str, &Item), u32> = BTreeMap::new();
    for k in kits.iter().filter(|k| k.place != "field") {
        let piece = k.place.trim_start_matches("shop: ");
        *sums.entry((piece, &k.item)).or_default() += k.quantity;
    }
    sums.into_iter()
        .map(|((p, i), q)| (p.to_string(), i.clone(), q))
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

    fn kit(connection: &str, place: &str, item: Item, quantity: u32) -> KitLine {
        KitLine {
            connection: connection.into(),
            member: connection.split('/').next().unwrap_or_default().into(),
            end: "start".into(),
            detail: "D".into(),
            place: place.into(),
            item,
            quantity,
        }
    }

    #[test]
    fn order_sums_field_kits_per_item_and_leaves_shop_hardware_out() {
        let kits = vec![
            kit("A/start", "field", item(ItemKind::Bolt, "2 in"), 2),
            kit("B/start", "field", item(ItemKind::Bolt, "2 in"), 4),
            kit("C/start", "field", item(ItemKind::Bolt, "2-1/2 in"), 2),
            kit("D/start", "shop: P1", item(ItemKind::Bolt, "2 in"), 3),
            kit("A/start", "field", item(ItemKind::Nut, ""), 2),
        ];
        let o = order(&kits, SparesRule::default());
        let got: Vec<(&str, u32, u32, u32)> = o
            .iter()
            .map(|l| (l.item.length.as_str(), l.quantity, l.spares, l.order))
            .collect();
        assert_eq!(
            got,
            vec![("2 in", 6, 1, 7), ("2-1/2 in", 2, 1, 3), ("", 2, 1, 3)]
        );
        let shop = shop_fitted(&kits);
        assert_eq!(shop.len(), 1);
        assert_eq!((shop[0].0.as_str(), shop[0].2), ("P1", 3));
    }
}
