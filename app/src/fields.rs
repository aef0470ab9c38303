//! The form's number fields: what each one is called, the unit the grower types in, how that
//! converts to the core's SI field, and back. This is the page's edge: the only place where
//! units change.

use crate::units::{FIREWOOD_STACKED_KG_PER_M3, PROPANE_LIQUID_KG_PER_M3, UnitSystem};
use stillroom_core::heat::Fuel;
use stillroom_core::scenario::{
    Barometer, BarometerReference, CustomCompound, CustomVapourPressure, Scenario,
};

/// How a field's text maps onto the scenario.
pub struct NumField {
    /// Stable key: element ids, storage and tests use it.
    pub key: &'static str,
    /// The core's dotted field path, to match its validation errors.
    pub path: &'static str,
    pub label: &'static str,
    pub unit: &'static str,
    /// A one-line hint under the field.
    pub hint: &'static str,
    /// Whether leaving the field empty falls back to a default (shown as a placeholder).
    pub optional: bool,
    /// Shown-unit value -> SI value.
    pub to_si: fn(f64) -> f64,
    /// SI value -> shown-unit value.
    pub from_si: fn(f64) -> f64,
    pub get: fn(&Scenario) -> Option<f64>,
    pub set: fn(&mut Scenario, Option<f64>),
}

/// Plain SI conversions shared by the page's two forms (this one and the first-still form).
pub(crate) mod convert {
    pub(crate) fn same(v: f64) -> f64 {
        v
    }
    pub(crate) fn kilo(v: f64) -> f64 {
        v * 1e3
    }
    pub(crate) fn per_kilo(v: f64) -> f64 {
        v / 1e3
    }
    pub(crate) fn minutes(v: f64) -> f64 {
        v * 60.0
    }
    pub(crate) fn per_minutes(v: f64) -> f64 {
        v / 60.0
    }
}
use convert::{kilo, minutes, per_kilo, per_minutes, same};

fn hecto(v: f64) -> f64 {
    v * 1e2
}
fn per_hecto(v: f64) -> f64 {
    v / 1e2
}
fn milli(v: f64) -> f64 {
    v * 1e-3
}
fn per_milli(v: f64) -> f64 {
    v * 1e3
}
fn micro(v: f64) -> f64 {
    v * 1e-6
}
fn per_micro(v: f64) -> f64 {
    v * 1e6
}
fn percent(v: f64) -> f64 {
    v / 100.0
}
fn per_percent(v: f64) -> f64 {
    v * 100.0
}

/// A field's unit in US customary, with its conversions to and from SI (NIST SP 811 factors,
/// [`crate::units::sp811`]).
pub struct Alt {
    pub unit: &'static str,
    pub to_si: fn(f64) -> f64,
    pub from_si: fn(f64) -> f64,
}

use crate::units::sp811;

fn ft(v: f64) -> f64 {
    v * sp811::FT_M
}
fn per_ft(v: f64) -> f64 {
    v / sp811::FT_M
}
fn lb(v: f64) -> f64 {
    v * sp811::LB_KG
}
fn per_lb(v: f64) -> f64 {
    v / sp811::LB_KG
}
fn fahrenheit(v: f64) -> f64 {
    crate::units::f_to_c(v)
}
fn per_fahrenheit(v: f64) -> f64 {
    crate::units::c_to_f(v)
}
fn gal_m3(v: f64) -> f64 {
    v * sp811::GAL_M3
}
fn per_gal_m3(v: f64) -> f64 {
    v / sp811::GAL_M3
}
/// Gallons of water to kg, water taken as 1 kg per litre as the metric field does.
fn gal_kg(v: f64) -> f64 {
    v * sp811::GAL_M3 * 1e3
}
fn per_gal_kg(v: f64) -> f64 {
    v / (sp811::GAL_M3 * 1e3)
}
fn inch(v: f64) -> f64 {
    v * sp811::IN_M
}
fn per_inch(v: f64) -> f64 {
    v / sp811::IN_M
}
fn psi(v: f64) -> f64 {
    v * sp811::PSI_PA
}
fn per_psi(v: f64) -> f64 {
    v / sp811::PSI_PA
}
fn inhg(v: f64) -> f64 {
    v * sp811::INHG_PA
}
fn per_inhg(v: f64) -> f64 {
    v / sp811::INHG_PA
}
fn btu_h(v: f64) -> f64 {
    v * sp811::BTU_H_W
}
fn per_btu_h(v: f64) -> f64 {
    v / sp811::BTU_H_W
}
fn btu_u(v: f64) -> f64 {
    v * sp811::BTU_H_FT2_F_W_M2_K
}
fn per_btu_u(v: f64) -> f64 {
    v / sp811::BTU_H_FT2_F_W_M2_K
}
/// A weather-report pressure in either unit people read it in: sea-level pressures lie between
/// about 25.7 and 32.0 inHg, or 870 and 1085 hPa, so a number under 100 is inHg and one above
/// is hPa, in both systems.
fn report_pressure(v: f64) -> f64 {
    if v.abs() < 100.0 { inhg(v) } else { hecto(v) }
}

/// The US customary unit of a field, where it differs from the metric one.
pub fn us_alt(key: &str) -> Option<Alt> {
    let alt = |unit, to_si, from_si| Some(Alt { unit, to_si, from_si });
    match key {
        "altitude" => alt("ft", ft, per_ft),
        "station_pressure" => alt("inHg", inhg, per_inhg),
        "sea_level_pressure" => alt("inHg", report_pressure, per_inhg),
        "ambient" | "cooling_in" | "cooling_out" | "distillate_out" | "own_t1" | "own_t2" => {
            alt("°F", fahrenheit, per_fahrenheit)
        }
        "plant_mass" | "metal_mass" | "harvest" => alt("lb", lb, per_lb),
        "steam_rate" => alt("lb/h", lb, per_lb),
        "still_volume" => alt("gal", gal_m3, per_gal_m3),
        "boiler_water" | "tub_water" => alt("gal", gal_kg, per_gal_kg),
        "wall_u" | "condensing_u" => alt("BTU/(h ft² °F)", btu_u, per_btu_u),
        "heat_input" => alt("BTU/h", btu_h, per_btu_h),
        "tube_od" => alt("in", inch, per_inch),
        "plant_value" => alt("per lb", per_lb, lb),
        "own_p1" | "own_p2" => alt("psi", psi, per_psi),
        _ => None,
    }
}

/// What a field's text is read in: the system of units and, for the one field whose unit
/// follows it, the fuel (a fuel's price is per the unit that fuel is sold by). Every
/// conversion between a field's text and the scenario goes through one of these.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub struct FieldUnits {
    pub system: UnitSystem,
    pub fuel: Fuel,
}

impl FieldUnits {
    pub fn new(system: UnitSystem, fuel: Fuel) -> FieldUnits {
        FieldUnits { system, fuel }
    }

    /// The units a scenario's own values are shown in under a system (its own fuel).
    pub fn of(system: UnitSystem, scenario: &Scenario) -> FieldUnits {
        FieldUnits::new(system, scenario.boiler.fuel)
    }
}

/// The key of the fuel's price: the field whose unit follows the fuel.
pub const FUEL_PRICE_KEY: &str = "fuel_price";

/// The fuel's price in metric: per the core's sales unit (`Fuel::data().unit`).
fn per_core_sales_unit(fuel: Fuel) -> &'static str {
    match fuel {
        Fuel::Propane | Fuel::Firewood => "per kg",
        Fuel::NaturalGas => "per m³",
        Fuel::Electricity => "per kWh",
    }
}

/// The unit a US grower buys a fuel by, and how many of the core's sales units it holds:
/// propane by the gallon of liquid at 60 °F ([`PROPANE_LIQUID_KG_PER_M3`] kg/m³), natural gas by
/// the therm as a utility bills it (on the gas's gross heating value,
/// [`crate::units::therms_per_m3_of_gas`], as [`crate::units::fuel`] counts therms), firewood
/// by the cord (stacked at [`FIREWOOD_STACKED_KG_PER_M3`]), electricity by the kWh. SP 811
/// factors ([`sp811`]). The same densities as the fuel amounts shown, so price times amount is
/// the cost shown.
pub fn us_sales_unit(fuel: Fuel) -> (&'static str, f64) {
    match fuel {
        Fuel::Propane => ("per gal", sp811::GAL_M3 * PROPANE_LIQUID_KG_PER_M3),
        Fuel::NaturalGas => ("per therm", 1.0 / crate::units::therms_per_m3_of_gas()),
        Fuel::Firewood => ("per cord", sp811::CORD_M3 * FIREWOOD_STACKED_KG_PER_M3),
        Fuel::Electricity => ("per kWh", 1.0),
    }
}

impl NumField {
    /// The unit the field is typed in.
    pub fn unit_in(&self, units: FieldUnits) -> &'static str {
        if self.key == FUEL_PRICE_KEY {
            return match units.system {
                UnitSystem::Metric => per_core_sales_unit(units.fuel),
                UnitSystem::UsCustomary => us_sales_unit(units.fuel).0,
            };
        }
        match (units.system, us_alt(self.key)) {
            (UnitSystem::UsCustomary, Some(a)) => a.unit,
            _ => self.unit,
        }
    }

    /// Typed value -> SI.
    pub fn to_si_in(&self, units: FieldUnits, v: f64) -> f64 {
        match (units.system, us_alt(self.key)) {
            // A price per US unit over the core units that unit holds.
            (UnitSystem::UsCustomary, _) if self.key == FUEL_PRICE_KEY => v / us_sales_unit(units.fuel).1,
            (UnitSystem::UsCustomary, Some(a)) => (a.to_si)(v),
            _ if self.key == "sea_level_pressure" => report_pressure(v),
            _ => (self.to_si)(v),
        }
    }

    /// SI -> the value shown.
    pub fn from_si_in(&self, units: FieldUnits, si: f64) -> f64 {
        match (units.system, us_alt(self.key)) {
            (UnitSystem::UsCustomary, _) if self.key == FUEL_PRICE_KEY => si * us_sales_unit(units.fuel).1,
            (UnitSystem::UsCustomary, Some(a)) => (a.from_si)(si),
            _ => (self.from_si)(si),
        }
    }
}

fn barometer_of(s: &mut Scenario) -> &mut Barometer {
    s.site.barometer.get_or_insert_with(Barometer::default)
}

/// Id of the grower's own compound in the scenario (the page offers one).
pub const OWN_COMPOUND_ID: &str = "own";

fn own_of(s: &mut Scenario) -> &mut CustomCompound {
    if s.custom_compounds.is_empty() {
        s.custom_compounds.push(CustomCompound {
            id: OWN_COMPOUND_ID.to_string(),
            name: String::new(),
            molar_mass_kg_per_mol: 0.15,
            liquid_density_kg_per_m3: 900.0,
            water_solubility_kg_per_m3: 0.0,
            vapour_pressure: CustomVapourPressure::TwoPoints {
                t1_c: 25.0,
                p1_pa: 30.0,
                t2_c: 200.0,
                p2_pa: 101_325.0,
            },
        });
    }
    &mut s.custom_compounds[0]
}

/// The two measured points of the own compound, as (t1 °C, p1 Pa, t2 °C, p2 Pa).
fn own_points(s: &Scenario) -> Option<(f64, f64, f64, f64)> {
    match s.custom_compounds.first()?.vapour_pressure {
        CustomVapourPressure::TwoPoints { t1_c, p1_pa, t2_c, p2_pa } => Some((t1_c, p1_pa, t2_c, p2_pa)),
        _ => None,
    }
}

fn set_own_point(s: &mut Scenario, which: usize, v: f64) {
    let c = own_of(s);
    let (mut t1, mut p1, mut t2, mut p2) = match c.vapour_pressure {
        CustomVapourPressure::TwoPoints { t1_c, p1_pa, t2_c, p2_pa } => (t1_c, p1_pa, t2_c, p2_pa),
        _ => (25.0, 30.0, 200.0, 101_325.0),
    };
    match which {
        0 => t1 = v,
        1 => p1 = v,
        2 => t2 = v,
        _ => p2 = v,
    }
    c.vapour_pressure = CustomVapourPressure::TwoPoints { t1_c: t1, p1_pa: p1, t2_c: t2, p2_pa: p2 };
}

/// Every number field, in page order.
pub const FIELDS: &[NumField] = &[
    NumField {
        key: "altitude",
        path: "site.altitude_m",
        label: "Altitude of the still",
        unit: "m",
        hint: "Height above sea level, from a map or GPS.",
        optional: false,
        to_si: same,
        from_si: same,
        get: |s| Some(s.site.altitude_m),
        set: |s, v| s.site.altitude_m = v.unwrap_or_default(),
    },
    NumField {
        key: "station_pressure",
        path: "site.barometer.pressure_pa",
        label: "Local air pressure",
        unit: "kPa",
        hint: "Absolute pressure read at the still (not the weather-report value).",
        optional: false,
        to_si: kilo,
        from_si: per_kilo,
        get: |s| {
            s.site
                .barometer
                .as_ref()
                .filter(|b| b.reference == BarometerReference::Station)
                .map(|b| b.pressure_pa)
        },
        set: |s, v| {
            let b = barometer_of(s);
            b.reference = BarometerReference::Station;
            b.pressure_pa = v.unwrap_or_default();
        },
    },
    NumField {
        key: "sea_level_pressure",
        path: "site.barometer.pressure_pa",
        label: "Weather-report pressure",
        unit: "hPa",
        hint: "The sea-level value a forecast gives: hPa (1013) or inHg (29.92), either is read.",
        optional: false,
        to_si: hecto,
        from_si: per_hecto,
        get: |s| {
            s.site
                .barometer
                .as_ref()
                .filter(|b| b.reference == BarometerReference::SeaLevel)
                .map(|b| b.pressure_pa)
        },
        set: |s, v| {
            let b = barometer_of(s);
            b.reference = BarometerReference::SeaLevel;
            b.pressure_pa = v.unwrap_or_default();
        },
    },
    NumField {
        key: "ambient",
        path: "site.ambient_temperature_c",
        label: "Air temperature",
        unit: "°C",
        hint: "Also the plant's and the fill water's temperature unless given.",
        optional: false,
        to_si: same,
        from_si: same,
        get: |s| Some(s.site.ambient_temperature_c),
        set: |s, v| s.site.ambient_temperature_c = v.unwrap_or_default(),
    },
    NumField {
        key: "plant_mass",
        path: "charge.plant_mass_kg",
        label: "Plant in the still",
        unit: "kg",
        hint: "The charge, weighed as loaded.",
        optional: false,
        to_si: same,
        from_si: same,
        get: |s| Some(s.charge.plant_mass_kg),
        set: |s, v| s.charge.plant_mass_kg = v.unwrap_or_default(),
    },
    NumField {
        key: "oil_content",
        path: "charge.oil_content_percent",
        label: "Oil content",
        unit: "% w/w",
        hint: "Empty: the crop's typical value.",
        optional: true,
        to_si: same,
        from_si: same,
        get: |s| s.charge.oil_content_percent,
        set: |s, v| s.charge.oil_content_percent = v,
    },
    NumField {
        key: "oil_density",
        path: "oil.density_kg_per_m3",
        label: "Oil density",
        unit: "g/mL",
        hint: "Empty: from the crop or the compounds.",
        optional: true,
        to_si: per_milli,
        from_si: milli,
        get: |s| s.oil.density_kg_per_m3,
        set: |s, v| s.oil.density_kg_per_m3 = v,
    },
    NumField {
        key: "still_volume",
        path: "still.volume_m3",
        label: "Still volume",
        unit: "L",
        hint: "Working volume of the body that holds the plant.",
        optional: true,
        to_si: milli,
        from_si: per_milli,
        get: |s| s.still.volume_m3,
        set: |s, v| s.still.volume_m3 = v,
    },
    NumField {
        key: "metal_mass",
        path: "still.metal_mass_kg",
        label: "Metal of the still",
        unit: "kg",
        hint: "Body, lid and column that the steam must warm.",
        optional: false,
        to_si: same,
        from_si: same,
        get: |s| Some(s.still.metal_mass_kg),
        set: |s, v| s.still.metal_mass_kg = v.unwrap_or_default(),
    },
    NumField {
        key: "wall_u",
        path: "still.wall_u_w_per_m2_k",
        label: "Wall heat loss",
        unit: "W/(m² K)",
        hint: "About 10 for bare metal, under 1 when lagged.",
        optional: false,
        to_si: same,
        from_si: same,
        get: |s| Some(s.still.wall_u_w_per_m2_k),
        set: |s, v| s.still.wall_u_w_per_m2_k = v.unwrap_or_default(),
    },
    NumField {
        key: "heat_input",
        path: "boiler.heat_input_w",
        label: "Burner or element power",
        unit: "kW",
        hint: "The rating of the heat source.",
        optional: false,
        to_si: kilo,
        from_si: per_kilo,
        get: |s| Some(s.boiler.heat_input_w),
        set: |s, v| s.boiler.heat_input_w = v.unwrap_or_default(),
    },
    NumField {
        key: "efficiency",
        path: "boiler.efficiency",
        label: "Heat reaching the water",
        unit: "%",
        hint: "Empty: typical for the fuel.",
        optional: true,
        to_si: percent,
        from_si: per_percent,
        get: |s| s.boiler.efficiency,
        set: |s, v| s.boiler.efficiency = v,
    },
    NumField {
        key: "steam_rate",
        path: "boiler.steam_rate_kg_per_h",
        label: "Measured steam rate",
        unit: "kg/h",
        hint: "Optional: overrides power and efficiency.",
        optional: true,
        to_si: same,
        from_si: same,
        get: |s| s.boiler.steam_rate_kg_per_h,
        set: |s, v| s.boiler.steam_rate_kg_per_h = v,
    },
    NumField {
        key: "boiler_water",
        path: "boiler.usable_water_kg",
        label: "Usable boiler water",
        unit: "L",
        hint: "What it can give before the heater is exposed (1 L ≈ 1 kg).",
        optional: false,
        to_si: same,
        from_si: same,
        get: |s| Some(s.boiler.usable_water_kg),
        set: |s, v| s.boiler.usable_water_kg = v.unwrap_or_default(),
    },
    NumField {
        key: "target",
        path: "run.target_recovery_percent",
        label: "Target recovery",
        unit: "%",
        hint: "Share of the oil the plant can give; the last few % take longest.",
        optional: false,
        to_si: same,
        from_si: same,
        get: |s| Some(s.run.target_recovery_percent),
        set: |s, v| s.run.target_recovery_percent = v.unwrap_or_default(),
    },
    NumField {
        key: "rate_constant",
        path: "run.rate_constant_per_min",
        label: "Recovery rate",
        unit: "per min",
        hint: "Empty: the crop's value. Fit it from your own runs.",
        optional: true,
        to_si: same,
        from_si: same,
        get: |s| s.run.rate_constant_per_min,
        set: |s, v| s.run.rate_constant_per_min = v,
    },
    NumField {
        key: "cooling_in",
        path: "condenser.cooling_water_inlet_c",
        label: "Cooling water in",
        unit: "°C",
        hint: "Tap, well or stream temperature.",
        optional: false,
        to_si: same,
        from_si: same,
        get: |s| Some(s.condenser.cooling_water_inlet_c),
        set: |s, v| s.condenser.cooling_water_inlet_c = v.unwrap_or_default(),
    },
    NumField {
        key: "cooling_out",
        path: "condenser.cooling_water_outlet_c",
        label: "Cooling water out",
        unit: "°C",
        hint: "For a tub: the warmest you let it get.",
        optional: false,
        to_si: same,
        from_si: same,
        get: |s| Some(s.condenser.cooling_water_outlet_c),
        set: |s, v| s.condenser.cooling_water_outlet_c = v.unwrap_or_default(),
    },
    NumField {
        key: "distillate_out",
        path: "condenser.distillate_outlet_c",
        label: "Distillate temperature",
        unit: "°C",
        hint: "Empty: the crop's advice (warm for oils that set).",
        optional: true,
        to_si: same,
        from_si: same,
        get: |s| s.condenser.distillate_outlet_c,
        set: |s, v| s.condenser.distillate_outlet_c = v,
    },
    NumField {
        key: "tub_water",
        path: "condenser.tub_water_kg",
        label: "Water in the tub",
        unit: "L",
        hint: "Coil-in-tub condensers only.",
        optional: false,
        to_si: same,
        from_si: same,
        get: |s| Some(s.condenser.tub_water_kg),
        set: |s, v| s.condenser.tub_water_kg = v.unwrap_or_default(),
    },
    NumField {
        key: "condensing_u",
        path: "condenser.condensing_u_w_per_m2_k",
        label: "Coil heat transfer",
        unit: "W/(m² K)",
        hint: "Condensing section: about 570-1200 in a tub.",
        optional: false,
        to_si: same,
        from_si: same,
        get: |s| Some(s.condenser.condensing_u_w_per_m2_k),
        set: |s, v| s.condenser.condensing_u_w_per_m2_k = v.unwrap_or_default(),
    },
    NumField {
        key: "tube_od",
        path: "condenser.tube_outer_diameter_m",
        label: "Tube outside diameter",
        unit: "mm",
        hint: "12.7 mm is ½ inch.",
        optional: false,
        to_si: milli,
        from_si: per_milli,
        get: |s| Some(s.condenser.tube_outer_diameter_m),
        set: |s, v| s.condenser.tube_outer_diameter_m = v.unwrap_or_default(),
    },
    NumField {
        key: "droplet",
        path: "separator.droplet_diameter_m",
        label: "Smallest droplet to catch",
        unit: "µm",
        hint: "150 µm is the usual gravity-separator basis.",
        optional: false,
        to_si: micro,
        from_si: per_micro,
        get: |s| Some(s.separator.droplet_diameter_m),
        set: |s, v| s.separator.droplet_diameter_m = v.unwrap_or_default(),
    },
    NumField {
        key: "residence",
        path: "separator.residence_time_s",
        label: "Time in the separator",
        unit: "min",
        hint: "How long the distillate stands before it leaves.",
        optional: false,
        to_si: minutes,
        from_si: per_minutes,
        get: |s| Some(s.separator.residence_time_s),
        set: |s, v| s.separator.residence_time_s = v.unwrap_or_default(),
    },
    NumField {
        key: "fuel_price",
        path: "costs.fuel_price_per_unit",
        label: "Fuel price",
        // Follows the fuel: see `NumField::unit_in`.
        unit: "per unit",
        hint: "Per the unit shown, which follows the fuel chosen. Optional.",
        optional: true,
        to_si: same,
        from_si: same,
        get: |s| s.costs.fuel_price_per_unit,
        set: |s, v| s.costs.fuel_price_per_unit = v,
    },
    NumField {
        key: "plant_value",
        path: "costs.plant_value_per_kg",
        label: "Value of the plant",
        unit: "per kg",
        hint: "Optional.",
        optional: true,
        to_si: same,
        from_si: same,
        get: |s| s.costs.plant_value_per_kg,
        set: |s, v| s.costs.plant_value_per_kg = v,
    },
    NumField {
        key: "labour",
        path: "costs.labour_per_hour",
        label: "Labour",
        unit: "per hour",
        hint: "Optional.",
        optional: true,
        to_si: same,
        from_si: same,
        get: |s| s.costs.labour_per_hour,
        set: |s, v| s.costs.labour_per_hour = v,
    },
    NumField {
        key: "harvest",
        path: "season.harvest_kg",
        label: "Season's harvest",
        unit: "kg",
        hint: "Optional: gives charges, hours, fuel and water for the season.",
        optional: true,
        to_si: same,
        from_si: same,
        get: |s| s.season.harvest_kg,
        set: |s, v| s.season.harvest_kg = v,
    },
    NumField {
        key: "own_molar_mass",
        path: "custom_compounds.0.molar_mass_kg_per_mol",
        label: "Molar mass",
        unit: "g/mol",
        hint: "From the supplier's sheet or a handbook.",
        optional: false,
        to_si: milli,
        from_si: per_milli,
        get: |s| s.custom_compounds.first().map(|c| c.molar_mass_kg_per_mol),
        set: |s, v| own_of(s).molar_mass_kg_per_mol = v.unwrap_or_default(),
    },
    NumField {
        key: "own_density",
        path: "custom_compounds.0.liquid_density_kg_per_m3",
        label: "Density",
        unit: "g/mL",
        hint: "Of the liquid near 20 °C.",
        optional: false,
        to_si: per_milli,
        from_si: milli,
        get: |s| s.custom_compounds.first().map(|c| c.liquid_density_kg_per_m3),
        set: |s, v| own_of(s).liquid_density_kg_per_m3 = v.unwrap_or_default(),
    },
    NumField {
        key: "own_solubility",
        path: "custom_compounds.0.water_solubility_kg_per_m3",
        label: "Solubility in water",
        unit: "g/L",
        hint: "Near 25 °C; 0 if unknown.",
        optional: false,
        to_si: same,
        from_si: same,
        get: |s| s.custom_compounds.first().map(|c| c.water_solubility_kg_per_m3),
        set: |s, v| own_of(s).water_solubility_kg_per_m3 = v.unwrap_or_default(),
    },
    NumField {
        key: "own_t1",
        path: "custom_compounds.0.vapour_pressure",
        label: "First point: temperature",
        unit: "°C",
        hint: "A measured vapour pressure, e.g. at 25 °C.",
        optional: false,
        to_si: same,
        from_si: same,
        get: |s| own_points(s).map(|p| p.0),
        set: |s, v| set_own_point(s, 0, v.unwrap_or_default()),
    },
    NumField {
        key: "own_p1",
        path: "custom_compounds.0.vapour_pressure.p1_pa",
        label: "First point: vapour pressure",
        unit: "kPa",
        hint: "",
        optional: false,
        to_si: kilo,
        from_si: per_kilo,
        get: |s| own_points(s).map(|p| p.1),
        set: |s, v| set_own_point(s, 1, v.unwrap_or_default()),
    },
    NumField {
        key: "own_t2",
        path: "custom_compounds.0.vapour_pressure.t2_c",
        label: "Second point: temperature",
        unit: "°C",
        hint: "The normal boiling point is a good second point.",
        optional: false,
        to_si: same,
        from_si: same,
        get: |s| own_points(s).map(|p| p.2),
        set: |s, v| set_own_point(s, 2, v.unwrap_or_default()),
    },
    NumField {
        key: "own_p2",
        path: "custom_compounds.0.vapour_pressure.p2_pa",
        label: "Second point: vapour pressure",
        unit: "kPa",
        hint: "101.325 kPa at the normal boiling point.",
        optional: false,
        to_si: kilo,
        from_si: per_kilo,
        get: |s| own_points(s).map(|p| p.3),
        set: |s, v| set_own_point(s, 3, v.unwrap_or_default()),
    },
];

/// Keys of the own-compound fields: used only when the compound has a name.
pub const OWN_COMPOUND_KEYS: &[&str] =
    &["own_molar_mass", "own_density", "own_solubility", "own_t1", "own_p1", "own_t2", "own_p2"];

/// Looks a field up by key.
pub fn field(key: &str) -> &'static NumField {
    FIELDS.iter().find(|f| f.key == key).unwrap_or(&FIELDS[0])
}

/// Why a field's text could not be used.
#[derive(Debug, Clone, PartialEq)]
pub enum TextError {
    Empty,
    NotANumber,
}

/// A number read from a field's text, with a note when the reading could be taken two ways.
#[derive(Debug, Clone, PartialEq)]
pub struct Reading {
    pub value: f64,
    /// Shown beside the field, e.g. "read as 1500".
    pub note: Option<String>,
}

/// Reads a number the way people type it, by one rule a person can predict:
///
/// - spaces (also no-break and thin spaces) are thousands gaps: "1 500" is 1500;
/// - the Unicode minus "−" and a leading "+" are signs: "−3" is -3;
/// - with both "," and ".", the last one is the decimal mark and the other groups thousands:
///   "1.500,5" and "1,500.5" are 1500.5;
/// - several of the same mark group thousands: "1,500,000" and "1.500.000" are 1500000;
/// - one "," is a decimal comma ("1,5" is 1.5), except a comma followed by exactly three digits
///   after one to three digits that are not just "0" ("1,500"): that is taken as thousands,
///   1500, and noted, since it could be meant as 1.5;
/// - one "." is a decimal point; "1.500" (the same look) is 1.5 and noted likewise.
///
/// Every reading that could be meant another way comes back with a note ("read as 1500").
pub fn read_number(text: &str) -> Result<Option<Reading>, TextError> {
    let spaced = text.trim();
    if spaced.is_empty() {
        return Ok(None);
    }
    let groups: Vec<&str> = spaced.split(char::is_whitespace).filter(|g| !g.is_empty()).collect();
    // A gap not in front of a group of three digits is read, but said.
    let odd_gap =
        groups.len() > 1 && groups[1..].iter().any(|g| g.split([',', '.']).next().map_or(0, str::len) != 3);
    let t: String = groups.concat().replace('\u{2212}', "-");
    let (sign, body) = match t.strip_prefix('-') {
        Some(rest) => ("-", rest),
        None => ("", t.strip_prefix('+').unwrap_or(&t)),
    };
    let commas = body.matches(',').count();
    let dots = body.matches('.').count();
    let mut ambiguous = false;
    let plain: String = match (commas, dots) {
        (0, 0) => body.to_string(),
        (c, d) if c > 0 && d > 0 => {
            let decimal = if body.rfind(',') > body.rfind('.') { ',' } else { '.' };
            let group = if decimal == ',' { '.' } else { ',' };
            let (int, frac) = body.rsplit_once(decimal).unwrap_or((body, ""));
            if frac.contains(group) {
                return Err(TextError::NotANumber);
            }
            format!("{}.{frac}", grouped(int, group)?)
        }
        (c, 0) if c > 1 => grouped(body, ',')?,
        (0, d) if d > 1 => grouped(body, '.')?,
        (1, 0) => {
            let (int, frac) = body.split_once(',').unwrap_or((body, ""));
            if looks_grouped(int, frac) {
                ambiguous = true;
                format!("{int}{frac}")
            } else {
                format!("{int}.{frac}")
            }
        }
        _ => {
            let (int, frac) = body.split_once('.').unwrap_or((body, ""));
            ambiguous = looks_grouped(int, frac);
            body.to_string()
        }
    };
    if plain.is_empty()
        || !plain.chars().all(|c| c.is_ascii_digit() || matches!(c, '.' | 'e' | 'E' | '-' | '+'))
    {
        return Err(TextError::NotANumber);
    }
    match json_number(sign, &plain).and_then(|n| serde_json::from_str::<f64>(&n).ok()) {
        Some(v) if v.is_finite() => {
            let note = (ambiguous || odd_gap).then(|| format!("read as {}", crate::units::plain_full(v)));
            Ok(Some(Reading { value: v, note }))
        }
        _ => Err(TextError::NotANumber),
    }
}

/// `plain` (digits, at most one ".", an exponent) in JSON's number grammar, which the page's
/// JSON reader then reads: no leading zeros, a digit on each side of the point. The page reads
/// typed numbers with the JSON reader it already carries rather than `str::parse`, whose exact
/// algorithm brings its own table of powers of five (about 9 kB gzip); the two agree for every
/// number of up to 15 significant figures with a decimal exponent within ±22 (`tests` below
/// holds it), beyond which serde_json may round the last bit differently.
fn json_number(sign: &str, plain: &str) -> Option<String> {
    let (mantissa, exponent) = match plain.find(['e', 'E']) {
        Some(at) => (&plain[..at], Some(&plain[at + 1..])),
        None => (plain, None),
    };
    let (int, frac) = mantissa.split_once('.').unwrap_or((mantissa, ""));
    let digits = |t: &str| t.chars().all(|c| c.is_ascii_digit());
    if (int.is_empty() && frac.is_empty()) || !digits(int) || !digits(frac) {
        return None;
    }
    let int = match int.trim_start_matches('0') {
        "" => "0",
        kept => kept,
    };
    let mut text = format!("{sign}{int}");
    if !frac.is_empty() {
        text = format!("{text}.{frac}");
    }
    if let Some(e) = exponent {
        let unsigned = e.strip_prefix(['+', '-']).unwrap_or(e);
        if unsigned.is_empty() || !digits(unsigned) {
            return None;
        }
        text = format!("{text}e{e}");
    }
    Some(text)
}

/// "1,500": one to three digits, not a lone zero, then exactly three digits.
fn looks_grouped(int: &str, frac: &str) -> bool {
    (1..=3).contains(&int.len())
        && int.chars().all(|c| c.is_ascii_digit())
        && int != "0"
        && frac.len() == 3
        && frac.chars().all(|c| c.is_ascii_digit())
}

/// "1,500,000" with `mark` grouping thousands: every group after the first has three digits.
fn grouped(body: &str, mark: char) -> Result<String, TextError> {
    let mut parts = body.split(mark);
    let first = parts.next().unwrap_or("");
    if first.is_empty() || first.len() > 3 || parts.clone().any(|g| g.len() != 3) {
        return Err(TextError::NotANumber);
    }
    Ok(body.replace(mark, ""))
}

/// The value of a field's text (see [`read_number`]), without the note.
pub fn parse_number(text: &str) -> Result<Option<f64>, TextError> {
    read_number(text).map(|r| r.map(|r| r.value))
}

/// The text a field shows for a scenario value (in the field's unit, without needless digits).
pub fn text_for(field: &NumField, scenario: &Scenario) -> String {
    text_for_in(field, scenario, UnitSystem::Metric)
}

/// The text a field shows for a scenario value in a system of units: the SI value as saved
/// (nine figures) where the field's unit is the core's, and four figures where it is converted
/// (US customary), as a unit switch writes it.
pub fn text_for_in(field: &NumField, scenario: &Scenario, system: UnitSystem) -> String {
    let units = FieldUnits::of(system, scenario);
    let metric = FieldUnits::of(UnitSystem::Metric, scenario);
    match (field.get)(scenario) {
        None => String::new(),
        Some(si) if converted(field, si, metric, units) => rounded_text(field, si, units),
        Some(si) => text_in(field, si, units),
    }
}

/// The text a unit switch writes into a field for its exact SI value: the typed text itself
/// when the field reads the same number in both units (a percentage, a density), otherwise
/// [`rounded_text`] in the new unit ("33.07" lb for 15 kg). The exact SI value stays pinned
/// behind it while the text is unchanged (see `AppState::set_units`), so the plan does not move.
pub fn switch_text(field: &NumField, si: f64, from: FieldUnits, to: FieldUnits, typed: &str) -> String {
    if converted(field, si, from, to) { rounded_text(field, si, to) } else { typed.to_string() }
}

/// An SI value in the field's unit to four significant figures, for reading: what a field shows
/// for a value converted from the unit it was given in.
pub fn rounded_text(field: &NumField, si: f64, units: FieldUnits) -> String {
    let w = field.from_si_in(units, si);
    if w == 0.0 || !w.is_finite() {
        return crate::units::plain(w);
    }
    let scale = 10f64.powi(3 - w.abs().log10().floor() as i32);
    crate::units::plain((w * scale).round() / scale)
}

/// Whether the field shows `si` as another number in `to` than in `from`.
fn converted(field: &NumField, si: f64, from: FieldUnits, to: FieldUnits) -> bool {
    field.from_si_in(to, si).to_bits() != field.from_si_in(from, si).to_bits()
}

/// The text for an SI value in a system's unit, to nine significant figures: what a field shows
/// for a value opened from a plan (exact to what was saved; the value is pinned behind it).
pub fn text_in(field: &NumField, si: f64, units: FieldUnits) -> String {
    let w = field.from_si_in(units, si);
    let digits = if w == 0.0 { 0 } else { 8 - w.abs().log10().floor() as i32 };
    let scale = 10f64.powi(digits);
    let r = (w * scale).round() / scale;
    // Shortest form of the rounded number (Display), never "-0" or an exponent.
    if r == 0.0 || !(1e-6..1e15).contains(&r.abs()) { crate::units::plain(r) } else { format!("{r}") }
}

#[cfg(test)]
mod tests {
    use super::*;
    use wasm_bindgen_test::wasm_bindgen_test;

    #[wasm_bindgen_test]
    fn decimal_comma_and_spaces_are_read() {
        assert_eq!(parse_number(" 1 200,5 "), Ok(Some(1200.5)));
        assert_eq!(parse_number(""), Ok(None));
        assert_eq!(parse_number("abc"), Err(TextError::NotANumber));
        assert_eq!(parse_number("1e400"), Err(TextError::NotANumber));
    }

    fn read(t: &str) -> (f64, Option<String>) {
        let r = read_number(t).unwrap().unwrap();
        (r.value, r.note)
    }

    #[wasm_bindgen_test]
    fn numbers_are_read_by_one_predictable_rule() {
        // A comma and exactly three digits could be thousands or a decimal: thousands, said.
        assert_eq!(read("1,500"), (1500.0, Some("read as 1500".into())));
        assert_eq!(read("12,500"), (12500.0, Some("read as 12500".into())));
        // Both marks: the last is the decimal one.
        assert_eq!(read("1.500,5"), (1500.5, None));
        assert_eq!(read("1,500.5"), (1500.5, None));
        // One comma otherwise is a decimal comma.
        assert_eq!(read("1,5"), (1.5, None));
        assert_eq!(read("0,500"), (0.5, None));
        assert_eq!(read("1,50"), (1.5, None));
        assert_eq!(read("1234,567"), (1234.567, None));
        // Gaps group thousands; an odd gap is read but said.
        assert_eq!(read("1 500"), (1500.0, None));
        assert_eq!(read("1\u{a0}500,25"), (1500.25, None));
        assert_eq!(read("15 0"), (150.0, Some("read as 150".into())));
        // Repeated marks group thousands.
        assert_eq!(read("1,500,000"), (1.5e6, None));
        assert_eq!(read("1.500.000"), (1.5e6, None));
        // A point with three digits is a decimal point, but said (it could be thousands).
        assert_eq!(read("1.500"), (1.5, Some("read as 1.5".into())));
        assert_eq!(read("12.5"), (12.5, None));
        // Signs.
        assert_eq!(read("\u{2212}3"), (-3.0, None));
        assert_eq!(read("-3,5"), (-3.5, None));
        assert_eq!(read("+4"), (4.0, None));
        // Not numbers.
        for bad in ["1,5,0", "1.5,3", "6O", "abc", "1e400", "--3", "1,2.3,4", ",", "."] {
            assert_eq!(read_number(bad), Err(TextError::NotANumber), "{bad}");
        }
        assert_eq!(read_number("   "), Ok(None));
    }

    #[wasm_bindgen_test]
    fn the_shapes_str_parse_takes_are_read_the_same() {
        for (text, value) in [
            (".5", 0.5_f64),
            ("5.", 5.0),
            ("007", 7.0),
            ("0", 0.0),
            ("-0.25", -0.25),
            ("1e3", 1000.0),
            ("2.5E-3", 0.0025),
            ("1e+05", 1e5),
            ("000.125", 0.125),
        ] {
            assert_eq!(read(text).0.to_bits(), value.to_bits(), "{text}");
            // The reference: Rust's correctly rounded `str::parse`.
            assert_eq!(text.parse::<f64>().unwrap().to_bits(), value.to_bits(), "{text}");
        }
        for bad in ["1e", "1e+", "e5", "1e5e5", "1-2", "1e2.5", "1.5e3.5"] {
            assert_eq!(read_number(bad), Err(TextError::NotANumber), "{bad}");
        }
    }

    /// Typed numbers of up to 15 significant figures, decimal exponents (of the last digit)
    /// -22 to 12, read to the same bits as Rust's correctly rounded `str::parse` (a fixed linear congruential sequence,
    /// Knuth's MMIX constants, picks them).
    #[wasm_bindgen_test]
    fn typed_numbers_are_read_to_the_last_bit() {
        let mut x: u64 = 0x9e37_79b9_7f4a_7c15;
        let mut next = || {
            x = x.wrapping_mul(6_364_136_223_846_793_005).wrapping_add(1_442_695_040_888_963_407);
            x >> 11
        };
        for _ in 0..20_000 {
            let figures = 1 + next() % 15;
            let digits = next() % 10u64.pow(figures as u32);
            let point = next() % (figures + 1);
            let exponent = (next() % 20) as i64 - 7;
            let text = format!("{digits:0width$}", width = figures as usize);
            let (int, frac) = text.split_at((figures - point) as usize);
            let typed = if frac.is_empty() {
                format!("{int}e{exponent}")
            } else {
                format!("{int}.{frac}e{exponent}")
            };
            let ours = read_number(&typed).unwrap().unwrap().value;
            let exact: f64 = typed.parse().unwrap();
            assert_eq!(ours.to_bits(), exact.to_bits(), "{typed}");
        }
    }

    const FUELS: [Fuel; 4] = [Fuel::Propane, Fuel::NaturalGas, Fuel::Firewood, Fuel::Electricity];

    #[wasm_bindgen_test]
    fn a_switch_writes_four_figures_in_a_new_unit_and_keeps_a_text_whose_unit_stays() {
        let metric = FieldUnits::new(UnitSystem::Metric, Fuel::Propane);
        let us = FieldUnits::new(UnitSystem::UsCustomary, Fuel::Propane);
        // 1 lb = 0.453 592 37 kg, 1 ft = 0.3048 m, t/°F = 1.8 t/°C + 32 (NIST SP 811 B.8).
        assert_eq!(switch_text(field("plant_mass"), 15.0, metric, us, "15"), "33.07");
        assert_eq!(switch_text(field("altitude"), 300.0, metric, us, "300"), "984.3");
        assert_eq!(switch_text(field("cooling_in"), 15.0, metric, us, "15"), "59");
        assert_eq!(switch_text(field("heat_input"), 5000.0, metric, us, "5"), "17060");
        // Back to metric: the four figures of the SI value.
        assert_eq!(switch_text(field("plant_mass"), 15.0, us, metric, "33.07"), "15");
        // A percentage reads the same in both: the text stays as typed.
        assert_eq!(switch_text(field("oil_content"), 0.9, metric, us, "0.90"), "0.90");
        assert_eq!(switch_text(field("plant_mass"), 0.0, metric, us, "0"), "0");
    }

    #[wasm_bindgen_test]
    fn us_units_round_trip_and_keep_the_metric_text() {
        let mut s = Scenario::default();
        s.costs.fuel_price_per_unit = Some(1.85);
        for fuel in FUELS {
            s.boiler.fuel = fuel;
            let (us_units, metric_units) =
                (FieldUnits::of(UnitSystem::UsCustomary, &s), FieldUnits::of(UnitSystem::Metric, &s));
            for f in FIELDS {
                if let Some(si) = (f.get)(&s) {
                    let us = f.from_si_in(us_units, si);
                    let back = f.to_si_in(us_units, us);
                    assert!((back - si).abs() <= 1e-9 * si.abs().max(1.0), "{} {fuel:?}", f.key);
                    // The nine-figure text (a saved value shown in a unit), from the exact SI value, and back.
                    let metric = text_for(f, &s);
                    let there = text_in(f, si, us_units);
                    assert_eq!(text_in(f, si, metric_units), metric, "{}", f.key);
                    let typed_back = f.to_si_in(us_units, parse_number(&there).unwrap().unwrap());
                    assert!(
                        (typed_back - si).abs() <= 1e-8 * si.abs().max(1.0),
                        "{} {fuel:?}: {there}",
                        f.key
                    );
                }
            }
        }
        let us = FieldUnits::new(UnitSystem::UsCustomary, Fuel::Propane);
        let metric = FieldUnits::new(UnitSystem::Metric, Fuel::Propane);
        // NIST SP 811: 1 ft = 0.3048 m; 212 °F = 100 °C; 1 BTU/h = 0.2930711 W.
        assert!((field("altitude").to_si_in(us, 1000.0) - 304.8).abs() < 1e-9);
        assert!((field("ambient").to_si_in(us, 212.0) - 100.0).abs() < 1e-9);
        assert!((field("heat_input").to_si_in(us, 1.0) - 0.2930711).abs() < 1e-9);
        // A weather report is read in hPa or inHg in either system: 29.92 inHg ≈ 1013.2 hPa.
        let report = field("sea_level_pressure");
        assert!((report.to_si_in(metric, 29.92) - 101_320.8).abs() < 1.0);
        assert!((report.to_si_in(us, 1013.0) - 101_300.0).abs() < 1e-6);
    }

    /// A fuel's price typed per the US unit it is bought by, against hand arithmetic with each
    /// factor's source written out; the scenario holds it per the core's sales unit.
    #[wasm_bindgen_test]
    fn a_fuel_price_per_us_unit_is_held_per_the_cores_sales_unit() {
        let price = field(FUEL_PRICE_KEY);
        let us = |fuel| FieldUnits::new(UnitSystem::UsCustomary, fuel);
        let metric = |fuel| FieldUnits::new(UnitSystem::Metric, fuel);
        let close = |a: f64, b: f64| (a - b).abs() <= 1e-12 * b.abs();
        // Propane, 3.00 per gal: 1 US gal = 3.785 411 784 L (SP 811 B.8, exact); liquid propane
        // at 60 °F 0.507 × 999.0 kg/m³ = 506.493 kg/m³ (GPA 2145 relative density, from
        // memory), so 1 gal = 3.785 411 784e-3 × 506.493 = 1.917 284 570 7 kg; 3.00 / 1.917 284 570 7
        // = 1.564 712 951 8 per kg.
        assert!(close(price.to_si_in(us(Fuel::Propane), 3.0), 1.564_712_951_757_369), "propane");
        // Natural gas, 1.20 per therm: 1 therm (U.S.) = 105 480 400 J (SP 811 B.8), billed on the
        // gross heating value; 1 m³ of the gas holds 36.6 MJ net (the core's fuel table) and
        // 36.6e6 × 1089 / 983 = 40 546 693.79 J gross (GREET's 1,089 and 983 Btu/ft³, from
        // memory), so 1 m³ = 0.384 400 265 8 therm; 1.20 × 0.384 400 265 8 = 0.461 280 318 9 per m³.
        assert!(close(price.to_si_in(us(Fuel::NaturalGas), 1.2), 0.461_280_318_935_157), "natural gas");
        // Firewood, 300 per cord: 1 cord (128 ft³) = 3.624 556 m³ (SP 811 B.8), stacked at the
        // 2000 kg a cord of seasoned hardwood weighs (from memory; the amounts use the same):
        // 300 / 2000 = 0.15 per kg.
        assert!(close(price.to_si_in(us(Fuel::Firewood), 300.0), 0.15), "firewood");
        // Electricity is bought by the kWh in both systems.
        assert_eq!(price.to_si_in(us(Fuel::Electricity), 0.16), 0.16);
        // Metric keeps the core's sales unit as it is.
        assert_eq!(price.to_si_in(metric(Fuel::NaturalGas), 0.9), 0.9);
        // The labels follow the fuel in each system.
        let labels: Vec<_> =
            FUELS.iter().map(|f| (price.unit_in(us(*f)), price.unit_in(metric(*f)))).collect();
        assert_eq!(
            labels,
            [("per gal", "per kg"), ("per therm", "per m³"), ("per cord", "per kg"), ("per kWh", "per kWh")]
        );
        // The metric label is the core's own sales unit.
        for fuel in FUELS {
            assert_eq!(price.unit_in(metric(fuel)), format!("per {}", fuel.data().unit), "{fuel:?}");
        }
        // US -> SI -> US, every fuel, and the shown text read back.
        for fuel in FUELS {
            for v in [0.01, 2.5, 417.0] {
                let si = price.to_si_in(us(fuel), v);
                assert!((price.from_si_in(us(fuel), si) - v).abs() <= 1e-12 * v, "{fuel:?} {v}");
                let text = text_in(price, si, us(fuel));
                assert_eq!(parse_number(&text), Ok(Some(v)), "{fuel:?}: {text}");
            }
        }
    }

    /// The fuel's price in US units restates the core's limit in the fuel's unit: the core
    /// takes at most 1 000 000 per kg, which for propane is 1 917 284.57 per gal (× 1.917 284 570 7
    /// kg/gal, as above), said rounded down.
    #[wasm_bindgen_test]
    fn a_fuel_price_limit_is_said_per_gal() {
        let units = FieldUnits::new(UnitSystem::UsCustomary, Fuel::Propane);
        let price = field(FUEL_PRICE_KEY);
        let mut s = Scenario::default();
        s.boiler.fuel = Fuel::Propane;
        s.costs.fuel_price_per_unit = Some(price.to_si_in(units, 2e6));
        let errors = stillroom_core::plan(&s).expect_err("a price past the core's limit");
        let e = errors.errors.iter().find(|e| e.field == price.path).expect("an error on the price");
        let msg = crate::components::inputs::limit_message(price, units, e, s.costs.fuel_price_per_unit);
        assert_eq!(msg, "Must be at most 1917284\u{a0}per gal.");
    }

    #[wasm_bindgen_test]
    fn every_field_round_trips_its_unit() {
        let s = Scenario::default();
        for f in FIELDS {
            if let Some(si) = (f.get)(&s) {
                let shown = (f.from_si)(si);
                assert!(((f.to_si)(shown) - si).abs() <= 1e-9 * si.abs().max(1.0), "{}", f.key);
            }
        }
    }

    #[wasm_bindgen_test]
    fn keys_are_unique() {
        for (i, a) in FIELDS.iter().enumerate() {
            assert!(FIELDS[i + 1..].iter().all(|b| b.key != a.key), "{}", a.key);
        }
    }
}
