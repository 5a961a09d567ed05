use nalgebra::Vector3;
use serde::{Deserialize, Serialize};

use crate::dynamics::{DiscBody, DiscState};

/// One recorded instant of a flight, world frame (x downrange, y left, z up), SI units.
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
pub struct FlightSample {
    /// Time since release in s.
    pub time_s: f64,
    /// Centre-of-mass position in m.
    pub position_m: Vector3<f64>,
    /// Centre-of-mass velocity relative to the ground in m/s.
    pub velocity_mps: Vector3<f64>,
    /// Unit symmetry axis **n** (attitude), dimensionless.
    pub normal: Vector3<f64>,
    /// Spin ω_s about **n** in rad/s (signed; right-hand backhand negative).
    pub spin_rad_s: f64,
    /// Roll angle in rad, positive = hyzer (the fade-side edge low), negative = anhyzer:
    /// atan2(s (**n**·**l**), **n**·**u**), where **f** is the ground-track velocity direction,
    /// **l** = unit(**z** × **f**) (horizontal, to the left), **u** = **f** × **l**, and s the
    /// throw's fade side (+1 left). At release it equals [`crate::ReleaseState::roll_rad`].
    pub roll_rad: f64,
    /// Angle of attack in rad against the air-relative velocity, positive with air on the
    /// underside (same definition as [`crate::AeroInput`]).
    pub angle_of_attack_rad: f64,
    /// Wobble angle in rad: the angle between **n** and the line of the angular momentum **H**
    /// about the centre of mass (the nutation cone's half-angle; 0 for a clean spin), not the
    /// angle to a running mean of **n**. Without torque it is constant, tan θ = I_x |ω⊥| /
    /// (I_z |ω_s|) (see [`super::wobble_rate_for_angle`]); in air the damping terms shrink it.
    pub wobble_rad: f64,
}

/// What a sample needs besides the state.
pub(crate) struct SampleContext<'a> {
    pub body: &'a DiscBody,
    /// Fade side s: +1 left, −1 right.
    pub fade_side: f64,
    /// Ground-track direction to use when the disc moves vertically (unit, horizontal).
    pub fallback_forward: Vector3<f64>,
}

impl SampleContext<'_> {
    /// The sample of `state` at `time_s`, with `wind_mps` the air velocity at the disc.
    pub fn sample(&self, time_s: f64, state: &DiscState, wind_mps: &Vector3<f64>) -> FlightSample {
        FlightSample {
            time_s,
            position_m: state.position_m,
            velocity_mps: state.velocity_mps,
            normal: state.normal,
            spin_rad_s: state.spin_rad_s,
            roll_rad: self.roll_rad(state),
            angle_of_attack_rad: angle_of_attack_rad(&(state.velocity_mps - wind_mps), &state.normal),
            wobble_rad: wobble_rad(state, self.body),
        }
    }

    /// Roll angle (see [`FlightSample::roll_rad`]).
    pub fn roll_rad(&self, state: &DiscState) -> f64 {
        let v = state.velocity_mps;
        let horizontal = Vector3::new(v.x, v.y, 0.0);
        let forward = if horizontal.norm() > 1e-9 { v.normalize() } else { self.fallback_forward };
        let left = Vector3::z().cross(&forward).normalize();
        let up = forward.cross(&left);
        (self.fade_side * state.normal.dot(&left)).atan2(state.normal.dot(&up))
    }
}

/// α = atan2(−v̂·**n**, |v̂ − (v̂·**n**)**n**|) in rad; 0 at zero airspeed.
pub fn angle_of_attack_rad(air_velocity_mps: &Vector3<f64>, normal: &Vector3<f64>) -> f64 {
    let speed = air_velocity_mps.norm();
    if speed == 0.0 {
        return 0.0;
    }
    let v = air_velocity_mps / speed;
    let along = v.dot(normal);
    (-along).atan2((v - normal * along).norm())
}

/// Angle between **n** and the line of **H** in rad, in [0, π/2]; 0 when **H** = 0.
pub fn wobble_rad(state: &DiscState, body: &DiscBody) -> f64 {
    let h = state.angular_momentum(body);
    state.normal.cross(&h).norm().atan2(state.normal.dot(&h).abs())
}
