//! Batch records in the workbench on the built page, in headless Chromium: three runs logged
//! (one with an earlier oil reading) give a fitted oil content and recovery rate that "Plan with
//! these" puts into the plan's form with the plan's note; delete and undo; the log exported as
//! JSON and imported into a fresh browser profile; the CSV; an old (version 1) run log migrated
//! and shown; one batch record printed alone on one page. The runs are invented (Larkfield
//! Farm, a fictional farm); their oil follows the first-order law with 1.1 % and 0.04 /min.

use fantoccini::{Client, Locator};
use serde_json::{Value, json};
use std::time::{Duration, Instant};
use stillroom_tests::BoxError;
use stillroom_tests::browser::{self, Page, WAIT, pdf_pages, wait_text};
use stillroom_tests::drive::{self, count, fill, wait_count};

/// Counts `window.print()` calls without opening a print dialogue.
const COUNT_PRINTS: &str = "window.__printed = 0; window.print = function () { window.__printed += 1; };";

async fn start(page: &Page, runs: Option<&str>) -> Result<(), BoxError> {
    page.before_load(drive::CAPTURE_DOWNLOADS).await?;
    page.before_load(COUNT_PRINTS).await?;
    page.goto("").await?;
    page.client.execute("localStorage.clear();", vec![]).await?;
    if let Some(raw) = runs {
        page.client
            .execute("localStorage.setItem('stillroom.runs', arguments[0]);", vec![json!(raw)])
            .await?;
    }
    page.client.refresh().await?;
    page.client.wait().at_most(WAIT).for_element(Locator::Id("f-plant_mass")).await?;
    Ok(())
}

async fn open_workbench(c: &Client) -> Result<(), BoxError> {
    c.find(Locator::Id("mode-workbench")).await?.click().await?;
    c.wait().at_most(WAIT).for_element(Locator::Id("run-log")).await?;
    Ok(())
}

async fn value(c: &Client, id: &str) -> Result<String, BoxError> {
    Ok(c.find(Locator::Id(id)).await?.prop("value").await?.unwrap_or_default())
}

/// Logs one run: charge kg, minutes, oil mL, and optionally an earlier (minutes, mL).
async fn log_run(
    c: &Client,
    kg: &str,
    min: &str,
    ml: &str,
    earlier: Option<(&str, &str)>,
) -> Result<(), BoxError> {
    let before = count(c, ".run-card").await?;
    fill(c, "#run-mass", kg).await?;
    fill(c, "#run-minutes", min).await?;
    fill(c, "#run-oil", ml).await?;
    if let Some((t, v)) = earlier {
        fill(c, "#run-early-min", t).await?;
        fill(c, "#run-early-oil", v).await?;
    }
    c.find(Locator::Id("run-log")).await?.click().await?;
    wait_count(c, ".run-card", before + 1).await
}

/// The first number in a text ("1.10 % ± 0.01 from 3 runs" -> 1.10).
fn first_number(text: &str) -> f64 {
    let start = text.find(|c: char| c.is_ascii_digit()).unwrap_or(0);
    let digits: String = text[start..].chars().take_while(|c| c.is_ascii_digit() || *c == '.').collect();
    digits.parse().unwrap_or(f64::NAN)
}

#[tokio::test]
async fn three_runs_calibrate_the_plan_and_the_log_travels() -> Result<(), BoxError> {
    let page = browser::open().await?;
    start(&page, None).await?;
    let c = &page.client;
    let oil_before = wait_text(c, "[data-out=oil_mass]", |t| !t.is_empty() && t != "–").await?;
    open_workbench(c).await?;
    // The lot follows the page's pattern: crop code, year, running number.
    let lot = value(c, "run-lot").await?;
    assert!(lot.starts_with("LAV-") && lot.ends_with("-001"), "{lot}");
    // A field's error is beside it, and nothing is logged.
    c.find(Locator::Id("run-log")).await?.click().await?;
    wait_text(c, "#run-mass-error", |t| t.contains("charge")).await?;
    assert_eq!(count(c, ".run-card").await?, 0);

    // 20 kg each; 1.1 % and 0.04 /min (invented): 30 min 174 mL, 60 min 226 mL with 112 mL at
    // 15 min, 100 min 244 mL.
    log_run(c, "20", "30", "174", None).await?;
    log_run(c, "20", "60", "226", Some(("15", "112"))).await?;
    log_run(c, "20", "100", "244", None).await?;
    // A lot already in the log is refused beside its field.
    fill(c, "#run-lot", &lot).await?;
    fill(c, "#run-mass", "20").await?;
    fill(c, "#run-minutes", "40").await?;
    fill(c, "#run-oil", "190").await?;
    c.find(Locator::Id("run-log")).await?.click().await?;
    wait_text(c, "#run-lot-error", |t| t.contains("already in your log")).await?;
    assert_eq!(count(c, ".run-card").await?, 3);
    // Newest first.
    let first = c.find(Locator::Css(".run-card")).await?.attr("data-run").await?.unwrap_or_default();
    assert!(first.ends_with("-003"), "{first}");

    let content = wait_text(c, "[data-out=cal_content]", |t| t.contains("from 3 runs")).await?;
    let rate = wait_text(c, "[data-out=cal_rate]", |t| t.contains("from 3 runs")).await?;
    let (c_pct, k) = (first_number(&content), first_number(&rate));
    // The steam of the Larkfield plan differs from lavender's usual rate, so k is referred back
    // to it; the content is near the 1.1 % the runs were made from.
    assert!((c_pct - 1.1).abs() < 0.05, "{content}");
    assert!(k > 0.01 && k < 0.2, "{rate}");
    c.execute("document.querySelector('[data-out=calibration]').scrollIntoView();", vec![]).await?;
    std::fs::write(std::env::temp_dir().join("stillroom-runs-412x915.png"), c.screenshot().await?)?;

    c.find(Locator::Id("run-use")).await?.click().await?;
    // A note about where the numbers come from: under "how sure", not "Watch out".
    c.wait().at_most(WAIT).for_element(Locator::Css("[data-out=how_sure]")).await?;
    c.execute("document.querySelector('[data-out=how_sure]').open = true;", vec![]).await?;
    let note = wait_text(c, "[data-out=how_sure]", |t| t.contains("3 of your logged runs")).await?;
    assert_eq!(
        count(c, ".warnings [data-warning=own_calibration]").await?,
        0,
        "listed as something to act on"
    );
    assert!(note.contains(&format!("{c_pct:.2} %")), "{note} / {content}");
    let typed_c: f64 = value(c, "f-oil_content").await?.parse()?;
    let typed_k: f64 = value(c, "f-rate_constant").await?.parse()?;
    assert!((typed_c - c_pct).abs() < 0.006, "{typed_c} against {content}");
    assert!((typed_k - k).abs() < 0.0006, "{typed_k} against {rate}");
    wait_text(c, "[data-out=oil_mass]", |t| !t.is_empty() && t != oil_before).await?;
    // Another oil content: the note goes.
    fill(c, "#f-oil_content", "1.5").await?;
    let start_wait = Instant::now();
    loop {
        c.execute("const d = document.querySelector('[data-out=how_sure]'); if (d) d.open = true;", vec![])
            .await?;
        let shown = match c.find(Locator::Css("[data-out=how_sure]")).await {
            Ok(e) => e.text().await.unwrap_or_default(),
            Err(_) => String::new(),
        };
        if !shown.contains("logged runs") {
            break;
        }
        assert!(start_wait.elapsed() < WAIT, "the note stays after the content changed");
        tokio::time::sleep(Duration::from_millis(50)).await;
    }

    // Delete the newest run, then undo.
    open_workbench(c).await?;
    c.find(Locator::Css(".run-card .run-delete")).await?.click().await?;
    wait_count(c, ".run-card", 2).await?;
    wait_text(c, "[data-out=run_removed]", |t| t.contains("deleted")).await?;
    c.find(Locator::Id("run-undo")).await?.click().await?;
    wait_count(c, ".run-card", 3).await?;

    // CSV: a header and a line a run, metric units named.
    c.find(Locator::Id("run-export-csv")).await?.click().await?;
    let (name, csv) = drive::last_download(c).await?;
    assert!(name.ends_with(".csv"), "{name}");
    let lines: Vec<&str> = csv.lines().collect();
    assert!(lines[0].starts_with("lot,date,crop,plant_part,charge_kg,distilled_min"), "{csv}");
    assert_eq!(lines.len(), 4, "{csv}");
    assert!(
        lines.iter().any(|l| l.contains(",60,") && l.contains(",226,") && l.contains(",15,112,")),
        "{csv}"
    );

    // The log as JSON: the run-log record, version 2.
    c.find(Locator::Id("run-export")).await?.click().await?;
    let (name, exported) = drive::last_download(c).await?;
    assert!(name.ends_with(".json"), "{name}");
    let record: Value = serde_json::from_str(&exported)?;
    assert_eq!(record["record_version"], 2);
    assert_eq!(record["runs"].as_array().map(Vec::len), Some(3));

    // One batch record printed: one page, A4 and US Letter, no form fields.
    c.find(Locator::Css(".run-card .run-print")).await?.click().await?;
    assert_eq!(c.execute("return window.__printed;", vec![]).await?, json!(1));
    page.cdp("Emulation.setEmulatedMedia", json!({ "media": "print" })).await?;
    let shown = c
        .execute(
            r#"const seen = (e) => e.getClientRects().length > 0;
               return {
                 fields: [...document.querySelectorAll('input, select, textarea, button')].filter(seen).length,
                 sheet: seen(document.getElementById('batch-print')) ? document.getElementById('batch-print').innerText : '',
                 cls: document.documentElement.className };"#,
            vec![],
        )
        .await?;
    assert_eq!(shown["fields"], 0, "{shown}");
    let sheet = shown["sheet"].as_str().unwrap_or_default();
    assert!(sheet.contains(&first) && sheet.contains("Oil collected") && sheet.contains("244 mL"), "{shown}");
    // Back on screen to tap (print media hides every button); printing to PDF uses print media
    // by itself. Printing fires `afterprint`, which leaves print mode: each paper is a fresh tap.
    page.cdp("Emulation.setEmulatedMedia", json!({ "media": "" })).await?;
    for (i, sheet) in [browser::A4, browser::LETTER].into_iter().enumerate() {
        let paper = sheet.name;
        if i > 0 {
            c.find(Locator::Css(".run-card .run-print")).await?.click().await?;
        }
        let bytes = page.print_pdf(sheet).await?;
        assert!(bytes.starts_with(b"%PDF"), "{paper}: not a PDF");
        std::fs::write(
            std::env::temp_dir().join(format!("stillroom-batch-{}.pdf", paper.replace(' ', "-"))),
            &bytes,
        )?;
        assert_eq!(pdf_pages(&bytes), 1, "{paper}: the batch record prints on one page");
        let after = c
            .execute(
                "return [document.documentElement.className, !!document.getElementById('batch-print')];",
                vec![],
            )
            .await?;
        assert_eq!(after, json!(["", false]), "{paper}: print mode is left after printing");
    }
    page.close().await?;

    // A fresh browser profile: the log imported, then again (nothing twice).
    let page = browser::open().await?;
    start(&page, None).await?;
    let c = &page.client;
    open_workbench(c).await?;
    assert_eq!(count(c, ".run-card").await?, 0);
    let paste = "const t = document.getElementById('run-import-text'); t.value = arguments[0];
                 t.dispatchEvent(new Event('input', { bubbles: true }));";
    c.execute(paste, vec![json!(exported)]).await?;
    c.find(Locator::Id("run-import")).await?.click().await?;
    wait_text(c, "[data-out=run_merged]", |t| t.contains("Added 3 runs")).await?;
    wait_count(c, ".run-card", 3).await?;
    wait_text(c, "[data-out=cal_rate]", |t| t.contains("from 3 runs")).await?;
    c.execute(paste, vec![json!(exported)]).await?;
    c.find(Locator::Id("run-import")).await?.click().await?;
    wait_text(c, "[data-out=run_merged]", |t| t.contains("Added 0 runs") && t.contains("skipped 3")).await?;
    assert_eq!(count(c, ".run-card").await?, 3);
    // Not a log: said beside the box, nothing added.
    c.execute(paste, vec![json!("{\"record_version\":2,\"runs\":{}}")]).await?;
    c.find(Locator::Id("run-import")).await?.click().await?;
    wait_text(c, "#run-import-error", |t| t.contains("Nothing was added")).await?;
    // A run log handed over through the inbox is merged like an import; a clashing lot kept.
    let mut other: Value = serde_json::from_str(&exported)?;
    other["runs"][0]["oil_volume_m3"] = json!(0.0002);
    c.execute(
        "(window.stillroomInbox = window.stillroomInbox || []).push(['runlog', arguments[0]]);
         window.dispatchEvent(new CustomEvent('stillroom-inbox', { detail: 'runlog' }));",
        vec![json!(other.to_string())],
    )
    .await?;
    wait_text(c, "[data-out=run_merged]", |t| t.contains("Added 1 run") && t.contains("-2")).await?;
    wait_count(c, ".run-card", 4).await?;
    page.close().await
}

#[tokio::test]
async fn a_version_1_run_log_is_migrated_and_shown() -> Result<(), BoxError> {
    let v1 = r#"{"record_version":1,"runs":[{"date":"2026-07-14","crop":"lavender","plant_mass_kg":20.0,"distilling_time_s":3600.0,"oil_volume_m3":0.0002,"oil_density_kg_per_m3":885.0,"rate_constant_per_min":0.05,"note":"first cut"}]}"#;
    let page = browser::open().await?;
    start(&page, Some(v1)).await?;
    let c = &page.client;
    open_workbench(c).await?;
    wait_count(c, ".run-card", 1).await?;
    let card = wait_text(c, ".run-card", |t| t.contains("200 mL")).await?;
    assert!(card.contains("LAV-2026-001") && card.contains("2026-07-14"), "{card}");
    // Stored again as version 2, every value kept.
    let start_wait = Instant::now();
    loop {
        let raw = c.execute("return localStorage.getItem('stillroom.runs');", vec![]).await?;
        let record: Value = serde_json::from_str(raw.as_str().unwrap_or("{}"))?;
        if record["record_version"] == 2 {
            let run = &record["runs"][0];
            assert_eq!(
                (run["note"].as_str(), run["oil_volume_m3"].as_f64()),
                (Some("first cut"), Some(0.0002))
            );
            assert_eq!(run["lot"], "LAV-2026-001");
            break;
        }
        assert!(start_wait.elapsed() < WAIT, "never stored as version 2: {raw}");
        tokio::time::sleep(Duration::from_millis(50)).await;
    }
    let kept = c
        .execute(
            "return Object.keys(localStorage).filter((k) => k.startsWith('stillroom.unreadable.')).length;",
            vec![],
        )
        .await?;
    assert_eq!(kept, json!(0), "a version-1 log is read, not kept aside");
    page.close().await
}
