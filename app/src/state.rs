//! The page's state: one text signal per number field, the choices, the derived scenario and
//! plan, and the only code that talks to storage.
//!
//! Flow: field texts and choices -> `scenario` (memo, units converted at the edge in
//! [`crate::fields`]) -> `plan` (memo, the core's one entry point) -> view. The scenario is
//! what is saved; the plan is always recomputed.

use crate::fields::{FIELDS, OWN_COMPOUND_ID, OWN_COMPOUND_KEYS, TextError, parse_number, text_for};
use crate::storage::{self, KeptCopy, Kind};
use leptos::prelude::*;
use stillroom_core::calibration::RunRecord;
use stillroom_core::heat::{Fuel, Metal};
use stillroom_core::scenario::{
    BarometerReference, CondenserKind, CustomVapourPressure, OilComposition, OilPart, Scenario,
};
use stillroom_core::{Plan, ScenarioErrors, plan};

/// The largest pasted text the page tries to read (a plan is a few kB).
pub const MAX_PASTE_BYTES: usize = 256 * 1024;

/// How the site's pressure is known.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum PressureMode {
    Altitude,
    Station,
    SeaLevel,
}

/// The oil choice in the picker: the crop's typical oil, the grower's own analysis, or (any other
/// value) a single compound's id.
pub const CROP_OIL: &str = "crop";
pub const MIXTURE_OIL: &str = "mixture";

/// One line of the grower's own oil analysis.
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct MixRow {
    /// Stable key for the list, never reused.
    pub key: u32,
    pub compound: RwSignal<String>,
    pub percent: RwSignal<String>,
    /// The share as opened from a saved or pasted plan: used as it is while the text still
    /// shows it, so opening a plan never rounds its numbers.
    pub opened: Option<f64>,
}

/// The page's state, shared through context.
#[derive(Clone)]
pub struct AppState {
    /// The scenario the form started from: holds the fields the form does not show.
    base: RwSignal<Scenario>,
    /// One text per entry of [`FIELDS`], in the same order.
    pub texts: Vec<RwSignal<String>>,
    pub crop: RwSignal<Option<String>>,
    pub oil_choice: RwSignal<String>,
    pub pressure_mode: RwSignal<PressureMode>,
    pub fuel: RwSignal<Fuel>,
    pub metal: RwSignal<Metal>,
    pub condenser_kind: RwSignal<CondenserKind>,
    /// The lines of the grower's own oil analysis.
    pub mixture: RwSignal<Vec<MixRow>>,
    next_row_key: RwSignal<u32>,
    /// Name of the grower's own compound; empty means none.
    pub own_name: RwSignal<String>,
    /// The grower's log of finished runs.
    pub runs: RwSignal<Vec<RunRecord>>,
    /// Saved data: notices, kept-aside copies, the storage sync.
    pub store: Store,
    pub scenario: Memo<Derived>,
    pub plan: Memo<Result<Plan, ScenarioErrors>>,
}

/// The scenario built from the form, with the texts that could not be read.
#[derive(Debug, Clone, PartialEq)]
pub struct Derived {
    pub scenario: Scenario,
    /// (field key, or `mix-<row>` for a line of the oil analysis; the error).
    pub text_errors: Vec<(String, TextError)>,
}

/// What the page knows about its saved data, and the storage sync. Every read and write of the
/// stored records goes through here (and [`crate::storage`] below it).
#[derive(Clone, Copy)]
pub struct Store {
    /// What the page found when it started (unreadable records, no storage), for the grower.
    pub notice: RwSignal<Option<String>>,
    /// Why the latest entries of each record could not be saved.
    errors: RwSignal<Vec<(Kind, String)>>,
    /// Records left under their own key because they could not be read nor copied aside: never
    /// saved over.
    held: RwSignal<Vec<Kind>>,
    /// The kept-aside copies (and held records), as listed on the page.
    pub kept: RwSignal<Vec<KeptCopy>>,
    /// The text last read or written under each record's key: the same text is not written twice.
    last: StoredValue<Vec<(Kind, String)>>,
    /// Texts that could not be written yet.
    pending: StoredValue<Vec<(Kind, String)>>,
    /// Records found unreadable at start: (which, held in place).
    found: StoredValue<Vec<(Kind, bool)>>,
}

impl Store {
    fn new() -> Store {
        Store {
            notice: RwSignal::new(None),
            errors: RwSignal::new(Vec::new()),
            held: RwSignal::new(Vec::new()),
            kept: RwSignal::new(Vec::new()),
            last: StoredValue::new(Vec::new()),
            pending: StoredValue::new(Vec::new()),
            found: StoredValue::new(Vec::new()),
        }
    }

    fn say(&self, text: String) {
        self.notice.update(|n| match n {
            Some(old) if old.contains(&text) => {}
            Some(old) => *old = format!("{old} {text}"),
            None => *n = Some(text),
        });
    }

    fn remember(&self, kind: Kind, text: String) {
        self.last.update_value(|l| {
            l.retain(|(k, _)| *k != kind);
            l.push((kind, text));
        });
    }

    /// Reads one record. Anything not exactly readable is copied aside and reported; if the
    /// copy cannot be made the record is held in place. `None` means: start from the default.
    fn load<T>(&self, kind: Kind, read: fn(&str) -> Result<T, String>) -> Option<T> {
        let raw = match storage::get(kind.key()) {
            Ok(Some(raw)) => raw,
            Ok(None) => return None,
            Err(e) => {
                self.say(format!(
                    "Saved entries cannot be read here: {}. What you enter now lasts only while this page is open: use “Download everything” to keep it.",
                    e.words()
                ));
                return None;
            }
        };
        match read(&raw) {
            Ok(v) => {
                self.remember(kind, raw);
                Some(v)
            }
            Err(_) => {
                let held = storage::keep_aside(kind, &raw).is_err();
                if held {
                    self.held.update(|h| h.push(kind));
                }
                self.found.update_value(|f| f.push((kind, held)));
                None
            }
        }
    }

    /// Tells, in one notice, which records could not be read and where they are now.
    fn report_found(&self) {
        let found = self.found.get_value();
        // (names, "it" or "they", "it is" or "they are") of the records found held or not.
        let names = |held: bool| {
            let words: Vec<&str> = found.iter().filter(|(_, h)| *h == held).map(|(k, _)| k.word()).collect();
            let one = words.len() == 1;
            (words.join(" and "), if one { "it" } else { "them" }, if one { "it is" } else { "they are" })
        };
        let (aside, _, is) = names(false);
        if !aside.is_empty() {
            self.say(format!(
                "Your saved {aside} could not be read, so the page starts afresh. Nothing is lost: {is} kept below, under “Saved data the page could not read”."
            ));
        }
        let (held, them, is) = names(true);
        if !held.is_empty() {
            self.say(format!(
                "Your saved {held} could not be read, and there is no room to copy {them} aside. {} where {} and the page will not save over {them}: download or delete {them} below, under “Saved data the page could not read”.",
                if is == "it is" { "It stays" } else { "They stay" },
                if is == "it is" { "it is" } else { "they are" },
            ));
        }
    }

    /// Lists the kept-aside copies again.
    pub fn refresh_kept(&self) {
        let held = self.held.get_untracked();
        self.kept.set(storage::kept_copies(&held));
    }

    /// Whether a record is held in place (unreadable, not yet copied aside).
    pub fn is_held(&self, kind: Kind) -> bool {
        self.held.with_untracked(|h| h.contains(&kind))
    }

    /// Tries again to copy a held record aside, so the page may save under its key.
    fn release(&self, kind: Kind) -> Result<(), String> {
        let raw = match storage::get(kind.key()) {
            Ok(Some(raw)) if kind.problem(&raw).is_some() => raw,
            _ => {
                self.held.update(|h| h.retain(|k| *k != kind));
                return Ok(());
            }
        };
        match storage::keep_aside(kind, &raw) {
            Ok(_) => {
                self.held.update(|h| h.retain(|k| *k != kind));
                self.refresh_kept();
                Ok(())
            }
            Err(_) => Err(format!(
                "your unreadable saved {} still sits where the page would save, with no room to copy it aside: download or delete it under “Saved data the page could not read”",
                kind.word()
            )),
        }
    }

    /// Writes a record's text under its key, unless the same text is there already. A failure
    /// is kept for the notice, with the text, which is tried again after the next save that
    /// works; the entries stay in memory.
    pub fn save(&self, kind: Kind, text: String) {
        if self.last.with_value(|l| l.iter().any(|(k, t)| *k == kind && *t == text)) {
            return;
        }
        if self.write(kind, text) {
            let waiting: Vec<(Kind, String)> =
                self.pending.with_value(|p| p.iter().filter(|(k, _)| *k != kind).cloned().collect());
            for (k, t) in waiting {
                self.write(k, t);
            }
        }
    }

    fn write(&self, kind: Kind, text: String) -> bool {
        let held = self.is_held(kind);
        let result = if held { self.release(kind) } else { Ok(()) }
            .and_then(|_| storage::set(kind.key(), &text).map_err(|e| e.words().to_string()));
        self.pending.update_value(|p| p.retain(|(k, _)| *k != kind));
        match result {
            Ok(()) => {
                self.remember(kind, text);
                if self.errors.with_untracked(|e| e.iter().any(|(k, _)| *k == kind)) {
                    self.errors.update(|e| e.retain(|(k, _)| *k != kind));
                }
                true
            }
            Err(why) => {
                self.pending.update_value(|p| p.push((kind, text)));
                let now = (kind, why);
                if !self.errors.with_untracked(|e| e.contains(&now)) {
                    self.errors.update(|e| {
                        e.retain(|(k, _)| *k != now.0);
                        e.push(now);
                    });
                }
                false
            }
        }
    }

    /// Why the latest entries are not saved, in words; `None` when everything is saved.
    pub fn unsaved(&self) -> Option<String> {
        self.errors.with(|e| {
            let first = e.first()?;
            let what = match e.len() {
                1 => format!("your latest {}", match first.0 {
                    Kind::Plan => "changes to the plan",
                    Kind::RunLog => "changes to the run log",
                }),
                _ => "your latest changes".to_string(),
            };
            Some(format!(
                "Not saved: {what} ({}). They stay on this page while it is open: download everything to keep them.",
                first.1
            ))
        })
    }

    /// Deletes a kept-aside copy, or discards a held record; true if it is gone.
    pub fn delete(&self, key: &str) -> bool {
        let gone = storage::remove(key);
        if gone {
            self.held.update(|h| h.retain(|k| k.key() != key));
            // The next save may now go through: forget what was written so it is tried again.
            self.last.update_value(|l| l.retain(|(k, _)| k.key() != key));
        }
        self.refresh_kept();
        gone
    }
}

impl AppState {
    /// Builds the state from saved data and wires the memos and the storage sync.
    pub fn new() -> AppState {
        let store = Store::new();
        let base = store.load(Kind::Plan, storage::read_scenario).unwrap_or_default();
        let logged = store.load(Kind::RunLog, storage::read_runs).unwrap_or_default();
        store.report_found();
        store.refresh_kept();
        let runs = RwSignal::new(logged);
        let texts: Vec<RwSignal<String>> = FIELDS.iter().map(|_| RwSignal::new(String::new())).collect();
        let base_signal = RwSignal::new(Scenario::default());
        let pressure_mode = RwSignal::new(PressureMode::Altitude);
        let crop = RwSignal::new(None);
        let oil_choice = RwSignal::new(CROP_OIL.to_string());
        let mixture = RwSignal::new(Vec::<MixRow>::new());
        let next_row_key = RwSignal::new(0);
        let own_name = RwSignal::new(String::new());
        let fuel = RwSignal::new(base.boiler.fuel);
        let metal = RwSignal::new(base.still.metal);
        let condenser_kind = RwSignal::new(base.condenser.kind);

        let field_texts = texts.clone();
        let scenario = Memo::new(move |_| {
            let opened = base_signal.get();
            let mut s = opened.clone();
            let mode = pressure_mode.get();
            let kind = condenser_kind.get();
            s.site.barometer = None;
            let mut text_errors = Vec::new();
            let name = own_name.get().trim().to_string();
            // A law the form has no fields for (Antoine coefficients) is kept as opened until
            // the grower types measured points instead.
            let own_law_kept = opened
                .custom_compounds
                .first()
                .is_some_and(|c| matches!(c.vapour_pressure, CustomVapourPressure::Antoine { .. }));
            for (f, text) in FIELDS.iter().zip(&field_texts) {
                let text = text.get();
                let skip = match f.key {
                    "station_pressure" => mode != PressureMode::Station,
                    "sea_level_pressure" => mode != PressureMode::SeaLevel,
                    "tub_water" => kind != CondenserKind::CoilInTub,
                    "own_t1" | "own_p1" | "own_t2" | "own_p2" if own_law_kept && text.trim().is_empty() => {
                        true
                    }
                    k if OWN_COMPOUND_KEYS.contains(&k) => name.is_empty(),
                    _ => false,
                };
                if skip {
                    continue;
                }
                // A field still showing the opened value keeps that value exactly (the text is
                // rounded for reading; the number underneath is not).
                if let Some(v) = (f.get)(&opened)
                    && text == text_for(f, &opened)
                {
                    (f.set)(&mut s, Some(v));
                    continue;
                }
                match parse_number(&text) {
                    Ok(Some(v)) => (f.set)(&mut s, Some((f.to_si)(v))),
                    Ok(None) if f.optional => (f.set)(&mut s, None),
                    Ok(None) => text_errors.push((f.key.to_string(), TextError::Empty)),
                    Err(e) => text_errors.push((f.key.to_string(), e)),
                }
            }
            // The own compound keeps the id it was opened with; a new one is called `own`.
            if name.is_empty() {
                if s.custom_compounds.first().is_some_and(|c| !c.name.trim().is_empty()) {
                    s.custom_compounds.remove(0);
                }
            } else if let Some(c) = s.custom_compounds.first_mut() {
                if c.id.trim().is_empty() {
                    c.id = OWN_COMPOUND_ID.to_string();
                }
                if c.name.trim() != name {
                    c.name = name;
                }
            }
            s.charge.crop = crop.get();
            let choice = oil_choice.get();
            s.oil.composition = match choice.as_str() {
                CROP_OIL => OilComposition::CropTypical,
                MIXTURE_OIL => {
                    let mut parts = Vec::new();
                    for (i, row) in mixture.get().iter().enumerate() {
                        let text = row.percent.get();
                        if let Some(v) = row.opened.filter(|v| text == crate::units::plain(*v)) {
                            parts.push(OilPart { compound: row.compound.get(), mass_percent: v });
                            continue;
                        }
                        match parse_number(&text) {
                            Ok(Some(v)) => {
                                parts.push(OilPart { compound: row.compound.get(), mass_percent: v })
                            }
                            Ok(None) => text_errors.push((format!("mix-{i}"), TextError::Empty)),
                            Err(e) => text_errors.push((format!("mix-{i}"), e)),
                        }
                    }
                    OilComposition::Mixture { parts }
                }
                _ => OilComposition::Compound { id: choice },
            };
            s.boiler.fuel = fuel.get();
            s.still.metal = metal.get();
            s.condenser.kind = kind;
            Derived { scenario: s, text_errors }
        });
        let plan = Memo::new(move |_| scenario.with(|d| plan(&d.scenario)));

        // Storage sync, in this one place: save what the grower entered whenever it changes.
        Effect::new(move |_| {
            let text = scenario.with(|d| storage::scenario_text(&d.scenario));
            store.save(Kind::Plan, text);
        });
        Effect::new(move |_| {
            let text = runs.with(|r| storage::runs_text(r));
            store.save(Kind::RunLog, text);
        });
        // The page's shell reads this before applying an update (a reload would drop entries
        // that only live on the page).
        Effect::new(move |_| {
            let unsaved = store.unsaved().is_some();
            if let Some(root) =
                web_sys::window().and_then(|w| w.document()).and_then(|d| d.document_element())
            {
                let _ = if unsaved {
                    root.set_attribute("data-unsaved", "")
                } else {
                    root.remove_attribute("data-unsaved")
                };
            }
        });

        let state = AppState {
            base: base_signal,
            texts,
            crop,
            oil_choice,
            pressure_mode,
            fuel,
            metal,
            condenser_kind,
            mixture,
            next_row_key,
            own_name,
            runs,
            store,
            scenario,
            plan,
        };
        state.apply(&base);
        state
    }

    /// Shows a scenario in the form: every field, choice and list, and the fields the form does
    /// not show (kept in `base`). Used when the page starts and when a scenario is pasted in.
    pub fn apply(&self, s: &Scenario) {
        self.base.set(s.clone());
        for (f, text) in FIELDS.iter().zip(&self.texts) {
            text.set(text_for(f, s));
        }
        self.pressure_mode.set(match s.site.barometer.as_ref().map(|b| b.reference) {
            None => PressureMode::Altitude,
            Some(BarometerReference::Station) => PressureMode::Station,
            Some(BarometerReference::SeaLevel) => PressureMode::SeaLevel,
        });
        self.crop.set(s.charge.crop.clone());
        self.oil_choice.set(match &s.oil.composition {
            OilComposition::Compound { id } => id.clone(),
            OilComposition::Mixture { .. } => MIXTURE_OIL.to_string(),
            OilComposition::CropTypical => CROP_OIL.to_string(),
        });
        let start = self.next_row_key.get_untracked();
        let rows: Vec<MixRow> = match &s.oil.composition {
            OilComposition::Mixture { parts } => parts
                .iter()
                .enumerate()
                .map(|(i, p)| MixRow {
                    key: start + i as u32,
                    compound: RwSignal::new(p.compound.clone()),
                    percent: RwSignal::new(crate::units::plain(p.mass_percent)),
                    opened: Some(p.mass_percent),
                })
                .collect(),
            _ => Vec::new(),
        };
        self.next_row_key.set(start + rows.len() as u32);
        self.mixture.set(rows);
        self.own_name.set(s.custom_compounds.first().map(|c| c.name.clone()).unwrap_or_default());
        self.fuel.set(s.boiler.fuel);
        self.metal.set(s.still.metal);
        self.condenser_kind.set(s.condenser.kind);
    }

    /// Reads a pasted scenario (JSON, this or an earlier saved version) and shows it; the
    /// parser's message, naming the field, if it cannot be read.
    pub fn import(&self, text: &str) -> Result<(), String> {
        if text.len() > MAX_PASTE_BYTES {
            return Err(format!(
                "This text is {} kB; the page opens plans of up to {} kB (a plan is usually under 10 kB). Check that only the plan was copied.",
                text.len().div_ceil(1024),
                MAX_PASTE_BYTES / 1024
            ));
        }
        let s = storage::read_scenario(text)
            .map_err(|e| format!("This is not a plan the page can read: {e}."))?;
        self.apply(&s);
        Ok(())
    }

    /// The id the picker offers for the grower's own compound: the opened one's, or `own`.
    pub fn own_id(&self) -> String {
        self.base
            .with(|b| b.custom_compounds.first().map(|c| c.id.clone()))
            .filter(|id| !id.trim().is_empty())
            .unwrap_or_else(|| OWN_COMPOUND_ID.to_string())
    }

    /// Everything the page holds, offered as a file.
    pub fn download_everything(&self) -> Result<(), String> {
        let text = self.scenario.with_untracked(|d| {
            self.runs.with_untracked(|r| {
                self.store.kept.with_untracked(|k| storage::everything(&d.scenario, r, k))
            })
        });
        storage::download(&format!("stillroom-everything-{}.json", storage::file_stamp()), &text)
    }

    /// Saves what the page shows now (after a kept copy was deleted, say, to try again).
    pub fn save_now(&self) {
        let plan = self.scenario.with_untracked(|d| storage::scenario_text(&d.scenario));
        self.store.save(Kind::Plan, plan);
        let runs = self.runs.with_untracked(|r| storage::runs_text(r));
        self.store.save(Kind::RunLog, runs);
    }

    /// Adds a line to the oil analysis.
    pub fn add_mix_row(&self, compound: &str) {
        let key = self.next_row_key.get_untracked();
        self.next_row_key.set(key + 1);
        let row = MixRow {
            key,
            compound: RwSignal::new(compound.to_string()),
            percent: RwSignal::new(String::new()),
            opened: None,
        };
        self.mixture.update(|rows| rows.push(row));
    }

    /// Removes a line from the oil analysis.
    pub fn remove_mix_row(&self, key: u32) {
        self.mixture.update(|rows| rows.retain(|r| r.key != key));
    }

    /// The text signal of a field.
    pub fn text(&self, key: &str) -> RwSignal<String> {
        let i = FIELDS.iter().position(|f| f.key == key).unwrap_or(0);
        self.texts[i]
    }
}

impl Default for AppState {
    fn default() -> Self {
        Self::new()
    }
}
