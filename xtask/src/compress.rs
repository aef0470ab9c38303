//! The compressed copies a static host sends in place of a file: gzip (RFC 1952, deflate found
//! by Zopfli's exhaustive search) and Brotli (RFC 7932) at its highest quality, since they are
//! made once per build and fetched by every phone.

use std::path::Path;

/// Brotli's highest quality.
pub const BROTLI_QUALITY: i32 = 11;
/// Brotli's largest standard window (2^24 bytes, RFC 7932 §9.1), larger than any file we ship.
pub const BROTLI_WINDOW_LOG2: i32 = 24;

/// Extensions of files worth compressing: text, and wasm (which shrinks by half or more).
/// Images already compressed (png, woff2) are left alone.
pub const COMPRESSIBLE: [&str; 9] = ["html", "js", "mjs", "css", "wasm", "svg", "webmanifest", "json", "txt"];

/// Is `path` a file type the build writes compressed copies of?
pub fn is_compressible(path: &Path) -> bool {
    path.extension()
        .and_then(|e| e.to_str())
        .is_some_and(|e| COMPRESSIBLE.contains(&e.to_ascii_lowercase().as_str()))
}

/// `bytes` as a gzip stream, its deflate blocks found by Zopfli (15 iterations, its default):
/// slower to make than zlib's level 9 (seconds for the page's wasm), smaller to fetch, and
/// decoded by any gzip reader.
pub fn gzip(bytes: &[u8]) -> Vec<u8> {
    let mut out = Vec::new();
    zopfli::compress(zopfli::Options::default(), zopfli::Format::Gzip, bytes, &mut out)
        .expect("reading a slice into a Vec cannot fail");
    out
}

/// `bytes` as a Brotli stream at quality 11.
pub fn brotli(bytes: &[u8]) -> Vec<u8> {
    let params = brotli::enc::BrotliEncoderParams {
        quality: BROTLI_QUALITY,
        lgwin: BROTLI_WINDOW_LOG2,
        size_hint: bytes.len(),
        ..Default::default()
    };
    let mut out = Vec::new();
    brotli::BrotliCompress(&mut &bytes[..], &mut out, &params)
        .expect("reading a slice into a Vec cannot fail");
    out
}

#[cfg(test)]
mod tests {
    use super::*;
    use flate2::read::GzDecoder;
    use std::io::Read;

    /// Text that compresses, though not trivially.
    fn sample() -> Vec<u8> {
        (0..4000u32)
            .map(|i| format!("charge {} kg at {} m; ", i % 97, (i * 37) % 1500))
            .collect::<String>()
            .into_bytes()
    }

    #[test]
    fn gzip_round_trips_through_an_independent_decoder() {
        let text = sample();
        let gz = gzip(&text);
        assert!(gz.len() < text.len() / 3, "{} of {}", gz.len(), text.len());
        let mut back = Vec::new();
        GzDecoder::new(&gz[..]).read_to_end(&mut back).unwrap();
        assert_eq!(back, text);
    }

    #[test]
    fn brotli_round_trips_and_beats_gzip_on_text() {
        let text = sample();
        let br = brotli(&text);
        let mut back = Vec::new();
        brotli::Decompressor::new(&br[..], 4096).read_to_end(&mut back).unwrap();
        assert_eq!(back, text);
        assert!(br.len() < gzip(&text).len(), "brotli {} vs gzip {}", br.len(), gzip(&text).len());
    }

    #[test]
    fn compressible_types() {
        for f in ["index.html", "a.js", "s.CSS", "m_bg.wasm", "i.svg", "manifest.webmanifest"] {
            assert!(is_compressible(Path::new(f)), "{f}");
        }
        for f in ["p.png", "f.woff2", "a.wasm.br", "a.js.gz", "noext"] {
            assert!(!is_compressible(Path::new(f)), "{f}");
        }
    }
}
