//! What a first visit costs over the wire, the offline copy included: every file of the page is
//! sent with a body at most once (the service worker revalidates what the page already fetched
//! and gets bodiless 304s), and the bytes written to the wire stay within the files' own sizes
//! plus their headers.

use fantoccini::Locator;
use std::collections::BTreeMap;
use std::time::{Duration, Instant};
use stillroom_tests::BoxError;
use stillroom_tests::browser::{self, WAIT, wait_text};

/// Resolves with the number of entries in the page's offline cache once a worker is active.
const CACHED: &str = r#"const done = arguments[arguments.length - 1];
navigator.serviceWorker.ready.then(async () => {
  const names = await caches.keys();
  const mine = names.filter((n) => n.startsWith("stillroom-"));
  if (mine.length !== 1) return done(-1);
  done((await (await caches.open(mine[0])).keys()).length);
}, () => done(-2));"#;

/// Response headers of this server are well under this many bytes each (measured about 400).
const HEAD_BYTES: u64 = 1024;

#[tokio::test]
async fn a_first_visit_sends_each_file_once_offline_copy_included() -> Result<(), BoxError> {
    let page = browser::open().await?;
    page.goto("").await?;
    let c = &page.client;
    c.wait().at_most(WAIT).for_element(Locator::Id("f-plant_mass")).await?;
    wait_text(c, "[data-out=steam_total]", |t| t.ends_with("kg")).await?;
    // The worker installs after the first plan: wait until its cache holds the precache list.
    let sw = browser::read_dist("sw.js")?;
    let list = sw.lines().find(|l| l.starts_with("const PRECACHE")).ok_or("no PRECACHE in sw.js")?;
    let listed = list.matches("\"./").count() as i64;
    let start = Instant::now();
    loop {
        let n = c.execute_async(CACHED, vec![]).await?.as_i64().unwrap_or(-3);
        if n >= listed {
            break;
        }
        if start.elapsed() > Duration::from_secs(60) {
            return Err(format!("the offline cache holds {n} of {listed} files").into());
        }
        tokio::time::sleep(Duration::from_millis(200)).await;
    }
    let served = page.traffic().served();
    let wire = page.traffic().wire_bytes();
    let mut bodies: BTreeMap<String, Vec<u64>> = BTreeMap::new();
    for s in &served {
        if s.body_bytes > 0 {
            bodies.entry(s.path.clone()).or_default().push(s.body_bytes);
        }
    }
    let twice: Vec<(&String, &Vec<u64>)> = bodies.iter().filter(|(_, b)| b.len() > 1).collect();
    assert!(twice.is_empty(), "sent with a body more than once: {twice:?}");
    let files: u64 = bodies.values().flatten().sum();
    let most = files + HEAD_BYTES * served.len() as u64;
    eprintln!(
        "first visit: {} responses, {} with a body, {files} B of files, {wire} B over the wire",
        served.len(),
        bodies.len()
    );
    assert!(wire <= most, "{wire} B over the wire for {files} B of files in {} responses", served.len());
    // The page's own module is among them, compressed.
    let wasm = bodies.get("/stillroom_app_bg.wasm").ok_or("the wasm was never sent")?;
    let raw = std::fs::metadata(browser::dist()?.join("stillroom_app_bg.wasm"))?.len();
    assert!(wasm[0] < raw / 2, "the wasm went uncompressed: {} of {raw} B", wasm[0]);
    page.close().await
}
