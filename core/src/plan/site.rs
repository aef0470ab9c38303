//! The site: the pressure at the still and what it does to water.

use super::{FieldError, Resolved, SEA_LEVEL_BOILING_C, SitePlan, compute_error};
use crate::water;

/// The site as later stages need it: the published part and the saturation state.
pub(super) struct Site {
    pub plan: SitePlan,
    pub pressure_pa: f64,
    /// Latent heat at the local boiling point, J/kg.
    pub latent_heat_j_per_kg: f64,
    /// Saturated liquid enthalpy at the local boiling point, J/kg.
    pub saturated_liquid_enthalpy_j_per_kg: f64,
}

/// Water's boiling point, latent heat and liquid enthalpy at the resolved site pressure
/// (IAPWS-IF97 region 4, via [`crate::water`]).
pub(super) fn site(r: &Resolved) -> Result<Site, Box<FieldError>> {
    let p = r.pressure_pa;
    let out_of_range = |_| compute_error("site", p, "1 kPa to 1 MPa", "pressure out of range");
    let boiling_k = water::saturation_temperature_k(p).map_err(out_of_range)?;
    let h_fg = water::latent_heat_j_per_kg(boiling_k).map_err(out_of_range)?;
    let h_f = water::saturated_liquid_enthalpy_j_per_kg(boiling_k).map_err(out_of_range)?;
    let boiling_c = boiling_k - 273.15;
    Ok(Site {
        plan: SitePlan {
            pressure_pa: p,
            pressure_from: r.pressure_from,
            water_boiling_point_c: boiling_c,
            boiling_point_shift_k: boiling_c - SEA_LEVEL_BOILING_C,
            latent_heat_j_per_kg: h_fg,
        },
        pressure_pa: p,
        latent_heat_j_per_kg: h_fg,
        saturated_liquid_enthalpy_j_per_kg: h_f,
    })
}
