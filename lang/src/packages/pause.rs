//! `sleep`, replaced so that a pause obeys the interrupt flag (Rhai's own blocks the thread).
use super::PackageContext;
use crate::help::{FnDoc, Registrar};
use crate::session::InterruptHandle;
use std::time::{Duration, Instant};

/// Longest pause one call may ask for, s.
const MAX_PAUSE_S: f64 = 3600.0;
/// How often a pause looks at the interrupt flag.
const SLICE: Duration = Duration::from_millis(20);

/// Registers `sleep(seconds)` for integers and floats.
pub(crate) fn register(reg: &mut Registrar, context: &PackageContext) {
    let flag = context.interrupt.clone();
    reg.engine.register_fn("sleep", move |seconds: f64| pause(&flag, seconds));
    let flag = context.interrupt.clone();
    reg.engine.register_fn("sleep", move |seconds: rhai::INT| pause(&flag, seconds as f64));
    reg.doc(FnDoc::new(
        "sleep(seconds: float)",
        "Pauses the cell (at most 3600 s); an interrupt ends the pause at once.",
        "sleep(0.5);",
    ));
}

fn pause(flag: &InterruptHandle, seconds: f64) {
    let seconds = if seconds.is_finite() { seconds.clamp(0.0, MAX_PAUSE_S) } else { 0.0 };
    let end = Instant::now() + Duration::from_secs_f64(seconds);
    while !flag.is_interrupted() {
        let now = Instant::now();
        if now >= end {
            return;
        }
        std::thread::sleep(SLICE.min(end - now));
    }
}
