//! Wobble: an off-axis release, its nutation, and how fast the air damps it.
//!
//! # Definition
//! The **wobble angle** θ is the angle between the symmetry axis **n** and the line of the
//! angular momentum **H** about the centre of mass ([`super::wobble_rad`]); it is recorded in every
//! [`super::FlightSample`] and summarised in [`super::FlightMetrics`] (initial angle, time to halve).
//! A clean release (no transverse rate) has θ = 0.
//!
//! # Wobble angle and transverse rate (derivation)
//! For an axisymmetric body with spin ω_s about **n** and a transverse angular velocity **ω**⊥
//! (⟂ **n**), the angular momentum is **H** = I_z ω_s **n** + I_x **ω**⊥ (principal axes; see
//! [`crate::dynamics`]). Its component along **n** is I_z ω_s and its component across **n** is
//! I_x |**ω**⊥|, so the angle between **n** and the line of **H** satisfies
//!
//! tan θ = I_x |**ω**⊥| / (I_z |ω_s|).
//!
//! Without torque, **H** is constant (dH/dt = **M** = 0), I_z ω_s is constant (I_z ω̇_s = **M**·**n**
//! = 0), hence |**H**| cos θ = I_z |ω_s| fixes θ: the axis **n** sweeps a cone of half-angle θ about
//! the fixed **H**, at φ̇ = I_z ω_s / (I_x cos θ) (Goldstein, Poole & Safko (2002), Classical
//! Mechanics 3rd ed., §5.6). So "wobble 5°" at release means the transverse rate
//! |**ω**⊥| = I_z |ω_s| tan 5° / I_x ([`wobble_rate_for_angle`]).
//!
//! An off-axis impulse J (an angular impulse across **n**, N·m·s) adds transverse angular
//! momentum I_x |**ω**⊥| = J, so tan θ = J / (I_z |ω_s|): the same impulse wobbles a disc with
//! more spin angular momentum less.
//!
//! # Damping
//! In air, the pitch- and roll-damping terms of a coefficient set (C_Mq, C_Rp) oppose the
//! transverse rates and shrink the cone; the time to halve
//! ([`super::FlightMetrics::wobble_half_time_s`]) measures it: the first time after release at
//! which θ has fallen to half its release value, found on the solver's dense output on a grid
//! of at most an eighth of the nutation period 2π I_x / (I_z |ω_s|) and refined by bisection.
use crate::dynamics::DiscBody;
use crate::throw::ReleaseState;

use super::sample::wobble_rad;
use super::trajectory::Trajectory;
use super::FlightError;

/// Below this release wobble angle (rad) there is nothing to halve.
const NO_WOBBLE_RAD: f64 = 1e-9;

/// Largest wobble angle accepted by the helpers, rad (89°: the cone must stay narrower than a
/// right angle for tan θ to be finite).
pub const MAX_WOBBLE_RAD: f64 = 89.0 * std::f64::consts::PI / 180.0;

/// The transverse angular rate |**ω**⊥| in rad/s that gives the wobble angle `wobble_rad` (rad)
/// to a disc spinning at `spin_rad_s` (rad/s, sign ignored): I_z |ω_s| tan θ / I_x
/// (module docs).
///
/// Errors: θ outside [0, 89°] or non-finite; θ > 0 without spin (a non-spinning disc has no
/// wobble cone: any transverse rate is a tumble, θ = 90°); an invalid body.
pub fn wobble_rate_for_angle(body: &DiscBody, spin_rad_s: f64, wobble_rad: f64) -> Result<f64, FlightError> {
    body.validate()?;
    if !(wobble_rad.is_finite() && (0.0..=MAX_WOBBLE_RAD).contains(&wobble_rad)) {
        return Err(FlightError::InvalidRelease { field: "wobble_rad", value: wobble_rad, range: "0 to 89° (1.553 rad)" });
    }
    if !spin_rad_s.is_finite() || (wobble_rad > 0.0 && spin_rad_s == 0.0) {
        return Err(FlightError::InvalidRelease {
            field: "spin_rad_s",
            value: spin_rad_s,
            range: "finite, and non-zero when a wobble angle is given",
        });
    }
    Ok(body.spin_inertia_kg_m2 * spin_rad_s.abs() * wobble_rad.tan() / body.transverse_inertia_kg_m2)
}

/// The wobble angle θ in rad of a disc spinning at `spin_rad_s` (rad/s) with transverse rate
/// `transverse_rate_rad_s` (rad/s): atan2(I_x |ω⊥|, I_z |ω_s|), in [0, π/2] (module docs).
pub fn wobble_angle_for_rate(body: &DiscBody, spin_rad_s: f64, transverse_rate_rad_s: f64) -> f64 {
    (body.transverse_inertia_kg_m2 * transverse_rate_rad_s.abs()).atan2(body.spin_inertia_kg_m2 * spin_rad_s.abs())
}

/// `release` with its off-axis rate set so that the disc leaves the hand wobbling by
/// `wobble_rad` (rad), the transverse rate pointing `direction_rad` (rad) from the forward
/// in-plane direction toward the left ([`ReleaseState::off_axis_direction_rad`]).
///
/// Uses the release's spin magnitude; errors as [`wobble_rate_for_angle`].
pub fn release_with_wobble(
    release: &ReleaseState,
    body: &DiscBody,
    wobble_rad: f64,
    direction_rad: f64,
) -> Result<ReleaseState, FlightError> {
    if !direction_rad.is_finite() {
        return Err(FlightError::InvalidRelease { field: "off_axis_direction_rad", value: direction_rad, range: "finite" });
    }
    let rate = wobble_rate_for_angle(body, release.spin_rad_s, wobble_rad)?;
    Ok(ReleaseState { off_axis_rate_rad_s: rate, off_axis_direction_rad: direction_rad, ..*release })
}

/// The first time (s) at which the wobble angle has fallen to half its release value; `None`
/// when the release has no wobble (< 1e-9 rad) or it never halves before the end of the flight.
pub(crate) fn wobble_half_time_s(trajectory: &Trajectory, body: &DiscBody) -> Option<f64> {
    let initial = wobble_rad(&trajectory.state_at(0.0), body);
    if initial < NO_WOBBLE_RAD {
        return None;
    }
    let above = |t: f64| wobble_rad(&trajectory.state_at(t), body) - 0.5 * initial;
    let mut ends: Vec<f64> = trajectory.step_times_s.iter().copied().filter(|&t| t > 0.0 && t < trajectory.end_time_s).collect();
    ends.push(trajectory.end_time_s);
    let mut start = 0.0;
    for end in ends {
        let state = trajectory.state_at(start);
        let nutation_rad_s = body.spin_inertia_kg_m2 * state.spin_rad_s.abs() / body.transverse_inertia_kg_m2;
        let finest = if nutation_rad_s > 0.0 { std::f64::consts::TAU / nutation_rad_s / 8.0 } else { end - start };
        let pieces = ((end - start) / finest).ceil().max(1.0) as usize;
        for k in 1..=pieces {
            let (a, b) = (start + (end - start) * (k - 1) as f64 / pieces as f64, start + (end - start) * k as f64 / pieces as f64);
            if above(b) <= 0.0 {
                return Some(bisect_down(&above, a, b));
            }
        }
        start = end;
    }
    None
}

/// Bisection for the crossing of `f` from > 0 at `lo` to ≤ 0 at `hi`, to 1e-9 s.
fn bisect_down(f: &dyn Fn(f64) -> f64, mut lo: f64, mut hi: f64) -> f64 {
    while hi - lo > 1e-9 {
        let mid = 0.5 * (lo + hi);
        if f(mid) > 0.0 {
            lo = mid;
        } else {
            hi = mid;
        }
    }
    hi
}

#[cfg(test)]
mod tests {
    use super::*;

    fn body() -> DiscBody {
        DiscBody { mass_kg: 0.175, spin_inertia_kg_m2: 0.00235, transverse_inertia_kg_m2: 0.00122, diameter_m: 0.269 }
    }

    #[test]
    fn angle_and_rate_are_inverse() {
        // source: H = I_z ω_s n + I_x ω⊥ (Goldstein, Poole & Safko (2002), §5.6); tan θ = I_x ω⊥ / (I_z ω_s)
        let b = body();
        for &theta in &[0.0, 0.01, 5f64.to_radians(), 0.5, 1.2] {
            let rate = wobble_rate_for_angle(&b, -90.0, theta).unwrap();
            assert!((wobble_angle_for_rate(&b, -90.0, rate) - theta).abs() < 1e-14);
        }
        // 5° at 90 rad/s: 0.00235·90·tan 5°/0.00122 (arithmetic)
        let expected = 0.00235 * 90.0 * 5f64.to_radians().tan() / 0.00122;
        assert!((wobble_rate_for_angle(&b, 90.0, 5f64.to_radians()).unwrap() - expected).abs() < 1e-12);
    }

    #[test]
    fn bad_wobble_input_is_a_typed_error() {
        let b = body();
        assert!(matches!(wobble_rate_for_angle(&b, 90.0, -0.1), Err(FlightError::InvalidRelease { field: "wobble_rad", .. })));
        assert!(matches!(wobble_rate_for_angle(&b, 90.0, 1.6), Err(FlightError::InvalidRelease { field: "wobble_rad", .. })));
        assert!(matches!(wobble_rate_for_angle(&b, 0.0, 0.1), Err(FlightError::InvalidRelease { field: "spin_rad_s", .. })));
        assert_eq!(wobble_rate_for_angle(&b, 0.0, 0.0).unwrap(), 0.0);
    }
}
