//! From a [`ReleaseState`] to the integrator's initial [`DiscState`].
use nalgebra::{Rotation3, Unit, Vector3};

use crate::dynamics::{DiscBody, DiscState};
use crate::throw::ReleaseState;

use super::FlightError;

/// The initial state of a flight, after checking the release values (typed errors naming the
/// field, its value and the allowed range; a tilted rim that would start below the ground is
/// rejected as a bad `height_m`).
///
/// Construction (world frame x downrange, y left, z up; γ launch, ψ heading, ν nose, ρ roll,
/// s = [`ReleaseState::fade_side`], +1 left):
/// 1. velocity **v** = V (cos γ cos ψ, cos γ sin ψ, sin γ); **f** = **v**/V;
/// 2. lateral (left) axis **l** = (−sin ψ, cos ψ, 0); the velocity's "up" **u** = **f** × **l**
///    (perpendicular to **v** in the vertical plane containing it);
/// 3. nose: **n₀** = −sin ν **f** + cos ν **u** (the disc plane ν above the velocity, so the
///    angle of attack in still air equals ν);
/// 4. roll about **f**: **n** = −sin ν **f** + cos ν (cos ρ **u** + s sin ρ **l**), so a positive
///    (hyzer) roll tilts **n** toward the fade side, i.e. lowers the fade-side edge;
/// 5. spin ω_s = [`ReleaseState::signed_spin_rad_s`];
/// 6. wobble: the transverse angular velocity **ω**⊥ = w (cos β **e_f** + sin β **e_l**), with
///    **e_f** the velocity's direction projected into the disc plane, **e_l** = **n** × **e_f**
///    (in-plane, to the left) and β = `off_axis_direction_rad`; then **ṅ** = **ω**⊥ × **n**;
/// 7. position (0, 0, h): the release point is the origin of the ground plane.
pub fn initial_state(body: &DiscBody, release: &ReleaseState) -> Result<DiscState, FlightError> {
    validate_release(release)?;
    let frame = ReleaseFrame::new(release.launch_rad, release.heading_rad);
    let normal = release_normal(&frame, release);
    let state = DiscState {
        position_m: Vector3::new(0.0, 0.0, release.height_m),
        velocity_mps: frame.forward * release.speed_mps,
        normal,
        normal_rate_per_s: wobble_transverse_rate(&frame, release, &normal).cross(&normal),
        spin_rad_s: release.signed_spin_rad_s(),
    };
    check_rim_above_ground(&state, body)?;
    Ok(state)
}

/// The velocity's orthonormal frame at release.
struct ReleaseFrame {
    forward: Vector3<f64>,
    up: Vector3<f64>,
}

impl ReleaseFrame {
    fn new(launch_rad: f64, heading_rad: f64) -> Self {
        let (sg, cg) = launch_rad.sin_cos();
        let (sh, ch) = heading_rad.sin_cos();
        let forward = Vector3::new(cg * ch, cg * sh, sg);
        let left = Vector3::new(-sh, ch, 0.0);
        Self { forward, up: forward.cross(&left) }
    }
}

fn release_normal(frame: &ReleaseFrame, release: &ReleaseState) -> Vector3<f64> {
    let (sn, cn) = release.nose_rad.sin_cos();
    let nosed = -sn * frame.forward + cn * frame.up;
    let angle = -release.fade_side() * release.roll_rad; // rotation about f takes u toward −l
    let rotation = Rotation3::from_axis_angle(&Unit::new_unchecked(frame.forward), angle);
    (rotation * nosed).normalize()
}

fn wobble_transverse_rate(frame: &ReleaseFrame, release: &ReleaseState, normal: &Vector3<f64>) -> Vector3<f64> {
    if release.off_axis_rate_rad_s == 0.0 {
        return Vector3::zeros();
    }
    let in_plane = frame.forward - normal * normal.dot(&frame.forward);
    // a disc released edge-on to its velocity (|nose| = 90°) has no in-plane forward: use up
    let e_f = if in_plane.norm() > 1e-9 { in_plane.normalize() } else { frame.up - normal * normal.dot(&frame.up) };
    let e_f = e_f.normalize();
    let e_l = normal.cross(&e_f);
    let (sb, cb) = release.off_axis_direction_rad.sin_cos();
    (e_f * cb + e_l * sb) * release.off_axis_rate_rad_s
}

fn check_rim_above_ground(state: &DiscState, body: &DiscBody) -> Result<(), FlightError> {
    let z_low = state.lowest_rim_height_m(body.radius_m());
    if z_low < -1e-9 {
        let tilt_drop = state.position_m.z - z_low;
        return Err(FlightError::InvalidRelease {
            field: "height_m",
            value: state.position_m.z,
            range: if tilt_drop > 0.0 { "≥ R·sin(tilt): the tilted rim would start below the ground" } else { "≥ 0 m" },
        });
    }
    Ok(())
}

fn validate_release(r: &ReleaseState) -> Result<(), FlightError> {
    use std::f64::consts::FRAC_PI_2;
    let check = |field: &'static str, value: f64, lo: f64, hi: f64, range: &'static str| {
        if value.is_finite() && value >= lo && value <= hi {
            Ok(())
        } else {
            Err(FlightError::InvalidRelease { field, value, range })
        }
    };
    check("speed_mps", r.speed_mps, 0.0, 300.0, "0 to 300 m/s")?;
    check("spin_rad_s", r.spin_rad_s, 0.0, 10_000.0, "0 to 10 000 rad/s")?;
    check("launch_rad", r.launch_rad, -FRAC_PI_2, FRAC_PI_2, "−π/2 to π/2 rad")?;
    check("nose_rad", r.nose_rad, -FRAC_PI_2, FRAC_PI_2, "−π/2 to π/2 rad")?;
    check("roll_rad", r.roll_rad, -FRAC_PI_2, FRAC_PI_2, "−π/2 to π/2 rad")?;
    check("heading_rad", r.heading_rad, -1e3, 1e3, "finite (|value| ≤ 1000 rad)")?;
    check("height_m", r.height_m, 0.0, 1e4, "0 to 10 000 m")?;
    check("off_axis_rate_rad_s", r.off_axis_rate_rad_s, 0.0, 10_000.0, "0 to 10 000 rad/s")?;
    check("off_axis_direction_rad", r.off_axis_direction_rad, -1e3, 1e3, "finite (|value| ≤ 1000 rad)")
}
