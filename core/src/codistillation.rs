//! Steam distillation of an oil that does not mix with water: the boiling temperature at the
//! site, the vapour composition, the least steam that can carry the oil, and how the oil's
//! composition shifts as the light compounds leave first.
//!
//! Dalton's law across the two immiscible liquids: the mixture boils when
//! p_w*(T) + Σ x_i p_i*(T) = P, each liquid exerting its full vapour pressure whatever the
//! amount of the other (e.g. Perry's Chemical Engineers' Handbook, 8th ed., §13 "steam
//! distillation"; Coulson & Richardson vol. 2, §11.8).

use crate::numeric::find_root;
use crate::oil::Oil;
use crate::water;

/// The state of the boiling two-liquid mixture at one moment.
#[derive(Debug, Clone, PartialEq)]
pub struct Equilibrium {
    pub temperature_k: f64,
    pub water_partial_pressure_pa: f64,
    /// p_i = x_i p_i*(T), one per oil component.
    pub oil_partial_pressures_pa: Vec<f64>,
    /// Least steam per kg of oil carried over: (p_w M_w) / Σ (p_i M_i).
    pub steam_per_oil_kg_per_kg: f64,
    /// Whether each component's correlation was used inside its fitted range.
    pub in_range: Vec<bool>,
}

/// Why the mixture's boiling point could not be found.
#[derive(Debug, Clone, Copy, PartialEq)]
pub enum EquilibriumError {
    /// The pressure is outside 1 kPa to 1 MPa.
    PressureOutOfRange { pressure_pa: f64 },
    /// The oil is empty or its vapour pressure is not a finite positive number.
    InvalidOil,
}

const T_LOW_K: f64 = 274.0;

fn oil_pressure_sum_pa(oil: &Oil, gamma: &[f64], t_k: f64) -> f64 {
    let total: f64 = oil.moles.iter().sum();
    oil.components
        .iter()
        .zip(&oil.moles)
        .zip(gamma)
        .map(|((c, n), g)| g * n / total * c.vapour_pressure.pressure_pa(t_k))
        .sum()
}

/// Boiling temperature of water plus an immiscible oil at total pressure P, K.
///
/// Solves p_w*(T) + Σ x_i p_i*(T) = P, with p_w* from IAPWS-IF97 and p_i* from each compound's
/// correlation, by a bracketing root finder between 274 K and the boiling point of pure water
/// at P (where the left side exceeds P), so it always converges. The answer lies below water's
/// own boiling point: the classic lowering that makes steam distillation work.
/// Valid for 1 kPa ≤ P ≤ 1 MPa.
///
/// ```
/// use stillroom_core::{codistillation::boiling_temperature_k, compounds::find, oil::{Component, Oil}};
/// let pinene = Oil::from_mass_fractions(vec![Component::from(find("alpha-pinene").unwrap())], &[1.0]);
/// let t = boiling_temperature_k(&pinene, 101_325.0).unwrap();
/// // Water alone boils at 99.97 °C; with α-pinene the pair boils near 95.6 °C.
/// assert!(t - 273.15 > 94.5 && t - 273.15 < 96.5);
/// ```
pub fn boiling_temperature_k(oil: &Oil, pressure_pa: f64) -> Result<f64, EquilibriumError> {
    boiling_state(oil, pressure_pa).map(|(t, _)| t)
}

/// The boiling temperature and the activity coefficients there. A non-ideal oil is solved twice:
/// ideal first, then with γ taken at that temperature (γ moves little over a kelvin or two:
/// re-solving until T settles changed it by under 0.001 K on the crop oils).
fn boiling_state(oil: &Oil, pressure_pa: f64) -> Result<(f64, Vec<f64>), EquilibriumError> {
    if !(1_000.0..=1.0e6).contains(&pressure_pa) {
        return Err(EquilibriumError::PressureOutOfRange { pressure_pa });
    }
    let total_moles: f64 = oil.moles.iter().sum();
    if oil.components.is_empty() || total_moles.is_nan() || total_moles <= 0.0 {
        return Err(EquilibriumError::InvalidOil);
    }
    let t_water = water::saturation_temperature_k(pressure_pa)
        .map_err(|_| EquilibriumError::PressureOutOfRange { pressure_pa })?;
    let solve = |gamma: &[f64]| {
        let balance = |t: f64| {
            let p_w = water::saturation_pressure_pa(t).unwrap_or(f64::NAN);
            p_w + oil_pressure_sum_pa(oil, gamma, t) - pressure_pa
        };
        find_root(balance, T_LOW_K, t_water, 1e-7).map_err(|_| EquilibriumError::InvalidOil)
    };
    let ideal = vec![1.0; oil.moles.len()];
    let t_ideal = solve(&ideal)?;
    if oil.activity.is_none() {
        return Ok((t_ideal, ideal));
    }
    let gamma = oil.activity_coefficients(t_ideal);
    Ok((solve(&gamma)?, gamma))
}

/// The full equilibrium at total pressure P: temperature, partial pressures and the least
/// steam per kg of oil.
///
/// m_w / m_o = (p_w M_w) / Σ (p_i M_i): the vapour's mass ratio, since in an ideal-gas mixture
/// the moles of each species are in proportion to its partial pressure (Dalton's law).
/// Source: the steam-distillation mass ratio as in Perry's Handbook, 8th ed., §13.
/// Valid for 1 kPa ≤ P ≤ 1 MPa.
///
/// ```
/// use stillroom_core::{codistillation::equilibrium, compounds::find, oil::{Component, Oil}};
/// let eugenol = Oil::from_mass_fractions(vec![Component::from(find("eugenol").unwrap())], &[1.0]);
/// let e = equilibrium(&eugenol, 101_325.0).unwrap();
/// // Eugenol boils high (527 K): it needs tens of kg of steam per kg (about 25 at 1 atm).
/// assert!(e.steam_per_oil_kg_per_kg > 20.0 && e.steam_per_oil_kg_per_kg < 30.0);
/// ```
pub fn equilibrium(oil: &Oil, pressure_pa: f64) -> Result<Equilibrium, EquilibriumError> {
    let (t, gamma) = boiling_state(oil, pressure_pa)?;
    let p_w = water::saturation_pressure_pa(t).map_err(|_| EquilibriumError::InvalidOil)?;
    let p_oil = oil.partial_pressures_with_pa(&gamma, t);
    let oil_mass_term: f64 =
        oil.components.iter().zip(&p_oil).map(|(c, p)| p * c.molar_mass_kg_per_mol).sum();
    Ok(Equilibrium {
        temperature_k: t,
        water_partial_pressure_pa: p_w,
        steam_per_oil_kg_per_kg: p_w * water::MOLAR_MASS_KG_PER_MOL / oil_mass_term,
        in_range: oil.components.iter().map(|c| c.vapour_pressure.in_range(t)).collect(),
        oil_partial_pressures_pa: p_oil,
    })
}

/// One cut of the distillate while the oil is carried over.
#[derive(Debug, Clone, PartialEq, serde::Serialize, serde::Deserialize)]
#[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
pub struct Cut {
    /// Share of the initial oil already carried over when the cut starts and ends.
    pub from_fraction: f64,
    pub to_fraction: f64,
    /// Least steam for this cut, per kg of initial oil.
    pub steam_kg_per_kg_oil: f64,
    /// Boiling temperature at the end of the cut.
    pub end_temperature_k: f64,
    /// Composition of the oil in this cut, by mass, one per component.
    pub mass_fractions: Vec<f64>,
}

/// The course of an ideal run: the oil carried over as steam passes.
#[derive(Debug, Clone, PartialEq)]
pub struct Depletion {
    pub cuts: Vec<Cut>,
    /// Least cumulative steam per kg of initial oil to carry over `target_fraction` of it.
    pub steam_to_target_kg_per_kg_oil: f64,
    /// Least cumulative steam per kg of initial oil to carry over all of it (99.9 %).
    pub steam_to_all_kg_per_kg_oil: f64,
    pub target_fraction: f64,
    /// Whether any component's correlation left its range during the run.
    pub any_out_of_range: bool,
}

/// Follows the oil through an ideal run in which every bit of steam leaves saturated with oil
/// vapour, so the light compounds go first and the boiling temperature climbs.
///
/// For component moles n_i: dn_i/dm_w = (p_i / p_w) / M_w, with p_i = x_i p_i*(T) and T from
/// [`boiling_temperature_k`] at each state (Rayleigh-type batch depletion, as for a differential
/// distillation; McCabe, Smith & Harriott, *Unit Operations*, §21). Integrated with the
/// midpoint method in steps of 1 % of the initial oil mass, the oil mass removed being the
/// independent variable (so each step removes exactly 1 %), on to 99.9 % of the oil; the cuts
/// cover the way to `target_fraction` (capped at 0.999).
///
/// ```
/// use stillroom_core::{codistillation::{deplete, equilibrium}, compounds::find, oil::{Component, Oil}};
/// let pure = Oil::from_mass_fractions(vec![Component::from(find("alpha-pinene").unwrap())], &[1.0]);
/// let d = deplete(&pure, 101_325.0, 0.9, 10).unwrap();
/// // A pure oil keeps its composition, so the steam is the single-point ratio times the share.
/// let r = equilibrium(&pure, 101_325.0).unwrap().steam_per_oil_kg_per_kg;
/// assert!((d.steam_to_target_kg_per_kg_oil - 0.9 * r).abs() < 1e-6 * r);
/// ```
pub fn deplete(
    oil: &Oil,
    pressure_pa: f64,
    target_fraction: f64,
    cut_count: usize,
) -> Result<Depletion, EquilibriumError> {
    let target = target_fraction.clamp(0.0, 0.999);
    let cut_count = cut_count.max(1);
    let mut state = Oil::from_mass_fractions(oil.components.clone(), &oil.mass_fractions());
    state.activity = oil.activity.clone();
    let m_w = water::MOLAR_MASS_KG_PER_MOL;
    let step: f64 = 0.01;
    let n = oil.components.len();

    // Rates per kg of oil removed: dn_i/dm_oil and dm_w/dm_oil.
    let rates = |s: &Oil| -> Result<(Vec<f64>, f64, bool), EquilibriumError> {
        let e = equilibrium(s, pressure_pa)?;
        let mass_term: f64 = s
            .components
            .iter()
            .zip(&e.oil_partial_pressures_pa)
            .map(|(c, p)| p * c.molar_mass_kg_per_mol)
            .sum();
        let dn: Vec<f64> = e.oil_partial_pressures_pa.iter().map(|p| p / mass_term).collect();
        let steam = e.water_partial_pressure_pa * m_w / mass_term;
        Ok((dn, steam, e.in_range.iter().all(|&r| r)))
    };

    let mut removed = 0.0;
    let mut steam_total = 0.0;
    let mut any_out_of_range = false;
    let mut cuts = Vec::with_capacity(cut_count);
    let cut_width = target / cut_count as f64;
    let mut cut_start = 0.0;
    let mut cut_steam = 0.0;
    let mut cut_mass = vec![0.0; n];
    let mut last_t = 0.0;

    let mut steam_to_target = 0.0;
    let all = 0.999;
    while removed < all - 1e-12 {
        let before_target = removed < target - 1e-12;
        let h = if before_target { step.min(target - removed) } else { step.min(all - removed) };
        let (dn0, _, ok0) = rates(&state)?;
        let mut mid = state.clone();
        for (m, d) in mid.moles.iter_mut().zip(&dn0) {
            *m = (*m - 0.5 * h * d).max(0.0);
        }
        let (dn, steam_rate, ok1) = rates(&mid)?;
        any_out_of_range |= !(ok0 && ok1);
        for (i, (m, d)) in state.moles.iter_mut().zip(&dn).enumerate() {
            let taken = (h * d).min(*m);
            *m -= taken;
            cut_mass[i] += taken * oil.components[i].molar_mass_kg_per_mol;
        }
        removed += h;
        steam_total += h * steam_rate;
        if !before_target {
            if state.moles.iter().sum::<f64>() <= 0.0 {
                break;
            }
            continue;
        }
        steam_to_target = steam_total;
        cut_steam += h * steam_rate;
        let cut_end = cut_start + cut_width;
        if removed >= cut_end - 1e-9 || removed >= target - 1e-12 {
            last_t = equilibrium_temperature_or(&state, pressure_pa, last_t);
            let total: f64 = cut_mass.iter().sum();
            cuts.push(Cut {
                from_fraction: cut_start,
                to_fraction: removed,
                steam_kg_per_kg_oil: cut_steam,
                end_temperature_k: last_t,
                mass_fractions: cut_mass.iter().map(|m| m / total).collect(),
            });
            cut_start = removed;
            cut_steam = 0.0;
            cut_mass = vec![0.0; n];
        }
        if state.moles.iter().sum::<f64>() <= 0.0 {
            break;
        }
    }
    Ok(Depletion {
        cuts,
        steam_to_target_kg_per_kg_oil: steam_to_target,
        steam_to_all_kg_per_kg_oil: steam_total,
        target_fraction: target,
        any_out_of_range,
    })
}

fn equilibrium_temperature_or(oil: &Oil, pressure_pa: f64, fallback: f64) -> f64 {
    boiling_temperature_k(oil, pressure_pa).unwrap_or(fallback)
}
