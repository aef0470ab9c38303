//! Properties of the still sizing: it never panics; every design, planned forward, meets its
//! request (run length, charges a day, the working day, steam rate, tub temperature, the fed
//! jacket's cooling flow, the water a charge uses); and the next
//! smaller catalogue size of each part would not. The "would not" checks rebuild the geometry
//! and the steam velocity here, from the allowances the design lists and from IAPWS-IF97
//! (seuif97) directly, rather than through the sizing's own functions.

use proptest::prelude::*;
use stillroom_core::crops::CROPS;
use stillroom_core::heat::Fuel;
use stillroom_core::plan::{Plan, plan};
use stillroom_core::scenario::{CondenserKind, Scenario};
use stillroom_core::sizing::catalogue::{self, TubeStandard};
use stillroom_core::sizing::{
    CoolingSupply, Design, ElectricSupply, Harvest, HeatSupply, Limits, SiteRequest, SizingRequest, size,
};

/// Crops whose runs fit in a working day (woods and seeds need far longer runs than sampled here).
const CROP_IDS: &[&str] = &["lavender", "lavandin", "peppermint", "rosemary", "tea-tree", "thyme", "basil"];

fn heat_supply() -> impl Strategy<Value = HeatSupply> {
    prop_oneof![
        Just(HeatSupply::Fuel { fuel: Fuel::Propane, appliance: None, max_heat_input_w: None }),
        Just(HeatSupply::Fuel { fuel: Fuel::NaturalGas, appliance: None, max_heat_input_w: None }),
        Just(HeatSupply::Fuel { fuel: Fuel::Firewood, appliance: None, max_heat_input_w: None }),
        (3_000.0..40_000.0f64)
            .prop_map(|w| HeatSupply::Electric { supply: ElectricSupply::Power { max_power_w: w } }),
        (10.0..63.0f64, prop::bool::ANY).prop_map(|(a, three)| HeatSupply::Electric {
            supply: ElectricSupply::Current {
                current_a: a,
                voltage_v: if three { 400.0 } else { 230.0 },
                phases: Some(if three { 3 } else { 1 }),
            }
        }),
    ]
}

prop_compose! {
    fn request()(
        crop in prop::sample::select(CROP_IDS),
        daily in 5.0..150.0f64,
        altitude in 0.0..2500.0f64,
        heat in heat_supply(),
        inlet in 5.0..25.0f64,
        rise in 12.0..40.0f64,
        charges in 1u32..4,
        run_h in 2.0..8.0f64,
        jacket in prop::bool::ANY,
        us in prop::bool::ANY,
        // 1.2 to 60 L/min of cooling water, when the request has a limit.
        max_flow in prop::option::of(0.02..1.0f64),
        max_water in prop::option::of(100.0..5_000.0f64),
        day_h in prop::option::of(4.0..24.0f64),
    ) -> SizingRequest {
        SizingRequest {
            crop: Some(crop.to_string()),
            base: None,
            harvest: Harvest::PerDay { kg_per_day: daily, days: Some(20) },
            site: SiteRequest { altitude_m: altitude, ambient_temperature_c: None },
            heat,
            cooling: CoolingSupply {
                inlet_c: inlet,
                max_flow_kg_per_s: max_flow,
                condenser: if jacket { CondenserKind::TubeInTube } else { CondenserKind::CoilInTub },
                tube_standard: if us { TubeStandard::Us } else { TubeStandard::Metric },
            },
            limits: Limits {
                max_charges_per_day: charges,
                max_run_s: run_h * 3600.0,
                max_water_per_run_kg: max_water,
                warmest_cooling_water_c: inlet + rise,
                working_day_s: day_h.map(|h| h * 3600.0),
            },
            packing_density_kg_per_m3: None,
            steam_rate_kg_per_h_per_kg: None,
        }
    }
}

fn crop_steam_rate(r: &SizingRequest) -> f64 {
    CROPS.iter().find(|c| Some(c.id) == r.crop.as_deref()).unwrap().steam_rate_kg_per_h_per_kg
}

/// The request's limits, read off a forward plan.
fn meets(r: &SizingRequest, p: &Plan) -> bool {
    let season = p.season.as_ref().unwrap();
    p.run.total_time_s <= r.limits.max_run_s
        && season.charges <= r.limits.max_charges_per_day
        && season.total_time_s <= r.limits.working_day_s.unwrap_or(86_400.0)
        && p.run.specific_steam_rate_kg_per_h_per_kg >= crop_steam_rate(r) * (1.0 - 1e-9)
        && p.run.refills == 0
        // A tub holds at its warmest only when fed: the design's tub must last the run unfed.
        && p.condenser.tub_feed_from_s.is_none()
        && p.condenser.tub_end_c.is_none_or(|t| t <= r.limits.warmest_cooling_water_c + 1e-9)
        // A fed jacket draws its water from the supply; a tub is filled, so the flow limit only
        // sets how long a refill takes.
        && (r.cooling.condenser != CondenserKind::TubeInTube
            || r.cooling.max_flow_kg_per_s.is_none_or(|f| p.condenser.cooling_water_flow_kg_per_s <= f * (1.0 + 1e-9)))
        && r.limits.max_water_per_run_kg.is_none_or(|w| p.water_use.total_kg <= w * (1.0 + 1e-9))
}

/// Whether a charge of `charge_m3` with `boiled_kg` of water to boil off fits a drum-shaped
/// vessel of `volume_m3`: water (hot, 958.4 kg/m³ from IAPWS-IF97) plus the listed cover and
/// clearance, then the charge and its steam space, against the height, all by the design's
/// listed allowances.
fn fits(d: &Design, volume_m3: f64, boiled_kg: f64) -> bool {
    let allowance = |name: &str| d.allowances.iter().find(|a| a.name == name).unwrap().value;
    let r = allowance("vessel height over diameter");
    let diameter = (4.0 * volume_m3 / (std::f64::consts::PI * r)).cbrt();
    let area = std::f64::consts::PI * diameter * diameter / 4.0;
    let rho = seuif97::tx(100.0, 0.0, seuif97::OD);
    let needed = boiled_kg / (rho * area)
        + allowance("water kept over the heater")
        + allowance("gap from the boiling water to the grid")
        + (1.0 + allowance("steam space above the charge")) * d.still.charge_volume_m3 / area;
    needed <= r * diameter * (1.0 + 1e-6)
}

fn with<F: FnOnce(&mut Scenario)>(s: &Scenario, f: F) -> Scenario {
    let mut s = s.clone();
    f(&mut s);
    s
}

fn check_design(r: &SizingRequest, d: &Design) -> Result<(), TestCaseError> {
    let p = plan(&d.scenario).map_err(|e| TestCaseError::fail(format!("the design does not plan: {e}")))?;
    prop_assert!(meets(r, &p), "the design misses its request: {:?}", d.planned);
    prop_assert_eq!(p.season.as_ref().unwrap().charges, d.charges_per_day);
    prop_assert!((d.planned.first_charge_time_s - p.run.total_time_s).abs() < 1e-9);
    prop_assert!(d.still.capacity_kg >= d.charge_kg * (1.0 - 1e-9));
    for part in
        [&d.still.volume_m3, &d.heat.heat_input_w, &d.separator.volume_m3, &d.condenser.tube_inner_diameter_m]
    {
        prop_assert!(part.rounded >= part.exact * (1.0 - 1e-9), "{} below its exact size", part.label);
    }
    prop_assert!(d.heat.heat_input_w.rounded <= d.heat.supply_limit_w * (1.0 + 1e-9));

    // The next smaller vessel cannot hold the charge with the water it would boil off.
    if let Some(smaller) = catalogue::next_smaller(catalogue::VESSELS_M3, d.still.volume_m3.rounded) {
        let s = with(&d.scenario, |s| s.still.volume_m3 = Some(smaller.value));
        if let Ok(q) = plan(&s) {
            let boiled = (q.run.boiler_water_evaporated_kg - q.run.returned_to_boiler_kg) * 1.05;
            prop_assert!(!fits(d, smaller.value, boiled) || !meets(r, &q), "{} would do", smaller.label);
        }
    }
    // The next smaller heat rating misses a limit.
    if let Some(smaller) =
        catalogue::next_smaller(catalogue::heat_ratings(d.heat.fuel), d.heat.heat_input_w.rounded)
    {
        let s = with(&d.scenario, |s| s.boiler.heat_input_w = smaller.value);
        prop_assert!(plan(&s).map(|q| !meets(r, &q)).unwrap_or(true), "{} would do", smaller.label);
    }
    // The next smaller tub lets the water warm past the limit.
    if let Some(smaller) = d
        .condenser
        .tub_volume_m3
        .as_ref()
        .and_then(|tub| catalogue::next_smaller(catalogue::TUBS_M3, tub.rounded))
    {
        let rho = seuif97::pt(0.101325, r.cooling.inlet_c, seuif97::OD);
        let s = with(&d.scenario, |s| s.condenser.tub_water_kg = smaller.value * 0.9 * rho);
        prop_assert!(plan(&s).map(|q| !meets(r, &q)).unwrap_or(true), "{} would do", smaller.label);
    }
    // The next smaller glassware holds less than the distillate over the residence time.
    if let Some(smaller) = catalogue::next_smaller(catalogue::SEPARATORS_M3, d.separator.volume_m3.rounded) {
        prop_assert!(
            smaller.value
                < p.separator.distillate_flow_m3_per_s * Scenario::default().separator.residence_time_s
        );
    }
    // The next smaller tube would carry the steam faster than the listed inlet velocity.
    if !d.condenser.tube_inner_diameter_m.label.contains("coils") {
        let tubes = catalogue::tubes(r.cooling.tube_standard);
        let chosen =
            tubes.iter().position(|t| t.outer_diameter_m == d.condenser.tube_outer_diameter_m).unwrap();
        if chosen > 0 {
            let inner = tubes[chosen - 1].inner_diameter_m();
            let rho_v = seuif97::tx(p.codistillation.temperature_c, 1.0, seuif97::OD);
            let v =
                p.run.distillate_steam_rate_kg_per_s / (rho_v * std::f64::consts::PI * inner * inner / 4.0);
            let limit = d
                .allowances
                .iter()
                .find(|a| a.name == "steam velocity at the condenser inlet")
                .unwrap()
                .value;
            prop_assert!(v > limit, "{} would carry the steam at {v:.1} m/s", tubes[chosen - 1].label);
        }
    }
    Ok(())
}

proptest! {
    #![proptest_config(ProptestConfig { cases: 64, ..ProptestConfig::default() })]

    #[test]
    fn every_design_meets_its_request_and_no_smaller_size_would(r in request()) {
        match size(&r) {
            Ok(d) => check_design(&r, &d)?,
            Err(e) => {
                prop_assert!(!e.errors.is_empty());
                for f in &e.errors {
                    prop_assert!(!f.field.is_empty() && !f.message.is_empty(), "{e}");
                }
            }
        }
    }

    #[test]
    fn nonsense_numbers_give_field_errors_not_panics(
        daily in prop::num::f64::ANY,
        altitude in prop::num::f64::ANY,
        inlet in prop::num::f64::ANY,
        run in prop::num::f64::ANY,
        warmest in prop::num::f64::ANY,
        charges in 0u32..100,
    ) {
        let r = SizingRequest {
            crop: Some("lavender".into()),
            base: None,
            harvest: Harvest::PerDay { kg_per_day: daily, days: None },
            site: SiteRequest { altitude_m: altitude, ambient_temperature_c: None },
            heat: HeatSupply::Fuel { fuel: Fuel::Propane, appliance: None, max_heat_input_w: None },
            cooling: CoolingSupply {
                inlet_c: inlet,
                max_flow_kg_per_s: None,
                condenser: CondenserKind::CoilInTub,
                tube_standard: TubeStandard::Metric,
            },
            limits: Limits {
                max_charges_per_day: charges,
                max_run_s: run,
                max_water_per_run_kg: None,
                warmest_cooling_water_c: warmest,
                working_day_s: None,
            },
            packing_density_kg_per_m3: None,
            steam_rate_kg_per_h_per_kg: None,
        };
        if let Err(e) = size(&r) {
            prop_assert!(!e.errors.is_empty());
        }
    }
}

/// The sampled requests must not all fail: a fixed, comfortable request gives a design.
#[test]
fn a_comfortable_request_is_designed() {
    let r = SizingRequest {
        crop: Some("lavender".into()),
        base: None,
        harvest: Harvest::PerDay { kg_per_day: 30.0, days: Some(20) },
        site: SiteRequest { altitude_m: 300.0, ambient_temperature_c: None },
        heat: HeatSupply::Fuel { fuel: Fuel::Propane, appliance: None, max_heat_input_w: None },
        cooling: CoolingSupply {
            inlet_c: 15.0,
            max_flow_kg_per_s: None,
            condenser: CondenserKind::CoilInTub,
            tube_standard: TubeStandard::Metric,
        },
        limits: Limits {
            max_charges_per_day: 2,
            max_run_s: 4.0 * 3600.0,
            max_water_per_run_kg: None,
            warmest_cooling_water_c: 45.0,
            working_day_s: None,
        },
        packing_density_kg_per_m3: None,
        steam_rate_kg_per_h_per_kg: None,
    };
    let d = size(&r).unwrap();
    check_design(&r, &d).unwrap();
}

/// The sampled limits must not all end in errors: a fed jacket on a limited supply, with a
/// limit on the water a charge uses and an eight-hour working day, gives a design that keeps
/// every one of them (an invented farm: 30 kg of lavender a day).
#[test]
fn a_request_with_flow_water_and_day_limits_is_designed() {
    let r = SizingRequest {
        crop: Some("lavender".into()),
        base: None,
        harvest: Harvest::PerDay { kg_per_day: 30.0, days: Some(20) },
        site: SiteRequest { altitude_m: 300.0, ambient_temperature_c: None },
        heat: HeatSupply::Fuel { fuel: Fuel::Propane, appliance: None, max_heat_input_w: None },
        cooling: CoolingSupply {
            inlet_c: 15.0,
            // 30 L/min.
            max_flow_kg_per_s: Some(0.5),
            condenser: CondenserKind::TubeInTube,
            tube_standard: TubeStandard::Metric,
        },
        limits: Limits {
            max_charges_per_day: 2,
            max_run_s: 4.0 * 3600.0,
            max_water_per_run_kg: Some(4_000.0),
            warmest_cooling_water_c: 45.0,
            working_day_s: Some(8.0 * 3600.0),
        },
        packing_density_kg_per_m3: None,
        steam_rate_kg_per_h_per_kg: None,
    };
    let d = size(&r).unwrap();
    check_design(&r, &d).unwrap();
    // The same request with too little water for a charge is refused on that field.
    let mut thirsty = r.clone();
    thirsty.limits.max_water_per_run_kg = Some(plan(&d.scenario).unwrap().water_use.total_kg * 0.5);
    assert!(size(&thirsty).unwrap_err().on("limits.max_water_per_run_kg").is_some());
}
