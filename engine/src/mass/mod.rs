//! Mass properties of a disc: the revolved solid of an outline filled by a layup, by exact
//! polygon integrals ([`mass_breakdown`]); target masses ([`MassTarget`]); whole designs
//! ([`DiscDesign`] → [`DesignReport`]).
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
