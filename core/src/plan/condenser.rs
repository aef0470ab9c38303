//! Stage 6, the condenser: its duty, the cooling water, and the area and tube it needs.

use super::site::Site;
use super::{CondenserPlan, FieldError, Resolved, compute_error};
use crate::condenser as law;
use crate::scenario::{CondenserKind, Scenario};
use crate::water;

/// Condensing and sub-cooling the distillate steam down to the distillate temperature.
pub(super) fn condenser(
    s: &Scenario,
    r: &Resolved,
    site: &Site,
    distillate_rate_kg_per_s: f64,
    run_s: f64,
) -> Result<CondenserPlan, Box<FieldError>> {
    let c = &s.condenser;
    let p = site.pressure_pa;
    let t_boil_c = site.plan.water_boiling_point_c;
    let t_d = r.distillate_outlet_c;
    let h_out = water::liquid_enthalpy_j_per_kg(t_d + 273.15, p).map_err(|_| {
        compute_error("condenser.distillate_outlet_c", t_d, "5 °C to below the boiling point", "out of range")
    })?;
    let h_f_sat = site.saturated_liquid_enthalpy_j_per_kg;
    let h_fg = site.latent_heat_j_per_kg;
    let duty_per_kg = h_f_sat + h_fg - h_out;
    let duty_w = distillate_rate_kg_per_s * duty_per_kg;
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
    let cw_flow =
        law::cooling_water_flow_kg_per_s(duty_w, cp_cw, c.cooling_water_inlet_c, c.cooling_water_outlet_c);
    let q_cond = distillate_rate_kg_per_s * h_fg;
    let q_sub = distillate_rate_kg_per_s * (h_f_sat - h_out);
    // Counterflow: cold water meets the cooled distillate first, then the condensing steam.
    let t_mid = c.cooling_water_inlet_c + q_sub / (cw_flow * cp_cw);
    let lmtd_cond =
        law::log_mean_temperature_difference_k(t_boil_c - t_mid, t_boil_c - c.cooling_water_outlet_c);
    let lmtd_sub = law::log_mean_temperature_difference_k(t_boil_c - t_mid, t_d - c.cooling_water_inlet_c);
    let condensing_area_m2 = law::area_m2(q_cond, c.condensing_u_w_per_m2_k, lmtd_cond);
    let cooling_area_m2 =
        if q_sub > 0.0 { law::area_m2(q_sub, c.cooling_u_w_per_m2_k, lmtd_sub) } else { 0.0 };
    let area_m2 = condensing_area_m2 + cooling_area_m2;
    let in_tub = c.kind == CondenserKind::CoilInTub;
    Ok(CondenserPlan {
        kind: c.kind,
        duty_w,
        duty_per_kg_steam_j: duty_per_kg,
        distillate_outlet_c: t_d,
        cooling_water_flow_kg_per_s: cw_flow,
        cooling_water_per_run_kg: cw_flow * run_s,
        tub_lasts_s: in_tub.then(|| {
            law::tub_warming_time_s(
                c.tub_water_kg,
                cp_cw,
                c.cooling_water_inlet_c,
                c.cooling_water_outlet_c,
                duty_w,
            )
        }),
        tub_rise_over_run_k: in_tub.then(|| duty_w * run_s / (c.tub_water_kg * cp_cw)),
        condensing_area_m2,
        cooling_area_m2,
        area_m2,
        tube_length_m: law::tube_length_m(area_m2, c.tube_outer_diameter_m),
    })
}
