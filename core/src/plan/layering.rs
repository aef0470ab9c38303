//! Stage 3, layering: the water at the separator's temperature and which way the oil goes.

use super::equilibrium::Equilibrium;
use super::{FieldError, OilLayer, OilPlan, Resolved, compute_error};
use crate::water;

/// Water at the separator, as the separator and yield stages need it.
pub(super) struct SeparatorWater {
    pub density_kg_per_m3: f64,
    pub viscosity_pa_s: f64,
}

/// Share of the oil (by mass) made of compounds lighter than the water.
pub(super) fn lighter_share(r: &Resolved, water_density_kg_per_m3: f64) -> f64 {
    r.oil
        .components
        .iter()
        .zip(r.oil.mass_fractions())
        .filter(|(c, _)| c.liquid_density_kg_per_m3 < water_density_kg_per_m3)
        .map(|(_, w)| w)
        .sum()
}

/// Liquid water at the distillate temperature (IAPWS-IF97 density, IAPWS 2008 viscosity)
/// against the oil's density: top or bottom outlet.
pub(super) fn layering(
    r: &Resolved,
    eq: &Equilibrium,
    pressure_pa: f64,
) -> Result<(OilPlan, SeparatorWater), Box<FieldError>> {
    let t_k = r.distillate_outlet_c + 273.15;
    let out_of_range = |_| {
        compute_error(
            "condenser.distillate_outlet_c",
            r.distillate_outlet_c,
            "5 °C to below the boiling point",
            "out of range",
        )
    };
    let rho_w = water::liquid_density_kg_per_m3(t_k, pressure_pa).map_err(out_of_range)?;
    let mu_w = water::liquid_viscosity_pa_s(t_k, pressure_pa).map_err(out_of_range)?;
    let rho_oil = r.oil_density_kg_per_m3;
    let collects_at = if rho_oil < rho_w { OilLayer::Top } else { OilLayer::Bottom };
    let mixed_density = (0.05..=0.95).contains(&lighter_share(r, rho_w));
    let plan =
        OilPlan { components: eq.components.clone(), density_kg_per_m3: rho_oil, collects_at, mixed_density };
    Ok((plan, SeparatorWater { density_kg_per_m3: rho_w, viscosity_pa_s: mu_w }))
}
