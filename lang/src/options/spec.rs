/// What values one option key accepts.
#[derive(Debug, Clone, Copy, PartialEq)]
pub enum OptionKind {
    /// A number (integers accepted) within `min ..= max`, in the unit the key names.
    Number {
        /// Smallest allowed value.
        min: f64,
        /// Largest allowed value.
        max: f64,
    },
    /// A whole number within `min ..= max`.
    Integer {
        /// Smallest allowed value.
        min: i64,
        /// Largest allowed value.
        max: i64,
    },
    /// One of a fixed set of words.
    Choice(&'static [&'static str]),
    /// Any text.
    Text,
    /// `true` or `false`.
    Flag,
}

/// One key of an option map: its name (with its unit), what it accepts and what it means.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct OptionSpec {
    /// The key, ending in its unit (`speed_mps`, `diameter_cm`).
    pub key: &'static str,
    /// Accepted values.
    pub kind: OptionKind,
    /// Whether the key must be given.
    pub required: bool,
    /// What the key means, including its default when optional.
    pub doc: &'static str,
}

impl OptionSpec {
    /// A required number in `min ..= max`.
    pub const fn number(key: &'static str, min: f64, max: f64, doc: &'static str) -> Self {
        Self { key, kind: OptionKind::Number { min, max }, required: true, doc }
    }

    /// An optional number in `min ..= max` (its default stated in `doc`).
    pub const fn optional(key: &'static str, min: f64, max: f64, doc: &'static str) -> Self {
        Self { key, kind: OptionKind::Number { min, max }, required: false, doc }
    }

    /// An optional whole number in `min ..= max`.
    pub const fn integer(key: &'static str, min: i64, max: i64, doc: &'static str) -> Self {
        Self { key, kind: OptionKind::Integer { min, max }, required: false, doc }
    }

    /// An optional choice among `words`.
    pub const fn choice(key: &'static str, words: &'static [&'static str], doc: &'static str) -> Self {
        Self { key, kind: OptionKind::Choice(words), required: false, doc }
    }

    /// An optional text.
    pub const fn text(key: &'static str, doc: &'static str) -> Self {
        Self { key, kind: OptionKind::Text, required: false, doc }
    }

    /// An optional flag.
    pub const fn flag(key: &'static str, doc: &'static str) -> Self {
        Self { key, kind: OptionKind::Flag, required: false, doc }
    }

    /// The accepted values in words, e.g. `a number from 0 to 60` or `one of "backhand", "forehand"`.
    pub fn allowed(&self) -> String {
        match self.kind {
            OptionKind::Number { min, max } => format!("a number from {} to {}", fmt_num(min), fmt_num(max)),
            OptionKind::Integer { min, max } => format!("a whole number from {min} to {max}"),
            OptionKind::Choice(words) => {
                let quoted: Vec<String> = words.iter().map(|w| format!("\"{w}\"")).collect();
                format!("one of {}", quoted.join(", "))
            }
            OptionKind::Text => "a string".to_string(),
            OptionKind::Flag => "true or false".to_string(),
        }
    }
}

/// A number as a person writes it: no trailing `.0`, no exponent for everyday sizes.
pub(crate) fn fmt_num(x: f64) -> String {
    if x.is_finite() && x == x.trunc() && x.abs() < 1e15 {
        format!("{}", x as i64)
    } else {
        format!("{x}")
    }
}

/// A number with at most `decimals` decimals, trailing zeros removed (`2.2000` → `2.2`).
pub(crate) fn fmt_short(x: f64, decimals: usize) -> String {
    let text = format!("{x:.decimals$}");
    if text.contains('.') {
        text.trim_end_matches('0').trim_end_matches('.').to_string()
    } else {
        text
    }
}
