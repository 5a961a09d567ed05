//! The language itself: a short overview of the script syntax and the words it reserves, shown
//! by `help("language")` and at the top of the reference page.

/// Words the script language keeps for itself: they cannot name a variable, a function
/// parameter, a loop variable or an unquoted map key. Checked against the parser by a test.
pub(crate) const RESERVED_WORDS: &[&str] = &[
    "as", "async", "await", "break", "call", "case", "catch", "const", "continue", "curry", "debug", "default",
    "do", "else", "eval", "export", "false", "Fn", "fn", "for", "go", "goto", "if", "import", "in", "is",
    "is_def_fn", "is_def_var", "is_shared", "let", "loop", "match", "module", "new", "nil", "null", "package",
    "print", "private", "protected", "public", "return", "shared", "spawn", "static", "super", "switch", "sync",
    "this", "thread", "throw", "true", "try", "type_of", "until", "use", "var", "void", "while", "with", "yield",
];

/// True when `word` is one of [`RESERVED_WORDS`].
pub(crate) fn is_reserved_word(word: &str) -> bool {
    RESERVED_WORDS.contains(&word)
}

/// The overview as Markdown: syntax in brief, then the reserved words.
pub(crate) fn language_markdown() -> String {
    format!(
        "## language\n\n\
         Scripts are written in Rhai, a small scripting language embedded in Spinfoil.\n\n\
         - `let t = throw_release(#{{ speed_mps: 24.0 }});` names a value; `const` names one that never changes; \
         statements end with `;`; `//` starts a comment.\n\
         - `22` is an integer and `22.0` a floating-point number; `\"text\"` is a string.\n\
         - `[a, b, c]` is an array; `#{{ speed_mps: 24.0, spin_rpm: 900 }}` is an object map \
         (the options of most functions; its keys carry their unit).\n\
         - `flight.carry_m` reads a field; `help(\"Flight\")` lists the fields of a type.\n\
         - `for t in throws {{ ... }}` loops over an array; `if`, `while` and `loop` work as in \
         most languages; `fn name(x) {{ ... }}` defines a function and `|x| x * 2` a closure.\n\n\
         **Reserved words.** These words belong to the language: they cannot name a variable, a \
         function parameter or a loop variable, nor be an unquoted map key (write \
         `#{{\"default\": 1}}` and `m[\"default\"]` instead). A common surprise is \
         `for throw in throws {{ ... }}`: name the loop variable `t` or `release`.\n\n\
         {}\n",
        RESERVED_WORDS.iter().map(|w| format!("`{w}`")).collect::<Vec<_>>().join(", ")
    )
}

/// The overview as plain text (for `help("language")`).
pub(crate) fn language_text() -> String {
    let md = language_markdown();
    let body = md.strip_prefix("## language\n\n").unwrap_or(&md);
    format!("The script language\n\n{}", body.replace("**", ""))
}

/// The hint added to a syntax error at `word` when it is reserved; `as_key` when the word
/// stands where a map key or field name was expected.
pub(crate) fn reserved_word_hint(word: &str, as_key: bool) -> Option<String> {
    if !is_reserved_word(word) {
        return None;
    }
    let advice = if as_key {
        format!("quote it as a key (#{{\"{word}\": ...}}, m[\"{word}\"]) or choose another name")
    } else if word == "throw" {
        "name the variable e.g. 't' or 'release'".to_string()
    } else {
        format!("choose another name, e.g. 'my_{word}'")
    };
    Some(format!("'{word}' is a reserved word of the language; {advice} (help(\"language\") lists them)"))
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn every_listed_word_is_refused_by_the_parser_as_a_variable_name() {
        let engine = rhai::Engine::new();
        for word in RESERVED_WORDS {
            assert!(engine.compile(format!("let {word} = 1;")).is_err(), "{word} is accepted as a name");
        }
        for word in ["t", "release", "throws", "global", "exit", "my_default"] {
            assert!(engine.compile(format!("let {word} = 1;")).is_ok(), "{word} is refused");
        }
    }

    #[test]
    fn the_overview_lists_the_reserved_words() {
        let md = language_markdown();
        assert!(md.starts_with("## language"));
        assert!(RESERVED_WORDS.iter().all(|w| md.contains(&format!("`{w}`"))));
        assert!(language_text().contains("for throw in throws"));
    }
}
