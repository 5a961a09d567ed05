//! The side view: height against downrange distance, with the ground line.

use super::axes::{self, plot_px};
use super::bounds::Bounds;
use super::data::{Axis, Track};
use super::frame::Frame;
use super::line_chart::draw_zero_line;
use super::track_marks::{draw_thrower, draw_tracks, track_legend};
use crate::display::style::CHART_WIDTH_PX;
use crate::display::Render;
use crate::MimeBundle;

const PLOT_HEIGHT_PX: f64 = 260.0;

/// Height against downrange distance for several flights, in metres, with first-contact and
/// rest markers and the ground line. The vertical scale is stretched to fill the plot; the
/// subtitle states by how much.
#[derive(Debug, Clone, PartialEq)]
pub struct SideView {
    /// Title.
    pub title: String,
    /// The flights: points (downrange x m, height z m).
    pub tracks: Vec<Track>,
}

impl SideView {
    /// An empty side view with a title.
    pub fn new(title: impl Into<String>) -> Self {
        Self { title: title.into(), tracks: Vec::new() }
    }

    /// Adds a flight: points (downrange x m, height z m).
    pub fn track(mut self, track: Track) -> Self {
        self.tracks.push(track);
        self
    }

    fn frame(&self, stretch: Option<f64>) -> Frame {
        let frame = Frame::new(&self.title).legend(track_legend(&self.tracks, true));
        match stretch {
            Some(s) if s > 1.05 => frame.subtitle(format!("Height drawn {s:.1}× taller than downrange distance")),
            _ => frame.subtitle("Height and downrange distance at the same scale"),
        }
    }

    /// The chart as SVG.
    pub fn to_svg(&self) -> String {
        let points = self.tracks.iter().flat_map(|t| t.all_finite_points());
        let Some(bounds) = Bounds::of(points) else {
            return self.frame(None).no_data("no finite points in any track");
        };
        let bounds = bounds.including_x(0.0).including_y(0.0).padded(0.05, 1.0);
        let bounds = Bounds { y0: bounds.y0.max(-0.05 * bounds.height()), ..bounds };
        let body_px = axes::body_px_for_plot(PLOT_HEIGHT_PX);
        let stretch = vertical_stretch(bounds, plot_px((CHART_WIDTH_PX, body_px)));
        self.frame(Some(stretch)).draw(body_px, |area| {
            let mut plot = axes::draw_axes(area, bounds, &Axis::new("downrange x", "m"), &Axis::new("height z", "m"))?;
            draw_zero_line(&mut plot, bounds)?;
            draw_tracks(&mut plot, &self.tracks)?;
            let release = self.tracks.iter().find_map(|t| t.points.first().copied());
            match release {
                Some(point) if point.0.is_finite() && point.1.is_finite() => draw_thrower(&mut plot, point),
                _ => Ok(()),
            }
        })
    }
}

/// How many times more pixels a metre of height gets than a metre downrange.
fn vertical_stretch(bounds: Bounds, plot: (f64, f64)) -> f64 {
    (plot.1 / bounds.height()) / (plot.0 / bounds.width())
}

impl Render for SideView {
    fn render(&self) -> MimeBundle {
        let mut lines = vec![format!("{} — side view, {} flight(s)", self.title, self.tracks.len())];
        for track in &self.tracks {
            let top = track.points.iter().map(|p| p.1).filter(|z| z.is_finite()).fold(f64::NAN, f64::max);
            let reach = track.points.iter().map(|p| p.0).filter(|x| x.is_finite()).fold(f64::NAN, f64::max);
            lines.push(format!("  {}: highest {top:.1} m, reaches {reach:.1} m downrange", track.label));
        }
        MimeBundle::plain(lines.join("\n")).with("image/svg+xml", self.to_svg())
    }
}
