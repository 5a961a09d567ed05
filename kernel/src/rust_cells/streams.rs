//! Forwards a Rust cell's standard output and error to the notebook while it runs.
use crossbeam_channel::{Receiver, RecvTimeoutError};
use spinfoil_lang::OutputSink;
use std::sync::atomic::{AtomicBool, Ordering};
use std::time::Duration;

const POLL: Duration = Duration::from_millis(20);
/// How long to wait for late standard-error lines once the cell has finished.
const GRACE: Duration = Duration::from_millis(60);

/// What the cell printed that the caller needs to know about.
#[derive(Debug, Default, Clone, PartialEq)]
pub struct StreamFacts {
    /// The cell panicked: the panic's message (its first line), from standard error.
    pub panic: Option<String>,
}

/// Runs `work` while two threads stream `stdout` and `stderr` lines to `sink`; returns its
/// result and what the streams showed.
pub fn forwarding<R>(stdout: &Receiver<String>, stderr: &Receiver<String>, sink: &dyn OutputSink, work: impl FnOnce() -> R) -> (R, StreamFacts) {
    let done = AtomicBool::new(false);
    std::thread::scope(|scope| {
        scope.spawn(|| pump(stdout, &done, |text| sink.stdout(text)));
        let errors = scope.spawn(|| {
            let mut panic = PanicReader::default();
            pump(stderr, &done, |text| {
                text.lines().for_each(|line| panic.read(line));
                sink.stderr(text)
            });
            StreamFacts { panic: panic.message }
        });
        let result = work();
        done.store(true, Ordering::SeqCst);
        let facts = errors.join().unwrap_or_default();
        (result, facts)
    })
}

/// Finds the panic message in standard error: the line after `thread '…' panicked at …:`
/// (the location is in evcxr's generated code, so it is left out).
#[derive(Default)]
struct PanicReader {
    after_header: bool,
    message: Option<String>,
}

impl PanicReader {
    fn read(&mut self, line: &str) {
        if self.message.is_some() {
            return;
        }
        if self.after_header {
            self.message = Some(line.trim().to_string());
        } else {
            self.after_header = line.starts_with("thread '") && line.contains("panicked at");
        }
    }
}

/// Sends lines to `emit` in batches (all lines waiting at once become one text) until `done`
/// and the channel stays quiet for [`GRACE`].
fn pump(lines: &Receiver<String>, done: &AtomicBool, mut emit: impl FnMut(&str)) {
    loop {
        let wait = if done.load(Ordering::SeqCst) { GRACE } else { POLL };
        match lines.recv_timeout(wait) {
            Ok(first) => {
                let mut text = format!("{first}\n");
                while let Ok(more) = lines.try_recv() {
                    text.push_str(&more);
                    text.push('\n');
                }
                emit(&text);
            }
            Err(RecvTimeoutError::Timeout) if done.load(Ordering::SeqCst) && wait == GRACE => return,
            Err(RecvTimeoutError::Timeout) => {}
            Err(RecvTimeoutError::Disconnected) => return,
        }
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use spinfoil_lang::{CollectedOutput, OutputEvent};

    #[test]
    fn lines_reach_the_sink_and_panics_are_noticed() {
        let (out_tx, out_rx) = crossbeam_channel::unbounded();
        let (err_tx, err_rx) = crossbeam_channel::unbounded();
        let sink = CollectedOutput::default();
        let (value, facts) = forwarding(&out_rx, &err_rx, &sink, || {
            out_tx.send("carry 61.2 m".to_string()).unwrap();
            err_tx.send("thread '<unnamed>' (7) panicked at src/lib.rs:3:1:".to_string()).unwrap();
            err_tx.send("on purpose".to_string()).unwrap();
            std::thread::sleep(Duration::from_millis(50));
            7
        });
        assert_eq!(value, 7);
        assert_eq!(facts.panic.as_deref(), Some("on purpose"));
        let events = sink.take();
        assert!(events.contains(&OutputEvent::Stdout("carry 61.2 m\n".into())), "{events:?}");
        assert!(events.iter().any(|e| matches!(e, OutputEvent::Stderr(t) if t.contains("panicked"))));
    }
}
