//! The log out and in: the whole log as a run-log record (JSON) or as CSV, and a log pasted
//! back, merged without overwriting.

use super::{Runs, log};
use crate::records;
use crate::storage;
use leptos::prelude::*;

/// Export as JSON and CSV; import by pasting a log's text.
#[component]
pub fn Transfer() -> impl IntoView {
    let runs = expect_context::<Runs>();
    let pasted = RwSignal::new(String::new());
    let problem = RwSignal::new(None::<String>);
    let export_json = move |_| {
        let text =
            runs.lot_pattern.with_untracked(|p| runs.runs.with_untracked(|r| records::runs_text(r, p)));
        let name = format!("stillroom-runs-{}.json", storage::file_stamp());
        problem.set(storage::download(&name, &text).err());
    };
    let export_csv = move |_| {
        let text = runs.runs.with_untracked(|r| log::csv(r));
        let name = format!("stillroom-runs-{}.csv", storage::file_stamp());
        problem.set(storage::download(&name, &text).err());
    };
    let import = move |_| {
        let text = pasted.get_untracked();
        if text.trim().is_empty() {
            problem.set(Some("Paste a run log (the text of an exported .json file) first.".into()));
            return;
        }
        match runs.merge_text(text.trim()) {
            Ok(words) => {
                problem.set(None);
                runs.merged.set(Some(words));
                pasted.set(String::new());
            }
            Err(why) => {
                runs.merged.set(None);
                problem
                    .set(Some(format!("This is not a run log the page can read: {why}. Nothing was added.")));
            }
        }
    };
    view! {
        <div class="run-transfer">
            <h3>"Share or keep your log"</h3>
            <div class="run-export">
                <button type="button" id="run-export" on:click=export_json>"Download the log (JSON)"</button>
                <button type="button" id="run-export-csv" on:click=export_csv>"Download as CSV"</button>
            </div>
            <div class="field">
                <label for="run-import-text"><span class="label">"Add runs from a log (paste the JSON file's text)"</span></label>
                <textarea id="run-import-text" rows="4" spellcheck="false" aria-describedby="run-import-error"
                    maxlength=records::MAX_RUNS_TEXT_BYTES.to_string()
                    prop:value=move || pasted.get() on:input=move |ev| pasted.set(event_target_value(&ev))></textarea>
                <p class="error" id="run-import-error" aria-live="polite">{move || problem.get()}</p>
            </div>
            <button type="button" id="run-import" on:click=import>"Add these runs to my log"</button>
            <p class="hint" role="status" data-out="run_merged">{move || runs.merged.get()}</p>
        </div>
    }
}
