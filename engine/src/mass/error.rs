use crate::geometry::{Dimension, GeometryError};
use crate::layup::LayupError;
use thiserror::Error;

/// Why mass properties or a design's report could not be computed.
#[derive(Debug, Clone, PartialEq, Error)]
#[non_exhaustive]
pub enum MassError {
    /// The outline is not valid.
    #[error(transparent)]
    Geometry(#[from] GeometryError),
    /// The layup does not fit the outline.
    #[error(transparent)]
    Layup(#[from] LayupError),
    /// The target mass is not a sensible number.
    #[error("target mass {target_kg} kg is outside the allowed range ({min_kg}, {max_kg}] kg")]
    TargetOutOfRange {
        /// Requested mass, kg.
        target_kg: f64,
        /// Lower bound (exclusive), kg.
        min_kg: f64,
        /// Upper bound, kg.
        max_kg: f64,
    },
    /// No value of the dimension in its allowed range gives the target mass.
    #[error("target mass {:.2} g cannot be reached by changing the {dimension}: over its allowed range [{:.3}, {:.3}] mm the mass runs from {:.2} g to {:.2} g", .target_kg * 1e3, .dimension_min_m * 1e3, .dimension_max_m * 1e3, .reachable_min_kg * 1e3, .reachable_max_kg * 1e3)]
    UnreachableTarget {
        /// Requested mass, kg.
        target_kg: f64,
        /// The dimension that was to be solved for.
        dimension: Dimension,
        /// Smallest mass reachable (at one end of the range), kg.
        reachable_min_kg: f64,
        /// Largest mass reachable, kg.
        reachable_max_kg: f64,
        /// Lower end of the dimension's allowed range, m.
        dimension_min_m: f64,
        /// Upper end of the dimension's allowed range, m.
        dimension_max_m: f64,
    },
    /// Solving for a dimension needs a parametric outline.
    #[error("solving for the {dimension} needs a parametric outline; this design's outline is given by points (scale the densities instead)")]
    NotParametric {
        /// The dimension asked for.
        dimension: Dimension,
    },
}
