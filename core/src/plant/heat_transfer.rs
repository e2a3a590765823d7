//! Heat added or removed by a flow between two states: boiler and
//! reheater heat input, condenser duty; and the condensate a condenser
//! delivers.

use super::native;
use crate::saturation_line::saturation_temperature;
use crate::{Error, Quantity, Saturation, State, Units};

/// Heat given to `flow` going from `inlet` to `outlet` (negative when the
/// flow gives heat away, as in a condenser), in the inlet's units times
/// the flow unit.
pub fn heat_duty(flow: f64, inlet: &State, outlet: &State) -> f64 {
    inlet.units().from_native(
        Quantity::Enthalpy,
        flow * (outlet.native().h - inlet.native().h),
    )
}

/// The condensate leaving a condenser at `pressure`, subcooled below its
/// saturation temperature by `subcooling` (a temperature difference; 0
/// for saturated liquid), all in `units`.
pub fn condensate(pressure: f64, subcooling: f64, units: Units) -> Result<State, Error> {
    let sat = Saturation::at_pressure(pressure, units)?;
    let dt = native(Quantity::TemperatureDifference, subcooling, units)?;
    if dt < 0.0 {
        return Err(Error::InvalidPlant {
            what: "a condensate subcooling is negative",
        });
    }
    if dt == 0.0 {
        return Ok(*sat.liquid());
    }
    let p = sat.liquid().native().p;
    Ok(State::from_pt(p, saturation_temperature(p) - dt, Units::Native)?.in_units(units))
}
