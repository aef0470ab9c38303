//! Stage 8, the yield: the oil to expect with its range, what stays dissolved in the hydrosol,
//! and the water the run uses.

use super::equilibrium::Equilibrium;
use super::timeline::Timeline;
use super::{Range, Resolved, WaterPlan, YieldPlan};
use crate::recovery;
use crate::scenario::Scenario;

/// Dissolved share of the oil above which returning the waters pays.
/// Common practice, no source: redistilling the waters pays when they hold several % of the oil.
const COHOBATION_SHARE: f64 = 0.05;

/// Oil at the target with its low-high range (oil content and rate constant spreads), and the
/// oil the hydrosol holds at saturation (Σ x_i S_i times the hydrosol volume).
pub(super) fn oil_yield(s: &Scenario, r: &Resolved, eq: &Equilibrium, tl: &Timeline) -> YieldPlan {
    let plant_kg = s.charge.plant_mass_kg;
    let target = eq.target_fraction;
    let central = tl.oil_recovered_kg;
    let (content_low, content_high) = r.oil_content_spread;
    let (k_low, k_high) = r.rate_constant_spread;
    let run_s = tl.plan.time_after_first_drop_s;
    let low = plant_kg * content_low * recovery::recovered_fraction(k_low, run_s).min(target);
    let high = plant_kg * content_high * recovery::recovered_fraction(k_high, run_s).max(target);
    let rho_oil = r.oil_density_kg_per_m3;
    let mole_fractions = r.oil.mole_fractions();
    let solubility: f64 =
        r.oil.components.iter().zip(&mole_fractions).map(|(c, x)| x * c.water_solubility_kg_per_m3).sum();
    let dissolved = (solubility * tl.plan.hydrosol_volume_m3).min(central);
    let dissolved_share = dissolved / central;
    YieldPlan {
        oil_in_charge_kg: eq.oil_in_charge_kg,
        oil_kg: Range { low, central, high },
        oil_volume_m3: Range { low: low / rho_oil, central: central / rho_oil, high: high / rho_oil },
        recovery_percent_of_plant: Range {
            low: 100.0 * low / plant_kg,
            central: 100.0 * central / plant_kg,
            high: 100.0 * high / plant_kg,
        },
        dissolved_in_hydrosol_kg: dissolved,
        dissolved_share,
        cohobation_advised: dissolved_share > COHOBATION_SHARE,
    }
}

/// Boiler feed (fill plus make-up) and cooling water for one run.
pub(super) fn water_use(s: &Scenario, tl: &Timeline, cooling_water_kg: f64) -> WaterPlan {
    let boiler_feed_kg = s.boiler.usable_water_kg + tl.makeup_kg;
    WaterPlan { boiler_feed_kg, cooling_water_kg, total_kg: boiler_feed_kg + cooling_water_kg }
}
