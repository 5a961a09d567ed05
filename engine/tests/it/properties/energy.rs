//! Energy is never gained: in flight with drag (and lift, which does no work in calm air), and
//! on the ground after landing.
use crate::flight::{hummel_body, release, Fixed};
use proptest::prelude::*;
use spinfoil_engine::*;

const G: f64 = STANDARD_GRAVITY_MPS2;

/// Only lift and drag: the aerodynamic force does work −D·v ≤ 0 in calm air (lift is
/// perpendicular to the air velocity); no moments, so the rotational energy of the symmetric
/// body stays constant (torque-free Euler equations).
fn lift_and_drag(lift: f64, drag: f64) -> Fixed {
    Fixed(AeroCoefficients { lift, drag, roll: 0.0, pitch: 0.0, spin: 0.0 })
}

/// A random right-hand backhand release from 0.5–2 m.
fn releases() -> impl Strategy<Value = ReleaseState> {
    (5.0f64..30.0, 20.0f64..150.0, -0.1f64..0.4, -0.1f64..0.2, -0.6f64..0.6, 0.5f64..2.0)
        .prop_map(|(v, spin, launch, nose, roll, h)| ReleaseState { height_m: h, ..release(v, spin, launch, nose, roll) })
}

/// Translational kinetic plus potential energy per unit mass, J/kg.
fn specific_energy(velocity: &nalgebra::Vector3<f64>, height_m: f64) -> f64 {
    0.5 * velocity.norm_squared() + G * height_m
}

proptest! {
    #![proptest_config(super::config(64))]

    /// source: physics law (work–energy theorem: drag only dissipates, lift does no work),
    /// Goldstein, Poole & Safko (2002), Classical Mechanics 3rd ed., §1.2.
    #[test]
    fn a_flight_with_drag_never_gains_energy(r in releases(), lift in -0.2f64..0.4, drag in 0.05f64..0.6) {
        let body = hummel_body();
        let flight = fly(&body, &lift_and_drag(lift, drag), &r, &FlightConditions::default(), &FlightSettings::default())
            .expect("the flight integrates");
        let mut previous = f64::INFINITY;
        for s in &flight.samples {
            let e = specific_energy(&s.velocity_mps, s.position_m.z);
            prop_assert!(e <= previous + 1e-7 * previous.abs().min(1e6), "energy rose to {e} J/kg at {} s", s.time_s);
            previous = e;
        }
        let total = |st: &DiscState| st.kinetic_energy_j(&body) + body.mass_kg * G * st.position_m.z;
        let (start, end) = (total(&flight.release_state), total(&flight.landing_state));
        prop_assert!(end <= start * (1.0 + 1e-9), "{end} J at landing > {start} J at release");
    }

    /// source: physics law (work–energy theorem; Coulomb friction, restitution e ≤ 1 and rolling
    /// resistance only dissipate).
    #[test]
    fn the_ground_never_gives_energy_back(
        r in releases(),
        drag in 0.05f64..0.3,
        preset in prop::sample::select(SurfacePreset::ALL.to_vec()),
    ) {
        let body = hummel_body();
        let contact = ContactBody::from(body);
        let result = fly_to_rest(
            &body, &lift_and_drag(0.3, drag), &r, &FlightConditions::default(), &FlightSettings::default(),
            &Ground::level(preset), &GroundSettings::default(),
        );
        // A throw the engine refuses is skipped; proptest fails the test if most are.
        prop_assume!(result.is_ok(), "{:?}", result.err());
        let to_rest = result.expect("checked");
        let landing = ContactState::from_disc_state(&to_rest.flight.landing_state).expect("a valid landing");
        let at_landing = landing.kinetic_energy_j(&contact) + body.mass_kg * G * landing.position_m.z;
        let rest = &to_rest.ground.rest_state;
        let at_rest = rest.kinetic_energy_j(&contact) + body.mass_kg * G * rest.position_m.z;
        let tolerance = 1e-9 * at_landing.abs() + 1e-12;
        prop_assert!(at_rest <= at_landing + tolerance, "{}: {at_rest} J at rest > {at_landing} J at landing", preset.name());
        for s in &to_rest.ground.samples {
            let e = body.mass_kg * specific_energy(&s.velocity_mps, s.position_m.z);
            prop_assert!(e <= at_landing + tolerance, "{}: {e} J at {} s after landing > {at_landing} J", preset.name(), s.time_s);
        }
    }
}
