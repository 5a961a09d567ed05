//! Mass properties of a disc: the revolved solid of an outline filled by a layup.
mod properties;
pub use properties::MassProperties;
