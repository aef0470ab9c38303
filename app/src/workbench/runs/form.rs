//! The batch-record form, in the grower's units; each field's error beside it.

use super::{Runs, log};
use crate::components::inputs::ReadingNote;
use crate::fields::{TextError, parse_number};
use crate::units::{UnitSystem, sp811};
use crate::workbench::Workbench;
use leptos::prelude::*;
use stillroom_core::calibration::{EarlierReading, RunRecord, logged_conditions};
use stillroom_core::crops::CROPS;
use stillroom_core::heat::Fuel;

/// A typed quantity's unit in a system, and its factor to SI.
struct Unit {
    label: &'static str,
    to_si: f64,
}

fn mass_unit(u: UnitSystem) -> Unit {
    match u {
        UnitSystem::Metric => Unit { label: "kg", to_si: 1.0 },
        UnitSystem::UsCustomary => Unit { label: "lb", to_si: sp811::LB_KG },
    }
}

fn oil_unit(u: UnitSystem) -> Unit {
    match u {
        UnitSystem::Metric => Unit { label: "mL", to_si: 1e-6 },
        UnitSystem::UsCustomary => Unit { label: "fl oz", to_si: sp811::FL_OZ_M3 },
    }
}

fn hydrosol_unit(u: UnitSystem) -> Unit {
    match u {
        UnitSystem::Metric => Unit { label: "L", to_si: 1e-3 },
        UnitSystem::UsCustomary => Unit { label: "gal", to_si: sp811::GAL_M3 },
    }
}

/// The unit the plan shows the fuel in (`units::fuel`): the sales unit in metric; lb, therms
/// or kWh in US units.
pub fn fuel_unit(fuel: Fuel, u: UnitSystem) -> &'static str {
    match (u, fuel) {
        (UnitSystem::Metric, f) => f.data().unit,
        (UnitSystem::UsCustomary, Fuel::Propane | Fuel::Firewood) => "lb",
        (UnitSystem::UsCustomary, Fuel::NaturalGas) => "therms",
        (UnitSystem::UsCustomary, Fuel::Electricity) => "kWh",
    }
}

/// Today's date, `2026-07-14`, and its year, by the browser's clock.
pub fn today() -> (String, String) {
    let d = js_sys::Date::new_0();
    let year = format!("{:04}", d.get_full_year());
    (format!("{year}-{:02}-{:02}", d.get_month() + 1, d.get_date()), year)
}

/// A required positive number, or the words for its field.
fn positive(text: &str, what: &str) -> Result<f64, String> {
    match parse_number(text) {
        Ok(Some(v)) if v > 0.0 => Ok(v),
        Ok(Some(_)) => Err(format!("{what} must be more than zero.")),
        Ok(None) | Err(TextError::Empty) => Err(format!("Enter {what}.")),
        Err(TextError::NotANumber) => Err(format!("{what}: enter a number.")),
    }
}

/// An optional number ≥ 0: `None` when blank.
fn optional(text: &str, what: &str) -> Result<Option<f64>, String> {
    match parse_number(text) {
        Ok(None) | Err(TextError::Empty) => Ok(None),
        Ok(Some(v)) if v >= 0.0 => Ok(Some(v)),
        Ok(Some(_)) => Err(format!("{what} cannot be below zero.")),
        Err(TextError::NotANumber) => Err(format!("{what}: enter a number.")),
    }
}

#[derive(Clone, Copy)]
struct Texts {
    lot: RwSignal<String>,
    date: RwSignal<String>,
    crop: RwSignal<Option<String>>,
    part: RwSignal<String>,
    mass: RwSignal<String>,
    minutes: RwSignal<String>,
    fuel: RwSignal<String>,
    oil: RwSignal<String>,
    hydrosol: RwSignal<String>,
    early_min: RwSignal<String>,
    early_oil: RwSignal<String>,
    note: RwSignal<String>,
}

/// Field errors by input id.
type Errors = RwSignal<Vec<(&'static str, String)>>;

/// One text field with its label, unit and error.
#[component]
fn Field(
    id: &'static str,
    label: &'static str,
    #[prop(into)] unit: Signal<String>,
    value: RwSignal<String>,
    errors: Errors,
    #[prop(default = true)] numeric: bool,
    #[prop(optional, into)] placeholder: Signal<String>,
) -> impl IntoView {
    let error = move || errors.with(|e| e.iter().find(|(k, _)| *k == id).map(|(_, m)| m.clone()));
    view! {
        <div class="field" class:invalid=move || error().is_some()>
            <label for=id><span class="label">{label}</span><span class="unit">{move || unit.get()}</span></label>
            <input id=id type="text" autocomplete="off" inputmode=if numeric { "decimal" } else { "text" }
                placeholder=move || placeholder.get()
                aria-describedby=format!("{id}-error {id}-reading")
                prop:value=move || value.get() on:input=move |ev| value.set(event_target_value(&ev)) />
            <p class="error" id=format!("{id}-error") aria-live="polite">{error}</p>
            {numeric.then(|| view! { <ReadingNote text=value id=format!("{id}-reading") /> })}
        </div>
    }
}

/// The run's record from the form, or each field's error.
fn read_form(wb: Workbench, runs: Runs, t: Texts) -> Result<RunRecord, Vec<(&'static str, String)>> {
    let u = wb.units.get_untracked();
    let mut errors = Vec::new();
    let mut take = |id: &'static str, r: Result<f64, String>| r.map_err(|e| errors.push((id, e))).ok();
    let mass = take("run-mass", positive(&t.mass.get_untracked(), "the charge loaded"));
    let minutes = take("run-minutes", positive(&t.minutes.get_untracked(), "the minutes distilled"));
    let oil = take("run-oil", positive(&t.oil.get_untracked(), "the oil collected"));
    let mut opt =
        |id: &'static str, r: Result<Option<f64>, String>| r.map_err(|e| errors.push((id, e))).ok().flatten();
    let fuel = opt("run-fuel", optional(&t.fuel.get_untracked(), "The fuel used"));
    let hydrosol = opt("run-hydrosol", optional(&t.hydrosol.get_untracked(), "The hydrosol"));
    let early_min = opt("run-early-min", optional(&t.early_min.get_untracked(), "The earlier time"));
    let early_oil = opt("run-early-oil", optional(&t.early_oil.get_untracked(), "The earlier oil"));
    let earlier = match (early_min, early_oil) {
        (None, None) => None,
        (Some(m), Some(o)) => {
            if minutes.is_some_and(|t| m >= t) {
                errors.push((
                    "run-early-min",
                    "The earlier reading must come before the end of the run.".into(),
                ));
            } else if oil.is_some_and(|v| o >= v) {
                errors.push((
                    "run-early-oil",
                    "By the earlier time there was less oil than at the end.".into(),
                ));
            } else if m <= 0.0 || o <= 0.0 {
                errors.push((
                    "run-early-oil",
                    "An earlier reading needs a time and an amount above zero.".into(),
                ));
            }
            Some(EarlierReading { time_s: m * 60.0, oil_volume_m3: o * oil_unit(u).to_si })
        }
        (None, Some(_)) => {
            errors.push(("run-early-min", "Enter when the earlier oil was measured.".into()));
            None
        }
        (Some(_), None) => {
            errors.push(("run-early-oil", "Enter the oil collected by then.".into()));
            None
        }
    };
    let lot = t.lot.get_untracked().trim().to_string();
    if lot.is_empty() {
        errors.push(("run-lot", "Enter a lot number.".into()));
    } else if lot.chars().count() > log::MAX_LOT_CHARS {
        errors.push(("run-lot", format!("A lot number has at most {} characters.", log::MAX_LOT_CHARS)));
    } else if runs.runs.with_untracked(|r| r.iter().any(|r| r.lot == lot)) {
        errors.push(("run-lot", format!("Lot {lot} is already in your log: give this run another number.")));
    }
    wb.refresh();
    let scenario = wb.current.get_untracked();
    let planned = scenario.as_ref().map(|s| (s, stillroom_core::plan(s)));
    let conditions = match (&planned, mass) {
        (None, _) => {
            errors.push((
                "run-mass",
                "The plan's form could not be read: open “Plan a run” once, then log the run.".into(),
            ));
            None
        }
        (Some((_, Err(_))), _) => {
            errors.push((
                "run-mass",
                "Fix the plan's marked fields first: the record keeps the plan's oil density and steam rate."
                    .into(),
            ));
            None
        }
        (Some((s, Ok(p))), Some(m)) => logged_conditions(s, p, m * mass_unit(u).to_si),
        _ => None,
    };
    if !errors.is_empty() {
        return Err(errors);
    }
    let (Some(mass), Some(minutes), Some(oil), Some(c), Some((s, _))) =
        (mass, minutes, oil, conditions, planned)
    else {
        return Err(vec![("run-mass", "The record could not be made from these numbers.".into())]);
    };
    Ok(RunRecord {
        lot,
        date: t.date.get_untracked().trim().to_string(),
        crop: t.crop.get_untracked(),
        plant_part: t.part.get_untracked().trim().to_string(),
        plant_mass_kg: mass * mass_unit(u).to_si,
        distilling_time_s: minutes * 60.0,
        fuel_used: fuel,
        fuel_unit: fuel_unit(s.boiler.fuel, u).to_string(),
        oil_volume_m3: oil * oil_unit(u).to_si,
        hydrosol_volume_m3: hydrosol.map(|h| h * hydrosol_unit(u).to_si),
        note: t.note.get_untracked().trim().to_string(),
        earlier,
        oil_density_kg_per_m3: c.oil_density_kg_per_m3,
        rate_constant_per_min: c.rate_constant_per_min,
        specific_steam_rate_kg_per_h_per_kg: c.specific_steam_rate_kg_per_h_per_kg,
        reference_steam_rate_kg_per_h_per_kg: c.reference_steam_rate_kg_per_h_per_kg,
    })
}

/// The form for a finished run: crop, plant part and date from the plan and today, the next
/// lot number of the grower's pattern, the rest typed.
#[component]
pub fn BatchForm() -> impl IntoView {
    let wb = expect_context::<Workbench>();
    let runs = expect_context::<Runs>();
    let (date_today, year) = today();
    let plan_crop = move || wb.current.with(|s| s.as_ref().and_then(|s| s.charge.crop.clone()));
    let t = Texts {
        lot: RwSignal::new(String::new()),
        date: RwSignal::new(date_today.clone()),
        crop: RwSignal::new(plan_crop()),
        part: RwSignal::new(log::plant_part(plan_crop().as_deref())),
        mass: RwSignal::new(String::new()),
        minutes: RwSignal::new(String::new()),
        fuel: RwSignal::new(String::new()),
        oil: RwSignal::new(String::new()),
        hydrosol: RwSignal::new(String::new()),
        early_min: RwSignal::new(String::new()),
        early_oil: RwSignal::new(String::new()),
        note: RwSignal::new(String::new()),
    };
    // The plan's crop becomes the form's when the plan changes it.
    Effect::new(move |last: Option<Option<String>>| {
        let crop = plan_crop();
        if last.as_ref() != Some(&crop) {
            t.part.set(log::plant_part(crop.as_deref()));
            t.crop.set(crop.clone());
        }
        crop
    });
    let year_for_lot = year.clone();
    let suggested = Memo::new(move |_| {
        let crop = t.crop.get();
        runs.lot_pattern.with(|p| runs.runs.with(|r| log::next_lot(p, crop.as_deref(), &year_for_lot, r)))
    });
    // The lot field follows the pattern until the grower types one of their own.
    let typed_lot = RwSignal::new(false);
    Effect::new(move |_| {
        let next = suggested.get();
        if !typed_lot.get_untracked() {
            t.lot.set(next);
        }
    });
    let errors: Errors = RwSignal::new(Vec::new());
    let logged = RwSignal::new(None::<String>);
    let u = wb.units;
    let log_it = move |_| match read_form(wb, runs, t) {
        Err(e) => {
            errors.set(e);
            logged.set(None);
        }
        Ok(record) => {
            errors.set(Vec::new());
            logged.set(Some(format!("Lot {} logged.", record.lot)));
            runs.runs.update(|r| r.push(record));
            for s in [t.mass, t.minutes, t.fuel, t.oil, t.hydrosol, t.early_min, t.early_oil, t.note] {
                s.set(String::new());
            }
            typed_lot.set(false);
            t.lot.set(suggested.get_untracked());
        }
    };
    let fuel_label = move || {
        wb.current.with(|s| s.as_ref().map(|s| fuel_unit(s.boiler.fuel, u.get())).unwrap_or("").to_string())
    };
    let mass_placeholder = move || {
        wb.current
            .with(|s| s.as_ref().map(|s| s.charge.plant_mass_kg / mass_unit(u.get()).to_si))
            .map(|m| format!("planned {}", crate::units::sig3(m)))
            .unwrap_or_default()
    };
    let lot_error = move || errors.with(|e| e.iter().find(|(k, _)| *k == "run-lot").map(|(_, m)| m.clone()));
    view! {
        <div class="batch-form">
            <h3>"Log a finished run"</h3>
            <div class="field" class:invalid=move || lot_error().is_some()>
                <label for="run-lot"><span class="label">"Lot number"</span></label>
                <input id="run-lot" type="text" autocomplete="off" aria-describedby="run-lot-error"
                    prop:value=move || t.lot.get()
                    on:input=move |ev| { typed_lot.set(true); t.lot.set(event_target_value(&ev)); } />
                <p class="error" id="run-lot-error" aria-live="polite">{lot_error}</p>
            </div>
            <Field id="run-date" label="Date" unit=String::new() value=t.date errors=errors numeric=false />
            <div class="field">
                <label for="run-crop"><span class="label">"Crop"</span></label>
                <select id="run-crop" on:change=move |ev| {
                    let v = event_target_value(&ev);
                    let crop = (!v.is_empty()).then_some(v);
                    t.part.set(log::plant_part(crop.as_deref()));
                    t.crop.set(crop);
                }>
                    <option value="" selected=move || t.crop.with(|c| c.is_none())>"No preset"</option>
                    {CROPS.iter().map(|c| view! {
                        <option value=c.id selected=move || t.crop.with(|x| x.as_deref() == Some(c.id))>{c.name}</option>
                    }).collect_view()}
                </select>
            </div>
            <Field id="run-part" label="Plant part" unit=String::new() value=t.part errors=errors numeric=false />
            <Field id="run-mass" label="Charge loaded (weighed)" unit=Signal::derive(move || mass_unit(u.get()).label.to_string())
                value=t.mass errors=errors placeholder=Signal::derive(mass_placeholder) />
            <Field id="run-minutes" label="Distilled after the first drop" unit="min".to_string() value=t.minutes errors=errors />
            <Field id="run-oil" label="Oil collected" unit=Signal::derive(move || oil_unit(u.get()).label.to_string()) value=t.oil errors=errors />
            <Field id="run-hydrosol" label="Hydrosol kept" unit=Signal::derive(move || hydrosol_unit(u.get()).label.to_string()) value=t.hydrosol errors=errors />
            <Field id="run-fuel" label="Fuel used" unit=Signal::derive(fuel_label) value=t.fuel errors=errors />
            <fieldset class="earlier">
                <legend>"Oil at an earlier time of this run (optional: gives your crop's recovery rate)"</legend>
                <Field id="run-early-min" label="After the first drop" unit="min".to_string() value=t.early_min errors=errors />
                <Field id="run-early-oil" label="Oil by then" unit=Signal::derive(move || oil_unit(u.get()).label.to_string()) value=t.early_oil errors=errors />
            </fieldset>
            <Field id="run-note" label="Notes" unit=String::new() value=t.note errors=errors numeric=false />
            <details class="lot-pattern">
                <summary>"Lot numbers"</summary>
                <div class="field">
                    <label for="run-lot-pattern"><span class="label">"Pattern for new lots"</span></label>
                    <input id="run-lot-pattern" type="text" autocomplete="off" placeholder=log::DEFAULT_LOT_PATTERN
                        prop:value=move || runs.lot_pattern.get()
                        on:change=move |ev| {
                            let p: String = event_target_value(&ev).chars().take(log::MAX_LOT_CHARS).collect();
                            runs.lot_pattern.set(p);
                        } />
                    <p class="hint">"{CROP} is the crop's code, {YEAR} the year, {N} the running number (added at the end if left out)."</p>
                </div>
            </details>
            <button type="button" id="run-log" on:click=log_it>"Log this run"</button>
            <p class="hint" role="status" data-out="run_logged">{move || logged.get()}</p>
        </div>
    }
}
