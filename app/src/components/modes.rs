//! The tab bar over the page's three views: the ordinary plan (kept alive while hidden, so
//! nothing typed there is lost), the workbench (saved plans and stills, compare, share, tables,
//! batch records) and the first-still designer. The last two are modules of their own, loaded
//! the first time their tab is opened; a scenario either sends back is opened in the plan.

use crate::bridge;
use crate::state::AppState;
use leptos::prelude::*;

/// Which of the page's views is shown.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum Mode {
    Plan,
    Workbench,
    FirstStill,
}

/// Which view the page shows, shared through context by the tab bar, the plan's wrapper in
/// `App` and the modules' roots.
#[derive(Debug, Clone, Copy)]
pub struct ShownMode(pub RwSignal<Mode>);

/// The loader each lazily loaded module has in `public/start.js`.
const FIRST_STILL_LOADER: &str = "stillroomFirstStill";
use bridge::WORKBENCH_LOADER;

/// Hands a text to the workbench (a share link, a kept-aside copy) and shows it.
pub fn to_workbench(mode: RwSignal<Mode>, kind: &str, text: &str) {
    bridge::post(kind, text);
    mode.set(Mode::Workbench);
}

/// A share link in the address (`#plan=…`) goes to the workbench, which opens it as a new saved
/// plan: the form is never replaced without asking.
fn take_share_link(mode: RwSignal<Mode>) {
    let hash = web_sys::window().and_then(|w| w.location().hash().ok()).unwrap_or_default();
    if hash.starts_with("#plan=") {
        to_workbench(mode, bridge::INBOX_LINK, &hash);
    }
}

#[component]
pub fn ModeTabs() -> impl IntoView {
    let mode = expect_context::<ShownMode>().0;
    // The start-up script loads each module once and keeps it; after a failed load, opening the
    // tab again tries again.
    Effect::new(move |_| match mode.get() {
        Mode::FirstStill => bridge::load_module(FIRST_STILL_LOADER),
        Mode::Workbench => {
            bridge::load_module(WORKBENCH_LOADER);
            bridge::send(bridge::SHOWN_EVENT, "");
        }
        Mode::Plan => {}
    });
    take_share_link(mode);
    let on_hash = window_event_listener_untyped("hashchange", move |_| take_share_link(mode));
    on_cleanup(move || on_hash.remove());
    let app = expect_context::<AppState>();
    // A plan the form cannot take (too large, a mixture of thousands, unreadable) is refused
    // before any of the form changes, and said at the top of the page.
    let handle = window_event_listener_untyped(bridge::OPEN_PLAN_EVENT, move |ev| {
        let text = bridge::detail(ev).filter(|j| j.len() <= crate::state::MAX_PASTE_BYTES);
        match text
            .ok_or_else(|| "it is not a text of up to 256 kB".to_string())
            .and_then(|j| crate::records::read_scenario(&j))
        {
            Ok(s) => {
                app.apply(&s);
                mode.set(Mode::Plan);
                if let Some(w) = web_sys::window() {
                    w.scroll_to_with_x_and_y(0.0, 0.0);
                }
            }
            Err(e) => {
                app.store.say(format!("That plan was not opened in the form: {e}. The form is unchanged."))
            }
        }
    });
    on_cleanup(move || handle.remove());
    let tab = move |m: Mode| move || if mode.get() == m { "true" } else { "false" };
    let button = move |m: Mode, id: &'static str, panel: &'static str, label: &'static str| {
        view! {
            <button type="button" role="tab" id=id aria-controls=panel
                aria-selected=tab(m) class:chosen=move || mode.get() == m
                on:click=move |_| mode.set(m)>{label}</button>
        }
    };
    view! {
        <div class="modes" role="tablist" aria-label="What to work out">
            {button(Mode::Plan, "mode-plan", "plan-view", "Plan a run")}
            {button(Mode::Workbench, "mode-workbench", "workbench-root", "Saved, compare & runs")}
            {button(Mode::FirstStill, "mode-first", "first-still-root", "Design a first still")}
        </div>
        <div id="workbench-root" role="tabpanel" aria-labelledby="mode-workbench" hidden=move || mode.get() != Mode::Workbench>
            <p class="hint">"Loading the workbench…"</p>
        </div>
        <div id="first-still-root" role="tabpanel" aria-labelledby="mode-first" hidden=move || mode.get() != Mode::FirstStill>
            <p class="hint">"Loading the first-still designer…"</p>
        </div>
    }
}
