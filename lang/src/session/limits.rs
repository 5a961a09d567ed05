//! Limits that our script functions check themselves (Rhai checks the others): flights in one
//! study, trajectory samples of one flight, the wall time of a cell; and the folders scripts may
//! use. Functions reach them through the engine's default tag ([`ScriptRules::of`]).
use super::SessionSettings;
use crate::files::{FileAccessError, StudyFolder};
use rhai::{Dynamic, EvalAltResult, NativeCallContext};
use std::path::PathBuf;
use std::sync::atomic::{AtomicU64, Ordering};
use std::sync::Arc;
use std::time::{Duration, Instant};

/// Prefix of the runtime errors our functions raise for a limit (read back by
/// [`SessionSettings::limit_message`]).
pub(crate) const LIMIT_PREFIX: &str = "LimitError: ";

/// What a script's functions may do: the limits they check and the folders they may use.
#[derive(Debug, Clone, PartialEq)]
pub(crate) struct ScriptRules {
    /// Most flights (throws or sweep points) in one study.
    pub max_study_flights: usize,
    /// Most trajectory samples one flight may record.
    pub max_trajectory_samples: usize,
    /// The study folder (read and write), if any.
    pub study_dir: Option<PathBuf>,
    /// Extra folders scripts may read from.
    pub extra_dirs: Vec<PathBuf>,
}

impl ScriptRules {
    /// The rules of `settings`.
    pub fn of_settings(settings: &SessionSettings) -> Self {
        Self {
            max_study_flights: settings.max_study_flights,
            max_trajectory_samples: settings.max_trajectory_samples,
            study_dir: settings.study_dir.clone(),
            extra_dirs: settings.extra_dirs.clone(),
        }
    }

    /// The rules as the engine's default tag.
    pub fn to_tag(&self) -> Dynamic {
        Dynamic::from(Arc::new(self.clone()))
    }

    /// The rules of the session running `ctx` (the defaults when the engine has none).
    pub fn of(ctx: &NativeCallContext) -> Arc<ScriptRules> {
        ctx.tag()
            .and_then(|tag| tag.clone().try_cast::<Arc<ScriptRules>>())
            .unwrap_or_else(|| Arc::new(Self::of_settings(&SessionSettings::default())))
    }

    /// The study folder with its extra read-only folders.
    pub fn folder(&self) -> Result<StudyFolder, FileAccessError> {
        StudyFolder::with_extra(self.study_dir.as_deref(), &self.extra_dirs)
    }
}

/// A limit error at the call `ctx`: `message` names the limit and the setting that raises it.
pub(crate) fn limit_error(ctx: &NativeCallContext, message: String) -> Box<EvalAltResult> {
    Box::new(EvalAltResult::ErrorRuntime(Dynamic::from(format!("{LIMIT_PREFIX}{message}")), ctx.call_position()))
}

/// Refuses a study of `flights` flights beyond the session's `max_study_flights`.
pub(crate) fn check_study_flights(ctx: &NativeCallContext, what: &str, flights: usize) -> Result<(), Box<EvalAltResult>> {
    let max = ScriptRules::of(ctx).max_study_flights;
    if flights > max {
        return Err(limit_error(
            ctx,
            format!("{what} of {flights} flights is more than {max} flights in one study (limit max_study_flights); split it into shards or smaller studies"),
        ));
    }
    Ok(())
}

/// Refuses a flight flown with `settings` when it may record more trajectory samples than the
/// session's `max_trajectory_samples` (one every `sample_interval_s` for up to `max_time_s`).
pub(crate) fn check_trajectory_samples(ctx: &NativeCallContext, settings: &spinfoil_engine::FlightSettings) -> Result<(), Box<EvalAltResult>> {
    if !settings.record_samples {
        return Ok(());
    }
    let samples = (settings.max_time_s / settings.sample_interval_s).ceil() as usize + 1;
    let max = ScriptRules::of(ctx).max_trajectory_samples;
    if samples > max {
        return Err(limit_error(
            ctx,
            format!(
                "a flight records up to {samples} trajectory samples ({} ms apart for up to {} s), more than {max} (limit max_trajectory_samples)",
                settings.sample_interval_s * 1000.0,
                settings.max_time_s
            ),
        ));
    }
    Ok(())
}

/// The wall-time clock of the running cell, shared by the interrupt handle.
#[derive(Debug)]
pub(crate) struct CellClock {
    base: Instant,
    /// Nanoseconds after `base` at which the cell runs out of time (`u64::MAX`: never).
    deadline_ns: AtomicU64,
}

impl Default for CellClock {
    fn default() -> Self {
        Self { base: Instant::now(), deadline_ns: AtomicU64::new(u64::MAX) }
    }
}

impl CellClock {
    fn now_ns(&self) -> u64 {
        u64::try_from(self.base.elapsed().as_nanos()).unwrap_or(u64::MAX - 1)
    }

    /// Starts a cell that may run for `limit`.
    pub fn start(&self, limit: Duration) {
        let limit_ns = u64::try_from(limit.as_nanos()).unwrap_or(u64::MAX);
        self.deadline_ns.store(self.now_ns().saturating_add(limit_ns), Ordering::SeqCst);
    }

    /// True when the running cell has used up its wall time.
    pub fn expired(&self) -> bool {
        let deadline = self.deadline_ns.load(Ordering::Relaxed);
        deadline != u64::MAX && self.now_ns() >= deadline
    }
}
