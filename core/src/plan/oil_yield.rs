//! The yield: the oil the steam carries over with its range, what stays dissolved in
//! the kept hydrosol, what separates, and the water the run uses.

use super::equilibrium::Equilibrium;
use super::timeline::Timeline;
use super::{Range, Resolved, WaterPlan, YieldPlan};
use crate::codistillation::Cut;
use crate::recovery;
use crate::scenario::Scenario;

/// Dissolved share of the oil above which returning the waters pays.
/// Common practice, no source: redistilling the waters pays when they hold several % of the oil.
const COHOBATION_SHARE: f64 = 0.05;
/// Dissolved share above which the hydrosol is the product (judgement, no source).
const HYDROSOL_PRODUCT_SHARE: f64 = 0.8;

/// Share of the charge's oil that a given least steam per kg of that oil can carry, from the
/// cuts' cumulative least steam (monotone), linear within a cut.
fn carried_fraction(cuts: &[Cut], steam_per_kg_oil: f64) -> f64 {
    let mut steam = 0.0;
    for cut in cuts {
        let next = steam + cut.steam_kg_per_kg_oil;
        if steam_per_kg_oil <= next {
            let within = if cut.steam_kg_per_kg_oil > 0.0 {
                (steam_per_kg_oil - steam) / cut.steam_kg_per_kg_oil
            } else {
                1.0
            };
            return cut.from_fraction + within.clamp(0.0, 1.0) * (cut.to_fraction - cut.from_fraction);
        }
        steam = next;
    }
    cuts.last().map_or(0.0, |c| c.to_fraction)
}

/// Oil carried over from a charge holding `oil_kg`: the plant's release over the run (first
/// order) capped by what the steam passed can carry (Dalton's least steam, cut by cut).
fn carried_kg(eq: &Equilibrium, tl: &Timeline, oil_kg: f64, released_fraction: f64) -> f64 {
    let by_steam = carried_fraction(&eq.plan.cuts, tl.plan.distillate_steam_kg / oil_kg);
    oil_kg * released_fraction.min(by_steam)
}

/// Mass balance of the oil: carried over = min(release, steam's carrying power); dissolved =
/// Σ x_i S_i × kept hydrosol volume (Raoult's law for solubility from an ideal oil);
/// separable = carried over − dissolved. The range comes from the oil content and rate
/// constant spreads, each end with its own steam cap.
pub(super) fn oil_yield(s: &Scenario, r: &Resolved, eq: &Equilibrium, tl: &Timeline) -> YieldPlan {
    let plant_kg = s.charge.plant_mass_kg;
    let target = eq.target_fraction;
    let run_s = tl.plan.time_after_first_drop_s;
    let (content_low, content_high) = r.oil_content_spread;
    let (k_low, k_high) = r.rate_constant_spread;
    let release_low = recovery::recovered_fraction(k_low, run_s).min(target);
    let release_high = recovery::recovered_fraction(k_high, run_s).max(target);
    let carried = Range {
        low: carried_kg(eq, tl, plant_kg * content_low, release_low),
        central: carried_kg(eq, tl, eq.oil_in_charge_kg, target),
        high: carried_kg(eq, tl, plant_kg * content_high, release_high),
    };
    let mole_fractions = r.oil.mole_fractions();
    let solubility: f64 =
        r.oil.components.iter().zip(&mole_fractions).map(|(c, x)| x * c.water_solubility_kg_per_m3).sum();
    let dissolvable = solubility * tl.plan.hydrosol_volume_m3;
    let separable = |carried: f64| (carried - dissolvable).max(0.0);
    let oil_kg = Range {
        low: separable(carried.low),
        central: separable(carried.central),
        high: separable(carried.high),
    };
    let dissolved = dissolvable.min(carried.central);
    let dissolved_share = if carried.central > 0.0 { dissolved / carried.central } else { 0.0 };
    let rho_oil = r.oil_density_kg_per_m3;
    YieldPlan {
        oil_in_charge_kg: eq.oil_in_charge_kg,
        carried_over_kg: carried,
        oil_volume_m3: Range {
            low: oil_kg.low / rho_oil,
            central: oil_kg.central / rho_oil,
            high: oil_kg.high / rho_oil,
        },
        recovery_percent_of_plant: Range {
            low: 100.0 * oil_kg.low / plant_kg,
            central: 100.0 * oil_kg.central / plant_kg,
            high: 100.0 * oil_kg.high / plant_kg,
        },
        oil_kg,
        dissolved_in_hydrosol_kg: dissolved,
        dissolved_share,
        hydrosol_is_the_product: dissolved_share > HYDROSOL_PRODUCT_SHARE,
        cohobation_advised: dissolved_share > COHOBATION_SHARE && !s.run.cohobation,
    }
}

/// Boiler feed (fill plus fresh make-up) and cooling water for one run.
pub(super) fn water_use(s: &Scenario, tl: &Timeline, cooling_water_kg: f64) -> WaterPlan {
    let boiler_feed_kg = s.boiler.usable_water_kg + tl.makeup_kg;
    WaterPlan { boiler_feed_kg, cooling_water_kg, total_kg: boiler_feed_kg + cooling_water_kg }
}
