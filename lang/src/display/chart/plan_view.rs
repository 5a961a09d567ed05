//! The plan view: ground tracks seen from above, downrange x to the right and lateral y up
//! (the thrower's left), both axes at the same scale so turn and fade keep their true shape.

use super::axes::{self, plot_px, Plot};
use super::bounds::Bounds;
use super::data::{Axis, Track};
use super::font;
use super::frame::{Drawn, Frame};
use super::track_marks::{draw_thrower, draw_tracks, end_point, track_legend};
use crate::display::style::{CHART_WIDTH_PX, MUTED_INK, SMALL_PX};
use crate::display::Render;
use crate::MimeBundle;
use plotters::element::Text;
use plotters::style::text_anchor::{HPos, VPos};

const MIN_PLOT_HEIGHT_PX: f64 = 200.0;
const MAX_PLOT_HEIGHT_PX: f64 = 460.0;

/// Ground tracks of several flights seen from above, in metres: x downrange, y lateral
/// (positive to the thrower's left). Landing and rest markers, the release point at the
/// origin, equal scales on both axes, and the safety caution below.
#[derive(Debug, Clone, PartialEq)]
pub struct PlanView {
    /// Title.
    pub title: String,
    /// The flights, each in its own colour.
    pub tracks: Vec<Track>,
}

impl PlanView {
    /// An empty plan view with a title.
    pub fn new(title: impl Into<String>) -> Self {
        Self { title: title.into(), tracks: Vec::new() }
    }

    /// Adds a flight's ground track: points (downrange x m, lateral y m).
    pub fn track(mut self, track: Track) -> Self {
        self.tracks.push(track);
        self
    }

    fn frame(&self) -> Frame {
        Frame::new(&self.title)
            .subtitle("Seen from above, thrower at the triangle facing right; equal scales on both axes")
            .legend(track_legend(&self.tracks, true))
            .caution()
    }

    /// The chart as SVG.
    pub fn to_svg(&self) -> String {
        let points = self.tracks.iter().flat_map(|t| t.all_finite_points());
        let Some(bounds) = Bounds::of(points) else {
            return self.frame().no_data("no finite points in any track");
        };
        let bounds = bounds.including_x(0.0).including_y(0.0).padded(0.06, 5.0);
        let plot_height = plot_height_px(bounds);
        let body_px = axes::body_px_for_plot(plot_height);
        let bounds = bounds.equal_scale(plot_px((CHART_WIDTH_PX, body_px)));
        self.frame().draw(body_px, |area| {
            let x = Axis::new("downrange x", "m");
            let y = Axis::new("lateral y", "m");
            let mut plot = axes::draw_axes(area, bounds, &x, &y)?;
            draw_sides(&mut plot, bounds)?;
            draw_tracks(&mut plot, &self.tracks)?;
            draw_thrower(&mut plot, (0.0, 0.0))
        })
    }
}

/// The plot height that shows `bounds` at equal scales, kept within readable limits.
fn plot_height_px(bounds: Bounds) -> f64 {
    let (width, _) = plot_px((CHART_WIDTH_PX, 0));
    let natural = width * bounds.height() / bounds.width();
    natural.clamp(MIN_PLOT_HEIGHT_PX, MAX_PLOT_HEIGHT_PX)
}

/// "LEFT of thrower" along the top edge and "RIGHT of thrower" along the bottom edge, at the
/// thrower's end of the plot, where tracks are still near the line (at the far end they would
/// run through the labels where the discs land).
fn draw_sides(plot: &mut Plot, bounds: Bounds) -> Drawn {
    let inset_x = bounds.x0 + 0.01 * bounds.width();
    let inset_y = 0.02 * bounds.height();
    let style = font::text(SMALL_PX, MUTED_INK);
    let top = font::anchored(style.clone(), HPos::Left, VPos::Top);
    let bottom = font::anchored(style, HPos::Left, VPos::Bottom);
    plot.draw_series(std::iter::once(Text::new("▲ LEFT of thrower", (inset_x, bounds.y1 - inset_y), top)))?;
    plot.draw_series(std::iter::once(Text::new("▼ RIGHT of thrower", (inset_x, bounds.y0 + inset_y), bottom)))?;
    Ok(())
}

impl Render for PlanView {
    fn render(&self) -> MimeBundle {
        let mut lines = vec![format!("{} — plan view, {} flight(s)", self.title, self.tracks.len())];
        for track in &self.tracks {
            lines.push(match end_point(track) {
                Some((x, y)) => format!("  {}: ends {x:.1} m downrange, {}", track.label, side(y)),
                None => format!("  {}: no finite points", track.label),
            });
        }
        lines.push(crate::display::SAFETY_CAUTION.to_string());
        MimeBundle::plain(lines.join("\n")).with("image/svg+xml", self.to_svg())
    }
}

/// `3.2 m left`, `1.0 m right` or `on the line`, as the thrower sees it.
pub(crate) fn side(lateral_m: f64) -> String {
    if lateral_m.abs() < 0.05 {
        "on the line".to_string()
    } else if lateral_m > 0.0 {
        format!("{lateral_m:.1} m left")
    } else {
        format!("{:.1} m right", -lateral_m)
    }
}
