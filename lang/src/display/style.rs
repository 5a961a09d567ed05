//! Spinfoil's visual style: palette, ink colours, fonts and sizes shared by every chart.
//!
//! The series palette is the colour-blind-safe set of Okabe & Ito (2008), "Color Universal
//! Design (CUD): how to make figures and presentations that are friendly to colorblind people",
//! reordered so the first colours contrast most on white. The layout (title strip, legend strip
//! above the plot, captions and caution lines below it) is our own.

use plotters::style::RGBColor;

/// Width of every chart in pixels: readable at notebook width (~720–800 px).
pub const CHART_WIDTH_PX: u32 = 760;

/// Font family list written into the SVG (the viewer picks the first one it has).
pub const FONT_FAMILY: &str = "DejaVu Sans, Helvetica, Arial, sans-serif";

/// Series colours, in order of use (Okabe–Ito, colour-blind safe).
pub const SERIES_COLOURS: [RGBColor; 7] = [
    RGBColor(0, 114, 178),   // blue
    RGBColor(213, 94, 0),    // vermillion
    RGBColor(0, 158, 115),   // bluish green
    RGBColor(204, 121, 167), // reddish purple
    RGBColor(230, 159, 0),   // orange
    RGBColor(86, 180, 233),  // sky blue
    RGBColor(60, 60, 60),    // near black
];

/// Main text colour (titles, axis titles).
pub const INK: RGBColor = RGBColor(34, 34, 38);
/// Secondary text colour (subtitles, captions, units).
pub const MUTED_INK: RGBColor = RGBColor(105, 105, 112);
/// Axis lines and tick labels.
pub const AXIS_INK: RGBColor = RGBColor(80, 80, 86);
/// Major grid lines.
pub const GRID: RGBColor = RGBColor(226, 223, 216);
/// Minor grid lines.
pub const GRID_MINOR: RGBColor = RGBColor(241, 239, 234);
/// Background of the plotting area (a warm paper tone).
pub const PLOT_BACKGROUND: RGBColor = RGBColor(252, 251, 248);
/// Colour of the safety caution text.
pub const CAUTION_INK: RGBColor = RGBColor(150, 60, 0);

/// Title size in pixels.
pub const TITLE_PX: f64 = 17.0;
/// Subtitle, legend and axis-title size in pixels.
pub const TEXT_PX: f64 = 13.0;
/// Tick-label size in pixels.
pub const TICK_PX: f64 = 12.0;
/// Caption and caution size in pixels.
pub const SMALL_PX: f64 = 11.5;

/// The colour of series number `index` (cycles through [`SERIES_COLOURS`]).
pub fn series_colour(index: usize) -> RGBColor {
    SERIES_COLOURS[index % SERIES_COLOURS.len()]
}

/// Rough width in pixels of `text` set at `size_px` in a sans-serif font (for layout).
pub fn text_width_px(text: &str, size_px: f64) -> f64 {
    text.chars().count() as f64 * size_px * 0.58
}

/// The safety caution shown under every landing-zone chart and table.
pub const SAFETY_CAUTION: &str = "Predictions are estimates. Keep clear of the throwing lane, \
check landing zones for people and property, and follow local rules and the course designer's \
safety guidance.";
