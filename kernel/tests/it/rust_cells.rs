//! Rust cells (`%%rust`): with the `rust-cells` feature they run through evcxr against the
//! engine; without it they fail with a clear `FeatureError`.
use serde_json::{json, Value};
use spinfoil_kernel::notebook::{run_notebook, Notebook, RunSettings, RunSummary};
use spinfoil_lang::SessionSettings;
use std::path::Path;

fn notebook(cells: &[&str]) -> Notebook {
    let cells: Vec<Value> = cells
        .iter()
        .map(|code| json!({"cell_type": "code", "source": code, "metadata": {}, "outputs": [], "execution_count": null}))
        .collect();
    Notebook::from_json(json!({"nbformat": 4, "nbformat_minor": 5, "metadata": {}, "cells": cells})).expect("a valid notebook")
}

fn run_in(folder: &Path, book: &mut Notebook) -> RunSummary {
    let session = SessionSettings { study_dir: Some(folder.to_path_buf()), ..SessionSettings::default() };
    run_notebook(book, &RunSettings { keep_going: true, session, ..RunSettings::default() })
}

/// All text a cell printed on one stream.
#[cfg(feature = "rust-cells")]
fn stream(book: &Notebook, cell: usize, name: &str) -> String {
    book.outputs(cell).iter().filter(|o| o["output_type"] == "stream" && o["name"] == name).filter_map(|o| o["text"].as_str()).collect()
}

fn result_text(book: &Notebook, cell: usize) -> String {
    let outputs = book.outputs(cell);
    let result = outputs.iter().find(|o| o["output_type"] == "execute_result");
    result.and_then(|r| r["data"]["text/plain"].as_str()).unwrap_or_else(|| panic!("cell {cell} has no result: {outputs:?}")).to_string()
}

#[cfg(not(feature = "rust-cells"))]
#[test]
fn without_the_feature_a_rust_cell_says_how_to_build_it() {
    let folder = crate::support::scratch("rust-cells-off");
    let mut book = notebook(&["%%rust\nlet x = 1;", "1 + 1"]);
    let summary = run_in(&folder, &mut book);
    assert_eq!(summary.errors.len(), 1);
    let (cell, report) = &summary.errors[0];
    assert_eq!((*cell, report.ename.as_str()), (0, "FeatureError"));
    assert!(report.evalue.contains("--features rust-cells"), "{}", report.evalue);
    assert_eq!(result_text(&book, 1), "2", "script cells still run");
}

#[cfg(feature = "rust-cells")]
const SCRIPT_DESIGN: &str = r#"let d = disc("Kestrel overmold", driver_outline(#{}),
    rim_layup(material("Quarry rim blend", 1.30), material("Tidewater foam core", 0.80), #{ split_radius_cm: 9.0 }),
    #{ mass_g: 170.0 });
save(d, "kestrel.json");
let f = fly(d, throw_release(#{ speed_mps: 24, spin_rpm: 900, launch_deg: 10, nose_deg: 1 }), environment());
f.carry_m"#;

/// Reads the script's design, flies it with the demo set and the same release, returns the carry.
#[cfg(feature = "rust-cells")]
const RUST_FLIGHT: &str = r#"%%rust
use spinfoil_engine::*;
let (design, aero) = study::load_disc_file("kestrel.json").expect("the script saved it");
let report = design.evaluate().expect("the design evaluates");
let body = DiscBody::from_mass_properties(&report.properties, report.outline.diameter_m());
let pose = ReleasePose { launch_rad: 10f64.to_radians(), nose_rad: 1f64.to_radians(), ..ReleasePose::default() };
let release = pose.with_speed_and_spin(24.0, 900.0 * std::f64::consts::TAU / 60.0);
let flight = fly(&body, &demo_driver(), &release, &FlightConditions::default(), &FlightSettings::default()).expect("it flies");
println!("aero set {aero}, {} samples", flight.samples.len());
flight.metrics.carry_m"#;

/// Writes a lighter copy of the design for the script to load.
#[cfg(feature = "rust-cells")]
const RUST_SAVE: &str = r#"%%rust
let lighter = design.clone().with_target(MassTarget::ScaleDensities { mass_kg: 0.160 });
study::save_design(&lighter, "demo_driver", "kestrel-160.json").expect("saved");
flight"#;

#[cfg(feature = "rust-cells")]
const SCRIPT_LOAD: &str = r#"let light = load_disc("kestrel-160.json");
light.mass_g"#;

#[cfg(feature = "rust-cells")]
const RUST_COMPILE_ERROR: &str = "%%rust\nlet a: f64 = 1.0;\nlet b: f64 = \"two\";\na + b";

#[cfg(feature = "rust-cells")]
#[test]
fn rust_cells_fly_the_scripts_design_show_results_and_name_the_lines_of_errors() {
    let folder = crate::support::scratch("rust-cells");
    let mut book = notebook(&[SCRIPT_DESIGN, RUST_FLIGHT, RUST_SAVE, SCRIPT_LOAD, RUST_COMPILE_ERROR, "%%rust\npanic!(\"on purpose\");", "%%rust\n2 + 3"]);
    let summary = run_in(&folder, &mut book);
    let errors: Vec<(usize, &str)> = summary.errors.iter().map(|(cell, r)| (*cell, r.ename.as_str())).collect();
    assert_eq!(errors, vec![(4, "CompileError"), (5, "RustPanic")], "{:#?}", summary.errors);

    // The carry crosses back as a number, and equals the script's flight of the same design.
    let script_carry: f64 = result_text(&book, 0).parse().expect("a number");
    let rust_carry: f64 = result_text(&book, 1).parse().expect("the Rust cell's carry is a number");
    println!("carry: script {script_carry} m, Rust cell {rust_carry} m");
    assert!((20.0..150.0).contains(&rust_carry), "{rust_carry}");
    assert!((rust_carry - script_carry).abs() < 1e-6 * script_carry, "script {script_carry} m, Rust {rust_carry} m");
    assert!(stream(&book, 1, "stdout").contains("aero set demo_driver"), "stdout streams: {:?}", book.outputs(1));

    // A flight shows as HTML (metrics table with units and its SVG path chart).
    let display = book.outputs(2).into_iter().find(|o| o["output_type"] == "display_data").expect("a display");
    let html = display["data"]["text/html"].as_str().expect("HTML");
    assert!(html.contains("carry") && html.contains("<svg") && html.contains("Keep clear of the throwing lane"));
    assert!(display["data"]["text/plain"].as_str().is_some_and(|t| t.contains("carry")));

    // The script reads the design the Rust cell wrote.
    let light_g: f64 = result_text(&book, 3).parse().expect("a mass");
    assert!((light_g - 160.0).abs() < 1e-6, "{light_g}");

    // The compile error names the cell's line 3 (the marker is line 1).
    let report = &summary.errors[0].1;
    assert!(report.evalue.contains("line 3"), "{}", report.evalue);
    assert!(report.traceback.iter().any(|l| l.contains("at line 3")), "{:?}", report.traceback);
    assert!(report.traceback.iter().any(|l| l.contains("let b: f64 = \"two\";")), "{:?}", report.traceback);

    // After a panic the context lives on.
    assert!(summary.errors[1].1.evalue.contains("on purpose"));
    assert_eq!(result_text(&book, 6), "5");
}
