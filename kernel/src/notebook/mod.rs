//! Notebooks without Jupyter: nbformat 4 documents, the headless runner and the HTML report.
mod document;
mod outputs;
mod report;
mod runner;

pub use document::{multiline_text, CellView, Notebook, NotebookError};
pub use outputs::{display_data, error, execute_result, stream};
pub use report::{escape, html_report, markdown_to_html, SAFETY_CAUTION};
pub use runner::{run_notebook, RunSettings, RunSummary};
