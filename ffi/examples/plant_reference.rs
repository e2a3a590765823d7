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
//! With the argument `off-design`, the same plant with every loss
//! (`with_losses`) instead, for `test_plant.c` alone: the design's plant
//! output (the 21 numbers of `EbullioPlantOutput`, in its order: `output`
//! below), the unit at 80 % of its flow with sliding pressure (the 14
//! totals, then its output), a load curve at a fixed throttle pressure at
//! 40, 60, 80, 100 and 110 % of the flow (per solved row, the throttle
//! pressure, the thermal efficiency and its output; the 110 % row is
//! refused), and the unit at 75 % of its design net output (the 14
//! totals, then its output).
//!
//! With the argument `python-demo`, for `python/tests/test_plant_off_design.py`:
//! the demo plant with losses of `python/examples/tallowmere_load_curve.py`
//! (its feed pump discharge 186 bar and other pumps 0.78, as
//! `tallowmere_cycle.py` has them; its losses in `python_demo_losses`):
//! the design balance's output, the off-design balance at 70 % of the
//! design flow with sliding pressure, then each of the 15 load-curve rows
//! (30 % to 100 % of the flow, sliding pressure: throttle pressure,
//! thermal efficiency, output), then, with every option (an efficiency
//! correction, the design cooling water, heaters by their UA), the
//! balance at 60 % of the flow with warmer cooling water and heater 6
//! out of service (its output). Each output is the 21 numbers of
//! `EbullioPlantOutput`, as below.
//!
//! `cargo run --release -p ebullio-ffi --example plant_reference [off-design | python-demo]`

use ebullio::plant::{
    solve_cycle, Casing, CondenserCondition, CoolingWater, Curve, CycleResult, CycleSpec, Drains,
    ExhaustLoss, FeedPumpTurbine, Generator, Heater, HeaterApproach, HeaterKind, HeaterTransfer,
    Leak, LeakSource, Makeup, OffDesignModel, OffDesignOptions, OperatingPoint, PlantOutput,
    Reheat, SteamDestination, Supply, ThrottleControl, WaterLoss,
};
use ebullio::{Property, Units};

/// The design throttle flow, kg/s (invented).
const DESIGN_FLOW: f64 = 520.0;

/// Every loss of the demo plant (invented numbers, as
/// `ffi/src/plant/abi_tests.rs`'s `tallowmere_with_losses` without the
/// generator curve, and `test_plant.c`'s `with_losses`).
fn with_losses(spec: &mut CycleSpec) {
    let l = &mut spec.losses;
    l.throttle_flow = Some(DESIGN_FLOW);
    l.generator = Some(Generator::Constant { efficiency: 0.987 });
    l.mechanical_losses = 1800.0;
    l.auxiliary_power = 14_000.0;
    // Invented (not machine data): kJ/kg against m/s.
    let exhaust = [
        (10.0, 90.0),
        (60.0, 40.0),
        (100.0, 25.0),
        (150.0, 18.0),
        (200.0, 22.0),
        (250.0, 34.0),
        (300.0, 50.0),
        (400.0, 90.0),
    ];
    l.exhaust = Some(ExhaustLoss {
        annulus_area: 30.0,
        curve: Curve::new(&exhaust).expect("a rising curve"),
    });
    for j in [0, 1, 2, 4, 5, 6] {
        l.water_pressure_drops[j] = 0.8;
    }
    let leak = |from, to, fraction| Some(Leak { from, to, fraction });
    l.leaks = [
        leak(
            LeakSource::CasingInlet(0),
            SteamDestination::HeaterShell(1),
            0.002,
        ),
        leak(
            LeakSource::CasingExhaust(0),
            SteamDestination::HeaterShell(5),
            0.001,
        ),
        leak(
            LeakSource::CasingInlet(0),
            SteamDestination::CasingInlet(1),
            0.01,
        ),
        leak(
            LeakSource::CasingInlet(2),
            SteamDestination::Condenser,
            0.001,
        ),
    ];
    l.makeup = Some(Makeup {
        fraction: 0.01,
        pressure: 2.0,
        temperature: 25.0,
        lost_as: WaterLoss::Blowdown,
    });
    l.feed_pump_turbine = Some(FeedPumpTurbine {
        steam_from: 3,
        exhaust_to: SteamDestination::Condenser,
        isentropic_efficiency: 0.8,
    });
}

/// The 21 numbers of a plant output, powers last (zeros without them),
/// in the core's `FIGURE_NAMES` orders (those of `EbullioPlantOutput`).
fn output(o: &PlantOutput) -> Vec<f64> {
    let mut out: Vec<f64> = o.figures().map(|(_, value)| value).to_vec();
    out.extend(
        o.power
            .map_or([0.0; 10], |p| p.figures().map(|(_, value)| value)),
    );
    out
}

/// The 14 totals, then the output.
fn totals_and_output(r: &CycleResult) -> Vec<f64> {
    let mut out: Vec<f64> = r.figures().map(|(_, value)| value).to_vec();
    out.extend(output(&r.output));
    out
}

/// The off-design numbers of the demo plant with every loss.
fn off_design(spec: &CycleSpec) -> Vec<f64> {
    let design = solve_cycle(spec).expect("the demo plant with losses solves");
    let mut out = output(&design.output);
    let model = OffDesignModel::calibrate(spec).expect("the demo plant calibrates");
    let sliding = OperatingPoint::new(0.8 * DESIGN_FLOW, ThrottleControl::SlidingPressure);
    out.extend(totals_and_output(
        &model.solve(&sliding).expect("80 % solves"),
    ));
    let fixed = OperatingPoint::new(0.0, ThrottleControl::FixedPressure);
    let flows = [0.4, 0.6, 0.8, 1.0, 1.1].map(|f| f * DESIGN_FLOW);
    let curve = model.load_curve(&flows, &fixed).expect("five flows fit");
    for row in curve.rows().iter().flatten() {
        out.extend([row.throttle_pressure, row.thermal_efficiency]);
        out.extend(output(&row.output));
    }
    let net = design.output.power.expect("the flow is given").net_output;
    let like = sliding.at_flow(0.0);
    out.extend(totals_and_output(
        &model
            .solve_for_output(0.75 * net, &like)
            .expect("75 % of the output solves"),
    ));
    out
}

/// The demo plant with its feed pump discharge at `feed_bar` and its
/// other pumps at `condensate_pump` (both invented beside DESIGN.md's
/// numbers).
fn tallowmere(feed_bar: f64, condensate_pump: f64) -> CycleSpec {
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
    spec.feed_pressure = Some(feed_bar);
    spec.feed_pump_efficiency = 0.83;
    spec.condensate_pump_efficiency = condensate_pump;
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
fn python_demo_losses(spec: &mut CycleSpec) {
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
}

/// The Python demo's numbers (see the module's docs).
fn python_demo(spec: &CycleSpec) -> Vec<f64> {
    let mut out = Vec::new();
    out.extend(output(
        &solve_cycle(spec)
            .expect("the demo plant with losses solves")
            .output,
    ));
    let model = OffDesignModel::calibrate(spec).expect("the design calibrates");
    let sliding = OperatingPoint::new(0.7 * DESIGN_FLOW, ThrottleControl::SlidingPressure);
    out.extend(output(&model.solve(&sliding).expect("70 % solves").output));
    let flows: Vec<f64> = (0..15)
        .map(|k| DESIGN_FLOW * (f64::from(30 + 5 * k) / 100.0))
        .collect();
    let curve = model.load_curve(&flows, &sliding).expect("15 flows fit");
    for row in curve.rows() {
        let row = row.expect("every row solves");
        out.extend([row.throttle_pressure, row.thermal_efficiency]);
        out.extend(output(&row.output));
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
    let model = OffDesignModel::calibrate_with(spec, &options).expect("the options calibrate");
    let mut point = OperatingPoint::new(0.6 * DESIGN_FLOW, ThrottleControl::SlidingPressure);
    point.condenser = CondenserCondition::CoolingWater(CoolingWater {
        inlet_temperature: 26.0,
        flow: 17_000.0,
    });
    point.out_of_service[5] = true;
    out.extend(output(
        &model
            .solve(&point)
            .expect("60 % with the options solves")
            .output,
    ));
    out
}

fn main() {
    // The C and Python tests build the same descriptions.
    let mode = std::env::args().nth(1);
    if mode.as_deref() == Some("python-demo") {
        let mut spec = tallowmere(186.0, 0.78);
        python_demo_losses(&mut spec);
        for x in python_demo(&spec) {
            println!("{:016x}", x.to_bits());
        }
        return;
    }
    let mut spec = tallowmere(187.0, 0.80);
    if mode.as_deref() == Some("off-design") {
        with_losses(&mut spec);
        for x in off_design(&spec) {
            println!("{:016x}", x.to_bits());
        }
        return;
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
