//! Calibration: recovers known coefficients from synthetic flights with seeded noise, refuses
//! unidentifiable ones; the measured-flight CSV parser names line and column.
use rand::SeedableRng;
use rand_chacha::ChaCha8Rng;
use rand_distr::{Distribution, Normal};

use super::*;

const POSITION_SD_M: f64 = 0.3;
const TIME_SD_S: f64 = 0.03;

fn releases() -> Vec<ReleaseState> {
    [(18.0, 8.0, 0.0), (21.0, 11.0, 8.0), (24.0, 9.0, -6.0), (26.0, 13.0, 4.0), (20.0, 6.0, 12.0)]
        .iter()
        .map(|&(speed, launch, hyzer): &(f64, f64, f64)| ReleaseState { launch_rad: launch.to_radians(), roll_rad: hyzer.to_radians(), ..release(speed) })
        .collect()
}

/// CSV of synthetic measured flights flown with `truth`: landings with noise, and one flight
/// observed at 0.5 s intervals.
fn synthetic_csv(truth: &LinearCoefficients, seed: u64) -> String {
    let mut rng = ChaCha8Rng::seed_from_u64(seed);
    let (pos, time) = (Normal::new(0.0, POSITION_SD_M).unwrap(), Normal::new(0.0, TIME_SD_S).unwrap());
    let settings = FlightSettings { sample_interval_s: 0.5, ..FlightSettings::default() };
    let mut csv = String::from("# synthetic flights of an invented driver\nflight,speed_mps,spin_rps,launch_deg,nose_deg,hyzer_deg,height_m,t_s,x_m,y_m,z_m\n");
    for (k, r) in releases().iter().enumerate() {
        let f = fly(&demo_body(), truth, r, &FlightConditions::default(), &settings).unwrap();
        let head = format!(
            "throw{k},{},{},{},{},{},{}",
            r.speed_mps,
            r.spin_rad_s / std::f64::consts::TAU,
            r.launch_rad.to_degrees(),
            r.nose_rad.to_degrees(),
            r.roll_rad.to_degrees(),
            r.height_m
        );
        let p = f.landing_state.position_m;
        let t = f.metrics.time_aloft_s + time.sample(&mut rng);
        csv += &format!("{head},{t},{},{},\n", p.x + pos.sample(&mut rng), p.y + pos.sample(&mut rng));
        if k == 0 {
            for s in f.samples.iter().filter(|s| s.time_s > 0.0 && s.time_s < f.metrics.time_aloft_s - 0.1) {
                let q = s.position_m;
                let noisy = [q.x + pos.sample(&mut rng), q.y + pos.sample(&mut rng), q.z + pos.sample(&mut rng)];
                csv += &format!("{head},{},{},{},{}\n", s.time_s, noisy[0], noisy[1], noisy[2]);
            }
        }
    }
    csv
}

fn spec(parameters: &[&str]) -> CalibrationSpec {
    CalibrationSpec { position_sd_m: POSITION_SD_M, time_sd_s: TIME_SD_S, ..CalibrationSpec::new(parameters.iter().map(|p| p.to_string()).collect()) }
}

#[test]
fn recovers_known_coefficients_within_two_standard_errors() {
    let truth = demo_driver();
    let flights = parse_measured_flights(&synthetic_csv(&truth, 42)).unwrap();
    assert_eq!(flights.len(), 5);
    assert!(flights[0].observations.len() > 3);
    let mut case = demo_case();
    case.set("model.lift_slope_per_rad", truth.lift_slope_per_rad * 0.85).unwrap();
    case.set("model.drag_min", truth.drag_min * 1.2).unwrap();
    let result = calibrate(&case, &flights, &spec(&["model.lift_slope_per_rad", "model.drag_min"]), StudyControl::none()).unwrap();
    eprintln!(
        "fit: {} iterations, {} flights; {:?}",
        result.iterations,
        result.flights_flown,
        result.parameters.iter().map(|p| format!("{} {:.5} ± {:.5} (start {:.5})", p.name, p.value, p.standard_error, p.initial)).collect::<Vec<_>>()
    );
    // Least squares with correct weights: the estimate lies within 2 standard errors of the
    // truth with about 95 % probability per coefficient (source: common practice, no published
    // source; the standard errors are s²(JᵀJ)⁻¹, Seber & Wild (1989), Nonlinear Regression, §2.1).
    for (fitted, true_value) in result.parameters.iter().zip([truth.lift_slope_per_rad, truth.drag_min]) {
        assert!(fitted.standard_error > 0.0);
        assert!((fitted.value - true_value).abs() < 2.0 * fitted.standard_error, "{fitted:?} vs {true_value}");
        assert!(fitted.standard_error < 0.05 * true_value.abs(), "{fitted:?}");
    }
    // With the measurement σ's right, the residual variance of the weighted residuals is near 1
    // (source: common practice, no published source).
    assert!((0.4..2.0).contains(&result.residual_variance), "s² = {}", result.residual_variance);
    assert_eq!(result.residuals.len(), 3 * flights.iter().map(|f| f.observations.len()).sum::<usize>());
}

#[test]
fn refuses_a_coefficient_with_no_effect_on_the_data() {
    let truth = demo_driver();
    let flights = parse_measured_flights(&synthetic_csv(&truth, 7)).unwrap();
    let mut case = demo_case();
    case.set("model.drag_growth_per_rad2", 0.0).unwrap();
    let err = calibrate(&case, &flights, &spec(&["model.drag_min", "model.drag_min_alpha_rad"]), StudyControl::none()).unwrap_err();
    let StudyError::Unidentifiable { coefficient, reason } = &err else { panic!("{err}") };
    assert_eq!(coefficient, "model.drag_min_alpha_rad", "{reason}");
}

#[test]
fn refuses_perfectly_correlated_coefficients() {
    let truth = demo_driver();
    let flights = parse_measured_flights(&synthetic_csv(&truth, 8)).unwrap();
    let parameters = ["model.lift_scale", "model.lift_at_zero", "model.lift_slope_per_rad"];
    let err = calibrate(&demo_case(), &flights, &spec(&parameters), StudyControl::none()).unwrap_err();
    let StudyError::Unidentifiable { coefficient, .. } = &err else { panic!("{err}") };
    assert!(parameters.contains(&coefficient.as_str()), "{err}");
}

#[test]
fn csv_errors_name_line_and_column() {
    let header = "flight,speed_mps,spin_rps,launch_deg,nose_deg,hyzer_deg,t_s,x_m,y_m\n";
    let err = parse_measured_flights(&format!("{header}a,20,15,10,0,0,3.1,60,abc\n")).unwrap_err();
    assert_eq!(err, StudyError::Csv { line: 2, column: 9, message: "y_m: \"abc\" is not a finite number".into() });
    let err = parse_measured_flights("flight,speed,spin_rps\n").unwrap_err();
    assert!(matches!(err, StudyError::Csv { line: 1, column: 2, .. }), "{err}");
    let err = parse_measured_flights(&format!("{header}a,20,15,10,0,0,3.1,60,2\na,21,15,10,0,0,3.1,60,2\n")).unwrap_err();
    assert!(matches!(err, StudyError::Csv { line: 3, .. }), "{err}");
    let err = parse_measured_flights(&format!("{header}a,20,15,10,0\n")).unwrap_err();
    assert!(matches!(err, StudyError::Csv { line: 2, column: 0, .. }), "{err}");
}

/// The demo driver's static coefficients tabulated every 5° from −30° to 60° (no rate terms).
fn tabulated_driver() -> TabulatedCoefficients {
    let d = demo_driver();
    let alpha: Vec<f64> = (-6..=12).map(|k| f64::from(k * 5).to_radians()).collect();
    let columns = CoefficientColumns {
        lift: alpha.iter().map(|a| d.lift(*a)).collect(),
        drag: alpha.iter().map(|a| d.drag(*a)).collect(),
        pitch: alpha.iter().map(|a| d.static_pitch(*a)).collect(),
        roll: None,
        spin: None,
    };
    let info = ModelInfo { name: "tabulated demo driver".into(), source: "invented for demos".into(), confidence: "demo".into() };
    TabulatedCoefficients::new(info, alpha, columns).unwrap()
}

#[test]
fn recovers_scale_factors_of_a_tabulated_set() {
    let table = tabulated_driver();
    let truth_case = StudyCase::new(CaseDisc::Body { body: demo_body() }, CaseModel::tabulated(table.clone()), release(22.0));
    let mut rng = ChaCha8Rng::seed_from_u64(99);
    let noise = Normal::new(0.0, POSITION_SD_M).unwrap();
    let flights: Vec<MeasuredFlight> = releases()
        .into_iter()
        .enumerate()
        .map(|(k, r)| {
            let outcome = StudyCase { release: r, ..truth_case.clone() }.run().unwrap();
            let [x, y] = outcome.landing_m();
            let time_s = outcome.metrics.time_aloft_s + Normal::new(0.0, TIME_SD_S).unwrap().sample(&mut rng);
            let landing_m = [x + noise.sample(&mut rng), y + noise.sample(&mut rng)];
            MeasuredFlight { label: format!("t{k}"), release: r, observations: vec![Observation::Landing { time_s, landing_m }] }
        })
        .collect();
    let mut start = truth_case.clone();
    start.set("model.lift_scale", 0.9).unwrap();
    start.set("model.drag_scale", 1.2).unwrap();
    let result = calibrate(&start, &flights, &spec(&["model.lift_scale", "model.drag_scale"]), StudyControl::none()).unwrap();
    // source: common practice, no published source (least squares recovers the truth within
    // 2 standard errors about 95 % of the time per coefficient).
    for p in &result.parameters {
        assert!((p.value - 1.0).abs() < 2.0 * p.standard_error && p.standard_error < 0.05, "{p:?}");
    }
}
