//! Measured-data calculations, per element: each figure set alone and
//! with its uncertainty budget (the GUM propagation through the engine's
//! exact derivatives).
//!
//! Run with `cargo bench -p ebullio-benches --bench measured`.

use std::hint::black_box;
use std::time::Duration;

use criterion::{criterion_group, criterion_main, Criterion};
use ebullio::measured::{Calculation, Measured, SectionTest};
use ebullio::Units;

/// The demo unit's HP section (DESIGN.md's invented plant, metric
/// engineering units), readings with typical test-grade uncertainties.
fn hp_section() -> SectionTest {
    SectionTest {
        inlet_pressure: Measured::new(167.0, 0.25),
        inlet_temperature: Measured::split(538.0, 1.0, 0.2),
        exhaust_pressure: Measured::new(40.0, 0.08),
        exhaust_temperature: Measured::split(335.0, 1.0, 0.2),
    }
}

fn measured(c: &mut Criterion) {
    let mut group = c.benchmark_group("measured");
    let units = Units::MetricEngineering;
    let section = hp_section();
    group.bench_function("section_efficiency", |b| {
        b.iter(|| {
            black_box(&section)
                .evaluate(units)
                .map(|r| r.figures.isentropic_efficiency)
        })
    });
    group.bench_function("section_efficiency_with_uncertainty", |b| {
        b.iter(|| {
            black_box(&section)
                .evaluate_with_uncertainty(units, 2.0)
                .map(|r| r.figures.isentropic_efficiency.standard_uncertainty)
        })
    });
    group.finish();
}

criterion_group! {
    name = benches;
    config = Criterion::default()
        .warm_up_time(Duration::from_millis(500))
        .measurement_time(Duration::from_secs(2));
    targets = measured
}
criterion_main!(benches);
