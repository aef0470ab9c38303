//! The only code that talks to the browser's storage, and the reading rules for saved records.
//!
//! Two records are kept in `localStorage`: the scenario `{record_version, scenario}` under
//! [`SCENARIO_KEY`] and the run log `{record_version, runs}` under [`RUNS_KEY`]. A record is read
//! only if it is exactly readable: valid JSON, the right shape, a known record version, and no
//! field the page does not know (every part of the text must come back when the page writes what
//! it read). Anything else is copied aside under [`BACKUP_PREFIX`] and reported; if there is no
//! room for the copy, the original stays where it is and the page does not save over it.

use serde::{Deserialize, Serialize};
use serde_json::Value;
use stillroom_core::Scenario;
use stillroom_core::calibration::RunRecord;
use wasm_bindgen::JsCast;

/// Storage key of the saved scenario record.
pub const SCENARIO_KEY: &str = "stillroom.scenario";
/// Storage key of the grower's log of finished runs.
pub const RUNS_KEY: &str = "stillroom.runs";
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
}

impl Kind {
    /// The record's own storage key.
    pub fn key(self) -> &'static str {
        match self {
            Kind::Plan => SCENARIO_KEY,
            Kind::RunLog => RUNS_KEY,
        }
    }

    /// The record in the grower's words.
    pub fn word(self) -> &'static str {
        match self {
            Kind::Plan => "plan",
            Kind::RunLog => "run log",
        }
    }

    /// The part of a kept-aside key that says what it holds.
    fn slug(self) -> &'static str {
        match self {
            Kind::Plan => "plan",
            Kind::RunLog => "runlog",
        }
    }

    /// Why `raw` is not a readable record of this kind, or `None` if it reads.
    pub fn problem(self, raw: &str) -> Option<String> {
        match self {
            Kind::Plan => read_scenario(raw).err(),
            Kind::RunLog => read_runs(raw).err(),
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
/// type: string "lots", expected f64`).
fn typed<T: serde::de::DeserializeOwned>(value: Value) -> Result<T, String> {
    serde_path_to_error::deserialize(value).map_err(|e| {
        let path = e.path().to_string();
        let inner = e.into_inner();
        if path.is_empty() || path == "." { inner.to_string() } else { format!("{path}: {inner}") }
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

/// Why a write did not happen.
#[derive(Debug, Clone, PartialEq, Eq)]
pub enum SaveError {
    /// The browser's storage for this page is full.
    Full,
    /// The browser keeps no storage for this page (switched off, or a private mode).
    Unavailable,
}

impl SaveError {
    pub fn words(&self) -> &'static str {
        match self {
            SaveError::Full => "this browser's storage for the page is full",
            SaveError::Unavailable => {
                "this browser is not letting the page keep data (storage off, or a private window)"
            }
        }
    }
}

fn storage() -> Result<web_sys::Storage, SaveError> {
    web_sys::window().and_then(|w| w.local_storage().ok().flatten()).ok_or(SaveError::Unavailable)
}

/// The stored text under `key`.
pub fn get(key: &str) -> Result<Option<String>, SaveError> {
    storage()?.get_item(key).map_err(|_| SaveError::Unavailable)
}

/// Stores `text` under `key`.
pub fn set(key: &str, text: &str) -> Result<(), SaveError> {
    storage()?.set_item(key, text).map_err(|e| {
        let name = e.dyn_ref::<web_sys::DomException>().map(|d| d.name()).unwrap_or_default();
        if name == "QuotaExceededError" { SaveError::Full } else { SaveError::Unavailable }
    })
}

/// Removes `key`; true if it is gone.
pub fn remove(key: &str) -> bool {
    storage().map(|s| s.remove_item(key).is_ok()).unwrap_or(false)
}

/// Every stored key.
pub fn keys() -> Vec<String> {
    let Ok(s) = storage() else { return Vec::new() };
    let n = s.length().unwrap_or(0);
    (0..n).filter_map(|i| s.key(i).ok().flatten()).collect()
}

/// Milliseconds since 1970.
pub fn now_ms() -> f64 {
    js_sys::Date::now()
}

/// Copies `raw` aside under a fresh kept-aside key; the key, or why it could not be done.
pub fn keep_aside(kind: Kind, raw: &str) -> Result<String, SaveError> {
    let stamp = now_ms() as u64;
    let existing = keys();
    let mut key = format!("{BACKUP_PREFIX}{}.{stamp}", kind.slug());
    let mut n = 1;
    while existing.contains(&key) {
        key = format!("{BACKUP_PREFIX}{}.{stamp}-{n}", kind.slug());
        n += 1;
    }
    set(&key, raw)?;
    Ok(key)
}

/// One record the page could not read, kept in this browser.
#[derive(Debug, Clone, PartialEq)]
pub struct KeptCopy {
    pub key: String,
    /// What it was, if its key says.
    pub kind: Option<Kind>,
    /// When it was kept aside, ms since 1970 (from its key); `None` for a record held in place.
    pub kept_ms: Option<f64>,
    /// Its length in characters.
    pub chars: usize,
    /// Why the page could not read it.
    pub reason: String,
    /// Still under its own key, because there was no room to copy it aside.
    pub held: bool,
}

/// The kept-aside copies, oldest first, after the records `held` in place.
pub fn kept_copies(held: &[Kind]) -> Vec<KeptCopy> {
    let mut list: Vec<KeptCopy> = held
        .iter()
        .filter_map(|k| {
            let raw = get(k.key()).ok().flatten()?;
            Some(KeptCopy {
                key: k.key().to_string(),
                kind: Some(*k),
                kept_ms: None,
                chars: raw.chars().count(),
                reason: k.problem(&raw).unwrap_or_else(|| "it reads now".into()),
                held: true,
            })
        })
        .collect();
    let mut aside: Vec<KeptCopy> = keys()
        .into_iter()
        .filter(|k| k.starts_with(BACKUP_PREFIX))
        .filter_map(|key| {
            let raw = get(&key).ok().flatten()?;
            let rest = &key[BACKUP_PREFIX.len()..];
            let (slug, stamp) = rest.split_once('.').unwrap_or((rest, ""));
            let kind = match slug {
                "plan" => Some(Kind::Plan),
                "runlog" => Some(Kind::RunLog),
                _ => None,
            };
            let stamp = stamp.split('-').next().and_then(|s| s.parse::<f64>().ok());
            let reason = match kind {
                Some(k) => k.problem(&raw).unwrap_or_else(|| "it reads now: open it".into()),
                None => "not a record this page knows".into(),
            };
            Some(KeptCopy { key, kind, kept_ms: stamp, chars: raw.chars().count(), reason, held: false })
        })
        .collect();
    aside.sort_by(|a, b| a.kept_ms.partial_cmp(&b.kept_ms).unwrap_or(std::cmp::Ordering::Equal));
    list.extend(aside);
    list
}

/// A local date and time for reading: `2026-07-14 09:05`.
pub fn local_time(ms: f64) -> String {
    let d = js_sys::Date::new(&wasm_bindgen::JsValue::from_f64(ms));
    format!(
        "{:04}-{:02}-{:02} {:02}:{:02}",
        d.get_full_year(),
        d.get_month() + 1,
        d.get_date(),
        d.get_hours(),
        d.get_minutes()
    )
}

/// Offers `text` as a file download (a Blob behind an object URL, clicked through `<a download>`).
pub fn download(file_name: &str, text: &str) -> Result<(), String> {
    let fail = |what: &str| format!("The download could not start ({what}). Copy the text instead.");
    let parts = js_sys::Array::of1(&wasm_bindgen::JsValue::from_str(text));
    let bag = web_sys::BlobPropertyBag::new();
    bag.set_type("application/json");
    let blob = web_sys::Blob::new_with_str_sequence_and_options(&parts, &bag).map_err(|_| fail("blob"))?;
    let url = web_sys::Url::create_object_url_with_blob(&blob).map_err(|_| fail("address"))?;
    let document = web_sys::window().and_then(|w| w.document()).ok_or_else(|| fail("no page"))?;
    let a: web_sys::HtmlAnchorElement =
        document.create_element("a").map_err(|_| fail("link"))?.unchecked_into();
    a.set_href(&url);
    a.set_download(file_name);
    a.click();
    // Give the browser time to start reading the blob before letting it go.
    leptos::prelude::set_timeout(
        move || {
            let _ = web_sys::Url::revoke_object_url(&url);
        },
        std::time::Duration::from_secs(30),
    );
    Ok(())
}

/// A file-name-safe stamp for downloads: `2026-07-14-0905`.
pub fn file_stamp() -> String {
    local_time(now_ms()).replace(' ', "-").replace(':', "")
}

/// Everything the page holds, as one JSON text: today's plan and run log (from memory, so the
/// latest entries are in it even when they could not be saved) and every kept-aside text.
pub fn everything(scenario: &Scenario, runs: &[RunRecord], kept: &[KeptCopy]) -> String {
    let kept: Vec<Value> = kept
        .iter()
        .map(|k| {
            serde_json::json!({
                "key": k.key,
                "reason": k.reason,
                "text": get(&k.key).ok().flatten().unwrap_or_default(),
            })
        })
        .collect();
    let all = serde_json::json!({
        "stillroom_export": 1,
        "plan_record": serde_json::from_str::<Value>(&scenario_text(scenario)).unwrap_or(Value::Null),
        "run_log_record": serde_json::from_str::<Value>(&runs_text(runs)).unwrap_or(Value::Null),
        "kept_aside": kept,
    });
    serde_json::to_string_pretty(&all).unwrap_or_default()
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
        assert!(e.contains("charge.plant_mass_kg") && e.contains("f64"), "{e}");
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
