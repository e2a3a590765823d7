//! The plant's output from the cycle's balance and its losses: the
//! shaft power less the mechanical losses drives the generator, whose
//! output (gross) less the motor-driven pumps and the auxiliaries is the
//! net output; heat rates are heat input per kWh of each.

use super::assembly::Totals;
use super::exhaust::EndPoint;
use super::losses::{Generator, Losses};
use super::result::{PlantOutput, PlantPower};
use super::SECONDS_PER_HOUR;
use crate::plant::fault::{refuse, refuse_with};
use crate::plant::{check_efficiency, native, PlantFigure, PlantPart};
use crate::{Error, Quantity, Units};

const GENERATOR: PlantPart = PlantPart::single("generator");
const PLANT: PlantPart = PlantPart::single("plant");

/// The throttle flow in kg/s, when given: finite and positive.
pub(super) fn throttle_flow(losses: &Losses, units: Units) -> Result<Option<f64>, Error> {
    losses
        .throttle_flow
        .map(|flow| positive_throttle_flow(flow, units))
        .transpose()
}

/// A throttle flow given in `units`, in kg/s: finite and positive.
pub(super) fn positive_throttle_flow(flow: f64, units: Units) -> Result<f64, Error> {
    let flow = native(Quantity::MassFlow, flow, units)?;
    if flow <= 0.0 {
        return Err(refuse_with(
            PLANT,
            "its throttle flow is not positive",
            PlantFigure::native("throttle flow", Quantity::MassFlow, flow, Some(0.0), units),
        ));
    }
    Ok(flow)
}

/// A power loss per unit throttle flow (kJ/kg from kW over kg/s); a
/// non-zero one needs the throttle flow.
fn per_unit_flow(
    power: f64,
    flow: Option<f64>,
    what: &'static str,
    units: Units,
) -> Result<f64, Error> {
    let power = native(Quantity::Power, power, units)?;
    if power < 0.0 {
        return Err(refuse_with(
            PLANT,
            what,
            PlantFigure::native("power", Quantity::Power, power, Some(0.0), units),
        ));
    }
    match flow {
        Some(flow) => Ok(power / flow),
        None if power == 0.0 => Ok(0.0),
        None => Err(refuse(
            PLANT,
            "a loss given as a power needs the throttle flow",
        )),
    }
}

/// The generator's efficiency at `generator_input` (shaft power less
/// mechanical losses, per unit throttle `flow`): 1 without a generator,
/// its constant, or its curve read at the load it then produces.
fn generator_efficiency(
    losses: &Losses,
    units: Units,
    flow: Option<f64>,
    generator_input: f64,
) -> Result<f64, Error> {
    match losses.generator {
        None => Ok(1.0),
        Some(Generator::Constant { efficiency }) => check_efficiency(efficiency, GENERATOR),
        Some(Generator::AgainstLoad {
            rated_output,
            efficiency,
        }) => {
            let Some(flow) = flow else {
                return Err(refuse(
                    GENERATOR,
                    "an efficiency against load needs the throttle flow",
                ));
            };
            let rated = native(Quantity::Power, rated_output, units)?;
            super::generator::efficiency_at_load(&efficiency, rated, generator_input * flow)
        }
    }
}

/// The output of the cycle whose totals are `t` (native, per unit
/// throttle flow), with its heat input and the last casing's end point.
pub(super) fn plant_output(
    losses: &Losses,
    units: Units,
    t: &Totals,
    heat_input: f64,
    end: &EndPoint,
) -> Result<PlantOutput, Error> {
    let flow = throttle_flow(losses, units)?;
    let mechanical = per_unit_flow(
        losses.mechanical_losses,
        flow,
        "its mechanical losses are negative",
        units,
    )?;
    let auxiliary = per_unit_flow(
        losses.auxiliary_power,
        flow,
        "its auxiliary power is negative",
        units,
    )?;
    let shaft = t.turbine_work - t.drive_work;
    let generator_input = shaft - mechanical;
    if generator_input <= 0.0 {
        return Err(refuse(
            GENERATOR,
            "the mechanical losses take the whole shaft power",
        ));
    }
    let efficiency = generator_efficiency(losses, units, flow, generator_input)?;
    let gross = generator_input * efficiency;
    let pumps = t.pump_work - t.drive_work;
    let net = gross - pumps - auxiliary;
    if net <= 0.0 {
        return Err(refuse_with(
            PLANT,
            "its pumps and auxiliaries take the whole generator output",
            PlantFigure::native("net output", Quantity::Enthalpy, net, Some(0.0), units),
        ));
    }
    let e = |x| units.from_native(Quantity::Enthalpy, x);
    let heat_rate = |output: f64| {
        units.from_native(Quantity::HeatRate, SECONDS_PER_HOUR / (output / heat_input))
    };
    let power = flow.map(|m| {
        let p = |x: f64| units.from_native(Quantity::Power, x * m);
        let q = |x: f64| units.from_native(Quantity::HeatFlow, x * m);
        PlantPower {
            throttle_flow: units.from_native(Quantity::MassFlow, m),
            heat_input: q(heat_input),
            condenser_duty: q(t.condenser_duty),
            shaft_power: p(shaft),
            mechanical_losses: p(mechanical),
            generator_losses: p(generator_input - gross),
            gross_output: p(gross),
            motor_pump_power: p(pumps),
            auxiliary_power: p(auxiliary),
            net_output: p(net),
        }
    });
    Ok(PlantOutput {
        shaft_work: e(shaft),
        generator_efficiency: efficiency,
        gross_output: e(gross),
        motor_pump_work: e(pumps),
        net_output: e(net),
        net_efficiency: net / heat_input,
        gross_heat_rate: heat_rate(gross),
        net_heat_rate: heat_rate(net),
        expansion_line_end: e(end.expansion_line_end),
        exhaust_loss: e(end.exhaust_loss),
        annulus_velocity: units.from_native(Quantity::Speed, end.annulus_velocity),
        power,
    })
}
