//! Displays: tables and charts that render themselves as MIME bundles.
//!
//! Every displayable value implements [`Render`]. Tables render aligned `text/plain`,
//! self-contained `text/html` with a units row and `application/json`; charts render
//! `image/svg+xml` (drawn with `plotters`) plus a short `text/plain` summary. All of them take
//! plain data (numbers and labels), never engine types.

mod chart;
mod style;
mod table;

pub use chart::*;
pub use style::{series_colour, SAFETY_CAUTION, SERIES_COLOURS};
pub use table::{Cell, Column, Table, TableError};

use crate::MimeBundle;

/// A value that shows itself: a table, a chart, a result.
pub trait Render {
    /// Renders the value as a MIME bundle (always with `text/plain`).
    fn render(&self) -> MimeBundle;
}
