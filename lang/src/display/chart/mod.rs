//! Charts drawn with `plotters` into `image/svg+xml`, each from plain data.

mod axes;
mod bounds;
mod data;
mod fine_path;
mod font;
mod frame;
mod legend;

pub use data::{Axis, Series, Track};
mod grouped_lines;
mod line_chart;
mod marker;
mod plan_view;
mod side_view;
mod track_marks;

pub use grouped_lines::{GroupedLine, GroupedLines};
pub use line_chart::LineChart;
pub use plan_view::PlanView;
pub use side_view::SideView;
mod coefficient_curves;
mod time_series;

pub use coefficient_curves::CoefficientCurves;
pub use time_series::{Panel, TimeSeries};
mod cross_section;

pub use cross_section::{CrossSection, Region};
mod mass_bars;

pub use mass_bars::{BarGroup, MassBars};
mod colour_scale;
mod heat_map;

pub use heat_map::HeatMap;
mod scatter;
mod spread;

pub use scatter::ScatterEllipses;
pub use spread::{ellipse_scale, Spread};
