//! Optimisation of release inputs (e.g. launch, nose and hyzer angles, any subset, within
//! bounds) to maximise carry or to land (or rest) nearest a target, by the bounded Nelder–Mead
//! simplex of [`SimplexSettings`].
use serde::{Deserialize, Serialize};

use super::nelder_mead::minimise;
use super::{input_unit, CaseOutcome, SimplexSettings, StudyCase, StudyControl, StudyError, SAFETY_CAUTION};

/// A value the optimiser may change, within bounds (in the input's unit).
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct OptimiseVariable {
    /// Input name, e.g. `throw.launch_deg`.
    pub input: String,
    /// Lower bound.
    pub min: f64,
    /// Upper bound.
    pub max: f64,
}

/// What to optimise.
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
#[serde(tag = "kind", rename_all = "snake_case")]
pub enum Objective {
    /// The greatest carry (m).
    MaxCarry,
    /// The least horizontal distance (m) from the landing point, or the rest point when the case
    /// has ground play, to a target (x, y) in m.
    NearestTarget {
        /// Target (x, y), m.
        target_m: [f64; 2],
    },
}

/// An optimisation.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct OptimiseSpec {
    /// The variables (starting from the case's values, clamped to the bounds).
    pub variables: Vec<OptimiseVariable>,
    /// The objective.
    pub objective: Objective,
    /// Simplex settings.
    pub settings: SimplexSettings,
}

/// A named value with its unit.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct NamedValue {
    /// Input name.
    pub name: String,
    /// Unit.
    pub unit: String,
    /// Value.
    pub value: f64,
}

/// The optimum found.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct OptimiseResult {
    /// The optimal values.
    pub optimum: Vec<NamedValue>,
    /// The objective there: carry in m (MaxCarry) or distance to the target in m.
    pub objective_m: f64,
    /// The flight at the optimum.
    pub outcome: CaseOutcome,
    /// Flights flown.
    pub flights: usize,
    /// The safety caution to show beside this output.
    pub caution: String,
}

/// Objective value given to a flight that fails (the search moves away from it).
const FAILED_FLIGHT_PENALTY: f64 = 1e9;

/// Runs the optimisation of `spec` on `case` (sequential: each flight depends on the last).
pub fn optimise(case: &StudyCase, spec: &OptimiseSpec, control: StudyControl<'_>) -> Result<OptimiseResult, StudyError> {
    validate(spec)?;
    let body = case.disc.body()?;
    let start: Vec<f64> = spec.variables.iter().map(|v| case.get(&v.input)).collect::<Result<_, _>>()?;
    let bounds: Vec<(f64, f64)> = spec.variables.iter().map(|v| (v.min, v.max)).collect();
    let run = |x: &[f64]| -> Result<CaseOutcome, StudyError> {
        let mut trial = case.clone();
        for (v, value) in spec.variables.iter().zip(x) {
            trial.set(&v.input, *value)?;
        }
        trial.run_with_body(&body)
    };
    let score = |outcome: &CaseOutcome| match spec.objective {
        Objective::MaxCarry => -outcome.metrics.carry_m,
        Objective::NearestTarget { target_m } => {
            let p = outcome.rest_m.unwrap_or_else(|| outcome.landing_m());
            (p[0] - target_m[0]).hypot(p[1] - target_m[1])
        }
    };
    let mut flown = 0;
    let mut objective = |x: &[f64]| -> Result<f64, StudyError> {
        if control.cancelled() {
            return Err(StudyError::Cancelled { done: flown, total: spec.settings.max_evaluations });
        }
        flown += 1;
        let value = run(x).map_or(FAILED_FLIGHT_PENALTY, |o| score(&o));
        if let Some(progress) = control.progress {
            progress(flown, spec.settings.max_evaluations);
        }
        Ok(value)
    };
    let minimum = minimise(&start, &bounds, &spec.settings, &mut objective)?;
    let outcome = run(&minimum.point)?;
    let optimum = spec
        .variables
        .iter()
        .zip(&minimum.point)
        .map(|(v, value)| Ok(NamedValue { name: v.input.clone(), unit: input_unit(&v.input)?.into(), value: *value }))
        .collect::<Result<_, StudyError>>()?;
    let objective_m = score(&outcome).abs();
    Ok(OptimiseResult { optimum, objective_m, outcome, flights: minimum.evaluations + 1, caution: SAFETY_CAUTION.into() })
}

fn validate(spec: &OptimiseSpec) -> Result<(), StudyError> {
    if spec.variables.is_empty() {
        return Err(StudyError::InvalidSpec { field: "variables".into(), reason: "name at least one input to optimise".into() });
    }
    for v in &spec.variables {
        input_unit(&v.input)?;
        if !(v.min.is_finite() && v.max.is_finite() && v.min < v.max) {
            let reason = format!("bounds {} … {} must be finite with min < max", v.min, v.max);
            return Err(StudyError::InvalidSpec { field: v.input.clone(), reason });
        }
    }
    Ok(())
}
