//! Tables as script values: exports and cell access.
use super::args::{value_error, Fallible};
use crate::help::{FnDoc, Registrar};
use crate::{Cell, Table};
use rhai::{Array, Dynamic, NativeCallContext};

/// Registers the `Table` type's methods.
pub(crate) fn register(reg: &mut Registrar) {
    reg.section("tables", "results as data: exports and columns");
    reg.engine.register_type_with_name::<Table>("Table");
    reg.engine.register_fn("to_csv", |t: &mut Table| t.to_csv());
    reg.doc(FnDoc::new(
        "to_csv(table: Table) -> string",
        "The table as CSV text; headers carry units (`carry_m`), numbers keep full precision.",
        "compare_mass([a, b]).to_csv()",
    ));
    reg.engine.register_fn("to_json", |t: &mut Table| t.to_json());
    reg.doc(FnDoc::new(
        "to_json(table: Table) -> string",
        "The table as JSON text (title, columns with units, rows, notes).",
        "compare_mass([a, b]).to_json()",
    ));
    reg.engine.register_fn("column", column);
    reg.doc(FnDoc::new(
        "column(table: Table, name: string) -> array",
        "The values of one column, top to bottom (numbers in the column's unit, or texts).",
        "compare_mass([a, b]).column(\"I_z\")",
    ));
    reg.getter("Table", "title", "the table's title", |t: &mut Table| t.title.clone());
    reg.getter("Table", "row_count", "number of rows", |t: &mut Table| t.rows.len() as rhai::INT);
    reg.getter("Table", "notes", "notes under the table (warnings, sources, cautions)", |t: &mut Table| -> Array {
        t.notes.iter().cloned().map(Dynamic::from).collect()
    });
    reg.text(|t: &mut Table| t.to_text());
}

fn column(ctx: NativeCallContext, table: &mut Table, name: &str) -> Fallible<Array> {
    let Some(index) = table.columns.iter().position(|c| c.name == name) else {
        let names: Vec<&str> = table.columns.iter().map(|c| c.name.as_str()).collect();
        return Err(value_error(&ctx, format!("no column '{name}'; columns: {}", names.join(", "))));
    };
    Ok((0..table.rows.len())
        .map(|row| match table.cell(row, index) {
            Cell::Number(x) => Dynamic::from_float(*x),
            Cell::Count(n) => Dynamic::from_float(*n as f64),
            Cell::Text(t) => Dynamic::from(t.clone()),
            Cell::Empty => Dynamic::UNIT,
        })
        .collect())
}
