//! Rich displays of engine results for Rust notebook cells (feature `evcxr-display`, off by
//! default).
//!
//! Rust notebook cells run through evcxr, which shows the value of a cell's last expression by
//! calling an inherent method `evcxr_display(&self)` when the type has one. That method must
//! print blocks to standard output:
//!
//! ```text
//! EVCXR_BEGIN_CONTENT text/html
//! <table>…</table>
//! EVCXR_END_CONTENT
//! ```
//!
//! Spinfoil's kernel turns such blocks into Jupyter displays with their MIME type, and a stock
//! evcxr notebook shows them the same way. The method has to be inherent (a trait would need a
//! `use` in every cell), so it lives in this crate, on the result types themselves.
//!
//! Why a printing method in a pure engine: everything here is pure string formatting
//! ([`MassProperties::to_html`], [`FlightMetrics::to_html`], [`Flight::to_html`],
//! [`Flight::path_chart`]), testable without IO; the only IO is the single `print!` in each
//! `evcxr_display` that evcxr's protocol requires, and it is compiled only with the feature,
//! which the workspace's own crates never enable (Rust cells ask for it in their `:dep` line).
//!
//! Tables are HTML with units in every row; charts are SVG. Flight charts carry the safety
//! caution ([`SAFETY_CAUTION`]).
//!
//! [`MassProperties::to_html`]: crate::MassProperties::to_html
//! [`FlightMetrics::to_html`]: crate::FlightMetrics::to_html
//! [`Flight::to_html`]: crate::Flight::to_html
//! [`Flight::path_chart`]: crate::Flight::path_chart
mod html;
mod path_chart;
mod results;

pub use html::QuantityTable;
pub use path_chart::FlightPathChart;

/// The caution shown beside any output that could guide where people stand.
pub const SAFETY_CAUTION: &str = "Predictions are estimates. Keep clear of the throwing lane, check landing zones \
for people and property, and follow local rules and the course designer's safety guidance.";

/// Writes one evcxr content block per `(mime, content)` pair to standard output (evcxr's display
/// protocol; the only printing in the engine, and only with the `evcxr-display` feature).
pub fn print_evcxr_blocks(blocks: &[(&str, &str)]) {
    let mut text = String::new();
    for (mime, content) in blocks {
        text.push_str(&evcxr_block(mime, content));
    }
    print!("{text}");
}

/// One evcxr content block: `EVCXR_BEGIN_CONTENT mime`, the content, `EVCXR_END_CONTENT`.
pub fn evcxr_block(mime: &str, content: &str) -> String {
    format!("EVCXR_BEGIN_CONTENT {mime}\n{}\nEVCXR_END_CONTENT\n", content.trim_end_matches('\n'))
}
