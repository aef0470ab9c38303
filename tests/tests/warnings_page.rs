//! Two warnings under "Watch out" never give opposite advice: every crop preset picked on the
//! page, at the page's own settings and with a small charge in a small, overpacked still (5 kg in
//! 20 L, where the oil mostly stays in the hydrosol), checked against the pairs the core's tests
//! use (`stillroom_tests::OPPOSITE_ADVICE`; the pairs are the warnings' own advice, common
//! practice, no source).

use fantoccini::Locator;
use stillroom_core::crops::CROPS;
use stillroom_tests::browser::{self, wait_text};
use stillroom_tests::{BoxError, OPPOSITE_ADVICE, drive, opposite_advice};

#[tokio::test]
async fn no_two_shown_warnings_give_opposite_advice_for_any_crop_preset() -> Result<(), BoxError> {
    let page = browser::open().await?;
    drive::start_clean(&page).await?;
    let c = &page.client;
    let options = c.find_all(Locator::Css("#f-crop option")).await?;
    let mut values = Vec::new();
    for o in options {
        values.push(o.attr("value").await?.unwrap_or_default());
    }
    let presets: Vec<&String> = values.iter().filter(|v| !v.is_empty()).collect();
    assert_eq!(presets.len(), CROPS.len(), "every crop preset is offered");
    let mut warned = 0;
    let mut trips = Vec::new();
    // (plant mass in kg, still volume in L; empty leaves the page's own).
    for (mass, volume) in [("", ""), ("5", "20")] {
        c.execute("document.querySelectorAll('details').forEach((d) => { d.open = true; });", vec![]).await?;
        if !mass.is_empty() {
            drive::fill(c, "#f-plant_mass", mass).await?;
            drive::fill(c, "#f-still_volume", volume).await?;
        }
        for id in &presets {
            c.find(Locator::Id("f-crop")).await?.select_by_value(id).await?;
            // The answers are for this crop (and charge) once the summary names it.
            let name = CROPS.iter().find(|k| k.id == id.as_str()).ok_or("unknown crop")?.name.to_lowercase();
            let want =
                if mass.is_empty() { format!(" {name} at ") } else { format!("For {mass} kg {name} at ") };
            wait_text(c, "[data-out=charge_summary]", |t| t.contains(&want)).await?;
            let mut texts = Vec::new();
            for li in c.find_all(Locator::Css(".warnings li")).await? {
                texts.push(li.text().await?);
            }
            warned += usize::from(!texts.is_empty());
            let pairs = opposite_advice(texts.iter().map(String::as_str));
            if !pairs.is_empty() {
                trips.push(format!("{id} at {mass} kg in {volume} L: {pairs:?} in {texts:#?}"));
            }
        }
    }
    // The check reads real warnings: some presets show some.
    assert!(warned > 0, "no preset showed any warning");
    assert!(!OPPOSITE_ADVICE.is_empty());
    assert!(trips.is_empty(), "opposite advice on the page:\n{}", trips.join("\n"));
    page.close().await
}

/// Notes about the data, among them the grower's own calibration and the separator's settling
/// formula used beyond its range, sit under "How sure is this?", not under "Watch out".
#[tokio::test]
async fn notes_about_the_data_sit_under_how_sure_not_watch_out() -> Result<(), BoxError> {
    use stillroom_core::calibration::{Calibration, SpreadMeasure};
    use stillroom_core::{Scenario, plan};
    // An invented farm's record: its own oil content from 3 logged runs, and a separator set to
    // catch 0.4 mm droplets, which settle faster than Stokes' law holds for (it is the law of
    // creeping flow, Reynolds number under 1: Perry's Chemical Engineers' Handbook, 8th ed.,
    // section 6, from memory).
    let mut s = Scenario::default();
    s.charge.oil_content_percent = Some(1.2);
    s.calibration = Some(Calibration {
        oil_content_percent: 1.2,
        oil_content_runs: 3,
        oil_content_spread_percent: Some(0.1),
        rate_constant_per_min: 0.0,
        rate_constant_runs: 0,
        rate_constant_spread_per_min: None,
        spread: SpreadMeasure::RunToRun,
    });
    s.separator.droplet_diameter_m = 400e-6;
    let p = plan(&s).map_err(|e| e.to_string())?;
    for code in ["own_calibration", "stokes_limit"] {
        assert!(p.warnings.iter().any(|w| w.code == code), "the plan has no {code} note: {:?}", p.warnings);
    }
    let page = browser::open().await?;
    drive::start_clean(&page).await?;
    let c = &page.client;
    let record = serde_json::json!({ "record_version": 1, "scenario": s }).to_string();
    drive::open_in_form(c, &record).await?;
    drive::tap(c, "[data-out=how_sure] summary").await?;
    let notes = wait_text(c, "[data-out=how_sure]", |t| t.contains("logged runs")).await?;
    assert!(notes.contains("a little more area"), "{notes}");
    for code in ["own_calibration", "stokes_limit"] {
        let css = format!(".warnings [data-warning={code}]");
        assert_eq!(drive::count(c, &css).await?, 0, "{code} is listed as something to act on");
    }
    page.close().await
}
