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

    /// The accepted values in words, with the unit the key names, e.g. `a number from 0 to 45 m/s`
    /// or `one of "backhand", "forehand"`.
    pub fn allowed(&self) -> String {
        let unit = match key_unit(self.key) {
            Some("°") => "°".to_string(),
            Some(u) => format!(" {u}"),
            None => String::new(),
        };
        match self.kind {
            OptionKind::Number { min, max } => format!("a number from {} to {}{unit}", fmt_num(min), fmt_num(max)),
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

/// Unit suffixes of option keys and the units they stand for, longest suffix first.
const KEY_UNITS: &[(&str, &str)] = &[
    ("_g_m2_s", "g·m²/s"),
    ("_pa_s", "Pa·s"),
    ("_deg_s", "°/s"),
    ("_rad_s", "rad/s"),
    ("_g_cm3", "g/cm³"),
    ("_n_m", "N·m"),
    ("_mps", "m/s"),
    ("_kmh", "km/h"),
    ("_rpm", "rpm"),
    ("_rps", "rev/s"),
    ("_deg", "°"),
    ("_rad", "rad"),
    ("_pct", "%"),
    ("_hpa", "hPa"),
    ("_hz", "Hz"),
    ("_nm", "N·m"),
    ("_kg", "kg"),
    ("_mm", "mm"),
    ("_cm", "cm"),
    ("_m", "m"),
    ("_s", "s"),
    ("_g", "g"),
    ("_j", "J"),
    ("_c", "°C"),
];

/// The unit a key names by its suffix (`speed_mps` → `m/s`, `temperature_c` → `°C`); `None`
/// for keys without one (`count`, `seed`).
pub(crate) fn key_unit(key: &str) -> Option<&'static str> {
    KEY_UNITS.iter().find(|(suffix, _)| key.len() > suffix.len() && key.ends_with(suffix)).map(|(_, unit)| *unit)
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

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn key_units_come_from_the_longest_suffix() {
        assert_eq!(key_unit("speed_mps"), Some("m/s"));
        assert_eq!(key_unit("wrist_torque_n_m"), Some("N·m"));
        assert_eq!(key_unit("wobble_rad_s"), Some("rad/s"));
        assert_eq!(key_unit("time_sd_s"), Some("s"));
        assert_eq!(key_unit("temperature_c"), Some("°C"));
        assert_eq!(key_unit("density_g_cm3"), Some("g/cm³"));
        assert_eq!(key_unit("count"), None);
        assert_eq!(key_unit("_m"), None);
    }

    #[test]
    fn allowed_numbers_name_their_unit() {
        assert_eq!(OptionSpec::optional("speed_mps", 0.0, 45.0, "").allowed(), "a number from 0 to 45 m/s");
        assert_eq!(OptionSpec::number("work_j", 0.0, 1000.0, "").allowed(), "a number from 0 to 1000 J");
        assert_eq!(OptionSpec::optional("hyzer_deg", -90.0, 90.0, "").allowed(), "a number from -90 to 90°");
        assert_eq!(OptionSpec::integer("count", 1, 10, "").allowed(), "a whole number from 1 to 10");
    }
}
