//! A flight's name: the label its row, line and legend entry carry in tables and charts. It is
//! the disc's name until the script sets another (`f.name = "..."` or `named(f, "...")`).
use super::args::Fallible;
use super::flights::FlightValue;
use crate::errors::script_error;
use crate::help::{FnDoc, Registrar};
use rhai::{ImmutableString, NativeCallContext};

/// Longest accepted name, in characters (a legend entry, not a paragraph).
pub(crate) const MAX_NAME_CHARS: usize = 200;

/// Registers the `name` field (read and write) of `Flight` and `named`.
pub(crate) fn register(reg: &mut Registrar) {
    reg.getter(
        "Flight",
        "name",
        "the flight's label in tables and charts: the disc's name unless set (f.name = \"...\" or named(f, \"...\"))",
        |f: &mut FlightValue| f.label.clone(),
    );
    reg.engine.register_set("name", |ctx: NativeCallContext, f: &mut FlightValue, name: ImmutableString| {
        f.label = checked_name(&ctx, "Flight.name", &name)?;
        Ok::<_, Box<rhai::EvalAltResult>>(())
    });
    reg.engine.register_fn("named", |ctx: NativeCallContext, f: FlightValue, name: &str| -> Fallible<FlightValue> {
        Ok(FlightValue { label: checked_name(&ctx, "named", name)?, ..f })
    });
    reg.doc(FnDoc::new(
        "named(flight: Flight, name: string) -> Flight",
        "The same flight under another name: the label of its row in compare() and of its line and legend entry in charts (a flight takes its disc's name otherwise). One line of text, up to 200 characters; leading and trailing spaces are dropped. Setting the field works too: f.name = \"...\".",
        "let hyzer = fly(d, throw_release(#{ speed_mps: 24, spin_rpm: 900, hyzer_deg: 15 })).named(\"P-7, 15° hyzer\");\nlet flat = fly(d, throw_release(#{ speed_mps: 24, spin_rpm: 900 }));\nflat.name = \"P-7, flat\";\ncompare([hyzer, flat])",
    ));
}

/// `name` trimmed, when it is one non-empty line of at most [`MAX_NAME_CHARS`] characters; a
/// `ValueError` naming `what` otherwise.
fn checked_name(ctx: &NativeCallContext, what: &str, name: &str) -> Fallible<String> {
    let trimmed = name.trim();
    let problem = if trimmed.is_empty() {
        Some("is empty; give the label to show in tables and charts".to_string())
    } else if trimmed.chars().any(char::is_control) {
        Some("holds a line break or another control character; give one line of text".to_string())
    } else if trimmed.chars().count() > MAX_NAME_CHARS {
        Some(format!("has {} characters; at most {MAX_NAME_CHARS} fit a legend", trimmed.chars().count()))
    } else {
        None
    };
    match problem {
        Some(problem) => Err(script_error("ValueError", format!("{what}: the name {problem}"), ctx.call_position())),
        None => Ok(trimmed.to_string()),
    }
}
