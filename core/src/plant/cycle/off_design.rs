//! The unit away from its design point: a design balance calibrates each
//! stage group's cone law, and the same unit is then solved at another
//! throttle flow, its stage pressures from the cone law, from the
//! condenser backward.
//!
//! Nothing here is a second solver. An off-design case is a design solve
//! of the same description with the pressures the cone law gives (and,
//! at a fixed throttle pressure, the control valves' throttling); the
//! flows that solve gives move the pressures again, and the two are
//! iterated until the pressures settle.
//!
//! The options move more with the pressures: each casing's efficiency
//! by its volume flow (`efficiency_correction.rs`), the condenser
//! pressure by its cooling water (`condenser_cooling.rs`); heaters out
//! of service are bypassed by the design solve itself
//! (`out_of_service.rs`). Each closed heater keeps its design TTD and
//! DCA, or with [`OffDesignOptions::heater_transfer`] takes those its
//! zones' UA give at the last pass's flows (`heater_zones.rs`,
//! `heater_ntu.rs`), iterated with the pressures.

use super::condenser_cooling::{self, CondenserTransfer};
use super::cone_law::{GroupOperation, StageGroups};
use super::efficiency_correction::{check_curve, corrected_efficiencies, Outside};
use super::expansion::MAX_GROUPS;
use super::heater_ntu::HeaterPasses;
use super::heater_operation::HeaterOperations;
use super::heater_zones::CalibratedHeaters;
use super::losses::Losses;
use super::off_design_options::{
    CondenserCondition, HeatersOutOfService, OffDesignOptions, ALL_IN_SERVICE,
};
use super::out_of_service;
use super::output::{positive_throttle_flow, throttle_flow};
use super::relaxation::Relaxation;
use super::result::CycleResult;
use super::spec::{CycleSpec, Supply, MAX_HEATERS};
use super::{solve, CONTROL_VALVES};
use crate::plant::fault::{in_caller_units, refuse, refuse_with};
use crate::plant::{native, PlantFigure, PlantPart};
use crate::{Error, Quantity};

const MODEL: PlantPart = PlantPart::single("off-design model");

/// How the throttle pressure follows the load.
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
pub enum ThrottleControl {
    /// The boiler holds the design throttle pressure; below the design
    /// flow the control valves throttle the steam (at constant
    /// enthalpy) to the pressure the first stage group passes it at.
    FixedPressure,
    /// The valves stay wide open and the boiler's pressure follows the
    /// first stage group's cone law, at the design throttle temperature.
    SlidingPressure,
}

/// Where to run the unit.
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct OperatingPoint {
    /// Throttle steam mass flow (kg/s; lbm/h in US customary units).
    pub throttle_flow: f64,
    /// How the throttle pressure follows the flow.
    pub control: ThrottleControl,
    /// The condenser's pressure, or the cooling water that sets it.
    pub condenser: CondenserCondition,
    /// The heaters taken out of service.
    pub out_of_service: HeatersOutOfService,
}

impl OperatingPoint {
    /// `throttle_flow` with the throttle `control`led one way, the
    /// condenser at its design pressure and every heater in service.
    pub fn new(throttle_flow: f64, control: ThrottleControl) -> OperatingPoint {
        OperatingPoint {
            throttle_flow,
            control,
            condenser: CondenserCondition::Design,
            out_of_service: ALL_IN_SERVICE,
        }
    }

    /// The same conditions at another throttle flow.
    pub fn at_flow(&self, throttle_flow: f64) -> OperatingPoint {
        OperatingPoint {
            throttle_flow,
            ..*self
        }
    }
}

/// Where a heater's extraction point lies on the line: at a stage
/// group's outlet, or (extracting at a casing's inlet) at its inlet.
#[derive(Clone, Copy, Debug, PartialEq)]
enum Station {
    Outlet(usize),
    Inlet(usize),
}

/// A design balance calibrated for off-design operation: the design
/// description, its throttle flow and each stage group's cone law.
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct OffDesignModel {
    design: CycleSpec,
    /// The design throttle flow, kg/s.
    design_flow: f64,
    /// Each group at design, native units.
    at_design: StageGroups,
    /// Each group's cone-law coefficient K.
    flow_coefficients: [f64; MAX_GROUPS],
    /// Each heater's extraction point.
    stations: [Station; MAX_HEATERS],
    /// What the model knows beyond the design balance.
    options: OffDesignOptions,
    /// The condenser's UA, from the design cooling water.
    condenser: Option<CondenserTransfer>,
    /// The closed heaters' UA per zone, with `options.heater_transfer`.
    heaters: Option<CalibratedHeaters>,
}

/// Passes of the pressures and the balance allowed. The pressures move
/// with the flows' small changes and with p·v at the groups' inlets,
/// contracting about tenfold a pass (where they swing instead,
/// `relaxation.rs` damps them). Measured: the demo unit of
/// `plant_off_design.rs` settles in at most 12 passes from 30 % to 100 %
/// of its flow, either way of controlling the throttle, 14 with the
/// options of `plant_off_design_options.rs`; the random campaign's drawn
/// units (`random_inputs.rs`, `off_design_within_physical_limits`, eight
/// seeds, some 6600 balances) in at most 38; with its heaters by their
/// UA (`plant_heater_transfer.rs`) in at most 15 with a UA flow exponent
/// of 0.5 to 1, 16 with 0 (two of them refused and retried,
/// `HeaterPasses::after_refusal`); designs without drain coolers or with
/// a negative TTD, at a fixed UA, in at most 30 at 15 % of the flow.
const MAX_PASSES: usize = 100;
/// Pressures that move less than this (relative) between passes have
/// settled: finer than the cone law is needed, coarser than the states'
/// own resolution (relative 1e-10 promised, a few 1e-15 met).
const PRESSURE_TOLERANCE: f64 = 1e-11;

impl OffDesignModel {
    /// Calibrates `design`, which must give its throttle flow
    /// (`losses.throttle_flow`): it is solved as [`solve_cycle`](super::solve_cycle)
    /// solves it, and each stage group's K is its flow over
    /// √((p_in² − p_out²)/(p_in·v_in)) there. Errors are the design
    /// solve's, in `design.units`.
    pub fn calibrate(design: &CycleSpec) -> Result<OffDesignModel, Error> {
        Self::calibrate_with(design, &OffDesignOptions::NONE)
    }

    /// As [`OffDesignModel::calibrate`], with what the model knows beyond
    /// the design balance (`options`, in `design.units`).
    pub fn calibrate_with(
        design: &CycleSpec,
        options: &OffDesignOptions,
    ) -> Result<OffDesignModel, Error> {
        Self::calibrate_native(design, options).map_err(|e| in_caller_units(e, design.units))
    }

    fn calibrate_native(
        design: &CycleSpec,
        options: &OffDesignOptions,
    ) -> Result<OffDesignModel, Error> {
        if let Some(curve) = &options.efficiency_correction {
            check_curve(curve)?;
        }
        let Some(design_flow) = throttle_flow(&design.losses, design.units)? else {
            return Err(refuse(
                MODEL,
                "its calibration needs the design throttle flow (losses.throttle_flow)",
            ));
        };
        let mut at_design = StageGroups::NONE;
        let mut heaters_at_design = HeaterOperations::NONE;
        let balance = solve(
            design,
            None,
            &ALL_IN_SERVICE,
            Some(&mut at_design),
            Some(&mut heaters_at_design),
        )?;
        let mut flow_coefficients = [0.0; MAX_GROUPS];
        for (k, group) in flow_coefficients.iter_mut().zip(at_design.groups()) {
            *k = group.flow_coefficient(design_flow);
            if !(*k > 0.0 && k.is_finite()) {
                return Err(refuse(
                    MODEL,
                    "a stage group passes no steam at design, so its cone law has no coefficient",
                ));
            }
        }
        let mut stations = [Station::Inlet(0); MAX_HEATERS];
        for (station, heater) in stations.iter_mut().zip(design.heaters()) {
            let p = native(Quantity::Pressure, heater.extraction_pressure, design.units)?;
            *station = station_at(at_design.groups(), p);
        }
        let condenser = match &options.design_cooling_water {
            Some(water) => Some(CondenserTransfer::calibrate(
                water,
                condenser_cooling::duty(&balance, design_flow),
                at_design.groups()[at_design.groups().len() - 1].outlet_pressure,
                design.units,
            )?),
            None => None,
        };
        Ok(OffDesignModel {
            design: *design,
            design_flow,
            at_design,
            flow_coefficients,
            stations,
            options: *options,
            condenser,
            heaters: match &options.heater_transfer {
                Some(transfer) => Some(CalibratedHeaters::calibrate(
                    design,
                    &heaters_at_design,
                    design_flow,
                    transfer,
                )?),
                None => None,
            },
        })
    }

    /// The design description.
    pub fn design(&self) -> &CycleSpec {
        &self.design
    }

    /// The design throttle flow, kg/s.
    pub(super) fn design_flow(&self) -> f64 {
        self.design_flow
    }

    /// The unit at `point`: a full balance as [`solve_cycle`](super::solve_cycle)
    /// gives one, at the stage pressures where every group's cone law
    /// holds with the flows of that balance (to relative 1e-11 in the
    /// pressures) and, with [`OffDesignOptions::heater_transfer`], where
    /// each closed heater's TTD and DCA are those its zones give at those
    /// flows (to 1e-9 K). At a fixed throttle pressure the valves wide open pass
    /// the flow the first group takes at the design throttle pressure; a
    /// larger flow is refused (part "control valves"). Errors in the
    /// design's units; a balance whose pressures do not settle is
    /// [`Error::NotConverged`].
    pub fn solve(&self, point: &OperatingPoint) -> Result<CycleResult, Error> {
        self.solve_native(point)
            .map_err(|e| in_caller_units(e, self.design.units))
    }

    fn solve_native(&self, point: &OperatingPoint) -> Result<CycleResult, Error> {
        let units = self.design.units;
        let flow = positive_throttle_flow(point.throttle_flow, units)?;
        let mut losses = self.design.losses;
        losses.throttle_flow = Some(point.throttle_flow);
        out_of_service::check(&self.design, &point.out_of_service)?;
        let design_condenser =
            self.at_design.groups()[self.at_design.groups().len() - 1].outlet_pressure;
        // By its cooling water the condenser starts at its design
        // pressure and follows each pass's duty.
        let (mut condenser, cooling) = match point.condenser {
            CondenserCondition::Pressure(p) => (native(Quantity::Pressure, p, units)?, None),
            CondenserCondition::Design => (design_condenser, None),
            CondenserCondition::CoolingWater(water) => match &self.condenser {
                Some(transfer) => (design_condenser, Some((transfer, water))),
                None => {
                    return Err(refuse(
                        MODEL,
                        "a condenser by its cooling water needs the design cooling water (options.design_cooling_water)",
                    ))
                }
            },
        };
        // The first pressures from the design's flows and p·v, scaled to
        // the throttle flow.
        let mut pressures = self.cone_pressures(&self.at_design, flow, condenser);
        // The groups of the last pass, whose volume flows correct the
        // efficiencies (none before the first: design efficiencies).
        let mut last: Option<StageGroups> = None;
        let mut relaxation = Relaxation::new();
        // With heater_transfer, the closed heaters' approaches: the
        // design's, then each pass those the last one's flows give.
        let mut heater_passes = match &self.heaters {
            Some(calibrated) => Some(HeaterPasses::new(calibrated, &self.design)?),
            None => None,
        };
        for _ in 0..MAX_PASSES {
            let (mut spec, control_valves) =
                self.spec_at(&pressures, point, losses, last.as_ref().map(|g| (g, flow)))?;
            let mut solved = StageGroups::NONE;
            let mut heaters = HeaterOperations::NONE;
            if let Some(passes) = &heater_passes {
                passes.set_approaches(&mut spec);
            }
            let balance = match solve(
                &spec,
                control_valves,
                &point.out_of_service,
                Some(&mut solved),
                heater_passes.as_ref().map(|_| &mut heaters),
            ) {
                Ok(balance) => balance,
                // A pass refused at the approaches the last balance gave
                // may retry with those its own flows give.
                Err(_)
                    if heater_passes
                        .as_mut()
                        .is_some_and(|passes| passes.after_refusal(&spec, &heaters, flow)) =>
                {
                    continue
                }
                Err(error) => return Err(error),
            };
            if solved.groups().len() != self.at_design.groups().len() {
                return Err(refuse(
                    MODEL,
                    "its stage groups differ from the design's at these pressures",
                ));
            }
            if let Some((transfer, water)) = &cooling {
                let duty = condenser_cooling::duty(&balance, flow);
                condenser = transfer.condenser_pressure(water, duty, units)?;
            }
            let heaters_settled = match &mut heater_passes {
                Some(passes) => passes.advance(&spec, &heaters, flow)?,
                None => true,
            };
            let next = self.cone_pressures(&solved, flow, condenser);
            if next
                .iter()
                .zip(&pressures)
                .all(|(a, b)| (a.0 - b.0).abs() <= PRESSURE_TOLERANCE * b.0)
                && self.efficiencies_settled(last.as_ref(), &solved, flow)?
                && heaters_settled
            {
                return Ok(balance);
            }
            pressures = relaxation.next(&pressures, &next);
            last = Some(solved);
        }
        Err(Error::NotConverged {
            what: "off-design stage pressures",
        })
    }

    /// Each group's (inlet, outlet) pressure, native, from the cone law
    /// with `solved`'s flows and inlet p·v at `flow` kg/s of throttle
    /// steam, from `condenser` backward. Between casings the outlet is
    /// the next inlet times its design ratio (1 without a reheater: the
    /// reheater's fractional pressure loss is kept, as Δp ∝ m²·v ∝ p
    /// when p ∝ m).
    fn cone_pressures(
        &self,
        solved: &StageGroups,
        flow: f64,
        condenser: f64,
    ) -> [(f64, f64); MAX_GROUPS] {
        let design = self.at_design.groups();
        let mut pressures = [(0.0, 0.0); MAX_GROUPS];
        let mut p_out = condenser;
        for (g, group) in solved.groups().iter().enumerate().rev() {
            let p_in =
                group.inlet_pressure_for(self.flow_coefficients[g], group.flow * flow, p_out);
            pressures[g] = (p_in, p_out);
            if g > 0 {
                p_out = p_in * (design[g - 1].outlet_pressure / design[g].inlet_pressure);
            }
        }
        pressures
    }

    /// Whether the casings' corrected efficiencies at the groups of the
    /// `last` and `solved` passes (at `flow` kg/s) agree, as the
    /// pressures must (always without a correction, never after the
    /// first pass with one). Once they do, a volume flow ratio the
    /// passes took at the curve's end is refused.
    fn efficiencies_settled(
        &self,
        last: Option<&StageGroups>,
        solved: &StageGroups,
        flow: f64,
    ) -> Result<bool, Error> {
        let Some(curve) = &self.options.efficiency_correction else {
            return Ok(true);
        };
        let Some(last) = last else {
            return Ok(false);
        };
        let design = (&self.at_design, self.design_flow);
        let at = |groups| {
            corrected_efficiencies(
                curve,
                &self.design,
                design,
                (groups, flow),
                Outside::NearerEnd,
            )
        };
        let (before, after) = (at(last)?, at(solved)?);
        let settled = before
            .iter()
            .zip(&after)
            .all(|(a, b)| (a - b).abs() <= PRESSURE_TOLERANCE * b);
        if settled {
            corrected_efficiencies(curve, &self.design, design, (last, flow), Outside::Refused)?;
        }
        Ok(settled)
    }

    /// The design description at `pressures` (native) and the operating
    /// `point`, with `losses` at its throttle flow, each casing's
    /// efficiency corrected for the volume flows of `last` (the last
    /// pass's groups at `flow` kg/s; none on the first pass, which keeps
    /// the design efficiencies) when the model has a correction, and the
    /// control valves' outlet pressure (native) when they throttle.
    fn spec_at(
        &self,
        pressures: &[(f64, f64); MAX_GROUPS],
        point: &OperatingPoint,
        losses: Losses,
        last: Option<(&StageGroups, f64)>,
    ) -> Result<(CycleSpec, Option<f64>), Error> {
        let units = self.design.units;
        let to = |p| units.from_native(Quantity::Pressure, p);
        let groups = self.at_design.groups();
        // Heaters keep their design TTDs and DCAs here; with
        // heater_transfer the passes set those their zones give.
        let mut spec = self.design;
        spec.losses = losses;
        if let (Some(curve), Some(last)) = (&self.options.efficiency_correction, last) {
            let design = (&self.at_design, self.design_flow);
            let efficiencies =
                corrected_efficiencies(curve, &self.design, design, last, Outside::NearerEnd)?;
            for (casing, efficiency) in spec.casings_mut().iter_mut().zip(efficiencies) {
                casing.isentropic_efficiency = efficiency;
            }
        }
        for (c, casing) in spec.casings_mut().iter_mut().enumerate() {
            if let Some(g) = groups.iter().rposition(|group| group.casing == c) {
                casing.exhaust_pressure = to(pressures[g].1);
            }
        }
        for (heater, station) in spec.heaters_mut().iter_mut().zip(&self.stations) {
            heater.extraction_pressure = to(match *station {
                Station::Outlet(g) => pressures[g].1,
                Station::Inlet(g) => pressures[g].0,
            });
        }
        if let Some(reheat) = &mut spec.reheat {
            if let Some(g) = groups.iter().position(|group| group.casing == 1) {
                reheat.pressure = to(pressures[g].0);
            }
        }
        let first = pressures[0].0;
        let design_first = groups[0].inlet_pressure;
        match point.control {
            ThrottleControl::SlidingPressure => {
                match &mut spec.supply {
                    Supply::Superheated { pressure, .. } | Supply::SaturatedVapour { pressure } => {
                        *pressure = to(first)
                    }
                }
                // The feed pump discharge slides with the throttle
                // pressure, the boiler's fractional loss kept.
                if let Some(p) = &mut spec.feed_pressure {
                    *p *= first / design_first;
                }
                Ok((spec, None))
            }
            ThrottleControl::FixedPressure if first < design_first => Ok((spec, Some(first))),
            ThrottleControl::FixedPressure if first <= design_first * (1.0 + 1e-9) => {
                Ok((spec, None))
            }
            ThrottleControl::FixedPressure => Err(refuse_with(
                CONTROL_VALVES,
                "wide open they pass less than the throttle flow at the design throttle pressure",
                PlantFigure::native(
                    "first stage pressure",
                    Quantity::Pressure,
                    first,
                    Some(design_first),
                    units,
                ),
            )),
        }
    }
}

/// The station of the design pressure `p` among `groups`: the group
/// ending there, else the group starting there (an extraction at a
/// casing's inlet). The line was solved at these very pressures, so the
/// nearest boundary is the one.
fn station_at(groups: &[GroupOperation], p: f64) -> Station {
    let distance = |q: f64| (q - p).abs();
    let mut best = (Station::Inlet(0), distance(groups[0].inlet_pressure));
    for (g, group) in groups.iter().enumerate() {
        if distance(group.outlet_pressure) <= best.1 {
            best = (Station::Outlet(g), distance(group.outlet_pressure));
        }
        if distance(group.inlet_pressure) < best.1 {
            best = (Station::Inlet(g), distance(group.inlet_pressure));
        }
    }
    best.0
}
