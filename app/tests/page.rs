//! The page in a real browser (headless Chromium through wasm-bindgen-test-runner).
#![cfg(target_arch = "wasm32")]

use wasm_bindgen::JsCast;
use wasm_bindgen_test::{wasm_bindgen_test, wasm_bindgen_test_configure};

wasm_bindgen_test_configure!(run_in_browser);

fn fresh_host() -> web_sys::HtmlElement {
    let document = web_sys::window().unwrap().document().unwrap();
    let host: web_sys::HtmlElement = document.create_element("div").unwrap().unchecked_into();
    document.body().unwrap().append_child(&host).unwrap();
    host
}

#[wasm_bindgen_test]
async fn heading_names_the_tool() {
    let host = fresh_host();
    assert!(host.query_selector("h1").unwrap().is_none());
    let _mounted = leptos::mount::mount_to(host.clone(), stillroom_app::App);
    leptos::task::tick().await;
    let headings = host.query_selector_all("h1").unwrap();
    assert_eq!(headings.length(), 1, "one top heading");
    let h1 = headings.item(0).unwrap();
    assert_eq!(h1.text_content().unwrap(), "Stillroom");
}
