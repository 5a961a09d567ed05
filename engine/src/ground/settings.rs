use serde::{Deserialize, Serialize};

use crate::STANDARD_GRAVITY_MPS2;

/// Numerical and modelling settings of the ground phase. Every field states its default.
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
#[serde(default)]
pub struct GroundSettings {
    /// Gravitational acceleration, m/s². Default: standard gravity 9.80665.
    pub gravity_mps2: f64,
    /// After an impact the disc leaves the ground again only if its centre of mass (a skip) or,
    /// while clearly tilted, its contact point moves away from the ground faster than this, m/s.
    /// Default 0.3 (a rebound of about 5 mm); slower rebounds settle into sliding or rolling.
    pub skip_min_speed_mps: f64,
    /// A disc tilted less than this from the ground (rad) whose centre does not rebound settles
    /// even if its rim lifts off (no further slaps). Default 10° (0.175 rad).
    pub settle_max_tilt_rad: f64,
    /// If the next rim contact comes sooner than this after an impact (s), the contact counts as
    /// sustained and the disc settles; this ends the ever shorter impact sequences (chatter) of
    /// a rim that stays pressed on the ground. Default 4 ms.
    pub min_flight_s: f64,
    /// Tilt between the disc plane and the ground, rad, above which a disc that stays on the
    /// ground rolls on its rim instead of flattening and sliding. Default 60° (1.047 rad).
    pub roll_min_tilt_rad: f64,
    /// Time step of the airborne contact search and of the sliding integration, s. Default 1 ms.
    pub step_s: f64,
    /// Interval between recorded trajectory samples, s. Default 10 ms.
    pub sample_interval_s: f64,
    /// Number of points the contact ring is divided into for sliding friction. Default 64.
    pub ring_points: usize,
    /// Speeds below this count as rest, m/s (rim speed |ω_s| R included). Default 1 mm/s.
    pub rest_speed_mps: f64,
    /// The ground phase gives up (ending `Unsettled`) after this long, s. Default 60.
    pub max_time_s: f64,
    /// The disc settles after at most this many impacts. Default 50.
    pub max_impacts: usize,
}

impl Default for GroundSettings {
    fn default() -> Self {
        GroundSettings {
            gravity_mps2: STANDARD_GRAVITY_MPS2,
            skip_min_speed_mps: 0.3,
            settle_max_tilt_rad: 10f64.to_radians(),
            min_flight_s: 4e-3,
            roll_min_tilt_rad: 60f64.to_radians(),
            step_s: 1e-3,
            sample_interval_s: 1e-2,
            ring_points: 64,
            rest_speed_mps: 1e-3,
            max_time_s: 60.0,
            max_impacts: 50,
        }
    }
}
