//! An [`OutputSink`] that turns a running cell's prints and displays into IOPub messages.
use super::iopub::Iopub;
use super::messages::Stream;
use super::wire::WireMessage;
use crate::mime::bundle_to_data;
use serde_json::json;
use spinfoil_lang::{MimeBundle, OutputSink};

/// Sends one cell's output to IOPub, parented to its `execute_request` (silent cells send none).
pub struct CellSink {
    iopub: Iopub,
    parent: WireMessage,
    silent: bool,
}

impl CellSink {
    /// A sink for the cell requested by `parent`.
    pub fn new(iopub: Iopub, parent: &WireMessage, silent: bool) -> Self {
        let mut parent = parent.clone();
        parent.content = json!({});
        Self { iopub, parent, silent }
    }

    fn publish(&self, msg_type: &str, content: serde_json::Value) {
        if !self.silent {
            self.iopub.publish(&self.parent, msg_type, content);
        }
    }

    fn stream(&self, name: &str, text: &str) {
        if !self.silent {
            self.iopub.publish(&self.parent, "stream", Stream { name, text });
        }
    }
}

impl OutputSink for CellSink {
    fn stdout(&self, text: &str) {
        self.stream("stdout", text);
    }

    fn stderr(&self, text: &str) {
        self.stream("stderr", text);
    }

    fn display(&self, bundle: &MimeBundle, display_id: Option<&str>) {
        let transient = display_id.map_or_else(|| json!({}), |id| json!({ "display_id": id }));
        let content = json!({ "data": bundle_to_data(bundle), "metadata": {}, "transient": transient });
        self.publish("display_data", content);
    }

    fn update_display(&self, bundle: &MimeBundle, display_id: &str) {
        let content = json!({
            "data": bundle_to_data(bundle), "metadata": {}, "transient": { "display_id": display_id }
        });
        self.publish("update_display_data", content);
    }
}
