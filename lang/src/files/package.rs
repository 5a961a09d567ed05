//! The script functions that save and load designs and exports.
use super::confine::{read_text, write_atomic, StudyFolder};
use super::design_file::{DesignFile, Format};
use super::json_value::json_to_dynamic;
use crate::errors::script_error;
use crate::help::{FnDoc, Registrar};
use crate::packages::{DiscValue, EnvironmentValue, FlightValue, ThrowValue};
use crate::session::{limit_error, ScriptRules};
use crate::Table;
use rhai::{Dynamic, EvalAltResult, NativeCallContext};

type Fallible<T> = Result<T, Box<EvalAltResult>>;

const DESIGN_EXTENSIONS: &[&str] = &["json", "toml"];
const TEXT_EXTENSIONS: &[&str] = &["csv", "json", "txt", "md", "svg", "html"];

fn file_error(ctx: &NativeCallContext, err: impl std::fmt::Display) -> Box<EvalAltResult> {
    script_error("FileError", format!("{}: {err}", ctx.fn_name()), ctx.call_position())
}

/// Registers the save and load functions. They use the folders of the session's
/// [`ScriptRules`] and fail with a `FileError` when the session has none.
pub(crate) fn register(reg: &mut Registrar) {
    reg.section("files", "saving and loading designs (JSON or TOML), exports and JSON data, inside the study's folder only");
    register_save(reg);
    register_load(reg);
    reg.engine.register_fn("save_text", |ctx: NativeCallContext, text: &str, path: &str| save_text(&ctx, text, path));
    reg.doc(FnDoc::new(
        "save_text(text: string, path: string) -> string",
        "Writes text (a CSV or JSON export, an SVG chart) to a file in the study folder (.csv, .json, .txt, .md, .svg, .html); returns the path.",
        "save_text(compare_mass([a, b]).to_csv(), \"mass.csv\");",
    ));
    reg.engine.register_fn("save_csv", |ctx: NativeCallContext, f: FlightValue, path: &str| {
        save_text(&ctx, &crate::packages::trajectory_table(&f).to_csv(), path)
    });
    reg.engine.register_fn("save_csv", |ctx: NativeCallContext, t: Table, path: &str| save_text(&ctx, &t.to_csv(), path));
    reg.doc(FnDoc::new(
        "save_csv(result: Flight or Table, path: string) -> string",
        "Writes a flight's trajectory or a table as CSV (headers carry units) to a file in the study folder; returns the path.",
        "save_csv(fly(d, t), \"flights/p7.csv\");",
    ));
}

fn register_save(reg: &mut Registrar) {
    reg.engine.register_fn("save", |ctx: NativeCallContext, x: DiscValue, path: &str| {
        save_design(&ctx, &DesignFile::of_disc(&x), path)
    });
    reg.engine.register_fn("save", |ctx: NativeCallContext, x: ThrowValue, path: &str| {
        save_design(&ctx, &DesignFile::Throw { throw: x }, path)
    });
    reg.engine.register_fn("save", |ctx: NativeCallContext, x: EnvironmentValue, path: &str| {
        save_design(&ctx, &DesignFile::of_environment(&x), path)
    });
    reg.doc(FnDoc::new(
        "save(design: Disc, Throw or Environment, path: string) -> string",
        "Saves a design to a file in the study folder, as JSON (.json) or TOML (.toml), atomically (a partial file never replaces a good one). Paths are relative to the study folder; '..' and absolute paths are refused. Returns the path.",
        "save(d, \"designs/p7-rim-heavy.toml\");",
    ));
}

fn register_load(reg: &mut Registrar) {
    reg.engine.register_fn("load_disc", |ctx: NativeCallContext, path: &str| {
        match load(&ctx, path, "disc")? {
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
    reg.engine.register_fn("load_throw", |ctx: NativeCallContext, path: &str| {
        match load(&ctx, path, "throw")? {
            DesignFile::Throw { throw } => Ok(throw),
            _ => unreachable_kind(&ctx),
        }
    });
    reg.doc(FnDoc::new(
        "load_throw(path: string) -> Throw",
        "Loads a throw saved with save from the study folder.",
        "let t = load_throw(\"throws/long-hyzer.json\");",
    ));
    reg.engine.register_fn("load_environment", |ctx: NativeCallContext, path: &str| {
        match load(&ctx, path, "environment")? {
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
    reg.engine.register_fn("load_json", |ctx: NativeCallContext, path: &str| load_json(&ctx, path));
    reg.doc(FnDoc::new(
        "load_json(path: string) -> map, array or value",
        "Reads any JSON file (.json) from the study folder (or an extra read-only folder) as script values: objects become object maps, arrays arrays, whole numbers integers, other numbers floats, null (). The same confinement and size limits as the other loaders apply; a malformed file is refused with the line and column of the problem.",
        "let field = load_json(\"fields/north-meadow.json\");\nlet tee = field.tee_m;",
    ));
}

fn load_json(ctx: &NativeCallContext, path: &str) -> Fallible<Dynamic> {
    let text = read_confined(ctx, path, &["json"])?;
    let value = json_to_dynamic(&text).map_err(|e| file_error(ctx, format!("\"{path}\" is not valid JSON: {e}")))?;
    ctx.engine().ensure_data_size_within_limits(&value).map_err(|_| {
        let engine = ctx.engine();
        limit_error(
            ctx,
            format!(
                "{}: \"{path}\" holds more than a script value may: arrays hold at most {} elements, maps {} entries, strings {} bytes (limits max_array_size, max_map_size, max_string_size)",
                ctx.fn_name(),
                engine.max_array_size(),
                engine.max_map_size(),
                engine.max_string_size()
            ),
        )
    })?;
    Ok(value)
}

fn unreachable_kind<T>(ctx: &NativeCallContext) -> Fallible<T> {
    Err(file_error(ctx, "the file holds another kind of design"))
}

fn folder(ctx: &NativeCallContext) -> Fallible<StudyFolder> {
    ScriptRules::of(ctx).folder().map_err(|e| file_error(ctx, e))
}

fn save_design(ctx: &NativeCallContext, file: &DesignFile, path: &str) -> Fallible<String> {
    let full = folder(ctx)?.for_writing(path, DESIGN_EXTENSIONS).map_err(|e| file_error(ctx, e))?;
    let text = file.to_text(Format::of(path)).map_err(|e| file_error(ctx, e))?;
    write_atomic(&full, &text, path).map_err(|e| file_error(ctx, e))?;
    Ok(path.to_string())
}

fn load(ctx: &NativeCallContext, path: &str, kind: &str) -> Fallible<DesignFile> {
    let text = read_confined(ctx, path, DESIGN_EXTENSIONS)?;
    let file = DesignFile::from_text(&text, Format::of(path))
        .map_err(|e| file_error(ctx, format!("\"{path}\" is not a valid design file: {e}")))?;
    if file.kind() != kind {
        return Err(file_error(ctx, format!("\"{path}\" holds a {}, not a {kind}", file.kind())));
    }
    Ok(file)
}

/// The text of the file at the script path `path` (one of `extensions`), read through the
/// session's confinement (study folder, then extra folders); a `FileError` naming the path
/// otherwise.
pub(crate) fn read_confined(ctx: &NativeCallContext, path: &str, extensions: &[&str]) -> Fallible<String> {
    let full = folder(ctx)?.for_reading(path, extensions).map_err(|e| file_error(ctx, e))?;
    let max = ctx.engine().max_string_size();
    let bytes = std::fs::metadata(&full).map(|m| m.len()).unwrap_or(0);
    if max > 0 && bytes > max as u64 {
        return Err(limit_error(
            ctx,
            format!(
                "{}: \"{path}\" is {bytes} bytes, more than the {max} bytes a script may read (limit max_string_size)",
                ctx.fn_name()
            ),
        ));
    }
    read_text(&full, path).map_err(|e| file_error(ctx, e))
}

fn save_text(ctx: &NativeCallContext, text: &str, path: &str) -> Fallible<String> {
    let full = folder(ctx)?.for_writing(path, TEXT_EXTENSIONS).map_err(|e| file_error(ctx, e))?;
    write_atomic(&full, text, path).map_err(|e| file_error(ctx, e))?;
    Ok(path.to_string())
}
