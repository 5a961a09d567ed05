//! The Rust context of one session: an evcxr command context started on the first Rust cell.
use super::errors::{cell_error, panic_error};
use super::marker::rust_cell_source;
use super::setup::{RustCellSettings, WorkSlot};
use super::streams::forwarding;
use evcxr::{CommandContext, EvalContext, EvalContextOutputs, EvalOutputs};
use spinfoil_lang::{CellError, MimeBundle, OutputSink, Session};
use std::process::{Child, Command};
use std::sync::{Arc, Mutex};
use std::time::Instant;

/// The child process running the current Rust cell, for interrupts.
static RUNNING: Mutex<Option<Arc<Mutex<Child>>>> = Mutex::new(None);
/// Guards evcxr's environment variable (read once while a context starts).
static STARTING: Mutex<()> = Mutex::new(());

/// Stops the running Rust cell by ending its process (the context restarts with the next cell).
pub fn interrupt_running() {
    let running = RUNNING.lock().unwrap_or_else(|p| p.into_inner()).clone();
    if let Some(child) = running {
        let _ = child.lock().unwrap_or_else(|p| p.into_inner()).kill();
    }
}

struct Started {
    command: CommandContext,
    outputs: EvalContextOutputs,
    _slot: WorkSlot,
}

/// The Rust cells of one session (created empty; the evcxr context starts with the first cell).
pub struct RustCells {
    settings: RustCellSettings,
    started: Option<Started>,
}

impl RustCells {
    /// Rust cells with `settings`.
    pub fn new(settings: RustCellSettings) -> Self {
        Self { settings, started: None }
    }

    /// Rust cells that share the study folder of `session` (else the current directory).
    pub fn for_session(session: &Session) -> Self {
        Self::new(RustCellSettings::from_env(session.settings().study_dir.clone()))
    }

    /// Runs a Rust cell (`code` starts with the marker line): streams its output to `sink`,
    /// shows rich results as displays and returns a plain result as the cell's value.
    pub fn eval(&mut self, code: &str, sink: Arc<dyn OutputSink>) -> Result<Option<MimeBundle>, CellError> {
        let Some(source) = rust_cell_source(code) else {
            return Err(CellError { kind: "RustError".into(), message: "not a Rust cell (no %%rust line)".into(), line: None, column: None });
        };
        if self.started.is_none() {
            self.started = Some(start(&self.settings, sink.as_ref())?);
        }
        let started = self.started.as_mut().expect("started above");
        let outcome = run(started, &source, sink.as_ref());
        if matches!(outcome, Err(evcxr::Error::SubprocessTerminated(_))) {
            self.started = None;
        }
        let (outputs, panic) = match outcome {
            Ok(pair) => pair,
            Err(error) => return Err(cell_error(&error)),
        };
        let bundle = to_bundle(outputs);
        if let Some(first_line) = panic {
            if let Some(bundle) = bundle.filter(|b| b.data.len() > 1 || b.text_plain().is_none()) {
                sink.display(&bundle, None);
            }
            return Err(panic_error(&first_line));
        }
        Ok(match bundle {
            Some(bundle) if bundle.data.keys().any(|mime| mime != "text/plain") => {
                sink.display(&bundle, None);
                None
            }
            other => other,
        })
    }
}

type RunOutcome = Result<(EvalOutputs, Option<String>), evcxr::Error>;

fn run(started: &mut Started, source: &str, sink: &dyn OutputSink) -> RunOutcome {
    let Started { command, outputs, .. } = started;
    *RUNNING.lock().unwrap_or_else(|p| p.into_inner()) = Some(command.process_handle());
    let (result, facts) = forwarding(&outputs.stdout, &outputs.stderr, sink, || command.execute(source));
    *RUNNING.lock().unwrap_or_else(|p| p.into_inner()) = None;
    result.map(|outputs| (outputs, facts.panic))
}

fn to_bundle(outputs: EvalOutputs) -> Option<MimeBundle> {
    if outputs.content_by_mime_type.is_empty() {
        return None;
    }
    let mut bundle = MimeBundle::default();
    for (mime, content) in outputs.content_by_mime_type {
        bundle.data.insert(mime, content);
    }
    Some(bundle)
}

/// Starts evcxr in a work slot, adds the engine and the helpers, and reports the time taken.
fn start(settings: &RustCellSettings, sink: &dyn OutputSink) -> Result<Started, CellError> {
    let setup_error = |message: String| CellError { kind: "RustSetupError".into(), message, line: None, column: None };
    let settings = settings.resolved().map_err(setup_error)?;
    let slot = settings.take_slot().map_err(setup_error)?;
    let began = Instant::now();
    let workspace = settings.engine_path.parent().unwrap_or(&settings.engine_path);
    let kept = slot.dir.strip_prefix(workspace).unwrap_or(&slot.dir);
    sink.stderr(&format!(
        "Starting Rust cells: compiling spinfoil-engine for them (about a minute the first time; builds are kept in {}).\n",
        kept.display()
    ));
    let (context, outputs) = {
        let _guard = STARTING.lock().unwrap_or_else(|p| p.into_inner());
        // evcxr reads its work folder from this variable while the context is created.
        std::env::set_var("EVCXR_TMPDIR", &slot.dir);
        let created = EvalContext::with_subprocess_command(Command::new(&settings.runtime));
        std::env::remove_var("EVCXR_TMPDIR");
        created.map_err(|e| setup_error(format!("evcxr could not start: {e}")))?
    };
    let mut started = Started { command: CommandContext::with_eval_context(context), outputs, _slot: slot };
    let (deps, prelude) = settings.prelude();
    for (what, code) in [("adding spinfoil-engine", deps), ("defining the study helpers", prelude)] {
        if let Err(error) = run(&mut started, &code, sink) {
            let detail = cell_error(&error);
            return Err(setup_error(format!("Rust cells could not start ({what}): {}", detail.message)));
        }
    }
    sink.stderr(&format!("Rust cells ready in {:.1} s.\n", began.elapsed().as_secs_f64()));
    Ok(started)
}
