//! Markers for flight tracks (landing dots, rest squares, the thrower) and the tracks' lines,
//! shared by the plan and side views.

use super::axes::Plot;
use super::data::{point_is_finite, Series, Track};
use super::frame::Drawn;
use super::legend::{series_swatch, LegendEntry, Swatch};
use super::line_chart::draw_series;
use crate::display::style::{series_colour, INK, PLOT_BACKGROUND};
use plotters::element::{Circle, EmptyElement, Polygon, Rectangle};
use plotters::style::Color;

/// Draws the tracks' lines, then their landing and rest markers, in series colours.
pub(crate) fn draw_tracks(plot: &mut Plot, tracks: &[Track]) -> Drawn {
    let lines: Vec<Series> = tracks.iter().map(|t| Series::new(t.label.clone(), t.points.clone())).collect();
    draw_series(plot, &lines, |index| index)?;
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

/// A dark triangle at the release point, pointing downrange (+x).
pub(crate) fn draw_thrower(plot: &mut Plot, at: (f64, f64)) -> Drawn {
    let shape = EmptyElement::at(at) + Polygon::new(vec![(-6, -7), (9, 0), (-6, 7)], INK.filled());
    plot.draw_series(std::iter::once(shape))?;
    Ok(())
}

/// Legend: one line per track, then the marker kinds that appear.
pub(crate) fn track_legend(tracks: &[Track], thrower: bool) -> Vec<LegendEntry> {
    let mut entries: Vec<LegendEntry> = tracks.iter().enumerate()
        .map(|(index, t)| LegendEntry::new(series_swatch(index), t.label.clone()))
        .collect();
    if thrower {
        entries.push(LegendEntry::new(Swatch::Triangle(INK), "release point"));
    }
    if tracks.iter().any(|t| t.landing.is_some()) {
        entries.push(LegendEntry::new(Swatch::Dot(INK), "first ground contact"));
    }
    if tracks.iter().any(|t| t.rest.is_some()) {
        entries.push(LegendEntry::new(Swatch::Square(INK), "at rest"));
    }
    entries
}

/// Where a track ends: the rest point, else the landing point, else its last finite point.
pub(crate) fn end_point(track: &Track) -> Option<(f64, f64)> {
    let last = track.points.iter().rev().copied().find(|p| point_is_finite(*p));
    track.rest.filter(|p| point_is_finite(*p)).or(track.landing.filter(|p| point_is_finite(*p))).or(last)
}
