//! Wind fields: the air's velocity over the ground, as a function of position and time.
mod field;
pub use field::{CalmAir, WindField};
