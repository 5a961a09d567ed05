//! The `Study` value: a table of results, a chart and notes, shown together.
use crate::help::{FnDoc, Registrar};
use crate::output::{MimeBundle, INLINE_CHART_CLOSE, INLINE_CHART_OPEN};
use crate::packages::charts::ChartValue;
use crate::{Cell, Render, Table};
use rhai::{Array, Dynamic, Map};

/// A study's result as scripts hold it: its table (rows readable) and its chart.
#[derive(Debug, Clone)]
pub(crate) struct StudyValue {
    /// The results, with units in the column headers.
    pub table: Table,
    /// The chart's rendering (SVG and a text summary).
    pub chart: MimeBundle,
    /// A calibration's fitted inputs (`model.*` name, value); empty for other studies.
    pub fitted: Vec<(String, f64)>,
}

impl StudyValue {
    /// A result from its table and chart.
    pub fn new(table: Table, chart: &impl Render) -> Self {
        Self { table, chart: chart.render(), fitted: Vec::new() }
    }

    /// Table and chart in one display: the table's text, HTML and JSON, the chart's SVG inline
    /// in the HTML below the table (notebooks show both; terminals print the table).
    pub fn render(&self) -> MimeBundle {
        let table = self.table.render();
        let svg = self.chart.data.get("image/svg+xml").cloned().unwrap_or_default();
        let text = format!("{}\n{}", table.text_plain().unwrap_or_default(), self.chart.text_plain().unwrap_or_default());
        let table_html = table.data.get("text/html").cloned().unwrap_or_default();
        let html = format!("{table_html}\n{INLINE_CHART_OPEN}{svg}{INLINE_CHART_CLOSE}");
        // No image/svg+xml part (a notebook would show the chart twice); a terminal saves the
        // chart from the HTML (MimeBundle::inline_chart_svg). The JSON part lets it export the table.
        let json = table.data.get("application/json").cloned().unwrap_or_default();
        MimeBundle::plain(text).with("text/html", html).with("application/json", json)
    }

    /// The rows as maps keyed by `column_unit` (e.g. `carry_m`).
    pub fn rows(&self) -> Array {
        let keys: Vec<String> = self.table.columns.iter().map(|c| row_key(&c.name, &c.unit)).collect();
        self.table
            .rows
            .iter()
            .map(|row| {
                let map: Map = keys
                    .iter()
                    .zip(row)
                    .map(|(k, cell)| {
                        let value = match cell {
                            Cell::Number(x) => Dynamic::from_float(*x),
                            Cell::Count(n) => Dynamic::from_float(*n as f64),
                            Cell::Text(t) => Dynamic::from(t.clone()),
                            Cell::Empty => Dynamic::UNIT,
                        };
                        (k.as_str().into(), value)
                    })
                    .collect();
                Dynamic::from_map(map)
            })
            .collect()
    }
}

/// A column's key in row maps: its name in snake case, then its unit in words (`carry_m`).
pub(crate) fn row_key(name: &str, unit: &str) -> String {
    let unit = match unit {
        "" | "1" => String::new(),
        "m/s" => "mps".into(),
        "°" => "deg".into(),
        "%" => "pct".into(),
        "rev/s" => "rps".into(),
        u => ascii_key(&u.replace('³', "3").replace('²', "2").replace('µ', "u")),
    };
    let name = ascii_key(name);
    if name.ends_with(&format!("_{unit}")) || unit.is_empty() { name } else { format!("{name}_{unit}") }
}

/// `text` in lower case with every character but ASCII letters and digits turned into `_`, so a
/// key reads as `row.key` in scripts (`g/cm³` gives `g_cm3`).
fn ascii_key(text: &str) -> String {
    text.chars().map(|c| if c.is_ascii_alphanumeric() { c.to_ascii_lowercase() } else { '_' }).collect()
}

/// Registers the `Study` type and its fields.
pub(crate) fn register(reg: &mut Registrar) {
    reg.engine.register_type_with_name::<StudyValue>("Study");
    reg.getter("Study", "rows", "the result rows as maps keyed by column and unit (e.g. carry_m)", |s: &mut StudyValue| s.rows());
    reg.getter("Study", "table", "the result table", |s: &mut StudyValue| s.table.clone());
    reg.getter("Study", "chart", "the study's chart", |s: &mut StudyValue| ChartValue { bundle: s.chart.clone() });
    reg.engine.register_fn("to_csv", |s: &mut StudyValue| s.table.to_csv());
    reg.doc(FnDoc::new(
        "to_csv(study: Study) -> string",
        "The study's result table as CSV text (headers carry units).",
        "save_text(sweep(d, t, environment(), #{ input: \"throw.speed_mps\", from: 16, to: 28, count: 4 }).to_csv(), \"sweep.csv\");",
    ));
    reg.text(|s: &mut StudyValue| s.render().text_plain().unwrap_or_default().to_string());
}

/// Registers `study_inputs` and `study_metrics`: what studies can vary and report.
pub(crate) fn register_catalogues(reg: &mut Registrar) {
    reg.engine.register_fn("study_inputs", || catalogue("Study inputs", "input", spinfoil_engine::INPUTS));
    reg.doc(FnDoc::new(
        "study_inputs() -> Table",
        "The inputs a sweep, dispersion, calibration or best_release can vary, with their units and meanings.",
        "study_inputs()",
    ));
    reg.engine.register_fn("study_metrics", || catalogue("Study metrics", "metric", spinfoil_engine::METRICS));
    reg.doc(FnDoc::new("study_metrics() -> Table", "The metrics a sweep can report, with their units and meanings.", "study_metrics()"));
}

fn catalogue(title: &str, what: &str, rows: &[(&str, &str, &str)]) -> Table {
    let table = Table::new(title).column(what, "", 0).column("unit", "", 0).column("meaning", "", 0);
    rows.iter().fold(table, |t, (name, unit, meaning)| t.row(vec![Cell::from(*name), Cell::from(*unit), Cell::from(*meaning)]))
}

/// The meaning of an input (`throw.speed_mps` → `release speed`), for chart axes.
pub(crate) fn input_title(input: &str) -> String {
    spinfoil_engine::INPUTS.iter().find(|(n, ..)| *n == input).map_or_else(|| input.to_string(), |(_, _, m)| m.to_string())
}
