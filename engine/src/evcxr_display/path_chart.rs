//! The flight path as an SVG chart: side view (height over downrange) above a top view
//! (lateral offset over downrange), one line per flight, with the safety caution.
use super::html::escape;
use super::SAFETY_CAUTION;
use crate::Flight;

const WIDTH: f64 = 720.0;
const HEIGHT: f64 = 470.0;
const LEFT: f64 = 64.0;
const RIGHT: f64 = 24.0;
const PANEL_H: f64 = 150.0;
const SIDE_TOP: f64 = 40.0;
const TOP_TOP: f64 = 250.0;
const COLOURS: [&str; 6] = ["#1f5fa8", "#c2571a", "#2e8b57", "#8e3b8f", "#b8860b", "#444444"];

/// One flight's path: label and points (downrange m, lateral m positive to the thrower's left,
/// height m) along the release heading line.
#[derive(Debug, Clone, PartialEq)]
struct Path {
    label: String,
    points: Vec<(f64, f64, f64)>,
}

/// An SVG chart of one or more flight paths (side and top views on shared downrange axes).
#[derive(Debug, Clone, Default, PartialEq)]
pub struct FlightPathChart {
    paths: Vec<Path>,
}

impl FlightPathChart {
    /// An empty chart.
    pub fn new() -> Self {
        Self::default()
    }

    /// Adds `flight` with a legend `label` (flights flown without recorded samples add a line
    /// from release to landing only).
    pub fn with_flight(mut self, flight: &Flight, label: &str) -> Self {
        let heading = flight.release.heading_rad;
        let (s, c) = heading.sin_cos();
        let mut points: Vec<(f64, f64, f64)> =
            flight.samples.iter().map(|p| (c * p.position_m.x + s * p.position_m.y, -s * p.position_m.x + c * p.position_m.y, p.position_m.z)).collect();
        if points.is_empty() {
            for state in [&flight.release_state, &flight.landing_state] {
                let p = state.position_m;
                points.push((c * p.x + s * p.y, -s * p.x + c * p.y, p.z));
            }
        }
        self.paths.push(Path { label: label.to_string(), points });
        self
    }

    /// The chart as a standalone SVG document (sizes in px; axes in m).
    pub fn to_svg(&self) -> String {
        let all = self.paths.iter().flat_map(|p| p.points.iter());
        let (mut x_max, mut z_max, mut y_abs): (f64, f64, f64) = (1.0, 1.0, 1.0);
        let mut x_min: f64 = 0.0;
        for &(x, y, z) in all {
            x_max = x_max.max(x);
            x_min = x_min.min(x);
            z_max = z_max.max(z);
            y_abs = y_abs.max(y.abs());
        }
        let x_axis = Axis::nice(x_min, x_max);
        let side = Panel { top: SIDE_TOP, x: x_axis, y: Axis::nice(0.0, z_max) };
        let top = Panel { top: TOP_TOP, x: x_axis, y: Axis::nice(-y_abs, y_abs) };
        let mut svg = format!(
            "<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"{WIDTH}\" height=\"{HEIGHT}\" viewBox=\"0 0 {WIDTH} {HEIGHT}\" font-family=\"sans-serif\" font-size=\"12\">\
             <rect width=\"100%\" height=\"100%\" fill=\"white\"/>"
        );
        svg.push_str(&side.frame("Side view: height (m) over downrange (m)"));
        svg.push_str(&top.frame("Top view: lateral offset (m, + toward the thrower's left) over downrange (m)"));
        for (i, path) in self.paths.iter().enumerate() {
            let colour = COLOURS[i % COLOURS.len()];
            svg.push_str(&side.line(path.points.iter().map(|p| (p.0, p.2)), colour));
            svg.push_str(&top.line(path.points.iter().map(|p| (p.0, p.1)), colour));
            let y = SIDE_TOP + 14.0 + 16.0 * i as f64;
            svg.push_str(&format!(
                "<line x1=\"{:.1}\" y1=\"{:.1}\" x2=\"{:.1}\" y2=\"{:.1}\" stroke=\"{colour}\" stroke-width=\"2.5\"/><text x=\"{:.1}\" y=\"{:.1}\">{}</text>",
                WIDTH - RIGHT - 190.0, y - 4.0, WIDTH - RIGHT - 168.0, y - 4.0, WIDTH - RIGHT - 162.0, y, escape(&path.label)
            ));
        }
        svg.push_str(&format!("<text x=\"{LEFT}\" y=\"{:.1}\" font-size=\"11\" fill=\"#7a1d1d\">{}</text>", HEIGHT - 26.0, escape(&SAFETY_CAUTION[..SAFETY_CAUTION.find("check").unwrap_or(0)])));
        svg.push_str(&format!("<text x=\"{LEFT}\" y=\"{:.1}\" font-size=\"11\" fill=\"#7a1d1d\">{}</text>", HEIGHT - 11.0, escape(&SAFETY_CAUTION[SAFETY_CAUTION.find("check").unwrap_or(0)..])));
        svg.push_str("</svg>");
        svg
    }
}

/// A linear axis with "nice" ticks (steps of 1, 2 or 5 times a power of ten).
#[derive(Debug, Clone, Copy)]
struct Axis {
    min: f64,
    max: f64,
    step: f64,
}

impl Axis {
    fn nice(min: f64, max: f64) -> Self {
        let raw = ((max - min) / 5.0).max(1e-9);
        let power = 10f64.powf(raw.log10().floor());
        let step = [1.0, 2.0, 5.0, 10.0].iter().map(|m| m * power).find(|s| *s >= raw).unwrap_or(10.0 * power);
        Self { min: (min / step).floor() * step, max: (max / step).ceil() * step, step }
    }

    fn ticks(&self) -> Vec<f64> {
        let count = ((self.max - self.min) / self.step).round() as usize;
        (0..=count).map(|i| self.min + i as f64 * self.step).collect()
    }
}

/// One panel: a frame with ticks, mapping data to pixels.
struct Panel {
    top: f64,
    x: Axis,
    y: Axis,
}

impl Panel {
    fn px(&self, x: f64) -> f64 {
        LEFT + (x - self.x.min) / (self.x.max - self.x.min) * (WIDTH - LEFT - RIGHT)
    }

    fn py(&self, y: f64) -> f64 {
        self.top + PANEL_H - (y - self.y.min) / (self.y.max - self.y.min) * PANEL_H
    }

    fn frame(&self, title: &str) -> String {
        let mut out = format!(
            "<text x=\"{LEFT}\" y=\"{:.1}\" font-weight=\"bold\">{}</text><rect x=\"{LEFT}\" y=\"{:.1}\" width=\"{:.1}\" height=\"{PANEL_H}\" fill=\"none\" stroke=\"#888\"/>",
            self.top - 8.0, escape(title), self.top, WIDTH - LEFT - RIGHT
        );
        for x in self.x.ticks() {
            let px = self.px(x);
            out.push_str(&format!(
                "<line x1=\"{px:.1}\" y1=\"{:.1}\" x2=\"{px:.1}\" y2=\"{:.1}\" stroke=\"#e4e4e4\"/><text x=\"{px:.1}\" y=\"{:.1}\" text-anchor=\"middle\">{}</text>",
                self.top, self.top + PANEL_H, self.top + PANEL_H + 15.0, tick_label(x)
            ));
        }
        for y in self.y.ticks() {
            let py = self.py(y);
            out.push_str(&format!(
                "<line x1=\"{LEFT}\" y1=\"{py:.1}\" x2=\"{:.1}\" y2=\"{py:.1}\" stroke=\"#e4e4e4\"/><text x=\"{:.1}\" y=\"{:.1}\" text-anchor=\"end\">{}</text>",
                WIDTH - RIGHT, LEFT - 6.0, py + 4.0, tick_label(y)
            ));
        }
        out
    }

    fn line(&self, points: impl Iterator<Item = (f64, f64)>, colour: &str) -> String {
        let coords: Vec<String> = points.map(|(x, y)| format!("{:.1},{:.1}", self.px(x), self.py(y))).collect();
        format!("<polyline points=\"{}\" fill=\"none\" stroke=\"{colour}\" stroke-width=\"2\"/>", coords.join(" "))
    }
}

fn tick_label(value: f64) -> String {
    let rounded = (value * 1000.0).round() / 1000.0;
    if rounded == 0.0 { "0".to_string() } else { format!("{rounded}") }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn nice_axes_cover_the_data_with_round_steps() {
        let axis = Axis::nice(0.0, 63.0);
        assert_eq!((axis.min, axis.max, axis.step), (0.0, 80.0, 20.0));
        assert_eq!(axis.ticks(), vec![0.0, 20.0, 40.0, 60.0, 80.0]);
        let small = Axis::nice(-1.2, 1.2);
        assert_eq!(small.step, 0.5);
        assert_eq!(small.ticks(), vec![-1.5, -1.0, -0.5, 0.0, 0.5, 1.0, 1.5]);
        assert_eq!(tick_label(-0.0), "0");
        assert_eq!(tick_label(0.30000000000000004), "0.3");
    }
}
