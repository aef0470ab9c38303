//! The release build of the page into `dist/`.

use crate::buildid::build_id;
use crate::proc::{self, run};
use crate::setup::{BuildTools, WASM_TARGET};
use crate::sizes::FirstLoad;
use crate::{Failure, Result, io_ctx};
use std::path::{Path, PathBuf};

/// The app crate and the stem of the files wasm-bindgen writes.
pub const APP_PACKAGE: &str = "stillroom-app";
pub const OUT_NAME: &str = "stillroom_app";
/// The modules the page loads only when their tab is first opened (the first-still designer; the
/// workbench of saved plans, comparisons, tables and batch records), so the first load carries
/// only what a first plan needs: (cargo bin, output name).
pub const LAZY_BINS: [(&str, &str); 2] =
    [("stillroom-first-still", "stillroom_first_still"), ("stillroom-workbench", "stillroom_workbench")];
/// The bench's measuring anchor (`tests/anchor`): a minimal Leptos page as large as the plan
/// page, without physics, built like the page into [`crate::anchor_dist_dir`].
pub const ANCHOR_PACKAGE: &str = "stillroom-anchor";
pub const ANCHOR_OUT_NAME: &str = "stillroom_anchor";
/// The anchor's first load, file for file the counterpart of [`crate::sizes::FIRST_LOAD_FILES`]
/// (the same stylesheet).
pub const ANCHOR_FIRST_LOAD_FILES: [&str; 4] =
    ["index.html", "stillroom_anchor.js", "stillroom_anchor_bg.wasm", "style.css"];
/// Replaced by the build id in `dist/sw.js` and `dist/index.html`.
pub const BUILD_ID_TOKEN: &str = "__STILLROOM_BUILD_ID__";
/// Replaced in `dist/sw.js` by the list of files to precache.
pub const PRECACHE_TOKEN: &str = "/*__STILLROOM_PRECACHE__*/";
/// wasm features wasm-opt may use: those Rust's wasm32 target emits by default (the module's
/// `target_features` section lists the same set; wasm-opt reads it too). wasm-bindgen's glue
/// relies on reference types for its externref table.
pub const WASM_OPT_FEATURES: [&str; 8] = [
    "--enable-bulk-memory",
    "--enable-bulk-memory-opt",
    "--enable-call-indirect-overlong",
    "--enable-nontrapping-float-to-int",
    "--enable-sign-ext",
    "--enable-mutable-globals",
    "--enable-reference-types",
    "--enable-multivalue",
];

/// What a build produced.
#[derive(Debug, Clone)]
pub struct Built {
    pub dist: PathBuf,
    pub build_id: String,
    pub sizes: FirstLoad,
}

/// Every file under `dir`, as `/`-separated paths relative to it, sorted.
pub fn list_files(dir: &Path) -> Result<Vec<String>> {
    fn walk(base: &Path, dir: &Path, out: &mut Vec<String>) -> Result<()> {
        for entry in io_ctx(std::fs::read_dir(dir), dir.display())? {
            let entry = io_ctx(entry, dir.display())?;
            let path = entry.path();
            let ty = io_ctx(entry.file_type(), path.display())?;
            if ty.is_dir() {
                walk(base, &path, out)?;
            } else if ty.is_file() {
                let rel = path.strip_prefix(base).expect("walked from base");
                let parts: Vec<String> =
                    rel.components().map(|c| c.as_os_str().to_string_lossy().into_owned()).collect();
                out.push(parts.join("/"));
            }
        }
        Ok(())
    }
    let mut out = Vec::new();
    walk(dir, dir, &mut out)?;
    out.sort();
    Ok(out)
}

/// Copy the files under `from` into `to`, keeping sub-folders.
pub fn copy_tree(from: &Path, to: &Path) -> Result<()> {
    for rel in list_files(from)? {
        let dst = to.join(&rel);
        if let Some(parent) = dst.parent() {
            io_ctx(std::fs::create_dir_all(parent), parent.display())?;
        }
        io_ctx(std::fs::copy(from.join(&rel), &dst), format!("copying {rel} into {}", to.display()))?;
    }
    Ok(())
}

/// The JavaScript array elements naming the files to precache, after the `./` and `./index.html`
/// the service worker lists itself: `, "./a.js", "./b.wasm"`.
pub fn precache_entries(files: &[String]) -> String {
    files
        .iter()
        .filter(|f| f.as_str() != "sw.js" && f.as_str() != "index.html")
        .map(|f| format!(", \"./{}\"", f.replace('\\', "\\\\").replace('"', "\\\"")))
        .collect()
}

/// Replace `token` in `text`, failing if it is not there (a template lost its placeholder).
pub fn fill(text: &str, token: &str, value: &str, file: &str) -> Result<String> {
    if !text.contains(token) {
        return Err(Failure::new(format!("{file} has no `{token}` placeholder for the build to fill")));
    }
    Ok(text.replace(token, value))
}

/// Next to each compressible file under `dir`, write `NAME.gz` and `NAME.br`, each only if it is
/// smaller than the file. A host sends one of them, with `Content-Encoding`, to a browser that
/// accepts it. Returns the copies written, relative to `dir`.
pub fn write_compressed_copies(dir: &Path) -> Result<Vec<String>> {
    let mut written = Vec::new();
    for rel in list_files(dir)? {
        let path = dir.join(&rel);
        if !crate::compress::is_compressible(&path) {
            continue;
        }
        let bytes = io_ctx(std::fs::read(&path), path.display())?;
        for (suffix, packed) in
            [("gz", crate::compress::gzip(&bytes)), ("br", crate::compress::brotli(&bytes))]
        {
            if packed.len() < bytes.len() {
                let copy = format!("{rel}.{suffix}");
                io_ctx(std::fs::write(dir.join(&copy), packed), &copy)?;
                written.push(copy);
            }
        }
    }
    Ok(written)
}

/// wasm-bindgen's glue for one wasm binary of the page, then wasm-opt -Oz over its module.
fn bind_and_optimise(root: &Path, tools: &BuildTools, dist: &Path, bin: &str, out_name: &str) -> Result<()> {
    let wasm = crate::target_dir(root).join(WASM_TARGET).join("release").join(format!("{bin}.wasm"));
    if !wasm.is_file() {
        return Err(Failure::new(format!("cargo finished but {} is not there", wasm.display())));
    }
    let mut bindgen = proc::command(&tools.wasm_bindgen);
    bindgen
        .args(["--target", "web", "--no-typescript", "--out-dir"])
        .arg(dist)
        .args(["--out-name", out_name])
        .arg(&wasm);
    run(&mut bindgen)?;
    let bg = dist.join(format!("{out_name}_bg.wasm"));
    let optimised = dist.join(format!("{out_name}_bg.opt.wasm"));
    let mut opt = proc::command(&tools.wasm_opt);
    // `--converge` repeats the passes while they still shrink the module (about 1 % more).
    opt.arg("-Oz").arg("--converge").args(WASM_OPT_FEATURES).arg(&bg).arg("-o").arg(&optimised);
    run(&mut opt)?;
    io_ctx(std::fs::rename(&optimised, &bg), bg.display())
}

/// Build the release page into `<root>/dist` and measure it.
pub fn build(root: &Path, tools: &BuildTools) -> Result<Built> {
    run(proc::cargo_command().current_dir(root).args([
        "build",
        "-p",
        APP_PACKAGE,
        "--bins",
        "--release",
        "--target",
        WASM_TARGET,
    ]))?;
    let dist = crate::dist_dir(root);
    if dist.exists() {
        io_ctx(std::fs::remove_dir_all(&dist), dist.display())?;
    }
    io_ctx(std::fs::create_dir_all(&dist), dist.display())?;
    for (bin, out_name) in std::iter::once((APP_PACKAGE, OUT_NAME)).chain(LAZY_BINS) {
        bind_and_optimise(root, tools, &dist, bin, out_name)?;
    }

    let public = root.join("public");
    copy_tree(&public, &dist)?;
    let template_path = root.join("app").join("index.html");
    let template = io_ctx(std::fs::read_to_string(&template_path), template_path.display())?;
    let script = format!("./{OUT_NAME}.js");
    if !template.contains(&script) {
        return Err(Failure::new(format!("{} does not load {script}", template_path.display())));
    }
    io_ctx(std::fs::write(dist.join("index.html"), &template), "writing dist/index.html")?;
    // The tables' source texts, which the page's modules leave out and fetch when asked; before
    // the file list is taken, so the offline copy holds it and the build id covers it.
    let sources = crate::sources::sources_json()?;
    io_ctx(std::fs::write(dist.join(crate::sources::SOURCES_FILE), sources), "writing dist/sources.json")?;

    // The id covers every file as built, placeholders still in, so any change to any of them
    // renames the offline cache.
    let files = list_files(&dist)?;
    let mut contents = Vec::new();
    for f in &files {
        contents.push((f.clone(), io_ctx(std::fs::read(dist.join(f)), f)?));
    }
    let id = build_id(contents.iter().map(|(n, b)| (n.as_str(), b.as_slice())));

    let index = fill(&template, BUILD_ID_TOKEN, &id, "app/index.html")?;
    io_ctx(std::fs::write(dist.join("index.html"), index), "dist/index.html")?;
    let sw_path = dist.join("sw.js");
    let sw = io_ctx(std::fs::read_to_string(&sw_path), "public/sw.js")?;
    let sw = fill(&sw, BUILD_ID_TOKEN, &id, "public/sw.js")?;
    let sw = fill(&sw, PRECACHE_TOKEN, &precache_entries(&files), "public/sw.js")?;
    io_ctx(std::fs::write(&sw_path, sw), "dist/sw.js")?;

    // Last, so the copies are neither precached (the browser decodes them transparently) nor part
    // of the build id (they follow from the files it covers).
    write_compressed_copies(&dist)?;

    let sizes = io_ctx(FirstLoad::measure(&dist), "measuring dist/")?;
    Ok(Built { dist, build_id: id, sizes })
}

/// Build the bench's measuring anchor into [`crate::anchor_dist_dir`] through the page's own
/// pipeline (the workspace release profile, wasm-bindgen, wasm-opt -Oz, the compressed copies),
/// with the page's stylesheet, and measure its first load.
pub fn build_anchor(root: &Path, tools: &BuildTools) -> Result<Built> {
    run(proc::cargo_command().current_dir(root).args([
        "build",
        "-p",
        ANCHOR_PACKAGE,
        "--bins",
        "--release",
        "--target",
        WASM_TARGET,
    ]))?;
    let dist = crate::anchor_dist_dir(root);
    if dist.exists() {
        io_ctx(std::fs::remove_dir_all(&dist), dist.display())?;
    }
    io_ctx(std::fs::create_dir_all(&dist), dist.display())?;
    bind_and_optimise(root, tools, &dist, ANCHOR_PACKAGE, ANCHOR_OUT_NAME)?;
    let anchor = root.join("tests").join("anchor");
    for (from, name) in
        [(root.join("public"), "style.css"), (anchor.clone(), "index.html"), (anchor, "start.js")]
    {
        io_ctx(
            std::fs::copy(from.join(name), dist.join(name)),
            format!("copying {}", from.join(name).display()),
        )?;
    }
    let files = list_files(&dist)?;
    let mut contents = Vec::new();
    for f in &files {
        contents.push((f.clone(), io_ctx(std::fs::read(dist.join(f)), f)?));
    }
    let id = build_id(contents.iter().map(|(n, b)| (n.as_str(), b.as_slice())));
    write_compressed_copies(&dist)?;
    let sizes = io_ctx(FirstLoad::measure_files(&dist, &ANCHOR_FIRST_LOAD_FILES), "measuring the anchor")?;
    Ok(Built { dist, build_id: id, sizes })
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn precache_skips_worker_and_index_and_quotes() {
        let files = vec![
            "icon.svg".to_string(),
            "index.html".to_string(),
            "stillroom_app.js".to_string(),
            "sw.js".to_string(),
            "img/a\"b.png".to_string(),
        ];
        assert_eq!(
            precache_entries(&files),
            ", \"./icon.svg\", \"./stillroom_app.js\", \"./img/a\\\"b.png\""
        );
        assert_eq!(precache_entries(&[]), "");
    }

    #[test]
    fn fill_demands_the_placeholder() {
        assert_eq!(fill("const C = 'x-__T__';", "__T__", "abc", "f").unwrap(), "const C = 'x-abc';");
        let e = fill("nothing", "__T__", "abc", "public/sw.js").unwrap_err();
        assert!(e.0.contains("public/sw.js") && e.0.contains("__T__"), "{e}");
    }

    #[test]
    fn compressed_copies_decode_to_their_file() {
        use std::io::Read;
        let d = std::env::temp_dir().join(format!("stillroom-packed-{}", std::process::id()));
        let _ = std::fs::remove_dir_all(&d);
        std::fs::create_dir_all(d.join("sub")).unwrap();
        let text = "fn steam() { return 42; }\n".repeat(200);
        std::fs::write(d.join("sub/a.js"), &text).unwrap();
        std::fs::write(d.join("tiny.css"), "p{}").unwrap();
        std::fs::write(d.join("pic.png"), vec![7u8; 5000]).unwrap();
        let written = write_compressed_copies(&d).unwrap();
        // The png is not a compressible type; three bytes of css do not shrink.
        assert_eq!(written, ["sub/a.js.gz", "sub/a.js.br"]);
        let mut gz = String::new();
        flate2::read::GzDecoder::new(&std::fs::read(d.join("sub/a.js.gz")).unwrap()[..])
            .read_to_string(&mut gz)
            .unwrap();
        assert_eq!(gz, text);
        let mut br = String::new();
        brotli::Decompressor::new(&std::fs::read(d.join("sub/a.js.br")).unwrap()[..], 4096)
            .read_to_string(&mut br)
            .unwrap();
        assert_eq!(br, text);
        std::fs::remove_dir_all(&d).unwrap();
    }

    #[test]
    fn list_and_copy_tree() {
        let base = std::env::temp_dir().join(format!("stillroom-tree-{}", std::process::id()));
        let _ = std::fs::remove_dir_all(&base);
        let (a, b) = (base.join("a"), base.join("b"));
        std::fs::create_dir_all(a.join("deep/er")).unwrap();
        std::fs::write(a.join("z.txt"), "z").unwrap();
        std::fs::write(a.join("deep/er/y.css"), "y").unwrap();
        std::fs::write(a.join("deep/x.js"), "x").unwrap();
        assert_eq!(list_files(&a).unwrap(), ["deep/er/y.css", "deep/x.js", "z.txt"]);
        copy_tree(&a, &b).unwrap();
        assert_eq!(list_files(&b).unwrap(), list_files(&a).unwrap());
        assert_eq!(std::fs::read_to_string(b.join("deep/er/y.css")).unwrap(), "y");
        std::fs::remove_dir_all(&base).unwrap();
    }
}
