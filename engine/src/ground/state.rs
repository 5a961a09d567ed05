use nalgebra::Vector3;
use serde::{Deserialize, Serialize};

use super::body::ContactBody;
use super::error::{finite, GroundError};

/// The rigid-body state of the disc at a moment of the ground phase (typically at first rim
/// contact, as the flight ends). World frame: x downrange, y left, z up. SI units.
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
pub struct ContactState {
    /// Centre-of-mass position, m.
    pub position_m: Vector3<f64>,
    /// Centre-of-mass velocity, m/s.
    pub velocity_mps: Vector3<f64>,
    /// Unit symmetry axis **n**, out of the top of the flight plate.
    pub normal: Vector3<f64>,
    /// Full angular velocity ω in world axes including the spin ω_s **n**, rad/s.
    pub angular_velocity_rad_s: Vector3<f64>,
}

impl ContactState {
    /// A state from the flight integrator's form: spin ω_s about **n** and the axis rate ṅ,
    /// with ω = ω_s **n** + **n** × ṅ. `normal` is normalised.
    pub fn from_axis_rate(
        position_m: Vector3<f64>,
        velocity_mps: Vector3<f64>,
        normal: Vector3<f64>,
        normal_rate_per_s: Vector3<f64>,
        spin_rad_s: f64,
    ) -> Result<Self, GroundError> {
        let n = unit_axis(&normal)?;
        let omega = n * spin_rad_s + n.cross(&normal_rate_per_s);
        ContactState { position_m, velocity_mps, normal: n, angular_velocity_rad_s: omega }.validated()
    }

    /// Checks that every component is finite and the axis is non-zero; returns the state with
    /// a unit axis.
    pub fn validated(self) -> Result<Self, GroundError> {
        finite_vector("disc position (m)", &self.position_m)?;
        finite_vector("disc velocity (m/s)", &self.velocity_mps)?;
        finite_vector("disc axis n", &self.normal)?;
        finite_vector("disc angular velocity (rad/s)", &self.angular_velocity_rad_s)?;
        Ok(ContactState { normal: unit_axis(&self.normal)?, ..self })
    }

    /// Spin ω_s = ω · **n**, rad/s.
    pub fn spin_rad_s(&self) -> f64 {
        self.angular_velocity_rad_s.dot(&self.normal)
    }

    /// Kinetic energy of `body` in this state, J.
    pub fn kinetic_energy_j(&self, body: &ContactBody) -> f64 {
        body.kinetic_energy_j(&self.velocity_mps, &self.normal, &self.angular_velocity_rad_s)
    }

    /// Kinetic plus gravitational potential energy (zero at z = 0), J.
    pub fn mechanical_energy_j(&self, body: &ContactBody, gravity_mps2: f64) -> f64 {
        self.kinetic_energy_j(body) + body.mass_kg * gravity_mps2 * self.position_m.z
    }

    /// The first non-finite quantity, if any (used to guard the ground-phase integration).
    pub(crate) fn non_finite_quantity(&self) -> Option<&'static str> {
        [
            ("position", &self.position_m),
            ("velocity", &self.velocity_mps),
            ("axis", &self.normal),
            ("angular velocity", &self.angular_velocity_rad_s),
        ]
        .into_iter()
        .find(|(_, v)| !v.iter().all(|c| c.is_finite()))
        .map(|(name, _)| name)
    }
}

fn finite_vector(quantity: &'static str, v: &Vector3<f64>) -> Result<(), GroundError> {
    v.iter().try_for_each(|&c| finite(quantity, c).map(|_| ()))
}

fn unit_axis(v: &Vector3<f64>) -> Result<Vector3<f64>, GroundError> {
    let length = v.norm();
    if length.is_finite() && length > 1e-12 {
        Ok(v / length)
    } else {
        Err(GroundError::ZeroAxis { length })
    }
}
