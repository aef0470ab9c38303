//! The crop and compound tables' source texts, fetched from the build's `sources.json`.
//!
//! The page's modules are built from the core without its feature `source-texts` (every
//! `*_source` is ""), which keeps 67 kB of text (18.7 kB gzip) out of the first load. The
//! build writes the texts natively from the same tables (`xtask::sources`); the page fetches the
//! file the first time a crop's sources are opened, and the service worker precaches it with the
//! rest of the build, so they open offline too. Read with serde_json's `Value`, which the page
//! already carries for its records: no reader of its own.

use serde_json::Value;
use stillroom_core::compounds;
use stillroom_core::crops::Crop;
use wasm_bindgen::JsCast;
use wasm_bindgen_futures::JsFuture;

/// The file, beside the page (`xtask::sources::SOURCES_FILE`).
pub const SOURCES_URL: &str = "./sources.json";
/// The format this page reads (`xtask::sources::SOURCES_FORMAT`).
pub const SOURCES_FORMAT: u64 = 1;

/// Fetches the file and checks its format; the error is a sentence for the grower.
pub async fn fetch() -> Result<String, String> {
    const UNREACHABLE: &str = "The sources could not be fetched: no connection. They open without one once the page has been saved for offline use.";
    let window = web_sys::window().ok_or(UNREACHABLE)?;
    let response = JsFuture::from(window.fetch_with_str(SOURCES_URL)).await.map_err(|_| UNREACHABLE)?;
    let response: web_sys::Response = response.dyn_into().map_err(|_| UNREACHABLE)?;
    if !response.ok() {
        return Err(format!("The sources could not be fetched: the server answered {}.", response.status()));
    }
    let text = match response.text() {
        Ok(promise) => JsFuture::from(promise).await.ok().and_then(|t| t.as_string()),
        Err(_) => None,
    }
    .ok_or("The sources could not be fetched: the connection broke off.")?;
    let file: Value =
        serde_json::from_str(&text).map_err(|e| format!("The sources file could not be read ({e})."))?;
    match file.get("format").and_then(Value::as_u64) {
        Some(SOURCES_FORMAT) => Ok(text),
        _ => Err("The sources file is of another version than this page; reload the page.".to_string()),
    }
}

/// `[[label, text], ...]` as pairs, or `None` if the list is not of that shape.
fn labelled(list: Option<&Value>) -> Option<Vec<(String, String)>> {
    list?
        .as_array()?
        .iter()
        .map(|pair| Some((pair.get(0)?.as_str()?.to_string(), pair.get(1)?.as_str()?.to_string())))
        .collect()
}

/// What the crop's sources list shows, in order: the crop's own texts, then those of each
/// compound of its typical oil ("Linalool: vapour pressure"), from the file's text (checked by
/// [`fetch`]). A part the file lacks (a file from another build) is one row saying so.
pub fn rows(text: &str, crop: &Crop) -> Vec<(String, String)> {
    let file: Value = serde_json::from_str(text).unwrap_or(Value::Null);
    let missing =
        |name: &str| (name.to_string(), "Not in this build's sources file; reload the page.".to_string());
    let mut rows =
        labelled(file.get("crops").and_then(|m| m.get(crop.id))).unwrap_or_else(|| vec![missing(crop.name)]);
    for &(id, _) in crop.composition {
        let name = compounds::find(id).map_or(id, |c| c.name);
        match labelled(file.get("compounds").and_then(|m| m.get(id))) {
            Some(own) => rows.extend(own.into_iter().map(|(label, text)| (format!("{name}: {label}"), text))),
            None => rows.push(missing(name)),
        }
    }
    rows
}
