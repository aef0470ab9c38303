//! How numbers are shown: the plan's SI values in the units a grower reads, rounded to what the
//! physics can honestly claim. Components call these and nothing else for numbers.
//!
//! Two systems: metric, and US customary. The US factors are those of NIST Special
//! Publication 811 (2008), *Guide for the Use of the International System of Units*,
//! Appendix B.8 ("Factors for units listed alphabetically"), each named beside its line in
//! [`sp811`]. The system in force is set per render by [`with_system`], so every formatter
//! below answers in the grower's choice without each call passing it.

use std::cell::Cell;

/// The grower's choice of units. The scenario is always SI; only what is shown changes.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Default)]
pub enum UnitSystem {
    #[default]
    Metric,
    UsCustomary,
}

impl UnitSystem {
    /// Name under which the choice is stored.
    pub fn key(self) -> &'static str {
        match self {
            UnitSystem::Metric => "metric",
            UnitSystem::UsCustomary => "us",
        }
    }

    pub fn from_key(key: &str) -> Option<UnitSystem> {
        match key {
            "metric" => Some(UnitSystem::Metric),
            "us" => Some(UnitSystem::UsCustomary),
            _ => None,
        }
    }
}

/// Conversion factors to SI, from NIST SP 811 (2008) Appendix B.8; the line each comes from
/// is quoted beside it. Exact factors are marked so.
pub mod sp811 {
    /// "pound (avoirdupois) (lb) ... kilogram (kg) 4.535 924 E-01" (exact: 0.453 592 37).
    pub const LB_KG: f64 = 0.453_592_37;
    /// "ounce (avoirdupois) (oz) ... kilogram (kg) 2.834 952 E-02".
    pub const OZ_KG: f64 = 2.834_952e-2;
    /// "gallon [U.S.] (gal) ... cubic meter (m³) 3.785 412 E-03" (exact: 3.785 411 784).
    pub const GAL_M3: f64 = 3.785_411_784e-3;
    /// "quart [U.S. liquid] (qt) ... cubic meter (m³) 9.463 529 E-04".
    pub const QT_M3: f64 = GAL_M3 / 4.0;
    /// "ounce [U.S. fluid] (fl oz) ... cubic meter (m³) 2.957 353 E-05".
    pub const FL_OZ_M3: f64 = GAL_M3 / 128.0;
    /// "cubic foot (ft³) ... cubic meter (m³) 2.831 685 E-02".
    pub const FT3_M3: f64 = FT_M * FT_M * FT_M;
    /// "foot (ft) ... meter (m) 3.048 E-01" (exact).
    pub const FT_M: f64 = 0.3048;
    /// "inch (in) ... meter (m) 2.54 E-02" (exact).
    pub const IN_M: f64 = 0.0254;
    /// "square foot (ft²) ... square meter (m²) 9.290 304 E-02" (exact).
    pub const FT2_M2: f64 = FT_M * FT_M;
    /// "square inch (in²) ... square meter (m²) 6.4516 E-04" (exact).
    pub const IN2_M2: f64 = IN_M * IN_M;
    /// "inch of mercury, conventional (inHg) ... pascal (Pa) 3.386 389 E+03".
    pub const INHG_PA: f64 = 3.386_389e3;
    /// "pound-force per square inch (psi) (lbf/in²) ... pascal (Pa) 6.894 757 E+03".
    pub const PSI_PA: f64 = 6.894_757e3;
    /// "British thermal unit_IT per hour (Btu_IT/h) ... watt (W) 2.930 711 E-01".
    pub const BTU_H_W: f64 = 2.930_711e-1;
    /// "British thermal unit_IT per hour square foot degree Fahrenheit
    /// [Btu_IT/(h · ft² · °F)] ... watt per square meter kelvin [W/(m² · K)] 5.678 263 E+00".
    pub const BTU_H_FT2_F_W_M2_K: f64 = 5.678_263;
    /// "therm (U.S.) ... joule (J) 1.054 804 E+08".
    pub const THERM_J: f64 = 1.054_804e8;
    /// "cord (128 ft³) ... cubic meter (m³) 3.624 556".
    pub const CORD_M3: f64 = 3.624_556;
    /// B.8 note on temperature: t/°C = (t/°F − 32)/1.8; a temperature interval of 1 °F is
    /// 5/9 K.
    pub const F_PER_K: f64 = 1.8;
}

thread_local! {
    static SYSTEM: Cell<UnitSystem> = const { Cell::new(UnitSystem::Metric) };
}

/// Runs `f` with `system` as the system the formatters answer in.
pub fn with_system<R>(system: UnitSystem, f: impl FnOnce() -> R) -> R {
    /// Puts the system back even if `f` panics, so one failing check cannot leak its
    /// units into the next.
    struct Restore(UnitSystem);
    impl Drop for Restore {
        fn drop(&mut self) {
            SYSTEM.with(|s| s.set(self.0));
        }
    }
    let _restore = Restore(SYSTEM.with(|s| s.replace(system)));
    f()
}

/// The system in force (see [`with_system`]).
pub fn system() -> UnitSystem {
    SYSTEM.with(|s| s.get())
}

fn us() -> bool {
    system() == UnitSystem::UsCustomary
}

/// °C to °F.
pub fn c_to_f(c: f64) -> f64 {
    c * sp811::F_PER_K + 32.0
}

/// °F to °C.
pub fn f_to_c(f: f64) -> f64 {
    (f - 32.0) / sp811::F_PER_K
}
/// A number with a fixed count of decimals, a minus sign that reads as one, no "-0".
pub fn fixed(v: f64, decimals: usize) -> String {
    if !v.is_finite() {
        return "–".to_string();
    }
    let s = format!("{:.*}", decimals, v);
    let s = if s.trim_start_matches('-').chars().all(|c| c == '0' || c == '.') {
        s.trim_start_matches('-').to_string()
    } else {
        s
    };
    s.replace('-', "−")
}

/// A number as a person would type it back: no trailing zeros, at most six decimals.
pub fn plain(v: f64) -> String {
    let s = format!("{:.6}", v);
    let s = s.trim_end_matches('0').trim_end_matches('.');
    if s == "-0" { "0".to_string() } else { s.to_string() }
}

/// A number read back in full, for "read as …" notes: no thousands marks, point decimal.
pub fn plain_full(v: f64) -> String {
    plain(v)
}

/// A limit restated for a message, at the precision of about three figures, rounded inwards
/// (`up` for a lower bound) so that a value typed as shown is inside the range: "at most
/// 94.9 °C" for 94.98, never "95.0".
pub fn limit(v: f64, up: bool) -> String {
    let a = v.abs();
    let decimals: i32 = if a >= 100.0 {
        if a.fract().abs() < 1e-9 || a >= 1000.0 { 0 } else { 1 }
    } else if a >= 10.0 {
        1
    } else if a >= 1.0 {
        2
    } else if a >= 0.1 {
        3
    } else {
        4
    };
    let scale = 10f64.powi(decimals);
    let scaled = v * scale;
    // Values within a hair of a round number are that number (unit factors leave dust).
    let r = if (scaled - scaled.round()).abs() < 1e-6 {
        scaled.round()
    } else if up {
        scaled.ceil()
    } else {
        scaled.floor()
    };
    plain(r / scale).replace('-', "−")
}

/// A number to about three significant figures. The decimals follow the value as it will
/// be shown, so 0.99999 reads "1.00" rather than "1.000".
pub fn sig3(v: f64) -> String {
    let decimals_for = |a: f64| -> i32 {
        if a >= 100.0 {
            0
        } else if a >= 10.0 {
            1
        } else if a >= 1.0 {
            2
        } else if a >= 0.1 {
            3
        } else {
            4
        }
    };
    let first = decimals_for(v.abs());
    let scale = 10f64.powi(first);
    let shown = (v.abs() * scale).round() / scale;
    fixed(v, decimals_for(shown).min(first) as usize)
}

/// Air pressure: kPa, or inHg (a barometer's unit) in US customary.
pub fn kpa(pa: f64) -> String {
    if us() {
        return format!("{} inHg", fixed(pa / sp811::INHG_PA, 2));
    }
    format!("{} kPa", fixed(pa / 1e3, 1))
}

pub fn celsius(c: f64) -> String {
    if us() {
        return format!("{} °F", fixed(c_to_f(c), 1));
    }
    format!("{} °C", fixed(c, 1))
}

/// A temperature difference, with its sign.
pub fn kelvin_shift(k: f64) -> String {
    let (v, unit) = if us() { (k * sp811::F_PER_K, "°F") } else { (k, "K") };
    let s = fixed(v, 1);
    if v > 0.05 { format!("+{s} {unit}") } else { format!("{s} {unit}") }
}

/// A temperature difference without sign: K, or °F in US customary.
pub fn kelvin(k: f64, decimals: usize) -> String {
    if us() {
        return format!("{} °F", fixed(k * sp811::F_PER_K, decimals));
    }
    format!("{} K", fixed(k, decimals))
}

/// Mass: grams under 1 kg, kilograms above, tonnes above 10 t; US: ounces under 1 lb, pounds.
pub fn mass(kg: f64) -> String {
    if us() {
        let lb = kg / sp811::LB_KG;
        return if lb.abs() < 1.0 {
            format!("{} oz", sig3(kg / sp811::OZ_KG))
        } else {
            format!("{} lb", sig3(lb))
        };
    }
    if kg.abs() < 1.0 {
        format!("{} g", sig3(kg * 1e3))
    } else if kg.abs() < 10_000.0 {
        format!("{} kg", sig3(kg))
    } else {
        format!("{} t", sig3(kg / 1e3))
    }
}

/// Volume: millilitres under 1 L, litres above, cubic metres above 10 m³.
pub fn volume(m3: f64) -> String {
    if us() {
        let gal = m3 / sp811::GAL_M3;
        return if gal.abs() < 1.0 {
            format!("{} qt", sig3(m3 / sp811::QT_M3))
        } else {
            format!("{} gal", sig3(gal))
        };
    }
    let l = m3 * 1e3;
    if l.abs() < 1.0 {
        format!("{} mL", sig3(l * 1e3))
    } else if l.abs() < 10_000.0 {
        format!("{} L", sig3(l))
    } else {
        format!("{} m³", sig3(m3))
    }
}

/// Duration as hours and minutes.
pub fn duration(s: f64) -> String {
    if !s.is_finite() {
        return "–".to_string();
    }
    let total_min = (s / 60.0).round() as i64;
    let (h, m) = (total_min / 60, total_min % 60);
    if h == 0 { format!("{m} min") } else { format!("{h} h {m:02} min") }
}

/// A site's altitude: whole metres, or whole feet.
pub fn altitude(m: f64) -> String {
    if us() {
        return format!("{} ft", fixed(m / sp811::FT_M, 0));
    }
    format!("{} m", fixed(m, 0))
}

/// Oil: millilitres or litres; US fluid ounces.
pub fn oil_volume(m3: f64) -> String {
    if us() {
        return format!("{} fl oz", sig3(m3 / sp811::FL_OZ_M3));
    }
    volume(m3)
}

pub fn kilowatts(w: f64) -> String {
    if us() {
        return format!("{} BTU/h", grouped(w / sp811::BTU_H_W));
    }
    format!("{} kW", sig3(w / 1e3))
}

/// Heat: MJ, or thousands of BTU in US customary.
pub fn megajoules(j: f64) -> String {
    if us() {
        return format!("{} kBTU", sig3(j / sp811::BTU_H_W / 3600.0 / 1e3));
    }
    format!("{} MJ", sig3(j / 1e6))
}

/// A large whole number with thin-space thousands gaps, to three figures: "85 300".
pub fn grouped(v: f64) -> String {
    let digits = if v.abs() >= 1000.0 { (v.abs().log10().floor() as i32) - 2 } else { 0 };
    let step = 10f64.powi(digits.max(0));
    let n = ((v / step).round() * step) as i64;
    let s = n.abs().to_string();
    let mut out = String::new();
    for (i, ch) in s.chars().enumerate() {
        if i > 0 && (s.len() - i).is_multiple_of(3) {
            out.push('\u{202f}');
        }
        out.push(ch);
    }
    if n < 0 { format!("−{out}") } else { out }
}

pub fn area(m2: f64) -> String {
    if us() {
        let ft2 = m2 / sp811::FT2_M2;
        return if ft2 < 1.0 {
            format!("{} in²", sig3(m2 / sp811::IN2_M2))
        } else {
            format!("{} ft²", sig3(ft2))
        };
    }
    if m2 < 0.1 { format!("{} cm²", sig3(m2 * 1e4)) } else { format!("{} m²", sig3(m2)) }
}

pub fn length(m: f64) -> String {
    if us() {
        let ft = m / sp811::FT_M;
        return if ft < 3.0 { format!("{} in", sig3(m / sp811::IN_M)) } else { format!("{} ft", sig3(ft)) };
    }
    if m < 1.0 { format!("{} cm", sig3(m * 100.0)) } else { format!("{} m", sig3(m)) }
}

/// A short height: mm, or inches in US customary.
pub fn millimetres(m: f64) -> String {
    if us() {
        return format!("{} in", fixed(m / sp811::IN_M, 2));
    }
    format!("{} mm", fixed(m * 1000.0, 0))
}

/// Water flow from kg/s (1 kg of water taken as 1 L).
pub fn litres_per_minute(kg_per_s: f64) -> String {
    if us() {
        return format!("{} gal/min", sig3(kg_per_s * 60.0 * 1e-3 / sp811::GAL_M3));
    }
    format!("{} L/min", sig3(kg_per_s * 60.0))
}

pub fn litres_per_hour(m3_per_s: f64) -> String {
    if us() {
        return format!("{} gal/h", sig3(m3_per_s * 3600.0 / sp811::GAL_M3));
    }
    format!("{} L/h", sig3(m3_per_s * 3.6e6))
}

pub fn mm_per_s(m_per_s: f64) -> String {
    if us() {
        return format!("{} in/s", sig3(m_per_s / sp811::IN_M));
    }
    format!("{} mm/s", sig3(m_per_s * 1e3))
}

/// A mass flow: kg/h, or lb/h.
pub fn kg_per_hour(kg_per_s: f64) -> String {
    if us() {
        return format!("{} lb/h", sig3(kg_per_s * 3600.0 / sp811::LB_KG));
    }
    format!("{} kg/h", sig3(kg_per_s * 3600.0))
}

/// A density: g/mL in both systems (a specific gravity reads the same).
pub fn g_per_ml(kg_per_m3: f64) -> String {
    format!("{} g/mL", fixed(kg_per_m3 / 1000.0, 3))
}

pub fn percent(fraction: f64) -> String {
    format!("{} %", sig3(fraction * 100.0))
}

/// Liquid propane's density at 60 °F, kg/m³: relative density 0.507 (GPA 2145, from memory)
/// times water's 999.0 kg/m³ at 60 °F; about 4.23 lb per US gallon.
pub const PROPANE_LIQUID_KG_PER_M3: f64 = 0.507 * 999.0;

/// Stacked firewood's bulk density, kg/m³: a cord of seasoned mixed hardwood weighs about
/// 1,800-2,300 kg (from memory; it varies with species and dryness), about 2,000 kg over the
/// cord's 3.62 m³ of stack. Only for showing a purchase in cords; the plan works in kg.
pub const FIREWOOD_STACKED_KG_PER_M3: f64 = 2000.0 / sp811::CORD_M3;

/// Natural gas's higher (gross) heating value over its lower (net) one: 1,089 against 983 Btu/ft³
/// in the same GREET table the core's net value comes from (from memory). A US utility bills the
/// therm (100,000 Btu) on the gross value, so therms shown and prices typed per therm use it;
/// the plan's fuel stays on the net value, the heat a burner can use.
pub const NATURAL_GAS_GROSS_OVER_NET: f64 = 1089.0 / 983.0;

/// Therms (U.S., as billed: gross heating value) in a cubic metre of natural gas.
pub fn therms_per_m3_of_gas() -> f64 {
    let net = stillroom_core::heat::Fuel::NaturalGas.data().heating_value_j_per_unit;
    net * NATURAL_GAS_GROSS_OVER_NET / sp811::THERM_J
}

/// An amount of fuel, given in the core's sales unit (kg, m³, kWh): metric as it is; US as
/// propane in lb and gal, natural gas in therms and ft³, firewood in lb, electricity in kWh.
pub fn fuel(amount: f64, fuel: stillroom_core::heat::Fuel) -> String {
    use stillroom_core::heat::Fuel;
    let data = fuel.data();
    if !us() {
        return format!("{} {}", sig3(amount), data.unit);
    }
    match fuel {
        Fuel::Propane => format!(
            "{} lb ({} gal)",
            sig3(amount / sp811::LB_KG),
            sig3(amount / PROPANE_LIQUID_KG_PER_M3 / sp811::GAL_M3)
        ),
        Fuel::NaturalGas => {
            format!("{} therms ({} ft³)", sig3(amount * therms_per_m3_of_gas()), sig3(amount / sp811::FT3_M3))
        }
        Fuel::Firewood => format!(
            "{} lb (about {} cord)",
            sig3(amount / sp811::LB_KG),
            sig3(amount / FIREWOOD_STACKED_KG_PER_M3 / sp811::CORD_M3)
        ),
        Fuel::Electricity => format!("{} {}", sig3(amount), data.unit),
    }
}

/// A cost per millilitre of oil, per the oil's unit in force: " (0.12 per mL of oil)", or per
/// US fluid ounce (29.57 mL, SP 811).
pub fn per_oil(cost_per_ml: f64) -> String {
    if us() {
        format!(" ({} per fl oz of oil)", sig3(cost_per_ml * sp811::FL_OZ_M3 * 1e6))
    } else {
        format!(" ({} per mL of oil)", sig3(cost_per_ml))
    }
}

/// A low–high range with a central value, e.g. "120 mL (90–150)".
pub fn range(central: String, low: String, high: String) -> String {
    format!("{central} ({low} – {high})")
}

#[cfg(test)]
mod tests {
    use super::*;
    use wasm_bindgen_test::wasm_bindgen_test;

    #[wasm_bindgen_test]
    fn readable_units() {
        assert_eq!(duration(3900.0), "1 h 05 min");
        assert_eq!(duration(600.0), "10 min");
        assert_eq!(mass(0.1234), "123 g");
        assert_eq!(volume(0.0071), "7.10 L");
        assert_eq!(fixed(-0.01, 1), "0.0");
        assert_eq!(kelvin_shift(-1.04), "−1.0 K");
    }

    #[wasm_bindgen_test]
    fn limits_round_inwards_at_the_shown_precision() {
        assert_eq!(limit(94.982082, false), "94.9");
        assert_eq!(limit(5.000000001, true), "5");
        assert_eq!(limit(0.05, true), "0.05");
        assert_eq!(limit(2.0000000004, true), "2");
        assert_eq!(limit(6000.0, false), "6000");
        assert_eq!(limit(-500.0, true), "−500");
        assert_eq!(limit(202.97, false), "202.9");
    }

    #[wasm_bindgen_test]
    fn three_figures_follow_the_value_as_shown() {
        assert_eq!(sig3(0.999_999_9), "1.00");
        assert_eq!(sig3(99.97), "100");
        assert_eq!(sig3(9.996), "10.0");
        assert_eq!(sig3(0.123_45), "0.123");
        assert_eq!(sig3(1234.4), "1234");
        assert_eq!(sig3(-0.999_99), "−1.00");
    }

    #[wasm_bindgen_test]
    fn a_cost_per_oil_follows_the_oils_unit() {
        assert_eq!(per_oil(0.5), " (0.500 per mL of oil)");
        // 1 US fl oz = 29.573 53 mL (SP 811).
        with_system(UnitSystem::UsCustomary, || assert_eq!(per_oil(0.5), " (14.8 per fl oz of oil)"));
    }

    #[wasm_bindgen_test]
    fn firewood_is_shown_in_pounds_and_cords_in_us_units() {
        use stillroom_core::heat::Fuel;
        // 2000 kg is 4409 lb (1 lb = 0.453 592 37 kg, SP 811), and about one cord at the
        // stacked density above; metric keeps the core's kg.
        with_system(UnitSystem::UsCustomary, || {
            assert_eq!(fuel(2000.0, Fuel::Firewood), "4409 lb (about 1.00 cord)");
        });
        assert_eq!(fuel(2000.0, Fuel::Firewood), "2000 kg");
    }

    #[wasm_bindgen_test]
    fn natural_gas_is_shown_in_therms_as_billed() {
        use stillroom_core::heat::Fuel;
        // 10 m³ at 36.6 MJ/m³ net is 366 MJ, 405.5 MJ gross (× 1089 / 983, GREET, from memory);
        // over 105.4804 MJ a therm (SP 811) that is 3.844 therms; 10 m³ / 0.028 316 846 592 m³
        // a ft³ (SP 811) is 353.1 ft³.
        with_system(UnitSystem::UsCustomary, || {
            assert_eq!(fuel(10.0, Fuel::NaturalGas), "3.84 therms (353 ft³)");
        });
    }

    #[wasm_bindgen_test]
    fn us_customary_formats() {
        with_system(UnitSystem::UsCustomary, || {
            // 100 °C = 212 °F; 15 kg = 33.1 lb; 1 US gal = 3.785 411 784 L (SP 811).
            assert_eq!(celsius(100.0), "212.0 °F");
            assert_eq!(mass(15.0), "33.1 lb");
            assert_eq!(volume(0.037_854_117_84), "10.0 gal");
            assert_eq!(oil_volume(29.573_53e-6 * 2.0), "2.00 fl oz");
            assert_eq!(kelvin_shift(-5.0), "−9.0 °F");
        });
        assert_eq!(celsius(100.0), "100.0 °C", "the system is set only inside with_system");
    }
}
