//! Typed contents of the messages this kernel reads and writes (messaging protocol 5.3).
use serde::{Deserialize, Serialize};
use serde_json::{Map, Value};

/// `execute_request`.
#[derive(Debug, Clone, Deserialize)]
pub struct ExecuteRequest {
    /// The cell's source.
    pub code: String,
    /// Run without broadcasting outputs or counting.
    #[serde(default)]
    pub silent: bool,
    /// Record in the history and count (forced off by `silent`).
    #[serde(default = "yes")]
    pub store_history: bool,
    /// Expressions to evaluate after the cell (answered with an error: not supported).
    #[serde(default)]
    pub user_expressions: Map<String, Value>,
    /// Whether queued cells should be skipped after an error.
    #[serde(default = "yes")]
    pub stop_on_error: bool,
}

fn yes() -> bool {
    true
}

/// `complete_request` and `inspect_request` (the cursor is in Unicode code points).
#[derive(Debug, Clone, Deserialize)]
pub struct CodeAtCursor {
    /// The code around the cursor.
    pub code: String,
    /// Cursor position, in Unicode code points.
    pub cursor_pos: usize,
}

/// `is_complete_request`.
#[derive(Debug, Clone, Deserialize)]
pub struct IsCompleteRequest {
    /// The code typed so far.
    pub code: String,
}

/// `shutdown_request`.
#[derive(Debug, Clone, Deserialize, Serialize)]
pub struct ShutdownRequest {
    /// Whether a restart follows.
    #[serde(default)]
    pub restart: bool,
}

/// `history_request`.
#[derive(Debug, Clone, Deserialize)]
pub struct HistoryRequest {
    /// Include outputs (pairs of input and output).
    #[serde(default)]
    pub output: bool,
    /// `range`, `tail` or `search`.
    #[serde(default = "tail")]
    pub hist_access_type: String,
    /// Session number for `range` (0: this session).
    #[serde(default)]
    pub session: i64,
    /// First line for `range`.
    #[serde(default)]
    pub start: i64,
    /// End line (exclusive) for `range`.
    #[serde(default)]
    pub stop: Option<i64>,
    /// Number of entries for `tail` and `search`.
    #[serde(default)]
    pub n: Option<usize>,
    /// Glob pattern for `search` (`*` and `?`).
    #[serde(default)]
    pub pattern: String,
    /// Drop repeated inputs in `search`.
    #[serde(default)]
    pub unique: bool,
}

fn tail() -> String {
    "tail".into()
}

/// `stream` on IOPub.
#[derive(Debug, Clone, Serialize)]
pub struct Stream<'a> {
    /// `stdout` or `stderr`.
    pub name: &'a str,
    /// The text.
    pub text: &'a str,
}

/// `status` on IOPub.
#[derive(Debug, Clone, Serialize)]
pub struct Status<'a> {
    /// `starting`, `busy` or `idle`.
    pub execution_state: &'a str,
}
