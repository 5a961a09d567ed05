//! Wind fields: the air's velocity over the ground, as a function of position and time.
//!
//! [`WindSpec`] describes a wind as a player or a weather report gives it (speed at a reference
//! height, the direction it comes from relative to downrange, the surface's roughness, optional
//! seeded gusts) and builds a [`BoundaryLayerWind`], which implements [`WindField`].
//! See [`WindSpec`] for the direction convention.
mod field;
mod gusts;
mod profile;
mod spec;
mod terrain;

pub use field::{CalmAir, WindField};
pub use gusts::{GustSeries, GustSpec, GUST_COMPONENTS, GUST_FREQUENCY_RANGE_HZ};
pub use profile::LogProfile;
pub use spec::*;
pub use terrain::Terrain;
