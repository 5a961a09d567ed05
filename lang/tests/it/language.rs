//! The language's own words: a reserved word where a name was expected gets a hint naming it.
use spinfoil_lang::{CellError, CollectedOutput, Session, SessionSettings};
use std::sync::Arc;

fn error_of(script: &str) -> CellError {
    let mut session = Session::new(SessionSettings::default());
    match session.eval(script, Arc::new(CollectedOutput::default())) {
        Err(e) => e,
        Ok(v) => panic!("no error from {script}: {v:?}"),
    }
}

#[test]
fn a_loop_variable_named_throw_is_explained() {
    let e = error_of("let throws = [1, 2];\nfor throw in throws {\n    print(throw);\n}");
    assert_eq!(e.kind, "SyntaxError");
    assert_eq!((e.line, e.column), (Some(2), Some(5)));
    assert_eq!(
        e.message,
        "Expecting name of a variable: 'throw' is a reserved word of the language; name the variable e.g. 't' or 'release' (help(\"language\") lists them)"
    );
}

#[test]
fn reserved_words_as_parameters_and_keys_are_explained() {
    let e = error_of("[1].map(|throw| throw + 1)");
    assert!(e.message.contains("'throw' is a reserved word of the language; name the variable"), "{}", e.message);
    let e = error_of("let default = 1;");
    assert!(e.message.starts_with("'default' is a reserved word of the language; choose another name"), "{}", e.message);
    assert!(e.message.contains("e.g. 'my_default'"), "{}", e.message);
    for script in ["let m = #{ throw: 1 };", "let m = #{ a: 1, throw: 2 };", "let m = #{}; m.throw"] {
        let e = error_of(script);
        assert!(e.message.contains("quote it as a key (#{\"throw\": ...}, m[\"throw\"])"), "{script}: {}", e.message);
    }
}

#[test]
fn other_syntax_errors_get_no_reserved_word_hint() {
    for script in ["let x = ;", "let throws = (1 + 2;", "let t = 1 +;"] {
        let e = error_of(script);
        assert!(!e.message.contains("reserved word"), "{script}: {}", e.message);
    }
}

#[test]
fn help_language_describes_the_syntax_and_the_reserved_words() {
    let mut session = Session::new(SessionSettings::default());
    let text = session
        .eval("help(\"language\")", Arc::new(CollectedOutput::default()))
        .unwrap()
        .and_then(|b| b.text_plain().map(str::to_string))
        .unwrap();
    assert!(text.contains("Reserved words.") && text.contains("`throw`, `true`, `try`"), "{text}");
    assert!(session.docs().reference_markdown().contains("## language\n\nScripts are written in Rhai"));
}
