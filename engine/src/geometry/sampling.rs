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

/// Equal steps a smooth step starts from before adaptive halving.
const INITIAL_STEPS: usize = 8;
/// Most halvings of one step of a smooth step.
const MAX_REFINEMENTS: u32 = 12;
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

    /// Points of a smooth step from `from` to `to`: r runs linearly and z follows
    /// 3t² − 2t³, so the curve leaves and arrives horizontally (tangent-continuous with the
    /// rounded corners it joins). Sampled adaptively: 8 equal steps, each halved until the
    /// curve's midpoint lies within the chord tolerance of its chord. Both ends included.
    pub(crate) fn smooth_step(&self, from: RzPoint, to: RzPoint) -> Vec<RzPoint> {
        let at = |t: f64| {
            let s = t * t * (3.0 - 2.0 * t);
            RzPoint::new(from.r_m + (to.r_m - from.r_m) * t, from.z_m + (to.z_m - from.z_m) * s)
        };
        let mut points = vec![from];
        for k in 0..INITIAL_STEPS {
            let (t0, t1) = (k as f64 / INITIAL_STEPS as f64, (k + 1) as f64 / INITIAL_STEPS as f64);
            self.refine(&at, t0, t1, MAX_REFINEMENTS, &mut points);
        }
        let last = points.len() - 1;
        points[last] = to;
        points
    }

    /// Appends the points after `t0` up to `t1`, halving while the midpoint is off the chord.
    fn refine(&self, at: &dyn Fn(f64) -> RzPoint, t0: f64, t1: f64, depth: u32, out: &mut Vec<RzPoint>) {
        let (a, b, mid_t) = (at(t0), at(t1), 0.5 * (t0 + t1));
        let mid = at(mid_t);
        let chord = b.minus(a);
        let length = chord.dot(chord).sqrt();
        let off = if length > 0.0 { chord.cross(mid.minus(a)).abs() / length } else { 0.0 };
        if depth > 0 && off > self.chord_tolerance_m {
            self.refine(at, t0, mid_t, depth - 1, out);
            self.refine(at, mid_t, t1, depth - 1, out);
        } else {
            out.push(b);
        }
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
    fn smooth_step_stays_within_tolerance_of_its_chords() {
        let s = SamplingSettings::default();
        let (a, b) = (RzPoint::new(0.08, 0.0), RzPoint::new(0.1, 0.003));
        let pts = s.smooth_step(a, b);
        assert_eq!((pts[0], pts[pts.len() - 1]), (a, b));
        // Every curve point between two samples lies within the tolerance of their chord.
        for w in pts.windows(2) {
            let t_mid = ((w[0].r_m + w[1].r_m) / 2.0 - a.r_m) / (b.r_m - a.r_m);
            let z_mid = a.z_m + (b.z_m - a.z_m) * t_mid * t_mid * (3.0 - 2.0 * t_mid);
            let chord_z = (w[0].z_m + w[1].z_m) / 2.0;
            assert!((z_mid - chord_z).abs() <= 1.5 * s.chord_tolerance_m, "{} vs {}", z_mid, chord_z);
        }
    }

    #[test]
    fn dome_ends_where_asked() {
        let pts = SamplingSettings::default().dome(0.08, 0.014, 0.002);
        let last = pts.last().copied().unwrap_or(RzPoint::new(f64::NAN, f64::NAN));
        assert!((last.r_m - 0.08).abs() < 1e-12 && (last.z_m - 0.012).abs() < 1e-12);
    }
}
