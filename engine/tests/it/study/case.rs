//! Named inputs, metrics and their errors.
use super::*;

#[test]
fn unknown_input_is_a_typed_error_listing_the_known_names() {
    let mut case = demo_case();
    let err = case.set("throw.sped_mps", 20.0).unwrap_err();
    let StudyError::UnknownInput { name, known } = &err else { panic!("{err}") };
    assert_eq!(name, "throw.sped_mps");
    assert!(known.contains("throw.speed_mps") && known.contains("layup.split_radius_cm"), "{known}");
    assert!(matches!(CaseOutcome::from_flight(&fly_demo()).metric("carry"), Err(StudyError::UnknownMetric { .. })));
}

fn fly_demo() -> Flight {
    let case = demo_case();
    fly(&demo_body(), &demo_driver(), &case.release, &FlightConditions::default(), &case.flight_settings).unwrap()
}

#[test]
fn inputs_round_trip_in_their_units() {
    let mut case = design_case();
    for (name, value) in [
        ("throw.speed_mps", 19.5),
        ("throw.spin_rps", 14.0),
        ("throw.launch_deg", 12.0),
        ("throw.nose_deg", -1.5),
        ("throw.hyzer_deg", 8.0),
        ("env.wind_mps", 3.0),
        ("env.altitude_m", 1500.0),
        ("layup.split_radius_cm", 9.0),
        ("layup.rim_density_g_cm3", 1.3),
        ("outline.rim_depth_cm", 1.2),
        ("model.drag_scale", 1.1),
        ("model.lift_slope_per_rad", 3.0),
    ] {
        case.set(name, value).unwrap();
        let back = case.get(name).unwrap();
        // source: common practice, no published source (unit conversions round-trip to rounding)
        assert!((back - value).abs() <= 1e-12 * value.abs(), "{name}: {back} vs {value}");
    }
}

#[test]
fn layup_inputs_rebuild_the_mass_properties() {
    let mut case = design_case();
    let base = case.disc.body().unwrap();
    case.set("layup.split_radius_cm", 8.5).unwrap();
    let wider_rim = case.disc.body().unwrap();
    // A denser rim material over a larger share of the radius raises the mass and I_z
    // (source: common practice, no published source; the mass integrals are checked in mass/).
    assert!(wider_rim.mass_kg > base.mass_kg && wider_rim.spin_inertia_kg_m2 > base.spin_inertia_kg_m2);
    let err = demo_case().set("layup.split_radius_cm", 9.0).unwrap_err();
    assert!(matches!(err, StudyError::NotApplicable { .. }), "{err}");
}

#[test]
fn altitude_lengthens_the_flight_of_a_case() {
    let mut case = demo_case();
    let sea = case.run().unwrap().metrics;
    case.set("env.altitude_m", 2000.0).unwrap();
    let high = case.run().unwrap().metrics;
    // Thinner air (ISA: ρ falls about 18 % by 2 km; ISO 2533:1975) lowers drag: the flight
    // changes (source: common practice, no published source; direction only).
    assert!((high.carry_m - sea.carry_m).abs() > 0.5, "{} vs {}", high.carry_m, sea.carry_m);
}

#[test]
fn sweep_over_launch_gives_rows_with_units_and_records_failures() {
    let spec = SweepSpec {
        axes: vec![SweepAxis::values("throw.launch_deg", vec![5.0, 10.0]), SweepAxis::values("throw.speed_mps", vec![18.0, -1.0])],
        metrics: vec!["carry_m".into(), "time_aloft_s".into()],
    };
    let result = run_sweep(&demo_case(), &spec, Shard::whole(), StudyControl::none()).unwrap();
    assert_eq!(result.rows.len(), 4);
    assert_eq!(result.input_units, vec!["°", "m/s"]);
    assert_eq!(result.metric_units, vec!["m", "s"]);
    assert_eq!(result.rows[1].inputs, vec![5.0, -1.0]);
    assert!(result.rows[1].error.as_deref().unwrap().contains("speed"), "{:?}", result.rows[1].error);
    assert!(result.rows[0].error.is_none() && result.rows[0].values[0] > 20.0);
    let range = SweepAxis::range("throw.launch_deg", 0.0, 20.0, 5).unwrap();
    assert_eq!(range.values, vec![0.0, 5.0, 10.0, 15.0, 20.0]);
}

#[test]
fn a_set_cancel_flag_stops_a_study() {
    let cancel = std::sync::atomic::AtomicBool::new(true);
    let spec = SweepSpec { axes: vec![SweepAxis::values("throw.speed_mps", vec![18.0, 20.0])], metrics: vec!["carry_m".into()] };
    let err = run_sweep(&demo_case(), &spec, Shard::whole(), StudyControl::none().with_cancel(&cancel)).unwrap_err();
    assert!(matches!(err, StudyError::Cancelled { total: 2, .. }), "{err}");
}

#[test]
fn progress_reports_every_flight() {
    let calls = std::sync::atomic::AtomicUsize::new(0);
    let progress = |done: usize, total: usize| {
        assert!(done <= total);
        calls.fetch_add(1, std::sync::atomic::Ordering::Relaxed);
    };
    let spec = SweepSpec { axes: vec![SweepAxis::values("throw.speed_mps", vec![18.0, 20.0, 22.0])], metrics: vec!["carry_m".into()] };
    run_sweep(&demo_case(), &spec, Shard::whole(), StudyControl::none().with_progress(&progress)).unwrap();
    assert_eq!(calls.into_inner(), 3);
}

#[test]
fn ground_play_gives_rest_metrics() {
    let mut case = demo_case();
    case.ground = Some(Ground::level(SurfacePreset::ShortGrass));
    let outcome = case.run().unwrap();
    // The disc slides or rolls on after landing (source: common practice, no published source).
    assert!(outcome.metric("rest_distance_m").unwrap() > outcome.metrics.carry_m - 1.0);
    assert!(matches!(demo_case().run().unwrap().metric("rest_x_m"), Err(StudyError::NotApplicable { .. })));
}

#[test]
fn the_same_effort_spins_a_rim_heavy_layup_slower_with_more_angular_momentum() {
    let mut case = design_case();
    case.effort = Some(Effort::Independent(IndependentEffort { linear_work_j: 45.0, wrist_torque_n_m: 2.0, wrist_turn_rad: 1.5, arm_mass_kg: 0.4 }));
    case.set("disc.mass_g", 172.0).unwrap();
    let spin_and_momentum = |rim_density: f64| {
        let mut c = case.clone();
        c.set("layup.rim_density_g_cm3", rim_density).unwrap();
        let body = c.disc.body().unwrap();
        let release = c.release_for(&body).unwrap();
        (release.spin_rad_s, body.spin_inertia_kg_m2 * release.spin_rad_s, body.spin_inertia_kg_m2)
    };
    let (light_spin, light_h, light_i) = spin_and_momentum(0.95);
    let (heavy_spin, heavy_h, heavy_i) = spin_and_momentum(1.4);
    // Work–energy theorem: ½ I_z ω² = τ θ for the same wrist work, so ω ∝ I_z^(−1/2) and
    // H = I_z ω ∝ I_z^(1/2) (source: physics law, Newton's second law for rotation).
    assert!(heavy_i > light_i && heavy_spin < light_spin && heavy_h > light_h);
    assert!(((heavy_spin / light_spin) - (light_i / heavy_i).sqrt()).abs() < 1e-9);
    assert_eq!(case.get("effort.work_j").unwrap(), 45.0);
    assert!(case.run().is_ok());
    assert!(matches!(demo_case().set("effort.work_j", 40.0), Err(StudyError::NotApplicable { .. })));
}
