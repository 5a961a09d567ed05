//! Throws: the state of a disc as it leaves the hand, and the effort forms that turn a player's
//! work into that state through the disc's mass properties.
//!
//! - [`ReleaseState`]: speed, spin, angles, height, wobble, style and hand (conventions in its
//!   docs); [`ReleaseState::validate`] checks each number against the ranges in this module.
//! - [`Effort`] ([`IndependentEffort`], [`CoupledEffort`]) with a [`ReleasePose`] makes an
//!   [`EffortThrow`], which [`EffortThrow::release`] turns into a release state for a given disc.
mod effort;
mod error;
mod limits;
mod pose;
mod release;
mod similarity;

pub use effort::*;
pub use error::ThrowError;
pub use limits::*;
pub use pose::ReleasePose;
pub use release::{Hand, ReleaseState, Style};
