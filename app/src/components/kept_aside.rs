//! Saved data the page could not read, and the notices about saved data: what was found at
//! start, entries that could not be saved, and the way out (download everything).

use crate::bridge;
use crate::components::modes::{ShownMode, to_workbench};
use crate::records::{self, Kind};
use crate::state::AppState;
use crate::storage::{self, KeptCopy};
use leptos::prelude::*;

/// What the page found in storage when it started, and whether the latest entries are saved.
/// A failed save is told twice: in the notices at the top, and at once in a bar at the foot of
/// the screen (wherever the grower is typing), which they may hide until the next new problem.
#[component]
pub fn StorageNotices() -> impl IntoView {
    let state = expect_context::<AppState>();
    let store = state.store;
    let failed = RwSignal::new(None::<String>);
    let unsaved = Memo::new(move |_| store.unsaved());
    let hidden_for = RwSignal::new(None::<String>);
    let toast = move || unsaved.get().is_some_and(|u| hidden_for.get().as_deref() != Some(u.as_str()));
    let dl = state.clone();
    let download = move |_| failed.set(dl.download_everything().err());
    let download_too = download.clone();
    view! {
        <Show when=move || store.notice.get().is_some()>
            <p class="notice" role="status" data-out="storage_notice">{move || store.notice.get()}</p>
        </Show>
        <Show when=move || unsaved.get().is_some()>
            <div class="notice unsaved" data-out="save_problem">
                <p>{move || unsaved.get()}</p>
                <button type="button" id="download-all" on:click=download.clone()>"Download everything"</button>
                <p class="error">{move || failed.get()}</p>
            </div>
        </Show>
        <Show when=toast>
            <div class="save-toast" role="alert" data-out="save_toast">
                <p>"Not saved in this browser. Your entries stay while this page is open."</p>
                <button type="button" id="download-all-toast" on:click=download_too.clone()>"Download everything"</button>
                <button type="button" class="quiet" id="save-toast-hide" on:click=move |_| hidden_for.set(unsaved.get_untracked())>"Hide"</button>
            </div>
        </Show>
    }
}

fn describe(k: &KeptCopy) -> String {
    let what = match k.kind {
        Some(kind) => format!("Saved {}", kind.word()),
        None => "Saved data".to_string(),
    };
    let when = match (k.held, k.kept_ms) {
        (true, _) => "still in its place (no room to copy it aside)".to_string(),
        (false, Some(ms)) => format!("kept aside {}", storage::local_time(ms)),
        (false, None) => "kept aside".to_string(),
    };
    format!("{what}, {when}, {} characters", k.chars)
}

/// One kept copy: what it is, why it could not be read, and what to do with it.
#[component]
fn KeptLine(copy: KeptCopy, index: usize) -> impl IntoView {
    let state = expect_context::<AppState>();
    let store = state.store;
    let confirming = RwSignal::new(false);
    let outcome = RwSignal::new(None::<Result<String, String>>);
    let key = copy.key.clone();
    let kind = copy.kind;

    let dl_key = key.clone();
    let download = move |_| {
        let text = storage::get(&dl_key).ok().flatten().unwrap_or_default();
        let name = format!(
            "stillroom-kept-{}-{}.json",
            kind.map(Kind::slug).unwrap_or("data"),
            storage::file_stamp()
        );
        outcome.set(storage::download(&name, &text).err().map(Err));
    };
    let open_key = key.clone();
    let mode = expect_context::<ShownMode>().0;
    // Opened in the workbench: a plan as a new saved plan (never over the form), a run log
    // merged into the runs.
    let open = move |_| {
        let text = storage::get(&open_key).ok().flatten().unwrap_or_default();
        // Read as the plan module reads at start: a run log or library in outline, the
        // workbench telling what it still cannot read of the rest.
        let result = match kind {
            Some(k @ Kind::RunLog) => k.first_look(&text).map(|_| bridge::INBOX_RUNLOG),
            Some(k @ Kind::Library) => k.first_look(&text).map(|_| bridge::INBOX_LIBRARY),
            _ => records::read_scenario(&text).map(|_| bridge::INBOX_PLAN),
        };
        match result {
            Ok(inbox) => {
                to_workbench(mode, inbox, &text);
                outcome.set(Some(Ok("Opened in “Saved, compare & runs”.".to_string())));
            }
            Err(e) => outcome.set(Some(Err(format!("It still cannot be read: {e}.")))),
        }
    };
    let del_key = key.clone();
    let del_state = state.clone();
    let delete = move |_| {
        confirming.set(false);
        if store.delete(&del_key) {
            del_state.save_now();
        } else {
            outcome.set(Some(Err("It could not be deleted.".into())));
        }
    };
    view! {
        <li class="kept" data-kept=index data-key=key.clone()>
            <p class="kept-what">{describe(&copy)}</p>
            <p class="hint">{format!("Why: {}.", copy.reason)}</p>
            <div class="kept-actions">
                <button type="button" class="kept-download" on:click=download>"Download"</button>
                <button type="button" class="kept-open" on:click=open>"Try to open"</button>
                <Show when=move || !confirming.get()>
                    <button type="button" class="quiet kept-delete" on:click=move |_| confirming.set(true)>"Delete…"</button>
                </Show>
            </div>
            <Show when=move || confirming.get()>
                <div class="kept-confirm" role="group" aria-label="Confirm delete">
                    <p>"Delete it from this browser for good? Download it first if you may need it."</p>
                    <button type="button" class="danger kept-delete-yes" on:click=delete.clone()>"Yes, delete it"</button>
                    <button type="button" class="quiet kept-delete-no" on:click=move |_| confirming.set(false)>"Keep it"</button>
                </div>
            </Show>
            <p class="error" aria-live="polite">{move || outcome.get().and_then(|r| r.err())}</p>
            <p class="hint" aria-live="polite">{move || outcome.get().and_then(|r| r.ok())}</p>
        </li>
    }
}

/// The list of saved data the page could not read, shown only when there is some.
#[component]
pub fn KeptAside() -> impl IntoView {
    let state = expect_context::<AppState>();
    let kept = state.store.kept;
    // The workbench reads its records field by field when it opens, and may copy one aside.
    let store = state.store;
    let listener = window_event_listener_untyped(bridge::KEPT_EVENT, move |_| store.refresh_kept());
    on_cleanup(move || listener.remove());
    view! {
        <Show when=move || kept.with(|k| !k.is_empty())>
            <section class="kept-aside" aria-labelledby="h-kept" id="kept-aside">
                <h2 id="h-kept">"Saved data the page could not read"</h2>
                <p class="hint">"Kept in this browser so nothing is lost. Download a copy to keep it safe, try to open it, or delete it."</p>
                <ul class="kept-list">
                    {move || kept.get().into_iter().enumerate().map(|(i, copy)| view! { <KeptLine copy=copy index=i /> }).collect_view()}
                </ul>
            </section>
        </Show>
    }
}
