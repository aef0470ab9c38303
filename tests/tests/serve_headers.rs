//! The static server's response headers, read off raw requests: the security headers on every
//! response, MIME types, compressed copies chosen by `Accept-Encoding`, and caching.

mod serve_http;

use serve_http::{Raw, get, send, small_site};
use std::io::Read;
use xtask::serve::Server;

/// The page's policy, written out here independently of `xtask::serve::CONTENT_SECURITY_POLICY`
/// (the project's chosen policy: own origin only, wasm compilation allowed, no framing).
const POLICY: &str = "default-src 'none'; script-src 'self' 'wasm-unsafe-eval'; style-src 'self'; \
                      img-src 'self'; connect-src 'self'; manifest-src 'self'; worker-src 'self'; \
                      base-uri 'none'; form-action 'none'; frame-ancestors 'none'";

fn security_headers(r: &Raw, what: &str) {
    assert_eq!(r.header("content-security-policy"), Some(POLICY), "{what}: {r:?}");
    assert_eq!(r.header("x-content-type-options"), Some("nosniff"), "{what}: {r:?}");
    assert_eq!(r.header("cache-control"), Some("no-cache"), "{what}: {r:?}");
}

#[test]
fn every_response_carries_the_policy_nosniff_and_no_cache() {
    let d = small_site("headers");
    let s = Server::start(&d).unwrap();
    for path in ["/", "/index.html", "/sw.js", "/app.js", "/m_bg.wasm", "/style.css", "/missing.js", "/../x"]
    {
        security_headers(&get(s.addr(), path, &[]), path);
    }
    let post =
        send(s.addr(), b"POST / HTTP/1.1\r\nHost: x\r\nContent-Length: 0\r\nConnection: close\r\n\r\n");
    assert_eq!(post.status(), 405, "{post:?}");
    security_headers(&post, "POST");
    assert_eq!(get(s.addr(), "/missing.js", &[]).status(), 404);
    std::fs::remove_dir_all(&d).unwrap();
}

#[test]
fn content_types() {
    let d = small_site("types");
    let s = Server::start(&d).unwrap();
    // Browsers stream-compile wasm only when it is served as application/wasm (WebAssembly
    // Web API §4); module scripts need a JavaScript MIME type (HTML Standard §4.12.1).
    for (path, want) in [
        ("/", "text/html; charset=utf-8"),
        ("/index.html", "text/html; charset=utf-8"),
        ("/m_bg.wasm", "application/wasm"),
        ("/app.js", "text/javascript; charset=utf-8"),
        ("/sw.js", "text/javascript; charset=utf-8"),
        ("/style.css", "text/css; charset=utf-8"),
        ("/manifest.webmanifest", "application/manifest+json"),
    ] {
        let r = get(s.addr(), path, &[]);
        assert_eq!(r.status(), 200, "{path}: {r:?}");
        assert_eq!(r.header("content-type"), Some(want), "{path}");
    }
    let wasm = get(s.addr(), "/m_bg.wasm", &[]);
    assert_eq!(wasm.body, [0u8, b'a', b's', b'm', 1, 0, 0, 0]);
    std::fs::remove_dir_all(&d).unwrap();
}

fn gunzip(b: &[u8]) -> Vec<u8> {
    let mut out = Vec::new();
    flate2::read::GzDecoder::new(b).read_to_end(&mut out).expect("a gzip stream");
    out
}

fn unbrotli(b: &[u8]) -> Vec<u8> {
    let mut out = Vec::new();
    brotli::Decompressor::new(b, 4096).read_to_end(&mut out).expect("a brotli stream");
    out
}

#[test]
fn the_best_accepted_compressed_copy_is_sent() {
    let d = small_site("encodings");
    let script: String = (0..400).map(|i| format!("export const c{i} = {};\n", i * 7)).collect();
    std::fs::write(d.join("app.js"), &script).unwrap();
    // The build's own step writes the copies.
    let written = xtask::build::write_compressed_copies(&d).unwrap();
    assert!(written.contains(&"app.js.br".to_string()) && written.contains(&"app.js.gz".to_string()));
    let s = Server::start(&d).unwrap();

    for (accept, want) in [
        ("Accept-Encoding: gzip, deflate, br, zstd", Some("br")), // what Chromium sends
        ("Accept-Encoding: br, gzip", Some("br")),
        ("Accept-Encoding: gzip", Some("gzip")),
        ("Accept-Encoding: br;q=0, gzip", Some("gzip")),
        ("Accept-Encoding: gzip;q=0.9, br;q=0.5", Some("gzip")),
        ("Accept-Encoding: identity", None),
        ("X-None: 1", None),
    ] {
        let r = get(s.addr(), "/app.js", &[accept]);
        assert_eq!(r.status(), 200, "{accept}: {r:?}");
        assert_eq!(r.header("content-encoding"), want, "{accept}");
        assert_eq!(
            r.header("vary").map(str::to_ascii_lowercase).as_deref(),
            Some("accept-encoding"),
            "{accept}"
        );
        assert_eq!(r.header("content-type"), Some("text/javascript; charset=utf-8"), "{accept}");
        assert_eq!(r.header("content-length"), Some(r.body.len().to_string().as_str()), "{accept}");
        let plain = match want {
            Some("br") => unbrotli(&r.body),
            Some("gzip") => gunzip(&r.body),
            _ => r.body.clone(),
        };
        assert_eq!(plain, script.as_bytes(), "{accept}");
        if want.is_some() {
            assert!(r.body.len() < script.len() / 2, "{accept}: {} of {}", r.body.len(), script.len());
        }
    }
    // A file with no copies is sent as it is, whatever is accepted.
    std::fs::remove_file(d.join("style.css.gz")).ok();
    std::fs::remove_file(d.join("style.css.br")).ok();
    let css = get(s.addr(), "/style.css", &["Accept-Encoding: br, gzip"]);
    assert_eq!(css.header("content-encoding"), None);
    assert_eq!(css.body, b"p { margin: 0 }\n");
    // HEAD gives the same head, no body.
    let head = send(
        s.addr(),
        b"HEAD /app.js HTTP/1.1\r\nHost: x\r\nAccept-Encoding: br\r\nConnection: close\r\n\r\n",
    );
    assert_eq!(head.header("content-encoding"), Some("br"));
    assert!(head.body.is_empty());
    std::fs::remove_dir_all(&d).unwrap();
}

#[test]
fn unchanged_files_revalidate_to_304() {
    let d = small_site("revalidate");
    let s = Server::start(&d).unwrap();
    for path in ["/", "/sw.js", "/m_bg.wasm"] {
        let first = get(s.addr(), path, &[]);
        let etag =
            first.header("etag").unwrap_or_else(|| panic!("{path} has no ETag: {first:?}")).to_string();
        let modified = first
            .header("last-modified")
            .unwrap_or_else(|| panic!("{path} has no Last-Modified"))
            .to_string();
        let by_tag = get(s.addr(), path, &[&format!("If-None-Match: {etag}")]);
        assert_eq!(by_tag.status(), 304, "{path}: {by_tag:?}");
        assert!(by_tag.body.is_empty());
        let by_date = get(s.addr(), path, &[&format!("If-Modified-Since: {modified}")]);
        assert_eq!(by_date.status(), 304, "{path}: {by_date:?}");
        let other = get(s.addr(), path, &["If-None-Match: \"not-this-one\""]);
        assert_eq!(other.status(), 200, "{path}");
    }
    std::fs::remove_dir_all(&d).unwrap();
}
