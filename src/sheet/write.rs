//! Writing the sheet's folder: every file first into a temporary folder beside the target, then
//! moved into place, so a reader never sees half a sheet. A folder that holds files is refused
//! unless the caller forces it; forced, only the sheet's own files are replaced.

use std::path::{Path, PathBuf};

/// One output file: its name inside the folder and its bytes.
#[derive(Debug, Clone, PartialEq, Eq)]
pub struct OutFile {
    pub name: String,
    pub bytes: Vec<u8>,
}

/// Why the folder was not written.
#[derive(Debug)]
pub enum WriteError {
    /// The folder holds files and `force` was not given.
    NotEmpty(PathBuf),
    /// The path exists and is not a folder.
    NotAFolder(PathBuf),
    Io(PathBuf, std::io::Error),
}

impl std::fmt::Display for WriteError {
    fn fmt(&self, f: &mut std::fmt::Formatter<'_>) -> std::fmt::Result {
        match self {
            WriteError::NotEmpty(p) => write!(f, "'{}' is not empty", p.display()),
            WriteError::NotAFolder(p) => write!(f, "'{}' exists and is not a folder", p.display()),
            WriteError::Io(p, e) => write!(f, "cannot write '{}': {e}", p.display()),
        }
    }
}

fn io(p: &Path) -> impl FnOnce(std::io::Error) -> WriteError + '_ {
    move |e| WriteError::Io(p.to_path_buf(), e)
}

/// A temporary folder beside `out`, on the same file system so the moves are renames.
fn temp_beside(out: &Path) -> PathBuf {
    let name = out
        .file_name()
        .map(|n| n.to_string_lossy().into_owned())
        .unwrap_or_else(|| "sheet".into());
    let parent = match out.parent() {
        Some(p) if !p.as_os_str().is_empty() => p.to_path_buf(),
        _ => PathBuf::from("."),
    };
    parent.join(format!(".{name}.jointbook-{}", std::process::id()))
}

/// Write `files` into the folder `out`.
pub fn write_folder(out: &Path, files: &[OutFile], force: bool) -> Result<(), WriteError> {
    let exists = out.exists();
    if exists && !out.is_dir() {
        return Err(WriteError::NotAFolder(out.to_path_buf()));
    }
    let empty = !exists || std::fs::read_dir(out).map_err(io(out))?.next().is_none();
    if !empty && !force {
        return Err(WriteError::NotEmpty(out.to_path_buf()));
    }
    let tmp = temp_beside(out);
    if tmp.exists() {
        std::fs::remove_dir_all(&tmp).map_err(io(&tmp))?;
    }
    std::fs::create_dir_all(&tmp).map_err(io(&tmp))?;
    let staged = (|| {
        for f in files {
            std::fs::write(tmp.join(&f.name), &f.bytes).map_err(io(&tmp))?;
        }
        Ok(())
    })();
    if let Err(e) = staged {
        let _ = std::fs::remove_dir_all(&tmp);
        return Err(e);
    }
    let moved = if empty {
        // an empty folder is replaced by the staged one whole
        if exists {
            std::fs::remove_dir(out).map_err(io(out))?;
        }
        std::fs::rename(&tmp, out).map_err(io(out))
    } else {
        // forced into a folder with files: each of ours is moved over its old copy, and the
        // drawings of an earlier sheet that this one does not write are removed, so no stale
        // drawing of a detail the model no longer has lies beside the new sheet
        let r = files
            .iter()
            .try_for_each(|f| {
                std::fs::rename(tmp.join(&f.name), out.join(&f.name)).map_err(io(out))
            })
            .and_then(|_| remove_stale_drawings(out, files));
        let _ = std::fs::remove_dir_all(&tmp);
        r
    };
    if moved.is_err() {
        let _ = std::fs::remove_dir_all(&tmp);
    }
    moved
}

/// Whether a file name is one of the sheet's drawings, `detail-ID.svg`.
fn is_drawing(name: &str) -> bool {
    name.starts_with("detail-") && name.ends_with(".svg")
}

/// Remove the drawings in `out` that are not among `files`.
fn remove_stale_drawings(out: &Path, files: &[OutFile]) -> Result<(), WriteError> {
    for entry in std::fs::read_dir(out).map_err(io(out))? {
        let entry = entry.map_err(io(out))?;
        let name = entry.file_name().to_string_lossy().to_string();
        if is_drawing(&name) && !files.iter().any(|f| f.name == name) && entry.path().is_file() {
            std::fs::remove_file(entry.path()).map_err(io(out))?;
        }
    }
    Ok(())
}

#[cfg(test)]
mod tests {
    use super::*;

    fn scratch(name: &str) -> PathBuf {
        let d = std::env::temp_dir().join(format!("jointbook-write-{name}-{}", std::process::id()));
        let _ = std::fs::remove_dir_all(&d);
        std::fs::create_dir_all(&d).unwrap();
        d
    }

    fn file(name: &str, text: &str) -> OutFile {
        OutFile {
            name: name.into(),
            bytes: text.as_bytes().to_vec(),
        }
    }

    #[test]
    fn writes_a_new_folder_and_refuses_a_full_one() {
        let root = scratch("new");
        let out = root.join("sheet");
        write_folder(&out, &[file("a.txt", "one")], false).unwrap();
        assert_eq!(std::fs::read_to_string(out.join("a.txt")).unwrap(), "one");
        let e = write_folder(&out, &[file("a.txt", "two")], false).unwrap_err();
        assert!(matches!(e, WriteError::NotEmpty(_)));
        assert_eq!(std::fs::read_to_string(out.join("a.txt")).unwrap(), "one");
        // nothing is left beside the folder
        let left: Vec<_> = std::fs::read_dir(&root).unwrap().collect();
        assert_eq!(left.len(), 1);
        let _ = std::fs::remove_dir_all(&root);
    }

    #[test]
    fn forced_replaces_its_own_files_and_keeps_others() {
        let root = scratch("force");
        let out = root.join("sheet");
        std::fs::create_dir_all(&out).unwrap();
        std::fs::write(out.join("notes.txt"), "mine").unwrap();
        std::fs::write(out.join("a.txt"), "old").unwrap();
        write_folder(&out, &[file("a.txt", "new")], true).unwrap();
        assert_eq!(std::fs::read_to_string(out.join("a.txt")).unwrap(), "new");
        assert_eq!(
            std::fs::read_to_string(out.join("notes.txt")).unwrap(),
            "mine"
        );
        let _ = std::fs::remove_dir_all(&root);
    }

    #[test]
    fn forced_removes_the_drawings_of_an_earlier_sheet_only() {
        let root = scratch("stale");
        let out = root.join("sheet");
        std::fs::create_dir_all(&out).unwrap();
        std::fs::write(out.join("detail-OLD.svg"), "old drawing").unwrap();
        std::fs::write(out.join("detail-KEPT.svg"), "old").unwrap();
        std::fs::write(out.join("my-detail-notes.svg"), "mine").unwrap();
        write_folder(&out, &[file("detail-KEPT.svg", "new")], true).unwrap();
        assert!(!out.join("detail-OLD.svg").exists());
        assert_eq!(
            std::fs::read_to_string(out.join("detail-KEPT.svg")).unwrap(),
            "new"
        );
        assert!(out.join("my-detail-notes.svg").exists());
        let _ = std::fs::remove_dir_all(&root);
    }

    #[test]
    fn an_empty_folder_is_filled_and_a_file_is_refused() {
        let root = scratch("empty");
        let out = root.join("sheet");
        std::fs::create_dir_all(&out).unwrap();
        write_folder(&out, &[file("a.txt", "x")], false).unwrap();
        assert!(out.join("a.txt").exists());
        let f = root.join("plain");
        std::fs::write(&f, "x").unwrap();
        assert!(matches!(
            write_folder(&f, &[], true).unwrap_err(),
            WriteError::NotAFolder(_)
        ));
        let _ = std::fs::remove_dir_all(&root);
    }
}
