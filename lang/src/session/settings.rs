use super::limits::LIMIT_PREFIX;
use std::path::{Path, PathBuf};
use std::time::Duration;

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
    /// Longest wall-clock time one cell may run (default 10 minutes). Checked every 1 024
    /// script operations and after every flight of a study, so a long dispersion study stops
    /// within about one flight of the limit.
    pub max_cell_time: Duration,
    /// Most flights (dispersion throws, sweep points) one study may fly (default 100 000).
    /// Bounds the memory of a study's rows; larger studies are split into shards.
    pub max_study_flights: usize,
    /// Most trajectory samples one flight may record (default 10 000; a default flight records
    /// at most 3 001: 10 ms samples for up to 30 s).
    pub max_trajectory_samples: usize,
    /// The study's folder: the only place scripts may save designs and exports, and the first
    /// place they load from. `None` (the default) forbids writing files from scripts.
    pub study_dir: Option<PathBuf>,
    /// Extra folders scripts may READ designs and measured flights from (default none), e.g. a
    /// shared library of designs. A relative path is looked up in the study folder first, then
    /// in these folders in order; nothing is ever written to them. The same confinement applies
    /// in each (relative paths only, no `..`, no symbolic links leading out of the folder).
    pub extra_dirs: Vec<PathBuf>,
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
            max_cell_time: Duration::from_secs(600),
            max_study_flights: 100_000,
            max_trajectory_samples: 10_000,
            study_dir: None,
            extra_dirs: Vec::new(),
        }
    }
}

impl SessionSettings {
    /// The default settings with `dir` as the study folder.
    pub fn in_folder(dir: impl Into<PathBuf>) -> Self {
        Self { study_dir: Some(dir.into()), ..Self::default() }
    }

    /// The settings for running the script at `path`: the defaults, with the script's own
    /// folder as the study folder.
    pub fn for_script(path: &Path) -> Self {
        let folder = path.parent().filter(|p| !p.as_os_str().is_empty()).unwrap_or(Path::new("."));
        Self::in_folder(folder)
    }

    /// The message of a cell that ran out of wall time.
    pub(crate) fn wall_time_message(&self) -> String {
        format!(
            "the cell ran longer than {} (limit max_cell_time); a loop that never ends, or a study to split into shards?",
            seconds_text(self.max_cell_time)
        )
    }

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
            E::ErrorRuntime(value, _) => value.clone().into_string().ok()?.strip_prefix(LIMIT_PREFIX)?.to_string(),
            _ => return None,
        })
    }
}

fn seconds_text(time: Duration) -> String {
    let s = time.as_secs_f64();
    if s >= 120.0 && s % 60.0 == 0.0 {
        format!("{} minutes", s / 60.0)
    } else {
        format!("{s} s")
    }
}
