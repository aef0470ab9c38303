//! Everything the grower saved, out to one file and back in: the same shape as the plan's
//! "Download everything" (`{stillroom_export: 1, plan_record, library_record, run_log_record,
//! kept_aside}`), here from memory, so the latest entries are in it even when storage is full.
//!
//! Taking a file in never overwrites: the plan record and each saved plan or still become new
//! entries (a name already used gets " (2)"), entries identical to one already here are skipped,
//! runs are merged by equality, and kept-aside texts that still cannot be read are kept aside
//! here too. The grower is told what was added and what skipped.

use super::Workbench;
use super::library::{Library, LibraryRecord, SavedPlan, read_library};
use super::library_view::{Shelf, unique_name};
use super::runs::Runs;
use crate::records::{self, BACKUP_PREFIX, Kind};
use crate::storage;
use leptos::prelude::*;
use serde_json::Value;
use wasm_bindgen::JsCast;

/// The largest file the page takes in: about what a browser's storage for the page holds.
pub const MAX_IMPORT_BYTES: usize = 5 * 1024 * 1024;
/// The version of the export file's envelope.
const EXPORT_VERSION: u64 = 1;

/// What a merge did.
#[derive(Debug, Default, Clone, Copy, PartialEq, Eq)]
pub struct Merged {
    pub added: usize,
    pub skipped: usize,
}

impl Merged {
    fn and(self, other: Merged) -> Merged {
        Merged { added: self.added + other.added, skipped: self.skipped + other.skipped }
    }

    /// "2 saved plans and stills added, 1 skipped (already here)."
    pub fn words(self, what: &str) -> String {
        format!("{what}: {} added, {} skipped (already here).", self.added, self.skipped)
    }
}

fn same_name(a: &str, b: &str) -> bool {
    a.trim().to_lowercase() == b.trim().to_lowercase()
}

/// Adds each plan and still of `record` as a new entry, unless one of the same name and content
/// is here already; a name in use gets a number.
pub fn merge_library(lib: Library, record: LibraryRecord) -> Merged {
    let mut m = Merged::default();
    for p in record.plans {
        let here = lib
            .plans
            .with_untracked(|l| l.iter().any(|x| same_name(&x.name, &p.name) && x.scenario == p.scenario));
        if here {
            m.skipped += 1;
            continue;
        }
        let names: Vec<String> = lib.plans.with_untracked(|l| l.iter().map(|x| x.name.clone()).collect());
        let name = unique_name(&p.name, &names.iter().map(String::as_str).collect::<Vec<_>>());
        let id = lib.fresh_id();
        lib.plans.update(|l| l.push(SavedPlan { id, name, ..p }));
        m.added += 1;
    }
    for s in record.stills {
        let here = lib
            .stills
            .with_untracked(|l| l.iter().any(|x| same_name(&x.name, &s.name) && x.equipment == s.equipment));
        if here {
            m.skipped += 1;
            continue;
        }
        let names: Vec<String> = lib.stills.with_untracked(|l| l.iter().map(|x| x.name.clone()).collect());
        let name = unique_name(&s.name, &names.iter().map(String::as_str).collect::<Vec<_>>());
        let id = lib.fresh_id();
        lib.stills.update(|l| l.push(super::library::SavedStill { id, name, ..s }));
        m.added += 1;
    }
    m
}

/// The export file's text, from what the workbench holds now.
pub fn export_text(wb: Workbench, lib: Library, runs: Runs) -> String {
    let as_json = |t: String| serde_json::from_str::<Value>(&t).unwrap_or(Value::Null);
    let plan = wb.current.get_untracked().map(|s| as_json(records::scenario_text(&s))).unwrap_or(Value::Null);
    let library =
        lib.plans.with_untracked(|p| lib.stills.with_untracked(|s| super::library::library_text(p, s)));
    let log = runs.lot_pattern.with_untracked(|p| runs.runs.with_untracked(|r| records::runs_text(r, p)));
    let kept: Vec<Value> = storage::kept_copies(&[], Kind::problem)
        .iter()
        .map(|k| {
            serde_json::json!({
                "key": k.key,
                "reason": k.reason,
                "text": storage::get(&k.key).ok().flatten().unwrap_or_default(),
            })
        })
        .collect();
    let all = serde_json::json!({
        "stillroom_export": EXPORT_VERSION,
        "plan_record": plan,
        "run_log_record": as_json(log),
        "library_record": as_json(library),
        "kept_aside": kept,
    });
    serde_json::to_string_pretty(&all).unwrap_or_default()
}

/// Takes a plan in as a new saved plan unless a saved plan has the same scenario.
fn take_plan(shelf: Shelf, s: stillroom_core::Scenario, base: &str) -> Merged {
    if shelf.lib.plans.with_untracked(|l| l.iter().any(|x| x.scenario == s)) {
        return Merged { added: 0, skipped: 1 };
    }
    shelf.add_plan(base, s);
    Merged { added: 1, skipped: 0 }
}

fn take_runs(runs: Runs, raw: &str) -> Result<Merged, String> {
    let list = records::read_runs(raw)?.runs;
    let (added, skipped) = runs.merge(list);
    Ok(Merged { added, skipped })
}

/// A kept-aside text from the file: taken in if it reads now, else kept aside here (once).
fn take_kept(shelf: Shelf, runs: Runs, key: &str, text: &str) -> Result<Merged, String> {
    let slug = key.strip_prefix(BACKUP_PREFIX).and_then(|r| r.split('.').next()).unwrap_or("");
    let kind = match slug {
        "runlog" => Kind::RunLog,
        "library" => Kind::Library,
        _ => Kind::Plan,
    };
    let stamp = storage::local_time(storage::now_ms());
    let read = match kind {
        Kind::Plan => {
            records::read_scenario(text).map(|s| take_plan(shelf, s, &format!("Imported plan, {stamp}")))
        }
        Kind::RunLog => take_runs(runs, text),
        Kind::Library => read_library(text).map(|r| merge_library(shelf.lib, r)),
    };
    if let Ok(m) = read {
        return Ok(m);
    }
    let here = storage::kept_copies(&[], Kind::problem)
        .iter()
        .any(|k| storage::get(&k.key).ok().flatten().as_deref() == Some(text));
    if here {
        return Ok(Merged { added: 0, skipped: 1 });
    }
    storage::keep_aside(kind, text)
        .map(|_| Merged { added: 1, skipped: 0 })
        .map_err(|e| format!("a copy the page could not read was not kept: {}", e.words()))
}

fn field_text(v: &Value) -> Option<String> {
    if v.is_null() { None } else { serde_json::to_string(v).ok() }
}

/// Takes in a chosen file's text: an export file, a plan, a library or a run-log record. What
/// was added and skipped, or why nothing could be.
pub fn import(shelf: Shelf, runs: Runs, text: &str) -> Result<String, String> {
    if text.len() > MAX_IMPORT_BYTES {
        return Err(format!(
            "This file is {} kB; the page takes files of up to {} kB. Nothing was added.",
            text.len().div_ceil(1024),
            MAX_IMPORT_BYTES / 1024
        ));
    }
    let value: Value = serde_json::from_str(text).map_err(|e| {
        format!("This file is not one the page saved (not JSON text: {e}). Nothing was added.")
    })?;
    let stamp = storage::local_time(storage::now_ms());
    let Some(obj) = value.as_object() else {
        return Err("This file is not one the page saved (not a JSON object). Nothing was added.".into());
    };
    if let Some(v) = obj.get("stillroom_export") {
        match v.as_u64() {
            Some(EXPORT_VERSION) => {}
            Some(n) if n > EXPORT_VERSION => {
                return Err(format!(
                    "This file was written by a newer version of the page (export version {n}). Reload the page to update it, then try again. Nothing was added."
                ));
            }
            _ => {
                return Err(
                    "This file's stillroom_export is not a version the page knows. Nothing was added.".into(),
                );
            }
        }
        if let Some(k) = obj.keys().find(|k| {
            !["stillroom_export", "plan_record", "run_log_record", "library_record", "kept_aside"]
                .contains(&k.as_str())
        }) {
            return Err(format!("This file has a part the page does not know (“{k}”). Nothing was added."));
        }
        // Every part is read before any is taken in, so a bad file adds nothing.
        let plan = match obj.get("plan_record").and_then(field_text) {
            Some(t) => Some(
                records::read_scenario(&t)
                    .map_err(|e| format!("Its plan cannot be read: {e}. Nothing was added."))?,
            ),
            None => None,
        };
        let library = match obj.get("library_record").and_then(field_text) {
            Some(t) => Some(
                read_library(&t)
                    .map_err(|e| format!("Its saved plans cannot be read: {e}. Nothing was added."))?,
            ),
            None => None,
        };
        let log = match obj.get("run_log_record").and_then(field_text) {
            Some(t) => Some(
                records::read_runs(&t)
                    .map_err(|e| format!("Its run log cannot be read: {e}. Nothing was added."))?,
            ),
            None => None,
        };
        let mut kept = Vec::new();
        for (i, k) in obj.get("kept_aside").and_then(Value::as_array).into_iter().flatten().enumerate() {
            let key = k.get("key").and_then(Value::as_str);
            let t = k.get("text").and_then(Value::as_str);
            match (key, t) {
                (Some(key), Some(t)) => kept.push((key.to_string(), t.to_string())),
                _ => return Err(format!("kept_aside[{i}] has no key and text. Nothing was added.")),
            }
        }
        let mut said = Vec::new();
        let mut plans = Merged::default();
        // The library first: the form's plan is often one of its saved plans.
        if let Some(r) = library {
            plans = plans.and(merge_library(shelf.lib, r));
        }
        if let Some(s) = plan {
            plans = plans.and(take_plan(shelf, s, &format!("Imported form plan, {stamp}")));
        }
        said.push(plans.words("Saved plans and stills"));
        if let Some(list) = log {
            let (added, skipped) = runs.merge(list.runs);
            said.push(Merged { added, skipped }.words("Logged runs"));
        }
        if !kept.is_empty() {
            let mut m = Merged::default();
            let mut failed = None;
            for (key, t) in kept {
                match take_kept(shelf, runs, &key, &t) {
                    Ok(x) => m = m.and(x),
                    Err(e) => failed = Some(e),
                }
            }
            said.push(m.words("Copies the page could not read"));
            if let Some(e) = failed {
                said.push(format!("But {e}."));
            }
        }
        return Ok(said.join(" "));
    }
    if obj.contains_key("plans") || obj.contains_key("stills") {
        let r = read_library(text)
            .map_err(|e| format!("These saved plans cannot be read: {e}. Nothing was added."))?;
        return Ok(merge_library(shelf.lib, r).words("Saved plans and stills"));
    }
    if obj.contains_key("runs") {
        return take_runs(runs, text)
            .map(|m| m.words("Logged runs"))
            .map_err(|e| format!("This run log cannot be read: {e}. Nothing was added."));
    }
    let s = records::read_scenario(text)
        .map_err(|e| format!("This is not a file the page can read: {e}. Nothing was added."))?;
    Ok(take_plan(shelf, s, &format!("Imported plan, {stamp}")).words("Saved plans"))
}

/// Reads the file chosen in an `<input type=file>`, then takes it in.
fn read_chosen(
    input: web_sys::HtmlInputElement,
    shelf: Shelf,
    runs: Runs,
    outcome: RwSignal<Option<Result<String, String>>>,
) {
    let Some(file) = input.files().and_then(|f| f.get(0)) else { return };
    // Refused before reading: a huge file is not read into memory at all.
    if file.size() > MAX_IMPORT_BYTES as f64 {
        outcome.set(Some(Err(format!(
            "This file is {} kB; the page takes files of up to {} kB. Nothing was added.",
            (file.size() / 1024.0).ceil(),
            MAX_IMPORT_BYTES / 1024
        ))));
        input.set_value("");
        return;
    }
    leptos::task::spawn_local(async move {
        let text = wasm_bindgen_futures::JsFuture::from(file.text()).await;
        let result = match text.ok().and_then(|t| t.as_string()) {
            Some(t) => import(shelf, runs, &t),
            None => Err("The file could not be read. Nothing was added.".into()),
        };
        outcome.set(Some(result));
        input.set_value("");
    });
}

/// Download everything, and take a file in.
#[component]
pub fn Backup() -> impl IntoView {
    let shelf = expect_context::<Shelf>();
    let runs = expect_context::<Runs>();
    let outcome = RwSignal::new(None::<Result<String, String>>);
    let export = move |_| {
        shelf.wb.refresh();
        let text = export_text(shelf.wb, shelf.lib, runs);
        let name = format!("stillroom-everything-{}.json", storage::file_stamp());
        outcome.set(storage::download(&name, &text).err().map(Err));
    };
    let chosen = move |ev: web_sys::Event| {
        if let Some(input) = ev.target().and_then(|t| t.dyn_into::<web_sys::HtmlInputElement>().ok()) {
            read_chosen(input, shelf, runs, outcome);
        }
    };
    view! {
        <section class="backup" aria-labelledby="h-backup">
            <h2 id="h-backup">"Keep a copy, or bring one in"</h2>
            <p class="hint">"One file with the form's plan, the saved plans and stills, the run log and any saved data the page could not read. Taking a file in adds to what is here and never replaces it."</p>
            <button type="button" id="backup-export" on:click=export>"Download everything"</button>
            <label class="file-pick" for="backup-import"><span class="label">"Take in a file"</span>
                <input type="file" id="backup-import" accept=".json,application/json,text/plain" on:change=chosen />
            </label>
            <p class="error" id="backup-error" aria-live="polite">{move || outcome.get().and_then(|r| r.err())}</p>
            <p class="hint" id="backup-done" aria-live="polite">{move || outcome.get().and_then(|r| r.ok())}</p>
        </section>
    }
}
