//! A disc's cross-section: the outline in (r, z) mirrored about the axis to show the full
//! section, regions shaded by material, a legend of materials and densities, dimensions in mm.

use super::axes::{self, plot_px, Plot};
use super::bounds::Bounds;
use super::data::Axis;
use super::font;
use super::frame::{Drawn, Frame};
use super::legend::{LegendEntry, Swatch};
use crate::display::style::{series_colour, AXIS_INK, CHART_WIDTH_PX, INK, MUTED_INK, SMALL_PX, TEXT_PX};
use crate::display::Render;
use crate::MimeBundle;
use super::fine_path::{draw_line, fill_polygon, Stroke};
use plotters::element::{EmptyElement, PathElement, Text};
use plotters::style::text_anchor::{HPos, VPos};
use plotters::style::{Color, RGBColor};

const MIN_PLOT_HEIGHT_PX: f64 = 170.0;
const MAX_PLOT_HEIGHT_PX: f64 = 420.0;

/// One region of the section filled with one material: a closed polygon in (r, z) millimetres
/// with r ≥ 0 (the half-section; it is mirrored when drawn).
#[derive(Debug, Clone, PartialEq)]
pub struct Region {
    /// Material name.
    pub material: String,
    /// Material density (g/cm³).
    pub density_g_cm3: f64,
    /// Polygon vertices (r mm, z mm), in order.
    pub outline_mm: Vec<(f64, f64)>,
}

/// A disc's full cross-section, regions shaded by material, with its diameter and height.
#[derive(Debug, Clone, PartialEq)]
pub struct CrossSection {
    /// Title.
    pub title: String,
    /// The regions (the same material in several regions gets one colour).
    pub regions: Vec<Region>,
}

impl CrossSection {
    /// An empty section with a title.
    pub fn new(title: impl Into<String>) -> Self {
        Self { title: title.into(), regions: Vec::new() }
    }

    /// Adds a region: material name, density (g/cm³), half-section polygon (r mm, z mm).
    pub fn region(mut self, material: impl Into<String>, density_g_cm3: f64, outline_mm: Vec<(f64, f64)>) -> Self {
        self.regions.push(Region { material: material.into(), density_g_cm3, outline_mm });
        self
    }

    /// Distinct materials in order of first appearance, with their densities (g/cm³).
    fn materials(&self) -> Vec<(String, f64)> {
        let mut materials: Vec<(String, f64)> = Vec::new();
        for region in &self.regions {
            if !materials.iter().any(|(name, _)| *name == region.material) {
                materials.push((region.material.clone(), region.density_g_cm3));
            }
        }
        materials
    }

    fn colour_of(&self, material: &str) -> RGBColor {
        series_colour(self.materials().iter().position(|(name, _)| name == material).unwrap_or(0))
    }

    fn frame(&self, stretch: f64) -> Frame {
        let entries = self.materials().into_iter().map(|(name, density)| {
            LegendEntry::new(Swatch::Block(self.colour_of(&name)), format!("{name} · {density:.2} g/cm³"))
        });
        let scale = if stretch > 1.05 { format!("heights drawn {stretch:.1}× (not to scale)") } else { "to scale".to_string() };
        let frame = Frame::new(&self.title).subtitle(format!("Section through the spin axis, dimensions in mm, {scale}"));
        let entries: Vec<LegendEntry> = entries.collect();
        // A single material still deserves its name and density.
        if entries.len() == 1 { frame.legend(vec![entries[0].clone(), LegendEntry::new(Swatch::Line(AXIS_INK), "spin axis")]) } else { frame.legend(entries) }
    }

    fn finite_points(&self) -> impl Iterator<Item = (f64, f64)> + '_ {
        let points = self.regions.iter().flat_map(|r| r.outline_mm.iter().copied());
        points.filter(|(r, z)| r.is_finite() && z.is_finite())
    }

    /// The chart as SVG.
    pub fn to_svg(&self) -> String {
        let Some(section) = Bounds::of(self.finite_points().flat_map(|(r, z)| [(r, z), (-r, z)])) else {
            return self.frame(1.0).no_data("no region has a finite outline");
        };
        let bounds = Bounds { x1: section.x1 + 0.12 * section.width(), y1: section.y1 + 0.45 * section.height(), ..section };
        let bounds = bounds.padded(0.03, 2.0);
        let width_px = plot_px((CHART_WIDTH_PX, 0)).0;
        let natural_px = width_px * bounds.height() / bounds.width();
        let plot_height = natural_px.clamp(MIN_PLOT_HEIGHT_PX, MAX_PLOT_HEIGHT_PX);
        let body_px = axes::body_px_for_plot(plot_height);
        let bounds = if natural_px >= MIN_PLOT_HEIGHT_PX { bounds.equal_scale(plot_px((CHART_WIDTH_PX, body_px))) } else { bounds };
        let stretch = plot_height / natural_px;
        self.frame(stretch).draw(body_px, |area| {
            let mut plot = axes::draw_axes(area, bounds, &Axis::new("radius r", "mm"), &Axis::new("height z", "mm"))?;
            self.draw_regions(&mut plot)?;
            draw_axis_line(&mut plot, section)?;
            draw_dimensions(&mut plot, section)
        })
    }

    fn draw_regions(&self, plot: &mut Plot) -> Drawn {
        for region in &self.regions {
            let half: Vec<(f64, f64)> = region.outline_mm.iter().copied().filter(|(r, z)| r.is_finite() && z.is_finite()).collect();
            if half.len() < 3 {
                continue;
            }
            let colour = self.colour_of(&region.material);
            for side in [1.0, -1.0] {
                let points: Vec<(f64, f64)> = half.iter().map(|(r, z)| (side * r, *z)).collect();
                fill_polygon(plot, &points, colour, 0.55)?;
                let mut closed = points;
                closed.push(closed[0]);
                draw_line(plot, &closed, Stroke::solid(colour, 1.0))?;
            }
        }
        Ok(())
    }
}

/// The spin axis: a thin line at r = 0 through the section.
fn draw_axis_line(plot: &mut Plot, section: Bounds) -> Drawn {
    let reach = 0.25 * section.height();
    let line = vec![(0.0, section.y0 - reach), (0.0, section.y1 + reach)];
    plot.draw_series(std::iter::once(PathElement::new(line, AXIS_INK.stroke_width(1))))?;
    Ok(())
}

/// The overall diameter above the section and the height to its right, with their values.
fn draw_dimensions(plot: &mut Plot, s: Bounds) -> Drawn {
    let above = s.y1 + 0.25 * s.height();
    let right = s.x1 + 0.05 * s.width();
    draw_dimension_line(plot, (s.x0, above), (s.x1, above), true)?;
    draw_dimension_line(plot, (right, s.y0), (right, s.y1), false)?;
    let style = font::text(TEXT_PX, INK);
    let diameter = format!("Ø {:.1} mm", s.width());
    let top = font::anchored(style.clone(), HPos::Center, VPos::Bottom);
    plot.draw_series(std::iter::once(EmptyElement::at((0.0, above)) + Text::new(diameter, (0, -4), top)))?;
    let side = font::anchored(font::text(SMALL_PX, MUTED_INK), HPos::Left, VPos::Center);
    let height = format!("{:.1} mm", s.height());
    plot.draw_series(std::iter::once(EmptyElement::at((right, 0.5 * (s.y0 + s.y1))) + Text::new(height, (6, 0), side)))?;
    Ok(())
}

/// A dimension line with short end ticks across it.
fn draw_dimension_line(plot: &mut Plot, from: (f64, f64), to: (f64, f64), horizontal: bool) -> Drawn {
    let style = INK.stroke_width(1);
    plot.draw_series(std::iter::once(PathElement::new(vec![from, to], style)))?;
    let tick: [(i32, i32); 2] = if horizontal { [(0, -5), (0, 5)] } else { [(-5, 0), (5, 0)] };
    for end in [from, to] {
        plot.draw_series(std::iter::once(EmptyElement::at(end) + PathElement::new(tick.to_vec(), style)))?;
    }
    Ok(())
}

impl Render for CrossSection {
    fn render(&self) -> MimeBundle {
        let mut lines = vec![format!("{} — cross-section, {} region(s)", self.title, self.regions.len())];
        if let Some(b) = Bounds::of(self.finite_points()) {
            lines.push(format!("  diameter {:.1} mm, height {:.1} mm", 2.0 * b.x1, b.height()));
        }
        for (name, density) in self.materials() {
            lines.push(format!("  {name}: {density:.2} g/cm³"));
        }
        MimeBundle::plain(lines.join("\n")).with("image/svg+xml", self.to_svg())
    }
}
