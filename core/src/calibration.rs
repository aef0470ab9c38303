//! Learning from the grower's own runs: the oil content and the release constant that logged
//! batch records imply, to plan the next run.
//!
//! The model is the plan's pseudo-first-order release (Milojević et al., Hem. Ind. 67 (2013)
//! 843-859): the oil collected per kg of charge after a time t is y = C (1 - e^(-k t)). A run's
//! constant follows its specific steam rate q, k = k_ref (q/q_ref)^n (`recovery`), so every time
//! here is first turned into an *effective time* τ = t (q/q_ref)^n at the crop's reference rate
//! q_ref, and the constant fitted is k_ref, the one a scenario's `run.rate_constant_per_min`
//! holds.

use crate::numeric;
use crate::recovery::{self, KINETIC_STEAM_EXPONENT};
use serde::{Deserialize, Serialize};

/// Oil collected at an earlier time of the same run.
#[derive(Debug, Clone, PartialEq, Default, Serialize, Deserialize)]
#[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
#[serde(default, deny_unknown_fields)]
pub struct EarlierReading {
    /// Time after the first drop, s.
    pub time_s: f64,
    /// Oil collected by then, m³.
    pub oil_volume_m3: f64,
}

/// One finished run, as the grower logs it: a batch record.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
#[serde(default, deny_unknown_fields)]
pub struct RunRecord {
    /// The grower's lot number, unique within one log.
    pub lot: String,
    /// When, as the grower writes it (e.g. "2026-07-14").
    pub date: String,
    /// Crop preset id; `None` for no preset.
    pub crop: Option<String>,
    /// Plant part distilled, the grower's words ("flowering tops").
    pub plant_part: String,
    /// Charge actually loaded, kg (weighed by the grower, not the plan's figure).
    pub plant_mass_kg: f64,
    /// Time distilled after the first drop, s.
    pub distilling_time_s: f64,
    /// Fuel used, in [`RunRecord::fuel_unit`].
    pub fuel_used: Option<f64>,
    /// The unit of `fuel_used`, as the plan shows the fuel ("kg", "m³", "kWh").
    pub fuel_unit: String,
    /// Oil collected, m³.
    pub oil_volume_m3: f64,
    /// Hydrosol kept, m³.
    pub hydrosol_volume_m3: Option<f64>,
    pub note: String,
    /// Oil collected earlier in the same run (gives the release constant from one run).
    pub earlier: Option<EarlierReading>,
    /// Oil density used to weigh the oil, kg/m³ (the plan's at the time of logging).
    pub oil_density_kg_per_m3: f64,
    /// Release constant the plan used for this run, per minute (at the run's steam rate).
    pub rate_constant_per_min: f64,
    /// The run's specific steam rate q, kg steam per kg charge per hour (the plan's steam over
    /// the charge logged).
    pub specific_steam_rate_kg_per_h_per_kg: Option<f64>,
    /// The crop's reference specific steam rate q_ref at which its constant is quoted.
    pub reference_steam_rate_kg_per_h_per_kg: Option<f64>,
}

impl Default for RunRecord {
    fn default() -> Self {
        RunRecord {
            lot: String::new(),
            date: String::new(),
            crop: None,
            plant_part: String::new(),
            plant_mass_kg: 0.0,
            distilling_time_s: 0.0,
            fuel_used: None,
            fuel_unit: String::new(),
            oil_volume_m3: 0.0,
            hydrosol_volume_m3: None,
            note: String::new(),
            earlier: None,
            oil_density_kg_per_m3: 900.0,
            rate_constant_per_min: 0.05,
            specific_steam_rate_kg_per_h_per_kg: None,
            reference_steam_rate_kg_per_h_per_kg: None,
        }
    }
}

/// What the plan knew when a run was logged, as a [`RunRecord`] keeps it.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct LoggedConditions {
    pub oil_density_kg_per_m3: f64,
    pub rate_constant_per_min: f64,
    pub specific_steam_rate_kg_per_h_per_kg: Option<f64>,
    pub reference_steam_rate_kg_per_h_per_kg: Option<f64>,
}

/// The plan's conditions for a run of `plant_mass_kg` (the charge the grower weighed, which may
/// differ from the plan's): the plan's steam over that charge gives q, and the constant at q is
/// k = k_ref (q/q_ref)^n ([`recovery::scaled_rate_constant_per_s`]). `None` for a charge ≤ 0.
///
/// ```
/// use stillroom_core::{calibration::logged_conditions, plan, Scenario};
/// let s = Scenario::default();
/// let p = plan(&s).unwrap();
/// let c = logged_conditions(&s, &p, s.charge.plant_mass_kg).unwrap();
/// assert!((c.rate_constant_per_min - p.run.rate_constant_per_min).abs() < 1e-9);
/// ```
pub fn logged_conditions(
    scenario: &crate::Scenario,
    plan: &crate::Plan,
    plant_mass_kg: f64,
) -> Option<LoggedConditions> {
    if !plant_mass_kg.is_finite() || plant_mass_kg <= 0.0 {
        return None;
    }
    let q = plan.run.distillate_steam_rate_kg_per_s * 3600.0 / plant_mass_kg;
    let q_ref = scenario
        .charge
        .crop
        .as_deref()
        .and_then(|id| crate::crops::CROPS.iter().find(|c| c.id == id))
        .map(|c| c.steam_rate_kg_per_h_per_kg);
    let k_ref = plan.run.reference_rate_constant_per_min;
    let k = match q_ref {
        Some(q_ref) => recovery::scaled_rate_constant_per_s(k_ref, q, q_ref, KINETIC_STEAM_EXPONENT.1),
        None => k_ref,
    };
    Some(LoggedConditions {
        oil_density_kg_per_m3: plan.oil.density_kg_per_m3,
        rate_constant_per_min: k,
        specific_steam_rate_kg_per_h_per_kg: q.is_finite().then_some(q),
        reference_steam_rate_kg_per_h_per_kg: q_ref.or(Some(q)).filter(|q| q.is_finite()),
    })
}

/// Which measure a calibration's spreads are.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Default, Serialize, Deserialize)]
#[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
#[serde(rename_all = "snake_case")]
pub enum SpreadMeasure {
    /// The least-squares standard error (1σ) of the fitted value, s² (JᵀJ)⁻¹ with the residual
    /// variance s² = S/(N - 2) (the covariance `scipy.optimize.curve_fit` reports).
    #[default]
    StandardError,
    /// The sample standard deviation (1σ, N - 1) of the values the single runs imply.
    RunToRun,
}

/// What the logged runs of one crop say; also kept on a scenario planned with these values.
#[derive(Debug, Clone, PartialEq, Default, Serialize, Deserialize)]
#[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
#[serde(default, deny_unknown_fields)]
pub struct Calibration {
    /// Oil content the runs imply, % w/w of the charge as loaded.
    pub oil_content_percent: f64,
    /// Runs the oil content rests on.
    pub oil_content_runs: usize,
    /// 1σ of the oil content, % (see `spread`); `None` when the runs cannot tell.
    pub oil_content_spread_percent: Option<f64>,
    /// Release constant at the crop's reference steam rate, per minute: fitted, or the plan's.
    pub rate_constant_per_min: f64,
    /// Runs the constant rests on; 0 when it is the plan's own (the runs could not fix it).
    pub rate_constant_runs: usize,
    /// 1σ of the constant, per minute; `None` when the runs cannot tell.
    pub rate_constant_spread_per_min: Option<f64>,
    /// Which measure the two spreads are.
    pub spread: SpreadMeasure,
}

/// Oil content of a charge implied by one run and the plan's constant, % w/w:
/// w = m_oil / (m_plant (1 - e^(-k t))), undoing the first-order law for the oil still in the
/// plant when the run stopped.
///
/// Source: inverse of the pseudo-first-order recovery law (Milojević et al., Hem. Ind. 67 (2013)
/// 843-859). Valid for k t > 0 with at least 5 % out; the longer the run, the less the result
/// leans on k. `None` for nonsense (zero, negative, NaN) or a content over 100 %.
///
/// ```
/// use stillroom_core::calibration::{oil_content_percent_from_run, RunRecord};
/// // 20 kg of plant, 60 min after the first drop at k = 0.05/min (95 % out), 200 mL of oil at
/// // 0.885 g/mL: 177 g / 0.9502 / 20 kg = 0.931 %.
/// let run = RunRecord { plant_mass_kg: 20.0, distilling_time_s: 3600.0, oil_volume_m3: 200e-6,
///     oil_density_kg_per_m3: 885.0, rate_constant_per_min: 0.05, ..RunRecord::default() };
/// assert!((oil_content_percent_from_run(&run).unwrap() - 0.9314).abs() < 1e-3);
/// ```
pub fn oil_content_percent_from_run(run: &RunRecord) -> Option<f64> {
    let k = run.rate_constant_per_min / 60.0;
    let share = recovery::recovered_fraction(k, run.distilling_time_s);
    let valid = run.plant_mass_kg > 0.0
        && run.oil_volume_m3 > 0.0
        && run.oil_density_kg_per_m3 > 0.0
        && share > 0.05
        && share.is_finite();
    if !valid {
        return None;
    }
    let percent = 100.0 * run.oil_volume_m3 * run.oil_density_kg_per_m3 / (run.plant_mass_kg * share);
    (percent.is_finite() && percent <= 100.0).then_some(percent)
}

/// Release constant k from the oil collected at two times of one run, per second: the root of
/// V1/V2 = (1 - e^(-k t1)) / (1 - e^(-k t2)), found by bracketing ([`numeric::find_root`]) in
/// x = k t2 over [1e-6, 700].
///
/// The ratio rises from t1/t2 (k → 0) to 1 (k → ∞), so a root exists only for
/// t1/t2 < V1/V2 < 1; otherwise (or for zero, negative, NaN, equal times) `None`. Source: the
/// first-order law as above, solved for k.
///
/// ```
/// use stillroom_core::calibration::rate_constant_from_two_readings_per_s;
/// // Half the oil of 60 min after 15 min: (1 - e^(-15k))/(1 - e^(-60k)) = 0.5 at k ≈ 0.0504/min.
/// let k = rate_constant_from_two_readings_per_s(900.0, 0.5, 3600.0, 1.0).unwrap();
/// let ratio = (1.0 - (-k * 900.0f64).exp()) / (1.0 - (-k * 3600.0f64).exp());
/// assert!((ratio - 0.5).abs() < 1e-9);
/// assert!(rate_constant_from_two_readings_per_s(900.0, 0.2, 3600.0, 1.0).is_none());
/// ```
pub fn rate_constant_from_two_readings_per_s(t1_s: f64, v1: f64, t2_s: f64, v2: f64) -> Option<f64> {
    let all_finite = [t1_s, v1, t2_s, v2].iter().all(|v| v.is_finite());
    if !(all_finite && t1_s > 0.0 && t2_s > t1_s && v1 > 0.0 && v2 > v1) {
        return None;
    }
    let (a, r) = (t1_s / t2_s, v1 / v2);
    if r <= a * (1.0 + 1e-9) {
        return None;
    }
    let g = |x: f64| -(-x * a).exp_m1() / -(-x).exp_m1() - r;
    let x = numeric::find_root(g, 1e-6, 700.0, 1e-12).ok()?;
    let k = x / t2_s;
    (k.is_finite() && k > 0.0).then_some(k)
}

/// One point of the fit: effective time τ (s) and oil per kg of charge y (kg/kg).
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Point {
    pub tau_s: f64,
    pub oil_per_charge: f64,
}

/// The least-squares fit of y = C (1 - e^(-k τ)).
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Fit {
    /// C, kg oil per kg charge.
    pub content: f64,
    /// k, per second.
    pub rate_constant_per_s: f64,
    /// Standard errors of C and k, s² (JᵀJ)⁻¹ with s² = S/(N-2); `None` with two points.
    pub content_se: Option<f64>,
    pub rate_constant_se_per_s: Option<f64>,
}

/// The least-squares C and k of y = C (1 - e^(-k τ)) over the points, minimising
/// S = Σ (y_i - C f_i)², f_i = 1 - e^(-k τ_i).
///
/// Method: variable projection: for a fixed k the best C is Σ y f / Σ f² (linear), and k is
/// the root of dS/dk = -2 C Σ (y_i - C f_i) τ_i e^(-k τ_i) (by the envelope theorem), found by
/// scanning k τ_max over 1e-3..50 on a log grid for the minimum of S and bracketing its sign
/// change ([`numeric::find_root`]). Valid for at least two distinct times (within 5 %) and a
/// minimum inside the scan; otherwise `None` (the times cannot fix k). Standard errors as
/// `scipy.optimize.curve_fit` with `absolute_sigma=False`.
///
/// ```
/// use stillroom_core::calibration::{fit_first_order, Point};
/// let law = |t: f64| 0.01 * (1.0 - (-0.001 * t).exp());
/// let pts: Vec<Point> = [600.0, 1800.0, 3600.0].iter()
///     .map(|&t| Point { tau_s: t, oil_per_charge: law(t) }).collect();
/// let fit = fit_first_order(&pts).unwrap();
/// assert!((fit.content - 0.01).abs() < 1e-8 && (fit.rate_constant_per_s - 0.001).abs() < 1e-8);
/// ```
pub fn fit_first_order(points: &[Point]) -> Option<Fit> {
    let ok = |p: &Point| {
        p.tau_s.is_finite() && p.tau_s > 0.0 && p.oil_per_charge.is_finite() && p.oil_per_charge > 0.0
    };
    if points.len() < 2 || !points.iter().all(ok) {
        return None;
    }
    let t_max = points.iter().map(|p| p.tau_s).fold(0.0, f64::max);
    let t_min = points.iter().map(|p| p.tau_s).fold(f64::INFINITY, f64::min);
    if t_min > 0.95 * t_max {
        return None;
    }
    let best_c = |k: f64| {
        let (yf, ff) = points.iter().fold((0.0, 0.0), |(yf, ff), p| {
            let f = -(-k * p.tau_s).exp_m1();
            (yf + p.oil_per_charge * f, ff + f * f)
        });
        yf / ff
    };
    let slope = |k: f64| {
        let c = best_c(k);
        -2.0 * c
            * points
                .iter()
                .map(|p| (p.oil_per_charge + c * (-k * p.tau_s).exp_m1()) * p.tau_s * (-k * p.tau_s).exp())
                .sum::<f64>()
    };
    let sum_sq = |k: f64| {
        let c = best_c(k);
        points.iter().map(|p| (p.oil_per_charge + c * (-k * p.tau_s).exp_m1()).powi(2)).sum::<f64>()
    };
    const STEPS: usize = 200;
    let grid: Vec<f64> = (0..=STEPS).map(|i| 1e-3 * (5e4f64).powf(i as f64 / STEPS as f64) / t_max).collect();
    let (i_min, _) = grid
        .iter()
        .map(|&k| sum_sq(k))
        .enumerate()
        .fold((0, f64::INFINITY), |best, (i, s)| if s < best.1 { (i, s) } else { best });
    if i_min == 0 || i_min == STEPS {
        return None;
    }
    let k = numeric::find_root(slope, grid[i_min - 1], grid[i_min + 1], 1e-15 / t_max).ok()?;
    let c = best_c(k);
    if !c.is_finite() || c <= 0.0 || !k.is_finite() || k <= 0.0 {
        return None;
    }
    let (content_se, rate_constant_se_per_s) = standard_errors(points, c, k);
    Some(Fit { content: c, rate_constant_per_s: k, content_se, rate_constant_se_per_s })
}

/// s² (JᵀJ)⁻¹ at the fit, J_i = (∂y/∂C, ∂y/∂k) = (f_i, C τ_i e^(-k τ_i)); needs N > 2.
fn standard_errors(points: &[Point], c: f64, k: f64) -> (Option<f64>, Option<f64>) {
    let n = points.len();
    if n <= 2 {
        return (None, None);
    }
    let (mut a, mut b, mut d, mut s) = (0.0, 0.0, 0.0, 0.0);
    for p in points {
        let e = (-k * p.tau_s).exp();
        let (jc, jk) = (1.0 - e, c * p.tau_s * e);
        a += jc * jc;
        b += jc * jk;
        d += jk * jk;
        s += (p.oil_per_charge - c * (1.0 - e)).powi(2);
    }
    let det = a * d - b * b;
    let s2 = s / (n - 2) as f64;
    let se = |v: f64| (v.is_finite() && v >= 0.0).then(|| v.sqrt());
    if det.is_nan() || det <= 0.0 {
        return (None, None);
    }
    (se(s2 * d / det), se(s2 * a / det))
}

/// τ = t (q/q_ref)^n: the time at the crop's reference steam rate that releases as much
/// (n the plan's central [`KINETIC_STEAM_EXPONENT`]); t itself when the rates are unknown.
fn effective_time_s(run: &RunRecord, t_s: f64) -> f64 {
    match (run.specific_steam_rate_kg_per_h_per_kg, run.reference_steam_rate_kg_per_h_per_kg) {
        (Some(q), Some(q_ref)) if q > 0.0 && q_ref > 0.0 && q.is_finite() && q_ref.is_finite() => {
            t_s * (q / q_ref).powf(KINETIC_STEAM_EXPONENT.1)
        }
        _ => t_s,
    }
}

/// The run's points (earlier reading first), or none when the record is nonsense.
fn points_of(run: &RunRecord) -> Vec<Point> {
    let per_kg = |v: f64| v * run.oil_density_kg_per_m3 / run.plant_mass_kg;
    let sound = run.plant_mass_kg > 0.0 && run.oil_density_kg_per_m3 > 0.0 && run.plant_mass_kg.is_finite();
    if !sound {
        return Vec::new();
    }
    let mut out = Vec::new();
    if let Some(e) = &run.earlier
        && e.time_s > 0.0
        && e.time_s < run.distilling_time_s
        && e.oil_volume_m3 > 0.0
        && e.oil_volume_m3 < run.oil_volume_m3
    {
        out.push(Point { tau_s: effective_time_s(run, e.time_s), oil_per_charge: per_kg(e.oil_volume_m3) });
    }
    out.push(Point {
        tau_s: effective_time_s(run, run.distilling_time_s),
        oil_per_charge: per_kg(run.oil_volume_m3),
    });
    out.retain(|p| {
        p.tau_s.is_finite() && p.tau_s > 0.0 && p.oil_per_charge.is_finite() && p.oil_per_charge > 0.0
    });
    out
}

fn sample_sd(values: &[f64]) -> Option<f64> {
    let n = values.len();
    if n < 2 {
        return None;
    }
    let mean = values.iter().sum::<f64>() / n as f64;
    let var = values.iter().map(|v| (v - mean).powi(2)).sum::<f64>() / (n - 1) as f64;
    var.is_finite().then(|| var.sqrt())
}

/// The oil content and release constant that the logged runs of a crop imply, or `None`
/// without a usable run.
///
/// - Runs that between them give two distinct effective times (several runs of different
///   lengths, or one run with an earlier reading): content and constant by
///   [`fit_first_order`]; spreads are its standard errors (with three points or more).
///   With a single run of two readings this is the exact two-time solve
///   ([`rate_constant_from_two_readings_per_s`]), then C = y2 / (1 - e^(-k τ2)).
/// - Otherwise the content alone, the mean of [`oil_content_percent_from_run`] with each run's
///   own constant, the constant the plan's (referred back to q_ref), and run-to-run spreads.
///
/// Runs with nonsense numbers are left out, never a panic.
///
/// ```
/// use stillroom_core::calibration::{calibrate, RunRecord};
/// let run = |ml: f64| RunRecord { crop: Some("lavender".into()), plant_mass_kg: 20.0,
///     distilling_time_s: 3600.0, oil_volume_m3: ml * 1e-6, oil_density_kg_per_m3: 885.0,
///     rate_constant_per_min: 0.05, ..RunRecord::default() };
/// let c = calibrate(&[run(180.0), run(220.0)], Some("lavender")).unwrap();
/// assert_eq!((c.oil_content_runs, c.rate_constant_runs), (2, 0));
/// assert!(c.oil_content_spread_percent.unwrap() > 0.0);
/// assert!(calibrate(&[run(180.0)], Some("rosemary")).is_none());
/// ```
pub fn calibrate(runs: &[RunRecord], crop: Option<&str>) -> Option<Calibration> {
    let runs: Vec<&RunRecord> =
        runs.iter().filter(|r| r.crop.as_deref() == crop).filter(|r| !points_of(r).is_empty()).collect();
    let points: Vec<Point> = runs.iter().flat_map(|r| points_of(r)).collect();
    if let Some(fit) = fit_first_order(&points).filter(|f| f.content <= 1.0) {
        return Some(Calibration {
            oil_content_percent: 100.0 * fit.content,
            oil_content_runs: runs.len(),
            oil_content_spread_percent: fit.content_se.map(|s| 100.0 * s),
            rate_constant_per_min: fit.rate_constant_per_s * 60.0,
            rate_constant_runs: runs.len(),
            rate_constant_spread_per_min: fit.rate_constant_se_per_s.map(|s| s * 60.0),
            spread: SpreadMeasure::StandardError,
        });
    }
    let used: Vec<(&RunRecord, f64)> =
        runs.iter().filter_map(|r| oil_content_percent_from_run(r).map(|c| (*r, c))).collect();
    if used.is_empty() {
        return None;
    }
    let contents: Vec<f64> = used.iter().map(|(_, c)| *c).collect();
    // The plan's constant at each run's rate, referred back to the reference rate.
    let k_refs: Vec<f64> = used
        .iter()
        .map(|(r, _)| {
            r.rate_constant_per_min * r.distilling_time_s / effective_time_s(r, r.distilling_time_s)
        })
        .filter(|k| k.is_finite() && *k > 0.0)
        .collect();
    let n = contents.len() as f64;
    let k_ref = if k_refs.is_empty() { f64::NAN } else { k_refs.iter().sum::<f64>() / k_refs.len() as f64 };
    k_ref.is_finite().then(|| Calibration {
        oil_content_percent: contents.iter().sum::<f64>() / n,
        oil_content_runs: contents.len(),
        oil_content_spread_percent: sample_sd(&contents),
        rate_constant_per_min: k_ref,
        rate_constant_runs: 0,
        rate_constant_spread_per_min: None,
        spread: SpreadMeasure::RunToRun,
    })
}

/// Whether a scenario's charge still holds a calibration's values (to within 1e-9 relative),
/// so the plan may say it plans with the grower's own figures. A constant the runs did not fix
/// need not match.
///
/// ```
/// use stillroom_core::{calibration::{holds, Calibration}, Scenario};
/// let c = Calibration { oil_content_percent: 1.1, oil_content_runs: 3,
///     rate_constant_per_min: 0.041, rate_constant_runs: 3, ..Calibration::default() };
/// let mut s = Scenario::default();
/// s.charge.oil_content_percent = Some(1.1);
/// s.run.rate_constant_per_min = Some(0.041);
/// assert!(holds(&s, &c));
/// s.charge.oil_content_percent = Some(1.2);
/// assert!(!holds(&s, &c));
/// ```
pub fn holds(scenario: &crate::Scenario, c: &Calibration) -> bool {
    let same = |a: Option<f64>, b: f64| a.is_some_and(|a| (a - b).abs() <= 1e-9 * b.abs().max(1e-12));
    let finite = c.oil_content_percent.is_finite() && c.rate_constant_per_min.is_finite();
    finite
        && c.oil_content_runs > 0
        && same(scenario.charge.oil_content_percent, c.oil_content_percent)
        && (c.rate_constant_runs == 0 || same(scenario.run.rate_constant_per_min, c.rate_constant_per_min))
}

#[cfg(test)]
mod tests {
    use super::*;

    /// A small deterministic noise source (xorshift), so the checks are repeatable.
    struct Noise(u64);
    impl Noise {
        fn next(&mut self) -> f64 {
            self.0 ^= self.0 << 13;
            self.0 ^= self.0 >> 7;
            self.0 ^= self.0 << 17;
            (self.0 % 1_000_000) as f64 / 1e6 - 0.5
        }
    }

    fn run(t_min: f64, ml: f64) -> RunRecord {
        RunRecord {
            crop: Some("lavender".into()),
            plant_mass_kg: 20.0,
            distilling_time_s: t_min * 60.0,
            oil_volume_m3: ml * 1e-6,
            oil_density_kg_per_m3: 885.0,
            rate_constant_per_min: 0.05,
            ..RunRecord::default()
        }
    }

    /// Oil volume mL from the first-order law for 20 kg at density 885.
    fn law_ml(c: f64, k_per_min: f64, t_min: f64) -> f64 {
        c * 20.0 * (1.0 - (-k_per_min * t_min).exp()) / 885.0 * 1e6
    }

    #[test]
    fn known_content_and_constant_come_back_from_noisy_runs_of_different_lengths() {
        let mut noise = Noise(0x5eed);
        for &(c, k) in &[(0.008, 0.03), (0.012, 0.06), (0.02, 0.1), (0.005, 0.02)] {
            let runs: Vec<RunRecord> = [20.0, 35.0, 50.0, 70.0, 90.0, 120.0]
                .iter()
                .map(|&t| run(t, law_ml(c, k, t) * (1.0 + 0.01 * noise.next())))
                .collect();
            let cal = calibrate(&runs, Some("lavender")).unwrap();
            assert!((cal.oil_content_percent / (100.0 * c) - 1.0).abs() < 0.02, "{cal:?} for C {c}");
            assert!((cal.rate_constant_per_min / k - 1.0).abs() < 0.08, "{cal:?} for k {k}");
            assert_eq!((cal.oil_content_runs, cal.rate_constant_runs), (6, 6));
            // The truth lies within a few standard errors.
            let se_k = cal.rate_constant_spread_per_min.unwrap();
            assert!((cal.rate_constant_per_min - k).abs() < 4.0 * se_k + 1e-9, "{cal:?}");
        }
    }

    #[test]
    fn one_run_with_an_earlier_reading_gives_both_exactly() {
        let (c, k) = (0.011, 0.041);
        let mut r = run(75.0, law_ml(c, k, 75.0));
        r.earlier = Some(EarlierReading { time_s: 20.0 * 60.0, oil_volume_m3: law_ml(c, k, 20.0) * 1e-6 });
        let cal = calibrate(&[r], Some("lavender")).unwrap();
        assert!((cal.oil_content_percent - 1.1).abs() < 1e-6, "{cal:?}");
        assert!((cal.rate_constant_per_min - 0.041).abs() < 1e-8, "{cal:?}");
        assert_eq!((cal.oil_content_runs, cal.rate_constant_runs), (1, 1));
        assert_eq!(cal.oil_content_spread_percent, None);
        let k2 =
            rate_constant_from_two_readings_per_s(1200.0, law_ml(c, k, 20.0), 4500.0, law_ml(c, k, 75.0));
        assert!((k2.unwrap() * 60.0 - k).abs() < 1e-9);
    }

    #[test]
    fn a_run_at_another_steam_rate_is_referred_back_to_the_reference_rate() {
        // Twice the reference steam rate with n = 0.5: the run's constant is √2 k_ref.
        let (c, k_ref) = (0.01, 0.04);
        let k_run = k_ref * 2f64.sqrt();
        let runs: Vec<RunRecord> = [15.0, 40.0, 90.0]
            .iter()
            .map(|&t| RunRecord {
                specific_steam_rate_kg_per_h_per_kg: Some(0.6),
                reference_steam_rate_kg_per_h_per_kg: Some(0.3),
                ..run(t, law_ml(c, k_run, t))
            })
            .collect();
        let cal = calibrate(&runs, Some("lavender")).unwrap();
        assert!((cal.rate_constant_per_min - k_ref).abs() < 1e-7, "{cal:?}");
    }

    #[test]
    fn equal_times_fall_back_to_the_content_alone_with_the_plans_constant() {
        let cal = calibrate(&[run(60.0, 200.0), run(60.0, 210.0)], Some("lavender")).unwrap();
        assert_eq!(cal.rate_constant_runs, 0);
        assert_eq!(cal.spread, SpreadMeasure::RunToRun);
        assert!((cal.rate_constant_per_min - 0.05).abs() < 1e-12);
        let one = calibrate(&[run(60.0, 200.0)], Some("lavender")).unwrap();
        assert_eq!((one.oil_content_runs, one.oil_content_spread_percent), (1, None));
    }

    #[test]
    fn nonsense_never_panics_and_gives_nothing() {
        let bad = [f64::NAN, f64::INFINITY, -1.0, 0.0, 1e300, -1e300];
        for &x in &bad {
            for &y in &bad {
                let mut r = run(60.0, 200.0);
                r.plant_mass_kg = x;
                r.oil_volume_m3 = y;
                assert!(
                    calibrate(&[r.clone()], Some("lavender"))
                        .is_none_or(|c| c.oil_content_percent.is_finite())
                );
                r.earlier = Some(EarlierReading { time_s: y, oil_volume_m3: x });
                let _ = calibrate(&[r.clone(), run(x, y), run(30.0, y)], Some("lavender"));
                assert!(rate_constant_from_two_readings_per_s(x, y, x, y).is_none());
                let _ = fit_first_order(&[Point { tau_s: x, oil_per_charge: y }; 3]);
            }
        }
        assert!(calibrate(&[], None).is_none());
        assert!(fit_first_order(&[Point { tau_s: 60.0, oil_per_charge: 0.01 }; 4]).is_none());
        // A later reading with less oil than the earlier, or ratio outside (t1/t2, 1): no k.
        assert!(rate_constant_from_two_readings_per_s(600.0, 2.0, 3600.0, 1.0).is_none());
        assert!(rate_constant_from_two_readings_per_s(1800.0, 0.4, 3600.0, 1.0).is_none());
    }

    #[test]
    fn the_plan_says_so_only_while_the_values_hold() {
        let c = Calibration {
            oil_content_percent: 1.1,
            oil_content_runs: 3,
            rate_constant_per_min: 0.041,
            rate_constant_runs: 0,
            ..Calibration::default()
        };
        let mut s = crate::Scenario::default();
        s.charge.oil_content_percent = Some(1.1);
        assert!(holds(&s, &c));
        s.charge.oil_content_percent = None;
        assert!(!holds(&s, &c));
    }

    #[test]
    fn the_plan_notes_the_own_values_and_narrows_their_ranges() {
        let mut s = crate::Scenario::default();
        let wide = crate::plan(&s).unwrap();
        let c = Calibration {
            oil_content_percent: 1.1,
            oil_content_runs: 3,
            oil_content_spread_percent: Some(0.01),
            rate_constant_per_min: 0.041,
            rate_constant_runs: 3,
            rate_constant_spread_per_min: Some(0.001),
            spread: SpreadMeasure::StandardError,
        };
        s.charge.oil_content_percent = Some(1.1);
        s.run.rate_constant_per_min = Some(0.041);
        s.calibration = Some(c);
        let p = crate::plan(&s).unwrap();
        let note = p.warnings.iter().find(|w| w.code == "own_calibration").expect("the note");
        assert!(
            note.message.contains("1.10 %")
                && note.message.contains("0.041")
                && note.message.contains("3 of")
        );
        let width = |p: &crate::Plan| (p.ranges.oil_kg.high - p.ranges.oil_kg.low) / p.ranges.oil_kg.central;
        assert!(width(&p) < 0.5 * width(&wide), "{} {}", width(&p), width(&wide));
        s.charge.oil_content_percent = Some(1.2);
        assert!(crate::plan(&s).unwrap().warnings.iter().all(|w| w.code != "own_calibration"));
    }
}
