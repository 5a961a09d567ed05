//! Point-mass ballistics in a vacuum.
use spinfoil_engine::*;

use super::*;
use crate::common::rel_diff;

/// A level disc (n = z) launched from ground level: the centre of mass starts at z = 0, the
/// level rim therefore too, and the flight ends when the rim (= centre) returns to z = 0.
fn ground_level_throw(speed: f64, launch: f64) -> ReleaseState {
    ReleaseState { height_m: 0.0, nose_rad: -launch, ..release(speed, 60.0, launch, 0.0, 0.0) }
}

#[test]
fn vacuum_range_matches_the_parabola() {
    // source: Kleppner & Kolenkow (2014), An Introduction to Mechanics 2nd ed., ch. 1
    // (projectile range v² sin 2θ / g from ground level); g0 = 9.80665 m/s² (CGPM 1901)
    let g = STANDARD_GRAVITY_MPS2;
    for (speed, launch_deg) in [(20.0, 30.0), (25.0, 10.0), (12.0, 45.0)] {
        let launch = f64::to_radians(launch_deg);
        let r = ground_level_throw(speed, launch);
        let flight = fly(&hummel_body(), &LinearTestModel, &r, &vacuum(g), &FlightSettings::precise()).unwrap();
        let range = speed * speed * (2.0 * launch).sin() / g;
        let time = 2.0 * speed * launch.sin() / g;
        assert!(rel_diff(flight.metrics.carry_m, range) < 1e-6, "{} vs {range}", flight.metrics.carry_m);
        assert!(rel_diff(flight.metrics.time_aloft_s, time) < 1e-6);
        let apex = (speed * launch.sin()).powi(2) / (2.0 * g);
        assert!(rel_diff(flight.metrics.apex_m, apex) < 1e-8);
        assert!(flight.landed);
    }
}

#[test]
fn vacuum_flight_conserves_energy_and_angular_momentum() {
    // source: conservation of mechanical energy and of angular momentum without torque,
    // Goldstein, Poole & Safko (2002), Classical Mechanics 3rd ed., §1.2 and §5.5
    let body = hummel_body();
    let mut r = release(22.0, 90.0, 0.2, 0.05, 0.3);
    r.height_m = 1.2;
    r.off_axis_rate_rad_s = 8.0;
    let flight = fly(&body, &LinearTestModel, &r, &vacuum(STANDARD_GRAVITY_MPS2), &FlightSettings::precise()).unwrap();
    let energy = |s: &FlightSample| {
        0.5 * body.mass_kg * s.velocity_mps.norm_squared() + body.mass_kg * STANDARD_GRAVITY_MPS2 * s.position_m.z
    };
    let e0 = energy(&flight.samples[0]);
    for s in &flight.samples {
        assert!(rel_diff(energy(s), e0) < 1e-9);
    }
    let h0 = flight.release_state.angular_momentum(&body);
    let h1 = flight.landing_state.angular_momentum(&body);
    assert!((h1 - h0).norm() / h0.norm() < 1e-8);
    let rotational = |st: &DiscState| st.kinetic_energy_j(&body) - 0.5 * body.mass_kg * st.velocity_mps.norm_squared();
    assert!(rel_diff(rotational(&flight.landing_state), rotational(&flight.release_state)) < 1e-8);
}
