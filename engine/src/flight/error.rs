use thiserror::Error;

use crate::dynamics::BodyError;

/// Why a flight could not be computed.
#[derive(Debug, Clone, PartialEq, Error)]
#[non_exhaustive]
pub enum FlightError {
    /// The disc body is invalid.
    #[error(transparent)]
    InvalidBody(#[from] BodyError),
    /// A release value is non-finite or out of range.
    #[error("release: {field} = {value} is out of range ({range})")]
    InvalidRelease {
        /// Name of the field.
        field: &'static str,
        /// The offending value.
        value: f64,
        /// The allowed range, in words.
        range: &'static str,
    },
    /// A flight condition is non-finite or out of range.
    #[error("flight conditions: {field} = {value} is out of range ({range})")]
    InvalidConditions {
        /// Name of the field.
        field: &'static str,
        /// The offending value.
        value: f64,
        /// The allowed range, in words.
        range: &'static str,
    },
    /// A setting is non-finite or out of range.
    #[error("flight settings: {field} = {value} is out of range ({range})")]
    InvalidSettings {
        /// Name of the field.
        field: &'static str,
        /// The offending value.
        value: f64,
        /// The allowed range, in words.
        range: &'static str,
    },
    /// A quantity became NaN or infinite during integration.
    #[error("the flight diverged at t = {time_s:.6} s: {quantity} became non-finite")]
    NonFinite {
        /// Time since release in s.
        time_s: f64,
        /// Which quantity (e.g. "aerodynamic moment", "velocity").
        quantity: &'static str,
    },
    /// A quantity exceeded its divergence guard ([`super::FlightSettings`]).
    #[error("the flight diverged at t = {time_s:.6} s: {quantity} = {value:.4e} exceeds {limit:.4e}")]
    Diverged {
        /// Time since release in s.
        time_s: f64,
        /// Which quantity (e.g. "speed (m/s)").
        quantity: &'static str,
        /// Its value.
        value: f64,
        /// The guard it exceeded.
        limit: f64,
    },
    /// The adaptive step size collapsed (step size underflow or apparent stiffness).
    #[error("the integrator's step size collapsed at t = {time_s:.6} s ({detail})")]
    StepCollapsed {
        /// Time since release in s.
        time_s: f64,
        /// The solver's own description.
        detail: String,
    },
    /// The solver needed more steps than allowed.
    #[error("more than {max_steps} integration steps were needed (stopped at t = {time_s:.6} s)")]
    TooManySteps {
        /// Time since release in s.
        time_s: f64,
        /// The limit from the settings.
        max_steps: u32,
    },
    /// The disc was still in the air at the time limit.
    #[error("the disc had not landed after {max_time_s} s (raise max_time_s or allow ending at the limit)")]
    NoLanding {
        /// The time limit in s.
        max_time_s: f64,
    },
}
