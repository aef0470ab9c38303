//! The build id: a 64-bit FNV-1a hash of the built files, written into the service worker's cache
//! name so that every new build replaces the offline copy.

const OFFSET: u64 = 0xcbf2_9ce4_8422_2325;
const PRIME: u64 = 0x0000_0100_0000_01b3;

/// An incremental 64-bit FNV-1a hasher.
#[derive(Debug, Clone, Copy)]
pub struct Fnv1a(u64);

impl Default for Fnv1a {
    fn default() -> Self {
        Fnv1a(OFFSET)
    }
}

impl Fnv1a {
    pub fn new() -> Self {
        Self::default()
    }

    pub fn update(&mut self, bytes: &[u8]) {
        for &b in bytes {
            self.0 ^= u64::from(b);
            self.0 = self.0.wrapping_mul(PRIME);
        }
    }

    pub fn finish(&self) -> u64 {
        self.0
    }

    /// The hash as 16 lower-case hex digits.
    pub fn hex(&self) -> String {
        format!("{:016x}", self.0)
    }
}

/// The hash of one byte string.
pub fn fnv1a64(bytes: &[u8]) -> u64 {
    let mut h = Fnv1a::new();
    h.update(bytes);
    h.finish()
}

/// The build id of a set of named files: each name and its length are hashed before its bytes, so
/// moving bytes from one file to another changes the id. The caller gives the files in a stable
/// order.
pub fn build_id<'a>(files: impl IntoIterator<Item = (&'a str, &'a [u8])>) -> String {
    let mut h = Fnv1a::new();
    for (name, bytes) in files {
        h.update(name.as_bytes());
        h.update(&[0]);
        h.update(&(bytes.len() as u64).to_le_bytes());
        h.update(bytes);
    }
    h.hex()
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn published_fnv1a_64_vectors() {
        assert_eq!(fnv1a64(b""), 0xcbf2_9ce4_8422_2325);
        assert_eq!(fnv1a64(b"a"), 0xaf63_dc4c_8601_ec8c);
        assert_eq!(fnv1a64(b"foobar"), 0x8594_4171_f739_67e8);
    }

    #[test]
    fn incremental_equals_one_shot() {
        let mut h = Fnv1a::new();
        h.update(b"foo");
        h.update(b"bar");
        assert_eq!(h.finish(), fnv1a64(b"foobar"));
        assert_eq!(h.hex(), "85944171f73967e8");
    }

    #[test]
    fn build_id_tracks_names_and_boundaries() {
        let a = build_id([("x.js", &b"ab"[..]), ("y.wasm", &b"c"[..])]);
        let b = build_id([("x.js", &b"a"[..]), ("y.wasm", &b"bc"[..])]);
        let c = build_id([("z.js", &b"ab"[..]), ("y.wasm", &b"c"[..])]);
        let again = build_id([("x.js", &b"ab"[..]), ("y.wasm", &b"c"[..])]);
        assert_eq!(a, again);
        assert_ne!(a, b);
        assert_ne!(a, c);
        assert_eq!(a.len(), 16);
        assert!(a.chars().all(|ch| ch.is_ascii_hexdigit()));
    }
}
