use nalgebra::Vector3;

/// A wind field: the velocity of the air relative to the ground, in the world frame
/// (x downrange, y left, z up), in m/s.
///
/// Implementations must be deterministic: the same position and time give the same velocity
/// (seeded gusts included), so flights are reproducible.
pub trait WindField: Send + Sync + std::fmt::Debug {
    /// Air velocity in m/s at `position_m` (world frame, m) and `time_s` (s since release).
    fn velocity_mps(&self, position_m: &Vector3<f64>, time_s: f64) -> Vector3<f64>;
}

/// Still air everywhere.
#[derive(Debug, Clone, Copy, Default, PartialEq)]
pub struct CalmAir;

impl WindField for CalmAir {
    fn velocity_mps(&self, _position_m: &Vector3<f64>, _time_s: f64) -> Vector3<f64> {
        Vector3::zeros()
    }
}
