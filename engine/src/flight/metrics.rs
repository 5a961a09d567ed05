//! Flight metrics: what a designer reads off a flight, defined once for every style and hand.
use nalgebra::Vector3;
use serde::{Deserialize, Serialize};

use crate::dynamics::{DiscBody, DiscState};

use super::sample::wobble_rad;
use super::trajectory::Trajectory;
use super::wobble::wobble_half_time_s;

/// Summary numbers of one flight, SI units.
///
/// Frame: the release point's ground projection is the origin; the **release heading line** is
/// the horizontal line through it along the release heading ψ₀ ([`crate::ReleaseState::heading_rad`]).
/// "Lateral" is the horizontal offset from that line, along **l₀** = (−sin ψ₀, cos ψ₀, 0).
/// s = [`crate::ReleaseState::fade_side`] (+1 left, −1 right); the turn side is −s. With these
/// definitions a left-hand flight that mirrors a right-hand one has identical metrics.
/// "Landing" is the end of the flight: the first ground contact of the rim (or the time limit,
/// when the flight was allowed to end there; see [`super::Flight::landed`]).
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
pub struct FlightMetrics {
    /// Horizontal distance from the release point to the centre of mass at landing, m.
    pub carry_m: f64,
    /// Centre-of-mass position at landing, world frame, m.
    pub landing_position_m: Vector3<f64>,
    /// Distance along the release heading line to the landing point, m.
    pub landing_downrange_m: f64,
    /// Lateral offset of the landing point from the release heading line, m, positive toward
    /// the fade side.
    pub landing_lateral_m: f64,
    /// Greatest centre-of-mass height above the ground, m (located on the dense output).
    pub apex_m: f64,
    /// Time of the apex since release, s.
    pub apex_time_s: f64,
    /// Time from release to landing, s.
    pub time_aloft_s: f64,
    /// Centre-of-mass speed relative to the ground at landing, m/s.
    pub landing_speed_mps: f64,
    /// Descent angle of the velocity below the horizontal at landing, rad (positive descending).
    pub landing_angle_rad: f64,
    /// Spin magnitude |ω_s| at release, rad/s.
    pub release_spin_rad_s: f64,
    /// Spin magnitude |ω_s| at landing, rad/s.
    pub landing_spin_rad_s: f64,
    /// Fraction of the release spin kept at landing, ω_s(landing)/ω_s(release)
    /// (dimensionless; 0 when released without spin).
    pub spin_kept_fraction: f64,
    /// |**H**| about the centre of mass at release, kg·m²/s.
    pub release_angular_momentum_kg_m2_s: f64,
    /// |**H**| about the centre of mass at landing, kg·m²/s.
    pub landing_angular_momentum_kg_m2_s: f64,
    /// Turn: the largest lateral excursion toward the turn side (−s) from the release heading
    /// line over the flight, m (≥ 0; 0 when the disc never crosses to the turn side).
    pub turn_m: f64,
    /// Time of the largest turn-side excursion, s (0 when `turn_m` is 0).
    pub turn_time_s: f64,
    /// Fade: the lateral change from the point of largest turn to landing, toward the fade side,
    /// m (≥ 0 by construction).
    pub fade_m: f64,
    /// Ground-track heading at landing minus the release heading, wrapped to (−π, π], signed
    /// positive toward the fade side, rad.
    pub heading_change_rad: f64,
    /// Largest rate of the axis, max |**ṅ**| over the solver's steps, rad/s (roll and pitch
    /// motion of the disc plane, nutation included).
    pub max_axis_rate_rad_s: f64,
    /// Wobble angle at release, rad: the angle between **n** and the line of **H**
    /// ([`super::wobble_rad`]); tan θ = I_x |ω⊥| / (I_z |ω_s|) (see [`super::wobble_rate_for_angle`]).
    #[serde(default)]
    pub initial_wobble_rad: f64,
    /// Time to halve the wobble, s: the first time after release at which the wobble angle has
    /// fallen to half of `initial_wobble_rad` (located on the dense output to 1 ns). `None` when
    /// the release had no wobble (< 1e-9 rad) or the wobble never halved before landing.
    #[serde(default)]
    pub wobble_half_time_s: Option<f64>,
}

/// What the metrics need from the throw.
pub(crate) struct MetricsFrame {
    /// Release heading ψ₀, rad.
    pub heading_rad: f64,
    /// Fade side s: +1 left, −1 right.
    pub fade_side: f64,
}

impl MetricsFrame {
    fn lateral_m(&self, p: &Vector3<f64>) -> f64 {
        -self.heading_rad.sin() * p.x + self.heading_rad.cos() * p.y
    }

    fn downrange_m(&self, p: &Vector3<f64>) -> f64 {
        self.heading_rad.cos() * p.x + self.heading_rad.sin() * p.y
    }
}

/// Computes the metrics of a solved flight.
pub(crate) fn flight_metrics(trajectory: &Trajectory, body: &DiscBody, frame: &MetricsFrame) -> FlightMetrics {
    let release = trajectory.state_at(0.0);
    let landing = trajectory.state_at(trajectory.end_time_s);
    let (times, states) = knots(trajectory);
    let (apex_time_s, apex_m) = refined_max(trajectory, &times, &states, |s| s.position_m.z);
    let turn_side = -frame.fade_side;
    let (turn_time_s, turn) = refined_max(trajectory, &times, &states, |s| turn_side * frame.lateral_m(&s.position_m));
    let (turn_time_s, turn_m) = if turn > 0.0 { (turn_time_s, turn) } else { (0.0, 0.0) };
    let landing_lateral = frame.lateral_m(&landing.position_m);
    let max_axis_rate = states.iter().map(|s| s.normal_rate_per_s.norm()).fold(0.0, f64::max);
    let v = landing.velocity_mps;
    let horizontal_speed = v.x.hypot(v.y);
    FlightMetrics {
        carry_m: landing.position_m.x.hypot(landing.position_m.y),
        landing_position_m: landing.position_m,
        landing_downrange_m: frame.downrange_m(&landing.position_m),
        landing_lateral_m: frame.fade_side * landing_lateral,
        apex_m,
        apex_time_s,
        time_aloft_s: trajectory.end_time_s,
        landing_speed_mps: v.norm(),
        landing_angle_rad: (-v.z).atan2(horizontal_speed),
        release_spin_rad_s: release.spin_rad_s.abs(),
        landing_spin_rad_s: landing.spin_rad_s.abs(),
        spin_kept_fraction: if release.spin_rad_s != 0.0 { landing.spin_rad_s / release.spin_rad_s } else { 0.0 },
        release_angular_momentum_kg_m2_s: release.angular_momentum(body).norm(),
        landing_angular_momentum_kg_m2_s: landing.angular_momentum(body).norm(),
        turn_m,
        turn_time_s,
        fade_m: frame.fade_side * (landing_lateral - frame.lateral_m(&trajectory.state_at(turn_time_s).position_m)),
        heading_change_rad: frame.fade_side * wrap_angle(v.y.atan2(v.x) - frame.heading_rad),
        max_axis_rate_rad_s: max_axis_rate,
        initial_wobble_rad: wobble_rad(&release, body),
        wobble_half_time_s: wobble_half_time_s(trajectory, body),
    }
}

/// Release, every accepted step's end before the landing, and the landing: (times s, states).
fn knots(trajectory: &Trajectory) -> (Vec<f64>, Vec<DiscState>) {
    let capacity = trajectory.step_times_s.len() + 2;
    let (mut times, mut states) = (Vec::with_capacity(capacity), Vec::with_capacity(capacity));
    times.push(0.0);
    states.push(trajectory.state_at(0.0));
    for (&t, y) in trajectory.step_times_s.iter().zip(&trajectory.step_states) {
        if t > 0.0 && t < trajectory.end_time_s {
            times.push(t);
            states.push(DiscState::from_vector(y).projected());
        }
    }
    times.push(trajectory.end_time_s);
    states.push(trajectory.state_at(trajectory.end_time_s));
    (times, states)
}

/// The largest value of `f` over the flight: the best knot, refined by golden-section search
/// on the dense output between its neighbours. Returns (time s, value).
fn refined_max(trajectory: &Trajectory, times: &[f64], states: &[DiscState], f: impl Fn(&DiscState) -> f64) -> (f64, f64) {
    let best = (0..states.len()).fold(0, |b, i| if f(&states[i]) > f(&states[b]) { i } else { b });
    let lo = times[best.saturating_sub(1)];
    let hi = times[(best + 1).min(times.len() - 1)];
    let g = |t: f64| f(&trajectory.state_at(t));
    let (t, value) = golden_section_max(&g, lo, hi);
    if value > f(&states[best]) { (t, value) } else { (times[best], f(&states[best])) }
}

/// Golden-section search for the maximum of a unimodal `g` on [lo, hi]; (argmax, max).
fn golden_section_max(g: &impl Fn(f64) -> f64, mut lo: f64, mut hi: f64) -> (f64, f64) {
    const INV_PHI: f64 = 0.618_033_988_749_895;
    let mut a = hi - INV_PHI * (hi - lo);
    let mut b = lo + INV_PHI * (hi - lo);
    let (mut ga, mut gb) = (g(a), g(b));
    while hi - lo > 1e-9 {
        if ga > gb {
            hi = b;
            (b, gb) = (a, ga);
            a = hi - INV_PHI * (hi - lo);
            ga = g(a);
        } else {
            lo = a;
            (a, ga) = (b, gb);
            b = lo + INV_PHI * (hi - lo);
            gb = g(b);
        }
    }
    let t = 0.5 * (lo + hi);
    (t, g(t))
}

/// Wraps an angle to (−π, π].
fn wrap_angle(a: f64) -> f64 {
    use std::f64::consts::{PI, TAU};
    let w = a.rem_euclid(TAU);
    if w > PI { w - TAU } else { w }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn golden_section_finds_a_parabola_peak() {
        // source: Kiefer (1953), Sequential minimax search for a maximum, Proc. AMS 4, 502–506
        let (t, v) = golden_section_max(&|t: f64| 3.0 - (t - 0.3).powi(2), 0.0, 1.0);
        // near a smooth maximum the argmax is resolvable only to about √ε of the scale
        assert!((t - 0.3).abs() < 1e-7 && (v - 3.0).abs() < 1e-15);
    }

    #[test]
    fn wraps_angles_into_the_half_open_interval() {
        assert!((wrap_angle(3.0 * std::f64::consts::PI) - std::f64::consts::PI).abs() < 1e-12);
        assert!((wrap_angle(-0.5) + 0.5).abs() < 1e-15);
    }
}
