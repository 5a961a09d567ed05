//! Flights per second for a typical 6–7 s flight (the `typical` throw of the
//! `reference_flights` example: the invented demo driver, 22 m/s, 95 rad/s, about 6.1 s aloft).
//!
//! `scripts/bench-flight` runs this and times the SciPy reference on the same throw in the same
//! run, printing both rates and their ratio.
use criterion::{criterion_group, criterion_main, Criterion};
use spinfoil_engine::*;

#[allow(dead_code)] // reason: the example's file is shared for its throw definitions; its main() is unused here
#[path = "../examples/reference_flights.rs"]
mod reference_flights;

fn typical_flight(c: &mut Criterion) {
    let throw = reference_flights::typical_throw();
    let conditions = throw.conditions();
    let metrics_only = FlightSettings { record_samples: false, ..FlightSettings::default() };
    let sampled = FlightSettings::default();
    let mut group = c.benchmark_group("flight");
    group.bench_function("typical_metrics_only", |b| {
        b.iter(|| fly(&throw.body, &throw.model, &throw.release, &conditions, &metrics_only).map(|f| f.metrics.carry_m))
    });
    group.bench_function("typical_with_10ms_samples", |b| {
        b.iter(|| fly(&throw.body, &throw.model, &throw.release, &conditions, &sampled).map(|f| f.samples.len()))
    });
    group.finish();
}

criterion_group!(benches, typical_flight);
criterion_main!(benches);
