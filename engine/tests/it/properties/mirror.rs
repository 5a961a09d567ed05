//! Mirror symmetry: a left-hand throw is the mirror image of the same right-hand throw across
//! the vertical x–z plane (y → −y), with every metric unchanged.
use crate::flight::hummel_body;
use proptest::prelude::*;
use spinfoil_engine::*;

fn mirrored(v: &nalgebra::Vector3<f64>) -> nalgebra::Vector3<f64> {
    nalgebra::Vector3::new(v.x, -v.y, v.z)
}

proptest! {
    #![proptest_config(super::config(48))]

    /// source: physics law (reflection symmetry of Newton's and Euler's equations: a mirror
    /// image reverses the spin's sense, and the disc, air and gravity are symmetric under the
    /// reflection y → −y).
    #[test]
    fn a_left_hand_throw_mirrors_the_right_hand_one(
        speed in 10.0f64..30.0,
        spin in 40.0f64..140.0,
        launch in -0.05f64..0.3,
        nose in -0.1f64..0.15,
        roll in -0.5f64..0.5,
        heading in -0.4f64..0.4,
        off_axis in 0.0f64..5.0,
        off_axis_direction in -3.0f64..3.0,
        style in prop::sample::select(vec![Style::Backhand, Style::Forehand]),
    ) {
        let body = hummel_body();
        let model = hummel_2003();
        let right = ReleaseState {
            speed_mps: speed, spin_rad_s: spin, launch_rad: launch, nose_rad: nose, roll_rad: roll,
            heading_rad: heading, height_m: 1.2, off_axis_rate_rad_s: off_axis,
            off_axis_direction_rad: off_axis_direction, style, hand: Hand::Right,
        };
        // The off-axis rate is an angular velocity, an axial vector: the reflection y → −y maps
        // (ω_x, ω_y, ω_z) to (−ω_x, ω_y, −ω_z), so its in-plane direction θ becomes π − θ.
        let left = ReleaseState {
            heading_rad: -heading,
            off_axis_direction_rad: std::f64::consts::PI - off_axis_direction,
            hand: Hand::Left,
            ..right
        };
        let conditions = FlightConditions::default();
        let a = fly(&body, &model, &right, &conditions, &FlightSettings::default()).expect("right-hand flight");
        let b = fly(&body, &model, &left, &conditions, &FlightSettings::default()).expect("left-hand flight");
        prop_assert_eq!(a.samples.len(), b.samples.len());
        for (s, m) in a.samples.iter().zip(&b.samples) {
            prop_assert!((mirrored(&s.position_m) - m.position_m).norm() < 1e-6, "at {} s: {} vs {}", s.time_s, s.position_m, m.position_m);
            prop_assert!((mirrored(&s.normal) - m.normal).norm() < 1e-7);
            prop_assert!((s.roll_rad - m.roll_rad).abs() < 1e-7, "roll (hyzer positive on each hand's fade side)");
        }
        let (ma, mb) = (&a.metrics, &b.metrics);
        for (x, y, what) in [
            (ma.carry_m, mb.carry_m, "carry"),
            (ma.turn_m, mb.turn_m, "turn"),
            (ma.fade_m, mb.fade_m, "fade"),
            (ma.landing_lateral_m, mb.landing_lateral_m, "lateral offset toward the fade side"),
            (ma.time_aloft_s, mb.time_aloft_s, "time aloft"),
        ] {
            prop_assert!((x - y).abs() < 1e-6, "{what}: {x} vs {y}");
        }
    }
}
