//! The Rust yardstick for `python/benchmarks/bench_arrays.py`: the loop a
//! Rust caller would write, `State::solve` per element with every property
//! read into its own column, on one thread and over every core (rayon).
//!
//! `cargo run --release -p ebullio-python --example rust_loop -- N`
//! prints `pair threads ns_per_element` lines for the benchmark's inputs.

use std::time::Instant;

use ebullio::{InputPair, Method, Property, State, Units};
use rayon::prelude::*;

/// The benchmark's inputs (the Python script builds the same): superheated
/// steam, 1 to 20 MPa, 700 to 1000 K; for (p, h) the enthalpies of those.
fn inputs(n: usize) -> (Vec<f64>, Vec<f64>) {
    let p = (0..n)
        .map(|i| 1.0 + 19.0 * (i % 1000) as f64 / 1000.0)
        .collect();
    let t = (0..n)
        .map(|i| 700.0 + 300.0 * ((i * 7) % 1000) as f64 / 1000.0)
        .collect();
    (p, t)
}

const PROPERTIES: [Property; 15] = Property::ALL;

fn element(pair: InputPair, a: f64, b: f64, row: &mut [f64; 15]) {
    match State::solve(pair, a, b, Units::Native, Method::Exact) {
        Ok(state) => {
            for (slot, &property) in row.iter_mut().zip(PROPERTIES.iter()) {
                *slot = state.get(property).unwrap_or(f64::NAN);
            }
        }
        Err(_) => row.fill(f64::NAN),
    }
}

fn time(n: usize, pair: InputPair, a: &[f64], b: &[f64], parallel: bool) -> f64 {
    let mut out = vec![[0.0f64; 15]; n];
    let mut best = f64::INFINITY;
    for _ in 0..5 {
        let start = Instant::now();
        if parallel {
            out.par_chunks_mut(2048).enumerate().for_each(|(k, rows)| {
                for (i, row) in rows.iter_mut().enumerate() {
                    let j = k * 2048 + i;
                    element(pair, a[j], b[j], row);
                }
            });
        } else {
            for (j, row) in out.iter_mut().enumerate() {
                element(pair, a[j], b[j], row);
            }
        }
        best = best.min(start.elapsed().as_secs_f64());
        std::hint::black_box(&out);
    }
    best / n as f64 * 1e9
}

fn main() {
    let n: usize = std::env::args()
        .nth(1)
        .and_then(|s| s.parse().ok())
        .unwrap_or(1_000_000);
    let (p, t) = inputs(n);
    let h: Vec<f64> = p
        .iter()
        .zip(&t)
        .map(|(&p, &t)| State::from_pt(p, t, Units::Native).map_or(f64::NAN, |s| s.enthalpy()))
        .collect();
    for (name, pair, b) in [
        ("pt", InputPair::PressureTemperature, &t),
        ("ph", InputPair::PressureEnthalpy, &h),
    ] {
        for (threads, parallel) in [("1", false), ("all", true)] {
            println!("{name} {threads} {:.1}", time(n, pair, &p, b, parallel));
        }
    }
}
