//! A grower's flows through the built release page in headless Chromium at phone size: type the
//! charge and the site, read the plan, make mistakes, reload, and come back to unreadable data.

use fantoccini::{Client, Locator};
use std::time::Duration;
use stillroom_tests::BoxError;
use stillroom_tests::browser;

const WAIT: Duration = Duration::from_secs(15);

async fn out(client: &Client, key: &str) -> Result<String, BoxError> {
    Ok(client.find(Locator::Css(&format!("[data-out={key}]"))).await?.text().await?)
}

/// Waits until an output shows the expected text (updates are asynchronous).
async fn wait_out(client: &Client, key: &str, want: &str) -> Result<(), BoxError> {
    let start = std::time::Instant::now();
    loop {
        let got = out(client, key).await.unwrap_or_default();
        if got == want {
            return Ok(());
        }
        if start.elapsed() > WAIT {
            return Err(format!("{key}: wanted {want:?}, page shows {got:?}").into());
        }
        tokio::time::sleep(Duration::from_millis(50)).await;
    }
}

async fn set_field(client: &Client, key: &str, text: &str) -> Result<(), BoxError> {
    let input = client.find(Locator::Id(&format!("f-{key}"))).await?;
    input.clear().await?;
    input.send_keys(text).await?;
    Ok(())
}

async fn message(client: &Client, key: &str) -> Result<String, BoxError> {
    Ok(client.find(Locator::Id(&format!("e-{key}"))).await?.text().await?)
}

async fn fresh(page: &browser::Page) -> Result<(), BoxError> {
    page.goto("").await?;
    page.client.execute("localStorage.clear();", vec![]).await?;
    page.client.refresh().await?;
    page.client.wait().at_most(WAIT).for_element(Locator::Id("f-plant_mass")).await?;
    Ok(())
}

#[tokio::test]
async fn typing_the_charge_and_site_gives_the_plan() -> Result<(), BoxError> {
    let page = browser::open().await?;
    fresh(&page).await?;
    let c = &page.client;
    set_field(c, "altitude", "1500").await?;
    // US Standard Atmosphere 1976 at 1500 m: 84.56 kPa; IF97 boiling point there 94.98 °C,
    // 5.0 K under sea level's 99.97 °C.
    wait_out(c, "pressure", "84.6 kPa").await?;
    wait_out(c, "water_boiling_point", "95.0 °C").await?;
    // A pure compound: thymol with water boils just under water (thermo 0.6.1 + CoolProp 8.0.0:
    // 99.72 °C at 1 atm) and needs about 13.0 kg of steam per kg of thymol.
    c.find(Locator::Id("f-oil")).await?.select_by_value("thymol").await?;
    set_field(c, "altitude", "0").await?;
    wait_out(c, "codistillation_temperature", "99.7 °C").await?;
    let ratio = out(c, "steam_per_kg_oil").await?;
    let kg: f64 = ratio.trim_end_matches(" kg").parse()?;
    assert!((kg - 13.0).abs() < 0.2, "{ratio}");
    // Twice the plant, twice the least steam for the charge.
    set_field(c, "oil_content", "1").await?;
    set_field(c, "plant_mass", "10").await?;
    wait_out(c, "oil_in_charge", "100 g").await?;
    set_field(c, "plant_mass", "20").await?;
    wait_out(c, "oil_in_charge", "200 g").await?;
    page.close().await
}

#[tokio::test]
async fn bad_input_is_explained_beside_the_field_and_the_page_lives_on() -> Result<(), BoxError> {
    let page = browser::open().await?;
    fresh(&page).await?;
    let c = &page.client;
    set_field(c, "plant_mass", "lots").await?;
    c.wait().at_most(WAIT).for_element(Locator::Css(".field.invalid #f-plant_mass")).await?;
    assert!(message(c, "plant_mass").await?.contains("number"));
    set_field(c, "oil_content", "150").await?;
    set_field(c, "altitude", "-900").await?;
    // The answers on screen are marked as not matching the form (the last good plan stays).
    c.wait().at_most(WAIT).for_element(Locator::Css(".headline.stale [data-out=plan_stale]")).await?;
    assert!(message(c, "oil_content").await?.contains("100"), "{}", message(c, "oil_content").await?);
    assert!(message(c, "altitude").await?.contains("-500") || message(c, "altitude").await?.contains("−500"));
    // Nothing crashed: fixing the fields brings the plan back.
    set_field(c, "plant_mass", "15").await?;
    set_field(c, "oil_content", "1").await?;
    set_field(c, "altitude", "0").await?;
    wait_out(c, "water_boiling_point", "100.0 °C").await?;
    page.close().await
}

#[tokio::test]
async fn entries_survive_a_reload() -> Result<(), BoxError> {
    let page = browser::open().await?;
    fresh(&page).await?;
    let c = &page.client;
    set_field(c, "plant_mass", "33").await?;
    set_field(c, "altitude", "2000").await?;
    c.find(Locator::Id("f-crop")).await?.select_by_value("rosemary").await?;
    wait_out(c, "pressure", "79.5 kPa").await?;
    c.refresh().await?;
    let mass = c.wait().at_most(WAIT).for_element(Locator::Id("f-plant_mass")).await?;
    assert_eq!(mass.prop("value").await?.as_deref(), Some("33"));
    assert_eq!(c.find(Locator::Id("f-crop")).await?.prop("value").await?.as_deref(), Some("rosemary"));
    wait_out(c, "pressure", "79.5 kPa").await?;
    page.close().await
}

#[tokio::test]
async fn unreadable_saved_data_is_kept_and_reported() -> Result<(), BoxError> {
    let page = browser::open().await?;
    fresh(&page).await?;
    let c = &page.client;
    c.execute(
        "localStorage.setItem('stillroom.scenario', '{\"charge\": {\"plant_mass_kg\": \"heaps\"}}');",
        vec![],
    )
    .await?;
    c.refresh().await?;
    let notice = c.wait().at_most(WAIT).for_element(Locator::Css("[data-out=storage_notice]")).await?;
    assert!(notice.text().await?.contains("could not be read"));
    let kept = c
        .execute(
            "return Object.keys(localStorage).filter(k => k.startsWith('stillroom.unreadable.')).map(k => localStorage.getItem(k));",
            vec![],
        )
        .await?;
    assert_eq!(kept, serde_json::json!(["{\"charge\": {\"plant_mass_kg\": \"heaps\"}}"]));
    // The example plan is shown instead.
    assert_ne!(out(c, "water_boiling_point").await?, "–");
    page.close().await
}

#[tokio::test]
async fn the_cautions_are_always_on_the_page() -> Result<(), BoxError> {
    let page = browser::open().await?;
    fresh(&page).await?;
    let text = page.client.find(Locator::Css(".cautions")).await?.text().await?;
    for needle in ["scald", "never be sealed", "burn", "local codes"] {
        assert!(text.contains(needle), "cautions lack {needle:?}");
    }
    page.close().await
}
