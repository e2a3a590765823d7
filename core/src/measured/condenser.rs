//! A condenser's duty measured two ways: from its cooling water (flow and
//! the temperature rise across the tubes) and from its steam side (the
//! exhaust steam's flow and enthalpy, which a heat balance on the turbine
//! gives, down to the condensate). The two disagree by what the readings
//! and the heat balance miss; each carries its own uncertainty.

use super::calculation::Calculation;
use super::flags::Flags;
use super::measurement::Measured;
use super::point::Point;
use super::stream_state::{tracked_saturation_temperature, Expected, StreamState};
use super::tracked::Tracked;
use crate::numerics::constants::CRITICAL_PRESSURE;
use crate::pairs::saturation::min_saturation_pressure;
use crate::plant::PlantPart;
use crate::{Error, Quantity, Units, Variable};

/// The cooling water readings. Flow in the caller's mass-flow unit.
#[derive(Clone, Copy, Debug, PartialEq, Default)]
pub struct CoolingWaterTest {
    /// Cooling water flow.
    pub flow: Measured,
    /// Cooling water pressure in the tubes (the water-side drop is not
    /// resolved: both temperatures are read at it).
    pub pressure: Measured,
    /// Inlet temperature.
    pub inlet_temperature: Measured,
    /// Outlet temperature.
    pub outlet_temperature: Measured,
}

/// The cooling water side's figures.
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct CoolingWaterFigures<F> {
    /// Heat taken by the cooling water, flow × (h_out − h_in).
    pub duty: F,
    /// T_out − T_in.
    pub temperature_rise: F,
}

/// The steam side readings. The exhaust flow and enthalpy come from a
/// heat balance on the turbine (the exhaust is wet: its (p,T) would not
/// fix it).
#[derive(Clone, Copy, Debug, PartialEq, Default)]
pub struct CondenserSteamTest {
    /// Exhaust steam flow into the condenser.
    pub exhaust_flow: Measured,
    /// Exhaust steam enthalpy.
    pub exhaust_enthalpy: Measured,
    /// Condenser (exhaust) pressure.
    pub pressure: Measured,
    /// Condensate temperature in the hotwell.
    pub condensate_temperature: Measured,
}

/// The steam side's figures.
#[derive(Clone, Copy, Debug, PartialEq)]
pub struct CondenserSteamFigures<F> {
    /// Heat given up by the steam, exhaust flow × (h_exhaust − h_condensate).
    pub duty: F,
    /// Condensate subcooling, Tsat(pressure) − T_condensate.
    pub subcooling: F,
}

impl Calculation<4, 2> for CoolingWaterTest {
    const INPUTS: [(&'static str, Quantity); 4] = [
        ("cooling water flow", Quantity::MassFlow),
        ("cooling water pressure", Quantity::Pressure),
        ("cooling water inlet temperature", Quantity::Temperature),
        ("cooling water outlet temperature", Quantity::Temperature),
    ];
    const FIGURES: [(&'static str, Option<Quantity>); 2] = [
        ("duty", Some(Quantity::HeatFlow)),
        ("temperature rise", Some(Quantity::TemperatureDifference)),
    ];
    type Figures<F: Copy> = CoolingWaterFigures<F>;

    fn named<F: Copy>([duty, temperature_rise]: [F; 2]) -> CoolingWaterFigures<F> {
        CoolingWaterFigures {
            duty,
            temperature_rise,
        }
    }

    fn measured(&self) -> [Measured; 4] {
        [
            self.flow,
            self.pressure,
            self.inlet_temperature,
            self.outlet_temperature,
        ]
    }

    fn with_measured(&self, [flow, pressure, t_in, t_out]: [Measured; 4]) -> Self {
        CoolingWaterTest {
            flow,
            pressure,
            inlet_temperature: t_in,
            outlet_temperature: t_out,
        }
    }

    fn compute<T: Tracked>(
        &self,
        [m, p, t_in, t_out]: [T; 4],
        units: Units,
    ) -> Result<([T; 2], Flags), Error> {
        let water = |t, temperature| {
            StreamState::of(Expected::Liquid, (p, t), &self.pressure, temperature, units)
        };
        let (inlet, inlet_flags) = water(t_in, &self.inlet_temperature)?;
        let (outlet, outlet_flags) = water(t_out, &self.outlet_temperature)?;
        let duty = m * (outlet.get(Variable::Enthalpy) - inlet.get(Variable::Enthalpy));
        let rise = t_out - t_in;
        let flags = inlet_flags
            | outlet_flags
            | Flags::NONE
                .with_if(rise.value() < 0.0, Flags::REVERSED_HEAT_FLOW)
                .with_if(m.value() < 0.0, Flags::NEGATIVE_FLOW);
        Ok(([duty, rise], flags))
    }
}

impl Calculation<4, 2> for CondenserSteamTest {
    const INPUTS: [(&'static str, Quantity); 4] = [
        ("exhaust flow", Quantity::MassFlow),
        ("exhaust enthalpy", Quantity::Enthalpy),
        ("condenser pressure", Quantity::Pressure),
        ("condensate temperature", Quantity::Temperature),
    ];
    const FIGURES: [(&'static str, Option<Quantity>); 2] = [
        ("duty", Some(Quantity::HeatFlow)),
        ("subcooling", Some(Quantity::TemperatureDifference)),
    ];
    type Figures<F: Copy> = CondenserSteamFigures<F>;

    fn named<F: Copy>([duty, subcooling]: [F; 2]) -> CondenserSteamFigures<F> {
        CondenserSteamFigures { duty, subcooling }
    }

    fn measured(&self) -> [Measured; 4] {
        [
            self.exhaust_flow,
            self.exhaust_enthalpy,
            self.pressure,
            self.condensate_temperature,
        ]
    }

    fn with_measured(&self, [flow, h, pressure, t]: [Measured; 4]) -> Self {
        CondenserSteamTest {
            exhaust_flow: flow,
            exhaust_enthalpy: h,
            pressure,
            condensate_temperature: t,
        }
    }

    fn compute<T: Tracked>(
        &self,
        [m, h_exhaust, p, t]: [T; 4],
        units: Units,
    ) -> Result<([T; 2], Flags), Error> {
        if !(min_saturation_pressure()..CRITICAL_PRESSURE).contains(&p.value()) {
            return Err(Error::InvalidPlant {
                part: PlantPart::single("condenser"),
                what: "its pressure lies outside the saturation line (from the triple point to below the critical pressure)",
                figure: None,
            });
        }
        // The exhaust state itself must exist (inside the formulation).
        Point::ph(p, h_exhaust)?;
        let (condensate, flags) = StreamState::of(
            Expected::Liquid,
            (p, t),
            &self.pressure,
            &self.condensate_temperature,
            units,
        )?;
        let given_up = h_exhaust - condensate.get(Variable::Enthalpy);
        let duty = m * given_up;
        let subcooling = tracked_saturation_temperature(p) - t;
        let flags = flags
            .with_if(given_up.value() < 0.0, Flags::REVERSED_HEAT_FLOW)
            .with_if(m.value() < 0.0, Flags::NEGATIVE_FLOW);
        Ok(([duty, subcooling], flags))
    }
}
