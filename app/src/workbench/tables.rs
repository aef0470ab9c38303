//! Tables: one input of the plan's form scenario varied over a range typed in the grower's
//! units, chosen headline answers read off each plan (through the core's
//! [`stillroom_core::sweep`], the same function as the command line's `stillroom sweep`), shown
//! as a table and a small chart, and offered as the command line's CSV (SI, byte for byte).

use super::Workbench;
use crate::fields::{self, FieldUnits, NumField, TextError, parse_number};
use crate::storage;
use crate::units::{self, UnitSystem, sp811};
use leptos::prelude::*;
use stillroom_core::heat::Fuel;
use stillroom_core::sweep::{self, SweepError, SweepTable};

/// The inputs a table can vary, by their key in [`crate::fields`], with a starting range in SI
/// (from, to, step) that the grower then edits: a range a small farm's still spans (common
/// practice, no source).
const INPUTS: [(&str, f64, f64, f64); 6] = [
    ("altitude", 0.0, 3000.0, 500.0),
    ("plant_mass", 5.0, 50.0, 5.0),
    ("heat_input", 5_000.0, 40_000.0, 5_000.0),
    ("target", 80.0, 98.0, 2.0),
    ("cooling_in", 5.0, 30.0, 5.0),
    ("oil_content", 0.5, 3.0, 0.5),
];

/// Most rows the page makes at once: each row is a whole plan with its ranges, planned while
/// the page waits, and a table read on a phone has tens. The command line goes to
/// [`sweep::MAX_SWEEP_ROWS`].
pub const PAGE_MAX_ROWS: u64 = 200;

/// A headline answer a table can show: its key, its heading, its path in the plan's JSON (the
/// command line's column name).
pub struct Column {
    pub key: &'static str,
    pub label: &'static str,
    pub path: &'static str,
}

/// The columns on offer, in the order they appear in the table and the CSV.
pub const COLUMNS: [Column; 7] = [
    Column { key: "steam", label: "Steam needed", path: "ranges.steam_kg.central" },
    Column { key: "water", label: "Water use", path: "ranges.water_total_kg.central" },
    Column { key: "boiling", label: "Water boils at", path: "site.water_boiling_point_c" },
    Column { key: "run_time", label: "Whole run", path: "run.total_time_s" },
    Column { key: "oil", label: "Oil to expect", path: "yield_estimate.oil_volume_m3.central" },
    Column { key: "fuel", label: "Fuel", path: "energy.fuel_amount" },
    Column { key: "separator", label: "Separator", path: "separator.volume_m3" },
];

fn column(key: &str) -> &'static Column {
    COLUMNS.iter().find(|c| c.key == key).unwrap_or(&COLUMNS[0])
}

/// An answer in the grower's units, as the plan's cards show it.
fn show(key: &str, si: f64, fuel: Fuel) -> String {
    match key {
        "steam" => units::mass(si),
        "water" => units::volume(si / 1000.0),
        "boiling" => units::celsius(si),
        "run_time" => units::duration(si),
        "oil" => units::oil_volume(si),
        "fuel" => units::fuel(si, fuel),
        _ => units::volume(si),
    }
}

/// An answer as a plain number in one fixed unit of the grower's system, for the chart's axis:
/// (value, unit). US factors from NIST SP 811 ([`sp811`]).
fn chart_value(key: &str, si: f64, fuel: Fuel) -> (f64, &'static str) {
    let us = units::system() == UnitSystem::UsCustomary;
    match (key, us) {
        ("steam", false) => (si, "kg"),
        ("steam", true) => (si / sp811::LB_KG, "lb"),
        // Water in kg, taken as 1 L per kg as the cards do.
        ("water", false) => (si, "L"),
        ("water", true) => (si / 1000.0 / sp811::GAL_M3, "gal"),
        ("boiling", false) => (si, "°C"),
        ("boiling", true) => (units::c_to_f(si), "°F"),
        ("run_time", _) => (si / 3600.0, "h"),
        ("oil", false) => (si * 1e6, "mL"),
        ("oil", true) => (si / sp811::FL_OZ_M3, "fl oz"),
        ("fuel", true) => match fuel {
            Fuel::Propane | Fuel::Firewood => (si / sp811::LB_KG, "lb"),
            Fuel::NaturalGas => (si * fuel.data().heating_value_j_per_unit / sp811::THERM_J, "therms"),
            Fuel::Electricity => (si, fuel.data().unit),
        },
        ("fuel", false) => (si, fuel.data().unit),
        (_, false) => (si * 1000.0, "L"),
        (_, true) => (si / sp811::GAL_M3, "gal"),
    }
}

/// A varied value in the grower's units, to about three figures: "1640 ft".
fn show_input(f: &NumField, si: f64, units: FieldUnits) -> String {
    let v = f.from_si_in(units, si);
    // sig3 writes a zero as "0.0000"; a range's start is often a plain 0.
    let n = if v == 0.0 { "0".to_string() } else { units::sig3(v) };
    format!("{n} {}", f.unit_in(units))
}

/// A step is a difference: in °F it is 5/9 K whatever the offset, so it converts as
/// to_si(step) - to_si(0).
fn step_to_si(f: &NumField, units: FieldUnits, v: f64) -> f64 {
    f.to_si_in(units, v) - f.to_si_in(units, 0.0)
}

fn step_from_si(f: &NumField, units: FieldUnits, si: f64) -> f64 {
    f.from_si_in(units, si) - f.from_si_in(units, 0.0)
}

/// The text for a step in SI, as a field shows it (nine figures, see [`fields::text_in`]).
fn step_text(f: &NumField, units: FieldUnits, si: f64) -> String {
    let shown = step_from_si(f, units, si);
    // text_in converts from SI itself; hand it the SI value whose plain conversion is `shown`.
    let back = f.to_si_in(units, shown);
    fields::text_in(f, back, units)
}

/// One range field: the text as typed, and the exact SI value it was written from (kept until
/// the grower edits it, so a units switch leaves the sweep exactly where it was).
#[derive(Clone, Copy)]
struct RangeField {
    text: RwSignal<String>,
    pinned: RwSignal<Option<f64>>,
}

impl RangeField {
    fn new() -> RangeField {
        RangeField { text: RwSignal::new(String::new()), pinned: RwSignal::new(None) }
    }

    fn set_si(&self, text: String, si: f64) {
        self.text.set(text);
        self.pinned.set(Some(si));
    }

    /// The SI value, or the message to show beside the field.
    fn si(&self, what: &str, to_si: impl Fn(f64) -> f64) -> Result<f64, String> {
        if let Some(si) = self.pinned.get_untracked() {
            return Ok(si);
        }
        match parse_number(&self.text.get_untracked()) {
            Ok(Some(v)) => Ok(to_si(v)),
            Ok(None) | Err(TextError::Empty) => Err(format!("Enter {what}.")),
            Err(TextError::NotANumber) => Err(format!("{what}: enter a number, e.g. 500.")),
        }
    }
}

/// What a made table holds: the sweep, the input's field key and the base scenario's fuel.
#[derive(Clone)]
struct Made {
    table: SweepTable,
    input: &'static str,
    fuel: Fuel,
    /// The range in SI, for the command line shown under the table.
    range: (f64, f64, f64),
}

/// The faults of the form, each beside its field.
#[derive(Clone, Default, PartialEq)]
struct Faults {
    from: Option<String>,
    to: Option<String>,
    step: Option<String>,
    columns: Option<String>,
    general: Option<String>,
}

fn input_key(key: &str) -> &'static str {
    INPUTS.iter().map(|i| i.0).find(|k| *k == key).unwrap_or(INPUTS[0].0)
}

/// The sweep form, the table, its chart and the CSV.
#[component]
pub fn Tables() -> impl IntoView {
    let wb = expect_context::<Workbench>();
    // The inputs a table varies do not follow the fuel; the form's fuel is used all the same,
    // so every conversion here is the form's own.
    let units_of = move |system: UnitSystem| {
        let fuel = wb.current.with_untracked(|s| s.as_ref().map(|s| s.boiler.fuel));
        FieldUnits::new(system, fuel.unwrap_or_else(|| stillroom_core::Scenario::default().boiler.fuel))
    };
    let input = RwSignal::new(INPUTS[0].0);
    let from = RangeField::new();
    let to = RangeField::new();
    let step = RangeField::new();
    let by_rows = RwSignal::new(false);
    let rows_text = RwSignal::new("7".to_string());
    let chosen = RwSignal::new(vec!["steam", "run_time"]);
    let chart_key = RwSignal::new("steam");
    let faults = RwSignal::new(Faults::default());
    let made = RwSignal::new(None::<Made>);
    // The units the range texts are written in.
    let typed_in = RwSignal::new(wb.units.get_untracked());

    let preset = move |key: &'static str| {
        let system = wb.units.get_untracked();
        let f = fields::field(key);
        let (_, a, b, s) = INPUTS.iter().copied().find(|i| i.0 == key).unwrap_or(INPUTS[0]);
        from.set_si(fields::text_in(f, a, units_of(system)), a);
        to.set_si(fields::text_in(f, b, units_of(system)), b);
        step.set_si(step_text(f, units_of(system), s), s);
        typed_in.set(system);
    };
    preset(INPUTS[0].0);

    // A units switch rewrites the range in the new units; the SI values stay exactly.
    Effect::new(move |_| {
        let system = wb.units.get();
        let before = typed_in.get_untracked();
        if system == before {
            return;
        }
        let f = fields::field(input.get_untracked());
        for (r, is_step) in [(from, false), (to, false), (step, true)] {
            let si = if is_step {
                r.si("", |v| step_to_si(f, units_of(before), v))
            } else {
                r.si("", |v| f.to_si_in(units_of(before), v))
            };
            if let Ok(si) = si {
                let text = if is_step {
                    step_text(f, units_of(system), si)
                } else {
                    fields::text_in(f, si, units_of(system))
                };
                r.set_si(text, si);
            }
        }
        typed_in.set(system);
    });

    let make = move |_| {
        wb.refresh();
        let system = wb.units.get_untracked();
        let key = input.get_untracked();
        let f = fields::field(key);
        let mut found = Faults::default();
        let a = from.si("where the table starts", |v| f.to_si_in(units_of(system), v));
        let b = to.si("where the table ends", |v| f.to_si_in(units_of(system), v));
        let s = if by_rows.get_untracked() {
            match (&a, &b, parse_number(&rows_text.get_untracked())) {
                (Ok(a), Ok(b), Ok(Some(n))) if n >= 2.0 && n.fract() == 0.0 => Ok((b - a) / (n - 1.0)),
                (_, _, Ok(Some(n))) if n < 2.0 || n.fract() != 0.0 => {
                    Err("The number of rows: a whole number, at least 2.".to_string())
                }
                // The start or the end is at fault: said beside them.
                (_, _, Ok(Some(_))) => Err(String::new()),
                (_, _, Ok(None) | Err(_)) => Err("Enter the number of rows, e.g. 7.".to_string()),
            }
        } else {
            step.si("the step", |v| step_to_si(f, units_of(system), v))
        };
        found.from = a.clone().err();
        found.to = b.clone().err();
        found.step = s.clone().err().filter(|m| !m.is_empty());
        let cols: Vec<&'static str> = COLUMNS
            .iter()
            .filter(|c| chosen.with_untracked(|k| k.contains(&c.key)))
            .map(|c| c.path)
            .collect();
        if cols.is_empty() {
            found.columns = Some("Tick at least one answer to show.".into());
        }
        let scenario = wb.current.get_untracked();
        if scenario.is_none() {
            found.general =
                Some("The plan's form could not be read: open “Plan a run” once, then come back.".into());
        }
        let (Ok(a), Ok(b), Ok(s), Some(scenario), false) = (a, b, s, scenario, cols.is_empty()) else {
            faults.set(found);
            made.set(None);
            return;
        };
        let unit = f.unit_in(units_of(system));
        match sweep::row_count(a, b, s) {
            Err(SweepError::BadRange) if b < a => {
                found.to = Some(format!(
                    "The end must not be below the start ({}).",
                    show_input(f, a, units_of(system))
                ));
            }
            Err(SweepError::BadRange) => found.step = Some(format!("The step must be more than 0 {unit}.")),
            Err(SweepError::TooManyRows { rows }) => {
                found.step = Some(format!(
                    "That makes {} rows; the page makes at most {PAGE_MAX_ROWS}: take a larger step or a narrower range.",
                    rows.map(|r| r.to_string()).unwrap_or_else(|| "endless".into())
                ))
            }
            Ok(n) if n > PAGE_MAX_ROWS => {
                found.step = Some(format!(
                    "That makes {n} rows; the page makes at most {PAGE_MAX_ROWS}: take a larger step or a narrower range."
                ))
            }
            _ => {}
        }
        if found != Faults::default() {
            faults.set(found);
            made.set(None);
            return;
        }
        match sweep::sweep(&scenario, f.path, a, b, s, &cols) {
            Ok(table) => {
                faults.set(Faults::default());
                // The chart keeps its column while that column is shown; else the first one.
                let first = COLUMNS.iter().find(|c| chosen.with_untracked(|k| k.contains(&c.key)));
                if let Some(first) =
                    first.filter(|_| !chosen.with_untracked(|k| k.contains(&chart_key.get_untracked())))
                {
                    chart_key.set(first.key);
                }
                made.set(Some(Made { table, input: key, fuel: scenario.boiler.fuel, range: (a, b, s) }));
            }
            Err(e) => {
                faults.set(Faults { general: Some(e.to_string()), ..Faults::default() });
                made.set(None);
            }
        }
    };

    let download = move |_| {
        if let Some(m) = made.get_untracked() {
            let name = format!("stillroom-table-{}.csv", storage::file_stamp());
            if let Err(e) = storage::download(&name, &m.table.to_csv()) {
                faults.update(|f| f.general = Some(e));
            }
        }
    };

    let unit_label = move || {
        let system = wb.units.get();
        fields::field(input.get()).unit_in(units_of(system))
    };
    let fault = move |pick: fn(&Faults) -> Option<String>| move || faults.with(pick);

    view! {
        <section class="tables" aria-labelledby="h-tables">
            <h2 id="h-tables">"Tables: one input over a range"</h2>
            <p class="hint">"The plan's form as it is now, with one input varied. Each row is a whole plan."</p>
            <div class="field">
                <label for="sweep-input"><span class="label">"Vary"</span></label>
                <select id="sweep-input" on:change=move |ev| {
                    let key = input_key(&event_target_value(&ev));
                    input.set(key);
                    preset(key);
                    made.set(None);
                }>
                    {INPUTS.iter().map(|(key, ..)| {
                        let f = fields::field(key);
                        view! { <option value=*key selected=move || input.get() == *key>{f.label}</option> }
                    }).collect_view()}
                </select>
            </div>
            <div class="sweep-range">
                <RangeInput id="sweep-from" label="From" field=from unit=Signal::derive(unit_label) fault=Signal::derive(fault(|f| f.from.clone())) />
                <RangeInput id="sweep-to" label="To" field=to unit=Signal::derive(unit_label) fault=Signal::derive(fault(|f| f.to.clone())) />
            </div>
            <fieldset class="sweep-by">
                <legend>"Rows"</legend>
                <label class="choice"><input type="radio" name="sweep-by" id="sweep-by-step" prop:checked=move || !by_rows.get() on:change=move |_| by_rows.set(false) />"By a step"</label>
                <label class="choice"><input type="radio" name="sweep-by" id="sweep-by-rows" prop:checked=move || by_rows.get() on:change=move |_| by_rows.set(true) />"By a number of rows"</label>
            </fieldset>
            <div hidden=move || by_rows.get()>
                <RangeInput id="sweep-step" label="Step" field=step unit=Signal::derive(unit_label) fault=Signal::derive(fault(|f| f.step.clone())) />
            </div>
            <div class="field" hidden=move || !by_rows.get()>
                <label for="sweep-rows"><span class="label">"Number of rows"</span></label>
                <input id="sweep-rows" type="text" inputmode="numeric" autocomplete="off"
                    prop:value=move || rows_text.get() on:input=move |ev| rows_text.set(event_target_value(&ev)) />
                <p class="error" aria-live="polite">{move || by_rows.get().then(|| faults.with(|f| f.step.clone())).flatten()}</p>
            </div>
            <fieldset class="sweep-columns">
                <legend>"Answers to show"</legend>
                {COLUMNS.iter().map(|c| {
                    let key = c.key;
                    view! {
                        <label class="choice">
                            <input type="checkbox" id=format!("sweep-col-{key}")
                                prop:checked=move || chosen.with(|k| k.contains(&key))
                                on:change=move |ev| {
                                    let on = event_target_checked(&ev);
                                    chosen.update(|k| { k.retain(|x| *x != key); if on { k.push(key); } });
                                } />
                            {c.label}
                        </label>
                    }
                }).collect_view()}
                <p class="error" aria-live="polite">{fault(|f| f.columns.clone())}</p>
            </fieldset>
            <button type="button" id="sweep-make" on:click=make>"Make the table"</button>
            <p class="error" id="sweep-error" role="alert">{fault(|f| f.general.clone())}</p>
            <Show when=move || made.with(|m| m.is_some())>
                <SweepView made=made chart_key=chart_key />
                <button type="button" id="sweep-csv" on:click=download>"Download as CSV"</button>
                <p class="hint">"The CSV is in SI units (m, kg, W, °C, s, m³), as the command line writes it:"</p>
                <p class="command"><code id="sweep-command">{move || made.with(|m| m.as_ref().map(|m| {
                    let (a, b, s) = m.range;
                    format!("stillroom sweep {} {a} {b} {s} {} plan.json", m.table.field, m.table.columns.join(","))
                }))}</code></p>
            </Show>
        </section>
    }
}

/// A range field: label with the unit, the text, its fault beside it.
#[component]
fn RangeInput(
    id: &'static str,
    label: &'static str,
    field: RangeField,
    unit: Signal<&'static str>,
    fault: Signal<Option<String>>,
) -> impl IntoView {
    view! {
        <div class="field">
            <label for=id><span class="label">{label}</span><span class="unit">{move || unit.get()}</span></label>
            <input id=id type="text" inputmode="decimal" autocomplete="off"
                aria-invalid=move || if fault.with(|f| f.is_some()) { "true" } else { "false" }
                prop:value=move || field.text.get()
                on:input=move |ev| { field.text.set(event_target_value(&ev)); field.pinned.set(None); } />
            <p class="error" aria-live="polite">{move || fault.get()}</p>
        </div>
    }
}

/// The made table and its chart, in the grower's units.
#[component]
fn SweepView(made: RwSignal<Option<Made>>, chart_key: RwSignal<&'static str>) -> impl IntoView {
    let wb = expect_context::<Workbench>();
    let keys = move || {
        made.with(|m| {
            m.as_ref()
                .map(|m| {
                    m.table
                        .columns
                        .iter()
                        .filter_map(|p| COLUMNS.iter().find(|c| c.path == p).map(|c| c.key))
                        .collect::<Vec<_>>()
                })
                .unwrap_or_default()
        })
    };
    let head = move || {
        let system = wb.units.get();
        made.with(|m| {
            m.as_ref().map(|m| {
                let f = fields::field(m.input);
                let mut cells = vec![format!("{} ({})", f.label, f.unit_in(FieldUnits::new(system, m.fuel)))];
                cells.extend(keys().into_iter().map(|k| column(k).label.to_string()));
                cells.into_iter().map(|c| view! { <th scope="col">{c}</th> }).collect_view()
            })
        })
    };
    let body = move || {
        let system = wb.units.get();
        made.with(|m| {
            let Some(m) = m.as_ref() else { return Vec::new() };
            let f = fields::field(m.input);
            let keys = keys();
            units::with_system(system, || {
                m.table
                    .rows
                    .iter()
                    .enumerate()
                    .map(|(i, row)| {
                        let x = show_input(f, row.value, FieldUnits::new(system, m.fuel));
                        let cells = match &row.cells {
                            Ok(_) => keys
                                .iter()
                                .enumerate()
                                .map(|(j, k)| {
                                    let si = row.number(j);
                                    let text = si.map(|v| show(k, v, m.fuel)).unwrap_or_else(|| "–".into());
                                    let si = si.map(|v| v.to_string()).unwrap_or_default();
                                    view! { <td data-col=*k data-si=si>{text}</td> }.into_any()
                                })
                                .collect::<Vec<_>>(),
                            Err(e) => {
                                let why = super::compare::why(e);
                                vec![view! {
                                    <td class="row-error" colspan=keys.len().to_string()>{format!("No plan: {why}")}</td>
                                }
                                .into_any()]
                            }
                        };
                        view! {
                            <tr data-row=i class:refused=row.cells.is_err()>
                                <th scope="row" data-si=row.value.to_string()>{x}</th>
                                {cells}
                            </tr>
                        }
                    })
                    .collect::<Vec<_>>()
            })
        })
    };
    view! {
        <div class="sweep-scroll">
            <table class="sweep" id="sweep-table">
                <thead><tr>{head}</tr></thead>
                <tbody>{body}</tbody>
            </table>
        </div>
        <div class="field">
            <label for="sweep-chart-col"><span class="label">"Chart"</span></label>
            <select id="sweep-chart-col" on:change=move |ev| {
                let v = event_target_value(&ev);
                if let Some(c) = COLUMNS.iter().find(|c| c.key == v) {
                    chart_key.set(c.key);
                }
            }>
                {move || keys().into_iter().map(|k| view! {
                    <option value=k selected=move || chart_key.get() == k>{column(k).label}</option>
                }).collect_view()}
            </select>
        </div>
        <SweepChart made=made chart_key=chart_key />
    }
}

/// Round steps for an axis from `lo` to `hi`: 1, 2, 2.5 or 5 times a power of ten, about four or
/// five of them; the ticks lie inside the (widened) range.
pub fn ticks(lo: f64, hi: f64) -> (f64, f64, Vec<f64>) {
    let (mut lo, mut hi) = if lo <= hi { (lo, hi) } else { (hi, lo) };
    if (hi - lo).abs() < 1e-12 * lo.abs().max(1.0) {
        // A flat line: a span of 1 % (or 1) around it, so the axis still has ticks.
        let pad = (lo.abs() * 0.01).max(1e-9).max(if lo == 0.0 { 1.0 } else { 0.0 });
        lo -= pad;
        hi += pad;
    }
    let raw = (hi - lo) / 4.0;
    let mag = 10f64.powf(raw.log10().floor());
    let step = [1.0, 2.0, 2.5, 5.0, 10.0].iter().map(|m| m * mag).find(|s| *s >= raw).unwrap_or(10.0 * mag);
    let start = (lo / step).floor() * step;
    let end = (hi / step).ceil() * step;
    let n = ((end - start) / step).round() as usize;
    let list = (0..=n.min(20)).map(|i| start + step * i as f64).collect();
    (start, end, list)
}

/// A tick's label: no more decimals than the step needs.
fn tick_label(v: f64, step: f64) -> String {
    let decimals = if step >= 1.0 { 0 } else { (-step.log10().floor()) as usize };
    units::fixed(v, decimals)
}

/// The chosen column against the varied input, drawn from the numbers.
#[component]
fn SweepChart(made: RwSignal<Option<Made>>, chart_key: RwSignal<&'static str>) -> impl IntoView {
    let wb = expect_context::<Workbench>();
    // Plot box inside a 320 x 220 view: left margin for the value labels, bottom for the input's.
    const L: f64 = 52.0;
    // Room on the right for half of the last input label.
    const R: f64 = 296.0;
    const T: f64 = 14.0;
    const B: f64 = 180.0;
    let drawn = move || {
        let system = wb.units.get();
        let key = chart_key.get();
        made.with(|m| {
            let m = m.as_ref()?;
            let col = m.table.columns.iter().position(|p| *p == column(key).path)?;
            let f = fields::field(m.input);
            let (points, unit) = units::with_system(system, || {
                let mut unit = "";
                let pts: Vec<(f64, f64)> = m
                    .table
                    .rows
                    .iter()
                    .filter_map(|r| {
                        let (y, u) = chart_value(key, r.number(col)?, m.fuel);
                        unit = u;
                        Some((f.from_si_in(FieldUnits::new(system, m.fuel), r.value), y))
                    })
                    .collect();
                (pts, unit)
            });
            if points.is_empty() {
                return None;
            }
            let xs = points.iter().map(|p| p.0);
            let ys = points.iter().map(|p| p.1);
            let (x0, x1, xt) =
                ticks(xs.clone().fold(f64::INFINITY, f64::min), xs.fold(f64::NEG_INFINITY, f64::max));
            let (y0, y1, yt) =
                ticks(ys.clone().fold(f64::INFINITY, f64::min), ys.fold(f64::NEG_INFINITY, f64::max));
            let px = move |x: f64| L + (R - L) * (x - x0) / (x1 - x0);
            let py = move |y: f64| B - (B - T) * (y - y0) / (y1 - y0);
            let line = points
                .iter()
                .map(|(x, y)| format!("{:.1},{:.1}", px(*x), py(*y)))
                .collect::<Vec<_>>()
                .join(" ");
            let xstep = xt.get(1).map(|v| v - xt[0]).unwrap_or(1.0);
            let ystep = yt.get(1).map(|v| v - yt[0]).unwrap_or(1.0);
            let xlabels = xt.iter().map(|x| (px(*x), tick_label(*x, xstep))).collect::<Vec<_>>();
            let ylabels = yt.iter().map(|y| (py(*y), tick_label(*y, ystep))).collect::<Vec<_>>();
            let dots = points.iter().map(|(x, y)| (px(*x), py(*y))).collect::<Vec<_>>();
            let title = format!(
                "{} ({unit}) against {} ({})",
                column(key).label,
                f.label.to_lowercase(),
                f.unit_in(FieldUnits::new(system, m.fuel))
            );
            Some((line, xlabels, ylabels, dots, title, unit, f.unit_in(FieldUnits::new(system, m.fuel))))
        })
    };
    view! {
        {move || drawn().map(|(line, xl, yl, dots, title, unit, xunit)| view! {
            <figure class="chart sweep-chart">
                <svg viewBox="0 0 320 220" role="img" aria-label=title.clone() id="sweep-chart">
                    {yl.into_iter().map(|(y, t)| view! {
                        <line x1=L.to_string() x2=R.to_string() y1=format!("{y:.1}") y2=format!("{y:.1}") class="grid" />
                        <text x=(L - 4.0).to_string() y=format!("{:.1}", y + 4.0) class="tick end">{t}</text>
                    }).collect_view()}
                    {xl.into_iter().map(|(x, t)| view! {
                        <line x1=format!("{x:.1}") x2=format!("{x:.1}") y1=B.to_string() y2=(B + 4.0).to_string() class="axis" />
                        <text x=format!("{x:.1}") y=(B + 17.0).to_string() class="tick mid">{t}</text>
                    }).collect_view()}
                    <line x1=L.to_string() y1=B.to_string() x2=R.to_string() y2=B.to_string() class="axis" />
                    <line x1=L.to_string() y1=T.to_string() x2=L.to_string() y2=B.to_string() class="axis" />
                    <polyline points=line class="curve" />
                    {dots.into_iter().map(|(x, y)| view! { <circle cx=format!("{x:.1}") cy=format!("{y:.1}") r="3" class="dot" /> }).collect_view()}
                    <text x=L.to_string() y="10" class="tick">{unit}</text>
                    <text x=R.to_string() y="214" class="tick end">{xunit}</text>
                </svg>
                <figcaption>{title}</figcaption>
            </figure>
        })}
    }
}
