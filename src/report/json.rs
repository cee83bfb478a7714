//! The JSON document of `jointbook check --format json`. Its keys are documented in the README
//! and held stable; values are in the units the document's `units` table names.

use super::CAUTION;
use crate::checks::{CheckResult, ConnectionReport, Report};
use crate::model::Model;
use crate::standards::{Bound, Method};
use crate::units::{Dim, Quantity, UnitSystem};
use serde_json::{json, Map, Value};

fn quantity(q: Quantity, units: UnitSystem) -> Value {
    json!({ "value": finite(units.value(q)), "unit": units.unit(q.dim) })
}

fn finite(v: f64) -> Value {
    if v.is_finite() {
        json!(v)
    } else {
        Value::Null
    }
}

fn check(c: &CheckResult, units: UnitSystem) -> Value {
    let mut inputs = Map::new();
    for i in &c.inputs {
        let mut key = i.symbol.to_string();
        let mut k = 2;
        while inputs.contains_key(&key) {
            key = format!("{}#{k}", i.symbol);
            k += 1;
        }
        let mut v = quantity(i.value, units);
        v["meaning"] = json!(i.meaning);
        inputs.insert(key, v);
    }
    json!({
        "limit_state": c.limit_state,
        "subject": c.subject,
        "load_case": c.load_case,
        "standard": c.citation.standard,
        "clause": c.citation.clause,
        "equation": c.citation.equation,
        "formula": c.formula,
        "inputs": inputs,
        "nominal": c.nominal.map(|n| quantity(n, units)),
        "factor": c.factor.map(|f| json!({ "symbol": f.symbol, "value": f.value })),
        "available": c.evaluated().then(|| quantity(c.available, units)),
        "demand": c.evaluated().then(|| quantity(c.demand, units)),
        "bound": c.bound.map(|b| match b {
            Bound::Minimum => "minimum",
            Bound::Maximum => "maximum",
        }),
        "ratio": finite(c.ratio),
        "status": c.status.as_str(),
        "note": c.notes.join("; "),
    })
}

fn connection(c: &ConnectionReport, units: UnitSystem) -> Value {
    json!({
        "id": c.id,
        "member": c.member,
        "end": c.end.as_str(),
        "detail": c.detail,
        "kind": c.kind,
        "status": c.status().as_str(),
        "governing": c.governing().map(|g| json!({ "limit_state": g.limit_state, "subject": g.subject, "ratio": finite(g.ratio) })),
        "checks": c.checks.iter().map(|k| check(k, units)).collect::<Vec<_>>(),
        "not_checked": c.not_checked,
    })
}

/// The whole JSON document.
pub fn document(model: &Model, report: &Report, units: UnitSystem) -> Value {
    let p = &model.project;
    json!({
        "standard": p.edition.standard(),
        "method": match p.method { Method::Lrfd => "LRFD", Method::Asd => "ASD" },
        "units": {
            "force": units.unit(Dim::Force),
            "length": units.unit(Dim::Length),
            "stress": units.unit(Dim::Stress),
        },
        "model": {
            "file": model.file,
            "title": p.title,
            "revision": p.revision,
            "demand_factor": p.demand_factor,
            "sha256": model.hash,
        },
        "status": report.status().as_str(),
        "connections": report.connections.iter().map(|c| connection(c, units)).collect::<Vec<_>>(),
        "unchecked_ends": report.unchecked_ends,
        "project_checks": report.project_checks.iter().map(|k| check(k, units)).collect::<Vec<_>>(),
        "caution": CAUTION,
    })
}
