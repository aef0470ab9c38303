//! Running other programs: the search path the tools are found on, one-line command echoes, and
//! failures that say which command failed and how.

use crate::{Failure, Result};
use std::ffi::{OsStr, OsString};
use std::io::{BufRead, BufReader, Write};
use std::path::{Path, PathBuf};
use std::process::{Command, Stdio};

/// Cargo's home (`CARGO_HOME`, else `~/.cargo`), where `cargo install` puts binaries.
pub fn cargo_home() -> Option<PathBuf> {
    if let Some(h) = std::env::var_os("CARGO_HOME").filter(|h| !h.is_empty()) {
        return Some(PathBuf::from(h));
    }
    std::env::var_os("HOME").filter(|h| !h.is_empty()).map(|h| PathBuf::from(h).join(".cargo"))
}

/// The search path for child processes: `PATH` with cargo's bin folder first, so that tools just
/// installed by `cargo install` are found even when the caller's `PATH` lacks that folder.
pub fn tool_path() -> OsString {
    let mut dirs: Vec<PathBuf> = Vec::new();
    if let Some(h) = cargo_home() {
        dirs.push(h.join("bin"));
    }
    if let Some(p) = std::env::var_os("PATH") {
        for d in std::env::split_paths(&p) {
            if !dirs.contains(&d) {
                dirs.push(d);
            }
        }
    }
    std::env::join_paths(dirs).unwrap_or_else(|_| std::env::var_os("PATH").unwrap_or_default())
}

/// Find a program on [`tool_path`].
pub fn which(name: &str) -> Option<PathBuf> {
    let p = Path::new(name);
    if p.components().count() > 1 {
        return p.is_file().then(|| p.to_path_buf());
    }
    std::env::split_paths(&tool_path()).map(|d| d.join(name)).find(|c| is_executable(c))
}

fn is_executable(p: &Path) -> bool {
    use std::os::unix::fs::PermissionsExt;
    std::fs::metadata(p).map(|m| m.is_file() && m.permissions().mode() & 0o111 != 0).unwrap_or(false)
}

/// The cargo that runs us (cargo sets `CARGO` for `cargo run`), else `cargo` from the path.
pub fn cargo() -> OsString {
    std::env::var_os("CARGO").filter(|c| !c.is_empty()).unwrap_or_else(|| "cargo".into())
}

/// A command with the tool search path set.
pub fn command(program: impl AsRef<OsStr>) -> Command {
    let mut c = Command::new(program);
    c.env("PATH", tool_path());
    c
}

/// A cargo command with the tool search path set.
pub fn cargo_command() -> Command {
    command(cargo())
}

/// How a command reads when echoed: program name and arguments separated by spaces.
pub fn describe(cmd: &Command) -> String {
    let prog =
        Path::new(cmd.get_program()).file_name().unwrap_or(cmd.get_program()).to_string_lossy().into_owned();
    let mut s = prog;
    for a in cmd.get_args() {
        s.push(' ');
        s.push_str(&a.to_string_lossy());
    }
    s
}

/// Run a command to completion with its output going to the terminal; fail unless it exits 0.
pub fn run(cmd: &mut Command) -> Result<()> {
    let desc = describe(cmd);
    println!("$ {desc}");
    let _ = std::io::stdout().flush();
    let status = cmd.status().map_err(|e| Failure(format!("could not start `{desc}`: {e}")))?;
    if status.success() { Ok(()) } else { Err(Failure(format!("`{desc}` failed ({status})"))) }
}

/// Run a command quietly and return its standard output if it exits 0, `None` if it cannot start
/// or fails. Used for version checks.
pub fn output_of(cmd: &mut Command) -> Option<String> {
    let out = cmd.stdin(Stdio::null()).stderr(Stdio::null()).output().ok()?;
    out.status.success().then(|| String::from_utf8_lossy(&out.stdout).into_owned())
}

/// Run a command with its standard output passed through line by line while `each_line` sees every
/// line; standard error goes straight to the terminal. Fails unless the command exits 0.
pub fn run_watching(cmd: &mut Command, mut each_line: impl FnMut(&str)) -> Result<()> {
    let desc = describe(cmd);
    println!("$ {desc}");
    let _ = std::io::stdout().flush();
    let mut child =
        cmd.stdout(Stdio::piped()).spawn().map_err(|e| Failure(format!("could not start `{desc}`: {e}")))?;
    let stdout = child.stdout.take().expect("stdout was piped");
    for line in BufReader::new(stdout).lines() {
        let line = match line {
            Ok(l) => l,
            Err(e) => {
                // Output that is not UTF-8 cannot hold a result line; keep draining.
                eprintln!("xtask: unreadable output line from `{desc}`: {e}");
                continue;
            }
        };
        // Standard output is line-buffered: each line shows as it comes.
        println!("{line}");
        each_line(&line);
    }
    let status = child.wait().map_err(|e| Failure(format!("waiting for `{desc}`: {e}")))?;
    if status.success() { Ok(()) } else { Err(Failure(format!("`{desc}` failed ({status})"))) }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn describe_shows_program_name_and_args() {
        let mut c = Command::new("/usr/bin/env");
        c.args(["cargo", "fmt", "--check"]);
        assert_eq!(describe(&c), "env cargo fmt --check");
    }

    #[test]
    fn run_reports_failure_status() {
        let mut c = Command::new("sh");
        c.args(["-c", "exit 3"]);
        let err = run(&mut c).unwrap_err();
        assert!(err.0.contains("sh -c exit 3"), "{err}");
        assert!(err.0.contains('3'), "{err}");
        assert!(run(Command::new("sh").args(["-c", "true"])).is_ok());
    }

    #[test]
    fn run_watching_sees_every_line() {
        let mut seen = Vec::new();
        let mut c = Command::new("sh");
        c.args(["-c", "printf 'one\\ntwo\\nthree\\n'"]);
        run_watching(&mut c, |l| seen.push(l.to_string())).unwrap();
        assert_eq!(seen, ["one", "two", "three"]);
    }

    #[test]
    fn which_finds_sh_and_not_nonsense() {
        assert!(which("sh").is_some());
        assert!(which("no-such-program-stillroom-xyz").is_none());
    }
}
