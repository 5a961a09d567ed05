//! Landing zones: a target circle, a fairway corridor (centre line and half width) or a polygon.
use serde::{Deserialize, Serialize};

/// An area on the ground (world x, y in m) whose share of landings a dispersion reports.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(tag = "kind", rename_all = "snake_case")]
pub enum Zone {
    /// A circle around a target.
    Circle {
        /// Centre (x, y), m.
        centre_m: [f64; 2],
        /// Radius, m.
        radius_m: f64,
    },
    /// A corridor: points within `half_width_m` of a polyline centre line.
    Corridor {
        /// Centre line points (x, y), m (at least 2).
        centre_line_m: Vec<[f64; 2]>,
        /// Half width, m.
        half_width_m: f64,
    },
    /// A simple polygon (x, y), m (at least 3 points; even-odd rule).
    Polygon {
        /// Vertices in order.
        points_m: Vec<[f64; 2]>,
    },
}

impl Zone {
    /// True when the point (x, y) in m lies inside (boundary included).
    pub fn contains(&self, p: [f64; 2]) -> bool {
        match self {
            Zone::Circle { centre_m, radius_m } => (p[0] - centre_m[0]).hypot(p[1] - centre_m[1]) <= *radius_m,
            Zone::Corridor { centre_line_m, half_width_m } => {
                centre_line_m.windows(2).any(|w| segment_distance(p, w[0], w[1]) <= *half_width_m)
            }
            Zone::Polygon { points_m } => inside_polygon(p, points_m),
        }
    }

    /// The zone's boundary as closed rings of (x, y) points in m, for drawing: a circle as a
    /// polygon of `vertices` corners; a corridor as one rounded strip (a stadium: the points
    /// within the half width of a segment) per centre-line segment; a polygon as itself.
    pub fn outline_m(&self, vertices: usize) -> Vec<Vec<[f64; 2]>> {
        let n = vertices.max(8);
        let arc = |c: [f64; 2], r: f64, from: f64, count: usize| -> Vec<[f64; 2]> {
            (0..=count).map(|i| from + std::f64::consts::PI * i as f64 / count as f64).map(|t| [c[0] + r * t.cos(), c[1] + r * t.sin()]).collect()
        };
        match self {
            Zone::Circle { centre_m, radius_m } => {
                let mut ring = arc(*centre_m, *radius_m, 0.0, n / 2);
                ring.extend(arc(*centre_m, *radius_m, std::f64::consts::PI, n / 2));
                vec![ring]
            }
            Zone::Corridor { centre_line_m, half_width_m } => centre_line_m
                .windows(2)
                .map(|w| {
                    let heading = (w[1][1] - w[0][1]).atan2(w[1][0] - w[0][0]);
                    let half = std::f64::consts::FRAC_PI_2;
                    let mut ring = arc(w[1], *half_width_m, heading - half, n / 2);
                    ring.extend(arc(w[0], *half_width_m, heading + half, n / 2));
                    ring.push(ring[0]);
                    ring
                })
                .collect(),
            Zone::Polygon { points_m } => {
                let mut ring = points_m.clone();
                ring.extend(points_m.first().copied());
                vec![ring]
            }
        }
    }

    /// The share (0 … 1) of `points` inside; 0 for no points.
    pub fn share_inside(&self, points: &[[f64; 2]]) -> f64 {
        if points.is_empty() {
            return 0.0;
        }
        points.iter().filter(|p| self.contains(**p)).count() as f64 / points.len() as f64
    }
}

fn segment_distance(p: [f64; 2], a: [f64; 2], b: [f64; 2]) -> f64 {
    let (dx, dy) = (b[0] - a[0], b[1] - a[1]);
    let length2 = dx * dx + dy * dy;
    let t = if length2 > 0.0 { (((p[0] - a[0]) * dx + (p[1] - a[1]) * dy) / length2).clamp(0.0, 1.0) } else { 0.0 };
    (p[0] - a[0] - t * dx).hypot(p[1] - a[1] - t * dy)
}

fn inside_polygon(p: [f64; 2], points: &[[f64; 2]]) -> bool {
    let mut inside = false;
    for (i, a) in points.iter().enumerate() {
        let b = points[(i + 1) % points.len()];
        if (a[1] > p[1]) != (b[1] > p[1]) && p[0] < a[0] + (p[1] - a[1]) * (b[0] - a[0]) / (b[1] - a[1]) {
            inside = !inside;
        }
    }
    inside
}
