//! The air around the still: site pressure from altitude (US Standard Atmosphere 1976) and
//! barometer readings, station or reduced to sea level.
//!
//! Altitudes are **geometric** (height above mean sea level as a map or GPS gives it). The
//! standard's equations are written in geopotential altitude H, so each function first converts
//! H = r0 Z / (r0 + Z) with the standard's effective Earth radius r0 = 6 356 766 m.

/// Sea-level standard pressure P0, Pa (USSA 1976).
pub const SEA_LEVEL_PRESSURE_PA: f64 = 101_325.0;
/// Sea-level standard temperature T0, K (USSA 1976).
pub const SEA_LEVEL_TEMPERATURE_K: f64 = 288.15;
/// Standard gravity g0, m/s² (USSA 1976).
pub const STANDARD_GRAVITY_M_PER_S2: f64 = 9.806_65;
/// Gas constant R*, J/(mol·K), the value the standard itself uses (not CODATA's).
pub const GAS_CONSTANT_USSA_J_PER_MOL_K: f64 = 8.314_32;
/// Mean molar mass of sea-level air M0, kg/mol (USSA 1976).
pub const AIR_MOLAR_MASS_KG_PER_MOL: f64 = 0.028_964_4;
/// Tropospheric lapse rate, K per geopotential metre (USSA 1976, 0-11 km).
pub const LAPSE_RATE_K_PER_M: f64 = -0.0065;
/// Effective Earth radius used for the geopotential conversion, m (USSA 1976).
pub const EARTH_RADIUS_M: f64 = 6_356_766.0;

/// Lowest site altitude the calculator accepts (the Dead Sea shore is at about -430 m).
pub const MIN_ALTITUDE_M: f64 = -500.0;
/// Highest site altitude the calculator accepts; stills are not run higher, and the troposphere
/// formula itself holds to 11 km.
pub const MAX_ALTITUDE_M: f64 = 6000.0;

/// An altitude outside [`MIN_ALTITUDE_M`], [`MAX_ALTITUDE_M`].
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct AltitudeOutOfRange {
    pub altitude_m: f64,
}

fn check_altitude(altitude_m: f64) -> Result<(), AltitudeOutOfRange> {
    if altitude_m.is_finite() && (MIN_ALTITUDE_M..=MAX_ALTITUDE_M).contains(&altitude_m) {
        Ok(())
    } else {
        Err(AltitudeOutOfRange { altitude_m })
    }
}

/// Geopotential altitude H (m') from geometric altitude Z (m): H = r0 Z / (r0 + Z).
///
/// Source: US Standard Atmosphere 1976, eq. 18. Valid for any Z > -r0.
///
/// ```
/// use stillroom_core::atmosphere::geopotential_altitude_m;
/// // USSA 1976 / its Table I: Z = 1000 m is H = 999.84 m'.
/// assert!((geopotential_altitude_m(1000.0) - 999.843).abs() < 1e-3);
/// ```
pub fn geopotential_altitude_m(geometric_altitude_m: f64) -> f64 {
    EARTH_RADIUS_M * geometric_altitude_m / (EARTH_RADIUS_M + geometric_altitude_m)
}

/// The ratio P(Z)/P0 of the standard troposphere,
/// (1 + L H / T0)^(-g0 M0 / (R* L)), exponent 5.255876.
fn standard_pressure_ratio(geometric_altitude_m: f64) -> f64 {
    let h = geopotential_altitude_m(geometric_altitude_m);
    let exponent = -STANDARD_GRAVITY_M_PER_S2 * AIR_MOLAR_MASS_KG_PER_MOL
        / (GAS_CONSTANT_USSA_J_PER_MOL_K * LAPSE_RATE_K_PER_M);
    (1.0 + LAPSE_RATE_K_PER_M * h / SEA_LEVEL_TEMPERATURE_K).powf(exponent)
}

/// Standard-atmosphere pressure at a geometric altitude, Pa.
///
/// P = P0 (1 + L H / T0)^(-g0 M0 / (R* L)), with H geopotential (see
/// [`geopotential_altitude_m`]), L = -6.5 K/km, exponent 5.255876.
/// Source: US Standard Atmosphere 1976 (NOAA/NASA/USAF), troposphere, eq. 33a.
/// Valid range accepted here: -500 m to 6000 m; an error outside it.
///
/// ```
/// use stillroom_core::atmosphere::standard_pressure_pa;
/// // USSA 1976 Table I prints 8.9876E+04 Pa at 1000 m.
/// let p = standard_pressure_pa(1000.0).unwrap();
/// assert!((p - 89_876.0).abs() < 5.0);
/// assert!(standard_pressure_pa(7000.0).is_err());
/// ```
pub fn standard_pressure_pa(geometric_altitude_m: f64) -> Result<f64, AltitudeOutOfRange> {
    check_altitude(geometric_altitude_m)?;
    Ok(SEA_LEVEL_PRESSURE_PA * standard_pressure_ratio(geometric_altitude_m))
}

/// Station (absolute) pressure from a barometer reading reduced to sea level, Pa.
///
/// Weather reports give pressure "reduced to sea level" (QNH-style). Reversing the reduction
/// through the standard atmosphere: p_station = p_sea_level · P(Z)/P0.
/// Source: the reduction that defines the altimeter setting (ICAO Doc 7488 standard
/// atmosphere, identical to USSA 1976 below 32 km). Valid for -500 m to 6000 m.
///
/// ```
/// use stillroom_core::atmosphere::station_pressure_from_sea_level_pa;
/// // A 1013.25 hPa report at 1000 m means the standard 898.8 hPa at the still.
/// let p = station_pressure_from_sea_level_pa(101_325.0, 1000.0).unwrap();
/// assert!((p - 89_876.0).abs() < 5.0);
/// ```
pub fn station_pressure_from_sea_level_pa(
    sea_level_pressure_pa: f64,
    geometric_altitude_m: f64,
) -> Result<f64, AltitudeOutOfRange> {
    check_altitude(geometric_altitude_m)?;
    Ok(sea_level_pressure_pa * standard_pressure_ratio(geometric_altitude_m))
}

/// Standard temperature at a geometric altitude, K: T = T0 + L H.
///
/// Source: US Standard Atmosphere 1976, troposphere. Valid for -500 m to 6000 m.
///
/// ```
/// use stillroom_core::atmosphere::standard_temperature_k;
/// // USSA 1976 Table I: 281.651 K at 1000 m.
/// assert!((standard_temperature_k(1000.0).unwrap() - 281.651).abs() < 1e-3);
/// ```
pub fn standard_temperature_k(geometric_altitude_m: f64) -> Result<f64, AltitudeOutOfRange> {
    check_altitude(geometric_altitude_m)?;
    Ok(SEA_LEVEL_TEMPERATURE_K + LAPSE_RATE_K_PER_M * geopotential_altitude_m(geometric_altitude_m))
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn pressure_falls_with_altitude_across_the_range() {
        let mut last = f64::INFINITY;
        let mut z = MIN_ALTITUDE_M;
        while z <= MAX_ALTITUDE_M {
            let p = standard_pressure_pa(z).unwrap();
            assert!(p < last);
            last = p;
            z += 250.0;
        }
    }

    #[test]
    fn rejects_non_finite_altitude() {
        assert!(standard_pressure_pa(f64::NAN).is_err());
        assert!(standard_pressure_pa(-501.0).is_err());
    }
}
