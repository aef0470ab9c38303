//! The time line: the boiler warming its water, steam warming the charge and the
//! still (time to the first drop), the run to the target recovery, and the boiler's water.

use super::equilibrium::Equilibrium;
use super::knobs::Knobs;
use super::site::Site;
use super::{FieldError, Resolved, RunLimit, RunPlan, compute_error};
use crate::scenario::Scenario;
use crate::{heat, recovery, water};

/// The time line as later stages need it.
pub(super) struct Timeline {
    pub plan: RunPlan,
    pub wall_loss_w: f64,
    pub warm_up_s: f64,
    pub boiler_water_heating_j: f64,
    pub charge_heating_j: f64,
    pub still_heating_j: f64,
    pub makeup_kg: f64,
    pub makeup_water_heating_j: f64,
    /// Feed water's enthalpy gain to the boil, J/kg.
    pub heat_per_kg_fill_j: f64,
    /// Distillate water returned to the boiler (cohobation), kg.
    pub returned_kg: f64,
    /// Superficial velocity of the steam rising through the charge, when the still's volume is known.
    pub steam_velocity_m_per_s: Option<f64>,
}

/// Heat reaching the water and the steam it raises: from a measured steam rate, or from the
/// burner's input (gas derated for altitude, [`heat::gas_altitude_derate`]) times the
/// appliance's efficiency. Q = ṁ h_fg.
pub(super) fn heat_source(s: &Scenario, r: &Resolved, h_fg: f64) -> (f64, f64) {
    let derate = if s.boiler.fuel.is_gas() { heat::gas_altitude_derate(s.site.altitude_m) } else { 1.0 };
    let useful_w = match s.boiler.steam_rate_kg_per_h {
        Some(rate) => rate / 3600.0 * h_fg,
        None => s.boiler.heat_input_w * derate * r.efficiency,
    };
    (useful_w, useful_w / h_fg)
}

/// Heat lost through the still's wall at the co-distillation temperature (U A ΔT), on the
/// given volume or, without one, the volume estimated from the charge (`Resolved`).
pub(super) fn wall_loss_w(s: &Scenario, r: &Resolved, knobs: &Knobs, inside_c: f64) -> f64 {
    let area = heat::cylinder_surface_m2(r.still_volume_m3, s.still.height_to_diameter);
    let u = s.still.wall_u_w_per_m2_k * knobs.wall_u_factor;
    heat::wall_loss_w(u, area, inside_c, s.site.ambient_temperature_c)
}

/// Sensible heat to bring the charge and the still's metal to the co-distillation temperature.
fn warm_up_heat_j(s: &Scenario, r: &Resolved, t_cd_c: f64) -> (f64, f64) {
    let charge = heat::sensible_heat_j(
        s.charge.plant_mass_kg,
        r.charge_heat_capacity_j_per_kg_k,
        r.charge_temperature_c,
        t_cd_c,
    )
    .max(0.0);
    let still = heat::sensible_heat_j(
        s.still.metal_mass_kg,
        s.still.metal.heat_capacity_j_per_kg_k(),
        s.site.ambient_temperature_c,
        t_cd_c,
    )
    .max(0.0);
    (charge, still)
}

/// Least steam per kg of the charge's oil for the next bit of oil, once a share `carried` has
/// come over: the current cut's least steam over its width, divided by the vapour-pressure knob.
fn marginal_least_steam(eq: &Equilibrium, knobs: &Knobs, carried: f64) -> f64 {
    let cuts = &eq.plan.cuts;
    let cut = cuts.iter().find(|c| carried < c.to_fraction).or(cuts.last());
    cut.map_or(f64::INFINITY, |c| c.steam_kg_per_kg_oil / (c.to_fraction - c.from_fraction).max(1e-9))
        / knobs.vapour_pressure_factor
}

/// The release constant at this run's specific steam rate, and the vaporisation efficiency
/// after channelling: a charge packed above the still's usual capacity lets steam bypass part
/// of it, η × capacity / charge (judgement, common practice, no source).
fn release_and_efficiency(s: &Scenario, r: &Resolved, knobs: &Knobs, distillate_rate: f64) -> (f64, f64) {
    let q = distillate_rate * 3600.0 / s.charge.plant_mass_kg;
    let q_ref = r.crop.map_or(q, |c| c.steam_rate_kg_per_h_per_kg);
    let k = recovery::scaled_rate_constant_per_s(r.rate_constant_per_s, q, q_ref, knobs.kinetic_exponent);
    let capacity = super::season::still_capacity_kg(s, r);
    let packing = capacity.map_or(1.0, |cap| (cap / s.charge.plant_mass_kg).min(1.0));
    (k, knobs.vaporisation_efficiency * packing)
}

/// Longest run the plan follows, s: a week of steaming.
const LONGEST_RUN_S: f64 = 7.0 * 24.0 * 3600.0;

/// The run after the first drop, from the coupled release-and-carry model
/// ([`recovery::carry_over`]).
fn run_course(
    s: &Scenario,
    r: &Resolved,
    eq: &Equilibrium,
    knobs: &Knobs,
    distillate_rate: f64,
) -> Result<(recovery::CarryOver, f64, f64), Box<FieldError>> {
    let (k, efficiency) = release_and_efficiency(s, r, knobs, distillate_rate);
    let steam_per_kg_oil = distillate_rate / super::oil_in_charge_kg(s, r);
    let course = recovery::carry_over(
        k,
        steam_per_kg_oil,
        efficiency,
        |c| marginal_least_steam(eq, knobs, c),
        eq.target_fraction,
        LONGEST_RUN_S,
    );
    if course.time_to_target_s.is_none() {
        return Err(compute_error(
            steam_source_field(s).0,
            steam_source_field(s).1,
            "enough steam to reach the target within a week",
            "the steam is far too little for this charge: the run would last more than a week",
        ));
    }
    Ok((course, k, efficiency))
}

/// Water that tops the boiler up: the returned distillate (cohobation, arriving at the
/// distillate temperature, all of it reheated to the boil), then fresh feed for what the fill
/// and the returned water do not cover.
struct TopUp {
    feed_kg: f64,
    heating_j: f64,
}

fn top_up(
    s: &Scenario,
    r: &Resolved,
    site: &Site,
    evaporated_kg: f64,
    returned_kg: f64,
    heat_per_kg_feed_j: f64,
) -> Result<TopUp, Box<FieldError>> {
    let feed_kg = (evaporated_kg - s.boiler.usable_water_kg - returned_kg).max(0.0);
    let heat_per_kg_returned_j = if returned_kg > 0.0 {
        let t_k = r.distillate_outlet_c + 273.15;
        let h = water::liquid_enthalpy_j_per_kg(t_k, site.pressure_pa).map_err(|_| {
            compute_error(
                "condenser.distillate_outlet_c",
                r.distillate_outlet_c,
                "5 °C to below the boiling point",
                "out of range",
            )
        })?;
        site.saturated_liquid_enthalpy_j_per_kg - h
    } else {
        0.0
    };
    Ok(TopUp { feed_kg, heating_j: feed_kg * heat_per_kg_feed_j + returned_kg * heat_per_kg_returned_j })
}

/// Superficial steam velocity in an empty still of the given shape: u = ṁ / (ρ_v π d²/4).
fn steam_velocity_m_per_s(s: &Scenario, eq: &Equilibrium, distillate_rate: f64) -> Option<f64> {
    let v = s.still.volume_m3?;
    let d = (4.0 * v / (std::f64::consts::PI * s.still.height_to_diameter)).cbrt();
    let rho_v = water::saturated_vapour_density_kg_per_m3(eq.temperature_k).unwrap_or(0.6);
    Some(distillate_rate / (rho_v * std::f64::consts::PI * d * d / 4.0))
}

/// The whole time line, lighting to the end of the run, with the boiler's water balance.
pub(super) fn timeline(
    s: &Scenario,
    r: &Resolved,
    site: &Site,
    eq: &Equilibrium,
    knobs: &Knobs,
) -> Result<Timeline, Box<FieldError>> {
    let p = site.pressure_pa;
    let h_fg = site.latent_heat_j_per_kg;
    let t_cd_c = eq.temperature_k - 273.15;
    let feed_c = r.feed_temperature_c;
    let h_feed = water::liquid_enthalpy_j_per_kg(feed_c + 273.15, p).map_err(|_| {
        compute_error(
            "boiler.feed_temperature_c",
            feed_c,
            "0.5 °C to below the boiling point",
            "out of range",
        )
    })?;
    let heat_per_kg_fill_j = site.saturated_liquid_enthalpy_j_per_kg - h_feed;
    let (useful_w, steam_rate) = heat_source(s, r, h_fg);
    let wall_loss_w = wall_loss_w(s, r, knobs, t_cd_c);
    if wall_loss_w >= 0.9 * useful_w {
        return Err(compute_error(
            steam_source_field(s).0,
            steam_source_field(s).1,
            &format!("enough to outrun the still's wall loss of about {:.0} W", wall_loss_w),
            "the boiler is too small: almost all its heat is lost through the still wall",
        ));
    }
    let distillate_rate = (useful_w - wall_loss_w) / h_fg;

    let boiler_fill_kg = s.boiler.usable_water_kg;
    let boiler_water_heating_j = boiler_fill_kg * heat_per_kg_fill_j;
    let time_to_boil_s = boiler_water_heating_j / useful_w;
    let (charge_heating_j, still_heating_j) = warm_up_heat_j(s, r, t_cd_c);
    let startup_condensate_kg = heat::startup_condensate_kg(charge_heating_j + still_heating_j, h_fg);
    let warm_up_s = (charge_heating_j + still_heating_j) / (useful_w - wall_loss_w);
    let time_to_first_drop_s = time_to_boil_s + warm_up_s;

    let (course, k, vaporisation_efficiency) = run_course(s, r, eq, knobs, distillate_rate)?;
    let time_after_first_drop_s = course.time_to_target_s.unwrap_or(LONGEST_RUN_S);
    let limited_by = if course.steam_limited { RunLimit::Steam } else { RunLimit::Release };
    let distillate_steam_kg = distillate_rate * time_after_first_drop_s;
    let evaporated_kg = startup_condensate_kg
        + wall_loss_w * (warm_up_s + time_after_first_drop_s) / h_fg
        + distillate_steam_kg;
    let returned_kg = if s.run.cohobation {
        (distillate_steam_kg - distillate_rate * s.separator.residence_time_s).max(0.0)
    } else {
        0.0
    };
    let topping = top_up(s, r, site, evaporated_kg, returned_kg, heat_per_kg_fill_j)?;
    let makeup_kg = topping.feed_kg;
    let refills = if makeup_kg > 0.0 { (makeup_kg / boiler_fill_kg).ceil() as u32 } else { 0 };
    let makeup_water_heating_j = topping.heating_j;
    let boiler_dry_after_s =
        if makeup_kg > 0.0 { Some(time_to_boil_s + boiler_fill_kg * h_fg / useful_w) } else { None };
    let refill_reheat_s = makeup_water_heating_j / useful_w;
    let total_time_s = time_to_first_drop_s + time_after_first_drop_s + refill_reheat_s;

    let oil_recovered_kg = super::oil_in_charge_kg(s, r) * eq.target_fraction;
    let plan = RunPlan {
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
        // Set once the separator's temperature is known.
        hydrosol_volume_m3: f64::NAN,
        returned_to_boiler_kg: returned_kg,
        steam_to_minimum_ratio: distillate_steam_kg / eq.plan.min_steam_to_target_kg,
        water_to_oil_ratio: distillate_steam_kg / oil_recovered_kg,
        specific_steam_rate_kg_per_h_per_kg: distillate_rate * 3600.0 / s.charge.plant_mass_kg,
        boiler_water_evaporated_kg: evaporated_kg,
        boiler_dry_after_s,
        refills,
        recovery_curve: course.curve,
        reference_rate_constant_per_min: r.rate_constant_per_s * 60.0,
        vaporisation_efficiency,
        still_volume_used_m3: r.still_volume_m3,
        still_volume_estimated: r.still_volume_estimated,
    };
    Ok(Timeline {
        plan,
        wall_loss_w,
        warm_up_s,
        boiler_water_heating_j,
        charge_heating_j,
        still_heating_j,
        makeup_kg,
        makeup_water_heating_j,
        heat_per_kg_fill_j,
        returned_kg,
        steam_velocity_m_per_s: steam_velocity_m_per_s(s, eq, distillate_rate),
    })
}

/// The field that sets the steam: a measured steam rate when given, else the heat input. An
/// error about too little steam is the grower's to fix there.
fn steam_source_field(s: &Scenario) -> (&'static str, f64) {
    match s.boiler.steam_rate_kg_per_h {
        Some(rate) => ("boiler.steam_rate_kg_per_h", rate),
        None => ("boiler.heat_input_w", s.boiler.heat_input_w),
    }
}
