//! Landing location, release construction and metric definitions.
use spinfoil_engine::*;

use super::*;

#[test]
fn landing_is_located_on_the_ground_to_well_under_a_millimetre() {
    // common practice, no published source: the reported landing must lie on the event surface
    let body = hummel_body();
    for (i, settings) in [FlightSettings::default(), FlightSettings { record_samples: false, ..FlightSettings::default() }].iter().enumerate() {
        let r = release(22.0 + i as f64, 85.0, 0.17, 0.02, 0.15);
        let flight = fly(&body, &LinearTestModel, &r, &FlightConditions::default(), settings).unwrap();
        let z_low = flight.landing_state.lowest_rim_height_m(body.radius_m());
        assert!(z_low.abs() < 1e-6, "z_low at landing = {z_low} m");
        assert!(flight.landed && flight.metrics.time_aloft_s > 1.0);
        for s in &flight.samples {
            let st = DiscState { position_m: s.position_m, velocity_mps: s.velocity_mps, normal: s.normal, normal_rate_per_s: Default::default(), spin_rad_s: s.spin_rad_s };
            assert!(st.lowest_rim_height_m(body.radius_m()) > -1e-6, "the first contact, not a later one");
        }
    }
}

#[test]
fn release_sample_reproduces_the_release_angles_for_every_style_and_hand() {
    // common practice, no published source: the documented construction of n is invertible
    let body = hummel_body();
    for (style, hand) in [(Style::Backhand, Hand::Right), (Style::Forehand, Hand::Right), (Style::Backhand, Hand::Left), (Style::Forehand, Hand::Left)] {
        let r = ReleaseState { style, hand, heading_rad: 0.3, ..release(20.0, 80.0, 0.2, 0.05, 0.25) };
        let flight = fly(&body, &LinearTestModel, &r, &FlightConditions::default(), &FlightSettings::default()).unwrap();
        let s0 = flight.samples[0];
        assert!((s0.roll_rad - 0.25).abs() < 1e-12, "{style:?} {hand:?}: {}", s0.roll_rad);
        assert!((s0.angle_of_attack_rad - 0.05).abs() < 1e-12);
        assert!((s0.spin_rad_s - r.signed_spin_rad_s()).abs() < 1e-12);
        // hyzer tilts n toward the fade side: the lift leans that way
        let lateral = -0.3f64.sin() * s0.normal.x + 0.3f64.cos() * s0.normal.y;
        assert!(lateral * r.fade_side() > 0.0);
    }
}

#[test]
fn metrics_follow_their_definitions() {
    // common practice, no published source: definitions in FlightMetrics' docs
    let body = hummel_body();
    let r = ReleaseState { roll_rad: -0.25, ..release(24.0, 90.0, 0.17, 0.0, -0.25) };
    let flight = fly(&body, &LinearTestModel, &r, &FlightConditions::default(), &FlightSettings::default()).unwrap();
    let m = flight.metrics;
    let last = flight.samples.last().unwrap();
    assert_eq!(last.time_s, m.time_aloft_s);
    assert!((m.carry_m - last.position_m.x.hypot(last.position_m.y)).abs() < 1e-12);
    let apex_sampled = flight.samples.iter().map(|s| s.position_m.z).fold(f64::MIN, f64::max);
    assert!(m.apex_m >= apex_sampled && m.apex_m - apex_sampled < 1e-3);
    // an anhyzer right-hand backhand drifts right (turn side, −y) first
    let most_right = flight.samples.iter().map(|s| -s.position_m.y).fold(0.0, f64::max);
    assert!(m.turn_m > 0.0 && m.turn_m >= most_right && m.turn_m - most_right < 1e-3);
    assert!(m.fade_m >= 0.0);
    assert!((m.fade_m - (last.position_m.y + m.turn_m)).abs() < 1e-9);
    assert!(m.landing_angle_rad > 0.0 && m.landing_speed_mps > 0.0);
    assert!(m.spin_kept_fraction > 0.5 && m.spin_kept_fraction < 1.0);
    assert!(m.landing_angular_momentum_kg_m2_s < m.release_angular_momentum_kg_m2_s);
    let v = last.velocity_mps;
    assert!((m.heading_change_rad - v.y.atan2(v.x)).abs() < 1e-12);
}

#[test]
fn default_tolerances_land_within_a_millimetre_of_precise_ones() {
    // common practice, no published source: a tighter-tolerance run of the same integrator as
    // the reference for the default settings' accuracy
    let body = hummel_body();
    for (speed, roll) in [(18.0, 0.2), (24.0, -0.3), (27.0, 0.0)] {
        let r = release(speed, 90.0, 0.17, 0.03, roll);
        let c = FlightConditions::default();
        let a = fly(&body, &LinearTestModel, &r, &c, &FlightSettings::default()).unwrap();
        let b = fly(&body, &LinearTestModel, &r, &c, &FlightSettings::precise()).unwrap();
        let d = (a.landing_state.position_m - b.landing_state.position_m).norm();
        assert!(d < 1e-3, "{d} m");
        assert!((a.metrics.time_aloft_s - b.metrics.time_aloft_s).abs() < 1e-4);
    }
}

#[test]
fn metrics_do_not_depend_on_the_release_heading_in_calm_air() {
    // common practice, no published source: rotational symmetry about the vertical in calm air
    let body = hummel_body();
    let r = release(23.0, 88.0, 0.16, 0.02, -0.2);
    let s = FlightSettings::precise();
    let a = fly(&body, &LinearTestModel, &r, &FlightConditions::default(), &s).unwrap().metrics;
    let b = fly(&body, &LinearTestModel, &ReleaseState { heading_rad: 0.7, ..r }, &FlightConditions::default(), &s).unwrap().metrics;
    for (x, y) in [
        (a.carry_m, b.carry_m),
        (a.turn_m, b.turn_m),
        (a.fade_m, b.fade_m),
        (a.apex_m, b.apex_m),
        (a.heading_change_rad, b.heading_change_rad),
        (a.landing_lateral_m, b.landing_lateral_m),
        (a.landing_downrange_m, b.landing_downrange_m),
    ] {
        assert!((x - y).abs() < 1e-6, "{x} vs {y}");
    }
    assert!((b.landing_position_m.y.atan2(b.landing_position_m.x) - a.landing_position_m.y.atan2(a.landing_position_m.x) - 0.7).abs() < 1e-8);
}
