//! Helpers shared by the engine's integration tests.
#![allow(dead_code)] // reason: each test module uses a different subset of the helpers

/// Relative difference |a − b| / max(|b|, tiny).
pub fn rel_diff(a: f64, b: f64) -> f64 {
    (a - b).abs() / b.abs().max(1e-300)
}
