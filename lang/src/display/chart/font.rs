//! Text styles in our fonts, sized in real pixels.

use crate::display::style::{FONT_FAMILY, INK};
use plotters::style::{FontStyle, FontTransform, IntoFont, RGBColor, TextStyle};
use plotters::style::text_anchor::{HPos, Pos, VPos};

/// The SVG backend writes `size / 1.24` as the font size; this undoes that.
const PLOTTERS_SIZE_FACTOR: f64 = 1.24;

/// A text style of `size_px` pixels in `colour`, anchored at its left top.
pub(crate) fn text(size_px: f64, colour: RGBColor) -> TextStyle<'static> {
    let font = (FONT_FAMILY, size_px * PLOTTERS_SIZE_FACTOR).into_font();
    font.color(&colour).pos(Pos::new(HPos::Left, VPos::Top))
}

/// A bold text style of `size_px` pixels in the main ink, anchored at its left top.
pub(crate) fn bold(size_px: f64) -> TextStyle<'static> {
    let font = (FONT_FAMILY, size_px * PLOTTERS_SIZE_FACTOR).into_font().style(FontStyle::Bold);
    font.color(&INK).pos(Pos::new(HPos::Left, VPos::Top))
}

/// The same style anchored at (`h`, `v`).
pub(crate) fn anchored(style: TextStyle<'static>, h: HPos, v: VPos) -> TextStyle<'static> {
    style.pos(Pos::new(h, v))
}

/// The same style turned to read upwards (rotated a quarter turn anticlockwise).
pub(crate) fn upright(style: TextStyle<'static>) -> TextStyle<'static> {
    TextStyle { font: style.font.transform(FontTransform::Rotate270), ..style }
}
