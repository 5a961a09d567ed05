//! The aligned `text/plain` form of a table.

use super::Table;

impl Table {
    /// The table as aligned text: title, header, a units row in brackets (left out when no
    /// column has a unit), a rule, the rows
    /// (numbers right-aligned, text left-aligned) and the notes.
    pub fn to_text(&self) -> String {
        let header: Vec<String> = self.columns.iter().map(|c| c.name.clone()).collect();
        let units: Vec<String> = self.columns.iter().map(|c| unit_label(&c.unit)).collect();
        let body: Vec<Vec<String>> = (0..self.rows.len()).map(|r| self.shown_row(r)).collect();
        let widths = column_widths(&header, &units, &body);
        let mut lines = vec![self.title.clone()];
        lines.push(self.text_line(&header, &widths, false));
        if units.iter().any(|u| !u.is_empty()) {
            lines.push(self.text_line(&units, &widths, false));
        }
        lines.push(widths.iter().map(|w| "─".repeat(*w)).collect::<Vec<_>>().join("  "));
        lines.extend(body.iter().map(|row| self.text_line(row, &widths, true)));
        lines.extend(self.notes.iter().map(|note| format!("Note: {note}")));
        lines.join("\n")
    }

    fn text_line(&self, cells: &[String], widths: &[usize], body: bool) -> String {
        let padded = cells.iter().zip(widths).enumerate().map(|(column, (cell, width))| {
            let fill = " ".repeat(width.saturating_sub(cell.chars().count()));
            let right = self.is_numeric(column) && (body || !cell.is_empty());
            if right { format!("{fill}{cell}") } else { format!("{cell}{fill}") }
        });
        padded.collect::<Vec<_>>().join("  ").trim_end().to_string()
    }
}

/// `[m]` for a unit, empty for none.
fn unit_label(unit: &str) -> String {
    if unit.is_empty() { String::new() } else { format!("[{unit}]") }
}

/// The widest entry of each column, in characters.
fn column_widths(header: &[String], units: &[String], body: &[Vec<String>]) -> Vec<usize> {
    let width = |text: &String| text.chars().count();
    let rows = std::iter::once(header).chain(std::iter::once(units)).chain(body.iter().map(Vec::as_slice));
    let mut widths = vec![0; header.len()];
    for row in rows {
        for (slot, cell) in widths.iter_mut().zip(row) {
            *slot = (*slot).max(width(cell));
        }
    }
    widths
}
