//! Tables of results: named columns with units, rows of numbers or text, notes.

mod export;
mod html;
mod model;
mod text;

pub use export::TableError;
pub use model::{Cell, Column, Table};
pub(crate) use html::escape;

use super::Render;
use crate::MimeBundle;

impl Render for Table {
    fn render(&self) -> MimeBundle {
        MimeBundle::plain(self.to_text())
            .with("text/html", self.to_html())
            .with("application/json", self.to_json())
    }
}
