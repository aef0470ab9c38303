//! Ranges: each headline answer's likely low and high, from the uncertainties the tables carry
//! and the grower's own entries, by running the same stages with one input at a time at its low
//! and its high end and combining the swings.
//!
//! Each input's low and high are read as its 10th and 90th percentiles; the answer's low and
//! high are central ∓ √Σ(swing_i²), the swings taken downward and upward separately: the law of
//! propagation of uncertainty for independent inputs (JCGM 100:2008, *Guide to the expression
//! of uncertainty in measurement*, §5.1.2), applied to P10-P90 half-widths. Valid while each
//! answer is near-linear in each input over its range; it ignores correlations between inputs.

use super::equilibrium::Equilibrium;
use super::knobs::Knobs;
use super::site::Site;
use super::{FieldError, Range, Resolved, Uncertainty};
use super::{condenser, energy, layering, oil_yield, separator, timeline};
use crate::compounds;
use crate::recovery::{KINETIC_STEAM_EXPONENT, VAPORISATION_EFFICIENCY};
use crate::scenario::Scenario;

/// 1σ to the 10th/90th percentile of a normal distribution (z = 1.2816).
const SIGMA_TO_P90: f64 = 1.2816;
/// Spread of a typed oil content, as a fraction either way: a grower's figure from an earlier
/// run or a lab is still a field estimate (judgement, common practice, no source).
const TYPED_CONTENT_SPREAD: f64 = 0.25;
/// Condenser U-values: 570-1200 W/(m² K) about 800 for a coil in still water (Engineering
/// ToolBox tables; computed 950-1220 with ht 1.2.0).
const CONDENSER_U_FACTORS: (f64, f64) = (0.7, 1.5);
/// Bare still walls: 6.5-13.3 W/(m² K) about 10, from the metal's emissivity (computed with ht
/// 1.2.0, natural convection and radiation).
const WALL_U_FACTORS: (f64, f64) = (0.65, 1.33);
/// Solubilities of oil compounds in water, when the table gives no uncertainty: a factor of 1.5
/// either way (judgement; many are single measurements at 25 °C).
const SOLUBILITY_FACTOR: f64 = 1.5;

/// The answers that carry a range.
#[derive(Debug, Clone, Copy, PartialEq)]
pub(super) struct Headline {
    pub steam_kg: f64,
    pub run_time_s: f64,
    pub total_time_s: f64,
    pub fuel_amount: f64,
    pub cooling_water_kg: f64,
    pub water_total_kg: f64,
    pub oil_kg: f64,
    pub separator_volume_m3: f64,
}

impl Headline {
    fn values(&self) -> [f64; 8] {
        [
            self.steam_kg,
            self.run_time_s,
            self.total_time_s,
            self.fuel_amount,
            self.cooling_water_kg,
            self.water_total_kg,
            self.oil_kg,
            self.separator_volume_m3,
        ]
    }
}

/// One answer's range and the input that moves it most.
#[derive(Debug, Clone, PartialEq)]
pub(super) struct Spread {
    pub range: Range,
    pub mostly_from: Uncertainty,
}

/// The stages after the equilibrium, run again for one set of inputs: the same functions the
/// plan runs, without the parts no headline reads (the density-inversion search).
pub(super) fn downstream(
    s: &Scenario,
    r: &Resolved,
    site: &Site,
    eq: &Equilibrium,
    knobs: &Knobs,
) -> Result<Headline, Box<FieldError>> {
    let mut tl = timeline::timeline(s, r, site, eq, knobs)?;
    let rate = tl.plan.distillate_steam_rate_kg_per_s;
    let cond = condenser::condenser(s, r, site, rate, knobs, tl.plan.time_after_first_drop_s)?;
    let boiling_c = site.plan.water_boiling_point_c;
    let (oil, water) =
        layering::layering(r, eq, site.pressure_pa, boiling_c, cond.distillate_outlet_c, false)?;
    tl.plan.hydrosol_volume_m3 = (tl.plan.distillate_steam_kg - tl.returned_kg) / water.density_kg_per_m3;
    let sep = separator::separator(s, &water, rate, &oil, cond.distillate_outlet_c);
    let balance = oil_yield::oil_balance(s, r, eq, &tl, knobs);
    let water_use = oil_yield::water_use(s, &tl, cond.plan.cooling_water_per_run_kg);
    let fuel = energy::energy(s, r, site.latent_heat_j_per_kg, &tl, 0.0).fuel_amount;
    Ok(Headline {
        steam_kg: tl.plan.boiler_water_evaporated_kg,
        run_time_s: tl.plan.time_after_first_drop_s,
        total_time_s: tl.plan.total_time_s,
        fuel_amount: fuel,
        cooling_water_kg: water_use.cooling_water_kg,
        water_total_kg: water_use.total_kg,
        oil_kg: balance.separable_kg,
        separator_volume_m3: sep.volume_m3,
    })
}

/// The oil's vapour-pressure uncertainty at P90: the mass-weighted 1σ of its compounds, taken as
/// fully correlated (they share methods and sources), times z.
fn vapour_pressure_swing(r: &Resolved) -> f64 {
    let w = r.oil.mass_fractions();
    let sigma: f64 =
        r.oil.components.iter().zip(&w).map(|(c, w)| w * c.vapour_pressure.relative_uncertainty).sum();
    (SIGMA_TO_P90 * sigma).min(0.9)
}

/// The oil's solubility swing: the library's own uncertainty where it has one, else a factor.
fn solubility_factors(r: &Resolved) -> (f64, f64) {
    let w = r.oil.mass_fractions();
    let sigma: f64 = r
        .oil
        .components
        .iter()
        .zip(&w)
        .map(|(c, w)| {
            w * compounds::find(&c.id)
                .map_or(SOLUBILITY_FACTOR - 1.0, |k| k.water_solubility_relative_uncertainty)
        })
        .sum();
    let up = 1.0 + (SIGMA_TO_P90 * sigma).max(0.0);
    (1.0 / up, up)
}

/// Low and high of every uncertain input, as changed inputs for the downstream stages.
fn swings(s: &Scenario, r: &Resolved) -> Vec<(Uncertainty, [(Resolved, Knobs); 2])> {
    let k0 = Knobs::CENTRAL;
    let with_r = |f: &dyn Fn(&mut Resolved, bool)| {
        [false, true].map(|high| {
            let mut r2 = r.clone();
            f(&mut r2, high);
            (r2, k0)
        })
    };
    let with_k = |f: &dyn Fn(&mut Knobs, bool)| {
        [false, true].map(|high| {
            let mut k = k0;
            f(&mut k, high);
            (r.clone(), k)
        })
    };
    let (c_lo, c_hi) = match r.oil_content_spread {
        (lo, hi) if hi > lo => (lo, hi),
        _ => (
            r.oil_content_fraction * (1.0 - TYPED_CONTENT_SPREAD),
            r.oil_content_fraction * (1.0 + TYPED_CONTENT_SPREAD),
        ),
    };
    let (k_lo, k_hi) = r.rate_constant_spread;
    let appliance = s.boiler.appliance.unwrap_or(s.boiler.fuel.usual_appliance()).data();
    let (e_lo, e_hi) = match s.boiler.efficiency {
        None => (appliance.low_efficiency, appliance.high_efficiency),
        Some(e) => (e * 0.9, (e * 1.1).min(1.0)),
    };
    let vp = vapour_pressure_swing(r);
    let (sol_lo, sol_hi) = solubility_factors(r);
    vec![
        (Uncertainty::OilContent, with_r(&|r, h| r.oil_content_fraction = if h { c_hi } else { c_lo })),
        (Uncertainty::RateConstant, with_r(&|r, h| r.rate_constant_per_s = if h { k_hi } else { k_lo })),
        (Uncertainty::BoilerEfficiency, with_r(&|r, h| r.efficiency = if h { e_hi } else { e_lo })),
        (
            Uncertainty::VapourPressures,
            with_k(&|k, h| k.vapour_pressure_factor = if h { 1.0 + vp } else { 1.0 - vp }),
        ),
        (Uncertainty::Solubilities, with_k(&|k, h| k.solubility_factor = if h { sol_hi } else { sol_lo })),
        (
            Uncertainty::VaporisationEfficiency,
            with_k(&|k, h| {
                k.vaporisation_efficiency =
                    if h { VAPORISATION_EFFICIENCY.2 } else { VAPORISATION_EFFICIENCY.0 }
            }),
        ),
        (
            Uncertainty::SteamDependence,
            with_k(&|k, h| {
                k.kinetic_exponent = if h { KINETIC_STEAM_EXPONENT.2 } else { KINETIC_STEAM_EXPONENT.0 }
            }),
        ),
        (
            Uncertainty::CondenserU,
            with_k(&|k, h| {
                k.condenser_u_factor = if h { CONDENSER_U_FACTORS.1 } else { CONDENSER_U_FACTORS.0 }
            }),
        ),
        (
            Uncertainty::WallU,
            with_k(&|k, h| k.wall_u_factor = if h { WALL_U_FACTORS.1 } else { WALL_U_FACTORS.0 }),
        ),
    ]
}

/// Each headline's range and its biggest contributor. An input end whose plan fails (e.g. a
/// boiler too small at its lowest efficiency) is left out of the swing and counted in `failed`.
/// Without `swept`, no input is swung and every range is its central value.
pub(super) fn ranges(
    s: &Scenario,
    r: &Resolved,
    site: &Site,
    eq: &Equilibrium,
    central: &Headline,
    swept: bool,
) -> (Vec<Spread>, u32) {
    let c = central.values();
    let mut down = [0.0f64; 8];
    let mut up = [0.0f64; 8];
    let mut biggest = [(0.0f64, Uncertainty::OilContent); 8];
    let mut failed = 0;
    let swung = if swept { swings(s, r) } else { Vec::new() };
    for (which, ends) in swung {
        for (r2, k) in &ends {
            let Ok(h) = downstream(s, r2, site, eq, k) else {
                failed += 1;
                continue;
            };
            for (i, v) in h.values().iter().enumerate() {
                let d = v - c[i];
                if d < 0.0 {
                    down[i] += d * d
                } else {
                    up[i] += d * d
                }
                if d.abs() > biggest[i].0 {
                    biggest[i] = (d.abs(), which);
                }
            }
        }
    }
    let spreads = (0..8)
        .map(|i| Spread {
            range: Range { low: (c[i] - down[i].sqrt()).max(0.0), central: c[i], high: c[i] + up[i].sqrt() },
            mostly_from: biggest[i].1,
        })
        .collect();
    (spreads, failed)
}
