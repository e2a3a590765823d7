//! The plant layer: one cycle solve (seven heaters with cascaded drains,
//! the same with two pumped-forward drains, the first with every loss, a
//! plain Rankine cycle), that lossy unit off design (one solve, a
//! 15-point load curve) and
//! the single components a performance calculation calls per sample.
//!
//! Run with `cargo bench -p ebullio-benches --bench plant`.

use std::hint::black_box;
use std::time::Duration;

use criterion::{criterion_group, criterion_main, Criterion};
use ebullio::plant::{
    compress, expand, section_efficiency, solve_cycle, CondenserCondition, CoolingWater, Curve,
    Drains, HeaterTransfer, OffDesignModel, OffDesignOptions, OperatingPoint, ThrottleControl,
};
use ebullio::{Saturation, State, Units};
use ebullio_benches::cycles;

fn plant(c: &mut Criterion) {
    let mut group = c.benchmark_group("cycle");
    let cascaded = cycles::seven_heaters(Drains::CascadeBackward);
    let pumped = cycles::seven_heaters(Drains::PumpForward);
    let plain = cycles::plain_rankine();
    let lossy = cycles::seven_heaters_with_losses();
    group.bench_function("seven_heaters_cascaded", |b| {
        b.iter(|| solve_cycle(black_box(&cascaded)).map(|r| r.thermal_efficiency))
    });
    group.bench_function("seven_heaters_two_pumped_forward", |b| {
        b.iter(|| solve_cycle(black_box(&pumped)).map(|r| r.thermal_efficiency))
    });
    group.bench_function("seven_heaters_with_losses", |b| {
        b.iter(|| solve_cycle(black_box(&lossy)).map(|r| r.output.net_heat_rate))
    });
    group.bench_function("plain_rankine", |b| {
        b.iter(|| solve_cycle(black_box(&plain)).map(|r| r.thermal_efficiency))
    });
    group.finish();

    // The lossy unit off its design point: one solve at 70 % of its flow
    // with sliding pressure, and a 15-point load curve (44-100 %).
    let mut group = c.benchmark_group("off_design");
    let model = OffDesignModel::calibrate(&lossy).expect("the design calibrates");
    let point = OperatingPoint::new(350.0, ThrottleControl::SlidingPressure);
    group.bench_function("seven_heaters_with_losses_at_70_percent", |b| {
        b.iter(|| {
            model
                .solve(black_box(&point))
                .map(|r| r.output.net_heat_rate)
        })
    });
    group.bench_function("seven_heaters_with_losses_15_point_load_curve", |b| {
        b.iter(|| {
            model
                .load_curve(
                    black_box(&cycles::LOAD_CURVE_FLOWS),
                    &OperatingPoint::new(0.0, ThrottleControl::SlidingPressure),
                )
                .map(|curve| curve.rows().len())
        })
    });
    // Every option on (invented machine data): an efficiency correction,
    // the condenser by its cooling water, heaters by their UA; at 70 %
    // with warmer cooling water and the lowest heater out of service.
    let options = OffDesignOptions {
        efficiency_correction: Some(
            Curve::new(&[(0.5, 0.93), (1.0, 1.0), (1.5, 0.96)]).expect("a rising curve"),
        ),
        design_cooling_water: Some(CoolingWater {
            inlet_temperature: 295.15,
            flow: 17_000.0,
        }),
        heater_transfer: Some(HeaterTransfer {
            ua_flow_exponent: 0.8,
        }),
    };
    let with_options = OffDesignModel::calibrate_with(&lossy, &options).expect("options calibrate");
    let mut warm = point;
    warm.condenser = CondenserCondition::CoolingWater(CoolingWater {
        inlet_temperature: 299.15,
        flow: 17_000.0,
    });
    warm.out_of_service[6] = true;
    with_options
        .solve(&warm)
        .expect("the bench times a balance, not a refusal");
    group.bench_function("seven_heaters_every_option_at_70_percent", |b| {
        b.iter(|| {
            with_options
                .solve(black_box(&warm))
                .map(|r| r.output.net_heat_rate)
        })
    });
    group.finish();

    let mut group = c.benchmark_group("components");
    let inlet = State::from_pt(16.5, 813.15, Units::Native).unwrap();
    group.bench_function("expand_to_superheated", |b| {
        b.iter(|| expand(black_box(&inlet), black_box(4.0), 0.86).map(|x| x.work))
    });
    group.bench_function("expand_to_wet", |b| {
        b.iter(|| expand(black_box(&inlet), black_box(0.007), 0.86).map(|x| x.work))
    });
    group.bench_function("section_efficiency_from_pt", |b| {
        b.iter(|| {
            section_efficiency(
                black_box(16.5),
                black_box(813.15),
                black_box(4.0),
                black_box(620.0),
                Units::Native,
            )
            .map(|x| x.isentropic_efficiency)
        })
    });
    let hotwell = *Saturation::at_pressure(0.007, Units::Native)
        .unwrap()
        .liquid();
    group.bench_function("compress", |b| {
        b.iter(|| compress(black_box(&hotwell), black_box(1.2), 0.78).map(|x| x.work))
    });
    group.finish();
}

criterion_group! {
    name = benches;
    config = Criterion::default()
        .warm_up_time(Duration::from_secs(1))
        .measurement_time(Duration::from_secs(3));
    targets = plant
}
criterion_main!(benches);
