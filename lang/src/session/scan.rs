//! A light lexical scan of (part of) a cell: open brackets, strings and comments. Enough for
//! completion contexts and for telling an unfinished cell from a finished one.

/// An open bracket at the end of the scanned text.
#[derive(Debug, Clone, PartialEq)]
pub(crate) struct Open {
    /// `(`, `[`, `{`, or `#` for an object map `#{`.
    pub bracket: char,
    /// For `(`: the identifier just before it (the function being called).
    pub caller: Option<String>,
}

/// The state at the end of the scanned text.
#[derive(Debug, Clone, Default, PartialEq)]
pub(crate) struct Scan {
    /// Brackets still open, innermost last.
    pub stack: Vec<Open>,
    /// The quote of a string literal still open (`"`, `'` or `` ` ``).
    pub open_string: Option<char>,
    /// True inside a block comment.
    pub open_comment: bool,
    /// True when a closing bracket had no opening one.
    pub unbalanced: bool,
}

/// Scans `code` from its start.
pub(crate) fn scan(code: &str) -> Scan {
    let chars: Vec<char> = code.chars().collect();
    let mut state = Scan::default();
    let mut i = 0;
    while i < chars.len() {
        i = step(&chars, i, &mut state);
    }
    state
}

fn step(chars: &[char], i: usize, state: &mut Scan) -> usize {
    let c = chars[i];
    let next = chars.get(i + 1).copied();
    match (c, next) {
        ('/', Some('/')) => skip_line(chars, i),
        ('/', Some('*')) => skip_block_comment(chars, i, state),
        ('"' | '`' | '\'', _) => skip_string(chars, i, state),
        ('#', Some('{')) => {
            state.stack.push(Open { bracket: '#', caller: None });
            i + 2
        }
        ('(' | '[' | '{', _) => {
            let caller = (c == '(').then(|| identifier_before(chars, i)).flatten();
            state.stack.push(Open { bracket: c, caller });
            i + 1
        }
        (')' | ']' | '}', _) => {
            state.unbalanced |= !closes(state.stack.pop(), c);
            i + 1
        }
        _ => i + 1,
    }
}

fn closes(open: Option<Open>, close: char) -> bool {
    matches!((open.map(|o| o.bracket), close), (Some('('), ')') | (Some('['), ']') | (Some('{' | '#'), '}'))
}

fn skip_line(chars: &[char], i: usize) -> usize {
    chars[i..].iter().position(|&c| c == '\n').map_or(chars.len(), |n| i + n + 1)
}

fn skip_block_comment(chars: &[char], mut i: usize, state: &mut Scan) -> usize {
    let mut depth = 0;
    while i < chars.len() {
        match (chars[i], chars.get(i + 1)) {
            ('/', Some('*')) => (depth, i) = (depth + 1, i + 2),
            ('*', Some('/')) => (depth, i) = (depth - 1, i + 2),
            _ => i += 1,
        }
        if depth == 0 {
            return i;
        }
    }
    state.open_comment = true;
    i
}

fn skip_string(chars: &[char], mut i: usize, state: &mut Scan) -> usize {
    let quote = chars[i];
    i += 1;
    while i < chars.len() {
        match chars[i] {
            '\\' if quote != '`' => i += 2,
            '\n' if quote != '`' && chars.get(i.wrapping_sub(1)) != Some(&'\\') => break,
            c if c == quote => return i + 1,
            _ => i += 1,
        }
    }
    state.open_string = Some(quote);
    i.min(chars.len())
}

/// The identifier that ends just before `chars[end]` (spaces skipped), if any.
pub(crate) fn identifier_before(chars: &[char], end: usize) -> Option<String> {
    let mut stop = end;
    while stop > 0 && chars[stop - 1] == ' ' {
        stop -= 1;
    }
    let start = (0..stop).rev().take_while(|&k| is_ident(chars[k])).last()?;
    Some(chars[start..stop].iter().collect())
}

/// Whether `c` may appear in an identifier.
pub(crate) fn is_ident(c: char) -> bool {
    c.is_alphanumeric() || c == '_'
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn tracks_calls_maps_strings_and_comments() {
        let s = scan("let t = throw_release(#{ speed_mps: 24, ");
        assert_eq!(s.stack.len(), 2);
        assert_eq!(s.stack[0].caller.as_deref(), Some("throw_release"));
        assert_eq!(s.stack[1].bracket, '#');
        assert!(scan("let s = \"a ( b\"; // (").stack.is_empty());
        assert!(scan("/* ( */ x").stack.is_empty());
        assert_eq!(scan("let s = `open").open_string, Some('`'));
        assert!(scan("x)").unbalanced);
    }
}
