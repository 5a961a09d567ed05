//! Plausible ranges of a release state, and its validation.

use std::f64::consts::{FRAC_PI_2, PI, TAU};

use super::{ReleaseState, ThrowError};
use crate::InputRangeError;

/// Release speed: 0 … 45 m/s (the fastest measured throws are a little above 40 m/s; common
/// practice, no published source).
pub const RELEASE_SPEED_RANGE_MPS: (f64, f64) = (0.0, 45.0);
/// Spin magnitude: 0 … 250 rad/s (about 40 rev/s, 2 400 rpm, beyond any human throw).
pub const RELEASE_SPIN_RANGE_RAD_S: (f64, f64) = (0.0, 250.0);
/// Launch angle: −90° … +90° (straight down … straight up), in rad.
pub const LAUNCH_RANGE_RAD: (f64, f64) = (-FRAC_PI_2, FRAC_PI_2);
/// Nose angle: −60° … +60°, in rad.
pub const NOSE_RANGE_RAD: (f64, f64) = (-PI / 3.0, PI / 3.0);
/// Roll angle: −90° … +90° (full anhyzer … full hyzer, a vertical disc), in rad.
pub const ROLL_RANGE_RAD: (f64, f64) = (-FRAC_PI_2, FRAC_PI_2);
/// Heading: −180° … +180°, in rad.
pub const HEADING_RANGE_RAD: (f64, f64) = (-PI, PI);
/// Release height of the centre of mass: 0 … 3 m.
pub const RELEASE_HEIGHT_RANGE_M: (f64, f64) = (0.0, 3.0);
/// Off-axis (wobble) rate: 0 … 50 rad/s.
pub const OFF_AXIS_RATE_RANGE_RAD_S: (f64, f64) = (0.0, 50.0);
/// Direction of the off-axis rate: −360° … +360°, in rad.
pub const OFF_AXIS_DIRECTION_RANGE_RAD: (f64, f64) = (-TAU, TAU);

impl ReleaseState {
    /// Checks every number against its plausible range (the constants of this module); the
    /// error names the first offending field, its value and the range.
    pub fn validate(&self) -> Result<(), ThrowError> {
        let check = InputRangeError::check_within;
        check("speed_mps", self.speed_mps, RELEASE_SPEED_RANGE_MPS, "m/s")?;
        check("spin_rad_s", self.spin_rad_s, RELEASE_SPIN_RANGE_RAD_S, "rad/s")?;
        check("launch_rad", self.launch_rad, LAUNCH_RANGE_RAD, "rad")?;
        check("nose_rad", self.nose_rad, NOSE_RANGE_RAD, "rad")?;
        check("roll_rad", self.roll_rad, ROLL_RANGE_RAD, "rad")?;
        check("heading_rad", self.heading_rad, HEADING_RANGE_RAD, "rad")?;
        check("height_m", self.height_m, RELEASE_HEIGHT_RANGE_M, "m")?;
        check("off_axis_rate_rad_s", self.off_axis_rate_rad_s, OFF_AXIS_RATE_RANGE_RAD_S, "rad/s")?;
        check("off_axis_direction_rad", self.off_axis_direction_rad, OFF_AXIS_DIRECTION_RANGE_RAD, "rad")?;
        Ok(())
    }

    /// The same state after validation, for chaining.
    pub fn validated(self) -> Result<Self, ThrowError> {
        self.validate().map(|()| self)
    }
}
