use nalgebra::{Matrix3, Vector3};
use serde::{Deserialize, Serialize};

use super::error::{positive, GroundError};
use crate::mass::MassProperties;

/// The disc as the ground sees it: a rigid, thin, axisymmetric disc of rim radius R.
///
/// Built with [`ContactBody::new`] (validated) or [`ContactBody::from_mass_properties`].
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
pub struct ContactBody {
    /// Mass m, kg.
    pub mass_kg: f64,
    /// Moment of inertia about the symmetry axis **n**, I_z, kg·m².
    pub spin_inertia_kg_m2: f64,
    /// Moment of inertia about a diameter through the centre of mass, I_x, kg·m².
    pub transverse_inertia_kg_m2: f64,
    /// Rim radius R (half the outer diameter), m.
    pub radius_m: f64,
}

impl ContactBody {
    /// A validated body: every value finite and > 0.
    pub fn new(mass_kg: f64, spin_inertia_kg_m2: f64, transverse_inertia_kg_m2: f64, radius_m: f64) -> Result<Self, GroundError> {
        Ok(ContactBody {
            mass_kg: positive("disc mass (kg)", mass_kg)?,
            spin_inertia_kg_m2: positive("spin moment of inertia I_z (kg·m²)", spin_inertia_kg_m2)?,
            transverse_inertia_kg_m2: positive("transverse moment of inertia I_x (kg·m²)", transverse_inertia_kg_m2)?,
            radius_m: positive("rim radius (m)", radius_m)?,
        })
    }

    /// The body of a disc with the given mass properties and outer diameter (m).
    pub fn from_mass_properties(mass: &MassProperties, diameter_m: f64) -> Result<Self, GroundError> {
        ContactBody::new(mass.mass_kg, mass.spin_inertia_kg_m2, mass.transverse_inertia_kg_m2, diameter_m / 2.0)
    }

    /// Checks the fields (useful after deserialising or building the struct literally).
    pub fn validated(self) -> Result<Self, GroundError> {
        ContactBody::new(self.mass_kg, self.spin_inertia_kg_m2, self.transverse_inertia_kg_m2, self.radius_m)
    }

    /// Inverse inertia tensor in world axes for symmetry axis `n` (unit), 1/(kg·m²):
    /// I⁻¹ = (1/I_x)(E − n nᵀ) + (1/I_z) n nᵀ.
    pub fn inverse_inertia_world(&self, n: &Vector3<f64>) -> Matrix3<f64> {
        let axial = n * n.transpose();
        (Matrix3::identity() - axial) / self.transverse_inertia_kg_m2 + axial / self.spin_inertia_kg_m2
    }

    /// Angular momentum about the centre of mass, H = I ω, kg·m²/s.
    pub fn angular_momentum(&self, n: &Vector3<f64>, omega: &Vector3<f64>) -> Vector3<f64> {
        let spin = omega.dot(n);
        (omega - n * spin) * self.transverse_inertia_kg_m2 + n * (spin * self.spin_inertia_kg_m2)
    }

    /// Angular velocity from angular momentum, ω = I⁻¹ H, rad/s.
    pub fn angular_velocity(&self, n: &Vector3<f64>, momentum: &Vector3<f64>) -> Vector3<f64> {
        self.inverse_inertia_world(n) * momentum
    }

    /// Kinetic energy ½ m v² + ½ ωᵀ I ω, J.
    pub fn kinetic_energy_j(&self, velocity: &Vector3<f64>, n: &Vector3<f64>, omega: &Vector3<f64>) -> f64 {
        0.5 * self.mass_kg * velocity.norm_squared() + 0.5 * omega.dot(&self.angular_momentum(n, omega))
    }
}
