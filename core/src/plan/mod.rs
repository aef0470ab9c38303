//! The one entry point: [`plan`] turns a [`Scenario`] into a [`Plan`].
//!
//! The order follows the run itself: the site's pressure, the oil and its boiling point with
//! water, the boiler warming up, the steam warming the charge (time to the first drop), the
//! recovery of oil over time, the heat and fuel, the condenser, the separator, the yield, the
//! season. Every number is recomputed from the scenario; nothing is stored.

use crate::codistillation::{self, Cut};
use crate::compounds::{self, Confidence};
use crate::crops::{self, Crop};
use crate::heat::{self, Fuel};
use crate::oil::{Component, Oil};
use crate::scenario::*;
use crate::{condenser, recovery, season, separator, water};
use serde::{Deserialize, Serialize};

pub mod sanity;
mod validate;

pub use validate::validate;

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
        pub warnings: Vec<Warning>,
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
        pub density_kg_per_m3: f64,
        /// Where the oil gathers in the separator.
        pub collects_at: OilLayer,
        /// Whether the oil holds both lighter- and heavier-than-water compounds (≥ 5 % each).
        pub mixed_density: bool,
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
        pub rate_constant_per_min: f64,
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
        pub hydrosol_volume_m3: f64,
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
        /// Share of recoverable oil over time since the first drop: (s, fraction).
        pub recovery_curve: Vec<(f64, f64)>,
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
        /// |heat in - heat out| / heat in, from the time line against the sum of the sinks.
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
        pub distillate_outlet_c: f64,
        pub cooling_water_flow_kg_per_s: f64,
        pub cooling_water_per_run_kg: f64,
        /// Coil in a tub: how long the tub's own water lasts without a feed, s.
        pub tub_lasts_s: Option<f64>,
        /// Coil in a tub: how much the tub would warm over the whole run without a feed, K.
        pub tub_rise_over_run_k: Option<f64>,
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
    }

    pub struct YieldPlan {
        pub oil_in_charge_kg: f64,
        pub oil_kg: Range,
        pub oil_volume_m3: Range,
        /// Recovered oil as % of the charge mass.
        pub recovery_percent_of_plant: Range,
        pub dissolved_in_hydrosol_kg: f64,
        pub dissolved_share: f64,
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
    let resolved = validate(scenario)?;
    let plan = compute(scenario, &resolved).map_err(|e| ScenarioErrors { errors: vec![*e] })?;
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
}

fn warn(list: &mut Vec<Warning>, code: &str, message: String) {
    list.push(Warning { code: code.to_string(), message });
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

fn compute(s: &Scenario, r: &Resolved) -> Result<Plan, Box<FieldError>> {
    let mut warnings = Vec::new();
    let p = r.pressure_pa;
    let t_boil_k = water::saturation_temperature_k(p)
        .map_err(|_| compute_error("site", p, "1 kPa to 1 MPa", "pressure out of range"))?;
    let t_boil_c = t_boil_k - 273.15;
    let h_fg = water::latent_heat_j_per_kg(t_boil_k)
        .map_err(|_| compute_error("site", p, "1 kPa to 1 MPa", "pressure out of range"))?;
    let site = SitePlan {
        pressure_pa: p,
        pressure_from: r.pressure_from,
        water_boiling_point_c: t_boil_c,
        boiling_point_shift_k: t_boil_c - SEA_LEVEL_BOILING_C,
        latent_heat_j_per_kg: h_fg,
    };

    // --- Oil and co-distillation -------------------------------------------------------------
    let eq = codistillation::equilibrium(&r.oil, p).map_err(|_| {
        compute_error("oil.composition", 0.0, "a known oil", "the oil's boiling point could not be found")
    })?;
    let t_cd_c = eq.temperature_k - 273.15;
    let target = s.run.target_recovery_percent / 100.0;
    let depletion = codistillation::deplete(&r.oil, p, target, 10).map_err(|_| {
        compute_error("oil.composition", 0.0, "a known oil", "the oil could not be followed through the run")
    })?;
    let oil_in_charge_kg = s.charge.plant_mass_kg * r.oil_content_fraction;
    let min_steam_to_target_kg = oil_in_charge_kg * depletion.steam_to_target_kg_per_kg_oil;

    let mass_fractions = r.oil.mass_fractions();
    let mole_fractions = r.oil.mole_fractions();
    let vapour_mass: Vec<f64> = r
        .oil
        .components
        .iter()
        .zip(&eq.oil_partial_pressures_pa)
        .map(|(c, p_i)| p_i * c.molar_mass_kg_per_mol)
        .collect();
    let vapour_total: f64 = vapour_mass.iter().sum();
    let components: Vec<ComponentShare> = r
        .oil
        .components
        .iter()
        .enumerate()
        .map(|(i, c)| ComponentShare {
            id: c.id.clone(),
            name: c.name.clone(),
            mass_fraction: mass_fractions[i],
            mole_fraction: mole_fractions[i],
            first_vapour_mass_fraction: vapour_mass[i] / vapour_total,
            vapour_pressure_at_boiling_pa: c.vapour_pressure.pressure_pa(eq.temperature_k),
            correlation_in_range: eq.in_range[i],
            confidence: r.confidences[i],
        })
        .collect();
    // Estimates get their own, stronger warning below.
    for c in components.iter().filter(|c| !c.correlation_in_range && c.confidence != Confidence::Estimated) {
        warn(
            &mut warnings,
            "correlation_out_of_range",
            format!(
                "The vapour-pressure correlation for {} is used outside the temperature range it was fitted over; its share of the vapour is less certain.",
                c.name
            ),
        );
    }
    if depletion.any_out_of_range && components.iter().all(|c| c.correlation_in_range) {
        warn(
            &mut warnings,
            "correlation_out_of_range",
            "Late in the run the boiling temperature leaves a correlation's fitted range; the last cuts are less certain.".to_string(),
        );
    }
    for c in components.iter().filter(|c| c.confidence == Confidence::Estimated) {
        warn(
            &mut warnings,
            "estimated_vapour_pressure",
            format!("{} has no measured vapour-pressure correlation; an estimate (±30 %) is used.", c.name),
        );
    }
    let codistillation = CodistillationPlan {
        temperature_c: t_cd_c,
        lowering_k: t_boil_c - t_cd_c,
        water_partial_pressure_pa: eq.water_partial_pressure_pa,
        min_steam_per_kg_oil: eq.steam_per_oil_kg_per_kg,
        min_steam_whole_charge_kg: oil_in_charge_kg * depletion.steam_to_all_kg_per_kg_oil,
        min_steam_to_target_kg,
        cuts: depletion.cuts,
    };

    // --- Oil density and the separator's layer ------------------------------------------------
    let t_sep_k = r.distillate_outlet_c + 273.15;
    let rho_w_sep = water::liquid_density_kg_per_m3(t_sep_k, p).map_err(|_| {
        compute_error(
            "condenser.distillate_outlet_c",
            r.distillate_outlet_c,
            "5 °C to below the boiling point",
            "out of range",
        )
    })?;
    let mu_w_sep = water::liquid_viscosity_pa_s(t_sep_k, p).map_err(|_| {
        compute_error(
            "condenser.distillate_outlet_c",
            r.distillate_outlet_c,
            "5 °C to below the boiling point",
            "out of range",
        )
    })?;
    let rho_oil = r.oil_density_kg_per_m3;
    let collects_at = if rho_oil < rho_w_sep { OilLayer::Top } else { OilLayer::Bottom };
    let lighter: f64 = r
        .oil
        .components
        .iter()
        .zip(&mass_fractions)
        .filter(|(c, _)| c.liquid_density_kg_per_m3 < rho_w_sep)
        .map(|(_, w)| w)
        .sum();
    let mixed_density = (0.05..=0.95).contains(&lighter);
    if mixed_density {
        warn(
            &mut warnings,
            "mixed_density_oil",
            format!(
                "About {:.0} % of this oil is lighter than water and {:.0} % heavier: part may float and part sink. Draw off at both the top and the bottom of the separator.",
                lighter * 100.0,
                (1.0 - lighter) * 100.0
            ),
        );
    }
    if (rho_oil - rho_w_sep).abs() < 20.0 {
        warn(
            &mut warnings,
            "small_density_difference",
            format!(
                "The oil ({:.0} kg/m³) is within {:.0} kg/m³ of the water ({:.0} kg/m³) at the separator: it will part slowly. A warmer or larger separator helps.",
                rho_oil,
                (rho_oil - rho_w_sep).abs(),
                rho_w_sep
            ),
        );
    }
    let oil = OilPlan { components, density_kg_per_m3: rho_oil, collects_at, mixed_density };

    // --- Boiler, warm-up and the time line -------------------------------------------------------
    let feed_c = r.feed_temperature_c;
    let h_feed = water::liquid_enthalpy_j_per_kg(feed_c + 273.15, p).map_err(|_| {
        compute_error(
            "boiler.feed_temperature_c",
            feed_c,
            "0.5 °C to below the boiling point",
            "out of range",
        )
    })?;
    let h_f_sat = water::saturated_liquid_enthalpy_j_per_kg(t_boil_k)
        .map_err(|_| compute_error("site", p, "1 kPa to 1 MPa", "pressure out of range"))?;
    let heat_per_kg_fill = h_f_sat - h_feed;
    let useful_w = match s.boiler.steam_rate_kg_per_h {
        Some(rate) => rate / 3600.0 * h_fg,
        None => s.boiler.heat_input_w * r.efficiency,
    };
    let steam_rate = useful_w / h_fg;
    let wall_area =
        s.still.volume_m3.map(|v| heat::cylinder_surface_m2(v, s.still.height_to_diameter)).unwrap_or(0.0);
    let wall_loss_w =
        heat::wall_loss_w(s.still.wall_u_w_per_m2_k, wall_area, t_cd_c, s.site.ambient_temperature_c);
    if wall_loss_w >= 0.9 * useful_w {
        return Err(compute_error(
            "boiler.heat_input_w",
            s.boiler.heat_input_w,
            &format!("enough to outrun the still's wall loss of about {:.0} W", wall_loss_w),
            "the boiler is too small: almost all its heat is lost through the still wall",
        ));
    }
    let distillate_rate = (useful_w - wall_loss_w) / h_fg;

    let boiler_fill_kg = s.boiler.usable_water_kg;
    let boiler_water_heating_j = boiler_fill_kg * heat_per_kg_fill;
    let time_to_boil_s = boiler_water_heating_j / useful_w;
    let charge_heating_j = heat::sensible_heat_j(
        s.charge.plant_mass_kg,
        r.charge_heat_capacity_j_per_kg_k,
        r.charge_temperature_c,
        t_cd_c,
    )
    .max(0.0);
    let still_heating_j = heat::sensible_heat_j(
        s.still.metal_mass_kg,
        s.still.metal.heat_capacity_j_per_kg_k(),
        s.site.ambient_temperature_c,
        t_cd_c,
    )
    .max(0.0);
    let startup_condensate_kg = heat::startup_condensate_kg(charge_heating_j + still_heating_j, h_fg);
    let warm_up_s = (charge_heating_j + still_heating_j) / (useful_w - wall_loss_w);
    let time_to_first_drop_s = time_to_boil_s + warm_up_s;

    let k = r.rate_constant_per_s;
    let release_time_s = recovery::time_to_fraction_s(k, target);
    let steam_time_s = min_steam_to_target_kg / distillate_rate;
    let (time_after_first_drop_s, limited_by) = if steam_time_s > release_time_s {
        (steam_time_s, RunLimit::Steam)
    } else {
        (release_time_s, RunLimit::Release)
    };
    if limited_by == RunLimit::Steam {
        warn(
            &mut warnings,
            "steam_limited",
            format!(
                "This oil needs at least {:.1} kg of steam per kg to come over; the steam, not the plant, sets the run's length. More steam per hour shortens it.",
                depletion.steam_to_target_kg_per_kg_oil
            ),
        );
    }
    let distillate_steam_kg = distillate_rate * time_after_first_drop_s;
    let evaporated_kg = startup_condensate_kg
        + wall_loss_w * (warm_up_s + time_after_first_drop_s) / h_fg
        + distillate_steam_kg;
    let makeup_kg = (evaporated_kg - boiler_fill_kg).max(0.0);
    let refills = if makeup_kg > 0.0 { (makeup_kg / boiler_fill_kg).ceil() as u32 } else { 0 };
    let makeup_water_heating_j = makeup_kg * heat_per_kg_fill;
    let boiler_dry_after_s =
        if makeup_kg > 0.0 { Some(time_to_boil_s + boiler_fill_kg * h_fg / useful_w) } else { None };
    if let Some(t_dry) = boiler_dry_after_s {
        warn(
            &mut warnings,
            "boiler_runs_dry",
            format!(
                "The run needs {:.0} kg of steam but the boiler holds {:.0} kg of usable water: top it up before {:.0} min after lighting ({} refill(s), {:.0} kg in all). Never let the heater run dry.",
                evaporated_kg,
                boiler_fill_kg,
                t_dry / 60.0,
                refills,
                makeup_kg
            ),
        );
    }
    let refill_reheat_s = makeup_water_heating_j / useful_w;
    let total_time_s = time_to_first_drop_s + time_after_first_drop_s + refill_reheat_s;

    let recovered_fraction = target;
    let oil_recovered_kg = oil_in_charge_kg * recovered_fraction;
    let rho_w_out = rho_w_sep;
    let hydrosol_volume_m3 = distillate_steam_kg / rho_w_out;
    let steam_to_minimum_ratio = distillate_steam_kg / min_steam_to_target_kg;
    let water_to_oil_ratio = distillate_steam_kg / oil_recovered_kg;
    let specific_rate = distillate_rate * 3600.0 / s.charge.plant_mass_kg;
    if let Some(crop) = r.crop
        && specific_rate < 0.5 * crop.steam_rate_kg_per_h_per_kg
    {
        warn(
            &mut warnings,
            "low_steam_rate",
            format!(
                "{:.2} kg/h of steam per kg of charge is under half the {:.2} usual for {}: the run may take longer than planned.",
                specific_rate, crop.steam_rate_kg_per_h_per_kg, crop.name
            ),
        );
    }
    // Practice: total distillate water to oil of about 20-30:1 (Denny, for lavender: at most
    // 20:1; lavandin caissons 19-33:1 by arithmetic on published fuel use).
    if water_to_oil_ratio > 30.0 {
        warn(
            &mut warnings,
            "water_to_oil_high",
            format!(
                "About {:.0} kg of distillate water per kg of oil: practice is 20-30. Less steam per hour (a smaller flame) or a shorter run would save fuel and water for little oil.",
                water_to_oil_ratio
            ),
        );
    }
    // Steam rising through the charge: droplets of 100 µm and more fall back below about
    // 0.2-0.3 m/s (terminal velocities computed with fluids 1.3.1); above, the steam carries
    // water up and finds channels (judgement, no published limit).
    if let Some(v) = s.still.volume_m3 {
        let d = (4.0 * v / (std::f64::consts::PI * s.still.height_to_diameter)).cbrt();
        let rho_v = water::saturated_vapour_density_kg_per_m3(eq.temperature_k).unwrap_or(0.6);
        let velocity = distillate_rate / (rho_v * std::f64::consts::PI * d * d / 4.0);
        if velocity > 0.25 {
            warn(
                &mut warnings,
                "steam_too_fast",
                format!(
                    "Steam rises through the charge at about {:.2} m/s: above about 0.25 m/s it lifts water droplets and cuts channels, leaving oil behind. Use less heat or a wider still.",
                    velocity
                ),
            );
        }
    }
    let curve_end = time_after_first_drop_s.max(1.0);
    let recovery_curve = (0..=24)
        .map(|i| {
            let t = curve_end * i as f64 / 24.0;
            (t, recovery::recovered_fraction(k, t))
        })
        .collect();
    let run = RunPlan {
        rate_constant_per_min: k * 60.0,
        steam_rate_kg_per_s: steam_rate,
        distillate_steam_rate_kg_per_s: distillate_rate,
        useful_heat_w: useful_w,
        time_to_boil_s,
        time_to_first_drop_s,
        time_after_first_drop_s,
        total_time_s,
        limited_by,
        startup_condensate_kg,
        distillate_steam_kg,
        hydrosol_volume_m3,
        steam_to_minimum_ratio,
        water_to_oil_ratio,
        specific_steam_rate_kg_per_h_per_kg: specific_rate,
        boiler_water_evaporated_kg: evaporated_kg,
        boiler_dry_after_s,
        refills,
        recovery_curve,
    };

    // --- Heat and fuel --------------------------------------------------------------------------
    let wall_loss_j = wall_loss_w * (warm_up_s + time_after_first_drop_s);
    let steam_to_condenser_j = distillate_steam_kg * h_fg;
    let useful_heat_j = boiler_water_heating_j
        + charge_heating_j
        + still_heating_j
        + wall_loss_j
        + steam_to_condenser_j
        + makeup_water_heating_j;
    let heat_in_j = useful_w * total_time_s;
    let heat_balance_error = (heat_in_j - useful_heat_j).abs() / heat_in_j;
    if wall_loss_j > 0.2 * useful_heat_j {
        warn(
            &mut warnings,
            "wall_losses",
            format!(
                "{:.0} % of the heat is lost through the still's wall. Lagging it (50 mm of mineral wool cuts the loss about fourteen-fold, U 10 -> 0.7 W/(m² K)) saves fuel and time.",
                100.0 * wall_loss_j / useful_heat_j
            ),
        );
    }
    let fuel_heat_j = useful_heat_j / r.efficiency;
    let fuel_amount = heat::fuel_amount(useful_heat_j, s.boiler.fuel, r.efficiency);
    let oil_volume_m3 = oil_recovered_kg / rho_oil;
    let cost = cost_of_run(&s.costs, fuel_amount, s.charge.plant_mass_kg, total_time_s, oil_volume_m3);
    let energy = EnergyPlan {
        boiler_water_heating_j,
        charge_heating_j,
        still_heating_j,
        wall_loss_j,
        steam_to_condenser_j,
        makeup_water_heating_j,
        useful_heat_j,
        fuel_heat_j,
        fuel: s.boiler.fuel,
        fuel_amount,
        fuel_unit: s.boiler.fuel.data().unit.to_string(),
        efficiency: r.efficiency,
        heat_balance_error,
        cost,
    };

    // --- Condenser --------------------------------------------------------------------------------
    let c = &s.condenser;
    let t_d = r.distillate_outlet_c;
    let h_out = water::liquid_enthalpy_j_per_kg(t_d + 273.15, p).map_err(|_| {
        compute_error("condenser.distillate_outlet_c", t_d, "5 °C to below the boiling point", "out of range")
    })?;
    let h_g = h_f_sat + h_fg;
    let duty_per_kg = h_g - h_out;
    let duty_w = distillate_rate * duty_per_kg;
    let cp_cw = water::liquid_heat_capacity_j_per_kg_k(
        0.5 * (c.cooling_water_inlet_c + c.cooling_water_outlet_c) + 273.15,
        p,
    )
    .map_err(|_| {
        compute_error(
            "condenser.cooling_water_outlet_c",
            c.cooling_water_outlet_c,
            "below the boiling point",
            "out of range",
        )
    })?;
    let cw_flow = condenser::cooling_water_flow_kg_per_s(
        duty_w,
        cp_cw,
        c.cooling_water_inlet_c,
        c.cooling_water_outlet_c,
    );
    let q_cond = distillate_rate * h_fg;
    let q_sub = distillate_rate * (h_f_sat - h_out);
    // Counterflow: cold water meets the cooled distillate first, then the condensing steam.
    let t_mid = c.cooling_water_inlet_c + q_sub / (cw_flow * cp_cw);
    let lmtd_cond =
        condenser::log_mean_temperature_difference_k(t_boil_c - t_mid, t_boil_c - c.cooling_water_outlet_c);
    let lmtd_sub =
        condenser::log_mean_temperature_difference_k(t_boil_c - t_mid, t_d - c.cooling_water_inlet_c);
    let condensing_area_m2 = condenser::area_m2(q_cond, c.condensing_u_w_per_m2_k, lmtd_cond);
    let cooling_area_m2 =
        if q_sub > 0.0 { condenser::area_m2(q_sub, c.cooling_u_w_per_m2_k, lmtd_sub) } else { 0.0 };
    let area_m2 = condensing_area_m2 + cooling_area_m2;
    let tub_lasts_s = match c.kind {
        CondenserKind::CoilInTub => Some(condenser::tub_warming_time_s(
            c.tub_water_kg,
            cp_cw,
            c.cooling_water_inlet_c,
            c.cooling_water_outlet_c,
            duty_w,
        )),
        CondenserKind::TubeInTube => None,
    };
    if let Some(t) = tub_lasts_s
        && t < time_after_first_drop_s
    {
        warn(
            &mut warnings,
            "tub_warms_up",
            format!(
                "The tub's water reaches {:.0} °C after about {:.0} min: feed it cold water at the bottom, about {:.1} L/min, or change it during the run.",
                c.cooling_water_outlet_c,
                t / 60.0,
                cw_flow * 60.0 / 1.0
            ),
        );
    }
    let cooling_water_per_run_kg = cw_flow * time_after_first_drop_s;
    let condenser = CondenserPlan {
        kind: c.kind,
        duty_w,
        duty_per_kg_steam_j: duty_per_kg,
        distillate_outlet_c: t_d,
        cooling_water_flow_kg_per_s: cw_flow,
        cooling_water_per_run_kg,
        tub_lasts_s,
        tub_rise_over_run_k: match c.kind {
            CondenserKind::CoilInTub => Some(duty_w * time_after_first_drop_s / (c.tub_water_kg * cp_cw)),
            CondenserKind::TubeInTube => None,
        },
        condensing_area_m2,
        cooling_area_m2,
        area_m2,
        tube_length_m: condenser::tube_length_m(area_m2, c.tube_outer_diameter_m),
    };

    // --- Separator --------------------------------------------------------------------------------
    let sp = &s.separator;
    let flow = distillate_rate / rho_w_sep;
    let v = separator::stokes_velocity_m_per_s(sp.droplet_diameter_m, rho_oil, rho_w_sep, mu_w_sep);
    let re = separator::droplet_reynolds_number(v, sp.droplet_diameter_m, rho_w_sep, mu_w_sep);
    if re > 1.0 {
        warn(
            &mut warnings,
            "stokes_limit",
            format!(
                "The design droplet's Reynolds number is {:.1}, above Stokes' range (< 1): it moves slower than computed, so allow more area.",
                re
            ),
        );
    }
    let volume_m3 = flow * sp.residence_time_s;
    let (plan_area_m2, diameter_m, height_m) = if (rho_oil - rho_w_sep).abs() >= 1.0 {
        let a = separator::plan_area_m2(flow, v, sp.turbulence_factor);
        let (d, h) = separator::practical_cylinder_m(volume_m3, a, 2.0);
        (Some(a), Some(d), Some(h))
    } else {
        warn(
            &mut warnings,
            "no_gravity_separation",
            "The oil is as dense as the water at the separator: it will not part by gravity. Change the separator temperature or add salt to the water (common practice).".to_string(),
        );
        (None, None, None)
    };
    let separator = SeparatorPlan {
        distillate_flow_m3_per_s: flow,
        temperature_c: t_d,
        water_density_kg_per_m3: rho_w_sep,
        water_viscosity_pa_s: mu_w_sep,
        droplet_velocity_m_per_s: v,
        droplet_reynolds_number: re,
        plan_area_m2,
        diameter_m,
        volume_m3,
        height_m,
        oil_outlet: collects_at,
    };

    // --- Yield ------------------------------------------------------------------------------------
    let (content_low, content_high) = r.oil_content_spread;
    let (k_low, k_high) = r.rate_constant_spread;
    let planned_t = time_after_first_drop_s;
    let low = s.charge.plant_mass_kg
        * content_low
        * recovery::recovered_fraction(k_low, planned_t).min(recovered_fraction);
    let high = s.charge.plant_mass_kg
        * content_high
        * recovery::recovered_fraction(k_high, planned_t).max(recovered_fraction);
    let oil_kg = Range { low, central: oil_recovered_kg, high };
    let solubility: f64 =
        r.oil.components.iter().zip(&mole_fractions).map(|(c, x)| x * c.water_solubility_kg_per_m3).sum();
    let dissolved = (solubility * hydrosol_volume_m3).min(oil_recovered_kg);
    let dissolved_share = dissolved / oil_recovered_kg;
    // Common practice, no source: redistilling the waters pays when they hold several % of the oil.
    let cohobation_advised = dissolved_share > 0.05;
    if cohobation_advised {
        warn(
            &mut warnings,
            "cohobation",
            format!(
                "About {:.0} % of the oil ({:.0} g) stays dissolved in the hydrosol: return the waters to the still (cohobation) or redistil them.",
                dissolved_share * 100.0,
                dissolved * 1000.0
            ),
        );
    }
    let yield_estimate = YieldPlan {
        oil_in_charge_kg,
        oil_volume_m3: Range { low: low / rho_oil, central: oil_volume_m3, high: high / rho_oil },
        recovery_percent_of_plant: Range {
            low: 100.0 * low / s.charge.plant_mass_kg,
            central: 100.0 * oil_recovered_kg / s.charge.plant_mass_kg,
            high: 100.0 * high / s.charge.plant_mass_kg,
        },
        oil_kg,
        dissolved_in_hydrosol_kg: dissolved,
        dissolved_share,
        cohobation_advised,
    };

    let boiler_feed_kg = boiler_fill_kg + makeup_kg;
    let water_use = WaterPlan {
        boiler_feed_kg,
        cooling_water_kg: cooling_water_per_run_kg,
        total_kg: boiler_feed_kg + cooling_water_per_run_kg,
    };

    // --- Capacity and season ----------------------------------------------------------------------
    let still_capacity_kg = match (s.still.volume_m3, r.crop) {
        (Some(v), Some(crop)) => Some(season::charge_mass_kg(v, crop.charge_density_kg_per_m3)),
        _ => None,
    };
    if let Some(cap) = still_capacity_kg
        && s.charge.plant_mass_kg > 1.25 * cap
    {
        warn(
            &mut warnings,
            "overpacked",
            format!(
                "{:.0} kg is well over the {:.0} kg this still holds at a usual packing: tight packing makes steam channel and leaves oil behind.",
                s.charge.plant_mass_kg, cap
            ),
        );
    }
    let season = s.season.harvest_kg.map(|harvest| {
        let charges = season::charges_for_harvest(harvest, s.charge.plant_mass_kg);
        let n = charges as f64;
        SeasonPlan {
            still_capacity_kg,
            charges,
            total_time_s: n * total_time_s + (n - 1.0).max(0.0) * s.run.turnaround_min * 60.0,
            fuel_amount: n * fuel_amount,
            water_kg: n * water_use.total_kg,
            oil_kg: harvest * r.oil_content_fraction * recovered_fraction,
        }
    });

    Ok(Plan {
        site,
        oil,
        codistillation,
        run,
        energy,
        condenser,
        separator,
        yield_estimate,
        water_use,
        season,
        warnings,
    })
}

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
