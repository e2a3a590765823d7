//! Off-design inputs: a drawn cycle (mostly within sane limits) given a
//! design throttle flow, the model's options (a correction curve through (1, 1) or not, a design
//! cooling water able to condense its steam or not), and operating
//! points from 20 % to 110 % of the design flow, both throttle controls,
//! the three condenser conditions and random heaters out of service,
//! each sometimes adversarial.

use ebullio::plant::{
    CondenserCondition, CoolingWater, Curve, CycleSpec, HeaterTransfer, OffDesignOptions,
    OperatingPoint, ThrottleControl, ALL_IN_SERVICE, MAX_HEATERS,
};
use ebullio::saturation_line::saturation_temperature;
use ebullio::{Quantity, Units};

use super::draw::Draw;
use super::plant::{cycle, sane_cycle};
use super::values::value;

/// A model to calibrate and the points to solve it at.
#[derive(Clone, Debug)]
pub struct OffDesignCase {
    /// The design, with its throttle flow (or, rarely, without).
    pub design: CycleSpec,
    /// What the model knows beyond the design balance.
    pub options: OffDesignOptions,
    /// Where to run it.
    pub points: Vec<OperatingPoint>,
}

/// Operating points per model.
const POINTS: usize = 4;

/// A correction curve: through (1, 1) and falling away from it, or
/// narrow (its ends near 1), or one that misses (1, 1).
fn correction(draw: &mut impl Draw) -> Option<Curve> {
    let below = draw.range(0.05, 0.9);
    let above = draw.range(1.02, 2.5);
    let points: Vec<(f64, f64)> = match draw.below(8) {
        0 => vec![(1.0 - 1e-3, 0.999), (1.0, 1.0), (1.0 + 1e-3, 0.999)],
        1 => vec![(below, draw.range(0.5, 1.2)), (above, draw.range(0.5, 1.2))],
        _ => vec![
            (below, draw.range(0.6, 1.0)),
            ((1.0 + below) / 2.0, draw.range(0.9, 1.0)),
            (1.0, 1.0),
            (above, draw.range(0.8, 1.0)),
        ],
    };
    Curve::new(&points).ok()
}

/// The design condenser's saturation temperature (K), if the last
/// casing's exhaust is a pressure on the line.
fn condensing_temperature(design: &CycleSpec) -> Option<f64> {
    let p = design
        .units
        .to_native(Quantity::Pressure, design.condenser_pressure()?);
    (p.is_finite() && p > 0.0008 && p < 22.0).then(|| saturation_temperature(p))
}

/// A cooling water in `units` for a unit of `throttle_flow` kg/s whose
/// steam condenses at `t_sat` K: colder than it, some 15 to 80 times the
/// steam flow (a rise of a few to some twenty kelvin), or adversarial.
fn cooling_water(
    draw: &mut impl Draw,
    units: Units,
    throttle_flow: f64,
    t_sat: f64,
) -> CoolingWater {
    if draw.chance(0.85) {
        CoolingWater {
            inlet_temperature: units.from_native(
                Quantity::Temperature,
                (t_sat - draw.range(2.0, 35.0)).max(274.0),
            ),
            flow: units.from_native(Quantity::MassFlow, throttle_flow * draw.range(15.0, 80.0)),
        }
    } else {
        CoolingWater {
            inlet_temperature: value(draw, Quantity::Temperature, units),
            flow: value(draw, Quantity::MassFlow, units),
        }
    }
}

/// A drawn off-design case.
pub fn off_design_case(draw: &mut impl Draw) -> OffDesignCase {
    let mut design = if draw.chance(0.85) {
        let units = draw.pick(&Units::ALL);
        sane_cycle(draw, units)
    } else {
        cycle(draw)
    };
    let units = design.units;
    let flow = draw.range(20.0, 800.0);
    design.losses.throttle_flow = if draw.chance(0.97) {
        Some(units.from_native(Quantity::MassFlow, flow))
    } else {
        None
    };
    let t_sat = condensing_temperature(&design).unwrap_or(310.0);
    let design_water = draw
        .chance(0.6)
        .then(|| cooling_water(draw, units, flow, t_sat));
    let efficiency_correction = if draw.chance(0.6) {
        correction(draw)
    } else {
        None
    };
    // Heaters by their UA: an exponent mostly in [0, 1], sometimes one
    // the model must refuse.
    let heater_transfer = draw.chance(0.4).then(|| HeaterTransfer {
        ua_flow_exponent: if draw.chance(0.9) {
            draw.range(0.0, 1.0)
        } else {
            draw.pick(&[-0.5, 1.5, f64::NAN])
        },
    });
    let options = OffDesignOptions {
        efficiency_correction,
        design_cooling_water: design_water,
        heater_transfer,
    };
    let heaters = design.heaters().len();
    let points = (0..POINTS)
        .map(|_| {
            let throttle_flow = if draw.chance(0.95) {
                units.from_native(Quantity::MassFlow, flow * draw.range(0.2, 1.1))
            } else {
                value(draw, Quantity::MassFlow, units)
            };
            let control = draw.pick(&[
                ThrottleControl::FixedPressure,
                ThrottleControl::SlidingPressure,
            ]);
            let mut point = OperatingPoint::new(throttle_flow, control);
            // By its cooling water mostly where the model knows its UA.
            let by_water = if design_water.is_some() {
                1.0 / 3.0
            } else {
                0.05
            };
            point.condenser = match draw.below(2) {
                _ if draw.chance(by_water) => {
                    CondenserCondition::CoolingWater(match design_water {
                        Some(water) if draw.chance(0.7) => CoolingWater {
                            inlet_temperature: water.inlet_temperature
                                + units.from_native(
                                    Quantity::TemperatureDifference,
                                    draw.range(-10.0, 10.0),
                                ),
                            flow: water.flow * draw.range(0.5, 1.5),
                        },
                        _ => cooling_water(draw, units, flow, t_sat),
                    })
                }
                0 => CondenserCondition::Design,
                _ => CondenserCondition::Pressure(if draw.chance(0.85) {
                    design.condenser_pressure().unwrap_or(0.0) * draw.decades(-0.3, 0.5)
                } else {
                    value(draw, Quantity::Pressure, units)
                }),
            };
            for out in point.out_of_service.iter_mut().take(heaters) {
                *out = draw.chance(0.15);
            }
            if draw.chance(0.03) {
                point.out_of_service = ALL_IN_SERVICE;
                point.out_of_service[draw.below(MAX_HEATERS)] = true;
            }
            point
        })
        .collect();
    OffDesignCase {
        design,
        options,
        points,
    }
}
