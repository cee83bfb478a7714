//! The fastener of one bolt position in words: the spec line a buyer orders from and a short
//! text sketch of the stack a fitter reads (head, washers, plies, shear planes, nut, stick-out).

use super::planes::PlaneThreads;
use super::{Ply, PlyKind};
use crate::units::{fraction_inch, Length, UnitSystem};

/// What the spec line names.
#[derive(Debug, Clone, Copy)]
pub struct SpecParts<'a> {
    /// Thread designation, e.g. "1/2-13 UNC".
    pub thread: &'a str,
    /// The bolt length, or `None` when no length works.
    pub length: Option<Length>,
    pub bolt_type: &'a str,
    pub grade: &'a str,
    pub nut: &'a str,
    pub nut_grade: &'a str,
    /// Washer type name, when the detail has washers.
    pub washer: Option<&'a str>,
    pub washer_under_head: bool,
    pub washer_under_nut: bool,
}

/// A length as the shop writes it: a fraction to 1/16 in. (decimal to 0.001 in. where the
/// value is not a sixteenth) in US units, whole or decimal millimetres in SI.
pub fn shop_length(l: Length, units: UnitSystem) -> String {
    match units {
        UnitSystem::Us => {
            let x = l.to_in();
            if ((x * 16.0).round() - x * 16.0).abs() < 1e-6 {
                fraction_inch(x, false)
            } else {
                format!("{x:.3} in")
            }
        }
        UnitSystem::Si => {
            let x = l.to_mm();
            if (x.round() - x).abs() < 1e-6 {
                format!("{x:.0} mm")
            } else {
                format!("{x:.1} mm")
            }
        }
    }
}

/// The plain spec of one bolt position, e.g. "1/2-13 UNC × 2 in heavy hex structural bolt,
/// ASTM F3125 Gr A325; heavy hex nut, ASTM A563 Gr DH; one ASTM F436 washer under the nut".
pub fn fastener_spec(p: &SpecParts, units: UnitSystem) -> String {
    let length = match p.length {
        Some(l) => format!(" × {}", shop_length(l, units)),
        None => " × (no length of the series works)".to_string(),
    };
    let mut s = format!(
        "{}{} {}, {}; {}, {}",
        p.thread, length, p.bolt_type, p.grade, p.nut, p.nut_grade
    );
    match (p.washer, p.washer_under_head, p.washer_under_nut) {
        (Some(w), true, true) => s.push_str(&format!(
            "; two {w} washers, under the head and under the nut"
        )),
        (Some(w), true, false) => s.push_str(&format!("; one {w} washer under the head")),
        (Some(w), false, true) => s.push_str(&format!("; one {w} washer under the nut")),
        _ => s.push_str("; no washers"),
    }
    s
}

/// What the sketch draws, head side first.
#[derive(Debug, Clone, Copy)]
pub struct SketchParts<'a> {
    pub bolt_type: &'a str,
    pub head_height: Option<Length>,
    /// Washer under the head: name and thickness.
    pub head_washer: Option<(&'a str, Length)>,
    pub plies: &'a [Ply],
    pub planes: &'a [PlaneThreads],
    /// Washer under the nut: name and thickness.
    pub nut_washer: Option<(&'a str, Length)>,
    pub nut: &'a str,
    pub nut_height: Length,
    /// Stick-out beyond the nut face and in thread pitches, when a length was found.
    pub stickout: Option<(Length, f64)>,
}

/// A text sketch of the stack, one line per layer, with each shear plane marked after its ply.
pub fn stack_sketch(p: &SketchParts, units: UnitSystem) -> String {
    let show = |l: Length| shop_length(l, units);
    let mut lines = Vec::new();
    let head = p.head_height.map_or("-".to_string(), show);
    lines.push(format!("{:<15} {head:>10}  {}", "head", p.bolt_type));
    if let Some((w, t)) = p.head_washer {
        lines.push(format!("{:<15} {:>10}  {w}", "washer", show(t)));
    }
    // positions are measured from the bearing face under the head, so the head washer counts
    let mut at = p.head_washer.map_or(0.0, |w| w.1.to_mm());
    for ply in p.plies {
        let (mark, kind) = match ply.kind {
            PlyKind::Solid => ("|", "solid"),
            PlyKind::Gap => (":", "open"),
        };
        lines.push(format!(
            "{mark} {:<13} {:>10}  {kind}",
            ply.name,
            show(ply.thickness)
        ));
        at += ply.thickness.to_mm();
        for (i, plane) in p.planes.iter().enumerate() {
            if (plane.plane.position.to_mm() - at).abs() < 1e-6 {
                lines.push(format!(
                    "-- shear plane {} at {} from the head: threads {}",
                    i + 1,
                    show(plane.plane.position),
                    if plane.excluded {
                        "excluded"
                    } else {
                        "not excluded"
                    }
                ));
            }
        }
    }
    if let Some((w, t)) = p.nut_washer {
        lines.push(format!("{:<15} {:>10}  {w}", "washer", show(t)));
    }
    lines.push(format!(
        "{:<15} {:>10}  {}",
        "nut",
        show(p.nut_height),
        p.nut
    ));
    match p.stickout {
        Some((l, n)) => lines.push(format!(
            "{:<15} {:>10}  {n:.1} threads past the nut face",
            "stick-out",
            show(l)
        )),
        None => lines.push("stick-out       (no bolt length found)".to_string()),
    }
    lines.join("\n")
}

#[cfg(test)]
mod tests {
    use super::super::planes::PlanePosition;
    use super::*;

    #[test]
    fn spec_line_names_every_part() {
        let s = fastener_spec(
            &SpecParts {
                thread: "3/8-16 UNC",
                length: Some(Length::inch(1.25)),
                bolt_type: "hex bolt",
                grade: "SAE J429 Gr 5",
                nut: "hex nut",
                nut_grade: "ASTM A563 Gr A",
                washer: Some("ASME B18.21.1 Type A"),
                washer_under_head: false,
                washer_under_nut: true,
            },
            UnitSystem::Us,
        );
        assert_eq!(
            s,
            "3/8-16 UNC × 1-1/4 in hex bolt, SAE J429 Gr 5; hex nut, ASTM A563 Gr A; one ASME B18.21.1 Type A washer under the nut"
        );
    }

    #[test]
    fn spec_line_says_when_no_length_works() {
        let s = fastener_spec(
            &SpecParts {
                thread: "M12",
                length: None,
                bolt_type: "ISO 4014 hex bolt",
                grade: "ISO 898-1 8.8",
                nut: "ISO 4032 hex nut",
                nut_grade: "ISO 898-2 class 8",
                washer: None,
                washer_under_head: false,
                washer_under_nut: false,
            },
            UnitSystem::Si,
        );
        assert!(s.contains("no length of the series works"), "{s}");
        assert!(s.ends_with("no washers"), "{s}");
    }

    #[test]
    fn shop_lengths() {
        assert_eq!(shop_length(Length::inch(2.25), UnitSystem::Us), "2-1/4 in");
        assert_eq!(shop_length(Length::inch(0.177), UnitSystem::Us), "0.177 in");
        assert_eq!(shop_length(Length::mm(45.0), UnitSystem::Si), "45 mm");
        assert_eq!(shop_length(Length::mm(2.5), UnitSystem::Si), "2.5 mm");
    }

    #[test]
    fn sketch_marks_the_plane_after_its_ply() {
        let plies = [
            Ply {
                name: "mate".into(),
                thickness: Length::inch(0.25),
                kind: PlyKind::Solid,
            },
            Ply {
                name: "tab".into(),
                thickness: Length::inch(0.25),
                kind: PlyKind::Solid,
            },
        ];
        let planes = [PlaneThreads {
            plane: PlanePosition {
                between: ("mate".into(), "tab".into()),
                position: Length::inch(0.25),
            },
            excluded: false,
            margin: Length::inch(-0.1),
        }];
        let s = stack_sketch(
            &SketchParts {
                bolt_type: "hex bolt",
                head_height: Some(Length::inch(11.0 / 32.0)),
                head_washer: None,
                plies: &plies,
                planes: &planes,
                nut_washer: Some(("ASTM F436", Length::inch(0.177))),
                nut: "heavy hex nut",
                nut_height: Length::inch(31.0 / 64.0),
                stickout: Some((Length::inch(0.0625), 0.8125)),
            },
            UnitSystem::Us,
        );
        let lines: Vec<&str> = s.lines().collect();
        assert!(lines[1].starts_with("| mate"), "{s}");
        assert!(
            lines[2].contains("shear plane 1") && lines[2].contains("not excluded"),
            "{s}"
        );
        assert!(lines[3].starts_with("| tab"), "{s}");
        assert!(lines.last().unwrap().contains("0.8 threads"), "{s}");
    }
}
