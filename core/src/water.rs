//! Water and steam: IAPWS-IF97 saturation line, enthalpies and latent heat; liquid density,
//! heat capacity and viscosity.
//!
//! All properties come from the `seuif97` crate (an IAPWS-IF97 implementation, with the IAPWS
//! 2008 viscosity), wrapped here in SI units (Pa, K, J/kg) with the validity range checked first,
//! because the crate answers out-of-range input with a sentinel number rather than an error.
//! The tests in `tests/tests/reference_water.rs` hold it to the IAPWS verification tables.

use seuif97::{OCP, OD, ODV, OH, OP, OT, pt, px, tx};

/// Molar mass of water, kg/mol (IAPWS-95 / IF97 value 18.015268 g/mol).
pub const MOLAR_MASS_KG_PER_MOL: f64 = 0.018_015_268;
/// Lowest temperature of the IF97 saturation line, K (the triple point).
pub const SATURATION_T_MIN_K: f64 = 273.15;
/// Critical temperature, K (IF97).
pub const SATURATION_T_MAX_K: f64 = 647.096;
/// Saturation pressure at 273.15 K, Pa (IF97 region 4 lower limit).
pub const SATURATION_P_MIN_PA: f64 = 611.213;
/// Critical pressure, Pa (IF97).
pub const SATURATION_P_MAX_PA: f64 = 22.064e6;

/// A state outside the range where the property equations hold.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct OutOfRange {
    pub quantity: &'static str,
    pub value: f64,
    pub min: f64,
    pub max: f64,
}

fn check(quantity: &'static str, value: f64, min: f64, max: f64) -> Result<f64, OutOfRange> {
    if value.is_finite() && value >= min && value <= max {
        Ok(value)
    } else {
        Err(OutOfRange { quantity, value, min, max })
    }
}

fn k_to_c(t_k: f64) -> f64 {
    t_k - 273.15
}

/// Saturation pressure of water, Pa, from the IF97 region-4 saturation equation.
///
/// p_s = [2C / (-B + (B² - 4AC)^0.5)]^4 (MPa), with A, B, C quadratic in ϑ = T + n9/(T - n10).
/// Source: IAPWS R7-97(2012), eq. 30. Valid 273.15 K to 647.096 K.
///
/// ```
/// use stillroom_core::water::saturation_pressure_pa;
/// // IAPWS-IF97 Table 35: p_s(300 K) = 0.353658941e-2 MPa.
/// let p = saturation_pressure_pa(300.0).unwrap();
/// assert!((p / 3536.58941 - 1.0).abs() < 1e-8);
/// ```
pub fn saturation_pressure_pa(t_k: f64) -> Result<f64, OutOfRange> {
    check("temperature_k", t_k, SATURATION_T_MIN_K, SATURATION_T_MAX_K)?;
    Ok(tx(k_to_c(t_k), 0.0, OP) * 1e6)
}

/// Saturation (boiling) temperature of water, K, from the IF97 backward saturation equation.
///
/// T_s = [n10 + D - ((n10 + D)² - 4(n9 + n10 D))^0.5] / 2, D from β = p^0.25.
/// Source: IAPWS R7-97(2012), eq. 31. Valid 611.213 Pa to 22.064 MPa.
///
/// ```
/// use stillroom_core::water::saturation_temperature_k;
/// // IAPWS-IF97 Table 36: T_s(0.1 MPa) = 0.372755919e3 K.
/// let t = saturation_temperature_k(100_000.0).unwrap();
/// assert!((t / 372.755919 - 1.0).abs() < 1e-8);
/// ```
pub fn saturation_temperature_k(p_pa: f64) -> Result<f64, OutOfRange> {
    check("pressure_pa", p_pa, SATURATION_P_MIN_PA, SATURATION_P_MAX_PA)?;
    Ok(px(p_pa / 1e6, 0.0, OT) + 273.15)
}

/// Specific enthalpy of saturated liquid water at temperature T, J/kg (IF97 region 1 on the
/// saturation line). Reference state: liquid at the triple point has u = 0, s = 0.
///
/// Source: IAPWS R7-97(2012), eq. 7 at p = p_s(T). Valid 273.15 K to 623.15 K.
///
/// ```
/// use stillroom_core::water::saturated_liquid_enthalpy_j_per_kg;
/// // IF97 at 100 °C: h' = 419.099 kJ/kg.
/// let h = saturated_liquid_enthalpy_j_per_kg(373.15).unwrap();
/// assert!((h - 419_099.0).abs() < 2.0);
/// ```
pub fn saturated_liquid_enthalpy_j_per_kg(t_k: f64) -> Result<f64, OutOfRange> {
    check("temperature_k", t_k, SATURATION_T_MIN_K, 623.15)?;
    Ok(tx(k_to_c(t_k), 0.0, OH) * 1e3)
}

/// Specific enthalpy of saturated steam at temperature T, J/kg (IF97 region 2 on the
/// saturation line).
///
/// Source: IAPWS R7-97(2012), eq. 15 at p = p_s(T). Valid 273.15 K to 623.15 K.
///
/// ```
/// use stillroom_core::water::saturated_vapour_enthalpy_j_per_kg;
/// // IF97 at 100 °C: h'' = 2675.572 kJ/kg.
/// let h = saturated_vapour_enthalpy_j_per_kg(373.15).unwrap();
/// assert!((h - 2_675_572.0).abs() < 2.0);
/// ```
pub fn saturated_vapour_enthalpy_j_per_kg(t_k: f64) -> Result<f64, OutOfRange> {
    check("temperature_k", t_k, SATURATION_T_MIN_K, 623.15)?;
    Ok(tx(k_to_c(t_k), 1.0, OH) * 1e3)
}

/// Latent heat of vaporisation h_fg = h'' - h', J/kg, at saturation temperature T.
///
/// Source: IAPWS R7-97(2012) regions 1 and 2 on the saturation line. Valid 273.15 K to 623.15 K.
///
/// ```
/// use stillroom_core::water::latent_heat_j_per_kg;
/// // IF97 at 90 °C: 2282.560 kJ/kg (steam-table value 2282.5 kJ/kg).
/// let l = latent_heat_j_per_kg(363.15).unwrap();
/// assert!((l - 2_282_560.0).abs() < 5.0);
/// ```
pub fn latent_heat_j_per_kg(t_k: f64) -> Result<f64, OutOfRange> {
    Ok(saturated_vapour_enthalpy_j_per_kg(t_k)? - saturated_liquid_enthalpy_j_per_kg(t_k)?)
}

/// Density of saturated steam at temperature T, kg/m³ (IF97 region 2 on the saturation line).
///
/// Source: IAPWS R7-97(2012), eq. 15 at p = p_s(T). Valid 273.15 K to 623.15 K.
///
/// ```
/// use stillroom_core::water::saturated_vapour_density_kg_per_m3;
/// // Saturated steam at 1 atm: 0.5977 kg/m³ (CoolProp 8.0.0, IAPWS-95).
/// let rho = saturated_vapour_density_kg_per_m3(373.124).unwrap();
/// assert!((rho - 0.5977).abs() < 0.001);
/// ```
pub fn saturated_vapour_density_kg_per_m3(t_k: f64) -> Result<f64, OutOfRange> {
    check("temperature_k", t_k, SATURATION_T_MIN_K, 623.15)?;
    Ok(tx(k_to_c(t_k), 1.0, OD))
}

/// The liquid states the calculator needs: 0.5 °C to just below boiling at the given pressure,
/// and pressures a still sees (10 kPa to 1 MPa).
fn check_liquid(t_k: f64, p_pa: f64) -> Result<(), OutOfRange> {
    check("pressure_pa", p_pa, 10_000.0, 1.0e6)?;
    let t_boil = saturation_temperature_k(p_pa)?;
    check("temperature_k", t_k, 273.65, t_boil - 1e-6)?;
    Ok(())
}

/// Specific enthalpy of compressed (sub-cooled) liquid water, J/kg (IF97 region 1).
///
/// Source: IAPWS R7-97(2012), eq. 7. Valid here from 0.5 °C to the boiling point at p,
/// for 10 kPa ≤ p ≤ 1 MPa.
///
/// ```
/// use stillroom_core::water::liquid_enthalpy_j_per_kg;
/// // Steam tables: liquid water at 20 °C, 1 atm: 84.0 kJ/kg (from memory; IF97 gives 84.01).
/// let h = liquid_enthalpy_j_per_kg(293.15, 101_325.0).unwrap();
/// assert!((h - 84_010.0).abs() < 50.0);
/// ```
pub fn liquid_enthalpy_j_per_kg(t_k: f64, p_pa: f64) -> Result<f64, OutOfRange> {
    check_liquid(t_k, p_pa)?;
    Ok(pt(p_pa / 1e6, k_to_c(t_k), (OH, 1)) * 1e3)
}

/// Density of liquid water, kg/m³ (IF97 region 1, ρ = 1/v).
///
/// Source: IAPWS R7-97(2012), eq. 7; within 0.015 kg/m³ of IAPWS-95 from 10 to 99 °C.
/// Valid here from 0.5 °C to the boiling point at p, for 10 kPa ≤ p ≤ 1 MPa.
///
/// ```
/// use stillroom_core::water::liquid_density_kg_per_m3;
/// // CRC Handbook, properties of water: 998.21 kg/m³ at 20 °C.
/// let rho = liquid_density_kg_per_m3(293.15, 101_325.0).unwrap();
/// assert!((rho - 998.21).abs() < 0.02);
/// ```
pub fn liquid_density_kg_per_m3(t_k: f64, p_pa: f64) -> Result<f64, OutOfRange> {
    check_liquid(t_k, p_pa)?;
    Ok(pt(p_pa / 1e6, k_to_c(t_k), (OD, 1)))
}

/// Isobaric specific heat capacity of liquid water, J/(kg·K) (IF97 region 1).
///
/// Source: IAPWS R7-97(2012), Table 3 (c_p from γ_ττ). Valid here from 0.5 °C to the boiling
/// point at p, for 10 kPa ≤ p ≤ 1 MPa.
///
/// ```
/// use stillroom_core::water::liquid_heat_capacity_j_per_kg_k;
/// // ≈ 4184 J/(kg K) at 20 °C, 1 atm (IAPWS-95 gives 4184.1).
/// let cp = liquid_heat_capacity_j_per_kg_k(293.15, 101_325.0).unwrap();
/// assert!((cp - 4184.0).abs() < 3.0);
/// ```
pub fn liquid_heat_capacity_j_per_kg_k(t_k: f64, p_pa: f64) -> Result<f64, OutOfRange> {
    check_liquid(t_k, p_pa)?;
    Ok(pt(p_pa / 1e6, k_to_c(t_k), (OCP, 1)) * 1e3)
}

/// Dynamic viscosity of liquid water, Pa·s: the IAPWS 2008 formulation μ = μ0(T) μ1(T, ρ)
/// (critical enhancement omitted, as the industrial formulation allows), with ρ from IF97.
///
/// Source: IAPWS R12-08, eqs. 10-12. Valid here from 0.5 °C to the boiling point at p,
/// for 10 kPa ≤ p ≤ 1 MPa.
///
/// ```
/// use stillroom_core::water::liquid_viscosity_pa_s;
/// // CRC Handbook: 1.0016 mPa·s at 20 °C.
/// let mu = liquid_viscosity_pa_s(293.15, 101_325.0).unwrap();
/// assert!((mu - 1.0016e-3).abs() < 2e-6);
/// ```
pub fn liquid_viscosity_pa_s(t_k: f64, p_pa: f64) -> Result<f64, OutOfRange> {
    check_liquid(t_k, p_pa)?;
    Ok(pt(p_pa / 1e6, k_to_c(t_k), (ODV, 1)))
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn out_of_range_is_an_error_not_a_sentinel() {
        assert!(saturation_pressure_pa(200.0).is_err());
        assert!(saturation_temperature_k(1.0).is_err());
        assert!(liquid_density_kg_per_m3(380.0, 101_325.0).is_err());
        assert!(liquid_viscosity_pa_s(f64::NAN, 101_325.0).is_err());
    }

    #[test]
    fn saturation_functions_invert_each_other() {
        for t in [280.0, 330.0, 363.15, 373.15, 420.0] {
            let p = saturation_pressure_pa(t).unwrap();
            let back = saturation_temperature_k(p).unwrap();
            assert!((back - t).abs() < 1e-6, "{t} -> {p} -> {back}");
        }
    }
}
