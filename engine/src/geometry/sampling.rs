use super::{GeometryError, RzPoint};
use serde::{Deserialize, Serialize};

/// How curves (dome arcs, rounded leading edges, rim undersides) are turned into polygons.
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
#[serde(default)]
pub struct SamplingSettings {
    /// Largest distance between a curve and the chord that replaces it, m. Default 1e-6 m
    /// (0.001 mm): the volume and I_z of the built-in families then lie within about 0.01 % of
    /// the exact curves' (the error falls in proportion to the tolerance). Allowed range [`SamplingSettings::MIN_TOLERANCE_M`, `SamplingSettings::MAX_TOLERANCE_M`].
    pub chord_tolerance_m: f64,
}

impl Default for SamplingSettings {
    fn default() -> Self {
        Self { chord_tolerance_m: 1e-6 }
    }
}

/// Most chords one curve is split into, whatever the tolerance.
const MAX_CHORDS_PER_CURVE: usize = 4096;

impl SamplingSettings {
    /// Smallest accepted chord tolerance, m (0.1 µm).
    pub const MIN_TOLERANCE_M: f64 = 1e-7;
    /// Largest accepted chord tolerance, m (1 mm).
    pub const MAX_TOLERANCE_M: f64 = 1e-3;

    /// Settings with the given chord tolerance (m), checked against the allowed range.
    pub fn with_tolerance(chord_tolerance_m: f64) -> Result<Self, GeometryError> {
        let settings = Self { chord_tolerance_m };
        settings.validate()?;
        Ok(settings)
    }

    /// Checks the tolerance against the allowed range (NaN is rejected).
    pub fn validate(&self) -> Result<(), GeometryError> {
        let t = self.chord_tolerance_m;
        if (Self::MIN_TOLERANCE_M..=Self::MAX_TOLERANCE_M).contains(&t) {
            Ok(())
        } else {
            Err(GeometryError::ToleranceOutOfRange {
                value_m: t,
                min_m: Self::MIN_TOLERANCE_M,
                max_m: Self::MAX_TOLERANCE_M,
            })
        }
    }

    /// Number of chords for an elliptical arc with semi-axes `a_m`, `b_m` spanning
    /// `sweep_rad` of its parameter angle. The sagitta of each chord is at most the tolerance
    /// (an ellipse is a contraction of the circle of radius max(a, b)).
    fn chords(&self, a_m: f64, b_m: f64, sweep_rad: f64) -> usize {
        let radius = a_m.max(b_m);
        if radius <= self.chord_tolerance_m {
            return 1;
        }
        let step = 2.0 * (1.0 - self.chord_tolerance_m / radius).acos();
        let n = (sweep_rad.abs() / step).ceil();
        (n as usize).clamp(1, MAX_CHORDS_PER_CURVE)
    }

    /// Points of the elliptical arc centre + (a cos θ, b sin θ) for θ from `from_rad` to
    /// `to_rad`, both ends included.
    pub(crate) fn elliptic_arc(&self, centre: RzPoint, a_m: f64, b_m: f64, from_rad: f64, to_rad: f64) -> Vec<RzPoint> {
        let n = self.chords(a_m, b_m, to_rad - from_rad);
        (0..=n)
            .map(|k| {
                let theta = from_rad + (to_rad - from_rad) * k as f64 / n as f64;
                RzPoint::new(centre.r_m + a_m * theta.cos(), centre.z_m + b_m * theta.sin())
            })
            .collect()
    }

    /// Points of a domed surface from the axis (height `z_axis_m`) down to (`r_edge_m`,
    /// `z_axis_m − dome_m`): a circular arc with a horizontal tangent on the axis. A flat
    /// surface when `dome_m` is 0. Ordered from the axis outward.
    pub(crate) fn dome(&self, r_edge_m: f64, z_axis_m: f64, dome_m: f64) -> Vec<RzPoint> {
        if dome_m <= 0.0 {
            return vec![RzPoint::new(0.0, z_axis_m), RzPoint::new(r_edge_m, z_axis_m)];
        }
        let radius = (r_edge_m * r_edge_m + dome_m * dome_m) / (2.0 * dome_m);
        let sweep = (r_edge_m / radius).asin();
        let centre = RzPoint::new(0.0, z_axis_m - radius);
        let half_pi = std::f64::consts::FRAC_PI_2;
        let mut points = self.elliptic_arc(centre, radius, radius, half_pi, half_pi - sweep);
        // Exact ends: on the axis, and at the edge.
        let last = points.len() - 1;
        points[0] = RzPoint::new(0.0, z_axis_m);
        points[last] = RzPoint::new(r_edge_m, z_axis_m - dome_m);
        points
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn chord_sagitta_is_within_tolerance() {
        let s = SamplingSettings::default();
        let pts = s.elliptic_arc(RzPoint::new(0.0, 0.0), 0.01, 0.01, 0.0, std::f64::consts::PI);
        let step = std::f64::consts::PI / (pts.len() - 1) as f64;
        let sagitta = 0.01 * (1.0 - (step / 2.0).cos());
        assert!(sagitta <= s.chord_tolerance_m * (1.0 + 1e-12));
    }

    #[test]
    fn dome_ends_where_asked() {
        let pts = SamplingSettings::default().dome(0.08, 0.014, 0.002);
        let last = pts.last().copied().unwrap_or(RzPoint::new(f64::NAN, f64::NAN));
        assert!((last.r_m - 0.08).abs() < 1e-12 && (last.z_m - 0.012).abs() < 1e-12);
    }
}
