//! Adiabatic mixing of streams at one pressure, and throttling through a
//! valve or trap (constant enthalpy).

use super::fault::{finite_figures, in_caller_units, refuse};
use super::PlantPart;
use super::{finite_flow, native};
use crate::{Error, Quantity, State, Units};

const MIXING_POINT: PlantPart = PlantPart::single("mixing point");
const THROTTLE: PlantPart = PlantPart::single("throttle");

/// Mixes `streams` of (flow, state) adiabatically into one stream at
/// `pressure` (in `units`): returns the total flow and its state.
pub fn mix(streams: &[(f64, &State)], pressure: f64, units: Units) -> Result<(f64, State), Error> {
    let p = native(Quantity::Pressure, pressure, units)?;
    let mut flow = 0.0;
    let mut enthalpy_flow = 0.0;
    for &(m, state) in streams {
        let m = finite_flow(m, MIXING_POINT)?;
        flow += m;
        enthalpy_flow += m * state.native().h;
    }
    if flow <= 0.0 {
        return Err(refuse(MIXING_POINT, "it has no flow"));
    }
    finite_figures(MIXING_POINT, &[flow, enthalpy_flow])?;
    let mixed = State::from_ph(p, enthalpy_flow / flow, Units::Native)
        .map_err(|e| in_caller_units(e, units))?;
    Ok((flow, mixed.in_units(units)))
}

/// Throttles `inlet` to `outlet_pressure` (in the inlet's units) at
/// constant enthalpy.
pub fn throttle(inlet: &State, outlet_pressure: f64) -> Result<State, Error> {
    let units = inlet.units();
    let p = native(Quantity::Pressure, outlet_pressure, units)?;
    if p > inlet.native().p {
        return Err(refuse(
            THROTTLE,
            "its outlet pressure is above its inlet pressure",
        ));
    }
    let outlet = State::from_ph(p, inlet.native().h, Units::Native)
        .map_err(|e| in_caller_units(e, units))?;
    Ok(outlet.in_units(units))
}
