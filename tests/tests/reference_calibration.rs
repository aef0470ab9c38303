//! The calibration from logged runs (`stillroom_core::calibration`) against scipy 1.17.1
//! (`scipy.optimize.brentq` and `scipy.optimize.curve_fit`, an independent general-purpose
//! root finder and Levenberg-Marquardt least-squares fit). The runs are invented (Larkfield
//! Farm, a fictional farm). The values were computed with this script (Python 3, numpy, scipy
//! 1.17.1 from PyPI):
//!
//! ```python
//! import numpy as np, scipy
//! from scipy.optimize import brentq, curve_fit
//! print("scipy", scipy.__version__)
//! # Two readings of one run (invented, Larkfield Farm): 118 mL at 20 min, 231 mL at 75 min.
//! t1, v1, t2, v2 = 1200.0, 118.0, 4500.0, 231.0
//! k = brentq(lambda k: (1 - np.exp(-k*t1))/(1 - np.exp(-k*t2)) - v1/v2, 1e-9, 1.0, xtol=1e-15, rtol=1e-15)
//! print(repr(k))
//! # Runs of different lengths (invented, Larkfield Farm): minutes, mL, kg, density 885 kg/m3.
//! runs = [(25, 152, 20.0), (45, 238, 22.0), (70, 240, 19.5), (100, 300, 21.0), (130, 292, 20.5)]
//! t = np.array([r[0]*60.0 for r in runs]); y = np.array([r[1]*1e-6*885.0/r[2] for r in runs])
//! popt, pcov = curve_fit(lambda t, c, k: c*(1-np.exp(-k*t)), t, y, p0=(0.01, 1e-3), xtol=1e-15, ftol=1e-15, gtol=1e-15, maxfev=100000)
//! print(repr(popt[0]), repr(popt[1]), repr(np.sqrt(pcov[0,0])), repr(np.sqrt(pcov[1,1])))
//! ```
//!
//! Output: `scipy 1.17.1`, `0.0005138527306621065`, then `0.01301948192981168
//! 0.00047991682880808146 0.00031135887294060557 3.546149235925501e-05`.

use stillroom_core::calibration::{
    EarlierReading, Point, RunRecord, SpreadMeasure, calibrate, fit_first_order,
    rate_constant_from_two_readings_per_s,
};

fn close(got: f64, want: f64, rel: f64, what: &str) {
    assert!((got / want - 1.0).abs() < rel, "{what}: {got} against scipy's {want}");
}

fn run(t_min: f64, ml: f64, kg: f64) -> RunRecord {
    RunRecord {
        lot: format!("LAV-2026-{t_min}"),
        crop: Some("lavender".into()),
        plant_mass_kg: kg,
        distilling_time_s: t_min * 60.0,
        oil_volume_m3: ml * 1e-6,
        oil_density_kg_per_m3: 885.0,
        rate_constant_per_min: 0.05,
        ..RunRecord::default()
    }
}

#[test]
fn two_readings_of_one_run_give_scipys_brentq_root() {
    // scipy 1.17.1 brentq (script above): k = 0.0005138527306621065 /s.
    let k = rate_constant_from_two_readings_per_s(1200.0, 118.0, 4500.0, 231.0).unwrap();
    close(k, 0.0005138527306621065, 1e-9, "k from two readings");
    // The same run as a batch record: k and C = y2 / (1 - e^(-k t2)).
    let mut r = run(75.0, 231.0, 20.0);
    r.earlier = Some(EarlierReading { time_s: 1200.0, oil_volume_m3: 118e-6 });
    let cal = calibrate(&[r], Some("lavender")).unwrap();
    close(cal.rate_constant_per_min, 0.0005138527306621065 * 60.0, 1e-7, "k of the record");
    let c_scipy = 231e-6 * 885.0 / 20.0 / (1.0 - (-0.0005138527306621065f64 * 4500.0).exp());
    close(cal.oil_content_percent, 100.0 * c_scipy, 1e-7, "C of the record");
}

#[test]
fn runs_of_different_lengths_give_scipys_curve_fit() {
    let runs = [
        (25.0, 152.0, 20.0),
        (45.0, 238.0, 22.0),
        (70.0, 240.0, 19.5),
        (100.0, 300.0, 21.0),
        (130.0, 292.0, 20.5),
    ];
    // scipy 1.17.1 curve_fit (script above).
    let (c, k, se_c, se_k) =
        (0.01301948192981168, 0.00047991682880808146, 0.00031135887294060557, 3.546149235925501e-05);
    let points: Vec<Point> = runs
        .iter()
        .map(|&(t, ml, kg)| Point { tau_s: t * 60.0, oil_per_charge: ml * 1e-6 * 885.0 / kg })
        .collect();
    let fit = fit_first_order(&points).unwrap();
    close(fit.content, c, 1e-7, "C");
    close(fit.rate_constant_per_s, k, 1e-7, "k");
    close(fit.content_se.unwrap(), se_c, 1e-5, "standard error of C");
    close(fit.rate_constant_se_per_s.unwrap(), se_k, 1e-5, "standard error of k");
    let records: Vec<RunRecord> = runs.iter().map(|&(t, ml, kg)| run(t, ml, kg)).collect();
    let cal = calibrate(&records, Some("lavender")).unwrap();
    close(cal.oil_content_percent, 100.0 * c, 1e-7, "C of the log");
    close(cal.rate_constant_per_min, 60.0 * k, 1e-7, "k of the log");
    close(cal.rate_constant_spread_per_min.unwrap(), 60.0 * se_k, 1e-5, "spread of k");
    assert_eq!(
        (cal.oil_content_runs, cal.rate_constant_runs, cal.spread),
        (5, 5, SpreadMeasure::StandardError)
    );
}
