//! Our legend: a strip of entries above the plot, wrapped into rows, never over the data.

use super::fine_path::Dash;
use super::font;
use super::frame::{Area, Drawn};
use super::marker::{draw_marker, Marker};
use super::track_marks::THROWER_TRIANGLE;
use crate::display::style::{series_colour, text_width_px, CHART_WIDTH_PX, INK, SERIES_COLOURS, TEXT_PX};
use plotters::element::{Circle, PathElement, Polygon, Rectangle, Text};
use plotters::style::text_anchor::{HPos, VPos};
use plotters::style::{Color, RGBColor, WHITE};

/// Left edge of the legend and title, in pixels.
pub(crate) const LEFT_PX: i32 = 16;
/// Height of one legend row, in pixels.
pub(crate) const ROW_PX: i32 = 22;
const SWATCH_PX: i32 = 20;
const GAP_PX: i32 = 22;

/// What an entry's swatch looks like.
#[derive(Debug, Clone, Copy, PartialEq)]
pub(crate) enum Swatch {
    /// A line (a series).
    Line(RGBColor),
    /// A filled block (an area, a bar, a material).
    Block(RGBColor),
    /// A filled dot (a landing point, a scatter point).
    Dot(RGBColor),
    /// A hollow square (a rest point).
    Square(RGBColor),
    /// The thrower's triangle, pointing right, as drawn at the release point.
    Thrower(RGBColor),
    /// A plus-shaped cross (a mean).
    Cross(RGBColor),
    /// A line in a dash pattern (a kind of line, keyed apart from the series' colours).
    Stroke(RGBColor, Dash),
    /// A short line with a point marker on it (a series drawn with markers).
    Marked(RGBColor, Marker),
}

/// One legend entry.
#[derive(Debug, Clone, PartialEq)]
pub(crate) struct LegendEntry {
    /// Its swatch.
    pub swatch: Swatch,
    /// Its label.
    pub label: String,
    /// Starts a new row (e.g. the first of a second kind of entry).
    pub new_row: bool,
}

impl LegendEntry {
    /// An entry.
    pub fn new(swatch: Swatch, label: impl Into<String>) -> Self {
        Self { swatch, label: label.into(), new_row: false }
    }

    /// The same entry at the start of a new row.
    pub fn on_new_row(self) -> Self {
        Self { new_row: true, ..self }
    }
}

/// The swatch of series number `index`: solid in the first round of the palette, dashed after
/// (in the dashes the lines are drawn with).
pub(crate) fn series_swatch(index: usize) -> Swatch {
    let colour = series_colour(index);
    if is_dashed(index) { Swatch::Stroke(colour, Dash::DASHED) } else { Swatch::Line(colour) }
}

/// Series past the palette's length repeat its colours as dashed lines.
pub(crate) fn is_dashed(index: usize) -> bool {
    index >= SERIES_COLOURS.len()
}

/// The left-top position of every entry, relative to the legend's origin.
fn layout(entries: &[LegendEntry]) -> Vec<(i32, i32)> {
    let right_edge = CHART_WIDTH_PX as i32 - LEFT_PX;
    let (mut x, mut y) = (LEFT_PX, 0);
    let mut places = Vec::with_capacity(entries.len());
    for entry in entries {
        let width = SWATCH_PX + 6 + text_width_px(&entry.label, TEXT_PX) as i32;
        if x > LEFT_PX && (entry.new_row || x + width > right_edge) {
            (x, y) = (LEFT_PX, y + ROW_PX);
        }
        places.push((x, y));
        x += width + GAP_PX;
    }
    places
}

/// Height in pixels that `entries` take (0 when there is none).
pub(crate) fn height(entries: &[LegendEntry]) -> i32 {
    layout(entries).last().map_or(0, |(_, y)| y + ROW_PX)
}

/// Draws the entries with their top at `top` pixels.
pub(crate) fn draw(area: &Area, entries: &[LegendEntry], top: i32) -> Drawn {
    for (entry, (x, y)) in entries.iter().zip(layout(entries)) {
        let middle = top + y + ROW_PX / 2;
        draw_swatch(area, entry.swatch, (x, middle))?;
        let style = font::anchored(font::text(TEXT_PX, INK), HPos::Left, VPos::Center);
        area.draw(&Text::new(entry.label.clone(), (x + SWATCH_PX + 6, middle), style))?;
    }
    Ok(())
}

fn draw_swatch(area: &Area, swatch: Swatch, (x, y): (i32, i32)) -> Drawn {
    let centre = (x + SWATCH_PX / 2, y);
    match swatch {
        Swatch::Line(c) => area.draw(&PathElement::new(vec![(x, y), (x + SWATCH_PX, y)], c.stroke_width(3)))?,
        Swatch::Block(c) => area.draw(&Rectangle::new([(x + 2, y - 6), (x + SWATCH_PX - 2, y + 6)], c.filled()))?,
        Swatch::Dot(c) => area.draw(&Circle::new(centre, 5, c.filled()))?,
        Swatch::Square(c) => area.draw(&Rectangle::new([(centre.0 - 5, y - 5), (centre.0 + 5, y + 5)], c.stroke_width(2)))?,
        Swatch::Thrower(c) => {
            let corners: Vec<(i32, i32)> = THROWER_TRIANGLE.iter().map(|(dx, dy)| (centre.0 - 2 + dx, y + dy)).collect();
            area.draw(&Polygon::new(corners, c.filled()))?
        }
        Swatch::Cross(c) => {
            area.draw(&PathElement::new(vec![(centre.0 - 6, y), (centre.0 + 6, y)], c.stroke_width(2)))?;
            area.draw(&PathElement::new(vec![(centre.0, y - 6), (centre.0, y + 6)], c.stroke_width(2)))?;
        }
        Swatch::Stroke(c, dash) => draw_dashes(area, c, dash, (x, y))?,
        Swatch::Marked(c, marker) => {
            area.draw(&PathElement::new(vec![(x, y), (x + SWATCH_PX, y)], c.stroke_width(2)))?;
            draw_marker(area, centre, (marker, 5), c, WHITE)?;
        }
    }
    Ok(())
}

/// A line across the swatch in `dash`'s pattern, 3 px wide.
fn draw_dashes(area: &Area, colour: RGBColor, dash: Dash, (x, y): (i32, i32)) -> Drawn {
    let (on, off) = match dash {
        Dash::Solid => (SWATCH_PX, 0),
        Dash::Pattern(on, off) => ((on.round() as i32).max(1), (off.round() as i32).max(1)),
    };
    let mut start = x;
    while start < x + SWATCH_PX {
        let end = (start + on).min(x + SWATCH_PX);
        area.draw(&PathElement::new(vec![(start, y), (end, y)], colour.stroke_width(3)))?;
        start = end + off;
    }
    Ok(())
}

