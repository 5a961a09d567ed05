//! The `spinfoil` binary: glue between the command line, Jupyter and a `spinfoil_lang::Session`.
use clap::Parser;

/// Spinfoil: study spin-stabilised flying discs from scripts and notebooks.
#[derive(Parser)]
#[command(version, about)]
struct Cli {}

fn main() -> anyhow::Result<()> {
    let _cli = Cli::parse();
    Ok(())
}
