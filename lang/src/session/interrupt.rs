use std::sync::atomic::{AtomicBool, Ordering};
use std::sync::Arc;

/// A handle that stops the cell a [`Session`](crate::Session) is running, from any thread.
///
/// The running cell ends with a `CellError` of kind `"Interrupted"` within a second (the flag is
/// checked at every script operation and between steps of long simulations); the flag is cleared
/// when the next cell starts.
#[derive(Debug, Clone, Default)]
pub struct InterruptHandle {
    flag: Arc<AtomicBool>,
}

impl InterruptHandle {
    /// Asks the running cell to stop.
    pub fn interrupt(&self) {
        self.flag.store(true, Ordering::SeqCst);
    }

    /// True when an interrupt was requested and not yet cleared.
    pub fn is_interrupted(&self) -> bool {
        self.flag.load(Ordering::Relaxed)
    }

    pub(crate) fn clear(&self) {
        self.flag.store(false, Ordering::SeqCst);
    }
}
