//! Equilibrium and depletion: where oil and water boil together, what the first
//! vapour carries, and how the oil's make-up shifts as the light compounds leave.

use super::site::Site;
use super::{CodistillationPlan, ComponentShare, FieldError, Resolved, compute_error};
use crate::codistillation::{self, Depletion, Equilibrium as PhaseEquilibrium};
use crate::oil::Oil;
use crate::scenario::Scenario;
use std::cell::RefCell;

/// Cut width when the oil is followed through the run, in % of the oil.
const DEPLETION_STEPS_PER_10_PERCENT: usize = 10;

/// The equilibrium as later stages need it.
pub(super) struct Equilibrium {
    pub plan: CodistillationPlan,
    pub components: Vec<ComponentShare>,
    pub temperature_k: f64,
    pub target_fraction: f64,
    /// Least steam to the target per kg of oil in the charge.
    pub steam_to_target_kg_per_kg_oil: f64,
    /// Whether some late cut leaves a correlation's fitted range.
    pub late_out_of_range: bool,
}

/// Dalton + Raoult boiling temperature, the first vapour and the depletion to the target
/// (equations in [`crate::codistillation`]).
pub(super) fn equilibrium(s: &Scenario, r: &Resolved, site: &Site) -> Result<Equilibrium, Box<FieldError>> {
    let p = site.pressure_pa;
    let eq = codistillation::equilibrium(&r.oil, p).map_err(|_| {
        compute_error("oil.composition", 0.0, "a known oil", "the oil's boiling point could not be found")
    })?;
    let target = s.run.target_recovery_percent / 100.0;
    let depletion = kept_depletion(&r.oil, p, target).ok_or_else(|| {
        compute_error("oil.composition", 0.0, "a known oil", "the oil could not be followed through the run")
    })?;
    let oil_in_charge_kg = s.charge.plant_mass_kg * r.oil_content_fraction;
    let components = component_shares(r, &eq);
    let t_c = eq.temperature_k - 273.15;
    let plan = CodistillationPlan {
        temperature_c: t_c,
        lowering_k: site.plan.water_boiling_point_c - t_c,
        water_partial_pressure_pa: eq.water_partial_pressure_pa,
        min_steam_per_kg_oil: eq.steam_per_oil_kg_per_kg,
        min_steam_whole_charge_kg: oil_in_charge_kg * depletion.steam_to_all_kg_per_kg_oil,
        min_steam_to_target_kg: oil_in_charge_kg * depletion.steam_to_target_kg_per_kg_oil,
        cuts: depletion.cuts,
    };
    Ok(Equilibrium {
        plan,
        components,
        temperature_k: eq.temperature_k,
        target_fraction: target,
        steam_to_target_kg_per_kg_oil: depletion.steam_to_target_kg_per_kg_oil,
        late_out_of_range: depletion.any_out_of_range,
    })
}

/// The depletions kept, by (oil, bits of pressure and target): the newest first, at most
/// [`KEPT_DEPLETIONS`].
type KeptDepletions = Vec<((Oil, u64, u64), Depletion)>;

/// The page plans one scenario per keystroke; two cover an edit and its undo.
const KEPT_DEPLETIONS: usize = 2;

thread_local! {
    static KEPT: RefCell<KeptDepletions> = const { RefCell::new(Vec::new()) };
}

/// The oil followed through the run ([`codistillation::deplete`]), about 200 boiling-point
/// solves and two thirds of a plan. It depends on the oil, the pressure and the target only,
/// not on the charge's mass, the still, the heat or the condenser, which are what most edits
/// change: the last few are kept. Pressure and target are compared bit for bit; the oil by
/// value (its names, groups and numbers; equal numbers can differ only in a zero's sign, and a
/// zero share or coefficient adds nothing to the depletion's sums either way). The same inputs
/// give the numbers a fresh depletion gives. One store per thread, so tests on parallel threads
/// never share one. `None` when the oil cannot be followed (not kept: it is planned again).
fn kept_depletion(oil: &Oil, pressure_pa: f64, target: f64) -> Option<Depletion> {
    let found = KEPT.with_borrow(|k| {
        k.iter()
            .find(|((o, p, t), _)| *p == pressure_pa.to_bits() && *t == target.to_bits() && o == oil)
            .map(|(_, d)| d.clone())
    });
    if found.is_some() {
        return found;
    }
    let depletion = codistillation::deplete(oil, pressure_pa, target, DEPLETION_STEPS_PER_10_PERCENT).ok()?;
    KEPT.with_borrow_mut(|k| {
        k.insert(0, ((oil.clone(), pressure_pa.to_bits(), target.to_bits()), depletion.clone()));
        k.truncate(KEPT_DEPLETIONS);
    });
    Some(depletion)
}

/// Each compound's share of the oil and of its first vapour (mass share of p_i M_i).
fn component_shares(r: &Resolved, eq: &PhaseEquilibrium) -> Vec<ComponentShare> {
    let mass_fractions = r.oil.mass_fractions();
    let mole_fractions = r.oil.mole_fractions();
    let vapour_mass: Vec<f64> = r
        .oil
        .components
        .iter()
        .zip(&eq.oil_partial_pressures_pa)
        .map(|(c, p_i)| p_i * c.molar_mass_kg_per_mol)
        .collect();
    let vapour_total: f64 = vapour_mass.iter().sum();
    r.oil
        .components
        .iter()
        .enumerate()
        .map(|(i, c)| ComponentShare {
            id: c.id.clone(),
            name: c.name.clone(),
            mass_fraction: mass_fractions[i],
            mole_fraction: mole_fractions[i],
            first_vapour_mass_fraction: vapour_mass[i] / vapour_total,
            vapour_pressure_at_boiling_pa: c.vapour_pressure.pressure_pa(eq.temperature_k),
            correlation_in_range: eq.in_range[i],
            confidence: r.confidences[i],
        })
        .collect()
}
