//! The sandbox options of the command line: `--study-dir`, `--read-dir`, `--max-cell-seconds`,
//! and the default study folder of `run` and `report` (the file's own folder).
use crate::support::{scratch, spinfoil, text};
use std::path::Path;

fn run(script: &Path, extra: &[&str]) -> (Option<i32>, String, String) {
    let out = script.parent().unwrap().join("out");
    let mut args = vec!["run", script.to_str().unwrap(), "--out", out.to_str().unwrap()];
    args.extend_from_slice(extra);
    let output = spinfoil(&args, "");
    let (stdout, stderr) = text(&output);
    (output.status.code(), stdout, stderr)
}

#[test]
fn run_saves_beside_the_script_or_in_the_study_dir() {
    let folder = scratch("sandbox-run");
    let script = folder.join("note.rhai");
    std::fs::write(&script, r#"save_text("from the script", "note.txt");"#).unwrap();
    assert_eq!(run(&script, &[]).0, Some(0));
    assert_eq!(std::fs::read_to_string(folder.join("note.txt")).unwrap(), "from the script");

    let elsewhere = folder.join("elsewhere");
    std::fs::create_dir_all(&elsewhere).unwrap();
    assert_eq!(run(&script, &["--study-dir", elsewhere.to_str().unwrap()]).0, Some(0));
    assert!(elsewhere.join("note.txt").exists(), "--study-dir moves the study folder");
}

#[test]
fn read_dirs_are_readable_and_never_writable() {
    let folder = scratch("sandbox-read");
    let shared = folder.join("shared");
    std::fs::create_dir_all(&shared).unwrap();
    let design = folder.join("design.rhai");
    std::fs::write(&design, r#"save(environment(#{ altitude_m: 1600 }), "ridge.json");"#).unwrap();
    let made = run(&design, &["--study-dir", shared.to_str().unwrap()]);
    assert_eq!(made.0, Some(0), "{}", made.2);

    let reader = folder.join("study").join("read.rhai");
    std::fs::create_dir_all(reader.parent().unwrap()).unwrap();
    std::fs::write(&reader, r#"let e = load_environment("ridge.json"); print("loaded");"#).unwrap();
    let refused = run(&reader, &[]);
    assert_eq!(refused.0, Some(1), "without --read-dir the file is not found: {}", refused.1);
    let (code, stdout, stderr) = run(&reader, &["--read-dir", shared.to_str().unwrap()]);
    assert_eq!(code, Some(0), "{stderr}");
    assert!(stdout.contains("loaded"));

    std::fs::write(&reader, r#"save_text("x", "../shared/ridge.json");"#).unwrap();
    let (code, _, stderr) = run(&reader, &["--read-dir", shared.to_str().unwrap()]);
    assert_eq!(code, Some(1));
    assert!(stderr.contains("not allowed"), "{stderr}");
}

#[test]
fn max_cell_seconds_stops_a_runaway_script_with_a_clear_message() {
    let folder = scratch("sandbox-time");
    let script = folder.join("loop.rhai");
    std::fs::write(&script, "let n = 0;\nloop { n += 1; }\n").unwrap();
    let (code, _, stderr) = run(&script, &["--max-cell-seconds", "0.3"]);
    assert_eq!(code, Some(1));
    assert!(stderr.contains("max_cell_time"), "{stderr}");
    let (code, _, stderr) = run(&script, &["--max-cell-seconds", "-1"]);
    assert_eq!(code, Some(2), "{stderr}");
}
