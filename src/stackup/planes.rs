//! Shear planes of a stack: where each lies from the head bearing face, and whether the bolt's
//! threads are excluded from it. Pure geometry.

use super::{snap, threads_excluded, Ply, StackError, ThreadLayout};
use crate::units::Length;

/// A shear plane of the stack: after which ply it lies and how far it is from the head.
#[derive(Debug, Clone, PartialEq)]
pub struct PlanePosition {
    /// The ply on the head side of the plane and the ply on the nut side, by name.
    pub between: (String, String),
    /// Distance from the bearing face under the head to the plane (washer under the head
    /// included).
    pub position: Length,
}

/// The thread condition found at one shear plane.
#[derive(Debug, Clone, PartialEq)]
pub struct PlaneThreads {
    pub plane: PlanePosition,
    /// Whether the plain shank fills the plane (Table J3.2 "X"); a plane in the transition
    /// thread, or any plane of a bolt threaded to its head, counts as not excluded.
    pub excluded: bool,
    /// Nearest end of the plain shank less the plane position: ≥ 0 when excluded.
    pub margin: Length,
}

/// The positions of the planes that lie after the plies `after` (indices into `plies`, the
/// plane being the far face of that ply), with `head_washer` under the head.
///
/// Where a fit gap separates two parts (a sleeve in a tube), the caller names the gap's index,
/// so the plane is taken at the gap's far face, the position farthest from the head: the
/// conservative one for the thread condition.
pub fn plane_positions(
    plies: &[Ply],
    head_washer: Length,
    after: &[usize],
) -> Result<Vec<PlanePosition>, StackError> {
    let mut out = Vec::new();
    for &i in after {
        if i + 1 >= plies.len() {
            return Err(StackError::NotPositive {
                what: format!("plies after shear plane {} (index {i})", out.len() + 1),
                value_mm: 0.0,
            });
        }
        let position = head_washer + plies[..=i].iter().map(|p| p.thickness).sum::<Length>();
        out.push(PlanePosition {
            between: (plies[i].name.clone(), plies[i + 1].name.clone()),
            position: snap(position),
        });
    }
    Ok(out)
}

/// The thread condition at every plane for a bolt of the given layout.
pub fn plane_threads(layout: &ThreadLayout, planes: &[PlanePosition]) -> Vec<PlaneThreads> {
    planes
        .iter()
        .map(|p| {
            let (excluded, margin) = threads_excluded(layout, p.position);
            PlaneThreads {
                plane: p.clone(),
                excluded,
                margin,
            }
        })
        .collect()
}

#[cfg(test)]
mod tests {
    use super::super::{thread_layout, PlyKind};
    use super::*;

    fn ply(name: &str, t_in: f64, kind: PlyKind) -> Ply {
        Ply {
            name: name.into(),
            thickness: Length::inch(t_in),
            kind,
        }
    }

    #[test]
    fn planes_of_a_double_lap_with_a_head_washer() {
        // Worked by hand: washer 0.1 + mate 1/4 → plane 1 at 0.35; + tab 3/8 → plane 2 at 0.725 in.
        let plies = [
            ply("mate", 0.25, PlyKind::Solid),
            ply("tab", 0.375, PlyKind::Solid),
            ply("mate", 0.25, PlyKind::Solid),
        ];
        let p = plane_positions(&plies, Length::inch(0.1), &[0, 1]).unwrap();
        assert!((p[0].position.to_in() - 0.35).abs() < 1e-9);
        assert!((p[1].position.to_in() - 0.725).abs() < 1e-9);
        assert_eq!(p[1].between, ("tab".to_string(), "mate".to_string()));
    }

    #[test]
    fn a_plane_after_the_last_ply_is_refused() {
        let plies = [ply("tab", 0.25, PlyKind::Solid)];
        assert!(plane_positions(&plies, Length::mm(0.0), &[0]).is_err());
    }

    #[test]
    fn shank_covers_the_first_plane_not_the_second() {
        // Worked by hand: L = 2, LT = 1.0, Y = 5/13 → shank ends at 0.6154 in.; planes at 0.35
        // (excluded, margin 0.2654) and 0.725 (not excluded).
        let layout = thread_layout(
            Length::inch(2.0),
            Some(Length::inch(1.0)),
            Length::inch(5.0 / 13.0),
        );
        let plies = [
            ply("mate", 0.25, PlyKind::Solid),
            ply("tab", 0.375, PlyKind::Solid),
            ply("mate", 0.25, PlyKind::Solid),
        ];
        let planes = plane_positions(&plies, Length::inch(0.1), &[0, 1]).unwrap();
        let t = plane_threads(&layout, &planes);
        assert!(t[0].excluded);
        assert!((t[0].margin.to_in() - (1.0 - 5.0 / 13.0 - 0.35)).abs() < 1e-6);
        assert!(!t[1].excluded);
    }
}
