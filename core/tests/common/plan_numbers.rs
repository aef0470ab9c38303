//! An independent check of a serialized plan against its published JSON Schema
//! (`core/schema/plan.schema.json`): every number finite and within ±1e15, and a `null` only
//! where the schema allows one. serde_json writes NaN and infinity as `null`, so a `null` in a
//! place the schema types as a plain number is a non-finite number in the plan.
//! Shared by the property tests (`tests/tests/properties.rs`) and the fuzz test.

use serde_json::Value;

/// The bound of the plan's sanity rule, restated here so this check does not lean on the code
/// it checks.
pub const LIMIT: f64 = 1e15;

/// The plan schema, as published.
pub fn plan_schema() -> Value {
    serde_json::from_str(include_str!("../../schema/plan.schema.json")).expect("the plan schema is JSON")
}

/// Checks a plan value; the error names the first bad place.
pub fn check(plan: &Value, schema: &Value) -> Result<(), String> {
    walk(schema, schema, plan, "plan")
}

fn allows_null(node: &Value) -> bool {
    match node.get("type") {
        Some(Value::String(t)) => t == "null",
        Some(Value::Array(ts)) => ts.iter().any(|t| t == "null"),
        _ => false,
    }
}

fn walk(root: &Value, node: &Value, v: &Value, path: &str) -> Result<(), String> {
    if let Some(Value::String(r)) = node.get("$ref") {
        let def = root
            .pointer(&format!("/definitions/{}", r.trim_start_matches("#/definitions/")))
            .ok_or_else(|| format!("{path}: unknown {r}"))?;
        return walk(root, def, v, path);
    }
    if let Some(Value::Array(all)) = node.get("allOf") {
        return all.iter().try_for_each(|s| walk(root, s, v, path));
    }
    for combinator in ["anyOf", "oneOf"] {
        if let Some(Value::Array(alts)) = node.get(combinator) {
            let mut first = None;
            for alt in alts {
                match walk(root, alt, v, path) {
                    Ok(()) => return Ok(()),
                    Err(e) => first = first.or(Some(e)),
                }
            }
            return Err(first.unwrap_or_else(|| format!("{path}: no alternative")));
        }
    }
    match v {
        Value::Null if allows_null(node) => Ok(()),
        Value::Null => {
            Err(format!("{path}: null where the schema wants {}", node.get("type").unwrap_or(&Value::Null)))
        }
        Value::Number(n) => match n.as_f64() {
            Some(x) if x.is_finite() && x.abs() <= LIMIT => Ok(()),
            _ => Err(format!("{path}: {n} is out of bounds")),
        },
        Value::Array(items) => match node.get("items") {
            Some(Value::Array(tuple)) => items
                .iter()
                .zip(tuple)
                .enumerate()
                .try_for_each(|(i, (x, s))| walk(root, s, x, &format!("{path}.{i}"))),
            Some(item) => {
                items.iter().enumerate().try_for_each(|(i, x)| walk(root, item, x, &format!("{path}.{i}")))
            }
            None => Err(format!("{path}: a list where the schema has none")),
        },
        Value::Object(map) => {
            let props = node
                .get("properties")
                .ok_or_else(|| format!("{path}: an object where the schema has none"))?;
            map.iter().try_for_each(|(k, x)| match props.get(k) {
                Some(s) => walk(root, s, x, &format!("{path}.{k}")),
                None => Err(format!("{path}.{k}: not in the schema")),
            })
        }
        Value::Bool(_) | Value::String(_) => Ok(()),
    }
}
