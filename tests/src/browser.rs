//! A headless Chromium session on the built page.
//!
//! [`open`] checks that `dist/` holds a build, serves it on a free loopback port, starts
//! ChromeDriver on another, opens a WebDriver session with a phone-sized viewport (412 x 915 CSS
//! pixels, set through the DevTools protocol and checked) and returns a [`Page`]. Dropping the
//! `Page` ends ChromeDriver and the browser it started, and removes the browser profile.
//! Sessions are taken one at a time: the machine has two cores.

use crate::BoxError;
use fantoccini::wd::{Capabilities, WebDriverCompatibleCommand};
use fantoccini::{Client, ClientBuilder};
use hyper_util::client::legacy::connect::HttpConnector;
use serde_json::{Value, json};
use std::net::{TcpListener, TcpStream};
use std::os::unix::process::CommandExt;
use std::path::PathBuf;
use std::process::{Child, Command, Stdio};
use std::time::{Duration, Instant};
use tokio::sync::{Mutex, MutexGuard};
use xtask::serve::Server;

/// The phone viewport the page is tested at, in CSS pixels.
pub const VIEWPORT: (u32, u32) = (412, 915);

/// Chromium flags for a quiet, headless run as root in a container.
pub const CHROMIUM_FLAGS: [&str; 9] = [
    "--headless=new",
    "--no-sandbox",
    "--disable-gpu",
    "--disable-dev-shm-usage",
    "--disable-quic",
    "--no-first-run",
    "--disable-background-networking",
    "--disable-component-update",
    "--disable-sync",
];

/// Held by each open [`Page`]: one browser at a time, whichever test thread asks.
static ONE_AT_A_TIME: Mutex<()> = Mutex::const_new(());

/// The built page's folder, or an error telling how to make it.
pub fn dist() -> Result<PathBuf, BoxError> {
    let dist = xtask::dist_dir(&xtask::workspace_root());
    if dist.join("index.html").is_file() {
        Ok(dist)
    } else {
        Err(format!(
            "{} is missing: run `cargo xtask build` first (`cargo xtask test` does)",
            dist.join("index.html").display()
        )
        .into())
    }
}

/// A program from an environment variable, else the first of `defaults` that exists.
fn program(var: &str, defaults: &[&str]) -> Result<PathBuf, BoxError> {
    if let Some(p) = std::env::var_os(var).filter(|p| !p.is_empty()) {
        return Ok(PathBuf::from(p));
    }
    defaults.iter().map(PathBuf::from).find(|p| p.is_file()).ok_or_else(|| {
        format!("none of {defaults:?} exists (set {var}, or run `cargo xtask setup` to install it)").into()
    })
}

fn free_port() -> std::io::Result<u16> {
    Ok(TcpListener::bind(("127.0.0.1", 0))?.local_addr()?.port())
}

/// A fresh, empty folder under the system temp dir.
fn fresh_dir(tag: &str) -> std::io::Result<PathBuf> {
    let nanos = std::time::SystemTime::now()
        .duration_since(std::time::UNIX_EPOCH)
        .map(|d| d.subsec_nanos())
        .unwrap_or(0);
    let d = std::env::temp_dir().join(format!("stillroom-{tag}-{}-{nanos}", std::process::id()));
    std::fs::create_dir_all(&d)?;
    Ok(d)
}

/// A DevTools protocol command sent through ChromeDriver's `goog/cdp/execute` endpoint.
#[derive(Debug)]
struct Cdp {
    cmd: String,
    params: Value,
}

impl WebDriverCompatibleCommand for Cdp {
    fn endpoint(&self, base_url: &url::Url, session_id: Option<&str>) -> Result<url::Url, url::ParseError> {
        base_url.join(&format!("session/{}/goog/cdp/execute", session_id.unwrap_or_default()))
    }

    fn method_and_body(&self, _request_url: &url::Url) -> (http::Method, Option<String>) {
        let body = json!({ "cmd": self.cmd, "params": self.params });
        (http::Method::POST, Some(body.to_string()))
    }
}

/// ChromeDriver, in a process group of its own so the browser it starts ends with it.
struct Driver {
    child: Child,
    log: PathBuf,
}

impl Driver {
    fn start(port: u16, log: PathBuf) -> Result<Driver, BoxError> {
        let exe = program("CHROMEDRIVER", &["/usr/bin/chromedriver"])?;
        let out = std::fs::File::create(&log)?;
        let err = out.try_clone()?;
        let child = Command::new(&exe)
            .arg(format!("--port={port}"))
            .stdin(Stdio::null())
            .stdout(out)
            .stderr(err)
            .process_group(0)
            .spawn()
            .map_err(|e| format!("cannot start {}: {e}", exe.display()))?;
        let mut driver = Driver { child, log };
        let deadline = Instant::now() + Duration::from_secs(20);
        loop {
            if TcpStream::connect(("127.0.0.1", port)).is_ok() {
                return Ok(driver);
            }
            if let Some(status) = driver.child.try_wait()? {
                return Err(format!("chromedriver exited ({status}): {}", driver.log_tail()).into());
            }
            if Instant::now() > deadline {
                return Err(format!(
                    "chromedriver did not listen on port {port} within 20 s: {}",
                    driver.log_tail()
                )
                .into());
            }
            std::thread::sleep(Duration::from_millis(50));
        }
    }

    fn log_tail(&self) -> String {
        let text = std::fs::read_to_string(&self.log).unwrap_or_default();
        let lines: Vec<&str> = text.lines().collect();
        lines[lines.len().saturating_sub(20)..].join("\n")
    }

    fn signal_group(&self, signal: &str) {
        // The group id is the driver's pid (process_group(0)); the browser is in that group.
        let _ = Command::new("kill")
            .args([signal, "--", &format!("-{}", self.child.id())])
            .stdout(Stdio::null())
            .stderr(Stdio::null())
            .status();
    }
}

impl Drop for Driver {
    fn drop(&mut self) {
        self.signal_group("-TERM");
        let deadline = Instant::now() + Duration::from_secs(3);
        while Instant::now() < deadline {
            if matches!(self.child.try_wait(), Ok(Some(_))) {
                break;
            }
            std::thread::sleep(Duration::from_millis(25));
        }
        // Whatever of the group is left (a browser helper that ignored TERM) goes now.
        self.signal_group("-KILL");
        let _ = self.child.wait();
    }
}

/// A browser session on the served page. Fields drop in order: the WebDriver client, the
/// driver (and its browser), the server, then the lock.
pub struct Page {
    pub client: Client,
    driver: Option<Driver>,
    server: Option<Server>,
    base: String,
    profile: PathBuf,
    _turn: MutexGuard<'static, ()>,
}

/// Serve `dist/`, start ChromeDriver and Chromium, and open a session at the phone viewport. The
/// browser is on `about:blank`; call [`Page::goto`].
pub async fn open() -> Result<Page, BoxError> {
    open_at(&dist()?).await
}

/// Like [`open`], serving `dir` (a copy of `dist/` a test may change) instead of `dist/`.
pub async fn open_at(dist: &std::path::Path) -> Result<Page, BoxError> {
    let turn = ONE_AT_A_TIME.lock().await;
    let server = Server::start(dist)?;
    let base = server.url();
    let profile = fresh_dir("chromium-profile")?;
    let port = free_port()?;
    let driver = Driver::start(port, profile.join("chromedriver.log"))?;

    let chromium = program("CHROMIUM", &["/usr/bin/chromium", "/usr/bin/chromium-browser"])?;
    let mut args: Vec<String> = CHROMIUM_FLAGS.iter().map(|s| s.to_string()).collect();
    args.push(format!("--window-size={},{}", VIEWPORT.0, VIEWPORT.1));
    args.push(format!("--user-data-dir={}", profile.join("user-data").display()));
    let mut caps = Capabilities::new();
    caps.insert("browserName".into(), json!("chrome"));
    caps.insert("goog:chromeOptions".into(), json!({ "binary": chromium, "args": args }));
    let client = ClientBuilder::new(HttpConnector::new())
        .capabilities(caps)
        .connect(&format!("http://127.0.0.1:{port}"))
        .await
        .map_err(|e| format!("WebDriver session failed: {e}\n{}", driver.log_tail()))?;

    let page = Page { client, driver: Some(driver), server: Some(server), base, profile, _turn: turn };
    page.cdp(
        "Emulation.setDeviceMetricsOverride",
        json!({
            "width": VIEWPORT.0,
            "height": VIEWPORT.1,
            "deviceScaleFactor": 1,
            "mobile": true
        }),
    )
    .await?;
    Ok(page)
}

impl Page {
    /// What the page's server has sent so far (responses and bytes over the wire).
    pub fn traffic(&self) -> &xtask::serve::Traffic {
        self.server.as_ref().expect("the server lives as long as the page").traffic()
    }

    /// The served page's URL for `path` (relative, no leading slash; "" is the page itself).
    pub fn url(&self, path: &str) -> String {
        format!("{}{}", self.base, path.trim_start_matches('/'))
    }

    /// Navigate to `path` on the served page and check the viewport came out phone-sized.
    pub async fn goto(&self, path: &str) -> Result<(), BoxError> {
        self.client.goto(&self.url(path)).await?;
        let (w, h) = self.viewport().await?;
        if (w, h) != (u64::from(VIEWPORT.0), u64::from(VIEWPORT.1)) {
            return Err(
                format!("viewport is {w} x {h} CSS px, wanted {} x {}", VIEWPORT.0, VIEWPORT.1).into()
            );
        }
        Ok(())
    }

    /// The layout viewport, in CSS pixels (`innerWidth`, `innerHeight`).
    pub async fn viewport(&self) -> Result<(u64, u64), BoxError> {
        let v = self.client.execute("return [window.innerWidth, window.innerHeight];", vec![]).await?;
        match (v[0].as_u64(), v[1].as_u64()) {
            (Some(w), Some(h)) => Ok((w, h)),
            _ => Err(format!("unexpected viewport answer {v}").into()),
        }
    }

    /// Send a DevTools protocol command; returns its result object.
    pub async fn cdp(&self, cmd: &str, params: Value) -> Result<Value, BoxError> {
        Ok(self.client.issue_cmd(Cdp { cmd: cmd.to_string(), params }).await?)
    }

    /// Run `source` in every document this session opens from now on, before the page's own
    /// scripts (DevTools `Page.addScriptToEvaluateOnNewDocument`): to watch or break the page
    /// from its very start.
    pub async fn before_load(&self, source: &str) -> Result<(), BoxError> {
        self.cdp("Page.addScriptToEvaluateOnNewDocument", json!({ "source": source })).await?;
        Ok(())
    }

    /// Fill `localStorage` with filler keys (`fill.N`) until not one more character fits; the
    /// number of characters stored.
    pub async fn fill_storage(&self) -> Result<u64, BoxError> {
        let v = self.client.execute(FILL_STORAGE, vec![]).await?;
        v.as_u64().ok_or_else(|| format!("filling storage answered {v}").into())
    }

    /// Remove the filler keys [`Page::fill_storage`] wrote.
    pub async fn unfill_storage(&self) -> Result<(), BoxError> {
        self.client
            .execute(
                "Object.keys(localStorage).filter((k) => k.startsWith('fill.')).forEach((k) => localStorage.removeItem(k));",
                vec![],
            )
            .await?;
        Ok(())
    }

    /// Stop serving: from now on only what the browser has cached can load.
    pub fn stop_server(&mut self) {
        self.server = None;
    }

    /// The static server's folder on disk.
    pub fn dist(&self) -> PathBuf {
        xtask::dist_dir(&xtask::workspace_root())
    }

    /// End the WebDriver session cleanly (closes the browser), then stop the driver and server.
    pub async fn close(mut self) -> Result<(), BoxError> {
        let client = self.client.clone();
        client.close().await?;
        self.driver = None;
        Ok(())
    }
}

impl Drop for Page {
    fn drop(&mut self) {
        self.driver = None;
        self.server = None;
        let _ = std::fs::remove_dir_all(&self.profile);
    }
}

/// Writes ever smaller chunks under `fill.N` keys, then grows the last one, until not a single
/// character more fits.
const FILL_STORAGE: &str = r#"
    let n = 0, stored = 0;
    for (let size = 1 << 20; size >= 1; size = Math.floor(size / 2)) {
      const chunk = "x".repeat(size);
      for (;;) {
        try { localStorage.setItem("fill." + n, chunk); n += 1; stored += size; }
        catch (e) { break; }
      }
    }
    // A new key costs its name too: grow the last value one character at a time as well.
    const last = "fill." + (n - 1);
    for (;;) {
      try { localStorage.setItem(last, localStorage.getItem(last) + "x"); stored += 1; }
      catch (e) { break; }
    }
    return stored;
"#;

/// Read a file of the built page as text.
pub fn read_dist(name: &str) -> Result<String, BoxError> {
    let p: PathBuf = dist()?.join(name);
    std::fs::read_to_string(&p).map_err(|e| format!("{}: {e}", p.display()).into())
}

/// The build id `cargo xtask build` wrote into `dist/index.html`.
pub fn build_id() -> Result<String, BoxError> {
    let html = read_dist("index.html")?;
    let marker = "name=\"stillroom-build\" content=\"";
    let start = html.find(marker).ok_or("dist/index.html has no stillroom-build meta tag")? + marker.len();
    let id = &html[start..];
    let id = &id[..id.find('"').ok_or("unterminated build id")?];
    if id.len() != 16 || !id.chars().all(|c| c.is_ascii_hexdigit()) {
        return Err(format!("build id `{id}` is not 16 hex digits").into());
    }
    Ok(id.to_string())
}

/// A paper size for [`Page::print_pdf`], in inches (what DevTools takes).
#[derive(Debug, Clone, Copy)]
pub struct Paper {
    pub name: &'static str,
    pub width_in: f64,
    pub height_in: f64,
}

/// ISO 216 A4, 210 x 297 mm.
pub const A4: Paper = Paper { name: "A4", width_in: 210.0 / 25.4, height_in: 297.0 / 25.4 };
/// US Letter, 8.5 x 11 in (ANSI/ASME Y14.1).
pub const LETTER: Paper = Paper { name: "US Letter", width_in: 8.5, height_in: 11.0 };

impl Page {
    /// The page printed to PDF as the browser's print dialog would (the print stylesheet, the
    /// page's own `@page` margins), on `paper`.
    pub async fn print_pdf(&self, paper: Paper) -> Result<Vec<u8>, BoxError> {
        use base64::Engine;
        let out = self
            .cdp(
                "Page.printToPDF",
                json!({"paperWidth": paper.width_in, "paperHeight": paper.height_in, "preferCSSPageSize": false}),
            )
            .await?;
        let data = out["data"].as_str().ok_or("printToPDF gave no data")?;
        Ok(base64::engine::general_purpose::STANDARD.decode(data)?)
    }
}

/// Pages in a PDF: its page objects (`/Type /Page`, not the `/Pages` tree nodes).
pub fn pdf_pages(pdf: &[u8]) -> usize {
    let text = String::from_utf8_lossy(pdf);
    text.match_indices("/Type /Page").filter(|(i, _)| !text[i + 11..].starts_with('s')).count()
}

/// How long a test waits for the page to show something (updates are asynchronous).
pub const WAIT: Duration = Duration::from_secs(15);

/// Waits until the text of the first element matching `css` satisfies `ok`, and returns it; an
/// error naming what the page showed after [`WAIT`].
pub async fn wait_text(client: &Client, css: &str, ok: impl Fn(&str) -> bool) -> Result<String, BoxError> {
    let start = Instant::now();
    loop {
        let got = match client.find(fantoccini::Locator::Css(css)).await {
            Ok(e) => e.text().await.unwrap_or_default(),
            Err(_) => String::new(),
        };
        if ok(&got) {
            return Ok(got);
        }
        if start.elapsed() > WAIT {
            return Err(format!("{css}: page shows {got:?}").into());
        }
        tokio::time::sleep(Duration::from_millis(50)).await;
    }
}
