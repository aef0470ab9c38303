//! The page in a real browser (headless Chromium through wasm-bindgen-test-runner): typing into
//! the form updates the plan, bad input is named beside its field, and saved data survives.
#![cfg(target_arch = "wasm32")]

use gloo_storage::{LocalStorage, Storage};
use wasm_bindgen::JsCast;
use wasm_bindgen_test::{wasm_bindgen_test, wasm_bindgen_test_configure};
use web_sys::{Event, HtmlElement, HtmlInputElement};

wasm_bindgen_test_configure!(run_in_browser);

fn fresh_host() -> HtmlElement {
    let document = web_sys::window().unwrap().document().unwrap();
    let host: HtmlElement = document.create_element("div").unwrap().unchecked_into();
    document.body().unwrap().append_child(&host).unwrap();
    host
}

fn text_of(host: &HtmlElement, selector: &str) -> String {
    host.query_selector(selector).unwrap().unwrap_or_else(|| panic!("no {selector}")).text_content().unwrap()
}

async fn type_into(host: &HtmlElement, key: &str, value: &str) {
    let input: HtmlInputElement =
        host.query_selector(&format!("#f-{key}")).unwrap().unwrap().unchecked_into();
    input.set_value(value);
    input.dispatch_event(&Event::new("input").unwrap()).unwrap();
    leptos::task::tick().await;
}

/// Starts each test from an empty store, so tests do not see each other's saves.
fn clear_store() {
    LocalStorage::clear();
}

#[wasm_bindgen_test]
async fn heading_names_the_tool() {
    clear_store();
    let host = fresh_host();
    let _mounted = leptos::mount::mount_to(host.clone(), stillroom_app::App);
    leptos::task::tick().await;
    assert_eq!(text_of(&host, "h1"), "Stillroom");
}

#[wasm_bindgen_test]
async fn altitude_moves_the_boiling_point() {
    clear_store();
    let host = fresh_host();
    let _mounted = leptos::mount::mount_to(host.clone(), stillroom_app::App);
    leptos::task::tick().await;
    type_into(&host, "altitude", "0").await;
    // IF97 at 101.325 kPa: 99.97 °C.
    assert_eq!(text_of(&host, "[data-out=water_boiling_point]"), "100.0 °C");
    assert_eq!(text_of(&host, "[data-out=pressure]"), "101.3 kPa");
    type_into(&host, "altitude", "2000").await;
    // USSA 1976 at 2000 m: 79.50 kPa, where water boils at 93.3 °C (IF97).
    assert_eq!(text_of(&host, "[data-out=pressure]"), "79.5 kPa");
    assert_eq!(text_of(&host, "[data-out=water_boiling_point]"), "93.3 °C");
}

#[wasm_bindgen_test]
async fn bad_input_is_named_beside_its_field() {
    clear_store();
    let host = fresh_host();
    let _mounted = leptos::mount::mount_to(host.clone(), stillroom_app::App);
    leptos::task::tick().await;
    type_into(&host, "plant_mass", "abc").await;
    assert!(text_of(&host, "#e-plant_mass").contains("number"));
    type_into(&host, "plant_mass", "").await;
    assert!(text_of(&host, "#e-plant_mass").contains("Enter a value"));
    type_into(&host, "plant_mass", "-4").await;
    assert!(text_of(&host, "#e-plant_mass").contains("more than zero"));
    type_into(&host, "oil_content", "120").await;
    assert!(text_of(&host, "#e-oil_content").contains("100"), "{}", text_of(&host, "#e-oil_content"));
    type_into(&host, "altitude", "7000").await;
    assert!(text_of(&host, "#e-altitude").contains("6000"));
    // The plan on screen is marked as not matching the form, naming the fields to fix.
    assert!(host.query_selector(".headline.stale").unwrap().is_some(), "answers marked stale");
    let fix = text_of(&host, "[data-out=plan_stale]");
    assert!(fix.contains("Plant in the still") && fix.contains("Altitude"), "{fix}");
    // Fixing the fields brings it back.
    type_into(&host, "plant_mass", "15").await;
    type_into(&host, "oil_content", "1").await;
    type_into(&host, "altitude", "300").await;
    assert_eq!(text_of(&host, "#e-altitude"), "");
    assert_ne!(text_of(&host, "[data-out=water_boiling_point]"), "–");
}

#[wasm_bindgen_test]
async fn inputs_survive_a_remount() {
    clear_store();
    let host = fresh_host();
    let mounted = leptos::mount::mount_to(host.clone(), stillroom_app::App);
    leptos::task::tick().await;
    type_into(&host, "plant_mass", "42.5").await;
    drop(mounted);
    let again = fresh_host();
    let _mounted = leptos::mount::mount_to(again.clone(), stillroom_app::App);
    leptos::task::tick().await;
    let input: HtmlInputElement = again.query_selector("#f-plant_mass").unwrap().unwrap().unchecked_into();
    assert_eq!(input.value(), "42.5");
}

#[wasm_bindgen_test]
async fn unreadable_saved_data_is_kept_aside_not_lost() {
    clear_store();
    LocalStorage::raw().set_item("stillroom.scenario", "{broken json").unwrap();
    let host = fresh_host();
    let _mounted = leptos::mount::mount_to(host.clone(), stillroom_app::App);
    leptos::task::tick().await;
    assert!(text_of(&host, "[data-out=storage_notice]").contains("could not be read"));
    let storage = LocalStorage::raw();
    let kept = (0..storage.length().unwrap())
        .filter_map(|i| storage.key(i).unwrap())
        .filter(|k| k.starts_with("stillroom.unreadable."))
        .map(|k| storage.get_item(&k).unwrap().unwrap())
        .collect::<Vec<_>>();
    assert_eq!(kept, vec!["{broken json".to_string()]);
    // The page still plans with the example.
    assert_ne!(text_of(&host, "[data-out=water_boiling_point]"), "–");
}

async fn choose(host: &HtmlElement, selector: &str, value: &str) {
    let select: web_sys::HtmlSelectElement = host.query_selector(selector).unwrap().unwrap().unchecked_into();
    select.set_value(value);
    select.dispatch_event(&Event::new("change").unwrap()).unwrap();
    leptos::task::tick().await;
}

#[wasm_bindgen_test]
async fn a_lab_report_mixture_drives_the_plan() {
    clear_store();
    let host = fresh_host();
    let _mounted = leptos::mount::mount_to(host.clone(), stillroom_app::App);
    leptos::task::tick().await;
    type_into(&host, "altitude", "0").await;
    choose(&host, "#f-oil", "mixture").await;
    let add: HtmlElement = host.query_selector("#mix-add").unwrap().unwrap().unchecked_into();
    add.click();
    leptos::task::tick().await;
    // The new line starts empty: the plan on screen is marked stale until its share is given.
    assert!(text_of(&host, "[data-out=plan_stale]").contains("Oil analysis, line 1"));
    choose(&host, "select[id^=mix-compound-]", "alpha-pinene").await;
    let share: HtmlInputElement =
        host.query_selector("input[id^=mix-percent-]").unwrap().unwrap().unchecked_into();
    share.set_value("100");
    share.dispatch_event(&Event::new("input").unwrap()).unwrap();
    leptos::task::tick().await;
    // Pure α-pinene with water at 1 atm boils at 95.2 °C (thermo 0.6.1 + CoolProp 8.0.0: 95.19).
    assert_eq!(text_of(&host, "[data-out=codistillation_temperature]"), "95.2 °C");
    assert!(host.query_selector("[data-out=plan_stale]").unwrap().is_none(), "no longer stale");
}

#[wasm_bindgen_test]
async fn a_compound_of_ones_own_from_two_points() {
    clear_store();
    let host = fresh_host();
    let _mounted = leptos::mount::mount_to(host.clone(), stillroom_app::App);
    leptos::task::tick().await;
    type_into(&host, "altitude", "0").await;
    type_into(&host, "own_name", "test oil").await;
    // α-pinene's own numbers, as a grower would copy them from a sheet: 136.2 g/mol, 0.86 g/mL,
    // 19.16 kPa at 100 °C (chemicals 1.5.2, WebBook set) and its boiling point 156.3 °C.
    type_into(&host, "own_molar_mass", "136.23").await;
    type_into(&host, "own_density", "0.86").await;
    type_into(&host, "own_solubility", "0").await;
    type_into(&host, "own_t1", "100").await;
    type_into(&host, "own_p1", "19.16").await;
    type_into(&host, "own_t2", "156.3").await;
    type_into(&host, "own_p2", "101.325").await;
    choose(&host, "#f-oil", "own").await;
    // A straight line in ln p against 1/T through those points: boils with water near 95.2 °C.
    let t = text_of(&host, "[data-out=codistillation_temperature]");
    assert!(t == "95.2 °C" || t == "95.1 °C" || t == "95.3 °C", "{t}");
    // A bad point is named beside its field.
    type_into(&host, "own_p1", "-3").await;
    assert!(!text_of(&host, "#e-own_t1").is_empty(), "two-point law error shown");
}

#[wasm_bindgen_test]
async fn the_fuel_picker_changes_the_fuel_and_its_unit() {
    clear_store();
    let host = fresh_host();
    let _mounted = leptos::mount::mount_to(host.clone(), stillroom_app::App);
    leptos::task::tick().await;
    assert!(text_of(&host, "[data-out=fuel]").ends_with(" kg"), "propane is sold by the kg");
    choose(&host, "#f-fuel", "electricity").await;
    assert!(text_of(&host, "[data-out=fuel]").ends_with(" kWh"), "{}", text_of(&host, "[data-out=fuel]"));
    choose(&host, "#f-fuel", "natural_gas").await;
    assert!(text_of(&host, "[data-out=fuel]").ends_with(" m³"));
}

/// Sends `text` to the plan as the workbench does when the grower opens a saved, pasted or
/// shared plan in the form (`bridge::OPEN_PLAN_EVENT`).
async fn open_in_plan(text: &str) {
    stillroom_app::bridge::send(stillroom_app::bridge::OPEN_PLAN_EVENT, text);
    leptos::task::tick().await;
    leptos::task::tick().await;
}

/// Waits past the save's delay after the last edit (250 ms).
async fn settle() {
    let wait = js_sys::Promise::new(&mut |done, _| {
        web_sys::window().unwrap().set_timeout_with_callback_and_timeout_and_arguments_0(&done, 400).unwrap();
    });
    wasm_bindgen_futures::JsFuture::from(wait).await.unwrap();
}

#[wasm_bindgen_test]
async fn a_plan_sent_to_the_form_opens_and_unreadable_text_changes_nothing() {
    clear_store();
    let host = fresh_host();
    let _mounted = leptos::mount::mount_to(host.clone(), stillroom_app::App);
    leptos::task::tick().await;
    let current = stillroom_app::bridge::current_plan_text().expect("the plan offers its scenario");
    let copied = current.replace("\"plant_mass_kg\":15.0", "\"plant_mass_kg\":64.0");
    assert!(copied.contains("64.0"), "the form's scenario holds the plant mass: {current}");
    for bad in ["{ this is not a plan", r#"{"record_version":1,"scenario":{"charge":{"plant_mas_kg":3}}}"#] {
        open_in_plan(bad).await;
        let mass: HtmlInputElement = host.query_selector("#f-plant_mass").unwrap().unwrap().unchecked_into();
        assert_eq!(mass.value(), "15", "{bad} changed the form");
    }
    let huge = format!("{{\"note\":\"{}\"}}", "x".repeat(300 * 1024));
    open_in_plan(&huge).await;
    open_in_plan(&copied).await;
    let mass: HtmlInputElement = host.query_selector("#f-plant_mass").unwrap().unwrap().unchecked_into();
    assert_eq!(mass.value(), "64");
}

/// An invented lab sheet: an own compound with an Antoine law (the numbers are made up for
/// the test, not a real compound's), and values with more digits than the form shows.
const PASTED: &str = r#"{"record_version":1,"scenario":{
  "charge":{"plant_mass_kg":12.3456789},
  "run":{"rate_constant_per_min":0.0512345678},
  "oil":{"composition":{"kind":"mixture","parts":[
     {"compound":"linalool","mass_percent":33.33333333},
     {"compound":"larkfield-resin","mass_percent":66.66666667}]}},
  "custom_compounds":[{"id":"larkfield-resin","name":"Larkfield resin","molar_mass_kg_per_mol":0.2012345,
     "liquid_density_kg_per_m3":987.654321,"water_solubility_kg_per_m3":0.0123456789,
     "vapour_pressure":{"kind":"antoine","a":7.123456789,"b":1850.5,"c":-60.25,"log":"log10",
       "pressure_unit":"mm_hg","temperature_unit":"kelvin","t_min_c":120,"t_max_c":260}}]}}"#;

#[wasm_bindgen_test]
async fn a_pasted_plan_is_kept_as_written_ids_laws_and_every_digit() {
    clear_store();
    let host = fresh_host();
    let _mounted = leptos::mount::mount_to(host.clone(), stillroom_app::App);
    leptos::task::tick().await;
    open_in_plan(PASTED).await;
    settle().await;
    // What the page saves holds every part of what was pasted, unchanged.
    let saved = LocalStorage::raw().get_item("stillroom.scenario").unwrap().unwrap();
    let saved: serde_json::Value = serde_json::from_str(&saved).unwrap();
    let pasted: serde_json::Value = serde_json::from_str(PASTED).unwrap();
    let lost = stillroom_app::records::lost_part(&pasted["scenario"], &saved["scenario"], "scenario");
    assert_eq!(lost, None, "saved: {}", saved["scenario"]);
    assert_eq!(saved["scenario"]["custom_compounds"][0]["id"], "larkfield-resin");
    assert_eq!(saved["scenario"]["custom_compounds"][0]["vapour_pressure"]["a"], 7.123456789);
    assert_eq!(saved["scenario"]["charge"]["plant_mass_kg"], 12.3456789);
    let first: web_sys::HtmlSelectElement =
        host.query_selector("select[id^=mix-compound-]").unwrap().unwrap().unchecked_into();
    assert_eq!(first.value(), "linalool");
    // Typing over a field changes that field only.
    type_into(&host, "plant_mass", "20").await;
    settle().await;
    let saved = LocalStorage::raw().get_item("stillroom.scenario").unwrap().unwrap();
    let saved: serde_json::Value = serde_json::from_str(&saved).unwrap();
    assert_eq!(saved["scenario"]["charge"]["plant_mass_kg"], 20.0);
    assert_eq!(saved["scenario"]["run"]["rate_constant_per_min"], 0.0512345678);
    assert_eq!(saved["scenario"]["oil"]["composition"]["parts"][1]["mass_percent"], 66.66666667);
}
