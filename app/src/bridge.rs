//! How the page's modules talk: the plan (the first module) and the modules loaded later (the
//! first-still designer, the workbench) share no memory, only the window. Three channels:
//!
//! - [`OPEN_PLAN_EVENT`]: a module asks the plan to open a scenario (its record text or bare
//!   JSON) in the form; the plan reads it like any pasted plan.
//! - the inbox: the plan hands the workbench a text to take in (a share link, a kept-aside copy
//!   to try again), queued on `window.stillroomInbox` so nothing is lost while the module is
//!   still loading, and announced with [`INBOX_EVENT`].
//! - `window.stillroomCurrentPlan()` and `window.stillroomUnits()`, set by the plan: the form's
//!   scenario as a record text, and the units in force ([`UNITS_EVENT`] announces a change);
//!   `window.stillroomWorkbenchRecords()`, set by the workbench: its run log and saved plans
//!   and stills as they are in memory.

use wasm_bindgen::JsCast;
use wasm_bindgen::prelude::*;

/// A module asks the plan to open a scenario in the form (detail: its JSON text).
pub const OPEN_PLAN_EVENT: &str = "stillroom-open-plan";
/// Something waits in the workbench's inbox.
pub const INBOX_EVENT: &str = "stillroom-inbox";
/// The workbench's tab was shown again: what it read from the plan may have changed.
pub const SHOWN_EVENT: &str = "stillroom-workbench-shown";
/// The grower switched units (detail: the units' key).
pub const UNITS_EVENT: &str = "stillroom-units";
/// A module copied an unreadable record aside (detail: the record's slug): the plan page's
/// list of kept copies, read at start, is read again.
pub const KEPT_EVENT: &str = "stillroom-kept";
/// What an inbox item holds.
pub const INBOX_LINK: &str = "link";
pub const INBOX_PLAN: &str = "plan";
pub const INBOX_RUNLOG: &str = "runlog";
pub const INBOX_LIBRARY: &str = "library";
/// A designed still (a scenario's JSON) for the workbench to keep under "Saved stills".
pub const INBOX_STILL: &str = "still";
/// The workbench module's loader on the window (`public/start.js`).
pub const WORKBENCH_LOADER: &str = "stillroomWorkbench";

const INBOX: &str = "stillroomInbox";
const CURRENT_PLAN: &str = "stillroomCurrentPlan";
const UNITS: &str = "stillroomUnits";
const WORKBENCH_RECORDS: &str = "stillroomWorkbenchRecords";

fn window() -> Option<web_sys::Window> {
    web_sys::window()
}

/// Dispatches `event` on the window with a text as its detail.
pub fn send(event: &str, detail: &str) {
    let Some(window) = window() else { return };
    let init = web_sys::CustomEventInit::new();
    init.set_detail(&JsValue::from_str(detail));
    if let Ok(ev) = web_sys::CustomEvent::new_with_event_init_dict(event, &init) {
        let _ = window.dispatch_event(&ev);
    }
}

/// The text an event of [`send`] carries.
pub fn detail(ev: web_sys::Event) -> Option<String> {
    ev.dyn_into::<web_sys::CustomEvent>().ok().and_then(|e| e.detail().as_string())
}

fn inbox(window: &web_sys::Window) -> Option<js_sys::Array> {
    let found =
        js_sys::Reflect::get(window, &INBOX.into()).ok().and_then(|v| v.dyn_into::<js_sys::Array>().ok());
    found.or_else(|| {
        let fresh = js_sys::Array::new();
        js_sys::Reflect::set(window, &INBOX.into(), &fresh).ok()?;
        Some(fresh)
    })
}

/// Queues `(kind, text)` for the workbench and announces it.
pub fn post(kind: &str, text: &str) {
    let Some(w) = window() else { return };
    if let Some(list) = inbox(&w) {
        list.push(&js_sys::Array::of2(&kind.into(), &text.into()));
    }
    send(INBOX_EVENT, kind);
}

/// Everything queued for the workbench, oldest first; the queue is emptied.
pub fn take_inbox() -> Vec<(String, String)> {
    let Some(list) = window().and_then(|w| inbox(&w)) else { return Vec::new() };
    let items: Vec<(String, String)> = list
        .iter()
        .filter_map(|item| {
            let pair = item.dyn_into::<js_sys::Array>().ok()?;
            Some((pair.get(0).as_string()?, pair.get(1).as_string()?))
        })
        .collect();
    list.set_length(0);
    items
}

/// The queued texts of one kind, oldest first, removed from the queue; items of other kinds stay
/// queued, in their order, for the part that takes them.
pub fn take_inbox_of(kind: &str) -> Vec<String> {
    let Some(list) = window().and_then(|w| inbox(&w)) else { return Vec::new() };
    let mut taken = Vec::new();
    let mut i = 0;
    while i < list.length() {
        let pair = list.get(i).dyn_into::<js_sys::Array>().ok();
        let text = pair
            .as_ref()
            .filter(|p| p.get(0).as_string().as_deref() == Some(kind))
            .map(|p| p.get(1).as_string());
        match text {
            Some(text) => {
                list.splice_many(i, 1, &[]);
                taken.extend(text);
            }
            None => i += 1,
        }
    }
    taken
}

/// Sets `window.<name>` to a function returning a text.
fn expose(name: &str, f: impl Fn() -> String + 'static) {
    let Some(w) = window() else { return };
    let closure = Closure::<dyn Fn() -> String>::new(f);
    let _ = js_sys::Reflect::set(&w, &name.into(), closure.as_ref());
    closure.forget();
}

fn call(name: &str) -> Option<String> {
    let w = window()?;
    let f = js_sys::Reflect::get(&w, &name.into()).ok()?.dyn_into::<js_sys::Function>().ok()?;
    f.call0(&w).ok()?.as_string()
}

/// The plan offers its form's scenario (as a record text) to the other modules.
pub fn expose_current_plan(f: impl Fn() -> String + 'static) {
    expose(CURRENT_PLAN, f);
}

/// The plan's form scenario now, as a record text; `None` when the plan is not running.
pub fn current_plan_text() -> Option<String> {
    call(CURRENT_PLAN)
}

/// The workbench offers its records as they are in memory: a JSON object with
/// `run_log_record` and `library_record`.
pub fn expose_workbench_records(f: impl Fn() -> String + 'static) {
    expose(WORKBENCH_RECORDS, f);
}

/// The workbench's records in memory (see [`expose_workbench_records`]); `None` until the
/// workbench has loaded.
pub fn workbench_records() -> Option<String> {
    call(WORKBENCH_RECORDS)
}

/// The plan offers the units in force.
pub fn expose_units(f: impl Fn() -> String + 'static) {
    expose(UNITS, f);
}

/// For `cargo xtask bench`: `window.stillroomBenchPlan(batches, per_batch)` plans the form's
/// scenario `batches` times `per_batch` times and returns each batch's time per plan in µs
/// (JSON), timed with `performance.now()` (whose resolution, 0.1 ms in Chromium, is why plans
/// are timed in batches); `window.stillroomWasmBytes()` is the module's memory in bytes.
pub fn expose_bench(plan_once: impl Fn() + 'static) {
    let Some(w) = window() else { return };
    let timed = Closure::<dyn Fn(u32, u32) -> String>::new(move |batches: u32, per_batch: u32| {
        let Some(perf) = window().and_then(|w| w.performance()) else { return String::new() };
        let per_batch = per_batch.max(1);
        let times: Vec<String> = (0..batches.min(10_000))
            .map(|_| {
                let start = perf.now();
                for _ in 0..per_batch {
                    plan_once();
                }
                format!("{:.2}", (perf.now() - start) * 1000.0 / f64::from(per_batch))
            })
            .collect();
        format!("[{}]", times.join(","))
    });
    let _ = js_sys::Reflect::set(&w, &"stillroomBenchPlan".into(), timed.as_ref());
    timed.forget();
    expose("stillroomWasmBytes", || {
        let buffer = js_sys::Reflect::get(&wasm_bindgen::memory(), &"buffer".into());
        let bytes = buffer.and_then(|b| js_sys::Reflect::get(&b, &"byteLength".into()));
        bytes.ok().and_then(|b| b.as_f64()).map(|b| format!("{b}")).unwrap_or_default()
    });
}

/// The units in force on the page (metric if the plan does not say).
pub fn units() -> crate::units::UnitSystem {
    call(UNITS).and_then(|k| crate::units::UnitSystem::from_key(&k)).unwrap_or_default()
}

/// Asks the page's start-up script to load a lazily loaded module by the name of its loader on
/// the window (`public/start.js`): it loads once and is kept; a failed load tries again.
pub fn load_module(loader: &str) {
    let Some(w) = window() else { return };
    let f = js_sys::Reflect::get(&w, &loader.into()).ok().and_then(|f| f.dyn_into::<js_sys::Function>().ok());
    if let Some(f) = f {
        let _ = f.call0(&w);
    }
}
