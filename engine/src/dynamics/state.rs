use nalgebra::{SVector, Vector3};
use serde::{Deserialize, Serialize};

use super::DiscBody;

/// Number of scalars in the integrated state (position 3, velocity 3, **n** 3, **ṅ** 3, ω_s 1).
pub const STATE_LEN: usize = 13;

/// The state vector handed to the ODE solver, laid out as
/// `[x, y, z, v_x, v_y, v_z, n_x, n_y, n_z, ṅ_x, ṅ_y, ṅ_z, ω_s]`.
pub type StateVector = SVector<f64, STATE_LEN>;

/// The kinematic state of a disc, world frame (x downrange, y left, z up), SI units.
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
pub struct DiscState {
    /// Centre-of-mass position in m.
    pub position_m: Vector3<f64>,
    /// Centre-of-mass velocity in m/s (relative to the ground).
    pub velocity_mps: Vector3<f64>,
    /// Unit symmetry axis **n** (out of the top of the flight plate), dimensionless.
    pub normal: Vector3<f64>,
    /// Rate of change of **n**, **ṅ**, in 1/s (perpendicular to **n**).
    pub normal_rate_per_s: Vector3<f64>,
    /// Spin ω_s about **n** in rad/s (signed; right-hand backhand negative).
    pub spin_rad_s: f64,
}

impl DiscState {
    /// Reads a state from the solver's vector (no normalisation).
    pub fn from_vector(y: &StateVector) -> Self {
        Self {
            position_m: Vector3::new(y[0], y[1], y[2]),
            velocity_mps: Vector3::new(y[3], y[4], y[5]),
            normal: Vector3::new(y[6], y[7], y[8]),
            normal_rate_per_s: Vector3::new(y[9], y[10], y[11]),
            spin_rad_s: y[12],
        }
    }

    /// Writes the state into the solver's vector layout.
    pub fn to_vector(&self) -> StateVector {
        let mut y = StateVector::zeros();
        y.fixed_rows_mut::<3>(0).copy_from(&self.position_m);
        y.fixed_rows_mut::<3>(3).copy_from(&self.velocity_mps);
        y.fixed_rows_mut::<3>(6).copy_from(&self.normal);
        y.fixed_rows_mut::<3>(9).copy_from(&self.normal_rate_per_s);
        y[12] = self.spin_rad_s;
        y
    }

    /// The same state with **n** scaled to unit length and **ṅ** projected perpendicular to it
    /// (the constraints |**n**| = 1, **n**·**ṅ** = 0 that the integrator only keeps approximately).
    pub fn projected(&self) -> Self {
        let norm = self.normal.norm();
        let inverse = norm.max(f64::MIN_POSITIVE).recip();
        let normal = if norm > 0.0 { self.normal * inverse } else { Vector3::z() };
        let rate = self.normal_rate_per_s * inverse;
        Self { normal, normal_rate_per_s: rate - normal * normal.dot(&rate), ..*self }
    }

    /// Angular velocity **ω** = ω_s **n** + **n** × **ṅ** in rad/s (world frame).
    pub fn angular_velocity_rad_s(&self) -> Vector3<f64> {
        self.normal * self.spin_rad_s + self.transverse_angular_velocity_rad_s()
    }

    /// Transverse part of the angular velocity, **n** × **ṅ**, in rad/s (world frame).
    pub fn transverse_angular_velocity_rad_s(&self) -> Vector3<f64> {
        self.normal.cross(&self.normal_rate_per_s)
    }

    /// Angular momentum about the centre of mass **H** = I_z ω_s **n** + I_x **n** × **ṅ**, kg·m²/s.
    pub fn angular_momentum(&self, body: &DiscBody) -> Vector3<f64> {
        self.normal * (body.spin_inertia_kg_m2 * self.spin_rad_s)
            + self.transverse_angular_velocity_rad_s() * body.transverse_inertia_kg_m2
    }

    /// Kinetic energy ½m|v|² + ½I_z ω_s² + ½I_x |**ṅ**|² in J.
    pub fn kinetic_energy_j(&self, body: &DiscBody) -> f64 {
        0.5 * (body.mass_kg * self.velocity_mps.norm_squared()
            + body.spin_inertia_kg_m2 * self.spin_rad_s * self.spin_rad_s
            + body.transverse_inertia_kg_m2 * self.normal_rate_per_s.norm_squared())
    }

    /// Height of the lowest point of the rim in m: z_low = z − R·√(1 − n_z²) for unit **n**
    /// (the rim is the circle of radius R about the centre of mass in the disc plane; its lowest
    /// point lies R·sin(tilt) below the centre). The rim's own thickness and the offset between
    /// the centre of mass and the rim plane are neglected.
    pub fn lowest_rim_height_m(&self, radius_m: f64) -> f64 {
        // √(n_x² + n_y²) rather than √(1 − n_z²): exact for a level disc, no cancellation; one
        // square root of the ratio to |n|² (|n| stays far from overflow and underflow)
        let n = &self.normal;
        self.position_m.z - radius_m * ((n.x * n.x + n.y * n.y) / n.norm_squared()).sqrt()
    }

    /// True when every component is finite.
    pub fn is_finite(&self) -> bool {
        self.to_vector().iter().all(|v| v.is_finite())
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn vector_round_trip_and_projection() {
        let s = DiscState {
            position_m: Vector3::new(1.0, 2.0, 3.0),
            velocity_mps: Vector3::new(4.0, 5.0, 6.0),
            normal: Vector3::new(0.0, 0.0, 2.0),
            normal_rate_per_s: Vector3::new(1.0, 0.0, 1.0),
            spin_rad_s: -7.0,
        };
        assert_eq!(DiscState::from_vector(&s.to_vector()), s);
        let p = s.projected();
        assert!((p.normal.norm() - 1.0).abs() < 1e-15);
        assert!(p.normal.dot(&p.normal_rate_per_s).abs() < 1e-15);
    }

    #[test]
    fn lowest_rim_point_of_a_tilted_disc() {
        // source: geometry of a circle tilted by θ: lowest point R·sin θ below its centre,
        // common practice, no published source
        let tilt = 0.3_f64;
        let s = DiscState {
            position_m: Vector3::new(0.0, 0.0, 1.0),
            velocity_mps: Vector3::zeros(),
            normal: Vector3::new(tilt.sin(), 0.0, tilt.cos()),
            normal_rate_per_s: Vector3::zeros(),
            spin_rad_s: 0.0,
        };
        assert!((s.lowest_rim_height_m(0.1) - (1.0 - 0.1 * tilt.sin())).abs() < 1e-15);
    }
}
