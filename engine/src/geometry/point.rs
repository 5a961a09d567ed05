use serde::{Deserialize, Serialize};

/// A point of a cross-section in the (r, z) half-plane: `r_m` is the distance from the disc's
/// symmetry axis and `z_m` the height above the outline's reference (z = 0 at the lowest point
/// of the rim for the parametric families), both in m.
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
pub struct RzPoint {
    /// Radius from the symmetry axis, m (≥ 0 in a valid outline).
    pub r_m: f64,
    /// Height, m.
    pub z_m: f64,
}

impl RzPoint {
    /// A point at radius `r_m` and height `z_m` (m).
    pub const fn new(r_m: f64, z_m: f64) -> Self {
        Self { r_m, z_m }
    }

    /// Vector difference `self − other`, m.
    pub(crate) fn minus(self, other: RzPoint) -> RzPoint {
        RzPoint::new(self.r_m - other.r_m, self.z_m - other.z_m)
    }

    /// 2-D cross product of `self` and `other` taken as vectors, m².
    pub(crate) fn cross(self, other: RzPoint) -> f64 {
        self.r_m * other.z_m - self.z_m * other.r_m
    }

    /// Dot product of `self` and `other` taken as vectors, m².
    pub(crate) fn dot(self, other: RzPoint) -> f64 {
        self.r_m * other.r_m + self.z_m * other.z_m
    }

    /// Whether both coordinates are finite.
    pub(crate) fn is_finite(self) -> bool {
        self.r_m.is_finite() && self.z_m.is_finite()
    }
}
