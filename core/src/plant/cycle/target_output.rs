//! The unit at a target net output instead of a throttle flow: the
//! throttle flow is found by secant steps on the net output, each an
//! off-design solve. The net output rises with the flow nearly in
//! proportion (the auxiliaries' constant power aside), so the steps
//! settle in a few.

use super::off_design::{OffDesignModel, OperatingPoint, ThrottleControl};
use super::result::CycleResult;
use super::CONTROL_VALVES;
use crate::plant::fault::{in_caller_units, refuse_with};
use crate::plant::{native, PlantFigure, PlantPart};
use crate::{Error, Quantity};

/// Secant steps allowed. Measured: the demo unit of
/// `plant_off_design.rs` needs at most 4 (after the solve at the design
/// flow) from 30 % to 100 % of its output, either way of controlling
/// the throttle: 20 leave room for a less proportional unit.
const MAX_STEPS: usize = 20;
/// A net output within this (relative) of its target meets it: above
/// what the pressures' own tolerance (1e-11) leaves in the output.
const OUTPUT_TOLERANCE: f64 = 1e-10;
/// Steps of 5 % below the design flow tried for a first balance the
/// control valves pass, down to 50 %.
const WIDEST_FLOW_STEPS: usize = 10;

impl OffDesignModel {
    /// The unit at the throttle flow whose net output (a power, in the
    /// design's units) is `net_output`, every other condition as in
    /// `like` (whose own flow is not used): [`OffDesignModel::solve`]'s
    /// balance at that flow. At a
    /// fixed throttle pressure an output above the valves' wide open one
    /// (at the design flow) is refused (part "control valves"). Errors
    /// in the design's units.
    pub fn solve_for_output(
        &self,
        net_output: f64,
        like: &OperatingPoint,
    ) -> Result<CycleResult, Error> {
        let units = self.design().units;
        self.output_native(net_output, like)
            .map_err(|e| in_caller_units(e, units))
    }

    fn output_native(&self, net_output: f64, like: &OperatingPoint) -> Result<CycleResult, Error> {
        let units = self.design().units;
        let control = like.control;
        let target = native(Quantity::Power, net_output, units)?;
        if target <= 0.0 {
            return Err(refuse_with(
                PlantPart::single("plant"),
                "its target net output is not positive",
                PlantFigure::native("net output", Quantity::Power, target, Some(0.0), units),
            ));
        }
        // Net output (kW) and balance at `flow` kg/s.
        let at = |flow: f64| -> Result<(f64, CycleResult), Error> {
            let balance = self.solve(&like.at_flow(units.from_native(Quantity::MassFlow, flow)))?;
            let per_unit = units.to_native(Quantity::Enthalpy, balance.output.net_output);
            Ok((per_unit * flow, balance))
        };
        let (start_flow, (start_output, balance)) = self.widest_flow(control, &at)?;
        if (start_output - target).abs() <= OUTPUT_TOLERANCE * target {
            return Ok(balance);
        }
        if control == ThrottleControl::FixedPressure && target > start_output {
            return Err(refuse_with(
                CONTROL_VALVES,
                "wide open at the design throttle pressure they pass too little steam for this net output",
                PlantFigure::native(
                    "net output",
                    Quantity::Power,
                    target,
                    Some(start_output),
                    units,
                ),
            ));
        }
        let mut last = (start_flow, start_output - target);
        let mut flow = start_flow * target / start_output;
        for _ in 0..MAX_STEPS {
            if control == ThrottleControl::FixedPressure {
                flow = flow.min(start_flow);
            }
            let (output, balance) = at(flow)?;
            let residual = output - target;
            if residual.abs() <= OUTPUT_TOLERANCE * target {
                return Ok(balance);
            }
            let next = flow - residual * (flow - last.0) / (residual - last.1);
            last = (flow, residual);
            flow = next;
        }
        Err(Error::NotConverged {
            what: "throttle flow for the net output",
        })
    }

    /// The flow the secant starts from, its net output and balance: the
    /// design flow, or at a fixed throttle pressure where the valves
    /// wide open pass less than that (a heater out of service sends its
    /// steam on through the turbine, whose first group then needs more
    /// pressure for the design flow), the largest of 95 %, 90 %, … of it
    /// they pass: the secant then stays at or below it (so a target
    /// between that flow's output and the valves' true wide-open one, at
    /// most 5 % of the flow apart, is refused as beyond the valves).
    fn widest_flow(
        &self,
        control: ThrottleControl,
        at: &impl Fn(f64) -> Result<(f64, CycleResult), Error>,
    ) -> Result<(f64, (f64, CycleResult)), Error> {
        let design_flow = self.design_flow();
        let refusal = match at(design_flow) {
            Ok(solved) => return Ok((design_flow, solved)),
            Err(e) => e,
        };
        let valves =
            |e: &Error| matches!(e, Error::InvalidPlant { part, .. } if *part == CONTROL_VALVES);
        if control != ThrottleControl::FixedPressure || !valves(&refusal) {
            return Err(refusal);
        }
        for step in 1..=WIDEST_FLOW_STEPS {
            let flow = design_flow * (1.0 - 0.05 * step as f64);
            match at(flow) {
                Ok(solved) => return Ok((flow, solved)),
                Err(e) if valves(&e) => {}
                Err(e) => return Err(e),
            }
        }
        Err(refusal)
    }
}
