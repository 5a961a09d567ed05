//! Shared helpers: running the binary and scratch folders.
use std::io::Write;
use std::path::PathBuf;
use std::process::{Command, Output, Stdio};

/// Runs `spinfoil ARGS` with `stdin` fed to it.
pub fn spinfoil(args: &[&str], stdin: &str) -> Output {
    let mut child = Command::new(env!("CARGO_BIN_EXE_spinfoil"))
        .args(args)
        .env("XDG_DATA_HOME", scratch("history"))
        .stdin(Stdio::piped())
        .stdout(Stdio::piped())
        .stderr(Stdio::piped())
        .spawn()
        .expect("the binary starts");
    child.stdin.take().expect("stdin is piped").write_all(stdin.as_bytes()).expect("stdin takes the text");
    child.wait_with_output().expect("the binary ends")
}

/// A fresh, empty scratch folder named after `label`.
pub fn scratch(label: &str) -> PathBuf {
    let folder = std::env::temp_dir().join(format!("spinfoil-it-{label}-{}", std::process::id()));
    let _ = std::fs::remove_dir_all(&folder);
    std::fs::create_dir_all(&folder).expect("the scratch folder is created");
    folder
}

/// Stdout and stderr as text.
pub fn text(output: &Output) -> (String, String) {
    (String::from_utf8_lossy(&output.stdout).into_owned(), String::from_utf8_lossy(&output.stderr).into_owned())
}
