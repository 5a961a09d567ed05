//! The self-contained `text/html` form of a table (inline styles, every text escaped).

use super::Table;

const TABLE_STYLE: &str = "border-collapse:collapse;font-family:'DejaVu Sans',Helvetica,Arial,\
sans-serif;font-size:13px;margin:4px 0";
const CAPTION_STYLE: &str = "caption-side:top;text-align:left;font-weight:bold;font-size:14px;\
padding:4px 0 6px 0";
const NAME_STYLE: &str = "padding:4px 10px 0 10px;border-bottom:none;font-weight:bold";
const UNIT_STYLE: &str = "padding:0 10px 4px 10px;border-bottom:2px solid rgba(128,128,128,0.8);\
font-weight:normal;opacity:0.7;font-size:12px";
const CELL_STYLE: &str = "padding:3px 10px;border-bottom:1px solid rgba(128,128,128,0.25)";
const NOTE_STYLE: &str = "font-size:12px;opacity:0.75;margin:2px 0";

impl Table {
    /// The table as a self-contained HTML fragment: a caption, a header row of names, a units
    /// row, the body (numbers right-aligned in tabular figures) and the notes below.
    pub fn to_html(&self) -> String {
        let mut html = format!("<div class=\"spinfoil-table\">\n<table style=\"{TABLE_STYLE}\">\n");
        html += &format!("<caption style=\"{CAPTION_STYLE}\">{}</caption>\n", escape(&self.title));
        html += &self.html_header();
        html += "<tbody>\n";
        for row in 0..self.rows.len() {
            html += &self.html_row(row);
        }
        html += "</tbody>\n</table>\n";
        for note in &self.notes {
            html += &format!("<p style=\"{NOTE_STYLE}\">{}</p>\n", escape(note));
        }
        html + "</div>"
    }

    fn html_header(&self) -> String {
        let cells = |text: &dyn Fn(usize) -> String, style: &str| -> String {
            let cells = (0..self.columns.len()).map(|c| {
                format!("<th style=\"{style};text-align:{}\">{}</th>", self.align(c), escape(&text(c)))
            });
            cells.collect::<Vec<_>>().join("")
        };
        let names = cells(&|c| self.columns[c].name.clone(), NAME_STYLE);
        let units = cells(&|c| self.columns[c].unit.clone(), UNIT_STYLE);
        format!("<thead>\n<tr>{names}</tr>\n<tr>{units}</tr>\n</thead>\n")
    }

    fn html_row(&self, row: usize) -> String {
        let shown = self.shown_row(row);
        let cells = shown.iter().enumerate().map(|(c, text)| {
            let style = format!("{CELL_STYLE};text-align:{}", self.align(c));
            let figures = if self.is_numeric(c) { ";font-variant-numeric:tabular-nums" } else { "" };
            format!("<td style=\"{style}{figures}\">{}</td>", escape(text))
        });
        format!("<tr>{}</tr>\n", cells.collect::<Vec<_>>().join(""))
    }

    fn align(&self, column: usize) -> &'static str {
        if self.is_numeric(column) { "right" } else { "left" }
    }
}

/// Escapes text for HTML content and attribute values.
pub(crate) fn escape(text: &str) -> String {
    let mut escaped = String::with_capacity(text.len());
    for c in text.chars() {
        match c {
            '&' => escaped.push_str("&amp;"),
            '<' => escaped.push_str("&lt;"),
            '>' => escaped.push_str("&gt;"),
            '"' => escaped.push_str("&quot;"),
            '\'' => escaped.push_str("&#39;"),
            other => escaped.push(other),
        }
    }
    escaped
}
