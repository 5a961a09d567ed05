//! Cartesian axes in our style: paper-toned plot area, light grid, axis titles with units.

use super::bounds::Bounds;
use super::data::Axis;
use super::font;
use super::frame::Area;
use crate::display::style::*;
use plotters::chart::{ChartBuilder, ChartContext};
use plotters::coord::types::RangedCoordf64;
use plotters::prelude::{Cartesian2d, SVGBackend};
use plotters::style::Color;

/// A chart with f64 axes on the SVG backend.
pub(crate) type Plot<'a, 'b> = ChartContext<'a, SVGBackend<'b>, Cartesian2d<RangedCoordf64, RangedCoordf64>>;

/// Pixels left of the plot for tick labels and the y-axis title.
pub(crate) const LEFT_AREA_PX: u32 = 70;
/// Pixels between the chart's left edge and the y-axis title.
pub(crate) const LEFT_MARGIN_PX: u32 = 6;
/// Pixels under the plot for tick labels and the x-axis title.
pub(crate) const BOTTOM_AREA_PX: u32 = 48;
/// Pixels above and right of the plot.
pub(crate) const TOP_MARGIN_PX: u32 = 8;
/// Pixels right of the plot.
pub(crate) const RIGHT_MARGIN_PX: u32 = 28;

/// The plot's size in pixels inside a body of `body` (width, height) pixels.
pub(crate) fn plot_px(body: (u32, u32)) -> (f64, f64) {
    let width = body.0.saturating_sub(LEFT_MARGIN_PX + LEFT_AREA_PX + RIGHT_MARGIN_PX);
    let height = body.1.saturating_sub(BOTTOM_AREA_PX + TOP_MARGIN_PX);
    (width as f64, height as f64)
}

/// The body height in pixels that holds a plot `plot_height` pixels high.
pub(crate) fn body_px_for_plot(plot_height: f64) -> u32 {
    plot_height.round() as u32 + BOTTOM_AREA_PX + TOP_MARGIN_PX
}

/// Builds axes over `bounds` in `area`, draws the plot background, grid, ticks and titles.
pub(crate) fn draw_axes<'a, 'b>(area: &'a Area<'b>, bounds: Bounds, x: &Axis, y: &Axis) -> Result<Plot<'a, 'b>, Box<dyn std::error::Error>> {
    draw_axes_with(area, bounds, x, y, (9, BOTTOM_AREA_PX))
}

/// As [`draw_axes`], with about `x_ticks` labelled ticks on the x axis (0: none, for charts
/// that label categories themselves) and `bottom_px` pixels under the plot for them.
pub(crate) fn draw_axes_with<'a, 'b>(
    area: &'a Area<'b>,
    bounds: Bounds,
    x: &Axis,
    y: &Axis,
    (x_ticks, bottom_px): (usize, u32),
) -> Result<Plot<'a, 'b>, Box<dyn std::error::Error>> {
    draw_axes_ticked(area, bounds, (x, y), (x_ticks, 7), bottom_px)
}

/// As [`draw_axes_with`], with `y_ticks` labels on the y axis too (0: none, the caller labels
/// its own values, as a heat map labels its grid values).
pub(crate) fn draw_axes_ticked<'a, 'b>(
    area: &'a Area<'b>,
    bounds: Bounds,
    (x, y): (&Axis, &Axis),
    (x_ticks, y_ticks): (usize, usize),
    bottom_px: u32,
) -> Result<Plot<'a, 'b>, Box<dyn std::error::Error>> {
    let mut chart = ChartBuilder::on(area)
        .margin_top(TOP_MARGIN_PX)
        .margin_left(LEFT_MARGIN_PX)
        .margin_right(RIGHT_MARGIN_PX)
        .x_label_area_size(bottom_px)
        .y_label_area_size(LEFT_AREA_PX)
        .build_cartesian_2d(bounds.x0..bounds.x1, bounds.y0..bounds.y1)?;
    chart.plotting_area().fill(&PLOT_BACKGROUND)?;
    chart
        .configure_mesh()
        .x_desc(x.label())
        .y_desc(y.label())
        .x_labels(x_ticks)
        .y_labels(y_ticks)
        .x_label_formatter(&tick_label)
        .y_label_formatter(&tick_label)
        .axis_desc_style(font::text(TEXT_PX, INK))
        .label_style(font::text(TICK_PX, AXIS_INK))
        .bold_line_style(GRID.stroke_width(1))
        .light_line_style(GRID_MINOR.stroke_width(1))
        .axis_style(AXIS_INK.stroke_width(1))
        .draw()?;
    Ok(chart)
}

/// A tick value with no more decimals than it needs (at most 3), and no "-0".
pub(crate) fn tick_label(value: &f64) -> String {
    let rounded = (value * 1000.0).round() / 1000.0;
    let text = format!("{rounded:.3}");
    let text = text.trim_end_matches('0').trim_end_matches('.');
    if text == "-0" { "0".to_string() } else { text.to_string() }
}
