//! The scenario as text: to copy into a message, a file or the command-line tool, and to paste
//! back in on another phone.

use crate::state::AppState;
use leptos::prelude::*;
use wasm_bindgen::JsCast;

#[component]
pub fn ScenarioText() -> impl IntoView {
    let state = expect_context::<AppState>();
    let open = RwSignal::new(false);
    let pasted = RwSignal::new(String::new());
    let outcome = RwSignal::new(None::<Result<(), String>>);
    let show_state = state.clone();
    // Serialised only while the section is open, not on every keystroke.
    let current =
        move || show_state.scenario.with(|d| serde_json::to_string_pretty(&d.scenario).unwrap_or_default());
    let load_state = state.clone();
    let load = move |_| {
        let result = load_state.import(&pasted.get_untracked());
        if result.is_ok() {
            pasted.set(String::new());
        }
        outcome.set(Some(result));
    };
    view! {
        <details class="share" on:toggle=move |ev| {
            let el: web_sys::HtmlDetailsElement = ev.target().unwrap().unchecked_into();
            open.set(el.open());
        }>
            <summary>"This plan as text"</summary>
            <Show when=move || open.get()>
                <div class="field">
                    <label for="scenario-out"><span class="label">"Copy this to keep or send the plan"</span></label>
                    <textarea id="scenario-out" readonly rows="8" prop:value=current></textarea>
                    <p class="hint">"The command-line tool reads the same text: stillroom plan scenario.json."</p>
                </div>
                <div class="field">
                    <label for="scenario-in"><span class="label">"Paste a plan here to open it"</span></label>
                    <textarea id="scenario-in" rows="5"
                        prop:value=move || pasted.get()
                        on:input=move |ev| pasted.set(event_target_value(&ev))></textarea>
                    <p class="error" id="scenario-in-error" aria-live="polite">
                        {move || outcome.get().and_then(|r| r.err())}
                    </p>
                    <p class="hint" aria-live="polite">
                        {move || matches!(outcome.get(), Some(Ok(()))).then_some("Opened: the form above now shows it.")}
                    </p>
                </div>
                <button type="button" id="scenario-load" on:click=load.clone()>"Open the pasted plan"</button>
            </Show>
        </details>
    }
}
