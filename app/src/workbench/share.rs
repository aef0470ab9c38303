//! Sharing a plan: a link that carries the scenario in its fragment (`#plan=<version>.<payload>`,
//! never sent to a server), the plan as text to copy, and a plain-text summary for a message.
//!
//! The payload is the scenario's JSON, deflated in a zlib stream (RFC 1950/1951, `miniz_oxide`:
//! its Adler-32 check catches a link changed in copying) and written in base64url without
//! padding (RFC 4648 §5), so it survives messaging apps and the address bar.
//! A link is read like any pasted plan (`records::read_scenario`), after its length, version,
//! alphabet and inflated size are checked.

use crate::records;
use crate::state::MAX_PASTE_BYTES;
use crate::units;
use stillroom_core::Scenario;
use stillroom_core::crops::CROPS;

/// The version of the link's payload (its first part, before the dot).
pub const LINK_VERSION: u32 = 1;
/// The longest link the page makes or reads, in characters. Messaging apps and address bars
/// keep links of this length whole; a plan is usually well under a fifth of it.
pub const MAX_LINK_CHARS: usize = 8_000;
/// What starts the fragment of a share link.
pub const LINK_MARK: &str = "#plan=";
/// How hard deflate works: the level with the shortest links (the plan is small, so time is
/// no concern).
const DEFLATE_LEVEL: u8 = 10;

const ALPHABET: &[u8; 64] = b"ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789-_";

/// Bytes as base64url without padding (RFC 4648 §5).
pub fn base64url(bytes: &[u8]) -> String {
    let mut out = String::with_capacity(bytes.len().div_ceil(3) * 4);
    for chunk in bytes.chunks(3) {
        let b = [chunk[0], *chunk.get(1).unwrap_or(&0), *chunk.get(2).unwrap_or(&0)];
        let n = (u32::from(b[0]) << 16) | (u32::from(b[1]) << 8) | u32::from(b[2]);
        for i in 0..=chunk.len() {
            out.push(ALPHABET[((n >> (18 - 6 * i)) & 63) as usize] as char);
        }
    }
    out
}

/// Reads base64url without padding; `None` for any other character or an impossible length.
pub fn from_base64url(text: &str) -> Option<Vec<u8>> {
    let digits: Vec<u8> = text
        .bytes()
        .map(|c| ALPHABET.iter().position(|a| *a == c).map(|p| p as u8))
        .collect::<Option<_>>()?;
    if digits.len() % 4 == 1 {
        return None;
    }
    let mut out = Vec::with_capacity(digits.len() * 3 / 4);
    for chunk in digits.chunks(4) {
        let n = chunk.iter().enumerate().fold(0u32, |n, (i, d)| n | (u32::from(*d) << (18 - 6 * i)));
        for i in 0..chunk.len() - 1 {
            out.push((n >> (16 - 8 * i)) as u8);
        }
    }
    Some(out)
}

/// The fragment of a share link for `scenario` (`#plan=1.…`), or why none can be made.
pub fn link_fragment(scenario: &Scenario) -> Result<String, String> {
    let json =
        serde_json::to_string(scenario).map_err(|e| format!("The plan could not be written ({e})."))?;
    let packed = miniz_oxide::deflate::compress_to_vec_zlib(json.as_bytes(), DEFLATE_LEVEL);
    Ok(format!("{LINK_MARK}{LINK_VERSION}.{}", base64url(&packed)))
}

/// A whole share link: `base` (the page's address without its fragment) and the fragment,
/// refused when longer than [`MAX_LINK_CHARS`].
pub fn make_link(base: &str, scenario: &Scenario) -> Result<String, String> {
    let link = format!("{base}{}", link_fragment(scenario)?);
    let n = link.chars().count();
    if n > MAX_LINK_CHARS {
        return Err(format!(
            "This plan makes a link of {n} characters, longer than the {MAX_LINK_CHARS} a link may have here. Share the plan as text or as a file instead."
        ));
    }
    Ok(link)
}

/// Reads a share link (the whole address or its fragment) back into a scenario; the message
/// says what is wrong with it.
pub fn read_link(link: &str) -> Result<Scenario, String> {
    let link = link.trim();
    let n = link.chars().count();
    if n > MAX_LINK_CHARS {
        return Err(format!(
            "This link is {n} characters long; the page reads links of up to {MAX_LINK_CHARS}. Ask for the plan as text or as a file instead."
        ));
    }
    let bad =
        "This is not a whole Stillroom plan link: it may have been cut short or changed when it was copied.";
    let at = link.find(LINK_MARK).ok_or("This is not a Stillroom plan link (it has no “#plan=”).")?;
    let rest = &link[at + LINK_MARK.len()..];
    let (version, payload) = rest.split_once('.').ok_or(bad)?;
    match version.parse::<u32>() {
        Ok(LINK_VERSION) => {}
        Ok(v) if v > LINK_VERSION => {
            return Err(format!(
                "This link was made by a newer version of the page (link version {v}; this page reads version {LINK_VERSION}). Reload the page to update it, then open the link again."
            ));
        }
        _ => return Err(bad.to_string()),
    }
    let packed = from_base64url(payload).ok_or(bad)?;
    let json =
        miniz_oxide::inflate::decompress_to_vec_zlib_with_limit(&packed, MAX_PASTE_BYTES).map_err(|_| bad)?;
    let text = String::from_utf8(json).map_err(|_| bad)?;
    records::read_scenario(&text).map_err(|e| format!("The link holds a plan the page cannot read: {e}."))
}

/// The crop's name, or "no crop preset".
pub fn crop_name(scenario: &Scenario) -> String {
    scenario
        .charge
        .crop
        .as_deref()
        .and_then(|id| CROPS.iter().find(|c| c.id == id))
        .map(|c| c.name.to_string())
        .unwrap_or_else(|| "no crop preset".to_string())
}

/// The plan's main results as plain text for a message, in the units in force (call inside
/// `units::with_system`). `None` when the scenario has no plan (a field is out of range).
pub fn summary(scenario: &Scenario) -> Option<String> {
    let p = stillroom_core::plan(scenario).ok()?;
    let range = |a: &stillroom_core::plan::Answer, f: fn(f64) -> String| {
        format!("likely {} to {}", f(a.low), f(a.high))
    };
    let oil = if p.yield_estimate.hydrosol_is_the_product {
        format!(
            "almost none separates ({} stays dissolved: the hydrosol is the product)",
            units::mass(p.yield_estimate.dissolved_in_hydrosol_kg)
        )
    } else {
        let o = &p.yield_estimate.oil_volume_m3;
        format!(
            "{} ({})",
            units::oil_volume(o.central),
            units::range(units::oil_volume(o.central), units::oil_volume(o.low), units::oil_volume(o.high))
        )
    };
    let lines = [
        format!("Distillation plan: {} of {}", units::mass(scenario.charge.plant_mass_kg), crop_name(scenario)),
        format!("Site: {} up, air at {}", units::altitude(scenario.site.altitude_m), units::kpa(p.site.pressure_pa)),
        format!("Steam needed: {} ({})", units::mass(p.ranges.steam_kg.central), range(&p.ranges.steam_kg, units::mass)),
        format!(
            "Water use: {} (boiler {} + cooling {})",
            units::volume(p.ranges.water_total_kg.central / 1000.0),
            units::volume(p.water_use.boiler_feed_kg / 1000.0),
            units::volume(p.water_use.cooling_water_kg / 1000.0)
        ),
        format!(
            "Water boils at {} ({} from sea level)",
            units::celsius(p.site.water_boiling_point_c),
            units::kelvin_shift(p.site.boiling_point_shift_k)
        ),
        format!("Separator: {}", units::volume(p.separator.volume_m3)),
        format!(
            "Run time: {} in all, {} of distilling after the first drop",
            units::duration(p.run.total_time_s),
            units::duration(p.run.time_after_first_drop_s)
        ),
        format!("Expected oil: {oil}"),
        "Worked out by Stillroom: estimates, not promises. Steam, pressure, fire and hot flammable oil can hurt: read the cautions with the plan and follow your local codes.".to_string(),
    ];
    Some(lines.join("\n"))
}

#[cfg(test)]
mod tests {
    use super::*;
    use wasm_bindgen_test::wasm_bindgen_test;

    #[wasm_bindgen_test]
    fn base64url_matches_the_rfc_4648_test_vectors() {
        // RFC 4648 §10 ("f", "fo", ... "foobar"), without padding as §3.2 allows.
        for (plain, coded) in [
            ("", ""),
            ("f", "Zg"),
            ("fo", "Zm8"),
            ("foo", "Zm9v"),
            ("foob", "Zm9vYg"),
            ("fooba", "Zm9vYmE"),
            ("foobar", "Zm9vYmFy"),
        ] {
            assert_eq!(base64url(plain.as_bytes()), coded);
            assert_eq!(from_base64url(coded).unwrap(), plain.as_bytes());
        }
        // §5: 0xfb 0xff is "+/8" in base64, "-_8" in base64url.
        assert_eq!(base64url(&[0xfb, 0xff]), "-_8");
        assert!(from_base64url("+/8").is_none());
        assert!(from_base64url("Zm9vY").is_none(), "a length of 4n+1 cannot be");
    }

    #[wasm_bindgen_test]
    fn a_link_brings_back_the_same_scenario() {
        let mut s = Scenario::default();
        s.charge.plant_mass_kg = 23.456789;
        s.site.altitude_m = 1234.5;
        let link = make_link("https://example.invalid/", &s).unwrap();
        assert!(link.starts_with("https://example.invalid/#plan=1."), "{link}");
        assert_eq!(read_link(&link).unwrap(), s);
        // The fragment alone reads too (what the address bar hands over).
        let fragment = link_fragment(&s).unwrap();
        assert_eq!(read_link(&fragment).unwrap(), s);
        // Shorter than the JSON it carries.
        assert!(fragment.len() < serde_json::to_string(&s).unwrap().len(), "{}", fragment.len());
    }

    #[wasm_bindgen_test]
    fn corrupt_cut_short_foreign_future_or_long_links_are_refused_with_a_message() {
        let fragment = link_fragment(&Scenario::default()).unwrap();
        let cut = &fragment[..fragment.len() - 5];
        let mut flipped = fragment.clone().into_bytes();
        let mid = flipped.len() / 2;
        flipped[mid] = if flipped[mid] == b'A' { b'B' } else { b'A' };
        let flipped = String::from_utf8(flipped).unwrap();
        let long = format!("#plan=1.{}", "A".repeat(MAX_LINK_CHARS));
        let future = fragment.replacen("#plan=1.", "#plan=2.", 1);
        let not_json =
            format!("#plan=1.{}", base64url(&miniz_oxide::deflate::compress_to_vec_zlib(b"{nope", 6)));
        let unknown = format!(
            "#plan=1.{}",
            base64url(&miniz_oxide::deflate::compress_to_vec_zlib(br#"{"charge":{"mass":3}}"#, 6))
        );
        for (link, words) in [
            (cut, "cut short"),
            (flipped.as_str(), "cut short"),
            ("#plan=1.!!!", "cut short"),
            ("#plan=x.AAAA", "cut short"),
            ("#plan=1", "cut short"),
            ("https://example.invalid/", "no “#plan=”"),
            (long.as_str(), "characters long"),
            (future.as_str(), "newer version"),
            (not_json.as_str(), "cannot read"),
            (unknown.as_str(), "charge.mass"),
        ] {
            let e = read_link(link).unwrap_err();
            assert!(e.contains(words), "{link}: {e}");
        }
        // A changed character is caught (zlib's Adler-32, or the stream itself).
        assert!(read_link(&flipped).is_err(), "{flipped}");
    }

    #[wasm_bindgen_test]
    fn a_link_over_the_limit_is_not_made() {
        let e = make_link(&"x".repeat(MAX_LINK_CHARS), &Scenario::default()).unwrap_err();
        assert!(e.contains("longer than"), "{e}");
    }
}
