//! Integration tests: the domain packages, driven through scripts, with values equal to the
//! engine's (the engine is called directly with the same inputs in SI units).
use super::session::{error, number, value};
use spinfoil_engine::{Dimension, DiscFamily, Layup, Material, ParametricOutline, SamplingSettings};
use spinfoil_lang::{Session, SessionSettings};

fn session() -> Session {
    Session::new(SessionSettings::default())
}

/// Asserts a script's number equals the engine's to 1e-12 relative (scripts print floats
/// in their shortest round-trip form, which may differ in the last bit of the unit conversion).
fn assert_same(s: &mut Session, code: &str, engine: f64) {
    let got = number(s, code);
    assert!((got - engine).abs() <= 1e-12 * engine.abs().max(1e-300), "{code}: script {got} vs engine {engine}");
}

#[test]
fn materials_keep_name_and_density() {
    let mut s = session();
    value(&mut s, "let m = material(\"soft base blend\", 0.95);");
    assert_eq!(value(&mut s, "m.name"), "soft base blend");
    let expected = Material::from_g_cm3("x", 0.95).unwrap().density_g_cm3();
    assert_eq!(number(&mut s, "m.density_g_cm3"), expected);
    assert_eq!(number(&mut s, "material(\"int density\", 2).density_g_cm3"), 2.0, "integers are accepted");
    let e = error(&mut s, "material(\"air pocket\", -1.0)");
    assert_eq!(e.kind, "DesignError");
    assert!(e.message.contains("allowed range"), "{}", e.message);
}

#[test]
fn outlines_match_the_engine_in_user_units() {
    let mut s = session();
    let cell = "let o = driver_outline(#{ diameter_cm: 21.1, rim_width_cm: 2.0, plate_mm: 2 });";
    value(&mut s, cell);
    let engine = ParametricOutline::new(DiscFamily::Driver)
        .with(Dimension::Diameter, 0.211)
        .with(Dimension::RimWidth, 0.020)
        .with(Dimension::PlateThickness, 0.002)
        .build(&SamplingSettings::default())
        .unwrap();
    assert_same(&mut s, "o.diameter_cm", engine.diameter_m() * 100.0);
    assert_same(&mut s, "o.rim_width_cm", engine.rim_width_m() * 100.0);
    assert_same(&mut s, "o.rim_depth_cm", engine.rim_depth_m() * 100.0);
    assert_same(&mut s, "o.plate_mm", engine.plate_thickness_m() * 1000.0);
    assert_same(&mut s, "o.area_cm2", engine.area_m2() * 1e4);
    assert_eq!(value(&mut s, "o.family"), "driver");
    assert_eq!(value(&mut s, "putter_outline().family"), "putter");
}

#[test]
fn impossible_outlines_name_the_key_in_user_units() {
    let mut s = session();
    let e = error(&mut s, "driver_outline(#{ rim_width_cm: 11 })");
    assert_eq!(e.kind, "DesignError");
    assert!(e.message.contains("rim_width_cm = 11"), "{}", e.message);
    assert!(e.message.contains("allowed range"), "{}", e.message);
}

#[test]
fn layups_build_the_engine_layups() {
    let mut s = session();
    value(&mut s, "let rim = material(\"dense rim blend\", 1.24); let plate = material(\"soft base blend\", 0.95);");
    let rim = Material::from_g_cm3("dense rim blend", 1.24).unwrap();
    let plate = Material::from_g_cm3("soft base blend", 0.95).unwrap();
    assert_eq!(value(&mut s, "rim_layup(rim, plate, #{ split_radius_cm: 8.4 }).kind"), "overmold");
    assert_eq!(value(&mut s, "single_layup(plate).kind"), "single");
    assert_eq!(value(&mut s, "ring_layup(plate, rim, #{ inner_radius_cm: 9, outer_radius_cm: 9.6 }).kind"), "regions");
    assert_eq!(value(&mut s, "rim_layup(rim, plate, #{ split_radius_cm: 8.4 }).materials.len()"), "2");
    let _expected = Layup::overmold(plate, rim, 0.084);
    let e = error(&mut s, "ring_layup(plate, rim, #{ inner_radius_cm: 9.6, outer_radius_cm: 9 })");
    assert!(e.message.contains("must be larger than inner_radius_cm"), "{}", e.message);
}

#[test]
fn option_errors_name_key_value_range_and_position() {
    let mut s = session();
    let e = error(&mut s, "let a = 1;\nlet o = driver_outline(#{ diametr_cm: 21.1 });");
    assert_eq!(e.kind, "OptionError");
    assert!(e.message.contains("unknown option 'diametr_cm'; did you mean 'diameter_cm'?"), "{}", e.message);
    assert_eq!((e.line, e.column), (Some(2), Some(9)));
    let e = error(&mut s, "driver_outline(#{ diameter_cm: 500 })");
    assert!(
        e.message.contains("'diameter_cm' = 500 is out of range; expected a number from 1 to 200"),
        "{}",
        e.message
    );
    let e = error(&mut s, "driver_outline(#{ diameter_cm: \"big\" })");
    assert!(e.message.contains("is not a number"), "{}", e.message);
    let e = error(&mut s, "let p = material(\"p\", 1.0); rim_layup(p, p, #{})");
    assert!(e.message.contains("missing option 'split_radius_cm'"), "{}", e.message);
}

#[test]
fn completion_offers_option_keys_of_the_call() {
    let s = session();
    let code = "let o = driver_outline(#{ diameter_cm: 21.1, rim_";
    let c = s.complete(code, code.chars().count());
    assert!(
        c.matches.contains(&"rim_width_cm".to_string()) && c.matches.contains(&"rim_depth_cm".to_string()),
        "{c:?}"
    );
    assert!(!c.matches.contains(&"diameter_cm".to_string()));
}

#[test]
fn completion_offers_fields_after_a_dot() {
    let mut s = session();
    value(&mut s, "let m = material(\"a\", 1.0);");
    let c = s.complete("m.dens", 6);
    assert_eq!(c.matches, vec!["density_g_cm3".to_string()]);
}

const TWO_DISCS: &str = r#"
let plate = material("soft base blend", 0.95);
let rim = material("dense rim blend", 1.24);
let outline = driver_outline(#{ diameter_cm: 21.1 });
let one_piece = disc("P-7 one-piece", outline, single_layup(plate), #{ mass_g: 174 });
let rim_heavy = disc("P-7 rim-heavy", outline, rim_layup(rim, plate, #{ split_radius_cm: 8.4 }), #{ mass_g: 174 });
"#;

fn engine_design(layup: Layup) -> spinfoil_engine::DesignReport {
    let outline = ParametricOutline::new(DiscFamily::Driver).with(Dimension::Diameter, 0.211);
    spinfoil_engine::DiscDesign::new("x", outline, layup)
        .with_target(spinfoil_engine::MassTarget::ScaleDensities { mass_kg: 0.174 })
        .evaluate()
        .unwrap()
}

#[test]
fn discs_expose_the_engines_mass_properties() {
    let mut s = session();
    value(&mut s, TWO_DISCS);
    let plate = Material::from_g_cm3("soft base blend", 0.95).unwrap();
    let rim = Material::from_g_cm3("dense rim blend", 1.24).unwrap();
    let one = engine_design(Layup::single(plate.clone())).properties;
    let two = engine_design(Layup::overmold(plate, rim, 0.084)).properties;
    assert_same(&mut s, "one_piece.mass_g", one.mass_kg * 1000.0);
    assert_same(&mut s, "one_piece.spin_inertia_g_cm2", one.spin_inertia_kg_m2 * 1e7);
    assert_same(&mut s, "rim_heavy.spin_inertia_g_cm2", two.spin_inertia_kg_m2 * 1e7);
    assert_same(&mut s, "rim_heavy.transverse_inertia_g_cm2", two.transverse_inertia_kg_m2 * 1e7);
    assert_same(&mut s, "rim_heavy.cg_height_mm", two.cg_height_m * 1000.0);
    assert_same(&mut s, "rim_heavy.spin_gyration_radius_mm", two.spin_radius_of_gyration_m() * 1000.0);
    assert!((number(&mut s, "rim_heavy.mass_g") - 174.0).abs() < 1e-9);
    assert!(number(&mut s, "rim_heavy.spin_inertia_g_cm2") > number(&mut s, "one_piece.spin_inertia_g_cm2"));
    assert_eq!(value(&mut s, "one_piece.aero"), "demo_driver");
}

#[test]
fn compare_mass_gives_a_table_with_units() {
    let mut s = session();
    value(&mut s, TWO_DISCS);
    let csv = value(&mut s, "compare_mass([one_piece, rim_heavy]).to_csv()");
    assert!(csv.starts_with("design,mass_g,CG height_mm,I_z_g·cm²") || csv.contains("mass_g"), "{csv}");
    assert_eq!(value(&mut s, "compare_mass([one_piece, rim_heavy]).row_count"), "2");
    let sink = std::sync::Arc::new(spinfoil_lang::CollectedOutput::default());
    let bundle = s.eval("compare_mass([one_piece, rim_heavy])", sink).unwrap().unwrap();
    assert!(bundle.data["text/html"].contains("g·cm²"));
    let e = error(&mut s, "compare_mass([one_piece, 3])");
    assert!(e.message.contains("item 1 is a int, not a Disc") || e.message.contains("not a Disc"), "{}", e.message);
}

#[test]
fn standard_warnings_are_readable() {
    let mut s = session();
    value(&mut s, "let p = material(\"base\", 0.95); let o = driver_outline(#{ diameter_cm: 21.1 });");
    assert_eq!(value(&mut s, "disc(\"ok\", o, single_layup(p), #{ mass_g: 175 }).warnings.len()"), "0");
    let heavy = value(&mut s, "disc(\"heavy\", o, single_layup(p), #{ mass_g: 176 }).warnings");
    assert!(heavy.contains("FAILS"), "{heavy}");
}

#[test]
fn release_throws_convert_user_units() {
    let mut s = session();
    value(&mut s, "let t = throw_release(#{ speed_kmh: 86.4, spin_rps: 15, launch_deg: 10, nose_deg: 1, hyzer_deg: -5, style: \"forehand\" });");
    assert_same(&mut s, "t.speed_mps", 86.4 / 3.6);
    assert_same(&mut s, "t.spin_rpm", 15.0 * 60.0);
    assert_same(&mut s, "t.launch_deg", 10f64.to_radians().to_degrees());
    assert_same(&mut s, "t.hyzer_deg", (-5f64).to_radians().to_degrees());
    assert_eq!(value(&mut s, "t.style"), "forehand");
    assert_eq!(value(&mut s, "t.hand"), "right");
    let e = error(&mut s, "throw_release(#{ speed_mps: 20, speed_kmh: 72, spin_rpm: 900 })");
    assert!(e.message.contains("give only one of the options speed_mps, speed_kmh"), "{}", e.message);
    let e = error(&mut s, "throw_release(#{ speed_mps: 20 })");
    assert!(e.message.contains("give one of the options spin_rpm, spin_rps"), "{}", e.message);
}

#[test]
fn efforts_give_each_disc_its_own_speed_and_spin() {
    let mut s = session();
    value(&mut s, TWO_DISCS);
    value(&mut s, "let arm = effort(#{ work_j: 48, torque_nm: 1.1, wrist_deg: 140, launch_deg: 9, hyzer_deg: 4 });");
    let plate = Material::from_g_cm3("soft base blend", 0.95).unwrap();
    let report = engine_design(Layup::single(plate));
    let effort = spinfoil_engine::EffortThrow {
        effort: spinfoil_engine::Effort::Independent(spinfoil_engine::IndependentEffort::new(
            48.0,
            1.1,
            140f64.to_radians(),
        )),
        pose: spinfoil_engine::ReleasePose {
            launch_rad: 9f64.to_radians(),
            roll_rad: 4f64.to_radians(),
            ..Default::default()
        },
    };
    let release = effort.release(&report.properties, report.outline.diameter_m() / 2.0).unwrap();
    assert_same(&mut s, "arm.release_for(one_piece).speed_mps", release.speed_mps);
    assert_same(&mut s, "arm.release_for(one_piece).spin_rpm", release.spin_rad_s * 60.0 / std::f64::consts::TAU);
    assert!(
        number(&mut s, "arm.release_for(rim_heavy).spin_rpm") < number(&mut s, "arm.release_for(one_piece).spin_rpm"),
        "the rim-heavy disc spins slower from the same effort"
    );
    let e = error(&mut s, "effort(#{ work_j: 48, torque_nm: 1.1 })");
    assert!(e.message.contains("give torque_nm and wrist_deg together"), "{}", e.message);
}

#[test]
fn environments_match_the_engines_air() {
    let mut s = session();
    value(&mut s, "let day = environment(#{ altitude_m: 420, temperature_c: 18, humidity_pct: 60, wind_mps: 3, wind_from_deg: 250 });");
    let offset = 18.0 + 273.15 - spinfoil_engine::isa_temperature_k(420.0);
    let air =
        spinfoil_engine::AirSpec::standard_with_offset(420.0, offset).with_relative_humidity_pct(60.0).build().unwrap();
    assert_same(&mut s, "day.density_kg_m3", air.density_kg_m3);
    assert!((number(&mut s, "day.temperature_c") - 18.0).abs() < 1e-9);
    let measured = spinfoil_engine::AirSpec::measured(95_000.0, 283.15).build().unwrap();
    assert_same(&mut s, "environment(#{ pressure_hpa: 950, temperature_c: 10 }).density_kg_m3", measured.density_kg_m3);
    let sea_level = spinfoil_engine::AirSpec::standard(0.0).build().unwrap();
    assert_same(&mut s, "environment().density_kg_m3", sea_level.density_kg_m3);
    // ISO 2533:1975 sea-level density 1.2250 kg/m³ (the engine's ISA formulas reproduce it to 1e-7).
    assert!((number(&mut s, "environment().density_kg_m3") - 1.2250).abs() < 1e-6);
    let e = error(&mut s, "environment(#{ pressure_hpa: 950 })");
    assert!(e.message.contains("pressure_hpa needs temperature_c"), "{}", e.message);
}

#[test]
fn flights_expose_the_engines_metrics_and_trajectory() {
    let mut s = session();
    value(&mut s, TWO_DISCS);
    value(&mut s, "let t = throw_release(#{ speed_mps: 24, spin_rpm: 900, launch_deg: 10, nose_deg: 1 }); let f = fly(one_piece, t, environment());");
    let plate = Material::from_g_cm3("soft base blend", 0.95).unwrap();
    let report = engine_design(Layup::single(plate));
    let body = spinfoil_engine::DiscBody::from_mass_properties(&report.properties, report.outline.diameter_m());
    let release = spinfoil_engine::ReleasePose {
        launch_rad: 10f64.to_radians(),
        nose_rad: 1f64.to_radians(),
        ..Default::default()
    }
    .with_speed_and_spin(24.0, 900.0 / 60.0 * std::f64::consts::TAU);
    let conditions = spinfoil_engine::FlightConditions {
        air: spinfoil_engine::AirSpec::standard(0.0).build().unwrap(),
        ..Default::default()
    };
    let flight =
        spinfoil_engine::fly(&body, &spinfoil_engine::demo_driver(), &release, &conditions, &Default::default())
            .unwrap();
    assert_same(&mut s, "f.carry_m", flight.metrics.carry_m);
    assert_same(&mut s, "f.apex_m", flight.metrics.apex_m);
    assert_same(&mut s, "f.turn_m", flight.metrics.turn_m);
    assert_same(&mut s, "f.fade_m", flight.metrics.fade_m);
    assert_same(&mut s, "f.time_aloft_s", flight.metrics.time_aloft_s);
    assert_eq!(value(&mut s, "f.trajectory().row_count"), flight.samples.len().to_string());
    let csv = value(&mut s, "f.to_csv()");
    assert!(csv.starts_with("time_s,x_m,y_m,z_m,speed_m_per_s,spin_rpm"), "{}", &csv[..80.min(csv.len())]);
    let table = value(&mut s, "compare([f, fly(rim_heavy, t)]).row_count");
    assert_eq!(table, "2");
}

/// A fresh, empty folder for one test (under the system's temporary folder).
fn study_folder(name: &str) -> std::path::PathBuf {
    let dir = std::env::temp_dir().join(format!("spinfoil-lang-{name}-{}", std::process::id()));
    let _ = std::fs::remove_dir_all(&dir);
    std::fs::create_dir_all(&dir).unwrap();
    dir
}

fn session_in(dir: &std::path::Path) -> Session {
    Session::new(SessionSettings { study_dir: Some(dir.to_path_buf()), ..Default::default() })
}

#[test]
fn designs_round_trip_through_json_and_toml() {
    let dir = study_folder("roundtrip");
    let mut s = session_in(&dir);
    value(&mut s, TWO_DISCS);
    std::fs::create_dir_all(dir.join("designs")).unwrap();
    for path in ["designs/rim.json", "designs/rim.toml"] {
        value(&mut s, &format!("save(rim_heavy, \"{path}\");"));
        assert!(dir.join(path).exists());
        let same = value(&mut s, &format!("let a = load_disc(\"{path}\").spin_inertia_g_cm2; let b = rim_heavy.spin_inertia_g_cm2; if a == b {{ \"true\" }} else {{ `${{a}} vs ${{b}}` }}"));
        assert_eq!(same, "true", "{path}");
    }
    value(&mut s, "let t = throw_release(#{ speed_mps: 24, spin_rpm: 900, hyzer_deg: 5 }); save(t, \"t.toml\");");
    assert_eq!(value(&mut s, "load_throw(\"t.toml\").hyzer_deg == t.hyzer_deg"), "true");
    value(
        &mut s,
        "let day = environment(#{ altitude_m: 420, wind_mps: 3, wind_from_deg: 250 }); save(day, \"day.json\");",
    );
    assert_eq!(value(&mut s, "load_environment(\"day.json\").density_kg_m3 == day.density_kg_m3"), "true");
    let e = error(&mut s, "load_disc(\"t.toml\")");
    assert!(e.message.contains("holds a throw, not a disc"), "{}", e.message);
    let _ = std::fs::remove_dir_all(&dir);
}

#[test]
fn exports_are_written_atomically_inside_the_study_folder() {
    let dir = study_folder("exports");
    let mut s = session_in(&dir);
    value(&mut s, TWO_DISCS);
    value(&mut s, "save_csv(fly(one_piece, throw_release(#{ speed_mps: 20, spin_rpm: 800 })), \"flight.csv\");");
    let text = std::fs::read_to_string(dir.join("flight.csv")).unwrap();
    assert!(text.starts_with("time_s,x_m"), "{}", &text[..40]);
    value(&mut s, "save_text(compare_mass([one_piece, rim_heavy]).to_csv(), \"mass.csv\");");
    assert!(std::fs::read_to_string(dir.join("mass.csv")).unwrap().contains("P-7 rim-heavy"));
    let leftovers: Vec<_> = std::fs::read_dir(&dir)
        .unwrap()
        .filter_map(|e| e.ok())
        .filter(|e| e.file_name().to_string_lossy().ends_with(".partial"))
        .collect();
    assert!(leftovers.is_empty());
    let _ = std::fs::remove_dir_all(&dir);
}

#[test]
fn paths_outside_the_study_folder_are_refused() {
    let dir = study_folder("confined");
    let outside = study_folder("outside");
    let mut s = session_in(&dir);
    value(&mut s, TWO_DISCS);
    for (path, fragment) in [
        ("../escape.json", "without '..'"),
        ("/tmp/escape.json", "without '..'"),
        ("a/../../escape.json", "without '..'"),
        ("design.exe", "must end in one of .json, .toml"),
    ] {
        let e = error(&mut s, &format!("save(one_piece, \"{path}\")"));
        assert_eq!(e.kind, "FileError");
        assert!(e.message.contains(fragment), "{path}: {}", e.message);
    }
    #[cfg(unix)]
    {
        std::os::unix::fs::symlink(&outside, dir.join("link")).unwrap();
        let e = error(&mut s, "save(one_piece, \"link/escape.json\")");
        assert!(e.message.contains("leads outside the study folder"), "{}", e.message);
        assert!(!outside.join("escape.json").exists());
    }
    let _ = std::fs::remove_dir_all(&dir);
    let _ = std::fs::remove_dir_all(&outside);
}

#[test]
fn without_a_study_folder_scripts_touch_no_files() {
    let mut s = session();
    value(&mut s, TWO_DISCS);
    let e = error(&mut s, "save(one_piece, \"a.json\")");
    assert_eq!(e.kind, "FileError");
    assert!(e.message.contains("file access is off"), "{}", e.message);
    assert!(error(&mut s, "load_disc(\"a.json\")").message.contains("file access is off"));
}

#[test]
fn charts_of_flights_and_discs_render_svg() {
    let mut s = session();
    value(&mut s, TWO_DISCS);
    value(&mut s, "let t = throw_release(#{ speed_mps: 24, spin_rpm: 900, launch_deg: 10 }); let a = fly(one_piece, t); let b = fly(rim_heavy, t);");
    let sink = std::sync::Arc::new(spinfoil_lang::CollectedOutput::default());
    for cell in [
        "plan_view([a, b])",
        "side_view(a)",
        "time_series([a, b])",
        "cross_section(rim_heavy)",
        "mass_bars([one_piece, rim_heavy])",
        "coefficient_curves(one_piece)",
    ] {
        let bundle = s.eval(cell, sink.clone()).unwrap().unwrap();
        let svg = &bundle.data["image/svg+xml"];
        assert!(svg.contains("<svg"), "{cell}");
        assert!(
            svg.contains("P-7 one-piece") || svg.contains("P-7 rim-heavy"),
            "{cell}: legend or title names the design"
        );
    }
    assert!(
        value(&mut s, "plan_view([a, b]).to_svg()").starts_with("<svg")
            || value(&mut s, "plan_view([a, b]).to_svg()").contains("<svg")
    );
    let e = error(&mut s, "plan_view([])");
    assert!(e.message.contains("give at least one Flight"), "{}", e.message);
}

#[test]
fn show_sends_a_display_and_flights_render_a_table() {
    let mut s = session();
    value(&mut s, TWO_DISCS);
    let sink = std::sync::Arc::new(spinfoil_lang::CollectedOutput::default());
    let result = s.eval("show(compare_mass([one_piece, rim_heavy])); let f = fly(one_piece, throw_release(#{ speed_mps: 20, spin_rpm: 800 })); f", sink.clone()).unwrap().unwrap();
    assert!(result.data["text/html"].contains("carry"));
    assert!(result.text_plain().unwrap().contains("Keep clear of the throwing lane"));
    let events = sink.take();
    assert!(matches!(&events[0], spinfoil_lang::OutputEvent::Display(b, None) if b.data.contains_key("text/html")));
}

#[test]
fn a_ground_in_the_environment_plays_the_landing_out_to_rest() {
    let mut s = session();
    value(&mut s, TWO_DISCS);
    value(&mut s, "let t = throw_release(#{ speed_mps: 22, spin_rpm: 850, launch_deg: 10 }); let f = fly(one_piece, t, environment(#{ ground: \"packed_dirt\" }));");
    let plate = Material::from_g_cm3("soft base blend", 0.95).unwrap();
    let report = engine_design(Layup::single(plate));
    let body = spinfoil_engine::DiscBody::from_mass_properties(&report.properties, report.outline.diameter_m());
    let release = spinfoil_engine::ReleasePose { launch_rad: 10f64.to_radians(), ..Default::default() }
        .with_speed_and_spin(22.0, 850.0 / 60.0 * std::f64::consts::TAU);
    let conditions = spinfoil_engine::FlightConditions {
        air: spinfoil_engine::AirSpec::standard(0.0).build().unwrap(),
        ..Default::default()
    };
    let ground = spinfoil_engine::Ground::level(spinfoil_engine::SurfacePreset::PackedDirt);
    let to_rest = spinfoil_engine::fly_to_rest(
        &body,
        &spinfoil_engine::demo_driver(),
        &release,
        &conditions,
        &Default::default(),
        &ground,
        &Default::default(),
    )
    .unwrap();
    assert_same(&mut s, "f.ground_play_m", to_rest.ground.ground_play_m);
    assert_same(&mut s, "f.carry_m", to_rest.flight.metrics.carry_m);
    assert_eq!(value(&mut s, "f.ground_ending"), to_rest.ground.describe());
    assert_eq!(value(&mut s, "type_of(fly(one_piece, t).ground_play_m)"), "()", "no ground, no ground play");
    let rest = value(&mut s, "compare([f]).column(\"rest distance\")[0]").parse::<f64>().unwrap();
    assert!((rest - to_rest.rest_distance_m()).abs() <= 1e-9 * rest, "{rest} vs {}", to_rest.rest_distance_m());
    // One flight needs no array, as in plan_view(f).
    assert_eq!(value(&mut s, "compare(f).to_csv()"), value(&mut s, "compare([f]).to_csv()"));
}

#[test]
fn outlines_from_points_match_the_engine() {
    let mut s = session();
    value(&mut s, "let o = outline_points([[0, 1.6], [10.55, 1.2], [10.55, 0.0], [8.4, 0.0], [8.4, 1.0], [0, 1.0]]);");
    let points = [(0.0, 1.6), (10.55, 1.2), (10.55, 0.0), (8.4, 0.0), (8.4, 1.0), (0.0, 1.0)];
    let engine = spinfoil_engine::Outline::from_points(
        points.iter().map(|(r, z)| spinfoil_engine::RzPoint::new(r / 100.0, z / 100.0)).collect(),
    )
    .unwrap();
    assert_same(&mut s, "o.area_cm2", engine.area_m2() * 1e4);
    assert_same(&mut s, "o.diameter_cm", engine.diameter_m() * 100.0);
    assert_eq!(value(&mut s, "o.family"), "points");
    let e = error(&mut s, "outline_points([[0, 0], [1, 1], [1, 0], [0, 1]])");
    assert_eq!(e.kind, "DesignError");
    assert!(e.message.contains("intersects itself"), "{}", e.message);
    let e = error(&mut s, "outline_points([[0, 0], [1], [1, 0]])");
    assert!(e.message.contains("point 1 must be [r_cm, z_cm]"), "{}", e.message);
}
