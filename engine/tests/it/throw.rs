//! Integration tests: throws (release-state validation, effort forms, work–energy checks).
use spinfoil_engine::*;

use crate::common::rel_diff;

const RADIUS_M: f64 = 0.106;

/// An invented single-material driver (demo numbers).
fn solid_disc() -> MassProperties {
    MassProperties {
        mass_kg: 0.172,
        cg_height_m: 0.01,
        spin_inertia_kg_m2: 0.00120,
        transverse_inertia_kg_m2: 0.00062,
    }
}

/// The same mass with more of it in the rim (an invented overmold).
fn rim_heavy_disc() -> MassProperties {
    MassProperties { spin_inertia_kg_m2: 0.00150, transverse_inertia_kg_m2: 0.00077, ..solid_disc() }
}

fn independent() -> Effort {
    Effort::Independent(IndependentEffort::new(120.0, 4.0, 1.2))
}

#[test]
fn same_effort_rim_heavy_disc_spins_slower_with_more_angular_momentum() {
    // source: work–energy theorem, ω = √(2τθ/I) (CHECKS.md, Rigid-body dynamics): spin ∝ 1/√I_z,
    // angular momentum I_z ω ∝ √I_z
    let throw = EffortThrow { effort: independent(), pose: ReleasePose::default() };
    let (solid, rim) = (solid_disc(), rim_heavy_disc());
    let a = throw.release(&solid, RADIUS_M).unwrap();
    let b = throw.release(&rim, RADIUS_M).unwrap();
    let inertia_ratio = rim.spin_inertia_kg_m2 / solid.spin_inertia_kg_m2;
    assert!(rel_diff(b.spin_rad_s / a.spin_rad_s, 1.0 / inertia_ratio.sqrt()) < 1e-9);
    let momentum = |m: &MassProperties, r: &ReleaseState| m.spin_inertia_kg_m2 * r.spin_rad_s;
    assert!(rel_diff(momentum(&rim, &b) / momentum(&solid, &a), inertia_ratio.sqrt()) < 1e-9);
    assert_eq!(a.speed_mps, b.speed_mps, "same mass, same linear work, same speed");
}

#[test]
fn four_times_the_inertia_gives_half_the_spin_and_twice_the_momentum() {
    // source: CHECKS.md, work–energy (derivable): 4× I → ½ ω, 2× I ω
    let base = solid_disc();
    let quadruple = MassProperties { spin_inertia_kg_m2: 4.0 * base.spin_inertia_kg_m2, ..base };
    let (_, spin) = independent().speed_and_spin(&base, RADIUS_M).unwrap();
    let (_, spin_4) = independent().speed_and_spin(&quadruple, RADIUS_M).unwrap();
    assert!(rel_diff(spin_4, 0.5 * spin) < 1e-12);
    assert!(rel_diff(quadruple.spin_inertia_kg_m2 * spin_4, 2.0 * base.spin_inertia_kg_m2 * spin) < 1e-12);
}

#[test]
fn independent_form_follows_the_work_energy_formulas() {
    // source: work–energy theorem: V = √(2W/(m + m_arm)), ω = √(2τθ/I_z)
    let disc = solid_disc();
    let (speed, spin) = independent().speed_and_spin(&disc, RADIUS_M).unwrap();
    assert!(rel_diff(speed, (2.0 * 120.0 / (0.172 + DEFAULT_ARM_MASS_KG)).sqrt()) < 1e-14);
    assert!(rel_diff(spin, (2.0 * 4.0 * 1.2 / 0.00120_f64).sqrt()) < 1e-14);
    let no_arm =
        Effort::Independent(IndependentEffort { arm_mass_kg: 0.0, ..IndependentEffort::new(40.0, 4.0, 1.2) });
    let (speed, _) = no_arm.speed_and_spin(&disc, RADIUS_M).unwrap();
    assert!(rel_diff(0.5 * disc.mass_kg * speed * speed, 40.0) < 1e-12);
}

#[test]
fn coupled_form_splits_the_work_exactly() {
    // source: work–energy theorem, ½mV² + ½I_zω² = W with ωR = kV (PHYSICS.md, Throws)
    for disc in [solid_disc(), rim_heavy_disc()] {
        for k in [0.0, 0.3, 0.5, 1.0] {
            let (v, w) =
                Effort::Coupled(CoupledEffort::new(45.0, k)).speed_and_spin(&disc, RADIUS_M).unwrap();
            let energy_j = 0.5 * disc.mass_kg * v * v + 0.5 * disc.spin_inertia_kg_m2 * w * w;
            assert!(rel_diff(energy_j, 45.0) < 1e-12, "k = {k}: {energy_j}");
            assert!((w * RADIUS_M - k * v).abs() <= 1e-12 * v, "rim-speed ratio");
        }
    }
}

#[test]
fn coupled_form_with_arm_mass_counts_the_arm_energy() {
    // source: work–energy theorem, ½(m + m_arm)V² + ½I_zω² = W
    let disc = rim_heavy_disc();
    let effort = CoupledEffort { work_j: 150.0, rim_speed_ratio: 0.45, arm_mass_kg: 0.4 };
    let (v, w) = Effort::Coupled(effort).speed_and_spin(&disc, RADIUS_M).unwrap();
    let energy_j = 0.5 * (disc.mass_kg + 0.4) * v * v + 0.5 * disc.spin_inertia_kg_m2 * w * w;
    assert!(rel_diff(energy_j, 150.0) < 1e-12);
}

#[test]
fn coupled_form_gives_the_rim_heavy_disc_less_speed_and_spin() {
    // source: V = √(2W/(m + I_z k²/R²)) (PHYSICS.md): more I_z, less of the work left for speed
    let effort = Effort::Coupled(CoupledEffort::new(45.0, 0.45));
    let (v_solid, w_solid) = effort.speed_and_spin(&solid_disc(), RADIUS_M).unwrap();
    let (v_rim, w_rim) = effort.speed_and_spin(&rim_heavy_disc(), RADIUS_M).unwrap();
    assert!(v_rim < v_solid && w_rim < w_solid);
    assert!(rim_heavy_disc().spin_inertia_kg_m2 * w_rim > solid_disc().spin_inertia_kg_m2 * w_solid);
}

#[test]
fn effort_throw_carries_the_pose_into_the_release() {
    let pose = ReleasePose {
        launch_rad: 0.17,
        nose_rad: 0.02,
        roll_rad: -0.1,
        heading_rad: 0.05,
        height_m: 1.3,
        off_axis_rate_rad_s: 2.0,
        off_axis_direction_rad: 0.7,
        style: Style::Forehand,
        hand: Hand::Left,
    };
    let release = EffortThrow { effort: independent(), pose }.release(&solid_disc(), RADIUS_M).unwrap();
    assert_eq!(release.pose(), pose);
    assert_eq!(release.signed_spin_rad_s(), -release.spin_rad_s, "left forehand spins clockwise");
}

#[test]
fn a_typical_amateur_effort_gives_a_typical_release() {
    // common practice, no published source: about 22 m/s and 15 rev/s for an amateur backhand
    let effort = Effort::Coupled(CoupledEffort::new(55.0, 0.45));
    let (speed, spin) = effort.speed_and_spin(&solid_disc(), RADIUS_M).unwrap();
    assert!((20.0..26.0).contains(&speed), "{speed} m/s");
    assert!((12.0..20.0).contains(&(spin / std::f64::consts::TAU)), "{spin} rad/s");
}

fn valid_release() -> ReleaseState {
    ReleasePose::default().with_speed_and_spin(22.0, 90.0)
}

#[test]
fn a_plausible_release_validates() {
    assert_eq!(valid_release().validate(), Ok(()));
    assert_eq!(valid_release().validated(), Ok(valid_release()));
}

/// A change that spoils one field of a valid release.
type Spoil = fn(&mut ReleaseState);

#[test]
fn bad_release_values_name_field_value_and_range() {
    let cases: [(&str, Spoil); 12] = [
        ("speed_mps", |r| r.speed_mps = 50.0),
        ("speed_mps", |r| r.speed_mps = -1.0),
        ("speed_mps", |r| r.speed_mps = f64::NAN),
        ("spin_rad_s", |r| r.spin_rad_s = 300.0),
        ("spin_rad_s", |r| r.spin_rad_s = f64::INFINITY),
        ("launch_rad", |r| r.launch_rad = 2.0),
        ("nose_rad", |r| r.nose_rad = -1.2),
        ("roll_rad", |r| r.roll_rad = 1.7),
        ("heading_rad", |r| r.heading_rad = 4.0),
        ("height_m", |r| r.height_m = 3.5),
        ("off_axis_rate_rad_s", |r| r.off_axis_rate_rad_s = f64::NEG_INFINITY),
        ("off_axis_direction_rad", |r| r.off_axis_direction_rad = 7.0),
    ];
    for (field, spoil) in cases {
        let mut release = valid_release();
        spoil(&mut release);
        let error = release.validate().unwrap_err();
        assert_eq!(error.field(), field);
        let message = error.to_string();
        assert!(message.contains(field) && message.contains("allowed range"), "{message}");
    }
}

#[test]
fn bad_effort_and_disc_values_name_the_field() {
    let disc = solid_disc();
    let cases = [
        (Effort::Independent(IndependentEffort::new(-5.0, 4.0, 1.0)), disc, RADIUS_M, "linear_work_j"),
        (
            Effort::Independent(IndependentEffort::new(100.0, f64::NAN, 1.0)),
            disc,
            RADIUS_M,
            "wrist_torque_n_m",
        ),
        (Effort::Independent(IndependentEffort::new(100.0, 4.0, 9.0)), disc, RADIUS_M, "wrist_turn_rad"),
        (Effort::Coupled(CoupledEffort::new(50.0, 3.0)), disc, RADIUS_M, "rim_speed_ratio"),
        (
            Effort::Coupled(CoupledEffort { arm_mass_kg: -0.1, ..CoupledEffort::new(50.0, 0.4) }),
            disc,
            RADIUS_M,
            "arm_mass_kg",
        ),
        (
            Effort::Coupled(CoupledEffort::new(50.0, 0.4)),
            MassProperties { mass_kg: 0.0, ..disc },
            RADIUS_M,
            "mass_kg",
        ),
        (
            Effort::Coupled(CoupledEffort::new(50.0, 0.4)),
            MassProperties { spin_inertia_kg_m2: f64::NAN, ..disc },
            RADIUS_M,
            "spin_inertia_kg_m2",
        ),
        (Effort::Coupled(CoupledEffort::new(50.0, 0.4)), disc, 1.5, "radius_m"),
    ];
    for (effort, mass, radius_m, field) in cases {
        assert_eq!(effort.speed_and_spin(&mass, radius_m).unwrap_err().field(), field);
    }
}

#[test]
fn an_effort_too_large_for_a_light_disc_is_rejected_by_release_speed() {
    let throw =
        EffortThrow { effort: Effort::Coupled(CoupledEffort::new(900.0, 0.3)), pose: ReleasePose::default() };
    assert_eq!(throw.release(&solid_disc(), RADIUS_M).unwrap_err().field(), "speed_mps");
}

#[test]
fn throw_inputs_round_trip_through_json_with_defaults() {
    let json = r#"{"effort": {"form": "independent", "linear_work_j": 120, "wrist_torque_n_m": 4, "wrist_turn_rad": 1.2}}"#;
    let throw: EffortThrow = serde_json::from_str(json).unwrap();
    assert_eq!(throw, EffortThrow { effort: independent(), pose: ReleasePose::default() });
    let coupled = EffortThrow {
        effort: Effort::Coupled(CoupledEffort::new(50.0, 0.4)),
        pose: ReleasePose::thrown(Style::Forehand, Hand::Right),
    };
    let text = serde_json::to_string(&coupled).unwrap();
    assert_eq!(serde_json::from_str::<EffortThrow>(&text).unwrap(), coupled);
    assert!(serde_json::from_str::<EffortThrow>(
        r#"{"effort": {"form": "coupled", "work_j": 5, "rim_speed_ratio": 0.4}, "pose": {"height": 1}}"#
    )
    .is_err());
}

/// Mass properties of an invented driver outline at 172 g, one-piece or with a dense rim blend
/// in the outer 8 mm (densities invented for the test).
fn driver_layup_properties(rim_heavy: bool) -> (MassProperties, f64) {
    let outline = ParametricOutline::new(DiscFamily::Driver);
    let base = Material::from_g_cm3("test base blend", 0.95).unwrap();
    let layup = if rim_heavy {
        let dense = Material::from_g_cm3("test dense blend", 1.30).unwrap();
        Layup::overmold(base, dense, outline.diameter_m / 2.0 - 0.008)
    } else {
        Layup::single(base)
    };
    let design =
        DiscDesign::new("test", outline, layup).with_target(MassTarget::ScaleDensities { mass_kg: 0.172 });
    (design.evaluate().unwrap().properties, outline.diameter_m / 2.0)
}

#[test]
fn from_the_same_effort_a_rim_heavy_layup_spins_slower_with_more_angular_momentum() {
    // source: work–energy theorem (CHECKS.md): spin ∝ 1/√I_z, angular momentum ∝ √I_z, to 1e-9
    let ((solid, radius_m), (overmold, _)) = (driver_layup_properties(false), driver_layup_properties(true));
    let inertia_ratio = overmold.spin_inertia_kg_m2 / solid.spin_inertia_kg_m2;
    assert!(inertia_ratio > 1.01, "the overmold should be rim-heavy: {inertia_ratio}");
    let throw = EffortThrow { effort: independent(), pose: ReleasePose::default() };
    let (a, b) = (throw.release(&solid, radius_m).unwrap(), throw.release(&overmold, radius_m).unwrap());
    assert!(rel_diff(b.spin_rad_s / a.spin_rad_s, inertia_ratio.powf(-0.5)) < 1e-9);
    let momentum_ratio =
        overmold.spin_inertia_kg_m2 * b.spin_rad_s / (solid.spin_inertia_kg_m2 * a.spin_rad_s);
    assert!(rel_diff(momentum_ratio, inertia_ratio.sqrt()) < 1e-9);
}

#[test]
fn release_similarity_numbers() {
    // common practice, no published source: AR = |ω|R/V, Re = ρVd/μ
    let release = ReleasePose::default().with_speed_and_spin(21.0, 100.0);
    assert!(rel_diff(release.advance_ratio(0.105), 0.5) < 1e-12);
    let air = AirProperties::sea_level_standard();
    assert!(rel_diff(release.reynolds_number(&air, 0.21), 1.2250 * 21.0 * 0.21 / 1.7894e-5) < 1e-12);
}
