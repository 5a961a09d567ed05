//! `show`: explicit displays.
use super::PackageContext;
use crate::help::{FnDoc, Registrar};
use rhai::{Dynamic, NativeCallContext};

/// Registers `show(value)`.
pub(crate) fn register(reg: &mut Registrar, context: &PackageContext) {
    reg.section("display", "showing results while a cell runs");
    reg.doc(FnDoc::new(
        "show(value)",
        "Displays a value now (a table or chart in a notebook, aligned text in a terminal), instead of only the cell's last value.",
        "show(compare_mass([a, b]));",
    ));
    let sink = context.sink.clone();
    reg.engine.register_fn("show", move |ctx: NativeCallContext, value: Dynamic| {
        sink.display(&crate::render::render_value(&value, ctx.engine()), None)
    });
    let sink = context.sink.clone();
    reg.engine.register_fn("show", move |ctx: NativeCallContext, value: Dynamic, id: &str| {
        sink.display(&crate::render::render_value(&value, ctx.engine()), Some(id))
    });
    reg.doc(FnDoc::new(
        "show(value, id: string)",
        "Displays a value under a name so that update_display can replace it later (progress of a long study).",
        "show(\"starting\", \"progress\");\nfor i in 1..=10 { update_display(`run ${i} of 10`, \"progress\"); }",
    ));
    let sink = context.sink.clone();
    reg.engine.register_fn("update_display", move |ctx: NativeCallContext, value: Dynamic, id: &str| {
        sink.update_display(&crate::render::render_value(&value, ctx.engine()), id)
    });
    reg.doc(FnDoc::new(
        "update_display(value, id: string)",
        "Replaces the display shown earlier with show(value, id).",
        "update_display(compare(flights), \"progress\");",
    ));
}
