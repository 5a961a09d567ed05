//! The header every Jupyter message carries.
use serde::{Deserialize, Serialize};

/// Version of the messaging protocol this kernel speaks.
pub const PROTOCOL_VERSION: &str = "5.3";

/// A message header (messaging protocol, "General Message Format").
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct Header {
    /// Unique id of this message.
    pub msg_id: String,
    /// Id of the session that sent it.
    pub session: String,
    /// User name of the sender.
    #[serde(default)]
    pub username: String,
    /// ISO 8601 time the message was created.
    #[serde(default)]
    pub date: String,
    /// Message type, e.g. `execute_request`.
    pub msg_type: String,
    /// Protocol version.
    #[serde(default)]
    pub version: String,
}

impl Header {
    /// A new header of `msg_type` in `session`, with a fresh id and the current time.
    pub fn new(msg_type: &str, session: &str) -> Self {
        Self {
            msg_id: uuid::Uuid::new_v4().to_string(),
            session: session.to_string(),
            username: "spinfoil".into(),
            date: chrono::Utc::now().to_rfc3339_opts(chrono::SecondsFormat::Micros, true),
            msg_type: msg_type.to_string(),
            version: PROTOCOL_VERSION.into(),
        }
    }
}
