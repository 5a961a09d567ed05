//! Throws: the state of a disc as it leaves the hand, and the effort forms that turn a player's
//! work into that state through the disc's mass properties.
mod release;
pub use release::{Hand, ReleaseState, Style};
