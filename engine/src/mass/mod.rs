//! Mass properties of a disc: the revolved solid of an outline filled by a layup, by exact
//! polygon integrals ([`mass_breakdown`]); target masses ([`MassTarget`]); whole designs
//! ([`DiscDesign`] → [`DesignReport`]).
//!
//! ```
//! use spinfoil_engine::*;
//! let outline = ParametricOutline::new(DiscFamily::Driver);
//! let layup = Layup::overmold(
//!     Material::from_g_cm3("base blend", 0.95)?,
//!     Material::from_g_cm3("dense rim blend", 1.28)?,
//!     0.0975, // split radius, m
//! );
//! let design = DiscDesign::new("prototype", outline, layup)
//!     .with_target(MassTarget::ScaleDensities { mass_kg: 0.172 });
//! let report = design.evaluate()?;
//! assert!((report.properties.mass_kg - 0.172).abs() < 1e-12);
//! assert!(report.regions[1].spin_inertia_fraction > report.regions[1].mass_fraction);
//! # Ok::<(), MassError>(())
//! ```
mod breakdown;
mod design;
mod error;
mod moments;
mod properties;
mod target;

pub use breakdown::{breakdown_of_regions, mass_breakdown, MassBreakdown, RegionShare};
pub use design::{DesignReport, DiscDesign};
pub use error::MassError;
pub use moments::SectionMoments;
pub use properties::MassProperties;
pub use target::{solve_dimension, MassTarget, TargetOutcome, MAX_TARGET_MASS_KG};
