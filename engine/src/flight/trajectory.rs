//! Running the solver: the dense solution of one flight, up to its landing.
use std::cell::{Cell, RefCell};

use ode_solvers::continuous_output_model::ContinuousOutputModel;
use ode_solvers::dop_shared::IntegrationError;
use ode_solvers::{Dopri5, OutputType};

use crate::aero::AeroModel;
use crate::dynamics::{DiscBody, DiscState, StateVector};

use super::system::{FlightSystem, StopReason};
use super::{FlightConditions, FlightError, FlightSettings};

/// The solved flight: the dense output of every accepted step, from release to its end.
pub(crate) struct Trajectory {
    dense: ContinuousOutputModel<f64, StateVector>,
    initial: DiscState,
    /// The solver's last state, for times at the very end that rounding puts past the dense
    /// output's last breakpoint.
    last: DiscState,
    /// Times of the accepted steps' ends (s), ascending, all < `end_time_s` after landing.
    pub step_times_s: Vec<f64>,
    /// The solver's states at `step_times_s` (not projected).
    pub step_states: Vec<StateVector>,
    /// End of the flight (landing or time limit), s.
    pub end_time_s: f64,
    /// True when the flight ended by ground contact.
    pub landed: bool,
    /// Solver statistics: (derivative evaluations, accepted steps, rejected steps).
    pub stats: (u32, u32, u32),
}

impl Trajectory {
    /// The projected state at `t` (s), clamped to the flight's span.
    pub fn state_at(&self, t: f64) -> DiscState {
        if t <= 0.0 {
            return self.initial;
        }
        let t = t.min(self.end_time_s);
        match self.dense.evaluate(t) {
            Some(y) => DiscState::from_vector(&y).projected(),
            None => self.last,
        }
    }
}

/// Integrates from `initial` until ground contact (located by bisection) or the time limit.
pub(crate) fn integrate(
    body: &DiscBody,
    model: &dyn AeroModel,
    conditions: &FlightConditions,
    settings: &FlightSettings,
    initial: DiscState,
) -> Result<Trajectory, FlightError> {
    let non_finite = Cell::new(None);
    let stop = Cell::new(None);
    let steps = RefCell::new((Vec::with_capacity(1024), Vec::with_capacity(1024)));
    let system = FlightSystem { body, model, conditions, settings, non_finite: &non_finite, stop: &stop, steps: &steps };
    let mut solver = new_solver(system, settings, initial.to_vector());
    let mut dense = ContinuousOutputModel::default();
    let outcome = solver.integrate_with_continuous_output_model(&mut dense);
    if let Some((time_s, quantity)) = non_finite.get() {
        return Err(FlightError::NonFinite { time_s, quantity });
    }
    let stats = outcome.map_err(|e| solver_error(e, settings))?;
    let (step_times_s, step_states) = steps.take();
    let last = step_states.last().map_or(initial, |y| DiscState::from_vector(y).projected());
    let trajectory = Trajectory {
        dense,
        initial,
        last,
        step_times_s,
        step_states,
        end_time_s: settings.max_time_s,
        landed: false,
        stats: (stats.num_eval, stats.accepted_steps, stats.rejected_steps),
    };
    finish(trajectory, stop.take(), body.radius_m(), settings)
}

/// Ends the trajectory according to why the solver stopped.
fn finish(
    mut trajectory: Trajectory,
    stop: Option<StopReason>,
    radius_m: f64,
    settings: &FlightSettings,
) -> Result<Trajectory, FlightError> {
    match stop {
        Some(StopReason::Failed(error)) => Err(error),
        Some(StopReason::GroundContact) => {
            let after = trajectory.step_times_s.pop().unwrap_or(0.0);
            trajectory.step_states.pop();
            let before = trajectory.step_times_s.last().copied().unwrap_or(0.0);
            trajectory.end_time_s = after;
            trajectory.end_time_s = locate_contact(&trajectory, radius_m, before, after, settings);
            trajectory.landed = true;
            Ok(trajectory)
        }
        None if settings.end_at_time_limit => Ok(trajectory),
        None => Err(FlightError::NoLanding { max_time_s: settings.max_time_s }),
    }
}

fn new_solver<'a>(
    system: FlightSystem<'a>,
    settings: &FlightSettings,
    y0: StateVector,
) -> Dopri5<f64, StateVector, FlightSystem<'a>> {
    let t_end = settings.max_time_s;
    // Stiffness detection is switched off (n_stiff = u32::MAX): the flight equations are not
    // stiff, and the solver's heuristic misreads fast nutation of a wobbling disc as stiffness.
    Dopri5::from_param(
        system,
        0.0,
        t_end,
        t_end,
        y0,
        settings.relative_tolerance,
        settings.absolute_tolerance,
        0.9,  // safety factor (solver default)
        0.04, // PI controller β (solver default)
        0.2,  // smallest step ratio (solver default)
        10.0, // largest step ratio (solver default)
        t_end,
        0.0, // initial step chosen by the solver
        settings.max_steps,
        u32::MAX,
        OutputType::Continuous,
    )
}

fn solver_error(error: IntegrationError, settings: &FlightSettings) -> FlightError {
    match error {
        IntegrationError::MaxNumStepReached { x, .. } => FlightError::TooManySteps { time_s: x, max_steps: settings.max_steps },
        IntegrationError::StepSizeUnderflow { x } => FlightError::StepCollapsed { time_s: x, detail: "step size underflow".into() },
        IntegrationError::StiffnessDetected { x } => FlightError::StepCollapsed { time_s: x, detail: "stiffness detected".into() },
    }
}

/// Bisection on the dense output for z_low(t) = 0 in [before, after], where z_low(before) ≥ 0
/// and z_low(after) < 0. Returns the last time found with the rim at or above the ground.
fn locate_contact(trajectory: &Trajectory, radius_m: f64, before: f64, after: f64, settings: &FlightSettings) -> f64 {
    let height = |t: f64| trajectory.state_at(t).lowest_rim_height_m(radius_m);
    let (mut lo, mut hi) = (before, after);
    if height(lo) < 0.0 {
        return lo;
    }
    while hi - lo > settings.landing_time_tolerance_s {
        let mid = 0.5 * (lo + hi);
        if mid <= lo || mid >= hi {
            break;
        }
        if height(mid) >= 0.0 {
            lo = mid;
        } else {
            hi = mid;
        }
    }
    // the nearer end to the zero crossing, by linear interpolation of the final bracket
    let (h_lo, h_hi) = (height(lo), height(hi));
    if h_lo - h_hi > 0.0 { lo + (hi - lo) * h_lo / (h_lo - h_hi) } else { lo }
}
