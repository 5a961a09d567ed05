//! Prints, as JSON, seeded throws and where Spinfoil lands them, for the independent Python
//! reference (`tests/flight_reference.py`, checked by `tests/test_flight_reference.py`).
//!
//! `cargo run --release -p spinfoil-engine --example reference_flights` prints 20 seeded
//! throws flown with precise settings; `... -- typical` prints the benchmark's typical flight
//! flown with the default settings (used by `scripts/bench-flight`).
//!
//! Each record holds everything the reference needs: the body, the coefficient set (serialised
//! in our axes), the air, a steady wind vector, gravity, the release, the solver tolerances, and
//! our landing time and position.
use nalgebra::Vector3;
use rand::{Rng, SeedableRng};
use rand_chacha::ChaCha8Rng;
use serde_json::{json, Value};
use spinfoil_engine::*;
use std::sync::Arc;

/// A wind that is the same everywhere and always (m/s, world frame).
#[derive(Debug, Clone, Copy)]
pub struct SteadyWind(pub Vector3<f64>);

impl WindField for SteadyWind {
    fn velocity_mps(&self, _position_m: &Vector3<f64>, _time_s: f64) -> Vector3<f64> {
        self.0
    }
}

/// Flies the typical throw `count` times (metrics only) and prints the summed carry, for
/// profiling and CPU-time counts (`perf stat ... -- typical-repeat 2000`).
fn repeat_typical(count: usize) {
    let throw = typical_throw();
    let conditions = throw.conditions();
    let settings = FlightSettings { record_samples: false, ..FlightSettings::default() };
    let total: f64 = (0..count).map(|_| fly(&throw.body, &throw.model, &throw.release, &conditions, &settings).unwrap().metrics.carry_m).sum();
    println!("{count} flights, summed carry {total:.6} m");
}

/// One reference throw: body, coefficients, wind, release.
pub struct ReferenceThrow {
    /// The disc.
    pub body: DiscBody,
    /// Its coefficient set.
    pub model: LinearCoefficients,
    /// Steady wind, m/s.
    pub wind_mps: Vector3<f64>,
    /// The release.
    pub release: ReleaseState,
}

impl ReferenceThrow {
    /// Conditions: sea-level standard air, this throw's steady wind, standard gravity.
    pub fn conditions(&self) -> FlightConditions {
        FlightConditions { wind: Arc::new(SteadyWind(self.wind_mps)), ..FlightConditions::default() }
    }
}

/// The disc of Hummel's set (175 g, 0.269 m; value from memory, unverified; CHECKS.md).
fn hummel_body() -> DiscBody {
    DiscBody { mass_kg: 0.175, spin_inertia_kg_m2: 0.00235, transverse_inertia_kg_m2: 0.00122, diameter_m: 0.269 }
}

/// An invented 0.211 m, 0.172 kg driver body (invented for demos).
fn demo_driver_body() -> DiscBody {
    DiscBody { mass_kg: 0.172, spin_inertia_kg_m2: 0.00142, transverse_inertia_kg_m2: 0.00075, diameter_m: 0.211 }
}

/// The typical flight of the benchmark: the invented demo driver, a right-hand backhand at
/// 22 m/s and 95 rad/s (about 15 rev/s), launch 10°, nose 1°, flat, from 1 m, calm sea-level
/// air (lands after about 6.1 s, about 78 m out).
pub fn typical_throw() -> ReferenceThrow {
    let release = ReleasePose { launch_rad: 10f64.to_radians(), nose_rad: 1f64.to_radians(), ..ReleasePose::default() }
        .with_speed_and_spin(22.0, 95.0);
    ReferenceThrow { body: demo_driver_body(), model: demo_driver(), wind_mps: Vector3::zeros(), release }
}

/// The 20 seeded throws: both styles and hands, two coefficient sets, light steady winds.
pub fn seeded_throws() -> Vec<ReferenceThrow> {
    let mut rng = ChaCha8Rng::seed_from_u64(20_261_201);
    (0..20).map(|i| seeded_throw(i, &mut rng)).collect()
}

fn seeded_throw(i: usize, rng: &mut ChaCha8Rng) -> ReferenceThrow {
    let (body, model) = if i.is_multiple_of(2) { (hummel_body(), hummel_2003()) } else { (demo_driver_body(), demo_driver()) };
    let release = ReleaseState {
        speed_mps: rng.gen_range(14.0..26.0),
        spin_rad_s: rng.gen_range(50.0..110.0),
        launch_rad: rng.gen_range(0.03..0.3),
        nose_rad: rng.gen_range(-0.05..0.1),
        roll_rad: rng.gen_range(-0.4..0.4),
        heading_rad: rng.gen_range(-0.3..0.3),
        height_m: rng.gen_range(0.8..1.6),
        off_axis_rate_rad_s: rng.gen_range(0.0..5.0),
        off_axis_direction_rad: rng.gen_range(0.0..std::f64::consts::TAU),
        style: if i % 4 < 2 { Style::Backhand } else { Style::Forehand },
        hand: if i % 8 < 4 { Hand::Right } else { Hand::Left },
    };
    let wind_mps = Vector3::new(rng.gen_range(-3.0..3.0), rng.gen_range(-3.0..3.0), 0.0);
    ReferenceThrow { body, model, wind_mps, release }
}

fn record(throw: &ReferenceThrow, settings: &FlightSettings) -> Value {
    let conditions = throw.conditions();
    let flight = fly(&throw.body, &throw.model, &throw.release, &conditions, settings);
    let outcome = match flight {
        Ok(f) => json!({
            "landing_time_s": f.metrics.time_aloft_s,
            "landing_position_m": f.landing_state.position_m,
            "carry_m": f.metrics.carry_m,
            "landing_spin_rad_s": f.metrics.landing_spin_rad_s,
            "steps": f.accepted_steps,
        }),
        Err(e) => json!({ "error": e.to_string() }),
    };
    json!({
        "body": throw.body,
        "model": throw.model,
        "air": conditions.air,
        "wind_mps": throw.wind_mps,
        "gravity_mps2": conditions.gravity_mps2,
        "release": throw.release,
        "fade_side": throw.release.fade_side(),
        "relative_tolerance": settings.relative_tolerance,
        "absolute_tolerance": settings.absolute_tolerance,
        "spinfoil": outcome,
    })
}

fn main() {
    if let Some(count) = std::env::args().nth(1).filter(|a| a == "typical-repeat").and(std::env::args().nth(2)) {
        repeat_typical(count.parse().expect("typical-repeat takes a count of flights"));
        return;
    }
    let typical = std::env::args().nth(1).as_deref() == Some("typical");
    let (throws, settings) = if typical {
        (vec![typical_throw()], FlightSettings { record_samples: false, ..FlightSettings::default() })
    } else {
        (seeded_throws(), FlightSettings { record_samples: false, ..FlightSettings::precise() })
    };
    let records: Vec<Value> = throws.iter().map(|t| record(t, &settings)).collect();
    println!("{}", json!({ "throws": records }));
}
