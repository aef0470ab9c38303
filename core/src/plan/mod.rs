//! The one entry point: [`plan`] turns a [`Scenario`] into a [`Plan`].
//!
//! The plan is a pipeline of stages, one file each, in the order of the run; each takes the
//! earlier stages' results and returns its own:
//! `site` (pressure, boiling point) → `equilibrium` (Dalton + Raoult, depletion, cuts) →
//! `timeline` (boil, first drop, run, boiler water) → `condenser` (duty, cooling water, the
//! distillate temperature a tub allows) → `layering` (oil and water densities at the separator,
//! cut by cut) → `separator` (Stokes check, vessel, outlet heights) → `oil_yield` (mass
//! balance of the oil, water use) → `balance` (the run stepped through, against the closed
//! form) → `energy` (heat and fuel) → `season` → `warnings`. Every number is recomputed
//! from the scenario; nothing is stored.

use crate::codistillation::Cut;
use crate::compounds::{self, Confidence};
use crate::crops::{self, Crop};
use crate::heat::Fuel;
use crate::oil::{Component, Oil};
use crate::scenario::*;
use serde::{Deserialize, Serialize};

mod balance;
mod condenser;
mod energy;
mod equilibrium;
mod knobs;
mod layering;
mod oil_yield;
mod ranges;
pub mod sanity;
mod season;
mod separator;
mod site;
mod timeline;
mod validate;
mod warnings;

pub use validate::{ESTIMATED_FILL_SHARE, ESTIMATED_PACKING_KG_PER_M3, estimated_still_volume_m3, validate};
pub use warnings::{OPPOSITE_ADVICE, opposite_advice};

macro_rules! output {
    ($($item:item)*) => { $(
        #[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
        #[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
        $item
    )* };
}

output! {
    /// Everything the run needs, in SI units.
    pub struct Plan {
        pub site: SitePlan,
        pub oil: OilPlan,
        pub codistillation: CodistillationPlan,
        pub run: RunPlan,
        pub energy: EnergyPlan,
        pub condenser: CondenserPlan,
        pub separator: SeparatorPlan,
        pub yield_estimate: YieldPlan,
        pub water_use: WaterPlan,
        pub season: Option<SeasonPlan>,
        /// Likely low and high of the headline answers.
        pub ranges: PlanRanges,
        pub warnings: Vec<Warning>,
    }

    /// The headline answers with their likely ranges (about P10-P90), from the uncertainties of
    /// the data and the grower's entries (`plan/ranges.rs`).
    pub struct PlanRanges {
        /// Steam the boiler raises over the run, kg.
        pub steam_kg: Answer,
        /// From the first drop to the target, s.
        pub run_time_s: Answer,
        /// Lighting to the end, s.
        pub total_time_s: Answer,
        /// Fuel for the run, in the fuel's unit.
        pub fuel_amount: Answer,
        pub cooling_water_kg: Answer,
        /// Boiler feed plus cooling water, kg.
        pub water_total_kg: Answer,
        /// Separable oil, kg.
        pub oil_kg: Answer,
        pub separator_volume_m3: Answer,
        /// Input ends whose plan failed (for example a burner too small at its lowest
        /// efficiency) and so are left out of the ranges.
        pub failed_ends: u32,
    }

    /// One answer: central value, likely low and high, and what moves it most.
    pub struct Answer {
        pub low: f64,
        pub central: f64,
        pub high: f64,
        pub mostly_from: Uncertainty,
    }

    pub struct SitePlan {
        pub pressure_pa: f64,
        pub pressure_from: PressureFrom,
        pub water_boiling_point_c: f64,
        /// Boiling point minus the standard sea-level boiling point (99.974 °C); negative uphill.
        pub boiling_point_shift_k: f64,
        pub latent_heat_j_per_kg: f64,
    }

    pub struct OilPlan {
        pub components: Vec<ComponentShare>,
        /// Density of the whole oil at 20 °C.
        pub density_kg_per_m3: f64,
        /// Density of the whole oil at the separator's temperature.
        pub density_at_separator_kg_per_m3: f64,
        /// Density of each distillate cut's oil at the separator's temperature, in cut order.
        pub cut_densities_at_separator_kg_per_m3: Vec<f64>,
        /// Where the oil gathers in the separator, at its temperature.
        pub collects_at: OilLayer,
        /// Whether some cuts float and others sink at the separator's temperature.
        pub mixed_density: bool,
        /// Temperature at which the whole oil is as dense as the water (nearest the separator's),
        /// if any between 1 °C and the boiling point.
        pub inversion_temperature_c: Option<f64>,
        /// Whether the oil's or a cut's density crosses the water's within 10 K of the separator.
        pub inversion_risk: bool,
    }

    pub struct ComponentShare {
        pub id: String,
        pub name: String,
        pub mass_fraction: f64,
        pub mole_fraction: f64,
        /// Share of this compound in the oil part of the first vapour, by mass.
        pub first_vapour_mass_fraction: f64,
        pub vapour_pressure_at_boiling_pa: f64,
        pub correlation_in_range: bool,
        pub confidence: Confidence,
    }

    pub struct CodistillationPlan {
        /// Boiling temperature of the water + oil mixture at the site.
        pub temperature_c: f64,
        /// How far below water's own boiling point the mixture boils.
        pub lowering_k: f64,
        pub water_partial_pressure_pa: f64,
        /// Thermodynamic least steam per kg of oil at the start of the run.
        pub min_steam_per_kg_oil: f64,
        /// Least steam to carry over all the oil (99.9 %) of this charge, kg.
        pub min_steam_whole_charge_kg: f64,
        /// Least steam to carry over the target share, kg.
        pub min_steam_to_target_kg: f64,
        /// Distillate cuts from the ideal depletion of the oil.
        pub cuts: Vec<Cut>,
    }

    pub struct RunPlan {
        /// Release constant at this run's specific steam rate, per minute.
        pub rate_constant_per_min: f64,
        /// The crop's (or the grower's) release constant at the crop's usual steam rate.
        pub reference_rate_constant_per_min: f64,
        /// Share of the saturation load the steam carries, after any channelling.
        pub vaporisation_efficiency: f64,
        /// Steam raised by the boiler while it runs, kg/s.
        pub steam_rate_kg_per_s: f64,
        /// Steam reaching the condenser once the charge is hot, kg/s (after wall losses).
        pub distillate_steam_rate_kg_per_s: f64,
        /// Heat reaching the water, W.
        pub useful_heat_w: f64,
        pub time_to_boil_s: f64,
        /// From lighting the boiler to the first drop of distillate.
        pub time_to_first_drop_s: f64,
        /// From the first drop to the target recovery.
        pub time_after_first_drop_s: f64,
        /// Lighting to the end of the run, including any refill reheating.
        pub total_time_s: f64,
        /// What decides the run's length.
        pub limited_by: RunLimit,
        /// Steam that condenses in the charge and on the still while warming them, kg.
        pub startup_condensate_kg: f64,
        /// Steam passed through the charge after the first drop, kg.
        pub distillate_steam_kg: f64,
        /// Hydrosol kept at the end: the distillate water less what was returned to the boiler.
        pub hydrosol_volume_m3: f64,
        /// Distillate water returned to the boiler during the run (cohobation), kg.
        pub returned_to_boiler_kg: f64,
        /// Planned steam over the thermodynamic least steam for the same oil.
        pub steam_to_minimum_ratio: f64,
        /// Distillate water per kg of oil recovered.
        pub water_to_oil_ratio: f64,
        /// Steam per hour per kg of charge, the rate growers compare.
        pub specific_steam_rate_kg_per_h_per_kg: f64,
        pub boiler_water_evaporated_kg: f64,
        /// Time from lighting at which the usable water is gone, if it runs out before the end.
        pub boiler_dry_after_s: Option<f64>,
        pub refills: u32,
        /// Share of the charge's oil carried over, by time since the first drop: (s, fraction).
        pub recovery_curve: Vec<(f64, f64)>,
        /// The still's volume the wall losses are reckoned on, m³: the grower's, or estimated
        /// from the charge when not given (`still_volume_estimated`).
        pub still_volume_used_m3: f64,
        /// Whether `still_volume_used_m3` is an estimate from the charge and its packing.
        pub still_volume_estimated: bool,
    }

    pub struct EnergyPlan {
        pub boiler_water_heating_j: f64,
        pub charge_heating_j: f64,
        pub still_heating_j: f64,
        pub wall_loss_j: f64,
        pub steam_to_condenser_j: f64,
        pub makeup_water_heating_j: f64,
        /// Sum of the above: the heat the water must receive.
        pub useful_heat_j: f64,
        /// Fuel heat: useful heat over efficiency.
        pub fuel_heat_j: f64,
        pub fuel: Fuel,
        pub fuel_amount: f64,
        pub fuel_unit: String,
        pub efficiency: f64,
        /// Largest relative gap between the closed-form time line and heat sum and the same run
        /// stepped through in time from its physical state (`plan/balance.rs`).
        pub heat_balance_error: f64,
        pub cost: Option<CostPlan>,
    }

    pub struct CostPlan {
        pub currency: String,
        pub fuel: f64,
        pub plant: f64,
        pub labour: f64,
        pub total: f64,
        pub per_millilitre_oil: Option<f64>,
    }

    pub struct CondenserPlan {
        pub kind: CondenserKind,
        pub duty_w: f64,
        pub duty_per_kg_steam_j: f64,
        /// Distillate temperature leaving the condenser: the one asked for, or warmer when a
        /// tub's water cannot bring it that low.
        pub distillate_outlet_c: f64,
        pub distillate_outlet_requested_c: f64,
        /// Cooling water flow: through a jacket all run; into a tub only once it has reached
        /// its warmest allowed temperature (0 when it never does).
        pub cooling_water_flow_kg_per_s: f64,
        /// Cooling water over the run: the jacket's flow, or the tub's fill plus its feed.
        pub cooling_water_per_run_kg: f64,
        /// Coil in a tub: how long the tub's own water lasts without a feed, s.
        pub tub_lasts_s: Option<f64>,
        /// Coil in a tub: how much the tub would warm over the whole run without a feed, K.
        pub tub_rise_over_run_k: Option<f64>,
        /// Coil in a tub: its temperature at the end of the run, °C.
        pub tub_end_c: Option<f64>,
        /// Coil in a tub: when the feed must start, s after the first drop, if it must.
        pub tub_feed_from_s: Option<f64>,
        pub condensing_area_m2: f64,
        pub cooling_area_m2: f64,
        pub area_m2: f64,
        pub tube_length_m: f64,
    }

    pub struct SeparatorPlan {
        pub distillate_flow_m3_per_s: f64,
        pub temperature_c: f64,
        pub water_density_kg_per_m3: f64,
        pub water_viscosity_pa_s: f64,
        /// Stokes velocity of the design droplet: positive rising, negative sinking.
        pub droplet_velocity_m_per_s: f64,
        pub droplet_reynolds_number: f64,
        /// Least surface area; None when the oil and water densities are too close for a
        /// gravity separator.
        pub plan_area_m2: Option<f64>,
        /// A practical cylinder: at least the least area, no taller than twice its width.
        pub diameter_m: Option<f64>,
        pub volume_m3: f64,
        pub height_m: Option<f64>,
        pub oil_outlet: OilLayer,
        /// Overflow of the upper liquid, above the vessel's bottom: the liquid height.
        pub top_outlet_height_m: Option<f64>,
        /// Overflow of the gooseneck that draws the lower liquid from the bottom.
        pub gooseneck_height_m: Option<f64>,
        /// Where the oil-water interface settles with these outlets (oil layer a fifth of the height).
        pub interface_height_m: Option<f64>,
        /// How many mm the interface moves per mm of gooseneck height.
        pub interface_per_gooseneck: Option<f64>,
        /// Interface height for the cut that puts it lowest and highest, with the same outlets.
        pub interface_low_m: Option<f64>,
        pub interface_high_m: Option<f64>,
    }

    pub struct YieldPlan {
        pub oil_in_charge_kg: f64,
        /// Oil the steam carries over by the end of the run (the target share of the charge's oil).
        pub carried_over_kg: f64,
        /// Oil that separates: carried over less what stays dissolved in the kept hydrosol, with
        /// its likely range (as `ranges.oil_kg`).
        pub oil_kg: Range,
        /// Volume of the separable oil at 20 °C.
        pub oil_volume_m3: Range,
        /// Separable oil as % of the charge mass.
        pub recovery_percent_of_plant: Range,
        /// Oil dissolved in the kept hydrosol (central case), from each compound's solubility
        /// near 25 °C: no temperature dependence is applied, none being known to the table.
        pub dissolved_in_hydrosol_kg: f64,
        /// Dissolved oil over oil carried over (central case).
        pub dissolved_share: f64,
        /// Almost all the oil stays dissolved: the hydrosol, not the oil, is the product.
        pub hydrosol_is_the_product: bool,
        pub cohobation_advised: bool,
    }

    pub struct WaterPlan {
        pub boiler_feed_kg: f64,
        pub cooling_water_kg: f64,
        pub total_kg: f64,
    }

    pub struct SeasonPlan {
        /// What the still holds at the crop's packing density, if its volume is given.
        pub still_capacity_kg: Option<f64>,
        pub charges: u32,
        /// The first charge, from cold, lighting to the end of its run.
        pub first_charge_time_s: f64,
        /// Each later charge, started with the boiler and still hot after the turnaround.
        pub later_charge_time_s: f64,
        pub later_charge_fuel_amount: f64,
        /// Heat the still loses while it stands between charges, J.
        pub turnaround_heat_loss_j: f64,
        /// All charges with the turnarounds between them.
        pub total_time_s: f64,
        pub fuel_amount: f64,
        pub water_kg: f64,
        pub oil_kg: f64,
    }

    /// Something the grower should know, with a stable code for the page.
    pub struct Warning {
        pub code: String,
        pub message: String,
    }

    /// A low, central and high estimate.
    pub struct Range {
        pub low: f64,
        pub central: f64,
        pub high: f64,
    }
}

/// An uncertain input the ranges swing.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize, Deserialize)]
#[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
#[serde(rename_all = "snake_case")]
pub enum Uncertainty {
    /// The crop's oil content (its field-to-field spread, or ±25 % of a typed figure).
    OilContent,
    /// The crop's release rate constant.
    RateConstant,
    /// The appliance's efficiency.
    BoilerEfficiency,
    /// The oil compounds' vapour-pressure laws.
    VapourPressures,
    /// The compounds' water solubilities.
    Solubilities,
    /// How close to saturation the steam leaves the charge.
    VaporisationEfficiency,
    /// How strongly release follows the steam rate.
    SteamDependence,
    /// The condenser's heat-transfer coefficients.
    CondenserU,
    /// The still wall's heat-loss coefficient.
    WallU,
}

#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize, Deserialize)]
#[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
#[serde(rename_all = "snake_case")]
pub enum PressureFrom {
    StandardAtmosphere,
    StationBarometer,
    SeaLevelBarometer,
}

#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize, Deserialize)]
#[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
#[serde(rename_all = "snake_case")]
pub enum OilLayer {
    /// Oil lighter than water floats: it is drawn off at the top, water leaves from the bottom.
    Top,
    /// Oil heavier than water sinks: it is drawn off at the bottom, water leaves from the top.
    Bottom,
}

#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize, Deserialize)]
#[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
#[serde(rename_all = "snake_case")]
pub enum RunLimit {
    /// Oil leaves the plant slower than the steam could carry it.
    Release,
    /// The steam cannot carry the oil as fast as the plant releases it (heavy oils).
    Steam,
}

/// Standard sea-level boiling point of water, °C (IF97 at 101 325 Pa).
const SEA_LEVEL_BOILING_C: f64 = 99.974_3;

/// Plans one run.
///
/// Checks every field first and returns all invalid ones together; then computes, in order,
/// the site pressure (US Standard Atmosphere 1976 or the barometer), the co-distillation
/// temperature and least steam (Dalton + Raoult, IAPWS-IF97), the time line (boiler heat-up,
/// start-up condensate, first-order recovery), heat and fuel, condenser, separator (Stokes),
/// yield and season. Each step's equations are documented in its module.
///
/// ```
/// use stillroom_core::{plan::plan, scenario::Scenario};
/// let p = plan(&Scenario::default()).unwrap();
/// // The invented default (lavender at 300 m) boils below 100 °C and needs steam.
/// assert!(p.site.water_boiling_point_c < 99.974);
/// assert!(p.codistillation.temperature_c < p.site.water_boiling_point_c);
/// assert!(p.run.distillate_steam_kg > p.codistillation.min_steam_to_target_kg);
/// ```
pub fn plan(scenario: &Scenario) -> Result<Plan, ScenarioErrors> {
    plan_with(scenario, Doubt::Swept)
}

/// Whether a plan sweeps its inputs' doubt for the ranges.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub(crate) enum Doubt {
    /// Every range from the swings of its inputs (what [`plan`] gives).
    Swept,
    /// Every range collapsed on its central value: for the sizing search, whose trials are
    /// judged on central values only and planned again in full once chosen.
    CentralOnly,
}

pub(crate) fn plan_with(scenario: &Scenario, doubt: Doubt) -> Result<Plan, ScenarioErrors> {
    let resolved = validate(scenario)?;
    let plan = compute(scenario, &resolved, doubt).map_err(|e| ScenarioErrors { errors: vec![*e] })?;
    sanity::checked(plan)
}

/// The scenario with every default filled in, ready to compute.
#[derive(Debug, Clone)]
pub struct Resolved {
    pub crop: Option<&'static Crop>,
    pub pressure_pa: f64,
    pub pressure_from: PressureFrom,
    pub oil: Oil,
    pub oil_density_kg_per_m3: f64,
    pub oil_content_fraction: f64,
    pub oil_content_spread: (f64, f64),
    pub moisture_fraction: f64,
    pub charge_heat_capacity_j_per_kg_k: f64,
    pub charge_temperature_c: f64,
    pub feed_temperature_c: f64,
    pub efficiency: f64,
    pub rate_constant_per_s: f64,
    pub rate_constant_spread: (f64, f64),
    pub distillate_outlet_c: f64,
    pub confidences: Vec<Confidence>,
    /// The still's volume, m³: given, or estimated from the charge (`validate.rs`).
    pub still_volume_m3: f64,
    pub still_volume_estimated: bool,
}

fn compute_error(field: &str, value: f64, valid: &str, message: &str) -> Box<FieldError> {
    Box::new(FieldError {
        field: field.to_string(),
        value: fmt_num(value),
        valid: valid.to_string(),
        message: message.to_string(),
        min: None,
        max: None,
    })
}

/// The stages in the order of the run, each reading the earlier stages' results.
fn compute(s: &Scenario, r: &Resolved, doubt: Doubt) -> Result<Plan, Box<FieldError>> {
    let site = site::site(r)?;
    let eq = equilibrium::equilibrium(s, r, &site)?;
    let knobs = knobs::Knobs::CENTRAL;
    let mut tl = timeline::timeline(s, r, &site, &eq, &knobs)?;
    let distillate_rate = tl.plan.distillate_steam_rate_kg_per_s;
    let run_s = tl.plan.time_after_first_drop_s;
    let cond = condenser::condenser(s, r, &site, distillate_rate, &knobs, run_s)?;
    let t_sep_c = cond.distillate_outlet_c;
    let condenser = cond.plan;
    let boiling_c = site.plan.water_boiling_point_c;
    let (oil, separator_water) = layering::layering(r, &eq, site.pressure_pa, boiling_c, t_sep_c, true)?;
    // The hydrosol's volume waits for the separator's temperature, which the condenser sets.
    tl.plan.hydrosol_volume_m3 =
        (tl.plan.distillate_steam_kg - tl.returned_kg) / separator_water.density_kg_per_m3;
    let separator = separator::separator(s, &separator_water, distillate_rate, &oil, t_sep_c);
    let balance = oil_yield::oil_balance(s, r, &eq, &tl, &knobs);
    let water_use = oil_yield::water_use(s, &tl, condenser.cooling_water_per_run_kg);
    let mut energy =
        energy::energy(s, r, site.latent_heat_j_per_kg, &tl, balance.separable_kg / r.oil_density_kg_per_m3);
    let stepped = balance::stepped_run(s, r, &site, &eq, &knobs, run_s);
    energy.heat_balance_error = balance::gap(&stepped, &tl, energy.useful_heat_j);
    let central = ranges::Headline {
        steam_kg: tl.plan.boiler_water_evaporated_kg,
        run_time_s: run_s,
        total_time_s: tl.plan.total_time_s,
        fuel_amount: energy.fuel_amount,
        cooling_water_kg: water_use.cooling_water_kg,
        water_total_kg: water_use.total_kg,
        oil_kg: balance.separable_kg,
        separator_volume_m3: separator.volume_m3,
    };
    let (spreads, failed_ends) = ranges::ranges(s, r, &site, &eq, &central, doubt == Doubt::Swept);
    let ranges = plan_ranges(&spreads, failed_ends);
    let yield_estimate = yield_plan(s, r, &balance, &ranges.oil_kg);
    let still_capacity_kg = season::still_capacity_kg(s, r);
    let t_hot_c = eq.temperature_k - 273.15;
    let season =
        season::season(s, r, &tl, (&energy, &water_use, &yield_estimate), still_capacity_kg, t_hot_c);
    let warnings = warnings::warnings(&warnings::Facts {
        scenario: s,
        resolved: r,
        equilibrium: &eq,
        oil: &oil,
        timeline: &tl,
        energy: &energy,
        condenser: &condenser,
        separator: &separator,
        oil_yield: &yield_estimate,
        still_capacity_kg,
    });
    Ok(Plan {
        site: site.plan,
        oil,
        codistillation: eq.plan,
        run: tl.plan,
        energy,
        condenser,
        separator,
        yield_estimate,
        water_use,
        season,
        ranges,
        warnings,
    })
}

/// Oil the charge holds: plant mass times the resolved oil content (which the ranges swing).
pub(crate) fn oil_in_charge_kg(s: &Scenario, r: &Resolved) -> f64 {
    s.charge.plant_mass_kg * r.oil_content_fraction
}

fn plan_ranges(spreads: &[ranges::Spread], failed_ends: u32) -> PlanRanges {
    let answer = |i: usize| {
        let sp = &spreads[i];
        Answer {
            low: sp.range.low,
            central: sp.range.central,
            high: sp.range.high,
            mostly_from: sp.mostly_from,
        }
    };
    PlanRanges {
        steam_kg: answer(0),
        run_time_s: answer(1),
        total_time_s: answer(2),
        fuel_amount: answer(3),
        cooling_water_kg: answer(4),
        water_total_kg: answer(5),
        oil_kg: answer(6),
        separator_volume_m3: answer(7),
        failed_ends,
    }
}

/// The yield as published: the central mass balance with the separable oil's range.
fn yield_plan(s: &Scenario, r: &Resolved, balance: &oil_yield::OilBalance, oil: &Answer) -> YieldPlan {
    let plant_kg = s.charge.plant_mass_kg;
    let rho = r.oil_density_kg_per_m3;
    let dissolved_share =
        if balance.carried_kg > 0.0 { balance.dissolved_kg / balance.carried_kg } else { 0.0 };
    YieldPlan {
        oil_in_charge_kg: oil_in_charge_kg(s, r),
        carried_over_kg: balance.carried_kg,
        oil_kg: Range { low: oil.low, central: oil.central, high: oil.high },
        oil_volume_m3: Range { low: oil.low / rho, central: oil.central / rho, high: oil.high / rho },
        recovery_percent_of_plant: Range {
            low: 100.0 * oil.low / plant_kg,
            central: 100.0 * oil.central / plant_kg,
            high: 100.0 * oil.high / plant_kg,
        },
        dissolved_in_hydrosol_kg: balance.dissolved_kg,
        dissolved_share,
        hydrosol_is_the_product: dissolved_share > oil_yield::HYDROSOL_PRODUCT_SHARE,
        cohobation_advised: dissolved_share > oil_yield::COHOBATION_SHARE && !s.run.cohobation,
    }
}

/// The library's compounds and crops, for pickers in the page.
pub fn library() -> (&'static [compounds::Compound], &'static [crops::Crop]) {
    (compounds::COMPOUNDS, crops::CROPS)
}

/// The component list for an oil part id: a library compound or the user's own.
pub(crate) fn component_for(id: &str, custom: &[CustomCompound]) -> Option<(Component, Confidence)> {
    if let Some(c) = compounds::find(id) {
        return Some((Component::from(c), c.vapour_pressure.confidence));
    }
    let c = custom.iter().find(|c| c.id == id)?;
    let vp = c.vapour_pressure.to_vapour_pressure()?;
    Some((
        Component {
            id: c.id.clone(),
            name: c.name.clone(),
            molar_mass_kg_per_mol: c.molar_mass_kg_per_mol,
            liquid_density_kg_per_m3: c.liquid_density_kg_per_m3,
            vapour_pressure: vp,
            water_solubility_kg_per_m3: c.water_solubility_kg_per_m3,
        },
        Confidence::UserSupplied,
    ))
}

#[cfg(test)]
mod doubt_tests {
    use super::*;
    use crate::crops::CROPS;

    /// The sizing search judges trials on plans that skip the doubt sweep. That is only sound
    /// if skipping it leaves every central figure the full plan gives exactly as it is.
    #[test]
    fn a_central_only_plan_has_the_full_plans_central_figures() {
        for crop in CROPS {
            let mut s = Scenario::default();
            s.charge.crop = Some(crop.id.to_string());
            let (Ok(full), Ok(central)) = (plan(&s), plan_with(&s, Doubt::CentralOnly)) else {
                continue;
            };
            let json = |p: &Plan| {
                serde_json::to_value((
                    &p.site,
                    &p.oil,
                    &p.codistillation,
                    &p.run,
                    &p.energy,
                    &p.condenser,
                    &p.separator,
                    &p.water_use,
                    &p.season,
                ))
                .unwrap()
            };
            assert_eq!(json(&full), json(&central), "{}", crop.id);
            let (f, c) = (&full.ranges, &central.ranges);
            for (name, f, c) in [
                ("steam", &f.steam_kg, &c.steam_kg),
                ("run time", &f.run_time_s, &c.run_time_s),
                ("total time", &f.total_time_s, &c.total_time_s),
                ("water", &f.water_total_kg, &c.water_total_kg),
                ("oil", &f.oil_kg, &c.oil_kg),
                ("separator", &f.separator_volume_m3, &c.separator_volume_m3),
            ] {
                assert_eq!(f.central, c.central, "{} {name}", crop.id);
                assert!(c.low == c.central && c.high == c.central, "{} {name}: {c:?}", crop.id);
                // And the full plan does sweep: its steam range is not a point.
                if name == "steam" {
                    assert!(f.high > f.central, "{} {name}: {f:?}", crop.id);
                }
            }
        }
    }
}

#[cfg(test)]
mod kept_tests {
    use super::*;
    use crate::crops::CROPS;

    /// The plan keeps its last few stepped boils' heat capacities (`balance.rs`) and
    /// depletions (`equilibrium.rs`). A
    /// plan made on a thread that has planned other scenarios just before (so kept results are
    /// found, and others passed over) must equal the same plan made on a fresh thread, which
    /// has nothing kept.
    #[test]
    fn a_plan_after_other_plans_equals_a_plan_from_nothing() {
        let mut cases = Vec::new();
        for crop in CROPS {
            for (mass_kg, altitude_m, feed_c, target) in
                [(15.0, 300.0, 15.0, 90.0), (15.5, 300.0, 15.0, 90.0), (40.0, 1450.0, 10.0, 80.0)]
            {
                let mut s = Scenario::default();
                s.charge.crop = Some(crop.id.to_string());
                s.charge.plant_mass_kg = mass_kg;
                s.site.altitude_m = altitude_m;
                s.boiler.feed_temperature_c = Some(feed_c);
                s.run.target_recovery_percent = target;
                cases.push(s);
            }
        }
        // Twice through, so every case also meets results kept from a different scenario.
        let warm: Vec<_> = cases.iter().chain(&cases).map(plan).collect();
        for (i, s) in cases.iter().chain(&cases).enumerate() {
            let s = s.clone();
            let cold = std::thread::spawn(move || plan(&s)).join().unwrap();
            assert_eq!(warm[i], cold, "case {i}");
        }
    }

    /// The kept depletion is reused when only what it does not depend on changes (the charge,
    /// the boiler water, the heat, the condenser) and never when the oil, the pressure or the
    /// target changes: every crop preset through a run of such edits, each plan made after the
    /// one before it, equals the same plan made on a fresh thread.
    #[test]
    fn a_depletion_kept_from_the_last_edit_gives_the_fresh_plan() {
        type Edit = fn(&mut Scenario);
        let edits: [(&str, Edit); 10] = [
            ("plant mass", |s| s.charge.plant_mass_kg = 15.5),
            ("plant mass again", |s| s.charge.plant_mass_kg = 16.0),
            ("boiler water", |s| s.boiler.usable_water_kg = 30.0),
            ("heat input", |s| s.boiler.heat_input_w = 9_000.0),
            ("cooling water", |s| s.condenser.cooling_water_inlet_c = 18.0),
            ("target", |s| s.run.target_recovery_percent = 80.0),
            ("altitude", |s| s.site.altitude_m = 1_200.0),
            ("non-ideal oil", |s| s.oil.non_ideal = true),
            ("one compound", |s| s.oil.composition = OilComposition::Compound { id: "linalool".into() }),
            ("back to the first", |s| *s = Scenario::default()),
        ];
        for crop in CROPS {
            let mut s = Scenario::default();
            s.charge.crop = Some(crop.id.to_string());
            let mut steps = vec![("start", s.clone())];
            for (name, edit) in edits {
                edit(&mut s);
                s.charge.crop = Some(crop.id.to_string());
                steps.push((name, s.clone()));
            }
            for (name, s) in steps {
                let warm = plan(&s);
                let cold = std::thread::spawn(move || plan(&s)).join().unwrap();
                assert_eq!(warm, cold, "{} after the {name} edit", crop.id);
            }
        }
    }
}
