//! Integration tests: ground (surfaces, rim contact, impacts, ground play until rest).
use nalgebra::Vector3;
use proptest::prelude::*;
use rand::{Rng, SeedableRng};
use rand_chacha::ChaCha8Rng;
use spinfoil_engine::{
    demo_driver, fly_to_rest, lowest_rim_point, play_out_landing, resolve_impact, ContactBody, ContactState, DiscBody,
    FlightConditions, FlightSettings, FlightToRest, Ground, GroundEnding, GroundError, GroundPhase, GroundPlane,
    GroundPlay, GroundSample, GroundSettings, Hand, ReleaseState, Style, Surface, SurfacePreset, STANDARD_GRAVITY_MPS2,
};

use crate::common::rel_diff;

const G: f64 = STANDARD_GRAVITY_MPS2;

/// An invented 175 g disc of 21.1 cm diameter (demo values, not a product).
fn disc() -> ContactBody {
    ContactBody::new(0.175, 1.30e-3, 0.70e-3, 0.1055).expect("valid demo disc")
}

/// A unit axis tilted `tilt_rad` from vertical toward the horizontal azimuth `azimuth_rad`.
fn tilted_axis(tilt_rad: f64, azimuth_rad: f64) -> Vector3<f64> {
    Vector3::new(tilt_rad.sin() * azimuth_rad.cos(), tilt_rad.sin() * azimuth_rad.sin(), tilt_rad.cos())
}

/// A landing state whose lowest rim point just touches level ground at z = 0.
fn landing(velocity: Vector3<f64>, axis: Vector3<f64>, spin_rad_s: f64) -> ContactState {
    let body = disc();
    let plane = GroundPlane::default();
    let n = axis.normalize();
    let rim = lowest_rim_point(&plane, &Vector3::zeros(), &n, body.radius_m);
    let state = ContactState {
        position_m: Vector3::new(0.0, 0.0, -rim.gap_m),
        velocity_mps: velocity,
        normal: n,
        angular_velocity_rad_s: n * spin_rad_s,
    };
    state.validated().expect("valid landing")
}

fn play(ground: &Ground, state: &ContactState) -> GroundPlay {
    play_out_landing(&disc(), ground, state, &GroundSettings::default()).expect("ground play succeeds")
}

fn all_surfaces() -> Vec<Surface> {
    let mut surfaces: Vec<Surface> = SurfacePreset::ALL.iter().map(|p| p.surface()).collect();
    for (friction, restitution) in [(0.0, 1.0), (0.0, 0.0), (2.0, 1.0), (2.0, 0.0), (1.0, 0.5)] {
        surfaces.push(Surface::new(friction, restitution, 0.1).expect("valid extreme surface"));
    }
    surfaces
}

fn random_landing(rng: &mut ChaCha8Rng) -> ContactState {
    let axis = tilted_axis(rng.gen_range(0.0..1.5), rng.gen_range(0.0..std::f64::consts::TAU));
    let heading: f64 = rng.gen_range(0.0..std::f64::consts::TAU);
    let speed: f64 = rng.gen_range(0.0..25.0);
    let velocity = Vector3::new(speed * heading.cos(), speed * heading.sin(), -rng.gen_range(0.1..10.0));
    let mut state = landing(velocity, axis, rng.gen_range(-150.0..150.0));
    let wobble = Vector3::new(rng.gen_range(-15.0..15.0), rng.gen_range(-15.0..15.0), rng.gen_range(-15.0..15.0));
    state.angular_velocity_rad_s += wobble - axis * wobble.dot(&axis);
    state
}

#[test]
fn energy_never_increases_across_an_impact_for_every_surface() {
    // source: physics law (work–energy theorem; Coulomb friction and restitution only dissipate).
    let body = disc();
    let plane = GroundPlane::default();
    let mut rng = ChaCha8Rng::seed_from_u64(20261201);
    for surface in all_surfaces() {
        let mut impacts = 0;
        while impacts < 1000 {
            let state = random_landing(&mut rng);
            let rim = lowest_rim_point(&plane, &state.position_m, &state.normal, body.radius_m);
            let out = resolve_impact(&body, &state, &rim.arm_m, &plane.normal(), &surface, 0.0).expect("impact resolves");
            if !out.approaching {
                assert_eq!(out.energy_after_j, out.energy_before_j, "a separating contact must not change anything");
                continue;
            }
            impacts += 1;
            let tolerance = 1e-12 * out.energy_before_j + 1e-15;
            assert!(
                out.energy_after_j <= out.energy_before_j + tolerance,
                "{}: energy rose from {} J to {} J",
                surface.name(),
                out.energy_before_j,
                out.energy_after_j
            );
            // The contact point no longer moves into the ground (rigid, non-penetrating).
            assert!(out.contact_velocity_mps.z >= -1e-9, "contact still approaching: {}", out.contact_velocity_mps.z);
            // The impulse acts at the contact point, so the angular momentum about it is kept
            // (source: physics law, angular impulse–momentum about the point of application).
            let about_contact = |st: &ContactState| {
                body.angular_momentum(&st.normal, &st.angular_velocity_rad_s) - rim.arm_m.cross(&(st.velocity_mps * body.mass_kg))
            };
            let (before, after) = (about_contact(&state), about_contact(&out.state));
            assert!((after - before).norm() <= 1e-9 * before.norm().max(1e-6), "{before} vs {after}");
        }
    }
}

/// The apex height (m) of the first rebound after the first impact.
fn first_rebound_apex_m(play: &GroundPlay) -> f64 {
    let first = play.samples.iter().position(|s| s.phase == GroundPhase::Impact).expect("an impact");
    play.samples[first + 1..]
        .iter()
        .take_while(|s| s.phase == GroundPhase::Airborne)
        .map(|s| s.position_m.z)
        .fold(f64::NEG_INFINITY, f64::max)
}

#[test]
fn flat_drop_rebounds_to_e_squared_of_drop_height() {
    // source: Meriam & Kraige, Engineering Mechanics: Dynamics, direct central impact
    // (rebound speed e·v, so rebound height e²·h).
    let drop_m = 1.0;
    for surface in all_surfaces().into_iter().filter(|s| s.restitution() >= 0.1) {
        let start = ContactState {
            position_m: Vector3::new(0.0, 0.0, drop_m),
            velocity_mps: Vector3::zeros(),
            normal: Vector3::z(),
            angular_velocity_rad_s: Vector3::zeros(),
        };
        let result = play(&Ground::new(GroundPlane::default(), surface.clone()), &start);
        let expected = surface.restitution().powi(2) * drop_m;
        let apex = first_rebound_apex_m(&result);
        assert!(rel_diff(apex, expected) < 0.01, "{}: rebound {apex} m, expected {expected} m", surface.name());
    }
}

#[test]
fn flat_slide_stops_after_v_squared_over_two_mu_g() {
    // source: textbook Coulomb friction kinematics (constant deceleration μg: s = v²/(2μg)),
    // e.g. Meriam & Kraige, Engineering Mechanics: Dynamics, rectilinear motion.
    let speed = 8.0;
    for preset in SurfacePreset::ALL {
        let ground = Ground::level(preset);
        let start = landing(Vector3::new(speed * 0.6, speed * 0.8, 0.0), Vector3::z(), 0.0);
        let result = play(&ground, &start);
        let expected = speed * speed / (2.0 * ground.surface.friction() * G);
        assert_eq!(result.ending, GroundEnding::Slid);
        assert!(rel_diff(result.ground_play_m, expected) < 0.01, "{preset:?}: {} m vs {expected} m", result.ground_play_m);
        assert!(rel_diff(result.time_to_rest_s, speed / (ground.surface.friction() * G)) < 0.01);
    }
}

#[test]
fn flat_slide_down_a_slope_stops_after_textbook_incline_distance() {
    // source: textbook block on an incline with Coulomb friction, deceleration
    // g(μ cos α − sin α), e.g. Meriam & Kraige, Engineering Mechanics: Dynamics.
    let slope = 10f64.to_radians();
    let plane = GroundPlane::new(0.0, slope, 0.0).expect("valid slope");
    let ground = Ground::new(plane, SurfacePreset::ShortGrass);
    let speed = 5.0;
    let downhill = Vector3::new(slope.cos(), 0.0, -slope.sin());
    let start = ContactState {
        position_m: Vector3::zeros(),
        velocity_mps: downhill * speed,
        normal: plane.normal(),
        angular_velocity_rad_s: Vector3::zeros(),
    };
    let result = play(&ground, &start);
    let along = speed * speed / (2.0 * G * (0.5 * slope.cos() - slope.sin()));
    assert!(rel_diff(result.ground_play_m, along * slope.cos()) < 0.01, "{} m vs {} m", result.ground_play_m, along * slope.cos());
}

#[test]
fn lowest_rim_point_matches_a_sampled_rim_on_a_slope() {
    // source: common practice, no published source (brute-force minimum over the rim circle).
    let plane = GroundPlane::new(0.3, 20f64.to_radians(), 2.0).expect("valid slope");
    let centre = Vector3::new(1.0, -2.0, 0.5);
    let n = tilted_axis(0.7, -1.1);
    let radius = 0.1055;
    let contact = lowest_rim_point(&plane, &centre, &n, radius);
    let e1 = n.cross(&Vector3::x()).normalize();
    let e2 = n.cross(&e1);
    let sampled = (0..100_000)
        .map(|i| {
            let phi = std::f64::consts::TAU * i as f64 / 100_000.0;
            plane.distance_m(&(centre + (e1 * phi.cos() + e2 * phi.sin()) * radius))
        })
        .fold(f64::INFINITY, f64::min);
    assert!((contact.gap_m - sampled).abs() < 1e-8, "{} vs {}", contact.gap_m, sampled);
    assert!((plane.distance_m(&(centre + contact.arm_m)) - contact.gap_m).abs() < 1e-12);
}

/// A nose-down landing with spin `spin_rad_s`, heading downrange.
fn nose_down_landing(spin_rad_s: f64) -> ContactState {
    landing(Vector3::new(14.0, 0.0, -3.0), tilted_axis(20f64.to_radians(), 0.0), spin_rad_s)
}

#[test]
fn spin_direction_decides_the_skip_side() {
    // source: physics law (mirror symmetry: reflecting y reverses the spin, an axial vector).
    let ground = Ground::level(SurfacePreset::HardCourt);
    let backhand = play(&ground, &nose_down_landing(-80.0)); // right-hand backhand: ω_s < 0
    let forehand = play(&ground, &nose_down_landing(80.0)); // right-hand forehand: ω_s > 0
    assert!(backhand.skips >= 1, "expected a skip, got {}", backhand.describe());
    let (left, right) = (backhand.displacement_m().y, forehand.displacement_m().y);
    assert!(left.abs() > 0.05, "lateral skip too small: {left} m");
    assert!(rel_diff(-right, left) < 1e-9, "backhand {left} m, forehand {right} m");
    assert!((backhand.displacement_m().x - forehand.displacement_m().x).abs() < 1e-9 * backhand.ground_play_m);
}

#[test]
fn more_residual_spin_gives_more_ground_play_on_edge_landings() {
    // source: common practice, no published source (spin at the rim is turned into ground
    // travel by friction; CHECKS.md: a disc that "lands with more spin" has "more ground play").
    let ground = Ground::level(SurfacePreset::ShortGrass);
    let edge_low_left = tilted_axis(0.8, std::f64::consts::FRAC_PI_2); // hyzer for a right-hand backhand
    let edge_low_right = tilted_axis(0.8, -std::f64::consts::FRAC_PI_2); // anhyzer for it
    for axis in [edge_low_left, edge_low_right] {
        let plays: Vec<f64> = (0..=8)
            .map(|i| play(&ground, &landing(Vector3::new(10.0, 0.0, -2.5), axis, -15.0 * i as f64)).ground_play_m)
            .collect();
        assert!(plays.windows(2).all(|w| w[1] > w[0]), "ground play not increasing with spin: {plays:?}");
        assert!(plays[8] > 1.3 * plays[0], "spin should matter: {plays:?}");
    }
}

#[test]
fn upright_landing_with_spin_rolls_the_textbook_distance() {
    // source: textbook rolling wheel: sliding-to-rolling speed from angular momentum about the
    // contact, then deceleration c_rr g / (1 + I/(mR²)); e.g. Meriam & Kraige, Dynamics.
    let body = disc();
    let ground = Ground::level(SurfacePreset::PackedDirt);
    let axis = Vector3::new(0.0, 1.0, 0.0); // on edge, top facing left, rolling downrange
    let spin = 40.0; // ω = 40 ŷ: the bottom of the rim moves backward, so the disc rolls forward
    let start = landing(Vector3::new(0.0, 0.0, -0.05), axis, spin);
    let result = play(&ground, &start);
    assert_eq!(result.ending, GroundEnding::Rolled);
    let ratio = body.spin_inertia_kg_m2 / (body.mass_kg * body.radius_m.powi(2));
    let roll_speed = -spin * body.radius_m * ratio / (1.0 + ratio);
    let expected = roll_speed.powi(2) / (2.0 * ground.surface.rolling_resistance() * G / (1.0 + ratio));
    assert!(rel_diff(result.ground_play_m, expected) < 0.01, "{} m vs {expected} m", result.ground_play_m);
    assert!(result.displacement_m().x > 0.0);
}

#[test]
fn spinning_flat_disc_slides_further_than_a_still_one() {
    // source: Farkas, Bartels, Unger & Wolf (2003), Frictional coupling between sliding and
    // spinning motion, Phys. Rev. Lett. 90, 248302 (spin lowers the sliding deceleration).
    let ground = Ground::level(SurfacePreset::ShortGrass);
    let still = play(&ground, &landing(Vector3::new(6.0, 0.0, 0.0), Vector3::z(), 0.0));
    let spinning = play(&ground, &landing(Vector3::new(6.0, 0.0, 0.0), Vector3::z(), -60.0));
    assert!(spinning.ground_play_m > 1.05 * still.ground_play_m);
    assert!(spinning.displacement_m().y.abs() < 1e-6 * spinning.ground_play_m, "a uniform ring must not curve");
}

#[test]
fn bad_surface_and_slope_values_are_typed_errors() {
    assert!(matches!(Surface::new(-0.1, 0.5, 0.0), Err(GroundError::FrictionOutOfRange { .. })));
    assert!(matches!(Surface::new(0.5, 1.2, 0.0), Err(GroundError::RestitutionOutOfRange { .. })));
    assert!(matches!(Surface::new(0.5, -0.01, 0.0), Err(GroundError::RestitutionOutOfRange { .. })));
    assert!(matches!(Surface::new(0.5, 0.5, -1.0), Err(GroundError::RollingResistanceOutOfRange { .. })));
    assert!(matches!(Surface::new(f64::NAN, 0.5, 0.0), Err(GroundError::NotFinite { .. })));
    let steep = GroundPlane::new(0.0, 35f64.to_radians(), 0.0).expect_err("35° is too steep");
    assert!(matches!(steep, GroundError::SlopeTooSteep { .. }));
    assert!(steep.to_string().contains("30"), "message should state the limit: {steep}");
    assert!(GroundPlane::new(0.0, 30f64.to_radians(), 0.0).is_ok());
    assert!(matches!(GroundPlane::new(f64::INFINITY, 0.1, 0.0), Err(GroundError::NotFinite { .. })));
    let message = Surface::new(0.5, 1.5, 0.0).expect_err("out of range").to_string();
    assert!(message.contains("1.5") && message.contains("[0, 1]"), "{message}");
}

#[test]
fn bad_values_in_files_are_rejected_when_read() {
    let bad_friction = r#"{"surface": {"friction": -0.2, "restitution": 0.3}}"#;
    assert!(serde_json::from_str::<Ground>(bad_friction).is_err());
    let steep = r#"{"plane": {"slope_rad": 1.0}, "surface": {"friction": 0.2, "restitution": 0.3}}"#;
    assert!(serde_json::from_str::<Ground>(steep).is_err());
    let good = Ground::new(GroundPlane::new(0.5, 0.1, 1.0).expect("valid"), SurfacePreset::Sand);
    let text = serde_json::to_string(&good).expect("serialises");
    assert_eq!(serde_json::from_str::<Ground>(&text).expect("reads back"), good);
}

#[test]
fn non_finite_landing_states_are_typed_errors_not_panics() {
    let ground = Ground::level(SurfacePreset::ShortGrass);
    let settings = GroundSettings::default();
    let mut state = landing(Vector3::new(10.0, 0.0, -2.0), Vector3::z(), -50.0);
    state.velocity_mps.x = f64::NAN;
    assert!(matches!(play_out_landing(&disc(), &ground, &state, &settings), Err(GroundError::NotFinite { .. })));
    let mut state = landing(Vector3::new(10.0, 0.0, -2.0), Vector3::z(), -50.0);
    state.normal = Vector3::zeros();
    assert!(matches!(play_out_landing(&disc(), &ground, &state, &settings), Err(GroundError::ZeroAxis { .. })));
    let state = landing(Vector3::new(10.0, 0.0, -2.0), Vector3::z(), -50.0);
    let bad_body = ContactBody { mass_kg: f64::NAN, ..disc() };
    assert!(play_out_landing(&bad_body, &ground, &state, &settings).is_err());
}

#[test]
fn random_landings_always_come_to_rest_with_finite_results() {
    // source: physics law (energy only leaves the disc, so every landing on level ground ends).
    let mut rng = ChaCha8Rng::seed_from_u64(7);
    for i in 0..100 {
        let preset = SurfacePreset::ALL[i % SurfacePreset::ALL.len()];
        let result = play(&Ground::level(preset), &random_landing(&mut rng));
        assert_ne!(result.ending, GroundEnding::Unsettled, "{preset:?}: {}", result.describe());
        assert!(result.ground_play_m.is_finite() && result.time_to_rest_s.is_finite());
        assert!(result.samples.windows(2).all(|w| w[1].time_s >= w[0].time_s), "samples out of order");
        assert!(result.rest_state.kinetic_energy_j(&disc()) == 0.0);
    }
}

#[test]
fn frictionless_rim_impact_matches_newtons_closed_form() {
    // source: Meriam & Kraige, Engineering Mechanics: Dynamics, eccentric impact of a rigid body
    // (normal impulse P = (1 + e)(−u_n) / (1/m + (r×k̂)ᵀ I⁻¹ (r×k̂)); without friction Stronge's
    // energetic coefficient and Newton's agree: Stronge (2000), Impact Mechanics, ch. 4).
    let body = disc();
    let plane = GroundPlane::default();
    let surface = Surface::new(0.0, 0.6, 0.0).expect("valid");
    let mut state = landing(Vector3::new(5.0, 1.0, -3.0), tilted_axis(0.4, 0.7), -60.0);
    state.angular_velocity_rad_s += Vector3::new(2.0, -1.0, 0.0);
    let rim = lowest_rim_point(&plane, &state.position_m, &state.normal, body.radius_m);
    let k = Vector3::z();
    let u_n = (state.velocity_mps + state.angular_velocity_rad_s.cross(&rim.arm_m)).dot(&k);
    let lever = rim.arm_m.cross(&k);
    let k_nn = 1.0 / body.mass_kg + lever.dot(&(body.inverse_inertia_world(&state.normal) * lever));
    let expected = 1.6 * (-u_n) / k_nn;
    let out = resolve_impact(&body, &state, &rim.arm_m, &k, &surface, 0.0).expect("resolves");
    assert!(rel_diff(out.impulse_ns.z, expected) < 1e-9, "{} vs {expected}", out.impulse_ns.z);
    assert!(out.impulse_ns.xy().norm() < 1e-12);
    assert!(rel_diff(out.contact_velocity_mps.z, -0.6 * u_n) < 1e-9);
}

#[test]
fn rough_plastic_impact_brings_the_contact_point_to_rest() {
    // source: Stronge (2000), Impact Mechanics, ch. 5 (with enough friction the slip is arrested
    // and stays stuck; with e = 0 the normal velocity ends at zero).
    let body = disc();
    let plane = GroundPlane::default();
    let surface = Surface::new(5.0, 0.0, 0.0).expect("valid");
    let state = landing(Vector3::new(3.0, 0.5, -2.0), tilted_axis(0.5, 2.0), 40.0);
    let rim = lowest_rim_point(&plane, &state.position_m, &state.normal, body.radius_m);
    let out = resolve_impact(&body, &state, &rim.arm_m, &Vector3::z(), &surface, 0.0).expect("resolves");
    assert!(out.contact_velocity_mps.norm() < 1e-9, "contact still moving: {}", out.contact_velocity_mps);
}

fn driver_release(spin_rad_s: f64) -> ReleaseState {
    ReleaseState {
        speed_mps: 24.0,
        spin_rad_s,
        launch_rad: 0.17,
        nose_rad: 0.0,
        roll_rad: 0.15,
        heading_rad: 0.0,
        height_m: 1.5,
        off_axis_rate_rad_s: 0.0,
        off_axis_direction_rad: 0.0,
        style: Style::Backhand,
        hand: Hand::Right,
    }
}

fn driver_body() -> DiscBody {
    let body = disc();
    DiscBody {
        mass_kg: body.mass_kg,
        spin_inertia_kg_m2: body.spin_inertia_kg_m2,
        transverse_inertia_kg_m2: body.transverse_inertia_kg_m2,
        diameter_m: 2.0 * body.radius_m,
    }
}

fn throw_to_rest(ground: &Ground) -> Result<FlightToRest, GroundError> {
    let conditions = FlightConditions::default();
    let release = driver_release(110.0);
    fly_to_rest(&driver_body(), &demo_driver(), &release, &conditions, &FlightSettings::default(), ground, &GroundSettings::default())
}

#[test]
fn a_throw_continues_from_its_landing_to_rest() {
    // source: common practice, no published source (continuity: the ground phase starts where
    // and how the flight ended).
    let whole = throw_to_rest(&Ground::level(SurfacePreset::ShortGrass)).expect("throw to rest");
    let landing = whole.flight.landing_state;
    assert_eq!(whole.ground.landing_position_m, landing.position_m);
    let expected = ContactState::from_disc_state(&landing).expect("valid").kinetic_energy_j(&ContactBody::from(driver_body()));
    assert!(rel_diff(whole.ground.landing_energy_j, expected) < 1e-12);
    assert_ne!(whole.ground.ending, GroundEnding::Unsettled);
    assert!(whole.ground.ground_play_m > 0.1, "{}", whole.ground.ground_play_m);
    let carry = landing.position_m.xy().norm();
    assert!(whole.rest_distance_m() > carry, "rest {} m, carry {carry} m", whole.rest_distance_m());
}

#[test]
fn a_lower_ground_is_reached_by_a_fall_and_a_higher_one_is_an_error() {
    let lower = Ground::new(GroundPlane::level(-0.3).expect("valid"), SurfacePreset::ShortGrass);
    let whole = throw_to_rest(&lower).expect("falls to the lower ground");
    assert!(whole.ground.rest_position_m.z < -0.29);
    let higher = Ground::new(GroundPlane::level(0.3).expect("valid"), SurfacePreset::ShortGrass);
    assert!(matches!(throw_to_rest(&higher), Err(GroundError::GroundAboveLanding { .. })));
}

#[test]
fn a_slope_steeper_than_friction_holds_ends_unsettled_without_hanging() {
    let plane = GroundPlane::new(0.0, 25f64.to_radians(), 0.0).expect("valid");
    let ground = Ground::new(plane, Surface::new(0.2, 0.3, 0.1).expect("valid"));
    let settings = GroundSettings { max_time_s: 5.0, ..GroundSettings::default() };
    let start = ContactState { position_m: Vector3::zeros(), velocity_mps: Vector3::zeros(), normal: plane.normal(), angular_velocity_rad_s: Vector3::zeros() };
    let result = play_out_landing(&disc(), &ground, &start, &settings).expect("runs");
    assert_eq!(result.ending, GroundEnding::Unsettled);
    assert!(result.time_to_rest_s <= 5.0 + 1e-9);
}

/// Any finite or non-finite number, with the awkward ones over-represented.
fn any_number() -> impl Strategy<Value = f64> {
    prop_oneof![
        4 => -30.0..30.0f64,
        1 => Just(f64::NAN),
        1 => Just(f64::INFINITY),
        1 => Just(-1e300),
        1 => Just(0.0),
    ]
}

proptest! {
    #![proptest_config(ProptestConfig { cases: 200, ..ProptestConfig::default() })]
    #[test]
    fn arbitrary_inputs_never_panic(
        numbers in proptest::collection::vec(any_number(), 17),
    ) {
        // Every input either plays out or is a typed error; nothing panics, nothing is NaN.
        let v = |i: usize| Vector3::new(numbers[i], numbers[i + 1], numbers[i + 2]);
        let state = ContactState { position_m: v(0), velocity_mps: v(3), normal: v(6), angular_velocity_rad_s: v(9) };
        let surface = Surface::new(numbers[12], numbers[13].abs() / 30.0, numbers[14].abs());
        let plane = GroundPlane::new(0.0, numbers[15].abs() / 60.0, numbers[16]);
        let settings = GroundSettings { max_time_s: 2.0, ..GroundSettings::default() };
        if let (Ok(surface), Ok(plane)) = (surface, plane) {
            if let Ok(result) = play_out_landing(&disc(), &Ground::new(plane, surface), &state, &settings) {
                prop_assert!(result.ground_play_m.is_finite() && result.time_to_rest_s.is_finite());
                prop_assert!(result.samples.iter().all(|s| s.position_m.iter().all(|c| c.is_finite())));
            }
        }
    }
}

#[test]
fn downhill_ground_lengthens_ground_play_and_uphill_ground_shortens_it() {
    // source: common practice, no published source (gravity's pull along the slope).
    let play_on = |azimuth_rad: f64| {
        let plane = GroundPlane::new(0.0, 8f64.to_radians(), azimuth_rad).expect("valid");
        let velocity = plane.tangential(&Vector3::x()).normalize() * 6.0;
        let start = ContactState { position_m: Vector3::zeros(), velocity_mps: velocity, normal: plane.normal(), angular_velocity_rad_s: plane.normal() * -50.0 };
        play(&Ground::new(plane, SurfacePreset::ShortGrass), &start).ground_play_m
    };
    let level = play(&Ground::level(SurfacePreset::ShortGrass), &landing(Vector3::new(6.0, 0.0, 0.0), Vector3::z(), -50.0)).ground_play_m;
    let (downhill, uphill) = (play_on(0.0), play_on(std::f64::consts::PI));
    assert!(downhill > level && level > uphill, "downhill {downhill} m, level {level} m, uphill {uphill} m");
}

#[test]
fn sliding_and_spinning_stop_together() {
    // source: Farkas, Bartels, Unger & Wolf (2003), Frictional coupling between sliding and
    // spinning motion, Phys. Rev. Lett. 90, 248302 (for a ring or disc contact both motions
    // come to rest at the same moment, whatever the starting mix).
    let ground = Ground::level(SurfacePreset::PackedDirt);
    for spin in [-20.0, -60.0, -150.0] {
        let result = play(&ground, &landing(Vector3::new(5.0, 0.0, 0.0), Vector3::z(), spin));
        let sliding: Vec<_> = result.samples.iter().filter(|s| s.phase == GroundPhase::Sliding).collect();
        let first_below = |f: &dyn Fn(&GroundSample) -> f64| {
            let start = f(sliding[0]);
            sliding.iter().find(|s| f(s) < 0.05 * start).map_or(result.time_to_rest_s, |s| s.time_s)
        };
        let slide_ends = first_below(&|s| s.velocity_mps.norm());
        let spin_ends = first_below(&|s| s.spin_rad_s.abs());
        assert!((slide_ends - spin_ends).abs() < 0.1 * result.time_to_rest_s, "slide {slide_ends} s, spin {spin_ends} s");
        assert!(result.samples.iter().rev().nth(1).is_some_and(|s| s.spin_rad_s.abs() < 0.1 * spin.abs()));
    }
}

#[test]
fn ground_play_converges_as_the_time_step_shrinks() {
    // source: common practice, no published source (numerical convergence check).
    let fine = GroundSettings { step_s: 2.5e-4, ..GroundSettings::default() };
    let landings = [
        (SurfacePreset::ShortGrass, landing(Vector3::new(10.0, 0.0, -2.5), tilted_axis(0.8, 1.2), -90.0)),
        (SurfacePreset::PackedDirt, landing(Vector3::new(12.0, 3.0, -3.0), tilted_axis(0.3, 2.0), -70.0)),
        (SurfacePreset::HardCourt, nose_down_landing(-80.0)),
        (SurfacePreset::Sand, landing(Vector3::new(8.0, -1.0, -4.0), tilted_axis(0.5, -0.5), 60.0)),
    ];
    for (preset, start) in landings {
        let ground = Ground::level(preset);
        let coarse = play(&ground, &start);
        let refined = play_out_landing(&disc(), &ground, &start, &fine).expect("plays out");
        assert_eq!(coarse.describe(), refined.describe());
        assert!(rel_diff(coarse.ground_play_m, refined.ground_play_m) < 1e-4, "{preset:?}: {} m vs {} m", coarse.ground_play_m, refined.ground_play_m);
    }
}
