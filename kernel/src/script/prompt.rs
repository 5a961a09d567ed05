//! The interactive prompt: one session, line editing and history (rustyline), multi-line input
//! until the session says the code is complete, Ctrl-C stopping a running cell.
use super::shell_completion::ShellHelper;
use super::terminal::TerminalSink;
use crate::error_report::ErrorReport;
use rustyline::error::ReadlineError;
use rustyline::history::DefaultHistory;
use rustyline::Editor;
use spinfoil_lang::{Completeness, InterruptHandle, Session, SessionSettings};
use std::cell::RefCell;
use std::path::{Path, PathBuf};
use std::rc::Rc;
use std::sync::Arc;

const PROMPT: &str = "spinfoil> ";
const MORE: &str = "      ..> ";

/// The prompt's line editor, completing with the session (Tab).
type ShellEditor = Editor<ShellHelper, DefaultHistory>;

/// Why the prompt could not run.
#[derive(Debug, thiserror::Error)]
#[non_exhaustive]
pub enum PromptError {
    /// The terminal could not be set up for line editing.
    #[error("cannot start line editing: {0}")]
    Terminal(#[from] ReadlineError),
}

/// Runs the prompt until end of input (Ctrl-D) in a session with `settings`; charts go into
/// `out_dir`.
pub fn run_prompt(out_dir: &Path, settings: SessionSettings) -> Result<(), PromptError> {
    let session = Session::new(settings);
    stop_cells_on_ctrl_c(session.interrupt_handle());
    let session = Rc::new(RefCell::new(session));
    // Tab completes the common prefix; a second Tab lists the candidates (as shells do).
    let config = rustyline::Config::builder().completion_type(rustyline::CompletionType::List).build();
    let mut editor = ShellEditor::with_config(config)?;
    editor.set_helper(Some(ShellHelper::new(session.clone())));
    let history = history_file();
    if let Some(file) = &history {
        let _ = editor.load_history(file);
    }
    let sink = Arc::new(TerminalSink::new(out_dir, None));
    println!("Spinfoil {} - type help() for the functions, Ctrl-D to leave.", env!("CARGO_PKG_VERSION"));
    while let Some(code) = read_cell(&mut editor, &session) {
        let _ = editor.add_history_entry(code.trim_end());
        run_cell(&mut session.borrow_mut(), &sink, &code);
    }
    if let Some(file) = &history {
        let _ = std::fs::create_dir_all(file.parent().unwrap_or(Path::new(".")));
        let _ = editor.save_history(file);
    }
    Ok(())
}

/// Reads lines until they form a complete (or hopelessly invalid) cell; None at end of input.
fn read_cell(editor: &mut ShellEditor, session: &RefCell<Session>) -> Option<String> {
    let mut code = String::new();
    loop {
        let prompt = if code.is_empty() { PROMPT } else { MORE };
        if let Some(helper) = editor.helper() {
            helper.set_pending(&code);
        }
        match editor.readline(prompt) {
            Ok(line) => code.push_str(&line),
            Err(ReadlineError::Interrupted) => {
                code.clear();
                continue;
            }
            Err(_) => return None,
        }
        code.push('\n');
        if code.trim().is_empty() {
            code.clear();
        } else if !matches!(session.borrow().is_complete(&code), Completeness::Incomplete { .. }) {
            return Some(code);
        }
    }
}

fn run_cell(session: &mut Session, sink: &Arc<TerminalSink>, code: &str) {
    let outcome = session.eval(code, sink.clone());
    sink.end_cell();
    match outcome {
        Ok(Some(result)) => sink.show_result(&result),
        Ok(None) => {}
        Err(error) => eprintln!("{}", ErrorReport::from_cell(code, &error).text()),
    }
}

/// Ctrl-C while a cell runs interrupts the cell instead of ending the program.
fn stop_cells_on_ctrl_c(handle: InterruptHandle) {
    let spawned = std::thread::Builder::new().name("spinfoil-ctrl-c".into()).spawn(move || {
        let Ok(runtime) = tokio::runtime::Builder::new_current_thread().enable_all().build() else { return };
        runtime.block_on(async {
            while tokio::signal::ctrl_c().await.is_ok() {
                handle.interrupt();
            }
        });
    });
    if spawned.is_err() {
        eprintln!("spinfoil: Ctrl-C will end the program instead of the running cell");
    }
}

/// `$XDG_DATA_HOME/spinfoil/history.txt` (or `~/.local/share/...`); None without a home.
fn history_file() -> Option<PathBuf> {
    let data = std::env::var_os("XDG_DATA_HOME")
        .map(PathBuf::from)
        .or_else(|| std::env::var_os("HOME").map(|h| PathBuf::from(h).join(".local").join("share")))?;
    Some(data.join("spinfoil").join("history.txt"))
}
