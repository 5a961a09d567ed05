//! Fuzzes the design loaders: the input is written as a design file into a study folder and
//! loaded with `load_disc`, `load_throw` and `load_environment` (JSON, or TOML when the first
//! byte is odd; that byte is not part of the file). Every outcome must be a value or a clear
//! script error, never a panic; a loaded disc must have finite, positive mass properties.
#![no_main]
use libfuzzer_sys::fuzz_target;
use spinfoil_lang::{CollectedOutput, Session, SessionSettings};
use std::path::PathBuf;
use std::sync::{Arc, Mutex, OnceLock};

fn folder() -> &'static PathBuf {
    static FOLDER: OnceLock<PathBuf> = OnceLock::new();
    FOLDER.get_or_init(|| {
        let dir = std::env::temp_dir().join(format!("spinfoil-fuzz-designs-{}", std::process::id()));
        std::fs::create_dir_all(&dir).expect("a scratch study folder");
        dir
    })
}

/// One session for all inputs (a fresh one per input costs more than the loads); the loads run
/// inside a block, so no variable outlives an input.
fn session() -> &'static Mutex<Session> {
    static SESSION: OnceLock<Mutex<Session>> = OnceLock::new();
    SESSION.get_or_init(|| {
        let settings = SessionSettings { study_dir: Some(folder().clone()), ..SessionSettings::default() };
        Mutex::new(Session::new(settings))
    })
}

const LOADS: &str = r#"{
let found = [];
try { let d = load_disc(FILE); found.push(d.spin_inertia_g_cm2); found.push(d.mass_g); } catch (e) { found.push(e); }
try { load_throw(FILE); } catch (e) { found.push(e); }
try { load_environment(FILE); } catch (e) { found.push(e); }
found
}"#;

fuzz_target!(|data: &[u8]| {
    let Some((&choice, text)) = data.split_first() else { return };
    let name = if choice % 2 == 1 { "design.toml" } else { "design.json" };
    std::fs::write(folder().join(name), text).expect("the scratch file is written");
    let code = LOADS.replace("FILE", &format!("{name:?}"));
    let outcome = session().lock().unwrap().eval(&code, Arc::new(CollectedOutput::default()));
    assert!(outcome.is_ok(), "the loads are wrapped in try: {outcome:?}");
});
