//! The release-and-carry model against published yield-versus-time points, and the plan's run
//! following what the grower controls (burner, charge, packing).
//!
//! What data these checks have, said plainly: no published yield-versus-time figure or table has
//! been seen, so none has been digitised. The only published points at hand are figures quoted in
//! abstracts (Wesołowska et al.; Zheljazkov et al. 2013; Gawde et al.; the coriander paper, which
//! is hydrodistillation, not steam distillation), listed with their sources in the project's
//! reference notes. Two points from one abstract fix the two first-order parameters exactly, so
//! checks on them hold the integrator, not the model; they are named so below. The check that
//! holds the steam coupling (`a_steam_limited_clove_run_lasts_as_long_as_the_eugenol_equilibrium_says`)
//! takes its number from a general-purpose library, not from a yield curve.

use stillroom_core::crops::CROPS;
use stillroom_core::plan::RunLimit;
use stillroom_core::recovery::{carry_over, scaled_rate_constant_per_s};
use stillroom_core::{Plan, Scenario, plan};

/// With steam to spare the model must reduce to the first-order law it was built on.
fn plenty_of_steam(k_per_min: f64, target: f64) -> f64 {
    carry_over(k_per_min / 60.0, 1.0, 0.75, |_| 1.0, target, 1.0e7).time_to_target_s.unwrap() / 60.0
}

/// Share carried at time t (min) from the model's own curve, run to 99.9 %.
fn share_at(k_per_min: f64, t_min: f64) -> f64 {
    let run = carry_over(k_per_min / 60.0, 1.0, 0.75, |_| 1.0, 0.999, 1.0e7);
    let pts = &run.curve;
    let t = t_min * 60.0;
    let j = pts.iter().position(|p| p.0 >= t).unwrap();
    let (a, b) = (pts[j - 1], pts[j]);
    a.1 + (b.1 - a.1) * (t - a.0) / (b.0 - a.0)
}

#[test]
fn the_integrator_passes_through_a_two_point_first_order_fit() {
    // A consistency check of the integrator, not of the model: k and Y∞ are solved from the very
    // two points checked. Wesołowska, Jadczak & Grzeszczuk, Herba Polonica (abstract only):
    // steam-distilled L. angustifolia gave 1 % oil at 40 min and 2 % at 120 min. First order
    // through both gives k = 0.0120 /min and Y∞ = 2.62 %. With steam to spare the stepped
    // release-and-carry integrator must reproduce the closed-form law through both points within
    // 5 % (the abstract prints one significant figure).
    let y_inf = 2.62;
    for (t, y) in [(40.0, 1.0), (120.0, 2.0)] {
        let got = y_inf * share_at(0.0120, t);
        assert!((got - y).abs() <= 0.05 * y, "at {t} min: {got} % against {y} %");
    }
}

#[test]
fn the_integrator_reproduces_a_hydrodistillation_point() {
    // Hydrodistillation (Clevenger/Deryng apparatus), not steam distillation, and a consistency
    // check of the integrator only: Pol. J. Food Nutr. Sci. 68(3) (2018) 243-249 (abstract):
    // crushed coriander fruit, 1.20 % at 15 min and 1.62 % at 2 h; taking the 2 h value as Y∞
    // gives k ≈ 0.090 /min from the same point that is checked, within 5 %.
    let got = 1.62 * share_at(0.090, 15.0);
    assert!((got - 1.20).abs() <= 0.05 * 1.20, "{got}");
}

#[test]
fn the_lavender_preset_reaches_its_maximum_near_an_hour() {
    // Zheljazkov et al., J. Oleo Sci. 62 (2013) 195-199: the yield of steam-distilled lavender
    // reached its maximum at 60 min. The preset's k, at the crop's own steam rate, must give
    // 95 % within 45-75 min.
    let lavender = CROPS.iter().find(|c| c.id == "lavender").unwrap();
    let t = plenty_of_steam(lavender.rate_constant_per_min.typical, 0.95);
    assert!((45.0..=75.0).contains(&t), "{t} min");
}

#[test]
fn the_chamomile_preset_plateaus_after_four_to_eight_hours() {
    // Gawde et al. (steam distillation of chamomile, 30-720 min): key constituents plateau after
    // about 240 min; the maximum was at 720 min. 95 % must fall within 240-480 min.
    let chamomile = CROPS.iter().find(|c| c.id == "german-chamomile").unwrap();
    let t = plenty_of_steam(chamomile.rate_constant_per_min.typical, 0.95);
    assert!((240.0..=480.0).contains(&t), "{t} min");
}

#[test]
fn the_release_constant_follows_the_specific_steam_rate() {
    // k = k_ref (q/q_ref)^n: Denny's superficial-oil result n = 1; diffusion-limited n = 0.
    let k = 0.05;
    assert_eq!(scaled_rate_constant_per_s(k, 0.6, 0.3, 1.0), 0.1);
    assert_eq!(scaled_rate_constant_per_s(k, 0.6, 0.3, 0.0), 0.05);
}

fn run_minutes(crop: &str, heat_w: f64, mass_kg: f64) -> (f64, Plan) {
    let mut s = Scenario::default();
    s.charge.crop = Some(crop.into());
    s.charge.plant_mass_kg = mass_kg;
    s.boiler.heat_input_w = heat_w;
    s.boiler.usable_water_kg = 1000.0;
    // A lagged 200 L still: room for the double charge, little wall loss at 3 kW.
    s.still.volume_m3 = Some(0.2);
    s.still.wall_u_w_per_m2_k = 0.7;
    let p = plan(&s).unwrap();
    (p.run.time_after_first_drop_s / 60.0, p)
}

#[test]
fn more_steam_shortens_the_run_and_a_bigger_charge_lengthens_it() {
    // What a grower controls must move the answer (the old model ran 60 min from 3 kW to 5 MW).
    for crop in ["lavender", "peppermint", "clove-bud"] {
        let (t3, _) = run_minutes(crop, 3_000.0, 15.0);
        let (t8, _) = run_minutes(crop, 8_000.0, 15.0);
        let (t30, _) = run_minutes(crop, 30_000.0, 15.0);
        assert!(t3 > t8 && t8 > t30, "{crop}: {t3} {t8} {t30}");
        let (half, _) = run_minutes(crop, 8_000.0, 7.5);
        let (double, _) = run_minutes(crop, 8_000.0, 30.0);
        assert!(half < t8 && t8 < double, "{crop}: {half} {t8} {double}");
    }
}

#[test]
fn a_steam_limited_clove_run_lasts_as_long_as_the_eugenol_equilibrium_says() {
    // Source of the number: the ideal immiscible equilibrium of eugenol with water at one
    // atmosphere needs at least about 25 kg steam per kg of oil, computed with the general-purpose
    // libraries thermo 0.6.1 and CoolProp 8.0.0 (the clove-bud preset's source notes). Eugenol
    // boils lowest of the oil's three main compounds (eugenol 254 °C, β-caryophyllene about
    // 262 °C, eugenyl acetate about 281 °C), so no part of the oil needs less; the oil's heavier
    // molecules can lower the figure by a few per cent, hence 5 % taken off. The steam leaving
    // the charge carries at most the vaporisation efficiency times its saturation load, so over
    // the run the distillate must hold at least 0.95 × 25 / η kg of water per kg of oil carried.
    // At 3 kW the first-order release alone (ln 20 / k, 10 h for clove) would end the run with
    // far less steam than that; the plan must not. Tried: with the run length put back to
    // ln 20 / k this test fails (1.98 kg/h of distillate for 10 h is about 9 kg per kg of oil).
    for heat_w in [3_000.0, 8_000.0] {
        let (minutes, p) = run_minutes("clove-bud", heat_w, 15.0);
        let steam_per_oil = p.run.distillate_steam_kg / p.yield_estimate.carried_over_kg;
        let least = 0.95 * 25.0 / p.run.vaporisation_efficiency;
        assert!(
            steam_per_oil >= least,
            "{heat_w} W: {steam_per_oil:.1} kg/kg in {minutes:.0} min, below {least:.1}"
        );
        assert_eq!(p.run.limited_by, RunLimit::Steam, "{heat_w} W");
        // The time follows: at least the least steam over the distillate rate.
        let floor_min =
            least * p.yield_estimate.carried_over_kg / p.run.distillate_steam_rate_kg_per_s / 60.0;
        assert!(minutes >= floor_min, "{heat_w} W: {minutes:.0} min below {floor_min:.0}");
    }
}

#[test]
fn an_overpacked_still_runs_longer_not_only_warns() {
    // Channelling: steam bypasses part of an overpacked charge (common practice, no source); the
    // plan lowers the steam's effective load and the run lengthens.
    let mut s = Scenario::default();
    s.charge.crop = Some("clove-bud".into());
    s.boiler.usable_water_kg = 1000.0;
    s.still.volume_m3 = Some(0.1);
    s.charge.plant_mass_kg = 30.0;
    let fits = plan(&s).unwrap();
    s.still.volume_m3 = Some(0.04);
    let packed = plan(&s).unwrap();
    assert!(packed.warnings.iter().any(|w| w.code == "overpacked"));
    assert!(packed.run.vaporisation_efficiency < fits.run.vaporisation_efficiency);
    assert!(packed.run.time_after_first_drop_s > fits.run.time_after_first_drop_s);
    assert_eq!(packed.run.limited_by, RunLimit::Steam);
}

#[test]
fn every_headline_has_a_range_around_it_and_a_typed_content_has_a_spread() {
    for c in CROPS {
        let mut s = Scenario::default();
        s.charge.crop = Some(c.id.into());
        let p = plan(&s).unwrap();
        let r = &p.ranges;
        for (name, a) in [
            ("steam", &r.steam_kg),
            ("run", &r.run_time_s),
            ("total", &r.total_time_s),
            ("water", &r.water_total_kg),
            ("fuel", &r.fuel_amount),
            ("cooling", &r.cooling_water_kg),
            ("oil", &r.oil_kg),
            ("separator", &r.separator_volume_m3),
        ] {
            assert!(a.low <= a.central && a.central <= a.high, "{}: {name} {a:?}", c.id);
        }
        assert!(r.run_time_s.high > r.run_time_s.low, "{}", c.id);
    }
    let mut s = Scenario::default();
    s.charge.oil_content_percent = Some(1.0);
    let p = plan(&s).unwrap();
    assert!(p.ranges.oil_kg.high > 1.1 * p.ranges.oil_kg.central);
}
