//! The oil phase: a liquid mixture of compounds, ideal in the sense of Raoult's law.
//!
//! Inside the oil, each compound's partial pressure is p_i = x_i · p_i*(T) (Raoult's law, the
//! ideal-solution limit; terpene mixtures are close to ideal, oxygenated compounds less so).
//! Across the oil and the water, which do not mix, each liquid exerts its own vapour pressure in
//! full (Dalton's law): see [`crate::codistillation`].

use crate::compounds::{Compound, VapourPressure};
use serde::{Deserialize, Serialize};

/// The properties of one compound that the physics needs, owned so that a user's own compound
/// and a library compound are handled alike.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
pub struct Component {
    pub id: String,
    pub name: String,
    pub molar_mass_kg_per_mol: f64,
    pub liquid_density_kg_per_m3: f64,
    pub vapour_pressure: VapourPressure,
    pub water_solubility_kg_per_m3: f64,
}

impl From<&Compound> for Component {
    fn from(c: &Compound) -> Self {
        Component {
            id: c.id.to_string(),
            name: c.name.to_string(),
            molar_mass_kg_per_mol: c.molar_mass_kg_per_mol,
            liquid_density_kg_per_m3: c.liquid_density_kg_per_m3,
            vapour_pressure: c.vapour_pressure,
            water_solubility_kg_per_m3: c.water_solubility_kg_per_m3,
        }
    }
}

/// An oil: components with their amounts in moles (any consistent scale), ideal unless it
/// carries UNIFAC groups for its activity coefficients.
#[derive(Debug, Clone, PartialEq)]
pub struct Oil {
    pub components: Vec<Component>,
    pub moles: Vec<f64>,
    /// Groups for UNIFAC activity coefficients; None for an ideal oil (γ = 1).
    pub activity: Option<crate::activity::OilGroups>,
}

impl Oil {
    /// An oil from mass fractions (they need not sum to 1: they are renormalised).
    /// Amounts are stored as moles per kg of oil.
    ///
    /// x_i = (w_i / M_i) / Σ_j (w_j / M_j).
    ///
    /// ```
    /// use stillroom_core::{compounds::find, oil::{Component, Oil}};
    /// let a = Component::from(find("alpha-pinene").unwrap());
    /// let l = Component::from(find("linalool").unwrap());
    /// let oil = Oil::from_mass_fractions(vec![a, l], &[0.5, 0.5]);
    /// // Equal masses: the lighter molecule (136 vs 154 g/mol) has the larger mole fraction.
    /// let x = oil.mole_fractions();
    /// assert!(x[0] > 0.5 && (x[0] + x[1] - 1.0).abs() < 1e-12);
    /// ```
    pub fn from_mass_fractions(components: Vec<Component>, mass_fractions: &[f64]) -> Oil {
        let total: f64 = mass_fractions.iter().sum();
        let moles =
            components.iter().zip(mass_fractions).map(|(c, w)| w / total / c.molar_mass_kg_per_mol).collect();
        Oil { components, moles, activity: None }
    }

    /// The same oil with activity coefficients by UNIFAC ([`crate::activity`]); an error when a
    /// compound has no UNIFAC groups (a grower's own compound, for one).
    pub fn with_activity(mut self) -> Result<Oil, crate::activity::ActivityError> {
        let ids: Vec<&str> = self.components.iter().map(|c| c.id.as_str()).collect();
        self.activity = Some(crate::activity::OilGroups::new(&ids)?);
        Ok(self)
    }

    /// Activity coefficients γ_i at T: UNIFAC for a non-ideal oil, 1 for an ideal one (and where
    /// UNIFAC cannot answer, e.g. outside its temperature range).
    pub fn activity_coefficients(&self, t_k: f64) -> Vec<f64> {
        let ideal = || vec![1.0; self.moles.len()];
        match &self.activity {
            Some(g) => g.gamma(&self.moles, t_k).unwrap_or_else(|_| ideal()),
            None => ideal(),
        }
    }

    /// Mole fractions x_i = n_i / Σ n.
    pub fn mole_fractions(&self) -> Vec<f64> {
        let total: f64 = self.moles.iter().sum();
        self.moles.iter().map(|n| n / total).collect()
    }

    /// Mass fractions w_i = n_i M_i / Σ n_j M_j.
    pub fn mass_fractions(&self) -> Vec<f64> {
        let masses: Vec<f64> =
            self.components.iter().zip(&self.moles).map(|(c, n)| n * c.molar_mass_kg_per_mol).collect();
        let total: f64 = masses.iter().sum();
        masses.iter().map(|m| m / total).collect()
    }

    /// Mass of the oil, kg, for the stored mole amounts.
    pub fn mass_kg(&self) -> f64 {
        self.components.iter().zip(&self.moles).map(|(c, n)| n * c.molar_mass_kg_per_mol).sum()
    }

    /// Partial pressures over the oil by Raoult's law, p_i = γ_i x_i p_i*(T), Pa (γ_i = 1 for an
    /// ideal oil).
    ///
    /// Source: Raoult (1887), modified with activity coefficients; any thermodynamics text (e.g.
    /// Smith, Van Ness & Abbott, *Introduction to Chemical Engineering Thermodynamics*, eq. 10.1
    /// and 12.1). Valid for liquid mixtures; each p_i* within its correlation's range.
    ///
    /// ```
    /// use stillroom_core::{compounds::find, oil::{Component, Oil}};
    /// let c = Component::from(find("1-8-cineole").unwrap());
    /// let oil = Oil::from_mass_fractions(vec![c.clone()], &[1.0]);
    /// // A pure oil exerts its full vapour pressure.
    /// let p = oil.partial_pressures_pa(373.15);
    /// assert!((p[0] - c.vapour_pressure.pressure_pa(373.15)).abs() < 1e-9);
    /// ```
    pub fn partial_pressures_pa(&self, t_k: f64) -> Vec<f64> {
        self.partial_pressures_with_pa(&self.activity_coefficients(t_k), t_k)
    }

    /// Partial pressures with given activity coefficients, p_i = γ_i x_i p_i*(T), Pa.
    pub fn partial_pressures_with_pa(&self, gamma: &[f64], t_k: f64) -> Vec<f64> {
        let x = self.mole_fractions();
        self.components
            .iter()
            .zip(x)
            .zip(gamma)
            .map(|((c, x), g)| g * x * c.vapour_pressure.pressure_pa(t_k))
            .collect()
    }

    /// Total vapour pressure of the oil, Σ x_i p_i*(T), Pa.
    pub fn vapour_pressure_pa(&self, t_k: f64) -> f64 {
        self.partial_pressures_pa(t_k).iter().sum()
    }

    /// Volume-additive density of the oil, kg/m³: 1/ρ = Σ w_i / ρ_i.
    pub fn ideal_density_kg_per_m3(&self) -> f64 {
        ideal_density_kg_per_m3(&self.components, &self.mass_fractions())
    }
}

/// Volume-additive density of a mixture, kg/m³: 1/ρ = Σ w_i / ρ_i (mass fractions renormalised).
///
/// Ideal mixing: essential-oil compounds mix with volume changes well under 1 % (common
/// practice, no source). Used for the ratio between a cut and the whole oil, so the oil's
/// measured density stays the anchor.
///
/// ```
/// use stillroom_core::{compounds::find, oil::{Component, ideal_density_kg_per_m3}};
/// let l = Component::from(find("d-limonene").unwrap());
/// let e = Component::from(find("eugenol").unwrap());
/// let rho = ideal_density_kg_per_m3(&[l.clone(), e.clone()], &[0.5, 0.5]);
/// assert!(rho > l.liquid_density_kg_per_m3 && rho < e.liquid_density_kg_per_m3);
/// ```
pub fn ideal_density_kg_per_m3(components: &[Component], mass_fractions: &[f64]) -> f64 {
    let total: f64 = mass_fractions.iter().sum();
    let specific_volume: f64 =
        components.iter().zip(mass_fractions).map(|(c, w)| w / total / c.liquid_density_kg_per_m3).sum();
    1.0 / specific_volume
}

/// Volumetric thermal expansion of essential oils, 1/K: β = -(1/ρ) dρ/dT near 20-60 °C.
///
/// The median of nine main oil compounds (limonene 7.7, α-pinene 8.4, p-cymene 7.7,
/// 1,8-cineole 7.5, linalool 7.2, linalyl acetate 7.0, camphor 6.7, menthol 6.4, eugenol
/// 5.3 × 10⁻⁴ per K from 20 to 40 °C), computed with thermo 0.6.1 `VolumeLiquid` (its default
/// corresponding-states method for these compounds). Phenolic oils expand less than terpenes.
pub const OIL_THERMAL_EXPANSION_PER_K: f64 = 7.2e-4;

/// Reference temperature of the oil densities in the tables and the scenario, °C.
pub const OIL_DENSITY_REFERENCE_C: f64 = 20.0;

/// Density of an oil at a temperature from its density at 20 °C: ρ(T) = ρ₂₀ / (1 + β (T − 20)).
///
/// Linear volume expansion with [`OIL_THERMAL_EXPANSION_PER_K`]; valid from about 0 to 100 °C,
/// well below the oil's critical point. Source: definition of β; β as above.
///
/// ```
/// use stillroom_core::oil::oil_density_at_kg_per_m3;
/// // A clove-like oil of 1000 kg/m³ at 20 °C is about 986 kg/m³ at 40 °C, lighter than
/// // water there (992.2 kg/m³).
/// let rho = oil_density_at_kg_per_m3(1000.0, 40.0);
/// assert!((rho - 985.8).abs() < 0.1);
/// ```
pub fn oil_density_at_kg_per_m3(density_20c_kg_per_m3: f64, temperature_c: f64) -> f64 {
    density_20c_kg_per_m3 / (1.0 + OIL_THERMAL_EXPANSION_PER_K * (temperature_c - OIL_DENSITY_REFERENCE_C))
}
