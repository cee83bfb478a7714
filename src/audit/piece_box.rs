//! Piece box: the smallest-margin-first bounding box of a fabricated piece (tube as cut plus shop
//! attachments) over a search of orientations, fitted against a box limit.
//!
//! A piece that fits the limit in its own frame (axis, depth, width square to the box) is reported
//! in that frame. Otherwise, and when no limit is given, the orientation is searched.
//!
//! Method (a search, not a proof of the optimum): start frames are the member's own frame (axis,
//! section depth, section width) and each attachment's frame; each start frame is turned about each
//! of its three axes from 0° to 90° in 0.5° steps (a box's sorted sizes repeat every 90°), then the
//! best frame is refined by turning it about its own axes in steps of 0.5°, 0.1°, 0.02° while that
//! improves. When no frame found fits the limit, the sizes reported are those in the member's own
//! frame. The sizes in a frame are exact (support functions of boxes and cylinders).
//!
//! Fit rule: a piece fits a box, placed square to the box's sides, iff its sorted sizes are each at
//! most the box's sorted sizes. Diagonal placements (a long piece laid corner to corner) are not
//! considered, so a piece reported as not fitting might still fit diagonally: conservative.

use super::geometry::{extent, Frame, MemberSolid, OrientedBox, Solid};
use super::result::{positive, AuditInputError, AuditResult};
use crate::units::{Angle, Length};

/// A shop attachment as a box in the member's frame: `center` measured from end A along the axis,
/// along the section's depth and along its width; `size` along those same three directions before
/// `roll`, a turn of the box about the member axis.
#[derive(Debug, Clone, PartialEq)]
pub struct Attachment {
    pub name: String,
    pub center: [Length; 3],
    pub size: [Length; 3],
    pub roll: Angle,
}

/// A fabricated piece: one member as cut plus what the shop welds or fixes to it.
#[derive(Debug, Clone, PartialEq)]
pub struct Piece {
    pub mark: String,
    pub member: MemberSolid,
    pub attachments: Vec<Attachment>,
}

/// The best box found: its three sizes sorted from smallest, and the margin of each against the
/// sorted limit (when a limit is given).
#[derive(Debug, Clone, PartialEq)]
pub struct BoxFit {
    pub dims: [Length; 3],
    pub margins: Option<[Length; 3]>,
    pub frame: Frame,
    /// Whether the box is the piece's own frame (as built) rather than a searched orientation.
    pub as_built: bool,
}

/// The solids of a piece in model space.
pub fn piece_solids(piece: &Piece) -> Result<Vec<Solid>, AuditInputError> {
    let mark = piece.mark.as_str();
    let frame = piece.member.validate(mark)?;
    let mut solids = vec![piece.member.solid(mark)?];
    let a = piece.member.a.v();
    for (i, att) in piece.attachments.iter().enumerate() {
        for k in 0..3 {
            positive(mark, &format!("attachments[{i}].size"), att.size[k])?;
        }
        if !att.roll.is_finite() || att.center.iter().any(|c| !c.is_finite()) {
            return Err(AuditInputError::new(
                mark,
                format!("attachments[{i}]"),
                "not finite",
            ));
        }
        let center = a
            + frame.axes[0] * att.center[0].si()
            + frame.axes[1] * att.center[1].si()
            + frame.axes[2] * att.center[2].si();
        solids.push(Solid::Block(OrientedBox {
            center,
            frame: frame.rotated_about(0, att.roll.to_rad()),
            half: att.size.map(|s| s.si() / 2.0),
        }));
    }
    Ok(solids)
}

/// The three sizes of the piece's box with sides along the frame's axes, sorted from smallest.
pub fn box_in_frame(solids: &[Solid], frame: &Frame) -> [f64; 3] {
    let mut d = frame.axes.map(|a| extent(solids, a));
    d.sort_by(f64::total_cmp);
    d
}

/// Smaller is better: with a limit, first the total shortfall Σ max(0, −marginᵢ), then minus the
/// least margin; without a limit, the volume.
fn score(dims: [f64; 3], limit: Option<[f64; 3]>) -> (f64, f64) {
    let vol = dims[0] * dims[1] * dims[2];
    match limit {
        Some(l) => {
            let shortfall: f64 = (0..3).map(|k| (dims[k] - l[k]).max(0.0)).sum();
            if shortfall > 0.0 {
                (shortfall, 0.0)
            } else {
                (
                    0.0,
                    -(0..3).map(|k| l[k] - dims[k]).fold(f64::MAX, f64::min),
                )
            }
        }
        None => (vol, 0.0),
    }
}

/// The best-fitting box of a piece over the orientation search described in the module doc.
pub fn piece_box(piece: &Piece, limit: Option<[Length; 3]>) -> Result<BoxFit, AuditInputError> {
    let solids = piece_solids(piece)?;
    let lim = match limit {
        Some(l) => {
            for v in l {
                positive(&piece.mark, "limit", v)?;
            }
            let mut s = l.map(|v| v.si());
            s.sort_by(f64::total_cmp);
            Some(s)
        }
        None => None,
    };
    let member_frame = piece.member.frame(&piece.mark)?;
    let mut starts = vec![member_frame];
    starts.extend(solids.iter().skip(1).filter_map(|s| match s {
        Solid::Block(b) => Some(b.frame),
        Solid::Cylinder { .. } => None,
    }));
    let eval = |f: &Frame| score(box_in_frame(&solids, f), lim);
    let mut best = member_frame;
    let mut best_score = eval(&best);
    // A piece that fits as built (its own frame square to the box) is reported so: its sizes are
    // then its length, depth and width, which a person can check by hand, and the margin is never
    // more than the best placement's (conservative). The search is for pieces that do not.
    if lim.is_some() && best_score.0 == 0.0 {
        let dims = box_in_frame(&solids, &best);
        return Ok(BoxFit {
            dims: dims.map(Length::mm),
            margins: lim.map(|l| [0, 1, 2].map(|k| Length::mm(l[k] - dims[k]))),
            frame: best,
            as_built: true,
        });
    }
    for start in &starts {
        for k in 0..3 {
            for step in 0..180 {
                let f = start.rotated_about(k, (step as f64 * 0.5).to_radians());
                let s = eval(&f);
                if s < best_score {
                    best = f;
                    best_score = s;
                }
            }
        }
    }
    for step_deg in [0.5_f64, 0.1, 0.02] {
        let mut improved = true;
        while improved {
            improved = false;
            for k in 0..3 {
                for sign in [-1.0, 1.0] {
                    let f = best.rotated_about(k, sign * step_deg.to_radians());
                    let s = eval(&f);
                    if s < best_score {
                        best = f;
                        best_score = s;
                        improved = true;
                    }
                }
            }
        }
    }
    // Nothing fits: report the sizes in the member's own frame, the piece's plain size, rather
    // than a tilted box that only misses by less.
    if best_score.0 > 0.0 {
        best = member_frame;
    }
    let dims = box_in_frame(&solids, &best);
    Ok(BoxFit {
        dims: dims.map(Length::mm),
        margins: lim.map(|l| [0, 1, 2].map(|k| Length::mm(l[k] - dims[k]))),
        as_built: best == member_frame,
        frame: best,
    })
}

/// The piece box rule: the governing (least) margin of the sorted sizes against the sorted limit.
pub fn piece_box_rule(
    piece: &Piece,
    limit: [Length; 3],
    rule_set: &str,
) -> Result<AuditResult, AuditInputError> {
    let fit = piece_box(piece, Some(limit))?;
    let margins = fit.margins.expect("a limit was given");
    let mut lim = limit;
    lim.sort_by(|a, b| a.si().total_cmp(&b.si()));
    let k = (0..3)
        .min_by(|&i, &j| margins[i].si().total_cmp(&margins[j].si()))
        .expect("three sizes");
    let mm = |v: [Length; 3]| format!("{:.1} x {:.1} x {:.1} mm", v[0].si(), v[1].si(), v[2].si());
    let inch = |v: [Length; 3]| {
        format!(
            "{:.2} x {:.2} x {:.2} in",
            v[0].to_in(),
            v[1].to_in(),
            v[2].to_in()
        )
    };
    let note = format!(
        "sorted sizes {} ({}) against {} ({}); {}; placements square to the box only \
         (diagonal fits not considered)",
        mm(fit.dims),
        inch(fit.dims),
        mm(lim),
        inch(lim),
        if fit.as_built {
            "the piece as built, square to the box"
        } else {
            "the piece turned as an orientation search found best"
        }
    );
    Ok(AuditResult::from_margin(
        "piece_box",
        rule_set,
        &piece.mark,
        fit.dims[k].into(),
        lim[k].into(),
        margins[k].into(),
        note,
    ))
}
