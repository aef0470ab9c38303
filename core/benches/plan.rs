//! Benchmark of one full plan (validation, co-distillation with the run-through depletion,
//! time line, heat, condenser, separator, yield, the stepped heat balance and the ranges'
//! 18 extra runs), natively.
//!
//! Run with `cargo bench -p stillroom-core`. Prints the median and the spread over batches;
//! no pass/fail threshold here (timings on a shared machine are reported, not asserted).

use std::hint::black_box;
use std::time::Instant;
use stillroom_core::{Scenario, plan};

fn measure(label: &str, scenario: &Scenario) {
    // Warm up caches and branch predictors.
    for _ in 0..50 {
        black_box(plan(black_box(scenario)).unwrap());
    }
    let batch = 200;
    let mut per_plan_us: Vec<f64> = (0..25)
        .map(|_| {
            let start = Instant::now();
            for _ in 0..batch {
                black_box(plan(black_box(scenario)).unwrap());
            }
            start.elapsed().as_secs_f64() * 1e6 / batch as f64
        })
        .collect();
    per_plan_us.sort_by(|a, b| a.total_cmp(b));
    let median = per_plan_us[per_plan_us.len() / 2];
    println!(
        "{label:<34} median {median:8.1} µs per plan   (fastest batch {:.1}, slowest {:.1}; budget 2000 µs with ranges: {:.2}x under)",
        per_plan_us[0],
        per_plan_us[per_plan_us.len() - 1],
        2000.0 / median
    );
}

fn main() {
    let mut lavender = Scenario::default();
    measure("lavender, crop oil (default)", &lavender);
    lavender.charge.crop = Some("tea-tree".into());
    measure("tea tree, crop oil", &lavender);
    lavender.charge.crop = Some("clove-bud".into());
    measure("clove bud, crop oil (steam-limited)", &lavender);
}
