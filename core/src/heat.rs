//! Heat: warming the charge, the still and the boiler water; losses through the still wall;
//! and the fuel that pays for it all.

use serde::{Deserialize, Serialize};

/// Sensible heat to warm a mass from one temperature to another, J: Q = m c_p ΔT.
///
/// Source: definition of specific heat capacity (any heat-transfer text, e.g. Incropera,
/// *Fundamentals of Heat and Mass Transfer*, eq. 1.12). Valid where c_p is near constant over
/// ΔT (plant matter, metals between 0 and 100 °C).
///
/// ```
/// use stillroom_core::heat::sensible_heat_j;
/// // 80 kg of stainless steel (c_p 460 J/kg K) from 20 to 100 °C: 2.94 MJ.
/// assert!((sensible_heat_j(80.0, 460.0, 20.0, 100.0) - 2.944e6).abs() < 1.0);
/// ```
pub fn sensible_heat_j(mass_kg: f64, heat_capacity_j_per_kg_k: f64, from_c: f64, to_c: f64) -> f64 {
    mass_kg * heat_capacity_j_per_kg_k * (to_c - from_c)
}

/// Steam condensed to warm the charge and the still up to the boiling temperature, kg:
/// m = Q / h_fg. This water stays in the charge or runs back; it is not distillate.
///
/// Source: heat balance on a steam-heated body (steam gives up its latent heat as it
/// condenses). Valid for saturated steam and a charge warmed below the steam's temperature.
///
/// ```
/// use stillroom_core::heat::{sensible_heat_j, startup_condensate_kg};
/// // 100 kg herb (3.2 kJ/kg K) + 80 kg stainless, 20 -> 100 °C, h_fg 2256 kJ/kg: ≈ 12.6 kg.
/// let q = sensible_heat_j(100.0, 3200.0, 20.0, 100.0) + sensible_heat_j(80.0, 460.0, 20.0, 100.0);
/// assert!((startup_condensate_kg(q, 2.256e6) - 12.65).abs() < 0.05);
/// ```
pub fn startup_condensate_kg(heat_j: f64, latent_heat_j_per_kg: f64) -> f64 {
    heat_j / latent_heat_j_per_kg
}

/// Heat lost through a wall, W: Q = U A (T_inside - T_outside).
///
/// Source: overall heat-transfer coefficient definition (Incropera, eq. 3.19). U for an
/// uninsulated metal still in still air is about 6.5-13 W/(m² K), 0.7 with 50 mm mineral wool
/// (computed with ht 1.2.0 natural convection plus radiation).
///
/// ```
/// use stillroom_core::heat::wall_loss_w;
/// assert_eq!(wall_loss_w(10.0, 2.0, 100.0, 20.0), 1600.0);
/// ```
pub fn wall_loss_w(u_w_per_m2_k: f64, area_m2: f64, inside_c: f64, outside_c: f64) -> f64 {
    u_w_per_m2_k * area_m2 * (inside_c - outside_c).max(0.0)
}

/// Outer surface of a closed upright cylinder of volume V and height-to-diameter ratio r, m²:
/// D = (4 V / (π r))^(1/3), A = π D H + 2 π D²/4.
///
/// Source: geometry. Valid for V > 0, r > 0.
///
/// ```
/// use stillroom_core::heat::cylinder_surface_m2;
/// // A 100 L still twice as tall as wide: D = 0.3993 m, H = 0.7986 m, A = 1.2522 m².
/// assert!((cylinder_surface_m2(0.1, 2.0) - 1.2522).abs() < 1e-3);
/// ```
pub fn cylinder_surface_m2(volume_m3: f64, height_to_diameter: f64) -> f64 {
    let d = (4.0 * volume_m3 / (std::f64::consts::PI * height_to_diameter)).cbrt();
    let h = height_to_diameter * d;
    std::f64::consts::PI * d * h + std::f64::consts::PI * d * d / 2.0
}

/// A heat source for the boiler.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize, Deserialize)]
#[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
#[serde(rename_all = "snake_case")]
pub enum Fuel {
    Propane,
    NaturalGas,
    Firewood,
    Electricity,
}

/// What one unit of a fuel holds, and what it is sold by.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct FuelData {
    /// Lower heating value per sales unit, J.
    pub heating_value_j_per_unit: f64,
    /// The sales unit: "kg", "m³", "kWh".
    pub unit: &'static str,
    /// A typical share of the heating value that ends up in the boiler water.
    pub typical_efficiency: f64,
    pub source: &'static str,
}

impl Fuel {
    /// Heating value, unit and typical efficiency of the fuel, with sources.
    ///
    /// ```
    /// use stillroom_core::heat::Fuel;
    /// assert_eq!(Fuel::Electricity.data().heating_value_j_per_unit, 3.6e6);
    /// ```
    pub fn data(self) -> FuelData {
        match self {
            Fuel::Propane => FuelData {
                heating_value_j_per_unit: 46.34e6,
                unit: "kg",
                typical_efficiency: 0.45,
                source: "LHV 46.34 MJ/kg (computed with chemicals 1.5.2 from the heat of \
                         formation); efficiency 0.45 for a burner under a kettle, range 0.35-0.58 \
                         (Khan & Saxena, IJERT 2(7) 2013: max 58 %)",
            },
            Fuel::NaturalGas => FuelData {
                heating_value_j_per_unit: 36.6e6,
                unit: "m³",
                typical_efficiency: 0.75,
                source: "LHV 983 Btu/ft³ = 36.6 MJ/m³ at 0 °C, 1 atm (PNNL Hydrogen Analysis \
                         Resource Center, GREET table); efficiency 0.75 for a packaged boiler, \
                         range 0.6-0.85 (US DOE Steam Tip Sheet #4, 2006)",
            },
            Fuel::Firewood => FuelData {
                heating_value_j_per_unit: 16.0e6,
                unit: "kg",
                typical_efficiency: 0.15,
                source: "16 MJ/kg dry wood (world-nuclear.org, Heat values of various fuels); \
                         efficiency 0.15 for an open firebox, range 0.10-0.25 (Ikpambese et al., \
                         IJERST 3(2) 2014, water-boiling tests 9.6-14.6 %)",
            },
            Fuel::Electricity => FuelData {
                heating_value_j_per_unit: 3.6e6,
                unit: "kWh",
                typical_efficiency: 0.95,
                source: "3.6 MJ/kWh by definition; an immersion element turns about all of its \
                         input into heat, 0.95 allows for wiring and vessel surfaces \
                         (common practice, no source)",
            },
        }
    }
}

/// Fuel needed to deliver a useful heat, in the fuel's sales unit: Q / (η · HV).
///
/// Source: definition of the heating value and of appliance efficiency. Valid for 0 < η ≤ 1.
///
/// ```
/// use stillroom_core::heat::{fuel_amount, Fuel};
/// // 10 kWh of heat from electricity at 95 %: 10.53 kWh bought.
/// assert!((fuel_amount(36.0e6, Fuel::Electricity, 0.95) - 10.526).abs() < 1e-3);
/// ```
pub fn fuel_amount(useful_heat_j: f64, fuel: Fuel, efficiency: f64) -> f64 {
    useful_heat_j / (efficiency * fuel.data().heating_value_j_per_unit)
}

/// Specific heat of still metals, J/(kg K), at room temperature.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize, Deserialize)]
#[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
#[serde(rename_all = "snake_case")]
pub enum Metal {
    Copper,
    StainlessSteel,
    CarbonSteel,
    Aluminium,
}

impl Metal {
    /// c_p, J/(kg K): copper 380, stainless steel 460, carbon steel 450, aluminium 880
    /// (DIN EN 12524 data as tabulated in the VDI Heat Atlas, read with ht 1.2.0).
    ///
    /// ```
    /// assert_eq!(stillroom_core::heat::Metal::Copper.heat_capacity_j_per_kg_k(), 380.0);
    /// ```
    pub fn heat_capacity_j_per_kg_k(self) -> f64 {
        match self {
            Metal::Copper => 380.0,
            Metal::StainlessSteel => 460.0,
            Metal::CarbonSteel => 450.0,
            Metal::Aluminium => 880.0,
        }
    }
}
