use super::spec::{fmt_num, OptionKind, OptionSpec};
use crate::errors::{closest, script_error};
use rhai::{Dynamic, EvalAltResult, Map, Position};
use std::collections::BTreeMap;

/// The checked values of one option map, by key.
#[derive(Debug, Clone, Default, PartialEq)]
pub struct OptionValues {
    numbers: BTreeMap<String, f64>,
    texts: BTreeMap<String, String>,
    flags: BTreeMap<String, bool>,
    context: String,
    pos: Position,
}

type Checked<T> = Result<T, Box<EvalAltResult>>;

/// Checks `map` against `specs` for the function `context` called at `pos`: every key must be
/// known, of the right type and in range; every required key present. Errors name the key, the
/// value, the allowed range and the position, and suggest the nearest known key for a typo.
pub fn read_options(map: &Map, specs: &[OptionSpec], context: &str, pos: Position) -> Checked<OptionValues> {
    let mut values = OptionValues { context: context.to_string(), pos, ..Default::default() };
    for (key, value) in map {
        let spec = find_spec(key, specs, context, pos)?;
        values.insert(spec, value)?;
    }
    for spec in specs.iter().filter(|s| s.required) {
        if !map.contains_key(spec.key) {
            let msg = format!("{context}: missing option '{}' ({}: {})", spec.key, spec.allowed(), spec.doc);
            return Err(script_error("OptionError", msg, pos));
        }
    }
    Ok(values)
}

fn find_spec<'a>(key: &str, specs: &'a [OptionSpec], context: &str, pos: Position) -> Checked<&'a OptionSpec> {
    if let Some(spec) = specs.iter().find(|s| s.key == key) {
        return Ok(spec);
    }
    let keys: Vec<&str> = specs.iter().map(|s| s.key).collect();
    let hint = match closest(key, keys.iter().copied()) {
        Some(near) => format!("; did you mean '{near}'?"),
        None => String::new(),
    };
    let msg = format!("{context}: unknown option '{key}'{hint} (known options: {})", keys.join(", "));
    Err(script_error("OptionError", msg, pos))
}

impl OptionValues {
    fn fail<T>(&self, spec: &OptionSpec, value: &dyn std::fmt::Display, problem: &str) -> Checked<T> {
        let msg = format!("{}: option '{}' = {value} {problem}; expected {}", self.context, spec.key, spec.allowed());
        Err(script_error("OptionError", msg, self.pos))
    }

    fn insert(&mut self, spec: &OptionSpec, value: &Dynamic) -> Checked<()> {
        match spec.kind {
            OptionKind::Number { min, max } => self.insert_number(spec, value, min, max),
            OptionKind::Integer { min, max } => self.insert_integer(spec, value, min, max),
            OptionKind::Choice(words) => self.insert_choice(spec, value, words),
            OptionKind::Text => self.insert_text(spec, value),
            OptionKind::Flag => match value.as_bool() {
                Ok(flag) => {
                    self.flags.insert(spec.key.to_string(), flag);
                    Ok(())
                }
                Err(found) => self.fail(spec, value, &format!("is a {found}")),
            },
        }
    }

    fn insert_number(&mut self, spec: &OptionSpec, value: &Dynamic, min: f64, max: f64) -> Checked<()> {
        let x = match (value.as_float(), value.as_int()) {
            (Ok(x), _) => x,
            (_, Ok(i)) => i as f64,
            _ => return self.fail(spec, &describe(value), "is not a number"),
        };
        if !x.is_finite() {
            return self.fail(spec, &x, "is not a finite number");
        }
        if x < min || x > max {
            return self.fail(spec, &fmt_num(x), "is out of range");
        }
        self.numbers.insert(spec.key.to_string(), x);
        Ok(())
    }

    fn insert_integer(&mut self, spec: &OptionSpec, value: &Dynamic, min: i64, max: i64) -> Checked<()> {
        let Ok(i) = value.as_int() else {
            return self.fail(spec, &describe(value), "is not a whole number");
        };
        if i < min || i > max {
            return self.fail(spec, &i, "is out of range");
        }
        self.numbers.insert(spec.key.to_string(), i as f64);
        Ok(())
    }

    fn insert_choice(&mut self, spec: &OptionSpec, value: &Dynamic, words: &[&str]) -> Checked<()> {
        let Some(text) = value.read_lock::<rhai::ImmutableString>().map(|s| s.to_string()) else {
            return self.fail(spec, &describe(value), "is not a string");
        };
        if !words.contains(&text.as_str()) {
            return self.fail(spec, &format!("\"{text}\""), "is not allowed");
        }
        self.texts.insert(spec.key.to_string(), text);
        Ok(())
    }

    fn insert_text(&mut self, spec: &OptionSpec, value: &Dynamic) -> Checked<()> {
        match value.read_lock::<rhai::ImmutableString>() {
            Some(text) => {
                self.texts.insert(spec.key.to_string(), text.to_string());
                Ok(())
            }
            None => self.fail(spec, &describe(value), "is not a string"),
        }
    }

    /// The number given for `key`, if any (in the key's unit).
    pub fn number(&self, key: &str) -> Option<f64> {
        self.numbers.get(key).copied()
    }

    /// The number given for `key`, or `default`.
    pub fn number_or(&self, key: &str, default: f64) -> f64 {
        self.number(key).unwrap_or(default)
    }

    /// The text (or choice) given for `key`, if any.
    pub fn text(&self, key: &str) -> Option<&str> {
        self.texts.get(key).map(String::as_str)
    }

    /// The flag given for `key`, or `default`.
    pub fn flag_or(&self, key: &str, default: bool) -> bool {
        self.flags.get(key).copied().unwrap_or(default)
    }

    /// Whether `key` was given.
    pub fn has(&self, key: &str) -> bool {
        self.numbers.contains_key(key) || self.texts.contains_key(key) || self.flags.contains_key(key)
    }

    /// Exactly one of `keys` (the same quantity in different units) must be given: returns the
    /// key given and its value; an error names the keys when none or several are given.
    pub fn one_of<'k>(&self, keys: &[&'k str]) -> Checked<(&'k str, f64)> {
        let given: Vec<&'k str> = keys.iter().copied().filter(|k| self.numbers.contains_key(*k)).collect();
        match given.as_slice() {
            [key] => Ok((key, self.numbers[*key])),
            [] => Err(self.error(&format!("give one of the options {}", keys.join(", ")))),
            _ => Err(self.error(&format!(
                "give only one of the options {} (they are the same quantity in other units)",
                given.join(", ")
            ))),
        }
    }

    /// An option error at the call's position, prefixed with the function's name.
    pub fn error(&self, message: &str) -> Box<EvalAltResult> {
        script_error("OptionError", format!("{}: {message}", self.context), self.pos)
    }
}

fn describe(value: &Dynamic) -> String {
    if value.is_string() {
        format!("\"{value}\" (a string)")
    } else {
        format!("{value} (a {})", crate::errors::friendly_type(value))
    }
}
