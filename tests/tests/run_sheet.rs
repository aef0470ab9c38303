//! The printed run sheet: the plan on one page of A4 and of US Letter, with the answers, the
//! site, charge, equipment and time line, the cautions and blank lines for the run's figures,
//! and none of the form.

use fantoccini::Locator;
use serde_json::json;
use stillroom_tests::BoxError;
use stillroom_tests::browser::{self, A4, LETTER, WAIT, pdf_pages, wait_text};

#[tokio::test]
async fn the_run_sheet_prints_on_one_page_with_no_form() -> Result<(), BoxError> {
    let page = browser::open().await?;
    page.goto("").await?;
    page.client.execute("localStorage.clear();", vec![]).await?;
    page.client.refresh().await?;
    let c = &page.client;
    c.wait().at_most(WAIT).for_element(Locator::Id("f-plant_mass")).await?;
    let total = wait_text(c, "[data-out=total_time]", |t| t.contains("min")).await?;
    // Every fold of the form open, as a grower may leave it: print must still drop it.
    c.execute("document.querySelectorAll('details').forEach((d) => { d.open = true; });", vec![]).await?;
    page.cdp("Emulation.setEmulatedMedia", json!({"media": "print"})).await?;
    let shown: serde_json::Value = c
        .execute(
            r#"const seen = (el) => el.getClientRects().length > 0 && getComputedStyle(el).visibility !== 'hidden';
               return {
                 fields: [...document.querySelectorAll('input, select, textarea, button')].filter(seen).length,
                 sheet: [...document.querySelectorAll('.run-sheet')].filter(seen).length,
                 text: document.body.innerText,
               };"#,
            vec![],
        )
        .await?;
    assert_eq!(shown["fields"], json!(0), "form controls print");
    assert_eq!(shown["sheet"], json!(1), "the run sheet does not print");
    let text = shown["text"].as_str().unwrap_or_default();
    for part in [
        "Steam for the run",
        "Separator",
        "likely",
        "Site",
        "Charge",
        "Equipment",
        "Time line",
        "This run, as it went",
        "Oil collected",
        "Safety first",
        &total,
    ] {
        assert!(text.contains(part), "the sheet lacks {part:?}");
    }
    std::fs::write(std::env::temp_dir().join("stillroom-run-sheet.png"), c.screenshot().await?)?;
    page.cdp("Emulation.setEmulatedMedia", json!({"media": ""})).await?;
    for paper in [A4, LETTER] {
        let pdf = page.print_pdf(paper).await?;
        std::fs::write(std::env::temp_dir().join(format!("stillroom-run-sheet-{}.pdf", paper.name)), &pdf)?;
        assert_eq!(pdf_pages(&pdf), 1, "the run sheet takes more than one page of {}", paper.name);
    }
    // US units print in US units.
    c.find(Locator::Id("units-us")).await?.click().await?;
    wait_text(c, "[data-out=water_boiling_point]", |t| t.ends_with("°F")).await?;
    assert_eq!(pdf_pages(&page.print_pdf(LETTER).await?), 1);
    page.close().await
}
