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

    // Site.
    let altitude_ok = ck.range(
        "site.altitude_m",
        s.site.altitude_m,
        atmosphere::MIN_ALTITUDE_M,
        atmosphere::MAX_ALTITUDE_M,
        "m",
    );
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
        Some(id) => {
            let found = crops::CROPS.iter().find(|c| c.id == *id);
            if found.is_none() {
                ck.push("charge.crop", id.clone(), "a crop from the list".into(), "unknown crop".into());
            }
            found
        }
    };

    // Charge.
    ck.positive("charge.plant_mass_kg", s.charge.plant_mass_kg, 100_000.0, "kg");
    let oil_content_percent = s.charge.oil_content_percent.or(crop.map(|c| c.oil_content_percent.typical));
    match oil_content_percent {
        Some(v) => {
            ck.positive("charge.oil_content_percent", v, 100.0, "%");
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
    if let Some(m) = s.charge.moisture_percent {
        ck.range("charge.moisture_percent", m, 0.0, 95.0, "%");
    }
    // Without a value: water and the crop's dry matter mixed by mass at the charge's moisture,
    // so a grower's own moisture figure moves the heat capacity (crops::charge_heat_capacity).
    let cp_charge = s.charge.heat_capacity_j_per_kg_k.unwrap_or_else(|| {
        let dry = crop.map_or(crops::DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K, |c| {
            c.dry_matter_heat_capacity_j_per_kg_k
        });
        crops::charge_heat_capacity_j_per_kg_k(moisture, dry)
    });
    ck.range("charge.heat_capacity_j_per_kg_k", cp_charge, 500.0, 4500.0, "J/(kg K)");
    let charge_temperature_c = s.charge.temperature_c.unwrap_or(s.site.ambient_temperature_c);
    ck.range("charge.temperature_c", charge_temperature_c, -10.0, 60.0, "°C");

    // Oil.
    let mut parts: Vec<(String, f64)> = Vec::new();
    match &s.oil.composition {
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
            if compound_exists(id, &s.custom_compounds) {
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
            for (i, part) in given.iter().enumerate() {
                let field = format!("oil.composition.parts.{i}");
                if !compound_exists(&part.compound, &s.custom_compounds) {
                    ck.push(
                        &format!("{field}.compound"),
                        part.compound.clone(),
                        "a compound from the list".into(),
                        "unknown compound".into(),
                    );
                }
                if ck.positive(&format!("{field}.mass_percent"), part.mass_percent, 100.0, "%") {
                    parts.push((part.compound.clone(), part.mass_percent));
                }
            }
            let total: f64 = given.iter().map(|p| p.mass_percent).filter(|v| v.is_finite()).sum();
            if total > 100.5 {
                ck.push(
                    "oil.composition",
                    fmt_num(total),
                    "shares adding up to 100 % or less".into(),
                    "the shares add up to more than 100 %".into(),
                );
            }
        }
    }
    for (i, c) in s.custom_compounds.iter().enumerate() {
        let f = format!("custom_compounds.{i}");
        if c.id.trim().is_empty() {
            ck.push(
                &format!("{f}.id"),
                "empty".into(),
                "a short name".into(),
                "give the compound an id".into(),
            );
        }
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
        match c.vapour_pressure.to_vapour_pressure() {
            None => ck.push(
                &format!("{f}.vapour_pressure"),
                "two points".into(),
                "two different temperatures, pressures above 0".into(),
                "the two points do not define a line".into(),
            ),
            Some(vp) => {
                let p100 = vp.pressure_pa(373.15);
                if !(p100.is_finite() && p100 > 0.0 && p100 < 1e7) {
                    ck.push(
                        &format!("{f}.vapour_pressure"),
                        fmt_num(p100),
                        "a finite vapour pressure near 100 °C".into(),
                        "these coefficients do not give a usable vapour pressure near 100 °C; check the units".into(),
                    );
                }
                if vp.t_min_k.partial_cmp(&vp.t_max_k) != Some(std::cmp::Ordering::Less) {
                    ck.push(
                        &format!("{f}.vapour_pressure"),
                        fmt_num(vp.t_min_k - 273.15),
                        "a lower limit under the upper".into(),
                        "the range is empty".into(),
                    );
                }
            }
        }
    }

    // Still.
    if let Some(v) = s.still.volume_m3 {
        ck.positive("still.volume_m3", v, 50.0, "m³");
    }
    ck.range("still.height_to_diameter", s.still.height_to_diameter, 0.3, 5.0, "");
    ck.range("still.metal_mass_kg", s.still.metal_mass_kg, 0.0, 20_000.0, "kg");
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
            ck.positive("boiler.steam_rate_kg_per_h", rate, 20_000.0, "kg/h");
        }
        None => {
            ck.range("boiler.heat_input_w", s.boiler.heat_input_w, 100.0, 5.0e6, "W");
        }
    }
    ck.range("boiler.efficiency", efficiency, 0.05, 1.0, "");
    ck.positive("boiler.usable_water_kg", s.boiler.usable_water_kg, 100_000.0, "kg");
    let feed_c = s.boiler.feed_temperature_c.unwrap_or(s.site.ambient_temperature_c.max(1.0));
    let hot_limit = boiling_c.map(|b| b - 1.0).unwrap_or(90.0);
    ck.range("boiler.feed_temperature_c", feed_c, 1.0, hot_limit.min(90.0), "°C");

    // Run.
    ck.range("run.target_recovery_percent", s.run.target_recovery_percent, 1.0, 99.9, "%");
    let k_crop = crop.map(|c| c.rate_constant_per_min);
    let k_per_min = s.run.rate_constant_per_min.or(k_crop.map(|k| k.typical));
    match k_per_min {
        Some(k) => {
            ck.range("run.rate_constant_per_min", k, 0.0005, 1.0, "per min");
        }
        None => ck.push(
            "run.rate_constant_per_min",
            "empty".into(),
            "0.0005 to 1 per min".into(),
            "give the recovery rate, or pick a crop".into(),
        ),
    }
    ck.range("run.turnaround_min", s.run.turnaround_min, 0.0, 1440.0, "min");

    // Condenser.
    let c = &s.condenser;
    let t_d = c.distillate_outlet_c.or(crop.map(|c| c.distillate_temperature_c)).unwrap_or(30.0);
    ck.range("condenser.cooling_water_inlet_c", c.cooling_water_inlet_c, 0.5, 40.0, "°C");
    if let Some(b) = boiling_c {
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
    ck.range("condenser.condensing_u_w_per_m2_k", c.condensing_u_w_per_m2_k, 10.0, 10_000.0, "W/(m² K)");
    ck.range("condenser.cooling_u_w_per_m2_k", c.cooling_u_w_per_m2_k, 10.0, 10_000.0, "W/(m² K)");
    ck.range("condenser.tube_outer_diameter_m", c.tube_outer_diameter_m, 0.002, 0.1, "m");
    if c.kind == CondenserKind::CoilInTub {
        ck.positive("condenser.tub_water_kg", c.tub_water_kg, 100_000.0, "kg");
    }

    // Separator.
    let sp = &s.separator;
    ck.range("separator.droplet_diameter_m", sp.droplet_diameter_m, 10e-6, 2e-3, "m");
    ck.range("separator.residence_time_s", sp.residence_time_s, 10.0, 86_400.0, "s");
    ck.range("separator.turbulence_factor", sp.turbulence_factor, 1.0, 3.0, "");

    // Costs and season.
    for (field, v) in [
        ("costs.fuel_price_per_unit", s.costs.fuel_price_per_unit),
        ("costs.plant_value_per_kg", s.costs.plant_value_per_kg),
        ("costs.labour_per_hour", s.costs.labour_per_hour),
    ] {
        if let Some(v) = v {
            ck.range(field, v, 0.0, 1.0e6, "");
        }
    }
    if let Some(h) = s.season.harvest_kg {
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
            if let Some((comp, conf)) = component_for(id, &s.custom_compounds) {
                comps.push(comp);
                weights.push(*w);
                confidences.push(conf);
            }
        }
        if !comps.is_empty() {
            oil = Some(Oil::from_mass_fractions(comps, &weights));
        }
    }
    let oil_density = match (&oil, s.oil.density_kg_per_m3) {
        (_, Some(d)) => {
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
    })
}
