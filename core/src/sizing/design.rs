//! The design: each piece of equipment with the exact size the physics asks for and the size
//! to buy, and the forward plan of the bought design.

use crate::heat::{Appliance, Fuel};
use crate::plan::{Range, Warning};
use crate::scenario::{CondenserKind, Scenario};
use serde::{Deserialize, Serialize};

macro_rules! output {
    ($($item:item)*) => { $(
        #[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
        #[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
        #[serde(deny_unknown_fields)]
        $item
    )* };
}

output! {
    /// Equipment for the request, exact and rounded to what can be bought, with the forward plan
    /// of the rounded design.
    pub struct Design {
        pub charges_per_day: u32,
        /// Plant per charge, kg.
        pub charge_kg: f64,
        pub still: StillDesign,
        pub heat: HeatDesign,
        pub boiler: BoilerDesign,
        pub condenser: CondenserDesign,
        pub separator: SeparatorDesign,
        /// What the rounded design gives, from its forward plan.
        pub planned: PlannedFigures,
        /// Each allowance the design adds, with its source.
        pub allowances: Vec<Allowance>,
        /// Cautions that go with building and running it.
        pub cautions: Vec<String>,
        /// The rounded design as a scenario: `plan` it to see every number.
        pub scenario: Scenario,
    }

    /// One sized quantity: what the physics asks for and what to buy.
    pub struct Purchase {
        /// The least that meets the request, in the field's unit.
        pub exact: f64,
        /// The catalogue size chosen, in the same unit.
        pub rounded: f64,
        /// The shop's name for it.
        pub label: String,
        pub source: String,
    }

    /// The still body: boiler water under a grid, the charge on it, steam space above.
    pub struct StillDesign {
        /// The charge's own volume at the packing density, m³.
        pub charge_volume_m3: f64,
        pub packing_density_kg_per_m3: f64,
        /// Whole vessel, m³.
        pub volume_m3: Purchase,
        /// Of the rounded vessel, m.
        pub diameter_m: f64,
        pub height_m: f64,
        pub height_to_diameter: f64,
        /// Boiler water depth at the fill, m.
        pub water_depth_m: f64,
        pub grid_height_m: f64,
        /// Top of the charge when the rounded vessel holds the design charge, m.
        pub charge_top_m: f64,
        /// Most plant the rounded vessel holds at the packing density, kg.
        pub capacity_kg: f64,
        /// Shell metal (wall, bottom and lid) of the rounded vessel, kg.
        pub metal_mass_kg: f64,
    }

    /// The heat source.
    pub struct HeatDesign {
        pub fuel: Fuel,
        pub appliance: Appliance,
        /// Heat input (sea-level rating for gas), W.
        pub heat_input_w: Purchase,
        /// Most the supply gives (electric) or the largest on offer (fuel), W.
        pub supply_limit_w: f64,
        /// Current the rounded element draws from the supply, A (electric with a voltage).
        pub current_a: Option<f64>,
        /// Steam per hour per kg of charge the design passes (the crop's rate or more).
        pub specific_steam_rate_kg_per_h_per_kg: f64,
        pub steam_rate_kg_per_s: f64,
    }

    /// The boiler water.
    pub struct BoilerDesign {
        /// Water boiled off over the first charge, kg (with the design's margin).
        pub boiled_off_kg: f64,
        /// Water over the heater that is never boiled off, kg.
        pub heater_cover_kg: f64,
        /// Water to fill before lighting, kg.
        pub fill_kg: f64,
    }

    /// The condenser.
    pub struct CondenserDesign {
        pub kind: CondenserKind,
        pub duty_w: f64,
        /// Inner diameter the steam needs at the coil's inlet, and the tube chosen, m.
        pub tube_inner_diameter_m: Purchase,
        pub tube_outer_diameter_m: f64,
        /// Tube the condensing and cooling areas need, m (from the forward plan).
        pub tube_length_m: f64,
        /// Whole metres to buy, m.
        pub tube_to_buy_m: f64,
        /// Tub volume (coil in a tub), m³: exact from its water, rounded to a tub size.
        pub tub_volume_m3: Option<Purchase>,
        /// Tub water, kg: the least that stays at or under the warmest allowed temperature over
        /// the run without a feed, and what the rounded tub holds at its fill.
        pub tub_water_kg: Option<Purchase>,
        /// The tub's temperature at the end of the first charge, °C.
        pub tub_end_c: Option<f64>,
        /// Time to refill the tub with cold water at the supply's limit, s.
        pub tub_refill_s: Option<f64>,
        /// Cooling water flow (fed jacket), kg/s.
        pub cooling_water_flow_kg_per_s: f64,
        pub distillate_outlet_c: f64,
    }

    /// The separator (oil-water receiver).
    pub struct SeparatorDesign {
        /// Volume, m³: exact from the distillate flow and residence time, rounded to glassware.
        pub volume_m3: Purchase,
        pub diameter_m: Option<f64>,
        pub height_m: Option<f64>,
        pub top_outlet_height_m: Option<f64>,
        pub gooseneck_height_m: Option<f64>,
        pub interface_height_m: Option<f64>,
        pub residence_time_s: f64,
    }

    /// Headline numbers of the rounded design's forward plan.
    pub struct PlannedFigures {
        pub time_to_first_drop_s: f64,
        pub time_after_first_drop_s: f64,
        /// The first charge, from cold, lighting to the end of its run.
        pub first_charge_time_s: f64,
        /// Each later charge, started hot.
        pub later_charge_time_s: f64,
        /// The day's charges with their turnarounds.
        pub day_time_s: f64,
        pub fuel_unit: String,
        pub fuel_per_charge: f64,
        pub fuel_per_day: f64,
        pub water_per_run_kg: f64,
        pub oil_per_charge_kg: Range,
        pub oil_per_day_kg: f64,
        /// Over the days given with the harvest.
        pub oil_per_season_kg: Option<f64>,
        pub hydrosol_per_charge_m3: f64,
        pub warnings: Vec<Warning>,
    }

    /// An allowance the design adds on top of the physics, and where it comes from.
    pub struct Allowance {
        pub name: String,
        pub value: f64,
        pub unit: String,
        pub source: String,
    }
}
