//! Sliding flat: the disc lies on the ground and slides and spins until friction stops it.
//!
//! Model. Once the disc stays on the ground it is laid flat on the plane (documented
//! simplification: the flattening is instantaneous). The angular momentum about the ground
//! normal, H·k̂, is kept through the flattening, because the normal forces that flatten the
//! disc have no moment about k̂; the centre keeps its velocity along the ground. The disc then
//! rests on its rim, a ring of radius R carrying the normal load m g cos α uniformly. Each
//! element of the ring feels Coulomb friction μ dN against its own velocity v + ω k̂ × r, so the
//! net force and torque couple sliding and spinning (the ring model of Farkas, Bartels, Unger
//! and Wolf (2003), "Frictional coupling between sliding and spinning motion", Phys. Rev.
//! Lett. 90, 248302): a spinning disc slides further than a non-spinning one, and both motions
//! stop together. Without spin the deceleration is exactly μ g cos α (plus the slope's pull).
use nalgebra::Vector3;

use super::body::ContactBody;
use super::play::{GroundEnding, GroundPhase, PhaseContext, Recorder, Settled};
use super::settings::GroundSettings;
use super::state::ContactState;
use super::terrain::Ground;

/// Translational and spin state of the flat disc: position (m), velocity (m/s), spin (rad/s).
#[derive(Debug, Clone, Copy)]
struct Flat {
    position_m: Vector3<f64>,
    velocity_mps: Vector3<f64>,
    spin_rad_s: f64,
}

/// Time derivative of [`Flat`]: velocity, acceleration, spin rate.
#[derive(Debug, Clone, Copy)]
struct FlatRate {
    velocity_mps: Vector3<f64>,
    acceleration_mps2: Vector3<f64>,
    spin_rate_rad_s2: f64,
}

/// The forces of the flat slide: gravity along the plane and ring friction.
struct SlideForces {
    normal: Vector3<f64>,
    /// Unit radial directions of the ring points, in the plane.
    ring: Vec<Vector3<f64>>,
    radius_m: f64,
    /// μ g cos α, m/s²: the friction deceleration of a non-spinning disc.
    friction_mps2: f64,
    /// Gravity's component along the plane, m/s².
    downhill_mps2: Vector3<f64>,
    /// m R² / I_z: converts friction torque per unit mass into spin acceleration.
    spin_factor: f64,
}

impl SlideForces {
    fn new(body: &ContactBody, ground: &Ground, settings: &GroundSettings) -> Self {
        let normal = ground.plane.normal();
        let gravity = Vector3::new(0.0, 0.0, -settings.gravity_mps2);
        let t1 = ground.plane.tangential(&Vector3::x()).normalize();
        let t2 = normal.cross(&t1);
        let count = settings.ring_points.max(4);
        let ring = (0..count)
            .map(|i| {
                let angle = std::f64::consts::TAU * (i as f64 + 0.5) / count as f64;
                t1 * angle.cos() + t2 * angle.sin()
            })
            .collect();
        SlideForces {
            normal,
            ring,
            radius_m: body.radius_m,
            friction_mps2: ground.surface.friction() * settings.gravity_mps2 * normal.z,
            downhill_mps2: gravity - normal * gravity.dot(&normal),
            spin_factor: body.mass_kg * body.radius_m.powi(2) / body.spin_inertia_kg_m2,
        }
    }

    fn rate(&self, flat: &Flat) -> FlatRate {
        let (mut force, mut torque) = (Vector3::zeros(), 0.0);
        for radial in &self.ring {
            let tangent = self.normal.cross(radial);
            let local = flat.velocity_mps + tangent * (flat.spin_rad_s * self.radius_m);
            let speed = local.norm();
            if speed > 1e-12 {
                force -= local / speed;
                torque -= tangent.dot(&local) / speed;
            }
        }
        let share = self.friction_mps2 / self.ring.len() as f64;
        FlatRate {
            velocity_mps: flat.velocity_mps,
            acceleration_mps2: self.downhill_mps2 + force * share,
            spin_rate_rad_s2: torque * share * self.spin_factor / self.radius_m,
        }
    }

    /// Whether static friction holds the disc on the slope.
    fn holds(&self) -> bool {
        self.downhill_mps2.norm() <= self.friction_mps2
    }
}

fn advance(flat: &Flat, rate: &FlatRate, dt: f64) -> Flat {
    Flat {
        position_m: flat.position_m + rate.velocity_mps * dt,
        velocity_mps: flat.velocity_mps + rate.acceleration_mps2 * dt,
        spin_rad_s: flat.spin_rad_s + rate.spin_rate_rad_s2 * dt,
    }
}

/// One classical Runge–Kutta step of length `dt` (s).
fn rk4_step(forces: &SlideForces, flat: &Flat, dt: f64) -> Flat {
    let k1 = forces.rate(flat);
    let k2 = forces.rate(&advance(flat, &k1, 0.5 * dt));
    let k3 = forces.rate(&advance(flat, &k2, 0.5 * dt));
    let k4 = forces.rate(&advance(flat, &k3, dt));
    let blend = |f: fn(&FlatRate) -> Vector3<f64>| (f(&k1) + (f(&k2) + f(&k3)) * 2.0 + f(&k4)) / 6.0;
    let spin = |r: &FlatRate| r.spin_rate_rad_s2;
    let rate = FlatRate {
        velocity_mps: blend(|r| r.velocity_mps),
        acceleration_mps2: blend(|r| r.acceleration_mps2),
        spin_rate_rad_s2: (spin(&k1) + 2.0 * (spin(&k2) + spin(&k3)) + spin(&k4)) / 6.0,
    };
    advance(flat, &rate, dt)
}

/// Lays `state` flat on the ground (see the module docs).
fn flatten(body: &ContactBody, ground: &Ground, state: &ContactState) -> Flat {
    let k = ground.plane.normal();
    let momentum = body.angular_momentum(&state.normal, &state.angular_velocity_rad_s);
    let spin_about_k = momentum.dot(&k) / body.spin_inertia_kg_m2;
    Flat {
        position_m: state.position_m - k * ground.plane.distance_m(&state.position_m),
        velocity_mps: ground.plane.tangential(&state.velocity_mps),
        spin_rad_s: spin_about_k,
    }
}

/// The flat disc as a full state (axis along ±k̂, keeping the side that faced up).
fn unflatten(flat: &Flat, k: &Vector3<f64>, upside: f64) -> ContactState {
    ContactState {
        position_m: flat.position_m,
        velocity_mps: flat.velocity_mps,
        normal: k * upside,
        angular_velocity_rad_s: k * flat.spin_rad_s,
    }
}

/// Slides `state` flat to rest. Returns the ending, the elapsed time (s) and the final state.
pub(crate) fn slide_to_rest(context: &PhaseContext, state: &ContactState, t0_s: f64, recorder: &mut Recorder) -> Settled {
    let PhaseContext { body, ground, settings } = *context;
    let forces = SlideForces::new(body, ground, settings);
    let k = forces.normal;
    let upside = if state.normal.dot(&k) >= 0.0 { 1.0 } else { -1.0 };
    let mut flat = flatten(body, ground, state);
    let mut elapsed = 0.0;
    while t0_s + elapsed < settings.max_time_s {
        recorder.offer(t0_s + elapsed, &unflatten(&flat, &k, upside), GroundPhase::Sliding);
        if let Some(stop_s) = stopping_time(&forces, &flat, settings) {
            flat.position_m += flat.velocity_mps * (0.5 * stop_s);
            let rest = unflatten(&Flat { velocity_mps: Vector3::zeros(), spin_rad_s: 0.0, ..flat }, &k, upside);
            return Settled { ending: GroundEnding::Slid, elapsed_s: elapsed + stop_s, state: rest };
        }
        flat = rk4_step(&forces, &flat, settings.step_s);
        elapsed += settings.step_s;
    }
    Settled { ending: GroundEnding::Unsettled, elapsed_s: elapsed, state: unflatten(&flat, &k, upside) }
}

/// If the disc will stop within the next step, the time to stop (s) under the friction
/// deceleration μ g cos α; `None` while it keeps moving.
fn stopping_time(forces: &SlideForces, flat: &Flat, settings: &GroundSettings) -> Option<f64> {
    let near = (forces.friction_mps2 * settings.step_s).max(settings.rest_speed_mps);
    let speed = flat.velocity_mps.norm();
    let rim_speed = flat.spin_rad_s.abs() * forces.radius_m;
    if !forces.holds() || speed > near || rim_speed > near {
        return None;
    }
    Some(if forces.friction_mps2 > 0.0 { speed / forces.friction_mps2 } else { 0.0 })
}
