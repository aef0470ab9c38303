//! Plans larger than the core plans, on the built page in headless Chromium: a mixture of
//! 2,000 parts (the size of the pasted plan that once froze the page) is refused before any form
//! line is made, with the core's own message, and the form keeps answering; the most the core
//! plans (`stillroom_core::scenario::limits::MAX_MIXTURE_PARTS`) opens, and then no more lines can
//! be added.
//!
//! Every plan here belongs to the invented Larkfield Farm (a fictional farm).

use fantoccini::{Client, Locator};
use serde_json::json;
use std::time::{Duration, Instant};
use stillroom_core::Scenario;
use stillroom_core::scenario::limits::MAX_MIXTURE_PARTS;
use stillroom_core::scenario::{OilComposition, OilPart};
use stillroom_tests::BoxError;
use stillroom_tests::browser::{self, wait_text};
use stillroom_tests::drive::{self, count, fill, form_plan, open_in_form, tap, wait_count, wait_for};

/// A Larkfield Farm lavender plan whose oil is given as `n` equal parts of linalool.
fn mixture_plan(n: usize) -> String {
    let mut s = Scenario::default();
    s.charge.plant_mass_kg = 40.0;
    let part = OilPart { compound: "linalool".into(), mass_percent: 100.0 / n as f64 };
    s.oil.composition = OilComposition::Mixture { parts: vec![part; n] };
    json!({ "record_version": 1, "scenario": s }).to_string()
}

/// Waits until the form's scenario holds `kg` as its plant mass; how long that took.
async fn form_takes_mass(c: &Client, kg: f64) -> Result<Duration, BoxError> {
    let start = Instant::now();
    loop {
        if form_plan(c).await?["charge"]["plant_mass_kg"].as_f64() == Some(kg) {
            return Ok(start.elapsed());
        }
        if start.elapsed() > browser::WAIT {
            return Err(format!("the form never took {kg} kg").into());
        }
        tokio::time::sleep(Duration::from_millis(20)).await;
    }
}

/// Whether the element matching `css` is drawn (not `display: none`).
async fn shown(c: &Client, css: &str) -> Result<bool, BoxError> {
    let e = c.find(Locator::Css(css)).await?;
    Ok(e.is_displayed().await?)
}

#[tokio::test]
async fn a_mixture_of_two_thousand_parts_is_refused_at_once_and_the_form_answers() -> Result<(), BoxError> {
    let page = browser::open().await?;
    drive::start_clean(&page).await?;
    let c = &page.client;
    let plan = mixture_plan(2000);
    println!("a 2,000-part plan is {} kB", plan.len() / 1024);

    // Handed to the form as the workbench hands a plan over.
    open_in_form(c, &plan).await?;
    let said = wait_text(c, "[data-out=storage_notice]", |t| t.contains("was not opened")).await?;
    // The core's words for the field (core/src/plan/validate.rs), with the count it was given.
    assert!(
        said.contains("scenario.oil.composition.parts: too many compounds: at most 64")
            && said.contains("got 2000 compounds")
            && said.contains("The form is unchanged"),
        "{said}"
    );
    assert_eq!(count(c, ".mix-line").await?, 0, "no line of the analysis was made");
    assert_eq!(form_plan(c).await?["charge"]["crop"], json!("lavender"), "the form still holds its plan");
    // The form answers: a new plant mass is taken and planned well within a second.
    fill(c, "#f-plant_mass", "33").await?;
    let took = form_takes_mass(c, 33.0).await?;
    println!("the form took a new plant mass in {} ms", took.as_millis());
    assert!(took < Duration::from_secs(1), "the form took {took:?} to answer");
    wait_text(c, "[data-out=water_boiling_point]", |t| !t.is_empty() && t != "–").await?;

    // Pasted into the workbench's box, it is named the same way and not saved.
    tap(c, "#mode-workbench").await?;
    wait_for(c, "#paste-plan").await?;
    c.execute(
        "const box = document.getElementById('paste-plan');
         box.value = arguments[0];
         box.dispatchEvent(new Event('input', { bubbles: true }));",
        vec![json!(plan)],
    )
    .await?;
    tap(c, "#paste-add").await?;
    let problem = wait_text(c, "#paste-error", |t| !t.is_empty()).await?;
    assert!(problem.contains("oil.composition.parts: too many compounds: at most 64"), "{problem}");
    assert_eq!(count(c, "[data-plan]").await?, 0);
    page.close().await
}

#[tokio::test]
async fn the_most_parts_the_core_plans_open_and_no_line_can_be_added_beyond() -> Result<(), BoxError> {
    let page = browser::open().await?;
    drive::start_clean(&page).await?;
    let c = &page.client;
    open_in_form(c, &mixture_plan(MAX_MIXTURE_PARTS)).await?;
    wait_count(c, ".mix-line", MAX_MIXTURE_PARTS).await?;
    let parts = form_plan(c).await?["oil"]["composition"]["parts"].as_array().map(Vec::len);
    assert_eq!(parts, Some(MAX_MIXTURE_PARTS), "the form holds every part it was given");
    assert!(!shown(c, "#mix-add").await?, "the add button is still offered with {MAX_MIXTURE_PARTS} lines");
    assert!(shown(c, "#mix-full").await?);
    // One line fewer, and a line can be added again: up to the limit, and no further.
    tap(c, ".mix-line:last-child button").await?;
    wait_count(c, ".mix-line", MAX_MIXTURE_PARTS - 1).await?;
    assert!(shown(c, "#mix-add").await?);
    assert!(!shown(c, "#mix-full").await?);
    tap(c, "#mix-add").await?;
    wait_count(c, ".mix-line", MAX_MIXTURE_PARTS).await?;
    // A tap the page still receives (the button hidden by the style) adds nothing.
    c.execute("document.getElementById('mix-add').click();", vec![]).await?;
    tokio::time::sleep(Duration::from_millis(300)).await;
    assert_eq!(count(c, ".mix-line").await?, MAX_MIXTURE_PARTS);
    page.close().await
}
