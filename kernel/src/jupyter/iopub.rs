//! The IOPub side: messages queued in order for the PUB socket's task.
use super::messages::Status;
use super::wire::WireMessage;
use serde::Serialize;
use tokio::sync::mpsc::UnboundedSender;

/// Queues IOPub messages; cheap to clone, usable from any thread.
#[derive(Clone)]
pub struct Iopub {
    queue: UnboundedSender<WireMessage>,
}

impl Iopub {
    /// An IOPub queue feeding `queue`.
    pub fn new(queue: UnboundedSender<WireMessage>) -> Self {
        Self { queue }
    }

    /// Publishes a `msg_type` message whose parent is `parent`.
    pub fn publish(&self, parent: &WireMessage, msg_type: &str, content: impl Serialize) {
        let mut message = parent.reply(msg_type, content);
        message.identities = vec![format!("kernel.{msg_type}").into_bytes()];
        self.send(message);
    }

    /// Publishes the kernel's execution state (`busy`, `idle`) in answer to `parent`.
    pub fn status(&self, parent: &WireMessage, execution_state: &str) {
        self.publish(parent, "status", Status { execution_state });
    }

    /// Queues a complete message as it is.
    pub fn send(&self, message: WireMessage) {
        if self.queue.send(message).is_err() {
            eprintln!("spinfoil kernel: the IOPub socket is closed; message dropped");
        }
    }
}
