//! Checking positional arguments and turning engine errors into script errors.
use crate::errors::script_error;
use rhai::{Dynamic, EvalAltResult, NativeCallContext};

/// A script result.
pub(crate) type Fallible<T> = Result<T, Box<EvalAltResult>>;

/// A positional number argument (integers accepted), finite and within `min ..= max`.
pub(crate) fn number_arg(ctx: &NativeCallContext, arg: &str, value: &Dynamic, min: f64, max: f64) -> Fallible<f64> {
    let x = match (value.as_float(), value.as_int()) {
        (Ok(x), _) => x,
        (_, Ok(i)) => i as f64,
        _ => {
            return Err(value_error(
                ctx,
                format!("{arg} must be a number, got {value} (a {})", crate::errors::friendly_type(value)),
            ))
        }
    };
    if !x.is_finite() || x < min || x > max {
        let range = format!("{} to {}", crate::options::fmt_num(min), crate::options::fmt_num(max));
        return Err(value_error(ctx, format!("{arg} = {x} is out of range; expected a number from {range}")));
    }
    Ok(x)
}

/// A `ValueError` at the call, prefixed with the function's name.
pub(crate) fn value_error(ctx: &NativeCallContext, message: String) -> Box<EvalAltResult> {
    script_error("ValueError", format!("{}: {message}", ctx.fn_name()), ctx.call_position())
}

/// A `DesignError` at the call (an impossible disc, layup or outline), from an engine error.
pub(crate) fn design_error(ctx: &NativeCallContext, err: impl std::fmt::Display) -> Box<EvalAltResult> {
    script_error("DesignError", format!("{}: {err}", ctx.fn_name()), ctx.call_position())
}

/// An `EngineError` at the call (the simulation could not complete).
pub(crate) fn engine_error(ctx: &NativeCallContext, err: impl std::fmt::Display) -> Box<EvalAltResult> {
    script_error("EngineError", format!("{}: {err}", ctx.fn_name()), ctx.call_position())
}

/// Reads the option map of a call with `specs`.
pub(crate) fn options(
    ctx: &NativeCallContext,
    map: &rhai::Map,
    specs: &[crate::options::OptionSpec],
) -> Fallible<crate::options::OptionValues> {
    crate::options::read_options(map, specs, ctx.fn_name(), ctx.call_position())
}
