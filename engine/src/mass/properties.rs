use serde::{Deserialize, Serialize};

/// Mass properties of an axisymmetric disc about its centre of mass.
///
/// The symmetry (spin) axis is z; the transverse axis x is any diameter through the centre of
/// mass. All values SI.
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
pub struct MassProperties {
    /// Total mass in kg.
    pub mass_kg: f64,
    /// Height of the centre of mass above the outline's z = 0 reference, in m.
    pub cg_height_m: f64,
    /// Moment of inertia about the symmetry (spin) axis, I_z, in kg·m².
    pub spin_inertia_kg_m2: f64,
    /// Moment of inertia about a diameter through the centre of mass, I_x, in kg·m².
    pub transverse_inertia_kg_m2: f64,
}

impl MassProperties {
    /// Radius of gyration about the spin axis, √(I_z/m), in m.
    pub fn spin_radius_of_gyration_m(&self) -> f64 {
        (self.spin_inertia_kg_m2 / self.mass_kg).sqrt()
    }

    /// Radius of gyration about a diameter through the centre of mass, √(I_x/m), in m.
    pub fn transverse_radius_of_gyration_m(&self) -> f64 {
        (self.transverse_inertia_kg_m2 / self.mass_kg).sqrt()
    }
}
