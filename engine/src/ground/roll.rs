//! Rolling on the rim: a disc that stays on the ground nearly upright rolls like a wheel.
//!
//! Model (deliberately simple). The disc keeps its attitude and rolls in a straight line along
//! the rim tangent at the contact, t̂ = n × r̂ (r̂: centre → contact), which lies in the ground
//! plane. Any slip left after the impact is removed by friction, which keeps the angular
//! momentum about the contact point: the rolling speed is
//! v_roll = (m R² v·t̂ − I_z ω_s R) / (I_z + m R²) (the sliding-to-rolling result for a wheel).
//! Rolling then obeys (m + I_z/R²) dv/dt = m g·t̂ − c_rr m g cos α sign(v), with c_rr the
//! surface's rolling resistance. Lean-driven curving and the final fall onto the flight plate
//! are not modelled; the rest point is where the rolling stops.
use nalgebra::Vector3;

use super::body::ContactBody;
use super::play::{GroundEnding, GroundPhase, PhaseContext, Recorder, Settled};
use super::rim::lowest_rim_point;
use super::settings::GroundSettings;
use super::state::ContactState;
use super::terrain::Ground;

/// The straight rolling motion.
struct RollLine {
    start: Vector3<f64>,
    direction: Vector3<f64>,
    speed_mps: f64,
    /// Acceleration along `direction` while rolling forward (speed > 0), m/s².
    acceleration_mps2: f64,
    /// Whether rolling resistance can hold the disc against the slope's pull.
    holds: bool,
    /// +1 when `direction` is n × r̂, −1 when it is the reverse (sets the sign of the spin).
    sense: f64,
}

impl RollLine {
    fn new(body: &ContactBody, ground: &Ground, state: &ContactState, settings: &GroundSettings) -> Self {
        let contact = lowest_rim_point(&ground.plane, &state.position_m, &state.normal, body.radius_m);
        let arm_unit = contact.arm_m / body.radius_m;
        let mut direction = state.normal.cross(&arm_unit);
        let inertia_ratio = body.spin_inertia_kg_m2 / (body.mass_kg * body.radius_m.powi(2));
        let mut speed_mps = (state.velocity_mps.dot(&direction) - inertia_ratio * state.spin_rad_s() * body.radius_m) / (1.0 + inertia_ratio);
        let sense = if speed_mps < 0.0 { -1.0 } else { 1.0 };
        direction *= sense;
        speed_mps *= sense;
        let pull_mps2 = -settings.gravity_mps2 * direction.z;
        let resistance_mps2 = ground.surface.rolling_resistance() * settings.gravity_mps2 * ground.plane.normal().z;
        RollLine {
            start: state.position_m,
            direction,
            speed_mps,
            acceleration_mps2: (pull_mps2 - resistance_mps2) / (1.0 + inertia_ratio),
            holds: pull_mps2.abs() <= resistance_mps2,
            sense,
        }
    }

    /// Distance rolled after `elapsed_s` (s), m, and the speed then, m/s.
    fn at(&self, elapsed_s: f64) -> (f64, f64) {
        let speed = self.speed_mps + self.acceleration_mps2 * elapsed_s;
        (self.speed_mps * elapsed_s + 0.5 * self.acceleration_mps2 * elapsed_s * elapsed_s, speed)
    }

    /// When the roll stops, s (`None` if it never does: downhill faster than resistance).
    fn stop_time_s(&self) -> Option<f64> {
        if self.speed_mps <= 0.0 {
            return self.holds.then_some(0.0);
        }
        (self.acceleration_mps2 < 0.0 && self.holds).then(|| -self.speed_mps / self.acceleration_mps2)
    }

    fn state(&self, attitude: &ContactState, body: &ContactBody, elapsed_s: f64) -> ContactState {
        let (distance, speed) = self.at(elapsed_s);
        // Rolling without slip: v = −ω_s R (n × r̂).
        let rim_spin = -speed / body.radius_m * self.sense;
        ContactState {
            position_m: self.start + self.direction * distance,
            velocity_mps: self.direction * speed,
            normal: attitude.normal,
            angular_velocity_rad_s: attitude.normal * rim_spin,
        }
    }
}

/// Rolls `state` on its rim to rest. Returns the ending, the elapsed time (s) and the final state.
pub(crate) fn roll_to_rest(context: &PhaseContext, state: &ContactState, t0_s: f64, recorder: &mut Recorder) -> Settled {
    let PhaseContext { body, ground, settings } = *context;
    let line = RollLine::new(body, ground, state, settings);
    let available = (settings.max_time_s - t0_s).max(0.0);
    let (ending, duration) = match line.stop_time_s() {
        Some(stop) if stop <= available => (GroundEnding::Rolled, stop),
        _ => (GroundEnding::Unsettled, available),
    };
    let mut elapsed = 0.0;
    while elapsed < duration {
        recorder.offer(t0_s + elapsed, &line.state(state, body, elapsed), GroundPhase::Rolling);
        elapsed += settings.sample_interval_s;
    }
    let mut last = line.state(state, body, duration);
    if ending == GroundEnding::Rolled {
        last.velocity_mps = Vector3::zeros();
        last.angular_velocity_rad_s = Vector3::zeros();
    }
    Settled { ending, elapsed_s: duration, state: last }
}
