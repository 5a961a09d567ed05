//! Integration tests: wind (logarithmic profile, direction convention, seeded gusts).
use nalgebra::Vector3;
use spinfoil_engine::*;

use crate::common::rel_diff;

fn at(height_m: f64) -> Vector3<f64> {
    Vector3::new(30.0, -2.0, height_m)
}

#[test]
fn profile_equals_the_reference_speed_at_the_reference_height() {
    // source: logarithmic wind law u(z) = u_ref ln(z/z0)/ln(z_ref/z0) (common practice)
    for terrain in Terrain::all() {
        for reference_height_m in [2.0, 10.0, 30.0] {
            let wind = WindSpec::new(6.0, 0.0)
                .over(terrain)
                .with_reference_height_m(reference_height_m)
                .build()
                .unwrap();
            assert!(rel_diff(wind.mean_speed_mps(reference_height_m), 6.0) < 1e-14, "{terrain:?}");
        }
    }
}

#[test]
fn profile_follows_the_log_law() {
    // source: logarithmic wind law of the neutral surface layer (common practice)
    let wind = WindSpec::new(8.0, 0.0).with_roughness_length_m(0.1).build().unwrap();
    let expected = 8.0 * (2.0_f64 / 0.1).ln() / (10.0_f64 / 0.1).ln();
    assert!(rel_diff(wind.mean_speed_mps(2.0), expected) < 1e-14);
}

#[test]
fn profile_is_zero_at_and_below_the_roughness_length() {
    let wind = WindSpec::new(8.0, 90.0).over(Terrain::WoodedEdge).build().unwrap();
    for height_m in [0.5, 0.3, 0.0, -1.0, f64::NAN] {
        assert_eq!(wind.velocity_mps(&at(height_m), 1.0), Vector3::zeros(), "z = {height_m}");
    }
}

#[test]
fn profile_increases_monotonically_with_height() {
    let wind = WindSpec::new(8.0, 0.0).over(Terrain::RoughField).build().unwrap();
    let speeds: Vec<f64> = (0..400).map(|i| wind.mean_speed_mps(0.1 + 0.05 * f64::from(i))).collect();
    assert!(speeds.windows(2).all(|pair| pair[1] > pair[0]));
}

#[test]
fn rougher_ground_slows_the_wind_near_the_ground() {
    // common practice, no published source: same 10 m speed, rougher surface, less wind at 2 m
    let speed_at_2_m =
        |terrain: Terrain| WindSpec::new(8.0, 0.0).over(terrain).build().unwrap().mean_speed_mps(2.0);
    assert!(speed_at_2_m(Terrain::OpenShortGrass) > speed_at_2_m(Terrain::RoughField));
    assert!(speed_at_2_m(Terrain::RoughField) > speed_at_2_m(Terrain::WoodedEdge));
}

#[test]
fn direction_zero_is_a_headwind() {
    let v = WindSpec::new(5.0, 0.0).build().unwrap().velocity_mps(&at(10.0), 0.0);
    assert!((v - Vector3::new(-5.0, 0.0, 0.0)).norm() < 1e-12, "{v}");
}

#[test]
fn direction_180_is_a_tailwind() {
    let v = WindSpec::new(5.0, 180.0).build().unwrap().velocity_mps(&at(10.0), 0.0);
    assert!((v - Vector3::new(5.0, 0.0, 0.0)).norm() < 1e-12, "{v}");
}

#[test]
fn direction_90_comes_from_the_left_and_blows_right() {
    // world frame: y is to the left, so a wind from the left moves toward −y
    let v = WindSpec::new(5.0, 90.0).build().unwrap().velocity_mps(&at(10.0), 0.0);
    assert!((v - Vector3::new(0.0, -5.0, 0.0)).norm() < 1e-12, "{v}");
    let from_right = WindSpec::new(5.0, 270.0).build().unwrap().velocity_mps(&at(10.0), 0.0);
    assert!((from_right - Vector3::new(0.0, 5.0, 0.0)).norm() < 1e-12, "{from_right}");
    let negative = WindSpec::new(5.0, -90.0).build().unwrap().velocity_mps(&at(10.0), 0.0);
    assert!((negative - from_right).norm() < 1e-12);
}

#[test]
fn compass_bearings_map_to_the_relative_direction() {
    // Throwing north (0°): a wind from the east (90°) comes from the right, 270° relative.
    assert_eq!(relative_from_deg(90.0, 0.0), 270.0);
    // Throwing east: a wind from the east is a headwind; from the north it comes from the left.
    assert_eq!(relative_from_deg(90.0, 90.0), 0.0);
    assert_eq!(relative_from_deg(0.0, 90.0), 90.0);
    assert_eq!(relative_from_deg(270.0, 90.0), 180.0);
}

#[test]
fn wind_is_horizontal_and_the_same_everywhere_at_one_height() {
    let wind = WindSpec::new(7.0, 33.0).with_gusts(GustSpec::seeded(4)).build().unwrap();
    let a = wind.velocity_mps(&Vector3::new(0.0, 0.0, 3.0), 2.0);
    let b = wind.velocity_mps(&Vector3::new(120.0, 40.0, 3.0), 2.0);
    assert_eq!(a, b);
    assert_eq!(a.z, 0.0);
}

fn gust_samples(seed: u64) -> Vec<Vector3<f64>> {
    let wind = WindSpec::new(6.0, 180.0).with_gusts(GustSpec::seeded(seed)).build().unwrap();
    (0..200).map(|i| wind.velocity_mps(&at(10.0), 0.05 * f64::from(i))).collect()
}

#[test]
fn gusts_are_deterministic_per_seed() {
    assert_eq!(gust_samples(17), gust_samples(17));
    let differs = gust_samples(17).iter().zip(gust_samples(18)).any(|(a, b)| (a - b).norm() > 0.05);
    assert!(differs, "different seeds should give different gusts");
    assert!(
        gust_samples(17).iter().any(|v| (v - Vector3::new(6.0, 0.0, 0.0)).norm() > 0.1),
        "gusts vary the wind"
    );
}

#[test]
fn gusts_have_the_mean_wind_and_the_documented_intensity() {
    // common practice, no published source: a zero-mean, unit-RMS sum of sinusoids scaled by
    // the turbulence intensity has the mean wind as its long-time mean and σ_u = I·ū.
    let spec = GustSpec { intensity: 0.2, lateral_ratio: 0.75, seed: 9 };
    let wind = WindSpec::new(6.0, 180.0).with_gusts(spec).build().unwrap();
    let samples: Vec<Vector3<f64>> =
        (0..200_000).map(|i| wind.velocity_mps(&at(10.0), 0.1 * f64::from(i))).collect();
    let count = samples.len() as f64;
    let mean = samples.iter().sum::<Vector3<f64>>() / count;
    assert!((mean - Vector3::new(6.0, 0.0, 0.0)).norm() < 0.02 * 6.0, "mean {mean}");
    let sigma_u = (samples.iter().map(|v| (v.x - mean.x).powi(2)).sum::<f64>() / count).sqrt();
    let sigma_v = (samples.iter().map(|v| (v.y - mean.y).powi(2)).sum::<f64>() / count).sqrt();
    assert!(rel_diff(sigma_u, 0.2 * 6.0) < 0.05, "σ_u {sigma_u}");
    assert!(rel_diff(sigma_v, 0.75 * 0.2 * 6.0) < 0.05, "σ_v {sigma_v}");
    let peak = wind.peak_speed_mps(10.0);
    assert!(samples.iter().all(|v| v.norm() <= peak + 1e-12), "bounded by {peak}");
}

#[test]
fn gusts_scale_with_the_local_mean_speed() {
    let wind = WindSpec::new(6.0, 0.0).with_gusts(GustSpec::seeded(3)).build().unwrap();
    let (low, high) = (wind.velocity_mps(&at(2.0), 7.5), wind.velocity_mps(&at(10.0), 7.5));
    let ratio = wind.mean_speed_mps(2.0) / wind.mean_speed_mps(10.0);
    assert!((low - high * ratio).norm() < 1e-12);
}

#[test]
fn bad_wind_settings_name_field_value_and_range() {
    let cases = [
        (WindSpec::new(-1.0, 0.0), "speed_mps"),
        (WindSpec::new(f64::NAN, 0.0), "speed_mps"),
        (WindSpec::new(5.0, 400.0), "from_deg"),
        (WindSpec::new(5.0, f64::INFINITY), "from_deg"),
        (WindSpec::new(5.0, 0.0).with_roughness_length_m(0.0), "roughness_length_m"),
        (WindSpec::new(5.0, 0.0).with_reference_height_m(0.1), "reference_height_m"),
        (
            WindSpec::new(5.0, 0.0).with_gusts(GustSpec { intensity: 0.9, lateral_ratio: 0.75, seed: 1 }),
            "gusts.intensity",
        ),
        (
            WindSpec::new(5.0, 0.0).with_gusts(GustSpec { intensity: 0.1, lateral_ratio: -1.0, seed: 1 }),
            "gusts.lateral_ratio",
        ),
    ];
    for (spec, field) in cases {
        let WindError::OutOfRange(error) = spec.build().unwrap_err() else {
            panic!("wrong error for {field}")
        };
        assert_eq!(error.field, field);
        assert!(error.to_string().contains(field), "{error}");
    }
    let low_reference = WindSpec::new(5.0, 0.0).with_roughness_length_m(1.5).with_reference_height_m(1.0);
    assert!(matches!(low_reference.build(), Err(WindError::ReferenceBelowRoughness { .. })));
}

#[test]
fn wind_spec_round_trips_through_json_with_defaults() {
    let spec: WindSpec =
        serde_json::from_str(r#"{"speed_mps": 4, "from_deg": 45, "gusts": {"seed": 5}}"#).unwrap();
    assert_eq!(spec, WindSpec::new(4.0, 45.0).with_gusts(GustSpec::seeded(5)));
    let json = serde_json::to_string(&spec).unwrap();
    assert_eq!(serde_json::from_str::<WindSpec>(&json).unwrap(), spec);
    assert!(serde_json::from_str::<WindSpec>(r#"{"speed_mps": 4, "from_deg": 45, "gust": 1}"#).is_err());
}

#[test]
fn calm_spec_builds_still_air() {
    let wind = WindSpec::calm().build().unwrap();
    assert_eq!(wind.velocity_mps(&at(10.0), 3.0), CalmAir.velocity_mps(&at(10.0), 3.0));
}

#[test]
fn terrain_presets_are_davenport_wieringa_class_values() {
    // source: Wieringa et al. (2001), New revision of Davenport roughness classification, as
    // tabulated in Stull, Meteorology for Scientists and Engineers (classes open 0.03 m,
    // roughly open 0.10 m, very rough 0.5 m)
    assert_eq!(Terrain::OpenShortGrass.roughness_length_m(), 0.03);
    assert_eq!(Terrain::RoughField.roughness_length_m(), 0.10);
    assert_eq!(Terrain::WoodedEdge.roughness_length_m(), 0.5);
    assert!(Terrain::all().iter().all(|t| t.source().starts_with("approximate")));
}
