use super::scan::is_ident;
use super::Session;
use crate::output::MimeBundle;

impl Session {
    /// The documentation of the name under `cursor` (in code points): one of our functions, a
    /// type's fields, a script function, or a variable's type and value.
    pub fn inspect(&self, code: &str, cursor: usize) -> Option<MimeBundle> {
        let name = word_at(code, cursor)?;
        if !self.docs.find(&name).is_empty() || !self.docs.fields_of(&name).is_empty() {
            return Some(MimeBundle::plain(self.docs.help(&name)));
        }
        if let Some((_, params)) = self.script_functions().into_iter().find(|(n, _)| *n == name) {
            return Some(MimeBundle::plain(format!("fn {name}({}) (defined in this notebook)", params.join(", "))));
        }
        let (_, _, value) = self.scope.iter_raw().find(|(n, _, _)| *n == name)?;
        let type_name = crate::errors::friendly_type(value);
        let type_name = type_name.as_str();
        let shown = crate::render::text_of(value, &self.engine);
        let mut text = format!("{name}: {type_name} = {shown}");
        let fields = self.docs.fields_of(type_name);
        if !fields.is_empty() {
            text.push_str(&format!("\n\n{}", self.docs.help(type_name)));
        }
        Some(MimeBundle::plain(text))
    }
}

/// The identifier touching `cursor` (code points), if any.
fn word_at(code: &str, cursor: usize) -> Option<String> {
    let chars: Vec<char> = code.chars().collect();
    let cursor = cursor.min(chars.len());
    let start = (0..cursor).rev().take_while(|&k| is_ident(chars[k])).last().unwrap_or(cursor);
    let end = (cursor..chars.len()).take_while(|&k| is_ident(chars[k])).last().map_or(cursor, |k| k + 1);
    (start < end).then(|| chars[start..end].iter().collect())
}
