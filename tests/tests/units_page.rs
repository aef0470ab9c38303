//! The units choice on the built release page: US customary and back gives the same plan, the
//! choice is remembered, and the first bytes of the page already say it is loading.

use fantoccini::{Client, Locator};
use std::time::Duration;
use stillroom_tests::BoxError;
use stillroom_tests::browser;

const WAIT: Duration = Duration::from_secs(15);

/// Every output on the page, by its `data-out` name.
async fn outputs(client: &Client) -> Result<serde_json::Value, BoxError> {
    Ok(client
        .execute(
            "return Object.fromEntries([...document.querySelectorAll('[data-out]')].map(e => [e.dataset.out, e.textContent]));",
            vec![],
        )
        .await?)
}

async fn value(client: &Client, key: &str) -> Result<String, BoxError> {
    Ok(client.find(Locator::Id(&format!("f-{key}"))).await?.prop("value").await?.unwrap_or_default())
}

async fn wait_out(client: &Client, key: &str, ok: impl Fn(&str) -> bool) -> Result<String, BoxError> {
    let start = std::time::Instant::now();
    loop {
        let got = match client.find(Locator::Css(&format!("[data-out={key}]"))).await {
            Ok(e) => e.text().await.unwrap_or_default(),
            Err(_) => String::new(),
        };
        if ok(&got) {
            return Ok(got);
        }
        if start.elapsed() > WAIT {
            return Err(format!("{key}: page shows {got:?}").into());
        }
        tokio::time::sleep(Duration::from_millis(50)).await;
    }
}

fn number(text: &str) -> f64 {
    let t: String = text.chars().filter(|c| c.is_ascii_digit() || *c == '.' || *c == '−').collect();
    t.replace('−', "-").parse().unwrap_or(f64::NAN)
}

#[tokio::test]
async fn us_units_and_back_give_the_same_plan_and_are_remembered() -> Result<(), BoxError> {
    let page = browser::open().await?;
    page.goto("").await?;
    page.client.execute("localStorage.clear();", vec![]).await?;
    page.client.refresh().await?;
    let c = &page.client;
    c.wait().at_most(WAIT).for_element(Locator::Id("f-plant_mass")).await?;
    let celsius = wait_out(c, "water_boiling_point", |t| t.ends_with("°C")).await?;
    let metric = outputs(c).await?;
    let saved = c.execute("return localStorage.getItem('stillroom.scenario');", vec![]).await?;

    c.find(Locator::Id("units-us")).await?.click().await?;
    let fahrenheit = wait_out(c, "water_boiling_point", |t| t.ends_with("°F")).await?;
    // t/°F = 1.8 t/°C + 32 (NIST SP 811 B.8), to the one decimal shown.
    assert!(
        (number(&fahrenheit) - (number(&celsius) * 1.8 + 32.0)).abs() <= 0.1,
        "{celsius} vs {fahrenheit}"
    );
    // 15 kg is 33.07 lb (1 lb = 0.453 592 37 kg exactly, SP 811), written to four figures.
    assert_eq!(value(c, "plant_mass").await?, "33.07");
    assert!(wait_out(c, "steam_total", |t| t.ends_with("lb")).await?.ends_with("lb"));
    std::fs::write(std::env::temp_dir().join("stillroom-us-412x915.png"), c.screenshot().await?)?;
    let label = c.find(Locator::Css("label[for=f-plant_mass] .unit")).await?.text().await?;
    assert_eq!(label, "lb");
    // The scenario saved is the same SI scenario.
    tokio::time::sleep(Duration::from_millis(300)).await;
    assert_eq!(c.execute("return localStorage.getItem('stillroom.scenario');", vec![]).await?, saved);

    // Remembered over a reload.
    c.refresh().await?;
    c.wait().at_most(WAIT).for_element(Locator::Id("f-plant_mass")).await?;
    wait_out(c, "water_boiling_point", |t| t.ends_with("°F")).await?;

    c.find(Locator::Id("units-metric")).await?.click().await?;
    wait_out(c, "water_boiling_point", |t| t.ends_with("°C")).await?;
    assert_eq!(value(c, "plant_mass").await?, "15");
    tokio::time::sleep(Duration::from_millis(300)).await;
    assert_eq!(outputs(c).await?, metric, "the round trip changed the plan");
    assert_eq!(c.execute("return localStorage.getItem('stillroom.scenario');", vec![]).await?, saved);
    page.close().await
}

#[tokio::test]
async fn the_weather_report_takes_inhg_or_hpa() -> Result<(), BoxError> {
    let page = browser::open().await?;
    page.goto("").await?;
    page.client.execute("localStorage.clear();", vec![]).await?;
    page.client.refresh().await?;
    let c = &page.client;
    c.wait().at_most(WAIT).for_element(Locator::Id("f-plant_mass")).await?;
    c.find(Locator::Id("p-sea-level")).await?.click().await?;
    let input = c.wait().at_most(WAIT).for_element(Locator::Id("f-sea_level_pressure")).await?;
    input.clear().await?;
    input.send_keys("1013.25").await?;
    let hpa = wait_out(c, "pressure", |t| t.ends_with("kPa")).await?;
    input.clear().await?;
    // 29.92 inHg × 3386.389 Pa/inHg (SP 811) = 1013.2 hPa: the same air.
    input.send_keys("29.92").await?;
    let note = c.find(Locator::Id("n-sea_level_pressure")).await?;
    let start = std::time::Instant::now();
    while !note.text().await?.contains("inHg") && start.elapsed() < WAIT {
        tokio::time::sleep(Duration::from_millis(50)).await;
    }
    assert!(note.text().await?.contains("inHg"));
    let inhg = wait_out(c, "pressure", |t| t.ends_with("kPa")).await?;
    assert!((number(&hpa) - number(&inhg)).abs() <= 0.1, "{hpa} vs {inhg}");
    page.close().await
}

#[tokio::test]
async fn the_first_bytes_say_the_page_is_loading() -> Result<(), BoxError> {
    let html = browser::read_dist("index.html")?;
    let at = html.find("Stillroom is loading").ok_or("no loading message in index.html")?;
    assert!(at < 2048, "the loading message starts at byte {at}");
    let page = browser::open().await?;
    page.goto("").await?;
    let c = &page.client;
    c.wait().at_most(WAIT).for_element(Locator::Id("f-plant_mass")).await?;
    // Mounted, the app has taken the message away.
    assert!(c.find(Locator::Id("loading")).await.is_err());
    page.close().await
}
