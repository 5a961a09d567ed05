//! Random input never panics: it gives either a typed error or finite mass properties.
use super::support::*;
use proptest::prelude::*;
use spinfoil_engine::*;

fn finite(p: &MassProperties) -> bool {
    [p.mass_kg, p.cg_height_m, p.spin_inertia_kg_m2, p.transverse_inertia_kg_m2].iter().all(|v| v.is_finite())
}

proptest! {
    #![proptest_config(ProptestConfig { cases: 64, ..ProptestConfig::default() })]

    #[test]
    fn random_points_give_an_error_or_finite_properties(
        coords in prop::collection::vec((-0.02f64..0.15, -0.02f64..0.03), 0..12),
        split in -0.05f64..0.2,
    ) {
        let points = coords.iter().map(|&(r, z)| RzPoint::new(r, z)).collect();
        if let Ok(outline) = Outline::from_points(points) {
            prop_assert!(outline.area_m2() > 0.0);
            let layup = Layup::overmold(material("a", 900.0), material("b", 1300.0), split);
            if let Ok(b) = mass_breakdown(&outline, &layup) {
                prop_assert!(finite(&b.properties) && b.properties.mass_kg > 0.0);
                prop_assert!(b.properties.transverse_inertia_kg_m2 > 0.0);
            }
            let _ = TriangleMesh::of_outline(&outline, 8).map(|m| encode_stl_ascii(&m, "fuzz", StlUnit::Metre));
        }
    }

    #[test]
    fn random_dimensions_give_an_error_or_a_valid_disc(
        values in prop::collection::vec(-0.01f64..0.3, 8),
        family in prop::sample::select(vec![DiscFamily::Putter, DiscFamily::Midrange, DiscFamily::Driver]),
        scale in prop::sample::select(vec![0.0, 0.01, 0.1, 1.0]),
    ) {
        let mut p = ParametricOutline::new(family);
        for (dimension, value) in Dimension::ALL.into_iter().zip(values) {
            p = p.with(dimension, p.get(dimension) * (1.0 - scale) + value * scale);
        }
        if let Ok(outline) = p.build(&SamplingSettings::with_tolerance(1e-5).expect("ok")) {
            let b = mass_breakdown(&outline, &Layup::single(material("a", 1000.0)));
            prop_assert!(b.as_ref().map(|b| finite(&b.properties)).unwrap_or(false), "{:?}", b);
        }
    }
}
