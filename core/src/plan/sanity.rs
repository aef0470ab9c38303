//! The last check on a plan: every number in it finite and within sane bounds.
//!
//! A plan whose inputs passed validation can still, at an extreme corner of the valid ranges,
//! carry a number that overflowed or lost all meaning (an infinity, a NaN, 1e300 kg of steam).
//! Such a plan is not shown: it becomes an error that names the first bad number's place. The
//! walk is a [`serde::Serializer`] that looks at every number and builds nothing, so it sees
//! exactly what a reader of the serialized plan would see, at the cost of one pass.

use crate::scenario::{FieldError, ScenarioErrors, fmt_num};
use serde::Serialize;
use serde::ser::{self, Impossible};
use std::fmt;

/// Largest magnitude a plan number may have. The largest real quantities in a plan are a
/// season's heat in joules (a 5 MW boiler over a year of runs is about 1.6e14 J) and costs; a
/// number past 1e15 in any unit of the plan is an overflow, not a result.
pub const MAX_PLAN_MAGNITUDE: f64 = 1e15;

/// Where the first bad number sits, and what it was.
#[derive(Debug, Clone, PartialEq)]
pub struct BadNumber {
    /// Dotted path into the serialized value, list items by index: `run.recovery_curve.3.1`.
    pub path: String,
    pub value: f64,
}

impl fmt::Display for BadNumber {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        write!(f, "{} = {}", self.path, self.value)
    }
}

impl std::error::Error for BadNumber {}

impl ser::Error for BadNumber {
    fn custom<T: fmt::Display>(msg: T) -> Self {
        BadNumber { path: msg.to_string(), value: f64::NAN }
    }
}

/// Checks that every number in `value`, as serde serializes it, is finite and at most
/// [`MAX_PLAN_MAGNITUDE`] in magnitude; returns the first one that is not.
///
/// ```
/// use stillroom_core::plan::sanity::first_bad_number;
/// #[derive(serde::Serialize)]
/// struct Run { times_s: Vec<f64>, steam_kg: Option<f64> }
/// assert!(first_bad_number(&Run { times_s: vec![1.0, 2.0], steam_kg: None }).is_none());
/// let bad = first_bad_number(&Run { times_s: vec![1.0, f64::NAN], steam_kg: Some(3.0) }).unwrap();
/// assert_eq!(bad.path, "times_s.1");
/// assert_eq!(first_bad_number(&Run { times_s: vec![], steam_kg: Some(2e15) }).unwrap().path, "steam_kg");
/// ```
pub fn first_bad_number<T: Serialize + ?Sized>(value: &T) -> Option<BadNumber> {
    let mut walker = Walker { path: Vec::new() };
    value.serialize(&mut walker).err()
}

/// Passes a plan through, or turns it into an error on its first bad number.
pub(crate) fn checked<T: Serialize>(plan: T) -> Result<T, ScenarioErrors> {
    match first_bad_number(&plan) {
        None => Ok(plan),
        Some(bad) => Err(ScenarioErrors {
            errors: vec![FieldError {
                field: format!("plan.{}", bad.path),
                value: fmt_num(bad.value),
                valid: format!("a finite number within ±{}", fmt_num(MAX_PLAN_MAGNITUDE)),
                message: "these inputs, taken together, lead to a number the plan cannot trust; \
                          check the most extreme inputs"
                    .into(),
                min: None,
                max: None,
            }],
        }),
    }
}

/// One step of the path: a field name or a list index (strings only when there is a fault).
enum Step {
    Field(&'static str),
    Index(usize),
    Key(String),
}

struct Walker {
    path: Vec<Step>,
}

impl Walker {
    fn number(&self, v: f64) -> Result<(), BadNumber> {
        if v.is_finite() && v.abs() <= MAX_PLAN_MAGNITUDE {
            return Ok(());
        }
        let path: Vec<String> = self
            .path
            .iter()
            .map(|s| match s {
                Step::Field(f) => (*f).to_string(),
                Step::Index(i) => i.to_string(),
                Step::Key(k) => k.clone(),
            })
            .collect();
        Err(BadNumber { path: path.join("."), value: v })
    }

    fn nested<T: Serialize + ?Sized>(&mut self, step: Step, value: &T) -> Result<(), BadNumber> {
        self.path.push(step);
        let r = value.serialize(&mut *self);
        self.path.pop();
        r
    }
}

/// A list or a tuple: items by index.
struct Items<'a> {
    walker: &'a mut Walker,
    next: usize,
}

impl Items<'_> {
    fn item<T: Serialize + ?Sized>(&mut self, value: &T) -> Result<(), BadNumber> {
        let i = self.next;
        self.next += 1;
        self.walker.nested(Step::Index(i), value)
    }
}

/// A map: values under their key (the key is rendered only as a path step).
struct Entries<'a> {
    walker: &'a mut Walker,
    key: String,
}

macro_rules! fine {
    ($($name:ident: $ty:ty),*) => { $(fn $name(self, _v: $ty) -> Result<(), BadNumber> { Ok(()) })* };
}

impl<'a> ser::Serializer for &'a mut Walker {
    type Ok = ();
    type Error = BadNumber;
    type SerializeSeq = Items<'a>;
    type SerializeTuple = Items<'a>;
    type SerializeTupleStruct = Items<'a>;
    type SerializeTupleVariant = Items<'a>;
    type SerializeMap = Entries<'a>;
    type SerializeStruct = &'a mut Walker;
    type SerializeStructVariant = &'a mut Walker;

    fine!(serialize_bool: bool, serialize_i8: i8, serialize_i16: i16, serialize_i32: i32,
          serialize_u8: u8, serialize_u16: u16, serialize_u32: u32, serialize_char: char,
          serialize_str: &str, serialize_bytes: &[u8]);

    fn serialize_i64(self, v: i64) -> Result<(), BadNumber> {
        self.number(v as f64)
    }
    fn serialize_u64(self, v: u64) -> Result<(), BadNumber> {
        self.number(v as f64)
    }
    fn serialize_f32(self, v: f32) -> Result<(), BadNumber> {
        self.number(f64::from(v))
    }
    fn serialize_f64(self, v: f64) -> Result<(), BadNumber> {
        self.number(v)
    }
    fn serialize_none(self) -> Result<(), BadNumber> {
        Ok(())
    }
    fn serialize_some<T: Serialize + ?Sized>(self, value: &T) -> Result<(), BadNumber> {
        value.serialize(self)
    }
    fn serialize_unit(self) -> Result<(), BadNumber> {
        Ok(())
    }
    fn serialize_unit_struct(self, _name: &'static str) -> Result<(), BadNumber> {
        Ok(())
    }
    fn serialize_unit_variant(self, _n: &'static str, _i: u32, _v: &'static str) -> Result<(), BadNumber> {
        Ok(())
    }
    fn serialize_newtype_struct<T: Serialize + ?Sized>(
        self,
        _n: &'static str,
        v: &T,
    ) -> Result<(), BadNumber> {
        v.serialize(self)
    }
    fn serialize_newtype_variant<T: Serialize + ?Sized>(
        self,
        _n: &'static str,
        _i: u32,
        variant: &'static str,
        v: &T,
    ) -> Result<(), BadNumber> {
        self.nested(Step::Field(variant), v)
    }
    fn serialize_seq(self, _len: Option<usize>) -> Result<Items<'a>, BadNumber> {
        Ok(Items { walker: self, next: 0 })
    }
    fn serialize_tuple(self, _len: usize) -> Result<Items<'a>, BadNumber> {
        Ok(Items { walker: self, next: 0 })
    }
    fn serialize_tuple_struct(self, _n: &'static str, _len: usize) -> Result<Items<'a>, BadNumber> {
        Ok(Items { walker: self, next: 0 })
    }
    fn serialize_tuple_variant(
        self,
        _n: &'static str,
        _i: u32,
        _v: &'static str,
        _len: usize,
    ) -> Result<Items<'a>, BadNumber> {
        Ok(Items { walker: self, next: 0 })
    }
    fn serialize_map(self, _len: Option<usize>) -> Result<Entries<'a>, BadNumber> {
        Ok(Entries { walker: self, key: String::new() })
    }
    fn serialize_struct(self, _n: &'static str, _len: usize) -> Result<&'a mut Walker, BadNumber> {
        Ok(self)
    }
    fn serialize_struct_variant(
        self,
        _n: &'static str,
        _i: u32,
        _v: &'static str,
        _len: usize,
    ) -> Result<&'a mut Walker, BadNumber> {
        Ok(self)
    }
}

macro_rules! items {
    ($($tr:ident :: $method:ident),*) => { $(
        impl ser::$tr for Items<'_> {
            type Ok = ();
            type Error = BadNumber;
            fn $method<T: Serialize + ?Sized>(&mut self, value: &T) -> Result<(), BadNumber> {
                self.item(value)
            }
            fn end(self) -> Result<(), BadNumber> {
                Ok(())
            }
        }
    )* };
}

items!(
    SerializeSeq::serialize_element,
    SerializeTuple::serialize_element,
    SerializeTupleStruct::serialize_field,
    SerializeTupleVariant::serialize_field
);

macro_rules! fields {
    ($($tr:ident),*) => { $(
        impl ser::$tr for &mut Walker {
            type Ok = ();
            type Error = BadNumber;
            fn serialize_field<T: Serialize + ?Sized>(&mut self, key: &'static str, value: &T) -> Result<(), BadNumber> {
                self.nested(Step::Field(key), value)
            }
            fn end(self) -> Result<(), BadNumber> {
                Ok(())
            }
        }
    )* };
}

fields!(SerializeStruct, SerializeStructVariant);

impl ser::SerializeMap for Entries<'_> {
    type Ok = ();
    type Error = BadNumber;
    fn serialize_key<T: Serialize + ?Sized>(&mut self, key: &T) -> Result<(), BadNumber> {
        // Keys are named, not checked: a map key is never a quantity in a plan.
        self.key = key.serialize(KeyName).unwrap_or_else(|_| "?".into());
        Ok(())
    }
    fn serialize_value<T: Serialize + ?Sized>(&mut self, value: &T) -> Result<(), BadNumber> {
        let key = std::mem::take(&mut self.key);
        self.walker.nested(Step::Key(key), value)
    }
    fn end(self) -> Result<(), BadNumber> {
        Ok(())
    }
}

/// Renders a map key (text or a number) as a path step.
struct KeyName;

macro_rules! key_as_text {
    ($($name:ident: $ty:ty),*) => { $(fn $name(self, v: $ty) -> Result<String, BadNumber> { Ok(v.to_string()) })* };
}

impl ser::Serializer for KeyName {
    type Ok = String;
    type Error = BadNumber;
    type SerializeSeq = Impossible<String, BadNumber>;
    type SerializeTuple = Impossible<String, BadNumber>;
    type SerializeTupleStruct = Impossible<String, BadNumber>;
    type SerializeTupleVariant = Impossible<String, BadNumber>;
    type SerializeMap = Impossible<String, BadNumber>;
    type SerializeStruct = Impossible<String, BadNumber>;
    type SerializeStructVariant = Impossible<String, BadNumber>;

    key_as_text!(serialize_bool: bool, serialize_i8: i8, serialize_i16: i16, serialize_i32: i32,
                 serialize_i64: i64, serialize_u8: u8, serialize_u16: u16, serialize_u32: u32,
                 serialize_u64: u64, serialize_f32: f32, serialize_f64: f64, serialize_char: char,
                 serialize_str: &str);

    fn serialize_bytes(self, _v: &[u8]) -> Result<String, BadNumber> {
        Ok("bytes".into())
    }
    fn serialize_none(self) -> Result<String, BadNumber> {
        Ok("none".into())
    }
    fn serialize_some<T: Serialize + ?Sized>(self, v: &T) -> Result<String, BadNumber> {
        v.serialize(self)
    }
    fn serialize_unit(self) -> Result<String, BadNumber> {
        Ok("unit".into())
    }
    fn serialize_unit_struct(self, name: &'static str) -> Result<String, BadNumber> {
        Ok(name.into())
    }
    fn serialize_unit_variant(self, _n: &'static str, _i: u32, v: &'static str) -> Result<String, BadNumber> {
        Ok(v.into())
    }
    fn serialize_newtype_struct<T: Serialize + ?Sized>(
        self,
        _n: &'static str,
        v: &T,
    ) -> Result<String, BadNumber> {
        v.serialize(self)
    }
    fn serialize_newtype_variant<T: Serialize + ?Sized>(
        self,
        _n: &'static str,
        _i: u32,
        v: &'static str,
        _value: &T,
    ) -> Result<String, BadNumber> {
        Ok(v.into())
    }
    fn serialize_seq(self, _len: Option<usize>) -> Result<Self::SerializeSeq, BadNumber> {
        Err(ser::Error::custom("a list as a map key"))
    }
    fn serialize_tuple(self, _len: usize) -> Result<Self::SerializeTuple, BadNumber> {
        Err(ser::Error::custom("a tuple as a map key"))
    }
    fn serialize_tuple_struct(
        self,
        _n: &'static str,
        _l: usize,
    ) -> Result<Self::SerializeTupleStruct, BadNumber> {
        Err(ser::Error::custom("a tuple as a map key"))
    }
    fn serialize_tuple_variant(
        self,
        _n: &'static str,
        _i: u32,
        _v: &'static str,
        _l: usize,
    ) -> Result<Self::SerializeTupleVariant, BadNumber> {
        Err(ser::Error::custom("a tuple as a map key"))
    }
    fn serialize_map(self, _len: Option<usize>) -> Result<Self::SerializeMap, BadNumber> {
        Err(ser::Error::custom("a map as a map key"))
    }
    fn serialize_struct(self, _n: &'static str, _l: usize) -> Result<Self::SerializeStruct, BadNumber> {
        Err(ser::Error::custom("a struct as a map key"))
    }
    fn serialize_struct_variant(
        self,
        _n: &'static str,
        _i: u32,
        _v: &'static str,
        _l: usize,
    ) -> Result<Self::SerializeStructVariant, BadNumber> {
        Err(ser::Error::custom("a struct as a map key"))
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use std::collections::BTreeMap;

    #[derive(Debug, Serialize)]
    enum Shape {
        Point(f64),
        Pair(f64, f64),
        Named { x_m: f64 },
    }

    #[derive(Debug, Serialize)]
    struct Sample {
        curve: Vec<(f64, f64)>,
        by_name: BTreeMap<String, f64>,
        shape: Shape,
        maybe: Option<f64>,
        count: u64,
    }

    fn sample() -> Sample {
        Sample {
            curve: vec![(0.0, 0.0), (60.0, 0.5)],
            by_name: BTreeMap::from([("a".to_string(), 1.0)]),
            shape: Shape::Named { x_m: 2.0 },
            maybe: Some(-3.0),
            count: 7,
        }
    }

    #[test]
    fn a_sound_value_passes() {
        assert_eq!(first_bad_number(&sample()), None);
        assert_eq!(first_bad_number(&Shape::Point(1.0)), None);
        assert_eq!(first_bad_number(&Shape::Pair(1.0, -1e15)), None);
    }

    #[test]
    fn every_kind_of_place_is_reached_and_named() {
        let mut s = sample();
        s.curve[1].1 = f64::INFINITY;
        assert_eq!(first_bad_number(&s).unwrap().path, "curve.1.1");
        let mut s = sample();
        s.by_name.insert("b".into(), f64::NAN);
        assert_eq!(first_bad_number(&s).unwrap().path, "by_name.b");
        let mut s = sample();
        s.shape = Shape::Named { x_m: -1e16 };
        assert_eq!(first_bad_number(&s).unwrap().path, "shape.x_m");
        let mut s = sample();
        s.shape = Shape::Point(f64::NEG_INFINITY);
        assert_eq!(first_bad_number(&s).unwrap().path, "shape.Point");
        let mut s = sample();
        s.maybe = Some(f64::NAN);
        assert_eq!(first_bad_number(&s).unwrap().path, "maybe");
        let mut s = sample();
        s.count = u64::MAX;
        assert_eq!(first_bad_number(&s).unwrap().path, "count");
    }

    #[test]
    fn the_limit_itself_is_allowed_and_just_past_it_is_not() {
        assert!(first_bad_number(&MAX_PLAN_MAGNITUDE).is_none());
        assert!(first_bad_number(&-MAX_PLAN_MAGNITUDE).is_none());
        assert!(first_bad_number(&(MAX_PLAN_MAGNITUDE * (1.0 + f64::EPSILON))).is_some());
    }

    #[test]
    fn a_bad_plan_becomes_an_error_on_its_place() {
        let mut s = sample();
        s.curve[0].0 = f64::NAN;
        let e = checked(s).unwrap_err();
        assert_eq!(e.errors[0].field, "plan.curve.0.0");
        assert_eq!(e.errors[0].value, "NaN");
    }
}
