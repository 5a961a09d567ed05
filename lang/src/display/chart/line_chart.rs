//! A line chart of labelled series against shared axes; also the drawing of series that the
//! side view, the coefficient curves and the time-series panels share.

use super::axes::{self, Plot};
use super::bounds::Bounds;
use super::data::{Axis, Series};
use super::frame::{Drawn, Frame};
use super::legend::{is_dashed, series_swatch, LegendEntry};
use crate::display::style::series_colour;
use crate::display::Render;
use crate::MimeBundle;
use super::fine_path::{draw_line, Dash, Stroke};
use plotters::element::{Circle, PathElement};
use plotters::style::{Color, RGBColor};

const PLOT_HEIGHT_PX: f64 = 330.0;
/// Width of a data line in pixels.
pub(crate) const LINE_WIDTH_PX: f64 = 2.0;

/// Several labelled series against one x axis and one y axis, e.g. speed against time for
/// several flights. Non-finite points are skipped; no finite point gives a "no data" chart.
#[derive(Debug, Clone, PartialEq)]
pub struct LineChart {
    /// Title.
    pub title: String,
    /// Optional subtitle (context, sources).
    pub subtitle: Option<String>,
    /// Horizontal axis.
    pub x: Axis,
    /// Vertical axis.
    pub y: Axis,
    /// The series, each in its own colour.
    pub series: Vec<Series>,
    /// Draws a line at y = 0 when it lies inside the range.
    pub zero_line: bool,
}

impl LineChart {
    /// An empty line chart with a title and axes.
    pub fn new(title: impl Into<String>, x: Axis, y: Axis) -> Self {
        Self { title: title.into(), subtitle: None, x, y, series: Vec::new(), zero_line: false }
    }

    /// Adds a series.
    pub fn series(mut self, series: Series) -> Self {
        self.series.push(series);
        self
    }

    fn frame(&self) -> Frame {
        let frame = Frame::new(&self.title).legend(line_legend(&self.series));
        match &self.subtitle {
            Some(subtitle) => frame.subtitle(subtitle.clone()),
            None => frame,
        }
    }

    /// The chart as SVG.
    pub fn to_svg(&self) -> String {
        let Some(bounds) = series_bounds(&self.series) else {
            return self.frame().no_data("no finite points in any series");
        };
        let bounds = if self.zero_line { bounds.including_y(0.0) } else { bounds };
        let bounds = bounds.padded(0.04, 1.0);
        self.frame().draw(axes::body_px_for_plot(PLOT_HEIGHT_PX), |area| {
            let mut plot = axes::draw_axes(area, bounds, &self.x, &self.y)?;
            if self.zero_line {
                draw_zero_line(&mut plot, bounds)?;
            }
            draw_series(&mut plot, &self.series, |index| index, false)
        })
    }
}

impl Render for LineChart {
    fn render(&self) -> MimeBundle {
        let summary = series_summary(&self.title, &self.x, &self.y, &self.series);
        MimeBundle::plain(summary).with("image/svg+xml", self.to_svg())
    }
}

/// The legend of a set of series: one line swatch per series, in series colours.
pub(crate) fn line_legend(series: &[Series]) -> Vec<LegendEntry> {
    let entries = series.iter().enumerate();
    entries.map(|(index, s)| LegendEntry::new(series_swatch(index), s.label.clone())).collect()
}

/// The bounds of every finite point of the series.
pub(crate) fn series_bounds(series: &[Series]) -> Option<Bounds> {
    Bounds::of(series.iter().flat_map(|s| s.finite_points()))
}

/// Draws each series in the style of palette slot `slot(index)` (its colour, dashed past the
/// palette's length): a line, or a dot for a single point. Non-finite points are left out.
/// `layered` draws the first series widest and each later one narrower, for series that may
/// coincide (flights of nearly equal discs): the earlier ones then show as a coloured edge.
pub(crate) fn draw_series(plot: &mut Plot, series: &[Series], slot: impl Fn(usize) -> usize, layered: bool) -> Drawn {
    for (index, one) in series.iter().enumerate() {
        let points = one.finite_points();
        let colour = series_colour(slot(index));
        if points.len() == 1 {
            plot.draw_series(std::iter::once(Circle::new(points[0], 4, colour.filled())))?;
            continue;
        }
        let width_px = if layered { layered_width_px(index, series.len()) } else { LINE_WIDTH_PX };
        let stroke = Stroke::solid(colour, width_px);
        draw_line(plot, &points, if is_dashed(slot(index)) { stroke.dashed(Dash::DASHED) } else { stroke })?;
    }
    Ok(())
}

/// The width in pixels of line `index` of `count` layered lines: from 3.5 px for the first (drawn
/// first, at the bottom) down to 2 px for the last; 2 px for a single line.
pub(crate) fn layered_width_px(index: usize, count: usize) -> f64 {
    if count <= 1 {
        return LINE_WIDTH_PX;
    }
    let share = (count - 1 - index.min(count - 1)) as f64 / (count - 1) as f64;
    LINE_WIDTH_PX + 1.5 * share
}

/// A thin dark line along y = 0 across the plot.
pub(crate) fn draw_zero_line(plot: &mut Plot, bounds: Bounds) -> Drawn {
    let line = vec![(bounds.x0, 0.0), (bounds.x1, 0.0)];
    plot.draw_series(std::iter::once(PathElement::new(line, RGBColor(120, 120, 126).stroke_width(1))))?;
    Ok(())
}

/// A few lines of text describing the series: counts and ranges.
pub(crate) fn series_summary(title: &str, x: &Axis, y: &Axis, series: &[Series]) -> String {
    let mut lines = vec![format!("{title}: {} against {}, {} series", y.label(), x.label(), series.len())];
    for one in series {
        lines.push(match Bounds::of(one.finite_points()) {
            Some(b) => format!(
                "  {}: {} points, {} {:.3} to {:.3}, {} {:.3} to {:.3}",
                one.label, one.finite_points().len(), x.title, b.x0, b.x1, y.title, b.y0, b.y1
            ),
            None => format!("  {}: no finite points", one.label),
        });
    }
    lines.join("\n")
}
