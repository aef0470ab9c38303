//! The command line, run as a program: sweeps are bounded, their columns known, and a scenario
//! it cannot read comes back as field errors.
#![cfg(feature = "cli")]

use std::io::{BufRead, BufReader, Write};
use std::process::{Child, Command, Output, Stdio};
use std::time::{Duration, Instant};

/// Long enough for a thousand debug-build plans on a busy machine; a run past it is a hang.
const HANG: Duration = Duration::from_secs(120);

fn start(args: &[&str]) -> Child {
    Command::new(env!("CARGO_BIN_EXE_stillroom"))
        .args(args)
        .stdin(Stdio::piped())
        .stdout(Stdio::piped())
        .stderr(Stdio::piped())
        .spawn()
        .unwrap()
}

/// Waits for the program, killing it (and failing) if it runs past [`HANG`].
fn finish(mut child: Child) -> Output {
    let t0 = Instant::now();
    while child.try_wait().unwrap().is_none() {
        if t0.elapsed() > HANG {
            child.kill().unwrap();
            panic!("still running after {HANG:?}");
        }
        std::thread::sleep(Duration::from_millis(20));
    }
    child.wait_with_output().unwrap()
}

fn run(args: &[&str], stdin: &str) -> (bool, String, String) {
    let mut child = start(args);
    child.stdin.take().unwrap().write_all(stdin.as_bytes()).unwrap();
    // The output of a bounded sweep fits the pipe buffers; read it once the program ends.
    let out = finish(child);
    (out.status.success(), String::from_utf8(out.stdout).unwrap(), String::from_utf8(out.stderr).unwrap())
}

#[test]
fn an_endless_sweep_is_refused_before_it_starts() {
    // Before: 0 to 1e308 in steps of 1e-308 ran for ever and grew without bound.
    let (ok, out, err) = run(&["sweep", "site.altitude_m", "0", "1e308", "1e-308", "site.pressure_pa"], "");
    assert!(!ok);
    assert!(out.is_empty(), "{out}");
    assert!(err.contains("at most 1000"), "{err}");
    let (ok, _, err) = run(&["sweep", "site.altitude_m", "0", "3000", "1", "site.pressure_pa"], "");
    assert!(!ok);
    assert!(err.contains("3001 rows"), "{err}");
    for bad in [["0", "inf", "1"], ["nan", "1", "1"], ["0", "1", "0"], ["5", "1", "1"]] {
        let (ok, _, err) = run(&["sweep", "site.altitude_m", bad[0], bad[1], bad[2], "site.pressure_pa"], "");
        assert!(!ok, "{bad:?}: {err}");
    }
}

#[test]
fn a_thousand_rows_is_the_most_and_each_is_printed() {
    let (ok, out, err) = run(&["sweep", "site.altitude_m", "0", "999", "1", "site.pressure_pa"], "");
    assert!(ok, "{err}");
    let lines: Vec<&str> = out.lines().collect();
    assert_eq!(lines.len(), 1001);
    assert_eq!(lines[0], "site.altitude_m,site.pressure_pa");
    assert!(lines[1000].starts_with("999,"));
    // Pressure falls with height (US Standard Atmosphere 1976: 101 325 Pa at 0 m, 89 876 Pa
    // at 1000 m, so about 89 887 Pa at 999 m).
    let p0: f64 = lines[1].split(',').nth(1).unwrap().parse().unwrap();
    let p999: f64 = lines[1000].split(',').nth(1).unwrap().parse().unwrap();
    assert!((p0 - 101_325.0).abs() < 1.0 && (p999 - 89_887.0).abs() < 20.0, "{p0} {p999}");
}

#[test]
fn rows_stream_and_a_closed_reader_ends_the_sweep() {
    let mut child = start(&["sweep", "charge.plant_mass_kg", "1", "1000", "1", "run.total_time_s"]);
    drop(child.stdin.take());
    let mut reader = BufReader::new(child.stdout.take().unwrap());
    let mut header = String::new();
    reader.read_line(&mut header).unwrap();
    let mut first = String::new();
    reader.read_line(&mut first).unwrap();
    assert_eq!(header.trim(), "charge.plant_mass_kg,run.total_time_s");
    assert!(first.starts_with("1,"), "{first}");
    // Like `| head -2`: the reader goes away; the sweep stops instead of running on.
    drop(reader);
    let out = finish(child);
    assert!(!out.status.success() || out.stderr.is_empty());
}

#[test]
fn unknown_columns_and_fields_are_errors_not_empty_cells() {
    // Before: an unknown column gave a column of empty cells.
    let (ok, out, err) = run(
        &["sweep", "site.altitude_m", "0", "100", "50", "site.pressure_pa,site.pressure,run.total_time"],
        "",
    );
    assert!(!ok);
    assert!(out.is_empty());
    assert!(err.contains("site.pressure,") || err.contains("site.pressure "), "{err}");
    assert!(err.contains("run.total_time"), "{err}");
    // A column that is known but empty in this plan (no season given) stays allowed.
    let (ok, out, err) = run(
        &[
            "sweep",
            "site.altitude_m",
            "0",
            "100",
            "50",
            "season.charges,codistillation.cuts.0.steam_kg_per_kg_oil,run.recovery_curve.1.0",
        ],
        "",
    );
    assert!(ok, "{err}");
    assert_eq!(out.lines().count(), 4);
    let (ok, _, err) = run(&["sweep", "site.altitud", "0", "100", "50", "site.pressure_pa"], "");
    assert!(!ok);
    assert!(err.contains("site.altitud"), "{err}");
}

#[test]
fn a_misspelt_scenario_comes_back_as_field_errors() {
    let (ok, _, err) = run(&["plan"], r#"{"charge": {"plant_mass": 40}}"#);
    assert!(!ok);
    let v: serde_json::Value = serde_json::from_str(&err).unwrap();
    assert_eq!(v["errors"][0]["field"], "charge.plant_mass");
    let (ok, out, err) = run(&["plan"], r#"{"charge": {"plant_mass_kg": 40}}"#);
    assert!(ok, "{err}");
    assert!(out.contains("\"codistillation\""));
}

#[test]
fn the_command_line_prints_the_librarys_table_byte_for_byte() {
    // An invented scenario (a 22 kg rosemary charge at Larkfield Farm), read from a file as a
    // grower would pass it, swept with a column the plan leaves empty and a refused value.
    let mut s = stillroom_core::Scenario::default();
    s.charge.crop = Some("rosemary".into());
    s.charge.plant_mass_kg = 22.0;
    let path = std::env::temp_dir().join(format!("stillroom-cli-sweep-{}.json", std::process::id()));
    std::fs::write(&path, serde_json::to_string(&s).unwrap()).unwrap();
    let columns = ["site.water_boiling_point_c", "run.total_time_s", "season.charges", "energy.fuel_unit"];
    let (ok, out, err) = run(
        &["sweep", "charge.plant_mass_kg", "-10", "50", "15", &columns.join(","), path.to_str().unwrap()],
        "",
    );
    std::fs::remove_file(&path).ok();
    assert!(ok, "{err}");
    let table =
        stillroom_core::sweep::sweep(&s, "charge.plant_mass_kg", -10.0, 50.0, 15.0, &columns).unwrap();
    assert_eq!(out, table.to_csv());
    assert!(out.lines().nth(1).unwrap().starts_with("-10,\"error: "), "{out}");
}
