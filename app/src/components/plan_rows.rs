//! The full plan's rows, as data: each row's label, its `data-out` key and how its text is
//! written from the plan, in the grower's units (see [`crate::units`]).

use crate::units;
use stillroom_core::Plan;
use stillroom_core::plan::{OilLayer, RunLimit};
use stillroom_core::scenario::CondenserKind;

/// One row of the full plan: its label, its `data-out` key and how its text is written. The
/// rows are tables of these, built by one loop (`results::rows`): one copy of the row's view
/// code in the wasm rather than one per row (2.0 kB gzip -9 of the plan module).
pub(crate) struct Out {
    pub label: &'static str,
    pub out: &'static str,
    pub text: fn(&Plan) -> String,
}

/// A short height (mm, or inches).
pub(crate) fn mm(m: f64) -> String {
    units::millimetres(m)
}

/// The rows under "Steam and time".
pub(crate) const STEAM_ROWS: &[Out] = &[
    Out { label: "Air pressure at the still", out: "pressure", text: |p| units::kpa(p.site.pressure_pa) },
    Out {
        label: "Oil and water boil together at",
        out: "codistillation_temperature",
        text: |p| units::celsius(p.codistillation.temperature_c),
    },
    Out {
        label: "below water's own boiling point by",
        out: "codistillation_lowering",
        text: |p| units::kelvin(p.codistillation.lowering_k, 1),
    },
    Out {
        label: "Least steam per kg of oil (a lower bound, at the start)",
        out: "steam_per_kg_oil",
        text: |p| format!("{} kg", units::sig3(p.codistillation.min_steam_per_kg_oil)),
    },
    Out {
        label: "Least steam for this charge (a lower bound)",
        out: "min_steam_charge",
        text: |p| {
            format!(
                "{} to the target, {} for all of it",
                units::mass(p.codistillation.min_steam_to_target_kg),
                units::mass(p.codistillation.min_steam_whole_charge_kg)
            )
        },
    },
    Out { label: "Steam raised", out: "steam_rate", text: |p| units::kg_per_hour(p.run.steam_rate_kg_per_s) },
    Out {
        label: "Steam through the plant",
        out: "specific_steam",
        text: |p| format!("{} kg/h per kg of charge", units::sig3(p.run.specific_steam_rate_kg_per_h_per_kg)),
    },
    Out {
        label: "Steam condensed warming the charge and still",
        out: "startup_condensate",
        text: |p| units::mass(p.run.startup_condensate_kg),
    },
    Out {
        label: "Steam after the first drop",
        out: "distillate_steam",
        text: |p| units::mass(p.run.distillate_steam_kg),
    },
    Out {
        label: "Planned steam over the least steam",
        out: "steam_ratio",
        text: |p| format!("{}×", units::sig3(p.run.steam_to_minimum_ratio)),
    },
    Out {
        label: "What sets the run's length",
        out: "limited_by",
        text: |p| match p.run.limited_by {
            RunLimit::Release => "oil leaving the plant".to_string(),
            RunLimit::Steam => "the steam's carrying power".to_string(),
        },
    },
    Out {
        label: "Release rate at this steam rate",
        out: "rate_constant",
        text: |p| {
            format!(
                "{} per min (crop: {} per min at its usual steam)",
                units::sig3(p.run.rate_constant_per_min),
                units::sig3(p.run.reference_rate_constant_per_min)
            )
        },
    },
    Out {
        label: "Steam's share of a full load of oil",
        out: "vaporisation_efficiency",
        text: |p| units::percent(p.run.vaporisation_efficiency),
    },
    Out {
        label: "Boiler water turned to steam",
        out: "evaporated",
        text: |p| units::mass(p.run.boiler_water_evaporated_kg),
    },
    Out {
        label: "Top up the boiler",
        out: "refill",
        text: |p| match p.run.boiler_dry_after_s {
            Some(t) => format!("before {} after lighting ({} refill(s))", units::duration(t), p.run.refills),
            None => "not needed for this run".to_string(),
        },
    },
];

/// The rows under "Heat and fuel".
pub(crate) const HEAT_ROWS: &[Out] = &[
    Out {
        label: "Heat reaching the water",
        out: "useful_heat",
        text: |p| units::kilowatts(p.run.useful_heat_w),
    },
    Out {
        label: "Fuel for the run",
        out: "fuel",
        text: |p| units::fuel(p.energy.fuel_amount, p.energy.fuel),
    },
    Out {
        label: "Heat: boiler water / charge / still",
        out: "heat_split",
        text: |p| {
            format!(
                "{} / {} / {}",
                units::megajoules(p.energy.boiler_water_heating_j),
                units::megajoules(p.energy.charge_heating_j),
                units::megajoules(p.energy.still_heating_j)
            )
        },
    },
    Out {
        label: "Still volume the wall loss is reckoned on",
        out: "still_volume_used",
        text: |p| {
            format!(
                "{}{}",
                units::volume(p.run.still_volume_used_m3),
                if p.run.still_volume_estimated { " (estimated from the charge)" } else { "" }
            )
        },
    },
    Out {
        label: "Heat: lost through the wall / carried to the condenser",
        out: "heat_out",
        text: |p| {
            format!(
                "{} / {}",
                units::megajoules(p.energy.wall_loss_j),
                units::megajoules(p.energy.steam_to_condenser_j)
            )
        },
    },
    Out {
        label: "Cost of the run",
        out: "cost",
        text: |p| match &p.energy.cost {
            None => "add prices under “Run, season and costs”".to_string(),
            Some(c) => format!(
                "{} {}{}",
                units::sig3(c.total),
                c.currency,
                c.per_millilitre_oil.map(units::per_oil).unwrap_or_default()
            ),
        },
    },
];

/// The rows under "Condenser and water".
pub(crate) const CONDENSER_ROWS: &[Out] = &[
    Out { label: "Heat to take out", out: "condenser_duty", text: |p| units::kilowatts(p.condenser.duty_w) },
    Out {
        label: "Cooling water",
        out: "cooling_flow",
        text: |p| match p.condenser.tub_feed_from_s {
            None if p.condenser.kind == CondenserKind::CoilInTub => {
                "no feed: the tub's own water lasts the run".to_string()
            }
            Some(t) => format!(
                "{}, from {} after the first drop",
                units::litres_per_minute(p.condenser.cooling_water_flow_kg_per_s),
                units::duration(t)
            ),
            None => units::litres_per_minute(p.condenser.cooling_water_flow_kg_per_s),
        },
    },
    Out {
        label: "Cooling water per run",
        out: "cooling_per_run",
        text: |p| units::volume(p.condenser.cooling_water_per_run_kg / 1000.0),
    },
    Out {
        label: "Tub water lasts",
        out: "tub_lasts",
        text: |p| match (p.condenser.kind, p.condenser.tub_lasts_s) {
            (CondenserKind::CoilInTub, Some(t)) => format!("{} without a cold feed", units::duration(t)),
            _ => "– (jacketed condenser)".to_string(),
        },
    },
    Out {
        label: "Tub warms over the run, without a feed",
        out: "tub_rise",
        text: |p| {
            p.condenser
                .tub_rise_over_run_k
                .map(|k| units::kelvin(k, 0))
                .unwrap_or_else(|| "– (jacketed condenser)".into())
        },
    },
    Out {
        label: "Tub at the end of the run",
        out: "tub_end",
        text: |p| {
            p.condenser.tub_end_c.map(units::celsius).unwrap_or_else(|| "– (jacketed condenser)".into())
        },
    },
    Out {
        label: "Distillate leaves at",
        out: "distillate_outlet",
        text: |p| units::celsius(p.condenser.distillate_outlet_c),
    },
    Out { label: "Cooling area needed", out: "condenser_area", text: |p| units::area(p.condenser.area_m2) },
    Out { label: "Tube length", out: "tube_length", text: |p| units::length(p.condenser.tube_length_m) },
    Out {
        label: "Water for the run, boiler and cooling",
        out: "total_water",
        text: |p| units::volume(p.water_use.total_kg / 1000.0),
    },
    Out {
        label: "Hydrosol (distillate water)",
        out: "hydrosol",
        text: |p| units::volume(p.run.hydrosol_volume_m3),
    },
];

/// The rows under "Separator".
pub(crate) const SEPARATOR_ROWS: &[Out] = &[
    Out {
        label: "Distillate flow",
        out: "distillate_flow",
        text: |p| units::litres_per_hour(p.separator.distillate_flow_m3_per_s),
    },
    Out {
        label: "Oil gathers at the",
        out: "oil_layer",
        text: |p| match p.separator.oil_outlet {
            OilLayer::Top => "top: water leaves from the bottom".to_string(),
            OilLayer::Bottom => "bottom: water leaves from the top".to_string(),
        },
    },
    Out {
        label: "Design droplet moves",
        out: "droplet_velocity",
        text: |p| {
            format!(
                "{} {}",
                units::mm_per_s(p.separator.droplet_velocity_m_per_s.abs()),
                if p.separator.droplet_velocity_m_per_s >= 0.0 { "up" } else { "down" }
            )
        },
    },
    Out {
        label: "Least surface area",
        out: "separator_area",
        text: |p| p.separator.plan_area_m2.map(units::area).unwrap_or_else(|| "no gravity separation".into()),
    },
    Out {
        label: "A vessel that works: diameter",
        out: "separator_diameter",
        text: |p| p.separator.diameter_m.map(units::length).unwrap_or_else(|| "–".into()),
    },
    Out {
        label: "Volume for the standing time",
        out: "separator_volume",
        text: |p| units::volume(p.separator.volume_m3),
    },
    Out {
        label: "and liquid height (top outlet)",
        out: "separator_height",
        text: |p| p.separator.height_m.map(units::length).unwrap_or_else(|| "–".into()),
    },
    Out {
        label: "Gooseneck outlet height",
        out: "gooseneck_height",
        text: |p| p.separator.gooseneck_height_m.map(mm).unwrap_or_else(|| "–".into()),
    },
    Out {
        label: "Oil-water interface at",
        out: "interface_height",
        text: |p| {
            p.separator
                .interface_height_m
                .map(|h| {
                    format!(
                        "{} ({} to {} over the cuts)",
                        mm(h),
                        mm(p.separator.interface_low_m.unwrap_or(h)),
                        mm(p.separator.interface_high_m.unwrap_or(h))
                    )
                })
                .unwrap_or_else(|| "–".into())
        },
    },
    Out {
        label: "Interface moves per mm of gooseneck",
        out: "interface_sensitivity",
        text: |p| {
            p.separator
                .interface_per_gooseneck
                .map(|k| format!("{} mm", units::sig3(k)))
                .unwrap_or_else(|| "–".into())
        },
    },
    Out {
        label: "Oil density at the separator",
        out: "oil_density_separator",
        text: |p| {
            format!(
                "{} g/mL{}",
                units::fixed(p.oil.density_at_separator_kg_per_m3 / 1000.0, 3),
                p.oil
                    .inversion_temperature_c
                    .map(|t| format!("; as dense as water at {}", units::celsius(t)))
                    .unwrap_or_default()
            )
        },
    },
];

/// The rows under "Oil and hydrosol".
pub(crate) const OIL_ROWS: &[Out] = &[
    Out {
        label: "Oil in the charge",
        out: "oil_in_charge",
        text: |p| units::mass(p.yield_estimate.oil_in_charge_kg),
    },
    Out {
        label: "Oil carried over",
        out: "oil_carried",
        text: |p| units::mass(p.yield_estimate.carried_over_kg),
    },
    Out {
        label: "Oil that separates",
        out: "oil_mass",
        text: |p| {
            units::range(
                units::mass(p.yield_estimate.oil_kg.central),
                units::mass(p.yield_estimate.oil_kg.low),
                units::mass(p.yield_estimate.oil_kg.high),
            )
        },
    },
    Out {
        label: "As share of the plant",
        out: "oil_share",
        text: |p| format!("{} %", units::sig3(p.yield_estimate.recovery_percent_of_plant.central)),
    },
    Out {
        label: "Water to oil",
        out: "water_to_oil",
        text: |p| format!("{} : 1", units::sig3(p.run.water_to_oil_ratio)),
    },
    Out {
        label: "Oil dissolved in the hydrosol",
        out: "dissolved",
        text: |p| {
            format!(
                "{} ({})",
                units::mass(p.yield_estimate.dissolved_in_hydrosol_kg),
                units::percent(p.yield_estimate.dissolved_share)
            )
        },
    },
    Out {
        label: "Oil density used",
        out: "oil_density",
        text: |p| format!("{} g/mL", units::fixed(p.oil.density_kg_per_m3 / 1000.0, 3)),
    },
];

/// The rows under "Season".
pub(crate) const SEASON_ROWS: &[Out] = &[
    Out {
        label: "The still holds, at usual packing",
        out: "still_capacity",
        text: |p| {
            p.season
                .as_ref()
                .and_then(|s| s.still_capacity_kg)
                .map(units::mass)
                .unwrap_or_else(|| "give the still volume".into())
        },
    },
    Out {
        label: "Charges",
        out: "season_charges",
        text: |p| p.season.as_ref().map(|s| s.charges.to_string()).unwrap_or_default(),
    },
    Out {
        label: "First charge, from cold / each later one, hot",
        out: "season_charge_times",
        text: |p| {
            p.season
                .as_ref()
                .map(|s| {
                    format!(
                        "{} / {}",
                        units::duration(s.first_charge_time_s),
                        units::duration(s.later_charge_time_s)
                    )
                })
                .unwrap_or_default()
        },
    },
    Out {
        label: "Still time, with turnarounds",
        out: "season_time",
        text: |p| {
            p.season
                .as_ref()
                .map(|s| format!("{} h", units::sig3(s.total_time_s / 3600.0)))
                .unwrap_or_default()
        },
    },
    Out {
        label: "Fuel",
        out: "season_fuel",
        text: |p| p.season.as_ref().map(|s| units::fuel(s.fuel_amount, p.energy.fuel)).unwrap_or_default(),
    },
    Out {
        label: "Water",
        out: "season_water",
        text: |p| p.season.as_ref().map(|s| units::volume(s.water_kg / 1000.0)).unwrap_or_default(),
    },
    Out {
        label: "Oil",
        out: "season_oil",
        text: |p| p.season.as_ref().map(|s| units::mass(s.oil_kg)).unwrap_or_default(),
    },
];
