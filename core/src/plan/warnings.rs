//! Warnings: what the grower should know about this plan, read off the other stages.

use super::equilibrium::Equilibrium;
use super::timeline::Timeline;
use super::{
    CondenserPlan, EnergyPlan, OilLayer, OilPlan, Resolved, RunLimit, SeparatorPlan, Warning, YieldPlan,
};
use crate::compounds::Confidence;
use crate::scenario::Scenario;

/// Steam rising through the charge: droplets of 100 µm and more fall back below about
/// 0.2-0.3 m/s (terminal velocities computed with fluids 1.3.1); above, the steam carries
/// water up and finds channels (judgement, no published limit).
const STEAM_VELOCITY_LIMIT_M_PER_S: f64 = 0.25;
/// Oil and water densities closer than this part slowly, kg/m³ (common practice, no source).
const SLOW_PARTING_DENSITY_DIFFERENCE: f64 = 20.0;
/// Interface moves more than this many mm per mm of gooseneck: the outlets need care
/// (judgement, common practice, no source).
const TOUCHY_INTERFACE: f64 = 20.0;
/// A charge this far over the still's usual packing is overpacked (common practice, no source).
const OVERPACKED_RATIO: f64 = 1.25;

/// Leafy and flowering herbs hold a few per cent of oil at most; over 10 % is most likely a
/// typing slip (common practice, no source), unless the crop's own high end is above it (dried
/// buds and seeds in the crop table).
const MOST_OIL_ANY_CROP_PERCENT: f64 = 10.0;
/// A barometer more than this share off the standard atmosphere at the stated altitude is most
/// likely a misread (the weather moves pressure by a few per cent at most: the lowest and highest
/// sea-level pressures on record, 870 and 1084 hPa, are -14 % and +7 %).
const BAROMETER_PLAUSIBLE_SHARE: f64 = 0.10;

/// Everything the warnings read.
pub(super) struct Facts<'a> {
    pub scenario: &'a Scenario,
    pub resolved: &'a Resolved,
    pub equilibrium: &'a Equilibrium,
    pub oil: &'a OilPlan,
    pub timeline: &'a Timeline,
    pub energy: &'a EnergyPlan,
    pub condenser: &'a CondenserPlan,
    pub separator: &'a SeparatorPlan,
    pub oil_yield: &'a YieldPlan,
    pub still_capacity_kg: Option<f64>,
}

fn warn(list: &mut Vec<Warning>, code: &str, message: String) {
    list.push(Warning { code: code.to_string(), message });
}

/// Every warning, in the order of the run: data, oil, time line, heat, condenser, separator,
/// yield, capacity.
pub(super) fn warnings(f: &Facts) -> Vec<Warning> {
    let mut list = Vec::new();
    plausibility_warnings(f, &mut list);
    data_warnings(f, &mut list);
    density_warnings(f, &mut list);
    run_warnings(f, &mut list);
    heat_and_cooling_warnings(f, &mut list);
    separator_and_yield_warnings(f, &mut list);
    capacity_warnings(f, &mut list);
    list
}

/// Entries that are possible but unlikely: said plainly, so a slip is caught before the run.
fn plausibility_warnings(f: &Facts, list: &mut Vec<Warning>) {
    let oil_percent = f.resolved.oil_content_fraction * 100.0;
    let most = f
        .resolved
        .crop
        .map_or(MOST_OIL_ANY_CROP_PERCENT, |c| c.oil_content_percent.high.max(MOST_OIL_ANY_CROP_PERCENT));
    if oil_percent > most {
        warn(
            list,
            "oil_content_implausible",
            format!(
                "{oil_percent:.1} % oil is more than such a crop holds (at most about {most:.0} %): check the oil content, which sets every oil figure here."
            ),
        );
    }
    let Some(b) = &f.scenario.site.barometer else { return };
    let (read, standard, what) = match b.reference {
        crate::scenario::BarometerReference::Station => (
            b.pressure_pa,
            crate::atmosphere::standard_pressure_pa(f.scenario.site.altitude_m).ok(),
            "at the stated altitude",
        ),
        crate::scenario::BarometerReference::SeaLevel => {
            (b.pressure_pa, Some(crate::atmosphere::SEA_LEVEL_PRESSURE_PA), "at sea level")
        }
    };
    if let Some(std_pa) = standard
        && ((read - std_pa) / std_pa).abs() > BAROMETER_PLAUSIBLE_SHARE
    {
        warn(
            list,
            "barometer_implausible",
            format!(
                "The barometer reads {:.1} kPa, {:.0} % off the standard {:.1} kPa {what}: check the reading, its unit and the altitude.",
                read / 1e3,
                (read - std_pa) / std_pa * 100.0,
                std_pa / 1e3
            ),
        );
    }
}

fn data_warnings(f: &Facts, list: &mut Vec<Warning>) {
    if let Some(message) = own_values_note(f.scenario) {
        warn(list, "own_calibration", message);
    }
    if f.resolved.still_volume_estimated {
        warn(
            list,
            "still_volume_estimated",
            format!(
                "The still's volume is not given: its wall losses are reckoned on about {:.0} L, the charge at {} packing filling four fifths of the body. Give the volume to firm them up.",
                f.resolved.still_volume_m3 * 1e3,
                f.resolved
                    .crop
                    .map_or("usual".to_string(), |c| format!("{:.0} kg/m³", c.charge_density_kg_per_m3)),
            ),
        );
    }
    let components = &f.equilibrium.components;
    // Estimates get their own, stronger warning below.
    for c in components.iter().filter(|c| !c.correlation_in_range && c.confidence != Confidence::Estimated) {
        warn(
            list,
            "correlation_out_of_range",
            format!(
                "The vapour-pressure correlation for {} is used outside the temperature range it was fitted over; its share of the vapour is less certain.",
                c.name
            ),
        );
    }
    if f.equilibrium.late_out_of_range && components.iter().all(|c| c.correlation_in_range) {
        warn(
            list,
            "correlation_out_of_range",
            "Late in the run the boiling temperature leaves a correlation's fitted range; the last cuts are less certain.".to_string(),
        );
    }
    // Each estimate with the uncertainty its own row states (1σ near 95-100 °C).
    for (c, k) in components.iter().zip(&f.resolved.oil.components) {
        if c.confidence != Confidence::Estimated {
            continue;
        }
        warn(
            list,
            "estimated_vapour_pressure",
            format!(
                "{} has no measured vapour-pressure correlation; an estimate (±{:.0} %) is used.",
                c.name,
                k.vapour_pressure.relative_uncertainty * 100.0
            ),
        );
    }
}

fn outlet_words(layer: OilLayer) -> (&'static str, &'static str) {
    match layer {
        OilLayer::Top => ("floats", "top"),
        OilLayer::Bottom => ("sinks", "bottom"),
    }
}

fn density_warnings(f: &Facts, list: &mut Vec<Warning>) {
    let rho_w = f.separator.water_density_kg_per_m3;
    let oil = f.oil;
    let rho_oil = oil.density_at_separator_kg_per_m3;
    let t_sep = f.separator.temperature_c;
    if oil.mixed_density {
        warn(
            list,
            "mixed_density_oil",
            format!(
                "At {t_sep:.0} °C some cuts of this oil are lighter than the water and some heavier: part will float and part sink. Draw off at both the top and the bottom of the separator."
            ),
        );
    }
    // An oil that will not part at all is told so once (`no_gravity_separation`), with its own
    // advice; telling it which outlet to use as well would contradict that.
    if oil.inversion_risk && f.separator.plan_area_m2.is_some() {
        let (moves, outlet) = outlet_words(oil.collects_at);
        let crossing = match oil.inversion_temperature_c {
            Some(t) => format!(" The whole oil is as dense as the water at about {t:.0} °C."),
            None => " Some cuts are as dense as the water within 10 °C of it.".to_string(),
        };
        warn(
            list,
            "density_inversion_risk",
            format!(
                "At the separator's {t_sep:.0} °C the oil ({rho_oil:.0} kg/m³) {moves} in the water ({rho_w:.0} kg/m³): use the {outlet} outlet for the oil.{crossing} Keep the separator's temperature steady, or the oil may change sides."
            ),
        );
    }
    if let Some(k) = f.separator.interface_per_gooseneck
        && (rho_oil - rho_w).abs() < SLOW_PARTING_DENSITY_DIFFERENCE
    {
        warn(
            list,
            "small_density_difference",
            format!(
                "The oil ({:.0} kg/m³) is within {:.0} kg/m³ of the water ({:.0} kg/m³) at the separator: it will part slowly, and every millimetre of gooseneck height moves the interface about {:.0} mm. A larger separator kept at a steady temperature helps.",
                rho_oil,
                (rho_oil - rho_w).abs(),
                rho_w,
                k
            ),
        );
    }
}

fn run_warnings(f: &Facts, list: &mut Vec<Warning>) {
    let run = &f.timeline.plan;
    if run.limited_by == RunLimit::Steam {
        warn(
            list,
            "steam_limited",
            format!(
                "This oil needs at least {:.1} kg of steam per kg to come over; the steam, not the plant, sets the run's length. More steam per hour shortens it.",
                f.equilibrium.steam_to_target_kg_per_kg_oil
            ),
        );
    }
    if let Some(t_dry) = run.boiler_dry_after_s {
        warn(
            list,
            "boiler_runs_dry",
            format!(
                "The run needs {:.0} kg of steam but the boiler holds {:.0} kg of usable water: top it up before {:.0} min after lighting ({} refill(s), {:.0} kg in all). Never let the heater run dry.",
                run.boiler_water_evaporated_kg,
                f.scenario.boiler.usable_water_kg,
                t_dry / 60.0,
                run.refills,
                f.timeline.makeup_kg
            ),
        );
    }
    if let Some(crop) = f.resolved.crop
        && run.specific_steam_rate_kg_per_h_per_kg < 0.5 * crop.steam_rate_kg_per_h_per_kg
    {
        warn(
            list,
            "low_steam_rate",
            format!(
                "{:.2} kg/h of steam per kg of charge is under half the {:.2} usual for {}: the run may take longer than planned.",
                run.specific_steam_rate_kg_per_h_per_kg, crop.steam_rate_kg_per_h_per_kg, crop.name
            ),
        );
    }
    water_to_oil_warning(f, list);
    if let Some(v) = f.timeline.steam_velocity_m_per_s
        && v > STEAM_VELOCITY_LIMIT_M_PER_S
    {
        warn(
            list,
            "steam_too_fast",
            format!(
                "Steam rises through the charge at about {:.2} m/s: above about 0.25 m/s it lifts water droplets and cuts channels, leaving oil behind. Use less heat or a wider still.",
                v
            ),
        );
    }
}

/// Distillate water per kg of oil above what practice gives for this crop. The advice follows
/// the cause: a steam-limited oil needs its steam; a fast flame wastes it; a long tail costs most.
fn water_to_oil_warning(f: &Facts, list: &mut Vec<Warning>) {
    let run = &f.timeline.plan;
    let Some(crop) = f.resolved.crop else { return };
    let practice = crop.typical_water_to_oil_ratio;
    if run.water_to_oil_ratio <= practice.high {
        return;
    }
    let advice = if run.limited_by == RunLimit::Steam {
        "This oil needs that much steam to come over: more steam per hour shortens the run but does not save water. Returning the waters (cohobation) saves some."
    } else if run.specific_steam_rate_kg_per_h_per_kg > 1.25 * crop.steam_rate_kg_per_h_per_kg {
        "The steam runs faster than the crop usually needs: a smaller flame would save fuel and water for little oil."
    } else {
        "The last few per cent of the oil cost the most water: a lower target recovery saves water and fuel."
    };
    warn(
        list,
        "water_to_oil_high",
        format!(
            "About {:.0} kg of distillate water per kg of oil, above the {:.0}-{:.0} usual for {}. {advice}",
            run.water_to_oil_ratio, practice.low, practice.high, crop.name
        ),
    );
}

fn heat_and_cooling_warnings(f: &Facts, list: &mut Vec<Warning>) {
    let e = f.energy;
    if e.wall_loss_j > 0.2 * e.useful_heat_j {
        warn(
            list,
            "wall_losses",
            format!(
                "{:.0} % of the heat is lost through the still's wall. Lagging it (50 mm of mineral wool cuts the loss about fourteen-fold, U 10 -> 0.7 W/(m² K)) saves fuel and time.",
                100.0 * e.wall_loss_j / e.useful_heat_j
            ),
        );
    }
    let c = f.condenser;
    if let Some(t) = c.tub_feed_from_s {
        warn(
            list,
            "tub_warms_up",
            format!(
                "The tub's water reaches {:.0} °C about {:.0} min after the first drop: from then on feed about {:.1} L/min of cold water at the bottom and let the warm water overflow at the top, or change the water.",
                f.scenario.condenser.cooling_water_outlet_c,
                t / 60.0,
                c.cooling_water_flow_kg_per_s * 60.0
            ),
        );
    }
    if c.distillate_outlet_c > c.distillate_outlet_requested_c + 0.05 {
        warn(
            list,
            "tub_limits_outlet",
            format!(
                "The tub's water ends the run at about {:.0} °C, so the distillate cannot leave colder than about {:.0} °C (not the {:.0} °C asked): the separator is planned at that temperature. A larger tub or an earlier cold feed keeps it cooler.",
                c.tub_end_c.unwrap_or(c.distillate_outlet_c),
                c.distillate_outlet_c,
                c.distillate_outlet_requested_c
            ),
        );
    }
}

fn separator_and_yield_warnings(f: &Facts, list: &mut Vec<Warning>) {
    let sp = f.separator;
    if sp.droplet_reynolds_number > 1.0 {
        warn(
            list,
            "stokes_limit",
            format!(
                "The separator is sized for droplets that rise or sink a little faster than its settling formula covers (Reynolds number {:.1}, over 1): they move somewhat slower than reckoned, so a little more area than shown is safer.",
                sp.droplet_reynolds_number
            ),
        );
    }
    if sp.plan_area_m2.is_none() {
        warn(
            list,
            "no_gravity_separation",
            "The oil is as dense as the water at the separator: it will not part by gravity. Change the separator temperature or add salt to the water (common practice).".to_string(),
        );
    }
    if let (Some(lo), Some(hi), Some(top)) = (sp.interface_low_m, sp.interface_high_m, sp.top_outlet_height_m)
        && (lo <= 0.0 || hi >= top)
    {
        warn(
            list,
            "interface_leaves_receiver",
            format!(
                "Set for the whole oil, the outlets hold the interface at {:.0} mm, but some cuts are so much lighter or heavier that it would reach the {}: watch the interface as the run goes on and reset the gooseneck, or change receivers between cuts.",
                sp.interface_height_m.unwrap_or(0.0) * 1000.0,
                if lo <= 0.0 { "bottom" } else { "top" }
            ),
        );
    }
    let close = (f.oil.density_at_separator_kg_per_m3 - sp.water_density_kg_per_m3).abs()
        < SLOW_PARTING_DENSITY_DIFFERENCE;
    if let Some(k) = sp.interface_per_gooseneck
        && k > TOUCHY_INTERFACE
        && !close
    {
        warn(
            list,
            "touchy_interface",
            format!(
                "The oil and water densities are close: every millimetre of gooseneck height moves the interface about {k:.0} mm. Set the gooseneck carefully and check the interface often."
            ),
        );
    }
    let y = f.oil_yield;
    if y.hydrosol_is_the_product {
        // An overpacked still is told to take less: more plant is then advice only for a
        // larger still.
        let more = if overpacked(f) {
            "returning the waters to the still (cohobation) or more plant in a larger still"
        } else {
            "returning the waters to the still (cohobation) or a larger charge"
        };
        warn(
            list,
            "hydrosol_is_the_product",
            format!(
                "About {:.0} % of the oil carried over ({:.0} g) stays dissolved in the hydrosol: expect little or no oil to separate. The hydrosol is this run's product; {more} gives more separable oil.",
                y.dissolved_share * 100.0,
                y.dissolved_in_hydrosol_kg * 1000.0
            ),
        );
    } else if y.cohobation_advised {
        warn(
            list,
            "cohobation",
            format!(
                "About {:.0} % of the oil ({:.0} g) stays dissolved in the hydrosol: return the waters to the still (cohobation) or redistil them.",
                y.dissolved_share * 100.0,
                y.dissolved_in_hydrosol_kg * 1000.0
            ),
        );
    }
}

/// The charge is well over what the still holds at a usual packing.
fn overpacked(f: &Facts) -> bool {
    f.still_capacity_kg.is_some_and(|cap| f.scenario.charge.plant_mass_kg > OVERPACKED_RATIO * cap)
}

fn capacity_warnings(f: &Facts, list: &mut Vec<Warning>) {
    let mass = f.scenario.charge.plant_mass_kg;
    if let Some(cap) = f.still_capacity_kg
        && overpacked(f)
    {
        warn(
            list,
            "overpacked",
            format!(
                "{:.0} kg is well over the {:.0} kg this still holds at a usual packing: tight packing makes steam channel and leaves oil behind.",
                mass, cap
            ),
        );
    }
}

/// The note that the plan uses the grower's own values from their logged runs, while the charge
/// still holds them (`calibration::holds`).
fn own_values_note(s: &Scenario) -> Option<String> {
    let c = s.calibration.as_ref().filter(|c| crate::calibration::holds(s, c))?;
    let runs = |n: usize| {
        if n == 1 { "1 of your logged runs".to_string() } else { format!("{n} of your logged runs") }
    };
    Some(if c.rate_constant_runs == 0 {
        format!(
            "Oil content {:.2} % from {}; the recovery rate is the crop's.",
            c.oil_content_percent,
            runs(c.oil_content_runs)
        )
    } else if c.rate_constant_runs == c.oil_content_runs {
        format!(
            "Oil content {:.2} % and recovery rate {:.3} /min from {}.",
            c.oil_content_percent,
            c.rate_constant_per_min,
            runs(c.oil_content_runs)
        )
    } else {
        format!(
            "Oil content {:.2} % from {} and recovery rate {:.3} /min from {}.",
            c.oil_content_percent,
            runs(c.oil_content_runs),
            c.rate_constant_per_min,
            runs(c.rate_constant_runs)
        )
    })
}

/// Pairs of phrases, as the warnings word them (lowercase), that give opposite advice or say
/// opposite things about the same part of the run: no plan may show both phrases of a pair. The
/// core's tests check every crop preset at its own and at stressed settings, and the page's tests
/// check the shown warnings, against this list.
pub const OPPOSITE_ADVICE: [(&str, &str); 12] = [
    // The steam and the flame.
    ("more steam", "less heat"),
    ("smaller flame", "more steam per hour"),
    ("smaller flame", "may take longer"),
    ("may take longer", "less heat"),
    // The oil's outlet: both outlets, one outlet, or none.
    ("both the top and the bottom", "outlet for the oil"),
    ("will not part by gravity", "outlet for the oil"),
    ("will not part by gravity", "draw off at both"),
    ("will not part by gravity", "will part slowly"),
    // The separator's temperature.
    ("change the separator temperature", "keep the separator's temperature steady"),
    ("change the separator temperature", "kept at a steady temperature"),
    // The size of the charge.
    ("a larger charge", "well over the"),
    ("a larger charge", "tight packing"),
];

/// The pairs of [`OPPOSITE_ADVICE`] that appear together in these warning texts (any case).
pub fn opposite_advice<'a>(messages: impl IntoIterator<Item = &'a str>) -> Vec<(&'static str, &'static str)> {
    let text: Vec<String> = messages.into_iter().map(str::to_lowercase).collect();
    let says = |needle: &str| text.iter().any(|t| t.contains(needle));
    OPPOSITE_ADVICE.into_iter().filter(|(a, b)| says(a) && says(b)).collect()
}

#[cfg(test)]
mod tests {
    use super::{OPPOSITE_ADVICE, opposite_advice};
    use crate::crops::CROPS;
    use crate::plan::plan;
    use crate::scenario::{Barometer, BarometerReference, Scenario};

    fn codes(s: &Scenario) -> Vec<(String, String)> {
        plan(s).unwrap().warnings.into_iter().map(|w| (w.code, w.message.to_lowercase())).collect()
    }

    /// The settings each crop preset is planned at: the page's own (the preset on the default
    /// scenario), then one stressed setting at a time, then two at once.
    fn stressed(crop: &str) -> Vec<(String, Scenario)> {
        type Change = fn(&mut Scenario);
        let changes: [(&str, Change); 9] = [
            ("own settings", |_| {}),
            ("3 kW burner", |s| s.boiler.heat_input_w = 3_000.0),
            ("30 kW burner", |s| s.boiler.heat_input_w = 30_000.0),
            ("1500 m altitude", |s| s.site.altitude_m = 1_500.0),
            ("half charge", |s| s.charge.plant_mass_kg /= 2.0),
            ("double charge", |s| s.charge.plant_mass_kg *= 2.0),
            ("40 °C separator", |s| s.condenser.distillate_outlet_c = Some(40.0)),
            ("5 kg in 20 L", |s| {
                s.charge.plant_mass_kg = 5.0;
                s.still.volume_m3 = Some(0.02);
            }),
            ("200 kg in 100 L", |s| s.charge.plant_mass_kg = 200.0),
        ];
        let mut out = Vec::new();
        for (i, (a, fa)) in changes.iter().enumerate() {
            // The page's own settings alone, then every stressed setting alone and with each other.
            let partners = if i == 0 { &changes[..1] } else { &changes[i..] };
            for (b, fb) in partners {
                let mut s = Scenario::default();
                s.charge.crop = Some(crop.to_string());
                fa(&mut s);
                fb(&mut s);
                let name = if a == b { a.to_string() } else { format!("{a} + {b}") };
                out.push((name, s));
            }
        }
        out
    }

    #[test]
    fn no_two_warnings_give_opposite_advice_on_any_crop_preset() {
        let mut planned = 0;
        let mut trips = Vec::new();
        for crop in CROPS {
            for (name, s) in stressed(crop.id) {
                let p = plan(&s);
                if name == "own settings" {
                    assert!(p.is_ok(), "{} at its own settings does not plan: {:?}", crop.id, p.err());
                }
                let Ok(p) = p else { continue };
                planned += 1;
                let pairs = opposite_advice(p.warnings.iter().map(|w| w.message.as_str()));
                if !pairs.is_empty() {
                    let codes: Vec<&str> = p.warnings.iter().map(|w| w.code.as_str()).collect();
                    trips.push(format!("{} at {name}: {pairs:?} in {codes:?}", crop.id));
                }
            }
        }
        assert!(planned > CROPS.len() * 20, "only {planned} stressed plans succeeded");
        assert!(trips.is_empty(), "{} plans give opposite advice:\n{}", trips.len(), trips.join("\n"));
    }

    #[test]
    fn every_phrase_of_the_opposite_pairs_is_in_a_warning() {
        // Only the warnings' own text, before the list, counts: a phrase that no warning says any
        // more would make its pair a check that cannot fail.
        let source = include_str!("warnings.rs");
        let texts = source[..source.find("pub const OPPOSITE_ADVICE").unwrap()].to_lowercase();
        for (a, b) in OPPOSITE_ADVICE {
            for phrase in [a, b] {
                assert!(texts.contains(phrase), "no warning says “{phrase}”");
            }
        }
    }

    #[test]
    fn an_oil_content_above_any_crop_is_questioned() {
        let mut s = Scenario::default();
        s.charge.oil_content_percent = Some(12.0);
        assert!(codes(&s).iter().any(|(c, _)| c == "oil_content_implausible"));
        s.charge.oil_content_percent = Some(3.0);
        assert!(!codes(&s).iter().any(|(c, _)| c == "oil_content_implausible"));
    }

    #[test]
    fn a_charge_far_above_the_still_is_called_overpacked() {
        let mut s = Scenario::default();
        // 50 L of lavender at its packing holds well under the 40 kg loaded.
        s.still.volume_m3 = Some(0.05);
        s.charge.plant_mass_kg = 40.0;
        s.boiler.heat_input_w = 60_000.0;
        assert!(codes(&s).iter().any(|(c, _)| c == "overpacked"), "{:?}", codes(&s));
        // An estimated volume is sized to the charge: never overpacked, but said.
        s.still.volume_m3 = None;
        let c = codes(&s);
        assert!(!c.iter().any(|(c, _)| c == "overpacked"));
        assert!(c.iter().any(|(c, _)| c == "still_volume_estimated"));
    }

    #[test]
    fn a_barometer_far_from_the_standard_atmosphere_is_questioned() {
        let mut s = Scenario::default();
        s.site.altitude_m = 0.0;
        // 80 kPa at sea level is 21 % under 101.325 kPa (USSA 1976): a misread or a wrong altitude.
        s.site.barometer = Some(Barometer { pressure_pa: 80_000.0, reference: BarometerReference::Station });
        assert!(codes(&s).iter().any(|(c, _)| c == "barometer_implausible"));
        // 99 kPa is 2 % under: weather.
        s.site.barometer = Some(Barometer { pressure_pa: 99_000.0, reference: BarometerReference::Station });
        assert!(!codes(&s).iter().any(|(c, _)| c == "barometer_implausible"));
    }
}
