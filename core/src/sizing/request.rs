//! What the grower asks for: the crop and its harvest, the site, the heat and cooling water at
//! hand, and the limits to hold to; and the check of every field.

use super::catalogue::TubeStandard;
use crate::crops::{self, Crop};
use crate::heat::{Appliance, Fuel};
use crate::scenario::{CondenserKind, FieldError, Scenario};
use serde::{Deserialize, Serialize};

macro_rules! request {
    ($($item:item)*) => { $(
        #[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
        #[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
        #[serde(deny_unknown_fields)]
        $item
    )* };
}

request! {
    /// A request for equipment: what to distil and what to hold to.
    pub struct SizingRequest {
        /// Crop preset id (see [`crate::crops::CROPS`]); the base scenario's crop when absent.
        #[serde(default)]
        pub crop: Option<String>,
        /// A scenario whose other sections (the oil, the grower's own compounds, the still's
        /// metal and lagging, the run's target and turnaround, condenser and separator
        /// coefficients, costs) the design keeps. The sized fields are replaced. The invented
        /// default scenario when absent.
        #[serde(default)]
        pub base: Option<Scenario>,
        pub harvest: Harvest,
        pub site: SiteRequest,
        pub heat: HeatSupply,
        pub cooling: CoolingSupply,
        pub limits: Limits,
        /// Bulk density of the charge as packed; the crop's when absent.
        #[serde(default)]
        pub packing_density_kg_per_m3: Option<f64>,
        /// Steam per hour per kg of charge the run should pass; the crop's when absent.
        #[serde(default)]
        pub steam_rate_kg_per_h_per_kg: Option<f64>,
    }

    /// Where the still will stand.
    pub struct SiteRequest {
        pub altitude_m: f64,
        /// The base scenario's ambient temperature when absent.
        #[serde(default)]
        pub ambient_temperature_c: Option<f64>,
    }

    /// Cooling water at hand and the condenser to build.
    pub struct CoolingSupply {
        pub inlet_c: f64,
        /// Most the supply gives, kg/s (about L/s); no limit when absent.
        #[serde(default)]
        pub max_flow_kg_per_s: Option<f64>,
        /// A coil in a tub when absent.
        #[serde(default = "coil_in_tub")]
        pub condenser: CondenserKind,
        /// Metric when absent.
        #[serde(default)]
        pub tube_standard: TubeStandard,
    }

    /// What the grower wants to hold to.
    pub struct Limits {
        /// Most charges to run in one day (1 to 24).
        pub max_charges_per_day: u32,
        /// Longest a charge may take from lighting to the end of its run, s.
        pub max_run_s: f64,
        /// Most water (boiler feed and cooling) one charge may use, kg; no limit when absent.
        #[serde(default)]
        pub max_water_per_run_kg: Option<f64>,
        /// Warmest the tub (or the jacket's outflow) may get, °C.
        pub warmest_cooling_water_c: f64,
        /// Time the day's charges must fit in, turnarounds included, s; 24 h when absent.
        #[serde(default)]
        pub working_day_s: Option<f64>,
    }
}

fn coil_in_tub() -> CondenserKind {
    CondenserKind::CoilInTub
}

/// How much plant comes in.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
#[serde(tag = "kind", rename_all = "snake_case", deny_unknown_fields)]
pub enum Harvest {
    /// The same cut every day; `days` (if given) for the season's totals.
    PerDay {
        kg_per_day: f64,
        #[serde(default)]
        days: Option<u32>,
    },
    /// A season's harvest spread evenly over the days available to distil it.
    PerSeason { kg_per_season: f64, days: u32 },
}

/// The heat source at hand.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
#[serde(tag = "kind", rename_all = "snake_case", deny_unknown_fields)]
pub enum HeatSupply {
    /// Gas or wood; the design picks the burner (or the fire) rating.
    Fuel {
        fuel: Fuel,
        /// The fuel's usual appliance when absent.
        #[serde(default)]
        appliance: Option<Appliance>,
        /// Largest heat input on offer (sea-level rating), W; the catalogue's largest when absent.
        #[serde(default)]
        max_heat_input_w: Option<f64>,
    },
    /// Electric immersion elements within a supply limit.
    Electric { supply: ElectricSupply },
}

/// What the electric supply can give.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
#[serde(tag = "kind", rename_all = "snake_case", deny_unknown_fields)]
pub enum ElectricSupply {
    /// A power limit, W.
    Power { max_power_w: f64 },
    /// A current limit at a voltage: P = V I on one phase, √3 V I on three (V line to line).
    Current {
        current_a: f64,
        voltage_v: f64,
        /// 1 (single phase) when absent, or 3.
        #[serde(default)]
        phases: Option<u8>,
    },
}

impl ElectricSupply {
    /// Most power the supply can give, W: P = V I (one phase), √3 V_LL I (three phases).
    ///
    /// Source: the power of a balanced three-phase load at unit power factor (IEC 60050-131;
    /// any electrical-engineering text). An immersion element is resistive, power factor 1.
    ///
    /// ```
    /// use stillroom_core::sizing::ElectricSupply;
    /// let one = ElectricSupply::Current { current_a: 16.0, voltage_v: 230.0, phases: None };
    /// assert_eq!(one.max_power_w(), 3680.0);
    /// let three = ElectricSupply::Current { current_a: 16.0, voltage_v: 400.0, phases: Some(3) };
    /// assert!((three.max_power_w() - 11_085.1).abs() < 0.1);
    /// ```
    pub fn max_power_w(&self) -> f64 {
        match *self {
            ElectricSupply::Power { max_power_w } => max_power_w,
            ElectricSupply::Current { current_a, voltage_v, phases } => {
                let factor = if phases == Some(3) { 3f64.sqrt() } else { 1.0 };
                factor * voltage_v * current_a
            }
        }
    }
}

/// The request checked, with the crop's values filled in.
#[derive(Debug, Clone)]
pub(super) struct Needs {
    pub base: Scenario,
    pub crop: Option<&'static Crop>,
    pub daily_kg: f64,
    pub days: Option<u32>,
    pub packing_kg_per_m3: f64,
    pub steam_rate_kg_per_h_per_kg: f64,
    pub fuel: Fuel,
    pub appliance: Appliance,
    pub heat_cap_w: f64,
    /// Supply voltage and phases, for the current an element draws.
    pub electric: Option<(f64, u8)>,
    pub working_day_s: f64,
}

/// Every invalid field of a request, reported together (the shape of
/// [`crate::scenario::ScenarioErrors`]: path, value, valid range, message).
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
pub struct SizingErrors {
    pub errors: Vec<FieldError>,
    /// The numbers with units in the message of a limit the request cannot meet, in the order
    /// they appear, so a reader in other units can restate them.
    #[serde(default, skip_serializing_if = "Vec::is_empty")]
    pub figures: Vec<Figure>,
}

/// A number in a sizing message as written there (`"12 kW"`), with its SI value and kind.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
pub struct Figure {
    pub shown: String,
    pub si: f64,
    pub quantity: Quantity,
}

/// What a [`Figure`] measures, and so its SI unit.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize, Deserialize)]
#[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
#[serde(rename_all = "snake_case")]
pub enum Quantity {
    /// A fuel's heat input, W.
    HeatInputW,
    /// An electric supply's power, W (kW in any units).
    ElectricPowerW,
    /// Plant, kg.
    MassKg,
    /// Steam, kg/s.
    SteamKgPerS,
    /// Steam per kg of charge, kg/s per kg (a ratio the same in any mass unit).
    SteamPerChargeKgPerSPerKg,
    /// A vessel's volume, m³.
    VolumeM3,
    /// Water by mass, kg.
    WaterKg,
    /// A water flow, kg/s.
    WaterFlowKgPerS,
    /// A temperature, °C.
    TemperatureC,
}

/// Collects the figures of one message while it is written: `fig` returns the words it records.
#[derive(Default)]
pub(super) struct Figures(Vec<Figure>);

impl Figures {
    pub(super) fn fig(&mut self, si: f64, quantity: Quantity, shown: String) -> String {
        self.0.push(Figure { shown: shown.clone(), si, quantity });
        shown
    }

    /// The heat supply's figure: a fuel's heat input, or an electric supply's power.
    pub(super) fn supply(&mut self, req: &SizingRequest, w: f64, shown: String) -> String {
        let q = match req.heat {
            HeatSupply::Electric { .. } => Quantity::ElectricPowerW,
            HeatSupply::Fuel { .. } => Quantity::HeatInputW,
        };
        self.fig(w, q, shown)
    }

    /// One error with these figures.
    pub(super) fn error(self, field: &str, value: String, valid: String, message: String) -> SizingErrors {
        SizingErrors { figures: self.0, ..SizingErrors::one(field, value, valid, message) }
    }
}

impl SizingErrors {
    /// The error on a field, if any.
    pub fn on(&self, field: &str) -> Option<&FieldError> {
        self.errors.iter().find(|e| e.field == field)
    }

    pub(super) fn one(field: &str, value: String, valid: String, message: String) -> SizingErrors {
        SizingErrors {
            errors: vec![FieldError { field: field.into(), value, valid, message, min: None, max: None }],
            figures: Vec::new(),
        }
    }
}

impl std::fmt::Display for SizingErrors {
    fn fmt(&self, f: &mut std::fmt::Formatter<'_>) -> std::fmt::Result {
        for e in &self.errors {
            writeln!(f, "{}: {} (got {}; valid: {})", e.field, e.message, e.value, e.valid)?;
        }
        Ok(())
    }
}

/// A number without needless digits.
pub(super) fn num(v: f64) -> String {
    if !v.is_finite() {
        return format!("{v}");
    }
    let s = format!("{v:.6}");
    s.trim_end_matches('0').trim_end_matches('.').to_string()
}

#[derive(Default)]
struct Check {
    errors: Vec<FieldError>,
}

impl Check {
    /// min ≤ value ≤ max, finite; strict lower end when `strict`.
    fn range(&mut self, field: &str, value: f64, min: f64, max: f64, unit: &str, strict: bool) -> bool {
        let low_ok = if strict { value > min } else { value >= min };
        if value.is_finite() && low_ok && value <= max {
            return true;
        }
        let message = if !value.is_finite() {
            "must be a number".to_string()
        } else if !low_ok {
            if strict {
                format!("must be more than {} {unit}", num(min))
            } else {
                format!("must be at least {} {unit}", num(min))
            }
        } else {
            format!("must be at most {} {unit}", num(max))
        };
        let valid = if strict {
            format!("more than {}, up to {} {unit}", num(min), num(max))
        } else {
            format!("{} to {} {unit}", num(min), num(max))
        };
        self.errors.push(FieldError {
            field: field.into(),
            value: num(value),
            valid,
            message,
            min: Some(min),
            max: Some(max),
        });
        false
    }

    fn push(&mut self, field: &str, value: String, valid: &str, message: &str) {
        self.errors.push(FieldError {
            field: field.into(),
            value,
            valid: valid.into(),
            message: message.into(),
            min: None,
            max: None,
        });
    }
}

/// Most plant a day the sizing handles, kg (ten tonnes: beyond any still in the catalogue).
const MAX_DAILY_KG: f64 = 10_000.0;

/// Checks every field and fills in the crop's values.
pub(super) fn check(r: &SizingRequest) -> Result<Needs, SizingErrors> {
    let mut ck = Check::default();
    let base = r.base.clone().unwrap_or_default();
    let crop_id = r.crop.clone().or_else(|| base.charge.crop.clone());
    let crop = match &crop_id {
        None => None,
        Some(id) => {
            let found = crops::CROPS.iter().find(|c| c.id == *id);
            if found.is_none() {
                let field = if r.crop.is_some() { "crop" } else { "base.charge.crop" };
                ck.push(field, id.clone(), "a crop from the list", "unknown crop");
            }
            found
        }
    };

    let (daily_kg, days) = match r.harvest {
        Harvest::PerDay { kg_per_day, days } => {
            ck.range("harvest.kg_per_day", kg_per_day, 0.0, MAX_DAILY_KG, "kg", true);
            if let Some(d) = days {
                ck.range("harvest.days", d as f64, 1.0, 366.0, "days", false);
            }
            (kg_per_day, days)
        }
        Harvest::PerSeason { kg_per_season, days } => {
            ck.range("harvest.kg_per_season", kg_per_season, 0.0, 1.0e7, "kg", true);
            if ck.range("harvest.days", days as f64, 1.0, 366.0, "days", false) {
                let daily = kg_per_season / days as f64;
                if daily.is_finite() && daily > MAX_DAILY_KG {
                    ck.push(
                        "harvest.kg_per_season",
                        num(kg_per_season),
                        &format!("at most {} kg a day", num(MAX_DAILY_KG)),
                        "more plant a day than one still can take: spread it over more days",
                    );
                }
            }
            (kg_per_season / days.max(1) as f64, Some(days))
        }
    };

    ck.range("site.altitude_m", r.site.altitude_m, crate::atmosphere::MIN_ALTITUDE_M, 4000.0, "m", false);
    if let Some(t) = r.site.ambient_temperature_c {
        ck.range("site.ambient_temperature_c", t, -20.0, 50.0, "°C", false);
    }

    let packing = r.packing_density_kg_per_m3.or(crop.map(|c| c.charge_density_kg_per_m3));
    match packing {
        Some(v) => {
            ck.range("packing_density_kg_per_m3", v, 10.0, 1000.0, "kg/m³", false);
        }
        None => ck.push(
            "packing_density_kg_per_m3",
            "empty".into(),
            "10 to 1000 kg/m³",
            "give the charge's packing density, or pick a crop",
        ),
    }
    let steam = r.steam_rate_kg_per_h_per_kg.or(crop.map(|c| c.steam_rate_kg_per_h_per_kg));
    match steam {
        Some(v) => {
            ck.range("steam_rate_kg_per_h_per_kg", v, 0.02, 3.0, "kg/h per kg", false);
        }
        None => ck.push(
            "steam_rate_kg_per_h_per_kg",
            "empty".into(),
            "0.02 to 3 kg/h per kg",
            "give the steam rate per kg of charge, or pick a crop",
        ),
    }

    let (fuel, appliance, heat_cap_w, electric) = heat_supply(&mut ck, &r.heat);

    ck.range("cooling.inlet_c", r.cooling.inlet_c, 0.5, 40.0, "°C", false);
    if let Some(f) = r.cooling.max_flow_kg_per_s {
        ck.range("cooling.max_flow_kg_per_s", f, 0.0, 100.0, "kg/s", true);
    }

    let l = &r.limits;
    ck.range("limits.max_charges_per_day", l.max_charges_per_day as f64, 1.0, 24.0, "", false);
    ck.range("limits.max_run_s", l.max_run_s, 600.0, 172_800.0, "s", false);
    if let Some(w) = l.max_water_per_run_kg {
        ck.range("limits.max_water_per_run_kg", w, 0.0, 1.0e6, "kg", true);
    }
    let warmest_min = if r.cooling.inlet_c.is_finite() { r.cooling.inlet_c + 1.0 } else { 1.5 };
    ck.range("limits.warmest_cooling_water_c", l.warmest_cooling_water_c, warmest_min, 85.0, "°C", false);
    let working_day_s = l.working_day_s.unwrap_or(86_400.0);
    if l.working_day_s.is_some() {
        ck.range("limits.working_day_s", working_day_s, 600.0, 86_400.0, "s", false);
    }

    if !ck.errors.is_empty() {
        return Err(SizingErrors { errors: ck.errors, figures: Vec::new() });
    }
    let (Some(packing_kg_per_m3), Some(steam_rate)) = (packing, steam) else {
        return Err(SizingErrors::one(
            "request",
            String::new(),
            String::new(),
            "the request is incomplete".into(),
        ));
    };
    Ok(Needs {
        base,
        crop,
        daily_kg,
        days,
        packing_kg_per_m3,
        steam_rate_kg_per_h_per_kg: steam_rate,
        fuel,
        appliance,
        heat_cap_w,
        electric,
        working_day_s,
    })
}

type Supply = (Fuel, Appliance, f64, Option<(f64, u8)>);

fn heat_supply(ck: &mut Check, h: &HeatSupply) -> Supply {
    match h {
        HeatSupply::Fuel { fuel, appliance, max_heat_input_w } => {
            let appliance = appliance.unwrap_or(fuel.usual_appliance());
            if *fuel == Fuel::Electricity {
                ck.push(
                    "heat.fuel",
                    "electricity".into(),
                    "propane, natural gas or firewood",
                    "for electric heating give the supply's limit instead (kind \"electric\")",
                );
            } else if !appliance.accepts(*fuel) {
                ck.push(
                    "heat.appliance",
                    format!("{appliance:?}"),
                    "an appliance that uses this fuel",
                    "this appliance cannot use the chosen fuel",
                );
            }
            let top = super::catalogue::heat_ratings(*fuel).last().map(|s| s.value).unwrap_or(1.0e5);
            let cap = max_heat_input_w.unwrap_or(top);
            if max_heat_input_w.is_some() {
                ck.range("heat.max_heat_input_w", cap, 500.0, 5.0e6, "W", false);
            }
            (*fuel, appliance, cap, None)
        }
        HeatSupply::Electric { supply } => {
            let electric = match *supply {
                ElectricSupply::Power { max_power_w } => {
                    ck.range("heat.supply.max_power_w", max_power_w, 500.0, 1.0e6, "W", false);
                    None
                }
                ElectricSupply::Current { current_a, voltage_v, phases } => {
                    ck.range("heat.supply.current_a", current_a, 1.0, 1000.0, "A", false);
                    ck.range("heat.supply.voltage_v", voltage_v, 100.0, 1000.0, "V", false);
                    let p = phases.unwrap_or(1);
                    if p != 1 && p != 3 {
                        ck.push(
                            "heat.supply.phases",
                            p.to_string(),
                            "1 or 3",
                            "a supply has one phase or three",
                        );
                    }
                    Some((voltage_v, p))
                }
            };
            let cap = supply.max_power_w();
            if matches!(supply, ElectricSupply::Current { .. }) && cap.is_finite() && cap < 500.0 {
                ck.push(
                    "heat.supply.current_a",
                    num(cap),
                    "a supply of at least 500 W",
                    "this supply gives under 500 W: too little to raise steam",
                );
            }
            (Fuel::Electricity, Appliance::ImmersionElement, cap, electric)
        }
    }
}
