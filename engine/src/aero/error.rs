//! Typed errors of the aerodynamics module.
use thiserror::Error;

/// What can be wrong with a coefficient set, a table, its CSV text or a disc shape.
#[derive(Debug, Clone, PartialEq, Error)]
#[non_exhaustive]
pub enum AeroError {
    /// A value is NaN or infinite.
    #[error("{field} must be a finite number, got {value}")]
    NotFinite {
        /// Name of the offending field, with its unit.
        field: String,
        /// The value given.
        value: f64,
    },
    /// A value lies outside its allowed range.
    #[error("{field} = {value} is out of range: allowed {min} to {max}")]
    OutOfRange {
        /// Name of the offending field, with its unit.
        field: String,
        /// The value given.
        value: f64,
        /// Smallest allowed value.
        min: f64,
        /// Largest allowed value.
        max: f64,
    },
    /// A table has too few rows (grid points) along one axis.
    #[error("the table needs at least {min} {axis} values, got {found}")]
    TooFewRows {
        /// Which axis ("angle of attack", "advance ratio").
        axis: String,
        /// Rows found.
        found: usize,
        /// Rows needed.
        min: usize,
    },
    /// A table column has a different length than the grid needs.
    #[error("column {column} has {found} values, the grid needs {expected}")]
    ColumnLength {
        /// Column name.
        column: String,
        /// Values found.
        found: usize,
        /// Values expected.
        expected: usize,
    },
    /// Grid values are not strictly increasing.
    #[error("{}{column} = {value} does not increase on the previous value {previous} (values must be strictly increasing)", at_line(*.line))]
    NotIncreasing {
        /// Line of the CSV text (1-based; 0 for tables built in code).
        line: usize,
        /// Column name.
        column: String,
        /// The offending value.
        value: f64,
        /// The value before it.
        previous: f64,
    },
    /// The CSV text has no header line.
    #[error("the CSV text is empty: expected a header such as `alpha_deg,lift,drag,pitch`")]
    EmptyCsv,
    /// The header lacks a required column.
    #[error("line {line}: missing column {column} (the header needs an angle `alpha_deg` or `alpha_rad`, and `lift`, `drag`, `pitch`)")]
    MissingColumn {
        /// Header line.
        line: usize,
        /// The missing column.
        column: String,
    },
    /// The header names a column we do not know, or names one twice.
    #[error("line {line}, column {column}: unknown or repeated column name `{name}` (known: alpha_deg, alpha_rad, advance_ratio, lift, drag, pitch, roll, spin)")]
    BadColumnName {
        /// Header line.
        line: usize,
        /// 1-based column.
        column: usize,
        /// The name found.
        name: String,
    },
    /// A data line has the wrong number of fields.
    #[error("line {line}: expected {expected} comma-separated values, found {found}")]
    FieldCount {
        /// Line of the CSV text (1-based).
        line: usize,
        /// Fields in the header.
        expected: usize,
        /// Fields on this line.
        found: usize,
    },
    /// A field is not a finite number.
    #[error("line {line}, column {column} ({name}): `{text}` is not a finite number")]
    BadNumber {
        /// Line of the CSV text (1-based).
        line: usize,
        /// 1-based column.
        column: usize,
        /// Column name.
        name: String,
        /// The text found.
        text: String,
    },
    /// With an advance-ratio column, every advance ratio must list the same angles of attack.
    #[error("line {line}: the angles of attack for advance ratio {advance_ratio} differ from those of the first advance ratio (each advance ratio needs the same alpha grid)")]
    GridMismatch {
        /// Line of the CSV text where the mismatch shows.
        line: usize,
        /// The advance ratio of the offending block.
        advance_ratio: f64,
    },
}

/// "line N: " for CSV positions, nothing for tables built in code (line 0).
fn at_line(line: usize) -> String {
    if line == 0 {
        String::new()
    } else {
        format!("line {line}: ")
    }
}

/// Checks that `value` is finite and within `min..=max`.
pub(crate) fn check_range(field: &str, value: f64, min: f64, max: f64) -> Result<(), AeroError> {
    if !value.is_finite() {
        return Err(AeroError::NotFinite { field: field.to_string(), value });
    }
    if value < min || value > max {
        return Err(AeroError::OutOfRange { field: field.to_string(), value, min, max });
    }
    Ok(())
}
