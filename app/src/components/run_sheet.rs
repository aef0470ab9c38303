//! The run sheet: the plan on one printed page, to take to the still. On screen only its button
//! shows; the print stylesheet (`public/style.css`, `@media print`) hides the form and the tabs
//! and prints the answers, this summary of the site, charge, equipment and time line, the
//! cautions, and blank lines for the run's actual figures.

use crate::components::inputs::{CONDENSERS, FUELS, METALS};
use crate::components::results::Lines;
use crate::state::AppState;
use crate::units;
use leptos::prelude::*;
use stillroom_core::Plan;
use stillroom_core::crops::CROPS;
use stillroom_core::scenario::Scenario;

/// The label a choice has in the form.
fn label<T: PartialEq>(list: &[(T, &str, &'static str)], value: &T) -> &'static str {
    list.iter().find(|(v, _, _)| v == value).map(|(_, _, l)| *l).unwrap_or("–")
}

/// (heading, [(label, value)]) of the sheet, in the grower's units.
fn sections(s: &Scenario, p: &Plan) -> Vec<(&'static str, Vec<(&'static str, String)>)> {
    let crop = s.charge.crop.as_deref().and_then(|id| CROPS.iter().find(|c| c.id == id));
    vec![
        (
            "Site",
            vec![
                ("Altitude", units::altitude(s.site.altitude_m)),
                ("Air pressure", units::kpa(p.site.pressure_pa)),
                ("Water boils at", units::celsius(p.site.water_boiling_point_c)),
            ],
        ),
        (
            "Charge",
            vec![
                (
                    "Crop",
                    crop.map(|c| format!("{} ({})", c.name, c.material))
                        .unwrap_or_else(|| "no preset".into()),
                ),
                ("Plant mass", units::mass(s.charge.plant_mass_kg)),
                ("Oil in the charge", units::mass(p.yield_estimate.oil_in_charge_kg)),
                ("Target recovery", format!("{} %", units::fixed(s.run.target_recovery_percent, 0))),
            ],
        ),
        (
            "Equipment",
            vec![
                (
                    "Still",
                    format!(
                        "{}, {}",
                        units::volume(p.run.still_volume_used_m3),
                        label(METALS, &s.still.metal)
                    ),
                ),
                (
                    "Heat",
                    format!("{}, {}", label(FUELS, &s.boiler.fuel), units::kilowatts(s.boiler.heat_input_w)),
                ),
                ("Boiler water", units::volume(s.boiler.usable_water_kg / 1000.0)),
                ("Condenser", label(CONDENSERS, &s.condenser.kind).to_string()),
                ("Cooling water in", units::celsius(s.condenser.cooling_water_inlet_c)),
            ],
        ),
        (
            "Time line",
            vec![
                ("Boiler boils after", units::duration(p.run.time_to_boil_s)),
                ("First drop after", units::duration(p.run.time_to_first_drop_s)),
                ("Distilling", units::duration(p.run.time_after_first_drop_s)),
                ("Whole run", units::duration(p.run.total_time_s)),
            ],
        ),
    ]
}

/// The figures a grower writes down during the run, one blank line each.
const ACTUAL: [&str; 8] = [
    "Date and lot",
    "Charge mass loaded",
    "Heat on at",
    "First drop at",
    "Heat off at",
    "Fuel used",
    "Oil collected",
    "Hydrosol kept",
];

/// The button that prints the sheet.
#[component]
pub fn PrintSheet() -> impl IntoView {
    let print = move |_| {
        if let Some(w) = web_sys::window() {
            let _ = w.print();
        }
    };
    view! {
        <button type="button" id="print-sheet" class="quiet screen-only" on:click=print>"Print a run sheet"</button>
    }
}

/// The printed page's summary (hidden on screen).
#[component]
pub fn RunSheet() -> impl IntoView {
    let state = expect_context::<AppState>();
    let good = state.good;
    let system = state.units;
    // A memo of the sheet's texts, so the sheet is rebuilt only when one of them changes (most
    // edits change a few values; the sections and labels stay).
    let sheet = Memo::new(move |_| {
        let system = system.get();
        good.with(|g| {
            g.as_ref().map(|(s, p)| units::with_system(system, || sections(s, p))).unwrap_or_default()
        })
        .into_iter()
        .flat_map(|(h, rows)| rows.into_iter().map(move |(l, v)| (h.to_string(), l.to_string(), v)))
        .collect::<Lines>()
    });
    // The sheet's shape (headings and labels, no values) changes only when a first plan comes
    // or goes: the parts are built then, and each value follows its own line.
    let shape = Memo::new(move |_| {
        sheet.with(|lines| {
            lines.iter().map(|(h, l, _)| (h.clone(), l.clone(), String::new())).collect::<Lines>()
        })
    });
    let body = move || {
        let mut parts: Vec<(String, Vec<(usize, String)>)> = Vec::new();
        for (i, (h, l, _)) in shape.get().into_iter().enumerate() {
            match parts.last_mut() {
                Some((last, rows)) if *last == h => rows.push((i, l)),
                _ => parts.push((h, vec![(i, l)])),
            }
        }
        parts
    };
    let value =
        move |i: usize| sheet.with(|lines| lines.get(i).map(|(_, _, v)| v.clone()).unwrap_or_default());
    view! {
        <section class="run-sheet print-only" aria-hidden="true">
            <div class="sheet-grid">
                {move || body().into_iter().map(|(h, rows)| view! {
                    <div class="sheet-part">
                        <h3>{h}</h3>
                        <dl>{rows.into_iter().map(|(i, l)| view! { <dt>{l}</dt><dd>{move || value(i)}</dd> }).collect_view()}</dl>
                    </div>
                }).collect_view()}
            </div>
            <h3>"This run, as it went"</h3>
            <table class="sheet-actual">
                <tbody>{ACTUAL.iter().map(|l| view! { <tr><th scope="row">{*l}</th><td></td></tr> }).collect_view()}</tbody>
            </table>
            <p class="sheet-foot">"Worked out by Stillroom from published physics: planning estimates, not a design approval."</p>
        </section>
    }
}
