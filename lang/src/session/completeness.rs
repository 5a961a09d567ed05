use super::scan::scan;
use super::Session;
use rhai::ParseErrorType;

/// Whether a cell is ready to run (Jupyter's `is_complete_request`).
#[derive(Debug, Clone, PartialEq, Eq)]
pub enum Completeness {
    /// The code is a whole, valid cell.
    Complete,
    /// The code is unfinished (open bracket, string or comment); `indent` is what the next line
    /// should start with.
    Incomplete {
        /// Four spaces per open bracket.
        indent: String,
    },
    /// The code cannot become valid by adding lines.
    Invalid,
}

impl Session {
    /// Whether `code` is complete, unfinished, or invalid.
    pub fn is_complete(&self, code: &str) -> Completeness {
        let state = scan(code);
        if state.unbalanced {
            return Completeness::Invalid;
        }
        if !state.stack.is_empty() || state.open_comment || state.open_string == Some('`') {
            return Completeness::Incomplete { indent: "    ".repeat(state.stack.len()) };
        }
        if state.open_string.is_some() && !code.trim_end().ends_with('\\') {
            return Completeness::Invalid;
        }
        match self.engine.compile(code) {
            Ok(_) => Completeness::Complete,
            Err(e) if matches!(e.err_type(), ParseErrorType::UnexpectedEOF) => {
                Completeness::Incomplete { indent: String::new() }
            }
            Err(_) => Completeness::Invalid,
        }
    }
}
