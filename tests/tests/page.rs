//! The built page in headless Chromium at a phone viewport.

use fantoccini::Locator;
use std::time::Duration;
use stillroom_tests::BoxError;
use stillroom_tests::browser::{self, VIEWPORT};

const WAIT: Duration = Duration::from_secs(15);

#[tokio::test]
async fn page_loads() -> Result<(), BoxError> {
    // The heading is drawn by the wasm module, not written in the HTML: finding it proves the
    // module was fetched, compiled and run.
    let html = browser::read_dist("index.html")?;
    assert!(!html.contains("<h1"), "dist/index.html must not hold the heading itself");

    let page = browser::open().await?;
    page.goto("").await?;
    let h1 = page.client.wait().at_most(WAIT).for_element(Locator::Css("h1")).await?;
    assert_eq!(h1.text().await?, "Stillroom");
    assert_eq!(page.client.title().await?, "Stillroom");
    let (w, h) = page.viewport().await?;
    println!("viewport {w} x {h} CSS px");
    assert_eq!(w, u64::from(VIEWPORT.0));
    // Nothing wider than the phone: no sideways scrolling.
    let scroll_w = page.client.execute("return document.documentElement.scrollWidth;", vec![]).await?;
    assert_eq!(scroll_w.as_u64(), Some(u64::from(VIEWPORT.0)));
    // The module is fetched once: the early preload in the HTML is the fetch the loader uses.
    let fetches = page
        .client
        .execute(
            "return performance.getEntriesByType('resource')
                 .filter((e) => new URL(e.name).pathname.endsWith('.wasm')).length;",
            vec![],
        )
        .await?;
    assert_eq!(fetches.as_u64(), Some(1), "wasm fetched {fetches} times");
    page.close().await
}

#[tokio::test]
async fn reloads_offline_from_the_cache() -> Result<(), BoxError> {
    let id = browser::build_id()?;
    let mut page = browser::open().await?;
    page.goto("").await?;
    page.client.wait().at_most(WAIT).for_element(Locator::Css("h1")).await?;
    // Wait until the service worker is active and controls the page, then list the caches.
    let caches = page
        .client
        .execute_async(
            r#"const done = arguments[arguments.length - 1];
               (async () => {
                 await navigator.serviceWorker.ready;
                 if (!navigator.serviceWorker.controller) {
                   await new Promise((r) =>
                     navigator.serviceWorker.addEventListener("controllerchange", r, { once: true }));
                 }
                 const names = await caches.keys();
                 const cache = await caches.open("stillroom-" + arguments[0]);
                 const urls = (await cache.keys()).map((r) => new URL(r.url).pathname);
                 done({ names, urls });
               })().catch((e) => done({ error: String(e) }));"#,
            vec![serde_json::json!(id)],
        )
        .await?;
    assert!(caches.get("error").is_none(), "{caches}");
    let names: Vec<&str> =
        caches["names"].as_array().ok_or("no cache names")?.iter().filter_map(|v| v.as_str()).collect();
    assert_eq!(names, [format!("stillroom-{id}")], "one cache, named by the build");
    let urls: Vec<&str> =
        caches["urls"].as_array().ok_or("no cached urls")?.iter().filter_map(|v| v.as_str()).collect();
    for want in [
        "/",
        "/index.html",
        "/stillroom_app.js",
        "/stillroom_app_bg.wasm",
        "/style.css",
        "/manifest.webmanifest",
        "/icon.svg",
    ] {
        assert!(urls.contains(&want), "{want} not precached: {urls:?}");
    }

    // With the server gone, a reload must still draw the page.
    page.stop_server();
    page.client.refresh().await?;
    let h1 = page.client.wait().at_most(WAIT).for_element(Locator::Css("h1")).await?;
    assert_eq!(h1.text().await?, "Stillroom");
    page.close().await
}
