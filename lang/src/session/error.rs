use super::SessionSettings;
use crate::errors::{closest, split_kind};
use crate::help::Docs;
use rhai::{EvalAltResult, ParseError, Position};

/// An error from a cell, with its script position when there is one.
#[derive(Debug, Clone, PartialEq, thiserror::Error)]
#[error("{kind}: {message}{}", location(*.line, *.column))]
pub struct CellError {
    /// Short error kind: "SyntaxError", "OptionError", "DesignError", "NameError", "TypeError",
    /// "LimitError", "Interrupted", "FileError", "ValueError", "EngineError", "RuntimeError", ...
    pub kind: String,
    /// The message shown to the user (without the position).
    pub message: String,
    /// 1-based line in the cell, if known.
    pub line: Option<usize>,
    /// 1-based column in the cell, if known.
    pub column: Option<usize>,
}

fn location(line: Option<usize>, column: Option<usize>) -> String {
    match (line, column) {
        (Some(l), Some(c)) => format!(" (line {l}, column {c})"),
        (Some(l), None) => format!(" (line {l})"),
        _ => String::new(),
    }
}

impl CellError {
    fn at(kind: &str, message: String, pos: Position) -> Self {
        Self { kind: kind.to_string(), message, line: pos.line(), column: pos.position() }
    }

    /// A syntax error from compiling a cell.
    pub(crate) fn from_parse(err: &ParseError, settings: &SessionSettings) -> Self {
        if matches!(err.err_type(), rhai::ParseErrorType::ExprTooDeep) {
            let message = format!(
                "expressions nested deeper than {} levels ({} inside functions; limits max_expression_depth, max_function_expression_depth)",
                settings.max_expression_depth, settings.max_function_expression_depth
            );
            return Self::at("LimitError", message, err.position());
        }
        Self::at("SyntaxError", err.err_type().to_string(), err.position())
    }

    /// A runtime error, reported at its position in the cell being run: for errors inside
    /// function calls, the call site (the outermost position); the message names the functions.
    pub(crate) fn from_eval(err: &EvalAltResult, settings: &SessionSettings, docs: &Docs) -> Self {
        let mut calls = Vec::new();
        let mut inner = err;
        while let EvalAltResult::ErrorInFunctionCall(name, _, cause, _) = inner {
            if !name.starts_with("anon$") {
                calls.push(name.clone());
            }
            inner = cause;
        }
        let pos = if err.position().is_none() { inner.position() } else { err.position() };
        let (kind, mut message) = classify(inner, settings, docs);
        for name in calls {
            message.push_str(&format!("\n  in call to function '{name}'"));
        }
        Self::at(&kind, message, pos)
    }
}

fn plain_message(err: &EvalAltResult) -> String {
    let text = err.to_string();
    let suffix = format!(" ({})", err.position());
    match text.strip_suffix(&suffix) {
        Some(stripped) if !err.position().is_none() => stripped.to_string(),
        _ => text,
    }
}

fn classify(err: &EvalAltResult, settings: &SessionSettings, docs: &Docs) -> (String, String) {
    use EvalAltResult as E;
    if let Some(message) = settings.limit_message(err) {
        return ("LimitError".into(), message);
    }
    let kind = match err {
        E::ErrorRuntime(value, _) => return runtime_value(&value.to_string()),
        E::ErrorTerminated(..) => return ("Interrupted".into(), "the cell was interrupted".into()),
        E::ErrorFunctionNotFound(signature, _) => {
            return ("NameError".into(), unknown_function(signature, &docs.names()))
        }
        E::ErrorDotExpr(text, _) if text.starts_with("Unknown property") => {
            return ("NameError".into(), unknown_field(text, docs))
        }
        E::ErrorParsing(..) => "SyntaxError",
        E::ErrorVariableNotFound(..) | E::ErrorPropertyNotFound(..) | E::ErrorModuleNotFound(..) => "NameError",
        E::ErrorMismatchDataType(..) | E::ErrorMismatchOutputType(..) | E::ErrorIndexingType(..) | E::ErrorFor(..) => {
            "TypeError"
        }
        E::ErrorArithmetic(..) => "ArithmeticError",
        E::ErrorArrayBounds(..) | E::ErrorStringBounds(..) | E::ErrorBitFieldBounds(..) | E::ErrorIndexNotFound(..) => {
            "IndexError"
        }
        _ => "RuntimeError",
    };
    (kind.into(), plain_message(err))
}

fn runtime_value(text: &str) -> (String, String) {
    match split_kind(text) {
        Some((kind, message)) => (kind.into(), message.into()),
        None => ("RuntimeError".into(), text.to_string()),
    }
}

fn unknown_function(signature: &str, known_fns: &[&str]) -> String {
    let name = signature.split([' ', '(']).next().unwrap_or(signature);
    let mut message = format!("no function {signature}");
    if known_fns.contains(&name) {
        message.push_str(&format!("; '{name}' exists but takes other arguments: see help(\"{name}\")"));
    } else if let Some(near) = closest(name, known_fns.iter().copied()) {
        message.push_str(&format!("; did you mean '{near}'?"));
    }
    message
}

/// "Unknown property 'x' - a getter is not registered for type 'T'" restated with the type's
/// fields and the nearest one.
fn unknown_field(text: &str, docs: &Docs) -> String {
    let quoted: Vec<&str> = text.split('\'').collect();
    let (Some(field), Some(type_name)) = (quoted.get(1), quoted.get(3)) else { return text.to_string() };
    let fields: Vec<&str> = docs.fields_of(type_name).iter().map(|f| f.field.as_str()).collect();
    if fields.is_empty() {
        return format!("{type_name} has no field '{field}'");
    }
    let hint = closest(field, fields.iter().copied()).map_or(String::new(), |near| format!("; did you mean '{near}'?"));
    format!("{type_name} has no field '{field}'{hint} (fields: {})", fields.join(", "))
}
