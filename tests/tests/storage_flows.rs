//! Saved data on the built page, in headless Chromium: every way a stored record can be
//! unreadable, storage too full to copy it aside, storage full on save, storage unavailable.
//! In each case the grower is told, the page keeps working, and nothing stored earlier is lost.

use fantoccini::{Client, Locator};
use serde_json::{Value, json};
use std::time::{Duration, Instant};
use stillroom_tests::BoxError;
use stillroom_tests::browser::{self, Page, WAIT};
use stillroom_tests::drive::{self, last_download, stored, wait_stored};

async fn start(page: &Page) -> Result<(), BoxError> {
    page.before_load(drive::CAPTURE_DOWNLOADS).await?;
    page.goto("").await?;
    page.client.execute("localStorage.clear();", vec![]).await?;
    reload(page).await
}

async fn reload(page: &Page) -> Result<(), BoxError> {
    page.client.refresh().await?;
    page.client.wait().at_most(WAIT).for_element(Locator::Id("f-plant_mass")).await?;
    Ok(())
}

async fn text(c: &Client, css: &str) -> String {
    match c.find(Locator::Css(css)).await {
        Ok(e) => e.text().await.unwrap_or_default(),
        Err(_) => String::new(),
    }
}

/// Waits until the element's text holds every needle.
async fn wait_text(c: &Client, css: &str, needles: &[&str]) -> Result<String, BoxError> {
    let start = Instant::now();
    loop {
        let got = text(c, css).await;
        if needles.iter().all(|n| got.contains(n)) {
            return Ok(got);
        }
        if start.elapsed() > WAIT {
            return Err(format!("{css}: wanted {needles:?}, page shows {got:?}").into());
        }
        tokio::time::sleep(Duration::from_millis(50)).await;
    }
}

async fn wait_gone(c: &Client, css: &str) -> Result<(), BoxError> {
    let start = Instant::now();
    while c.find(Locator::Css(css)).await.is_ok() {
        if start.elapsed() > WAIT {
            return Err(format!("{css} is still on the page: {:?}", text(c, css).await).into());
        }
        tokio::time::sleep(Duration::from_millis(50)).await;
    }
    Ok(())
}

async fn set_field(c: &Client, key: &str, value: &str) -> Result<(), BoxError> {
    let input = c.find(Locator::Id(&format!("f-{key}"))).await?;
    input.clear().await?;
    input.send_keys(value).await?;
    Ok(())
}

/// The kept-aside copies in storage: their texts, by key order.
async fn kept(c: &Client) -> Result<Vec<String>, BoxError> {
    let v = c
        .execute(
            "return Object.keys(localStorage).filter((k) => k.startsWith('stillroom.unreadable.')).sort()
                 .map((k) => localStorage.getItem(k));",
            vec![],
        )
        .await?;
    Ok(serde_json::from_value(v)?)
}

async fn plans(c: &Client) -> Result<(), BoxError> {
    let t = text(c, "[data-out=water_boiling_point]").await;
    assert!(!t.is_empty() && t != "–", "the page shows no plan: {t:?}");
    Ok(())
}

#[tokio::test]
async fn every_unreadable_record_is_kept_aside_reported_and_left_alone() -> Result<(), BoxError> {
    let page = browser::open().await?;
    start(&page).await?;
    let c = &page.client;
    let record = wait_stored(c, "stillroom.scenario", |t| t.contains("record_version")).await?;
    let truncated = record[..record.len() / 2].to_string();
    let cases: Vec<(&str, String, &str)> = vec![
        ("stillroom.scenario", "{broken json".into(), "not JSON"),
        ("stillroom.scenario", truncated, "EOF"),
        ("stillroom.scenario", r#"{"hello":"world"}"#.into(), "hello"),
        ("stillroom.scenario", "[]".into(), "a list"),
        ("stillroom.scenario", r#"{"record_version":"1","scenario":{}}"#.into(), "record_version"),
        (
            "stillroom.scenario",
            r#"{"record_version":1,"scenario":{"charge":{"plant_mas_kg":20}}}"#.into(),
            "plant_mas_kg",
        ),
        (
            "stillroom.scenario",
            r#"{"record_version":2,"scenario":{"charge":{"plant_mass_kg":20}}}"#.into(),
            "newer",
        ),
        // A scenario format newer than this page reads, inside a record of a version it reads.
        (
            "stillroom.scenario",
            r#"{"record_version":1,"scenario":{"version":2,"charge":{"plant_mass_kg":20}}}"#.into(),
            "newer version",
        ),
        ("stillroom.runs", r#"{"record_version":1,"runs":[{"x":1},{}]}"#.into(), "runs[0]"),
        ("stillroom.runs", r#"{"record_version":3,"runs":[]}"#.into(), "newer"),
        // The workbench's saved plans and stills, told on the first screen too.
        ("stillroom.library", r#"{"record_version":1,"plans":[{"x":1}],"stills":[]}"#.into(), "plans[0]"),
        ("stillroom.library", r#"{"record_version":2,"plans":[],"stills":[]}"#.into(), "newer"),
    ];
    for (key, raw, why) in cases {
        c.execute(
            "localStorage.clear(); localStorage.setItem(arguments[0], arguments[1]);",
            vec![json!(key), json!(raw)],
        )
        .await?;
        reload(&page).await?;
        let which = match key {
            "stillroom.runs" => "saved run log",
            "stillroom.library" => "saved plans and stills",
            _ => "saved plan",
        };
        wait_text(c, "[data-out=storage_notice]", &[which, "could not be read", "kept under"])
            .await
            .map_err(|e| format!("{raw}: {e}"))?;
        assert_eq!(
            kept(c).await?,
            std::slice::from_ref(&raw),
            "{raw}: the copy is the stored text, unchanged"
        );
        wait_text(c, "[data-kept='0']", &[why]).await?;
        plans(c).await?;
        // The grower carries on; the copy stays, and a reload finds nothing new to complain of.
        set_field(c, "plant_mass", "21").await?;
        wait_stored(c, "stillroom.scenario", |t| t.contains("\"plant_mass_kg\":21")).await?;
        reload(&page).await?;
        wait_gone(c, "[data-out=storage_notice]").await?;
        assert_eq!(kept(c).await?, std::slice::from_ref(&raw), "{raw}: still kept after a reload");
        wait_text(c, "[data-kept='0']", &["kept aside"]).await?;
    }
    page.close().await
}

#[tokio::test]
async fn a_fault_inside_a_logged_run_is_kept_aside_when_the_workbench_reads_it() -> Result<(), BoxError> {
    let page = browser::open().await?;
    start(&page).await?;
    let c = &page.client;
    // Whole in outline (JSON, its version, a run with the fields a run must have), but a
    // number typed as a word: only the workbench's field-by-field reading finds it.
    let raw = r#"{"record_version":2,"runs":[{"plant_mass_kg":"twenty","distilling_time_s":3600,"oil_volume_m3":1e-5}]}"#;
    c.execute(
        "localStorage.clear(); localStorage.setItem('stillroom.runs', arguments[0]);",
        vec![json!(raw)],
    )
    .await?;
    reload(&page).await?;
    plans(c).await?;
    assert!(c.find(Locator::Css("[data-out=storage_notice]")).await.is_err(), "nothing to tell yet");
    assert_eq!(kept(c).await?, Vec::<String>::new());
    c.find(Locator::Id("mode-workbench")).await?.click().await?;
    wait_text(
        c,
        "[data-out=workbench_notice]",
        &["saved run log could not be read", "kept under", "top of the page"],
    )
    .await?;
    assert_eq!(kept(c).await?, vec![raw.to_string()], "the copy is the stored text, unchanged");
    // The plan page's list, read at start, lists it now too.
    wait_text(
        c,
        "[data-kept='0']",
        &["Saved run log", "its outline reads", "the workbench checks each field"],
    )
    .await?;
    // Opened from there, the workbench says what it still cannot read.
    c.find(Locator::Css("[data-kept='0'] .kept-open")).await?.click().await?;
    wait_text(c, "[data-out=run_merged]", &["could not be read", "runs[0]", "plant_mass_kg"]).await?;
    page.close().await
}

#[tokio::test]
async fn a_record_too_large_to_copy_aside_is_never_saved_over() -> Result<(), BoxError> {
    let page = browser::open().await?;
    start(&page).await?;
    let c = &page.client;
    // 1.5 million characters of a record cut off mid-way: unreadable, and too large to copy
    // once the rest of the storage is full.
    const MAKE: &str = "return '{\"record_version\":1,\"scenario\":\"' + 'y'.repeat(1500000);";
    let big = c.execute(MAKE, vec![]).await?;
    let big = big.as_str().ok_or("no text")?.to_string();
    c.execute(
        "localStorage.clear(); localStorage.setItem('stillroom.scenario', arguments[0]);",
        vec![json!(big)],
    )
    .await?;
    let filled = page.fill_storage().await?;
    println!("stored record {} chars, filler {filled} chars", big.len());
    reload(&page).await?;
    wait_text(c, "[data-out=storage_notice]", &["could not be read", "no room", "will not save over it"])
        .await?;
    wait_text(c, "[data-key='stillroom.scenario']", &["still in its place"]).await?;
    plans(c).await?;
    // An edit is refused a place and said so; the unreadable original stays, byte for byte.
    set_field(c, "plant_mass", "21").await?;
    wait_text(c, "[data-out=save_problem]", &["Not saved", "in the way"]).await?;
    assert!(
        stored(c, "stillroom.scenario").await?.as_deref() == Some(big.as_str()),
        "the original was rewritten"
    );
    wait_text(c, "[data-out=save_toast]", &["Not saved"]).await?;
    c.find(Locator::Id("save-toast-hide")).await?.click().await?;
    wait_gone(c, "[data-out=save_toast]").await?;
    // Its download is the whole original.
    c.find(Locator::Css("[data-key='stillroom.scenario'] .kept-download")).await?.click().await?;
    let (name, text) = last_download(c).await?;
    assert!(name.ends_with(".json"), "{name}");
    assert_eq!(text.len(), big.len());
    assert!(text == big, "the download differs from the stored record");
    // With room made elsewhere, the next edit copies it aside first, then saves.
    page.unfill_storage().await?;
    set_field(c, "plant_mass", "22").await?;
    wait_stored(c, "stillroom.scenario", |t| t.contains("\"plant_mass_kg\":22")).await?;
    assert!(kept(c).await? == [big.clone()], "the original was not copied aside whole");
    wait_gone(c, "[data-out=save_problem]").await?;
    wait_text(c, "[data-kept='0']", &["kept aside"]).await?;
    page.close().await
}

#[tokio::test]
async fn a_save_into_full_storage_is_told_at_once_and_offered_as_a_download() -> Result<(), BoxError> {
    let page = browser::open().await?;
    start(&page).await?;
    let c = &page.client;
    set_field(c, "plant_mass", "33").await?;
    wait_stored(c, "stillroom.scenario", |t| t.contains("\"plant_mass_kg\":33")).await?;
    let filled = page.fill_storage().await?;
    println!("storage filled with {filled} chars");
    set_field(c, "plant_mass", "33.123456789").await?;
    wait_text(c, "[data-out=save_problem]", &["Not saved", "full"]).await?;
    wait_text(c, "[data-out=save_toast]", &["Not saved"]).await?;
    plans(c).await?;
    // What was saved before is still there.
    let before = stored(c, "stillroom.scenario").await?.unwrap_or_default();
    // (A save follows each edit: the last that fitted is kept, the one that did not is not.)
    assert!(before.contains("\"plant_mass_kg\":33") && !before.contains("33.123456789"), "{before}");
    // Everything on the page, latest entry included, comes as one file.
    c.find(Locator::Id("download-all")).await?.click().await?;
    let (name, text) = last_download(c).await?;
    assert!(name.starts_with("stillroom-everything-") && name.ends_with(".json"), "{name}");
    let all: Value = serde_json::from_str(&text)?;
    assert_eq!(all["plan_record"]["scenario"]["charge"]["plant_mass_kg"], json!(33.123456789));
    // No run was logged in this browser: the file says so rather than invent a log.
    assert_eq!(all["run_log_record"], Value::Null);
    // Room again: the next change saves everything and the notice goes.
    page.unfill_storage().await?;
    set_field(c, "altitude", "100").await?;
    let now = wait_stored(c, "stillroom.scenario", |t| t.contains("\"altitude_m\":100")).await?;
    assert!(now.contains("\"plant_mass_kg\":33.123456789"), "{now}");
    wait_gone(c, "[data-out=save_problem]").await?;
    page.close().await
}

#[tokio::test]
async fn with_no_storage_at_all_the_page_works_and_says_so() -> Result<(), BoxError> {
    let page = browser::open().await?;
    page.before_load(drive::CAPTURE_DOWNLOADS).await?;
    page.before_load(
        "Object.defineProperty(window, 'localStorage', { configurable: true,
             get() { throw new DOMException('The operation is insecure.', 'SecurityError'); } });",
    )
    .await?;
    page.goto("").await?;
    let c = &page.client;
    c.wait().at_most(WAIT).for_element(Locator::Id("f-plant_mass")).await?;
    wait_text(c, "[data-out=storage_notice]", &["cannot be read here", "Download everything"]).await?;
    wait_text(c, "[data-out=save_problem]", &["Not saved", "not letting the page keep data"]).await?;
    set_field(c, "plant_mass", "27").await?;
    plans(c).await?;
    c.find(Locator::Id("download-all")).await?.click().await?;
    let (_, text) = last_download(c).await?;
    let all: Value = serde_json::from_str(&text)?;
    assert_eq!(all["plan_record"]["scenario"]["charge"]["plant_mass_kg"], json!(27.0));
    page.close().await
}

#[tokio::test]
async fn when_every_write_is_refused_saved_entries_stay_and_the_grower_is_told() -> Result<(), BoxError> {
    let page = browser::open().await?;
    start(&page).await?;
    let c = &page.client;
    set_field(c, "plant_mass", "44").await?;
    let saved = wait_stored(c, "stillroom.scenario", |t| t.contains("\"plant_mass_kg\":44")).await?;
    // As in private windows that allow reading but no writing.
    page.before_load(
        "Storage.prototype.setItem = function () { throw new DOMException('No room.', 'QuotaExceededError'); };",
    )
    .await?;
    reload(&page).await?;
    let mass = c.find(Locator::Id("f-plant_mass")).await?.prop("value").await?;
    assert_eq!(mass.as_deref(), Some("44"));
    set_field(c, "plant_mass", "45").await?;
    wait_text(c, "[data-out=save_problem]", &["Not saved", "full"]).await?;
    plans(c).await?;
    assert_eq!(stored(c, "stillroom.scenario").await?.as_deref(), Some(saved.as_str()));
    page.close().await
}

#[tokio::test]
async fn kept_copies_can_be_downloaded_opened_and_deleted_after_a_second_tap() -> Result<(), BoxError> {
    let page = browser::open().await?;
    start(&page).await?;
    let c = &page.client;
    let plan = r#"{"record_version":1,"scenario":{"charge":{"plant_mass_kg":77.125}}}"#;
    let junk = "{\"record_version\":1,\"runs\":[";
    c.execute(
        "localStorage.setItem('stillroom.unreadable.plan.1000', arguments[0]);
         localStorage.setItem('stillroom.unreadable.runlog.2000', arguments[1]);",
        vec![json!(plan), json!(junk)],
    )
    .await?;
    reload(&page).await?;
    wait_text(c, "[data-kept='0']", &["Saved plan", "it reads now"]).await?;
    wait_text(c, "[data-kept='1']", &["Saved run log", "EOF"]).await?;
    c.find(Locator::Css("[data-kept='0'] .kept-download")).await?.click().await?;
    assert_eq!(last_download(c).await?.1, plan);
    // Opening a kept plan adds it to the workbench's saved plans; the form is not touched.
    c.find(Locator::Css("[data-kept='0'] .kept-open")).await?.click().await?;
    wait_text(c, "#shelf-said", &["The kept copy is saved as “Kept plan, ", "form is unchanged"]).await?;
    let library = wait_stored(c, "stillroom.library", |t| t.contains("77.125")).await?;
    assert!(library.contains("\"name\":\"Kept plan, "), "{library}");
    let mass = c.find(Locator::Id("f-plant_mass")).await?.prop("value").await?;
    assert_eq!(mass.as_deref(), Some("15"));
    c.find(Locator::Id("mode-plan")).await?.click().await?;
    wait_text(c, "[data-kept='0']", &["Opened"]).await?;
    c.find(Locator::Css("[data-kept='1'] .kept-open")).await?.click().await?;
    wait_text(c, "[data-kept='1']", &["still cannot be read"]).await?;
    // Delete asks first; "Keep it" keeps it.
    c.find(Locator::Css("[data-kept='1'] .kept-delete")).await?.click().await?;
    wait_text(c, "[data-kept='1'] .kept-confirm", &["for good"]).await?;
    assert_eq!(kept(c).await?.len(), 2);
    c.find(Locator::Css("[data-kept='1'] .kept-delete-no")).await?.click().await?;
    wait_gone(c, "[data-kept='1'] .kept-confirm").await?;
    assert_eq!(kept(c).await?.len(), 2);
    c.find(Locator::Css("[data-kept='1'] .kept-delete")).await?.click().await?;
    c.find(Locator::Css("[data-kept='1'] .kept-delete-yes")).await?.click().await?;
    wait_gone(c, "[data-kept='1']").await?;
    assert_eq!(kept(c).await?, [plan.to_string()]);
    page.close().await
}

#[tokio::test]
async fn a_held_record_discarded_by_the_grower_frees_its_place_for_the_entries() -> Result<(), BoxError> {
    let page = browser::open().await?;
    start(&page).await?;
    let c = &page.client;
    c.execute(
        "localStorage.clear(); localStorage.setItem('stillroom.scenario', '[' + 'z'.repeat(1500000));",
        vec![],
    )
    .await?;
    page.fill_storage().await?;
    reload(&page).await?;
    wait_text(c, "[data-key='stillroom.scenario']", &["still in its place"]).await?;
    set_field(c, "plant_mass", "23").await?;
    wait_text(c, "[data-out=save_problem]", &["Not saved"]).await?;
    c.find(Locator::Id("save-toast-hide")).await?.click().await?;
    c.find(Locator::Css("[data-key='stillroom.scenario'] .kept-delete")).await?.click().await?;
    assert!(
        stored(c, "stillroom.scenario").await?.is_some_and(|t| t.starts_with("[zzz")),
        "deleted before Yes"
    );
    c.find(Locator::Css("[data-key='stillroom.scenario'] .kept-delete-yes")).await?.click().await?;
    // The entries made meanwhile are saved at once, in the place it held.
    wait_stored(c, "stillroom.scenario", |t| t.contains("\"plant_mass_kg\":23")).await?;
    wait_gone(c, "[data-out=save_problem]").await?;
    wait_gone(c, "#kept-aside").await?;
    page.close().await
}

#[tokio::test]
async fn a_library_record_too_large_to_copy_aside_is_listed_told_and_never_saved_over() -> Result<(), BoxError>
{
    let page = browser::open().await?;
    start(&page).await?;
    let c = &page.client;
    // The workbench's saved plans and stills, cut off mid-way, and no room to copy them aside.
    const MAKE: &str = "return '{\"record_version\":1,\"plans\":[\"' + 'p'.repeat(1500000);";
    let big = c.execute(MAKE, vec![]).await?;
    let big = big.as_str().ok_or("no text")?.to_string();
    c.execute(
        "localStorage.clear(); localStorage.setItem('stillroom.library', arguments[0]);",
        vec![json!(big)],
    )
    .await?;
    page.fill_storage().await?;
    reload(&page).await?;
    // On the first screen: told, and listed where the grower can download or delete it.
    wait_text(c, "[data-out=storage_notice]", &["saved plans and stills", "could not be read", "no room"])
        .await?;
    wait_text(c, "[data-key='stillroom.library']", &["Saved plans and stills", "still in its place"]).await?;
    plans(c).await?;
    // (The plan's own saves fail in full storage too; their bar is set aside.)
    if let Ok(hide) = c.find(Locator::Id("save-toast-hide")).await {
        hide.click().await?;
    }
    // The workbench, which owns the record, tells it too once all its records are read.
    c.find(Locator::Id("mode-workbench")).await?.click().await?;
    wait_text(c, "[data-out=workbench_notice]", &["saved plans and stills", "no room"]).await?;
    // A plan saved there is kept on the page, and the original is not written over.
    drive::fill(c, "#plan-name", "Larkfield north field").await?;
    c.find(Locator::Id("plan-save")).await?.click().await?;
    // (The run log's save may fail beside it, in full storage; the notice then speaks of all.)
    wait_text(c, "#library-unsaved", &["Not saved", "download everything"]).await?;
    wait_text(c, "[data-out=workbench_notice]", &["plans and stills", "no room"]).await?;
    assert!(
        stored(c, "stillroom.library").await?.as_deref() == Some(big.as_str()),
        "the original was rewritten"
    );
    page.close().await
}

/// Whether `<html>` carries `attr` (the marks the page's shell reads before an update reload).
async fn marked(c: &Client, attr: &str) -> Result<bool, BoxError> {
    let v =
        c.execute("return document.documentElement.hasAttribute(arguments[0]);", vec![json!(attr)]).await?;
    Ok(v.as_bool() == Some(true))
}

async fn wait_marked(c: &Client, attr: &str, want: bool) -> Result<(), BoxError> {
    let start = Instant::now();
    while marked(c, attr).await? != want {
        if start.elapsed() > WAIT {
            return Err(format!("<html> {attr}: wanted {want}").into());
        }
        tokio::time::sleep(Duration::from_millis(50)).await;
    }
    Ok(())
}

#[tokio::test]
async fn a_workbench_save_into_full_storage_marks_the_page_and_is_in_the_download() -> Result<(), BoxError> {
    let page = browser::open().await?;
    start(&page).await?;
    let c = &page.client;
    c.find(Locator::Id("mode-workbench")).await?.click().await?;
    c.wait().at_most(WAIT).for_element(Locator::Id("plan-name")).await?;
    drive::fill(c, "#plan-name", "Larkfield before the storage filled").await?;
    c.find(Locator::Id("plan-save")).await?.click().await?;
    wait_stored(c, "stillroom.library", |t| t.contains("Larkfield before the storage filled")).await?;
    assert!(!marked(c, "data-unsaved-workbench").await?);
    page.fill_storage().await?;
    drive::fill(c, "#plan-name", "Larkfield after it filled").await?;
    c.find(Locator::Id("plan-save")).await?.click().await?;
    wait_text(c, "#library-unsaved", &["Not saved"]).await?;
    // The plan's entries fail too; its "Download everything" holds the workbench's entries as
    // they are on the page, not only what storage kept.
    c.find(Locator::Id("mode-plan")).await?.click().await?;
    set_field(c, "plant_mass", "34.123456789").await?;
    wait_text(c, "[data-out=save_problem]", &["Not saved"]).await?;
    c.find(Locator::Id("download-all")).await?.click().await?;
    let (_, text) = last_download(c).await?;
    let all: Value = serde_json::from_str(&text)?;
    let names = drive::saved_plan_names(&all);
    assert!(
        names.contains(&"Larkfield before the storage filled")
            && names.contains(&"Larkfield after it filled"),
        "{names:?}"
    );
    let kept = stored(c, "stillroom.library").await?.unwrap_or_default();
    assert!(!kept.contains("Larkfield after it filled"), "{kept}");
    // The page's shell will ask before an update reloads the page (public/start.js).
    wait_marked(c, "data-unsaved-workbench", true).await?;
    // Room again: the workbench's next save goes through and the mark goes.
    page.unfill_storage().await?;
    c.find(Locator::Id("mode-workbench")).await?.click().await?;
    drive::fill(c, "#plan-name", "Larkfield with room again").await?;
    c.find(Locator::Id("plan-save")).await?.click().await?;
    wait_stored(c, "stillroom.library", |t| t.contains("Larkfield after it filled")).await?;
    wait_marked(c, "data-unsaved-workbench", false).await?;
    page.close().await
}
