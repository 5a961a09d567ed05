//! Each subcommand, calling the library and reporting in the terminal.
use crate::cli::{Command, InstallArgs, MergeArgs, ReportArgs, RunArgs, TableFormat};
use crate::sandbox_args::SandboxArgs;
use anyhow::Context;
use spinfoil_kernel::kernelspec::{install, InstallTarget};
use spinfoil_kernel::notebook::{html_report, run_notebook, Notebook, RunSettings};
use spinfoil_kernel::script::{run_prompt, run_script, ProgressBoardSink, ScriptSettings, TableExport};
use std::path::{Path, PathBuf};
use std::sync::Arc;

/// How a command ended, when it did not fail to run.
pub enum Outcome {
    /// Everything ran.
    Done,
    /// The study raised an error (exit code 1).
    StudyFailed,
}

/// Runs one subcommand.
pub fn dispatch(command: Command) -> anyhow::Result<Outcome> {
    match command {
        Command::Run(args) => run(args),
        Command::Report(args) => report(args),
        Command::Merge(args) => merge(args),
        Command::InstallKernel(args) => install_kernel(args),
        Command::Kernel { connection_file, sandbox } => {
            let settings = sandbox.settings(None);
            spinfoil_kernel::jupyter::run_kernel_with(&connection_file, settings).context("the kernel stopped")?;
            Ok(Outcome::Done)
        }
        Command::Shell { out, sandbox } => {
            run_prompt(&out, sandbox.settings(None))?;
            Ok(Outcome::Done)
        }
    }
}

/// Environment variables through which the study functions learn their shard and its folder
/// (read in `lang/src/packages/studies/shards.rs`).
const SHARD_VAR: &str = "SPINFOIL_SHARD";
const SHARD_DIR_VAR: &str = "SPINFOIL_SHARD_DIR";

fn table_export(tables: Option<TableFormat>) -> Option<TableExport> {
    tables.map(|format| match format {
        TableFormat::Csv => TableExport::Csv,
        TableFormat::Json => TableExport::Json,
    })
}

fn run(args: RunArgs) -> anyhow::Result<Outcome> {
    if let Some(shard) = &args.shard {
        std::env::set_var(SHARD_VAR, shard.to_string());
        std::env::set_var(SHARD_DIR_VAR, &args.out);
    }
    run_and_report(&args.script, args.out, args.tables, &args.sandbox)
}

/// Writes OUT/merge.rhai (which shows every merged study) and runs it on FOLDER's partial files.
fn merge(args: MergeArgs) -> anyhow::Result<Outcome> {
    if !args.folder.is_dir() {
        anyhow::bail!("cannot read the shard folder {}: not a folder (give the --out folder of the `run --shard` runs)", args.folder.display());
    }
    if !has_partial_results(&args.folder) {
        anyhow::bail!("no partial-*.json files in {}: run the script with `--shard i/N --out {0}` first", args.folder.display());
    }
    std::fs::create_dir_all(&args.out).with_context(|| format!("cannot create {}", args.out.display()))?;
    let script = args.out.join("merge.rhai");
    let code = "// Merges the partial results of a sharded run (spinfoil merge).\nfor study in merge_shards() { show(study); }\n";
    std::fs::write(&script, code).with_context(|| format!("cannot write {}", script.display()))?;
    std::env::set_var(SHARD_DIR_VAR, &args.folder);
    run_and_report(&script, args.out.clone(), args.tables, &SandboxArgs { study_dir: Some(args.out), ..SandboxArgs::default() })
}

/// Whether `folder` holds partial results of a sharded run (`partial-*.json`).
fn has_partial_results(folder: &Path) -> bool {
    let is_partial = |name: &str| name.starts_with("partial-") && name.ends_with(".json");
    std::fs::read_dir(folder).is_ok_and(|entries| entries.flatten().any(|e| is_partial(&e.file_name().to_string_lossy())))
}

fn run_and_report(script: &Path, out: PathBuf, tables: Option<TableFormat>, sandbox: &SandboxArgs) -> anyhow::Result<Outcome> {
    let session = sandbox.settings(Some(script));
    let outcome = run_script(script, &ScriptSettings { out_dir: out, export: table_export(tables), session: Some(session) })?;
    if outcome.write_failures > 0 {
        anyhow::bail!("{} output file(s) could not be written", outcome.write_failures);
    }
    match outcome.error {
        Some(report) => {
            eprintln!("{}\n  in {}", report.text(), script.display());
            Ok(Outcome::StudyFailed)
        }
        None => Ok(Outcome::Done),
    }
}

fn report(args: ReportArgs) -> anyhow::Result<Outcome> {
    if args.notebook.extension().is_some_and(|e| e == "rhai") {
        let path = args.notebook.display();
        anyhow::bail!("{path} is a study script, not a notebook: run it with `spinfoil run {path}`");
    }
    let mut notebook = Notebook::load(&args.notebook)?;
    let observer = Arc::new(ProgressBoardSink::default());
    let session = args.sandbox.settings(Some(&args.notebook));
    let settings = RunSettings { keep_going: args.keep_going, observer: Some(observer), session };
    let summary = run_notebook(&mut notebook, &settings);
    let (executed, html) = write_report(&notebook, &args)?;
    println!("{} code cells run; wrote {} and {}", summary.cells_run, executed.display(), html.display());
    for (cell, error) in &summary.errors {
        eprintln!("cell {} failed:\n{}", cell + 1, error.text());
    }
    Ok(if summary.errors.is_empty() { Outcome::Done } else { Outcome::StudyFailed })
}

/// Writes OUT/NAME.ipynb and OUT/NAME.html; returns their paths.
fn write_report(notebook: &Notebook, args: &ReportArgs) -> anyhow::Result<(PathBuf, PathBuf)> {
    let name = |part: Option<&std::ffi::OsStr>| part.map_or_else(|| "notebook".to_string(), |s| s.to_string_lossy().into_owned());
    let (stem, file_name) = (name(args.notebook.file_stem()), name(args.notebook.file_name()));
    std::fs::create_dir_all(&args.out).with_context(|| format!("cannot create {}", args.out.display()))?;
    let executed = args.out.join(format!("{stem}.ipynb"));
    notebook.save(&executed)?;
    let html = args.out.join(format!("{stem}.html"));
    std::fs::write(&html, html_report(notebook, &file_name)).with_context(|| format!("cannot write {}", html.display()))?;
    Ok((executed, html))
}

fn install_kernel(args: InstallArgs) -> anyhow::Result<Outcome> {
    let target = match (args.sys_prefix, args.prefix) {
        (true, _) => InstallTarget::SysPrefix,
        (false, Some(prefix)) => InstallTarget::Prefix(prefix),
        (false, None) => InstallTarget::User,
    };
    let executable = std::env::current_exe().context("cannot find this program's own path")?;
    let executable = executable.canonicalize().unwrap_or(executable);
    let folder = install(&target, &executable)?;
    println!("Installed kernelspec \"spinfoil\" in {}", folder.display());
    Ok(Outcome::Done)
}
