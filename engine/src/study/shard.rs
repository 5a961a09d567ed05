//! Shards: a study's indices split into N deterministic parts, and the exact merge of the parts.
//!
//! Shard i of N takes the indices k with k mod N = i. Every study keeps its raw rows with their
//! index; [`merge_rows`] sorts the rows of all N parts by index and checks that every index
//! appears exactly once, so summaries computed after merging are bitwise the single-run ones.
use serde::{Deserialize, Serialize};

use super::StudyError;

/// Which part of a study to run: shard `index` of `count` (0-based; `count` ≥ 1).
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize, Deserialize)]
pub struct Shard {
    /// This shard, 0 … count − 1.
    pub index: usize,
    /// Number of shards.
    pub count: usize,
}

impl Default for Shard {
    fn default() -> Self {
        Self::whole()
    }
}

impl Shard {
    /// The whole study as one shard.
    pub fn whole() -> Self {
        Self { index: 0, count: 1 }
    }

    /// Shard `index` of `count`, checked.
    pub fn new(index: usize, count: usize) -> Result<Self, StudyError> {
        let shard = Self { index, count };
        shard.validate()?;
        Ok(shard)
    }

    /// Checks count ≥ 1 and index < count.
    pub fn validate(&self) -> Result<(), StudyError> {
        if self.count == 0 || self.index >= self.count {
            return Err(StudyError::InvalidSpec {
                field: "shard".into(),
                reason: format!("shard {} of {} is not valid (need count ≥ 1 and 0 ≤ index < count)", self.index, self.count),
            });
        }
        Ok(())
    }

    /// The indices of `0..total` this shard runs, ascending.
    pub fn indices(&self, total: usize) -> Vec<usize> {
        (self.index..total).step_by(self.count.max(1)).collect()
    }
}

impl std::str::FromStr for Shard {
    type Err = StudyError;

    /// Parses `"i/N"` (0-based shard index i of N shards, e.g. `"0/4"` … `"3/4"`).
    fn from_str(text: &str) -> Result<Self, StudyError> {
        let bad = || StudyError::InvalidSpec { field: "shard".into(), reason: format!("\"{text}\" is not of the form i/N with 0 ≤ i < N") };
        let (i, n) = text.trim().split_once('/').ok_or_else(bad)?;
        let index = i.trim().parse().map_err(|_| bad())?;
        let count = n.trim().parse().map_err(|_| bad())?;
        Shard::new(index, count).map_err(|_| bad())
    }
}

impl std::fmt::Display for Shard {
    fn fmt(&self, f: &mut std::fmt::Formatter<'_>) -> std::fmt::Result {
        write!(f, "{}/{}", self.index, self.count)
    }
}

/// A row of a study that knows its index.
pub trait Indexed {
    /// The row's index in the whole study.
    fn index(&self) -> usize;
}

/// Merges the rows of all shards of a study with `total` indices: sorted by index, each index
/// exactly once, or [`StudyError::Shards`].
pub fn merge_rows<R: Indexed + Clone>(parts: &[&[R]], total: usize) -> Result<Vec<R>, StudyError> {
    let mut rows: Vec<R> = parts.iter().flat_map(|p| p.iter().cloned()).collect();
    rows.sort_by_key(Indexed::index);
    if rows.len() != total {
        return Err(StudyError::Shards { reason: format!("{} rows for a study of {total}", rows.len()) });
    }
    match rows.iter().enumerate().find(|(k, r)| r.index() != *k) {
        Some((k, _)) => Err(StudyError::Shards { reason: format!("index {k} is missing or repeated") }),
        None => Ok(rows),
    }
}
