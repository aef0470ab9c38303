//! The static server outlives a failing `accept`. A server run under a limit of 64 file handles
//! is sent more connections than it can hold; `accept` fails with "too many open files", and the
//! server must log it, keep running, and answer again once handles free up.
//!
//! The server runs in a child process (this same test binary, re-entered through an environment
//! variable) so that only it gets the low limit.

mod serve_http;

use serve_http::{get, small_site};
use std::io::{BufRead, BufReader};
use std::net::{SocketAddr, TcpListener, TcpStream};
use std::process::{Child, Command, Stdio};
use std::sync::mpsc;
use std::time::{Duration, Instant};
use xtask::serve::{Limits, Server};

/// Set in the child: the folder to serve.
const CHILD_DIR: &str = "STILLROOM_SERVE_ACCEPT_CHILD_DIR";
/// The child's file-handle limit, and the header-read timeout that frees idle handles.
const NOFILE: u32 = 64;
const CHILD_HEADER_TIMEOUT: Duration = Duration::from_secs(2);
const IDLE: usize = 80;

/// The child's whole life: serve, say where, and wait to be killed.
fn child(dir: std::ffi::OsString) -> ! {
    let listener = TcpListener::bind(("127.0.0.1", 0)).unwrap();
    let limits = Limits { header_read_timeout: CHILD_HEADER_TIMEOUT, ..Limits::default() };
    let s = Server::start_with(dir, listener, limits).unwrap();
    println!("serving-on {}", s.addr());
    loop {
        std::thread::sleep(Duration::from_secs(3600));
    }
}

/// Kills the child however the test ends.
struct Killed(Child);

impl Drop for Killed {
    fn drop(&mut self) {
        let _ = self.0.kill();
        let _ = self.0.wait();
    }
}

fn spawn_child(dir: &std::path::Path) -> (Killed, SocketAddr, mpsc::Receiver<String>) {
    let me = std::env::current_exe().unwrap();
    let mut c = Command::new("/bin/sh")
        .arg("-c")
        .arg(format!("ulimit -n {NOFILE} && exec \"$0\" \"$@\""))
        .arg(me)
        .args(["--exact", "keeps_serving_when_accept_fails", "--nocapture", "--test-threads=1"])
        .env(CHILD_DIR, dir)
        .stdout(Stdio::piped())
        .stderr(Stdio::piped())
        .spawn()
        .unwrap();
    let stdout = BufReader::new(c.stdout.take().unwrap());
    let stderr = BufReader::new(c.stderr.take().unwrap());
    let child = Killed(c);
    let (addr_tx, addr_rx) = mpsc::channel();
    std::thread::spawn(move || {
        // libtest may have written `test NAME ... ` on the same line first.
        for line in stdout.lines().map_while(Result::ok) {
            if let Some((_, a)) = line.split_once("serving-on ") {
                let _ = addr_tx.send(a.trim().parse::<SocketAddr>().unwrap());
            }
        }
    });
    let (tx, rx) = mpsc::channel();
    std::thread::spawn(move || {
        for line in stderr.lines().map_while(Result::ok) {
            let _ = tx.send(line);
        }
    });
    let addr = addr_rx.recv_timeout(Duration::from_secs(30)).expect("the child names its address");
    (child, addr, rx)
}

#[test]
fn keeps_serving_when_accept_fails() {
    if let Some(dir) = std::env::var_os(CHILD_DIR) {
        child(dir);
    }
    let d = small_site("accept");
    let (mut child, addr, stderr) = spawn_child(&d);
    assert_eq!(get(addr, "/", &[]).status(), 200);

    // More connections than the child has handles: the kernel completes them all, the child
    // accepts what it can and then fails.
    let idle: Vec<TcpStream> = (0..IDLE).map(|_| TcpStream::connect(addr).unwrap()).collect();
    let failed =
        stderr.recv_timeout(Duration::from_secs(5)).expect("the child reports a failed accept on stderr");
    assert!(failed.contains("accept failed") && failed.contains("Too many open files"), "{failed}");
    std::thread::sleep(Duration::from_millis(500));
    assert!(child.0.try_wait().unwrap().is_none(), "the server exited on a failed accept");

    // A fresh request waits behind the idle ones only until their header time runs out.
    let t = Instant::now();
    let r = get(addr, "/m_bg.wasm", &[]);
    let waited = t.elapsed();
    assert_eq!(r.status(), 200);
    assert!(waited < CHILD_HEADER_TIMEOUT * 3, "answered after {waited:?}");
    println!("with {IDLE} idle connections at a limit of {NOFILE} handles: answered after {waited:?}");

    // Once the crowd is gone, answers come at once again.
    drop(idle);
    std::thread::sleep(CHILD_HEADER_TIMEOUT);
    let t = Instant::now();
    assert_eq!(get(addr, "/", &[]).status(), 200);
    assert!(t.elapsed() < Duration::from_secs(1), "{:?}", t.elapsed());
    assert!(child.0.try_wait().unwrap().is_none());
    std::fs::remove_dir_all(&d).unwrap();
}
