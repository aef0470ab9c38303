//! Essential-oil compounds: identity, liquid properties and vapour-pressure correlations.
//!
//! The table itself lives in [`table`] as data, one row per compound, each with its source.
//! Vapour pressure is evaluated by [`VapourPressure::pressure_pa`]; evaluating a correlation
//! outside its fitted range is allowed (a run may sit a few kelvin below a fit) but always
//! reported through [`VapourPressure::in_range`], which the plan turns into a warning.

mod table;

pub use table::COMPOUNDS;

use serde::{Deserialize, Serialize};

/// Chemical family, used for grouping in the page and for default solubility reasoning.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize, Deserialize)]
#[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
#[serde(rename_all = "snake_case")]
pub enum CompoundClass {
    MonoterpeneHydrocarbon,
    OxygenatedMonoterpene,
    Phenylpropanoid,
    Sesquiterpene,
    RoseAlcohol,
    Other,
}

/// The mathematical form of a vapour-pressure correlation, with its coefficients.
///
/// T is absolute temperature in kelvin in every form.
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
#[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
#[serde(tag = "form", rename_all = "snake_case")]
pub enum CorrelationForm {
    /// ln(p/Pa) = A - B / (T/K + C)  (Landolt-Börnstein style).
    AntoineLnPa { a: f64, b: f64, c: f64 },
    /// log10(p/bar) = A - B / (T/K + C)  (NIST WebBook style).
    AntoineLog10Bar { a: f64, b: f64, c: f64 },
    /// log10(p/Pa) = A - B / (T/K + C)  (Poling, Prausnitz & O'Connell style).
    AntoineLog10Pa { a: f64, b: f64, c: f64 },
    /// log10(p/mmHg) = A - B / (t/°C + C)  (the classic handbook form, °C and mmHg).
    AntoineLog10MmHgCelsius { a: f64, b: f64, c: f64 },
    /// ln(p/Pc) = (Tc/T)(A τ + B τ^1.5 + C τ^2.5 + D τ^5), τ = 1 - T/Tc  (Wagner 2.5,5).
    Wagner25 { tc_k: f64, pc_pa: f64, a: f64, b: f64, c: f64, d: f64 },
}

/// How much to trust a correlation's numbers.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize, Deserialize)]
#[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
#[serde(rename_all = "snake_case")]
pub enum Confidence {
    /// A published correlation fitted to measurements, used inside its range.
    Measured,
    /// Fitted here to published points (for example one measured point and the normal boiling point).
    FittedToPublishedPoints,
    /// From a corresponding-states estimate: order of magnitude only.
    Estimated,
    /// Entered by the user.
    UserSupplied,
}

/// A vapour-pressure correlation with the temperature range its authors fitted it over.
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
#[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
pub struct VapourPressure {
    pub form: CorrelationForm,
    pub t_min_k: f64,
    pub t_max_k: f64,
    /// Relative uncertainty (1 sigma, as a fraction) of the pressure near 95-100 °C.
    pub relative_uncertainty: f64,
    pub confidence: Confidence,
}

/// One compound of the library.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct Compound {
    /// Stable identifier used in scenarios (lowercase, ASCII, hyphens).
    pub id: &'static str,
    pub name: &'static str,
    pub cas: &'static str,
    pub class: CompoundClass,
    pub molar_mass_kg_per_mol: f64,
    pub liquid_density_kg_per_m3: f64,
    pub density_temperature_c: f64,
    pub normal_boiling_point_k: f64,
    pub boiling_point_source: &'static str,
    pub vapour_pressure: VapourPressure,
    pub vapour_pressure_source: &'static str,
    /// Solubility in water near 25 °C, used at any hydrosol temperature (no temperature
    /// dependence is known to the table; see the table's header).
    pub water_solubility_kg_per_m3: f64,
    /// Relative uncertainty of the solubility (fraction).
    pub water_solubility_relative_uncertainty: f64,
    pub water_solubility_source: &'static str,
    /// Source of molar mass and density.
    pub property_source: &'static str,
}

impl Compound {
    /// Each source text of the row with what it supports (lower case: the page writes the
    /// compound's name before it). The texts are "" in a build without the feature
    /// `source-texts` (the page's): the build writes them natively into `sources.json`.
    pub fn sources(&self) -> [(&'static str, &'static str); 4] {
        [
            ("boiling point", self.boiling_point_source),
            ("vapour pressure", self.vapour_pressure_source),
            ("water solubility", self.water_solubility_source),
            ("molar mass and density", self.property_source),
        ]
    }
}

const LN_10: f64 = std::f64::consts::LN_10;
const PA_PER_BAR: f64 = 1e5;
const PA_PER_MMHG: f64 = 101_325.0 / 760.0;

impl CorrelationForm {
    /// Vapour pressure, Pa, at absolute temperature T, by the form's own equation.
    ///
    /// Antoine (Antoine 1888; the coefficients' units are part of the form); Wagner 2.5,5
    /// (Wagner 1973, in the form of Poling, Prausnitz & O'Connell, *The Properties of Gases and
    /// Liquids*, 5th ed., eq. 7-3.3). Returns NaN when T is at or below an Antoine set's
    /// asymptote (T + C ≤ 0) or above Tc for Wagner; callers check.
    ///
    /// ```
    /// use stillroom_core::compounds::CorrelationForm;
    /// // Landolt-Börnstein IV/20 Antoine for d-limonene, ln(P/Pa) = 22.471987 - 4697.952852/(T - 19.639):
    /// let f = CorrelationForm::AntoineLnPa { a: 22.471987, b: 4697.952852, c: -19.639 };
    /// // 9726 Pa at 100 °C (evaluated with chemicals 1.5.2).
    /// assert!((f.pressure_pa(373.15) - 9726.0).abs() < 2.0);
    /// ```
    pub fn pressure_pa(&self, t_k: f64) -> f64 {
        self.ln_pressure_pa(t_k).exp()
    }

    /// ln(p/Pa) at T: the correlation in its natural log-linear form, which stays finite where
    /// the pressure itself would underflow (far below the boiling point).
    pub fn ln_pressure_pa(&self, t_k: f64) -> f64 {
        match *self {
            CorrelationForm::AntoineLnPa { a, b, c } => guarded(t_k + c, |d| a - b / d),
            CorrelationForm::AntoineLog10Bar { a, b, c } => {
                guarded(t_k + c, |d| PA_PER_BAR.ln() + (a - b / d) * LN_10)
            }
            CorrelationForm::AntoineLog10Pa { a, b, c } => guarded(t_k + c, |d| (a - b / d) * LN_10),
            CorrelationForm::AntoineLog10MmHgCelsius { a, b, c } => {
                guarded(t_k - 273.15 + c, |d| PA_PER_MMHG.ln() + (a - b / d) * LN_10)
            }
            CorrelationForm::Wagner25 { tc_k, pc_pa, a, b, c, d } => {
                if !(t_k > 0.0 && t_k < tc_k) {
                    return f64::NAN;
                }
                let tau = 1.0 - t_k / tc_k;
                let sum = a * tau + b * tau.powf(1.5) + c * tau.powf(2.5) + d * tau.powi(5);
                pc_pa.ln() + tc_k / t_k * sum
            }
        }
    }
}

fn guarded(denominator: f64, f: impl Fn(f64) -> f64) -> f64 {
    if denominator > 0.0 { f(denominator) } else { f64::NAN }
}

impl VapourPressure {
    /// Vapour pressure, Pa, at T (see [`CorrelationForm::pressure_pa`]); evaluated even outside
    /// the fitted range, which [`VapourPressure::in_range`] reports.
    pub fn pressure_pa(&self, t_k: f64) -> f64 {
        self.form.pressure_pa(t_k)
    }

    /// Whether T lies inside the range the correlation was fitted over.
    pub fn in_range(&self, t_k: f64) -> bool {
        t_k >= self.t_min_k && t_k <= self.t_max_k
    }

    /// Temperature, K, at which the vapour pressure equals `p_pa` (e.g. the normal boiling
    /// point at 101 325 Pa), found by bracketing between 150 K and 900 K.
    ///
    /// ```
    /// use stillroom_core::compounds::find;
    /// // CRC Handbook: α-pinene boils at 429.45 K.
    /// let tb = find("alpha-pinene").unwrap().vapour_pressure.temperature_at_k(101_325.0).unwrap();
    /// assert!((tb - 429.45).abs() < 1.0);
    /// ```
    pub fn temperature_at_k(&self, p_pa: f64) -> Option<f64> {
        // Below an Antoine asymptote the function is NaN: start the bracket above it.
        let lo = match self.form {
            CorrelationForm::AntoineLnPa { c, .. }
            | CorrelationForm::AntoineLog10Bar { c, .. }
            | CorrelationForm::AntoineLog10Pa { c, .. } => (150.0f64).max(-c + 1.0),
            CorrelationForm::AntoineLog10MmHgCelsius { c, .. } => (150.0f64).max(273.15 - c + 1.0),
            CorrelationForm::Wagner25 { .. } => 150.0,
        };
        let hi = match self.form {
            CorrelationForm::Wagner25 { tc_k, .. } => tc_k - 1e-6,
            _ => 900.0,
        };
        crate::numeric::find_root(|t| self.form.ln_pressure_pa(t) - p_pa.ln(), lo, hi, 1e-9).ok()
    }
}

/// Looks a compound up by its id.
///
/// ```
/// assert_eq!(stillroom_core::compounds::find("linalool").unwrap().name, "Linalool");
/// ```
pub fn find(id: &str) -> Option<&'static Compound> {
    COMPOUNDS.iter().find(|c| c.id == id)
}
