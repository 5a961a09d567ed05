use super::SessionSettings;
use crate::errors::{closest, split_kind};
use crate::help::{reserved_word_hint, Docs};
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

    /// A syntax error from compiling the cell `code`; when the error stands at a reserved word
    /// (`for throw in throws`), the message says so and how to name the variable instead.
    pub(crate) fn from_parse(err: &ParseError, code: &str, settings: &SessionSettings) -> Self {
        if matches!(err.err_type(), rhai::ParseErrorType::ExprTooDeep) {
            let message = format!(
                "expressions nested deeper than {} levels ({} inside functions; limits max_expression_depth, max_function_expression_depth)",
                settings.max_expression_depth, settings.max_function_expression_depth
            );
            return Self::at("LimitError", message, err.position());
        }
        let mut message = err.err_type().to_string();
        if let Some(hint) = reserved_word_at(code, err.position()) {
            // Rhai's own "'x' is a reserved keyword" says less than the hint: replace it.
            message = match err.err_type() {
                rhai::ParseErrorType::Reserved(_) => hint,
                _ => format!("{message}: {hint}"),
            };
        }
        Self::at("SyntaxError", message, err.position())
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

/// The reserved-word hint for the word that starts at `pos` in `code`, if it is one; a word
/// right after a `.` or inside `#{ }` stands where a key was expected.
fn reserved_word_at(code: &str, pos: Position) -> Option<String> {
    let (line, column) = (pos.line()?, pos.position()?);
    let text = code.lines().nth(line.checked_sub(1)?)?;
    let start = text.char_indices().nth(column.checked_sub(1)?).map(|(i, _)| i)?;
    let rest = &text[start..];
    let end = rest.find(|c: char| !(c.is_alphanumeric() || c == '_')).unwrap_or(rest.len());
    let before = text[..start].trim_end();
    let as_key = before.ends_with('.') || before.ends_with("#{") || (before.ends_with(',') && inside_map(before));
    reserved_word_hint(&rest[..end], as_key)
}

/// True when `before` (the line up to a word) has an object map `#{` still open.
fn inside_map(before: &str) -> bool {
    before.rfind("#{").is_some_and(|open| !before[open..].contains('}'))
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
    } else if let Some(hint) = functions_naming(name, known_fns) {
        message.push_str(&hint);
    } else if let Some(near) = closest(name, known_fns.iter().copied()) {
        message.push_str(&format!("; did you mean '{near}'?"));
    }
    message
}

/// "; did you mean 'a' or 'b'?" for functions whose name has `name` as one of its words
/// (`release` → `release_for`, `throw_release`); `None` when there are none.
fn functions_naming(name: &str, known_fns: &[&str]) -> Option<String> {
    let named: Vec<String> =
        known_fns.iter().filter(|f| name.len() >= 3 && f.split('_').any(|w| w == name)).map(|f| format!("'{f}'")).collect();
    match named.as_slice() {
        [] => None,
        [one] => Some(format!("; did you mean {one}?")),
        [first @ .., last] => Some(format!("; did you mean {} or {last}?", first.join(", "))),
    }
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
    let hint = match closest(field, fields.iter().copied()) {
        Some(near) => format!("; did you mean '{near}'?"),
        None => field_by_symbol(field, &docs.fields_of(type_name)).map_or(String::new(), |f| {
            format!("; {field} is the field '{f}'")
        }),
    };
    format!("{type_name} has no field '{field}'{hint} (fields: {})", fields.join(", "))
}

/// The first field whose summary names `symbol` as a whole word (`I_z` → `spin_inertia_g_cm2`,
/// whose summary reads "... about the spin axis I_z, g·cm²").
fn field_by_symbol<'a>(symbol: &str, fields: &[&'a crate::help::FieldDoc]) -> Option<&'a str> {
    let is_word = |summary: &str| summary.split(|c: char| !(c.is_alphanumeric() || c == '_')).any(|w| w == symbol);
    fields.iter().find(|f| is_word(&f.summary)).map(|f| f.field.as_str())
}
