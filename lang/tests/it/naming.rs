//! A flight's name: the disc's name by default, set by `f.name = ...` or `named(f, ...)`, and
//! carried into tables, exports and chart legends.
use spinfoil_lang::{CellError, CollectedOutput, Session, SessionSettings};
use std::sync::Arc;

const PRELUDE: &str = r#"
let plate = material("soft base blend", 0.95);
let d = disc("P-7", driver_outline(#{ diameter_cm: 21.1 }), single_layup(plate), #{ mass_g: 172 });
let f = fly(d, throw_release(#{ speed_mps: 20, spin_rpm: 850, launch_deg: 8 }));
"#;

fn session() -> Session {
    let mut session = Session::new(SessionSettings::default());
    session.eval(PRELUDE, Arc::new(CollectedOutput::default())).expect("prelude runs");
    session
}

fn text(session: &mut Session, code: &str) -> String {
    let value = session.eval(code, Arc::new(CollectedOutput::default())).unwrap_or_else(|e| panic!("{code}: {e}"));
    value.and_then(|b| b.text_plain().map(str::to_string)).unwrap_or_default()
}

fn error(session: &mut Session, code: &str) -> CellError {
    session.eval(code, Arc::new(CollectedOutput::default())).expect_err(code)
}

#[test]
fn a_flight_is_named_after_its_disc_until_the_script_names_it() {
    let mut s = session();
    assert_eq!(text(&mut s, "f.name"), "P-7");
    assert_eq!(text(&mut s, "f.name = \"P-7, flat\"; f.name"), "P-7, flat");
    assert!(text(&mut s, "`${f}`").contains("flight of \"P-7, flat\""));
    // named() gives a renamed copy; the original keeps its name.
    assert_eq!(text(&mut s, "let g = f.named(\"  slow one \"); [g.name, f.name]"), "[\"slow one\", \"P-7, flat\"]");
    assert_eq!(text(&mut s, "g.carry_m == f.carry_m"), "true");
}

#[test]
fn tables_exports_and_legends_show_the_name() {
    let mut s = session();
    text(&mut s, "let a = f.named(\"hyzer 15°\"); let b = f; b.name = \"flat, 20 m/s\";");
    let table = text(&mut s, "compare([a, b])");
    assert!(table.contains("\nhyzer 15°") && table.contains("\nflat, 20 m/s"), "{table}");
    let csv = text(&mut s, "compare([a, b]).to_csv()");
    assert!(csv.contains("\"flat, 20 m/s\""), "{csv}");
    assert!(text(&mut s, "trajectory(a)").starts_with("Trajectory of hyzer 15°"));
    for chart in ["plan_view", "side_view", "time_series", "wobble_view"] {
        let svg = text(&mut s, &format!("{chart}([a, b]).to_svg()"));
        assert!(svg.contains("hyzer 15°") && svg.contains("flat, 20 m/s"), "{chart} legend lacks the names");
    }
}

#[test]
fn names_that_would_spoil_a_table_or_legend_are_refused() {
    let mut s = session();
    let e = error(&mut s, "f.name = \"   \";");
    assert_eq!((e.kind.as_str(), e.line), ("ValueError", Some(1)));
    assert_eq!(e.message, "Flight.name: the name is empty; give the label to show in tables and charts");
    let e = error(&mut s, "f.named(\"two\\nlines\")");
    assert_eq!(e.message, "named: the name holds a line break or another control character; give one line of text");
    let e = error(&mut s, "let long = \"x\"; long.pad(201, \"x\"); f.named(long)");
    assert!(e.message.contains("has 201 characters; at most 200"), "{}", e.message);
    assert_eq!(text(&mut s, "f.name"), "P-7", "a refused name leaves the old one");
    assert!(text(&mut s, "help(\"named\")").contains("named(flight: Flight, name: string) -> Flight"));
}
