//! Learning from the grower's own runs: the oil content a logged run implies, to plan the next.

use crate::recovery;
use serde::{Deserialize, Serialize};

/// One finished run, as the grower logs it.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
#[serde(default)]
pub struct RunRecord {
    /// When, as the grower writes it (free text, e.g. "2026-07-14").
    pub date: String,
    pub crop: Option<String>,
    pub plant_mass_kg: f64,
    /// Time distilled after the first drop, s.
    pub distilling_time_s: f64,
    /// Oil collected, m³.
    pub oil_volume_m3: f64,
    /// Oil density used to weigh the oil, kg/m³ (the plan's at the time of logging).
    pub oil_density_kg_per_m3: f64,
    /// Recovery constant the plan used, per minute (to undo the part of the oil left behind).
    pub rate_constant_per_min: f64,
    pub note: String,
}

impl Default for RunRecord {
    fn default() -> Self {
        RunRecord {
            date: String::new(),
            crop: None,
            plant_mass_kg: 0.0,
            distilling_time_s: 0.0,
            oil_volume_m3: 0.0,
            oil_density_kg_per_m3: 900.0,
            rate_constant_per_min: 0.05,
            note: String::new(),
        }
    }
}

/// What the logged runs of one crop say.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
pub struct Calibration {
    pub runs_used: usize,
    /// Mean oil content the runs imply, % w/w.
    pub oil_content_percent: f64,
    pub lowest_percent: f64,
    pub highest_percent: f64,
}

/// Oil content of a charge implied by one run, % w/w:
/// w = m_oil / (m_plant (1 - e^(-k t))), undoing the first-order law for the oil still in the
/// plant when the run stopped.
///
/// Source: inverse of the pseudo-first-order recovery law (Milojević et al., Hem. Ind. 67 (2013)
/// 843-859). Valid for k t > 0; the longer the run, the less the result leans on k.
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

/// The oil content that the logged runs of a crop imply, or `None` without a usable run.
///
/// ```
/// use stillroom_core::calibration::{calibrate, RunRecord};
/// let run = |ml: f64| RunRecord { crop: Some("lavender".into()), plant_mass_kg: 20.0,
///     distilling_time_s: 3600.0, oil_volume_m3: ml * 1e-6, oil_density_kg_per_m3: 885.0,
///     rate_constant_per_min: 0.05, ..RunRecord::default() };
/// let c = calibrate(&[run(180.0), run(220.0)], Some("lavender")).unwrap();
/// assert_eq!(c.runs_used, 2);
/// assert!(c.lowest_percent < c.oil_content_percent && c.oil_content_percent < c.highest_percent);
/// assert!(calibrate(&[run(180.0)], Some("rosemary")).is_none());
/// ```
pub fn calibrate(runs: &[RunRecord], crop: Option<&str>) -> Option<Calibration> {
    let contents: Vec<f64> =
        runs.iter().filter(|r| r.crop.as_deref() == crop).filter_map(oil_content_percent_from_run).collect();
    if contents.is_empty() {
        return None;
    }
    let n = contents.len();
    Some(Calibration {
        runs_used: n,
        oil_content_percent: contents.iter().sum::<f64>() / n as f64,
        lowest_percent: contents.iter().cloned().fold(f64::INFINITY, f64::min),
        highest_percent: contents.iter().cloned().fold(f64::NEG_INFINITY, f64::max),
    })
}
