use super::polygon::{first_self_intersection, signed_area_m2, vertical_crossings, without_repeats};
use super::{GeometryError, RzPoint};
use serde::{Deserialize, Serialize};

/// Dimensions an outline knows because it was built from named parameters (all in m). An
/// outline from points may declare them too; where one is missing it is measured from the
/// points (see the accessors on [`Outline`]).
#[derive(Debug, Clone, Copy, PartialEq, Default, Serialize, Deserialize)]
#[serde(default)]
pub struct DeclaredDimensions {
    /// Radial width of the rim, from the outer edge to the inner rim wall, m.
    #[serde(skip_serializing_if = "Option::is_none")]
    pub rim_width_m: Option<f64>,
    /// Inner rim depth: from the bottom of the rim up to the underside of the flight plate at
    /// the inner rim wall, m.
    #[serde(skip_serializing_if = "Option::is_none")]
    pub rim_depth_m: Option<f64>,
    /// Vertical thickness of the rim's outer edge (the nose), m.
    #[serde(skip_serializing_if = "Option::is_none")]
    pub rim_thickness_m: Option<f64>,
    /// Thickness of the flight plate, m.
    #[serde(skip_serializing_if = "Option::is_none")]
    pub plate_thickness_m: Option<f64>,
    /// Radius of the rounded leading edge, m.
    #[serde(skip_serializing_if = "Option::is_none")]
    pub leading_edge_radius_m: Option<f64>,
}

impl DeclaredDimensions {
    fn validate(&self) -> Result<(), GeometryError> {
        let named = [
            ("rim width", self.rim_width_m),
            ("rim depth", self.rim_depth_m),
            ("rim thickness", self.rim_thickness_m),
            ("plate thickness", self.plate_thickness_m),
            ("leading-edge radius", self.leading_edge_radius_m),
        ];
        for (name, value) in named {
            if let Some(v) = value.filter(|v| !(v.is_finite() && *v >= 0.0)) {
                return Err(GeometryError::BadDeclaredDimension { name, value_m: v });
            }
        }
        Ok(())
    }
}

/// A disc's cross-section: a simple closed polygon in the (r, z) half-plane (m), stored
/// counter-clockwise (r to the right, z up) without repeating the first point. Revolving it
/// about the z axis gives the disc.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(try_from = "OutlineData", into = "OutlineData")]
pub struct Outline {
    points: Vec<RzPoint>,
    declared: DeclaredDimensions,
}

/// The serialised form of an [`Outline`]: its points and any declared dimensions.
#[derive(Debug, Clone, Serialize, Deserialize)]
struct OutlineData {
    points: Vec<RzPoint>,
    #[serde(default)]
    declared: DeclaredDimensions,
}

impl TryFrom<OutlineData> for Outline {
    type Error = GeometryError;
    fn try_from(data: OutlineData) -> Result<Self, GeometryError> {
        Outline::from_points(data.points)?.with_declared(data.declared)
    }
}

impl From<Outline> for OutlineData {
    fn from(outline: Outline) -> Self {
        OutlineData { points: outline.points, declared: outline.declared }
    }
}

/// Largest |r| or |z| of an outline point, m.
pub const MAX_COORDINATE_M: f64 = 10.0;
/// Smallest enclosed area accepted, m² (1e-12 m² = 1 µm²).
const MIN_AREA_M2: f64 = 1e-12;

impl Outline {
    /// An outline from its points (m). Closing the polygon by repeating the first point is
    /// optional. Checked: at least 3 distinct points, all finite and within ±10 m, every r ≥ 0, no
    /// self-intersection, positive area. A clockwise polygon is reversed.
    pub fn from_points(points: Vec<RzPoint>) -> Result<Self, GeometryError> {
        let mut points = checked_polygon(&points)?;
        if signed_area_m2(&points) < 0.0 {
            points.reverse();
        }
        Ok(Self { points, declared: DeclaredDimensions::default() })
    }

    /// The same outline with declared dimensions (each finite and ≥ 0).
    pub fn with_declared(mut self, declared: DeclaredDimensions) -> Result<Self, GeometryError> {
        declared.validate()?;
        self.declared = declared;
        Ok(self)
    }

    /// The points, counter-clockwise, first point not repeated, m.
    pub fn points(&self) -> &[RzPoint] {
        &self.points
    }

    /// The declared dimensions.
    pub fn declared(&self) -> &DeclaredDimensions {
        &self.declared
    }

    /// Enclosed cross-section area, m².
    pub fn area_m2(&self) -> f64 {
        signed_area_m2(&self.points)
    }

    /// Largest radius of the outline, m.
    pub fn outer_radius_m(&self) -> f64 {
        self.points.iter().map(|p| p.r_m).fold(0.0, f64::max)
    }

    /// Outside diameter, m.
    pub fn diameter_m(&self) -> f64 {
        2.0 * self.outer_radius_m()
    }

    /// Lowest and highest z of the outline, m.
    pub fn height_range_m(&self) -> (f64, f64) {
        let zs = self.points.iter().map(|p| p.z_m);
        (zs.clone().fold(f64::INFINITY, f64::min), zs.fold(f64::NEG_INFINITY, f64::max))
    }

    /// Inner rim depth, m: declared, else measured as the height of the plate underside just
    /// inside the inner rim wall above the lowest point (see [`Outline::rim_width_m`]).
    pub fn rim_depth_m(&self) -> f64 {
        self.declared.rim_depth_m.unwrap_or_else(|| self.measure_rim().1)
    }

    /// Radial rim width, m: declared, else measured: the inner rim wall is the smallest radius
    /// at which the lower surface has dropped below half-way between the plate underside near
    /// the axis and the lowest point (sampled every 1/400 of the radius).
    pub fn rim_width_m(&self) -> f64 {
        self.declared.rim_width_m.unwrap_or_else(|| self.measure_rim().0)
    }

    /// Vertical thickness of the rim's outer edge, m: declared, else measured as the height
    /// spanned by the outline 1.6 mm (the leading-edge gauge's radius) inside its outer radius.
    pub fn rim_thickness_m(&self) -> f64 {
        self.declared.rim_thickness_m.unwrap_or_else(|| {
            let outer = self.outer_radius_m();
            let r_probe = outer - (1.6e-3_f64).min(0.5 * outer);
            span(&vertical_crossings(&self.points, r_probe))
        })
    }

    /// Flight-plate thickness, m: declared, else measured on the innermost radius of the
    /// outline (on the axis for a full disc).
    pub fn plate_thickness_m(&self) -> f64 {
        self.declared.plate_thickness_m.unwrap_or_else(|| span(&self.crossings_near_axis()))
    }

    /// Leading-edge radius, m, when declared (an outline from points does not know it).
    pub fn leading_edge_radius_m(&self) -> Option<f64> {
        self.declared.leading_edge_radius_m
    }

    fn crossings_near_axis(&self) -> Vec<f64> {
        let r_inner = self.points.iter().map(|p| p.r_m).fold(f64::INFINITY, f64::min);
        vertical_crossings(&self.points, r_inner + 1e-6 * self.outer_radius_m())
    }

    /// Measured (rim width, rim depth), m.
    fn measure_rim(&self) -> (f64, f64) {
        let (z_low, _) = self.height_range_m();
        let z_plate = self.crossings_near_axis().first().copied().unwrap_or(z_low);
        let threshold = z_low + 0.5 * (z_plate - z_low);
        let outer = self.outer_radius_m();
        let r_inner = self.points.iter().map(|p| p.r_m).fold(f64::INFINITY, f64::min);
        let samples = 400;
        let mut underside = z_plate;
        for k in 1..samples {
            let r = r_inner + (outer - r_inner) * k as f64 / samples as f64;
            let Some(&z) = vertical_crossings(&self.points, r).first() else { continue };
            if z < threshold {
                return (outer - r, underside - z_low);
            }
            underside = z;
        }
        (0.0, 0.0)
    }
}

fn span(heights: &[f64]) -> f64 {
    match heights {
        [low, high, ..] => high - low,
        _ => 0.0,
    }
}

/// Checks the polygon rules and returns the points without repeats.
pub(crate) fn checked_polygon(points: &[RzPoint]) -> Result<Vec<RzPoint>, GeometryError> {
    for (index, p) in points.iter().enumerate() {
        if !p.is_finite() {
            return Err(GeometryError::NotFinite { index, r_m: p.r_m, z_m: p.z_m });
        }
        if p.r_m.abs() > MAX_COORDINATE_M || p.z_m.abs() > MAX_COORDINATE_M {
            return Err(GeometryError::CoordinateOutOfRange { index, r_m: p.r_m, z_m: p.z_m, limit_m: MAX_COORDINATE_M });
        }
        if p.r_m < 0.0 {
            return Err(GeometryError::NegativeRadius { index, r_m: p.r_m });
        }
    }
    let points = without_repeats(points);
    if points.len() < 3 {
        return Err(GeometryError::TooFewPoints { count: points.len() });
    }
    let area_m2 = signed_area_m2(&points).abs();
    let collinear = all_collinear(&points);
    if let Some((first, second)) = first_self_intersection(&points).filter(|_| !collinear) {
        return Err(GeometryError::SelfIntersecting { first, second });
    }
    if area_m2 < MIN_AREA_M2 || collinear {
        return Err(GeometryError::ZeroArea { area_m2, min_area_m2: MIN_AREA_M2 });
    }
    Ok(points)
}

fn all_collinear(points: &[RzPoint]) -> bool {
    let (a, b) = (points[0], points[1]);
    points.iter().all(|&p| b.minus(a).cross(p.minus(a)) == 0.0)
}
