//! Saves survive a kill: `spinfoil run` saves a large export and a design over and over, and is
//! killed (SIGKILL) at a different moment each time. After every kill each file is the old
//! version or a complete new one, never a truncated mix; the hidden temporary files a kill
//! leaves behind cannot be loaded, and the next completed save removes them.
use super::support::scratch;
use std::path::Path;
use std::process::{Command, Stdio};
use std::time::Duration;

/// Saves a 4 MiB JSON export and a disc design, numbered, until killed.
const SAVE_FOREVER: &str = r#"
let d = disc("K-1", driver_outline(#{ diameter_cm: 21.1 }), single_layup(material("base blend", 0.95)), #{ mass_g: 172 });
let pad = "x";
for i in 0..22 { pad += pad; }
let n = 0;
loop {
    n += 1;
    save_text(`{"n": ${n}, "pad": "${pad}", "end": true}`, "big.json");
    save(d, "design.json");
}
"#;

/// One completed save of each file (run after the kills).
const SAVE_ONCE: &str = r#"
let d = disc("K-1", driver_outline(#{ diameter_cm: 21.1 }), single_layup(material("base blend", 0.95)), #{ mass_g: 172 });
save_text(`{"n": -1, "pad": "", "end": true}`, "big.json");
save(d, "design.json");
let back = load_disc("design.json");
print(`loaded ${back.name}`);
"#;

const PAD_LEN: usize = 1 << 22;

/// The export's version number, if the file is a complete export (old or new).
fn export_version(dir: &Path) -> i64 {
    let text = std::fs::read_to_string(dir.join("big.json")).expect("big.json is there");
    let value: serde_json::Value = serde_json::from_str(&text).unwrap_or_else(|e| panic!("big.json is complete JSON: {e} ({} bytes)", text.len()));
    assert_eq!(value["end"], serde_json::Value::Bool(true));
    let n = value["n"].as_i64().expect("a version number");
    let pad = value["pad"].as_str().expect("the padding").len();
    assert!(pad == PAD_LEN || n <= 0, "version {n} holds {pad} bytes of padding, not {PAD_LEN}");
    n
}

fn design_is_whole(dir: &Path) {
    let text = std::fs::read_to_string(dir.join("design.json")).expect("design.json is there");
    let value: serde_json::Value = serde_json::from_str(&text).unwrap_or_else(|e| panic!("design.json is complete JSON: {e}"));
    assert_eq!(value["kind"], "disc");
}

fn temporary_files(dir: &Path) -> Vec<String> {
    std::fs::read_dir(dir)
        .unwrap()
        .flatten()
        .map(|e| e.file_name().to_string_lossy().into_owned())
        .filter(|name| name.ends_with(".partial"))
        .collect()
}

fn run(dir: &Path, script: &str) -> Command {
    std::fs::write(dir.join("study.rhai"), script).unwrap();
    let mut command = Command::new(env!("CARGO_BIN_EXE_spinfoil"));
    command.arg("run").arg(dir.join("study.rhai")).current_dir(dir).stdout(Stdio::null()).stderr(Stdio::piped());
    command
}

#[test]
fn a_save_killed_mid_write_leaves_the_old_file_or_the_new_one() {
    let dir = scratch("atomic-save");
    std::fs::write(dir.join("big.json"), r#"{"n": 0, "pad": "", "end": true}"#).unwrap();
    let first = run(&dir, SAVE_ONCE).output().unwrap();
    assert!(first.status.success(), "{}", String::from_utf8_lossy(&first.stderr));
    std::fs::write(dir.join("big.json"), r#"{"n": 0, "pad": "", "end": true}"#).unwrap();
    const KILLS: u64 = 12;
    let (mut old, mut new, mut temps_seen) = (0, 0, 0);
    let mut versions = Vec::new();
    for k in 0..KILLS {
        let mut child = run(&dir, SAVE_FOREVER).spawn().expect("spinfoil starts");
        // Different moments: from before the first save to several saves in.
        std::thread::sleep(Duration::from_millis(30 + k * 97));
        child.kill().expect("SIGKILL");
        child.wait().unwrap();
        let n = export_version(&dir);
        design_is_whole(&dir);
        versions.push(n);
        if n <= 0 {
            old += 1;
        } else {
            new += 1;
        }
        if !temporary_files(&dir).is_empty() {
            temps_seen += 1;
        }
    }
    eprintln!("{KILLS} kills: old file {old} times, a complete new one {new} times (versions {versions:?}); a partial temporary file was left by {temps_seen} kills");
    assert!(new > 0, "the runs got far enough to save");
    // Leftover temporary files are hidden, and no load function accepts them.
    let leftovers = temporary_files(&dir);
    if let Some(name) = leftovers.first() {
        std::fs::write(dir.join("probe.rhai"), format!("load_disc(\"{name}\")")).unwrap();
        let probe = Command::new(env!("CARGO_BIN_EXE_spinfoil")).arg("run").arg(dir.join("probe.rhai")).current_dir(&dir).output().unwrap();
        let err = format!("{}{}", String::from_utf8_lossy(&probe.stderr), String::from_utf8_lossy(&probe.stdout));
        assert!(err.contains("must end in one of .json, .toml"), "{err}");
    }
    // The next completed save removes what the killed processes left.
    let last = run(&dir, SAVE_ONCE).output().unwrap();
    assert!(last.status.success(), "{}", String::from_utf8_lossy(&last.stderr));
    assert_eq!(export_version(&dir), -1);
    assert_eq!(temporary_files(&dir), Vec::<String>::new(), "abandoned temporary files are removed");
    let _ = std::fs::remove_dir_all(&dir);
}
