use nalgebra::Vector3;

use super::{DiscBody, DiscState, StateVector};

/// External loads on the disc other than gravity, world frame.
#[derive(Debug, Clone, Copy, Default, PartialEq)]
pub struct Loads {
    /// Force on the centre of mass in N.
    pub force_n: Vector3<f64>,
    /// Moment about the centre of mass in N·m.
    pub moment_nm: Vector3<f64>,
}

/// Time derivative of the state, in the solver's layout (see [`StateVector`]).
///
/// `state` must already be projected ([`DiscState::projected`]): unit **n**, **ṅ** ⟂ **n**.
/// `gravity_mps2` is g ≥ 0, acting along −z.
///
/// - m **v̇** = **F** + m **g**
/// - I_z ω̇_s = **M**·**n**
/// - **n̈** = −|**ṅ**|² **n** + (I_z ω_s **n** × **ṅ** − **n** × **M**) / I_x
///
/// (derivation in the [module docs](crate::dynamics)).
pub fn state_derivative(body: &DiscBody, state: &DiscState, loads: &Loads, gravity_mps2: f64) -> StateVector {
    let mut d = StateVector::zeros();
    let acceleration = loads.force_n / body.mass_kg - Vector3::z() * gravity_mps2;
    d.fixed_rows_mut::<3>(0).copy_from(&state.velocity_mps);
    d.fixed_rows_mut::<3>(3).copy_from(&acceleration);
    d.fixed_rows_mut::<3>(6).copy_from(&state.normal_rate_per_s);
    d.fixed_rows_mut::<3>(9).copy_from(&normal_acceleration(body, state, &loads.moment_nm));
    d[12] = loads.moment_nm.dot(&state.normal) / body.spin_inertia_kg_m2;
    d
}

/// **n̈** = −|**ṅ**|² **n** + (I_z ω_s **n** × **ṅ** − **n** × **M**) / I_x, in 1/s².
pub fn normal_acceleration(body: &DiscBody, state: &DiscState, moment_nm: &Vector3<f64>) -> Vector3<f64> {
    let n = &state.normal;
    let n_dot = &state.normal_rate_per_s;
    let gyroscopic = n.cross(n_dot) * (body.spin_inertia_kg_m2 * state.spin_rad_s);
    -n * n_dot.norm_squared() + (gyroscopic - n.cross(moment_nm)) / body.transverse_inertia_kg_m2
}

#[cfg(test)]
mod tests {
    use super::*;

    fn body() -> DiscBody {
        DiscBody { mass_kg: 0.175, spin_inertia_kg_m2: 0.00235, transverse_inertia_kg_m2: 0.00122, diameter_m: 0.269 }
    }

    fn state() -> DiscState {
        DiscState {
            position_m: Vector3::zeros(),
            velocity_mps: Vector3::new(20.0, 0.0, 2.0),
            normal: Vector3::new(0.1, -0.2, 1.0).normalize(),
            normal_rate_per_s: Vector3::zeros(),
            spin_rad_s: -80.0,
        }
        .projected()
    }

    /// dH/dt computed from the derivative equals the applied moment (Euler's law for the
    /// angular momentum about the centre of mass).
    #[test]
    fn rate_of_angular_momentum_equals_moment() {
        // source: Goldstein, Poole & Safko (2002), Classical Mechanics 3rd ed., §5.5 (dL/dt = N)
        let b = body();
        let mut s = state();
        s.normal_rate_per_s = Vector3::new(0.5, 3.0, 0.0);
        let s = s.projected();
        let m = Loads { force_n: Vector3::zeros(), moment_nm: Vector3::new(0.03, -0.01, 0.002) };
        let d = state_derivative(&b, &s, &m, 9.80665);
        let n_dd = Vector3::new(d[9], d[10], d[11]);
        let h_dot = s.normal * (b.spin_inertia_kg_m2 * d[12])
            + s.normal_rate_per_s * (b.spin_inertia_kg_m2 * s.spin_rad_s)
            + s.normal.cross(&n_dd) * b.transverse_inertia_kg_m2;
        assert!((h_dot - m.moment_nm).norm() < 1e-15);
        // |n| and n·ṅ stay constant: n·n̈ = −|ṅ|²
        assert!((s.normal.dot(&n_dd) + s.normal_rate_per_s.norm_squared()).abs() < 1e-12);
    }

    #[test]
    fn free_fall_without_loads() {
        // source: Newton's second law with standard gravity g0 = 9.80665 m/s² (CGPM 1901)
        let d = state_derivative(&body(), &state(), &Loads::default(), 9.80665);
        assert_eq!(d[5], -9.80665);
        assert_eq!(d[12], 0.0);
        assert_eq!(d[0], 20.0);
    }
}
