//! Progress displays and interrupts of a running study.
use crate::output::MimeBundle;
use crate::packages::PackageContext;
use spinfoil_engine::StudyControl;
use std::sync::atomic::{AtomicBool, AtomicUsize, Ordering};
use std::sync::Mutex;

/// Shows "`what`: done/total flights" under one display id while a study runs, and turns the
/// session's interrupt into the study's cancel flag.
pub(crate) struct Watch<'a> {
    context: &'a PackageContext,
    id: String,
    what: String,
    cancel: AtomicBool,
    shown_steps: AtomicUsize,
    /// The furthest progress reported: (done, total) flights.
    furthest: Mutex<(usize, usize)>,
}

/// Display updates per study at most (plus the first and the last).
const STEPS: usize = 20;

static NEXT_ID: AtomicUsize = AtomicUsize::new(1);

impl<'a> Watch<'a> {
    /// A watch for a study called `what` (shows its starting display at once).
    pub fn new(context: &'a PackageContext, what: &str, total: usize) -> Self {
        let id = format!("study-progress-{}", NEXT_ID.fetch_add(1, Ordering::Relaxed));
        let watch = Self { context, id, what: what.to_string(), cancel: AtomicBool::new(false), shown_steps: AtomicUsize::new(0), furthest: Mutex::new((0, total)) };
        context.sink.display(&watch.message(0, total), Some(&watch.id));
        watch
    }

    fn message(&self, done: usize, total: usize) -> MimeBundle {
        MimeBundle::plain(format!("{}: {done}/{total} flights", self.what))
    }

    /// Called after each flight: updates the display every 1/20 of the work, and sets the cancel
    /// flag when the session was interrupted.
    pub fn progress(&self, done: usize, total: usize) {
        if self.context.interrupt.is_interrupted() {
            self.cancel.store(true, Ordering::Relaxed);
        }
        if let Ok(mut furthest) = self.furthest.lock() {
            if done > furthest.0 {
                *furthest = (done, total);
            }
        }
        let step = done * STEPS / total.max(1);
        if self.shown_steps.fetch_max(step, Ordering::Relaxed) < step {
            self.context.sink.update_display(&self.message(done, total), &self.id);
        }
    }

    /// Shows the furthest progress once more after the study: worker threads race to update the
    /// display, so an earlier count can arrive last; this makes the final display deterministic.
    pub fn finish(&self) {
        let (done, total) = self.furthest.lock().map(|f| *f).unwrap_or_default();
        self.context.sink.update_display(&self.message(done, total), &self.id);
    }

    /// The engine's control for this watch.
    pub fn control<'w>(&'w self, progress: &'w (dyn Fn(usize, usize) + Sync)) -> StudyControl<'w> {
        if self.context.interrupt.is_interrupted() {
            self.cancel.store(true, Ordering::Relaxed);
        }
        StudyControl::none().with_cancel(&self.cancel).with_progress(progress)
    }
}

/// Runs `study` with a progress display and interrupts; an interrupt gives the session's
/// "Interrupted" error.
pub(crate) fn watched<T>(
    ctx: &rhai::NativeCallContext,
    context: &PackageContext,
    what: &str,
    total: usize,
    study: impl FnOnce(StudyControl<'_>) -> Result<T, spinfoil_engine::StudyError>,
) -> Result<T, Box<rhai::EvalAltResult>> {
    let watch = Watch::new(context, what, total);
    let progress = |done: usize, total: usize| watch.progress(done, total);
    let result = study(watch.control(&progress));
    if result.is_ok() {
        watch.finish();
    }
    match result {
        Err(spinfoil_engine::StudyError::Cancelled { .. }) => {
            Err(rhai::EvalAltResult::ErrorTerminated(rhai::Dynamic::from("interrupted"), ctx.call_position()).into())
        }
        Err(e) => Err(super::super::args::engine_error(ctx, e)),
        Ok(value) => Ok(value),
    }
}
