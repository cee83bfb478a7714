//! Checks of the whole project rather than one member end: where one rule needs every
//! connection at once (the same bolt diameter in two grades, which the shop can mix up).

use super::{CheckResult, Status};
use crate::catalogue::same_size;
use crate::model::{End, Model};
use crate::standards::{number, Bound, Citation, Input, Requirement};
use crate::units::{Length, UnitSystem};

/// Citation of the one-grade-per-diameter rule: common practice, no clause.
pub const ONE_GRADE_PER_DIAMETER: Citation =
    Citation::new("common practice", "one bolt grade per nominal diameter", "");

/// The project-level checks, in a stable order (by diameter).
pub fn project_checks(model: &Model) -> Vec<CheckResult> {
    bolt_uses_by_diameter(model)
        .into_iter()
        .map(|(d, uses)| {
            let mut c = CheckResult::requirement(
                "bolt_grades_per_diameter",
                format!("bolts d = {}", show(d, model.project.units)),
                bolt_grades_per_diameter(d, &uses, model.project.units),
                false,
            );
            if c.status == Status::Fail {
                // a practice, not a clause: the engineer decides
                c.status = Status::Warn;
                c.notes
                    .push("a rule of practice: more than one grade warns, it does not fail".into());
            }
            c
        })
        .collect()
}

fn show(d: Length, units: UnitSystem) -> String {
    crate::sheet::format::length(d, units, false)
}

/// The bolt grades used at one nominal diameter, each with the connections using it, in the
/// order of the members.
type GradeUses = Vec<(String, Vec<String>)>;

/// Every nominal bolt diameter of the model with the grades used at it.
fn bolt_uses_by_diameter(model: &Model) -> Vec<(Length, GradeUses)> {
    let mut out: Vec<(Length, GradeUses)> = Vec::new();
    for m in &model.members {
        for (end, id) in [(End::Start, &m.start), (End::End, &m.end)] {
            let Some(d) = id
                .as_ref()
                .and_then(|id| model.details.iter().find(|d| &d.id == id))
            else {
                continue;
            };
            let b = &d.bolts;
            let at = format!("{}/{}", m.id, end.as_str());
            let i = match out.iter().position(|(x, _)| same_size(*x, b.thread.d)) {
                Some(i) => i,
                None => {
                    out.push((b.thread.d, Vec::new()));
                    out.len() - 1
                }
            };
            // a grade in two finishes counts twice: plain and galvanized bolts of one size take
            // different nuts, and the shop can mix them up as readily as two grades
            let grade = match b.bolt_type.finish {
                crate::catalogue::Finish::Plain => b.grade.name.clone(),
                f => format!("{} ({})", b.grade.name, f.as_str()),
            };
            let grades = &mut out[i].1;
            match grades.iter_mut().find(|(g, _)| g == &grade) {
                Some((_, ats)) => ats.push(at),
                None => grades.push((grade, vec![at])),
            }
        }
    }
    out.sort_by(|a, b| a.0.to_mm().total_cmp(&b.0.to_mm()));
    out
}

/// bolt_grades_per_diameter: at most one bolt grade per nominal diameter on the project, so the
/// shop cannot put a weaker bolt where a stronger one of the same size belongs (common practice).
fn bolt_grades_per_diameter(d: Length, uses: &GradeUses, units: UnitSystem) -> Requirement {
    let mut notes: Vec<String> = uses
        .iter()
        .map(|(g, at)| format!("{g} at {}", at.join(", ")))
        .collect();
    if uses.len() > 1 {
        notes.push(format!(
            "{} bolt grades share the diameter {}: bolts of one size look alike in the shop and the field and can be mixed up; use one grade at this diameter, or mark and bag each grade apart and check the head markings at fit-up",
            uses.len(),
            show(d, units)
        ));
    }
    Requirement {
        citation: ONE_GRADE_PER_DIAMETER,
        formula: "bolt grades at one nominal diameter ≤ 1",
        inputs: vec![
            Input::new("d", d, "nominal bolt diameter"),
            Input::new(
                "grades",
                number(uses.len() as f64),
                "bolt grades used at this diameter",
            ),
        ],
        provided: number(uses.len() as f64),
        required: number(1.0),
        bound: Bound::Maximum,
        notes,
        out_of_scope: vec![],
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::model::{load, LoadOptions};
    use std::path::Path;

    #[test]
    fn one_grade_at_a_diameter_passes_and_a_second_grade_warns() {
        let path = Path::new(env!("CARGO_MANIFEST_DIR"))
            .join("examples/quillon-brook-footbridge/model.toml");
        let mut model = load(&path, &LoadOptions::default()).expect("the demo model loads");
        // the demo mixes grades at 1/2 in. on purpose; give every detail the first one's grade
        let first = model.details[0].bolts.grade.clone();
        for d in &mut model.details {
            d.bolts.grade = first.clone();
        }
        let rows = project_checks(&model);
        assert_eq!(rows.len(), 1);
        assert_eq!(rows[0].status, Status::Pass);
        assert_eq!(rows[0].subject, "bolts d = 1/2 in");
        let mut other = model.details[0].bolts.grade.clone();
        other.name = "a second grade".into();
        model.details[0].bolts.grade = other;
        let rows = project_checks(&model);
        assert_eq!(rows[0].status, Status::Warn);
        assert!(
            rows[0].notes[0].starts_with("a second grade at ")
                || rows[0].notes[1].starts_with("a second grade at "),
            "{:?}",
            rows[0].notes
        );
        assert!(rows[0].notes[2].contains("2 bolt grades share the diameter 1/2 in"));
    }
}
