//! Scripts and the terminal: running a `.rhai` study, the interactive prompt, progress bars.
mod progress;
mod prompt;
mod run;
mod shell_completion;
mod terminal;

pub use progress::{fraction, ProgressBoard, ProgressBoardSink};
pub use prompt::{run_prompt, PromptError};
pub use run::{run_script, ScriptError, ScriptOutcome, ScriptSettings};
pub use terminal::{TableExport, TerminalSink};
