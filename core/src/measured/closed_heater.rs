//! A closed feedwater heater's test: its terminal temperature difference,
//! drain cooler approach, temperature rise, duty, and the extraction steam
//! flow its energy balance requires, from the measured shell and water
//! side readings.
//!
//! The drain leaves as liquid at the shell pressure and its measured
//! temperature. The balance (common practice):
//! extraction × (h_ext − h_drain) + cascade × (h_cascade − h_drain)
//!   = feedwater × (h_fw,out − h_fw,in).

use super::calculation::Calculation;
use super::flags::Flags;
use super::inflow::Inflow;
use super::measurement::Measured;
use super::stream_state::{tracked_saturation_temperature, Expected, StreamState};
use super::tracked::Tracked;
use crate::numerics::constants::CRITICAL_PRESSURE;
use crate::pairs::saturation::min_saturation_pressure;
use crate::plant::PlantPart;
use crate::{Error, Quantity, Units, Variable};

/// The readings of a closed heater test. Flows in the caller's mass-flow
/// unit; the extraction steam's temperature is read at the shell.
#[derive(Clone, Copy, Debug, PartialEq, Default)]
pub struct ClosedHeaterTest {
    /// Shell (extraction steam) pressure.
    pub shell_pressure: Measured,
    /// Extraction steam temperature at the shell inlet.
    pub extraction_temperature: Measured,
    /// Feedwater temperature entering the tubes.
    pub feedwater_inlet_temperature: Measured,
    /// Feedwater temperature leaving the tubes.
    pub feedwater_outlet_temperature: Measured,
    /// Feedwater pressure (the water-side pressure drop is not resolved).
    pub feedwater_pressure: Measured,
    /// Drain temperature leaving the shell.
    pub drain_temperature: Measured,
    /// Feedwater flow through the tubes.
    pub feedwater_flow: Measured,
    /// Drains cascaded in from the heater above ([`Inflow::NONE`]: none).
    pub cascade: Inflow,
}

/// A closed heater test's figures.
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct ClosedHeaterFigures<F> {
    /// TTD = Tsat(shell pressure) − T_fw,out.
    pub terminal_temperature_difference: F,
    /// DCA = T_drain − T_fw,in.
    pub drain_cooler_approach: F,
    /// T_fw,out − T_fw,in.
    pub temperature_rise: F,
    /// Heat taken by the feedwater, feedwater flow × (h_fw,out − h_fw,in).
    pub duty: F,
    /// Extraction steam flow by the energy balance.
    pub extraction_flow: F,
}

const CLOSED_HEATER: PlantPart = PlantPart::single("closed heater");

impl Calculation<10, 5> for ClosedHeaterTest {
    const INPUTS: [(&'static str, Quantity); 10] = [
        ("shell pressure", Quantity::Pressure),
        ("extraction temperature", Quantity::Temperature),
        ("feedwater inlet temperature", Quantity::Temperature),
        ("feedwater outlet temperature", Quantity::Temperature),
        ("feedwater pressure", Quantity::Pressure),
        ("drain temperature", Quantity::Temperature),
        ("feedwater flow", Quantity::MassFlow),
        ("cascade flow", Quantity::MassFlow),
        ("cascade pressure", Quantity::Pressure),
        ("cascade temperature", Quantity::Temperature),
    ];
    const FIGURES: [(&'static str, Option<Quantity>); 5] = [
        (
            "terminal temperature difference",
            Some(Quantity::TemperatureDifference),
        ),
        (
            "drain cooler approach",
            Some(Quantity::TemperatureDifference),
        ),
        ("temperature rise", Some(Quantity::TemperatureDifference)),
        ("duty", Some(Quantity::HeatFlow)),
        ("extraction flow", Some(Quantity::MassFlow)),
    ];
    type Figures<F: Copy> = ClosedHeaterFigures<F>;

    fn named<F: Copy>([ttd, dca, rise, duty, extraction]: [F; 5]) -> ClosedHeaterFigures<F> {
        ClosedHeaterFigures {
            terminal_temperature_difference: ttd,
            drain_cooler_approach: dca,
            temperature_rise: rise,
            duty,
            extraction_flow: extraction,
        }
    }

    fn measured(&self) -> [Measured; 10] {
        let [cf, cp, ct] = self.cascade.measured();
        [
            self.shell_pressure,
            self.extraction_temperature,
            self.feedwater_inlet_temperature,
            self.feedwater_outlet_temperature,
            self.feedwater_pressure,
            self.drain_temperature,
            self.feedwater_flow,
            cf,
            cp,
            ct,
        ]
    }

    fn with_measured(&self, [ps, te, ti, to, pf, td, mf, cf, cp, ct]: [Measured; 10]) -> Self {
        ClosedHeaterTest {
            shell_pressure: ps,
            extraction_temperature: te,
            feedwater_inlet_temperature: ti,
            feedwater_outlet_temperature: to,
            feedwater_pressure: pf,
            drain_temperature: td,
            feedwater_flow: mf,
            cascade: Inflow::from_measured([cf, cp, ct]),
        }
    }

    fn compute<T: Tracked>(
        &self,
        [ps, te, ti, to, pf, td, mf, cf, cp, ct]: [T; 10],
        units: Units,
    ) -> Result<([T; 5], Flags), Error> {
        if !(min_saturation_pressure()..CRITICAL_PRESSURE).contains(&ps.value()) {
            return Err(Error::InvalidPlant {
                part: CLOSED_HEATER,
                what: "its shell pressure lies outside the saturation line (from the triple point to below the critical pressure)",
                figure: None,
            });
        }
        let stream = |expected, p, t, pressure, temperature| {
            StreamState::of(expected, (p, t), pressure, temperature, units)
        };
        let (extraction, extraction_flags) = stream(
            Expected::Vapour,
            ps,
            te,
            &self.shell_pressure,
            &self.extraction_temperature,
        )?;
        let (drain, drain_flags) = stream(
            Expected::Liquid,
            ps,
            td,
            &self.shell_pressure,
            &self.drain_temperature,
        )?;
        let (inlet, inlet_flags) = stream(
            Expected::Liquid,
            pf,
            ti,
            &self.feedwater_pressure,
            &self.feedwater_inlet_temperature,
        )?;
        let (outlet, outlet_flags) = stream(
            Expected::Liquid,
            pf,
            to,
            &self.feedwater_pressure,
            &self.feedwater_outlet_temperature,
        )?;
        let h_drain = drain.get(Variable::Enthalpy);
        let (cascade_heat, cascade_flags) = match self.cascade.enthalpy((cp, ct), units)? {
            Some((h, flags)) => (cf * (h - h_drain), flags),
            None => (T::constant(0.0), Flags::NONE),
        };
        let duty = mf * (outlet.get(Variable::Enthalpy) - inlet.get(Variable::Enthalpy));
        let extraction_flow =
            (duty - cascade_heat) / (extraction.get(Variable::Enthalpy) - h_drain);
        let ttd = tracked_saturation_temperature(ps) - to;
        let dca = td - ti;
        let rise = to - ti;
        let flags = extraction_flags
            | drain_flags
            | inlet_flags
            | outlet_flags
            | cascade_flags
            | Flags::NONE
                .with_if(to.value() >= te.value(), Flags::FEEDWATER_ABOVE_STEAM)
                .with_if(dca.value() < 0.0, Flags::DRAIN_BELOW_FEEDWATER)
                .with_if(rise.value() < 0.0, Flags::REVERSED_HEAT_FLOW)
                .with_if(extraction_flow.value() < 0.0, Flags::NEGATIVE_FLOW);
        Ok(([ttd, dca, rise, duty, extraction_flow], flags))
    }
}
