//! The C ABI beside the direct Rust call, for the same states.
//!
//! The `extern "C"` functions are called from Rust through the ffi crate's
//! rlib, so what is measured is the ABI layer itself: argument decoding and
//! checks, the panic boundary, the size-prefixed copy into the caller's
//! struct and the status. It does not include the dynamic-linker
//! indirection (PLT) a C program calling libebullio_c.so pays, about a
//! nanosecond, nor cross-language inlining, which a C caller never gets.
//!
//! Run with `cargo bench -p ebullio-benches --bench c_abi`.

use std::hint::black_box;
use std::mem::size_of;
use std::ptr;

use criterion::{criterion_group, criterion_main, BenchmarkGroup, Criterion, Throughput};
use ebullio::{Method, State, Units};
use ebullio_benches::states;
use ebullio_c::{EbullioInputPair as Pair, EbullioProperty as Prop, EbullioState};

type Group<'a> = BenchmarkGroup<'a, criterion::measurement::WallTime>;

/// A benchmark case: its name, its states and the pair they are given in.
type Case<'a> = (&'a str, &'a [(f64, f64)], Pair);

fn over<R>(group: &mut Group, name: &str, inputs: &[(f64, f64)], f: impl Fn(f64, f64) -> R) {
    group.bench_function(name, |b| {
        b.iter(|| {
            for &(x, y) in black_box(inputs) {
                black_box(f(black_box(x), black_box(y)));
            }
        })
    });
}

fn blank() -> EbullioState {
    EbullioState {
        size: size_of::<EbullioState>() as u32,
        units: ebullio_c::EbullioUnits::Native,
        region: ebullio_c::EbullioRegion::One,
        phase: ebullio_c::EbullioPhase::CompressedLiquid,
        pressure: 0.0,
        temperature: 0.0,
        specific_volume: 0.0,
        density: 0.0,
        internal_energy: 0.0,
        enthalpy: 0.0,
        entropy: 0.0,
        isobaric_heat_capacity: 0.0,
        isochoric_heat_capacity: 0.0,
        speed_of_sound: 0.0,
        quality: 0.0,
        expansion_coefficient: 0.0,
        compressibility: 0.0,
        gibbs_energy: 0.0,
        helmholtz_energy: 0.0,
    }
}

fn c_solve(pair: Pair, a: f64, b: f64) -> f64 {
    let mut s = blank();
    // SAFETY: `s` is a whole EbullioState with its size set; no detail.
    let status =
        unsafe { ebullio_c::ebullio_solve(pair as u32, a, b, 0, 0, &mut s, ptr::null_mut()) };
    assert_eq!(status, ebullio_c::EbullioStatus::Ok);
    s.enthalpy
}

fn c_property(property: Prop, pair: Pair, a: f64, b: f64) -> f64 {
    let mut status = ebullio_c::EbullioStatus::Panic;
    // SAFETY: `status` is a writable status.
    unsafe { ebullio_c::ebullio_property(property as u32, pair as u32, a, b, 0, 0, &mut status) }
}

fn groups(c: &mut Criterion) {
    let ph1: Vec<(f64, f64)> = states::REGION1
        .iter()
        .map(|&(p, t)| (p, State::from_pt(p, t, Units::Native).unwrap().enthalpy()))
        .collect();
    let cases: [Case; 4] = [
        ("region1_pt", &states::REGION1, Pair::PressureTemperature),
        ("region2_pt", &states::REGION2, Pair::PressureTemperature),
        ("region3_pt", &states::REGION3, Pair::PressureTemperature),
        ("region1_ph", &ph1, Pair::PressureEnthalpy),
    ];
    for (name, inputs, pair) in cases {
        let core_pair = ebullio::InputPair::from_number(pair as u32).unwrap();
        // The same numbers both ways, before timing either.
        for &(a, b) in inputs {
            let rust = State::solve(core_pair, a, b, Units::Native, Method::Exact).unwrap();
            assert_eq!(rust.enthalpy().to_bits(), c_solve(pair, a, b).to_bits());
        }
        let mut g = c.benchmark_group(format!("c_abi/{name}"));
        g.throughput(Throughput::Elements(inputs.len() as u64));
        over(&mut g, "rust_state_solve", inputs, |a, b| {
            State::solve(core_pair, a, b, Units::Native, Method::Exact)
        });
        over(&mut g, "rust_state_solve_read_all", inputs, |a, b| {
            // What ebullio_solve hands back: every property in the caller's units.
            State::solve(core_pair, a, b, Units::Native, Method::Exact)
                .map(|s| ebullio::Property::ALL.map(|p| s.get(p).unwrap_or(f64::NAN)))
        });
        over(&mut g, "c_ebullio_solve", inputs, |a, b| {
            c_solve(pair, a, b)
        });
        over(&mut g, "rust_get_density", inputs, |a, b| {
            State::solve(core_pair, a, b, Units::Native, Method::Exact)
                .map(|s| s.density())
                .unwrap_or(f64::NAN)
        });
        over(&mut g, "c_ebullio_property_density", inputs, |a, b| {
            c_property(Prop::Density, pair, a, b)
        });
        g.finish();
    }

    let mut g = c.benchmark_group("c_abi/enthalpy_pt");
    let inputs = &states::REGION1;
    g.throughput(Throughput::Elements(inputs.len() as u64));
    over(&mut g, "rust_enthalpy_from_pt", inputs, |p, t| {
        ebullio::enthalpy_from_pt(p, t, Units::Native)
    });
    over(&mut g, "c_ebullio_property_enthalpy", inputs, |p, t| {
        c_property(Prop::Enthalpy, Pair::PressureTemperature, p, t)
    });
    g.finish();

    // A historian batch: 8 × 128 states, one property, per element.
    let (ps, ts): (Vec<f64>, Vec<f64>) = states::REGION2.iter().cycle().take(1024).copied().unzip();
    let mut out = vec![0.0; ps.len()];
    let mut statuses = vec![ebullio_c::EbullioStatus::Panic; ps.len()];
    let mut g = c.benchmark_group("c_abi/array_enthalpy_region2");
    g.throughput(Throughput::Elements(ps.len() as u64));
    g.bench_function("rust_loop", |b| {
        b.iter(|| {
            for ((o, &p), &t) in out.iter_mut().zip(&ps).zip(&ts) {
                *o = ebullio::enthalpy_from_pt(p, t, Units::Native).unwrap_or(f64::NAN);
            }
            black_box(&out);
        })
    });
    g.bench_function("c_ebullio_property_array", |b| {
        b.iter(|| {
            // SAFETY: four arrays of ps.len() elements each.
            let status = unsafe {
                ebullio_c::ebullio_property_array(
                    Prop::Enthalpy as u32,
                    Pair::PressureTemperature as u32,
                    ps.as_ptr(),
                    ts.as_ptr(),
                    ps.len(),
                    0,
                    0,
                    out.as_mut_ptr(),
                    statuses.as_mut_ptr(),
                )
            };
            black_box((status, &out));
        })
    });
    g.finish();
}

criterion_group!(benches, groups);
criterion_main!(benches);
