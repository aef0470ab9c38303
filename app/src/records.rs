//! The saved records and the rules for reading them.
//!
//! Two records are kept: the scenario `{record_version, scenario}` under [`SCENARIO_KEY`] and
//! the run log `{record_version, runs}` under [`RUNS_KEY`]. A record is read only if it is
//! exactly readable: valid JSON, the right shape, a known record version, and no field the page
//! does not know (every part of the text must come back when the page writes what it read).
//! Anything else is copied aside under [`BACKUP_PREFIX`] (see [`crate::store`]).

use serde::{Deserialize, Serialize};
use serde_json::Value;
use stillroom_core::Scenario;
use stillroom_core::calibration::RunRecord;

/// Storage key of the saved scenario record.
pub const SCENARIO_KEY: &str = "stillroom.scenario";
/// Storage key of the grower's log of finished runs.
pub const RUNS_KEY: &str = "stillroom.runs";
/// Storage key of the workbench's saved plans and stills.
pub const LIBRARY_KEY: &str = "stillroom.library";
/// Prefix of keys holding saved data that could not be read, kept so nothing is lost.
pub const BACKUP_PREFIX: &str = "stillroom.unreadable.";
/// Version of the stored records' envelope (the scenario inside carries its own version).
pub const RECORD_VERSION: u32 = 1;
/// The fields a logged run must hold to mean anything (the rest have sensible defaults).
const RUN_REQUIRED: [&str; 3] = ["plant_mass_kg", "distilling_time_s", "oil_volume_m3"];

/// Which record a stored text is.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum Kind {
    Plan,
    RunLog,
    /// The workbench's saved plans and stills.
    Library,
}

impl Kind {
    /// The record's own storage key.
    pub fn key(self) -> &'static str {
        match self {
            Kind::Plan => SCENARIO_KEY,
            Kind::RunLog => RUNS_KEY,
            Kind::Library => LIBRARY_KEY,
        }
    }

    /// The record in the grower's words.
    pub fn word(self) -> &'static str {
        match self {
            Kind::Plan => "plan",
            Kind::RunLog => "run log",
            Kind::Library => "saved plans and stills",
        }
    }

    /// The part of a kept-aside key that says what it holds.
    pub fn slug(self) -> &'static str {
        match self {
            Kind::Plan => "plan",
            Kind::RunLog => "runlog",
            Kind::Library => "library",
        }
    }

    /// Why `raw` is not a readable record of this kind, or `None` if it reads.
    pub fn problem(self, raw: &str) -> Option<String> {
        match self {
            Kind::Plan => read_scenario(raw).err(),
            Kind::RunLog => read_runs(raw).err(),
            Kind::Library => crate::workbench::library::read_library(raw).err(),
        }
    }
}

/// The scenario record. Strict: a misspelt or unknown envelope field makes it unreadable.
#[derive(Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
struct ScenarioRecord {
    record_version: u32,
    scenario: Scenario,
}

/// The run-log record, as strict as [`ScenarioRecord`].
#[derive(Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
struct RunsRecord {
    record_version: u32,
    runs: Vec<RunRecord>,
}

/// The record text for a scenario.
pub fn scenario_text(scenario: &Scenario) -> String {
    let record = ScenarioRecord { record_version: RECORD_VERSION, scenario: scenario.clone() };
    serde_json::to_string(&record).unwrap_or_default()
}

/// The record text for a run log.
pub fn runs_text(runs: &[RunRecord]) -> String {
    let record = RunsRecord { record_version: RECORD_VERSION, runs: runs.to_vec() };
    serde_json::to_string(&record).unwrap_or_default()
}

fn shape(v: &Value) -> &'static str {
    match v {
        Value::Null => "null",
        Value::Bool(_) => "true or false",
        Value::Number(_) => "a number",
        Value::String(_) => "a string",
        Value::Array(_) => "a list",
        Value::Object(_) => "an object",
    }
}

/// Deserialises with the failing field's path in the message (`charge.plant_mass_kg: invalid
/// type: string "lots", expected a number`).
fn typed<T: serde::de::DeserializeOwned>(value: Value) -> Result<T, String> {
    serde_path_to_error::deserialize(value).map_err(|e| {
        let path = e.path().to_string();
        // serde's words, with Rust's type names said plainly.
        let inner = e
            .into_inner()
            .to_string()
            .replace("expected f64", "expected a number")
            .replace("expected u32", "expected a whole number")
            .replace("expected u64", "expected a whole number");
        if path.is_empty() || path == "." { inner } else { format!("{path}: {inner}") }
    })
}

/// The first part of `input` that does not come back, unchanged, in `read` (what the page would
/// write after reading `input`): an unknown or misspelt field, or a value read as another.
pub fn lost_part(input: &Value, read: &Value, path: &str) -> Option<String> {
    let at = |p: &str| if p.is_empty() { "the record".to_string() } else { p.to_string() };
    match (input, read) {
        (Value::Object(a), Value::Object(b)) => a.iter().find_map(|(k, va)| {
            let p = if path.is_empty() { k.clone() } else { format!("{path}.{k}") };
            match b.get(k) {
                None if va.is_null() => None,
                None => Some(format!("{p}: the page has no field by this name")),
                Some(vb) => lost_part(va, vb, &p),
            }
        }),
        (Value::Array(a), Value::Array(b)) if a.len() == b.len() => {
            a.iter().zip(b).enumerate().find_map(|(i, (va, vb))| lost_part(va, vb, &format!("{path}[{i}]")))
        }
        (Value::Number(a), Value::Number(b)) if a.as_f64() == b.as_f64() => None,
        (a, b) if a == b => None,
        (a, b) => Some(format!("{}: {} would be read as {}", at(path), a, b)),
    }
}

fn object(value: &Value, what: &str) -> Result<(), String> {
    match value {
        Value::Object(_) => Ok(()),
        other => Err(format!("a saved {what} is a JSON object, this is {}", shape(other))),
    }
}

fn version(value: &Value) -> Result<(), String> {
    match value.get("record_version").and_then(Value::as_u64) {
        Some(v) if v > u64::from(RECORD_VERSION) => Err(format!(
            "it was written by a newer version of the page (record version {v}; this page reads up to {RECORD_VERSION})"
        )),
        _ => Ok(()),
    }
}

/// Reads a record `{record_version, ...}` of type `T` whose version is at most `newest`, strictly:
/// it must be a JSON object, of a known version, with no field the page does not know, and come
/// back unchanged when written again. `what` names it in messages.
pub fn read_strict<T: serde::de::DeserializeOwned + Serialize>(
    raw: &str,
    what: &str,
    newest: u32,
) -> Result<T, String> {
    let value: Value = serde_json::from_str(raw).map_err(|e| format!("not JSON text ({e})"))?;
    object(&value, what)?;
    match value.get("record_version").and_then(Value::as_u64) {
        None => return Err(format!("a saved {what} record has a whole-number record_version")),
        Some(v) if v > u64::from(newest) => {
            return Err(format!(
                "it was written by a newer version of the page (record version {v}; this page reads up to {newest})"
            ));
        }
        Some(_) => {}
    }
    let record: T = typed(value.clone())?;
    let back = serde_json::to_value(&record).map_err(|e| e.to_string())?;
    match lost_part(&value, &back, "") {
        Some(p) => Err(p),
        None => Ok(record),
    }
}

/// Reads a stored or pasted scenario: a record `{record_version, scenario}` of this or an
/// earlier version, or a bare scenario (the shape before records had an envelope). The error
/// names the field and what was expected.
pub fn read_scenario(raw: &str) -> Result<Scenario, String> {
    let value: Value = serde_json::from_str(raw).map_err(|e| format!("not JSON text ({e})"))?;
    object(&value, "plan")?;
    if value.get("record_version").is_some() {
        version(&value)?;
        let record: ScenarioRecord = typed(value.clone())?;
        let back = serde_json::to_value(&record.scenario).map_err(|e| e.to_string())?;
        match lost_part(&value["scenario"], &back, "scenario") {
            Some(p) => Err(p),
            None => Ok(record.scenario),
        }
    } else {
        let scenario: Scenario = typed(value.clone())?;
        let back = serde_json::to_value(&scenario).map_err(|e| e.to_string())?;
        match lost_part(&value, &back, "") {
            Some(p) => Err(p),
            None => Ok(scenario),
        }
    }
}

/// Reads a stored run log `{record_version, runs}`; every run must be an object with at least
/// the plant mass, the time distilled and the oil collected.
pub fn read_runs(raw: &str) -> Result<Vec<RunRecord>, String> {
    let value: Value = serde_json::from_str(raw).map_err(|e| format!("not JSON text ({e})"))?;
    object(&value, "run log")?;
    version(&value)?;
    if let Some(list) = value.get("runs").and_then(Value::as_array) {
        for (i, run) in list.iter().enumerate() {
            object(run, "run").map_err(|e| format!("runs[{i}]: {e}"))?;
            if let Some(missing) = RUN_REQUIRED.iter().find(|k| run.get(**k).is_none()) {
                return Err(format!("runs[{i}]: the run has no {missing}"));
            }
        }
    }
    let record: RunsRecord = typed(value.clone())?;
    let back = serde_json::to_value(&record.runs).map_err(|e| e.to_string())?;
    match lost_part(&value["runs"], &back, "runs") {
        Some(p) => Err(p),
        None => Ok(record.runs),
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use wasm_bindgen_test::wasm_bindgen_test;

    #[wasm_bindgen_test]
    fn a_bare_scenario_from_before_the_envelope_still_loads() {
        let bare = r#"{"charge":{"plant_mass_kg":42.0}}"#;
        assert_eq!(read_scenario(bare).unwrap().charge.plant_mass_kg, 42.0);
    }

    #[wasm_bindgen_test]
    fn a_record_of_this_version_reads_and_comes_back_the_same() {
        let s = Scenario::default();
        let text = scenario_text(&s);
        assert_eq!(read_scenario(&text).unwrap(), s);
        assert_eq!(read_runs(&runs_text(&[])).unwrap(), Vec::<RunRecord>::new());
    }

    #[wasm_bindgen_test]
    fn corrupt_wrong_shaped_or_future_records_are_refused_not_guessed() {
        for raw in [
            "{not json",
            "[]",
            "\"text\"",
            r#"{"hello":"world"}"#,
            r#"{"record_version":"1","scenario":{}}"#,
            r#"{"record_version":99,"scenario":{}}"#,
            r#"{"record_version":1,"scenario":{},"extra":1}"#,
            r#"{"record_version":1,"scenario":{"charge":{"plant_mas_kg":3}}}"#,
            r#"{"charge":{"plant_mass_kg":"lots"}}"#,
        ] {
            assert!(read_scenario(raw).is_err(), "{raw} was read");
        }
        for raw in [
            r#"{"record_version":1,"runs":[{"x":1},{}]}"#,
            r#"{"record_version":1,"runs":[{}]}"#,
            r#"{"record_version":1,"runs":{}}"#,
            r#"{"record_version":2,"runs":[]}"#,
            r#"{"runs":[]}"#,
            "[]",
        ] {
            assert!(read_runs(raw).is_err(), "{raw} was read");
        }
    }

    #[wasm_bindgen_test]
    fn the_message_names_the_field_and_the_type_expected() {
        let e = read_scenario(r#"{"charge":{"plant_mass_kg":"lots"}}"#).unwrap_err();
        assert!(e.contains("charge.plant_mass_kg") && e.contains("expected a number"), "{e}");
        let e =
            read_scenario(r#"{"record_version":1,"scenario":{"charge":{"plant_mas_kg":3}}}"#).unwrap_err();
        assert!(e.contains("plant_mas_kg"), "{e}");
        let e = read_scenario(r#"{"record_version":7,"scenario":{}}"#).unwrap_err();
        assert!(e.contains("newer version"), "{e}");
        let e = read_runs(r#"{"record_version":1,"runs":[{"x":1},{}]}"#).unwrap_err();
        assert!(e.contains("runs[0]"), "{e}");
    }

    #[wasm_bindgen_test]
    fn lost_part_sees_unknown_fields_and_changed_values_only() {
        let a: Value = serde_json::json!({"a": 1, "b": {"c": [1, 2]}, "n": null});
        let same: Value = serde_json::json!({"a": 1.0, "b": {"c": [1, 2], "d": 0}});
        assert_eq!(lost_part(&a, &same, ""), None);
        let other: Value = serde_json::json!({"a": 1, "b": {"c": [1, 3]}});
        assert!(lost_part(&a, &other, "").unwrap().starts_with("b.c[1]"));
        let fewer: Value = serde_json::json!({"b": {"c": [1, 2]}});
        assert!(lost_part(&a, &fewer, "").unwrap().starts_with("a:"));
    }
}
