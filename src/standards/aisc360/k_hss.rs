//! AISC 360 Chapter K — HSS connections (plate-to-HSS): concentrated forces from a transverse or
//! longitudinal plate on a round or rectangular HSS wall, with the limits of applicability of
//! the tables entered as out-of-scope entries.
//!
//! Clause and equation labels (Section K2, Tables K2.1/K2.1A for round and K2.2/K2.2A for
//! rectangular HSS, Eq. K2-1 to K2-12) are from memory of 360-16, taken as unchanged in 360-22;
//! 360-10 numbered the same content K1. They are kept in [`round_clause`] and
//! [`rectangular_clause`] and the equation strings below so that a check against the printed
//! standard can correct them in one place.

use crate::standards::{number, Bound, Input, Requirement, Strength};
use crate::units::{Angle, Length, Stress};

use super::j2_welds::{require_positive, InputError};
use super::Edition;

/// Modulus of elasticity of steel, E = 29,000 ksi (AISC 360 Nomenclature).
pub fn modulus_of_elasticity() -> Stress {
    Stress::ksi(29_000.0)
}

/// A round HSS (the chord that receives the plate).
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct RoundHss {
    /// D: outside diameter.
    pub diameter: Length,
    /// t: design wall thickness (B4.2).
    pub wall: Length,
    /// Fy: specified minimum yield stress.
    pub fy: Stress,
    /// Fu: specified minimum tensile strength.
    pub fu: Stress,
}

/// A rectangular HSS (the chord that receives the plate).
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct RectangularHss {
    /// B: overall width of the loaded face, measured 90° to the plane of the connection.
    pub width_b: Length,
    /// H: overall height, in the plane of the connection.
    pub height_h: Length,
    /// t: design wall thickness (B4.2).
    pub wall: Length,
    /// k: outside corner radius; None takes 1.5 t, as the table permits when unknown.
    pub corner_radius: Option<Length>,
    pub fy: Stress,
    pub fu: Stress,
}

/// A T-connection (load on one face) or a cross-connection (plates on opposite faces).
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum Connection {
    Tee,
    Cross,
}

/// Stress on the HSS connecting face, for the chord-stress interaction Qf.
#[derive(Debug, Clone, Copy, PartialEq)]
pub enum ChordFace {
    /// Connecting surface in tension: Qf = 1.
    Tension,
    /// Connecting surface in compression, with the utilization U = |Pro/(Fc Ag) + Mro/(Fc S)|
    /// on the side of the joint with the lower compression stress.
    Compression { utilization: f64 },
}

/// Clause of the round HSS table.
pub fn round_clause(_edition: Edition) -> &'static str {
    "K2, Table K2.1"
}

/// Clause of the rectangular HSS table.
pub fn rectangular_clause(_edition: Edition) -> &'static str {
    "K2, Table K2.2"
}

fn check_face(face: ChordFace, out_of_scope: &mut Vec<String>) -> Result<f64, InputError> {
    match face {
        ChordFace::Tension => Ok(0.0),
        ChordFace::Compression { utilization } => {
            if !(utilization.is_finite() && utilization >= 0.0) {
                return Err(InputError::new(
                    "U",
                    "the chord utilization must be a finite number of zero or more",
                ));
            }
            if utilization > 1.0 {
                out_of_scope.push(format!(
                    "chord utilization U = {utilization:.3} above 1: the HSS itself is overstressed"
                ));
            }
            Ok(utilization)
        }
    }
}

/// Qf for round HSS, Table K2.1 functions: 1 in tension, 1.0 − 0.3 U (1 + U) in compression.
pub fn chord_stress_factor_round(face: ChordFace) -> f64 {
    match face {
        ChordFace::Tension => 1.0,
        ChordFace::Compression { utilization: u } => (1.0 - 0.3 * u * (1.0 + u)).max(0.0),
    }
}

/// Qf for rectangular HSS with a transverse plate, Table K2.2 functions: 1 in tension,
/// 1.3 − 0.4 U/β ≤ 1.0 in compression.
pub fn chord_stress_factor_rect_transverse(face: ChordFace, beta: f64) -> f64 {
    match face {
        ChordFace::Tension => 1.0,
        ChordFace::Compression { utilization: u } => (1.3 - 0.4 * u / beta).clamp(0.0, 1.0),
    }
}

/// Qf for rectangular HSS with a longitudinal plate, Table K2.2 functions: 1 in tension,
/// √(1 − U²) in compression.
pub fn chord_stress_factor_rect_longitudinal(face: ChordFace) -> f64 {
    match face {
        ChordFace::Tension => 1.0,
        ChordFace::Compression { utilization: u } => (1.0 - u * u).max(0.0).sqrt(),
    }
}

fn material_scope(fy: Stress, fu: Stress, out_of_scope: &mut Vec<String>) {
    if fy > Stress::ksi(52.0) + Stress::mpa(1e-9) {
        out_of_scope.push(format!(
            "Fy = {:.1} ksi above 52 ksi (360 MPa): outside the limits of applicability",
            fy.to_ksi()
        ));
    }
    let ratio = fy.si() / fu.si();
    if ratio > 0.8 + 1e-12 && !is_a500_grade_c_rectangular(fy, fu) {
        out_of_scope.push(format!(
            "Fy/Fu = {ratio:.3} above 0.8: outside the ductility limit of applicability"
        ));
    }
}

/// Fy = 50 ksi with Fu = 62 ksi (ASTM A500 Grade C, shaped): Fy/Fu = 0.806, which the tables'
/// ductility limit accepts by a note naming A500 Grade C (from memory).
fn is_a500_grade_c_rectangular(fy: Stress, fu: Stress) -> bool {
    (fy.to_ksi() - 50.0).abs() < 1e-6 && (fu.to_ksi() - 62.0).abs() < 1e-6
}

fn angle_scope(angle: Angle, out_of_scope: &mut Vec<String>) {
    if angle.to_deg() < 30.0 - 1e-9 {
        out_of_scope.push(format!(
            "plate angle θ = {:.1} deg below 30 deg: outside the limits of applicability",
            angle.to_deg()
        ));
    }
}

fn check_round(hss: &RoundHss) -> Result<(), InputError> {
    require_positive("D", hss.diameter.si(), "the outside diameter")?;
    require_positive("t", hss.wall.si(), "the design wall thickness")?;
    require_positive("Fy", hss.fy.si(), "the yield stress")?;
    require_positive("Fu", hss.fu.si(), "the tensile strength")?;
    if hss.wall * 2.0 >= hss.diameter {
        return Err(InputError::new("t", "the wall is as thick as the radius"));
    }
    Ok(())
}

fn check_rect(hss: &RectangularHss) -> Result<(), InputError> {
    require_positive("B", hss.width_b.si(), "the overall width")?;
    require_positive("H", hss.height_h.si(), "the overall height")?;
    require_positive("t", hss.wall.si(), "the design wall thickness")?;
    require_positive("Fy", hss.fy.si(), "the yield stress")?;
    require_positive("Fu", hss.fu.si(), "the tensile strength")?;
    if let Some(k) = hss.corner_radius {
        require_positive("k", k.si(), "the outside corner radius")?;
    }
    if hss.wall * 3.0 >= hss.width_b.min(hss.height_h) {
        return Err(InputError::new(
            "t",
            "the wall is too thick for the section (3t reaches B or H)",
        ));
    }
    Ok(())
}

fn check_angle(angle: Angle) -> Result<(), InputError> {
    let deg = angle.to_deg();
    if deg.is_finite() && deg > 0.0 && deg <= 90.0 {
        Ok(())
    } else {
        Err(InputError::new(
            "θ",
            format!(
                "the plate angle to the HSS axis must lie above 0 and up to 90 deg, got {deg} deg"
            ),
        ))
    }
}

fn round_slenderness_scope(hss: &RoundHss, connection: Connection, out: &mut Vec<String>) {
    let d_t = hss.diameter / hss.wall;
    let limit = match connection {
        Connection::Tee => 50.0,
        Connection::Cross => 40.0,
    };
    if d_t > limit {
        out.push(format!(
            "D/t = {d_t:.1} above {limit:.0} for a {} connection: outside Table K2.1A",
            match connection {
                Connection::Tee => "T-",
                Connection::Cross => "cross-",
            }
        ));
    }
}

/// Round HSS local yielding under a transverse plate, AISC 360 Table K2.1 Eq. K2-1:
/// Rn = Fy t² (5.5 / (1 − 0.81 Bp/D)) Qf; φ = 0.90, Ω = 1.67.
pub fn round_transverse_plate_local_yielding(
    edition: Edition,
    hss: &RoundHss,
    plate_width: Length,
    connection: Connection,
    face: ChordFace,
) -> Result<Strength, InputError> {
    check_round(hss)?;
    require_positive("Bp", plate_width.si(), "the plate width")?;
    let mut out = Vec::new();
    check_face(face, &mut out)?;
    let ratio = plate_width / hss.diameter;
    if ratio > 1.0 {
        return Err(InputError::new(
            "Bp",
            "a transverse plate wider than the HSS diameter is not a plate-to-round HSS connection",
        ));
    }
    if ratio <= 0.2 {
        out.push(format!(
            "Bp/D = {ratio:.3} not above 0.2: outside Table K2.1A"
        ));
    }
    round_slenderness_scope(hss, connection, &mut out);
    material_scope(hss.fy, hss.fu, &mut out);
    let qf = chord_stress_factor_round(face);
    let nominal = hss.fy * (hss.wall * hss.wall) * (5.5 / (1.0 - 0.81 * ratio)) * qf;
    Ok(Strength {
        citation: edition.cite(round_clause(edition), "K2-1"),
        formula: "Rn = Fy t² (5.5 / (1 − 0.81 Bp/D)) Qf",
        inputs: vec![
            Input::new("Fy", hss.fy, "HSS yield stress"),
            Input::new("t", hss.wall, "HSS design wall thickness"),
            Input::new("D", hss.diameter, "HSS outside diameter"),
            Input::new("Bp", plate_width, "plate width"),
            Input::new("Qf", number(qf), "chord-stress interaction factor"),
        ],
        nominal: nominal.into(),
        phi: 0.90,
        omega: 1.67,
        notes: vec![],
        out_of_scope: out,
    })
}

/// Round HSS plastification under a longitudinal plate, AISC 360 Table K2.1 Eq. K2-2:
/// Rn sin θ = 5.5 Fy t² (1 + 0.25 lb/D) Qf; φ = 0.90, Ω = 1.67.
pub fn round_longitudinal_plate_plastification(
    edition: Edition,
    hss: &RoundHss,
    plate_length: Length,
    angle: Angle,
    connection: Connection,
    face: ChordFace,
) -> Result<Strength, InputError> {
    check_round(hss)?;
    require_positive("lb", plate_length.si(), "the plate bearing length")?;
    check_angle(angle)?;
    let mut out = Vec::new();
    check_face(face, &mut out)?;
    round_slenderness_scope(hss, connection, &mut out);
    material_scope(hss.fy, hss.fu, &mut out);
    angle_scope(angle, &mut out);
    let qf = chord_stress_factor_round(face);
    let nominal = hss.fy
        * (hss.wall * hss.wall)
        * 5.5
        * (1.0 + 0.25 * (plate_length / hss.diameter))
        * qf
        * (1.0 / angle.to_rad().sin());
    Ok(Strength {
        citation: edition.cite(round_clause(edition), "K2-2"),
        formula: "Rn sin θ = 5.5 Fy t² (1 + 0.25 lb/D) Qf",
        inputs: vec![
            Input::new("Fy", hss.fy, "HSS yield stress"),
            Input::new("t", hss.wall, "HSS design wall thickness"),
            Input::new("D", hss.diameter, "HSS outside diameter"),
            Input::new("lb", plate_length, "plate bearing length along the HSS"),
            Input::new("θ", angle, "angle of the plate to the HSS axis"),
            Input::new("Qf", number(qf), "chord-stress interaction factor"),
        ],
        nominal: nominal.into(),
        phi: 0.90,
        omega: 1.67,
        notes: vec![],
        out_of_scope: out,
    })
}

fn punching_requirement(
    edition: Edition,
    clause: &'static str,
    wall: Length,
    fu: Stress,
    plate_thickness: Length,
    plate_fy: Stress,
    out_of_scope: Vec<String>,
) -> Requirement {
    let limit = wall * (fu / plate_fy);
    Requirement {
        citation: edition.cite(clause, "K2-3"),
        formula: "tp ≤ Fu t / Fyp",
        inputs: vec![
            Input::new("Fu", fu, "HSS tensile strength"),
            Input::new("t", wall, "HSS design wall thickness"),
            Input::new("Fyp", plate_fy, "plate yield stress"),
            Input::new("tp", plate_thickness, "plate thickness"),
        ],
        provided: plate_thickness.into(),
        required: limit.into(),
        bound: Bound::Maximum,
        notes: vec![
            "plate under shear loading: a plate no thicker than this cannot punch the HSS wall \
             before it yields; the plate's own limit states are checked separately"
                .to_string(),
        ],
        out_of_scope,
    }
}

/// Round HSS punching shear under a longitudinal plate in shear, AISC 360 Table K2.1 Eq. K2-3:
/// tp ≤ Fu t / Fyp; scope D/t ≤ 0.11 E/Fy (Table K2.1A).
pub fn round_plate_shear_punching(
    edition: Edition,
    hss: &RoundHss,
    plate_thickness: Length,
    plate_fy: Stress,
) -> Result<Requirement, InputError> {
    check_round(hss)?;
    require_positive("tp", plate_thickness.si(), "the plate thickness")?;
    require_positive("Fyp", plate_fy.si(), "the plate yield stress")?;
    let mut out = Vec::new();
    let d_t = hss.diameter / hss.wall;
    let limit = 0.11 * (modulus_of_elasticity() / hss.fy);
    if d_t > limit {
        out.push(format!(
            "D/t = {d_t:.1} above 0.11 E/Fy = {limit:.1}: outside Table K2.1A"
        ));
    }
    material_scope(hss.fy, hss.fu, &mut out);
    Ok(punching_requirement(
        edition,
        round_clause(edition),
        hss.wall,
        hss.fu,
        plate_thickness,
        plate_fy,
        out,
    ))
}

/// Rectangular HSS punching shear under a longitudinal plate in shear, AISC 360 Table K2.2
/// (same rule as Eq. K2-3): tp ≤ Fu t / Fyp; scope (B − 3t)/t ≤ 1.40 √(E/Fy) (Table K2.2A).
pub fn rect_plate_shear_punching(
    edition: Edition,
    hss: &RectangularHss,
    plate_thickness: Length,
    plate_fy: Stress,
) -> Result<Requirement, InputError> {
    check_rect(hss)?;
    require_positive("tp", plate_thickness.si(), "the plate thickness")?;
    require_positive("Fyp", plate_fy.si(), "the plate yield stress")?;
    let mut out = Vec::new();
    let flat = (hss.width_b - hss.wall * 3.0) / hss.wall;
    let limit = 1.40 * (modulus_of_elasticity() / hss.fy).sqrt();
    if flat > limit {
        out.push(format!(
            "(B − 3t)/t = {flat:.1} above 1.40 √(E/Fy) = {limit:.1}: outside Table K2.2A"
        ));
    }
    material_scope(hss.fy, hss.fu, &mut out);
    Ok(punching_requirement(
        edition,
        rectangular_clause(edition),
        hss.wall,
        hss.fu,
        plate_thickness,
        plate_fy,
        out,
    ))
}

/// A plate across a rectangular HSS face.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct TransversePlate {
    /// Bp: plate width across the HSS face.
    pub width: Length,
    /// tp: plate thickness.
    pub thickness: Length,
    /// Fyp: plate yield stress.
    pub fy: Stress,
}

fn check_transverse(
    hss: &RectangularHss,
    plate: &TransversePlate,
) -> Result<(f64, Vec<String>), InputError> {
    check_rect(hss)?;
    require_positive("Bp", plate.width.si(), "the plate width")?;
    require_positive("tp", plate.thickness.si(), "the plate thickness")?;
    require_positive("Fyp", plate.fy.si(), "the plate yield stress")?;
    let beta = plate.width / hss.width_b;
    if beta > 1.0 + 1e-9 {
        return Err(InputError::new(
            "Bp",
            "a transverse plate wider than the HSS face is outside the plate-to-HSS tables",
        ));
    }
    let mut out = Vec::new();
    if beta <= 0.25 {
        out.push(format!(
            "Bp/B = {beta:.3} not above 0.25: outside Table K2.2A"
        ));
    }
    let b_t = hss.width_b / hss.wall;
    let h_t = hss.height_h / hss.wall;
    if b_t > 35.0 || h_t > 35.0 {
        out.push(format!(
            "B/t = {b_t:.1}, H/t = {h_t:.1}: above 35 for a transverse plate, outside Table K2.2A"
        ));
    }
    material_scope(hss.fy, hss.fu, &mut out);
    Ok((beta, out))
}

/// Effective width of a transverse plate on a rectangular HSS, AISC 360 K1 definitions:
/// Bep = 10 Bp / (B/t) ≤ Bp.
pub fn effective_plate_width(hss: &RectangularHss, plate_width: Length) -> Length {
    (plate_width * (10.0 / (hss.width_b / hss.wall))).min(plate_width)
}

/// Local yielding of a transverse plate on a rectangular HSS, AISC 360 Table K2.2 Eq. K2-7:
/// Rn = 10 Fy t Bp / (B/t) ≤ Fyp tp Bp; φ = 0.95, Ω = 1.58.
pub fn rect_transverse_plate_local_yielding(
    edition: Edition,
    hss: &RectangularHss,
    plate: &TransversePlate,
) -> Result<Strength, InputError> {
    let (_, out) = check_transverse(hss, plate)?;
    let b_t = hss.width_b / hss.wall;
    let wall_value = hss.fy * hss.wall * plate.width * (10.0 / b_t);
    let plate_value = plate.fy * plate.thickness * plate.width;
    let mut notes = Vec::new();
    if plate_value < wall_value {
        notes.push("capped at the plate's own yield strength Fyp tp Bp".to_string());
    }
    Ok(Strength {
        citation: edition.cite(rectangular_clause(edition), "K2-7"),
        formula: "Rn = 10 Fy t Bp / (B/t) ≤ Fyp tp Bp",
        inputs: vec![
            Input::new("Fy", hss.fy, "HSS yield stress"),
            Input::new("t", hss.wall, "HSS design wall thickness"),
            Input::new("B", hss.width_b, "HSS width of the loaded face"),
            Input::new("Bp", plate.width, "plate width"),
            Input::new("tp", plate.thickness, "plate thickness"),
            Input::new("Fyp", plate.fy, "plate yield stress"),
        ],
        nominal: wall_value.min(plate_value).into(),
        phi: 0.95,
        omega: 1.58,
        notes,
        out_of_scope: out,
    })
}

/// Shear yielding (punching) of a rectangular HSS face under a transverse plate, AISC 360
/// Table K2.2 Eq. K2-8: Rn = 0.6 Fy t (2 tp + 2 Bep), for 0.85 B ≤ Bp ≤ B − 2t;
/// φ = 0.95, Ω = 1.58. None where the plate width is outside that range.
pub fn rect_transverse_plate_shear_yielding(
    edition: Edition,
    hss: &RectangularHss,
    plate: &TransversePlate,
) -> Result<Option<Strength>, InputError> {
    let (_, out) = check_transverse(hss, plate)?;
    let lower = hss.width_b * 0.85;
    let upper = hss.width_b - hss.wall * 2.0;
    if plate.width < lower || plate.width > upper {
        return Ok(None);
    }
    let bep = effective_plate_width(hss, plate.width);
    let nominal = hss.fy * hss.wall * (plate.thickness * 2.0 + bep * 2.0) * 0.6;
    Ok(Some(Strength {
        citation: edition.cite(rectangular_clause(edition), "K2-8"),
        formula: "Rn = 0.6 Fy t (2 tp + 2 Bep), Bep = 10 Bp / (B/t) ≤ Bp",
        inputs: vec![
            Input::new("Fy", hss.fy, "HSS yield stress"),
            Input::new("t", hss.wall, "HSS design wall thickness"),
            Input::new("B", hss.width_b, "HSS width of the loaded face"),
            Input::new("Bp", plate.width, "plate width"),
            Input::new("tp", plate.thickness, "plate thickness"),
            Input::new("Bep", bep, "effective plate width"),
        ],
        nominal: nominal.into(),
        phi: 0.95,
        omega: 1.58,
        notes: vec![],
        out_of_scope: out,
    }))
}

fn corner_radius(hss: &RectangularHss) -> (Length, Option<String>) {
    match hss.corner_radius {
        Some(k) => (k, None),
        None => (
            hss.wall * 1.5,
            Some("outside corner radius not given: k taken as 1.5 t".to_string()),
        ),
    }
}

/// Whether a transverse plate bears on the sidewalls (β = 1.0 in Table K2.2): taken as a plate
/// wider than B − 2t, where the face shear-yielding rule stops.
fn bears_on_sidewalls(hss: &RectangularHss, plate: &TransversePlate) -> bool {
    plate.width > hss.width_b - hss.wall * 2.0
}

/// Local yielding of rectangular HSS sidewalls under a full-width transverse plate, AISC 360
/// Table K2.2 Eq. K2-9: Rn = 2 Fy t (5k + lb), lb = tp; φ = 1.00, Ω = 1.50. None where β < 1.
pub fn rect_sidewall_local_yielding(
    edition: Edition,
    hss: &RectangularHss,
    plate: &TransversePlate,
) -> Result<Option<Strength>, InputError> {
    let (_, out) = check_transverse(hss, plate)?;
    if !bears_on_sidewalls(hss, plate) {
        return Ok(None);
    }
    let (k, k_note) = corner_radius(hss);
    let lb = plate.thickness;
    let nominal = hss.fy * hss.wall * (k * 5.0 + lb) * 2.0;
    let mut notes =
        vec!["applied to a plate wider than B − 2t (Table K2.2 states β = 1.0)".to_string()];
    notes.extend(k_note);
    Ok(Some(Strength {
        citation: edition.cite(rectangular_clause(edition), "K2-9"),
        formula: "Rn = 2 Fy t (5k + lb)",
        inputs: vec![
            Input::new("Fy", hss.fy, "HSS yield stress"),
            Input::new("t", hss.wall, "HSS design wall thickness"),
            Input::new("k", k, "outside corner radius"),
            Input::new("lb", lb, "bearing length (plate thickness)"),
        ],
        nominal: nominal.into(),
        phi: 1.00,
        omega: 1.50,
        notes,
        out_of_scope: out,
    }))
}

/// Local crippling of rectangular HSS sidewalls under a full-width transverse plate in
/// compression, AISC 360 Table K2.2 Eq. K2-10 (T: Rn = 1.6 t² (1 + 3 lb/(H − 3t)) √(E Fy) Qf,
/// φ 0.75, Ω 2.00) and Eq. K2-11 (cross: Rn = 48 t³/(H − 3t) √(E Fy) Qf, φ 0.90, Ω 1.67).
/// None where β < 1. Call it only for a plate pushing on the HSS.
pub fn rect_sidewall_local_crippling(
    edition: Edition,
    hss: &RectangularHss,
    plate: &TransversePlate,
    connection: Connection,
    face: ChordFace,
) -> Result<Option<Strength>, InputError> {
    let (beta, mut out) = check_transverse(hss, plate)?;
    check_face(face, &mut out)?;
    if !bears_on_sidewalls(hss, plate) {
        return Ok(None);
    }
    let qf = chord_stress_factor_rect_transverse(face, beta);
    let t = hss.wall.to_mm();
    let flat = hss.height_h.to_mm() - 3.0 * t;
    let lb = plate.thickness.to_mm();
    let root = (modulus_of_elasticity().to_mpa() * hss.fy.to_mpa()).sqrt();
    let (equation, formula, n_mm, phi, omega) = match connection {
        Connection::Tee => (
            "K2-10",
            "Rn = 1.6 t² (1 + 3 lb/(H − 3t)) √(E Fy) Qf",
            1.6 * t * t * (1.0 + 3.0 * lb / flat) * root * qf,
            0.75,
            2.00,
        ),
        Connection::Cross => (
            "K2-11",
            "Rn = 48 t³ / (H − 3t) √(E Fy) Qf",
            48.0 * t * t * t / flat * root * qf,
            0.90,
            1.67,
        ),
    };
    Ok(Some(Strength {
        citation: edition.cite(rectangular_clause(edition), equation),
        formula,
        inputs: vec![
            Input::new("t", hss.wall, "HSS design wall thickness"),
            Input::new("H", hss.height_h, "HSS height"),
            Input::new("lb", plate.thickness, "bearing length (plate thickness)"),
            Input::new("E", modulus_of_elasticity(), "modulus of elasticity"),
            Input::new("Fy", hss.fy, "HSS yield stress"),
            Input::new("Qf", number(qf), "chord-stress interaction factor"),
        ],
        nominal: crate::units::Force::n(n_mm).into(),
        phi,
        omega,
        notes: vec!["applied to a plate wider than B − 2t (Table K2.2 states β = 1.0)".to_string()],
        out_of_scope: out,
    }))
}

/// Rectangular HSS wall plastification under a longitudinal plate, AISC 360 Table K2.2
/// Eq. K2-12: Rn sin θ = Fy t² / (1 − tp/B) (2 lb/B + 4 √(1 − tp/B) Qf); φ = 1.00, Ω = 1.50.
pub fn rect_longitudinal_plate_plastification(
    edition: Edition,
    hss: &RectangularHss,
    plate_thickness: Length,
    plate_length: Length,
    angle: Angle,
    face: ChordFace,
) -> Result<Strength, InputError> {
    check_rect(hss)?;
    require_positive("tp", plate_thickness.si(), "the plate thickness")?;
    require_positive("lb", plate_length.si(), "the plate bearing length")?;
    check_angle(angle)?;
    let mut out = Vec::new();
    check_face(face, &mut out)?;
    let b_t = hss.width_b / hss.wall;
    if b_t > 40.0 {
        out.push(format!(
            "B/t = {b_t:.1} above 40 for a longitudinal plate: outside Table K2.2A"
        ));
    }
    material_scope(hss.fy, hss.fu, &mut out);
    angle_scope(angle, &mut out);
    let eta = plate_thickness / hss.width_b;
    if eta >= 1.0 {
        return Err(InputError::new(
            "tp",
            "the plate is as thick as the HSS is wide",
        ));
    }
    let qf = chord_stress_factor_rect_longitudinal(face);
    let bracket = 2.0 * (plate_length / hss.width_b) + 4.0 * (1.0 - eta).sqrt() * qf;
    let nominal = hss.fy * (hss.wall * hss.wall) * (bracket / (1.0 - eta) / angle.to_rad().sin());
    Ok(Strength {
        citation: edition.cite(rectangular_clause(edition), "K2-12"),
        formula: "Rn sin θ = Fy t² / (1 − tp/B) (2 lb/B + 4 √(1 − tp/B) Qf)",
        inputs: vec![
            Input::new("Fy", hss.fy, "HSS yield stress"),
            Input::new("t", hss.wall, "HSS design wall thickness"),
            Input::new("B", hss.width_b, "HSS width of the loaded face"),
            Input::new("tp", plate_thickness, "plate thickness"),
            Input::new("lb", plate_length, "plate bearing length along the HSS"),
            Input::new("θ", angle, "angle of the plate to the HSS axis"),
            Input::new("Qf", number(qf), "chord-stress interaction factor"),
        ],
        nominal: nominal.into(),
        phi: 1.00,
        omega: 1.50,
        notes: vec![],
        out_of_scope: out,
    })
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::units::Force;

    const E22: Edition = Edition::Aisc360_22;

    fn round(d: f64, t: f64, fy: f64, fu: f64) -> RoundHss {
        RoundHss {
            diameter: Length::inch(d),
            wall: Length::inch(t),
            fy: Stress::ksi(fy),
            fu: Stress::ksi(fu),
        }
    }

    fn kip_of(s: &Strength) -> f64 {
        Force::from_si(s.nominal.si).to_kip()
    }

    /// Hand-worked from the printed equations (AISC 360-22 Table K2.1 Eq. K2-1, Table K2.2
    /// Eq. K2-8, K2-10, K2-11, from memory), connecting face in tension (Qf = 1):
    /// - K2-1: D = 6, t = 0.25, Fy = 50, Bp = 4: Rn = 50 (0.0625) 5.5 / (1 − 0.81 × 4/6)
    ///   = 17.1875 / 0.46 = 37.364 kip;
    /// - K2-8: B = H = 4, t = 0.25, Bp = 3.5 (0.85 B ≤ Bp ≤ B − 2t), tp = 0.5:
    ///   Bep = 10 × 3.5 / 16 = 2.1875; Rn = 0.6 (50)(0.25)(2 × 0.5 + 2 × 2.1875) = 40.3125 kip;
    /// - K2-10 (T) and K2-11 (cross): Bp = B = 4 (β = 1), tp = lb = 0.5, √(E Fy) = √(29000 × 50)
    ///   = 1204.159 ksi: Rn = 1.6 (0.0625)(1 + 3 × 0.5 / (4 − 0.75)) 1204.159 = 175.992 kip;
    ///   Rn = 48 (0.015625) / 3.25 × 1204.159 = 277.883 kip.
    #[test]
    fn hand_worked_transverse_plate_equations() {
        let hss = round(6.0, 0.25, 50.0, 62.0);
        let s = round_transverse_plate_local_yielding(
            E22,
            &hss,
            Length::inch(4.0),
            Connection::Tee,
            ChordFace::Tension,
        )
        .unwrap();
        assert!((kip_of(&s) - 37.364).abs() < 1e-3, "{}", kip_of(&s));
        let r = rect(4.0, 4.0, 0.25);
        let plate = |bp: f64| TransversePlate {
            width: Length::inch(bp),
            thickness: Length::inch(0.5),
            fy: Stress::ksi(36.0),
        };
        let s = rect_transverse_plate_shear_yielding(E22, &r, &plate(3.5))
            .unwrap()
            .expect("0.85 B ≤ Bp ≤ B − 2t");
        assert!((kip_of(&s) - 40.3125).abs() < 1e-6, "{}", kip_of(&s));
        let t = rect_sidewall_local_crippling(
            E22,
            &r,
            &plate(4.0),
            Connection::Tee,
            ChordFace::Tension,
        )
        .unwrap()
        .expect("β = 1");
        assert!((kip_of(&t) - 175.992).abs() < 1e-2, "{}", kip_of(&t));
        let x = rect_sidewall_local_crippling(
            E22,
            &r,
            &plate(4.0),
            Connection::Cross,
            ChordFace::Tension,
        )
        .unwrap()
        .expect("β = 1");
        assert!((kip_of(&x) - 277.883).abs() < 1e-2, "{}", kip_of(&x));
    }

    fn rect(b: f64, h: f64, t: f64) -> RectangularHss {
        RectangularHss {
            width_b: Length::inch(b),
            height_h: Length::inch(h),
            wall: Length::inch(t),
            corner_radius: None,
            fy: Stress::ksi(50.0),
            fu: Stress::ksi(62.0),
        }
    }

    fn kip(s: &Strength) -> f64 {
        Force::from_si(s.nominal.si).to_kip()
    }

    #[test]
    fn round_scope_entries() {
        let slender = round(12.0, 0.2, 46.0, 62.0); // D/t = 60
        let s = round_transverse_plate_local_yielding(
            E22,
            &slender,
            Length::inch(1.0),
            Connection::Tee,
            ChordFace::Tension,
        )
        .unwrap();
        // D/t above 50 and Bp/D = 0.083 ≤ 0.2
        assert_eq!(s.out_of_scope.len(), 2, "{:?}", s.out_of_scope);
        let cross = round(9.0, 0.2, 46.0, 62.0); // D/t = 45: fine for T, not for cross
        let t = round_longitudinal_plate_plastification(
            E22,
            &cross,
            Length::inch(4.0),
            Angle::deg(90.0),
            Connection::Tee,
            ChordFace::Tension,
        )
        .unwrap();
        assert!(t.out_of_scope.is_empty());
        let c = round_longitudinal_plate_plastification(
            E22,
            &cross,
            Length::inch(4.0),
            Angle::deg(25.0),
            Connection::Cross,
            ChordFace::Tension,
        )
        .unwrap();
        assert_eq!(c.out_of_scope.len(), 2, "{:?}", c.out_of_scope);
        let strong = round(6.0, 0.25, 70.0, 80.0);
        let p = round_plate_shear_punching(E22, &strong, Length::inch(0.25), Stress::ksi(36.0))
            .unwrap();
        // Fy above 52 ksi and Fy/Fu = 0.875
        assert_eq!(p.out_of_scope.len(), 2, "{:?}", p.out_of_scope);
    }

    #[test]
    fn round_rejections() {
        let hss = round(6.0, 0.25, 46.0, 62.0);
        let err = round_transverse_plate_local_yielding(
            E22,
            &hss,
            Length::inch(7.0),
            Connection::Tee,
            ChordFace::Tension,
        )
        .unwrap_err();
        assert_eq!(err.symbol, "Bp");
        let err = round_longitudinal_plate_plastification(
            E22,
            &hss,
            Length::inch(4.0),
            Angle::deg(0.0),
            Connection::Tee,
            ChordFace::Tension,
        )
        .unwrap_err();
        assert_eq!(err.symbol, "θ");
        let err = round_transverse_plate_local_yielding(
            E22,
            &hss,
            Length::inch(3.0),
            Connection::Tee,
            ChordFace::Compression { utilization: -0.1 },
        )
        .unwrap_err();
        assert_eq!(err.symbol, "U");
        let over = round_transverse_plate_local_yielding(
            E22,
            &hss,
            Length::inch(3.0),
            Connection::Tee,
            ChordFace::Compression { utilization: 1.2 },
        )
        .unwrap();
        assert!(over.out_of_scope[0].contains("overstressed"));
        assert_eq!(
            check_round(&round(1.0, 0.5, 46.0, 62.0))
                .unwrap_err()
                .symbol,
            "t"
        );
    }

    #[test]
    fn ductility_limit_accepts_only_the_a500_c_pair() {
        let mut out = Vec::new();
        material_scope(Stress::ksi(50.0), Stress::ksi(62.0), &mut out);
        assert!(out.is_empty());
        material_scope(Stress::ksi(50.0), Stress::ksi(61.0), &mut out);
        assert_eq!(out.len(), 1);
        assert!(out[0].contains("ductility"));
    }

    #[test]
    fn chord_stress_factors() {
        assert_eq!(chord_stress_factor_round(ChordFace::Tension), 1.0);
        let c = ChordFace::Compression { utilization: 0.5 };
        assert!((chord_stress_factor_round(c) - (1.0 - 0.3 * 0.5 * 1.5)).abs() < 1e-12);
        assert!((chord_stress_factor_rect_longitudinal(c) - 0.75f64.sqrt()).abs() < 1e-12);
        // 1.3 − 0.4 (0.5)/1.0 = 1.1 → capped at 1.0; at β = 0.5: 1.3 − 0.4 = 0.9
        assert_eq!(chord_stress_factor_rect_transverse(c, 1.0), 1.0);
        assert!((chord_stress_factor_rect_transverse(c, 0.5) - 0.9).abs() < 1e-12);
    }

    #[test]
    fn rect_transverse_branches() {
        let hss = rect(8.0, 8.0, 0.25);
        let narrow = TransversePlate {
            width: Length::inch(4.0),
            thickness: Length::inch(0.5),
            fy: Stress::ksi(36.0),
        };
        assert!(rect_transverse_plate_shear_yielding(E22, &hss, &narrow)
            .unwrap()
            .is_none());
        assert!(rect_sidewall_local_yielding(E22, &hss, &narrow)
            .unwrap()
            .is_none());
        let mid = TransversePlate {
            width: Length::inch(7.0),
            ..narrow
        };
        assert!(rect_transverse_plate_shear_yielding(E22, &hss, &mid)
            .unwrap()
            .is_some());
        let full = TransversePlate {
            width: Length::inch(8.0),
            ..narrow
        };
        let side = rect_sidewall_local_yielding(E22, &hss, &full)
            .unwrap()
            .unwrap();
        assert!(side.notes.iter().any(|n| n.contains("1.5 t")));
        let t =
            rect_sidewall_local_crippling(E22, &hss, &full, Connection::Tee, ChordFace::Tension)
                .unwrap()
                .unwrap();
        let x =
            rect_sidewall_local_crippling(E22, &hss, &full, Connection::Cross, ChordFace::Tension)
                .unwrap()
                .unwrap();
        assert_eq!(
            (t.citation.equation, x.citation.equation),
            ("K2-10", "K2-11")
        );
        let wide = TransversePlate {
            width: Length::inch(8.5),
            ..narrow
        };
        assert_eq!(
            rect_transverse_plate_local_yielding(E22, &hss, &wide)
                .unwrap_err()
                .symbol,
            "Bp"
        );
        let slender = rect(10.0, 10.0, 0.25); // B/t = 40
        let s = rect_transverse_plate_local_yielding(E22, &slender, &mid).unwrap();
        assert_eq!(s.out_of_scope.len(), 1, "{:?}", s.out_of_scope);
    }

    #[test]
    fn plate_cap_on_local_yielding() {
        // A thin plate: Fyp tp Bp governs over the wall term.
        let hss = rect(6.0, 6.0, 0.375);
        let thin = TransversePlate {
            width: Length::inch(5.0),
            thickness: Length::inch(0.125),
            fy: Stress::ksi(36.0),
        };
        let s = rect_transverse_plate_local_yielding(E22, &hss, &thin).unwrap();
        assert!((kip(&s) - 36.0 * 0.125 * 5.0).abs() < 1e-9);
        assert!(s.notes[0].contains("capped"));
    }

    #[test]
    fn rect_longitudinal_scope_and_rejection() {
        let slender = rect(12.0, 12.0, 0.25); // B/t = 48
        let s = rect_longitudinal_plate_plastification(
            E22,
            &slender,
            Length::inch(0.5),
            Length::inch(6.0),
            Angle::deg(90.0),
            ChordFace::Tension,
        )
        .unwrap();
        assert_eq!(s.out_of_scope.len(), 1);
        let punch =
            rect_plate_shear_punching(E22, &slender, Length::inch(0.5), Stress::ksi(36.0)).unwrap();
        // (12 − 0.75)/0.25 = 45 > 1.40 √(29000/50) = 33.7
        assert_eq!(punch.out_of_scope.len(), 1);
        assert!(punch.ratio() > 1.0);
    }
}
