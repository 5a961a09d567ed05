//! Prints the language reference page (Markdown) generated from the functions' doc strings:
//! `cargo run -p spinfoil-lang --example reference > docs/reference.md`
use spinfoil_lang::{Session, SessionSettings};

fn main() {
    print!("{}", Session::new(SessionSettings::default()).docs().reference_markdown());
}
