//! An [`OutputSink`] that forwards everything to two sinks (a record and a live observer).
use spinfoil_lang::{MimeBundle, OutputSink};
use std::sync::Arc;

/// Sends each event to `first`, then to `second`.
pub struct Tee {
    first: Arc<dyn OutputSink>,
    second: Arc<dyn OutputSink>,
}

impl Tee {
    /// A sink feeding both.
    pub fn new(first: Arc<dyn OutputSink>, second: Arc<dyn OutputSink>) -> Self {
        Self { first, second }
    }
}

impl OutputSink for Tee {
    fn stdout(&self, text: &str) {
        self.first.stdout(text);
        self.second.stdout(text);
    }
    fn stderr(&self, text: &str) {
        self.first.stderr(text);
        self.second.stderr(text);
    }
    fn display(&self, bundle: &MimeBundle, display_id: Option<&str>) {
        self.first.display(bundle, display_id);
        self.second.display(bundle, display_id);
    }
    fn update_display(&self, bundle: &MimeBundle, display_id: &str) {
        self.first.update_display(bundle, display_id);
        self.second.update_display(bundle, display_id);
    }
}
