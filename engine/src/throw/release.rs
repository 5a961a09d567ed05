use serde::{Deserialize, Serialize};

/// Throwing style.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize, Deserialize)]
#[serde(rename_all = "lowercase")]
pub enum Style {
    /// Backhand: the arm crosses the body and extends.
    Backhand,
    /// Forehand (sidearm): the palm faces forward at release.
    Forehand,
}

/// Throwing hand.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize, Deserialize)]
#[serde(rename_all = "lowercase")]
pub enum Hand {
    /// Right hand.
    Right,
    /// Left hand.
    Left,
}

/// The state of a disc as it leaves the hand. Angles in rad, speeds in m/s, spin in rad/s.
///
/// Conventions (world frame x downrange, y left, z up):
/// - `speed_mps` is the centre-of-mass speed; its direction is `heading_rad` (about +z, from +x
///   toward +y, i.e. positive = to the left) and `launch_rad` above the horizontal.
/// - `nose_rad` is the angle of the disc plane above the velocity (positive nose-up), measured
///   in the vertical plane containing the velocity.
/// - `roll_rad` is the tilt of the disc about the velocity direction, positive = hyzer: the edge
///   on the style's fade side is lower (right-hand backhand fades left; right-hand forehand and
///   left-hand backhand fade right; left-hand forehand fades left). Negative = anhyzer.
/// - `spin_rad_s` is the spin magnitude (≥ 0); its sign about **n** follows style and hand
///   ([`ReleaseState::signed_spin_rad_s`]).
/// - `off_axis_rate_rad_s` is a transverse angular velocity at release (wobble), in the disc
///   plane, pointing `off_axis_direction_rad` from the forward in-plane direction toward the left.
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
pub struct ReleaseState {
    /// Release speed of the centre of mass, m/s.
    pub speed_mps: f64,
    /// Spin magnitude, rad/s (≥ 0).
    pub spin_rad_s: f64,
    /// Launch (elevation) angle of the velocity above horizontal, rad.
    pub launch_rad: f64,
    /// Nose angle of the disc plane relative to the velocity, rad (positive nose-up).
    pub nose_rad: f64,
    /// Roll angle, rad (positive hyzer, negative anhyzer).
    pub roll_rad: f64,
    /// Heading of the velocity about +z from downrange, rad (positive to the left).
    pub heading_rad: f64,
    /// Release height of the centre of mass above the ground, m.
    pub height_m: f64,
    /// Off-axis (wobble) angular velocity magnitude at release, rad/s.
    pub off_axis_rate_rad_s: f64,
    /// Direction of the off-axis rate in the disc plane, rad from forward toward the left.
    pub off_axis_direction_rad: f64,
    /// Throwing style.
    pub style: Style,
    /// Throwing hand.
    pub hand: Hand,
}

impl ReleaseState {
    /// +1 when the spin about **n** is counter-clockwise seen from above (right-hand forehand,
    /// left-hand backhand), −1 when clockwise (right-hand backhand, left-hand forehand).
    pub fn spin_sign(&self) -> f64 {
        match (self.style, self.hand) {
            (Style::Backhand, Hand::Right) | (Style::Forehand, Hand::Left) => -1.0,
            (Style::Forehand, Hand::Right) | (Style::Backhand, Hand::Left) => 1.0,
        }
    }

    /// Signed spin ω_s about **n** in rad/s.
    pub fn signed_spin_rad_s(&self) -> f64 {
        self.spin_sign() * self.spin_rad_s
    }

    /// The lateral direction (sign of world y) the disc fades toward: +1 left, −1 right.
    /// Clockwise spin (ω_s < 0) fades left.
    pub fn fade_side(&self) -> f64 {
        -self.spin_sign()
    }
}
