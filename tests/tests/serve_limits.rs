//! The static server against clients that misbehave: oversized heads, bare-LF line ends, clients
//! that send their head slowly or never, and crowds of idle connections.

mod serve_http;

use serve_http::{parse, send, small_site};
use std::io::{Read, Write};
use std::net::TcpStream;
use std::time::{Duration, Instant};
use xtask::serve::{Limits, Server};

#[test]
fn oversized_heads_get_431() {
    let d = small_site("big-head");
    let s = Server::start(&d).unwrap();
    let max = Limits::default().max_header_bytes;
    // One field longer than the whole allowance (RFC 6585 §5: 431 Request Header Fields Too Large).
    let long = format!("GET / HTTP/1.1\r\nHost: x\r\nX-Long: {}\r\n\r\n", "a".repeat(max + 1));
    assert_eq!(send(s.addr(), long.as_bytes()).status(), 431);
    // Many short fields adding up to more than the allowance.
    let mut many = String::from("GET / HTTP/1.1\r\nHost: x\r\n");
    for i in 0..(max / 20 + 1) {
        many.push_str(&format!("X-F{i:05}: {}\r\n", "b".repeat(8)));
    }
    many.push_str("\r\n");
    assert!(many.len() > max);
    assert_eq!(send(s.addr(), many.as_bytes()).status(), 431);
    // Just under the allowance is served.
    let fits =
        format!("GET / HTTP/1.1\r\nHost: x\r\nConnection: close\r\nX-Long: {}\r\n\r\n", "a".repeat(max / 2));
    assert_eq!(send(s.addr(), fits.as_bytes()).status(), 200);
    std::fs::remove_dir_all(&d).unwrap();
}

#[test]
fn bare_lf_line_ends_are_answered() {
    // RFC 9112 §2.2: a recipient MAY recognise a single LF as a line terminator; some scripted
    // clients send nothing else.
    let d = small_site("lf");
    let s = Server::start(&d).unwrap();
    let r = send(s.addr(), b"GET /app.js HTTP/1.1\nHost: x\nConnection: close\n\n");
    assert_eq!(r.status(), 200, "{r:?}");
    assert_eq!(r.body, std::fs::read(d.join("app.js")).unwrap());
    let mixed = send(s.addr(), b"GET / HTTP/1.1\r\nHost: x\nConnection: close\r\n\n");
    assert_eq!(mixed.status(), 200, "{mixed:?}");
    std::fs::remove_dir_all(&d).unwrap();
}

/// Read until the server closes; returns the bytes and when it closed.
fn until_closed(mut c: TcpStream, budget: Duration) -> (Vec<u8>, Duration) {
    let t = Instant::now();
    c.set_read_timeout(Some(budget)).unwrap();
    let mut got = Vec::new();
    let mut buf = [0u8; 512];
    loop {
        match c.read(&mut buf) {
            Ok(0) => break,
            Ok(n) => got.extend_from_slice(&buf[..n]),
            // A reset counts as closed.
            Err(e) if e.kind() == std::io::ErrorKind::ConnectionReset => break,
            Err(e) => panic!("the server still held the connection after {:?}: {e}", t.elapsed()),
        }
    }
    (got, t.elapsed())
}

#[test]
fn slow_and_silent_clients_are_cut_off() {
    let d = small_site("slow");
    let s = Server::start(&d).unwrap();
    let limit = Limits::default().header_read_timeout;
    let margin = Duration::from_secs(3);

    // Connects and sends nothing.
    let silent = TcpStream::connect(s.addr()).unwrap();
    // Sends half a head and stops.
    let mut half = TcpStream::connect(s.addr()).unwrap();
    half.write_all(b"GET / HTTP/1.1\r\nHost: x\r\n").unwrap();
    // Trickles a byte every 300 ms, forever.
    let mut trickle = TcpStream::connect(s.addr()).unwrap();
    let addr = s.addr();
    let trickler = std::thread::spawn(move || {
        let t = Instant::now();
        for b in b"GET / HTTP/1.1\r\nX-Slow: ".iter().chain(std::iter::repeat(&b'z')) {
            if trickle.write_all(&[*b]).is_err() {
                return t.elapsed();
            }
            std::thread::sleep(Duration::from_millis(300));
            if t.elapsed() > limit + margin * 2 {
                panic!("the server still read from a trickling client after {:?}", t.elapsed());
            }
        }
        unreachable!()
    });
    let kept_alive = {
        // A served request on a kept-alive connection, then silence.
        let mut c = TcpStream::connect(addr).unwrap();
        c.write_all(b"GET /style.css HTTP/1.1\r\nHost: x\r\n\r\n").unwrap();
        c
    };

    let handles: Vec<_> = [silent, half, kept_alive]
        .into_iter()
        .map(|c| std::thread::spawn(move || until_closed(c, limit + margin)))
        .collect();
    for (i, h) in handles.into_iter().enumerate() {
        let (got, after) = h.join().unwrap();
        assert!(after >= limit - Duration::from_millis(500), "client {i} closed early, after {after:?}");
        assert!(after <= limit + margin, "client {i} held for {after:?}");
        if i == 2 {
            // The kept-alive one got its answer first.
            let r = parse(&got).expect("a response before the close");
            assert_eq!(r.status(), 200);
        }
    }
    let trickled = trickler.join().unwrap();
    assert!(trickled <= limit + margin * 2, "trickling client held for {trickled:?}");
    // And the server still serves.
    assert_eq!(serve_http::get(s.addr(), "/", &[]).status(), 200);
    std::fs::remove_dir_all(&d).unwrap();
}

#[test]
fn hundreds_of_idle_connections_do_not_block_a_fresh_request() {
    const IDLE: usize = 300;
    assert!(IDLE < Limits::default().max_connections);
    let d = small_site("idle");
    let s = Server::start(&d).unwrap();
    let mut idle = Vec::with_capacity(IDLE);
    for i in 0..IDLE {
        let mut c = TcpStream::connect(s.addr()).unwrap_or_else(|e| panic!("idle connection {i}: {e}"));
        // Half of them start a request head and never finish it.
        if i % 2 == 1 {
            c.write_all(b"GET / HTTP/1.1\r\n").unwrap();
        }
        idle.push(c);
    }
    std::thread::sleep(Duration::from_millis(200));
    let t = Instant::now();
    let r = serve_http::get(s.addr(), "/m_bg.wasm", &[]);
    let took = t.elapsed();
    assert_eq!(r.status(), 200);
    println!("fresh request behind {IDLE} idle connections answered in {took:?}");
    assert!(took < Duration::from_secs(2), "took {took:?}");
    drop(idle);
    std::fs::remove_dir_all(&d).unwrap();
}

#[test]
fn a_client_that_stops_reading_is_cut_off() {
    let d = small_site("stall");
    // Far more than the socket buffers on both ends hold, so the server's writes block.
    let size = 64 << 20;
    std::fs::write(d.join("big.bin"), vec![0x5au8; size]).unwrap();
    let stall = Duration::from_secs(2);
    // One connection at a time: the stalled one must give its place up.
    let limits = Limits { write_stall_timeout: stall, max_connections: 1, ..Limits::default() };
    let s = Server::start_with(&d, std::net::TcpListener::bind(("127.0.0.1", 0)).unwrap(), limits).unwrap();

    let mut stuck = TcpStream::connect(s.addr()).unwrap();
    stuck.write_all(b"GET /big.bin HTTP/1.1\r\nHost: x\r\n\r\n").unwrap();
    // Never read; meanwhile a second client waits for the only place.
    let t = Instant::now();
    let r = serve_http::get(s.addr(), "/", &[]);
    let waited = t.elapsed();
    assert_eq!(r.status(), 200);
    assert!(waited >= stall - Duration::from_millis(500), "answered after {waited:?}: was the big one sent?");
    assert!(waited < stall + Duration::from_secs(5), "answered after {waited:?}");
    // The stalled client, reading at last, finds its response cut short.
    let (got, _) = until_closed(stuck, Duration::from_secs(10));
    assert!(got.len() < size, "{} bytes of {size}", got.len());
    std::fs::remove_dir_all(&d).unwrap();
}
