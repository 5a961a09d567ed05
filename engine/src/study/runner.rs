//! The parallel runner every study uses: one closure per index, rayon, results in index order.
use rayon::prelude::*;

use super::control::Tally;
use super::{StudyControl, StudyError};

/// Evaluates `f` at each of `indices` in parallel (rayon's current pool) and returns the results
/// in the order of `indices`. The cancel flag is checked before each evaluation; progress is
/// reported after each. Results depend only on the index, never on the thread that ran it.
pub(crate) fn run_indexed<T, F>(indices: &[usize], control: StudyControl<'_>, f: F) -> Result<Vec<T>, StudyError>
where
    T: Send,
    F: Fn(usize) -> T + Sync,
{
    let tally = Tally::new(control, indices.len());
    let results: Result<Vec<T>, StudyError> = indices
        .par_iter()
        .map(|&k| {
            tally.check()?;
            let value = f(k);
            tally.finished_one();
            Ok(value)
        })
        .collect();
    results
}
