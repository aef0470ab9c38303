//! The yield: the oil the steam carries over, what stays dissolved in the kept hydrosol, what
//! separates, and the water the run uses.

use super::equilibrium::Equilibrium;
use super::knobs::Knobs;
use super::timeline::Timeline;
use super::{Resolved, WaterPlan};
use crate::scenario::Scenario;

/// Dissolved share of the oil above which returning the waters pays.
/// Common practice, no source: redistilling the waters pays when they hold several % of the oil.
pub(super) const COHOBATION_SHARE: f64 = 0.05;
/// Dissolved share above which the hydrosol is the product (judgement, no source).
pub(super) const HYDROSOL_PRODUCT_SHARE: f64 = 0.8;

/// The oil's mass balance for one run.
#[derive(Debug, Clone, Copy, PartialEq)]
pub(super) struct OilBalance {
    /// Carried over by the steam at the end of the run (the target share of the charge's oil).
    pub carried_kg: f64,
    /// Held dissolved in the kept hydrosol.
    pub dissolved_kg: f64,
    /// Separates: carried over less dissolved.
    pub separable_kg: f64,
}

/// Mass balance of the oil: carried over = the target share (the run lasts until the release-
/// and-carry model reaches it); dissolved = Σ x_i S_i × kept hydrosol volume (Raoult's law for
/// the solubility of each compound from an ideal oil, S_i the pure compound's solubility);
/// separable = carried over − dissolved, never below zero.
pub(super) fn oil_balance(
    s: &Scenario,
    r: &Resolved,
    eq: &Equilibrium,
    tl: &Timeline,
    knobs: &Knobs,
) -> OilBalance {
    let carried_kg = super::oil_in_charge_kg(s, r) * eq.target_fraction;
    let mole_fractions = r.oil.mole_fractions();
    let solubility: f64 =
        r.oil.components.iter().zip(&mole_fractions).map(|(c, x)| x * c.water_solubility_kg_per_m3).sum();
    let dissolved_kg = (solubility * knobs.solubility_factor * tl.plan.hydrosol_volume_m3).min(carried_kg);
    OilBalance { carried_kg, dissolved_kg, separable_kg: carried_kg - dissolved_kg }
}

/// Boiler feed (fill plus fresh make-up) and cooling water for one run.
pub(super) fn water_use(s: &Scenario, tl: &Timeline, cooling_water_kg: f64) -> WaterPlan {
    let boiler_feed_kg = s.boiler.usable_water_kg + tl.makeup_kg;
    WaterPlan { boiler_feed_kg, cooling_water_kg, total_kg: boiler_feed_kg + cooling_water_kg }
}
