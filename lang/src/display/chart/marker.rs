//! Point markers that tell series apart by shape as well as colour: a filled circle, square,
//! diamond, upward and downward triangle, in that order, each with a thin outline in the plot
//! background so coinciding markers stay visible.

use super::frame::Drawn;
use plotters::coord::CoordTranslate;
use plotters::element::{Circle, EmptyElement, Polygon};
use plotters::prelude::{DrawingArea, SVGBackend};
use plotters::style::{Color, RGBColor};

/// A marker shape.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub(crate) enum Marker {
    /// A filled circle.
    Circle,
    /// A filled square.
    Square,
    /// A filled diamond.
    Diamond,
    /// A filled triangle pointing up.
    TriangleUp,
    /// A filled triangle pointing down.
    TriangleDown,
}

const ORDER: [Marker; 5] = [Marker::Circle, Marker::Square, Marker::Diamond, Marker::TriangleUp, Marker::TriangleDown];

impl Marker {
    /// The marker of series number `index` (cycles through the shapes).
    pub fn of(index: usize) -> Self {
        ORDER[index % ORDER.len()]
    }

    /// The corners of the shape `half` pixels from its centre to its side (none for a circle),
    /// as pixel offsets (y down); each shape covers about the same area.
    fn corners(self, half: i32) -> Vec<(i32, i32)> {
        let diagonal = (f64::from(half) * 1.35).round() as i32;
        let tall = (f64::from(half) * 1.25).round() as i32;
        match self {
            Marker::Circle => Vec::new(),
            Marker::Square => vec![(-half, -half), (half, -half), (half, half), (-half, half)],
            Marker::Diamond => vec![(0, -diagonal), (diagonal, 0), (0, diagonal), (-diagonal, 0)],
            Marker::TriangleUp => vec![(0, -tall), (tall, tall - 2), (-tall, tall - 2)],
            Marker::TriangleDown => vec![(0, tall), (tall, 2 - tall), (-tall, 2 - tall)],
        }
    }
}

/// Draws `marker` of half-size `half` px in `colour` at `at` (in the area's coordinates) with a
/// one-pixel `edge` around it.
pub(crate) fn draw_marker<C: CoordTranslate>(
    area: &DrawingArea<SVGBackend, C>,
    at: C::From,
    (marker, half): (Marker, i32),
    colour: RGBColor,
    edge: RGBColor,
) -> Drawn
where
    C::From: Clone,
{
    if marker == Marker::Circle {
        area.draw(&(EmptyElement::at(at.clone()) + Circle::new((0, 0), half + 1, edge.filled())))?;
        area.draw(&(EmptyElement::at(at) + Circle::new((0, 0), half, colour.filled())))?;
        return Ok(());
    }
    let outer = marker.corners(half + 1);
    area.draw(&(EmptyElement::at(at.clone()) + Polygon::new(outer, edge.filled())))?;
    area.draw(&(EmptyElement::at(at) + Polygon::new(marker.corners(half), colour.filled())))?;
    Ok(())
}
