//! Property tests of the whole plan over wide random scenarios: it never panics, every number
//! is finite, the heat balance closes, and it moves the way physics says it must.

use proptest::prelude::*;
use stillroom_core::crops::CROPS;
use stillroom_core::plan::OilLayer;
use stillroom_core::scenario::{OilComposition, Scenario};
use stillroom_core::{Plan, plan};

fn all_numbers_finite(v: &serde_json::Value, path: &str) -> Result<(), String> {
    match v {
        serde_json::Value::Number(n) => {
            if n.as_f64().is_some_and(f64::is_finite) {
                Ok(())
            } else {
                Err(path.to_string())
            }
        }
        serde_json::Value::Array(items) => {
            items.iter().enumerate().try_for_each(|(i, x)| all_numbers_finite(x, &format!("{path}.{i}")))
        }
        serde_json::Value::Object(map) => {
            map.iter().try_for_each(|(k, x)| all_numbers_finite(x, &format!("{path}.{k}")))
        }
        // serde_json writes NaN and infinity as null: a null where a number belongs is a failure
        // unless the field is optional, so nulls are checked through the typed plan instead.
        _ => Ok(()),
    }
}

prop_compose! {
    fn scenario()(
        crop in 0..CROPS.len(),
        plant_mass in 0.5f64..3000.0,
        altitude in -400.0f64..5800.0,
        heat_input in 1_500.0f64..400_000.0,
        water in 5.0f64..3000.0,
        volume in 0.01f64..8.0,
        metal in 0.0f64..2000.0,
        target in 50.0f64..99.5,
        ambient in -5.0f64..40.0,
        kind in 0..2usize,
    ) -> Scenario {
        let mut s = Scenario::default();
        s.charge.crop = Some(CROPS[crop].id.to_string());
        s.charge.plant_mass_kg = plant_mass;
        s.site.altitude_m = altitude;
        s.site.ambient_temperature_c = ambient;
        s.boiler.heat_input_w = heat_input;
        s.boiler.usable_water_kg = water;
        s.still.volume_m3 = Some(volume);
        s.still.metal_mass_kg = metal;
        s.run.target_recovery_percent = target;
        s.condenser.kind = if kind == 0 {
            stillroom_core::scenario::CondenserKind::CoilInTub
        } else {
            stillroom_core::scenario::CondenserKind::TubeInTube
        };
        s.season.harvest_kg = Some(plant_mass * 7.3);
        s
    }
}

fn ok(s: &Scenario) -> Option<Plan> {
    plan(s).ok()
}

proptest! {
    #![proptest_config(ProptestConfig { cases: 256, ..ProptestConfig::default() })]

    #[test]
    fn never_panics_and_every_output_is_finite(s in scenario()) {
        // A plan or a list of field errors; never a panic.
        match plan(&s) {
            Ok(p) => {
                let v = serde_json::to_value(&p).unwrap();
                prop_assert!(all_numbers_finite(&v, "plan").is_ok(), "{:?}", all_numbers_finite(&v, "plan"));
                prop_assert!(p.run.total_time_s.is_finite() && p.run.total_time_s > 0.0);
                prop_assert!(p.yield_estimate.oil_kg.low <= p.yield_estimate.oil_kg.central + 1e-12);
                prop_assert!(p.yield_estimate.oil_kg.central <= p.yield_estimate.oil_kg.high + 1e-12);
                prop_assert!(p.codistillation.temperature_c < p.site.water_boiling_point_c);
            }
            Err(e) => prop_assert!(!e.errors.is_empty()),
        }
    }

    #[test]
    fn heat_balance_closes(s in scenario()) {
        if let Some(p) = ok(&s) {
            prop_assert!(p.energy.heat_balance_error < 1e-3, "{}", p.energy.heat_balance_error);
        }
    }

    #[test]
    fn higher_site_boils_lower(s in scenario(), rise in 10.0f64..2000.0) {
        let mut up = s.clone();
        up.site.altitude_m = (s.site.altitude_m + rise).min(6000.0);
        if let (Some(a), Some(b)) = (ok(&s), ok(&up))
            && up.site.altitude_m > s.site.altitude_m
        {
            prop_assert!(b.site.water_boiling_point_c < a.site.water_boiling_point_c);
            prop_assert!(b.codistillation.temperature_c < a.codistillation.temperature_c);
        }
    }

    #[test]
    fn more_plant_needs_more_steam(s in scenario(), factor in 1.05f64..4.0) {
        let mut more = s.clone();
        more.charge.plant_mass_kg = s.charge.plant_mass_kg * factor;
        if let (Some(a), Some(b)) = (ok(&s), ok(&more)) {
            prop_assert!(b.codistillation.min_steam_to_target_kg > a.codistillation.min_steam_to_target_kg);
            prop_assert!(b.run.distillate_steam_kg >= a.run.distillate_steam_kg);
            prop_assert!(b.energy.fuel_amount > a.energy.fuel_amount);
        }
    }

    #[test]
    fn a_denser_oil_never_moves_the_outlet_to_the_top(s in scenario(), d1 in 700.0f64..1200.0, extra in 0.1f64..300.0) {
        let mut light = s.clone();
        light.oil.composition = OilComposition::CropTypical;
        light.oil.density_kg_per_m3 = Some(d1);
        let mut dense = light.clone();
        dense.oil.density_kg_per_m3 = Some((d1 + extra).min(1500.0));
        if let (Some(a), Some(b)) = (ok(&light), ok(&dense))
            && a.separator.oil_outlet == OilLayer::Bottom
        {
            prop_assert_eq!(b.separator.oil_outlet, OilLayer::Bottom);
        }
    }
}

#[test]
fn every_crop_preset_plans_with_defaults() {
    for crop in CROPS {
        let mut s = Scenario::default();
        s.charge.crop = Some(crop.id.to_string());
        let p = plan(&s).unwrap_or_else(|e| panic!("{}: {e}", crop.id));
        assert!(p.run.total_time_s > 0.0, "{}", crop.id);
    }
}

#[test]
fn fast_steam_in_a_narrow_still_is_flagged_and_a_gentle_one_is_not() {
    // 50 kg/h of steam up a 20 L still (D = 0.26 m): about 0.45 m/s, where 100 µm water droplets
    // (terminal velocity 0.36 m/s in steam, fluids 1.3.1) are carried up.
    let mut s = Scenario::default();
    s.still.volume_m3 = Some(0.02);
    s.charge.plant_mass_kg = 3.0;
    s.boiler.steam_rate_kg_per_h = Some(50.0);
    let p = plan(&s).unwrap();
    assert!(p.warnings.iter().any(|w| w.code == "steam_too_fast"), "{:?}", p.warnings);
    s.boiler.steam_rate_kg_per_h = Some(3.0);
    let p = plan(&s).unwrap();
    assert!(!p.warnings.iter().any(|w| w.code == "steam_too_fast"));
}

#[test]
fn tub_warming_rise_and_time_tell_the_same_story() {
    // One heat balance, m c_p ΔT = Q t, read two ways: the tub reaches the allowed outlet
    // temperature after `tub_lasts_s`, and warms by `tub_rise_over_run_k` over the whole run.
    let s = Scenario::default();
    let p = plan(&s).unwrap();
    let lasts = p.condenser.tub_lasts_s.unwrap();
    let rise = p.condenser.tub_rise_over_run_k.unwrap();
    let allowed = s.condenser.cooling_water_outlet_c - s.condenser.cooling_water_inlet_c;
    let implied = rise * lasts / p.run.time_after_first_drop_s;
    assert!((implied - allowed).abs() < 1e-6 * allowed, "{implied} vs {allowed}");
}
