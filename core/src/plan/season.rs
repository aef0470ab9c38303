//! The season: what the still holds, and a harvest's charges run back to back: the
//! first from cold, the later ones with the boiler and still still hot.

use super::timeline::Timeline;
use super::{EnergyPlan, Resolved, SeasonPlan, WaterPlan, YieldPlan};
use crate::heat;
use crate::scenario::Scenario;
use crate::season as law;

/// What the still holds at the crop's packing density, if its volume is known.
pub(super) fn still_capacity_kg(s: &Scenario, r: &Resolved) -> Option<f64> {
    match (s.still.volume_m3, r.crop) {
        (Some(v), Some(crop)) => Some(law::charge_mass_kg(v, crop.charge_density_kg_per_m3)),
        _ => None,
    }
}

/// A later charge, started hot: heat, time and water it needs.
struct HotRestart {
    useful_heat_j: f64,
    time_s: f64,
    boiler_feed_kg: f64,
    turnaround_loss_j: f64,
}

/// The still's wall loss over the turnaround, U A (T − T_air) t, capped at the heat the still
/// and the water left in the boiler hold (Newton cooling at the hot temperature: an upper
/// bound, as the still cools while it stands).
fn turnaround_loss_j(s: &Scenario, tl: &Timeline, left_in_boiler_kg: f64, t_hot_c: f64) -> f64 {
    let area = heat::cylinder_surface_m2(tl.plan.still_volume_used_m3, s.still.height_to_diameter);
    let rate_w = heat::wall_loss_w(s.still.wall_u_w_per_m2_k, area, t_hot_c, s.site.ambient_temperature_c);
    let stored_j = tl.still_heating_j + left_in_boiler_kg * tl.heat_per_kg_fill_j;
    (rate_w * s.run.turnaround_min * 60.0).min(stored_j)
}

/// A charge after the first: the boiler water left hot is topped up to its fill with feed, the
/// still's metal is already hot, the new charge is cold; the turnaround's wall loss is made good.
fn hot_restart(s: &Scenario, tl: &Timeline, energy: &EnergyPlan, t_hot_c: f64) -> HotRestart {
    let run = &tl.plan;
    let refill_kg = (run.boiler_water_evaporated_kg - tl.makeup_kg - tl.returned_kg).max(0.0);
    let left_kg = (s.boiler.usable_water_kg - refill_kg).max(0.0);
    let refill_j = refill_kg * tl.heat_per_kg_fill_j;
    let loss_j = turnaround_loss_j(s, tl, left_kg, t_hot_c);
    let saved_j = tl.boiler_water_heating_j + tl.still_heating_j;
    let useful_heat_j = energy.useful_heat_j - saved_j + refill_j + loss_j;
    let net_w = run.useful_heat_w - tl.wall_loss_w;
    let saved_s = run.time_to_boil_s + tl.still_heating_j / net_w;
    HotRestart {
        useful_heat_j,
        time_s: run.total_time_s - saved_s + (refill_j + loss_j) / run.useful_heat_w,
        boiler_feed_kg: refill_kg + tl.makeup_kg,
        turnaround_loss_j: loss_j,
    }
}

/// One run per charge over the harvest: the first from cold, each later one started hot after
/// the turnaround; oil in proportion to the plant distilled.
pub(super) fn season(
    s: &Scenario,
    r: &Resolved,
    tl: &Timeline,
    one_run: (&EnergyPlan, &WaterPlan, &YieldPlan),
    still_capacity_kg: Option<f64>,
    t_hot_c: f64,
) -> Option<SeasonPlan> {
    let (energy, water, oil) = one_run;
    let harvest = s.season.harvest_kg?;
    let charges = law::charges_for_harvest(harvest, s.charge.plant_mass_kg);
    let later = (charges as f64 - 1.0).max(0.0);
    let hot = hot_restart(s, tl, energy, t_hot_c);
    let later_fuel = heat::fuel_amount(hot.useful_heat_j, s.boiler.fuel, r.efficiency);
    Some(SeasonPlan {
        still_capacity_kg,
        charges,
        first_charge_time_s: tl.plan.total_time_s,
        later_charge_time_s: hot.time_s,
        later_charge_fuel_amount: later_fuel,
        turnaround_heat_loss_j: hot.turnaround_loss_j,
        total_time_s: tl.plan.total_time_s + later * (s.run.turnaround_min * 60.0 + hot.time_s),
        fuel_amount: energy.fuel_amount + later * later_fuel,
        water_kg: water.total_kg + later * (hot.boiler_feed_kg + water.cooling_water_kg),
        oil_kg: oil.oil_kg.central * harvest / s.charge.plant_mass_kg,
    })
}
