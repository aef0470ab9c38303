//! The saved records and the rules for reading them.
//!
//! Three records are kept: the scenario `{record_version, scenario}` under [`SCENARIO_KEY`], the
//! run log `{record_version, runs, lot_pattern}` under [`RUNS_KEY`] and the workbench's saved
//! plans and stills under [`LIBRARY_KEY`]. A record is read only if it is
//! exactly readable: valid JSON, the right shape, a known record version, and no field the page
//! does not know (every part of the text must come back when the page writes what it read).
//! Anything else is copied aside under [`BACKUP_PREFIX`] (see [`crate::store`]).

use serde::{Deserialize, Serialize};
use serde_json::Value;
use stillroom_core::Scenario;
use stillroom_core::calibration::RunRecord;
use stillroom_core::json_path;

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
            // Said after "saved" ("Your saved plans and stills could not be read").
            Kind::Library => "plans and stills",
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

    /// Whether `raw` reads as a record of this kind, every field read by the module that owns
    /// it (the workbench's reading): what it can say of a record that reads, or why not.
    pub fn problem(self, raw: &str) -> Result<&'static str, String> {
        match self {
            Kind::Plan => read_scenario(raw).map(|_| READS),
            Kind::RunLog => read_runs(raw).map(|_| READS),
            Kind::Library => crate::workbench::library::read_library(raw).map(|_| READS),
        }
    }

    /// The plan module's reading at start: the plan read whole; the run log and the saved
    /// plans and stills read in outline only (JSON, their version, every list item an object
    /// with the fields it must have). Their field-by-field readers belong to the workbench
    /// module, which reads them again when it opens and keeps aside what it cannot read: in
    /// the plan module they would cost 13 kB gzip of the first load (DEVELOPERS.md).
    pub fn first_look(self, raw: &str) -> Result<&'static str, String> {
        match self {
            Kind::Plan => self.problem(raw),
            Kind::RunLog => runs_outline(raw).map(|_| LOOKS_WHOLE),
            Kind::Library => crate::workbench::library::library_outline(raw).map(|_| LOOKS_WHOLE),
        }
    }
}

/// How a module reads a record before it says whether it reads: [`Kind::problem`] or
/// [`Kind::first_look`], chosen by the module (so the other's readers stay out of its wasm).
pub type Reading = fn(Kind, &str) -> Result<&'static str, String>;

/// What [`Kind::problem`] says of a record that reads.
pub const READS: &str = "it reads now";
/// What [`Kind::first_look`] says of a record whose outline reads: the workbench reads the rest.
pub const LOOKS_WHOLE: &str = "its outline reads; open it and the workbench checks each field";

/// The scenario record. Strict: a misspelt or unknown envelope field makes it unreadable.
#[derive(Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
struct ScenarioRecord {
    record_version: u32,
    scenario: Scenario,
}

/// Version of the run-log record: 2 holds batch records (lot, plant part, fuel, hydrosol, an
/// earlier oil reading, the steam rates) and the grower's lot pattern; 1 (the short run of
/// date, mass, minutes and oil) is migrated on read.
pub const RUNS_RECORD_VERSION: u32 = 2;
/// Largest run-log text read (stored or imported): some 5000 batch records.
pub const MAX_RUNS_TEXT_BYTES: usize = 2 * 1024 * 1024;

/// The run-log record, as strict as [`ScenarioRecord`].
#[derive(Debug, Clone, PartialEq, Default, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct RunsRecord {
    pub record_version: u32,
    pub runs: Vec<RunRecord>,
    /// The grower's pattern for new lot numbers (`{CROP}`, `{YEAR}`, `{N}`); the page's when empty.
    #[serde(default)]
    pub lot_pattern: String,
}

/// A logged run as version 1 of the record held it (kept to read old logs, never written).
#[derive(Serialize, Deserialize)]
#[serde(default)]
struct RunV1 {
    date: String,
    crop: Option<String>,
    plant_mass_kg: f64,
    distilling_time_s: f64,
    oil_volume_m3: f64,
    oil_density_kg_per_m3: f64,
    rate_constant_per_min: f64,
    note: String,
}

impl Default for RunV1 {
    fn default() -> Self {
        // Version 1's own defaults.
        RunV1 {
            date: String::new(),
            crop: None,
            plant_mass_kg: 0.0,
            distilling_time_s: 0.0,
            oil_volume_m3: 0.0,
            oil_density_kg_per_m3: 900.0,
            rate_constant_per_min: 0.05,
            note: String::new(),
        }
    }
}

#[derive(Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
struct RunsRecordV1 {
    record_version: u32,
    runs: Vec<RunV1>,
}

impl RunV1 {
    /// The batch record it becomes: no lot yet (the log gives it one), the rest as it was.
    fn migrated(self) -> RunRecord {
        RunRecord {
            date: self.date,
            crop: self.crop,
            plant_mass_kg: self.plant_mass_kg,
            distilling_time_s: self.distilling_time_s,
            oil_volume_m3: self.oil_volume_m3,
            oil_density_kg_per_m3: self.oil_density_kg_per_m3,
            rate_constant_per_min: self.rate_constant_per_min,
            note: self.note,
            ..RunRecord::default()
        }
    }
}

/// The record text for a scenario.
pub fn scenario_text(scenario: &Scenario) -> String {
    let record = ScenarioRecord { record_version: RECORD_VERSION, scenario: scenario.clone() };
    serde_json::to_string(&record).unwrap_or_default()
}

/// The record text for a run log and the grower's lot pattern.
pub fn runs_text(runs: &[RunRecord], lot_pattern: &str) -> String {
    let record = RunsRecord {
        record_version: RUNS_RECORD_VERSION,
        runs: runs.to_vec(),
        lot_pattern: lot_pattern.to_string(),
    };
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

/// Reads `raw` as a `T`, with the failing field's path in the message (`charge.plant_mass_kg:
/// invalid type: string "lots", expected a number`). From the text, not a parsed value: the
/// text's places give the path (`stillroom_core::json_path`), and a key given twice is refused.
fn typed<T: serde::de::DeserializeOwned>(raw: &str) -> Result<T, String> {
    serde_json::from_str(raw).map_err(|e| {
        let path = json_path::bracketed(&json_path::error_path(raw, &e));
        // serde's words, with Rust's type names said plainly.
        let inner = json_path::message_of(&e)
            .replace("expected f64", "expected a number")
            .replace("expected u32", "expected a whole number")
            .replace("expected u64", "expected a whole number");
        if path == "." { inner } else { format!("{path}: {inner}") }
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
    let value = outline(raw, what, newest)?;
    let record: T = typed(raw)?;
    let back = serde_json::to_value(&record).map_err(|e| e.to_string())?;
    match lost_part(&value, &back, "") {
        Some(p) => Err(p),
        None => Ok(record),
    }
}

/// A record's envelope: JSON, an object, and a `record_version` this page reads (at most
/// `newest`); the parsed text.
pub fn outline(raw: &str, what: &str, newest: u32) -> Result<Value, String> {
    let value: Value = serde_json::from_str(raw).map_err(|e| format!("not JSON text ({e})"))?;
    object(&value, what)?;
    match value.get("record_version").and_then(Value::as_u64) {
        None => Err(format!("a saved {what} record has a whole-number record_version")),
        Some(v) if v > u64::from(newest) => Err(format!(
            "it was written by a newer version of the page (record version {v}; this page reads up to {newest})"
        )),
        Some(_) => Ok(value),
    }
}

/// Every item of the list `name` in `record` (absent or not a list: refused) an object with
/// exactly the fields `fields`, as `what` (the library's lists, read in outline).
pub fn items_with_fields(record: &Value, name: &str, fields: &[&str], what: &str) -> Result<(), String> {
    let Some(list) = record.get(name).and_then(Value::as_array) else {
        return Err(format!("a saved {what} record has a list of {name}"));
    };
    for (i, item) in list.iter().enumerate() {
        object(item, what).map_err(|e| format!("{name}[{i}]: {e}"))?;
        if let Some(missing) = fields.iter().find(|f| item.get(**f).is_none()) {
            return Err(format!("{name}[{i}]: missing field `{missing}`"));
        }
        if let Some(unknown) = item.as_object().and_then(|o| o.keys().find(|k| !fields.contains(&k.as_str())))
        {
            return Err(format!("{name}[{i}]: unknown field `{unknown}`"));
        }
    }
    Ok(())
}

/// Refuses, in the core's own words, what the core would refuse before the form is built from
/// it: a scenario `version` this build does not read (the core's reader), and more mixture parts
/// or own compounds than the core's [`limits`](stillroom_core::scenario::limits) (the core's
/// check; a pasted list of thousands would otherwise make thousands of form lines first). `at`
/// is the path to the scenario (`scenario.` or empty).
pub fn fits(s: &Scenario, at: &str) -> Result<(), String> {
    let said = |e: &stillroom_core::scenario::FieldError| {
        format!("{at}{}: {} (got {}; valid: {})", e.field, e.message, e.value, e.valid)
    };
    if let Err(errors) = stillroom_core::scenario::check_version(s.version)
        && let Some(e) = errors.errors.first()
    {
        return Err(said(e));
    }
    const COUNTED: [&str; 2] = ["oil.composition.parts", "custom_compounds"];
    match stillroom_core::plan::validate(s) {
        Err(errors) => match errors.errors.iter().find(|e| COUNTED.contains(&e.field.as_str())) {
            Some(e) => Err(said(e)),
            None => Ok(()),
        },
        Ok(_) => Ok(()),
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
        let record: ScenarioRecord = typed(raw)?;
        fits(&record.scenario, "scenario.")?;
        let back = serde_json::to_value(&record.scenario).map_err(|e| e.to_string())?;
        match lost_part(&value["scenario"], &back, "scenario") {
            Some(p) => Err(p),
            None => Ok(record.scenario),
        }
    } else {
        let scenario: Scenario = typed(raw)?;
        fits(&scenario, "")?;
        let back = serde_json::to_value(&scenario).map_err(|e| e.to_string())?;
        match lost_part(&value, &back, "") {
            Some(p) => Err(p),
            None => Ok(scenario),
        }
    }
}

/// Reads a stored or imported run log `{record_version, runs}`; every run must be an object with
/// at least the plant mass, the time distilled and the oil collected. A version-1 log is
/// migrated (its runs get no lot; the log numbers them).
pub fn read_runs(raw: &str) -> Result<RunsRecord, String> {
    let (value, v) = runs_outline(raw)?;
    if v <= 1 {
        let old: RunsRecordV1 = typed(raw)?;
        let back = serde_json::to_value(&old.runs).map_err(|e| e.to_string())?;
        if let Some(p) = lost_part(&value["runs"], &back, "runs") {
            return Err(p);
        }
        let runs = old.runs.into_iter().map(RunV1::migrated).collect();
        return Ok(RunsRecord { record_version: RUNS_RECORD_VERSION, runs, lot_pattern: String::new() });
    }
    let record: RunsRecord = typed(raw)?;
    let back = serde_json::to_value(&record).map_err(|e| e.to_string())?;
    match lost_part(&value, &back, "") {
        Some(p) => Err(p),
        None => Ok(record),
    }
}

/// A run log's outline ([`read_runs`] without the typed fields): its size, JSON, its version,
/// and every run an object with the fields a run must have; the parsed text and its version.
pub fn runs_outline(raw: &str) -> Result<(Value, u64), String> {
    if raw.len() > MAX_RUNS_TEXT_BYTES {
        return Err(format!(
            "the run log is {} kB, more than the {} kB this page reads",
            raw.len() / 1024,
            MAX_RUNS_TEXT_BYTES / 1024
        ));
    }
    let value: Value = serde_json::from_str(raw).map_err(|e| format!("not JSON text ({e})"))?;
    object(&value, "run log")?;
    let v = match value.get("record_version").and_then(Value::as_u64) {
        None => return Err("a saved run log has a whole-number record_version".to_string()),
        Some(v) if v > u64::from(RUNS_RECORD_VERSION) => {
            return Err(format!(
                "it was written by a newer version of the page (record version {v}; this page reads up to {RUNS_RECORD_VERSION})"
            ));
        }
        Some(v) => v,
    };
    if let Some(list) = value.get("runs").and_then(Value::as_array) {
        for (i, run) in list.iter().enumerate() {
            object(run, "run").map_err(|e| format!("runs[{i}]: {e}"))?;
            if let Some(missing) = RUN_REQUIRED.iter().find(|k| run.get(**k).is_none()) {
                return Err(format!("runs[{i}]: the run has no {missing}"));
            }
        }
    }
    Ok((value, v))
}

#[cfg(test)]
mod tests {
    use super::*;
    use wasm_bindgen_test::wasm_bindgen_test;

    #[wasm_bindgen_test]
    fn the_first_look_reads_an_outline_and_leaves_the_fields_to_the_workbench() {
        use crate::workbench::library::{LIBRARY_VERSION, library_text};
        let run = r#"{"plant_mass_kg":20,"distilling_time_s":3600,"oil_volume_m3":1e-5}"#;
        let log = |run: &str| format!(r#"{{"record_version":2,"runs":[{run}]}}"#);
        assert_eq!(Kind::RunLog.problem(&log(run)), Ok(READS));
        assert_eq!(Kind::RunLog.first_look(&log(run)), Ok(LOOKS_WHOLE));
        // A field of the wrong type: only the workbench's reading finds it.
        let typo = run.replace("20", r#""twenty""#);
        assert!(Kind::RunLog.problem(&log(&typo)).unwrap_err().contains("plant_mass_kg"));
        assert_eq!(Kind::RunLog.first_look(&log(&typo)), Ok(LOOKS_WHOLE));
        // What the outline refuses, the workbench refuses too, in the same words.
        for bad in [log("{}"), log(r#"[1]"#), "{\"record_version\":3,\"runs\":[]}".to_string(), "{".into()] {
            let look = Kind::RunLog.first_look(&bad).unwrap_err();
            assert_eq!(Kind::RunLog.problem(&bad).unwrap_err(), look, "{bad}");
        }

        let empty = library_text(&[], &[]);
        assert_eq!(Kind::Library.first_look(&empty), Ok(LOOKS_WHOLE));
        let v = LIBRARY_VERSION;
        let plan = |fields: &str| format!(r#"{{"record_version":{v},"plans":[{{{fields}}}],"stills":[]}}"#);
        let whole = r#""id":1,"name":"A","saved_ms":0,"scenario":{}"#;
        assert_eq!(Kind::Library.first_look(&plan(whole)), Ok(LOOKS_WHOLE));
        let extra = format!(r#"{whole},"x":1"#);
        assert_eq!(Kind::Library.first_look(&plan(&extra)).unwrap_err(), "plans[0]: unknown field `x`");
        assert!(Kind::Library.problem(&plan(&extra)).unwrap_err().contains("plans[0]"));
        let short = r#""id":1,"name":"A","saved_ms":0"#;
        assert_eq!(Kind::Library.first_look(&plan(short)).unwrap_err(), "plans[0]: missing field `scenario`");
        let no_stills = format!(r#"{{"record_version":{v},"plans":[]}}"#);
        assert!(Kind::Library.first_look(&no_stills).unwrap_err().contains("stills"));
        assert!(Kind::Library.problem(&no_stills).is_err());
    }

    #[wasm_bindgen_test]
    fn a_bare_scenario_from_before_the_envelope_still_loads() {
        let bare = r#"{"charge":{"plant_mass_kg":42.0}}"#;
        assert_eq!(read_scenario(bare).unwrap().charge.plant_mass_kg, 42.0);
    }

    #[wasm_bindgen_test]
    fn a_key_given_twice_is_refused_on_its_path_as_the_core_refuses_it() {
        // Read as a parsed value first, the last of the two would have been taken silently.
        let twice = r#"{"record_version":1,"scenario":{"charge":{"plant_mass_kg":40,"plant_mass_kg":4}}}"#;
        let e = read_scenario(twice).unwrap_err();
        assert!(e.starts_with("scenario.charge.plant_mass_kg: duplicate field"), "{e}");
        let core = stillroom_core::scenario::parse_scenario_json(
            r#"{"charge":{"plant_mass_kg":40,"plant_mass_kg":4}}"#,
        );
        assert_eq!(core.unwrap_err().errors[0].field, "charge.plant_mass_kg");
        // A misplaced value names its field in the page's words.
        let e = read_scenario(r#"{"charge":{"plant_mass_kg":"lots"}}"#).unwrap_err();
        assert_eq!(e, "charge.plant_mass_kg: invalid type: string \"lots\", expected a number");
    }

    #[wasm_bindgen_test]
    fn a_record_of_this_version_reads_and_comes_back_the_same() {
        let s = Scenario::default();
        let text = scenario_text(&s);
        assert_eq!(read_scenario(&text).unwrap(), s);
        assert_eq!(read_runs(&runs_text(&[], "")).unwrap().runs, Vec::<RunRecord>::new());
        let run = RunRecord {
            lot: "LAV-2026-001".into(),
            plant_mass_kg: 21.5,
            distilling_time_s: 4200.0,
            oil_volume_m3: 2.1e-4,
            fuel_used: Some(3.2),
            fuel_unit: "kg".into(),
            earlier: Some(stillroom_core::calibration::EarlierReading {
                time_s: 1200.0,
                oil_volume_m3: 1e-4,
            }),
            ..RunRecord::default()
        };
        let back = read_runs(&runs_text(std::slice::from_ref(&run), "{CROP}-{N}")).unwrap();
        assert_eq!((back.runs, back.lot_pattern.as_str()), (vec![run], "{CROP}-{N}"));
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
            r#"{"record_version":1,"scenario":{"version":2}}"#,
            r#"{"version":0}"#,
        ] {
            assert!(read_scenario(raw).is_err(), "{raw} was read");
        }
        for raw in [
            r#"{"record_version":1,"runs":[{"x":1},{}]}"#,
            r#"{"record_version":1,"runs":[{}]}"#,
            r#"{"record_version":1,"runs":{}}"#,
            r#"{"record_version":3,"runs":[]}"#,
            r#"{"record_version":2,"runs":[{"plant_mass_kg":1,"distilling_time_s":1,"oil_volume_m3":1,"lott":"A"}]}"#,
            r#"{"record_version":1,"runs":[{"plant_mass_kg":1,"distilling_time_s":1,"oil_volume_m3":1,"lot":"A"}]}"#,
            r#"{"runs":[]}"#,
            "[]",
        ] {
            assert!(read_runs(raw).is_err(), "{raw} was read");
        }
    }

    #[wasm_bindgen_test]
    fn a_version_1_log_is_migrated_with_every_value_kept() {
        let v1 = r#"{"record_version":1,"runs":[{"date":"2026-07-14","crop":"lavender","plant_mass_kg":20.0,
            "distilling_time_s":3600.0,"oil_volume_m3":0.0002,"oil_density_kg_per_m3":885.0,
            "rate_constant_per_min":0.05,"note":"first cut"},
            {"plant_mass_kg":18.0,"distilling_time_s":3000.0,"oil_volume_m3":0.00015}]}"#;
        let log = read_runs(v1).unwrap();
        assert_eq!(log.record_version, RUNS_RECORD_VERSION);
        let r = &log.runs[0];
        assert_eq!(
            (r.date.as_str(), r.crop.as_deref(), r.note.as_str()),
            ("2026-07-14", Some("lavender"), "first cut")
        );
        assert_eq!((r.plant_mass_kg, r.distilling_time_s, r.oil_volume_m3), (20.0, 3600.0, 0.0002));
        assert_eq!((r.oil_density_kg_per_m3, r.rate_constant_per_min), (885.0, 0.05));
        // Version 1's own defaults for what a run left out.
        assert_eq!((log.runs[1].oil_density_kg_per_m3, log.runs[1].rate_constant_per_min), (900.0, 0.05));
        // Written again, it is a version-2 record that reads the same.
        let again = read_runs(&runs_text(&log.runs, "")).unwrap();
        assert_eq!(again.runs, log.runs);
        assert!(runs_text(&log.runs, "").contains("\"record_version\":2"));
    }

    #[wasm_bindgen_test]
    fn an_oversized_log_is_refused_by_its_size() {
        let big = format!(
            r#"{{"record_version":2,"runs":[],"lot_pattern":"{}"}}"#,
            "x".repeat(MAX_RUNS_TEXT_BYTES)
        );
        assert!(read_runs(&big).unwrap_err().contains("kB"));
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

    /// A scenario whose oil is a mixture of `n` parts.
    fn mixture_of(n: usize) -> String {
        let part = r#"{"compound":"linalool","mass_percent":1.5}"#;
        let parts = vec![part; n].join(",");
        format!(
            r#"{{"record_version":1,"scenario":{{"oil":{{"composition":{{"kind":"mixture","parts":[{parts}]}}}}}}}}"#
        )
    }

    #[wasm_bindgen_test]
    fn a_scenario_beyond_the_cores_limits_or_versions_is_refused_by_its_field() {
        use stillroom_core::scenario::limits::{MAX_CUSTOM_COMPOUNDS, MAX_MIXTURE_PARTS};
        // The most the core plans with reads; one more, or the 2,000 of a pasted monster, does not.
        assert!(read_scenario(&mixture_of(MAX_MIXTURE_PARTS)).is_ok());
        for n in [MAX_MIXTURE_PARTS + 1, 2000] {
            let e = read_scenario(&mixture_of(n)).unwrap_err();
            // The core's own words (plan/validate.rs): its field, the count and the most it plans.
            assert!(e.starts_with("scenario.oil.composition.parts: too many compounds: at most 64"), "{e}");
            assert!(e.contains(&format!("got {n} compounds")), "{e}");
        }
        let own = r#"{"id":"x","name":"X","molar_mass_kg_per_mol":0.15,"liquid_density_kg_per_m3":900,"vapour_pressure":{"kind":"two_points","t1_c":100,"p1_pa":1000,"t2_c":150,"p2_pa":10000}}"#;
        let many = format!(r#"{{"custom_compounds":[{}]}}"#, vec![own; MAX_CUSTOM_COMPOUNDS + 1].join(","));
        let e = read_scenario(&many).unwrap_err();
        assert!(e.starts_with("custom_compounds: too many compounds of your own: at most 32"), "{e}");
        assert!(read_scenario(&many.replace(&format!(",{own}]"), "]")).is_ok());
        // A scenario format this page does not read is named, not opened.
        let e = read_scenario(r#"{"record_version":1,"scenario":{"version":2}}"#).unwrap_err();
        assert!(e.contains("scenario.version") && e.contains("newer version"), "{e}");
        let e = read_scenario(r#"{"version":0}"#).unwrap_err();
        assert!(e.starts_with("version:"), "{e}");
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
