//! CSV and JSON exports of a table (full precision; CSV headers as `name_unit`).

use super::{Cell, Table};

/// Errors reading a table back from JSON.
#[derive(Debug, thiserror::Error)]
#[non_exhaustive]
pub enum TableError {
    /// The text is not a table in Spinfoil's JSON form.
    #[error("not a table in Spinfoil's JSON form: {0}")]
    Json(#[from] serde_json::Error),
}

impl Table {
    /// The table as CSV: a header of `name_unit` keys (`carry_m`, `spin_rpm`, `i_z_g_cm2`),
    /// then one line per row; numbers at full precision, non-finite numbers and empty cells
    /// as empty fields, text quoted when needed. Notes are not part of the CSV.
    pub fn to_csv(&self) -> String {
        let header: Vec<String> = self.columns.iter().map(|c| csv_key(&c.name, &c.unit)).collect();
        let mut csv = header.join(",") + "\n";
        for row in 0..self.rows.len() {
            let fields = (0..self.columns.len()).map(|c| csv_field(self.cell(row, c)));
            csv += &(fields.collect::<Vec<_>>().join(",") + "\n");
        }
        csv
    }

    /// The table as JSON: `{"title", "columns": [{"name", "unit", "decimals"}], "rows": [[...]],
    /// "notes": [...]}`; numbers at full precision, non-finite numbers as `null`.
    pub fn to_json(&self) -> String {
        serde_json::to_string(self).unwrap_or_else(|error| format!("{{\"error\":\"{error}\"}}"))
    }

    /// Reads a table back from [`Table::to_json`]'s form.
    pub fn from_json(json: &str) -> Result<Self, TableError> {
        Ok(serde_json::from_str(json)?)
    }
}

/// `name_unit` in lower case ASCII: `carry` + `m` → `carry_m`, `I_z` + `g·cm²` → `i_z_g_cm2`,
/// `speed` + `m/s` → `speed_m_per_s`, `hyzer` + `°` → `hyzer_deg`.
pub fn csv_key(name: &str, unit: &str) -> String {
    let key = if unit.is_empty() { name.to_string() } else { format!("{name}_{unit}") };
    let mut out = String::new();
    for c in key.chars().flat_map(char::to_lowercase) {
        out.push_str(&ascii_for(c));
    }
    collapse_underscores(&out)
}

fn ascii_for(c: char) -> String {
    match c {
        'a'..='z' | '0'..='9' => c.to_string(),
        '²' => "2".into(),
        '³' => "3".into(),
        '/' => "_per_".into(),
        '°' => "deg".into(),
        '%' => "pct".into(),
        'α' => "alpha".into(),
        'ω' => "omega".into(),
        _ => "_".into(),
    }
}

fn collapse_underscores(key: &str) -> String {
    let parts: Vec<&str> = key.split('_').filter(|part| !part.is_empty()).collect();
    parts.join("_")
}

fn csv_field(cell: &Cell) -> String {
    match cell {
        Cell::Number(value) if value.is_finite() => format!("{value}"),
        Cell::Number(_) | Cell::Empty => String::new(),
        Cell::Text(text) if text.contains([',', '"', '\n', '\r']) => {
            format!("\"{}\"", text.replace('"', "\"\""))
        }
        Cell::Text(text) => text.clone(),
        Cell::Count(n) => n.to_string(),
    }
}
