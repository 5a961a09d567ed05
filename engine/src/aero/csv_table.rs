//! Coefficient tables from CSV text (the hosts read the file; no IO here).
//!
//! Format: one header line naming the columns, then one line per grid point; blank lines and
//! lines starting with `#` are skipped; fields separated by commas, surrounding spaces ignored.
//! Columns (case-insensitive, any order):
//! - `alpha_deg` or `alpha_rad` (required, exactly one): angle of attack;
//! - `lift`, `drag`, `pitch` (required): C_L, C_D (≥ 0), C_M (positive nose-up);
//! - `roll`, `spin` (optional): moment coefficients for counter-clockwise spin (ω_s > 0);
//! - `advance_ratio` (optional): |ω_s|R/V. With it, the lines come in blocks of equal advance
//!   ratio (increasing from block to block), each block listing the same increasing α grid.
use super::error::AeroError;
use super::model::ModelInfo;
use super::table::{CoefficientColumns, TabulatedCoefficients};

/// What a header column means.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
enum Column {
    AlphaDeg,
    AlphaRad,
    AdvanceRatio,
    Lift,
    Drag,
    Pitch,
    Roll,
    Spin,
}

impl Column {
    fn parse(name: &str) -> Option<Self> {
        Some(match name.to_ascii_lowercase().as_str() {
            "alpha_deg" => Self::AlphaDeg,
            "alpha_rad" => Self::AlphaRad,
            "advance_ratio" => Self::AdvanceRatio,
            "lift" => Self::Lift,
            "drag" => Self::Drag,
            "pitch" => Self::Pitch,
            "roll" => Self::Roll,
            "spin" => Self::Spin,
            _ => return None,
        })
    }
}

/// One parsed data line: its line number and its values in header order.
struct Row {
    line: usize,
    values: Vec<f64>,
}

/// The header's columns and the line it stood on.
struct Header {
    line: usize,
    columns: Vec<Column>,
    names: Vec<String>,
}

impl Header {
    fn position(&self, column: Column) -> Option<usize> {
        self.columns.iter().position(|c| *c == column)
    }

    fn require(&self, column: Column, name: &str) -> Result<usize, AeroError> {
        self.position(column).ok_or_else(|| AeroError::MissingColumn { line: self.line, column: name.to_string() })
    }
}

impl TabulatedCoefficients {
    /// Parses CSV text (see the module docs of the format) into a table labelled `info`.
    /// Errors name the line and column of bad numbers, missing columns and non-increasing grids.
    pub fn from_csv(text: &str, info: ModelInfo) -> Result<Self, AeroError> {
        let mut lines = text
            .lines()
            .enumerate()
            .map(|(i, l)| (i + 1, l.trim()))
            .filter(|(_, l)| !l.is_empty() && !l.starts_with('#'));
        let (header_line, header_text) = lines.next().ok_or(AeroError::EmptyCsv)?;
        let header = parse_header(header_line, header_text)?;
        let rows = lines.map(|(line, text)| parse_row(&header, line, text)).collect::<Result<Vec<_>, _>>()?;
        build_table(&header, &rows, info)
    }
}

fn parse_header(line: usize, text: &str) -> Result<Header, AeroError> {
    let names: Vec<String> = text.split(',').map(|n| n.trim().to_string()).collect();
    let mut columns = Vec::with_capacity(names.len());
    for (i, name) in names.iter().enumerate() {
        match Column::parse(name) {
            Some(column) if !columns.contains(&column) => columns.push(column),
            _ => return Err(AeroError::BadColumnName { line, column: i + 1, name: name.clone() }),
        }
    }
    if columns.contains(&Column::AlphaDeg) && columns.contains(&Column::AlphaRad) {
        let column = columns.iter().position(|c| *c == Column::AlphaRad).map_or(0, |i| i + 1);
        return Err(AeroError::BadColumnName { line, column, name: "alpha_rad (alpha_deg given too)".into() });
    }
    Ok(Header { line, columns, names })
}

fn parse_row(header: &Header, line: usize, text: &str) -> Result<Row, AeroError> {
    let fields: Vec<&str> = text.split(',').map(str::trim).collect();
    if fields.len() != header.columns.len() {
        return Err(AeroError::FieldCount { line, expected: header.columns.len(), found: fields.len() });
    }
    let parse = |(i, field): (usize, &&str)| match field.parse::<f64>() {
        Ok(value) if value.is_finite() => Ok(value),
        _ => Err(AeroError::BadNumber { line, column: i + 1, name: header.names[i].clone(), text: field.to_string() }),
    };
    let values = fields.iter().enumerate().map(parse).collect::<Result<Vec<_>, _>>()?;
    Ok(Row { line, values })
}

/// The α column in rad, with its position.
fn alpha_column(header: &Header) -> Result<(usize, f64), AeroError> {
    match (header.position(Column::AlphaDeg), header.position(Column::AlphaRad)) {
        (Some(i), _) => Ok((i, 1f64.to_radians())),
        (None, Some(i)) => Ok((i, 1.0)),
        (None, None) => Err(AeroError::MissingColumn { line: header.line, column: "alpha_deg".into() }),
    }
}

fn build_table(header: &Header, rows: &[Row], info: ModelInfo) -> Result<TabulatedCoefficients, AeroError> {
    let (alpha_at, to_rad) = alpha_column(header)?;
    let lift = header.require(Column::Lift, "lift")?;
    let drag = header.require(Column::Drag, "drag")?;
    let pitch = header.require(Column::Pitch, "pitch")?;
    let column = |at: usize| rows.iter().map(|r| r.values[at]).collect::<Vec<f64>>();
    let optional = |c: Column| header.position(c).map(column);
    let columns = CoefficientColumns {
        lift: column(lift),
        drag: column(drag),
        pitch: column(pitch),
        roll: optional(Column::Roll),
        spin: optional(Column::Spin),
    };
    check_drag(rows, drag)?;
    let alpha_name = &header.names[alpha_at];
    let (alpha_rad, advance) = match header.position(Column::AdvanceRatio) {
        None => (increasing(rows, alpha_at, alpha_name)?, Vec::new()),
        Some(at) => grid_blocks(rows, alpha_at, at, alpha_name)?,
    };
    let alpha_rad = alpha_rad.into_iter().map(|a| a * to_rad).collect();
    TabulatedCoefficients::with_advance_ratio(info, alpha_rad, advance, columns)
}

fn check_drag(rows: &[Row], at: usize) -> Result<(), AeroError> {
    match rows.iter().find(|r| r.values[at] < 0.0) {
        Some(row) => Err(AeroError::OutOfRange {
            field: format!("drag on line {}", row.line),
            value: row.values[at],
            min: 0.0,
            max: f64::INFINITY,
        }),
        None => Ok(()),
    }
}

/// The values of column `at` over `rows`, checked strictly increasing (errors name the line).
fn increasing(rows: &[Row], at: usize, name: &str) -> Result<Vec<f64>, AeroError> {
    for pair in rows.windows(2) {
        let (previous, value) = (pair[0].values[at], pair[1].values[at]);
        if value <= previous {
            return Err(AeroError::NotIncreasing { line: pair[1].line, column: name.to_string(), value, previous });
        }
    }
    Ok(rows.iter().map(|r| r.values[at]).collect())
}

/// Splits rows into blocks of equal advance ratio; checks the blocks share one α grid.
fn grid_blocks(rows: &[Row], alpha_at: usize, advance_at: usize, alpha_name: &str) -> Result<(Vec<f64>, Vec<f64>), AeroError> {
    let blocks: Vec<&[Row]> = rows.chunk_by(|a, b| a.values[advance_at] == b.values[advance_at]).collect();
    let firsts: Vec<Row> = blocks.iter().map(|b| Row { line: b[0].line, values: b[0].values.clone() }).collect();
    let advance = increasing(&firsts, advance_at, "advance_ratio")?;
    let alpha = increasing(blocks.first().copied().unwrap_or(&[]), alpha_at, alpha_name)?;
    for block in blocks.iter().skip(1) {
        let same_length = block.len() == alpha.len();
        if let Some(row) = block.iter().zip(&alpha).find(|(r, a)| r.values[alpha_at] != **a).map(|(r, _)| r) {
            return Err(AeroError::GridMismatch { line: row.line, advance_ratio: row.values[advance_at] });
        }
        if !same_length {
            let row = &block[block.len().min(alpha.len()) - 1];
            return Err(AeroError::GridMismatch { line: row.line, advance_ratio: row.values[advance_at] });
        }
    }
    Ok((alpha, advance))
}
