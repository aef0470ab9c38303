//! Checking a scenario field by field, and filling in the defaults from the crop preset.

use super::{PressureFrom, Resolved, component_for};
use crate::atmosphere;
use crate::crops;
use crate::oil::Oil;
use crate::scenario::*;
use crate::water;

/// Validates every field of a scenario and resolves its defaults.
///
/// Returns all the invalid fields at once, each with its path, its value and its valid range,
/// so a page can show each message beside its own field.
///
/// ```
/// use stillroom_core::{plan::validate, scenario::Scenario};
/// let mut s = Scenario::default();
/// s.charge.plant_mass_kg = -3.0;
/// s.site.altitude_m = 9000.0;
/// let errors = validate(&s).unwrap_err();
/// assert!(errors.on("charge.plant_mass_kg").is_some());
/// assert!(errors.on("site.altitude_m").unwrap().valid.contains("6000"));
/// ```
pub fn validate(s: &Scenario) -> Result<Resolved, ScenarioErrors> {
    let mut ck = Checker::default();

    // Format version: a scenario built in code can carry any number; only the ones this build
    // reads are planned.
    if !(OLDEST_SCENARIO_VERSION..=SCENARIO_VERSION).contains(&s.version) {
        ck.push(
            "version",
            s.version.to_string(),
            if OLDEST_SCENARIO_VERSION == SCENARIO_VERSION {
                format!("version {SCENARIO_VERSION}")
            } else {
                format!("versions {OLDEST_SCENARIO_VERSION} to {SCENARIO_VERSION}")
            },
            "not a format version this build reads".into(),
        );
    }

    // Site.
    let altitude_ok = ck.range(
        "site.altitude_m",
        s.site.altitude_m,
        atmosphere::MIN_ALTITUDE_M,
        atmosphere::MAX_ALTITUDE_M,
        "m",
    );
    // Outdoor work: -20 °C to 50 °C covers the climates stills are run in (common practice).
    ck.range("site.ambient_temperature_c", s.site.ambient_temperature_c, -20.0, 50.0, "°C");
    let mut pressure = None;
    let mut pressure_from = PressureFrom::StandardAtmosphere;
    match &s.site.barometer {
        None => {
            if altitude_ok {
                pressure = atmosphere::standard_pressure_pa(s.site.altitude_m).ok();
            }
        }
        Some(b) => match b.reference {
            BarometerReference::Station => {
                pressure_from = PressureFrom::StationBarometer;
                // Station pressure: 40 kPa is about 7200 m (standard atmosphere), above any
                // farm; 110 kPa a valley below sea level on a high-pressure day.
                if ck.range("site.barometer.pressure_pa", b.pressure_pa, 40_000.0, 110_000.0, "Pa") {
                    pressure = Some(b.pressure_pa);
                }
            }
            BarometerReference::SeaLevel => {
                pressure_from = PressureFrom::SeaLevelBarometer;
                // The lowest and highest sea-level pressures on record are about 870 and 1084 hPa.
                if ck.range("site.barometer.pressure_pa", b.pressure_pa, 87_000.0, 108_500.0, "Pa")
                    && altitude_ok
                {
                    pressure =
                        atmosphere::station_pressure_from_sea_level_pa(b.pressure_pa, s.site.altitude_m).ok();
                }
            }
        },
    }
    let boiling_c = pressure.and_then(|p| water::saturation_temperature_k(p).ok()).map(|t| t - 273.15);

    // Crop.
    let crop = match &s.charge.crop {
        None => None,
        Some(id) if !ck.text("charge.crop", id, limits::MAX_ID_CHARS) => None,
        Some(id) => {
            let found = crops::CROPS.iter().find(|c| c.id == *id);
            if found.is_none() {
                ck.push("charge.crop", id.clone(), "a crop from the list".into(), "unknown crop".into());
            }
            found
        }
    };

    // Charge.
    // 50 g: a laboratory hydrodistillation charge; 100 t: beyond any field still (common
    // practice, no source).
    ck.range("charge.plant_mass_kg", s.charge.plant_mass_kg, 0.05, 100_000.0, "kg");
    let oil_content_percent = s.charge.oil_content_percent.or(crop.map(|c| c.oil_content_percent.typical));
    let mut oil_content_ok = false;
    match oil_content_percent {
        Some(v) => {
            // 0.001 %: well under rose (about 0.02 %, the poorest crop in the table); 100 %: the
            // oil is part of the charge (and with the water, below, no more than all of it).
            oil_content_ok = ck.range("charge.oil_content_percent", v, 0.001, 100.0, "%");
        }
        None => ck.push(
            "charge.oil_content_percent",
            "empty".into(),
            "more than 0, up to 100 %".into(),
            "give the oil content, or pick a crop".into(),
        ),
    }
    let moisture =
        s.charge.moisture_percent.map(|m| m / 100.0).or(crop.map(|c| c.moisture_fraction)).unwrap_or(0.6);
    let mut moisture_ok = true;
    if let Some(m) = s.charge.moisture_percent {
        moisture_ok = ck.range("charge.moisture_percent", m, 0.0, 95.0, "%");
    }
    // Oil and water are both parts of the charge: together they cannot exceed it.
    if let (Some(oil_pc), true, true) = (oil_content_percent, oil_content_ok, moisture_ok)
        && oil_pc + moisture * 100.0 > 100.0
    {
        let field = if s.charge.oil_content_percent.is_some() {
            "charge.oil_content_percent"
        } else {
            "charge.moisture_percent"
        };
        ck.push(
            field,
            format!("{} % oil + {} % water", fmt_num(oil_pc), fmt_num(moisture * 100.0)),
            "oil and water together at most 100 % of the charge".into(),
            "the oil and the water add up to more than the whole charge".into(),
        );
        ck.set_range(0.0, 100.0 - moisture * 100.0);
    }
    // Without a value: water and the crop's dry matter mixed by mass at the charge's moisture,
    // so a grower's own moisture figure moves the heat capacity (crops::charge_heat_capacity).
    let cp_charge = s.charge.heat_capacity_j_per_kg_k.unwrap_or_else(|| {
        let dry = crop.map_or(crops::DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K, |c| {
            c.dry_matter_heat_capacity_j_per_kg_k
        });
        crops::charge_heat_capacity_j_per_kg_k(moisture, dry)
    });
    // Dry plant matter (about 1200, from memory) up to water (4180) with some margin.
    ck.range("charge.heat_capacity_j_per_kg_k", cp_charge, 500.0, 4500.0, "J/(kg K)");
    let charge_temperature_c = s.charge.temperature_c.unwrap_or(s.site.ambient_temperature_c);
    // Frozen to sun-warmed material as loaded (common practice).
    ck.range("charge.temperature_c", charge_temperature_c, -10.0, 60.0, "°C");

    // Own compounds first: the oil may name them.
    let custom = check_custom_compounds(&mut ck, &s.custom_compounds);

    // Oil.
    let parts = check_composition(&mut ck, &s.oil.composition, crop, &custom);

    // Still.
    if let Some(v) = s.still.volume_m3 {
        // 1 L: a laboratory flask; 50 m³: past the largest field stills (common practice).
        ck.range("still.volume_m3", v, 0.001, 50.0, "m³");
    }
    let (still_volume_m3, still_volume_estimated) = match s.still.volume_m3 {
        Some(v) => (v, false),
        None => (estimated_still_volume_m3(s.charge.plant_mass_kg, crop), true),
    };
    // A shallow pan (0.3) to a tall column (5); outside that the wall-area formula means little.
    ck.range("still.height_to_diameter", s.still.height_to_diameter, 0.3, 5.0, "");
    // None (a still whose warming is not counted) up to a 20 t industrial vessel.
    ck.range("still.metal_mass_kg", s.still.metal_mass_kg, 0.0, 20_000.0, "kg");
    // Perfect lagging (0) to a bare wall in wind (about 25-50 W/(m² K), from memory).
    ck.range("still.wall_u_w_per_m2_k", s.still.wall_u_w_per_m2_k, 0.0, 50.0, "W/(m² K)");

    // Boiler.
    let appliance = s.boiler.appliance.unwrap_or(s.boiler.fuel.usual_appliance());
    if !appliance.accepts(s.boiler.fuel) {
        ck.push(
            "boiler.appliance",
            format!("{appliance:?}"),
            "an appliance that uses this fuel".into(),
            "this appliance cannot use the chosen fuel".into(),
        );
    }
    let efficiency = s.boiler.efficiency.unwrap_or(appliance.data().typical_efficiency);
    match s.boiler.steam_rate_kg_per_h {
        Some(rate) => {
            // 10 g/h: under a laboratory flask's boil-up; 20 t/h: an industrial boiler.
            ck.range("boiler.steam_rate_kg_per_h", rate, 0.01, 20_000.0, "kg/h");
            // A measured rate replaces the heat input, but a heat input is still a heat input:
            // never below zero.
            ck.range("boiler.heat_input_w", s.boiler.heat_input_w, 0.0, 5.0e6, "W");
        }
        None => {
            // 100 W: a laboratory heating mantle; 5 MW: a large industrial boiler.
            ck.range("boiler.heat_input_w", s.boiler.heat_input_w, 100.0, 5.0e6, "W");
        }
    }
    // 5 %: an open fire in wind; 100 %: an electric element.
    ck.range("boiler.efficiency", efficiency, 0.05, 1.0, "");
    // 100 g: a laboratory flask's water; 100 t: an industrial boiler.
    ck.range("boiler.usable_water_kg", s.boiler.usable_water_kg, 0.1, 100_000.0, "kg");
    let feed_c = s.boiler.feed_temperature_c.unwrap_or(s.site.ambient_temperature_c.max(1.0));
    let hot_limit = boiling_c.map(|b| b - 1.0).unwrap_or(90.0);
    // Liquid water, below boiling at the site (and below 90 °C, hotter feed is not tap water).
    ck.range("boiler.feed_temperature_c", feed_c, 1.0, hot_limit.min(90.0), "°C");

    // Run.
    // The first-order law never reaches 100 %; under 1 % is not a run.
    ck.range("run.target_recovery_percent", s.run.target_recovery_percent, 1.0, 99.9, "%");
    let k_crop = crop.map(|c| c.rate_constant_per_min);
    let k_per_min = s.run.rate_constant_per_min.or(k_crop.map(|k| k.typical));
    match k_per_min {
        Some(k) => {
            // Published first-order constants span about 0.002 to 0.3 per min (Milojević et al. 2013
            // and the crop table); the bounds are wider by a factor of four or so.
            ck.range("run.rate_constant_per_min", k, 0.0005, 1.0, "per min");
        }
        None => ck.push(
            "run.rate_constant_per_min",
            "empty".into(),
            "0.0005 to 1 per min".into(),
            "give the recovery rate, or pick a crop".into(),
        ),
    }
    // Up to a day between runs.
    ck.range("run.turnaround_min", s.run.turnaround_min, 0.0, 1440.0, "min");

    // Condenser.
    let c = &s.condenser;
    let t_d = c.distillate_outlet_c.or(crop.map(|c| c.distillate_temperature_c)).unwrap_or(30.0);
    // Liquid water that can still cool: just above freezing to 40 °C.
    let inlet_ok = ck.range("condenser.cooling_water_inlet_c", c.cooling_water_inlet_c, 0.5, 40.0, "°C");
    // The distillate must leave at least 1 K above the cooling water. When its temperature is
    // the crop's advice (not typed), the cooling water is what is too warm: said on the inlet.
    let inlet_too_warm = inlet_ok && c.distillate_outlet_c.is_none() && c.cooling_water_inlet_c + 1.0 > t_d;
    if inlet_too_warm {
        ck.push(
            "condenser.cooling_water_inlet_c",
            fmt_num(c.cooling_water_inlet_c),
            format!("at most {} °C, 1 K under the distillate's {} °C", fmt_num(t_d - 1.0), fmt_num(t_d)),
            format!("too warm to cool the distillate to the crop's {} °C", fmt_num(t_d)),
        );
        ck.set_range(0.5, t_d - 1.0);
    }
    if let (Some(b), true, false) = (boiling_c, inlet_ok, inlet_too_warm) {
        ck.range(
            "condenser.cooling_water_outlet_c",
            c.cooling_water_outlet_c,
            c.cooling_water_inlet_c + 1.0,
            b - 2.0,
            "°C",
        );
        ck.range(
            "condenser.distillate_outlet_c",
            t_d,
            (c.cooling_water_inlet_c + 1.0).max(5.0),
            b - 1.0,
            "°C",
        );
    }
    // Overall coefficients of water-cooled condensers and coolers run from tens to a few
    // thousand W/(m² K) (Incropera, typical ranges); 10 to 10 000 keeps both ends.
    ck.range("condenser.condensing_u_w_per_m2_k", c.condensing_u_w_per_m2_k, 10.0, 10_000.0, "W/(m² K)");
    ck.range("condenser.cooling_u_w_per_m2_k", c.cooling_u_w_per_m2_k, 10.0, 10_000.0, "W/(m² K)");
    // Capillary (2 mm) to a 100 mm pipe.
    ck.range("condenser.tube_outer_diameter_m", c.tube_outer_diameter_m, 0.002, 0.1, "m");
    if c.kind == CondenserKind::CoilInTub {
        // 1 kg: a bucket round a small coil; 100 t: a cooling pond.
        ck.range("condenser.tub_water_kg", c.tub_water_kg, 1.0, 100_000.0, "kg");
    }

    // Separator.
    let sp = &s.separator;
    // 10 µm to 2 mm: Stokes' law holds at the small end; API 421 designs for 150 µm.
    ck.range("separator.droplet_diameter_m", sp.droplet_diameter_m, 10e-6, 2e-3, "m");
    // 10 s to a day.
    ck.range("separator.residence_time_s", sp.residence_time_s, 10.0, 86_400.0, "s");
    // API 421 uses factors from about 1.07 to 1.74 (from memory); up to 3 for a rough build.
    ck.range("separator.turbulence_factor", sp.turbulence_factor, 1.0, 3.0, "");

    // Costs and season.
    ck.text("costs.currency", &s.costs.currency, limits::MAX_CURRENCY_CHARS);
    for (field, v) in [
        ("costs.fuel_price_per_unit", s.costs.fuel_price_per_unit),
        ("costs.plant_value_per_kg", s.costs.plant_value_per_kg),
        ("costs.labour_per_hour", s.costs.labour_per_hour),
    ] {
        if let Some(v) = v {
            // Prices: free up to a million per unit, in any currency.
            ck.range(field, v, 0.0, 1.0e6, "");
        }
    }
    if let Some(h) = s.season.harvest_kg {
        // Up to 10 000 t a season.
        ck.range("season.harvest_kg", h, 0.0, 1.0e7, "kg");
    }

    // The oil itself, once its parts are known to exist.
    let mut oil = None;
    let mut confidences = Vec::new();
    if !parts.is_empty()
        && ck.errors.iter().all(|e| !e.field.starts_with("oil") && !e.field.starts_with("custom"))
    {
        let mut comps = Vec::new();
        let mut weights = Vec::new();
        for (id, w) in &parts {
            // The index hands over the one compound, so the lookup inside is over one item.
            let own = custom.get(id).map(std::slice::from_ref).unwrap_or_default();
            if let Some((comp, conf)) = component_for(id, own) {
                comps.push(comp);
                weights.push(*w);
                confidences.push(conf);
            }
        }
        if !comps.is_empty() {
            oil = Some(Oil::from_mass_fractions(comps, &weights));
        }
    }
    if s.oil.non_ideal
        && let Some(ideal) = oil.take()
    {
        match ideal.clone().with_activity() {
            Ok(non_ideal) => oil = Some(non_ideal),
            Err(e) => {
                ck.push(
                    "oil.non_ideal",
                    "on".into(),
                    "an oil whose compounds all have UNIFAC groups".into(),
                    format!(
                        "activity coefficients cannot be computed for this oil ({e}); turn the setting off"
                    ),
                );
                oil = Some(ideal);
            }
        }
    }
    let oil_density = match (&oil, s.oil.density_kg_per_m3) {
        (_, Some(d)) => {
            // Light terpene oils (about 840) to heavy phenolic ones (about 1070) with margin.
            ck.range("oil.density_kg_per_m3", d, 600.0, 1500.0, "kg/m³");
            d
        }
        (Some(o), None) => match (&s.oil.composition, crop) {
            (OilComposition::CropTypical, Some(c)) => c.oil_density_kg_per_m3,
            _ => o.ideal_density_kg_per_m3(),
        },
        (None, None) => f64::NAN,
    };

    if !ck.errors.is_empty() {
        return Err(ScenarioErrors { errors: ck.errors });
    }
    let (Some(pressure_pa), Some(oil), Some(content), Some(k_min)) =
        (pressure, oil, oil_content_percent, k_per_min)
    else {
        return Err(ScenarioErrors {
            errors: vec![FieldError {
                field: "scenario".into(),
                value: String::new(),
                valid: String::new(),
                message: "the scenario is incomplete".into(),
                min: None,
                max: None,
            }],
        });
    };
    let content_fraction = content / 100.0;
    // Without the grower's own figure, the crop's field-to-field spread is the uncertainty.
    let oil_content_spread = match (s.charge.oil_content_percent, crop) {
        (None, Some(c)) => (c.oil_content_percent.low / 100.0, c.oil_content_percent.high / 100.0),
        _ => (content_fraction, content_fraction),
    };
    let k = k_min / 60.0;
    let rate_constant_spread = match k_crop {
        Some(kc) => (k * kc.low / kc.typical, k * kc.high / kc.typical),
        None => (k * 0.5, k * 1.5),
    };
    let (oil_content_spread, rate_constant_spread) =
        calibrated_spreads(s, (oil_content_spread, rate_constant_spread));
    Ok(Resolved {
        crop,
        pressure_pa,
        pressure_from,
        oil,
        oil_density_kg_per_m3: oil_density,
        oil_content_fraction: content_fraction,
        oil_content_spread,
        moisture_fraction: moisture,
        charge_heat_capacity_j_per_kg_k: cp_charge,
        charge_temperature_c,
        feed_temperature_c: feed_c,
        efficiency,
        rate_constant_per_s: k,
        rate_constant_spread,
        distillate_outlet_c: t_d,
        confidences,
        still_volume_m3,
        still_volume_estimated,
    })
}

/// Share of a still's body a charge fills when its volume is estimated: bodies are loaded to
/// about four fifths, leaving room under the lid for the steam to gather (common practice, no
/// source).
pub const ESTIMATED_FILL_SHARE: f64 = 0.8;
/// Packing density for an estimate without a crop, kg/m³: 175, the value most crop presets
/// share (16 of 33 rows of the crop table).
pub const ESTIMATED_PACKING_KG_PER_M3: f64 = 175.0;

/// A still volume estimated from the charge, m³: V = m / (ρ_packed · f), with the crop's packing
/// density ρ_packed (or 175 kg/m³ without a crop) and the fill share f = 0.8. So an unstated
/// volume never makes the wall losses vanish.
///
/// ```
/// use stillroom_core::plan::estimated_still_volume_m3;
/// // 14 kg at 175 kg/m³, filled to 80 %: 0.1 m³.
/// assert!((estimated_still_volume_m3(14.0, None) - 0.1).abs() < 1e-12);
/// ```
pub fn estimated_still_volume_m3(plant_mass_kg: f64, crop: Option<&crops::Crop>) -> f64 {
    let packing = crop.map_or(ESTIMATED_PACKING_KG_PER_M3, |c| c.charge_density_kg_per_m3);
    plant_mass_kg / (packing * ESTIMATED_FILL_SHARE)
}

/// Mixture shares are rescaled to 100 % only within this tolerance: 98 to 102 % is an analysis
/// that rounds; further off, a share is missing or mistyped and the user should say so.
pub const MIXTURE_TOTAL_TOLERANCE_PERCENT: f64 = 2.0;

/// The oil's parts as (id, weight), with every error on its own field.
fn check_composition(
    ck: &mut Checker,
    composition: &OilComposition,
    crop: Option<&crops::Crop>,
    custom: &CustomIndex,
) -> Vec<(String, f64)> {
    let mut parts = Vec::new();
    match composition {
        OilComposition::CropTypical => match crop {
            Some(c) => parts = c.composition.iter().map(|(id, w)| (id.to_string(), *w)).collect(),
            None => ck.push(
                "oil.composition",
                "crop typical".into(),
                "a crop, a compound or a mixture".into(),
                "pick a crop to use its typical oil, or give the compounds".into(),
            ),
        },
        OilComposition::Compound { id } => {
            if !ck.text("oil.composition", id, limits::MAX_ID_CHARS) {
                // Too long to be any id: reported as such.
            } else if custom.exists(id) {
                parts.push((id.clone(), 1.0));
            } else {
                ck.push(
                    "oil.composition",
                    id.clone(),
                    "a compound from the list".into(),
                    "unknown compound".into(),
                );
            }
        }
        OilComposition::Mixture { parts: given } => {
            if given.is_empty() {
                ck.push(
                    "oil.composition",
                    "no compounds".into(),
                    "one or more compounds".into(),
                    "add at least one compound".into(),
                );
            }
            // Counted before anything else: a pasted list of thousands is refused at once.
            if given.len() > limits::MAX_MIXTURE_PARTS {
                ck.push(
                    "oil.composition.parts",
                    format!("{} compounds", given.len()),
                    format!("at most {} compounds", limits::MAX_MIXTURE_PARTS),
                    format!("too many compounds: at most {}", limits::MAX_MIXTURE_PARTS),
                );
                return parts;
            }
            let before = ck.errors.len();
            for (i, part) in given.iter().enumerate() {
                let field = format!("oil.composition.parts.{i}");
                let compound = format!("{field}.compound");
                if ck.text(&compound, &part.compound, limits::MAX_ID_CHARS) && !custom.exists(&part.compound)
                {
                    ck.push(
                        &compound,
                        part.compound.clone(),
                        "a compound from the list".into(),
                        "unknown compound".into(),
                    );
                }
                // 0.001 %: the smallest share a GC report gives (common practice, no source).
                if ck.range(&format!("{field}.mass_percent"), part.mass_percent, 0.001, 100.0, "%") {
                    parts.push((part.compound.clone(), part.mass_percent));
                }
            }
            let total: f64 = given.iter().map(|p| p.mass_percent).sum();
            if ck.errors.len() == before && (total - 100.0).abs() > MIXTURE_TOTAL_TOLERANCE_PERCENT {
                ck.push(
                    "oil.composition",
                    format!("{} %", fmt_num(total)),
                    format!(
                        "shares adding up to 100 % (within {} to {} % they are rescaled)",
                        fmt_num(100.0 - MIXTURE_TOTAL_TOLERANCE_PERCENT),
                        fmt_num(100.0 + MIXTURE_TOTAL_TOLERANCE_PERCENT)
                    ),
                    format!("the shares add up to {} %, not 100 %", fmt_num(total)),
                );
                ck.set_range(
                    100.0 - MIXTURE_TOTAL_TOLERANCE_PERCENT,
                    100.0 + MIXTURE_TOTAL_TOLERANCE_PERCENT,
                );
            }
        }
    }
    parts
}

/// Checks the user's own compounds and indexes them by id.
fn check_custom_compounds<'a>(ck: &mut Checker, list: &'a [CustomCompound]) -> CustomIndex<'a> {
    if list.len() > limits::MAX_CUSTOM_COMPOUNDS {
        ck.push(
            "custom_compounds",
            format!("{} compounds", list.len()),
            format!("at most {} compounds", limits::MAX_CUSTOM_COMPOUNDS),
            format!("too many compounds of your own: at most {}", limits::MAX_CUSTOM_COMPOUNDS),
        );
        return CustomIndex::new(&[]);
    }
    let index = CustomIndex::new(list);
    for (i, c) in list.iter().enumerate() {
        let f = format!("custom_compounds.{i}");
        let id_field = format!("{f}.id");
        if c.id.trim().is_empty() {
            ck.push(&id_field, "empty".into(), "a short name".into(), "give the compound an id".into());
        } else if !ck.text(&id_field, &c.id, limits::MAX_ID_CHARS) {
            // Too long to be any id: reported as such.
        } else if crate::compounds::find(&c.id).is_some() {
            ck.push(
                &id_field,
                c.id.clone(),
                "an id not used by the library".into(),
                "the library already has a compound with this id; give yours another".into(),
            );
        } else if let Some(first) = index.position(&c.id)
            && first < i
        {
            ck.push(
                &id_field,
                c.id.clone(),
                "an id used once".into(),
                format!("custom_compounds.{first} already has this id"),
            );
        }
        ck.text(&format!("{f}.name"), &c.name, limits::MAX_NAME_CHARS);
        // Essential-oil compounds weigh 0.07 to 0.3 kg/mol; 0.02 (neon) to 1 leave room for others.
        // Liquids from a light ether (about 600) to heavy halogenated oils (about 2000 kg/m³).
        // Solubility: insoluble (0) up to 100 kg/m³, past the most soluble oil alcohols.
        ck.range(&format!("{f}.molar_mass_kg_per_mol"), c.molar_mass_kg_per_mol, 0.02, 1.0, "kg/mol");
        ck.range(
            &format!("{f}.liquid_density_kg_per_m3"),
            c.liquid_density_kg_per_m3,
            500.0,
            2000.0,
            "kg/m³",
        );
        ck.range(
            &format!("{f}.water_solubility_kg_per_m3"),
            c.water_solubility_kg_per_m3,
            0.0,
            100.0,
            "kg/m³",
        );
        check_law(ck, &format!("{f}.vapour_pressure"), &c.vapour_pressure);
    }
    index
}

/// A vapour-pressure law must rise with temperature over a real range and give a usable
/// pressure near 100 °C. Each fault goes on its own field; when the law as a whole is unusable a
/// summary also goes on the law (`….vapour_pressure`), where a form shows the law as one block.
fn check_law(ck: &mut Checker, f: &str, law: &CustomVapourPressure) {
    let before = ck.errors.len();
    // -200 to 500 °C: a law fitted wholly outside it says nothing about a still at 60-110 °C.
    let temperature = |ck: &mut Checker, name: &str, t_c: f64| {
        let field = format!("{f}.{name}");
        if t_c.is_finite() && t_c < -273.15 {
            ck.push(
                &field,
                fmt_num(t_c),
                "-200 to 500 °C".into(),
                "is below absolute zero (-273.15 °C)".into(),
            );
            ck.set_range(-200.0, 500.0);
            false
        } else {
            ck.range(&field, t_c, -200.0, 500.0, "°C")
        }
    };
    match *law {
        CustomVapourPressure::Antoine { a, b, c, temperature_unit, t_min_c, t_max_c, .. } => {
            // Published Antoine sets: A of order 5-25 in any log base and unit, B of order
            // 1e3-1e4 K, C within a few hundred kelvin; the bounds are an order wider.
            ck.range(&format!("{f}.a"), a, -100.0, 100.0, "");
            if b.is_finite() && b <= 0.0 {
                ck.push(
                    &format!("{f}.b"),
                    fmt_num(b),
                    "more than 0".into(),
                    "B must be positive: with B at or below zero the vapour pressure does not rise with temperature"
                        .into(),
                );
                ck.set_range(0.0, 1e5);
            } else {
                ck.range(&format!("{f}.b"), b, 0.0, 1e5, "");
            }
            let c_ok = ck.range(&format!("{f}.c"), c, -500.0, 500.0, "");
            let lo = temperature(ck, "t_min_c", t_min_c);
            let hi = temperature(ck, "t_max_c", t_max_c);
            if lo && hi && t_min_c >= t_max_c {
                ck.push(
                    &format!("{f}.t_max_c"),
                    fmt_num(t_max_c),
                    format!("above the lower limit, {} °C", fmt_num(t_min_c)),
                    "the range is empty".into(),
                );
            }
            // T + C must stay positive over the range, or the law has a pole inside it.
            let t_low = match temperature_unit {
                TemperatureUnit::Kelvin => t_min_c + 273.15,
                TemperatureUnit::Celsius => t_min_c,
            };
            if c_ok && lo && t_low + c <= 0.0 {
                ck.push(
                    &format!("{f}.c"),
                    fmt_num(c),
                    format!("more than {}", fmt_num(-t_low)),
                    "T + C must stay above zero over the range, or the law breaks down inside it".into(),
                );
            }
        }
        CustomVapourPressure::TwoPoints { t1_c, p1_pa, t2_c, p2_pa } => {
            let t1 = temperature(ck, "t1_c", t1_c);
            let t2 = temperature(ck, "t2_c", t2_c);
            // 1 mPa: under any oil compound's pressure at room temperature; 100 bar: above every
            // organic compound's critical pressure.
            let p1 = ck.range(&format!("{f}.p1_pa"), p1_pa, 1e-3, 1e7, "Pa");
            let p2 = ck.range(&format!("{f}.p2_pa"), p2_pa, 1e-3, 1e7, "Pa");
            if t1 && t2 && (t2_c - t1_c).abs() < 1.0 {
                ck.push(
                    &format!("{f}.t2_c"),
                    fmt_num(t2_c),
                    "at least 1 K from the first point".into(),
                    "the two points are too close to define a line".into(),
                );
            } else if t1 && t2 && p1 && p2 && (p2_pa - p1_pa) * (t2_c - t1_c) <= 0.0 {
                ck.push(
                    f,
                    format!(
                        "{} Pa at {} °C, {} Pa at {} °C",
                        fmt_num(p1_pa),
                        fmt_num(t1_c),
                        fmt_num(p2_pa),
                        fmt_num(t2_c)
                    ),
                    "the warmer point at the higher pressure".into(),
                    "the vapour pressure must rise with temperature".into(),
                );
            }
        }
    }
    if ck.errors.len() == before {
        match law.to_vapour_pressure() {
            None => ck.push(
                f,
                "two points".into(),
                "two different temperatures, pressures above 0".into(),
                "the two points do not define a line".into(),
            ),
            Some(vp) => {
                let p100 = vp.pressure_pa(373.15);
                if !(p100.is_finite() && p100 > 0.0 && p100 < 1e7) {
                    ck.push(
                        f,
                        fmt_num(p100),
                        "a finite vapour pressure near 100 °C".into(),
                        "these coefficients do not give a usable vapour pressure near 100 °C; check the units".into(),
                    );
                }
            }
        }
    } else if !ck.errors[before..].iter().any(|e| e.field == f) {
        let first = ck.errors[before].field.clone();
        ck.push(
            f,
            String::new(),
            "a law rising with temperature".into(),
            format!("this law cannot be used: see {first}"),
        );
    }
}

/// 1σ to the 10th/90th percentile of a normal distribution (z = 1.2816), as in `ranges.rs`.
const SIGMA_TO_P90: f64 = 1.2816;

/// The spreads of the oil content (fraction) and the reference constant (per second) from the
/// grower's own runs while the charge still holds their values: the calibration's 1σ taken to
/// P10-P90 (z = 1.2816), kept above zero; the crop's or the typed figure's otherwise.
fn calibrated_spreads(s: &Scenario, crop: ((f64, f64), (f64, f64))) -> ((f64, f64), (f64, f64)) {
    let Some(c) = s.calibration.as_ref().filter(|c| crate::calibration::holds(s, c)) else { return crop };
    let around = |central: f64, sd: Option<f64>, fallback: (f64, f64)| match sd {
        Some(sd) if sd.is_finite() && sd >= 0.0 && central > 0.0 => {
            let half = (SIGMA_TO_P90 * sd).min(0.9 * central);
            (central - half, central + half)
        }
        _ => fallback,
    };
    let content =
        around(c.oil_content_percent / 100.0, c.oil_content_spread_percent.map(|v| v / 100.0), crop.0);
    let k = if c.rate_constant_runs > 0 {
        around(c.rate_constant_per_min / 60.0, c.rate_constant_spread_per_min.map(|v| v / 60.0), crop.1)
    } else {
        crop.1
    };
    (content, k)
}

#[cfg(test)]
mod tests {
    use crate::plan::plan;
    use crate::scenario::Scenario;

    /// Cooling water warmer than the crop's advised distillate temperature is the cooling
    /// water's fault: the error names the inlet, not the distillate field the grower left empty.
    #[test]
    fn warm_cooling_water_is_reported_on_the_inlet() {
        let mut s = Scenario::default();
        s.condenser.distillate_outlet_c = None;
        s.condenser.cooling_water_inlet_c = 39.0;
        s.condenser.cooling_water_outlet_c = 45.0;
        let errors = plan(&s).unwrap_err();
        assert!(errors.on("condenser.cooling_water_inlet_c").is_some(), "{errors:?}");
        assert!(errors.on("condenser.distillate_outlet_c").is_none(), "{errors:?}");
    }

    /// A measured steam rate far too small for the charge is said on the steam rate field.
    #[test]
    fn too_little_measured_steam_is_reported_on_the_steam_rate() {
        let mut s = Scenario::default();
        s.boiler.steam_rate_kg_per_h = Some(0.01);
        let errors = plan(&s).unwrap_err();
        assert!(errors.on("boiler.steam_rate_kg_per_h").is_some(), "{errors:?}");
        assert!(errors.on("boiler.heat_input_w").is_none(), "{errors:?}");
    }
}
