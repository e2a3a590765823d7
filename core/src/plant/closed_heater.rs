//! A closed feedwater heater: extraction steam condenses in the shell and
//! heats the feedwater in the tubes. Its temperatures are set the way the
//! trade specifies them (common practice): the terminal temperature
//! difference TTD = T_sat(shell) − T_feedwater,out, and the drain cooler
//! approach DCA = T_drain,out − T_feedwater,in (no drain cooler: the drain
//! leaves as saturated liquid). The extraction flow follows from the
//! energy balance. Water-side pressure drop is not modelled.

use super::native;
use crate::constants::CRITICAL_PRESSURE;
use crate::saturation_line::saturation_temperature;
use crate::{Error, Phase, Quantity, Saturation, State, Units};

/// How a closed heater's temperatures are set, in the caller's units
/// (temperature differences).
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct HeaterApproach {
    /// T_sat(shell) − T_feedwater,out; negative where a desuperheating
    /// zone heats the feedwater above the shell saturation temperature.
    pub terminal_temperature_difference: f64,
    /// T_drain,out − T_feedwater,in with a drain cooler; `None` without
    /// one (the drain leaves as saturated liquid at the shell pressure).
    pub drain_cooler_approach: Option<f64>,
}

/// A solved closed heater. Flows are in the unit of the feedwater flow
/// given; the duty is that flow times the specific energy unit.
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct ClosedHeater {
    /// Feedwater leaving the tubes.
    pub feedwater_out: State,
    /// Condensate leaving the shell.
    pub drain_out: State,
    /// Extraction steam flow that the energy balance requires.
    pub extraction_flow: f64,
    /// Heat given to the feedwater.
    pub duty: f64,
    /// Entropy generated in the heater, including the flashing of any
    /// cascaded drains into its shell (flow × specific entropy unit).
    pub entropy_generation: f64,
}

/// Solves a closed heater whose shell holds `extraction` steam (its state
/// at the shell, after the extraction line's pressure loss), heating
/// `feedwater_flow` of `feedwater_in`, with optional `cascaded_drains`
/// (flow, state) from the heater above flashing into the shell.
pub fn closed_heater(
    extraction: &State,
    feedwater_in: &State,
    feedwater_flow: f64,
    cascaded_drains: Option<(f64, &State)>,
    approach: HeaterApproach,
) -> Result<ClosedHeater, Error> {
    let units = feedwater_in.units();
    let flow = finite_flow(feedwater_flow)?;
    let (fw_out, drain) = end_states(extraction, feedwater_in, approach)?;
    let (e, a, b, d) = (
        extraction.native(),
        feedwater_in.native(),
        fw_out.native(),
        drain.native(),
    );
    let (c_flow, c) = match cascaded_drains {
        Some((m, state)) => (finite_flow(m)?, *state.native()),
        None => (0.0, *d),
    };
    let duty = flow * (b.h - a.h);
    let extraction_flow = (duty - c_flow * (c.h - d.h)) / (e.h - d.h);
    if extraction_flow < 0.0 {
        return Err(Error::InvalidPlant {
            what: "a closed heater's cascaded drains alone give more heat than its feedwater takes",
        });
    }
    let entropy_generation =
        extraction_flow * (d.s - e.s) + c_flow * (d.s - c.s) + flow * (b.s - a.s);
    Ok(ClosedHeater {
        feedwater_out: fw_out.in_units(units),
        drain_out: drain.in_units(units),
        extraction_flow,
        duty: units.from_native(Quantity::Enthalpy, duty),
        entropy_generation: units.from_native(Quantity::Entropy, entropy_generation),
    })
}

/// The feedwater outlet and drain states (native units) that the
/// approach temperatures fix, with the checks that make them a heater.
pub(crate) fn end_states(
    extraction: &State,
    feedwater_in: &State,
    approach: HeaterApproach,
) -> Result<(State, State), Error> {
    let units = feedwater_in.units();
    let ttd = native(
        Quantity::TemperatureDifference,
        approach.terminal_temperature_difference,
        units,
    )?;
    let shell = extraction.native();
    let fw = feedwater_in.native();
    if shell.p >= CRITICAL_PRESSURE {
        return Err(Error::InvalidPlant {
            what: "a closed heater's shell pressure is not below the critical pressure",
        });
    }
    if extraction.native().h
        <= Saturation::at_pressure(shell.p, Units::Native)?
            .liquid()
            .native()
            .h
    {
        return Err(Error::InvalidPlant {
            what: "a closed heater's extraction steam is not above its drain enthalpy",
        });
    }
    let t_shell = saturation_temperature(shell.p);
    let t_out = t_shell - ttd;
    if t_out <= fw.t {
        return Err(Error::InvalidPlant {
            what: "a closed heater's terminal temperature difference leaves no temperature rise for its feedwater",
        });
    }
    let fw_out = State::from_pt(fw.p, t_out, Units::Native)?;
    if fw_out.phase() != Phase::CompressedLiquid {
        return Err(Error::InvalidPlant {
            what: "a closed heater's feedwater would boil: its pressure is too low for its outlet temperature",
        });
    }
    let drain = match approach.drain_cooler_approach {
        None => *Saturation::at_pressure(shell.p, Units::Native)?.liquid(),
        Some(dca) => {
            let t_drain = fw.t + native(Quantity::TemperatureDifference, dca, units)?;
            if dca < 0.0 || t_drain >= t_shell {
                return Err(Error::InvalidPlant {
                    what: "a drain cooler approach is negative or puts the drain at or above the shell saturation temperature",
                });
            }
            State::from_pt(shell.p, t_drain, Units::Native)?
        }
    };
    Ok((fw_out, drain))
}

pub(crate) fn finite_flow(flow: f64) -> Result<f64, Error> {
    if !flow.is_finite() || flow < 0.0 {
        return Err(Error::InvalidPlant {
            what: "a mass flow is negative or not finite",
        });
    }
    Ok(flow)
}
