//! All engine integration tests, compiled into one binary. One module per capability; shared
//! helpers live in `common`. Every numerical check names its source (see CHECKS.md).
mod aero;
mod air;
mod common;
mod flight;
mod ground;
mod mass;
mod properties;
mod study;
mod throw;
mod wind;
