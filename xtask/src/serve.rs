//! The static file server for `dist/`: hyper's HTTP/1.1 on tokio, with tower-http's `ServeDir` for
//! the files. Loopback only. What it promises (each has a test in `tests/tests/serve_*.rs`):
//!
//! - A failed `accept` (out of file handles, say) is logged and waited out; it never stops the server.
//! - A client has [`Limits::header_read_timeout`] to send each request head, idle keep-alive
//!   connections included; one that stops reading the response is cut off after
//!   [`Limits::write_stall_timeout`]; at most [`Limits::max_connections`] are served at once, the
//!   rest wait in the kernel's backlog.
//! - Nothing outside the served folder is read: every path is resolved (symlinks included) and
//!   refused with 404 unless it stays inside.
//! - A request head over [`Limits::max_header_bytes`] (or over 100 fields) gets 431.
//! - Lines ending in a bare LF are accepted as well as CRLF.
//! - Every response the service writes carries [`CONTENT_SECURITY_POLICY`], `nosniff` and
//!   [`CACHE_CONTROL`]; files carry their MIME type and, if the build wrote `NAME.br` / `NAME.gz`,
//!   the best one the browser accepts is sent with `Content-Encoding` and `Vary: Accept-Encoding`.
//!   (The 400/431 hyper writes itself for an unreadable head bypasses the service and has no body.)
//! - Every response is logged in the server's [`Traffic`] (path, status, body bytes) and every byte
//!   written to a connection is counted, so a test can tell what a visit cost over the wire.

use http::header::{self, HeaderValue};
use http::{Request, Response};
use hyper::body::Incoming;
use hyper_util::rt::{TokioIo, TokioTimer};
use std::convert::Infallible;
use std::future::Future;
use std::io;
use std::net::{SocketAddr, TcpListener};
use std::path::{Path, PathBuf};
use std::pin::Pin;
use std::sync::Arc;
use std::task::{Context, Poll};
use std::thread::JoinHandle;
use std::time::Duration;
use tokio::sync::{Semaphore, oneshot};
use tower_http::services::fs::{
    Backend, DefaultServeDirFallback, ServeDir, ServeFileSystemResponseBody, TokioBackend, TokioFile,
};
use tower_service::Service;

/// The page's Content-Security-Policy: its own scripts, styles and images, wasm compilation, its
/// manifest and service worker; nothing else, no forms, no `<base>`, no framing. The page carries
/// the same policy in a `<meta>` tag (app/index.html), less `frame-ancestors`, which browsers
/// honour only as a header; a host should send this header.
pub const CONTENT_SECURITY_POLICY: &str = "default-src 'none'; script-src 'self' 'wasm-unsafe-eval'; \
     style-src 'self'; img-src 'self'; connect-src 'self'; manifest-src 'self'; \
     worker-src 'self'; base-uri 'none'; form-action 'none'; frame-ancestors 'none'";

/// The build keeps file names stable (the service worker lists them), so no name is
/// content-hashed and nothing may be cached without asking: every response says `no-cache`, and
/// the browser revalidates with `If-None-Match` (ETag) or `If-Modified-Since` (Last-Modified),
/// getting a bodiless 304 when nothing changed.
pub const CACHE_CONTROL: &str = "no-cache";

/// How long a failed `accept` waits before the next try when the cause is a shortage (file
/// handles, memory) that only time frees; any other failure is retried at once.
pub const ACCEPT_BACKOFF: Duration = Duration::from_millis(250);

/// The server's bounds on what a client may hold.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub struct Limits {
    /// Time to send a whole request head, counted from when the server starts waiting for it
    /// (after accept, and after each response on a kept-alive connection).
    pub header_read_timeout: Duration,
    /// Time a response write may stay blocked (the client stopped reading) before the
    /// connection is dropped.
    pub write_stall_timeout: Duration,
    /// Largest request head (request line and fields), in bytes; more gets 431.
    pub max_header_bytes: usize,
    /// Connections served at once.
    pub max_connections: usize,
}

impl Default for Limits {
    fn default() -> Self {
        Limits {
            header_read_timeout: Duration::from_secs(10),
            write_stall_timeout: Duration::from_secs(30),
            max_header_bytes: 16 * 1024,
            max_connections: 512,
        }
    }
}

/// The MIME type for a file, from its extension; `None` for one not in this table.
pub fn mime_for(path: &Path) -> Option<&'static str> {
    let ext = path.extension().and_then(|e| e.to_str()).map(|e| e.to_ascii_lowercase());
    Some(match ext.as_deref()? {
        "html" | "htm" => "text/html; charset=utf-8",
        "js" | "mjs" => "text/javascript; charset=utf-8",
        "css" => "text/css; charset=utf-8",
        "wasm" => "application/wasm",
        "webmanifest" => "application/manifest+json",
        "json" => "application/json",
        "svg" => "image/svg+xml",
        "png" => "image/png",
        "ico" => "image/x-icon",
        "txt" => "text/plain; charset=utf-8",
        "csv" => "text/csv; charset=utf-8",
        "woff2" => "font/woff2",
        _ => return None,
    })
}

/// The MIME type for a request path: a folder (`/`, `/sub/`) is served as its `index.html`.
fn mime_for_target(target: &str) -> Option<&'static str> {
    if target.ends_with('/') { mime_for(Path::new("index.html")) } else { mime_for(Path::new(target)) }
}

/// A `ServeDir` file system that answers "not found" for any path whose real location (every
/// symlink resolved) is outside `root`. `ServeDir` itself refuses `..` but follows symlinks.
#[derive(Clone, Debug)]
struct Confined {
    /// Canonical.
    root: Arc<PathBuf>,
}

type Boxed<T> = Pin<Box<dyn Future<Output = io::Result<T>> + Send>>;

impl Confined {
    fn inside(&self, path: PathBuf) -> impl Future<Output = io::Result<PathBuf>> + Send + 'static {
        let root = Arc::clone(&self.root);
        async move {
            let real = tokio::fs::canonicalize(&path).await?;
            if real.starts_with(root.as_path()) {
                Ok(real)
            } else {
                Err(io::Error::new(io::ErrorKind::NotFound, "resolves outside the served folder"))
            }
        }
    }
}

impl Backend for Confined {
    type File = TokioFile;
    type Metadata = std::fs::Metadata;
    type OpenFuture = Boxed<TokioFile>;
    type MetadataFuture = Boxed<std::fs::Metadata>;

    fn open(&self, path: PathBuf) -> Self::OpenFuture {
        let real = self.inside(path);
        Box::pin(async move { TokioBackend.open(real.await?).await })
    }

    fn metadata(&self, path: PathBuf) -> Self::MetadataFuture {
        let real = self.inside(path);
        Box::pin(async move { TokioBackend.metadata(real.await?).await })
    }
}

type Files = ServeDir<DefaultServeDirFallback, Confined>;

fn files(dir: &Path) -> io::Result<Files> {
    let root = std::fs::canonicalize(dir)
        .map_err(|e| io::Error::new(e.kind(), format!("cannot serve {}: {e}", dir.display())))?;
    Ok(ServeDir::with_backend(&root, Confined { root: Arc::new(root.clone()) })
        .precompressed_br()
        .precompressed_gzip())
}

/// One response as served: what was asked, the status, and the body's length (0 for a 304).
#[derive(Debug, Clone, PartialEq, Eq)]
pub struct Served {
    pub path: String,
    pub status: u16,
    pub body_bytes: u64,
}

/// What the server sent: each response, and the bytes written to connections (heads, bodies
/// and framing: what crossed the wire).
#[derive(Debug, Default)]
pub struct Traffic {
    log: std::sync::Mutex<Vec<Served>>,
    wire_bytes: std::sync::atomic::AtomicU64,
}

impl Traffic {
    /// The responses so far, in order.
    pub fn served(&self) -> Vec<Served> {
        self.log.lock().map(|l| l.clone()).unwrap_or_default()
    }

    /// Bytes written to connections so far.
    pub fn wire_bytes(&self) -> u64 {
        self.wire_bytes.load(std::sync::atomic::Ordering::Relaxed)
    }

    fn wrote(&self, n: usize) {
        self.wire_bytes.fetch_add(n as u64, std::sync::atomic::Ordering::Relaxed);
    }
}

/// One request: the file service, then the headers every response carries.
async fn answer(
    mut files: Files,
    traffic: Arc<Traffic>,
    req: Request<Incoming>,
) -> Result<Response<ServeFileSystemResponseBody>, Infallible> {
    let mime = mime_for_target(req.uri().path());
    let path = req.uri().path().to_string();
    let mut resp = files.call(req).await?;
    let body_bytes = resp
        .headers()
        .get(header::CONTENT_LENGTH)
        .and_then(|v| v.to_str().ok())
        .and_then(|v| v.parse().ok())
        .unwrap_or(0);
    if let Ok(mut log) = traffic.log.lock() {
        log.push(Served { path, status: resp.status().as_u16(), body_bytes });
    }
    let h = resp.headers_mut();
    if let Some(mime) = mime
        && h.contains_key(header::CONTENT_TYPE)
    {
        h.insert(header::CONTENT_TYPE, HeaderValue::from_static(mime));
    }
    h.insert(header::CONTENT_SECURITY_POLICY, HeaderValue::from_static(CONTENT_SECURITY_POLICY));
    h.insert(header::X_CONTENT_TYPE_OPTIONS, HeaderValue::from_static("nosniff"));
    h.insert(header::CACHE_CONTROL, HeaderValue::from_static(CACHE_CONTROL));
    Ok(resp)
}

/// A connection whose writes must make progress: a write that stays blocked for `limit` fails
/// with `TimedOut`, which ends the connection. hyper has a deadline for reading a request head
/// but none for a client that stops reading the response.
struct WriteDeadline<T> {
    io: T,
    limit: Duration,
    traffic: Arc<Traffic>,
    /// Armed when a write blocks, cleared when one goes through.
    stalled: Option<Pin<Box<tokio::time::Sleep>>>,
}

impl<T> WriteDeadline<T> {
    fn new(io: T, limit: Duration, traffic: Arc<Traffic>) -> Self {
        WriteDeadline { io, limit, traffic, stalled: None }
    }

    /// After a blocked write: still waiting, or out of time.
    fn blocked<R>(&mut self, cx: &mut Context<'_>) -> Poll<io::Result<R>> {
        let limit = self.limit;
        let timer = self.stalled.get_or_insert_with(|| Box::pin(tokio::time::sleep(limit)));
        match timer.as_mut().poll(cx) {
            Poll::Ready(()) => Poll::Ready(Err(io::Error::new(
                io::ErrorKind::TimedOut,
                "the client stopped reading the response",
            ))),
            Poll::Pending => Poll::Pending,
        }
    }

    fn progressed<R>(&mut self, r: Poll<io::Result<R>>) -> Poll<io::Result<R>> {
        self.stalled = None;
        r
    }

    fn counted(&mut self, r: Poll<io::Result<usize>>) -> Poll<io::Result<usize>> {
        if let Poll::Ready(Ok(n)) = &r {
            self.traffic.wrote(*n);
        }
        self.progressed(r)
    }
}

impl<T: hyper::rt::Read + Unpin> hyper::rt::Read for WriteDeadline<T> {
    fn poll_read(
        self: Pin<&mut Self>,
        cx: &mut Context<'_>,
        buf: hyper::rt::ReadBufCursor<'_>,
    ) -> Poll<io::Result<()>> {
        Pin::new(&mut self.get_mut().io).poll_read(cx, buf)
    }
}

impl<T: hyper::rt::Write + Unpin> hyper::rt::Write for WriteDeadline<T> {
    fn poll_write(self: Pin<&mut Self>, cx: &mut Context<'_>, buf: &[u8]) -> Poll<io::Result<usize>> {
        let this = self.get_mut();
        match Pin::new(&mut this.io).poll_write(cx, buf) {
            Poll::Pending => this.blocked(cx),
            done => this.counted(done),
        }
    }

    fn poll_write_vectored(
        self: Pin<&mut Self>,
        cx: &mut Context<'_>,
        bufs: &[io::IoSlice<'_>],
    ) -> Poll<io::Result<usize>> {
        let this = self.get_mut();
        match Pin::new(&mut this.io).poll_write_vectored(cx, bufs) {
            Poll::Pending => this.blocked(cx),
            done => this.counted(done),
        }
    }

    fn is_write_vectored(&self) -> bool {
        self.io.is_write_vectored()
    }

    fn poll_flush(self: Pin<&mut Self>, cx: &mut Context<'_>) -> Poll<io::Result<()>> {
        let this = self.get_mut();
        match Pin::new(&mut this.io).poll_flush(cx) {
            Poll::Pending => this.blocked(cx),
            done => this.progressed(done),
        }
    }

    fn poll_shutdown(self: Pin<&mut Self>, cx: &mut Context<'_>) -> Poll<io::Result<()>> {
        let this = self.get_mut();
        match Pin::new(&mut this.io).poll_shutdown(cx) {
            Poll::Pending => this.blocked(cx),
            done => this.progressed(done),
        }
    }
}

/// Does this `accept` failure mean a shortage that only time frees?
fn is_shortage(e: &io::Error) -> bool {
    const EMFILE: i32 = 24;
    const ENFILE: i32 = 23;
    const ENOMEM: i32 = 12;
    const ENOBUFS: i32 = 105;
    matches!(e.raw_os_error(), Some(EMFILE | ENFILE | ENOMEM | ENOBUFS))
        || e.kind() == io::ErrorKind::OutOfMemory
}

/// Accept and serve until `stop` fires (or its sender is dropped).
async fn serve_loop(
    listener: tokio::net::TcpListener,
    files: Files,
    limits: Limits,
    traffic: Arc<Traffic>,
    mut stop: oneshot::Receiver<()>,
) {
    let slots = Arc::new(Semaphore::new(limits.max_connections));
    // The last failure reported, so a run of the same one is logged once.
    let mut reported: Option<io::ErrorKind> = None;
    loop {
        let slot = tokio::select! {
            _ = &mut stop => return,
            s = Arc::clone(&slots).acquire_owned() => s.expect("the semaphore is never closed"),
        };
        let accepted = tokio::select! {
            _ = &mut stop => return,
            r = listener.accept() => r,
        };
        let stream = match accepted {
            Ok((stream, _)) => {
                reported = None;
                stream
            }
            Err(e) => {
                if reported != Some(e.kind()) {
                    eprintln!("static server: accept failed ({e}); still serving, retrying");
                    reported = Some(e.kind());
                }
                if is_shortage(&e) {
                    tokio::select! {
                        _ = &mut stop => return,
                        _ = tokio::time::sleep(ACCEPT_BACKOFF) => {}
                    }
                }
                continue;
            }
        };
        let files = files.clone();
        let traffic = Arc::clone(&traffic);
        tokio::spawn(async move {
            let _slot = slot;
            let log = Arc::clone(&traffic);
            let service = hyper::service::service_fn(move |req| answer(files.clone(), Arc::clone(&log), req));
            let mut http = hyper::server::conn::http1::Builder::new();
            http.timer(TokioTimer::new())
                .header_read_timeout(limits.header_read_timeout)
                .max_header_size(limits.max_header_bytes);
            let io = WriteDeadline::new(TokioIo::new(stream), limits.write_stall_timeout, traffic);
            // A client that goes away or times out ends only its own connection.
            let _ = http.serve_connection(io, service).await;
        });
    }
}

/// A runtime, the listener registered with it, and the file service: everything that can fail
/// before serving starts.
fn prepare(
    dir: &Path,
    listener: TcpListener,
) -> io::Result<(tokio::runtime::Runtime, tokio::net::TcpListener, Files)> {
    let files = files(dir)?;
    let rt = tokio::runtime::Builder::new_current_thread().enable_all().build()?;
    listener.set_nonblocking(true)?;
    let listener = {
        let _in_rt = rt.enter();
        tokio::net::TcpListener::from_std(listener)?
    };
    Ok((rt, listener, files))
}

/// Serve the files under `dir` on `listener` until the process ends.
pub fn serve_dir(dir: &Path, listener: TcpListener) -> io::Result<()> {
    let (rt, listener, files) = prepare(dir, listener)?;
    let (_keep, stop) = oneshot::channel();
    rt.block_on(serve_loop(listener, files, Limits::default(), Arc::default(), stop));
    Ok(())
}

/// A server running on a thread of its own; stops when dropped.
pub struct Server {
    addr: SocketAddr,
    traffic: Arc<Traffic>,
    stop: Option<oneshot::Sender<()>>,
    thread: Option<JoinHandle<()>>,
}

impl Server {
    /// Serve `dir` on a free loopback port.
    pub fn start(dir: impl Into<PathBuf>) -> io::Result<Server> {
        Server::start_on(dir, TcpListener::bind(("127.0.0.1", 0))?)
    }

    /// Serve `dir` on the given listener.
    pub fn start_on(dir: impl Into<PathBuf>, listener: TcpListener) -> io::Result<Server> {
        Server::start_with(dir, listener, Limits::default())
    }

    /// Serve `dir` on the given listener within the given limits.
    pub fn start_with(dir: impl Into<PathBuf>, listener: TcpListener, limits: Limits) -> io::Result<Server> {
        let addr = listener.local_addr()?;
        let (rt, listener, files) = prepare(&dir.into(), listener)?;
        let (tx, stop) = oneshot::channel();
        let traffic = Arc::new(Traffic::default());
        let log = Arc::clone(&traffic);
        let thread = std::thread::Builder::new().name("stillroom-static".into()).spawn(move || {
            rt.block_on(serve_loop(listener, files, limits, log, stop));
            // Ends open connections; file reads in flight take at most this long.
            rt.shutdown_timeout(Duration::from_secs(1));
        })?;
        Ok(Server { addr, traffic, stop: Some(tx), thread: Some(thread) })
    }

    pub fn addr(&self) -> SocketAddr {
        self.addr
    }

    /// What the server has sent so far.
    pub fn traffic(&self) -> &Traffic {
        &self.traffic
    }

    /// The base URL, ending in `/`.
    pub fn url(&self) -> String {
        format!("http://{}/", self.addr)
    }
}

impl Drop for Server {
    fn drop(&mut self) {
        if let Some(stop) = self.stop.take() {
            let _ = stop.send(());
        }
        if let Some(t) = self.thread.take() {
            let _ = t.join();
        }
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn mime_types() {
        assert_eq!(mime_for(Path::new("a_bg.wasm")), Some("application/wasm"));
        assert_eq!(mime_for(Path::new("x.js")), Some("text/javascript; charset=utf-8"));
        assert_eq!(mime_for(Path::new("s.CSS")), Some("text/css; charset=utf-8"));
        assert_eq!(mime_for(Path::new("manifest.webmanifest")), Some("application/manifest+json"));
        assert_eq!(mime_for(Path::new("icon.svg")), Some("image/svg+xml"));
        assert_eq!(mime_for(Path::new("index.html")), Some("text/html; charset=utf-8"));
        assert_eq!(mime_for(Path::new("noext")), None);
        assert_eq!(mime_for_target("/"), Some("text/html; charset=utf-8"));
        assert_eq!(mime_for_target("/sub/"), Some("text/html; charset=utf-8"));
        assert_eq!(mime_for_target("/m_bg.wasm"), Some("application/wasm"));
    }

    #[test]
    fn shortages_are_told_from_other_failures() {
        assert!(is_shortage(&io::Error::from_raw_os_error(24)));
        assert!(is_shortage(&io::Error::from_raw_os_error(23)));
        assert!(!is_shortage(&io::Error::from(io::ErrorKind::ConnectionAborted)));
    }

    #[test]
    fn dropping_the_server_stops_it() {
        use std::io::{Read, Write};
        let d = std::env::temp_dir().join(format!("stillroom-serve-drop-{}", std::process::id()));
        std::fs::create_dir_all(&d).unwrap();
        std::fs::write(d.join("index.html"), "<p>hi</p>").unwrap();
        let server = Server::start(&d).unwrap();
        let addr = server.addr();
        assert_eq!(server.url(), format!("http://{addr}/"));
        assert!(addr.ip().is_loopback());
        let fetch = || -> io::Result<Vec<u8>> {
            let mut s = std::net::TcpStream::connect_timeout(&addr, Duration::from_millis(500))?;
            s.set_read_timeout(Some(Duration::from_secs(5)))?;
            s.write_all(b"GET / HTTP/1.1\r\nHost: x\r\nConnection: close\r\n\r\n")?;
            let mut v = Vec::new();
            s.read_to_end(&mut v)?;
            Ok(v)
        };
        let answer = fetch().unwrap();
        assert!(answer.starts_with(b"HTTP/1.1 200 OK") && answer.ends_with(b"<p>hi</p>"));
        drop(server);
        assert!(fetch().map_or(true, |v| v.is_empty()), "answered after being dropped");
        std::fs::remove_dir_all(&d).unwrap();
    }

    #[test]
    fn a_missing_folder_is_refused_up_front() {
        let l = TcpListener::bind(("127.0.0.1", 0)).unwrap();
        let err = Server::start_on("/nonexistent/stillroom-dist", l).err().expect("no such folder");
        assert!(err.to_string().contains("/nonexistent/stillroom-dist"), "{err}");
    }
}
