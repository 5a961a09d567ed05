//! Any release inside the validated ranges gives a finite flight or a typed error, never NaN.
use rand::{Rng, SeedableRng};
use rand_chacha::ChaCha8Rng;
use spinfoil_engine::*;

use super::*;

fn random_release(rng: &mut ChaCha8Rng) -> ReleaseState {
    use std::f64::consts::FRAC_PI_2;
    let styles = [Style::Backhand, Style::Forehand];
    let hands = [Hand::Right, Hand::Left];
    ReleaseState {
        speed_mps: rng.gen_range(0.0..45.0),
        spin_rad_s: rng.gen_range(0.0..200.0),
        launch_rad: rng.gen_range(-FRAC_PI_2..FRAC_PI_2),
        nose_rad: rng.gen_range(-FRAC_PI_2..FRAC_PI_2),
        roll_rad: rng.gen_range(-FRAC_PI_2..FRAC_PI_2),
        heading_rad: rng.gen_range(-3.0..3.0),
        height_m: rng.gen_range(0.15..3.0),
        off_axis_rate_rad_s: rng.gen_range(0.0..30.0),
        off_axis_direction_rad: rng.gen_range(-3.0..3.0),
        style: styles[rng.gen_range(0..2)],
        hand: hands[rng.gen_range(0..2)],
    }
}

#[test]
fn random_releases_give_finite_flights() {
    // common practice, no published source: no NaN may leave the engine
    let mut rng = ChaCha8Rng::seed_from_u64(7);
    let body = hummel_body();
    let model = hummel_2003();
    let (mut landed, mut rejected) = (0, 0);
    for _ in 0..150 {
        let r = random_release(&mut rng);
        match fly(&body, &model, &r, &FlightConditions::default(), &FlightSettings::default()) {
            Ok(f) => {
                landed += 1;
                let m = serde_json::to_value(f.metrics).unwrap();
                for (name, value) in m.as_object().unwrap() {
                    // null is "never" for the optional time to halve the wobble, NaN elsewhere
                    let optional = name == "wobble_half_time_s";
                    assert!(optional || !value.to_string().contains("null"), "{name} is not finite for {r:?}");
                }
                assert!(f.metrics.wobble_half_time_s.is_none_or(|t| t.is_finite() && t >= 0.0));
                assert!(f.samples.iter().all(|s| s.position_m.iter().all(|x| x.is_finite()) && s.roll_rad.is_finite()
                    && s.angle_of_attack_rad.is_finite() && s.wobble_rad.is_finite()));
                assert!(f.landing_state.lowest_rim_height_m(body.radius_m()).abs() < 1e-6);
            }
            Err(FlightError::InvalidRelease { field: "height_m", .. }) => rejected += 1,
            Err(e) => panic!("unexpected error {e} for {r:?}"),
        }
    }
    assert!(landed > 100, "{landed} landed, {rejected} rejected as starting below ground");
}
