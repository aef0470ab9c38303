//! The offline copy (service worker) on the built page: any in-scope address opens offline,
//! query strings are never answered with another URL's file, and a new version waits for the
//! grower's tap instead of taking over mid-entry.

use fantoccini::{Client, Locator};
use serde_json::{Value, json};
use std::time::{Duration, Instant};
use stillroom_tests::BoxError;
use stillroom_tests::browser;

const WAIT: Duration = Duration::from_secs(15);

/// Resolves once a service worker controls the page; then lists the caches.
const CONTROLLED: &str = r#"const done = arguments[arguments.length - 1];
    (async () => {
      await navigator.serviceWorker.ready;
      if (!navigator.serviceWorker.controller) {
        await new Promise((r) => navigator.serviceWorker.addEventListener("controllerchange", r, { once: true }));
      }
      done((await caches.keys()).sort());
    })().catch((e) => done({ error: String(e) }));"#;

async fn controlled(c: &Client) -> Result<Vec<String>, BoxError> {
    let v = c.execute_async(CONTROLLED, vec![]).await?;
    serde_json::from_value(v.clone()).map_err(|_| format!("no controller: {v}").into())
}

async fn heading(c: &Client) -> Result<String, BoxError> {
    Ok(c.wait().at_most(WAIT).for_element(Locator::Css("h1")).await?.text().await?)
}

#[tokio::test]
async fn any_address_in_scope_opens_offline_and_queries_are_not_conflated() -> Result<(), BoxError> {
    let mut page = browser::open().await?;
    page.goto("").await?;
    heading(&page.client).await?;
    controlled(&page.client).await?;
    page.stop_server();
    let c = &page.client;
    for path in ["?from=a-link", "index.html?x=1", "some/deeper/place?y=2", "plan"] {
        page.goto(path).await?;
        assert_eq!(heading(c).await?, "Stillroom", "{path} did not open offline");
    }
    // A deeper path lands on the page itself, so its files (addressed relative to it) load.
    let url = c.current_url().await?;
    assert!(!url.path().contains("deeper"), "{url}");
    let answers = c
        .execute_async(
            r#"const done = arguments[arguments.length - 1];
               const ok = (u) => fetch(u).then((r) => r.ok, () => "failed");
               Promise.all([ok("./style.css"), ok("./style.css?v=2")]).then(done);"#,
            vec![],
        )
        .await?;
    assert_eq!(answers, json!([true, "failed"]), "style.css?v=2 must not be answered with style.css");
    page.close().await
}

/// Polls `script` until it answers something other than null or false.
async fn wait_until(c: &Client, script: &str) -> Result<Value, BoxError> {
    let start = Instant::now();
    loop {
        let v = c.execute(script, vec![]).await.unwrap_or(Value::Null);
        if v != Value::Null && v != json!(false) {
            return Ok(v);
        }
        if start.elapsed() > WAIT {
            return Err(format!("never true: {script}").into());
        }
        tokio::time::sleep(Duration::from_millis(100)).await;
    }
}

#[tokio::test]
async fn a_new_version_waits_for_the_growers_tap() -> Result<(), BoxError> {
    let id = browser::build_id()?;
    // A copy of the page this test may change into a "new version".
    let dir = std::env::temp_dir().join(format!("stillroom-sw-update-{}", std::process::id()));
    let _ = std::fs::remove_dir_all(&dir);
    xtask::build::copy_tree(&browser::dist()?, &dir).map_err(|e| e.0)?;
    let page = browser::open_at(&dir).await?;
    page.goto("").await?;
    let c = &page.client;
    heading(c).await?;
    assert_eq!(controlled(c).await?, [format!("stillroom-{id}")]);
    c.execute("window.__same_page = true;", vec![]).await?;

    let new_id = "0123456789abcdef";
    let sw = std::fs::read_to_string(dir.join("sw.js"))?;
    assert!(sw.contains(&id));
    std::fs::write(dir.join("sw.js"), sw.replace(&id, new_id))?;
    // The build's compressed copies would still hold the old worker: a new build writes them
    // afresh, so this stand-in for one drops them.
    for copy in ["sw.js.br", "sw.js.gz"] {
        let _ = std::fs::remove_file(dir.join(copy));
    }
    c.execute_async(
        r#"const done = arguments[arguments.length - 1];
           navigator.serviceWorker.getRegistration().then((r) => r.update()).then(() => done(true), (e) => done(String(e)));"#,
        vec![],
    )
    .await?;
    wait_until(c, "return !document.getElementById('update').hidden;").await?;
    let bar = c.find(Locator::Id("update")).await?.text().await?;
    assert!(bar.contains("new version"), "{bar}");
    // Installed and waiting; the old version still runs the page, and typing does not disturb it.
    let input = c.find(Locator::Id("f-plant_mass")).await?;
    input.clear().await?;
    input.send_keys("19").await?;
    tokio::time::sleep(Duration::from_millis(800)).await;
    let state = c
        .execute_async(
            r#"const done = arguments[arguments.length - 1];
               navigator.serviceWorker.getRegistration().then(async (r) =>
                 done({ waiting: !!r.waiting, same: window.__same_page === true, caches: (await caches.keys()).sort() }));"#,
            vec![],
        )
        .await?;
    assert_eq!(state["waiting"], json!(true), "{state}");
    assert_eq!(state["same"], json!(true), "the page reloaded without a tap: {state}");
    assert!(
        state["caches"].as_array().is_some_and(|a| a.contains(&json!(format!("stillroom-{id}")))),
        "{state}"
    );

    c.find(Locator::Id("update-apply")).await?.click().await?;
    wait_until(c, "return window.__same_page === undefined && !!document.querySelector('h1');").await?;
    let names = controlled(c).await?;
    assert_eq!(names, [format!("stillroom-{new_id}")], "the old cache is dropped");
    let mass = c.wait().at_most(WAIT).for_element(Locator::Id("f-plant_mass")).await?;
    assert_eq!(mass.prop("value").await?.as_deref(), Some("19"), "the entry survived the update");
    page.close().await?;
    let _ = std::fs::remove_dir_all(&dir);
    Ok(())
}
