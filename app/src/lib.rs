//! The Stillroom page: a thin shell around the core. It collects the inputs, calls the core's
//! one entry point, and shows the plan.

pub mod bridge;
pub mod components;
pub mod fields;
pub mod records;
pub mod sources;
pub mod state;
pub mod storage;
pub mod store;
pub mod units;
pub mod workbench;

use components::cautions::Cautions;
use components::inputs::{EquipmentInputs, EssentialInputs, InstallHint, UnitsChoice};
use components::kept_aside::{KeptAside, StorageNotices};
use components::modes::{Mode, ModeTabs, ShownMode};
use components::results::{Details, Headline, Warnings};
use components::run_sheet::{PrintSheet, RunSheet};
use leptos::prelude::*;
use state::AppState;

#[cfg(test)]
wasm_bindgen_test::wasm_bindgen_test_configure!(run_in_browser);

/// The page's root component.
#[component]
pub fn App() -> impl IntoView {
    let state = AppState::new();
    provide_context(state);
    let mode = RwSignal::new(Mode::Plan);
    provide_context(ShownMode(mode));
    // The static loading message of index.html goes once the page is live.
    if let Some(el) =
        web_sys::window().and_then(|w| w.document()).and_then(|d| d.get_element_by_id("loading"))
    {
        el.remove();
    }
    view! {
        <header class="masthead">
            <div class="masthead-row">
                <h1>"Stillroom"</h1>
                <UnitsChoice />
            </div>
            <p class="lede">"Plan a steam-distillation run from your crop and your site."</p>
            <InstallHint />
        </header>
        <main class="page">
            <StorageNotices />
            <KeptAside />
            <ModeTabs />
            // On a phone the answers come first, the inputs after; on a wide screen inputs sit
            // left and answers right.
            <div id="plan-view" role="tabpanel" aria-labelledby="mode-plan" class="columns" hidden=move || mode.get() != Mode::Plan>
                <div class="col-out"><Headline /><Warnings /><RunSheet /><PrintSheet /></div>
                <div class="col-in"><EssentialInputs /><EquipmentInputs /></div>
                <div class="col-out"><Details /></div>
            </div>
            <Cautions />
        </main>
        <footer class="colophon">
            <p>"Works offline once loaded. Your entries stay in this browser. The starting example (a 15 kg lavender charge at Larkfield Farm) is invented."</p>
        </footer>
    }
}
