//! Command-line entry: a scenario as JSON in, the plan as JSON out; or a sweep of one input
//! over a range, as CSV.
//!
//! ```text
//! stillroom plan [FILE]                    read a scenario (FILE or stdin), print the plan
//! stillroom sweep FIELD FROM TO STEP COLUMNS [FILE]
//!                                          vary FIELD (a dotted path such as site.altitude_m)
//!                                          and print CSV of the COLUMNS (comma-separated dotted
//!                                          paths into the plan), a row as soon as it is planned;
//!                                          at most MAX_SWEEP_ROWS rows
//! stillroom size [FILE]                    read a sizing request (FILE or stdin), print the design
//! stillroom schema scenario|plan|sizing_request|design
//!                                          print the JSON Schema
//! stillroom example                        print the invented example scenario
//! ```
//!
//! A scenario that cannot be read or planned prints its field errors as JSON,
//! `{"errors":[{"field","value","valid","message","min","max"}]}`, on stderr.

use serde_json::Value;
use std::io::{Read, Write};
use std::process::ExitCode;
use stillroom_core::scenario::{limits, parse_scenario_json, scenario_from_json_value};
use stillroom_core::{Plan, Scenario, ScenarioErrors, plan};

/// Most rows one sweep prints: a leaflet's table has tens; a thousand is a fine curve, and the
/// cap keeps a mistyped STEP from running for ever.
const MAX_SWEEP_ROWS: u64 = 1_000;

fn errors_json(e: &ScenarioErrors) -> String {
    serde_json::to_string_pretty(e).unwrap_or_else(|_| e.to_string())
}

fn read_scenario(path: Option<&String>) -> Result<Scenario, String> {
    let mut text = String::new();
    match path {
        Some(p) => {
            let file = std::fs::File::open(p).map_err(|e| format!("cannot read {p}: {e}"))?;
            // One byte past the limit is enough to know the file is too large.
            file.take(limits::MAX_SCENARIO_JSON_BYTES as u64 + 1)
                .read_to_string(&mut text)
                .map_err(|e| format!("cannot read {p}: {e}"))?;
        }
        None => {
            std::io::stdin()
                .take(limits::MAX_SCENARIO_JSON_BYTES as u64 + 1)
                .read_to_string(&mut text)
                .map_err(|e| format!("cannot read stdin: {e}"))?;
        }
    }
    parse_scenario_json(&text).map_err(|e| errors_json(&e))
}

/// Sets a dotted path inside a JSON value, creating objects on the way.
fn set_path(value: &mut Value, path: &str, new: Value) -> Result<(), String> {
    let mut cur = value;
    let parts: Vec<&str> = path.split('.').collect();
    for (i, key) in parts.iter().enumerate() {
        if i == parts.len() - 1 {
            match cur {
                Value::Object(map) => {
                    map.insert((*key).to_string(), new);
                    return Ok(());
                }
                _ => return Err(format!("{path}: {key} is not inside an object")),
            }
        }
        cur = match cur {
            Value::Object(map) => {
                map.entry((*key).to_string()).or_insert_with(|| Value::Object(Default::default()))
            }
            _ => return Err(format!("{path}: {key} is not an object")),
        };
    }
    Ok(())
}

fn get_path<'a>(value: &'a Value, path: &str) -> Option<&'a Value> {
    path.split('.').try_fold(value, |cur, key| match cur {
        Value::Object(map) => map.get(key),
        Value::Array(items) => key.parse::<usize>().ok().and_then(|i| items.get(i)),
        _ => None,
    })
}

/// Whether a dotted path names a place in the plan's JSON Schema (through optional sections
/// and list items), so a column is known before any row is computed, even where a particular
/// plan holds nothing.
fn schema_has(root: &Value, node: &Value, path: &[&str]) -> bool {
    if let Some(Value::String(r)) = node.get("$ref") {
        let name = r.trim_start_matches("#/definitions/");
        return root.pointer(&format!("/definitions/{name}")).is_some_and(|n| schema_has(root, n, path));
    }
    for combinator in ["anyOf", "oneOf", "allOf"] {
        if let Some(Value::Array(alts)) = node.get(combinator) {
            return alts.iter().any(|a| schema_has(root, a, path));
        }
    }
    let Some((head, rest)) = path.split_first() else {
        return true;
    };
    if let Some(next) = node.get("properties").and_then(|p| p.get(*head)) {
        return schema_has(root, next, rest);
    }
    match (node.get("items"), head.parse::<usize>()) {
        (Some(Value::Array(tuple)), Ok(i)) => tuple.get(i).is_some_and(|n| schema_has(root, n, rest)),
        (Some(item @ Value::Object(_)), Ok(_)) => schema_has(root, item, rest),
        _ => false,
    }
}

fn csv_cell(v: Option<&Value>) -> String {
    match v {
        None | Some(Value::Null) => String::new(),
        Some(Value::String(s)) => format!("\"{}\"", s.replace('"', "\"\"")),
        Some(other) => other.to_string(),
    }
}

/// The sweep's values, FROM + i STEP up to TO, after checking they are few enough.
fn sweep_values(from: &str, to: &str, step: &str) -> Result<(f64, f64, u64), String> {
    let num = |s: &str| match s.parse::<f64>() {
        Ok(v) if v.is_finite() => Ok(v),
        _ => Err(format!("{s} is not a finite number")),
    };
    let (from, to, step) = (num(from)?, num(to)?, num(step)?);
    if step <= 0.0 || to < from {
        return Err("need FROM <= TO and STEP > 0".into());
    }
    // The small allowance keeps TO itself when (TO - FROM) / STEP is whole but rounds below.
    let intervals = ((to - from) / step + 1e-9).floor();
    if !(intervals.is_finite() && intervals < MAX_SWEEP_ROWS as f64) {
        let rows = if intervals.is_finite() {
            format!("{} rows", intervals + 1.0)
        } else {
            "rows without end".into()
        };
        return Err(format!(
            "the sweep would print {rows}; at most {MAX_SWEEP_ROWS} rows: choose a larger STEP or a narrower range"
        ));
    }
    Ok((from, step, intervals as u64 + 1))
}

fn sweep(args: &[String]) -> Result<(), String> {
    let [field, from, to, step, columns, rest @ ..] = args else {
        return Err("usage: stillroom sweep FIELD FROM TO STEP COLUMNS [FILE]".into());
    };
    let (from, step, rows) = sweep_values(from, to, step)?;
    let base = if rest.is_empty() { Scenario::default() } else { read_scenario(rest.first())? };
    let base = serde_json::to_value(&base).map_err(|e| e.to_string())?;
    let columns: Vec<&str> = columns.split(',').collect();
    let plan_schema = serde_json::to_value(schemars::schema_for!(Plan)).map_err(|e| e.to_string())?;
    let unknown: Vec<&str> = columns
        .iter()
        .copied()
        .filter(|c| !schema_has(&plan_schema, &plan_schema, &c.split('.').collect::<Vec<_>>()))
        .collect();
    if !unknown.is_empty() {
        return Err(format!(
            "not in the plan: {} (see `stillroom schema plan` for the names)",
            unknown.join(", ")
        ));
    }
    let scenario_at = |x: f64| -> Result<Scenario, ScenarioErrors> {
        let mut v = base.clone();
        set_path(&mut v, field, serde_json::json!(x)).map_err(|m| ScenarioErrors {
            errors: vec![stillroom_core::scenario::FieldError {
                field: field.clone(),
                value: String::new(),
                valid: "a numeric field of the scenario".into(),
                message: m,
                min: None,
                max: None,
            }],
        })?;
        scenario_from_json_value(v)
    };
    // A FIELD the scenario does not have fails on the first value: say so once, not per row.
    scenario_at(from).map_err(|e| format!("{field} cannot be swept:\n{}", errors_json(&e)))?;
    let stdout = std::io::stdout();
    let mut out = stdout.lock();
    let mut line = |text: String| {
        writeln!(out, "{text}").and_then(|_| out.flush()).map_err(|e| format!("cannot write: {e}"))
    };
    line(format!("{field},{}", columns.join(",")))?;
    for i in 0..rows {
        let x = from + step * i as f64;
        let row = match scenario_at(x).and_then(|s| plan(&s)) {
            Ok(p) => {
                let pv = serde_json::to_value(&p).map_err(|e| e.to_string())?;
                let cells: Vec<String> = columns.iter().map(|c| csv_cell(get_path(&pv, c))).collect();
                format!("{x},{}", cells.join(","))
            }
            Err(e) => {
                let msg = e
                    .errors
                    .iter()
                    .map(|e| format!("{}: {}", e.field, e.message))
                    .collect::<Vec<_>>()
                    .join("; ");
                format!("{x},\"error: {}\"", msg.replace('"', "'"))
            }
        };
        line(row)?;
    }
    Ok(())
}

/// `size [FILE]`: a sizing request (FILE or stdin) in, the design out; field errors as JSON.
fn size_request(path: Option<&String>) -> Result<String, String> {
    let mut text = String::new();
    let reader: Box<dyn Read> = match path {
        Some(p) => Box::new(std::fs::File::open(p).map_err(|e| format!("cannot read {p}: {e}"))?),
        None => Box::new(std::io::stdin()),
    };
    // One byte past the limit is enough to know the request is too large.
    reader
        .take(limits::MAX_SCENARIO_JSON_BYTES as u64 + 1)
        .read_to_string(&mut text)
        .map_err(|e| format!("cannot read the request: {e}"))?;
    if text.len() > limits::MAX_SCENARIO_JSON_BYTES {
        return Err(format!("the request is larger than {} bytes", limits::MAX_SCENARIO_JSON_BYTES));
    }
    let request: stillroom_core::SizingRequest =
        serde_json::from_str(&text).map_err(|e| format!("not a valid sizing request: {e}"))?;
    match stillroom_core::size(&request) {
        Ok(d) => serde_json::to_string_pretty(&d).map_err(|e| e.to_string()),
        Err(e) => Err(serde_json::to_string_pretty(&e).unwrap_or_else(|_| e.to_string())),
    }
}

fn run(args: &[String]) -> Result<Option<String>, String> {
    match args.first().map(String::as_str) {
        Some("plan") => {
            let s = read_scenario(args.get(1))?;
            match plan(&s) {
                Ok(p) => serde_json::to_string_pretty(&p).map(Some).map_err(|e| e.to_string()),
                Err(e) => Err(errors_json(&e)),
            }
        }
        Some("sweep") => sweep(&args[1..]).map(|_| None),
        Some("size") => size_request(args.get(1)).map(Some),
        Some("schema") => match args.get(1).map(String::as_str) {
            Some("scenario") => serde_json::to_string_pretty(&schemars::schema_for!(Scenario)).map(Some).map_err(|e| e.to_string()),
            Some("plan") => serde_json::to_string_pretty(&schemars::schema_for!(Plan)).map(Some).map_err(|e| e.to_string()),
            Some("sizing_request") => serde_json::to_string_pretty(&schemars::schema_for!(stillroom_core::SizingRequest)).map(Some).map_err(|e| e.to_string()),
            Some("design") => serde_json::to_string_pretty(&schemars::schema_for!(stillroom_core::Design)).map(Some).map_err(|e| e.to_string()),
            _ => Err("usage: stillroom schema scenario|plan|sizing_request|design".into()),
        },
        Some("example") => serde_json::to_string_pretty(&Scenario::default()).map(Some).map_err(|e| e.to_string()),
        _ => Err("usage: stillroom plan [FILE] | sweep FIELD FROM TO STEP COLUMNS [FILE] | size [FILE] | schema scenario|plan|sizing_request|design | example".into()),
    }
}

fn main() -> ExitCode {
    let args: Vec<String> = std::env::args().skip(1).collect();
    match run(&args) {
        Ok(out) => {
            if let Some(out) = out {
                println!("{out}");
            }
            ExitCode::SUCCESS
        }
        Err(e) => {
            eprintln!("{e}");
            ExitCode::FAILURE
        }
    }
}
