//! The flight signature of a disc: a fixed battery of test throws, reduced to a few numbers in
//! physical units on scales of our own, so two designs compare at a glance.
//!
//! # The battery (fixed)
//! Right-hand backhand, flat (hyzer 0°), launch 10°, nose 0°, released 1.0 m above level ground,
//! heading straight downrange, no wobble, at 16, 20, 24 and 28 m/s, with spin tied to speed by
//! the advance ratio ωR/V = [`SIGNATURE_ADVANCE_RATIO`] (0.5); sea-level standard dry air, calm;
//! flights end at first ground contact. The case's disc and coefficient set are used; its
//! release, air, wind and ground are ignored.
//!
//! # The scales
//! - `high_speed_turn_m`: greatest excursion away from the fade side (m) at 28 m/s.
//! - `low_speed_fade_m`: landing offset toward the fade side (m) at 16 m/s.
//! - `glide_s`: time aloft (s) at 20 m/s.
//! - `carry_at_24_m`: carry (m) at 24 m/s.
//! - `lift_to_drag_at_5deg`: C_L/C_D of the set at α = 5° (a typical glide angle of attack;
//!   common practice, no published source), 20 m/s, the battery's advance ratio.
use serde::{Deserialize, Serialize};

use super::runner::run_indexed;
use super::{NamedValue, StudyCase, StudyControl, StudyError};
use crate::{fly, AeroInput, AeroModel, AirProperties, FlightConditions, Hand, ReleasePose, ReleaseState, Style};

/// Release speeds of the battery, m/s.
pub const SIGNATURE_SPEEDS_MPS: [f64; 4] = [16.0, 20.0, 24.0, 28.0];
/// Advance ratio ωR/V of every battery throw.
pub const SIGNATURE_ADVANCE_RATIO: f64 = 0.5;
/// The scales: (name, unit, meaning).
pub const SIGNATURE_SCALES: [(&str, &str, &str); 5] = [
    ("high_speed_turn_m", "m", "high-speed turn: greatest excursion away from the fade side at 28 m/s"),
    ("low_speed_fade_m", "m", "low-speed fade: landing offset toward the fade side at 16 m/s"),
    ("glide_s", "s", "glide: time aloft at 20 m/s"),
    ("carry_at_24_m", "m", "carry at 24 m/s"),
    ("lift_to_drag_at_5deg", "1", "lift-to-drag ratio of the set at 5° angle of attack"),
];

/// One throw of the battery.
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
pub struct SignatureThrow {
    /// Release speed, m/s.
    pub speed_mps: f64,
    /// Spin, rev/s.
    pub spin_rps: f64,
    /// Carry, m.
    pub carry_m: f64,
    /// Turn (away from the fade side), m.
    pub turn_m: f64,
    /// Landing offset toward the fade side, m.
    pub landing_lateral_m: f64,
    /// Time aloft, s.
    pub time_aloft_s: f64,
    /// Apex height, m.
    pub apex_m: f64,
}

/// A disc's flight signature.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct FlightSignature {
    /// The battery's throws, by speed.
    pub throws: Vec<SignatureThrow>,
    /// The scales (see [`SIGNATURE_SCALES`]).
    pub scales: Vec<NamedValue>,
}

/// The battery's release at `speed_mps` for a disc of diameter `diameter_m`.
pub fn signature_release(speed_mps: f64, diameter_m: f64) -> ReleaseState {
    let pose = ReleasePose { launch_rad: 10f64.to_radians(), height_m: 1.0, style: Style::Backhand, hand: Hand::Right, ..ReleasePose::default() };
    pose.with_speed_and_spin(speed_mps, SIGNATURE_ADVANCE_RATIO * speed_mps / (0.5 * diameter_m))
}

/// Flies the battery with the case's disc and coefficient set.
pub fn flight_signature(case: &StudyCase, control: StudyControl<'_>) -> Result<FlightSignature, StudyError> {
    let body = case.disc.body()?;
    let model = case.model.scaled();
    let conditions = FlightConditions::default();
    let settings = crate::FlightSettings { record_samples: false, ..case.flight_settings };
    let flights = run_indexed(&[0, 1, 2, 3], control, |k| {
        let release = signature_release(SIGNATURE_SPEEDS_MPS[k], body.diameter_m);
        fly(&body, &model, &release, &conditions, &settings).map(|f| SignatureThrow {
            speed_mps: release.speed_mps,
            spin_rps: release.spin_rad_s / std::f64::consts::TAU,
            carry_m: f.metrics.carry_m,
            turn_m: f.metrics.turn_m,
            landing_lateral_m: f.metrics.landing_lateral_m,
            time_aloft_s: f.metrics.time_aloft_s,
            apex_m: f.metrics.apex_m,
        })
    })?;
    let throws = flights.into_iter().collect::<Result<Vec<_>, _>>()?;
    let air = AirProperties::sea_level_standard();
    let c = model.coefficients(&AeroInput {
        angle_of_attack_rad: 5f64.to_radians(),
        airspeed_mps: 20.0,
        spin_rad_s: -SIGNATURE_ADVANCE_RATIO * 20.0 / body.radius_m(),
        pitch_rate_rad_s: 0.0,
        roll_rate_rad_s: 0.0,
        advance_ratio: SIGNATURE_ADVANCE_RATIO,
        reynolds_number: air.reynolds_number(20.0, body.diameter_m),
    });
    let values = [throws[3].turn_m, throws[0].landing_lateral_m, throws[1].time_aloft_s, throws[2].carry_m, c.lift / c.drag];
    let scales = SIGNATURE_SCALES.iter().zip(values).map(|((name, unit, _), value)| NamedValue { name: (*name).into(), unit: (*unit).into(), value }).collect();
    Ok(FlightSignature { throws, scales })
}
