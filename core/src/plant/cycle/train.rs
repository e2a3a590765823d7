//! The feedwater train's pressures and pumps. Each heater's tube side
//! (closed) or its pump's discharge (open) is at the pressure of the
//! part above it, up to the feed pump's discharge into the boiler; the
//! condensate pump lifts the hotwell to the lowest of them.

use super::spec::{CycleSpec, HeaterKind, MAX_HEATERS};
use super::{at, heater_part};
use crate::plant::closed_heater::HeaterApproach;
use crate::plant::fault::{refuse, refuse_with};
use crate::plant::pump::compress;
use crate::plant::{check_efficiency, native, PlantFigure, PlantPart};
use crate::{Error, Quantity, State};

const FEED_PUMP: PlantPart = PlantPart::single("feed pump");
const CONDENSATE_PUMP: PlantPart = PlantPart::single("condensate pump");

/// The train's pressures, pumps and approaches, native units.
pub(super) struct FeedwaterTrain {
    /// The pressure each heater's water goes up to: the next part above
    /// (a closed heater's tubes, an open heater's pump discharge).
    pub(super) above_pressure: [f64; MAX_HEATERS],
    /// Whether the water above each heater reaches the boiler without
    /// passing an open heater (its pump is then the feed pump).
    pub(super) pumps_to_boiler: [bool; MAX_HEATERS],
    /// The water the condensate pump delivers from the hotwell.
    pub(super) condensate_pump_outlet: State,
    /// Drain pumps share the condensate pump's efficiency.
    pub(super) drain_pump_efficiency: f64,
    /// The closed heaters' approaches in native temperature differences.
    pub(super) approaches: [HeaterApproach; MAX_HEATERS],
}

impl FeedwaterTrain {
    /// The train of `spec` between the `hotwell` and the `throttle`, with
    /// its heaters' shells at `shell`.
    pub(super) fn new(
        spec: &CycleSpec,
        throttle: &State,
        hotwell: &State,
        shell: &[State; MAX_HEATERS],
    ) -> Result<FeedwaterTrain, Error> {
        let drops = water_pressure_drops(spec)?;
        // The drops between the feed pump and the boiler: of the closed
        // heaters above the highest open heater.
        let to_boiler: f64 = spec
            .heaters()
            .iter()
            .zip(&drops)
            .take_while(|(h, _)| h.kind != HeaterKind::Open)
            .map(|(_, d)| d)
            .sum();
        let feed_pressure = match spec.feed_pressure {
            Some(p) => native(Quantity::Pressure, p, spec.units)? - to_boiler,
            None => throttle.native().p,
        };
        if feed_pressure < throttle.native().p {
            return Err(refuse(
                FEED_PUMP,
                if to_boiler > 0.0 {
                    "its discharge pressure less the heaters' water-side pressure drops is below the throttle pressure"
                } else {
                    "its discharge pressure is below the throttle pressure"
                },
            ));
        }
        let mut above_pressure = [feed_pressure; MAX_HEATERS];
        let mut pumps_to_boiler = [true; MAX_HEATERS];
        let mut to_boiler = true;
        let mut line_pressure = feed_pressure;
        for (j, heater) in spec.heaters().iter().enumerate() {
            above_pressure[j] = line_pressure;
            pumps_to_boiler[j] = to_boiler;
            if heater.kind == HeaterKind::Open {
                line_pressure = shell[j].native().p;
                to_boiler = false;
            } else {
                line_pressure += drops[j];
            }
        }
        let condensate_pump = compress(hotwell, line_pressure, pump_efficiency(spec, to_boiler)?)
            .map_err(at(train_pump(to_boiler)))?;
        Ok(FeedwaterTrain {
            above_pressure,
            pumps_to_boiler,
            condensate_pump_outlet: condensate_pump.outlet,
            drain_pump_efficiency: check_efficiency(
                spec.condensate_pump_efficiency,
                CONDENSATE_PUMP,
            )?,
            approaches: native_approaches(spec)?,
        })
    }
}

/// The pump that lifts water out of the train's lowest section or from
/// an open heater: the feed pump when the boiler is next (`to_boiler`),
/// a condensate pump otherwise.
fn train_pump(to_boiler: bool) -> PlantPart {
    if to_boiler {
        FEED_PUMP
    } else {
        CONDENSATE_PUMP
    }
}

/// The isentropic efficiency of [`train_pump`]`(to_boiler)`.
pub(super) fn pump_efficiency(spec: &CycleSpec, to_boiler: bool) -> Result<f64, Error> {
    let efficiency = if to_boiler {
        spec.feed_pump_efficiency
    } else {
        spec.condensate_pump_efficiency
    };
    check_efficiency(efficiency, train_pump(to_boiler))
}

/// Each heater's water-side pressure drop, native: finite, not negative,
/// and none on an open heater.
fn water_pressure_drops(spec: &CycleSpec) -> Result<[f64; MAX_HEATERS], Error> {
    let mut drops = [0.0; MAX_HEATERS];
    let given = &spec.losses.water_pressure_drops;
    for (j, (heater, drop)) in spec.heaters().iter().zip(given).enumerate() {
        let part = heater_part(heater, j);
        let d = native(Quantity::Pressure, *drop, spec.units)?;
        if d < 0.0 {
            return Err(refuse_with(
                part,
                "its water-side pressure drop is negative",
                PlantFigure::native(
                    "pressure drop",
                    Quantity::Pressure,
                    d,
                    Some(0.0),
                    spec.units,
                ),
            ));
        }
        if d > 0.0 && heater.kind == HeaterKind::Open {
            return Err(refuse(
                part,
                "an open heater has no tubes for a water-side pressure drop",
            ));
        }
        drops[j] = d;
    }
    Ok(drops)
}

/// The closed heaters' approaches in native temperature differences.
pub(super) fn native_approaches(spec: &CycleSpec) -> Result<[HeaterApproach; MAX_HEATERS], Error> {
    let units = spec.units;
    let dt = |x| native(Quantity::TemperatureDifference, x, units);
    let mut approaches = [HeaterApproach {
        terminal_temperature_difference: 0.0,
        drain_cooler_approach: None,
    }; MAX_HEATERS];
    for (a, heater) in approaches.iter_mut().zip(spec.heaters()) {
        if let HeaterKind::Closed { approach, .. } = heater.kind {
            *a = HeaterApproach {
                terminal_temperature_difference: dt(approach.terminal_temperature_difference)?,
                drain_cooler_approach: match approach.drain_cooler_approach {
                    Some(d) => Some(dt(d)?),
                    None => None,
                },
            };
        }
    }
    Ok(approaches)
}
