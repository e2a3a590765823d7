//! The feedwater train's pressures and pumps. Each heater's tube side
//! (closed) or its pump's discharge (open) is at the pressure of the
//! part above it, up to the feed pump's discharge into the boiler; the
//! condensate pump lifts the hotwell to the lowest of them.

use super::at;
use super::spec::{CycleSpec, HeaterKind, MAX_HEATERS};
use crate::plant::closed_heater::HeaterApproach;
use crate::plant::fault::refuse;
use crate::plant::pump::compress;
use crate::plant::{check_efficiency, native, PlantPart};
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
        let feed_pressure = match spec.feed_pressure {
            Some(p) => native(Quantity::Pressure, p, spec.units)?,
            None => throttle.native().p,
        };
        if feed_pressure < throttle.native().p {
            return Err(refuse(
                FEED_PUMP,
                "its discharge pressure is below the throttle pressure",
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

/// The closed heaters' approaches in native temperature differences.
fn native_approaches(spec: &CycleSpec) -> Result<[HeaterApproach; MAX_HEATERS], Error> {
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
