//! The Stillroom page: a thin shell around the core. It collects the inputs, calls the core's
//! one entry point, and shows the plan.

pub mod components;
pub mod fields;
pub mod state;
pub mod units;

use components::cautions::Cautions;
use components::inputs::{EquipmentInputs, EssentialInputs};
use components::results::{Details, Headline, Warnings};
use components::runlog::RunLog;
use components::share::ScenarioText;
use leptos::prelude::*;
use state::AppState;

#[cfg(test)]
wasm_bindgen_test::wasm_bindgen_test_configure!(run_in_browser);

/// The page's root component.
#[component]
pub fn App() -> impl IntoView {
    let state = AppState::new();
    let notice = state.notice;
    provide_context(state);
    view! {
        <header class="masthead">
            <h1>"Stillroom"</h1>
            <p class="lede">"Plan a steam-distillation run: steam, time, fuel, water, hydrosol and separator, from your crop and your site."</p>
        </header>
        <main class="page">
            <Show when=move || notice.get().is_some()>
                <p class="notice" role="status" data-out="storage_notice">{move || notice.get()}</p>
            </Show>
            <components::first_still::Modes>
            // On a phone the answers follow the first inputs; on a wide screen inputs sit left.
            <div class="columns">
                <div class="col-in"><EssentialInputs /></div>
                <div class="col-out"><Headline /><Warnings /></div>
                <div class="col-in"><EquipmentInputs /><RunLog /><ScenarioText /></div>
                <div class="col-out"><Details /></div>
            </div>
            </components::first_still::Modes>
            <Cautions />
        </main>
        <footer class="colophon">
            <p>"Works offline once loaded. Your entries stay in this browser. The starting example (a 15 kg lavender charge at Larkfield Farm) is invented."</p>
        </footer>
    }
}
