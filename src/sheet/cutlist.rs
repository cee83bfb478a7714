//! The cut list: one row per piece mark, from the model's pieces grouped by mark.

use super::format::{length, trim_decimals};
use crate::model::pieces::{CutBasis, EndCut, Piece, PieceGroup, ShopPartKind};
use crate::units::{Mass, UnitSystem};
use serde::Serialize;
use std::collections::BTreeMap;

/// One piece mark of the cut list, every value written in the sheet's units.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct CutRow {
    pub mark: String,
    pub section: String,
    pub material: String,
    pub cut_length: String,
    /// How the cut length was found: "given", or "nodes 8 ft less 5-1/2 in and 5-1/2 in".
    pub cut_basis: String,
    pub start_cut: String,
    pub end_cut: String,
    pub quantity: usize,
    /// The tube alone, each.
    pub weight_each: String,
    /// The tube with its shop attachments and welds, each.
    pub weight_with_attachments: String,
    pub attachments: String,
    pub members: String,
    /// Parts at the piece's ends that belong to no piece of the model.
    pub not_included: String,
}

fn mass(m: Mass, units: UnitSystem) -> String {
    match units {
        UnitSystem::Us => format!("{} lb", trim_decimals(m.to_lb(), 1)),
        UnitSystem::Si => format!("{} kg", trim_decimals(m.to_kg(), 2)),
    }
}

fn end_cut(c: &EndCut, units: UnitSystem) -> String {
    match c {
        EndCut::Square => "square".into(),
        EndCut::SquareSlotted { length: l, width } => format!(
            "square, slot {} wide × {} long through both walls",
            length(*width, units, false),
            length(*l, units, false)
        ),
    }
}

/// The cut list rows, in the order the marks first appear in the model.
pub fn rows(groups: &[PieceGroup], units: UnitSystem) -> Vec<CutRow> {
    groups
        .iter()
        .map(|g| {
            let p = &g.piece;
            let basis = match p.cut_basis {
                CutBasis::Given => "given".to_string(),
                CutBasis::FromNodes {
                    node_length,
                    start_setback,
                    end_setback,
                } => format!(
                    "nodes {} less set-backs {} and {}",
                    length(node_length, units, true),
                    length(start_setback, units, false),
                    length(end_setback, units, false)
                ),
            };
            let attachments = p
                .attachments
                .iter()
                .map(|a| {
                    let what = match &a.kind {
                        ShopPartKind::Tab {
                            thickness, width, ..
                        } => format!(
                            "tab PL {} × {} × {}",
                            length(*thickness, units, false),
                            length(*width, units, false),
                            length(a.length, units, false)
                        ),
                        ShopPartKind::Sleeve { section } => {
                            format!(
                                "sleeve {} × {}",
                                section.name,
                                length(a.length, units, false)
                            )
                        }
                        ShopPartKind::Plug { section } => format!(
                            "tapped plug {} thick, {} outline",
                            length(a.length, units, false),
                            section.name
                        ),
                        ShopPartKind::Mate(f) => {
                            return format!(
                                "mate PL {} × {} (welded edge) × {} {} on the face at node {} for {} ({})",
                                length(f.thickness, units, false),
                                length(f.welded, units, false),
                                length(f.height, units, false),
                                a.material,
                                f.node,
                                f.carries,
                                a.detail
                            )
                        }
                    };
                    format!("{what} {} at {} ({})", a.material, a.end.as_str(), a.detail)
                })
                .collect::<Vec<_>>()
                .join("; ");
            CutRow {
                mark: g.mark.clone(),
                section: p.section.name.clone(),
                material: p.material.name.clone(),
                cut_length: length(p.cut_length, units, true),
                cut_basis: basis,
                start_cut: end_cut(&p.start_cut, units),
                end_cut: end_cut(&p.end_cut, units),
                quantity: g.quantity,
                weight_each: mass(p.weight.tube, units),
                weight_with_attachments: mass(p.weight.total, units),
                attachments,
                members: g.members.join(" "),
                not_included: p
                    .not_included
                    .iter()
                    .map(|l| format!("{} of {} at the {} end", l.what, l.detail, l.end.as_str()))
                    .collect::<Vec<_>>()
                    .join("; "),
            }
        })
        .collect()
}

/// One line per detail whose parts the model places in no piece (mating plates, mostly), with
/// how many member ends carry them, so nobody takes the cut list as complete.
pub fn left_out_notes(pieces: &[Piece]) -> Vec<String> {
    let mut by: BTreeMap<(&str, &str), Vec<String>> = BTreeMap::new();
    for p in pieces {
        for l in &p.not_included {
            by.entry((l.detail.as_str(), l.what.as_str()))
                .or_default()
                .push(format!("{}/{}", p.member, l.end.as_str()));
        }
    }
    by.into_iter()
        .map(|((detail, what), ends)| {
            format!(
                "Not in the cut list: {what} of detail {detail} at each of {} member ends ({}); \
                 the model does not say which piece carries it.",
                ends.len(),
                ends.join(", ")
            )
        })
        .collect()
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn masses_in_each_system() {
        assert_eq!(
            mass(Mass::kg(0.45359237 * 12.26), UnitSystem::Us),
            "12.3 lb"
        );
        assert_eq!(mass(Mass::kg(5.5), UnitSystem::Si), "5.5 kg");
    }
}
