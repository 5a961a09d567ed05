//! Turning a cell's value into a MIME bundle.
use crate::output::MimeBundle;
use rhai::{Dynamic, Engine, Scope};

/// The rendering of any script value: our displayable types render themselves; other values
/// show as `text/plain`, through their script `to_string` when they have one.
pub(crate) fn render_value(value: &Dynamic, engine: &Engine) -> MimeBundle {
    crate::packages::render_domain(value).unwrap_or_else(|| MimeBundle::plain(text_of(value, engine)))
}

/// The value as text, as `print` would show it.
pub(crate) fn text_of(value: &Dynamic, engine: &Engine) -> String {
    if value.is_string() || value.is_int() || value.is_float() || value.is_bool() || value.is_unit() {
        return value.to_string();
    }
    let mut scope = Scope::new();
    scope.push("value", value.clone());
    engine.eval_with_scope::<String>(&mut scope, "value.to_string()").unwrap_or_else(|_| value.to_string())
}
