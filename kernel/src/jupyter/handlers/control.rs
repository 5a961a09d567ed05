//! The control channel: interrupt, shutdown (and restart), kernel_info; never blocked by a cell.
use super::info::kernel_info;
use crate::jupyter::incident_log::{log_incident, Incident};
use crate::jupyter::messages::ShutdownRequest;
use crate::jupyter::wire::WireMessage;
use crate::jupyter::worker::Worker;
use serde_json::json;

/// What the control loop does after a request.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum ControlOutcome {
    /// Keep serving.
    Continue,
    /// Stop the kernel (Jupyter starts a new one when a restart was asked for).
    Shutdown,
}

/// Handles control requests.
pub struct ControlHandlers {
    worker: Worker,
}

impl ControlHandlers {
    /// Handlers that interrupt cells running on `worker`.
    pub fn new(worker: Worker) -> Self {
        Self { worker }
    }

    /// The reply to `request` and what to do next.
    pub fn handle(&self, request: &WireMessage) -> (Option<WireMessage>, ControlOutcome) {
        match request.header.msg_type.as_str() {
            "interrupt_request" => {
                self.worker.interrupt();
                (Some(request.reply("interrupt_reply", json!({"status": "ok"}))), ControlOutcome::Continue)
            }
            "shutdown_request" => {
                let restart = request.content_as::<ShutdownRequest>().map(|r| r.restart).unwrap_or(false);
                self.worker.interrupt();
                let reply = request.reply("shutdown_reply", json!({"status": "ok", "restart": restart}));
                (Some(reply), ControlOutcome::Shutdown)
            }
            "kernel_info_request" => (Some(request.reply("kernel_info_reply", kernel_info())), ControlOutcome::Continue),
            other => {
                log_incident("control", Incident::UnknownType, format_args!("{other:?} ignored"));
                (None, ControlOutcome::Continue)
            }
        }
    }
}
