//! Bad input: each a typed error naming the value and the allowed range; nothing panics.
use super::support::*;
use spinfoil_engine::*;

fn pts(coords: &[(f64, f64)]) -> Vec<RzPoint> {
    coords.iter().map(|&(r, z)| RzPoint::new(r, z)).collect()
}

#[test]
fn zero_negative_and_nan_densities_are_rejected() {
    for density in [0.0, 0.5, -950.0, f64::NAN, f64::INFINITY, 30_001.0] {
        let err = Material::from_kg_m3("base blend", density).expect_err("bad density");
        assert!(matches!(err, LayupError::DensityOutOfRange { .. }), "{err:?}");
        let text = err.to_string();
        assert!(text.contains("base blend") && text.contains("30000"), "{text}");
    }
    // A density smuggled in through a struct literal is caught when used.
    let bad = Layup::single(Material { name: "x".into(), density_kg_m3: -1.0 });
    let err = mass_breakdown(&rectangle(0.0, 0.1, 0.0, 0.01), &bad).expect_err("negative density");
    assert!(matches!(err, MassError::Layup(LayupError::DensityOutOfRange { .. })), "{err:?}");
}

#[test]
fn self_intersecting_outline_is_rejected() {
    let err = Outline::from_points(pts(&[(0.0, 0.0), (0.1, 0.01), (0.1, 0.0), (0.0, 0.01)])).expect_err("bow tie");
    assert!(matches!(err, GeometryError::SelfIntersecting { .. }), "{err:?}");
}

#[test]
fn zero_area_and_too_few_points_are_rejected() {
    let err = Outline::from_points(pts(&[(0.0, 0.0), (0.05, 0.0), (0.1, 0.0)])).expect_err("collinear");
    assert!(matches!(err, GeometryError::ZeroArea { .. }), "{err:?}");
    let err = Outline::from_points(pts(&[(0.0, 0.0), (0.1, 0.0), (0.0, 0.0)])).expect_err("two points");
    assert!(matches!(err, GeometryError::TooFewPoints { count: 2 }), "{err:?}");
}

#[test]
fn nan_anywhere_is_rejected() {
    let err = Outline::from_points(pts(&[(0.0, 0.0), (f64::NAN, 0.0), (0.1, 0.01)])).expect_err("NaN point");
    assert!(matches!(err, GeometryError::NotFinite { index: 1, .. }), "{err:?}");
    let nan_dim = ParametricOutline::new(DiscFamily::Putter).with(Dimension::DomeHeight, f64::NAN);
    let err = nan_dim.build(&SamplingSettings::default()).expect_err("NaN dimension");
    assert!(matches!(err, GeometryError::DimensionNotFinite { dimension: Dimension::DomeHeight, .. }), "{err:?}");
    let err = SamplingSettings::with_tolerance(f64::NAN).expect_err("NaN tolerance");
    assert!(matches!(err, GeometryError::ToleranceOutOfRange { .. }), "{err:?}");
    let outline = rectangle(0.0, 0.1, 0.0, 0.01);
    let err = mass_breakdown(&outline, &Layup::overmold(material("a", 1.0), material("b", 1.0), f64::NAN)).expect_err("NaN split");
    assert!(matches!(err, MassError::Layup(LayupError::SplitRadiusOutOfRange { .. })), "{err:?}");
    let nan_bounds = Region::bounded("r", material("a", 1.0), RegionBounds::radial(Some(f64::NAN), None));
    let err = mass_breakdown(&outline, &Layup::Regions { regions: vec![nan_bounds] }).expect_err("NaN bound");
    assert!(matches!(err, MassError::Layup(LayupError::BadBounds { .. })), "{err:?}");
    let design = DiscDesign::new("d", ParametricOutline::new(DiscFamily::Driver), Layup::single(material("a", 1000.0)))
        .with_target(MassTarget::ScaleDensities { mass_kg: f64::NAN });
    assert!(matches!(design.evaluate(), Err(MassError::TargetOutOfRange { .. })));
}

#[test]
fn coordinates_beyond_any_disc_are_rejected() {
    let err = Outline::from_points(pts(&[(0.0, 0.0), (1e200, 0.0), (0.1, 0.01)])).expect_err("huge");
    assert!(matches!(err, GeometryError::CoordinateOutOfRange { index: 1, .. }), "{err:?}");
}

#[test]
fn negative_radius_is_rejected() {
    let err = Outline::from_points(pts(&[(-0.01, 0.0), (0.1, 0.0), (0.1, 0.01)])).expect_err("r < 0");
    assert!(matches!(err, GeometryError::NegativeRadius { index: 0, .. }), "{err:?}");
}

#[test]
fn dimensions_are_checked_against_each_other() {
    let s = SamplingSettings::default();
    let cases = [
        (Dimension::RimWidth, 0.2, "rim width"),
        (Dimension::PlateThickness, 0.02, "plate thickness"),
        (Dimension::LeadingEdgeRadius, 0.005, "leading-edge radius"),
    ];
    for (dimension, value, name) in cases {
        let err = ParametricOutline::new(DiscFamily::Driver).with(dimension, value).build(&s).expect_err(name);
        let GeometryError::DimensionOutOfRange { dimension: got, value_m, min_m, max_m } = err.clone() else {
            panic!("{name}: {err:?}");
        };
        assert_eq!((got, value_m), (dimension, value));
        assert!(value_m > max_m && min_m <= max_m, "{err}");
        assert!(err.to_string().contains(name), "{err}");
    }
    // Leading-edge radius over half the rim thickness (7.5 mm nose): allowed up to 3.75 mm.
    let p = ParametricOutline::new(DiscFamily::Driver).with(Dimension::LeadingEdgeRadius, 0.005);
    assert_eq!(p.allowed_range_m(Dimension::LeadingEdgeRadius).1, 0.0075 / 2.0);
}

fn two_regions(a: RegionBounds, b: RegionBounds) -> Layup {
    Layup::Regions {
        regions: vec![Region::bounded("plate", material("a", 900.0), a), Region::bounded("rim", material("b", 1300.0), b)],
    }
}

#[test]
fn overlapping_regions_are_rejected_with_their_names_and_area() {
    // Plate to r = 0.09, rim from r = 0.08 on: they share a 10 mm × 10 mm band = 100 mm².
    let outline = rectangle(0.0, 0.1, 0.0, 0.01);
    let layup = two_regions(RegionBounds::radial(None, Some(0.09)), RegionBounds::radial(Some(0.08), None));
    let err = mass_breakdown(&outline, &layup).expect_err("overlap");
    let MassError::Layup(LayupError::Overlap { first, second, overlap_mm2 }) = err else { panic!("{err:?}") };
    assert_eq!((first.as_str(), second.as_str()), ("plate", "rim"));
    assert_rel(overlap_mm2, 100.0, 1e-9, "overlap area");
}

#[test]
fn gaps_between_regions_are_rejected_with_the_uncovered_area() {
    let outline = rectangle(0.0, 0.1, 0.0, 0.01);
    let layup = two_regions(RegionBounds::radial(None, Some(0.08)), RegionBounds::radial(Some(0.09), None));
    let err = mass_breakdown(&outline, &layup).expect_err("gap");
    let MassError::Layup(LayupError::Gap { uncovered_mm2, .. }) = err else { panic!("{err:?}") };
    assert_rel(uncovered_mm2, 100.0, 1e-9, "gap area");
    let outside = two_regions(RegionBounds::everything(), RegionBounds::radial(Some(0.2), None));
    let err = mass_breakdown(&outline, &outside).expect_err("empty region");
    assert!(matches!(err, MassError::Layup(LayupError::EmptyRegion { .. })), "{err:?}");
    let nothing_left = Layup::Regions {
        regions: vec![Region::bounded("all", material("a", 900.0), RegionBounds::everything()), Region::rest("rest", material("b", 900.0))],
    };
    let err = mass_breakdown(&outline, &nothing_left).expect_err("empty rest");
    assert!(matches!(err, MassError::Layup(LayupError::EmptyRegion { ref region, .. }) if region == "rest"), "{err:?}");
    let two_rests = Layup::Regions { regions: vec![Region::rest("a", material("a", 900.0)), Region::rest("b", material("b", 900.0))] };
    let err = mass_breakdown(&outline, &two_rests).expect_err("two rests");
    assert!(matches!(err, MassError::Layup(LayupError::SeveralRests { .. })), "{err:?}");
}

#[test]
fn impossible_target_mass_is_rejected_with_the_reachable_range() {
    let design = DiscDesign::new("d", ParametricOutline::new(DiscFamily::Driver), Layup::single(material("a", 950.0)))
        .with_target(MassTarget::SolveDimension { mass_kg: 0.05, dimension: Dimension::PlateThickness });
    let err = design.evaluate().expect_err("unreachable");
    let MassError::UnreachableTarget { reachable_min_kg, reachable_max_kg, .. } = err.clone() else { panic!("{err:?}") };
    assert!(reachable_min_kg > 0.05 && reachable_max_kg > reachable_min_kg, "{err}");
    assert!(err.to_string().contains("50.00 g"), "{err}");
    let points = DiscDesign::new("p", rectangle(0.0, 0.1, 0.0, 0.01), Layup::single(material("a", 950.0)))
        .with_target(MassTarget::SolveDimension { mass_kg: 0.17, dimension: Dimension::PlateThickness });
    assert!(matches!(points.evaluate(), Err(MassError::NotParametric { .. })));
    for bad in [0.0, -0.1, 11.0] {
        let d = design.clone().with_target(MassTarget::ScaleDensities { mass_kg: bad });
        assert!(matches!(d.evaluate(), Err(MassError::TargetOutOfRange { .. })), "{bad}");
    }
}

#[test]
fn bad_mesh_segments_are_rejected() {
    let outline = rectangle(0.0, 0.1, 0.0, 0.01);
    for segments in [0, 2, MAX_SEGMENTS + 1] {
        let err = TriangleMesh::of_outline(&outline, segments).expect_err("segments");
        assert!(matches!(err, MeshError::SegmentsOutOfRange { .. }), "{err:?}");
    }
}

#[test]
fn oversized_region_polygon_is_rejected() {
    let many: Vec<RzPoint> = (0..=MAX_REGION_POINTS)
        .map(|k| {
            let t = std::f64::consts::TAU * k as f64 / (MAX_REGION_POINTS + 1) as f64;
            RzPoint::new(0.05 + 0.01 * t.cos(), 0.005 + 0.004 * t.sin())
        })
        .collect();
    let layup = Layup::embedded_insert(material("a", 900.0), material("b", 1300.0), many);
    let err = mass_breakdown(&rectangle(0.0, 0.1, 0.0, 0.01), &layup).expect_err("too many points");
    assert!(matches!(err, MassError::Layup(LayupError::BadRegionPolygon { source: GeometryError::TooManyPoints { .. }, .. })), "{err:?}");
}
