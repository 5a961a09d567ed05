//! Calibration: fit chosen coefficients of a case's set (any `model.*` input: linear
//! coefficients or scale factors) to measured flights by Levenberg–Marquardt (the
//! `levenberg-marquardt` crate, see `least_squares.rs`).
//!
//! Residuals are (predicted − measured)/σ with σ = [`CalibrationSpec::position_sd_m`] for
//! positions and [`CalibrationSpec::time_sd_s`] for times aloft. Standard errors come from
//! s²(JᵀJ)⁻¹ at the solution with s² = Σr²/(m − k). A coefficient is refused
//! ([`StudyError::Unidentifiable`]) when it has no effect on the data, when the column-scaled JᵀJ
//! has a condition number above [`CalibrationSpec::max_condition`] (default 1e10), or when its
//! relative standard error exceeds [`CalibrationSpec::max_relative_se`] (default 1, i.e. 100 %).
//! Positions at observation times are interpolated linearly between the flight's samples (every
//! 5 ms; error below 0.1 mm for a flight's accelerations).
use nalgebra::DVector;
use serde::{Deserialize, Serialize};

use super::least_squares::{check_identifiable, least_squares, residuals_and_jacobian, FitSettings};
use super::runner::run_indexed;
use super::{input_unit, MeasuredFlight, Observation, StudyCase, StudyControl, StudyError};
use crate::{fly, Flight, FlightSample};

/// What to fit and how.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct CalibrationSpec {
    /// Input names of the coefficients to fit (`model.*`, see [`super::INPUTS`]).
    pub parameters: Vec<String>,
    /// Measurement uncertainty of positions, m (weights the residuals).
    pub position_sd_m: f64,
    /// Measurement uncertainty of times aloft, s.
    pub time_sd_s: f64,
    /// Patience of the solver: at most `max_iterations` × (k + 1) trial steps for k
    /// coefficients (MINPACK's maxfev; each step flies every measured flight once). Converging
    /// fits stop long before.
    pub max_iterations: usize,
    /// Largest accepted condition number of the column-scaled JᵀJ.
    pub max_condition: f64,
    /// Largest accepted standard error relative to the fitted value.
    pub max_relative_se: f64,
}

impl CalibrationSpec {
    /// Fit `parameters` with σ 0.5 m on positions and 0.05 s on times, at most 30 iterations.
    pub fn new(parameters: Vec<String>) -> Self {
        Self { parameters, position_sd_m: 0.5, time_sd_s: 0.05, max_iterations: 30, max_condition: 1e10, max_relative_se: 1.0 }
    }
}

/// A fitted coefficient.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct FittedParameter {
    /// Input name.
    pub name: String,
    /// Unit.
    pub unit: String,
    /// Starting value (the case's).
    pub initial: f64,
    /// Fitted value.
    pub value: f64,
    /// Standard error.
    pub standard_error: f64,
}

/// One observed quantity at the solution.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct ResidualRow {
    /// Flight label.
    pub flight: String,
    /// Quantity: `x_m`, `y_m`, `z_m` or `time_aloft_s`.
    pub quantity: String,
    /// Observation time, s.
    pub time_s: f64,
    /// Measured value (m or s).
    pub measured: f64,
    /// Predicted value (m or s).
    pub predicted: f64,
    /// predicted − measured (m or s).
    pub residual: f64,
}

/// The result of a calibration.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct CalibrationResult {
    /// Fitted coefficients with standard errors.
    pub parameters: Vec<FittedParameter>,
    /// Residuals per observed quantity.
    pub residuals: Vec<ResidualRow>,
    /// Residual variance s² of the weighted residuals (≈ 1 when the σ's are right).
    pub residual_variance: f64,
    /// Correlation matrix of the fitted coefficients.
    pub correlation: Vec<Vec<f64>>,
    /// Iterations (Jacobians the solver asked for).
    pub iterations: usize,
    /// Flights flown.
    pub flights_flown: usize,
}

/// Fits the coefficients named in `spec` to `flights`, starting from the case's values.
pub fn calibrate(case: &StudyCase, flights: &[MeasuredFlight], spec: &CalibrationSpec, control: StudyControl<'_>) -> Result<CalibrationResult, StudyError> {
    let start = validate(case, flights, spec)?;
    let body = case.disc.body()?;
    let predict_all = |p: &DVector<f64>| -> Result<Vec<Vec<ResidualRow>>, StudyError> {
        let mut fitted = case.clone();
        for (name, value) in spec.parameters.iter().zip(p.iter()) {
            fitted.set(name, *value)?;
        }
        let conditions = fitted.conditions()?;
        let model = fitted.model.scaled();
        let settings = crate::FlightSettings { record_samples: true, sample_interval_s: 0.005, ..fitted.flight_settings };
        let rows = run_indexed(&(0..flights.len()).collect::<Vec<_>>(), control, |k| {
            let flight = fly(&body, &model, &flights[k].release, &conditions, &settings)?;
            Ok(residual_rows(&flights[k], &flight))
        })?;
        rows.into_iter().collect()
    };
    let weights = |rows: &[Vec<ResidualRow>]| -> DVector<f64> {
        let r = rows.iter().flatten().map(|row| row.residual / if row.quantity == "time_aloft_s" { spec.time_sd_s } else { spec.position_sd_m });
        DVector::from_iterator(rows.iter().map(Vec::len).sum(), r)
    };
    let batch = |points: &[DVector<f64>]| points.iter().map(|p| predict_all(p).map(|rows| weights(&rows))).collect();
    let settings = FitSettings { patience: spec.max_iterations, relative_step: 1e-4, min_step_scale: 1e-2, tolerance: 1e-10 };
    let mut evaluations = 0;
    let (_, j0) = residuals_and_jacobian(&start, &batch, &settings, &mut evaluations)?;
    check_identifiable(&j0, &spec.parameters, spec.max_condition)?;
    let solution = least_squares(start.clone(), &batch, &settings)?;
    check_identifiable(&solution.jacobian, &spec.parameters, spec.max_condition)?;
    let (m, k) = (solution.residuals.len(), start.len());
    let residual_variance = solution.residuals.norm_squared() / (m - k) as f64;
    let inverse = (solution.jacobian.transpose() * &solution.jacobian).try_inverse().ok_or_else(|| StudyError::Unidentifiable {
        coefficient: spec.parameters[0].clone(),
        reason: "JᵀJ is singular at the solution".into(),
    })?;
    let covariance = inverse * residual_variance;
    let parameters = fitted_parameters(spec, &start, &solution.parameters, &covariance)?;
    let correlation = (0..k).map(|a| (0..k).map(|b| covariance[(a, b)] / (covariance[(a, a)] * covariance[(b, b)]).sqrt()).collect()).collect();
    let residuals = predict_all(&solution.parameters)?.into_iter().flatten().collect();
    let flights_flown = (evaluations + solution.evaluations + 1) * flights.len();
    Ok(CalibrationResult { parameters, residuals, residual_variance, correlation, iterations: solution.iterations, flights_flown })
}

fn validate(case: &StudyCase, flights: &[MeasuredFlight], spec: &CalibrationSpec) -> Result<DVector<f64>, StudyError> {
    let invalid = |field: &str, reason: String| Err(StudyError::InvalidSpec { field: field.into(), reason });
    if spec.parameters.is_empty() {
        return invalid("parameters", "name at least one model.* coefficient".into());
    }
    if let Some(p) = spec.parameters.iter().find(|p| !p.starts_with("model.")) {
        input_unit(p)?;
        return invalid("parameters", format!("{p} is not a coefficient (model.*) input"));
    }
    if !(spec.position_sd_m > 0.0 && spec.time_sd_s > 0.0) {
        return invalid("position_sd_m/time_sd_s", "both must be > 0".into());
    }
    let observed: usize = flights.iter().map(|f| 3 * f.observations.len()).sum();
    if observed <= spec.parameters.len() {
        return invalid("flights", format!("{observed} observed quantities cannot fit {} coefficients", spec.parameters.len()));
    }
    let values: Result<Vec<f64>, StudyError> = spec.parameters.iter().map(|p| case.get(p)).collect();
    Ok(DVector::from_vec(values?))
}

fn fitted_parameters(spec: &CalibrationSpec, start: &DVector<f64>, p: &DVector<f64>, covariance: &nalgebra::DMatrix<f64>) -> Result<Vec<FittedParameter>, StudyError> {
    spec.parameters
        .iter()
        .enumerate()
        .map(|(j, name)| {
            let standard_error = covariance[(j, j)].max(0.0).sqrt();
            if standard_error > spec.max_relative_se * p[j].abs() {
                let reason = format!(
                    "fitted {:.4e} ± {:.2e}: the standard error exceeds {:.0} % of the value",
                    p[j],
                    standard_error,
                    100.0 * spec.max_relative_se
                );
                return Err(StudyError::Unidentifiable { coefficient: name.clone(), reason });
            }
            Ok(FittedParameter { name: name.clone(), unit: input_unit(name)?.into(), initial: start[j], value: p[j], standard_error })
        })
        .collect()
}

fn residual_rows(measured: &MeasuredFlight, flight: &Flight) -> Vec<ResidualRow> {
    let row = |quantity: &str, time_s: f64, measured_value: f64, predicted: f64| ResidualRow {
        flight: measured.label.clone(),
        quantity: quantity.into(),
        time_s,
        measured: measured_value,
        predicted,
        residual: predicted - measured_value,
    };
    let mut rows = Vec::new();
    for o in &measured.observations {
        match *o {
            Observation::Landing { time_s, landing_m } => {
                let p = flight.landing_state.position_m;
                rows.push(row("x_m", time_s, landing_m[0], p.x));
                rows.push(row("y_m", time_s, landing_m[1], p.y));
                rows.push(row("time_aloft_s", time_s, time_s, flight.metrics.time_aloft_s));
            }
            Observation::Position { time_s, position_m } => {
                let p = position_at(&flight.samples, time_s);
                for (k, q) in ["x_m", "y_m", "z_m"].iter().enumerate() {
                    rows.push(row(q, time_s, position_m[k], p[k]));
                }
            }
        }
    }
    rows
}

/// Linear interpolation of the samples' positions at `time_s` (clamped to the flight).
fn position_at(samples: &[FlightSample], time_s: f64) -> [f64; 3] {
    let k = samples.partition_point(|s| s.time_s < time_s).clamp(1, samples.len().max(2) - 1);
    let (a, b) = (&samples[k - 1], &samples[k.min(samples.len() - 1)]);
    let span = b.time_s - a.time_s;
    let w = if span > 0.0 { ((time_s - a.time_s) / span).clamp(0.0, 1.0) } else { 0.0 };
    let p = a.position_m + (b.position_m - a.position_m) * w;
    [p.x, p.y, p.z]
}
