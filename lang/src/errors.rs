//! Errors raised by our script functions, tagged with a kind the session reports.

use rhai::{Dynamic, EvalAltResult, Position};

/// Kinds of errors our packages raise; each message starts with `"<Kind>: "`.
pub(crate) const KNOWN_KINDS: &[&str] =
    &["OptionError", "DesignError", "FileError", "ValueError", "EngineError", "Interrupted"];

/// A runtime error of `kind` (one of [`KNOWN_KINDS`]) at `pos`, catchable in scripts as the text
/// `"<kind>: <message>"`.
pub(crate) fn script_error(kind: &str, message: impl AsRef<str>, pos: Position) -> Box<EvalAltResult> {
    let text = format!("{kind}: {}", message.as_ref());
    Box::new(EvalAltResult::ErrorRuntime(Dynamic::from(text), pos))
}

/// Splits `"<Kind>: message"` into its known kind and the message.
pub(crate) fn split_kind(text: &str) -> Option<(&str, &str)> {
    let (kind, rest) = text.split_once(": ")?;
    KNOWN_KINDS.contains(&kind).then_some((kind, rest))
}

/// A script type name as users know it (`int`, `float`, `string`, ...).
pub(crate) fn friendly_type(value: &rhai::Dynamic) -> String {
    let name = value.type_name();
    let short = name.rsplit("::").next().unwrap_or(name);
    match short {
        "i64" | "i32" => "int".into(),
        "f64" | "f32" => "float".into(),
        "ImmutableString" | "string" | "&str" => "string".into(),
        "Array" | "array" => "array".into(),
        "Map" | "map" => "map".into(),
        "()" => "nothing".into(),
        "DiscValue" => "Disc".into(),
        "OutlineValue" => "Outline".into(),
        "ThrowValue" => "Throw".into(),
        "EnvironmentValue" => "Environment".into(),
        "FlightValue" => "Flight".into(),
        "ChartValue" => "Chart".into(),
        other => other.into(),
    }
}

/// Levenshtein edit distance between two short names.
pub(crate) fn edit_distance(a: &str, b: &str) -> usize {
    let b: Vec<char> = b.chars().collect();
    let mut row: Vec<usize> = (0..=b.len()).collect();
    for (i, ca) in a.chars().enumerate() {
        let mut diagonal = row[0];
        row[0] = i + 1;
        for (j, cb) in b.iter().enumerate() {
            let substitution = diagonal + usize::from(ca != *cb);
            diagonal = row[j + 1];
            row[j + 1] = substitution.min(row[j] + 1).min(row[j + 1] + 1);
        }
    }
    row[b.len()]
}

/// The candidate closest to `name`, when it is close enough to be a likely typo (or shares the
/// name's stem before its unit suffix, e.g. `diameter_mm` → `diameter_cm`, or is the name with a
/// unit added, e.g. `speed` → `speed_mps`).
pub(crate) fn closest<'a>(name: &str, candidates: impl IntoIterator<Item = &'a str>) -> Option<&'a str> {
    let stem = |s: &str| s.rsplit_once('_').map_or(s.to_string(), |(head, _)| head.to_string());
    let related = |c: &str| {
        let (a, b) = (stem(name), stem(c));
        let unit_added = name.len() >= 3 && b == name;
        unit_added
            || name.contains('_') && (a == b || (a.len() >= 3 && b.starts_with(&a)) || (b.len() >= 3 && a.starts_with(&b)))
    };
    candidates
        .into_iter()
        .map(|c| (edit_distance(name, c), c))
        .filter(|(d, c)| *d <= 2.max(name.len() / 3) || related(c))
        .min_by_key(|(d, _)| *d)
        .map(|(_, c)| c)
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn edit_distance_counts_single_edits() {
        assert_eq!(edit_distance("speed_mps", "sped_mps"), 1);
        assert_eq!(edit_distance("kitten", "sitting"), 3);
        assert_eq!(edit_distance("", "abc"), 3);
    }

    #[test]
    fn closest_prefers_same_stem_with_other_unit() {
        assert_eq!(closest("diameter_mm", ["diameter_cm", "rim_width_cm"]), Some("diameter_cm"));
        assert_eq!(closest("sped_mps", ["speed_mps", "spin_rpm"]), Some("speed_mps"));
        assert_eq!(closest("xyzzy", ["speed_mps", "spin_rpm"]), None);
        assert_eq!(closest("temp_c", ["altitude_m", "temperature_c", "humidity_pct"]), Some("temperature_c"));
    }

    #[test]
    fn closest_finds_the_key_with_its_unit_added() {
        assert_eq!(closest("speed", ["spin_rpm", "speed_mps", "speed_kmh"]), Some("speed_mps"));
        assert_eq!(closest("spin", ["speed_mps", "spin_rpm"]), Some("spin_rpm"));
        assert_eq!(closest("split_radius", ["split_radius_cm"]), Some("split_radius_cm"));
        assert_eq!(closest("rim", ["rim_width_cm", "rim_depth_cm"]), None);
    }

    #[test]
    fn split_kind_only_accepts_known_kinds() {
        assert_eq!(split_kind("OptionError: bad"), Some(("OptionError", "bad")));
        assert_eq!(split_kind("hello: world"), None);
    }
}
