//! The command line's grammar (clap).
use crate::sandbox_args::SandboxArgs;
use clap::{Args, Parser, Subcommand, ValueEnum};
use std::path::PathBuf;

const EXIT_CODES: &str = "\
Exit codes:
  0  success
  1  the study failed: a script or notebook cell raised an error (shown with its line and column)
  2  the command line is wrong (unknown subcommand or option, missing argument)
  3  a file could not be read or written, or the kernel could not start

Predictions are estimates. Keep clear of the throwing lane, check landing zones for people and
property, and follow local rules and the course designer's safety guidance.";

/// Spinfoil: study spin-stabilised flying discs from scripts, notebooks and Jupyter.
#[derive(Parser, Debug)]
#[command(version, after_help = EXIT_CODES)]
pub struct Cli {
    /// What to do.
    #[command(subcommand)]
    pub command: Command,
}

/// The subcommands.
#[derive(Subcommand, Debug)]
pub enum Command {
    /// Run a study script (.rhai): tables in the terminal, charts as SVG files.
    Run(RunArgs),
    /// Execute a notebook without Jupyter; write the executed .ipynb and an HTML report.
    Report(ReportArgs),
    /// Merge the partial results of a script run in shards (`run --shard i/N`) into full results.
    Merge(MergeArgs),
    /// Install the Jupyter kernelspec for this binary (with its logo).
    InstallKernel(InstallArgs),
    /// Start the Jupyter kernel (Jupyter calls this with a connection file).
    Kernel {
        /// The connection file Jupyter wrote.
        connection_file: PathBuf,
        /// The study folder (default: the current folder, where Jupyter starts the kernel: the
        /// notebook's folder), read-only folders and the time limit of a cell.
        #[command(flatten)]
        sandbox: SandboxArgs,
    },
    /// Open an interactive prompt with line editing, history and multi-line input.
    Shell {
        /// Folder for charts shown at the prompt.
        #[arg(long, default_value = "spinfoil-out")]
        out: PathBuf,
        /// The study folder (default: the current folder), read-only folders, cell time limit.
        #[command(flatten)]
        sandbox: SandboxArgs,
    },
}

/// `spinfoil run`.
#[derive(Args, Debug)]
pub struct RunArgs {
    /// The script to run.
    pub script: PathBuf,
    /// Folder for charts (chart-001.svg, ...) and table copies.
    #[arg(long, default_value = "spinfoil-out")]
    pub out: PathBuf,
    /// Also save every table shown, as CSV or JSON files.
    #[arg(long, value_enum)]
    pub tables: Option<TableFormat>,
    /// Run only shard i of N (0-based) of every sweep and dispersion, writing partial results
    /// (partial-*.json) into the output folder; merge them with `spinfoil merge`.
    #[arg(long, value_name = "i/N", value_parser = parse_shard)]
    pub shard: Option<spinfoil_engine::Shard>,
    /// The study folder (default: the script's folder), read-only folders, cell time limit.
    #[command(flatten)]
    pub sandbox: SandboxArgs,
}

/// `spinfoil merge`.
#[derive(Args, Debug)]
pub struct MergeArgs {
    /// The folder holding the partial-*.json files of all shards.
    pub folder: PathBuf,
    /// Folder for the merged charts, tables and the merging script.
    #[arg(long, default_value = "spinfoil-out")]
    pub out: PathBuf,
    /// Also save every merged table, as CSV or JSON files.
    #[arg(long, value_enum)]
    pub tables: Option<TableFormat>,
}

/// File format of table copies.
#[derive(ValueEnum, Clone, Copy, Debug)]
pub enum TableFormat {
    /// Comma-separated values, units in the header.
    Csv,
    /// JSON with columns, units and rows.
    Json,
}

/// `spinfoil report`.
#[derive(Args, Debug)]
pub struct ReportArgs {
    /// The notebook (.ipynb, nbformat 4) to execute.
    pub notebook: PathBuf,
    /// Folder for NAME.ipynb (executed) and NAME.html (report).
    #[arg(long, default_value = "spinfoil-out")]
    pub out: PathBuf,
    /// Run the remaining cells after one fails (the exit code is still 1).
    #[arg(long)]
    pub keep_going: bool,
    /// The study folder (default: the notebook's folder), read-only folders, cell time limit.
    #[command(flatten)]
    pub sandbox: SandboxArgs,
}

/// `spinfoil install-kernel`: exactly one place, the user's folder by default.
#[derive(Args, Debug)]
#[group(multiple = false)]
pub struct InstallArgs {
    /// Into the user's Jupyter data folder (default).
    #[arg(long)]
    pub user: bool,
    /// Into the active Python environment (VIRTUAL_ENV, CONDA_PREFIX or python3's sys.prefix).
    #[arg(long)]
    pub sys_prefix: bool,
    /// Into PREFIX/share/jupyter/kernels.
    #[arg(long, value_name = "PREFIX")]
    pub prefix: Option<PathBuf>,
}

/// `--shard i/N`: 0-based shard i of N.
fn parse_shard(text: &str) -> Result<spinfoil_engine::Shard, String> {
    text.parse().map_err(|e: spinfoil_engine::StudyError| e.to_string())
}
