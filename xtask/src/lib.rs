//! The build, serve and test driver for Stillroom.
//!
//! The page ships as a release wasm module built by cargo, bound to JavaScript by `wasm-bindgen`,
//! shrunk by `wasm-opt`, and copied into `dist/` with the static files from `public/`. Nothing else
//! drives the build. The library half holds the pieces the end-to-end tests reuse: the static file
//! server, the first-load size figures and the build id.

pub mod build;
pub mod buildid;
pub mod compress;
pub mod proc;
pub mod serve;
pub mod setup;
pub mod sizes;
pub mod sources;
pub mod testrun;

use std::fmt;
use std::path::{Path, PathBuf};

/// A failed step, with a message meant for the person at the terminal.
#[derive(Debug, Clone, PartialEq, Eq)]
pub struct Failure(pub String);

impl fmt::Display for Failure {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        f.write_str(&self.0)
    }
}

impl std::error::Error for Failure {}

impl Failure {
    pub fn new(msg: impl Into<String>) -> Self {
        Failure(msg.into())
    }
}

impl From<std::io::Error> for Failure {
    fn from(e: std::io::Error) -> Self {
        Failure(e.to_string())
    }
}

pub type Result<T> = std::result::Result<T, Failure>;

/// Attach a description of what was being done to an I/O error.
pub fn io_ctx<T>(r: std::io::Result<T>, what: impl fmt::Display) -> Result<T> {
    r.map_err(|e| Failure(format!("{what}: {e}")))
}

/// The workspace root (the folder holding the top `Cargo.toml`).
///
/// Taken from the `CARGO_MANIFEST_DIR` that cargo gives the running program (`cargo run` and
/// `cargo test` set it to the member's folder, one level below the root), else from where this
/// crate was compiled.
pub fn workspace_root() -> PathBuf {
    let is_root =
        |d: &Path| std::fs::read_to_string(d.join("Cargo.toml")).is_ok_and(|t| t.contains("[workspace]"));
    if let Some(member) = std::env::var_os("CARGO_MANIFEST_DIR")
        && let Some(root) = Path::new(&member).parent()
        && is_root(root)
    {
        return root.to_path_buf();
    }
    Path::new(env!("CARGO_MANIFEST_DIR"))
        .parent()
        .expect("xtask lives one level below the workspace root")
        .to_path_buf()
}

/// Where the built page is written.
pub fn dist_dir(root: &Path) -> PathBuf {
    root.join("dist")
}

/// Where the bench's measuring anchor (`tests/anchor`) is built: under the target directory,
/// never in `dist/`, as it is no part of the page.
pub fn anchor_dist_dir(root: &Path) -> PathBuf {
    target_dir(root).join("anchor-dist")
}

/// Cargo's target directory: `CARGO_TARGET_DIR` if set, else `<root>/target`.
pub fn target_dir(root: &Path) -> PathBuf {
    match std::env::var_os("CARGO_TARGET_DIR") {
        Some(d) if !d.is_empty() => {
            let d = PathBuf::from(d);
            if d.is_absolute() { d } else { root.join(d) }
        }
        _ => root.join("target"),
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn root_holds_the_workspace_manifest() {
        let root = workspace_root();
        let manifest = std::fs::read_to_string(root.join("Cargo.toml")).unwrap();
        assert!(manifest.contains("[workspace]"));
        assert!(root.join("xtask").join("Cargo.toml").is_file());
        assert_eq!(dist_dir(&root), root.join("dist"));
    }
}
