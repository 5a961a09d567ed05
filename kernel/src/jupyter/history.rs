//! The kernel's own record of executed cells, answering `history_request`.
use super::messages::HistoryRequest;
use serde_json::{json, Value};

/// The number this kernel gives its (only) session in history entries.
pub const SESSION_NUMBER: i64 = 1;

/// One executed cell.
#[derive(Debug, Clone, PartialEq)]
struct Entry {
    line: usize,
    input: String,
    output: Option<String>,
}

/// Every cell run with `store_history`, in order.
#[derive(Debug, Default)]
pub struct History {
    entries: Vec<Entry>,
}

impl History {
    /// Records cell number `line` with its input and the `text/plain` of its result.
    pub fn record(&mut self, line: usize, input: &str, output: Option<String>) {
        self.entries.push(Entry { line, input: input.to_string(), output });
    }

    /// The `history` list of a `history_reply`: `[session, line, input]` or, with `output`,
    /// `[session, line, [input, output]]`.
    pub fn answer(&self, request: &HistoryRequest) -> Vec<Value> {
        let chosen: Vec<&Entry> = match request.hist_access_type.as_str() {
            "range" => self.range(request),
            "search" => self.search(request),
            _ => last(self.entries.iter().collect(), request.n),
        };
        chosen.into_iter().map(|entry| as_value(entry, request.output)).collect()
    }

    fn range(&self, request: &HistoryRequest) -> Vec<&Entry> {
        if request.session != 0 && request.session != SESSION_NUMBER {
            return Vec::new();
        }
        let stop = request.stop.unwrap_or(i64::MAX);
        self.entries
            .iter()
            .filter(|e| (e.line as i64) >= request.start && (e.line as i64) < stop)
            .collect()
    }

    fn search(&self, request: &HistoryRequest) -> Vec<&Entry> {
        let mut found: Vec<&Entry> = self.entries.iter().filter(|e| glob_match(&request.pattern, &e.input)).collect();
        if request.unique {
            let mut seen = std::collections::HashSet::new();
            found.reverse();
            found.retain(|e| seen.insert(e.input.as_str()));
            found.reverse();
        }
        last(found, request.n)
    }
}

fn last(entries: Vec<&Entry>, n: Option<usize>) -> Vec<&Entry> {
    let n = n.unwrap_or(entries.len());
    let skip = entries.len().saturating_sub(n);
    entries.into_iter().skip(skip).collect()
}

fn as_value(entry: &Entry, with_output: bool) -> Value {
    if with_output {
        json!([SESSION_NUMBER, entry.line, [entry.input, entry.output]])
    } else {
        json!([SESSION_NUMBER, entry.line, entry.input])
    }
}

/// Whole-string glob match: `*` any run of characters, `?` one character.
fn glob_match(pattern: &str, text: &str) -> bool {
    let p: Vec<char> = pattern.chars().collect();
    let t: Vec<char> = text.chars().collect();
    let (mut pi, mut ti, mut star, mut mark) = (0, 0, None, 0);
    while ti < t.len() {
        if pi < p.len() && (p[pi] == '?' || p[pi] == t[ti]) {
            pi += 1;
            ti += 1;
        } else if pi < p.len() && p[pi] == '*' {
            star = Some(pi);
            mark = ti;
            pi += 1;
        } else if let Some(s) = star {
            pi = s + 1;
            mark += 1;
            ti = mark;
        } else {
            return false;
        }
    }
    p[pi..].iter().all(|&c| c == '*')
}

#[cfg(test)]
mod tests {
    use super::*;

    fn request(kind: &str) -> HistoryRequest {
        serde_json::from_value(json!({ "hist_access_type": kind })).unwrap()
    }

    fn sample() -> History {
        let mut history = History::default();
        for (line, code) in ["let a = 1", "a + 1", "let a = 1", "print(a)"].iter().enumerate() {
            history.record(line + 1, code, None);
        }
        history
    }

    #[test]
    fn globs_match_whole_inputs() {
        assert!(glob_match("let*", "let a = 1"));
        assert!(glob_match("a ? 1", "a + 1"));
        assert!(!glob_match("let", "let a = 1"));
        assert!(glob_match("*", ""));
    }

    #[test]
    fn tail_range_and_search() {
        let history = sample();
        let mut tail = request("tail");
        tail.n = Some(2);
        assert_eq!(history.answer(&tail), vec![json!([1, 3, "let a = 1"]), json!([1, 4, "print(a)"])]);
        let mut range = request("range");
        range.session = SESSION_NUMBER;
        range.start = 2;
        range.stop = Some(3);
        assert_eq!(history.answer(&range), vec![json!([1, 2, "a + 1"])]);
        let mut search = request("search");
        search.pattern = "let*".into();
        assert_eq!(history.answer(&search).len(), 2);
        search.unique = true;
        assert_eq!(history.answer(&search), vec![json!([1, 3, "let a = 1"])]);
    }
}
