use serde::{Deserialize, Serialize};

use super::{Hand, ReleaseState, Style};

/// Everything about a release except its speed and spin: angles, height, wobble, style and
/// hand. An effort form supplies speed and spin; together they make a [`ReleaseState`], whose
/// docs give the conventions. Angles in rad, heights in m, rates in rad/s.
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct ReleasePose {
    /// Launch angle of the velocity above horizontal, rad (default 0).
    #[serde(default)]
    pub launch_rad: f64,
    /// Nose angle of the disc plane relative to the velocity, rad, positive nose-up (default 0).
    #[serde(default)]
    pub nose_rad: f64,
    /// Roll angle, rad, positive hyzer (default 0, flat).
    #[serde(default)]
    pub roll_rad: f64,
    /// Heading about +z from downrange, rad, positive to the left (default 0).
    #[serde(default)]
    pub heading_rad: f64,
    /// Release height of the centre of mass, m (default 1.0, about hip to chest height).
    #[serde(default = "default_height_m")]
    pub height_m: f64,
    /// Off-axis (wobble) rate, rad/s (default 0).
    #[serde(default)]
    pub off_axis_rate_rad_s: f64,
    /// Direction of the off-axis rate in the disc plane, rad from forward toward the left
    /// (default 0).
    #[serde(default)]
    pub off_axis_direction_rad: f64,
    /// Throwing style (default backhand).
    #[serde(default = "default_style")]
    pub style: Style,
    /// Throwing hand (default right).
    #[serde(default = "default_hand")]
    pub hand: Hand,
}

fn default_height_m() -> f64 {
    1.0
}

fn default_style() -> Style {
    Style::Backhand
}

fn default_hand() -> Hand {
    Hand::Right
}

impl Default for ReleasePose {
    /// A flat right-hand backhand released level at 1.0 m, without wobble.
    fn default() -> Self {
        Self {
            launch_rad: 0.0,
            nose_rad: 0.0,
            roll_rad: 0.0,
            heading_rad: 0.0,
            height_m: default_height_m(),
            off_axis_rate_rad_s: 0.0,
            off_axis_direction_rad: 0.0,
            style: default_style(),
            hand: default_hand(),
        }
    }
}

impl ReleasePose {
    /// A default pose thrown with `style` and `hand`.
    pub fn thrown(style: Style, hand: Hand) -> Self {
        Self { style, hand, ..Self::default() }
    }

    /// The release state with this pose, `speed_mps` (m/s) and spin magnitude `spin_rad_s`
    /// (rad/s). Not validated; see [`ReleaseState::validate`].
    #[rustfmt::skip] // reason: one line per field list keeps the two mappings readable side by side
    pub fn with_speed_and_spin(&self, speed_mps: f64, spin_rad_s: f64) -> ReleaseState {
        let Self { launch_rad, nose_rad, roll_rad, heading_rad, height_m, off_axis_rate_rad_s, off_axis_direction_rad, style, hand } = *self;
        ReleaseState { speed_mps, spin_rad_s, launch_rad, nose_rad, roll_rad, heading_rad, height_m, off_axis_rate_rad_s, off_axis_direction_rad, style, hand }
    }
}

impl ReleaseState {
    /// The pose of this release (everything but speed and spin).
    #[rustfmt::skip] // reason: as above
    pub fn pose(&self) -> ReleasePose {
        let Self { launch_rad, nose_rad, roll_rad, heading_rad, height_m, off_axis_rate_rad_s, off_axis_direction_rad, style, hand, .. } = *self;
        ReleasePose { launch_rad, nose_rad, roll_rad, heading_rad, height_m, off_axis_rate_rad_s, off_axis_direction_rad, style, hand }
    }
}
