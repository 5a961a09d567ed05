//! Typed errors of the study module.
use thiserror::Error;

use crate::{AeroError, AirError, FlightError, GroundError, MassError, ThrowError, WindError};

/// Why a study (or one case of it) could not be computed.
#[derive(Debug, Clone, PartialEq, Error)]
#[non_exhaustive]
pub enum StudyError {
    /// An input name is not one the case knows.
    #[error("unknown input \"{name}\"; known inputs: {known}")]
    UnknownInput {
        /// The name given.
        name: String,
        /// The known names, comma separated.
        known: String,
    },
    /// A metric name is not one the study knows.
    #[error("unknown metric \"{name}\"; known metrics: {known}")]
    UnknownMetric {
        /// The name given.
        name: String,
        /// The known names, comma separated.
        known: String,
    },
    /// The input exists but does not apply to this case (e.g. a layup field of a bare body).
    #[error("input \"{name}\" does not apply here: {reason}")]
    NotApplicable {
        /// The input name.
        name: String,
        /// Why, in words.
        reason: String,
    },
    /// A study setting is out of range or inconsistent.
    #[error("study setting {field}: {reason}")]
    InvalidSpec {
        /// The setting.
        field: String,
        /// What is wrong, with the allowed range.
        reason: String,
    },
    /// The study was stopped through its cancel flag.
    #[error("the study was cancelled after {done} of {total} flights")]
    Cancelled {
        /// Flights finished before the stop.
        done: usize,
        /// Flights planned.
        total: usize,
    },
    /// Shards cannot be merged (missing, repeated or from different studies).
    #[error("shards cannot be merged: {reason}")]
    Shards {
        /// What is wrong.
        reason: String,
    },
    /// The data cannot identify a coefficient of a calibration.
    #[error("the data cannot identify {coefficient}: {reason}")]
    Unidentifiable {
        /// The coefficient's input name.
        coefficient: String,
        /// Why (condition number, relative standard error or no effect on the data).
        reason: String,
    },
    /// Measured-flight CSV text is malformed.
    #[error("measured flights, line {line}, column {column}: {message}")]
    Csv {
        /// 1-based line number.
        line: usize,
        /// 1-based column number (0 when the line as a whole is wrong).
        column: usize,
        /// What is wrong.
        message: String,
    },
    /// A flight failed.
    #[error(transparent)]
    Flight(#[from] FlightError),
    /// Ground play failed.
    #[error(transparent)]
    Ground(#[from] GroundError),
    /// The disc design's mass properties could not be computed.
    #[error(transparent)]
    Mass(#[from] MassError),
    /// The air could not be built.
    #[error(transparent)]
    Air(#[from] AirError),
    /// The wind could not be built.
    #[error(transparent)]
    Wind(#[from] WindError),
    /// An effort could not be turned into a release.
    #[error(transparent)]
    Throw(#[from] ThrowError),
    /// The coefficient set is invalid.
    #[error(transparent)]
    Aero(#[from] AeroError),
}
