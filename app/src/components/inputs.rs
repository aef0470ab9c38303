//! The form: small components, one concern each. They read and write the state's signals and
//! never compute physics.

use crate::fields::{FieldUnits, NumField, TextError, field, read_number};
use crate::state::{AppState, CROP_OIL, MIXTURE_OIL, MixRow, PressureMode};
use crate::units;
use crate::units::UnitSystem;
use leptos::prelude::*;
use stillroom_core::compounds::COMPOUNDS;
use stillroom_core::crops::CROPS;
use stillroom_core::heat::{Appliance, Fuel, Metal};
use stillroom_core::scenario::CondenserKind;
use stillroom_core::scenario::limits::MAX_MIXTURE_PARTS;

/// The message shown beside a field: its own text first, then the core's verdict on its value,
/// its limits restated in the field's own unit and precision.
fn field_message(f: &NumField, state: &AppState) -> Option<String> {
    // Without a fault there is no message. Asked first, so while the form is sound (most
    // keystrokes) this memo follows `stale` alone, which does not change, and is not worked out
    // again on every plan; nor does every field subscribe to the scenario and the plan.
    if !state.stale.get() {
        return None;
    }
    // Read through `with`: the plan is large and every field asks on every keystroke.
    let text_error =
        state.scenario.with(|d| d.text_errors.iter().find(|(k, _)| k == f.key).map(|(_, e)| e.clone()));
    if let Some(e) = text_error {
        return Some(match e {
            TextError::Empty => "Enter a value.".to_string(),
            TextError::NotANumber => "Enter a number, such as 12.5.".to_string(),
        });
    }
    let units = state.field_units();
    let value = state.scenario.with(|d| (f.get)(&d.scenario));
    state.plan.with(|plan| {
        let e = plan.as_ref().err()?.errors.iter().find(|e| e.field == f.path)?;
        Some(limit_message(f, units, e, value))
    })
}

/// "Must be at least 5 %." from a core error: the bound the value crossed, in the field's unit,
/// rounded inwards so a value typed as shown is valid.
pub fn limit_message(
    f: &NumField,
    units: FieldUnits,
    e: &stillroom_core::scenario::FieldError,
    value_si: Option<f64>,
) -> String {
    let unit = f.unit_in(units);
    let with_unit = |v: String| if unit.is_empty() { v } else { format!("{v}\u{a0}{unit}") };
    // Converted ends, low first (a conversion may turn the order round, as 1/x would).
    let ends = |min: f64, max: f64| {
        let (a, b) = (f.from_si_in(units, min), f.from_si_in(units, max));
        (a.min(b), a.max(b))
    };
    let plain_message = || {
        let m = first_upper(e.message.trim());
        let m = m.trim_end_matches(['.', ' ']).to_string();
        m + "."
    };
    // Zero means zero in this unit (not so for °F): "more than zero" reads true.
    let zero_is_zero = f.from_si_in(units, 0.0).abs() < 1e-12;
    // The core's own words, when they say more than the bound ("too warm to cool …").
    let reason = if e.message.starts_with("must be") { String::new() } else { plain_message() + " " };
    match (e.min, e.max, value_si) {
        (Some(min), Some(max), Some(v)) if v <= 0.0 && min > 0.0 && zero_is_zero => format!(
            "{reason}Must be more than zero: at least {}.",
            with_unit(units::limit(ends(min, max).0, true))
        ),
        (Some(min), Some(max), Some(v)) if v < min => {
            format!("{reason}Must be at least {}.", with_unit(units::limit(ends(min, max).0, true)))
        }
        (Some(min), Some(max), Some(v)) if v > max => {
            format!("{reason}Must be at most {}.", with_unit(units::limit(ends(min, max).1, false)))
        }
        (Some(min), Some(max), _) => {
            let (lo, hi) = ends(min, max);
            format!(
                "{} Valid: {} to {}.",
                plain_message(),
                units::limit(lo, true),
                with_unit(units::limit(hi, false))
            )
        }
        _ => plain_message(),
    }
}

/// The message with its first letter capitalised. ASCII only: a message that opens with a
/// compound's name keeps its Greek prefix as chemists write it ("β-pinene", never "Β-pinene"),
/// and the page carries no Unicode case tables for this one use.
fn first_upper(s: &str) -> String {
    let mut text = s.to_string();
    if let Some(first) = text.get_mut(..1) {
        first.make_ascii_uppercase();
    }
    text
}

/// What an optional field falls back to, shown as its placeholder (in the field's unit).
fn fallback(f: &NumField, state: &AppState) -> String {
    let crop = state.crop.get().and_then(|id| CROPS.iter().find(|c| c.id == id));
    let shown_in = state.field_units();
    let shown = |si: f64, whose: &str| format!("{} ({whose})", units::plain(f.from_si_in(shown_in, si)));
    match (f.key, crop) {
        ("oil_content", Some(c)) => shown(c.oil_content_percent.typical, "crop"),
        ("oil_density", Some(c)) => shown(c.oil_density_kg_per_m3, "crop"),
        ("rate_constant", Some(c)) => shown(c.rate_constant_per_min.typical, "crop"),
        ("distillate_out", Some(c)) => shown(c.distillate_temperature_c, "crop"),
        ("efficiency", _) => shown(
            state.appliance.get().unwrap_or(state.fuel.get().usual_appliance()).data().typical_efficiency,
            "typical",
        ),
        ("still_volume", _) => "from the charge".to_string(),
        _ => String::new(),
    }
}

/// Opens the folded section holding an element, so a field with a fault is never hidden.
pub fn open_section_of(el: &web_sys::Element) {
    if let Ok(Some(d)) = el.closest("details") {
        let _ = d.set_attribute("open", "");
    }
}

/// One number field with its label, unit, hint, how its text was read, and its error message.
#[component]
pub fn NumberInput(key: &'static str) -> impl IntoView {
    let state = expect_context::<AppState>();
    let f = field(key);
    let text = state.text(key);
    let msg_state = state.clone();
    let message = Memo::new(move |_| field_message(f, &msg_state));
    let ph_state = state.clone();
    let placeholder = move || fallback(f, &ph_state);
    let (units_signal, fuel) = (state.units, state.fuel);
    let units_now = move || FieldUnits::new(units_signal.get(), fuel.get());
    let scenario = state.scenario;
    // Prices carry the scenario's currency; a fuel's price is per the unit the fuel is sold by
    // in the units shown (`NumField::unit_in`).
    let unit = move || {
        let currency = || scenario.with(|d| d.scenario.costs.currency.clone());
        match key {
            "fuel_price" | "plant_value" | "labour" => format!("{} {}", currency(), f.unit_in(units_now())),
            _ => f.unit_in(units_now()).to_string(),
        }
    };
    // "read as 1500" for a reading that could be meant another way; the weather-report field
    // also says which unit its number was taken in.
    let reading = move || {
        let r = read_number(&text.get()).ok().flatten()?;
        let mut note = r.note;
        if key == "sea_level_pressure" {
            let taken = if r.value.abs() < 100.0 { "inHg" } else { "hPa" };
            if taken != f.unit_in(units_now()) {
                note =
                    Some(format!("{} read as {} {taken}", note.unwrap_or_default(), units::plain(r.value)));
            }
        }
        note.map(|n| n.trim().to_string())
    };
    let id = format!("f-{key}");
    let err_id = format!("e-{key}");
    let note_id = format!("n-{key}");
    let node = NodeRef::<leptos::html::Div>::new();
    Effect::new(move |_| {
        if message.get().is_some()
            && let Some(el) = node.get()
        {
            open_section_of(&el);
        }
    });
    view! {
        <div class="field" class:invalid=move || message.get().is_some() node_ref=node>
            <label for=id.clone()>
                <span class="label">{f.label}</span>
                <span class="unit">{unit}</span>
            </label>
            <input
                id=id
                name=key
                type="text"
                inputmode="decimal"
                autocomplete="off"
                placeholder=placeholder
                aria-describedby=format!("{err_id} {note_id}")
                aria-invalid=move || if message.get().is_some() { "true" } else { "false" }
                prop:value=move || text.get()
                on:input=move |ev| text.set(event_target_value(&ev))
            />
            <p class="error" id=err_id aria-live="polite">{move || message.get()}</p>
            <p class="reading" id=note_id aria-live="polite">{reading}</p>
            <p class="hint">{f.hint}</p>
        </div>
    }
}

/// How a typed number was read, where it could be meant another way ("read as 1500"): shown
/// beside every number typed outside the main form's fields (which add their own unit notes).
#[component]
pub fn ReadingNote(#[prop(into)] text: Signal<String>, id: String) -> impl IntoView {
    let note =
        move || read_number(&text.get()).ok().flatten().and_then(|r| r.note).map(|n| n.trim().to_string());
    view! { <p class="reading" id=id aria-live="polite">{note}</p> }
}

/// Picks the crop preset.
#[component]
pub fn CropPicker() -> impl IntoView {
    let state = expect_context::<AppState>();
    let crop = state.crop;
    view! {
        <div class="field">
            <label for="f-crop"><span class="label">"Crop"</span></label>
            <select id="f-crop" on:change=move |ev| {
                let v = event_target_value(&ev);
                crop.set(if v.is_empty() { None } else { Some(v) });
            }>
                <option value="" selected=move || crop.get().is_none()>"No preset"</option>
                {CROPS.iter().map(|c| {
                    let id = c.id;
                    view! { <option value=id selected=move || crop.get().as_deref() == Some(id)>{c.name}</option> }
                }).collect_view()}
            </select>
            <p class="hint">{move || crop.get().and_then(|id| CROPS.iter().find(|c| c.id == id)).map(|c| c.material)}</p>
            <CropSources />
        </div>
    }
}

/// Where the crop preset's numbers come from, row by row: the texts are fetched from the build's
/// `sources.json` (`crate::sources`) the first time the list is opened, and again on "Try again"
/// after a failure. One view with parts hidden, not swapped subtrees (0.3 kB smaller, measured),
/// and signals of types the page already has.
#[component]
fn CropSources() -> impl IntoView {
    let state = expect_context::<AppState>();
    let crop = state.crop;
    let preset = move || crop.get().and_then(|id| CROPS.iter().find(|c| c.id == id));
    // The file's text once fetched; the line under the summary (loading, or why it failed).
    let file = RwSignal::new(None::<String>);
    let status = RwSignal::new(None::<String>);
    let failed = RwSignal::new(false);
    let load = move || {
        status.set(Some("Loading the sources…".to_string()));
        failed.set(false);
        leptos::task::spawn_local(async move {
            match crate::sources::fetch().await {
                Ok(text) => {
                    file.set(Some(text));
                    status.set(None);
                }
                Err(why) => {
                    status.set(Some(why));
                    failed.set(true);
                }
            }
        });
    };
    let on_toggle = move |ev: leptos::ev::Event| {
        let open = event_target::<web_sys::HtmlDetailsElement>(&ev).open();
        // Not fetched yet, and not on its way (idle, or failed and waiting for another try).
        let idle = status.with_untracked(Option::is_none) || failed.get_untracked();
        if open && file.with_untracked(Option::is_none) && idle {
            load();
        }
    };
    let rows = move || {
        let c = preset()?;
        file.with(|f| f.as_deref().map(|text| crate::sources::rows(text, c)))
    };
    view! {
        <Show when=move || preset().is_some()>
            <details class="sources" on:toggle=on_toggle>
                <summary>"Where the crop's numbers come from"</summary>
                <p class="sources-status" role="status" hidden=move || status.with(Option::is_none)>{move || status.get()}</p>
                <button type="button" class="sources-retry" hidden=move || !failed.get() on:click=move |_| load()>"Try again"</button>
                <dl class="source-list">
                    {move || rows().into_iter().flatten().map(|(label, text)| view! { <dt>{label}</dt><dd>{text}</dd> }).collect_view()}
                </dl>
            </details>
        </Show>
    }
}

/// The compounds a picker offers: the library's, then the grower's own if named.
fn compound_options(state: &AppState) -> Vec<(String, String)> {
    let mut list: Vec<(String, String)> =
        COMPOUNDS.iter().map(|c| (c.id.to_string(), c.name.to_string())).collect();
    let own = state.own_name.get();
    if !own.trim().is_empty() {
        list.push((state.own_id(), format!("{} (yours)", own.trim())));
    }
    list
}

/// Picks the oil: the crop's typical composition, the grower's own analysis, or one compound.
#[component]
pub fn OilPicker() -> impl IntoView {
    let state = expect_context::<AppState>();
    let choice = state.oil_choice;
    let msg_state = state.clone();
    let message = Memo::new(move |_| {
        // `stale` first: while the form is sound this follows it alone, not every plan.
        if !msg_state.stale.get() {
            return None;
        }
        msg_state.plan.with(|plan| {
            plan.as_ref()
                .err()?
                .errors
                .iter()
                .find(|e| e.field == "oil.composition")
                .map(|e| first_upper(&e.message) + ".")
        })
    });
    let opt_state = state.clone();
    view! {
        <div class="field" class:invalid=move || message.get().is_some()>
            <label for="f-oil"><span class="label">"Oil"</span></label>
            <select id="f-oil" on:change=move |ev| choice.set(event_target_value(&ev))>
                <option value=CROP_OIL selected=move || choice.get() == CROP_OIL>"The crop's typical oil"</option>
                <option value=MIXTURE_OIL selected=move || choice.get() == MIXTURE_OIL>"My own analysis (by mass)"</option>
                {move || compound_options(&opt_state).into_iter().map(|(id, name)| {
                    let selected_id = id.clone();
                    view! { <option value=id selected=move || choice.get() == selected_id>{name}</option> }
                }).collect_view()}
            </select>
            <p class="error" id="e-oil" aria-live="polite">{move || message.get()}</p>
            <p class="hint">"The crop's typical mix of main compounds, your lab report, or one compound."</p>
        </div>
        <Show when=move || choice.get() == MIXTURE_OIL>
            <MixtureEditor />
        </Show>
    }
}

/// The message beside one line of the oil analysis.
fn row_message(index: usize, state: &AppState) -> Option<String> {
    // As for a field: no fault, no message (and no subscription to the scenario or the plan).
    if !state.stale.get() {
        return None;
    }
    let key = format!("mix-{index}");
    let text_error =
        state.scenario.with(|d| d.text_errors.iter().find(|(k, _)| *k == key).map(|(_, e)| e.clone()));
    if let Some(e) = text_error {
        return Some(match e {
            TextError::Empty => "Enter the share.".to_string(),
            TextError::NotANumber => "Enter a number, such as 35.".to_string(),
        });
    }
    let prefix = format!("oil.composition.parts.{index}.");
    state.plan.with(|plan| {
        plan.as_ref()
            .err()?
            .errors
            .iter()
            .find(|e| e.field.starts_with(&prefix))
            .map(|e| first_upper(&e.message) + ".")
    })
}

/// One line of the analysis: a compound and its share by mass. `index` is the line's place in the
/// list, kept by the list itself (no line searches the others for its place).
#[component]
fn MixLine(row: MixRow, index: ReadSignal<usize>) -> impl IntoView {
    let state = expect_context::<AppState>();
    let msg_state = state.clone();
    let message = Memo::new(move |_| row_message(index.get(), &msg_state));
    let opt_state = state.clone();
    let remove_state = state.clone();
    let id = format!("mix-compound-{}", row.key);
    let pid = format!("mix-percent-{}", row.key);
    view! {
        <li class="mix-line" class:invalid=move || message.get().is_some()>
            <select id=id aria-label="Compound" on:change=move |ev| row.compound.set(event_target_value(&ev))>
                {move || compound_options(&opt_state).into_iter().map(|(cid, name)| {
                    let sel = cid.clone();
                    view! { <option value=cid selected=move || row.compound.get() == sel>{name}</option> }
                }).collect_view()}
            </select>
            <input id=pid.clone() type="text" inputmode="decimal" aria-label="Share by mass, %" placeholder="%"
                aria-describedby=format!("{pid}-reading")
                prop:value=move || row.percent.get()
                on:input=move |ev| row.percent.set(event_target_value(&ev)) />
            <button type="button" class="quiet" aria-label="Remove this compound"
                on:click=move |_| remove_state.remove_mix_row(row.key)>"✕"</button>
            <p class="error" aria-live="polite">{move || message.get()}</p>
            <ReadingNote text=row.percent id=format!("{pid}-reading") />
        </li>
    }
}

/// Said when the analysis has as many lines as the core plans.
const MIX_FULL: &str = "At most 64 compounds: list the main ones.";
// The text above says the core's limit.
const _: () = assert!(MAX_MIXTURE_PARTS == 64);

/// The grower's own oil analysis: compounds and their shares by mass.
#[component]
pub fn MixtureEditor() -> impl IntoView {
    let state = expect_context::<AppState>();
    let rows = state.mixture;
    let add_state = state.clone();
    view! {
        <div class="mixture">
            <p class="hint">"Shares by mass from your analysis. They are scaled to 100 %; list the main compounds."</p>
            <ul class="mix-lines">
                <ForEnumerate each=move || rows.get() key=|r| r.key children=move |index, row| view! { <MixLine row=row index=index /> } />
            </ul>
            <button type="button" id="mix-add" on:click=move |_| add_state.add_mix_row(COMPOUNDS[0].id)>"Add a compound"</button>
            // Shown in place of the button once the list is full (style.css).
            <p class="hint" id="mix-full">{MIX_FULL}</p>
        </div>
    }
}

/// A compound of the grower's own, from two measured vapour pressures.
#[component]
pub fn OwnCompound() -> impl IntoView {
    let state = expect_context::<AppState>();
    let name = state.own_name;
    view! {
        <details class="own-compound">
            <summary>"Add your own compound"</summary>
            <div class="field">
                <label for="f-own_name"><span class="label">"Name"</span></label>
                <input id="f-own_name" type="text" autocomplete="off" placeholder="e.g. sclareol"
                    prop:value=move || name.get()
                    on:input=move |ev| name.set(event_target_value(&ev)) />
                <p class="hint">"Named, it joins the oil lists. Two measured points give its vapour pressure (ln p against 1/T)."</p>
            </div>
            <Show when=move || !name.get().trim().is_empty()>
                <NumberInput key="own_molar_mass" />
                <NumberInput key="own_density" />
                <NumberInput key="own_solubility" />
                <NumberInput key="own_t1" />
                <NumberInput key="own_p1" />
                <NumberInput key="own_t2" />
                <NumberInput key="own_p2" />
            </Show>
        </details>
    }
}

/// Chooses how the site's pressure is known, with the matching field.
#[component]
pub fn PressureInputs() -> impl IntoView {
    let state = expect_context::<AppState>();
    let mode = state.pressure_mode;
    view! {
        <RadioChoices legend="Air pressure from" name="pressure-mode" value=mode options=PRESSURE_MODES />
        <NumberInput key="altitude" />
        <Show when=move || mode.get() == PressureMode::Station>
            <NumberInput key="station_pressure" />
        </Show>
        <Show when=move || mode.get() == PressureMode::SeaLevel>
            <NumberInput key="sea_level_pressure" />
        </Show>
    }
}

/// The heat sources the page offers: (value, option key, label).
pub const FUELS: &[(Fuel, &str, &str)] = &[
    (Fuel::Propane, "propane", "Propane (bottled gas)"),
    (Fuel::NaturalGas, "natural_gas", "Natural gas"),
    (Fuel::Firewood, "firewood", "Firewood"),
    (Fuel::Electricity, "electricity", "Electricity"),
];

/// The still metals the page offers.
pub const METALS: &[(Metal, &str, &str)] = &[
    (Metal::Copper, "copper", "Copper"),
    (Metal::StainlessSteel, "stainless", "Stainless steel"),
    (Metal::CarbonSteel, "carbon", "Carbon steel"),
    (Metal::Aluminium, "aluminium", "Aluminium"),
];

/// A drop-down list over a fixed set of choices, bound to one signal.
#[component]
fn ChoicePicker<T>(
    id: &'static str,
    label: &'static str,
    value: RwSignal<T>,
    options: &'static [(T, &'static str, &'static str)],
) -> impl IntoView
where
    T: Copy + PartialEq + Send + Sync + 'static,
{
    view! {
        <div class="field">
            <label for=id><span class="label">{label}</span></label>
            <select id=id on:change=move |ev| {
                let v = event_target_value(&ev);
                if let Some((choice, _, _)) = options.iter().find(|(_, k, _)| *k == v) { value.set(*choice); }
            }>
                {options.iter().map(|(choice, k, text)| {
                    let choice = *choice;
                    view! { <option value=*k selected=move || value.get() == choice>{*text}</option> }
                }).collect_view()}
            </select>
        </div>
    }
}

/// Picks the fuel.
#[component]
pub fn FuelPicker() -> impl IntoView {
    let fuel = expect_context::<AppState>().fuel;
    view! { <ChoicePicker id="f-fuel" label="Heat source" value=fuel options=FUELS /> }
}

/// What the fuel fires: the efficiency belongs to it, not to the fuel.
const APPLIANCES: &[(Option<Appliance>, &str, &str)] = &[
    (None, "usual", "The usual one for this fuel"),
    (Some(Appliance::OpenBurner), "open_burner", "Gas burner under the boiler"),
    (Some(Appliance::JacketedBoiler), "jacketed_boiler", "Boiler with its own firebox and flue"),
    (Some(Appliance::ImmersionElement), "immersion_element", "Electric element in the water"),
    (Some(Appliance::WoodFirebox), "wood_firebox", "Wood fire in a box under the boiler"),
];

/// The message the plan gives on one field that has no number box, if any.
fn choice_error(state: &AppState, path: &'static str) -> Signal<String> {
    let (plan, stale) = (state.plan, state.stale);
    // `stale` first: while the form is sound this follows it alone, not every plan.
    Signal::derive(move || {
        if !stale.get() {
            return String::new();
        }
        plan.with(|r| {
            r.as_ref()
                .err()
                .and_then(|e| e.errors.iter().find(|e| e.field == path))
                .map(|e| e.message.clone())
        })
        .unwrap_or_default()
    })
}

/// Picks the appliance the fuel fires.
#[component]
pub fn AppliancePicker() -> impl IntoView {
    let state = expect_context::<AppState>();
    let message = choice_error(&state, "boiler.appliance");
    view! {
        <ChoicePicker id="f-appliance" label="Fired in" value=state.appliance options=APPLIANCES />
        <p class="error" id="e-appliance" aria-live="polite">{move || message.get()}</p>
        <p class="hint">"Sets how much of the fuel's heat reaches the water; gas burners lose some at altitude."</p>
    }
}

/// A yes/no setting as a large checkbox with its label and hint.
#[component]
fn Toggle(
    id: &'static str,
    label: &'static str,
    hint: &'static str,
    value: RwSignal<bool>,
    #[prop(optional)] error_path: Option<&'static str>,
) -> impl IntoView {
    let state = expect_context::<AppState>();
    let message = choice_error(&state, error_path.unwrap_or(""));
    view! {
        <div class="field toggle">
            <label for=id>
                <input type="checkbox" id=id prop:checked=move || value.get()
                    on:change=move |ev| value.set(event_target_checked(&ev)) />
                <span class="label">{label}</span>
            </label>
            <p class="error" aria-live="polite">{move || message.get()}</p>
            <p class="hint">{hint}</p>
        </div>
    }
}

/// Whether the separated water goes back into the boiler.
#[component]
pub fn CohobationToggle() -> impl IntoView {
    let value = expect_context::<AppState>().cohobation;
    view! {
        <Toggle id="f-cohobation" label="Return the separated water to the boiler (cohobation)"
            hint="The oil dissolved in it comes over again; the boiler needs less fresh water." value=value />
    }
}

/// Whether the oil's compounds are taken as a non-ideal mixture.
#[component]
pub fn NonIdealToggle() -> impl IntoView {
    let value = expect_context::<AppState>().non_ideal;
    view! {
        <Toggle id="f-non_ideal" label="Treat the oil as a non-ideal mixture (UNIFAC)"
            hint="Off: Raoult's law, the reference. On: activity coefficients by group contribution; library compounds only."
            value=value error_path="oil.non_ideal" />
    }
}

/// Picks the still's metal.
#[component]
pub fn MetalPicker() -> impl IntoView {
    let metal = expect_context::<AppState>().metal;
    view! { <ChoicePicker id="f-metal" label="Still made of" value=metal options=METALS /> }
}

/// Picks the condenser's build.
#[component]
pub fn CondenserPicker() -> impl IntoView {
    let kind = expect_context::<AppState>().condenser_kind;
    view! { <RadioChoices legend="Condenser" name="condenser" value=kind options=CONDENSERS /> }
}

/// How the site's pressure can be known: (value, element id, label).
const PRESSURE_MODES: &[(PressureMode, &str, &str)] = &[
    (PressureMode::Altitude, "p-altitude", "Altitude (standard air)"),
    (PressureMode::Station, "p-station", "My barometer at the still"),
    (PressureMode::SeaLevel, "p-sea-level", "The weather report"),
];

/// The condenser builds the page offers.
pub const CONDENSERS: &[(CondenserKind, &str, &str)] = &[
    (CondenserKind::CoilInTub, "c-tub", "Coil in a tub of water"),
    (CondenserKind::TubeInTube, "c-jacket", "Tube in a water jacket"),
];

/// Large radio buttons over a fixed set of choices, bound to one signal.
#[component]
fn RadioChoices<T>(
    legend: &'static str,
    name: &'static str,
    value: RwSignal<T>,
    options: &'static [(T, &'static str, &'static str)],
) -> impl IntoView
where
    T: Copy + PartialEq + Send + Sync + 'static,
{
    view! {
        <fieldset class="choices">
            <legend>{legend}</legend>
            {options.iter().map(|(choice, id, label)| {
                let choice = *choice;
                view! {
                    <label class="choice" for=*id>
                        <input type="radio" name=name id=*id
                            prop:checked=move || value.get() == choice
                            on:change=move |_| value.set(choice) />
                        <span>{*label}</span>
                    </label>
                }
            }).collect_view()}
        </fieldset>
    }
}

/// The first things a grower knows: crop, amount, oil, place.
#[component]
pub fn EssentialInputs() -> impl IntoView {
    view! {
        <section class="inputs" aria-labelledby="h-essentials">
            <h2 id="h-essentials">"Your charge and site"</h2>
            <CropPicker />
            <NumberInput key="plant_mass" />
            <NumberInput key="oil_content" />
            <OilPicker />
            <OwnCompound />
            <PressureInputs />
        </section>
    }
}

/// Everything else, folded away until needed.
#[component]
pub fn EquipmentInputs() -> impl IntoView {
    let state = expect_context::<AppState>();
    let kind = state.condenser_kind;
    view! {
        <section class="inputs" aria-labelledby="h-equipment">
            <h2 id="h-equipment">"Your equipment"</h2>
            <details open>
                <summary>"Boiler and heat"</summary>
                <FuelPicker />
                <AppliancePicker />
                <NumberInput key="heat_input" />
                <NumberInput key="efficiency" />
                <NumberInput key="boiler_water" />
                <NumberInput key="steam_rate" />
                <NumberInput key="ambient" />
            </details>
            <details>
                <summary>"Still"</summary>
                <NumberInput key="still_volume" />
                <MetalPicker />
                <NumberInput key="metal_mass" />
                <NumberInput key="wall_u" />
            </details>
            <details>
                <summary>"Condenser and cooling water"</summary>
                <CondenserPicker />
                <NumberInput key="cooling_in" />
                <NumberInput key="cooling_out" />
                <NumberInput key="distillate_out" />
                <Show when=move || kind.get() == CondenserKind::CoilInTub>
                    <NumberInput key="tub_water" />
                </Show>
                <NumberInput key="condensing_u" />
                <NumberInput key="tube_od" />
            </details>
            <details>
                <summary>"Separator"</summary>
                <NumberInput key="droplet" />
                <NumberInput key="residence" />
            </details>
            <details>
                <summary>"Run, season and costs"</summary>
                <NumberInput key="target" />
                <NumberInput key="rate_constant" />
                <CohobationToggle />
                <NonIdealToggle />
                <NumberInput key="harvest" />
                <CurrencyInput />
                <NumberInput key="fuel_price" />
                <NumberInput key="plant_value" />
                <NumberInput key="labour" />
            </details>
        </section>
    }
}

/// Metric or US customary, for the form and the answers; remembered in this browser.
#[component]
pub fn UnitsChoice() -> impl IntoView {
    let state = expect_context::<AppState>();
    let units = state.units;
    let choose = move |to: UnitSystem| {
        let state = state.clone();
        move |_| state.set_units(to)
    };
    view! {
        <div class="units-choice" role="group" aria-label="Units">
            <button type="button" id="units-metric" class:chosen=move || units.get() == UnitSystem::Metric
                aria-pressed=move || (units.get() == UnitSystem::Metric).to_string()
                on:click=choose(UnitSystem::Metric)>"Metric"</button>
            <button type="button" id="units-us" class:chosen=move || units.get() == UnitSystem::UsCustomary
                aria-pressed=move || (units.get() == UnitSystem::UsCustomary).to_string()
                on:click=choose(UnitSystem::UsCustomary)>"US"</button>
        </div>
    }
}

/// Where the page remembers that the grower declined the install hint.
pub const INSTALL_DISMISSED_KEY: &str = "stillroom.install-dismissed";

/// A small, dismissable offer to install the page, shown only where the browser offers it
/// (its `beforeinstallprompt` event) and the grower has not declined it before.
#[component]
pub fn InstallHint() -> impl IntoView {
    use wasm_bindgen::JsCast;
    use wasm_bindgen::closure::Closure;
    let offer = RwSignal::new_local(None::<web_sys::Event>);
    if let Some(w) = web_sys::window() {
        let on_offer = Closure::<dyn FnMut(web_sys::Event)>::new(move |ev: web_sys::Event| {
            ev.prevent_default();
            // Once declined, the hint stays away on later visits too.
            if !matches!(crate::storage::get(INSTALL_DISMISSED_KEY), Ok(Some(_))) {
                offer.set(Some(ev));
            }
        });
        let _ = w.add_event_listener_with_callback("beforeinstallprompt", on_offer.as_ref().unchecked_ref());
        on_offer.forget();
    }
    let install = move |_| {
        if let Some(ev) = offer.get_untracked() {
            // `prompt()` is the event's own method; called by name to need no extra binding.
            if let Ok(f) = js_sys_get(&ev, "prompt") {
                let _ = f.call0(&ev);
            }
        }
        offer.set(None);
    };
    view! {
        <Show when=move || offer.with(|o| o.is_some())>
            <p class="install-hint">
                <span>"Keep it on this device, for offline use"</span>
                <button type="button" on:click=install>"Install"</button>
                <button type="button" class="quiet" aria-label="No thanks" on:click=move |_| {
                    let _ = crate::storage::set(INSTALL_DISMISSED_KEY, "1");
                    offer.set(None);
                }>"✕"</button>
            </p>
        </Show>
    }
}

/// A function property of a JS object, by name.
fn js_sys_get(obj: &web_sys::Event, name: &str) -> Result<web_sys::js_sys::Function, wasm_bindgen::JsValue> {
    use wasm_bindgen::JsCast;
    web_sys::js_sys::Reflect::get(obj, &name.into())?.dyn_into::<web_sys::js_sys::Function>()
}

/// The currency of every price and cost: a label of the grower's choice.
#[component]
pub fn CurrencyInput() -> impl IntoView {
    let state = expect_context::<AppState>();
    let currency = state.currency;
    let (plan, stale) = (state.plan, state.stale);
    let message = Memo::new(move |_| {
        // `stale` first: while the form is sound this follows it alone, not every plan.
        if !stale.get() {
            return None;
        }
        plan.with(|p| {
            p.as_ref()
                .err()?
                .errors
                .iter()
                .find(|e| e.field == "costs.currency")
                .map(|e| first_upper(e.message.trim_end_matches('.')) + ".")
        })
    });
    view! {
        <div class="field" class:invalid=move || message.get().is_some()>
            <label for="f-currency"><span class="label">"Currency"</span></label>
            <input id="f-currency" type="text" autocomplete="off" placeholder="e.g. EUR"
                prop:value=move || currency.get()
                on:input=move |ev| currency.set(event_target_value(&ev)) />
            <p class="error" id="e-currency" aria-live="polite">{move || message.get()}</p>
            <p class="hint">"Shown with every price and cost."</p>
        </div>
    }
}

#[cfg(test)]
mod tests {
    use super::first_upper;
    use wasm_bindgen_test::wasm_bindgen_test;

    #[wasm_bindgen_test]
    fn a_message_opens_with_a_capital_and_a_compound_keeps_its_greek_prefix() {
        assert_eq!(first_upper("must be at least 0.1 kg"), "Must be at least 0.1 kg");
        assert_eq!(first_upper("β-pinene needs a law"), "β-pinene needs a law");
        assert_eq!(first_upper("(E)-anethole"), "(E)-anethole");
        assert_eq!(first_upper(""), "");
    }
}
