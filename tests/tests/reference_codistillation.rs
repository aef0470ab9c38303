//! Steam distillation of single compounds and mixtures against computed equilibrium values.

use stillroom_core::codistillation::{deplete, equilibrium};
use stillroom_core::compounds::find;
use stillroom_core::oil::{Component, Oil};

fn pure(id: &str) -> Oil {
    Oil::from_mass_fractions(vec![Component::from(find(id).unwrap())], &[1.0])
}

#[test]
fn single_compounds_at_one_atmosphere() {
    // Ideal immiscible steam distillation of pure compounds at 101.325 kPa, computed with
    // thermo 0.6.1 (the same published correlations) and CoolProp 8.0.0 water:
    // (id, T where the mixture boils °C, least water:oil kg/kg printed to 0.1).
    let cases = [
        ("alpha-pinene", 95.19, 0.7),
        ("1-8-cineole", 97.39, 1.2),
        ("p-cymene", 97.57, 1.5),
        ("linalyl-acetate", 99.54, 5.9),
        ("estragole", 99.48, 6.9),
        ("thymol", 99.72, 13.0),
        ("eugenol", 99.85, 25.3),
    ];
    for (id, t_c, ratio) in cases {
        let e = equilibrium(&pure(id), 101_325.0).unwrap();
        let got_t = e.temperature_k - 273.15;
        assert!((got_t - t_c).abs() <= 0.05, "{id}: boils at {got_t:.3} °C, thermo {t_c}");
        assert!(
            (e.steam_per_oil_kg_per_kg - ratio).abs() <= 0.05 + 0.01 * ratio,
            "{id}: {:.3} kg/kg, thermo {ratio}",
            e.steam_per_oil_kg_per_kg
        );
    }
}

#[test]
fn dalton_sum_closes_at_the_boiling_point() {
    // Definition of the co-distillation temperature: p_w + Σ p_i = P (Dalton's law).
    let oil = Oil::from_mass_fractions(
        vec![Component::from(find("linalool").unwrap()), Component::from(find("linalyl-acetate").unwrap())],
        &[0.4, 0.6],
    );
    for p in [60_000.0, 80_000.0, 101_325.0] {
        let e = equilibrium(&oil, p).unwrap();
        let sum = e.water_partial_pressure_pa + e.oil_partial_pressures_pa.iter().sum::<f64>();
        assert!((sum - p).abs() < 1e-3, "{sum} vs {p}");
    }
}

#[test]
fn light_compounds_leave_first() {
    // Rayleigh-type depletion: the more volatile compound is enriched in the first cut and
    // depleted in the last (McCabe, Smith & Harriott, Unit Operations, differential distillation).
    let oil = Oil::from_mass_fractions(
        vec![Component::from(find("alpha-pinene").unwrap()), Component::from(find("eugenol").unwrap())],
        &[0.5, 0.5],
    );
    let d = deplete(&oil, 101_325.0, 0.95, 10).unwrap();
    let first = &d.cuts[0].mass_fractions;
    let last = &d.cuts.last().unwrap().mass_fractions;
    assert!(first[0] > 0.9, "first cut {first:?}");
    assert!(last[1] > 0.9, "last cut {last:?}");
    // Temperature climbs toward eugenol's co-distillation point as pinene runs out.
    assert!(d.cuts.last().unwrap().end_temperature_k > d.cuts[0].end_temperature_k);
    let total_cut_steam: f64 = d.cuts.iter().map(|c| c.steam_kg_per_kg_oil).sum();
    assert!((total_cut_steam - d.steam_to_target_kg_per_kg_oil).abs() < 1e-9);
}

#[test]
fn steam_distillation_rule_of_thumb_for_high_boilers() {
    // Clove bud: eugenol's least steam 25.3 kg/kg times 16 % oil gives >= 4.05 kg steam per kg
    // buds (computed with thermo 0.6.1 + CoolProp 8.0.0).
    let e = equilibrium(&pure("eugenol"), 101_325.0).unwrap();
    let per_kg_buds = e.steam_per_oil_kg_per_kg * 0.16;
    assert!((per_kg_buds - 4.05).abs() < 0.1, "{per_kg_buds}");
}
