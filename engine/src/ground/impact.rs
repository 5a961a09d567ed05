//! Rigid-body impact at the rim contact with Coulomb friction and restitution.
//!
//! Method: the impact is integrated in impulse space with the normal impulse p_n as the clock
//! (Routh's method as set out by Stronge (2000), *Impact Mechanics*, Cambridge University Press,
//! ch. 4–5). The contact-point velocity u = v + ω × r changes linearly with the impulse P,
//! du = K dP with K = E/m − [r]× I⁻¹ [r]× (the full world-axes inertia of the axisymmetric
//! disc), so spin enters through ω × r. Each increment dp_n brings a tangential impulse that
//! either keeps the contact stuck (when that needs at most μ dp_n) or opposes the current slip
//! with magnitude μ dp_n. Compression ends when the normal velocity reaches zero; restitution
//! ends when the normal work of restitution equals e² times the work of compression (Stronge's
//! energetic coefficient). With that definition friction and restitution can only remove
//! energy, unlike Newton's velocity rule with slip reversal; for a frictionless or central
//! impact both give the same rebound velocity −e u_n.
use nalgebra::{Matrix2, Matrix3, Vector2, Vector3};

use super::body::ContactBody;
use super::error::GroundError;
use super::state::ContactState;
use super::surface::Surface;

/// Normal-impulse increments per estimated compression impulse.
const STEPS_PER_COMPRESSION: f64 = 256.0;
/// Hard cap on impulse increments (compression plus restitution).
const MAX_STEPS: usize = 200_000;

/// What an impact did.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct ImpactOutcome {
    /// State just after the impact (position and attitude unchanged), SI.
    pub state: ContactState,
    /// Total impulse applied by the ground at the contact point, world axes, N·s.
    pub impulse_ns: Vector3<f64>,
    /// Kinetic energy before, J.
    pub energy_before_j: f64,
    /// Kinetic energy after, J (≤ before).
    pub energy_after_j: f64,
    /// Contact-point velocity after the impact, world axes, m/s.
    pub contact_velocity_mps: Vector3<f64>,
    /// Whether the points were approaching at all (if not, nothing happened).
    pub approaching: bool,
}

/// Resolves an impact of `body` in `state` with the ground of unit normal `ground_normal`
/// (pointing up out of the ground) at the contact arm `arm_m` (centre of mass → contact, m),
/// on `surface`. `time_s` only labels errors.
pub fn resolve_impact(
    body: &ContactBody,
    state: &ContactState,
    arm_m: &Vector3<f64>,
    ground_normal: &Vector3<f64>,
    surface: &Surface,
    time_s: f64,
) -> Result<ImpactOutcome, GroundError> {
    let frame = ContactFrame::new(ground_normal);
    let k_world = contact_compliance(body, &state.normal, arm_m);
    let u_world = state.velocity_mps + state.angular_velocity_rad_s.cross(arm_m);
    let mut impact = ImpulseWalk::new(frame.to_local_matrix(&k_world), frame.to_local(&u_world), surface);
    let energy_before_j = state.kinetic_energy_j(body);
    let approaching = impact.u.z < 0.0;
    if approaching {
        impact.run().ok_or(GroundError::ImpactDidNotConverge { time_s, steps: MAX_STEPS })?;
    }
    let impulse_ns = frame.to_world(&impact.p);
    let after = apply_impulse(body, state, arm_m, &impulse_ns);
    Ok(ImpactOutcome {
        state: after,
        impulse_ns,
        energy_before_j,
        energy_after_j: after.kinetic_energy_j(body),
        contact_velocity_mps: after.velocity_mps + after.angular_velocity_rad_s.cross(arm_m),
        approaching,
    })
}

/// K = E/m − [r]× I⁻¹ [r]×: contact-point velocity change per unit impulse, world axes, 1/kg.
fn contact_compliance(body: &ContactBody, n: &Vector3<f64>, arm: &Vector3<f64>) -> Matrix3<f64> {
    let cross = arm.cross_matrix();
    Matrix3::identity() / body.mass_kg - cross * body.inverse_inertia_world(n) * cross
}

/// The state after impulse `impulse` (world, N·s) at `arm` (m).
fn apply_impulse(body: &ContactBody, state: &ContactState, arm: &Vector3<f64>, impulse: &Vector3<f64>) -> ContactState {
    let omega_change = body.inverse_inertia_world(&state.normal) * arm.cross(impulse);
    ContactState {
        velocity_mps: state.velocity_mps + impulse / body.mass_kg,
        angular_velocity_rad_s: state.angular_velocity_rad_s + omega_change,
        ..*state
    }
}

/// Orthonormal contact frame (t₁, t₂, k̂): local z is the ground normal.
struct ContactFrame {
    rotation: Matrix3<f64>,
}

impl ContactFrame {
    fn new(k: &Vector3<f64>) -> Self {
        let helper = if k.x.abs() < 0.9 { Vector3::x() } else { Vector3::y() };
        let t1 = (helper - k * helper.dot(k)).normalize();
        let t2 = k.cross(&t1);
        ContactFrame { rotation: Matrix3::from_columns(&[t1, t2, *k]) }
    }
    fn to_local(&self, v: &Vector3<f64>) -> Vector3<f64> {
        self.rotation.transpose() * v
    }
    fn to_world(&self, v: &Vector3<f64>) -> Vector3<f64> {
        self.rotation * v
    }
    fn to_local_matrix(&self, m: &Matrix3<f64>) -> Matrix3<f64> {
        self.rotation.transpose() * m * self.rotation
    }
}

/// The impulse-space integration, in the contact frame (z = normal).
struct ImpulseWalk {
    compliance: Matrix3<f64>,
    tangential_inverse: Matrix2<f64>,
    friction: f64,
    restitution_squared: f64,
    /// Contact-point velocity, m/s.
    u: Vector3<f64>,
    /// Accumulated impulse, N·s.
    p: Vector3<f64>,
    /// Normal-impulse increment, N·s.
    dpn: f64,
    steps: usize,
}

impl ImpulseWalk {
    fn new(compliance: Matrix3<f64>, u: Vector3<f64>, surface: &Surface) -> Self {
        let tangential: Matrix2<f64> = compliance.fixed_view::<2, 2>(0, 0).into();
        ImpulseWalk {
            compliance,
            tangential_inverse: tangential.try_inverse().unwrap_or_else(Matrix2::zeros),
            friction: surface.friction(),
            restitution_squared: surface.restitution().powi(2),
            u,
            p: Vector3::zeros(),
            dpn: (-u.z / compliance[(2, 2)]).max(0.0) / STEPS_PER_COMPRESSION,
            steps: 0,
        }
    }

    /// Compression then restitution; `None` if the step budget ran out.
    fn run(&mut self) -> Option<()> {
        let compression_work = self.compress()?;
        self.restitute(-compression_work * self.restitution_squared)
    }

    /// Walks until the normal velocity reaches zero; returns the (negative) normal work, J.
    fn compress(&mut self) -> Option<f64> {
        let tolerance = 1e-12 * self.u.norm();
        let mut work = 0.0;
        while self.u.z < -tolerance {
            self.budget()?;
            let (mut impulse, mut u_next) = self.trial(self.dpn);
            if u_next.z > 0.0 {
                // Land on u_n = 0; the stick/slip choice can shift it slightly, so repeat.
                (impulse, u_next) = self.trial(self.dpn * (-self.u.z / (u_next.z - self.u.z)));
            }
            work += 0.5 * (self.u.z + u_next.z) * impulse.z;
            self.accept(impulse, u_next);
        }
        Some(work)
    }

    /// Walks until the normal work of restitution reaches `target_j` (≥ 0, J).
    fn restitute(&mut self, target_j: f64) -> Option<()> {
        let mut work = 0.0;
        while work < target_j {
            self.budget()?;
            let (impulse, u_next) = self.trial(self.dpn);
            let step_work = 0.5 * (self.u.z + u_next.z) * impulse.z;
            if work + step_work < target_j {
                work += step_work;
                self.accept(impulse, u_next);
                continue;
            }
            let fraction = final_fraction(self.u.z, u_next.z - self.u.z, self.dpn, target_j - work);
            let (impulse, u_next) = self.trial(self.dpn * fraction);
            self.accept(impulse, u_next);
            break;
        }
        Some(())
    }

    fn budget(&mut self) -> Option<()> {
        self.steps += 1;
        (self.steps <= MAX_STEPS).then_some(())
    }

    fn accept(&mut self, impulse: Vector3<f64>, u_next: Vector3<f64>) {
        self.p += impulse;
        self.u = u_next;
    }

    /// The impulse increment for normal increment `dpn` and the velocity it leads to.
    fn trial(&self, dpn: f64) -> (Vector3<f64>, Vector3<f64>) {
        let impulse = self.increment(dpn);
        (impulse, self.u + self.compliance * impulse)
    }

    /// Stick if it takes at most μ dp_n of tangential impulse, else slide against the slip.
    fn increment(&self, dpn: f64) -> Vector3<f64> {
        let slip = Vector2::new(self.u.x, self.u.y);
        let coupling = Vector2::new(self.compliance[(0, 2)], self.compliance[(1, 2)]) * dpn;
        let stick = -(self.tangential_inverse * (slip + coupling));
        let limit = self.friction * dpn;
        let tangential = if stick.norm() <= limit {
            stick
        } else {
            let direction = if slip.norm() > 1e-12 { slip.normalize() } else { -stick.normalize() };
            -direction * limit
        };
        Vector3::new(tangential.x, tangential.y, dpn)
    }
}

/// Fraction f ∈ (0, 1] of a step with normal velocity u_n + f Δ (linear) whose normal work
/// f dp (u_n + ½ f Δ) equals `remaining_j`.
fn final_fraction(u_n: f64, delta: f64, dpn: f64, remaining_j: f64) -> f64 {
    let a = 0.5 * delta * dpn;
    let b = u_n * dpn;
    let fraction = if a.abs() < 1e-300 {
        remaining_j / b
    } else {
        (-b + (b * b + 4.0 * a * remaining_j).max(0.0).sqrt()) / (2.0 * a)
    };
    if fraction.is_finite() {
        fraction.clamp(0.0, 1.0)
    } else {
        1.0
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn the_final_fraction_lands_exactly_on_the_remaining_work() {
        // work of a partial step with linear u_n: f dp (u_n + ½ f Δ)
        let (u_n, delta, dpn, remaining) = (0.3, 0.2, 0.01, 0.002);
        let f = final_fraction(u_n, delta, dpn, remaining);
        assert!((f * dpn * (u_n + 0.5 * f * delta) - remaining).abs() < 1e-15);
        assert_eq!(final_fraction(0.0, 0.0, 0.01, 1.0), 1.0);
    }
}
