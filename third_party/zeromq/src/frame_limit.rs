//! Spinfoil patch: a process-wide cap on the length a peer may announce for one frame.
//!
//! Without it, a peer that sends a greeting and then a frame header announcing, say, 2^40 bytes
//! makes the decoder reserve that much memory at once; the allocation fails and the process
//! aborts. With it, such a frame is a decode error: the connection is closed, the socket and
//! the process go on.
use super::codec::CodecError;
use std::sync::atomic::{AtomicUsize, Ordering};
use std::sync::RwLock;

/// The default cap on one frame's announced length: 256 MiB.
pub const DEFAULT_MAX_FRAME_BYTES: usize = 256 * 1024 * 1024;

static MAX_FRAME_BYTES: AtomicUsize = AtomicUsize::new(DEFAULT_MAX_FRAME_BYTES);
static ON_REFUSED: RwLock<Option<fn(usize, usize)>> = RwLock::new(None);

/// Sets the cap on one frame's announced length, in bytes, for every socket of the process, and
/// a function told of each refused frame (announced length, cap), e.g. to log it.
pub fn set_max_frame_bytes(bytes: usize, on_refused: Option<fn(usize, usize)>) {
    MAX_FRAME_BYTES.store(bytes, Ordering::Relaxed);
    if let Ok(mut hook) = ON_REFUSED.write() {
        *hook = on_refused;
    }
}

/// The cap on one frame's announced length, in bytes.
pub fn max_frame_bytes() -> usize {
    MAX_FRAME_BYTES.load(Ordering::Relaxed)
}

/// An error for an announced length over the cap.
pub(crate) fn check(announced: usize) -> Result<(), CodecError> {
    let cap = max_frame_bytes();
    if announced <= cap {
        return Ok(());
    }
    if let Some(hook) = ON_REFUSED.read().ok().and_then(|h| *h) {
        hook(announced, cap);
    }
    Err(CodecError::Decode("Frame length exceeds the receiver's limit"))
}
