//! A closed feedwater heater: extraction steam condenses in the shell and
//! heats the feedwater in the tubes. Its temperatures are set the way the
//! trade specifies them (common practice): the terminal temperature
//! difference TTD = T_sat(shell) − T_feedwater,out, and the drain cooler
//! approach DCA = T_drain,out − T_feedwater,in (no drain cooler: the drain
//! leaves as saturated liquid). The extraction flow follows from the
//! energy balance. The stand-alone heater has no water-side pressure drop;
//! in a cycle, the description may give one.

use super::fault::{finite_figures, in_caller_units, refuse, refuse_with, second_law};
use super::{finite_flow, native};
use super::{PlantFigure, PlantPart};
use crate::equations::saturation_line::saturation_temperature;
use crate::numerics::constants::CRITICAL_PRESSURE;
use crate::{Error, Phase, Quantity, Saturation, State, Units};

/// Relative rounding between a saturation temperature and the same
/// temperature of a state solved on the saturation line.
const TEMPERATURE_ROUNDING: f64 = 1e-12;

const CLOSED_HEATER: PlantPart = PlantPart::single("closed heater");

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
    let flow = finite_flow(feedwater_flow, CLOSED_HEATER)?;
    let (fw_out, drain) = end_states(
        extraction,
        feedwater_in,
        feedwater_in.native().p,
        approach,
        CLOSED_HEATER,
    )?;
    let (e, a, b, d) = (
        extraction.native(),
        feedwater_in.native(),
        fw_out.native(),
        drain.native(),
    );
    let (c_flow, c) = match cascaded_drains {
        Some((m, state)) => (finite_flow(m, CLOSED_HEATER)?, *state.native()),
        None => (0.0, *d),
    };
    let duty = flow * (b.h - a.h);
    let extraction_flow = steam_for_duty(duty, c_flow, c.h, d.h, e.h);
    if extraction_flow < 0.0 {
        return Err(refuse(
            CLOSED_HEATER,
            "its cascaded drains alone give more heat than its feedwater takes",
        ));
    }
    desuperheating_zone(CLOSED_HEATER, extraction, &fw_out, flow, extraction_flow)?;
    let entropy_generation =
        extraction_flow * (d.s - e.s) + c_flow * (d.s - c.s) + flow * (b.s - a.s);
    finite_figures(CLOSED_HEATER, &[duty, extraction_flow, entropy_generation])?;
    let entropy_flows = [extraction_flow * e.s, c_flow * c.s, flow * a.s, flow * b.s];
    second_law(CLOSED_HEATER, entropy_generation, entropy_flows, units)?;
    Ok(ClosedHeater {
        feedwater_out: fw_out.in_units(units),
        drain_out: drain.in_units(units),
        extraction_flow,
        duty: units.from_native(Quantity::Enthalpy, duty),
        entropy_generation: units.from_native(Quantity::Entropy, entropy_generation),
    })
}

/// The steam a closed heater condenses, from its energy balance: the
/// `duty` its feedwater takes, less what `cascaded_flow` of drains at
/// `h_cascaded` give up falling to the drain enthalpy `h_drain`, over
/// what each unit of steam at `h_steam` gives up.
pub(crate) fn steam_for_duty(
    duty: f64,
    cascaded_flow: f64,
    h_cascaded: f64,
    h_drain: f64,
    h_steam: f64,
) -> f64 {
    (duty - cascaded_flow * (h_cascaded - h_drain)) / (h_steam - h_drain)
}

/// The feedwater outlet (at `outlet_pressure`, native: below the inlet's
/// by the tubes' pressure drop) and drain states (native units) that the
/// approach temperatures fix, with the checks that make them a heater.
pub(crate) fn end_states(
    extraction: &State,
    feedwater_in: &State,
    outlet_pressure: f64,
    approach: HeaterApproach,
    part: PlantPart,
) -> Result<(State, State), Error> {
    let units = feedwater_in.units();
    // The states below are solved natively; their range errors read in
    // the caller's units.
    let caller = |e| in_caller_units(e, units);
    let ttd = native(
        Quantity::TemperatureDifference,
        approach.terminal_temperature_difference,
        units,
    )?;
    let shell = extraction.native();
    let fw = feedwater_in.native();
    if shell.p >= CRITICAL_PRESSURE {
        return Err(refuse(
            part,
            "its shell pressure is not below the critical pressure",
        ));
    }
    if extraction.native().h
        <= Saturation::at_pressure(shell.p, Units::Native)
            .map_err(caller)?
            .liquid()
            .native()
            .h
    {
        return Err(refuse(
            part,
            "its extraction steam is not above its drain enthalpy",
        ));
    }
    let t_shell = saturation_temperature(shell.p);
    let t_out = t_shell - ttd;
    if t_out <= fw.t {
        return Err(refuse(
            part,
            "its terminal temperature difference leaves no temperature rise for its feedwater",
        ));
    }
    // Heat flows from hot to cold: the feedwater can leave no hotter than
    // the steam enters the shell, whatever the TTD (common practice; a
    // negative TTD needs superheated steam and a desuperheating zone).
    // Equal is the ideal heater (TTD 0 on saturated steam), to rounding.
    if t_out > shell.t * (1.0 + TEMPERATURE_ROUNDING) {
        return Err(refuse_with(
            part,
            "its feedwater would leave hotter than the steam entering its shell",
            PlantFigure::native(
                "feedwater outlet",
                Quantity::Temperature,
                t_out,
                Some(shell.t),
                units,
            ),
        ));
    }
    let fw_out = State::from_pt(outlet_pressure, t_out, Units::Native).map_err(caller)?;
    if fw_out.phase() != Phase::CompressedLiquid {
        return Err(refuse(
            part,
            "its feedwater would boil: its pressure is too low for its outlet temperature",
        ));
    }
    let drain = drain_state(
        approach.drain_cooler_approach,
        (shell.p, t_shell),
        fw.t,
        units,
        part,
    )?;
    Ok((fw_out, drain))
}

/// The drain leaving a shell at pressure and saturation temperature
/// `(p_shell, t_shell)` (native): saturated liquid without a drain
/// cooler, else `drain_cooler_approach` (in `units`) above the feedwater
/// inlet temperature `t_feedwater_in`, below `t_shell`.
fn drain_state(
    drain_cooler_approach: Option<f64>,
    (p_shell, t_shell): (f64, f64),
    t_feedwater_in: f64,
    units: Units,
    part: PlantPart,
) -> Result<State, Error> {
    let caller = |e| in_caller_units(e, units);
    match drain_cooler_approach {
        None => Ok(*Saturation::at_pressure(p_shell, Units::Native)
            .map_err(caller)?
            .liquid()),
        Some(dca) => {
            let t_drain = t_feedwater_in + native(Quantity::TemperatureDifference, dca, units)?;
            if dca < 0.0 || t_drain >= t_shell {
                return Err(refuse(part, "its drain cooler approach is negative or puts the drain at or above the shell saturation temperature"));
            }
            Ok(State::from_pt(p_shell, t_drain, Units::Native).map_err(caller)?)
        }
    }
}

/// With a negative TTD the feedwater leaves above the shell saturation
/// temperature, and only the steam's superheat (its desuperheating zone)
/// can heat it there: `feedwater_flow` × (h_out − h(T_sat)) must not
/// exceed `extraction_flow` × (h_steam − h_g). Refuses a heater that
/// would need more.
pub(crate) fn desuperheating_zone(
    part: PlantPart,
    shell: &State,
    feedwater_out: &State,
    feedwater_flow: f64,
    extraction_flow: f64,
) -> Result<(), Error> {
    let (e, b) = (shell.native(), feedwater_out.native());
    let t_sat = saturation_temperature(e.p);
    if b.t <= t_sat {
        return Ok(());
    }
    let caller = |e| in_caller_units(e, shell.units());
    let at_saturation = State::from_pt(b.p, t_sat, Units::Native)
        .map_err(caller)?
        .native()
        .h;
    let needed = feedwater_flow * (b.h - at_saturation);
    let h_vapour = Saturation::at_pressure(e.p, Units::Native)
        .map_err(caller)?
        .vapour()
        .native()
        .h;
    let available = extraction_flow * (e.h - h_vapour);
    if needed > available.max(0.0) {
        // Per unit feedwater flow (needed > 0, so that flow is not 0).
        return Err(refuse_with(
            part,
            "the steam's superheat cannot heat the feedwater this far",
            PlantFigure::native(
                "needed per unit feedwater",
                Quantity::Enthalpy,
                needed / feedwater_flow,
                Some(available.max(0.0) / feedwater_flow),
                shell.units(),
            ),
        ));
    }
    Ok(())
}
