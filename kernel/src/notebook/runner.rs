//! The headless notebook runner: every code cell through one embedded session, outputs stored
//! as Jupyter stores them (no Jupyter needed).
use super::document::Notebook;
use super::outputs::{self, DisplayIndex};
use crate::error_report::ErrorReport;
use crate::jupyter::handlers::kernel_info;
use crate::kernelspec::{DISPLAY_NAME, KERNEL_NAME};
use crate::rust_cells::SessionCells;
use crate::tee::Tee;
use serde_json::{json, Value};
use spinfoil_lang::{CollectedOutput, OutputSink, Session, SessionSettings};
use std::sync::Arc;

/// How to run a notebook.
#[derive(Clone, Default)]
pub struct RunSettings {
    /// Keep running the cells after one fails (default false: stop, as nbclient does).
    pub keep_going: bool,
    /// Settings of the embedded session (default: the session's defaults).
    pub session: SessionSettings,
    /// Also sends every event here as it happens, e.g. progress bars (default none).
    pub observer: Option<Arc<dyn OutputSink>>,
}

/// What a run did.
#[derive(Debug, Clone, Default, PartialEq)]
pub struct RunSummary {
    /// Code cells executed.
    pub cells_run: usize,
    /// Errors raised: (cell index, report), in order.
    pub errors: Vec<(usize, ErrorReport)>,
}

/// Runs every non-empty code cell of `notebook` in order, replacing its outputs.
pub fn run_notebook(notebook: &mut Notebook, settings: &RunSettings) -> RunSummary {
    let mut session = SessionCells::new(Session::new(settings.session.clone()));
    let mut displays = DisplayIndex::default();
    let mut summary = RunSummary::default();
    for (index, cell) in notebook.cells().into_iter().enumerate() {
        if cell.cell_type != "code" || cell.source.trim().is_empty() {
            continue;
        }
        summary.cells_run += 1;
        let failed = run_cell(notebook, &mut session, index, &cell.source, summary.cells_run, &mut displays, settings);
        if let Some(report) = failed {
            summary.errors.push((index, report));
            if !settings.keep_going {
                break;
            }
        }
    }
    let info = kernel_info();
    notebook.set_kernel(
        json!({"name": KERNEL_NAME, "display_name": DISPLAY_NAME, "language": spinfoil_lang::LANGUAGE_NAME}),
        info["language_info"].clone(),
    );
    summary
}

fn run_cell(
    notebook: &mut Notebook,
    session: &mut SessionCells,
    index: usize,
    code: &str,
    count: usize,
    displays: &mut DisplayIndex,
    settings: &RunSettings,
) -> Option<ErrorReport> {
    let record = Arc::new(CollectedOutput::default());
    let sink: Arc<dyn OutputSink> = match &settings.observer {
        Some(observer) => Arc::new(Tee::new(record.clone(), observer.clone())),
        None => record.clone(),
    };
    let outcome = session.eval(code, sink);
    let (mut cell_outputs, earlier) = outputs::outputs_from_events(index, record.take(), displays);
    for (at_cell, at_output, output) in earlier {
        replace_output(notebook, at_cell, at_output, output);
    }
    let failed = match outcome {
        Ok(Some(bundle)) => {
            cell_outputs.push(outputs::execute_result(&bundle, count));
            None
        }
        Ok(None) => None,
        Err(error) => {
            let report = ErrorReport::from_cell(code, &error);
            cell_outputs.push(outputs::error(&report));
            Some(report)
        }
    };
    notebook.set_outputs(index, cell_outputs, Some(count));
    failed
}

fn replace_output(notebook: &mut Notebook, cell: usize, output: usize, value: Value) {
    let mut list = notebook.outputs(cell);
    if output < list.len() {
        list[output] = value;
        let count = notebook.json()["cells"][cell]["execution_count"].as_u64().map(|n| n as usize);
        notebook.set_outputs(cell, list, count);
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    fn notebook(cells: &[&str]) -> Notebook {
        let cells: Vec<Value> = cells
            .iter()
            .map(|code| json!({"cell_type": "code", "source": code, "metadata": {}, "outputs": [], "execution_count": null}))
            .collect();
        Notebook::from_json(json!({"nbformat": 4, "nbformat_minor": 5, "metadata": {}, "cells": cells})).unwrap()
    }

    #[test]
    fn stores_streams_results_and_counts() {
        let mut book = notebook(&["print(\"hi\");", "", "40 + 2"]);
        let summary = run_notebook(&mut book, &RunSettings::default());
        assert_eq!(summary.cells_run, 2);
        assert_eq!(book.outputs(0), vec![json!({"output_type": "stream", "name": "stdout", "text": "hi\n"})]);
        assert_eq!(book.json()["cells"][1]["execution_count"], Value::Null);
        assert_eq!(book.outputs(2)[0]["data"]["text/plain"], "42");
        assert_eq!(book.outputs(2)[0]["execution_count"], 2);
        assert_eq!(book.json()["metadata"]["kernelspec"]["name"], "spinfoil");
    }

    #[test]
    fn stops_at_the_first_error_unless_asked_to_keep_going() {
        let mut book = notebook(&["let a = ;", "1"]);
        let summary = run_notebook(&mut book, &RunSettings::default());
        assert_eq!(summary.errors.len(), 1);
        assert_eq!(book.outputs(0)[0]["output_type"], "error");
        assert!(book.outputs(1).is_empty());
        let mut book = notebook(&["let a = ;", "1"]);
        let settings = RunSettings { keep_going: true, ..RunSettings::default() };
        run_notebook(&mut book, &settings);
        assert_eq!(book.outputs(1)[0]["data"]["text/plain"], "1");
    }
}
