//! Which cells are Rust: the marker line.

/// The first non-blank line of a Rust cell.
pub const RUST_CELL_MARKER: &str = "%%rust";

/// The Rust source of `code` if it is a Rust cell: the cell with its marker line blanked, so
/// line numbers stay those of the cell. `None` for script cells.
pub fn rust_cell_source(code: &str) -> Option<String> {
    let mut lines: Vec<&str> = code.split('\n').collect();
    let first = lines.iter().position(|l| !l.trim().is_empty())?;
    if lines[first].trim() != RUST_CELL_MARKER {
        return None;
    }
    lines[first] = "";
    Some(lines.join("\n"))
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn the_marker_line_is_blanked_and_lines_keep_their_numbers() {
        assert_eq!(rust_cell_source("%%rust\nlet x = 1;\nx").as_deref(), Some("\nlet x = 1;\nx"));
        assert_eq!(rust_cell_source("\n  %%rust  \r\nlet x = 1;").as_deref(), Some("\n\nlet x = 1;"));
    }

    #[test]
    fn script_cells_are_not_rust() {
        assert_eq!(rust_cell_source("let x = 1; // %%rust"), None);
        assert_eq!(rust_cell_source("%%rustic\n1"), None);
        assert_eq!(rust_cell_source(""), None);
        assert_eq!(rust_cell_source("print(\"%%rust\");"), None);
    }
}
