//! Compare: two to four plans side by side, from the saved plans and the plan's form as it is
//! now. Each is planned by the core; the headline answers (with their likely ranges) and the
//! main inputs are rows, the plans are columns, and a row whose values differ is marked.

use super::Workbench;
use super::library::Library;
use crate::fields::FIELDS;
use crate::units;
use leptos::prelude::*;
use stillroom_core::crops::CROPS;
use stillroom_core::heat::Fuel;
use stillroom_core::plan::Answer;
use stillroom_core::scenario::CondenserKind;
use stillroom_core::{Plan, Scenario, ScenarioErrors};

/// Most plans side by side: four columns still fit a phone's width with sideways scrolling.
const MOST: usize = 4;
/// The pick that stands for the plan's form as it is now (saved plans' ids start at 1).
const FORM: u64 = 0;

/// One compared plan: its name, its scenario, and the plan or why there is none.
struct Compared {
    name: String,
    scenario: Scenario,
    plan: Result<Plan, ScenarioErrors>,
}

/// A cell: the text shown, its likely range (if any), and the SI value it was made from
/// (`data-si`, so a test reads the number the core planned).
struct Cell {
    text: String,
    range: Option<String>,
    si: Option<f64>,
    /// An answer of a plan that could not be made: left out when looking for differences.
    missing: bool,
}

fn cell(text: String) -> Cell {
    Cell { text, range: None, si: None, missing: false }
}

fn answer(a: &Answer, show: impl Fn(f64) -> String) -> Cell {
    Cell {
        text: show(a.central),
        range: Some(format!("likely {} to {}", show(a.low), show(a.high))),
        si: Some(a.central),
        missing: false,
    }
}

fn crop_name(s: &Scenario) -> String {
    s.charge
        .crop
        .as_deref()
        .and_then(|id| CROPS.iter().find(|c| c.id == id))
        .map(|c| c.name.to_string())
        .unwrap_or_else(|| "no preset".to_string())
}

fn fuel_word(f: Fuel) -> &'static str {
    match f {
        Fuel::Propane => "propane",
        Fuel::NaturalGas => "natural gas",
        Fuel::Firewood => "firewood",
        Fuel::Electricity => "electricity",
    }
}

/// A row: its key (for tests), its label, and how to read it off one compared plan. Answers
/// of a plan that could not be made are a dash; its column says why at the top.
struct RowDef {
    key: &'static str,
    label: &'static str,
    read: fn(&Compared) -> Cell,
}

fn planned(c: &Compared, f: impl Fn(&Plan) -> Cell) -> Cell {
    c.plan.as_ref().map(f).unwrap_or_else(|_| Cell { missing: true, ..cell("–".into()) })
}

const ROWS: [RowDef; 12] = [
    RowDef { key: "crop", label: "Crop", read: |c| cell(crop_name(&c.scenario)) },
    RowDef {
        key: "charge",
        label: "Plant in the still",
        read: |c| Cell {
            si: Some(c.scenario.charge.plant_mass_kg),
            ..cell(units::mass(c.scenario.charge.plant_mass_kg))
        },
    },
    RowDef {
        key: "altitude",
        label: "Altitude",
        read: |c| Cell {
            si: Some(c.scenario.site.altitude_m),
            ..cell(units::altitude(c.scenario.site.altitude_m))
        },
    },
    RowDef {
        key: "heat_input",
        label: "Heat input",
        read: |c| Cell {
            si: Some(c.scenario.boiler.heat_input_w),
            ..cell(format!(
                "{}, {}",
                units::kilowatts(c.scenario.boiler.heat_input_w),
                fuel_word(c.scenario.boiler.fuel)
            ))
        },
    },
    RowDef {
        key: "condenser",
        label: "Condenser",
        read: |c| {
            cell(match c.scenario.condenser.kind {
                CondenserKind::CoilInTub => "coil in a tub".into(),
                CondenserKind::TubeInTube => "jacketed tube".into(),
            })
        },
    },
    RowDef {
        key: "steam",
        label: "Steam for the run",
        read: |c| planned(c, |p| answer(&p.ranges.steam_kg, units::mass)),
    },
    RowDef {
        key: "water",
        label: "Water used",
        read: |c| planned(c, |p| answer(&p.ranges.water_total_kg, |kg| units::volume(kg / 1000.0))),
    },
    RowDef {
        key: "boiling",
        label: "Water boils at",
        read: |c| {
            planned(c, |p| Cell {
                si: Some(p.site.water_boiling_point_c),
                ..cell(units::celsius(p.site.water_boiling_point_c))
            })
        },
    },
    RowDef {
        key: "run_time",
        label: "Whole run",
        read: |c| planned(c, |p| answer(&p.ranges.total_time_s, units::duration)),
    },
    RowDef {
        key: "oil",
        label: "Oil to expect",
        read: |c| {
            planned(c, |p| {
                let r = &p.yield_estimate.oil_volume_m3;
                Cell {
                    text: units::oil_volume(r.central),
                    range: Some(format!(
                        "likely {} to {}",
                        units::oil_volume(r.low),
                        units::oil_volume(r.high)
                    )),
                    si: Some(r.central),
                    missing: false,
                }
            })
        },
    },
    RowDef {
        key: "fuel",
        label: "Fuel for the run",
        read: |c| {
            let fuel = c.scenario.boiler.fuel;
            planned(c, |p| {
                let a = &p.ranges.fuel_amount;
                Cell {
                    text: units::fuel(a.central, fuel),
                    range: Some(format!(
                        "likely {} to {}",
                        units::fuel(a.low, fuel),
                        units::fuel(a.high, fuel)
                    )),
                    si: Some(a.central),
                    missing: false,
                }
            })
        },
    },
    RowDef {
        key: "separator",
        label: "Separator",
        read: |c| planned(c, |p| answer(&p.ranges.separator_volume_m3, units::volume)),
    },
];

/// Why a plan could not be made, in the grower's words: each field by its label on the form
/// (its path where the form has no such field), then the core's message.
pub fn why(e: &ScenarioErrors) -> String {
    e.errors
        .iter()
        .map(|e| {
            let label = FIELDS.iter().find(|f| f.path == e.field).map(|f| f.label.to_string());
            format!("{}: {}", label.unwrap_or_else(|| e.field.clone()), e.message)
        })
        .collect::<Vec<_>>()
        .join("; ")
}

/// The picker and the side-by-side table.
#[component]
pub fn Compare() -> impl IntoView {
    let wb = expect_context::<Workbench>();
    let library = expect_context::<Library>();
    let picked = RwSignal::new(Vec::<u64>::new());
    let toggle = move |id: u64, on: bool| {
        picked.update(|p| {
            p.retain(|x| *x != id);
            if on && p.len() < MOST {
                p.push(id);
            }
        })
    };
    // Whether `id` cannot be ticked now: it is not picked and the most are.
    let full = move |id: u64| picked.with(|p| !p.contains(&id) && p.len() >= MOST);
    // Plans picked that are still saved (one may be deleted meanwhile), in the order picked.
    let compared = Memo::new(move |_| {
        let ids = picked.get();
        let plans = library.plans.get();
        let form = wb.current.get();
        ids.iter()
            .filter_map(|id| {
                if *id == FORM {
                    form.clone().map(|s| ("The plan's form now".to_string(), s))
                } else {
                    plans.iter().find(|p| p.id == *id).map(|p| (p.name.clone(), p.scenario.clone()))
                }
            })
            .map(|(name, scenario)| {
                let plan = stillroom_core::plan(&scenario);
                (name, scenario, plan)
            })
            .collect::<Vec<_>>()
    });
    let count = move || compared.with(|c| c.len());
    let hint = move || match count() {
        0 | 1 => "Tick two to four plans to see them side by side.".to_string(),
        n if n >= MOST => format!("{MOST} plans is the most side by side: untick one to pick another."),
        _ => String::new(),
    };
    let table = move || {
        let system = wb.units.get();
        compared.with(|list| {
            if list.len() < 2 {
                return None;
            }
            let list: Vec<Compared> = list
                .iter()
                .map(|(name, scenario, plan)| Compared {
                    name: name.clone(),
                    scenario: scenario.clone(),
                    plan: plan.clone(),
                })
                .collect();
            Some(units::with_system(system, || compare_table(&list)))
        })
    };
    view! {
        <section class="compare" aria-labelledby="h-compare">
            <h2 id="h-compare">"Compare plans"</h2>
            <fieldset class="compare-pick">
                <legend>"Plans to compare"</legend>
                <label class="choice">
                    <input type="checkbox" id="compare-pick-form"
                        prop:checked=move || picked.with(|p| p.contains(&FORM))
                        prop:disabled=move || wb.current.with(|c| c.is_none()) || full(FORM)
                        on:change=move |ev| { wb.refresh(); toggle(FORM, event_target_checked(&ev)); } />
                    "The plan's form now"
                </label>
                {move || library.plans.get().into_iter().map(|p| {
                    let id = p.id;
                    view! {
                        <label class="choice">
                            <input type="checkbox" id=format!("compare-pick-{id}")
                                prop:checked=move || picked.with(|x| x.contains(&id))
                                prop:disabled=move || full(id)
                                on:change=move |ev| toggle(id, event_target_checked(&ev)) />
                            {p.name}
                        </label>
                    }
                }).collect_view()}
                <p class="hint" aria-live="polite">{hint}</p>
            </fieldset>
            {table}
        </section>
    }
}

/// The table itself: rows the answers and inputs, columns the plans; a row whose shown values
/// differ is marked with "≠" and a word, not by colour alone (a plan that could not be made is
/// left out of that: its dashes are not a difference).
fn compare_table(list: &[Compared]) -> impl IntoView + use<> {
    let names: Vec<String> = list.iter().map(|c| c.name.clone()).collect();
    let status: Vec<Option<String>> = list.iter().map(|c| c.plan.as_ref().err().map(why)).collect();
    let rows: Vec<_> = ROWS
        .iter()
        .map(|r| {
            let cells: Vec<Cell> = list.iter().map(|c| (r.read)(c)).collect();
            let mut shown = cells.iter().filter(|c| !c.missing).map(|c| &c.text);
            let first = shown.next();
            let differs = shown.any(|t| Some(t) != first);
            (r.key, r.label, differs, cells)
        })
        .collect();
    view! {
        <div class="compare-scroll">
            <table class="compare-table" id="compare-table">
                <thead>
                    <tr>
                        <th scope="col" class="label-col">"Plan"</th>
                        {names.into_iter().zip(status).map(|(n, s)| view! {
                            <th scope="col">
                                <span class="plan-name">{n}</span>
                                {s.map(|s| view! { <span class="cannot" data-out="cannot_plan">{format!("Cannot be planned: {s}")}</span> })}
                            </th>
                        }).collect_view()}
                    </tr>
                </thead>
                <tbody>
                    {rows.into_iter().map(|(key, label, differs, cells)| view! {
                        <tr data-row=key class:differs=differs data-differs=if differs { "true" } else { "false" }>
                            <th scope="row" class="label-col">
                                {label}
                                {differs.then(|| view! { <span class="differs-mark" title="The plans differ here">" ≠ differs"</span> })}
                            </th>
                            {cells.into_iter().map(|c| view! {
                                <td data-si=c.si.map(|v| v.to_string()).unwrap_or_default()>
                                    <span class="value">{c.text}</span>
                                    {c.range.map(|r| view! { <span class="range">{r}</span> })}
                                </td>
                            }).collect_view()}
                        </tr>
                    }).collect_view()}
                </tbody>
            </table>
        </div>
    }
}
