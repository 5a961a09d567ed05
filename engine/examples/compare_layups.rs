//! A mass-property study of two invented prototypes from the (invented) Fernbrook Moulding
//! Works: the "Kestrel Line" driver outline (21.1 cm) as a one-piece disc in a base blend and
//! as a rim-heavy overmold with a dense rim blend in the outer 8 mm of the rim, both brought
//! to 172 g by scaling their densities. A third row meets 172 g with the one-piece's nominal
//! density by solving for the flight-plate thickness instead. Prints aligned tables with units, the ratio of spin moments
//! of inertia, how each target was met, and the standard's warnings.
//!
//! Run: `cargo run --release -p spinfoil-engine --example compare_layups`
use spinfoil_engine::*;
use std::process::ExitCode;

const TARGET_KG: f64 = 0.172;

fn main() -> ExitCode {
    match run() {
        Ok(()) => ExitCode::SUCCESS,
        Err(error) => {
            eprintln!("error: {error}");
            ExitCode::FAILURE
        }
    }
}

fn designs() -> Result<Vec<DiscDesign>, MassError> {
    let outline = ParametricOutline::new(DiscFamily::Driver);
    let base = Material::from_g_cm3("base blend", 0.95)?;
    let dense = Material::from_g_cm3("dense rim blend", 1.28)?;
    let split_m = outline.diameter_m / 2.0 - 0.008; // dense blend in the outer 8 mm
    let overmold = Layup::overmold(base.clone(), dense, split_m);
    let scale = MassTarget::ScaleDensities { mass_kg: TARGET_KG };
    let solve = MassTarget::SolveDimension { mass_kg: TARGET_KG, dimension: Dimension::PlateThickness };
    Ok(vec![
        DiscDesign::new("Kestrel one-piece", outline, Layup::single(base.clone())).with_target(scale),
        DiscDesign::new("Kestrel overmold", outline, overmold).with_target(scale),
        DiscDesign::new("Kestrel plate-solved", outline, Layup::single(base)).with_target(solve),
    ])
}

fn run() -> Result<(), MassError> {
    let reports: Vec<DesignReport> = designs()?.iter().map(DiscDesign::evaluate).collect::<Result<_, _>>()?;
    println!("Fernbrook Moulding Works: Kestrel Line driver prototypes (invented scenario)");
    println!("Outline: driver family, diameter 21.1 cm; target mass {:.1} g\n", TARGET_KG * 1e3);
    print_properties(&reports);
    print_regions(&reports);
    print_ratio(&reports);
    print_targets(&reports);
    print_standard(&reports);
    Ok(())
}

fn print_properties(reports: &[DesignReport]) {
    println!("Mass properties (about the centre of mass; z up from the rim bottom)");
    println!(
        "{:<24} {:>8} {:>9} {:>11} {:>11} {:>8} {:>8} {:>7}",
        "design", "mass g", "CG z mm", "I_z g·cm²", "I_x g·cm²", "k_z mm", "k_x mm", "I_z/I_x"
    );
    for r in reports {
        let p = &r.properties;
        println!(
            "{:<24} {:>8.2} {:>9.3} {:>11.1} {:>11.1} {:>8.2} {:>8.2} {:>7.3}",
            r.name,
            p.mass_kg * 1e3,
            p.cg_height_m * 1e3,
            p.spin_inertia_kg_m2 * 1e7,
            p.transverse_inertia_kg_m2 * 1e7,
            p.spin_radius_of_gyration_m() * 1e3,
            p.transverse_radius_of_gyration_m() * 1e3,
            p.spin_inertia_kg_m2 / p.transverse_inertia_kg_m2
        );
    }
    println!();
}

fn print_regions(reports: &[DesignReport]) {
    println!("Regions");
    println!(
        "{:<24} {:<7} {:<16} {:>8} {:>8} {:>8} {:>7}",
        "design", "region", "material", "ρ g/cm³", "mass g", "mass %", "I_z %"
    );
    for r in reports {
        for s in &r.regions {
            println!(
                "{:<24} {:<7} {:<16} {:>8.4} {:>8.2} {:>8.1} {:>7.1}",
                r.name,
                s.name,
                s.material,
                s.density_kg_m3 / 1e3,
                s.mass_kg * 1e3,
                s.mass_fraction * 100.0,
                s.spin_inertia_fraction * 100.0
            );
        }
    }
    println!();
}

fn print_ratio(reports: &[DesignReport]) {
    if let [one, over, ..] = reports {
        let ratio = over.properties.spin_inertia_kg_m2 / one.properties.spin_inertia_kg_m2;
        println!(
            "I_z ratio, {} / {}: {:.4} ({:+.2} %) at the same mass and outline\n",
            over.name,
            one.name,
            ratio,
            (ratio - 1.0) * 100.0
        );
    }
}

fn print_targets(reports: &[DesignReport]) {
    println!("How the target mass was met");
    for r in reports {
        let how = match r.target {
            TargetOutcome::AsDesigned => "no target; mass as designed".to_string(),
            TargetOutcome::DensitiesScaled { designed_mass_kg, factor } => format!(
                "densities × {factor:.4} (designed mass {:.2} g)",
                designed_mass_kg * 1e3
            ),
            TargetOutcome::DimensionSolved { dimension, designed_m, solved_m, designed_mass_kg } => format!(
                "{dimension} {:.3} mm → {:.3} mm (designed mass {:.2} g)",
                designed_m * 1e3,
                solved_m * 1e3,
                designed_mass_kg * 1e3
            ),
        };
        println!("  {:<24} {how}", r.name);
    }
    println!();
}

fn print_standard(reports: &[DesignReport]) {
    println!("Technical standard (checks are warnings, never errors; limits from memory, unverified)");
    print!("{:<48} {:>10}", "rule", "limit");
    for r in reports {
        print!(" {:>16}", short_label(&r.name));
    }
    println!();
    for (row, check) in reports[0].standard.iter().enumerate() {
        print!("{:<48} {:>10}", check.title, format!("{:.2} {}", check.limit, short_unit(&check.unit)));
        for r in reports {
            let c = &r.standard[row];
            let flag = if c.passed { "" } else { " !" };
            print!(" {:>16}", format!("{:.2} ({:+.2}){flag}", c.value, c.margin));
        }
        println!();
    }
    println!("values (margin inside the limit) in the limit's unit; ! marks a failed rule");
    for r in reports {
        for w in r.warnings() {
            println!("WARNING {}: {w}", r.name);
        }
    }
    let mut sources: Vec<&str> = reports[0].standard.iter().map(|c| c.source.as_str()).collect();
    sources.sort_unstable();
    sources.dedup();
    for source in sources {
        println!("source: {source}");
    }
}

fn short_label(name: &str) -> &str {
    name.strip_prefix("Kestrel ").unwrap_or(name)
}

fn short_unit(unit: &str) -> &str {
    if unit == "% of diameter" { "%" } else { unit }
}
