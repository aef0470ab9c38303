//! Where in a JSON text serde_json stopped, as the path of keys and list indices open there, so
//! a field error can name its field (`charge.plant_mass_kg`, `runs[0].oil_volume_m3`).
//!
//! serde_json reports the line and column where it found a fault; this walks the text up to that
//! place. It replaces a path-tracking wrapper around the deserializer, which compiled a second
//! copy of every `Deserialize` impl into the page's wasm (about 17 kB gzip of its first module).
//! Where serde_json stops (a value's fault after the value, a key's after the key, a missing
//! field after its object's closing brace) and a member counted once its key is read give the
//! same paths as that wrapper: the
//! test `core/tests/json_path_oracle.rs` holds the two equal over every field of a scenario.

/// One step of a path into a JSON document.
#[derive(Debug, Clone, PartialEq, Eq)]
pub enum Step {
    /// A member of an object, by its key.
    Key(String),
    /// An item of a list, from 0.
    Index(usize),
}

/// One open container while walking the text.
struct Frame {
    /// A list (`[`) rather than an object.
    list: bool,
    /// The object's key last read, or the list's item index.
    key: Option<String>,
    index: usize,
    /// Past the `:` of the current member, so a string is its value, not a key (an object);
    /// the current item has begun (a list).
    in_value: bool,
}

/// The byte offset of serde_json's (line, column): line from 1, column the bytes into that
/// line. Line 0 means the error carries no place; the offset is then 0.
///
/// ```
/// use stillroom_core::json_path::offset_of;
/// assert_eq!(offset_of("{\n  \"a\": x", 2, 8), 10);
/// assert_eq!(offset_of("{}", 0, 0), 0);
/// ```
pub fn offset_of(text: &str, line: usize, column: usize) -> usize {
    if line == 0 {
        return 0;
    }
    let start: usize = text.split_inclusive('\n').take(line - 1).map(str::len).sum();
    (start + column).min(text.len())
}

/// The path of the members and items open at byte `offset` of a JSON `text`: a member counts
/// once its key is read, an item once its first character is. Text that is not JSON gives the path as
/// far as it could be read.
///
/// ```
/// use stillroom_core::json_path::{path_at, Step};
/// let t = r#"{"runs": [{"a": 1}, {"b": "x"}]}"#;
/// let at = t.find("\"x\"").unwrap() + 3;
/// assert_eq!(path_at(t, at), vec![Step::Key("runs".into()), Step::Index(1), Step::Key("b".into())]);
/// ```
pub fn path_at(text: &str, offset: usize) -> Vec<Step> {
    let bytes = text.as_bytes();
    let end = offset.min(bytes.len());
    let mut frames: Vec<Frame> = Vec::new();
    let mut i = 0;
    while i < end {
        match bytes[i] {
            b'{' | b'[' => {
                started(&mut frames);
                frames.push(Frame { list: bytes[i] == b'[', key: None, index: 0, in_value: false });
                i += 1;
            }
            b'}' | b']' => {
                frames.pop();
                i += 1;
            }
            b':' => {
                if let Some(f) = frames.last_mut() {
                    f.in_value = true;
                }
                i += 1;
            }
            b',' => {
                if let Some(f) = frames.last_mut() {
                    f.in_value = false;
                    if f.list {
                        f.index += 1;
                    } else {
                        f.key = None;
                    }
                }
                i += 1;
            }
            b'"' => {
                let close = string_end(bytes, i);
                if close >= end {
                    break;
                }
                match frames.last_mut() {
                    Some(f) if !f.list && !f.in_value => {
                        f.key = serde_json::from_str::<String>(&text[i..=close]).ok();
                    }
                    _ => started(&mut frames),
                }
                i = close + 1;
            }
            b' ' | b'\t' | b'\n' | b'\r' => i += 1,
            _ => {
                started(&mut frames);
                i += 1;
            }
        }
    }
    frames
        .into_iter()
        .filter_map(|f| match f.list {
            true => f.in_value.then_some(Step::Index(f.index)),
            false => f.key.map(Step::Key),
        })
        .collect()
}

/// A value begins: inside a list, its item has started.
fn started(frames: &mut [Frame]) {
    if let Some(f) = frames.last_mut().filter(|f| f.list) {
        f.in_value = true;
    }
}

/// The index of the quote closing the string that opens at `open` (or the text's length).
fn string_end(bytes: &[u8], open: usize) -> usize {
    let mut i = open + 1;
    while i < bytes.len() {
        match bytes[i] {
            b'\\' => i += 2,
            b'"' => return i,
            _ => i += 1,
        }
    }
    bytes.len()
}

/// The path at which serde_json, reading `text`, raised `error`.
///
/// ```
/// use stillroom_core::json_path::{error_path, dotted};
/// let t = r#"{"charge": {"plant_mass_kg": "forty"}}"#;
/// let e = serde_json::from_str::<std::collections::BTreeMap<String, std::collections::BTreeMap<String, f64>>>(t).unwrap_err();
/// assert_eq!(dotted(&error_path(t, &e)), "charge.plant_mass_kg");
/// ```
pub fn error_path(text: &str, error: &serde_json::Error) -> Vec<Step> {
    path_at(text, offset_of(text, error.line(), error.column()))
}

/// A path as dotted names, list items by index (`custom_compounds.1.id`); empty for the top.
pub fn dotted(path: &[Step]) -> String {
    let parts: Vec<String> = path
        .iter()
        .map(|s| match s {
            Step::Key(k) => k.clone(),
            Step::Index(i) => i.to_string(),
        })
        .collect();
    parts.join(".")
}

/// A path with list items in brackets (`runs[0].oil_volume_m3`); `.` for the top.
///
/// ```
/// use stillroom_core::json_path::{bracketed, Step};
/// assert_eq!(bracketed(&[Step::Key("runs".into()), Step::Index(0), Step::Key("x".into())]), "runs[0].x");
/// assert_eq!(bracketed(&[]), ".");
/// ```
pub fn bracketed(path: &[Step]) -> String {
    if path.is_empty() {
        return ".".into();
    }
    let mut out = String::new();
    for s in path {
        match s {
            Step::Key(k) => {
                if !out.is_empty() {
                    out.push('.');
                }
                out.push_str(k);
            }
            Step::Index(i) => out.push_str(&format!("[{i}]")),
        }
    }
    out
}

/// serde_json's message without the " at line L column C" it appends (the path says where).
pub fn message_of(error: &serde_json::Error) -> String {
    let text = error.to_string();
    let place = format!(" at line {} column {}", error.line(), error.column());
    text.strip_suffix(&place).map(str::to_string).unwrap_or(text)
}
