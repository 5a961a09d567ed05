//! Help: the doc string of every script function, shown by `help`, used by completion and
//! inspection, and written to the reference page.
mod doc;
mod docs;
mod language;
mod registrar;

pub use doc::{FieldDoc, FnDoc};
pub use docs::Docs;
pub(crate) use language::reserved_word_hint;
pub(crate) use registrar::Registrar;

use std::sync::Arc;

/// Registers `help()` and `help(name)`, which return the docs as text.
pub(crate) fn register_help(reg: &mut Registrar, docs_cell: Arc<std::sync::OnceLock<Arc<Docs>>>) {
    reg.section("help", "documentation inside the language");
    reg.doc(FnDoc::new("help() -> string", "Lists every function by package, with its signature.", "help()"));
    reg.doc(FnDoc::new(
        "help(name: string) -> string",
        "The documentation of a function (signature, units, options, an example), the fields of a type such as \"Flight\", or, with \"language\", the syntax in brief and the reserved words (such as throw) that cannot name a variable.",
        "help(\"fly\")",
    ));
    let cell = docs_cell.clone();
    reg.engine.register_fn("help", move || cell.get().map_or_else(String::new, |d| d.overview()));
    reg.engine.register_fn("help", move |name: &str| docs_cell.get().map_or_else(String::new, |d| d.help(name)));
}
