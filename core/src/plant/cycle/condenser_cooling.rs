//! The condenser by its cooling water: its UA calibrated on the design
//! balance, and off design the condenser pressure whose saturation
//! temperature lets that UA carry the balance's condenser duty.
//!
//! The steam side condenses at one temperature, so the exchanger is one
//! with a constant-temperature hot side: ε = 1 − exp(−NTU), NTU =
//! UA/(m·c_p), and at design the LMTD form UA = Q/LMTD, which is the
//! same relation. The cooling water's c_p is its mean over the rise,
//! from the engine's enthalpies of liquid water at
//! [`COOLING_WATER_PRESSURE`]. Subcooling, air and fouling are not
//! modelled: the UA is the design one, scaled with the cooling water
//! flow only ([`UA_FLOW_EXPONENT`]).

use super::off_design_options::CoolingWater;
use super::result::CycleResult;
use crate::constants::CRITICAL_TEMPERATURE;
use crate::equations::saturation_line::{saturation_pressure, saturation_temperature};
use crate::numerics::math::{exp_m1, ln, powf};
use crate::plant::fault::{refuse_with, PlantFigure};
use crate::plant::{native, PlantPart};
use crate::{Error, Quantity, State, Units};

const CONDENSER: PlantPart = PlantPart::single("condenser");

/// The cooling water's pressure in the tubes, MPa: a few bar, where the
/// circulating pumps deliver it (common practice). Its effect on the
/// liquid's enthalpy is some 0.1 kJ/kg per MPa.
pub(super) const COOLING_WATER_PRESSURE: f64 = 0.2;

/// UA scales with the cooling water flow to this power: the square
/// root of the tube velocity, the usual form of a surface condenser's
/// overall coefficient (common practice); the inlet temperature's own
/// effect on U is not modelled.
pub(super) const UA_FLOW_EXPONENT: f64 = 0.5;

/// The condenser's heat transfer at the design balance, native units.
#[derive(Clone, Copy, Debug, PartialEq)]
pub(super) struct CondenserTransfer {
    /// UA at the design cooling water flow, kW/K.
    design_ua: f64,
    /// The design cooling water flow, kg/s.
    design_flow: f64,
}

/// The cooling water's inlet temperature (K) and flow (kg/s) given in
/// `units`: a positive flow, liquid at [`COOLING_WATER_PRESSURE`].
fn native_water(water: &CoolingWater, units: Units) -> Result<(State, f64), Error> {
    let t_in = native(Quantity::Temperature, water.inlet_temperature, units)?;
    let flow = native(Quantity::MassFlow, water.flow, units)?;
    if flow <= 0.0 {
        return Err(refuse_with(
            CONDENSER,
            "its cooling water flow is not positive",
            PlantFigure::native(
                "cooling water flow",
                Quantity::MassFlow,
                flow,
                Some(0.0),
                units,
            ),
        ));
    }
    let boiling = saturation_temperature(COOLING_WATER_PRESSURE);
    if t_in >= boiling {
        return Err(refuse_with(
            CONDENSER,
            "its cooling water is not liquid at 0.2 MPa",
            PlantFigure::native(
                "cooling water inlet",
                Quantity::Temperature,
                t_in,
                Some(boiling),
                units,
            ),
        ));
    }
    Ok((
        State::from_pt(COOLING_WATER_PRESSURE, t_in, Units::Native)?,
        flow,
    ))
}

/// The cooling water's outlet after taking `duty` kW at `flow` kg/s
/// from `inlet`; refused when it would boil in the tubes.
fn outlet(inlet: &State, flow: f64, duty: f64, units: Units) -> Result<State, Error> {
    let out = State::from_ph(
        COOLING_WATER_PRESSURE,
        inlet.native().h + duty / flow,
        Units::Native,
    )?;
    if out.quality().is_some() || out.native().t >= saturation_temperature(COOLING_WATER_PRESSURE) {
        let boiling = State::from_pt(
            COOLING_WATER_PRESSURE,
            saturation_temperature(COOLING_WATER_PRESSURE),
            Units::Native,
        )?;
        return Err(refuse_with(
            CONDENSER,
            "its cooling water would boil in the tubes: its flow is too small",
            PlantFigure::native(
                "cooling water flow",
                Quantity::MassFlow,
                flow,
                Some(duty / (boiling.native().h - inlet.native().h)),
                units,
            ),
        ));
    }
    Ok(out)
}

impl CondenserTransfer {
    /// The UA that carries `duty` kW (the design balance's) from steam
    /// condensing at `condenser_pressure` MPa into `water` (in `units`):
    /// the cooling water's rise from its flow and enthalpies, UA = Q/LMTD
    /// against the condensing temperature.
    pub(super) fn calibrate(
        water: &CoolingWater,
        duty: f64,
        condenser_pressure: f64,
        units: Units,
    ) -> Result<CondenserTransfer, Error> {
        let (inlet, flow) = native_water(water, units)?;
        let t_sat = saturation_temperature(condenser_pressure);
        let t_in = inlet.native().t;
        if t_in >= t_sat {
            return Err(refuse_with(
                CONDENSER,
                "its cooling water enters no colder than the steam condenses at design",
                PlantFigure::native(
                    "cooling water inlet",
                    Quantity::Temperature,
                    t_in,
                    Some(t_sat),
                    units,
                ),
            ));
        }
        let out = outlet(&inlet, flow, duty, units)?;
        let t_out = out.native().t;
        if t_out >= t_sat {
            // The flow that would leave at t_sat, below which it cannot.
            let at_sat = State::from_pt(COOLING_WATER_PRESSURE, t_sat, Units::Native)?;
            return Err(refuse_with(
                CONDENSER,
                "its cooling water would leave no colder than the steam condenses at design",
                PlantFigure::native(
                    "cooling water flow",
                    Quantity::MassFlow,
                    flow,
                    Some(duty / (at_sat.native().h - inlet.native().h)),
                    units,
                ),
            ));
        }
        // UA = Q / LMTD, LMTD = (t_out − t_in) / ln((t_sat − t_in)/(t_sat − t_out)).
        let design_ua = duty / (t_out - t_in) * ln((t_sat - t_in) / (t_sat - t_out));
        Ok(CondenserTransfer {
            design_ua,
            design_flow: flow,
        })
    }

    /// The condenser pressure (MPa) at which the UA, scaled to `water`'s
    /// flow, carries `duty` kW into `water` (in `units`): the rise is
    /// fixed by the duty, and ε = 1 − exp(−NTU) puts the condensing
    /// temperature at t_in + rise/ε. Refused when that lies beyond the
    /// critical temperature.
    pub(super) fn condenser_pressure(
        &self,
        water: &CoolingWater,
        duty: f64,
        units: Units,
    ) -> Result<f64, Error> {
        let (inlet, flow) = native_water(water, units)?;
        let out = outlet(&inlet, flow, duty, units)?;
        let rise = out.native().t - inlet.native().t;
        let ua = self.design_ua * powf(flow / self.design_flow, UA_FLOW_EXPONENT);
        // NTU = UA/(m·c_p) with m·c_p = duty/rise, the mean over the rise.
        let effectiveness = -exp_m1(-ua * rise / duty);
        let t_sat = inlet.native().t + rise / effectiveness;
        if t_sat.is_nan() || t_sat >= CRITICAL_TEMPERATURE {
            return Err(refuse_with(
                CONDENSER,
                "its UA cannot carry the duty into this cooling water below the critical temperature",
                PlantFigure::native(
                    "condensing temperature",
                    Quantity::Temperature,
                    t_sat,
                    Some(CRITICAL_TEMPERATURE),
                    units,
                ),
            ));
        }
        Ok(saturation_pressure(t_sat))
    }
}

/// The condenser duty of `balance` at `flow` kg/s of throttle steam, kW.
pub(super) fn duty(balance: &CycleResult, flow: f64) -> f64 {
    balance
        .units
        .to_native(Quantity::Enthalpy, balance.condenser_duty)
        * flow
}
