//! `json_path` names the same place of a fault as a path-tracking deserializer does
//! (serde_path_to_error 0.1, from crates.io, the reference here): every field of a scenario and
//! of a batch record is given a wrong type, an unknown neighbour or taken away, in compact and in
//! pretty-printed text, and the two paths must be equal.
#![cfg(feature = "json")]

use serde::de::DeserializeOwned;
use serde_json::{Value, json};
use stillroom_core::calibration::RunRecord;
use stillroom_core::json_path::{bracketed, error_path};
use stillroom_core::scenario::{CustomCompound, CustomVapourPressure, OilComposition, OilPart, Scenario};

/// Every path to an object or a leaf of `v`, as JSON pointers.
fn pointers(v: &Value, at: String, out: &mut Vec<String>) {
    out.push(at.clone());
    match v {
        Value::Object(m) => m.iter().for_each(|(k, x)| pointers(x, format!("{at}/{k}"), out)),
        Value::Array(a) => a.iter().enumerate().for_each(|(i, x)| pointers(x, format!("{at}/{i}"), out)),
        _ => {}
    }
}

/// Faults made at `pointer`: wrong types in its place, an unknown key beside it, and (inside an
/// object) taken away.
fn faults(doc: &Value, pointer: &str) -> Vec<Value> {
    let mut out = Vec::new();
    for wrong in [json!("x"), json!({}), json!([]), json!(null), json!(true), json!(-1), json!([1, "a"])] {
        let mut d = doc.clone();
        if let Some(slot) = d.pointer_mut(pointer) {
            *slot = wrong;
            out.push(d);
        }
    }
    let mut d = doc.clone();
    if let Some(Value::Object(m)) = d.pointer_mut(pointer) {
        m.insert("zz_unknown".into(), json!(1));
        out.push(d);
    }
    if let Some((parent, key)) = pointer.rsplit_once('/') {
        let mut d = doc.clone();
        if let Some(Value::Object(m)) = d.pointer_mut(parent) {
            m.remove(key);
            out.push(d);
        }
    }
    out
}

/// Compares the two paths for every fault of `doc`; returns how many faults were compared.
fn compare<T: DeserializeOwned + std::fmt::Debug>(doc: &Value) -> usize {
    let mut all = Vec::new();
    pointers(doc, String::new(), &mut all);
    let mut compared = 0;
    for p in &all {
        for d in faults(doc, p) {
            for text in [d.to_string(), serde_json::to_string_pretty(&d).unwrap()] {
                let ours = serde_json::from_str::<T>(&text);
                let reference: Result<T, _> =
                    serde_path_to_error::deserialize(&mut serde_json::Deserializer::from_str(&text));
                match (ours, reference) {
                    (Err(e), Err(r)) => {
                        assert_eq!(
                            bracketed(&error_path(&text, &e)),
                            r.path().to_string(),
                            "fault at {p}: {text}"
                        );
                        compared += 1;
                    }
                    (Ok(_), Ok(_)) => {}
                    (a, b) => panic!("the readers disagree at {p}: {a:?} / {b:?}"),
                }
            }
        }
    }
    compared
}

/// A scenario with both of its lists filled (own compounds, an analysed mixture).
fn full_scenario() -> Value {
    let mut s = Scenario::default();
    s.custom_compounds.push(CustomCompound {
        id: "own".into(),
        name: "An own compound (invented)".into(),
        molar_mass_kg_per_mol: 0.154,
        liquid_density_kg_per_m3: 870.0,
        water_solubility_kg_per_m3: 0.5,
        vapour_pressure: CustomVapourPressure::TwoPoints {
            t1_c: 25.0,
            p1_pa: 30.0,
            t2_c: 200.0,
            p2_pa: 101_325.0,
        },
    });
    s.oil.composition = OilComposition::Mixture {
        parts: vec![
            OilPart { compound: "linalool".into(), mass_percent: 60.0 },
            OilPart { compound: "own".into(), mass_percent: 40.0 },
        ],
    };
    serde_json::to_value(&s).unwrap()
}

#[test]
fn every_fault_of_a_scenario_is_placed_where_the_reference_places_it() {
    let n = compare::<Scenario>(&full_scenario());
    // Hundreds of faults, not a handful: the scenario has some 90 fields.
    assert!(n > 400, "only {n} faults compared");
}

#[test]
fn every_fault_of_a_list_of_batch_records_is_placed_where_the_reference_places_it() {
    let run = serde_json::to_value(RunRecord {
        lot: "FARM-2026-1".into(),
        plant_mass_kg: 15.0,
        distilling_time_s: 5400.0,
        oil_volume_m3: 45e-6,
        ..RunRecord::default()
    })
    .unwrap();
    let n = compare::<Vec<RunRecord>>(&json!([run.clone(), run]));
    assert!(n > 100, "only {n} faults compared");
}

#[test]
fn a_place_inside_a_string_with_escapes_is_found() {
    let text = r#"{"a\"b": {"c\\": [1, {"d": "x"}]}}"#;
    let e = serde_json::from_str::<
        std::collections::BTreeMap<
            String,
            std::collections::BTreeMap<String, (u8, std::collections::BTreeMap<String, u8>)>,
        >,
    >(text)
    .unwrap_err();
    assert_eq!(bracketed(&error_path(text, &e)), "a\"b.c\\[1].d");
}
