//! Rough wall-clock timing of the main calls (the criterion benches in
//! benches/ are the reference; this is a quick look during development).
use ebullio::{State, Units};
use std::hint::black_box;
use std::time::Instant;

fn time<F: FnMut(usize) -> f64>(name: &str, mut f: F) {
    let mut best = f64::INFINITY;
    for _ in 0..20 {
        let t0 = Instant::now();
        let mut acc = 0.0;
        for k in 0..20000 {
            acc += f(k & 7);
        }
        black_box(acc);
        best = best.min(t0.elapsed().as_nanos() as f64 / 20000.0);
    }
    println!("{name:28} {best:8.1} ns");
}

fn main() {
    let n = Units::Native;
    let all = |s: State| {
        s.enthalpy()
            + s.entropy()
            + s.specific_volume()
            + s.isobaric_heat_capacity().unwrap_or(0.0)
            + s.speed_of_sound().unwrap_or(0.0)
    };
    let pts1 = [
        (3.0, 300.0),
        (80.0, 300.0),
        (3.0, 500.0),
        (10.0, 400.0),
        (50.0, 350.0),
        (1.0, 280.0),
        (20.0, 600.0),
        (100.0, 450.0),
    ];
    let pts2 = [
        (0.0035, 300.0),
        (0.0035, 700.0),
        (30.0, 700.0),
        (1.0, 500.0),
        (10.0, 900.0),
        (0.1, 400.0),
        (5.0, 600.0),
        (50.0, 1000.0),
    ];
    let pts3 = [
        (25.0, 650.0),
        (30.0, 700.0),
        (50.0, 660.0),
        (100.0, 700.0),
        (22.0, 645.0),
        (40.0, 750.0),
        (70.0, 800.0),
        (23.0, 640.0),
    ];
    let h1: Vec<f64> = pts1
        .iter()
        .map(|&(p, t)| State::from_pt(p, t, n).unwrap().enthalpy())
        .collect();
    let s1: Vec<f64> = pts1
        .iter()
        .map(|&(p, t)| State::from_pt(p, t, n).unwrap().entropy())
        .collect();
    let h2: Vec<f64> = pts2
        .iter()
        .map(|&(p, t)| State::from_pt(p, t, n).unwrap().enthalpy())
        .collect();
    let s2: Vec<f64> = pts2
        .iter()
        .map(|&(p, t)| State::from_pt(p, t, n).unwrap().entropy())
        .collect();
    let h3: Vec<f64> = pts3
        .iter()
        .map(|&(p, t)| State::from_pt(p, t, n).unwrap().enthalpy())
        .collect();
    time("from_pt region 1", |k| {
        let (p, t) = black_box(pts1[k]);
        all(State::from_pt(p, t, n).unwrap())
    });
    time("from_pt region 2", |k| {
        let (p, t) = black_box(pts2[k]);
        all(State::from_pt(p, t, n).unwrap())
    });
    time("from_pt region 3", |k| {
        let (p, t) = black_box(pts3[k]);
        all(State::from_pt(p, t, n).unwrap())
    });
    time("enthalpy_from_pt region 1", |k| {
        let (p, t) = black_box(pts1[k]);
        ebullio::enthalpy_from_pt(p, t, n).unwrap()
    });
    time("enthalpy_from_pt region 2", |k| {
        let (p, t) = black_box(pts2[k]);
        ebullio::enthalpy_from_pt(p, t, n).unwrap()
    });
    time("from_ph region 1", |k| {
        let p = black_box(pts1[k].0);
        all(State::from_ph(p, h1[k], n).unwrap())
    });
    time("from_ph region 2", |k| {
        let p = black_box(pts2[k].0);
        all(State::from_ph(p, h2[k], n).unwrap())
    });
    time("from_ph region 3", |k| {
        let p = black_box(pts3[k].0);
        all(State::from_ph(p, h3[k], n).unwrap())
    });
    time("from_ps region 1", |k| {
        let p = black_box(pts1[k].0);
        all(State::from_ps(p, s1[k], n).unwrap())
    });
    time("from_ps region 2", |k| {
        let p = black_box(pts2[k].0);
        all(State::from_ps(p, s2[k], n).unwrap())
    });
    time("from_hs region 2", |k| {
        all(State::from_hs(black_box(h2[k]), s2[k], n).unwrap())
    });
    time("from_px 0.1 MPa", |k| {
        all(State::from_px(black_box(0.1), 0.1 * k as f64, n).unwrap())
    });
}
