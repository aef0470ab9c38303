//! Layering: the water at the separator's temperature, the oil's density there (whole
//! and cut by cut, following temperature), and which way the oil goes.

use super::equilibrium::Equilibrium;
use super::{FieldError, OilLayer, OilPlan, Resolved, compute_error};
use crate::oil::{ideal_density_kg_per_m3, oil_density_at_kg_per_m3};
use crate::water;
use std::cell::RefCell;
use std::rc::Rc;

/// How near the separator temperature a density crossing counts as a risk, K. A receiver drifts
/// by this much over a run and between day and night (common practice, no source).
const INVERSION_WINDOW_K: f64 = 10.0;
/// Coldest and warmest separator temperatures searched for a crossing, °C.
const SEARCH_FROM_C: f64 = 1.0;
const SEARCH_TO_C: f64 = 99.0;

/// Water at the separator, as the separator and yield stages need it.
pub(super) struct SeparatorWater {
    pub density_kg_per_m3: f64,
    pub viscosity_pa_s: f64,
}

/// Oil density at `t_c` scaled by a cut's ideal density relative to the whole oil's.
fn density_at(r: &Resolved, relative: f64, t_c: f64) -> f64 {
    oil_density_at_kg_per_m3(r.oil_density_kg_per_m3, t_c) * relative
}

/// Water's density by temperature, (°C, kg/m³), 1 K apart.
type Grid = Rc<[(f64, f64)]>;

thread_local! {
    /// The last grid made, by the bits of (pressure, boiling point).
    static KEPT_GRID: RefCell<Option<((u64, u64), Grid)>> = const { RefCell::new(None) };
}

/// Water's density on a 1 K grid from 1 °C to the boiling point (or 99 °C): computed once,
/// shared by every crossing search. Its ~100 IF97 calls depend on the pressure alone, which
/// most of the page's edits leave as it was, so the last grid is kept and reused for the same
/// pressure and boiling point (bit for bit): the same numbers a fresh grid gives. One per
/// thread.
fn water_density_grid(pressure_pa: f64, boiling_c: f64) -> Grid {
    let key = (pressure_pa.to_bits(), boiling_c.to_bits());
    if let Some(grid) =
        KEPT_GRID.with_borrow(|k| k.as_ref().filter(|(k, _)| *k == key).map(|(_, g)| g.clone()))
    {
        return grid;
    }
    let grid: Grid = fresh_water_density_grid(pressure_pa, boiling_c).into();
    KEPT_GRID.with_borrow_mut(|k| *k = Some((key, grid.clone())));
    grid
}

fn fresh_water_density_grid(pressure_pa: f64, boiling_c: f64) -> Vec<(f64, f64)> {
    let top = (boiling_c - 0.5).min(SEARCH_TO_C);
    let mut grid = Vec::new();
    let mut t = SEARCH_FROM_C;
    while t <= top {
        if let Ok(rho) = water::liquid_density_kg_per_m3(t + 273.15, pressure_pa) {
            grid.push((t, rho));
        }
        t += 1.0;
    }
    grid
}

/// The temperature nearest `near_c` at which the oil (scaled by `relative`) is as dense as the
/// water, if any on the grid; linear between grid points (both densities are smooth and
/// nearly linear over 1 K, so the error is far below a kelvin).
fn crossing_c(r: &Resolved, relative: f64, grid: &[(f64, f64)], near_c: f64) -> Option<f64> {
    let gap = |&(t, rho_w): &(f64, f64)| density_at(r, relative, t) - rho_w;
    grid.windows(2)
        .filter_map(|w| {
            let (g0, g1) = (gap(&w[0]), gap(&w[1]));
            (g0 * g1 <= 0.0 && g0 != g1).then(|| w[0].0 + (w[1].0 - w[0].0) * g0 / (g0 - g1))
        })
        .min_by(|a, b| (a - near_c).abs().total_cmp(&(b - near_c).abs()))
}

/// Liquid water at the distillate temperature (IAPWS-IF97 density, IAPWS 2008 viscosity)
/// against the oil's density at that temperature: top or bottom outlet, cut by cut, and whether
/// the oil's density crosses the water's within 10 K of the separator temperature.
pub(super) fn layering(
    r: &Resolved,
    eq: &Equilibrium,
    pressure_pa: f64,
    boiling_c: f64,
    t_c: f64,
    look_for_inversion: bool,
) -> Result<(OilPlan, SeparatorWater), Box<FieldError>> {
    let out_of_range = |_| {
        compute_error("condenser.distillate_outlet_c", t_c, "5 °C to below the boiling point", "out of range")
    };
    let rho_w = water::liquid_density_kg_per_m3(t_c + 273.15, pressure_pa).map_err(out_of_range)?;
    let mu_w = water::liquid_viscosity_pa_s(t_c + 273.15, pressure_pa).map_err(out_of_range)?;
    let rho_oil = density_at(r, 1.0, t_c);
    let collects_at = if rho_oil < rho_w { OilLayer::Top } else { OilLayer::Bottom };
    let whole = r.oil.ideal_density_kg_per_m3();
    let relatives: Vec<f64> = eq
        .plan
        .cuts
        .iter()
        .map(|c| ideal_density_kg_per_m3(&r.oil.components, &c.mass_fractions) / whole)
        .collect();
    let cut_densities: Vec<f64> = relatives.iter().map(|q| density_at(r, *q, t_c)).collect();
    let floats = cut_densities.iter().any(|d| *d < rho_w);
    let sinks = cut_densities.iter().any(|d| *d >= rho_w);
    let grid = if look_for_inversion { water_density_grid(pressure_pa, boiling_c) } else { Rc::from([]) };
    let inversion_temperature_c = crossing_c(r, 1.0, &grid, t_c);
    let near = |t: f64| (t - t_c).abs() <= INVERSION_WINDOW_K;
    let inversion_risk = inversion_temperature_c.is_some_and(near)
        || relatives.iter().any(|q| crossing_c(r, *q, &grid, t_c).is_some_and(near));
    let plan = OilPlan {
        components: eq.components.clone(),
        density_kg_per_m3: r.oil_density_kg_per_m3,
        density_at_separator_kg_per_m3: rho_oil,
        cut_densities_at_separator_kg_per_m3: cut_densities,
        collects_at,
        mixed_density: floats && sinks,
        inversion_temperature_c,
        inversion_risk,
    };
    Ok((plan, SeparatorWater { density_kg_per_m3: rho_w, viscosity_pa_s: mu_w }))
}
