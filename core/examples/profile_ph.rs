use ebullio::{State, Units};
use std::hint::black_box;
fn main() {
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
    let h2: Vec<f64> = pts2
        .iter()
        .map(|&(p, t)| State::from_pt(p, t, Units::Native).unwrap().entropy())
        .collect();
    let mut acc = 0.0;
    for k in 0..20000 {
        acc += State::from_ps(black_box(pts2[k & 7].0), h2[k & 7], Units::Native)
            .unwrap()
            .temperature();
    }
    println!("{acc}");
}
