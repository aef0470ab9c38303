//! Fuzzing the scenario reader and the planner with structured input.
//!
//! Each case is JSON text grown from the published scenario schema (`core/schema/`), choice by
//! choice from a tape of random words that proptest supplies and shrinks (a zero word is the
//! plainest choice, so a failure shrinks toward a plain scenario): fields present or not,
//! values near their defaults, far off, at the edges of f64, of the wrong type; now and then a
//! misspelt or unknown key, a section written as a list, a huge list, or text cut short.
//!
//! Every case must end, within [`CASE_LIMIT`], in one of: a read error, field errors, or a plan
//! whose every number is finite within ±1e15 where the plan schema says a number is. A scenario
//! that reads must write back to the same scenario.
//!
//! A normal test run makes [`DEFAULT_CASES`] cases; `STILLROOM_FUZZ_CASES=N` makes N, and
//! `STILLROOM_FUZZ_SECONDS=S` stops making them after S seconds (run long ones with
//! `nice -n 19`, and `-- --nocapture` to see the tally).
#![cfg(feature = "json")]

use proptest::prelude::*;
use proptest::test_runner::{Config, TestRunner};
use serde_json::{Map, Value, json};
use std::sync::mpsc;
use std::time::{Duration, Instant};
use stillroom_core::plan;
use stillroom_core::scenario::parse_scenario_json;

#[path = "common/plan_numbers.rs"]
mod plan_numbers;

const DEFAULT_CASES: u32 = 384;
/// A case past this is a hang: a plan takes about a millisecond, reading a scenario less.
const CASE_LIMIT: Duration = Duration::from_secs(20);

/// Random words, then a generator seeded by them when they run out.
struct Tape {
    words: Vec<u64>,
    at: usize,
    state: u64,
}

impl Tape {
    fn new(words: Vec<u64>) -> Tape {
        let state =
            words.iter().fold(0x9e37_79b9_7f4a_7c15, |h, w| (h ^ w).wrapping_mul(0x1000_0000_01b3)) | 1;
        Tape { words, at: 0, state }
    }

    fn word(&mut self) -> u64 {
        if let Some(w) = self.words.get(self.at) {
            self.at += 1;
            return *w;
        }
        // xorshift64*, for choices past the tape's end.
        self.state ^= self.state >> 12;
        self.state ^= self.state << 25;
        self.state ^= self.state >> 27;
        self.state.wrapping_mul(0x2545_f491_4f6c_dd1d)
    }

    fn below(&mut self, n: usize) -> usize {
        (self.word() % n as u64) as usize
    }

    /// True about once in `n` times; a zero word says no.
    fn rarely(&mut self, n: usize) -> bool {
        self.below(n) == n - 1
    }

    fn unit(&mut self) -> f64 {
        (self.word() >> 11) as f64 / (1u64 << 53) as f64
    }
}

const EXTREMES: &[f64] = &[
    0.0,
    -0.0,
    5e-324,
    1e-300,
    1e-12,
    1e-6,
    1e-3,
    0.5,
    1.0,
    2.0,
    100.0,
    1e6,
    1e12,
    1e15,
    1e300,
    f64::MAX,
    -1e-300,
    -1.0,
    -273.15,
    -1e6,
    -f64::MAX,
];

const WORDS: &[&str] = &[
    "lavender",
    "rosemary",
    "peppermint",
    "clove",
    "linalool",
    "camphor",
    "eugenol",
    "alpha-pinene",
    "own-0",
    "own-1",
    "",
    " ",
    "EUR",
    "Lavandula (invented lot)",
    "\u{0}",
    "ünïcødé",
];

/// Ordinary values of the fields the schema gives no number default (required, or optional
/// with a `null` default), so that a case often gets past reading to the planner. Invented
/// ordinary magnitudes, not data.
fn ordinary(field: &str) -> Option<f64> {
    Some(match field {
        "molar_mass_kg_per_mol" => 0.15,
        "liquid_density_kg_per_m3" | "density_kg_per_m3" => 900.0,
        "water_solubility_kg_per_m3" => 0.5,
        "t1_c" | "temperature_c" | "feed_temperature_c" => 25.0,
        "p1_pa" => 30.0,
        "t2_c" | "t_max_c" => 200.0,
        "p2_pa" | "pressure_pa" => 101_325.0,
        "a" => 7.0,
        "b" => 1600.0,
        "c" => 200.0,
        "t_min_c" => 20.0,
        "mass_percent" => 50.0,
        "oil_content_percent" => 1.0,
        "moisture_percent" => 60.0,
        "heat_capacity_j_per_kg_k" => 3000.0,
        "efficiency" => 0.6,
        "steam_rate_kg_per_h" => 10.0,
        "volume_m3" => 0.1,
        "rate_constant_per_min" => 0.05,
        "distillate_outlet_c" => 30.0,
        "harvest_kg" => 1000.0,
        "fuel_price_per_unit" | "plant_value_per_kg" | "labour_per_hour" => 2.0,
        _ => return None,
    })
}

/// A number near `default` most of the time, anywhere at other times.
fn number(t: &mut Tape, default: Option<f64>) -> Value {
    let d = default.unwrap_or(1.0);
    let x = match t.below(32) {
        0..=9 => d,
        10..=23 => d * (0.5 + t.unit()),
        24..=25 => d + (t.unit() - 0.5) * 100.0,
        26..=27 => EXTREMES[t.below(EXTREMES.len())],
        28..=29 => (t.unit() - 0.3) * 10f64.powi(t.below(12) as i32),
        _ => return json!(t.below(200) as i64 - 20),
    };
    json!(x)
}

/// A value of any type, for a field that expects something else.
fn wild(t: &mut Tape) -> Value {
    match t.below(7) {
        0 => Value::Null,
        1 => json!(t.below(2) == 1),
        2 => number(t, None),
        3 => json!(WORDS[t.below(WORDS.len())]),
        4 => json!([number(t, None)]),
        5 => json!({ "x": 1 }),
        _ => json!(u64::MAX),
    }
}

fn resolve<'a>(root: &'a Value, mut node: &'a Value) -> &'a Value {
    loop {
        if let Some(Value::String(r)) = node.get("$ref") {
            node = root.pointer(&format!("/definitions/{}", r.trim_start_matches("#/definitions/"))).unwrap();
        } else if let Some(Value::Array(all)) = node.get("allOf") {
            node = &all[0];
        } else {
            return node;
        }
    }
}

fn misspelt(t: &mut Tape, key: &str) -> String {
    match t.below(3) {
        0 => format!("{key}x"),
        1 => key[..key.len().saturating_sub(1)].to_string(),
        _ => key.to_uppercase(),
    }
}

/// Grows a value for a schema node.
fn grow(root: &Value, node: &Value, t: &mut Tape, depth: usize, hint: Option<f64>) -> Value {
    let node = resolve(root, node);
    if depth > 8 || t.rarely(400) {
        return wild(t);
    }
    for alts in ["anyOf", "oneOf"] {
        if let Some(Value::Array(a)) = node.get(alts) {
            return grow(root, &a[t.below(a.len())], t, depth + 1, hint);
        }
    }
    if let Some(Value::Array(choices)) = node.get("enum") {
        return if t.rarely(200) {
            json!(WORDS[t.below(WORDS.len())])
        } else {
            choices[t.below(choices.len())].clone()
        };
    }
    let default = node.get("default").and_then(Value::as_f64).or(hint);
    let types: Vec<&str> = match node.get("type") {
        Some(Value::String(s)) => vec![s.as_str()],
        Some(Value::Array(a)) => a.iter().filter_map(Value::as_str).collect(),
        _ => vec![],
    };
    let ty = types[t.below(types.len().max(1)).min(types.len().saturating_sub(1))];
    match ty {
        "null" => Value::Null,
        "number" => number(t, default),
        "integer" => {
            if t.rarely(50) {
                number(t, None)
            } else {
                json!(1)
            }
        }
        "string" => json!(if t.rarely(300) {
            "x".repeat(70 + t.below(2000))
        } else {
            WORDS[t.below(WORDS.len())].into()
        }),
        "boolean" => json!(t.below(2) == 1),
        "array" => {
            let n = match t.below(64) {
                0..=59 => t.below(5),
                60 => 64 + t.below(3),
                61 | 62 => 30 + t.below(10),
                _ => 2000,
            };
            let item = node.get("items").unwrap();
            Value::Array((0..n).map(|_| grow(root, item, t, depth + 1, None)).collect())
        }
        "object" => {
            let mut map = Map::new();
            if let Some(Value::Object(props)) = node.get("properties") {
                let required: Vec<&str> = node
                    .get("required")
                    .and_then(Value::as_array)
                    .map(|r| r.iter().filter_map(Value::as_str).collect())
                    .unwrap_or_default();
                for (k, sub) in props {
                    if !required.contains(&k.as_str()) && t.below(2) == 0 {
                        continue;
                    }
                    let key = if t.rarely(600) { misspelt(t, k) } else { k.clone() };
                    map.insert(key, grow(root, sub, t, depth + 1, ordinary(k)));
                }
            }
            if t.rarely(300) {
                map.insert("unknown_field".into(), wild(t));
            }
            if t.rarely(300) {
                // Written by position.
                return Value::Array(map.into_iter().map(|(_, v)| v).collect());
            }
            Value::Object(map)
        }
        _ => wild(t),
    }
}

/// The text of one case, now and then damaged.
fn case_text(schema: &Value, words: Vec<u64>) -> String {
    let mut t = Tape::new(words);
    let value = grow(schema, schema, &mut t, 0, None);
    let mut text = serde_json::to_string(&value).unwrap();
    if t.rarely(20) && !text.is_empty() {
        let at = t.below(text.len());
        let at = (0..=at).rev().find(|i| text.is_char_boundary(*i)).unwrap_or(0);
        match t.below(3) {
            0 => text.truncate(at),
            1 => text.insert(at, ['{', '[', '"', ',', '1', '\\'][t.below(6)]),
            _ => text.insert_str(at, r#""version":1,"#),
        }
    }
    text
}

#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, PartialOrd, Ord)]
enum Outcome {
    NotRead,
    FieldErrors,
    /// Errors from the plan's last check (a number out of bounds): allowed, but counted.
    PlanCheck,
    Planned,
}

/// Reads and plans one case; an `Err` is a fault.
fn evaluate(text: &str, plan_schema: &Value) -> Result<Outcome, String> {
    let scenario = match parse_scenario_json(text) {
        Err(e) if e.errors.is_empty() => return Err("a read error without a message".into()),
        Err(e) if e.errors.iter().any(|f| f.field.is_empty() || f.message.is_empty()) => {
            return Err(format!("an error without a field or a message: {e:?}"));
        }
        Err(_) => return Ok(Outcome::NotRead),
        Ok(s) => s,
    };
    let again = serde_json::to_string(&scenario).map_err(|e| e.to_string())?;
    match parse_scenario_json(&again) {
        Ok(back) if back == scenario => {}
        other => return Err(format!("written back, it reads differently: {other:?}")),
    }
    match plan(&scenario) {
        Ok(p) => {
            let v = serde_json::to_value(&p).map_err(|e| e.to_string())?;
            plan_numbers::check(&v, plan_schema)?;
            Ok(Outcome::Planned)
        }
        Err(e) if e.errors.is_empty() => Err("a plan error without a message".into()),
        Err(e) if e.errors[0].field.starts_with("plan.") => Ok(Outcome::PlanCheck),
        Err(_) => Ok(Outcome::FieldErrors),
    }
}

/// Runs a case on its own thread, so a hang is seen (and a panic is caught) rather than
/// stopping the run.
fn watched(text: String) -> Result<Outcome, String> {
    let (tx, rx) = mpsc::channel();
    let shown = text.chars().take(400).collect::<String>();
    std::thread::spawn(move || {
        let schema = plan_numbers::plan_schema();
        let r = std::panic::catch_unwind(|| evaluate(&text, &schema));
        let _ = tx.send(r);
    });
    match rx.recv_timeout(CASE_LIMIT) {
        Ok(Ok(r)) => r.map_err(|e| format!("{e}\n  in: {shown}")),
        Ok(Err(_)) => Err(format!("panicked\n  in: {shown}")),
        Err(_) => Err(format!("no answer after {CASE_LIMIT:?} (a hang)\n  in: {shown}")),
    }
}

#[test]
fn the_reader_and_the_planner_survive_structured_fuzzing() {
    let cases =
        std::env::var("STILLROOM_FUZZ_CASES").ok().and_then(|v| v.parse().ok()).unwrap_or(DEFAULT_CASES);
    let schema: Value = serde_json::from_str(include_str!("../schema/scenario.schema.json")).unwrap();
    let config = Config { cases, failure_persistence: None, ..Config::default() };
    let mut runner = TestRunner::new(config);
    let tally = std::cell::RefCell::new(std::collections::BTreeMap::<Outcome, u64>::new());
    let slowest = std::cell::Cell::new(Duration::ZERO);
    let budget =
        std::env::var("STILLROOM_FUZZ_SECONDS").ok().and_then(|v| v.parse().ok()).map(Duration::from_secs);
    let started = Instant::now();
    let result = runner.run(&prop::collection::vec(any::<u64>(), 0..96), |words| {
        if budget.is_some_and(|b| started.elapsed() > b) {
            return Ok(());
        }
        let text = case_text(&schema, words);
        let t0 = Instant::now();
        let outcome = watched(text);
        slowest.set(slowest.get().max(t0.elapsed()));
        match outcome {
            Ok(o) => {
                *tally.borrow_mut().entry(o).or_default() += 1;
                Ok(())
            }
            Err(e) => Err(TestCaseError::fail(e)),
        }
    });
    let tally = tally.into_inner();
    let total: u64 = tally.values().sum();
    eprintln!(
        "fuzz: {total} executions in {:.1} s (slowest case {:.1} ms): {tally:?}",
        started.elapsed().as_secs_f64(),
        slowest.get().as_secs_f64() * 1e3
    );
    if let Err(e) = result {
        panic!("{e}");
    }
    // The generator must reach every outcome, or it is not testing the planner at all.
    if cases >= DEFAULT_CASES {
        for o in [Outcome::NotRead, Outcome::FieldErrors, Outcome::Planned] {
            assert!(tally.get(&o).copied().unwrap_or(0) > 0, "no case ended as {o:?}: {tally:?}");
        }
    }
}
