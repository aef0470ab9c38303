//! How fast oil leaves the plant: the first-order recovery law.
//!
//! Real stills use far more steam than the equilibrium minimum, because the oil must first
//! leave the glands and diffuse out of the tissue. For steam distillation the pseudo-first-order
//! law Y(t) = Y∞ (1 - e^(-k t)) fits published runs best (Milojević et al., Hem. Ind. 67 (2013)
//! 843-859), with t counted from the first drop of distillate.

/// Share of the recoverable oil carried over after time t: 1 - e^(-k t).
///
/// Source: Milojević et al. (2013), pseudo-first-order model. Valid for k > 0, t ≥ 0.
///
/// ```
/// use stillroom_core::recovery::recovered_fraction;
/// // After one time constant (k t = 1): 63.2 %.
/// assert!((recovered_fraction(0.05 / 60.0, 20.0 * 60.0) - 0.632_12).abs() < 1e-5);
/// ```
pub fn recovered_fraction(rate_constant_per_s: f64, time_s: f64) -> f64 {
    1.0 - (-rate_constant_per_s * time_s.max(0.0)).exp()
}

/// Time from the first drop to a target share f of the recoverable oil: t = -ln(1 - f) / k.
///
/// Source: inverse of the first-order law. Valid for k > 0 and 0 ≤ f < 1.
///
/// ```
/// use stillroom_core::recovery::time_to_fraction_s;
/// // 95 % with k = 0.05 /min takes 3.0/0.05 = 59.9 min.
/// let t = time_to_fraction_s(0.05 / 60.0, 0.95);
/// assert!((t / 60.0 - 59.915).abs() < 1e-3);
/// ```
pub fn time_to_fraction_s(rate_constant_per_s: f64, fraction: f64) -> f64 {
    -(1.0 - fraction).ln() / rate_constant_per_s
}

/// The rate constant that gives a share f after a time t: k = -ln(1 - f) / t.
///
/// Used to turn a crop's typical run time into a rate constant. Valid for t > 0, 0 ≤ f < 1.
///
/// ```
/// use stillroom_core::recovery::rate_constant_for_per_s;
/// let k = rate_constant_for_per_s(0.95, 3600.0);
/// assert!((k * 3600.0 - 2.9957).abs() < 1e-4);
/// ```
pub fn rate_constant_for_per_s(fraction: f64, time_s: f64) -> f64 {
    -(1.0 - fraction).ln() / time_s
}
