//! `dist/sources.json`: the source texts of the core's crop and compound tables, written natively
//! from `stillroom_core` (with its default feature `source-texts`). The page's wasm is built from
//! the core without them, so the texts cost the first load nothing; the page fetches this file
//! the first time a crop's sources are opened, and the service worker precaches it with the
//! build's other files, so the sources open offline too.
//!
//! The format (version [`SOURCES_FORMAT`]), every text as written in the table:
//!
//! ```json
//! {"format": 1,
//!  "crops": {"lavender": [["Oil content", "Low 0.6: ..."], ...], ...},
//!  "compounds": {"linalool": [["boiling point", "..."], ...], ...}}
//! ```
//!
//! Each list is `[label, text]` pairs in the order of `Crop::sources` and `Compound::sources`.

use crate::{Failure, Result};
use serde_json::{Map, Value, json};
use stillroom_core::compounds::COMPOUNDS;
use stillroom_core::crops::CROPS;

/// The file's name in `dist/`, which the page fetches relative to itself.
pub const SOURCES_FILE: &str = "sources.json";
/// The format version the page reads.
pub const SOURCES_FORMAT: u64 = 1;

/// Labelled texts as `[label, text]` pairs; fails on an empty text (a core built without
/// `source-texts` would write a file of blanks).
fn pairs(id: &str, list: &[(&str, &str)]) -> Result<Value> {
    if let Some((label, _)) = list.iter().find(|(_, text)| text.trim().is_empty()) {
        return Err(Failure::new(format!(
            "{id} has no source text for {label}: is stillroom-core built without `source-texts`?"
        )));
    }
    Ok(Value::Array(list.iter().map(|&(label, text)| json!([label, text])).collect()))
}

/// The text of `sources.json`.
pub fn sources_json() -> Result<String> {
    let mut crops = Map::new();
    for c in CROPS {
        crops.insert(c.id.to_string(), pairs(c.id, &c.sources())?);
    }
    let mut compounds = Map::new();
    for c in COMPOUNDS {
        compounds.insert(c.id.to_string(), pairs(c.id, &c.sources())?);
    }
    let file = json!({ "format": SOURCES_FORMAT, "crops": crops, "compounds": compounds });
    Ok(serde_json::to_string(&file).expect("a map of strings always serialises"))
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn every_crop_and_compound_with_its_texts_in_order() {
        let v: Value = serde_json::from_str(&sources_json().unwrap()).unwrap();
        assert_eq!(v["format"], SOURCES_FORMAT);
        for c in CROPS {
            let got: Vec<(String, String)> = serde_json::from_value(v["crops"][c.id].clone()).unwrap();
            let want: Vec<(String, String)> =
                c.sources().iter().map(|&(l, t)| (l.to_string(), t.to_string())).collect();
            assert_eq!(got, want, "{}", c.id);
        }
        for c in COMPOUNDS {
            let got: Vec<(String, String)> = serde_json::from_value(v["compounds"][c.id].clone()).unwrap();
            assert_eq!(got.len(), 4, "{}", c.id);
            assert_eq!(got[1], ("vapour pressure".to_string(), c.vapour_pressure_source.to_string()));
        }
        assert_eq!(v["crops"].as_object().unwrap().len(), CROPS.len());
        assert_eq!(v["compounds"].as_object().unwrap().len(), COMPOUNDS.len());
    }

    #[test]
    fn an_empty_text_is_refused() {
        let e = pairs("lavender", &[("Oil content", "a"), ("Composition", " ")]).unwrap_err();
        assert!(e.0.contains("lavender") && e.0.contains("Composition"), "{e}");
    }
}
