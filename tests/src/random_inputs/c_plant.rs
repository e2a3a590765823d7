//! Plant cases for the C ABI's cycle and off-design calls: a cycle
//! description (sane or spoiled, as `plant::cycle` draws it) with losses
//! drawn over its own casings and heaters (sometimes past them), a
//! throttle flow, off-design options, an operating point, a load curve's
//! flows and a target net output, each sane or adversarial.

use ebullio::plant::{
    CondenserCondition, CoolingWater, Curve, CycleSpec, ExhaustLoss, FeedPumpTurbine, Generator,
    HeaterKind, HeaterTransfer, Leak, LeakSource, Losses, Makeup, OffDesignOptions, OperatingPoint,
    SteamDestination, ThrottleControl, WaterLoss, MAX_HEATERS, MAX_LEAKS,
};
use ebullio::{Quantity, Units};

use super::draw::Draw;
use super::plant::{cycle, efficiency, flow};
use super::values::value;

/// One case of the C plant calls, every number in `spec.units`.
#[derive(Clone, Debug)]
pub struct PlantCase {
    /// The design description, losses included.
    pub spec: CycleSpec,
    /// What the off-design model knows beyond it.
    pub options: OffDesignOptions,
    /// Where to run the unit (its flow also the target's and the load
    /// curve's conditions).
    pub point: OperatingPoint,
    /// The load curve's throttle flows.
    pub flows: Vec<f64>,
    /// The target net output (a power).
    pub target: f64,
}

/// A curve of two to four points from x = lo to x = hi, x rising, y
/// within [ylo, yhi]. (Curves that cannot be are refused by
/// `Curve::new`, on the C side as on the core's: `plant/abi_tests.rs`
/// shows it.)
fn curve(draw: &mut impl Draw, (lo, hi): (f64, f64), (ylo, yhi): (f64, f64)) -> Curve {
    let n = 2 + draw.below(3);
    let points: Vec<(f64, f64)> = (0..n)
        .map(|k| {
            let inner = if k == 0 || k == n - 1 {
                0.0
            } else {
                draw.range(-0.4, 0.4)
            };
            let x = lo + (hi - lo) * (k as f64 + inner) / (n - 1) as f64;
            (x, draw.range(ylo, yhi))
        })
        .collect();
    Curve::new(&points).expect("x rises by construction")
}

/// An index among `n` items, now and then one past them.
fn index(draw: &mut impl Draw, n: usize) -> usize {
    if n == 0 || draw.chance(0.05) {
        n + draw.below(3)
    } else {
        draw.below(n)
    }
}

/// Where a leakage or the feed pump turbine's exhaust goes: mostly the
/// condenser, which every source reaches downhill.
fn destination(draw: &mut impl Draw, spec: &CycleSpec) -> SteamDestination {
    match draw.below(5) {
        0 | 1 => SteamDestination::Condenser,
        2 | 3 => SteamDestination::HeaterShell(index(draw, spec.heaters().len())),
        _ => SteamDestination::CasingInlet(index(draw, spec.casings().len())),
    }
}

/// Losses over `spec`'s casings and heaters, each present by chance, of
/// a size that fits the unit (a generator rated near its output, an
/// annulus for its exhaust flow: most solve) or adversarial.
fn losses(draw: &mut impl Draw, spec: &CycleSpec) -> Losses {
    let units = spec.units;
    let power = |kw: f64| units.from_native(Quantity::Power, kw);
    let mut l = Losses::NONE;
    // kg/s, native.
    let throttle = draw.range(5.0, 700.0);
    l.throttle_flow = draw.chance(0.9).then(|| {
        if draw.chance(0.95) {
            units.from_native(Quantity::MassFlow, throttle)
        } else {
            flow(draw)
        }
    });
    l.generator = match draw.below(3) {
        0 => None,
        1 => Some(Generator::Constant {
            efficiency: efficiency(draw),
        }),
        // Some 1000 kJ/kg of shaft work, rated within a factor of two.
        _ => Some(Generator::AgainstLoad {
            rated_output: power(throttle * 1000.0 * draw.range(0.5, 2.0)),
            efficiency: curve(draw, (0.0, 5.0), (0.9, 1.0)),
        }),
    };
    if draw.chance(0.5) {
        l.mechanical_losses = power(throttle * draw.range(0.0, 5.0));
        l.auxiliary_power = power(throttle * draw.range(0.0, 30.0));
    }
    l.exhaust = draw.chance(0.4).then(|| ExhaustLoss {
        // About 0.06 m² per kg/s of throttle steam (common practice for
        // a last stage's annulus), within a factor of three.
        annulus_area: if draw.chance(0.95) {
            throttle * draw.range(0.02, 0.18) * units.from_native(Quantity::Speed, 1.0).powi(2)
        } else {
            value(draw, Quantity::Speed, units)
        },
        curve: curve(
            draw,
            (0.0, units.from_native(Quantity::Speed, 3000.0)),
            (0.0, units.from_native(Quantity::Enthalpy, 100.0)),
        ),
    });
    if draw.chance(0.3) {
        // Closed heaters only: an open heater has no tubes.
        for (drop, heater) in l.water_pressure_drops.iter_mut().zip(spec.heaters()) {
            if heater.kind != HeaterKind::Open || draw.chance(0.05) {
                *drop = units.from_native(Quantity::Pressure, draw.range(0.0, 0.15));
            }
        }
    }
    let leaks = match draw.below(10) {
        0..=5 => 0,
        6..=8 => 1,
        _ => 2 + draw.below(MAX_LEAKS - 1),
    };
    for slot in l.leaks.iter_mut().take(leaks) {
        let casing = index(draw, spec.casings().len());
        *slot = Some(Leak {
            from: if draw.chance(0.8) {
                LeakSource::CasingInlet(casing)
            } else {
                LeakSource::CasingExhaust(casing)
            },
            to: destination(draw, spec),
            fraction: if draw.chance(0.9) {
                draw.range(0.0, 0.01)
            } else {
                flow(draw)
            },
        });
    }
    l.makeup = draw.chance(0.3).then(|| Makeup {
        fraction: draw.range(0.0, 0.03),
        pressure: units.from_native(Quantity::Pressure, draw.range(0.1, 1.0)),
        temperature: units.from_native(Quantity::Temperature, draw.range(280.0, 330.0)),
        lost_as: if draw.chance(0.5) {
            WaterLoss::Blowdown
        } else {
            WaterLoss::ThrottleSteam
        },
    });
    let heaters = !spec.heaters().is_empty();
    l.feed_pump_turbine = (heaters && draw.chance(0.2)).then(|| FeedPumpTurbine {
        steam_from: index(draw, spec.heaters().len()),
        exhaust_to: if draw.chance(0.7) {
            SteamDestination::Condenser
        } else {
            destination(draw, spec)
        },
        isentropic_efficiency: efficiency(draw),
    });
    l
}

/// The off-design options, each present by chance.
fn options(draw: &mut impl Draw, units: Units) -> OffDesignOptions {
    OffDesignOptions {
        efficiency_correction: draw
            .chance(0.2)
            .then(|| curve(draw, (0.0, 2.0), (0.8, 1.05))),
        design_cooling_water: draw.chance(0.2).then(|| cooling_water(draw, units)),
        heater_transfer: draw.chance(0.2).then(|| HeaterTransfer {
            ua_flow_exponent: draw.range(0.0, 1.0),
        }),
    }
}

fn cooling_water(draw: &mut impl Draw, units: Units) -> CoolingWater {
    CoolingWater {
        inlet_temperature: units.from_native(Quantity::Temperature, draw.range(275.0, 310.0)),
        flow: units.from_native(Quantity::MassFlow, draw.range(1e3, 5e4)),
    }
}

/// A throttle flow from 20 % to 120 % of `design` (in the caller's
/// units), or adversarial.
fn part_load(draw: &mut impl Draw, design: f64) -> f64 {
    if draw.chance(0.9) {
        design * draw.range(0.2, 1.2)
    } else {
        flow(draw)
    }
}

/// The most flows of a case's load curve (each is an off-design solve:
/// a few keep the target's cost down; `MAX_LOAD_POINTS` is the C
/// table's, tested in `plant/off_design_abi_tests.rs`).
const MAX_FLOWS: usize = 5;

/// A plant case.
pub fn plant_case(draw: &mut impl Draw) -> PlantCase {
    let mut spec = cycle(draw);
    spec.losses = losses(draw, &spec);
    let units = spec.units;
    let design = spec.losses.throttle_flow.unwrap_or(1.0);
    let control = if draw.chance(0.5) {
        ThrottleControl::FixedPressure
    } else {
        ThrottleControl::SlidingPressure
    };
    let mut point = OperatingPoint::new(part_load(draw, design), control);
    point.condenser = match draw.below(4) {
        0 | 1 => CondenserCondition::Design,
        2 => CondenserCondition::Pressure(if draw.chance(0.9) {
            units.from_native(Quantity::Pressure, draw.range(0.003, 0.02))
        } else {
            value(draw, Quantity::Pressure, units)
        }),
        _ => CondenserCondition::CoolingWater(cooling_water(draw, units)),
    };
    if draw.chance(0.2) {
        point.out_of_service[draw.below(MAX_HEATERS)] = true;
    }
    let flows = (0..draw.below(MAX_FLOWS + 1))
        .map(|_| part_load(draw, design))
        .collect();
    let net = units.from_native(Quantity::Power, draw.decades(3.0, 6.0));
    PlantCase {
        spec,
        options: options(draw, units),
        point,
        flows,
        target: if draw.chance(0.9) {
            net
        } else {
            value(draw, Quantity::Power, units)
        },
    }
}
