//! The scenario's tagged sections (the oil's composition, an own compound's vapour-pressure law)
//! are read by hand (`tagged_sections.rs`) to keep serde's buffering reader out of the page's
//! modules. The reference here is serde's own derive for the same shapes (serde 1, from
//! crates.io): every text below must be accepted or refused alike, read to the same value, and
//! refused in the same words (the position, which now names the faulty field, left aside).

use serde::Deserialize;
use stillroom_core::scenario::{
    CustomVapourPressure, LogBase, OilComposition, OilPart, PressureUnit, TemperatureUnit,
};

#[derive(Debug, Deserialize)]
#[serde(deny_unknown_fields, tag = "kind", rename_all = "snake_case")]
enum ReferenceComposition {
    CropTypical,
    Compound { id: String },
    Mixture { parts: Vec<OilPart> },
}

impl From<ReferenceComposition> for OilComposition {
    fn from(r: ReferenceComposition) -> Self {
        match r {
            ReferenceComposition::CropTypical => OilComposition::CropTypical,
            ReferenceComposition::Compound { id } => OilComposition::Compound { id },
            ReferenceComposition::Mixture { parts } => OilComposition::Mixture { parts },
        }
    }
}

#[derive(Debug, Deserialize)]
#[serde(deny_unknown_fields, tag = "kind", rename_all = "snake_case")]
enum ReferenceLaw {
    Antoine {
        a: f64,
        b: f64,
        c: f64,
        log: LogBase,
        pressure_unit: PressureUnit,
        temperature_unit: TemperatureUnit,
        t_min_c: f64,
        t_max_c: f64,
    },
    TwoPoints {
        t1_c: f64,
        p1_pa: f64,
        t2_c: f64,
        p2_pa: f64,
    },
}

impl From<ReferenceLaw> for CustomVapourPressure {
    fn from(r: ReferenceLaw) -> Self {
        match r {
            ReferenceLaw::Antoine { a, b, c, log, pressure_unit, temperature_unit, t_min_c, t_max_c } => {
                CustomVapourPressure::Antoine {
                    a,
                    b,
                    c,
                    log,
                    pressure_unit,
                    temperature_unit,
                    t_min_c,
                    t_max_c,
                }
            }
            ReferenceLaw::TwoPoints { t1_c, p1_pa, t2_c, p2_pa } => {
                CustomVapourPressure::TwoPoints { t1_c, p1_pa, t2_c, p2_pa }
            }
        }
    }
}

/// serde_json's message without its "at line L column C".
fn words(e: &serde_json::Error) -> String {
    let text = e.to_string();
    text.split(" at line ").next().unwrap_or(&text).to_string()
}

fn agree<Ours, Reference>(text: &str) -> bool
where
    Ours: for<'de> Deserialize<'de> + PartialEq + std::fmt::Debug,
    Reference: for<'de> Deserialize<'de> + Into<Ours>,
{
    let ours = serde_json::from_str::<Ours>(text);
    let reference = serde_json::from_str::<Reference>(text).map(Into::into);
    // A section that is not an object at all is refused by both, each in its own words (serde's
    // names the Rust type, and reads a list as its fields in order, which no text here uses).
    let object = text.trim_start().starts_with('{');
    match (&ours, &reference) {
        (Ok(a), Ok(b)) => assert_eq!(a, b, "{text}"),
        (Err(a), Err(b)) if object => assert_eq!(words(a), words(b), "{text}"),
        (Err(_), Err(_)) => {}
        _ => panic!("the readers disagree on {text}: {ours:?} / {reference:?}"),
    }
    ours.is_ok()
}

#[test]
fn every_composition_text_is_read_as_serdes_derive_reads_it() {
    let texts = [
        r#"{"kind":"crop_typical"}"#,
        r#"{"kind":"compound","id":"linalool"}"#,
        r#"{"id":"linalool","kind":"compound"}"#,
        r#"{"kind":"mixture","parts":[{"compound":"linalool","mass_percent":40},{"compound":"camphor","mass_percent":60}]}"#,
        r#"{"kind":"mixture","parts":[]}"#,
        r#"{"kind":"crop_typical","id":"linalool"}"#,
        r#"{"kind":"compound","parts":[]}"#,
        r#"{"kind":"compound","id":"linalool","parts":[]}"#,
        r#"{"kind":"mixture","id":"x","parts":[]}"#,
        r#"{"kind":"compound"}"#,
        r#"{"kind":"mixture"}"#,
        r#"{"kind":"blend"}"#,
        r#"{"id":"linalool"}"#,
        r#"{}"#,
        r#"{"kind":"compound","id":5}"#,
        r#"{"kind":"mixture","parts":[{"compound":"linalool"}]}"#,
        r#"{"kind":"mixture","parts":{"compound":"linalool"}}"#,
        r#"{"kind":"compound","id":"a","zz":1}"#,
        r#"{"kind":"compound","id":"a","id":"b"}"#,
        r#"{"kind":7}"#,
        r#"[]"#,
        r#""compound""#,
    ];
    let read = texts.iter().filter(|t| agree::<OilComposition, ReferenceComposition>(t)).count();
    // The five well-formed texts, and the two "crop_typical" ones with a field left over: serde
    // lets a fieldless kind's other fields pass unread, and so does this reader.
    assert_eq!(read, 7);
    // The one difference: a field of the wrong type *before* a fieldless `kind` is read for its
    // type (serde's derive, having buffered the object, never looks at it).
    let late = r#"{"id":5,"kind":"crop_typical"}"#;
    assert!(serde_json::from_str::<ReferenceComposition>(late).is_ok());
    let ours = serde_json::from_str::<OilComposition>(late).unwrap_err().to_string();
    assert!(ours.starts_with("invalid type: integer `5`, expected a string"), "{ours}");
}

#[test]
fn every_vapour_pressure_law_text_is_read_as_serdes_derive_reads_it() {
    let antoine = r#""a":4.1,"b":1400.5,"c":-70.2,"log":"log10","pressure_unit":"bar","temperature_unit":"kelvin","t_min_c":40,"t_max_c":200"#;
    let two = r#""t1_c":80,"p1_pa":1500,"t2_c":120,"p2_pa":9000"#;
    let mut texts = vec![
        format!(r#"{{"kind":"antoine",{antoine}}}"#),
        format!(r#"{{{antoine},"kind":"antoine"}}"#),
        format!(r#"{{"kind":"two_points",{two}}}"#),
        format!(r#"{{"kind":"two_points",{two},"a":1}}"#),
        format!(r#"{{"kind":"antoine",{antoine},"t1_c":80}}"#),
        format!(r#"{{"kind":"antoine",{antoine},"log":"ln"}}"#),
        format!(r#"{{"kind":"two_points","t1_c":80}}"#),
        format!(r#"{{"kind":"two_points",{two},"zz":1}}"#),
        format!(r#"{{"kind":"antoine",{}}}"#, antoine.replace(r#""bar""#, r#""psi""#)),
        format!(r#"{{"kind":"two_points",{}}}"#, two.replace("1500", r#""1500""#)),
        format!(r#"{{"kind":"clapeyron",{two}}}"#),
        format!(r#"{{{two}}}"#),
    ];
    // Each field of each law taken away in turn.
    for (kind, fields) in [("antoine", antoine), ("two_points", two)] {
        let parts: Vec<&str> = fields.split(',').collect();
        for i in 0..parts.len() {
            let rest: Vec<&str> =
                parts.iter().enumerate().filter(|(j, _)| *j != i).map(|(_, p)| *p).collect();
            texts.push(format!(r#"{{"kind":"{kind}",{}}}"#, rest.join(",")));
        }
    }
    let read = texts.iter().filter(|t| agree::<CustomVapourPressure, ReferenceLaw>(t)).count();
    assert_eq!(read, 3, "the three well-formed texts read, the rest refused");
}
