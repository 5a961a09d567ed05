use std::path::PathBuf;

/// Settings of a [`Session`](crate::Session): the limits a cell runs under and where it may
/// read and write files. Defaults are documented on each field; all are configurable.
#[derive(Debug, Clone, PartialEq)]
pub struct SessionSettings {
    /// Largest number of Rhai operations one cell may run (default 500 000 000, about a minute
    /// of pure script work). Calls into the simulation count as one operation each.
    pub max_operations: u64,
    /// Largest number of elements in one array (default 1 000 000).
    pub max_array_size: usize,
    /// Largest length of one string, in bytes (default 16 000 000).
    pub max_string_size: usize,
    /// Largest number of entries in one object map (default 100 000). Rhai 1.27 checks it on
    /// map operations and function results, not on a single `m[key] = v` insertion.
    pub max_map_size: usize,
    /// Deepest nesting of script function calls (default 64).
    pub max_call_depth: usize,
    /// Deepest nesting of expressions at the top level of a cell (default 64).
    pub max_expression_depth: usize,
    /// Deepest nesting of expressions inside a function body (default 32).
    pub max_function_expression_depth: usize,
    /// The study's folder: the only place scripts may save and load designs. `None` (the
    /// default) forbids all file access from scripts.
    pub study_dir: Option<PathBuf>,
}

impl Default for SessionSettings {
    fn default() -> Self {
        Self {
            max_operations: 500_000_000,
            max_array_size: 1_000_000,
            max_string_size: 16_000_000,
            max_map_size: 100_000,
            max_call_depth: 64,
            max_expression_depth: 64,
            max_function_expression_depth: 32,
            study_dir: None,
        }
    }
}

impl SessionSettings {
    /// A clear message for an error caused by one of these limits, naming the limit and the
    /// setting that raises it; `None` for other errors.
    pub(crate) fn limit_message(&self, err: &rhai::EvalAltResult) -> Option<String> {
        use rhai::EvalAltResult as E;
        Some(match err {
            E::ErrorTooManyOperations(..) => format!(
                "the cell ran more than {} operations (limit max_operations); a loop that never ends?",
                self.max_operations
            ),
            E::ErrorStackOverflow(..) => format!(
                "function calls nested deeper than {} levels (limit max_call_depth); a recursion without an end?",
                self.max_call_depth
            ),
            E::ErrorDataTooLarge(what, ..) => format!(
                "{what} too large: arrays hold at most {} elements, strings {} bytes, maps {} entries \
                 (limits max_array_size, max_string_size, max_map_size)",
                self.max_array_size, self.max_string_size, self.max_map_size
            ),
            E::ErrorTooManyVariables(..) => "too many variables in one cell".to_string(),
            _ => return None,
        })
    }
}
