//! The grower's saved plans and stills: named scenarios, and named equipment (still, boiler,
//! condenser, separator) that can be used with any crop. Saved under [`Kind::Library`]'s key as
//! one versioned record.

use super::Workbench;
use crate::records::{self, Kind};
use leptos::prelude::*;
use serde::{Deserialize, Serialize};
use stillroom_core::Scenario;
use stillroom_core::scenario::{Boiler, Condenser, Separator, Still};

/// One saved plan: a scenario under the grower's name for it.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct SavedPlan {
    /// Unique within the library, never reused (the list's key).
    pub id: u64,
    pub name: String,
    /// When it was saved or last renamed, ms since 1970 (the browser's clock).
    pub saved_ms: f64,
    pub scenario: Scenario,
}

/// A still's equipment, as the scenario holds it.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct Equipment {
    pub still: Still,
    pub boiler: Boiler,
    pub condenser: Condenser,
    pub separator: Separator,
}

impl Equipment {
    /// The equipment of a scenario.
    pub fn of(s: &Scenario) -> Equipment {
        Equipment {
            still: s.still.clone(),
            boiler: s.boiler.clone(),
            condenser: s.condenser.clone(),
            separator: s.separator.clone(),
        }
    }

    /// `s` with this equipment in place of its own; the crop, site, oil and run stay.
    pub fn fitted_to(&self, s: &Scenario) -> Scenario {
        Scenario {
            still: self.still.clone(),
            boiler: self.boiler.clone(),
            condenser: self.condenser.clone(),
            separator: self.separator.clone(),
            ..s.clone()
        }
    }
}

/// One saved still.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct SavedStill {
    pub id: u64,
    pub name: String,
    pub saved_ms: f64,
    pub equipment: Equipment,
}

/// The library's stored record.
#[derive(Debug, Clone, PartialEq, Default, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct LibraryRecord {
    pub record_version: u32,
    pub plans: Vec<SavedPlan>,
    pub stills: Vec<SavedStill>,
}

/// The library record's version.
pub const LIBRARY_VERSION: u32 = 1;

/// The record text of a library.
pub fn library_text(plans: &[SavedPlan], stills: &[SavedStill]) -> String {
    let record =
        LibraryRecord { record_version: LIBRARY_VERSION, plans: plans.to_vec(), stills: stills.to_vec() };
    serde_json::to_string(&record).unwrap_or_default()
}

/// A library record's outline ([`read_library`] without the typed fields): its envelope, and
/// every saved plan and still an object with exactly the fields it must have.
pub fn library_outline(raw: &str) -> Result<(), String> {
    let value = records::outline(raw, "saved plans", LIBRARY_VERSION)?;
    records::items_with_fields(&value, "plans", &["id", "name", "saved_ms", "scenario"], "saved plan")?;
    records::items_with_fields(&value, "stills", &["id", "name", "saved_ms", "equipment"], "saved still")
}

/// Reads a stored library record, as strictly as every record (see [`crate::records`]).
pub fn read_library(raw: &str) -> Result<LibraryRecord, String> {
    records::read_strict::<LibraryRecord>(raw, "saved plans", LIBRARY_VERSION)
}

/// The saved plans and stills, in context; saved whenever they change.
#[derive(Clone, Copy)]
pub struct Library {
    pub plans: RwSignal<Vec<SavedPlan>>,
    pub stills: RwSignal<Vec<SavedStill>>,
}

impl Library {
    /// Reads the saved library (anything unreadable kept aside, and reported by the workbench
    /// once every part has loaded) and keeps it saved.
    pub fn new(wb: Workbench) -> Library {
        let store = wb.store;
        let found = store.load(Kind::Library, read_library).unwrap_or_default();
        let plans = RwSignal::new(found.plans);
        let stills = RwSignal::new(found.stills);
        Effect::new(move |_| {
            let text = plans.with(|p| stills.with(|s| library_text(p, s)));
            store.save(Kind::Library, text);
        });
        Library { plans, stills }
    }

    /// An id no saved plan or still has.
    pub fn fresh_id(&self) -> u64 {
        let most = self.plans.with_untracked(|p| p.iter().map(|x| x.id).max().unwrap_or(0));
        let most_still = self.stills.with_untracked(|s| s.iter().map(|x| x.id).max().unwrap_or(0));
        most.max(most_still) + 1
    }
}
