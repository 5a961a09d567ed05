use crate::output::{MimeBundle, OutputSink};
use std::sync::{Arc, RwLock};

/// The sink of the cell being evaluated, shared with the engine's `'static` callbacks
/// (`print`, `debug`, `show`). Empty between cells: output outside a cell is dropped.
#[derive(Clone, Default)]
pub(crate) struct SinkSlot {
    current: Arc<RwLock<Option<Arc<dyn OutputSink>>>>,
}

impl SinkSlot {
    /// Makes `sink` the destination of output until [`SinkSlot::clear`].
    pub fn set(&self, sink: Arc<dyn OutputSink>) {
        *self.current.write().unwrap_or_else(|p| p.into_inner()) = Some(sink);
    }

    /// Drops the current sink.
    pub fn clear(&self) {
        *self.current.write().unwrap_or_else(|p| p.into_inner()) = None;
    }

    fn get(&self) -> Option<Arc<dyn OutputSink>> {
        self.current.read().unwrap_or_else(|p| p.into_inner()).clone()
    }

    /// Standard output text.
    pub fn stdout(&self, text: &str) {
        if let Some(sink) = self.get() {
            sink.stdout(text);
        }
    }

    /// Standard error text.
    pub fn stderr(&self, text: &str) {
        if let Some(sink) = self.get() {
            sink.stderr(text);
        }
    }

    /// A rich display.
    pub fn display(&self, bundle: &MimeBundle, id: Option<&str>) {
        if let Some(sink) = self.get() {
            sink.display(bundle, id);
        }
    }

    /// An update of an earlier display.
    pub fn update_display(&self, bundle: &MimeBundle, id: &str) {
        if let Some(sink) = self.get() {
            sink.update_display(bundle, id);
        }
    }
}
