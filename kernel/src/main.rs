//! The `spinfoil` binary: glue between the command line and the library's hosts.
mod cli;
mod commands;
mod sandbox_args;

use clap::Parser;
use std::process::ExitCode;

fn main() -> ExitCode {
    let cli = cli::Cli::parse();
    match commands::dispatch(cli.command) {
        Ok(commands::Outcome::Done) => ExitCode::SUCCESS,
        Ok(commands::Outcome::StudyFailed) => ExitCode::from(1),
        Err(error) => {
            eprintln!("spinfoil: {}", failure_text(&error));
            ExitCode::from(3)
        }
    }
}

/// The error and its causes, each cause once: errors that already quote their source in their
/// message ("cannot read script x: Is a directory") do not repeat it at the end.
fn failure_text(error: &anyhow::Error) -> String {
    let mut text = String::new();
    for cause in error.chain().map(|c| c.to_string()) {
        if text.is_empty() {
            text = cause;
        } else if !text.contains(&cause) {
            text = format!("{text}: {cause}");
        }
    }
    text
}

#[cfg(test)]
mod tests {
    use super::failure_text;

    #[test]
    fn causes_already_quoted_are_not_repeated() {
        let io = std::io::Error::other("Is a directory");
        let quoted = anyhow::Error::from(io).context("cannot read script x: Is a directory");
        assert_eq!(failure_text(&quoted), "cannot read script x: Is a directory");
        let io = std::io::Error::other("disk full");
        let unquoted = anyhow::Error::from(io).context("cannot write report");
        assert_eq!(failure_text(&unquoted), "cannot write report: disk full");
    }
}
