//! A terminal [`OutputSink`]: text as text, tables aligned, charts written as SVG files,
//! optional CSV/JSON copies of tables, progress bars for updating displays.
use super::progress::ProgressBoard;
use spinfoil_lang::{MimeBundle, OutputSink, Table};
use std::io::Write;
use std::path::{Path, PathBuf};
use std::sync::atomic::{AtomicUsize, Ordering};
use std::sync::Mutex;

/// Copies of table results written beside the charts.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum TableExport {
    /// Comma-separated values with a units header.
    Csv,
    /// The table's JSON (columns with units, rows).
    Json,
}

/// Prints to the terminal and writes files into one output folder.
pub struct TerminalSink {
    out_dir: PathBuf,
    export: Option<TableExport>,
    counter: AtomicUsize,
    progress: ProgressBoard,
    written: Mutex<Vec<PathBuf>>,
    failures: AtomicUsize,
}

impl TerminalSink {
    /// A sink writing charts (and table copies when `export` is set) into `out_dir`.
    pub fn new(out_dir: &Path, export: Option<TableExport>) -> Self {
        Self {
            out_dir: out_dir.to_path_buf(),
            export,
            counter: AtomicUsize::new(0),
            progress: ProgressBoard::default(),
            written: Mutex::new(Vec::new()),
            failures: AtomicUsize::new(0),
        }
    }

    /// Shows a cell's result like a display.
    pub fn show_result(&self, bundle: &MimeBundle) {
        self.display(bundle, None);
    }

    /// Ends the progress bars of the cell that just finished.
    pub fn end_cell(&self) {
        self.progress.finish_all();
    }

    /// Files written so far.
    pub fn written(&self) -> Vec<PathBuf> {
        self.written.lock().map(|w| w.clone()).unwrap_or_default()
    }

    /// Number of files that could not be written.
    pub fn failures(&self) -> usize {
        self.failures.load(Ordering::SeqCst)
    }

    fn write_file(&self, name: String, content: &str) -> Option<PathBuf> {
        let path = self.out_dir.join(name);
        let done = std::fs::create_dir_all(&self.out_dir).and_then(|_| std::fs::write(&path, content));
        match done {
            Ok(()) => {
                if let Ok(mut written) = self.written.lock() {
                    written.push(path.clone());
                }
                Some(path)
            }
            Err(error) => {
                self.failures.fetch_add(1, Ordering::SeqCst);
                eprintln!("spinfoil: cannot write {}: {error}", path.display());
                None
            }
        }
    }

    fn export_table(&self, bundle: &MimeBundle, number: usize) {
        let (Some(format), Some(json)) = (self.export, bundle.data.get("application/json")) else { return };
        let Ok(table) = Table::from_json(json) else { return };
        let path = match format {
            TableExport::Csv => self.write_file(format!("table-{number:03}.csv"), &table.to_csv()),
            TableExport::Json => self.write_file(format!("table-{number:03}.json"), &table.to_json()),
        };
        if let Some(path) = path {
            println!("(table saved to {})", path.display());
        }
    }
}

impl OutputSink for TerminalSink {
    fn stdout(&self, text: &str) {
        print!("{text}");
        let _ = std::io::stdout().flush();
    }

    fn stderr(&self, text: &str) {
        eprint!("{text}");
    }

    fn display(&self, bundle: &MimeBundle, display_id: Option<&str>) {
        if let Some(id) = display_id {
            return self.progress.show(bundle, id);
        }
        let number = self.counter.fetch_add(1, Ordering::SeqCst) + 1;
        let plain = bundle.text_plain().unwrap_or_default();
        if let Some(svg) = bundle.data.get("image/svg+xml") {
            if let Some(path) = self.write_file(format!("chart-{number:03}.svg"), svg) {
                let mut lines = plain.lines();
                println!("{} (chart saved to {})", lines.next().unwrap_or("chart"), path.display());
                // The rest of the text form (summaries, notes, the safety caution) stays visible.
                for line in lines {
                    println!("{line}");
                }
            }
            return;
        }
        println!("{plain}");
        self.export_table(bundle, number);
        // A study's display: its table above, its chart inside the HTML.
        if let Some(svg) = bundle.inline_chart_svg() {
            if let Some(path) = self.write_file(format!("chart-{number:03}.svg"), svg) {
                println!("(chart saved to {})", path.display());
            }
        }
    }

    fn update_display(&self, bundle: &MimeBundle, display_id: &str) {
        self.progress.show(bundle, display_id);
    }
}
