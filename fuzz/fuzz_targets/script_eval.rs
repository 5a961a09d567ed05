//! Fuzzes script evaluation: the input, as UTF-8, is one cell run in a fresh `Session` with
//! small limits (operations, sizes, depths) and a one-second wall-clock watchdog that interrupts
//! it, so runaway scripts end quickly. Any outcome is fine except a panic, an abort or a hang;
//! afterwards the session must still evaluate a trivial cell.
#![no_main]
use libfuzzer_sys::fuzz_target;
use spinfoil_lang::{CollectedOutput, InterruptHandle, Session, SessionSettings};
use std::sync::{Arc, Mutex, OnceLock};
use std::time::{Duration, Instant};

/// Wall-clock budget of one fuzz cell before the watchdog interrupts it.
const CELL_BUDGET: Duration = Duration::from_secs(1);

/// The session being run and when to interrupt it.
type Watched = Mutex<Option<(InterruptHandle, Instant)>>;

fn watchdog() -> &'static Watched {
    static WATCHED: OnceLock<Watched> = OnceLock::new();
    WATCHED.get_or_init(|| {
        std::thread::spawn(|| loop {
            std::thread::sleep(Duration::from_millis(20));
            if let Some((handle, deadline)) = watchdog().lock().unwrap().as_ref() {
                if Instant::now() > *deadline {
                    handle.interrupt();
                }
            }
        });
        Mutex::new(None)
    })
}

fn settings() -> SessionSettings {
    SessionSettings {
        max_operations: 200_000,
        max_array_size: 10_000,
        max_string_size: 100_000,
        max_map_size: 1_000,
        max_call_depth: 16,
        max_expression_depth: 32,
        max_function_expression_depth: 16,
        study_dir: None,
        ..SessionSettings::default()
    }
}

fuzz_target!(|data: &[u8]| {
    let Ok(code) = std::str::from_utf8(data) else { return };
    let mut session = Session::new(settings());
    *watchdog().lock().unwrap() = Some((session.interrupt_handle(), Instant::now() + CELL_BUDGET));
    let _ = session.eval(code, Arc::new(CollectedOutput::default()));
    *watchdog().lock().unwrap() = None;
    let _ = session.complete(code, code.chars().count() / 2);
    let _ = session.is_complete(code);
    let after = session.eval("40 + 2", Arc::new(CollectedOutput::default()));
    assert_eq!(after.ok().flatten().and_then(|b| b.text_plain().map(str::to_string)).as_deref(), Some("42"));
});
