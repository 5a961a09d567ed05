//! Rust cells in a kernel built without the `rust-cells` feature: a clear error.
use spinfoil_lang::{CellError, MimeBundle, OutputSink, Session};
use std::sync::Arc;

/// What a Rust cell answers when the kernel was built without the feature.
pub const FEATURE_MESSAGE: &str = "this kernel was built without the `rust-cells` feature, so cells starting with %%rust \
cannot run. Build it with: cargo build --release -p spinfoil-kernel --features rust-cells \
(then run `spinfoil install-kernel` from that build). Script cells work as usual.";

/// Stand-in for the Rust context: every Rust cell fails with a `FeatureError`.
#[derive(Debug, Default)]
pub struct RustCells;

impl RustCells {
    /// The stand-in (the session is not needed).
    pub fn for_session(_session: &Session) -> Self {
        Self
    }

    /// Fails with a `FeatureError` naming the feature and the build command.
    pub fn eval(&mut self, _code: &str, _sink: Arc<dyn OutputSink>) -> Result<Option<MimeBundle>, CellError> {
        Err(CellError { kind: "FeatureError".into(), message: FEATURE_MESSAGE.into(), line: Some(1), column: None })
    }
}
