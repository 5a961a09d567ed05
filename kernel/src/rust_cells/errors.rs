//! evcxr's errors as cell errors that name the cell's lines.
use evcxr::{CompilationError, Error};
use spinfoil_lang::CellError;

/// The cell error for `error`, raised by a Rust cell (lines are the cell's own).
pub fn cell_error(error: &Error) -> CellError {
    match error {
        Error::CompilationErrors(errors) => compile_error(errors),
        Error::TypeRedefinedVariablesLost(names) => plain(
            "RustStateError",
            format!("a type was redefined, so these variables were dropped: {}", names.join(", ")),
        ),
        Error::SubprocessTerminated(message) => plain(
            "RustProcessEnded",
            format!("{}; the Rust context starts again with the next Rust cell (its variables are lost)", message.trim()),
        ),
        Error::Message(message) => plain("RustError", message.trim().to_string()),
    }
}

/// A panic seen on standard error (the cell's variables from before it are kept).
pub fn panic_error(message: &str) -> CellError {
    plain("RustPanic", format!("the Rust cell panicked: {} (variables from earlier cells are kept)", message.trim()))
}

fn plain(kind: &str, message: String) -> CellError {
    CellError { kind: kind.into(), message, line: None, column: None }
}

/// One error per compiler message, the first one's position on the cell error; every message
/// names its line ("line 3: mismatched types: expected `f64`, found `&str`").
fn compile_error(errors: &[CompilationError]) -> CellError {
    let relevant: Vec<&CompilationError> = errors.iter().filter(|e| e.level() == "error").collect();
    let shown = if relevant.is_empty() { errors.iter().collect() } else { relevant };
    let mut position = None;
    let mut lines = Vec::new();
    for error in &shown {
        let span = error.primary_spanned_message().and_then(|m| m.span);
        if position.is_none() {
            position = span.map(|s| (s.start_line, s.start_column));
        }
        lines.push(describe(error, span.map(|s| s.start_line)));
    }
    let count = lines.len();
    let mut message = lines.join("\n");
    if count > 1 {
        message = format!("{count} compile errors:\n{message}");
    }
    CellError { kind: "CompileError".into(), message, line: position.map(|p| p.0), column: position.map(|p| p.1) }
}

fn describe(error: &CompilationError, line: Option<usize>) -> String {
    let mut text = match line {
        Some(line) => format!("line {line}: {}", error.message()),
        None => error.message(),
    };
    if let Some(code) = error.code() {
        text.push_str(&format!(" [{code}]"));
    }
    if let Some(label) = error.primary_spanned_message().map(|m| m.label.trim()).filter(|l| !l.is_empty()) {
        text.push_str(&format!(": {label}"));
    }
    for help in error.help().iter().take(2) {
        text.push_str(&format!("\n  help: {}", help.lines().next().unwrap_or_default()));
    }
    if let Some(hint) = error.evcxr_extra_hint() {
        text.push_str(&format!("\n  note: {hint}"));
    }
    text
}
