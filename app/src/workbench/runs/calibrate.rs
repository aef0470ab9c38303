//! What the logged runs say about the crop, and planning with it.

use super::{Runs, log};
use crate::units;
use crate::workbench::Workbench;
use leptos::prelude::*;
use stillroom_core::calibration::{Calibration, SpreadMeasure, calibrate};

fn runs_word(n: usize) -> String {
    if n == 1 { "1 run".to_string() } else { format!("{n} runs") }
}

fn spread_words(c: &Calibration) -> &'static str {
    match c.spread {
        SpreadMeasure::StandardError => "± is the fit's standard error",
        SpreadMeasure::RunToRun => "± is the run-to-run standard deviation",
    }
}

/// The fitted oil content and recovery rate of the plan's crop, and "Plan with these".
#[component]
pub fn CalibrationPanel() -> impl IntoView {
    let wb = expect_context::<Workbench>();
    let runs = expect_context::<Runs>().runs;
    let fitted = Memo::new(move |_| {
        let crop = wb.current.with(|s| s.as_ref().and_then(|s| s.charge.crop.clone()));
        runs.with(|r| calibrate(r, crop.as_deref())).map(|c| (c, log::crop_name(crop.as_deref())))
    });
    let plan_with = move |_| {
        if let (Some((c, _)), Some(mut s)) = (fitted.get_untracked(), wb.current.get_untracked()) {
            s.charge.oil_content_percent = Some(c.oil_content_percent);
            if c.rate_constant_runs > 0 {
                s.run.rate_constant_per_min = Some(c.rate_constant_per_min);
            }
            s.calibration = Some(c);
            wb.open_in_plan(&s);
        }
    };
    let content = move || {
        fitted.get().map(|(c, _)| {
            let pm =
                c.oil_content_spread_percent.map(|s| format!(" ± {}", units::sig3(s))).unwrap_or_default();
            format!("{} %{pm} from {}", units::fixed(c.oil_content_percent, 2), runs_word(c.oil_content_runs))
        })
    };
    let rate = move || {
        fitted.get().map(|(c, _)| {
            if c.rate_constant_runs == 0 {
                format!(
                    "{} /min, the plan's: your runs cannot fix it yet (log runs of different lengths, or oil at an earlier time)",
                    units::fixed(c.rate_constant_per_min, 3)
                )
            } else {
                let pm = c.rate_constant_spread_per_min.map(|s| format!(" ± {}", units::sig3(s))).unwrap_or_default();
                format!("{} /min{pm} from {}", units::fixed(c.rate_constant_per_min, 3), runs_word(c.rate_constant_runs))
            }
        })
    };
    view! {
        <Show when=move || fitted.with(|f| f.is_some())>
            <div class="suggestion" data-out="calibration">
                <h3>{move || fitted.get().map(|(_, name)| format!("What your runs of {name} say"))}</h3>
                <dl>
                    <dt>"Oil content"</dt><dd data-out="cal_content">{content}</dd>
                    <dt>"Recovery rate (at the crop's usual steam rate)"</dt><dd data-out="cal_rate">{rate}</dd>
                </dl>
                <p class="hint">{move || fitted.get().map(|(c, _)| format!("{}.", spread_words(&c)))}</p>
                <button type="button" id="run-use" on:click=plan_with>"Plan with these"</button>
            </div>
        </Show>
    }
}
