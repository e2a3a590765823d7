//! Limits the balances alone do not keep: a heater takes no more steam
//! than reaches its extraction point from the throttle, a closed heater
//! heats its feedwater above saturation only by the steam's superheat,
//! and the boiler only heats.

use super::expansion::ExpansionLine;
use super::side_streams::SideStreams;
use super::spec::{Heater, HeaterKind, MAX_HEATERS};
use super::sweeps::TrainFlows;
use super::{heater_part, FLOW_ROUNDING};
use crate::plant::closed_heater::desuperheating_zone;
use crate::plant::fault::refuse_with;
use crate::plant::{PlantFigure, PlantPart};
use crate::{Error, Quantity, State, Units};

const BOILER: PlantPart = PlantPart::single("boiler");

/// Every heater's extraction against the steam left after the heaters
/// above it, and every closed heater's desuperheating zone.
///
/// Steam that leaves the turbine outside the extraction lines (`side`:
/// leakages, a feed pump turbine's) counts against what reaches each
/// point, and against what is left for the condenser.
pub(super) fn check_extractions(
    heaters: &[Heater],
    flows: &TrainFlows,
    shell: &[State; MAX_HEATERS],
    side: &SideStreams,
    line: &ExpansionLine,
) -> Result<(), Error> {
    let mut reaching = 1.0;
    for (j, (heater, w)) in heaters.iter().zip(&flows.water).enumerate() {
        let part = heater_part(heater, j);
        let here = reaching - side.withdrawn_before(line.extraction_casing[j], j, false);
        if w.extraction_flow + side.drive_at(j) > here + FLOW_ROUNDING {
            return Err(refuse_with(
                part,
                "it needs more steam than reaches its extraction point",
                PlantFigure::number(
                    "extraction per unit throttle flow",
                    w.extraction_flow,
                    Some(here.max(0.0)),
                ),
            ));
        }
        reaching -= w.extraction_flow;
        if let HeaterKind::Closed { .. } = heater.kind {
            desuperheating_zone(
                part,
                &shell[j],
                &w.feedwater_out,
                w.feedwater_flow,
                w.extraction_flow,
            )?;
        }
    }
    let exhaust = reaching - side.withdrawn();
    if exhaust < -FLOW_ROUNDING {
        return Err(refuse_with(
            PlantPart::single("turbine"),
            "its extractions, leakages and feed pump turbine take more than the throttle flow",
            PlantFigure::number("exhaust per unit throttle flow", exhaust, Some(0.0)),
        ));
    }
    Ok(())
}

/// The boiler's heat per unit throttle flow, once its feedwater enters
/// colder than the throttle steam (a feed pump may discharge too hot).
pub(super) fn check_boiler(
    throttle: &State,
    boiler_inlet: &State,
    units: Units,
) -> Result<f64, Error> {
    let boiler_heat = throttle.native().h - boiler_inlet.native().h;
    if boiler_inlet.native().t >= throttle.native().t || boiler_heat <= 0.0 {
        return Err(refuse_with(
            BOILER,
            "its feedwater enters no colder than the throttle steam: the feed pump discharges too hot",
            PlantFigure::native(
                "feedwater",
                Quantity::Temperature,
                boiler_inlet.native().t,
                Some(throttle.native().t),
                units,
            ),
        ));
    }
    Ok(boiler_heat)
}
