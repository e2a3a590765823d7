//! Plant inputs: cycle descriptions within sane limits (a reheat unit of
//! the kind DESIGN.md's invented Tallowmere Station is, in every unit
//! system) and beyond them (a field or three replaced by an adversarial
//! value: compressed-liquid supply, heaters out of order, TTD −60 K,
//! efficiency 1e-300, a condenser below the triple point, NaN), and the
//! numbers the single components are called with.

use ebullio::plant::{
    Casing, CycleSpec, Drains, Heater, HeaterApproach, HeaterKind, Reheat, Supply,
};
use ebullio::saturation_line::saturation_temperature;
use ebullio::{Quantity, Units};

use super::draw::Draw;
use super::values::{value, SPECIALS};

/// An isentropic efficiency: sane in (0.5, 1], or adversarial.
pub fn efficiency(draw: &mut impl Draw) -> f64 {
    if draw.chance(0.8) {
        if draw.chance(0.2) {
            1.0
        } else {
            draw.range(0.5, 1.0)
        }
    } else {
        draw.pick(&[
            0.0,
            1e-300,
            -0.5,
            1.0 + f64::EPSILON,
            2.0,
            f64::NAN,
            f64::INFINITY,
            5e-324,
            f64::MAX,
        ])
    }
}

/// A mass flow: sane, or adversarial.
pub fn flow(draw: &mut impl Draw) -> f64 {
    if draw.chance(0.8) {
        draw.range(0.0, 10.0)
    } else {
        draw.pick(&SPECIALS)
    }
}

/// A temperature difference (TTD, DCA, subcooling) in native kelvin.
fn difference(draw: &mut impl Draw, lo: f64, hi: f64) -> f64 {
    draw.range(lo, hi)
}

/// A cycle within sane limits, native units, then read in `units`.
pub fn sane_cycle(draw: &mut impl Draw, units: Units) -> CycleSpec {
    let p = |x: f64| units.from_native(Quantity::Pressure, x);
    let t = |x: f64| units.from_native(Quantity::Temperature, x);
    let dt = |x: f64| units.from_native(Quantity::TemperatureDifference, x);
    let throttle = draw.range(1.0, 30.0);
    let supply = if throttle < 20.0 && draw.chance(0.25) {
        Supply::SaturatedVapour {
            pressure: p(throttle),
        }
    } else {
        let t_min = if throttle < 22.0 {
            saturation_temperature(throttle) + 20.0
        } else {
            700.0
        };
        Supply::Superheated {
            pressure: p(throttle),
            temperature: t(draw.range(t_min.max(600.0), 900.0)),
        }
    };
    let mut spec = CycleSpec::new(units, supply);
    let condenser = draw.range(0.003, 0.02);
    let casings = 1 + draw.below(4);
    let mut exhausts: Vec<f64> = (1..casings)
        .map(|_| draw.decades(condenser.log10() + 0.3, (throttle * 0.8).log10()))
        .collect();
    exhausts.sort_by(|a, b| b.total_cmp(a));
    exhausts.push(condenser);
    for &e in &exhausts {
        let _ = spec.push_casing(Casing {
            exhaust_pressure: p(e),
            isentropic_efficiency: draw.range(0.7, 1.0),
        });
    }
    if casings >= 2 && draw.chance(0.5) {
        spec.reheat = Some(Reheat {
            pressure: p(exhausts[0] * draw.range(0.9, 1.0)),
            temperature: t(draw.range(700.0, 880.0)),
        });
    }
    let heaters = draw.below(9);
    let mut pressures: Vec<f64> = (0..heaters)
        .map(|_| draw.decades((condenser * 1.5).log10(), (throttle * 0.9).log10()))
        .collect();
    pressures.sort_by(|a, b| b.total_cmp(a));
    let open_at = if draw.chance(0.6) && heaters > 0 {
        Some(draw.below(heaters))
    } else {
        None
    };
    for (k, &x) in pressures.iter().enumerate() {
        let kind = if Some(k) == open_at {
            HeaterKind::Open
        } else {
            HeaterKind::Closed {
                approach: HeaterApproach {
                    terminal_temperature_difference: dt(difference(draw, -3.0, 6.0)),
                    drain_cooler_approach: draw
                        .chance(0.5)
                        .then(|| dt(difference(draw, 3.0, 10.0))),
                },
                drains: if draw.chance(0.7) {
                    Drains::CascadeBackward
                } else {
                    Drains::PumpForward
                },
            }
        };
        let _ = spec.push_heater(Heater {
            extraction_pressure: p(x),
            extraction_line_loss: draw.range(0.0, 0.08),
            kind,
        });
    }
    spec.feed_pump_efficiency = draw.range(0.7, 1.0);
    spec.condensate_pump_efficiency = draw.range(0.7, 1.0);
    spec.condensate_subcooling = dt(difference(draw, 0.0, 3.0));
    if draw.chance(0.3) {
        spec.feed_pressure = Some(p(throttle * draw.range(1.0, 1.3)));
    }
    spec
}

/// One field of `spec` replaced by something impossible or adversarial.
fn spoil(draw: &mut impl Draw, spec: &mut CycleSpec) {
    let units = spec.units;
    match draw.below(12) {
        0 => {
            // Compressed liquid, or anything, as the "superheated" supply.
            spec.supply = Supply::Superheated {
                pressure: value(draw, Quantity::Pressure, units),
                temperature: value(draw, Quantity::Temperature, units),
            };
        }
        1 => {
            spec.supply = Supply::SaturatedVapour {
                pressure: value(draw, Quantity::Pressure, units),
            }
        }
        2 => {
            // A casing's exhaust anywhere (out of order, below the triple
            // point, above the throttle).
            let mut casings: Vec<Casing> = spec.casings().to_vec();
            let k = draw.below(casings.len());
            casings[k].exhaust_pressure = value(draw, Quantity::Pressure, units);
            rebuild(spec, Some(&casings), None);
        }
        3 => {
            let mut casings: Vec<Casing> = spec.casings().to_vec();
            let k = draw.below(casings.len());
            casings[k].isentropic_efficiency = efficiency(draw);
            rebuild(spec, Some(&casings), None);
        }
        4 | 5 => {
            let mut heaters: Vec<Heater> = spec.heaters().to_vec();
            if heaters.is_empty() {
                heaters.push(Heater {
                    extraction_pressure: value(draw, Quantity::Pressure, units),
                    extraction_line_loss: 0.0,
                    kind: HeaterKind::Open,
                });
            }
            let k = draw.below(heaters.len());
            match draw.below(4) {
                0 => heaters[k].extraction_pressure = value(draw, Quantity::Pressure, units),
                1 => {
                    heaters[k].extraction_line_loss =
                        draw.pick(&[-0.5, 1.0, 1.5, f64::NAN, 0.999999])
                }
                _ => {
                    heaters[k].kind = HeaterKind::Closed {
                        approach: HeaterApproach {
                            terminal_temperature_difference: if draw.chance(0.7) {
                                units.from_native(
                                    Quantity::TemperatureDifference,
                                    draw.range(-100.0, 100.0),
                                )
                            } else {
                                value(draw, Quantity::TemperatureDifference, units)
                            },
                            drain_cooler_approach: draw.chance(0.5).then(|| {
                                units.from_native(
                                    Quantity::TemperatureDifference,
                                    draw.range(-20.0, 60.0),
                                )
                            }),
                        },
                        drains: if draw.chance(0.5) {
                            Drains::CascadeBackward
                        } else {
                            Drains::PumpForward
                        },
                    }
                }
            }
            rebuild(spec, None, Some(&heaters));
        }
        6 => spec.feed_pump_efficiency = efficiency(draw),
        7 => spec.condensate_pump_efficiency = efficiency(draw),
        8 => spec.condensate_subcooling = value(draw, Quantity::TemperatureDifference, units),
        9 => spec.feed_pressure = Some(value(draw, Quantity::Pressure, units)),
        10 => {
            spec.reheat = Some(Reheat {
                pressure: value(draw, Quantity::Pressure, units),
                temperature: value(draw, Quantity::Temperature, units),
            })
        }
        _ => {
            // Everything ideal, a heater at the throttle's own pressure.
            let mut heaters: Vec<Heater> = spec.heaters().to_vec();
            let throttle = match spec.supply {
                Supply::Superheated { pressure, .. } | Supply::SaturatedVapour { pressure } => {
                    pressure
                }
            };
            heaters.insert(
                0,
                Heater {
                    extraction_pressure: throttle * draw.range(0.9, 1.0),
                    extraction_line_loss: 0.0,
                    kind: HeaterKind::Closed {
                        approach: HeaterApproach {
                            terminal_temperature_difference: 0.0,
                            drain_cooler_approach: None,
                        },
                        drains: Drains::CascadeBackward,
                    },
                },
            );
            heaters.truncate(ebullio::plant::MAX_HEATERS);
            rebuild(spec, None, Some(&heaters));
        }
    }
}

/// `spec` with these casings (and heaters, if given) instead of its own.
fn rebuild(spec: &mut CycleSpec, casings: Option<&[Casing]>, heaters: Option<&[Heater]>) {
    let casings: Vec<Casing> = casings.map_or_else(|| spec.casings().to_vec(), <[Casing]>::to_vec);
    let heaters: Vec<Heater> = heaters.map_or_else(|| spec.heaters().to_vec(), <[Heater]>::to_vec);
    let mut fresh = CycleSpec::new(spec.units, spec.supply);
    fresh.reheat = spec.reheat;
    fresh.feed_pressure = spec.feed_pressure;
    fresh.feed_pump_efficiency = spec.feed_pump_efficiency;
    fresh.condensate_pump_efficiency = spec.condensate_pump_efficiency;
    fresh.condensate_subcooling = spec.condensate_subcooling;
    for &c in &casings {
        let _ = fresh.push_casing(c);
    }
    for &h in &heaters {
        let _ = fresh.push_heater(h);
    }
    *spec = fresh;
}

/// A cycle description: within sane limits or beyond them.
pub fn cycle(draw: &mut impl Draw) -> CycleSpec {
    let units = draw.pick(&Units::ALL);
    let mut spec = sane_cycle(draw, units);
    if draw.chance(0.5) {
        for _ in 0..1 + draw.below(3) {
            spoil(draw, &mut spec);
        }
    }
    spec
}
