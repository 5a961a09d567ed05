//! Rust cells: notebook cells that start with the marker line `%%rust` run as Rust, against
//! the engine, through an embedded [evcxr](https://crates.io/crates/evcxr) context (kernel
//! feature `rust-cells`).
//!
//! - The marker is the cell's first non-blank line, exactly `%%rust` (surrounding spaces
//!   allowed). It is replaced by a blank line before compiling, so compiler errors name the
//!   cell's own line numbers.
//! - The first Rust cell of a session starts the context: it adds
//!   `spinfoil-engine` (from the workspace this kernel was built from, feature
//!   `evcxr-display`), `serde` and `serde_json` as dependencies, and defines the `study`
//!   module of [`CELL_PRELUDE`] (paths in the study folder, loading and saving designs and
//!   JSON), so `use spinfoil_engine::*;` works at once. The first time on a machine this
//!   compiles the engine (a minute or two); the build is kept in `target/evcxr/` and reused.
//! - Values cross between Rust and script cells as JSON files in the study folder: a script's
//!   `save(disc, "p.json")` is read by `study::load_design("p.json")`, and
//!   `study::save_design(&design, "demo_driver", "q.json")` is read by the script's
//!   `load_disc("q.json")`.
//! - Output: standard output and error stream to the notebook; the last expression is shown
//!   with its `evcxr_display` method when it has one (engine results show HTML tables and SVG
//!   charts), otherwise with `Debug`.
//! - Without the feature a Rust cell fails with a `FeatureError` saying how to build it.
//!
//! Settings come from environment variables: `SPINFOIL_ENGINE_PATH` (the engine crate's
//! folder), `SPINFOIL_RUST_CELLS_DIR` (evcxr's work and build folder),
//! `SPINFOIL_RUST_RUNTIME` (the `spinfoil-rust-runtime` helper binary that runs compiled
//! cells). Rust cells are native code with the user's rights: the study-folder sandbox of
//! script cells does not apply to them.
mod marker;

#[cfg(feature = "rust-cells")]
mod context;
#[cfg(feature = "rust-cells")]
mod errors;
#[cfg(feature = "rust-cells")]
mod setup;
#[cfg(feature = "rust-cells")]
mod streams;

#[cfg(not(feature = "rust-cells"))]
mod disabled;

pub use marker::{rust_cell_source, RUST_CELL_MARKER};

#[cfg(feature = "rust-cells")]
pub use context::RustCells;
#[cfg(feature = "rust-cells")]
pub use setup::{RustCellSettings, CELL_PRELUDE};

#[cfg(not(feature = "rust-cells"))]
pub use disabled::{RustCells, FEATURE_MESSAGE};

use spinfoil_lang::{CellError, MimeBundle, OutputSink, Session};
use std::cell::RefCell;
use std::sync::Arc;

thread_local! {
    /// The Rust context of the session that lives on this thread (the kernel's session thread).
    static THREAD_CELLS: RefCell<Option<RustCells>> = const { RefCell::new(None) };
}

/// Runs one cell of the kernel's session: Rust cells in this thread's Rust context (started on
/// first use, with the session's study folder), everything else in `session`.
pub fn eval_cell(session: &mut Session, code: &str, sink: Arc<dyn OutputSink>) -> Result<Option<MimeBundle>, CellError> {
    if rust_cell_source(code).is_none() {
        return session.eval(code, sink);
    }
    THREAD_CELLS.with(|cells| {
        let mut cells = cells.borrow_mut();
        let cells = cells.get_or_insert_with(|| RustCells::for_session(session));
        cells.eval(code, sink)
    })
}

/// A session with its Rust cells, for hosts that own their session (the headless runner):
/// each cell goes to the right one; the Rust context starts with the first Rust cell.
pub struct SessionCells {
    /// The script session.
    pub session: Session,
    rust: Option<RustCells>,
}

impl SessionCells {
    /// `session`, with no Rust context yet.
    pub fn new(session: Session) -> Self {
        Self { session, rust: None }
    }

    /// Runs one cell: Rust cells in the Rust context, everything else in the session.
    pub fn eval(&mut self, code: &str, sink: Arc<dyn OutputSink>) -> Result<Option<MimeBundle>, CellError> {
        if rust_cell_source(code).is_none() {
            return self.session.eval(code, sink);
        }
        let session = &self.session;
        self.rust.get_or_insert_with(|| RustCells::for_session(session)).eval(code, sink)
    }
}

/// Stops the running Rust cell of this process, if any (kernel interrupts).
pub fn interrupt() {
    #[cfg(feature = "rust-cells")]
    context::interrupt_running();
}
