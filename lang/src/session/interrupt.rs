use super::limits::CellClock;
use std::sync::atomic::{AtomicBool, Ordering};
use std::sync::Arc;
use std::time::Duration;

/// A handle that stops the cell a [`Session`](crate::Session) is running, from any thread.
///
/// The running cell ends with a `CellError` of kind `"Interrupted"` within a second (the flag is
/// checked at every script operation and between steps of long simulations); the flag is cleared
/// when the next cell starts. The same checks stop a cell that ran out of wall time
/// (`SessionSettings::max_cell_time`).
#[derive(Debug, Clone, Default)]
pub struct InterruptHandle {
    flag: Arc<AtomicBool>,
    clock: Arc<CellClock>,
}

impl InterruptHandle {
    /// Asks the running cell to stop.
    pub fn interrupt(&self) {
        self.flag.store(true, Ordering::SeqCst);
    }

    /// True when an interrupt was requested and not yet cleared, or the running cell ran out
    /// of wall time.
    pub fn is_interrupted(&self) -> bool {
        self.flag.load(Ordering::Relaxed) || self.clock.expired()
    }

    /// The check at script operation number `operations`: the flag every time, the clock every
    /// 1 024 operations (reading the clock costs about as much as an operation).
    pub(crate) fn stops_at(&self, operations: u64) -> bool {
        self.flag.load(Ordering::Relaxed) || (operations.is_multiple_of(1024) && self.clock.expired())
    }

    /// True when the running cell ran out of wall time (and was not interrupted by a user).
    pub(crate) fn timed_out(&self) -> bool {
        !self.flag.load(Ordering::Relaxed) && self.clock.expired()
    }

    /// Clears the flag and starts the clock of a new cell that may run for `limit`.
    pub(crate) fn start_cell(&self, limit: Duration) {
        self.flag.store(false, Ordering::SeqCst);
        self.clock.start(limit);
    }
}
