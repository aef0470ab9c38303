//! One trial design planned forward: the equipment turned into a scenario, the boiler water
//! settled so the first charge needs no refill, and the test of the request's limits.

use super::catalogue::{self, VESSEL_HEIGHT_TO_DIAMETER};
use super::request::{Needs, SizingErrors, SizingRequest};
use super::vessel::{self, Stack};
use crate::heat;
use crate::plan::{Doubt, Plan, plan_with};
use crate::scenario::{CondenserKind, Scenario, ScenarioErrors};

/// Margin on the water boiled off over a charge: the first charge's evaporation is a plan, not a
/// measurement (common practice, no source).
pub const BOILER_WATER_MARGIN: f64 = 0.05;
/// Most passes to settle the boiler water against the vessel it sits in (each pass is a plan;
/// two almost always suffice, as the water changes the wall loss only a little).
const WATER_PASSES: usize = 4;

/// The vessel of a trial: the smallest that holds the charge and its water, or a bought one.
#[derive(Debug, Clone, Copy, PartialEq)]
pub(super) enum VesselChoice {
    Smallest,
    Fixed(f64),
}

/// The equipment of one trial, in the scenario's terms.
#[derive(Debug, Clone, Copy, PartialEq)]
pub(super) struct Equipment {
    pub charges: u32,
    pub heat_w: f64,
    pub vessel: VesselChoice,
    pub kind: CondenserKind,
    pub tube_od_m: f64,
    pub tub_kg: f64,
    pub residence_s: f64,
}

/// A trial planned forward.
#[derive(Debug, Clone)]
pub(super) struct Trial {
    pub plan: Plan,
    pub stack: Stack,
    pub boiled_off_kg: f64,
    pub charge_kg: f64,
    pub charge_m3: f64,
    pub scenario: Scenario,
}

/// Which of the request's limits a trial misses.
#[derive(Debug, Clone, Copy, PartialEq)]
pub(super) enum Shortfall {
    /// The plan itself failed (e.g. the heat cannot outrun the wall loss).
    NoPlan,
    SteamRate {
        got: f64,
    },
    RunLength {
        got_s: f64,
    },
    WorkingDay {
        got_s: f64,
    },
    BoilerRefill,
    ChargeDoesNotFit {
        space_m3: f64,
    },
}

/// Plant per charge for a number of charges a day, kg.
pub(super) fn charge_kg(needs: &Needs, charges: u32) -> f64 {
    needs.daily_kg / charges.max(1) as f64
}

/// Shell metal of a vessel, kg: its outer surface times the sheet's thickness and density.
pub(super) fn shell_mass_kg(needs: &Needs, volume_m3: f64) -> f64 {
    let (thickness_m, density) = catalogue::sheet(needs.base.still.metal);
    heat::cylinder_surface_m2(volume_m3, VESSEL_HEIGHT_TO_DIAMETER) * thickness_m * density
}

/// The distillate temperature the design asks the condenser for: the base's, else the crop's
/// (30 °C without one), but at least 5 K over the cooling water so a condenser can reach it.
pub(super) fn distillate_outlet_c(needs: &Needs, req: &SizingRequest) -> Option<f64> {
    if let Some(t) = needs.base.condenser.distillate_outlet_c {
        return Some(t);
    }
    let wanted = needs.crop.map(|c| c.distillate_temperature_c).unwrap_or(30.0);
    (wanted < req.cooling.inlet_c + 5.0).then_some(req.cooling.inlet_c + 5.0)
}

/// The scenario of a piece of equipment: the base with the sized fields replaced.
pub(super) fn scenario(
    needs: &Needs,
    req: &SizingRequest,
    eq: &Equipment,
    vessel_m3: f64,
    fill_kg: f64,
) -> Scenario {
    let mut s = needs.base.clone();
    s.site.altitude_m = req.site.altitude_m;
    s.site.barometer = None;
    if let Some(t) = req.site.ambient_temperature_c {
        s.site.ambient_temperature_c = t;
    }
    s.charge.crop = needs.crop.map(|c| c.id.to_string());
    s.charge.plant_mass_kg = charge_kg(needs, eq.charges);
    s.still.volume_m3 = Some(vessel_m3);
    s.still.height_to_diameter = VESSEL_HEIGHT_TO_DIAMETER;
    s.still.metal_mass_kg = shell_mass_kg(needs, vessel_m3);
    s.boiler.fuel = needs.fuel;
    s.boiler.appliance = Some(needs.appliance);
    s.boiler.heat_input_w = eq.heat_w;
    s.boiler.usable_water_kg = fill_kg;
    s.boiler.steam_rate_kg_per_h = None;
    s.condenser.kind = eq.kind;
    s.condenser.cooling_water_inlet_c = req.cooling.inlet_c;
    s.condenser.cooling_water_outlet_c = req.limits.warmest_cooling_water_c;
    s.condenser.distillate_outlet_c = distillate_outlet_c(needs, req);
    s.condenser.tube_outer_diameter_m = eq.tube_od_m;
    s.condenser.tub_water_kg = eq.tub_kg;
    s.separator.residence_time_s = eq.residence_s;
    s.season.harvest_kg = Some(needs.daily_kg);
    s
}

/// Plans the equipment forward, settling the boiler water: the fill is what the first charge
/// boils off (less what cohobation returns), with [`BOILER_WATER_MARGIN`], plus the heater's
/// cover; the smallest vessel is re-solved for it on each pass.
pub(super) fn run(needs: &Needs, req: &SizingRequest, eq: &Equipment) -> Result<Trial, ScenarioErrors> {
    let charge_kg = charge_kg(needs, eq.charges);
    let charge_m3 = charge_kg / needs.packing_kg_per_m3;
    // First guess: the crop's steam over half the longest run.
    let mut boiled = needs.steam_rate_kg_per_h_per_kg * charge_kg * req.limits.max_run_s / 7200.0;
    let mut last = None;
    for _ in 0..WATER_PASSES {
        let v = match eq.vessel {
            VesselChoice::Smallest => {
                vessel::smallest_vessel_m3(charge_m3, VESSEL_HEIGHT_TO_DIAMETER, boiled)
                    .unwrap_or(charge_m3 * 2.0)
            }
            VesselChoice::Fixed(v) => v,
        };
        let stack = vessel::stack(v, VESSEL_HEIGHT_TO_DIAMETER, boiled);
        let scenario = scenario(needs, req, eq, v, stack.water_fill_kg);
        let p = plan_with(&scenario, Doubt::CentralOnly)?;
        let need = (p.run.boiler_water_evaporated_kg - p.run.returned_to_boiler_kg).max(0.0);
        let settled =
            p.run.refills == 0 && boiled >= need && boiled <= need * (1.0 + 2.0 * BOILER_WATER_MARGIN);
        last = Some(Trial { plan: p, stack, boiled_off_kg: boiled, charge_kg, charge_m3, scenario });
        if settled {
            break;
        }
        boiled = need * (1.0 + BOILER_WATER_MARGIN);
    }
    last.ok_or_else(|| ScenarioErrors { errors: Vec::new() })
}

/// The first of the request's limits a trial misses, if any (tub and water are checked later,
/// once the condenser is sized).
pub(super) fn shortfall(needs: &Needs, req: &SizingRequest, t: &Trial) -> Option<Shortfall> {
    let p = &t.plan;
    if p.run.specific_steam_rate_kg_per_h_per_kg < needs.steam_rate_kg_per_h_per_kg * (1.0 - 1e-9) {
        return Some(Shortfall::SteamRate { got: p.run.specific_steam_rate_kg_per_h_per_kg });
    }
    if p.run.total_time_s > req.limits.max_run_s {
        return Some(Shortfall::RunLength { got_s: p.run.total_time_s });
    }
    let day_s = p.season.as_ref().map(|s| s.total_time_s).unwrap_or(p.run.total_time_s);
    if day_s > needs.working_day_s {
        return Some(Shortfall::WorkingDay { got_s: day_s });
    }
    if p.run.refills > 0 {
        return Some(Shortfall::BoilerRefill);
    }
    if t.stack.charge_space_m3 < t.charge_m3 * (1.0 - 1e-9) {
        return Some(Shortfall::ChargeDoesNotFit { space_m3: t.stack.charge_space_m3 });
    }
    None
}

/// Plans and tests in one: the shortfall, or the trial that meets the limits.
pub(super) fn try_equipment(needs: &Needs, req: &SizingRequest, eq: &Equipment) -> Result<Trial, Shortfall> {
    let t = run(needs, req, eq).map_err(|_| Shortfall::NoPlan)?;
    match shortfall(needs, req, &t) {
        None => Ok(t),
        Some(s) => Err(s),
    }
}

/// Plan errors of an assembled scenario, named by the request's fields where the request set
/// them and under `base.` where they come from the base scenario.
pub(super) fn request_errors(e: ScenarioErrors, req: &SizingRequest) -> SizingErrors {
    let errors = e
        .errors
        .into_iter()
        .map(|mut f| {
            f.field = match f.field.as_str() {
                "site.altitude_m" => "site.altitude_m".into(),
                "site.ambient_temperature_c" if req.site.ambient_temperature_c.is_some() => {
                    "site.ambient_temperature_c".into()
                }
                "charge.crop" if req.crop.is_some() => "crop".into(),
                "condenser.cooling_water_inlet_c" => "cooling.inlet_c".into(),
                "condenser.cooling_water_outlet_c" => "limits.warmest_cooling_water_c".into(),
                "boiler.heat_input_w" => "heat".into(),
                other => format!("base.{other}"),
            };
            f
        })
        .collect();
    SizingErrors { errors, figures: Vec::new() }
}
