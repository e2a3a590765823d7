//! An open heater's (a deaerator's) test: the extraction steam flow and
//! the outlet flow from its mass and energy balances, given the measured
//! water flows entering it. With the outlet flow m_out = m_ext + Σ m_i:
//! m_ext (h_ext − h_out) = Σ m_i (h_out − h_i)  (common practice).

use super::calculation::Calculation;
use super::flags::Flags;
use super::inflow::Inflow;
use super::measurement::Measured;
use super::stream_state::{Expected, StreamState};
use super::tracked::Tracked;
use crate::numerics::constants::CRITICAL_PRESSURE;
use crate::plant::PlantPart;
use crate::{Error, Quantity, Units, Variable};

/// Where the outlet's enthalpy comes from.
#[derive(Clone, Copy, Debug, PartialEq, Eq, Default)]
pub enum OpenHeaterOutlet {
    /// Saturated liquid at the heater pressure (a heater at equilibrium);
    /// the outlet temperature is not read. The default: a measured outlet
    /// at equilibrium lies on the line, where its (p,T) is always near
    /// saturation.
    #[default]
    Saturated,
    /// Liquid at the heater pressure and the measured outlet temperature
    /// (a storage tank that subcools it).
    AtMeasuredTemperature,
}

/// Entering water streams besides the condensate: cascaded drains.
pub const OPEN_HEATER_DRAINS: usize = 2;

/// The readings of an open heater test. Flows in the caller's mass-flow
/// unit.
#[derive(Clone, Copy, Debug, PartialEq, Default)]
pub struct OpenHeaterTest {
    /// Heater (extraction steam) pressure.
    pub heater_pressure: Measured,
    /// Extraction steam temperature at the heater.
    pub extraction_temperature: Measured,
    /// Outlet temperature, read only with
    /// [`OpenHeaterOutlet::AtMeasuredTemperature`].
    pub outlet_temperature: Measured,
    /// Condensate entering from below.
    pub condensate: Inflow,
    /// Drains cascaded in ([`Inflow::NONE`] where fewer).
    pub drains: [Inflow; OPEN_HEATER_DRAINS],
    /// Where the outlet's enthalpy comes from.
    pub outlet: OpenHeaterOutlet,
}

/// An open heater test's figures.
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct OpenHeaterFigures<F> {
    /// Extraction steam flow by the balances.
    pub extraction_flow: F,
    /// Outlet flow: extraction plus every entering stream.
    pub outlet_flow: F,
}

impl Calculation<12, 2> for OpenHeaterTest {
    const INPUTS: [(&'static str, Quantity); 12] = [
        ("heater pressure", Quantity::Pressure),
        ("extraction temperature", Quantity::Temperature),
        ("outlet temperature", Quantity::Temperature),
        ("condensate flow", Quantity::MassFlow),
        ("condensate pressure", Quantity::Pressure),
        ("condensate temperature", Quantity::Temperature),
        ("first drain flow", Quantity::MassFlow),
        ("first drain pressure", Quantity::Pressure),
        ("first drain temperature", Quantity::Temperature),
        ("second drain flow", Quantity::MassFlow),
        ("second drain pressure", Quantity::Pressure),
        ("second drain temperature", Quantity::Temperature),
    ];
    const FIGURES: [(&'static str, Option<Quantity>); 2] = [
        ("extraction flow", Some(Quantity::MassFlow)),
        ("outlet flow", Some(Quantity::MassFlow)),
    ];
    type Figures<F: Copy> = OpenHeaterFigures<F>;

    fn named<F: Copy>([extraction_flow, outlet_flow]: [F; 2]) -> OpenHeaterFigures<F> {
        OpenHeaterFigures {
            extraction_flow,
            outlet_flow,
        }
    }

    fn measured(&self) -> [Measured; 12] {
        let [c, d1, d2] = [self.condensate, self.drains[0], self.drains[1]].map(|i| i.measured());
        [
            self.heater_pressure,
            self.extraction_temperature,
            self.outlet_temperature,
            c[0],
            c[1],
            c[2],
            d1[0],
            d1[1],
            d1[2],
            d2[0],
            d2[1],
            d2[2],
        ]
    }

    fn with_measured(&self, m: [Measured; 12]) -> Self {
        let inflow = |i: usize| Inflow::from_measured([m[i], m[i + 1], m[i + 2]]);
        OpenHeaterTest {
            heater_pressure: m[0],
            extraction_temperature: m[1],
            outlet_temperature: m[2],
            condensate: inflow(3),
            drains: [inflow(6), inflow(9)],
            outlet: self.outlet,
        }
    }

    fn compute<T: Tracked>(&self, x: [T; 12], units: Units) -> Result<([T; 2], Flags), Error> {
        let p = x[0];
        if p.value() >= CRITICAL_PRESSURE {
            return Err(Error::InvalidPlant {
                part: PlantPart::single("open heater"),
                what: "its pressure is not below the critical pressure",
                figure: None,
            });
        }
        let (extraction, mut flags) = StreamState::of(
            Expected::Vapour,
            (p, x[1]),
            &self.heater_pressure,
            &self.extraction_temperature,
            units,
        )?;
        let outlet = match self.outlet {
            OpenHeaterOutlet::Saturated => StreamState::saturated(Expected::Liquid, p)?,
            OpenHeaterOutlet::AtMeasuredTemperature => {
                let (state, outlet_flags) = StreamState::of(
                    Expected::Liquid,
                    (p, x[2]),
                    &self.heater_pressure,
                    &self.outlet_temperature,
                    units,
                )?;
                flags = flags | outlet_flags;
                state
            }
        };
        let h_out = outlet.get(Variable::Enthalpy);
        // Σ m_i (h_out − h_i) and Σ m_i over the streams present.
        let mut heat_needed = T::constant(0.0);
        let mut water_in = T::constant(0.0);
        let streams = [self.condensate, self.drains[0], self.drains[1]];
        for (k, inflow) in streams.iter().enumerate() {
            let (m, pi, ti) = (x[3 + 3 * k], x[4 + 3 * k], x[5 + 3 * k]);
            if let Some((h, stream_flags)) = inflow.enthalpy((pi, ti), units)? {
                let rise = h_out - h;
                // The condensate is the stream the heater heats.
                let reversed = k == 0 && rise.value() <= 0.0;
                flags = flags | stream_flags.with_if(reversed, Flags::REVERSED_HEAT_FLOW);
                heat_needed = heat_needed + m * rise;
                water_in = water_in + m;
            }
        }
        let extraction_flow = heat_needed / (extraction.get(Variable::Enthalpy) - h_out);
        let outlet_flow = extraction_flow + water_in;
        let negative = extraction_flow.value() < 0.0 || outlet_flow.value() < 0.0;
        Ok((
            [extraction_flow, outlet_flow],
            flags.with_if(negative, Flags::NEGATIVE_FLOW),
        ))
    }
}
