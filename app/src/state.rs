//! The page's state: one text signal per number field, the choices, the derived scenario and
//! plan, and the storage sync (one effect per saved record, through [`crate::store`]).
//!
//! Flow: field texts and choices -> `scenario` (memo, units converted at the edge in
//! [`crate::fields`]) -> `plan` (memo, the core's one entry point) -> view. The scenario is
//! what is saved; the plan is always recomputed.

use crate::fields::{
    FIELDS, FieldUnits, NumField, OWN_COMPOUND_ID, OWN_COMPOUND_KEYS, TextError, parse_number, rounded_text,
    switch_text, text_for_in,
};
use crate::records::{self, Kind};
use crate::storage;
use crate::store::Store;
use crate::units::UnitSystem;
use leptos::prelude::*;
use serde::{Deserialize, Serialize};
use stillroom_core::heat::{Appliance, Fuel, Metal};
use stillroom_core::scenario::limits::MAX_MIXTURE_PARTS;
use stillroom_core::scenario::{
    BarometerReference, CondenserKind, CustomVapourPressure, OilComposition, OilPart, Scenario,
};
use stillroom_core::{Plan, ScenarioErrors, plan};

/// The largest pasted text the page tries to read (a plan is a few kB).
pub const MAX_PASTE_BYTES: usize = 256 * 1024;
/// Storage key of the grower's choice of units (metric or US customary).
pub const UNITS_KEY: &str = "stillroom.units";
/// How long after the last edit the entries are saved.
const SAVE_DELAY: std::time::Duration = std::time::Duration::from_millis(250);
/// Storage key of the form's texts as typed, even when they are not yet valid.
pub const DRAFT_KEY: &str = "stillroom.draft";

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
    /// What the fuel fires; `None` for the fuel's usual appliance.
    pub appliance: RwSignal<Option<Appliance>>,
    /// Whether the separated water goes back to the boiler (cohobation).
    pub cohobation: RwSignal<bool>,
    /// Whether the oil is taken as non-ideal (UNIFAC activity coefficients).
    pub non_ideal: RwSignal<bool>,
    pub metal: RwSignal<Metal>,
    pub condenser_kind: RwSignal<CondenserKind>,
    /// The lines of the grower's own oil analysis.
    pub mixture: RwSignal<Vec<MixRow>>,
    next_row_key: RwSignal<u32>,
    /// Name of the grower's own compound; empty means none.
    pub own_name: RwSignal<String>,
    /// Saved data: notices, kept-aside copies, the storage sync.
    pub store: Store,
    pub scenario: Memo<Derived>,
    pub plan: Memo<Result<Plan, ScenarioErrors>>,
    /// The units the form and the answers are shown in.
    pub units: RwSignal<UnitSystem>,
    /// The currency every price and cost is in (a label, e.g. "EUR").
    pub currency: RwSignal<String>,
    /// The last plan that matched the whole form (kept on screen while the form has a fault),
    /// with the scenario it was made for; `None` until one is made.
    pub good: Memo<Option<(Scenario, Plan)>>,
    /// The plan on screen: the last good one, or the current error when there was none.
    pub shown: Memo<Result<Plan, ScenarioErrors>>,
    /// Whether the plan on screen no longer matches the form.
    pub stale: Memo<bool>,
    /// Per field, the text a unit switch wrote and the exact SI value it stands for, so a
    /// switch (and a switch back) leaves the scenario exactly as it was.
    pinned: StoredValue<Vec<Option<Pin>>>,
}

/// The exact SI value behind a field's text, written in one unit. It holds while both the text
/// and the field's unit are unchanged: a fuel's price typed "2.5" per gal of propane is read
/// afresh per therm when the fuel becomes natural gas, never kept as the propane price.
#[derive(Debug, Clone, PartialEq)]
struct Pin {
    text: String,
    unit: &'static str,
    si: f64,
}

impl Pin {
    fn new(f: &NumField, units: FieldUnits, text: String, si: f64) -> Pin {
        Pin { text, unit: f.unit_in(units), si }
    }

    /// The pinned value, if it still stands behind `text` in the field's unit now.
    fn value(pin: &Option<Pin>, f: &NumField, units: FieldUnits, text: &str) -> Option<f64> {
        pin.as_ref().filter(|p| p.text == text && p.unit == f.unit_in(units)).map(|p| p.si)
    }
}

/// The scenario built from the form, with the texts that could not be read.
#[derive(Debug, Clone, PartialEq)]
pub struct Derived {
    pub scenario: Scenario,
    /// (field key, or `mix-<row>` for a line of the oil analysis; the error).
    pub text_errors: Vec<(String, TextError)>,
}

/// Reads the saved choice of units; anything else is metric.
pub fn load_units() -> UnitSystem {
    storage::get(UNITS_KEY).ok().flatten().and_then(|k| UnitSystem::from_key(&k)).unwrap_or_default()
}

// A failed units or draft save needs no notice of its own: the same storage then fails the plan
// record, and that failure is told at once (`store.rs`).
fn save_units(units: UnitSystem) {
    let _ = storage::set(UNITS_KEY, units.key());
}

/// The form's texts as typed, by field key, in the units they were typed in.
#[derive(Serialize, Deserialize, Default)]
struct Draft {
    units: String,
    texts: std::collections::BTreeMap<String, String>,
}

/// Reads the draft texts typed under `units`; a draft in other units or unreadable is ignored
/// (the saved scenario holds every valid value, so nothing valid is lost).
fn load_draft(units: UnitSystem) -> std::collections::BTreeMap<String, String> {
    storage::get(DRAFT_KEY)
        .ok()
        .flatten()
        .and_then(|raw| serde_json::from_str::<Draft>(&raw).ok())
        .filter(|d| d.units == units.key())
        .map(|d| d.texts)
        .unwrap_or_default()
}

fn save_draft(units: UnitSystem, texts: &[RwSignal<String>]) {
    let draft = Draft {
        units: units.key().to_string(),
        texts: FIELDS.iter().zip(texts).map(|(f, t)| (f.key.to_string(), t.get())).collect(),
    };
    if let Ok(text) = serde_json::to_string(&draft) {
        let _ = storage::set(DRAFT_KEY, &text);
    }
}

impl AppState {
    /// Builds the state from saved data and wires the memos and the storage sync.
    pub fn new() -> AppState {
        let store = Store::new(Kind::first_look);
        let base = store.load(Kind::Plan, records::read_scenario).unwrap_or_default();
        // The run log and the saved plans and stills belong to the workbench; checked here too,
        // in outline (`Kind::first_look`), so one that is not JSON, of a newer version or with
        // a malformed entry is kept aside (or held, and listed) and reported on the first
        // screen; the workbench reads every field when it opens.
        store.check(Kind::RunLog);
        store.check(Kind::Library);
        store.report_found();
        store.refresh_kept();
        let texts: Vec<RwSignal<String>> = FIELDS.iter().map(|_| RwSignal::new(String::new())).collect();
        let base_signal = RwSignal::new(Scenario::default());
        let pressure_mode = RwSignal::new(PressureMode::Altitude);
        let crop = RwSignal::new(None);
        let oil_choice = RwSignal::new(CROP_OIL.to_string());
        let mixture = RwSignal::new(Vec::<MixRow>::new());
        let next_row_key = RwSignal::new(0);
        let own_name = RwSignal::new(String::new());
        let fuel = RwSignal::new(base.boiler.fuel);
        let appliance = RwSignal::new(base.boiler.appliance);
        let cohobation = RwSignal::new(base.run.cohobation);
        let non_ideal = RwSignal::new(base.oil.non_ideal);
        let metal = RwSignal::new(base.still.metal);
        let condenser_kind = RwSignal::new(base.condenser.kind);
        let units = RwSignal::new(load_units());
        let currency = RwSignal::new(base.costs.currency.clone());
        let pinned = StoredValue::new(vec![None; FIELDS.len()]);

        let field_texts = texts.clone();
        let scenario = Memo::new(move |prev: Option<&Derived>| {
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
            for (i, (f, text)) in FIELDS.iter().zip(&field_texts).enumerate() {
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
                // Units read untracked: a switch rewrites the texts first (see `set_units`). The
                // fuel is read tracked: the price's unit follows it.
                let read_in = FieldUnits::new(units.get_untracked(), fuel.get());
                let exact = pinned.with_value(|p| Pin::value(&p[i], f, read_in, &text));
                if let Some(si) = exact {
                    (f.set)(&mut s, Some(si));
                    continue;
                }
                let fault = match parse_number(&text) {
                    Ok(Some(v)) => {
                        (f.set)(&mut s, Some(f.to_si_in(read_in, v)));
                        continue;
                    }
                    Ok(None) if f.optional => {
                        (f.set)(&mut s, None);
                        continue;
                    }
                    Ok(None) => TextError::Empty,
                    Err(e) => e,
                };
                // A field being retyped keeps its last readable value, so that is what is saved
                // (and planned after a reload), not the value the page was opened with.
                if let Some(p) = prev {
                    (f.set)(&mut s, (f.get)(&p.scenario));
                }
                text_errors.push((f.key.to_string(), fault));
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
            s.costs.currency = currency.get().trim().to_string();
            s.boiler.fuel = fuel.get();
            s.boiler.appliance = appliance.get();
            s.run.cohobation = cohobation.get();
            s.oil.non_ideal = non_ideal.get();
            s.still.metal = metal.get();
            s.condenser.kind = kind;
            Derived { scenario: s, text_errors }
        });
        let plan = Memo::new(move |_| scenario.with(|d| plan(&d.scenario)));
        let stale =
            Memo::new(move |_| scenario.with(|d| !d.text_errors.is_empty()) || plan.with(|r| r.is_err()));
        let good = Memo::new(move |prev: Option<&Option<(Scenario, Plan)>>| {
            if stale.get() {
                // Opened with a fault typed last time: the saved scenario's plan is the last good.
                return prev.cloned().flatten().or_else(|| {
                    plan.with(|r| r.as_ref().ok().cloned())
                        .map(|p| (scenario.with(|d| d.scenario.clone()), p))
                });
            }
            plan.with(|r| r.as_ref().ok().cloned()).map(|p| (scenario.with(|d| d.scenario.clone()), p))
        });
        let shown = Memo::new(move |_| match good.with(|g| g.as_ref().map(|(_, p)| p.clone())) {
            Some(p) => Ok(p),
            None => plan.get(),
        });

        // Storage sync, in this one place: what the grower entered is saved a moment after the
        // last change, not on every keystroke (serialising and writing cost a frame on a slow
        // phone), and at once when the page is hidden or closed, so nothing typed is lost.
        let draft_texts = StoredValue::new(texts.clone());
        let save_all = move || {
            let text = scenario.with_untracked(|d| records::scenario_text(&d.scenario));
            store.save(Kind::Plan, text);
            draft_texts.with_value(|t| save_draft(units.get_untracked(), t));
        };
        let waiting = StoredValue::new(None::<TimeoutHandle>);
        let flush = move || {
            if let Some(h) = waiting.get_value() {
                h.clear();
                waiting.set_value(None);
                save_all();
            }
        };
        Effect::new(move |ran: Option<()>| {
            scenario.track();
            draft_texts.with_value(|t| t.iter().for_each(|x| x.track()));
            if ran.is_none() {
                return save_all();
            }
            if let Some(h) = waiting.get_value() {
                h.clear();
            }
            let next = set_timeout_with_handle(
                move || {
                    waiting.set_value(None);
                    save_all();
                },
                SAVE_DELAY,
            );
            waiting.set_value(next.ok());
        });
        let hidden = window_event_listener_untyped("pagehide", move |_| flush());
        let away = window_event_listener_untyped("visibilitychange", move |_| flush());
        // Unmounted (a test's remount): nothing waiting is dropped, and the listeners go.
        on_cleanup(move || {
            flush();
            hidden.remove();
            away.remove();
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
        Effect::new(move |ran: Option<()>| {
            units.track();
            if ran.is_some() {
                save_all();
            }
        });
        Effect::new(move |_| {
            let chosen = units.get();
            save_units(chosen);
            crate::bridge::send(crate::bridge::UNITS_EVENT, chosen.key());
        });
        // What the other modules read of the plan: the form's scenario and the units.
        crate::bridge::expose_current_plan(move || {
            scenario.with_untracked(|d| records::scenario_text(&d.scenario))
        });
        crate::bridge::expose_units(move || units.get_untracked().key().to_string());
        crate::bridge::expose_bench(move || {
            scenario.with_untracked(|d| {
                let _ = std::hint::black_box(stillroom_core::plan(std::hint::black_box(&d.scenario)));
            })
        });

        let state = AppState {
            base: base_signal,
            texts,
            crop,
            oil_choice,
            pressure_mode,
            fuel,
            appliance,
            cohobation,
            non_ideal,
            metal,
            condenser_kind,
            mixture,
            next_row_key,
            own_name,
            store,
            scenario,
            plan,
            units,
            currency,
            good,
            shown,
            stale,
            pinned,
        };
        state.apply(&base);
        // What was typed last time, valid or not, goes back over the saved scenario.
        for (key, text) in load_draft(units.get_untracked()) {
            if let Some(i) = FIELDS.iter().position(|f| f.key == key) {
                state.keep_pin_if_rounded(i, &text);
                state.texts[i].set(text);
            }
        }
        state
    }

    /// A draft text that is the saved value rounded as a unit switch writes it ("33.07" lb for
    /// 15 kg) still stands for that exact value: the pin moves to the text, so a reload after a
    /// switch leaves the scenario exactly as it was.
    fn keep_pin_if_rounded(&self, i: usize, text: &str) {
        let f = &FIELDS[i];
        let units = self.base.with_untracked(|s| FieldUnits::of(self.units.get_untracked(), s));
        self.pinned.update_value(|p| {
            if let Some(pin) = p[i].as_ref().filter(|pin| rounded_text(f, pin.si, units) == text) {
                p[i] = Some(Pin::new(f, units, text.to_string(), pin.si));
            }
        });
    }

    /// Shows a scenario in the form: every field, choice and list, and the fields the form does
    /// not show (kept in `base`). Used when the page starts and when a scenario is pasted in.
    pub fn apply(&self, s: &Scenario) {
        self.base.set(s.clone());
        let units = self.units.get_untracked();
        let shown_in = FieldUnits::of(units, s);
        for (i, (f, text)) in FIELDS.iter().zip(&self.texts).enumerate() {
            let shown = text_for_in(f, s, units);
            self.pinned
                .update_value(|p| p[i] = (f.get)(s).map(|si| Pin::new(f, shown_in, shown.clone(), si)));
            text.set(shown);
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
        self.appliance.set(s.boiler.appliance);
        self.cohobation.set(s.run.cohobation);
        self.non_ideal.set(s.oil.non_ideal);
        self.currency.set(s.costs.currency.clone());
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
        let s = records::read_scenario(text)
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
        let text = self
            .scenario
            .with_untracked(|d| self.store.kept.with_untracked(|k| storage::everything(&d.scenario, k)));
        storage::download(&format!("stillroom-everything-{}.json", storage::file_stamp()), &text)
    }

    /// Saves what the page shows now (after a kept copy was deleted, say, to try again).
    pub fn save_now(&self) {
        let plan = self.scenario.with_untracked(|d| records::scenario_text(&d.scenario));
        self.store.save(Kind::Plan, plan);
    }

    /// Shows the form and the answers in other units. Every number typed is carried over as
    /// the same quantity, so the scenario (always SI) does not change. (A change of fuel is not
    /// a switch: the price's text stays and is read in the new fuel's unit, see [`Pin`].)
    pub fn set_units(&self, to: UnitSystem) {
        let fuel = self.fuel.get_untracked();
        let from = FieldUnits::new(self.units.get_untracked(), fuel);
        let to_units = FieldUnits::new(to, fuel);
        for (i, (f, text)) in FIELDS.iter().zip(&self.texts).enumerate() {
            let before = text.get_untracked();
            // The exact SI value behind the old text: pinned, or read in the old units. Text
            // that is not a number stays as typed.
            let exact = self
                .pinned
                .with_value(|p| Pin::value(&p[i], f, from, &before))
                .or_else(|| parse_number(&before).ok().flatten().map(|v| f.to_si_in(from, v)));
            let converted = exact.map(|si| switch_text(f, si, from, to_units, &before)).unwrap_or(before);
            self.pinned.update_value(|p| p[i] = exact.map(|v| Pin::new(f, to_units, converted.clone(), v)));
            text.set(converted);
        }
        self.units.set(to);
    }

    /// Adds a line to the oil analysis, up to the most the core plans.
    pub fn add_mix_row(&self, compound: &str) {
        if self.mixture.with_untracked(Vec::len) >= MAX_MIXTURE_PARTS {
            return;
        }
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

    /// The units the form's fields are read in now: the system and the fuel (tracked).
    pub fn field_units(&self) -> FieldUnits {
        FieldUnits::new(self.units.get(), self.fuel.get())
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
