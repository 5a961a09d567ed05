//! Bad input and diverging integrations give typed errors, never NaN.
use spinfoil_engine::*;

use super::*;

fn fly_with(body: &DiscBody, model: &dyn AeroModel, r: &ReleaseState, c: &FlightConditions, s: &FlightSettings) -> FlightError {
    fly(body, model, r, c, s).expect_err("must be rejected")
}

#[test]
fn bad_input_names_field_value_and_range() {
    let (b, m, c, s) = (hummel_body(), LinearTestModel, FlightConditions::default(), FlightSettings::default());
    let r = release(20.0, 80.0, 0.1, 0.0, 0.0);
    let bad_speed = ReleaseState { speed_mps: f64::NAN, ..r };
    assert!(matches!(fly_with(&b, &m, &bad_speed, &c, &s), FlightError::InvalidRelease { field: "speed_mps", .. }));
    let bad_spin = ReleaseState { spin_rad_s: -3.0, ..r };
    let e = fly_with(&b, &m, &bad_spin, &c, &s);
    assert!(matches!(e, FlightError::InvalidRelease { field: "spin_rad_s", value, .. } if value == -3.0));
    assert!(e.to_string().contains("spin_rad_s = -3"));
    let buried = ReleaseState { height_m: 0.0, roll_rad: 0.3, ..r };
    assert!(matches!(fly_with(&b, &m, &buried, &c, &s), FlightError::InvalidRelease { field: "height_m", .. }));
    let no_mass = DiscBody { mass_kg: 0.0, ..b };
    assert!(matches!(fly_with(&no_mass, &m, &r, &c, &s), FlightError::InvalidBody(BodyError::OutOfRange { field: "mass_kg", .. })));
    let bad_air = FlightConditions { air: AirProperties { density_kg_m3: f64::INFINITY, ..AirProperties::sea_level_standard() }, ..FlightConditions::default() };
    assert!(matches!(fly_with(&b, &m, &r, &bad_air, &s), FlightError::InvalidConditions { field: "air.density_kg_m3", .. }));
    let bad_settings = FlightSettings { relative_tolerance: 0.0, ..s };
    assert!(matches!(fly_with(&b, &m, &r, &c, &bad_settings), FlightError::InvalidSettings { field: "relative_tolerance", .. }));
}

/// A model that pushes the disc forward harder the faster it goes (negative drag).
#[derive(Debug)]
struct Runaway;

impl AeroModel for Runaway {
    fn coefficients(&self, _: &AeroInput) -> AeroCoefficients {
        AeroCoefficients { drag: -50.0, ..AeroCoefficients::default() }
    }
    fn info(&self) -> ModelInfo {
        ModelInfo { name: "runaway".into(), source: "absurd test model".into(), confidence: "test".into() }
    }
}

/// A model that returns NaN once the disc slows below 18 m/s.
#[derive(Debug)]
struct BreaksWhenSlow;

impl AeroModel for BreaksWhenSlow {
    fn coefficients(&self, i: &AeroInput) -> AeroCoefficients {
        let pitch = if i.airspeed_mps < 18.0 { f64::NAN } else { -0.01 };
        AeroCoefficients { lift: 0.2, drag: 0.1, pitch, ..AeroCoefficients::default() }
    }
    fn info(&self) -> ModelInfo {
        ModelInfo { name: "breaks when slow".into(), source: "absurd test model".into(), confidence: "test".into() }
    }
}

#[test]
fn diverging_integrations_name_time_and_quantity() {
    let (b, c, s) = (hummel_body(), FlightConditions::default(), FlightSettings::default());
    let r = release(20.0, 80.0, 0.1, 0.0, 0.0);
    match fly_with(&b, &Runaway, &r, &c, &s) {
        FlightError::Diverged { time_s, quantity, value, .. } => {
            assert!(time_s > 0.0 && time_s < 1.0 && quantity.starts_with("speed") && value > 1000.0);
        }
        other => panic!("expected divergence, got {other:?}"),
    }
    match fly_with(&b, &BreaksWhenSlow, &r, &c, &s) {
        e @ FlightError::NonFinite { .. } => {
            let FlightError::NonFinite { time_s, quantity } = e.clone() else { unreachable!() };
            assert!(time_s > 0.0 && quantity == "aerodynamic moment");
            assert!(e.to_string().contains("t = "));
        }
        other => panic!("expected a non-finite error, got {other:?}"),
    }
}

#[test]
fn a_disc_that_never_lands_is_reported() {
    let r = release(20.0, 80.0, 0.1, 0.0, 0.0);
    let s = FlightSettings { max_time_s: 2.0, ..FlightSettings::default() };
    let e = fly_with(&hummel_body(), &LinearTestModel, &r, &vacuum(0.0), &s);
    assert_eq!(e, FlightError::NoLanding { max_time_s: 2.0 });
}

#[test]
fn a_step_limit_is_reported_with_its_time() {
    let r = release(20.0, 80.0, 0.1, 0.0, 0.0);
    let s = FlightSettings { max_steps: 5, ..FlightSettings::default() };
    match fly_with(&hummel_body(), &LinearTestModel, &r, &FlightConditions::default(), &s) {
        FlightError::TooManySteps { time_s, max_steps: 5 } => assert!(time_s > 0.0 && time_s < 1.0),
        other => panic!("expected the step limit, got {other:?}"),
    }
}

/// A model that never gives a number.
#[derive(Debug)]
struct AlwaysNan;

impl AeroModel for AlwaysNan {
    fn coefficients(&self, _: &AeroInput) -> AeroCoefficients {
        AeroCoefficients { lift: f64::NAN, ..AeroCoefficients::default() }
    }
    fn info(&self) -> ModelInfo {
        ModelInfo { name: "always NaN".into(), source: "absurd test model".into(), confidence: "test".into() }
    }
}

#[test]
fn a_model_that_fails_at_release_is_reported_at_time_zero() {
    let r = release(20.0, 80.0, 0.1, 0.0, 0.0);
    let e = fly_with(&hummel_body(), &AlwaysNan, &r, &FlightConditions::default(), &FlightSettings::default());
    assert_eq!(e, FlightError::NonFinite { time_s: 0.0, quantity: "aerodynamic force" });
}
