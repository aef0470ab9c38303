//! Command-line entry: a scenario as JSON in, the plan as JSON out; or a sweep of one input
//! over a range, as CSV.
//!
//! ```text
//! stillroom plan [FILE]                    read a scenario (FILE or stdin), print the plan
//! stillroom sweep FIELD FROM TO STEP COLUMNS [FILE]
//!                                          vary FIELD (a dotted path such as site.altitude_m)
//!                                          and print CSV of the COLUMNS (comma-separated dotted
//!                                          paths into the plan), a row as soon as it is planned;
//!                                          at most stillroom_core::sweep::MAX_SWEEP_ROWS rows
//! stillroom size [FILE]                    read a sizing request (FILE or stdin), print the design
//! stillroom schema scenario|plan|sizing_request|design
//!                                          print the JSON Schema
//! stillroom example                        print the invented example scenario
//! ```
//!
//! A scenario that cannot be read or planned prints its field errors as JSON,
//! `{"errors":[{"field","value","valid","message","min","max"}]}`, on stderr.

use std::io::{Read, Write};
use std::process::ExitCode;
use stillroom_core::scenario::{limits, parse_scenario_json};
use stillroom_core::sweep::{Sweep, known_columns, row_count};
use stillroom_core::{Plan, Scenario, ScenarioErrors, plan};

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

fn sweep(args: &[String]) -> Result<(), String> {
    let [field, from, to, step, columns, rest @ ..] = args else {
        return Err("usage: stillroom sweep FIELD FROM TO STEP COLUMNS [FILE]".into());
    };
    let num = |s: &str| match s.parse::<f64>() {
        Ok(v) if v.is_finite() => Ok(v),
        _ => Err(format!("{s} is not a finite number")),
    };
    let (from, to, step) = (num(from)?, num(to)?, num(step)?);
    // The range first: a sweep too long is refused before the scenario is even read.
    row_count(from, to, step).map_err(|e| e.to_string())?;
    let base = if rest.is_empty() { Scenario::default() } else { read_scenario(rest.first())? };
    let columns: Vec<&str> = columns.split(',').collect();
    known_columns(&columns).map_err(|e| e.to_string())?;
    let sweep = Sweep::new(&base, field, from, to, step, &columns).map_err(|e| e.to_string())?;
    let stdout = std::io::stdout();
    let mut out = stdout.lock();
    let mut line = |text: String| {
        writeln!(out, "{text}").and_then(|_| out.flush()).map_err(|e| format!("cannot write: {e}"))
    };
    line(sweep.csv_header())?;
    for row in sweep.rows() {
        line(row.csv_line())?;
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
