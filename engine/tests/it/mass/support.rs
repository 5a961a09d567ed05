//! Builders shared by the mass tests.
use spinfoil_engine::*;

/// A material of `density_kg_m3`, or a panic naming the test input (tests only).
pub fn material(name: &str, density_kg_m3: f64) -> Material {
    Material::from_kg_m3(name, density_kg_m3).expect("test material is valid")
}

/// The rectangle [r0, r1] × [z0, z1] as an outline, m.
pub fn rectangle(r0: f64, r1: f64, z0: f64, z1: f64) -> Outline {
    let pts = vec![RzPoint::new(r0, z0), RzPoint::new(r1, z0), RzPoint::new(r1, z1), RzPoint::new(r0, z1)];
    Outline::from_points(pts).expect("test rectangle is valid")
}

/// Mass properties of an outline in one material.
pub fn single(outline: &Outline, density_kg_m3: f64) -> MassProperties {
    mass_breakdown(outline, &Layup::single(material("m", density_kg_m3)))
        .expect("single-material layup fits")
        .properties
}

/// The default outline of a family.
pub fn family_outline(family: DiscFamily) -> Outline {
    ParametricOutline::new(family).build(&SamplingSettings::default()).expect("family defaults are valid")
}

/// Asserts |actual − expected| ≤ tol · |expected|.
pub fn assert_rel(actual: f64, expected: f64, tol: f64, what: &str) {
    let rel = crate::common::rel_diff(actual, expected);
    assert!(rel <= tol, "{what}: {actual} vs {expected} (relative difference {rel:e} > {tol:e})");
}
