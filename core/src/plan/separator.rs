//! The separator: how fast the oil parts from the water, and the vessel it needs.

use super::layering::SeparatorWater;
use super::{OilPlan, SeparatorPlan};
use crate::scenario::Scenario;
use crate::separator as law;

/// Densities closer than this give no gravity separation worth sizing for, kg/m³.
const LEAST_DENSITY_DIFFERENCE_KG_PER_M3: f64 = 1.0;
/// Share of the receiver's liquid height given to the oil layer at the design interface: room
/// for the oil to gather and for the interface to wander (judgement, common practice, no source).
const OIL_LAYER_SHARE: f64 = 0.2;

/// Outlet heights and the interface they hold, for a receiver whose liquid stands `height_m`.
struct Heights {
    top_outlet_m: f64,
    gooseneck_m: f64,
    interface_m: f64,
    sensitivity: f64,
    interface_over_cuts_m: (f64, f64),
}

/// Sets the gooseneck so the oil layer takes [`OIL_LAYER_SHARE`] of the height, then finds where
/// the interface goes for the lightest and the heaviest cut ([`law::interface_height_m`]).
fn heights(oil: &OilPlan, rho_w: f64, height_m: f64) -> Heights {
    let rho_oil = oil.density_at_separator_kg_per_m3;
    let oil_floats = rho_oil < rho_w;
    let (light, heavy) = if oil_floats { (rho_oil, rho_w) } else { (rho_w, rho_oil) };
    let interface_m =
        if oil_floats { height_m * (1.0 - OIL_LAYER_SHARE) } else { height_m * OIL_LAYER_SHARE };
    let gooseneck_m = law::gooseneck_height_m(light, heavy, height_m, interface_m);
    let at = |rho_cut: f64| {
        let (l, h) = if oil_floats { (rho_cut, rho_w) } else { (rho_w, rho_cut) };
        if h > l {
            law::interface_height_m(l, h, height_m, gooseneck_m)
        } else if oil_floats {
            0.0
        } else {
            height_m
        }
    };
    let over_cuts = oil.cut_densities_at_separator_kg_per_m3.iter().map(|d| at(*d).clamp(0.0, height_m));
    let lo = over_cuts.clone().fold(interface_m, f64::min);
    let hi = over_cuts.fold(interface_m, f64::max);
    Heights {
        top_outlet_m: height_m,
        gooseneck_m,
        interface_m,
        sensitivity: law::interface_sensitivity(light, heavy),
        interface_over_cuts_m: (lo, hi),
    }
}

/// Stokes velocity of the design droplet, the least plan area (a check that the vessel is wide
/// enough), a practical cylinder for the residence time, and the outlet heights that hold the
/// oil-water interface (equations in [`crate::separator`]).
pub(super) fn separator(
    s: &Scenario,
    water: &SeparatorWater,
    distillate_rate_kg_per_s: f64,
    oil: &OilPlan,
    temperature_c: f64,
) -> SeparatorPlan {
    let sp = &s.separator;
    let rho_w = water.density_kg_per_m3;
    let mu_w = water.viscosity_pa_s;
    let rho_oil = oil.density_at_separator_kg_per_m3;
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
    let h = height_m.map(|h| heights(oil, rho_w, h));
    SeparatorPlan {
        distillate_flow_m3_per_s: flow,
        temperature_c,
        water_density_kg_per_m3: rho_w,
        water_viscosity_pa_s: mu_w,
        droplet_velocity_m_per_s: v,
        droplet_reynolds_number: re,
        plan_area_m2,
        diameter_m,
        volume_m3,
        height_m,
        oil_outlet: oil.collects_at,
        top_outlet_height_m: h.as_ref().map(|h| h.top_outlet_m),
        gooseneck_height_m: h.as_ref().map(|h| h.gooseneck_m),
        interface_height_m: h.as_ref().map(|h| h.interface_m),
        interface_per_gooseneck: h.as_ref().map(|h| h.sensitivity),
        interface_low_m: h.as_ref().map(|h| h.interface_over_cuts_m.0),
        interface_high_m: h.as_ref().map(|h| h.interface_over_cuts_m.1),
    }
}
