//! Mass properties of random outlines and layups: positive, additive over regions, unchanged by
//! splitting a region in two of the same material, linear in density.
use proptest::prelude::*;
use spinfoil_engine::*;

fn material(name: &str, density_kg_m3: f64) -> Material {
    Material::from_kg_m3(name, density_kg_m3).expect("test density is in range")
}

/// Relative tolerance of sums of exact polygon integrals (rounding only).
const TOL: f64 = 1e-10;

fn close(a: f64, b: f64) -> bool {
    (a - b).abs() <= TOL * b.abs().max(1e-300)
}

/// A random outline of one family: every dimension somewhere in its allowed range (outlines
/// whose dimensions do not fit together are skipped).
fn outline(family: DiscFamily, fractions: &[f64]) -> Option<Outline> {
    let mut p = ParametricOutline::new(family);
    for (dimension, t) in Dimension::ALL.into_iter().zip(fractions) {
        let (lo, hi) = p.allowed_range_m(dimension);
        p = p.with(dimension, lo + (hi - lo) * t);
    }
    p.build(&SamplingSettings::default()).ok()
}

fn families() -> impl Strategy<Value = DiscFamily> {
    prop::sample::select(vec![DiscFamily::Putter, DiscFamily::Midrange, DiscFamily::Driver])
}

proptest! {
    #![proptest_config(super::config(64))]

    /// source: physics law: mass and moments of inertia are integrals of density over volume,
    /// so they are positive and add over disjoint regions; the transverse moment of a solid of
    /// revolution is at least half the axial one (I_x = ∫(r²/2 + z'²)dm ≥ I_z/2, perpendicular
    /// axis theorem, Goldstein, Poole & Safko (2002), Classical Mechanics 3rd ed., §5.3).
    #[test]
    fn mass_properties_are_positive_and_add_over_regions(
        family in families(),
        fractions in prop::collection::vec(0.05f64..0.95, 8),
        plate in 500.0f64..2500.0,
        rim in 500.0f64..2500.0,
        split in 0.3f64..0.98,
    ) {
        let outline = outline(family, &fractions);
        prop_assume!(outline.is_some(), "dimensions that do not fit together");
        let outline = outline.expect("checked");
        let layup = Layup::overmold(material("plate", plate), material("rim", rim), split * outline.outer_radius_m());
        let b = mass_breakdown(&outline, &layup);
        prop_assume!(b.is_ok(), "{:?}", b.as_ref().err());
        let b = b.expect("checked");
        let p = b.properties;
        prop_assert!(p.mass_kg > 0.0 && p.spin_inertia_kg_m2 > 0.0 && p.transverse_inertia_kg_m2 > 0.0, "{p:?}");
        prop_assert!(p.transverse_inertia_kg_m2 >= 0.5 * p.spin_inertia_kg_m2 * (1.0 - TOL), "{p:?}");
        prop_assert!(p.spin_inertia_kg_m2 <= p.mass_kg * outline.outer_radius_m().powi(2), "I_z ≤ m R²: {p:?}");
        for r in &b.regions {
            prop_assert!(r.mass_kg > 0.0 && r.spin_inertia_kg_m2 > 0.0 && r.volume_m3 > 0.0, "{r:?}");
        }
        let sum = |f: fn(&RegionShare) -> f64| b.regions.iter().map(f).sum::<f64>();
        prop_assert!(close(sum(|r| r.mass_kg), p.mass_kg));
        prop_assert!(close(sum(|r| r.spin_inertia_kg_m2), p.spin_inertia_kg_m2));
        prop_assert!(close(sum(|r| r.volume_m3), b.volume_m3));
        prop_assert!(close(sum(|r| r.mass_fraction), 1.0) && close(sum(|r| r.spin_inertia_fraction), 1.0));
    }

    /// source: physics law (additivity of volume integrals): splitting one material's region in
    /// two at any radius leaves every total unchanged; scaling every density by k scales mass
    /// and moments of inertia by k and leaves the centre of mass where it was.
    #[test]
    fn splitting_a_region_changes_nothing_and_density_scales_linearly(
        family in families(),
        fractions in prop::collection::vec(0.05f64..0.95, 8),
        density in 500.0f64..2500.0,
        split in 0.05f64..0.99,
        k in 0.2f64..5.0,
    ) {
        let outline = outline(family, &fractions);
        prop_assume!(outline.is_some(), "dimensions that do not fit together");
        let outline = outline.expect("checked");
        let whole = mass_breakdown(&outline, &Layup::single(material("a", density))).expect("single layup fits").properties;
        let layup = Layup::overmold(material("a", density), material("a", density), split * outline.outer_radius_m());
        if let Ok(two) = mass_breakdown(&outline, &layup) {
            let p = two.properties;
            prop_assert!(close(p.mass_kg, whole.mass_kg), "{} vs {}", p.mass_kg, whole.mass_kg);
            prop_assert!(close(p.spin_inertia_kg_m2, whole.spin_inertia_kg_m2));
            prop_assert!(close(p.transverse_inertia_kg_m2, whole.transverse_inertia_kg_m2));
            prop_assert!((p.cg_height_m - whole.cg_height_m).abs() <= 1e-12);
        }
        let scaled = mass_breakdown(&outline, &Layup::single(material("a", density)).scaled_densities(k)).expect("fits").properties;
        prop_assert!(close(scaled.mass_kg, k * whole.mass_kg));
        prop_assert!(close(scaled.spin_inertia_kg_m2, k * whole.spin_inertia_kg_m2));
        prop_assert!(close(scaled.transverse_inertia_kg_m2, k * whole.transverse_inertia_kg_m2));
        prop_assert!((scaled.cg_height_m - whole.cg_height_m).abs() <= 1e-12);
    }
}
