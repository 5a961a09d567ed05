//! Scatter clouds (e.g. landing points under throw scatter) with each cloud's mean and its
//! 50 % and 95 % ellipses, over the landing zones a study was given (target circle, fairway).

use super::axes::{self, plot_px, Plot};
use super::bounds::Bounds;
use super::data::{Axis, Series};
use super::frame::{Drawn, Frame};
use super::legend::{LegendEntry, Swatch};
use super::spread::Spread;
use crate::display::style::{series_colour, CHART_WIDTH_PX, INK};
use crate::display::Render;
use crate::MimeBundle;
use super::fine_path::{draw_line, fill_polygon, Dash, Stroke};
use plotters::element::{Circle, EmptyElement, PathElement};
use plotters::style::{Color, RGBColor};

const PLOT_HEIGHT_PX: f64 = 340.0;
const ELLIPSE_VERTICES: usize = 96;
/// Dashes of the 95 % ellipses.
const WIDE_DASH: Dash = Dash::Pattern(6.0, 4.0);
/// Colours of landing zones, in the order given (outline; the fill is a light tint of it): green,
/// then purple, so a target and a fairway are told apart in the legend.
const ZONE_COLOURS: [RGBColor; 2] = [RGBColor(46, 125, 50), RGBColor(123, 31, 162)];
/// The zone colours' tints for the legend swatches (about 35 % on white).
const ZONE_SWATCHES: [RGBColor; 2] = [RGBColor(182, 211, 183), RGBColor(215, 188, 227)];

/// A labelled landing zone: closed rings of (x, y) points (a circle as a polygon, a fairway as
/// rounded strips), drawn under the clouds with a light fill and an outline.
#[derive(Debug, Clone, PartialEq)]
struct ZoneShape {
    label: String,
    rings: Vec<Vec<(f64, f64)>>,
}

/// Clouds of points with their mean and 50 % / 95 % ellipses (from each cloud's mean and
/// covariance, as for a bivariate normal distribution). As a landing-zone chart it draws both
/// axes at the same scale and shows the safety caution.
#[derive(Debug, Clone, PartialEq)]
pub struct ScatterEllipses {
    /// Title.
    pub title: String,
    /// Horizontal axis.
    pub x: Axis,
    /// Vertical axis.
    pub y: Axis,
    /// The clouds, one colour each.
    pub clouds: Vec<Series>,
    /// Landing zones: equal scales and the safety caution (default true).
    pub landing_zone: bool,
    /// Zones drawn under the clouds (see [`ScatterEllipses::zone`]).
    zones: Vec<ZoneShape>,
}

impl ScatterEllipses {
    /// An empty landing-zone scatter with a title and axes.
    pub fn new(title: impl Into<String>, x: Axis, y: Axis) -> Self {
        Self { title: title.into(), x, y, clouds: Vec::new(), landing_zone: true, zones: Vec::new() }
    }

    /// Adds a labelled zone (a target circle, a fairway): closed rings of (x, y) points, in the
    /// axes' units, drawn with a light fill and an outline under the clouds and named in the
    /// legend.
    pub fn zone(mut self, label: impl Into<String>, rings: Vec<Vec<(f64, f64)>>) -> Self {
        self.zones.push(ZoneShape { label: label.into(), rings });
        self
    }

    /// Adds a cloud of points.
    pub fn cloud(mut self, series: Series) -> Self {
        self.clouds.push(series);
        self
    }

    fn frame(&self) -> Frame {
        let mut legend: Vec<LegendEntry> =
            self.clouds.iter().enumerate().map(|(i, c)| LegendEntry::new(Swatch::Dot(series_colour(i)), c.label.clone())).collect();
        legend.push(LegendEntry::new(Swatch::Cross(INK), "mean"));
        legend.push(LegendEntry::new(Swatch::Line(INK), "50 % ellipse"));
        legend.push(LegendEntry::new(Swatch::Stroke(INK, WIDE_DASH), "95 % ellipse"));
        legend.extend(self.zones.iter().enumerate().map(|(i, z)| LegendEntry::new(Swatch::Block(ZONE_SWATCHES[i % 2]), z.label.clone())));
        let scale = if self.landing_zone { "; equal scales on both axes" } else { "" };
        let frame = Frame::new(&self.title).subtitle(format!("Ellipses from each cloud's mean and covariance{scale}")).legend(legend);
        if self.landing_zone { frame.caution() } else { frame }
    }

    /// The chart as SVG.
    pub fn to_svg(&self) -> String {
        let mut points: Vec<(f64, f64)> = self.clouds.iter().flat_map(|c| c.finite_points()).collect();
        points.extend(self.spreads().iter().flat_map(|s| s.ellipse(0.95, ELLIPSE_VERTICES)));
        points.extend(self.zones.iter().flat_map(|z| z.rings.iter().flatten().copied()));
        let Some(bounds) = Bounds::of(points) else {
            return self.frame().no_data("no finite points in any cloud");
        };
        let bounds = bounds.padded(0.05, 1.0);
        let body_px = axes::body_px_for_plot(PLOT_HEIGHT_PX);
        let bounds = if self.landing_zone { bounds.equal_scale(plot_px((CHART_WIDTH_PX, body_px))) } else { bounds };
        self.frame().draw(body_px, |area| {
            let mut plot = axes::draw_axes(area, bounds, &self.x, &self.y)?;
            // Zones are named in the legend (a label inside the plot would cover the clouds).
            for (index, zone) in self.zones.iter().enumerate() {
                draw_zone(&mut plot, zone, ZONE_COLOURS[index % 2])?;
            }
            for (index, cloud) in self.clouds.iter().enumerate() {
                draw_cloud(&mut plot, cloud, index)?;
            }
            Ok(())
        })
    }

    fn spreads(&self) -> Vec<Spread> {
        self.clouds.iter().filter_map(|c| Spread::of(&c.points)).collect()
    }
}

/// A zone: light fill and solid outline in `colour` (under the clouds).
fn draw_zone(plot: &mut Plot, zone: &ZoneShape, colour: RGBColor) -> Drawn {
    for ring in zone.rings.iter().filter(|r| r.len() >= 3) {
        fill_polygon(plot, ring, colour, 0.12)?;
        draw_line(plot, ring, Stroke::solid(colour, 2.0))?;
    }
    Ok(())
}

fn draw_cloud(plot: &mut Plot, cloud: &Series, index: usize) -> Drawn {
    let colour = series_colour(index);
    let dots = cloud.finite_points().into_iter().map(|p| Circle::new(p, 3, colour.mix(0.5).filled()));
    plot.draw_series(dots)?;
    let Some(spread) = Spread::of(&cloud.points).filter(|s| s.count >= 3) else {
        return Ok(());
    };
    draw_line(plot, &spread.ellipse(0.5, ELLIPSE_VERTICES), Stroke::solid(colour, 2.0))?;
    draw_line(plot, &spread.ellipse(0.95, ELLIPSE_VERTICES), Stroke::solid(colour, 2.0).dashed(WIDE_DASH))?;
    let cross = |a: (i32, i32), b: (i32, i32)| EmptyElement::at(spread.mean) + PathElement::new(vec![a, b], INK.stroke_width(2));
    plot.draw_series([cross((-7, 0), (7, 0)), cross((0, -7), (0, 7))])?;
    Ok(())
}

impl Render for ScatterEllipses {
    fn render(&self) -> MimeBundle {
        let mut lines = vec![format!("{} — {} against {}, {} cloud(s)", self.title, self.y.label(), self.x.label(), self.clouds.len())];
        for cloud in &self.clouds {
            lines.push(match Spread::of(&cloud.points) {
                Some(s) => {
                    let (major, minor, _) = s.semi_axes(0.95);
                    format!("  {}: {} points, mean ({:.2}, {:.2}), 95 % ellipse semi-axes {major:.2} × {minor:.2}", cloud.label, s.count, s.mean.0, s.mean.1)
                }
                None => format!("  {}: fewer than 2 finite points", cloud.label),
            });
        }
        for zone in &self.zones {
            lines.push(format!("  zone: {}", zone.label));
        }
        if self.landing_zone {
            lines.push(crate::display::SAFETY_CAUTION.to_string());
        }
        MimeBundle::plain(lines.join("\n")).with("image/svg+xml", self.to_svg())
    }
}
