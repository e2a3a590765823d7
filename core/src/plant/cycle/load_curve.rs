//! A load curve: the unit at several throttle flows in one call, one
//! row per flow with what a part-load chart shows (throttle pressure,
//! outputs, heat rates). Each row is [`OffDesignModel::solve`]'s balance
//! at its flow, to the bit; a flow whose balance is refused keeps its
//! refusal in its row, the others are still solved. The full balance at
//! any row's flow is one `solve` away.

use super::off_design::{OffDesignModel, OperatingPoint};
use super::result::{CycleResult, PlantOutput};
use crate::plant::fault::refuse;
use crate::plant::PlantPart;
use crate::Error;

/// The most flows one load curve holds.
pub const MAX_LOAD_POINTS: usize = 16;

/// One row of a load curve, in the design's units.
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct LoadPoint {
    /// Throttle steam pressure, at the boiler (before the control
    /// valves when they throttle).
    pub throttle_pressure: f64,
    /// The cycle's thermal efficiency.
    pub thermal_efficiency: f64,
    /// The plant's output, heat rates and powers at this flow (its
    /// powers hold the throttle flow).
    pub output: PlantOutput,
}

impl LoadPoint {
    fn of(balance: &CycleResult) -> LoadPoint {
        // The record writes the throttle first.
        LoadPoint {
            throttle_pressure: balance.points[0].state.pressure(),
            thermal_efficiency: balance.thermal_efficiency,
            output: balance.output,
        }
    }
}

/// The rows of a load curve, in the order of its flows.
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct LoadCurve {
    rows: [Result<LoadPoint, Error>; MAX_LOAD_POINTS],
    count: usize,
}

impl LoadCurve {
    /// Each flow's row, or its refusal.
    pub fn rows(&self) -> &[Result<LoadPoint, Error>] {
        &self.rows[..self.count]
    }
}

impl OffDesignModel {
    /// The unit at each of `flows` (throttle steam mass flows, in the
    /// design's units), every other condition (throttle control,
    /// condenser, heaters out of service) as in `like`, whose own flow
    /// is not used. Refused when there are more than [`MAX_LOAD_POINTS`]
    /// flows.
    pub fn load_curve(&self, flows: &[f64], like: &OperatingPoint) -> Result<LoadCurve, Error> {
        if flows.len() > MAX_LOAD_POINTS {
            return Err(refuse(
                PlantPart::single("load curve"),
                "it has more flows than MAX_LOAD_POINTS",
            ));
        }
        // Rows past `count` are never read.
        let mut curve = LoadCurve {
            rows: [Err(Error::NotConverged { what: "no flow" }); MAX_LOAD_POINTS],
            count: flows.len(),
        };
        for (row, &throttle_flow) in curve.rows.iter_mut().zip(flows) {
            *row = self
                .solve(&like.at_flow(throttle_flow))
                .map(|balance| LoadPoint::of(&balance));
        }
        Ok(curve)
    }
}
