//! Closed heaters taken out of service: the extraction valve closed (no
//! steam leaves at that point, but the point stays a stage boundary, so
//! the line keeps its stage groups and the cone law its group count),
//! the feedwater bypassed, and the drains cascaded from above passed on
//! to the next heater in service below (or the condenser).
//!
//! In the result such a heater keeps its number and its points and
//! components, with no steam and no drain: zero extraction, steam and
//! drain flows, its feedwater leaving as it entered. The bypass is taken
//! to throttle the water by the tubes' design pressure drop, so every
//! pump discharges as at design (with no drop given the water passes
//! unchanged, to the bit).
//!
//! Refused: an open heater (a deaerator's storage feeds the pump after
//! it: no bypass keeps the train), a heater that receives a leakage or a
//! feed pump turbine's exhaust, or whose extraction point feeds the feed
//! pump turbine (the steam would have nowhere to go or no line to come
//! from), and a heater the cycle lacks.

use super::losses::SteamDestination;
use super::off_design_options::HeatersOutOfService;
use super::spec::{CycleSpec, HeaterKind};
use super::sweeps::HeaterWater;
use super::{at, heater_part};
use crate::plant::fault::refuse;
use crate::plant::mixing::throttle;
use crate::plant::PlantPart;
use crate::Error;

/// Whether `spec` may run with `out_of_service` heaters out (see the
/// module's list of refusals).
pub(super) fn check(spec: &CycleSpec, out_of_service: &HeatersOutOfService) -> Result<(), Error> {
    let heaters = spec.heaters();
    let losses = &spec.losses;
    for (j, _) in out_of_service.iter().enumerate().filter(|(_, &out)| out) {
        let Some(heater) = heaters.get(j) else {
            return Err(refuse(
                PlantPart::numbered("heater out of service", j),
                "the cycle has no such heater",
            ));
        };
        let part = heater_part(heater, j);
        if heater.kind == HeaterKind::Open {
            return Err(refuse(
                part,
                "an open heater cannot be taken out of service: the pump after it draws from it",
            ));
        }
        let to_here = SteamDestination::HeaterShell(j);
        if losses.leaks.iter().flatten().any(|leak| leak.to == to_here) {
            return Err(refuse(
                part,
                "out of service it cannot receive a leakage; send the leakage elsewhere",
            ));
        }
        if let Some(drive) = &losses.feed_pump_turbine {
            if drive.steam_from == j || drive.exhaust_to == to_here {
                return Err(refuse(
                    part,
                    "out of service it cannot supply or receive the feed pump turbine's steam",
                ));
            }
        }
    }
    Ok(())
}

/// Heater `j`'s water when bypassed: its feedwater throttled to
/// `above_pressure` (the tubes' design drop, none when it is none), and
/// no drain (its drain states hold that water, at no flow). Returns the
/// water it sends up.
pub(super) fn bypass_water(
    w: &mut HeaterWater,
    j: usize,
    above_pressure: f64,
) -> Result<crate::State, Error> {
    if w.feedwater_in.native().p > above_pressure {
        w.feedwater_out = throttle(&w.feedwater_in, above_pressure)
            .map_err(at(PlantPart::numbered("feedwater bypass of heater", j)))?;
    } else {
        w.feedwater_out = w.feedwater_in;
    }
    w.drain = w.feedwater_out;
    w.drain_pumped = w.feedwater_out;
    w.mixed = w.feedwater_out;
    Ok(w.feedwater_out)
}

/// A bypassed heater's flows: no steam, no drain, the feedwater `above`
/// passing through; drains cascaded from above pass it by.
pub(super) fn bypass_flows(w: &mut HeaterWater, above: f64) {
    w.extraction_flow = 0.0;
    w.feedwater_flow = above;
    w.outlet_flow = above;
    w.drain_flow = 0.0;
    w.cascaded_in = None;
}
