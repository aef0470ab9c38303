//! The exact design: the most charges a day the request allows (so the smallest still), and
//! the least heat input that meets the crop's steam rate, the longest run and the working day.

use super::request::{Figures, Needs, Quantity, SizingErrors, SizingRequest, num};
use super::search::{bracket_up, smallest_passing};
use super::trial::{self, Equipment, Shortfall, Trial, VesselChoice};
use crate::heat;
use crate::scenario::CondenserKind;

/// Latent heat of water at 100.5 °C, J/kg (IAPWS-IF97 gives 2.2555 MJ/kg; lower than at any
/// temperature a still boils at), rounded down: it makes the steam-rate heat a lower bound.
const LEAST_LATENT_HEAT_J_PER_KG: f64 = 2.25e6;
/// The heat search stops when its bracket is narrower than this share of the heat, or 5 W.
const HEAT_TOLERANCE: f64 = 1e-3;

/// The exact design and the trial that proves it.
pub(super) struct Exact {
    pub charges: u32,
    pub heat_w: f64,
    pub trial: Trial,
}

/// The equipment of the heat search: the smallest vessel, a fed jacket (the condenser does not
/// change the run), the base's tube and separator.
pub(super) fn search_equipment(needs: &Needs, charges: u32, heat_w: f64) -> Equipment {
    Equipment {
        charges,
        heat_w,
        vessel: VesselChoice::Smallest,
        kind: CondenserKind::TubeInTube,
        tube_od_m: needs.base.condenser.tube_outer_diameter_m,
        tub_kg: needs.base.condenser.tub_water_kg,
        residence_s: needs.base.separator.residence_time_s,
    }
}

/// A heat input that cannot meet the crop's steam rate, W: the steam alone, with no wall loss,
/// Q = s m h_fg / (η f_alt), just under it.
fn rate_lower_bound_w(needs: &Needs, req: &SizingRequest, charges: u32) -> f64 {
    let efficiency = needs.base.boiler.efficiency.unwrap_or(needs.appliance.data().typical_efficiency);
    let derate = if needs.fuel.is_gas() { heat::gas_altitude_derate(req.site.altitude_m) } else { 1.0 };
    let steam_kg_per_s = needs.steam_rate_kg_per_h_per_kg * trial::charge_kg(needs, charges) / 3600.0;
    0.999 * steam_kg_per_s * LEAST_LATENT_HEAT_J_PER_KG / (efficiency * derate).max(1e-6)
}

/// Tries the most charges a day first, then fewer; for the first that the supply can serve,
/// finds the least heat by bracketing and bisection on the forward plan.
pub(super) fn solve(needs: &Needs, req: &SizingRequest) -> Result<Exact, SizingErrors> {
    let cap = needs.heat_cap_w;
    let max_charges = req.limits.max_charges_per_day;
    let mut misses = Vec::new();
    for charges in (1..=max_charges).rev() {
        let meets = |h: f64| trial::try_equipment(needs, req, &search_equipment(needs, charges, h)).is_ok();
        if let Err(s) = trial::try_equipment(needs, req, &search_equipment(needs, charges, cap)) {
            misses.push((charges, s));
            continue;
        }
        let lo = rate_lower_bound_w(needs, req, charges).min(cap);
        let searched = bracket_up(meets, lo, cap)
            .and_then(|(a, b)| smallest_passing(meets, a, b, (HEAT_TOLERANCE * b).max(5.0)));
        let Ok(heat_w) = searched else { continue };
        if let Ok(trial) = trial::try_equipment(needs, req, &search_equipment(needs, charges, heat_w)) {
            return Ok(Exact { charges, heat_w, trial });
        }
    }
    Err(explain(needs, req, &misses))
}

/// The reason to show: the one at the most charges a day (the smallest charge, the easiest for
/// the heat), unless that is the working day, which fewer charges would ease.
fn explain(needs: &Needs, req: &SizingRequest, misses: &[(u32, Shortfall)]) -> SizingErrors {
    let first = misses.first().copied();
    let chosen = match first {
        Some((_, Shortfall::WorkingDay { .. })) => misses.last().copied(),
        other => other,
    };
    let Some((charges, s)) = chosen else {
        return SizingErrors::one(
            "heat",
            num(needs.heat_cap_w),
            "a heat input the search can settle".into(),
            "no heat input within the supply gave a settled design".into(),
        );
    };
    shortfall_error(needs, req, charges, s)
}

fn heat_field(req: &SizingRequest) -> &'static str {
    match req.heat {
        super::request::HeatSupply::Electric { .. } => "heat.supply",
        super::request::HeatSupply::Fuel { .. } => "heat.max_heat_input_w",
    }
}

/// A clear message for a limit the request cannot meet.
pub(super) fn shortfall_error(
    needs: &Needs,
    req: &SizingRequest,
    charges: u32,
    s: Shortfall,
) -> SizingErrors {
    let kw = needs.heat_cap_w / 1000.0;
    let charge = trial::charge_kg(needs, charges);
    let need = needs.steam_rate_kg_per_h_per_kg;
    let mut f = Figures::default();
    match s {
        Shortfall::SteamRate { got } => {
            let message = format!(
                "{} cannot raise the steam the crop needs: {} of charge ({} for {} at {} charges a day) against the {} it can raise; allow more charges a day or a larger supply",
                f.supply(req, needs.heat_cap_w, format!("{} kW", num(kw))),
                f.fig(need / 3600.0, Quantity::SteamPerChargeKgPerSPerKg, format!("{} kg/h per kg", num(need))),
                f.fig(need * charge / 3600.0, Quantity::SteamKgPerS, format!("{:.1} kg/h", need * charge)),
                f.fig(charge, Quantity::MassKg, format!("{charge:.1} kg")),
                charges,
                f.fig(got / 3600.0, Quantity::SteamPerChargeKgPerSPerKg, format!("{got:.3} kg/h per kg")),
            );
            f.error(
                heat_field(req),
                format!("{} kW", num(kw)),
                format!("enough heat for {} kg/h of steam", num(need * charge)),
                message,
            )
        }
        Shortfall::RunLength { got_s } => {
            let message = format!(
                "even with the full {} a charge of {} takes {:.0} min from lighting: the plant gives up its oil at its own pace and the boiler water must first boil; allow a longer run",
                f.supply(req, needs.heat_cap_w, format!("{} kW", num(kw))),
                f.fig(charge, Quantity::MassKg, format!("{charge:.1} kg")),
                got_s / 60.0
            );
            f.error("limits.max_run_s", num(req.limits.max_run_s), format!("at least {:.0} s", got_s.ceil()), message)
        }
        Shortfall::WorkingDay { got_s } => SizingErrors::one(
            if req.limits.working_day_s.is_some() { "limits.working_day_s" } else { "limits.max_charges_per_day" },
            num(needs.working_day_s),
            format!("at least {:.0} s", got_s.ceil()),
            format!(
                "{} charges with their turnarounds take {:.1} h, more than the working day; allow a longer day or fewer, larger charges",
                charges, got_s / 3600.0
            ),
        ),
        Shortfall::ChargeDoesNotFit { space_m3 } => {
            let space = f.fig(space_m3, Quantity::VolumeM3, format!("{:.0} L", space_m3 * 1000.0));
            f.error(
                "limits.max_charges_per_day",
                charges.to_string(),
                "a charge the vessel holds".into(),
                format!("the vessel's charge space ({space}) is too small"),
            )
        }
        Shortfall::BoilerRefill => SizingErrors::one(
            "heat",
            num(kw),
            "a boiler fill that lasts the run".into(),
            "the boiler water could not be settled for this run".into(),
        ),
        Shortfall::NoPlan => SizingErrors::one(
            heat_field(req),
            format!("{} kW", num(kw)),
            "enough heat to outrun the still's wall loss".into(),
            "this heat supply cannot bring the still to distil at all: almost all of it is lost through the wall".into(),
        ),
    }
}
