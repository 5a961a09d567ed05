//! # spinfoil-lang
//!
//! The study language of Spinfoil: a [`Session`] evaluates Rhai cells whose state persists, over
//! packages for the domain objects (disc, layup, throw, environment) and displays that render
//! results as MIME bundles (`text/plain`, `text/html`, `image/svg+xml`, `application/json`).
//!
//! ```
//! use spinfoil_lang::{CollectedOutput, Session, SessionSettings};
//! use std::sync::Arc;
//! let mut session = Session::new(SessionSettings::default());
//! let sink = Arc::new(CollectedOutput::default());
//! let result = session.eval("let x = 40; x + 2", sink.clone()).unwrap();
//! assert_eq!(result.unwrap().text_plain(), Some("42"));
//! ```
//!
//! Folders: `session/` (evaluation, limits, interrupt, completion, inspection), `options/` (the
//! one checker of option maps), `help/` (doc strings, `help`, the reference page), `packages/`
//! (one module per domain object), `display/` (tables and charts).
#![deny(missing_docs)]

mod display;
mod errors;
mod files;
mod help;
mod options;
mod output;
mod packages;
mod render;
mod session;

pub use display::*;

pub use files::{FileAccessError, StudyFolder};
pub use help::{Docs, FieldDoc, FnDoc};
pub use options::{read_options, OptionKind, OptionSpec, OptionValues};
pub use output::{CollectedOutput, MimeBundle, OutputEvent, OutputSink};
pub use session::{CellError, Completeness, Completions, InterruptHandle, Session, SessionSettings};

/// The language's name, as Jupyter's `language_info.name` gives it.
pub const LANGUAGE_NAME: &str = "spinfoil";

/// The file extension of study scripts.
pub const FILE_EXTENSION: &str = ".rhai";

/// The language version: this crate's version and the Rhai version underneath.
pub fn language_version() -> String {
    format!("{} (rhai 1.27)", env!("CARGO_PKG_VERSION"))
}
