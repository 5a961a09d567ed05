//! Where a Rust context finds the engine, its work folder and its runtime helper, and what it
//! evaluates first.
use std::fs::File;
use std::path::{Path, PathBuf};

/// Rust code evaluated once when a context starts, after the dependencies: the `study` module
/// (files in the study folder). `@STUDY_DIR@` is replaced by the folder, as a Rust string.
pub const CELL_PRELUDE: &str = include_str!("cell_prelude.rs.txt");

/// The name of the helper binary that loads and runs compiled cells (and wraps rustc).
pub const RUNTIME_NAME: &str = "spinfoil-rust-runtime";

/// How many contexts may run at once on one machine from one work folder (each takes a slot).
const SLOTS: usize = 8;

/// Everything a Rust context needs to start.
#[derive(Debug, Clone, PartialEq)]
pub struct RustCellSettings {
    /// The `spinfoil-engine` crate's folder (default: the workspace this kernel was built from;
    /// env `SPINFOIL_ENGINE_PATH`).
    pub engine_path: PathBuf,
    /// evcxr's work folders, one slot per running context; builds are kept there and reused
    /// (default `target/evcxr` of that workspace; env `SPINFOIL_RUST_CELLS_DIR`).
    pub work_root: PathBuf,
    /// The runtime helper binary (default: `spinfoil-rust-runtime` beside this executable;
    /// env `SPINFOIL_RUST_RUNTIME`).
    pub runtime: PathBuf,
    /// The study folder Rust cells read and write through `study::` (default: the current
    /// directory).
    pub study_dir: PathBuf,
}

impl RustCellSettings {
    /// Settings from the environment and the build, with `study_dir` (else the current directory).
    pub fn from_env(study_dir: Option<PathBuf>) -> Self {
        let workspace = Path::new(env!("CARGO_MANIFEST_DIR")).join("..");
        let var = |name: &str| std::env::var_os(name).filter(|v| !v.is_empty()).map(PathBuf::from);
        Self {
            engine_path: var("SPINFOIL_ENGINE_PATH").unwrap_or_else(|| workspace.join("engine")),
            work_root: var("SPINFOIL_RUST_CELLS_DIR").unwrap_or_else(|| workspace.join("target").join("evcxr")),
            runtime: var("SPINFOIL_RUST_RUNTIME").unwrap_or_else(default_runtime),
            study_dir: study_dir.or_else(|| std::env::current_dir().ok()).unwrap_or_else(|| PathBuf::from(".")),
        }
    }

    /// Checks the paths and makes them absolute, with a message naming what is missing.
    pub fn resolved(&self) -> Result<Self, String> {
        let engine = self.engine_path.join("Cargo.toml");
        if !engine.is_file() {
            return Err(format!(
                "the engine's sources are not at {} (Rust cells compile against them); set SPINFOIL_ENGINE_PATH to the spinfoil-engine folder",
                self.engine_path.display()
            ));
        }
        if !self.runtime.is_file() {
            return Err(format!(
                "the Rust cell runtime {} is missing; build it with: cargo build -p spinfoil-kernel --features rust-cells (or set SPINFOIL_RUST_RUNTIME)",
                self.runtime.display()
            ));
        }
        std::fs::create_dir_all(&self.work_root).map_err(|e| format!("cannot create {}: {e}", self.work_root.display()))?;
        let absolute = |p: &Path| p.canonicalize().map_err(|e| format!("{}: {e}", p.display()));
        Ok(Self {
            engine_path: absolute(&self.engine_path)?,
            work_root: absolute(&self.work_root)?,
            runtime: absolute(&self.runtime)?,
            study_dir: absolute(&self.study_dir)?,
        })
    }

    /// The dependency commands and the prelude, as one evcxr cell.
    pub fn prelude(&self) -> (String, String) {
        let engine = self.engine_path.display().to_string();
        let deps = format!(
            ":dep spinfoil-engine = {{ path = {engine:?}, features = [\"evcxr-display\"] }}\n\
             :dep serde = {{ version = \"1\", features = [\"derive\"] }}\n\
             :dep serde_json = {{ version = \"1\", features = [\"float_roundtrip\"] }}"
        );
        let folder = format!("{:?}", self.study_dir.display().to_string());
        (deps, CELL_PRELUDE.replace("@STUDY_DIR@", &folder))
    }

    /// Takes the first free work slot (a folder under `work_root` locked by this process).
    pub fn take_slot(&self) -> Result<WorkSlot, String> {
        for index in 0..SLOTS {
            let dir = self.work_root.join(format!("slot-{index}"));
            std::fs::create_dir_all(&dir).map_err(|e| format!("cannot create {}: {e}", dir.display()))?;
            let lock = File::create(dir.join(".spinfoil-lock")).map_err(|e| format!("{}: {e}", dir.display()))?;
            if lock.try_lock().is_ok() {
                self.seed_lockfile(&dir);
                return Ok(WorkSlot { dir, _lock: lock });
            }
        }
        Err(format!("all {SLOTS} Rust cell work folders in {} are in use by other kernels", self.work_root.display()))
    }

    /// Starts a new slot from the workspace's Cargo.lock, so cells build with the versions the
    /// engine is tested with.
    fn seed_lockfile(&self, dir: &Path) {
        let target = dir.join("Cargo.lock");
        let source = self.engine_path.join("..").join("Cargo.lock");
        if !target.exists() && source.is_file() {
            let _ = std::fs::copy(source, target);
        }
    }
}

/// A work folder held by this process (the lock is released when it is dropped).
#[derive(Debug)]
pub struct WorkSlot {
    /// The folder (evcxr's crate and its `target/`).
    pub dir: PathBuf,
    _lock: File,
}

fn default_runtime() -> PathBuf {
    let exe = std::env::current_exe().unwrap_or_default();
    let dir = exe.parent().map(Path::to_path_buf).unwrap_or_default();
    let beside = dir.join(RUNTIME_NAME);
    if beside.is_file() {
        return beside;
    }
    // Test binaries live in target/<profile>/deps, the helper one level up.
    dir.parent().map(|p| p.join(RUNTIME_NAME)).filter(|p| p.is_file()).unwrap_or(beside)
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn the_prelude_names_the_engine_and_the_study_folder() {
        let settings = RustCellSettings {
            engine_path: PathBuf::from("/src/spinfoil/engine"),
            work_root: PathBuf::from("/w"),
            runtime: PathBuf::from("/r"),
            study_dir: PathBuf::from("/studies/kestrel"),
        };
        let (deps, prelude) = settings.prelude();
        assert!(deps.starts_with(":dep spinfoil-engine = { path = \"/src/spinfoil/engine\", features = [\"evcxr-display\"] }"));
        assert!(prelude.contains("\"/studies/kestrel\""));
        assert!(!prelude.contains("@STUDY_DIR@"));
    }

    #[test]
    fn missing_paths_are_named() {
        let settings = RustCellSettings { engine_path: PathBuf::from("/nowhere/engine"), ..RustCellSettings::from_env(None) };
        let message = settings.resolved().unwrap_err();
        assert!(message.contains("/nowhere/engine") && message.contains("SPINFOIL_ENGINE_PATH"), "{message}");
    }
}
