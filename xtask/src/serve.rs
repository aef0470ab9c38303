//! A small static file server for `dist/`: GET and HEAD only, loopback use, correct MIME types
//! (browsers refuse to stream-compile wasm served as anything but `application/wasm`).

use std::io::{self, Read, Write};
use std::net::{Shutdown, SocketAddr, TcpListener, TcpStream};
use std::path::{Component, Path, PathBuf};
use std::sync::Arc;
use std::sync::atomic::{AtomicBool, Ordering};
use std::thread::JoinHandle;
use std::time::Duration;

/// The largest request head accepted.
const MAX_HEAD: usize = 16 * 1024;

/// The MIME type for a file, from its extension.
pub fn mime_for(path: &Path) -> &'static str {
    let ext = path.extension().and_then(|e| e.to_str()).map(|e| e.to_ascii_lowercase());
    match ext.as_deref() {
        Some("html" | "htm") => "text/html; charset=utf-8",
        Some("js" | "mjs") => "text/javascript; charset=utf-8",
        Some("css") => "text/css; charset=utf-8",
        Some("wasm") => "application/wasm",
        Some("webmanifest") => "application/manifest+json",
        Some("json") => "application/json",
        Some("svg") => "image/svg+xml",
        Some("png") => "image/png",
        Some("ico") => "image/x-icon",
        Some("txt") => "text/plain; charset=utf-8",
        Some("csv") => "text/csv; charset=utf-8",
        Some("woff2") => "font/woff2",
        _ => "application/octet-stream",
    }
}

/// Decode `%XX` escapes. `None` for a malformed escape or a result that is not UTF-8.
pub fn percent_decode(s: &str) -> Option<String> {
    let b = s.as_bytes();
    let mut out = Vec::with_capacity(b.len());
    let mut i = 0;
    while i < b.len() {
        if b[i] == b'%' {
            let hex = b.get(i + 1..i + 3)?;
            let hex = std::str::from_utf8(hex).ok()?;
            out.push(u8::from_str_radix(hex, 16).ok()?);
            i += 3;
        } else {
            out.push(b[i]);
            i += 1;
        }
    }
    String::from_utf8(out).ok()
}

/// Map a request target (`/a/b.js?x=1`) to a path under `root`. `None` for anything that could leave
/// `root` (`..`, backslashes, NUL) or that is not an origin-form target.
pub fn resolve(root: &Path, target: &str) -> Option<PathBuf> {
    let path = target.split(['?', '#']).next().unwrap_or("");
    if !path.starts_with('/') {
        return None;
    }
    let decoded = percent_decode(path)?;
    if decoded.contains('\\') || decoded.contains('\0') {
        return None;
    }
    let mut out = root.to_path_buf();
    for seg in decoded.split('/') {
        match seg {
            "" | "." => {}
            ".." => return None,
            s => {
                // A segment must be one plain name (no prefix or root hidden inside it).
                let mut comps = Path::new(s).components();
                match (comps.next(), comps.next()) {
                    (Some(Component::Normal(_)), None) => out.push(s),
                    _ => return None,
                }
            }
        }
    }
    if out.is_dir() {
        out.push("index.html");
    }
    Some(out)
}

struct Response {
    status: &'static str,
    content_type: &'static str,
    body: Vec<u8>,
}

impl Response {
    fn text(status: &'static str, msg: &str) -> Self {
        Response { status, content_type: "text/plain; charset=utf-8", body: format!("{msg}\n").into_bytes() }
    }
}

fn respond(root: &Path, method: &str, target: &str) -> Response {
    if method != "GET" && method != "HEAD" {
        return Response::text("405 Method Not Allowed", "only GET and HEAD are served");
    }
    let Some(path) = resolve(root, target) else {
        return Response::text("400 Bad Request", "bad path");
    };
    match std::fs::read(&path) {
        Ok(body) => Response { status: "200 OK", content_type: mime_for(&path), body },
        Err(e) if e.kind() == io::ErrorKind::NotFound => Response::text("404 Not Found", "not found"),
        Err(_) => Response::text("403 Forbidden", "cannot read"),
    }
}

/// Read the request head (up to the blank line).
fn read_head(stream: &mut TcpStream) -> io::Result<Option<String>> {
    let mut buf = Vec::with_capacity(1024);
    let mut chunk = [0u8; 1024];
    loop {
        if let Some(end) = find_blank_line(&buf) {
            buf.truncate(end);
            return Ok(Some(String::from_utf8_lossy(&buf).into_owned()));
        }
        if buf.len() > MAX_HEAD {
            return Ok(None);
        }
        let n = stream.read(&mut chunk)?;
        if n == 0 {
            return Ok(None);
        }
        buf.extend_from_slice(&chunk[..n]);
    }
}

fn find_blank_line(buf: &[u8]) -> Option<usize> {
    buf.windows(4).position(|w| w == b"\r\n\r\n")
}

fn handle(root: &Path, mut stream: TcpStream) -> io::Result<()> {
    stream.set_read_timeout(Some(Duration::from_secs(10)))?;
    stream.set_write_timeout(Some(Duration::from_secs(10)))?;
    let Some(head) = read_head(&mut stream)? else {
        return Ok(());
    };
    let mut parts = head.lines().next().unwrap_or("").split_whitespace();
    let (method, target) = (parts.next().unwrap_or(""), parts.next().unwrap_or(""));
    let resp = respond(root, method, target);
    let header = format!(
        "HTTP/1.1 {}\r\nContent-Type: {}\r\nContent-Length: {}\r\nCache-Control: no-cache\r\n\
         X-Content-Type-Options: nosniff\r\nConnection: close\r\n\r\n",
        resp.status,
        resp.content_type,
        resp.body.len()
    );
    stream.write_all(header.as_bytes())?;
    if method != "HEAD" {
        stream.write_all(&resp.body)?;
    }
    stream.flush()?;
    let _ = stream.shutdown(Shutdown::Write);
    Ok(())
}

fn serve_loop(root: &Path, listener: &TcpListener, stop: &AtomicBool) -> io::Result<()> {
    for conn in listener.incoming() {
        if stop.load(Ordering::SeqCst) {
            break;
        }
        match conn {
            Ok(stream) => {
                let root = root.to_path_buf();
                std::thread::spawn(move || {
                    let _ = handle(&root, stream);
                });
            }
            // A connection that failed before it was accepted concerns only that client.
            Err(e) if e.kind() == io::ErrorKind::ConnectionAborted => {}
            Err(e) if e.kind() == io::ErrorKind::Interrupted => {}
            Err(e) => return Err(e),
        }
    }
    Ok(())
}

/// Serve the files under `dir` on `listener` until the process ends.
pub fn serve_dir(dir: &Path, listener: TcpListener) -> io::Result<()> {
    serve_loop(dir, &listener, &AtomicBool::new(false))
}

/// A server running on a thread of its own; stops when dropped.
pub struct Server {
    addr: SocketAddr,
    stop: Arc<AtomicBool>,
    thread: Option<JoinHandle<io::Result<()>>>,
}

impl Server {
    /// Serve `dir` on a free loopback port.
    pub fn start(dir: impl Into<PathBuf>) -> io::Result<Server> {
        Server::start_on(dir, TcpListener::bind(("127.0.0.1", 0))?)
    }

    /// Serve `dir` on the given listener.
    pub fn start_on(dir: impl Into<PathBuf>, listener: TcpListener) -> io::Result<Server> {
        let dir = dir.into();
        let addr = listener.local_addr()?;
        let stop = Arc::new(AtomicBool::new(false));
        let flag = Arc::clone(&stop);
        let thread = std::thread::Builder::new()
            .name("stillroom-static".into())
            .spawn(move || serve_loop(&dir, &listener, &flag))?;
        Ok(Server { addr, stop, thread: Some(thread) })
    }

    pub fn addr(&self) -> SocketAddr {
        self.addr
    }

    /// The base URL, ending in `/`.
    pub fn url(&self) -> String {
        format!("http://{}/", self.addr)
    }
}

impl Drop for Server {
    fn drop(&mut self) {
        self.stop.store(true, Ordering::SeqCst);
        // Wake the accept loop so it sees the flag.
        let _ = TcpStream::connect_timeout(&self.addr, Duration::from_secs(1));
        if let Some(t) = self.thread.take() {
            let _ = t.join();
        }
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use std::sync::atomic::AtomicUsize;

    fn temp_dir() -> PathBuf {
        static N: AtomicUsize = AtomicUsize::new(0);
        let d = std::env::temp_dir().join(format!(
            "stillroom-serve-test-{}-{}",
            std::process::id(),
            N.fetch_add(1, Ordering::SeqCst)
        ));
        let _ = std::fs::remove_dir_all(&d);
        std::fs::create_dir_all(d.join("sub")).unwrap();
        d
    }

    /// One raw request; returns (status line, headers, body).
    fn get(addr: SocketAddr, req: &str) -> (String, String, Vec<u8>) {
        let mut s = TcpStream::connect(addr).unwrap();
        s.write_all(req.as_bytes()).unwrap();
        let mut all = Vec::new();
        s.read_to_end(&mut all).unwrap();
        let end = find_blank_line(&all).expect("response head");
        let head = String::from_utf8(all[..end].to_vec()).unwrap();
        let body = all[end + 4..].to_vec();
        let (status, headers) = head.split_once("\r\n").unwrap_or((&head, ""));
        (status.to_string(), headers.to_string(), body)
    }

    fn header<'a>(headers: &'a str, name: &str) -> Option<&'a str> {
        headers.lines().find_map(|l| {
            let (k, v) = l.split_once(':')?;
            k.eq_ignore_ascii_case(name).then(|| v.trim())
        })
    }

    #[test]
    fn mime_types() {
        assert_eq!(mime_for(Path::new("a_bg.wasm")), "application/wasm");
        assert_eq!(mime_for(Path::new("x.js")), "text/javascript; charset=utf-8");
        assert_eq!(mime_for(Path::new("s.CSS")), "text/css; charset=utf-8");
        assert_eq!(mime_for(Path::new("manifest.webmanifest")), "application/manifest+json");
        assert_eq!(mime_for(Path::new("icon.svg")), "image/svg+xml");
        assert_eq!(mime_for(Path::new("index.html")), "text/html; charset=utf-8");
        assert_eq!(mime_for(Path::new("noext")), "application/octet-stream");
    }

    #[test]
    fn percent_decoding() {
        assert_eq!(percent_decode("/a%20b").as_deref(), Some("/a b"));
        assert_eq!(percent_decode("/%2e%2E").as_deref(), Some("/.."));
        assert_eq!(percent_decode("/bad%2"), None);
        assert_eq!(percent_decode("/bad%zz"), None);
        assert_eq!(percent_decode("/%ff"), None);
    }

    #[test]
    fn resolve_refuses_escapes() {
        let d = temp_dir();
        assert_eq!(resolve(&d, "/"), Some(d.join("index.html")));
        assert_eq!(resolve(&d, "/sub/"), Some(d.join("sub").join("index.html")));
        assert_eq!(resolve(&d, "/a.js?v=2#x"), Some(d.join("a.js")));
        assert_eq!(resolve(&d, "/./a.js"), Some(d.join("a.js")));
        assert_eq!(resolve(&d, "/../etc/passwd"), None);
        assert_eq!(resolve(&d, "/sub/%2e%2e/%2e%2e/x"), None);
        assert_eq!(resolve(&d, "/a%5cb"), None);
        assert_eq!(resolve(&d, "/a%00b"), None);
        assert_eq!(resolve(&d, "http://elsewhere/a"), None);
        assert_eq!(resolve(&d, ""), None);
        std::fs::remove_dir_all(&d).unwrap();
    }

    #[test]
    fn serves_files_with_types_and_errors() {
        let d = temp_dir();
        std::fs::write(d.join("index.html"), "<p>hi</p>").unwrap();
        let wasm = [0u8, b'a', b's', b'm', 1, 0, 0, 0];
        std::fs::write(d.join("m_bg.wasm"), wasm).unwrap();
        std::fs::write(d.join("sub").join("s.css"), "p{}").unwrap();
        let server = Server::start(&d).unwrap();
        let a = server.addr();
        assert!(server.url().starts_with("http://127.0.0.1:"));

        let (st, h, body) = get(a, "GET / HTTP/1.1\r\nHost: x\r\n\r\n");
        assert_eq!(st, "HTTP/1.1 200 OK");
        assert_eq!(header(&h, "content-type"), Some("text/html; charset=utf-8"));
        assert_eq!(body, b"<p>hi</p>");

        let (st, h, body) = get(a, "GET /m_bg.wasm HTTP/1.1\r\n\r\n");
        assert_eq!(st, "HTTP/1.1 200 OK");
        assert_eq!(header(&h, "content-type"), Some("application/wasm"));
        assert_eq!(header(&h, "content-length"), Some("8"));
        assert_eq!(body, wasm);

        let (st, h, body) = get(a, "HEAD /sub/s.css HTTP/1.1\r\n\r\n");
        assert_eq!(st, "HTTP/1.1 200 OK");
        assert_eq!(header(&h, "content-type"), Some("text/css; charset=utf-8"));
        assert_eq!(header(&h, "content-length"), Some("3"));
        assert!(body.is_empty());

        let (st, _, _) = get(a, "GET /missing.js HTTP/1.1\r\n\r\n");
        assert_eq!(st, "HTTP/1.1 404 Not Found");
        let (st, _, _) = get(a, "GET /../Cargo.toml HTTP/1.1\r\n\r\n");
        assert_eq!(st, "HTTP/1.1 400 Bad Request");
        let (st, _, _) = get(a, "POST / HTTP/1.1\r\n\r\n");
        assert_eq!(st, "HTTP/1.1 405 Method Not Allowed");

        drop(server);
        assert!(
            TcpStream::connect_timeout(&a, Duration::from_millis(300))
                .and_then(|mut s| {
                    s.write_all(b"GET / HTTP/1.1\r\n\r\n")?;
                    let mut v = Vec::new();
                    s.read_to_end(&mut v)?;
                    if v.is_empty() { Err(io::Error::other("closed")) } else { Ok(()) }
                })
                .is_err()
        );
        std::fs::remove_dir_all(&d).unwrap();
    }
}
