//! The flight as an ODE system for `ode_solvers`: derivative, stop test and guards.
use std::cell::{Cell, RefCell};

use nalgebra::Vector3;
use ode_solvers::System;

use crate::aero::{aero_loads, AeroModel};
use crate::dynamics::{state_derivative, DiscBody, DiscState, Loads, StateVector};

use super::{FlightConditions, FlightError, FlightSettings};

/// Why the solver was stopped before the time limit.
#[derive(Debug, Clone, PartialEq)]
pub(crate) enum StopReason {
    /// The lowest rim point went below the ground at the end of the last step.
    GroundContact,
    /// A guard tripped.
    Failed(FlightError),
}

/// The disc's flight as seen by the solver.
pub(crate) struct FlightSystem<'a> {
    pub body: &'a DiscBody,
    pub model: &'a dyn AeroModel,
    pub conditions: &'a FlightConditions,
    pub settings: &'a FlightSettings,
    /// First non-finite quantity met inside a derivative evaluation (time, name).
    pub non_finite: &'a Cell<Option<(f64, &'static str)>>,
    /// Set by `solout` when it stops the integration.
    pub stop: &'a Cell<Option<StopReason>>,
    /// Every accepted step's end, recorded by `solout`: (times s, unprojected states). The same
    /// points as the solver's own `x_out`/`y_out`, kept here so they need not be copied out.
    pub steps: &'a RefCell<(Vec<f64>, Vec<StateVector>)>,
}

impl FlightSystem<'_> {
    /// Aerodynamic loads on a projected state at time `t` (s).
    pub fn loads(&self, t: f64, state: &DiscState) -> Loads {
        let wind = self.conditions.wind.velocity_mps(&state.position_m, t);
        let air_velocity = state.velocity_mps - wind;
        let omega = state.angular_velocity_rad_s();
        let aero = aero_loads(
            self.model,
            &self.conditions.air,
            self.body.diameter_m,
            &air_velocity,
            &state.normal,
            &omega,
            state.spin_rad_s,
        );
        Loads { force_n: aero.force_n, moment_nm: aero.moment_nm }
    }

    fn note_non_finite(&self, t: f64, quantity: &'static str) {
        if self.non_finite.get().is_none() {
            self.non_finite.set(Some((t, quantity)));
        }
    }

    /// Checks a stepped state against the guards; `None` when it may go on.
    fn guard(&self, t: f64, state: &DiscState) -> Option<FlightError> {
        if !state.is_finite() {
            return Some(FlightError::NonFinite { time_s: t, quantity: non_finite_part(state) });
        }
        let speed = state.velocity_mps.norm();
        if speed > self.settings.max_speed_mps {
            return Some(diverged(t, "speed (m/s)", speed, self.settings.max_speed_mps));
        }
        let rate = state.spin_rad_s.abs().max(state.normal_rate_per_s.norm());
        if rate > self.settings.max_angular_rate_rad_s {
            return Some(diverged(t, "angular rate (rad/s)", rate, self.settings.max_angular_rate_rad_s));
        }
        None
    }
}

fn diverged(time_s: f64, quantity: &'static str, value: f64, limit: f64) -> FlightError {
    FlightError::Diverged { time_s, quantity, value, limit }
}

/// Names the first non-finite part of a state.
pub(crate) fn non_finite_part(state: &DiscState) -> &'static str {
    let bad = |v: &Vector3<f64>| v.iter().any(|x| !x.is_finite());
    if bad(&state.position_m) {
        "position"
    } else if bad(&state.velocity_mps) {
        "velocity"
    } else if bad(&state.normal) || bad(&state.normal_rate_per_s) {
        "attitude (normal or its rate)"
    } else {
        "spin"
    }
}

impl System<f64, StateVector> for FlightSystem<'_> {
    fn system(&self, t: f64, y: &StateVector, dy: &mut StateVector) {
        let state = DiscState::from_vector(y).projected();
        let loads = self.loads(t, &state);
        if !loads.force_n.iter().all(|x| x.is_finite()) {
            self.note_non_finite(t, "aerodynamic force");
        } else if !loads.moment_nm.iter().all(|x| x.is_finite()) {
            self.note_non_finite(t, "aerodynamic moment");
        }
        *dy = state_derivative(self.body, &state, &loads, self.conditions.gravity_mps2);
    }

    fn solout(&mut self, t: f64, y: &StateVector, _dy: &StateVector) -> bool {
        {
            let mut steps = self.steps.borrow_mut();
            steps.0.push(t);
            steps.1.push(*y);
        }
        let state = DiscState::from_vector(y).projected();
        if let Some(error) = self.guard(t, &state) {
            self.stop.set(Some(StopReason::Failed(error)));
            return true;
        }
        if state.lowest_rim_height_m(self.body.radius_m()) < 0.0 {
            self.stop.set(Some(StopReason::GroundContact));
            return true;
        }
        false
    }
}
