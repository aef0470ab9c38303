//! The first-still form's edge: each field's label, unit and conversion to the core's
//! `SizingRequest`, which fields a set of choices uses, and the words beside a field for the
//! core's verdict. Units change here and nowhere else in the first-still mode: each field has
//! its metric unit and, where US customary differs, the plan form's US unit for the same
//! quantity ([`crate::fields::us_alt`], NIST SP 811 factors).

use crate::fields::{Alt, TextError, parse_number};
use crate::units::{self, UnitSystem, sp811};
use stillroom_core::heat::Fuel;
use stillroom_core::scenario::{CondenserKind, FieldError};
use stillroom_core::sizing::{
    CoolingSupply, ElectricSupply, Figure, Harvest, HeatSupply, Limits, Quantity, SiteRequest, SizingErrors,
    SizingRequest, TubeStandard,
};

/// One number field of the request.
pub struct SizeField {
    /// Stable key: element ids (`fs-<key>`, `fs-e-<key>`) and tests use it.
    pub key: &'static str,
    /// The core's dotted request path, to match its errors.
    pub path: &'static str,
    pub label: &'static str,
    pub unit: &'static str,
    pub hint: &'static str,
    /// Whether the field may be left empty.
    pub optional: bool,
    /// Whether only whole numbers make sense (charges, days).
    pub whole: bool,
    /// Shown-unit value -> SI value.
    pub to_si: fn(f64) -> f64,
    /// SI value -> shown-unit value.
    pub from_si: fn(f64) -> f64,
    /// The text the form starts with: an invented farm (see [`start_note`]).
    pub start: &'static str,
}

/// Says where the starting entries come from, in the units the form shows them in: the same
/// numbers and units as the fields (the starting entries are metric, see [`SizeField::start`]).
pub fn start_note(system: UnitSystem) -> String {
    let shown = |key: &str| {
        let f = size_field(key);
        let si = si_value(f, f.start, UnitSystem::Metric).ok().flatten().unwrap_or_default();
        format!("{}\u{a0}{}", text_in(f, si, system), f.unit_in(system))
    };
    format!(
        "The starting entries are invented: Larkfield Farm's {} of lavender a day for {} days, at {}, over propane.",
        shown("kg_per_day"),
        size_field("days").start,
        shown("altitude")
    )
}

use crate::fields::convert::{kilo, minutes, per_kilo, per_minutes, same};

fn hours(v: f64) -> f64 {
    v * 3600.0
}
fn per_hours(v: f64) -> f64 {
    v / 3600.0
}

const fn field(
    key: &'static str,
    path: &'static str,
    label: &'static str,
    unit: &'static str,
    hint: &'static str,
    start: &'static str,
) -> SizeField {
    SizeField {
        key,
        path,
        label,
        unit,
        hint,
        optional: false,
        whole: false,
        to_si: same,
        from_si: same,
        start,
    }
}

/// Every number field of the first-still form, in page order.
pub const SIZE_FIELDS: &[SizeField] = &[
    field(
        "kg_per_day",
        "harvest.kg_per_day",
        "Plant cut each day",
        "kg",
        "Fresh weight, as it goes into the still.",
        "40",
    ),
    SizeField {
        whole: true,
        optional: true,
        ..field(
            "days",
            "harvest.days",
            "Days of harvest",
            "days",
            "For the season's totals; leave empty for one day.",
            "20",
        )
    },
    field(
        "kg_per_season",
        "harvest.kg_per_season",
        "Plant for the whole season",
        "kg",
        "Spread evenly over the days of harvest.",
        "800",
    ),
    SizeField {
        whole: true,
        ..field(
            "season_days",
            "harvest.days",
            "Days to distil it in",
            "days",
            "Days the still can run in the season.",
            "20",
        )
    },
    field(
        "altitude",
        "site.altitude_m",
        "Altitude of the still",
        "m",
        "Height above sea level, from a map or GPS.",
        "300",
    ),
    SizeField {
        optional: true,
        to_si: kilo,
        from_si: per_kilo,
        ..field(
            "max_heat",
            "heat.max_heat_input_w",
            "Largest burner or fire you can run",
            "kW",
            "Gas at its sea-level rating. Leave empty to choose from the usual sizes.",
            "",
        )
    },
    SizeField {
        to_si: kilo,
        from_si: per_kilo,
        ..field(
            "max_power",
            "heat.supply.max_power_w",
            "Most power the supply gives",
            "kW",
            "What the circuit may carry for hours, not its peak.",
            "9",
        )
    },
    field(
        "current",
        "heat.supply.current_a",
        "Circuit rating",
        "A",
        "The breaker or fuse of the circuit for the elements.",
        "16",
    ),
    field(
        "voltage",
        "heat.supply.voltage_v",
        "Supply voltage",
        "V",
        "Line to line on three phases (for example 400 V).",
        "230",
    ),
    field(
        "inlet",
        "cooling.inlet_c",
        "Cooling water comes in at",
        "°C",
        "Tap, well or stream water, in the warmest weeks.",
        "15",
    ),
    SizeField {
        optional: true,
        // L/min -> kg/s, a litre of cool water taken as a kilogram (999 kg/m³ at 15 °C,
        // IAPWS-IF97: 0.1 % off, well inside what a tap's flow is known to).
        to_si: per_minutes,
        from_si: minutes,
        ..field(
            "max_flow",
            "cooling.max_flow_kg_per_s",
            "Most cooling water you can run",
            "L/min",
            "Time a bucket at the tap. Leave empty if there is plenty.",
            "",
        )
    },
    SizeField {
        whole: true,
        ..field(
            "charges",
            "limits.max_charges_per_day",
            "Most charges in a day",
            "charges",
            "More charges a day make a smaller still.",
            "2",
        )
    },
    SizeField {
        to_si: hours,
        from_si: per_hours,
        ..field(
            "longest_run",
            "limits.max_run_s",
            "Longest a charge may take",
            "h",
            "From lighting the heat to the end of the first charge's run.",
            "3",
        )
    },
    SizeField {
        optional: true,
        // A litre of water taken as a kilogram, as the cooling flow's field does.
        to_si: same,
        from_si: same,
        ..field(
            "max_water",
            "limits.max_water_per_run_kg",
            "Most water a charge may use",
            "L",
            "Boiler feed and cooling water together. Leave empty if there is plenty.",
            "",
        )
    },
    SizeField {
        optional: true,
        to_si: hours,
        from_si: per_hours,
        ..field(
            "working_day",
            "limits.working_day_s",
            "Hours you can work in a day",
            "h",
            "Every charge, its run and the turnarounds fit inside it. Leave empty for no limit.",
            "",
        )
    },
    field(
        "warmest",
        "limits.warmest_cooling_water_c",
        "Warmest the cooling water may get",
        "°C",
        "The tub at the end of a run, or the jacket's outflow.",
        "45",
    ),
];

/// US gallons a minute of cool water -> kg/s, a litre taken as a kilogram as the metric field
/// does (NIST SP 811: 1 gal = 3.785 411 784 L).
fn gal_per_min(v: f64) -> f64 {
    v * sp811::GAL_M3 * 1e3 / 60.0
}
fn per_gal_per_min(kg_per_s: f64) -> f64 {
    kg_per_s * 60.0 / (sp811::GAL_M3 * 1e3)
}

/// US gallons of water -> kg, a litre taken as a kilogram (NIST SP 811: 1 gal = 3.785 411 784 L).
fn gal_to_kg(v: f64) -> f64 {
    v * sp811::GAL_M3 * 1e3
}
fn kg_to_gal(kg: f64) -> f64 {
    kg / (sp811::GAL_M3 * 1e3)
}

/// A field's US customary unit where it differs from the metric one: the plan form's unit for
/// the same quantity (ft, lb, °F, BTU/h), and gal/min for the cooling water's flow. Electric
/// power stays in kW, as US supplies are rated.
pub fn us_alt(key: &str) -> Option<Alt> {
    let same_as = match key {
        "altitude" => "altitude",
        "kg_per_day" | "kg_per_season" => "harvest",
        "inlet" | "warmest" => "cooling_in",
        "max_heat" => "heat_input",
        "max_flow" => return Some(Alt { unit: "gal/min", to_si: gal_per_min, from_si: per_gal_per_min }),
        "max_water" => return Some(Alt { unit: "gal", to_si: gal_to_kg, from_si: kg_to_gal }),
        _ => return None,
    };
    crate::fields::us_alt(same_as)
}

impl SizeField {
    /// The unit the field is typed in under a system.
    pub fn unit_in(&self, system: UnitSystem) -> &'static str {
        match (system, us_alt(self.key)) {
            (UnitSystem::UsCustomary, Some(a)) => a.unit,
            _ => self.unit,
        }
    }

    /// Typed value -> SI, under a system.
    pub fn to_si_in(&self, system: UnitSystem, v: f64) -> f64 {
        match (system, us_alt(self.key)) {
            (UnitSystem::UsCustomary, Some(a)) => (a.to_si)(v),
            _ => (self.to_si)(v),
        }
    }

    /// SI -> the value shown, under a system.
    pub fn from_si_in(&self, system: UnitSystem, si: f64) -> f64 {
        match (system, us_alt(self.key)) {
            (UnitSystem::UsCustomary, Some(a)) => (a.from_si)(si),
            _ => (self.from_si)(si),
        }
    }

    /// Whether the field's unit differs between the systems.
    pub fn converts(&self) -> bool {
        us_alt(self.key).is_some()
    }
}

/// The text a unit switch writes for an SI value: four significant figures, for reading (the
/// exact SI value stays pinned behind it while the text is unchanged).
pub fn text_in(f: &SizeField, si: f64, system: UnitSystem) -> String {
    let w = f.from_si_in(system, si);
    if w == 0.0 || !w.is_finite() {
        return units::plain(w);
    }
    let digits = 3 - w.abs().log10().floor() as i32;
    let scale = 10f64.powi(digits);
    units::plain((w * scale).round() / scale)
}

/// Looks a field up by key.
pub fn size_field(key: &str) -> &'static SizeField {
    SIZE_FIELDS.iter().find(|f| f.key == key).unwrap_or(&SIZE_FIELDS[0])
}

/// How the harvest is given.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum HarvestMode {
    PerDay,
    PerSeason,
}

/// How an electric supply's limit is given.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum SupplyMode {
    Power,
    Current,
}

/// The form's choices (everything that is not a number field).
#[derive(Debug, Clone, PartialEq)]
pub struct Choices {
    pub crop: String,
    pub harvest: HarvestMode,
    pub fuel: Fuel,
    pub supply: SupplyMode,
    pub phases: u8,
    pub condenser: CondenserKind,
    pub tubes: TubeStandard,
}

impl Default for Choices {
    /// The invented farm's choices (see [`start_note`]).
    fn default() -> Self {
        Choices {
            crop: "lavender".into(),
            harvest: HarvestMode::PerDay,
            fuel: Fuel::Propane,
            supply: SupplyMode::Current,
            phases: 1,
            condenser: CondenserKind::CoilInTub,
            tubes: TubeStandard::Metric,
        }
    }
}

/// Whether a field is part of the request for these choices.
pub fn active(key: &str, c: &Choices) -> bool {
    let electric = c.fuel == Fuel::Electricity;
    match key {
        "kg_per_day" | "days" => c.harvest == HarvestMode::PerDay,
        "kg_per_season" | "season_days" => c.harvest == HarvestMode::PerSeason,
        "max_heat" => !electric,
        "max_power" => electric && c.supply == SupplyMode::Power,
        "current" | "voltage" => electric && c.supply == SupplyMode::Current,
        _ => true,
    }
}

/// Why a field's text could not be used.
#[derive(Debug, Clone, PartialEq)]
pub enum TextProblem {
    Empty,
    NotANumber,
    NotWhole,
}

impl TextProblem {
    pub fn words(&self) -> &'static str {
        match self {
            TextProblem::Empty => "Enter a value.",
            TextProblem::NotANumber => "Enter a number, such as 12.5.",
            TextProblem::NotWhole => "Enter a whole number, such as 2.",
        }
    }
}

/// A field's text, typed in `system`'s unit, in the core's SI unit: `Ok(None)` when empty.
pub fn si_value(f: &SizeField, text: &str, system: UnitSystem) -> Result<Option<f64>, TextProblem> {
    match parse_number(text) {
        Ok(None) => Ok(None),
        Err(TextError::NotANumber | TextError::Empty) => Err(TextProblem::NotANumber),
        Ok(Some(v)) if f.whole && (v.fract() != 0.0 || !(0.0..=1.0e6).contains(&v)) => {
            Err(TextProblem::NotWhole)
        }
        Ok(Some(v)) => Ok(Some(f.to_si_in(system, v))),
    }
}

/// What a field's text means in SI: the reading [`build_request`] takes, by key.
pub type Reading<'a> = &'a dyn Fn(&'static str) -> Result<Option<f64>, TextProblem>;

/// Reads texts (looked up by key) as typed in `system`'s units.
pub fn typed_in(
    text: &dyn Fn(&str) -> String,
    system: UnitSystem,
) -> impl Fn(&'static str) -> Result<Option<f64>, TextProblem> {
    move |key| si_value(size_field(key), &text(key), system)
}

/// Builds the request from the fields' readings (see [`typed_in`]) and the choices, or lists
/// every text that cannot be read.
pub fn build_request(read: Reading, c: &Choices) -> Result<SizingRequest, Vec<(&'static str, TextProblem)>> {
    let mut problems = Vec::new();
    let mut get = |key: &'static str| -> Option<f64> {
        if !active(key, c) {
            return None;
        }
        let f = size_field(key);
        match read(key) {
            Ok(Some(v)) => Some(v),
            Ok(None) if f.optional => None,
            Ok(None) => {
                problems.push((key, TextProblem::Empty));
                None
            }
            Err(p) => {
                problems.push((key, p));
                None
            }
        }
    };
    let harvest = match c.harvest {
        HarvestMode::PerDay => {
            let kg = get("kg_per_day");
            let days = get("days");
            kg.map(|kg_per_day| Harvest::PerDay { kg_per_day, days: days.map(|d| d as u32) })
        }
        HarvestMode::PerSeason => {
            let kg = get("kg_per_season");
            let days = get("season_days");
            kg.zip(days).map(|(kg_per_season, d)| Harvest::PerSeason { kg_per_season, days: d as u32 })
        }
    };
    let altitude = get("altitude");
    let heat = if c.fuel == Fuel::Electricity {
        match c.supply {
            SupplyMode::Power => get("max_power")
                .map(|max_power_w| HeatSupply::Electric { supply: ElectricSupply::Power { max_power_w } }),
            SupplyMode::Current => {
                let a = get("current");
                let v = get("voltage");
                a.zip(v).map(|(current_a, voltage_v)| HeatSupply::Electric {
                    supply: ElectricSupply::Current { current_a, voltage_v, phases: Some(c.phases) },
                })
            }
        }
    } else {
        Some(HeatSupply::Fuel { fuel: c.fuel, appliance: None, max_heat_input_w: get("max_heat") })
    };
    let inlet = get("inlet");
    let max_flow = get("max_flow");
    let charges = get("charges");
    let longest = get("longest_run");
    let warmest = get("warmest");
    let max_water = get("max_water");
    let working_day = get("working_day");
    let (
        Some(harvest),
        Some(altitude_m),
        Some(heat),
        Some(inlet_c),
        Some(charges),
        Some(max_run_s),
        Some(warmest),
    ) = (harvest, altitude, heat, inlet, charges, longest, warmest)
    else {
        return Err(problems);
    };
    if !problems.is_empty() {
        return Err(problems);
    }
    Ok(SizingRequest {
        crop: Some(c.crop.clone()),
        base: None,
        harvest,
        site: SiteRequest { altitude_m, ambient_temperature_c: None },
        heat,
        cooling: CoolingSupply {
            inlet_c,
            max_flow_kg_per_s: max_flow,
            condenser: c.condenser,
            tube_standard: c.tubes,
        },
        limits: Limits {
            max_charges_per_day: charges as u32,
            max_run_s,
            max_water_per_run_kg: max_water,
            warmest_cooling_water_c: warmest,
            working_day_s: working_day,
        },
        packing_density_kg_per_m3: None,
        steam_rate_kg_per_h_per_kg: None,
    })
}

/// The form key that shows an error on `path`, or `None` for one that belongs to no field
/// shown (it is listed with the design instead).
pub fn shown_on(path: &str, c: &Choices) -> Option<&'static str> {
    match path {
        "crop" | "base.charge.crop" => return Some("crop"),
        "heat" | "heat.fuel" | "heat.appliance" => return Some("fuel"),
        "heat.supply.phases" => return Some("phases"),
        // A supply too small (or too big for the catalogue) as a whole.
        "heat.supply" => {
            return Some(if c.supply == SupplyMode::Power { "max_power" } else { "current" });
        }
        _ => {}
    }
    SIZE_FIELDS.iter().find(|f| f.path == path && active(f.key, c)).map(|f| f.key)
}

/// A bound in the field's unit, without needless digits.
fn bound(v: f64) -> String {
    let s = units::sig3(v);
    if s.contains('.') { s.trim_end_matches('0').trim_end_matches('.').to_string() } else { s }
}

/// A sizing figure in the grower's units (the core wrote it in SI words).
fn figure_words(f: &Figure) -> String {
    match f.quantity {
        Quantity::HeatInputW => units::kilowatts(f.si),
        // Electric supplies are rated in kW in either system.
        Quantity::ElectricPowerW => f.shown.clone(),
        Quantity::MassKg => units::mass(f.si),
        Quantity::SteamKgPerS => units::kg_per_hour(f.si),
        // Per kg of charge or per lb: the same ratio, said in the system's mass unit.
        Quantity::SteamPerChargeKgPerSPerKg if units::system() == UnitSystem::UsCustomary => {
            format!("{} lb/h per lb", units::sig3(f.si * 3600.0))
        }
        Quantity::SteamPerChargeKgPerSPerKg => f.shown.clone(),
        Quantity::VolumeM3 => units::volume(f.si),
        // A kilogram of water taken as a litre, as the water fields are.
        Quantity::WaterKg => units::volume(f.si / 1000.0),
        Quantity::WaterFlowKgPerS => units::litres_per_minute(f.si),
        Quantity::TemperatureC => units::celsius(f.si),
    }
}

/// The core's sentence with its figures restated in US customary, each in turn where it stands;
/// in metric, the core's own words.
pub fn in_units(message: &str, figures: &[Figure], system: UnitSystem) -> String {
    if system == UnitSystem::Metric {
        return message.to_string();
    }
    units::with_system(system, || {
        let (mut out, mut rest) = (String::new(), message);
        for f in figures {
            if let Some(at) = rest.find(&f.shown) {
                out.push_str(&rest[..at]);
                out.push_str(&figure_words(f));
                rest = &rest[at + f.shown.len()..];
            }
        }
        out + rest
    })
}

/// The words beside a field for the core's error on it. A range is restated in the field's
/// own unit (the core's bounds are SI); any other verdict is the core's own sentence, its
/// figures in the grower's units.
pub fn error_words(
    f: Option<&SizeField>,
    e: &FieldError,
    figures: &[Figure],
    si: Option<f64>,
    system: UnitSystem,
) -> String {
    if let (Some(f), Some(min), Some(max), Some(v)) = (f, e.min, e.max, si) {
        let unit = f.unit_in(system);
        let unit = if unit.is_empty() { String::new() } else { format!(" {unit}") };
        let (lo, hi) = (f.from_si_in(system, min), f.from_si_in(system, max));
        if v <= min {
            let how = if e.message.contains("more than") { "more than" } else { "at least" };
            return format!("Must be {how} {}{unit}.", bound(lo));
        }
        if v > max {
            return format!("Must be at most {}{unit}.", bound(hi));
        }
    }
    let message = in_units(&e.message, figures, system);
    let mut c = message.chars();
    let first: String = c.next().map(|f| f.to_uppercase().collect()).unwrap_or_default();
    let text = first + c.as_str();
    if text.ends_with('.') { text } else { text + "." }
}

/// Every error of a verdict that no shown field carries, in words.
pub fn unplaced(errors: &SizingErrors, c: &Choices, system: UnitSystem) -> Vec<String> {
    errors
        .errors
        .iter()
        .filter(|e| shown_on(&e.field, c).is_none())
        .map(|e| format!("{}: {}", e.field, error_words(None, e, &errors.figures, None, system)))
        .collect()
}

#[cfg(test)]
mod tests {
    use super::*;
    use wasm_bindgen_test::wasm_bindgen_test;

    fn starting_text(key: &str) -> String {
        size_field(key).start.to_string()
    }

    #[wasm_bindgen_test]
    fn the_starting_entries_are_the_documented_example_request() {
        // The invented request of DEVELOPERS.md's sizing section, read by serde: an independent
        // path to the same request.
        let documented: SizingRequest = serde_json::from_str(
            r#"{
              "crop": "lavender",
              "harvest": { "kind": "per_day", "kg_per_day": 40, "days": 20 },
              "site": { "altitude_m": 300 },
              "heat": { "kind": "fuel", "fuel": "propane" },
              "cooling": { "inlet_c": 15 },
              "limits": { "max_charges_per_day": 2, "max_run_s": 10800, "warmest_cooling_water_c": 45 }
            }"#,
        )
        .unwrap();
        let metric = typed_in(&starting_text, UnitSystem::Metric);
        assert_eq!(build_request(&metric, &Choices::default()), Ok(documented));
    }

    #[wasm_bindgen_test]
    fn units_convert_at_the_edge_and_hidden_fields_are_ignored() {
        let c = Choices {
            fuel: Fuel::Electricity,
            supply: SupplyMode::Power,
            harvest: HarvestMode::PerSeason,
            ..Choices::default()
        };
        let text = |key: &str| match key {
            "max_power" => "6,5".to_string(),
            "max_flow" => "30".to_string(),
            "longest_run" => "2.5".to_string(),
            "max_water" => "800".to_string(),
            "working_day" => "9.5".to_string(),
            "kg_per_season" => "900".to_string(),
            "season_days" => "15".to_string(),
            // Hidden for these choices: never read.
            "current" | "kg_per_day" | "max_heat" => "nonsense".to_string(),
            k => starting_text(k),
        };
        let r = build_request(&typed_in(&text, UnitSystem::Metric), &c).unwrap();
        assert_eq!(r.heat, HeatSupply::Electric { supply: ElectricSupply::Power { max_power_w: 6500.0 } });
        assert_eq!(r.cooling.max_flow_kg_per_s, Some(0.5));
        assert_eq!(r.limits.max_run_s, 9000.0);
        assert_eq!(r.limits.max_water_per_run_kg, Some(800.0));
        assert_eq!(r.limits.working_day_s, Some(34_200.0));
        assert_eq!(r.harvest, Harvest::PerSeason { kg_per_season: 900.0, days: 15 });
    }

    #[wasm_bindgen_test]
    fn us_customary_texts_are_read_in_the_plan_forms_us_units() {
        // NIST SP 811 Appendix B.8: 1 lb = 0.453 592 37 kg, 1 ft = 0.3048 m,
        // t/°C = (t/°F − 32)/1.8, 1 BTU/h = 0.293 071 1 W, 1 gal = 3.785 411 784 L.
        let text = |key: &str| match key {
            "kg_per_day" => "100".to_string(),
            "altitude" => "1000".to_string(),
            "inlet" => "59".to_string(),
            "warmest" => "113".to_string(),
            "max_heat" => "40000".to_string(),
            "max_flow" => "5".to_string(),
            "max_water" => "200".to_string(),
            k => starting_text(k),
        };
        let r = build_request(&typed_in(&text, UnitSystem::UsCustomary), &Choices::default()).unwrap();
        let close = |a: f64, b: f64| (a - b).abs() <= 1e-12 * b.abs().max(1.0);
        let Harvest::PerDay { kg_per_day, .. } = r.harvest else { panic!("per day") };
        assert!(close(kg_per_day, 45.359237), "{kg_per_day}");
        assert!(close(r.site.altitude_m, 304.8));
        assert!(close(r.cooling.inlet_c, 15.0));
        assert!(close(r.limits.warmest_cooling_water_c, 45.0));
        let HeatSupply::Fuel { max_heat_input_w: Some(w), .. } = r.heat else { panic!("fuel") };
        assert!(close(w, 11_722.844), "{w}");
        assert!(close(r.cooling.max_flow_kg_per_s.unwrap(), 5.0 * 3.785411784 / 60.0));
        assert!(close(r.limits.max_water_per_run_kg.unwrap(), 757.0823568));
        // Left empty, as they start: no limit.
        assert_eq!(r.limits.working_day_s, None);
        // Hours, charges and days are the same in both systems.
        assert_eq!(r.limits.max_run_s, 10_800.0);
        assert_eq!(size_field("altitude").unit_in(UnitSystem::UsCustomary), "ft");
        assert_eq!(size_field("longest_run").unit_in(UnitSystem::UsCustomary), "h");
        // A switch writes a readable text; the value it stands for is pinned by the caller.
        assert_eq!(text_in(size_field("kg_per_day"), 40.0, UnitSystem::UsCustomary), "88.18");
        assert_eq!(text_in(size_field("inlet"), 15.0, UnitSystem::UsCustomary), "59");
        assert_eq!(text_in(size_field("altitude"), 300.0, UnitSystem::UsCustomary), "984.3");
        // The note on the starting entries says them as the fields do: 40 kg is 88.18 lb
        // (1 lb = 0.453 592 37 kg) and 300 m is 984.3 ft (1 ft = 0.3048 m), SP 811 B.8.
        assert_eq!(
            start_note(UnitSystem::UsCustomary),
            "The starting entries are invented: Larkfield Farm's 88.18\u{a0}lb of lavender a day for 20 days, at 984.3\u{a0}ft, over propane."
        );
        assert!(
            start_note(UnitSystem::Metric)
                .contains("40\u{a0}kg of lavender a day for 20 days, at 300\u{a0}m,")
        );
    }

    #[wasm_bindgen_test]
    fn unreadable_texts_are_named_by_field() {
        let text = |key: &str| match key {
            "charges" => "2.5".to_string(),
            "inlet" => "cold".to_string(),
            "altitude" => String::new(),
            k => starting_text(k),
        };
        let problems = build_request(&typed_in(&text, UnitSystem::Metric), &Choices::default()).unwrap_err();
        assert!(problems.contains(&("charges", TextProblem::NotWhole)));
        assert!(problems.contains(&("inlet", TextProblem::NotANumber)));
        assert!(problems.contains(&("altitude", TextProblem::Empty)));
        assert_eq!(problems.len(), 3);
    }

    #[wasm_bindgen_test]
    fn a_limit_the_design_cannot_meet_is_told_in_the_growers_units() {
        let c = Choices::default();
        let mut r = build_request(&typed_in(&starting_text, UnitSystem::Metric), &c).unwrap();
        r.harvest = Harvest::PerDay { kg_per_day: 30.0, days: Some(20) };
        r.heat = HeatSupply::Fuel { fuel: Fuel::Propane, appliance: None, max_heat_input_w: Some(5000.0) };
        let e = stillroom_core::size(&r).unwrap_err();
        let err = e.on("heat.max_heat_input_w").unwrap_or_else(|| panic!("{e}"));
        let metric = error_words(Some(size_field("max_heat")), err, &e.figures, None, UnitSystem::Metric);
        assert!(metric.starts_with("5 kW cannot raise the steam"), "{metric}");
        assert!(metric.contains("for 15.0 kg at 2 charges a day"), "{metric}");
        let us = error_words(Some(size_field("max_heat")), err, &e.figures, None, UnitSystem::UsCustomary);
        // 5000 W over 0.293 071 1 W per BTU/h (NIST SP 811 B.8) is 17 060.7 BTU/h, 17 100 to
        // the page's three figures; 15.0 kg over 0.453 592 37 kg a pound is 33.07 lb.
        let packed: String = us.chars().filter(|c| !c.is_whitespace() && *c != '\u{202f}').collect();
        assert!(packed.starts_with("17100BTU/hcannotraisethesteam"), "{us}");
        assert!(us.contains("for 33.1 lb at 2 charges a day"), "{us}");
        assert!(us.contains("lb/h per lb"), "{us}");
        assert!(!us.contains("kg") && !us.contains("kW"), "{us}");
    }

    #[wasm_bindgen_test]
    fn the_cores_bounds_are_restated_in_the_fields_unit() {
        let c = Choices::default();
        let mut r = build_request(&typed_in(&starting_text, UnitSystem::Metric), &c).unwrap();
        r.limits.max_run_s = 100.0 * 3600.0;
        let e = stillroom_core::size(&r).unwrap_err();
        let err = e.on("limits.max_run_s").unwrap();
        assert_eq!(shown_on(&err.field, &c), Some("longest_run"));
        assert_eq!(
            error_words(
                Some(size_field("longest_run")),
                err,
                &e.figures,
                Some(r.limits.max_run_s),
                UnitSystem::Metric
            ),
            "Must be at most 48 h."
        );
        // The same bound in US customary, where the field is in hours too; a temperature's in °F.
        let err = stillroom_core::scenario::FieldError {
            field: "limits.warmest_cooling_water_c".into(),
            value: "150".into(),
            valid: String::new(),
            message: "must be at most 100".into(),
            min: Some(0.0),
            max: Some(100.0),
        };
        assert_eq!(
            error_words(Some(size_field("warmest")), &err, &[], Some(150.0), UnitSystem::UsCustomary),
            "Must be at most 212 °F."
        );
        assert_eq!(
            shown_on("heat.supply", &Choices { supply: SupplyMode::Power, ..c.clone() }),
            Some("max_power")
        );
        assert_eq!(shown_on("base.still.metal_mass_kg", &c), None);
    }
}
