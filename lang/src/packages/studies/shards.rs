//! Shards from the command line: `spinfoil run study.rhai --shard i/N` sets the environment
//! variables [`SHARD_VAR`] and [`SHARD_DIR_VAR`]; every sweep and dispersion of the script then
//! runs only shard i of N and writes its partial result as JSON into that folder, and
//! `spinfoil merge FOLDER` calls `merge_shards()`, which merges the partial files of each study
//! into the single-run result (bitwise equal) and shows it.
//!
//! Calibrations and launch optimisation are not sharded: they are sequential algorithms (each
//! Levenberg–Marquardt or simplex step needs the previous one), so there is nothing to split
//! across machines; their flights within a step run in parallel on one machine. Signatures are
//! four flights.
use super::dispersion::dispersion_value;
use super::result::StudyValue;
use super::sweep::sweep_value;
use crate::help::{FnDoc, Registrar};
use crate::packages::args::{value_error, Fallible};
use rhai::{Array, Dynamic, NativeCallContext};
use serde::{Deserialize, Serialize};
use spinfoil_engine::{merge_dispersions, merge_sweeps, DispersionResult, Shard, SweepResult};
use std::collections::BTreeMap;
use std::path::PathBuf;
use std::sync::atomic::{AtomicUsize, Ordering};

/// Environment variable holding the shard `i/N` this process runs.
pub const SHARD_VAR: &str = "SPINFOIL_SHARD";
/// Environment variable holding the folder of partial results.
pub const SHARD_DIR_VAR: &str = "SPINFOIL_SHARD_DIR";

/// The partial result of one study of a sharded script.
#[derive(Debug, Clone, Serialize, Deserialize)]
#[serde(tag = "study", rename_all = "snake_case")]
pub(crate) enum Partial {
    /// A sweep's rows of one shard.
    Sweep {
        /// Which study of the script (0 for the first sharded study call).
        ordinal: usize,
        /// The disc's name.
        design: String,
        /// The engine's partial result.
        result: SweepResult,
    },
    /// A dispersion's rows of one shard.
    Dispersion {
        /// Which study of the script.
        ordinal: usize,
        /// The disc's name.
        design: String,
        /// The engine's partial result.
        result: Box<DispersionResult>,
    },
}

static ORDINAL: AtomicUsize = AtomicUsize::new(0);

/// The shard this process runs (the whole study unless the command line asked for one).
pub(crate) fn current_shard(ctx: &NativeCallContext) -> Fallible<Shard> {
    match std::env::var(SHARD_VAR) {
        Ok(text) => text.parse().map_err(|e: spinfoil_engine::StudyError| value_error(ctx, e.to_string())),
        Err(_) => Ok(Shard::whole()),
    }
}

/// The next study's ordinal in this script.
pub(crate) fn next_ordinal() -> usize {
    ORDINAL.fetch_add(1, Ordering::Relaxed)
}

fn shard_dir(ctx: &NativeCallContext) -> Fallible<PathBuf> {
    std::env::var(SHARD_DIR_VAR)
        .map(PathBuf::from)
        .map_err(|_| value_error(ctx, "no shard folder: run the script with `spinfoil run SCRIPT --shard i/N`, merge with `spinfoil merge FOLDER`".into()))
}

/// Writes a partial result as `partial-ORDINAL-STUDY-shard-I-of-N.json` into the shard folder.
pub(crate) fn keep(ctx: &NativeCallContext, partial: &Partial, shard: Shard) -> Fallible<()> {
    let dir = shard_dir(ctx)?;
    let (ordinal, kind) = match partial {
        Partial::Sweep { ordinal, .. } => (ordinal, "sweep"),
        Partial::Dispersion { ordinal, .. } => (ordinal, "dispersion"),
    };
    let name = format!("partial-{ordinal:03}-{kind}-shard-{}-of-{}.json", shard.index, shard.count);
    let text = serde_json::to_string(partial).map_err(|e| value_error(ctx, e.to_string()))?;
    std::fs::create_dir_all(&dir).map_err(|e| value_error(ctx, format!("cannot write {name}: {e}")))?;
    // Atomic: a shard killed mid-write leaves no truncated partial for `merge` to read.
    crate::files::write_atomic(&dir.join(&name), &text, &name).map_err(|e| value_error(ctx, e.to_string()))
}

/// Registers `merge_shards`.
pub(crate) fn register(reg: &mut Registrar) {
    reg.engine.register_fn("merge_shards", merge_shards);
    reg.doc(FnDoc::new(
        "merge_shards() -> array of Study",
        "Merges the partial results that `spinfoil run SCRIPT --shard i/N` wrote (one file per study and shard) into each study's full result, equal to a single run. Called by `spinfoil merge FOLDER`.",
        "for study in merge_shards() { show(study); }",
    ));
}

fn merge_shards(ctx: NativeCallContext) -> Fallible<Array> {
    let dir = shard_dir(&ctx)?;
    let entries = std::fs::read_dir(&dir).map_err(|e| value_error(&ctx, format!("cannot read the shard folder: {e}")))?;
    let mut groups: BTreeMap<usize, Vec<Partial>> = BTreeMap::new();
    for entry in entries.flatten() {
        let name = entry.file_name().to_string_lossy().into_owned();
        if !(name.starts_with("partial-") && name.ends_with(".json")) {
            continue;
        }
        let text = std::fs::read_to_string(entry.path()).map_err(|e| value_error(&ctx, format!("cannot read {name}: {e}")))?;
        let partial: Partial = serde_json::from_str(&text).map_err(|e| value_error(&ctx, format!("{name} is not a partial result: {e}")))?;
        let ordinal = match &partial {
            Partial::Sweep { ordinal, .. } | Partial::Dispersion { ordinal, .. } => *ordinal,
        };
        groups.entry(ordinal).or_default().push(partial);
    }
    if groups.is_empty() {
        return Err(value_error(&ctx, "no partial-*.json files in the shard folder".into()));
    }
    groups.into_values().map(|parts| merge_group(&ctx, parts).map(Dynamic::from)).collect()
}

fn merge_group(ctx: &NativeCallContext, parts: Vec<Partial>) -> Fallible<StudyValue> {
    let merge_error = |e: spinfoil_engine::StudyError| value_error(ctx, e.to_string());
    match &parts[0] {
        Partial::Sweep { design, .. } => {
            let results: Vec<SweepResult> = parts.iter().filter_map(|p| if let Partial::Sweep { result, .. } = p { Some(result.clone()) } else { None }).collect();
            Ok(sweep_value(&merge_sweeps(&results).map_err(merge_error)?, design))
        }
        Partial::Dispersion { design, .. } => {
            let results: Vec<DispersionResult> =
                parts.iter().filter_map(|p| if let Partial::Dispersion { result, .. } = p { Some((**result).clone()) } else { None }).collect();
            Ok(dispersion_value(&merge_dispersions(&results).map_err(merge_error)?, design))
        }
    }
}
