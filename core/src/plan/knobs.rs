//! The uncertain inputs the plan's ranges swing: each at its central value for the plan itself,
//! and at its low or high end, one at a time, for the ranges (`plan/ranges.rs`).

use crate::recovery::{KINETIC_STEAM_EXPONENT, VAPORISATION_EFFICIENCY};

/// Factors and values the stages read besides the scenario. Central values reproduce the plan.
#[derive(Debug, Clone, Copy, PartialEq)]
pub(super) struct Knobs {
    /// Multiplies every oil compound's vapour pressure (so divides the least steam).
    pub vapour_pressure_factor: f64,
    /// Multiplies every compound's water solubility.
    pub solubility_factor: f64,
    /// Share of the saturation load the steam carries ([`VAPORISATION_EFFICIENCY`]).
    pub vaporisation_efficiency: f64,
    /// n in k = k_ref (q/q_ref)^n ([`KINETIC_STEAM_EXPONENT`]).
    pub kinetic_exponent: f64,
    /// Multiplies the condenser's two U-values.
    pub condenser_u_factor: f64,
    /// Multiplies the still wall's U-value.
    pub wall_u_factor: f64,
}

impl Knobs {
    pub const CENTRAL: Knobs = Knobs {
        vapour_pressure_factor: 1.0,
        solubility_factor: 1.0,
        vaporisation_efficiency: VAPORISATION_EFFICIENCY.1,
        kinetic_exponent: KINETIC_STEAM_EXPONENT.1,
        condenser_u_factor: 1.0,
        wall_u_factor: 1.0,
    };
}
