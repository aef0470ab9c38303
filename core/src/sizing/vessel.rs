//! The still body of a water-and-steam still: boiler water at the bottom, a grid above it, the
//! charge on the grid and steam space above the charge, in one upright cylinder.

use super::search::{bracket_up, smallest_passing};

/// Water held above the heater (element or fired bottom) that is never boiled off, m of depth:
/// a bare element or a dry bottom burns out (common practice, no source).
pub const HEATER_COVER_M: f64 = 0.05;
/// Gap between the boiling water's surface and the grid, m: boiling water splashes and foams,
/// and must not wet the charge (common practice, no source).
pub const GRID_CLEARANCE_M: f64 = 0.10;
/// Steam space above the charge, as a share of the charge's volume: room for the steam to
/// gather before the swan neck, and for the charge to swell (common practice, no source).
pub const STEAM_SPACE_SHARE: f64 = 0.10;
/// Density of boiling water, kg/m³: saturated liquid at 100 °C (IAPWS-IF97, 958.4); the
/// water stands higher hot than cold.
pub const BOILING_WATER_DENSITY_KG_PER_M3: f64 = 958.4;

/// The stack inside one vessel, heights from its bottom, m.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Stack {
    pub volume_m3: f64,
    pub diameter_m: f64,
    pub height_m: f64,
    /// Boiler water at the start: what boils off plus the heater's cover, kg.
    pub water_fill_kg: f64,
    pub water_depth_m: f64,
    pub grid_height_m: f64,
    /// Volume left for the charge between the grid and the steam space.
    pub charge_space_m3: f64,
    pub charge_top_m: f64,
}

fn cross_section_m2(volume_m3: f64, height_to_diameter: f64) -> f64 {
    let d = (4.0 * volume_m3 / (std::f64::consts::PI * height_to_diameter)).cbrt();
    std::f64::consts::PI * d * d / 4.0
}

/// How a vessel of a given volume and shape divides up, holding `boiled_off_kg` of water to boil
/// away (plus the heater's cover) below the grid.
///
/// D = (4 V / (π r))^(1/3), A = π D²/4, H = r D; water depth h_w = m/(ρ A) + cover; grid at
/// h_w + clearance; the charge gets (H − grid) A / (1 + steam share). Source: geometry.
///
/// ```
/// use stillroom_core::sizing::vessel::stack;
/// // A 200 L drum (shape 1.5) boiling off 20 kg: D = 0.554 m; 11.7 kg of cover water.
/// let s = stack(0.2, 1.5, 20.0);
/// assert!((s.diameter_m - 0.5537).abs() < 1e-3);
/// assert!((s.water_fill_kg - 31.54).abs() < 0.05);
/// assert!(s.charge_space_m3 > 0.13 && s.charge_space_m3 < 0.14);
/// ```
pub fn stack(volume_m3: f64, height_to_diameter: f64, boiled_off_kg: f64) -> Stack {
    let a = cross_section_m2(volume_m3, height_to_diameter);
    let d = (4.0 * a / std::f64::consts::PI).sqrt();
    let h = height_to_diameter * d;
    let water_depth_m = boiled_off_kg / (BOILING_WATER_DENSITY_KG_PER_M3 * a) + HEATER_COVER_M;
    let grid = water_depth_m + GRID_CLEARANCE_M;
    let charge_space_m3 = ((h - grid) * a / (1.0 + STEAM_SPACE_SHARE)).max(0.0);
    Stack {
        volume_m3,
        diameter_m: d,
        height_m: h,
        water_fill_kg: boiled_off_kg + HEATER_COVER_M * a * BOILING_WATER_DENSITY_KG_PER_M3,
        water_depth_m,
        grid_height_m: grid,
        charge_space_m3,
        charge_top_m: grid + charge_space_m3 / a,
    }
}

/// The smallest vessel of a shape that holds a charge of `charge_m3` and the boiler water, m³:
/// bisection on the volume, whose charge space grows with it.
///
/// ```
/// use stillroom_core::sizing::vessel::{smallest_vessel_m3, stack};
/// let v = smallest_vessel_m3(0.1, 1.5, 20.0).unwrap();
/// assert!(stack(v, 1.5, 20.0).charge_space_m3 >= 0.1);
/// assert!(stack(v * 0.999, 1.5, 20.0).charge_space_m3 < 0.1);
/// ```
pub fn smallest_vessel_m3(charge_m3: f64, height_to_diameter: f64, boiled_off_kg: f64) -> Option<f64> {
    let holds = |v: f64| stack(v, height_to_diameter, boiled_off_kg).charge_space_m3 >= charge_m3;
    let start = charge_m3 + boiled_off_kg / BOILING_WATER_DENSITY_KG_PER_M3;
    let (lo, hi) = bracket_up(holds, start, 1.0e3).ok()?;
    smallest_passing(holds, lo, hi, 1e-6 * hi).ok()
}
