//! Installing what the build and the tests need, each piece checked first by its version so that a
//! second run does nothing. Sources: rustup, crates.io (`cargo install`), the npm registry and
//! Debian's archive; nothing is downloaded from anywhere else.

use crate::proc::{self, command, output_of, run};
use crate::{Failure, Result};
use std::path::{Path, PathBuf};
use std::process::Command;

pub const WASM_TARGET: &str = "wasm32-unknown-unknown";
/// Must equal the `wasm-bindgen` crate version pinned in `app/Cargo.toml`.
pub const WASM_BINDGEN_VERSION: &str = "0.2.130";
/// binaryen from npm; Debian's older binaryen corrupts the module's function table.
pub const BINARYEN_VERSION: &str = "132";

/// Paths of the tools the build uses.
#[derive(Debug, Clone)]
pub struct BuildTools {
    pub wasm_bindgen: PathBuf,
    pub wasm_opt: PathBuf,
}

fn say(item: &str, what: &str) {
    println!("setup: {item:<28} {what}");
}

/// The folder npm installs binaryen into.
pub fn binaryen_prefix(root: &Path) -> PathBuf {
    root.join(".tools").join("binaryen")
}

pub fn wasm_opt_path(root: &Path) -> PathBuf {
    binaryen_prefix(root).join("node_modules").join(".bin").join("wasm-opt")
}

/// The wasm target's standard library is in the sysroot (works with or without rustup).
fn wasm_target_present() -> bool {
    let Some(sysroot) = output_of(command("rustc").args(["--print", "sysroot"])) else {
        return false;
    };
    Path::new(sysroot.trim()).join("lib/rustlib").join(WASM_TARGET).join("lib").is_dir()
}

fn need_rustup() -> Result<()> {
    if proc::which("rustup").is_none() {
        return Err(Failure::new(
            "rustup is not on PATH; install the missing Rust parts by hand or install rustup",
        ));
    }
    Ok(())
}

/// The wasm target and the rustfmt and clippy components.
pub fn ensure_rust() -> Result<()> {
    if wasm_target_present() {
        say(WASM_TARGET, "present");
    } else {
        need_rustup()?;
        say(WASM_TARGET, "installing (rustup)");
        run(command("rustup").args(["target", "add", WASM_TARGET]))?;
        if !wasm_target_present() {
            return Err(Failure::new(format!(
                "`rustup target add {WASM_TARGET}` ran but the target is still missing"
            )));
        }
    }
    for (component, sub) in [("rustfmt", "fmt"), ("clippy", "clippy")] {
        let probe = || output_of(proc::cargo_command().args([sub, "--version"]));
        match probe() {
            Some(v) => say(component, &format!("present ({})", v.trim())),
            None => {
                need_rustup()?;
                say(component, "installing (rustup)");
                run(command("rustup").args(["component", "add", component]))?;
                if probe().is_none() {
                    return Err(Failure::new(format!("`cargo {sub}` still fails after install")));
                }
            }
        }
    }
    Ok(())
}

/// The version a `--version` line reports, as its last word (`wasm-bindgen 0.2.130` -> `0.2.130`).
pub fn last_word(s: &str) -> Option<&str> {
    s.lines().next()?.split_whitespace().last()
}

fn bindgen_versions() -> (Option<String>, Option<String>) {
    let v = |prog: &str| {
        let path = proc::which(prog)?;
        output_of(Command::new(path).arg("--version")).and_then(|o| last_word(&o).map(str::to_string))
    };
    (v("wasm-bindgen"), v("wasm-bindgen-test-runner"))
}

/// `wasm-bindgen` and `wasm-bindgen-test-runner` at exactly [`WASM_BINDGEN_VERSION`].
pub fn ensure_wasm_bindgen() -> Result<PathBuf> {
    let ok = |(a, b): &(Option<String>, Option<String>)| {
        a.as_deref() == Some(WASM_BINDGEN_VERSION) && b.as_deref() == Some(WASM_BINDGEN_VERSION)
    };
    let found = bindgen_versions();
    if ok(&found) {
        say("wasm-bindgen-cli", &format!("present ({WASM_BINDGEN_VERSION})"));
    } else {
        say(
            "wasm-bindgen-cli",
            &format!(
                "installing {WASM_BINDGEN_VERSION} (found {}); cargo builds it from source, about 2 minutes",
                found.0.as_deref().unwrap_or("none")
            ),
        );
        // Not `--locked`: the published lockfile names a crate version the registry lacks.
        run(proc::cargo_command().args(["install", "wasm-bindgen-cli", "--version", WASM_BINDGEN_VERSION]))?;
        let after = bindgen_versions();
        if !ok(&after) {
            return Err(Failure::new(format!(
                "wasm-bindgen-cli {WASM_BINDGEN_VERSION} was installed but `wasm-bindgen --version` \
                 gives {:?} and `wasm-bindgen-test-runner --version` gives {:?}; another copy may \
                 come first on PATH",
                after.0, after.1
            )));
        }
    }
    proc::which("wasm-bindgen").ok_or_else(|| Failure::new("wasm-bindgen vanished from PATH"))
}

fn wasm_opt_version(root: &Path) -> Option<String> {
    let p = wasm_opt_path(root);
    if !p.exists() {
        return None;
    }
    output_of(proc::command(&p).arg("--version"))
}

/// The release number in `wasm-opt version 132 (version_132)`.
pub fn binaryen_release(v: &str) -> Option<&str> {
    let rest = v.split("version ").nth(1)?;
    let end = rest.find(|c: char| !c.is_ascii_digit()).unwrap_or(rest.len());
    (end > 0).then(|| &rest[..end])
}

fn binaryen_ok(v: &Option<String>) -> bool {
    v.as_deref().and_then(binaryen_release) == Some(BINARYEN_VERSION)
}

/// npm's `binaryen@132` in `.tools/binaryen`; returns the `wasm-opt` path.
pub fn ensure_binaryen(root: &Path) -> Result<PathBuf> {
    let found = wasm_opt_version(root);
    if binaryen_ok(&found) {
        say("wasm-opt (npm binaryen)", &format!("present ({})", found.unwrap_or_default().trim()));
    } else {
        if proc::which("npm").is_none() || proc::which("node").is_none() {
            return Err(Failure::new(
                "node and npm are needed for wasm-opt (npm package binaryen); install Node.js",
            ));
        }
        say(
            "wasm-opt (npm binaryen)",
            &format!("installing binaryen@{BINARYEN_VERSION} into .tools/binaryen"),
        );
        let prefix = binaryen_prefix(root);
        crate::io_ctx(std::fs::create_dir_all(&prefix), prefix.display())?;
        run(command("npm").args([
            "install",
            "--prefix",
            &prefix.to_string_lossy(),
            "--no-audit",
            "--no-fund",
            "--loglevel=error",
            &format!("binaryen@{BINARYEN_VERSION}"),
        ]))?;
        let after = wasm_opt_version(root);
        if !binaryen_ok(&after) {
            return Err(Failure::new(format!(
                "binaryen@{BINARYEN_VERSION} installed but `{} --version` gives {:?}",
                wasm_opt_path(root).display(),
                after
            )));
        }
    }
    Ok(wasm_opt_path(root))
}

/// What the release build needs.
pub fn ensure_build_tools(root: &Path) -> Result<BuildTools> {
    ensure_rust()?;
    let wasm_bindgen = ensure_wasm_bindgen()?;
    let wasm_opt = ensure_binaryen(root)?;
    Ok(BuildTools { wasm_bindgen, wasm_opt })
}

fn browser_versions() -> Option<(String, String)> {
    let v = |p: &str| {
        let path = proc::which(p)?;
        output_of(Command::new(path).arg("--version")).map(|s| s.trim().to_string())
    };
    Some((v("chromium")?, v("chromedriver")?))
}

fn is_root() -> bool {
    output_of(Command::new("id").arg("-u")).is_some_and(|s| s.trim() == "0")
}

/// `apt-get ARGS`, non-interactive, through sudo when not root.
fn apt(args: &[&str]) -> Command {
    let mut c = if is_root() {
        let mut c = command("apt-get");
        c.env("DEBIAN_FRONTEND", "noninteractive");
        c
    } else {
        // sudo resets the environment, so the setting goes through `env`.
        let mut c = command("sudo");
        c.args(["env", "DEBIAN_FRONTEND=noninteractive", "apt-get"]);
        c
    };
    c.args(args);
    c
}

/// Debian's Chromium and its matching ChromeDriver.
pub fn ensure_browser() -> Result<()> {
    if let Some((c, d)) = browser_versions() {
        say("chromium + chromium-driver", &format!("present ({c}; {d})"));
        return Ok(());
    }
    if proc::which("apt-get").is_none() {
        return Err(Failure::new(
            "chromium and chromedriver are missing and apt-get is not here: install them by hand",
        ));
    }
    if !is_root() && proc::which("sudo").is_none() {
        return Err(Failure::new(
            "chromium and chromedriver are missing; installing them needs root or sudo",
        ));
    }
    say("chromium + chromium-driver", "installing (apt-get)");
    let install = ["install", "-y", "-q", "chromium", "chromium-driver"];
    if run(&mut apt(&install)).is_err() {
        // The package lists are missing or stale: refresh them once and retry.
        say("apt package lists", "updating");
        run(&mut apt(&["update", "-q"]))?;
        run(&mut apt(&install))?;
    }
    match browser_versions() {
        Some((c, d)) => {
            say("chromium + chromium-driver", &format!("installed ({c}; {d})"));
            Ok(())
        }
        None => Err(Failure::new(
            "apt-get installed chromium but `chromium --version` or `chromedriver --version` fails",
        )),
    }
}

/// Everything: the build tools and the browser for the tests.
pub fn setup_all(root: &Path) -> Result<BuildTools> {
    let tools = ensure_build_tools(root)?;
    ensure_browser()?;
    Ok(tools)
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn version_words() {
        assert_eq!(last_word("wasm-bindgen 0.2.130\n"), Some("0.2.130"));
        assert_eq!(last_word("wasm-bindgen-test-runner 0.2.130"), Some("0.2.130"));
        assert_eq!(last_word(""), None);
    }

    #[test]
    fn binaryen_version_match() {
        assert!(binaryen_ok(&Some("wasm-opt version 132 (version_132)".into())));
        assert!(!binaryen_ok(&Some("wasm-opt version 108".into())));
        assert!(!binaryen_ok(&Some("wasm-opt version 1320".into())));
        assert_eq!(binaryen_release("wasm-opt version 132 (version_132)"), Some("132"));
        assert_eq!(binaryen_release("wasm-opt"), None);
        assert!(!binaryen_ok(&None));
    }

    #[test]
    fn tool_paths_live_under_the_repo() {
        let root = Path::new("/r");
        assert_eq!(wasm_opt_path(root), Path::new("/r/.tools/binaryen/node_modules/.bin/wasm-opt"));
    }
}
