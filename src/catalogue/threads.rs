//! Screw threads: Unified inch (ASME B1.1) by threads per inch, ISO metric (ISO 261 / ISO 898-1)
//! by pitch. The stress area is computed from the geometry; the tabulated value is kept beside it.

use super::node::{Ctx, Table};
use super::Provenance;
use crate::standards::threads::{tensile_stress_area_metric, tensile_stress_area_unified};
use crate::units::{Area, Length};

/// A thread size.
#[derive(Debug, Clone, PartialEq)]
pub struct Thread {
    /// E.g. "1/2-13 UNC", "M12".
    pub designation: String,
    /// E.g. "UNC", "UNF", "M coarse".
    pub series: String,
    /// Basic major diameter.
    pub d: Length,
    /// Pitch (1/n for Unified threads).
    pub pitch: Length,
    /// Threads per inch, for Unified threads.
    pub tpi: Option<f64>,
    /// Tensile stress area computed from d and the pitch (ASME B1.1 / ISO 898-1 formula).
    pub stress_area: Area,
    /// The stress area as the source table prints it.
    pub stress_area_tabulated: Option<Area>,
    pub provenance: Provenance,
}

impl Thread {
    pub(crate) fn read(
        t: &Table,
        cx: &mut Ctx,
        name: String,
        provenance: Provenance,
    ) -> Option<Self> {
        let series = t.str(cx, "series");
        let d = t.length(cx, "d");
        let tpi = t.opt_number(cx, "tpi");
        let pitch = t.opt_length(cx, "pitch");
        let tabulated = t.opt_area(cx, "stress_area_tabulated");
        let (has_tpi, has_pitch) = (t.has("tpi"), t.has("pitch"));
        t.finish(cx);
        if has_tpi == has_pitch {
            cx.error_hint(
                &t.span,
                &t.key("tpi"),
                "give exactly one of 'tpi' (Unified inch threads) or 'pitch' (metric threads)",
                "e.g. tpi = 13 or pitch = \"1.75 mm\"",
            );
            return None;
        }
        let d = d?;
        if let Some(n) = tpi {
            if n <= 0.0 {
                cx.error(
                    &t.span_of("tpi"),
                    &t.key("tpi"),
                    "tpi must be greater than zero",
                );
                return None;
            }
        }
        let (pitch, stress_area) = match (tpi, pitch) {
            (Some(n), None) => (Length::inch(1.0 / n), tensile_stress_area_unified(d, n)),
            (None, Some(p)) => (p, tensile_stress_area_metric(d, p)),
            _ => return None,
        };
        if pitch.to_mm() >= d.to_mm() / 2.0 {
            cx.error(
                &t.span,
                &t.key("pitch"),
                "the pitch is too coarse for the diameter",
            );
            return None;
        }
        Some(Thread {
            designation: name,
            series: series?,
            d,
            pitch,
            tpi,
            stress_area,
            stress_area_tabulated: tabulated,
            provenance,
        })
    }
}
