//! Flow through a differential-pressure meter: one solve (the upstream
//! state, viscosity, isentropic exponent and the Reynolds-number
//! iteration) per element kind, with and without its uncertainty budget.
//! The target: a flow-meter solve ≤ 2 µs.
//!
//! Run with `cargo bench -p ebullio-benches --bench flow_meter`.

use std::hint::black_box;
use std::time::Duration;

use criterion::{criterion_group, criterion_main, Criterion};
use ebullio::measured::{Calculation, FlowMeter, Measured, MeteredFluid, PrimaryElement};
use ebullio::Units;

/// Feedwater through an orifice plate, steam through an ISA 1932 nozzle,
/// water through a venturi tube (invented, Tallowmere-sized lines).
fn meters() -> [(&'static str, FlowMeter); 3] {
    let feedwater = FlowMeter {
        element: PrimaryElement::OrificeDAndHalfDTappings,
        fluid: MeteredFluid::Water,
        element_expansion: 16.5e-6,
        pipe_expansion: 12.0e-6,
        upstream_pressure: Measured::new(195.0, 0.3),
        upstream_temperature: Measured::new(252.0, 0.5),
        differential_pressure: Measured::new(1.78, 0.004),
        bore: Measured::new(240.0, 0.02),
        pipe_diameter: Measured::new(400.0, 0.4),
        discharge_coefficient_factor: Measured::new(1.0, 0.0025),
    };
    let steam = FlowMeter {
        element: PrimaryElement::Isa1932Nozzle,
        fluid: MeteredFluid::Steam,
        upstream_pressure: Measured::new(12.0, 0.03),
        upstream_temperature: Measured::new(250.0, 1.0),
        differential_pressure: Measured::new(0.36, 0.001),
        bore: Measured::new(90.0, 0.01),
        pipe_diameter: Measured::new(150.0, 0.15),
        discharge_coefficient_factor: Measured::new(1.0, 0.004),
        ..feedwater
    };
    let venturi = FlowMeter {
        element: PrimaryElement::VenturiAsCast,
        upstream_pressure: Measured::new(20.0, 0.05),
        upstream_temperature: Measured::new(140.0, 0.3),
        differential_pressure: Measured::new(0.08, 0.0002),
        bore: Measured::new(150.0, 0.02),
        pipe_diameter: Measured::new(300.0, 0.2),
        discharge_coefficient_factor: Measured::new(1.0, 0.0035),
        ..feedwater
    };
    [
        ("orifice_feedwater", feedwater),
        ("nozzle_steam", steam),
        ("venturi_water", venturi),
    ]
}

fn flow_meter(c: &mut Criterion) {
    let units = Units::MetricEngineering;
    let mut group = c.benchmark_group("flow_meter");
    for (name, meter) in meters() {
        group.bench_function(name, |b| {
            b.iter(|| {
                black_box(&meter)
                    .evaluate(units)
                    .map(|r| r.figures.mass_flow)
            })
        });
        group.bench_function(format!("{name}_with_uncertainty"), |b| {
            b.iter(|| {
                black_box(&meter)
                    .evaluate_with_uncertainty(units, 2.0)
                    .map(|r| r.figures.mass_flow.standard_uncertainty)
            })
        });
    }
    group.finish();
}

criterion_group! {
    name = benches;
    config = Criterion::default()
        .warm_up_time(Duration::from_secs(1))
        .measurement_time(Duration::from_secs(3));
    targets = flow_meter
}
criterion_main!(benches);
