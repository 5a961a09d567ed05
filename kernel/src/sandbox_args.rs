//! The command line's say over a session's sandbox: the study folder, read-only extra folders
//! and the wall-time limit of a cell (`--study-dir`, `--read-dir`, `--max-cell-seconds`).
use clap::Args;
use spinfoil_lang::SessionSettings;
use std::path::{Path, PathBuf};
use std::time::Duration;

/// Where scripts may touch files and how long one cell may run.
#[derive(Args, Debug, Clone, Default, PartialEq)]
pub struct SandboxArgs {
    /// The study folder, the only folder scripts may save into and load from (default: the
    /// script's or notebook's own folder; the current folder for `kernel` and `shell`).
    #[arg(long, value_name = "DIR")]
    pub study_dir: Option<PathBuf>,
    /// Also let scripts read (never write) files in DIR; repeat for more folders.
    #[arg(long = "read-dir", value_name = "DIR")]
    pub read_dirs: Vec<PathBuf>,
    /// Stop a cell that runs longer than this many seconds (default 600).
    #[arg(long, value_name = "SECONDS", value_parser = parse_seconds)]
    pub max_cell_seconds: Option<Duration>,
}

impl SandboxArgs {
    /// The session settings: the defaults, with these folders and limit. Without
    /// `--study-dir`, the study folder is the folder of `file` (a script or notebook), else the
    /// current folder.
    pub fn settings(&self, file: Option<&Path>) -> SessionSettings {
        let defaults = file.map_or_else(|| SessionSettings::in_folder("."), SessionSettings::for_script);
        SessionSettings {
            study_dir: self.study_dir.clone().or(defaults.study_dir.clone()),
            extra_dirs: self.read_dirs.clone(),
            max_cell_time: self.max_cell_seconds.unwrap_or(defaults.max_cell_time),
            ..defaults
        }
    }
}

/// `--max-cell-seconds`: a positive, finite number of seconds.
fn parse_seconds(text: &str) -> Result<Duration, String> {
    let seconds: f64 = text.trim().parse().map_err(|_| format!("\"{text}\" is not a number of seconds"))?;
    if !(seconds.is_finite() && seconds > 0.0 && seconds <= 1.0e9) {
        return Err(format!("{seconds} s is not allowed: give a positive number of seconds up to 1e9"));
    }
    Ok(Duration::from_secs_f64(seconds))
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn defaults_put_the_study_folder_beside_the_file() {
        let settings = SandboxArgs::default().settings(Some(Path::new("studies/kestrel.rhai")));
        assert_eq!(settings.study_dir, Some(PathBuf::from("studies")));
        let bare = SandboxArgs::default().settings(Some(Path::new("kestrel.rhai")));
        assert_eq!(bare.study_dir, Some(PathBuf::from(".")));
        assert_eq!(SandboxArgs::default().settings(None).study_dir, Some(PathBuf::from(".")));
        assert_eq!(settings.max_cell_time, SessionSettings::default().max_cell_time);
    }

    #[test]
    fn seconds_must_be_positive_and_finite() {
        assert_eq!(parse_seconds("2.5"), Ok(Duration::from_millis(2500)));
        for bad in ["0", "-1", "nan", "inf", "ten"] {
            assert!(parse_seconds(bad).is_err(), "{bad} accepted");
        }
    }
}
