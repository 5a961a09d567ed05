//! The flight signature of a disc: a fixed battery of test throws, reduced to a few numbers in
//! physical units on scales of our own, so two designs compare at a glance.
//!
//! # The battery (fixed)
//! Right-hand backhand, flat (hyzer 0°), launch 10°, nose 0°, released 1.0 m above level ground,
//! heading straight downrange, no wobble, at 16, 20, 24 and 28 m/s ([`SIGNATURE_SPEEDS_MPS`]);
//! sea-level standard dry air, calm; flights end at first ground contact. The case's disc and
//! coefficient set are used; its release, air, wind and ground are ignored.
//!
//! Spin comes from the same effort for every disc: the spin's kinetic energy ½ I_z ω² is a fixed
//! share [`SIGNATURE_SPIN_ENERGY_SHARE`] (0.2) of the translational ½ m V², so
//! ω = V √(0.2 m / I_z). A rim-heavy disc of the same mass spins slower than a one-piece disc
//! from the battery's throw, yet carries more angular momentum |H| = √(0.2 m V² I_z), as from a
//! player's throw. (For a typical I_z ≈ 0.74 m R² this is an advance ratio ωR/V ≈ 0.52.)
//!
//! # The scales
//! Both direction scales are angles, so they do not grow with carry: a disc that flies further
//! drifts further sideways in metres at the same bank, but it does not bank further.
//! - `high_speed_turn_deg`: the greatest roll (bank) toward the turn side (anhyzer) over the
//!   28 m/s throw, degrees, ≥ 0 (0 for a disc that never rolls past flat toward turn). The
//!   aerodynamic pitching moment M rolls a spinning disc at the precession rate M/(I_z ω)
//!   (Euler's equations, gyroscopic precession), so the scale falls with angular momentum.
//! - `low_speed_fade_deg`: how far the ground track hooks toward the fade side after the apex
//!   of the 16 m/s throw: the heading at landing minus the heading at the apex, toward the fade
//!   side, degrees.
//! - `glide_s`: time aloft (s) at 20 m/s.
//! - `carry_at_24_m`: carry (m) at 24 m/s.
//! - `lift_to_drag_at_5deg`: C_L/C_D of the set at α = 5° (a typical glide angle of attack;
//!   common practice, no published source), 20 m/s, an advance ratio of 0.5.
use serde::{Deserialize, Serialize};

use super::runner::run_indexed;
use super::{NamedValue, StudyCase, StudyControl, StudyError};
use crate::{fly, AeroInput, AeroModel, AirProperties, Flight, FlightConditions, FlightSample, Hand, ReleasePose, ReleaseState, Style};

/// Release speeds of the battery, m/s.
pub const SIGNATURE_SPEEDS_MPS: [f64; 4] = [16.0, 20.0, 24.0, 28.0];
/// Share of the translational kinetic energy ½ m V² that a battery throw puts into spin,
/// ½ I_z ω² (the same effort for every disc: rim-heavy discs spin slower, with more |H|).
pub const SIGNATURE_SPIN_ENERGY_SHARE: f64 = 0.2;
/// Advance ratio ωR/V at which the set's lift-to-drag ratio is read.
pub const SIGNATURE_ADVANCE_RATIO: f64 = 0.5;
/// Interval of the battery flights' samples, s (bank and heading are read from them).
const SAMPLE_INTERVAL_S: f64 = 0.01;
/// The battery is right-hand backhand: it fades to the left (+y), turns to the right.
const FADE_SIDE: f64 = 1.0;
/// The scales: (name, unit, meaning).
pub const SIGNATURE_SCALES: [(&str, &str, &str); 5] = [
    ("high_speed_turn_deg", "°", "high-speed turn: greatest bank toward the turn side (anhyzer) at 28 m/s"),
    ("low_speed_fade_deg", "°", "low-speed fade: heading change toward the fade side from apex to landing at 16 m/s"),
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
    /// Greatest bank toward the turn side (anhyzer), degrees (≥ 0).
    pub turn_bank_deg: f64,
    /// Heading change toward the fade side from the apex to landing, degrees.
    pub fade_hook_deg: f64,
    /// Angular momentum |H| at release, kg·m²/s.
    pub angular_momentum_kg_m2_s: f64,
    /// Turn (lateral excursion away from the fade side), m (grows with carry).
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

/// The battery's release at `speed_mps` for a disc of mass `mass_kg` and spin inertia
/// `spin_inertia_kg_m2` (spin from [`SIGNATURE_SPIN_ENERGY_SHARE`]).
pub fn signature_release(speed_mps: f64, mass_kg: f64, spin_inertia_kg_m2: f64) -> ReleaseState {
    let pose = ReleasePose { launch_rad: 10f64.to_radians(), height_m: 1.0, style: Style::Backhand, hand: Hand::Right, ..ReleasePose::default() };
    let spin_rad_s = speed_mps * (SIGNATURE_SPIN_ENERGY_SHARE * mass_kg / spin_inertia_kg_m2).sqrt();
    pose.with_speed_and_spin(speed_mps, spin_rad_s)
}

/// Flies the battery with the case's disc and coefficient set.
pub fn flight_signature(case: &StudyCase, control: StudyControl<'_>) -> Result<FlightSignature, StudyError> {
    let body = case.disc.body()?;
    let model = case.model.scaled();
    let conditions = FlightConditions::default();
    let settings = crate::FlightSettings { record_samples: true, sample_interval_s: SAMPLE_INTERVAL_S, ..case.flight_settings };
    let flights = run_indexed(&[0, 1, 2, 3], control, |k| {
        let release = signature_release(SIGNATURE_SPEEDS_MPS[k], body.mass_kg, body.spin_inertia_kg_m2);
        fly(&body, &model, &release, &conditions, &settings).map(|f| signature_throw(&release, &f))
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
    let values = [throws[3].turn_bank_deg, throws[0].fade_hook_deg, throws[1].time_aloft_s, throws[2].carry_m, c.lift / c.drag];
    let scales = SIGNATURE_SCALES.iter().zip(values).map(|((name, unit, _), value)| NamedValue { name: (*name).into(), unit: (*unit).into(), value }).collect();
    Ok(FlightSignature { throws, scales })
}

fn signature_throw(release: &ReleaseState, f: &Flight) -> SignatureThrow {
    let m = &f.metrics;
    SignatureThrow {
        speed_mps: release.speed_mps,
        spin_rps: release.spin_rad_s.abs() / std::f64::consts::TAU,
        carry_m: m.carry_m,
        turn_bank_deg: turn_bank_deg(&f.samples),
        fade_hook_deg: fade_hook_deg(&f.samples, m.apex_time_s),
        angular_momentum_kg_m2_s: m.release_angular_momentum_kg_m2_s,
        turn_m: m.turn_m,
        landing_lateral_m: m.landing_lateral_m,
        time_aloft_s: m.time_aloft_s,
        apex_m: m.apex_m,
    }
}

/// The greatest bank toward the turn side over the samples, degrees (≥ 0).
pub(crate) fn turn_bank_deg(samples: &[FlightSample]) -> f64 {
    samples.iter().map(|s| -s.roll_rad).fold(0.0, f64::max).to_degrees()
}

/// The ground-track heading change toward the fade side from the sample nearest the apex to
/// the last sample (landing), degrees.
pub(crate) fn fade_hook_deg(samples: &[FlightSample], apex_time_s: f64) -> f64 {
    let heading = |s: &FlightSample| s.velocity_mps.y.atan2(s.velocity_mps.x);
    let (Some(apex), Some(last)) = (samples.iter().min_by(|a, b| (a.time_s - apex_time_s).abs().total_cmp(&(b.time_s - apex_time_s).abs())), samples.last()) else {
        return 0.0;
    };
    let change = heading(last) - heading(apex);
    let wrapped = (change + std::f64::consts::PI).rem_euclid(std::f64::consts::TAU) - std::f64::consts::PI;
    (FADE_SIDE * wrapped).to_degrees()
}
