//! The drawing of each detail as SVG, to scale from the model's numbers: the tab (or the sleeve
//! in the member end) with its holes, dimension lines for the end and edge distances, pitch,
//! gauge and hole diameter, the weld lines with their call, and the bolt stack in section.
//! Every text from the model is escaped. Units inside the drawing are millimetres; the printed
//! scale is stated on the drawing.

use super::format::length as show_length;
use crate::checks::bolting;
use crate::checks::fasteners::{BoltLength, FastenerSet, WasherSide, WasherUse};
use crate::model::{
    Bolting, Detail, DetailKind, Model, SleeveDetail, TabDetail, TabWeld, TappedDetail,
};
use crate::stackup::PlyKind;
use crate::standards::aisc360::j2_welds as j2;
use crate::standards::weld_notation::{
    describe, weld_symbol, SymbolElement, WeldCall, WeldKind, WeldSide, WeldSymbol,
};
use crate::units::{Length, UnitSystem};
use std::fmt::Write;

/// Escape a text for XML (SVG) and HTML: & < > " '.
pub fn escape(s: &str) -> String {
    let mut out = String::with_capacity(s.len());
    for c in s.chars() {
        match c {
            '&' => out.push_str("&amp;"),
            '<' => out.push_str("&lt;"),
            '>' => out.push_str("&gt;"),
            '"' => out.push_str("&quot;"),
            '\'' => out.push_str("&#39;"),
            c => out.push(c),
        }
    }
    out
}

/// Printed scales tried in turn, largest first: the first at which the drawing fits the page
/// width is used (the smallest when none does).
const SCALES: [f64; 6] = [1.0, 0.5, 0.4, 0.25, 0.2, 0.1];
/// Width of the drawing area on a letter or A4 page with 12 mm side margins, mm.
const PAGE_WIDTH_MM: f64 = 180.0;
/// Text height in drawing units at scale 1:1, mm.
const TEXT_MM: f64 = 2.6;

/// A drawing being built: elements in model millimetres.
struct Drawing {
    body: String,
    /// Text size in drawing units, chosen so the printed text is about 2.6 mm high.
    text: f64,
    /// Left and right reach of the texts written so far (estimated from their length).
    text_x: (f64, f64),
    /// The boxes (x0, x1, baseline) of the dimension labels placed so far, so that a label too
    /// wide for its dimension steps clear of its neighbour instead of printing over it.
    labels: Vec<(f64, f64, f64)>,
}

fn n(v: f64) -> String {
    super::format::trim_decimals(v, 2)
}

impl Drawing {
    fn new(text: f64) -> Self {
        Drawing {
            body: String::new(),
            text,
            text_x: (f64::INFINITY, f64::NEG_INFINITY),
            labels: Vec::new(),
        }
    }

    /// The presentation attributes of a kind of line, written on each element (not in a style
    /// sheet, which would reach every drawing of an HTML page the SVG is inlined in). Kinds:
    /// "part" (outline), "hidden" (dashed), "cut" (grey fill), "mate" (chain line), "weld"
    /// (heavy), "ext", "dim" and "tick" (thin); "part hidden" combines them.
    fn look(&self, class: &str) -> String {
        let w = self.text * 0.08;
        let has = |k: &str| class.split(' ').any(|c| c == k);
        let width = if has("weld") {
            w * 10.0
        } else if has("part") {
            w * 3.0
        } else if has("ext") || has("dim") || has("tick") {
            w * 1.5
        } else {
            w * 2.0
        };
        let mut a = format!(
            r#"fill="{}" stroke="{}" stroke-width="{}""#,
            if has("cut") { "#ddd" } else { "none" },
            if has("mate") { "#555" } else { "#000" },
            n(width)
        );
        if has("hidden") {
            let _ = write!(
                a,
                r#" stroke-dasharray="{} {}""#,
                n(self.text),
                n(self.text * 0.6)
            );
        } else if has("mate") {
            let _ = write!(
                a,
                r#" stroke-dasharray="{} {} {} {}""#,
                n(self.text * 2.0),
                n(self.text * 0.5),
                n(self.text * 0.3),
                n(self.text * 0.5)
            );
        }
        a
    }

    fn line(&mut self, x1: f64, y1: f64, x2: f64, y2: f64, class: &str) {
        let _ = writeln!(
            self.body,
            r#"<line {} x1="{}" y1="{}" x2="{}" y2="{}"/>"#,
            self.look(class),
            n(x1),
            n(y1),
            n(x2),
            n(y2)
        );
    }

    fn rect(&mut self, x: f64, y: f64, w: f64, h: f64, class: &str) {
        let _ = writeln!(
            self.body,
            r#"<rect {} x="{}" y="{}" width="{}" height="{}"/>"#,
            self.look(class),
            n(x),
            n(y),
            n(w.max(0.0)),
            n(h.max(0.0))
        );
    }

    fn circle(&mut self, x: f64, y: f64, r: f64, class: &str) {
        let _ = writeln!(
            self.body,
            r#"<circle {} cx="{}" cy="{}" r="{}"/>"#,
            self.look(class),
            n(x),
            n(y),
            n(r)
        );
    }

    fn text(&mut self, x: f64, y: f64, anchor: &str, s: &str) {
        // a sans-serif character is about 0.55 of the text height wide on average
        let w = s.chars().count() as f64 * 0.55 * self.text;
        let (x0, x1) = match anchor {
            "middle" => (x - w / 2.0, x + w / 2.0),
            "end" => (x - w, x),
            _ => (x, x + w),
        };
        self.text_x = (self.text_x.0.min(x0), self.text_x.1.max(x1));
        let _ = writeln!(
            self.body,
            r#"<text x="{}" y="{}" font-size="{}" font-family="sans-serif" text-anchor="{anchor}">{}</text>"#,
            n(x),
            n(y),
            n(self.text),
            escape(s)
        );
    }

    /// A dimension along x between x1 and x2, its line at height y, extension lines from `from_y`.
    fn dim_x(&mut self, x1: f64, x2: f64, y: f64, from_y: f64, label: &str) {
        self.line(x1, from_y, x1, y, "ext");
        self.line(x2, from_y, x2, y, "ext");
        self.line(x1, y, x2, y, "dim");
        self.tick(x1, y);
        self.tick(x2, y);
        let above = if y <= from_y { -0.6 } else { 1.3 };
        // step a label away from the line (up above it, down below it) while it would overlap
        // one already placed
        let step = if y <= from_y { -1.2 } else { 1.2 } * self.text;
        let half = label.chars().count() as f64 * 0.55 * self.text / 2.0;
        let xm = (x1 + x2) / 2.0;
        let mut ty = y + above * self.text;
        while self.labels.iter().any(|(a, b, ly)| {
            (ly - ty).abs() < self.text
                && xm - half < *b + 0.3 * self.text
                && xm + half > *a - 0.3 * self.text
        }) {
            ty += step;
        }
        self.labels.push((xm - half, xm + half, ty));
        self.text(xm, ty, "middle", label);
    }

    /// A dimension along y between y1 and y2, its line at x, extension lines from `from_x`.
    fn dim_y(&mut self, y1: f64, y2: f64, x: f64, from_x: f64, label: &str) {
        self.line(from_x, y1, x, y1, "ext");
        self.line(from_x, y2, x, y2, "ext");
        self.line(x, y1, x, y2, "dim");
        self.tick(x, y1);
        self.tick(x, y2);
        let (dx, anchor) = if x >= from_x {
            (0.6, "start")
        } else {
            (-0.6, "end")
        };
        self.text(
            x + dx * self.text,
            (y1 + y2) / 2.0 + 0.35 * self.text,
            anchor,
            label,
        );
    }

    /// A closed polygon, filled black (arrow heads, flags).
    fn filled(&mut self, points: &[(f64, f64)]) {
        let pts: Vec<String> = points
            .iter()
            .map(|(x, y)| format!("{},{}", n(*x), n(*y)))
            .collect();
        let _ = writeln!(
            self.body,
            r##"<polygon fill="#000" stroke="none" points="{}"/>"##,
            pts.join(" ")
        );
    }

    /// A weld symbol in the layout of AWS A2.4: an arrow to the weld at `tip`, the reference
    /// line from `at` to the right, the arrow-side element below it and the other-side element
    /// above, the size left of the weld symbol and the length (and pitch) right of it, the
    /// all-around circle and the field flag at the joint of arrow and reference line, and the
    /// tail with its note at the far end.
    fn weld_symbol(&mut self, tip: (f64, f64), at: (f64, f64), sym: &WeldSymbol) {
        let t = self.text;
        let (x0, y) = at;
        let x1 = x0 + 12.0 * t;
        self.line(x0, y, tip.0, tip.1, "dim");
        self.line(x0, y, x1, y, "part");
        // the arrow head, pointing along the leader to the weld
        let (dx, dy) = (tip.0 - x0, tip.1 - y);
        let len = (dx * dx + dy * dy).sqrt().max(1e-9);
        let (ux, uy) = (dx / len, dy / len);
        let (hl, hw) = (1.2 * t, 0.35 * t);
        let base = (tip.0 - ux * hl, tip.1 - uy * hl);
        self.filled(&[
            tip,
            (base.0 - uy * hw, base.1 + ux * hw),
            (base.0 + uy * hw, base.1 - ux * hw),
        ]);
        let sx = x0 + 4.5 * t;
        if let Some(e) = &sym.arrow_side {
            self.weld_element(sx, y, 1.0, e);
        }
        if let Some(e) = &sym.other_side {
            self.weld_element(sx, y, -1.0, e);
        }
        if sym.all_around {
            self.circle(x0, y, 0.6 * t, "dim");
        }
        if sym.field {
            self.line(x0, y, x0, y - 2.2 * t, "dim");
            self.filled(&[
                (x0, y - 2.2 * t),
                (x0 + 1.2 * t, y - 1.8 * t),
                (x0, y - 1.4 * t),
            ]);
        }
        if let Some(note) = &sym.tail {
            self.line(x1, y, x1 + 0.8 * t, y - 0.6 * t, "dim");
            self.line(x1, y, x1 + 0.8 * t, y + 0.6 * t, "dim");
            self.text(x1 + 1.2 * t, y + 0.35 * t, "start", note);
        }
    }

    /// One element of a weld symbol, below the reference line (`side` = 1, arrow side) or above
    /// it (`side` = −1, other side): the fillet's triangle with its upright leg on the left, or the
    /// flare-bevel's straight leg and arc.
    fn weld_element(&mut self, sx: f64, y: f64, side: f64, e: &SymbolElement) {
        let t = self.text;
        let h = 1.2 * t;
        match e.kind {
            WeldKind::Fillet => {
                self.line(sx, y, sx, y + side * h, "dim");
                self.line(sx, y + side * h, sx + h, y, "dim");
            }
            WeldKind::FlareBevelGroove => {
                self.line(sx, y, sx, y + side * h, "dim");
                let _ = writeln!(
                    self.body,
                    r#"<path {} d="M {} {} Q {} {} {} {}"/>"#,
                    self.look("dim"),
                    n(sx + 0.9 * h),
                    n(y),
                    n(sx + 0.2 * h),
                    n(y + side * h / 2.0),
                    n(sx + 0.9 * h),
                    n(y + side * h)
                );
            }
        }
        if e.flush {
            // the flush contour: a straight bar just beyond the symbol, away from the line
            let yc = y + side * (h + 0.35 * t);
            self.line(sx - 0.1 * h, yc, sx + 1.1 * h, yc, "dim");
        }
        let baseline = if side > 0.0 {
            y + 0.35 * t + h / 2.0
        } else {
            y + 0.35 * t - h / 2.0
        };
        self.text(sx - 0.4 * t, baseline, "end", &e.size);
        if !e.length_pitch.is_empty() {
            self.text(sx + h + 0.4 * t, baseline, "start", &e.length_pitch);
        }
    }

    /// An oblique tick marking the end of a dimension line.
    fn tick(&mut self, x: f64, y: f64) {
        let t = self.text * 0.4;
        self.line(x - t, y + t, x + t, y - t, "tick");
    }
}

/// The finished SVG: the drawing framed in a view box with a margin, with title and scale lines.
fn finish(
    d: Drawing,
    bounds: (f64, f64, f64, f64),
    title: &str,
    project: &str,
    scale: f64,
) -> (String, f64) {
    let (x0, y0, x1, y1) = bounds;
    let (x0, x1) = (x0.min(d.text_x.0), x1.max(d.text_x.1));
    let margin = 2.0 * d.text;
    let (vx, vy) = (x0 - margin, y0 - margin - 4.0 * d.text);
    let (vw, vh) = (
        x1 - x0 + 2.0 * margin,
        y1 - y0 + 2.0 * margin + 4.0 * d.text,
    );
    let ratio = if scale >= 1.0 {
        "1:1".to_string()
    } else {
        format!("1:{}", n(1.0 / scale))
    };
    let mut s = String::new();
    let _ = writeln!(
        s,
        r#"<svg xmlns="http://www.w3.org/2000/svg" width="{}mm" height="{}mm" viewBox="{} {} {} {}" role="img">"#,
        n(vw * scale),
        n(vh * scale),
        n(vx),
        n(vy),
        n(vw),
        n(vh)
    );
    let _ = writeln!(s, "<title>{} — {}</title>", escape(title), escape(project));
    let _ = writeln!(
        s,
        r#"<text x="{}" y="{}" font-size="{}" font-family="sans-serif" font-weight="bold">{}</text>"#,
        n(x0),
        n(y0 - 1.3 * d.text),
        n(d.text * 1.2),
        escape(&format!("{title} — scale {ratio} when printed at 100 %"))
    );
    let _ = writeln!(
        s,
        r#"<text x="{}" y="{}" font-size="{}" font-family="sans-serif">{}</text>"#,
        n(x0),
        n(y0 - 3.0 * d.text),
        n(d.text),
        escape(project)
    );
    s.push_str(&d.body);
    s.push_str("</svg>\n");
    (s, vw * scale)
}

/// Labels of the layers of a stack, spread apart so thin layers stay readable, each joined to
/// its layer by a leader.
struct Labels {
    next: f64,
    from_x: f64,
    x: f64,
}

impl Labels {
    fn put(&mut self, d: &mut Drawing, at: f64, text: &str) {
        let y = at.max(self.next);
        self.next = y + 1.3 * d.text;
        d.line(self.from_x, at, self.x - 0.3 * d.text, y, "ext");
        d.text(self.x, y + 0.35 * d.text, "start", text);
    }
}

/// Draw the bolt stack of a fastener set in section at (x, y) (bolt axis, top of the head): the
/// head, the washers, the plies from the head side (solid plies hatched grey, gaps open), the
/// nut and the shank to the bolt length. Returns the bottom y and the right x reached.
fn draw_stack(
    d: &mut Drawing,
    set: Option<&FastenerSet>,
    b: &Bolting,
    x: f64,
    y: f64,
    units: UnitSystem,
) -> (f64, f64) {
    let Some(set) = set.filter(|s| !s.plies.is_empty()) else {
        let why = set
            .map(|s| s.problems.join("; "))
            .filter(|p| !p.is_empty())
            .unwrap_or_else(|| "no fastener set for this detail".into());
        d.text(
            x,
            y + d.text,
            "middle",
            &format!("stack not worked out: {why}"),
        );
        return (y + 2.0 * d.text, x + 20.0 * d.text);
    };
    let dia = b.thread.d.to_mm();
    let size = b.bolt_type.size_for(b.thread.d);
    let head = size.and_then(|z| z.head_height).map(|l| l.to_mm());
    let head_w = size
        .and_then(|z| z.across_flats)
        .map(|l| l.to_mm())
        .unwrap_or(1.5 * dia);
    let nut_w = b
        .nut
        .as_ref()
        .and_then(|nut| nut.size_for(b.thread.d))
        .and_then(|z| z.across_flats)
        .map(|l| l.to_mm())
        .unwrap_or(head_w);
    let washer_od = b
        .washer
        .as_ref()
        .and_then(|w| w.size_for(b.thread.d))
        .map(|w| w.od.to_mm())
        .unwrap_or(2.0 * dia);
    let ply_w = 4.0 * dia;
    let label_x = x + ply_w / 2.0 + 4.0 * d.text;
    let mut labels = Labels {
        next: f64::NEG_INFINITY,
        from_x: x + ply_w / 2.0,
        x: label_x,
    };
    let head_h = head.unwrap_or(0.0);
    let mut cy = y;
    if head_h > 0.0 {
        d.rect(x - head_w / 2.0, cy, head_w, head_h, "part cut");
        labels.put(d, cy + head_h / 2.0, "head");
    }
    cy += head_h;
    let bearing_face = cy;
    let washer = |d: &mut Drawing, labels: &mut Labels, cy: &mut f64, w: &WasherUse| {
        let t = w.thickness.to_mm();
        d.rect(x - washer_od / 2.0, *cy, washer_od, t, "part");
        labels.put(d, *cy + t / 2.0, &format!("washer {}", w.name));
        *cy += t;
    };
    for w in set.washers.iter().filter(|w| w.side == WasherSide::Head) {
        washer(d, &mut labels, &mut cy, w);
    }
    let grip_top = cy;
    for p in &set.plies {
        let t = p.thickness.to_mm();
        let solid = p.kind == PlyKind::Solid;
        if solid {
            d.rect(x - ply_w / 2.0, cy, ply_w, t, "part cut");
        } else {
            d.line(x - ply_w / 2.0, cy, x - ply_w / 2.0, cy + t, "part hidden");
            d.line(x + ply_w / 2.0, cy, x + ply_w / 2.0, cy + t, "part hidden");
        }
        labels.put(d, cy + t / 2.0, &p.name);
        cy += t;
    }
    let grip_bottom = cy;
    for w in set.washers.iter().filter(|w| w.side == WasherSide::Nut) {
        washer(d, &mut labels, &mut cy, w);
    }
    if !set.nut.is_empty() {
        let nut_h = set.nut_height.to_mm();
        d.rect(x - nut_w / 2.0, cy, nut_w, nut_h, "part cut");
        labels.put(d, cy + nut_h / 2.0, &set.nut);
        cy += nut_h;
    }
    let shown = set.length.evaluated_at();
    let shank_end = shown.map(|l| bearing_face + l.to_mm()).unwrap_or(cy);
    d.line(
        x - dia / 2.0,
        bearing_face,
        x - dia / 2.0,
        shank_end,
        "part",
    );
    d.line(
        x + dia / 2.0,
        bearing_face,
        x + dia / 2.0,
        shank_end,
        "part",
    );
    d.line(x - dia / 2.0, shank_end, x + dia / 2.0, shank_end, "part");
    let dim_x = x - ply_w / 2.0 - 2.0 * d.text;
    d.dim_y(
        grip_top,
        grip_bottom,
        dim_x,
        x - ply_w / 2.0,
        &format!(
            "grip {}",
            show_length(Length::mm(grip_bottom - grip_top), units, false)
        ),
    );
    let length_text = match &set.length {
        BoltLength::Chosen(l) | BoltLength::Fixed(l) => {
            format!("bolt length {}", show_length(*l, units, false))
        }
        BoltLength::NoneFits { shown_at, .. } => format!(
            "no bolt length fits: drawn at {}",
            show_length(*shown_at, units, false)
        ),
        BoltLength::Unknown => "bolt length not worked out".to_string(),
    };
    let bottom = shank_end.max(cy);
    d.text(x, bottom + 1.5 * d.text, "middle", &length_text);
    let mut end = bottom + 1.5 * d.text;
    if head.is_none() {
        end += 1.3 * d.text;
        d.text(
            x,
            end,
            "middle",
            "head height not in the catalogue: head not drawn",
        );
    }
    (end + 1.5 * d.text, label_x + 14.0 * d.text)
}

/// The hole size of a detail along the force (its diameter for a round hole), or `None` where
/// Table J3.3 does not give one.
pub fn hole_diameter(model: &Model, b: &Bolting) -> Option<Length> {
    bolting::hole(model.project.edition, b)
        .ok()
        .map(|h| h.along)
}

/// Positions of the bolt lines across the plate, centred on its width.
fn across_positions(b: &Bolting, width: f64) -> Vec<f64> {
    let g = b.gauge.map(|g| g.to_mm()).unwrap_or(0.0);
    let k = b.across.max(1) as usize;
    (0..k)
        .map(|j| width / 2.0 + (j as f64 - (k as f64 - 1.0) / 2.0) * g)
        .collect()
}

/// The drawing of a tab detail: the tab face with holes, the tube end, the welds, the mating
/// plate's outline, and the bolt stack in section.
fn tab_drawing(
    model: &Model,
    detail: &Detail,
    t: &TabDetail,
    units: UnitSystem,
    set: Option<&FastenerSet>,
    scale: f64,
) -> (String, f64) {
    let b = &detail.bolts;
    let e = t.tab.end_distance.to_mm();
    let p = b.pitch.map(|p| p.to_mm()).unwrap_or(0.0);
    let along = b.along.max(1) as usize;
    let x_last = e + (along as f64 - 1.0) * p;
    let x_tube = x_last + t.tab.clear_length.to_mm();
    let lw = t.weld.length().to_mm();
    let lapped = matches!(t.weld, TabWeld::FlareBevel(_));
    let length = x_tube + lw;
    let w = t.tab.width.to_mm();
    let mate_w = t.mate.width.to_mm();
    let mate_x0 = e - t.mate.back_distance.to_mm();
    let mate_x1 = x_last + t.mate.end_distance.to_mm();
    let overall_x0 = mate_x0.min(0.0);
    let mut d = Drawing::new(TEXT_MM / scale);
    let tx = d.text;
    let cy = 0.0;
    let y_top = cy - w / 2.0;
    let y_bot = cy + w / 2.0;
    // the tube: outside walls across the tab's width, drawn past the weld
    let tube_b = match member_width(model, &detail.id) {
        Some(v) => v,
        None => w,
    };
    let tube_end = length + 2.0 * tx;
    d.line(x_tube, cy - tube_b / 2.0, x_tube, cy + tube_b / 2.0, "part");
    d.line(
        x_tube,
        cy - tube_b / 2.0,
        tube_end,
        cy - tube_b / 2.0,
        "part",
    );
    d.line(
        x_tube,
        cy + tube_b / 2.0,
        tube_end,
        cy + tube_b / 2.0,
        "part",
    );
    d.text(tube_end, cy - tube_b / 2.0 - 0.5 * tx, "end", "member");
    // the mating plate's outline
    d.rect(
        mate_x0,
        cy - mate_w / 2.0,
        mate_x1 - mate_x0,
        mate_w,
        "mate",
    );
    d.text(
        mate_x0,
        cy - mate_w / 2.0 - 0.5 * tx,
        "start",
        "mate outline",
    );
    // the tab: its part inside a slotted tube hidden; lapped on the face, all of it in view
    let inside = if lapped { "part" } else { "part hidden" };
    d.line(0.0, y_top, x_tube, y_top, "part");
    d.line(0.0, y_bot, x_tube, y_bot, "part");
    d.line(0.0, y_top, 0.0, y_bot, "part");
    d.line(x_tube, y_top, length, y_top, inside);
    d.line(x_tube, y_bot, length, y_bot, inside);
    d.line(length, y_top, length, y_bot, inside);
    // holes
    let dh = hole_diameter(model, b).map(|l| l.to_mm());
    let ys: Vec<f64> = across_positions(b, w).iter().map(|y| y - w / 2.0).collect();
    for i in 0..along {
        let x = e + i as f64 * p;
        for y in &ys {
            match dh {
                Some(h) => d.circle(x, *y, h / 2.0, "part"),
                None => d.circle(x, *y, b.thread.d.to_mm() / 2.0, "part hidden"),
            }
            d.line(x - 0.6 * tx, *y, x + 0.6 * tx, *y, "ext");
            d.line(x, *y - 0.6 * tx, x, *y + 0.6 * tx, "ext");
        }
    }
    // welds: four lines at both slotted walls, both faces of the tab; or one flare bevel along
    // each edge of a lapped tab
    let weld_y = [cy - tube_b.min(w) / 2.0, cy + tube_b.min(w) / 2.0];
    for y in weld_y {
        d.line(x_tube, y, x_tube + lw, y, "weld");
    }
    let call = tab_weld_call(t, corner_radius(model, &detail.id));
    let weld_text = match describe(&call, units) {
        Ok(s) => format!("weld: {s}"),
        Err(e) => format!("weld call cannot be written: {e}"),
    };
    let symbol = weld_symbol(&call, units).ok();
    // dimensions along the tab, above it
    let top = y_top.min(cy - mate_w / 2.0).min(cy - tube_b / 2.0);
    let row1 = top - 2.5 * tx;
    d.dim_x(
        0.0,
        e,
        row1,
        y_top,
        &format!("end {}", show_length(t.tab.end_distance, units, false)),
    );
    if along > 1 {
        for i in 0..along - 1 {
            let x = e + i as f64 * p;
            let label = match b.pitch {
                Some(pl) => format!("pitch {}", show_length(pl, units, false)),
                None => "pitch".to_string(),
            };
            d.dim_x(x, x + p, row1, y_top, &label);
        }
    }
    d.dim_x(
        x_last,
        x_tube,
        row1,
        y_top,
        &format!("clear {}", show_length(t.tab.clear_length, units, false)),
    );
    d.dim_x(
        x_tube,
        length,
        row1 - 2.5 * tx,
        y_top,
        &format!(
            "{} {}",
            if lapped { "lap on face" } else { "in slot" },
            show_length(t.weld.length(), units, false)
        ),
    );
    // mate distances, below
    let bottom = y_bot.max(cy + mate_w / 2.0).max(cy + tube_b / 2.0);
    let row2 = bottom + 2.0 * tx;
    d.dim_x(
        mate_x0,
        e,
        row2,
        cy + mate_w / 2.0,
        &format!(
            "mate back {}",
            show_length(t.mate.back_distance, units, false)
        ),
    );
    d.dim_x(
        x_last,
        mate_x1,
        row2 + 2.5 * tx,
        cy + mate_w / 2.0,
        &format!(
            "mate end {}",
            show_length(t.mate.end_distance, units, false)
        ),
    );
    // across: edge distance, gauge, width, at the free end
    let left = overall_x0 - 2.0 * tx;
    let first = ys.first().copied().unwrap_or(cy);
    let edge = Length::mm(first - y_top);
    d.dim_y(
        y_top,
        first,
        left,
        0.0,
        &format!("edge {}", show_length(edge, units, false)),
    );
    if ys.len() > 1 {
        if let Some(g) = b.gauge {
            d.dim_y(
                first,
                first + g.to_mm(),
                left,
                0.0,
                &format!("gauge {}", show_length(g, units, false)),
            );
        }
    }
    d.dim_y(
        y_top,
        y_bot,
        tube_end + 2.0 * tx,
        length,
        &format!("tab width {}", show_length(t.tab.width, units, false)),
    );
    // hole and weld notes
    let mut note_y = row2 + 6.0 * tx;
    let hole_text = match dh {
        Some(h) => format!(
            "{} hole{} ⌀ {} ({})",
            b.count(),
            if b.count() == 1 { "" } else { "s" },
            show_length(Length::mm(h), units, false),
            hole_name(b)
        ),
        None => "hole size not given by Table J3.3: see the check table".to_string(),
    };
    d.text(0.0, note_y, "start", &hole_text);
    note_y += 1.5 * tx;
    d.text(0.0, note_y, "start", &weld_text);
    note_y += 1.5 * tx;
    d.text(
        0.0,
        note_y,
        "start",
        if lapped {
            "along both edges of the tab at the tube's corners (2 lines), filled flush"
        } else {
            "at both slotted walls, both faces of the tab (4 lines)"
        },
    );
    note_y += 1.5 * tx;
    d.text(
        0.0,
        note_y,
        "start",
        &format!(
            "tab {} × {} × {}, {}",
            show_length(t.tab.thickness, units, false),
            show_length(t.tab.width, units, false),
            show_length(Length::mm(length), units, false),
            t.tab.material.name
        ),
    );
    if let Some(oc) = &t.on_chord {
        let call = describe(&chord_weld_call(t, oc), units)
            .unwrap_or_else(|e| format!("the weld call cannot be written: {e}"));
        note_y += 1.5 * tx;
        d.text(
            0.0,
            note_y,
            "start",
            &format!("mate shop-welded {} to the chord face", oc.plate.as_str()),
        );
        note_y += 1.5 * tx;
        d.text(0.0, note_y, "start", &format!("mate to chord: {call}"));
    }
    // the bolt stack, below the plan and its notes
    let stack_top = note_y + 4.0 * tx;
    let sx = x_tube / 2.0;
    d.text(0.0, stack_top - 1.5 * tx, "start", &stack_title(set));
    let (sb, sr) = draw_stack(&mut d, set, b, sx, stack_top, units);
    // the weld symbol, above and right of the slot: the arrow to the upper weld line
    let symbol_at = (length + 2.0 * tx, row1 - 5.5 * tx);
    if let Some(sym) = &symbol {
        d.weld_symbol((x_tube + 0.3 * lw, weld_y[0]), symbol_at, sym);
    }
    let right = sr.max(tube_end).max(symbol_at.0 + 13.0 * tx);
    let bounds = (left, symbol_at.1 - 3.0 * tx, right, sb + tx);
    finish(
        d,
        bounds,
        &format!("detail {} (tab)", detail.id),
        &project_line(model),
        scale,
    )
}

/// The project and revision, so a drawing printed alone says where it belongs.
fn project_line(model: &Model) -> String {
    format!(
        "{}, revision {}",
        model.project.title, model.project.revision
    )
}

fn stack_title(set: Option<&FastenerSet>) -> String {
    match set {
        Some(s) => format!("bolt stack in section, as at {}", s.connection),
        None => "bolt stack in section".into(),
    }
}

pub fn hole_name(b: &Bolting) -> &'static str {
    use crate::standards::aisc360::j3_bolts::HoleType;
    if b.hole_override.is_some() {
        return "diameter set by the detail";
    }
    match b.hole {
        HoleType::Standard => "standard hole",
        HoleType::Oversized => "oversized hole",
        HoleType::ShortSlot => "short slot, length shown",
        HoleType::LongSlot => "long slot, length shown",
    }
}

/// The weld call of a tab's welds: in a slot, a fillet on both faces of the tab; lapped on a
/// face, a flare-bevel groove filled flush with its effective throat (Table J2.2) from the
/// corner radius `radius` of the tube. The weld length is given.
pub fn tab_weld_call(t: &TabDetail, radius: Option<Length>) -> WeldCall {
    match &t.weld {
        TabWeld::Slot(w) => WeldCall {
            kind: WeldKind::Fillet,
            size: w.size,
            side: WeldSide::Both,
            length: Some(w.length),
            pitch: None,
            all_around: false,
            field: false,
            flush: false,
            tail: None,
        },
        TabWeld::FlareBevel(w) => WeldCall {
            kind: WeldKind::FlareBevelGroove,
            size: radius
                .map(|r| j2::flare_groove_effective_throat(j2::FlareGroove::Bevel, w.process, r).0)
                .unwrap_or(Length::mm(0.0)),
            side: WeldSide::Arrow,
            length: Some(w.length),
            pitch: None,
            all_around: false,
            field: false,
            flush: true,
            tail: Some(w.process.label().to_string()),
        },
    }
}

/// The smallest outside corner radius of the rectangular members using a detail (the smallest
/// flare-bevel throat); none when no such member has one.
pub fn corner_radius(model: &Model, detail: &str) -> Option<Length> {
    model
        .members
        .iter()
        .filter(|m| m.start.as_deref() == Some(detail) || m.end.as_deref() == Some(detail))
        .filter_map(|m| m.section.r_outer)
        .reduce(|a, b| a.min(b))
}

/// The weld call of a mate's fillets to a chord face: one side (arrow side) or both, along the
/// plate's welded edge.
pub fn chord_weld_call(t: &TabDetail, oc: &crate::model::OnChord) -> WeldCall {
    WeldCall {
        kind: WeldKind::Fillet,
        size: oc.weld.size,
        side: if oc.weld.sides == 2 {
            WeldSide::Both
        } else {
            WeldSide::Arrow
        },
        length: Some(oc.welded_length(&t.mate)),
        pitch: None,
        all_around: false,
        field: false,
        tail: None,
        flush: false,
    }
}

/// The weld call of a tapped detail's end weld: a fillet all round the tube end.
pub fn end_weld_call(t: &TappedDetail) -> WeldCall {
    WeldCall {
        kind: WeldKind::Fillet,
        size: t.weld.size,
        side: WeldSide::Arrow,
        length: None,
        pitch: None,
        all_around: true,
        field: false,
        flush: false,
        tail: None,
    }
}

/// The outside width of the first member that uses a detail, across the bolted face (the
/// section's `b`), for drawing the tube end. Members of one detail may differ; the drawing shows
/// the first.
fn member_width(model: &Model, detail: &str) -> Option<f64> {
    let m = model
        .members
        .iter()
        .find(|m| m.start.as_deref() == Some(detail) || m.end.as_deref() == Some(detail))?;
    match m.section.shape {
        crate::catalogue::Shape::Rect { b, .. } => Some(b.to_mm()),
        crate::catalogue::Shape::Round { d } => Some(d.to_mm()),
    }
}

/// The member's section and wall of the first member using a detail.
fn member_section<'m>(model: &'m Model, detail: &str) -> Option<&'m crate::catalogue::Section> {
    model
        .members
        .iter()
        .find(|m| m.start.as_deref() == Some(detail) || m.end.as_deref() == Some(detail))
        .map(|m| &m.section)
}

/// The drawing of a sleeve detail: the member end with the sleeve inside (hidden lines), the
/// through-bolt holes, and the bolt stack through both walls of both tubes.
fn sleeve_drawing(
    model: &Model,
    detail: &Detail,
    s: &SleeveDetail,
    units: UnitSystem,
    set: Option<&FastenerSet>,
    scale: f64,
) -> (String, f64) {
    let b = &detail.bolts;
    let ins = s.insertion.to_mm();
    let e = s.end_distance.to_mm();
    let p = b.pitch.map(|p| p.to_mm()).unwrap_or(0.0);
    let along = b.along.max(1) as usize;
    let member = member_section(model, &detail.id);
    let (mb, mt) = match member {
        Some(sec) => (
            match sec.shape {
                crate::catalogue::Shape::Rect { h, .. } => h.to_mm(),
                crate::catalogue::Shape::Round { d } => d.to_mm(),
            },
            sec.t_nominal.to_mm(),
        ),
        None => (0.0, 0.0),
    };
    let sb = match s.section.shape {
        crate::catalogue::Shape::Rect { h, .. } => h.to_mm(),
        crate::catalogue::Shape::Round { d } => d.to_mm(),
    };
    let reach = ins + 15.0;
    let mut d = Drawing::new(TEXT_MM / scale);
    let tx = d.text;
    // member from the splice line x = 0 into +x; sleeve from -reach (the other member) to +ins
    let (top, bot) = (-mb / 2.0, mb / 2.0);
    d.line(0.0, top, 0.0, bot, "part");
    d.line(0.0, top, reach, top, "part");
    d.line(0.0, bot, reach, bot, "part");
    d.line(0.0, top + mt, reach, top + mt, "part hidden");
    d.line(0.0, bot - mt, reach, bot - mt, "part hidden");
    d.text(reach, top - 0.5 * tx, "end", "member");
    d.text(0.0, top - 0.5 * tx, "middle", "member end");
    let (stop, sbot) = (-sb / 2.0, sb / 2.0);
    d.line(-15.0, stop, ins, stop, "part hidden");
    d.line(-15.0, sbot, ins, sbot, "part hidden");
    d.line(ins, stop, ins, sbot, "part hidden");
    d.text(-15.0, sbot + 1.3 * tx, "start", "sleeve (hidden)");
    let dh = hole_diameter(model, b).map(|l| l.to_mm());
    for i in 0..along {
        let x = e + i as f64 * p;
        match dh {
            Some(h) => d.circle(x, 0.0, h / 2.0, "part"),
            None => d.circle(x, 0.0, b.thread.d.to_mm() / 2.0, "part hidden"),
        }
        d.line(x - 0.6 * tx, 0.0, x + 0.6 * tx, 0.0, "ext");
        d.line(x, -0.6 * tx, x, 0.6 * tx, "ext");
    }
    let row1 = top - 2.5 * tx;
    d.dim_x(
        0.0,
        e,
        row1,
        top,
        &format!("end {}", show_length(s.end_distance, units, false)),
    );
    let x_last = e + (along as f64 - 1.0) * p;
    if along > 1 {
        if let Some(pl) = b.pitch {
            for i in 0..along - 1 {
                let x = e + i as f64 * p;
                d.dim_x(
                    x,
                    x + p,
                    row1,
                    top,
                    &format!("pitch {}", show_length(pl, units, false)),
                );
            }
        }
    }
    let row2 = bot + 2.5 * tx;
    d.dim_x(
        0.0,
        ins,
        row2,
        bot,
        &format!(
            "sleeve insertion {}",
            show_length(s.insertion, units, false)
        ),
    );
    d.dim_x(
        x_last,
        ins,
        row2 + 2.5 * tx,
        bot,
        &format!(
            "sleeve end {}",
            show_length(Length::mm(ins - x_last), units, false)
        ),
    );
    let mut note_y = row2 + 6.0 * tx;
    let hole_text = match dh {
        Some(h) => format!(
            "{} through-hole{} ⌀ {} in member and sleeve ({}), both walls",
            b.count(),
            if b.count() == 1 { "" } else { "s" },
            show_length(Length::mm(h), units, false),
            hole_name(b)
        ),
        None => "hole size not given by Table J3.3: see the check table".to_string(),
    };
    d.text(-15.0, note_y, "start", &hole_text);
    note_y += 1.5 * tx;
    d.text(
        -15.0,
        note_y,
        "start",
        &format!("sleeve {}, {}", s.section.name, s.material.name),
    );
    if let Some(end) = s.welded_into {
        note_y += 1.5 * tx;
        d.text(
            -15.0,
            note_y,
            "start",
            &format!(
                "sleeve shop-welded into the member whose {} end this is: weld not given in the model",
                end.as_str()
            ),
        );
    }
    // the bolt stack, below the elevation and its notes
    let stack_top = note_y + 4.0 * tx;
    let sx = ins / 2.0;
    d.text(-15.0, stack_top - 1.5 * tx, "start", &stack_title(set));
    let (stack_bottom, sr) = draw_stack(&mut d, set, b, sx, stack_top, units);
    let bounds = (
        -15.0 - 2.0 * tx,
        row1 - 5.0 * tx,
        sr.max(reach),
        stack_bottom + 2.0 * tx,
    );
    finish(
        d,
        bounds,
        &format!("detail {} (sleeve)", detail.id),
        &project_line(model),
        scale,
    )
}

/// The drawing of a tapped detail: the tube end with its plug (in section), the plate under the
/// screw head, the screw (hidden) into the plug, the end weld, and the stack in section.
fn tapped_drawing(
    model: &Model,
    detail: &Detail,
    t: &TappedDetail,
    units: UnitSystem,
    set: Option<&FastenerSet>,
    scale: f64,
) -> (String, f64) {
    let b = &detail.bolts;
    let (mb, mt) = match member_section(model, &detail.id) {
        Some(sec) => (
            match sec.shape {
                crate::catalogue::Shape::Rect { h, .. } => h.to_mm(),
                crate::catalogue::Shape::Round { d } => d.to_mm(),
            },
            sec.t_nominal.to_mm(),
        ),
        None => (0.0, 0.0),
    };
    let tp = t.plug.thickness.to_mm();
    let le = t.plug.engagement.to_mm();
    let tpl = t.plate.thickness.to_mm();
    let dia = b.thread.d.to_mm();
    let reach = (3.0 * mb).max(60.0);
    let mut d = Drawing::new(TEXT_MM / scale);
    let tx = d.text;
    let (top, bot) = (-mb / 2.0, mb / 2.0);
    // the plate under the head at x < -tp, the plug from -tp to 0, the tube from 0 on
    let plate_h = mb * 1.8;
    d.rect(-tp - tpl, -plate_h / 2.0, tpl, plate_h, "mate");
    d.text(
        -tp - tpl,
        -plate_h / 2.0 - 0.5 * tx,
        "end",
        "plate under the head",
    );
    d.rect(-tp, top, tp, mb, "part cut");
    d.text(-tp / 2.0, bot + 1.3 * tx, "middle", "plug");
    d.line(0.0, top, reach, top, "part");
    d.line(0.0, bot, reach, bot, "part");
    d.line(0.0, top + mt, reach, top + mt, "part hidden");
    d.line(0.0, bot - mt, reach, bot - mt, "part hidden");
    d.text(reach, top - 0.5 * tx, "end", "member");
    // the end weld at the tube's outer corners
    let w = t.weld.size.to_mm();
    for y in [top, bot] {
        d.line(0.0, y, w, y, "weld");
    }
    // the screw on the axis, hidden, from the plate's outer face through the engagement
    let screw_end = -tp
        - tpl
        - set
            .and_then(|s| s.washers.first())
            .map_or(0.0, |w| w.thickness.to_mm())
        + set
            .and_then(|s| s.length.evaluated_at())
            .map_or(tpl + le, |l| l.to_mm());
    for y in [-dia / 2.0, dia / 2.0] {
        d.line(-tp - tpl, y, screw_end, y, "part hidden");
    }
    let row1 = top - 2.5 * tx;
    d.dim_x(
        -tp,
        0.0,
        row1,
        top,
        &format!("plug {}", show_length(t.plug.thickness, units, false)),
    );
    d.dim_x(
        -tp,
        -tp + le,
        row1 - 2.5 * tx,
        top,
        &format!("engaged {}", show_length(t.plug.engagement, units, false)),
    );
    // the weld symbol, above the tube beyond the dimensions: the arrow to the upper weld
    let symbol_at = (w + 4.0 * tx, row1 - 5.5 * tx);
    if let Ok(sym) = weld_symbol(&end_weld_call(t), units) {
        d.weld_symbol((w / 2.0, top), symbol_at, &sym);
    }
    let mut note_y = bot + 4.0 * tx;
    let call = describe(&end_weld_call(t), units).unwrap_or_else(|e| e.to_string());
    let hole = match hole_diameter(model, b) {
        Some(h) => format!(
            "plate hole ⌀ {} ({})",
            show_length(h, units, false),
            hole_name(b)
        ),
        None => "plate hole: not given by Table J3.3, see the checks".into(),
    };
    for note in [
        format!("end weld: {call}"),
        format!("{} tapped through the plug", b.thread.designation),
        hole,
    ] {
        d.text(-tp - tpl, note_y, "start", &note);
        note_y += 1.5 * tx;
    }
    let stack_top = note_y + 4.0 * tx;
    d.text(-tp - tpl, stack_top - 1.5 * tx, "start", &stack_title(set));
    let (stack_bottom, sr) = draw_stack(&mut d, set, b, reach / 2.0, stack_top, units);
    let bounds = (
        -tp - tpl - 12.0 * tx,
        symbol_at.1 - 3.0 * tx,
        sr.max(reach).max(symbol_at.0 + 13.0 * tx),
        stack_bottom + 2.0 * tx,
    );
    finish(
        d,
        bounds,
        &format!("detail {} (tapped)", detail.id),
        &project_line(model),
        scale,
    )
}

/// The SVG drawing of one detail, its bolt stack as the fastener set `set` (of one of the
/// connections using the detail) gives it.
pub fn detail_drawing(
    model: &Model,
    detail: &Detail,
    units: UnitSystem,
    set: Option<&FastenerSet>,
) -> String {
    let draw = |scale: f64| match &detail.kind {
        DetailKind::Tab(t) => tab_drawing(model, detail, t, units, set, scale),
        DetailKind::Sleeve(s) => sleeve_drawing(model, detail, s, units, set, scale),
        DetailKind::Tapped(t) => tapped_drawing(model, detail, t, units, set, scale),
    };
    let mut last = String::new();
    for scale in SCALES {
        let (svg, width) = draw(scale);
        if width <= PAGE_WIDTH_MM {
            return svg;
        }
        last = svg;
    }
    last
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn escapes_markup() {
        assert_eq!(
            escape("<script>alert('x') & \"y\"</script>"),
            "&lt;script&gt;alert(&#39;x&#39;) &amp; &quot;y&quot;&lt;/script&gt;"
        );
    }

    #[test]
    fn a_dimension_draws_its_label_escaped() {
        let mut d = Drawing::new(2.0);
        d.dim_x(0.0, 10.0, -5.0, 0.0, "a<b");
        assert!(d.body.contains("a&lt;b"));
        assert_eq!(d.body.matches("<line").count(), 5);
    }

    /// Two short dimensions side by side with labels wider than themselves: the second label
    /// steps up clear of the first; a third, far away, stays on the line's own level.
    #[test]
    fn a_crowded_dimension_label_steps_clear_of_its_neighbour() {
        let mut d = Drawing::new(2.0);
        d.dim_x(0.0, 3.0, -5.0, 0.0, "end 1-1/2 in");
        d.dim_x(3.0, 6.0, -5.0, 0.0, "pitch 1-1/2 in");
        d.dim_x(100.0, 103.0, -5.0, 0.0, "clear 1 in");
        let ys: Vec<f64> = d.labels.iter().map(|l| l.2).collect();
        assert_eq!(ys[0], -5.0 - 0.6 * 2.0);
        assert!(ys[1] < ys[0] - 2.0 + 1e-9, "{ys:?}");
        assert_eq!(ys[2], ys[0]);
    }

    fn symbol_of(call: &WeldCall) -> WeldSymbol {
        weld_symbol(call, UnitSystem::Us).unwrap()
    }

    /// AWS A2.4 layout (common practice of the symbol): a both-sides fillet has one triangle
    /// below the reference line (arrow side) and one above (other side), each with its size on
    /// the left and its length on the right.
    #[test]
    fn a_both_sides_fillet_has_an_element_on_each_side_of_the_reference_line() {
        let call = WeldCall {
            kind: WeldKind::Fillet,
            size: Length::inch(0.1875),
            side: WeldSide::Both,
            length: Some(Length::inch(2.0)),
            pitch: None,
            all_around: false,
            field: true,
            tail: Some("E70".into()),
            flush: false,
        };
        let mut d = Drawing::new(2.0);
        d.weld_symbol((0.0, 10.0), (10.0, 0.0), &symbol_of(&call));
        assert_eq!(d.body.matches(">3/16</text>").count(), 2, "{}", d.body);
        assert_eq!(d.body.matches(">2</text>").count(), 2);
        assert!(d.body.contains(">E70</text>"));
        // arrow head and field flag
        assert_eq!(d.body.matches("<polygon").count(), 2);
        // leader, reference line, 2 × 2 triangle legs, flag staff, 2 tail lines
        assert_eq!(d.body.matches("<line").count(), 9);
        // sizes: the arrow side's baseline below the line (y > 0), the other side's above
        let ys: Vec<f64> = d
            .body
            .lines()
            .filter(|l| l.contains(">3/16</text>"))
            .map(|l| {
                let y = l.split("y=\"").nth(1).unwrap();
                y[..y.find('"').unwrap()].parse().unwrap()
            })
            .collect();
        assert!(
            ys.iter().any(|y| *y > 0.0) && ys.iter().any(|y| *y < 0.0),
            "{ys:?}"
        );
    }

    #[test]
    fn an_all_around_flare_bevel_has_its_circle_and_arc_on_the_arrow_side() {
        let call = WeldCall {
            kind: WeldKind::FlareBevelGroove,
            size: Length::inch(0.125),
            side: WeldSide::Arrow,
            length: None,
            pitch: None,
            all_around: true,
            field: false,
            tail: None,
            flush: false,
        };
        let mut d = Drawing::new(2.0);
        d.weld_symbol((0.0, 10.0), (10.0, 0.0), &symbol_of(&call));
        assert_eq!(d.body.matches("<circle").count(), 1);
        assert_eq!(d.body.matches("<path").count(), 1);
        assert!(d.body.contains(">(0.125)</text>"), "{}", d.body);
        assert_eq!(d.body.matches("<polygon").count(), 1);
        // leader, reference line and the straight leg; a flush contour adds its bar
        assert_eq!(d.body.matches("<line").count(), 3);
        let mut flush = call.clone();
        flush.flush = true;
        let mut d = Drawing::new(2.0);
        d.weld_symbol((0.0, 10.0), (10.0, 0.0), &symbol_of(&flush));
        assert_eq!(d.body.matches("<line").count(), 4);
    }
}
