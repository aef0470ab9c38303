//! A sweep: one input of a scenario varied over a range, each value planned, and chosen answers
//! of each plan read off as a table (feature `json`).
//!
//! The varied value is x_i = FROM + i STEP for i = 0, 1, ... while x_i <= TO (with an allowance
//! of 1e-9 STEP, so that TO itself is kept when (TO - FROM) / STEP is whole but rounds just
//! below). The input is named by its dotted path in the scenario's JSON (`site.altitude_m`), the
//! answers by dotted paths in the plan's JSON (`run.total_time_s`, list items by index,
//! `codistillation.cuts.0.steam_kg_per_kg_oil`). Every value is SI, as in the scenario and the
//! plan. Both the command line (`stillroom sweep`) and the page's tables come from here, so they
//! give the same numbers; [`SweepTable::to_csv`] is the command line's output byte for byte.
//!
//! Limits: at most [`MAX_SWEEP_ROWS`] rows, refused before any row is planned; FROM, TO and
//! STEP finite, FROM <= TO, STEP > 0. A value the plan refuses (a negative plant mass, say) is
//! a row holding the plan's field errors; the other rows are planned as usual. An input the
//! scenario does not have is refused on the first value, once. A column the plan does not hold
//! (or holds empty, as `season.charges` without a harvest) is an empty cell; the command line
//! first checks the column names against the plan's JSON Schema (`known_columns`, feature `cli`).

use crate::scenario::{FieldError, ScenarioErrors, scenario_from_json_value};
use crate::{Plan, Scenario, plan};
use serde_json::Value;

/// Most rows one sweep makes: a leaflet's table has tens; a thousand is a fine curve, and the
/// cap keeps a mistyped STEP from running for ever.
pub const MAX_SWEEP_ROWS: u64 = 1_000;

/// Why a sweep cannot be made at all.
#[derive(Debug, Clone, PartialEq)]
pub enum SweepError {
    /// FROM, TO or STEP is not finite, TO < FROM, or STEP <= 0.
    BadRange,
    /// The range would make more than [`MAX_SWEEP_ROWS`] rows (`None`: no end).
    TooManyRows { rows: Option<f64> },
    /// The varied input is not a numeric field of the scenario.
    Field { field: String, errors: ScenarioErrors },
    /// Columns the plan has no place for (from `known_columns`).
    UnknownColumns(Vec<String>),
}

impl std::fmt::Display for SweepError {
    fn fmt(&self, f: &mut std::fmt::Formatter<'_>) -> std::fmt::Result {
        match self {
            SweepError::BadRange => write!(f, "need FROM <= TO and STEP > 0"),
            SweepError::TooManyRows { rows } => {
                let rows = match rows {
                    Some(n) => format!("{n} rows"),
                    None => "rows without end".into(),
                };
                write!(
                    f,
                    "the sweep would print {rows}; at most {MAX_SWEEP_ROWS} rows: choose a larger STEP or a narrower range"
                )
            }
            SweepError::Field { field, errors } => {
                let json = serde_json::to_string_pretty(errors).unwrap_or_else(|_| errors.to_string());
                write!(f, "{field} cannot be swept:\n{json}")
            }
            SweepError::UnknownColumns(c) => {
                write!(f, "not in the plan: {} (see `stillroom schema plan` for the names)", c.join(", "))
            }
        }
    }
}

impl std::error::Error for SweepError {}

/// The number of rows of a sweep from `from` to `to` in steps of `step`:
/// n = floor((TO - FROM) / STEP + 1e-9) + 1, at most [`MAX_SWEEP_ROWS`].
///
/// ```
/// use stillroom_core::sweep::{row_count, SweepError};
/// assert_eq!(row_count(0.0, 3000.0, 500.0), Ok(7));
/// // From 0 to 0.3 in steps of 0.1: 0.3 / 0.1 is 2.9999999999999996 in floating point; 0.3 is kept.
/// assert_eq!(row_count(0.0, 0.3, 0.1), Ok(4));
/// assert_eq!(row_count(0.0, 3000.0, 1.0), Err(SweepError::TooManyRows { rows: Some(3001.0) }));
/// assert_eq!(row_count(5.0, 1.0, 1.0), Err(SweepError::BadRange));
/// ```
pub fn row_count(from: f64, to: f64, step: f64) -> Result<u64, SweepError> {
    if !(from.is_finite() && to.is_finite() && step.is_finite()) || step <= 0.0 || to < from {
        return Err(SweepError::BadRange);
    }
    let intervals = ((to - from) / step + 1e-9).floor();
    if !(intervals.is_finite() && intervals < MAX_SWEEP_ROWS as f64) {
        return Err(SweepError::TooManyRows { rows: intervals.is_finite().then_some(intervals + 1.0) });
    }
    Ok(intervals as u64 + 1)
}

/// One row: the varied value (SI) and either each column's value from the plan (`Null` where
/// the plan holds nothing there) or the field errors that kept this value from a plan.
#[derive(Debug, Clone, PartialEq)]
pub struct SweepRow {
    pub value: f64,
    pub cells: Result<Vec<Value>, ScenarioErrors>,
}

impl SweepRow {
    /// Column `i` as a number, where it is one.
    pub fn number(&self, i: usize) -> Option<f64> {
        self.cells.as_ref().ok()?.get(i)?.as_f64()
    }

    /// The row as the command line prints it (without the line end): the value, then each cell
    /// (a number as JSON writes it, a text quoted, nothing for an empty cell), or the row's
    /// errors as one quoted cell `"error: field: message; ..."`.
    pub fn csv_line(&self) -> String {
        match &self.cells {
            Ok(cells) => {
                let cells: Vec<String> = cells.iter().map(csv_cell).collect();
                format!("{},{}", self.value, cells.join(","))
            }
            Err(e) => format!("{},\"error: {}\"", self.value, error_words(e).replace('"', "'")),
        }
    }
}

/// The errors of a row in one line: `field: message; field: message`.
pub fn error_words(e: &ScenarioErrors) -> String {
    e.errors.iter().map(|e| format!("{}: {}", e.field, e.message)).collect::<Vec<_>>().join("; ")
}

fn csv_cell(v: &Value) -> String {
    match v {
        Value::Null => String::new(),
        Value::String(s) => format!("\"{}\"", s.replace('"', "\"\"")),
        other => other.to_string(),
    }
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

/// The value at a dotted path of a JSON value (list items by index).
fn get_path<'a>(value: &'a Value, path: &str) -> Option<&'a Value> {
    path.split('.').try_fold(value, |cur, key| match cur {
        Value::Object(map) => map.get(key),
        Value::Array(items) => key.parse::<usize>().ok().and_then(|i| items.get(i)),
        _ => None,
    })
}

/// A sweep ready to run row by row (the command line prints each row as it is planned); see
/// [`sweep`] for the whole table at once.
#[derive(Debug, Clone)]
pub struct Sweep {
    base: Value,
    field: String,
    from: f64,
    step: f64,
    rows: u64,
    columns: Vec<String>,
}

impl Sweep {
    /// Checks the range ([`row_count`]) and that `field` is a numeric input of the scenario
    /// (by planning nothing: the scenario at FROM must read), and makes the sweep.
    ///
    /// ```
    /// use stillroom_core::{Scenario, sweep::{Sweep, SweepError}};
    /// let s = Sweep::new(&Scenario::default(), "site.altitude_m", 0.0, 100.0, 50.0, &["site.pressure_pa"]).unwrap();
    /// assert_eq!(s.len(), 3);
    /// assert_eq!(s.csv_header(), "site.altitude_m,site.pressure_pa");
    /// let bad = Sweep::new(&Scenario::default(), "site.altitud", 0.0, 100.0, 50.0, &["site.pressure_pa"]);
    /// assert!(matches!(bad, Err(SweepError::Field { .. })));
    /// ```
    pub fn new(
        base: &Scenario,
        field: &str,
        from: f64,
        to: f64,
        step: f64,
        columns: &[&str],
    ) -> Result<Sweep, SweepError> {
        let rows = row_count(from, to, step)?;
        let base = serde_json::to_value(base).map_err(|e| SweepError::Field {
            field: field.to_string(),
            errors: one_error(field, e.to_string()),
        })?;
        let sweep = Sweep {
            base,
            field: field.to_string(),
            from,
            step,
            rows,
            columns: columns.iter().map(|c| c.to_string()).collect(),
        };
        // An input the scenario does not have fails on the first value: say so once, not per row.
        sweep.scenario_at(from).map_err(|errors| SweepError::Field { field: field.to_string(), errors })?;
        Ok(sweep)
    }

    /// How many rows the sweep makes.
    pub fn len(&self) -> usize {
        self.rows as usize
    }

    /// Whether the sweep makes no rows (never: a range holds at least FROM).
    pub fn is_empty(&self) -> bool {
        self.rows == 0
    }

    /// The header line: the varied input's path, then the columns' paths.
    pub fn csv_header(&self) -> String {
        format!("{},{}", self.field, self.columns.join(","))
    }

    /// The scenario with the varied input at `x`.
    pub fn scenario_at(&self, x: f64) -> Result<Scenario, ScenarioErrors> {
        let mut v = self.base.clone();
        set_path(&mut v, &self.field, serde_json::json!(x)).map_err(|m| one_error(&self.field, m))?;
        scenario_from_json_value(v)
    }

    /// Row `i`: x = FROM + i STEP, planned.
    pub fn row(&self, i: u64) -> SweepRow {
        let x = self.from + self.step * i as f64;
        let cells = self.scenario_at(x).and_then(|s| plan(&s)).and_then(|p| self.cells_of(&p));
        SweepRow { value: x, cells }
    }

    /// Every row, in order, each planned when it is asked for.
    pub fn rows(&self) -> impl Iterator<Item = SweepRow> + '_ {
        (0..self.rows).map(|i| self.row(i))
    }

    fn cells_of(&self, p: &Plan) -> Result<Vec<Value>, ScenarioErrors> {
        let pv = serde_json::to_value(p).map_err(|e| one_error("plan", e.to_string()))?;
        Ok(self.columns.iter().map(|c| get_path(&pv, c).cloned().unwrap_or(Value::Null)).collect())
    }
}

fn one_error(field: &str, message: String) -> ScenarioErrors {
    ScenarioErrors {
        errors: vec![FieldError {
            field: field.to_string(),
            value: String::new(),
            valid: "a numeric field of the scenario".into(),
            message,
            min: None,
            max: None,
        }],
    }
}

/// A whole sweep: the varied input's path, the columns' paths, and the rows.
#[derive(Debug, Clone, PartialEq)]
pub struct SweepTable {
    pub field: String,
    pub columns: Vec<String>,
    pub rows: Vec<SweepRow>,
}

impl SweepTable {
    /// The table as CSV, exactly as `stillroom sweep` prints it: a header line
    /// `FIELD,COLUMN,...`, then one line per row ([`SweepRow::csv_line`]), each ended by `\n`.
    pub fn to_csv(&self) -> String {
        let mut out = format!("{},{}\n", self.field, self.columns.join(","));
        for row in &self.rows {
            out.push_str(&row.csv_line());
            out.push('\n');
        }
        out
    }
}

/// Varies `field` of `base` from `from` to `to` in steps of `step` (all SI) and plans each
/// value, reading `columns` off each plan: x_i = FROM + i STEP while x_i <= TO (see the module
/// text for the limits). Higher sites boil water lower: the IAPWS-IF97 saturation temperature is
/// 373.124 K (99.974 °C) at 101.325 kPa, the standard atmosphere's sea-level pressure.
///
/// ```
/// use stillroom_core::{Scenario, sweep::sweep};
/// let t = sweep(&Scenario::default(), "site.altitude_m", 0.0, 1000.0, 500.0,
///               &["site.water_boiling_point_c"]).unwrap();
/// assert_eq!(t.rows.len(), 3);
/// let bp: Vec<f64> = t.rows.iter().map(|r| r.number(0).unwrap()).collect();
/// assert!((bp[0] - 99.974).abs() < 0.01 && bp[0] > bp[1] && bp[1] > bp[2]);
/// assert!(t.to_csv().starts_with("site.altitude_m,site.water_boiling_point_c\n0,99.97"));
/// ```
pub fn sweep(
    base: &Scenario,
    field: &str,
    from: f64,
    to: f64,
    step: f64,
    columns: &[&str],
) -> Result<SweepTable, SweepError> {
    let s = Sweep::new(base, field, from, to, step, columns)?;
    Ok(SweepTable { field: s.field.clone(), columns: s.columns.clone(), rows: s.rows().collect() })
}

/// Checks column names against the plan's JSON Schema (through optional sections and list
/// items), so an unknown column is an error before any row is planned, while a known one that a
/// given plan leaves empty stays an empty cell (feature `cli`, which has the schema).
///
/// ```
/// use stillroom_core::sweep::{known_columns, SweepError};
/// assert!(known_columns(&["site.pressure_pa", "season.charges", "run.recovery_curve.1.0"]).is_ok());
/// assert_eq!(known_columns(&["site.pressure", "run.total_time_s"]),
///            Err(SweepError::UnknownColumns(vec!["site.pressure".into()])));
/// ```
#[cfg(feature = "cli")]
pub fn known_columns(columns: &[&str]) -> Result<(), SweepError> {
    let schema = serde_json::to_value(schemars::schema_for!(Plan)).unwrap_or(Value::Null);
    let unknown: Vec<String> = columns
        .iter()
        .filter(|c| !schema_has(&schema, &schema, &c.split('.').collect::<Vec<_>>()))
        .map(|c| c.to_string())
        .collect();
    if unknown.is_empty() { Ok(()) } else { Err(SweepError::UnknownColumns(unknown)) }
}

/// Whether a dotted path names a place in a JSON Schema.
#[cfg(feature = "cli")]
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

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn a_thousand_rows_is_the_most() {
        assert_eq!(row_count(0.0, 999.0, 1.0), Ok(1000));
        assert_eq!(row_count(0.0, 1000.0, 1.0), Err(SweepError::TooManyRows { rows: Some(1001.0) }));
        assert_eq!(row_count(0.0, 1e308, 1e-308), Err(SweepError::TooManyRows { rows: None }));
        for (a, b, c) in [(0.0, f64::INFINITY, 1.0), (f64::NAN, 1.0, 1.0), (0.0, 1.0, 0.0), (0.0, 1.0, -1.0)]
        {
            assert_eq!(row_count(a, b, c), Err(SweepError::BadRange), "{a} {b} {c}");
        }
        // One row when FROM = TO.
        assert_eq!(row_count(3.0, 3.0, 1.0), Ok(1));
    }

    #[test]
    fn a_refused_value_is_a_row_of_its_own_and_the_others_are_planned() {
        let t = sweep(&Scenario::default(), "charge.plant_mass_kg", -10.0, 10.0, 10.0, &["run.total_time_s"])
            .unwrap();
        assert_eq!(t.rows.len(), 3);
        let refused = t.rows[0].cells.as_ref().unwrap_err();
        assert!(refused.on("charge.plant_mass_kg").is_some(), "{refused:?}");
        assert!(t.rows[0].csv_line().starts_with("-10,\"error: charge.plant_mass_kg: "));
        assert!(t.rows[2].number(0).is_some_and(|s| s > 0.0));
    }

    #[test]
    fn empty_and_text_cells_read_as_the_command_line_writes_them() {
        let t = sweep(
            &Scenario::default(),
            "site.altitude_m",
            0.0,
            0.0,
            1.0,
            &["season.charges", "energy.fuel_unit"],
        )
        .unwrap();
        let line = t.rows[0].csv_line();
        // No harvest: no season, an empty cell; the fuel's unit is a text, quoted.
        assert!(line.starts_with("0,,\""), "{line}");
        assert_eq!(t.rows[0].number(0), None);
    }

    #[test]
    fn the_csv_is_the_header_and_each_row_on_its_own_line() {
        let t = sweep(&Scenario::default(), "site.altitude_m", 0.0, 3000.0, 500.0, &["site.pressure_pa"])
            .unwrap();
        let csv = t.to_csv();
        let lines: Vec<&str> = csv.lines().collect();
        assert_eq!(lines.len(), 8);
        assert!(csv.ends_with('\n') && !csv.ends_with("\n\n"));
        assert_eq!(lines[0], "site.altitude_m,site.pressure_pa");
        // US Standard Atmosphere 1976, Table I: 101 325 Pa at 0 m, 70 121 Pa at 3000 m.
        let p: Vec<f64> = t.rows.iter().map(|r| r.number(0).unwrap()).collect();
        assert!((p[0] - 101_325.0).abs() < 1.0 && (p[6] - 70_121.0).abs() < 40.0, "{p:?}");
        assert_eq!(lines[7], format!("3000,{}", serde_json::json!(p[6])));
    }

    #[test]
    fn an_input_the_scenario_lacks_is_refused_once() {
        let e =
            sweep(&Scenario::default(), "site.altitud", 0.0, 100.0, 50.0, &["site.pressure_pa"]).unwrap_err();
        assert!(matches!(&e, SweepError::Field { field, .. } if field == "site.altitud"));
        assert!(e.to_string().contains("site.altitud"));
        let e =
            sweep(&Scenario::default(), "charge.crop.x", 0.0, 1.0, 1.0, &["site.pressure_pa"]).unwrap_err();
        assert!(matches!(e, SweepError::Field { .. }));
    }
}
