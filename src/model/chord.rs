//! Where a mate plate sits on its chord: the node the member end connects to, found on the chord's
//! line; the angle θ between the member and the chord; the direction from the chord axis to the
//! member (the face the plate is welded to); and, for a rectangular chord, which face that is.
//!
//! Every placement that the geometry does not give unambiguously is an error with its hint: a
//! node off the chord, a member in line with the chord, a transverse plate on a member that is not
//! square to the chord, a rectangular chord met at a corner, a non-square chord without `roll`.

use super::{ChordPlate, End, Member, Node, OnChord};
use crate::audit::{MemberSolid, Point3, Roll, Vec3};
use crate::catalogue::Shape;
use crate::units::{Angle, Length};

/// A node closer than this (1 mm) to the chord's line is on it (common practice for model
/// coordinates written to the nearest fraction of an inch or millimetre).
pub const ON_LINE: Length = Length::from_si(1.0);

/// Angles within this (1 deg) of square are square, and faces within it are met square.
const SQUARE_DEG: f64 = 1.0;

/// The place of a mate on its chord, for one member end.
#[derive(Debug, Clone, PartialEq)]
pub struct Placement {
    /// The chord member's id.
    pub chord: String,
    /// The node the member end connects to, on the chord.
    pub node: String,
    /// From the chord's `from` node to the node, along the chord.
    pub along: Length,
    /// θ: the acute angle between the member's axis and the chord's axis (0 < θ ≤ 90 deg).
    pub theta: Angle,
    /// Unit direction (model axes) from the chord axis towards the member, square to the chord.
    pub outward: [f64; 3],
    /// Components of `outward` on the chord's section depth (y) and width (z) directions.
    pub in_section: [f64; 2],
    /// For a rectangular chord: the width B of the face the plate is on (measured 90 deg to the
    /// plane of the connection) and the height H of the walls beside it; none for a round chord.
    pub faces: Option<(Length, Length)>,
}

/// Why a mate cannot be placed: the message and the likely fix.
#[derive(Debug, Clone, PartialEq)]
pub struct PlaceError {
    pub message: String,
    pub hint: String,
}

fn err(message: String, hint: &str) -> PlaceError {
    PlaceError {
        message,
        hint: hint.to_string(),
    }
}

fn point(n: &Node) -> Point3 {
    Point3::new(n.at[0], n.at[1], n.at[2])
}

/// The chord's own frame as the audit geometry defines it (x along the chord, y the section's
/// depth direction after `roll`); a round or square chord without `roll` takes 0 deg.
fn chord_frame(chord: &Member, a: Point3, b: Point3) -> Result<[Vec3; 3], PlaceError> {
    let roll = match (chord.roll, chord.section.shape) {
        (Some(r), _) => r,
        (None, Shape::Rect { b, h }) if (b - h).abs().to_mm() > 1e-6 => {
            return Err(err(
                format!(
                    "chord '{}' has a rectangular section ({}) but no `roll`: which face the mate is on decides B and H",
                    chord.id, chord.section.name
                ),
                "add `roll = \"0 deg\"` to the chord member (depth towards global +z projected; see the README)",
            ))
        }
        (None, _) => Angle::deg(0.0),
    };
    let solid = MemberSolid {
        a,
        b,
        section: super::pieces::solid_section(&chord.section),
        roll: Roll::Angle(roll),
    };
    solid
        .frame(&chord.id)
        .map(|f| f.axes)
        .map_err(|e| err(e.message, "check the chord's nodes and roll"))
}

/// The node of member `m` at `end`.
fn end_node<'a>(nodes: &'a [Node], m: &Member, end: End) -> Option<&'a Node> {
    let id = match end {
        End::Start => &m.from,
        End::End => &m.to,
    };
    nodes.iter().find(|n| &n.id == id)
}

/// Whether node `n` lies on the line of member `c`, between its nodes (within [`ON_LINE`]).
fn on_line(nodes: &[Node], c: &Member, n: &Node) -> bool {
    let at = |id: &str| nodes.iter().find(|x| x.id == id).map(|x| point(x).v());
    let (Some(a), Some(b)) = (at(&c.from), at(&c.to)) else {
        return false;
    };
    let Some(ex) = (b - a).unit() else {
        return false;
    };
    let p = point(n).v();
    let s = (p - a).dot(ex);
    let tol = ON_LINE.to_mm();
    (p - a - ex * s).norm() <= tol && s >= -tol && s <= (b - a).norm() + tol
}

/// The chord of `oc` for this member end: the only one named, or among several the one whose
/// line passes through the end's node (none or more than one is an error).
fn pick_chord<'a>(
    nodes: &[Node],
    members: &'a [Member],
    m: &Member,
    end: End,
    oc: &OnChord,
) -> Result<&'a Member, PlaceError> {
    let find = |id: &str| {
        members.iter().find(|c| c.id == id).ok_or_else(|| {
            err(
                format!("no member '{id}' in [members] for the mate's chord"),
                "give the id of the member the mate is welded to",
            )
        })
    };
    if let [only] = oc.chords.as_slice() {
        return find(&only.id);
    }
    let node = end_node(nodes, m, end).ok_or_else(|| {
        err(
            "the member's node is not in [nodes]".into(),
            "check the node ids",
        )
    })?;
    let mut through = Vec::new();
    for c in &oc.chords {
        let c = find(&c.id)?;
        if c.id != m.id && on_line(nodes, c, node) {
            through.push(c);
        }
    }
    match through.as_slice() {
        [one] => Ok(one),
        [] => Err(err(
            format!(
                "node '{}' of member '{}' is on none of the chords {}: the mate cannot be placed",
                node.id,
                m.id,
                oc.names()
            ),
            "add the chord through this node to `chords`, or use a detail without `on_chord` at this end",
        )),
        several => Err(err(
            format!(
                "node '{}' of member '{}' is on more than one of the chords ({}): which one carries the mate is not known",
                node.id,
                m.id,
                several.iter().map(|c| c.id.as_str()).collect::<Vec<_>>().join(", ")
            ),
            "give this end a detail whose `chord` names the one member the mate is welded to",
        )),
    }
}

/// Place the mate of `oc` for the end `end` of member `m`.
pub fn placement(
    nodes: &[Node],
    members: &[Member],
    m: &Member,
    end: End,
    oc: &OnChord,
) -> Result<Placement, PlaceError> {
    let chord = pick_chord(nodes, members, m, end, oc)?;
    if chord.id == m.id {
        return Err(err(
            format!(
                "member '{}' cannot carry its own mate: the chord must be another member",
                m.id
            ),
            "name the member the mate is welded to in `chord`",
        ));
    }
    let node_of = |id: &str| nodes.iter().find(|n| n.id == id);
    let here_id = match end {
        End::Start => &m.from,
        End::End => &m.to,
    };
    let far_id = match end {
        End::Start => &m.to,
        End::End => &m.from,
    };
    let (Some(here), Some(far), Some(ca), Some(cb)) = (
        node_of(here_id),
        node_of(far_id),
        node_of(&chord.from),
        node_of(&chord.to),
    ) else {
        return Err(err(
            "a node of the member or of the chord is not in [nodes]".into(),
            "check the node ids",
        ));
    };
    let (a, b, p, q) = (
        point(ca).v(),
        point(cb).v(),
        point(here).v(),
        point(far).v(),
    );
    let ex = (b - a)
        .unit()
        .ok_or_else(|| err("the chord has zero length".into(), "check its nodes"))?;
    let s = (p - a).dot(ex);
    let len = (b - a).norm();
    if !on_line(nodes, chord, here) {
        return Err(err(
            format!(
                "node '{}' of member '{}' is not on chord '{}' ({} to {}): the mate cannot be placed",
                here.id, m.id, chord.id, chord.from, chord.to
            ),
            "name the chord that passes through this node, or use a detail without `on_chord` at this end",
        ));
    }
    let toward = (q - p)
        .unit()
        .ok_or_else(|| err("the member has zero length".into(), "check its nodes"))?;
    let cos = toward.dot(ex).abs().min(1.0);
    let theta = cos.acos().to_degrees();
    if theta < SQUARE_DEG {
        return Err(err(
            format!(
                "member '{}' runs in line with chord '{}': a plate on the chord face cannot take its force",
                m.id, chord.id
            ),
            "check the chord id and the node coordinates",
        ));
    }
    if oc.plate == ChordPlate::Transverse && (90.0 - theta) > SQUARE_DEG {
        return Err(err(
            format!(
                "a transverse plate needs the member square to the chord; member '{}' meets chord '{}' at {theta:.1} deg",
                m.id, chord.id
            ),
            "write `plate = \"longitudinal\"` (plate in the plane of member and chord), or check the nodes",
        ));
    }
    let outward = (toward - ex * toward.dot(ex))
        .unit()
        .expect("θ above 1 deg leaves a component square to the chord");
    let axes = chord_frame(chord, point(ca), point(cb))?;
    let (ny, nz) = (outward.dot(axes[1]), outward.dot(axes[2]));
    let square = SQUARE_DEG.to_radians().cos();
    let faces = match chord.section.shape {
        Shape::Round { .. } => None,
        Shape::Rect { b: width, h: depth } => {
            if ny.abs() >= square {
                Some((width, depth))
            } else if nz.abs() >= square {
                Some((depth, width))
            } else {
                return Err(err(
                    format!(
                        "member '{}' meets rectangular chord '{}' off its faces (towards a corner): the plate's face is not known",
                        m.id, chord.id
                    ),
                    "set the chord's `roll` so that a face looks at the member",
                ));
            }
        }
    };
    Ok(Placement {
        chord: chord.id.clone(),
        node: here.id.clone(),
        along: Length::mm(s.clamp(0.0, len)),
        theta: Angle::deg(theta),
        outward: outward.0,
        in_section: [ny, nz],
        faces,
    })
}

/// The other mates on the same chord at the same node: each member end's id ("MEMBER/end") and
/// whether its plate is on the opposite face (a cross-connection) or not (plates side by side on
/// one face, or around a round chord). `on_chord_of` gives a detail id's `on_chord`.
pub fn others_at_node(
    nodes: &[Node],
    members: &[Member],
    m: &Member,
    end: End,
    here: &Placement,
    on_chord_of: impl Fn(&str) -> Option<OnChord>,
) -> Vec<(String, bool)> {
    let mut out = Vec::new();
    for o in members {
        for (e, d) in [(End::Start, &o.start), (End::End, &o.end)] {
            if o.id == m.id && e == end {
                continue;
            }
            let Some(oc) = d.as_deref().and_then(&on_chord_of) else {
                continue;
            };
            if !oc.chords.iter().any(|c| c.id == here.chord) {
                continue;
            }
            if let Ok(p) = placement(nodes, members, o, e, &oc) {
                if p.chord == here.chord && p.node == here.node {
                    let opposite =
                        Vec3(p.outward).dot(Vec3(here.outward)) < -SQUARE_DEG.to_radians().cos();
                    out.push((format!("{}/{}", o.id, e.as_str()), opposite));
                }
            }
        }
    }
    out
}
