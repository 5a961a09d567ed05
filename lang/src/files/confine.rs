//! Paths confined to the study's folder (and extra read-only folders): relative, no `..`, no
//! way out through symlinks.
use std::path::{Component, Path, PathBuf};
use std::sync::atomic::{AtomicUsize, Ordering};

/// Why a path was refused or a file could not be used.
#[derive(Debug, Clone, PartialEq, thiserror::Error)]
#[non_exhaustive]
pub enum FileAccessError {
    /// Scripts of this session may not touch files.
    #[error("file access is off in this session (no study folder is set)")]
    NoStudyDir,
    /// The path is absolute, empty, or climbs out with `..`.
    #[error("path \"{path}\" is not allowed: give a path relative to the study folder, without '..'")]
    NotRelative {
        /// The path as given.
        path: String,
    },
    /// The file's extension is not one this function writes or reads.
    #[error("path \"{path}\" must end in one of {allowed}")]
    BadExtension {
        /// The path as given.
        path: String,
        /// The allowed extensions.
        allowed: String,
    },
    /// The path leads outside the study folder (through a symbolic link).
    #[error("path \"{path}\" leads outside the study folder (through a symbolic link); scripts may only use files inside it")]
    Outside {
        /// The path as given.
        path: String,
    },
    /// The operating system refused.
    #[error("{action} \"{path}\" failed: {reason}")]
    Io {
        /// Reading or writing.
        action: &'static str,
        /// The path as given.
        path: String,
        /// The system's reason.
        reason: String,
    },
}

/// The study folder, the extra read-only folders, and the checks every script path goes through.
#[derive(Debug, Clone, PartialEq)]
pub struct StudyFolder {
    /// The study folder (canonical), if file access is on.
    root: Option<PathBuf>,
    /// Extra folders to read from (canonical), searched after the study folder.
    extra: Vec<PathBuf>,
}

impl StudyFolder {
    /// The folder `dir` (canonicalised); `None` when file access is off.
    pub fn new(dir: Option<&Path>) -> Result<Self, FileAccessError> {
        Self::with_extra(dir, &[])
    }

    /// The study folder `dir` (read and write) and `extra` folders (read only). Fails when
    /// there is no folder at all, or when one cannot be opened.
    pub fn with_extra(dir: Option<&Path>, extra: &[PathBuf]) -> Result<Self, FileAccessError> {
        if dir.is_none() && extra.is_empty() {
            return Err(FileAccessError::NoStudyDir);
        }
        let open = |d: &Path| d.canonicalize().map_err(|e| io("opening the study folder", d, &e));
        let root = dir.map(open).transpose()?;
        let extra = extra.iter().map(|d| open(d)).collect::<Result<_, _>>()?;
        Ok(Self { root, extra })
    }

    /// The checked full path of `relative` for reading: it must exist inside the study folder,
    /// or else inside one of the extra folders (searched in order).
    pub fn for_reading(&self, relative: &str, extensions: &[&str]) -> Result<PathBuf, FileAccessError> {
        let path = checked_relative(relative, extensions)?;
        let roots: Vec<&PathBuf> = self.root.iter().chain(&self.extra).collect();
        for root in &roots {
            let joined = root.join(path);
            if std::fs::symlink_metadata(&joined).is_err() {
                continue; // not in this folder: look in the next one
            }
            let real = joined.canonicalize().map_err(|e| io("reading", Path::new(relative), &e))?;
            return inside(root, real, relative);
        }
        let first = roots.first().ok_or(FileAccessError::NoStudyDir)?;
        let missing = first.join(path).canonicalize().err();
        Err(missing.map_or(FileAccessError::NoStudyDir, |e| io("reading", Path::new(relative), &e)))
    }

    /// The checked full path of `relative` for writing: its folder must exist inside the study
    /// folder, and an existing file there must not be a link to elsewhere. Extra folders are
    /// never written to.
    pub fn for_writing(&self, relative: &str, extensions: &[&str]) -> Result<PathBuf, FileAccessError> {
        let root = self.root.as_ref().ok_or(FileAccessError::NoStudyDir)?;
        let joined = root.join(checked_relative(relative, extensions)?);
        let parent = joined.parent().unwrap_or(root);
        let real_parent = parent.canonicalize().map_err(|e| io("opening the folder of", Path::new(relative), &e))?;
        inside(root, real_parent.clone(), relative)?;
        if let Ok(real) = joined.canonicalize() {
            inside(root, real, relative)?;
        } else if std::fs::symlink_metadata(&joined).is_ok() {
            // A link whose target does not exist: writing through it could create a file anywhere.
            return Err(FileAccessError::Outside { path: relative.to_string() });
        }
        Ok(real_parent.join(joined.file_name().unwrap_or_default()))
    }
}

fn inside(root: &Path, real: PathBuf, relative: &str) -> Result<PathBuf, FileAccessError> {
    if real.starts_with(root) {
        Ok(real)
    } else {
        Err(FileAccessError::Outside { path: relative.to_string() })
    }
}

fn checked_relative<'a>(relative: &'a str, extensions: &[&str]) -> Result<&'a Path, FileAccessError> {
    let path = Path::new(relative);
    let plain = path.components().all(|c| matches!(c, Component::Normal(_) | Component::CurDir));
    if relative.is_empty() || !plain || relative.contains('\0') {
        return Err(FileAccessError::NotRelative { path: relative.to_string() });
    }
    let ext = path.extension().and_then(|e| e.to_str()).unwrap_or("").to_ascii_lowercase();
    if !extensions.contains(&ext.as_str()) {
        let allowed = extensions.iter().map(|e| format!(".{e}")).collect::<Vec<_>>().join(", ");
        return Err(FileAccessError::BadExtension { path: relative.to_string(), allowed });
    }
    Ok(path)
}

fn io(action: &'static str, path: &Path, err: &std::io::Error) -> FileAccessError {
    FileAccessError::Io { action, path: path.display().to_string(), reason: err.to_string() }
}

static NEXT_TEMP: AtomicUsize = AtomicUsize::new(0);

/// Writes `text` to `path` atomically: a hidden temporary file in the same folder
/// (`.NAME.PID-N.partial`, created new, never through a link), written and flushed to disk
/// (fsync), then renamed over `path`, and the folder flushed. A process killed at any moment
/// leaves `path` either old or new, never partly written; the temporary files that such
/// processes left behind are removed by the next save of the same file.
pub fn write_atomic(path: &Path, text: &str, shown: &str) -> Result<(), FileAccessError> {
    use std::io::Write;
    let name = path.file_name().and_then(|n| n.to_str()).unwrap_or("file");
    let pid = std::process::id();
    let temp = path.with_file_name(format!(".{name}.{pid}-{}.partial", NEXT_TEMP.fetch_add(1, Ordering::Relaxed)));
    let result = std::fs::OpenOptions::new()
        .write(true)
        .create_new(true)
        .open(&temp)
        .and_then(|mut f| f.write_all(text.as_bytes()).and_then(|()| f.sync_all()))
        .and_then(|()| std::fs::rename(&temp, path));
    if let Err(e) = result {
        let _ = std::fs::remove_file(&temp);
        return Err(io("writing", Path::new(shown), &e));
    }
    if let Some(folder) = path.parent() {
        // Makes the rename itself durable; some systems refuse to sync a folder: no matter.
        let _ = std::fs::File::open(folder).and_then(|f| f.sync_all());
        remove_abandoned_temps(folder, name, pid);
    }
    Ok(())
}

/// Removes `.NAME.PID-N.partial` files in `folder` left by processes that no longer run
/// (known on Linux through /proc; elsewhere they stay, hidden and never loaded).
fn remove_abandoned_temps(folder: &Path, name: &str, own_pid: u32) {
    let prefix = format!(".{name}.");
    let Ok(entries) = std::fs::read_dir(folder) else { return };
    for entry in entries.flatten() {
        let file = entry.file_name().to_string_lossy().into_owned();
        let Some(pid) = file.strip_prefix(&prefix).and_then(|r| r.strip_suffix(".partial")).and_then(|r| r.split('-').next()) else {
            continue;
        };
        let Ok(pid) = pid.parse::<u32>() else { continue };
        if pid != own_pid && !process_runs(pid) {
            let _ = std::fs::remove_file(entry.path());
        }
    }
}

fn process_runs(pid: u32) -> bool {
    if cfg!(target_os = "linux") {
        Path::new("/proc").join(pid.to_string()).exists()
    } else {
        true
    }
}

/// Reads a text file.
pub fn read_text(path: &Path, shown: &str) -> Result<String, FileAccessError> {
    std::fs::read_to_string(path).map_err(|e| io("reading", Path::new(shown), &e))
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn relative_paths_only() {
        assert!(checked_relative("designs/a.json", &["json"]).is_ok());
        assert!(checked_relative("./a.json", &["json"]).is_ok());
        for bad in ["", "/etc/passwd.json", "../a.json", "a/../../b.json"] {
            assert!(matches!(checked_relative(bad, &["json"]), Err(FileAccessError::NotRelative { .. })), "{bad}");
        }
        assert!(matches!(checked_relative("a.exe", &["json"]), Err(FileAccessError::BadExtension { .. })));
    }
}
