//! Grouped bars comparing mass properties of several designs (e.g. I_z and I_x per design),
//! every bar labelled with its value.

use super::axes::{self, plot_px, Plot};
use super::bounds::Bounds;
use super::data::Axis;
use super::font;
use super::frame::{Drawn, Frame};
use super::legend::{LegendEntry, Swatch};
use crate::display::style::{series_colour, text_width_px, AXIS_INK, CHART_WIDTH_PX, INK, MUTED_INK, SMALL_PX, TEXT_PX};
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
        let layout = self.layout();
        let (top, low) = (values.y1.max(0.0), values.y0.min(0.0));
        let y0 = low - 0.02 * (top - low).max(1e-9);
        // Room above the highest bar for its labels: solve (y1 − top) / (y1 − y0) = room / plot.
        let room = layout.label_room_px.min(0.6 * PLOT_HEIGHT_PX);
        let y1 = (PLOT_HEIGHT_PX * top - room * y0) / (PLOT_HEIGHT_PX - room);
        let y1 = if y1 > top { y1 } else { top + 1.0 };
        let bounds = Bounds { x0: 0.0, x1: self.groups.len() as f64, y0, y1 };
        self.frame().draw(axes::body_px_for_plot(PLOT_HEIGHT_PX), |area| {
            let mut plot = axes::draw_axes_with(area, bounds, &Axis::new("", ""), &self.measure, (0, axes::BOTTOM_AREA_PX))?;
            for (index, group) in self.groups.iter().enumerate() {
                self.draw_group(&mut plot, index, group, &layout)?;
                draw_name(&mut plot, index, &group.label, bounds.y0, layout.name_chars)?;
            }
            Ok(())
        })
    }

    /// Whether labels fit across the bars or must turn upright, and the room they need.
    fn layout(&self) -> BarLayout {
        let group_px = plot_px((CHART_WIDTH_PX, 0)).0 / self.groups.len().max(1) as f64;
        let bar_px = group_px * GROUP_FILL / self.quantities.len().max(1) as f64;
        let labels: Vec<BarLabels> = self.all_labels().collect();
        let widest = |f: &dyn Fn(&BarLabels) -> String| labels.iter().map(|l| text_width_px(&f(l), SMALL_PX)).fold(0.0, f64::max);
        let across = widest(&|(value, change)| if change.as_ref().map_or(0, |c| c.len()) > value.len() { change.clone().unwrap_or_default() } else { value.clone() });
        let upright = across + 4.0 > bar_px;
        let changes = labels.iter().any(|(_, change)| change.is_some());
        let label_room_px = if upright { widest(&upright_label) + 10.0 } else if changes { 38.0 } else { 20.0 };
        BarLayout { upright, label_room_px, name_chars: (group_px / text_width_px("x", TEXT_PX)).max(4.0) as usize }
    }

    fn all_labels(&self) -> impl Iterator<Item = BarLabels> + '_ {
        let groups = self.groups.iter().enumerate();
        groups.flat_map(move |(g, group)| group.values.iter().enumerate().map(move |(q, v)| self.labels_of(g, q, *v)))
    }

    fn draw_group(&self, plot: &mut Plot, index: usize, group: &BarGroup, layout: &BarLayout) -> Drawn {
        let width = GROUP_FILL / self.quantities.len().max(1) as f64;
        let start = index as f64 + 0.5 * (1.0 - GROUP_FILL);
        for (q, value) in group.values.iter().enumerate().take(self.quantities.len()) {
            let left = start + q as f64 * width;
            let top = (left + 0.5 * width, if value.is_finite() { value.max(0.0) } else { 0.0 });
            if value.is_finite() {
                let bar = Rectangle::new([(left + 0.06 * width, 0.0), (left + 0.94 * width, *value)], series_colour(q).filled());
                plot.draw_series(std::iter::once(bar))?;
            }
            draw_labels(plot, top, self.labels_of(index, q, *value), layout.upright)?;
        }
        Ok(())
    }

    /// The value (or "n/a") and, for designs after the first, its change against the first
    /// design, e.g. `+12.4 %`.
    fn labels_of(&self, group: usize, quantity: usize, value: f64) -> BarLabels {
        if !value.is_finite() {
            return ("n/a".to_string(), None);
        }
        let text = format!("{value:.prec$}", prec = self.decimals);
        let first = self.groups.first().and_then(|g| g.values.get(quantity)).copied().unwrap_or(f64::NAN);
        let change = (group > 0 && first.is_finite() && first != 0.0).then(|| format!("{:+.1} %", 100.0 * (value / first - 1.0)));
        (text, change)
    }
}

/// A bar's value label and, after the first design, its change label.
type BarLabels = (String, Option<String>);

/// How the labels of a bar chart are set.
struct BarLayout {
    /// Labels turn upright (bars too narrow for them).
    upright: bool,
    /// Pixels above the highest bar that its labels need.
    label_room_px: f64,
    /// Characters of a design name per line.
    name_chars: usize,
}

/// Value and change as one upright label.
fn upright_label((value, change): &BarLabels) -> String {
    match change {
        Some(change) => format!("{value}  {change}"),
        None => value.clone(),
    }
}

/// A bar's labels above `top`: stacked across, or as one upright line when bars are narrow.
fn draw_labels(plot: &mut Plot, top: (f64, f64), labels: BarLabels, upright: bool) -> Drawn {
    if upright {
        let style = font::upright(font::anchored(font::text(SMALL_PX, INK), HPos::Left, VPos::Center));
        plot.draw_series(std::iter::once(EmptyElement::at(top) + Text::new(upright_label(&labels), (0, -4), style)))?;
        return Ok(());
    }
    let value_style = font::anchored(font::text(SMALL_PX, INK), HPos::Center, VPos::Bottom);
    plot.draw_series(std::iter::once(EmptyElement::at(top) + Text::new(labels.0, (0, -3), value_style)))?;
    if let Some(change) = labels.1 {
        let style = font::anchored(font::text(SMALL_PX, MUTED_INK), HPos::Center, VPos::Bottom);
        plot.draw_series(std::iter::once(EmptyElement::at(top) + Text::new(change, (0, -18), style)))?;
    }
    Ok(())
}

/// A design's name under its group, in at most two lines of `chars` characters.
fn draw_name(plot: &mut Plot, index: usize, name: &str, bottom: f64, chars: usize) -> Drawn {
    let style = font::anchored(font::text(TEXT_PX, AXIS_INK), HPos::Center, VPos::Top);
    for (line_index, line) in two_lines(name, chars).into_iter().enumerate() {
        let offset = (0, 8 + 16 * line_index as i32);
        plot.draw_series(std::iter::once(EmptyElement::at((index as f64 + 0.5, bottom)) + Text::new(line, offset, style.clone())))?;
    }
    Ok(())
}

/// `text` broken at spaces into at most two lines of `chars` characters; the rest is cut with "…".
fn two_lines(text: &str, chars: usize) -> Vec<String> {
    let mut lines: Vec<String> = vec![String::new()];
    for word in text.split_whitespace() {
        let last = lines.last_mut().map_or(0, |l| l.chars().count());
        if last > 0 && last + 1 + word.chars().count() > chars {
            lines.push(String::new());
        }
        let line = lines.last_mut().expect("one line at least");
        if !line.is_empty() {
            line.push(' ');
        }
        line.push_str(word);
    }
    if lines.len() > 2 || lines.iter().any(|l| l.chars().count() > chars) {
        lines.truncate(2);
        for line in &mut lines {
            if line.chars().count() > chars {
                *line = line.chars().take(chars.saturating_sub(1)).collect::<String>() + "…";
            }
        }
        if let Some(last) = lines.last_mut().filter(|l| !l.ends_with('…')) {
            last.push('…');
        }
    }
    lines
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
