//! Property evaluation speed, the core against the straightforward baseline
//! of `ebullio_benches::baseline`, in one run.
//!
//! Every benchmark walks a fixed array of eight representative states of
//! its region (`ebullio_benches::states`), so branches and the region
//! search see varied inputs; the throughput is set to the number of calls,
//! so criterion's time divided by eight (or its element rate) is the time
//! per call.
//!
//! Run with `cargo bench -p ebullio-benches`; a name filter after `--`
//! selects groups, e.g. `cargo bench -p ebullio-benches -- region1`.

use std::hint::black_box;
use std::time::Duration;

use criterion::{criterion_group, criterion_main, BenchmarkGroup, Criterion, Throughput};
use ebullio::{region1, region2, region3, region5, Saturation, State, Units};
use ebullio_benches::{baseline, states};

type Group<'a> = BenchmarkGroup<'a, criterion::measurement::WallTime>;

/// Benchmarks `f` over every (a, b) pair of `inputs`, one call per pair.
fn over_states<R>(group: &mut Group, name: &str, inputs: &[(f64, f64)], f: impl Fn(f64, f64) -> R) {
    group.bench_function(name, |b| {
        b.iter(|| {
            for &(x, y) in black_box(inputs) {
                black_box(f(black_box(x), black_box(y)));
            }
        })
    });
}

fn region_group<'a>(c: &'a mut Criterion, name: &str, calls: usize) -> Group<'a> {
    let mut group = c.benchmark_group(name);
    group.throughput(Throughput::Elements(calls as u64));
    group
}

fn gibbs_regions(c: &mut Criterion) {
    {
        let s = &states::REGION1;
        let mut g = region_group(c, "region1", s.len());
        over_states(&mut g, "state_from_pt", s, |p, t| {
            State::from_pt(p, t, Units::Native)
        });
        over_states(&mut g, "gibbs_properties", s, |p, t| {
            region1::gibbs(p, t).properties(p, t)
        });
        over_states(&mut g, "enthalpy_from_pt", s, |p, t| {
            ebullio::enthalpy_from_pt(p, t, Units::Native)
        });
        over_states(&mut g, "enthalpy_raw", s, region1::enthalpy);
        over_states(&mut g, "baseline_full", s, baseline::region1::properties);
        over_states(
            &mut g,
            "baseline_full_shared_sums",
            s,
            baseline::region1::properties_shared_sums,
        );
        over_states(&mut g, "baseline_enthalpy", s, baseline::region1::enthalpy);
        g.finish();
    }
    {
        let s = &states::REGION2;
        let mut g = region_group(c, "region2", s.len());
        over_states(&mut g, "state_from_pt", s, |p, t| {
            State::from_pt(p, t, Units::Native)
        });
        over_states(&mut g, "gibbs_properties", s, |p, t| {
            region2::gibbs(p, t).properties(p, t)
        });
        over_states(&mut g, "enthalpy_from_pt", s, |p, t| {
            ebullio::enthalpy_from_pt(p, t, Units::Native)
        });
        over_states(&mut g, "enthalpy_raw", s, region2::enthalpy);
        over_states(&mut g, "baseline_full", s, baseline::region2::properties);
        over_states(
            &mut g,
            "baseline_full_shared_sums",
            s,
            baseline::region2::properties_shared_sums,
        );
        over_states(&mut g, "baseline_enthalpy", s, baseline::region2::enthalpy);
        g.finish();
    }
    {
        let s = &states::REGION5;
        let mut g = region_group(c, "region5", s.len());
        over_states(&mut g, "state_from_pt", s, |p, t| {
            State::from_pt(p, t, Units::Native)
        });
        over_states(&mut g, "gibbs_properties", s, |p, t| {
            region5::gibbs(p, t).properties(p, t)
        });
        over_states(&mut g, "enthalpy_from_pt", s, |p, t| {
            ebullio::enthalpy_from_pt(p, t, Units::Native)
        });
        over_states(&mut g, "enthalpy_raw", s, region5::enthalpy);
        over_states(&mut g, "baseline_full", s, baseline::region5::properties);
        over_states(
            &mut g,
            "baseline_full_shared_sums",
            s,
            baseline::region5::properties_shared_sums,
        );
        over_states(&mut g, "baseline_enthalpy", s, baseline::region5::enthalpy);
        g.finish();
    }
}

fn region3_group(c: &mut Criterion) {
    let s = &states::REGION3;
    // The baseline works at (ρ, T); it is compared with the core's
    // Helmholtz evaluation at the same densities.
    let rho_t = states::region3_density_temperature();
    let mut g = region_group(c, "region3", s.len());
    over_states(&mut g, "state_from_pt", s, |p, t| {
        State::from_pt(p, t, Units::Native)
    });
    over_states(&mut g, "helmholtz_properties", &rho_t, |rho, t| {
        region3::helmholtz(rho, t).properties(rho, t)
    });
    over_states(&mut g, "enthalpy_from_pt", s, |p, t| {
        ebullio::enthalpy_from_pt(p, t, Units::Native)
    });
    over_states(
        &mut g,
        "baseline_full_rho_t",
        &rho_t,
        baseline::region3::properties,
    );
    over_states(
        &mut g,
        "baseline_full_shared_sums_rho_t",
        &rho_t,
        baseline::region3::properties_shared_sums,
    );
    over_states(
        &mut g,
        "baseline_enthalpy_rho_t",
        &rho_t,
        baseline::region3::enthalpy,
    );
    g.finish();
}

fn saturation_group(c: &mut Criterion) {
    let mut g = c.benchmark_group("saturation");
    g.throughput(Throughput::Elements(1));
    // 0.1 MPa: regions 1 and 2; 20 MPa (Tsat ≈ 639 K): both phases in region 3.
    for (label, p) in [("0.1MPa", 0.1), ("20MPa", 20.0)] {
        g.bench_function(format!("at_pressure/{label}"), |b| {
            b.iter(|| Saturation::at_pressure(black_box(p), Units::Native))
        });
        g.bench_function(format!("state_from_px/{label}"), |b| {
            b.iter(|| State::from_px(black_box(p), black_box(0.5), Units::Native))
        });
    }
    g.finish();
}

fn config() -> Criterion {
    Criterion::default()
        .warm_up_time(Duration::from_secs(1))
        .measurement_time(Duration::from_secs(2))
        .sample_size(30)
}

criterion_group! {
    name = benches;
    config = config();
    targets = gibbs_regions, region3_group, saturation_group
}
criterion_main!(benches);
