//! Stage 7, the separator: how fast the oil parts from the water, and the vessel it needs.

use super::layering::SeparatorWater;
use super::{OilLayer, Resolved, SeparatorPlan};
use crate::scenario::Scenario;
use crate::separator as law;

/// Densities closer than this give no gravity separation worth sizing for, kg/m³.
const LEAST_DENSITY_DIFFERENCE_KG_PER_M3: f64 = 1.0;

/// Stokes velocity of the design droplet, the least plan area, and a practical cylinder for the
/// residence time (equations in [`crate::separator`]).
pub(super) fn separator(
    s: &Scenario,
    r: &Resolved,
    water: &SeparatorWater,
    distillate_rate_kg_per_s: f64,
    oil_outlet: OilLayer,
) -> SeparatorPlan {
    let sp = &s.separator;
    let rho_w = water.density_kg_per_m3;
    let mu_w = water.viscosity_pa_s;
    let rho_oil = r.oil_density_kg_per_m3;
    let flow = distillate_rate_kg_per_s / rho_w;
    let v = law::stokes_velocity_m_per_s(sp.droplet_diameter_m, rho_oil, rho_w, mu_w);
    let re = law::droplet_reynolds_number(v, sp.droplet_diameter_m, rho_w, mu_w);
    let volume_m3 = flow * sp.residence_time_s;
    let (plan_area_m2, diameter_m, height_m) =
        if (rho_oil - rho_w).abs() >= LEAST_DENSITY_DIFFERENCE_KG_PER_M3 {
            let a = law::plan_area_m2(flow, v, sp.turbulence_factor);
            let (d, h) = law::practical_cylinder_m(volume_m3, a, 2.0);
            (Some(a), Some(d), Some(h))
        } else {
            (None, None, None)
        };
    SeparatorPlan {
        distillate_flow_m3_per_s: flow,
        temperature_c: r.distillate_outlet_c,
        water_density_kg_per_m3: rho_w,
        water_viscosity_pa_s: mu_w,
        droplet_velocity_m_per_s: v,
        droplet_reynolds_number: re,
        plan_area_m2,
        diameter_m,
        volume_m3,
        height_m,
        oil_outlet,
    }
}
