//! One stderr line per bad input the kernel refused or survived, naming the channel and the case,
//! rate-limited so that a flood of bad messages cannot flood the log: the first
//! [`LOGGED_IN_FULL`] incidents of each case on each channel are logged in full, after that one
//! line at every [`SUMMARY_EVERY`]th with the running count.
use super::wire::WireError;
use std::collections::HashMap;
use std::fmt::Display;
use std::sync::{Mutex, OnceLock};

/// Incidents of one case on one channel logged line by line before summaries take over.
pub const LOGGED_IN_FULL: u64 = 10;
/// After the first ones, one summary line per this many incidents of a case.
pub const SUMMARY_EVERY: u64 = 1000;

/// The kinds of bad input, as the log names them (also listed in docs/bad-input-messages.md).
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash)]
pub enum Incident {
    /// Frames without the `<IDS|MSG>` delimiter.
    NoDelimiter,
    /// Fewer than signature + four JSON frames.
    MissingFrames,
    /// A signature that does not match (or is missing) under the connection file's key.
    BadSignature,
    /// A header, parent header, metadata or content frame that is not JSON of the right shape.
    MalformedJson,
    /// A message over the size cap.
    Oversized,
    /// A well-formed message of a type this kernel does not serve.
    UnknownType,
    /// A known request whose content lacks or mistypes a field.
    BadContent,
    /// A reply that could not be delivered (the client went away).
    Undeliverable,
    /// A panic inside the session while running a request.
    Panic,
}

impl Incident {
    /// The case of a message the wire format refused.
    pub fn of_wire(error: &WireError) -> Self {
        match error {
            WireError::NoDelimiter(_) => Incident::NoDelimiter,
            WireError::TooFewFrames(_) => Incident::MissingFrames,
            WireError::BadSignature(_) => Incident::BadSignature,
            WireError::TooLarge { .. } => Incident::Oversized,
            WireError::Json { .. } => Incident::MalformedJson,
        }
    }

    /// The case's name in log lines.
    pub fn label(self) -> &'static str {
        match self {
            Incident::NoDelimiter => "no delimiter",
            Incident::MissingFrames => "missing frames",
            Incident::BadSignature => "bad or missing signature",
            Incident::MalformedJson => "malformed JSON",
            Incident::Oversized => "oversized message",
            Incident::UnknownType => "unknown message type",
            Incident::BadContent => "bad content",
            Incident::Undeliverable => "client gone",
            Incident::Panic => "panic in a request",
        }
    }
}

fn counts() -> &'static Mutex<HashMap<(&'static str, Incident), u64>> {
    static COUNTS: OnceLock<Mutex<HashMap<(&'static str, Incident), u64>>> = OnceLock::new();
    COUNTS.get_or_init(Default::default)
}

/// Records one incident on `channel` (`shell`, `control`, `iopub`, `session`) and logs it to
/// stderr unless the rate limit holds it back.
pub fn log_incident(channel: &'static str, incident: Incident, detail: impl Display) {
    if let Some(line) = count_and_format(channel, incident, &detail) {
        eprintln!("{line}");
    }
}

/// The line to log for this incident (None when rate-limited); counts it.
fn count_and_format(channel: &'static str, incident: Incident, detail: &dyn Display) -> Option<String> {
    let count = {
        let mut counts = counts().lock().unwrap_or_else(|poisoned| poisoned.into_inner());
        let entry = counts.entry((channel, incident)).or_insert(0);
        *entry += 1;
        *entry
    };
    let head = format!("spinfoil kernel: {channel}: {}", incident.label());
    if count <= LOGGED_IN_FULL {
        Some(format!("{head}: {detail}"))
    } else if count % SUMMARY_EVERY == 0 {
        Some(format!("{head}: {count} so far on this channel (only every {SUMMARY_EVERY}th is logged); latest: {detail}"))
    } else {
        None
    }
}

/// How many incidents of `incident` were counted on `channel` since the kernel started.
pub fn incident_count(channel: &'static str, incident: Incident) -> u64 {
    counts().lock().map(|c| c.get(&(channel, incident)).copied().unwrap_or(0)).unwrap_or(0)
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn the_first_incidents_are_logged_in_full_then_summarised() {
        let logged: Vec<Option<String>> =
            (0..2 * SUMMARY_EVERY).map(|k| count_and_format("test-a", Incident::Oversized, &k)).collect();
        assert_eq!(logged.iter().flatten().count() as u64, LOGGED_IN_FULL + 2);
        assert_eq!(logged[0].as_deref(), Some("spinfoil kernel: test-a: oversized message: 0"));
        let summary = logged[SUMMARY_EVERY as usize - 1].as_deref().unwrap();
        assert!(summary.contains("1000 so far"), "{summary}");
        assert_eq!(incident_count("test-a", Incident::Oversized), 2 * SUMMARY_EVERY);
        assert_eq!(incident_count("test-a", Incident::Panic), 0);
    }
}
