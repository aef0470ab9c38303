//! The release page under its Content-Security-Policy, in headless Chromium: no violation from
//! the first byte to a page in use, and not one request to another origin.

use fantoccini::Locator;
use serde_json::{Value, json};
use std::time::Duration;
use stillroom_tests::BoxError;
use stillroom_tests::browser;

const WAIT: Duration = Duration::from_secs(15);

/// The policy, as the page states it (and as DEVELOPERS.md states it for the server's header).
const POLICY: &str = "default-src 'none'; script-src 'self' 'wasm-unsafe-eval'; style-src 'self'; img-src 'self'; connect-src 'self'; manifest-src 'self'; worker-src 'self'; base-uri 'none'; form-action 'none'";

/// Runs before any of the page's own scripts: every violation is recorded in the window.
const WATCH_VIOLATIONS: &str = r#"
    window.__violations = [];
    document.addEventListener("securitypolicyviolation", (e) => {
      window.__violations.push(e.violatedDirective + " " + e.blockedURI + " " + (e.sourceFile || "") + ":" + e.lineNumber);
    });
"#;

async fn violations(c: &fantoccini::Client) -> Result<Vec<String>, BoxError> {
    Ok(serde_json::from_value(c.execute("return window.__violations;", vec![]).await?)?)
}

#[tokio::test]
async fn the_policy_is_stated_once_and_the_same_everywhere() -> Result<(), BoxError> {
    let html = browser::read_dist("index.html")?;
    let meta = format!("<meta http-equiv=\"Content-Security-Policy\" content=\"{POLICY}\">");
    assert!(html.contains(&meta), "dist/index.html lacks the policy {POLICY}");
    // It must come before anything it governs.
    assert!(html.find(&meta) < html.find("<link"), "the policy meta tag must precede the links");
    assert!(!html.contains("<script>") && !html.contains("<script type=\"module\">"), "an inline script");
    assert!(!html.contains(" style="), "an inline style attribute");
    let guide = std::fs::read_to_string(xtask::workspace_root().join("DEVELOPERS.md"))?;
    assert!(guide.contains(POLICY), "DEVELOPERS.md does not state the policy");
    // The served header is the same policy plus frame-ancestors (honoured only as a header).
    assert_eq!(xtask::serve::CONTENT_SECURITY_POLICY, format!("{POLICY}; frame-ancestors 'none'"));
    Ok(())
}

#[tokio::test]
async fn the_page_in_use_breaks_no_rule_of_its_policy_and_asks_no_other_origin() -> Result<(), BoxError> {
    let page = browser::open().await?;
    page.before_load(WATCH_VIOLATIONS).await?;
    page.goto("").await?;
    let c = &page.client;
    c.wait().at_most(WAIT).for_element(Locator::Id("f-plant_mass")).await?;
    // Unreadable saved data, so the kept-aside list and notices are drawn too.
    c.execute("localStorage.clear(); localStorage.setItem('stillroom.scenario', '{broken');", vec![]).await?;
    c.refresh().await?;
    c.wait().at_most(WAIT).for_element(Locator::Css("[data-kept='0']")).await?;
    // Use it: fields, pickers, the own compound, the chart and panels, the workbench.
    let mass = c.find(Locator::Id("f-plant_mass")).await?;
    mass.clear().await?;
    mass.send_keys("18").await?;
    c.find(Locator::Id("f-oil")).await?.select_by_value("mixture").await?;
    c.find(Locator::Id("mix-add")).await?.click().await?;
    c.execute(
        "document.querySelectorAll('details').forEach((d) => { d.open = true; d.dispatchEvent(new Event('toggle')); });",
        vec![],
    )
    .await?;
    // The workbench module too: its plan as text is drawn once it has loaded and read the form.
    c.find(Locator::Id("mode-workbench")).await?.click().await?;
    c.wait().at_most(WAIT).for_element(Locator::Id("plan-text")).await?;
    c.find(Locator::Id("mode-plan")).await?.click().await?;
    c.find(Locator::Css("[data-kept='0'] .kept-delete")).await?.click().await?;
    // The service worker is part of the page: wait until it controls it.
    let ready = c
        .execute_async(
            r#"const done = arguments[arguments.length - 1];
               navigator.serviceWorker.ready.then(() => done(true), (e) => done(String(e)));"#,
            vec![],
        )
        .await?;
    assert_eq!(ready, json!(true));
    tokio::time::sleep(Duration::from_millis(300)).await;
    assert_eq!(violations(c).await?, Vec::<String>::new());
    let foreign: Value = c
        .execute(
            "return performance.getEntriesByType('resource').map((e) => e.name)
                 .filter((u) => new URL(u).origin !== location.origin);",
            vec![],
        )
        .await?;
    assert_eq!(foreign, json!([]), "requests to other origins");
    let fetched = c.execute("return performance.getEntriesByType('resource').length;", vec![]).await?;
    assert!(fetched.as_u64().unwrap_or(0) >= 4, "the resource timing list looks empty: {fetched}");

    // The watch is live: an inline script is refused, and counted.
    c.execute(
        "const s = document.createElement('script'); s.textContent = 'window.__ran = 1;'; document.head.append(s);",
        vec![],
    )
    .await?;
    tokio::time::sleep(Duration::from_millis(200)).await;
    let seen = violations(c).await?;
    // One report per policy in force: the meta tag's and the served header's.
    assert!((1..=2).contains(&seen.len()), "{seen:?}");
    assert!(seen.iter().all(|v| v.starts_with("script-src")), "{seen:?}");
    assert_eq!(c.execute("return window.__ran === undefined;", vec![]).await?, json!(true));
    page.close().await
}
