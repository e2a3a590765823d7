//! The Rust core's own numbers for `python/tests/test_plant_off_design.py`:
//! the demo plant with losses of `python/examples/tallowmere_load_curve.py`
//! (invented: Tallowmere Unit 3, metric engineering units), built here the
//! same way, solved by the core directly and printed as the bit patterns
//! of every number, one hexadecimal u64 per line: the design balance's
//! output figures then power figures (the core's `FIGURE_NAMES` order);
//! the off-design balance at 70 % of the design flow, sliding pressure,
//! the same; then each of the 15 load-curve rows (30 % to 100 % of the
//! flow, sliding pressure): throttle pressure, thermal efficiency, the
//! output and power figures; then, with every option (an efficiency
//! correction, the design cooling water, heaters by their UA), the
//! balance at 60 % of the flow with warmer cooling water and heater 6
//! out of service, the same figures.
//!
//! `cargo run --release -p ebullio-python --example off_design_reference`

use ebullio::plant::{
    solve_cycle, Casing, CondenserCondition, CoolingWater, Curve, CycleResult, CycleSpec, Drains,
    ExhaustLoss, FeedPumpTurbine, Generator, Heater, HeaterApproach, HeaterKind, HeaterTransfer,
    Leak, LeakSource, Makeup, OffDesignModel, OffDesignOptions, OperatingPoint, PlantOutput,
    Reheat, SteamDestination, Supply, ThrottleControl, WaterLoss,
};
use ebullio::Units;

/// The design throttle flow, kg/s (invented, as the Python demo).
const DESIGN_FLOW: f64 = 520.0;

/// Tallowmere Unit 3 as `python/examples/tallowmere_cycle.py` describes it.
fn tallowmere() -> CycleSpec {
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
    spec.feed_pressure = Some(186.0);
    spec.feed_pump_efficiency = 0.83;
    spec.condensate_pump_efficiency = 0.78;
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
    spec
}

/// The demo's losses (all invented), as `tallowmere_load_curve.py` gives them.
fn with_losses(mut spec: CycleSpec) -> CycleSpec {
    let curve = |points: &[(f64, f64)]| Curve::new(points).expect("a rising curve");
    let losses = &mut spec.losses;
    losses.throttle_flow = Some(DESIGN_FLOW);
    losses.generator = Some(Generator::AgainstLoad {
        rated_output: 640_000.0,
        efficiency: curve(&[
            (0.2, 0.975),
            (0.5, 0.984),
            (0.8, 0.987),
            (1.0, 0.987),
            (1.2, 0.986),
        ]),
    });
    losses.mechanical_losses = 1_800.0;
    losses.auxiliary_power = 22_000.0;
    losses.exhaust = Some(ExhaustLoss {
        annulus_area: 30.0,
        curve: curve(&[
            (10.0, 90.0),
            (60.0, 40.0),
            (100.0, 25.0),
            (150.0, 18.0),
            (200.0, 22.0),
            (250.0, 34.0),
            (300.0, 50.0),
            (400.0, 90.0),
        ]),
    });
    losses.water_pressure_drops = [0.8, 0.8, 0.8, 0.0, 0.8, 0.8, 0.8, 0.0, 0.0, 0.0, 0.0, 0.0];
    losses.leaks[0] = Some(Leak {
        from: LeakSource::CasingInlet(0),
        to: SteamDestination::HeaterShell(1),
        fraction: 0.002,
    });
    losses.leaks[1] = Some(Leak {
        from: LeakSource::CasingExhaust(0),
        to: SteamDestination::HeaterShell(4),
        fraction: 0.004,
    });
    losses.leaks[2] = Some(Leak {
        from: LeakSource::CasingInlet(1),
        to: SteamDestination::Condenser,
        fraction: 0.0015,
    });
    losses.makeup = Some(Makeup {
        fraction: 0.01,
        pressure: 2.0,
        temperature: 25.0,
        lost_as: WaterLoss::Blowdown,
    });
    losses.feed_pump_turbine = Some(FeedPumpTurbine {
        steam_from: 3,
        exhaust_to: SteamDestination::Condenser,
        isentropic_efficiency: 0.80,
    });
    spec
}

fn output_figures(output: &PlantOutput, out: &mut Vec<f64>) {
    out.extend(output.figures().map(|(_, value)| value));
    let power = output.power.expect("the demo gives its throttle flow");
    out.extend(power.figures().map(|(_, value)| value));
}

fn balance(r: &CycleResult, out: &mut Vec<f64>) {
    output_figures(&r.output, out);
}

fn main() {
    let spec = with_losses(tallowmere());
    let mut out = Vec::new();
    balance(
        &solve_cycle(&spec).expect("the demo plant solves"),
        &mut out,
    );
    let model = OffDesignModel::calibrate(&spec).expect("the design calibrates");
    let sliding = OperatingPoint::new(0.7 * DESIGN_FLOW, ThrottleControl::SlidingPressure);
    balance(&model.solve(&sliding).expect("70 % solves"), &mut out);
    let flows: Vec<f64> = (0..15)
        .map(|k| DESIGN_FLOW * (f64::from(30 + 5 * k) / 100.0))
        .collect();
    let curve = model.load_curve(&flows, &sliding).expect("15 flows fit");
    for row in curve.rows() {
        let row = row.expect("every row solves");
        out.extend([row.throttle_pressure, row.thermal_efficiency]);
        output_figures(&row.output, &mut out);
    }
    let options = OffDesignOptions {
        efficiency_correction: Some(
            Curve::new(&[(0.5, 0.93), (1.0, 1.0), (1.5, 0.96)]).expect("a rising curve"),
        ),
        design_cooling_water: Some(CoolingWater {
            inlet_temperature: 22.0,
            flow: 17_000.0,
        }),
        heater_transfer: Some(HeaterTransfer {
            ua_flow_exponent: 0.8,
        }),
    };
    let model = OffDesignModel::calibrate_with(&spec, &options).expect("the options calibrate");
    let mut point = OperatingPoint::new(0.6 * DESIGN_FLOW, ThrottleControl::SlidingPressure);
    point.condenser = CondenserCondition::CoolingWater(CoolingWater {
        inlet_temperature: 26.0,
        flow: 17_000.0,
    });
    point.out_of_service[5] = true;
    balance(
        &model.solve(&point).expect("60 % with the options solves"),
        &mut out,
    );
    for value in out {
        println!("{:016x}", value.to_bits());
    }
}
