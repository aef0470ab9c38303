//! Benchmark of one still design (`size`: validation, the charges-a-day and heat searches on the
//! forward plan, rounding to the catalogue, the bought design planned forward), natively.
//!
//! Run with `cargo bench -p stillroom-core --bench size`. Prints the median and the spread over
//! batches; the target (a design in under 20 ms) is reported, not asserted.

use std::hint::black_box;
use std::time::Instant;
use stillroom_core::sizing::{SizingRequest, size};

fn measure(label: &str, request: &SizingRequest) {
    for _ in 0..3 {
        black_box(size(black_box(request)).unwrap());
    }
    let batch = 5;
    let mut per_design_ms: Vec<f64> = (0..15)
        .map(|_| {
            let start = Instant::now();
            for _ in 0..batch {
                black_box(size(black_box(request)).unwrap());
            }
            start.elapsed().as_secs_f64() * 1e3 / batch as f64
        })
        .collect();
    per_design_ms.sort_by(|a, b| a.total_cmp(b));
    let median = per_design_ms[per_design_ms.len() / 2];
    println!(
        "{label:<44} median {median:6.2} ms per design   (fastest batch {:.2}, slowest {:.2}; {:.2} of the 20 ms target)",
        per_design_ms[0],
        per_design_ms[per_design_ms.len() - 1],
        median / 20.0
    );
}

fn request(json: &str) -> SizingRequest {
    serde_json::from_str(json).expect("the benchmark's request parses")
}

fn main() {
    // Invented farms, for timing only.
    measure(
        "lavender 40 kg/day, propane, coil in tub",
        &request(
            r#"{"crop":"lavender","harvest":{"kind":"per_day","kg_per_day":40,"days":20},
            "site":{"altitude_m":300},"heat":{"kind":"fuel","fuel":"propane"},"cooling":{"inlet_c":15},
            "limits":{"max_charges_per_day":2,"max_run_s":10800,"warmest_cooling_water_c":45}}"#,
        ),
    );
    measure(
        "rosemary 60 kg/day, 3-phase 32 A, jacket",
        &request(
            r#"{"crop":"rosemary","harvest":{"kind":"per_season","kg_per_season":1800,"days":30},
            "site":{"altitude_m":1450,"ambient_temperature_c":18},
            "heat":{"kind":"electric","supply":{"kind":"current","current_a":32,"voltage_v":400,"phases":3}},
            "cooling":{"inlet_c":18,"max_flow_kg_per_s":0.25,"condenser":"tube_in_tube"},
            "limits":{"max_charges_per_day":3,"max_run_s":9000,"warmest_cooling_water_c":40,"working_day_s":36000}}"#,
        ),
    );
    measure(
        "peppermint 30 kg/day, 230 V 32 A, US tube",
        &request(
            r#"{"crop":"peppermint","harvest":{"kind":"per_day","kg_per_day":30},"site":{"altitude_m":50},
            "heat":{"kind":"electric","supply":{"kind":"current","current_a":32,"voltage_v":230}},
            "cooling":{"inlet_c":12,"tube_standard":"us"},
            "limits":{"max_charges_per_day":3,"max_run_s":9000,"warmest_cooling_water_c":40}}"#,
        ),
    );
}
