//! The published JSON Schemas (`core/schema/*.json`) must match the types. Regenerate them with
//! `STILLROOM_WRITE_SCHEMA=1 cargo test -p stillroom-core --features cli --test schema`.
#![cfg(feature = "cli")]

use std::path::PathBuf;

fn check(name: &str, schema: schemars::schema::RootSchema) {
    let path = PathBuf::from(env!("CARGO_MANIFEST_DIR")).join("schema").join(format!("{name}.schema.json"));
    let text = serde_json::to_string_pretty(&schema).unwrap() + "\n";
    if std::env::var_os("STILLROOM_WRITE_SCHEMA").is_some() {
        std::fs::write(&path, &text).unwrap();
    }
    let published = std::fs::read_to_string(&path).unwrap_or_default();
    assert!(published == text, "{} is out of date; regenerate it (see this file's header)", path.display());
}

#[test]
fn scenario_schema_is_published() {
    check("scenario", schemars::schema_for!(stillroom_core::Scenario));
}

#[test]
fn plan_schema_is_published() {
    check("plan", schemars::schema_for!(stillroom_core::Plan));
}

#[test]
fn the_example_scenario_round_trips_through_json() {
    let s = stillroom_core::Scenario::default();
    let text = serde_json::to_string(&s).unwrap();
    assert_eq!(serde_json::from_str::<stillroom_core::Scenario>(&text).unwrap(), s);
    // An empty object is a valid scenario: every field has a default.
    assert_eq!(serde_json::from_str::<stillroom_core::Scenario>("{}").unwrap(), s);
}

#[test]
fn sizing_schemas_are_published_and_refuse_unknown_fields() {
    check("sizing_request", schemars::schema_for!(stillroom_core::SizingRequest));
    check("design", schemars::schema_for!(stillroom_core::Design));
    // A misspelt limit is refused, not silently dropped.
    let text = r#"{"crop":"lavender","harvest":{"kind":"per_day","kg_per_day":10},"site":{"altitude_m":0},
        "heat":{"kind":"fuel","fuel":"propane"},"cooling":{"inlet_c":15},
        "limits":{"max_charges_per_day":1,"max_run_s":7200,"warmest_cooling_water_c":45,"max_run_min":90}}"#;
    let err = serde_json::from_str::<stillroom_core::SizingRequest>(text).unwrap_err();
    assert!(err.to_string().contains("max_run_min"), "{err}");
}
