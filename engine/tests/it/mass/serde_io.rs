//! Every input type round-trips through JSON and TOML.
use super::support::*;
use spinfoil_engine::*;
use serde::{de::DeserializeOwned, Serialize};
use std::fmt::Debug;

fn round_trip<T: Serialize + DeserializeOwned + PartialEq + Debug>(value: &T) {
    let json = serde_json::to_string(value).expect("to JSON");
    assert_eq!(&serde_json::from_str::<T>(&json).expect("from JSON"), value, "JSON: {json}");
    let toml_text = toml::to_string(value).expect("to TOML");
    assert_eq!(&toml::from_str::<T>(&toml_text).expect("from TOML"), value, "TOML: {toml_text}");
}

fn layups() -> Vec<Layup> {
    let base = material("base blend", 950.0);
    let poly = vec![RzPoint::new(0.09, -0.01), RzPoint::new(0.2, -0.01), RzPoint::new(0.2, 0.05), RzPoint::new(0.09, 0.05)];
    vec![
        Layup::single(base.clone()),
        Layup::overmold(base.clone(), material("dense rim blend", 1280.0), 0.0975),
        Layup::insert_ring(base.clone(), material("insert", 2700.0), 0.09, 0.095),
        Layup::embedded_insert(base.clone(), material("insert", 2700.0), vec![RzPoint::new(0.09, 0.003), RzPoint::new(0.095, 0.003), RzPoint::new(0.092, 0.006)]),
        Layup::Regions {
            regions: vec![
                Region::bounded("plate", base.clone(), RegionBounds::radial(None, Some(0.09))),
                Region::polygon("rim", base, poly),
            ],
        },
    ]
}

#[test]
fn materials_outlines_and_layups_round_trip() {
    round_trip(&material("base blend", 950.0));
    round_trip(&family_outline(DiscFamily::Putter));
    round_trip(&rectangle(0.0, 0.1, 0.0, 0.01));
    round_trip(&ParametricOutline::new(DiscFamily::Midrange));
    for layup in layups() {
        round_trip(&layup);
    }
}

#[test]
fn designs_round_trip_with_every_target() {
    let targets = [
        MassTarget::AsDesigned,
        MassTarget::ScaleDensities { mass_kg: 0.172 },
        MassTarget::SolveDimension { mass_kg: 0.172, dimension: Dimension::PlateThickness },
    ];
    for (target, layup) in targets.into_iter().zip(layups()) {
        let design = DiscDesign::new("Kestrel", ParametricOutline::new(DiscFamily::Driver), layup).with_target(target);
        round_trip(&design);
    }
    round_trip(&DiscDesign::new("puck", rectangle(0.0, 0.1, 0.0, 0.01), Layup::single(material("a", 1000.0))));
}

#[test]
fn a_short_toml_design_takes_family_defaults() {
    let text = r#"
        name = "Kestrel"
        [outline]
        kind = "parametric"
        family = "driver"
        plate_thickness_m = 0.002
        [layup]
        kind = "single"
        material = { name = "base blend", density_kg_m3 = 950.0 }
        [target]
        kind = "scale_densities"
        mass_kg = 0.172
    "#;
    let design: DiscDesign = toml::from_str(text).expect("parses");
    let expected = ParametricOutline::new(DiscFamily::Driver).with(Dimension::PlateThickness, 0.002);
    assert_eq!(design.outline, OutlineSource::Parametric(expected));
    assert_eq!(design.sampling, SamplingSettings::default());
    assert_rel(design.evaluate().expect("evaluates").properties.mass_kg, 0.172, 1e-12, "mass");
}

#[test]
fn invalid_outline_in_json_is_an_error_not_a_panic() {
    let json = r#"{"points":[{"r_m":0.0,"z_m":0.0},{"r_m":0.1,"z_m":0.01},{"r_m":0.1,"z_m":0.0},{"r_m":0.0,"z_m":0.01}]}"#;
    let err = serde_json::from_str::<Outline>(json).expect_err("bow tie");
    assert!(err.to_string().contains("intersects itself"), "{err}");
}
