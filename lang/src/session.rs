use crate::output::{MimeBundle, OutputSink};
use rhai::{Dynamic, Engine, Scope, AST};
use std::sync::{Arc, RwLock};

/// Settings of a [`Session`]. Defaults are documented on each field.
#[derive(Debug, Clone)]
pub struct SessionSettings {
    /// Largest number of Rhai operations one cell may run (default 500 000 000).
    pub max_operations: u64,
}

impl Default for SessionSettings {
    fn default() -> Self {
        Self { max_operations: 500_000_000 }
    }
}

/// An error from a cell, with its script position when there is one.
#[derive(Debug, Clone, PartialEq, thiserror::Error)]
#[error("{message}")]
pub struct CellError {
    /// Short error kind, e.g. "SyntaxError", "OptionError".
    pub kind: String,
    /// The message shown to the user.
    pub message: String,
    /// 1-based line in the cell, if known.
    pub line: Option<usize>,
    /// 1-based column in the cell, if known.
    pub column: Option<usize>,
}

type SharedSink = Arc<RwLock<Option<Arc<dyn OutputSink>>>>;

/// A persistent evaluation context: variables and functions survive from cell to cell.
pub struct Session {
    engine: Engine,
    scope: Scope<'static>,
    functions: AST,
    sink: SharedSink,
}

impl Session {
    /// A new session with the given settings.
    pub fn new(settings: SessionSettings) -> Self {
        let sink: SharedSink = Arc::new(RwLock::new(None));
        let mut engine = Engine::new();
        engine.set_max_operations(settings.max_operations);
        let print_sink = sink.clone();
        engine.on_print(move |text| {
            if let Some(s) = print_sink.read().ok().and_then(|g| g.clone()) {
                s.stdout(&format!("{text}\n"));
            }
        });
        Self { engine, scope: Scope::new(), functions: AST::empty(), sink }
    }

    /// Evaluates one cell, sending prints and displays to `sink` as they happen; returns the
    /// rendering of the cell's last expression (None when it is unit).
    pub fn eval(&mut self, code: &str, sink: Arc<dyn OutputSink>) -> Result<Option<MimeBundle>, CellError> {
        if let Ok(mut slot) = self.sink.write() {
            *slot = Some(sink);
        }
        let ast = self.engine.compile(code).map_err(|e| CellError {
            kind: "SyntaxError".into(),
            message: e.to_string(),
            line: e.1.line(),
            column: e.1.position(),
        })?;
        let merged = self.functions.merge(&ast);
        let value: Dynamic = self.engine.eval_ast_with_scope(&mut self.scope, &merged).map_err(|e| CellError {
            kind: "RuntimeError".into(),
            message: e.to_string(),
            line: e.position().line(),
            column: e.position().position(),
        })?;
        self.functions = self.functions.merge(&ast.clone_functions_only());
        Ok(if value.is_unit() { None } else { Some(MimeBundle::plain(value.to_string())) })
    }
}
