//! Time series as small multiples: one panel per quantity (each with its own unit), stacked
//! over a shared time axis (or another shared x axis, for sweeps), one colour per flight across
//! all panels.

use super::axes;
use super::bounds::Bounds;
use super::data::{Axis, Series};
use super::frame::{Area, Drawn, Frame};
use super::legend::{series_swatch, LegendEntry};
use super::line_chart::{draw_series, draw_zero_line, series_bounds, series_summary};
use crate::display::Render;
use crate::MimeBundle;

const PANEL_PLOT_PX: f64 = 130.0;
/// The default shared x axis.
const TIME_TITLE: &str = "time since release";
/// Room under a panel that is not the last one: tick labels only.
const INNER_BOTTOM_PX: u32 = 26;

/// One panel: a quantity with its unit and one series per flight (x = time in s).
#[derive(Debug, Clone, PartialEq)]
pub struct Panel {
    /// The quantity and its unit, e.g. `Axis::new("spin", "rpm")`.
    pub quantity: Axis,
    /// One series per flight; the same label gets the same colour in every panel.
    pub series: Vec<Series>,
}

impl Panel {
    /// An empty panel for a quantity.
    pub fn new(quantity: Axis) -> Self {
        Self { quantity, series: Vec::new() }
    }

    /// Adds a flight's series: points (time s, value in the panel's unit).
    pub fn series(mut self, series: Series) -> Self {
        self.series.push(series);
        self
    }
}

/// Several quantities against time (speed, spin, roll, angle of attack, wobble), one panel each.
#[derive(Debug, Clone, PartialEq)]
pub struct TimeSeries {
    /// Title.
    pub title: String,
    /// The panels, top to bottom.
    pub panels: Vec<Panel>,
    /// The shared x axis: time since release (s) unless set with [`TimeSeries::against`].
    pub x_axis: Axis,
}

impl TimeSeries {
    /// An empty time-series chart with a title.
    pub fn new(title: impl Into<String>) -> Self {
        Self { title: title.into(), panels: Vec::new(), x_axis: Axis::new(TIME_TITLE, "s") }
    }

    /// The same small multiples against another shared x axis (e.g. a swept input).
    pub fn against(mut self, x_axis: Axis) -> Self {
        self.x_axis = x_axis;
        self
    }

    /// Adds a panel.
    pub fn panel(mut self, panel: Panel) -> Self {
        self.panels.push(panel);
        self
    }

    fn against_time(&self) -> bool {
        self.x_axis.title == TIME_TITLE
    }

    /// Every series label in order of first appearance (their colour order).
    fn labels(&self) -> Vec<String> {
        let mut labels: Vec<String> = Vec::new();
        for series in self.panels.iter().flat_map(|p| &p.series) {
            if !labels.contains(&series.label) {
                labels.push(series.label.clone());
            }
        }
        labels
    }

    fn frame(&self) -> Frame {
        let legend = self.labels().into_iter().enumerate();
        let entries = legend.map(|(index, label)| LegendEntry::new(series_swatch(index), label));
        let frame = Frame::new(&self.title).legend(entries.collect());
        // A single panel needs no word on how the panels are laid out.
        if self.panels.len() <= 1 {
            frame
        } else if self.against_time() {
            frame.subtitle("One panel per quantity, all on the same time axis")
        } else {
            frame.subtitle(format!("One panel per quantity (each with its own scale), all against {}", self.x_axis.title))
        }
    }

    /// The chart as SVG.
    pub fn to_svg(&self) -> String {
        let panels: Vec<(&Panel, Bounds)> =
            self.panels.iter().filter_map(|p| series_bounds(&p.series).map(|b| (p, b))).collect();
        let Some(time) = Bounds::of(panels.iter().flat_map(|(_, b)| [(b.x0, 0.0), (b.x1, 0.0)])) else {
            return self.frame().no_data("no finite points in any panel");
        };
        let time = time.padded(0.0, 0.5);
        let labels = self.labels();
        let inner_px = PANEL_PLOT_PX as u32 + axes::TOP_MARGIN_PX + INNER_BOTTOM_PX;
        let body_px = axes::body_px_for_plot(PANEL_PLOT_PX) + inner_px * (panels.len() as u32 - 1);
        self.frame().draw(body_px, |area| {
            let mut rest = area.clone();
            for (index, (panel, bounds)) in panels.iter().enumerate() {
                let last = index + 1 == panels.len();
                let (cell, below) = if last { (rest.clone(), rest.clone()) } else { rest.split_vertically(inner_px) };
                rest = below;
                let bounds = Bounds { x0: time.x0, x1: time.x1, ..bounds.padded(0.04, 1.0) };
                self.draw_panel(&cell, panel, bounds, &labels, last)?;
            }
            Ok(())
        })
    }

    fn draw_panel(&self, cell: &Area, panel: &Panel, bounds: Bounds, labels: &[String], last: bool) -> Drawn {
        let (time_axis, bottom_px) =
            if last { (self.x_axis.clone(), axes::BOTTOM_AREA_PX) } else { (Axis::new("", ""), INNER_BOTTOM_PX) };
        let mut plot = axes::draw_axes_with(cell, bounds, &time_axis, &panel.quantity, (9, bottom_px))?;
        if bounds.y0 < 0.0 && bounds.y1 > 0.0 {
            draw_zero_line(&mut plot, bounds)?;
        }
        let slot = |index: usize| {
            let label = &panel.series[index].label;
            labels.iter().position(|l| l == label).unwrap_or(index)
        };
        draw_series(&mut plot, &panel.series, slot, true)
    }
}

impl Render for TimeSeries {
    fn render(&self) -> MimeBundle {
        let time = if self.against_time() { Axis::new("time", "s") } else { self.x_axis.clone() };
        let mut lines = vec![format!("{} — {} panel(s) against {}", self.title, self.panels.len(), time.label())];
        for panel in &self.panels {
            lines.push(series_summary(&panel.quantity.label(), &time, &panel.quantity, &panel.series));
        }
        let summary = lines.join("\n");
        MimeBundle::plain(summary).with("image/svg+xml", self.to_svg())
    }
}
