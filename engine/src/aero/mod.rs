//! Aerodynamic coefficient models behind one trait ([`AeroModel`]), and the assembly of forces
//! and moments from them ([`aero_loads`]).
mod loads;
mod model;
pub use loads::{aero_loads, AeroLoads};
pub use model::{AeroCoefficients, AeroInput, AeroModel, ModelInfo};
