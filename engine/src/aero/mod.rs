//! Aerodynamic coefficient models behind one trait ([`AeroModel`]), and the assembly of forces
//! and moments from them ([`aero_loads`]).
//!
//! Models: [`LinearCoefficients`] (the linear form of Hummel, 2003; published sets in
//! [`hummel_2003`] and [`hummel_2003_lift_drag`]), [`TabulatedCoefficients`] (against α and
//! optionally advance ratio, also from CSV text), a first guess from the outline
//! ([`estimate_coefficients`]) and invented demo sets ([`demo_putter`], [`demo_midrange`],
//! [`demo_driver`]).
mod atan;
mod csv_table;
mod demo;
mod error;
mod estimate;
mod linear;
mod loads;
mod model;
mod published;
mod rates;
mod table;
pub use error::AeroError;
pub use linear::LinearCoefficients;
pub use loads::{aero_loads, AeroLoads};
pub use model::{AeroCoefficients, AeroInput, AeroModel, ModelInfo};
pub use published::{hummel_2003, hummel_2003_lift_drag};
pub use rates::{RateConvention, RateMoments, RateTerms};
pub use table::{CoefficientColumns, TabulatedCoefficients};
pub use demo::{demo_driver, demo_midrange, demo_putter};
pub use estimate::{estimate_coefficients, helmbold_lift_slope_per_rad, WingShape, CIRCULAR_ASPECT_RATIO};
