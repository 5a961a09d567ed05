//! A bounded Nelder–Mead simplex minimiser: the standard reflection (1), expansion (2),
//! contraction (½) and shrink (½) steps of Nelder & Mead (1965), with every trial point projected
//! onto the box bounds (clamping), which keeps the search inside the bounds.
use serde::{Deserialize, Serialize};

use super::StudyError;

/// Settings of the simplex search.
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
pub struct SimplexSettings {
    /// Initial simplex edge as a share of each bound's width (0 … 1).
    pub initial_step_share: f64,
    /// Stop when the spread of the objective over the simplex falls below this while the
    /// simplex is smaller than 100 × `size_tolerance_share`.
    pub objective_tolerance: f64,
    /// Stop when the simplex is smaller than this share of the bounds' widths.
    pub size_tolerance_share: f64,
    /// Most objective evaluations.
    pub max_evaluations: usize,
}

impl Default for SimplexSettings {
    fn default() -> Self {
        Self { initial_step_share: 0.2, objective_tolerance: 1e-4, size_tolerance_share: 1e-4, max_evaluations: 200 }
    }
}

/// The minimum found.
#[derive(Debug, Clone, PartialEq)]
pub(crate) struct SimplexMinimum {
    pub point: Vec<f64>,
    pub value: f64,
    pub evaluations: usize,
}

/// Minimises `f` inside `bounds` (lo, hi) from `start`. `f` returns Err to abort (cancel).
pub(crate) fn minimise(
    start: &[f64],
    bounds: &[(f64, f64)],
    settings: &SimplexSettings,
    f: &mut dyn FnMut(&[f64]) -> Result<f64, StudyError>,
) -> Result<SimplexMinimum, StudyError> {
    let clamp = |x: Vec<f64>| -> Vec<f64> { x.iter().zip(bounds).map(|(v, (lo, hi))| v.clamp(*lo, *hi)).collect() };
    let n = start.len();
    let evaluations = std::cell::Cell::new(0usize);
    let mut eval = |x: &[f64]| -> Result<f64, StudyError> {
        evaluations.set(evaluations.get() + 1);
        f(x)
    };
    let mut simplex: Vec<(Vec<f64>, f64)> = Vec::with_capacity(n + 1);
    let x0 = clamp(start.to_vec());
    simplex.push((x0.clone(), eval(&x0)?));
    for j in 0..n {
        let (lo, hi) = bounds[j];
        let step = settings.initial_step_share * (hi - lo);
        let mut x = x0.clone();
        x[j] = if x[j] + step <= hi { x[j] + step } else { x[j] - step };
        let x = clamp(x);
        let v = eval(&x)?;
        simplex.push((x, v));
    }
    loop {
        simplex.sort_by(|a, b| a.1.total_cmp(&b.1));
        let spread = simplex[n].1 - simplex[0].1;
        let size = (1..=n).flat_map(|k| (0..n).map(move |j| (k, j))).map(|(k, j)| (simplex[k].0[j] - simplex[0].0[j]).abs() / (bounds[j].1 - bounds[j].0).max(f64::MIN_POSITIVE)).fold(0.0, f64::max);
        let settled = spread.abs() < settings.objective_tolerance && size < 100.0 * settings.size_tolerance_share;
        if settled || size < settings.size_tolerance_share || evaluations.get() + 2 > settings.max_evaluations {
            break;
        }
        let centroid: Vec<f64> = (0..n).map(|j| simplex[..n].iter().map(|s| s.0[j]).sum::<f64>() / n as f64).collect();
        let along = |t: f64| clamp(centroid.iter().zip(&simplex[n].0).map(|(c, w)| c + t * (c - w)).collect());
        let reflected = along(1.0);
        let fr = eval(&reflected)?;
        if fr < simplex[0].1 {
            let expanded = along(2.0);
            let fe = eval(&expanded)?;
            simplex[n] = if fe < fr { (expanded, fe) } else { (reflected, fr) };
        } else if fr < simplex[n - 1].1 {
            simplex[n] = (reflected, fr);
        } else {
            let contracted = if fr < simplex[n].1 { along(0.5) } else { along(-0.5) };
            let fc = eval(&contracted)?;
            if fc < simplex[n].1.min(fr) {
                simplex[n] = (contracted, fc);
            } else {
                let best = simplex[0].0.clone();
                for s in simplex.iter_mut().skip(1) {
                    let x: Vec<f64> = best.iter().zip(&s.0).map(|(b, v)| b + 0.5 * (v - b)).collect();
                    s.1 = eval(&x)?;
                    s.0 = x;
                }
            }
        }
    }
    simplex.sort_by(|a, b| a.1.total_cmp(&b.1));
    let (point, value) = simplex.swap_remove(0);
    Ok(SimplexMinimum { point, value, evaluations: evaluations.get() })
}
