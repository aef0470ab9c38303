//! Command-line entry: a scenario as JSON in, the plan as JSON out; or a sweep of one input
//! over a range, as CSV.
//!
//! ```text
//! stillroom plan [FILE]                    read a scenario (FILE or stdin), print the plan
//! stillroom sweep FIELD FROM TO STEP COLUMNS [FILE]
//!                                          vary FIELD (a dotted path such as site.altitude_m)
//!                                          and print CSV of the COLUMNS (comma-separated dotted
//!                                          paths into the plan)
//! stillroom size [FILE]                    read a sizing request (FILE or stdin), print the design
//! stillroom schema scenario|plan|sizing_request|design
//!                                          print the JSON Schema
//! stillroom example                        print the invented example scenario
//! ```

use serde_json::Value;
use std::io::Read;
use std::process::ExitCode;
use stillroom_core::{Plan, Scenario, plan};

fn read_scenario(path: Option<&String>) -> Result<Scenario, String> {
    let text = match path {
        Some(p) => std::fs::read_to_string(p).map_err(|e| format!("cannot read {p}: {e}"))?,
        None => {
            let mut s = String::new();
            std::io::stdin().read_to_string(&mut s).map_err(|e| format!("cannot read stdin: {e}"))?;
            s
        }
    };
    serde_json::from_str(&text).map_err(|e| format!("not a valid scenario: {e}"))
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

fn csv_cell(v: Option<&Value>) -> String {
    match v {
        None | Some(Value::Null) => String::new(),
        Some(Value::String(s)) => format!("\"{}\"", s.replace('"', "\"\"")),
        Some(other) => other.to_string(),
    }
}

fn sweep(args: &[String]) -> Result<String, String> {
    let [field, from, to, step, columns, rest @ ..] = args else {
        return Err("usage: stillroom sweep FIELD FROM TO STEP COLUMNS [FILE]".into());
    };
    let num = |s: &String| s.parse::<f64>().map_err(|_| format!("{s} is not a number"));
    let (from, to, step) = (num(from)?, num(to)?, num(step)?);
    if step.is_nan() || step <= 0.0 || to < from {
        return Err("need FROM <= TO and STEP > 0".into());
    }
    let base = if rest.is_empty() { Scenario::default() } else { read_scenario(rest.first())? };
    let base = serde_json::to_value(&base).map_err(|e| e.to_string())?;
    let columns: Vec<&str> = columns.split(',').collect();
    let mut out = format!("{field},{}\n", columns.join(","));
    let steps = ((to - from) / step + 1e-9).floor() as usize;
    for i in 0..=steps {
        let x = from + step * i as f64;
        let mut scenario_value = base.clone();
        set_path(&mut scenario_value, field, serde_json::json!(x))?;
        let scenario: Scenario =
            serde_json::from_value(scenario_value).map_err(|e| format!("{field}: {e}"))?;
        match plan(&scenario) {
            Ok(p) => {
                let pv = serde_json::to_value(&p).map_err(|e| e.to_string())?;
                let cells: Vec<String> = columns.iter().map(|c| csv_cell(get_path(&pv, c))).collect();
                out.push_str(&format!("{x},{}\n", cells.join(",")));
            }
            Err(e) => {
                let msg = e
                    .errors
                    .iter()
                    .map(|e| format!("{}: {}", e.field, e.message))
                    .collect::<Vec<_>>()
                    .join("; ");
                out.push_str(&format!("{x},\"error: {}\"\n", msg.replace('"', "'")));
            }
        }
    }
    Ok(out)
}

/// `size [FILE]`: a sizing request (FILE or stdin) in, the design out; field errors as JSON.
fn size_request(path: Option<&String>) -> Result<String, String> {
    let text = match path {
        Some(p) => std::fs::read_to_string(p).map_err(|e| format!("cannot read {p}: {e}"))?,
        None => {
            let mut s = String::new();
            std::io::stdin().read_to_string(&mut s).map_err(|e| format!("cannot read stdin: {e}"))?;
            s
        }
    };
    let request: stillroom_core::SizingRequest =
        serde_json::from_str(&text).map_err(|e| format!("not a valid sizing request: {e}"))?;
    match stillroom_core::size(&request) {
        Ok(d) => serde_json::to_string_pretty(&d).map_err(|e| e.to_string()),
        Err(e) => Err(serde_json::to_string_pretty(&e).unwrap_or_else(|_| e.to_string())),
    }
}

fn run(args: &[String]) -> Result<String, String> {
    match args.first().map(String::as_str) {
        Some("plan") => {
            let s = read_scenario(args.get(1))?;
            match plan(&s) {
                Ok(p) => serde_json::to_string_pretty(&p).map_err(|e| e.to_string()),
                Err(e) => Err(serde_json::to_string_pretty(&e).unwrap_or_else(|_| e.to_string())),
            }
        }
        Some("sweep") => sweep(&args[1..]),
        Some("size") => size_request(args.get(1)),
        Some("schema") => match args.get(1).map(String::as_str) {
            Some("scenario") => serde_json::to_string_pretty(&schemars::schema_for!(Scenario)).map_err(|e| e.to_string()),
            Some("plan") => serde_json::to_string_pretty(&schemars::schema_for!(Plan)).map_err(|e| e.to_string()),
            Some("sizing_request") => serde_json::to_string_pretty(&schemars::schema_for!(stillroom_core::SizingRequest)).map_err(|e| e.to_string()),
            Some("design") => serde_json::to_string_pretty(&schemars::schema_for!(stillroom_core::Design)).map_err(|e| e.to_string()),
            _ => Err("usage: stillroom schema scenario|plan|sizing_request|design".into()),
        },
        Some("example") => serde_json::to_string_pretty(&Scenario::default()).map_err(|e| e.to_string()),
        _ => Err("usage: stillroom plan [FILE] | sweep FIELD FROM TO STEP COLUMNS [FILE] | size [FILE] | schema scenario|plan|sizing_request|design | example".into()),
    }
}

fn main() -> ExitCode {
    let args: Vec<String> = std::env::args().skip(1).collect();
    match run(&args) {
        Ok(out) => {
            println!("{out}");
            ExitCode::SUCCESS
        }
        Err(e) => {
            eprintln!("{e}");
            ExitCode::FAILURE
        }
    }
}
