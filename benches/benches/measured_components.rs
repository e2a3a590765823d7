//! The measured-data calculations of the components and the heat rate,
//! per element, with and without the uncertainty budget: closed heater,
//! open heater, pump, attemperator, condenser (both sides), heat rate. The
//! readings are the invented Tallowmere Station Unit 3's of the tests.
//!
//! Run with `cargo bench -p ebullio-benches --bench measured_components`.

use std::hint::black_box;
use std::time::Duration;

use criterion::{criterion_group, criterion_main, Criterion};
use ebullio::measured::*;
use ebullio::Units;

const UNITS: Units = Units::MetricEngineering;

/// One calculation's two benchmarks: the figures alone, and with their
/// uncertainty and budget.
fn bench<C: Calculation<N, M>, const N: usize, const M: usize>(
    c: &mut Criterion,
    name: &str,
    calculation: C,
) {
    let mut group = c.benchmark_group(name);
    group.bench_function("figures", |b| {
        b.iter(|| evaluate(black_box(&calculation), UNITS).map(|(f, _)| f[0]))
    });
    group.bench_function("with_uncertainty", |b| {
        b.iter(|| {
            evaluate_with_uncertainty(black_box(&calculation), UNITS, 2.0)
                .map(|(f, _)| f[0].standard_uncertainty)
        })
    });
    group.finish();
}

fn measured_components(c: &mut Criterion) {
    let drain = Inflow {
        flow: Measured::new(40.0, 1.0),
        pressure: Measured::new(40.0, 0.1),
        temperature: Measured::new(220.6, 0.3),
    };
    bench(
        c,
        "closed_heater",
        ClosedHeaterTest {
            shell_pressure: Measured::new(20.0, 0.05),
            extraction_temperature: Measured::new(430.0, 1.0),
            feedwater_inlet_temperature: Measured::new(180.0, 0.3),
            feedwater_outlet_temperature: Measured::new(209.6, 0.3),
            feedwater_pressure: Measured::new(205.0, 0.5),
            drain_temperature: Measured::new(185.6, 0.3),
            feedwater_flow: Measured::new(500.0, 2.5),
            cascade: drain,
        },
    );
    bench(
        c,
        "open_heater",
        OpenHeaterTest {
            heater_pressure: Measured::new(10.0, 0.03),
            extraction_temperature: Measured::new(330.0, 1.0),
            outlet_temperature: Measured::new(178.0, 0.3),
            condensate: Inflow {
                flow: Measured::new(420.0, 2.0),
                pressure: Measured::new(15.0, 0.05),
                temperature: Measured::new(150.0, 0.3),
            },
            drains: [drain, Inflow::NONE],
            outlet: OpenHeaterOutlet::Saturated,
        },
    );
    bench(
        c,
        "pump",
        PumpTest {
            suction_pressure: Measured::new(12.0, 0.03),
            suction_temperature: Measured::new(180.0, 0.1),
            discharge_pressure: Measured::new(200.0, 0.5),
            discharge_temperature: Measured::new(183.5, 0.1),
        },
    );
    bench(
        c,
        "attemperator",
        AttemperatorTest {
            steam_flow: Measured::new(480.0, 2.4),
            steam_pressure: Measured::new(170.0, 0.4),
            steam_temperature: Measured::new(480.0, 1.5),
            spray_pressure: Measured::new(200.0, 0.5),
            spray_temperature: Measured::new(183.5, 0.5),
            outlet_temperature: Measured::new(450.0, 1.5),
        },
    );
    bench(
        c,
        "condenser_cooling_water",
        CoolingWaterTest {
            flow: Measured::new(15_700.0, 150.0),
            pressure: Measured::new(2.0, 0.02),
            inlet_temperature: Measured::new(20.0, 0.1),
            outlet_temperature: Measured::new(30.0, 0.1),
        },
    );
    bench(
        c,
        "condenser_steam_side",
        CondenserSteamTest {
            exhaust_flow: Measured::new(300.0, 3.0),
            exhaust_enthalpy: Measured::new(2350.0, 10.0),
            pressure: Measured::new(0.068, 0.0005),
            condensate_temperature: Measured::new(37.5, 0.2),
        },
    );
    bench(
        c,
        "heat_rate",
        HeatRateTest {
            feedwater_flow: Measured::new(480.0, 1.5),
            feedwater_pressure: Measured::new(190.0, 0.5),
            feedwater_temperature: Measured::new(275.0, 0.3),
            main_steam_pressure: Measured::new(167.0, 0.4),
            main_steam_temperature: Measured::new(538.0, 1.0),
            superheater_spray: Inflow {
                flow: Measured::new(10.0, 0.3),
                pressure: Measured::new(200.0, 0.5),
                temperature: Measured::new(183.5, 0.5),
            },
            cold_reheat_flow: Measured::new(430.0, 2.5),
            cold_reheat_pressure: Measured::new(40.0, 0.1),
            cold_reheat_temperature: Measured::new(335.0, 1.0),
            hot_reheat_pressure: Measured::new(37.0, 0.1),
            hot_reheat_temperature: Measured::new(538.0, 1.0),
            reheater_spray: Inflow {
                flow: Measured::new(2.0, 0.2),
                pressure: Measured::new(90.0, 0.3),
                temperature: Measured::new(183.0, 0.5),
            },
            generator_output: Measured::new(600_000.0, 600.0),
        },
    );
}

criterion_group! {
    name = benches;
    config = Criterion::default()
        .warm_up_time(Duration::from_secs(1))
        .measurement_time(Duration::from_secs(3));
    targets = measured_components
}
criterion_main!(benches);
