//! Layups: materials ([`Material`], densities in kg/m³ or g/cm³) and the regions of the outline
//! they fill ([`Layup`]: one material, a two-material overmold, or any list of [`Region`]s),
//! clipped to the outline and checked to cover it exactly once ([`fill_outline`]).
mod error;
mod fill;
#[allow(clippy::module_inception)] // reason: the folder is the concept, the file its main type
mod layup;
mod material;
mod region;

pub use error::LayupError;
pub use fill::{fill_outline, FilledRegion};
pub use layup::Layup;
pub use material::Material;
pub use region::{Region, RegionBounds, RegionShape, MAX_REGION_POINTS};
