//! The only code that talks to the browser's storage (`localStorage`), and the file download
//! that is the way out when it fails. What the records hold and how they are read is in
//! [`crate::records`]; when to read and write them, in [`crate::store`].

use crate::records::{self, BACKUP_PREFIX, Kind};
use serde_json::Value;
use stillroom_core::Scenario;
use wasm_bindgen::JsCast;

/// Why a write did not happen.
#[derive(Debug, Clone, PartialEq, Eq)]
pub enum SaveError {
    /// The browser's storage for this page is full.
    Full,
    /// The browser keeps no storage for this page (switched off, or a private mode).
    Unavailable,
}

impl SaveError {
    pub fn words(&self) -> &'static str {
        match self {
            SaveError::Full => "this browser's storage for the page is full",
            SaveError::Unavailable => {
                "this browser is not letting the page keep data (storage off, or a private window)"
            }
        }
    }
}

/// The page's `localStorage`, through gloo-storage. gloo's handle throws when the browser keeps
/// no storage (switched off, some private modes), which would kill the page: so web-sys asks
/// first whether there is one.
fn storage() -> Result<web_sys::Storage, SaveError> {
    use gloo_storage::Storage as _;
    let available = web_sys::window().and_then(|w| w.local_storage().ok().flatten()).is_some();
    if available { Ok(gloo_storage::LocalStorage::raw()) } else { Err(SaveError::Unavailable) }
}

/// The stored text under `key`.
pub fn get(key: &str) -> Result<Option<String>, SaveError> {
    storage()?.get_item(key).map_err(|_| SaveError::Unavailable)
}

/// Stores `text` under `key`.
pub fn set(key: &str, text: &str) -> Result<(), SaveError> {
    storage()?.set_item(key, text).map_err(|e| {
        let name = e.dyn_ref::<web_sys::DomException>().map(|d| d.name()).unwrap_or_default();
        if name == "QuotaExceededError" { SaveError::Full } else { SaveError::Unavailable }
    })
}

/// Removes `key`; true if it is gone.
pub fn remove(key: &str) -> bool {
    storage().map(|s| s.remove_item(key).is_ok()).unwrap_or(false)
}

/// Every stored key.
pub fn keys() -> Vec<String> {
    let Ok(s) = storage() else { return Vec::new() };
    let n = s.length().unwrap_or(0);
    (0..n).filter_map(|i| s.key(i).ok().flatten()).collect()
}

/// Milliseconds since 1970.
pub fn now_ms() -> f64 {
    js_sys::Date::now()
}

/// Copies `raw` aside under a fresh kept-aside key; the key, or why it could not be done.
pub fn keep_aside(kind: Kind, raw: &str) -> Result<String, SaveError> {
    let stamp = now_ms() as u64;
    let existing = keys();
    let mut key = format!("{BACKUP_PREFIX}{}.{stamp}", kind.slug());
    let mut n = 1;
    while existing.contains(&key) {
        key = format!("{BACKUP_PREFIX}{}.{stamp}-{n}", kind.slug());
        n += 1;
    }
    set(&key, raw)?;
    Ok(key)
}

/// One record the page could not read, kept in this browser.
#[derive(Debug, Clone, PartialEq)]
pub struct KeptCopy {
    pub key: String,
    /// What it was, if its key says.
    pub kind: Option<Kind>,
    /// When it was kept aside, ms since 1970 (from its key); `None` for a record held in place.
    pub kept_ms: Option<f64>,
    /// Its length in characters.
    pub chars: usize,
    /// Why the page could not read it.
    pub reason: String,
    /// Still under its own key, because there was no room to copy it aside.
    pub held: bool,
}

/// The kept-aside copies, oldest first, after the records `held` in place, each read by the
/// module's `reading`.
pub fn kept_copies(held: &[Kind], reading: crate::records::Reading) -> Vec<KeptCopy> {
    let mut list: Vec<KeptCopy> = held
        .iter()
        .filter_map(|k| {
            let raw = get(k.key()).ok().flatten()?;
            Some(KeptCopy {
                key: k.key().to_string(),
                kind: Some(*k),
                kept_ms: None,
                chars: raw.chars().count(),
                reason: reading(*k, &raw).map_or_else(|why| why, str::to_string),
                held: true,
            })
        })
        .collect();
    let mut aside: Vec<KeptCopy> = keys()
        .into_iter()
        .filter(|k| k.starts_with(BACKUP_PREFIX))
        .filter_map(|key| {
            let raw = get(&key).ok().flatten()?;
            let rest = &key[BACKUP_PREFIX.len()..];
            let (slug, stamp) = rest.split_once('.').unwrap_or((rest, ""));
            let kind = match slug {
                "plan" => Some(Kind::Plan),
                "runlog" => Some(Kind::RunLog),
                "library" => Some(Kind::Library),
                _ => None,
            };
            let stamp = stamp.split('-').next().and_then(|s| s.parse::<u64>().ok()).map(|ms| ms as f64);
            let reason = match kind {
                Some(k) => reading(k, &raw).map_or_else(
                    |why| why,
                    // The outline's verdict already says to open it.
                    |says| {
                        if says == crate::records::READS {
                            format!("{says}: open it")
                        } else {
                            says.to_string()
                        }
                    },
                ),
                None => "not a record this page knows".into(),
            };
            Some(KeptCopy { key, kind, kept_ms: stamp, chars: raw.chars().count(), reason, held: false })
        })
        .collect();
    aside.sort_by(|a, b| a.kept_ms.partial_cmp(&b.kept_ms).unwrap_or(std::cmp::Ordering::Equal));
    list.extend(aside);
    list
}

/// A local date and time for reading: `2026-07-14 09:05`.
pub fn local_time(ms: f64) -> String {
    let d = js_sys::Date::new(&wasm_bindgen::JsValue::from_f64(ms));
    format!(
        "{:04}-{:02}-{:02} {:02}:{:02}",
        d.get_full_year(),
        d.get_month() + 1,
        d.get_date(),
        d.get_hours(),
        d.get_minutes()
    )
}

/// The media type a download is offered as, from its file name: spreadsheets open a `.csv` as
/// a table only when it is labelled as one.
pub fn media_type(file_name: &str) -> &'static str {
    if file_name.ends_with(".csv") { "text/csv;charset=utf-8" } else { "application/json" }
}

/// Offers `text` as a file download (a Blob behind an object URL, clicked through `<a download>`).
pub fn download(file_name: &str, text: &str) -> Result<(), String> {
    let fail = |what: &str| format!("The download could not start ({what}). Copy the text instead.");
    let parts = js_sys::Array::of1(&wasm_bindgen::JsValue::from_str(text));
    let bag = web_sys::BlobPropertyBag::new();
    bag.set_type(media_type(file_name));
    let blob = web_sys::Blob::new_with_str_sequence_and_options(&parts, &bag).map_err(|_| fail("blob"))?;
    let url = web_sys::Url::create_object_url_with_blob(&blob).map_err(|_| fail("address"))?;
    let document = web_sys::window().and_then(|w| w.document()).ok_or_else(|| fail("no page"))?;
    let a: web_sys::HtmlAnchorElement =
        document.create_element("a").map_err(|_| fail("link"))?.unchecked_into();
    a.set_href(&url);
    a.set_download(file_name);
    a.click();
    // Give the browser time to start reading the blob before letting it go.
    leptos::prelude::set_timeout(
        move || {
            let _ = web_sys::Url::revoke_object_url(&url);
        },
        std::time::Duration::from_secs(30),
    );
    Ok(())
}

/// A file-name-safe stamp for downloads: `2026-07-14-0905`.
pub fn file_stamp() -> String {
    local_time(now_ms()).replace(' ', "-").replace(':', "")
}

/// Everything the page holds, as one JSON text: today's plan and, once the workbench has
/// loaded, its run log and saved plans and stills, all from memory (so the latest entries are in
/// it even when they could not be saved; before that, those two records as stored), and every
/// kept-aside text.
pub fn everything(scenario: &Scenario, kept: &[KeptCopy]) -> String {
    let workbench: Value =
        crate::bridge::workbench_records().and_then(|t| serde_json::from_str(&t).ok()).unwrap_or(Value::Null);
    let record = |name: &str, kind: Kind| match workbench.get(name) {
        Some(v) => v.clone(),
        None => stored_json(kind.key()),
    };
    let kept: Vec<Value> = kept
        .iter()
        .map(|k| {
            serde_json::json!({
                "key": k.key,
                "reason": k.reason,
                "text": get(&k.key).ok().flatten().unwrap_or_default(),
            })
        })
        .collect();
    let all = serde_json::json!({
        "stillroom_export": 1,
        "plan_record": serde_json::from_str::<Value>(&records::scenario_text(scenario)).unwrap_or(Value::Null),
        "run_log_record": record("run_log_record", Kind::RunLog),
        "library_record": record("library_record", Kind::Library),
        "kept_aside": kept,
    });
    serde_json::to_string_pretty(&all).unwrap_or_default()
}

/// A stored record as JSON (`null` when absent or not JSON: a kept-aside copy holds such text).
fn stored_json(key: &str) -> Value {
    get(key).ok().flatten().and_then(|t| serde_json::from_str(&t).ok()).unwrap_or(Value::Null)
}
