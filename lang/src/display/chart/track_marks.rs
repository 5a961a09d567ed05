//! Markers for flight tracks (landing dots, rest squares, the thrower) and the tracks' lines,
//! shared by the plan and side views.

use super::axes::Plot;
use super::data::{point_is_finite, Series, Track};
use super::frame::Drawn;
use super::legend::{series_swatch, LegendEntry, Swatch};
use super::fine_path::{draw_line, Dash, Stroke};
use super::line_chart::{draw_series, layered_width_px};
use crate::display::style::{series_colour, INK, MUTED_INK, PLOT_BACKGROUND};
use plotters::element::{Circle, EmptyElement, Polygon, Rectangle};
use plotters::style::Color;

/// Dashes of the ground play (landing to rest), longer than the dashes of series past the
/// palette's length so the two read differently.
const GROUND_DASH: Dash = Dash::Pattern(5.0, 4.0);

/// Draws the tracks' lines (layered: the first widest), their ground play dashed in the same
/// colours, then their landing and rest markers.
pub(crate) fn draw_tracks(plot: &mut Plot, tracks: &[Track]) -> Drawn {
    let lines: Vec<Series> = tracks.iter().map(|t| Series::new(t.label.clone(), t.points.clone())).collect();
    draw_series(plot, &lines, |index| index, true)?;
    for (index, track) in tracks.iter().enumerate() {
        let stroke = Stroke::solid(series_colour(index), layered_width_px(index, tracks.len()).min(2.5));
        draw_line(plot, &track.ground_play(), stroke.dashed(GROUND_DASH))?;
    }
    for (index, track) in tracks.iter().enumerate() {
        draw_markers(plot, track, index)?;
    }
    Ok(())
}

fn draw_markers(plot: &mut Plot, track: &Track, index: usize) -> Drawn {
    let colour = series_colour(index);
    if let Some(point) = track.landing.filter(|p| point_is_finite(*p)) {
        plot.draw_series(std::iter::once(Circle::new(point, 6, PLOT_BACKGROUND.filled())))?;
        plot.draw_series(std::iter::once(Circle::new(point, 5, colour.filled())))?;
    }
    if let Some(point) = track.rest.filter(|p| point_is_finite(*p)) {
        let square = EmptyElement::at(point) + Rectangle::new([(-5, -5), (5, 5)], colour.stroke_width(2));
        plot.draw_series(std::iter::once(square))?;
    }
    Ok(())
}

/// The colour of the legend keys of marks drawn in each flight's own colour.
const MARK_KEY: plotters::style::RGBColor = MUTED_INK;

/// The thrower's triangle, pointing downrange (+x), as pixel offsets from the release point.
pub(crate) const THROWER_TRIANGLE: [(i32, i32); 3] = [(-6, -7), (9, 0), (-6, 7)];

/// A dark triangle at the release point, pointing downrange (+x).
pub(crate) fn draw_thrower(plot: &mut Plot, at: (f64, f64)) -> Drawn {
    let shape = EmptyElement::at(at) + Polygon::new(THROWER_TRIANGLE.to_vec(), INK.filled());
    plot.draw_series(std::iter::once(shape))?;
    Ok(())
}

/// Legend: one line per track, then the marker kinds that appear.
pub(crate) fn track_legend(tracks: &[Track], thrower: bool) -> Vec<LegendEntry> {
    let mut entries: Vec<LegendEntry> = tracks.iter().enumerate()
        .map(|(index, t)| LegendEntry::new(series_swatch(index), t.label.clone()))
        .collect();
    if thrower {
        entries.push(LegendEntry::new(Swatch::Thrower(INK), "release point"));
    }
    // Marks drawn in each flight's colour are keyed in neutral grey, in the shapes drawn.
    if tracks.iter().any(|t| t.landing.is_some()) {
        entries.push(LegendEntry::new(Swatch::Dot(MARK_KEY), "first ground contact"));
    }
    if tracks.iter().any(|t| t.ground_play().len() >= 2) {
        entries.push(LegendEntry::new(Swatch::Stroke(MARK_KEY, GROUND_DASH), "ground play (contact to rest)"));
    }
    if tracks.iter().any(|t| t.rest.is_some()) {
        entries.push(LegendEntry::new(Swatch::Square(MARK_KEY), "at rest"));
    }
    entries
}

/// Where a track ends: the rest point, else the landing point, else its last finite point.
pub(crate) fn end_point(track: &Track) -> Option<(f64, f64)> {
    let last = track.points.iter().rev().copied().find(|p| point_is_finite(*p));
    track.rest.filter(|p| point_is_finite(*p)).or(track.landing.filter(|p| point_is_finite(*p))).or(last)
}
