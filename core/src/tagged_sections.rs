//! How the scenario's two tagged sections are read: the oil's composition and an own compound's
//! vapour-pressure law, each a JSON object whose `kind` says which fields it holds.
//!
//! serde's derive reads an internally tagged enum by first buffering the whole object in its own
//! content tree and then reading the variant from that: a second reader of every field type,
//! compiled into each page module (about 20 kB of wasm), and faults without a place in the text.
//! Here the object is read once, field by field. Texts whose `kind` comes first (as every text
//! the page writes) are accepted, refused and worded exactly as serde's derive does
//! (`core/tests/tagged_sections_reference.rs` holds the two side by side); a fault inside a
//! field is now placed at that field. Where `kind` comes after a field that the kind turns out
//! not to have, that field is read for its type before it is refused.

use crate::scenario::{
    CustomVapourPressure, LogBase, OilComposition, OilPart, PressureUnit, TemperatureUnit,
};
use serde::Deserialize;
use serde::de::{DeserializeSeed, Deserializer, Error, IgnoredAny, MapAccess, Visitor};
use std::fmt;

/// Which keys a section takes at this point of the text.
#[derive(Clone, Copy)]
enum Takes {
    /// The kind is not read yet: any field of any kind.
    AnyField,
    /// The kind is read and has these fields.
    Fields(&'static [&'static str]),
    /// The kind is read and has no fields: the others pass unread, as with serde's derive.
    Nothing,
}

/// A key of a section, read as serde's derive reads a field name, so that a key the section
/// does not take is refused where it stands: its index in `all` (`kind` first), or `None` for a
/// key to pass over.
struct Key {
    all: &'static [&'static str],
    takes: Takes,
}

impl<'de> DeserializeSeed<'de> for Key {
    type Value = Option<usize>;

    fn deserialize<D: Deserializer<'de>>(self, d: D) -> Result<Option<usize>, D::Error> {
        d.deserialize_identifier(self)
    }
}

impl<'de> Visitor<'de> for Key {
    type Value = Option<usize>;

    fn expecting(&self, f: &mut fmt::Formatter) -> fmt::Result {
        f.write_str("field identifier")
    }

    fn visit_str<E: Error>(self, v: &str) -> Result<Option<usize>, E> {
        let at = self.all.iter().position(|n| *n == v);
        match self.takes {
            _ if v == "kind" => Ok(at),
            Takes::Nothing => Ok(None),
            Takes::Fields(allowed) if allowed.contains(&v) => Ok(at),
            Takes::Fields(allowed) => Err(E::unknown_field(v, allowed)),
            Takes::AnyField => at.map(Some).ok_or_else(|| E::unknown_field(v, self.all)),
        }
    }
}

/// A section's `kind`, read as serde's derive reads a variant's name: its index in `names`.
struct KindOf(&'static [&'static str]);

impl<'de> DeserializeSeed<'de> for KindOf {
    type Value = usize;

    fn deserialize<D: Deserializer<'de>>(self, d: D) -> Result<usize, D::Error> {
        d.deserialize_identifier(self)
    }
}

impl<'de> Visitor<'de> for KindOf {
    type Value = usize;

    fn expecting(&self, f: &mut fmt::Formatter) -> fmt::Result {
        f.write_str("variant identifier")
    }

    fn visit_str<E: Error>(self, v: &str) -> Result<usize, E> {
        self.0.iter().position(|n| *n == v).ok_or_else(|| E::unknown_variant(v, self.0))
    }
}

/// One pass over a section's keys: `kind` read into its index among `kinds`, each other field
/// handed to `field` (its index in `all`, `kind` first) in the text's order.
fn read_section<'de, A: MapAccess<'de>>(
    map: &mut A,
    all: &'static [&'static str],
    kinds: &'static [&'static str],
    fields_of: fn(usize) -> Option<&'static [&'static str]>,
    mut field: impl FnMut(usize, &mut A) -> Result<(), A::Error>,
) -> Result<usize, A::Error> {
    let mut kind = None;
    let mut given: Vec<&'static str> = Vec::new();
    loop {
        let takes = match kind.map(fields_of) {
            None => Takes::AnyField,
            Some(Some(fields)) => Takes::Fields(fields),
            Some(None) => Takes::Nothing,
        };
        match map.next_key_seed(Key { all, takes })? {
            None => break,
            Some(None) => {
                map.next_value::<IgnoredAny>()?;
            }
            Some(Some(0)) if kind.is_some() => return Err(A::Error::duplicate_field("kind")),
            Some(Some(0)) => kind = Some(map.next_value_seed(KindOf(kinds))?),
            Some(Some(i)) => {
                if given.contains(&all[i]) {
                    return Err(A::Error::duplicate_field(all[i]));
                }
                field(i, map)?;
                given.push(all[i]);
            }
        }
    }
    let kind = kind.ok_or_else(|| A::Error::missing_field("kind"))?;
    // A field read before the kind, that the kind turns out not to have.
    if let Some(fields) = fields_of(kind)
        && let Some(other) = given.iter().find(|g| !fields.contains(g))
    {
        return Err(A::Error::unknown_field(other, fields));
    }
    Ok(kind)
}

/// A field the kind needs.
fn need<T, E: Error>(value: Option<T>, name: &'static str) -> Result<T, E> {
    value.ok_or_else(|| E::missing_field(name))
}

const COMPOSITION_FIELDS: &[&str] = &["kind", "id", "parts"];
const COMPOSITION_KINDS: &[&str] = &["crop_typical", "compound", "mixture"];

fn composition_fields(kind: usize) -> Option<&'static [&'static str]> {
    [None, Some(&["id"][..]), Some(&["parts"][..])][kind.min(2)]
}

struct CompositionVisitor;

impl<'de> Visitor<'de> for CompositionVisitor {
    type Value = OilComposition;

    fn expecting(&self, f: &mut fmt::Formatter) -> fmt::Result {
        f.write_str("an oil composition with its kind")
    }

    fn visit_map<A: MapAccess<'de>>(self, mut map: A) -> Result<OilComposition, A::Error> {
        let (mut id, mut parts) = (None::<String>, None::<Vec<OilPart>>);
        let kind =
            read_section(&mut map, COMPOSITION_FIELDS, COMPOSITION_KINDS, composition_fields, |i, m| {
                match i {
                    1 => id = Some(m.next_value()?),
                    _ => parts = Some(m.next_value()?),
                }
                Ok(())
            })?;
        match kind {
            0 => Ok(OilComposition::CropTypical),
            1 => Ok(OilComposition::Compound { id: need(id, "id")? }),
            _ => Ok(OilComposition::Mixture { parts: need(parts, "parts")? }),
        }
    }
}

impl<'de> Deserialize<'de> for OilComposition {
    fn deserialize<D: Deserializer<'de>>(d: D) -> Result<Self, D::Error> {
        d.deserialize_map(CompositionVisitor)
    }
}

/// Every field a law may hold, `kind` first, then the Antoine law's, then the two points'.
const LAW_FIELDS: &[&str] = &[
    "kind",
    "a",
    "b",
    "c",
    "log",
    "pressure_unit",
    "temperature_unit",
    "t_min_c",
    "t_max_c",
    "t1_c",
    "p1_pa",
    "t2_c",
    "p2_pa",
];
const LAW_KINDS: &[&str] = &["antoine", "two_points"];

fn law_fields(kind: usize) -> Option<&'static [&'static str]> {
    Some(if kind == 0 { &LAW_FIELDS[1..9] } else { &LAW_FIELDS[9..] })
}

struct LawVisitor;

impl<'de> Visitor<'de> for LawVisitor {
    type Value = CustomVapourPressure;

    fn expecting(&self, f: &mut fmt::Formatter) -> fmt::Result {
        f.write_str("a vapour-pressure law with its kind")
    }

    fn visit_map<A: MapAccess<'de>>(self, mut map: A) -> Result<CustomVapourPressure, A::Error> {
        // The numbers by their index in LAW_FIELDS; the three named choices apart.
        let mut numbers = [None::<f64>; 13];
        let (mut log, mut pressure_unit, mut temperature_unit) =
            (None::<LogBase>, None::<PressureUnit>, None::<TemperatureUnit>);
        let kind = read_section(&mut map, LAW_FIELDS, LAW_KINDS, law_fields, |i, m| {
            match i {
                4 => log = Some(m.next_value()?),
                5 => pressure_unit = Some(m.next_value()?),
                6 => temperature_unit = Some(m.next_value()?),
                _ => numbers[i] = Some(m.next_value()?),
            }
            Ok(())
        })?;
        let n = |i: usize| need(numbers[i], LAW_FIELDS[i]);
        match kind {
            0 => Ok(CustomVapourPressure::Antoine {
                a: n(1)?,
                b: n(2)?,
                c: n(3)?,
                log: need(log, "log")?,
                pressure_unit: need(pressure_unit, "pressure_unit")?,
                temperature_unit: need(temperature_unit, "temperature_unit")?,
                t_min_c: n(7)?,
                t_max_c: n(8)?,
            }),
            _ => Ok(CustomVapourPressure::TwoPoints {
                t1_c: n(9)?,
                p1_pa: n(10)?,
                t2_c: n(11)?,
                p2_pa: n(12)?,
            }),
        }
    }
}

impl<'de> Deserialize<'de> for CustomVapourPressure {
    fn deserialize<D: Deserializer<'de>>(d: D) -> Result<Self, D::Error> {
        d.deserialize_map(LawVisitor)
    }
}
