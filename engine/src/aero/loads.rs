//! Force and moment assembly: from a disc's state and a coefficient model to newtons and
//! newton-metres in the world frame.
//!
//! Geometry (PHYSICS.md, "Aerodynamics"; axes as in [`AeroInput`]):
//! - v̂ = v_rel/|v_rel|; α = atan2(−v̂·**n**, |v̂ − (v̂·**n**)**n**|) (air on the underside: α > 0);
//! - **e_r** = (v̂ − (v̂·**n**)**n**)/|…| (forward in the disc plane);
//! - **e_p** = **e_r** × **n**, which equals v̂ × **n** normalised (positive = nose-up);
//! - lift along cos α **n** + sin α **e_r**, the unit part of **n** perpendicular to v̂;
//! - drag along −v̂;
//! - moment q∞·A·d·(C_roll **e_r** + C_pitch **e_p** + C_spin **n**).
//!
//! Degenerate states: at zero airspeed or zero density all loads are zero (the model is still
//! asked for its coefficients at α = 0, so the returned record is complete). When the air moves
//! along the normal (|in-plane part| < 1e-12), the disc has no preferred in-plane direction:
//! **e_r** = **e_p** = 0, so lift, pitch and roll vanish by symmetry and only drag and the spin
//! moment act.
use nalgebra::Vector3;

use super::model::{AeroCoefficients, AeroInput, AeroModel};
use crate::air::AirProperties;

/// Below this in-plane fraction of v̂ the air is taken to move along the normal.
const IN_PLANE_EPSILON: f64 = 1e-12;

/// Aerodynamic loads at one instant, world frame, with what produced them.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct AeroLoads {
    /// Aerodynamic force (lift + drag) in N, world frame.
    pub force_n: Vector3<f64>,
    /// Aerodynamic moment about the centre of mass in N·m, world frame.
    pub moment_nm: Vector3<f64>,
    /// What the coefficient model was given.
    pub input: AeroInput,
    /// What the coefficient model returned.
    pub coefficients: AeroCoefficients,
}

/// The aerodynamic axes of one state (see the module docs).
#[derive(Debug, Clone, Copy)]
struct AeroAxes {
    /// Unit air-relative velocity direction (zero at zero airspeed).
    velocity_dir: Vector3<f64>,
    /// Forward in-plane axis **e_r** (zero when undefined).
    roll_axis: Vector3<f64>,
    /// Pitch axis **e_p** = **e_r** × **n** (zero when undefined).
    pitch_axis: Vector3<f64>,
    /// Angle of attack in rad.
    alpha_rad: f64,
    /// cos α = |in-plane part of v̂| (v̂ is a unit vector), without a trigonometric call.
    cos_alpha: f64,
    /// sin α = −v̂·**n**.
    sin_alpha: f64,
}

impl AeroAxes {
    fn new(velocity_dir: Vector3<f64>, normal: &Vector3<f64>) -> Self {
        let along_normal = velocity_dir.dot(normal);
        let in_plane = velocity_dir - along_normal * normal;
        let in_plane_len = in_plane.norm();
        let (cos_alpha, sin_alpha) = (in_plane_len, -along_normal);
        if in_plane_len < IN_PLANE_EPSILON {
            let zero = Vector3::zeros();
            let alpha_rad = sin_alpha.atan2(cos_alpha);
            return Self { velocity_dir, roll_axis: zero, pitch_axis: zero, alpha_rad, cos_alpha, sin_alpha };
        }
        // α ∈ (−π/2, π/2) here, so atan of the ratio equals atan2 (and costs less)
        let alpha_rad = super::atan::atan(sin_alpha / cos_alpha);
        let roll_axis = in_plane * in_plane_len.recip();
        let pitch_axis = roll_axis.cross(normal);
        Self { velocity_dir, roll_axis, pitch_axis, alpha_rad, cos_alpha, sin_alpha }
    }

    /// Unit lift direction: the part of **n** perpendicular to v̂, cos α **n** + sin α **e_r**
    /// (zero when undefined).
    fn lift_dir(&self, normal: &Vector3<f64>) -> Vector3<f64> {
        if self.roll_axis == Vector3::zeros() {
            return Vector3::zeros();
        }
        self.cos_alpha * normal + self.sin_alpha * self.roll_axis
    }
}

/// Aerodynamic force (N) and moment about the centre of mass (N·m), world frame.
///
/// - `air`: density (kg/m³) and viscosity (Pa·s) of the air.
/// - `diameter_m`: reference length d in m; reference area A = πd²/4.
/// - `air_relative_velocity_mps`: the disc's centre-of-mass velocity minus the wind velocity,
///   world frame, m/s.
/// - `normal`: unit symmetry axis **n** (world).
/// - `angular_velocity_rad_s`: the body's full angular velocity ω (world), ω = ω_s **n** + **n** × **ṅ**, rad/s.
/// - `spin_rad_s`: ω_s, signed about **n**, rad/s.
///
/// Zero loads at zero airspeed or zero density; well defined when v̂ ∥ **n**; never NaN for
/// finite inputs.
pub fn aero_loads(
    model: &dyn AeroModel,
    air: &AirProperties,
    diameter_m: f64,
    air_relative_velocity_mps: &Vector3<f64>,
    normal: &Vector3<f64>,
    angular_velocity_rad_s: &Vector3<f64>,
    spin_rad_s: f64,
) -> AeroLoads {
    let speed = air_relative_velocity_mps.norm();
    let velocity_dir = if speed > 0.0 { air_relative_velocity_mps * speed.recip() } else { Vector3::zeros() };
    let axes = AeroAxes::new(velocity_dir, normal);
    let input = aero_input(&axes, air, diameter_m, speed, angular_velocity_rad_s, spin_rad_s);
    let coefficients = model.coefficients(&input);
    let dynamic_pressure_pa = 0.5 * air.density_kg_m3 * speed * speed;
    let area_m2 = std::f64::consts::PI * diameter_m * diameter_m / 4.0;
    let force_scale = dynamic_pressure_pa * area_m2;
    if force_scale.is_nan() || force_scale <= 0.0 || force_scale.is_infinite() {
        let zero = Vector3::zeros();
        return AeroLoads { force_n: zero, moment_nm: zero, input, coefficients };
    }
    let force_n = force_scale * (coefficients.lift * axes.lift_dir(normal) - coefficients.drag * axes.velocity_dir);
    let moment_nm = force_scale
        * diameter_m
        * (coefficients.roll * axes.roll_axis + coefficients.pitch * axes.pitch_axis + coefficients.spin * normal);
    AeroLoads { force_n, moment_nm, input, coefficients }
}

/// What the model sees: angle of attack, rates on our axes, advance ratio, Reynolds number.
fn aero_input(
    axes: &AeroAxes,
    air: &AirProperties,
    diameter_m: f64,
    speed_mps: f64,
    angular_velocity_rad_s: &Vector3<f64>,
    spin_rad_s: f64,
) -> AeroInput {
    let advance_ratio = if speed_mps > 0.0 { spin_rad_s.abs() * diameter_m * (0.5 * speed_mps.recip()) } else { 0.0 };
    let reynolds_number = if air.dynamic_viscosity_pa_s > 0.0 {
        air.density_kg_m3 * speed_mps * diameter_m / air.dynamic_viscosity_pa_s
    } else {
        0.0
    };
    AeroInput {
        angle_of_attack_rad: if speed_mps > 0.0 { axes.alpha_rad } else { 0.0 },
        airspeed_mps: speed_mps,
        spin_rad_s,
        pitch_rate_rad_s: angular_velocity_rad_s.dot(&axes.pitch_axis),
        roll_rate_rad_s: angular_velocity_rad_s.dot(&axes.roll_axis),
        advance_ratio: if advance_ratio.is_finite() { advance_ratio } else { 0.0 },
        reynolds_number: if reynolds_number.is_finite() { reynolds_number } else { 0.0 },
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::aero::model::ModelInfo;

    /// A model with fixed coefficients, to see the assembly alone.
    #[derive(Debug)]
    struct Fixed(AeroCoefficients);

    impl AeroModel for Fixed {
        fn coefficients(&self, _input: &AeroInput) -> AeroCoefficients {
            self.0
        }
        fn info(&self) -> ModelInfo {
            ModelInfo { name: "fixed".into(), source: "test".into(), confidence: "test".into() }
        }
    }

    fn loads_for(c: AeroCoefficients, v: Vector3<f64>, n: Vector3<f64>, w: Vector3<f64>) -> AeroLoads {
        let spin = w.dot(&n);
        aero_loads(&Fixed(c), &AirProperties::sea_level_standard(), 0.2, &v, &n, &w, spin)
    }

    fn coeffs(lift: f64, drag: f64, roll: f64, pitch: f64, spin: f64) -> AeroCoefficients {
        AeroCoefficients { lift, drag, roll, pitch, spin }
    }

    #[test]
    fn lift_is_up_and_drag_is_back_in_level_flight() {
        let l = loads_for(coeffs(1.0, 0.0, 0.0, 0.0, 0.0), Vector3::x() * 20.0, Vector3::z(), Vector3::zeros());
        assert!(l.force_n.z > 0.0 && l.force_n.x.abs() < 1e-12 && l.force_n.y.abs() < 1e-12);
        let d = loads_for(coeffs(0.0, 1.0, 0.0, 0.0, 0.0), Vector3::x() * 20.0, Vector3::z(), Vector3::zeros());
        assert!(d.force_n.x < 0.0 && d.force_n.z.abs() < 1e-12);
        // q∞ A = ½·1.225·400·π·0.01 (common practice, no published source: definition)
        let expected = 0.5 * 1.225 * 400.0 * std::f64::consts::PI * 0.01;
        assert!((l.force_n.z - expected).abs() < 1e-9 * expected);
    }

    #[test]
    fn lift_is_perpendicular_to_the_airflow_at_an_angle() {
        let v = Vector3::new(20.0, 0.0, -5.0);
        let l = loads_for(coeffs(1.0, 0.0, 0.0, 0.0, 0.0), v, Vector3::z(), Vector3::zeros());
        assert!(l.force_n.dot(&v).abs() < 1e-9);
        assert!(l.force_n.z > 0.0);
    }

    #[test]
    fn air_on_the_underside_is_positive_alpha() {
        let falling = loads_for(AeroCoefficients::default(), Vector3::new(20.0, 0.0, -2.0), Vector3::z(), Vector3::zeros());
        assert!((falling.input.angle_of_attack_rad - (2.0f64 / 20.0).atan()).abs() < 1e-12);
        let climbing = loads_for(AeroCoefficients::default(), Vector3::new(20.0, 0.0, 2.0), Vector3::z(), Vector3::zeros());
        assert!(climbing.input.angle_of_attack_rad < 0.0);
    }

    #[test]
    fn positive_pitch_moment_raises_the_leading_edge() {
        let l = loads_for(coeffs(0.0, 0.0, 0.0, 1.0, 0.0), Vector3::x() * 20.0, Vector3::z(), Vector3::zeros());
        // A small rotation by the moment direction carries the leading edge (+x) upward.
        let leading_edge_velocity = l.moment_nm.cross(&Vector3::x());
        assert!(leading_edge_velocity.z > 0.0);
    }

    #[test]
    fn roll_and_spin_moments_lie_on_their_axes() {
        let l = loads_for(coeffs(0.0, 0.0, 1.0, 0.0, -1.0), Vector3::x() * 20.0, Vector3::z(), Vector3::zeros());
        assert!(l.moment_nm.x > 0.0 && l.moment_nm.y.abs() < 1e-12 && l.moment_nm.z < 0.0);
    }

    #[test]
    fn rates_are_read_on_the_aero_axes() {
        let w = Vector3::new(1.0, -2.0, -90.0);
        let l = loads_for(AeroCoefficients::default(), Vector3::x() * 20.0, Vector3::z(), w);
        assert_eq!(l.input.roll_rate_rad_s, 1.0);
        assert_eq!(l.input.pitch_rate_rad_s, 2.0); // e_p = x × z = −y
        assert!((l.input.advance_ratio - 90.0 * 0.1 / 20.0).abs() < 1e-12);
    }

    #[test]
    fn degenerate_states_give_finite_loads() {
        let c = coeffs(1.0, 1.0, 1.0, 1.0, 1.0);
        let still = loads_for(c, Vector3::zeros(), Vector3::z(), Vector3::z());
        assert_eq!(still.force_n, Vector3::zeros());
        let flat_fall = loads_for(c, Vector3::new(0.0, 0.0, -5.0), Vector3::z(), Vector3::z());
        assert!(flat_fall.force_n.iter().chain(flat_fall.moment_nm.iter()).all(|x| x.is_finite()));
        assert!(flat_fall.force_n.z > 0.0 && flat_fall.force_n.x == 0.0);
        assert!((flat_fall.input.angle_of_attack_rad - std::f64::consts::FRAC_PI_2).abs() < 1e-12);
        let vacuum = aero_loads(&Fixed(c), &AirProperties::vacuum(), 0.2, &Vector3::x(), &Vector3::z(), &Vector3::z(), 1.0);
        assert_eq!(vacuum.moment_nm, Vector3::zeros());
    }
}
