//! Aerodynamic coefficient models behind one trait ([`AeroModel`]).
mod model;
pub use model::{AeroCoefficients, AeroInput, AeroModel, ModelInfo};
