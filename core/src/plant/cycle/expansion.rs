//! The expansion line: the steam through every stage group of every
//! casing, with its state at each extraction point, and the extraction
//! lines that bring it to each heater's shell. None of it depends on the
//! flows (each stage group expands at its casing's efficiency from its
//! own inlet), so it is solved once, before the feedwater train.

use super::spec::{CycleSpec, Reheat, MAX_CASINGS, MAX_HEATERS};
use super::{at, heater_part, CONTROL_VALVES, REHEATER};
use crate::constants::CRITICAL_PRESSURE;
use crate::plant::fault::{refuse, refuse_with};
use crate::plant::mixing::throttle as throttle_to;
use crate::plant::turbine::{check_pressure_falls, expand};
use crate::plant::{check_efficiency, native, PlantFigure, PlantPart};
use crate::{Error, Quantity, State, Units};

/// Each casing's exhaust ends one stage group and each extraction point
/// at most one more, so a line has at most this many.
pub(super) const MAX_GROUPS: usize = MAX_CASINGS + MAX_HEATERS;

/// A stage group: part of a casing between two extraction points.
#[derive(Clone, Copy)]
pub(super) struct Group {
    pub(super) casing: usize,
    pub(super) inlet: State,
    pub(super) outlet: State,
    /// How many heaters take their steam upstream of this group.
    pub(super) extractions_upstream: usize,
}

/// The solved expansion line, native units.
pub(super) struct ExpansionLine {
    groups: [Group; MAX_GROUPS],
    group_count: usize,
    /// The steam at each heater's extraction point.
    pub(super) extraction: [State; MAX_HEATERS],
    /// The casing each heater takes its steam from.
    pub(super) extraction_casing: [usize; MAX_HEATERS],
    /// The steam after the control valves, when they throttle it.
    pub(super) control_valves: Option<State>,
    /// Cold and hot reheat, when the cycle reheats.
    pub(super) reheat: Option<(State, State)>,
    /// The last casing's exhaust, into the condenser.
    pub(super) exhaust: State,
    /// The steam arriving at each casing's inlet, before any leakage
    /// returning there joins it.
    pub(super) arriving: [State; MAX_CASINGS],
}

impl ExpansionLine {
    /// A line not yet expanded, every state in it `throttle`. (Built in
    /// the caller's frame and filled by [`ExpansionLine::expand`]: a line
    /// returned by value inside a `Result` is copied once more.)
    pub(super) fn new(throttle: State) -> ExpansionLine {
        ExpansionLine {
            groups: [Group {
                casing: 0,
                inlet: throttle,
                outlet: throttle,
                extractions_upstream: 0,
            }; MAX_GROUPS],
            group_count: 0,
            extraction: [throttle; MAX_HEATERS],
            extraction_casing: [0usize; MAX_HEATERS],
            control_valves: None,
            reheat: None,
            exhaust: throttle,
            arriving: [throttle; MAX_CASINGS],
        }
    }

    /// Expands `throttle` through every casing of `spec`, reheating
    /// before the second, and finds the steam at each extraction point.
    /// With `control_valves` (a native pressure) the throttle steam is
    /// first throttled to it, at constant enthalpy. A casing with a
    /// specific enthalpy in `mixtures` starts from it, at its inlet
    /// pressure: the steam arriving there mixed with leakages that return
    /// to it.
    pub(super) fn expand(
        &mut self,
        spec: &CycleSpec,
        throttle: State,
        control_valves: Option<f64>,
        mixtures: &[Option<f64>; MAX_CASINGS],
    ) -> Result<(), Error> {
        let units = spec.units;
        let heaters = spec.heaters();
        let mut next = 0;
        let mut inlet = throttle;
        for (c, casing) in spec.casings().iter().enumerate() {
            let part = PlantPart::numbered("casing", c);
            let efficiency = check_efficiency(casing.isentropic_efficiency, part)?;
            let p_exhaust = native(Quantity::Pressure, casing.exhaust_pressure, units)?;
            if let (1, Some(reheat)) = (c, spec.reheat) {
                inlet = self.reheat(inlet, reheat, units)?;
            }
            self.arriving[c] = inlet;
            if let (0, Some(p)) = (c, control_valves) {
                inlet = throttle_to(&inlet, p).map_err(at(CONTROL_VALVES))?;
                self.control_valves = Some(inlet);
            }
            if let Some(h) = mixtures[c] {
                inlet = State::from_ph(inlet.native().p, h, Units::Native)?;
            }
            check_pressure_falls(part, inlet.native().p, p_exhaust)?;
            inlet = self.expand_casing(spec, c, inlet, p_exhaust, efficiency, &mut next)?;
        }
        if next < heaters.len() {
            return Err(refuse(
                heater_part(&heaters[next], next),
                "its extraction pressure is below the condenser pressure",
            ));
        }
        self.exhaust = inlet;
        Ok(())
    }

    /// Ends the last stage group, and the line, at `end` instead (the
    /// used energy end point, past the exhaust loss).
    pub(super) fn end_at(&mut self, end: State) {
        self.groups[self.group_count - 1].outlet = end;
        self.exhaust = end;
    }

    /// Casing `c`'s inlet and exhaust states (every casing has a group).
    pub(super) fn casing_ends(&self, c: usize) -> (State, State) {
        let mut groups = self.groups().iter().filter(|g| g.casing == c);
        let Some(first) = groups.next() else {
            return (self.exhaust, self.exhaust);
        };
        let last = groups.next_back().unwrap_or(first);
        (first.inlet, last.outlet)
    }

    /// The stage groups, from the throttle down.
    pub(super) fn groups(&self) -> &[Group] {
        &self.groups[..self.group_count]
    }

    /// Reheats `cold` (the first casing's exhaust) as `reheat` says and
    /// returns the hot reheat steam.
    fn reheat(&mut self, cold: State, reheat: Reheat, units: Units) -> Result<State, Error> {
        let hot = State::from_pt(
            native(Quantity::Pressure, reheat.pressure, units)?,
            native(Quantity::Temperature, reheat.temperature, units)?,
            Units::Native,
        )?;
        if hot.native().p > cold.native().p || hot.native().h <= cold.native().h {
            return Err(refuse(
                REHEATER,
                "its hot reheat is above the cold reheat pressure or not hotter",
            ));
        }
        self.reheat = Some((cold, hot));
        Ok(hot)
    }

    /// Casing `c` from `inlet` down to `p_exhaust`: a stage group to each
    /// extraction point within it, then one to its exhaust. `next` is the
    /// first heater not yet given its extraction steam. Returns the
    /// casing's exhaust.
    fn expand_casing(
        &mut self,
        spec: &CycleSpec,
        c: usize,
        inlet: State,
        p_exhaust: f64,
        efficiency: f64,
        next: &mut usize,
    ) -> Result<State, Error> {
        let heaters = spec.heaters();
        let mut current = inlet;
        while *next < heaters.len() {
            let p_extraction = native(
                Quantity::Pressure,
                heaters[*next].extraction_pressure,
                spec.units,
            )?;
            if p_extraction < p_exhaust {
                break;
            }
            if p_extraction > current.native().p {
                return Err(refuse(
                    heater_part(&heaters[*next], *next),
                    "its extraction pressure is not below the previous one, or lies between the reheater's inlet and outlet pressures",
                ));
            }
            if p_extraction < current.native().p {
                current = self.push_group(c, current, p_extraction, efficiency, *next)?;
            }
            self.extraction[*next] = current;
            self.extraction_casing[*next] = c;
            *next += 1;
        }
        if current.native().p > p_exhaust {
            current = self.push_group(c, current, p_exhaust, efficiency, *next)?;
        }
        Ok(current)
    }

    /// Expands `inlet` down to `p_out` as the next stage group of casing
    /// `casing`, with `extractions_upstream` heaters fed before it, and
    /// returns the group's outlet.
    fn push_group(
        &mut self,
        casing: usize,
        inlet: State,
        p_out: f64,
        efficiency: f64,
        extractions_upstream: usize,
    ) -> Result<State, Error> {
        let outlet = expand(&inlet, p_out, efficiency)
            .map_err(at(PlantPart::numbered("casing", casing)))?
            .exhaust;
        self.groups[self.group_count] = Group {
            casing,
            inlet,
            outlet,
            extractions_upstream,
        };
        self.group_count += 1;
        Ok(outlet)
    }
}

/// The steam at each heater's shell: its extraction steam throttled
/// through the extraction line's fractional pressure loss. Each shell
/// lies below the one above and above the condenser, so water can drain
/// down the train.
pub(super) fn heater_shells(
    spec: &CycleSpec,
    line: &ExpansionLine,
) -> Result<[State; MAX_HEATERS], Error> {
    let extraction = &line.extraction;
    let mut shell = *extraction;
    for (j, heater) in spec.heaters().iter().enumerate() {
        let loss = heater.extraction_line_loss;
        if !(0.0..1.0).contains(&loss) {
            return Err(refuse_with(
                PlantPart::numbered("extraction line", j),
                "its fractional pressure loss lies outside [0, 1)",
                PlantFigure::number("loss", loss, None),
            ));
        }
        if extraction[j].native().p >= CRITICAL_PRESSURE {
            return Err(refuse_with(
                heater_part(heater, j),
                "its steam cannot condense: its pressure is not below the critical pressure",
                PlantFigure::native(
                    "extraction pressure",
                    Quantity::Pressure,
                    extraction[j].native().p,
                    Some(CRITICAL_PRESSURE),
                    spec.units,
                ),
            ));
        }
        if loss > 0.0 {
            shell[j] = throttle_to(&extraction[j], extraction[j].native().p * (1.0 - loss))
                .map_err(at(PlantPart::numbered("extraction line", j)))?;
        }
        if j > 0 && shell[j].native().p >= shell[j - 1].native().p
            || shell[j].native().p <= line.exhaust.native().p
        {
            return Err(refuse(
                heater_part(heater, j),
                "its shell pressure is not below the heater above's and above the condenser's",
            ));
        }
    }
    Ok(shell)
}
