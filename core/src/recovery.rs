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

/// Share of the equilibrium oil load that steam leaving a packed charge actually carries:
/// typical 0.75, range 0.6-0.9. The steam leaves the bed before it is saturated with oil vapour.
/// Source: the vaporisation efficiency of steam distillation, quoted as 0.6-0.9 in
/// Coulson & Richardson's *Chemical Engineering* Vol. 2, steam distillation (from memory).
pub const VAPORISATION_EFFICIENCY: (f64, f64, f64) = (0.6, 0.75, 0.9);

/// Exponent n in k = k_ref (q / q_ref)^n: how the release constant follows the specific steam
/// rate q (kg steam per kg charge per hour). n = 1 is Denny's result for oils on the leaf
/// surface (extraction time proportional to charge height over steam speed; Denny, *Perfumer &
/// Flavorist*, "Parameter test distillations for the superficial essential oils", abstract);
/// n = 0 is release limited by diffusion inside the tissue (Cassel et al., *Ind. Crops Prod.*
/// 29 (2009) 171-176). The middle, 0.5, is the default and the two limits its range (judgement).
pub const KINETIC_STEAM_EXPONENT: (f64, f64, f64) = (0.0, 0.5, 1.0);

/// Release constant at a specific steam rate: k = k_ref (q / q_ref)^n.
///
/// `k_ref` is the crop's constant observed at its usual rate `q_ref`. Valid for q, q_ref > 0,
/// 0 ≤ n ≤ 1; sources as for [`KINETIC_STEAM_EXPONENT`].
///
/// ```
/// use stillroom_core::recovery::scaled_rate_constant_per_s;
/// // Half the usual steam with n = 0.5: k falls by √2.
/// let k = scaled_rate_constant_per_s(0.05, 0.15, 0.3, 0.5);
/// assert!((k - 0.05 / 2f64.sqrt()).abs() < 1e-12);
/// ```
pub fn scaled_rate_constant_per_s(k_ref_per_s: f64, q: f64, q_ref: f64, exponent: f64) -> f64 {
    k_ref_per_s * (q / q_ref).powf(exponent)
}

/// How a run carries the oil over, stepped in time.
#[derive(Debug, Clone, PartialEq)]
pub struct CarryOver {
    /// From the first drop to the target share, s; None if the target is not reached in the
    /// time allowed.
    pub time_to_target_s: Option<f64>,
    /// Whether the steam's carrying power, not the plant's release, was binding at the end.
    pub steam_limited: bool,
    /// (time since the first drop, share of the charge's oil carried over), evenly in time.
    pub curve: Vec<(f64, f64)>,
}

/// Oil released by the plant and carried by the steam, in one model: the plant releases its oil
/// first-order into a free film, dP/dt = −k P; the steam carries the film at no more than its
/// saturation load times the vaporisation efficiency, dC/dt ≤ η ṁ / s(C), where s(C) is the
/// least steam per kg of oil at the oil's current make-up (Dalton + Raoult, cut by cut); what
/// the steam cannot carry waits on the plant.
///
/// `least_steam` gives s(C) in kg steam per kg of the charge's oil carried, for the share C
/// already carried over. The model follows the structure of Cerpa, Mato & Cocero, *AIChE J* 54
/// (2008) 909-917 (first-order exudation from the glands, then transport limited by the
/// vapour-liquid equilibrium), with a vaporisation efficiency in place of their film mass
/// transfer. Valid for k > 0, a steady steam rate, and a target below 1. The step is a fiftieth
/// of the release time constant and at most a thousandth of `max_s`.
///
/// ```
/// use stillroom_core::recovery::carry_over;
/// // Plenty of steam: the first-order law, 95 % at 3.0/k.
/// let k = 0.05 / 60.0;
/// let run = carry_over(k, 1.0, 1.0, |_| 1.0, 0.95, 1.0e6);
/// let t = run.time_to_target_s.unwrap();
/// assert!((t * k - 2.9957).abs() < 0.01 && !run.steam_limited);
/// // Steam for only 0.1 % of the oil per second: steam-limited, about 950 s.
/// let run = carry_over(k * 100.0, 0.001, 1.0, |_| 1.0, 0.95, 1.0e6);
/// assert!(run.steam_limited && (run.time_to_target_s.unwrap() - 950.0).abs() < 5.0);
/// ```
pub fn carry_over(
    rate_constant_per_s: f64,
    steam_per_kg_oil_per_s: f64,
    efficiency: f64,
    least_steam: impl Fn(f64) -> f64,
    target: f64,
    max_s: f64,
) -> CarryOver {
    let dt = (1.0 / (50.0 * rate_constant_per_s)).min(max_s / 1000.0);
    let keep = (-rate_constant_per_s * dt).exp();
    let (mut t, mut in_plant, mut film, mut carried) = (0.0, 1.0, 0.0, 0.0);
    let mut samples = vec![(0.0, 0.0)];
    let mut steam_limited = false;
    let mut reached = None;
    while t < max_s {
        let released = in_plant * (1.0 - keep);
        in_plant -= released;
        film += released;
        // Least steam read at the middle of the step's oil, as it rises while the oil depletes.
        let first_guess = film.min(efficiency * steam_per_kg_oil_per_s * dt / least_steam(carried).max(1e-12));
        let capacity =
            efficiency * steam_per_kg_oil_per_s * dt / least_steam(carried + 0.5 * first_guess).max(1e-12);
        let moved = film.min(capacity);
        steam_limited = capacity < film;
        film -= moved;
        carried += moved;
        t += dt;
        samples.push((t, carried));
        if carried >= target {
            let back = if moved > 0.0 { (carried - target) / moved * dt } else { 0.0 };
            reached = Some(t - back);
            break;
        }
        if in_plant < 1e-9 {
            // All released: the rest goes at the steam's pace alone, in steps of 0.1 % of the oil.
            reached = finish_at_steam_pace(&mut samples, film, carried, target, max_s, |c| {
                least_steam(c) / (efficiency * steam_per_kg_oil_per_s)
            });
            break;
        }
    }
    CarryOver { time_to_target_s: reached, steam_limited, curve: resample(&samples, 24) }
}

/// Carries the waiting film at the steam's pace, dt = dC · s(C) / (η ṁ) (midpoint, steps of
/// 0.1 % of the oil), recording samples.
fn finish_at_steam_pace(
    samples: &mut Vec<(f64, f64)>,
    film: f64,
    carried: f64,
    target: f64,
    max_s: f64,
    seconds_per_share: impl Fn(f64) -> f64,
) -> Option<f64> {
    let (mut t, mut c) = *samples.last()?;
    let end = (carried + film).min(target);
    while c < end && t < max_s {
        let step = 0.001f64.min(end - c);
        t += step * seconds_per_share(c + 0.5 * step);
        c += step;
        samples.push((t, c));
    }
    (c >= target - 1e-12 && t < max_s).then_some(t)
}

/// Evenly spaced points of a sampled curve, by linear interpolation.
fn resample(samples: &[(f64, f64)], points: usize) -> Vec<(f64, f64)> {
    let end = samples.last().map_or(0.0, |s| s.0);
    let mut j = 0;
    (0..=points)
        .map(|i| {
            let t = end * i as f64 / points as f64;
            while j + 1 < samples.len() && samples[j + 1].0 < t {
                j += 1;
            }
            let (a, b) = (samples[j], samples[(j + 1).min(samples.len() - 1)]);
            let w = if b.0 > a.0 { ((t - a.0) / (b.0 - a.0)).clamp(0.0, 1.0) } else { 1.0 };
            (t, a.1 + w * (b.1 - a.1))
        })
        .collect()
}
