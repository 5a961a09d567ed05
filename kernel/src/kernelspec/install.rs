//! Installs the kernelspec: `kernel.json` pointing at this binary, plus the logo files.
use serde_json::json;
use std::path::{Path, PathBuf};

/// The kernelspec's folder name (what `jupyter kernelspec list` shows).
pub const KERNEL_NAME: &str = "spinfoil";
/// The name notebooks show for the kernel.
pub const DISPLAY_NAME: &str = "Spinfoil";

/// Where to install.
#[derive(Debug, Clone, PartialEq, Eq)]
pub enum InstallTarget {
    /// The user's Jupyter data folder (`JUPYTER_DATA_DIR`, else the platform's default).
    User,
    /// The active Python environment (`VIRTUAL_ENV`, `CONDA_PREFIX`, else `python3`'s `sys.prefix`).
    SysPrefix,
    /// `PREFIX/share/jupyter/kernels`.
    Prefix(PathBuf),
}

/// Why the kernelspec could not be installed.
#[derive(Debug, thiserror::Error)]
#[non_exhaustive]
pub enum InstallError {
    /// No home folder or Python environment to install into.
    #[error("cannot find where to install: {0}")]
    NoLocation(String),
    /// A file could not be written.
    #[error("cannot write {path}: {source}")]
    Write {
        /// The file or folder.
        path: String,
        /// The underlying error.
        source: std::io::Error,
    },
}

/// Installs the kernelspec for `executable` into `target`; returns the kernelspec's folder.
pub fn install(target: &InstallTarget, executable: &Path) -> Result<PathBuf, InstallError> {
    let folder = kernels_folder(target)?.join(KERNEL_NAME);
    write(&folder, None)?;
    let spec = kernel_json(executable);
    write(&folder.join("kernel.json"), Some(spec.as_bytes()))?;
    write(&folder.join("logo-svg.svg"), Some(include_bytes!("../../assets/logo-svg.svg")))?;
    write(&folder.join("logo-32x32.png"), Some(include_bytes!("../../assets/logo-32x32.png")))?;
    write(&folder.join("logo-64x64.png"), Some(include_bytes!("../../assets/logo-64x64.png")))?;
    Ok(folder)
}

/// The text of `kernel.json` for a kernel started as `EXECUTABLE kernel CONNECTION_FILE`.
pub fn kernel_json(executable: &Path) -> String {
    let spec = json!({
        "argv": [executable.display().to_string(), "kernel", "{connection_file}"],
        "display_name": DISPLAY_NAME,
        "language": spinfoil_lang::LANGUAGE_NAME,
        "interrupt_mode": "message",
        "metadata": { "debugger": false },
    });
    serde_json::to_string_pretty(&spec).unwrap_or_default()
}

fn write(path: &Path, bytes: Option<&[u8]>) -> Result<(), InstallError> {
    let done = match bytes {
        Some(bytes) => std::fs::write(path, bytes),
        None => std::fs::create_dir_all(path),
    };
    done.map_err(|source| InstallError::Write { path: path.display().to_string(), source })
}

/// The `kernels` folder of `target`.
pub fn kernels_folder(target: &InstallTarget) -> Result<PathBuf, InstallError> {
    let data = match target {
        InstallTarget::User => user_data_folder()?,
        InstallTarget::SysPrefix => python_prefix()?.join("share").join("jupyter"),
        InstallTarget::Prefix(prefix) => prefix.join("share").join("jupyter"),
    };
    Ok(data.join("kernels"))
}

fn user_data_folder() -> Result<PathBuf, InstallError> {
    if let Some(dir) = std::env::var_os("JUPYTER_DATA_DIR") {
        return Ok(PathBuf::from(dir));
    }
    if cfg!(windows) {
        let appdata = std::env::var_os("APPDATA").ok_or_else(|| InstallError::NoLocation("APPDATA is not set".into()))?;
        return Ok(PathBuf::from(appdata).join("jupyter"));
    }
    let home = std::env::var_os("HOME").map(PathBuf::from).ok_or_else(|| InstallError::NoLocation("HOME is not set".into()))?;
    if cfg!(target_os = "macos") {
        return Ok(home.join("Library").join("Jupyter"));
    }
    let data_home = std::env::var_os("XDG_DATA_HOME").map_or_else(|| home.join(".local").join("share"), PathBuf::from);
    Ok(data_home.join("jupyter"))
}

fn python_prefix() -> Result<PathBuf, InstallError> {
    for variable in ["VIRTUAL_ENV", "CONDA_PREFIX"] {
        if let Some(prefix) = std::env::var_os(variable).filter(|v| !v.is_empty()) {
            return Ok(PathBuf::from(prefix));
        }
    }
    let output = std::process::Command::new("python3")
        .args(["-c", "import sys; print(sys.prefix)"])
        .output()
        .map_err(|e| InstallError::NoLocation(format!("no active environment and python3 failed: {e}")))?;
    let prefix = String::from_utf8_lossy(&output.stdout).trim().to_string();
    if prefix.is_empty() {
        return Err(InstallError::NoLocation("python3 did not report sys.prefix".into()));
    }
    Ok(PathBuf::from(prefix))
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn installs_kernel_json_and_logos_under_a_prefix() {
        let prefix = std::env::temp_dir().join(format!("spinfoil-kernelspec-{}", std::process::id()));
        let folder = install(&InstallTarget::Prefix(prefix.clone()), Path::new("/opt/spinfoil")).unwrap();
        assert_eq!(folder, prefix.join("share/jupyter/kernels/spinfoil"));
        let spec: serde_json::Value = serde_json::from_slice(&std::fs::read(folder.join("kernel.json")).unwrap()).unwrap();
        assert_eq!(spec["argv"], json!(["/opt/spinfoil", "kernel", "{connection_file}"]));
        assert_eq!(spec["language"], "spinfoil");
        assert_eq!(spec["interrupt_mode"], "message");
        for logo in ["logo-svg.svg", "logo-32x32.png", "logo-64x64.png"] {
            assert!(folder.join(logo).is_file(), "{logo} missing");
        }
        std::fs::remove_dir_all(prefix).unwrap();
    }
}
