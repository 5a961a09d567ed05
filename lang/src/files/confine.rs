//! Paths confined to the study's folder: relative, no `..`, no way out through symlinks.
use std::path::{Component, Path, PathBuf};

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
    #[error("path \"{path}\" leads outside the study folder")]
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

/// The study folder and the checks every script path goes through.
#[derive(Debug, Clone, PartialEq)]
pub struct StudyFolder {
    root: PathBuf,
}

impl StudyFolder {
    /// The folder `dir` (canonicalised); `None` when file access is off.
    pub fn new(dir: Option<&Path>) -> Result<Self, FileAccessError> {
        let dir = dir.ok_or(FileAccessError::NoStudyDir)?;
        let root = dir.canonicalize().map_err(|e| io("opening the study folder", dir, &e))?;
        Ok(Self { root })
    }

    /// The checked full path of `relative` for reading: it must exist inside the folder.
    pub fn for_reading(&self, relative: &str, extensions: &[&str]) -> Result<PathBuf, FileAccessError> {
        let joined = self.root.join(checked_relative(relative, extensions)?);
        let real = joined.canonicalize().map_err(|e| io("reading", Path::new(relative), &e))?;
        self.inside(real, relative)
    }

    /// The checked full path of `relative` for writing: its folder must exist inside the study
    /// folder, and an existing file there must not be a link to elsewhere.
    pub fn for_writing(&self, relative: &str, extensions: &[&str]) -> Result<PathBuf, FileAccessError> {
        let joined = self.root.join(checked_relative(relative, extensions)?);
        let parent = joined.parent().unwrap_or(&self.root);
        let real_parent = parent.canonicalize().map_err(|e| io("opening the folder of", Path::new(relative), &e))?;
        self.inside(real_parent.clone(), relative)?;
        if let Ok(real) = joined.canonicalize() {
            self.inside(real, relative)?;
        }
        Ok(real_parent.join(joined.file_name().unwrap_or_default()))
    }

    fn inside(&self, real: PathBuf, relative: &str) -> Result<PathBuf, FileAccessError> {
        if real.starts_with(&self.root) {
            Ok(real)
        } else {
            Err(FileAccessError::Outside { path: relative.to_string() })
        }
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

/// Writes `text` to `path` atomically: a temporary file in the same folder, then a rename.
pub fn write_atomic(path: &Path, text: &str, shown: &str) -> Result<(), FileAccessError> {
    use std::io::Write;
    let name = path.file_name().and_then(|n| n.to_str()).unwrap_or("file");
    let temp = path.with_file_name(format!(".{name}.{}.partial", std::process::id()));
    let result = std::fs::File::create(&temp)
        .and_then(|mut f| f.write_all(text.as_bytes()).and_then(|()| f.sync_all()))
        .and_then(|()| std::fs::rename(&temp, path));
    if let Err(e) = result {
        let _ = std::fs::remove_file(&temp);
        return Err(io("writing", Path::new(shown), &e));
    }
    Ok(())
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
