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

#[cfg(test)]
mod tests {
    use super::*;
    use tokio::sync::mpsc::unbounded_channel;

    fn request() -> WireMessage {
        WireMessage::orphan("execute_request", "s1", json!({"code": "1"}))
    }

    #[test]
    fn displays_and_their_updates_carry_the_display_id() {
        let (queue, mut queued) = unbounded_channel();
        let sink = CellSink::new(Iopub::new(queue), &request(), false);
        sink.stdout("hello\n");
        sink.display(&MimeBundle::plain("0/10 throws"), Some("progress-1"));
        sink.update_display(&MimeBundle::plain("10/10 throws"), "progress-1");
        let messages: Vec<WireMessage> = std::iter::from_fn(|| queued.try_recv().ok()).collect();
        let types: Vec<&str> = messages.iter().map(|m| m.header.msg_type.as_str()).collect();
        assert_eq!(types, ["stream", "display_data", "update_display_data"]);
        assert_eq!(messages[0].content, json!({"name": "stdout", "text": "hello\n"}));
        assert_eq!(messages[2].content["transient"]["display_id"], "progress-1");
        assert_eq!(messages[2].content["data"]["text/plain"], "10/10 throws");
        assert_eq!(messages[2].parent_header["msg_type"], "execute_request");
    }

    #[test]
    fn a_silent_cell_publishes_nothing() {
        let (queue, mut queued) = unbounded_channel();
        let sink = CellSink::new(Iopub::new(queue), &request(), true);
        sink.stdout("hidden");
        sink.display(&MimeBundle::plain("x"), None);
        assert!(queued.try_recv().is_err());
    }
}
