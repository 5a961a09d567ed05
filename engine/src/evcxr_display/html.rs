//! A small HTML table of named quantities with units (pure string building).

/// Rows of (quantity, value, unit) rendered as an HTML table or aligned plain text.
#[derive(Debug, Clone, Default, PartialEq)]
pub struct QuantityTable {
    /// Caption above the table (plain text; escaped when rendered).
    pub caption: String,
    /// Rows: quantity name, formatted value, unit (all plain text).
    pub rows: Vec<(String, String, String)>,
    /// A note under the table (plain text), e.g. the model's source or a caution.
    pub notes: Vec<String>,
}

impl QuantityTable {
    /// An empty table with a caption.
    pub fn new(caption: impl Into<String>) -> Self {
        Self { caption: caption.into(), ..Self::default() }
    }

    /// Adds a row; `value` is formatted with `decimals` digits after the point.
    pub fn row(mut self, quantity: &str, value: f64, decimals: usize, unit: &str) -> Self {
        self.rows.push((quantity.to_string(), format!("{value:.decimals$}"), unit.to_string()));
        self
    }

    /// Adds a row whose value is already text (e.g. "none").
    pub fn text_row(mut self, quantity: &str, value: &str, unit: &str) -> Self {
        self.rows.push((quantity.to_string(), value.to_string(), unit.to_string()));
        self
    }

    /// Adds a note under the table.
    pub fn note(mut self, note: impl Into<String>) -> Self {
        self.notes.push(note.into());
        self
    }

    /// The table as an HTML fragment (every text escaped).
    pub fn to_html(&self) -> String {
        let mut out = String::from("<table class=\"spinfoil-quantities\" style=\"border-collapse:collapse\">");
        out.push_str(&format!("<caption style=\"text-align:left;font-weight:bold\">{}</caption>", escape(&self.caption)));
        out.push_str("<thead><tr><th style=\"text-align:left\">quantity</th><th style=\"text-align:right\">value</th><th style=\"text-align:left\">unit</th></tr></thead><tbody>");
        for (quantity, value, unit) in &self.rows {
            out.push_str(&format!(
                "<tr><td style=\"text-align:left\">{}</td><td style=\"text-align:right;font-variant-numeric:tabular-nums\">{}</td><td style=\"text-align:left\">{}</td></tr>",
                escape(quantity),
                escape(value),
                escape(unit)
            ));
        }
        out.push_str("</tbody></table>");
        for note in &self.notes {
            out.push_str(&format!("<p style=\"font-size:smaller\">{}</p>", escape(note)));
        }
        out
    }

    /// The table as aligned plain text (the `text/plain` fallback).
    pub fn to_text(&self) -> String {
        let width = self.rows.iter().map(|r| r.0.chars().count()).max().unwrap_or(0);
        let value_width = self.rows.iter().map(|r| r.1.chars().count()).max().unwrap_or(0);
        let mut out = format!("{}\n", self.caption);
        for (quantity, value, unit) in &self.rows {
            out.push_str(&format!("  {quantity:<width$}  {value:>value_width$} {unit}\n"));
        }
        for note in &self.notes {
            out.push_str(&format!("  {note}\n"));
        }
        out.trim_end().to_string()
    }
}

/// Escapes `&`, `<`, `>` and `"` for HTML text and attribute values.
pub(crate) fn escape(text: &str) -> String {
    let mut out = String::with_capacity(text.len());
    for c in text.chars() {
        match c {
            '&' => out.push_str("&amp;"),
            '<' => out.push_str("&lt;"),
            '>' => out.push_str("&gt;"),
            '"' => out.push_str("&quot;"),
            _ => out.push(c),
        }
    }
    out
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn rows_carry_units_and_text_is_escaped() {
        let table = QuantityTable::new("a <b> & c").row("carry", 61.234, 1, "m").note("x < y");
        let html = table.to_html();
        assert!(html.contains("a &lt;b&gt; &amp; c"));
        assert!(html.contains("<td style=\"text-align:right;font-variant-numeric:tabular-nums\">61.2</td><td style=\"text-align:left\">m</td>"));
        assert!(html.contains("x &lt; y"));
        assert_eq!(table.to_text(), "a <b> & c\n  carry  61.2 m\n  x < y");
    }
}
