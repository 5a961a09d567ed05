use thiserror::Error;

use crate::flight::FlightError;

/// Everything that can go wrong when describing the ground or playing a landing out on it.
///
/// Each variant names the offending value and the allowed range.
#[derive(Debug, Clone, PartialEq, Error)]
#[non_exhaustive]
pub enum GroundError {
    /// The slope of the ground plane is steeper than the model supports.
    #[error("ground slope {slope_deg:.2}° is steeper than the supported limit of {max_deg:.0}° (the contact model assumes a playable field; allowed range 0° to {max_deg:.0}°)")]
    SlopeTooSteep {
        /// The requested slope, degrees.
        slope_deg: f64,
        /// The largest supported slope, degrees.
        max_deg: f64,
    },
    /// A negative slope angle (the downhill direction carries the sign instead).
    #[error("ground slope {slope_deg:.2}° is negative; give a slope in 0° to {max_deg:.0}° and set the downhill direction instead")]
    NegativeSlope {
        /// The requested slope, degrees.
        slope_deg: f64,
        /// The largest supported slope, degrees.
        max_deg: f64,
    },
    /// A negative Coulomb friction coefficient.
    #[error("friction coefficient {value} is out of range: it must be ≥ 0 (Coulomb μ, dimensionless)")]
    FrictionOutOfRange {
        /// The rejected value.
        value: f64,
    },
    /// A coefficient of restitution outside [0, 1].
    #[error("coefficient of restitution {value} is out of range: it must lie in [0, 1] (0 = no rebound, 1 = elastic)")]
    RestitutionOutOfRange {
        /// The rejected value.
        value: f64,
    },
    /// A negative rolling (ploughing) resistance coefficient.
    #[error("rolling resistance coefficient {value} is out of range: it must be ≥ 0 (dimensionless)")]
    RollingResistanceOutOfRange {
        /// The rejected value.
        value: f64,
    },
    /// A quantity that must be finite was NaN or infinite.
    #[error("{quantity} is not a finite number ({value})")]
    NotFinite {
        /// What the number describes, with its unit.
        quantity: &'static str,
        /// The rejected value.
        value: f64,
    },
    /// A quantity that must be strictly positive was zero or negative.
    #[error("{quantity} must be > 0, got {value}")]
    NotPositive {
        /// What the number describes, with its unit.
        quantity: &'static str,
        /// The rejected value.
        value: f64,
    },
    /// The disc's symmetry axis has (near) zero length, so no attitude is defined.
    #[error("the disc axis n has length {length}; it must be a non-zero vector")]
    ZeroAxis {
        /// The length of the given axis vector.
        length: f64,
    },
    /// An unknown surface preset name.
    #[error("unknown ground surface '{name}'; known surfaces: {known}")]
    UnknownSurface {
        /// The name given.
        name: String,
        /// The names that exist, comma separated.
        known: String,
    },
    /// The impact integration did not finish within its step budget.
    #[error("the impact at t = {time_s:.4} s did not converge within {steps} impulse steps")]
    ImpactDidNotConverge {
        /// Ground-phase time of the impact, s.
        time_s: f64,
        /// The number of steps taken.
        steps: usize,
    },
    /// The flight before the ground phase failed.
    #[error(transparent)]
    Flight(#[from] FlightError),
    /// The flight reached its time limit without touching the ground.
    #[error("the flight did not reach the ground within {time_s:.2} s, so there is no ground play")]
    FlightDidNotLand {
        /// Time aloft when the flight stopped, s.
        time_s: f64,
    },
    /// At the flight's landing (level ground at z = 0) the rim is already below the ground
    /// plane: the plane lies above z = 0 there and would have been hit earlier.
    #[error("the ground plane lies {depth_m:.3} m above the flight's landing point (rim contact at z = 0); raised or uphill ground is not yet supported by the flight's landing event")]
    GroundAboveLanding {
        /// How far the rim is below the plane, m.
        depth_m: f64,
    },
    /// The ground-phase state became non-finite.
    #[error("ground play produced a non-finite {quantity} at t = {time_s:.4} s after landing")]
    NonFiniteState {
        /// Which quantity.
        quantity: &'static str,
        /// Ground-phase time, s.
        time_s: f64,
    },
}

/// Returns `value` if it is finite, else [`GroundError::NotFinite`] naming `quantity`.
pub(crate) fn finite(quantity: &'static str, value: f64) -> Result<f64, GroundError> {
    if value.is_finite() {
        Ok(value)
    } else {
        Err(GroundError::NotFinite { quantity, value })
    }
}

/// Returns `value` if it is finite and > 0, else a typed error naming `quantity`.
pub(crate) fn positive(quantity: &'static str, value: f64) -> Result<f64, GroundError> {
    if finite(quantity, value)? > 0.0 {
        Ok(value)
    } else {
        Err(GroundError::NotPositive { quantity, value })
    }
}
