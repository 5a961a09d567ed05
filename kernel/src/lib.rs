//! # spinfoil-kernel
//!
//! Spinfoil's hosts around one `spinfoil_lang::Session`: the command line's script runner and
//! interactive prompt, a headless notebook runner with an HTML report, and a Jupyter kernel
//! (messaging protocol 5.3 over ZeroMQ) with its kernelspec and logo.
//!
//! Folders: `jupyter/` (connection file, wire format and signing, sockets, handlers, session
//! thread), `kernelspec/` (install, logo), `notebook/` (nbformat 4 documents, headless runner,
//! HTML report), `script/` (scripts and the terminal).
//!
//! ```
//! use spinfoil_kernel::notebook::{run_notebook, Notebook, RunSettings};
//! let json = serde_json::json!({"nbformat": 4, "nbformat_minor": 5, "metadata": {}, "cells": [
//!     {"cell_type": "code", "source": "let spin_rpm = 900; spin_rpm / 60", "metadata": {},
//!      "outputs": [], "execution_count": null}]});
//! let mut notebook = Notebook::from_json(json).unwrap();
//! let summary = run_notebook(&mut notebook, &RunSettings::default());
//! assert!(summary.errors.is_empty());
//! assert_eq!(notebook.outputs(0)[0]["data"]["text/plain"], "15");
//! ```
#![deny(missing_docs)]

pub mod error_report;
pub mod jupyter;
pub mod mime;
pub mod kernelspec;
pub mod notebook;
pub mod rust_cells;
pub mod tee;
pub mod script;
