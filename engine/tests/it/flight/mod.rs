//! Integration tests: flight (dynamics, integration, landing, metrics). Every numerical check
//! names its source.
mod errors;
mod free_body;
mod metrics;
mod pitching_moment;
mod robustness;
mod vacuum;
mod wobble;

use std::sync::Arc;

use spinfoil_engine::*;

/// The disc of Hummel's linear model: 175 g, 0.269 m, I_z 0.00235, I_x 0.00122 kg·m²
/// (value from memory, unverified; CHECKS.md).
pub fn hummel_body() -> DiscBody {
    DiscBody { mass_kg: 0.175, spin_inertia_kg_m2: 0.00235, transverse_inertia_kg_m2: 0.00122, diameter_m: 0.269 }
}

/// A right-hand backhand release with the given speed (m/s), spin (rad/s) and angles (rad).
pub fn release(speed_mps: f64, spin_rad_s: f64, launch_rad: f64, nose_rad: f64, roll_rad: f64) -> ReleaseState {
    ReleaseState {
        speed_mps,
        spin_rad_s,
        launch_rad,
        nose_rad,
        roll_rad,
        heading_rad: 0.0,
        height_m: 1.0,
        off_axis_rate_rad_s: 0.0,
        off_axis_direction_rad: 0.0,
        style: Style::Backhand,
        hand: Hand::Right,
    }
}

/// Sea-level air, calm, with the given gravity (m/s²).
pub fn conditions(gravity_mps2: f64) -> FlightConditions {
    FlightConditions { gravity_mps2, ..FlightConditions::default() }
}

/// Vacuum, calm, with the given gravity (m/s²).
pub fn vacuum(gravity_mps2: f64) -> FlightConditions {
    FlightConditions { gravity_mps2, wind: Arc::new(CalmAir), ..FlightConditions::vacuum() }
}

/// Precise settings that end at `duration_s` instead of requiring a landing.
pub fn timed(duration_s: f64, sample_interval_s: f64) -> FlightSettings {
    FlightSettings { max_time_s: duration_s, end_at_time_limit: true, sample_interval_s, ..FlightSettings::precise() }
}

/// A test model with fixed coefficients (no dependence on the state).
#[derive(Debug, Clone, Copy)]
pub struct Fixed(pub AeroCoefficients);

impl AeroModel for Fixed {
    fn coefficients(&self, _input: &AeroInput) -> AeroCoefficients {
        self.0
    }
    fn info(&self) -> ModelInfo {
        ModelInfo { name: "fixed test coefficients".into(), source: "test".into(), confidence: "test".into() }
    }
}

/// Only a constant pitching-moment coefficient (positive nose-up).
pub fn constant_pitch(pitch: f64) -> Fixed {
    Fixed(AeroCoefficients { pitch, ..AeroCoefficients::default() })
}

/// A mirror-symmetric test model shaped like a linear coefficient set (invented values):
/// lift, drag and pitch from α, pitch damping from the pitch rate, roll damping from the roll
/// rate, spin-down against the spin.
#[derive(Debug, Clone, Copy)]
pub struct LinearTestModel;

impl AeroModel for LinearTestModel {
    fn coefficients(&self, i: &AeroInput) -> AeroCoefficients {
        let a = i.angle_of_attack_rad;
        AeroCoefficients {
            lift: 0.15 + 1.9 * a,
            drag: 0.08 + 2.0 * (a + 0.05) * (a + 0.05),
            pitch: -0.012 + 0.09 * a - 0.005 * i.pitch_rate_rad_s,
            roll: -0.014 * i.roll_rate_rad_s * 0.01,
            spin: -1e-5 * i.spin_rad_s,
        }
    }
    fn info(&self) -> ModelInfo {
        ModelInfo { name: "linear test model".into(), source: "invented for tests".into(), confidence: "test".into() }
    }
}

/// Least-squares slope of y against x.
pub fn slope(x: &[f64], y: &[f64]) -> f64 {
    let n = x.len() as f64;
    let (mx, my) = (x.iter().sum::<f64>() / n, y.iter().sum::<f64>() / n);
    let sxy: f64 = x.iter().zip(y).map(|(a, b)| (a - mx) * (b - my)).sum();
    let sxx: f64 = x.iter().map(|a| (a - mx) * (a - mx)).sum();
    sxy / sxx
}
