//! Limits the balances alone do not keep: a heater takes no more steam
//! than reaches its extraction point from the throttle, a closed heater
//! heats its feedwater above saturation only by the steam's superheat,
//! and the boiler only heats.

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
pub(super) fn check_extractions(
    heaters: &[Heater],
    flows: &TrainFlows,
    shell: &[State; MAX_HEATERS],
) -> Result<(), Error> {
    let mut reaching = 1.0;
    for (j, (heater, w)) in heaters.iter().zip(&flows.water).enumerate() {
        let part = heater_part(heater, j);
        if w.extraction_flow > reaching + FLOW_ROUNDING {
            return Err(refuse_with(
                part,
                "it needs more steam than reaches its extraction point",
                PlantFigure::number(
                    "extraction per unit throttle flow",
                    w.extraction_flow,
                    Some(reaching.max(0.0)),
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
