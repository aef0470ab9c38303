//! The first visit must stay light enough for a weak rural data connection.

use std::io::Read;
use stillroom_tests::browser;
use xtask::sizes::{FIRST_LOAD_BUDGET_GZIP, FIRST_LOAD_FILES, FirstLoad};

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
    println!(
        "wasm: {} B raw, {} B gzip, {} B brotli; first load with brotli: {} B",
        wasm.raw,
        wasm.gzip,
        wasm.brotli,
        sizes.total_brotli()
    );
    assert!(
        sizes.total_gzip() < FIRST_LOAD_BUDGET_GZIP,
        "first load is {} B gzipped, over the {} B budget",
        sizes.total_gzip(),
        FIRST_LOAD_BUDGET_GZIP
    );
    Ok(())
}

/// What the server actually sends: the build's `.gz` and `.br` copies of each first-load file
/// decode (with independent decoders) to the file itself, and are no bigger than the figures
/// above say.
#[test]
fn compressed_copies_in_dist_match_their_files() -> Result<(), stillroom_tests::BoxError> {
    let dist = browser::dist()?;
    let sizes = FirstLoad::measure(&dist)?;
    for name in FIRST_LOAD_FILES {
        let raw = std::fs::read(dist.join(name))?;
        let gz = std::fs::read(dist.join(format!("{name}.gz")))
            .map_err(|e| format!("{name}.gz: {e} (run `cargo xtask build`)"))?;
        let br = std::fs::read(dist.join(format!("{name}.br")))
            .map_err(|e| format!("{name}.br: {e} (run `cargo xtask build`)"))?;
        let mut back = Vec::new();
        flate2::read::GzDecoder::new(&gz[..]).read_to_end(&mut back)?;
        assert!(back == raw, "{name}.gz does not decode to {name}");
        back.clear();
        brotli::Decompressor::new(&br[..], 4096).read_to_end(&mut back)?;
        assert!(back == raw, "{name}.br does not decode to {name}");
        let a = sizes.get(name).ok_or(name)?;
        assert_eq!((gz.len() as u64, br.len() as u64), (a.gzip, a.brotli), "{name}");
    }
    Ok(())
}
