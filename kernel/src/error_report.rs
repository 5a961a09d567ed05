//! A cell's error as Jupyter shows it: kind, message and a traceback that points into the cell.
use serde::Serialize;
use spinfoil_lang::CellError;

/// The `ename`, `evalue` and `traceback` of an `error` output (kernel and notebook runner alike).
#[derive(Debug, Clone, Serialize, PartialEq)]
pub struct ErrorReport {
    /// Error kind, e.g. `SyntaxError`.
    pub ename: String,
    /// The message.
    pub evalue: String,
    /// Lines shown to the user: the message, the position and the offending source line.
    pub traceback: Vec<String>,
}

impl ErrorReport {
    /// The report of `error` raised by the cell `code`.
    pub fn from_cell(code: &str, error: &CellError) -> Self {
        let mut traceback = vec![format!("{}: {}", error.kind, error.message)];
        traceback.extend(position_lines(code, error));
        Self { ename: error.kind.clone(), evalue: error.message.clone(), traceback }
    }

    /// The traceback as one block of text (terminals, HTML reports).
    pub fn text(&self) -> String {
        self.traceback.join("\n")
    }
}

fn position_lines(code: &str, error: &CellError) -> Vec<String> {
    let Some(line) = error.line else { return Vec::new() };
    let mut lines = vec![match error.column {
        Some(column) => format!("  at line {line}, column {column}"),
        None => format!("  at line {line}"),
    }];
    if let Some(source) = code.lines().nth(line.saturating_sub(1)) {
        let gutter = format!("{line:>4} | ");
        lines.push(format!("{gutter}{source}"));
        if let Some(column) = error.column {
            let pad = " ".repeat(gutter.len() + column.saturating_sub(1));
            lines.push(format!("{pad}^"));
        }
    }
    lines
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn points_at_the_line_and_column() {
        let error = CellError { kind: "RuntimeError".into(), message: "boom".into(), line: Some(2), column: Some(5) };
        let report = ErrorReport::from_cell("let a = 1;\nlet b = nope;", &error);
        assert_eq!(report.ename, "RuntimeError");
        assert_eq!(report.traceback[1], "  at line 2, column 5");
        assert_eq!(report.traceback[2], "   2 | let b = nope;");
        assert_eq!(report.traceback[3], "           ^");
    }

    #[test]
    fn an_error_without_position_has_only_its_message() {
        let error = CellError { kind: "Interrupted".into(), message: "stopped".into(), line: None, column: None };
        assert_eq!(ErrorReport::from_cell("", &error).traceback, vec!["Interrupted: stopped"]);
    }
}
