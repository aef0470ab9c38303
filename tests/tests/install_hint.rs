//! The install hint shows where the browser offers an install, and once the grower declines it
//! (✕) it stays away on later visits. The browser's offer is its `beforeinstallprompt` event
//! (WHATWG/W3C Web App Manifest, "installation prompts"), dispatched here by the test as the
//! browser would.

use stillroom_tests::BoxError;
use stillroom_tests::browser;
use stillroom_tests::drive::{self, count, stored, tap, wait_count};

/// The browser's install offer, with the `prompt()` the page calls on "Install".
const OFFER: &str = "const e = new Event('beforeinstallprompt', { cancelable: true }); \
    e.prompt = () => Promise.resolve(); window.dispatchEvent(e);";

#[tokio::test]
async fn a_declined_install_hint_stays_away_after_a_reload() -> Result<(), BoxError> {
    let page = browser::open().await?;
    // Chromium may offer an install of its own (the page is installable on localhost): note it,
    // so the first check asks only that no hint shows without an offer.
    page.before_load(
        "window.__offered = false; window.addEventListener('beforeinstallprompt', () => { window.__offered = true; });",
    )
    .await?;
    drive::start_clean(&page).await?;
    let c = &page.client;
    let offered = c.execute("return window.__offered === true;", vec![]).await?.as_bool().unwrap_or(false);
    if !offered {
        assert_eq!(count(c, ".install-hint").await?, 0, "no hint before the browser offers");
    }
    c.execute(OFFER, vec![]).await?;
    wait_count(c, ".install-hint", 1).await?;
    tap(c, ".install-hint button[aria-label='No thanks']").await?;
    wait_count(c, ".install-hint", 0).await?;
    assert!(stored(c, "stillroom.install-dismissed").await?.is_some(), "the dismissal is not stored");
    c.refresh().await?;
    drive::wait_for(c, "#f-plant_mass").await?;
    c.execute(OFFER, vec![]).await?;
    // Give the page time to show a hint it should not show.
    tokio::time::sleep(std::time::Duration::from_millis(500)).await;
    assert_eq!(count(c, ".install-hint").await?, 0, "the declined hint came back");
    // A fresh profile's page still offers it.
    c.execute("localStorage.clear();", vec![]).await?;
    c.refresh().await?;
    drive::wait_for(c, "#f-plant_mass").await?;
    c.execute(OFFER, vec![]).await?;
    wait_count(c, ".install-hint", 1).await?;
    page.close().await
}
