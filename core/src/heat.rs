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
    pub source: &'static str,
}

impl Fuel {
    /// Heating value and sales unit of the fuel, with sources.
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
                source: "LHV 46.34 MJ/kg (computed with chemicals 1.5.2 from the heat of formation)",
            },
            Fuel::NaturalGas => FuelData {
                heating_value_j_per_unit: 36.6e6,
                unit: "m³",
                source: "LHV 983 Btu/ft³ = 36.6 MJ/m³ at 0 °C, 1 atm (PNNL Hydrogen Analysis \
                         Resource Center, GREET table)",
            },
            Fuel::Firewood => FuelData {
                heating_value_j_per_unit: 16.0e6,
                unit: "kg",
                source: "16 MJ/kg dry wood (world-nuclear.org, Heat values of various fuels)",
            },
            Fuel::Electricity => {
                FuelData { heating_value_j_per_unit: 3.6e6, unit: "kWh", source: "3.6 MJ/kWh by definition" }
            }
        }
    }

    /// The appliance a fuel usually fires when the scenario names none: gas under an open
    /// burner, wood in a firebox, electricity through an immersion element.
    ///
    /// ```
    /// use stillroom_core::heat::{Appliance, Fuel};
    /// assert_eq!(Fuel::Firewood.usual_appliance(), Appliance::WoodFirebox);
    /// ```
    pub fn usual_appliance(self) -> Appliance {
        match self {
            Fuel::Propane | Fuel::NaturalGas => Appliance::OpenBurner,
            Fuel::Firewood => Appliance::WoodFirebox,
            Fuel::Electricity => Appliance::ImmersionElement,
        }
    }

    /// Whether the fuel burns gas in air, so that its burner loses output with altitude.
    pub fn is_gas(self) -> bool {
        matches!(self, Fuel::Propane | Fuel::NaturalGas)
    }
}

/// What turns the fuel's heat into boiling water. The efficiency belongs to the appliance,
/// not to the fuel: the same propane heats a kettle at about 45 % and a packaged boiler at 75 %.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize, Deserialize)]
#[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
#[serde(rename_all = "snake_case")]
pub enum Appliance {
    /// A gas ring or burner under the boiler's bottom.
    OpenBurner,
    /// A packaged or jacketed boiler with its own firebox and flue (gas, oil or wood).
    JacketedBoiler,
    /// An electric element in the boiler water.
    ImmersionElement,
    /// A wood fire in a box or hearth under the boiler.
    WoodFirebox,
}

/// A typical appliance efficiency, its range, and where it comes from.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct ApplianceData {
    pub typical_efficiency: f64,
    pub low_efficiency: f64,
    pub high_efficiency: f64,
    pub source: &'static str,
}

impl Appliance {
    /// Share of the fuel's heat that reaches the boiler water, with its range and source.
    ///
    /// ```
    /// use stillroom_core::heat::Appliance;
    /// let d = Appliance::OpenBurner.data();
    /// assert!(d.low_efficiency < d.typical_efficiency && d.typical_efficiency < d.high_efficiency);
    /// ```
    pub fn data(self) -> ApplianceData {
        match self {
            Appliance::OpenBurner => ApplianceData {
                typical_efficiency: 0.45,
                low_efficiency: 0.35,
                high_efficiency: 0.58,
                source: "LPG burner under a pot, at most 58 % (Khan & Saxena, IJERT 2(7) 2013); \
                         0.45 typical for a kettle-type still",
            },
            Appliance::JacketedBoiler => ApplianceData {
                typical_efficiency: 0.75,
                low_efficiency: 0.60,
                high_efficiency: 0.85,
                source: "combustion 80.8-85.4 % (US DOE ITP Steam Tip Sheet #4, 2006); overall \
                         42.5-76.6 % after radiation and blowdown (ASHRAE Journal, Sept 1994)",
            },
            Appliance::ImmersionElement => ApplianceData {
                typical_efficiency: 0.95,
                low_efficiency: 0.90,
                high_efficiency: 0.99,
                source: "an element in the water turns about all its input into heat; 0.95 allows \
                         for wiring and exposed surfaces (common practice, no source)",
            },
            Appliance::WoodFirebox => ApplianceData {
                typical_efficiency: 0.15,
                low_efficiency: 0.10,
                high_efficiency: 0.25,
                source: "open fires and wood stoves in water-boiling tests 9.6-14.6 % (Ikpambese \
                         et al., IJERST 3(2) 2014); up to 25 % in a closed box (from memory)",
            },
        }
    }

    /// Whether this appliance can burn or use the fuel.
    ///
    /// ```
    /// use stillroom_core::heat::{Appliance, Fuel};
    /// assert!(Appliance::JacketedBoiler.accepts(Fuel::Firewood));
    /// assert!(!Appliance::ImmersionElement.accepts(Fuel::Propane));
    /// ```
    pub fn accepts(self, fuel: Fuel) -> bool {
        match self {
            Appliance::OpenBurner => fuel.is_gas(),
            Appliance::JacketedBoiler => fuel != Fuel::Electricity,
            Appliance::ImmersionElement => fuel == Fuel::Electricity,
            Appliance::WoodFirebox => fuel == Fuel::Firewood,
        }
    }
}

/// Share of its sea-level rating a gas appliance delivers at altitude.
///
/// f = 1 up to 2000 ft (609.6 m); above, 1 − 0.04 · z/1000 ft, i.e. 4 % for each 1000 ft above
/// sea level. The thinner air burns less gas through the same orifice. Source: the US National
/// Fuel Gas Code (NFPA 54 / ANSI Z223.1), high-altitude derating rule (wording from memory).
/// Valid for natural-draft and fan-less burners from sea level to about 3000 m; beyond, the
/// rule is extrapolated. Not for electric elements or wood fires.
///
/// ```
/// use stillroom_core::heat::gas_altitude_derate;
/// assert_eq!(gas_altitude_derate(500.0), 1.0);
/// // 1500 m = 4921 ft: 19.7 % less.
/// assert!((gas_altitude_derate(1500.0) - 0.8031).abs() < 1e-3);
/// ```
pub fn gas_altitude_derate(altitude_m: f64) -> f64 {
    /// International foot, m (NIST SP 811, B.8).
    const FOOT_M: f64 = 0.3048;
    let feet = altitude_m / FOOT_M;
    if feet <= 2000.0 { 1.0 } else { (1.0 - 0.04 * feet / 1000.0).max(0.0) }
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
