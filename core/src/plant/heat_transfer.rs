//! Heat added or removed by a flow between two states: boiler and
//! reheater heat input, condenser duty; and the condensate a condenser
//! delivers.

use super::fault::{finite_figures, refuse_with};
use super::{finite_flow, native};
use super::{PlantFigure, PlantPart};
use crate::equations::saturation_line::saturation_temperature;
use crate::numerics::constants::MIN_TEMPERATURE;
use crate::{Error, Quantity, Saturation, State, Units};

const CONDENSER: PlantPart = PlantPart::single("condenser");
const HEAT_DUTY: PlantPart = PlantPart::single("heat duty");

/// Heat given to `flow` going from `inlet` to `outlet` (negative when the
/// flow gives heat away, as in a condenser), in the inlet's units times
/// the flow unit. The flow is finite and not negative, and so is the
/// duty's size.
pub fn heat_duty(flow: f64, inlet: &State, outlet: &State) -> Result<f64, Error> {
    let flow = finite_flow(flow, HEAT_DUTY)?;
    let duty = inlet.units().from_native(
        Quantity::Enthalpy,
        flow * (outlet.native().h - inlet.native().h),
    );
    finite_figures(HEAT_DUTY, &[duty])?;
    Ok(duty)
}

/// The condensate leaving a condenser at `pressure`, subcooled below its
/// saturation temperature by `subcooling` (a temperature difference; 0
/// for saturated liquid, as is any subcooling within
/// [`State::SATURATION_TOLERANCE`] of the saturation temperature), all in
/// `units`. The subcooling lies between 0 and the saturation temperature
/// less 273.15 K, the formulation's lowest temperature.
pub fn condensate(pressure: f64, subcooling: f64, units: Units) -> Result<State, Error> {
    let sat = Saturation::at_pressure(pressure, units)?;
    let dt = native(Quantity::TemperatureDifference, subcooling, units)?;
    let subcooling_figure = |limit| {
        PlantFigure::native(
            "subcooling",
            Quantity::TemperatureDifference,
            dt,
            Some(limit),
            units,
        )
    };
    if dt < 0.0 {
        return Err(refuse_with(
            CONDENSER,
            "its condensate subcooling is negative",
            subcooling_figure(0.0),
        ));
    }
    let p = sat.liquid().native().p;
    let t_sat = saturation_temperature(p);
    // Within the saturation line's resolution a (p, T) state may land on
    // either side of the line (at 623.15 K, where B23 meets it, on the
    // vapour side): a subcooling that small is none, saturated liquid.
    if dt <= State::SATURATION_TOLERANCE * t_sat {
        return Ok(*sat.liquid());
    }
    if dt > t_sat - MIN_TEMPERATURE {
        return Err(refuse_with(
            CONDENSER,
            "its subcooling puts the hotwell below 273.15 K, the formulation's lowest temperature",
            subcooling_figure(t_sat - MIN_TEMPERATURE),
        ));
    }
    Ok(State::from_pt(p, t_sat - dt, Units::Native)?.in_units(units))
}
