//! Speed of every input pair, per region, exact beside strict
//! (`Method::BackwardOnly`), and of wet steam.
//!
//! The inputs are the (p, T) states of `ebullio_benches::states` turned
//! into each pair's values once, before timing; one benchmark walks the
//! eight states of a region, and the throughput is set per call.
//!
//! Run with `cargo bench -p ebullio-benches --bench pairs`.

use std::hint::black_box;
use std::time::Duration;

use criterion::{criterion_group, criterion_main, Criterion, Throughput};
use ebullio::{InputPair, Method, State, Units};
use ebullio_benches::states;

/// The pair's two values at a (p, T) state.
fn values(pair: InputPair, s: &State) -> (f64, f64) {
    match pair {
        InputPair::PressureTemperature => (s.pressure(), s.temperature()),
        InputPair::PressureEnthalpy => (s.pressure(), s.enthalpy()),
        InputPair::PressureEntropy => (s.pressure(), s.entropy()),
        InputPair::EnthalpyEntropy => (s.enthalpy(), s.entropy()),
        InputPair::DensityTemperature => (s.density(), s.temperature()),
        InputPair::VolumeTemperature => (s.specific_volume(), s.temperature()),
        InputPair::VolumeInternalEnergy => (s.specific_volume(), s.internal_energy()),
        InputPair::PressureQuality | InputPair::TemperatureQuality => {
            unreachable!("single-phase states only")
        }
    }
}

const SINGLE_PHASE_PAIRS: [InputPair; 7] = [
    InputPair::PressureTemperature,
    InputPair::PressureEnthalpy,
    InputPair::PressureEntropy,
    InputPair::EnthalpyEntropy,
    InputPair::DensityTemperature,
    InputPair::VolumeTemperature,
    InputPair::VolumeInternalEnergy,
];

fn pairs(c: &mut Criterion) {
    let regions = [
        ("region1", &states::REGION1),
        ("region2", &states::REGION2),
        ("region3", &states::REGION3),
        ("region5", &states::REGION5),
    ];
    for (region, points) in regions {
        let mut group = c.benchmark_group(format!("pairs/{region}"));
        group.throughput(Throughput::Elements(points.len() as u64));
        for pair in SINGLE_PHASE_PAIRS {
            let inputs: Vec<(f64, f64)> = points
                .iter()
                .map(|&(p, t)| values(pair, &State::from_pt(p, t, Units::Native).unwrap()))
                .collect();
            let methods: &[(&str, Method)] = match pair {
                InputPair::PressureEnthalpy
                | InputPair::PressureEntropy
                | InputPair::EnthalpyEntropy => {
                    &[("exact", Method::Exact), ("strict", Method::BackwardOnly)]
                }
                _ => &[("exact", Method::Exact)],
            };
            for &(label, method) in methods {
                group.bench_function(format!("{pair:?}/{label}"), |b| {
                    b.iter(|| {
                        for &(x, y) in black_box(&inputs) {
                            black_box(State::solve(
                                pair,
                                black_box(x),
                                black_box(y),
                                Units::Native,
                                method,
                            ))
                            .ok();
                        }
                    })
                });
            }
        }
        group.finish();
    }

    // Wet steam: quality 0.1 … 0.8 at 0.01 and 1 MPa and in region 3's part
    // of the dome (20 MPa).
    let mut group = c.benchmark_group("pairs/wet");
    for p in [0.01, 1.0, 20.0] {
        let wet: Vec<State> = (1..=8)
            .map(|k| State::from_px(p, 0.1 * f64::from(k), Units::Native).unwrap())
            .collect();
        group.throughput(Throughput::Elements(wet.len() as u64));
        for (name, pair) in [
            ("PressureEnthalpy", InputPair::PressureEnthalpy),
            ("EnthalpyEntropy", InputPair::EnthalpyEntropy),
            ("VolumeInternalEnergy", InputPair::VolumeInternalEnergy),
            ("DensityTemperature", InputPair::DensityTemperature),
            ("VolumeTemperature", InputPair::VolumeTemperature),
        ] {
            let inputs: Vec<(f64, f64)> = wet
                .iter()
                .map(|s| match pair {
                    InputPair::PressureEnthalpy => (s.pressure(), s.enthalpy()),
                    InputPair::EnthalpyEntropy => (s.enthalpy(), s.entropy()),
                    InputPair::VolumeInternalEnergy => (s.specific_volume(), s.internal_energy()),
                    InputPair::VolumeTemperature => (s.specific_volume(), s.temperature()),
                    _ => (s.density(), s.temperature()),
                })
                .collect();
            group.bench_function(format!("{name}/{p}MPa"), |b| {
                b.iter(|| {
                    for &(x, y) in black_box(&inputs) {
                        black_box(State::solve(
                            pair,
                            black_box(x),
                            black_box(y),
                            Units::Native,
                            Method::Exact,
                        ))
                        .ok();
                    }
                })
            });
        }
        group.bench_function(format!("PressureQuality/{p}MPa"), |b| {
            b.iter(|| {
                for k in 1..=8 {
                    black_box(State::from_px(
                        black_box(p),
                        0.1 * f64::from(k),
                        Units::Native,
                    ))
                    .ok();
                }
            })
        });
    }
    group.finish();
}

criterion_group! {
    name = benches;
    config = Criterion::default()
        .warm_up_time(Duration::from_millis(500))
        .measurement_time(Duration::from_secs(1))
        .sample_size(20);
    targets = pairs
}
criterion_main!(benches);
