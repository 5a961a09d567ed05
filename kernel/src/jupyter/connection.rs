//! The connection file Jupyter writes before starting a kernel: ports, transport and signing key.
use serde::{Deserialize, Serialize};
use std::path::Path;

/// Why a connection file could not be used.
#[derive(Debug, thiserror::Error)]
#[non_exhaustive]
pub enum ConnectionError {
    /// The file could not be read.
    #[error("cannot read connection file {path}: {source}")]
    Read {
        /// The file's path as given.
        path: String,
        /// The underlying error.
        source: std::io::Error,
    },
    /// The file is not the JSON Jupyter writes.
    #[error("connection file {path} is not valid: {source}")]
    Parse {
        /// The file's path as given.
        path: String,
        /// The underlying error.
        source: serde_json::Error,
    },
    /// A signature scheme other than `hmac-sha256` was asked for.
    #[error("signature scheme {0:?} is not supported (allowed: \"hmac-sha256\")")]
    Scheme(String),
}

/// The content of a Jupyter connection file (messaging protocol, "Connection files").
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct ConnectionInfo {
    /// `tcp` (the only transport served).
    #[serde(default = "default_transport")]
    pub transport: String,
    /// Address to bind, e.g. `127.0.0.1`.
    pub ip: String,
    /// Port of the shell ROUTER socket.
    pub shell_port: u16,
    /// Port of the IOPub PUB socket.
    pub iopub_port: u16,
    /// Port of the stdin ROUTER socket.
    pub stdin_port: u16,
    /// Port of the control ROUTER socket.
    pub control_port: u16,
    /// Port of the heartbeat REP socket.
    pub hb_port: u16,
    /// HMAC key; empty disables signing.
    #[serde(default)]
    pub key: String,
    /// Signature scheme; only `hmac-sha256` is served.
    #[serde(default = "default_scheme")]
    pub signature_scheme: String,
}

fn default_transport() -> String {
    "tcp".into()
}

fn default_scheme() -> String {
    "hmac-sha256".into()
}

impl ConnectionInfo {
    /// Reads and checks a connection file.
    pub fn load(path: &Path) -> Result<Self, ConnectionError> {
        let shown = path.display().to_string();
        let text = std::fs::read_to_string(path)
            .map_err(|source| ConnectionError::Read { path: shown.clone(), source })?;
        Self::parse(&text).map_err(|e| match e {
            ConnectionError::Parse { source, .. } => ConnectionError::Parse { path: shown, source },
            other => other,
        })
    }

    /// Parses the JSON text of a connection file.
    pub fn parse(text: &str) -> Result<Self, ConnectionError> {
        let info: Self = serde_json::from_str(text)
            .map_err(|source| ConnectionError::Parse { path: String::new(), source })?;
        if info.signature_scheme != "hmac-sha256" {
            return Err(ConnectionError::Scheme(info.signature_scheme));
        }
        Ok(info)
    }

    /// The ZeroMQ endpoint for one port, e.g. `tcp://127.0.0.1:5555`.
    pub fn endpoint(&self, port: u16) -> String {
        format!("{}://{}:{}", self.transport, self.ip, port)
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn parses_the_file_jupyter_writes() {
        let text = r#"{"shell_port": 1, "iopub_port": 2, "stdin_port": 3, "control_port": 4,
            "hb_port": 5, "ip": "127.0.0.1", "key": "k", "transport": "tcp",
            "signature_scheme": "hmac-sha256", "kernel_name": "spinfoil"}"#;
        let info = ConnectionInfo::parse(text).unwrap();
        assert_eq!(info.endpoint(info.control_port), "tcp://127.0.0.1:4");
        assert_eq!(info.key, "k");
    }

    #[test]
    fn rejects_other_signature_schemes() {
        let text = r#"{"shell_port": 1, "iopub_port": 2, "stdin_port": 3, "control_port": 4,
            "hb_port": 5, "ip": "127.0.0.1", "key": "k", "signature_scheme": "hmac-md5"}"#;
        assert!(matches!(ConnectionInfo::parse(text), Err(ConnectionError::Scheme(_))));
    }
}
