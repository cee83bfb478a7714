//! Weld calls in the standard welding notation (AWS A2.4): a plain-text line for the sheet, and
//! a small description of the symbol (reference line, arrow-side and other-side elements, size,
//! length and pitch, all-around, field weld, tail) for a drawing to lay out.

use crate::units::{fraction_inch, Length, UnitSystem};

/// The weld kind shown by the symbol on the reference line.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum WeldKind {
    Fillet,
    FlareBevelGroove,
}

/// Which side of the joint the weld is on, as the reference line shows it.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum WeldSide {
    Arrow,
    Other,
    Both,
}

/// One weld as called up on a drawing.
#[derive(Debug, Clone, PartialEq)]
pub struct WeldCall {
    pub kind: WeldKind,
    /// Leg size (fillet) or effective throat (flare groove, shown in parentheses).
    pub size: Length,
    pub side: WeldSide,
    /// Segment length of an intermittent weld, or a stated length of a continuous weld.
    pub length: Option<Length>,
    /// Centre-to-centre pitch of an intermittent weld.
    pub pitch: Option<Length>,
    pub all_around: bool,
    pub field: bool,
    /// A flush contour symbol over the weld (the face finished flush, as a flare groove filled
    /// flush).
    pub flush: bool,
    pub tail: Option<String>,
}

/// The text next to one symbol on the reference line.
#[derive(Debug, Clone, PartialEq, Eq)]
pub struct SymbolElement {
    pub kind: WeldKind,
    /// Size to the left of the symbol, e.g. "3/16" or "(5/16)".
    pub size: String,
    /// Length and pitch to the right of the symbol, e.g. "2-4", or "".
    pub length_pitch: String,
    /// The flush contour symbol drawn over the weld symbol.
    pub flush: bool,
}

/// A weld symbol for a drawer: what goes below (arrow side) and above (other side) the reference
/// line, the all-around circle, the field flag and the tail note.
#[derive(Debug, Clone, PartialEq, Eq)]
pub struct WeldSymbol {
    pub arrow_side: Option<SymbolElement>,
    pub other_side: Option<SymbolElement>,
    pub all_around: bool,
    pub field: bool,
    pub tail: Option<String>,
}

fn dimension(length: Length, units: UnitSystem) -> String {
    match units {
        UnitSystem::Us => fraction_inch(length.to_in(), false)
            .trim_end_matches(" in")
            .to_string(),
        UnitSystem::Si => format!("{:.0}", length.to_mm()),
    }
}

/// An effective throat as written in parentheses: rounded down (to 0.001 in. or 0.1 mm), never
/// up to the next fraction, so the call never promises more throat than was checked.
fn throat_dimension(throat: Length, units: UnitSystem) -> String {
    match units {
        UnitSystem::Us => format!("{:.3}", (throat.to_in() * 1000.0 + 1e-9).floor() / 1000.0),
        UnitSystem::Si => format!("{:.1}", (throat.to_mm() * 10.0 + 1e-9).floor() / 10.0),
    }
}

/// The symbol of a weld call; an error names what is inconsistent.
pub fn weld_symbol(call: &WeldCall, units: UnitSystem) -> Result<WeldSymbol, String> {
    if !(call.size.is_finite() && call.size.si() > 0.0) {
        return Err("weld size must be above zero".into());
    }
    if call.pitch.is_some() && call.length.is_none() {
        return Err("a pitch needs a segment length".into());
    }
    if let (Some(l), Some(p)) = (call.length, call.pitch) {
        if !(l.si() > 0.0 && p > l) {
            return Err("the pitch must exceed the segment length".into());
        }
    }
    if call.all_around && call.length.is_some() {
        return Err("an all-around weld has no segment length".into());
    }
    let size = dimension(call.size, units);
    let size = match call.kind {
        WeldKind::Fillet => size,
        WeldKind::FlareBevelGroove => format!("({})", throat_dimension(call.size, units)),
    };
    let length_pitch = match (call.length, call.pitch) {
        (Some(l), Some(p)) => format!("{}-{}", dimension(l, units), dimension(p, units)),
        (Some(l), None) => dimension(l, units),
        _ => String::new(),
    };
    let element = SymbolElement {
        kind: call.kind,
        size,
        length_pitch,
        flush: call.flush,
    };
    let (arrow_side, other_side) = match call.side {
        WeldSide::Arrow => (Some(element), None),
        WeldSide::Other => (None, Some(element)),
        WeldSide::Both => (Some(element.clone()), Some(element)),
    };
    Ok(WeldSymbol {
        arrow_side,
        other_side,
        all_around: call.all_around,
        field: call.field,
        tail: call.tail.clone(),
    })
}

/// The weld call as one plain-text line for the sheet, e.g. "fillet 3/16 2-4, both sides, field".
pub fn describe(call: &WeldCall, units: UnitSystem) -> Result<String, String> {
    let symbol = weld_symbol(call, units)?;
    let element = symbol
        .arrow_side
        .as_ref()
        .or(symbol.other_side.as_ref())
        .ok_or("weld symbol without an element")?;
    let mut text = match call.kind {
        WeldKind::Fillet => "fillet".to_string(),
        WeldKind::FlareBevelGroove => "flare-bevel groove".to_string(),
    };
    text.push(' ');
    text.push_str(&element.size);
    if !element.length_pitch.is_empty() {
        text.push(' ');
        text.push_str(&element.length_pitch);
    }
    if call.flush {
        text.push_str(", flush contour");
    }
    text.push_str(match call.side {
        WeldSide::Arrow => ", arrow side",
        WeldSide::Other => ", other side",
        WeldSide::Both => ", both sides",
    });
    if call.all_around {
        text.push_str(", all around");
    }
    if call.field {
        text.push_str(", field weld");
    }
    if let Some(t) = &call.tail {
        text.push_str(&format!(" [{t}]"));
    }
    Ok(text)
}

#[cfg(test)]
mod tests {
    use super::*;

    fn call() -> WeldCall {
        WeldCall {
            kind: WeldKind::Fillet,
            size: Length::inch(0.1875),
            side: WeldSide::Both,
            length: Some(Length::inch(2.0)),
            pitch: Some(Length::inch(4.0)),
            all_around: false,
            field: true,
            flush: false,
            tail: None,
        }
    }

    #[test]
    fn intermittent_fillet_both_sides() {
        // AWS A2.4 convention: size left of the symbol, length-pitch right of it (common practice).
        assert_eq!(
            describe(&call(), UnitSystem::Us).unwrap(),
            "fillet 3/16 2-4, both sides, field weld"
        );
        let s = weld_symbol(&call(), UnitSystem::Us).unwrap();
        assert_eq!(s.arrow_side, s.other_side);
    }

    #[test]
    fn rejections() {
        let mut c = call();
        c.length = None;
        assert_eq!(
            describe(&c, UnitSystem::Us).unwrap_err(),
            "a pitch needs a segment length"
        );
        let mut c = call();
        c.pitch = Some(Length::inch(1.0));
        assert!(describe(&c, UnitSystem::Us).is_err());
        let mut c = call();
        c.all_around = true;
        assert!(describe(&c, UnitSystem::Us).is_err());
    }

    #[test]
    fn flare_groove_all_around_arrow_side_in_mm() {
        let c = WeldCall {
            kind: WeldKind::FlareBevelGroove,
            size: Length::mm(5.0),
            side: WeldSide::Arrow,
            length: None,
            pitch: None,
            all_around: true,
            field: false,
            flush: false,
            tail: Some("GMAW".into()),
        };
        assert_eq!(
            describe(&c, UnitSystem::Si).unwrap(),
            "flare-bevel groove (5.0), arrow side, all around [GMAW]"
        );
        // AWS A2.4: a groove weld's effective throat in parentheses left of the symbol, the
        // length right of it, the contour symbol over it (common practice).
        let flush = WeldCall {
            size: Length::inch(0.2913),
            length: Some(Length::inch(3.0)),
            all_around: false,
            flush: true,
            ..c.clone()
        };
        assert_eq!(
            describe(&flush, UnitSystem::Us).unwrap(),
            "flare-bevel groove (0.291) 3, flush contour, arrow side [GMAW]"
        );
        assert!(
            weld_symbol(&flush, UnitSystem::Us)
                .unwrap()
                .arrow_side
                .unwrap()
                .flush
        );
        assert!(weld_symbol(&c, UnitSystem::Si)
            .unwrap()
            .other_side
            .is_none());
    }
}
