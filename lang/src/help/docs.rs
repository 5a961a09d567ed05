use super::doc::{FieldDoc, FnDoc};
use super::language::{language_markdown, language_text};

/// Every documented function and field of the language, in registration order.
#[derive(Debug, Clone, Default, PartialEq)]
pub struct Docs {
    /// Function docs (several per name when a function has overloads).
    pub functions: Vec<FnDoc>,
    /// Field docs of the domain types.
    pub fields: Vec<FieldDoc>,
    /// Section (package) names with a one-line description, in order.
    pub sections: Vec<(String, String)>,
}

impl Docs {
    /// All docs of functions named `name`.
    pub fn find(&self, name: &str) -> Vec<&FnDoc> {
        self.functions.iter().filter(|d| d.name == name).collect()
    }

    /// Fields of the type named `type_name`.
    pub fn fields_of(&self, type_name: &str) -> Vec<&FieldDoc> {
        self.fields.iter().filter(|f| f.type_name == type_name).collect()
    }

    /// Distinct function names, sorted.
    pub fn names(&self) -> Vec<&str> {
        let mut names: Vec<&str> = self.functions.iter().map(|d| d.name.as_str()).collect();
        names.sort_unstable();
        names.dedup();
        names
    }

    /// What `help(topic)` shows: a function's docs, a type's fields, the meaning of a field
    /// (`help("carry_m")`), or a hint.
    pub fn help(&self, topic: &str) -> String {
        if topic == "language" {
            return language_text();
        }
        let docs = self.find(topic);
        if !docs.is_empty() {
            return docs.iter().map(|d| d.to_text()).collect::<Vec<_>>().join("\n");
        }
        let fields = self.fields_of(topic);
        if !fields.is_empty() {
            let lines: Vec<String> = fields.iter().map(|f| format!("  .{}: {}", f.field, f.summary)).collect();
            return format!("{topic} fields:\n{}\n", lines.join("\n"));
        }
        let owners: Vec<String> = self
            .fields
            .iter()
            .filter(|f| f.field == topic)
            .map(|f| format!(".{} of {}: {}\n", f.field, f.type_name, f.summary))
            .collect();
        if !owners.is_empty() {
            return format!("{}(help(\"TYPE\") lists every field of a type.)\n", owners.join(""));
        }
        match crate::errors::closest(topic, self.names()) {
            Some(near) => format!("No help for '{topic}'. Did you mean '{near}'? help() lists every function.\n"),
            None => format!("No help for '{topic}'. help() lists every function.\n"),
        }
    }

    /// What `help()` shows: every function by section, with its signature.
    pub fn overview(&self) -> String {
        let mut text = String::from(
            "Spinfoil functions (help(\"name\") for details; help(\"language\") for the syntax and reserved words):\n",
        );
        for (section, about) in &self.sections {
            text.push_str(&format!("\n{section}: {about}\n"));
            for doc in self.functions.iter().filter(|d| &d.section == section) {
                text.push_str(&format!("  {}\n", doc.signature));
            }
        }
        text
    }

    /// The reference page (Markdown) generated from the same strings.
    pub fn reference_markdown(&self) -> String {
        let mut md = String::from(
            "# Spinfoil language reference\n\n\
             Generated from the doc strings of the functions (`cargo run -p spinfoil-lang --example reference`).\n\
             Do not edit by hand. Options are object maps whose keys carry their unit.\n\n",
        );
        md.push_str(&language_markdown());
        for (section, about) in &self.sections {
            md.push_str(&format!("\n## {section}\n\n{about}\n\n"));
            for doc in self.functions.iter().filter(|d| &d.section == section) {
                md.push_str(&doc.to_markdown());
                md.push('\n');
            }
            self.fields_markdown(section, &mut md);
        }
        md
    }

    fn fields_markdown(&self, section: &str, md: &mut String) {
        let types: Vec<&str> = self.type_names_in(section);
        for type_name in types {
            md.push_str(&format!("#### Fields of `{type_name}`\n\n| field | meaning |\n|---|---|\n"));
            for field in self.fields_of(type_name) {
                md.push_str(&format!("| `.{}` | {} |\n", field.field, field.summary));
            }
            md.push('\n');
        }
    }

    fn type_names_in(&self, section: &str) -> Vec<&str> {
        let mut names: Vec<&str> = Vec::new();
        for field in &self.fields {
            if field.section == section && !names.contains(&field.type_name.as_str()) {
                names.push(&field.type_name);
            }
        }
        names
    }
}
