//! The batch kernels beside the scalar loop, per element on one core: an
//! array of 4096 states (the eight representative states of a region,
//! repeated) through `State::from_pt` one by one, and through the batch on
//! every instruction set this machine supports (the detected one is what
//! the array calls use). Full state, enthalpy alone, and both saturated
//! phases from T. Every result is read, as an array call writes it.
//!
//! Run with `cargo bench -p ebullio-benches --bench batch`.

use std::hint::black_box;

use criterion::{criterion_group, criterion_main, Criterion, Throughput};
use ebullio::batch::Dispatch;
use ebullio::{Saturation, State, Units};
use ebullio_benches::states;

/// Elements per array.
const LEN: usize = 4096;

/// What an array call reads off a state: a few properties, summed.
fn read(state: &State) -> f64 {
    state.enthalpy() + state.entropy() + state.specific_volume()
}

fn groups(c: &mut Criterion) {
    let units = Units::Native;
    let regions = [
        ("region1", &states::REGION1),
        ("region2", &states::REGION2),
        ("region5", &states::REGION5),
    ];
    let variants: Vec<Dispatch> = Dispatch::ALL
        .into_iter()
        .filter(|d| d.is_supported())
        .collect();
    for (name, points) in regions {
        let inputs: Vec<(f64, f64)> = (0..LEN).map(|k| points[k % 8]).collect();
        let mut g = c.benchmark_group(format!("batch/{name}"));
        g.throughput(Throughput::Elements(LEN as u64));
        g.bench_function("full_state_scalar_loop", |b| {
            b.iter(|| {
                let mut sum = 0.0;
                for &(p, t) in black_box(&inputs) {
                    sum += read(&State::from_pt(p, t, units).unwrap());
                }
                sum
            })
        });
        g.bench_function("enthalpy_scalar_loop", |b| {
            b.iter(|| {
                let mut sum = 0.0;
                for &(p, t) in black_box(&inputs) {
                    sum += ebullio::enthalpy_from_pt(p, t, units).unwrap();
                }
                sum
            })
        });
        for &d in &variants {
            g.bench_function(format!("full_state_batch_{d:?}"), |b| {
                b.iter(|| {
                    let mut sum = 0.0;
                    d.states_from_pt(black_box(&inputs).iter().copied(), units, |_, s| {
                        sum += read(&s.unwrap())
                    });
                    sum
                })
            });
            g.bench_function(format!("enthalpy_batch_{d:?}"), |b| {
                b.iter(|| {
                    let mut sum = 0.0;
                    d.enthalpies_from_pt(black_box(&inputs).iter().copied(), units, |_, h| {
                        sum += h.unwrap()
                    });
                    sum
                })
            });
        }
        g.finish();
    }
    let temperatures: Vec<f64> = (0..LEN).map(|k| 280.0 + (k % 64) as f64 * 5.0).collect();
    let mut g = c.benchmark_group("batch/saturation_at_temperature");
    g.throughput(Throughput::Elements(LEN as u64));
    let both = |s: &Saturation| read(s.liquid()) + read(s.vapour());
    g.bench_function("scalar_loop", |b| {
        b.iter(|| {
            let mut sum = 0.0;
            for &t in black_box(&temperatures) {
                sum += both(&Saturation::at_temperature(t, units).unwrap());
            }
            sum
        })
    });
    for &d in &variants {
        g.bench_function(format!("batch_{d:?}"), |b| {
            b.iter(|| {
                let mut sum = 0.0;
                d.saturation_at_temperatures(
                    black_box(&temperatures).iter().copied(),
                    units,
                    |_, s| sum += both(&s.unwrap()),
                );
                sum
            })
        });
    }
    g.finish();
}

criterion_group!(benches, groups);
criterion_main!(benches);
