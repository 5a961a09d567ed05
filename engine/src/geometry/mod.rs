//! Cross-section outlines of a disc in the (r, z) half-plane: from points ([`Outline`]) or from
//! parametric families ([`ParametricOutline`], [`DiscFamily`]), with curves sampled to polygons
//! by a chord tolerance ([`SamplingSettings`]). Lengths in m.
pub(crate) mod clip;
mod dimension;
mod error;
mod family;
mod outline;
mod parametric;
mod point;
pub(crate) mod polygon;
mod sampling;
mod shape;
mod source;
pub(crate) mod triangulate;

pub use dimension::Dimension;
pub use error::GeometryError;
pub use family::DiscFamily;
pub use outline::{DeclaredDimensions, Outline, MAX_COORDINATE_M};
pub(crate) use outline::checked_polygon;
pub use parametric::ParametricOutline;
pub use point::RzPoint;
pub use polygon::signed_area_m2;
pub use sampling::SamplingSettings;
pub use source::OutlineSource;
