//! The grower's log of finished runs, and what it says about the next one.

use super::Workbench;
use crate::fields::{TextError, parse_number};
use crate::records::{self, Kind};
use crate::units;
use leptos::prelude::*;
use stillroom_core::calibration::{RunRecord, calibrate, oil_content_percent_from_run};
use stillroom_core::crops::CROPS;

/// The log of finished runs, saved under [`Kind::RunLog`]'s key.
#[derive(Clone, Copy)]
pub struct Runs {
    pub runs: RwSignal<Vec<RunRecord>>,
}

impl Runs {
    /// Reads the saved log (anything unreadable kept aside and reported) and keeps it saved.
    pub fn new(wb: Workbench) -> Runs {
        let store = wb.store;
        let logged = store.load(Kind::RunLog, records::read_runs).unwrap_or_default();
        store.report_found();
        let runs = RwSignal::new(logged);
        Effect::new(move |_| {
            let text = runs.with(|r| records::runs_text(r));
            store.save(Kind::RunLog, text);
        });
        Runs { runs }
    }
}

fn crop_name(id: &Option<String>) -> String {
    id.as_deref()
        .and_then(|id| CROPS.iter().find(|c| c.id == id))
        .map(|c| c.name.to_string())
        .unwrap_or_else(|| "no preset".to_string())
}

fn read(text: &str, what: &str) -> Result<f64, String> {
    match parse_number(text) {
        Ok(Some(v)) if v > 0.0 => Ok(v),
        Ok(Some(_)) => Err(format!("{what} must be more than zero.")),
        Ok(None) | Err(TextError::Empty) => Err(format!("Enter {what}.")),
        Err(TextError::NotANumber) => Err(format!("{what}: enter a number.")),
    }
}

/// The log: a short form for a finished run, the list, and the suggestion for the next plan.
#[component]
pub fn RunLog() -> impl IntoView {
    let wb = expect_context::<Workbench>();
    let runs = expect_context::<Runs>().runs;
    let date = RwSignal::new(String::new());
    let minutes = RwSignal::new(String::new());
    let oil_ml = RwSignal::new(String::new());
    let problem = RwSignal::new(None::<String>);
    // The run deleted last and where it was: one tap brings it back (a wet thumb can hit ✕).
    let removed = RwSignal::new(None::<(usize, RunRecord)>);
    let undo = move |_| {
        if let Some((i, run)) = removed.get_untracked() {
            runs.update(|list| list.insert(i.min(list.len()), run));
            removed.set(None);
        }
    };

    let log = move |_| {
        wb.refresh();
        let Some(scenario) = wb.current.get_untracked() else {
            problem.set(Some(
                "The plan's form could not be read: open “Plan a run” once, then log the run.".into(),
            ));
            return;
        };
        let Ok(plan) = stillroom_core::plan(&scenario) else {
            problem.set(Some(
                "Fix the plan's marked fields first: the log uses its plant mass and oil density.".into(),
            ));
            return;
        };
        let parsed = read(&minutes.get_untracked(), "the minutes distilled")
            .and_then(|m| read(&oil_ml.get_untracked(), "the oil collected").map(|o| (m, o)));
        match parsed {
            Err(e) => problem.set(Some(e)),
            Ok((m, ml)) => {
                problem.set(None);
                let record = RunRecord {
                    date: date.get_untracked().trim().to_string(),
                    crop: scenario.charge.crop.clone(),
                    plant_mass_kg: scenario.charge.plant_mass_kg,
                    distilling_time_s: m * 60.0,
                    oil_volume_m3: ml * 1e-6,
                    oil_density_kg_per_m3: plan.oil.density_kg_per_m3,
                    rate_constant_per_min: plan.run.rate_constant_per_min,
                    note: String::new(),
                };
                runs.update(|r| r.push(record));
                minutes.set(String::new());
                oil_ml.set(String::new());
            }
        }
    };

    let suggestion = Memo::new(move |_| {
        let crop = wb.current.with(|s| s.as_ref().and_then(|s| s.charge.crop.clone()));
        runs.with(|r| calibrate(r, crop.as_deref())).map(|c| (c, crop_name(&crop)))
    });
    let use_it = move |_| {
        if let (Some((c, _)), Some(mut s)) = (suggestion.get_untracked(), wb.current.get_untracked()) {
            s.charge.oil_content_percent = Some(c.oil_content_percent);
            wb.open_in_plan(&s);
        }
    };

    view! {
        <section class="runlog" aria-labelledby="h-runlog">
            <h2 id="h-runlog">"Your runs"</h2>
            <p class="hint">"Log a finished run of the charge above: the plan learns your crop's real oil content from it."</p>
            <div class="field">
                <label for="run-date"><span class="label">"Date"</span></label>
                <input id="run-date" type="text" autocomplete="off" placeholder="e.g. 14 July"
                    prop:value=move || date.get() on:input=move |ev| date.set(event_target_value(&ev)) />
            </div>
            <div class="field">
                <label for="run-minutes"><span class="label">"Distilled after the first drop"</span><span class="unit">"min"</span></label>
                <input id="run-minutes" type="text" inputmode="decimal" autocomplete="off"
                    prop:value=move || minutes.get() on:input=move |ev| minutes.set(event_target_value(&ev)) />
            </div>
            <div class="field">
                <label for="run-oil"><span class="label">"Oil collected"</span><span class="unit">"mL"</span></label>
                <input id="run-oil" type="text" inputmode="decimal" autocomplete="off"
                    prop:value=move || oil_ml.get() on:input=move |ev| oil_ml.set(event_target_value(&ev)) />
            </div>
            <p class="error" id="run-error" aria-live="polite">{move || problem.get()}</p>
            <button type="button" id="run-log" on:click=log>"Log this run"</button>

            <Show when=move || suggestion.get().is_some()>
                <div class="suggestion" data-out="calibration">
                    <p>{move || suggestion.get().map(|(c, name)| format!(
                        "Your {} logged run(s) of {} imply an oil content of {} % (from {} to {} %).",
                        c.runs_used, name, units::fixed(c.oil_content_percent, 2),
                        units::fixed(c.lowest_percent, 2), units::fixed(c.highest_percent, 2)))}</p>
                    <button type="button" id="run-use" on:click=use_it.clone()>"Plan with it"</button>
                </div>
            </Show>

            <ul class="runs">
                {move || runs.get().into_iter().enumerate().map(|(i, r)| {
                    let implied = oil_content_percent_from_run(&r)
                        .map(|p| format!("{} %", units::fixed(p, 2)))
                        .unwrap_or_else(|| "–".into());
                    view! {
                        <li data-run=i>
                            <span>{format!("{} · {} · {} kg · {} min · {} mL → {}",
                                if r.date.is_empty() { "undated".to_string() } else { r.date.clone() },
                                crop_name(&r.crop), units::sig3(r.plant_mass_kg), units::sig3(r.distilling_time_s / 60.0),
                                units::sig3(r.oil_volume_m3 * 1e6), implied)}</span>
                            <button type="button" class="quiet" aria-label="Delete this run"
                                on:click=move |_| runs.update(|list| {
                                    if i < list.len() {
                                        removed.set(Some((i, list.remove(i))));
                                    }
                                })>"✕"</button>
                        </li>
                    }
                }).collect_view()}
            </ul>
            <Show when=move || removed.with(|r| r.is_some())>
                <p class="hint run-removed" data-out="run_removed">"Run deleted. "
                    <button type="button" id="run-undo" class="quiet" on:click=undo>"Undo"</button>
                </p>
            </Show>
        </section>
    }
}

impl Runs {
    /// Adds the `incoming` runs not already in the log (equal in every field); (added, skipped).
    pub fn merge(&self, incoming: Vec<RunRecord>) -> (usize, usize) {
        let (mut added, mut skipped) = (0, 0);
        self.runs.update(|log| {
            for run in incoming {
                if log.contains(&run) {
                    skipped += 1;
                } else {
                    log.push(run);
                    added += 1;
                }
            }
        });
        (added, skipped)
    }
}
