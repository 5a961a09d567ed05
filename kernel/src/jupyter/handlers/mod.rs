//! Request handlers: each turns one request into its reply (and IOPub messages on the way).
mod control;
mod execute;
mod info;
mod introspection;

pub use control::{ControlHandlers, ControlOutcome};
pub use info::kernel_info;

use super::history::History;
use super::incident_log::{log_incident, Incident};
use super::iopub::Iopub;
use super::messages::HistoryRequest;
use super::wire::WireMessage;
use super::worker::Worker;
use serde_json::{json, Value};

/// Handles the shell channel's requests, one at a time, in arrival order.
pub struct ShellHandlers {
    worker: Worker,
    iopub: Iopub,
    history: History,
    execution_count: usize,
    abort_queued: bool,
}

impl ShellHandlers {
    /// Handlers running cells on `worker` and publishing on `iopub`.
    pub fn new(worker: Worker, iopub: Iopub) -> Self {
        Self { worker, iopub, history: History::default(), execution_count: 0, abort_queued: false }
    }

    /// The reply to `request`, or None for message types this kernel does not answer.
    pub async fn handle(&mut self, request: &WireMessage) -> Option<WireMessage> {
        let reply = match request.header.msg_type.as_str() {
            "execute_request" => self.execute(request).await,
            "complete_request" => self.complete(request).await,
            "inspect_request" => self.inspect(request).await,
            "is_complete_request" => self.is_complete(request).await,
            "history_request" => self.history(request),
            "kernel_info_request" => request.reply("kernel_info_reply", kernel_info()),
            "comm_info_request" => request.reply("comm_info_reply", json!({"status": "ok", "comms": {}})),
            other => {
                log_incident("shell", Incident::UnknownType, format_args!("{other:?} ignored"));
                return None;
            }
        };
        Some(reply)
    }

    /// True once after a cell failed with `stop_on_error`: queued executes should be aborted.
    pub fn take_abort(&mut self) -> bool {
        std::mem::take(&mut self.abort_queued)
    }

    /// The reply to an execute request skipped because an earlier cell failed.
    pub fn aborted(&self, request: &WireMessage) -> WireMessage {
        request.reply("execute_reply", json!({
            "status": "aborted", "execution_count": self.execution_count, "user_expressions": {}, "payload": [],
        }))
    }

    fn history(&self, request: &WireMessage) -> WireMessage {
        match request.content_as::<HistoryRequest>() {
            Ok(query) => request.reply("history_reply", json!({"status": "ok", "history": self.history.answer(&query)})),
            Err(e) => bad_request(request, "history_reply", &e.to_string()),
        }
    }
}

/// An error reply for a request whose content could not be read.
pub fn bad_request(request: &WireMessage, reply_type: &str, why: &str) -> WireMessage {
    log_incident("shell", Incident::BadContent, format_args!("{}: {why}; answered with an error", request.header.msg_type));
    request.reply(reply_type, error_content("BadRequest", why))
}

fn error_content(ename: &str, evalue: &str) -> Value {
    json!({"status": "error", "ename": ename, "evalue": evalue, "traceback": [format!("{ename}: {evalue}")]})
}
