use nalgebra::Vector3;

use super::plane::GroundPlane;

/// Below this sine of the tilt between disc and ground the disc counts as lying flat: the whole
/// rim touches at once and the contact acts at the centre of the contact ring.
pub const FLAT_TILT_SINE: f64 = 1e-9;

/// The rim's lowest point relative to a ground plane.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct RimContact {
    /// Vector from the centre of mass to the lowest rim point, m (zero when flat).
    pub arm_m: Vector3<f64>,
    /// Signed distance of the lowest rim point above the plane, m (< 0: penetrating).
    pub gap_m: f64,
    /// Sine of the tilt between the disc plane and the ground plane, |k̂ − (k̂·n)n|.
    pub tilt_sine: f64,
}

/// Locates the lowest rim point of a thin disc of radius `radius_m` centred at `centre_m` with
/// unit axis `n`, against `plane`.
///
/// The rim is the circle c + R(cos φ e₁ + sin φ e₂) in the disc plane. Its height above the
/// plane, (c − p₀)·k̂ + R(cos φ e₁ + sin φ e₂)·k̂, is least where the in-plane radius points
/// against the projection of k̂ onto the disc plane, k̂⊥ = k̂ − (k̂·n)n. So the lowest point is
/// c − R k̂⊥/|k̂⊥|, at height (c − p₀)·k̂ − R|k̂⊥|. This holds for any slope because only the
/// plane normal k̂ enters (for level ground k̂ = ẑ).
pub fn lowest_rim_point(plane: &GroundPlane, centre_m: &Vector3<f64>, n: &Vector3<f64>, radius_m: f64) -> RimContact {
    let k = plane.normal();
    let k_perp = k - n * k.dot(n);
    let tilt_sine = k_perp.norm();
    let arm_m = if tilt_sine > FLAT_TILT_SINE { -k_perp * (radius_m / tilt_sine) } else { Vector3::zeros() };
    RimContact { arm_m, gap_m: plane.distance_m(centre_m) - radius_m * tilt_sine, tilt_sine }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn a_flat_disc_touches_at_its_centre_and_an_upright_one_at_the_bottom() {
        // source: common practice, no published source (geometry of a circle over a plane).
        let plane = GroundPlane::default();
        let flat = lowest_rim_point(&plane, &Vector3::new(0.0, 0.0, 0.2), &Vector3::z(), 0.1);
        assert_eq!(flat.arm_m, Vector3::zeros());
        assert!((flat.gap_m - 0.2).abs() < 1e-15);
        let upright = lowest_rim_point(&plane, &Vector3::new(0.0, 0.0, 0.2), &Vector3::y(), 0.1);
        assert!((upright.arm_m - Vector3::new(0.0, 0.0, -0.1)).norm() < 1e-15);
        assert!((upright.gap_m - 0.1).abs() < 1e-15);
    }
}
