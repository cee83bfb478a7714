//! AISC 360 J2 — welds (fillet and flare groove welds): strength of the weld metal (J2.4,
//! Table J2.5), strength of the base metal along the weld (J2.4 → J4.2), and the size and length
//! rules of J2.2b (Table J2.4).
//!
//! Equation numbers: J2-1 (β), J2-3 (Rn = Fnw Awe) and J2-5 (directional factor) are the same in
//! 360-16 and 360-22; 360-16 writes the directional form as J2-4 with J2-5, 360-22 as J2-3 with
//! J2-4 (Fnw = 0.60 FEXX kds) and J2-5 (kds). The group combination of J2.4(c) is J2-10a/b in
//! 360-16 and J2-6a/b in 360-22. These numbers are from memory and are kept in one place
//! ([`weld_metal_equation`], [`group_equation`]) so they can be corrected at once.

use crate::standards::{number, Bound, Citation, Input, Requirement, Strength};
use crate::units::{Angle, Area, Force, ForcePerLength, Length, Stress};

use super::Edition;

/// Resistance factor of weld metal in shear, Table J2.5.
pub const PHI_WELD_SHEAR: f64 = 0.75;
/// Safety factor of weld metal in shear, Table J2.5.
pub const OMEGA_WELD_SHEAR: f64 = 2.00;

pub use super::input::InputError;

/// Require a finite value above zero (in internal units).
pub(crate) fn require_positive(
    symbol: &'static str,
    value: f64,
    what: &str,
) -> Result<(), InputError> {
    if value.is_finite() && value > 0.0 {
        Ok(())
    } else {
        Err(InputError::new(
            symbol,
            format!("{what} must be a finite value above zero"),
        ))
    }
}

/// One straight line of fillet weld of uniform leg size.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct FilletLine {
    /// w: leg size of an equal-leg fillet.
    pub size: Length,
    /// l: actual length of the line.
    pub length: Length,
    /// θ: angle between the line of action of the force and the weld's longitudinal axis
    /// (0 = longitudinal, 90° = transverse).
    pub angle: Angle,
    /// Whether the line is an end-loaded fillet (stress developed along its length, as in a
    /// lapped tab), to which the long-weld factor β of J2.2b applies.
    pub end_loaded: bool,
}

/// Effective throat of an equal-leg fillet, J2.2a: the shortest distance from root to face,
/// 0.707 w (w / √2).
pub fn fillet_effective_throat(size: Length) -> Length {
    size * std::f64::consts::FRAC_1_SQRT_2
}

/// Directional strength factor, AISC 360 J2.4 Eq. J2-5: kds = 1.0 + 0.50 sin^1.5 θ.
pub fn directional_factor(angle: Angle) -> f64 {
    1.0 + 0.50 * angle.to_rad().sin().abs().powf(1.5)
}

/// Long-weld factor β and effective length of an end-loaded fillet, AISC 360 J2.2b Eq. J2-1:
/// l/w ≤ 100 → β = 1; l/w ≤ 300 → β = 1.2 − 0.002 (l/w) ≤ 1.0; l/w > 300 → le = 180 w.
pub fn long_weld_effective_length(size: Length, length: Length) -> (Length, f64) {
    let ratio = length / size;
    if ratio <= 100.0 {
        (length, 1.0)
    } else if ratio <= 300.0 {
        let beta = (1.2 - 0.002 * ratio).min(1.0);
        (length * beta, beta)
    } else {
        let le = size * 180.0;
        (le, le / length)
    }
}

fn weld_metal_equation(edition: Edition, with_kds: bool) -> &'static str {
    match (edition, with_kds) {
        (_, false) => "J2-3",
        (Edition::Aisc360_16, true) => "J2-4, J2-5",
        (Edition::Aisc360_22, true) => "J2-3, J2-4, J2-5",
    }
}

fn group_equation(edition: Edition) -> &'static str {
    match edition {
        Edition::Aisc360_16 => "J2-10a, J2-10b",
        Edition::Aisc360_22 => "J2-6a, J2-6b",
    }
}

/// The parts of one line's strength, before they are put into a record.
struct LineParts {
    effective_size: Length,
    effective_length: Length,
    beta: f64,
    kds: f64,
    area: Area,
    nominal: Force,
    notes: Vec<String>,
}

fn check_line(line: &FilletLine) -> Result<(), InputError> {
    require_positive("w", line.size.si(), "the fillet leg size")?;
    require_positive("l", line.length.si(), "the weld length")?;
    let deg = line.angle.to_deg();
    if !(deg.is_finite() && (0.0..=90.0).contains(&deg)) {
        return Err(InputError::new(
            "θ",
            format!(
                "the angle of the force to the weld axis must lie from 0 to 90 deg, got {deg} deg"
            ),
        ));
    }
    Ok(())
}

fn check_fexx(fexx: Stress) -> Result<(), InputError> {
    require_positive("FEXX", fexx.si(), "the electrode classification strength")
}

fn line_parts(fexx: Stress, line: &FilletLine, kds_applied: bool) -> LineParts {
    let mut notes = Vec::new();
    let min_length = line.size * 4.0;
    let effective_size = if line.length < min_length {
        notes.push(format!(
            "length below 4 w (l/w = {:.2}): effective size taken as l/4 (J2.2b)",
            line.length / line.size
        ));
        line.length * 0.25
    } else {
        line.size
    };
    let (effective_length, beta) = if line.end_loaded {
        let (le, beta) = long_weld_effective_length(line.size, line.length);
        if beta < 1.0 {
            notes.push(format!(
                "end-loaded fillet with l/w = {:.0}: β = {:.3} (J2.2b, Eq. J2-1{})",
                line.length / line.size,
                beta,
                if line.length / line.size > 300.0 {
                    "; le = 180 w above l/w = 300"
                } else {
                    ""
                }
            ));
        }
        (le, beta)
    } else {
        (line.length, 1.0)
    };
    let kds = if kds_applied {
        directional_factor(line.angle)
    } else {
        1.0
    };
    let area = fillet_effective_throat(effective_size) * effective_length;
    let nominal = fexx * 0.60 * kds * area;
    LineParts {
        effective_size,
        effective_length,
        beta,
        kds,
        area,
        nominal,
        notes,
    }
}

/// The note a weld record carries when the directional increase was not applied.
pub const NO_INCREASE_NOTE: &str = "directional strength increase not applied (kds = 1.0)";

/// Fillet weld metal rupture of one line, AISC 360 J2.4 Eq. J2-3 (with J2-5 when the directional
/// increase applies): Rn = 0.60 FEXX kds Awe, Awe = 0.707 w le; φ = 0.75, Ω = 2.00 (Table J2.5).
///
/// `directional_increase` is the caller's choice: pass false where the increase is not to be
/// relied on (for example welds to tube walls); the record then says it was not applied.
pub fn fillet_weld_rupture(
    edition: Edition,
    fexx: Stress,
    line: &FilletLine,
    directional_increase: bool,
) -> Result<Strength, InputError> {
    check_fexx(fexx)?;
    check_line(line)?;
    let parts = line_parts(fexx, line, directional_increase);
    let mut notes = parts.notes;
    if !directional_increase {
        notes.push(NO_INCREASE_NOTE.to_string());
    }
    Ok(Strength {
        citation: edition.cite("J2.4", weld_metal_equation(edition, directional_increase)),
        formula: "Rn = 0.60 FEXX kds Awe, Awe = 0.707 w le, le = β l",
        inputs: vec![
            Input::new("FEXX", fexx, "electrode classification strength"),
            Input::new("w", line.size, "fillet leg size"),
            Input::new("w_eff", parts.effective_size, "effective leg size (J2.2b)"),
            Input::new("l", line.length, "actual weld length"),
            Input::new("θ", line.angle, "angle of the force to the weld axis"),
            Input::new("kds", number(parts.kds), "directional strength factor"),
            Input::new("β", number(parts.beta), "long-weld factor"),
            Input::new("le", parts.effective_length, "effective length"),
            Input::new("Awe", parts.area, "effective weld area"),
        ],
        nominal: parts.nominal.into(),
        phi: PHI_WELD_SHEAR,
        omega: OMEGA_WELD_SHEAR,
        notes,
        out_of_scope: vec![],
    })
}

/// Fillet weld metal rupture per unit length, AISC 360 J2.4 Eq. J2-3 / J2-5: Rn/l =
/// 0.60 FEXX kds 0.707 w (no long-weld or short-weld adjustment); φ = 0.75, Ω = 2.00.
pub fn fillet_weld_rupture_per_length(
    edition: Edition,
    fexx: Stress,
    size: Length,
    angle: Angle,
    directional_increase: bool,
) -> Result<Strength, InputError> {
    let line = FilletLine {
        size,
        length: Length::inch(1.0),
        angle,
        end_loaded: false,
    };
    check_fexx(fexx)?;
    check_line(&line)?;
    let kds = if directional_increase {
        directional_factor(angle)
    } else {
        1.0
    };
    let throat = fillet_effective_throat(size);
    let per_length: ForcePerLength = fexx * 0.60 * kds * throat;
    let mut notes =
        vec!["per unit length of weld; the length rules of J2.2b are not applied".to_string()];
    if !directional_increase {
        notes.push(NO_INCREASE_NOTE.to_string());
    }
    Ok(Strength {
        citation: edition.cite("J2.4", weld_metal_equation(edition, directional_increase)),
        formula: "Rn / l = 0.60 FEXX kds 0.707 w",
        inputs: vec![
            Input::new("FEXX", fexx, "electrode classification strength"),
            Input::new("w", size, "fillet leg size"),
            Input::new("θ", angle, "angle of the force to the weld axis"),
            Input::new("kds", number(kds), "directional strength factor"),
            Input::new("te", throat, "effective throat"),
        ],
        nominal: per_length.into(),
        phi: PHI_WELD_SHEAR,
        omega: OMEGA_WELD_SHEAR,
        notes,
        out_of_scope: vec![],
    })
}

/// How a weld group's strength was combined.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
enum GroupRule {
    /// Sum of the lines without directional increase (J2.4(a)).
    PlainSum,
    /// All lines parallel: a linear weld group, sum with kds (J2.4(b)).
    Linear,
    /// Longitudinal and transverse lines of one size: J2.4(c).
    LongitudinalTransverse,
}

fn is_angle(angle: Angle, deg: f64) -> bool {
    (angle.to_deg() - deg).abs() < 1e-6
}

/// Strength of a concentrically loaded fillet weld group, AISC 360 J2.4 Eq. J2-3; for a group of
/// longitudinal and transverse lines of uniform size with the directional increase on, the
/// greater of Rn = Rnwl + Rnwt and Rn = 0.85 Rnwl + 1.5 Rnwt (J2.4(c), Eq. J2-10a/b in 360-16,
/// J2-6a/b in 360-22); φ = 0.75, Ω = 2.00.
///
/// With lines at other mixed angles the directional increase needs the instantaneous-centre
/// method, which this function does not do: it then sums the lines with kds = 1.0 (conservative)
/// and says so. The group is taken as loaded through its centre of gravity (a note says so).
pub fn fillet_weld_group_rupture(
    edition: Edition,
    fexx: Stress,
    lines: &[FilletLine],
    directional_increase: bool,
) -> Result<Strength, InputError> {
    check_fexx(fexx)?;
    if lines.is_empty() {
        return Err(InputError::new(
            "lines",
            "a weld group needs at least one weld line",
        ));
    }
    for line in lines {
        check_line(line)?;
    }
    let first = lines[0];
    let all_parallel = lines
        .iter()
        .all(|l| (l.angle.to_deg() - first.angle.to_deg()).abs() < 1e-6);
    let uniform_size = lines
        .iter()
        .all(|l| (l.size.si() - first.size.si()).abs() < 1e-9);
    let long_or_trans = lines
        .iter()
        .all(|l| is_angle(l.angle, 0.0) || is_angle(l.angle, 90.0));
    let mut notes = vec!["group taken as loaded through its centre of gravity".to_string()];
    let rule = if !directional_increase {
        notes.push(NO_INCREASE_NOTE.to_string());
        GroupRule::PlainSum
    } else if all_parallel {
        GroupRule::Linear
    } else if long_or_trans && uniform_size {
        GroupRule::LongitudinalTransverse
    } else {
        notes.push(
            "lines at mixed angles or sizes: directional increase withheld (kds = 1.0); the \
             instantaneous-centre method of J2.4(b) is not applied"
                .to_string(),
        );
        GroupRule::PlainSum
    };
    let mut area_total = Area::mm2(0.0);
    let mut longitudinal = Force::n(0.0);
    let mut transverse = Force::n(0.0);
    let mut total = Force::n(0.0);
    for (i, line) in lines.iter().enumerate() {
        let parts = line_parts(fexx, line, rule == GroupRule::Linear);
        for n in &parts.notes {
            notes.push(format!("line {}: {n}", i + 1));
        }
        area_total = area_total + parts.area;
        total = total + parts.nominal;
        if is_angle(line.angle, 90.0) {
            transverse = transverse + parts.nominal;
        } else {
            longitudinal = longitudinal + parts.nominal;
        }
    }
    let mut inputs = vec![
        Input::new("FEXX", fexx, "electrode classification strength"),
        Input::new("n", number(lines.len() as f64), "number of weld lines"),
        Input::new("ΣAwe", area_total, "total effective weld area"),
    ];
    if all_parallel {
        inputs.push(Input::new(
            "θ",
            first.angle,
            "angle of the force to the weld axes",
        ));
    }
    if rule == GroupRule::PlainSum {
        inputs.push(Input::new(
            "kds",
            number(1.0),
            "directional strength factor (increase not applied)",
        ));
    }
    let (citation, formula, nominal) = match rule {
        GroupRule::PlainSum => (
            edition.cite("J2.4", weld_metal_equation(edition, false)),
            "Rn = Σ 0.60 FEXX Awe",
            total,
        ),
        GroupRule::Linear => {
            inputs.push(Input::new(
                "kds",
                number(directional_factor(first.angle)),
                "directional strength factor",
            ));
            (
                edition.cite("J2.4", weld_metal_equation(edition, true)),
                "Rn = Σ 0.60 FEXX kds Awe (linear weld group)",
                total,
            )
        }
        GroupRule::LongitudinalTransverse => {
            let combined = (longitudinal + transverse).max(longitudinal * 0.85 + transverse * 1.5);
            inputs.push(Input::new(
                "Rnwl",
                longitudinal,
                "nominal strength of the longitudinal lines",
            ));
            inputs.push(Input::new(
                "Rnwt",
                transverse,
                "nominal strength of the transverse lines, no directional increase",
            ));
            (
                edition.cite("J2.4", group_equation(edition)),
                "Rn = max(Rnwl + Rnwt, 0.85 Rnwl + 1.5 Rnwt)",
                combined,
            )
        }
    };
    Ok(Strength {
        citation,
        formula,
        inputs,
        nominal: nominal.into(),
        phi: PHI_WELD_SHEAR,
        omega: OMEGA_WELD_SHEAR,
        notes,
        out_of_scope: vec![],
    })
}

/// Welding process, as Table J2.2 groups them for flare groove welds.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum FlareProcess {
    /// Gas metal arc and gas-shielded flux cored arc welding (GMAW, FCAW-G).
    GmawFcawG,
    /// Shielded metal arc and self-shielded flux cored arc welding (SMAW, FCAW-S).
    SmawFcawS,
    /// Submerged arc welding (SAW).
    Saw,
}

impl FlareProcess {
    /// The processes of the group, as a sheet names them.
    pub fn label(self) -> &'static str {
        match self {
            FlareProcess::GmawFcawG => "GMAW or FCAW-G",
            FlareProcess::SmawFcawS => "SMAW or FCAW-S",
            FlareProcess::Saw => "SAW",
        }
    }
}

/// The kind of flare groove.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum FlareGroove {
    /// One rounded surface against a flat one (a tube corner against a tab).
    Bevel,
    /// Two rounded surfaces (two tube corners).
    Vee,
}

/// How the flare groove weld is loaded, for the factors of Table J2.5.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum GrooveLoad {
    /// Shear on the effective area: φ = 0.75, Ω = 2.00.
    Shear,
    /// Tension normal to the weld axis: φ = 0.80, Ω = 1.88.
    TensionNormal,
}

/// Effective throat of a flare groove weld filled flush, AISC 360 Table J2.2: bevel 5/8 R
/// (GMAW, FCAW-G), 5/16 R (SMAW, FCAW-S, SAW); vee 3/4 R, 5/8 R, 1/2 R (table from memory).
pub fn flare_groove_effective_throat(
    groove: FlareGroove,
    process: FlareProcess,
    radius: Length,
) -> (Length, f64) {
    let k = match (groove, process) {
        (FlareGroove::Bevel, FlareProcess::GmawFcawG) => 5.0 / 8.0,
        (FlareGroove::Bevel, FlareProcess::SmawFcawS) => 5.0 / 16.0,
        (FlareGroove::Bevel, FlareProcess::Saw) => 5.0 / 16.0,
        (FlareGroove::Vee, FlareProcess::GmawFcawG) => 3.0 / 4.0,
        (FlareGroove::Vee, FlareProcess::SmawFcawS) => 5.0 / 8.0,
        (FlareGroove::Vee, FlareProcess::Saw) => 1.0 / 2.0,
    };
    (radius * k, k)
}

/// Minimum effective throat of a partial-joint-penetration groove weld, AISC 360 J2.1b and
/// Table J2.3, by the thinner part joined (table from memory).
pub fn table_j2_3_minimum(table: SizeTable, thinner_part: Length) -> Length {
    let rows: &[(f64, f64)] = match table {
        SizeTable::Inch => &[
            (0.25, 0.125),
            (0.5, 0.1875),
            (0.75, 0.25),
            (1.5, 0.3125),
            (2.25, 0.375),
            (6.0, 0.5),
            (f64::INFINITY, 0.625),
        ],
        SizeTable::Metric => &[
            (6.0, 3.0),
            (13.0, 5.0),
            (19.0, 6.0),
            (38.0, 8.0),
            (57.0, 10.0),
            (150.0, 13.0),
            (f64::INFINITY, 16.0),
        ],
    };
    let t = match table {
        SizeTable::Inch => thinner_part.to_in(),
        SizeTable::Metric => thinner_part.to_mm(),
    };
    let w = rows
        .iter()
        .find(|(limit, _)| t <= *limit + 1e-9)
        .map_or(rows[rows.len() - 1].1, |r| r.1);
    match table {
        SizeTable::Inch => Length::inch(w),
        SizeTable::Metric => Length::mm(w),
    }
}

/// Minimum effective throat of a groove weld, AISC 360 J2.1b, Table J2.3: E ≥ E,min for the
/// thinner part joined (applied to flare groove welds as to PJP groove welds).
pub fn groove_throat_minimum(
    edition: Edition,
    table: SizeTable,
    thinner_part: Length,
    throat: Length,
) -> Result<Requirement, InputError> {
    require_positive("t", thinner_part.si(), "the thickness of the thinner part")?;
    require_positive("E", throat.si(), "the effective throat")?;
    let out_of_scope = sheet_steel_scope(table, thinner_part);
    Ok(Requirement {
        citation: edition.cite("J2.1b, Table J2.3", ""),
        formula: "E ≥ E,min (Table J2.3, by the thinner part joined)",
        inputs: vec![
            Input::new("t", thinner_part, "thickness of the thinner part joined"),
            Input::new("E", throat, "effective throat provided"),
        ],
        provided: throat.into(),
        required: table_j2_3_minimum(table, thinner_part).into(),
        bound: Bound::Minimum,
        notes: vec![
            "Table J2.3 is written for partial-joint-penetration groove welds; it is applied to \
             the flare groove weld, which shares their row of Table J2.5 (from memory)"
                .to_string(),
        ],
        out_of_scope,
    })
}

/// Flare groove weld metal strength, AISC 360 J2.4 Eq. J2-3 with Table J2.5 (PJP groove welds
/// including flare groove welds): Rn = 0.60 FEXX Awe, Awe = E l, E from Table J2.2.
pub fn flare_groove_weld_rupture(
    edition: Edition,
    fexx: Stress,
    groove: FlareGroove,
    process: FlareProcess,
    radius: Length,
    length: Length,
    load: GrooveLoad,
) -> Result<Strength, InputError> {
    check_fexx(fexx)?;
    require_positive("R", radius.si(), "the radius of the joint surface")?;
    require_positive("l", length.si(), "the weld length")?;
    let (throat, k) = flare_groove_effective_throat(groove, process, radius);
    let area = throat * length;
    let nominal = fexx * 0.60 * area;
    let (phi, omega) = match load {
        GrooveLoad::Shear => (0.75, 2.00),
        GrooveLoad::TensionNormal => (0.80, 1.88),
    };
    let mut out_of_scope = Vec::new();
    if groove == FlareGroove::Bevel && radius < Length::inch(0.375) - Length::mm(1e-9) {
        out_of_scope.push(
            "flare bevel groove with R below 3/8 in. (10 mm): Table J2.2 allows only a \
             reinforcing fillet weld on a filled flush joint"
                .to_string(),
        );
    }
    Ok(Strength {
        citation: edition.cite("J2.4, Table J2.2, Table J2.5", "J2-3"),
        formula: "Rn = 0.60 FEXX Awe, Awe = E l, E = k R",
        inputs: vec![
            Input::new("FEXX", fexx, "electrode classification strength"),
            Input::new(
                "R",
                radius,
                "radius of the joint surface (outside corner radius)",
            ),
            Input::new("k", number(k), "throat factor of Table J2.2"),
            Input::new("E", throat, "effective throat"),
            Input::new("l", length, "weld length"),
            Input::new("Awe", area, "effective weld area"),
        ],
        nominal: nominal.into(),
        phi,
        omega,
        notes: vec![
            "Table J2.2 permits R to be taken as 2t for HSS when the corner radius is not known"
                .to_string(),
            "the base metal is checked separately (Table J2.5: governed by J4)".to_string(),
        ],
        out_of_scope,
    })
}

/// Base metal shear yielding along a weld, AISC 360 J4.2(a) Eq. J4-3 (J2.4 sends base metal
/// in shear to J4): Rn = 0.60 Fy Agv, Agv = t l; φ = 1.00, Ω = 1.50.
pub fn weld_base_metal_shear_yielding(
    edition: Edition,
    fy: Stress,
    thickness: Length,
    length: Length,
) -> Result<Strength, InputError> {
    require_positive("Fy", fy.si(), "the specified minimum yield stress")?;
    require_positive("t", thickness.si(), "the base metal thickness")?;
    require_positive("l", length.si(), "the length along the weld")?;
    let agv = thickness * length;
    Ok(Strength {
        citation: edition.cite("J4.2(a)", "J4-3"),
        formula: "Rn = 0.60 Fy Agv, Agv = t l",
        inputs: vec![
            Input::new("Fy", fy, "specified minimum yield stress of the base metal"),
            Input::new("t", thickness, "base metal thickness at the weld"),
            Input::new("l", length, "length along the weld"),
            Input::new("Agv", agv, "gross area subject to shear"),
        ],
        nominal: (fy * 0.60 * agv).into(),
        phi: 1.00,
        omega: 1.50,
        notes: vec![],
        out_of_scope: vec![],
    })
}

/// Base metal shear rupture along a weld, AISC 360 J4.2(b) Eq. J4-4: Rn = 0.60 Fu Anv,
/// Anv = t l (no holes along a weld line); φ = 0.75, Ω = 2.00.
pub fn weld_base_metal_shear_rupture(
    edition: Edition,
    fu: Stress,
    thickness: Length,
    length: Length,
) -> Result<Strength, InputError> {
    require_positive("Fu", fu.si(), "the specified minimum tensile strength")?;
    require_positive("t", thickness.si(), "the base metal thickness")?;
    require_positive("l", length.si(), "the length along the weld")?;
    let anv = thickness * length;
    Ok(Strength {
        citation: edition.cite("J4.2(b)", "J4-4"),
        formula: "Rn = 0.60 Fu Anv, Anv = t l",
        inputs: vec![
            Input::new(
                "Fu",
                fu,
                "specified minimum tensile strength of the base metal",
            ),
            Input::new("t", thickness, "base metal thickness at the weld"),
            Input::new("l", length, "length along the weld"),
            Input::new("Anv", anv, "net area subject to shear"),
        ],
        nominal: (fu * 0.60 * anv).into(),
        phi: 0.75,
        omega: 2.00,
        notes: vec![],
        out_of_scope: vec![],
    })
}

/// Which column of Table J2.4 the thickness and size are read in.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum SizeTable {
    /// Inch column: 1/4, 1/2, 3/4 in. limits; 1/8, 3/16, 1/4, 5/16 in. sizes.
    Inch,
    /// Millimetre column: 6, 13, 19 mm limits; 3, 5, 6, 8 mm sizes.
    Metric,
}

/// Minimum fillet size from Table J2.4 for the thinner part joined (before the cap at that
/// thickness).
pub fn table_j2_4_minimum(table: SizeTable, thinner_part: Length) -> Length {
    match table {
        SizeTable::Inch => {
            let t = thinner_part.to_in();
            let w = if t <= 0.25 {
                0.125
            } else if t <= 0.5 {
                0.1875
            } else if t <= 0.75 {
                0.25
            } else {
                0.3125
            };
            Length::inch(w)
        }
        SizeTable::Metric => {
            let t = thinner_part.to_mm();
            let w = if t <= 6.0 {
                3.0
            } else if t <= 13.0 {
                5.0
            } else if t <= 19.0 {
                6.0
            } else {
                8.0
            };
            Length::mm(w)
        }
    }
}

fn sheet_steel_limit(table: SizeTable) -> Length {
    match table {
        SizeTable::Inch => Length::inch(0.125),
        SizeTable::Metric => Length::mm(3.0),
    }
}

/// The scope flag of a weld to a part thinner than 1/8 in. (3 mm): outside the prequalified
/// range of AWS D1.1, where the sheet-steel code AWS D1.3 applies; empty otherwise.
fn sheet_steel_scope(table: SizeTable, thinner_part: Length) -> Vec<String> {
    if thinner_part < sheet_steel_limit(table) - Length::mm(1e-9) {
        vec![
            "thinner part below 1/8 in. (3 mm): outside the prequalified range of AWS D1.1; \
              sheet-steel welding per AWS D1.3 applies"
                .to_string(),
        ]
    } else {
        Vec::new()
    }
}

/// Minimum fillet weld size, AISC 360 J2.2b(a) and Table J2.4, capped at the thickness of the
/// thinner part; a part thinner than 1/8 in. (3 mm) is flagged as sheet steel (AWS D1.3).
pub fn fillet_size_minimum(
    edition: Edition,
    table: SizeTable,
    thinner_part: Length,
    size: Length,
) -> Result<Requirement, InputError> {
    require_positive("t", thinner_part.si(), "the thickness of the thinner part")?;
    require_positive("w", size.si(), "the fillet leg size")?;
    let tabulated = table_j2_4_minimum(table, thinner_part);
    let required = tabulated.min(thinner_part);
    let mut notes = vec!["Table J2.4: single-pass welds must be used".to_string()];
    if required < tabulated {
        notes.push(
            "required size capped at the thickness of the thinner part (the weld size need not \
             exceed it)"
                .to_string(),
        );
    }
    let out_of_scope = sheet_steel_scope(table, thinner_part);
    Ok(Requirement {
        citation: edition.cite("J2.2b, Table J2.4", ""),
        formula: "w ≥ w,min (Table J2.4), w,min ≤ t of the thinner part",
        inputs: vec![
            Input::new("t", thinner_part, "thickness of the thinner part joined"),
            Input::new("w,min", tabulated, "minimum size of Table J2.4"),
            Input::new("w", size, "fillet leg size provided"),
        ],
        provided: size.into(),
        required: required.into(),
        bound: Bound::Minimum,
        notes,
        out_of_scope,
    })
}

/// Maximum fillet weld size along an edge, AISC 360 J2.2b(b): material under 1/4 in. (6 mm): t;
/// 1/4 in. or more: t − 1/16 in. (2 mm), unless the weld is designated to be built out.
pub fn fillet_size_maximum(
    edition: Edition,
    table: SizeTable,
    edge_thickness: Length,
    size: Length,
    built_out: bool,
) -> Result<Requirement, InputError> {
    require_positive("t", edge_thickness.si(), "the thickness along the edge")?;
    require_positive("w", size.si(), "the fillet leg size")?;
    let (threshold, relief) = match table {
        SizeTable::Inch => (Length::inch(0.25), Length::inch(1.0 / 16.0)),
        SizeTable::Metric => (Length::mm(6.0), Length::mm(2.0)),
    };
    let mut notes = Vec::new();
    let required = if edge_thickness < threshold || built_out {
        if built_out && edge_thickness >= threshold {
            notes.push(
                "weld designated to be built out to full throat: the limit is the thickness"
                    .to_string(),
            );
        }
        edge_thickness
    } else {
        edge_thickness - relief
    };
    Ok(Requirement {
        citation: edition.cite("J2.2b", ""),
        formula: "w ≤ t (t < 1/4 in.), w ≤ t − 1/16 in. (t ≥ 1/4 in.)",
        inputs: vec![
            Input::new(
                "t",
                edge_thickness,
                "thickness of the material along the edge",
            ),
            Input::new("w", size, "fillet leg size provided"),
        ],
        provided: size.into(),
        required: required.into(),
        bound: Bound::Maximum,
        notes,
        out_of_scope: vec![],
    })
}

/// Minimum length of a fillet weld designed for strength, AISC 360 J2.2b(c): l ≥ 4 w (else the
/// effective size is taken as l/4, which [`fillet_weld_rupture`] applies).
pub fn fillet_length_minimum(
    edition: Edition,
    size: Length,
    length: Length,
) -> Result<Requirement, InputError> {
    require_positive("w", size.si(), "the fillet leg size")?;
    require_positive("l", length.si(), "the weld length")?;
    Ok(Requirement {
        citation: edition.cite("J2.2b", ""),
        formula: "l ≥ 4 w",
        inputs: vec![
            Input::new("w", size, "fillet leg size"),
            Input::new("l", length, "weld length provided"),
        ],
        provided: length.into(),
        required: (size * 4.0).into(),
        bound: Bound::Minimum,
        notes: vec!["a shorter weld is permitted with its effective size taken as l/4".to_string()],
        out_of_scope: vec![],
    })
}

/// Minimum segment length of an intermittent fillet weld, AISC 360 J2.2b: l ≥ 4 w and
/// ≥ 1-1/2 in. (38 mm).
pub fn intermittent_segment_minimum(
    edition: Edition,
    table: SizeTable,
    size: Length,
    segment: Length,
) -> Result<Requirement, InputError> {
    require_positive("w", size.si(), "the fillet leg size")?;
    require_positive("l", segment.si(), "the segment length")?;
    let floor = match table {
        SizeTable::Inch => Length::inch(1.5),
        SizeTable::Metric => Length::mm(38.0),
    };
    Ok(Requirement {
        citation: edition.cite("J2.2b", ""),
        formula: "l ≥ max(4 w, 1-1/2 in.)",
        inputs: vec![
            Input::new("w", size, "fillet leg size"),
            Input::new("l", segment, "segment length provided"),
        ],
        provided: segment.into(),
        required: (size * 4.0).max(floor).into(),
        bound: Bound::Minimum,
        notes: vec![],
        out_of_scope: vec![],
    })
}

/// Minimum lap of a lap joint, AISC 360 J2.2b: 5 times the thinner part, and at least 1 in.
/// (25 mm).
pub fn lap_length_minimum(
    edition: Edition,
    table: SizeTable,
    thinner_part: Length,
    lap: Length,
) -> Result<Requirement, InputError> {
    require_positive("t", thinner_part.si(), "the thickness of the thinner part")?;
    require_positive("lap", lap.si(), "the lap length")?;
    let floor = match table {
        SizeTable::Inch => Length::inch(1.0),
        SizeTable::Metric => Length::mm(25.0),
    };
    Ok(Requirement {
        citation: edition.cite("J2.2b", ""),
        formula: "lap ≥ max(5 t, 1 in.)",
        inputs: vec![
            Input::new("t", thinner_part, "thickness of the thinner part joined"),
            Input::new("lap", lap, "lap provided"),
        ],
        provided: lap.into(),
        required: (thinner_part * 5.0).max(floor).into(),
        bound: Bound::Minimum,
        notes: vec![],
        out_of_scope: vec![],
    })
}

/// Maximum end return where the outstanding element must stay flexible, AISC 360 J2.2b: the
/// return shall not exceed 4 w nor half the width of the part.
pub fn end_return_maximum(
    edition: Edition,
    size: Length,
    part_width: Length,
    return_length: Length,
) -> Result<Requirement, InputError> {
    require_positive("w", size.si(), "the fillet leg size")?;
    require_positive("b", part_width.si(), "the width of the part")?;
    require_positive("l,ret", return_length.si(), "the end return length")?;
    Ok(Requirement {
        citation: edition.cite("J2.2b", ""),
        formula: "l,ret ≤ min(4 w, b/2)",
        inputs: vec![
            Input::new("w", size, "fillet leg size"),
            Input::new("b", part_width, "width of the part"),
            Input::new("l,ret", return_length, "end return provided"),
        ],
        provided: return_length.into(),
        required: (size * 4.0).min(part_width * 0.5).into(),
        bound: Bound::Maximum,
        notes: vec![
            "applies to connections where flexibility of the outstanding element is required"
                .to_string(),
        ],
        out_of_scope: vec![],
    })
}

/// The citation of a weld metal rupture check, for callers that list the clauses they run.
pub fn weld_metal_citation(edition: Edition, directional_increase: bool) -> Citation {
    edition.cite("J2.4", weld_metal_equation(edition, directional_increase))
}

/// Fillet welds along a plate's edge, `lines` parallel lines of length `l` side by side, loaded
/// in the plate's plane by a force at θ to the lines whose line of action passes a distance `e`
/// from the welds (the work point on a chord's axis, off the chord face): AISC 360-22 J2.4
/// Eq. J2-3 per unit length with kds = 1.0, by the elastic method of the AISC Manual Part 8
/// (common practice). Per unit of force, the end of the welds takes
/// c = √((cos θ / (n l))² + (sin θ / (n l) + 6 e cos θ / (n l²))²) per unit length, so
/// Rn = rn / c with rn = 0.60 FEXX (0.707 w), the strength of one line per unit length.
pub fn fillet_lines_eccentric(
    edition: Edition,
    fexx: Stress,
    size: Length,
    l: Length,
    lines: u32,
    theta: Angle,
    e: Length,
) -> Result<Strength, InputError> {
    require_positive("FEXX", fexx.si(), "the electrode strength")?;
    require_positive("w", size.si(), "the weld size")?;
    require_positive("l", l.si(), "the weld length")?;
    if lines == 0 {
        return Err(InputError::new("n", "no weld lines"));
    }
    if !(e.is_finite() && e.si() >= 0.0) {
        return Err(InputError::new(
            "e",
            "the eccentricity must be zero or more",
        ));
    }
    let n = f64::from(lines);
    let (c, s) = (theta.to_rad().cos(), theta.to_rad().sin());
    let l_in = l.to_in();
    let e_in = e.to_in();
    // per inch of weld, per kip of force
    let along = c / (n * l_in);
    let across = s / (n * l_in) + 6.0 * e_in * c / (n * l_in * l_in);
    let per_kip_per_in = (along * along + across * across).sqrt();
    let rn = fexx * (0.60 * std::f64::consts::FRAC_1_SQRT_2) * size; // per unit length
    let rn_kip_per_in = ForcePerLength::from_si(rn.si()).to_kip_per_in();
    let nominal = Force::kip(rn_kip_per_in / per_kip_per_in);
    Ok(Strength {
        citation: edition.cite("J2.4", weld_metal_equation(edition, false)),
        formula: "Rn = rn / c, rn = 0.60 FEXX (0.707 w), c = √((cos θ/(n l))² + (sin θ/(n l) + 6 e cos θ/(n l²))²)",
        inputs: vec![
            Input::new("FEXX", fexx, "electrode classification strength"),
            Input::new("w", size, "fillet leg size"),
            Input::new("l", l, "length of each weld line"),
            Input::new("n", number(n), "weld lines side by side"),
            Input::new("θ", theta, "angle of the force to the weld lines"),
            Input::new("e", e, "distance of the force's line of action from the welds"),
            Input::new("c", number(per_kip_per_in), "force per inch of weld at its end, per kip of load (1/in.)"),
            Input::new("rn", ForcePerLength::from_si(rn.si()), "strength of one line per unit of its length"),
        ],
        nominal: nominal.into(),
        phi: PHI_WELD_SHEAR,
        omega: OMEGA_WELD_SHEAR,
        notes: vec![
            "elastic method of the AISC Manual Part 8 (common practice): the welds' end takes the direct force shared evenly and the moment by the lines' section modulus n l²/6; no directional increase (kds = 1.0)".into(),
        ],
        out_of_scope: Vec::new(),
    })
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::standards::Method;

    /// Hand-worked, elastic method (common practice): two 1/8 in. E70 lines 4 in. long, the
    /// force at 36.87° (cos 0.8, sin 0.6) passing 1 in. from the welds:
    /// c = √((0.8/8)² + (0.6/8 + 6 × 1 × 0.8/(2 × 16))²) = √(0.01 + 0.225²) = 0.246221 per in.;
    /// rn = 0.60 × 70 × 0.70711 × 0.125 = 3.71231 kip/in.; Rn = 15.0771 kip. With e = 0 and
    /// θ = 0 it is the plain sum: 2 × 4 × 3.71231 = 29.698 kip.
    #[test]
    fn eccentric_lines_by_the_elastic_method() {
        let s = fillet_lines_eccentric(
            E22,
            Stress::ksi(70.0),
            Length::inch(0.125),
            Length::inch(4.0),
            2,
            Angle::deg(36.869_897_645_844),
            Length::inch(1.0),
        )
        .unwrap();
        let rn = Force::from_si(s.nominal.si).to_kip();
        assert!((rn - 15.0771).abs() < 1e-3, "{rn}");
        let s = fillet_lines_eccentric(
            E22,
            Stress::ksi(70.0),
            Length::inch(0.125),
            Length::inch(4.0),
            2,
            Angle::deg(0.0),
            Length::inch(0.0),
        )
        .unwrap();
        let rn = Force::from_si(s.nominal.si).to_kip();
        assert!((rn - 29.698).abs() < 1e-2, "{rn}");
    }

    const E22: Edition = Edition::Aisc360_22;

    fn line(w_in: f64, l_in: f64, deg: f64, end_loaded: bool) -> FilletLine {
        FilletLine {
            size: Length::inch(w_in),
            length: Length::inch(l_in),
            angle: Angle::deg(deg),
            end_loaded,
        }
    }

    fn kip(s: &Strength) -> f64 {
        Force::from_si(s.nominal.si).to_kip()
    }

    #[test]
    fn rejects_bad_inputs_by_symbol() {
        let e70 = Stress::ksi(70.0);
        let cases = [
            (line(0.0, 4.0, 0.0, false), "w"),
            (line(0.25, -1.0, 0.0, false), "l"),
            (line(0.25, 4.0, 95.0, false), "θ"),
            (line(0.25, 4.0, -1.0, false), "θ"),
            (line(f64::NAN, 4.0, 0.0, false), "w"),
        ];
        for (l, symbol) in cases {
            let err = fillet_weld_rupture(E22, e70, &l, true).unwrap_err();
            assert_eq!(err.symbol, symbol, "{err}");
        }
        let err = fillet_weld_rupture(E22, Stress::ksi(0.0), &line(0.25, 4.0, 0.0, false), true)
            .unwrap_err();
        assert_eq!(err.symbol, "FEXX");
        let err = fillet_weld_group_rupture(E22, e70, &[], true).unwrap_err();
        assert_eq!(err.message, "a weld group needs at least one weld line");
    }

    #[test]
    fn directional_increase_withheld_is_noted() {
        let s = fillet_weld_rupture(E22, Stress::ksi(70.0), &line(0.25, 4.0, 90.0, false), false)
            .unwrap();
        assert!(s.notes.iter().any(|n| n.contains("not applied")));
        assert_eq!(s.citation.equation, "J2-3");
        let with = fillet_weld_rupture(E22, Stress::ksi(70.0), &line(0.25, 4.0, 90.0, false), true)
            .unwrap();
        // kds at 90° is 1.5 exactly (Eq. J2-5).
        assert!((kip(&with) / kip(&s) - 1.5).abs() < 1e-12);
    }

    #[test]
    fn short_weld_counts_a_quarter_of_its_length_as_size() {
        let s =
            fillet_weld_rupture(E22, Stress::ksi(70.0), &line(0.5, 1.0, 0.0, false), true).unwrap();
        let full = fillet_weld_rupture(E22, Stress::ksi(70.0), &line(0.25, 1.0, 0.0, false), true)
            .unwrap();
        assert!((kip(&s) - kip(&full)).abs() < 1e-9);
        assert!(s.notes.iter().any(|n| n.contains("l/4")));
    }

    #[test]
    fn long_weld_factor_branches() {
        let w = Length::inch(0.25);
        assert_eq!(long_weld_effective_length(w, Length::inch(25.0)).1, 1.0);
        let (le, beta) = long_weld_effective_length(w, Length::inch(50.0));
        assert!((beta - 0.8).abs() < 1e-12);
        assert!((le.to_in() - 40.0).abs() < 1e-9);
        let (le, _) = long_weld_effective_length(w, Length::inch(100.0));
        assert!((le.to_in() - 45.0).abs() < 1e-9);
        // not end-loaded: no reduction
        let s = fillet_weld_rupture(E22, Stress::ksi(70.0), &line(0.25, 50.0, 0.0, false), true)
            .unwrap();
        let e = fillet_weld_rupture(E22, Stress::ksi(70.0), &line(0.25, 50.0, 0.0, true), true)
            .unwrap();
        assert!((kip(&e) / kip(&s) - 0.8).abs() < 1e-12);
    }

    #[test]
    fn group_rules() {
        let e70 = Stress::ksi(70.0);
        let mixed = [line(0.25, 4.0, 0.0, false), line(0.25, 4.0, 90.0, false)];
        let g = fillet_weld_group_rupture(E22, e70, &mixed, true).unwrap();
        assert_eq!(g.citation.equation, "J2-6a, J2-6b");
        let one = kip(&fillet_weld_rupture(E22, e70, &mixed[0], false).unwrap());
        // equal longitudinal and transverse strengths: max(2, 0.85 + 1.5) = 2.35
        assert!((kip(&g) / one - 2.35).abs() < 1e-12);
        let g16 = fillet_weld_group_rupture(Edition::Aisc360_16, e70, &mixed, true).unwrap();
        assert_eq!(g16.citation.equation, "J2-10a, J2-10b");
        let off = fillet_weld_group_rupture(E22, e70, &mixed, false).unwrap();
        assert!((kip(&off) / one - 2.0).abs() < 1e-12);
        let skew = [line(0.25, 4.0, 0.0, false), line(0.25, 4.0, 45.0, false)];
        let s = fillet_weld_group_rupture(E22, e70, &skew, true).unwrap();
        assert!((kip(&s) / one - 2.0).abs() < 1e-12);
        assert!(s.notes.iter().any(|n| n.contains("instantaneous-centre")));
        let parallel = [line(0.25, 4.0, 60.0, false), line(0.25, 4.0, 60.0, false)];
        let p = fillet_weld_group_rupture(E22, e70, &parallel, true).unwrap();
        assert!((kip(&p) / one - 2.0 * directional_factor(Angle::deg(60.0))).abs() < 1e-12);
    }

    #[test]
    fn flare_bevel_below_three_eighths_is_out_of_scope() {
        let s = flare_groove_weld_rupture(
            E22,
            Stress::ksi(70.0),
            FlareGroove::Bevel,
            FlareProcess::GmawFcawG,
            Length::inch(0.25),
            Length::inch(4.0),
            GrooveLoad::Shear,
        )
        .unwrap();
        assert_eq!(s.out_of_scope.len(), 1);
        let ok = flare_groove_weld_rupture(
            E22,
            Stress::ksi(70.0),
            FlareGroove::Bevel,
            FlareProcess::GmawFcawG,
            Length::inch(0.375),
            Length::inch(4.0),
            GrooveLoad::TensionNormal,
        )
        .unwrap();
        assert!(ok.out_of_scope.is_empty());
        assert_eq!((ok.phi, ok.omega), (0.80, 1.88));
        let err = flare_groove_weld_rupture(
            E22,
            Stress::ksi(70.0),
            FlareGroove::Vee,
            FlareProcess::Saw,
            Length::inch(0.0),
            Length::inch(4.0),
            GrooveLoad::Shear,
        )
        .unwrap_err();
        assert_eq!(err.symbol, "R");
    }

    #[test]
    fn size_rules_branches() {
        let thin = fillet_size_minimum(E22, SizeTable::Inch, Length::inch(0.1), Length::inch(0.1))
            .unwrap();
        assert_eq!(thin.out_of_scope.len(), 1);
        assert!((thin.required.si - Length::inch(0.1).si()).abs() < 1e-9);
        assert!(thin.notes.iter().any(|n| n.contains("capped")));
        let max_thin = fillet_size_maximum(
            E22,
            SizeTable::Inch,
            Length::inch(0.1875),
            Length::inch(0.1875),
            false,
        )
        .unwrap();
        assert!(max_thin.ratio() <= 1.0 + 1e-12);
        let max_thick = fillet_size_maximum(
            E22,
            SizeTable::Inch,
            Length::inch(0.5),
            Length::inch(0.5),
            false,
        )
        .unwrap();
        assert!(max_thick.ratio() > 1.0);
        let built_out = fillet_size_maximum(
            E22,
            SizeTable::Inch,
            Length::inch(0.5),
            Length::inch(0.5),
            true,
        )
        .unwrap();
        assert!(built_out.ratio() <= 1.0 + 1e-12);
        let short = fillet_length_minimum(E22, Length::inch(0.25), Length::inch(0.75)).unwrap();
        assert!(short.ratio() > 1.0);
        let ret = end_return_maximum(
            E22,
            Length::inch(0.25),
            Length::inch(1.5),
            Length::inch(1.0),
        )
        .unwrap();
        // min(4 × 1/4, 1.5/2) = 0.75 in.
        assert!((Length::from_si(ret.required.si).to_in() - 0.75).abs() < 1e-9);
        assert!(ret.ratio() > 1.0);
        let lap = lap_length_minimum(E22, SizeTable::Inch, Length::inch(0.25), Length::inch(1.0))
            .unwrap();
        assert!((Length::from_si(lap.required.si).to_in() - 1.25).abs() < 1e-9);
        assert!(
            fillet_size_minimum(E22, SizeTable::Inch, Length::inch(0.0), Length::inch(0.1))
                .is_err()
        );
    }

    #[test]
    fn per_length_matches_one_inch_line() {
        let e70 = Stress::ksi(70.0);
        let per =
            fillet_weld_rupture_per_length(E22, e70, Length::inch(0.25), Angle::deg(30.0), true)
                .unwrap();
        let line = fillet_weld_rupture(E22, e70, &line(0.25, 1.0, 30.0, false), true).unwrap();
        let per_kip_in = ForcePerLength::from_si(per.available(Method::Lrfd).si).to_kip_per_in();
        let line_kip = Force::from_si(line.available(Method::Lrfd).si).to_kip();
        assert!((per_kip_in - line_kip).abs() < 1e-9);
    }
}
