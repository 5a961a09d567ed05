//! The table model: columns, cells, rows, notes, and a builder.

use serde::{Deserialize, Serialize};

/// One column: a name, its unit (empty for text or dimensionless columns) and the number of
/// decimals its numbers are shown with.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct Column {
    /// Name, e.g. `carry`.
    pub name: String,
    /// Unit, e.g. `m`, `g·cm²`; empty when the column is text or dimensionless.
    pub unit: String,
    /// Decimals shown in text and HTML (exports keep full precision). Default 2.
    pub decimals: usize,
}

/// One cell: a number (shown with its column's decimals), text, or nothing.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(untagged)]
pub enum Cell {
    /// A number in the column's unit. Non-finite numbers show as a dash and export as empty.
    Number(f64),
    /// Text, shown as is (escaped in HTML).
    Text(String),
    /// A count (throws, flights), shown as a whole number whatever the column's decimals;
    /// exported and read back as a number.
    Count(u64),
    /// No value.
    Empty,
}

impl From<f64> for Cell {
    fn from(value: f64) -> Self {
        Cell::Number(value)
    }
}

impl From<&str> for Cell {
    fn from(value: &str) -> Self {
        Cell::Text(value.to_string())
    }
}

impl From<String> for Cell {
    fn from(value: String) -> Self {
        Cell::Text(value)
    }
}

impl Cell {
    /// The cell as shown in text and HTML, with `decimals` decimals for numbers.
    pub fn shown(&self, decimals: usize) -> String {
        match self {
            Cell::Number(value) if value.is_finite() => format!("{value:.decimals$}"),
            Cell::Number(_) | Cell::Empty => "—".to_string(),
            Cell::Text(text) => text.clone(),
            Cell::Count(n) => n.to_string(),
        }
    }

    /// True for numbers (they are right-aligned).
    pub fn is_number(&self) -> bool {
        matches!(self, Cell::Number(_) | Cell::Count(_))
    }
}

/// A table of results with a title, columns with units, rows and notes (sources, warnings,
/// the safety caution).
///
/// ```
/// use spinfoil_lang::{Render, Table};
/// let table = Table::new("Carry of two prototypes")
///     .column("design", "", 0)
///     .column("carry", "m", 1)
///     .row(vec!["P-7 one-piece".into(), 98.24.into()])
///     .row(vec!["P-7 rim-heavy".into(), 101.5.into()]);
/// assert!(table.to_csv().starts_with("design,carry_m\n"));
/// assert!(table.render().data.contains_key("text/html"));
/// ```
#[derive(Debug, Clone, PartialEq, Default, Serialize, Deserialize)]
pub struct Table {
    /// Title shown above the table.
    pub title: String,
    /// Columns, in order.
    pub columns: Vec<Column>,
    /// Rows; a row shorter than the columns is padded with empty cells when shown.
    pub rows: Vec<Vec<Cell>>,
    /// Notes shown under the table (sources, warnings, cautions).
    #[serde(default)]
    pub notes: Vec<String>,
}

impl Table {
    /// An empty table with a title.
    pub fn new(title: impl Into<String>) -> Self {
        Self { title: title.into(), ..Self::default() }
    }

    /// Adds a column with its unit and the decimals its numbers are shown with.
    pub fn column(mut self, name: impl Into<String>, unit: impl Into<String>, decimals: usize) -> Self {
        self.columns.push(Column { name: name.into(), unit: unit.into(), decimals });
        self
    }

    /// Adds a row of cells.
    pub fn row(mut self, cells: Vec<Cell>) -> Self {
        self.rows.push(cells);
        self
    }

    /// Adds a note shown under the table.
    pub fn note(mut self, note: impl Into<String>) -> Self {
        self.notes.push(note.into());
        self
    }

    /// The cell at (`row`, `column`), empty where the row is short.
    pub fn cell(&self, row: usize, column: usize) -> &Cell {
        self.rows.get(row).and_then(|cells| cells.get(column)).unwrap_or(&Cell::Empty)
    }

    /// Every cell of row `row` as shown, one per column.
    pub(crate) fn shown_row(&self, row: usize) -> Vec<String> {
        let columns = self.columns.iter().enumerate();
        columns.map(|(index, column)| self.cell(row, index).shown(column.decimals)).collect()
    }

    /// True when column `column` holds numbers (right-aligned).
    pub(crate) fn is_numeric(&self, column: usize) -> bool {
        (0..self.rows.len()).any(|row| self.cell(row, column).is_number())
    }
}
