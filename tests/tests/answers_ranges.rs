//! The page shows each headline answer with its likely range in plain words, says what moves it
//! most, and keeps notes about the data apart from what the grower should act on. The numbers
//! must be the core's own: the same scenario planned natively gives the same range.

use fantoccini::Locator;
use std::time::Duration;
use stillroom_core::{Scenario, plan};
use stillroom_tests::BoxError;
use stillroom_tests::browser::{self, wait_text};

const WAIT: Duration = Duration::from_secs(15);

/// "1 h 02 min" as the page writes durations (rounded to the minute).
fn duration(s: f64) -> String {
    let total = (s / 60.0).round() as i64;
    let (h, m) = (total / 60, total % 60);
    if h == 0 { format!("{m} min") } else { format!("{h} h {m:02} min") }
}

#[tokio::test]
async fn the_run_shows_its_likely_range_and_the_biggest_doubt() -> Result<(), BoxError> {
    let page = browser::open().await?;
    page.goto("").await?;
    page.client.execute("localStorage.clear();", vec![]).await?;
    page.client.refresh().await?;
    let c = &page.client;
    // The invented example (15 kg of lavender at Larkfield Farm), planned natively.
    let p = plan(&Scenario::default()).map_err(|e| e.to_string())?;
    let r = &p.ranges.run_time_s;
    let want = format!("likely {} to {}", duration(r.low), duration(r.high));
    let note = wait_text(c, "[data-out=total_time] + .card-note", |t| t.contains("likely")).await?;
    assert!(note.contains(&want), "{note:?} should contain {want:?}");
    // The oil card gives the separable oil's range.
    let oil = wait_text(c, "[data-out=oil_volume] + .card-note", |t| t.contains("likely")).await?;
    assert!(oil.starts_with("separable oil, likely"), "{oil}");
    // "How sure is this?" names what moves the run most, in plain words.
    let sure = c.find(Locator::Css("[data-out=how_sure] summary")).await?;
    sure.click().await?;
    let doubt = wait_text(c, "[data-note=doubt_run]", |t| !t.is_empty()).await?;
    assert!(doubt.starts_with("Run length: mostly"), "{doubt}");
    // Notes about the data sit there, not under "Watch out".
    let watch = c.find_all(Locator::Css(".warnings [data-warning=estimated_vapour_pressure]")).await?;
    assert!(watch.is_empty(), "a data note is listed as something to act on");
    if p.warnings.iter().any(|w| w.code == "estimated_vapour_pressure") {
        let notes = c.find_all(Locator::Css("[data-note=data_note]")).await?;
        assert!(!notes.is_empty());
    }
    page.close().await
}

#[tokio::test]
async fn the_appliance_and_cohobation_change_the_plan_from_the_page() -> Result<(), BoxError> {
    let page = browser::open().await?;
    page.goto("").await?;
    page.client.execute("localStorage.clear();", vec![]).await?;
    page.client.refresh().await?;
    let c = &page.client;
    c.wait().at_most(WAIT).for_element(Locator::Id("f-appliance")).await?;
    c.execute("document.querySelectorAll('details').forEach((d) => { d.open = true; });", vec![]).await?;
    // The same propane in a boiler with its own firebox: 75 % (US DOE Steam Tip Sheet #4), not
    // the 45 % of a burner under a kettle.
    c.find(Locator::Id("f-appliance")).await?.select_by_value("jacketed_boiler").await?;
    let placeholder =
        c.find(Locator::Id("f-efficiency")).await?.attr("placeholder").await?.unwrap_or_default();
    assert!(placeholder.starts_with("75"), "{placeholder}");
    // An electric element cannot burn propane: the message sits beside the picker.
    c.find(Locator::Id("f-appliance")).await?.select_by_value("immersion_element").await?;
    wait_text(c, "#e-appliance", |t| t.contains("cannot use")).await?;
    c.find(Locator::Id("f-appliance")).await?.select_by_value("usual").await?;
    // Returning the waters: the hydrosol card says how much went back to the boiler.
    c.find(Locator::Id("f-cohobation")).await?.click().await?;
    wait_text(c, "[data-out=hydrosol_total] + .card-note", |t| t.contains("returned to the boiler")).await?;
    page.close().await
}

#[tokio::test]
async fn the_first_still_designer_loads_only_when_its_tab_is_opened() -> Result<(), BoxError> {
    let page = browser::open().await?;
    page.goto("").await?;
    let c = &page.client;
    c.wait().at_most(WAIT).for_element(Locator::Id("f-plant_mass")).await?;
    let fetched = "return performance.getEntriesByType('resource').some((e) => e.name.includes('stillroom_first_still'));";
    assert_eq!(c.execute(fetched, vec![]).await?, serde_json::json!(false), "loaded before it was asked for");
    c.find(Locator::Id("mode-first")).await?.click().await?;
    c.wait().at_most(WAIT).for_element(Locator::Id("first-still")).await?;
    assert_eq!(c.execute(fetched, vec![]).await?, serde_json::json!(true));
    page.close().await
}
