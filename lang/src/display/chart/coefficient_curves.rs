//! Aerodynamic coefficient curves (C_L, C_D, C_M) against angle of attack in degrees.

use super::data::{Axis, Series};
use super::line_chart::LineChart;
use crate::display::Render;
use crate::MimeBundle;

/// Coefficient curves against angle of attack: each series is one coefficient of one model,
/// labelled e.g. `C_L`, `C_D`, `C_M` or `C_L (P-7)`; points (α in degrees, coefficient).
#[derive(Debug, Clone, PartialEq)]
pub struct CoefficientCurves {
    /// Title.
    pub title: String,
    /// Where the coefficients come from (model name, source), shown as the subtitle.
    pub source: String,
    /// The curves.
    pub curves: Vec<Series>,
}

impl CoefficientCurves {
    /// Empty curves with a title and the coefficients' source.
    pub fn new(title: impl Into<String>, source: impl Into<String>) -> Self {
        Self { title: title.into(), source: source.into(), curves: Vec::new() }
    }

    /// Adds a curve: points (angle of attack in degrees, coefficient).
    pub fn curve(mut self, label: impl Into<String>, points: Vec<(f64, f64)>) -> Self {
        self.curves.push(Series::new(label, points));
        self
    }

    fn as_line_chart(&self) -> LineChart {
        LineChart {
            title: self.title.clone(),
            subtitle: Some(self.source.clone()).filter(|s| !s.is_empty()),
            x: Axis::new("angle of attack α", "deg"),
            y: Axis::new("coefficient (dimensionless)", ""),
            series: self.curves.clone(),
            zero_line: true,
        }
    }

    /// The chart as SVG.
    pub fn to_svg(&self) -> String {
        self.as_line_chart().to_svg()
    }
}

impl Render for CoefficientCurves {
    fn render(&self) -> MimeBundle {
        self.as_line_chart().render()
    }
}
