//! Studies: sweeps, dispersion, calibration, optimisation and flight signatures (parallel,
//! seeded, deterministic).
//!
//! Every study runs its flights with rayon in the current thread pool, one closure per index;
//! each index's inputs depend only on the study's settings and the index (random draws come
//! from ChaCha8 seeded with the study seed on stream = index), and summaries are computed after
//! the rows are collected in index order. So results are bitwise identical whatever the number
//! of threads, and [`Shard`]s merged give the single-run result. A [`StudyControl`] carries a
//! cancel flag (checked before every flight) and a progress callback. The engine never prints.
//!
//! Predictions are estimates: see [`SAFETY_CAUTION`].
mod calibrate;
mod case;
mod control;
mod dispersion;
mod error;
mod inputs;
mod least_squares;
mod measured;
mod model;
mod montecarlo;
mod nelder_mead;
mod optimise;
mod outcome;
mod runner;
mod scatter_stats;
mod shard;
mod signature;
mod sweep;
mod zone;

pub use calibrate::{calibrate, CalibrationResult, CalibrationSpec, FittedParameter, ResidualRow};
pub use case::{CaseDisc, StudyCase};
pub use control::StudyControl;
pub use dispersion::{merge_dispersions, run_dispersion, DispersionResult, DispersionSpec, DispersionSummary, Scatter, Spread, ZoneShare};
pub use error::StudyError;
pub use inputs::{changes_body, input_unit, INPUTS};
pub use measured::{parse_measured_flights, MeasuredFlight, Observation};
pub use model::{BaseModel, CaseModel, ModelScale, ScaledModel};
pub use montecarlo::{draw_rng, monte_carlo, DrawOutcome, DrawRow};
pub use nelder_mead::SimplexSettings;
pub use optimise::{optimise, NamedValue, Objective, OptimiseResult, OptimiseSpec, OptimiseVariable};
pub use outcome::{metric_unit, CaseOutcome, METRICS};
pub use scatter_stats::{scatter_stats, symmetric_eigen, Ellipse, ScatterStats, CHI2_2DOF_50, CHI2_2DOF_95};
pub use shard::{merge_rows, Indexed, Shard};
pub use signature::{flight_signature, signature_release, FlightSignature, SignatureThrow, SIGNATURE_ADVANCE_RATIO, SIGNATURE_SCALES, SIGNATURE_SPEEDS_MPS, SIGNATURE_SPIN_ENERGY_SHARE};
pub use sweep::{merge_sweeps, run_sweep, SweepAxis, SweepResult, SweepRow, SweepSpec};
pub use zone::Zone;

/// The caution shown beside any landing-zone output.
pub const SAFETY_CAUTION: &str = "Predictions are estimates. Keep clear of the throwing lane, check landing zones for people and property, and follow local rules and the course designer's safety guidance.";
