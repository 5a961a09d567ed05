use nalgebra::Vector3;
use serde::{Deserialize, Serialize};

use super::error::{finite, GroundError};

/// Steepest ground slope the contact model accepts, degrees. Steeper ground is not a playing
/// field, and a disc would rarely come to rest on it.
pub const MAX_GROUND_SLOPE_DEG: f64 = 30.0;

/// A flat or uniformly sloped ground plane. Built with [`GroundPlane::new`] (validated);
/// deserialising validates too.
///
/// The plane passes through (0, 0, `height_at_origin_m`) and falls by `tan(slope)` per metre
/// toward the downhill azimuth: z(x, y) = h₀ − tan(slope)·(x cos a + y sin a).
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
#[serde(try_from = "GroundPlaneSpec", into = "GroundPlaneSpec")]
pub struct GroundPlane {
    height_at_origin_m: f64,
    slope_rad: f64,
    downhill_azimuth_rad: f64,
}

/// The unvalidated serialised form of a [`GroundPlane`].
#[derive(Debug, Clone, Copy, Serialize, Deserialize)]
struct GroundPlaneSpec {
    #[serde(default)]
    height_at_origin_m: f64,
    #[serde(default)]
    slope_rad: f64,
    #[serde(default)]
    downhill_azimuth_rad: f64,
}

impl TryFrom<GroundPlaneSpec> for GroundPlane {
    type Error = GroundError;
    fn try_from(spec: GroundPlaneSpec) -> Result<Self, GroundError> {
        GroundPlane::new(spec.height_at_origin_m, spec.slope_rad, spec.downhill_azimuth_rad)
    }
}

impl From<GroundPlane> for GroundPlaneSpec {
    fn from(plane: GroundPlane) -> Self {
        GroundPlaneSpec {
            height_at_origin_m: plane.height_at_origin_m,
            slope_rad: plane.slope_rad,
            downhill_azimuth_rad: plane.downhill_azimuth_rad,
        }
    }
}

impl Default for GroundPlane {
    /// Level ground at z = 0.
    fn default() -> Self {
        GroundPlane { height_at_origin_m: 0.0, slope_rad: 0.0, downhill_azimuth_rad: 0.0 }
    }
}

impl GroundPlane {
    /// A plane of height `height_at_origin_m` (m) at x = y = 0, slope `slope_rad` (rad, 0 to
    /// [`MAX_GROUND_SLOPE_DEG`]) falling toward `downhill_azimuth_rad` (rad about +z from
    /// downrange +x toward +y, i.e. positive = to the left).
    pub fn new(height_at_origin_m: f64, slope_rad: f64, downhill_azimuth_rad: f64) -> Result<Self, GroundError> {
        finite("ground height at the origin (m)", height_at_origin_m)?;
        finite("ground slope (rad)", slope_rad)?;
        finite("downhill direction (rad)", downhill_azimuth_rad)?;
        let slope_deg = slope_rad.to_degrees();
        if slope_deg < 0.0 {
            return Err(GroundError::NegativeSlope { slope_deg, max_deg: MAX_GROUND_SLOPE_DEG });
        }
        if slope_deg > MAX_GROUND_SLOPE_DEG {
            return Err(GroundError::SlopeTooSteep { slope_deg, max_deg: MAX_GROUND_SLOPE_DEG });
        }
        Ok(GroundPlane { height_at_origin_m, slope_rad, downhill_azimuth_rad })
    }

    /// Level ground at height `height_m` (m).
    pub fn level(height_m: f64) -> Result<Self, GroundError> {
        GroundPlane::new(height_m, 0.0, 0.0)
    }

    /// Height of the plane at the origin, m.
    pub fn height_at_origin_m(&self) -> f64 {
        self.height_at_origin_m
    }

    /// Slope angle, rad.
    pub fn slope_rad(&self) -> f64 {
        self.slope_rad
    }

    /// Downhill direction, rad about +z from +x.
    pub fn downhill_azimuth_rad(&self) -> f64 {
        self.downhill_azimuth_rad
    }

    /// Unit horizontal vector pointing downhill (x, y, 0).
    pub fn downhill(&self) -> Vector3<f64> {
        Vector3::new(self.downhill_azimuth_rad.cos(), self.downhill_azimuth_rad.sin(), 0.0)
    }

    /// Unit normal of the plane pointing out of the ground (up), k̂.
    pub fn normal(&self) -> Vector3<f64> {
        let (sin_s, cos_s) = self.slope_rad.sin_cos();
        self.downhill() * sin_s + Vector3::z() * cos_s
    }

    /// Ground height z at horizontal position (x, y), m.
    pub fn height_at_m(&self, x_m: f64, y_m: f64) -> f64 {
        let downhill = self.downhill();
        self.height_at_origin_m - self.slope_rad.tan() * (x_m * downhill.x + y_m * downhill.y)
    }

    /// Signed distance of point `p` (m) from the plane along its normal, m (> 0 above ground).
    pub fn distance_m(&self, p: &Vector3<f64>) -> f64 {
        (p - Vector3::new(0.0, 0.0, self.height_at_origin_m)).dot(&self.normal())
    }

    /// The component of the vector `v` lying in the plane (normal part removed).
    pub fn tangential(&self, v: &Vector3<f64>) -> Vector3<f64> {
        let k = self.normal();
        v - k * v.dot(&k)
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn points_on_the_plane_have_zero_distance_and_the_normal_is_perpendicular() {
        // source: common practice, no published source (analytic geometry of a plane).
        let plane = GroundPlane::new(0.4, 12f64.to_radians(), 2.5).expect("valid");
        let on = |x: f64, y: f64| Vector3::new(x, y, plane.height_at_m(x, y));
        assert!(plane.distance_m(&on(3.0, -7.0)).abs() < 1e-12);
        assert!((on(3.0, -7.0) - on(-2.0, 5.0)).dot(&plane.normal()).abs() < 1e-12);
        assert!((plane.normal().z - 12f64.to_radians().cos()).abs() < 1e-15);
        // Downhill really is down.
        assert!(plane.height_at_m(plane.downhill().x, plane.downhill().y) < plane.height_at_origin_m());
    }

    #[test]
    fn negative_slopes_are_rejected_with_a_hint() {
        let error = GroundPlane::new(0.0, -0.1, 0.0).expect_err("negative");
        assert!(error.to_string().contains("downhill direction"));
    }
}
