//! Gyroscopic response to a constant pitching moment: precession rate, roll direction by style
//! and hand, mirror symmetry, and the effect of a larger spin moment of inertia.
use spinfoil_engine::*;

use super::*;
use crate::common::rel_diff;

const PITCH: f64 = 0.01;
const SPEED: f64 = 20.0;

/// A level throw at zero angle of attack, flown 0.5 s without gravity, so only the pitching
/// moment acts (no lift, no drag: the speed and the moment stay constant).
fn roll_flight(body: &DiscBody, pitch: f64, spin: f64, style: Style, hand: Hand) -> Flight {
    let r = ReleaseState { style, hand, ..release(SPEED, spin, 0.0, 0.0, 0.0) };
    fly(body, &constant_pitch(pitch), &r, &conditions(0.0), &timed(0.5, 0.002)).unwrap()
}

/// Roll rate in rad/s (positive toward the fade side), fitted over the flight.
fn roll_rate(flight: &Flight) -> f64 {
    let t: Vec<f64> = flight.samples.iter().map(|s| s.time_s).collect();
    let roll: Vec<f64> = flight.samples.iter().map(|s| s.roll_rad).collect();
    slope(&t, &roll)
}

/// τ = q∞ A d C_M with q∞ = ½ρV².
fn moment(body: &DiscBody, pitch: f64) -> f64 {
    0.5 * AirProperties::sea_level_standard().density_kg_m3 * SPEED * SPEED * body.area_m2() * body.diameter_m * pitch
}

#[test]
fn constant_pitching_moment_precesses_at_torque_over_spin_momentum() {
    // source: Kleppner & Kolenkow (2014), An Introduction to Mechanics 2nd ed., ch. 7
    // (steady gyroscopic precession Ω = τ / (I ω)); CHECKS.md
    let body = hummel_body();
    for spin in [60.0, 100.0] {
        let flight = roll_flight(&body, PITCH, spin, Style::Backhand, Hand::Right);
        let expected = moment(&body, PITCH) / (body.spin_inertia_kg_m2 * spin);
        assert!(rel_diff(roll_rate(&flight), expected) < 0.01, "{} vs {expected}", roll_rate(&flight));
    }
}

#[test]
fn nose_up_rolls_toward_the_fade_side_for_every_style_and_hand() {
    // source: PHYSICS.md "Aerodynamics" (right-hand backhand: nose-up rolls left, its fade side;
    // nose-down rolls right, its turn side; forehand and left hand mirror), common practice
    let body = hummel_body();
    for (style, hand) in [(Style::Backhand, Hand::Right), (Style::Forehand, Hand::Right), (Style::Backhand, Hand::Left), (Style::Forehand, Hand::Left)] {
        let fade_side = ReleaseState { style, hand, ..release(SPEED, 80.0, 0.0, 0.0, 0.0) }.fade_side();
        let up = roll_flight(&body, PITCH, 80.0, style, hand);
        let down = roll_flight(&body, -PITCH, 80.0, style, hand);
        assert!(roll_rate(&up) > 0.0 && roll_rate(&down) < 0.0, "{style:?} {hand:?}");
        // nose-up tilts the axis toward the fade side in the world (left = +y)
        assert!(up.landing_state.normal.y * fade_side > 0.0);
        assert!(down.landing_state.normal.y * fade_side < 0.0);
    }
    let rhbh = roll_flight(&body, PITCH, 80.0, Style::Backhand, Hand::Right);
    assert!(rhbh.landing_state.normal.y > 0.0, "right-hand backhand, nose-up: rolls left");
}

#[test]
fn a_left_hand_flight_is_the_mirror_image_of_the_right_hand_one() {
    // source: mirror symmetry of Newton–Euler mechanics (y → −y, spin reversed),
    // common practice, no published source
    let body = hummel_body();
    for style in [Style::Backhand, Style::Forehand] {
        let mut right = ReleaseState { style, ..release(24.0, 95.0, 0.17, 0.03, 0.2) };
        right.off_axis_rate_rad_s = 3.0;
        right.off_axis_direction_rad = 0.4;
        // the wobble's direction is measured from forward toward the (absolute) left, and the
        // transverse angular velocity is an axial vector: its mirror image points at π − β
        let left = ReleaseState { hand: Hand::Left, off_axis_direction_rad: std::f64::consts::PI - 0.4, ..right };
        let settings = FlightSettings::default();
        let a = fly(&body, &LinearTestModel, &right, &FlightConditions::default(), &settings).unwrap();
        let b = fly(&body, &LinearTestModel, &left, &FlightConditions::default(), &settings).unwrap();
        assert_eq!(a.samples.len(), b.samples.len());
        for (p, q) in a.samples.iter().zip(&b.samples) {
            let mirrored = nalgebra::Vector3::new(q.position_m.x, -q.position_m.y, q.position_m.z);
            assert!((p.position_m - mirrored).norm() < 1e-9);
            assert!((p.spin_rad_s + q.spin_rad_s).abs() < 1e-9);
            assert!((p.roll_rad - q.roll_rad).abs() < 1e-9);
        }
        let (m, n) = (a.metrics, b.metrics);
        assert!((m.turn_m - n.turn_m).abs() < 1e-9 && (m.fade_m - n.fade_m).abs() < 1e-9);
        assert!((m.heading_change_rad - n.heading_change_rad).abs() < 1e-9);
        assert!((m.landing_lateral_m - n.landing_lateral_m).abs() < 1e-9);
    }
}

#[test]
fn same_effort_rim_heavy_disc_spins_slower_carries_more_momentum_and_rolls_less() {
    // source: work–energy theorem, τθ = ½ I ω² (Kleppner & Kolenkow (2014), ch. 7; CHECKS.md):
    // spin ∝ 1/√I_z, H ∝ √I_z; precession Ω = τ/(I_z ω) ∝ 1/√I_z
    let one_piece = MassProperties { mass_kg: 0.175, cg_height_m: 0.01, spin_inertia_kg_m2: 0.00235, transverse_inertia_kg_m2: 0.00122 };
    let rim_heavy = MassProperties { spin_inertia_kg_m2: 1.3 * 0.00235, transverse_inertia_kg_m2: 1.3 * 0.00122, ..one_piece };
    let throw = EffortThrow { effort: Effort::Independent(IndependentEffort::new(60.0, 4.0, 1.2)), pose: ReleasePose::default() };
    let fly_one = |mass: &MassProperties| {
        let body = DiscBody::from_mass_properties(mass, 0.269);
        let r = throw.release(mass, body.radius_m()).unwrap();
        let flight = fly(&body, &constant_pitch(PITCH), &r, &conditions(0.0), &timed(0.5, 0.002)).unwrap();
        (r, flight)
    };
    let ((ra, a), (rb, b)) = (fly_one(&one_piece), fly_one(&rim_heavy));
    assert_eq!(ra.speed_mps, rb.speed_mps);
    let ratio = (one_piece.spin_inertia_kg_m2 / rim_heavy.spin_inertia_kg_m2).sqrt();
    assert!(rel_diff(b.metrics.release_spin_rad_s / a.metrics.release_spin_rad_s, ratio) < 1e-9);
    assert!(rel_diff(a.metrics.release_angular_momentum_kg_m2_s / b.metrics.release_angular_momentum_kg_m2_s, ratio) < 1e-9);
    assert!(b.metrics.max_axis_rate_rad_s < a.metrics.max_axis_rate_rad_s);
    // the same speed gives the same moment, so the roll rate scales as 1/(I_z ω) ∝ 1/√I_z
    assert!(rel_diff(roll_rate(&b) / roll_rate(&a), ratio) < 0.01);
}
