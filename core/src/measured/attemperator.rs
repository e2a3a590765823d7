//! An attemperator's (a desuperheater's) spray flow from measured
//! temperatures: the steam's flow and (p,T) before it, the spray water's
//! (p,T), and the steam temperature after it, mixing at the steam
//! pressure. The energy balance, m·h_in + spray·h_spray = (m + spray)·h_out,
//! is the plant layer's [`crate::plant::spray_for_temperature`], operation
//! for operation.

use super::calculation::Calculation;
use super::flags::Flags;
use super::measurement::Measured;
use super::stream_state::{Expected, StreamState};
use super::tracked::Tracked;
use crate::plant::PlantPart;
use crate::{Error, Quantity, Units, Variable};

/// The readings of an attemperator. Flows in the caller's mass-flow unit.
#[derive(Clone, Copy, Debug, PartialEq, Default)]
pub struct AttemperatorTest {
    /// Steam flow entering (before the spray).
    pub steam_flow: Measured,
    /// Steam pressure (the spray mixes at it).
    pub steam_pressure: Measured,
    /// Steam temperature before the spray.
    pub steam_temperature: Measured,
    /// Spray water pressure.
    pub spray_pressure: Measured,
    /// Spray water temperature.
    pub spray_temperature: Measured,
    /// Steam temperature after the spray has mixed.
    pub outlet_temperature: Measured,
}

/// An attemperator's figures.
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct AttemperatorFigures<F> {
    /// Spray water flow by the energy balance.
    pub spray_flow: F,
    /// Steam flow leaving, steam plus spray.
    pub outlet_flow: F,
}

impl Calculation<6, 2> for AttemperatorTest {
    const INPUTS: [(&'static str, Quantity); 6] = [
        ("steam flow", Quantity::MassFlow),
        ("steam pressure", Quantity::Pressure),
        ("steam temperature", Quantity::Temperature),
        ("spray pressure", Quantity::Pressure),
        ("spray temperature", Quantity::Temperature),
        ("outlet temperature", Quantity::Temperature),
    ];
    const FIGURES: [(&'static str, Option<Quantity>); 2] = [
        ("spray flow", Some(Quantity::MassFlow)),
        ("outlet flow", Some(Quantity::MassFlow)),
    ];
    type Figures<F: Copy> = AttemperatorFigures<F>;

    fn named<F: Copy>([spray_flow, outlet_flow]: [F; 2]) -> AttemperatorFigures<F> {
        AttemperatorFigures {
            spray_flow,
            outlet_flow,
        }
    }

    fn measured(&self) -> [Measured; 6] {
        [
            self.steam_flow,
            self.steam_pressure,
            self.steam_temperature,
            self.spray_pressure,
            self.spray_temperature,
            self.outlet_temperature,
        ]
    }

    fn with_measured(&self, [m, ps, ts, pw, tw, to]: [Measured; 6]) -> Self {
        AttemperatorTest {
            steam_flow: m,
            steam_pressure: ps,
            steam_temperature: ts,
            spray_pressure: pw,
            spray_temperature: tw,
            outlet_temperature: to,
        }
    }

    fn compute<T: Tracked>(
        &self,
        [m, ps, ts, pw, tw, to]: [T; 6],
        units: Units,
    ) -> Result<([T; 2], Flags), Error> {
        let (steam, steam_flags) = StreamState::of(
            Expected::Vapour,
            (ps, ts),
            &self.steam_pressure,
            &self.steam_temperature,
            units,
        )?;
        let (outlet, outlet_flags) = StreamState::of(
            Expected::Vapour,
            (ps, to),
            &self.steam_pressure,
            &self.outlet_temperature,
            units,
        )?;
        let (spray, spray_flags) = StreamState::of(
            Expected::Liquid,
            (pw, tw),
            &self.spray_pressure,
            &self.spray_temperature,
            units,
        )?;
        let h_out = outlet.get(Variable::Enthalpy);
        let cooling = h_out - spray.get(Variable::Enthalpy);
        if cooling.value() <= 0.0 {
            return Err(Error::InvalidPlant {
                part: PlantPart::single("attemperator"),
                what: "its spray water is not colder than its outlet steam: no spray flow cools the steam to it",
                figure: None,
            });
        }
        let spray_flow = m * (steam.get(Variable::Enthalpy) - h_out) / cooling;
        let outlet_flow = m + spray_flow;
        let flags = steam_flags
            | outlet_flags
            | spray_flags.with_if(spray_flow.value() < 0.0, Flags::NEGATIVE_FLOW);
        Ok(([spray_flow, outlet_flow], flags))
    }
}
