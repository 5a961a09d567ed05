//! List-valued options (`values: [...]`, `metrics: [...]`), which the option checker does not
//! cover: taken out of the map before it checks the rest, and checked here.
use crate::packages::args::{number_arg, value_error, Fallible};
use rhai::{Array, Map, NativeCallContext};

/// Removes `key` from `map` and returns its array, if given (other values are left for the
/// checker, which then names the key and the wrong type).
pub(crate) fn take_list(map: &mut Map, key: &str) -> Option<Array> {
    if map.get(key).is_some_and(|v| v.is_array()) {
        return map.remove(key).and_then(|v| v.try_cast::<Array>());
    }
    None
}

/// The numbers of a list option (at least one).
pub(crate) fn number_list(ctx: &NativeCallContext, key: &str, list: &Array) -> Fallible<Vec<f64>> {
    if list.is_empty() {
        return Err(value_error(ctx, format!("{key} is empty; give at least one number")));
    }
    list.iter().enumerate().map(|(i, v)| number_arg(ctx, &format!("{key}[{i}]"), v, -1e9, 1e9)).collect()
}

/// The strings of a list option (at least one).
pub(crate) fn text_list(ctx: &NativeCallContext, key: &str, list: &Array) -> Fallible<Vec<String>> {
    if list.is_empty() {
        return Err(value_error(ctx, format!("{key} is empty; give at least one name")));
    }
    list.iter()
        .enumerate()
        .map(|(i, v)| v.clone().into_string().map_err(|_| value_error(ctx, format!("{key}[{i}] must be a string, got {v}"))))
        .collect()
}

/// A `ValueError` when one of the list `keys` was given as something other than a list (the
/// checker let it through as text).
pub(crate) fn lists_only(ctx: &NativeCallContext, opts: &crate::options::OptionValues, keys: &[&str]) -> Fallible<()> {
    match keys.iter().find(|k| opts.has(k)) {
        Some(key) => Err(value_error(ctx, format!("{key} must be a list [...]"))),
        None => Ok(()),
    }
}

/// A study error as the user reads it: an unknown input or metric also names the nearest known
/// one (`throw.sped_mps` → `throw.speed_mps`, `carry` → `carry_m`).
pub(crate) fn study_error_text(error: &spinfoil_engine::StudyError) -> String {
    use spinfoil_engine::StudyError as E;
    let (what, name, known) = match error {
        E::UnknownInput { name, known } => ("input", name, known),
        E::UnknownMetric { name, known } => ("metric", name, known),
        other => return other.to_string(),
    };
    match crate::errors::closest(name, known.split(", ")) {
        Some(near) => format!("unknown {what} \"{name}\"; did you mean \"{near}\"? known {what}s: {known}"),
        None => error.to_string(),
    }
}
