use crate::mass::MassProperties;
use serde::{Deserialize, Serialize};

use super::BodyError;

/// The rigid body the flight integrator moves: an axisymmetric disc, SI units.
///
/// Agreed interface between the aerodynamics and the flight parts of the engine.
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
pub struct DiscBody {
    /// Total mass m in kg.
    pub mass_kg: f64,
    /// Moment of inertia about the symmetry axis **n**, I_z, in kg·m².
    pub spin_inertia_kg_m2: f64,
    /// Moment of inertia about a diameter through the centre of mass, I_x, in kg·m².
    pub transverse_inertia_kg_m2: f64,
    /// Outside diameter d in m (the aerodynamic reference length).
    pub diameter_m: f64,
}

impl DiscBody {
    /// The body of a disc with the given mass properties and outside diameter (m).
    pub fn from_mass_properties(mass: &MassProperties, diameter_m: f64) -> Self {
        Self {
            mass_kg: mass.mass_kg,
            spin_inertia_kg_m2: mass.spin_inertia_kg_m2,
            transverse_inertia_kg_m2: mass.transverse_inertia_kg_m2,
            diameter_m,
        }
    }

    /// Outside radius R = d/2 in m.
    pub fn radius_m(&self) -> f64 {
        0.5 * self.diameter_m
    }

    /// Planform (reference) area A = πd²/4 in m².
    pub fn area_m2(&self) -> f64 {
        std::f64::consts::PI * self.diameter_m * self.diameter_m / 4.0
    }

    /// Checks that every field is finite and positive.
    ///
    /// The perpendicular-axis theorem bounds a real body's inertia ratio I_z ≤ 2 I_x (equality
    /// for a flat lamina); this is not enforced, so idealised test bodies stay usable.
    pub fn validate(&self) -> Result<(), BodyError> {
        positive("mass_kg", self.mass_kg)?;
        positive("spin_inertia_kg_m2", self.spin_inertia_kg_m2)?;
        positive("transverse_inertia_kg_m2", self.transverse_inertia_kg_m2)?;
        positive("diameter_m", self.diameter_m)
    }
}

fn positive(field: &'static str, value: f64) -> Result<(), BodyError> {
    if value.is_finite() && value > 0.0 {
        Ok(())
    } else {
        Err(BodyError::OutOfRange { field, value, range: "finite and > 0" })
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    fn body() -> DiscBody {
        DiscBody { mass_kg: 0.175, spin_inertia_kg_m2: 0.00235, transverse_inertia_kg_m2: 0.00122, diameter_m: 0.269 }
    }

    #[test]
    fn area_is_pi_d_squared_over_four() {
        // source: circle area πr², common practice, no published source
        let b = body();
        assert!((b.area_m2() - std::f64::consts::PI * 0.1345 * 0.1345).abs() < 1e-15);
        assert_eq!(b.radius_m(), 0.1345);
    }

    #[test]
    fn rejects_non_positive_and_non_finite_fields() {
        let mut b = body();
        b.mass_kg = 0.0;
        assert!(matches!(b.validate(), Err(BodyError::OutOfRange { field: "mass_kg", .. })));
        let mut b = body();
        b.diameter_m = f64::NAN;
        assert!(matches!(b.validate(), Err(BodyError::OutOfRange { field: "diameter_m", .. })));
        assert!(body().validate().is_ok());
    }
}
