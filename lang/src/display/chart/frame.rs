//! The frame every chart is drawn in: title strip, subtitle, legend strip, the chart body,
//! captions and the safety caution below, and the "no data" and error fallbacks.

use super::fine_path;
use super::font;
use super::legend::{self, LegendEntry, LEFT_PX};
use crate::display::style::*;
use crate::display::table::escape;
use plotters::coord::Shift;
use plotters::element::{Rectangle, Text};
use plotters::prelude::{DrawingArea, IntoDrawingArea, SVGBackend};
use plotters::style::text_anchor::{HPos, VPos};
use plotters::style::{Color, RGBColor, WHITE};

/// A drawing area of the SVG backend.
pub(crate) type Area<'a> = DrawingArea<SVGBackend<'a>, Shift>;
/// What drawing returns.
pub(crate) type Drawn = Result<(), Box<dyn std::error::Error>>;

const TITLE_ROW_PX: i32 = 34;
const TITLE_LINE_PX: i32 = 22;
const SUBTITLE_ROW_PX: i32 = 20;
const LINE_PX: i32 = 16;
const NO_DATA_BODY_PX: u32 = 180;

/// A chart's frame: title, optional subtitle, legend, and lines under the body.
#[derive(Debug, Clone, Default)]
pub(crate) struct Frame {
    title: String,
    subtitle: Option<String>,
    legend: Vec<LegendEntry>,
    footer: Vec<(String, RGBColor)>,
}

impl Frame {
    /// A frame with a title.
    pub fn new(title: &str) -> Self {
        Self { title: title.to_string(), ..Self::default() }
    }

    /// Adds a subtitle (context: units, scales, counts).
    pub fn subtitle(mut self, subtitle: impl Into<String>) -> Self {
        self.subtitle = Some(subtitle.into());
        self
    }

    /// Sets the legend entries (shown only when there is more than one).
    pub fn legend(mut self, entries: Vec<LegendEntry>) -> Self {
        self.legend = entries;
        self
    }

    /// Adds a caption under the body, wrapped to the chart width.
    pub fn caption(self, text: &str) -> Self {
        self.footer_text(text, MUTED_INK)
    }

    /// Adds the safety caution under the body.
    pub fn caution(self) -> Self {
        self.footer_text(&format!("⚠ {SAFETY_CAUTION}"), CAUTION_INK)
    }

    fn footer_text(mut self, text: &str, colour: RGBColor) -> Self {
        self.footer.extend(wrap(text, chars_per_line(SMALL_PX)).into_iter().map(|line| (line, colour)));
        self
    }

    /// The title in lines that fit the chart width.
    fn title_lines(&self) -> Vec<String> {
        wrap(&self.title, chars_per_line(TITLE_PX * 1.08))
    }

    /// The subtitle in lines that fit the chart width (none without a subtitle).
    fn subtitle_lines(&self) -> Vec<String> {
        self.subtitle.as_deref().map_or(Vec::new(), |s| wrap(s, chars_per_line(TEXT_PX)))
    }

    /// Pixels from the top to the first subtitle line.
    fn title_px(&self) -> i32 {
        TITLE_ROW_PX + TITLE_LINE_PX * (self.title_lines().len().max(1) as i32 - 1)
    }

    fn header_px(&self) -> i32 {
        let subtitle = SUBTITLE_ROW_PX * self.subtitle_lines().len() as i32;
        let legend = if self.legend.len() > 1 { legend::height(&self.legend) + 4 } else { 0 };
        self.title_px() + subtitle + legend
    }

    fn footer_px(&self) -> i32 {
        if self.footer.is_empty() { 0 } else { self.footer.len() as i32 * LINE_PX + 10 }
    }

    /// Draws the frame with a body `body_px` pixels high filled by `body`; on a drawing error,
    /// a chart that says what went wrong.
    pub fn draw(&self, body_px: u32, body: impl FnOnce(&Area) -> Drawn) -> String {
        match self.try_draw(body_px, body) {
            Ok(svg) => svg,
            Err(error) => self.message(&format!("The chart could not be drawn: {error}")),
        }
    }

    /// The frame with a body that says there is no data, and why.
    pub fn no_data(&self, why: &str) -> String {
        self.message(&format!("No data to draw: {why}"))
    }

    fn message(&self, text: &str) -> String {
        let frame = Frame { legend: Vec::new(), ..self.clone() };
        let drawn = frame.try_draw(NO_DATA_BODY_PX, |area| {
            let (width, height) = area.dim_in_pixel();
            area.draw(&Rectangle::new([(LEFT_PX, 4), (width as i32 - LEFT_PX, height as i32 - 4)], PLOT_BACKGROUND.filled()))?;
            let style = font::anchored(font::text(TEXT_PX, MUTED_INK), HPos::Center, VPos::Center);
            area.draw(&Text::new(text.to_string(), (width as i32 / 2, height as i32 / 2), style))?;
            Ok(())
        });
        drawn.unwrap_or_else(|_| minimal_svg(&self.title, text))
    }

    fn try_draw(&self, body_px: u32, body: impl FnOnce(&Area) -> Drawn) -> Result<String, Box<dyn std::error::Error>> {
        let (header, footer) = (self.header_px(), self.footer_px());
        let height = (header + body_px as i32 + footer) as u32;
        let mut svg = String::new();
        {
            let root = SVGBackend::with_string(&mut svg, (CHART_WIDTH_PX, height)).into_drawing_area();
            root.fill(&WHITE)?;
            self.draw_header(&root)?;
            let (_, rest) = root.split_vertically(header);
            let (body_area, footer_area) = rest.split_vertically(body_px);
            body(&body_area)?;
            self.draw_footer(&footer_area)?;
            root.present()?;
        }
        Ok(finish_svg(fine_path::expand(svg), &self.title))
    }

    fn draw_header(&self, root: &Area) -> Drawn {
        root.draw(&Rectangle::new([(LEFT_PX - 8, 11), (LEFT_PX - 4, self.title_px() - 5)], series_colour(0).filled()))?;
        for (index, line) in self.title_lines().into_iter().enumerate() {
            root.draw(&Text::new(line, (LEFT_PX, 12 + TITLE_LINE_PX * index as i32), font::bold(TITLE_PX)))?;
        }
        let subtitle_top = self.title_px() + 1;
        for (index, line) in self.subtitle_lines().into_iter().enumerate() {
            let y = subtitle_top + SUBTITLE_ROW_PX * index as i32;
            root.draw(&Text::new(line, (LEFT_PX, y), font::text(TEXT_PX, MUTED_INK)))?;
        }
        if self.legend.len() > 1 {
            let top = self.title_px() + SUBTITLE_ROW_PX * self.subtitle_lines().len() as i32;
            legend::draw(root, &self.legend, top)?;
        }
        Ok(())
    }

    fn draw_footer(&self, area: &Area) -> Drawn {
        for (index, (line, colour)) in self.footer.iter().enumerate() {
            let y = 4 + index as i32 * LINE_PX;
            area.draw(&Text::new(line.clone(), (LEFT_PX, y), font::text(SMALL_PX, *colour)))?;
        }
        Ok(())
    }
}

/// How many characters of `size_px` text fit across the chart.
fn chars_per_line(size_px: f64) -> usize {
    ((CHART_WIDTH_PX as f64 - 2.0 * LEFT_PX as f64) / text_width_px("x", size_px)) as usize
}

/// Words of `text` in lines of at most `width` characters.
pub(crate) fn wrap(text: &str, width: usize) -> Vec<String> {
    let mut lines: Vec<String> = Vec::new();
    for word in text.split_whitespace() {
        match lines.last_mut() {
            Some(line) if line.chars().count() + 1 + word.chars().count() <= width => {
                line.push(' ');
                line.push_str(word);
            }
            _ => lines.push(word.to_string()),
        }
    }
    lines
}

/// Makes the SVG scale with its container and gives it an accessible title.
fn finish_svg(svg: String, title: &str) -> String {
    let svg = svg.replacen("<svg ", "<svg role=\"img\" style=\"max-width:100%;height:auto\" ", 1);
    match svg.find('>') {
        Some(end) => format!("{}\n<title>{}</title>{}", &svg[..=end], escape(title), &svg[end + 1..]),
        None => svg,
    }
}

/// A hand-written SVG for when even the message frame cannot be drawn.
fn minimal_svg(title: &str, text: &str) -> String {
    format!(
        "<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"{w}\" height=\"80\" viewBox=\"0 0 {w} 80\">\
         <title>{t}</title><text x=\"16\" y=\"30\" font-family=\"{FONT_FAMILY}\" font-size=\"16\">{t}</text>\
         <text x=\"16\" y=\"60\" font-family=\"{FONT_FAMILY}\" font-size=\"13\">{m}</text></svg>",
        w = CHART_WIDTH_PX,
        t = escape(title),
        m = escape(text)
    )
}
