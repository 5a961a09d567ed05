//! A heat map of one result over two inputs (e.g. carry over release speed and hyzer angle),
//! with a labelled colour bar.

use super::axes::{self, Plot};
use super::bounds::Bounds;
use super::colour_scale::{scale_colour, wants_dark_text};
use super::data::Axis;
use super::font;
use super::frame::{wrap, Area, Drawn, Frame};
use crate::display::style::{text_width_px, AXIS_INK, CHART_WIDTH_PX, INK, MUTED_INK, SMALL_PX, TEXT_PX, TICK_PX};
use crate::display::Render;
use crate::MimeBundle;
use plotters::element::{EmptyElement, Rectangle, Text};
use plotters::style::text_anchor::{HPos, VPos};
use plotters::style::{Color, RGBColor, WHITE};

const PLOT_HEIGHT_PX: f64 = 320.0;
const BAR_AREA_PX: u32 = 120;
const MISSING: RGBColor = RGBColor(205, 203, 198);
const MAX_LABELLED_CELLS: usize = 80;

/// Values of one result over a grid of two inputs: `values[j][i]` is the result at
/// `y_values[j]`, `x_values[i]`. Non-finite values show as grey "no result" cells.
#[derive(Debug, Clone, PartialEq)]
pub struct HeatMap {
    /// Title.
    pub title: String,
    /// First input (horizontal).
    pub x: Axis,
    /// Second input (vertical).
    pub y: Axis,
    /// The result shown in colour, with its unit.
    pub value: Axis,
    /// Grid values of the first input, ascending.
    pub x_values: Vec<f64>,
    /// Grid values of the second input, ascending.
    pub y_values: Vec<f64>,
    /// Results, one row per `y_values` entry, one column per `x_values` entry.
    pub values: Vec<Vec<f64>>,
}

impl HeatMap {
    /// An empty heat map: title, the two inputs and the result, each with its unit.
    pub fn new(title: impl Into<String>, x: Axis, y: Axis, value: Axis) -> Self {
        let (x_values, y_values, values) = (Vec::new(), Vec::new(), Vec::new());
        Self { title: title.into(), x, y, value, x_values, y_values, values }
    }

    /// Sets the grid: input values (ascending) and results `values[j][i]` at (`x_values[i]`,
    /// `y_values[j]`).
    pub fn grid(mut self, x_values: Vec<f64>, y_values: Vec<f64>, values: Vec<Vec<f64>>) -> Self {
        (self.x_values, self.y_values, self.values) = (x_values, y_values, values);
        self
    }

    fn frame(&self) -> Frame {
        let subtitle = format!("Each cell: {} at one {} and one {}", self.value.label(), self.x.label(), self.y.label());
        let frame = Frame::new(&self.title).subtitle(subtitle);
        if self.cells().any(|(_, _, v)| !v.is_finite()) { frame.caption("Grey cells: no result for that combination.") } else { frame }
    }

    /// Every cell as (i, j, value), within the grid sizes.
    fn cells(&self) -> impl Iterator<Item = (usize, usize, f64)> + '_ {
        let rows = self.values.iter().take(self.y_values.len()).enumerate();
        rows.flat_map(move |(j, row)| row.iter().take(self.x_values.len()).enumerate().map(move |(i, v)| (i, j, *v)))
    }

    /// The chart as SVG.
    pub fn to_svg(&self) -> String {
        let finite = self.cells().map(|(_, _, v)| (v, 0.0));
        let (Some(range), true) = (Bounds::of(finite), self.x_values.len() * self.y_values.len() > 0) else {
            return self.frame().no_data("no finite value in the grid");
        };
        let (xs, ys) = (edges(&self.x_values), edges(&self.y_values));
        let bounds = Bounds { x0: xs[0], x1: xs[xs.len() - 1], y0: ys[0], y1: ys[ys.len() - 1] };
        let value_range = if range.width() > 0.0 { (range.x0, range.x1) } else { (range.x0 - 1.0, range.x1 + 1.0) };
        self.frame().draw(axes::body_px_for_plot(PLOT_HEIGHT_PX), |area| {
            let (left, right) = area.split_horizontally(CHART_WIDTH_PX - BAR_AREA_PX);
            // Ticks at the grid values (the cells' centres) when every value has room for its
            // label; round-number ticks for grids too fine to label cell by cell.
            let (label_x, label_y) = (labels_fit_x(&self.x_values), labels_fit_y(&self.y_values));
            let auto_ticks = (if label_x { 0 } else { 9 }, if label_y { 0 } else { 7 });
            let mut plot = axes::draw_axes_ticked(&left, bounds, (&self.x, &self.y), auto_ticks, axes::BOTTOM_AREA_PX)?;
            self.draw_cells(&mut plot, &xs, &ys, value_range)?;
            let grid_x = if label_x { self.x_values.as_slice() } else { &[] };
            let grid_y = if label_y { self.y_values.as_slice() } else { &[] };
            draw_grid_labels(&mut plot, grid_x, grid_y, bounds)?;
            draw_colour_bar(&right, &self.value, value_range)
        })
    }

    fn draw_cells(&self, plot: &mut Plot, xs: &[f64], ys: &[f64], (low, high): (f64, f64)) -> Drawn {
        let label = self.x_values.len() * self.y_values.len() <= MAX_LABELLED_CELLS;
        for (i, j, value) in self.cells() {
            let colour = if value.is_finite() { scale_colour((value - low) / (high - low)) } else { MISSING };
            plot.draw_series(std::iter::once(Rectangle::new([(xs[i], ys[j]), (xs[i + 1], ys[j + 1])], colour.filled())))?;
            plot.draw_series(std::iter::once(Rectangle::new([(xs[i], ys[j]), (xs[i + 1], ys[j + 1])], WHITE.stroke_width(1))))?;
            if label {
                let ink = if wants_dark_text(colour) { INK } else { WHITE };
                let style = font::anchored(font::text(SMALL_PX, ink), HPos::Center, VPos::Center);
                let centre = (0.5 * (xs[i] + xs[i + 1]), 0.5 * (ys[j] + ys[j + 1]));
                let text = if value.is_finite() { short(value) } else { "no result".to_string() };
                plot.draw_series(std::iter::once(EmptyElement::at(centre) + Text::new(text, (0, 0), style)))?;
            }
        }
        Ok(())
    }
}

/// Pixels of plot width beside the colour bar, for spacing the x labels.
fn plot_width_px() -> f64 {
    axes::plot_px((CHART_WIDTH_PX - BAR_AREA_PX, 0)).0
}

/// Whether every grid value of the x axis has room for its label under its cell.
fn labels_fit_x(xs: &[f64]) -> bool {
    let widest = xs.iter().map(|x| text_width_px(&axes::tick_label(x), TICK_PX)).fold(0.0, f64::max);
    plot_width_px() / xs.len().max(1) as f64 >= widest + 12.0
}

/// Whether every grid value of the y axis has room for its label beside its cell.
fn labels_fit_y(ys: &[f64]) -> bool {
    PLOT_HEIGHT_PX / ys.len().max(1) as f64 >= 2.0 * TICK_PX
}

/// Tick labels at the grid values `xs` under the x axis and `ys` left of the y axis.
fn draw_grid_labels(plot: &mut Plot, xs: &[f64], ys: &[f64], bounds: Bounds) -> Drawn {
    let x_style = font::anchored(font::text(TICK_PX, AXIS_INK), HPos::Center, VPos::Top);
    for x in xs {
        let label = EmptyElement::at((*x, bounds.y0)) + Text::new(axes::tick_label(x), (0, 6), x_style.clone());
        plot.draw_series(std::iter::once(label))?;
    }
    let y_style = font::anchored(font::text(TICK_PX, AXIS_INK), HPos::Right, VPos::Center);
    for y in ys {
        let label = EmptyElement::at((bounds.x0, *y)) + Text::new(axes::tick_label(y), (-6, 0), y_style.clone());
        plot.draw_series(std::iter::once(label))?;
    }
    Ok(())
}

/// Cell edges: halfway between neighbouring grid values, and as far out at both ends.
fn edges(values: &[f64]) -> Vec<f64> {
    if values.len() == 1 {
        return vec![values[0] - 0.5, values[0] + 0.5];
    }
    let mut edges = vec![values[0] - 0.5 * (values[1] - values[0])];
    edges.extend(values.windows(2).map(|w| 0.5 * (w[0] + w[1])));
    let n = values.len();
    edges.push(values[n - 1] + 0.5 * (values[n - 1] - values[n - 2]));
    edges
}

/// A value in 3 significant figures (more for values of 1000 and above).
fn short(value: f64) -> String {
    let magnitude = if value == 0.0 { 0 } else { value.abs().log10().floor() as i32 };
    let decimals = (2 - magnitude).clamp(0, 3) as usize;
    format!("{value:.decimals$}")
}

/// The colour bar: its title, a vertical gradient, and five labelled ticks.
fn draw_colour_bar(area: &Area, value: &Axis, (low, high): (f64, f64)) -> Drawn {
    let (_, height) = area.dim_in_pixel();
    // The title wraps to the bar area's width (a long name with its unit would run off the chart).
    let fits = ((BAR_AREA_PX as f64 - 8.0) / text_width_px("x", TEXT_PX)).max(8.0) as usize;
    let title = wrap(&value.label(), fits);
    let line_px = (TEXT_PX * 1.3).round() as i32;
    for (k, line) in title.iter().enumerate() {
        area.draw(&Text::new(line.clone(), (4, 6 + line_px * k as i32), font::text(TEXT_PX, INK)))?;
    }
    let (top, bottom) = (14 + line_px * title.len() as i32, height as i32 - axes::BOTTOM_AREA_PX as i32);
    let (left, right) = (14, 34);
    let steps = 64;
    for step in 0..steps {
        let y0 = bottom - (bottom - top) * step / steps;
        let y1 = bottom - (bottom - top) * (step + 1) / steps;
        let colour = scale_colour((step as f64 + 0.5) / steps as f64);
        area.draw(&Rectangle::new([(left, y1), (right, y0)], colour.filled()))?;
    }
    area.draw(&Rectangle::new([(left, top), (right, bottom)], MUTED_INK.stroke_width(1)))?;
    for tick in 0..=4 {
        let fraction = tick as f64 / 4.0;
        let y = bottom - ((bottom - top) as f64 * fraction).round() as i32;
        area.draw(&Rectangle::new([(right, y), (right + 4, y + 1)], MUTED_INK.filled()))?;
        let style = font::anchored(font::text(TICK_PX, INK), HPos::Left, VPos::Center);
        area.draw(&Text::new(short(low + fraction * (high - low)), (right + 7, y), style))?;
    }
    Ok(())
}

impl Render for HeatMap {
    fn render(&self) -> MimeBundle {
        let finite: Vec<f64> = self.cells().map(|(_, _, v)| v).filter(|v| v.is_finite()).collect();
        let low = finite.iter().copied().fold(f64::NAN, f64::min);
        let high = finite.iter().copied().fold(f64::NAN, f64::max);
        let summary = format!(
            "{} — {} over {} ({} values) × {} ({} values): {} results, from {low:.3} to {high:.3}",
            self.title, self.value.label(), self.x.label(), self.x_values.len(), self.y.label(), self.y_values.len(), finite.len()
        );
        MimeBundle::plain(summary).with("image/svg+xml", self.to_svg())
    }
}
