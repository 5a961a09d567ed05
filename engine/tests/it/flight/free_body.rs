//! The torque-free symmetric top: a wobbling disc with no air and no gravity.
use nalgebra::Vector3;
use spinfoil_engine::*;

use super::*;
use crate::common::rel_diff;

/// A right-hand forehand (ω_s > 0) with a wobble, flown 1 s in a vacuum without gravity.
fn wobbling_flight(body: &DiscBody) -> Flight {
    let mut r = release(20.0, 100.0, 0.1, 0.0, 0.2);
    r.style = Style::Forehand;
    r.off_axis_rate_rad_s = 15.0;
    r.off_axis_direction_rad = 0.7;
    fly(body, &LinearTestModel, &r, &vacuum(0.0), &timed(1.0, 0.001)).unwrap()
}

#[test]
fn torque_free_disc_keeps_its_angular_momentum() {
    // source: Goldstein, Poole & Safko (2002), Classical Mechanics 3rd ed., §5.6
    // (torque-free body: H and the kinetic energy are constant)
    let body = hummel_body();
    let flight = wobbling_flight(&body);
    // the flight really ran its full second: uniform straight motion of the centre of mass
    // (Newton's first law) to the end state
    let (r0, v0) = (flight.release_state.position_m, flight.release_state.velocity_mps);
    assert_eq!(flight.metrics.time_aloft_s, 1.0);
    assert!((flight.landing_state.position_m - (r0 + v0 * 1.0)).norm() < 1e-9);
    assert!(!flight.landed);
    let h0 = flight.release_state.angular_momentum(&body);
    let h1 = flight.landing_state.angular_momentum(&body);
    assert!((flight.landing_state.normal - flight.release_state.normal).norm() > 0.01, "the axis has moved");
    assert!((h1 - h0).norm() / h0.norm() < 1e-8, "{}", (h1 - h0).norm() / h0.norm());
    assert!(rel_diff(flight.landing_state.kinetic_energy_j(&body), flight.release_state.kinetic_energy_j(&body)) < 1e-8);
    // the wobble angle (n against the line of H) stays constant
    let w0 = flight.samples[0].wobble_rad;
    assert!(w0 > 0.05);
    for s in &flight.samples {
        assert!((s.wobble_rad - w0).abs() < 1e-7);
        assert!((s.normal.norm() - 1.0).abs() < 1e-12);
    }
}

#[test]
fn wobble_cones_at_the_textbook_rates() {
    // source: Goldstein, Poole & Safko (2002), Classical Mechanics 3rd ed., §5.6: the symmetry
    // axis cones about H at φ̇ = I₃ω₃/(I₁ cos θ); in the body the angular velocity precesses about
    // the axis at Ω_b = ω₃(I₃ − I₁)/I₁ (Euler's kinematics ω₃ = φ̇ cos θ + ψ̇, Goldstein §4.9,
    // gives the body rate |ψ̇| = φ̇ cos θ − ω₃ from the measured φ̇)
    let body = hummel_body();
    let flight = wobbling_flight(&body);
    let h = flight.release_state.angular_momentum(&body);
    let axis = h.normalize();
    let e1 = axis.cross(&Vector3::x()).normalize();
    let e2 = axis.cross(&e1);
    let times: Vec<f64> = flight.samples.iter().map(|s| s.time_s).collect();
    let mut azimuth = Vec::new();
    let mut last: f64 = 0.0;
    for s in &flight.samples {
        let raw = s.normal.dot(&e2).atan2(s.normal.dot(&e1));
        let unwrapped = last + (raw - last + std::f64::consts::PI).rem_euclid(std::f64::consts::TAU) - std::f64::consts::PI;
        azimuth.push(unwrapped);
        last = unwrapped;
    }
    let cone_rate = slope(&times, &azimuth).abs();
    let (i3, i1) = (body.spin_inertia_kg_m2, body.transverse_inertia_kg_m2);
    let omega3 = flight.release_state.spin_rad_s;
    let cos_theta = flight.release_state.normal.dot(&axis);
    let expected_cone = i3 * omega3 / (i1 * cos_theta);
    assert!(rel_diff(cone_rate, expected_cone) < 0.005, "{cone_rate} vs {expected_cone}");
    let body_rate = cone_rate * cos_theta - omega3;
    let expected_body = omega3 * (i3 - i1) / i1;
    assert!(rel_diff(body_rate, expected_body) < 0.005, "{body_rate} vs {expected_body}");
    // a flat disc (I₃ ≈ 2 I₁) wobbles at about twice its spin rate (CHECKS.md)
    assert!((cone_rate / omega3 - 2.0).abs() < 0.1);
}

#[test]
fn release_wobble_decays_through_aerodynamic_damping() {
    // common practice, no published source (PHYSICS.md: wobble decays through aerodynamic
    // damping): pitch- and roll-damping moments oppose the transverse rates
    let body = hummel_body();
    let mut r = release(22.0, 90.0, 0.15, 0.03, 0.0);
    r.off_axis_rate_rad_s = 10.0;
    let flight = fly(&body, &LinearTestModel, &r, &conditions(STANDARD_GRAVITY_MPS2), &FlightSettings::default()).unwrap();
    let at = |t: f64| flight.samples.iter().find(|s| s.time_s >= t).unwrap().wobble_rad;
    assert!(at(0.0) > 0.05);
    assert!(at(1.0) < 0.2 * at(0.0), "{} → {}", at(0.0), at(1.0));
}
