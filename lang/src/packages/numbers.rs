//! `round(x, decimals)`: rounding for printed results (Rhai's own `round` takes no decimals).
use super::args::{value_error, Fallible};
use crate::help::{FnDoc, Registrar};
use rhai::NativeCallContext;

/// Most decimals `round` accepts (beyond them an f64 has no digits left to round).
const MAX_DECIMALS: rhai::INT = 12;

/// Registers `round(x, decimals)` for floats and integers.
pub(crate) fn register(reg: &mut Registrar) {
    reg.section("numbers", "rounding results for printing");
    reg.engine.register_fn("round", |ctx: NativeCallContext, x: f64, decimals: rhai::INT| round_to(&ctx, x, decimals));
    reg.engine.register_fn("round", |ctx: NativeCallContext, x: rhai::INT, decimals: rhai::INT| round_to(&ctx, x as f64, decimals));
    reg.doc(FnDoc::new(
        "round(x: float, decimals: int) -> float",
        "x rounded to 0 to 12 decimals (halves away from zero), for printing: `f.carry_m.round(1)`. Without decimals, x.round() rounds to a whole number as before.",
        "print(`carry ${f.carry_m.round(1)} m`);",
    ));
}

fn round_to(ctx: &NativeCallContext, x: f64, decimals: rhai::INT) -> Fallible<f64> {
    if !(0..=MAX_DECIMALS).contains(&decimals) {
        return Err(value_error(ctx, format!("decimals = {decimals} is out of range; expected a whole number from 0 to {MAX_DECIMALS}")));
    }
    let scale = 10f64.powi(decimals as i32);
    Ok((x * scale).round() / scale)
}
