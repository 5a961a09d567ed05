//! Comparisons of several discs or flights, as tables.
use super::args::{value_error, Fallible};
use super::discs::DiscValue;
use super::flights::{FlightValue, METRICS};
use crate::help::{FnDoc, Registrar};
use crate::{Cell, Table};
use rhai::{Array, NativeCallContext};

/// Registers `compare` (flights).
pub(crate) fn register_compare_flights(reg: &mut Registrar) {
    reg.engine.register_fn("compare", compare_flights);
    reg.engine.register_fn("compare", |f: FlightValue| flight_table(&[f]));
    reg.doc(FnDoc::new(
        "compare(flights: Flight or array of Flight) -> Table",
        "A table of flights side by side: release speed (m/s) and spin (rpm), carry, apex, turn and fade (m), time aloft (s), landing spin (rpm) and spin kept (%); with a ground in the environment also ground play and rest distance (m). Predictions are estimates (see the note under the table).",
        "compare([fly(a, arm, day), fly(b, arm, day)])",
    ));
}

fn compare_flights(ctx: NativeCallContext, items: Array) -> Fallible<Table> {
    let flights = items_of::<FlightValue>(&ctx, &items, "Flight")?;
    Ok(flight_table(&flights))
}

/// The columns of the flight comparison: (metric field, column name, unit, decimals).
const FLIGHT_COLUMNS: &[(&str, &str, &str, usize)] = &[
    ("release_speed_mps", "release speed", "m/s", 1),
    ("release_spin_rpm", "release spin", "rpm", 0),
    ("carry_m", "carry", "m", 1),
    ("apex_m", "apex", "m", 1),
    ("turn_m", "turn", "m", 1),
    ("fade_m", "fade", "m", 1),
    ("time_aloft_s", "time aloft", "s", 2),
    ("landing_spin_rpm", "landing spin", "rpm", 0),
    ("spin_kept_pct", "spin kept", "%", 0),
];

/// The comparison table of `flights` (also how a single flight renders).
pub(crate) fn flight_table(flights: &[FlightValue]) -> Table {
    let mut table = Table::new("Flights").column("design", "", 0);
    for (_, name, unit, decimals) in FLIGHT_COLUMNS {
        table = table.column(*name, *unit, *decimals);
    }
    let on_ground = flights.iter().any(|f| f.ground.is_some());
    if on_ground {
        table = table.column("ground play", "m", 1).column("rest distance", "m", 1);
    }
    for flight in flights {
        let mut row = vec![Cell::from(flight.label.as_str())];
        for (field, ..) in FLIGHT_COLUMNS {
            let get = METRICS.iter().find(|(f, ..)| f == field).map(|(_, _, g)| *g);
            row.push(get.map_or(Cell::Empty, |g| Cell::Number(g(flight))));
        }
        if on_ground {
            row.extend(ground_cells(flight));
        }
        table = table.row(row);
    }
    table.note(crate::SAFETY_CAUTION)
}

/// Ground play (m) and the distance from the release point to rest (m), or empty cells.
fn ground_cells(flight: &FlightValue) -> [Cell; 2] {
    match &flight.ground {
        Some(ground) => {
            let shift = ground.rest_position_m - flight.flight.release_state.position_m;
            [Cell::Number(ground.ground_play_m), Cell::Number(shift.x.hypot(shift.y))]
        }
        None => [Cell::Empty, Cell::Empty],
    }
}

/// Registers `compare_mass`.
pub(crate) fn register_compare_mass(reg: &mut Registrar) {
    reg.engine.register_fn("compare_mass", compare_mass);
    reg.doc(FnDoc::new(
        "compare_mass(discs: array of Disc) -> Table",
        "A table of mass properties side by side: mass (g), centre-of-mass height (mm), I_z and I_x (g·cm²), radii of gyration (mm), and I_z relative to the first disc (%). The standard's warnings are listed under the table.",
        "compare_mass([one_piece, rim_heavy])",
    ));
}

/// The items of a script array, each of type `T` (named `what` in errors); at least one.
pub(crate) fn items_of<T: rhai::Variant + Clone>(
    ctx: &NativeCallContext,
    items: &Array,
    what: &str,
) -> Fallible<Vec<T>> {
    if items.is_empty() {
        return Err(value_error(ctx, format!("give at least one {what} in the array, e.g. [a, b]")));
    }
    items
        .iter()
        .enumerate()
        .map(|(i, item)| {
            item.clone().try_cast::<T>().ok_or_else(|| {
                value_error(ctx, format!("item {i} is a {}, not a {what}", crate::errors::friendly_type(item)))
            })
        })
        .collect()
}

fn compare_mass(ctx: NativeCallContext, items: Array) -> Fallible<Table> {
    Ok(mass_table(&items_of::<DiscValue>(&ctx, &items, "Disc")?))
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
