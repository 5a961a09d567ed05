use nalgebra::Vector3;
use serde::{Deserialize, Serialize};

use crate::aero::{AeroModel, ModelInfo};
use crate::dynamics::{DiscBody, DiscState};
use crate::throw::ReleaseState;

use super::metrics::{flight_metrics, MetricsFrame};
use super::release::initial_state;
use super::sample::SampleContext;
use super::trajectory::{integrate, Trajectory};
use super::{FlightConditions, FlightError, FlightMetrics, FlightSample, FlightSettings};

/// A computed flight: sampled trajectory, metrics, and how it ended.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct Flight {
    /// Trajectory samples every [`FlightSettings::sample_interval_s`] from release, plus the
    /// landing instant as the last sample (empty when `record_samples` is false).
    pub samples: Vec<FlightSample>,
    /// Summary numbers (see [`FlightMetrics`] for the definitions).
    pub metrics: FlightMetrics,
    /// The release it was flown from.
    pub release: ReleaseState,
    /// Name, source and confidence of the coefficient set it was flown with.
    pub model: ModelInfo,
    /// True when the flight ended by ground contact of the rim; false when it reached
    /// [`FlightSettings::max_time_s`] with `end_at_time_limit` set.
    pub landed: bool,
    /// State at release (projected), world frame.
    pub release_state: DiscState,
    /// State at the end of the flight (landing), world frame.
    pub landing_state: DiscState,
    /// Solver work: derivative evaluations.
    pub derivative_evaluations: u32,
    /// Solver work: accepted steps.
    pub accepted_steps: u32,
    /// Solver work: rejected steps.
    pub rejected_steps: u32,
}

/// Flies a disc from its release until the rim first touches the ground (z = 0).
///
/// Validates the body, the release, the conditions and the settings first (typed errors naming
/// field, value and range); integration failures name the time and the quantity.
pub fn fly(
    body: &DiscBody,
    model: &dyn AeroModel,
    release: &ReleaseState,
    conditions: &FlightConditions,
    settings: &FlightSettings,
) -> Result<Flight, FlightError> {
    body.validate()?;
    conditions.validate()?;
    settings.validate()?;
    let initial = initial_state(body, release)?;
    let trajectory = integrate(body, model, conditions, settings, initial)?;
    let frame = MetricsFrame { heading_rad: release.heading_rad, fade_side: release.fade_side() };
    let metrics = flight_metrics(&trajectory, body, &frame);
    let context = SampleContext {
        body,
        fade_side: release.fade_side(),
        fallback_forward: Vector3::new(release.heading_rad.cos(), release.heading_rad.sin(), 0.0),
    };
    let samples = if settings.record_samples { record_samples(&trajectory, &context, conditions, settings) } else { Vec::new() };
    let (derivative_evaluations, accepted_steps, rejected_steps) = trajectory.stats;
    Ok(Flight {
        samples,
        metrics,
        release: *release,
        model: model.info(),
        landed: trajectory.landed,
        release_state: trajectory.state_at(0.0),
        landing_state: trajectory.state_at(trajectory.end_time_s),
        derivative_evaluations,
        accepted_steps,
        rejected_steps,
    })
}

fn record_samples(
    trajectory: &Trajectory,
    context: &SampleContext,
    conditions: &FlightConditions,
    settings: &FlightSettings,
) -> Vec<FlightSample> {
    let end = trajectory.end_time_s;
    let count = (end / settings.sample_interval_s).floor() as usize;
    let mut times: Vec<f64> = (0..=count).map(|k| k as f64 * settings.sample_interval_s).filter(|&t| t < end).collect();
    times.push(end);
    times
        .into_iter()
        .map(|t| {
            let state = trajectory.state_at(t);
            let wind = conditions.wind.velocity_mps(&state.position_m, t);
            context.sample(t, &state, &wind)
        })
        .collect()
}
