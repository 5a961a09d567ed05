use super::scan::{is_ident, scan};
use super::Session;

/// Completion candidates for the identifier at the cursor (Jupyter's `complete_reply`).
#[derive(Debug, Clone, Default, PartialEq, Eq)]
pub struct Completions {
    /// Candidates, sorted, without duplicates.
    pub matches: Vec<String>,
    /// Start of the text the candidates replace, in Unicode code points.
    pub cursor_start: usize,
    /// End of the text the candidates replace, in Unicode code points.
    pub cursor_end: usize,
}

const KEYWORDS: &[&str] = &[
    "let", "const", "fn", "if", "else", "for", "in", "while", "loop", "do", "until", "break", "continue", "return",
    "throw", "try", "catch", "switch", "true", "false", "this", "print", "debug",
];

impl Session {
    /// Completions at `cursor` (in code points): option keys inside an option map of one of our
    /// functions, fields after `value.`, otherwise our functions, script functions, variables
    /// and keywords.
    pub fn complete(&self, code: &str, cursor: usize) -> Completions {
        let chars: Vec<char> = code.chars().collect();
        let cursor = cursor.min(chars.len());
        let start = (0..cursor).rev().take_while(|&k| is_ident(chars[k])).last().unwrap_or(cursor);
        let end = (cursor..chars.len()).take_while(|&k| is_ident(chars[k])).last().map_or(cursor, |k| k + 1);
        let prefix: String = chars[start..cursor].iter().collect();
        let before: String = chars[..start].iter().collect();
        let mut matches: Vec<String> =
            self.candidates(&before).into_iter().filter(|c| c.starts_with(&prefix)).collect();
        matches.sort();
        matches.dedup();
        Completions { matches, cursor_start: start, cursor_end: end }
    }

    fn candidates(&self, before: &str) -> Vec<String> {
        if let Some(keys) = self.option_keys(before) {
            return keys;
        }
        if let Some(receiver) = before.strip_suffix('.') {
            return self.member_names(receiver);
        }
        let mut names: Vec<String> = self.docs.names().iter().map(|s| s.to_string()).collect();
        names.extend(self.script_functions().into_iter().map(|(n, _)| n));
        names.extend(self.variables().into_iter().map(|(n, _)| n));
        names.extend(KEYWORDS.iter().map(|s| s.to_string()));
        names
    }

    /// Option keys when the cursor is at a key position of `#{` directly inside `f(`.
    fn option_keys(&self, before: &str) -> Option<Vec<String>> {
        let state = scan(before);
        let [.., call, map] = state.stack.as_slice() else { return None };
        if map.bracket != '#' || call.bracket != '(' || state.open_string.is_some() {
            return None;
        }
        let last = before.trim_end().chars().last()?;
        if last != '{' && last != ',' {
            return None;
        }
        let name = call.caller.as_deref()?;
        let keys = self.docs.find(name).iter().flat_map(|d| d.options.iter().map(|o| o.key.to_string())).collect();
        Some(keys)
    }

    /// Fields readable on the variable before the dot (all known fields when its type is unknown).
    fn member_names(&self, receiver: &str) -> Vec<String> {
        let chars: Vec<char> = receiver.chars().collect();
        let name = super::scan::identifier_before(&chars, chars.len()).unwrap_or_default();
        let type_name = self.variables().into_iter().find(|(n, _)| *n == name).map(|(_, t)| t);
        let fields = self
            .docs
            .fields
            .iter()
            .filter(|f| type_name.as_ref().is_none_or(|t| *t == f.type_name))
            .map(|f| f.field.clone());
        let methods =
            self.docs.functions.iter().filter(|d| {
                type_name.as_ref().is_some_and(|t| first_parameter_type(&d.signature).contains(t.as_str()))
            });
        fields.chain(methods.map(|d| d.name.clone())).collect()
    }
}

/// The type of a signature's first parameter: `to_csv(flight: Flight) -> string` → `Flight`.
fn first_parameter_type(signature: &str) -> &str {
    let inside = signature.split_once('(').map_or("", |(_, rest)| rest);
    let first = inside.split([',', ')']).next().unwrap_or("");
    first.split_once(':').map_or("", |(_, t)| t.trim())
}
