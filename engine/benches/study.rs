//! Dispersion benchmark: a 10,000-throw study on a 2-thread pool, and the first 200 throws of
//! the same study on 1 and 2 threads, timed once each after a warm-up (a study is long enough
//! that one timing is stable to a few per cent). Prints one JSON line.
//!
//! `scripts/bench-study` runs this and the SciPy flight reference (`tests/flight_reference.py`)
//! on the same 200 throws in the same run, and prints the ratio.
use std::time::Instant;

use spinfoil_engine::*;

#[allow(dead_code)] // reason: the example's file is shared for its study definitions; its main() is unused here
#[path = "../examples/study_reference.rs"]
mod study_reference;

fn timed(threads: usize, throws: usize) -> (f64, DispersionResult) {
    let pool = rayon::ThreadPoolBuilder::new().num_threads(threads).build().expect("a thread pool");
    let (case, spec) = (study_reference::bench_case(), study_reference::bench_spec(throws));
    let start = Instant::now();
    let result = pool.install(|| run_dispersion(&case, &spec, Shard::whole(), StudyControl::none())).expect("the bench study runs");
    (start.elapsed().as_secs_f64(), result)
}

fn main() {
    timed(2, 200);
    let (big_s, big) = timed(2, 10_000);
    let (one_s, _) = timed(1, 200);
    let (two_s, _) = timed(2, 200);
    let summary = big.summary.expect("a whole study has a summary");
    let landing = summary.landing.expect("landings");
    println!(
        "{}",
        serde_json::json!({
            "throws_10000_2_threads_s": big_s,
            "throws_200_1_thread_s": one_s,
            "throws_200_2_threads_s": two_s,
            "flown": summary.flown,
            "failed": summary.failed,
            "mean_carry_m": summary.mean_carry_m,
            "ellipse_95_semi_axes_m": [landing.ellipse_95.semi_major_m, landing.ellipse_95.semi_minor_m],
        })
    );
}
