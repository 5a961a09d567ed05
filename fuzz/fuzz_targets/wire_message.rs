//! Fuzzes the Jupyter wire-message parser (`WireMessage::parse_within`) and what the kernel does
//! with a parsed request before it reaches the session: the typed contents and the history
//! query. Input: the first byte picks the key (even: no key, so parsing reaches every part;
//! odd: a key, so signatures are checked) and a small size cap (every fourth value); the rest is
//! split into frames at each 0x1E byte (ASCII record separator).
#![no_main]
use libfuzzer_sys::fuzz_target;
use spinfoil_kernel::jupyter::history::History;
use spinfoil_kernel::jupyter::messages::{CodeAtCursor, ExecuteRequest, HistoryRequest, IsCompleteRequest, ShutdownRequest};
use spinfoil_kernel::jupyter::wire::DEFAULT_MAX_MESSAGE_BYTES;
use spinfoil_kernel::jupyter::{Signer, WireMessage};

fuzz_target!(|data: &[u8]| {
    let Some((&choice, rest)) = data.split_first() else { return };
    let signer = Signer::new(if choice % 2 == 0 { "" } else { "fuzz-key" });
    let cap = if choice % 4 == 1 { 256 } else { DEFAULT_MAX_MESSAGE_BYTES };
    let frames: Vec<Vec<u8>> = rest.split(|&b| b == 0x1e).map(<[u8]>::to_vec).collect();
    let Ok(message) = WireMessage::parse_within(frames, &signer, cap) else { return };
    // What the kernel sends back must parse to the same message.
    let again = WireMessage::parse(message.to_frames(&signer), &signer).expect("the kernel's own frames parse");
    assert_eq!(again, message);
    let reply = message.reply("status", status_of(&message));
    assert!(WireMessage::parse(reply.to_frames(&signer), &signer).is_ok());
    exercise_contents(&message);
});

fn status_of(message: &WireMessage) -> spinfoil_kernel::jupyter::messages::Status<'_> {
    spinfoil_kernel::jupyter::messages::Status { execution_state: message.header.msg_type.as_str() }
}

fn exercise_contents(message: &WireMessage) {
    let _ = message.content_as::<ExecuteRequest>();
    let _ = message.content_as::<CodeAtCursor>();
    let _ = message.content_as::<IsCompleteRequest>();
    let _ = message.content_as::<ShutdownRequest>();
    if let Ok(query) = message.content_as::<HistoryRequest>() {
        let mut history = History::default();
        for (line, input) in ["let a = 1", "a * 2", "print(\"*?\")", ""].iter().enumerate() {
            history.record(line + 1, input, Some(format!("{line}")));
        }
        let _ = history.answer(&query);
    }
}
