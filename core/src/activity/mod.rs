//! Activity coefficients inside the oil: the original UNIFAC group-contribution method.
//!
//! Raoult's law p_i = x_i p_i*(T) treats the oil as an ideal solution (see [`crate::oil`]).
//! A real oil of alcohols, esters, ketones and hydrocarbons deviates from it; the modified
//! Raoult's law p_i = γ_i x_i p_i*(T) carries that through an activity coefficient γ_i, which
//! UNIFAC estimates from the groups the molecules are made of. Using it is optional: the ideal
//! oil stays the reference.
//!
//! Method: Fredenslund, Jones & Prausnitz, "Group-contribution estimation of activity
//! coefficients in nonideal liquid mixtures", AIChE J. 21 (1975) 1086-1099, with the group
//! parameters of Hansen et al., Ind. Eng. Chem. Res. 30 (1991) 2352 (tables in [`groups`]).
//!
//! ln γ_i = ln γ_i^C + ln γ_i^R, with
//!
//! - combinatorial part (Staverman-Guggenheim, coordination number z = 10):
//!   ln γ_i^C = 1 − V_i + ln V_i − 5 q_i (1 − V_i/F_i + ln(V_i/F_i)),
//!   V_i = r_i / Σ_j x_j r_j, F_i = q_i / Σ_j x_j q_j, r_i = Σ_k ν_ki R_k, q_i = Σ_k ν_ki Q_k;
//! - residual part: ln γ_i^R = Σ_k ν_ki (ln Γ_k − ln Γ_k^(i)), with
//!   ln Γ_k = Q_k [1 − ln(Σ_m Θ_m Ψ_mk) − Σ_m Θ_m Ψ_km / Σ_n Θ_n Ψ_nm],
//!   Θ_m = Q_m X_m / Σ_n Q_n X_n, X_m the group mole fraction, Ψ_mn = exp(−a_mn / T) between
//!   the main groups of m and n, and Γ_k^(i) the same in pure compound i.
//!
//! Validity: liquid mixtures of non-electrolytes, well below their critical points, about
//! 275-425 K, the span of the vapour-liquid equilibria the parameters were fitted to (range
//! from memory). Expect γ within some 10-20 % of measurement, worse at infinite dilution
//! (common practice, no source; the handbook example in the tests, acetone in n-pentane, gives
//! 4.99 against 4.41 measured). Compounds are described by their groups alone: isomers with
//! the same groups (thymol and carvacrol) get the same γ.

pub mod groups;

use groups::{A_MN_K, COMPOUND_GROUPS, CompoundGroups, SUBGROUPS, Sub};

/// Lower end of the temperature range UNIFAC's parameters were fitted over, K.
pub const VALID_T_MIN_K: f64 = 275.0;
/// Upper end of that range, K.
pub const VALID_T_MAX_K: f64 = 425.0;

/// Temperatures outside this span are refused outright, K: far from any fitted data, and at
/// the low end Ψ = exp(−a/T) underflows.
const HARD_T_MIN_K: f64 = 200.0;
const HARD_T_MAX_K: f64 = 600.0;

/// Why activity coefficients could not be computed.
#[derive(Debug, Clone, PartialEq)]
pub enum ActivityError {
    /// No compound given.
    Empty,
    /// The compound has no UNIFAC group assignment (a user's own compound, or a new one).
    NoGroups { id: String },
    /// The number of mole fractions differs from the number of compounds.
    LengthMismatch { compounds: usize, fractions: usize },
    /// A mole fraction (or amount) is negative or not a finite number.
    InvalidFraction { index: usize, value: f64 },
    /// The amounts add up to zero.
    ZeroTotal,
    /// A compound's groups have no surface area (no groups, or only quaternary carbons).
    NoSurface { index: usize },
    /// The temperature is not a finite number within 200-600 K.
    TemperatureOutOfRange { t_k: f64 },
}

impl std::fmt::Display for ActivityError {
    fn fmt(&self, f: &mut std::fmt::Formatter<'_>) -> std::fmt::Result {
        match self {
            ActivityError::Empty => write!(f, "the oil has no compounds"),
            ActivityError::NoGroups { id } => {
                write!(
                    f,
                    "no UNIFAC groups are known for compound '{id}'; the oil can only be taken as ideal"
                )
            }
            ActivityError::LengthMismatch { compounds, fractions } => {
                write!(f, "{fractions} mole fractions given for {compounds} compounds")
            }
            ActivityError::InvalidFraction { index, value } => {
                write!(f, "mole fraction {index} is {value}: it must be a finite number, zero or more")
            }
            ActivityError::NoSurface { index } => {
                write!(f, "compound {index} has no UNIFAC groups with a surface area")
            }
            ActivityError::ZeroTotal => write!(f, "the mole fractions add up to zero"),
            ActivityError::TemperatureOutOfRange { t_k } => {
                write!(f, "temperature {t_k} K is outside {HARD_T_MIN_K}-{HARD_T_MAX_K} K")
            }
        }
    }
}

impl std::error::Error for ActivityError {}

/// The UNIFAC groups of one library compound, by its id.
///
/// ```
/// let g = stillroom_core::activity::groups_of("linalool").unwrap();
/// assert!(g.exact && g.groups.len() == 6);
/// ```
pub fn groups_of(id: &str) -> Option<&'static CompoundGroups> {
    COMPOUND_GROUPS.iter().find(|c| c.id == id)
}

/// Whether T lies inside the range UNIFAC's parameters were fitted over (275-425 K).
pub fn in_validity_range(t_k: f64) -> bool {
    (VALID_T_MIN_K..=VALID_T_MAX_K).contains(&t_k)
}

/// An oil's compounds resolved into UNIFAC groups once, so that γ can be evaluated many times
/// (every step of a run) without looking anything up again.
#[derive(Debug, Clone, PartialEq)]
pub struct OilGroups {
    /// Number of compounds.
    compounds: usize,
    /// Number of distinct subgroups present in the oil.
    subgroups: usize,
    /// ν_ki, compound-major: `nu[i * subgroups + k]`.
    nu: Vec<f64>,
    /// Q_k of each present subgroup.
    q_k: Vec<f64>,
    /// Index of each present subgroup's main group among the main groups present.
    main_of: Vec<usize>,
    /// Number of distinct main groups present.
    mains: usize,
    /// a_mn between the main groups present: `a[m * mains + n]`, K.
    a: Vec<f64>,
    /// The subgroups each compound holds (indices among those present), for its pure state.
    members: Vec<Vec<usize>>,
    /// r_i and q_i of each compound.
    r_i: Vec<f64>,
    q_i: Vec<f64>,
}

impl OilGroups {
    /// Resolves library compound ids into groups, in the order given.
    ///
    /// ```
    /// use stillroom_core::activity::OilGroups;
    /// assert!(OilGroups::new(&["linalool", "linalyl-acetate"]).is_ok());
    /// assert!(OilGroups::new(&["my-own-compound"]).is_err());
    /// ```
    pub fn new<S: AsRef<str>>(ids: &[S]) -> Result<OilGroups, ActivityError> {
        let rows = ids
            .iter()
            .map(|id| {
                groups_of(id.as_ref())
                    .map(|row| row.groups)
                    .ok_or_else(|| ActivityError::NoGroups { id: id.as_ref().into() })
            })
            .collect::<Result<Vec<_>, _>>()?;
        OilGroups::from_groups(&rows)
    }

    /// Builds the structure from each compound's subgroups and counts directly (for a molecule
    /// outside the library, e.g. a handbook example).
    ///
    /// ```
    /// use stillroom_core::activity::{OilGroups, groups::Sub};
    /// // n-hexane: 2 CH3 + 4 CH2.
    /// let hexane: &[(Sub, u8)] = &[(Sub::Ch3, 2), (Sub::Ch2, 4)];
    /// assert!(OilGroups::from_groups(&[hexane]).is_ok());
    /// assert!(OilGroups::from_groups(&[&[(Sub::C, 1)]]).is_err()); // no surface area
    /// ```
    pub fn from_groups(compounds: &[&[(Sub, u8)]]) -> Result<OilGroups, ActivityError> {
        if compounds.is_empty() {
            return Err(ActivityError::Empty);
        }
        // Distinct subgroups present, as indices into SUBGROUPS, in first-seen order.
        let mut present: Vec<usize> = Vec::new();
        for &(sub, _) in compounds.iter().flat_map(|c| c.iter()) {
            if !present.contains(&(sub as usize)) {
                present.push(sub as usize);
            }
        }
        let g = present.len();
        let mut nu = vec![0.0; compounds.len() * g];
        for (i, groups) in compounds.iter().enumerate() {
            for &(sub, count) in groups.iter() {
                let k = present.iter().position(|&p| p == sub as usize).unwrap_or(0);
                nu[i * g + k] += f64::from(count);
            }
        }
        let q_k: Vec<f64> = present.iter().map(|&p| SUBGROUPS[p].q).collect();
        let r_k: Vec<f64> = present.iter().map(|&p| SUBGROUPS[p].r).collect();
        // Ψ depends only on the main groups: keep one a_mn per pair of them, so that each
        // evaluation takes the fewest exponentials.
        let mut main_ids: Vec<usize> = Vec::new();
        let mut main_of = Vec::with_capacity(g);
        for &p in &present {
            let id = SUBGROUPS[p].main as usize;
            let local = main_ids.iter().position(|&m| m == id).unwrap_or_else(|| {
                main_ids.push(id);
                main_ids.len() - 1
            });
            main_of.push(local);
        }
        let mains = main_ids.len();
        let a = main_ids.iter().flat_map(|&m| main_ids.iter().map(move |&n| A_MN_K[m][n])).collect();
        let members =
            (0..compounds.len()).map(|i| (0..g).filter(|&k| nu[i * g + k] > 0.0).collect()).collect();
        let weighted = |i: usize, per_group: &[f64]| -> f64 {
            nu[i * g..(i + 1) * g].iter().zip(per_group).map(|(n, v)| n * v).sum()
        };
        let r_i: Vec<f64> = (0..compounds.len()).map(|i| weighted(i, &r_k)).collect();
        let q_i: Vec<f64> = (0..compounds.len()).map(|i| weighted(i, &q_k)).collect();
        // A molecule without surface area would divide by zero in F_i and Θ_m.
        if let Some(index) = q_i.iter().position(|q| *q <= 0.0) {
            return Err(ActivityError::NoSurface { index });
        }
        Ok(OilGroups {
            compounds: compounds.len(),
            subgroups: g,
            nu,
            q_k,
            main_of,
            mains,
            a,
            members,
            r_i,
            q_i,
        })
    }

    /// Number of compounds.
    pub fn len(&self) -> usize {
        self.compounds
    }

    /// Always false: an `OilGroups` holds at least one compound.
    pub fn is_empty(&self) -> bool {
        self.compounds == 0
    }

    /// Natural logarithms of the activity coefficients, ln γ_i, at amounts `x` (mole fractions,
    /// or moles on any scale: they are normalised) and temperature T in K.
    ///
    /// Equations, validity and source: see the [module documentation](self). A compound at
    /// x_i = 0 gets its infinite-dilution value; nothing takes the logarithm of x.
    ///
    /// ```
    /// use stillroom_core::activity::OilGroups;
    /// let oil = OilGroups::new(&["d-limonene"]).unwrap();
    /// // A pure compound is its own ideal solution: ln γ = 0.
    /// assert!(oil.ln_gamma(&[1.0], 373.15).unwrap()[0].abs() < 1e-12);
    /// ```
    pub fn ln_gamma(&self, x: &[f64], t_k: f64) -> Result<Vec<f64>, ActivityError> {
        let x = self.normalised(x)?;
        if !(HARD_T_MIN_K..=HARD_T_MAX_K).contains(&t_k) {
            return Err(ActivityError::TemperatureOutOfRange { t_k });
        }
        let g = self.subgroups;
        let psi_main: Vec<f64> = self.a.iter().map(|a| (-a / t_k).exp()).collect();
        let mut psi = Vec::with_capacity(g * g);
        for &mk in &self.main_of {
            let row = &psi_main[mk * self.mains..(mk + 1) * self.mains];
            psi.extend(self.main_of.iter().map(|&mm| row[mm]));
        }
        let all: Vec<usize> = (0..g).collect();

        // Residual part: group activity in the mixture, then in each pure compound.
        let mut group_x = vec![0.0; g];
        for (i, xi) in x.iter().enumerate() {
            for (gx, n) in group_x.iter_mut().zip(&self.nu[i * g..(i + 1) * g]) {
                *gx += xi * n;
            }
        }
        let mut scratch = vec![0.0; 2 * g];
        let mut ln_big_gamma = vec![0.0; g];
        self.ln_group_gamma(&group_x, &all, &psi, &mut scratch, &mut ln_big_gamma);
        let mut ln_pure = vec![0.0; g];

        let sum_xr: f64 = x.iter().zip(&self.r_i).map(|(x, r)| x * r).sum();
        let sum_xq: f64 = x.iter().zip(&self.q_i).map(|(x, q)| x * q).sum();
        let mut out = Vec::with_capacity(self.compounds);
        for i in 0..self.compounds {
            let nu_i = &self.nu[i * g..(i + 1) * g];
            let members = &self.members[i];
            self.ln_group_gamma(nu_i, members, &psi, &mut scratch, &mut ln_pure);
            let residual: f64 = members.iter().map(|&k| nu_i[k] * (ln_big_gamma[k] - ln_pure[k])).sum();
            let v = self.r_i[i] / sum_xr;
            let f = self.q_i[i] / sum_xq;
            let combinatorial = 1.0 - v + v.ln() - 5.0 * self.q_i[i] * (1.0 - v / f + (v / f).ln());
            out.push(combinatorial + residual);
        }
        Ok(out)
    }

    /// Activity coefficients γ_i = exp(ln γ_i); see [`OilGroups::ln_gamma`].
    ///
    /// ```
    /// use stillroom_core::activity::OilGroups;
    /// let oil = OilGroups::new(&["linalool", "d-limonene"]).unwrap();
    /// let g = oil.gamma(&[0.5, 0.5], 373.15).unwrap();
    /// // An alcohol among hydrocarbons: both deviate upwards from Raoult's law.
    /// assert!(g[0] > 1.0 && g[1] > 1.0);
    /// ```
    pub fn gamma(&self, x: &[f64], t_k: f64) -> Result<Vec<f64>, ActivityError> {
        let mut ln = self.ln_gamma(x, t_k)?;
        for v in &mut ln {
            *v = v.exp();
        }
        Ok(ln)
    }

    /// Mole fractions from amounts, after checking them.
    fn normalised(&self, x: &[f64]) -> Result<Vec<f64>, ActivityError> {
        if x.len() != self.compounds {
            return Err(ActivityError::LengthMismatch { compounds: self.compounds, fractions: x.len() });
        }
        if let Some((index, &value)) = x.iter().enumerate().find(|(_, v)| !(v.is_finite() && **v >= 0.0)) {
            return Err(ActivityError::InvalidFraction { index, value });
        }
        let total: f64 = x.iter().sum();
        if total <= 0.0 {
            return Err(ActivityError::ZeroTotal);
        }
        Ok(x.iter().map(|v| v / total).collect())
    }

    /// ln Γ_k for group amounts `counts` (any scale) over the subgroups `idx` (the others
    /// being absent), into `out[k]` for k in `idx`. `scratch` holds 2g values.
    fn ln_group_gamma(
        &self,
        counts: &[f64],
        idx: &[usize],
        psi: &[f64],
        scratch: &mut [f64],
        out: &mut [f64],
    ) {
        let g = self.subgroups;
        let (theta, w) = scratch.split_at_mut(g);
        // Θ_m = Q_m X_m / Σ Q_n X_n (the normalisation of X cancels).
        let area: f64 = idx.iter().map(|&m| counts[m] * self.q_k[m]).sum();
        for &m in idx {
            theta[m] = counts[m] * self.q_k[m] / area;
        }
        // s_k = Σ_m Θ_m Ψ_mk; ln Γ_k needs ln s_k and Σ_m Ψ_km Θ_m / s_m (w_m = Θ_m / s_m).
        for &k in idx {
            let s_k: f64 = idx.iter().map(|&m| theta[m] * psi[m * g + k]).sum();
            out[k] = s_k.ln();
            w[k] = theta[k] / s_k;
        }
        for &k in idx {
            let tail: f64 = idx.iter().map(|&m| w[m] * psi[k * g + m]).sum();
            out[k] = self.q_k[k] * (1.0 - out[k] - tail);
        }
    }
}

/// Activity coefficients γ_i of library compounds in a liquid oil, by original UNIFAC.
///
/// γ_i multiplies x_i in Raoult's law: p_i = γ_i x_i p_i*(T). Equations (combinatorial and
/// residual parts), validity (liquid, about 275-425 K) and source (Fredenslund, Jones &
/// Prausnitz 1975; parameters of Hansen et al. 1991): see the [module documentation](self).
/// `mole_fractions` may be amounts on any scale (they are normalised). For many evaluations of
/// one oil, build an [`OilGroups`] once and call [`OilGroups::gamma`].
///
/// ```
/// use stillroom_core::activity::activity_coefficients;
/// // A lavender-like oil at 100 °C: linalool, linalyl acetate, camphor.
/// let g = activity_coefficients(&["linalool", "linalyl-acetate", "camphor"], &[0.45, 0.45, 0.1], 373.15)
///     .unwrap();
/// assert!(g.iter().all(|g| *g > 0.8 && *g < 1.6));
/// // Unknown compounds and bad fractions are errors, not panics.
/// assert!(activity_coefficients(&["linalool"], &[f64::NAN], 373.15).is_err());
/// ```
pub fn activity_coefficients(
    ids: &[&str],
    mole_fractions: &[f64],
    t_k: f64,
) -> Result<Vec<f64>, ActivityError> {
    OilGroups::new(ids)?.gamma(mole_fractions, t_k)
}

#[cfg(test)]
mod tests {
    use super::*;

    const LAVENDER: [&str; 4] = ["linalool", "linalyl-acetate", "1-8-cineole", "camphor"];

    /// Gibbs-Duhem at constant T and P: Σ_i x_i d(ln γ_i) = 0 along any change of composition.
    /// An identity of thermodynamics, not of UNIFAC's terms, so it catches a mistyped equation.
    #[test]
    fn obeys_gibbs_duhem() {
        let oil = OilGroups::new(&["menthol", "menthone", "d-limonene", "eugenol"]).unwrap();
        let x = [0.4, 0.3, 0.2, 0.1];
        let dir = [0.1, -0.3, 0.05, 0.15]; // sums to zero: stays on the simplex
        let h = 1e-6;
        let shifted = |s: f64| -> Vec<f64> { x.iter().zip(&dir).map(|(x, d)| x + s * d).collect() };
        let up = oil.ln_gamma(&shifted(h), 360.0).unwrap();
        let down = oil.ln_gamma(&shifted(-h), 360.0).unwrap();
        let sum: f64 = x.iter().zip(up.iter().zip(&down)).map(|(x, (u, d))| x * (u - d) / (2.0 * h)).sum();
        let scale: f64 = up.iter().zip(&down).map(|(u, d)| ((u - d) / (2.0 * h)).abs()).sum();
        assert!(scale > 1e-3, "the direction must change ln γ for the check to mean anything");
        assert!(sum.abs() < 1e-6 * scale, "Σ x dlnγ = {sum}, scale {scale}");
    }

    #[test]
    fn amounts_on_any_scale_give_the_same_answer() {
        let oil = OilGroups::new(&LAVENDER).unwrap();
        let a = oil.gamma(&[0.4, 0.4, 0.1, 0.1], 370.0).unwrap();
        let b = oil.gamma(&[4.0, 4.0, 1.0, 1.0], 370.0).unwrap();
        for (a, b) in a.iter().zip(&b) {
            assert!((a - b).abs() < 1e-12 * a);
        }
    }

    #[test]
    fn an_absent_compound_gets_a_finite_infinite_dilution_value() {
        let g = activity_coefficients(&LAVENDER, &[0.5, 0.5, 0.0, 0.0], 373.15).unwrap();
        assert!(g.iter().all(|g| g.is_finite() && *g > 0.0), "{g:?}");
    }

    #[test]
    fn bad_input_is_an_error() {
        use ActivityError::*;
        let none: [&str; 0] = [];
        assert_eq!(OilGroups::new(&none), Err(Empty));
        assert_eq!(OilGroups::new(&["linalool", "nope"]), Err(NoGroups { id: "nope".into() }));
        assert_eq!(OilGroups::from_groups(&[&[(groups::Sub::Oh, 1)], &[]]), Err(NoSurface { index: 1 }));
        let oil = OilGroups::new(&["linalool", "camphor"]).unwrap();
        assert_eq!(oil.gamma(&[1.0], 373.15), Err(LengthMismatch { compounds: 2, fractions: 1 }));
        assert!(matches!(oil.gamma(&[0.5, f64::NAN], 373.15), Err(InvalidFraction { index: 1, .. })));
        assert!(matches!(oil.gamma(&[-0.1, 1.1], 373.15), Err(InvalidFraction { index: 0, .. })));
        assert!(matches!(oil.gamma(&[0.5, f64::INFINITY], 373.15), Err(InvalidFraction { index: 1, .. })));
        assert_eq!(oil.gamma(&[0.0, 0.0], 373.15), Err(ZeroTotal));
        for t in [f64::NAN, 0.0, -5.0, 150.0, 700.0, f64::INFINITY] {
            assert!(matches!(oil.gamma(&[0.5, 0.5], t), Err(TemperatureOutOfRange { .. })), "{t}");
        }
        assert!(!ActivityError::NoGroups { id: "nope".into() }.to_string().is_empty());
    }

    #[test]
    fn validity_range_is_reported() {
        assert!(in_validity_range(373.15));
        assert!(!in_validity_range(450.0));
    }
}
