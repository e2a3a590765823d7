//! Instruction-count probe of the batch kernels, per element: run under
//! callgrind as `core/examples/icount.rs` is (100 000 elements in batches of
//! 1000; probe 0 is the set-up alone). Beside the scalar probes, in a file of
//! its own so that their code, and so their counts, stay as they were.
//! 1–3 full states in regions 1, 2 and 5, read as icount's probes 5–6 read
//! them; 4–5 enthalpy alone in regions 1 and 2; on the widest variant the
//! machine offers (valgrind hides AVX-512: AVX2 under callgrind); 6–7 region
//! 1's full state and enthalpy on the baseline variant; 8 both saturated
//! phases from T (280–600 K). The same work one element at a time, for
//! comparison: 11–13 full states in regions 1, 2 and 5, 14–15 enthalpy in
//! regions 1 and 2, 18 saturation from T.
use ebullio::batch::Dispatch;
use ebullio::Units;
use std::hint::black_box;

/// Elements per batch call, and in all.
const BATCH: usize = 1000;
const ELEMENTS: usize = 100_000;

fn main() {
    let which: u32 = std::env::args()
        .nth(1)
        .and_then(|a| a.parse().ok())
        .unwrap_or(0);
    // The points of icount's probes: regions 1, 2 and 5.
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
    let pts5 = [
        (0.5, 1100.0),
        (0.5, 2200.0),
        (30.0, 1500.0),
        (10.0, 1300.0),
        (1.0, 1800.0),
        (45.0, 2000.0),
        (5.0, 1150.0),
        (20.0, 2250.0),
    ];
    let points = match which % 10 {
        2 | 5 => pts2,
        3 => pts5,
        _ => pts1,
    };
    let temperatures: [f64; 8] = core::array::from_fn(|k| 280.0 + 40.0 * k as f64);
    let dispatch = if matches!(which, 6 | 7) {
        Dispatch::Baseline
    } else {
        Dispatch::detected()
    };
    let mut acc = 0.0;
    for _ in 0..ELEMENTS / BATCH {
        let inputs = (0..BATCH).map(|j| black_box(points[j & 7]));
        let line = (0..BATCH).map(|j| black_box(temperatures[j & 7]));
        let read = |s: ebullio::State| {
            s.enthalpy()
                + s.entropy()
                + s.specific_volume()
                + s.isobaric_heat_capacity().unwrap()
                + s.speed_of_sound().unwrap()
        };
        match which {
            1..=3 | 6 => {
                dispatch.states_from_pt(inputs, Units::Native, |_, s| acc += read(s.unwrap()))
            }
            4 | 5 | 7 => {
                dispatch.enthalpies_from_pt(inputs, Units::Native, |_, h| acc += h.unwrap())
            }
            8 => dispatch.saturation_at_temperatures(line, Units::Native, |_, s| {
                acc += s.unwrap().liquid().enthalpy() + s.unwrap().vapour().enthalpy()
            }),
            11..=13 => {
                for (p, t) in inputs {
                    acc += read(ebullio::State::from_pt(p, t, Units::Native).unwrap());
                }
            }
            14 | 15 => {
                for (p, t) in inputs {
                    acc += ebullio::enthalpy_from_pt(p, t, Units::Native).unwrap();
                }
            }
            18 => {
                for t in line {
                    let s = ebullio::Saturation::at_temperature(t, Units::Native).unwrap();
                    acc += s.liquid().enthalpy() + s.vapour().enthalpy();
                }
            }
            _ => {}
        }
    }
    println!("{acc}");
}
