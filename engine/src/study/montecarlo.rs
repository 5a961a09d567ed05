//! The generic Monte Carlo machinery: a seeded draw per index, evaluated in parallel.
use rand::SeedableRng;
use rand_chacha::ChaCha8Rng;
use serde::{Deserialize, Serialize};

use super::runner::run_indexed;
use super::{Indexed, Shard, StudyControl, StudyError};

/// The random-number generator of draw `index` of a study seeded with `seed`: ChaCha8 seeded
/// from `seed`, on stream `index`. Independent of threads and shards.
pub fn draw_rng(seed: u64, index: usize) -> ChaCha8Rng {
    let mut rng = ChaCha8Rng::seed_from_u64(seed);
    rng.set_stream(index as u64);
    rng
}

/// What one draw lands at.
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
pub struct DrawOutcome {
    /// Landing (x, y), m.
    pub landing_m: [f64; 2],
    /// Rest (x, y), m, when the ground was played out.
    pub rest_m: Option<[f64; 2]>,
    /// Carry, m.
    pub carry_m: f64,
    /// Time aloft, s.
    pub time_aloft_s: f64,
}

/// One draw of a Monte Carlo study.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct DrawRow {
    /// Index of the draw.
    pub index: usize,
    /// The outcome (None when the draw failed).
    pub outcome: Option<DrawOutcome>,
    /// Why the draw failed, if it did.
    pub error: Option<String>,
}

impl Indexed for DrawRow {
    fn index(&self) -> usize {
        self.index
    }
}

/// Evaluates `f` for the draws of `shard` out of `total`, each with [`draw_rng`]`(seed, index)`;
/// rows in index order. `f` may be any function of the random draws (a flight, or a test
/// function with a known answer).
pub fn monte_carlo<F>(total: usize, seed: u64, shard: Shard, control: StudyControl<'_>, f: F) -> Result<Vec<DrawRow>, StudyError>
where
    F: Fn(&mut ChaCha8Rng) -> Result<DrawOutcome, StudyError> + Sync,
{
    shard.validate()?;
    run_indexed(&shard.indices(total), control, |index| match f(&mut draw_rng(seed, index)) {
        Ok(outcome) => DrawRow { index, outcome: Some(outcome), error: None },
        Err(e) => DrawRow { index, outcome: None, error: Some(e.to_string()) },
    })
}
