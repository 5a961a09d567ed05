//! Determinism: the same seed gives bitwise-identical results with 1 and 2 threads, and as 1 or
//! 4 shards merged (compared through exact, round-tripping JSON of every number).
use super::*;

fn pool(threads: usize) -> rayon::ThreadPool {
    rayon::ThreadPoolBuilder::new().num_threads(threads).build().unwrap()
}

fn exact<T: serde::Serialize>(value: &T) -> String {
    serde_json::to_string(value).unwrap()
}

fn scatter_spec(throws: usize) -> DispersionSpec {
    DispersionSpec {
        throws,
        seed: 2026,
        scatter: vec![
            Scatter { input: "throw.speed_mps".into(), spread: Spread::Normal { sd: 1.0 } },
            Scatter { input: "throw.launch_deg".into(), spread: Spread::Normal { sd: 1.5 } },
            Scatter { input: "throw.hyzer_deg".into(), spread: Spread::Uniform { half_width: 5.0 } },
        ],
        gust_intensity: Some(0.2),
        zones: vec![Zone::Circle { centre_m: [70.0, 5.0], radius_m: 10.0 }],
    }
}

fn windy_case() -> StudyCase {
    let mut case = demo_case();
    case.set("env.wind_mps", 3.0).unwrap();
    case.set("env.wind_from_deg", 45.0).unwrap();
    case
}

#[test]
fn dispersion_is_bitwise_the_same_on_one_and_two_threads_and_in_four_shards() {
    let (case, spec) = (windy_case(), scatter_spec(24));
    let one = pool(1).install(|| run_dispersion(&case, &spec, Shard::whole(), StudyControl::none())).unwrap();
    let two = pool(2).install(|| run_dispersion(&case, &spec, Shard::whole(), StudyControl::none())).unwrap();
    assert_eq!(exact(&one), exact(&two));
    let parts: Vec<DispersionResult> = (0..4)
        .map(|i| pool(2).install(|| run_dispersion(&case, &spec, Shard::new(i, 4).unwrap(), StudyControl::none())).unwrap())
        .collect();
    assert!(parts.iter().all(|p| p.summary.is_none() && p.rows.len() == 6));
    let json_parts: Vec<DispersionResult> = parts.iter().map(|p| serde_json::from_str(&exact(p)).unwrap()).collect();
    let merged = merge_dispersions(&json_parts).unwrap();
    assert_eq!(exact(&merged), exact(&one));
    let summary = one.summary.unwrap();
    assert_eq!(summary.flown + summary.failed, 24);
    assert!(summary.landing.unwrap().sd_m[1] > 0.5, "the scatter spreads the landings");
    assert_eq!(summary.caution, SAFETY_CAUTION);
}

#[test]
fn merging_refuses_missing_or_foreign_shards() {
    let (case, spec) = (demo_case(), scatter_spec(4));
    let a = run_dispersion(&case, &spec, Shard::new(0, 2).unwrap(), StudyControl::none()).unwrap();
    assert!(matches!(merge_dispersions(std::slice::from_ref(&a)), Err(StudyError::Shards { .. })));
    let other = run_dispersion(&case, &DispersionSpec { seed: 7, ..spec }, Shard::new(1, 2).unwrap(), StudyControl::none()).unwrap();
    assert!(matches!(merge_dispersions(&[a, other]), Err(StudyError::Shards { .. })));
    assert!(Shard::new(4, 4).is_err());
}

#[test]
fn sweep_is_bitwise_the_same_on_one_and_two_threads_and_in_four_shards() {
    let case = design_case();
    let spec = SweepSpec {
        axes: vec![SweepAxis::range("layup.split_radius_cm", 8.0, 10.0, 3).unwrap(), SweepAxis::values("throw.speed_mps", vec![20.0, 24.0])],
        metrics: vec!["carry_m".into(), "turn_m".into(), "landing_lateral_m".into()],
    };
    let one = pool(1).install(|| run_sweep(&case, &spec, Shard::whole(), StudyControl::none())).unwrap();
    let two = pool(2).install(|| run_sweep(&case, &spec, Shard::whole(), StudyControl::none())).unwrap();
    assert_eq!(exact(&one), exact(&two));
    let parts: Vec<SweepResult> = (0..4).map(|i| run_sweep(&case, &spec, Shard::new(i, 4).unwrap(), StudyControl::none()).unwrap()).collect();
    assert_eq!(exact(&merge_sweeps(&parts).unwrap()), exact(&one));
    assert!(one.rows.iter().all(|r| r.error.is_none()), "{:?}", one.rows);
}

#[test]
fn shards_parse_from_i_of_n_text() {
    let shard: Shard = "2/4".parse().unwrap();
    assert_eq!(shard, Shard::new(2, 4).unwrap());
    assert_eq!(shard.to_string(), "2/4");
    assert_eq!(shard.indices(11), vec![2, 6, 10]);
    for bad in ["4/4", "1/0", "x/2", "3"] {
        assert!(matches!(bad.parse::<Shard>(), Err(StudyError::InvalidSpec { .. })), "{bad}");
    }
}

#[test]
fn a_case_survives_a_json_round_trip_and_flies_the_same() {
    let case = design_case();
    let back: StudyCase = serde_json::from_str(&exact(&case)).unwrap();
    assert_eq!(exact(&back.run().unwrap()), exact(&case.run().unwrap()));
}

#[test]
fn cancelling_from_the_progress_callback_stops_a_dispersion_between_flights() {
    let cancel = std::sync::atomic::AtomicBool::new(false);
    let stop_after_three = |done: usize, _total: usize| {
        if done >= 3 {
            cancel.store(true, std::sync::atomic::Ordering::Relaxed);
        }
    };
    let control = StudyControl::none().with_cancel(&cancel).with_progress(&stop_after_three);
    let err = pool(1).install(|| run_dispersion(&demo_case(), &scatter_spec(50), Shard::whole(), control)).unwrap_err();
    assert_eq!(err, StudyError::Cancelled { done: 3, total: 50 });
}
