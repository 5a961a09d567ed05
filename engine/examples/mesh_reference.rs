//! Writes binary STL meshes of the default driver outline (one material, and a two-material
//! overmold as one mesh per region) and one coarser ASCII STL of the whole outline into the
//! folder given as the first argument, and prints
//! Spinfoil's own mass properties of the same designs as JSON, for the trimesh check in
//! `tests/test_mass_trimesh.py`. STL files are in millimetres.
//!
//! Run: `cargo run --release -p spinfoil-engine --example mesh_reference -- OUT_DIR [SEGMENTS]`
use serde_json::{json, Value};
use spinfoil_engine::*;
use std::path::{Path, PathBuf};
use std::process::ExitCode;

fn main() -> ExitCode {
    let mut args = std::env::args().skip(1);
    let Some(folder) = args.next().map(PathBuf::from) else {
        eprintln!("usage: mesh_reference OUT_DIR [SEGMENTS]");
        return ExitCode::FAILURE;
    };
    let segments = args.next().and_then(|s| s.parse().ok()).unwrap_or(720);
    match run(&folder, segments) {
        Ok(report) => {
            println!("{report}");
            ExitCode::SUCCESS
        }
        Err(error) => {
            eprintln!("error: {error}");
            ExitCode::FAILURE
        }
    }
}

fn run(folder: &Path, segments: usize) -> Result<Value, Box<dyn std::error::Error>> {
    std::fs::create_dir_all(folder)?;
    let outline = ParametricOutline::new(DiscFamily::Driver).build(&SamplingSettings::default())?;
    let base = Material::from_g_cm3("base blend", 0.95)?;
    let dense = Material::from_g_cm3("dense rim blend", 1.28)?;
    let single = Layup::single(base.clone());
    let overmold = Layup::overmold(base, dense, outline.outer_radius_m() - 0.008);
    let ascii = TriangleMesh::of_outline(&outline, ASCII_SEGMENTS)?;
    std::fs::write(folder.join(ASCII_FILE), encode_stl_ascii(&ascii, "driver single", StlUnit::Millimetre))?;
    Ok(json!({
        "ascii": { "file": ASCII_FILE, "segments": ASCII_SEGMENTS },
        "unit": "mm",
        "segments": segments,
        "single": design_json(folder, "driver_single", &outline, &single, segments)?,
        "overmold": design_json(folder, "driver_overmold", &outline, &overmold, segments)?,
    }))
}

/// A coarser ASCII mesh (ASCII STL is about five times larger than binary).
const ASCII_SEGMENTS: usize = 72;
const ASCII_FILE: &str = "driver_single_ascii.stl";

fn design_json(folder: &Path, stem: &str, outline: &Outline, layup: &Layup, segments: usize) -> Result<Value, Box<dyn std::error::Error>> {
    let regions = fill_outline(outline, layup)?;
    let mut parts = Vec::new();
    for region in &regions {
        let mesh = TriangleMesh::of_region(region, segments)?;
        let file = format!("{stem}_{}.stl", region.name.replace(' ', "_"));
        std::fs::write(folder.join(&file), encode_stl_binary(&mesh, stem, StlUnit::Millimetre))?;
        parts.push(json!({ "file": file, "region": region.name, "density_kg_m3": region.material.density_kg_m3 }));
    }
    let b = breakdown_of_regions(&regions);
    let p = b.properties;
    Ok(json!({
        "parts": parts,
        "volume_m3": b.volume_m3,
        "mass_kg": p.mass_kg,
        "cg_height_m": p.cg_height_m,
        "spin_inertia_kg_m2": p.spin_inertia_kg_m2,
        "transverse_inertia_kg_m2": p.transverse_inertia_kg_m2,
    }))
}
