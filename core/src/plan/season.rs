//! Stage 9, the season: what the still holds, and a harvest's charges, hours, fuel and oil.

use super::{EnergyPlan, Resolved, RunPlan, SeasonPlan, WaterPlan};
use crate::scenario::Scenario;
use crate::season as law;

/// What the still holds at the crop's packing density, if its volume is known.
pub(super) fn still_capacity_kg(s: &Scenario, r: &Resolved) -> Option<f64> {
    match (s.still.volume_m3, r.crop) {
        (Some(v), Some(crop)) => Some(law::charge_mass_kg(v, crop.charge_density_kg_per_m3)),
        _ => None,
    }
}

/// One run per charge, repeated over the harvest with a turnaround between charges.
pub(super) fn season(
    s: &Scenario,
    r: &Resolved,
    one_run: (&RunPlan, &EnergyPlan, &WaterPlan),
    still_capacity_kg: Option<f64>,
    target_fraction: f64,
) -> Option<SeasonPlan> {
    let (run, energy, water) = one_run;
    let harvest = s.season.harvest_kg?;
    let charges = law::charges_for_harvest(harvest, s.charge.plant_mass_kg);
    let n = charges as f64;
    Some(SeasonPlan {
        still_capacity_kg,
        charges,
        total_time_s: n * run.total_time_s + (n - 1.0).max(0.0) * s.run.turnaround_min * 60.0,
        fuel_amount: n * energy.fuel_amount,
        water_kg: n * water.total_kg,
        oil_kg: harvest * r.oil_content_fraction * target_fraction,
    })
}
