//! An nbformat 4 notebook, kept as JSON so that fields this tool does not know survive.
use serde_json::{json, Value};
use std::path::Path;

/// Why a notebook could not be read or written.
#[derive(Debug, thiserror::Error)]
#[non_exhaustive]
pub enum NotebookError {
    /// A file could not be read or written.
    #[error("{path}: {source}")]
    Io {
        /// The file's path.
        path: String,
        /// The underlying error.
        source: std::io::Error,
    },
    /// The file is not JSON.
    #[error("{path} is not a notebook (invalid JSON): {source}")]
    Json {
        /// The file's path.
        path: String,
        /// The parser's error.
        source: serde_json::Error,
    },
    /// The JSON is not an nbformat 4 notebook.
    #[error("{path} is not an nbformat 4 notebook: {why}")]
    Format {
        /// The file's path.
        path: String,
        /// What is wrong.
        why: String,
    },
}

/// A code, markdown or raw cell, as the runner and the report see it.
#[derive(Debug, Clone, PartialEq)]
pub struct CellView {
    /// `code`, `markdown` or `raw`.
    pub cell_type: String,
    /// The cell's source text.
    pub source: String,
}

/// An nbformat 4 notebook.
#[derive(Debug, Clone, PartialEq)]
pub struct Notebook {
    json: Value,
}

impl Notebook {
    /// Reads a notebook file.
    pub fn load(path: &Path) -> Result<Self, NotebookError> {
        let shown = path.display().to_string();
        let text = std::fs::read_to_string(path).map_err(|source| NotebookError::Io { path: shown.clone(), source })?;
        let json: Value = serde_json::from_str(&text).map_err(|source| NotebookError::Json { path: shown.clone(), source })?;
        Self::from_json(json).map_err(|why| NotebookError::Format { path: shown, why })
    }

    /// A notebook from its JSON; the error says what is missing.
    pub fn from_json(json: Value) -> Result<Self, String> {
        match json.get("nbformat").and_then(Value::as_u64) {
            Some(4) => {}
            other => return Err(format!("nbformat is {other:?}, expected 4")),
        }
        if !json.get("cells").is_some_and(Value::is_array) {
            return Err("no cells list".into());
        }
        Ok(Self { json })
    }

    /// Writes the notebook as nbformat does (one-space indent, trailing newline).
    pub fn save(&self, path: &Path) -> Result<(), NotebookError> {
        let mut text = to_nbformat_text(&self.json);
        text.push('\n');
        std::fs::write(path, text).map_err(|source| NotebookError::Io { path: path.display().to_string(), source })
    }

    /// The JSON of the whole notebook.
    pub fn json(&self) -> &Value {
        &self.json
    }

    /// The cells, in order.
    pub fn cells(&self) -> Vec<CellView> {
        self.cell_values().iter().map(cell_view).collect()
    }

    /// The stored outputs of cell `index` (empty for non-code cells).
    pub fn outputs(&self, index: usize) -> Vec<Value> {
        let cell = &self.cell_values()[index];
        cell.get("outputs").and_then(Value::as_array).cloned().unwrap_or_default()
    }

    /// Replaces the outputs and execution count of code cell `index`.
    pub fn set_outputs(&mut self, index: usize, outputs: Vec<Value>, execution_count: Option<usize>) {
        if let Some(cell) = self.json["cells"].get_mut(index) {
            cell["outputs"] = Value::Array(outputs);
            cell["execution_count"] = execution_count.map_or(Value::Null, |n| json!(n));
        }
    }

    /// Marks the notebook as one for the Spinfoil kernel.
    pub fn set_kernel(&mut self, kernelspec: Value, language_info: Value) {
        if !self.json["metadata"].is_object() {
            self.json["metadata"] = json!({});
        }
        self.json["metadata"]["kernelspec"] = kernelspec;
        self.json["metadata"]["language_info"] = language_info;
    }

    fn cell_values(&self) -> &Vec<Value> {
        static EMPTY: Vec<Value> = Vec::new();
        self.json["cells"].as_array().unwrap_or(&EMPTY)
    }
}

fn cell_view(cell: &Value) -> CellView {
    CellView {
        cell_type: cell.get("cell_type").and_then(Value::as_str).unwrap_or("raw").to_string(),
        source: multiline_text(cell.get("source")),
    }
}

/// Text stored either as one string or as a list of lines (nbformat's "multiline string").
pub fn multiline_text(value: Option<&Value>) -> String {
    match value {
        Some(Value::String(text)) => text.clone(),
        Some(Value::Array(lines)) => lines.iter().filter_map(Value::as_str).collect(),
        _ => String::new(),
    }
}

fn to_nbformat_text(json: &Value) -> String {
    let mut out = Vec::new();
    let formatter = serde_json::ser::PrettyFormatter::with_indent(b" ");
    let mut serializer = serde_json::Serializer::with_formatter(&mut out, formatter);
    if serde::Serialize::serialize(json, &mut serializer).is_err() {
        return json.to_string();
    }
    String::from_utf8(out).unwrap_or_else(|_| json.to_string())
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn reads_sources_stored_as_lines_and_rejects_other_formats() {
        let json = json!({"nbformat": 4, "nbformat_minor": 5, "metadata": {}, "cells": [
            {"cell_type": "code", "source": ["let a = 1;\n", "a"], "metadata": {}, "outputs": [], "execution_count": null}
        ]});
        let notebook = Notebook::from_json(json).unwrap();
        assert_eq!(notebook.cells()[0].source, "let a = 1;\na");
        assert!(Notebook::from_json(json!({"nbformat": 3, "cells": []})).is_err());
        assert!(Notebook::from_json(json!({"nbformat": 4})).is_err());
    }
}
