//! The heat-balance check: the run stepped through in time, sink by sink, from the
//! physical state (boiler water warming with IF97's c_p, charge and metal warming with their own
//! heat capacities, the boiler emptying and being topped up over the run), and
//! compared with the closed-form time line and heat sum. It shares no sum with them, so a term
//! dropped from or doubled in the closed form shows up here.

use super::Resolved;
use super::equilibrium::Equilibrium;
use super::knobs::Knobs;
use super::site::Site;
use super::timeline::{self, Timeline};
use crate::scenario::Scenario;
use crate::water;
use std::cell::RefCell;

/// Steps across each phase: enough for the stepped and closed forms to agree within 1e-4.
const STEPS: usize = 400;

/// What the stepped run finds.
#[derive(Debug, Clone, Copy, PartialEq)]
pub(super) struct SteppedRun {
    pub time_to_boil_s: f64,
    pub time_to_first_drop_s: f64,
    pub total_time_s: f64,
    /// Heat the burner delivered to the water over the stepped run, J.
    pub heat_delivered_j: f64,
}

/// The stepped boils' heat capacities kept, by the bits of (feed °C, boil °C, pressure): the
/// newest first, at most [`KEPT_BOILS`].
type KeptBoils = Vec<((u64, u64, u64), Vec<f64>)>;

/// A plan steps two boils (the fill and the feed, from the same temperature, and the returned
/// distillate); a few more cover the page's alternating plans.
const KEPT_BOILS: usize = 4;

thread_local! {
    static KEPT: RefCell<KeptBoils> = const { RefCell::new(Vec::new()) };
}

/// IF97 liquid c_p at the midpoint of each step from `feed_c` to `boil_c`. The page plans again
/// on every keystroke and most edits (the charge, the fill, the burner) leave the temperatures
/// and the pressure as they were, while these IF97 calls (400 a boil, three boils a plan) are
/// about a third of a plan: the last few are kept. The same inputs (compared bit for bit) give the same numbers a fresh call
/// gives. One store per thread, so tests on parallel threads never share one.
fn boil_heat_capacities(feed_c: f64, boil_c: f64, pressure_pa: f64) -> Vec<f64> {
    let key = (feed_c.to_bits(), boil_c.to_bits(), pressure_pa.to_bits());
    if let Some(found) = KEPT.with_borrow(|k| k.iter().find(|(k, _)| *k == key).map(|(_, cp)| cp.clone())) {
        return found;
    }
    let d_t = (boil_c - feed_c) / STEPS as f64;
    let cp: Vec<f64> = (0..STEPS)
        .map(|i| {
            let t_k = feed_c + (i as f64 + 0.5) * d_t + 273.15;
            water::liquid_heat_capacity_j_per_kg_k(t_k.min(boil_c + 273.15 - 0.01), pressure_pa)
                .unwrap_or(4200.0)
        })
        .collect();
    KEPT.with_borrow_mut(|k| {
        k.insert(0, (key, cp.clone()));
        k.truncate(KEPT_BOILS);
    });
    cp
}

/// Time to bring the boiler's fill from the feed temperature to the boil, by integrating
/// dt = m c_p(T) dT / P (midpoint rule, IF97 liquid c_p) rather than by the enthalpy difference.
fn stepped_boil_s(m_kg: f64, feed_c: f64, boil_c: f64, power_w: f64, pressure_pa: f64) -> f64 {
    let d_t = (boil_c - feed_c) / STEPS as f64;
    boil_heat_capacities(feed_c, boil_c, pressure_pa).iter().map(|cp| m_kg * cp * d_t / power_w).sum()
}

/// Steam condensing on the charge and then on the metal until both reach the co-distillation
/// temperature, each body taking m c (T_cd − T₀) at the boiler's power less the wall's loss.
fn stepped_warm_up_s(s: &Scenario, r: &Resolved, t_cd_c: f64, net_w: f64) -> f64 {
    let bodies = [
        (s.charge.plant_mass_kg * r.charge_heat_capacity_j_per_kg_k, r.charge_temperature_c),
        (s.still.metal_mass_kg * s.still.metal.heat_capacity_j_per_kg_k(), s.site.ambient_temperature_c),
    ];
    bodies
        .iter()
        .map(|(capacity_j_per_k, start_c)| capacity_j_per_k * (t_cd_c - start_c).max(0.0) / net_w)
        .sum()
}

/// The run stepped through: boil, warm-up, then steaming for the run's length (from the
/// release-and-carry model: the kinetics are checked elsewhere, this checks the heat) while
/// the boiler empties; once its usable water is gone each further kg of steam first needs a kg
/// of feed brought to the boil.
pub(super) fn stepped_run(
    s: &Scenario,
    r: &Resolved,
    site: &Site,
    eq: &Equilibrium,
    knobs: &Knobs,
    run_s: f64,
) -> SteppedRun {
    let h_fg = site.latent_heat_j_per_kg;
    let (power_w, steam_kg_per_s) = timeline::heat_source(s, r, h_fg);
    let t_cd_c = eq.temperature_k - 273.15;
    let wall_w = timeline::wall_loss_w(s, r, knobs, t_cd_c);
    let boil_c = site.plan.water_boiling_point_c;
    let fill = s.boiler.usable_water_kg;
    let time_to_boil_s = stepped_boil_s(fill, r.feed_temperature_c, boil_c, power_w, site.pressure_pa);
    let warm_up_s = stepped_warm_up_s(s, r, t_cd_c, power_w - wall_w);
    // Every kg evaporated beyond the fill (and the returned distillate) is fed cold and reheated.
    let returned_kg = if s.run.cohobation {
        ((power_w - wall_w) / h_fg * (run_s - s.separator.residence_time_s)).max(0.0)
    } else {
        0.0
    };
    let steaming_s = warm_up_s + run_s;
    let mut boiler_kg = fill + returned_kg;
    let mut topping_s = 0.0;
    let dt = steaming_s / STEPS as f64;
    let feed_time_per_kg = stepped_boil_s(1.0, r.feed_temperature_c, boil_c, power_w, site.pressure_pa);
    let returned_time_per_kg = stepped_boil_s(1.0, r.distillate_outlet_c, boil_c, power_w, site.pressure_pa);
    for _ in 0..STEPS {
        boiler_kg -= steam_kg_per_s * dt;
        if boiler_kg < 0.0 {
            topping_s += -boiler_kg * feed_time_per_kg;
            boiler_kg = 0.0;
        }
    }
    topping_s += returned_kg * returned_time_per_kg;
    let total_time_s = time_to_boil_s + steaming_s + topping_s;
    SteppedRun {
        time_to_boil_s,
        time_to_first_drop_s: time_to_boil_s + warm_up_s,
        total_time_s,
        heat_delivered_j: power_w * total_time_s,
    }
}

/// Largest relative gap between the stepped run and the closed form: times to boil, to the
/// first drop and to the end, and the heat delivered against the sum of the sinks.
pub(super) fn gap(stepped: &SteppedRun, tl: &Timeline, useful_heat_j: f64) -> f64 {
    let rel = |a: f64, b: f64| (a - b).abs() / b.abs().max(1e-30);
    rel(stepped.time_to_boil_s, tl.plan.time_to_boil_s)
        .max(rel(stepped.time_to_first_drop_s, tl.plan.time_to_first_drop_s))
        .max(rel(stepped.total_time_s, tl.plan.total_time_s))
        .max(rel(stepped.heat_delivered_j, useful_heat_j))
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::crops::CROPS;
    use crate::plan::{energy, equilibrium, site, validate};

    struct Parts {
        tl: Timeline,
        stepped: SteppedRun,
        energy: crate::plan::EnergyPlan,
    }

    fn parts(s: &Scenario) -> Parts {
        let r = validate(s).unwrap();
        let site = site::site(&r).unwrap();
        let eq = equilibrium::equilibrium(s, &r, &site).unwrap();
        let knobs = Knobs::CENTRAL;
        let tl = timeline::timeline(s, &r, &site, &eq, &knobs).unwrap();
        let stepped = stepped_run(s, &r, &site, &eq, &knobs, tl.plan.time_after_first_drop_s);
        let energy = energy::energy(s, &r, site.latent_heat_j_per_kg, &tl, 1e-4);
        Parts { tl, stepped, energy }
    }

    /// A scenario with every sink present: a small boiler that needs topping up, a still with
    /// walls and metal.
    fn every_sink() -> Scenario {
        let mut s = Scenario::default();
        s.boiler.usable_water_kg = 4.0;
        s
    }

    #[test]
    fn stepped_and_closed_forms_agree_for_every_crop() {
        for crop in CROPS {
            for cohobation in [false, true] {
                let mut s = every_sink();
                s.charge.crop = Some(crop.id.to_string());
                s.run.cohobation = cohobation;
                let p = parts(&s);
                let gap = gap(&p.stepped, &p.tl, p.energy.useful_heat_j);
                assert!(gap < 1e-4, "{} (cohobation {cohobation}): {gap}", crop.id);
            }
        }
    }

    #[test]
    fn a_sink_dropped_from_the_heat_sum_is_caught() {
        let p = parts(&every_sink());
        let e = &p.energy;
        let sinks = [
            ("boiler water", e.boiler_water_heating_j),
            ("charge", e.charge_heating_j),
            ("still", e.still_heating_j),
            ("wall", e.wall_loss_j),
            ("steam", e.steam_to_condenser_j),
            ("make-up", e.makeup_water_heating_j),
        ];
        for (name, sink) in sinks {
            assert!(sink > 0.0, "{name} is absent from the test scenario");
            let gap = gap(&p.stepped, &p.tl, e.useful_heat_j - sink);
            assert!(gap > 1e-3, "dropping the {name} term went unnoticed: {gap}");
        }
    }

    #[test]
    fn a_phase_dropped_from_the_time_line_is_caught() {
        let mut p = parts(&every_sink());
        let net_w = p.tl.plan.useful_heat_w - p.tl.wall_loss_w;
        let still_s = p.tl.still_heating_j / net_w;
        p.tl.plan.time_to_first_drop_s -= still_s;
        p.tl.plan.total_time_s -= still_s;
        assert!(gap(&p.stepped, &p.tl, p.energy.useful_heat_j) > 1e-3);
    }
}
