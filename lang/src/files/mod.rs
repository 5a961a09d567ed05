//! Saving and loading designs and exports, confined to the study's folder.
mod confine;
mod design_file;
mod json_value;
mod package;

pub use confine::{FileAccessError, StudyFolder};
pub(crate) use confine::write_atomic;
pub(crate) use package::{read_confined, register};
