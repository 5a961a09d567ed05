//! The script functions that save and load designs and exports.
use super::confine::{read_text, write_atomic, StudyFolder};
use super::design_file::{DesignFile, Format};
use crate::errors::script_error;
use crate::help::{FnDoc, Registrar};
use crate::packages::{DiscValue, EnvironmentValue, FlightValue, ThrowValue};
use crate::Table;
use rhai::{EvalAltResult, NativeCallContext};
use std::path::PathBuf;
use std::sync::Arc;

type Fallible<T> = Result<T, Box<EvalAltResult>>;

const DESIGN_EXTENSIONS: &[&str] = &["json", "toml"];
const TEXT_EXTENSIONS: &[&str] = &["csv", "json", "txt", "md", "svg", "html"];

fn file_error(ctx: &NativeCallContext, err: impl std::fmt::Display) -> Box<EvalAltResult> {
    script_error("FileError", format!("{}: {err}", ctx.fn_name()), ctx.call_position())
}

/// Registers the save and load functions; they fail with a `FileError` when `study_dir` is None.
pub(crate) fn register(reg: &mut Registrar, study_dir: Option<PathBuf>) {
    reg.section("files", "saving and loading designs (JSON or TOML) and exports, inside the study's folder only");
    let dir = Arc::new(study_dir);
    register_save(reg, &dir);
    register_load(reg, &dir);
    let d = dir.clone();
    reg.engine.register_fn("save_text", move |ctx: NativeCallContext, text: &str, path: &str| {
        save_text(&ctx, &d, text, path)
    });
    reg.doc(FnDoc::new(
        "save_text(text: string, path: string) -> string",
        "Writes text (a CSV or JSON export, an SVG chart) to a file in the study folder (.csv, .json, .txt, .md, .svg, .html); returns the path.",
        "save_text(compare_mass([a, b]).to_csv(), \"mass.csv\");",
    ));
    let d = dir.clone();
    reg.engine.register_fn("save_csv", move |ctx: NativeCallContext, f: FlightValue, path: &str| {
        save_text(&ctx, &d, &crate::packages::trajectory_table(&f).to_csv(), path)
    });
    let d = dir.clone();
    reg.engine.register_fn("save_csv", move |ctx: NativeCallContext, t: Table, path: &str| {
        save_text(&ctx, &d, &t.to_csv(), path)
    });
    reg.doc(FnDoc::new(
        "save_csv(result: Flight or Table, path: string) -> string",
        "Writes a flight's trajectory or a table as CSV (headers carry units) to a file in the study folder; returns the path.",
        "save_csv(fly(d, t), \"flights/p7.csv\");",
    ));
}

fn register_save(reg: &mut Registrar, dir: &Arc<Option<PathBuf>>) {
    let d = dir.clone();
    reg.engine.register_fn("save", move |ctx: NativeCallContext, x: DiscValue, path: &str| {
        save_design(&ctx, &d, &DesignFile::of_disc(&x), path)
    });
    let d = dir.clone();
    reg.engine.register_fn("save", move |ctx: NativeCallContext, x: ThrowValue, path: &str| {
        save_design(&ctx, &d, &DesignFile::Throw { throw: x }, path)
    });
    let d = dir.clone();
    reg.engine.register_fn("save", move |ctx: NativeCallContext, x: EnvironmentValue, path: &str| {
        save_design(&ctx, &d, &DesignFile::of_environment(&x), path)
    });
    reg.doc(FnDoc::new(
        "save(design: Disc, Throw or Environment, path: string) -> string",
        "Saves a design to a file in the study folder, as JSON (.json) or TOML (.toml), atomically (a partial file never replaces a good one). Paths are relative to the study folder; '..' and absolute paths are refused. Returns the path.",
        "save(d, \"designs/p7-rim-heavy.toml\");",
    ));
}

fn register_load(reg: &mut Registrar, dir: &Arc<Option<PathBuf>>) {
    let d = dir.clone();
    reg.engine.register_fn("load_disc", move |ctx: NativeCallContext, path: &str| {
        match load(&ctx, &d, path, "disc")? {
            DesignFile::Disc { design, aero } => {
                DiscValue::evaluate(design, &aero).map_err(|e| file_error(&ctx, format!("\"{path}\": {e}")))
            }
            _ => unreachable_kind(&ctx),
        }
    });
    reg.doc(FnDoc::new(
        "load_disc(path: string) -> Disc",
        "Loads a disc saved with save (JSON or TOML) from the study folder and evaluates it again.",
        "let d = load_disc(\"designs/p7-rim-heavy.toml\");",
    ));
    let d = dir.clone();
    reg.engine.register_fn("load_throw", move |ctx: NativeCallContext, path: &str| {
        match load(&ctx, &d, path, "throw")? {
            DesignFile::Throw { throw } => Ok(throw),
            _ => unreachable_kind(&ctx),
        }
    });
    reg.doc(FnDoc::new(
        "load_throw(path: string) -> Throw",
        "Loads a throw saved with save from the study folder.",
        "let t = load_throw(\"throws/long-hyzer.json\");",
    ));
    let d = dir.clone();
    reg.engine.register_fn("load_environment", move |ctx: NativeCallContext, path: &str| {
        match load(&ctx, &d, path, "environment")? {
            DesignFile::Environment { air, wind, ground } => EnvironmentValue::build(air, wind)
                .map(|e| EnvironmentValue { ground, ..e })
                .map_err(|e| file_error(&ctx, format!("\"{path}\": {e}"))),
            _ => unreachable_kind(&ctx),
        }
    });
    reg.doc(FnDoc::new(
        "load_environment(path: string) -> Environment",
        "Loads an environment saved with save from the study folder.",
        "let day = load_environment(\"days/windy.toml\");",
    ));
}

fn unreachable_kind<T>(ctx: &NativeCallContext) -> Fallible<T> {
    Err(file_error(ctx, "the file holds another kind of design"))
}

fn folder(ctx: &NativeCallContext, dir: &Option<PathBuf>) -> Fallible<StudyFolder> {
    StudyFolder::new(dir.as_deref()).map_err(|e| file_error(ctx, e))
}

fn save_design(ctx: &NativeCallContext, dir: &Option<PathBuf>, file: &DesignFile, path: &str) -> Fallible<String> {
    let full = folder(ctx, dir)?.for_writing(path, DESIGN_EXTENSIONS).map_err(|e| file_error(ctx, e))?;
    let text = file.to_text(Format::of(path)).map_err(|e| file_error(ctx, e))?;
    write_atomic(&full, &text, path).map_err(|e| file_error(ctx, e))?;
    Ok(path.to_string())
}

fn load(ctx: &NativeCallContext, dir: &Option<PathBuf>, path: &str, kind: &str) -> Fallible<DesignFile> {
    let full = folder(ctx, dir)?.for_reading(path, DESIGN_EXTENSIONS).map_err(|e| file_error(ctx, e))?;
    let text = read_text(&full, path).map_err(|e| file_error(ctx, e))?;
    let file = DesignFile::from_text(&text, Format::of(path))
        .map_err(|e| file_error(ctx, format!("\"{path}\" is not a valid design file: {e}")))?;
    if file.kind() != kind {
        return Err(file_error(ctx, format!("\"{path}\" holds a {}, not a {kind}", file.kind())));
    }
    Ok(file)
}

fn save_text(ctx: &NativeCallContext, dir: &Option<PathBuf>, text: &str, path: &str) -> Fallible<String> {
    let full = folder(ctx, dir)?.for_writing(path, TEXT_EXTENSIONS).map_err(|e| file_error(ctx, e))?;
    write_atomic(&full, text, path).map_err(|e| file_error(ctx, e))?;
    Ok(path.to_string())
}
