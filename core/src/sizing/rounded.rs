//! The design rounded to what can be bought: vessel and heat rating first (together, as a bigger
//! vessel loses more heat), then the tube for the steam that rating raises, the tub or the jacket's
//! water, and the separator glassware; each is the smallest catalogue size the forward plan of
//! the rounded design accepts.

use super::catalogue::{self, Size, Tube};
use super::exact::{Exact, search_equipment, shortfall_error};
use super::request::{Figures, Needs, Quantity, SizingErrors, SizingRequest, num};
use super::search::{bracket_up, smallest_passing};
use super::trial::{self, Equipment, Shortfall, Trial, VesselChoice};
use crate::plan::{Doubt, Plan, plan_with};
use crate::scenario::{CondenserKind, Scenario};
use crate::water;

/// Fastest the steam may enter the condenser tube, m/s: steam mains are sized for 25-40 m/s
/// (Spirax Sarco, Steam Engineering Tutorials, from memory); a still's coil works near
/// atmospheric pressure, where back pressure matters, so the lower part of that range (common
/// practice, no source). The steam slows as it condenses along the coil.
pub const TUBE_INLET_VELOCITY_M_PER_S: f64 = 30.0;
/// Share of a tub's volume filled with water: room for the coil and the overflow (common
/// practice, no source).
pub const TUB_FILL_SHARE: f64 = 0.9;

/// The vessel and heat rating bought, with their trial.
pub(super) struct Bought {
    pub vessel: &'static Size,
    pub heat: &'static Size,
    pub trial: Trial,
}

/// The smallest catalogue vessel, then the smallest rating, whose forward plan meets the limits.
pub(super) fn vessel_and_heat(
    needs: &Needs,
    req: &SizingRequest,
    exact: &Exact,
) -> Result<Bought, SizingErrors> {
    let exact_v = exact.trial.stack.volume_m3;
    // Every vessel that could hold the charge over the heater's cover alone is tried with the
    // plan, smallest first: the rounded heat may boil off less water than the exact design.
    let charge_m3 = exact.trial.charge_m3;
    let vessels = catalogue::VESSELS_M3.iter().filter(|v| {
        crate::sizing::vessel::stack(v.value, catalogue::VESSEL_HEIGHT_TO_DIAMETER, 0.0).charge_space_m3
            >= charge_m3
    });
    let ratings = catalogue::heat_ratings(needs.fuel);
    let mut last_miss = None;
    let mut any_vessel = false;
    for vessel in vessels {
        any_vessel = true;
        for heat in ratings.iter().filter(|h| h.value >= exact.heat_w * (1.0 - 1e-9)) {
            if heat.value > needs.heat_cap_w * (1.0 + 1e-9) {
                break;
            }
            let eq = Equipment {
                vessel: VesselChoice::Fixed(vessel.value),
                ..search_equipment(needs, exact.charges, heat.value)
            };
            match trial::try_equipment(needs, req, &eq) {
                Ok(trial) => return Ok(Bought { vessel, heat, trial }),
                Err(s @ Shortfall::ChargeDoesNotFit { .. }) => {
                    last_miss = Some(s);
                    break;
                }
                Err(s) => last_miss = Some(s),
            }
        }
    }
    if !any_vessel {
        let largest = catalogue::VESSELS_M3.last().map(|v| v.value).unwrap_or(0.0);
        let mut f = Figures::default();
        let message = format!(
            "at {} charges a day the still must hold {}, more than the largest in the catalogue ({}): allow more charges a day, or more days for the harvest",
            exact.charges,
            f.fig(exact_v, Quantity::VolumeM3, format!("{:.0} L", exact_v * 1000.0)),
            f.fig(largest, Quantity::VolumeM3, format!("{} L", num(largest * 1000.0))),
        );
        return Err(f.error(
            "limits.max_charges_per_day",
            req.limits.max_charges_per_day.to_string(),
            format!("a still of at most {} L", num(largest * 1000.0)),
            message,
        ));
    }
    match last_miss {
        Some(s) => Err(shortfall_error(needs, req, exact.charges, s)),
        None => {
            let mut f = Figures::default();
            let message = format!(
                "the design needs {}, and no rating in the catalogue lies between that and the {} on offer",
                f.supply(req, exact.heat_w, format!("{:.2} kW", exact.heat_w / 1000.0)),
                f.supply(req, needs.heat_cap_w, format!("{} kW", num(needs.heat_cap_w / 1000.0))),
            );
            Err(f.error(
                if matches!(req.heat, super::request::HeatSupply::Electric { .. }) {
                    "heat.supply"
                } else {
                    "heat.max_heat_input_w"
                },
                num(needs.heat_cap_w),
                format!("at least the next rating over {:.0} W", exact.heat_w),
                message,
            ))
        }
    }
}

/// Inner diameter that keeps the steam under [`TUBE_INLET_VELOCITY_M_PER_S`], m:
/// d = (4 ṁ / (π ρ_v u))^½, with ρ_v of saturated steam at the co-distillation temperature.
pub(super) fn tube_inner_diameter_m(p: &Plan) -> f64 {
    let t_k = p.codistillation.temperature_c + 273.15;
    let rho_v = water::saturated_vapour_density_kg_per_m3(t_k).unwrap_or(0.59);
    (4.0 * p.run.distillate_steam_rate_kg_per_s
        / (std::f64::consts::PI * rho_v * TUBE_INLET_VELOCITY_M_PER_S))
        .sqrt()
}

/// The smallest tube of the standard wide enough inside, or the widest with the steam split over
/// parallel coils.
pub(super) fn tube(req: &SizingRequest, needed_inner_m: f64) -> (&'static Tube, u32) {
    let table = catalogue::tubes(req.cooling.tube_standard);
    if let Some(t) = table.iter().find(|t| t.inner_diameter_m() >= needed_inner_m) {
        return (t, 1);
    }
    let widest = &table[table.len() - 1];
    // Area scales with d²: as many coils as the area ratio, rounded up.
    let coils = (needed_inner_m / widest.inner_diameter_m()).powi(2).ceil().max(1.0);
    (widest, coils.min(64.0) as u32)
}

/// A tub sized for the run: the least water that stays at or under the warmest allowed
/// temperature without a feed (bisection on the forward plan), and the catalogue tub for it.
pub(super) struct TubChoice {
    pub exact_water_kg: f64,
    pub exact_volume_m3: f64,
    pub tub: &'static Size,
    pub water_kg: f64,
}

fn tub_holds(s: &Scenario, water_kg: f64, warmest_c: f64) -> bool {
    let mut s = s.clone();
    s.condenser.tub_water_kg = water_kg;
    plan_with(&s, Doubt::CentralOnly)
        .map(|p| {
            p.condenser.tub_feed_from_s.is_none()
                && p.condenser.tub_end_c.is_some_and(|t| t <= warmest_c + 1e-9)
        })
        .unwrap_or(false)
}

pub(super) fn tub(req: &SizingRequest, s: &Scenario, p: &Plan) -> Result<TubChoice, SizingErrors> {
    let warmest = req.limits.warmest_cooling_water_c;
    let rise = warmest - req.cooling.inlet_c;
    // Tub water that takes the whole duty unfed, with c_p about 4180 J/(kg K): a start.
    let estimate = p.condenser.duty_w * p.run.time_after_first_drop_s / (4180.0 * rise);
    let holds = |m: f64| tub_holds(s, m, warmest);
    let start = (0.8 * estimate).clamp(1.0, 1.0e5);
    let found =
        bracket_up(holds, start, 1.0e5).and_then(|(a, b)| smallest_passing(holds, a, b, (1e-3 * b).max(0.1)));
    let Ok(exact_water_kg) = found else {
        return Err(SizingErrors::one(
            "limits.warmest_cooling_water_c",
            num(warmest),
            "a tub of at most 100 t".into(),
            "no tub keeps the water this cool over the run: allow a warmer tub or choose a fed jacket".into(),
        ));
    };
    let rho = water::liquid_density_kg_per_m3(req.cooling.inlet_c + 273.15, 101_325.0).unwrap_or(999.0);
    let mut exact_volume_m3 = exact_water_kg / (rho * TUB_FILL_SHARE);
    let Some(mut tub) = catalogue::smallest_at_least(catalogue::TUBS_M3, exact_volume_m3) else {
        let largest = catalogue::TUBS_M3.last().map(|t| t.value).unwrap_or(0.0);
        let mut f = Figures::default();
        let message = format!(
            "keeping the tub at or under {} takes {} of tub, more than the largest in the catalogue: allow a warmer tub or choose a fed jacket (tube_in_tube)",
            f.fig(warmest, Quantity::TemperatureC, format!("{} °C", num(warmest))),
            f.fig(exact_volume_m3, Quantity::VolumeM3, format!("{:.0} L", exact_volume_m3 * 1000.0)),
        );
        return Err(f.error(
            "limits.warmest_cooling_water_c",
            num(warmest),
            format!("a tub of at most {} L", num(largest * 1000.0)),
            message,
        ));
    };
    // The bisection stops within its tolerance above the least water, so a catalogue tub just
    // under that figure may still hold: the plan decides, as for every other bought part.
    while let Some(smaller) = catalogue::next_smaller(catalogue::TUBS_M3, tub.value)
        && holds(smaller.value * TUB_FILL_SHARE * rho)
    {
        tub = smaller;
        exact_volume_m3 = exact_volume_m3.min(smaller.value);
    }
    let exact_water_kg = exact_water_kg.min(exact_volume_m3 * rho * TUB_FILL_SHARE);
    Ok(TubChoice { exact_water_kg, exact_volume_m3, tub, water_kg: tub.value * TUB_FILL_SHARE * rho })
}

/// Glassware for the separator: the distillate flow times the residence time, rounded up.
pub(super) fn separator(p: &Plan, residence_s: f64) -> Result<(f64, &'static Size), SizingErrors> {
    let exact = p.separator.distillate_flow_m3_per_s * residence_s;
    match catalogue::smallest_at_least(catalogue::SEPARATORS_M3, exact) {
        Some(size) => Ok((exact, size)),
        None => {
            let mut f = Figures::default();
            let message = format!(
                "the distillate needs a {} receiver, more than the largest in the catalogue: use receivers in parallel or a shorter residence time",
                f.fig(exact, Quantity::VolumeM3, format!("{:.1} L", exact * 1000.0)),
            );
            Err(f.error(
                "base.separator.residence_time_s",
                num(residence_s),
                "a receiver of at most 20 L".into(),
                message,
            ))
        }
    }
}

/// The condenser kind's scenario fields for the bought design.
pub(super) fn with_condenser(s: &Scenario, kind: CondenserKind, tube_od_m: f64, tub_kg: f64) -> Scenario {
    let mut s = s.clone();
    s.condenser.kind = kind;
    s.condenser.tube_outer_diameter_m = tube_od_m;
    s.condenser.tub_water_kg = tub_kg;
    s
}
