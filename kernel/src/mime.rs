//! MIME bundles as Jupyter carries them: JSON types as JSON objects, everything else as text.
use serde_json::{Map, Value};
use spinfoil_lang::MimeBundle;

/// The `data` object of a `display_data`/`execute_result` for `bundle`.
pub fn bundle_to_data(bundle: &MimeBundle) -> Map<String, Value> {
    bundle
        .data
        .iter()
        .map(|(mime, content)| (mime.clone(), mime_value(mime, content)))
        .collect()
}

fn mime_value(mime: &str, content: &str) -> Value {
    if is_json(mime) {
        if let Ok(value) = serde_json::from_str(content) {
            return value;
        }
    }
    Value::String(content.to_string())
}

fn is_json(mime: &str) -> bool {
    mime == "application/json" || mime.ends_with("+json")
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn json_becomes_an_object_and_text_stays_text() {
        let bundle = MimeBundle::plain("t").with("application/json", r#"{"a": 1}"#).with("text/html", "<b>");
        let data = bundle_to_data(&bundle);
        assert_eq!(data["application/json"]["a"], 1);
        assert_eq!(data["text/plain"], "t");
        assert_eq!(data["text/html"], "<b>");
    }
}
