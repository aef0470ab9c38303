//! What the grower tells the calculator: the scenario, its defaults, and its validation.
//!
//! Every field name carries its unit. Optional fields (`Option`) fall back to the crop preset
//! or to a stated default when absent, so a scenario saved by an older version, which lacks a
//! newer field, still loads (`#[serde(default)]` on every struct).

use crate::compounds::{self, Confidence, CorrelationForm, VapourPressure};
use crate::heat::{Appliance, Fuel, Metal};
use serde::{Deserialize, Serialize};

/// The scenario format's version. Bump it when a field changes meaning.
pub const SCENARIO_VERSION: u32 = 1;
/// The oldest format version still read. A file of an older version than today's is opened as
/// it is (every field it lacks takes its default); a newer one is refused, by name, rather than
/// half-read.
pub const OLDEST_SCENARIO_VERSION: u32 = 1;

/// Size limits, checked before anything else so a pasted monster is refused at once. A real
/// analysis lists a few dozen compounds (a GC report of a crop oil names some 20-60, common
/// practice, no source); the limits leave room for that and refuse what no still needs.
pub mod limits {
    /// Parts of an oil given as a mixture.
    pub const MAX_MIXTURE_PARTS: usize = 64;
    /// Compounds of the user's own in one scenario.
    pub const MAX_CUSTOM_COMPOUNDS: usize = 32;
    /// Characters in an id (crop, compound): ids are short keys, not prose.
    pub const MAX_ID_CHARS: usize = 64;
    /// Characters in a display name.
    pub const MAX_NAME_CHARS: usize = 128;
    /// Characters in a currency label ("EUR", "kr", "US$").
    pub const MAX_CURRENCY_CHARS: usize = 16;
    /// Bytes of scenario JSON: the largest scenario the other limits allow is some 20 kB.
    pub const MAX_SCENARIO_JSON_BYTES: usize = 256 * 1024;
}

macro_rules! schema {
    ($($item:item)*) => { $(
        #[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
        #[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
        #[serde(default, deny_unknown_fields)]
        $item
    )* };
}

schema! {
    /// One planned run (and, optionally, the season it belongs to).
    pub struct Scenario {
        pub version: u32,
        pub site: Site,
        pub charge: Charge,
        pub oil: OilSpec,
        pub still: Still,
        pub boiler: Boiler,
        pub run: Run,
        pub condenser: Condenser,
        pub separator: Separator,
        pub costs: Costs,
        pub season: Season,
        /// Compounds of the user's own, usable in `oil` by their id.
        pub custom_compounds: Vec<CustomCompound>,
        /// Where the oil content and release constant came from when the grower planned with
        /// the values of their own logged runs; the plan says so while the charge still holds
        /// them, and its ranges use the runs' spread.
        #[serde(default, skip_serializing_if = "Option::is_none")]
        pub calibration: Option<crate::calibration::Calibration>,
    }

    /// Where the still stands.
    pub struct Site {
        /// Geometric altitude above mean sea level, m.
        pub altitude_m: f64,
        /// A barometer reading; without one, the standard atmosphere at the altitude is used.
        pub barometer: Option<Barometer>,
        pub ambient_temperature_c: f64,
    }

    /// The charge: the plant material loaded into the still.
    pub struct Charge {
        /// Crop preset id (see [`crate::crops::CROPS`]); `None` for no preset.
        pub crop: Option<String>,
        pub plant_mass_kg: f64,
        /// Oil content, % w/w of the charge as loaded; the crop's typical value when absent.
        pub oil_content_percent: Option<f64>,
        /// Water content of the charge, % w/w; the crop's value when absent.
        pub moisture_percent: Option<f64>,
        pub heat_capacity_j_per_kg_k: Option<f64>,
        /// Temperature of the charge when loaded; the ambient temperature when absent.
        pub temperature_c: Option<f64>,
    }

    /// What the oil is made of.
    pub struct OilSpec {
        pub composition: OilComposition,
        /// Density of the whole oil at about 20 °C; from the crop, or mixed ideally from the
        /// compounds, when absent.
        pub density_kg_per_m3: Option<f64>,
        /// Activity coefficients inside the oil by UNIFAC instead of an ideal (Raoult) oil. Off by
        /// default: the ideal oil stays the reference.
        pub non_ideal: bool,
    }

    /// One compound's share in a user's own oil analysis.
    pub struct OilPart {
        pub compound: String,
        pub mass_percent: f64,
    }

    /// The still body (the vessel that holds the charge).
    pub struct Still {
        /// Working volume, m³: gives the charge capacity and the wall area.
        pub volume_m3: Option<f64>,
        pub height_to_diameter: f64,
        pub metal: Metal,
        pub metal_mass_kg: f64,
        /// Overall heat-loss coefficient of the wall, W/(m² K): about 10 bare, 0.7 lagged.
        pub wall_u_w_per_m2_k: f64,
    }

    /// The steam source.
    pub struct Boiler {
        pub fuel: Fuel,
        /// What the fuel fires; the fuel's usual appliance when absent.
        pub appliance: Option<Appliance>,
        /// Heat released by the fuel at sea level (burner or element rating), W. Gas burners
        /// are derated for altitude in the plan.
        pub heat_input_w: f64,
        /// Share of that heat reaching the water; the appliance's typical value when absent.
        pub efficiency: Option<f64>,
        /// Water the boiler can give before the heater is exposed, kg.
        pub usable_water_kg: f64,
        /// Temperature of the fill and make-up water; the ambient temperature when absent.
        pub feed_temperature_c: Option<f64>,
        /// A measured steam rate, kg/h, used instead of the one from heat input and efficiency.
        pub steam_rate_kg_per_h: Option<f64>,
    }

    /// What the run aims for.
    pub struct Run {
        /// Share of the recoverable oil to carry over, %.
        pub target_recovery_percent: f64,
        /// First-order recovery constant, per minute; from the crop when absent.
        pub rate_constant_per_min: Option<f64>,
        /// Time to empty, clean and recharge between runs, min.
        pub turnaround_min: f64,
        /// Whether the separated water is returned to the boiler during the run (cohobation), so
        /// the oil dissolved in it comes over again.
        pub cohobation: bool,
    }

    /// The condenser and its cooling water.
    pub struct Condenser {
        pub kind: CondenserKind,
        pub cooling_water_inlet_c: f64,
        /// Warmest the cooling water may leave (or, for a tub, the warmest the tub may get).
        pub cooling_water_outlet_c: f64,
        /// Distillate temperature leaving the condenser; the crop's recommendation when absent.
        pub distillate_outlet_c: Option<f64>,
        pub condensing_u_w_per_m2_k: f64,
        pub cooling_u_w_per_m2_k: f64,
        pub tube_outer_diameter_m: f64,
        /// Water held by the tub, kg (coil in a tub only).
        pub tub_water_kg: f64,
    }

    /// The separator (oil-water receiver).
    pub struct Separator {
        /// Smallest droplet to be caught, m. 100 µm by default: finer than the refinery basis of
        /// API 421 (150 µm), as a hydrosol's droplets are small and no measured receiver sizes are
        /// published (judgement, common practice, no source).
        pub droplet_diameter_m: f64,
        pub residence_time_s: f64,
        /// Turbulence and short-circuit factor on the plan area.
        pub turbulence_factor: f64,
    }

    /// Money, all in one currency of the user's choice.
    #[derive(Default)]
    pub struct Costs {
        pub currency: String,
        /// Price per sales unit of the fuel (kg, m³ or kWh).
        pub fuel_price_per_unit: Option<f64>,
        pub plant_value_per_kg: Option<f64>,
        pub labour_per_hour: Option<f64>,
    }

    /// The season's harvest.
    #[derive(Default)]
    pub struct Season {
        pub harvest_kg: Option<f64>,
    }
}

/// A barometer reading at the site.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
#[serde(deny_unknown_fields)]
pub struct Barometer {
    pub pressure_pa: f64,
    pub reference: BarometerReference,
}

/// Whether a barometer value is the pressure at the site or a weather report's value reduced to
/// sea level.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize, Deserialize)]
#[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
#[serde(rename_all = "snake_case")]
pub enum BarometerReference {
    Station,
    SeaLevel,
}

/// The oil's composition.
// Read by `tagged_sections` (not serde's derive, which buffers tagged sections), written by serde.
#[derive(Debug, Clone, PartialEq, Serialize)]
#[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
#[derive(Default)]
#[serde(deny_unknown_fields, tag = "kind", rename_all = "snake_case")]
pub enum OilComposition {
    /// The crop preset's typical composition.
    #[default]
    CropTypical,
    /// A single compound.
    Compound { id: String },
    /// The user's own analysis, by mass.
    Mixture { parts: Vec<OilPart> },
}

/// How the condenser is built.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize, Deserialize)]
#[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
#[serde(rename_all = "snake_case")]
pub enum CondenserKind {
    /// A coiled tube in a tub of water, cold water fed at the bottom, warm overflow at the top.
    CoilInTub,
    /// A tube inside a jacket with cooling water in counterflow.
    TubeInTube,
}

/// A compound of the user's own.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
#[serde(deny_unknown_fields)]
pub struct CustomCompound {
    pub id: String,
    pub name: String,
    pub molar_mass_kg_per_mol: f64,
    pub liquid_density_kg_per_m3: f64,
    #[serde(default)]
    pub water_solubility_kg_per_m3: f64,
    pub vapour_pressure: CustomVapourPressure,
}

/// A vapour-pressure law given by the user.
// Read by `tagged_sections` (not serde's derive, which buffers tagged sections), written by serde.
#[derive(Debug, Clone, PartialEq, Serialize)]
#[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
#[serde(deny_unknown_fields, tag = "kind", rename_all = "snake_case")]
pub enum CustomVapourPressure {
    /// log_b(p/unit) = A - B / (T/unit + C), with the units the coefficients were published in.
    Antoine {
        a: f64,
        b: f64,
        c: f64,
        log: LogBase,
        pressure_unit: PressureUnit,
        temperature_unit: TemperatureUnit,
        /// Range the coefficients hold over, °C.
        t_min_c: f64,
        t_max_c: f64,
    },
    /// Two measured points; a Clausius-Clapeyron line ln p = A - B/T through them.
    TwoPoints { t1_c: f64, p1_pa: f64, t2_c: f64, p2_pa: f64 },
}

#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize, Deserialize)]
#[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
#[serde(rename_all = "snake_case")]
pub enum LogBase {
    Ln,
    Log10,
}

#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize, Deserialize)]
#[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
#[serde(rename_all = "snake_case")]
pub enum PressureUnit {
    Pa,
    KPa,
    Bar,
    MmHg,
}

#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize, Deserialize)]
#[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
#[serde(rename_all = "snake_case")]
pub enum TemperatureUnit {
    Kelvin,
    Celsius,
}

impl PressureUnit {
    fn pa(self) -> f64 {
        match self {
            PressureUnit::Pa => 1.0,
            PressureUnit::KPa => 1e3,
            PressureUnit::Bar => 1e5,
            PressureUnit::MmHg => 101_325.0 / 760.0,
        }
    }
}

impl CustomVapourPressure {
    /// The law as a correlation in the library's ln(p/Pa) = A - B/(T/K + C) form, with its range.
    ///
    /// Antoine sets convert exactly: ln(p/Pa) = k A + ln(unit) - k B / (T_K + C - offset), with
    /// k = ln 10 for base-10 sets and offset 273.15 for °C sets. Two points (T1, p1), (T2, p2)
    /// give B = ln(p2/p1) / (1/T1 - 1/T2), A = ln p1 + B/T1, C = 0 (Clausius-Clapeyron with a
    /// constant heat of vaporisation), valid between the points.
    ///
    /// ```
    /// use stillroom_core::scenario::{CustomVapourPressure, LogBase, PressureUnit, TemperatureUnit};
    /// // The classic water set log10(p/mmHg) = 8.07131 - 1730.63/(t/°C + 233.426), 1-100 °C:
    /// let law = CustomVapourPressure::Antoine { a: 8.07131, b: 1730.63, c: 233.426,
    ///     log: LogBase::Log10, pressure_unit: PressureUnit::MmHg,
    ///     temperature_unit: TemperatureUnit::Celsius, t_min_c: 1.0, t_max_c: 100.0 };
    /// let vp = law.to_vapour_pressure().unwrap();
    /// // It gives 760 mmHg near 100 °C.
    /// assert!((vp.pressure_pa(373.15) / 101_325.0 - 1.0).abs() < 0.002);
    /// ```
    pub fn to_vapour_pressure(&self) -> Option<VapourPressure> {
        match *self {
            CustomVapourPressure::Antoine {
                a,
                b,
                c,
                log,
                pressure_unit,
                temperature_unit,
                t_min_c,
                t_max_c,
            } => {
                let k = match log {
                    LogBase::Ln => 1.0,
                    LogBase::Log10 => std::f64::consts::LN_10,
                };
                let c_k = match temperature_unit {
                    TemperatureUnit::Kelvin => c,
                    TemperatureUnit::Celsius => c - 273.15,
                };
                let form =
                    CorrelationForm::AntoineLnPa { a: k * a + pressure_unit.pa().ln(), b: k * b, c: c_k };
                Some(VapourPressure {
                    form,
                    t_min_k: t_min_c + 273.15,
                    t_max_k: t_max_c + 273.15,
                    relative_uncertainty: 0.05,
                    confidence: Confidence::UserSupplied,
                })
            }
            CustomVapourPressure::TwoPoints { t1_c, p1_pa, t2_c, p2_pa } => {
                let (t1, t2) = (t1_c + 273.15, t2_c + 273.15);
                if !(p1_pa > 0.0 && p2_pa > 0.0) || (t1 - t2).abs() < 1e-6 {
                    return None;
                }
                let b = (p2_pa / p1_pa).ln() / (1.0 / t1 - 1.0 / t2);
                let a = p1_pa.ln() + b / t1;
                Some(VapourPressure {
                    form: CorrelationForm::AntoineLnPa { a, b, c: 0.0 },
                    t_min_k: t1.min(t2),
                    t_max_k: t1.max(t2),
                    relative_uncertainty: 0.1,
                    confidence: Confidence::UserSupplied,
                })
            }
        }
    }
}

impl Default for Scenario {
    /// An invented example: Larkfield Farm (a fictional farm) plans a charge of fresh lavender in
    /// a 100 L copper still over an 8 kW propane burner, at 300 m.
    fn default() -> Self {
        Scenario {
            version: SCENARIO_VERSION,
            site: Site::default(),
            charge: Charge::default(),
            oil: OilSpec::default(),
            still: Still::default(),
            boiler: Boiler::default(),
            run: Run::default(),
            condenser: Condenser::default(),
            separator: Separator::default(),
            costs: Costs::default(),
            season: Season::default(),
            custom_compounds: Vec::new(),
            calibration: None,
        }
    }
}

impl Default for Site {
    fn default() -> Self {
        Site { altitude_m: 300.0, barometer: None, ambient_temperature_c: 20.0 }
    }
}

impl Default for Charge {
    fn default() -> Self {
        Charge {
            crop: Some("lavender".to_string()),
            plant_mass_kg: 15.0,
            oil_content_percent: None,
            moisture_percent: None,
            heat_capacity_j_per_kg_k: None,
            temperature_c: None,
        }
    }
}

impl Default for OilSpec {
    fn default() -> Self {
        OilSpec { composition: OilComposition::CropTypical, density_kg_per_m3: None, non_ideal: false }
    }
}

impl Default for OilPart {
    fn default() -> Self {
        OilPart { compound: String::new(), mass_percent: 0.0 }
    }
}

impl Default for Still {
    fn default() -> Self {
        Still {
            volume_m3: Some(0.1),
            height_to_diameter: 1.5,
            metal: Metal::Copper,
            metal_mass_kg: 25.0,
            wall_u_w_per_m2_k: 10.0,
        }
    }
}

impl Default for Boiler {
    fn default() -> Self {
        Boiler {
            fuel: Fuel::Propane,
            appliance: None,
            heat_input_w: 8_000.0,
            efficiency: None,
            usable_water_kg: 40.0,
            feed_temperature_c: None,
            steam_rate_kg_per_h: None,
        }
    }
}

impl Default for Run {
    fn default() -> Self {
        Run {
            target_recovery_percent: 95.0,
            rate_constant_per_min: None,
            turnaround_min: 30.0,
            cohobation: false,
        }
    }
}

impl Default for Condenser {
    fn default() -> Self {
        Condenser {
            kind: CondenserKind::CoilInTub,
            cooling_water_inlet_c: 15.0,
            cooling_water_outlet_c: 45.0,
            distillate_outlet_c: None,
            condensing_u_w_per_m2_k: 800.0,
            cooling_u_w_per_m2_k: 150.0,
            tube_outer_diameter_m: 0.0127,
            tub_water_kg: 150.0,
        }
    }
}

impl Default for Separator {
    fn default() -> Self {
        Separator { droplet_diameter_m: 100e-6, residence_time_s: 600.0, turbulence_factor: 1.2 }
    }
}

impl Default for Barometer {
    fn default() -> Self {
        Barometer { pressure_pa: 101_325.0, reference: BarometerReference::Station }
    }
}

/// One invalid field: which, what it held, and what it should hold.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
pub struct FieldError {
    /// Dotted path of the field, e.g. `charge.plant_mass_kg`.
    pub field: String,
    /// The value as given.
    pub value: String,
    /// The valid range or set, in words with units.
    pub valid: String,
    pub message: String,
    /// The valid range's ends in the field's own (SI) unit, when it is a range, so a page can
    /// restate them in the unit it shows.
    #[serde(default)]
    pub min: Option<f64>,
    #[serde(default)]
    pub max: Option<f64>,
}

/// Every invalid field of a scenario, reported together.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
pub struct ScenarioErrors {
    pub errors: Vec<FieldError>,
}

impl ScenarioErrors {
    /// The error on a field, if any.
    pub fn on(&self, field: &str) -> Option<&FieldError> {
        self.errors.iter().find(|e| e.field == field)
    }
}

impl std::fmt::Display for ScenarioErrors {
    fn fmt(&self, f: &mut std::fmt::Formatter<'_>) -> std::fmt::Result {
        for e in &self.errors {
            writeln!(f, "{}: {} (got {}; valid: {})", e.field, e.message, e.value, e.valid)?;
        }
        Ok(())
    }
}

/// Collects field errors while a scenario is checked.
#[derive(Default)]
pub(crate) struct Checker {
    pub errors: Vec<FieldError>,
}

impl Checker {
    /// Checks min ≤ value ≤ max (and finiteness); returns whether it passed.
    pub fn range(&mut self, field: &str, value: f64, min: f64, max: f64, unit: &str) -> bool {
        if value.is_finite() && value >= min && value <= max {
            return true;
        }
        let message = if !value.is_finite() {
            "must be a number".to_string()
        } else if value <= 0.0 && min > 0.0 {
            // Said plainly where the quantity cannot be zero at all; the range gives the bound.
            "must be more than zero".to_string()
        } else if value < min {
            format!("must be at least {} {unit}", fmt_num(min))
        } else {
            format!("must be at most {} {unit}", fmt_num(max))
        };
        self.push(field, fmt_num(value), format!("{} to {} {unit}", fmt_num(min), fmt_num(max)), message);
        self.set_range(min, max);
        false
    }

    /// Checks a text's length in characters; returns whether it passed.
    pub fn text(&mut self, field: &str, value: &str, max_chars: usize) -> bool {
        let n = value.chars().count();
        if n <= max_chars {
            return true;
        }
        let shown: String = value.chars().take(24).collect();
        self.push(
            field,
            format!("{shown}…"),
            format!("up to {max_chars} characters"),
            format!("too long: {n} characters, at most {max_chars}"),
        );
        false
    }

    /// Gives the last error its range's ends, for a page to restate in its own unit.
    pub fn set_range(&mut self, min: f64, max: f64) {
        if let Some(e) = self.errors.last_mut() {
            e.min = Some(min);
            e.max = Some(max);
        }
    }

    pub fn push(&mut self, field: &str, value: String, valid: String, message: String) {
        self.errors.push(FieldError {
            field: field.to_string(),
            value,
            valid,
            message,
            min: None,
            max: None,
        });
    }
}

/// A number printed without needless digits (in exponent form when six decimals would show
/// nothing, or the digits would run on).
pub(crate) fn fmt_num(v: f64) -> String {
    if !v.is_finite() {
        return format!("{v}");
    }
    if v != 0.0 && (v.abs() < 1e-6 || v.abs() >= 1e15) {
        return format!("{v:e}");
    }
    let s = format!("{:.6}", v);
    let s = s.trim_end_matches('0').trim_end_matches('.');
    s.to_string()
}

/// The scenario's own compounds by id, built once, so looking up each part of a mixture is a
/// tree search rather than a scan of the list. On a repeated id the first one counts (a repeat
/// is reported as an error anyway).
pub(crate) struct CustomIndex<'a> {
    list: &'a [CustomCompound],
    /// Id -> position of its first compound in `list`.
    by_id: std::collections::BTreeMap<&'a str, usize>,
}

impl<'a> CustomIndex<'a> {
    pub fn new(list: &'a [CustomCompound]) -> Self {
        let mut by_id = std::collections::BTreeMap::new();
        for (i, c) in list.iter().enumerate() {
            by_id.entry(c.id.as_str()).or_insert(i);
        }
        CustomIndex { list, by_id }
    }

    pub fn get(&self, id: &str) -> Option<&'a CustomCompound> {
        self.position(id).map(|i| &self.list[i])
    }

    /// Position of the first compound with this id.
    pub fn position(&self, id: &str) -> Option<usize> {
        self.by_id.get(id).copied()
    }

    /// Whether `id` names a library compound or one of the scenario's own.
    pub fn exists(&self, id: &str) -> bool {
        compounds::find(id).is_some() || self.by_id.contains_key(id)
    }
}

#[cfg(feature = "json")]
pub use json::{check_version, parse_scenario_json, scenario_from_json_value};

/// Reading a scenario from JSON strictly: every error names its field and what it expects.
#[cfg(feature = "json")]
mod json {
    use super::{FieldError, OLDEST_SCENARIO_VERSION, SCENARIO_VERSION, Scenario, ScenarioErrors, limits};
    use crate::json_path;
    use serde_json::Value;

    /// The only places a scenario holds a list; anywhere else a list would be a section written
    /// by position, which the format does not allow (a reordered field would change meaning).
    const LIST_FIELDS: [&str; 2] = ["custom_compounds", "oil.composition.parts"];
    /// Deeper than any scenario goes (five levels); a bound for the walk over a caller's value.
    const MAX_DEPTH: usize = 16;

    fn one(field: &str, value: String, valid: &str, message: String) -> ScenarioErrors {
        ScenarioErrors {
            errors: vec![FieldError {
                field: field.to_string(),
                value,
                valid: valid.to_string(),
                message,
                min: None,
                max: None,
            }],
        }
    }

    /// Reads a scenario from JSON text.
    ///
    /// Strict: an unknown or misspelt field, a section written as a list, a value of the wrong
    /// type, a repeated key or a format version this build does not read is an error naming the
    /// field (dotted path, list items by index: `custom_compounds.1.id`) and what it expects.
    /// Text over [`limits::MAX_SCENARIO_JSON_BYTES`] is refused before it is parsed.
    ///
    /// ```
    /// use stillroom_core::scenario::parse_scenario_json;
    /// let s = parse_scenario_json(r#"{"charge": {"plant_mass_kg": 40}}"#).unwrap();
    /// assert_eq!(s.charge.plant_mass_kg, 40.0);
    /// let e = parse_scenario_json(r#"{"charge": {"plant_mass": 40}}"#).unwrap_err();
    /// assert_eq!(e.errors[0].field, "charge.plant_mass");
    /// let e = parse_scenario_json(r#"{"charge": {"plant_mass_kg": "forty"}}"#).unwrap_err();
    /// assert_eq!(e.errors[0].field, "charge.plant_mass_kg");
    /// assert_eq!(e.errors[0].valid, "a number");
    /// ```
    pub fn parse_scenario_json(text: &str) -> Result<Scenario, ScenarioErrors> {
        if text.len() > limits::MAX_SCENARIO_JSON_BYTES {
            return Err(one(
                "scenario",
                format!("{} bytes", text.len()),
                &format!("at most {} bytes", limits::MAX_SCENARIO_JSON_BYTES),
                "the scenario text is far larger than any scenario".into(),
            ));
        }
        let value: Value = serde_json::from_str(text)
            .map_err(|e| one("scenario", String::new(), "JSON text", format!("not readable as JSON: {e}")))?;
        check_shape(&value)?;
        // From the text rather than the value, so that a key given twice is caught as well.
        serde_json::from_str(text).map_err(|e| from_serde(&value, text, &e, true))
    }

    /// Reads a scenario from a JSON value, with the same checks as [`parse_scenario_json`].
    ///
    /// ```
    /// use stillroom_core::scenario::scenario_from_json_value;
    /// let v = serde_json::json!({"site": [300, null, 20]});
    /// assert_eq!(scenario_from_json_value(v).unwrap_err().errors[0].field, "site");
    /// ```
    pub fn scenario_from_json_value(value: Value) -> Result<Scenario, ScenarioErrors> {
        check_shape(&value)?;
        let original = value.clone();
        serde_json::from_value(value).map_err(|e| {
            // The value has no places to name; its text, read again, has (the same fault, as
            // the text holds the same numbers and keys).
            let text = original.to_string();
            match serde_json::from_str::<Scenario>(&text) {
                Err(at) => from_serde(&original, &text, &at, false),
                Ok(_) => from_serde(&original, "", &e, false),
            }
        })
    }

    /// Refuses a format `version` this build does not read, in the words [`parse_scenario_json`]
    /// uses.
    ///
    /// ```
    /// use stillroom_core::scenario::{check_version, SCENARIO_VERSION};
    /// assert!(check_version(SCENARIO_VERSION).is_ok());
    /// assert_eq!(check_version(SCENARIO_VERSION + 1).unwrap_err().errors[0].field, "version");
    /// ```
    pub fn check_version(version: u32) -> Result<(), ScenarioErrors> {
        let mut map = serde_json::Map::new();
        map.insert("version".into(), Value::from(version));
        check_shape(&Value::Object(map))
    }

    /// The checks serde's derive does not make: an object at the top, a version this build reads,
    /// and no section written as a list.
    fn check_shape(value: &Value) -> Result<(), ScenarioErrors> {
        let Value::Object(map) = value else {
            return Err(one(
                "scenario",
                kind_of(value).into(),
                "a JSON object of named sections, {…}",
                "a scenario is an object of named sections".into(),
            ));
        };
        if let Some(v) = map.get("version") {
            let readable = v.as_u64().is_some_and(|n| {
                (u64::from(OLDEST_SCENARIO_VERSION)..=u64::from(SCENARIO_VERSION)).contains(&n)
            });
            if !readable {
                let range = version_range();
                let message = if v.as_u64().is_some_and(|n| n > u64::from(SCENARIO_VERSION)) {
                    format!(
                        "this scenario was written by a newer version of the format; this build reads {range}"
                    )
                } else {
                    format!("not a format version this build reads ({range})")
                };
                return Err(one("version", v.to_string(), &range, message));
            }
        }
        let mut errors = Vec::new();
        walk_lists(value, &mut String::new(), 0, &mut errors);
        if errors.is_empty() { Ok(()) } else { Err(ScenarioErrors { errors }) }
    }

    fn version_range() -> String {
        if OLDEST_SCENARIO_VERSION == SCENARIO_VERSION {
            format!("version {SCENARIO_VERSION}")
        } else {
            format!("versions {OLDEST_SCENARIO_VERSION} to {SCENARIO_VERSION}")
        }
    }

    fn kind_of(v: &Value) -> &'static str {
        match v {
            Value::Null => "null",
            Value::Bool(_) => "true or false",
            Value::Number(_) => "a number",
            Value::String(_) => "text",
            Value::Array(_) => "a list",
            Value::Object(_) => "an object",
        }
    }

    /// Reports every list outside [`LIST_FIELDS`] (and any nesting deeper than [`MAX_DEPTH`]).
    fn walk_lists(v: &Value, path: &mut String, depth: usize, errors: &mut Vec<FieldError>) {
        if depth > MAX_DEPTH {
            errors.push(field_error(
                path,
                "nested deeper than any scenario",
                "sections nested as the format has them",
            ));
            return;
        }
        let len = path.len();
        match v {
            Value::Object(map) => {
                for (k, x) in map {
                    if !path.is_empty() {
                        path.push('.');
                    }
                    path.push_str(k);
                    walk_lists(x, path, depth + 1, errors);
                    path.truncate(len);
                }
            }
            Value::Array(items) => {
                // A list field by name (its indices left out: `custom_compounds.0.x` ->
                // `custom_compounds.x`), and never a list straight inside a list.
                let bare: Vec<&str> = path.split('.').filter(|s| s.parse::<usize>().is_err()).collect();
                let in_list = path.rsplit('.').next().is_some_and(|s| s.parse::<usize>().is_ok());
                if in_list || !LIST_FIELDS.contains(&bare.join(".").as_str()) {
                    errors.push(field_error(
                        path,
                        "a list",
                        "an object with named fields, {…}; sections are never written by position",
                    ));
                    return;
                }
                for (i, x) in items.iter().enumerate() {
                    path.push_str(&format!(".{i}"));
                    walk_lists(x, path, depth + 1, errors);
                    path.truncate(len);
                }
            }
            _ => {}
        }
    }

    fn field_error(path: &str, value: &str, valid: &str) -> FieldError {
        FieldError {
            field: if path.is_empty() { "scenario".into() } else { path.to_string() },
            value: value.to_string(),
            valid: valid.to_string(),
            message: format!("expected {valid}"),
            min: None,
            max: None,
        }
    }

    /// Turns serde's error (with the path it failed at) into a field error: the dotted path,
    /// what was expected, in words.
    /// `text` is what serde_json read (empty when it read the value itself); `keep_place` keeps
    /// its " (line L column C)" for a grower's own text.
    fn from_serde(value: &Value, text: &str, e: &serde_json::Error, keep_place: bool) -> ScenarioErrors {
        let mut field = into_tagged(value, dotted(&json_path::error_path(text, e)));
        let text = if keep_place { e.to_string() } else { json_path::message_of(e) };
        // serde_json appends " at line L column C"; the field path says more, keep it apart.
        let (message, place) = match text.rfind(" at line ") {
            Some(i) => (text[..i].to_string(), Some(text[i + 1..].to_string())),
            None => (text.clone(), None),
        };
        // Inside a tagged section serde loses the path; find the failing part by reading the
        // parts again on their own.
        if field == "oil.composition"
            && let Some(parts) = value.pointer("/oil/composition/parts")
            && let parts_text = parts.to_string()
            && let Err(pe) = serde_json::from_str::<Vec<super::OilPart>>(&parts_text)
        {
            let sub = dotted(&json_path::error_path(&parts_text, &pe));
            field = if sub == "scenario" {
                "oil.composition.parts".into()
            } else {
                format!("oil.composition.parts.{sub}")
            };
        }
        // A missing, unknown or repeated field is named in the message; add it to the path.
        for lead in ["missing field `", "unknown field `", "duplicate field `"] {
            if let Some(rest) = message.strip_prefix(lead)
                && let Some(name) = rest.split('`').next()
                && !field.ends_with(name)
            {
                field = if field == "scenario" { name.to_string() } else { format!("{field}.{name}") };
            }
        }
        let (found, valid) = match message.split_once(", expected ") {
            Some((head, expected)) => (
                head.strip_prefix("invalid type: ")
                    .or(head.strip_prefix("invalid value: "))
                    .unwrap_or("")
                    .to_string(),
                plain_expected(expected),
            ),
            None => (String::new(), String::new()),
        };
        let message = match place {
            Some(place) => format!("{} ({place})", plain_message(&message)),
            None => plain_message(&message),
        };
        ScenarioErrors {
            errors: vec![FieldError { field, value: found, valid, message, min: None, max: None }],
        }
    }

    /// A fault inside a tagged section (`oil.composition`, an own compound's
    /// `vapour_pressure`: serde reads such a section whole before its fields) is placed by
    /// serde_json after the section; when the section is its parent's last member, after the
    /// parent too, so the path stops at the parent. The parent's tagged section read again on its
    /// own shows whether the fault is in it.
    fn into_tagged(value: &Value, field: String) -> String {
        let pointer = format!("/{}", field.replace('.', "/"));
        let parent = if field == "scenario" { Some(value) } else { value.pointer(&pointer) };
        // Read from text, as the whole scenario is: the same reader, no second copy of it.
        let fails = |name: &str, read: fn(&str) -> bool| {
            parent.and_then(|p| p.get(name)).is_some_and(|v| v.is_object() && !read(&v.to_string()))
        };
        let in_list = field.strip_prefix("custom_compounds.").is_some_and(|i| i.parse::<usize>().is_ok());
        if field == "oil"
            && fails("composition", |t| serde_json::from_str::<super::OilComposition>(t).is_ok())
        {
            "oil.composition".into()
        } else if in_list
            && fails("vapour_pressure", |t| serde_json::from_str::<super::CustomVapourPressure>(t).is_ok())
        {
            format!("{field}.vapour_pressure")
        } else {
            field
        }
    }

    fn dotted(path: &[json_path::Step]) -> String {
        let d = json_path::dotted(path);
        if d.is_empty() { "scenario".into() } else { d }
    }

    /// serde names Rust types; say what a user would type.
    fn plain_expected(expected: &str) -> String {
        match expected {
            "f64" => "a number".into(),
            "u32" => "a whole number, 0 or more".into(),
            "a string" => "text".into(),
            other => other.to_string(),
        }
    }

    fn plain_message(message: &str) -> String {
        match message.split_once(", expected ") {
            Some((head, expected)) => format!("{head}, expected {}", plain_expected(expected)),
            None => message.to_string(),
        }
    }
}
