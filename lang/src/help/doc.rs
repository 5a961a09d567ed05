use crate::options::OptionSpec;

/// Documentation of one script function: what `help`, completion, inspection and the reference
/// page show. Written once, beside the function's registration.
#[derive(Debug, Clone, PartialEq)]
pub struct FnDoc {
    /// The function's name.
    pub name: String,
    /// The call as written, with argument types and units, e.g.
    /// `material(name: string, density_g_cm3: float) -> Material`.
    pub signature: String,
    /// What it does, in a sentence or two, with units.
    pub summary: String,
    /// A short example script.
    pub example: String,
    /// The package it belongs to ("materials", "throws", ...).
    pub section: String,
    /// The keys of its option map argument, if it takes one.
    pub options: Vec<OptionSpec>,
}

impl FnDoc {
    /// A doc whose name is taken from the signature (the text before `(`).
    pub fn new(signature: &str, summary: &str, example: &str) -> Self {
        let name = signature.split('(').next().unwrap_or(signature).trim().to_string();
        Self {
            name,
            signature: signature.to_string(),
            summary: summary.to_string(),
            example: example.to_string(),
            section: String::new(),
            options: Vec::new(),
        }
    }

    /// The same doc with the keys of its option map.
    pub fn with_options(mut self, options: &[OptionSpec]) -> Self {
        self.options = options.to_vec();
        self
    }

    /// The doc as plain text (for `help` and inspection).
    pub fn to_text(&self) -> String {
        let mut text = format!("{}\n\n{}\n", self.signature, self.summary);
        if !self.options.is_empty() {
            text.push_str("\nOptions:\n");
            for spec in &self.options {
                let required = if spec.required { " (required)" } else { "" };
                text.push_str(&format!("  {}{required}: {}; {}\n", spec.key, spec.allowed(), spec.doc));
            }
        }
        if !self.example.is_empty() {
            text.push_str(&format!("\nExample:\n{}\n", indent(&self.example, "  ")));
        }
        text
    }

    /// The doc as a Markdown section (for the reference page).
    pub fn to_markdown(&self) -> String {
        let mut md = format!("### `{}`\n\n{}\n", self.signature, self.summary);
        if !self.options.is_empty() {
            md.push_str("\n| option | accepts | meaning |\n|---|---|---|\n");
            for spec in &self.options {
                let required = if spec.required { " (required)" } else { "" };
                md.push_str(&format!("| `{}`{required} | {} | {} |\n", spec.key, spec.allowed(), spec.doc));
            }
        }
        if !self.example.is_empty() {
            md.push_str(&format!("\n```rhai\n{}\n```\n", self.example));
        }
        md
    }
}

/// Documentation of a readable field (`flight.carry_m`) of a domain type.
#[derive(Debug, Clone, PartialEq)]
pub struct FieldDoc {
    /// The type's script name (`Disc`, `Flight`).
    pub type_name: String,
    /// The field's name, ending in its unit.
    pub field: String,
    /// What it is, with its unit.
    pub summary: String,
    /// The package the type belongs to.
    pub section: String,
}

pub(crate) fn indent(text: &str, prefix: &str) -> String {
    text.lines().map(|l| format!("{prefix}{l}")).collect::<Vec<_>>().join("\n")
}
