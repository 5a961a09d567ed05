use super::doc::{FieldDoc, FnDoc};
use super::docs::Docs;
use rhai::Engine;

/// Registers script functions together with their docs, so no function goes undocumented.
pub(crate) struct Registrar<'a> {
    /// The engine functions are registered in.
    pub engine: &'a mut Engine,
    docs: &'a mut Docs,
    section: String,
}

impl<'a> Registrar<'a> {
    /// A registrar writing into `engine` and `docs`.
    pub fn new(engine: &'a mut Engine, docs: &'a mut Docs) -> Self {
        Self { engine, docs, section: String::new() }
    }

    /// Starts a package section: the functions documented next belong to it.
    pub fn section(&mut self, name: &str, about: &str) {
        self.section = name.to_string();
        self.docs.sections.push((name.to_string(), about.to_string()));
    }

    /// Records the doc of a function registered (or about to be) under `doc.name`.
    pub fn doc(&mut self, mut doc: FnDoc) {
        doc.section = self.section.clone();
        self.docs.functions.push(doc);
    }

    /// Records the doc of a readable field of `type_name`.
    pub fn field_doc(&mut self, type_name: &str, field: &str, summary: &str) {
        let section = self.section.clone();
        self.docs.fields.push(FieldDoc {
            type_name: type_name.into(),
            field: field.into(),
            summary: summary.into(),
            section,
        });
    }
}

impl Registrar<'_> {
    /// Registers how a script type shows as text, for `print`, `debug` and string interpolation.
    pub fn text<T: rhai::Variant + Clone>(&mut self, show: impl Fn(&mut T) -> String + Clone + Send + Sync + 'static) {
        self.engine.register_fn("to_string", show.clone());
        self.engine.register_fn("to_debug", show);
    }

    /// Registers a read-only field `field` on the script type `type_name` with its doc.
    pub fn getter<T, V>(
        &mut self,
        type_name: &str,
        field: &str,
        summary: &str,
        get: impl Fn(&mut T) -> V + Send + Sync + 'static,
    ) where
        T: rhai::Variant + Clone,
        V: rhai::Variant + Clone,
    {
        self.engine.register_get(field, get);
        self.field_doc(type_name, field, summary);
    }
}
