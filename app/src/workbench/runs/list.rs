//! The logged runs, newest first: each a card with its batch record, delete (with undo) and print.

use super::{Runs, log};
use crate::units;
use crate::workbench::Workbench;
use leptos::prelude::*;
use stillroom_core::calibration::{RunRecord, oil_content_percent_from_run};
use wasm_bindgen::JsCast;

/// Class on `<html>` while one batch record prints (`public/style.css`, print block).
const PRINTING_CLASS: &str = "printing-batch";
/// Id of the copy of the record put under `<body>` to print.
const PRINT_ID: &str = "batch-print";

fn or_dash(v: Option<String>) -> String {
    v.filter(|s| !s.is_empty()).unwrap_or_else(|| "–".to_string())
}

/// The record's lines, in the grower's units: (label, value).
fn sheet_lines(r: &RunRecord) -> Vec<(&'static str, String)> {
    vec![
        ("Lot", r.lot.clone()),
        ("Date", or_dash(Some(r.date.clone()))),
        ("Crop", log::crop_name(r.crop.as_deref())),
        ("Plant part", or_dash(Some(r.plant_part.clone()))),
        ("Charge loaded", units::mass(r.plant_mass_kg)),
        ("Distilled after the first drop", units::duration(r.distilling_time_s)),
        ("Fuel used", or_dash(r.fuel_used.map(|f| format!("{} {}", units::sig3(f), r.fuel_unit)))),
        ("Oil collected", units::oil_volume(r.oil_volume_m3)),
        ("Hydrosol kept", or_dash(r.hydrosol_volume_m3.map(units::volume))),
        (
            "Oil earlier in the run",
            or_dash(r.earlier.as_ref().map(|e| {
                format!("{} after {}", units::oil_volume(e.oil_volume_m3), units::duration(e.time_s))
            })),
        ),
        (
            "Oil content implied (plan's recovery rate)",
            or_dash(oil_content_percent_from_run(r).map(|p| format!("{} %", units::fixed(p, 2)))),
        ),
        ("Notes", or_dash(Some(r.note.clone()))),
    ]
}

fn set_printing(on: bool) {
    let Some(doc) = web_sys::window().and_then(|w| w.document()) else { return };
    if !on && let Some(old) = doc.get_element_by_id(PRINT_ID) {
        old.remove();
    }
    if let Some(html) = doc.document_element() {
        let classes = html.get_attribute("class").unwrap_or_default();
        let mut kept: Vec<&str> = classes.split_whitespace().filter(|c| *c != PRINTING_CLASS).collect();
        if on {
            kept.push(PRINTING_CLASS);
        }
        let _ = html.set_attribute("class", &kept.join(" "));
    }
}

/// Prints one record alone: a copy of its sheet under `<body>`, the class on `<html>` that
/// hides everything else in print, `window.print()`, and both taken away after printing.
fn print_sheet(sheet_id: &str) {
    let Some(w) = web_sys::window() else { return };
    let Some(doc) = w.document() else { return };
    set_printing(false);
    let (Some(sheet), Some(body)) = (doc.get_element_by_id(sheet_id), doc.body()) else { return };
    let Ok(copy) = sheet.clone_node_with_deep(true) else { return };
    let Ok(copy) = copy.dyn_into::<web_sys::Element>() else { return };
    copy.set_id(PRINT_ID);
    if body.append_child(&copy).is_err() {
        return;
    }
    set_printing(true);
    // Taken away on `afterprint` (see `RunList`); the next print clears it too.
    let _ = w.print();
}

/// The list of runs, newest first.
#[component]
pub fn RunList() -> impl IntoView {
    let wb = expect_context::<Workbench>();
    let runs = expect_context::<Runs>().runs;
    let printed = window_event_listener_untyped("afterprint", move |_| set_printing(false));
    on_cleanup(move || printed.remove());
    // The run deleted last and where it was: one tap brings it back (a wet thumb can mis-tap).
    let removed = RwSignal::new(None::<(usize, RunRecord)>);
    let undo = move |_| {
        if let Some((i, run)) = removed.get_untracked() {
            runs.update(|list| list.insert(i.min(list.len()), run));
            removed.set(None);
        }
    };
    let cards = move || {
        let system = wb.units.get();
        let list = runs.get();
        list.into_iter()
            .enumerate()
            .rev()
            .map(|(i, r)| {
                let sheet_id = format!("batch-sheet-{i}");
                let lines = units::with_system(system, || sheet_lines(&r));
                let summary = units::with_system(system, || {
                    format!(
                        "{} · {} · {} → {}",
                        or_dash(Some(r.date.clone())),
                        units::mass(r.plant_mass_kg),
                        units::duration(r.distilling_time_s),
                        units::oil_volume(r.oil_volume_m3)
                    )
                });
                let print_id = sheet_id.clone();
                let lot = r.lot.clone();
                view! {
                    <li class="run-card" data-run=lot.clone()>
                        <p class="run-head"><strong>{lot.clone()}</strong>" "{log::crop_name(r.crop.as_deref())}</p>
                        <p class="run-summary">{summary}</p>
                        <div class="batch-sheet" id=sheet_id>
                            <h2>{format!("Batch record {lot}")}</h2>
                            <dl>
                                {lines.into_iter().map(|(k, v)| view! { <dt>{k}</dt><dd>{v}</dd> }).collect_view()}
                            </dl>
                            <p class="sheet-foot">"Stillroom batch record. Steam, hot oil and fuel: follow your local codes."</p>
                        </div>
                        <div class="run-actions">
                            <button type="button" class="quiet run-print" on:click=move |_| print_sheet(&print_id)>
                                "Print this batch record"
                            </button>
                            <button type="button" class="quiet run-delete" aria-label=format!("Delete lot {lot}")
                                on:click=move |_| runs.update(|list| {
                                    if i < list.len() {
                                        removed.set(Some((i, list.remove(i))));
                                    }
                                })>"Delete"</button>
                        </div>
                    </li>
                }
            })
            .collect_view()
    };
    view! {
        <Show when=move || removed.with(|r| r.is_some())>
            <p class="hint run-removed" data-out="run_removed">
                {move || removed.with(|r| r.as_ref().map(|(_, r)| format!("Lot {} deleted. ", r.lot)))}
                <button type="button" id="run-undo" class="quiet" on:click=undo>"Undo"</button>
            </p>
        </Show>
        <ul class="runs">{cards}</ul>
    }
}
