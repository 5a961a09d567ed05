//! Integration tests: mass properties (outlines, layups, mass integrals, targets, standard
//! checks, meshes, serde). Every numerical check names its source (see CHECKS.md).
mod design;
mod errors;
mod fuzz;
mod handbook;
mod mesh;
mod serde_io;
mod support;
