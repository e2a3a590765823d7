//! Stodola's cone (ellipse) law for a stage group, and each stage
//! group's flow and end pressures as a solved cycle gives them, which
//! calibrate it and move the pressures at another flow.
//!
//! The law in its usual form (recalled from Stodola, "Steam and Gas
//! Turbines"): a group of many stages passes
//! m = K·√((p_in² − p_out²)/(p_in·v_in)), K fixed by the group's
//! geometry, so one balance calibrates it.

use super::expansion::{ExpansionLine, MAX_GROUPS};
use super::record::stage_group_flow;
use super::side_streams::SideStreams;
use super::sweeps::TrainFlows;
use crate::numerics::math::sqrt;

/// One stage group in a solved cycle, native units.
#[derive(Clone, Copy, Debug, PartialEq)]
pub(super) struct GroupOperation {
    /// The casing it belongs to (0 is the first).
    pub(super) casing: usize,
    /// Its inlet pressure, MPa.
    pub(super) inlet_pressure: f64,
    /// Its inlet specific volume, m³/kg.
    pub(super) inlet_volume: f64,
    /// Its outlet pressure, MPa.
    pub(super) outlet_pressure: f64,
    /// Its steam per unit throttle flow.
    pub(super) flow: f64,
}

impl GroupOperation {
    /// K of the cone law at this operation, with `throttle_flow` (kg/s)
    /// the scale of `flow`.
    pub(super) fn flow_coefficient(&self, throttle_flow: f64) -> f64 {
        let p_in = self.inlet_pressure;
        let p_out = self.outlet_pressure;
        self.flow * throttle_flow / sqrt((p_in * p_in - p_out * p_out) / (p_in * self.inlet_volume))
    }

    /// The inlet pressure at which a group of coefficient `k` passes
    /// `mass_flow` (kg/s) to `p_out`, its inlet's p·v taken from this
    /// operation: the cone law solved for p_in. Iterated with the cycle,
    /// p·v (which varies slowly with p) settles with the pressures.
    pub(super) fn inlet_pressure_for(&self, k: f64, mass_flow: f64, p_out: f64) -> f64 {
        let ratio = mass_flow / k;
        sqrt(p_out * p_out + ratio * ratio * self.inlet_pressure * self.inlet_volume)
    }
}

/// Every stage group of a solved cycle, from the throttle down.
#[derive(Clone, Copy, Debug, PartialEq)]
pub(super) struct StageGroups {
    groups: [GroupOperation; MAX_GROUPS],
    count: usize,
}

impl StageGroups {
    /// None yet.
    pub(super) const NONE: StageGroups = StageGroups {
        groups: [GroupOperation {
            casing: 0,
            inlet_pressure: 0.0,
            inlet_volume: 0.0,
            outlet_pressure: 0.0,
            flow: 0.0,
        }; MAX_GROUPS],
        count: 0,
    };

    /// The groups of `line` with the flows the train and side streams give.
    pub(super) fn record(&mut self, line: &ExpansionLine, flows: &TrainFlows, side: &SideStreams) {
        self.count = line.groups().len();
        for (slot, group) in self.groups.iter_mut().zip(line.groups()) {
            *slot = GroupOperation {
                casing: group.casing,
                inlet_pressure: group.inlet.native().p,
                inlet_volume: group.inlet.native().v,
                outlet_pressure: group.outlet.native().p,
                flow: stage_group_flow(group, flows, side),
            };
        }
    }

    /// The groups, from the throttle down.
    pub(super) fn groups(&self) -> &[GroupOperation] {
        &self.groups[..self.count]
    }
}
