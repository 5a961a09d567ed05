use super::ReleaseState;
use crate::{advance_ratio, AirProperties};

impl ReleaseState {
    /// Advance ratio |ω|R/V at release (dimensionless) for a disc of rim radius `radius_m` (m),
    /// taking the ground speed as airspeed (still air).
    pub fn advance_ratio(&self, radius_m: f64) -> f64 {
        advance_ratio(self.spin_rad_s, radius_m, self.speed_mps)
    }

    /// Reynolds number ρVd/μ at release (dimensionless) for a disc of diameter `diameter_m` (m)
    /// in `air`, taking the ground speed as airspeed (still air).
    pub fn reynolds_number(&self, air: &AirProperties, diameter_m: f64) -> f64 {
        air.reynolds_number(self.speed_mps, diameter_m)
    }
}
