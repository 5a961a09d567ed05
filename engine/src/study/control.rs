//! Cancellation and progress of long studies.
use std::sync::atomic::{AtomicBool, AtomicUsize, Ordering};

use super::StudyError;

/// How a host watches and stops a study: an optional cancel flag, checked before every flight,
/// and an optional progress callback `(done, total)` called after every flight (from worker
/// threads, so it must be `Sync`; it may be called out of order of indices, never with `done`
/// decreasing by more than the threads in flight).
#[derive(Clone, Copy, Default)]
pub struct StudyControl<'a> {
    /// Set to `true` to stop the study; it then ends with [`StudyError::Cancelled`].
    pub cancel: Option<&'a AtomicBool>,
    /// Called with (flights done, flights planned).
    pub progress: Option<&'a (dyn Fn(usize, usize) + Sync)>,
}

impl std::fmt::Debug for StudyControl<'_> {
    fn fmt(&self, f: &mut std::fmt::Formatter<'_>) -> std::fmt::Result {
        f.debug_struct("StudyControl").field("cancel", &self.cancel).field("progress", &self.progress.is_some()).finish()
    }
}

impl<'a> StudyControl<'a> {
    /// No cancel flag, no progress.
    pub fn none() -> Self {
        Self::default()
    }

    /// With a cancel flag.
    pub fn with_cancel(mut self, cancel: &'a AtomicBool) -> Self {
        self.cancel = Some(cancel);
        self
    }

    /// With a progress callback.
    pub fn with_progress(mut self, progress: &'a (dyn Fn(usize, usize) + Sync)) -> Self {
        self.progress = Some(progress);
        self
    }

    pub(crate) fn cancelled(&self) -> bool {
        self.cancel.is_some_and(|c| c.load(Ordering::Relaxed))
    }
}

/// Counts finished flights for one study run and reports them.
pub(crate) struct Tally<'a> {
    control: StudyControl<'a>,
    done: AtomicUsize,
    total: usize,
}

impl<'a> Tally<'a> {
    pub(crate) fn new(control: StudyControl<'a>, total: usize) -> Self {
        Self { control, done: AtomicUsize::new(0), total }
    }

    /// `Err(Cancelled)` when the flag is set.
    pub(crate) fn check(&self) -> Result<(), StudyError> {
        if self.control.cancelled() {
            Err(StudyError::Cancelled { done: self.done.load(Ordering::Relaxed), total: self.total })
        } else {
            Ok(())
        }
    }

    pub(crate) fn finished_one(&self) {
        let done = self.done.fetch_add(1, Ordering::Relaxed) + 1;
        if let Some(progress) = self.control.progress {
            progress(done, self.total);
        }
    }
}
