//! Comparisons of several discs or flights, as tables.
use super::args::{value_error, Fallible};
use super::discs::DiscValue;
use crate::help::{FnDoc, Registrar};
use crate::{Cell, Table};
use rhai::{Array, NativeCallContext};

/// Registers `compare_mass`.
pub(crate) fn register_compare_mass(reg: &mut Registrar) {
    reg.engine.register_fn("compare_mass", compare_mass);
    reg.doc(FnDoc::new(
        "compare_mass(discs: array of Disc) -> Table",
        "A table of mass properties side by side: mass (g), centre-of-mass height (mm), I_z and I_x (g·cm²), radii of gyration (mm), and I_z relative to the first disc (%). The standard's warnings are listed under the table.",
        "compare_mass([one_piece, rim_heavy])",
    ));
}

fn discs_of(ctx: &NativeCallContext, items: &Array) -> Fallible<Vec<DiscValue>> {
    if items.is_empty() {
        return Err(value_error(ctx, "give at least one disc, e.g. compare_mass([a, b])".into()));
    }
    items
        .iter()
        .enumerate()
        .map(|(i, item)| item.clone().try_cast::<DiscValue>().ok_or_else(|| value_error(ctx, format!("item {i} is a {}, not a Disc", crate::errors::friendly_type(item)))))
        .collect()
}

fn compare_mass(ctx: NativeCallContext, items: Array) -> Fallible<Table> {
    Ok(mass_table(&discs_of(&ctx, &items)?))
}

/// The mass-property table of `discs` (also how a single disc renders).
pub(crate) fn mass_table(discs: &[DiscValue]) -> Table {
    let mut table = Table::new("Mass properties")
        .column("design", "", 0)
        .column("mass", "g", 1)
        .column("CG height", "mm", 2)
        .column("I_z", "g·cm²", 0)
        .column("I_x", "g·cm²", 0)
        .column("k_z", "mm", 1)
        .column("k_x", "mm", 1)
        .column("I_z vs first", "%", 1);
    let first_iz = discs[0].report.properties.spin_inertia_kg_m2;
    for disc in discs {
        let p = disc.report.properties;
        table = table.row(vec![
            Cell::from(disc.design.name.as_str()),
            (p.mass_kg * 1000.0).into(),
            (p.cg_height_m * 1000.0).into(),
            (p.spin_inertia_kg_m2 * 1e7).into(),
            (p.transverse_inertia_kg_m2 * 1e7).into(),
            (p.spin_radius_of_gyration_m() * 1000.0).into(),
            (p.transverse_radius_of_gyration_m() * 1000.0).into(),
            ((p.spin_inertia_kg_m2 / first_iz - 1.0) * 100.0).into(),
        ]);
        for warning in disc.warnings() {
            table = table.note(format!("{}: {warning}", disc.design.name));
        }
    }
    table
}
