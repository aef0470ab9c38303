//! Planning a first still: the inverse of [`crate::plan::plan`]. The grower says what they
//! want to distil and what they can hold to; [`size`] designs the equipment.
//!
//! The design is a water-and-steam still (boiler water under a grid, the charge on it, steam
//! space above) with a coil in a tub or a fed jacket, and a separator. Every answer is solved
//! on the forward plan, never guessed:
//!
//! 1. `request` checks every field and fills in the crop's packing density and steam rate.
//! 2. `exact` tries the most charges a day first (the smallest charge, so the smallest still) and
//!    finds the least heat input that meets the crop's steam rate, the longest run and the
//!    working day, by bracketing and bisection on the forward plan (`search`); the still is
//!    the smallest vessel that holds the charge, its steam space and the boiler water the run
//!    boils off (`vessel`), settled with the plan (`trial`).
//! 3. `rounded` buys the smallest catalogue sizes (`catalogue`) that the forward plan of the
//!    bought design still accepts: vessel and heat rating, tube, tub (the least water that stays
//!    under the warmest allowed temperature, by bisection), separator glassware.
//! 4. The bought design is planned forward once more; its headline numbers are the design's.
//!
//! Every search is capped (halvings, doublings, catalogue lengths) and a request that cannot be
//! met returns a field error saying why, never a panic.

pub mod catalogue;
mod design;
mod exact;
mod request;
mod rounded;
pub mod search;
mod trial;
pub mod vessel;

pub use catalogue::TubeStandard;
pub use design::*;
pub use request::{
    CoolingSupply, ElectricSupply, Figure, Harvest, HeatSupply, Limits, Quantity, SiteRequest, SizingErrors,
    SizingRequest,
};

use crate::plan::{Plan, plan};
use crate::scenario::CondenserKind;
use request::{Figures, Needs, num};
use trial::Trial;

/// Designs the smallest still, heat source, condenser and separator that meet a request, each
/// rounded up to a size that can be bought, and plans the bought design forward.
///
/// Returns every invalid field together; a request that is valid but cannot be met (the supply
/// cannot raise the crop's steam within the longest run, the tub cannot stay cool enough, the
/// harvest needs a still larger than the catalogue's largest...) returns one field error saying
/// which limit to relax. Method: bracketing and bisection on the forward plan (see the module
/// documentation); allowances are listed in the design with their sources.
///
/// ```
/// use stillroom_core::sizing::{size, SizingRequest};
/// // An invented farm: 40 kg of lavender a day at 300 m, propane, 15 °C water.
/// let request: SizingRequest = serde_json::from_str(r#"{
///     "crop": "lavender",
///     "harvest": { "kind": "per_day", "kg_per_day": 40, "days": 20 },
///     "site": { "altitude_m": 300 },
///     "heat": { "kind": "fuel", "fuel": "propane" },
///     "cooling": { "inlet_c": 15 },
///     "limits": { "max_charges_per_day": 2, "max_run_s": 10800, "warmest_cooling_water_c": 45 }
/// }"#).unwrap();
/// let d = size(&request).unwrap();
/// assert!(d.still.volume_m3.rounded >= d.still.volume_m3.exact);
/// assert!(d.planned.first_charge_time_s <= 10800.0);
/// assert!(d.still.capacity_kg >= d.charge_kg);
/// ```
pub fn size(request: &SizingRequest) -> Result<Design, SizingErrors> {
    let needs = request::check(request)?;
    probe(&needs, request)?;
    let exact = exact::solve(&needs, request)?;
    let bought = rounded::vessel_and_heat(&needs, request, &exact)?;
    finish(&needs, request, &exact, &bought)
}

/// Validates the assembled scenario once, so a bad base scenario is reported by its own fields.
fn probe(needs: &Needs, req: &SizingRequest) -> Result<(), SizingErrors> {
    let eq = exact::search_equipment(needs, req.limits.max_charges_per_day, needs.heat_cap_w);
    let charge_m3 = trial::charge_kg(needs, eq.charges) / needs.packing_kg_per_m3;
    let s = trial::scenario(needs, req, &eq, charge_m3 * 2.0, 10.0);
    crate::plan::validate(&s).map(|_| ()).map_err(|e| trial::request_errors(e, req))
}

/// Condenser, separator and the last forward plan of the bought design.
fn finish(
    needs: &Needs,
    req: &SizingRequest,
    exact: &exact::Exact,
    bought: &rounded::Bought,
) -> Result<Design, SizingErrors> {
    let t = &bought.trial;
    let needed_inner_m = rounded::tube_inner_diameter_m(&t.plan);
    let (tube, coils) = rounded::tube(req, needed_inner_m);
    let kind = req.cooling.condenser;
    let jacket =
        rounded::with_condenser(&t.scenario, kind, tube.outer_diameter_m, t.scenario.condenser.tub_water_kg);
    let (scenario, tub) = match kind {
        CondenserKind::CoilInTub => {
            let choice = rounded::tub(req, &jacket, &t.plan)?;
            (rounded::with_condenser(&jacket, kind, tube.outer_diameter_m, choice.water_kg), Some(choice))
        }
        CondenserKind::TubeInTube => (jacket, None),
    };
    let cooled = planned(&scenario, req)?;
    let (exact_sep_m3, glass) = rounded::separator(&cooled, needs.base.separator.residence_time_s)?;
    let mut scenario = scenario;
    scenario.separator.residence_time_s = glass.value / cooled.separator.distillate_flow_m3_per_s;
    let p = planned(&scenario, req)?;
    check_final(needs, req, exact.charges, t, &scenario, &p)?;
    let parts = Parts { tube, coils, needed_inner_m, tub, exact_sep_m3, glass };
    Ok(build(needs, req, exact, bought, &parts, scenario, &p))
}

fn planned(s: &crate::scenario::Scenario, req: &SizingRequest) -> Result<Plan, SizingErrors> {
    plan(s).map_err(|e| trial::request_errors(e, req))
}

/// The bought design's last plan must still meet every limit, the cooling water's included.
fn check_final(
    needs: &Needs,
    req: &SizingRequest,
    charges: u32,
    t: &Trial,
    s: &crate::scenario::Scenario,
    p: &Plan,
) -> Result<(), SizingErrors> {
    let last = Trial { plan: p.clone(), scenario: s.clone(), ..t.clone() };
    if let Some(miss) = trial::shortfall(needs, req, &last) {
        return Err(exact::shortfall_error(needs, req, charges, miss));
    }
    if let (CondenserKind::TubeInTube, Some(limit)) = (req.cooling.condenser, req.cooling.max_flow_kg_per_s) {
        let flow = p.condenser.cooling_water_flow_kg_per_s;
        if flow > limit {
            let mut f = Figures::default();
            let warmest = req.limits.warmest_cooling_water_c;
            let message = format!(
                "the jacket needs {} of cooling water to leave at {}: allow a warmer outflow, more flow, or a coil in a tub",
                f.fig(flow, Quantity::WaterFlowKgPerS, format!("{flow:.3} kg/s")),
                f.fig(warmest, Quantity::TemperatureC, format!("{} °C", num(warmest))),
            );
            return Err(f.error(
                "cooling.max_flow_kg_per_s",
                num(limit),
                format!("at least {flow:.3} kg/s"),
                message,
            ));
        }
    }
    if let Some(limit) = req.limits.max_water_per_run_kg {
        let used = p.water_use.total_kg;
        if used > limit {
            let mut f = Figures::default();
            let (feed, cooling) = (p.water_use.boiler_feed_kg, p.water_use.cooling_water_kg);
            let message = format!(
                "a charge uses {} of water ({} boiler feed, {} cooling): the cooling water carries the condenser's heat, so allow more water or a warmer tub",
                f.fig(used, Quantity::WaterKg, format!("{used:.0} kg")),
                f.fig(feed, Quantity::WaterKg, format!("{feed:.0} kg")),
                f.fig(cooling, Quantity::WaterKg, format!("{cooling:.0} kg")),
            );
            return Err(f.error(
                "limits.max_water_per_run_kg",
                num(limit),
                format!("at least {used:.0} kg"),
                message,
            ));
        }
    }
    Ok(())
}

/// The condenser and separator parts chosen for the bought design.
struct Parts {
    tube: &'static catalogue::Tube,
    coils: u32,
    needed_inner_m: f64,
    tub: Option<rounded::TubChoice>,
    exact_sep_m3: f64,
    glass: &'static catalogue::Size,
}

fn sized(exact: f64, size: &catalogue::Size) -> Purchase {
    Purchase { exact, rounded: size.value, label: size.label.to_string(), source: size.source.to_string() }
}

fn build(
    needs: &Needs,
    req: &SizingRequest,
    exact: &exact::Exact,
    bought: &rounded::Bought,
    parts: &Parts,
    scenario: crate::scenario::Scenario,
    p: &Plan,
) -> Design {
    let t = &bought.trial;
    let st = &t.stack;
    let area = std::f64::consts::PI * st.diameter_m * st.diameter_m / 4.0;
    let still = StillDesign {
        charge_volume_m3: t.charge_m3,
        packing_density_kg_per_m3: needs.packing_kg_per_m3,
        // The least vessel for the bought design's own boiler water.
        volume_m3: sized(
            vessel::smallest_vessel_m3(t.charge_m3, catalogue::VESSEL_HEIGHT_TO_DIAMETER, t.boiled_off_kg)
                .unwrap_or(exact.trial.stack.volume_m3),
            bought.vessel,
        ),
        diameter_m: st.diameter_m,
        height_m: st.height_m,
        height_to_diameter: catalogue::VESSEL_HEIGHT_TO_DIAMETER,
        water_depth_m: st.water_depth_m,
        grid_height_m: st.grid_height_m,
        charge_top_m: st.grid_height_m + t.charge_m3 / area,
        capacity_kg: st.charge_space_m3 * needs.packing_kg_per_m3,
        metal_mass_kg: scenario.still.metal_mass_kg,
    };
    let heat = HeatDesign {
        fuel: needs.fuel,
        appliance: needs.appliance,
        heat_input_w: sized(exact.heat_w, bought.heat),
        supply_limit_w: needs.heat_cap_w,
        current_a: needs.electric.map(|(v, phases)| {
            let factor = if phases == 3 { 3f64.sqrt() } else { 1.0 };
            bought.heat.value / (factor * v)
        }),
        specific_steam_rate_kg_per_h_per_kg: p.run.specific_steam_rate_kg_per_h_per_kg,
        steam_rate_kg_per_s: p.run.steam_rate_kg_per_s,
    };
    let boiler = BoilerDesign {
        boiled_off_kg: t.boiled_off_kg,
        heater_cover_kg: st.water_fill_kg - t.boiled_off_kg,
        fill_kg: st.water_fill_kg,
    };
    let tube = parts.tube;
    let condenser = CondenserDesign {
        kind: req.cooling.condenser,
        duty_w: p.condenser.duty_w,
        tube_inner_diameter_m: Purchase {
            // Each of n parallel coils carries 1/n of the steam: it needs 1/√n of the diameter.
            exact: parts.needed_inner_m / (parts.coils as f64).sqrt(),
            rounded: tube.inner_diameter_m(),
            label: if parts.coils > 1 {
                format!("{} coils of {}", parts.coils, tube.label)
            } else {
                tube.label.to_string()
            },
            source: tube.source.to_string(),
        },
        tube_outer_diameter_m: tube.outer_diameter_m,
        tube_length_m: p.condenser.tube_length_m,
        tube_to_buy_m: p.condenser.tube_length_m.ceil(),
        tub_volume_m3: parts.tub.as_ref().map(|c| sized(c.exact_volume_m3, c.tub)),
        tub_water_kg: parts.tub.as_ref().map(|c| Purchase {
            exact: c.exact_water_kg,
            rounded: c.water_kg,
            ..sized(0.0, c.tub)
        }),
        tub_end_c: p.condenser.tub_end_c,
        tub_refill_s: match (&parts.tub, req.cooling.max_flow_kg_per_s) {
            (Some(c), Some(flow)) => Some(c.water_kg / flow),
            _ => None,
        },
        cooling_water_flow_kg_per_s: p.condenser.cooling_water_flow_kg_per_s,
        distillate_outlet_c: p.condenser.distillate_outlet_c,
    };
    let sp = &p.separator;
    let separator = SeparatorDesign {
        volume_m3: sized(parts.exact_sep_m3, parts.glass),
        diameter_m: sp.diameter_m,
        height_m: sp.height_m,
        top_outlet_height_m: sp.top_outlet_height_m,
        gooseneck_height_m: sp.gooseneck_height_m,
        interface_height_m: sp.interface_height_m,
        residence_time_s: scenario.separator.residence_time_s,
    };
    Design {
        charges_per_day: exact.charges,
        charge_kg: t.charge_kg,
        still,
        heat,
        boiler,
        condenser,
        separator,
        planned: figures(needs, p),
        allowances: allowances(),
        cautions: cautions(needs, parts, exact.charges),
        scenario,
    }
}

fn figures(needs: &Needs, p: &Plan) -> PlannedFigures {
    let season = p.season.as_ref();
    let oil_per_day = season.map(|s| s.oil_kg).unwrap_or(p.yield_estimate.oil_kg.central);
    PlannedFigures {
        time_to_first_drop_s: p.run.time_to_first_drop_s,
        time_after_first_drop_s: p.run.time_after_first_drop_s,
        first_charge_time_s: p.run.total_time_s,
        later_charge_time_s: season.map(|s| s.later_charge_time_s).unwrap_or(p.run.total_time_s),
        day_time_s: season.map(|s| s.total_time_s).unwrap_or(p.run.total_time_s),
        fuel_unit: p.energy.fuel_unit.clone(),
        fuel_per_charge: p.energy.fuel_amount,
        fuel_per_day: season.map(|s| s.fuel_amount).unwrap_or(p.energy.fuel_amount),
        water_per_run_kg: p.water_use.total_kg,
        oil_per_charge_kg: p.yield_estimate.oil_kg.clone(),
        oil_per_day_kg: oil_per_day,
        oil_per_season_kg: needs.days.map(|d| oil_per_day * d as f64),
        hydrosol_per_charge_m3: p.run.hydrosol_volume_m3,
        warnings: p.warnings.clone(),
    }
}

fn allowance(name: &str, value: f64, unit: &str, source: &str) -> Allowance {
    Allowance { name: name.into(), value, unit: unit.into(), source: source.into() }
}

fn allowances() -> Vec<Allowance> {
    const NO_SOURCE: &str = "common practice, no source";
    vec![
        allowance(
            "steam space above the charge",
            vessel::STEAM_SPACE_SHARE,
            "share of the charge volume",
            NO_SOURCE,
        ),
        allowance("gap from the boiling water to the grid", vessel::GRID_CLEARANCE_M, "m", NO_SOURCE),
        allowance("water kept over the heater", vessel::HEATER_COVER_M, "m", NO_SOURCE),
        allowance("margin on the water boiled off", trial::BOILER_WATER_MARGIN, "share", NO_SOURCE),
        allowance(
            "boiling water density",
            vessel::BOILING_WATER_DENSITY_KG_PER_M3,
            "kg/m³",
            "saturated liquid at 100 °C, IAPWS-IF97",
        ),
        allowance(
            "steam velocity at the condenser inlet",
            rounded::TUBE_INLET_VELOCITY_M_PER_S,
            "m/s",
            "lower part of the 25-40 m/s of steam mains (Spirax Sarco, from memory); common practice, no source",
        ),
        allowance("tub filled to", rounded::TUB_FILL_SHARE, "share of its volume", NO_SOURCE),
        allowance(
            "vessel height over diameter",
            catalogue::VESSEL_HEIGHT_TO_DIAMETER,
            "",
            "a 200 L drum, ISO 15750-3 (from memory); common practice, no source",
        ),
    ]
}

fn cautions(needs: &Needs, parts: &Parts, charges: u32) -> Vec<String> {
    let mut c = vec![
        "A still must stay open to the air through its condenser: never seal it, and keep the vapour path free so it cannot build pressure. Follow local codes and licensed practice for anything under pressure.".to_string(),
        "Essential oils and their vapours burn: keep flames and sparks away from the receiver and the condenser's outlet.".to_string(),
        "Never let the boiler run dry: refill before the water falls to the heater.".to_string(),
        "A boiler that can be shut (a lid clamped down, a valve or tap on it) needs a pressure-relief valve rated for it; a still built open needs none, but nothing may close its vapour path.".to_string(),
        "Build with food-safe materials that suit the oil: no lead solder, no galvanised (zinc-coated) parts where distillate or steam touches, and no aluminium for oils that attack it; choose stainless steel, copper or glass.".to_string(),
        "Local building, gas, electrical and pressure-equipment codes and licensed practice come first, before anything in this design.".to_string(),
    ];
    match needs.fuel {
        crate::heat::Fuel::Electricity => c.push(
            "Have the elements and their circuit installed by a licensed electrician; many codes keep a continuous load under 80 % of the circuit's rating.".to_string(),
        ),
        crate::heat::Fuel::Firewood => {
            c.push("Keep the fire contained and the area around it clear; stoke for a steady boil.".to_string())
        }
        _ => c.push(
            "Gas burners, hoses and regulators must meet local gas codes; use them outdoors or with good ventilation."
                .to_string(),
        ),
    }
    if let Some(tub) = parts.tub.as_ref().filter(|_| charges > 1) {
        c.push(format!(
            "The tub ({}) is sized for one charge: refill it with cold water (or feed it) before each later charge.",
            tub.tub.label
        ));
    }
    if parts.coils > 1 {
        c.push(format!(
            "The steam is split over {} coils in parallel; give each the same length.",
            parts.coils
        ));
    }
    c
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::scenario::{OilComposition, OilPart, Scenario};

    /// An invented farm's request: 30 kg of lavender a day over propane.
    fn request() -> SizingRequest {
        serde_json::from_str(
            r#"{"crop":"lavender","harvest":{"kind":"per_day","kg_per_day":30},"site":{"altitude_m":300},
            "heat":{"kind":"fuel","fuel":"propane"},"cooling":{"inlet_c":15},
            "limits":{"max_charges_per_day":2,"max_run_s":14400,"warmest_cooling_water_c":45}}"#,
        )
        .unwrap()
    }

    #[test]
    fn the_design_carries_the_builders_cautions() {
        // Before: the design's cautions (what the command line and JSON show) had no pressure
        // relief, no materials and no general "codes first" line; the page had them alone.
        let d = size(&request()).unwrap();
        let all = d.cautions.join("\n");
        for words in [
            "pressure-relief valve",
            "lead solder",
            "galvanised",
            "aluminium",
            "food-safe",
            "codes and licensed practice come first",
            "never seal it",
            "ventilation",
        ] {
            assert!(all.contains(words), "cautions lack {words:?}: {all}");
        }
    }

    #[test]
    fn every_bad_field_is_reported_together() {
        let mut r = request();
        r.crop = Some("moonflower".into());
        r.harvest = Harvest::PerDay { kg_per_day: -5.0, days: None };
        r.site.altitude_m = f64::NAN;
        r.cooling.inlet_c = 20.0;
        r.limits.warmest_cooling_water_c = 18.0;
        r.limits.max_charges_per_day = 0;
        r.heat = HeatSupply::Electric {
            supply: ElectricSupply::Current { current_a: 16.0, voltage_v: 230.0, phases: Some(2) },
        };
        let e = size(&r).unwrap_err();
        for field in [
            "crop",
            "harvest.kg_per_day",
            "site.altitude_m",
            "limits.warmest_cooling_water_c",
            "limits.max_charges_per_day",
            "heat.supply.phases",
        ] {
            assert!(e.on(field).is_some(), "no error on {field}: {e}");
        }
        assert_eq!(e.on("site.altitude_m").unwrap().message, "must be a number");
        assert_eq!(e.on("limits.warmest_cooling_water_c").unwrap().min, Some(21.0));
    }

    #[test]
    fn electricity_is_not_a_fuel_to_burn() {
        let mut r = request();
        r.heat = HeatSupply::Fuel {
            fuel: crate::heat::Fuel::Electricity,
            appliance: None,
            max_heat_input_w: None,
        };
        assert!(size(&r).unwrap_err().on("heat.fuel").is_some());
    }

    #[test]
    fn unknown_fields_are_refused_inside_tagged_sections() {
        let text = r#"{"crop":"lavender","harvest":{"kind":"per_day","kg_per_day":30,"kg_per_week":5},
            "site":{"altitude_m":300},"heat":{"kind":"fuel","fuel":"propane"},"cooling":{"inlet_c":15},
            "limits":{"max_charges_per_day":2,"max_run_s":14400,"warmest_cooling_water_c":45}}"#;
        assert!(serde_json::from_str::<SizingRequest>(text).unwrap_err().to_string().contains("kg_per_week"));
    }

    #[test]
    fn an_own_oil_needs_its_packing_and_steam_rate() {
        let mut base = Scenario::default();
        base.charge.crop = None;
        base.charge.oil_content_percent = Some(0.8);
        base.run.rate_constant_per_min = Some(0.04);
        base.oil.composition = OilComposition::Mixture {
            parts: vec![
                OilPart { compound: "linalool".into(), mass_percent: 60.0 },
                OilPart { compound: "d-limonene".into(), mass_percent: 40.0 },
            ],
        };
        let mut r = request();
        r.crop = None;
        r.base = Some(base);
        let e = size(&r).unwrap_err();
        assert!(e.on("packing_density_kg_per_m3").is_some() && e.on("steam_rate_kg_per_h_per_kg").is_some());
        r.packing_density_kg_per_m3 = Some(150.0);
        r.steam_rate_kg_per_h_per_kg = Some(0.4);
        let d = size(&r).unwrap();
        assert!((d.still.charge_volume_m3 - d.charge_kg / 150.0).abs() < 1e-12);
        assert!(d.heat.specific_steam_rate_kg_per_h_per_kg >= 0.4 * (1.0 - 1e-9));
    }

    #[test]
    fn a_bad_base_field_is_named_under_base() {
        let mut base = Scenario::default();
        base.still.wall_u_w_per_m2_k = -1.0;
        let mut r = request();
        r.base = Some(base);
        assert!(size(&r).unwrap_err().on("base.still.wall_u_w_per_m2_k").is_some());
    }

    #[test]
    fn a_run_too_short_for_the_crop_says_how_long_it_must_be() {
        let mut r = request();
        r.limits.max_run_s = 1200.0;
        let e = size(&r).unwrap_err();
        let f = e.on("limits.max_run_s").unwrap_or_else(|| panic!("{e}"));
        assert!(f.valid.starts_with("at least"), "{}", f.valid);
    }

    #[test]
    fn a_harvest_beyond_the_largest_still_asks_for_more_charges() {
        let mut r = request();
        r.harvest = Harvest::PerDay { kg_per_day: 600.0, days: None };
        r.limits.max_charges_per_day = 1;
        r.limits.max_run_s = 86_400.0;
        let e = size(&r).unwrap_err();
        assert!(
            e.on("limits.max_charges_per_day").is_some() || e.on("heat.max_heat_input_w").is_some(),
            "{e}"
        );
    }

    #[test]
    fn water_and_flow_limits_are_held() {
        let mut r = request();
        r.limits.max_water_per_run_kg = Some(5.0);
        assert!(size(&r).unwrap_err().on("limits.max_water_per_run_kg").is_some());
        let mut r = request();
        r.cooling.condenser = CondenserKind::TubeInTube;
        r.cooling.max_flow_kg_per_s = Some(0.001);
        assert!(size(&r).unwrap_err().on("cooling.max_flow_kg_per_s").is_some());
    }

    /// Each figure's words stand in the message, in order, with a value that reads back as
    /// them: what a page needs to restate the message in other units.
    fn figures_stand_in(e: &SizingErrors) {
        let message = &e.errors[0].message;
        let mut from = 0;
        for f in &e.figures {
            let at =
                message[from..].find(&f.shown).unwrap_or_else(|| panic!("{:?} not in {message}", f.shown));
            from += at + f.shown.len();
            let number: f64 = f.shown.split(' ').next().unwrap().parse().unwrap();
            let in_words = match f.quantity {
                Quantity::HeatInputW | Quantity::ElectricPowerW => f.si / 1000.0,
                Quantity::SteamKgPerS | Quantity::SteamPerChargeKgPerSPerKg => f.si * 3600.0,
                Quantity::VolumeM3 => f.si * 1000.0,
                Quantity::MassKg | Quantity::WaterKg | Quantity::WaterFlowKgPerS | Quantity::TemperatureC => {
                    f.si
                }
            };
            assert!(
                (number - in_words).abs() <= 0.5 * 10f64.powi(-(decimals(&f.shown) as i32)) + 1e-9,
                "{f:?}"
            );
        }
    }

    fn decimals(shown: &str) -> usize {
        let n = shown.split(' ').next().unwrap();
        n.split_once('.').map_or(0, |(_, d)| d.len())
    }

    #[test]
    fn a_limit_that_cannot_be_met_lists_its_figures_for_other_units() {
        let mut r = request();
        r.limits.max_run_s = 1200.0;
        let e = size(&r).unwrap_err();
        assert!(e.figures.iter().any(|f| f.quantity == Quantity::MassKg), "{e:?}");
        figures_stand_in(&e);
        let mut r = request();
        r.limits.max_water_per_run_kg = Some(5.0);
        let e = size(&r).unwrap_err();
        assert_eq!(e.figures.len(), 3, "{e:?}");
        figures_stand_in(&e);
        let mut r = request();
        r.cooling.condenser = CondenserKind::TubeInTube;
        r.cooling.max_flow_kg_per_s = Some(0.001);
        let e = size(&r).unwrap_err();
        assert_eq!(e.figures[1].quantity, Quantity::TemperatureC, "{e:?}");
        figures_stand_in(&e);
        let mut r = request();
        r.heat = HeatSupply::Fuel {
            fuel: crate::heat::Fuel::Propane,
            appliance: None,
            max_heat_input_w: Some(5000.0),
        };
        let e = size(&r).unwrap_err();
        assert_eq!(e.figures[0].quantity, Quantity::HeatInputW, "{e:?}");
        figures_stand_in(&e);
    }

    #[test]
    fn a_season_harvest_is_spread_over_its_days() {
        let mut r = request();
        r.harvest = Harvest::PerSeason { kg_per_season: 600.0, days: 20 };
        let d = size(&r).unwrap();
        assert!((d.charge_kg * d.charges_per_day as f64 - 30.0).abs() < 1e-9);
        let season = d.planned.oil_per_season_kg.unwrap();
        assert!((season - 20.0 * d.planned.oil_per_day_kg).abs() < 1e-9);
    }
}
