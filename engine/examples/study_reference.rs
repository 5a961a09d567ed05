//! Prints, as JSON, numbers of Spinfoil's studies for the checks and benchmarks in Python.
//!
//! - `cargo run --release -p spinfoil-engine --example study_reference` prints 2,000 landing
//!   points of a synthetic "flight" linear in two normal inputs (seeded), with Spinfoil's
//!   scatter statistics of them, for `tests/test_study_reference.py` (NumPy's `cov` and `eigh`).
//! - `... -- bench-throws N` prints the first N throws of the benchmark dispersion
//!   ([`bench_case`], [`bench_spec`]) as records for the SciPy flight reference
//!   (`tests/flight_reference.py`), used by `scripts/bench-study`.
use rand_distr::{Distribution, StandardNormal};
use serde_json::{json, Value};
use spinfoil_engine::*;

/// The benchmark's case: the invented demo driver (0.211 m, 0.172 kg), a right-hand backhand at
/// 22 m/s and 95 rad/s, launch 10°, nose 1°, flat, from 1 m, calm sea-level air.
pub fn bench_case() -> StudyCase {
    let body = DiscBody { mass_kg: 0.172, spin_inertia_kg_m2: 0.00142, transverse_inertia_kg_m2: 0.00075, diameter_m: 0.211 };
    let release = ReleasePose { launch_rad: 10f64.to_radians(), nose_rad: 1f64.to_radians(), ..ReleasePose::default() }
        .with_speed_and_spin(22.0, 95.0);
    StudyCase::new(CaseDisc::Body { body }, CaseModel::linear(demo_driver()), release)
}

/// The benchmark's dispersion: a player's scatter (invented: speed ±1 m/s, spin ±1 rev/s,
/// launch ±1.5°, nose ±1°, hyzer ±4°, heading ±2°, all normal), seed 2026.
pub fn bench_spec(throws: usize) -> DispersionSpec {
    let normal = |input: &str, sd: f64| Scatter { input: input.into(), spread: Spread::Normal { sd } };
    DispersionSpec {
        throws,
        seed: 2026,
        scatter: vec![
            normal("throw.speed_mps", 1.0),
            normal("throw.spin_rps", 1.0),
            normal("throw.launch_deg", 1.5),
            normal("throw.nose_deg", 1.0),
            normal("throw.hyzer_deg", 4.0),
            normal("throw.heading_deg", 2.0),
        ],
        gust_intensity: None,
        zones: vec![Zone::Circle { centre_m: [75.0, 0.0], radius_m: 10.0 }],
    }
}

fn linear_points(n: usize) -> Vec<[f64; 2]> {
    let rows = monte_carlo(n, 31, Shard::whole(), StudyControl::none(), |rng| {
        let z: [f64; 2] = [StandardNormal.sample(rng), StandardNormal.sample(rng)];
        let landing_m = [70.0 + 5.0 * z[0] + 2.0 * z[1], -3.0 - 1.5 * z[0] + 2.5 * z[1]];
        Ok(DrawOutcome { landing_m, rest_m: None, carry_m: 0.0, time_aloft_s: 0.0 })
    })
    .expect("a test function cannot fail");
    rows.iter().filter_map(|r| r.outcome.map(|o| o.landing_m)).collect()
}

fn bench_records(n: usize) -> Value {
    let (case, spec) = (bench_case(), bench_spec(n));
    let CaseDisc::Body { body } = case.disc else { unreachable!("the bench case is a body") };
    let CaseModel { base: BaseModel::Linear { set }, .. } = &case.model else { unreachable!("the bench set is linear") };
    let air = case.air.build().expect("standard air");
    let records: Vec<Value> = (0..n)
        .map(|k| {
            let drawn = spec.draw_case(&case, &mut draw_rng(spec.seed, k)).expect("valid scatter");
            json!({
                "body": body, "model": set, "air": air, "wind_mps": [0.0, 0.0, 0.0],
                "gravity_mps2": STANDARD_GRAVITY_MPS2, "release": drawn.release,
                "fade_side": drawn.release.fade_side(),
                "relative_tolerance": case.flight_settings.relative_tolerance,
                "absolute_tolerance": case.flight_settings.absolute_tolerance,
            })
        })
        .collect();
    json!({ "throws": records })
}

fn main() {
    let args: Vec<String> = std::env::args().skip(1).collect();
    if args.first().map(String::as_str) == Some("bench-throws") {
        let n = args.get(1).and_then(|a| a.parse().ok()).unwrap_or(200);
        println!("{}", bench_records(n));
        return;
    }
    let points = linear_points(2_000);
    let stats = scatter_stats(&points).expect("2,000 points");
    println!("{}", json!({ "points": points, "stats": stats, "chi2_50": CHI2_2DOF_50, "chi2_95": CHI2_2DOF_95 }));
}
