//! Turning a cell's value into a MIME bundle.
use crate::output::MimeBundle;
use rhai::Dynamic;

/// The rendering of any script value: our displayable types render themselves; other values
/// show as `text/plain`.
pub(crate) fn render_value(value: &Dynamic) -> MimeBundle {
    crate::packages::render_domain(value).unwrap_or_else(|| MimeBundle::plain(value.to_string()))
}
