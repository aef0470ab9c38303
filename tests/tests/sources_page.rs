//! The crop's sources on the page: the page's module carries no source text (the core is built
//! into it without `source-texts`) and fetches `sources.json` when the list is first opened.
//! What it shows must be exactly the core's texts, read here natively from `stillroom_core` (the
//! tables themselves, with the feature on): for every crop preset, online and, after the service
//! worker has installed, with the server gone; and a fetch that fails says so and can be retried.

use fantoccini::Client;
use serde_json::{Value, json};
use std::time::{Duration, Instant};
use stillroom_core::compounds;
use stillroom_core::crops::{CROPS, Crop};
use stillroom_tests::browser::{self, WAIT};
use stillroom_tests::{BoxError, drive};

/// The crop's own texts, then those of each compound of its typical oil, as the page lists them.
fn expected(crop: &Crop) -> Vec<(String, String)> {
    let mut rows: Vec<(String, String)> =
        crop.sources().iter().map(|&(label, text)| (label.to_string(), text.to_string())).collect();
    for &(id, _) in crop.composition {
        let c = compounds::find(id).expect("the table tests hold every id to the library");
        rows.extend(
            c.sources().iter().map(|&(label, text)| (format!("{}: {label}", c.name), text.to_string())),
        );
    }
    rows
}

/// The sources list as the page shows it: each `dt` with its `dd`, as their text content.
const SHOWN: &str = r#"const dl = document.querySelector('details.sources .source-list');
if (!dl) return null;
return Array.from(dl.querySelectorAll('dt')).map((dt) => [dt.textContent, dt.nextElementSibling ? dt.nextElementSibling.textContent : null]);"#;

/// The status line under the sources' summary (loading or a failure), if shown.
const STATUS: &str = "const p = document.querySelector('details.sources .sources-status'); return p && !p.hidden ? p.textContent : null;";

/// Whether "Try again" is shown.
const RETRY: &str =
    "const b = document.querySelector('details.sources .sources-retry'); return !!b && !b.hidden;";

/// Waits until the page lists exactly `crop`'s texts (or times out with what it shows).
async fn wait_for_sources(c: &Client, crop: &Crop) -> Result<(), BoxError> {
    let want = expected(crop);
    let start = Instant::now();
    loop {
        let shown = c.execute(SHOWN, vec![]).await?;
        let rows: Option<Vec<(String, String)>> = serde_json::from_value(shown.clone()).ok().flatten();
        if rows.as_ref() == Some(&want) {
            return Ok(());
        }
        if start.elapsed() > WAIT {
            let status = c.execute(STATUS, vec![]).await?;
            return Err(
                format!("{}: the page shows {shown} (status {status}), wanted {want:?}", crop.id).into()
            );
        }
        tokio::time::sleep(Duration::from_millis(50)).await;
    }
}

/// Waits until the status line reads something `ok` accepts; returns it.
async fn wait_for_status(c: &Client, ok: impl Fn(&str) -> bool) -> Result<String, BoxError> {
    let start = Instant::now();
    loop {
        if let Some(s) = c.execute(STATUS, vec![]).await?.as_str()
            && ok(s)
        {
            return Ok(s.to_string());
        }
        if start.elapsed() > WAIT {
            return Err(format!("status never came: {}", c.execute(STATUS, vec![]).await?).into());
        }
        tokio::time::sleep(Duration::from_millis(50)).await;
    }
}

/// Opens the crop's sources as a tap on the summary would.
async fn open_sources(c: &Client) -> Result<(), BoxError> {
    drive::wait_for(c, "details.sources summary").await?;
    drive::tap(c, "details.sources summary").await
}

/// Resolves once a service worker controls the page and its cache holds `sources.json`.
const SOURCES_CACHED: &str = r#"const done = arguments[arguments.length - 1];
(async () => {
  await navigator.serviceWorker.ready;
  if (!navigator.serviceWorker.controller) {
    await new Promise((r) => navigator.serviceWorker.addEventListener("controllerchange", r, { once: true }));
  }
  const cache = await caches.open("stillroom-" + arguments[0]);
  done(!!(await cache.match(new URL("./sources.json", location.href).href)));
})().catch((e) => done(String(e)));"#;

#[tokio::test]
async fn every_crops_sources_are_the_cores_texts_online_and_offline() -> Result<(), BoxError> {
    assert!(
        CROPS.iter().all(|c| expected(c).iter().all(|(_, t)| !t.is_empty())),
        "native texts are built in"
    );
    let mut page = browser::open().await?;
    drive::start_clean(&page).await?;
    let c = &page.client;
    drive::choose(c, "f-crop", CROPS[0].id).await?;
    open_sources(c).await?;
    // The list stays open while another crop is picked, and shows that crop's texts.
    for crop in CROPS {
        drive::choose(c, "f-crop", crop.id).await?;
        wait_for_sources(c, crop).await?;
    }
    // Fetched once, however many crops were shown.
    let fetches = c
        .execute(
            "return performance.getEntriesByType('resource').filter((e) => new URL(e.name).pathname.endsWith('/sources.json')).length;",
            vec![],
        )
        .await?;
    assert_eq!(fetches.as_u64(), Some(1), "sources.json fetched {fetches} times");

    // Offline: once the worker holds the file, a reload with the server gone still opens them.
    let id = browser::build_id()?;
    assert_eq!(
        c.execute_async(SOURCES_CACHED, vec![json!(id)]).await?,
        json!(true),
        "sources.json not precached"
    );
    page.stop_server();
    let c = &page.client;
    c.refresh().await?;
    drive::wait_for(c, "#f-crop").await?;
    let last = CROPS.last().ok_or("no crops")?;
    drive::choose(c, "f-crop", last.id).await?;
    open_sources(c).await?;
    wait_for_sources(c, last).await?;
    page.close().await
}

#[tokio::test]
async fn a_failed_fetch_says_why_and_tries_again() -> Result<(), BoxError> {
    // A copy of the page without its sources file: its worker cannot install (the file is on
    // its precache list), so every fetch goes to the network.
    let dir = std::env::temp_dir().join(format!("stillroom-sources-{}", std::process::id()));
    let _ = std::fs::remove_dir_all(&dir);
    let dist = browser::dist()?;
    xtask::build::copy_tree(&dist, &dir).map_err(|e| e.0)?;
    let files = ["sources.json", "sources.json.gz", "sources.json.br"];
    for f in files {
        let _ = std::fs::remove_file(dir.join(f));
    }
    let page = browser::open_at(&dir).await?;
    drive::start_clean(&page).await?;
    let c = &page.client;
    let crop = CROPS.iter().find(|k| k.id == "lavender").ok_or("no lavender preset")?;
    drive::choose(c, "f-crop", crop.id).await?;

    // No connection at all.
    page.cdp("Network.enable", json!({})).await?;
    let offline = json!({"offline": true, "latency": 0, "downloadThroughput": -1, "uploadThroughput": -1});
    page.cdp("Network.emulateNetworkConditions", offline).await?;
    open_sources(c).await?;
    let said = wait_for_status(c, |s| s.contains("no connection")).await?;
    assert!(said.contains("offline use"), "{said}");
    assert_eq!(c.execute(RETRY, vec![]).await?, json!(true), "no way to try again");

    // Back online, the server has no such file.
    let online = json!({"offline": false, "latency": 0, "downloadThroughput": -1, "uploadThroughput": -1});
    page.cdp("Network.emulateNetworkConditions", online).await?;
    drive::tap(c, "details.sources .sources-retry").await?;
    let said = wait_for_status(c, |s| s.contains("404")).await?;
    assert!(said.contains("server answered"), "{said}");

    // The file is back: one more try shows the texts, and the failure is gone.
    for f in files {
        if dist.join(f).is_file() {
            std::fs::copy(dist.join(f), dir.join(f))?;
        }
    }
    drive::tap(c, "details.sources .sources-retry").await?;
    wait_for_sources(c, crop).await?;
    assert_eq!(c.execute(STATUS, vec![]).await?, Value::Null);
    assert_eq!(c.execute(RETRY, vec![]).await?, json!(false));
    page.close().await?;
    let _ = std::fs::remove_dir_all(&dir);
    Ok(())
}
