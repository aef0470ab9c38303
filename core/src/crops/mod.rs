//! Crop presets: what a grower typically charges, with each number's source.
//!
//! A preset only fills in defaults; every value stays editable in the scenario.
//! The table itself is data, in [`table`].

mod table;

pub use table::CROPS;

use serde::Serialize;

/// A low / typical / high triple, for quantities that vary from field to field.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct Spread {
    pub low: f64,
    pub typical: f64,
    pub high: f64,
}

/// One crop preset.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct Crop {
    /// Stable identifier used in scenarios (lowercase, ASCII, hyphens).
    pub id: &'static str,
    pub name: &'static str,
    /// Botanical name and the part charged (e.g. "Lavandula angustifolia, fresh flowering tops").
    pub material: &'static str,
    /// Oil content, % of charged (as-is) mass, w/w.
    pub oil_content_percent: Spread,
    pub oil_content_source: &'static str,
    /// Main compounds by mass fraction of the oil, as (compound id, fraction). Need not sum to 1:
    /// the oil phase is renormalised over the listed compounds.
    pub composition: &'static [(&'static str, f64)],
    pub composition_source: &'static str,
    /// Density of the whole oil at about 20 °C.
    pub oil_density_kg_per_m3: f64,
    pub oil_density_source: &'static str,
    /// First-order recovery constant k, per minute of distillation after the first drop.
    pub rate_constant_per_min: Spread,
    pub rate_constant_source: &'static str,
    /// Typical run, minutes after the first drop.
    pub typical_run_min: Spread,
    pub typical_run_source: &'static str,
    /// Steam rate per kg of charge, kg/h per kg.
    pub steam_rate_kg_per_h_per_kg: f64,
    pub steam_rate_source: &'static str,
    /// Bulk (packing) density of the charge in the still.
    pub charge_density_kg_per_m3: f64,
    pub charge_density_source: &'static str,
    /// Water content of the charge as loaded, mass fraction.
    pub moisture_fraction: f64,
    /// Specific heat of the charge as loaded.
    pub plant_heat_capacity_j_per_kg_k: f64,
    pub thermal_source: &'static str,
    /// Recommended distillate (condenser outlet) temperature; warm for oils that congeal.
    pub distillate_temperature_c: f64,
    pub distillate_temperature_source: &'static str,
}
