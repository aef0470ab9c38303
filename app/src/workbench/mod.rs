//! The workbench: what an extension agent and a working still need beyond one plan. A module of
//! its own (`src/workbench_main.rs`), loaded the first time its tab is opened; it talks to the
//! plan only through [`crate::bridge`]: it reads the form's scenario and the units from the
//! plan, and asks the plan to open a scenario in the form.
//!
//! Each part keeps its own state, provided through context, and its own saved record through a
//! [`Store`] (the storage sync of the module, in one place per record).

pub mod backup;
pub mod compare;
pub mod library;
pub mod library_view;
pub mod runs;
pub mod share;
pub mod share_view;
pub mod tables;

use crate::bridge;
use crate::records;
use crate::store::Store;
use crate::units::UnitSystem;
use leptos::prelude::*;
use stillroom_core::Scenario;

/// What every part of the workbench shares: the units in force, the plan's form scenario as last
/// seen, and the module's storage notices.
#[derive(Clone, Copy)]
pub struct Workbench {
    pub units: RwSignal<UnitSystem>,
    /// The plan's form scenario, read when the workbench is opened or shown again.
    pub current: RwSignal<Option<Scenario>>,
    pub store: Store,
}

impl Workbench {
    fn new() -> Workbench {
        let wb = Workbench {
            units: RwSignal::new(bridge::units()),
            current: RwSignal::new(None),
            store: Store::new(records::Kind::problem),
        };
        wb.refresh();
        wb
    }

    /// Reads the plan's form scenario and units again.
    pub fn refresh(&self) {
        let current = bridge::current_plan_text().and_then(|t| records::read_scenario(&t).ok());
        self.current.set(current);
        self.units.set(bridge::units());
    }

    /// Asks the plan to open `scenario` in its form.
    pub fn open_in_plan(&self, scenario: &Scenario) {
        if let Ok(json) = serde_json::to_string(scenario) {
            bridge::send(bridge::OPEN_PLAN_EVENT, &json);
        }
    }
}

/// The workbench's sections.
#[component]
pub fn WorkbenchView() -> impl IntoView {
    let wb = Workbench::new();
    provide_context(wb);
    // Every part's state first, so any part may use another's.
    let runs = runs::Runs::new(wb);
    provide_context(runs);
    let lib = library::Library::new(wb);
    provide_context(lib);
    // Every record read: what could not be, told once.
    wb.store.report_found();
    // The plan's "Download everything" takes these records from here, as they are in memory, so
    // entries whose save failed are in the file too.
    bridge::expose_workbench_records(move || {
        let log = runs.lot_pattern.with_untracked(|p| runs.runs.with_untracked(|r| records::runs_text(r, p)));
        let library =
            lib.plans.with_untracked(|p| lib.stills.with_untracked(|s| library::library_text(p, s)));
        format!(r#"{{"run_log_record":{log},"library_record":{library}}}"#)
    });
    provide_context(library_view::Shelf::new(wb, expect_context::<library::Library>()));
    let shown = window_event_listener_untyped(bridge::SHOWN_EVENT, move |_| wb.refresh());
    on_cleanup(move || shown.remove());
    let units = window_event_listener_untyped(bridge::UNITS_EVENT, move |_| wb.units.set(bridge::units()));
    on_cleanup(move || units.remove());
    // The page's shell asks before an update reload while this is set, as it does for the
    // plan's entries (public/start.js): the workbench's unsaved entries live only on the page.
    Effect::new(move |_| {
        let unsaved = wb.store.unsaved().is_some();
        if let Some(root) = web_sys::window().and_then(|w| w.document()).and_then(|d| d.document_element()) {
            let _ = if unsaved {
                root.set_attribute("data-unsaved-workbench", "")
            } else {
                root.remove_attribute("data-unsaved-workbench")
            };
        }
    });
    let notice = wb.store.notice;
    view! {
        <div id="workbench" class="workbench">
            <Show when=move || notice.with(|n| n.is_some())>
                <p class="notice" role="status" data-out="workbench_notice">{move || notice.get()}</p>
            </Show>
            <p class="error" role="alert">{move || wb.store.unsaved()}</p>
            <library_view::SavedParts />
            <runs::RunLog />
            <compare::Compare />
            <tables::Tables />
        </div>
    }
}

/// Mounts the workbench into the page's `#workbench-root`, replacing its loading line (the
/// workbench module's entry point).
pub fn mount() {
    let root =
        web_sys::window().and_then(|w| w.document()).and_then(|d| d.get_element_by_id("workbench-root"));
    if let Some(root) = root {
        use wasm_bindgen::JsCast;
        root.set_inner_html("");
        if let Ok(root) = root.dyn_into::<web_sys::HtmlElement>() {
            leptos::mount::mount_to(root, WorkbenchView).forget();
        }
    }
}
