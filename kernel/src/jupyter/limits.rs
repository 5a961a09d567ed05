//! The kernel's own limits on what clients send (the session's limits are `SessionSettings`).
use super::incident_log::{log_incident, Incident};
use super::wire::DEFAULT_MAX_MESSAGE_BYTES;

/// Slack of the transport's per-frame cap over the message cap, bytes (1 MiB): a frame a
/// little over the message cap still arrives whole, so the kernel can log it by message type.
pub const TRANSPORT_SLACK_BYTES: usize = 1024 * 1024;

/// Environment variable that sets the message size cap, in MiB (whole or decimal, 0.001 to 4096).
pub const MAX_MESSAGE_ENV: &str = "SPINFOIL_MAX_MESSAGE_MB";

/// Limits on incoming messages.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub struct KernelLimits {
    /// Largest message accepted, all frames together, bytes (default
    /// [`DEFAULT_MAX_MESSAGE_BYTES`], 16 MiB); larger ones are dropped and logged.
    pub max_message_bytes: usize,
}

impl Default for KernelLimits {
    fn default() -> Self {
        Self { max_message_bytes: DEFAULT_MAX_MESSAGE_BYTES }
    }
}

impl KernelLimits {
    /// The defaults, with the cap from `SPINFOIL_MAX_MESSAGE_MB` when it is set; a value that
    /// is not a number in range is reported on stderr and the default kept.
    pub fn from_env() -> Self {
        match std::env::var(MAX_MESSAGE_ENV) {
            Ok(text) => Self::from_setting(&text).unwrap_or_else(|why| {
                eprintln!("spinfoil kernel: {MAX_MESSAGE_ENV}={text:?} ignored: {why}; the cap stays 16 MiB");
                Self::default()
            }),
            Err(_) => Self::default(),
        }
    }

    /// Sets the transport's cap on one frame's announced length to the message cap plus
    /// [`TRANSPORT_SLACK_BYTES`], for every socket of the process: a peer announcing a longer
    /// frame is disconnected before anything is reserved for it, and the kernel logs it.
    pub fn apply_to_transport(&self) {
        zeromq::set_max_frame_bytes(self.transport_frame_cap(), Some(log_refused_frame));
    }

    /// The transport's cap on one frame, bytes.
    pub fn transport_frame_cap(&self) -> usize {
        self.max_message_bytes.saturating_add(TRANSPORT_SLACK_BYTES)
    }

    /// The limits for a cap of `text` MiB.
    pub fn from_setting(text: &str) -> Result<Self, String> {
        let mib: f64 = text.trim().parse().map_err(|_| "not a number of MiB".to_string())?;
        if !(0.001..=4096.0).contains(&mib) {
            return Err(format!("{mib} MiB is outside 0.001 to 4096 MiB"));
        }
        Ok(Self { max_message_bytes: (mib * 1024.0 * 1024.0).round() as usize })
    }
}

fn log_refused_frame(announced: usize, cap: usize) {
    let detail = format!("a peer announced a frame of {announced} bytes, over the transport cap of {cap} bytes; its connection was closed");
    log_incident("transport", Incident::Oversized, detail);
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn the_cap_is_read_in_mebibytes_and_checked() {
        assert_eq!(KernelLimits::default().max_message_bytes, 16_777_216);
        assert_eq!(KernelLimits::from_setting("1").unwrap().max_message_bytes, 1_048_576);
        assert_eq!(KernelLimits::from_setting(" 0.5 ").unwrap().max_message_bytes, 524_288);
        assert!(KernelLimits::from_setting("0").is_err());
        assert!(KernelLimits::from_setting("lots").is_err());
        assert!(KernelLimits::from_setting("NaN").is_err());
        assert!(KernelLimits::from_setting("5000").is_err());
    }
}
