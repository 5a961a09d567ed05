//! Nonlinear least squares for calibrations: the `levenberg-marquardt` crate (a port of
//! MINPACK's `lmder`, with Moré's trust-region step and diagonal scaling) on the workspace's
//! nalgebra, fed with residuals flown in parallel batches and a forward-difference Jacobian,
//! plus the identifiability checks of a calibration.
//!
//! The crate asks for residuals and the Jacobian one at a time through
//! [`LeastSquaresProblem`]; each request here is one batch of flights (the k perturbed
//! parameter vectors of the Jacobian fly together, in parallel). A failed or cancelled batch
//! makes the request return `None`, which stops the solver; the stored error is returned.
use std::cell::{Cell, RefCell};

use levenberg_marquardt::{LeastSquaresProblem, LevenbergMarquardt, TerminationReason};
use nalgebra::storage::Owned;
use nalgebra::{DMatrix, DVector, Dyn, SymmetricEigen};

use super::StudyError;

/// Settings of the solver.
#[derive(Debug, Clone, Copy, PartialEq)]
pub(crate) struct FitSettings {
    /// Patience: the solver may evaluate at most patience × (k + 1) trial points for its
    /// steps (MINPACK's maxfev); the Jacobians' forward differences come on top.
    pub patience: usize,
    /// Relative step of the forward differences (times max(|p|, `min_step_scale`)).
    pub relative_step: f64,
    /// Smallest parameter scale of a forward-difference step.
    pub min_step_scale: f64,
    /// Relative tolerance on the sum of squares and on the parameters (MINPACK's ftol, xtol).
    pub tolerance: f64,
}

/// The solution: parameters, weighted residuals and Jacobian at the solution, Jacobians
/// computed (one per iteration) and residual evaluations (batches) used.
pub(crate) struct FitSolution {
    pub parameters: DVector<f64>,
    pub residuals: DVector<f64>,
    pub jacobian: DMatrix<f64>,
    pub iterations: usize,
    pub evaluations: usize,
}

/// Evaluates the weighted residuals at several parameter vectors (one batch, may run in
/// parallel).
pub(crate) type Batch<'a> = dyn Fn(&[DVector<f64>]) -> Result<Vec<DVector<f64>>, StudyError> + 'a;

/// Minimises |r(p)|² from `start` with the `levenberg-marquardt` crate.
pub(crate) fn least_squares(start: DVector<f64>, batch: &Batch<'_>, settings: &FitSettings) -> Result<FitSolution, StudyError> {
    let problem = Problem { p: start, batch, settings: *settings, last: RefCell::new(None), error: RefCell::new(None), evaluations: Cell::new(0), jacobians: Cell::new(0) };
    let patience = settings.patience.max(1);
    let solver = LevenbergMarquardt::new().with_ftol(settings.tolerance).with_xtol(settings.tolerance).with_gtol(0.0).with_patience(patience);
    let (problem, report) = solver.minimize(problem);
    if let Some(error) = problem.error.take() {
        return Err(error);
    }
    match report.termination {
        TerminationReason::Numerical(what) | TerminationReason::WrongDimensions(what) | TerminationReason::User(what) => {
            let reason = format!("the fit stopped on a non-finite or malformed {what}; start nearer plausible values");
            return Err(StudyError::InvalidSpec { field: "parameters".into(), reason });
        }
        _ => {}
    }
    let mut evaluations = problem.evaluations.get();
    let parameters = problem.p.clone();
    let (residuals, jacobian) = residuals_and_jacobian(&parameters, batch, settings, &mut evaluations)?;
    Ok(FitSolution { parameters, residuals, jacobian, iterations: problem.jacobians.get(), evaluations })
}

/// The calibration as the crate sees it: parameters, the batch that flies them, a cache of
/// the last residuals (the crate asks for the Jacobian right after the residuals at the same
/// point) and the first error met.
struct Problem<'a> {
    p: DVector<f64>,
    batch: &'a Batch<'a>,
    settings: FitSettings,
    last: RefCell<Option<(DVector<f64>, DVector<f64>)>>,
    error: RefCell<Option<StudyError>>,
    evaluations: Cell<usize>,
    jacobians: Cell<usize>,
}

impl Problem<'_> {
    fn fly(&self, points: &[DVector<f64>]) -> Option<Vec<DVector<f64>>> {
        if self.error.borrow().is_some() {
            return None;
        }
        self.evaluations.set(self.evaluations.get() + points.len());
        match (self.batch)(points) {
            Ok(values) => Some(values),
            Err(e) => {
                *self.error.borrow_mut() = Some(e);
                None
            }
        }
    }

    fn residuals_here(&self) -> Option<DVector<f64>> {
        if let Some((_, r)) = self.last.borrow().as_ref().filter(|(p, _)| *p == self.p) {
            return Some(r.clone());
        }
        let r = match self.fly(std::slice::from_ref(&self.p)) {
            Some(mut values) => values.remove(0),
            None => self.penalty()?,
        };
        *self.last.borrow_mut() = Some((self.p.clone(), r.clone()));
        Some(r)
    }

    /// A trial step whose flights fail (coefficients so far off that a flight cannot be
    /// integrated) gets residuals far worse than any flown point, so the solver rejects it and
    /// shrinks its step, instead of stopping. Cancellation and failures at accepted points
    /// still stop the fit.
    fn penalty(&self) -> Option<DVector<f64>> {
        let flight_failed = matches!(self.error.borrow().as_ref(), Some(StudyError::Flight(_)));
        let previous = self.last.borrow().as_ref().map(|(_, r)| r.clone())?;
        if !flight_failed {
            return None;
        }
        self.error.borrow_mut().take();
        let worst = previous.amax().max(1.0);
        Some(DVector::from_element(previous.len(), 1e3 * worst))
    }
}

impl LeastSquaresProblem<f64, Dyn, Dyn> for Problem<'_> {
    type ResidualStorage = Owned<f64, Dyn>;
    type JacobianStorage = Owned<f64, Dyn, Dyn>;
    type ParameterStorage = Owned<f64, Dyn>;

    fn set_params(&mut self, x: &DVector<f64>) {
        self.p.copy_from(x);
    }

    fn params(&self) -> DVector<f64> {
        self.p.clone()
    }

    fn residuals(&self) -> Option<DVector<f64>> {
        self.residuals_here()
    }

    fn jacobian(&self) -> Option<DMatrix<f64>> {
        let r0 = self.residuals_here()?;
        let (steps, points) = perturbed(&self.p, &self.settings);
        let values = self.fly(&points)?;
        self.jacobians.set(self.jacobians.get() + 1);
        Some(difference_jacobian(&r0, &values, &steps))
    }
}

/// Forward-difference steps and the perturbed parameter vectors.
fn perturbed(p: &DVector<f64>, settings: &FitSettings) -> (Vec<f64>, Vec<DVector<f64>>) {
    let steps: Vec<f64> = p.iter().map(|v| settings.relative_step * v.abs().max(settings.min_step_scale)).collect();
    let points = steps
        .iter()
        .enumerate()
        .map(|(j, h)| {
            let mut q = p.clone();
            q[j] += h;
            q
        })
        .collect();
    (steps, points)
}

fn difference_jacobian(r0: &DVector<f64>, values: &[DVector<f64>], steps: &[f64]) -> DMatrix<f64> {
    let mut jacobian = DMatrix::zeros(r0.len(), steps.len());
    for (j, (rj, h)) in values.iter().zip(steps).enumerate() {
        jacobian.set_column(j, &((rj - r0) / *h));
    }
    jacobian
}

/// Residuals at p and the forward-difference Jacobian ∂r/∂p, in one batch of k + 1 evaluations.
pub(crate) fn residuals_and_jacobian(
    p: &DVector<f64>,
    batch: &Batch<'_>,
    settings: &FitSettings,
    evaluations: &mut usize,
) -> Result<(DVector<f64>, DMatrix<f64>), StudyError> {
    let (steps, perturbed) = perturbed(p, settings);
    let mut points = vec![p.clone()];
    points.extend(perturbed);
    let mut values = batch(&points)?;
    *evaluations += values.len();
    let r0 = values.remove(0);
    let jacobian = difference_jacobian(&r0, &values, &steps);
    Ok((r0, jacobian))
}

/// Checks that JᵀJ identifies every parameter: each column must move the data, and the
/// column-scaled JᵀJ must have a condition number below `max_condition`. Names the culprit.
pub(crate) fn check_identifiable(jacobian: &DMatrix<f64>, names: &[String], max_condition: f64) -> Result<(), StudyError> {
    let norms: Vec<f64> = jacobian.column_iter().map(|c| c.norm()).collect();
    let largest = norms.iter().copied().fold(0.0, f64::max);
    if let Some(j) = norms.iter().position(|&n| n <= 1e-9 * largest || n == 0.0) {
        let reason = "changing it has no effect on the predicted observations".to_string();
        return Err(StudyError::Unidentifiable { coefficient: names[j].clone(), reason });
    }
    let scale = DMatrix::from_diagonal(&DVector::from_iterator(norms.len(), norms.iter().map(|n| 1.0 / n)));
    let scaled = &scale * (jacobian.transpose() * jacobian) * &scale;
    let eigen = SymmetricEigen::new(scaled);
    let (mut lo, mut hi) = (0, 0);
    for (k, v) in eigen.eigenvalues.iter().enumerate() {
        if *v < eigen.eigenvalues[lo] {
            lo = k;
        }
        if *v > eigen.eigenvalues[hi] {
            hi = k;
        }
    }
    let condition = eigen.eigenvalues[hi] / eigen.eigenvalues[lo].max(f64::MIN_POSITIVE);
    if condition > max_condition {
        let vector = eigen.eigenvectors.column(lo);
        let mut order: Vec<usize> = (0..vector.len()).collect();
        order.sort_by(|a, b| vector[*b].abs().total_cmp(&vector[*a].abs()));
        let partner = order.get(1).map_or(String::new(), |k| format!(" with {}", names[*k]));
        let reason = format!("its effect on the data is (nearly) the same as a combination{partner} (condition number {condition:.3e} > {max_condition:.1e})");
        return Err(StudyError::Unidentifiable { coefficient: names[order[0]].clone(), reason });
    }
    Ok(())
}
