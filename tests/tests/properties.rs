//! Property tests of the whole plan over wide random scenarios: it never panics, every number
//! is finite, the heat balance closes, and it moves the way physics says it must.

use proptest::prelude::*;
use stillroom_core::crops::CROPS;
use stillroom_core::plan::OilLayer;
use stillroom_core::scenario::{Barometer, BarometerReference, CondenserKind, OilComposition, Scenario};
use stillroom_core::{Plan, plan};

#[path = "../../core/tests/common/plan_numbers.rs"]
mod plan_numbers;

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
            // Inputs inside their ranges never fall through to the plan's last check.
            Err(e) => prop_assert!(
                !e.errors.is_empty() && !e.errors[0].field.starts_with("plan."),
                "{e}"
            ),
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

type Setter = fn(&mut Scenario, f64);

/// Every number input of a scenario: its path, a span of ordinary values, and how to set it.
const NUMBER_INPUTS: &[(&str, f64, f64, Setter)] = &[
    ("site.altitude_m", -400.0, 5800.0, |s, v| s.site.altitude_m = v),
    ("site.ambient_temperature_c", -15.0, 45.0, |s, v| s.site.ambient_temperature_c = v),
    ("site.barometer.pressure_pa", 50_000.0, 108_000.0, |s, v| {
        s.site.barometer = Some(Barometer { pressure_pa: v, reference: BarometerReference::Station })
    }),
    ("charge.plant_mass_kg", 0.1, 5000.0, |s, v| s.charge.plant_mass_kg = v),
    ("charge.oil_content_percent", 0.01, 20.0, |s, v| s.charge.oil_content_percent = Some(v)),
    ("charge.moisture_percent", 0.0, 90.0, |s, v| s.charge.moisture_percent = Some(v)),
    ("charge.heat_capacity_j_per_kg_k", 600.0, 4400.0, |s, v| s.charge.heat_capacity_j_per_kg_k = Some(v)),
    ("charge.temperature_c", -5.0, 55.0, |s, v| s.charge.temperature_c = Some(v)),
    ("oil.density_kg_per_m3", 650.0, 1400.0, |s, v| s.oil.density_kg_per_m3 = Some(v)),
    ("still.volume_m3", 0.002, 40.0, |s, v| s.still.volume_m3 = Some(v)),
    ("still.height_to_diameter", 0.4, 4.5, |s, v| s.still.height_to_diameter = v),
    ("still.metal_mass_kg", 0.0, 15_000.0, |s, v| s.still.metal_mass_kg = v),
    ("still.wall_u_w_per_m2_k", 0.0, 40.0, |s, v| s.still.wall_u_w_per_m2_k = v),
    ("boiler.heat_input_w", 200.0, 4.0e6, |s, v| s.boiler.heat_input_w = v),
    ("boiler.efficiency", 0.1, 1.0, |s, v| s.boiler.efficiency = Some(v)),
    ("boiler.usable_water_kg", 0.5, 50_000.0, |s, v| s.boiler.usable_water_kg = v),
    ("boiler.feed_temperature_c", 2.0, 80.0, |s, v| s.boiler.feed_temperature_c = Some(v)),
    ("boiler.steam_rate_kg_per_h", 0.05, 10_000.0, |s, v| s.boiler.steam_rate_kg_per_h = Some(v)),
    ("run.target_recovery_percent", 5.0, 99.5, |s, v| s.run.target_recovery_percent = v),
    ("run.rate_constant_per_min", 0.001, 0.9, |s, v| s.run.rate_constant_per_min = Some(v)),
    ("run.turnaround_min", 0.0, 1000.0, |s, v| s.run.turnaround_min = v),
    ("condenser.cooling_water_inlet_c", 1.0, 35.0, |s, v| s.condenser.cooling_water_inlet_c = v),
    ("condenser.cooling_water_outlet_c", 20.0, 90.0, |s, v| s.condenser.cooling_water_outlet_c = v),
    ("condenser.distillate_outlet_c", 10.0, 90.0, |s, v| s.condenser.distillate_outlet_c = Some(v)),
    ("condenser.condensing_u_w_per_m2_k", 20.0, 9000.0, |s, v| s.condenser.condensing_u_w_per_m2_k = v),
    ("condenser.cooling_u_w_per_m2_k", 20.0, 9000.0, |s, v| s.condenser.cooling_u_w_per_m2_k = v),
    ("condenser.tube_outer_diameter_m", 0.003, 0.09, |s, v| s.condenser.tube_outer_diameter_m = v),
    ("condenser.tub_water_kg", 2.0, 50_000.0, |s, v| s.condenser.tub_water_kg = v),
    ("separator.droplet_diameter_m", 20e-6, 1.5e-3, |s, v| s.separator.droplet_diameter_m = v),
    ("separator.residence_time_s", 20.0, 80_000.0, |s, v| s.separator.residence_time_s = v),
    ("separator.turbulence_factor", 1.0, 2.9, |s, v| s.separator.turbulence_factor = v),
    ("costs.fuel_price_per_unit", 0.0, 1e5, |s, v| s.costs.fuel_price_per_unit = Some(v)),
    ("costs.plant_value_per_kg", 0.0, 1e5, |s, v| s.costs.plant_value_per_kg = Some(v)),
    ("costs.labour_per_hour", 0.0, 1e5, |s, v| s.costs.labour_per_hour = Some(v)),
    ("season.harvest_kg", 0.0, 1e6, |s, v| s.season.harvest_kg = Some(v)),
];

/// Values no field should choke on: the edges of f64 and of sense.
const EXTREMES: &[f64] = &[
    0.0,
    -0.0,
    5e-324,
    -5e-324,
    1e-300,
    1e-12,
    1e-6,
    1e-3,
    1.0,
    1e6,
    1e12,
    1e15,
    1e300,
    f64::MAX,
    -1e-300,
    -1.0,
    -1e6,
    -f64::MAX,
    f64::NAN,
    f64::INFINITY,
    f64::NEG_INFINITY,
];

prop_compose! {
    /// Mostly ordinary values, and at most two extreme ones: an extreme value hides behind
    /// no other field's error.
    fn extreme_scenario()(
        picks in prop::collection::vec(prop::option::weighted(0.15, 0.0f64..=1.0), NUMBER_INPUTS.len()),
        extremes in prop::collection::vec((0..NUMBER_INPUTS.len(), 0..EXTREMES.len()), 0..=2),
        crop in prop::option::of(0..CROPS.len()),
        tube in any::<bool>(),
    ) -> Scenario {
        let mut s = Scenario::default();
        s.charge.crop = crop.map(|c| CROPS[c].id.to_string());
        if s.charge.crop.is_none() {
            // Without a preset these have no default.
            s.oil.composition = OilComposition::Compound { id: "linalool".into() };
            s.charge.oil_content_percent = Some(1.0);
            s.run.rate_constant_per_min = Some(0.05);
        }
        if tube {
            s.condenser.kind = CondenserKind::TubeInTube;
        }
        for ((_, lo, hi, set), p) in NUMBER_INPUTS.iter().zip(&picks) {
            if let Some(u) = p {
                set(&mut s, lo + u * (hi - lo));
            }
        }
        for (field, value) in extremes {
            (NUMBER_INPUTS[field].3)(&mut s, EXTREMES[value]);
        }
        s
    }
}

proptest! {
    #![proptest_config(ProptestConfig { cases: 512, ..ProptestConfig::default() })]

    /// A plan is all finite numbers within ±1e15, each `null` where the published schema allows
    /// one, or it is a list of field errors; never a panic.
    #[test]
    fn a_plan_is_sound_or_an_error_even_at_the_extremes(s in extreme_scenario()) {
        match plan(&s) {
            Ok(p) => {
                let v = serde_json::to_value(&p).unwrap();
                let schema = plan_numbers::plan_schema();
                prop_assert!(plan_numbers::check(&v, &schema).is_ok(), "{:?}", plan_numbers::check(&v, &schema));
            }
            Err(e) => prop_assert!(!e.errors.is_empty()),
        }
    }
}

#[test]
fn the_schema_check_sees_a_nan_written_as_null() {
    // The check above is only worth something if it can fail: a NaN in a plain number field
    // (written as null) and a number past the bound are both caught.
    let schema = plan_numbers::plan_schema();
    let mut v = serde_json::to_value(plan(&Scenario::default()).unwrap()).unwrap();
    assert_eq!(plan_numbers::check(&v, &schema), Ok(()));
    v["run"]["total_time_s"] = serde_json::Value::Null;
    assert!(plan_numbers::check(&v, &schema).unwrap_err().contains("plan.run.total_time_s"));
    v["run"]["total_time_s"] = serde_json::json!(2e15);
    assert!(plan_numbers::check(&v, &schema).is_err());
    // An optional field may be null.
    v["run"]["total_time_s"] = serde_json::json!(1.0);
    v["run"]["boiler_dry_after_s"] = serde_json::Value::Null;
    assert_eq!(plan_numbers::check(&v, &schema), Ok(()));
}
