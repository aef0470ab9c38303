//! `cargo xtask <command>`: see `usage()`.

use std::net::TcpListener;
use std::path::Path;
use std::process::ExitCode;
use std::time::Instant;
use xtask::proc::{self, run, run_watching};
use xtask::setup::{self, WASM_TARGET};
use xtask::testrun::{Counts, parse_summary};
use xtask::{Failure, Result, build, workspace_root};

fn usage() -> &'static str {
    "usage: cargo xtask <command>

commands:
  setup              install what is missing: wasm target, rustfmt, clippy, wasm-bindgen-cli,
                     binaryen (npm, into .tools/), chromium + chromedriver (apt)
  build              release build of the page into dist/, with its sizes
  serve [--port N]   build, then serve dist/ on http://127.0.0.1:N/ (default 8080)
  test               formatting, lints, build, and every test (native and in headless Chromium)
  bench [--skip-core-benches]
                     cargo bench -p stillroom-core (skipped with the flag), then the page and
                     its measuring anchor (tests/anchor) measured in headless Chromium into
                     BENCHMARKS.md"
}

fn main() -> ExitCode {
    let args: Vec<String> = std::env::args().skip(1).collect();
    let root = workspace_root();
    let result = match args.first().map(String::as_str) {
        Some("setup") => setup::setup_all(&root).map(|_| ()),
        Some("build") => setup::ensure_build_tools(&root).and_then(|t| do_build(&root, &t)).map(|_| ()),
        Some("serve") => parse_port(&args[1..]).and_then(|port| serve(&root, port)),
        Some("test") => test(&root),
        Some("bench") => parse_bench(&args[1..]).and_then(|core| bench(&root, core)),
        Some("help" | "--help" | "-h") => {
            println!("{}", usage());
            Ok(())
        }
        Some(other) => Err(Failure(format!("unknown command `{other}`\n\n{}", usage()))),
        None => Err(Failure(usage().to_string())),
    };
    match result {
        Ok(()) => ExitCode::SUCCESS,
        Err(e) => {
            eprintln!("xtask: error: {e}");
            ExitCode::FAILURE
        }
    }
}

fn parse_port(args: &[String]) -> Result<u16> {
    match args {
        [] => Ok(8080),
        [flag, n] if flag == "--port" => {
            n.parse().map_err(|_| Failure(format!("--port wants a number from 0 to 65535, not `{n}`")))
        }
        [one] if one.starts_with("--port=") => {
            let n = &one["--port=".len()..];
            n.parse().map_err(|_| Failure(format!("--port wants a number from 0 to 65535, not `{n}`")))
        }
        _ => Err(Failure(format!("serve takes only --port N\n\n{}", usage()))),
    }
}

/// Whether `bench` runs the core's criterion benches first (all but `--skip-core-benches`).
fn parse_bench(args: &[String]) -> Result<bool> {
    match args {
        [] => Ok(true),
        [flag] if flag == "--skip-core-benches" => Ok(false),
        _ => Err(Failure(format!("bench takes only --skip-core-benches\n\n{}", usage()))),
    }
}

fn do_build(root: &Path, tools: &setup::BuildTools) -> Result<build::Built> {
    let built = build::build(root, tools)?;
    println!("\nbuilt {} (build id {})", built.dist.display(), built.build_id);
    print!("{}", built.sizes.report());
    Ok(built)
}

fn serve(root: &Path, port: u16) -> Result<()> {
    let tools = setup::ensure_build_tools(root)?;
    let built = do_build(root, &tools)?;
    let listener = TcpListener::bind(("127.0.0.1", port)).map_err(|e| {
        Failure(format!("cannot listen on 127.0.0.1:{port}: {e} (choose another with --port N)"))
    })?;
    let addr = listener.local_addr()?;
    println!("\nserving {} at http://{addr}/  (Ctrl-C stops)", built.dist.display());
    xtask::serve::serve_dir(&built.dist, listener)?;
    Ok(())
}

/// Does `[features]` in the manifest at `path` declare `name`?
fn has_feature(path: &Path, name: &str) -> bool {
    let Ok(text) = std::fs::read_to_string(path) else {
        return false;
    };
    let mut in_features = false;
    for line in text.lines() {
        let line = line.trim();
        if line.starts_with('[') {
            in_features = line == "[features]";
        } else if in_features
            && let Some((key, _)) = line.split_once('=')
            && key.trim().trim_matches('"') == name
        {
            return true;
        }
    }
    false
}

struct Stages {
    total: Counts,
    started: Instant,
}

impl Stages {
    /// Run one stage; a failure names it.
    fn stage(&mut self, name: &str, f: impl FnOnce(&mut Counts) -> Result<()>) -> Result<()> {
        println!("\n=== {name} ===");
        let t = Instant::now();
        let mut counts = Counts::default();
        let r = f(&mut counts);
        let secs = t.elapsed().as_secs_f64();
        match r {
            Ok(()) => {
                if counts.suites > 0 {
                    println!(
                        "=== {name}: ok, {} passed, {} ignored ({secs:.1} s) ===",
                        counts.passed, counts.ignored
                    );
                } else {
                    println!("=== {name}: ok ({secs:.1} s) ===");
                }
                self.total.add(counts);
                Ok(())
            }
            Err(e) => {
                self.total.add(counts);
                let t = self.total;
                let tally = if t.suites > 0 {
                    format!("\ntotal: {} passed, {} failed", t.passed, t.failed)
                } else {
                    String::new()
                };
                Err(Failure(format!(
                    "stage `{name}` failed after {secs:.1} s: {e}\n(xtask test stops at the first failing stage){tally}"
                )))
            }
        }
    }
}

/// Run a cargo test command, adding up its summary lines.
fn cargo_tests(root: &Path, args: &[&str], counts: &mut Counts) -> Result<()> {
    let mut c = proc::cargo_command();
    c.current_dir(root).args(args);
    let mut failed_lines = 0;
    let r = run_watching(&mut c, |line| {
        if let Some(s) = parse_summary(line) {
            if s.failed > 0 {
                failed_lines += 1;
            }
            counts.add(s);
        }
    });
    r?;
    if failed_lines > 0 || counts.failed > 0 {
        return Err(Failure(format!("{} tests failed", counts.failed)));
    }
    if counts.suites == 0 {
        return Err(Failure("the command printed no test summary line: no tests ran".into()));
    }
    Ok(())
}

fn test(root: &Path) -> Result<()> {
    let mut st = Stages { total: Counts::default(), started: Instant::now() };
    let mut tools = None;
    st.stage("setup", |_| {
        tools = Some(setup::setup_all(root)?);
        Ok(())
    })?;
    let tools = tools.expect("setup stage succeeded");
    st.stage("format (cargo fmt --check)", |_| {
        run(proc::cargo_command().current_dir(root).args(["fmt", "--all", "--check"]))
    })?;
    st.stage("lints, host (clippy)", |_| clippy(root, &["--workspace", "--all-targets", "--all-features"]))?;
    st.stage("lints, wasm32 (clippy)", |_| {
        clippy(root, &["-p", "stillroom-app", "--all-targets", "--target", WASM_TARGET])?;
        clippy(root, &["-p", "stillroom-core", "--target", WASM_TARGET])?;
        clippy(root, &["-p", build::ANCHOR_PACKAGE, "--target", WASM_TARGET])
    })?;
    st.stage("release build of the page (dist/)", |_| do_build(root, &tools).map(|_| ()))?;
    st.stage("native tests (unit, doc, reference, end-to-end)", |c| {
        // The bench's anchor is a wasm page with no tests of its own; the bench builds it.
        let exclude = ["--exclude", "stillroom-app", "--exclude", build::ANCHOR_PACKAGE];
        cargo_tests(root, &[&["test", "--no-fail-fast", "--workspace"][..], &exclude].concat(), c)
    })?;
    if has_feature(&root.join("core").join("Cargo.toml"), "cli") {
        st.stage("stillroom-core with all features", |c| {
            cargo_tests(root, &["test", "--no-fail-fast", "-p", "stillroom-core", "--all-features"], c)
        })?;
    }
    st.stage("browser tests (wasm-bindgen-test, headless Chromium)", |c| {
        cargo_tests(root, &["test", "--no-fail-fast", "-p", "stillroom-app", "--target", WASM_TARGET], c)
    })?;
    let t = st.total;
    println!(
        "\nxtask test: every stage passed in {:.0} s ({} test runs, {} ignored)",
        st.started.elapsed().as_secs_f64(),
        t.suites,
        t.ignored
    );
    println!("total: {} passed, {} failed", t.passed, t.failed);
    Ok(())
}

/// Clippy over the given packages and targets, every warning an error.
fn clippy(root: &Path, selection: &[&str]) -> Result<()> {
    run(proc::cargo_command().current_dir(root).arg("clippy").args(selection).args(["--", "-D", "warnings"]))
}

/// The core's own benchmarks (unless `core` is false), then the page's figures and its anchor's
/// into BENCHMARKS.md (the page and the anchor built first; the bench profile, so the native plan
/// is timed as optimised as the command line is).
fn bench(root: &Path, core: bool) -> Result<()> {
    if core {
        run(proc::cargo_command().current_dir(root).args(["bench", "-p", "stillroom-core"]))?;
    }
    let tools = setup::setup_all(root)?;
    do_build(root, &tools)?;
    let anchor = build::build_anchor(root, &tools)?;
    println!(
        "\nbuilt the measuring anchor into {}: first load {:.1} kB gzip, {:.1} kB Brotli",
        anchor.dist.display(),
        anchor.sizes.total_gzip() as f64 / 1000.0,
        anchor.sizes.total_brotli() as f64 / 1000.0
    );
    run(proc::cargo_command().current_dir(root).args([
        "run",
        "--profile",
        "bench",
        "-p",
        "stillroom-tests",
        "--bin",
        "stillroom-bench",
    ]))
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn ports() {
        assert_eq!(parse_port(&[]).unwrap(), 8080);
        assert_eq!(parse_port(&["--port".into(), "9000".into()]).unwrap(), 9000);
        assert_eq!(parse_port(&["--port=8123".into()]).unwrap(), 8123);
        assert!(parse_port(&["--port".into(), "http".into()]).is_err());
        assert!(parse_port(&["--port".into(), "70000".into()]).is_err());
        assert!(parse_port(&["--verbose".into()]).is_err());
    }

    #[test]
    fn bench_flags() {
        assert!(parse_bench(&[]).unwrap());
        assert!(!parse_bench(&["--skip-core-benches".into()]).unwrap());
        assert!(parse_bench(&["--skip".into()]).is_err());
    }

    #[test]
    fn feature_detection() {
        let p = std::env::temp_dir().join(format!("stillroom-feat-{}.toml", std::process::id()));
        std::fs::write(
            &p,
            "[package]\nname = \"x\"\ncli = 1\n\n[features]\ndefault = []\ncli = [\"dep:a\"]\n\n[dependencies]\n",
        )
        .unwrap();
        assert!(has_feature(&p, "cli"));
        assert!(has_feature(&p, "default"));
        assert!(!has_feature(&p, "name"));
        std::fs::write(&p, "[package]\ncli = 1\n[dependencies]\ncli = \"1\"\n").unwrap();
        assert!(!has_feature(&p, "cli"));
        std::fs::remove_file(&p).unwrap();
    }
}
