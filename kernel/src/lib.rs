//! # spinfoil-kernel
//!
//! Spinfoil's hosts around one `spinfoil_lang::Session`: the command line's script runner and
//! interactive prompt, a headless notebook runner with an HTML report, and a Jupyter kernel
//! (messaging protocol 5.3 over ZeroMQ) with its kernelspec and logo.
//!
//! Folders: `jupyter/` (connection file, wire format and signing, sockets, handlers, session
//! thread), `kernelspec/` (install, logo), `notebook/` (nbformat 4 documents, headless runner,
//! HTML report), `script/` (scripts and the terminal).
#![deny(missing_docs)]

pub mod error_report;
pub mod jupyter;
pub mod mime;
pub mod kernelspec;
pub mod notebook;
pub mod tee;
pub mod script;
