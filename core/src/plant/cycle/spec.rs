//! A regenerative reheat Rankine cycle described as data: the steam
//! supply, the turbine casings, an optional reheat, the feedwater heaters
//! and the pumps. Fixed capacity, so a description lives on the stack and
//! crosses the C ABI as one caller-owned block.

use super::losses::Losses;
use crate::plant::closed_heater::HeaterApproach;
use crate::plant::fault::refuse;
use crate::plant::PlantPart;
use crate::{Error, Units};

/// The most turbine casings a cycle may have (HP, IP, and two LP, say).
pub const MAX_CASINGS: usize = 4;
/// The most feedwater heaters a cycle may have.
pub const MAX_HEATERS: usize = 12;

/// The steam the boiler delivers to the turbine throttle.
#[derive(Clone, Copy, Debug, PartialEq)]
pub enum Supply {
    /// Superheated (or supercritical) steam at a pressure and temperature.
    Superheated {
        /// Throttle pressure.
        pressure: f64,
        /// Throttle temperature.
        temperature: f64,
    },
    /// Saturated vapour at a pressure (below the critical pressure).
    SaturatedVapour {
        /// Throttle pressure.
        pressure: f64,
    },
}

/// A turbine casing: a group of stages expanding to an exhaust pressure.
/// Every stage group inside it (between extraction points) expands at
/// the casing's isentropic efficiency, from its own actual inlet state.
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct Casing {
    /// Exhaust pressure; the last casing's is the condenser pressure.
    pub exhaust_pressure: f64,
    /// Isentropic efficiency of each stage group, in (0, 1].
    pub isentropic_efficiency: f64,
}

/// Reheat of the first casing's exhaust (the cold reheat) to a hot reheat
/// state; the reheater's pressure loss is the difference between the
/// first casing's exhaust pressure and `pressure`.
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct Reheat {
    /// Hot reheat pressure, at the second casing's inlet.
    pub pressure: f64,
    /// Hot reheat temperature.
    pub temperature: f64,
}

/// Where a closed heater's drains go.
#[derive(Clone, Copy, Debug, PartialEq, Eq)]
pub enum Drains {
    /// Throttled (through a trap) into the next lower-pressure heater's
    /// shell, or into the condenser from the lowest heater.
    CascadeBackward,
    /// Pumped forward into the feedwater line just downstream of the
    /// heater (the drain pump works at the condensate pump efficiency).
    PumpForward,
}

/// What kind of feedwater heater.
#[derive(Clone, Copy, Debug, PartialEq)]
pub enum HeaterKind {
    /// A closed (shell-and-tube) heater.
    Closed {
        /// Its terminal temperature difference and drain cooler approach.
        approach: HeaterApproach,
        /// Where its drains go.
        drains: Drains,
    },
    /// An open (direct-contact) heater or deaerator; a pump follows it.
    Open,
}

/// A feedwater heater and its extraction.
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct Heater {
    /// Pressure at the turbine extraction point.
    pub extraction_pressure: f64,
    /// Fractional pressure loss of the extraction line: the heater shell
    /// works at extraction_pressure × (1 − loss). 0 for none.
    pub extraction_line_loss: f64,
    /// Closed or open.
    pub kind: HeaterKind,
}

/// A whole cycle. Heaters are listed from the highest extraction pressure
/// down and numbered 1, 2, … in that order in the results.
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct CycleSpec {
    /// Unit system of every number in the description and the results.
    pub units: Units,
    /// Throttle steam.
    pub supply: Supply,
    /// Reheat after the first casing, if any.
    pub reheat: Option<Reheat>,
    /// Boiler feed pump discharge pressure; `None` for the throttle
    /// pressure (a boiler without pressure loss, as textbooks take it).
    pub feed_pressure: Option<f64>,
    /// Isentropic efficiency of the pump that discharges to the boiler.
    pub feed_pump_efficiency: f64,
    /// Isentropic efficiency of every other pump (condensate, booster
    /// pumps after lower open heaters, drain pumps).
    pub condensate_pump_efficiency: f64,
    /// Subcooling of the condensate below the condenser saturation
    /// temperature (a temperature difference; 0 for saturated liquid).
    pub condensate_subcooling: f64,
    /// The plant's losses beyond the machines' efficiencies; none by
    /// default.
    pub losses: Losses,
    casings: [Casing; MAX_CASINGS],
    casing_count: usize,
    heaters: [Heater; MAX_HEATERS],
    heater_count: usize,
}

impl CycleSpec {
    /// A cycle with `supply`, no casings or heaters yet, no reheat, ideal
    /// pumps, saturated condensate and no boiler pressure loss.
    pub fn new(units: Units, supply: Supply) -> CycleSpec {
        let none = Casing {
            exhaust_pressure: 0.0,
            isentropic_efficiency: 1.0,
        };
        let no_heater = Heater {
            extraction_pressure: 0.0,
            extraction_line_loss: 0.0,
            kind: HeaterKind::Open,
        };
        CycleSpec {
            units,
            supply,
            reheat: None,
            feed_pressure: None,
            feed_pump_efficiency: 1.0,
            condensate_pump_efficiency: 1.0,
            condensate_subcooling: 0.0,
            losses: Losses::NONE,
            casings: [none; MAX_CASINGS],
            casing_count: 0,
            heaters: [no_heater; MAX_HEATERS],
            heater_count: 0,
        }
    }

    /// Appends the next casing downstream.
    pub fn push_casing(&mut self, casing: Casing) -> Result<(), Error> {
        if self.casing_count == MAX_CASINGS {
            return Err(refuse(
                PlantPart::single("cycle"),
                "more turbine casings than MAX_CASINGS",
            ));
        }
        self.casings[self.casing_count] = casing;
        self.casing_count += 1;
        Ok(())
    }

    /// Appends the next heater down in pressure.
    pub fn push_heater(&mut self, heater: Heater) -> Result<(), Error> {
        if self.heater_count == MAX_HEATERS {
            return Err(refuse(
                PlantPart::single("cycle"),
                "more feedwater heaters than MAX_HEATERS",
            ));
        }
        self.heaters[self.heater_count] = heater;
        self.heater_count += 1;
        Ok(())
    }

    /// The casings, from the throttle to the condenser.
    pub fn casings(&self) -> &[Casing] {
        &self.casings[..self.casing_count]
    }

    /// The heaters, from the highest extraction pressure down.
    pub fn heaters(&self) -> &[Heater] {
        &self.heaters[..self.heater_count]
    }

    /// The casings, to move their exhaust pressures off design.
    pub(super) fn casings_mut(&mut self) -> &mut [Casing] {
        &mut self.casings[..self.casing_count]
    }

    /// The heaters, to move their extraction pressures off design.
    pub(super) fn heaters_mut(&mut self) -> &mut [Heater] {
        &mut self.heaters[..self.heater_count]
    }

    /// The condenser pressure: the last casing's exhaust pressure.
    pub fn condenser_pressure(&self) -> Option<f64> {
        self.casings().last().map(|c| c.exhaust_pressure)
    }

    /// The same cycle with isentropic turbine sections and pumps (a feed
    /// pump turbine's too); every other part (pressures, losses, heater
    /// approaches) is kept.
    pub fn ideal(&self) -> CycleSpec {
        let mut ideal = *self;
        for casing in &mut ideal.casings[..ideal.casing_count] {
            casing.isentropic_efficiency = 1.0;
        }
        if let Some(drive) = &mut ideal.losses.feed_pump_turbine {
            drive.isentropic_efficiency = 1.0;
        }
        ideal.feed_pump_efficiency = 1.0;
        ideal.condensate_pump_efficiency = 1.0;
        ideal
    }
}
