//! The first-still form: what will be distilled, where, with what heat and water, and what to
//! hold to. Each field shows its own message beside it: a text that cannot be read, or the
//! core's verdict on its value.

use super::FirstStillState;
use super::request::{HarvestMode, SupplyMode, error_words, shown_on, si_value, size_field, start_note};
use crate::components::inputs::ReadingNote;
use leptos::prelude::*;
use stillroom_core::crops::CROPS;
use stillroom_core::heat::Fuel;
use stillroom_core::scenario::CondenserKind;
use stillroom_core::sizing::TubeStandard;

/// The message beside a field or picker (by key): its own text first, then the core's verdict.
fn message(fs: &FirstStillState, key: &str) -> Option<String> {
    let problem = fs
        .request
        .with(|r| r.as_ref().err().and_then(|ps| ps.iter().find(|(k, _)| *k == key).map(|(_, p)| p.words())));
    if let Some(words) = problem {
        return Some(words.to_string());
    }
    fs.choices.with(|c| {
        fs.design.with(|d| {
            let errors = d.as_ref()?.as_ref().err()?;
            let e = errors.errors.iter().find(|e| shown_on(&e.field, c) == Some(key))?;
            let f = Some(size_field(key)).filter(|f| f.key == key && f.path == e.field);
            let system = fs.units.get();
            let si = f.and_then(|f| si_value(f, &fs.text(key).get_untracked(), system).ok().flatten());
            Some(error_words(f, e, &errors.figures, si, system))
        })
    })
}

/// One number field with its label, unit, hint and message.
#[component]
fn SizeInput(key: &'static str) -> impl IntoView {
    let fs = expect_context::<FirstStillState>();
    let f = size_field(key);
    let text = fs.text(key);
    let units = fs.units;
    let msg_fs = fs.clone();
    let message = Memo::new(move |_| message(&msg_fs, key));
    let id = format!("fs-{key}");
    let err_id = format!("fs-e-{key}");
    let placeholder = match (f.optional, key) {
        (true, "days") => "one day",
        (true, _) => "no limit",
        _ => "",
    };
    view! {
        <div class="field" class:invalid=move || message.get().is_some()>
            <label for=id.clone()>
                <span class="label">{f.label}</span>
                <span class="unit">{move || f.unit_in(units.get())}</span>
            </label>
            <input id=id.clone() name=id type="text" inputmode="decimal" autocomplete="off"
                placeholder=placeholder
                aria-describedby=format!("{err_id} fs-n-{key}")
                aria-invalid=move || if message.get().is_some() { "true" } else { "false" }
                prop:value=move || text.get()
                on:input=move |ev| text.set(event_target_value(&ev)) />
            <p class="error" id=err_id aria-live="polite">{move || message.get()}</p>
            <ReadingNote text=text id=format!("fs-n-{key}") />
            <p class="hint">{f.hint}</p>
        </div>
    }
}

/// The message slot under a picker or a set of radio buttons.
#[component]
fn ChoiceMessage(key: &'static str) -> impl IntoView {
    let fs = expect_context::<FirstStillState>();
    let message = Memo::new(move |_| message(&fs, key));
    view! { <p class="error" id=format!("fs-e-{key}") aria-live="polite">{move || message.get()}</p> }
}

/// Large radio buttons over a fixed set of choices: `chosen` is the index of the one checked.
/// One non-generic component for every set of choices keeps the page's code small.
#[component]
fn Radios(
    legend: &'static str,
    name: &'static str,
    options: &'static [(&'static str, &'static str)],
    chosen: Signal<usize>,
    choose: Callback<usize>,
) -> impl IntoView {
    view! {
        <fieldset class="choices">
            <legend>{legend}</legend>
            {options.iter().enumerate().map(|(i, (id, label))| view! {
                <label class="choice" for=*id>
                    <input type="radio" name=name id=*id
                        prop:checked=move || chosen.get() == i
                        on:change=move |_| choose.run(i) />
                    <span>{*label}</span>
                </label>
            }).collect_view()}
        </fieldset>
    }
}

/// A set of radio buttons bound to one signal: `values[i]` goes with `options[i]`.
fn radios<T>(
    legend: &'static str,
    name: &'static str,
    value: RwSignal<T>,
    values: &'static [T],
    options: &'static [(&'static str, &'static str)],
) -> impl IntoView
where
    T: Copy + PartialEq + Send + Sync + 'static,
{
    let chosen = Signal::derive(move || values.iter().position(|v| *v == value.get()).unwrap_or(0));
    let choose = Callback::new(move |i: usize| value.set(values[i]));
    view! { <Radios legend=legend name=name options=options chosen=chosen choose=choose /> }
}

/// Each set of choices: the values, then (element id, label) in the same order.
const HARVEST_VALUES: &[HarvestMode] = &[HarvestMode::PerDay, HarvestMode::PerSeason];
const HARVESTS: &[(&str, &str)] =
    &[("fs-per-day", "The same cut each day"), ("fs-per-season", "A season's harvest in all")];
const SUPPLY_VALUES: &[SupplyMode] = &[SupplyMode::Current, SupplyMode::Power];
const SUPPLIES: &[(&str, &str)] =
    &[("fs-by-current", "A circuit's current and voltage"), ("fs-by-power", "A power limit")];
const PHASE_VALUES: &[u8] = &[1, 3];
const PHASES: &[(&str, &str)] = &[("fs-phase-1", "One phase"), ("fs-phase-3", "Three phases")];
const CONDENSER_VALUES: &[CondenserKind] = &[CondenserKind::CoilInTub, CondenserKind::TubeInTube];
const CONDENSERS: &[(&str, &str)] =
    &[("fs-tub", "Coil in a tub of water"), ("fs-jacket", "Tube in a water jacket, fed")];
const TUBE_VALUES: &[TubeStandard] = &[TubeStandard::Metric, TubeStandard::Us];
const TUBES: &[(&str, &str)] = &[("fs-metric", "Metric (mm)"), ("fs-us", "US (inch)")];

const FUELS: &[(Fuel, &str, &str)] = &[
    (Fuel::Propane, "propane", "Propane (bottled gas)"),
    (Fuel::NaturalGas, "natural_gas", "Natural gas"),
    (Fuel::Firewood, "firewood", "Firewood"),
    (Fuel::Electricity, "electricity", "Electricity"),
];

/// Picks the crop from the library.
#[component]
fn CropChoice() -> impl IntoView {
    let fs = expect_context::<FirstStillState>();
    let crop = fs.crop;
    let material = move || {
        CROPS.iter().find(|c| c.id == crop.get()).map(|c| format!("{}.", c.material.trim_end_matches('.')))
    };
    view! {
        <div class="field">
            <label for="fs-crop"><span class="label">"Crop"</span></label>
            <select id="fs-crop" on:change=move |ev| crop.set(event_target_value(&ev))>
                {CROPS.iter().map(|c| {
                    let id = c.id;
                    view! { <option value=id selected=move || crop.get() == id>{c.name}</option> }
                }).collect_view()}
            </select>
            <ChoiceMessage key="crop" />
            <p class="hint">{material}" Its packing and steam rate set the still's size."</p>
        </div>
    }
}

/// Picks the heat source.
#[component]
fn FuelChoice() -> impl IntoView {
    let fuel = expect_context::<FirstStillState>().fuel;
    view! {
        <div class="field">
            <label for="fs-fuel"><span class="label">"Heat source"</span></label>
            <select id="fs-fuel" on:change=move |ev| {
                let v = event_target_value(&ev);
                if let Some((f, _, _)) = FUELS.iter().find(|(_, k, _)| *k == v) { fuel.set(*f); }
            }>
                {FUELS.iter().map(|(f, k, text)| {
                    let f = *f;
                    view! { <option value=*k selected=move || fuel.get() == f>{*text}</option> }
                }).collect_view()}
            </select>
            <ChoiceMessage key="fuel" />
        </div>
    }
}

/// The whole form, in four parts. Fields the choices do not use are hidden, not removed, so
/// what was typed in them stays.
#[component]
pub fn FirstStillForm() -> impl IntoView {
    let fs = expect_context::<FirstStillState>();
    let (harvest, fuel, supply) = (fs.harvest, fs.fuel, fs.supply);
    let electric = move || fuel.get() == Fuel::Electricity;
    let per_day = move || harvest.get() == HarvestMode::PerDay;
    let by_current = move || supply.get() == SupplyMode::Current;
    let units = fs.units;
    view! {
        <section class="inputs" aria-labelledby="h-fs-crop">
            <h2 id="h-fs-crop">"What you will distil"</h2>
            <p class="hint" id="fs-start-note">{move || start_note(units.get())}</p>
            <CropChoice />
            {radios("Harvest given as", "fs-harvest", harvest, HARVEST_VALUES, HARVESTS)}
            <div hidden=move || !per_day()>
                <SizeInput key="kg_per_day" />
                <SizeInput key="days" />
            </div>
            <div hidden=per_day>
                <SizeInput key="kg_per_season" />
                <SizeInput key="season_days" />
            </div>
        </section>
        <section class="inputs" aria-labelledby="h-fs-heat">
            <h2 id="h-fs-heat">"Where, and with what heat"</h2>
            <SizeInput key="altitude" />
            <FuelChoice />
            <div hidden=electric>
                <SizeInput key="max_heat" />
            </div>
            <div hidden=move || !electric()>
                {radios("The supply's limit", "fs-supply", supply, SUPPLY_VALUES, SUPPLIES)}
                <div hidden=move || !by_current()>
                    <SizeInput key="current" />
                    <SizeInput key="voltage" />
                    {radios("Phases", "fs-phases", fs.phases, PHASE_VALUES, PHASES)}
                    <ChoiceMessage key="phases" />
                </div>
                <div hidden=by_current>
                    <SizeInput key="max_power" />
                </div>
            </div>
        </section>
        <section class="inputs" aria-labelledby="h-fs-cooling">
            <h2 id="h-fs-cooling">"Cooling water"</h2>
            <SizeInput key="inlet" />
            <SizeInput key="max_flow" />
            {radios("Condenser", "fs-condenser", fs.condenser, CONDENSER_VALUES, CONDENSERS)}
            {radios("Copper tube sold as", "fs-tubes", fs.tubes, TUBE_VALUES, TUBES)}
        </section>
        <section class="inputs" aria-labelledby="h-fs-limits">
            <h2 id="h-fs-limits">"What to hold to"</h2>
            <SizeInput key="charges" />
            <SizeInput key="longest_run" />
            <SizeInput key="max_water" />
            <SizeInput key="working_day" />
            <SizeInput key="warmest" />
        </section>
    }
}
