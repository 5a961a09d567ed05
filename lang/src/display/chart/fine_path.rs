//! Data lines and filled outlines at sub-pixel precision.
//!
//! plotters' SVG backend rounds every coordinate to whole pixels, which draws a gently curving
//! track as stair steps. The shapes here are mapped from data to pixels in `f64` (the same
//! mapping plotters uses, without the rounding) and written as SVG elements with fractional
//! coordinates, clipped to the plotting area by a nested `<svg>` viewport (no ids, so several
//! charts on one notebook page cannot clash). The backend has no call for a raw element, so a
//! shape passes through it as a marked `<text>` element that [`expand`] swaps for the real
//! element when the chart is finished; it keeps its place in the drawing order (over the grid,
//! under the markers).

use super::axes::Plot;
use super::data::point_is_finite;
use super::frame::Drawn;
use plotters::element::Text;
use plotters::style::{IntoFont, RGBColor};
use std::collections::hash_map::RandomState;
use std::fmt::Write;
use std::hash::{BuildHasher, Hasher};
use std::sync::OnceLock;

/// Starts the content of a text element that carries a shape: a fixed word and a number drawn
/// at random once per process, so no text of a chart (a label read from a file, say) can pass
/// for a shape and smuggle markup into the SVG. The mark never reaches the finished chart.
fn mark() -> &'static str {
    static MARK: OnceLock<String> = OnceLock::new();
    MARK.get_or_init(|| format!("spinfoil-fine-shape-{:016x}:", RandomState::new().build_hasher().finish()))
}
/// Stand-ins for the characters the backend escapes in text (`<`, `>`, `"`), from Unicode's
/// private-use area, so they never occur in chart text.
const CONCEALED: [(char, char); 3] = [('<', '\u{E000}'), ('>', '\u{E001}'), ('"', '\u{E002}')];

/// How a line is dashed.
#[derive(Debug, Clone, Copy, PartialEq)]
pub(crate) enum Dash {
    /// A continuous line.
    Solid,
    /// Dashes `on` pixels long with `off`-pixel gaps.
    Pattern(f64, f64),
}

impl Dash {
    /// The usual dashes of a second kind of line: 8 px on, 5 px off.
    pub const DASHED: Dash = Dash::Pattern(8.0, 5.0);
    /// Short dots of a third kind of line: 2 px on, 4 px off.
    pub const DOTTED: Dash = Dash::Pattern(2.0, 4.0);

    /// The `stroke-dasharray` attribute, empty for a solid line.
    fn attribute(self) -> String {
        match self {
            Dash::Solid => String::new(),
            Dash::Pattern(on, off) => format!(" stroke-dasharray=\"{on} {off}\""),
        }
    }
}

/// The stroke of a data line: colour, width (px) and dash.
#[derive(Debug, Clone, Copy, PartialEq)]
pub(crate) struct Stroke {
    /// Colour.
    pub colour: RGBColor,
    /// Width in pixels (fractions allowed).
    pub width_px: f64,
    /// Dash pattern.
    pub dash: Dash,
}

impl Stroke {
    /// A solid stroke.
    pub fn solid(colour: RGBColor, width_px: f64) -> Self {
        Self { colour, width_px, dash: Dash::Solid }
    }

    /// The same stroke with a dash pattern.
    pub fn dashed(self, dash: Dash) -> Self {
        Self { dash, ..self }
    }
}

/// Draws a line through the finite `points` (data units) with `stroke`; fewer than two finite
/// points draw nothing.
pub(crate) fn draw_line(plot: &mut Plot, points: &[(f64, f64)], stroke: Stroke) -> Drawn {
    let pixels = to_pixels(plot, points);
    if pixels.len() < 2 {
        return Ok(());
    }
    let element = format!(
        "<polyline fill=\"none\" stroke=\"{}\" stroke-width=\"{}\"{} stroke-linejoin=\"round\" stroke-linecap=\"round\" points=\"{}\"/>",
        hex(stroke.colour), stroke.width_px, stroke.dash.attribute(), point_list(&pixels)
    );
    pass_through(plot, &element)
}

/// Fills the polygon through the finite `points` (data units) with `colour` at `opacity`
/// (0 to 1); fewer than three finite points draw nothing.
pub(crate) fn fill_polygon(plot: &mut Plot, points: &[(f64, f64)], colour: RGBColor, opacity: f64) -> Drawn {
    let pixels = to_pixels(plot, points);
    if pixels.len() < 3 {
        return Ok(());
    }
    let element = format!("<polygon fill=\"{}\" fill-opacity=\"{opacity}\" stroke=\"none\" points=\"{}\"/>", hex(colour), point_list(&pixels));
    pass_through(plot, &element)
}

/// The pixel position of every finite point, in `f64`: plotters maps the x range onto pixels
/// `left ..= right − 1` and the y range onto `bottom − 1 ..= top` of the plotting area, then
/// rounds x down and y towards the bottom; half a pixel's shift the same way puts our lines
/// within ±0.5 px of the markers and grid lines plotters draws.
fn to_pixels(plot: &Plot, points: &[(f64, f64)]) -> Vec<(f64, f64)> {
    let (columns, rows) = plot.plotting_area().get_pixel_range();
    let (xs, ys) = (plot.x_range(), plot.y_range());
    let scale = |v: f64, from: &std::ops::Range<f64>, to: (f64, f64)| {
        let span = from.end - from.start;
        if span == 0.0 { 0.5 * (to.0 + to.1) } else { to.0 + (v - from.start) / span * (to.1 - to.0) }
    };
    let x_px = (f64::from(columns.start) - 0.5, f64::from(columns.end - 1) - 0.5);
    let y_px = (f64::from(rows.end - 1) + 0.5, f64::from(rows.start) + 0.5);
    points.iter().copied().filter(|p| point_is_finite(*p)).map(|(x, y)| (scale(x, &xs, x_px), scale(y, &ys, y_px))).collect()
}

/// `x,y x,y …` with two decimals.
fn point_list(pixels: &[(f64, f64)]) -> String {
    let mut text = String::with_capacity(pixels.len() * 14);
    for (x, y) in pixels {
        let _ = write!(text, "{x:.2},{y:.2} ");
    }
    text.pop();
    text
}

fn hex(colour: RGBColor) -> String {
    format!("#{:02X}{:02X}{:02X}", colour.0, colour.1, colour.2)
}

/// Sends `element`, clipped to the plotting area, through the backend as a marked text.
fn pass_through(plot: &mut Plot, element: &str) -> Drawn {
    let (columns, rows) = plot.plotting_area().get_pixel_range();
    let (x, y) = (columns.start, rows.start);
    let (width, height) = (columns.end - columns.start, rows.end - rows.start);
    let clipped = format!("<svg x=\"{x}\" y=\"{y}\" width=\"{width}\" height=\"{height}\" viewBox=\"{x} {y} {width} {height}\" overflow=\"hidden\">{element}</svg>");
    let anchor = (plot.x_range().start, plot.y_range().start);
    let style = ("sans-serif", 10.0).into_font();
    plot.draw_series(std::iter::once(Text::new(format!("{}{}", mark(), conceal(&clipped)), anchor, style)))?;
    Ok(())
}

fn conceal(text: &str) -> String {
    text.chars().map(|c| CONCEALED.iter().find(|(plain, _)| *plain == c).map_or(c, |(_, hidden)| *hidden)).collect()
}

fn reveal(text: &str) -> String {
    text.chars().map(|c| CONCEALED.iter().find(|(_, hidden)| *hidden == c).map_or(c, |(plain, _)| *plain)).collect()
}

/// Replaces every marked text element of a finished chart's SVG with the shape it carries.
pub(crate) fn expand(svg: String) -> String {
    let mut out = String::with_capacity(svg.len());
    let mut rest = svg.as_str();
    let marker = mark();
    while let Some(at) = rest.find(marker) {
        let (Some(open), Some(close)) = (rest[..at].rfind("<text"), rest[at..].find("</text>")) else {
            break;
        };
        out.push_str(&rest[..open]);
        out.push_str(&reveal(rest[at + marker.len()..at + close].trim_end()));
        rest = &rest[at + close + "</text>".len()..];
    }
    out.push_str(rest);
    out
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn expand_swaps_a_marked_text_for_its_element_and_keeps_the_rest() {
        let element = "<polyline points=\"1.25,2.50 3,4\"/>";
        let svg = format!("<svg>\n<rect/>\n<text x=\"1\" y=\"2\">\n{}{}\n</text>\n<circle/>\n</svg>", mark(), conceal(element));
        assert_eq!(expand(svg), format!("<svg>\n<rect/>\n{element}\n<circle/>\n</svg>"));
    }

    #[test]
    fn plain_text_passes_unchanged() {
        let svg = "<svg><text>speed (m/s)</text></svg>".to_string();
        assert_eq!(expand(svg.clone()), svg);
    }

    #[test]
    fn text_that_only_looks_like_a_shape_stays_text() {
        let forged = format!("<svg><text>spinfoil-fine-shape:{}</text></svg>", conceal("<script/>"));
        assert_eq!(expand(forged.clone()), forged);
    }

    #[test]
    fn point_lists_keep_fractions() {
        assert_eq!(point_list(&[(10.0, 20.126), (11.5, 19.0)]), "10.00,20.13 11.50,19.00");
    }
}
