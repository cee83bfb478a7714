//! AISC 360 J3.7 (360-16 J3.6) and J3.8 (360-16 J3.7) — tensile and shear strength of bolts, alone
//! and combined, in bearing-type joints.

use super::super::input::{require_non_negative, require_positive, InputError};
use super::super::Edition;
use super::{BoltStresses, J3Clause};
use crate::standards::{Input, Method, Strength};
use crate::units::{Area, Length, Stress};

/// Nominal unthreaded body area of a bolt, Ab = π d² / 4 (AISC 360 J3.7, definition of Ab).
pub fn nominal_body_area(d: Length) -> Area {
    std::f64::consts::FRAC_PI_4 * (d * d)
}

fn carried(
    stresses: &BoltStresses,
    mut inputs: Vec<Input>,
) -> (Vec<Input>, Vec<String>, Vec<String>) {
    let mut all = stresses.inputs.clone();
    all.append(&mut inputs);
    (all, stresses.notes.clone(), stresses.out_of_scope.clone())
}

/// AISC 360 J3.7 Eq. J3-1 (360-16 J3.6) — bolt shear rupture, Rn = Fnv Ab per shear plane; φ 0.75, Ω 2.00.
pub fn bolt_shear(
    edition: Edition,
    stresses: &BoltStresses,
    d: Length,
    shear_planes: u32,
) -> Result<Strength, InputError> {
    require_positive("d", d.si())?;
    if shear_planes == 0 {
        return Err(InputError::new(
            "n_s",
            "a bolt in shear needs at least one shear plane",
        ));
    }
    let ab = nominal_body_area(d);
    let n = f64::from(shear_planes);
    let (inputs, notes, out_of_scope) = carried(
        stresses,
        vec![
            Input::new("Ab", ab, "nominal unthreaded body area of the bolt"),
            Input::new("n_s", n, "number of shear planes"),
        ],
    );
    Ok(Strength {
        citation: edition.cite(J3Clause::TensionAndShear.number(edition), "J3-1"),
        formula: "Rn = Fnv Ab n_s",
        inputs,
        nominal: (n * (stresses.fnv * ab)).into(),
        phi: 0.75,
        omega: 2.00,
        notes,
        out_of_scope,
    })
}

/// AISC 360 J3.7 Eq. J3-1 (360-16 J3.6) — bolt tension rupture, Rn = Fnt Ab; φ 0.75, Ω 2.00.
pub fn bolt_tension(
    edition: Edition,
    stresses: &BoltStresses,
    d: Length,
) -> Result<Strength, InputError> {
    require_positive("d", d.si())?;
    let ab = nominal_body_area(d);
    let (inputs, notes, out_of_scope) = carried(
        stresses,
        vec![Input::new(
            "Ab",
            ab,
            "nominal unthreaded body area of the bolt",
        )],
    );
    Ok(Strength {
        citation: edition.cite(J3Clause::TensionAndShear.number(edition), "J3-1"),
        formula: "Rn = Fnt Ab",
        inputs,
        nominal: (stresses.fnt * ab).into(),
        phi: 0.75,
        omega: 2.00,
        notes,
        out_of_scope,
    })
}

/// AISC 360 J3.8 Eq. J3-2 with J3-3a (LRFD) / J3-3b (ASD) (360-16 J3.7) — bolt tension with shear,
/// Rn = F'nt Ab, F'nt = 1.3 Fnt − Fnt frv / (φ Fnv) (LRFD) or 1.3 Fnt − Ω Fnt frv / Fnv (ASD), ≤ Fnt;
/// φ 0.75, Ω 2.00.
///
/// `frv` is the required shear stress (factored for LRFD, service for ASD) on the bolt.
pub fn bolt_tension_with_shear(
    edition: Edition,
    stresses: &BoltStresses,
    d: Length,
    frv: Stress,
    method: Method,
) -> Result<Strength, InputError> {
    require_positive("d", d.si())?;
    require_non_negative("frv", frv.si())?;
    let (phi, omega) = (0.75, 2.00);
    let (fnt, fnv) = (stresses.fnt, stresses.fnv);
    let (equation, formula, reduced) = match method {
        Method::Lrfd => (
            "J3-3a",
            "Rn = F'nt Ab, F'nt = 1.3 Fnt − (Fnt / (φ Fnv)) frv ≤ Fnt",
            1.3 * fnt - (fnt.si() / (phi * fnv.si())) * frv,
        ),
        Method::Asd => (
            "J3-3b",
            "Rn = F'nt Ab, F'nt = 1.3 Fnt − (Ω Fnt / Fnv) frv ≤ Fnt",
            1.3 * fnt - (omega * fnt.si() / fnv.si()) * frv,
        ),
    };
    let mut f_nt_reduced = reduced.min(fnt);
    let ab = nominal_body_area(d);
    let (inputs, mut notes, out_of_scope) = carried(
        stresses,
        vec![
            Input::new("frv", frv, "required shear stress on the bolt"),
            Input::new("Ab", ab, "nominal unthreaded body area of the bolt"),
        ],
    );
    if f_nt_reduced.si() < 0.0 {
        f_nt_reduced = Stress::mpa(0.0);
        notes.push("the shear stress leaves no tensile strength: F'nt taken as zero".to_string());
    }
    let mut inputs = inputs;
    inputs.push(Input::new(
        "F'nt",
        f_nt_reduced,
        "nominal tensile stress modified for shear",
    ));
    notes.push(format!(
        "Eq. J3-2 with Eq. {equation}; the available shear stress must also equal or exceed frv"
    ));
    Ok(Strength {
        citation: edition.cite(J3Clause::CombinedTensionAndShear.number(edition), equation),
        formula,
        inputs,
        nominal: (f_nt_reduced * ab).into(),
        phi,
        omega,
        notes,
        out_of_scope,
    })
}

#[cfg(test)]
mod tests {
    use super::super::{table_j3_2, Bolt, BoltGrade, JointLoading, Series, Threads};
    use super::*;

    fn group_120(d_in: f64) -> BoltStresses {
        let bolt = Bolt {
            grade: BoltGrade::Group120,
            d: Length::inch(d_in),
            series: Series::Inch,
            threads: Threads::NotExcluded,
        };
        table_j3_2(Edition::Aisc360_22, &bolt, JointLoading::NotEndLoaded, None).unwrap()
    }

    #[test]
    fn shear_counts_planes_and_rejects_none() {
        let s = group_120(0.75);
        let one = bolt_shear(Edition::Aisc360_22, &s, Length::inch(0.75), 1).unwrap();
        let two = bolt_shear(Edition::Aisc360_22, &s, Length::inch(0.75), 2).unwrap();
        assert!((two.nominal.si - 2.0 * one.nominal.si).abs() < 1e-6);
        assert_eq!(one.citation.clause, "J3.7");
        assert_eq!(
            bolt_shear(Edition::Aisc360_22, &s, Length::inch(0.75), 0)
                .unwrap_err()
                .symbol,
            "n_s"
        );
        assert_eq!(
            bolt_shear(Edition::Aisc360_16, &s, Length::inch(0.0), 1)
                .unwrap_err()
                .symbol,
            "d"
        );
    }

    #[test]
    fn combined_is_capped_at_fnt_and_floored_at_zero() {
        let s = group_120(0.75);
        let d = Length::inch(0.75);
        let none =
            bolt_tension_with_shear(Edition::Aisc360_22, &s, d, Stress::ksi(0.0), Method::Lrfd)
                .unwrap();
        let plain = bolt_tension(Edition::Aisc360_22, &s, d).unwrap();
        assert!((none.nominal.si - plain.nominal.si).abs() < 1e-6);
        let huge =
            bolt_tension_with_shear(Edition::Aisc360_22, &s, d, Stress::ksi(100.0), Method::Asd)
                .unwrap();
        assert_eq!(huge.nominal.si, 0.0);
        assert!(huge.notes.iter().any(|n| n.contains("no tensile strength")));
        assert_eq!(huge.citation.equation, "J3-3b");
        assert_eq!(
            bolt_tension_with_shear(Edition::Aisc360_22, &s, d, Stress::ksi(-1.0), Method::Asd)
                .unwrap_err()
                .symbol,
            "frv"
        );
    }

    #[test]
    fn out_of_scope_travels_from_the_table() {
        let bolt = Bolt {
            grade: BoltGrade::OtherGrade {
                name: "SAE J429 Grade 5".into(),
                fu: Stress::ksi(120.0),
            },
            d: Length::inch(0.375),
            series: Series::Inch,
            threads: Threads::NotExcluded,
        };
        let s = table_j3_2(Edition::Aisc360_22, &bolt, JointLoading::NotEndLoaded, None).unwrap();
        let r = bolt_shear(Edition::Aisc360_22, &s, bolt.d, 1).unwrap();
        assert_eq!(r.out_of_scope.len(), 2);
    }
}
