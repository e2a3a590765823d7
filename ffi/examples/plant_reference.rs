//! The Rust core's own numbers for the plant tests of the C ABI
//! (`ffi/tests/c/test_plant.c`, `ffi/tests/python/test_plant_ctypes.py`):
//! the demo plant (invented, Tallowmere Unit 3, metric engineering units)
//! solved by `ebullio::plant::solve_cycle` directly, printed as the bit
//! patterns of every number, one hexadecimal u64 per line, in this order:
//! the 14 totals (turbine work ... Carnot efficiency, as in
//! `EbullioCycleResult`), the point and component counts, the extraction
//! fractions, then per point flow, p, T, h, s, x (NaN single phase), and
//! per component heat in, work out, entropy generation and its inlet then
//! outlet streams (flow, h, s each).
//!
//! `cargo run --release -p ebullio-ffi --example plant_reference`

use ebullio::plant::{
    solve_cycle, Casing, CycleSpec, Drains, Heater, HeaterApproach, HeaterKind, Reheat, Supply,
};
use ebullio::{Property, Units};

fn main() {
    // The demo plant; feed pressure 187 bar and condensate pump 0.80 are
    // invented beside DESIGN.md's numbers. The C and Python tests build
    // the same description.
    let mut spec = CycleSpec::new(
        Units::MetricEngineering,
        Supply::Superheated {
            pressure: 167.0,
            temperature: 538.0,
        },
    );
    spec.reheat = Some(Reheat {
        pressure: 37.0,
        temperature: 538.0,
    });
    spec.feed_pressure = Some(187.0);
    spec.feed_pump_efficiency = 0.83;
    spec.condensate_pump_efficiency = 0.80;
    for (p, eta) in [(41.0, 0.86), (9.5, 0.90), (0.068, 0.88)] {
        spec.push_casing(Casing {
            exhaust_pressure: p,
            isentropic_efficiency: eta,
        })
        .expect("three casings fit");
    }
    for (p, open, ttd) in [
        (62.0, false, -1.0),
        (41.0, false, 2.8),
        (19.0, false, 2.8),
        (9.5, true, 0.0),
        (4.2, false, 2.8),
        (1.6, false, 2.8),
        (0.65, false, 2.8),
    ] {
        let kind = if open {
            HeaterKind::Open
        } else {
            HeaterKind::Closed {
                approach: HeaterApproach {
                    terminal_temperature_difference: ttd,
                    drain_cooler_approach: Some(5.6),
                },
                drains: Drains::CascadeBackward,
            }
        };
        spec.push_heater(Heater {
            extraction_pressure: p,
            extraction_line_loss: 0.03,
            kind,
        })
        .expect("seven heaters fit");
    }
    let r = solve_cycle(&spec).expect("the demo plant solves");
    let mut out = Vec::new();
    out.extend(r.figures().map(|(_, value)| value));
    out.push(r.points().len() as f64);
    out.push(r.components().len() as f64);
    out.extend(r.extraction_fractions());
    for p in r.points() {
        let get = |q| p.state.get(q).unwrap_or(f64::NAN);
        out.extend([
            p.flow,
            get(Property::Pressure),
            get(Property::Temperature),
            get(Property::Enthalpy),
            get(Property::Entropy),
            get(Property::Quality),
        ]);
    }
    for c in r.components() {
        out.extend([c.heat_in, c.work_out, c.entropy_generation]);
        for s in c.inlets().iter().chain(c.outlets()) {
            out.extend([s.flow, s.enthalpy, s.entropy]);
        }
    }
    for x in out {
        println!("{:016x}", x.to_bits());
    }
}
