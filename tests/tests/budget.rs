//! The first visit must stay light enough for a weak rural data connection.

use stillroom_tests::browser;
use xtask::sizes::{FIRST_LOAD_BUDGET_GZIP, FirstLoad};

#[test]
fn first_load_budget() -> Result<(), stillroom_tests::BoxError> {
    let dist = browser::dist()?;
    let sizes = FirstLoad::measure(&dist)?;
    print!("{}", sizes.report());
    // Each part is really there (an empty file would pass any budget).
    for a in &sizes.assets {
        assert!(a.raw > 0, "{} is empty", a.name);
    }
    let wasm = sizes.get("stillroom_app_bg.wasm").ok_or("no wasm")?;
    assert!(wasm.raw > 1000, "wasm module is only {} bytes", wasm.raw);
    assert!(
        sizes.total_gzip() < FIRST_LOAD_BUDGET_GZIP,
        "first load is {} B gzipped, over the {} B budget",
        sizes.total_gzip(),
        FIRST_LOAD_BUDGET_GZIP
    );
    Ok(())
}
