//! Integration tests: air (standard atmosphere, humidity, viscosity, similarity numbers).
use spinfoil_engine::*;

use crate::common::rel_diff;

/// source: ISO 2533:1975 Standard Atmosphere / U.S. Standard Atmosphere 1976, tables by
/// geopotential altitude (as listed in CHECKS.md): (H m, T K, p Pa, ρ kg/m³).
const STANDARD_TABLE: [(f64, f64, f64, f64); 5] = [
    (0.0, 288.15, 101_325.0, 1.2250),
    (500.0, 284.90, 95_461.0, 1.1673),
    (1000.0, 281.65, 89_875.0, 1.1116),
    (2000.0, 275.15, 79_495.0, 1.0065),
    (3000.0, 268.65, 70_109.0, 0.9091),
];

#[test]
fn standard_atmosphere_matches_the_published_table_to_1e_4() {
    // source: ISO 2533:1975 / U.S. Standard Atmosphere 1976 (table in CHECKS.md)
    for (altitude_m, t_k, p_pa, rho) in STANDARD_TABLE {
        let air = AirSpec::standard(altitude_m).build().unwrap();
        assert!(rel_diff(air.temperature_k, t_k) < 1e-4, "T at {altitude_m} m: {}", air.temperature_k);
        assert!(rel_diff(air.pressure_pa, p_pa) < 1e-4, "p at {altitude_m} m: {}", air.pressure_pa);
        assert!(rel_diff(air.density_kg_m3, rho) < 1e-4, "ρ at {altitude_m} m: {}", air.density_kg_m3);
    }
}

#[test]
fn tropopause_and_stratosphere_values() {
    // source: U.S. Standard Atmosphere 1976, Table I: H = 11 km: 216.65 K, 22 632 Pa;
    // H = 20 km: 5 474.9 Pa (value from memory, unverified)
    let tropopause = AirSpec::standard(11_000.0).build().unwrap();
    assert!(rel_diff(tropopause.temperature_k, 216.65) < 1e-9);
    assert!(rel_diff(tropopause.pressure_pa, 22_632.0) < 1e-4, "{}", tropopause.pressure_pa);
    let top = AirSpec::standard(20_000.0).build().unwrap();
    assert!(rel_diff(top.temperature_k, 216.65) < 1e-9);
    assert!(rel_diff(top.pressure_pa, 5_474.9) < 1e-3, "{}", top.pressure_pa);
}

#[test]
fn sutherland_viscosity_at_sea_level() {
    // source: U.S. Standard Atmosphere 1976 (CHECKS.md): μ(288.15 K) = 1.7894×10⁻⁵ Pa·s
    assert!(rel_diff(sutherland_viscosity_pa_s(288.15), 1.7894e-5) < 1e-4);
    let air = AirSpec::standard(0.0).build().unwrap();
    assert!(rel_diff(air.dynamic_viscosity_pa_s, 1.7894e-5) < 1e-4);
}

#[test]
fn buck_saturation_vapour_pressure_at_20_c() {
    // source: Buck, A. L. (1981), New equations for computing vapor pressure and enhancement
    // factor, J. Appl. Meteor. 20, 1527–1532: e_s(20 °C) ≈ 23.37 hPa
    assert!((buck_saturation_vapour_pressure_pa(20.0) - 2_337.0).abs() < 1.0);
}

#[test]
fn humid_air_is_the_ideal_gas_mixture() {
    // source: Dalton's law and the ideal-gas law; R_v = 461.5 J/(kg·K) (value from memory,
    // unverified). ρ = (p − e)/(R_d T) + e/(R_v T) with e = RH · e_s.
    let detail =
        AirSpec::measured(100_000.0, 303.15).with_relative_humidity_pct(80.0).build_detailed().unwrap();
    let e_pa = 0.8 * buck_saturation_vapour_pressure_pa(30.0);
    let expected = (100_000.0 - e_pa) / (287.05287 * 303.15) + e_pa / (461.5 * 303.15);
    assert!(rel_diff(detail.vapour_pressure_pa, e_pa) < 1e-12);
    assert!(rel_diff(detail.properties.density_kg_m3, expected) < 1e-12);
    assert!(detail.properties.density_kg_m3 < detail.dry_density_kg_m3);
}

#[test]
fn enhancement_factor_raises_saturation_by_about_0_4_percent_at_sea_level() {
    // source: Buck (1981): f = 1.0007 + 3.46e-6 P[hPa] (value from memory, unverified)
    let plain = AirSpec::standard(0.0).with_relative_humidity_pct(100.0).build_detailed().unwrap();
    let enhanced = AirSpec::standard(0.0)
        .with_relative_humidity_pct(100.0)
        .with_enhancement_factor(true)
        .build_detailed()
        .unwrap();
    let ratio = enhanced.saturation_vapour_pressure_pa / plain.saturation_vapour_pressure_pa;
    assert!((ratio - (1.0007 + 3.46e-6 * 1013.25)).abs() < 1e-12);
}

#[test]
fn temperature_offset_changes_temperature_not_pressure() {
    // common practice, no published source: ISA deviation at a pressure altitude
    let standard = AirSpec::standard(1_000.0).build().unwrap();
    let hot = AirSpec::standard_with_offset(1_000.0, 15.0).build().unwrap();
    assert_eq!(hot.pressure_pa, standard.pressure_pa);
    assert!(rel_diff(hot.temperature_k, standard.temperature_k + 15.0) < 1e-15);
    assert!(
        rel_diff(hot.density_kg_m3, standard.density_kg_m3 * standard.temperature_k / hot.temperature_k)
            < 1e-12
    );
}

#[test]
fn reynolds_number_and_advance_ratio_of_a_typical_flight() {
    // common practice, no published source: Re = ρVd/μ, AR = |ω|R/V
    let air = AirProperties::sea_level_standard();
    let re = air.reynolds_number(20.0, 0.21);
    assert!(rel_diff(re, 1.2250 * 20.0 * 0.21 / 1.7894e-5) < 1e-12);
    assert!((re - 2.875e5).abs() < 1e3);
    assert!(rel_diff(advance_ratio(-100.0, 0.105, 21.0), 0.5) < 1e-12);
}

#[test]
fn geopotential_altitude_is_slightly_below_geometric() {
    // source: U.S. Standard Atmosphere 1976, H = r0 z / (r0 + z), r0 = 6 356 766 m
    let h = geopotential_altitude_m(3_000.0);
    assert!((3_000.0 - h - 1.415).abs() < 0.01, "{h}");
}

#[test]
fn bad_air_settings_name_field_value_and_range() {
    let cases = [
        (AirSpec::standard(25_000.0), "altitude_m"),
        (AirSpec::standard(f64::NAN), "altitude_m"),
        (AirSpec::standard_with_offset(0.0, 55.0), "temperature_offset_k"),
        (AirSpec::measured(30_000.0, 290.0), "pressure_pa"),
        (AirSpec::measured(101_000.0, 350.0), "temperature_k"),
        (AirSpec::measured(101_000.0, f64::INFINITY), "temperature_k"),
        (AirSpec::standard(0.0).with_relative_humidity_pct(120.0), "relative_humidity_pct"),
        (AirSpec::standard(0.0).with_relative_humidity_pct(-1.0), "relative_humidity_pct"),
    ];
    for (spec, field) in cases {
        let AirError::OutOfRange(error) = spec.build().unwrap_err() else { panic!("wrong error") };
        assert_eq!(error.field, field);
        assert!(error.to_string().contains(field) && error.to_string().contains('…'), "{error}");
    }
}

#[test]
fn air_spec_round_trips_through_json_and_rejects_unknown_fields() {
    let spec = AirSpec::standard_with_offset(800.0, -5.0).with_relative_humidity_pct(40.0);
    let json = serde_json::to_string(&spec).unwrap();
    assert_eq!(serde_json::from_str::<AirSpec>(&json).unwrap(), spec);
    let minimal: AirSpec =
        serde_json::from_str(r#"{"source":{"kind":"measured","pressure_pa":95000,"temperature_k":290}}"#)
            .unwrap();
    assert_eq!(minimal, AirSpec::measured(95_000.0, 290.0));
    assert!(serde_json::from_str::<AirSpec>(
        r#"{"source":{"kind":"standard","altitude_m":0},"humidity":50}"#
    )
    .is_err());
}
