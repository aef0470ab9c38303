//! The scenario format is strict: what it does not know, what cannot be, and what is too large
//! is refused with a message on the field that causes it.
#![cfg(feature = "json")]

use stillroom_core::plan::validate;
use stillroom_core::scenario::limits::*;
use stillroom_core::scenario::{
    CustomCompound, CustomVapourPressure, LogBase, OilComposition, OilPart, PressureUnit, Scenario,
    TemperatureUnit, parse_scenario_json,
};
use stillroom_core::{ScenarioErrors, plan};

fn parse_err(text: &str) -> ScenarioErrors {
    match parse_scenario_json(text) {
        Ok(s) => panic!("{text} was read as {s:?}"),
        Err(e) => e,
    }
}

fn plan_err(s: &Scenario) -> ScenarioErrors {
    match plan(s) {
        Ok(_) => panic!("planned {s:?}"),
        Err(e) => e,
    }
}

fn has(e: &ScenarioErrors, field: &str) -> bool {
    e.on(field).is_some()
}

// The example scenario exactly as `stillroom example` wrote it in format version 1, before the
// format became strict: it must keep opening, unchanged.
const VERSION_1_EXAMPLE: &str = r#"{
  "version": 1,
  "site": { "altitude_m": 300.0, "barometer": null, "ambient_temperature_c": 20.0 },
  "charge": { "crop": "lavender", "plant_mass_kg": 15.0, "oil_content_percent": null,
    "moisture_percent": null, "heat_capacity_j_per_kg_k": null, "temperature_c": null },
  "oil": { "composition": { "kind": "crop_typical" }, "density_kg_per_m3": null },
  "still": { "volume_m3": 0.1, "height_to_diameter": 1.5, "metal": "copper", "metal_mass_kg": 25.0,
    "wall_u_w_per_m2_k": 10.0 },
  "boiler": { "fuel": "propane", "heat_input_w": 8000.0, "efficiency": null, "usable_water_kg": 40.0,
    "feed_temperature_c": null, "steam_rate_kg_per_h": null },
  "run": { "target_recovery_percent": 95.0, "rate_constant_per_min": null, "turnaround_min": 30.0 },
  "condenser": { "kind": "coil_in_tub", "cooling_water_inlet_c": 15.0, "cooling_water_outlet_c": 45.0,
    "distillate_outlet_c": null, "condensing_u_w_per_m2_k": 800.0, "cooling_u_w_per_m2_k": 150.0,
    "tube_outer_diameter_m": 0.0127, "tub_water_kg": 150.0 },
  "separator": { "droplet_diameter_m": 0.00015, "residence_time_s": 600.0, "turbulence_factor": 1.2 },
  "costs": { "currency": "", "fuel_price_per_unit": null, "plant_value_per_kg": null, "labour_per_hour": null },
  "season": { "harvest_kg": null },
  "custom_compounds": []
}"#;

#[test]
fn a_version_1_file_keeps_opening() {
    // Written when the default droplet was 150 µm; newer fields (appliance, cohobation) absent.
    let mut expected = Scenario::default();
    expected.separator.droplet_diameter_m = 150e-6;
    assert_eq!(parse_scenario_json(VERSION_1_EXAMPLE).unwrap(), expected);
    // The short form in the guide, with most fields left out.
    let s = parse_scenario_json(
        r#"{"site": {"altitude_m": 1450, "barometer": {"pressure_pa": 100800, "reference": "sea_level"}},
            "charge": {"crop": "rosemary", "plant_mass_kg": 40},
            "boiler": {"fuel": "firewood", "heat_input_w": 30000}}"#,
    )
    .unwrap();
    assert!(plan(&s).is_ok());
}

#[test]
fn a_misspelt_field_is_refused_by_its_path() {
    // Before: read as the default 15 kg, silently.
    let e = parse_err(r#"{"charge": {"plant_mass": 40}}"#);
    assert_eq!(e.errors[0].field, "charge.plant_mass");
    assert!(e.errors[0].message.contains("unknown field"), "{e}");
    assert!(e.errors[0].valid.contains("plant_mass_kg"), "{e}");
    assert_eq!(parse_err(r#"{"chrage": {}}"#).errors[0].field, "chrage");
    let e = parse_err(
        r#"{"oil": {"composition": {"kind": "mixture", "parts": [
            {"compound": "linalool", "mass_percent": 50}, {"compound": "linalyl-acetate", "mass_pc": 50}]}}}"#,
    );
    assert_eq!(e.errors[0].field, "oil.composition.parts.1.mass_pc");
    let e = parse_err(
        r#"{"custom_compounds": [{"id": "x", "name": "x", "molar_mass_kg_per_mol": 0.15,
            "liquid_density_kg_per_m3": 900, "vapour_pressure": {"kind": "two_points",
            "t1_c": 25, "p1_pa": 10, "t2_c": 200, "p2_pa": 101325, "t3_c": 1}}]}"#,
    );
    assert_eq!(e.errors[0].field, "custom_compounds.0.vapour_pressure.t3_c");
}

#[test]
fn a_version_this_build_does_not_read_is_refused() {
    for v in ["0", "2", "99", "-1", "1.5", "\"1\""] {
        let e = parse_err(&format!(r#"{{"version": {v}}}"#));
        assert_eq!(e.errors[0].field, "version", "{v}");
        assert_eq!(e.errors[0].valid, "version 1", "{v}");
    }
    assert!(parse_err(r#"{"version": 2}"#).errors[0].message.contains("newer"));
    // And a scenario built in code.
    let s = Scenario { version: 2, ..Scenario::default() };
    assert!(has(&validate(&s).unwrap_err(), "version"));
}

#[test]
fn a_section_written_as_a_list_is_refused() {
    // Before: `site` read by position as altitude, barometer, ambient temperature.
    let e = parse_err(r#"{"site": [300, null, 20]}"#);
    assert_eq!(e.errors[0].field, "site");
    assert!(e.errors[0].valid.contains("named fields"));
    assert_eq!(parse_err("[1, {}]").errors[0].field, "scenario");
    assert_eq!(parse_err(r#"{"custom_compounds": [["x"]]}"#).errors[0].field, "custom_compounds.0");
    let e = parse_err(r#"{"oil": {"composition": {"kind": "mixture", "parts": [["linalool", 100]]}}}"#);
    assert_eq!(e.errors[0].field, "oil.composition.parts.0");
}

#[test]
fn a_wrong_type_names_the_field_and_the_type_expected() {
    let e = parse_err(r#"{"charge": {"plant_mass_kg": "forty"}}"#);
    assert_eq!(e.errors[0].field, "charge.plant_mass_kg");
    assert_eq!(e.errors[0].valid, "a number");
    assert!(e.errors[0].message.contains("line 1"), "{e}");
    let e = parse_err(r#"{"still": {"metal": "gold"}}"#);
    assert_eq!(e.errors[0].field, "still.metal");
    assert!(e.errors[0].valid.contains("copper"));
    let e = parse_err(r#"{"charge": {"plant_mass_kg": 1, "plant_mass_kg": 2}}"#);
    assert_eq!(e.errors[0].field, "charge.plant_mass_kg");
    assert!(e.errors[0].message.contains("duplicate"));
    let e = parse_err(r#"{"custom_compounds": [{"id": "x"}]}"#);
    assert_eq!(e.errors[0].field, "custom_compounds.0.name");
    assert_eq!(parse_err("{\"site\": ").errors[0].field, "scenario");
}

fn own(id: &str, law: CustomVapourPressure) -> CustomCompound {
    CustomCompound {
        id: id.into(),
        name: format!("{id} (invented)"),
        molar_mass_kg_per_mol: 0.154,
        liquid_density_kg_per_m3: 900.0,
        water_solubility_kg_per_m3: 0.5,
        vapour_pressure: law,
    }
}

fn points(t1_c: f64, p1_pa: f64, t2_c: f64, p2_pa: f64) -> CustomVapourPressure {
    CustomVapourPressure::TwoPoints { t1_c, p1_pa, t2_c, p2_pa }
}

fn antoine(a: f64, b: f64, c: f64, t_min_c: f64, t_max_c: f64) -> CustomVapourPressure {
    CustomVapourPressure::Antoine {
        a,
        b,
        c,
        log: LogBase::Log10,
        pressure_unit: PressureUnit::MmHg,
        temperature_unit: TemperatureUnit::Celsius,
        t_min_c,
        t_max_c,
    }
}

/// A compound with linalool-like numbers (invented as a whole): 25 Pa at 25 °C (linalool about
/// 21 Pa, Yaws' handbook, from memory), boiling at 198 °C.
fn sound() -> CustomVapourPressure {
    points(25.0, 25.0, 198.0, 101_325.0)
}

fn with_own(list: Vec<CustomCompound>, oil: &str) -> Scenario {
    let mut s = Scenario { custom_compounds: list, ..Scenario::default() };
    s.oil.composition = OilComposition::Compound { id: oil.into() };
    s
}

#[test]
fn a_sound_compound_of_ones_own_plans() {
    let p = plan(&with_own(vec![own("field-oil", sound())], "field-oil")).unwrap();
    // With water at the site (about 97.8 kPa) it boils a little under water's own point.
    assert!(p.codistillation.temperature_c < p.site.water_boiling_point_c);
}

#[test]
fn own_ids_must_be_new_and_distinct() {
    // Before: a repeated id, or a library id, was accepted and the first (or the library's) won.
    let e = plan_err(&with_own(vec![own("field-oil", sound()), own("field-oil", sound())], "field-oil"));
    assert!(has(&e, "custom_compounds.1.id"), "{e}");
    assert!(e.on("custom_compounds.1.id").unwrap().message.contains("custom_compounds.0"));
    assert!(!has(&e, "custom_compounds.0.id"));
    let e = plan_err(&with_own(vec![own("linalool", sound())], "linalool"));
    assert!(e.on("custom_compounds.0.id").unwrap().message.contains("library"), "{e}");
}

#[test]
fn a_law_that_falls_with_temperature_is_refused_on_the_law() {
    // Before: accepted, and the plan failed on `oil.composition` instead.
    let e = plan_err(&with_own(vec![own("field-oil", points(25.0, 101_325.0, 198.0, 25.0))], "field-oil"));
    assert!(e.on("custom_compounds.0.vapour_pressure").unwrap().message.contains("rise"), "{e}");
    assert!(!has(&e, "oil.composition"), "{e}");
    let e =
        plan_err(&with_own(vec![own("field-oil", antoine(7.0, -1600.0, 200.0, 20.0, 200.0))], "field-oil"));
    assert!(e.on("custom_compounds.0.vapour_pressure.b").unwrap().message.contains("positive"), "{e}");
    assert!(!has(&e, "oil.composition"), "{e}");
}

#[test]
fn impossible_temperatures_and_ranges_are_refused_on_their_field() {
    let e = plan_err(&with_own(vec![own("field-oil", points(-300.0, 25.0, 198.0, 101_325.0))], "field-oil"));
    assert!(e.on("custom_compounds.0.vapour_pressure.t1_c").unwrap().message.contains("absolute zero"));
    // The page shows the two-point law as one block: the law itself carries a summary.
    assert!(has(&e, "custom_compounds.0.vapour_pressure"));
    let e =
        plan_err(&with_own(vec![own("field-oil", antoine(7.0, 1600.0, 200.0, -1e308, 1e308))], "field-oil"));
    assert!(has(&e, "custom_compounds.0.vapour_pressure.t_min_c"), "{e}");
    assert!(has(&e, "custom_compounds.0.vapour_pressure.t_max_c"), "{e}");
    let e =
        plan_err(&with_own(vec![own("field-oil", antoine(7.0, 1600.0, 200.0, 150.0, 20.0))], "field-oil"));
    assert!(e.on("custom_compounds.0.vapour_pressure.t_max_c").unwrap().message.contains("empty"));
    // A pole inside the range: T + C = 0 at 30 °C.
    let e =
        plan_err(&with_own(vec![own("field-oil", antoine(7.0, 1600.0, -30.0, 20.0, 200.0))], "field-oil"));
    assert!(has(&e, "custom_compounds.0.vapour_pressure.c"), "{e}");
    let e = plan_err(&with_own(vec![own("field-oil", points(25.0, 5e-324, 198.0, 101_325.0))], "field-oil"));
    assert!(has(&e, "custom_compounds.0.vapour_pressure.p1_pa"), "{e}");
}

#[test]
fn oil_and_water_cannot_exceed_the_charge() {
    let mut s = Scenario::default();
    s.charge.oil_content_percent = Some(40.0);
    s.charge.moisture_percent = Some(70.0);
    let e = plan_err(&s);
    let oil = e.on("charge.oil_content_percent").unwrap();
    assert!(oil.message.contains("whole charge"), "{e}");
    assert_eq!(oil.max, Some(30.0));
    s.charge.oil_content_percent = Some(30.0);
    assert!(plan(&s).is_ok());
}

fn mixture(shares: &[f64]) -> Scenario {
    let ids = ["linalool", "linalyl-acetate", "camphor", "1-8-cineole"];
    let mut s = Scenario::default();
    s.oil.composition = OilComposition::Mixture {
        parts: shares
            .iter()
            .zip(ids.iter().cycle())
            .map(|(p, id)| OilPart { compound: id.to_string(), mass_percent: *p })
            .collect(),
    };
    s
}

#[test]
fn shares_far_from_100_percent_are_an_error_and_near_it_are_rescaled() {
    // Before: 50 % in all was planned as if it were 100 %.
    let e = plan_err(&mixture(&[30.0, 20.0]));
    let total = e.on("oil.composition").unwrap();
    assert!(total.message.contains("50 %"), "{e}");
    assert_eq!((total.min, total.max), (Some(98.0), Some(102.0)));
    assert!(has(&plan_err(&mixture(&[60.0, 50.0])), "oil.composition"));
    // 99 % and 101.5 % are an analysis that rounds: rescaled, and the same oil as 100 %.
    let exact = plan(&mixture(&[40.0, 60.0])).unwrap();
    for shares in [[39.6, 59.4], [40.6, 60.9]] {
        let p = plan(&mixture(&shares)).unwrap();
        assert!((p.codistillation.temperature_c - exact.codistillation.temperature_c).abs() < 1e-9);
    }
}

#[test]
fn a_negative_heat_input_is_an_error_even_beside_a_steam_rate() {
    let mut s = Scenario::default();
    s.boiler.steam_rate_kg_per_h = Some(10.0);
    s.boiler.heat_input_w = -5.0;
    assert!(has(&plan_err(&s), "boiler.heat_input_w"));
    s.boiler.heat_input_w = 0.0;
    assert!(plan(&s).is_ok());
}

/// Every number field of the scenario that must be strictly positive, by its path.
const POSITIVE_FIELDS: [&str; 6] = [
    "charge.plant_mass_kg",
    "charge.oil_content_percent",
    "still.volume_m3",
    "boiler.usable_water_kg",
    "boiler.steam_rate_kg_per_h",
    "condenser.tub_water_kg",
];

fn set(s: &Scenario, path: &str, v: f64) -> Scenario {
    let mut value = serde_json::to_value(s).unwrap();
    let (section, field) = path.split_once('.').unwrap();
    value[section][field] = serde_json::json!(v);
    serde_json::from_value(value).unwrap()
}

#[test]
fn a_tiny_positive_value_is_refused_not_planned_into_nulls() {
    // Before: 5e-324 kg of plant gave a "successful" plan holding nulls (NaN) and 1e300 steam
    // rates.
    for field in POSITIVE_FIELDS {
        for v in [5e-324, 1e-300, 1e-12] {
            let e = plan_err(&set(&Scenario::default(), field, v));
            let err = e.on(field).unwrap_or_else(|| panic!("{field} = {v}: {e}"));
            assert!(err.message.contains("at least"), "{field}: {e}");
            assert!(err.value.contains('e'), "shown as a number, not 0: {}", err.value);
        }
    }
    // At or below zero the message says so plainly; the range still gives the bound.
    for field in POSITIVE_FIELDS {
        let e = plan_err(&set(&Scenario::default(), field, -4.0));
        assert_eq!(e.on(field).unwrap().message, "must be more than zero", "{field}");
        assert!(e.on(field).unwrap().min.is_some_and(|m| m > 0.0), "{field}");
    }
    let e = plan_err(&mixture(&[100.0 - 1e-300, 1e-300]));
    assert!(has(&e, "oil.composition.parts.1.mass_percent"), "{e}");
}

#[test]
fn the_lower_bounds_themselves_plan_to_finite_numbers() {
    let lows = [
        ("charge.plant_mass_kg", 0.05),
        ("charge.oil_content_percent", 0.001),
        ("still.volume_m3", 0.001),
        ("boiler.usable_water_kg", 0.1),
        ("boiler.steam_rate_kg_per_h", 0.01),
        ("condenser.tub_water_kg", 1.0),
    ];
    for (field, v) in lows {
        let s = set(&Scenario::default(), field, v);
        // A plan, or an error on a field (never a plan with a bad number: that is its own error).
        match plan(&s) {
            Ok(p) => assert!(stillroom_core::plan::sanity::first_bad_number(&p).is_none()),
            Err(e) => assert!(!e.errors[0].field.starts_with("plan."), "{field} = {v}: {e}"),
        }
    }
}

#[test]
fn size_limits_are_refused_at_once_with_one_message() {
    let many = |n: usize| mixture(&vec![100.0 / n as f64; n]);
    assert!(plan(&many(MAX_MIXTURE_PARTS)).is_ok(), "{:?}", plan(&many(MAX_MIXTURE_PARTS)).err());
    for n in [MAX_MIXTURE_PARTS + 1, 2_000, 100_000] {
        let e = plan_err(&many(n));
        assert_eq!(e.errors.len(), 1, "one message, not one per part: {}", e.errors.len());
        assert_eq!(e.errors[0].field, "oil.composition.parts");
        assert!(e.errors[0].message.contains(&MAX_MIXTURE_PARTS.to_string()));
    }
    // Pasted as text, 2,000 parts are read and refused on their count.
    let parts: Vec<String> =
        (0..2_000).map(|_| r#"{"compound": "linalool", "mass_percent": 0.05}"#.to_string()).collect();
    let text =
        format!(r#"{{"oil": {{"composition": {{"kind": "mixture", "parts": [{}]}}}}}}"#, parts.join(","));
    let e = plan_err(&parse_scenario_json(&text).unwrap());
    assert_eq!(e.errors[0].field, "oil.composition.parts");
    // 100,000 parts are more text than any scenario: refused before parsing.
    let parts: Vec<String> =
        (0..100_000).map(|_| r#"{"compound": "linalool", "mass_percent": 0.001}"#.to_string()).collect();
    let text =
        format!(r#"{{"oil": {{"composition": {{"kind": "mixture", "parts": [{}]}}}}}}"#, parts.join(","));
    assert!(parse_err(&text).errors[0].valid.contains(&MAX_SCENARIO_JSON_BYTES.to_string()));

    let list: Vec<CustomCompound> =
        (0..=MAX_CUSTOM_COMPOUNDS).map(|i| own(&format!("own-{i}"), sound())).collect();
    let e = plan_err(&with_own(list, "own-0"));
    assert_eq!(
        e.on("custom_compounds").unwrap().message,
        format!("too many compounds of your own: at most {MAX_CUSTOM_COMPOUNDS}")
    );
    let list: Vec<CustomCompound> =
        (0..MAX_CUSTOM_COMPOUNDS).map(|i| own(&format!("own-{i}"), sound())).collect();
    assert!(plan(&with_own(list, "own-31")).is_ok());

    let long_id = "x".repeat(MAX_ID_CHARS + 1);
    assert!(has(&plan_err(&with_own(vec![own(&long_id, sound())], &long_id)), "custom_compounds.0.id"));
    let mut named = own("field-oil", sound());
    named.name = "n".repeat(MAX_NAME_CHARS + 1);
    assert!(has(&plan_err(&with_own(vec![named], "field-oil")), "custom_compounds.0.name"));
    let mut s = Scenario::default();
    s.charge.crop = Some("c".repeat(10_000));
    assert!(plan_err(&s).on("charge.crop").unwrap().message.contains("too long"));
    s = Scenario::default();
    s.costs.currency = "€".repeat(MAX_CURRENCY_CHARS + 1);
    assert!(has(&plan_err(&s), "costs.currency"));
}

#[test]
fn a_number_read_and_written_back_is_the_same_number() {
    // Found by the fuzz test: with serde_json's default fast float parser this 17-digit value
    // came back one unit in the last place off after a save and a reload.
    let s = parse_scenario_json(r#"{"still": {"wall_u_w_per_m2_k": 9.7401901090872552}}"#).unwrap();
    let again = parse_scenario_json(&serde_json::to_string(&s).unwrap()).unwrap();
    assert_eq!(again.still.wall_u_w_per_m2_k.to_bits(), s.still.wall_u_w_per_m2_k.to_bits());
    assert_eq!(again, s);
}
