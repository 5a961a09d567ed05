use super::{LayupError, Material};
use crate::geometry::clip::{convex_planes, HalfPlane};
use crate::geometry::triangulate::triangulate;
use crate::geometry::{checked_polygon, signed_area_m2, GeometryError, RzPoint};
use serde::{Deserialize, Serialize};

/// Most points of a region polygon (it is triangulated by ear clipping).
pub const MAX_REGION_POINTS: usize = 1000;

/// Axis-aligned bounds of a region, m; a missing bound is unbounded on that side.
#[derive(Debug, Clone, Copy, PartialEq, Default, Serialize, Deserialize)]
#[serde(default)]
pub struct RegionBounds {
    /// Smallest radius, m.
    #[serde(skip_serializing_if = "Option::is_none")]
    pub r_min_m: Option<f64>,
    /// Largest radius, m.
    #[serde(skip_serializing_if = "Option::is_none")]
    pub r_max_m: Option<f64>,
    /// Lowest height, m.
    #[serde(skip_serializing_if = "Option::is_none")]
    pub z_min_m: Option<f64>,
    /// Highest height, m.
    #[serde(skip_serializing_if = "Option::is_none")]
    pub z_max_m: Option<f64>,
}

impl RegionBounds {
    /// Everything (no bound).
    pub fn everything() -> Self {
        Self::default()
    }

    /// Radii from `r_min_m` to `r_max_m` (m), any height.
    pub fn radial(r_min_m: Option<f64>, r_max_m: Option<f64>) -> Self {
        Self { r_min_m, r_max_m, ..Self::default() }
    }

    fn check(&self, region: &str) -> Result<(), LayupError> {
        let pairs = [("radial", self.r_min_m, self.r_max_m), ("height", self.z_min_m, self.z_max_m)];
        for (bound, low, high) in pairs {
            let low = low.unwrap_or(f64::NEG_INFINITY);
            let high = high.unwrap_or(f64::INFINITY);
            if low.is_nan() || high.is_nan() || low == f64::INFINITY || high == f64::NEG_INFINITY || low >= high {
                return Err(LayupError::BadBounds { region: region.to_string(), bound, low, high });
            }
        }
        Ok(())
    }

    fn planes(&self) -> Vec<HalfPlane> {
        let mut planes = Vec::with_capacity(4);
        planes.extend(self.r_min_m.map(HalfPlane::r_at_least));
        planes.extend(self.r_max_m.map(HalfPlane::r_at_most));
        planes.extend(self.z_min_m.map(HalfPlane::z_at_least));
        planes.extend(self.z_max_m.map(HalfPlane::z_at_most));
        planes
    }
}

/// The shape of a region in the (r, z) half-plane. Serialised with a `kind` tag.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(tag = "kind", rename_all = "snake_case")]
pub enum RegionShape {
    /// Everything of the outline within radial and height bounds.
    Bounds(RegionBounds),
    /// Everything of the outline inside a simple polygon (any shape; m).
    Polygon {
        /// The polygon's points, m.
        points: Vec<RzPoint>,
    },
    /// Whatever part of the outline no other region fills (at most one per layup), e.g. the
    /// base material around an embedded insert.
    Rest,
}

/// A part of the outline filled with one material.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct Region {
    /// Name shown in reports and errors (unique within a layup).
    pub name: String,
    /// The material that fills it.
    pub material: Material,
    /// Where it is.
    pub shape: RegionShape,
}

impl Region {
    /// A region within bounds.
    pub fn bounded(name: impl Into<String>, material: Material, bounds: RegionBounds) -> Self {
        Self { name: name.into(), material, shape: RegionShape::Bounds(bounds) }
    }

    /// A region inside a polygon (m).
    pub fn polygon(name: impl Into<String>, material: Material, points: Vec<RzPoint>) -> Self {
        Self { name: name.into(), material, shape: RegionShape::Polygon { points } }
    }

    /// The rest of the outline (see [`RegionShape::Rest`]).
    pub fn rest(name: impl Into<String>, material: Material) -> Self {
        Self { name: name.into(), material, shape: RegionShape::Rest }
    }

    /// Whether this region takes the rest of the outline.
    pub fn is_rest(&self) -> bool {
        self.shape == RegionShape::Rest
    }

    /// The region as convex cells (each a list of half-planes) whose union is the region
    /// (none for the rest region, which is filled by subtraction).
    pub(crate) fn convex_cells(&self) -> Result<Vec<Vec<HalfPlane>>, LayupError> {
        self.material.validate()?;
        match &self.shape {
            RegionShape::Bounds(bounds) => {
                bounds.check(&self.name)?;
                Ok(vec![bounds.planes()])
            }
            RegionShape::Polygon { points } => self.polygon_cells(points),
            RegionShape::Rest => Ok(Vec::new()),
        }
    }

    fn polygon_cells(&self, points: &[RzPoint]) -> Result<Vec<Vec<HalfPlane>>, LayupError> {
        let wrap = |source| LayupError::BadRegionPolygon { region: self.name.clone(), source };
        if points.len() > MAX_REGION_POINTS {
            return Err(wrap(GeometryError::TooManyPoints { count: points.len(), max: MAX_REGION_POINTS }));
        }
        let mut polygon = checked_polygon(points).map_err(wrap)?;
        if signed_area_m2(&polygon) < 0.0 {
            polygon.reverse();
        }
        Ok(triangulate(&polygon).iter().map(|t| convex_planes(t)).collect())
    }
}
