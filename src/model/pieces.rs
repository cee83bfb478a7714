//! Fabricated pieces: one per member, the tube as cut plus what the shop welds to it (tabs in
//! slotted ends, sleeves), with its cut length, end cuts and weight. The cut list of the sheet and
//! the rule audit both read exactly this.
//!
//! Geometry of a piece, in its own frame: x runs along the tube from its start cut end (x = 0) to
//! its end cut end (x = cut length); y is the section's depth direction (`h` of a rectangular
//! tube); z the width. A tab lies in the x-y plane (its width along y, its thickness along z),
//! centred on the axis; a sleeve is centred on the axis.
//!
//! Cut length: the member's `cut_length` when given; otherwise the node-to-node length less the
//! set-back at each end (the member's `start_setback` / `end_setback`, else the detail's
//! `setback`). An end whose set-back is not stated anywhere is an error, never taken as zero.

use super::{Coating, DetailKind, End, Member, Model, TabWeld, VentHole};
use crate::audit::piece_box::{Attachment, Piece as BoxPiece};
use crate::audit::weight::{fillet_weld_mass, FilletWeld, PieceWeight};
use crate::audit::{MemberSolid, Point3, Roll, Section as SolidSection};
use crate::catalogue::{Material, Section, Shape};
use crate::diag::Diagnostic;
use crate::units::{Angle, Length, Mass};
use std::collections::BTreeMap;

/// Two cut lengths closer than this (0.5 mm) are the same piece for grouping by mark.
pub const SAME_LENGTH: Length = Length::from_si(0.5);

/// One fabricated piece: a member's tube as cut and its shop attachments.
#[derive(Debug, Clone, PartialEq)]
pub struct Piece {
    /// The piece mark (the member's `mark`, or its id).
    pub mark: String,
    /// The member this piece is made for.
    pub member: String,
    /// The tube section, from the catalogue.
    pub section: Section,
    /// The tube material, from the catalogue.
    pub material: Material,
    /// Length of the tube as cut, end to end.
    pub cut_length: Length,
    /// How the cut length was found.
    pub cut_basis: CutBasis,
    /// The cut at the start (the member's `from` end).
    pub start_cut: EndCut,
    /// The cut at the end (the member's `to` end).
    pub end_cut: EndCut,
    /// Parts welded to the tube in the shop, start end first.
    pub attachments: Vec<ShopPart>,
    /// Shop welds of the attachments.
    pub welds: Vec<ShopWeld>,
    /// Turn of the section about the member axis, when the model gives it.
    pub roll: Option<Angle>,
    /// Surface finish, when the model gives it.
    pub coating: Option<Coating>,
    /// Vent and drain holes drilled in the tube.
    pub vent_holes: Vec<VentHole>,
    /// Parts at this member's ends that belong to no piece of the model (mating plates whose
    /// place is not stated: no `on_chord`), listed so nobody takes the piece as complete.
    pub not_included: Vec<LeftOut>,
    /// The piece's weight by source.
    pub weight: PieceWeight,
}

/// A part at a member end that the model places in no piece.
#[derive(Debug, Clone, PartialEq)]
pub struct LeftOut {
    pub detail: String,
    pub end: End,
    /// What it is, e.g. "1 mating plate".
    pub what: String,
}

/// Where a cut length comes from.
#[derive(Debug, Clone, Copy, PartialEq)]
pub enum CutBasis {
    /// Given by the member's `cut_length`.
    Given,
    /// Node-to-node length less the two set-backs.
    FromNodes {
        node_length: Length,
        start_setback: Length,
        end_setback: Length,
    },
}

/// The cut at one end of the tube. Ends are cut square to the axis (the model has no other cut).
#[derive(Debug, Clone, Copy, PartialEq)]
pub enum EndCut {
    /// Cut square.
    Square,
    /// Cut square, with a slot through both walls for a tab: `length` along the axis from the end,
    /// `width` the tab thickness plus the fit-up gap.
    SquareSlotted { length: Length, width: Length },
}

/// A part welded to the tube in the shop.
#[derive(Debug, Clone, PartialEq)]
pub struct ShopPart {
    /// The detail it comes from.
    pub detail: String,
    /// The tube end it is at.
    pub end: End,
    pub kind: ShopPartKind,
    /// Its whole length along the member axis.
    pub length: Length,
    /// How far it reaches past the tube's cut end.
    pub projection: Length,
    /// Its material name.
    pub material: String,
    /// Its mass: plate volume × density, or section weight per length × length.
    pub mass: Mass,
}

/// What a shop part is.
#[derive(Debug, Clone, PartialEq)]
pub enum ShopPartKind {
    /// A flat plate tab in the slotted tube end, or lapped on one face of it.
    Tab {
        thickness: Length,
        width: Length,
        /// The box the tab lies in across its thickness, centred on the member axis: the
        /// thickness for a tab in a slot; for a tab lapped on a face, the tube's depth plus
        /// twice the thickness (either face: only ever larger than the tab's true place).
        envelope: Length,
    },
    /// A tube slid into the tube end (the catalogue section).
    Sleeve { section: Box<Section> },
    /// The tapped plug welded on the tube end, the tube's outline in plan.
    Plug { section: Box<Section> },
    /// A tab's mate plate welded to the face of this tube (the detail's `on_chord`), taken as a
    /// box: `length` (of the [`ShopPart`]) along the tube, `height` off the face, `across` square
    /// to both. `end` of the part is the tube end nearer the plate.
    Mate(Box<MateOnFace>),
}

/// Where and how large a mate plate on a tube face is.
#[derive(Debug, Clone, PartialEq)]
pub struct MateOnFace {
    /// The thickness of one plate (two plates with the tab between them when the detail has
    /// `count = 2`: `across` then spans both and the tab, and the mass counts both).
    pub thickness: Length,
    /// Its size square to the tube axis and to `outward`: the thickness of a longitudinal plate,
    /// the width of a transverse one.
    pub across: Length,
    /// Its welded length along the face (`lb`, or its width across a transverse plate's face).
    pub welded: Length,
    /// How far it stands off the face, along the member it takes (end distance, pitches and back
    /// distance of the bolts); the whole of it is taken square to the face (conservative).
    pub height: Length,
    /// From the tube axis to the face it is welded to, along `outward`.
    pub face: Length,
    /// The centre of the plate along the tube, from the tube's start cut end.
    pub at: Length,
    /// The direction from the tube axis to the plate, in model axes.
    pub outward: [f64; 3],
    /// `outward` on the tube section's depth (y) and width (z) directions.
    pub in_section: [f64; 2],
    /// The plate's plane: along the tube or across it.
    pub plate: super::ChordPlate,
    /// The node it is at and the member end it takes ("MEMBER/end").
    pub node: String,
    pub carries: String,
}

/// A shop weld: `lines` welds of length `length` each; `leg` is a fillet's leg, or for a
/// flare-bevel groove filled flush the corner radius R that bounds it.
#[derive(Debug, Clone, PartialEq)]
pub struct ShopWeld {
    pub detail: String,
    pub end: End,
    pub leg: Length,
    pub length: Length,
    pub lines: u32,
    /// Electrode classification name.
    pub electrode: String,
    /// Weld metal mass of all the lines.
    pub mass: Mass,
}

/// Pieces of the same mark, made alike.
#[derive(Debug, Clone, PartialEq)]
pub struct PieceGroup {
    pub mark: String,
    pub quantity: usize,
    /// The members made from this mark, in model order.
    pub members: Vec<String>,
    /// The first piece of the mark (all are alike).
    pub piece: Piece,
}

fn diag(model: &Model, line: usize, key: String, message: String, hint: &str) -> Diagnostic {
    let mut d = Diagnostic::file(&model.file, key, message).hint(hint);
    d.line = line;
    d.column = 1;
    d
}

/// The set-back at one end of a member: the member's own, else its detail's.
fn setback(model: &Model, m: &Member, end: End) -> Result<Length, Diagnostic> {
    let (own, detail, key) = match end {
        End::Start => (m.start_setback, &m.start, "start_setback"),
        End::End => (m.end_setback, &m.end, "end_setback"),
    };
    if let Some(s) = own {
        return Ok(s);
    }
    let found = detail
        .as_ref()
        .and_then(|id| model.details.iter().find(|d| &d.id == id));
    match found.and_then(|d| d.setback) {
        Some(s) => Ok(s),
        None => Err(diag(
            model,
            m.line,
            format!("members.{}.{key}", m.id),
            format!(
                "the cut length of member '{}' is not known: no set-back at its {} end",
                m.id,
                end.as_str()
            ),
            match found {
                Some(d) => format!(
                    "add `setback = \"0 in\"` to [details.{}] (node to tube end), `{key}` to the member, or `cut_length`",
                    d.id
                ),
                None => format!("add `{key} = \"0 in\"` (node to tube end) or `cut_length` to the member"),
            }
            .as_str(),
        )),
    }
}

/// The cut length of a member's tube and how it was found.
pub fn cut_length(model: &Model, m: &Member) -> Result<(Length, CutBasis), Vec<Diagnostic>> {
    if let Some(c) = m.cut_length {
        return Ok((c, CutBasis::Given));
    }
    let (a, b) = (setback(model, m, End::Start), setback(model, m, End::End));
    let (a, b) = match (a, b) {
        (Ok(a), Ok(b)) => (a, b),
        (a, b) => return Err([a.err(), b.err()].into_iter().flatten().collect()),
    };
    let cut = m.length - a - b;
    if cut.to_mm() <= 0.0 {
        return Err(vec![diag(
            model,
            m.line,
            format!("members.{}", m.id),
            format!(
                "the set-backs ({:.1} + {:.1} mm) leave no tube of member '{}' ({:.1} mm node to node)",
                a.to_mm(),
                b.to_mm(),
                m.id,
                m.length.to_mm()
            ),
            "check the set-backs and the node coordinates",
        )]);
    }
    Ok((
        cut,
        CutBasis::FromNodes {
            node_length: m.length,
            start_setback: a,
            end_setback: b,
        },
    ))
}

/// What one end of a member adds to its piece.
#[derive(Default)]
struct EndParts {
    cut: Option<EndCut>,
    parts: Vec<ShopPart>,
    welds: Vec<ShopWeld>,
    not_included: Vec<LeftOut>,
}

fn end_parts(model: &Model, m: &Member, end: End) -> Result<EndParts, Diagnostic> {
    let id = match end {
        End::Start => &m.start,
        End::End => &m.end,
    };
    let Some(id) = id else {
        return Ok(EndParts {
            cut: Some(EndCut::Square),
            ..EndParts::default()
        });
    };
    let d = model
        .details
        .iter()
        .find(|d| &d.id == id)
        .expect("member ends are checked against the details when the model is read");
    let mut out = EndParts::default();
    match &d.kind {
        DetailKind::Tab(t) => {
            let b = &d.bolts;
            let pitches = match (b.along, b.pitch) {
                (1, _) => Length::mm(0.0),
                (n, Some(p)) => p * f64::from(n - 1),
                (n, None) => {
                    return Err(diag(
                        model,
                        d.line,
                        format!("details.{}.bolts.pitch", d.id),
                        format!("{n} bolts in line need their spacing to place the tab"),
                        "add `pitch = \"1-1/2 in\"`",
                    ))
                }
            };
            let projection = t.tab.clear_length + pitches + t.tab.end_distance;
            let lap = t.weld.length();
            let length = lap + projection;
            let volume = t.tab.thickness * t.tab.width * length;
            out.parts.push(ShopPart {
                detail: d.id.clone(),
                end,
                kind: ShopPartKind::Tab {
                    thickness: t.tab.thickness,
                    width: t.tab.width,
                    envelope: match &t.weld {
                        TabWeld::Slot(_) => t.tab.thickness,
                        TabWeld::FlareBevel(_) => {
                            let depth = match m.section.shape {
                                Shape::Rect { b, h } => b.max(h),
                                Shape::Round { d } => d,
                            };
                            depth + t.tab.thickness * 2.0
                        }
                    },
                },
                length,
                projection,
                material: t.tab.material.name.clone(),
                mass: t.tab.material.density * volume,
            });
            match &t.weld {
                TabWeld::Slot(w) => {
                    out.cut = Some(EndCut::SquareSlotted {
                        length: w.length,
                        width: t.tab.thickness + w.slot_gap,
                    });
                    let weld = FilletWeld {
                        leg: w.size,
                        length: w.length,
                        // Weld metal taken at the density of the tab's steel (common practice).
                        density: t.tab.material.density,
                    };
                    out.welds.push(ShopWeld {
                        detail: d.id.clone(),
                        end,
                        leg: w.size,
                        length: w.length,
                        lines: 4,
                        electrode: w.electrode.name.clone(),
                        mass: fillet_weld_mass(&weld) * 4.0,
                    });
                }
                TabWeld::FlareBevel(w) => {
                    // The tab lies on the face: the tube end is cut square.
                    out.cut = Some(EndCut::Square);
                    // A groove filled flush between the tab and a corner of radius R holds the
                    // corner's spandrel, R² (1 − π/4) in section (geometry).
                    let radius = m.section.r_outer.unwrap_or(Length::mm(0.0));
                    let section = radius * radius * (1.0 - std::f64::consts::FRAC_PI_4);
                    out.welds.push(ShopWeld {
                        detail: d.id.clone(),
                        end,
                        leg: radius,
                        length: w.length,
                        lines: 2,
                        electrode: w.electrode.name.clone(),
                        mass: t.tab.material.density * (section * w.length) * 2.0,
                    });
                }
            }
            if t.on_chord.is_none() {
                out.not_included.push(LeftOut {
                    detail: d.id.clone(),
                    end,
                    what: format!(
                        "{} mating plate{}",
                        t.mate.count,
                        if t.mate.count == 1 { "" } else { "s" }
                    ),
                });
            }
        }
        DetailKind::Sleeve(s) => {
            out.cut = Some(EndCut::Square);
            let key = format!("details.{}.sleeve", d.id);
            let Some(welded_into) = s.welded_into else {
                return Err(diag(
                    model,
                    d.line,
                    format!("{key}.welded_into"),
                    format!("detail '{}' does not say which member the sleeve is welded into in the shop", d.id),
                    "add `welded_into = \"start\"` (the member whose start has this detail) or \"end\"",
                ));
            };
            if welded_into == end {
                let Some(length) = s.length else {
                    return Err(diag(
                        model,
                        d.line,
                        format!("{key}.length"),
                        format!("detail '{}' does not give the sleeve's whole length", d.id),
                        "add `length = \"8 in\"` (both insertions plus any gap)",
                    ));
                };
                out.parts.push(ShopPart {
                    detail: d.id.clone(),
                    end,
                    kind: ShopPartKind::Sleeve {
                        section: Box::new(s.section.clone()),
                    },
                    length,
                    projection: length - s.insertion,
                    material: s.material.name.clone(),
                    mass: s.section.props.mass_per_length * length,
                });
            }
        }
        DetailKind::Tapped(t) => {
            out.cut = Some(EndCut::Square);
            let outline = match m.section.shape {
                Shape::Rect { b, h } => b * h,
                Shape::Round { d } => d * d * (std::f64::consts::PI / 4.0),
            };
            out.parts.push(ShopPart {
                detail: d.id.clone(),
                end,
                kind: ShopPartKind::Plug {
                    section: Box::new(m.section.clone()),
                },
                length: t.plug.thickness,
                projection: t.plug.thickness,
                material: t.plug.material.name.clone(),
                mass: t.plug.material.density * (outline * t.plug.thickness),
            });
            let length = m.section.outside_perimeter();
            let weld = FilletWeld {
                leg: t.weld.size,
                length,
                // Weld metal taken at the density of the plug's steel (common practice).
                density: t.plug.material.density,
            };
            out.welds.push(ShopWeld {
                detail: d.id.clone(),
                end,
                leg: t.weld.size,
                length,
                lines: 1,
                electrode: t.weld.electrode.name.clone(),
                mass: fillet_weld_mass(&weld),
            });
            out.not_included.push(LeftOut {
                detail: d.id.clone(),
                end,
                what: "the plate under the screw head".into(),
            });
        }
    }
    Ok(out)
}

/// The mates of other members' tab details welded to this member's faces (`on_chord`), in model
/// order of the members that take them.
fn face_mates(model: &Model, chord: &Member) -> Result<EndParts, Diagnostic> {
    let mut out = EndParts::default();
    for o in &model.members {
        for (end, id) in [(End::Start, &o.start), (End::End, &o.end)] {
            let Some(d) = id
                .as_ref()
                .and_then(|id| model.details.iter().find(|d| &d.id == id))
            else {
                continue;
            };
            let DetailKind::Tab(t) = &d.kind else {
                continue;
            };
            let Some(oc) = t
                .on_chord
                .as_ref()
                .filter(|oc| oc.chords.iter().any(|c| c.id == chord.id))
            else {
                continue;
            };
            let key = format!("members.{}.{}", o.id, end.as_str());
            let p = super::chord::placement(&model.nodes, &model.members, o, end, oc)
                .map_err(|e| diag(model, o.line, key.clone(), e.message, &e.hint))?;
            if p.chord != chord.id {
                continue;
            }
            let start = match chord.cut_length {
                None => setback(model, chord, End::Start)?,
                Some(_) => chord.start_setback.ok_or_else(|| {
                    diag(
                        model,
                        chord.line,
                        format!("members.{}.start_setback", chord.id),
                        format!(
                            "the mate of {} cannot be placed on member '{}': its cut length is given but not where its tube starts",
                            key, chord.id
                        ),
                        "add `start_setback` (from the `from` node to the tube's start cut end)",
                    )
                })?,
            };
            let b = &d.bolts;
            let pitches = b.pitch.unwrap_or(Length::mm(0.0)) * f64::from(b.along - 1);
            let height = t.mate.end_distance + pitches + t.mate.back_distance;
            let face = match chord.section.shape {
                Shape::Round { d } => d * 0.5,
                Shape::Rect { b, h } => {
                    h * (0.5 * p.in_section[0].abs()) + b * (0.5 * p.in_section[1].abs())
                }
            };
            let welded = oc.welded_length(&t.mate);
            // Two mating plates stand either side of the tab: one box across both and the tab.
            let plates = f64::from(t.mate.count);
            let thick = if t.mate.count == 2 {
                t.mate.thickness * 2.0 + t.tab.thickness
            } else {
                t.mate.thickness
            };
            let (length, across, at) = match oc.plate {
                super::ChordPlate::Longitudinal => {
                    // The plate leans with the member: along the tube it reaches lb plus its
                    // height times cos θ, centred where the member's axis is at mid-height.
                    let theta = p.theta.to_rad();
                    let lean = Length::mm(
                        (face + height * 0.5).to_mm() / theta.tan()
                            * direction_along(model, o, end, chord),
                    );
                    (
                        welded + height * theta.cos().abs(),
                        thick,
                        p.along - start + lean,
                    )
                }
                super::ChordPlate::Transverse => (thick, t.mate.width, p.along - start),
            };
            let volume = t.mate.thickness * welded * height * plates;
            let cut = match chord.cut_length {
                Some(c) => c,
                None => chord.length - start - setback(model, chord, End::End)?,
            };
            out.parts.push(ShopPart {
                detail: d.id.clone(),
                end: if at.to_mm() <= cut.to_mm() * 0.5 {
                    End::Start
                } else {
                    End::End
                },
                kind: ShopPartKind::Mate(Box::new(MateOnFace {
                    thickness: t.mate.thickness,
                    across,
                    welded,
                    height,
                    face,
                    at,
                    outward: p.outward,
                    in_section: p.in_section,
                    plate: oc.plate,
                    node: p.node.clone(),
                    carries: format!("{}/{}", o.id, end.as_str()),
                })),
                length,
                projection: Length::mm(0.0),
                material: t.mate.material.name.clone(),
                mass: t.mate.material.density * volume,
            });
            let weld = FilletWeld {
                leg: oc.weld.size,
                length: welded,
                // Weld metal taken at the density of the plate's steel (common practice).
                density: t.mate.material.density,
            };
            out.welds.push(ShopWeld {
                detail: d.id.clone(),
                end,
                leg: oc.weld.size,
                length: welded,
                lines: oc.weld.sides * t.mate.count,
                electrode: oc.weld.electrode.name.clone(),
                mass: fillet_weld_mass(&weld) * f64::from(oc.weld.sides * t.mate.count),
            });
        }
    }
    Ok(out)
}

/// +1 where the member runs from its end at the chord towards the chord's `to` node, −1 where
/// it runs towards the `from` node.
fn direction_along(model: &Model, o: &Member, end: End, chord: &Member) -> f64 {
    let at = |id: &str| {
        model
            .nodes
            .iter()
            .find(|n| n.id == id)
            .map(|n| n.at.map(|c| c.to_mm()))
            .unwrap_or([0.0; 3])
    };
    let (here, far) = match end {
        End::Start => (at(&o.from), at(&o.to)),
        End::End => (at(&o.to), at(&o.from)),
    };
    let (a, b) = (at(&chord.from), at(&chord.to));
    let dot: f64 = (0..3).map(|i| (far[i] - here[i]) * (b[i] - a[i])).sum();
    if dot >= 0.0 {
        1.0
    } else {
        -1.0
    }
}

/// The piece made for one member.
pub fn piece(model: &Model, m: &Member) -> Result<Piece, Vec<Diagnostic>> {
    let mut errs = Vec::new();
    let cut = cut_length(model, m)
        .map_err(|mut e| errs.append(&mut e))
        .ok();
    let start = end_parts(model, m, End::Start)
        .map_err(|e| errs.push(e))
        .ok();
    let end = end_parts(model, m, End::End).map_err(|e| errs.push(e)).ok();
    // the mates on the tube's face are placed from its set-backs: a cut length that failed has
    // already said why, so they are not placed (the same error would be reported twice)
    let on_face = match cut {
        Some(_) => face_mates(model, m).map_err(|e| errs.push(e)).ok(),
        None => None,
    };
    let (Some((cut_length, cut_basis)), Some(start), Some(end), Some(on_face)) =
        (cut, start, end, on_face)
    else {
        return Err(errs);
    };
    let mut attachments = start.parts;
    attachments.extend(end.parts);
    attachments.extend(on_face.parts);
    let mut welds = start.welds;
    welds.extend(end.welds);
    welds.extend(on_face.welds);
    let mut not_included = start.not_included;
    not_included.extend(end.not_included);
    let tube = m.section.props.mass_per_length * cut_length;
    // Folded from +0 (a float sum of nothing is −0, which would print as "-0.00").
    let parts = attachments.iter().fold(Mass::kg(0.0), |s, a| s + a.mass);
    let weld_mass = welds.iter().fold(Mass::kg(0.0), |s, w| s + w.mass);
    Ok(Piece {
        mark: m.mark.clone(),
        member: m.id.clone(),
        section: m.section.clone(),
        material: m.material.clone(),
        cut_length,
        cut_basis,
        start_cut: start.cut.unwrap_or(EndCut::Square),
        end_cut: end.cut.unwrap_or(EndCut::Square),
        attachments,
        welds,
        roll: m.roll,
        coating: m.coating,
        vent_holes: m.vent_holes.clone(),
        not_included,
        weight: PieceWeight {
            tube,
            attachments: parts,
            welds: weld_mass,
            hardware: Mass::kg(0.0),
            total: tube + parts + weld_mass,
        },
    })
}

/// A sleeve welded into the member whose start (or end) has the detail is one part per pair of
/// member ends: as many ends of the other side must use the detail, or some sleeve would be
/// counted twice or not at all.
fn check_sleeve_pairs(model: &Model, errs: &mut Vec<Diagnostic>) {
    for d in &model.details {
        let DetailKind::Sleeve(s) = &d.kind else {
            continue;
        };
        if s.welded_into.is_none() {
            continue;
        }
        let starts = model
            .members
            .iter()
            .filter(|m| m.start.as_ref() == Some(&d.id))
            .count();
        let ends = model
            .members
            .iter()
            .filter(|m| m.end.as_ref() == Some(&d.id))
            .count();
        if starts != ends {
            errs.push(diag(
                model,
                d.line,
                format!("details.{}.sleeve.welded_into", d.id),
                format!(
                    "sleeve detail '{}' is used at {starts} member start(s) and {ends} member end(s): each sleeve joins one start to one end, so the sleeves cannot be placed",
                    d.id
                ),
                "use the detail at the end of one member and the start of the next, or give a second detail",
            ));
        }
    }
}

/// Every piece of the model, one per member in model order; every problem of every member.
pub fn pieces(model: &Model) -> Result<Vec<Piece>, Vec<Diagnostic>> {
    let mut out = Vec::new();
    let mut errs = Vec::new();
    check_sleeve_pairs(model, &mut errs);
    for m in &model.members {
        match piece(model, m) {
            Ok(p) => out.push(p),
            Err(mut e) => errs.append(&mut e),
        }
    }
    if errs.is_empty() {
        Ok(out)
    } else {
        Err(errs)
    }
}

/// The section's outline as the audit geometry takes it.
pub fn solid_section(s: &Section) -> SolidSection {
    match s.shape {
        Shape::Rect { b, h } => SolidSection::Rect { depth: h, width: b },
        Shape::Round { d } => SolidSection::Round { diameter: d },
    }
}

impl Piece {
    /// The piece as the box-fit and weight rules see it: the tube from x = 0 to the cut length in
    /// its own frame (module doc), each shop part as a box around it. A round sleeve is taken as
    /// the square box around it, which can only enlarge the piece (conservative).
    pub fn box_piece(&self) -> BoxPiece {
        let len = self.cut_length;
        let attachments = self
            .attachments
            .iter()
            .map(|a| {
                if let ShopPartKind::Mate(f) = &a.kind {
                    return mate_box(a, f);
                }
                // Centre along the axis: the part runs from −projection to length − projection at
                // the start end, and mirrored at the end end.
                let inside = a.length - a.projection;
                let x = match a.end {
                    End::Start => (inside - a.projection) * 0.5,
                    End::End => len - (inside - a.projection) * 0.5,
                };
                let size = match &a.kind {
                    ShopPartKind::Tab {
                        width, envelope, ..
                    } => [a.length, *width, *envelope],
                    ShopPartKind::Sleeve { section } | ShopPartKind::Plug { section } => {
                        match section.shape {
                            Shape::Rect { b, h } => [a.length, h, b],
                            Shape::Round { d } => [a.length, d, d],
                        }
                    }
                    ShopPartKind::Mate(_) => unreachable!("placed above"),
                };
                Attachment {
                    name: format!("{} {} at {}", a.kind_name(), a.detail, a.end.as_str()),
                    center: [x, Length::mm(0.0), Length::mm(0.0)],
                    size,
                    roll: Angle::deg(0.0),
                }
            })
            .collect();
        BoxPiece {
            mark: self.mark.clone(),
            member: MemberSolid {
                a: Point3::mm(0.0, 0.0, 0.0),
                b: Point3::new(len, Length::mm(0.0), Length::mm(0.0)),
                section: solid_section(&self.section),
                roll: Roll::Angle(Angle::deg(0.0)),
            },
            attachments,
        }
    }

    /// The first difference that makes two pieces of one mark not alike, if any.
    pub fn differs_from(&self, o: &Piece) -> Option<String> {
        if self.section.name != o.section.name {
            return Some(format!(
                "section {} vs {}",
                self.section.name, o.section.name
            ));
        }
        if self.material.name != o.material.name {
            return Some(format!(
                "material {} vs {}",
                self.material.name, o.material.name
            ));
        }
        if (self.cut_length - o.cut_length).abs().to_mm() > SAME_LENGTH.to_mm() {
            return Some(format!(
                "cut length {:.1} mm vs {:.1} mm",
                self.cut_length.to_mm(),
                o.cut_length.to_mm()
            ));
        }
        if self.start_cut != o.start_cut || self.end_cut != o.end_cut {
            return Some("end cuts differ".into());
        }
        // A tab, sleeve or plug by its detail and end; a mate on the face (whose detail names one
        // chord, so differs from piece to piece) by its plate, size and place in the tube's frame.
        let parts = |p: &Piece| {
            p.attachments
                .iter()
                .map(|a| match &a.kind {
                    ShopPartKind::Mate(f) => format!(
                        "mate {} {:.1} {:.1} {:.1} {:.1} at {:.0} towards {:.2} {:.2}",
                        a.material,
                        f.thickness.to_mm(),
                        f.across.to_mm(),
                        f.height.to_mm(),
                        a.length.to_mm(),
                        f.at.to_mm() / SAME_LENGTH.to_mm(),
                        direction(f.in_section[0]),
                        direction(f.in_section[1])
                    ),
                    _ => format!("{} {}", a.detail, a.end.as_str()),
                })
                .collect::<Vec<_>>()
        };
        if parts(self) != parts(o) {
            return Some("shop attachments differ".into());
        }
        if self.coating != o.coating || self.vent_holes != o.vent_holes {
            return Some("coating or vent holes differ".into());
        }
        None
    }
}

/// A mate on the tube face as a box in the piece's frame: turned about the axis so that its
/// height runs along `outward`, its inner side on the face.
fn mate_box(a: &ShopPart, f: &MateOnFace) -> Attachment {
    let off = f.face + f.height * 0.5;
    let [ny, nz] = f.in_section;
    Attachment {
        name: format!("mate {} for {} at {}", a.detail, f.carries, f.node),
        center: [f.at, off * ny, off * nz],
        size: [a.length, f.height, f.across],
        roll: Angle::rad(nz.atan2(ny)),
    }
}

impl ShopPart {
    /// "tab", "sleeve", "plug" or "mate".
    pub fn kind_name(&self) -> &'static str {
        match self.kind {
            ShopPartKind::Tab { .. } => "tab",
            ShopPartKind::Sleeve { .. } => "sleeve",
            ShopPartKind::Plug { .. } => "plug",
            ShopPartKind::Mate(_) => "mate",
        }
    }
}

/// A direction component rounded to the hundredth, with no negative zero (which would print as
/// "-0.00" and tell two alike pieces apart).
fn direction(v: f64) -> f64 {
    (v * 100.0).round() / 100.0 + 0.0
}

/// Group pieces by mark with their quantity, in order of first appearance. Two pieces of one mark
/// that are not alike are an error (a mark names one make of piece).
pub fn group_by_mark(model: &Model, pieces: &[Piece]) -> Result<Vec<PieceGroup>, Vec<Diagnostic>> {
    let mut order: Vec<String> = Vec::new();
    let mut groups: BTreeMap<String, PieceGroup> = BTreeMap::new();
    let mut errs = Vec::new();
    for p in pieces {
        match groups.get_mut(&p.mark) {
            Some(g) => match g.piece.differs_from(p) {
                None => {
                    g.quantity += 1;
                    g.members.push(p.member.clone());
                }
                Some(why) => {
                    let line = model
                        .members
                        .iter()
                        .find(|m| m.id == p.member)
                        .map(|m| m.line)
                        .unwrap_or(0);
                    errs.push(diag(
                        model,
                        line,
                        format!("members.{}.mark", p.member),
                        format!(
                            "members '{}' and '{}' share mark '{}' but are not alike: {why}",
                            g.members[0], p.member, p.mark
                        ),
                        "give one of them its own `mark`",
                    ));
                }
            },
            None => {
                order.push(p.mark.clone());
                groups.insert(
                    p.mark.clone(),
                    PieceGroup {
                        mark: p.mark.clone(),
                        quantity: 1,
                        members: vec![p.member.clone()],
                        piece: p.clone(),
                    },
                );
            }
        }
    }
    if !errs.is_empty() {
        return Err(errs);
    }
    Ok(order
        .into_iter()
        .filter_map(|m| groups.remove(&m))
        .collect())
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::model::{load, LoadOptions};
    use std::path::PathBuf;

    const DEMO: &str = include_str!("../../examples/quillon-brook-footbridge/model.toml");
    const FORCES: &str = include_str!("../../examples/quillon-brook-footbridge/forces.csv");

    /// The demo model with text replaced, written to its own temporary folder and read.
    fn demo_with(name: &str, edits: &[(&str, &str)]) -> Result<Model, Vec<Diagnostic>> {
        let dir: PathBuf =
            std::env::temp_dir().join(format!("jointbook-pieces-{name}-{}", std::process::id()));
        std::fs::create_dir_all(&dir).unwrap();
        let mut text = DEMO.to_string();
        for (from, to) in edits {
            assert!(text.contains(from), "edit target missing: {from}");
            text = text.replacen(from, to, 1);
        }
        std::fs::write(dir.join("model.toml"), text).unwrap();
        std::fs::write(dir.join("forces.csv"), FORCES).unwrap();
        let m = load(&dir.join("model.toml"), &LoadOptions::default());
        let _ = std::fs::remove_dir_all(&dir);
        m
    }

    const GANTRY: &str = include_str!("../../examples/nettlebank-notice-gantry/model.toml");
    const GANTRY_FORCES: &str = include_str!("../../examples/nettlebank-notice-gantry/forces.csv");

    /// The gantry example with text replaced, read from its own temporary folder.
    fn gantry_with(name: &str, edits: &[(&str, &str)]) -> Model {
        let dir: PathBuf =
            std::env::temp_dir().join(format!("jointbook-gantry-{name}-{}", std::process::id()));
        std::fs::create_dir_all(&dir).unwrap();
        let mut text = GANTRY.to_string();
        for (from, to) in edits {
            assert!(text.contains(from), "edit target missing: {from}");
            text = text.replacen(from, to, 1);
        }
        std::fs::write(dir.join("model.toml"), text).unwrap();
        std::fs::write(dir.join("forces.csv"), GANTRY_FORCES).unwrap();
        let m = load(&dir.join("model.toml"), &LoadOptions::default()).unwrap();
        let _ = std::fs::remove_dir_all(&dir);
        m
    }

    #[test]
    fn posts_are_alike_only_with_their_gussets_alike() {
        // P0's gusset looks at +x, P1's at −x: in each tube's own frame the plates are on
        // opposite faces, so one mark for both is refused (conservative: a post turned round
        // would do, but the model does not say the shop may turn it).
        let marks = [
            ("[members.P0]\n", "[members.P0]\nmark = \"POST\"\n"),
            ("[members.P1]\n", "[members.P1]\nmark = \"POST\"\n"),
        ];
        let model = gantry_with("marks", &marks);
        let e = group_by_mark(&model, &pieces(&model).unwrap()).unwrap_err();
        assert!(e[0].message.contains("shop attachments differ"), "{}", e[0]);
        // P1 turned half a turn about its axis (`roll`): its gusset is then on the same face of
        // its own frame, at the same height, and the two posts are one mark.
        let turned = [
            marks[0],
            (
                "[members.P1]\n",
                "[members.P1]\nmark = \"POST\"\nroll = \"180 deg\"\n",
            ),
        ];
        let model = gantry_with("turned", &turned);
        let g = group_by_mark(&model, &pieces(&model).unwrap()).unwrap();
        let post = g.iter().find(|g| g.mark == "POST").unwrap();
        assert_eq!(post.members, ["P0", "P1"]);
    }

    #[test]
    fn a_mate_on_a_chord_is_a_shop_part_of_the_chord() {
        let model = gantry_with("mate", &[]);
        let ps = pieces(&model).unwrap();
        let beam = find(&ps, "BEAM");
        let mates: Vec<&ShopPart> = beam
            .attachments
            .iter()
            .filter(|a| a.kind_name() == "mate")
            .collect();
        assert_eq!(mates.len(), 3);
        // The hanger's transverse plate at M, 5 ft along the beam: centred there, 1/4 in. along
        // the beam, 3 in. across, 1 + 1-1/2 = 2-1/2 in. high off the 1-1/2 in. face.
        let ShopPartKind::Mate(f) = &mates[2].kind else {
            panic!("a mate")
        };
        assert!((f.at.to_in() - 60.0).abs() < 1e-9);
        assert!((mates[2].length.to_in() - 0.25).abs() < 1e-9);
        assert!((f.across.to_in() - 3.0).abs() < 1e-9);
        assert!((f.height.to_in() - 2.5).abs() < 1e-9);
        assert!((f.face.to_in() - 1.5).abs() < 1e-9);
        assert_eq!(f.carries, "H/start");
        // The beam's box: the hanger plate hangs 1.5 + 2.5 = 4 in. below the axis and the knee
        // gussets stand the same way (down, towards the braces) 1.5 + 3 in.: with the top half
        // of the tube, 1.5 + 4.5 = 6 in.; across, the tube's 3 in.; along, 120 in.
        let b = crate::audit::piece_box::piece_box(&beam.box_piece(), None).unwrap();
        let d = b.dims.map(|l| l.to_in());
        assert!(
            (d[0] - 3.0).abs() < 1e-6 && (d[1] - 6.0).abs() < 1e-6,
            "{d:?}"
        );
        assert!((d[2] - 120.0).abs() < 1e-6, "{d:?}");
    }

    fn find<'a>(ps: &'a [Piece], member: &str) -> &'a Piece {
        ps.iter().find(|p| p.member == member).unwrap()
    }

    #[test]
    fn web_piece_cut_length_tabs_and_slots() {
        let model = demo_with("web", &[]).unwrap();
        let ps = pieces(&model).unwrap();
        assert_eq!(ps.len(), model.members.len());
        // By hand: V1 runs 3 ft node to node; 5-1/2 in. set-back at each end → 36 − 11 = 25 in.
        let v1 = find(&ps, "V1");
        assert!((v1.cut_length.to_in() - 25.0).abs() < 1e-9);
        // D1: √(48² + 36²) = 60 in. → 49 in.
        assert!((find(&ps, "D1").cut_length.to_in() - 49.0).abs() < 1e-9);
        // Tab: 2 in. in the slot + 1-1/2 clear + 1-1/2 pitch + 1 end distance = 6 in. long,
        // 4 in. past the tube end; slot 2 in. long, 1/4 + 1/16 = 5/16 in. wide.
        assert_eq!(v1.attachments.len(), 2);
        let tab = &v1.attachments[0];
        assert!((tab.length.to_in() - 6.0).abs() < 1e-9);
        assert!((tab.projection.to_in() - 4.0).abs() < 1e-9);
        match v1.start_cut {
            EndCut::SquareSlotted { length, width } => {
                assert!((length.to_in() - 2.0).abs() < 1e-9);
                assert!((width.to_in() - 0.3125).abs() < 1e-9);
            }
            other => panic!("{other:?}"),
        }
        // Tab mass by hand: 1/4 × 1-1/2 × 6 = 2.25 in³ at 490 lb/ft³ (1728 in³/ft³) = 0.638 lb.
        assert!((tab.mass.to_lb() - 2.25 * 490.0 / 1728.0).abs() < 1e-6);
        // Four 1/8 in. fillets 2 in. long: 4 × 0.125²/2 × 2 = 0.0625 in³ → 0.01772 lb.
        let w = &v1.welds[0];
        assert_eq!(w.lines, 4);
        assert!((w.mass.to_lb() - 0.0625 * 490.0 / 1728.0).abs() < 1e-6);
        // its gussets are shop-welded to the chords (on_chord): nothing is left out of a piece
        assert!(v1.not_included.is_empty(), "{:?}", v1.not_included);
        let total = v1.weight.tube + v1.weight.attachments + v1.weight.welds;
        assert!((v1.weight.total - total).abs().to_kg() < 1e-12);
    }

    #[test]
    fn a_lapped_tab_has_a_square_end_and_flare_bevel_weld_metal() {
        let model = demo_with(
            "lapped",
            &[(
                "weld = { size = \"1/8 in\", length = \"2 in\", electrode = \"E70\", slot_gap = \"1/16 in\" }",
                "weld = { joint = \"flare bevel\", process = \"GMAW\", fill = \"flush\", length = \"2 in\", electrode = \"E70\" }",
            )],
        )
        .unwrap();
        let ps = pieces(&model).unwrap();
        let v1 = find(&ps, "V1");
        assert_eq!(v1.start_cut, EndCut::Square);
        // By hand (geometry): a groove filled flush against a corner of radius R holds the
        // corner's spandrel R² (1 − π/4); HSS1-1/2x1-1/2x3/16, R = 2 × 0.174 = 0.348 in.:
        // 0.121104 × 0.214602 = 0.025989 in.² × 2 in. × 2 lines = 0.103957 in³ at 490 lb/ft³.
        let w = &v1.welds[0];
        assert_eq!(w.lines, 2);
        assert!((w.mass.to_lb() - 0.103957 * 490.0 / 1728.0).abs() < 1e-6);
        // The audit box of the tab takes in either face: 1-1/2 in. tube + 2 × 1/4 in. tab.
        match &v1.attachments[0].kind {
            ShopPartKind::Tab { envelope, .. } => assert!((envelope.to_in() - 2.0).abs() < 1e-9),
            other => panic!("{other:?}"),
        }
    }

    #[test]
    fn sleeve_goes_with_the_member_it_is_welded_into() {
        let model = demo_with("sleeve", &[]).unwrap();
        let ps = pieces(&model).unwrap();
        // welded_into = "start": BC2 (its start is the splice) carries the 8 in. sleeve, 4 in. out.
        let sleeves = |p: &Piece| -> Vec<ShopPart> {
            p.attachments
                .iter()
                .filter(|a| matches!(a.kind, ShopPartKind::Sleeve { .. }))
                .cloned()
                .collect()
        };
        let bc2 = find(&ps, "BC2");
        let bc2_sleeves = sleeves(bc2);
        assert_eq!(bc2_sleeves.len(), 1);
        assert!((bc2_sleeves[0].projection.to_in() - 4.0).abs() < 1e-9);
        assert!(sleeves(find(&ps, "BC1")).is_empty());
        assert!((bc2.cut_length.to_in() - 96.0).abs() < 1e-9);
        // Its box: 96 + 4 = 100 in. long, 2 in. across the chord (the gussets stand in the
        // truss plane, inside the chord's 2 in.), and 2 in. plus the gussets' height off the top
        // face: 1-1/4 end + 1-1/2 pitch + 3 back = 5-3/4 in. (the mate's box of on_chord).
        let b = crate::audit::piece_box::piece_box(&bc2.box_piece(), None).unwrap();
        let d = b.dims.map(|l| l.to_in());
        assert!((d[0] - 2.0).abs() < 1e-6, "{d:?}");
        assert!((d[1] - 7.75).abs() < 1e-6, "{d:?}");
        assert!((d[2] - 100.0).abs() < 1e-6, "{d:?}");
    }

    #[test]
    fn an_end_without_a_set_back_is_an_error_at_its_member() {
        let model = demo_with("nosetback", &[("start_setback = \"0 in\"\n", "")]).unwrap();
        let e = pieces(&model).unwrap_err();
        assert_eq!(e.len(), 1, "{e:?}");
        assert_eq!(e[0].key, "members.BC1.start_setback");
        assert_eq!(
            e[0].line,
            DEMO.lines().position(|l| l == "[members.BC1]").unwrap() + 1
        );
        assert!(
            e[0].message.contains("no set-back at its start end"),
            "{}",
            e[0]
        );
    }

    #[test]
    fn a_sleeve_without_its_shop_side_is_an_error() {
        let model = demo_with("noside", &[(", welded_into = \"start\"", "")]).unwrap();
        let e = pieces(&model).unwrap_err();
        assert!(e
            .iter()
            .all(|d| d.key == "details.CHORD-SPLICE.sleeve.welded_into"));
        assert_eq!(e.len(), 4, "each chord end at the splice: {e:?}");
    }

    #[test]
    fn a_sleeve_used_at_two_starts_cannot_be_placed() {
        // BC1 turned round (B2 → B0): the splice is then at the start of both BC1 and BC2.
        let model = demo_with(
            "pairs",
            &[(
                "from = \"B0\"\nto = \"B2\"\nsection = \"HSS2x2x3/16\"\nmaterial = \"ASTM A500 Gr C (shaped)\"\nstart = \"none\"\nend = \"CHORD-SPLICE\"\nstart_setback = \"0 in\"",
                "from = \"B2\"\nto = \"B0\"\nsection = \"HSS2x2x3/16\"\nmaterial = \"ASTM A500 Gr C (shaped)\"\nstart = \"CHORD-SPLICE\"\nend = \"none\"\nend_setback = \"0 in\"",
            )],
        )
        .unwrap();
        let e = pieces(&model).unwrap_err();
        assert_eq!(e.len(), 1, "{e:?}");
        assert!(
            e[0].message
                .contains("used at 3 member start(s) and 1 member end(s)"),
            "{}",
            e[0]
        );
    }

    #[test]
    fn given_cut_length_wins_and_a_too_long_one_is_refused() {
        let model = demo_with(
            "given",
            &[("[members.V1]\n", "[members.V1]\ncut_length = \"24 in\"\n")],
        )
        .unwrap();
        let v1 = find(&pieces(&model).unwrap(), "V1").clone();
        assert_eq!(v1.cut_basis, CutBasis::Given);
        assert!((v1.cut_length.to_in() - 24.0).abs() < 1e-9);
        let e = demo_with(
            "toolong",
            &[("[members.V1]\n", "[members.V1]\ncut_length = \"37 in\"\n")],
        )
        .unwrap_err();
        assert!(e.iter().any(|d| d.key == "members.V1.cut_length"), "{e:?}");
    }

    #[test]
    fn marks_group_alike_pieces_and_refuse_unlike_ones() {
        let model = demo_with(
            "marks",
            &[
                ("[members.V1]\n", "[members.V1]\nmark = \"W1\"\n"),
                ("[members.V3]\n", "[members.V3]\nmark = \"W1\"\n"),
            ],
        )
        .unwrap();
        let g = group_by_mark(&model, &pieces(&model).unwrap()).unwrap();
        let w1 = g.iter().find(|g| g.mark == "W1").unwrap();
        assert_eq!(w1.quantity, 2);
        assert_eq!(w1.members, ["V1", "V3"]);
        assert_eq!(g.len(), model.members.len() - 1);
        let model = demo_with(
            "badmarks",
            &[
                ("[members.V1]\n", "[members.V1]\nmark = \"W1\"\n"),
                ("[members.D1]\n", "[members.D1]\nmark = \"W1\"\n"),
            ],
        )
        .unwrap();
        let e = group_by_mark(&model, &pieces(&model).unwrap()).unwrap_err();
        assert_eq!(e[0].key, "members.D1.mark");
        assert!(e[0].message.contains("cut length"), "{}", e[0]);
    }
}
