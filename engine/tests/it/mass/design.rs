//! Designs: layups compared at the same mass, target masses, region shares, standard checks.
use super::support::*;
use spinfoil_engine::*;

fn driver() -> ParametricOutline {
    ParametricOutline::new(DiscFamily::Driver)
}

fn overmold(split_m: f64) -> Layup {
    Layup::overmold(material("base blend", 950.0), material("dense rim blend", 1280.0), split_m)
}

#[test]
fn rim_heavy_overmold_has_larger_spin_inertia_at_the_same_mass() {
    // For the same outline and mass, denser material at larger radius raises I_z.
    // source: common practice, no published source (follows from I_z = ∫ρ r² dV).
    let target = MassTarget::ScaleDensities { mass_kg: 0.172 };
    let one = DiscDesign::new("one", driver(), Layup::single(material("base blend", 950.0))).with_target(target);
    let two = DiscDesign::new("two", driver(), overmold(0.0975)).with_target(target);
    let (one, two) = (one.evaluate().expect("one-piece"), two.evaluate().expect("overmold"));
    assert_rel(one.properties.mass_kg, 0.172, 1e-12, "one-piece mass");
    assert_rel(two.properties.mass_kg, 0.172, 1e-12, "overmold mass");
    let gain = two.properties.spin_inertia_kg_m2 / one.properties.spin_inertia_kg_m2 - 1.0;
    println!("rim-heavy overmold I_z is {:+.2} % of the one-piece's at 172 g", gain * 100.0);
    assert!(gain > 0.01, "overmold I_z gain {gain}");
    let shares: f64 = two.regions.iter().map(|r| r.spin_inertia_fraction).sum();
    assert_rel(shares, 1.0, 1e-12, "I_z shares add up");
}

#[test]
fn overmold_of_one_material_equals_single_material() {
    // Splitting a body into regions of the same density changes nothing.
    // source: common practice, no published source (additivity of integrals).
    let outline = driver().build(&SamplingSettings::default()).expect("driver");
    let same = Layup::overmold(material("a", 1100.0), material("a", 1100.0), 0.09);
    let ring = Layup::insert_ring(material("a", 1100.0), material("a", 1100.0), 0.07, 0.095);
    let reference = single(&outline, 1100.0);
    for layup in [same, ring] {
        let p = mass_breakdown(&outline, &layup).expect("fits").properties;
        assert_rel(p.mass_kg, reference.mass_kg, 1e-12, "mass");
        assert_rel(p.spin_inertia_kg_m2, reference.spin_inertia_kg_m2, 1e-12, "I_z");
        assert_rel(p.transverse_inertia_kg_m2, reference.transverse_inertia_kg_m2, 1e-10, "I_x");
    }
}

#[test]
fn polygon_region_around_the_rim_matches_the_same_split_by_bounds() {
    // A (non-convex) polygon region holding the rim beyond r = 0.09 m (its notch lies above the
    // disc) gives the same result as the bounds split at 0.09 m. source: common practice, no published source.
    let outline = driver().build(&SamplingSettings::default()).expect("driver");
    let rim_poly = vec![
        RzPoint::new(0.09, -0.01), RzPoint::new(0.2, -0.01), RzPoint::new(0.2, 0.05),
        RzPoint::new(0.09, 0.05), RzPoint::new(0.09, 0.04), RzPoint::new(0.095, 0.035), RzPoint::new(0.09, 0.03),
    ];
    let regions = vec![
        Region::bounded("plate", material("base", 950.0), RegionBounds::radial(None, Some(0.09))),
        Region::polygon("rim", material("dense", 1280.0), rim_poly),
    ];
    let by_polygon = mass_breakdown(&outline, &Layup::Regions { regions }).expect("covers");
    let by_bounds = mass_breakdown(&outline, &overmold(0.09)).expect("covers");
    assert_rel(by_polygon.properties.spin_inertia_kg_m2, by_bounds.properties.spin_inertia_kg_m2, 1e-12, "I_z");
    assert_rel(by_polygon.properties.mass_kg, by_bounds.properties.mass_kg, 1e-12, "mass");
}

#[test]
fn dense_insert_ring_raises_spin_inertia() {
    // source: common practice, no published source (I_z = ∫ρ r² dV).
    let outline = driver().build(&SamplingSettings::default()).expect("driver");
    let ring = Layup::insert_ring(material("base", 950.0), material("insert", 2700.0), 0.095, 0.1);
    let b = mass_breakdown(&outline, &ring).expect("fits");
    assert_eq!(b.regions.len(), 3);
    let insert = &b.regions[1];
    assert!(insert.spin_inertia_fraction > insert.mass_fraction, "ring carries more I_z than mass");
    assert!(b.properties.spin_inertia_kg_m2 > single(&outline, 950.0).spin_inertia_kg_m2);
}

#[test]
fn solving_plate_thickness_meets_the_target() {
    let design = DiscDesign::new("solve", driver(), Layup::single(material("base", 950.0)))
        .with_target(MassTarget::SolveDimension { mass_kg: 0.170, dimension: Dimension::PlateThickness });
    let report = design.evaluate().expect("reachable");
    assert_rel(report.properties.mass_kg, 0.170, 1e-9, "solved mass");
    let TargetOutcome::DimensionSolved { solved_m, designed_m, .. } = report.target else {
        panic!("expected a solved dimension, got {:?}", report.target);
    };
    assert!(solved_m > designed_m, "the default driver is lighter than 170 g at 0.95 g/cm³");
    assert_eq!(report.outline.declared().plate_thickness_m, Some(solved_m));
}

#[test]
fn density_scaling_reports_its_factor() {
    let design = DiscDesign::new("scale", driver(), Layup::single(material("base", 1000.0)))
        .with_target(MassTarget::ScaleDensities { mass_kg: 0.175 });
    let report = design.evaluate().expect("scales");
    let TargetOutcome::DensitiesScaled { factor, designed_mass_kg } = report.target else {
        panic!("expected scaled densities, got {:?}", report.target);
    };
    assert_rel(factor * designed_mass_kg, 0.175, 1e-12, "factor × designed mass");
    assert_rel(report.regions[0].density_kg_m3, 1000.0 * factor, 1e-12, "scaled density");
}

fn mass_check(outline: &Outline, mass_kg: f64) -> StandardCheck {
    let p = MassProperties { mass_kg, cg_height_m: 0.0, spin_inertia_kg_m2: 1e-3, transverse_inertia_kg_m2: 5e-4 };
    check_standard(outline, &p).into_iter().find(|c| c.rule == StandardRule::MassPerDiameter).expect("always checked")
}

#[test]
fn weight_rule_passes_175_g_and_flags_176_g_at_21_1_cm() {
    // 8.3 g/cm × 21.1 cm = 175.13 g.
    // source: PDGA Technical Standards (2002 revision); value from memory, unverified.
    let outline = driver().with(Dimension::Diameter, 0.211).build(&SamplingSettings::default()).expect("driver");
    let pass = mass_check(&outline, 0.175);
    assert!(pass.passed, "{pass}");
    assert_rel(pass.limit, 175.13, 1e-9, "limit in g");
    let fail = mass_check(&outline, 0.176);
    assert!(!fail.passed, "{fail}");
    assert_rel(fail.margin, 175.13 - 176.0, 1e-9, "margin in g");
    assert!(standard_warnings(&outline, &MassProperties { mass_kg: 0.176, cg_height_m: 0.0, spin_inertia_kg_m2: 1e-3, transverse_inertia_kg_m2: 5e-4 })
        .iter()
        .any(|w| w.rule == StandardRule::MassPerDiameter));
}

#[test]
fn shallow_rim_is_flagged() {
    // Inner rim depth at least 5 % of diameter: 10.0 mm on 211 mm is 4.74 %.
    // source: PDGA Technical Standards (2002 revision); value from memory, unverified.
    let shallow = driver().with(Dimension::RimDepth, 0.010);
    let report = DiscDesign::new("shallow", shallow, Layup::single(material("base", 950.0))).evaluate().expect("valid");
    let warning = report.warnings().into_iter().find(|w| w.rule == StandardRule::RimDepthRatio).cloned();
    let warning = warning.expect("rim depth flagged");
    assert_rel(warning.value, 10.0 / 211.0 * 100.0, 1e-9, "rim depth %");
    assert!(warning.margin < 0.0 && warning.source.contains("unverified"));
    let deep = DiscDesign::new("deep", driver(), Layup::single(material("base", 950.0))).evaluate().expect("valid");
    assert!(deep.warnings().iter().all(|w| w.rule != StandardRule::RimDepthRatio));
}

#[test]
fn outline_from_points_measures_its_rim() {
    // The measured rim of a sampled driver agrees with its parameters within the sampling step.
    // source: common practice, no published source.
    let p = driver();
    let built = p.build(&SamplingSettings::default()).expect("driver");
    let plain = Outline::from_points(built.points().to_vec()).expect("same points");
    assert!((plain.rim_width_m() - p.rim_width_m).abs() < 0.6e-3, "width {}", plain.rim_width_m());
    assert!((plain.rim_depth_m() - p.rim_depth_m).abs() < 0.6e-3, "depth {}", plain.rim_depth_m());
    assert!((plain.plate_thickness_m() - p.plate_thickness_m).abs() < 1e-6);
    assert_rel(plain.diameter_m(), 0.211, 1e-12, "diameter");
}

#[test]
fn every_family_builds_and_a_tighter_tolerance_converges() {
    // Chord sampling inscribes the curves: the error falls in proportion to the tolerance.
    // source: common practice, no published source (sagitta of a chord).
    for family in [DiscFamily::Putter, DiscFamily::Midrange, DiscFamily::Driver] {
        let p = ParametricOutline::new(family);
        let at = |tol: f64| single(&p.build(&SamplingSettings::with_tolerance(tol).expect("ok")).expect("builds"), 1000.0);
        let reference = at(1e-7).spin_inertia_kg_m2;
        let coarse = crate::common::rel_diff(at(1e-4).spin_inertia_kg_m2, reference);
        let default = crate::common::rel_diff(single(&family_outline(family), 1000.0).spin_inertia_kg_m2, reference);
        println!("{family:?}: I_z error {coarse:.2e} at 0.1 mm tolerance, {default:.2e} at the default");
        assert!(default < 1e-4 && default < coarse / 20.0, "{family:?}: {default} vs {coarse}");
    }
}
