//! Heat and fuel: where the boiler's heat goes, and the fuel and money it costs.

use super::timeline::Timeline;
use super::{CostPlan, EnergyPlan, Resolved};
use crate::heat;
use crate::scenario::{Costs, Scenario};

/// The heat sinks of the run, the fuel that feeds them (Q_fuel = Q_useful / η) and the costs.
/// `oil_volume_m3` is the separable oil, for the cost per millilitre.
/// `heat_balance_error` is left at 0 here: the plan sets it from `plan/balance.rs`.
pub(super) fn energy(s: &Scenario, r: &Resolved, h_fg: f64, tl: &Timeline, oil_volume_m3: f64) -> EnergyPlan {
    let run = &tl.plan;
    let wall_loss_j = tl.wall_loss_w * (tl.warm_up_s + run.time_after_first_drop_s);
    let steam_to_condenser_j = run.distillate_steam_kg * h_fg;
    let useful_heat_j = tl.boiler_water_heating_j
        + tl.charge_heating_j
        + tl.still_heating_j
        + wall_loss_j
        + steam_to_condenser_j
        + tl.makeup_water_heating_j;
    let fuel_amount = heat::fuel_amount(useful_heat_j, s.boiler.fuel, r.efficiency);
    EnergyPlan {
        boiler_water_heating_j: tl.boiler_water_heating_j,
        charge_heating_j: tl.charge_heating_j,
        still_heating_j: tl.still_heating_j,
        wall_loss_j,
        steam_to_condenser_j,
        makeup_water_heating_j: tl.makeup_water_heating_j,
        useful_heat_j,
        fuel_heat_j: useful_heat_j / r.efficiency,
        fuel: s.boiler.fuel,
        fuel_amount,
        fuel_unit: s.boiler.fuel.data().unit.to_string(),
        efficiency: r.efficiency,
        heat_balance_error: 0.0,
        cost: cost_of_run(&s.costs, fuel_amount, s.charge.plant_mass_kg, run.total_time_s, oil_volume_m3),
    }
}

/// Fuel, plant and labour for one run, when any price is given.
fn cost_of_run(
    costs: &Costs,
    fuel_amount: f64,
    plant_kg: f64,
    total_time_s: f64,
    oil_volume_m3: f64,
) -> Option<CostPlan> {
    if costs.fuel_price_per_unit.is_none()
        && costs.plant_value_per_kg.is_none()
        && costs.labour_per_hour.is_none()
    {
        return None;
    }
    let fuel = fuel_amount * costs.fuel_price_per_unit.unwrap_or(0.0);
    let plant = plant_kg * costs.plant_value_per_kg.unwrap_or(0.0);
    let labour = total_time_s / 3600.0 * costs.labour_per_hour.unwrap_or(0.0);
    let total = fuel + plant + labour;
    let ml = oil_volume_m3 * 1e6;
    Some(CostPlan {
        currency: costs.currency.clone(),
        fuel,
        plant,
        labour,
        total,
        per_millilitre_oil: if ml > 0.0 { Some(total / ml) } else { None },
    })
}
