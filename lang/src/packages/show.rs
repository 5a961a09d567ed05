//! `show`: explicit displays.
use super::PackageContext;
use crate::help::{FnDoc, Registrar};
use rhai::Dynamic;

/// Registers `show(value)`.
pub(crate) fn register(reg: &mut Registrar, context: &PackageContext) {
    reg.section("display", "showing results while a cell runs");
    reg.doc(FnDoc::new(
        "show(value)",
        "Displays a value now (a table or chart in a notebook, aligned text in a terminal), instead of only the cell's last value.",
        "show(compare_mass([a, b]));",
    ));
    let sink = context.sink.clone();
    reg.engine.register_fn("show", move |value: Dynamic| sink.display(&crate::render::render_value(&value), None));
}
