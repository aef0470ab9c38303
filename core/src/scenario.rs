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

macro_rules! schema {
    ($($item:item)*) => { $(
        #[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
        #[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
        #[serde(default)]
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
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
#[derive(Default)]
#[serde(tag = "kind", rename_all = "snake_case")]
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
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
#[serde(tag = "kind", rename_all = "snake_case")]
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
        OilSpec { composition: OilComposition::CropTypical, density_kg_per_m3: None }
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
        } else if value < min {
            format!("must be at least {} {unit}", fmt_num(min))
        } else {
            format!("must be at most {} {unit}", fmt_num(max))
        };
        self.push(field, fmt_num(value), format!("{} to {} {unit}", fmt_num(min), fmt_num(max)), message);
        self.set_range(min, max);
        false
    }

    fn set_range(&mut self, min: f64, max: f64) {
        if let Some(e) = self.errors.last_mut() {
            e.min = Some(min);
            e.max = Some(max);
        }
    }

    /// Checks min < value ≤ max: for quantities that must be strictly positive.
    pub fn positive(&mut self, field: &str, value: f64, max: f64, unit: &str) -> bool {
        if value.is_finite() && value > 0.0 && value <= max {
            return true;
        }
        let message = if !value.is_finite() {
            "must be a number".to_string()
        } else if value <= 0.0 {
            "must be more than zero".to_string()
        } else {
            format!("must be at most {} {unit}", fmt_num(max))
        };
        self.push(field, fmt_num(value), format!("more than 0, up to {} {unit}", fmt_num(max)), message);
        self.set_range(0.0, max);
        false
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

/// A number printed without needless digits.
pub(crate) fn fmt_num(v: f64) -> String {
    if !v.is_finite() {
        return format!("{v}");
    }
    let s = format!("{:.6}", v);
    let s = s.trim_end_matches('0').trim_end_matches('.');
    s.to_string()
}

/// Whether `id` names a library compound or one of the scenario's own.
pub(crate) fn compound_exists(id: &str, custom: &[CustomCompound]) -> bool {
    compounds::find(id).is_some() || custom.iter().any(|c| c.id == id)
}
