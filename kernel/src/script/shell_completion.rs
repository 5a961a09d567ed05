//! Tab completion at the interactive prompt: the session's own completions (functions, option
//! keys inside an option map, fields after `value.`, variables), as the Jupyter kernel offers.
use rustyline::completion::Completer;
use rustyline::highlight::Highlighter;
use rustyline::hint::Hinter;
use rustyline::validate::Validator;
use rustyline::{Context, Helper};
use spinfoil_lang::Session;
use std::cell::RefCell;
use std::rc::Rc;

/// The prompt's helper: completes against the shared session and the lines of the cell typed
/// so far (so option keys complete on a continuation line too).
pub struct ShellHelper {
    session: Rc<RefCell<Session>>,
    pending: RefCell<String>,
}

impl ShellHelper {
    /// A helper completing against `session`.
    pub fn new(session: Rc<RefCell<Session>>) -> Self {
        Self { session, pending: RefCell::new(String::new()) }
    }

    /// The earlier lines of the cell being typed (empty at a fresh prompt).
    pub fn set_pending(&self, code: &str) {
        self.pending.replace(code.to_string());
    }

    /// Candidates for the word before byte `pos` of `line`: the byte where they start, and them.
    pub fn candidates(&self, line: &str, pos: usize) -> (usize, Vec<String>) {
        let Ok(session) = self.session.try_borrow() else { return (pos, Vec::new()) };
        let pending = self.pending.borrow();
        let before = pending.chars().count();
        let code = format!("{pending}{line}");
        let cursor = before + line[..pos.min(line.len())].chars().count();
        let found = session.complete(&code, cursor);
        let start = found.cursor_start.saturating_sub(before);
        let start_byte = line.char_indices().nth(start).map_or(line.len(), |(byte, _)| byte);
        (start_byte, found.matches)
    }
}

impl Completer for ShellHelper {
    type Candidate = String;

    fn complete(&self, line: &str, pos: usize, _ctx: &Context<'_>) -> rustyline::Result<(usize, Vec<String>)> {
        Ok(self.candidates(line, pos))
    }
}

impl Hinter for ShellHelper {
    type Hint = String;
}

impl Highlighter for ShellHelper {}

impl Validator for ShellHelper {}

impl Helper for ShellHelper {}

#[cfg(test)]
mod tests {
    use super::*;
    use spinfoil_lang::SessionSettings;

    #[test]
    fn completes_functions_option_keys_and_continuation_lines() {
        let session = Rc::new(RefCell::new(Session::new(SessionSettings::default())));
        let helper = ShellHelper::new(session);
        assert_eq!(helper.candidates("let t = throw_rel", 17), (8, vec!["throw_release".to_string()]));
        let (start, keys) = helper.candidates("throw_release(#{ spe", 20);
        assert_eq!(start, 17);
        assert!(keys.contains(&"speed_mps".to_string()) && keys.contains(&"speed_kmh".to_string()), "{keys:?}");
        helper.set_pending("let t = throw_release(#{\n");
        let (start, keys) = helper.candidates("    hyz", 7);
        assert_eq!((start, keys), (4, vec!["hyzer_deg".to_string()]));
    }
}
