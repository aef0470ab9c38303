//! Raw HTTP/1.1 over `TcpStream` for the static server's tests: what goes on the wire is exactly
//! what the test wrote, and what comes back is read byte for byte.
#![allow(dead_code)] // each serve_* test file uses its own part

use std::io::{Read, Write};
use std::net::{SocketAddr, TcpStream};
use std::path::PathBuf;
use std::sync::atomic::{AtomicUsize, Ordering};
use std::time::Duration;

/// A response as read off the wire.
#[derive(Debug)]
pub struct Raw {
    /// `HTTP/1.1 200 OK`
    pub status_line: String,
    /// `(name, value)`, in the order sent.
    pub headers: Vec<(String, String)>,
    pub body: Vec<u8>,
}

impl Raw {
    /// The status code.
    pub fn status(&self) -> u16 {
        self.status_line.split(' ').nth(1).and_then(|c| c.parse().ok()).unwrap_or(0)
    }

    /// A header's value, the name matched without regard to case.
    pub fn header(&self, name: &str) -> Option<&str> {
        self.headers.iter().find(|(k, _)| k.eq_ignore_ascii_case(name)).map(|(_, v)| v.as_str())
    }
}

/// Parse a whole response (the connection was closed after it).
pub fn parse(all: &[u8]) -> Option<Raw> {
    let end = all.windows(4).position(|w| w == b"\r\n\r\n")?;
    let head = std::str::from_utf8(&all[..end]).ok()?;
    let mut lines = head.split("\r\n");
    let status_line = lines.next()?.to_string();
    let headers = lines
        .filter_map(|l| l.split_once(':'))
        .map(|(k, v)| (k.trim().to_string(), v.trim().to_string()))
        .collect();
    Some(Raw { status_line, headers, body: all[end + 4..].to_vec() })
}

/// Send `request` as written and read until the server closes the connection (send
/// `Connection: close`). Panics on a read slower than 15 s.
pub fn send(addr: SocketAddr, request: &[u8]) -> Raw {
    let mut s = TcpStream::connect(addr).expect("connect");
    s.set_read_timeout(Some(Duration::from_secs(15))).unwrap();
    s.write_all(request).expect("write request");
    let mut all = Vec::new();
    s.read_to_end(&mut all).expect("read response");
    parse(&all).unwrap_or_else(|| panic!("not an HTTP response: {:?}", String::from_utf8_lossy(&all)))
}

/// `GET path` with the given extra header lines (each without its line end), CRLF throughout.
pub fn get(addr: SocketAddr, path: &str, extra: &[&str]) -> Raw {
    let mut req = format!("GET {path} HTTP/1.1\r\nHost: 127.0.0.1\r\nConnection: close\r\n");
    for line in extra {
        req.push_str(line);
        req.push_str("\r\n");
    }
    req.push_str("\r\n");
    send(addr, req.as_bytes())
}

/// A fresh, empty folder under the system's temporary folder.
pub fn temp_dir(tag: &str) -> PathBuf {
    static N: AtomicUsize = AtomicUsize::new(0);
    let d = std::env::temp_dir().join(format!(
        "stillroom-{tag}-{}-{}",
        std::process::id(),
        N.fetch_add(1, Ordering::SeqCst)
    ));
    let _ = std::fs::remove_dir_all(&d);
    std::fs::create_dir_all(&d).unwrap();
    d
}

/// A small site: a page, a script, a stylesheet, a manifest, a wasm module.
pub fn small_site(tag: &str) -> PathBuf {
    let d = temp_dir(tag);
    std::fs::write(d.join("index.html"), "<!doctype html><title>t</title><p>page</p>").unwrap();
    std::fs::write(d.join("app.js"), "export function start() { return 1; }\n").unwrap();
    std::fs::write(d.join("style.css"), "p { margin: 0 }\n").unwrap();
    std::fs::write(d.join("manifest.webmanifest"), "{\"name\":\"t\"}").unwrap();
    // The 8-byte wasm preamble: magic number and version 1 (WebAssembly Core Specification §5.5.16).
    std::fs::write(d.join("m_bg.wasm"), [0u8, b'a', b's', b'm', 1, 0, 0, 0]).unwrap();
    std::fs::write(d.join("sw.js"), "self.addEventListener('fetch', () => {});\n").unwrap();
    d
}
