//! Grouped bars comparing mass properties of several designs (e.g. I_z and I_x per design),
//! every bar labelled with its value.

use super::axes::{self, Plot};
use super::bounds::Bounds;
use super::data::Axis;
use super::font;
use super::frame::{Drawn, Frame};
use super::legend::{LegendEntry, Swatch};
use crate::display::style::{series_colour, AXIS_INK, INK, MUTED_INK, SMALL_PX, TEXT_PX};
use crate::display::Render;
use crate::MimeBundle;
use plotters::element::{EmptyElement, Rectangle, Text};
use plotters::style::text_anchor::{HPos, VPos};
use plotters::style::Color;

const PLOT_HEIGHT_PX: f64 = 280.0;
const GROUP_FILL: f64 = 0.76;

/// One design's values, one per quantity, in the chart's unit.
#[derive(Debug, Clone, PartialEq)]
pub struct BarGroup {
    /// Design name.
    pub label: String,
    /// One value per quantity (non-finite values leave a gap labelled "n/a").
    pub values: Vec<f64>,
}

/// Grouped bars: for each design a group with one bar per quantity, all in one unit,
/// e.g. quantities `["I_z (spin)", "I_x (wobble)"]` in g·cm².
#[derive(Debug, Clone, PartialEq)]
pub struct MassBars {
    /// Title.
    pub title: String,
    /// What the bars measure and their unit, e.g. `Axis::new("moment of inertia", "g·cm²")`.
    pub measure: Axis,
    /// Quantity names, one colour each.
    pub quantities: Vec<String>,
    /// The designs, left to right.
    pub groups: Vec<BarGroup>,
    /// Decimals of the value labels.
    pub decimals: usize,
}

impl MassBars {
    /// An empty comparison: title, measure with unit, quantity names.
    pub fn new(title: impl Into<String>, measure: Axis, quantities: Vec<String>) -> Self {
        Self { title: title.into(), measure, quantities, groups: Vec::new(), decimals: 0 }
    }

    /// Adds a design with one value per quantity.
    pub fn group(mut self, label: impl Into<String>, values: Vec<f64>) -> Self {
        self.groups.push(BarGroup { label: label.into(), values });
        self
    }

    fn frame(&self) -> Frame {
        let entries = self.quantities.iter().enumerate();
        let legend = entries.map(|(index, q)| LegendEntry::new(Swatch::Block(series_colour(index)), q.clone()));
        let frame = Frame::new(&self.title).legend(legend.collect());
        let measure = capitalised(&self.measure.label());
        frame.subtitle(format!("{measure} per design; grey: change against the first design"))
    }

    fn finite_values(&self) -> impl Iterator<Item = f64> + '_ {
        self.groups.iter().flat_map(|g| g.values.iter().copied()).filter(|v| v.is_finite())
    }

    /// The chart as SVG.
    pub fn to_svg(&self) -> String {
        let Some(values) = Bounds::of(self.finite_values().map(|v| (0.0, v))) else {
            return self.frame().no_data("no finite value in any group");
        };
        let top = values.y1.max(0.0);
        let low = values.y0.min(0.0);
        let span = (top - low).max(1e-9);
        let bounds = Bounds { x0: 0.0, x1: self.groups.len() as f64, y0: low - 0.02 * span, y1: top + 0.2 * span };
        self.frame().draw(axes::body_px_for_plot(PLOT_HEIGHT_PX), |area| {
            let mut plot = axes::draw_axes_with(area, bounds, &Axis::new("", ""), &self.measure, (0, axes::BOTTOM_AREA_PX))?;
            for (index, group) in self.groups.iter().enumerate() {
                self.draw_group(&mut plot, index, group, bounds)?;
            }
            Ok(())
        })
    }

    fn draw_group(&self, plot: &mut Plot, index: usize, group: &BarGroup, bounds: Bounds) -> Drawn {
        let count = self.quantities.len().max(1) as f64;
        let width = GROUP_FILL / count;
        let start = index as f64 + 0.5 * (1.0 - GROUP_FILL);
        for (q, value) in group.values.iter().enumerate().take(self.quantities.len()) {
            let left = start + q as f64 * width;
            let centre = left + 0.5 * width;
            let label_style = font::anchored(font::text(SMALL_PX, INK), HPos::Center, VPos::Bottom);
            if value.is_finite() {
                let bar = Rectangle::new([(left + 0.06 * width, 0.0), (left + 0.94 * width, *value)], series_colour(q).filled());
                plot.draw_series(std::iter::once(bar))?;
                let top = (centre, value.max(0.0));
                let text = format!("{value:.prec$}", prec = self.decimals);
                plot.draw_series(std::iter::once(EmptyElement::at(top) + Text::new(text, (0, -3), label_style)))?;
                if let Some(change) = self.change_label(index, q, *value) {
                    let style = font::anchored(font::text(SMALL_PX, MUTED_INK), HPos::Center, VPos::Bottom);
                    plot.draw_series(std::iter::once(EmptyElement::at(top) + Text::new(change, (0, -18), style)))?;
                }
            } else {
                plot.draw_series(std::iter::once(EmptyElement::at((centre, 0.0)) + Text::new("n/a", (0, -3), label_style)))?;
            }
        }
        let name_style = font::anchored(font::text(TEXT_PX, AXIS_INK), HPos::Center, VPos::Top);
        let name = EmptyElement::at((index as f64 + 0.5, bounds.y0)) + Text::new(group.label.clone(), (0, 8), name_style);
        plot.draw_series(std::iter::once(name))?;
        Ok(())
    }
}

impl MassBars {
    /// For designs after the first: the change against the first design, e.g. `+12.4 %`.
    fn change_label(&self, group: usize, quantity: usize, value: f64) -> Option<String> {
        let first = self.groups.first().and_then(|g| g.values.get(quantity)).copied()?;
        (group > 0 && first.is_finite() && first != 0.0).then(|| format!("{:+.1} %", 100.0 * (value / first - 1.0)))
    }
}

/// The text with its first letter in upper case.
fn capitalised(text: &str) -> String {
    let mut chars = text.chars();
    chars.next().map_or(String::new(), |first| first.to_uppercase().chain(chars).collect())
}

impl Render for MassBars {
    fn render(&self) -> MimeBundle {
        let mut lines = vec![format!("{} — {}", self.title, self.measure.label())];
        for group in &self.groups {
            let values = self.quantities.iter().zip(&group.values);
            let parts: Vec<String> = values.map(|(q, v)| format!("{q} {v:.prec$}", prec = self.decimals)).collect();
            lines.push(format!("  {}: {}", group.label, parts.join(", ")));
        }
        MimeBundle::plain(lines.join("\n")).with("image/svg+xml", self.to_svg())
    }
}
