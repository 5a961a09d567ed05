//! The sandbox: script functions that touch files stay inside the study folder (and read from
//! the explicitly allowed extra folders); path escapes are refused with a message naming the
//! path and leave files outside untouched; scripts reach no process, network or module loader.
use spinfoil_lang::{CellError, CollectedOutput, Session, SessionSettings};
use std::path::{Path, PathBuf};
use std::sync::Arc;

const DISC: &str = r#"let d = disc("Q-3", driver_outline(#{ diameter_cm: 21.1 }), single_layup(material("base blend", 0.95)), #{ mass_g: 172 });"#;

/// A CSV of one measured flight (columns as `measured_from_csv` documents).
const MEASURED_CSV: &str = "flight,speed_mps,spin_rps,launch_deg,nose_deg,hyzer_deg,t_s,x_m,y_m,z_m\nA,22,15,10,0,0,3.9,71.2,-2.1,\n";

/// A fresh, empty folder for one test.
fn folder(name: &str) -> PathBuf {
    let dir = std::env::temp_dir().join(format!("spinfoil-sandbox-{name}-{}", std::process::id()));
    let _ = std::fs::remove_dir_all(&dir);
    std::fs::create_dir_all(&dir).unwrap();
    dir
}

fn session(settings: SessionSettings) -> Session {
    let mut s = Session::new(settings);
    ok(&mut s, DISC);
    s
}

fn ok(s: &mut Session, code: &str) -> String {
    match s.eval(code, Arc::new(CollectedOutput::default())) {
        Ok(v) => v.and_then(|b| b.text_plain().map(str::to_string)).unwrap_or_default(),
        Err(e) => panic!("{code}: {e}"),
    }
}

fn refused(s: &mut Session, code: &str) -> CellError {
    s.eval(code, Arc::new(CollectedOutput::default())).expect_err(code)
}

/// Every function that reads or writes a file, applied to `path`.
fn file_calls(path_json: &str, path_csv: &str) -> Vec<String> {
    vec![
        format!("load_disc(\"{path_json}\")"),
        format!("save(d, \"{path_json}\")"),
        format!("load_measured(\"{path_csv}\")"),
        format!("save_text(\"x,y\\n1,2\", \"{path_csv}\")"),
        format!("save_csv(fly(d, throw_release(#{{ speed_mps: 20, spin_rpm: 800 }})), \"{path_csv}\")"),
    ]
}

/// The outside folder's files and their contents (to show they did not change).
fn snapshot(dir: &Path) -> Vec<(String, Vec<u8>)> {
    let mut files: Vec<_> = std::fs::read_dir(dir)
        .unwrap()
        .flatten()
        .map(|e| (e.file_name().to_string_lossy().into_owned(), std::fs::read(e.path()).unwrap_or_default()))
        .collect();
    files.sort();
    files
}

/// An outside folder holding a design and a CSV, and a study folder with links into it.
fn escape_setup(name: &str) -> (PathBuf, PathBuf) {
    let study = folder(&format!("{name}-study"));
    let outside = folder(&format!("{name}-outside"));
    let mut s = session(SessionSettings::in_folder(&outside));
    ok(&mut s, "save(d, \"secret.json\");");
    std::fs::write(outside.join("data.csv"), MEASURED_CSV).unwrap();
    std::os::unix::fs::symlink(outside.join("secret.json"), study.join("link.json")).unwrap();
    std::os::unix::fs::symlink(outside.join("data.csv"), study.join("link.csv")).unwrap();
    std::os::unix::fs::symlink(&outside, study.join("sub")).unwrap();
    std::os::unix::fs::symlink(outside.join("nowhere.json"), study.join("dangling.json")).unwrap();
    (study, outside)
}

#[test]
fn every_escape_is_refused_for_load_save_csv_import_and_exports() {
    let (study, outside) = escape_setup("escapes");
    let before = snapshot(&outside);
    let mut s = session(SessionSettings::in_folder(&study));
    let cases = [
        ("../secret.json", "../data.csv", "without '..'"),
        ("sub/../../secret.json", "sub/../../data.csv", "without '..'"),
        (&*format!("{}/secret.json", outside.display()), &*format!("{}/data.csv", outside.display()), "relative to the study folder"),
        ("link.json", "link.csv", "leads outside the study folder"),
        ("sub/secret.json", "sub/data.csv", "leads outside the study folder"),
    ];
    let mut checked = 0;
    for (json, csv, fragment) in cases {
        for (call, path) in file_calls(json, csv).iter().zip([json, json, csv, csv, csv]) {
            let e = refused(&mut s, call);
            assert_eq!(e.kind, "FileError", "{call}: {e}");
            assert!(e.message.contains(fragment), "{call}: {}", e.message);
            assert!(e.message.contains(&format!("\"{path}\"")), "the message names the path: {}", e.message);
            checked += 1;
        }
    }
    // Writing through a link whose target does not exist yet would create a file outside.
    let e = refused(&mut s, "save(d, \"dangling.json\")");
    assert!(e.message.contains("leads outside"), "{}", e.message);
    assert!(!outside.join("nowhere.json").exists());
    assert_eq!(checked, 25);
    assert_eq!(snapshot(&outside), before, "files outside are unchanged");
    // The session still works, and the same calls succeed inside the folder.
    for call in file_calls("inside.json", "inside.csv") {
        if call.starts_with("load") {
            continue;
        }
        ok(&mut s, &call);
    }
    ok(&mut s, "save(d, \"inside.json\"); load_disc(\"inside.json\").mass_g");
    std::fs::write(study.join("inside.csv"), MEASURED_CSV).unwrap();
    assert_eq!(ok(&mut s, "load_measured(\"inside.csv\").count"), "1");
    let _ = std::fs::remove_dir_all(&study);
    let _ = std::fs::remove_dir_all(&outside);
}

#[test]
fn a_study_folder_reached_through_a_linked_parent_works() {
    let real = folder("real-parent");
    std::fs::create_dir_all(real.join("study")).unwrap();
    let link = std::env::temp_dir().join(format!("spinfoil-sandbox-linked-parent-{}", std::process::id()));
    let _ = std::fs::remove_file(&link);
    std::os::unix::fs::symlink(&real, &link).unwrap();
    let mut s = session(SessionSettings::in_folder(link.join("study")));
    ok(&mut s, "save(d, \"q3.toml\");");
    assert!(real.join("study/q3.toml").exists());
    assert_eq!(ok(&mut s, "load_disc(\"q3.toml\").name"), "Q-3");
    // A sibling of the study folder, reached by the same linked parent, stays out of reach.
    std::fs::write(real.join("sibling.json"), "{}").unwrap();
    assert!(refused(&mut s, "load_disc(\"../sibling.json\")").message.contains("without '..'"));
    let _ = std::fs::remove_file(&link);
    let _ = std::fs::remove_dir_all(&real);
}

#[test]
fn extra_folders_are_read_only_and_searched_after_the_study_folder() {
    let study = folder("extra-study");
    let library = folder("extra-library");
    let outside = folder("extra-outside");
    session(SessionSettings::in_folder(&library)).eval("save(d, \"shared.json\");", Arc::new(CollectedOutput::default())).unwrap();
    std::fs::write(library.join("field.csv"), MEASURED_CSV).unwrap();
    std::fs::write(outside.join("secret.json"), "{}").unwrap();
    std::os::unix::fs::symlink(outside.join("secret.json"), library.join("link.json")).unwrap();
    let settings = SessionSettings { extra_dirs: vec![library.clone()], ..SessionSettings::in_folder(&study) };
    let mut s = session(settings);
    assert_eq!(ok(&mut s, "load_disc(\"shared.json\").name"), "Q-3");
    assert_eq!(ok(&mut s, "load_measured(\"field.csv\").count"), "1");
    let library_before = snapshot(&library);
    // Saving the same name writes into the study folder, never into the library.
    ok(&mut s, "let e = d; save(e, \"shared.json\");");
    assert!(study.join("shared.json").exists());
    assert_eq!(snapshot(&library), library_before);
    // The study folder's copy now comes first.
    std::fs::write(study.join("shared.json"), "{ \"kind\": \"throw\" }").unwrap();
    assert!(refused(&mut s, "load_disc(\"shared.json\")").message.contains("shared.json"));
    // Links out of an extra folder are refused as well.
    let e = refused(&mut s, "load_disc(\"link.json\")");
    assert!(e.message.contains("\"link.json\" leads outside"), "{}", e.message);
    // Only extra folders: loading works, saving is off.
    let mut reader = session(SessionSettings { extra_dirs: vec![library.clone()], ..Default::default() });
    assert_eq!(ok(&mut reader, "load_disc(\"shared.json\").name"), "Q-3");
    assert!(refused(&mut reader, "save(d, \"x.json\")").message.contains("file access is off"));
    for dir in [&study, &library, &outside] {
        let _ = std::fs::remove_dir_all(dir);
    }
}

#[test]
fn scripts_reach_no_process_network_environment_or_module_loader() {
    let study = folder("no-escape");
    let mut s = session(SessionSettings::in_folder(&study));
    for call in [
        "system(\"ls\")",
        "exec(\"ls\")",
        "spawn(\"ls\")",
        "command(\"ls\")",
        "shell(\"ls\")",
        "run(\"ls\")",
        "open(\"/etc/passwd\")",
        "read_file(\"/etc/passwd\")",
        "write_file(\"/tmp/x\", \"y\")",
        "http_get(\"http://127.0.0.1/\")",
        "fetch(\"http://127.0.0.1/\")",
        "connect(\"127.0.0.1:80\")",
        "env(\"HOME\")",
        "getenv(\"HOME\")",
        "timestamp()",
    ] {
        let e = refused(&mut s, call);
        // Absent (NameError), or a word Rhai reserves and refuses to parse (SyntaxError).
        assert!(matches!(e.kind.as_str(), "NameError" | "SyntaxError"), "{call}: {e}");
        eprintln!("{call} -> {e}");
    }
    // No module loader: `import` of a file or a name finds nothing.
    for code in ["import \"/etc/passwd\" as m;", "import \"../secret\" as m;", "import \"std\" as m;"] {
        let e = refused(&mut s, code);
        assert!(matches!(e.kind.as_str(), "NameError" | "SyntaxError" | "RuntimeError"), "{code}: {e}");
        eprintln!("{code} -> {e}");
    }
    // `eval` of text runs in the same sandbox, under the same confinement.
    let e = refused(&mut s, "eval(\"save(d, \\\"../escape.json\\\")\")");
    eprintln!("eval -> {e}");
    assert!(e.to_string().contains("without '..'") || matches!(e.kind.as_str(), "NameError" | "SyntaxError"), "{e}");
    assert!(!study.parent().unwrap().join("escape.json").exists());
    // None of our own functions names a process, network, environment or raw file facility.
    let forbidden = ["exec", "spawn", "system", "command", "shell", "socket", "http", "url", "connect", "env_var", "getenv", "read_file", "write_file", "remove", "delete"];
    for name in s.registered_functions() {
        assert!(!forbidden.iter().any(|f| name.contains(f)), "{name}");
    }
    ok(&mut s, "1 + 1");
    let _ = std::fs::remove_dir_all(&study);
}
