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

/// Every source text of the crop and compound tables, read natively (the core's default feature
/// `source-texts`), each with where it belongs.
fn source_texts() -> Vec<(String, &'static str)> {
    use stillroom_core::compounds::COMPOUNDS;
    use stillroom_core::crops::CROPS;
    let crops = CROPS.iter().flat_map(|c| c.sources().map(|(l, t)| (format!("{} {l}", c.id), t)));
    let compounds = COMPOUNDS.iter().flat_map(|c| c.sources().map(|(l, t)| (format!("{} {l}", c.id), t)));
    crops.chain(compounds).collect()
}

/// The first `n` bytes of `text`, if it has that many.
fn head(text: &str, n: usize) -> Option<&[u8]> {
    text.as_bytes().get(..n)
}

/// Which of `texts` have their first `n` bytes somewhere in `bytes`: one pass over `bytes`
/// through a set of those heads, so a megabyte of wasm against 500 texts stays quick.
fn found_in<'a>(bytes: &[u8], texts: &'a [(String, &'static str)], n: usize) -> Vec<&'a str> {
    let heads: std::collections::HashSet<&[u8]> = texts.iter().filter_map(|(_, t)| head(t, n)).collect();
    let hits: std::collections::HashSet<&[u8]> = bytes.windows(n).filter(|w| heads.contains(w)).collect();
    texts
        .iter()
        .filter(|(_, t)| head(t, n).is_some_and(|h| hits.contains(h)))
        .map(|(w, _)| w.as_str())
        .collect()
}

/// The page's modules carry none of the tables' source texts (they fetch `sources.json`), and
/// that file is the build's: exactly what the core's tables hold now.
#[test]
fn the_modules_carry_no_source_text_and_sources_json_has_them_all() -> Result<(), stillroom_tests::BoxError> {
    let dist = browser::dist()?;
    let texts = source_texts();
    // 32 bytes: long enough to be the text's own, short enough that most texts have it.
    const N: usize = 32;
    let checked = texts.iter().filter(|(_, t)| t.len() >= N).count();
    assert!(checked * 10 >= texts.len() * 9, "only {checked} of {} texts are long enough", texts.len());
    for module in ["stillroom_app_bg.wasm", "stillroom_first_still_bg.wasm", "stillroom_workbench_bg.wasm"] {
        let wasm = std::fs::read(dist.join(module))?;
        let inside = found_in(&wasm, &texts, N);
        assert!(inside.is_empty(), "{module} still carries the source texts of {inside:?}");
    }
    // The same search finds every text in the file the page fetches (the search can fail)...
    let file = std::fs::read(dist.join(xtask::sources::SOURCES_FILE))
        .map_err(|e| format!("{}: {e} (run `cargo xtask build`)", xtask::sources::SOURCES_FILE))?;
    assert_eq!(found_in(&file, &texts, N).len(), checked);
    // ... and the file is what the core's tables make now (not left from an older build).
    assert!(
        file == xtask::sources::sources_json()?.into_bytes(),
        "dist/sources.json is stale: run `cargo xtask build`"
    );
    Ok(())
}
