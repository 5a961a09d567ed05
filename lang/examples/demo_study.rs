//! Runs the invented demo study (`demo_study.rhai`) in a session whose study folder is the
//! folder given on the command line (default: the current folder), printing text output and
//! writing the charts and CSV the script saves there.
//!
//! `cargo run -p spinfoil-lang --example demo_study -- out/demo`
use spinfoil_lang::{CollectedOutput, OutputEvent, Session, SessionSettings};
use std::path::PathBuf;
use std::sync::Arc;

fn main() {
    let folder = PathBuf::from(std::env::args().nth(1).unwrap_or_else(|| ".".into()));
    if let Err(e) = std::fs::create_dir_all(&folder) {
        eprintln!("cannot create {}: {e}", folder.display());
        std::process::exit(2);
    }
    let mut session = Session::new(SessionSettings { study_dir: Some(folder), ..Default::default() });
    let sink = Arc::new(CollectedOutput::default());
    let result = session.eval(include_str!("demo_study.rhai"), sink.clone());
    for event in sink.take() {
        match event {
            OutputEvent::Stdout(text) => print!("{text}"),
            OutputEvent::Stderr(text) => eprint!("{text}"),
            OutputEvent::Display(bundle, _) | OutputEvent::Update(bundle, _) => {
                println!("{}\n", bundle.text_plain().unwrap_or_default())
            }
        }
    }
    match result {
        Ok(Some(bundle)) => println!("{}", bundle.text_plain().unwrap_or_default()),
        Ok(None) => {}
        Err(e) => {
            eprintln!("{e}");
            std::process::exit(1);
        }
    }
}
