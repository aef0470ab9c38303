//! Small steps the end-to-end tests take on the page, shared so each test file reads as its
//! flow: type into a field, tap a button, read and await storage, catch the files the page
//! offers for download.

use crate::BoxError;
use crate::browser::{Page, WAIT};
use fantoccini::{Client, Locator};
use serde_json::json;
use std::time::{Duration, Instant};

/// Records every download the page offers (the Blob behind the object URL and the file name)
/// instead of saving it to disk. Install with [`Page::before_load`] before the first `goto`.
pub const CAPTURE_DOWNLOADS: &str = r#"
    window.__downloads = [];
    const make = URL.createObjectURL;
    URL.createObjectURL = function (blob) {
      const url = make.call(URL, blob);
      window.__downloads.push({ url, blob, name: null });
      return url;
    };
    HTMLAnchorElement.prototype.click = function () {
      const last = window.__downloads[window.__downloads.length - 1];
      if (this.download && last && last.url === this.href) { last.name = this.download; return; }
      HTMLElement.prototype.click.call(this);
    };
"#;

/// How many downloads the page has offered since it loaded.
pub async fn download_count(c: &Client) -> Result<usize, BoxError> {
    Ok(c.execute("return window.__downloads.length;", vec![]).await?.as_u64().unwrap_or(0) as usize)
}

/// The first file the page offers after `before` downloads: (file name, text). Waits for it.
pub async fn download_after(c: &Client, before: usize) -> Result<(String, String), BoxError> {
    let start = Instant::now();
    loop {
        let v = c
            .execute_async(
                r#"const [before, done] = arguments;
                   const d = window.__downloads[before];
                   if (!d) { done(null); } else { d.blob.text().then((t) => done([d.name, t])); }"#,
                vec![json!(before)],
            )
            .await?;
        if let Some(pair) = serde_json::from_value::<Option<(String, String)>>(v)? {
            return Ok(pair);
        }
        if start.elapsed() > WAIT {
            return Err("the page offered no download".into());
        }
        tokio::time::sleep(Duration::from_millis(50)).await;
    }
}

/// The media type of the `index`-th file the page offered (as the Blob was labelled).
pub async fn download_type(c: &Client, index: usize) -> Result<String, BoxError> {
    let v = c
        .execute(
            "const d = window.__downloads[arguments[0]]; return d ? d.blob.type : null;",
            vec![json!(index)],
        )
        .await?;
    Ok(v.as_str().ok_or("no such download")?.to_string())
}

/// The latest file the page offered: (file name, text). Waits for one.
pub async fn last_download(c: &Client) -> Result<(String, String), BoxError> {
    let n = download_count(c).await?;
    download_after(c, n.saturating_sub(1)).await
}

/// Opens the page with downloads captured and storage empty, and waits for the form.
pub async fn start_clean(page: &Page) -> Result<(), BoxError> {
    page.before_load(CAPTURE_DOWNLOADS).await?;
    page.goto("").await?;
    page.client.execute("localStorage.clear();", vec![]).await?;
    page.client.refresh().await?;
    wait_for(&page.client, "#f-plant_mass").await
}

/// Waits until an element matching `css` is on the page.
pub async fn wait_for(c: &Client, css: &str) -> Result<(), BoxError> {
    c.wait().at_most(WAIT).for_element(Locator::Css(css)).await?;
    Ok(())
}

/// Waits until no element matches `css`.
pub async fn wait_gone(c: &Client, css: &str) -> Result<(), BoxError> {
    let start = Instant::now();
    while c.find(Locator::Css(css)).await.is_ok() {
        if start.elapsed() > WAIT {
            return Err(format!("{css} is still on the page").into());
        }
        tokio::time::sleep(Duration::from_millis(50)).await;
    }
    Ok(())
}

/// Replaces the text of the first input matching `css`.
pub async fn fill(c: &Client, css: &str, text: &str) -> Result<(), BoxError> {
    let input = c.find(Locator::Css(css)).await?;
    input.clear().await?;
    input.send_keys(text).await?;
    Ok(())
}

/// Types into the element with `id` even inside a folded section, as a paste would: its value
/// set and an `input` event sent.
pub async fn type_into(c: &Client, id: &str, text: &str) -> Result<(), BoxError> {
    c.execute(
        "const i = document.getElementById(arguments[0]); i.value = arguments[1]; i.dispatchEvent(new Event('input', {bubbles: true}));",
        vec![json!(id), json!(text)],
    )
    .await?;
    Ok(())
}

/// Chooses `value` in the drop-down list with `id`, as a tap on the option would (a `change`
/// event).
pub async fn choose(c: &Client, id: &str, value: &str) -> Result<(), BoxError> {
    c.execute(
        "const s = document.getElementById(arguments[0]); s.value = arguments[1]; s.dispatchEvent(new Event('change', {bubbles: true}));",
        vec![json!(id), json!(value)],
    )
    .await?;
    Ok(())
}

/// Taps the first element matching `css`.
pub async fn tap(c: &Client, css: &str) -> Result<(), BoxError> {
    c.find(Locator::Css(css)).await?.click().await?;
    Ok(())
}

/// How many elements match `css`.
pub async fn count(c: &Client, css: &str) -> Result<usize, BoxError> {
    Ok(c.find_all(Locator::Css(css)).await?.len())
}

/// Waits until exactly `n` elements match `css`.
pub async fn wait_count(c: &Client, css: &str, n: usize) -> Result<(), BoxError> {
    let start = Instant::now();
    loop {
        let got = count(c, css).await?;
        if got == n {
            return Ok(());
        }
        if start.elapsed() > WAIT {
            return Err(format!("{css}: {got} on the page, wanted {n}").into());
        }
        tokio::time::sleep(Duration::from_millis(50)).await;
    }
}

/// The stored text under `key`, if any.
pub async fn stored(c: &Client, key: &str) -> Result<Option<String>, BoxError> {
    let v = c.execute("return localStorage.getItem(arguments[0]);", vec![json!(key)]).await?;
    Ok(v.as_str().map(str::to_string))
}

/// The names of the saved plans in a "download everything" file, in their order.
pub fn saved_plan_names(everything: &serde_json::Value) -> Vec<&str> {
    everything["library_record"]["plans"]
        .as_array()
        .into_iter()
        .flatten()
        .filter_map(|p| p["name"].as_str())
        .collect()
}

/// The form's scenario as the page would save it (read through the page's bridge).
pub async fn form_plan(c: &Client) -> Result<serde_json::Value, BoxError> {
    let v = c
        .execute("return window.stillroomCurrentPlan ? window.stillroomCurrentPlan() : null;", vec![])
        .await?;
    let text = v.as_str().ok_or("the page offers no form plan")?;
    let record: serde_json::Value = serde_json::from_str(text)?;
    Ok(record["scenario"].clone())
}

/// Hands `scenario_text` to the plan's form as the workbench does when it opens a plan.
pub async fn open_in_form(c: &Client, scenario_text: &str) -> Result<(), BoxError> {
    c.execute(
        "window.dispatchEvent(new CustomEvent('stillroom-open-plan', { detail: arguments[0] }));",
        vec![json!(scenario_text)],
    )
    .await?;
    Ok(())
}

/// Polls the record under `key` until `test` holds; the record.
pub async fn wait_stored(c: &Client, key: &str, test: impl Fn(&str) -> bool) -> Result<String, BoxError> {
    let start = Instant::now();
    loop {
        let got = stored(c, key).await?.unwrap_or_default();
        if test(&got) {
            return Ok(got);
        }
        if start.elapsed() > WAIT {
            return Err(format!("{key} never matched: {}", &got[..got.len().min(300)]).into());
        }
        tokio::time::sleep(Duration::from_millis(50)).await;
    }
}
