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

/// The range after "likely" in a card's note, in litres ("likely 150 L to 230 L", "708 mL").
fn litres_range(note: &str) -> Result<(f64, f64), BoxError> {
    let part = note.rsplit("likely ").next().ok_or("no range")?;
    let mut out = Vec::new();
    for side in part.split(" to ") {
        let mut words = side.split_whitespace();
        let n: f64 = words.next().ok_or("no number")?.replace(',', "").parse()?;
        let unit = words.next().ok_or("no unit")?.trim_end_matches([';', ',', '.']);
        out.push(match unit {
            "L" => n,
            "mL" => n / 1000.0,
            "m³" => n * 1000.0,
            u => return Err(format!("unit {u:?} in {note:?}").into()),
        });
    }
    match out[..] {
        [lo, hi] => Ok((lo, hi)),
        _ => Err(format!("no low and high in {note:?}").into()),
    }
}

/// The page rounds to three significant figures: within 0.5 % of the core's figure.
fn assert_close(shown: (f64, f64), core: (f64, f64), what: &str, note: &str) {
    for (s, c) in [(shown.0, core.0), (shown.1, core.1)] {
        assert!((s - c).abs() <= 0.005 * c.abs(), "{what}: page {s} vs core {c} in {note:?}");
    }
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
    let want = format!(
        "distilling {} ({} to {})",
        duration(p.run.time_after_first_drop_s),
        duration(r.low),
        duration(r.high)
    );
    let note = wait_text(c, "[data-out=total_time] + .card-note", |t| t.contains("likely")).await?;
    assert!(note.contains(&want), "{note:?} should contain {want:?}");
    // The whole run's own range comes first, so it is not read as the distilling time's.
    let t = &p.ranges.total_time_s;
    let whole = format!("likely {} to {} in all;", duration(t.low), duration(t.high));
    assert!(note.starts_with(&whole), "{note:?} should start with {whole:?}");
    // Water used and the separator carry their ranges too, the core's to display precision.
    let water = wait_text(c, "[data-out=water_total] + .card-note", |t| t.contains("likely")).await?;
    let w = &p.ranges.water_total_kg;
    assert_close(litres_range(&water)?, (w.low, w.high), "water used", &water);
    let sep = wait_text(c, "[data-out=separator_size] + .card-note", |t| t.contains("likely")).await?;
    let v = &p.ranges.separator_volume_m3;
    assert_close(litres_range(&sep)?, (v.low * 1000.0, v.high * 1000.0), "separator", &sep);
    assert!(w.low < w.high && v.low < v.high, "the ranges are not empty");
    // The biggest doubt is named on the folded line itself, without opening it.
    let line = wait_text(c, "[data-out=how_sure_line]", |t| !t.is_empty()).await?;
    assert!(line.starts_with("Mostly ") && line.contains("narrow it"), "{line}");
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
