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
    reg.engine.register_fn("sleep", move |ctx: rhai::NativeCallContext, seconds: f64| pause(&ctx, &flag, seconds));
    let flag = context.interrupt.clone();
    reg.engine.register_fn("sleep", move |ctx: rhai::NativeCallContext, seconds: rhai::INT| pause(&ctx, &flag, seconds as f64));
    reg.doc(FnDoc::new(
        "sleep(seconds: float)",
        "Pauses the cell (at most 3600 s); an interrupt ends the pause at once.",
        "sleep(0.5);",
    ));
}

/// Pauses; an interrupt (or the end of the cell's wall time) ends the pause and the cell, even
/// when the pause is the cell's last statement.
fn pause(ctx: &rhai::NativeCallContext, flag: &InterruptHandle, seconds: f64) -> Result<(), Box<rhai::EvalAltResult>> {
    let seconds = if seconds.is_finite() { seconds.clamp(0.0, MAX_PAUSE_S) } else { 0.0 };
    let end = Instant::now() + Duration::from_secs_f64(seconds);
    while !flag.is_interrupted() {
        let now = Instant::now();
        if now >= end {
            return Ok(());
        }
        std::thread::sleep(SLICE.min(end - now));
    }
    Err(rhai::EvalAltResult::ErrorTerminated(rhai::Dynamic::from("interrupted"), ctx.call_position()).into())
}
