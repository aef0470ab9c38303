//! The plan, shown. Every number here comes from the core's plan through [`crate::units`].

use crate::components::plan_rows::{
    CONDENSER_ROWS, HEAT_ROWS, OIL_ROWS, Out, SEASON_ROWS, SEPARATOR_ROWS, STEAM_ROWS,
};
use crate::fields::{FIELDS, field};
use crate::state::{AppState, PressureMode};
use crate::units;
use leptos::prelude::*;
use stillroom_core::crops::CROPS;
use stillroom_core::plan::{Answer, OilLayer, Uncertainty};
use stillroom_core::scenario::Scenario;
use stillroom_core::{Plan, ScenarioErrors};
use wasm_bindgen::JsCast;

type PlanMemo = Memo<Result<Plan, ScenarioErrors>>;

/// A text derived from the plan, in the grower's units, or a dash while no plan was ever made.
fn from_plan(plan: PlanMemo, f: impl Fn(&Plan) -> String + Send + Sync + 'static) -> Signal<String> {
    let system = expect_context::<AppState>().units;
    Signal::derive(move || {
        let system = system.get();
        plan.with(|r| units::with_system(system, || r.as_ref().map(&f).unwrap_or_else(|_| "–".to_string())))
    })
}

/// Rows of a list or table, three texts each, as the view shows them.
pub(crate) type Lines = Vec<(String, String, String)>;

/// A list's rows from the plan, in the grower's units, kept as a memo: a list closure that read
/// the plan itself would rebuild every row and set every attribute again on each keystroke,
/// while most edits (the charge's mass among them) leave the cuts, the composition, the doubts
/// and the warnings as they were. One memo type, and a plain function rather than a closure
/// type, for every list: one copy of its code in the wasm.
pub(crate) fn lines_from(plan: PlanMemo, f: fn(&Plan) -> Lines) -> Memo<Lines> {
    let system = expect_context::<AppState>().units;
    Memo::new(move |_| {
        let system = system.get();
        plan.with(|r| units::with_system(system, || r.as_ref().map(f).unwrap_or_default()))
    })
}

/// "15 kg lavender at 300 m": the charge the answers on screen are for.
fn charge_summary(s: &Scenario) -> String {
    let crop = s
        .charge
        .crop
        .as_deref()
        .and_then(|id| CROPS.iter().find(|c| c.id == id))
        .map(|c| c.name.to_ascii_lowercase())
        .unwrap_or_else(|| "plant".to_string());
    // "15 kg", not "15.0 kg": the charge as the grower typed it, to three figures.
    let mass = units::mass(s.charge.plant_mass_kg);
    let mass = match mass.split_once(' ') {
        Some((n, unit)) if n.contains('.') => {
            format!("{} {unit}", n.trim_end_matches('0').trim_end_matches('.'))
        }
        _ => mass,
    };
    format!("{mass} {crop} at {}", units::altitude(s.site.altitude_m))
}

/// The fields that keep the form from a plan: (label, id of the element to focus).
fn failing_fields(state: &AppState) -> Vec<(String, Option<String>)> {
    let mode = state.pressure_mode.get();
    let mut out: Vec<(String, Option<String>)> = Vec::new();
    let mut add = |label: String, id: Option<String>| {
        if !out.iter().any(|(l, i)| *l == label && *i == id) {
            out.push((label, id));
        }
    };
    let rows = state.mixture.get();
    let text_errors = state.scenario.with(|d| d.text_errors.clone());
    for (key, _) in &text_errors {
        if let Some(i) = key.strip_prefix("mix-").and_then(|i| i.parse::<usize>().ok()) {
            let id = rows.get(i).map(|r| format!("mix-percent-{}", r.key));
            add(format!("Oil analysis, line {}", i + 1), id);
        } else {
            add(field(key).label.to_string(), Some(format!("f-{key}")));
        }
    }
    state.plan.with(|r| {
        for e in r.as_ref().err().map(|e| e.errors.as_slice()).unwrap_or_default() {
            let visible = FIELDS.iter().filter(|f| f.path == e.field).find(|f| match f.key {
                "station_pressure" => mode == PressureMode::Station,
                "sea_level_pressure" => mode == PressureMode::SeaLevel,
                _ => true,
            });
            match visible {
                Some(f) => add(f.label.to_string(), Some(format!("f-{}", f.key))),
                None if e.field.starts_with("oil.composition") => add("Oil".into(), Some("f-oil".into())),
                None => add(e.message.clone(), None),
            }
        }
    });
    out
}

/// Focuses a field by id, opening its folded section first.
fn focus_field(id: &str) {
    let Some(el) = web_sys::window().and_then(|w| w.document()).and_then(|d| d.get_element_by_id(id)) else {
        return;
    };
    crate::components::inputs::open_section_of(&el);
    if let Ok(el) = el.dyn_into::<web_sys::HtmlElement>() {
        let _ = el.focus();
    }
}

/// Names the fields to fix, each a link that takes the grower there.
#[component]
pub fn FixList() -> impl IntoView {
    let state = expect_context::<AppState>();
    let list_state = state.clone();
    let list = move || failing_fields(&list_state);
    view! {
        <ul class="fix-list">
            {move || list().into_iter().map(|(label, id)| match id {
                Some(id) => {
                    let href = format!("#{id}");
                    view! { <li><a href=href on:click=move |ev| { ev.prevent_default(); focus_field(&id); }>{label}</a></li> }.into_any()
                }
                None => view! { <li>{label}</li> }.into_any(),
            }).collect_view()}
        </ul>
    }
}

/// One labelled value; `out` names it for tests and assistive tools.
#[component]
fn Row(label: &'static str, out: &'static str, value: Signal<String>) -> impl IntoView {
    view! {
        <div class="row">
            <dt>{label}</dt>
            <dd data-out=out>{move || value.get()}</dd>
        </div>
    }
}

/// A headline figure in a large card.
#[component]
fn Card(
    label: &'static str,
    out: &'static str,
    value: Signal<String>,
    note: Signal<String>,
) -> impl IntoView {
    view! {
        <div class="card">
            <p class="card-label">{label}</p>
            <p class="card-value" data-out=out>{move || value.get()}</p>
            <p class="card-note">{move || note.get()}</p>
        </div>
    }
}

/// "likely A to B" for a range, in the answer's own format.
fn likely(a: &Answer, show: impl Fn(f64) -> String) -> String {
    format!("likely {} to {}", show(a.low), show(a.high))
}

/// The card's four answers first (steam, water, boiling point, separator), then time, fuel, oil
/// and hydrosol: each with its likely range where the core gives one.
#[component]
pub fn Headline() -> impl IntoView {
    let state = expect_context::<AppState>();
    let plan = state.shown;
    let stale = state.stale;
    let good = state.good;
    let units_signal = state.units;
    let summary = move || {
        let system = units_signal.get();
        good.with(|g| g.as_ref().map(|(s, _)| units::with_system(system, || charge_summary(s))))
    };
    view! {
        <section class="headline" class:stale=move || stale.get() aria-labelledby="h-headline" aria-live="polite">
            <h2 id="h-headline">"The run at a glance"</h2>
            <p class="summary" data-out="charge_summary">{move || summary().map(|s| format!("For {s}"))}</p>
            <Show when=move || stale.get()>
                <div class="notice stale-note" role="alert" data-out="plan_stale">
                    <p>{move || if summary().is_some() {
                        "These answers are for your last complete entries, not the form as it is now. Fix:"
                    } else {
                        "No plan yet. Fix:"
                    }}</p>
                    <FixList />
                </div>
            </Show>
            <div class="cards">
                <Card label="Steam for the run" out="steam_total"
                    value=from_plan(plan, |p| units::mass(p.ranges.steam_kg.central))
                    note=from_plan(plan, |p| format!("{} from the boiler; {}", units::kg_per_hour(p.run.steam_rate_kg_per_s), likely(&p.ranges.steam_kg, units::mass))) />
                <Card label="Water used" out="water_total"
                    value=from_plan(plan, |p| units::volume(p.ranges.water_total_kg.central / 1000.0))
                    note=from_plan(plan, |p| format!("boiler {} + cooling {}; {}", units::volume(p.water_use.boiler_feed_kg / 1000.0), units::volume(p.water_use.cooling_water_kg / 1000.0), likely(&p.ranges.water_total_kg, |kg| units::volume(kg / 1000.0)))) />
                <Card label="Water boils here at" out="water_boiling_point"
                    value=from_plan(plan, |p| units::celsius(p.site.water_boiling_point_c))
                    note=from_plan(plan, |p| format!("{} from sea level, at {}", units::kelvin_shift(p.site.boiling_point_shift_k), units::kpa(p.site.pressure_pa))) />
                <Card label="Separator" out="separator_size"
                    value=from_plan(plan, |p| units::volume(p.separator.volume_m3))
                    note=from_plan(plan, |p| match (p.separator.diameter_m, p.separator.height_m) {
                        (Some(d), Some(h)) => format!("{} wide × {} high; oil at the {}; {}", units::length(d), units::length(h), layer_word(p.separator.oil_outlet), likely(&p.ranges.separator_volume_m3, units::volume)),
                        _ => "the oil will not part by gravity".to_string(),
                    }) />
                <Card label="First drop after" out="first_drop"
                    value=from_plan(plan, |p| units::duration(p.run.time_to_first_drop_s))
                    note=from_plan(plan, |p| format!("the boiler boils after {}", units::duration(p.run.time_to_boil_s))) />
                <Card label="Whole run" out="total_time"
                    value=from_plan(plan, |p| units::duration(p.run.total_time_s))
                    note=from_plan(plan, |p| format!("{} in all; distilling {} ({} to {})", likely(&p.ranges.total_time_s, units::duration), units::duration(p.run.time_after_first_drop_s), units::duration(p.ranges.run_time_s.low), units::duration(p.ranges.run_time_s.high))) />
                <Card label="Fuel for the run" out="fuel_total"
                    value=from_plan(plan, |p| units::fuel(p.energy.fuel_amount, p.energy.fuel))
                    note=from_plan(plan, |p| likely(&p.ranges.fuel_amount, |v| units::fuel(v, p.energy.fuel))) />
                <Card label="Oil to expect" out="oil_volume"
                    value=from_plan(plan, |p| if p.yield_estimate.hydrosol_is_the_product {
                        "almost none".to_string()
                    } else {
                        units::oil_volume(p.yield_estimate.oil_volume_m3.central)
                    })
                    note=from_plan(plan, |p| if p.yield_estimate.hydrosol_is_the_product {
                        format!("{} stays dissolved: the hydrosol is the product", units::mass(p.yield_estimate.dissolved_in_hydrosol_kg))
                    } else {
                        format!("separable oil, likely {} to {}", units::oil_volume(p.yield_estimate.oil_volume_m3.low), units::oil_volume(p.yield_estimate.oil_volume_m3.high))
                    }) />
                <Card label="Hydrosol" out="hydrosol_total"
                    value=from_plan(plan, |p| units::volume(p.run.hydrosol_volume_m3))
                    note=from_plan(plan, |p| if p.run.returned_to_boiler_kg > 0.0 {
                        format!("kept, after {} returned to the boiler", units::volume(p.run.returned_to_boiler_kg / 1000.0))
                    } else {
                        "distillate water, kept".to_string()
                    }) />
            </div>
            <HowSure />
        </section>
    }
}

fn layer_word(layer: OilLayer) -> &'static str {
    match layer {
        OilLayer::Top => "top",
        OilLayer::Bottom => "bottom",
    }
}

/// What a grower can do about the biggest source of doubt.
fn doubt_words(u: Uncertainty) -> &'static str {
    match u {
        Uncertainty::OilContent => "the crop's oil content: log a run to narrow it",
        Uncertainty::RateConstant => "how fast this crop gives up its oil: log a run to narrow it",
        Uncertainty::BoilerEfficiency => {
            "how much of the burner's heat reaches the water: measure a steam rate to narrow it"
        }
        Uncertainty::VapourPressures => "the oil compounds' published vapour pressures",
        Uncertainty::Solubilities => "how much oil the water dissolves (published solubilities)",
        Uncertainty::VaporisationEfficiency => "how close the steam comes to carrying its full load of oil",
        Uncertainty::SteamDependence => "how strongly this crop's release follows the steam rate",
        Uncertainty::CondenserU => "how well the condenser passes heat",
        Uncertainty::WallU => "how much heat the still's wall loses: lagging it narrows this",
    }
}

/// Warning codes about the data rather than about the run: they belong with the ranges.
const DATA_NOTES: [&str; 5] = [
    "correlation_out_of_range",
    "estimated_vapour_pressure",
    "still_volume_estimated",
    "own_calibration",
    "stokes_limit",
];

/// How sure the answers are: the biggest source of doubt, and notes about the data.
#[component]
fn HowSure() -> impl IntoView {
    let state = expect_context::<AppState>();
    let plan = state.shown;
    let lines = lines_from(plan, |p| {
        let mut out = vec![
            ("doubt_run", format!("Run length: mostly {}.", doubt_words(p.ranges.run_time_s.mostly_from))),
            ("doubt_oil", format!("Oil: mostly {}.", doubt_words(p.ranges.oil_kg.mostly_from))),
            ("doubt_fuel", format!("Fuel: mostly {}.", doubt_words(p.ranges.fuel_amount.mostly_from))),
        ];
        if p.ranges.failed_ends > 0 {
            out.push((
                "doubt_left_out",
                "Some likely cases could not be planned at all (for example the burner at its weakest cannot keep the still going), so the ranges leave them out: the real spread is wider.".to_string(),
            ));
        }
        out.extend(
            p.warnings
                .iter()
                .filter(|w| DATA_NOTES.contains(&w.code.as_str()))
                .map(|w| ("data_note", w.message.clone())),
        );
        out.into_iter().map(|(k, t)| (k.to_string(), t, String::new())).collect()
    });
    view! {
        <Show when=move || lines.with(|l| !l.is_empty())>
            <details class="how-sure" data-out="how_sure">
                <summary>"How sure is this? " <span data-out="how_sure_line">{move || plan.with(|r| r.as_ref().ok().map(|p| format!("Mostly {}.", doubt_words(p.ranges.run_time_s.mostly_from))))}</span></summary>
                <p>"Ranges are likely lows and highs (about 1 in 10 either side) from the uncertainty of the published data and of your entries."</p>
                <ul>{move || lines.get().into_iter().map(|(k, t, _)| view! { <li data-note=k>{t}</li> }).collect_view()}</ul>
            </details>
        </Show>
    }
}

/// Warnings from the plan that the grower can act on, each in plain words.
#[component]
pub fn Warnings() -> impl IntoView {
    let state = expect_context::<AppState>();
    let plan = state.shown;
    let list = lines_from(plan, |p| {
        p.warnings
            .iter()
            .filter(|w| !DATA_NOTES.contains(&w.code.as_str()))
            .map(|w| (w.code.clone(), w.message.clone(), String::new()))
            .collect()
    });
    view! {
        <Show when=move || list.with(|l| !l.is_empty())>
            <section class="warnings" aria-labelledby="h-warnings">
                <h2 id="h-warnings">"Watch out"</h2>
                <ul>
                    {move || list.get().into_iter().map(|(code, message, _)| view! { <li data-warning=code>{message}</li> }).collect_view()}
                </ul>
            </section>
        </Show>
    }
}

/// Share of the oil over time, as a small line chart.
#[component]
fn RecoveryChart() -> impl IntoView {
    let state = expect_context::<AppState>();
    let plan = state.shown;
    let points = move || {
        plan.with(|r| {
            r.as_ref()
                .map(|p| {
                    let curve = &p.run.recovery_curve;
                    let t_end = curve.last().map(|c| c.0).unwrap_or(1.0).max(1.0);
                    curve
                        .iter()
                        .map(|(t, y)| format!("{:.1},{:.1}", 10.0 + 280.0 * t / t_end, 110.0 - 100.0 * y))
                        .collect::<Vec<_>>()
                        .join(" ")
                })
                .unwrap_or_default()
        })
    };
    let end_label = move || {
        plan.with(|r| r.as_ref().map(|p| units::duration(p.run.time_after_first_drop_s)).unwrap_or_default())
    };
    view! {
        <figure class="chart">
            <svg viewBox="0 0 300 130" role="img" aria-label="Share of the oil recovered over the run">
                <line x1="10" y1="110" x2="290" y2="110" class="axis" />
                <line x1="10" y1="10" x2="10" y2="110" class="axis" />
                <line x1="10" y1="10" x2="290" y2="10" class="grid" />
                <polyline points=points class="curve" />
                <text x="14" y="22" class="tick">"100 %"</text>
                <text x="14" y="124" class="tick">"first drop"</text>
                <text x="288" y="124" class="tick end">{end_label}</text>
            </svg>
            <figcaption>"Share of the charge's oil carried over after the first drop: the plant's release, held back where the steam cannot carry it faster."</figcaption>
        </figure>
    }
}

/// A table's rows, each a [`Row`] of the plan on screen.
fn rows(plan: PlanMemo, table: &'static [Out]) -> impl IntoView + use<> {
    table
        .iter()
        .map(|o| view! { <Row label=o.label out=o.out value=from_plan(plan, o.text) /> })
        .collect_view()
}

/// The full plan, panel by panel.
#[component]
pub fn Details() -> impl IntoView {
    let state = expect_context::<AppState>();
    let plan = state.shown;
    let composition = lines_from(plan, |p| {
        p.oil
            .components
            .iter()
            .map(|c| {
                let name = format!("{}{}", c.name, if c.correlation_in_range { "" } else { " *" });
                (name, units::percent(c.mass_fraction), units::percent(c.first_vapour_mass_fraction))
            })
            .collect()
    });
    let cuts = lines_from(plan, |p| {
        p.codistillation
            .cuts
            .iter()
            .map(|cut| {
                let mut ranked: Vec<(usize, f64)> = cut.mass_fractions.iter().cloned().enumerate().collect();
                ranked.sort_by(|a, b| b.1.total_cmp(&a.1));
                let mostly = ranked
                    .iter()
                    .take(2)
                    .map(|(i, w)| format!("{} {}", p.oil.components[*i].name, units::percent(*w)))
                    .collect::<Vec<_>>()
                    .join(", ");
                let share = format!(
                    "{}–{} %",
                    units::fixed(cut.from_fraction * 100.0, 0),
                    units::fixed(cut.to_fraction * 100.0, 0)
                );
                (share, units::sig3(cut.steam_kg_per_kg_oil), mostly)
            })
            .collect()
    });
    view! {
        <section class="details" class:stale=move || state.stale.get() aria-labelledby="h-details">
            <h2 id="h-details">"The plan in full"</h2>

            <h3>"Steam and time"</h3>
            <dl>
                {rows(plan, STEAM_ROWS)}
            </dl>
            <RecoveryChart />

            <h3>"Heat and fuel"</h3>
            <dl>
                {rows(plan, HEAT_ROWS)}
            </dl>

            <h3>"Condenser and water"</h3>
            <dl>
                {rows(plan, CONDENSER_ROWS)}
            </dl>

            <h3>"Separator"</h3>
            <dl>
                {rows(plan, SEPARATOR_ROWS)}
            </dl>

            <h3>"Oil and hydrosol"</h3>
            <dl>
                {rows(plan, OIL_ROWS)}
            </dl>
            <table class="composition">
                <caption>"Oil composition and the first vapour"</caption>
                <thead><tr><th scope="col">"Compound"</th><th scope="col">"In the oil"</th><th scope="col">"In the first vapour"</th></tr></thead>
                <tbody>
                    {move || composition.get().into_iter().map(|(name, in_oil, in_vapour)| view! {
                        <tr><th scope="row">{name}</th><td>{in_oil}</td><td>{in_vapour}</td></tr>
                    }).collect_view()}
                </tbody>
            </table>

            <table class="composition cuts">
                <caption>"The distillate, cut by cut (ideal run: the light compounds come first)"</caption>
                <thead><tr><th scope="col">"Share of the oil"</th><th scope="col">"Least steam, kg per kg of oil"</th><th scope="col">"Mostly"</th></tr></thead>
                <tbody>
                    {move || cuts.get().into_iter().map(|(share, steam, mostly)| view! {
                        <tr><th scope="row">{share}</th><td>{steam}</td><td>{mostly}</td></tr>
                    }).collect_view()}
                </tbody>
            </table>

            <Show when=move || plan.with(|r| r.as_ref().map(|p| p.season.is_some()).unwrap_or(false))>
                <h3>"Season"</h3>
                <dl>
                    {rows(plan, SEASON_ROWS)}
                </dl>
            </Show>
        </section>
    }
}
