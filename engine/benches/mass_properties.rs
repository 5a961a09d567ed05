//! Mass properties of a 2,000-vertex outline: the polygon integrals alone, whole breakdowns
//! with one and two materials (clipping and coverage checks included), and outline validation.
//! Run: `cargo bench -p spinfoil-engine --bench mass_properties`; compare the figures as
//! ratios within one run.
use criterion::{black_box, criterion_group, criterion_main, Criterion};
use spinfoil_engine::*;
use std::f64::consts::TAU;

/// An elliptical section of `n` vertices centred at r = 60 mm, 90 mm wide and 14 mm tall.
fn section(n: usize) -> Vec<RzPoint> {
    (0..n)
        .map(|k| {
            let t = TAU * k as f64 / n as f64;
            RzPoint::new(0.06 + 0.045 * t.cos(), 0.008 + 0.007 * t.sin())
        })
        .collect()
}

fn bench(c: &mut Criterion) {
    let points = section(2000);
    let outline = Outline::from_points(points.clone()).expect("valid section");
    let base = Material::from_g_cm3("base blend", 0.95).expect("valid");
    let dense = Material::from_g_cm3("dense rim blend", 1.28).expect("valid");
    let single = Layup::single(base.clone());
    let overmold = Layup::overmold(base, dense, 0.09);
    let mut group = c.benchmark_group("mass_properties_2000_vertices");
    group.bench_function("polygon_integrals", |b| b.iter(|| SectionMoments::of_polygon(black_box(outline.points()))));
    group.bench_function("breakdown_single", |b| b.iter(|| mass_breakdown(black_box(&outline), &single)));
    group.bench_function("breakdown_overmold", |b| b.iter(|| mass_breakdown(black_box(&outline), &overmold)));
    group.bench_function("validate_outline", |b| b.iter(|| Outline::from_points(black_box(points.clone()))));
    group.finish();
}

criterion_group!(benches, bench);
criterion_main!(benches);
