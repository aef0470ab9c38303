//! The condenser: its duty, the cooling water, the area and tube it needs, and the
//! distillate temperature it can really reach (a tub's water warms over the run).

use super::knobs::Knobs;
use super::site::Site;
use super::{CondenserPlan, FieldError, Resolved, compute_error};
use crate::condenser as law;
use crate::scenario::{Condenser, CondenserKind, Scenario};
use crate::water;

/// Closest a coil in a mixed tub brings the distillate to the tub's temperature, K: the
/// sub-cooling section's low U (about 105-150 W/(m² K)) makes a closer approach cost a long
/// coil (judgement, common practice, no source).
const TUB_APPROACH_K: f64 = 5.0;

/// What the condenser stage hands on: its plan and the distillate's real outlet temperature.
pub(super) struct Condensing {
    pub plan: CondenserPlan,
    /// Where the separator works: the requested outlet, or warmer when a tub cannot reach it.
    pub distillate_outlet_c: f64,
}

struct Duty {
    total_w: f64,
    condensing_w: f64,
    subcooling_w: f64,
    per_kg_j: f64,
}

fn duty(site: &Site, rate_kg_per_s: f64, outlet_c: f64) -> Result<Duty, Box<FieldError>> {
    let h_out = water::liquid_enthalpy_j_per_kg(outlet_c + 273.15, site.pressure_pa).map_err(|_| {
        compute_error(
            "condenser.distillate_outlet_c",
            outlet_c,
            "5 °C to below the boiling point",
            "out of range",
        )
    })?;
    let h_f = site.saturated_liquid_enthalpy_j_per_kg;
    let per_kg_j = h_f + site.latent_heat_j_per_kg - h_out;
    Ok(Duty {
        total_w: rate_kg_per_s * per_kg_j,
        condensing_w: rate_kg_per_s * site.latent_heat_j_per_kg,
        subcooling_w: rate_kg_per_s * (h_f - h_out),
        per_kg_j,
    })
}

fn cooling_water_cp(c: &Condenser, pressure_pa: f64) -> Result<f64, Box<FieldError>> {
    let mean_k = 0.5 * (c.cooling_water_inlet_c + c.cooling_water_outlet_c) + 273.15;
    water::liquid_heat_capacity_j_per_kg_k(mean_k, pressure_pa).map_err(|_| {
        compute_error(
            "condenser.cooling_water_outlet_c",
            c.cooling_water_outlet_c,
            "below the boiling point",
            "out of range",
        )
    })
}

/// A fed jacket (tube in tube): counterflow, cold water meeting the cooled distillate first.
fn counterflow(c: &Condenser, site: &Site, d: &Duty, cp: f64, outlet_c: f64, run_s: f64) -> CondenserPlan {
    let t_sat = site.plan.water_boiling_point_c;
    let flow =
        law::cooling_water_flow_kg_per_s(d.total_w, cp, c.cooling_water_inlet_c, c.cooling_water_outlet_c);
    let t_mid = c.cooling_water_inlet_c + d.subcooling_w / (flow * cp);
    let lmtd_cond = law::log_mean_temperature_difference_k(t_sat - t_mid, t_sat - c.cooling_water_outlet_c);
    let lmtd_sub = law::log_mean_temperature_difference_k(t_sat - t_mid, outlet_c - c.cooling_water_inlet_c);
    let condensing_area_m2 = law::area_m2(d.condensing_w, c.condensing_u_w_per_m2_k, lmtd_cond);
    let cooling_area_m2 = if d.subcooling_w > 0.0 {
        law::area_m2(d.subcooling_w, c.cooling_u_w_per_m2_k, lmtd_sub)
    } else {
        0.0
    };
    finish(c, d, outlet_c, flow, flow * run_s, condensing_area_m2, cooling_area_m2)
}

/// A coil in a tub: the tub's mixed water warms over the run ([`law::tub_course`]) and the coil
/// is sized against its warmest state ([`law::coil_in_bath_area_m2`]).
fn coil_in_tub(c: &Condenser, site: &Site, d: &Duty, cp: f64, outlet_c: f64, run_s: f64) -> CondenserPlan {
    let t_sat = site.plan.water_boiling_point_c;
    let course = law::tub_course(
        c.tub_water_kg,
        cp,
        c.cooling_water_inlet_c,
        c.cooling_water_outlet_c,
        d.total_w,
        run_s,
    );
    let condensing_area_m2 = law::area_m2(d.condensing_w, c.condensing_u_w_per_m2_k, t_sat - course.end_c);
    let whole = law::coil_in_bath_area_m2(
        d.condensing_w,
        d.subcooling_w,
        c.condensing_u_w_per_m2_k,
        c.cooling_u_w_per_m2_k,
        t_sat,
        course.end_c,
        outlet_c,
    );
    let mut plan = finish(
        c,
        d,
        outlet_c,
        course.feed_kg_per_s,
        course.water_used_kg,
        condensing_area_m2,
        whole - condensing_area_m2,
    );
    plan.tub_lasts_s = Some(law::tub_warming_time_s(
        c.tub_water_kg,
        cp,
        c.cooling_water_inlet_c,
        c.cooling_water_outlet_c,
        d.total_w,
    ));
    plan.tub_rise_over_run_k = Some(d.total_w * run_s / (c.tub_water_kg * cp));
    plan.tub_end_c = Some(course.end_c);
    plan.tub_feed_from_s = course.feed_from_s;
    plan
}

fn finish(
    c: &Condenser,
    d: &Duty,
    outlet_c: f64,
    flow_kg_per_s: f64,
    water_kg: f64,
    condensing_area_m2: f64,
    cooling_area_m2: f64,
) -> CondenserPlan {
    let area_m2 = condensing_area_m2 + cooling_area_m2;
    CondenserPlan {
        kind: c.kind,
        duty_w: d.total_w,
        duty_per_kg_steam_j: d.per_kg_j,
        distillate_outlet_c: outlet_c,
        distillate_outlet_requested_c: outlet_c,
        cooling_water_flow_kg_per_s: flow_kg_per_s,
        cooling_water_per_run_kg: water_kg,
        tub_lasts_s: None,
        tub_rise_over_run_k: None,
        tub_end_c: None,
        tub_feed_from_s: None,
        condensing_area_m2,
        cooling_area_m2,
        area_m2,
        tube_length_m: law::tube_length_m(area_m2, c.tube_outer_diameter_m),
    }
}

/// Condensing and sub-cooling the distillate steam: the duty H_g − h(T_out) per kg, the cooling
/// water, the area (counterflow for a fed jacket, a mixed bath for a tub) and the outlet a tub
/// allows: no colder than its warmest water plus a 5 K approach.
pub(super) fn condenser(
    s: &Scenario,
    r: &Resolved,
    site: &Site,
    distillate_rate_kg_per_s: f64,
    knobs: &Knobs,
    run_s: f64,
) -> Result<Condensing, Box<FieldError>> {
    let mut c = s.condenser.clone();
    c.condensing_u_w_per_m2_k *= knobs.condenser_u_factor;
    c.cooling_u_w_per_m2_k *= knobs.condenser_u_factor;
    let c = &c;
    let cp = cooling_water_cp(c, site.pressure_pa)?;
    let requested_c = r.distillate_outlet_c;
    let mut outlet_c = requested_c;
    let plan = match c.kind {
        CondenserKind::TubeInTube => {
            let d = duty(site, distillate_rate_kg_per_s, outlet_c)?;
            counterflow(c, site, &d, cp, outlet_c, run_s)
        }
        CondenserKind::CoilInTub => {
            // The duty barely moves with the outlet (about 0.2 % per K), so two passes settle it.
            for _ in 0..2 {
                let d = duty(site, distillate_rate_kg_per_s, outlet_c)?;
                let warmest = c.cooling_water_outlet_c;
                let tub =
                    law::tub_course(c.tub_water_kg, cp, c.cooling_water_inlet_c, warmest, d.total_w, run_s);
                outlet_c = requested_c.max(tub.end_c + TUB_APPROACH_K);
            }
            let d = duty(site, distillate_rate_kg_per_s, outlet_c)?;
            coil_in_tub(c, site, &d, cp, outlet_c, run_s)
        }
    };
    let plan = CondenserPlan { distillate_outlet_requested_c: requested_c, ..plan };
    if outlet_c >= site.plan.water_boiling_point_c - 1.0 {
        return Err(compute_error(
            "condenser.cooling_water_outlet_c",
            c.cooling_water_outlet_c,
            "at least 6 °C below the boiling point for a coil in a tub",
            "the tub would bring the distillate to the boil: keep the tub cooler",
        ));
    }
    Ok(Condensing { plan, distillate_outlet_c: outlet_c })
}
