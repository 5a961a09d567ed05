//! Runs a study script (`.rhai`) in one session, printing to the terminal.
use super::terminal::{TableExport, TerminalSink};
use crate::error_report::ErrorReport;
use spinfoil_lang::{Session, SessionSettings};
use std::path::{Path, PathBuf};
use std::sync::Arc;

/// How to run a script.
#[derive(Debug, Clone)]
pub struct ScriptSettings {
    /// Folder for charts and table copies (default `spinfoil-out`).
    pub out_dir: PathBuf,
    /// Also write each table as CSV or JSON (default none).
    pub export: Option<TableExport>,
    /// The session's settings (default `None`: the defaults with the script's own folder as the
    /// study folder).
    pub session: Option<SessionSettings>,
}

impl Default for ScriptSettings {
    fn default() -> Self {
        Self { out_dir: PathBuf::from("spinfoil-out"), export: None, session: None }
    }
}

/// What a script run produced.
#[derive(Debug, Clone, PartialEq)]
pub struct ScriptOutcome {
    /// The script's error, if it failed.
    pub error: Option<ErrorReport>,
    /// Files written (charts, tables).
    pub written: Vec<PathBuf>,
    /// Files that could not be written.
    pub write_failures: usize,
}

/// Why a script could not be run at all.
#[derive(Debug, thiserror::Error)]
#[non_exhaustive]
pub enum ScriptError {
    /// The script file could not be read.
    #[error("cannot read script {path}: {source}")]
    Read {
        /// The file's path.
        path: String,
        /// The underlying error.
        source: std::io::Error,
    },
}

/// Runs the script at `path`; its folder is the study folder (where `save` and `load` work)
/// unless `settings.session` says otherwise.
pub fn run_script(path: &Path, settings: &ScriptSettings) -> Result<ScriptOutcome, ScriptError> {
    let code = std::fs::read_to_string(path).map_err(|source| ScriptError::Read { path: path.display().to_string(), source })?;
    let mut session = Session::new(settings.session.clone().unwrap_or_else(|| SessionSettings::for_script(path)));
    let sink = Arc::new(TerminalSink::new(&settings.out_dir, settings.export));
    let outcome = session.eval(&code, sink.clone());
    sink.end_cell();
    let error = match outcome {
        Ok(Some(result)) => {
            sink.show_result(&result);
            None
        }
        Ok(None) => None,
        Err(error) => Some(ErrorReport::from_cell(&code, &error)),
    };
    Ok(ScriptOutcome { error, written: sink.written(), write_failures: sink.failures() })
}
