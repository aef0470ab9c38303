//! Crop presets: what a grower typically charges, with each number's source.
//!
//! A preset only fills in defaults; every value stays editable in the scenario.
//! The table itself is data, in [`table`].

mod table;

pub use table::CROPS;

use serde::Serialize;

/// Specific heat of liquid water between 20 and 100 °C, J/(kg K): 4.18 kJ/(kg K) within 1 %
/// (IAPWS-95 tables: 4181 J/(kg K) at 25 °C, 4216 at 100 °C, from memory).
pub const WATER_HEAT_CAPACITY_J_PER_KG_K: f64 = 4180.0;

/// Specific heat of dry leaf, flower and seed matter, J/(kg K): about 1.7 kJ/(kg K), between the
/// component values of the Choi & Okos (1986) food-property model near 25 °C for carbohydrate
/// (1.55), fibre (1.85) and protein (2.01 kJ/(kg K)) (as given in the ASHRAE Refrigeration
/// Handbook; coefficients from memory). With [`charge_heat_capacity_j_per_kg_k`] it gives
/// 3.78 kJ/(kg K) at 84 % water, inside the 3.2-4.0 kJ/(kg K) measured on fresh leaves of 13
/// species (Zhang, Kaiser, Zhang, Marcelis & Vialet-Chabrand, Plant Methods 2025,
/// doi:10.1186/s13007-025-01326-3).
pub const DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K: f64 = 1700.0;

/// Specific heat of oven-dry wood near 20-100 °C, J/(kg K) (ASHRAE woods, computed with ht 1.2.0).
pub const DRY_WOOD_HEAT_CAPACITY_J_PER_KG_K: f64 = 1630.0;

/// Specific heat of a charge, J/(kg K), as the mass-weighted mix of its water and dry matter:
///
/// c_p = w c_p,water + (1 - w) c_p,dry
///
/// with w the water (moisture) mass fraction on the wet basis, as loaded. This is Siebel's rule
/// for moist foods above freezing (Siebel 1892; the additive form used in the ASHRAE
/// Refrigeration Handbook, chapter "Thermal properties of foods"); it ignores bound-water and
/// temperature effects, a few percent. Valid for 0 ≤ w ≤ 1 above 0 °C; the caller checks the
/// range (outside it the formula is returned unchanged, never a panic).
///
/// Use it so that the charge's heat capacity follows its moisture: pass the scenario's moisture
/// (or the crop's `moisture_fraction`) and [`DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K`] (or
/// [`DRY_WOOD_HEAT_CAPACITY_J_PER_KG_K`] for wood chips).
///
/// ```
/// use stillroom_core::crops::{charge_heat_capacity_j_per_kg_k, DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K};
/// // Fresh peppermint, 84 % water: about 3.78 kJ/(kg K), within the 3.2-4.0 measured on fresh
/// // leaves (Zhang et al., Plant Methods 2025).
/// let cp = charge_heat_capacity_j_per_kg_k(0.84, DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K);
/// assert!((cp - 3783.2).abs() < 0.1);
/// // The ends: all water, all dry matter.
/// assert_eq!(charge_heat_capacity_j_per_kg_k(1.0, 1700.0), 4180.0);
/// assert_eq!(charge_heat_capacity_j_per_kg_k(0.0, 1700.0), 1700.0);
/// ```
pub const fn charge_heat_capacity_j_per_kg_k(moisture_fraction: f64, dry_matter_cp_j_per_kg_k: f64) -> f64 {
    moisture_fraction * WATER_HEAT_CAPACITY_J_PER_KG_K + (1.0 - moisture_fraction) * dry_matter_cp_j_per_kg_k
}

/// The state the charge is loaded in; it sets the basis of the oil content and the moisture.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize)]
#[serde(rename_all = "snake_case")]
pub enum ChargeCondition {
    /// Freshly cut, about 65-92 % water.
    Fresh,
    /// Wilted in the field for a day or two, or woody-leaved, about 40-70 % water.
    Wilted,
    /// Air-dried herb, seed, bud, berry or wood, about 5-15 % water.
    Dried,
}

impl ChargeCondition {
    /// The moisture span (wet basis, mass fraction) a charge in this condition usually has:
    /// common practice, no source (fresh leafy herbs 80-88 %, wilted 50-65 %, air-dried 8-12 %,
    /// from memory, each widened to cover the tables' crops).
    pub const fn usual_moisture_fraction(self) -> (f64, f64) {
        match self {
            ChargeCondition::Fresh => (0.65, 0.92),
            ChargeCondition::Wilted => (0.4, 0.7),
            ChargeCondition::Dried => (0.05, 0.15),
        }
    }
}

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
    /// Typical run, minutes after the first drop. Consistent with the rate constant: 95 % is
    /// out at t95 = 3/k, so the typical run lies within 25 % of 3/k_typical and its spread
    /// contains it (checked by the table tests).
    pub typical_run_min: Spread,
    pub typical_run_source: &'static str,
    /// Distillate water per kg of oil in practice (kg/kg, low / typical / high), for judging a
    /// planned run; never below the ideal co-distillation minimum (checked in
    /// `tests/tests/reference_crops.rs`).
    pub typical_water_to_oil_ratio: Spread,
    pub water_to_oil_source: &'static str,
    /// Steam rate per kg of charge, kg/h per kg.
    pub steam_rate_kg_per_h_per_kg: f64,
    pub steam_rate_source: &'static str,
    /// Bulk (packing) density of the charge in the still.
    pub charge_density_kg_per_m3: f64,
    pub charge_density_source: &'static str,
    /// Fresh, wilted or dried: the basis of `oil_content_percent` and of the moisture.
    pub charge_condition: ChargeCondition,
    /// Water content of the charge as loaded, mass fraction (wet basis).
    pub moisture_fraction: f64,
    /// Specific heat of the dry matter ([`DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K`] or
    /// [`DRY_WOOD_HEAT_CAPACITY_J_PER_KG_K`]), for [`charge_heat_capacity_j_per_kg_k`] at
    /// whatever moisture the grower enters.
    pub dry_matter_heat_capacity_j_per_kg_k: f64,
    /// Specific heat of the charge as loaded: [`charge_heat_capacity_j_per_kg_k`] of
    /// `moisture_fraction` and `dry_matter_heat_capacity_j_per_kg_k`, so they never disagree.
    pub plant_heat_capacity_j_per_kg_k: f64,
    pub thermal_source: &'static str,
    /// Recommended distillate (condenser outlet) temperature; warm for oils that congeal.
    pub distillate_temperature_c: f64,
    pub distillate_temperature_source: &'static str,
}

impl Crop {
    /// Each source text of the row with what it supports, in the order the page lists them.
    /// The texts are "" in a build without the feature `source-texts` (the page's): the build
    /// writes them natively into `sources.json`, which the page fetches.
    pub fn sources(&self) -> [(&'static str, &'static str); 10] {
        [
            ("Oil content", self.oil_content_source),
            ("Composition", self.composition_source),
            ("Oil density", self.oil_density_source),
            ("Recovery rate", self.rate_constant_source),
            ("Run time", self.typical_run_source),
            ("Distillate water per kg of oil", self.water_to_oil_source),
            ("Steam rate", self.steam_rate_source),
            ("Packing", self.charge_density_source),
            ("Moisture and heat capacity", self.thermal_source),
            ("Distillate temperature", self.distillate_temperature_source),
        ]
    }
}
