//! `load_json`: any JSON file of the study folder as script values, through the same
//! confinement and size limits as the other loaders.
use spinfoil_lang::{CellError, CollectedOutput, Session, SessionSettings};
use std::path::PathBuf;
use std::sync::Arc;

/// A fresh study folder (with a folder outside it) for one test.
fn folders(test: &str) -> (PathBuf, PathBuf) {
    let base = std::env::temp_dir().join(format!("spinfoil-json-{test}-{}", std::process::id()));
    let _ = std::fs::remove_dir_all(&base);
    let (study, outside) = (base.join("study"), base.join("outside"));
    std::fs::create_dir_all(study.join("fields")).unwrap();
    std::fs::create_dir_all(&outside).unwrap();
    (base, study)
}

/// A path with what load_json and load_disc made of it.
type BothLoaders = (String, Result<String, CellError>, Result<String, CellError>);

fn run(settings: SessionSettings, code: &str) -> Result<String, CellError> {
    let mut session = Session::new(settings);
    let value = session.eval(code, Arc::new(CollectedOutput::default()))?;
    Ok(value.and_then(|b| b.text_plain().map(str::to_string)).unwrap_or_default())
}

#[test]
fn a_json_file_reads_as_maps_arrays_and_numbers() {
    let (base, study) = folders("good");
    let text = r#"{ "name": "North meadow", "holes": [{ "par": 3, "length_m": 82.5 }, { "par": 4, "length_m": 140 }], "note": null }"#;
    std::fs::write(study.join("fields/north.json"), text).unwrap();
    let settings = SessionSettings::in_folder(&study);
    let script = r#"let f = load_json("fields/north.json");
        [f.name, f.holes.len(), f.holes[0].length_m + f.holes[1].length_m, type_of(f.holes[1].par), type_of(f.note)]"#;
    let out = run(settings.clone(), script);
    let _ = std::fs::remove_dir_all(&base);
    assert_eq!(out.unwrap(), "[\"North meadow\", 2, 222.5, \"i64\", \"()\"]");
}

#[test]
fn a_malformed_file_is_refused_with_line_and_column() {
    let (base, study) = folders("bad");
    std::fs::write(study.join("bad.json"), "{\n  \"name\": \"North meadow\",\n  \"tee_m\": [0, 0]\n  \"holes\": []\n}\n").unwrap();
    std::fs::write(study.join("empty.json"), "").unwrap();
    let settings = SessionSettings::in_folder(&study);
    let bad = run(settings.clone(), "let x = 1;\nload_json(\"bad.json\")").unwrap_err();
    let empty = run(settings, "load_json(\"empty.json\")").unwrap_err();
    let _ = std::fs::remove_dir_all(&base);
    assert_eq!((bad.kind.as_str(), bad.line, bad.column), ("FileError", Some(2), Some(1)));
    assert_eq!(bad.message, "load_json: \"bad.json\" is not valid JSON: expected `,` or `}` at line 4, column 3");
    assert!(empty.message.contains("is not valid JSON: EOF while parsing a value at line 1"), "{}", empty.message);
}

#[test]
fn paths_out_of_the_study_folder_are_refused_like_the_other_loaders() {
    let (base, study) = folders("escape");
    let outside = base.join("outside");
    std::fs::write(outside.join("secret.json"), "{\"pin\": 1234}").unwrap();
    std::os::unix::fs::symlink(outside.join("secret.json"), study.join("link.json")).unwrap();
    let settings = SessionSettings::in_folder(&study);
    let results: Vec<BothLoaders> =
        ["../outside/secret.json", "fields/../../outside/secret.json", "/etc/passwd.json", "link.json"]
            .iter()
            .map(|p| {
                let json = run(settings.clone(), &format!("load_json({p:?})"));
                let disc = run(settings.clone(), &format!("load_disc({p:?})"));
                (p.to_string(), json, disc)
            })
            .collect();
    let off = run(SessionSettings::default(), "load_json(\"a.json\")").unwrap_err();
    let toml = run(settings.clone(), "load_json(\"fields/north.toml\")").unwrap_err();
    let _ = std::fs::remove_dir_all(&base);
    for (path, json, disc) in results {
        let (json, disc) = (json.expect_err(&path), disc.expect_err(&path));
        assert_eq!(json.kind, "FileError", "{path}");
        // The same refusal as load_disc, with the function's own name in front.
        assert_eq!(json.message.replacen("load_json", "load_disc", 1), disc.message, "{path}");
        assert!(!json.message.contains("1234"), "{path}: the secret leaked");
    }
    assert_eq!(off.message, "load_json: file access is off in this session (no study folder is set)");
    assert_eq!(toml.message, "load_json: path \"fields/north.toml\" must end in one of .json");
}

#[test]
fn files_and_values_beyond_the_session_limits_are_refused() {
    let (base, study) = folders("limits");
    let many: Vec<String> = (0..2000).map(|i| i.to_string()).collect();
    std::fs::write(study.join("many.json"), format!("[{}]", many.join(","))).unwrap();
    std::fs::write(study.join("long.json"), format!("\"{}\"", "x".repeat(20_000))).unwrap();
    let settings = SessionSettings {
        max_array_size: 1000,
        max_string_size: 10_000,
        ..SessionSettings::in_folder(&study)
    };
    let many = run(settings.clone(), "load_json(\"many.json\")").unwrap_err();
    let long = run(settings.clone(), "load_json(\"long.json\")").unwrap_err();
    let long_disc = run(settings, "load_disc(\"long.json\")").unwrap_err();
    let _ = std::fs::remove_dir_all(&base);
    assert_eq!(many.kind, "LimitError");
    assert!(many.message.starts_with("load_json: \"many.json\" holds more than a script value may: arrays hold at most 1000 elements"), "{}", many.message);
    assert_eq!(long.kind, "LimitError");
    assert_eq!(long.message, "load_json: \"long.json\" is 20002 bytes, more than the 10000 bytes a script may read (limit max_string_size)");
    assert_eq!(long_disc.message, long.message.replace("load_json", "load_disc"), "one limit for every loader");
}
