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
            eprintln!("spinfoil: {error:#}");
            ExitCode::from(3)
        }
    }
}
