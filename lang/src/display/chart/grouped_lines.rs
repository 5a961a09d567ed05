//! Lines keyed two ways: colour and point marker by group (e.g. a design), dash by measure
//! (e.g. turn or fade). The legend names each group once and each measure once instead of every
//! combination; groups of nearly equal numbers stay apart because earlier groups are drawn
//! wider, with larger markers, under later ones.

use super::axes::{self, Plot};
use super::bounds::Bounds;
use super::data::{finite, Axis, Series};
use super::fine_path::{draw_line, Dash, Stroke};
use super::frame::{Drawn, Frame};
use super::legend::{self, LegendEntry, Swatch};
use super::line_chart::{draw_zero_line, layered_width_px, series_summary};
use super::marker::{draw_marker, Marker};
use crate::display::style::{series_colour, MUTED_INK, PLOT_BACKGROUND};
use crate::display::Render;
use crate::MimeBundle;

const PLOT_HEIGHT_PX: f64 = 330.0;
/// Dash patterns of the measures, in order (cycled).
const MEASURE_DASHES: [Dash; 4] = [Dash::Solid, Dash::DASHED, Dash::DOTTED, Dash::Pattern(12.0, 4.0)];

/// One line: group number, measure number and points (x, y) in the axes' units.
#[derive(Debug, Clone, PartialEq)]
pub struct GroupedLine {
    /// Index into [`GroupedLines::groups`].
    pub group: usize,
    /// Index into [`GroupedLines::measures`].
    pub measure: usize,
    /// Points (x, y); non-finite points are skipped.
    pub points: Vec<(f64, f64)>,
}

/// Several measures for several groups against shared axes: each group in its own colour and
/// marker, each measure in its own dash, e.g. each design's turn (solid) and fade (dashed)
/// against release speed.
#[derive(Debug, Clone, PartialEq)]
pub struct GroupedLines {
    /// Title.
    pub title: String,
    /// Optional subtitle (context, sources).
    pub subtitle: Option<String>,
    /// Horizontal axis.
    pub x: Axis,
    /// Vertical axis.
    pub y: Axis,
    /// Group names (colours), in order of first appearance.
    pub groups: Vec<String>,
    /// Measure names (dashes), in order of first appearance.
    pub measures: Vec<String>,
    /// The lines.
    pub lines: Vec<GroupedLine>,
    /// Draws a line at y = 0 when it lies inside the range.
    pub zero_line: bool,
}

impl GroupedLines {
    /// An empty chart with a title and axes.
    pub fn new(title: impl Into<String>, x: Axis, y: Axis) -> Self {
        let (groups, measures, lines) = (Vec::new(), Vec::new(), Vec::new());
        Self { title: title.into(), subtitle: None, x, y, groups, measures, lines, zero_line: false }
    }

    /// Adds the line of `measure` for `group`: points (x, y) in the axes' units.
    pub fn line(mut self, group: &str, measure: &str, points: Vec<(f64, f64)>) -> Self {
        let group = index_of(&mut self.groups, group);
        let measure = index_of(&mut self.measures, measure);
        self.lines.push(GroupedLine { group, measure, points });
        self
    }

    fn legend(&self) -> Vec<LegendEntry> {
        let groups = self.groups.iter().enumerate().map(|(g, name)| LegendEntry::new(Swatch::Marked(series_colour(g), Marker::of(g)), name.clone()));
        let measures = self.measures.iter().enumerate().map(|(m, name)| LegendEntry::new(Swatch::Stroke(MUTED_INK, dash_of(m)), name.clone()));
        let mut entries: Vec<LegendEntry> = groups.chain(measures).collect();
        // When the legend takes more than one row anyway, the measures get rows of their own.
        let first_measure = self.groups.len();
        if legend::height(&entries) > legend::ROW_PX && first_measure > 0 && first_measure < entries.len() {
            entries[first_measure] = entries[first_measure].clone().on_new_row();
        }
        entries
    }

    fn frame(&self) -> Frame {
        let frame = Frame::new(&self.title).legend(self.legend());
        match &self.subtitle {
            Some(subtitle) => frame.subtitle(subtitle.clone()),
            None => frame,
        }
    }

    /// The chart as SVG.
    pub fn to_svg(&self) -> String {
        let Some(bounds) = Bounds::of(self.lines.iter().flat_map(|l| finite(&l.points))) else {
            return self.frame().no_data("no finite points in any line");
        };
        let bounds = if self.zero_line { bounds.including_y(0.0) } else { bounds };
        let bounds = bounds.padded(0.05, 1.0);
        self.frame().draw(axes::body_px_for_plot(PLOT_HEIGHT_PX), |area| {
            let mut plot = axes::draw_axes(area, bounds, &self.x, &self.y)?;
            if self.zero_line {
                draw_zero_line(&mut plot, bounds)?;
            }
            self.draw_lines(&mut plot)
        })
    }

    /// Group by group, first group at the bottom: its lines, then its markers.
    fn draw_lines(&self, plot: &mut Plot) -> Drawn {
        let count = self.groups.len();
        for group in 0..count {
            let colour = series_colour(group);
            let lines = || self.lines.iter().filter(move |l| l.group == group);
            for line in lines() {
                let stroke = Stroke::solid(colour, layered_width_px(group, count)).dashed(dash_of(line.measure));
                draw_line(plot, &line.points, stroke)?;
            }
            let half = marker_half_px(group, count);
            for point in lines().flat_map(|l| finite(&l.points)) {
                draw_marker(plot.plotting_area(), point, (Marker::of(group), half), colour, PLOT_BACKGROUND)?;
            }
        }
        Ok(())
    }

    /// Every line as a labelled series ("group: measure").
    fn series(&self) -> Vec<Series> {
        let name = |l: &GroupedLine| format!("{}: {}", self.groups[l.group], self.measures[l.measure]);
        self.lines.iter().map(|l| Series::new(name(l), l.points.clone())).collect()
    }
}

impl Render for GroupedLines {
    fn render(&self) -> MimeBundle {
        let summary = series_summary(&self.title, &self.x, &self.y, &self.series());
        MimeBundle::plain(summary).with("image/svg+xml", self.to_svg())
    }
}

/// The position of `name` in `names`, added at the end when new.
fn index_of(names: &mut Vec<String>, name: &str) -> usize {
    names.iter().position(|n| n == name).unwrap_or_else(|| {
        names.push(name.to_string());
        names.len() - 1
    })
}

fn dash_of(measure: usize) -> Dash {
    MEASURE_DASHES[measure % MEASURE_DASHES.len()]
}

/// Marker half-size in pixels: 6 for the first of several groups down to 3 for the last.
fn marker_half_px(group: usize, count: usize) -> i32 {
    (layered_width_px(group, count) * 1.3 + 0.8).round() as i32
}
