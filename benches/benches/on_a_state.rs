//! What is computed on top of an existing state (solved once, outside the
//! timing): an arbitrary partial derivative, single phase and wet steam,
//! and the transport properties.
//!
//! Run with `cargo bench -p ebullio-benches --bench on_a_state`.

use std::hint::black_box;
use std::time::Duration;

use criterion::{criterion_group, criterion_main, Criterion, Throughput};
use ebullio::{State, Units, Variable};
use ebullio_benches::states;

fn on_a_state(c: &mut Criterion) {
    let mut group = c.benchmark_group("derivatives");
    let single: Vec<State> = states::REGION1
        .iter()
        .chain(states::REGION2.iter())
        .map(|&(p, t)| State::from_pt(p, t, Units::Native).unwrap())
        .collect();
    group.throughput(Throughput::Elements(single.len() as u64));
    group.bench_function("single_phase/(drho/dp)_h", |b| {
        b.iter(|| {
            for s in black_box(&single) {
                black_box(s.derivative(Variable::Density, Variable::Pressure, Variable::Enthalpy))
                    .ok();
            }
        })
    });
    group.bench_function("single_phase/joule_thomson", |b| {
        b.iter(|| {
            for s in black_box(&single) {
                black_box(s.joule_thomson_coefficient()).ok();
            }
        })
    });
    let wet: Vec<State> = (1..=8)
        .map(|k| State::from_px(1.0, 0.1 * f64::from(k), Units::Native).unwrap())
        .collect();
    group.throughput(Throughput::Elements(wet.len() as u64));
    group.bench_function("wet_1MPa/(drho/dp)_h", |b| {
        b.iter(|| {
            for s in black_box(&wet) {
                black_box(s.derivative(Variable::Density, Variable::Pressure, Variable::Enthalpy))
                    .ok();
            }
        })
    });
    group.finish();

    let mut group = c.benchmark_group("transport");
    group.throughput(Throughput::Elements(single.len() as u64));
    group.bench_function("viscosity", |b| {
        b.iter(|| {
            for s in black_box(&single) {
                black_box(s.viscosity()).ok();
            }
        })
    });
    group.bench_function("thermal_conductivity", |b| {
        b.iter(|| {
            for s in black_box(&single) {
                black_box(s.thermal_conductivity()).ok();
            }
        })
    });
    group.bench_function("prandtl_number", |b| {
        b.iter(|| {
            for s in black_box(&single) {
                black_box(s.prandtl_number()).ok();
            }
        })
    });
    group.finish();
}

criterion_group! {
    name = benches;
    config = Criterion::default()
        .warm_up_time(Duration::from_millis(500))
        .measurement_time(Duration::from_secs(1))
        .sample_size(20);
    targets = on_a_state
}
criterion_main!(benches);
