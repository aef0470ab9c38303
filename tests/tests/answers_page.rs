//! The answers on the built release page in headless Chromium at phone size: the four headline
//! answers above the fold, answers marked stale (never silently wrong) while the form has a
//! fault, the typed text kept over a reload, each error on the field that causes it, and
//! numbers read the way people type them.

use fantoccini::{Client, Locator};
use serde_json::json;
use std::time::Duration;
use stillroom_tests::BoxError;
use stillroom_tests::browser::{self, wait_text};

const WAIT: Duration = Duration::from_secs(15);

async fn out(client: &Client, key: &str) -> Result<String, BoxError> {
    Ok(client.find(Locator::Css(&format!("[data-out={key}]"))).await?.text().await?)
}

async fn set_field(client: &Client, key: &str, text: &str) -> Result<(), BoxError> {
    let input = client.find(Locator::Id(&format!("f-{key}"))).await?;
    input.clear().await?;
    input.send_keys(text).await?;
    Ok(())
}

/// Types into a field even inside a folded section, as a paste would, through an input event.
async fn set_hidden_field(client: &Client, key: &str, text: &str) -> Result<(), BoxError> {
    client
        .execute(
            "const i = document.getElementById(arguments[0]); i.value = arguments[1]; i.dispatchEvent(new Event('input', {bubbles: true}));",
            vec![json!(format!("f-{key}")), json!(text)],
        )
        .await?;
    Ok(())
}

/// An element's text whether or not it is on screen (WebDriver's text is empty for hidden ones).
async fn text_content(client: &Client, id: &str) -> Result<String, BoxError> {
    let v =
        client.execute("return document.getElementById(arguments[0]).textContent;", vec![json!(id)]).await?;
    Ok(v.as_str().unwrap_or_default().to_string())
}

async fn fresh(page: &browser::Page) -> Result<(), BoxError> {
    page.goto("").await?;
    page.client.execute("localStorage.clear();", vec![]).await?;
    page.client.refresh().await?;
    page.client.wait().at_most(WAIT).for_element(Locator::Id("f-plant_mass")).await?;
    Ok(())
}

/// Bottom edges of the four headline answers and the top of the first input, in CSS px.
async fn fold(client: &Client) -> Result<(Vec<f64>, f64, f64), BoxError> {
    let v = client
        .execute(
            "const b = k => document.querySelector('[data-out=' + k + ']').closest('.card').getBoundingClientRect().bottom;
             return [['steam_total','water_total','water_boiling_point','separator_size'].map(b),
                     document.getElementById('f-crop').getBoundingClientRect().top, window.innerHeight];",
            vec![],
        )
        .await?;
    let bottoms = v[0].as_array().ok_or("no answers")?.iter().filter_map(|x| x.as_f64()).collect();
    Ok((bottoms, v[1].as_f64().ok_or("no input")?, v[2].as_f64().ok_or("no height")?))
}

#[tokio::test]
async fn the_four_answers_show_without_scrolling_before_any_input() -> Result<(), BoxError> {
    let page = browser::open().await?;
    fresh(&page).await?;
    let c = &page.client;
    wait_text(c, "[data-out=water_boiling_point]", |t| t.ends_with("°C")).await?;
    let summary = out(c, "charge_summary").await?;
    assert!(summary.contains("15 kg lavender"), "{summary}");
    for (w, h) in [(412u32, 915u32), (360, 740)] {
        page.cdp(
            "Emulation.setDeviceMetricsOverride",
            json!({ "width": w, "height": h, "deviceScaleFactor": 1, "mobile": true }),
        )
        .await?;
        tokio::time::sleep(Duration::from_millis(300)).await;
        let png = c.screenshot().await?;
        std::fs::write(std::env::temp_dir().join(format!("stillroom-answers-{w}x{h}.png")), png)?;
        let (bottoms, first_input, height) = fold(c).await?;
        assert_eq!(bottoms.len(), 4);
        if (w, h) == (412, 915) {
            for b in &bottoms {
                assert!(*b < height, "an answer ends at {b} px, below the {height} px screen");
            }
        }
        for b in &bottoms {
            assert!(*b <= first_input, "an answer ({b} px) comes after the first input ({first_input} px)");
        }
        // Each mode tab's label fits inside its button, words unbroken.
        let spill = c
            .execute(
                "return [...document.querySelectorAll('.modes button')]
                   .filter(b => b.scrollWidth > b.clientWidth).map(b => b.textContent);",
                vec![],
            )
            .await?;
        assert_eq!(spill, json!([]), "at {w} px these tab labels spill out of their buttons");
    }
    page.close().await
}

#[tokio::test]
async fn a_typo_keeps_the_last_plan_marked_stale_and_survives_a_reload() -> Result<(), BoxError> {
    let page = browser::open().await?;
    fresh(&page).await?;
    let c = &page.client;
    // Typed key by key, "6" is a valid charge: its plan is the last good one when "O" follows.
    set_field(c, "plant_mass", "6").await?;
    wait_text(c, "[data-out=charge_summary]", |t| t.contains("6 kg")).await?;
    let before = wait_text(c, "[data-out=steam_total]", |t| t.ends_with("kg")).await?;
    c.find(Locator::Id("f-plant_mass")).await?.send_keys("O").await?;
    let note = wait_text(c, "[data-out=plan_stale]", |t| t.contains("Plant in the still")).await?;
    assert!(note.contains("not the form"), "{note}");
    // The last good plan stays, marked; not the typo's value, not a blank.
    assert_eq!(out(c, "steam_total").await?, before);
    assert!(c.find(Locator::Css(".headline.stale")).await.is_ok());
    c.execute("window.scrollTo(0, 0);", vec![]).await?;
    std::fs::write(std::env::temp_dir().join("stillroom-stale-412x915.png"), c.screenshot().await?)?;
    // The line names the field as a link that focuses it.
    c.find(Locator::Css("[data-out=plan_stale] a[href='#f-plant_mass']")).await?.click().await?;
    let focused = c.execute("return document.activeElement.id;", vec![]).await?;
    assert_eq!(focused, json!("f-plant_mass"));
    // What was typed, invalid as it is, comes back after a reload, still marked.
    c.refresh().await?;
    let mass = c.wait().at_most(WAIT).for_element(Locator::Id("f-plant_mass")).await?;
    assert_eq!(mass.prop("value").await?.as_deref(), Some("6O"));
    wait_text(c, "[data-out=plan_stale]", |t| t.contains("Plant in the still")).await?;
    // And the answers shown are still those of the last good entry, 6 kg, not of the value the
    // page was first opened with.
    wait_text(c, "[data-out=charge_summary]", |t| t.contains("6 kg")).await?;
    assert_eq!(out(c, "steam_total").await?, before);
    // Fixed, the marking goes and the plan follows the new value.
    set_field(c, "plant_mass", "60").await?;
    wait_text(c, "[data-out=charge_summary]", |t| t.contains("60 kg")).await?;
    assert!(c.find(Locator::Css("[data-out=plan_stale]")).await.is_err());
    assert_ne!(out(c, "steam_total").await?, before);
    page.close().await
}

#[tokio::test]
async fn an_error_shows_on_the_field_that_causes_it_even_when_folded() -> Result<(), BoxError> {
    let page = browser::open().await?;
    fresh(&page).await?;
    let c = &page.client;
    // The condenser section starts folded; the distillate temperature is left to the crop.
    let open =
        c.execute("return document.getElementById('f-cooling_in').closest('details').open;", vec![]).await?;
    assert_eq!(open, json!(false));
    set_hidden_field(c, "cooling_in", "39").await?;
    let msg = wait_text(c, "#e-cooling_in", |t| !t.is_empty()).await?;
    assert!(msg.to_lowercase().contains("too warm") && msg.contains("Must be at most"), "{msg}");
    assert!(!msg.contains("  ") && !msg.contains(" ."), "{msg}");
    assert_eq!(text_content(c, "e-distillate_out").await?, "");
    let open =
        c.execute("return document.getElementById('f-cooling_in').closest('details').open;", vec![]).await?;
    assert_eq!(open, json!(true), "the section holding the fault opens");
    // A measured steam rate far too small is said on the steam rate, not the burner power.
    set_hidden_field(c, "cooling_in", "12").await?;
    set_hidden_field(c, "steam_rate", "0.01").await?;
    wait_text(c, "#e-steam_rate", |t| !t.is_empty()).await?;
    assert_eq!(text_content(c, "e-heat_input").await?, "");
    // Limits are restated in the field's own unit and precision.
    set_hidden_field(c, "steam_rate", "").await?;
    set_hidden_field(c, "efficiency", "1").await?;
    // (WebDriver reads the no-break space between number and unit as a space.)
    wait_text(c, "#e-efficiency", |t| t.replace('\u{a0}', " ") == "Must be at least 5 %.").await?;
    set_hidden_field(c, "efficiency", "").await?;
    set_hidden_field(c, "tube_od", "1").await?;
    wait_text(c, "#e-tube_od", |t| t.replace('\u{a0}', " ") == "Must be at least 2 mm.").await?;
    page.close().await
}

#[tokio::test]
async fn numbers_are_read_the_way_people_type_them() -> Result<(), BoxError> {
    let page = browser::open().await?;
    fresh(&page).await?;
    let c = &page.client;
    // The season's harvest over 15 kg charges: the count of charges tells the value read
    // (ceil(harvest / 15 kg)).
    for (typed, charges, note) in [
        ("1,500", "100", "read as 1500"),
        ("1.500,5", "101", ""),
        ("1,5", "1", ""),
        ("1 500", "100", ""),
        ("1,500.5", "101", ""),
        ("3 000", "200", ""),
        ("15 0", "10", "read as 150"),
    ] {
        set_hidden_field(c, "harvest", typed).await?;
        wait_text(c, "[data-out=season_charges]", |t| t == charges)
            .await
            .map_err(|e| format!("{typed}: {e}"))?;
        assert_eq!(text_content(c, "n-harvest").await?, note, "{typed}");
        assert_eq!(text_content(c, "e-harvest").await?, "", "{typed}");
    }
    // The Unicode minus is a minus: 3 m below sea level, USSA 1976: 101.36 kPa.
    set_field(c, "altitude", "\u{2212}3").await?;
    wait_text(c, "[data-out=pressure]", |t| t == "101.4 kPa").await?;
    page.close().await
}

#[tokio::test]
async fn every_price_and_cost_names_the_currency() -> Result<(), BoxError> {
    let page = browser::open().await?;
    fresh(&page).await?;
    let c = &page.client;
    set_hidden_field(c, "currency", "NZD").await?;
    set_hidden_field(c, "fuel_price", "3").await?;
    let cost = wait_text(c, "[data-out=cost]", |t| t.contains("NZD")).await?;
    assert!(cost.chars().next().is_some_and(|ch| ch.is_ascii_digit()), "{cost}");
    let label = c
        .execute("return document.querySelector('label[for=f-fuel_price] .unit').textContent;", vec![])
        .await?;
    assert_eq!(label, json!("NZD per kg"), "propane is sold by the kg");
    page.close().await
}
