//! The workbench's tables and comparison on the built page, in headless Chromium: a sweep on the
//! page gives the command line's CSV byte for byte (the command line run as a program on the
//! form's saved scenario), the same sweep in US units shows feet and the same numbers, and three
//! saved plans side by side show what the core plans for each, with the rows that differ marked.

use fantoccini::{Client, Locator};
use serde_json::{Value, json};
use std::process::Command;
use std::time::{Duration, Instant};
use stillroom_core::Scenario;
use stillroom_tests::BoxError;
use stillroom_tests::browser::{self, Page, WAIT, wait_text};
use stillroom_tests::drive;

async fn type_into(c: &Client, id: &str, text: &str) -> Result<(), BoxError> {
    let input = c.find(Locator::Id(id)).await?;
    input.clear().await?;
    input.send_keys(text).await?;
    Ok(())
}

async fn click(c: &Client, id: &str) -> Result<(), BoxError> {
    c.find(Locator::Id(id)).await?.click().await?;
    Ok(())
}

async fn open_workbench(page: &Page) -> Result<(), BoxError> {
    let c = &page.client;
    c.wait().at_most(WAIT).for_element(Locator::Id("f-plant_mass")).await?;
    click(c, "mode-workbench").await?;
    c.wait().at_most(WAIT).for_element(Locator::Id("sweep-make")).await?;
    Ok(())
}

/// The command-line program's output for a sweep (run through cargo, which builds it if need be).
fn command_line(args: &[&str]) -> Result<String, BoxError> {
    let root = std::path::Path::new(env!("CARGO_MANIFEST_DIR")).join("..");
    let out = Command::new(env!("CARGO"))
        .current_dir(&root)
        .args(["run", "-q", "-p", "stillroom-core", "--features", "cli", "--bin", "stillroom", "--"])
        .args(args)
        .output()?;
    if !out.status.success() {
        return Err(format!("stillroom {args:?} failed: {}", String::from_utf8_lossy(&out.stderr)).into());
    }
    Ok(String::from_utf8(out.stdout)?)
}

/// The form's scenario as saved by the page, written to a temp file for the command line.
async fn saved_scenario_file(c: &Client, tag: &str) -> Result<std::path::PathBuf, BoxError> {
    let start = Instant::now();
    let raw = loop {
        let v = c.execute("return localStorage.getItem('stillroom.scenario');", vec![]).await?;
        if let Some(s) = v.as_str() {
            break s.to_string();
        }
        if start.elapsed() > WAIT {
            return Err("the page saved no scenario".into());
        }
        tokio::time::sleep(Duration::from_millis(50)).await;
    };
    let record: Value = serde_json::from_str(&raw)?;
    let path = std::env::temp_dir().join(format!("stillroom-tables-{tag}-{}.json", std::process::id()));
    std::fs::write(&path, serde_json::to_string(&record["scenario"])?)?;
    Ok(path)
}

/// The sweep table's cells: per row, (header text, header data-si, [(cell text, data-si)]).
async fn sweep_rows(c: &Client) -> Result<Vec<(String, String, Vec<(String, String)>)>, BoxError> {
    let v = c
        .execute(
            "return [...document.querySelectorAll('#sweep-table tbody tr')].map(r => {
               const th = r.querySelector('th');
               return [th.textContent, th.dataset.si, [...r.querySelectorAll('td')].map(d => [d.textContent, d.dataset.si || ''])];
             });",
            vec![],
        )
        .await?;
    Ok(serde_json::from_value(v)?)
}

async fn screenshot(page: &Page, css: &str, name: &str, width: u32, height: u32) -> Result<(), BoxError> {
    page.cdp(
        "Emulation.setDeviceMetricsOverride",
        json!({ "width": width, "height": height, "deviceScaleFactor": 1, "mobile": width < 600 }),
    )
    .await?;
    page.client.execute(&format!("document.querySelector('{css}').scrollIntoView();"), vec![]).await?;
    tokio::time::sleep(Duration::from_millis(300)).await;
    std::fs::write(std::env::temp_dir().join(name), page.client.screenshot().await?)?;
    Ok(())
}

async fn phone(page: &Page) -> Result<(), BoxError> {
    page.cdp(
        "Emulation.setDeviceMetricsOverride",
        json!({ "width": browser::VIEWPORT.0, "height": browser::VIEWPORT.1, "deviceScaleFactor": 1, "mobile": true }),
    )
    .await?;
    Ok(())
}

/// Two CSV texts alike: the same lines, the same header and varied values byte for byte, every
/// text or empty cell byte for byte, and every number equal to within 1e-12 relative. Not byte
/// for byte throughout: the page runs the same `stillroom_core::sweep` compiled to wasm, whose
/// `exp`, `ln` and `powf` (Rust's own libm) round the last binary digit differently from the
/// native build's C library in about one result in three, so a 16- or 17-digit number can end
/// in another digit. The core's tests check the command line against the library's
/// `SweepTable::to_csv` byte for byte on one platform (`core/tests/cli_sweep.rs`).
fn same_csv(page: &str, cli: &str) -> Result<(), String> {
    let (p, c): (Vec<&str>, Vec<&str>) = (page.split('\n').collect(), cli.split('\n').collect());
    if p.len() != c.len() || p[0] != c[0] {
        return Err(format!("lines or header differ:\n{page}\n---\n{cli}"));
    }
    for (lp, lc) in p.iter().zip(&c).skip(1) {
        let (cp, cc): (Vec<&str>, Vec<&str>) = (lp.split(',').collect(), lc.split(',').collect());
        let alike = cp.len() == cc.len()
            && cp[0] == cc[0]
            && cp.iter().zip(&cc).all(|(a, b)| match (a.parse::<f64>(), b.parse::<f64>()) {
                (Ok(x), Ok(y)) => (x - y).abs() <= 1e-12 * x.abs().max(y.abs()),
                _ => a == b,
            });
        if !alike {
            return Err(format!("row differs: page {lp:?}, command line {lc:?}"));
        }
    }
    Ok(())
}

fn close(a: f64, b: f64) -> bool {
    // The page's wasm and this native build may round transcendental functions differently in
    // the last place; anything past 1e-9 relative is a real difference.
    (a - b).abs() <= 1e-9 * a.abs().max(b.abs()).max(1e-12)
}

#[tokio::test]
async fn a_sweep_on_the_page_is_the_command_lines_csv_in_either_units() -> Result<(), BoxError> {
    let page = browser::open().await?;
    page.before_load(drive::CAPTURE_DOWNLOADS).await?;
    page.goto("").await?;
    page.client.execute("localStorage.clear();", vec![]).await?;
    page.client.refresh().await?;
    let c = &page.client;
    c.wait().at_most(WAIT).for_element(Locator::Id("f-plant_mass")).await?;
    // A charge of the grower's own, so the scenario is not the default one.
    type_into(c, "f-plant_mass", "22").await?;
    wait_text(c, "[data-out=charge_summary]", |t| t.contains("22 kg")).await?;
    open_workbench(&page).await?;

    type_into(c, "sweep-from", "0").await?;
    type_into(c, "sweep-to", "3000").await?;
    type_into(c, "sweep-step", "500").await?;
    // Steam and run time are ticked at first: boiling point in, steam out.
    click(c, "sweep-col-boiling").await?;
    click(c, "sweep-col-steam").await?;
    click(c, "sweep-make").await?;
    c.wait().at_most(WAIT).for_element(Locator::Css("#sweep-table tbody tr[data-row='6']")).await?;
    let n = drive::download_count(c).await?;
    click(c, "sweep-csv").await?;
    let (name, csv) = drive::download_after(c, n).await?;
    // Labelled as a table, so a spreadsheet opens it as one.
    assert_eq!(drive::download_type(c, n).await?, "text/csv;charset=utf-8");
    assert!(name.ends_with(".csv"), "{name}");

    let file = saved_scenario_file(c, "sweep").await?;
    let file_s = file.to_string_lossy().to_string();
    let cols = "site.water_boiling_point_c,run.total_time_s";
    let cli = command_line(&["sweep", "site.altitude_m", "0", "3000", "500", cols, &file_s])?;
    same_csv(&csv, &cli)?;
    assert_eq!(csv.lines().count(), 8);
    // The plant mass typed reached the sweep (the form's scenario, not the default one).
    let scenario: Value = serde_json::from_str(&std::fs::read_to_string(&file)?)?;
    assert_eq!(scenario["charge"]["plant_mass_kg"], json!(22.0));
    let command = wait_text(c, "#sweep-command", |t| !t.is_empty()).await?;
    assert!(command.starts_with(&format!("stillroom sweep site.altitude_m 0 3000 500 {cols}")), "{command}");

    // Metric: metres, °C, and the CSV's numbers behind each cell.
    let csv_rows: Vec<Vec<f64>> =
        cli.lines().skip(1).map(|l| l.split(',').map(|x| x.parse().unwrap()).collect()).collect();
    let rows = sweep_rows(c).await?;
    assert_eq!(rows.len(), 7);
    for (row, want) in rows.iter().zip(&csv_rows) {
        assert_eq!(row.0, format!("{} m", want[0]));
        assert!(row.2[0].0.ends_with("°C"), "{:?}", row.2[0]);
        assert!(
            close(row.2[0].1.parse()?, want[1]) && close(row.2[1].1.parse()?, want[2]),
            "{row:?} {want:?}"
        );
    }
    // Boiling falls with height (IAPWS-IF97: 99.97 °C at 101.325 kPa; at 3000 m, 70.1 kPa,
    // about 90 °C).
    assert!((csv_rows[0][1] - 99.97).abs() < 0.05 && (csv_rows[6][1] - 90.0).abs() < 0.5, "{csv_rows:?}");
    let chart = c.find(Locator::Css("#sweep-chart")).await?;
    let ticks = chart.find_all(Locator::Css("text.tick")).await?.len();
    assert!(ticks >= 6, "the chart has {ticks} labels");
    screenshot(&page, "#sweep-table", "stillroom-tables-412x915.png", 412, 915).await?;
    screenshot(&page, "#sweep-table", "stillroom-tables-1280x800.png", 1280, 800).await?;
    phone(&page).await?;

    // US customary: the range is rewritten in feet, the same SI sweep stays behind it.
    click(c, "units-us").await?;
    let start = Instant::now();
    loop {
        let to = c.find(Locator::Id("sweep-to")).await?.prop("value").await?.unwrap_or_default();
        // 3000 m = 9842.52 ft (1 ft = 0.3048 m exactly, NIST SP 811).
        if to.starts_with("9842.5") {
            break;
        }
        if start.elapsed() > WAIT {
            return Err(format!("the range's end shows {to:?} in US units").into());
        }
        tokio::time::sleep(Duration::from_millis(50)).await;
    }
    let rows = sweep_rows(c).await?;
    for (row, want) in rows.iter().zip(&csv_rows) {
        assert_eq!(row.0, format!("{} ft", (want[0] / 0.3048).round()), "{row:?}");
        // t/°F = 1.8 t/°C + 32 (NIST SP 811 B.8), to the one decimal shown.
        let f: f64 = row.2[0].0.trim_end_matches(" °F").parse()?;
        assert!((f - (want[1] * 1.8 + 32.0)).abs() <= 0.051, "{row:?} {want:?}");
        assert!(close(row.2[0].1.parse()?, want[1]), "{row:?} {want:?}");
    }
    let head = c.find(Locator::Css("#sweep-table thead th")).await?.text().await?;
    assert!(head.contains("(ft)"), "{head}");
    click(c, "sweep-make").await?;
    c.wait().at_most(WAIT).for_element(Locator::Css("#sweep-table tbody tr[data-row='6']")).await?;
    let n = drive::download_count(c).await?;
    click(c, "sweep-csv").await?;
    let (_, us_csv) = drive::download_after(c, n).await?;
    // The same SI sweep: the same CSV as the metric page made, byte for byte.
    assert_eq!(us_csv, csv, "the CSV made in US units differs from the one made in metric");
    same_csv(&us_csv, &cli)?;
    screenshot(&page, "#sweep-chart", "stillroom-tables-us-412x915.png", 412, 915).await?;
    phone(&page).await?;

    // Bad entries are told beside their field, and nothing breaks.
    type_into(c, "sweep-step", "abc").await?;
    click(c, "sweep-make").await?;
    wait_text(c, "#sweep-step ~ .error", |t| t.contains("enter a number")).await?;
    type_into(c, "sweep-step", "1").await?;
    click(c, "sweep-make").await?;
    wait_text(c, "#sweep-step ~ .error", |t| t.contains("at most 200")).await?;
    // A row the plan refuses is said in its row: plant mass from -10 lb.
    let select = c.find(Locator::Id("sweep-input")).await?;
    select.select_by_value("plant_mass").await?;
    type_into(c, "sweep-from", "-10").await?;
    type_into(c, "sweep-to", "30").await?;
    type_into(c, "sweep-step", "20").await?;
    click(c, "sweep-make").await?;
    wait_text(c, "#sweep-table tbody tr[data-row='0'] td.row-error", |t| t.starts_with("No plan:")).await?;
    let rows = sweep_rows(c).await?;
    assert_eq!(rows.len(), 3);
    assert!(rows[1].2.iter().all(|(t, si)| !t.is_empty() && !si.is_empty()), "{rows:?}");
    page.close().await
}

fn saved(id: u64, name: &str, s: &Scenario) -> Value {
    json!({ "id": id, "name": name, "saved_ms": 1_765_000_000_000.0, "scenario": serde_json::to_value(s).unwrap() })
}

#[tokio::test]
async fn saved_plans_side_by_side_show_the_cores_numbers_and_mark_what_differs() -> Result<(), BoxError> {
    // Three invented plans of the fictional Larkfield Farm and one that cannot be planned.
    let home = Scenario::default();
    let mut hill = Scenario::default();
    hill.site.altitude_m = 1500.0;
    let mut big = Scenario::default();
    big.charge.plant_mass_kg = 40.0;
    let mut broken = Scenario::default();
    broken.charge.plant_mass_kg = -5.0;
    let plans =
        [("Home field", &home), ("Hill field", &hill), ("Big charge", &big), ("Typing slip", &broken)];
    let record = json!({
        "record_version": 1,
        "plans": plans.iter().enumerate().map(|(i, (n, s))| saved(i as u64 + 1, n, s)).collect::<Vec<_>>(),
        "stills": [],
    });

    let page = browser::open().await?;
    page.goto("").await?;
    let c = &page.client;
    c.execute(
        "localStorage.clear(); localStorage.setItem('stillroom.library', arguments[0]);",
        vec![json!(record.to_string())],
    )
    .await?;
    c.refresh().await?;
    open_workbench(&page).await?;
    for id in 1..=4 {
        click(c, &format!("compare-pick-{id}")).await?;
    }
    // Four is the most: the form's own box is now closed.
    assert_eq!(
        c.find(Locator::Id("compare-pick-form")).await?.prop("disabled").await?.as_deref(),
        Some("true")
    );
    c.wait().at_most(WAIT).for_element(Locator::Css("#compare-table tr[data-row='steam']")).await?;

    let v = c
        .execute(
            "return Object.fromEntries([...document.querySelectorAll('#compare-table tbody tr')].map(r => [r.dataset.row,
               [r.dataset.differs, r.querySelector('th').textContent,
                [...r.querySelectorAll('td')].map(d => [d.querySelector('.value').textContent, d.dataset.si])]]));",
            vec![],
        )
        .await?;
    let table: std::collections::BTreeMap<String, CompareRow> = serde_json::from_value(v)?;

    // The core's own plans of the three, read here natively.
    let planned: Vec<_> = [&home, &hill, &big].iter().map(|s| stillroom_core::plan(s).unwrap()).collect();
    assert!(stillroom_core::plan(&broken).is_err());
    let expect: [(&str, Answer); 7] = [
        ("steam", |p| p.ranges.steam_kg.central),
        ("water", |p| p.ranges.water_total_kg.central),
        ("boiling", |p| p.site.water_boiling_point_c),
        ("run_time", |p| p.ranges.total_time_s.central),
        ("oil", |p| p.yield_estimate.oil_volume_m3.central),
        ("fuel", |p| p.ranges.fuel_amount.central),
        ("separator", |p| p.ranges.separator_volume_m3.central),
    ];
    for (key, f) in expect {
        let (_, _, cells) = &table[key];
        assert_eq!(cells.len(), 4, "{key}");
        for (p, (text, si)) in planned.iter().zip(cells) {
            assert!(close(si.parse()?, f(p)), "{key}: page {si} ({text}), core {}", f(p));
        }
        // The plan that cannot be made has a dash, not a number.
        assert_eq!(cells[3], ("–".to_string(), String::new()), "{key}");
    }
    let why = wait_text(c, "#compare-table [data-out=cannot_plan]", |t| !t.is_empty()).await?;
    assert!(why.starts_with("Cannot be planned:"), "{why}");
    // Inputs: the crop and the condenser are the same in all four; altitude and charge differ.
    for (key, differs) in
        [("crop", false), ("condenser", false), ("altitude", true), ("charge", true), ("boiling", true)]
    {
        let (flag, label, _) = &table[key];
        assert_eq!(flag == "true", differs, "{key}: {flag}");
        assert_eq!(label.contains("≠ differs"), differs, "{key}: {label}");
    }
    // Every row is marked exactly when the values shown for the plans made are not all the
    // same (the unplanned one's dashes do not count).
    for (key, (flag, label, cells)) in &table {
        let shown: Vec<&String> = cells.iter().map(|c| &c.0).filter(|t| t.as_str() != "–").collect();
        let differ = shown.iter().any(|t| *t != shown[0]);
        assert_eq!(flag == "true", differ, "{key}: {cells:?}");
        assert_eq!(label.contains("≠"), differ, "{key}");
    }
    let altitude = &table["altitude"].2;
    let home_m = format!("{} m", home.site.altitude_m);
    assert_eq!((altitude[0].0.as_str(), altitude[1].0.as_str()), (home_m.as_str(), "1500 m"));

    // On a phone the plans scroll sideways under a label column that stays put.
    phone(&page).await?;
    let layout = c
        .execute(
            "const w = document.querySelector('.compare-scroll'); const th = document.querySelector('#compare-table .label-col');
             return [w.scrollWidth > w.clientWidth, getComputedStyle(th).position];",
            vec![],
        )
        .await?;
    assert_eq!(layout, json!([true, "sticky"]));
    screenshot(&page, "#compare-table", "stillroom-compare-412x915.png", 412, 915).await?;
    c.execute("document.querySelector('.compare-scroll').scrollLeft = 200;", vec![]).await?;
    tokio::time::sleep(Duration::from_millis(200)).await;
    std::fs::write(
        std::env::temp_dir().join("stillroom-compare-scrolled-412x915.png"),
        c.screenshot().await?,
    )?;
    screenshot(&page, "#compare-table", "stillroom-compare-1280x800.png", 1280, 800).await?;
    let wide = c
        .execute(
            "return getComputedStyle(document.querySelector('#compare-table .label-col')).position;",
            vec![],
        )
        .await?;
    assert_eq!(wide, json!("static"));
    phone(&page).await?;
    page.close().await
}

/// One row of the comparison as the page draws it: (differs mark, label, [(shown, SI value)]).
type CompareRow = (String, String, Vec<(String, String)>);
/// A headline answer read off a plan, SI.
type Answer = fn(&stillroom_core::Plan) -> f64;
