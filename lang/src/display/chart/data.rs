//! Plain data the charts are drawn from: labelled series of points, axes with units, flight
//! tracks, cross-section regions, bar groups.

/// An axis: what it shows and its unit, e.g. `Axis::new("downrange x", "m")`.
#[derive(Debug, Clone, PartialEq)]
pub struct Axis {
    /// What the axis shows.
    pub title: String,
    /// Its unit (empty for dimensionless quantities).
    pub unit: String,
}

impl Axis {
    /// An axis with a title and a unit.
    pub fn new(title: impl Into<String>, unit: impl Into<String>) -> Self {
        Self { title: title.into(), unit: unit.into() }
    }

    /// `title (unit)`, or the title alone when there is no unit.
    pub fn label(&self) -> String {
        if self.unit.is_empty() { self.title.clone() } else { format!("{} ({})", self.title, self.unit) }
    }
}

/// A labelled series of (x, y) points in the chart's axis units.
#[derive(Debug, Clone, PartialEq)]
pub struct Series {
    /// Legend label.
    pub label: String,
    /// Points (x, y); non-finite points are skipped when drawn.
    pub points: Vec<(f64, f64)>,
}

impl Series {
    /// A series from a label and points.
    pub fn new(label: impl Into<String>, points: Vec<(f64, f64)>) -> Self {
        Self { label: label.into(), points }
    }

    /// The finite points only.
    pub fn finite_points(&self) -> Vec<(f64, f64)> {
        finite(&self.points)
    }
}

/// One flight's path for the plan and side views: points in metres, with optional landing
/// (first ground contact) and rest (where it stopped) points in the same plane.
#[derive(Debug, Clone, PartialEq)]
pub struct Track {
    /// Legend label (e.g. the design or throw name).
    pub label: String,
    /// Path points (m): (downrange x, lateral y) for the plan view, (downrange x, height z)
    /// for the side view.
    pub points: Vec<(f64, f64)>,
    /// First ground contact (m), if known.
    pub landing: Option<(f64, f64)>,
    /// Where the disc came to rest (m), if known.
    pub rest: Option<(f64, f64)>,
    /// The path on the ground from first contact to rest (m), in the same plane; empty when
    /// not known (the chart then draws a straight line from the landing to the rest point).
    pub ground: Vec<(f64, f64)>,
}

impl Track {
    /// A track from a label and path points (m).
    pub fn new(label: impl Into<String>, points: Vec<(f64, f64)>) -> Self {
        Self { label: label.into(), points, landing: None, rest: None, ground: Vec::new() }
    }

    /// Sets the landing point (m).
    pub fn landing(mut self, point: (f64, f64)) -> Self {
        self.landing = Some(point);
        self
    }

    /// Sets the rest point (m).
    pub fn rest(mut self, point: (f64, f64)) -> Self {
        self.rest = Some(point);
        self
    }

    /// Sets the path on the ground from first contact to rest (m).
    pub fn ground(mut self, points: Vec<(f64, f64)>) -> Self {
        self.ground = points;
        self
    }

    /// The ground play to draw, from first contact to rest (m): the ground path, joined to the
    /// landing and rest points when they are known, else the straight line from the landing to
    /// the rest point; empty when that leaves fewer than two distinct points.
    pub(crate) fn ground_play(&self) -> Vec<(f64, f64)> {
        let (landing, rest) = (self.landing.filter(|p| point_is_finite(*p)), self.rest.filter(|p| point_is_finite(*p)));
        let mut path: Vec<(f64, f64)> = landing.into_iter().collect();
        for point in finite(&self.ground).into_iter().chain(rest) {
            if path.last().is_none_or(|last| (last.0 - point.0).hypot(last.1 - point.1) > 1e-9) {
                path.push(point);
            }
        }
        if path.len() >= 2 { path } else { Vec::new() }
    }

    /// Every finite point of the track, the markers and the ground path included (for axis
    /// ranges).
    pub(crate) fn all_finite_points(&self) -> Vec<(f64, f64)> {
        let markers = self.landing.iter().chain(self.rest.iter()).chain(self.ground.iter()).copied();
        finite(&self.points.iter().copied().chain(markers).collect::<Vec<_>>())
    }
}

/// The finite points of a list.
pub(crate) fn finite(points: &[(f64, f64)]) -> Vec<(f64, f64)> {
    points.iter().copied().filter(|(x, y)| x.is_finite() && y.is_finite()).collect()
}

/// True when both coordinates are finite.
pub(crate) fn point_is_finite(point: (f64, f64)) -> bool {
    point.0.is_finite() && point.1.is_finite()
}
