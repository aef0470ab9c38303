//! Saved plans and stills on the built page, in headless Chromium, as an extension agent uses
//! them: save the form's plan under a name, open, rename, duplicate and delete it (with undo);
//! save a still and use it with another crop; a share link opened in a fresh browser profile
//! reproduces the plan exactly; a pasted plan becomes a new saved plan; everything exported
//! from one browser comes into a fresh one; a save into full storage is told at once.
//!
//! Every plan here belongs to the invented Larkfield Farm (a fictional farm).

use fantoccini::{Client, Locator};
use serde_json::{Value, json};
use stillroom_core::Scenario;
use stillroom_tests::BoxError;
use stillroom_tests::browser::{self, Page, wait_text};
use stillroom_tests::drive::{
    self, count, fill, form_plan, open_in_form, stored, tap, wait_count, wait_for, wait_stored,
};

async fn to_workbench(c: &Client) -> Result<(), BoxError> {
    tap(c, "#mode-workbench").await?;
    wait_for(c, "#plan-name").await
}

/// The CSS selector of the saved plan (`kind` "plan") or still ("still") called `name`.
async fn item(c: &Client, kind: &str, name: &str) -> Result<String, BoxError> {
    let v = c
        .execute(
            "const [kind, name] = arguments;
             const li = [...document.querySelectorAll(`[data-${kind}]`)]
               .find((l) => l.querySelector('.saved-name').textContent === name);
             return li ? li.dataset[kind] : null;",
            vec![json!(kind), json!(name)],
        )
        .await?;
    let id = v.as_str().ok_or_else(|| format!("no saved {kind} is called {name:?}"))?;
    Ok(format!("[data-{kind}='{id}']"))
}

/// The names of the saved plans (or stills) as listed, newest first.
async fn names(c: &Client, kind: &str) -> Result<Vec<String>, BoxError> {
    let v = c
        .execute(
            "return [...document.querySelectorAll(`[data-${arguments[0]}] .saved-name`)].map((n) => n.textContent);",
            vec![json!(kind)],
        )
        .await?;
    Ok(serde_json::from_value(v)?)
}

async fn said(c: &Client, needle: &str) -> Result<String, BoxError> {
    wait_text(c, "#shelf-said", |t| t.contains(needle)).await
}

/// Waits until the form's plant mass field shows `kg`.
async fn form_mass(c: &Client, kg: &str) -> Result<(), BoxError> {
    let start = std::time::Instant::now();
    loop {
        let v = c.find(Locator::Id("f-plant_mass")).await?.prop("value").await?.unwrap_or_default();
        if v == kg {
            return Ok(());
        }
        if start.elapsed() > browser::WAIT {
            return Err(format!("the form's plant mass is {v:?}, wanted {kg:?}").into());
        }
        tokio::time::sleep(std::time::Duration::from_millis(50)).await;
    }
}

/// Waits until the form's scenario has `want` at the JSON `pointer`.
async fn form_has(c: &Client, pointer: &str, want: Value) -> Result<(), BoxError> {
    let start = std::time::Instant::now();
    loop {
        let got = form_plan(c).await?.pointer(pointer).cloned().unwrap_or(Value::Null);
        if got == want {
            return Ok(());
        }
        if start.elapsed() > browser::WAIT {
            return Err(format!("the form's {pointer} is {got}, wanted {want}").into());
        }
        tokio::time::sleep(std::time::Duration::from_millis(50)).await;
    }
}

fn record_text(s: &Scenario) -> String {
    json!({ "record_version": 1, "scenario": s }).to_string()
}

#[tokio::test]
async fn a_plan_is_saved_opened_renamed_duplicated_and_deleted_with_undo() -> Result<(), BoxError> {
    let page = browser::open().await?;
    drive::start_clean(&page).await?;
    let c = &page.client;
    to_workbench(c).await?;
    assert_eq!(count(c, "[data-plan]").await?, 0);

    fill(c, "#plan-name", "Home field, July").await?;
    tap(c, "#plan-save").await?;
    said(c, "saved as “Home field, July”").await?;
    let home = item(c, "plan", "Home field, July").await?;
    let line = wait_text(c, &format!("{home} .hint"), |t| !t.is_empty()).await?;
    assert!(line.contains("Lavender") && line.contains("15") && line.contains("kg"), "{line}");

    // A name already taken (ignoring case) is refused beside the box.
    fill(c, "#plan-name", "  home FIELD, july ").await?;
    tap(c, "#plan-save").await?;
    wait_text(c, "#plan-error", |t| t.contains("already called")).await?;
    assert_eq!(count(c, "[data-plan]").await?, 1);

    // A second plan: 40 kg typed into the form.
    tap(c, "#mode-plan").await?;
    fill(c, "#f-plant_mass", "40").await?;
    wait_stored(c, "stillroom.scenario", |t| t.contains("\"plant_mass_kg\":40")).await?;
    to_workbench(c).await?;
    fill(c, "#plan-name", "Big charge").await?;
    tap(c, "#plan-save").await?;
    wait_count(c, "[data-plan]", 2).await?;

    // Opening a plan when the form is saved already changes nothing else.
    tap(c, &format!("{} .plan-open", item(c, "plan", "Home field, July").await?)).await?;
    form_mass(c, "15").await?;
    to_workbench(c).await?;
    said(c, "Opened “Home field, July” in the form.").await?;
    assert_eq!(count(c, "[data-plan]").await?, 2);

    // An unsaved form is kept as a plan of its own before another opens, and Undo takes both back.
    tap(c, "#mode-plan").await?;
    fill(c, "#f-plant_mass", "22").await?;
    wait_stored(c, "stillroom.scenario", |t| t.contains("\"plant_mass_kg\":22")).await?;
    to_workbench(c).await?;
    tap(c, &format!("{} .plan-open", item(c, "plan", "Big charge").await?)).await?;
    form_mass(c, "40").await?;
    to_workbench(c).await?;
    said(c, "is saved now as “Form before opening “Big charge”").await?;
    wait_count(c, "[data-plan]", 3).await?;
    tap(c, "#shelf-undo").await?;
    form_mass(c, "22").await?;
    form_has(c, "/charge/plant_mass_kg", json!(22.0)).await?;
    to_workbench(c).await?;
    said(c, "Undone.").await?;
    wait_count(c, "[data-plan]", 2).await?;

    // Rename: a taken name is refused on the entry, a free one is taken.
    let big = item(c, "plan", "Big charge").await?;
    tap(c, &format!("{big} .plan-rename")).await?;
    fill(c, &format!("{big} .rename-input"), "HOME field, July").await?;
    tap(c, &format!("{big} .rename-save")).await?;
    wait_text(c, &format!("{big} .rename-error"), |t| t.contains("already called")).await?;
    fill(c, &format!("{big} .rename-input"), "Big charge, 40 kg").await?;
    tap(c, &format!("{big} .rename-save")).await?;
    said(c, "Renamed to “Big charge, 40 kg”.").await?;

    // Duplicate gets the first free number; delete, undo, delete again.
    tap(c, &format!("{} .plan-duplicate", item(c, "plan", "Big charge, 40 kg").await?)).await?;
    said(c, "Duplicated as “Big charge, 40 kg (2)”.").await?;
    assert_eq!(names(c, "plan").await?, ["Big charge, 40 kg (2)", "Big charge, 40 kg", "Home field, July"]);
    tap(c, &format!("{} .plan-delete", item(c, "plan", "Big charge, 40 kg (2)").await?)).await?;
    said(c, "Deleted “Big charge, 40 kg (2)”.").await?;
    wait_count(c, "[data-plan]", 2).await?;
    tap(c, "#shelf-undo").await?;
    wait_count(c, "[data-plan]", 3).await?;
    tap(c, &format!("{} .plan-delete", item(c, "plan", "Big charge, 40 kg (2)").await?)).await?;
    wait_count(c, "[data-plan]", 2).await?;

    // All of it is in storage and comes back after a reload.
    let lib = wait_stored(c, "stillroom.library", |t| !t.contains("(2)") && t.contains("40 kg")).await?;
    let lib: Value = serde_json::from_str(&lib)?;
    let masses: Vec<(String, f64)> = lib["plans"]
        .as_array()
        .ok_or("no plans in the record")?
        .iter()
        .map(|p| {
            (
                p["name"].as_str().unwrap_or("").to_string(),
                p["scenario"]["charge"]["plant_mass_kg"].as_f64().unwrap_or(0.0),
            )
        })
        .collect();
    assert_eq!(masses, [("Home field, July".to_string(), 15.0), ("Big charge, 40 kg".to_string(), 40.0)]);
    c.refresh().await?;
    wait_for(c, "#f-plant_mass").await?;
    to_workbench(c).await?;
    wait_count(c, "[data-plan]", 2).await?;
    assert_eq!(names(c, "plan").await?, ["Big charge, 40 kg", "Home field, July"]);
    page.close().await
}

#[tokio::test]
async fn a_saved_still_is_used_with_another_crop_renamed_and_deleted_with_undo() -> Result<(), BoxError> {
    let mut drum = Scenario::default();
    drum.still.volume_m3 = Some(0.2);
    drum.boiler.heat_input_w = 12_000.0;
    let mut mint = Scenario::default();
    mint.charge.crop = Some("peppermint".into());
    mint.charge.plant_mass_kg = 25.0;
    mint.still.volume_m3 = Some(0.05);

    let page = browser::open().await?;
    drive::start_clean(&page).await?;
    let c = &page.client;
    open_in_form(c, &record_text(&drum)).await?;
    form_has(c, "/still/volume_m3", json!(0.2)).await?;
    to_workbench(c).await?;
    fill(c, "#still-name", "Copper drum").await?;
    tap(c, "#still-save").await?;
    said(c, "saved as “Copper drum”").await?;
    let still = item(c, "still", "Copper drum").await?;
    let line = wait_text(c, &format!("{still} .hint"), |t| !t.is_empty()).await?;
    assert!(line.contains("200") && line.contains("L"), "{line}");

    // The form now plans peppermint in a small still; the saved still replaces the equipment only.
    open_in_form(c, &record_text(&mint)).await?;
    form_has(c, "/still/volume_m3", json!(0.05)).await?;
    to_workbench(c).await?;
    tap(c, &format!("{still} .still-use")).await?;
    form_has(c, "/still/volume_m3", json!(0.2)).await?;
    let form = form_plan(c).await?;
    assert_eq!(form["charge"]["crop"], json!("peppermint"));
    assert_eq!(form["still"]["volume_m3"], json!(0.2));
    assert_eq!(form["boiler"]["heat_input_w"], json!(12_000.0));
    // The peppermint plan was not saved: it is now, so nothing typed is lost.
    to_workbench(c).await?;
    said(c, "is saved now as").await?;
    assert_eq!(count(c, "[data-plan]").await?, 1);

    // An empty name is refused; then a new name is taken.
    tap(c, &format!("{still} .still-rename")).await?;
    fill(c, &format!("{still} .rename-input"), "   ").await?;
    tap(c, &format!("{still} .rename-save")).await?;
    wait_text(c, &format!("{still} .rename-error"), |t| t.contains("Give the still a name.")).await?;
    fill(c, &format!("{still} .rename-input"), "Copper drum, 200 L").await?;
    tap(c, &format!("{still} .rename-save")).await?;
    said(c, "Renamed to “Copper drum, 200 L”.").await?;

    tap(c, &format!("{still} .still-delete")).await?;
    said(c, "Deleted the still “Copper drum, 200 L”.").await?;
    wait_count(c, "[data-still]", 0).await?;
    tap(c, "#shelf-undo").await?;
    wait_count(c, "[data-still]", 1).await?;
    assert_eq!(names(c, "still").await?, ["Copper drum, 200 L"]);
    let lib = wait_stored(c, "stillroom.library", |t| t.contains("Copper drum, 200 L")).await?;
    let lib: Value = serde_json::from_str(&lib)?;
    assert_eq!(lib["stills"][0]["equipment"]["still"]["volume_m3"], json!(0.2));
    page.close().await
}

/// The four headline answers, the oil and the run time as the page shows them.
async fn answers(c: &Client) -> Result<Vec<String>, BoxError> {
    let mut out = Vec::new();
    for key in
        ["steam_total", "water_total", "water_boiling_point", "separator_size", "oil_volume", "total_time"]
    {
        out.push(wait_text(c, &format!("[data-out={key}]"), |t| !t.is_empty() && t != "–").await?);
    }
    Ok(out)
}

#[tokio::test]
async fn a_share_link_opened_in_a_fresh_profile_reproduces_the_plan_exactly() -> Result<(), BoxError> {
    let mut hill = Scenario::default();
    hill.charge.crop = Some("peppermint".into());
    hill.charge.plant_mass_kg = 37.5;
    hill.charge.oil_content_percent = Some(0.612_345_678_901_234_5);
    hill.site.altitude_m = 1_487.25;
    hill.boiler.heat_input_w = 9_876.5;

    // The sender's browser.
    let page = browser::open().await?;
    drive::start_clean(&page).await?;
    let c = &page.client;
    open_in_form(c, &record_text(&hill)).await?;
    form_mass(c, "37.5").await?;
    let sent = form_plan(c).await?;
    let shown = answers(c).await?;
    to_workbench(c).await?;
    let link = {
        let start = std::time::Instant::now();
        loop {
            let v = c.find(Locator::Id("share-link")).await?.prop("value").await?.unwrap_or_default();
            if v.contains("#plan=") {
                break v;
            }
            if start.elapsed() > browser::WAIT {
                return Err(format!("no share link on the page: {v:?}").into());
            }
            tokio::time::sleep(std::time::Duration::from_millis(50)).await;
        }
    };
    assert!(link.len() < 2_000, "the link is {} characters", link.len());
    let fragment = link[link.find('#').ok_or("no fragment")?..].to_string();
    page.close().await?;

    // The receiver's: a new profile, never opened the page, follows the link.
    let page = browser::open().await?;
    let c = &page.client;
    page.goto(&fragment).await?;
    wait_for(c, "#shelf-said").await?;
    said(c, "The link's plan is saved as “Shared plan").await?;
    said(c, "Your form is unchanged.").await?;
    assert_eq!(count(c, "[data-plan]").await?, 1);
    // The fragment is gone from the address, so a reload does not add the plan twice.
    let address = c.current_url().await?;
    assert!(address.fragment().is_none_or(|f| f.is_empty()), "{address}");
    assert_eq!(form_plan(c).await?["charge"]["plant_mass_kg"], json!(15.0), "form untouched");

    tap(c, "#shelf-open-offered").await?;
    form_mass(c, "37.5").await?;
    assert_eq!(form_plan(c).await?, sent, "the scenario arrives to the last bit");
    assert_eq!(answers(c).await?, shown);

    // A link cut short on the way says so and adds nothing.
    let cut = &fragment[..fragment.len() - 12];
    page.goto(&format!("?again{cut}")).await?;
    wait_for(c, "#shelf-said").await?;
    said(c, "could not be opened").await?;
    let saved = wait_stored(c, "stillroom.library", |t| t.contains("Shared plan")).await?;
    assert_eq!(serde_json::from_str::<Value>(&saved)?["plans"].as_array().map(Vec::len), Some(2));
    page.close().await
}

#[tokio::test]
async fn a_pasted_plan_becomes_a_new_saved_plan_and_a_wrong_one_is_named() -> Result<(), BoxError> {
    let mut rose = Scenario::default();
    rose.charge.crop = Some("rose".into());
    rose.charge.plant_mass_kg = 60.0;

    let page = browser::open().await?;
    drive::start_clean(&page).await?;
    let c = &page.client;
    to_workbench(c).await?;
    fill(c, "#paste-plan", r#"{"charge":{"plant_mass":40}}"#).await?;
    tap(c, "#paste-add").await?;
    let problem = wait_text(c, "#paste-error", |t| !t.is_empty()).await?;
    assert!(problem.contains("plant_mass"), "the message names the field: {problem}");
    assert_eq!(count(c, "[data-plan]").await?, 0);

    fill(c, "#paste-plan", &record_text(&rose)).await?;
    tap(c, "#paste-add").await?;
    wait_text(c, "#paste-done", |t| t.contains("Saved as “Pasted plan") && t.contains("form is unchanged"))
        .await?;
    wait_count(c, "[data-plan]", 1).await?;
    assert_eq!(form_plan(c).await?["charge"]["crop"], json!("lavender"), "form untouched");
    tap(c, "#shelf-open-offered").await?;
    form_mass(c, "60").await?;
    assert_eq!(form_plan(c).await?["charge"]["crop"], json!("rose"));
    page.close().await
}

/// Saves the form's plan (or still) under `name` on the workbench.
async fn save_as(c: &Client, kind: &str, name: &str) -> Result<(), BoxError> {
    fill(c, &format!("#{kind}-name"), name).await?;
    tap(c, &format!("#{kind}-save")).await?;
    said(c, &format!("saved as “{name}”")).await?;
    Ok(())
}

async fn export_everything(page: &Page) -> Result<String, BoxError> {
    let c = &page.client;
    let n = drive::download_count(c).await?;
    tap(c, "#backup-export").await?;
    let (name, text) = drive::download_after(c, n).await?;
    assert!(name.starts_with("stillroom-everything-") && name.ends_with(".json"), "{name}");
    assert_eq!(drive::download_type(c, n).await?, "application/json");
    Ok(text)
}

#[tokio::test]
async fn everything_exported_comes_into_a_fresh_profile_once() -> Result<(), BoxError> {
    let mut hill = Scenario::default();
    hill.site.altitude_m = 1500.0;

    let page = browser::open().await?;
    drive::start_clean(&page).await?;
    let c = &page.client;
    to_workbench(c).await?;
    save_as(c, "plan", "Home field").await?;
    save_as(c, "still", "Copper drum").await?;
    open_in_form(c, &record_text(&hill)).await?;
    wait_stored(c, "stillroom.scenario", |t| t.contains("\"altitude_m\":1500")).await?;
    to_workbench(c).await?;
    save_as(c, "plan", "Hill field").await?;
    let exported = export_everything(&page).await?;
    let sent: Value = serde_json::from_str(&exported)?;
    page.close().await?;

    let dir = std::env::temp_dir().join(format!("stillroom-import-{}", std::process::id()));
    std::fs::create_dir_all(&dir)?;
    let file = dir.join("everything.json");
    std::fs::write(&file, &exported)?;

    let page = browser::open().await?;
    drive::start_clean(&page).await?;
    let c = &page.client;
    to_workbench(c).await?;
    let pick = c.find(Locator::Id("backup-import")).await?;
    pick.send_keys(&file.display().to_string()).await?;
    // The form's plan is the same as "Hill field", so it is not added a second time.
    wait_text(c, "#backup-done", |t| t.contains("Saved plans and stills: 3 added, 1 skipped")).await?;
    assert_eq!(names(c, "plan").await?, ["Hill field", "Home field"]);
    assert_eq!(names(c, "still").await?, ["Copper drum"]);
    assert_eq!(form_plan(c).await?["site"]["altitude_m"], json!(300.0), "the form is not replaced");

    // The same file again adds nothing.
    let pick = c.find(Locator::Id("backup-import")).await?;
    pick.send_keys(&file.display().to_string()).await?;
    wait_text(c, "#backup-done", |t| t.contains("0 added, 4 skipped")).await?;
    wait_count(c, "[data-plan]", 2).await?;

    // What arrived is what left: names and scenarios, to the last bit.
    let lib: Value = serde_json::from_str(&stored(c, "stillroom.library").await?.unwrap_or_default())?;
    let strip = |r: &Value, part: &str| -> Vec<(Value, Value)> {
        r[part].as_array().into_iter().flatten().map(|p| (p["name"].clone(), p["scenario"].clone())).collect()
    };
    assert_eq!(strip(&lib, "plans"), strip(&sent["library_record"], "plans"));
    assert_eq!(lib["stills"][0]["equipment"], sent["library_record"]["stills"][0]["equipment"]);

    // A file that is not one of the page's adds nothing and says why.
    let bad = dir.join("notes.json");
    std::fs::write(&bad, "[1, 2, 3]")?;
    c.find(Locator::Id("backup-import")).await?.send_keys(&bad.display().to_string()).await?;
    wait_text(c, "#backup-error", |t| t.contains("not a JSON object") && t.contains("Nothing was added"))
        .await?;
    wait_count(c, "[data-plan]", 2).await?;
    let _ = std::fs::remove_dir_all(&dir);
    page.close().await
}

#[tokio::test]
async fn a_library_save_into_full_storage_is_told_at_once_and_kept_on_the_page() -> Result<(), BoxError> {
    let page = browser::open().await?;
    drive::start_clean(&page).await?;
    let c = &page.client;
    to_workbench(c).await?;
    save_as(c, "plan", "Before the storage filled").await?;
    wait_stored(c, "stillroom.library", |t| t.contains("Before the storage filled")).await?;
    let filled = page.fill_storage().await?;
    println!("storage filled with {filled} characters");
    save_as(c, "plan", "After it filled").await?;
    // (Another record's save may fail beside it; the notice then speaks of all the latest changes.)
    wait_text(c, "#library-unsaved", |t| t.contains("Not saved") && t.contains("download everything"))
        .await?;
    // Still on the page, and in the download; storage keeps the last save that fitted.
    wait_count(c, "[data-plan]", 2).await?;
    let kept = stored(c, "stillroom.library").await?.unwrap_or_default();
    assert!(kept.contains("Before the storage filled") && !kept.contains("After it filled"), "{kept}");
    let all: Value = serde_json::from_str(&export_everything(&page).await?)?;
    let listed = drive::saved_plan_names(&all);
    assert_eq!(listed, ["Before the storage filled", "After it filled"]);

    // Room again: the next change saves both, and the notice goes.
    page.unfill_storage().await?;
    save_as(c, "still", "Copper drum").await?;
    wait_stored(c, "stillroom.library", |t| t.contains("After it filled") && t.contains("Copper drum"))
        .await?;
    wait_text(c, "#library-unsaved", str::is_empty).await?;
    page.close().await
}
