//! The page's state: one text signal per number field, the choices, the derived scenario and
//! plan, and the only code that talks to storage.
//!
//! Flow: field texts and choices -> `scenario` (memo, units converted at the edge in
//! [`crate::fields`]) -> `plan` (memo, the core's one entry point) -> view. The scenario is
//! what is saved; the plan is always recomputed.

use crate::fields::{
    FIELDS, OWN_COMPOUND_ID, OWN_COMPOUND_KEYS, TextError, parse_number, text_for_in, text_in,
};
use crate::units::UnitSystem;
use gloo_storage::{LocalStorage, Storage};
use leptos::prelude::*;
use serde::{Deserialize, Serialize};
use stillroom_core::calibration::RunRecord;
use stillroom_core::heat::{Fuel, Metal};
use stillroom_core::scenario::{BarometerReference, CondenserKind, OilComposition, OilPart, Scenario};
use stillroom_core::{Plan, ScenarioErrors, plan};

/// Storage key of the saved scenario record.
pub const SCENARIO_KEY: &str = "stillroom.scenario";
/// Storage key of the grower's log of finished runs.
pub const RUNS_KEY: &str = "stillroom.runs";
/// Prefix of keys holding saved data that could not be read, kept so nothing is lost.
pub const BACKUP_PREFIX: &str = "stillroom.unreadable.";
/// Storage key of the grower's choice of units (metric or US customary).
pub const UNITS_KEY: &str = "stillroom.units";
/// Storage key of the form's texts as typed, even when they are not yet valid.
pub const DRAFT_KEY: &str = "stillroom.draft";
/// Version of the stored record's envelope (the scenario inside carries its own version).
pub const RECORD_VERSION: u32 = 1;

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
}

#[derive(Serialize, Deserialize)]
struct Record {
    record_version: u32,
    scenario: serde_json::Value,
}

#[derive(Serialize, Deserialize)]
struct RunsRecord {
    record_version: u32,
    runs: Vec<RunRecord>,
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
    /// A message about saved data (for example that an unreadable copy was kept).
    pub notice: RwSignal<Option<String>>,
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
    pinned: StoredValue<Vec<Option<(String, f64)>>>,
}

/// The scenario built from the form, with the texts that could not be read.
#[derive(Debug, Clone, PartialEq)]
pub struct Derived {
    pub scenario: Scenario,
    /// (field key, or `mix-<row>` for a line of the oil analysis; the error).
    pub text_errors: Vec<(String, TextError)>,
}

/// Copies unreadable saved text aside under a backup key and says where it went.
fn keep_aside(what: &str, raw: &str) -> String {
    let slug: String = what.chars().filter(|c| c.is_ascii_alphanumeric()).collect();
    let key = format!("{BACKUP_PREFIX}{slug}.{}", js_sys_now());
    if LocalStorage::raw().set_item(&key, raw).is_ok() {
        format!(
            "Your saved {what} could not be read, so the page starts afresh. A copy was kept in this browser under “{key}”."
        )
    } else {
        format!("Your saved {what} could not be read, and there was no room to keep a copy.")
    }
}

/// Reads the saved scenario. Anything unreadable is copied to a backup key and reported, and
/// the invented example is used instead: saved data is never silently dropped.
pub fn load() -> (Scenario, Option<String>) {
    let raw = match LocalStorage::raw().get_item(SCENARIO_KEY) {
        Ok(Some(raw)) => raw,
        _ => return (Scenario::default(), None),
    };
    match migrate(&raw) {
        Some(s) => (s, None),
        None => (Scenario::default(), Some(keep_aside("plan", &raw))),
    }
}

/// Reads the log of runs, with the same care as [`load`].
pub fn load_runs() -> (Vec<RunRecord>, Option<String>) {
    let raw = match LocalStorage::raw().get_item(RUNS_KEY) {
        Ok(Some(raw)) => raw,
        _ => return (Vec::new(), None),
    };
    match serde_json::from_str::<RunsRecord>(&raw) {
        Ok(r) if r.record_version <= RECORD_VERSION => (r.runs, None),
        _ => (Vec::new(), Some(keep_aside("run log", &raw))),
    }
}

fn save_runs(runs: &[RunRecord]) {
    let record = RunsRecord { record_version: RECORD_VERSION, runs: runs.to_vec() };
    if let Ok(text) = serde_json::to_string(&record) {
        let _ = LocalStorage::raw().set_item(RUNS_KEY, &text);
    }
}

/// Turns a stored record of any version into today's scenario, or `None` if it is unreadable.
///
/// Record version 1 wraps the scenario; a bare scenario (the shape before records had an
/// envelope) is read too. Fields added later are filled with defaults by the core's serde rules.
pub fn migrate(raw: &str) -> Option<Scenario> {
    let value: serde_json::Value = serde_json::from_str(raw).ok()?;
    let scenario_value = match serde_json::from_value::<Record>(value.clone()) {
        Ok(r) if r.record_version <= RECORD_VERSION => r.scenario,
        Ok(_) => return None,
        Err(_) => value,
    };
    serde_json::from_value::<Scenario>(scenario_value).ok()
}

fn save(scenario: &Scenario) {
    if let Ok(value) = serde_json::to_value(scenario) {
        let record = Record { record_version: RECORD_VERSION, scenario: value };
        if let Ok(text) = serde_json::to_string(&record) {
            let _ = LocalStorage::raw().set_item(SCENARIO_KEY, &text);
        }
    }
}

/// Reads the saved choice of units; anything else is metric.
pub fn load_units() -> UnitSystem {
    LocalStorage::raw()
        .get_item(UNITS_KEY)
        .ok()
        .flatten()
        .and_then(|k| UnitSystem::from_key(&k))
        .unwrap_or_default()
}

fn save_units(units: UnitSystem) {
    let _ = LocalStorage::raw().set_item(UNITS_KEY, units.key());
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
    LocalStorage::raw()
        .get_item(DRAFT_KEY)
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
        let _ = LocalStorage::raw().set_item(DRAFT_KEY, &text);
    }
}

fn js_sys_now() -> u64 {
    web_sys::window().and_then(|w| w.performance()).map(|p| p.time_origin() + p.now()).unwrap_or(0.0) as u64
}

impl AppState {
    /// Builds the state from saved data and wires the memos and the storage sync.
    pub fn new() -> AppState {
        let (base, notice) = load();
        let (logged, runs_notice) = load_runs();
        let notice = match (notice, runs_notice) {
            (Some(a), Some(b)) => Some(format!("{a} {b}")),
            (a, b) => a.or(b),
        };
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
        let units = RwSignal::new(load_units());
        let currency = RwSignal::new(base.costs.currency.clone());
        let pinned = StoredValue::new(vec![None; FIELDS.len()]);

        let field_texts = texts.clone();
        let scenario = Memo::new(move |_| {
            let mut s = base_signal.get();
            let mode = pressure_mode.get();
            let kind = condenser_kind.get();
            s.site.barometer = None;
            let mut text_errors = Vec::new();
            let name = own_name.get().trim().to_string();
            for (i, (f, text)) in FIELDS.iter().zip(&field_texts).enumerate() {
                let skip = match f.key {
                    "station_pressure" => mode != PressureMode::Station,
                    "sea_level_pressure" => mode != PressureMode::SeaLevel,
                    "tub_water" => kind != CondenserKind::CoilInTub,
                    k if OWN_COMPOUND_KEYS.contains(&k) => name.is_empty(),
                    _ => false,
                };
                if skip {
                    continue;
                }
                let text = text.get();
                let exact = pinned.with_value(|p| p[i].as_ref().filter(|(t, _)| *t == text).map(|(_, v)| *v));
                if let Some(si) = exact {
                    (f.set)(&mut s, Some(si));
                    continue;
                }
                match parse_number(&text) {
                    // Units read untracked: a switch rewrites the texts first (see `set_units`).
                    Ok(Some(v)) => (f.set)(&mut s, Some(f.to_si_in(units.get_untracked(), v))),
                    Ok(None) if f.optional => (f.set)(&mut s, None),
                    Ok(None) => text_errors.push((f.key.to_string(), TextError::Empty)),
                    Err(e) => text_errors.push((f.key.to_string(), e)),
                }
            }
            if name.is_empty() {
                s.custom_compounds.clear();
            } else if let Some(c) = s.custom_compounds.first_mut() {
                c.id = OWN_COMPOUND_ID.to_string();
                c.name = name;
            }
            s.charge.crop = crop.get();
            let choice = oil_choice.get();
            s.oil.composition = match choice.as_str() {
                CROP_OIL => OilComposition::CropTypical,
                MIXTURE_OIL => {
                    let mut parts = Vec::new();
                    for (i, row) in mixture.get().iter().enumerate() {
                        match parse_number(&row.percent.get()) {
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

        // Storage sync, in this one place: save what the grower entered whenever it changes.
        Effect::new(move |_| scenario.with(|d| save(&d.scenario)));
        Effect::new(move |_| runs.with(|r| save_runs(r)));
        let draft_texts = texts.clone();
        Effect::new(move |_| save_draft(units.get(), &draft_texts));
        Effect::new(move |_| save_units(units.get()));

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
            notice: RwSignal::new(notice),
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
                state.texts[i].set(text);
            }
        }
        state
    }

    /// Shows a scenario in the form: every field, choice and list, and the fields the form does
    /// not show (kept in `base`). Used when the page starts and when a scenario is pasted in.
    pub fn apply(&self, s: &Scenario) {
        self.base.set(s.clone());
        let units = self.units.get_untracked();
        for (i, (f, text)) in FIELDS.iter().zip(&self.texts).enumerate() {
            let shown = text_for_in(f, s, units);
            self.pinned.update_value(|p| p[i] = (f.get)(s).map(|si| (shown.clone(), si)));
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
                })
                .collect(),
            _ => Vec::new(),
        };
        self.next_row_key.set(start + rows.len() as u32);
        self.mixture.set(rows);
        self.own_name.set(s.custom_compounds.first().map(|c| c.name.clone()).unwrap_or_default());
        self.fuel.set(s.boiler.fuel);
        self.currency.set(s.costs.currency.clone());
        self.metal.set(s.still.metal);
        self.condenser_kind.set(s.condenser.kind);
    }

    /// Reads a pasted scenario (JSON, any saved version) and shows it; an error in words if it
    /// cannot be read.
    pub fn import(&self, text: &str) -> Result<(), String> {
        match migrate(text) {
            Some(s) => {
                self.apply(&s);
                Ok(())
            }
            None => {
                Err("This is not a scenario the page can read: check that the whole text was copied.".into())
            }
        }
    }

    /// Shows the form and the answers in other units. Every number typed is carried over as
    /// the same quantity, so the scenario (always SI) does not change.
    pub fn set_units(&self, to: UnitSystem) {
        let from = self.units.get_untracked();
        for (i, (f, text)) in FIELDS.iter().zip(&self.texts).enumerate() {
            let before = text.get_untracked();
            // The exact SI value behind the old text: pinned, or read in the old units. Text
            // that is not a number stays as typed.
            let exact = self
                .pinned
                .with_value(|p| p[i].as_ref().filter(|(t, _)| *t == before).map(|(_, v)| *v))
                .or_else(|| parse_number(&before).ok().flatten().map(|v| f.to_si_in(from, v)));
            let converted = exact.map(|si| text_in(f, si, to)).unwrap_or(before);
            self.pinned.update_value(|p| p[i] = exact.map(|v| (converted.clone(), v)));
            text.set(converted);
        }
        self.units.set(to);
    }

    /// Adds a line to the oil analysis.
    pub fn add_mix_row(&self, compound: &str) {
        let key = self.next_row_key.get_untracked();
        self.next_row_key.set(key + 1);
        let row = MixRow {
            key,
            compound: RwSignal::new(compound.to_string()),
            percent: RwSignal::new(String::new()),
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

#[cfg(test)]
mod tests {
    use super::*;
    use wasm_bindgen_test::wasm_bindgen_test;

    #[wasm_bindgen_test]
    fn a_bare_scenario_from_before_the_envelope_still_loads() {
        let bare = r#"{"charge":{"plant_mass_kg":42.0}}"#;
        assert_eq!(migrate(bare).unwrap().charge.plant_mass_kg, 42.0);
    }

    #[wasm_bindgen_test]
    fn corrupt_or_future_records_are_refused_not_guessed() {
        assert!(migrate("{not json").is_none());
        assert!(migrate(r#"{"record_version":99,"scenario":{}}"#).is_none());
        assert!(migrate(r#"{"charge":{"plant_mass_kg":"lots"}}"#).is_none());
    }
}
