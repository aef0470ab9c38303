//! `cargo xtask bench`: measures the page and the core and writes `BENCHMARKS.md`, dated, with
//! the machine. Figures, not pass/fail: timings on a shared machine are reported, never asserted.
//!
//! Rows: `plan()` natively and in wasm in headless Chromium (median, p95, their ratio from the
//! same run); keystroke to updated DOM, unthrottled and at 4x CPU slowdown; first-load bytes per
//! file (raw, gzip, Brotli); time to the first plan on screen on an emulated weak link (150 ms
//! round trip, 1.6 Mbit/s down, 750 kbit/s up, 4x CPU, cold profile; median of 5); bytes over the
//! wire on a first visit, the service worker included, and on an offline revisit; wasm memory and
//! JS heap after load and after 1,000 edits.
//!
//! The same measures (but `plan()` and the visit's bytes) are taken with the same code on the
//! measuring anchor (`tests/anchor`, built by `cargo xtask bench` into `<target>/anchor-dist/`):
//! a minimal Leptos page with as many inputs and formatted outputs and no physics, so each table
//! has the framework's floor as a row and the page's figure as a ratio over it.

use serde_json::json;
use std::fmt::Write as _;
use std::hint::black_box;
use std::time::{Duration, Instant};
use stillroom_tests::BoxError;
use stillroom_tests::browser::{self, Page, WAIT, wait_text};
use xtask::sizes::FirstLoad;

/// The weak link of the measurements: DevTools network emulation (bytes per second).
const LINK: (f64, f64, f64) = (150.0, 1.6e6 / 8.0, 750e3 / 8.0);
const SLOW_CPU: f64 = 4.0;

fn percentile(sorted: &[f64], p: f64) -> f64 {
    if sorted.is_empty() {
        return f64::NAN;
    }
    let i = ((sorted.len() - 1) as f64 * p).round() as usize;
    sorted[i.min(sorted.len() - 1)]
}

fn sorted(mut v: Vec<f64>) -> Vec<f64> {
    v.sort_by(|a, b| a.total_cmp(b));
    v
}

/// µs per plan natively, batches of 20 (the same batching as in the browser).
fn native_plan_us() -> Vec<f64> {
    let s = stillroom_core::Scenario::default();
    for _ in 0..50 {
        black_box(stillroom_core::plan(black_box(&s)).ok());
    }
    (0..200)
        .map(|_| {
            let start = Instant::now();
            for _ in 0..20 {
                black_box(stillroom_core::plan(black_box(&s)).ok());
            }
            start.elapsed().as_secs_f64() * 1e6 / 20.0
        })
        .collect()
}

async fn fresh_page() -> Result<Page, BoxError> {
    fresh_page_at(&browser::dist()?).await
}

/// A browser on the page served from `dir` (`dist/` or the anchor's folder), storage cleared and
/// the watched output on screen.
async fn fresh_page_at(dir: &std::path::Path) -> Result<Page, BoxError> {
    let page = browser::open_at(dir).await?;
    page.goto("").await?;
    page.client.execute("localStorage.clear();", vec![]).await?;
    page.client.refresh().await?;
    wait_text(&page.client, "[data-out=steam_total]", |t| t.ends_with("kg") || t.ends_with("lb")).await?;
    Ok(page)
}

async fn wasm_plan_us(page: &Page) -> Result<Vec<f64>, BoxError> {
    page.client.execute("window.stillroomBenchPlan(20, 20);", vec![]).await?;
    let v = page.client.execute("return window.stillroomBenchPlan(200, 20);", vec![]).await?;
    let text = v.as_str().ok_or("no bench hook on the page")?;
    Ok(serde_json::from_str(text)?)
}

/// Times `edits` edits of the plant mass, each from the input event to the headline's new text
/// (the page updates asynchronously: polled on the event loop).
const EDITS: &str = r#"const [edits, done] = [arguments[0], arguments[arguments.length - 1]];
const input = document.getElementById('f-plant_mass');
const out = document.querySelector('[data-out=steam_total]');
const times = [];
(async () => {
  for (let i = 0; i < edits; i++) {
    const before = out.textContent;
    input.value = String(10 + (i % 40) + 0.5);
    const t0 = performance.now();
    input.dispatchEvent(new Event('input', { bubbles: true }));
    while (out.textContent === before && performance.now() - t0 < 2000) {
      await new Promise((r) => setTimeout(r, 0));
    }
    times.push(performance.now() - t0);
    await new Promise((r) => requestAnimationFrame(() => setTimeout(r, 0)));
  }
  done(times);
})();"#;

async fn keystrokes(page: &Page, edits: u32) -> Result<Vec<f64>, BoxError> {
    let v = page.client.execute_async(EDITS, vec![json!(edits)]).await?;
    Ok(serde_json::from_value(v)?)
}

async fn memory(page: &Page) -> Result<(f64, f64), BoxError> {
    let v = page
        .client
        .execute(
            "return [Number(window.stillroomWasmBytes()), performance.memory ? performance.memory.usedJSHeapSize : NaN];",
            vec![],
        )
        .await?;
    Ok((v[0].as_f64().unwrap_or(f64::NAN), v[1].as_f64().unwrap_or(f64::NAN)))
}

/// Records when the first plan is on screen, from the navigation's start.
const WATCH_FIRST_PLAN: &str = r#"new MutationObserver((_, obs) => {
  const el = document.querySelector('[data-out=steam_total]');
  if (el && /kg|lb/.test(el.textContent)) { window.__firstPlanMs = performance.now(); obs.disconnect(); }
}).observe(document, { subtree: true, childList: true, characterData: true });"#;

async fn emulate_weak_link(page: &Page) -> Result<(), BoxError> {
    page.cdp("Network.enable", json!({})).await?;
    page.cdp(
        "Network.emulateNetworkConditions",
        json!({"offline": false, "latency": LINK.0, "downloadThroughput": LINK.1, "uploadThroughput": LINK.2}),
    )
    .await?;
    page.cdp("Emulation.setCPUThrottlingRate", json!({"rate": SLOW_CPU})).await?;
    Ok(())
}

/// Time to the first plan on a cold profile over the weak link, ms.
async fn first_plan_ms(dir: &std::path::Path) -> Result<f64, BoxError> {
    let page = browser::open_at(dir).await?;
    page.before_load(WATCH_FIRST_PLAN).await?;
    emulate_weak_link(&page).await?;
    page.goto("").await?;
    let start = Instant::now();
    loop {
        let v = page.client.execute("return window.__firstPlanMs || null;", vec![]).await?;
        if let Some(ms) = v.as_f64() {
            page.close().await?;
            return Ok(ms);
        }
        if start.elapsed() > Duration::from_secs(120) {
            return Err("no plan on screen after 120 s".into());
        }
        tokio::time::sleep(Duration::from_millis(100)).await;
    }
}

/// Bytes over the wire on a first visit until the offline copy is complete, then on a revisit
/// with the network off.
async fn visit_bytes() -> Result<(u64, u64, usize), BoxError> {
    let page = fresh_page().await?;
    let sw = browser::read_dist("sw.js")?;
    let listed =
        sw.lines().find(|l| l.starts_with("const PRECACHE")).map(|l| l.matches("\"./").count()).unwrap_or(0);
    let start = Instant::now();
    loop {
        let n = page
            .client
            .execute_async(
                r#"const done = arguments[arguments.length - 1];
                   navigator.serviceWorker.ready.then(async () => {
                     const mine = (await caches.keys()).filter((n) => n.startsWith('stillroom-'));
                     done(mine.length === 1 ? (await (await caches.open(mine[0])).keys()).length : 0);
                   });"#,
                vec![],
            )
            .await?;
        if n.as_u64().unwrap_or(0) as usize >= listed || start.elapsed() > WAIT * 4 {
            break;
        }
        tokio::time::sleep(Duration::from_millis(200)).await;
    }
    let first = page.traffic().wire_bytes();
    let responses = page.traffic().served().len();
    page.cdp("Network.enable", json!({})).await?;
    page.cdp(
        "Network.emulateNetworkConditions",
        json!({"offline": true, "latency": 0, "downloadThroughput": -1, "uploadThroughput": -1}),
    )
    .await?;
    page.client.refresh().await?;
    wait_text(&page.client, "[data-out=steam_total]", |t| t.ends_with("kg")).await?;
    let revisit = page.traffic().wire_bytes() - first;
    page.close().await?;
    Ok((first, revisit, responses))
}

/// How many number inputs, pickers and formatted outputs the served page shows: what makes the
/// anchor "of the same size".
const COUNT_PARTS: &str = r#"return [
  document.querySelectorAll('input[id^="f-"][inputmode=decimal]').length,
  document.querySelectorAll('select[id^="f-"], input[id^="f-"][type=checkbox]').length,
  document.querySelectorAll('[data-out]').length,
];"#;

async fn parts(page: &Page) -> Result<[u64; 3], BoxError> {
    let v = page.client.execute(COUNT_PARTS, vec![]).await?;
    Ok([0, 1, 2].map(|i| v[i].as_u64().unwrap_or(0)))
}

/// The anchor's figures, taken with the page's own measuring functions.
struct Anchor {
    parts: [u64; 3],
    quick: Vec<f64>,
    slow: Vec<f64>,
    memory: [(f64, f64); 2],
    first: FirstLoad,
    cold: Vec<f64>,
}

async fn measure_anchor(dir: &std::path::Path) -> Result<Anchor, BoxError> {
    let first = FirstLoad::measure_files(dir, &xtask::build::ANCHOR_FIRST_LOAD_FILES)
        .map_err(|e| format!("{e}: the measuring anchor is not built (`cargo xtask bench` builds it)"))?;
    eprintln!("bench: the anchor's keystrokes");
    let page = fresh_page_at(dir).await?;
    let parts = parts(&page).await?;
    let after_load = memory(&page).await?;
    let quick = keystrokes(&page, 200).await?;
    page.cdp("Emulation.setCPUThrottlingRate", json!({"rate": SLOW_CPU})).await?;
    let slow = keystrokes(&page, 200).await?;
    page.cdp("Emulation.setCPUThrottlingRate", json!({"rate": 1})).await?;
    keystrokes(&page, 600).await?;
    let _ = page.cdp("HeapProfiler.collectGarbage", json!({})).await;
    let after_edits = memory(&page).await?;
    page.close().await?;
    eprintln!("bench: the anchor's first output on a weak link (5 cold visits)");
    let mut cold = Vec::new();
    for _ in 0..5 {
        cold.push(first_plan_ms(dir).await?);
    }
    Ok(Anchor { parts, quick, slow, memory: [after_load, after_edits], first, cold })
}

fn over_60hz(v: &[f64]) -> usize {
    v.iter().filter(|t| **t > 16.7).count()
}

fn kb(b: f64) -> String {
    format!("{:.1} kB", b / 1000.0)
}

fn stats(v: &[f64]) -> (f64, f64) {
    let s = sorted(v.to_vec());
    (percentile(&s, 0.5), percentile(&s, 0.95))
}

fn machine() -> String {
    let cpu = std::fs::read_to_string("/proc/cpuinfo")
        .ok()
        .and_then(|t| {
            t.lines()
                .find(|l| l.starts_with("model name"))
                .map(|l| l.split(':').nth(1).unwrap_or("").trim().to_string())
        })
        .unwrap_or_else(|| "unknown CPU".into());
    let cores = std::thread::available_parallelism().map(|n| n.get()).unwrap_or(0);
    let chromium = std::process::Command::new("chromium")
        .arg("--version")
        .output()
        .ok()
        .map(|o| String::from_utf8_lossy(&o.stdout).trim().to_string())
        .unwrap_or_default();
    format!("{cpu}, {cores} cores; {chromium}")
}

fn today() -> String {
    std::process::Command::new("date")
        .args(["-u", "+%Y-%m-%d %H:%M UTC"])
        .output()
        .map(|o| String::from_utf8_lossy(&o.stdout).trim().to_string())
        .unwrap_or_default()
}

#[tokio::main(flavor = "current_thread")]
async fn main() -> Result<(), BoxError> {
    let root = xtask::workspace_root();
    let mut md = String::new();
    writeln!(md, "# Stillroom benchmarks\n")?;
    writeln!(md, "Written by `cargo xtask bench` on {} ({}).", today(), machine())?;
    writeln!(md, "Figures from one run on a shared machine: compare ratios more than absolute times.\n")?;

    eprintln!("bench: plan() natively");
    let native = native_plan_us();
    let anchor = measure_anchor(&xtask::anchor_dist_dir(&root)).await?;
    let page = fresh_page().await?;
    let page_parts = parts(&page).await?;
    eprintln!("bench: plan() in wasm");
    let wasm = wasm_plan_us(&page).await?;
    let (n50, n95) = stats(&native);
    let (w50, w95) = stats(&wasm);
    writeln!(md, "## plan(), the default scenario (15 kg lavender), µs per plan\n")?;
    writeln!(md, "| where | median | p95 |\n|---|---|---|")?;
    writeln!(md, "| native (release, opt-level 3) | {n50:.0} | {n95:.0} |")?;
    writeln!(md, "| wasm in headless Chromium (release, opt-level z) | {w50:.0} | {w95:.0} |")?;
    writeln!(md, "| ratio wasm / native | {:.2} | {:.2} |\n", w50 / n50, w95 / n95)?;
    writeln!(
        md,
        "The same scenario each time, so the plan reuses what it keeps from the last plans (the \
         depletion, the water-density grid, the boils' heat capacities; `core/src/plan/`), as an \
         edit of the plant mass does. An edit of the oil, the site's pressure or the target pays \
         for them again.\n"
    )?;

    eprintln!("bench: keystrokes");
    let (mem0, heap0) = memory(&page).await?;
    let quick = keystrokes(&page, 200).await?;
    page.cdp("Emulation.setCPUThrottlingRate", json!({"rate": SLOW_CPU})).await?;
    let slow = keystrokes(&page, 200).await?;
    page.cdp("Emulation.setCPUThrottlingRate", json!({"rate": 1})).await?;
    let (q50, q95) = stats(&quick);
    let (s50, s95) = stats(&slow);
    let missed = slow.iter().filter(|t| **t > 16.7).count();
    writeln!(md, "## One edit of the plant mass: input event to the updated answer, ms (200 edits)\n")?;
    writeln!(md, "| CPU | p50 | p95 | edits over one 60 Hz frame |\n|---|---|---|---|")?;
    writeln!(md, "| unthrottled | {q50:.1} | {q95:.1} | {} |", quick.iter().filter(|t| **t > 16.7).count())?;
    writeln!(md, "| 4x slowdown | {s50:.1} | {s95:.1} | {missed} |")?;
    let ((aq50, aq95), (as50, as95)) = (stats(&anchor.quick), stats(&anchor.slow));
    writeln!(md, "| anchor, unthrottled | {aq50:.1} | {aq95:.1} | {} |", over_60hz(&anchor.quick))?;
    writeln!(md, "| anchor, 4x slowdown | {as50:.1} | {as95:.1} | {} |", over_60hz(&anchor.slow))?;
    writeln!(md, "| ratio page / anchor, unthrottled | {:.2} | {:.2} | |", q50 / aq50, q95 / aq95)?;
    writeln!(md, "| ratio page / anchor, 4x slowdown | {:.2} | {:.2} | |\n", s50 / as50, s95 / as95)?;

    eprintln!("bench: memory after 1,000 edits");
    keystrokes(&page, 600).await?;
    let _ = page.cdp("HeapProfiler.collectGarbage", json!({})).await;
    let (mem1, heap1) = memory(&page).await?;
    page.close().await?;
    writeln!(md, "## Memory\n")?;
    writeln!(md, "| when | wasm memory | JS heap used |\n|---|---|---|")?;
    writeln!(md, "| after load | {} | {} |", kb(mem0), kb(heap0))?;
    writeln!(md, "| after 1,000 edits | {} | {} |", kb(mem1), kb(heap1))?;
    let [(am0, ah0), (am1, ah1)] = anchor.memory;
    writeln!(md, "| anchor, after load | {} | {} |", kb(am0), kb(ah0))?;
    writeln!(md, "| anchor, after 1,000 edits | {} | {} |\n", kb(am1), kb(ah1))?;

    writeln!(md, "## First load, bytes per file\n")?;
    let first = FirstLoad::measure(&xtask::dist_dir(&root))?;
    writeln!(md, "| file | raw | gzip | Brotli |\n|---|---|---|---|")?;
    for a in &first.assets {
        writeln!(md, "| {} | {} | {} | {} |", a.name, a.raw, a.gzip, a.brotli)?;
    }
    writeln!(
        md,
        "| **first load** | {} | {} | {} |",
        first.total_raw(),
        first.total_gzip(),
        first.total_brotli()
    )?;
    let af = &anchor.first;
    writeln!(
        md,
        "| anchor: {} | {} | {} | {} |",
        af.assets.iter().map(|a| a.name.as_str()).collect::<Vec<_>>().join(", "),
        af.total_raw(),
        af.total_gzip(),
        af.total_brotli()
    )?;
    let ratio = |p: u64, a: u64| p as f64 / a as f64;
    writeln!(
        md,
        "| ratio page / anchor | {:.2} | {:.2} | {:.2} |\n",
        ratio(first.total_raw(), af.total_raw()),
        ratio(first.total_gzip(), af.total_gzip()),
        ratio(first.total_brotli(), af.total_brotli())
    )?;

    eprintln!("bench: first plan on a weak link (5 cold visits)");
    let mut cold = Vec::new();
    for _ in 0..5 {
        cold.push(first_plan_ms(&browser::dist()?).await?);
    }
    let (c50, _) = stats(&cold);
    let (visit, offline, responses) = visit_bytes().await?;
    writeln!(md, "## A visit on a weak link\n")?;
    writeln!(
        md,
        "Emulated: {} ms round trip, {:.1} Mbit/s down, {:.0} kbit/s up, {SLOW_CPU}x CPU slowdown, cold profile.\n",
        LINK.0,
        LINK.1 * 8.0 / 1e6,
        LINK.2 * 8.0 / 1e3
    )?;
    writeln!(md, "| measure | figure |\n|---|---|")?;
    writeln!(
        md,
        "| first plan on screen, median of 5 | {c50:.0} ms (all: {}) |",
        cold.iter().map(|c| format!("{c:.0}")).collect::<Vec<_>>().join(", ")
    )?;
    writeln!(
        md,
        "| bytes over the wire, first visit until the offline copy is complete | {} in {responses} responses |",
        kb(visit as f64)
    )?;
    let (a50, _) = stats(&anchor.cold);
    let all = |v: &[f64]| v.iter().map(|c| format!("{c:.0}")).collect::<Vec<_>>().join(", ");
    writeln!(md, "| bytes over the wire, offline revisit | {offline} B |")?;
    writeln!(
        md,
        "| anchor: first output on screen, median of 5 | {a50:.0} ms (all: {}) |",
        all(&anchor.cold)
    )?;
    writeln!(md, "| ratio page / anchor, first plan on screen | {:.2} |\n", c50 / a50)?;
    writeln!(md, "## The anchor\n")?;
    let [pn, pp, po] = page_parts;
    let [an, ap, ao] = anchor.parts;
    writeln!(
        md,
        "The anchor rows are a measuring page, not a product page (`tests/anchor`): Leptos 0.8 client-side \
         with the page's release profile, wasm-bindgen, wasm-opt -Oz and stylesheet, as many inputs and \
         formatted outputs and no physics (each output a sum of products of the inputs, `{{:.3}}`), so it is \
         the framework's floor and a ratio over it is the cost of everything else. Counted on screen in this \
         run: the page {pn} number inputs, {pp} pickers, {po} outputs; the anchor {an}, {ap}, {ao}."
    )?;

    let out = root.join("BENCHMARKS.md");
    std::fs::write(&out, &md)?;
    print!("{md}");
    eprintln!("bench: wrote {}", out.display());
    Ok(())
}
