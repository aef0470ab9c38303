//! The command line's `size` and `schema` for sizing, run as a program: a request file in, the
//! design `size()` gives out; a bad request comes back as field errors and a failing exit; the
//! schemas it prints are the published ones.
#![cfg(feature = "cli")]

use std::io::Write;
use std::path::PathBuf;
use std::process::{Command, Stdio};

/// The invented request of DEVELOPERS.md's sizing section (a fictional farm: 40 kg of lavender
/// a day for 20 days at 300 m, over propane).
const REQUEST: &str = r#"{
  "crop": "lavender",
  "harvest": { "kind": "per_day", "kg_per_day": 40, "days": 20 },
  "site": { "altitude_m": 300 },
  "heat": { "kind": "fuel", "fuel": "propane" },
  "cooling": { "inlet_c": 15 },
  "limits": { "max_charges_per_day": 2, "max_run_s": 10800, "warmest_cooling_water_c": 45 }
}"#;

/// Runs the program with `args` and `stdin`: (success, stdout, stderr).
fn run(args: &[&str], stdin: &str) -> (bool, String, String) {
    let mut child = Command::new(env!("CARGO_BIN_EXE_stillroom"))
        .args(args)
        .stdin(Stdio::piped())
        .stdout(Stdio::piped())
        .stderr(Stdio::piped())
        .spawn()
        .unwrap();
    child.stdin.take().unwrap().write_all(stdin.as_bytes()).unwrap();
    let out = child.wait_with_output().unwrap();
    (out.status.success(), String::from_utf8(out.stdout).unwrap(), String::from_utf8(out.stderr).unwrap())
}

fn request_file(name: &str, text: &str) -> PathBuf {
    let dir = std::env::temp_dir().join(format!("stillroom-cli-size-{}", std::process::id()));
    std::fs::create_dir_all(&dir).unwrap();
    let path = dir.join(name);
    std::fs::write(&path, text).unwrap();
    path
}

#[test]
fn a_request_file_gives_the_design_size_gives() {
    let request: stillroom_core::SizingRequest = serde_json::from_str(REQUEST).unwrap();
    let want = stillroom_core::size(&request).unwrap();
    let path = request_file("request.json", REQUEST);
    let (ok, out, err) = run(&["size", path.to_str().unwrap()], "");
    assert!(ok, "{err}");
    let got: stillroom_core::Design = serde_json::from_str(&out).unwrap();
    assert_eq!(got, want);
    // The same request on stdin.
    let (ok, out, err) = run(&["size"], REQUEST);
    assert!(ok, "{err}");
    assert_eq!(serde_json::from_str::<stillroom_core::Design>(&out).unwrap(), want);
}

#[test]
fn a_bad_request_names_its_fields_and_fails() {
    let bad = REQUEST.replace(r#""kg_per_day": 40"#, r#""kg_per_day": -5"#);
    let path = request_file("bad.json", &bad);
    let (ok, out, err) = run(&["size", path.to_str().unwrap()], "");
    assert!(!ok);
    assert!(out.is_empty(), "{out}");
    let errors: stillroom_core::sizing::SizingErrors = serde_json::from_str(&err).unwrap();
    assert!(errors.errors.iter().any(|e| e.field == "harvest.kg_per_day"), "{err}");
    // A misspelt field is refused, not dropped.
    let (ok, _, err) = run(&["size"], &REQUEST.replace("inlet_c", "inlet_temp_c"));
    assert!(!ok);
    assert!(err.contains("inlet_temp_c"), "{err}");
}

#[test]
fn the_schemas_printed_are_the_published_ones() {
    for name in ["sizing_request", "design"] {
        let (ok, out, err) = run(&["schema", name], "");
        assert!(ok, "{err}");
        let path =
            PathBuf::from(env!("CARGO_MANIFEST_DIR")).join("schema").join(format!("{name}.schema.json"));
        let published = std::fs::read_to_string(&path).unwrap();
        assert_eq!(out, published, "{name}");
    }
}
