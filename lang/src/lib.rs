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
#![deny(missing_docs)]

mod display;
mod output;
mod session;

pub use display::*;

pub use output::{CollectedOutput, MimeBundle, OutputEvent, OutputSink};
pub use session::{CellError, Session, SessionSettings};
