//! A skip: ballistic flight between impacts with exact torque-free rotation.
//!
//! Aerodynamics are left out (a skip is short and low). The centre of mass follows the
//! parabola c + v t − ½ g t² ẑ. The angular momentum H about the centre of mass is constant, and
//! for an axisymmetric body the symmetry axis precesses about H at the constant rate |H|/I_x
//! (torque-free motion, e.g. Goldstein, *Classical Mechanics*, §5.6), with ω = I⁻¹(n) H.
use nalgebra::{Rotation3, Unit, Vector3};

use super::body::ContactBody;
use super::play::{GroundPhase, Recorder};
use super::plane::GroundPlane;
use super::rim::lowest_rim_point;
use super::settings::GroundSettings;
use super::state::ContactState;

/// Bisection iterations to locate the next contact (step/2⁶⁰: far below rounding).
const BISECTIONS: usize = 60;

/// Torque-free motion of `start` after `elapsed_s` seconds of free fall.
#[derive(Debug, Clone, Copy)]
pub(crate) struct Ballistic<'a> {
    body: &'a ContactBody,
    start: ContactState,
    momentum: Vector3<f64>,
    gravity_mps2: f64,
}

impl<'a> Ballistic<'a> {
    pub(crate) fn new(body: &'a ContactBody, start: ContactState, gravity_mps2: f64) -> Self {
        let momentum = body.angular_momentum(&start.normal, &start.angular_velocity_rad_s);
        Ballistic { body, start, momentum, gravity_mps2 }
    }

    /// The state `elapsed_s` after the start.
    pub(crate) fn at(&self, elapsed_s: f64) -> ContactState {
        let fall = Vector3::new(0.0, 0.0, -self.gravity_mps2);
        let normal = self.axis_at(elapsed_s);
        ContactState {
            position_m: self.start.position_m + self.start.velocity_mps * elapsed_s + fall * (0.5 * elapsed_s * elapsed_s),
            velocity_mps: self.start.velocity_mps + fall * elapsed_s,
            normal,
            angular_velocity_rad_s: self.body.angular_velocity(&normal, &self.momentum),
        }
    }

    fn axis_at(&self, elapsed_s: f64) -> Vector3<f64> {
        let magnitude = self.momentum.norm();
        if magnitude < 1e-300 {
            return self.start.normal;
        }
        let angle = magnitude / self.body.transverse_inertia_kg_m2 * elapsed_s;
        let rotation = Rotation3::from_axis_angle(&Unit::new_unchecked(self.momentum / magnitude), angle);
        (rotation * self.start.normal).normalize()
    }

    fn gap_m(&self, plane: &GroundPlane, elapsed_s: f64) -> f64 {
        let state = self.at(elapsed_s);
        lowest_rim_point(plane, &state.position_m, &state.normal, self.body.radius_m).gap_m
    }
}

/// Flies `start` until the rim next touches `plane`; records samples (time offset `t0_s`).
/// Returns the elapsed time and the state at contact, or `None` if no contact happened within
/// `limit_s` seconds.
pub(crate) fn fly_to_contact(
    body: &ContactBody,
    plane: &GroundPlane,
    start: ContactState,
    settings: &GroundSettings,
    t0_s: f64,
    limit_s: f64,
    recorder: &mut Recorder,
) -> Option<(f64, ContactState)> {
    let path = Ballistic::new(body, start, settings.gravity_mps2);
    // The exact apex of the parabola is always recorded, so rebound heights read exactly.
    let apex_s = start.velocity_mps.z / settings.gravity_mps2;
    let mut before = 0.0;
    while before < limit_s {
        let after = before + settings.step_s;
        if path.gap_m(plane, after) <= 0.0 {
            let hit = bisect_contact(&path, plane, before, after);
            return Some((hit, path.at(hit)));
        }
        if apex_s > before && apex_s <= after {
            recorder.mark(t0_s + apex_s, &path.at(apex_s), GroundPhase::Airborne);
        }
        recorder.offer(t0_s + after, &path.at(after), GroundPhase::Airborne);
        before = after;
    }
    None
}

/// Bisection for the first zero of the rim gap in [lo, hi] (gap(hi) ≤ 0); returns a time
/// with gap ≤ 0.
fn bisect_contact(path: &Ballistic, plane: &GroundPlane, mut lo: f64, mut hi: f64) -> f64 {
    for _ in 0..BISECTIONS {
        let mid = 0.5 * (lo + hi);
        if path.gap_m(plane, mid) <= 0.0 {
            hi = mid;
        } else {
            lo = mid;
        }
    }
    hi
}
