//! JSON text as script values: objects become object maps, arrays arrays, numbers integers when
//! they are whole and fit 64 bits (floats otherwise), `null` the unit value `()`.
use rhai::{Array, Dynamic, Map};
use serde_json::Value;

/// Why a JSON text could not be read: what was wrong and where (1-based line and column).
#[derive(Debug, Clone, PartialEq, thiserror::Error)]
#[error("{reason} at line {line}, column {column}")]
pub(crate) struct JsonTextError {
    /// What the parser expected or found.
    pub reason: String,
    /// Line of the problem, from 1.
    pub line: usize,
    /// Column of the problem, from 1 (0 for an empty file).
    pub column: usize,
}

/// The script value of the JSON `text`.
pub(crate) fn json_to_dynamic(text: &str) -> Result<Dynamic, JsonTextError> {
    let value: Value = serde_json::from_str(text).map_err(|e| {
        let full = e.to_string();
        let suffix = format!(" at line {} column {}", e.line(), e.column());
        let reason = full.strip_suffix(&suffix).unwrap_or(&full).to_string();
        JsonTextError { reason, line: e.line(), column: e.column() }
    })?;
    Ok(to_dynamic(value))
}

fn to_dynamic(value: Value) -> Dynamic {
    match value {
        Value::Null => Dynamic::UNIT,
        Value::Bool(b) => Dynamic::from_bool(b),
        Value::Number(n) => match n.as_i64() {
            Some(i) => Dynamic::from_int(i),
            None => Dynamic::from_float(n.as_f64().unwrap_or(f64::NAN)),
        },
        Value::String(s) => Dynamic::from(s),
        Value::Array(items) => Dynamic::from_array(items.into_iter().map(to_dynamic).collect::<Array>()),
        Value::Object(entries) => {
            Dynamic::from_map(entries.into_iter().map(|(k, v)| (k.into(), to_dynamic(v))).collect::<Map>())
        }
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn values_map_to_script_types() {
        let v = json_to_dynamic(r#"{"name": "P-7", "carry_m": [40.5, 41], "ok": true, "note": null, "big": 1e300}"#).unwrap();
        let map = v.cast::<Map>();
        assert_eq!(map["name"].clone().into_string().unwrap(), "P-7");
        let carries = map["carry_m"].clone().into_array().unwrap();
        assert_eq!(carries[0].as_float(), Ok(40.5));
        assert_eq!(carries[1].as_int(), Ok(41));
        assert_eq!(map["ok"].as_bool(), Ok(true));
        assert!(map["note"].is_unit());
        assert_eq!(map["big"].as_float(), Ok(1e300));
        assert_eq!(json_to_dynamic("18446744073709551615").unwrap().as_float(), Ok(18446744073709551615.0));
    }

    #[test]
    fn errors_name_line_and_column() {
        let e = json_to_dynamic("{\n  \"a\": 1,\n  \"b\" 2\n}").unwrap_err();
        assert_eq!(e.to_string(), "expected `:` at line 3, column 7");
        assert_eq!(json_to_dynamic("[1, 2").unwrap_err().to_string(), "EOF while parsing a list at line 1, column 5");
        assert!(json_to_dynamic("1e999").unwrap_err().reason.contains("number out of range"));
    }
}
