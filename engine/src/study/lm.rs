//! A small Levenberg–Marquardt least-squares solver on nalgebra (Marquardt's diagonal scaling,
//! forward-difference Jacobian), with the identifiability checks of a calibration.
//!
//! Written here rather than taken from the `levenberg-marquardt` crate so the residuals of all
//! perturbed parameters can be flown in one parallel batch and cancelled between flights.
use nalgebra::{DMatrix, DVector, SymmetricEigen};

use super::StudyError;

/// Settings of the solver.
#[derive(Debug, Clone, Copy, PartialEq)]
pub(crate) struct LmSettings {
    pub max_iterations: usize,
    /// Relative step of the forward differences (times max(|p|, `min_step_scale`)).
    pub relative_step: f64,
    pub min_step_scale: f64,
    /// Stop when the sum of squares falls by less than this share.
    pub tolerance: f64,
}

/// The solution: parameters, weighted residuals and Jacobian at the solution, iterations and
/// residual evaluations used.
pub(crate) struct LmSolution {
    pub parameters: DVector<f64>,
    pub residuals: DVector<f64>,
    pub jacobian: DMatrix<f64>,
    pub iterations: usize,
    pub evaluations: usize,
}

/// Evaluates the weighted residuals at several parameter vectors (one batch, may run in
/// parallel).
pub(crate) type Batch<'a> = dyn Fn(&[DVector<f64>]) -> Result<Vec<DVector<f64>>, StudyError> + 'a;

/// Minimises |r(p)|² from `start`.
pub(crate) fn levenberg_marquardt(start: DVector<f64>, batch: &Batch<'_>, settings: &LmSettings) -> Result<LmSolution, StudyError> {
    let mut p = start;
    let mut evaluations = 0;
    let (mut r, mut jacobian) = residuals_and_jacobian(&p, batch, settings, &mut evaluations)?;
    let mut lambda = 1e-3;
    let mut iterations = 0;
    while iterations < settings.max_iterations {
        iterations += 1;
        let a = jacobian.transpose() * &jacobian;
        let g = jacobian.transpose() * &r;
        let cost = r.norm_squared();
        let mut improved = None;
        for _ in 0..12 {
            let mut damped = a.clone();
            for j in 0..p.len() {
                damped[(j, j)] += lambda * a[(j, j)].max(1e-12);
            }
            let Some(step) = damped.cholesky().map(|c| c.solve(&g)) else {
                lambda *= 10.0;
                continue;
            };
            let trial = &p - &step;
            evaluations += 1;
            let trial_r = batch(std::slice::from_ref(&trial))?.remove(0);
            if trial_r.norm_squared() < cost {
                improved = Some((trial, trial_r));
                lambda = (lambda / 3.0).max(1e-12);
                break;
            }
            lambda *= 4.0;
        }
        let Some((trial, trial_r)) = improved else { break };
        let decrease = (cost - trial_r.norm_squared()) / cost.max(f64::MIN_POSITIVE);
        p = trial;
        (r, jacobian) = residuals_and_jacobian(&p, batch, settings, &mut evaluations)?;
        if decrease < settings.tolerance {
            break;
        }
    }
    Ok(LmSolution { parameters: p, residuals: r, jacobian, iterations, evaluations })
}

/// Residuals at p and the forward-difference Jacobian ∂r/∂p, in one batch of k + 1 evaluations.
pub(crate) fn residuals_and_jacobian(
    p: &DVector<f64>,
    batch: &Batch<'_>,
    settings: &LmSettings,
    evaluations: &mut usize,
) -> Result<(DVector<f64>, DMatrix<f64>), StudyError> {
    let steps: Vec<f64> = p.iter().map(|v| settings.relative_step * v.abs().max(settings.min_step_scale)).collect();
    let mut points = vec![p.clone()];
    for (j, h) in steps.iter().enumerate() {
        let mut q = p.clone();
        q[j] += h;
        points.push(q);
    }
    let mut values = batch(&points)?;
    *evaluations += values.len();
    let r0 = values.remove(0);
    let mut jacobian = DMatrix::zeros(r0.len(), p.len());
    for (j, (rj, h)) in values.iter().zip(&steps).enumerate() {
        jacobian.set_column(j, &((rj - &r0) / *h));
    }
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
