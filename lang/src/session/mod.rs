//! The session: a persistent Rhai evaluation context with limits, interrupt and editor services.
mod completeness;
mod completion;
mod engine;
mod error;
mod inspection;
mod interrupt;
mod limits;
mod scan;
mod settings;
mod sink_slot;

pub use completeness::Completeness;
pub use completion::Completions;
pub use error::CellError;
pub use interrupt::InterruptHandle;
pub use settings::SessionSettings;
pub(crate) use limits::{check_study_flights, check_trajectory_samples, limit_error, ScriptRules};
pub(crate) use sink_slot::SinkSlot;

use crate::help::Docs;
use crate::output::{MimeBundle, OutputSink};
use rhai::{Dynamic, Engine, Scope, AST};
use std::sync::Arc;

/// A persistent evaluation context: variables and functions survive from cell to cell.
///
/// Cells run under the limits of [`SessionSettings`]; [`Session::interrupt_handle`] stops a
/// running cell from another thread. After any error or interrupt the session stays usable.
pub struct Session {
    engine: Engine,
    scope: Scope<'static>,
    functions: AST,
    sink: SinkSlot,
    interrupt: InterruptHandle,
    docs: Arc<Docs>,
    settings: SessionSettings,
}

impl Session {
    /// A new session with the given settings.
    pub fn new(settings: SessionSettings) -> Self {
        let sink = SinkSlot::default();
        let interrupt = InterruptHandle::default();
        let (engine, docs) = engine::build_engine(&settings, &sink, &interrupt);
        Self { engine, scope: Scope::new(), functions: AST::empty(), sink, interrupt, docs, settings }
    }

    /// Evaluates one cell, sending prints and displays to `sink` as they happen; returns the
    /// rendering of the cell's last expression (None when it is unit).
    pub fn eval(&mut self, code: &str, sink: Arc<dyn OutputSink>) -> Result<Option<MimeBundle>, CellError> {
        self.interrupt.start_cell(self.settings.max_cell_time);
        self.sink.set(sink);
        let result = self.run(code).map_err(|e| self.out_of_time(e));
        self.sink.clear();
        result
    }

    fn run(&mut self, code: &str) -> Result<Option<MimeBundle>, CellError> {
        let ast = self.engine.compile(code).map_err(|e| CellError::from_parse(&e, code, &self.settings))?;
        let merged = self.functions.merge(&ast);
        self.functions = self.functions.merge(&ast.clone_functions_only());
        let value: Dynamic = self
            .engine
            .eval_ast_with_scope(&mut self.scope, &merged)
            .map_err(|e| CellError::from_eval(&e, &self.settings, &self.docs))?;
        Ok((!value.is_unit()).then(|| crate::render::render_value(&value, &self.engine)))
    }

    /// `err` as a limit error when the cell was stopped because it ran out of wall time.
    fn out_of_time(&self, err: CellError) -> CellError {
        if err.kind == "Interrupted" && self.interrupt.timed_out() {
            CellError { kind: "LimitError".into(), message: self.settings.wall_time_message(), ..err }
        } else {
            err
        }
    }

    /// A handle that interrupts this session's running cell from any thread.
    pub fn interrupt_handle(&self) -> InterruptHandle {
        self.interrupt.clone()
    }

    /// The documentation of every function of the language (for help pages and editors).
    pub fn docs(&self) -> &Docs {
        &self.docs
    }

    /// The settings this session runs under.
    pub fn settings(&self) -> &SessionSettings {
        &self.settings
    }

    /// Names of the variables currently in scope, with their type names.
    pub fn variables(&self) -> Vec<(String, String)> {
        self.scope.iter_raw().map(|(name, _, value)| (name.to_string(), crate::errors::friendly_type(value))).collect()
    }

    /// Names of the script functions defined so far, with their parameters.
    pub fn script_functions(&self) -> Vec<(String, Vec<String>)> {
        self.functions
            .iter_functions()
            .map(|f| (f.name.to_string(), f.params.iter().map(|p| p.to_string()).collect()))
            .collect()
    }
}

impl Session {
    /// Names of the functions our packages registered that have no doc string (should be
    /// empty; a test holds it so). Field getters and `to_string` are documented as fields.
    pub fn undocumented_functions(&self) -> Vec<String> {
        self.registered_functions().into_iter().filter(|name| self.docs.find(name).is_empty()).collect()
    }

    /// Names of the functions our packages registered (not Rhai's standard ones), sorted.
    pub fn registered_functions(&self) -> Vec<String> {
        let mut names: Vec<String> = self
            .engine
            .gen_fn_signatures(false)
            .into_iter()
            .filter_map(|sig| sig.split('(').next().map(str::to_string))
            .filter(|name| {
                !name.starts_with("get$") && !name.starts_with("set$") && name != "to_string" && name != "to_debug"
            })
            .collect();
        names.sort();
        names.dedup();
        names
    }
}
